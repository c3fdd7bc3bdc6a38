"""Single-season occupancy from repeat visits (MacKenzie et al. 2002).

Each of ``s`` sites is visited on up to ``K`` occasions; ``y_ij`` is 1 when the
species was detected at site ``i`` on occasion ``j``, 0 when it was not, and the
occasion is left out where the site was not surveyed (``m_ij = 0``). A site is
occupied with probability ``psi_i``; at an occupied site each survey detects the
species with probability ``p_ij``, independently. The likelihood of site ``i``
is (MacKenzie et al. 2002, eq. 2 with missing observations, their §2.2)

    L_i = psi_i a_i + (1 - psi_i) I(no detection at i),
    a_i = prod_j [p_ij^y_ij (1 - p_ij)^(1 - y_ij)]^m_ij,

and both probabilities are linear on the logit scale:
``logit psi_i = x_i beta`` (site covariates) and ``logit p_ij = w_ij alpha``
(site covariates and an occasion-level effort).

Maximum likelihood
------------------
The log-likelihood is maximised with ``scipy.optimize.minimize`` (BFGS, with the
analytic gradient), then polished by Newton steps with the analytic Hessian.
The derivatives follow from the complete-data log-likelihood with the latent
occupancy state ``z_i`` and Louis (1982)'s identity
``H = E[d2 l_c] + Var[d l_c]`` given the data: with ``r_i`` the probability that
site ``i`` is occupied given its history (``psi_cond``),

    d l / d eta_i       = r_i - psi_i
    d l / d zeta_ij     = r_i m_ij (y_ij - p_ij)
    d2 l / d eta_i2     = -psi_i (1 - psi_i) + r_i (1 - r_i)
    d2 l / d zeta_ij zeta_ik = -r_i m_ij p_ij (1 - p_ij) [j = k] + r_i (1 - r_i) e_ij e_ik
    d2 l / d eta_i zeta_ij   = r_i (1 - r_i) e_ij,      e_ij = m_ij (y_ij - p_ij).

Standard errors come from the observed information (the negative Hessian at
the maximum); intervals are ``estimate +- z SE`` on the logit scale,
back-transformed. Covariates are centred and scaled (mean 0, SD 1 over the
sites used) for the fit and the coefficients are reported in the covariates' own
units (a linear map of the estimates and their covariance).

References
----------
MacKenzie, D. I., Nichols, J. D., Lachman, G. B., Droege, S., Royle, J. A. &
Langtimm, C. A. (2002). Estimating site occupancy rates when detection
probabilities are less than one. Ecology 83, 2248-2255.
MacKenzie, D. I. & Bailey, L. L. (2004). Assessing the fit of site-occupancy
models. Journal of Agricultural, Biological, and Environmental Statistics 9,
300-318.
MacKenzie, D. I. & Royle, J. A. (2005). Designing occupancy studies: general
advice and allocating survey effort. Journal of Applied Ecology 42, 1105-1114.
Louis, T. A. (1982). Finding the observed information matrix when using the EM
algorithm. Journal of the Royal Statistical Society B 44, 226-233.
"""
from dataclasses import dataclass
import itertools
import math
import re

import numpy as np
from scipy import optimize, special

from .errors import QT_TRANSLATE_NOOP, Cancelled, InputError, message
from .listing import listed_ids

EFFORT = "effort"  # the name of the occasion-level effort in a model
CONSTANT = "const"
#: a parameter beyond this on the logit scale of the centred and scaled fit sits at the boundary of
#: the parameter space (a probability within 3e-4 of 0 or 1, or a covariate that separates the sites)
BOUNDARY_LOGIT = 8.0
CUMULATIVE_TARGET = 0.95  # cumulative detection the occasions advice aims at
MAX_GOF_CELLS = 20_000_000  # histories x sites the goodness-of-fit may enumerate (memory bound)
MAX_GOF_OCCASIONS = 16


# ----------------------------------------------------------------------------
# input
# ----------------------------------------------------------------------------
@dataclass(frozen=True)
class ModelTerms:
    """Covariates of one model: site covariates for psi, site covariates and ``effort`` for p."""

    psi: tuple = ()
    p: tuple = ()

    @property
    def label(self):
        """Our own short label, ``psi: elev + green; p: effort`` (``constant`` without covariates)."""
        return "psi: {}; p: {}".format(" + ".join(self.psi) or "constant", " + ".join(self.p) or "constant")

    @property
    def site_covariates(self):
        return tuple(dict.fromkeys(c for c in self.psi + self.p if c != EFFORT))


@dataclass(frozen=True, eq=False)
class DetectionHistories:
    """Checked detection histories.

    Attributes
    ----------
    site_ids : tuple
        Ids of every input site, in input order.
    y : ndarray, shape (n_all, K)
        1 detected, 0 not detected, NaN not surveyed.
    occasions : tuple of str
        The history fields, in occasion order.
    kept : ndarray of bool, shape (n_all,)
        Sites with at least one surveyed occasion (the others are left out).
    """

    site_ids: tuple
    y: np.ndarray
    occasions: tuple
    kept: np.ndarray

    @property
    def left_out(self):
        return tuple(i for i, k in zip(self.site_ids, self.kept) if not k)

    @property
    def n_occasions(self):
        return self.y.shape[1]


def _history_value(value):
    """1.0, 0.0, NaN (NULL) or None for a value that is none of these."""
    if value is None:
        return math.nan
    if isinstance(value, bool):
        return float(value)
    if isinstance(value, (int, float, np.integer, np.floating)):
        v = float(value)
        if v != v:
            return math.nan
        return v if v in (0.0, 1.0) else None
    text = str(value).strip()
    if text == "" or text.upper() == "NULL":
        return math.nan
    return {"0": 0.0, "1": 1.0, "0.0": 0.0, "1.0": 1.0}.get(text)


