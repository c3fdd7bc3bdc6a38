"""Single-season occupancy: checks against outside references.

* MacKenzie et al. (2002)'s likelihood written out independently here and maximised directly with
  scipy.optimize, and its closed-form solution for the constant model without missing surveys;
* numerical Hessians from statsmodels (test-only reference) for the standard errors;
* truth known by construction: simulated data sets with known psi and p (bias, interval coverage,
  the variance of psi-hat against the asymptotic variance of MacKenzie & Royle 2005);
* the expected Fisher information of the constant model, enumerated over every history here, for
  the MacKenzie & Royle (2005) variance formula (eq. 3, # from memory);
* Pearson's chi-square of MacKenzie & Bailey (2004) written out for enumerated histories.
"""
import itertools
import math

import numpy as np
import pytest
from scipy import optimize, special
from statsmodels.tools.numdiff import approx_hess

from plotwise.processing.engine import occupancy as occ
from plotwise.processing.engine.errors import InputError


# -- helpers written independently of the engine ---------------------------------------------------------
def simulate(rng, psi, p, occasions, sites, missing=0.0):
    """Histories (sites, K) with NaN for surveys not made; psi and p may be per site / per site-occasion."""
    z = rng.random(sites) < psi
    y = ((rng.random((sites, occasions)) < p) & z[:, None]).astype(float)
    y[rng.random((sites, occasions)) < missing] = np.nan
    return y


def histories(y, ids=None):
    k = y.shape[1]
    columns = [[None if np.isnan(v) else int(v) for v in y[:, j]] for j in range(k)]
    return occ.detection_histories(columns, [f"det_{j + 1}" for j in range(k)], ids or list(range(len(y))))


def mackenzie_loglik(psi, p, y):
    """MacKenzie et al. (2002), eq. 2 with surveys not made left out (their §2.2); psi (s,), p (s, K)."""
    m = ~np.isnan(y)
    y0 = np.nan_to_num(y)
    a = np.prod(np.where(m, p ** y0 * (1 - p) ** (1 - y0), 1.0), axis=1)
    detected = (y0 * m).sum(axis=1) > 0
    return float(np.sum(np.log(psi * a + (1 - psi) * ~detected)))


def direct_constant_fit(y):
    """psi and p maximising the likelihood above, straight on the probability scale (scipy, bounded)."""
    s, k = y.shape

    def negative(q):
        return -mackenzie_loglik(np.full(s, q[0]), np.full((s, k), q[1]), y)

    best = optimize.minimize(negative, [0.5, 0.5], method="L-BFGS-B", bounds=[(1e-9, 1 - 1e-9)] * 2,
                             options={"ftol": 1e-15, "gtol": 1e-12, "maxiter": 10000})
    return optimize.minimize(negative, best.x, method="Nelder-Mead",
                             options={"xatol": 1e-12, "fatol": 1e-14, "maxiter": 20000}).x


def fit(y, **options):
    return occ.occupancy_analysis(histories(y), **options)


# -- the constant model against the likelihood maximised directly --------------------------------------
@pytest.mark.parametrize("psi, p, k, s, seed", [(0.4, 0.3, 5, 80, 1), (0.7, 0.6, 3, 60, 2), (0.25, 0.5, 8, 150, 3)])
def test_constant_model_equals_the_direct_maximum_and_the_closed_form(psi, p, k, s, seed):
    y = simulate(np.random.default_rng(seed), psi, p, k, s)
    result = fit(y)
    assert result.main.status == "converged"
    psi_hat, p_hat = result.main.psi_mean.estimate, result.main.p_mean.estimate
    direct = direct_constant_fit(y)
    assert psi_hat == pytest.approx(direct[0], abs=1e-6)  # MacKenzie et al. (2002), maximised directly
    assert p_hat == pytest.approx(direct[1], abs=1e-6)
    # closed form without missing surveys: p solves p / (1 - (1 - p)^K) = D / (K s_D), psi = s_D / (s p*)
    detected = y.sum(axis=1) > 0
    s_d, d = detected.sum(), y.sum()
    p_closed = optimize.brentq(lambda q: q / (1 - (1 - q) ** k) - d / (k * s_d), 1e-9, 1 - 1e-12, xtol=1e-15)
    assert p_hat == pytest.approx(p_closed, abs=1e-6)
    assert psi_hat == pytest.approx(s_d / (s * (1 - (1 - p_closed) ** k)), abs=1e-6)


