"""Detection functions fitted by maximum likelihood, checked against closed forms, scipy and simulation.

Sources: Buckland, S. T. et al. (2001) Introduction to Distance Sampling, Oxford University Press
(key functions, ch. 2; likelihoods, ESW and point-transect formulas, ch. 3; section numbers from
memory). Every "independent" likelihood below is written out here with scipy.stats or
scipy.integrate, not with the module under test.
"""
import numpy as np
import pytest
from scipy import integrate, optimize, stats

from plotwise.processing.engine import detection_functions as df
from plotwise.processing.engine.errors import InputError

HN, HR, UNIFORM = df.DetectionModel(df.HALF_NORMAL), df.DetectionModel(df.HAZARD_RATE), df.DetectionModel(df.UNIFORM)


def half_normal_line(rng, n, sigma, w=np.inf):
    """|N(0, σ²)| distances (the pdf of perpendicular distances under a half-normal g), below w."""
    x = np.abs(rng.normal(0.0, sigma, 4 * n))
    return x[x <= w][:n]


def hazard_rate_line(rng, n, sigma, shape, w):
    """Uniform positions in the strip thinned by g(x) = 1 − exp(−(x/σ)^−b) (truth by construction)."""
    x = rng.uniform(0.0, w, 40 * n)
    kept = x[rng.random(x.size) < -np.expm1(-(x / sigma) ** (-shape))]
    return kept[:n]


# --------------------------------------------------------------------------- closed forms


def test_half_normal_without_truncation_has_the_closed_form_mle():
    # Buckland et al. (2001), ch. 3: for g(x) = exp(−x²/2σ²) and no truncation, f(x) is the half-normal
    # pdf, so σ̂² = Σx²/n and the effective strip half-width is μ = σ √(π/2)
    x = half_normal_line(np.random.default_rng(1), 400, 25.0)
    fit = df.fit_detection_function(df.distance_data_iv(x, np.inf), HN)
    sigma = np.sqrt(np.sum(x ** 2) / x.size)
    assert fit.params[0] == pytest.approx(sigma, rel=1e-7)
    assert fit.esw == pytest.approx(sigma * np.sqrt(np.pi / 2.0), rel=1e-7)
    # the log-likelihood is that of scipy's half-normal distribution at σ̂
    assert fit.log_lik == pytest.approx(np.sum(stats.halfnorm.logpdf(x, scale=sigma)), rel=1e-10)
    assert fit.aic == pytest.approx(2 - 2 * np.sum(stats.halfnorm.logpdf(x, scale=sigma)), rel=1e-10)
    # var(σ̂²) = 2σ⁴/n for normal data, so SE(μ̂) = μ/√(2n) (delta method)
    assert fit.esw_se == pytest.approx(fit.esw / np.sqrt(2 * x.size), rel=1e-3)


def test_half_normal_point_transect_without_truncation_is_rayleigh():
    # Buckland et al. (2001), ch. 3 (point transects): f(r) = r exp(−r²/2σ²)/σ² (Rayleigh), so
    # σ̂² = Σr²/(2n) and the effective area is ν = 2πσ², the effective radius ρ = σ√2
    r = stats.rayleigh.rvs(scale=30.0, size=300, random_state=np.random.default_rng(2))
    fit = df.fit_detection_function(df.distance_data_iv(r, np.inf, df.POINT), HN)
    sigma = np.sqrt(np.sum(r ** 2) / (2 * r.size))
    assert fit.params[0] == pytest.approx(sigma, rel=1e-7)
    assert fit.esw == pytest.approx(sigma * np.sqrt(2.0), rel=1e-7)
    # our log-likelihood leaves out the constant Σ log 2πr (documented)
    expected = np.sum(stats.rayleigh.logpdf(r, scale=sigma)) - np.sum(np.log(2 * np.pi * r))
    assert fit.log_lik == pytest.approx(expected, rel=1e-10)


# --------------------------------------------------------------------------- truncated fits


