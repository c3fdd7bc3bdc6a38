"""Stratification engine against outside references: numpy, scikit-learn, a hand-worked table."""
import numpy as np
import pytest

from plotwise.processing.engine import stratification as s
from plotwise.processing.engine.errors import Cancelled, InputError


def _gamma_field(seed=1, shape=(240, 310), nan_share=0.05):
    rng = np.random.default_rng(seed)
    a = rng.gamma(2.0, 3.0, shape).astype(np.float32)
    a[rng.random(shape) < nan_share] = np.nan
    frame = np.zeros(shape, bool)
    frame[15:230, 20:300] = True
    return a, frame


def _ids_raster(source):
    """Provisional stratum id per cell, collected through the ``write`` callback (map with ``lut``)."""
    rows, cols = source.shape
    out = np.zeros((rows, cols), np.int64)

    def write(window, ids):
        xo, yo, xs, ys = window
        out[yo:yo + ys, xo:xo + xs] = ids

    return out, write


# --- quantiles ----------------------------------------------------------------------------------

@pytest.mark.parametrize("cap", [s.SELECTION_CAP, 40])
def test_exact_quantiles_equal_numpy(cap):
    a, frame = _gamma_field()
    src = s.ArrayCellSource([a], frame, block_rows=17)
    cells = a[frame & np.isfinite(a)].astype(float)
    p = [0.1, 0.2, 0.25, 0.5, 0.8, 0.999]
    q, _ = s.exact_quantiles(src, p, cap=cap)  # cap=40 forces the class-splitting passes
    # numpy.quantile, linear rule (Hyndman & Fan 1996 def. 7)
    np.testing.assert_allclose(q, np.quantile(cells, p), rtol=0, atol=1e-12)


def test_exact_quantiles_with_ties_and_a_poor_range_hint():
    rng = np.random.default_rng(7)
    b = rng.integers(0, 7, (200, 150)).astype(np.float64)
    src = s.ArrayCellSource([b], block_rows=33)
    p = [0.1, 0.25, 0.5, 0.9]
    # a range hint narrower than the data: values outside fall in the end classes
    q, _ = s.exact_quantiles(src, p, value_range=(2.0, 3.0), cap=50)
    np.testing.assert_array_equal(q, np.quantile(b.ravel(), p))  # numpy.quantile


def test_quantile_strata_boundaries_and_areas():
    a, frame = _gamma_field(seed=3)
    src = s.ArrayCellSource([a], frame, block_rows=23)
    out, write = _ids_raster(src)
    k = 5
    r = s.stratify_cells(src, s.QUANTILE, k, ["gamma"], write=write)
    cells = a[frame & np.isfinite(a)].astype(float)
    expected = np.quantile(cells, np.arange(1, k) / k)  # numpy.quantile
    np.testing.assert_allclose(r.boundaries, expected, rtol=0, atol=1e-12)
    # equal-count strata: within one cell per boundary of N/k (definition of the quantile)
    n = cells.size
    per_boundary = np.array([1, 2, 2, 2, 1])
    assert np.all(np.abs(r.statistics.count - n / k) <= per_boundary)
    # the written raster matches numpy.digitize on the same cells
    ref = np.zeros(a.shape, np.int64)
    ok = frame & np.isfinite(a)
    ref[ok] = np.digitize(a[ok].astype(float), expected) + 1
    np.testing.assert_array_equal(r.lut[out], ref)
    assert r.cells_in_frame == int(frame.sum()) and r.cells_valid == n


def test_float32_cells_compared_with_float64_boundaries_exactly():
    b = 1.0 + 2.0**-30  # between two float32 values
    v = np.array([[1.0, np.float32(b), np.nextafter(np.float32(1.0), np.float32(2.0))]], np.float32)
    rule = s.ThresholdRule(np.array([b]))
    # exact comparison in real numbers, as numpy.digitize does in float64
    np.testing.assert_array_equal(rule.assign([v.ravel()]), np.digitize(v.ravel().astype(float), [b]) + 1)


