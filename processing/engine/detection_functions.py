"""Detection functions of distance sampling, fitted to the recorded distances by maximum likelihood.

A detection function ``g(x)`` is the probability of seeing an animal (or a group) at distance
``x`` from the line or the point, with ``g(0) = 1`` (animals on the line or at the point are
always seen). Each model is a key function with an optional cosine series (Buckland et al.
2001, §2.3, key function plus series adjustment; section numbers from memory)::

    s(x) = k(x) · [1 + Σ_j a_j cos(j π x / w)],      g(x) = s(x) / s(0)

with the keys

* uniform:      k(x) = 1
* half-normal:  k(x) = exp(−x² / (2σ²))
* hazard-rate:  k(x) = 1 − exp(−(x / σ)^(−b))

and ``w`` the right-truncation distance. Adjusted models are fitted under the constraint that
``g`` is non-negative and does not increase with distance (checked on a grid of
``MONOTONE_GRID`` distances), as Buckland et al. (2001, §2.3) recommend.

Probability density of the recorded distances (Buckland et al. 2001, ch. 3)::

    lines:   f(x) = g(x) / μ,           μ = ∫_0^w g(x) dx       (the effective strip half-width)
    points:  f(r) = 2π r g(r) / ν,      ν = 2π ∫_0^w r g(r) dr  (the effective area, π ρ²)

so that the probability of detecting an animal within ``w`` is ``P_a = μ / w`` (lines) or
``ν / (π w²)`` (points), and the effective detection radius of a point is ``ρ = w √P_a``.
Grouped (binned) distances use the multinomial likelihood of the counts per band,
``Σ_j n_j log(∫_band f)``. Models are compared by AIC = 2q − 2 log L (Akaike 1973; Buckland
et al. 2001, §2.5); the fit is checked with a χ² test on distance bands and, for exact
distances, the Cramér–von Mises test (scipy.stats.cramervonmises).

Variances of P_a and of the effective width come from the inverse of the numerical Hessian of
the negative log-likelihood and the delta method (Buckland et al. 2001, ch. 3; Seber 1982).
Nothing here imports the host.
"""
from dataclasses import dataclass, field
import functools

import numpy as np
from scipy import optimize, special, stats

from .errors import QT_TRANSLATE_NOOP, Cancelled, InputError, message

HALF_NORMAL, HAZARD_RATE, UNIFORM = "half-normal", "hazard-rate", "uniform"
KEYS = (HALF_NORMAL, HAZARD_RATE, UNIFORM)  # the order of the algorithm's KEYS parameter
LINE, POINT = "line", "point"
SURVEYS = (LINE, POINT)
MONOTONE_GRID = 20  # distances in [0, w] at which the constraints are enforced
MAX_ADJUSTMENTS = 3
# the first cosine term of each key: the half-normal and hazard-rate keys already have a scale,
# so their series starts at order 2 (Buckland et al. 2001, §2.3; common practice)
FIRST_ORDER = {UNIFORM: 1, HALF_NORMAL: 2, HAZARD_RATE: 2}
KEY_PARAMETERS = {UNIFORM: (), HALF_NORMAL: ("sigma",), HAZARD_RATE: ("sigma", "shape")}
MIN_EXPECTED_PER_BIN = 5.0  # χ² bands are pooled until each expects 5 detections (common practice)
_GL_NODES, _GL_WEIGHTS = np.polynomial.legendre.leggauss(16)
_SUBDIVISIONS = 4  # each interval is integrated as 4 pieces of 16 Gauss-Legendre nodes
_WHOLE_RANGE_PIECES = 8
_SHOULDER = np.array([0.5, 0.7, 0.85, 0.95, 1.05, 1.2, 1.5, 2.0, 3.0])  # extra edges (× σ) for the hazard-rate
_LOG_SHAPE_BOUNDS = (0.0, np.log(50.0))  # hazard-rate shape b in [1, 50]
_PENALTY = 1e12


# --------------------------------------------------------------------------- data and models


@dataclass(frozen=True)
class DistanceData:
    """Distances ready for fitting: all within ``[0, truncation]``.

    Attributes
    ----------
    distances : numpy.ndarray
        Perpendicular (lines) or radial (points) distances in m.
    truncation : float
        The right-truncation distance ``w`` in m (``inf``: none, half-normal key only).
    survey : str
        ``"line"`` or ``"point"``.
    cutpoints : numpy.ndarray or None
        Band edges ``0 = c_0 < … < c_m = w`` for grouped distances, else None.
    bin_counts : numpy.ndarray or None
        Detections per band (grouped distances).
    """

    distances: np.ndarray = field(repr=False)
    truncation: float
    survey: str = LINE
    cutpoints: object = None
    bin_counts: object = None

    @property
    def n(self):
        return int(self.distances.size)

    @property
    def grouped(self):
        return self.cutpoints is not None