def test_truncated_half_normal_equals_a_direct_maximisation():
    # lines: f(x) is a normal pdf truncated to [0, w] (scipy.stats.truncnorm)
    w = 40.0
    x = half_normal_line(np.random.default_rng(3), 250, 30.0, w)
    fit = df.fit_detection_function(df.distance_data_iv(x, w), HN)

    def negative(sigma):
        return -np.sum(stats.truncnorm.logpdf(x, 0.0, w / sigma, scale=sigma))

    direct = optimize.minimize_scalar(negative, bounds=(1.0, 500.0), method="bounded", options={"xatol": 1e-9})
    assert fit.params[0] == pytest.approx(direct.x, rel=1e-5)
    assert fit.log_lik == pytest.approx(-direct.fun, abs=1e-7)
    # P_a = μ/w with μ = σ √(2π) (Φ(w/σ) − ½) (Buckland et al. 2001, ch. 3)
    mu = direct.x * np.sqrt(2 * np.pi) * (stats.norm.cdf(w / direct.x) - 0.5)
    assert fit.p_det == pytest.approx(mu / w, rel=1e-5)


def test_truncated_half_normal_points_equals_a_direct_maximisation():
    # points: f(r) = Rayleigh pdf truncated at w; ν = 2πσ²(1 − exp(−w²/2σ²)), P_a = ν / (π w²)
    w = 50.0
    r = stats.rayleigh.rvs(scale=35.0, size=600, random_state=np.random.default_rng(4))
    r = r[r <= w]
    fit = df.fit_detection_function(df.distance_data_iv(r, w, df.POINT), HN)

    def negative(sigma):
        return -np.sum(stats.rayleigh.logpdf(r, scale=sigma) - stats.rayleigh.logcdf(w, scale=sigma))

    direct = optimize.minimize_scalar(negative, bounds=(1.0, 1000.0), method="bounded", options={"xatol": 1e-9})
    assert fit.params[0] == pytest.approx(direct.x, rel=1e-5)
    nu = 2 * np.pi * direct.x ** 2 * (1 - np.exp(-w ** 2 / (2 * direct.x ** 2)))
    assert fit.p_det == pytest.approx(nu / (np.pi * w ** 2), rel=1e-5)
    assert fit.esw == pytest.approx(np.sqrt(nu / np.pi), rel=1e-5)


@pytest.mark.parametrize("survey", [df.LINE, df.POINT])
def test_truncated_hazard_rate_equals_a_direct_maximisation(survey):
    # the likelihood written out with scipy.integrate.quad for the normalising integral
    w = 60.0
    rng = np.random.default_rng(5)
    x = hazard_rate_line(rng, 300, 20.0, 3.0, w) if survey == df.LINE else None
    if survey == df.POINT:
        r = w * np.sqrt(rng.random(12000))
        x = r[rng.random(r.size) < -np.expm1(-(r / 22.0) ** -3.0)][:300]
    fit = df.fit_detection_function(df.distance_data_iv(x, w, survey), HR)

    def g(d, sigma, b):
        return 1.0 - np.exp(-(d / sigma) ** (-b))

    def negative(params):
        sigma, b = params
        if sigma <= 0 or b <= 0:
            return np.inf
        weight = (lambda d: g(d, sigma, b)) if survey == df.LINE else (lambda d: d * g(d, sigma, b))
        total = integrate.quad(weight, 1e-12, w, points=[sigma], epsabs=0, epsrel=1e-11, limit=200)[0]
        return -(np.sum(np.log(g(x, sigma, b))) - x.size * np.log(total))

    direct = optimize.minimize(negative, [25.0, 2.5], method="Nelder-Mead",
                               options={"xatol": 1e-8, "fatol": 1e-10, "maxiter": 4000})
    assert fit.params[0] == pytest.approx(direct.x[0], rel=1e-4)
    assert fit.params[1] == pytest.approx(direct.x[1], rel=1e-4)
    # the log-likelihoods differ only by the constant the points leave out, Σ log 2π (ours: ∫2πr g)
    offset = 0.0 if survey == df.LINE else -x.size * np.log(2 * np.pi)
    assert fit.log_lik == pytest.approx(-direct.fun + offset, abs=1e-5)


def test_grouped_half_normal_equals_a_direct_maximisation():
    # bands: multinomial likelihood with P_j = (Φ(c_j/σ) − Φ(c_j−1/σ)) / (Φ(w/σ) − ½)
    cut = np.array([0.0, 10.0, 20.0, 35.0, 50.0, 70.0])
    x = half_normal_line(np.random.default_rng(6), 300, 30.0, cut[-1])
    data = df.distance_data_iv(x, cut[-1], cutpoints=cut)
    counts = np.histogram(x, bins=cut)[0]  # numpy's bands as the reference counts
    assert list(data.bin_counts) == list(counts)
    fit = df.fit_detection_function(data, HN)

    def negative(sigma):
        p = np.diff(stats.norm.cdf(cut / sigma)) / (stats.norm.cdf(cut[-1] / sigma) - 0.5)
        return -np.sum(counts * np.log(p))

    direct = optimize.minimize_scalar(negative, bounds=(1.0, 500.0), method="bounded", options={"xatol": 1e-9})
    assert fit.params[0] == pytest.approx(direct.x, rel=1e-5)
    assert np.isnan(fit.gof.cvm_p) and fit.gof_p == fit.gof.chi2_p  # no exact distances: χ² only