# --- equal interval and cum sqrt(f) ---------------------------------------------------------------

def test_cum_root_f_hand_worked_table():
    # Dalenius & Hodges (1959) rule as set out in Cochran (1977) ch. 5A (# from memory: the rule's
    # statement); the table is our own and the arithmetic is done by hand here:
    # f      = 4, 16, 36, 64, 100, 81, 49, 25, 9, 1   (classes 0-10, 10-20, ..., 90-100)
    # sqrt f = 2,  4,  6,  8,  10,  9,  7,  5, 3, 1
    # cum    = 2,  6, 12, 20,  30, 39, 46, 51, 54, 55
    edges = np.arange(0, 101, 10)
    f = [4, 16, 36, 64, 100, 81, 49, 25, 9, 1]
    # k = 3: targets 55/3 = 18.33 -> cum 20 (class 30-40), 36.67 -> cum 39 (class 50-60)
    np.testing.assert_array_equal(s.cum_root_f_boundaries(edges, f, 3), [40, 60])
    # k = 4: targets 13.75 -> 12 (20-30), 27.5 -> 30 (40-50), 41.25 -> 39 (50-60)
    np.testing.assert_array_equal(s.cum_root_f_boundaries(edges, f, 4), [30, 50, 60])


def test_cum_root_f_strata_use_the_histogram_of_the_cells():
    a, frame = _gamma_field(seed=5, nan_share=0.0)
    src = s.ArrayCellSource([a], frame, block_rows=40)
    r = s.stratify_cells(src, s.CUM_ROOT_F, 4, ["gamma"])
    cells = a[frame].astype(float)
    counts, edges = np.histogram(cells, bins=s.CUM_ROOT_F_CLASSES, range=(cells.min(), cells.max()))  # numpy
    np.testing.assert_allclose(r.boundaries, s.cum_root_f_boundaries(edges, counts, 4), rtol=1e-9)


def test_equal_interval_and_label_text():
    v = np.linspace(1240.0, 1980.0, 400).reshape(20, 20)
    r = s.stratify_cells(s.ArrayCellSource([v]), s.EQUAL_INTERVAL, 2, ["elevation"])
    np.testing.assert_allclose(r.boundaries, [1610.0])  # (1240 + 1980) / 2
    assert s.stratum_label_texts(r, ["elevation"], ["m"]) == ["elevation 1,240\u20131,610 m",
                                                          "elevation 1,610\u20131,980 m"]


# --- k-means ---------------------------------------------------------------------------------------

def _three_covariates(seed=11, shape=(120, 150)):
    rng = np.random.default_rng(seed)
    centres = np.array([[0, 0, 0], [4, 1, -2], [1, 5, 2], [-3, 3, 4]], float)
    lab = rng.integers(0, 4, shape)
    x = centres[lab] + rng.normal(0, 1.0, shape + (3,))
    x[..., 0] = 1000 + 100 * x[..., 0]  # different scales: standardisation matters
    x[..., 2] = 0.05 * x[..., 2]
    covs = [x[..., c] for c in range(3)]
    covs[1][rng.random(shape) < 0.03] = np.nan
    return covs


def _z(cells, mean, sd):
    return (cells - mean) / sd


def test_kmeans_agrees_with_sklearn_on_all_cells():
    sklearn_cluster = pytest.importorskip("sklearn.cluster")
    metrics = pytest.importorskip("sklearn.metrics")
    covs = _three_covariates()
    src = s.ArrayCellSource(covs, block_rows=19)
    out, write = _ids_raster(src)
    r = s.stratify_cells(src, s.KMEANS, 4, ["a", "b", "c"], rng=np.random.default_rng(2), write=write)
    ok = np.all([np.isfinite(c) for c in covs], axis=0)
    cells = np.column_stack([c[ok] for c in covs])
    z = _z(cells, cells.mean(axis=0), cells.std(axis=0))  # numpy standardisation, population SD
    km = sklearn_cluster.KMeans(4, init=r.kmeans.initial_centres, n_init=1, max_iter=300, tol=0,
                                algorithm="lloyd").fit(z)
    ours = r.lut[out][ok]
    assert metrics.adjusted_rand_score(ours, km.predict(z)) > 0.99  # scikit-learn KMeans
    assert r.sample_size == cells.shape[0]