def test_standard_errors_equal_the_numerical_observed_information():
    y = simulate(np.random.default_rng(4), 0.5, 0.35, 5, 120, missing=0.15)
    main = fit(y).main
    s, k = y.shape

    def loglik(t):  # on the logit scale, written here
        return mackenzie_loglik(np.full(s, special.expit(t[0])), np.full((s, k), special.expit(t[1])), y)

    theta = special.logit([main.psi_mean.estimate, main.p_mean.estimate])
    cov = np.linalg.inv(-approx_hess(theta, loglik))  # statsmodels' numerical Hessian
    assert main.se == pytest.approx(np.sqrt(np.diag(cov)), rel=1e-4)
    # psi's SE on the probability scale by the delta method: psi(1 - psi) SE(logit psi)
    psi_hat = main.psi_mean.estimate
    assert main.psi_mean.se == pytest.approx(psi_hat * (1 - psi_hat) * math.sqrt(cov[0, 0]), rel=1e-4)
    lo, hi = special.expit(theta[0] + np.array([-1, 1]) * 1.959963984540054 * math.sqrt(cov[0, 0]))
    assert (main.psi_mean.lo, main.psi_mean.hi) == (pytest.approx(lo, rel=1e-4), pytest.approx(hi, rel=1e-4))


def test_covariate_model_equals_a_direct_maximisation():
    rng = np.random.default_rng(5)
    s, k = 160, 6
    elevation = rng.normal(1200.0, 150.0, s)
    effort = rng.uniform(2.0, 7.0, (s, k))
    psi = special.expit(0.3 + 0.006 * (elevation - 1200.0))
    p = special.expit(-1.8 + 0.3 * effort)
    y = simulate(rng, psi, p, k, s, missing=0.1)
    main = fit(y, psi_covariates=["elev"], covariates={"elev": elevation}, effort=effort).main

    def negative(b):  # on the covariates' own units, written here
        return -mackenzie_loglik(special.expit(b[0] + b[1] * elevation), special.expit(b[2] + b[3] * effort), y)

    start = np.array([-7.0, 0.006, -1.8, 0.3])
    direct = optimize.minimize(negative, start, method="Nelder-Mead",
                               options={"xatol": 1e-10, "fatol": 1e-12, "maxiter": 40000, "maxfev": 40000}).x
    assert main.names == ("logit_psi:const", "logit_psi:elev", "logit_p:const", "logit_p:effort")
    assert main.estimate == pytest.approx(direct, rel=1e-4, abs=1e-6)
    cov = np.linalg.inv(approx_hess(main.estimate, negative))  # statsmodels' numerical Hessian
    assert main.se == pytest.approx(np.sqrt(np.diag(cov)), rel=1e-3)


def test_many_data_sets_fitted_together_equal_the_scipy_search():
    rng = np.random.default_rng(6)
    s, k = 90, 5
    cover = rng.normal(size=s)
    y = np.stack([simulate(rng, special.expit(0.2 + 0.8 * cover), 0.4, k, s, missing=0.1) for _ in range(8)])
    inp = occ._occupancy_iv(histories(y[0]), psi_covariates=["cover"], covariates={"cover": cover})
    surveyed = ~np.isnan(y[0])
    y = np.where(surveyed, np.nan_to_num(y), np.nan)  # one missing pattern (the design) for every data set
    data = occ.model_data(inp, inp.main)
    together = occ.fit_many(data, np.nan_to_num(y))
    for y_b, many in zip(np.nan_to_num(y), together):
        single = occ.fit_model(occ._with_detections(data, y_b))
        assert many.estimate == pytest.approx(single.estimate, abs=1e-6)
        assert many.se == pytest.approx(single.se, abs=1e-6)