def detection_histories(columns, occasions, site_ids, layer="SITES"):
    """Check the history fields and return :class:`DetectionHistories`.

    Parameters
    ----------
    columns : sequence of sequences
        One sequence of values per occasion (history field), aligned with ``site_ids``.
    occasions : sequence of str
        The history fields' names (for messages).
    site_ids : sequence
        One id per site (the site id field, or the feature ids).

    Raises
    ------
    InputError
        A value other than 0, 1 or NULL (naming the field and the sites), fewer
        than two occasions, repeated or empty site ids, or no surveyed site.
    """
    occasions, site_ids = tuple(str(o) for o in occasions), tuple(site_ids)
    if len(occasions) < 2:
        raise InputError(message(QT_TRANSLATE_NOOP("PlotwiseEngine",
                                 "Layer {layer}: occupancy needs at least 2 occasions (history fields); {n} given. "
                                 "With one visit per site, detection and occupancy cannot be told apart."),
                                 layer=layer, n=len(occasions)))
    _check_site_ids(site_ids, layer)
    y = np.full((len(site_ids), len(occasions)), np.nan)
    for j, (name, values) in enumerate(zip(occasions, columns)):
        parsed = [_history_value(v) for v in values]
        bad = [sid for sid, v in zip(site_ids, parsed) if v is None]
        if bad:
            raise InputError(message(
                QT_TRANSLATE_NOOP("PlotwiseEngine",
                "Layer {layer}, history field {field}: sites {ids} hold a value other than 1 (detected), 0 (not "
                "detected) or NULL (not surveyed). Correct these values and run again."),
                layer=layer, field=name, ids=listed_ids(bad)), ids=bad)
        y[:, j] = parsed
    kept = ~np.isnan(y).all(axis=1)
    if not kept.any():
        raise InputError(message(QT_TRANSLATE_NOOP("PlotwiseEngine",
                                 "Layer {layer}: no site was surveyed on any occasion (every history value is "
                                 "NULL)."), layer=layer))
    if np.nansum(y[kept]) == 0:
        raise InputError(message(QT_TRANSLATE_NOOP("PlotwiseEngine",
                                 "Layer {layer}: the species was not detected at any site, so occupancy and "
                                 "detection cannot be estimated (every history is 0)."), layer=layer))
    return DetectionHistories(site_ids, y, occasions, kept)


def _check_site_ids(site_ids, layer):
    empty = [i for i, sid in enumerate(site_ids) if sid is None or str(sid).strip() == ""]
    if empty:
        raise InputError(message(QT_TRANSLATE_NOOP("PlotwiseEngine",
                                 "Layer {layer}: {n} sites have an empty (NULL) site id. Give every site an id, or "
                                 "leave SITE_ID_FIELD empty to use the feature ids."), layer=layer, n=len(empty)))
    seen, repeated = set(), []
    for sid in site_ids:
        key = str(sid)
        if key in seen and key not in repeated:
            repeated.append(key)
        seen.add(key)
    if repeated:
        raise InputError(message(QT_TRANSLATE_NOOP("PlotwiseEngine",
                                 "Layer {layer}: site ids {ids} occur more than once. Each site needs one row "
                                 "holding all its occasions; merge the rows or correct the ids."),
                                 layer=layer, ids=listed_ids(repeated)), ids=repeated)


_PART = re.compile(r"\b(psi|p)\s*:", re.IGNORECASE)


def parse_models(text, fields, has_effort):
    """Covariate sets from model lines.

    Each model is a line (or a part of a line after ``;;``) such as
    ``psi: elevation, greenness  p: effort`` (terms separated by commas or
    ``+``; a missing part is constant; ``psi:`` alone, or ``constant``, is the
    constant model). ``effort`` names the occasion-level effort fields.

    Returns
    -------
    tuple of ModelTerms
    """
    models = []
    for line in re.split(r"\n|;;", text or ""):
        line = line.strip()
        if not line:
            continue
        parts = _PART.split(line)
        if parts[0].strip() and parts[0].strip().lower() != "constant":
            raise InputError(message(QT_TRANSLATE_NOOP("PlotwiseEngine",
                                     "Model line {line!r}: write the occupancy terms after psi: and the detection "
                                     "terms after p:, for example psi: elevation p: effort."), line=line))
        terms = {"psi": [], "p": []}
        for key, body in zip(parts[1::2], parts[2::2]):
            names = [t.strip() for t in re.split(r"[,+]", body) if t.strip()]
            terms[key.lower()] += [n for n in names if n.lower() != "constant"]
        for key in ("psi", "p"):
            terms[key] = _model_field_names(terms[key], key, fields, has_effort, line)
        models.append(ModelTerms(tuple(dict.fromkeys(terms["psi"])), tuple(dict.fromkeys(terms["p"]))))
    return tuple(models)


def _model_field_names(names, part, fields, has_effort, line):
    out = []
    lookup = {f.lower(): f for f in fields}
    for name in names:
        if name.lower() == EFFORT and has_effort and name not in fields:
            if part == "psi":
                raise InputError(message(QT_TRANSLATE_NOOP("PlotwiseEngine",
                                         "Model line {line!r}: effort varies by occasion and acts on detection only; "
                                         "move it after p:."), line=line))
            out.append(EFFORT)
        elif name in fields or name.lower() in lookup:
            out.append(name if name in fields else lookup[name.lower()])
        else:
            raise InputError(message(
                QT_TRANSLATE_NOOP("PlotwiseEngine",
                "Model line {line!r}: {name} is not a numeric field of the sites layer (give EFFORT_FIELDS to use "
                "effort). Use the field names as they are in the layer.") if name.lower() == EFFORT else
                QT_TRANSLATE_NOOP("PlotwiseEngine",
                "Model line {line!r}: {name} is not a numeric field of the sites layer. Use the field names as they "
                "are in the layer."), line=line, name=name))
    return out


@dataclass(frozen=True, eq=False)
class OccupancyInput:
    """Everything the analysis needs, checked (:func:`_occupancy_iv`)."""

    histories: DetectionHistories
    main: ModelTerms
    models: tuple  # every model of the comparison, ``main`` first
    covariates: dict  # name -> (n_kept,) float
    effort: object  # (n_kept, K) float or None
    confidence: float
    target_se: float
    gof_replicates: int


