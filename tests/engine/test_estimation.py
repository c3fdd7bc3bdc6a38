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


def test_single_unit_stratum_collapses_with_closer_neighbour():
    counts = np.array([1.0, 2.0, 9.0, 8.0, 10.0, 11.0])
    strata = [1, 1, 2, 3, 3, 3]
    result = est.estimate_density(counts, np.ones(6), strata, {1: 10, 2: 10, 3: 10})
    assert result.strata[1].collapsed_with == ("3",)
    # the group shares one pooled residual variance with n_G - 1 df
    assert result.strata[1].df == 3 and result.strata[2].df == 3


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


def test_lognormal_interval_formula():
    """Buckland et al. (2001), eq. 3.71: C = exp(z sqrt(ln(1 + cv²)))."""
    counts, areas, strata, frame = _hand_arrays()
    result = est.estimate_density(counts, areas, strata, frame, ci_method="lognormal")
    row = result.overall
    c = math.exp(stats.norm.ppf(0.975) * math.sqrt(math.log(1 + row.cv ** 2)))
    assert row.abund_lo == pytest.approx(row.abund / c, rel=REL)
    assert row.abund_hi == pytest.approx(row.abund * c, rel=REL)


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
    assert s1.dens == pytest.approx(0.5) and s2.dens == pytest.approx(2 / 6)
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
    # Cochran (1977), eq. 5.26 with n_h = n M_h S_h / Σ M S (Neyman 1934)
    n = (m * s).sum() ** 2 / (0.1 * n_total) ** 2
    expected = np.maximum(np.ceil(n * m * s / (m * s).sum()), 2)
    assert [r.n_next for r in result.strata] == expected.astype(int).tolist()
    assert result.overall.n_next == int(expected.sum())
    # the planned sample meets the target (variance of the total, Cochran 1977, eq. 5.7)
    planned_cv = math.sqrt(np.sum(m ** 2 * s ** 2 / expected)) / n_total
    assert planned_cv <= 0.1


def test_zero_counts_everywhere():
    result = est.estimate_density(np.zeros(6), np.ones(6), [1, 1, 1, 2, 2, 2], {1: 5, 2: 5},
                                  ci_method="lognormal")
    assert result.overall.abund == 0 and result.overall.abund_hi == 0
    assert any("No animal" in w for w in result.warnings)


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
    assert local_neighbourhood_variance(np.full(144, 3.0), coords) == pytest.approx(0.0, abs=1e-20)
    trend = coords[:, 0] * 1.0
    assert local_neighbourhood_variance(trend, coords) < 0.1 * 144 * np.var(trend, ddof=1)


