"""Density from detection distances, checked against hand-worked formulas, reference libraries and simulation.

Sources: Buckland, S. T. et al. (2001) Introduction to Distance Sampling, Oxford University Press,
ch. 3 (D = n E(s) / (2wL P_a) and n E(s) / (kπw² P_a); delta method; Satterthwaite df, eq. 3.75;
log-normal interval with t, §3.6.1; size-bias regression, §3.5.4; equation and section numbers from
memory). Fewster, R. M. et al. (2009) Estimating the encounter rate variance in distance sampling,
Biometrics 65:225–236 (estimator R2). statsmodels (test-only) for the regression.
"""
import math

import numpy as np
import pytest
from scipy import optimize, stats

from plotwise.processing.engine import detection_functions as df
from plotwise.processing.engine import distance_density as dd
from plotwise.processing.engine.errors import InputError


# --------------------------------------------------------------------------- simulation helpers


def half_normal(x, sigma, shape=None):
    return np.exp(-0.5 * (x / sigma) ** 2)


def hazard_rate(x, sigma, shape):
    return -np.expm1(-(x / sigma) ** (-shape))


def simulate_surveys(rng, replicates, units, survey, density_m2, width, g, sigma, shape=None, length=1000.0):
    """Animals Poisson over each strip (2·W·L) or disc (πW²), uniform within it, each seen with
    probability g(distance): the truth is ``density_m2`` by construction. All surveys in one array draw.

    Returns the flat unit index (replicate · units + unit) and the distance of every detection.
    """
    area = 2.0 * width * length if survey == df.LINE else np.pi * width ** 2
    present = rng.poisson(density_m2 * area, size=(replicates, units))
    u = rng.random(present.sum())
    x = width * u if survey == df.LINE else width * np.sqrt(u)  # radial distance of a uniform point in a disc
    seen = rng.random(x.size) < g(x, sigma, shape)
    unit = np.repeat(np.arange(replicates * units), present.ravel())[seen]
    return unit, x[seen]


def split_by_survey(unit, x, replicates, units):
    order = np.argsort(unit, kind="stable")
    unit, x = unit[order], x[order]
    bounds = np.searchsorted(unit, np.arange(replicates + 1) * units)
    return [(unit[a:b] - r * units, x[a:b]) for r, (a, b) in enumerate(zip(bounds[:-1], bounds[1:]))]


# --------------------------------------------------------------------------- components


def test_encounter_rate_variance_r2_on_a_hand_worked_example():
    # Fewster et al. (2009), estimator R2: var(n/L) = K / (L²(K−1)) Σ l_k² (n_k/l_k − n/L)²
    # Four transects of 1, 2, 3 and 4 km with 2, 3, 9 and 6 detections, worked by hand:
    #   L = 10 km, n = 20, n/L = 2 per km; n_k/l_k = 2, 1.5, 3, 1.5; deviations 0, −0.5, 1, −0.5
    #   l_k² · deviation² = 0, 4·0.25 = 1, 9·1 = 9, 16·0.25 = 4; sum 14
    #   K / (L²(K−1)) = 4 / (100·3) = 1/75;  var = 14/75 = 0.18667 (per km)²
    assert dd.encounter_rate_variance([2, 3, 9, 6], [1.0, 2.0, 3.0, 4.0]) == pytest.approx(14 / 75, rel=1e-12)
    # with equal lengths R2 is the classical K/(K−1) Σ (n_k − n/K)² / L² (Buckland et al. 2001, ch. 3)
    n_k = np.array([4, 0, 7, 3, 5])
    classical = 5 / 4 * np.sum((n_k - n_k.mean()) ** 2) / 10.0 ** 2
    assert dd.encounter_rate_variance(n_k, [2.0] * 5) == pytest.approx(classical, rel=1e-12)