def _occupancy_iv(histories, psi_covariates=(), p_covariates=(), covariates=None, effort=None,
                    models=(), confidence=0.95, target_se=0.05, gof_replicates=0, layer="SITES",
                    effort_fields=()):
    """Validate the analysis' inputs (the ``_iv`` step) and return :class:`OccupancyInput`.

    ``covariates`` maps a field name to its values at every input site (None or
    NaN for NULL); ``effort`` is an (n_all, K) array aligned with the history
    fields. The main model uses ``psi_covariates`` and ``p_covariates`` (plus
    ``effort`` when given); ``models`` (from :func:`parse_models`) are compared
    with it by AIC, and the constant model is always among them.
    """
    if not 0.5 <= confidence < 1.0:
        raise InputError(message(QT_TRANSLATE_NOOP("PlotwiseEngine",
                                 "CONFIDENCE must be at least 0.5 and below 1; it is {value}."), value=confidence))
    if not target_se >= 0:
        raise InputError(message(QT_TRANSLATE_NOOP("PlotwiseEngine",
                                 "TARGET_SE must be 0 (no advice) or more; it is {value}."), value=target_se))
    if gof_replicates < 0 or int(gof_replicates) != gof_replicates:
        raise InputError(message(QT_TRANSLATE_NOOP("PlotwiseEngine",
                                 "The number of goodness-of-fit replicates must be 0 or a positive whole number.")))
    covariates = dict(covariates or {})
    main = ModelTerms(tuple(psi_covariates), tuple(p_covariates) + ((EFFORT,) if effort is not None else ()))
    all_models = [main] + [m for m in (ModelTerms(),) + tuple(models) if m != main]
    all_models = list(dict.fromkeys(all_models))
    values = {}
    for name in dict.fromkeys(c for m in all_models for c in m.site_covariates):
        values[name] = _covariate_values(covariates, name, histories, layer)
    effort_kept = None
    if effort is not None:
        effort_kept = _effort_values(np.asarray(effort, dtype=object), histories, layer, effort_fields)
    elif any(EFFORT in m.p for m in all_models):
        raise InputError(message(QT_TRANSLATE_NOOP("PlotwiseEngine",
                                 "A model uses effort but no EFFORT_FIELDS were given.")))
    return OccupancyInput(histories, main, tuple(all_models), values, effort_kept, float(confidence),
                          float(target_se), int(gof_replicates))


def _as_float(value):
    if value is None or isinstance(value, bool):
        return math.nan
    try:
        return float(value)
    except (TypeError, ValueError):
        return None


def _covariate_values(covariates, name, histories, layer):
    if name not in covariates:
        raise InputError(message(QT_TRANSLATE_NOOP("PlotwiseEngine",
                                 "Layer {layer} has no covariate field {field}."), layer=layer, field=name))
    raw = [_as_float(v) for v, k in zip(covariates[name], histories.kept) if k]
    ids = [s for s, k in zip(histories.site_ids, histories.kept) if k]
    bad = [sid for sid, v in zip(ids, raw) if v is None or not math.isfinite(v)]
    if bad:
        raise InputError(message(QT_TRANSLATE_NOOP("PlotwiseEngine",
                                 "Layer {layer}, covariate field {field}: surveyed sites {ids} have no number (NULL "
                                 "or text). Fill in the values, leave these sites out, or drop the covariate."),
                                 layer=layer, field=name, ids=listed_ids(bad)), ids=bad)
    values = np.asarray(raw, dtype=float)
    if np.ptp(values) == 0:
        raise InputError(message(QT_TRANSLATE_NOOP("PlotwiseEngine",
                                 "Layer {layer}, covariate field {field}: every surveyed site has the same value "
                                 "({value:g}), so its effect cannot be estimated. Drop it from the model."),
                                 layer=layer, field=name, value=float(values[0])))
    return values


def _effort_values(effort, histories, layer, effort_fields):
    if effort.shape != histories.y.shape:
        raise InputError(message(QT_TRANSLATE_NOOP("PlotwiseEngine",
                                 "Give one effort field per history field, in the same order: {k} history fields "
                                 "and {e} effort fields."), k=histories.y.shape[1],
                                 e=effort.shape[1] if effort.ndim == 2 else 0))
    kept = histories.kept
    parsed = [[_as_float(v) for v in row] for row in effort[kept]]
    values = np.array([[math.nan if v is None else v for v in row] for row in parsed], dtype=float)
    surveyed = ~np.isnan(histories.y[kept])
    unusable = np.array([[v is None for v in row] for row in parsed], dtype=bool).reshape(values.shape)
    unusable |= ~np.isfinite(values) | (np.nan_to_num(values) < 0)
    bad_cell = unusable & surveyed
    if bad_cell.any():
        ids = [s for s, k in zip(histories.site_ids, kept) if k]
        bad = [sid for sid, row in zip(ids, bad_cell) if row.any()]
        fields = [effort_fields[j] if j < len(effort_fields) else str(j + 1) for j in np.flatnonzero(bad_cell.any(0))]
        raise InputError(message(QT_TRANSLATE_NOOP("PlotwiseEngine",
                                 "Layer {layer}, effort fields {fields}: surveyed sites {ids} have no effort, or a "
                                 "negative one, on an occasion they were surveyed. Give every survey its effort."),
                                 layer=layer, fields=", ".join(fields), ids=listed_ids(bad)), ids=bad)
    out = np.where(surveyed, values, np.nan)
    if np.nanstd(out) == 0:
        raise InputError(message(QT_TRANSLATE_NOOP("PlotwiseEngine",
                                 "Layer {layer}: the effort is the same on every survey, so its effect cannot be "
                                 "estimated. Leave EFFORT_FIELDS empty."), layer=layer))
    return out


# ----------------------------------------------------------------------------
# design matrices and the likelihood
# ----------------------------------------------------------------------------
@dataclass(frozen=True, eq=False)
class ModelData:
    """Detection data and the centred and scaled design of one model.

    ``X`` (s, a) and ``W`` (s, K, b) start with a column of ones; ``to_original``
    maps the fitted parameters onto the covariates' own units.
    """

    terms: ModelTerms
    y: np.ndarray  # (s, K) 0/1, 0 where not surveyed
    surveyed: np.ndarray  # (s, K) bool
    X: np.ndarray
    W: np.ndarray
    names: tuple
    to_original: np.ndarray

    @property
    def n_psi(self):
        return self.X.shape[1]

    @property
    def detected(self):
        return (self.y * self.surveyed).sum(axis=1) > 0


def _scaled(values, mask=None):
    v = values[mask] if mask is not None else values
    centre, scale = float(np.mean(v)), float(np.std(v))
    return (values - centre) / scale, centre, scale


def model_data(inp, terms):
    """The :class:`ModelData` of ``terms`` on the kept sites of ``inp``."""
    y_all = inp.histories.y[inp.histories.kept]
    surveyed = ~np.isnan(y_all)
    s, k = y_all.shape
    x_cols, w_cols, names = [np.ones(s)], [np.ones((s, k))], ["logit_psi:" + CONSTANT]
    shifts_psi, shifts_p = [(0.0, 1.0)], [(0.0, 1.0)]
    for name in terms.psi:
        col, centre, scale = _scaled(inp.covariates[name])
        x_cols.append(col)
        shifts_psi.append((centre, scale))
        names.append("logit_psi:" + name)
    names.append("logit_p:" + CONSTANT)
    for name in terms.p:
        if name == EFFORT:
            col, centre, scale = _scaled(np.nan_to_num(inp.effort), surveyed)
            w_cols.append(np.where(surveyed, col, 0.0))
        else:
            col, centre, scale = _scaled(inp.covariates[name])
            w_cols.append(np.repeat(col[:, None], k, axis=1))
        shifts_p.append((centre, scale))
        names.append("logit_p:" + name)
    return ModelData(terms, np.nan_to_num(y_all), surveyed, np.stack(x_cols, axis=1), np.stack(w_cols, axis=2),
                     tuple(names), _original_map(shifts_psi, shifts_p))