def test_kmeans_on_a_subsample_agrees_with_sklearn():
    sklearn_cluster = pytest.importorskip("sklearn.cluster")
    metrics = pytest.importorskip("sklearn.metrics")
    covs = _three_covariates(seed=4)
    src = s.ArrayCellSource(covs, block_rows=31)
    out, write = _ids_raster(src)
    r = s.stratify_cells(src, s.KMEANS, 4, ["a", "b", "c"], rng=np.random.default_rng(9), sample_size=3000,
                         write=write)
    ok = np.all([np.isfinite(c) for c in covs], axis=0)
    cells = np.column_stack([c[ok] for c in covs])
    mean, sd = cells.mean(axis=0), cells.std(axis=0)
    # the same draw as the engine's: the run's generator is used first for the subsample
    sample = s.cell_sample(src, cells.shape[0], 3000, np.random.default_rng(9))
    km = sklearn_cluster.KMeans(4, init=r.kmeans.initial_centres, n_init=1, max_iter=300, tol=0,
                                algorithm="lloyd").fit(_z(sample, mean, sd))
    assert metrics.adjusted_rand_score(r.lut[out][ok], km.predict(_z(cells, mean, sd))) > 0.99  # scikit-learn
    # strata numbered by increasing mean of the first covariate
    assert np.all(np.diff(r.statistics.mean[:, 0]) > 0)


def test_kmeans_plusplus_draws_distinct_points_of_the_data():
    x = np.random.default_rng(0).normal(size=(500, 2))
    c = s.kmeans_plusplus(x, 5, np.random.default_rng(1))
    assert c.shape == (5, 2) and np.unique(c, axis=0).shape[0] == 5
    assert all((x == ci).all(axis=1).any() for ci in c)  # seeds are data points (Arthur & Vassilvitskii 2007)


# --- statistics --------------------------------------------------------------------------------------

@pytest.mark.parametrize("method", [s.QUANTILE, s.KMEANS])
def test_stratum_statistics_and_r_squared_equal_numpy(method):
    covs = _three_covariates(seed=8)
    src = s.ArrayCellSource(covs, block_rows=13)
    out, write = _ids_raster(src)
    r = s.stratify_cells(src, method, 3, ["a", "b", "c"], write=write, rng=np.random.default_rng(1))
    ok = np.all([np.isfinite(c) for c in covs], axis=0)
    ids = r.lut[out][ok]
    for c in range(3):
        x = covs[c][ok]
        groups = [x[ids == h] for h in (1, 2, 3)]
        np.testing.assert_allclose(r.statistics.mean[:, c], [g.mean() for g in groups], rtol=1e-10)
        np.testing.assert_allclose(r.statistics.sd[:, c], [g.std() for g in groups], rtol=1e-8)
        if method == s.KMEANS:  # threshold strata are bounded by their boundaries: no extremes kept
            np.testing.assert_allclose(r.statistics.minimum[:, c], [g.min() for g in groups], rtol=1e-12)
            np.testing.assert_allclose(r.statistics.maximum[:, c], [g.max() for g in groups], rtol=1e-12)
        # one-way ANOVA: R^2 = between SS / total SS
        between = sum(g.size * (g.mean() - x.mean()) ** 2 for g in groups)
        np.testing.assert_allclose(r.statistics.r_squared()[c], between / ((x - x.mean()) ** 2).sum(), rtol=1e-8)
    assert r.statistics.chart_counts.sum() == ok.sum()