def distance_data_iv(distances, truncation, survey=LINE, cutpoints=None):
    """Check distances for fitting and return :class:`DistanceData`.

    Raises
    ------
    InputError
        For a distance that is missing, negative or beyond the truncation distance, for bad
        cutpoints, or for fewer than two distances.
    """
    x = np.asarray(distances, dtype=float).ravel()
    if survey not in SURVEYS:
        raise InputError(message(QT_TRANSLATE_NOOP(
            "PlotwiseEngine",
            "The survey type must be 'line' or 'point' (got '{survey}')."),
            survey=survey))
    w = float(truncation)
    if not w > 0:
        raise InputError(message(QT_TRANSLATE_NOOP(
            "PlotwiseEngine",
            "The truncation distance must be above 0 m (got {w:g} m)."),
            w=w))
    if not np.all(np.isfinite(x)):
        raise InputError(message(QT_TRANSLATE_NOOP(
            "PlotwiseEngine",
            "{count} distances are missing or not numbers. Fill them in or leave those detections out."),
            count=int(np.sum(~np.isfinite(x)))))
    if np.any(x < 0):
        raise InputError(message(QT_TRANSLATE_NOOP(
            "PlotwiseEngine",
            "{count} distances are negative. Distances are measured from the line or the point outwards and are 0 m "
            "or more; correct them."),
            count=int(np.sum(x < 0))))
    if np.any(x > w):
        raise InputError(message(QT_TRANSLATE_NOOP(
            "PlotwiseEngine",
            "{count} distances lie beyond the truncation distance of {w:g} m. Leave them out first (right truncation) "
            "or raise the truncation distance."),
            count=int(np.sum(x > w)), w=w))
    if x.size < 2:
        raise InputError(message(QT_TRANSLATE_NOOP(
            "PlotwiseEngine",
            "A detection function needs at least 2 distances (got {n})."),
            n=int(x.size)))
    if cutpoints is None:
        return DistanceData(x, w, survey)
    edges = np.asarray(cutpoints, dtype=float).ravel()
    if edges.size < 3 or edges[0] != 0 or np.any(np.diff(edges) <= 0) or not np.isclose(edges[-1], w):
        raise InputError(message(QT_TRANSLATE_NOOP(
            "PlotwiseEngine",
            "The distance bands must start at 0 m, increase, and end at the truncation distance {w:g} m, with at "
            "least two bands (got {cutpoints})."),
            w=w, cutpoints=", ".join(f"{c:g}" for c in edges)))
    counts = np.histogram(x, bins=edges)[0]
    return DistanceData(x, w, survey, edges, counts)


@dataclass(frozen=True)
class DetectionModel:
    """A key function and the orders of its cosine terms (``()``: the key alone)."""

    key: str
    orders: tuple = ()

    @property
    def n_key(self):
        return len(KEY_PARAMETERS[self.key])

    @property
    def n_par(self):
        return self.n_key + len(self.orders)

    @property
    def label(self):
        """Our label: ``half-normal``, ``hazard-rate with cosine 2``, ``uniform with cosine 1, 2``."""
        if not self.orders:
            return self.key
        return f"{self.key} with cosine {', '.join(str(o) for o in self.orders)}"

    @property
    def parameter_names(self):
        return KEY_PARAMETERS[self.key] + tuple(f"cos{o}" for o in self.orders)


# --------------------------------------------------------------------------- the functions


def key_function(key, x, sigma=1.0, shape=1.0):
    """The key ``k(x)`` (Buckland et al. 2001, §2.3): uniform, half-normal or hazard-rate."""
    x = np.asarray(x, dtype=float)
    if key == UNIFORM:
        return np.ones_like(x)
    if key == HALF_NORMAL:
        return np.exp(-0.5 * (x / sigma) ** 2)
    if key == HAZARD_RATE:
        with np.errstate(divide="ignore", over="ignore"):
            return -np.expm1(-((x / sigma) ** (-shape)))
    raise ValueError(f"unknown key function {key!r}")


def _unpack(model, theta):
    """``(sigma, shape, coefficients)`` from the working parameters (log scale for σ and b)."""
    theta = np.asarray(theta, dtype=float)
    sigma = float(np.exp(theta[0])) if model.n_key >= 1 else 1.0
    shape = float(np.exp(theta[1])) if model.n_key >= 2 else 1.0
    return sigma, shape, theta[model.n_key:]


def _series(model, theta, x, w):
    """The unnormalised detection function ``s(x) = k(x)·[1 + Σ a_j cos(j π x / w)]``."""
    sigma, shape, coefficients = _unpack(model, theta)
    s = key_function(model.key, x, sigma, shape)
    if model.orders:
        x = np.asarray(x, dtype=float)
        terms = sum(a * np.cos(order * np.pi * x / w) for a, order in zip(coefficients, model.orders))
        s = s * (1.0 + terms)
    return s


def _at_zero(model, theta):
    """``s(0) = 1 + Σ a_j`` (every key is 1 at 0)."""
    return 1.0 + float(np.sum(_unpack(model, theta)[2]))