def _original_map(shifts_psi, shifts_p):
    """Matrix ``A`` with ``theta_original = A theta_scaled``: slopes ``b / s``, intercept ``b0 - sum b c / s``."""
    blocks = []
    for shifts in (shifts_psi, shifts_p):
        n = len(shifts)
        block = np.zeros((n, n))
        block[0, 0] = 1.0
        for j, (centre, scale) in enumerate(shifts[1:], start=1):
            block[j, j] = 1.0 / scale
            block[0, j] = -centre / scale
        blocks.append(block)
    a, b = (blk.shape[0] for blk in blocks)
    out = np.zeros((a + b, a + b))
    out[:a, :a], out[a:, a:] = blocks
    return out


def _log_expit(x):
    """``log(1 / (1 + exp(-x)))`` without overflow (faster than scipy's log_expit on large arrays)."""
    return -np.logaddexp(0.0, -x)


@dataclass(frozen=True, eq=False)
class LogLikelihood:
    """The log-likelihood at ``theta`` with its gradient and Hessian, and the fitted probabilities."""

    value: float
    gradient: np.ndarray
    hessian: np.ndarray
    psi: np.ndarray  # (s,)
    p: np.ndarray  # (s, K)
    psi_cond: np.ndarray  # (s,) probability of occupancy given the history


def log_likelihood(theta, data, hessian=True):
    """MacKenzie et al. (2002) log-likelihood, gradient and (Louis 1982) Hessian; see the module docstring."""
    terms = _likelihood_terms(np.asarray(theta, dtype=float)[None], data, data.y[None], hessian)
    value, gradient, h, psi, p, r = (None if t is None else t[0] for t in terms)
    return LogLikelihood(float(value), gradient, h, psi, np.where(data.surveyed, p, np.nan), r)


def start_values(data):
    """Start of the search: logit of the naive occupancy (raised a little) and of the detection rate at
    sites with a detection; slopes 0."""
    detected = data.detected
    naive = detected.mean()
    rate = (data.y[detected] * data.surveyed[detected]).sum() / max(data.surveyed[detected].sum(), 1)
    theta = np.zeros(data.X.shape[1] + data.W.shape[2])
    theta[0] = special.logit(min(max(naive * 1.1, 0.05), 0.95))
    theta[data.n_psi] = special.logit(min(max(rate, 0.05), 0.95))
    return theta


@dataclass(frozen=True, eq=False)
class Maximum:
    """Where the search ended: the parameters (centred and scaled), the log-likelihood and whether it converged."""

    theta: np.ndarray
    value: float
    converged: bool
    iterations: int


def maximise(data, start=None, max_iterations=500, tolerance=1e-7):
    """Maximise :func:`log_likelihood` with scipy's BFGS, then polish with Newton steps.

    Convergence: the largest gradient component (per site, i.e. divided by the
    number of sites) below ``tolerance``.
    """
    theta = start_values(data) if start is None else np.asarray(start, dtype=float)
    s = len(data.y)

    def negative(t):
        ll = log_likelihood(t, data, hessian=False)
        return -ll.value / s, -ll.gradient / s

    found = optimize.minimize(negative, theta, jac=True, method="BFGS",
                              options={"gtol": tolerance * 0.1, "maxiter": int(max_iterations)})
    theta, iterations = found.x, int(found.nit)
    if iterations < max_iterations:
        theta = _newton_polish(data, theta)
    ll = log_likelihood(theta, data, hessian=False)
    converged = bool(np.all(np.isfinite(theta)) and np.max(np.abs(ll.gradient)) / s < tolerance)
    return Maximum(theta, ll.value, converged, iterations)


def _newton_polish(data, theta, steps=30):
    """Newton steps with step halving where the Hessian is negative definite (quadratic convergence)."""
    current = log_likelihood(theta, data)
    for _ in range(steps):
        if np.max(np.abs(theta)) > BOUNDARY_LOGIT:
            break
        try:
            chol = np.linalg.cholesky(-current.hessian)
        except np.linalg.LinAlgError:
            break
        step = np.linalg.solve(chol.T, np.linalg.solve(chol, current.gradient))
        for _ in range(30):
            trial = log_likelihood(theta + step, data)
            if trial.value >= current.value - 1e-12 * abs(current.value):
                break
            step = step / 2.0
        else:
            break
        theta, current = theta + step, trial
        if np.max(np.abs(step)) < 1e-12:
            break
    return theta


def _likelihood_terms(theta, data, y, hessian=True, detected=None):
    """Log-likelihood terms of many data sets on one design: ``theta`` (B, P), ``y`` (B, s, K).

    Returns ``(value (B,), gradient (B, P), hessian (B, P, P) or None, psi (B, s), p (B, s, K), r (B, s))``
    by the formulas of the module docstring.
    """
    a = data.n_psi
    s, k, b = data.W.shape
    n = len(theta)
    flat_w = data.W.reshape(s * k, b)
    eta = theta[:, :a] @ data.X.T  # (B, s)
    zeta = (flat_w @ theta[:, a:].T).T.reshape(n, s, k)
    m = data.surveyed.astype(float)[None]
    ones = np.ones(k)
    log_p = _log_expit(zeta)
    log_a = (m * (log_p - (1.0 - y) * zeta)) @ ones  # log(1 - p) = log p - zeta
    log_occupied = _log_expit(eta) + log_a
    if detected is None:
        detected = (y * m) @ ones > 0
    log_site = np.where(detected, log_occupied, np.logaddexp(log_occupied, _log_expit(-eta)))
    r = np.exp(log_occupied - log_site)
    psi, p = special.expit(eta), np.exp(log_p)
    e = m * (y - p)
    gradient = np.concatenate([(r - psi) @ data.X, (r[:, :, None] * e).reshape(n, s * k) @ flat_w], axis=1)
    h = None
    if hessian:
        u = np.matmul(e[:, :, None, :], data.W[None])[:, :, 0, :]  # (B, s, b): sum over occasions, per site
        v = r * (1.0 - r)
        xx = (data.X[:, :, None] * data.X[:, None, :]).reshape(s, a * a)
        ww = (data.W[:, :, :, None] * data.W[:, :, None, :]).reshape(s * k, b * b)
        h_bb = ((v - psi * (1.0 - psi)) @ xx).reshape(n, a, a)
        h_aa = -((r[:, :, None] * m * p * (1.0 - p)).reshape(n, s * k) @ ww).reshape(n, b, b)
        h_aa += np.matmul(np.transpose(u * v[:, :, None], (0, 2, 1)), u)
        h_ba = np.matmul(np.transpose(data.X[None] * v[:, :, None], (0, 2, 1)), u)
        h = np.concatenate([np.concatenate([h_bb, h_ba], axis=2),
                            np.concatenate([np.transpose(h_ba, (0, 2, 1)), h_aa], axis=2)], axis=1)
    return log_site.sum(axis=1), gradient, h, psi, p, r


