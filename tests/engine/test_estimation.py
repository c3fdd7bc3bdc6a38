"""Stratified density and abundance: checks against formulas, a published example and hand cases.

Equation numbers of Cochran (1977) are cited from memory (the formulas themselves are
written out in the tests); the Thompson example is marked from memory where it is used.
"""
import math

import numpy as np
import pytest
from scipy import stats

from plotwise.processing.engine import estimation as est
from plotwise.processing.engine.errors import InputError
from plotwise.processing.engine.rng import make_rng

REL = 1e-9

# hand-made data: three strata, unequal unit areas (km²), stratum areas in km²
HAND = {
    "A": ([3, 0, 5, 2, 7, 1], [0.010, 0.012, 0.010, 0.009, 0.011, 0.010], 12.0),
    "B": ([12, 9, 15, 20, 8], [0.010, 0.010, 0.020, 0.020, 0.010], 4.5),
    "C": ([0, 0, 1, 0, 2, 0, 1, 0], [0.010] * 8, 30.0),
}


def _hand_arrays():
    counts, areas, strata = [], [], []
    for h, (y, a, _) in HAND.items():
        counts += y
        areas += a
        strata += [h] * len(y)
    return np.array(counts, float), np.array(areas), np.array(strata, dtype=object), {h: v[2] for h, v in HAND.items()}


def _by_formula(fpc, p=1.0, p_se=0.0, confidence=0.95):
    """Recompute everything with plain Python from the textbook formulas."""
    rows = {}
    total, var_total, components = 0.0, 0.0, []
    for h, (y, a, area) in HAND.items():
        n = len(y)
        r = sum(y) / sum(a)  # Cochran (1977), eq. 6.1: ratio estimator
        abar = sum(a) / n
        s2 = sum((yi - r * ai) ** 2 for yi, ai in zip(y, a)) / (n - 1)
        f = sum(a) / area if fpc else 0.0
        v = (1 - f) * s2 / (n * abar ** 2)  # Cochran (1977), eq. 6.13: linearised variance
        nh, vn = r * area, area ** 2 * v
        total += nh
        var_total += vn
        components.append((vn, n - 1))
        rows[h] = (nh, vn, n - 1)
    # Satterthwaite (1946); Cochran (1977), eq. 5.16
    df = var_total ** 2 / sum(v ** 2 / d for v, d in components)
    rows["all"] = (total, var_total, df)
    out = {}
    sum_area = sum(v[2] for v in HAND.values())
    for h, (nh, vn, d) in rows.items():
        area = sum_area if h == "all" else HAND[h][2]
        corrected = nh / p
        # delta method, Seber (1982): squared CVs add
        cv2 = vn / nh ** 2 + (p_se / p) ** 2
        se = corrected * math.sqrt(cv2)
        if p_se > 0:
            # Buckland et al. (2001), eq. 3.75, detection component with infinite df
            d = cv2 ** 2 / ((vn / nh ** 2) ** 2 / d)
        q = stats.t.ppf(1 - (1 - confidence) / 2, d)
        out[h] = dict(abund=corrected, abund_se=se, dens=corrected / area, dens_se=se / area, df=d,
                      abund_lo=max(0.0, corrected - q * se), abund_hi=corrected + q * se, cv=math.sqrt(cv2))
    return out


@pytest.mark.parametrize("fpc", [False, True])
@pytest.mark.parametrize("p,p_se", [(1.0, 0.0), (0.7, 0.06)])
def test_independent_recomputation_with_scipy_t(fpc, p, p_se):
    counts, areas, strata, frame = _hand_arrays()
    result = est.estimate_density(counts, areas, strata, frame, fpc=fpc, confidence=0.9,
                                  detection_p=p, detection_se=p_se)
    expected = _by_formula(fpc, p, p_se, confidence=0.9)
    for row in result.table():
        for name, value in expected[row.stratum].items():
            assert getattr(row, name) == pytest.approx(value, rel=REL), (row.stratum, name)


def test_mean_count_and_sd_per_stratum():
    counts, areas, strata, frame = _hand_arrays()
    result = est.estimate_density(counts, areas, strata, frame)
    for row in result.strata:
        y = HAND[row.stratum][0]
        assert row.mean_c == pytest.approx(np.mean(y), rel=REL)  # numpy as oracle
        assert row.sd_c == pytest.approx(np.std(y, ddof=1), rel=REL)
        assert row.n == len(y)


def test_thompson_caribou_stratified_example():
    """Thompson, *Sampling* (2nd ed. 2002), ch. 11, example of the caribou survey of
    Siniff & Skoog (1964): six strata, N_h units, n_h sampled, sample means and
    variances below; estimated total 54,497 with variance 34,105,732 (SE ≈ 5,840).
    All values # from memory."""
    n_units = [400, 30, 61, 18, 70, 120]
    n_sample = [98, 10, 37, 6, 39, 21]
    means = [24.1, 25.6, 267.6, 179.0, 293.7, 33.2]
    variances = [5575, 4064, 347556, 22798, 123578, 9795]
    counts, strata, frame = [], [], {}
    for h, (big_n, n, m, s2) in enumerate(zip(n_units, n_sample, means, variances)):
        # n values with exactly this mean and variance: n-1 equal values and one spike
        s = math.sqrt(s2)
        values = np.full(n, m - s / math.sqrt(n))
        values[-1] += s * math.sqrt(n)
        counts.append(values)
        strata += [h] * n
        frame[h] = float(big_n)  # unit area 1: a stratum of N_h units has area N_h
    counts = np.concatenate(counts)
    result = est.estimate_density(counts, np.ones(counts.size), strata, frame, fpc=True)
    # Cochran (1977), eqs. 5.1 and 5.7 (exact form of the same numbers)
    total = sum(big_n * m for big_n, m in zip(n_units, means))
    var = sum(big_n * (big_n - n) * s2 / n for big_n, n, s2 in zip(n_units, n_sample, variances))
    assert result.overall.abund == pytest.approx(total, rel=REL)
    assert result.overall.abund_se ** 2 == pytest.approx(var, rel=REL)
    assert round(result.overall.abund) == 54497  # Thompson (2002), from memory
    assert abs(result.overall.abund_se ** 2 - 34_105_732) < 1.0  # from memory
    assert round(result.overall.abund_se) == 5840  # from memory


