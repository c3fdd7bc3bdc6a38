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