def maximise_many(data, y, start=None, max_iterations=200, tolerance=1e-7):
    """Maximise the log-likelihood of many data sets on one design (``y`` of shape (B, s, K)) at once.

    Damped Newton steps (Levenberg 1944; Marquardt 1963), vectorised over the
    data sets: ``(-H + lambda I) step = gradient``, ``lambda`` divided by 10
    after a step that raises the log-likelihood and multiplied by 10 after one
    that does not. Data sets that do not converge are handed to :func:`maximise`
    (scipy). Used by the goodness-of-fit bootstrap and by simulations; the
    convergence rule is the one of :func:`maximise`.

    Returns
    -------
    list of Maximum
    """
    y = np.asarray(y, dtype=float)
    n_sets, s = y.shape[0], y.shape[1]
    k = data.X.shape[1] + data.W.shape[2]
    theta = np.tile(start_values(data) if start is None else np.asarray(start, float), (n_sets, 1))
    lam = np.full(n_sets, 1e-3)
    detected = (y * data.surveyed).sum(axis=2) > 0
    value, gradient, hessian = _likelihood_terms(theta, data, y, True, detected)[:3]
    eye = np.eye(k)
    for _ in range(int(max_iterations)):
        done = np.max(np.abs(gradient), axis=1) / s < tolerance * 1e-3  # a step or two past convergence
        if done.all():
            break
        scale = np.abs(np.diagonal(hessian, axis1=1, axis2=2)).max(axis=1) + 1.0
        system = -hessian + (lam * scale)[:, None, None] * eye
        step = _solve_many(system, gradient)
        trial = theta + step
        new_value = _likelihood_terms(trial, data, y, False, detected)[0]
        better = (new_value >= value - 1e-12 * np.abs(value)) & ~done & np.isfinite(new_value)
        theta[better] = trial[better]
        lam = np.where(better, np.maximum(lam / 10.0, 1e-12), np.minimum(lam * 10.0, 1e12))
        if better.any():
            value, gradient, hessian = _likelihood_terms(theta, data, y, True, detected)[:3]
    done = np.max(np.abs(gradient), axis=1) / s < tolerance
    out = []
    for b in range(n_sets):
        if done[b] and np.all(np.isfinite(theta[b])):
            out.append(Maximum(theta[b].copy(), float(value[b]), True, 0))
        else:  # the scipy search for the few that need it
            out.append(maximise(_with_detections(data, y[b]), start=theta[b]))
    return out


def _solve_many(system, rhs):
    try:
        return np.linalg.solve(system, rhs[:, :, None])[:, :, 0]
    except np.linalg.LinAlgError:
        out = np.zeros_like(rhs)
        for b in range(len(rhs)):
            out[b] = np.linalg.lstsq(system[b], rhs[b], rcond=None)[0]
        return out


def _with_detections(data, y):
    """``data`` with other detections ``y`` (s, K) on the same design."""
    return ModelData(data.terms, np.asarray(y, dtype=float) * data.surveyed, data.surveyed, data.X, data.W,
                     data.names, data.to_original)


# ----------------------------------------------------------------------------
# a fitted model
# ----------------------------------------------------------------------------
CONVERGED, BOUNDARY, FAILED = "converged", "boundary", "failed"


@dataclass(frozen=True)
class Derived:
    """A derived probability (mean psi or mean p): estimate, SE and the logit-scale interval."""

    estimate: float
    se: float
    lo: float
    hi: float


@dataclass(frozen=True, eq=False)
class OccupancyFit:
    """One fitted model.

    ``status`` is "converged", "boundary" (some parameters at the edge of the
    parameter space: their SE and interval are NaN, the others are conditional
    on them) or "failed" (no estimate: every number is NaN). Parameters are in
    the covariates' own units, on the logit scale.
    """

    terms: ModelTerms
    status: str
    names: tuple
    estimate: np.ndarray
    se: np.ndarray
    lo: np.ndarray
    hi: np.ndarray
    log_likelihood: float
    n_sites: int
    boundary: tuple
    psi: np.ndarray  # (s,) fitted psi of the kept sites
    p: np.ndarray  # (s, K) fitted p, NaN where not surveyed
    psi_cond: np.ndarray
    psi_mean: Derived
    p_mean: Derived
    theta: np.ndarray  # centred and scaled parameters (for the bootstrap)
    message: str = ""

    @property
    def n_par(self):
        return len(self.names)

    @property
    def aic(self):
        """Akaike (1973): -2 log L + 2 k."""
        return -2.0 * self.log_likelihood + 2.0 * self.n_par if self.status != FAILED else math.nan

    @property
    def aicc(self):
        """AIC with the small-sample correction 2k(k+1)/(n-k-1), n = sites (Hurvich & Tsai 1989)."""
        k, n = self.n_par, self.n_sites
        return self.aic + 2.0 * k * (k + 1) / (n - k - 1) if n - k - 1 > 0 else math.nan


def fit_model(data, confidence=0.95, start=None, max_iterations=500):
    """Fit one model: :func:`maximise` (scipy), then SEs from the observed information (:func:`fit_at`)."""
    return fit_at(data, maximise(data, start=start, max_iterations=max_iterations), confidence)


