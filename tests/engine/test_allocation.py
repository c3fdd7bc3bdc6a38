"""Allocation of effort across strata, checked against outside references.

References: Neyman (1934); Cochran, W. G. (1977) Sampling Techniques, 3rd ed.,
ch. 5; Lohr, S. L. (1999) Sampling: Design and Analysis; an exhaustive search over
the Lagrange conditions with capped strata as the bounded reference; simulated populations with known S_h.
"""
import itertools

import numpy as np
import pytest

from plotwise.processing.engine import allocation as al
from plotwise.processing.engine.errors import InputError

AREAS = np.array([120.0, 340.0, 75.0, 260.0])
SDS = np.array([3.0, 1.2, 6.5, 2.0])
MEANS = np.array([4.0, 1.5, 9.0, 2.5])
COSTS = np.array([1.5, 0.5, 3.0, 1.0])
UNIT = 0.25  # so N_h = A_h / a = 480, 1360, 300, 1040


def _stratified_variance(n, areas=AREAS, sds=SDS, unit=UNIT):
    """Sum W_h^2 S_h^2 (1 - f_h) / n_h  (Cochran 1977, ch. 5)."""
    w = areas / areas.sum()
    big_n = areas / unit
    return np.sum(w**2 * sds**2 * (1 - n / big_n) / n)


def _active_set_minimiser(constraint_costs, amount, lower=None, upper=None, sds=SDS):
    """Minimise the stratified variance under sum c_h n_h = amount and lower <= n <= upper.

    Exhaustive reference: the objective sum k_h (1 - n_h/N_h) / n_h is convex, so its
    minimiser is the one feasible point of the Lagrange conditions. Every stratum is
    either on its lower bound, on its upper bound, or free; the free ones take the
    closed form n_h = lambda sqrt(k_h / c_h) (Cochran 1977, §5.5) with lambda set by the
    budget. All 3^H assignments are tried and the feasible one with the least variance
    is returned; the test fails if none is feasible (the reference cannot fail silently).
    """
    w = AREAS / AREAS.sum()
    k = w**2 * sds**2
    c = np.asarray(constraint_costs, dtype=float)
    lo = np.zeros(AREAS.size) if lower is None else np.asarray(lower, dtype=float)
    hi = np.full(AREAS.size, np.inf) if upper is None else np.asarray(upper, dtype=float)
    best, best_value = None, np.inf
    for states in itertools.product((0, 1, 2), repeat=AREAS.size):  # 0 lower, 1 upper, 2 free
        states = np.array(states)
        if np.any((states == 1) & ~np.isfinite(hi)) or np.any((states == 0) & (lo <= 0)):
            continue
        free = states == 2
        if not free.any():
            continue
        n = np.where(states == 0, lo, hi).astype(float)
        rest = amount - np.sum(c[~free] * n[~free])
        shape = np.sqrt(k[free] / c[free])
        lam = rest / np.sum(c[free] * shape)
        if lam <= 0:
            continue
        n[free] = lam * shape
        if np.any(n < lo - 1e-9) or np.any(n > hi + 1e-9):
            continue
        value = np.sum(k / n)
        if value < best_value:
            best, best_value = n, value
    assert best is not None, "no assignment of bounds satisfies the Lagrange conditions"
    np.testing.assert_allclose(c @ best, amount, rtol=1e-12)
    return best


def test_neyman_equals_lagrange_minimiser():
    # the Lagrange minimiser of sum W^2 S^2 (1-f)/n under sum n = 80 (Cochran 1977, §5.5)
    expected = _active_set_minimiser(np.ones(4), 80.0)
    got = al.neyman_allocation(80, AREAS, SDS)
    np.testing.assert_allclose(got, expected, rtol=1e-6)


def test_cost_optimal_equals_lagrange_minimiser_under_budget():
    # the Lagrange minimiser under the budget C - c0 = sum c_h n_h (Cochran 1977, ch. 5)
    budget, fixed = 150.0, 30.0
    expected = _active_set_minimiser(COSTS, budget - fixed)
    total = al.cost_optimal_total(budget, AREAS, SDS, COSTS, fixed)
    got = al.cost_optimal_allocation(total, AREAS, SDS, COSTS)
    np.testing.assert_allclose(got, expected, rtol=1e-6)
    np.testing.assert_allclose(COSTS @ got + fixed, budget, rtol=1e-12)


