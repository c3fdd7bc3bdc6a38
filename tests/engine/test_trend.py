"""The trend over years, against outside references.

* statsmodels 0.13 (test-only reference): a Poisson GLM with one dummy per unit, the centred year and the
  log effort as offset gives β and, with ``scale="X2"`` (Pearson), the quasi-likelihood standard error; the GLM
  with unit and year dummies gives the year effects, their covariance (for the index intervals, delta method
  written out here) and the deviance drop between the two models.
* statsmodels' random-effects meta-analysis (``combine_effects``, method "dl") for the DerSimonian & Laird
  (1986) moment estimator, and statsmodels' WLS for the weighted regression whose scale is the residual mean
  square (Hartung & Knapp 2001).
* Truth by construction: simulated programmes with a known change, for interval coverage and bias.
"""
import numpy as np
import pytest
import statsmodels.api as sm
from scipy import stats
from statsmodels.stats.meta_analysis import combine_effects

from plotwise.processing.engine import panels as pe
from plotwise.processing.engine import trend as tr
from plotwise.processing.engine import trend_power as tp
from plotwise.processing.engine.errors import InputError


def split_panel_records(seed=5, n=40, years=8, with_zero_unit=True):
    """Invented counts: 10 core units every year, the rest in 3 rotating panels, effort 0.8-1.2."""
    rng = np.random.default_rng(seed)
    records = []
    for i in range(n):
        level = rng.normal(1.0, 0.8)
        for t in range(years):
            if i >= 10 and t % 3 != i % 3:
                continue
            mean = 0.0 if (with_zero_unit and i == 11) else np.exp(level - 0.04 * t + rng.normal(0, 0.3))
            records.append((f"u{i}", 2011 + t, int(rng.poisson(mean)), float(rng.uniform(0.8, 1.2))))
    return records


def glm_inputs(records, year_dummies=False):
    """Design matrix of the statsmodels reference: unit dummies (units with some count) and the centred year or
    year dummies (first year the reference)."""
    totals = {}
    for unit, _, count, _ in records:
        totals[unit] = totals.get(unit, 0) + count
    kept = [r for r in records if totals[r[0]] > 0]
    units = list(dict.fromkeys(r[0] for r in kept))
    years = sorted({r[1] for r in kept})
    dummies = np.array([[r[0] == u for u in units] for r in kept], dtype=float)
    if year_dummies:
        extra = np.array([[r[1] == y for y in years[1:]] for r in kept], dtype=float)
    else:
        extra = np.array([[r[1] - np.mean(years)] for r in kept])
    y = np.array([r[2] for r in kept], dtype=float)
    offset = np.log([r[3] for r in kept])
    return y, np.column_stack([dummies, extra]), offset, len(units), years


def engine_table(records):
    unit, year, count, effort = zip(*records)
    return tr.count_table_iv(list(unit), list(year), list(count), list(effort))


def test_trend_from_unit_counts_equals_a_poisson_glm_with_unit_effects():
    records = split_panel_records()
    result = tr.unit_count_trend(engine_table(records))
    y, X, offset, _, _ = glm_inputs(records)
    reference = sm.GLM(y, X, family=sm.families.Poisson(), offset=offset).fit(scale="X2", tol=1e-13)
    assert result.beta == pytest.approx(reference.params[-1], abs=1e-6)  # statsmodels GLM, Poisson, unit dummies
    assert result.details.se_unit == pytest.approx(reference.bse[-1], abs=1e-6)  # Pearson scale (scale="X2")
    assert result.details.unit_dispersion == pytest.approx(reference.scale, rel=1e-6)
    assert "u11" in result.details.zero_units  # counted nothing: left out, as from the reference
    assert result.details.n_used == 40 - len(result.details.zero_units)