def test_satterthwaite_df_and_log_normal_interval_by_hand():
    # Buckland et al. (2001), eq. 3.75: df = CV⁴(D) / Σ CV⁴_i / df_i, with CV²(D) = Σ CV²_i
    parts = [("encounter rate", 0.2 ** 2, 9), ("detection", 0.1 ** 2, 98), ("group size", 0.05 ** 2, 99)]
    cv, dof = dd._combine(parts)
    assert cv == pytest.approx(math.sqrt(0.04 + 0.01 + 0.0025))
    assert dof == pytest.approx(0.0525 ** 2 / (0.04 ** 2 / 9 + 0.01 ** 2 / 98 + 0.0025 ** 2 / 99))
    # §3.6.1: [N/C, N·C] with C = exp(t_df √ln(1 + CV²)), t from scipy.stats.t
    c = math.exp(stats.t.ppf(0.975, 20) * math.sqrt(math.log(1 + 0.2 ** 2)))
    lo, hi = dd.lognormal_interval_t(1000.0, 0.2, 20, 0.95)
    assert lo == pytest.approx(1000.0 / c) and hi == pytest.approx(1000.0 * c)
    lo, hi = dd.lognormal_interval_t(1000.0, 0.2, np.inf, 0.90)  # infinite df: the normal quantile
    assert hi == pytest.approx(1000.0 * math.exp(stats.norm.ppf(0.95) * math.sqrt(math.log(1.04))))


def test_strip_transect_formula_with_the_uniform_key():
    # with the uniform key alone P_a = 1: D = n / (2wL) for lines, n / (kπw²) for points (Buckland et al.
    # 2001, ch. 3), and the only variance is the encounter rate's (R2, df K − 1)
    ids, lengths = [1, 2, 3, 4, 5], np.array([800.0, 1200.0, 1000.0, 1500.0, 500.0])
    counts = [5, 9, 4, 12, 3]
    obs = np.repeat(ids, counts)
    x = np.random.default_rng(1).uniform(0, 40.0, obs.size)
    result = dd.estimate_distance_density(ids, [1] * 5, lengths, {"1": 20.0}, obs, x, truncation=40.0,
                                          keys=(df.UNIFORM,), max_adjustments=0)
    n, length = sum(counts), lengths.sum()
    density = n / (2 * 40.0 * length) * 1e6  # per km²
    row = result.overall
    assert row.dens == pytest.approx(density) and row.abund == pytest.approx(density * 20.0)
    cv = math.sqrt(dd.encounter_rate_variance(counts, lengths)) / (n / length)
    assert row.cv == pytest.approx(cv) and row.df == pytest.approx(4)
    c = math.exp(stats.t.ppf(0.975, 4) * math.sqrt(math.log(1 + cv ** 2)))
    assert row.abund_lo == pytest.approx(density * 20.0 / c) and row.abund_hi == pytest.approx(density * 20.0 * c)
    assert row.p_det == 1.0 and row.esw == pytest.approx(40.0)
    # points visited twice count twice: D = n / (kπw²), k the visits (per ha here)
    visits = np.array([2, 1, 1, 2, 1])
    points = dd.estimate_distance_density(ids, [1] * 5, visits, {"1": 20.0}, obs, x, survey=df.POINT,
                                          truncation=40.0, keys=(df.UNIFORM,), max_adjustments=0, m2_per_unit=1e4)
    assert points.overall.dens == pytest.approx(n / (visits.sum() * np.pi * 40.0 ** 2) * 1e4)
    assert points.overall.effort == 7 and result.overall.effort == pytest.approx(length / 1000.0)