def test_exact_quantiles_of_large_values_in_a_narrow_range():
    # float32 cells near 10^6 spread over 2 m: the fine classes are narrower than float32's resolution there
    rng = np.random.default_rng(4)
    a = (1.0e6 + rng.normal(0, 0.5, (180, 140))).astype(np.float32)
    src = s.ArrayCellSource([a], block_rows=21)
    p = [0.2, 0.4, 0.6, 0.8]
    q, _ = s.exact_quantiles(src, p)
    np.testing.assert_array_equal(q, np.quantile(a.astype(float).ravel(), p))  # numpy.quantile


def test_report_histogram_counts_every_cell_in_its_own_stratum():
    # the chart is re-binned from the fine histogram; the fine classes cut by a boundary are split exactly, so
    # each stratum's row holds its own cells: row sums equal numpy's counts of b_{h-1} <= x < b_h
    a, frame = _gamma_field(seed=5)
    src = s.ArrayCellSource([a], frame, block_rows=29)
    r = s.stratify_cells(src, s.QUANTILE, 6, ["gamma"])
    cells = a[frame & np.isfinite(a)].astype(float)
    counts = np.bincount(np.digitize(cells, np.quantile(cells, np.arange(1, 6) / 6)), minlength=6)  # numpy
    chart = r.statistics.chart_counts
    assert chart.min() >= 0
    np.testing.assert_array_equal(chart.sum(axis=1), counts)


def _row_runs(ids):
    """Flat index of the first cell, length and id of every run of equal ids along the rows (numpy)."""
    start = np.ones(ids.shape, bool)
    start[:, 1:] = ids[:, 1:] != ids[:, :-1]
    first = np.flatnonzero(start)
    return first, np.diff(np.append(first, ids.size)), ids.ravel()[first]


@pytest.mark.parametrize("use_histogram", [True, False])
def test_statistics_after_moves_equal_numpy_on_the_moved_strata(use_histogram):
    # truth by construction: a quarter of the runs of a quantile stratification move to a random other
    # stratum; numpy recomputes the strata's counts, means and SDs on the moved raster
    covs = _three_covariates(seed=9)
    src = s.ArrayCellSource(covs, block_rows=11)
    out, write = _ids_raster(src)
    k = 4
    r = s.stratify_cells(src, s.QUANTILE, k, ["a", "b", "c"], write=write)
    ids = r.lut[out]
    stats = r.statistics
    if not use_histogram:  # a chart counted cell by cell over the chart range instead
        stats = s.accumulate_statistics(src.with_strata(ids), k, shift=stats.overall_mean(),
                                        chart_range=stats.chart_range, extremes=False)
    rng = np.random.default_rng(2)
    first, length, old = _row_runs(ids)
    pick = np.flatnonzero((old > 0) & (rng.random(old.size) < 0.25))
    new = (old[pick] - 1 + rng.integers(1, k, pick.size)) % k + 1
    moves = s.CellMoves(ids.shape[1], first[pick], length[pick], old[pick], new)
    after = s.statistics_after_moves(src, stats, moves, r.histogram if use_histogram else None)
    moved = ids.copy().ravel()
    for f, n, h in zip(first[pick], length[pick], new):
        moved[f:f + n] = h
    moved = moved.reshape(ids.shape)
    ok = np.all([np.isfinite(c) for c in covs], axis=0)
    np.testing.assert_array_equal(after.count, np.bincount(moved[ok], minlength=k + 1)[1:])
    for c in range(3):
        groups = [covs[c][ok & (moved == h)] for h in range(1, k + 1)]
        np.testing.assert_allclose(after.mean[:, c], [g.mean() for g in groups], rtol=1e-10)
        np.testing.assert_allclose(after.sd[:, c], [g.std() for g in groups], rtol=1e-8)
    assert after.chart_counts.min() >= 0
    np.testing.assert_array_equal(after.chart_counts.sum(axis=1), after.count)
    if not use_histogram:  # numpy.histogram of each stratum's first covariate over the chart range
        lo, hi = stats.chart_range
        for h in range(k):
            ref, _ = np.histogram(covs[0][ok & (moved == h + 1)], bins=s.CHART_BINS, range=(lo, hi))
            np.testing.assert_array_equal(after.chart_counts[h], ref)