def _series_gradient(model, theta, x, w):
    """``s(x)`` and its derivatives with respect to the working parameters, shape ``(q,) + x.shape``.

    Half-normal: ∂k/∂log σ = k x²/σ². Hazard-rate, with u = (x/σ)^(−b): ∂k/∂log σ = b u e^(−u),
    ∂k/∂log b = −b u e^(−u) log(x/σ). Cosine terms: ∂s/∂a_j = k cos(j π x / w).
    """
    sigma, shape, coefficients = _unpack(model, theta)
    x = np.asarray(x, dtype=float)
    if model.key == HAZARD_RATE:
        with np.errstate(divide="ignore", over="ignore", invalid="ignore"):
            log_ratio = np.log(x / sigma)  # −inf at x = 0
            u = np.exp(-shape * log_ratio)
            k = -np.expm1(-u)
            eu = np.where(u < 1e300, (1.0 - k) * u, 0.0)  # e^(−u) u → 0 at x = 0
            key_derivatives = [shape * eu, np.where(eu > 0, -shape * eu * log_ratio, 0.0)]
    else:
        k = key_function(model.key, x, sigma, shape)
        key_derivatives = [k * (x / sigma) ** 2] if model.key == HALF_NORMAL else []
    cosines = [np.cos(order * np.pi * x / w) for order in model.orders]
    series = 1.0 + sum(a * c for a, c in zip(coefficients, cosines)) if cosines else 1.0
    gradient = [d * series for d in key_derivatives] + [k * c for c in cosines]
    return k * series, np.stack(gradient) if gradient else np.zeros((0,) + x.shape)


def _uses_quadrature(model):
    return bool(model.orders) or model.key == HAZARD_RATE


def _closed_form_integrals(model, theta, edges, survey):
    """``∫ s`` (lines) or ``∫ 2πx s`` (points) over each interval, for the keys alone."""
    a, b = edges[:-1], edges[1:]
    if model.key == UNIFORM:
        return (b - a) if survey == LINE else np.pi * (b ** 2 - a ** 2)
    sigma = _unpack(model, theta)[0]
    if survey == LINE:  # ∫ exp(−x²/2σ²) dx = σ √(π/2) [erf(b/σ√2) − erf(a/σ√2)]
        root2 = np.sqrt(2.0) * sigma
        return sigma * np.sqrt(np.pi / 2.0) * (special.erf(b / root2) - special.erf(a / root2))
    # ∫ 2πr exp(−r²/2σ²) dr = 2πσ² [exp(−a²/2σ²) − exp(−b²/2σ²)]
    return 2.0 * np.pi * sigma ** 2 * (np.exp(-0.5 * (a / sigma) ** 2) - np.exp(-0.5 * (b / sigma) ** 2))


def _unit_rule():
    """Gauss-Legendre nodes and weights on [0, 1]: ``_SUBDIVISIONS`` pieces of 16 nodes each."""
    starts = np.arange(_SUBDIVISIONS) / _SUBDIVISIONS
    nodes = (starts[:, None] + (_GL_NODES + 1.0) / (2.0 * _SUBDIVISIONS)).ravel()
    weights = np.tile(_GL_WEIGHTS / (2.0 * _SUBDIVISIONS), _SUBDIVISIONS)
    return nodes, weights


_UNIT_NODES, _UNIT_WEIGHTS = _unit_rule()
_CDF_NODES = (np.polynomial.legendre.leggauss(8)[0] + 1.0) / 2.0  # 8 nodes and weights on [0, 1]
_CDF_WEIGHTS = np.polynomial.legendre.leggauss(8)[1] / 2.0


def _quadrature_rule(edges):
    """Gauss-Legendre nodes ``x`` (k, 64) and weights (k, 64) for the k intervals of ``edges``."""
    width = np.diff(edges)[:, None]
    return edges[:-1, None] + width * _UNIT_NODES, width * _UNIT_WEIGHTS


@functools.lru_cache(maxsize=64)
def _cached_rule(edges):
    return _quadrature_rule(np.asarray(edges, dtype=float))


def interval_integrals(model, theta, edges, w, survey=LINE, cached=False):
    """``∫ s(x) dx`` (lines) or ``∫ 2πx s(x) dx`` (points) over each interval of ``edges``.

    Closed forms for the half-normal and uniform keys alone; otherwise Gauss-Legendre
    quadrature with 64 nodes per interval.
    """
    edges = np.asarray(edges, dtype=float)
    if not model.orders and model.key in (HALF_NORMAL, UNIFORM):
        return _closed_form_integrals(model, theta, edges, survey)
    x, weights = _cached_rule(tuple(edges)) if cached else _quadrature_rule(edges)
    values = _series(model, theta, x, w)
    if survey == POINT:
        values = values * 2.0 * np.pi * x
    return np.sum(values * weights, axis=-1)