def test_stratified_half_normal_estimate_by_hand():
    """Every number of a two-stratum line survey recomputed from the book's formulas.

    σ̂ by a direct maximisation of the truncated normal likelihood (scipy.stats.truncnorm), var(σ̂)
    from its observed information, P_a = σ√(2π)(Φ(w/σ) − ½)/w, E(s) the mean size with var s²/n,
    the encounter rate variance by R2, D_h = n_h E(s)/(2wL_h P_a), CV² by the delta method,
    df by eq. 3.75 and the log-normal t interval (Buckland et al. 2001, ch. 3).
    """
    rng = np.random.default_rng(21)
    w = 50.0
    units = np.arange(1, 13)
    strata = np.array([1] * 6 + [2] * 6)
    lengths = rng.uniform(800.0, 2500.0, 12)
    counts = rng.poisson(12, 12)
    obs = np.repeat(units, counts)
    x = np.abs(rng.normal(0, 30.0, 5 * obs.size))
    x = x[x <= w][:obs.size]
    sizes = rng.integers(1, 5, obs.size).astype(float)
    areas = {"1": 40.0, "2": 25.0}
    result = dd.estimate_distance_density(units, strata, lengths, areas, obs, x, sizes, truncation=w,
                                          keys=(df.HALF_NORMAL,), max_adjustments=0, size_method=dd.SIZE_MEAN)

    def loglik(sigma):
        return np.sum(stats.truncnorm.logpdf(x, 0.0, w / sigma, scale=sigma))

    sigma = optimize.minimize_scalar(lambda s: -loglik(s), bounds=(1, 500), method="bounded",
                                     options={"xatol": 1e-10}).x
    h = 1e-3 * sigma
    info = -(loglik(sigma + h) - 2 * loglik(sigma) + loglik(sigma - h)) / h ** 2

    def p_a(s):
        return s * math.sqrt(2 * math.pi) * (stats.norm.cdf(w / s) - 0.5) / w

    p = p_a(sigma)
    cv2_p = ((p_a(sigma + h) - p_a(sigma - h)) / (2 * h)) ** 2 / info / p ** 2
    mean_size = sizes.mean()
    cv2_s = sizes.var(ddof=1) / sizes.size / mean_size ** 2
    total, er_terms, numerator = 0.0, [], 0.0
    for h_label, row in zip(("1", "2"), result.strata):
        inside = strata == int(h_label)
        n_h, l_h = counts[inside].sum(), lengths[inside].sum()
        k = inside.sum()
        er = n_h / l_h
        var_er = k / (l_h ** 2 * (k - 1)) * np.sum(lengths[inside] ** 2 * (counts[inside] / lengths[inside] - er) ** 2)
        dens = n_h * mean_size / (2 * w * l_h * p) * 1e6
        cv2 = var_er / er ** 2 + cv2_p + cv2_s
        dof = cv2 ** 2 / ((var_er / er ** 2) ** 2 / (k - 1) + cv2_p ** 2 / (x.size - 1) + cv2_s ** 2 / (x.size - 1))
        c = math.exp(stats.t.ppf(0.975, dof) * math.sqrt(math.log(1 + cv2)))
        assert row.dens == pytest.approx(dens, rel=1e-6)
        assert row.cv == pytest.approx(math.sqrt(cv2), rel=1e-3)
        assert row.df == pytest.approx(dof, rel=1e-3)
        assert row.abund_lo == pytest.approx(dens * areas[h_label] / c, rel=1e-3)
        total += dens * areas[h_label]
        er_terms.append((areas[h_label] ** 2 * var_er, k - 1))
        numerator += areas[h_label] * er
    # overall: P_a and E(s) are common factors, so their CV² is added once
    cv2_er = sum(v for v, _ in er_terms) / numerator ** 2
    cv2 = cv2_er + cv2_p + cv2_s
    dof = cv2 ** 2 / (sum((v / numerator ** 2) ** 2 / d for v, d in er_terms) + cv2_p ** 2 / (x.size - 1)
                      + cv2_s ** 2 / (x.size - 1))
    assert result.overall.abund == pytest.approx(total, rel=1e-6)
    assert result.overall.dens == pytest.approx(total / 65.0, rel=1e-6)
    assert result.overall.cv == pytest.approx(math.sqrt(cv2), rel=1e-3)
    assert result.overall.df == pytest.approx(dof, rel=1e-3)
    assert result.overall.p_det == pytest.approx(p, rel=1e-5)


def test_size_bias_regression_against_statsmodels():
    sm = pytest.importorskip("statsmodels.api")
    rng = np.random.default_rng(5)
    g = rng.uniform(0.1, 1.0, 80)
    sizes = np.round(np.exp(1.6 - 0.8 * g + rng.normal(0, 0.3, 80))).clip(1, None)
    ours = dd.group_size_estimate(sizes, g, dd.SIZE_REGRESSION)
    fit = sm.OLS(np.log(sizes), sm.add_constant(g)).fit()
    assert ours.intercept == pytest.approx(fit.params[0]) and ours.slope == pytest.approx(fit.params[1])
    assert ours.slope_p == pytest.approx(fit.pvalues[1], rel=1e-6)
    # Buckland et al. (2001), §3.5.4 (from memory): E(s) = exp(â + b̂ + σ̂²/2) at ĝ = 1
    at_one = np.array([1.0, 1.0])
    assert ours.expected == pytest.approx(math.exp(fit.params.sum() + fit.scale / 2))
    assert ours.se == pytest.approx(ours.expected * math.sqrt(at_one @ fit.cov_params() @ at_one), rel=1e-8)
    assert ours.method == "regression" and ours.expected < sizes.mean()
    # automatic: the regression only when larger groups are seen farther away (b < 0, p < 0.15)
    assert dd.group_size_estimate(sizes, g).method == "regression"
    flat = dd.group_size_estimate(rng.integers(1, 5, 80), g)
    assert flat.method == "mean" or flat.slope_p < 0.15
    assert dd.group_size_estimate(np.ones(80), g, has_sizes=False).method == "none"