def test_collapsed_pair_of_single_unit_strata_matches_cochran():
    """Cochran (1977), §5A.12: two strata of equal size with one unit each,
    collapsed: v(Ŷ) = (Ŷ_1 − Ŷ_2)² for the pair."""
    counts = np.array([4.0, 10.0, 3.0, 5.0, 6.0])
    strata = ["1", "2", "3", "3", "3"]
    frame = {"1": 50.0, "2": 50.0, "3": 80.0}
    result = est.estimate_density(counts, np.ones(5), strata, frame, neighbours={"1": "2"})
    row1, row2, row3 = result.strata
    pair_var = (50 * 4.0 - 50 * 10.0) ** 2  # Cochran (1977), §5A.12, from memory
    assert row1.abund_se ** 2 + row2.abund_se ** 2 == pytest.approx(pair_var, rel=REL)
    assert row1.collapsed_with == ("2",) and row2.collapsed_with == ("1",)
    own3 = 80.0 ** 2 * np.var([3, 5, 6], ddof=1) / 3  # Cochran (1977), eq. 5.7 without FPC
    assert row3.abund_se ** 2 == pytest.approx(own3, rel=REL)
    assert result.overall.abund_se ** 2 == pytest.approx(pair_var + own3, rel=REL)
    assert any("collapsed" in w for w in result.warnings)




def test_missing_counts_are_non_response():
    counts, areas, strata, frame = _hand_arrays()
    with_gaps = counts.astype(object)
    with_gaps[[1, 7]] = None
    ids = np.arange(100, 100 + counts.size)
    result = est.estimate_density(with_gaps, areas, strata, frame, unit_ids=ids)
    assert result.missing_ids == (101, 107)
    assert "101" in result.warnings[0] and "107" in result.warnings[0]
    assert result.strata[0].n == 5 and result.strata[0].n_missing == 1
    keep = np.ones(counts.size, bool)
    keep[[1, 7]] = False
    same = est.estimate_density(counts[keep], areas[keep], strata[keep], frame)
    assert result.overall.abund == pytest.approx(same.overall.abund, rel=REL)
    assert result.overall.abund_se == pytest.approx(same.overall.abund_se, rel=REL)


@pytest.mark.parametrize("bad", [-1, "many", float("inf")])
def test_bad_counts_name_the_units(bad):
    counts, areas, strata, frame = _hand_arrays()
    values = counts.astype(object)
    values[4] = bad
    with pytest.raises(InputError) as err:
        est.estimate_density(values, areas, strata, frame, unit_ids=np.arange(counts.size) + 1)
    assert err.value.ids == [5]
    assert "5" in err.value.message


def test_empty_stratum_is_an_error_unless_left_out():
    counts, areas, strata, frame = _hand_arrays()
    frame = dict(frame, D=20.0)
    with pytest.raises(InputError) as err:
        est.estimate_density(counts, areas, strata, frame)
    assert err.value.ids == ["D"]
    result = est.estimate_density(counts, areas, strata, frame, drop_empty_strata=True)
    assert result.dropped_strata == ("D",) and result.dropped_area == 20.0
    assert result.overall.area == pytest.approx(46.5)
    assert any("shrank" in w for w in result.warnings)


def test_unit_in_unknown_stratum_is_an_error():
    counts, areas, strata, frame = _hand_arrays()
    strata = strata.copy()
    strata[2] = "Z"
    with pytest.raises(InputError) as err:
        est.estimate_density(counts, areas, strata, frame)
    assert err.value.ids == [2]


def test_numeric_and_text_stratum_ids_match():
    result = est.estimate_density([1.0, 2.0, 3.0, 4.0], [1, 1, 1, 1], [1, 1.0, "2", 2], {"1": 5, 2.0: 5})
    assert [r.stratum for r in result.strata] == ["1", "2"]