def fit_many(data, y, confidence=0.95, start=None):
    """:func:`fit_at` for many data sets ``y`` (B, s, K) on one design, maximised together (:func:`maximise_many`)."""
    y = np.asarray(y, dtype=float)
    found = maximise_many(data, y, start=start)
    terms = _likelihood_terms(np.array([m.theta for m in found]), data, y)  # every data set's terms at once
    fits = []
    for b, (y_b, m) in enumerate(zip(y, found)):
        value, gradient, h, psi, p, r = (t[b] for t in terms)
        ll = LogLikelihood(float(value), gradient, h, psi, np.where(data.surveyed, p, np.nan), r)
        fits.append(fit_at(_with_detections(data, y_b), m, confidence, ll))
    return fits


def fit_at(data, found, confidence=0.95, ll=None):
    """The :class:`OccupancyFit` at a :class:`Maximum`: SEs from the observed information ``-H``.

    Parameters beyond :data:`BOUNDARY_LOGIT` are at the boundary: the others'
    covariance is the inverse of their block of the information (conditional on
    the boundary values), and the boundary ones get no SE. ``ll`` is the
    :class:`LogLikelihood` at the maximum when already computed.
    """
    nan_k = np.full(len(data.names), np.nan)
    if not found.converged:
        return _failed_fit(data, nan_k, message(QT_TRANSLATE_NOOP("PlotwiseEngine",
                                                "The search for the maximum stopped after {n} iterations without "
                                                 "converging."), n=found.iterations))
    ll = log_likelihood(found.theta, data) if ll is None else ll
    at_edge = np.abs(found.theta) > BOUNDARY_LOGIT
    free = ~at_edge
    cov = np.full((len(found.theta),) * 2, np.nan)
    try:
        info = -ll.hessian[np.ix_(free, free)]
        np.linalg.cholesky(info)
        cov[np.ix_(free, free)] = np.linalg.inv(info)
    except np.linalg.LinAlgError:
        return _failed_fit(data, nan_k, message(QT_TRANSLATE_NOOP("PlotwiseEngine",
                                                "The observed information is not positive definite at the maximum: "
                                                 "the parameters cannot all be estimated from these data (collinear "
                                                 "covariates, or too few detections).")))
    a_map = data.to_original
    estimate = a_map @ found.theta
    cov_original = a_map @ np.nan_to_num(cov) @ a_map.T
    touched = np.abs(a_map[:, at_edge]).sum(axis=1) > 0
    se = np.where(touched, np.nan, np.sqrt(np.clip(np.diag(cov_original), 0.0, None)))
    z = float(special.ndtri(0.5 + confidence / 2.0))  # the normal quantile
    return OccupancyFit(
        data.terms, BOUNDARY if at_edge.any() else CONVERGED, data.names, estimate, se, estimate - z * se,
        estimate + z * se, ll.value, len(data.y), tuple(n for n, e in zip(data.names, at_edge) if e), ll.psi, ll.p,
        ll.psi_cond, _derived_psi(data, found.theta, cov, ll, z, at_edge),
        _derived_p(data, found.theta, cov, ll, z, at_edge), found.theta)


def _failed_fit(data, nan_k, why):
    s, k = data.y.shape
    nothing = Derived(math.nan, math.nan, math.nan, math.nan)
    return OccupancyFit(data.terms, FAILED, data.names, nan_k, nan_k, nan_k, nan_k, math.nan, s, (),
                        np.full(s, np.nan), np.full((s, k), np.nan), np.full(s, np.nan), nothing, nothing,
                        nan_k, why)


def _logit_interval(value, se, z):
    """``expit(logit(v) +- z SE / (v (1 - v)))``: the delta-method interval on the logit scale."""
    if not (0.0 < value < 1.0) or not np.isfinite(se):
        return math.nan, math.nan
    half = z * se / (value * (1.0 - value))
    centre = special.logit(value)
    return float(special.expit(centre - half)), float(special.expit(centre + half))


def _derived_psi(data, theta, cov, ll, z, at_edge):
    """Mean fitted psi over the sites, SE by the delta method (gradient ``mean psi(1-psi) x``)."""
    value = float(ll.psi.mean())
    grad = np.zeros(len(theta))
    grad[:data.n_psi] = (data.X * (ll.psi * (1.0 - ll.psi))[:, None]).mean(axis=0)
    return _derived(value, grad, cov, z, at_edge)


def _derived_p(data, theta, cov, ll, z, at_edge):
    """Mean fitted p over the surveys, SE by the delta method."""
    m = data.surveyed
    p = np.where(m, ll.p, 0.0)
    value = float(p[m].mean())
    grad = np.zeros(len(theta))
    grad[data.n_psi:] = np.einsum("sk,skb->b", p * (1.0 - p) * m, data.W) / m.sum()
    return _derived(value, grad, cov, z, at_edge)


def _derived(value, grad, cov, z, at_edge):
    if np.any(at_edge & (grad != 0)):
        return Derived(value, math.nan, math.nan, math.nan)
    se = float(math.sqrt(max(grad @ np.nan_to_num(cov) @ grad, 0.0)))
    lo, hi = _logit_interval(value, se, z)
    return Derived(value, se, lo, hi)


# ----------------------------------------------------------------------------
# design advice (MacKenzie & Royle 2005)
# ----------------------------------------------------------------------------
@dataclass(frozen=True)
class DesignAdvice:
    """Occasions for a cumulative detection of 0.95, and sites for a target SE of psi."""

    psi: float
    p: float
    occasions: int
    cumulative: float  # 1 - (1 - p)^K with the survey's K
    occasions_95: int
    variance_per_site: float  # s Var(psi_hat) with the survey's K
    target_se: float
    sites_needed: float
    best_occasions: int  # K minimising the surveys s K for the target SE
    best_sites: float


def cumulative_detection(p, occasions):
    """``1 - (1 - p)^K``: the chance of at least one detection in K surveys of an occupied site."""
    return 1.0 - (1.0 - np.asarray(p, dtype=float)) ** np.asarray(occasions, dtype=float)


def occasions_for(p, target=CUMULATIVE_TARGET):
    """Smallest K with ``1 - (1 - p)^K >= target``: ``ceil(ln(1 - target) / ln(1 - p))``."""
    if p >= 1.0:
        return 1
    if p <= 0.0:
        return math.inf
    k = math.ceil(math.log(1.0 - target) / math.log(1.0 - p) - 1e-12)
    return max(int(k), 1)


def psi_variance_per_site(psi, p, occasions):
    """``s Var(psi_hat)`` for the constant model (MacKenzie & Royle 2005, eq. 3):

        Var(psi_hat) = psi / s [(1 - psi) + (1 - p*) / (p* - K p (1 - p)^(K - 1))],
        p* = 1 - (1 - p)^K.
    """
    k = np.asarray(occasions, dtype=float)
    p_star = 1.0 - (1.0 - p) ** k
    twice = p_star - k * p * (1.0 - p) ** (k - 1.0)  # at least two detections at an occupied site
    with np.errstate(divide="ignore", invalid="ignore"):
        return psi * ((1.0 - psi) + (1.0 - p_star) / twice)