def _integrals_with_gradient(model, theta, edges, w, survey, cached=False):
    """Interval integrals of ``s`` (or ``2πx s``) and their gradients ``(q, k)``, by quadrature."""
    x, weights = _cached_rule(tuple(edges)) if cached else _quadrature_rule(np.asarray(edges, dtype=float))
    values, gradient = _series_gradient(model, theta, x, w)
    if survey == POINT:
        values, gradient = values * 2.0 * np.pi * x, gradient * 2.0 * np.pi * x
    return np.sum(values * weights, axis=-1), np.sum(gradient * weights, axis=-1)


def _whole_range_edges(model, theta, w):
    edges = _whole_range(w)
    if model.key == HAZARD_RATE:  # the shoulder near σ may be steep: more pieces about it
        # (edges repeated by the clipping make pieces of zero width, which add nothing)
        edges = np.sort(np.concatenate([edges, np.clip(np.exp(theta[0]) * _SHOULDER, 0.0, w)]))
    return edges


def log_likelihood_gradient(model, theta, data):
    """``(log L, ∂ log L / ∂θ)`` for models integrated by quadrature (see :func:`log_likelihood`)."""
    w = data.truncation
    edges = _whole_range_edges(model, theta, w)
    parts, d_parts = _integrals_with_gradient(model, theta, edges, w, data.survey, cached=model.key != HAZARD_RATE)
    total, d_total = np.sum(parts), np.sum(d_parts, axis=-1)
    if data.grouped:
        bands, d_bands = _integrals_with_gradient(model, theta, data.cutpoints, w, data.survey, cached=True)
        used = data.bin_counts > 0
        if not total > 0 or np.any(bands[used] <= 0):
            return -np.inf, np.zeros(theta.size)
        n_j = data.bin_counts[used]
        value = np.sum(n_j * np.log(bands[used] / total))
        return float(value), np.sum(n_j * d_bands[:, used] / bands[used], axis=-1) - n_j.sum() * d_total / total
    s, d_s = _series_gradient(model, theta, data.distances, w)
    if not total > 0 or not np.all(s > 0):
        return -np.inf, np.zeros(theta.size)
    value = np.sum(np.log(s)) - data.n * np.log(total)
    return float(value), np.sum(d_s / s, axis=-1) - data.n * d_total / total


def _total_integral(model, theta, w, survey):
    if not np.isfinite(w):
        return float(_closed_form_integrals(model, theta, np.array([0.0, np.inf]), survey)[0])
    edges = _whole_range_edges(model, theta, w)
    return float(np.sum(interval_integrals(model, theta, edges, w, survey, cached=model.key != HAZARD_RATE)))


@functools.lru_cache(maxsize=64)
def _whole_range(w):
    return np.linspace(0.0, w, _WHOLE_RANGE_PIECES + 1)


# --------------------------------------------------------------------------- likelihood


def log_likelihood(model, theta, data):
    """Log-likelihood of ``theta`` for the distances in ``data`` (:class:`DistanceData`).

    Exact distances: ``Σ log s(x_i) − n log ∫ s`` for lines, and for points the same with
    ``∫ 2πr s``, leaving out the constant ``Σ log 2π r_i``. Bands: ``Σ n_j log(P_j)``, with
    ``P_j`` the share of ``∫ s`` in band *j*. ``-inf`` where ``s`` is not positive.
    """
    w = data.truncation
    if data.grouped:
        parts = interval_integrals(model, theta, data.cutpoints, w, data.survey, cached=True)
        total = np.sum(parts)
        used = data.bin_counts > 0
        if not total > 0 or np.any(parts[used] <= 0):
            return -np.inf
        return float(np.sum(data.bin_counts[used] * np.log(parts[used] / total)))
    s = _series(model, theta, data.distances, w)
    total = _total_integral(model, theta, w, data.survey)
    if not total > 0 or not np.all(s > 0):
        return -np.inf
    return float(np.sum(np.log(s)) - data.n * np.log(total))


def _objective(model, data):
    """The negative log-likelihood per detection (with its gradient where the model is integrated by
    quadrature). Dividing by n keeps the optimiser's first step short whatever the sample size."""
    n = float(data.n)
    if _uses_quadrature(model):
        def negative_log_likelihood_and_gradient(theta):
            value, gradient = log_likelihood_gradient(model, theta, data)
            return (-value / n, -gradient / n) if np.isfinite(value) else (_PENALTY, np.zeros(theta.size))

        return negative_log_likelihood_and_gradient

    def negative_log_likelihood(theta):
        value = -log_likelihood(model, theta, data) / n
        return value if np.isfinite(value) else _PENALTY

    return negative_log_likelihood


def _scale_reference(data):
    return data.truncation if np.isfinite(data.truncation) else float(np.max(data.distances))


def _bounds(model, data):
    reference = _scale_reference(data)
    bounds = []
    if model.n_key >= 1:
        bounds.append((np.log(reference * 1e-3), np.log(reference * 1e3)))
    if model.n_key >= 2:
        bounds.append(_LOG_SHAPE_BOUNDS)
    return bounds + [(-50.0, 50.0)] * len(model.orders)