# -- simulations with known psi and p ---------------------------------------------------------------------
REPLICATES = 1000
COMBINATIONS = [  # psi, p, K, s, seed: cumulative detection 0.85 to 0.94
    (0.3, 0.4, 5, 120, 11),
    (0.6, 0.3, 6, 100, 12),
    (0.7, 0.5, 4, 150, 13),
    (0.5, 0.25, 8, 200, 14),
]
_SIMULATED = {}


def simulated_fits(psi, p, k, s, seed):
    """psi-hat, its interval and the fit status for REPLICATES data sets (vectorised fits)."""
    key = (psi, p, k, s, seed)
    if key not in _SIMULATED:
        rng = np.random.default_rng(seed)
        z = rng.random((REPLICATES, s)) < psi
        y = ((rng.random((REPLICATES, s, k)) < p) & z[:, :, None]).astype(float)
        inp = occ._occupancy_iv(histories(y[0]))
        fits = occ.fit_many(occ.model_data(inp, inp.main), y)
        _SIMULATED[key] = (np.array([f.psi_mean.estimate for f in fits]), np.array([f.psi_mean.lo for f in fits]),
                           np.array([f.psi_mean.hi for f in fits]), np.array([f.status for f in fits]))
    return _SIMULATED[key]


@pytest.mark.slow
@pytest.mark.parametrize("psi, p, k, s, seed", COMBINATIONS)
def test_psi_unbiased_and_intervals_cover_95_percent(psi, p, k, s, seed):
    """1,000 data sets per combination (truth by construction).

    Bias: |mean psi-hat - psi| within 3 Monte Carlo SEs (SD / sqrt(1000), about 0.0015 here).
    Coverage of the 95% logit-scale interval: MC SE sqrt(0.95 x 0.05 / 1000) = 0.007, so 92-97%
    is the expected 95% widened by 3 MC SEs below and 2 above. Fits at the boundary (no interval)
    count as misses.
    """
    estimate, lo, hi, status = simulated_fits(psi, p, k, s, seed)
    assert np.mean(status == "failed") == 0
    mc_error = estimate.std(ddof=1) / math.sqrt(REPLICATES)
    assert abs(estimate.mean() - psi) < 3 * mc_error
    coverage = np.mean((lo <= psi) & (psi <= hi))
    assert 0.92 <= coverage <= 0.97


@pytest.mark.parametrize("psi, p, k, s, seed", COMBINATIONS)
def test_design_variance_matches_the_simulated_variance(psi, p, k, s, seed):
    """MacKenzie & Royle (2005) asymptotic Var(psi-hat) against the variance over 1,000 simulated data sets
    (s >= 100): within 15% (the MC error of a variance from 1,000 replicates is about 4.5%)."""
    estimate, *_ = simulated_fits(psi, p, k, s, seed)
    advice = occ.design_advice(psi, p, k, target_se=0.05)
    assert estimate.var(ddof=1) == pytest.approx(advice.variance_per_site / s, rel=0.15)


@pytest.mark.parametrize("psi, p, k", [(0.3, 0.2, 4), (0.8, 0.5, 3), (0.5, 0.1, 10)])
def test_design_variance_is_the_inverse_expected_information(psi, p, k):
    """The formula (MacKenzie & Royle 2005, eq. 3, # from memory) against the inverse of the expected
    Fisher information of one site, enumerated here over every history: I = sum_h dP dP^T / P."""
    def probabilities(q):
        ps, pp = q
        out = []
        for h in itertools.product((0, 1), repeat=k):
            d = sum(h)
            out.append(ps * pp**d * (1 - pp) ** (k - d) + (1 - ps) * (d == 0))
        return np.array(out)

    step = 1e-6
    grads = np.stack([(probabilities(np.array([psi, p]) + e) - probabilities(np.array([psi, p]) - e)) / (2 * step)
                      for e in np.eye(2) * step], axis=1)
    info = (grads / probabilities(np.array([psi, p]))[:, None]).T @ grads
    assert occ.psi_variance_per_site(psi, p, k) == pytest.approx(np.linalg.inv(info)[0, 0], rel=1e-6)