# --- classes and bad input -----------------------------------------------------------------------------

def test_raster_classes_become_strata():
    rng = np.random.default_rng(2)
    cl = (rng.integers(1, 5, (60, 70)) * 10).astype(np.int16)
    r = s.stratify_cells(s.ArrayCellSource([cl]), s.RASTER_CLASSES, 0, ["cover"])
    np.testing.assert_array_equal(r.statistics.count, [np.count_nonzero(cl == v) for v in (10, 20, 30, 40)])
    assert s.stratum_label_texts(r, ["cover"]) == ["cover class 10", "cover class 20", "cover class 30",
                                                   "cover class 40"]


def test_too_many_classes_suggests_reclassifying():
    cl = np.arange(60 * 10).reshape(60, 10) % 51
    with pytest.raises(InputError, match="reclassify"):
        s.stratify_cells(s.ArrayCellSource([cl]), s.RASTER_CLASSES, 0, ["cover"])


def test_more_strata_than_distinct_values_states_the_number():
    v = (np.arange(400).reshape(20, 20) % 3).astype(float)
    with pytest.raises(InputError, match="only 3 distinct values"):
        s.stratify_cells(s.ArrayCellSource([v]), s.QUANTILE, 5, ["slope class"])
    with pytest.raises(InputError, match="only 3 distinct value combinations"):
        s.stratify_cells(s.ArrayCellSource([v, v]), s.KMEANS, 4, ["a", "b"], rng=np.random.default_rng(1))


def test_constant_covariate_is_an_error():
    v = np.full((10, 10), 7.0)
    g = np.random.default_rng(0).random((10, 10))
    with pytest.raises(InputError, match="'flat' is constant"):
        s.stratify_cells(s.ArrayCellSource([v]), s.EQUAL_INTERVAL, 3, ["flat"])
    with pytest.raises(InputError, match="'flat' is constant"):
        s.stratify_cells(s.ArrayCellSource([g, v]), s.KMEANS, 3, ["green", "flat"], rng=np.random.default_rng(0))


def test_no_valid_cell_is_an_error():
    v = np.full((10, 10), np.nan)
    with pytest.raises(InputError, match="No cell"):
        s.stratify_cells(s.ArrayCellSource([v]), s.QUANTILE, 3, ["empty"])


def test_cancel_stops_the_run():
    a, frame = _gamma_field()
    with pytest.raises(Cancelled):
        s.stratify_cells(s.ArrayCellSource([a], frame, block_rows=10), s.QUANTILE, 4, ["g"],
                         progress=lambda f: f > 0.5)


@pytest.mark.parametrize("method", [s.QUANTILE, s.KMEANS, s.CUM_ROOT_F])
def test_results_do_not_depend_on_the_worker_threads(monkeypatch, method):
    covs = _three_covariates(seed=12)
    runs = []
    for workers in (0, 1, 2):  # serial, one worker thread, two
        monkeypatch.setattr(s, "WORKERS", workers)
        src = s.ArrayCellSource(covs, block_rows=9)
        out, write = _ids_raster(src)
        r = s.stratify_cells(src, method, 4, ["a", "b", "c"], rng=np.random.default_rng(6), write=write)
        runs.append((out, r))
    for out, r in runs[1:]:
        np.testing.assert_array_equal(out, runs[0][0])  # bit for bit: sums are taken in reading order
        np.testing.assert_array_equal(r.statistics.mean, runs[0][1].statistics.mean)
        np.testing.assert_array_equal(r.statistics.sd, runs[0][1].statistics.sd)