def _starting_points(model, data):
    """Starting values on the working scale: the key's from the moments of the distances, terms at 0."""
    x = data.distances
    terms = np.zeros(len(model.orders))
    if model.key == UNIFORM:
        return [terms]
    mean_square = float(np.mean(x ** 2)) if data.survey == LINE else float(np.mean(x ** 2)) / 2.0
    log_sigma = np.log(max(np.sqrt(mean_square), 1e-6 * _scale_reference(data)))
    if model.key == HALF_NORMAL:
        return [np.concatenate([[log_sigma], terms])]
    median = max(float(np.median(x)), 1e-3 * _scale_reference(data))
    return [np.concatenate([[np.log(median), np.log(b)], terms]) for b in (2.0, 5.0)]


def _shape_constraints(model, w):
    """Non-negative and non-increasing ``s`` on a grid of ``[0, w]`` (Buckland et al. 2001, §2.3)."""
    grid = np.linspace(0.0, w, MONOTONE_GRID + 1)

    def non_negative(theta):
        return _series(model, theta, grid, w) - 1e-9

    def non_increasing(theta):
        return -np.diff(_series(model, theta, grid, w))

    return [{"type": "ineq", "fun": non_negative}, {"type": "ineq", "fun": non_increasing}]


def _maximise(model, data, start):
    """Maximum-likelihood estimate of the working parameters; returns ``(theta, converged)``."""
    objective = _objective(model, data)
    with_gradient = _uses_quadrature(model)
    bounds = _bounds(model, data)
    starts = [np.asarray(start, dtype=float)] if start is not None else _starting_points(model, data)
    if model.n_par == 1 and not model.orders:  # one scale parameter: a bounded search on log σ
        result = optimize.minimize_scalar(lambda t: objective(np.array([t])), bounds=bounds[0], method="bounded",
                                          options={"xatol": 1e-10})
        return np.array([result.x]), bool(result.success and result.fun < _PENALTY)
    best = None
    for theta0 in starts:
        theta0 = np.clip(theta0, [b[0] for b in bounds], [b[1] for b in bounds])
        if model.orders:
            result = optimize.minimize(objective, theta0, jac=with_gradient, method="SLSQP", bounds=bounds,
                                       constraints=_shape_constraints(model, data.truncation),
                                       options={"maxiter": 300, "ftol": 1e-12})
            # SLSQP may end on 'positive directional derivative' at the optimum: judge by the constraints
            ok = result.success or (result.status == 8 and _satisfies_constraints(model, result.x, data.truncation))
        else:
            result = optimize.minimize(objective, theta0, jac=with_gradient, method="L-BFGS-B", bounds=bounds,
                                       options={"maxiter": 500, "ftol": 1e-13, "gtol": 1e-9})
            # a line search that cannot improve further at a flat optimum also counts (small gradient)
            ok = bool(result.success) or bool(np.max(np.abs(result.jac), initial=0.0) < 1e-6)
        ok = ok and result.fun < _PENALTY
        if best is None or (ok, -result.fun) > (best[1], -best[0].fun):
            best = (result, ok)
    return np.asarray(best[0].x, dtype=float), bool(best[1])


def _satisfies_constraints(model, theta, w, tolerance=1e-6):
    grid = np.linspace(0.0, w, MONOTONE_GRID + 1)
    s = _series(model, theta, grid, w)
    return bool(np.all(s >= -tolerance) and np.all(np.diff(s) <= tolerance))


def _numeric_hessian(function, theta, relative_step=1e-4):
    """Central-difference Hessian of ``function`` at ``theta``."""
    theta = np.asarray(theta, dtype=float)
    p = theta.size
    steps = relative_step * np.maximum(1.0, np.abs(theta))
    hessian = np.empty((p, p))
    f0 = function(theta)
    for i in range(p):
        ei = np.zeros(p)
        ei[i] = steps[i]
        hessian[i, i] = (function(theta + ei) - 2.0 * f0 + function(theta - ei)) / steps[i] ** 2
        for j in range(i + 1, p):
            ej = np.zeros(p)
            ej[j] = steps[j]
            value = (function(theta + ei + ej) - function(theta + ei - ej) - function(theta - ei + ej)
                     + function(theta - ei - ej)) / (4.0 * steps[i] * steps[j])
            hessian[i, j] = hessian[j, i] = value
    return hessian


def _numeric_gradient(function, theta, relative_step=1e-5):
    theta = np.asarray(theta, dtype=float)
    gradient = np.empty(theta.size)
    for i in range(theta.size):
        step = relative_step * max(1.0, abs(theta[i]))
        e = np.zeros(theta.size)
        e[i] = step
        gradient[i] = (function(theta + e) - function(theta - e)) / (2.0 * step)
    return gradient


# --------------------------------------------------------------------------- the fitted model