def test_uniform_with_one_cosine_term_equals_a_direct_maximisation():
    # g(x) = (1 + a cos(πx/w)) / (1 + a); ∫_0^w cos(πx/w) dx = 0, so f(x) = (1 + a cos(πx/w)) / w, and
    # μ = w / (1 + a), P_a = 1 / (1 + a). Monotone and non-negative on [0, w] for 0 ≤ a ≤ 1.
    w = 50.0
    x = half_normal_line(np.random.default_rng(7), 300, 35.0, w)
    fit = df.fit_detection_function(df.distance_data_iv(x, w), df.DetectionModel(df.UNIFORM, (1,)))
    direct = optimize.minimize_scalar(lambda a: -np.sum(np.log1p(a * np.cos(np.pi * x / w))), bounds=(0.0, 1.0),
                                      method="bounded", options={"xatol": 1e-10})
    assert fit.params[0] == pytest.approx(direct.x, rel=1e-4)
    assert fit.p_det == pytest.approx(1.0 / (1.0 + direct.x), rel=1e-4)
    assert fit.monotone and fit.converged


def test_adjusted_fits_keep_the_detection_function_monotone():
    # Buckland et al. (2001), ch. 2: g must not increase with distance. Data with a bump at mid-distance
    # would pull an unconstrained cosine series upwards there.
    rng = np.random.default_rng(8)
    w = 100.0
    x = np.concatenate([half_normal_line(rng, 200, 30.0, w), rng.normal(70.0, 4.0, 60).clip(0, w)])
    data = df.distance_data_iv(x, w)
    for model in (df.DetectionModel(df.UNIFORM, (1, 2, 3)), df.DetectionModel(df.HALF_NORMAL, (2, 3))):
        fit = df.fit_detection_function(data, model)
        grid = np.linspace(0.0, w, 401)
        g = df.detection_curve(fit, grid)
        assert g[0] == pytest.approx(1.0)
        assert np.all(np.diff(g) <= 1e-3) and np.all(g >= -1e-6), model.label


def test_quadrature_matches_scipy_integrate():
    # our Gauss-Legendre integrals of g against scipy.integrate.quad, over shapes from flat to step-like
    w = 100.0
    worst = 0.0
    for sigma in (2.0, 10.0, 40.0, 150.0):
        for b in (1.0, 2.5, 8.0, 50.0):
            for survey in (df.LINE, df.POINT):
                mine = df._total_integral(HR, np.log([sigma, b]), w, survey)

                def f(d):
                    return (1 if survey == df.LINE else 2 * np.pi * d) * -np.expm1(-(d / sigma) ** -b)

                ref = integrate.quad(f, 0, w, points=[sigma], limit=500, epsabs=0, epsrel=1e-12)[0]
                worst = max(worst, abs(mine / ref - 1))
    assert worst < 1e-7
    # a cosine-adjusted half-normal against quad too
    model = df.DetectionModel(df.HALF_NORMAL, (2, 3))
    theta = np.array([np.log(30.0), 0.2, -0.05])
    ref = integrate.quad(lambda d: np.exp(-d ** 2 / 1800) * (1 + 0.2 * np.cos(2 * np.pi * d / w)
                                                             - 0.05 * np.cos(3 * np.pi * d / w)), 0, w)[0]
    assert df._total_integral(model, theta, w, df.LINE) == pytest.approx(ref, rel=1e-10)


# --------------------------------------------------------------------------- goodness of fit