def test_occasions_and_sites_advice():
    # 1 - (1 - 0.3)^K >= 0.95 first at K = 9 (0.7^8 = 0.0576, 0.7^9 = 0.0404)
    assert occ.occasions_for(0.3) == 9
    assert occ.occasions_for(1.0) == 1
    advice = occ.design_advice(0.4, 0.3, 5, target_se=0.05)
    assert advice.cumulative == pytest.approx(1 - 0.7**5)
    assert advice.sites_needed == pytest.approx(occ.psi_variance_per_site(0.4, 0.3, 5) / 0.05**2)
    ks = np.arange(2, 51)  # the occasions with the fewest surveys s K for the target
    assert advice.best_occasions == ks[np.argmin(occ.psi_variance_per_site(0.4, 0.3, ks) * ks)]


# -- goodness of fit ------------------------------------------------------------------------------------
def test_history_chi_square_written_out():
    """MacKenzie & Bailey (2004): X2 = sum over every history h of (O_h - E_h)^2 / E_h, E_h = s Pr(h)."""
    y = simulate(np.random.default_rng(7), 0.6, 0.4, 3, 80)
    main = fit(y).main
    psi_hat, p_hat = main.psi_mean.estimate, main.p_mean.estimate
    expected_x2 = 0.0
    for h in itertools.product((0, 1), repeat=3):
        d = sum(h)
        prob = psi_hat * p_hat**d * (1 - p_hat) ** (3 - d) + (1 - psi_hat) * (d == 0)
        observed = np.sum(np.all(y == np.array(h), axis=1))
        expected_x2 += (observed - 80 * prob) ** 2 / (80 * prob)
    inp = occ._occupancy_iv(histories(y))
    data = occ.model_data(inp, inp.main)
    assert occ.history_chi_square(data, main.psi, main.p) == pytest.approx(expected_x2, rel=1e-9)


def test_bootstrap_c_hat_sees_heterogeneous_detection():
    """Truth by construction: detection varying between sites (beta-distributed p) that the model ignores
    inflates the history chi-square; data from the model itself give c-hat near 1. 200 replicates each."""
    rng = np.random.default_rng(8)
    s, k = 200, 6
    same = simulate(rng, 0.6, 0.35, k, s)
    mixed = simulate(rng, 0.6, rng.beta(0.4, 0.6, s)[:, None], k, s)
    fair = occ.occupancy_analysis(histories(same), gof_replicates=200, rng=rng).gof
    over = occ.occupancy_analysis(histories(mixed), gof_replicates=200, rng=rng).gof
    assert fair.replicates + fair.failed == 200
    assert 0.6 < fair.c_hat < 1.6 and fair.p_value > 0.01
    assert over.c_hat > 1.5 and over.p_value < 0.05


# -- clear errors and statements ------------------------------------------------------------------------
def test_a_history_value_other_than_0_1_null_names_field_and_sites():
    columns = [[0, 1, None, 1], [1, 2, 0, "x"]]
    with pytest.raises(InputError) as caught:
        occ.detection_histories(columns, ["day1", "day2"], ["A", "B", "C", "D"], layer="cams")
    text = str(caught.value)
    assert "day2" in text and "B, D" in text and "cams" in text
    assert caught.value.ids == ["B", "D"]