@dataclass(frozen=True)
class GoodnessOfFit:
    """χ² on distance bands (pooled to at least 5 expected each) and Cramér–von Mises.

    ``chi2_edges`` are the band edges after pooling, with ``observed`` and ``expected``
    detections per band. ``cvm``/``cvm_p`` are NaN for grouped distances.
    """

    chi2: float
    chi2_df: int
    chi2_p: float
    cvm: float
    cvm_p: float
    chi2_edges: tuple = ()
    observed: tuple = ()
    expected: tuple = ()


@dataclass(frozen=True)
class DetectionFit:
    """A detection function fitted by maximum likelihood.

    Attributes
    ----------
    model : DetectionModel
    survey : str
    truncation : float
        ``w`` in m.
    n : int
        Detections fitted.
    theta : numpy.ndarray
        Working parameters (log σ, log b, then the cosine coefficients).
    params : tuple of float
        Natural parameters (σ in m, b, coefficients), named by ``model.parameter_names``.
    vcov : numpy.ndarray
        Covariance of ``theta`` (inverse Hessian); NaN when the Hessian is not positive definite.
    log_lik, aic : float
    p_det, p_det_se : float
        Probability of detecting an animal within ``w`` and its standard error.
    esw, esw_se : float
        Effective strip half-width μ (lines) or effective detection radius ρ (points), m.
    gof : GoodnessOfFit or None
    converged, monotone, at_bound : bool
        The optimiser converged; g does not increase on a fine grid; a key parameter sits on a
        bound (a hazard-rate shape at 50 is a step function: treat with care).
    """

    model: DetectionModel
    survey: str
    truncation: float
    n: int
    theta: np.ndarray = field(repr=False, compare=False)
    params: tuple
    vcov: np.ndarray = field(repr=False, compare=False)
    log_lik: float
    aic: float
    p_det: float
    p_det_se: float
    esw: float
    esw_se: float
    gof: object = None
    converged: bool = True
    monotone: bool = True
    at_bound: bool = False

    @property
    def label(self):
        return self.model.label

    @property
    def n_par(self):
        return self.model.n_par

    @property
    def p_det_cv(self):
        return self.p_det_se / self.p_det if self.p_det > 0 else float("nan")

    @property
    def gof_p(self):
        """The p-value shown for the model: Cramér–von Mises for exact distances, else χ²."""
        if self.gof is None:
            return float("nan")
        return self.gof.cvm_p if np.isfinite(self.gof.cvm_p) else self.gof.chi2_p


def detection_curve(fit, x):
    """``g(x)`` of a fitted model (1 at 0)."""
    x = np.asarray(x, dtype=float)
    return _series(fit.model, fit.theta, x, fit.truncation) / _at_zero(fit.model, fit.theta)


def distance_pdf(fit, x):
    """The probability density of the recorded distances: ``g(x)/μ`` (lines), ``2πr g(r)/ν`` (points)."""
    x = np.asarray(x, dtype=float)
    total = _total_integral(fit.model, fit.theta, fit.truncation, fit.survey)
    s = _series(fit.model, fit.theta, x, fit.truncation)
    return (s if fit.survey == LINE else 2.0 * np.pi * x * s) / total


def _detection_summary(model, theta, w, survey):
    """``(P_a, effective width)``: μ = ∫g and P_a = μ/w (lines); ν = ∫2πr g, ρ = √(ν/π), P_a = ν/(πw²)."""
    effective = _total_integral(model, theta, w, survey) / _at_zero(model, theta)
    if survey == LINE:
        return (effective / w if np.isfinite(w) else float("nan")), effective
    return (effective / (np.pi * w * w) if np.isfinite(w) else float("nan")), float(np.sqrt(effective / np.pi))


def _covariance(model, theta, data):
    """Inverse of the numerical Hessian of the negative log-likelihood (NaN if not positive definite)."""
    p = theta.size
    hessian = _numeric_hessian(lambda t: -log_likelihood(model, t, data), theta)
    if not np.all(np.isfinite(hessian)):
        return np.full((p, p), np.nan)
    hessian = 0.5 * (hessian + hessian.T)
    if np.min(np.linalg.eigvalsh(hessian)) <= 0:
        return np.full((p, p), np.nan)
    return np.linalg.inv(hessian)


def _delta_se(function, theta, vcov):
    """Delta-method standard error of ``function(theta)`` (Seber 1982): √(∇fᵀ V ∇f)."""
    if theta.size == 0:
        return 0.0
    gradient = _numeric_gradient(function, theta)
    variance = float(gradient @ vcov @ gradient)
    return float(np.sqrt(variance)) if variance >= 0 else float("nan")


def _band_counts(x, edges):
    """Detections per band ``[c_j, c_j+1)``, the last band closed (edges may end at inf)."""
    index = np.clip(np.searchsorted(edges, x, side="right") - 1, 0, edges.size - 2)
    return np.bincount(index, minlength=edges.size - 1)