def test_bootstrap_is_seeded_and_agrees_with_normal_theory():
    rng = np.random.default_rng(5)
    n = 400
    counts = rng.poisson(rng.gamma(2.0, 2.0, size=n)).astype(float)
    strata = np.repeat([1, 2], n // 2)
    frame = {1: 100.0, 2: 300.0}
    first = est.estimate_density(counts, np.full(n, 0.01), strata, frame, ci_method="bootstrap",
                                 rng=make_rng(11).generator)
    again = est.estimate_density(counts, np.full(n, 0.01), strata, frame, ci_method="bootstrap",
                                 rng=make_rng(11).generator)
    assert first.overall == again.overall and first.n_bootstrap == 2000
    # large samples: the percentile interval is close to estimate ± z·SE (Efron & Tibshirani 1993, ch. 13)
    row = first.overall
    z = stats.norm.ppf(0.975)
    assert row.abund_lo == pytest.approx(row.abund - z * row.abund_se, rel=0.03)
    assert row.abund_hi == pytest.approx(row.abund + z * row.abund_se, rel=0.03)


def test_presence_gives_naive_occupancy():
    detections = np.array([1, 0, 0, 1, 1, 0, 0, 0, 1, 0], float)
    strata = [1] * 4 + [2] * 6
    area = np.full(10, 0.04)  # 4 ha units in km²
    frame = {1: 4.0, 2: 12.0}  # 100 and 300 units
    result = est.estimate_density(detections, area, strata, frame, presence=True)
    s1, s2 = result.strata
    assert s1.area == 4.0 and s2.area == 12.0 and result.overall.area == 16.0  # areas, not numbers of units
    assert s1.dens == pytest.approx(0.5) and s2.dens == pytest.approx(2 / 6)
    assert s1.abund == pytest.approx(50.0)  # occupied units: 0.5 of the 100 the stratum holds
    # Cochran (1977), eq. 5.52 (stratified proportion): P = Σ W_h p_h with W_h by units
    assert result.overall.dens == pytest.approx((100 * 0.5 + 300 * 2 / 6) / 400, rel=REL)
    # Cochran (1977), eq. 5.54 without FPC: v(p_h) = p_h q_h / (n_h − 1)
    v = (100 / 400) ** 2 * 0.5 * 0.5 / 3 + (300 / 400) ** 2 * (2 / 6) * (4 / 6) / 5
    assert result.overall.dens_se == pytest.approx(math.sqrt(v), rel=REL)
    with pytest.raises(InputError):
        est.estimate_density(detections * 2, area, strata, frame, presence=True)


def test_neyman_n_next_reaches_target():
    counts, areas, strata, frame = _hand_arrays()
    areas = np.full(counts.size, 0.01)
    result = est.estimate_density(counts, areas, strata, frame, target_cv=0.1)
    m = np.array([frame[h] / 0.01 for h in HAND])
    s = np.array([np.std(HAND[h][0], ddof=1) for h in HAND])
    n_total = sum(r.abund for r in result.strata)
    planned = np.array([r.n_next for r in result.strata])
    assert result.overall.n_next == planned.sum() and np.all(planned >= 2)
    # the planned sample meets the target: variance of the total, Cochran (1977), eq. 5.7 without FPC
    assert math.sqrt(np.sum(m ** 2 * s ** 2 / planned)) / n_total <= 0.1
    # and costs at most one unit per stratum more than the continuous optimum, Cochran (1977), eq. 5.26
    n_star = (m * s).sum() ** 2 / (0.1 * n_total) ** 2
    assert math.ceil(n_star) <= planned.sum() <= math.ceil(n_star) + len(HAND)




def test_satterthwaite_single_stratum_is_n_minus_1():
    # Cochran (1977), eq. 5.16: one component gives its own df
    assert est.satterthwaite_df([3.0], [7]) == pytest.approx(7, rel=REL)
    assert est.satterthwaite_df([1.0, 1.0], [4, 4]) == pytest.approx(8)


def test_stratum_of_zeros_is_flagged():
    result = est.estimate_density([0.0, 0.0, 0.0, 2.0, 5.0, 1.0], np.ones(6), [1, 1, 1, 2, 2, 2], {1: 5, 2: 5})
    assert any("every surveyed unit counted 0" in w and "1" in w for w in result.warnings)


def test_cancel_stops_the_run():
    from plotwise.processing.engine.errors import Cancelled

    counts, areas, strata, frame = _hand_arrays()
    with pytest.raises(Cancelled):
        est.estimate_density(counts, areas, strata, frame, progress=lambda fraction: True)


def test_bootstrap_with_detection_matches_delta_method():
    """With a large sample the bootstrap's spread, p drawn from a beta with the same
    mean and SE, agrees with the delta-method SE (Seber 1982) to a few per cent."""
    rng = np.random.default_rng(9)
    n = 1000
    counts = rng.poisson(rng.gamma(2.0, 2.0, size=n)).astype(float)
    result = est.estimate_density(counts, np.full(n, 0.01), np.ones(n), {1: 100.0}, ci_method="bootstrap",
                                  detection_p=0.5, detection_se=0.05, rng=make_rng(3).generator, n_bootstrap=4000)
    o = result.overall
    # log-normal interval from the same CV as the yardstick (Buckland et al. 2001, eq. 3.71)
    lo, hi = est.lognormal_interval(o.abund, o.cv, 0.95)
    assert o.abund_lo == pytest.approx(lo, rel=0.05)
    assert o.abund_hi == pytest.approx(hi, rel=0.05)


def test_unit_without_stratum_is_an_error():
    with pytest.raises(InputError) as err:
        est.estimate_density([1.0, 2.0, 3.0], [1, 1, 1], [1, None, 1], {1: 5}, unit_ids=["a", "b", "c"])
    assert err.value.ids == ["b"] and "no stratum" in err.value.message


def test_no_count_at_all_is_an_error():
    with pytest.raises(InputError):
        est.estimate_density([None, None], [1, 1], [1, 1], {1: 5})
    with pytest.raises(InputError):
        est.estimate_density([], [], [], {1: 5})


def test_neighbourhood_weights_sum_to_one():
    """Stevens & Olsen (2003): each neighbourhood's weights sum to 1, and each unit's
    weights over the neighbourhoods it belongs to approach 1."""
    from plotwise.processing.engine.variance import local_neighbourhood_variance, neighbourhood_weights

    rng = np.random.default_rng(2)
    gy, gx = np.mgrid[0:12, 0:12]
    coords = np.column_stack([gx.ravel(), gy.ravel()]) + rng.uniform(-0.2, 0.2, (144, 2))
    rows, cols, w = neighbourhood_weights(coords)
    assert np.allclose(np.bincount(rows, w), 1.0, atol=1e-12)
    assert np.median(np.abs(np.bincount(cols, w, minlength=144) - 1.0)) < 0.01
    assert local_neighbourhood_variance(np.full(144, 3.0), coords).variance == pytest.approx(0.0, abs=1e-20)
    trend = coords[:, 0] * 1.0
    assert local_neighbourhood_variance(trend, coords).variance < 0.1 * 144 * np.var(trend, ddof=1)


def test_single_unit_stratum_collapses_with_a_touching_stratum():
    from shapely.geometry import box

    from plotwise.processing.engine.variance import adjacent_strata

    # on the map: 1 is an island; 2 | 3 | 4 in a row, and 2 shares a long edge with 3
    geometries = [box(10e3, 10e3, 11e3, 11e3), box(0, 0, 1e3, 1e3), box(1e3, 0, 2e3, 1e3), box(2e3, 0, 3e3, 1e3),
                  box(0, 1e3, 100, 1.1e3)]
    # shapely's shared-edge lengths: 2–3 1000 m, 2–5 100 m; 3–4 1000 m, 3–2 1000 m (ties in index order)
    assert adjacent_strata(geometries) == {0: [], 1: [2, 4], 2: [1, 3], 3: [2], 4: [1]}
    counts = np.array([8.0, 8.0, 9.0, 30.0, 31.0, 32.0, 1.0, 2.0])
    strata = [1, 1, 2, 3, 3, 3, 4, 4]  # stratum 2 has one unit
    frame = {1: 1.0, 2: 1.0, 3: 1.0, 4: 1.0}
    # no map: the next stratum in id order
    assert est.estimate_density(counts, np.ones(8), strata, frame).strata[1].collapsed_with == ("3",)
    # the map's first candidate, whatever the densities
    on_map = est.estimate_density(counts, np.ones(8), strata, frame, neighbours={2: [1, 3]})
    assert on_map.strata[1].collapsed_with == ("1",)
    alone = est.estimate_density(counts, np.ones(8), strata, frame, neighbours={2: []})
    assert alone.strata[1].collapsed_with == ("3",)  # touching nothing: the id order


def test_local_variance_needs_positions():
    coords = np.array([[0, 0], [1, 0], [np.nan, np.nan], [0, 1]], float)
    with pytest.raises(InputError) as err:
        est.estimate_density([1.0, 2.0, 3.0, 4.0], np.ones(4), [1] * 4, {1: 10}, variance_method="local",
                             coords=coords, unit_ids=[11, 12, 13, 14])
    assert err.value.ids == [13]


def test_overall_intervals_by_every_method():
    counts, areas, strata, frame = _hand_arrays()
    t_run = est.estimate_density(counts, areas, strata, frame)
    ln_run = est.estimate_density(counts, areas, strata, frame, ci_method="lognormal")
    boot_run = est.estimate_density(counts, areas, strata, frame, ci_method="bootstrap", rng=make_rng(2).generator)
    by_method = {m: (lo, hi) for m, lo, hi in boot_run.overall_intervals}
    assert by_method["t"] == (t_run.overall.abund_lo, t_run.overall.abund_hi)
    assert by_method["lognormal"] == pytest.approx((ln_run.overall.abund_lo, ln_run.overall.abund_hi), rel=REL)
    assert by_method["bootstrap"] == (boot_run.overall.abund_lo, boot_run.overall.abund_hi)
    assert boot_run.bootstrap_totals.shape == (2000,) and t_run.bootstrap_totals is None


def test_surveyed_areas_follow_the_rules_in_order():
    from shapely.geometry import LineString, Point, box

    geometries = [box(0, 0, 100, 100), box(0, 0, 10, 10), LineString([(0, 0), (300, 400)]), Point(5, 5), None]
    field = [None, 50.0, None, 0, None]
    areas = est.surveyed_areas(geometries, field, fixed_area=0.0, strip_width=20.0)
    # polygon area (shapely as oracle), the field, strip × length (500 m), nothing for the point
    assert areas[0] == pytest.approx(10_000.0) and areas[1] == 50.0 and areas[2] == pytest.approx(20.0 * 500.0)
    assert np.isnan(areas[3]) and np.isnan(areas[4])
    with_fixed = est.surveyed_areas(geometries, field, fixed_area=700.0)
    assert with_fixed[2] == 700.0 and with_fixed[3] == 700.0 and with_fixed[4] == 700.0


@pytest.mark.parametrize("fpc", [False, True])
def test_rescaled_bootstrap_variance_equals_the_stratified_formula(fpc):
    """Small strata, half of each surveyed: the replicates' variance is the textbook one.

    With equal unit areas a replicate's stratum density is a mean of n_h - 1 draws, rescaled by
    sqrt(1 - f_h), so its variance is exactly (1 - f_h) s_h² / n_h per unit area squared
    (Rao & Wu 1988, JASA 83:231-241, §2.2); summed over strata with weights A_h it is
    V(N) = Σ A_h² (1 - f_h) s_h² / (n_h a²) (Cochran 1977, §5.3, with the correction of §2.6).
    The plain bootstrap of n_h draws would fall short by (n_h - 1)/n_h, 20 % here.
    """
    y = np.array([3, 0, 5, 2, 7, 1, 12, 9, 15, 20, 8, 0, 0, 1, 0, 2], float)
    strata = np.repeat([1, 2, 3], [6, 5, 5])
    a = 0.01  # km² per unit
    frame = {1: 6 * a * 2, 2: 5 * a * 2, 3: 5 * a * 2}  # f_h = 1/2 in every stratum
    result = est.estimate_density(y, np.full(y.size, a), strata, frame, ci_method="bootstrap", fpc=fpc,
                                  rng=make_rng(21).generator, n_bootstrap=40_000)
    f = 0.5 if fpc else 0.0
    expected = sum(frame[h] ** 2 * (1 - f) * np.var(y[strata == h], ddof=1) / ((strata == h).sum() * a * a)
                   for h in (1, 2, 3))  # Cochran (1977) §5.3 and §2.6
    assert result.overall.abund_se ** 2 == pytest.approx(expected, rel=1e-9)  # the analytic SE agrees
    # 40,000 replicates: the sample variance is within about 2 % of its expectation
    assert np.var(result.bootstrap_totals, ddof=1) == pytest.approx(expected, rel=0.04)


# --------------------------------------------------------------------------- the frame: overlaps and NULL ids


def test_overlapping_strata_are_an_error_naming_the_pair_and_the_shared_area():
    from shapely.geometry import box

    # stratum 1 is 1 km × 2 km; stratum 2 is a square beside it plus a square inside stratum 1
    one, two_a, two_b = box(0, 0, 1000, 2000), box(1000, 0, 2000, 1000), box(0, 500, 1000, 1500)
    with pytest.raises(InputError) as err:
        est.frame_strata([1, 2, 2], [one, two_a, two_b], [11, 12, 13], m2_per_unit=1e4, unit="ha",
                         layer="strata", field="stratum")
    shared = one.intersection(two_a.union(two_b)).area / 1e4  # shapely's intersection as the oracle: 100 ha
    covered = one.union(two_a).union(two_b).area / 1e4  # 300 ha (shapely)
    text = str(err.value)
    assert err.value.ids == ["1", "2"]
    assert "'strata'" in text and f"1 and 2 ({shared:.4g} ha)" in text and f"{covered:.4g} ha" in text
    assert "do not overlap" in text


def test_a_trace_of_overlap_is_a_warning_with_the_area_counted_twice():
    from shapely.geometry import box
    from shapely.ops import unary_union

    from plotwise.processing.engine.geometry import OVERLAP_ERROR_SHARE

    # three strata digitised without snapping: 0.5 m slivers along the shared edges, and one corner in all three
    shapes = [box(0, 0, 1000.5, 1000.5), box(1000, 0, 2000, 1000.5), box(0, 1000, 2000, 2000)]
    frame = est.frame_strata(["a", "b", "c"], shapes, m2_per_unit=1e4, unit="ha", layer="strata")
    pairs = {(i, j): shapes[i].intersection(shapes[j]).area for i in range(3) for j in range(i + 1, 3)}
    # shapely's intersection areas as the oracle, each far below the layout's error share of the smaller stratum
    assert max(v / min(shapes[i].area, shapes[j].area) for (i, j), v in pairs.items()) < OVERLAP_ERROR_SHARE
    assert [(a, b) for a, b, _ in frame.overlaps] == [("a", "b"), ("a", "c"), ("b", "c")]
    np.testing.assert_allclose([v for _, _, v in frame.overlaps], [v / 1e4 for v in pairs.values()], rtol=1e-9)
    # the area counted more than once: Σ A_h − A(∪) (shapely), with the corner in all three counted twice over
    twice = (sum(g.area for g in shapes) - unary_union(shapes).area) / 1e4
    assert frame.overlap_area == pytest.approx(twice, rel=1e-9)
    assert sum(frame.areas.values()) == pytest.approx(sum(g.area for g in shapes) / 1e4, rel=1e-12)
    assert len(frame.warnings) == 1 and "counted in more than one stratum" in frame.warnings[0]
    assert f"{twice:.4g} ha" in frame.warnings[0]


def test_polygons_of_one_stratum_may_overlap_and_touching_strata_do_not():
    from shapely.geometry import box

    shapes = [box(0, 0, 1000, 1000), box(500, 0, 1500, 1000), box(1500, 0, 2500, 1000)]
    frame = est.frame_strata([1, 1, 2], shapes, m2_per_unit=1e6, unit="km²")
    # stratum 1 is the union of its two polygons (1.5 km², shapely); 2 only touches it
    assert frame.areas == {"1": pytest.approx(shapes[0].union(shapes[1]).area / 1e6), "2": pytest.approx(1.0)}
    assert frame.overlaps == () and frame.warnings == ()


def test_polygon_without_a_stratum_id_is_an_error_unless_left_out():
    from shapely.geometry import box

    shapes = [box(0, 0, 1000, 2000), box(1000, 0, 2000, 1000), box(1000, 1000, 2000, 2000)]
    with pytest.raises(InputError) as err:
        est.frame_strata([1, 2, None], shapes, [1, 2, 3], m2_per_unit=1e4, unit="ha", layer="strata",
                         field="stratum")
    assert err.value.ids == [3]
    text = str(err.value)
    assert "'strata'" in text and "'stratum'" in text and "(NULL)" in text and "feature id(s) 3" in text
    assert "100 ha" in text  # 1 km² left the frame: shapely's box area
    frame = est.frame_strata([1, 2, None], shapes, [1, 2, 3], m2_per_unit=1e4, unit="ha", drop_unlabelled=True)
    assert set(frame.areas) == {"1", "2"} and frame.unlabelled_ids == (3,)
    assert frame.unlabelled_area == pytest.approx(shapes[2].area / 1e4)  # shapely
    assert len(frame.warnings) == 1 and "shrank" in frame.warnings[0]
    # a NULL polygon that lies inside other strata takes nothing from the frame: a warning, not an error
    inside = est.frame_strata([1, 2, float("nan")], shapes[:2] + [box(100, 100, 900, 900)], [1, 2, 3],
                              m2_per_unit=1e4, unit="ha")
    assert inside.unlabelled_ids == (3,) and inside.unlabelled_area == 0.0 and len(inside.warnings) == 1
    with pytest.raises(InputError):
        est.frame_strata([None], shapes[:1], drop_unlabelled=True)  # no stratum at all


# --------------------------------------------------------------------------- bootstrap of collapsed strata


def test_bootstrap_of_a_one_unit_stratum_is_centred_on_its_own_estimate():
    """Stratum 2 holds one unit and is paired with stratum 1. Its replicates are its estimate plus a normal
    deviate with the variance of the one-unit rule, so their mean is its own estimate (within 3.5 Monte Carlo
    SE, 40,000 replicates) and their variance that of the t interval (within 4 %: the sample variance of
    40,000 normal values has a relative SE of 0.7 %); stratum 1 is resampled on its own (Rao & Wu 1988) and
    keeps its own variance A² s² / n (Cochran 1977, eq. 5.7; numpy as the oracle)."""
    y = np.array([3.0, 0.0, 5.0, 10.0])
    strata = [1, 1, 1, 2]
    frame = {1: 200.0, 2: 100.0}  # ha; unit area 1 ha
    b = 40_000
    result = est.estimate_density(y, np.ones(4), strata, frame, ci_method="bootstrap", rng=make_rng(5).generator,
                                  n_bootstrap=b)
    v_single = result.strata[1].abund_se ** 2
    _, per_stratum = est.stratified_bootstrap(
        y, np.ones(4), np.array([0, 0, 0, 1]), 2, np.array([200.0, 100.0]), 1.0, 0.0, make_rng(5).generator,
        n_bootstrap=b, single_sd=np.array([np.nan, math.sqrt(v_single) / 100.0]))
    single = per_stratum[:, 1]
    assert result.strata[1].abund == 1000.0  # 10 animals in 1 ha of a 100 ha stratum
    assert single.mean() == pytest.approx(1000.0, abs=3.5 * math.sqrt(v_single / b))
    assert np.var(single, ddof=1) == pytest.approx(v_single, rel=0.04)
    assert np.var(per_stratum[:, 0], ddof=1) == pytest.approx(200.0 ** 2 * np.var(y[:3], ddof=1) / 3, rel=0.04)
    assert result.strata[1].abund_lo < 1000.0 < result.strata[1].abund_hi




def test_bootstrap_with_one_unit_in_every_stratum_is_centred():
    """One unit per stratum, collapsed in pairs: the bootstrap total is centred on the estimate and
    varies as Σ over pairs of (N̂_1 − N̂_2)² for equal strata (Cochran 1977, §5A.12, from memory)."""
    y = np.array([4.0, 10.0, 3.0, 7.0])
    strata = [1, 2, 3, 4]
    frame = {h: 50.0 for h in strata}
    result = est.estimate_density(y, np.ones(4), strata, frame, ci_method="bootstrap", n_bootstrap=40_000,
                                  neighbours={1: 2, 3: 4}, rng=make_rng(7).generator)
    pair_var = (50 * 4.0 - 50 * 10.0) ** 2 + (50 * 3.0 - 50 * 7.0) ** 2  # Cochran (1977) §5A.12
    assert result.overall.abund_se ** 2 == pytest.approx(pair_var, rel=1e-12)
    assert np.var(result.bootstrap_totals, ddof=1) == pytest.approx(pair_var, rel=0.04)
    assert result.bootstrap_totals.mean() == pytest.approx(1200.0, abs=3.5 * math.sqrt(pair_var / 40_000))
    assert result.overall.abund_lo < 1200.0 < result.overall.abund_hi


def test_bootstrap_of_a_lone_one_unit_stratum_gives_no_interval():
    result = est.estimate_density([5.0], [1.0], [1], {1: 10.0}, ci_method="bootstrap", rng=make_rng(1).generator)
    # no variance can be estimated from one unit (Cochran 1977, ch. 5): no interval rather than a zero-width one
    assert math.isnan(result.overall.abund_lo) and math.isnan(result.overall.abund_hi)
    assert any("one surveyed unit" in w for w in result.warnings)


def test_single_unit_stratum_partner_is_fixed_by_the_order_not_by_the_counts():
    # stratum 2 has one unit; its partner is the next stratum (3) whatever the counts say: stratum 1's density
    # (1.5) is the closer one to 9, and choosing by it would pull the variance down
    counts = np.array([1.0, 2.0, 9.0, 28.0, 30.0, 33.0])
    strata = [1, 1, 2, 3, 3, 3]
    result = est.estimate_density(counts, np.ones(6), strata, {1: 10, 2: 10, 3: 10})
    assert result.strata[1].collapsed_with == ("3",) and result.strata[2].collapsed_with == ("2",)
    assert result.strata[1].df == 1  # one pairs contrast: 1 degree of freedom (Cochran 1977, §5A.12)
    assert result.strata[2].df == 2  # the partner keeps its own n − 1
    # the partner's SE is the one it has alone: Cochran (1977), eq. 5.7 without FPC, numpy as the oracle
    assert result.strata[2].abund_se == pytest.approx(10 * math.sqrt(np.var([28, 30, 33], ddof=1) / 3), rel=REL)


def test_collapsed_pair_of_unequal_strata_follows_hansen_hurwitz_madow():
    """Two strata of one unit each and unequal sizes A_1 = 30, A_2 = 90 (unit area 1).

    Cochran (1977), §5A.12, with the weights of Hansen, Hurwitz & Madow (1953) for strata of unequal size
    (from memory): v(Ŷ_1 + Ŷ_2) = 4 (A_2 Ŷ_1 − A_1 Ŷ_2)² / (A_1 + A_2)², written as one equal term per stratum.
    By hand: Ŷ_1 = 30·4 = 120, Ŷ_2 = 90·10 = 900, v = 4 (90·120 − 30·900)² / 120² = 4 · 16200² / 14400 = 72,900.
    """
    result = est.estimate_density([4.0, 10.0], [1.0, 1.0], [1, 2], {1: 30.0, 2: 90.0})
    one, two = result.strata
    assert one.abund == 120.0 and two.abund == 900.0
    assert result.overall.abund_se ** 2 == pytest.approx(72_900.0, rel=REL)
    assert one.abund_se ** 2 == pytest.approx(36_450.0, rel=REL) and two.abund_se ** 2 == pytest.approx(36_450.0)
    assert result.overall.df == pytest.approx(1.0)  # one contrast (Satterthwaite 1946 of a single component)


def test_one_unit_stratum_leaves_its_partner_se_unchanged():
    """Stratum 1 (one unit, A = 10) with partner 2 (four units, A = 40), unit area 1.

    The partner's SE is what it has without the one-unit stratum (Cochran 1977, eq. 5.7). The one-unit
    stratum: the pairs quantity (D̂_1 − D̂_2)² has the expectation V(D̂_1) + V(D̂_2) + (D_1 − D_2)²
    (Cochran 1977, §5A.12), so by hand v(D̂_1) = (12 − 4.5)² − s_2²/4 = 56.25 − (5/3)/4 = 55.8333.
    """
    y2 = [3.0, 5.0, 6.0, 4.0]
    alone = est.estimate_density(y2, np.ones(4), [2] * 4, {2: 40.0}).strata[0]
    result = est.estimate_density([12.0] + y2, np.ones(5), [1, 2, 2, 2, 2], {1: 10.0, 2: 40.0})
    one, two = result.strata
    assert two.abund_se == pytest.approx(alone.abund_se, rel=REL) and two.df == alone.df == 3
    assert one.abund_se ** 2 == pytest.approx(10.0 ** 2 * (7.5 ** 2 - (5.0 / 3.0) / 4.0), rel=REL)
    assert result.overall.abund_se ** 2 == pytest.approx(one.abund_se ** 2 + two.abund_se ** 2, rel=REL)


def test_lognormal_interval_uses_t_with_the_satterthwaite_df():
    """Buckland et al. (2001), §3.6.1: C = exp(t_df · sqrt(ln(1 + cv²))), t from scipy.stats."""
    counts, areas, strata, frame = _hand_arrays()
    result = est.estimate_density(counts, areas, strata, frame, ci_method="lognormal")
    for row in result.table():
        c = math.exp(stats.t.ppf(0.975, row.df) * math.sqrt(math.log(1 + row.cv ** 2)))
        assert row.abund_lo == pytest.approx(row.abund / c, rel=REL)
        assert row.abund_hi == pytest.approx(row.abund * c, rel=REL)
    # z only for infinite df (Burnham et al. 1987): scipy's normal quantile
    lo, hi = est.lognormal_interval(100.0, 0.2, 0.95, df=float("inf"))
    c = math.exp(stats.norm.ppf(0.975) * math.sqrt(math.log(1.04)))
    assert (lo, hi) == (pytest.approx(100 / c, rel=REL), pytest.approx(100 * c, rel=REL))


def test_n_next_stays_within_the_units_a_stratum_holds():
    # stratum 1 holds 6 units of 1 (area 6): a CV of 5 % would need more there than exist; every one is taken
    rng = np.random.default_rng(4)
    y = np.concatenate([[0, 30, 2, 55], rng.poisson(3.0, 10)]).astype(float)
    strata = [1] * 4 + [2] * 10
    result = est.estimate_density(y, np.ones(14), strata, {1: 6.0, 2: 400.0}, target_cv=0.05)
    assert result.strata[0].n_next == 6  # truth by construction: 6 possible units
    assert result.strata[1].n_next > 10


def test_zero_counts_everywhere_give_the_poisson_upper_limit():
    result = est.estimate_density(np.zeros(6), np.ones(6), [1, 1, 1, 2, 2, 2], {1: 5, 2: 5},
                                  ci_method="lognormal")
    o = result.overall
    # Garwood (1936): after a count of 0 the one-sided 95 % limit of a Poisson mean is −ln(0.05) ≈ 3.0;
    # the frame of area 10 was surveyed over 6: N_U = −ln(α) · A / Σa
    assert o.abund == 0 and o.abund_lo == 0 and o.upper_only
    assert o.abund_hi == pytest.approx(-math.log(0.05) * 10 / 6, rel=REL)
    assert o.abund_hi == pytest.approx(stats.chi2.ppf(0.95, 2) / 2 * 10 / 6, rel=REL)  # the same via chi² (scipy)
    for row in result.strata:
        assert row.abund_hi == pytest.approx(-math.log(0.05) * 5 / 3, rel=REL) and row.upper_only
    assert all(hi == pytest.approx(o.abund_hi) for _, _, hi in result.overall_intervals)
    assert any("one-sided" in w for w in result.warnings)
    # with detection the limit is divided by p
    seen = est.estimate_density(np.zeros(6), np.ones(6), [1, 1, 1, 2, 2, 2], {1: 5, 2: 5}, detection_p=0.5)
    assert seen.overall.abund_hi == pytest.approx(2 * o.abund_hi, rel=REL)


def test_local_variance_of_four_units_is_the_published_double_sum():
    """Four units at the corners of a square: every neighbourhood holds all four, with weights 1/4 (both
    sums are 1 at once). Stevens & Olsen (2003): v = Σ_i Σ_j w_ij (z_j − z̄_i)² = Σ_j (z_j − z̄)², by hand
    3 s² with no factor of our own; its quadratic form Q = I − J/4 has (tr Q)² / tr Q² = 9 / 3 = 3 degrees of
    freedom (Box 1954), the n − 1 of the simple formula."""
    from plotwise.processing.engine.variance import local_neighbourhood_variance

    z = np.array([1.0, 4.0, 2.0, 7.0])
    result = local_neighbourhood_variance(z, np.array([[0, 0], [1, 0], [0, 1], [1, 1]], float))
    assert result.variance == pytest.approx(3 * np.var(z, ddof=1), rel=1e-12)
    assert result.df == pytest.approx(3.0, rel=1e-12)


def test_bootstrap_with_a_one_unit_stratum_has_the_analytic_variance():
    """A one-unit stratum between two large ones: the replicates' variance matches the analytic variance
    (40,000 replicates: within 4 %), and the replicates are centred on the estimate (3.5 Monte Carlo SE)."""
    rng = np.random.default_rng(8)
    y = np.concatenate([rng.poisson(4.0, 60), [12.0], rng.poisson(7.0, 60)]).astype(float)
    a = np.concatenate([rng.uniform(0.8, 1.2, 60), [1.0], rng.uniform(0.8, 1.2, 60)]) * 0.01  # km²
    strata = np.repeat([1, 2, 3], [60, 1, 60])
    frame = {1: 30.0, 2: 10.0, 3: 40.0}
    boot = est.estimate_density(y, a, strata, frame, ci_method="bootstrap", rng=make_rng(3).generator,
                                n_bootstrap=40_000)
    o = boot.overall
    assert boot.strata[1].collapsed_with == ("3",)
    assert np.var(boot.bootstrap_totals, ddof=1) == pytest.approx(o.abund_se ** 2, rel=0.04)
    assert boot.bootstrap_totals.mean() == pytest.approx(o.abund, abs=3.5 * o.abund_se / math.sqrt(40_000))


def test_detection_df_combines_by_satterthwaite():
    """Buckland et al. (2001), eq. 3.75: df = CV⁴ / (CV_n⁴ / df_n + CV_p⁴ / df_p), by hand from the parts."""
    counts, areas, strata, frame = _hand_arrays()
    plain = est.estimate_density(counts, areas, strata, frame).overall
    p, se, df_p = 0.6, 0.05, 25
    with_p = est.estimate_density(counts, areas, strata, frame, detection_p=p, detection_se=se,
                                  detection_df=df_p).overall
    cv_n, cv_p = plain.cv, se / p
    cv = math.sqrt(cv_n ** 2 + cv_p ** 2)
    assert with_p.cv == pytest.approx(cv, rel=REL)
    assert with_p.df == pytest.approx(cv ** 4 / (cv_n ** 4 / plain.df + cv_p ** 4 / df_p), rel=REL)
    assert with_p.abund_hi == pytest.approx(with_p.abund + stats.t.ppf(0.975, with_p.df) * with_p.abund_se, rel=REL)
    known = est.estimate_density(counts, areas, strata, frame, detection_p=p, detection_se=se).overall
    assert known.df == pytest.approx(cv ** 4 / (cv_n ** 4 / plain.df), rel=REL)  # df_p infinite
    vague = est.estimate_density(counts, areas, strata, frame, detection_p=0.3, detection_se=0.2)
    assert any("more than half of p" in w for w in vague.warnings)


def test_fpc_is_refused_where_the_units_may_overlap():
    counts, areas, strata, frame = _hand_arrays()
    designs = np.where(strata == "A", "random", "grid")
    result = est.estimate_density(counts, areas, strata, frame, fpc=True, designs=designs)
    with_fpc = est.estimate_density(counts, areas, strata, frame, fpc=True)
    without = est.estimate_density(counts, areas, strata, frame, fpc=False)
    assert result.fpc_refused == ("A",) and result.fpc_strata == ("B", "C") and not result.fpc_assumed
    assert result.strata[0].abund_se == pytest.approx(without.strata[0].abund_se, rel=REL)  # no correction in A
    assert result.strata[1].abund_se == pytest.approx(with_fpc.strata[1].abund_se, rel=REL)
    assert any("not applied in strata A" in w for w in result.warnings)
    assert with_fpc.fpc_assumed  # no record: the user's choice, an assumption the report states


def test_engine_skips_unused_reserves_and_warns_about_design_and_presence_hints():
    y = [1, 0, 0, 1, 1, 0, None, None]
    roles = ["primary"] * 6 + ["reserve", "primary"]
    incl = [0.01] * 3 + [0.02] + [0.01] * 4
    result = est.estimate_density(y, np.ones(8), [1, 1, 1, 1, 2, 2, 2, 2], {1: 50, 2: 50}, roles=roles,
                                  incl_p=incl, unit_ids=np.arange(8) + 1)
    assert result.unused_reserves == 1 and result.missing_ids == (8,)  # the primary without a count is missing
    assert any("Every count is 0 or 1" in w for w in result.warnings)
    assert any("inclusion probabilities (incl_p) differ" in w and "strata 1" in w for w in result.warnings)


def test_plus_sampling_expands_by_the_plus_area():
    # Gregoire & Valentine (2008), ch. 10: under plus sampling N̂ = A⁺ Σy / Σa, and the density is N̂ / A
    result = est.estimate_density([2.0, 4.0, 0.0], np.full(3, 0.5), [1, 1, 1], {1: 10.0}, expansion_areas={1: 12.0})
    row = result.strata[0]
    assert row.abund == pytest.approx(12.0 * 6.0 / 1.5, rel=REL) and row.dens == pytest.approx(row.abund / 10.0)
    assert row.expansion == 12.0