@pytest.mark.slow
def test_size_bias_regression_removes_most_of_the_bias():
    """Groups of 1 to 8 animals, larger ones seen farther (σ_s = 12 m · (1 + 0.3 (s − 1))): the mean size
    of the detected groups overstates the population's mean size; the regression on ĝ(x) removes most
    of that (truth by construction). 300 surveys of about 250 groups each. Observed (seed 31): the mean
    of the detected sizes +11.7 %, the regression −2.1 % (Monte Carlo error 0.16 %): the log-linear
    regression is an approximation, so a small bias remains."""
    rng = np.random.default_rng(31)
    w, replicates = 60.0, 300
    population = np.arange(1, 9)
    weights = stats.poisson.pmf(population - 1, 2.0)
    weights /= weights.sum()
    true_mean = float(population @ weights)
    by_mean, by_regression = [], []
    for _ in range(replicates):
        s = rng.choice(population, 1500, p=weights).astype(float)
        x = rng.uniform(0.0, w, s.size)
        seen = rng.random(s.size) < np.exp(-0.5 * (x / (12.0 * (1 + 0.3 * (s - 1)))) ** 2)
        data = df.distance_data_iv(x[seen], w)
        fit = df.fit_detection_function(data, df.DetectionModel(df.HALF_NORMAL), variance=False, goodness=False)
        g = df.detection_curve(fit, x[seen])
        by_mean.append(dd.group_size_estimate(s[seen], g, dd.SIZE_MEAN).expected)
        by_regression.append(dd.group_size_estimate(s[seen], g, dd.SIZE_REGRESSION).expected)
    bias_mean = np.mean(by_mean) / true_mean - 1
    bias_regression = np.mean(by_regression) / true_mean - 1
    mc_error = np.std(by_regression, ddof=1) / np.sqrt(replicates) / true_mean
    assert bias_mean > 0.08  # detected groups are larger than the population's
    assert abs(bias_regression) < bias_mean / 3  # most of the size bias removed
    assert mc_error < 0.01


# --------------------------------------------------------------------------- the estimator on simulated surveys


SCENARIOS = [  # survey, density per m², simulation width W, truncation w, g, σ, shape, key, transects
    pytest.param(df.LINE, 100e-6, 80.0, 60.0, half_normal, 20.0, None, df.HALF_NORMAL, 20, id="line-half-normal"),
    pytest.param(df.LINE, 150e-6, 80.0, 60.0, hazard_rate, 20.0, 3.0, df.HAZARD_RATE, 20, id="line-hazard-rate"),
    pytest.param(df.POINT, 900e-6, 80.0, 60.0, half_normal, 25.0, None, df.HALF_NORMAL, 30, id="point-half-normal"),
    # 60 points (about 260 detections): with 30 (about 130) the estimator's own small-sample bias, of
    # order 1/n, was +2.5 %, 3 Monte Carlo errors; at 260 it is +0.3 % (0.7 %)
    pytest.param(df.POINT, 1200e-6, 80.0, 60.0, hazard_rate, 25.0, 3.0, df.HAZARD_RATE, 60, id="point-hazard-rate"),
]


@pytest.mark.slow
@pytest.mark.parametrize("survey, density, width, w, g, sigma, shape, key, units", SCENARIOS)
def test_simulated_surveys_are_unbiased_and_cover(survey, density, width, w, g, sigma, shape, key, units):
    """500 surveys with known density (truth by construction), about 100–260 detections each.

    Relative bias of D̂ within 3 Monte Carlo standard errors (sd(D̂)/√500/D, about 0.4–0.7 %), and the
    95 % log-normal t interval covers the true density in 92–97 % of surveys: the Monte Carlo standard
    error of a 95 % coverage over 500 surveys is √(0.95·0.05/500) ≈ 0.01. Observed (seed 2024), relative
    bias (Monte Carlo error) and coverage: line half-normal +0.7 % (0.6 %), 94.2 %; line hazard-rate
    +0.6 % (0.5 %), 94.6 %; point half-normal +0.1 % (0.7 %), 92.6 %; point hazard-rate +0.5 % (0.5 %),
    96.2 %. The MLE of D has a small positive bias of order 1/n.
    """
    replicates = 500
    rng = np.random.default_rng(2024)
    unit, x = simulate_surveys(rng, replicates, units, survey, density, width, g, sigma, shape)
    effort = np.full(units, 1000.0) if survey == df.LINE else np.ones(units)
    estimates, covered = np.empty(replicates), np.empty(replicates, dtype=bool)
    for r, (seen_on, distances) in enumerate(split_by_survey(unit, x, replicates, units)):
        result = dd.estimate_distance_density(np.arange(units), np.ones(units), effort, {"1": 1.0}, seen_on,
                                              distances, survey=survey, truncation=w, keys=(key,),
                                              max_adjustments=0, m2_per_unit=1.0)
        o = result.overall
        estimates[r], covered[r] = o.dens, o.dens_lo <= density <= o.dens_hi
    relative_bias = estimates.mean() / density - 1
    mc_error = estimates.std(ddof=1) / np.sqrt(replicates) / density
    assert abs(relative_bias) < 3 * mc_error, (relative_bias, mc_error)
    assert 0.92 <= covered.mean() <= 0.97, covered.mean()