def _pool_bands(edges, observed, expected, minimum=MIN_EXPECTED_PER_BIN):
    """Join neighbouring bands, from 0 outwards, until each expects at least ``minimum`` detections."""
    kept_edges, pooled_o, pooled_e = [edges[0]], [], []
    acc_o = acc_e = 0.0
    for j in range(observed.size):
        acc_o, acc_e = acc_o + observed[j], acc_e + expected[j]
        if acc_e >= minimum:
            pooled_o.append(acc_o)
            pooled_e.append(acc_e)
            kept_edges.append(edges[j + 1])
            acc_o = acc_e = 0.0
    if acc_e > 0 or acc_o > 0:
        if pooled_e:
            pooled_o[-1] += acc_o
            pooled_e[-1] += acc_e
            kept_edges[-1] = edges[-1]
        else:
            pooled_o, pooled_e, kept_edges = [acc_o], [acc_e], [edges[0], edges[-1]]
    return np.array(kept_edges), np.array(pooled_o), np.array(pooled_e)


def chi_square_bands(data):
    """Bands for the χ² test: the recorded bands, else ``√n`` equal bands (5 to 20) over ``[0, w]``."""
    if data.grouped:
        return data.cutpoints, data.bin_counts
    k = int(np.clip(round(np.sqrt(data.n)), 5, 20))
    top = data.truncation if np.isfinite(data.truncation) else float(np.max(data.distances))
    edges = np.linspace(0.0, top, k + 1)
    edges[-1] = data.truncation
    return edges, _band_counts(data.distances, edges)


def goodness_of_fit(model, theta, data):
    """χ² on bands and Cramér–von Mises on exact distances for a fitted model.

    χ² = Σ (o − e)² / e on bands pooled to at least 5 expected detections, with
    ``bands − 1 − q`` degrees of freedom (Buckland et al. 2001, §3.4, from memory). The
    Cramér–von Mises p-value treats the fitted cdf as known (scipy.stats.cramervonmises), so
    with estimated parameters it is conservative (too large).
    """
    w = data.truncation
    edges, observed = chi_square_bands(data)
    parts = interval_integrals(model, theta, edges, w, data.survey)
    expected = data.n * parts / np.sum(parts)
    pooled_edges, o, e = _pool_bands(edges, observed.astype(float), expected)
    df = int(o.size - 1 - model.n_par)
    chi2 = float(np.sum((o - e) ** 2 / e))
    chi2_p = float(stats.chi2.sf(chi2, df)) if df > 0 else float("nan")
    cvm = cvm_p = float("nan")
    if not data.grouped:
        result = stats.cramervonmises(data.distances, lambda x: _fitted_cdf(model, theta, data, x))
        cvm, cvm_p = float(result.statistic), float(result.pvalue)
    return GoodnessOfFit(chi2, df, chi2_p, cvm, cvm_p, tuple(pooled_edges), tuple(o), tuple(e))


def _fitted_cdf(model, theta, data, x):
    """``F(x) = ∫_0^x f`` at each ``x`` (integrals between the sorted values, added up)."""
    x = np.asarray(x, dtype=float)
    order = np.argsort(x)
    edges = np.concatenate([[0.0], np.minimum(x[order], data.truncation)])
    if not model.orders and model.key in (HALF_NORMAL, UNIFORM):
        parts = interval_integrals(model, theta, edges, data.truncation, data.survey)
    else:  # the gaps between sorted distances are short: 8 Gauss-Legendre nodes each are plenty
        width = np.diff(edges)[:, None]
        nodes = edges[:-1, None] + width * _CDF_NODES
        values = _series(model, theta, nodes, data.truncation)
        if data.survey == POINT:
            values = values * 2.0 * np.pi * nodes
        parts = np.sum(values * width * _CDF_WEIGHTS, axis=-1)
    cumulative = np.cumsum(parts)
    total = _total_integral(model, theta, data.truncation, data.survey)
    out = np.empty_like(x)
    out[order] = np.clip(cumulative / total, 0.0, 1.0)
    return out


def _at_a_bound(model, theta, data):
    bounds = _bounds(model, data)[:model.n_key]
    return any(abs(t - lo) < 1e-6 or abs(t - hi) < 1e-6 for t, (lo, hi) in zip(theta, bounds))


def _natural_parameters(model, theta):
    sigma, shape, coefficients = _unpack(model, theta)
    return tuple([sigma, shape][:model.n_key] + [float(a) for a in coefficients])