def test_selection_reads_only_blocks_that_can_hold_the_quantiles():
    # a covariate rising row by row: each quantile's class lies in one or two strips of rows
    rows = np.repeat(np.arange(400.0), 50).reshape(400, 50) + np.tile(np.linspace(0, 0.9, 50), (400, 1))

    class Counting(s.ArrayCellSource):
        read = 0

        def blocks_where(self, keep):
            for b in super().blocks_where(keep):
                Counting.read += 1
                yield b

    src = Counting([rows], block_rows=10)
    hist = s.streamed_histogram(src, s.FINE_BINS)
    before = Counting.read
    q, _ = s.exact_quantiles(src, [0.25, 0.5, 0.75], histogram=hist)
    np.testing.assert_allclose(q, np.quantile(rows.ravel(), [0.25, 0.5, 0.75]), rtol=0, atol=1e-12)  # numpy
    assert Counting.read - before <= 6  # of 40 blocks


# --- patches below the minimum area ---------------------------------------------------------------

def _patch_graph(ids):
    """Patches of a stratum map (scipy.ndimage.label, 4-connected): labels, sizes, strata, neighbour pairs."""
    from scipy import ndimage

    labels = np.zeros(ids.shape, np.int64)
    strata, n = [0], 0
    for h in np.unique(ids[ids > 0]):
        lab, k = ndimage.label(ids == h)
        labels[lab > 0] = lab[lab > 0] + n
        strata += [int(h)] * k
        n += k
    sizes = np.bincount(labels.ravel(), minlength=n + 1)
    sizes[0] = 0
    edges = []
    for a, b in ((labels[:, :-1], labels[:, 1:]), (labels[:-1], labels[1:])):
        e = (a != b) & (a > 0) & (b > 0)
        edges.append(np.stack([np.minimum(a[e], b[e]), np.maximum(a[e], b[e])], 1))
    pairs, shared = np.unique(np.concatenate(edges), axis=0, return_counts=True)
    return labels, sizes, np.asarray(strata), pairs, shared