@pytest.mark.slow
def test_bootstrap_standard_error_matches_the_spread_between_surveys():
    """The bootstrap over transects against the Monte Carlo spread of D̂ (truth by construction).

    200 simulated line surveys give sd(D̂) (its own Monte Carlo error about 5 %); six further surveys
    each get a 200-resample bootstrap SE, averaged (their spread about 7 %). The ratio is within 25 %.
    """
    rng = np.random.default_rng(77)
    units, density = 20, 100e-6
    unit, x = simulate_surveys(rng, 206, units, df.LINE, density, 80.0, half_normal, 20.0)
    surveys = split_by_survey(unit, x, 206, units)
    effort = np.full(units, 1000.0)

    def run(seen_on, distances, n_bootstrap=0, seed=1):
        return dd.estimate_distance_density(np.arange(units), np.ones(units), effort, {"1": 1.0}, seen_on,
                                            distances, truncation=60.0, keys=(df.HALF_NORMAL,), max_adjustments=0,
                                            m2_per_unit=1.0, n_bootstrap=n_bootstrap,
                                            rng=np.random.default_rng(seed))

    spread = np.std([run(*s).overall.dens for s in surveys[:200]], ddof=1)
    boot = [run(*s, n_bootstrap=200).overall.dens_se for s in surveys[200:]]
    assert 0.75 < np.mean(boot) / spread < 1.25, (np.mean(boot), spread)
    again = run(*surveys[200], n_bootstrap=200)
    assert again.overall.dens_se == pytest.approx(boot[0])  # the same seed, the same bootstrap
    assert again.bootstrap.replicates + again.bootstrap.failed == 200 and np.isnan(again.overall.df)


def test_grouped_distances_and_per_stratum_functions_recover_the_truth():
    """One large survey of two strata whose animals are seen at different distances (σ 15 m and 40 m).

    Per-stratum detection functions on exact distances, and one function on distance bands: each
    estimate within 3 of its standard errors of the true density (truth by construction)."""
    rng = np.random.default_rng(41)
    density, units = 150e-6, 60
    unit1, x1 = simulate_surveys(rng, 1, units, df.LINE, density, 150.0, half_normal, 15.0)
    unit2, x2 = simulate_surveys(rng, 1, units, df.LINE, density, 150.0, half_normal, 40.0)
    unit = np.concatenate([unit1, unit2 + units])
    x = np.concatenate([x1, x2])
    strata = [1] * units + [2] * units
    effort = np.full(2 * units, 1000.0)
    areas = {"1": 1.0, "2": 1.0}
    per = dd.estimate_distance_density(np.arange(2 * units), strata, effort, areas, unit, x, truncation=120.0,
                                       keys=(df.HALF_NORMAL, df.HAZARD_RATE), per_stratum=True, m2_per_unit=1.0)
    assert [a.stratum for a in per.analyses] == ["1", "2"]
    assert per.strata[0].esw < per.strata[1].esw  # each stratum its own function
    for row in per.table():
        assert abs(row.dens - density) < 3 * row.dens_se, row
    assert np.isnan(per.overall.p_det)
    bands = dd.estimate_distance_density(np.arange(units), [1] * units, effort[:units], {"1": 1.0}, unit1, x1,
                                         cutpoints=[0, 5, 10, 20, 30, 45, 60], m2_per_unit=1.0)
    assert bands.survey.truncation == 60.0 and bands.survey.cutpoints is not None
    assert abs(bands.overall.dens - density) < 3 * bands.overall.dens_se