def design_advice(psi, p, occasions, target_se, max_occasions=50):
    """:class:`DesignAdvice` at ``psi`` and ``p`` (for a model with covariates: their means)."""
    per_site = float(psi_variance_per_site(psi, p, occasions))
    sites = per_site / target_se**2 if target_se > 0 else math.nan
    ks = np.arange(2, max_occasions + 1)
    per_k = psi_variance_per_site(psi, p, ks)
    if target_se > 0 and np.isfinite(per_k).any():
        effort = np.where(np.isfinite(per_k), per_k * ks, np.inf)
        best = int(ks[int(np.argmin(effort))])
        best_sites = float(per_k[best - 2] / target_se**2)
    else:
        best, best_sites = 0, math.nan
    return DesignAdvice(float(psi), float(p), int(occasions), float(cumulative_detection(p, occasions)),
                        occasions_for(p), per_site, float(target_se), sites, best, best_sites)


# ----------------------------------------------------------------------------
# goodness of fit (MacKenzie & Bailey 2004)
# ----------------------------------------------------------------------------
@dataclass(frozen=True)
class GoodnessOfFit:
    """Pearson chi-square on history frequencies, its parametric bootstrap, and c-hat."""

    chi_square: float
    p_value: float
    c_hat: float
    replicates: int
    failed: int
    mean_bootstrap: float


def history_chi_square(data, psi, p):
    """``sum_h (O_h - E_h)^2 / E_h`` over every possible history, per cohort of sites with the same surveyed
    occasions, summed over cohorts (MacKenzie & Bailey 2004, §3). ``E_h = sum_i Pr(h | site i)``."""
    total = 0.0
    patterns, cohort = np.unique(data.surveyed, axis=0, return_inverse=True)
    cohort = np.asarray(cohort).ravel()
    for c, pattern in enumerate(patterns):
        sites = np.flatnonzero(cohort == c)
        cols = np.flatnonzero(pattern)
        k = len(cols)
        all_h = np.array(list(itertools.product((0, 1), repeat=k)), dtype=float)  # (2^k, k)
        pc = p[np.ix_(sites, cols)]  # (n, k)
        log_a = all_h @ np.log(pc).T + (1.0 - all_h) @ np.log1p(-pc).T  # (2^k, n)
        prob = psi[sites][None, :] * np.exp(log_a)
        prob[0] += 1.0 - psi[sites]  # the all-zero history (first row) also comes from unoccupied sites
        expected = prob.sum(axis=1)
        codes = data.y[np.ix_(sites, cols)] @ (2 ** np.arange(k - 1, -1, -1))
        observed = np.bincount(codes.astype(int), minlength=2**k)
        total += float(np.sum((observed - expected) ** 2 / np.maximum(expected, 1e-300)))
    return total


def goodness_of_fit(data, fit, replicates, rng, progress=None, chunk=200):
    """MacKenzie & Bailey (2004) parametric bootstrap: data sets simulated from the fitted model, the model
    refitted to each (:func:`maximise_many`, in chunks), ``p = (1 + #{X2* >= X2}) / (B + 1)`` and
    ``c_hat = X2 / mean(X2*)``. Replicates whose fit fails (or that hold no detection) are left out and counted."""
    observed = history_chi_square(data, fit.psi, np.where(data.surveyed, fit.p, 0.5))
    values, failed = [], 0
    p_true = np.nan_to_num(fit.p)
    for first in range(0, int(replicates), chunk):
        if progress is not None and progress(first / replicates):
            raise Cancelled("Cancelled during the goodness-of-fit bootstrap.")
        n = min(chunk, int(replicates) - first)
        z = rng.random((n, len(fit.psi))) < fit.psi
        y = ((rng.random((n,) + data.y.shape) < p_true) & z[:, :, None] & data.surveyed).astype(float)
        usable = y.sum(axis=(1, 2)) > 0
        failed += int((~usable).sum())
        for y_b, found in zip(y[usable], maximise_many(data, y[usable], start=fit.theta)):
            if not found.converged:
                failed += 1
                continue
            sim = _with_detections(data, y_b)
            ll = log_likelihood(found.theta, sim, hessian=False)
            values.append(history_chi_square(sim, ll.psi, np.where(sim.surveyed, ll.p, 0.5)))
    values = np.asarray(values)
    if len(values) == 0:
        return GoodnessOfFit(observed, math.nan, math.nan, 0, failed, math.nan)
    mean = float(values.mean())
    return GoodnessOfFit(observed, float((1 + np.sum(values >= observed)) / (len(values) + 1)), observed / mean,
                         len(values), failed, mean)


def gof_feasible(data):
    """True when every cohort's histories can be enumerated within the memory bound."""
    patterns, counts = np.unique(data.surveyed, axis=0, return_counts=True)
    k = patterns.sum(axis=1)
    return bool(k.max() <= MAX_GOF_OCCASIONS and np.sum(2.0**k * counts) <= MAX_GOF_CELLS)


# ----------------------------------------------------------------------------
# the analysis
# ----------------------------------------------------------------------------
@dataclass(frozen=True)
class HistorySummary:
    """What the detection histories hold."""

    n_sites: int  # input sites
    n_used: int  # with at least one surveyed occasion
    n_occasions: int
    n_surveys: int
    n_missing: int  # site-occasions not surveyed at the sites used
    n_detected_sites: int
    n_detections: int
    naive: float
    detections_per_site: tuple  # counts of sites with 0, 1, ..., K detections
    frequent: tuple  # (history text, sites) for the most frequent histories


def summarise_histories(histories, limit=12):
    y = histories.y[histories.kept]
    surveyed = ~np.isnan(y)
    det = np.nansum(y, axis=1).astype(int)
    texts = ["".join("-" if np.isnan(v) else str(int(v)) for v in row) for row in y]
    unique, counts = np.unique(texts, return_counts=True)
    order = np.lexsort((unique, -counts))[:limit]
    return HistorySummary(
        len(histories.site_ids), int(histories.kept.sum()), histories.n_occasions, int(surveyed.sum()),
        int((~surveyed).sum()), int((det > 0).sum()), int(det.sum()), float((det > 0).mean()),
        tuple(int(c) for c in np.bincount(det, minlength=histories.n_occasions + 1)),
        tuple((str(unique[i]), int(counts[i])) for i in order))