def test_year_level_scale_is_the_deviance_drop_between_the_two_glms():
    records = split_panel_records(seed=8)
    result = tr.unit_count_trend(engine_table(records))
    y, X, offset, _, _ = glm_inputs(records)
    trend_model = sm.GLM(y, X, family=sm.families.Poisson(), offset=offset).fit(tol=1e-13)
    y, X2, offset, _, _ = glm_inputs(records, year_dummies=True)
    year_model = sm.GLM(y, X2, family=sm.families.Poisson(), offset=offset).fit(tol=1e-13)
    drop = trend_model.deviance - year_model.deviance
    df = trend_model.df_resid - year_model.df_resid
    assert result.details.lack_of_fit == pytest.approx(drop, rel=1e-6)  # statsmodels deviances
    assert result.details.lof_df == df == 6
    assert result.df == df
    # the year effects' information S: its inverse over the free years is the year-dummy covariance of the
    # unscaled GLM (statsmodels, scale 1)
    unit, year, count, effort = zip(*records)
    table = engine_table(records)
    fit = tr.fit_trend(table.counts[None], table.effort, table.x)
    schur = tr.year_information(fit.year_group_effect, fit.year_effect, table.effort, table.counts.sum(axis=1)[None])[0]
    n_units = X2.shape[1] - (len(table.years) - 1)
    assert np.allclose(np.linalg.inv(schur[1:, 1:]), year_model.cov_params()[n_units:, n_units:], rtol=1e-6)
    # the standard error used, written out from S (module notes): ΔD/d · max(L d / tr Q, 1 / I_β)
    x = table.x
    sx = schur @ x
    leverage, trace_q = (sx @ sx) / (x @ sx) ** 2, np.trace(schur) - (sx @ sx) / (x @ sx)
    information = 1.0 / trend_model.bse[-1] ** 2  # the unscaled GLM's information for β
    expected = np.sqrt(drop / df * max(leverage * df / trace_q, 1.0 / information))
    assert result.se == pytest.approx(expected, rel=1e-6)


def test_every_year_design_uses_the_quasi_likelihood_f_scaling():
    """Every unit every year: se = √(ΔD / d) × the unscaled GLM's SE (McCullagh & Nelder 1989, ch. 9)."""
    rng = np.random.default_rng(13)
    records = [(f"u{i}", 2001 + t, int(rng.poisson(np.exp(0.8 + 0.03 * t + rng.normal(0, 0.2)))), 1.0)
               for i in range(25) for t in range(9)]
    result = tr.unit_count_trend(engine_table(records))
    y, X, offset, _, _ = glm_inputs(records)
    trend_model = sm.GLM(y, X, family=sm.families.Poisson(), offset=offset).fit(tol=1e-13)
    y, X2, offset, _, _ = glm_inputs(records, year_dummies=True)
    year_model = sm.GLM(y, X2, family=sm.families.Poisson(), offset=offset).fit(tol=1e-13)
    drop, df = trend_model.deviance - year_model.deviance, 7
    assert result.df == df
    assert result.se == pytest.approx(np.sqrt(drop / df) * trend_model.bse[-1], rel=1e-6)


def test_yearly_index_and_intervals_equal_the_year_effect_glm_by_the_delta_method():
    records = split_panel_records(seed=9)
    result = tr.unit_count_trend(engine_table(records))
    y, X, offset, n_units, years = glm_inputs(records, year_dummies=True)
    fit = sm.GLM(y, X, family=sm.families.Poisson(), offset=offset).fit(scale="X2", tol=1e-13)
    alpha, gamma = fit.params[:n_units], np.r_[0.0, fit.params[n_units:]]
    mean_effort = np.mean([r[3] for r in records])
    z = stats.norm.ppf(0.975)
    for t, year in enumerate(years):
        # index = mean effort × Σ_i exp(α_i + γ_t) / (all 40 units, the one without animals included)
        terms = np.exp(alpha + gamma[t])
        index = mean_effort * terms.sum() / 40
        gradient = np.zeros(X.shape[1])
        gradient[:n_units] = terms / terms.sum()
        if t:
            gradient[n_units + t - 1] = 1.0
        se = np.sqrt(gradient @ fit.cov_params() @ gradient)  # delta method on the log index
        assert result.index[t] == pytest.approx(index, rel=1e-6)
        assert result.index_hi[t] == pytest.approx(index * np.exp(z * se), rel=1e-6)
        assert result.index_lo[t] == pytest.approx(index * np.exp(-z * se), rel=1e-6)


def test_moment_estimate_of_process_variance_equals_dersimonian_laird():
    rng = np.random.default_rng(3)
    y = rng.normal(0.0, 0.3, 12)
    v = rng.uniform(0.01, 0.08, 12)
    tau2, _ = tr.process_variance(np.ones((12, 1)), y, v)
    reference = combine_effects(y, v, method_re="dl")  # statsmodels: DerSimonian & Laird (1986)
    assert tau2 == pytest.approx(reference.tau2, rel=1e-9)