def test_goodness_of_fit_against_scipy():
    w = 60.0
    x = half_normal_line(np.random.default_rng(9), 200, 30.0, w)
    fit = df.fit_detection_function(df.distance_data_iv(x, w), HN)
    sigma = fit.params[0]

    def cdf(d):  # the truncated half-normal cdf, written out
        return (stats.norm.cdf(np.minimum(d, w) / sigma) - 0.5) / (stats.norm.cdf(w / sigma) - 0.5)

    reference = stats.cramervonmises(x, cdf)
    assert fit.gof.cvm == pytest.approx(reference.statistic, rel=1e-8)
    assert fit.gof.cvm_p == pytest.approx(reference.pvalue, rel=1e-6)
    # χ² on the pooled bands: scipy.stats.chisquare with ddof = q on the same observed and expected counts
    edges = np.array(fit.gof.chi2_edges)
    observed = np.histogram(x, bins=edges)[0]
    expected = x.size * np.diff(cdf(edges))
    assert list(observed) == list(fit.gof.observed)
    assert np.all(expected >= df.MIN_EXPECTED_PER_BIN)  # pooled to 5 expected (common practice)
    chi2, p = stats.chisquare(observed, expected, ddof=1)
    assert fit.gof.chi2 == pytest.approx(chi2, rel=1e-6)
    assert fit.gof.chi2_p == pytest.approx(p, rel=1e-6)
    assert fit.gof.chi2_df == edges.size - 1 - 1 - 1


# --------------------------------------------------------------------------- selection


def test_forward_selection_tries_terms_while_aic_improves():
    w = 60.0
    x = half_normal_line(np.random.default_rng(10), 300, 25.0, w)
    selection = df.select_detection_function(df.distance_data_iv(x, w))
    labels = [f.label for f in selection.fits]
    assert labels[0] == "half-normal" and "uniform" in labels
    for key in df.KEYS:  # within a key, each model adds one term to the one before, AIC = 2q − 2 log L
        ours = [f for f in selection.fits if f.model.key == key]
        for before, after in zip(ours, ours[1:]):
            assert after.model.orders[:-1] == before.model.orders
        for f in ours:
            assert f.aic == pytest.approx(2 * f.n_par - 2 * f.log_lik)
        # a term was kept only when it lowered AIC; the search stops at the first that does not
        assert all(b.aic < a.aic for a, b in zip(ours[:-2], ours[1:-1]))
    assert selection.best.aic == min(f.aic for f in selection.fits)
    assert selection.delta_aic(selection.chosen) == 0.0


@pytest.mark.slow
def test_aic_chooses_the_true_key_in_most_replicates():
    """AIC among the half-normal and hazard-rate keys (no cosine terms), 150 surveys each.

    Observed here (seed 11): the hazard-rate is chosen on hazard-rate data (σ = 20 m, b = 4, w = 60 m,
    200 detections) in 118 of 150 surveys (79 %), the half-normal on half-normal data (σ = 25 m) in 125
    of 150 (83 %). The test asks for more than two thirds: a Monte Carlo standard error of a rate near
    0.8 over 150 surveys is √(0.8·0.2/150) = 0.033, so the bound sits about 4 standard errors below
    what is observed. With cosine terms allowed the keys mimic each other more often (not tested).
    """
    rng = np.random.default_rng(11)
    w, replicates, n = 60.0, 150, 200
    picked_hr = picked_hn = 0
    for _ in range(replicates):
        x = hazard_rate_line(rng, n, 20.0, 4.0, w)
        choice = df.select_detection_function(df.distance_data_iv(x, w), (df.HALF_NORMAL, df.HAZARD_RATE), 0)
        picked_hr += choice.best.model.key == df.HAZARD_RATE
        x = half_normal_line(rng, n, 25.0, w)
        choice = df.select_detection_function(df.distance_data_iv(x, w), (df.HALF_NORMAL, df.HAZARD_RATE), 0)
        picked_hn += choice.best.model.key == df.HALF_NORMAL
    assert picked_hr / replicates > 0.66, picked_hr
    assert picked_hn / replicates > 0.66, picked_hn


# --------------------------------------------------------------------------- errors


def test_bad_distances_are_clear_errors():
    with pytest.raises(InputError, match="negative"):
        df.distance_data_iv([1.0, -2.0, 3.0], 10.0)
    with pytest.raises(InputError, match=r"2 distances lie beyond the truncation distance of 10 m"):
        df.distance_data_iv([1.0, 12.0, 3.0, 15.0], 10.0)
    with pytest.raises(InputError, match="missing"):
        df.distance_data_iv([1.0, np.nan, 3.0], 10.0)
    with pytest.raises(InputError, match="bands"):
        df.distance_data_iv([1.0, 2.0, 3.0], 10.0, cutpoints=[0, 5, 4, 10])
    with pytest.raises(InputError, match="half-normal key alone"):
        df.fit_detection_function(df.distance_data_iv([1.0, 2.0, 3.0], np.inf), HR)