def test_bounded_neyman_equals_lagrange_with_bounds():
    # the minimiser with box constraints 2 <= n_h <= N_h: a small stratum hits its cap and
    # low-SD strata sit on the minimum; the excess is shared among the rest
    areas = AREAS
    upper = np.array([30.0, 400.0, 12.0, 300.0])
    lower = np.full(4, 2.0)
    q = al.allocation_scores("neyman", areas, SDS)
    got = al.bounded_allocation(q, 60.0, lower, upper)
    expected = _active_set_minimiser(np.ones(4), 60.0, lower, upper)
    np.testing.assert_allclose(got, expected, rtol=1e-6)
    assert got[2] == pytest.approx(12.0)  # the capped stratum
    # a stratum with a small SD sits on the minimum of 2
    sds = np.array([3.0, 0.05, 6.5, 2.0])
    got = al.bounded_allocation(al.allocation_scores("neyman", areas, sds), 30.0, lower, upper)
    np.testing.assert_allclose(got, _active_set_minimiser(np.ones(4), 30.0, lower, upper, sds), rtol=1e-6)
    assert got[1] == pytest.approx(2.0)


def test_bounded_cost_equals_lagrange_with_bounds():
    upper = np.array([25.0, 400.0, 10.0, 300.0])
    lower = np.full(4, 2.0)
    q = al.allocation_scores("optimal_cost", AREAS, SDS, COSTS)
    got = al.bounded_allocation(q, 90.0, lower, upper, COSTS)
    expected = _active_set_minimiser(COSTS, 90.0, lower, upper)
    np.testing.assert_allclose(got, expected, rtol=1e-6)


def test_lohr_proportional_worked_example():
    # Lohr (1999), Sampling: Design and Analysis, stratified sample of the 1992
    # Census of Agriculture by region: N_h = 1054 (NC), 220 (NE), 1382 (S), 422 (W),
    # n = 300 by proportional allocation gives 103, 21, 135, 41.  # from memory
    counties = np.array([1054.0, 220.0, 1382.0, 422.0])
    result = al.allocate(counties, 1.0, "proportional", total=300, min_per_stratum=2)
    np.testing.assert_array_equal(result.n, [103, 21, 135, 41])


def test_cochran_sample_size_for_a_variance_with_fpc():
    # Cochran (1977), ch. 5: with Neyman allocation the total needed for a variance V is
    # n = (sum W_h S_h)^2 / (V + sum W_h S_h^2 / N)
    w = AREAS / AREAS.sum()
    big_n = AREAS.sum() / UNIT
    ybar = np.sum(w * MEANS)
    for target in (0.05, 0.08, 0.15):
        v = (target * ybar) ** 2
        n_cochran = np.sum(w * SDS) ** 2 / (v + np.sum(w * SDS**2) / big_n)
        result = al.allocate(AREAS, UNIT, "neyman", target_cv=target, sds=SDS, means=MEANS)
        assert result.precision.cv <= target
        # whole units cost a little precision, never less than the continuous answer
        assert np.ceil(n_cochran) <= result.total <= np.ceil(n_cochran) + 2
        # the smallest such total: one fewer misses the target
        smaller = al.allocate(AREAS, UNIT, "neyman", total=result.total - 1, sds=SDS, means=MEANS)
        assert smaller.precision.cv > target


@pytest.mark.parametrize("method", al.METHODS)
@pytest.mark.parametrize("total", [8, 9, 37, 250, 3180])
def test_totals_exact_and_bounds_hold(method, total):
    result = al.allocate(AREAS, UNIT, method, total=total, sds=SDS, means=MEANS, costs=COSTS, min_per_stratum=2)
    assert result.n.sum() == total  # the requested total, exactly
    assert np.all(result.n >= 2)  # MIN_PER_STRATUM  # common practice
    assert np.all(result.n <= np.floor(AREAS / UNIT))  # units that fit
    assert np.all(np.abs(result.n - result.n_continuous) < 1.0 + 1e-9)  # rounding moves less than one unit


def test_caps_reallocate_excess_until_stable():
    # N_h = 10, 20, 400, 400: Neyman would give the first two far more than fits
    areas = np.array([10.0, 20.0, 400.0, 400.0])
    sds = np.array([50.0, 40.0, 1.0, 2.0])
    result = al.allocate(areas, 1.0, "neyman", total=100, sds=sds)
    assert result.n[0] == 10 and result.n[1] == 20  # both capped
    # the remaining 70 shared 1 : 2 as W_h S_h (Neyman 1934)
    np.testing.assert_allclose(result.n_continuous[2:], [70 / 3, 140 / 3], rtol=1e-12)
    assert result.n.sum() == 100
    assert any("sampled completely" in w for w in result.warnings)


def test_budget_rounding_stays_within_budget():
    result = al.allocate(AREAS, UNIT, "optimal_cost", budget=137.0, fixed_cost=12.0, sds=SDS, costs=COSTS)
    assert result.cost <= 137.0 + 1e-9
    assert np.all(result.n >= 2)
    # no stratum left at its whole part could take one more unit: each costs more than the budget left over
    # (truth by construction of the rounding: whole parts, then one more where it still fits)
    left = 137.0 - result.cost
    at_floor = (result.n == np.floor(result.n_continuous + 1e-9)) & (result.n < result.upper)
    assert at_floor.any() and np.all(COSTS[at_floor] > left)
    assert np.all(result.n - result.n_continuous < 1.0 + 1e-9)