def test_sites_without_a_survey_are_left_out_and_listed():
    y = simulate(np.random.default_rng(9), 0.5, 0.5, 4, 40)
    y[[3, 17]] = np.nan
    result = occ.occupancy_analysis(histories(y, [f"cam{i}" for i in range(40)]))
    assert result.summary.n_used == 38
    assert result.histories.left_out == ("cam3", "cam17")
    assert any("cam3, cam17" in w and "left out" in w for w in result.warnings)


def test_failed_convergence_gives_no_number():
    y = simulate(np.random.default_rng(10), 0.5, 0.3, 5, 100)
    with pytest.raises(InputError, match="could not be fitted"):
        occ.occupancy_analysis(histories(y), max_iterations=1)


def test_psi_at_the_boundary_is_stated():
    # every site detected at least once: the likelihood rises towards psi = 1 (MacKenzie et al. 2002)
    y = np.array([[1, 0, 0], [0, 1, 0], [0, 0, 1], [1, 1, 0], [0, 1, 1], [1, 0, 1]] * 5, dtype=float)
    y = np.vstack([y, [[0, 0, 0]] * 2])
    result = fit(y)
    main = result.main
    assert main.status == "boundary" and "logit_psi:const" in main.boundary
    assert main.psi_mean.estimate > 0.999
    assert math.isnan(main.psi_mean.se) and math.isnan(main.psi_mean.lo)
    assert any("boundary" in w for w in result.warnings)
    assert np.isfinite(main.p_mean.se)  # p keeps its SE, conditional on psi at 1


def test_repeated_site_ids_and_no_detection_are_errors():
    with pytest.raises(InputError, match="more than once"):
        occ.detection_histories([[0, 1], [1, 0]], ["a", "b"], ["X", "X"])
    with pytest.raises(InputError, match="not detected at any site"):
        occ.detection_histories([[0, 0], [0, None]], ["a", "b"], ["X", "Y"])
    with pytest.raises(InputError, match="at least 2 occasions"):
        occ.detection_histories([[0, 1]], ["a"], ["X", "Y"])


def test_covariate_errors_name_the_sites():
    y = simulate(np.random.default_rng(11), 0.5, 0.5, 3, 6)
    y[0, 0] = 1
    h = histories(y, list("ABCDEF"))
    with pytest.raises(InputError, match="B, E"):
        occ._occupancy_iv(h, psi_covariates=["elev"], covariates={"elev": [1, None, 3, 4, "x", 6]})
    with pytest.raises(InputError, match="same value"):
        occ._occupancy_iv(h, psi_covariates=["elev"], covariates={"elev": [2] * 6})


def test_model_lines_are_parsed():
    models = occ.parse_models("psi: elev, green  p: effort\n\np: Green;; constant", ["elev", "green"], True)
    assert models == (occ.ModelTerms(("elev", "green"), ("effort",)), occ.ModelTerms((), ("green",)),
                      occ.ModelTerms())
    with pytest.raises(InputError, match="not a numeric field"):
        occ.parse_models("psi: slope", ["elev"], False)
    with pytest.raises(InputError, match="detection only"):
        occ.parse_models("psi: effort", ["elev"], True)


def test_models_are_ranked_by_aic():
    rng = np.random.default_rng(12)
    s, k = 150, 5
    cover = rng.normal(size=s)
    y = simulate(rng, special.expit(0.3 + 1.2 * cover), 0.4, k, s)
    models = occ.parse_models("psi: cover", ["cover"], False)
    result = fit(y, models=models, covariates={"cover": cover})
    labels = [f.terms.label for f in result.fits]
    assert labels == ["psi: constant; p: constant", "psi: cover; p: constant"]
    for f in result.fits:  # Akaike (1973): -2 log L + 2k
        assert f.aic == pytest.approx(-2 * f.log_likelihood + 2 * f.n_par)
    assert result.delta_aic[1] == 0.0 and result.delta_aic[0] > 2  # the true covariate wins clearly
    assert result.aic_weights.sum() == pytest.approx(1.0)