def test_single_unit_stratum_collapses_with_a_touching_stratum():
    from shapely.geometry import box

    from plotwise.processing.engine.variance import adjacent_strata

    # on the map: 1 is an island; 2 | 3 | 4 in a row
    geometries = [box(10e3, 10e3, 11e3, 11e3), box(0, 0, 1e3, 1e3), box(1e3, 0, 2e3, 1e3), box(2e3, 0, 3e3, 1e3)]
    assert adjacent_strata(geometries) == {0: [], 1: [2], 2: [1, 3], 3: [2]}
    counts = np.array([8.0, 8.0, 9.0, 30.0, 31.0, 32.0, 1.0, 2.0])
    strata = [1, 1, 2, 3, 3, 3, 4, 4]  # stratum 2 has one unit (9); 1 has density 8, 3 has 31
    frame = {1: 1.0, 2: 1.0, 3: 1.0, 4: 1.0}
    # id order: candidates 1 and 3, and 1 has the closer density
    assert est.estimate_density(counts, np.ones(8), strata, frame).strata[1].collapsed_with == ("1",)
    # map: 2 touches only 3 (and the island 1 not at all)
    on_map = est.estimate_density(counts, np.ones(8), strata, frame, neighbours={1: [], 2: [3], 3: [2, 4], 4: [3]})
    assert on_map.strata[1].collapsed_with == ("3",)
    # a one-unit stratum that touches nothing falls back to id order
    alone = est.estimate_density(counts, np.ones(8), strata, frame, neighbours={2: []})
    assert alone.strata[1].collapsed_with == ("1",)


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
    """Stratum 2 holds one unit and is collapsed with stratum 1 (Cochran 1977, §5A.12).

    By construction its replicates are its estimate plus the group's ratio residuals, which sum
    to 0: their mean is the stratum's own estimate, within Monte Carlo error (3.5 SE), and their
    variance is the pooled collapsed-strata variance the t interval uses,
    A_h² s_G² / (n_h a_h²) with s_G² = Σ (y − R_G a)² / (n_G − 1) (Cochran 1977, §5A.12 and
    eq. 6.13; numpy as the oracle).
    """
    y = np.array([3.0, 0.0, 5.0, 10.0])
    strata = [1, 1, 1, 2]
    frame = {1: 200.0, 2: 100.0}  # ha; unit area 1 ha
    b = 40_000
    result = est.estimate_density(y, np.ones(4), strata, frame, ci_method="bootstrap", rng=make_rng(5).generator,
                                  n_bootstrap=b)
    _, per_stratum = est.stratified_bootstrap(
        y, np.ones(4), np.array([0, 0, 0, 1]), 2, np.array([0, 0]), np.array([200.0, 100.0]), 1.0, 0.0,
        make_rng(5).generator, n_bootstrap=b)
    single = per_stratum[:, 1]
    assert result.strata[1].abund == 1000.0  # 10 animals in 1 ha of a 100 ha stratum
    s2_pooled = np.var(y, ddof=1)  # equal unit areas: the residuals about the pooled ratio are y − ȳ
    assert single.mean() == pytest.approx(1000.0, abs=3.5 * math.sqrt(100.0 ** 2 * s2_pooled / b))
    assert np.var(single, ddof=1) == pytest.approx(100.0 ** 2 * s2_pooled, rel=0.04)  # Cochran §5A.12
    assert result.strata[1].abund_se ** 2 == pytest.approx(100.0 ** 2 * s2_pooled, rel=1e-12)
    # the collapsed 3-unit stratum shares the pooled variance: A² s_G² / n (Cochran 1977, §5A.12)
    assert np.var(per_stratum[:, 0], ddof=1) == pytest.approx(200.0 ** 2 * s2_pooled / 3, rel=0.04)
    # the stratum's interval holds its estimate (it used to end exactly at it)
    assert result.strata[1].abund_lo < 1000.0 < result.strata[1].abund_hi


def test_bootstrap_with_collapsed_strata_agrees_with_the_t_interval():
    """A one-unit stratum between two large ones: many degrees of freedom, so the percentile interval
    is close to the t interval (Efron & Tibshirani 1993, ch. 13: both near estimate ± 1.96 SE), and the
    replicates' variance matches the analytic variance with collapsed strata (Cochran 1977, §5A.12)."""
    rng = np.random.default_rng(8)
    y = np.concatenate([rng.poisson(4.0, 60), [12.0], rng.poisson(7.0, 60)]).astype(float)
    a = np.concatenate([rng.uniform(0.8, 1.2, 60), [1.0], rng.uniform(0.8, 1.2, 60)]) * 0.01  # km²
    strata = np.repeat([1, 2, 3], [60, 1, 60])
    frame = {1: 30.0, 2: 10.0, 3: 40.0}
    boot = est.estimate_density(y, a, strata, frame, ci_method="bootstrap", rng=make_rng(3).generator,
                                n_bootstrap=40_000)
    t_run = est.estimate_density(y, a, strata, frame)
    o = boot.overall
    assert boot.strata[1].collapsed_with  # stratum 2 was collapsed with a neighbour
    assert np.var(boot.bootstrap_totals, ddof=1) == pytest.approx(o.abund_se ** 2, rel=0.04)
    assert boot.bootstrap_totals.mean() == pytest.approx(o.abund, abs=3.5 * o.abund_se / math.sqrt(40_000))
    # about 1 % apart here; replicates of the one-unit stratum centred on the pooled density instead of its
    # own estimate put both limits some 8 % below the t limits
    assert o.abund_lo == pytest.approx(t_run.overall.abund_lo, rel=0.03)
    assert o.abund_hi == pytest.approx(t_run.overall.abund_hi, rel=0.03)


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