def test_mosaic_of_small_patches_is_merged_to_the_minimum():
    # truth by construction: 4 x 4-cell squares of three strata in diagonal bands, every patch (16 cells)
    # below the minimum of 20 cells and every neighbour too, where GDAL's sieve merges nothing.
    # Oracle: scipy.ndimage.label of the merged map
    from scipy import ndimage

    yy, xx = np.mgrid[0:48, 0:48]
    ids = ((xx // 4) + (yy // 4)) % 3 + 1
    labels, sizes, strata, pairs, shared = _patch_graph(ids)
    assert sizes[1:].max() == 16
    merge = s.merge_patch_graph(sizes, strata, pairs, shared, 20)
    merged = merge.strata[labels]
    for h in np.unique(merged):
        lab, _ = ndimage.label(merged == h)
        assert np.bincount(lab.ravel())[1:].min() >= 20
    assert merge.left.size == 0 and merge.merged == np.count_nonzero(merge.strata != strata)
    assert np.unique(merged).size >= 2  # the mosaic does not collapse into one stratum
    again = s.merge_patch_graph(sizes, strata, pairs, shared, 20)
    np.testing.assert_array_equal(again.strata, merge.strata)  # deterministic


def test_small_patch_takes_the_stratum_giving_the_smallest_patch_that_reaches_the_minimum():
    # truth by construction, one row: stratum 1 (10 cells) | stratum 3 (3 cells) | stratum 2 (30 cells).
    # With a minimum of 12, joining stratum 1 gives 13 cells, joining stratum 2 gives 33: stratum 1
    ids = np.array([[1] * 10 + [3] * 3 + [2] * 30])
    labels, sizes, strata, pairs, shared = _patch_graph(ids)
    merge = s.merge_patch_graph(sizes, strata, pairs, shared, 12)
    np.testing.assert_array_equal(merge.strata[labels][0], [1] * 13 + [2] * 30)
    assert merge.merged == 1 and merge.left.size == 0


def test_small_patch_takes_the_largest_join_when_none_reaches_the_minimum():
    # truth by construction, one row: stratum 1 (4 cells) | stratum 3 (2) | stratum 2 (5), minimum 20.
    # The 2-cell patch joins stratum 2 (7 cells, more than 6 with stratum 1); then the 4-cell patch, the
    # smallest left, joins it: 11 cells of stratum 2, still below 20, with no other neighbour.
    # (Had it joined stratum 1, the 5-cell patch would have followed into stratum 1.)
    ids = np.array([[1] * 4 + [3] * 2 + [2] * 5])
    labels, sizes, strata, pairs, shared = _patch_graph(ids)
    merge = s.merge_patch_graph(sizes, strata, pairs, shared, 20)
    assert (merge.strata[labels] == 2).all()
    assert merge.left_cells.tolist() == [11]


def test_joining_a_stratum_links_its_patches():
    # truth by construction: a 1-cell patch of stratum 2 between two 5-cell patches of stratum 1; taking
    # stratum 1 joins all three into one 11-cell patch, which reaches a minimum of 11 (but not 12)
    ids = np.array([[1] * 5 + [2] + [1] * 5])
    labels, sizes, strata, pairs, shared = _patch_graph(ids)
    merge = s.merge_patch_graph(sizes, strata, pairs, shared, 11)
    assert (merge.strata[labels] == 1).all() and merge.left.size == 0
    merge = s.merge_patch_graph(sizes, strata, pairs, shared, 12)
    assert (merge.strata[labels] == 1).all() and merge.left_cells.tolist() == [11]


def test_isolated_small_patch_stays_and_is_reported():
    # truth by construction: a 2 x 2 island of stratum 2 ringed by cells without a stratum (0)
    ids = np.zeros((8, 8), int)
    ids[:, :3] = 1
    ids[4:6, 5:7] = 2
    labels, sizes, strata, pairs, shared = _patch_graph(ids)
    merge = s.merge_patch_graph(sizes, strata, pairs, shared, 10)
    np.testing.assert_array_equal(merge.strata, strata)
    assert merge.merged == 0 and merge.left_cells.tolist() == [4]


def test_sieve_rule_follows_chains_to_the_largest_neighbour():
    # truth by construction (the rule of GDAL's sieve filter): patch 3 (1 cell) touches only patch 2 (3 cells),
    # which touches patch 1 (100 cells); below 4 cells both join along the chain 3 -> 2 -> 1
    sizes = [0, 100, 3, 1]
    strata = [0, 1, 3, 2]
    groups = s.sieve_patch_graph(sizes, strata, [[1, 2], [2, 3]], [10, 2], 4)
    assert groups.group.tolist() == [0, 1, 1, 1]
    assert groups.sizes.tolist() == [0, 104] and groups.strata.tolist() == [0, 1]
    assert groups.pairs.shape == (0, 2)


def test_sieve_rule_joins_groups_of_one_stratum_that_now_touch():
    # truth by construction: a 1-cell patch of stratum 2 between two patches of stratum 1 (50 and 60 cells) joins
    # the larger; the three are then one patch of 111 cells, and the 40-cell patch of stratum 3 beside keeps its own
    sizes = [0, 50, 1, 60, 40]
    strata = [0, 1, 2, 1, 3]
    pairs = [[1, 2], [2, 3], [1, 4], [3, 4]]
    groups = s.sieve_patch_graph(sizes, strata, pairs, [1, 1, 5, 7], 2)
    assert groups.group.tolist() == [0, 1, 1, 1, 2]
    assert groups.sizes.tolist() == [0, 111, 40] and groups.strata.tolist() == [0, 1, 3]
    assert groups.pairs.tolist() == [[1, 2]] and groups.shared.tolist() == [12]


def test_sieve_rule_leaves_a_patch_without_neighbours():
    groups = s.sieve_patch_graph([0, 2, 30], [0, 1, 2], np.zeros((0, 2), int), [], 8)
    assert groups.sizes.tolist() == [0, 2, 30]