def test_expected_cv_matches_monte_carlo():
    # truth by construction: a synthetic population with known S_h, stratified
    # simple random sampling without replacement, simulated 20,000 times
    rng = np.random.Generator(np.random.PCG64(20261201))
    sizes = np.array([300, 180, 120])
    population = [
        rng.negative_binomial(2, 2 / (2 + mu), size=size).astype(float)
        for size, mu in zip(sizes, (1.0, 4.0, 12.0))
    ]
    sds = np.array([p.std(ddof=1) for p in population])  # S_h with the N_h - 1 divisor (Cochran 1977, ch. 5)
    means = np.array([p.mean() for p in population])
    areas = sizes * 0.04  # units of 0.04 area: N_h = sizes exactly
    result = al.allocate(areas, 0.04, "neyman", total=45, sds=sds, means=means)
    weights = areas / areas.sum()
    reps = 20000
    estimate = np.zeros(reps)
    for values, n_h, w_h in zip(population, result.n, weights):
        draws = np.argsort(rng.random((reps, values.size)), axis=1)[:, :n_h]
        estimate += w_h * values[draws].mean(axis=1)
    true_mean = np.sum(weights * means)
    mc_cv = estimate.std(ddof=1) / true_mean
    assert abs(estimate.mean() / true_mean - 1) < 0.01  # unbiased
    assert mc_cv == pytest.approx(result.precision.cv, rel=0.05)
    # the per-stratum CV too
    for values, n_h, cv_h in zip(population, result.n, result.precision.stratum_cv):
        draws = np.argsort(rng.random((reps, values.size)), axis=1)[:, :n_h]
        mc = values[draws].mean(axis=1)
        assert mc.std(ddof=1) / values.mean() == pytest.approx(cv_h, rel=0.05)


def test_comparison_neyman_never_worse():
    # Neyman minimises the variance for a fixed total (Neyman 1934)
    result = al.allocate(AREAS, UNIT, "neyman", total=60, sds=SDS, means=MEANS)
    rows = {row.method: row for row in result.comparison}
    assert set(rows) == {"equal", "proportional", "neyman"}
    assert all(row.n.sum() == 60 for row in rows.values())
    assert rows["neyman"].relative_variance == pytest.approx(1.0)
    assert rows["proportional"].relative_variance >= 1.0
    assert rows["equal"].relative_variance >= 1.0
    np.testing.assert_allclose(rows["neyman"].precision.variance_mean, _stratified_variance(result.n))


def test_se_density_scales_with_unit_area():
    result = al.allocate(AREAS, UNIT, "neyman", total=60, sds=SDS, means=MEANS)
    p = result.precision
    assert p.se_density == pytest.approx(np.sqrt(_stratified_variance(result.n)) / UNIT)
    assert p.cv == pytest.approx(p.se_mean / np.sum(AREAS / AREAS.sum() * MEANS))


# ----------------------------------------------------------------------------- bad input
@pytest.mark.parametrize("bad", [None, np.nan, -3.0, 0.0, "n/a"])
def test_bad_area_names_the_features(bad):
    areas = [10.0, bad, 30.0]
    with pytest.raises(InputError) as err:
        al.allocate(areas, 1.0, "proportional", total=10, ids=[11, 12, 13])
    assert err.value.ids == [12]
    assert "12" in err.value.message


@pytest.mark.parametrize("bad", [None, -1.0])
def test_bad_sd_names_the_features(bad):
    with pytest.raises(InputError) as err:
        al.allocate([10.0, 20.0, 30.0], 1.0, "neyman", total=10, sds=[1.0, 2.0, bad], ids=["a", "b", "c"],
                    names={"sd": "field 'sd'"})
    assert err.value.ids == ["c"] and "field 'sd'" in err.value.message


@pytest.mark.parametrize("bad", [None, -1.0, 0.0])
def test_bad_cost_names_the_features(bad):
    with pytest.raises(InputError) as err:
        al.allocate([10.0, 20.0], 1.0, "optimal_cost", total=10, sds=[1.0, 2.0], costs=[bad, 2.0], ids=[5, 6])
    assert err.value.ids == [5]


def test_all_sd_zero_falls_back_to_proportional():
    result = al.allocate([10.0, 30.0], 1.0, "neyman", total=8, sds=[0.0, 0.0])
    assert result.method_used == "proportional"
    np.testing.assert_array_equal(result.n, [2, 6])
    assert any("proportional" in w for w in result.warnings)


def test_no_sd_falls_back_to_proportional_with_warning():
    result = al.allocate([10.0, 30.0], 1.0, "neyman", total=8)
    assert result.method_used == "proportional" and result.warnings