@dataclass(frozen=True, eq=False)
class OccupancyResult:
    """The main model, the model comparison, the design advice and the goodness of fit."""

    histories: DetectionHistories
    summary: HistorySummary
    main: OccupancyFit
    fits: tuple  # every model, main first
    advice: DesignAdvice
    gof: object  # GoodnessOfFit or None
    confidence: float
    warnings: tuple

    @property
    def delta_aic(self):
        aics = np.array([f.aic for f in self.fits])
        best = np.nanmin(aics) if np.isfinite(aics).any() else math.nan
        return aics - best

    @property
    def aic_weights(self):
        """Akaike weights ``exp(-delta/2) / sum`` (Burnham & Anderson 2002, §2.9)."""
        delta = self.delta_aic
        w = np.where(np.isfinite(delta), np.exp(-0.5 * np.nan_to_num(delta, nan=np.inf)), 0.0)
        return w / w.sum() if w.sum() > 0 else w


def occupancy_analysis(histories, psi_covariates=(), p_covariates=(), covariates=None, effort=None, models=(),
                       confidence=0.95, target_se=0.05, gof_replicates=0, layer="SITES", effort_fields=(), rng=None,
                       progress=None, max_iterations=500):
    """Fit the main model and the compared models, give the design advice and (optionally) the fit test.

    Parameters are those of :func:`_occupancy_iv` (checked there), plus ``rng``
    (the run's generator, for the goodness-of-fit bootstrap), ``progress``
    (``progress(fraction) -> cancelled``) and the search's ``max_iterations``.

    Returns
    -------
    OccupancyResult

    Raises
    ------
    InputError
        When the main model does not converge or cannot be estimated: no number
        comes from a failed fit.
    """
    inp = _occupancy_iv(histories, psi_covariates, p_covariates, covariates, effort, models, confidence, target_se,
                        gof_replicates, layer, effort_fields)
    warnings = []
    fits = []
    for i, terms in enumerate(inp.models):
        if progress is not None and progress(0.5 * i / len(inp.models)):
            raise Cancelled("Cancelled while fitting the occupancy models.")
        fits.append(fit_model(model_data(inp, terms), inp.confidence, max_iterations=max_iterations))
    main = fits[0]
    if main.status == FAILED:
        raise InputError(message(QT_TRANSLATE_NOOP("PlotwiseEngine",
                                 "The occupancy model ({model}) could not be fitted: {why} No estimate is given. "
                                 "Try fewer covariates, more sites or more occasions."), model=main.terms.label,
                                 why=main.message))
    warnings += _boundary_warnings(main)
    warnings += [message(QT_TRANSLATE_NOOP("PlotwiseEngine",
                         "The model {model} could not be fitted and is left out of the comparison: {why}"),
                         model=f.terms.label, why=f.message) for f in fits[1:] if f.status == FAILED]
    if inp.histories.left_out:
        warnings.append(message(QT_TRANSLATE_NOOP("PlotwiseEngine",
                                "Sites {ids} have no surveyed occasion (every history value NULL) and were left out "
                                "of the analysis."), ids=listed_ids(inp.histories.left_out)))
    advice = design_advice(main.psi_mean.estimate, main.p_mean.estimate, inp.histories.n_occasions, inp.target_se)
    gof = None
    if inp.gof_replicates > 0:
        data = model_data(inp, main.terms)
        if not gof_feasible(data):
            warnings.append(message(QT_TRANSLATE_NOOP("PlotwiseEngine",
                                    "The goodness-of-fit test was skipped: with {k} occasions there are too many "
                                    "possible detection histories to enumerate."), k=inp.histories.n_occasions))
        elif main.status == BOUNDARY:
            warnings.append(message(QT_TRANSLATE_NOOP("PlotwiseEngine",
                                    "The goodness-of-fit test was skipped: the model has parameters at the boundary.")))
        else:
            step = None if progress is None else (lambda f: progress(0.5 + 0.5 * f))
            gof = goodness_of_fit(data, main, inp.gof_replicates, rng, step)
            warnings += _gof_warnings(gof)
    return OccupancyResult(inp.histories, summarise_histories(inp.histories), main, tuple(fits), advice, gof,
                           inp.confidence, tuple(warnings))


def _boundary_warnings(fit):
    out = []
    for name in fit.boundary:
        if name == "logit_psi:" + CONSTANT and not fit.terms.psi:
            out.append(message(
                QT_TRANSLATE_NOOP("PlotwiseEngine",
                "psi is at the boundary of its range (estimate {psi:.4f}): the data are consistent with every site "
                "being occupied. Its standard error and interval cannot be computed from the information; the other "
                "estimates are conditional on it.") if fit.psi_mean.estimate > 0.5 else
                QT_TRANSLATE_NOOP("PlotwiseEngine",
                "psi is at the boundary of its range (estimate {psi:.4f}): the data are consistent with no site "
                "being occupied. Its standard error and interval cannot be computed from the information; the other "
                "estimates are conditional on it."), psi=fit.psi_mean.estimate))
        elif name == "logit_p:" + CONSTANT and not fit.terms.p:
            out.append(message(QT_TRANSLATE_NOOP("PlotwiseEngine",
                               "p is at the boundary of its range (estimate {p:.4f}): every survey of a site with a "
                               "detection detected the species. Its standard error cannot be computed; psi is then "
                               "the naive occupancy."), p=fit.p_mean.estimate))
        else:
            out.append(message(QT_TRANSLATE_NOOP("PlotwiseEngine",
                               "Parameter {name} is at the boundary (a logit beyond {limit:g}): a covariate separates "
                               "the sites, or a probability is 0 or 1. Its standard error cannot be computed; simplify "
                               "the model."), name=name, limit=BOUNDARY_LOGIT))
    return out


def _gof_warnings(gof):
    out = []
    if gof.failed:
        out.append(message(QT_TRANSLATE_NOOP("PlotwiseEngine",
                           "{n} bootstrap data sets could not be fitted and were left out of the goodness-of-fit "
                           "test."), n=gof.failed))
    if np.isfinite(gof.p_value) and gof.p_value < 0.05:
        out.append(message(QT_TRANSLATE_NOOP("PlotwiseEngine",
                           "The goodness-of-fit test rejects the model (p = {p:.3f}, c-hat = {c:.2f}): the histories "
                           "vary more than the model allows. Standard errors may be too small; multiply their "
                           "squares by c-hat, or add covariates."), p=gof.p_value, c=gof.c_hat))
    return out
