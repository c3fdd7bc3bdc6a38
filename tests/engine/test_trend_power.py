"""Power to detect a trend, against outside references.

* Gerrodette (1987): with only year-to-year noise the trend test is the t test on the slope of a regression
  of the log yearly totals on year, whose power is a noncentral t probability (scipy.stats.nct):
  δ = |β| √S_tt / σ, ν = T − 2, with σ² the year-to-year variance plus the Poisson variance of the log total.
* The level of a test (truth by construction): with no change, the detection rate is α.
* Moments of a Poisson–log-normal count (truth by construction, simulated counts).
"""
import numpy as np
import pytest
from scipy import stats

from plotwise.processing.engine import panels as pe
from plotwise.processing.engine import trend_power as tp
from plotwise.processing.engine.errors import InputError


def planned(result):
    spec = result.spec
    return {r.change: r for r in result.rows if r.years == spec.plan.years and r.n_units == spec.n_units}


@pytest.mark.parametrize("years, sd_year, mean, change", [(10, 0.15, 20.0, -3.0), (8, 0.10, 10.0, -5.0),
                                                           (15, 0.25, 30.0, 2.0)])
def test_power_with_only_year_to_year_noise_equals_the_noncentral_t_power(years, sd_year, mean, change):
    """4,000 replicates (MC SE at most 0.008); the simulated power must lie within 3 MC SE of the formula.

    The Poisson GLM weights the years by their counts, so with a large total change over the programme (say
    +50%) it is a little less efficient than the unweighted regression of the formula (a 2% larger SD of the
    slope at +4% a year over 12 years, and about 0.04 less power there): the settings here change the counts by
    at most 35% over the programme."""
    n = 100
    plan = tp.plan_from_spec(pe.panel_spec_iv(pe.EVERY_YEAR, 1, 0.0, 2025, years))
    spec = tp.power_spec_iv(plan, n, (change,), mean, 0.0, 0.0, sd_year, 1.0, 0.05, True, 4000)
    row = planned(tp.trend_power(spec, np.random.default_rng(2)))[change]
    beta = np.log1p(change / 100)
    t = np.arange(years)
    s_tt = np.sum((t - t.mean()) ** 2)
    sigma2 = sd_year ** 2 + np.mean(1.0 / (n * mean * np.exp(beta * t)))  # year noise + Poisson (1 / total)
    delta = abs(beta) * np.sqrt(s_tt / sigma2)
    critical = stats.t.ppf(0.975, years - 2)
    power = stats.nct.sf(critical, years - 2, delta) + stats.nct.cdf(-critical, years - 2, delta)
    assert abs(row.power - power) < 3 * row.power_se, (row.power, power, row.power_se)


@pytest.mark.parametrize("design, two_sided", [(pe.SPLIT, True), (pe.ROTATING, False), (pe.EVERY_YEAR, True)])
def test_no_change_is_detected_at_the_level_of_the_test(design, two_sided):
    """Type I error: 3,000 replicates with all three variance components and no change; the detection rate must
    lie within 3 MC SE (0.004 at α = 0.05) of α, for a programme of 12 years and its shorter first years."""
    plan = tp.plan_from_spec(pe.panel_spec_iv(design, 3, 0.3, 2025, 12))
    spec = tp.power_spec_iv(plan, 60, (0.0,), 4.0, 0.8, 0.3, 0.15, 0.8, 0.05, two_sided, 3000)
    result = tp.trend_power(spec, np.random.default_rng(7))
    mc_se = np.sqrt(0.05 * 0.95 / 3000)
    for row in result.rows:
        if row.years >= 6:
            assert abs(row.power - 0.05) < 3 * mc_se + 0.002, row  # 0.002: the t approximation of quasi-likelihood


def test_grids_and_years_needed():
    plan = tp.plan_from_spec(pe.panel_spec_iv(pe.ROTATING, 3, 0.0, 2025, 12))
    spec = tp.power_spec_iv(plan, 40, (-8.0,), 8.0, 0.5, 0.2, 0.05, 1.0, 0.1, True, 400)
    result = tp.trend_power(spec, np.random.default_rng(3))
    # rotating panels of 3: after 4 years panels 2 and 3 have one visit each, no year-level degree of freedom
    assert result.year_grid[0] == 5 and result.year_grid[-1] == 12
    assert result.unit_grid == (10, 20, 40, 60, 80)
    needed = result.years_needed[-8.0]
    powers = {r.years: r.power for r in result.curve("years", -8.0)}
    assert needed is not None and powers[needed] >= 0.8
    assert all(powers[k] < 0.8 for k in powers if k < needed)


def test_plan_from_a_panels_layer_matches_the_design():
    spec = pe.panel_spec_iv(pe.SPLIT, 3, 0.25, 2030, 9)
    assignment = pe.assign_panels(list(range(40)), spec, draw_ord=np.arange(1, 41))
    plan = tp.plan_from_years([[int(y) for y in text.split(",")] for text in assignment.years_text])
    assert plan.start_year == 2030 and plan.years == 9
    assert sorted(map(tuple, plan.patterns.astype(int))) == sorted(
        map(tuple, np.array([spec.visited(p) for p in spec.panel_numbers]).astype(int)))
    assert plan.sizes(40).sum() == 40 and sorted(plan.sizes(40)) == sorted(pe.panel_sizes(40, spec))


def test_pilot_gives_the_between_unit_sd_of_a_poisson_lognormal_count():
    """Counts simulated with σ = 0.8 on the log scale and mean 5 (truth by construction), in two strata."""
    rng = np.random.default_rng(5)
    sigma, m = 0.8, 5.0
    counts = rng.poisson(m * np.exp(sigma * rng.standard_normal(40000) - sigma ** 2 / 2))
    halves = counts[:20000], counts[20000:]
    mean, sd_unit = tp.unit_sd_from_pilot([h.mean() for h in halves], [h.std(ddof=1) for h in halves],
                                          [len(h) for h in halves])
    assert mean == pytest.approx(m, rel=0.02)
    assert sd_unit == pytest.approx(sigma, abs=0.03)
    _, less = tp.unit_sd_from_pilot([counts.mean()], [counts.std(ddof=1)], [len(counts)], sd_unit_year=0.3)
    assert less == pytest.approx(np.sqrt(sd_unit ** 2 - 0.09), abs=0.01)


def test_inputs_are_checked():
    assert tp.parse_changes("-3, -5; 2.5 −1") == (-3.0, -5.0, 2.5, -1.0)
    with pytest.raises(InputError, match="CHANGES"):
        tp.parse_changes("minus three")
    with pytest.raises(InputError, match="above -100"):
        tp.parse_changes("-100")
    plan = tp.plan_from_spec(pe.panel_spec_iv(pe.SPLIT, 3, 0.3, 2025, 10))
    with pytest.raises(InputError, match="every panel needs a unit"):
        tp.power_spec_iv(plan, 3, (-3,), 5, 1, 0.3, 0.1, 1, 0.05, True, 100)
    with pytest.raises(InputError, match="never links"):
        tp.year_grid(tp.plan_from_spec(pe.panel_spec_iv(pe.ROTATING, 5, 0.0, 2025, 6)), 50)