def test_trend_from_yearly_estimates_is_the_weighted_regression_with_process_variance():
    rng = np.random.default_rng(4)
    years = np.arange(2010, 2022)
    cv = rng.uniform(0.1, 0.3, len(years))
    estimates = 900 * 0.96 ** (years - 2010) * np.exp(rng.normal(0, 0.15, len(years)))
    result = tr.estimate_trend(tr.estimate_series_iv(years, estimates, estimates * cv))
    v = np.log1p(cv ** 2)
    X = sm.add_constant(years - years.mean())
    tau2 = result.details.tau2
    wls = sm.WLS(np.log(estimates), X, weights=1.0 / (v + tau2)).fit()  # scale: weighted RSS / (k − 2)
    assert result.beta == pytest.approx(wls.params[1], rel=1e-9)
    assert result.se == pytest.approx(wls.bse[1], rel=1e-9)
    lo, hi = wls.conf_int(0.05)[1]
    assert result.change_lo == pytest.approx(100 * np.expm1(lo), rel=1e-9)
    assert result.change_hi == pytest.approx(100 * np.expm1(hi), rel=1e-9)
    assert result.p_value == pytest.approx(wls.pvalues[1], rel=1e-9)


def simulate_totals(design, years, n_units, change, sd_unit, sd_unit_year, sd_year, mean, replicates, seed):
    """Panel x year totals of simulated programmes (the power engine's simulation, checked in test_trend_power)."""
    plan = tp.plan_from_spec(pe.panel_spec_iv(design, 3, 0.3, 2020, years))
    spec = tp.power_spec_iv(plan, n_units, (change,), mean, sd_unit, sd_unit_year, sd_year, 1.0, 0.05, True,
                            replicates)
    rng = np.random.default_rng(seed)
    latent = tp._latent_log_means(spec, n_units, rng, replicates)
    t = np.arange(years, dtype=float)
    counts = rng.poisson(np.exp(latent + np.log1p(change / 100) * t)).astype(float)
    effort, panel = tp._config_effort(plan, n_units, years)
    return tp.panel_totals(counts, panel, len(effort)) * effort[None], effort, t - t.mean(), (counts, panel)


@pytest.mark.parametrize("design", [pe.SPLIT, pe.ROTATING])
def test_interval_coverage_and_bias_on_simulated_programmes(design):
    """1,000 simulated programmes of 60 units over 10 years with a known decline of 4% per year, all three
    variance components present. 95% coverage must fall in 92-97% (binomial MC SE 0.7%) and the mean estimate
    of β must lie within 3 Monte Carlo SE of the truth."""
    totals, effort, x, units = simulate_totals(design, 10, 60, -4.0, 0.8, 0.3, 0.15, 3.0, 1000, seed=11 + design)
    fit = tr.fit_trend(totals, effort, x, units=units)
    truth = np.log(0.96)
    q = stats.t.ppf(0.975, fit.lof_df)
    covered = np.abs(fit.beta - truth) <= q * fit.se
    assert 0.92 <= covered.mean() <= 0.97, covered.mean()
    mc_se = fit.beta.std(ddof=1) / np.sqrt(len(fit.beta))
    assert abs(fit.beta.mean() - truth) < 3 * mc_se, (fit.beta.mean() - truth, mc_se)


def test_yearly_estimate_coverage_and_bias_on_simulated_series():
    """600 simulated series of 10 yearly estimates (CVs 10-35%, process SD 0.12 on the log scale, a decline of
    3% per year): coverage 92-97% (MC SE 0.9%), bias of β within 3 MC SE."""
    rng = np.random.default_rng(12)
    truth, hits, betas = np.log(0.97), 0, []
    for _ in range(600):
        years = np.arange(2010, 2020)
        cv = rng.uniform(0.1, 0.35, len(years))
        sd = np.sqrt(np.log1p(cv ** 2))
        log_n = np.log(500) + truth * (years - 2010) + rng.normal(0, 0.12, len(years))
        estimates = np.exp(log_n + rng.normal(0, sd) - sd ** 2 / 2)  # unbiased for N, log-normal error
        result = tr.estimate_trend(tr.estimate_series_iv(years, estimates, estimates * cv))
        hits += np.log1p(result.change_lo / 100) <= truth <= np.log1p(result.change_hi / 100)
        betas.append(result.beta)
    assert 0.92 <= hits / 600 <= 0.97, hits / 600
    assert abs(np.mean(betas) - truth) < 3 * np.std(betas, ddof=1) / np.sqrt(600)