def test_unreachable_target_cv_gives_best_cv():
    with pytest.raises(InputError) as err:
        al.allocate([2.5, 3.5], 1.0, "neyman", target_cv=1e-6, sds=[2.0, 3.0], means=[1.0, 1.0])
    assert "cannot be reached" in err.value.message and "expected CV of" in err.value.message


def test_budget_too_small_gives_minimum_budget():
    # minimum = c0 + MIN_PER_STRATUM * sum c_h = 10 + 2 * (1 + 3) = 18
    with pytest.raises(InputError) as err:
        al.allocate([10.0, 20.0], 1.0, "optimal_cost", budget=17.0, fixed_cost=10.0, sds=[1.0, 1.0],
                    costs=[1.0, 3.0])
    assert "minimum of 18" in err.value.message


def test_total_out_of_range():
    with pytest.raises(InputError):
        al.allocate([10.0, 20.0], 1.0, "equal", total=3)  # below 2 per stratum
    with pytest.raises(InputError):
        al.allocate([10.0, 20.0], 1.0, "equal", total=31)  # more than fits


def test_some_sd_zero_gets_the_minimum_with_warning():
    # a pilot stratum where every unit counted 0 has S_h = 0: Neyman (1934) gives it
    # nothing, the bound keeps MIN_PER_STRATUM  # common practice
    result = al.allocate([50.0, 50.0, 100.0], 1.0, "neyman", total=30, sds=[0.0, 1.0, 2.0], ids=[7, 8, 9])
    assert result.n[0] == 2 and result.n.sum() == 30
    np.testing.assert_allclose(result.n_continuous[1:], [28 / 5, 4 * 28 / 5])  # W_h S_h = 0.25 : 1
    assert any("zero" in w and "7" in w for w in result.warnings)


# ----------------------------------------------------------------------------- stratum ids
def test_unique_stratum_ids_pass():
    # truth by construction: one feature per stratum, every id filled in
    assert al.check_stratum_ids([1, 2, "3"], [10, 11, 12], "strata", "stratum") is None


@pytest.mark.parametrize("null", [None, float("nan")])
def test_null_stratum_id_names_layer_field_and_features(null):
    # truth by construction: features 11 and 14 have no id
    with pytest.raises(InputError) as err:
        al.check_stratum_ids([1, null, 2, 3, null], [10, 11, 12, 13, 14], "my strata", "zone")
    assert err.value.ids == [11, 14]
    text = err.value.message
    assert "'zone'" in text and "'my strata'" in text and "11, 14" in text and "NULL" in text
    assert "Give every stratum an id" in text


def test_duplicate_stratum_id_names_value_features_and_dissolve():
    # truth by construction: id 1 is carried by features 10 and 12
    with pytest.raises(InputError) as err:
        al.check_stratum_ids([1, 2, 1.0], [10, 11, 12], "strata", "stratum")
    assert err.value.ids == [10, 12]
    text = err.value.message
    assert "Features 10, 12" in text and "stratum id 1 " in text and "'stratum'" in text and "'strata'" in text
    assert "Dissolve" in text


def test_several_duplicate_stratum_ids_are_all_counted():
    # truth by construction: 'a' on features 1 and 3, 'b' on features 2 and 4
    with pytest.raises(InputError) as err:
        al.check_stratum_ids(["a", "b", "a", "b", "c"], [1, 2, 3, 4, 5], "strata", "name")
    assert err.value.ids == [1, 3, 2, 4]
    assert "'a' (features 1, 3)" in err.value.message and "1 other id(s) ('b')" in err.value.message


def test_fpc_follows_the_layout_design():
    # Cochran (1977), §5.3: V = Σ W_h² S_h² (1 − f_h) / n_h with f_h = n_h a / A_h for units that tile the
    # strata; units whose centres are drawn independently may overlap and have no correction (Cordy 1993)
    areas, unit = np.array([2.0, 3.0]), 0.1  # N_h = 20 and 30 units: sampling fractions of a third and more
    kwargs = dict(total=20, sds=[2.0, 3.0], means=[4.0, 5.0])
    grid = al.allocate(areas, unit, "neyman", layout_design="grid", **kwargs)
    srs = al.allocate(areas, unit, "neyman", layout_design="random", **kwargs)
    assert grid.fpc and not srs.fpc
    w, n = areas / areas.sum(), grid.n
    by_hand = np.sum(w ** 2 * np.array([4.0, 9.0]) * (1 - n * unit / areas) / n)
    assert grid.precision.variance_mean == pytest.approx(by_hand, rel=1e-12)
    assert srs.precision.variance_mean == pytest.approx(np.sum(w ** 2 * np.array([4.0, 9.0]) / srs.n), rel=1e-12)
    assert al.allocate(areas, unit, "neyman", layout_design="random_sep", **kwargs).fpc