def test_automatic_truncation_drops_the_farthest_five_percent():
    rng = np.random.default_rng(3)
    x = np.abs(rng.normal(0, 30.0, 400))
    unit = rng.integers(0, 10, 400)
    result = dd.estimate_distance_density(np.arange(10), [1] * 10, np.full(10, 1000.0), {"1": 10.0}, unit, x,
                                          keys=(df.HALF_NORMAL,))
    assert result.survey.truncation == pytest.approx(np.quantile(x, 0.95))  # numpy's quantile
    assert result.survey.truncation_auto and result.survey.n_dropped == int(np.sum(x > np.quantile(x, 0.95)))
    assert result.survey.n_dropped == 20  # common practice: 5 %


# --------------------------------------------------------------------------- errors


def survey_inputs(n=80, units=8):
    rng = np.random.default_rng(9)
    return dict(unit_ids=list(range(1, units + 1)), unit_strata=[1] * units, effort=[1000.0] * units,
                stratum_areas={"1": 10.0}, obs_unit_ids=list(rng.integers(1, units + 1, n)),
                distances=list(np.abs(rng.normal(0, 20.0, n))))


def test_unknown_units_negative_distances_and_bad_sizes_are_named():
    inputs = survey_inputs()
    inputs["obs_unit_ids"][3:5] = ["T9", "T7"]
    with pytest.raises(InputError, match=r"does not have \(field 'unit_id'\): T7, T9") as caught:
        dd.estimate_distance_density(**inputs)
    assert caught.value.ids == ["T7", "T9"]
    inputs = survey_inputs()
    inputs["distances"][2] = -4.0
    with pytest.raises(InputError, match="observations 102 have a negative distance"):
        dd.estimate_distance_density(**inputs, obs_ids=list(range(100, 180)))
    inputs = survey_inputs()
    inputs["distances"][5] = None
    with pytest.raises(InputError, match="observations 5 have no distance"):
        dd.estimate_distance_density(**inputs)
    with pytest.raises(InputError, match="observations 0 have no group size above 0"):
        dd.estimate_distance_density(**survey_inputs(), sizes=[0] + [1] * 79)


def test_too_few_detections_is_an_error_naming_the_count_and_few_a_warning():
    with pytest.raises(InputError, match="Only 15 detections lie within the truncation distance of 100 m"):
        dd.estimate_distance_density(**survey_inputs(n=15), truncation=100.0)
    result = dd.estimate_distance_density(**survey_inputs(n=40), truncation=100.0, keys=(df.HALF_NORMAL,))
    assert any("Only 40 detections" in w for w in result.warnings)
    inputs = survey_inputs(n=400)
    inputs["unit_strata"] = [1, 1, 1, 1, 1, 1, 2, 2]
    inputs["stratum_areas"] = {"1": 5.0, "2": 5.0}
    inputs["obs_unit_ids"] = [1] * 390 + [7] * 10
    with pytest.raises(InputError, match=r"fewer: 2 \(10\)"):
        dd.estimate_distance_density(**inputs, truncation=100.0, per_stratum=True)


def test_transects_strata_and_ids_are_checked():
    inputs = survey_inputs()
    inputs["effort"][2] = 0.0
    with pytest.raises(InputError, match="the transects 3 have zero length"):
        dd.estimate_distance_density(**inputs)
    inputs = survey_inputs()
    inputs["unit_strata"] = [1] * 7 + [2]
    inputs["stratum_areas"] = {"1": 5.0, "2": 5.0}
    with pytest.raises(InputError, match="strata 2 have one transect or point each"):
        dd.estimate_distance_density(**inputs)
    inputs = survey_inputs()
    inputs["unit_strata"][0] = 5
    with pytest.raises(InputError, match="units 1 have no stratum, or a stratum"):
        dd.estimate_distance_density(**inputs)
    inputs = survey_inputs()
    inputs["unit_ids"][1] = 1
    with pytest.raises(InputError, match="the unit ids 1 occur more than once"):
        dd.estimate_distance_density(**inputs)
    inputs = survey_inputs()
    inputs["stratum_areas"] = {"1": 10.0, "2": 3.0}
    with pytest.raises(InputError, match="strata 2 have no surveyed transect"):
        dd.estimate_distance_density(**inputs)