def test_count_records_are_checked():
    with pytest.raises(InputError, match="counted twice") as caught:
        tr.count_table_iv(["a", "a", "b", "b"], [2020, 2020, 2021, 2022], [1, 2, 3, 4])
    assert "a 2020 (1, 2)" in caught.value.message
    with pytest.raises(InputError, match="negative or non-numeric") as caught:
        tr.count_table_iv(["a", "b", "c"], [2020, 2021, 2022], [1, -2, 3], record_ids=[10, 11, 12])
    assert caught.value.ids == [11]
    with pytest.raises(InputError, match="at least 3 different years"):
        tr.count_table_iv(["a", "b"], [2020, 2021], [1, 2])
    with pytest.raises(InputError, match="more than one stratum"):
        tr.count_table_iv(["a", "a", "a"], [2020, 2021, 2022], [1, 2, 3], strata=["x", "y", "x"])
    table = tr.count_table_iv(["a", "a", "a", "b", "b"], [2020, 2021, 2022, 2020, 2023], [1, None, 3, 4, 0])
    assert table.skipped == 1 and table.visited.sum() == 4  # a NULL count: not surveyed
    assert list(table.years) == [2020, 2022, 2023]
    with pytest.raises(InputError, match="estimate above 0"):
        tr.estimate_series_iv([2020, 2021, 2022], [10, 0, 12], [1, 1, 1])
    with pytest.raises(InputError, match="more than one estimate"):
        tr.estimate_series_iv([2020, 2020, 2021, 2022], [10, 11, 12, 13], [1, 1, 1, 1])


def test_each_bad_record_is_named_by_its_id():
    """Truth by construction: the records made bad are the ones the error names, and no other."""
    with pytest.raises(InputError, match="no unit id or no whole-number year") as caught:
        tr.count_table_iv(["a", None, "c", "d"], [2020, 2021, 2022.5, None], [1, 2, 3, 4], record_ids=[5, 6, 7, 8])
    assert caught.value.ids == [6, 7, 8]
    with pytest.raises(InputError, match="no unit area") as caught:
        tr.count_table_iv(["a", "b", "c"], [2020, 2021, 2022], [1, None, 3], [1.0, 0.0, -1.0], record_ids=[1, 2, 3])
    assert caught.value.ids == [3]  # record 2 was not surveyed (NULL count): its area is not needed
    with pytest.raises(InputError, match="no whole-number year") as caught:
        tr.estimate_series_iv([2020, 2021.5, None], [10, 11, 12], [1, 1, 1], record_ids=["x", "y", "z"])
    assert caught.value.ids == ["y", "z"]
    with pytest.raises(InputError, match="no standard error above 0") as caught:
        tr.estimate_series_iv([2020, 2021, 2022], [10, 11, 12], [1, None, -1])
    assert caught.value.ids == [2, 3]


def test_overall_rows_of_an_estimate_table():
    assert tr.overall_rows(["1", "2", "all", "1", "2", "all"]).tolist() == [False, False, True] * 2
    assert tr.overall_rows(["a", "a"]).all()


def test_panel_totals_give_the_same_fit_as_the_single_units():
    """Both log-linear models depend on the counts only through unit and year totals (sufficient statistics,
    McCullagh & Nelder 1989, ch. 6), so fitting panel x year totals (the power simulation's shortcut) must give
    what fitting every unit gives: β, its standard error and the scale between units."""
    plan = tp.plan_from_spec(pe.panel_spec_iv(pe.SPLIT, 3, 0.3, 2025, 10))
    effort, panel = tp._config_effort(plan, 40, 10)
    rng = np.random.default_rng(1)
    counts = rng.poisson(3 * np.exp(rng.normal(0, 1, (5, 40, 1))), (5, 40, 10)).astype(float)
    x = np.arange(10) - 4.5
    grouped = tr.fit_trend(tp.panel_totals(counts, panel, len(effort)) * effort[None], effort, x,
                           units=(counts, panel))
    single = tr.fit_trend(counts * effort[panel][None], effort[panel], x)
    for name in ("beta", "se", "dispersion", "lack_of_fit", "lof_df"):
        assert np.allclose(getattr(grouped, name), getattr(single, name), rtol=1e-9), name