def fit_detection_function(data, model, start=None, variance=True, goodness=True):
    """Fit one detection function by maximum likelihood.

    Parameters
    ----------
    data : DistanceData
        From :func:`distance_data_iv`.
    model : DetectionModel
    start : array_like, optional
        Starting working parameters (log σ, log b, coefficients).
    variance, goodness : bool
        Compute the covariance (numerical Hessian) and the goodness-of-fit tests.

    Returns
    -------
    DetectionFit
    """
    if not np.isfinite(data.truncation) and (model.key != HALF_NORMAL or model.orders):
        raise InputError(message(QT_TRANSLATE_NOOP(
            "PlotwiseEngine",
            "Without a truncation distance only the half-normal key alone can be fitted; give a truncation distance "
            "for {model}."),
            model=model.label))
    free = (data.bin_counts.size - 1) if data.grouped else data.n - 1
    if model.n_par > free:
        raise InputError(message(QT_TRANSLATE_NOOP(
            "PlotwiseEngine",
            "The model {model} has {q} parameters, more than the {free} the distances can support. Use fewer cosine "
            "terms or more distance bands."),
            model=model.label, q=model.n_par, free=free))
    if model.n_par == 0:
        theta, converged = np.zeros(0), True
    else:
        theta, converged = _maximise(model, data, start)
    log_lik = log_likelihood(model, theta, data)
    p_det, esw = _detection_summary(model, theta, data.truncation, data.survey)
    p = theta.size
    vcov = _covariance(model, theta, data) if (variance and p) else np.full((p, p), 0.0 if not p else np.nan)
    p_se = _delta_se(lambda t: _detection_summary(model, t, data.truncation, data.survey)[0], theta, vcov)
    esw_se = _delta_se(lambda t: _detection_summary(model, t, data.truncation, data.survey)[1], theta, vcov)
    fine = np.linspace(0.0, data.truncation if np.isfinite(data.truncation) else np.max(data.distances), 201)
    s = _series(model, theta, fine, data.truncation)
    return DetectionFit(
        model=model, survey=data.survey, truncation=data.truncation, n=data.n, theta=theta,
        params=_natural_parameters(model, theta), vcov=vcov, log_lik=log_lik,
        aic=2.0 * model.n_par - 2.0 * log_lik, p_det=float(p_det), p_det_se=p_se, esw=float(esw), esw_se=esw_se,
        gof=goodness_of_fit(model, theta, data) if goodness else None,
        converged=bool(converged and np.isfinite(log_lik)),
        monotone=bool(np.all(np.diff(s) <= 1e-6 * max(s[0], 1e-300)) and np.all(s >= -1e-9)),
        at_bound=_at_a_bound(model, theta, data) if p else False,
    )


# --------------------------------------------------------------------------- model selection


@dataclass(frozen=True)
class ModelSelection:
    """Every model fitted, in the order fitted, and the one AIC chose.

    ``fits[chosen]`` has the smallest AIC among the models that converged.
    """

    fits: tuple
    chosen: int

    @property
    def best(self):
        return self.fits[self.chosen]

    def delta_aic(self, i):
        return self.fits[i].aic - self.best.aic


def select_detection_function(data, keys=KEYS, max_adjustments=MAX_ADJUSTMENTS, progress=None):
    """Fit each key, add cosine terms while AIC improves, and choose the model with the smallest AIC.

    For each key the key alone is fitted first; cosine terms of increasing order
    (``FIRST_ORDER[key]``, then the next) are added one at a time, under the monotonicity
    constraint, for as long as each lowers AIC, up to ``max_adjustments`` terms (forward
    selection, Buckland et al. 2001, §2.5, from memory). Every model tried is kept for the table.

    Parameters
    ----------
    progress : callable, optional
        ``progress(fraction) -> cancelled``, called after each fit.

    Returns
    -------
    ModelSelection
    """
    keys = tuple(dict.fromkeys(keys))
    if not keys or any(k not in KEYS for k in keys):
        raise InputError(message(QT_TRANSLATE_NOOP(
            "PlotwiseEngine",
            "Choose at least one key function among half-normal, hazard-rate and uniform.")))
    fits = []
    planned = len(keys) * (1 + max(int(max_adjustments), 0))
    for key in keys:
        best = _fit_or_none(data, DetectionModel(key), None)
        if best is not None:
            fits.append(best)
        for step in range(max(int(max_adjustments), 0)):
            if best is None:
                break
            model = DetectionModel(key, best.model.orders + (FIRST_ORDER[key] + step,))
            candidate = _fit_or_none(data, model, np.concatenate([best.theta, [0.0]]))
            if candidate is None:
                break
            fits.append(candidate)
            if progress is not None and progress(len(fits) / planned):
                raise Cancelled()
            if not candidate.converged or not candidate.aic < best.aic:
                break
            best = candidate
        if progress is not None and progress(len(fits) / planned):
            raise Cancelled()
    usable = [i for i, f in enumerate(fits) if f.converged and np.isfinite(f.aic)]
    if not usable:
        raise InputError(message(QT_TRANSLATE_NOOP(
            "PlotwiseEngine",
            "No detection function could be fitted to these {n} distances. Check the distances and the truncation "
            "distance."),
            n=data.n))
    chosen = min(usable, key=lambda i: fits[i].aic)
    return ModelSelection(tuple(fits), chosen)


def _fit_or_none(data, model, start):
    """The fit, or None when the model has more parameters than the data support."""
    free = (data.bin_counts.size - 1) if data.grouped else data.n - 1
    if model.n_par > free or (not np.isfinite(data.truncation) and (model.key != HALF_NORMAL or model.orders)):
        return None
    return fit_detection_function(data, model, start)
