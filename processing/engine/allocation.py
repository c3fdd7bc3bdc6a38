"""Allocation of survey effort (sample units) across strata.

The quantity the survey estimates is the overall density: the mean count per
unit, divided by the unit area. With stratum weights ``W_h = A_h / A`` (area
shares), pilot standard deviations of counts per unit ``S_h`` and ``n_h`` units
drawn without replacement from the ``N_h = A_h / a`` units of area ``a`` that fit
in stratum ``h``, the variance of the stratified mean count per unit is

    V = sum_h W_h**2 * S_h**2 * (1 - f_h) / n_h,      f_h = n_h / N_h

(Cochran 1977, ch. 5). The allocations here differ in how they share a given
effort among the strata:

* equal:         n_h = n / H
* proportional:  n_h = n * W_h
* Neyman:        n_h = n * W_h S_h / sum_k W_k S_k                (Neyman 1934)
* optimal with cost, under a budget C = c0 + sum_h c_h n_h:
                 n_h proportional to W_h S_h / sqrt(c_h)          (Cochran 1977, ch. 5)

Every allocation is bounded: at least ``MIN_PER_STRATUM`` units (two, so that a
stratum variance can be estimated: common practice) and at most the ``N_h`` units
that fit. A stratum that reaches a bound keeps it and the remaining effort is
shared among the others in the same proportions, repeated until stable
(Cochran 1977, ch. 5). The fixed point of that procedure is
``n_h = clip(lambda * q_h, lower_h, upper_h)`` with a single ``lambda`` that meets
the total (or the budget); :func:`bounded_allocation` finds it directly. For the
Neyman and cost scores this is also the minimiser of ``V`` under the bounds (the
Karush-Kuhn-Tucker conditions of a separable convex problem).

References
----------
Neyman, J. (1934). On the two different aspects of the representative method.
    Journal of the Royal Statistical Society 97, 558-625.
Cochran, W. G. (1977). Sampling Techniques, 3rd ed., chapter 5. Wiley.
"""
from dataclasses import dataclass

import numpy as np

from . import edge
from .errors import QT_TRANSLATE_NOOP, InputError, message
from .listing import listed_ids

METHODS = ("equal", "proportional", "neyman", "optimal_cost")
"""Allocation methods, in the order of the algorithm's METHOD parameter (0..3)."""

DEFAULT_MIN_PER_STRATUM = 2  # a stratum variance needs two units: common practice

_DEFAULT_NAMES = {
    "area": message(QT_TRANSLATE_NOOP("PlotwiseEngine", "stratum area")),
    "sd": message(QT_TRANSLATE_NOOP("PlotwiseEngine", "pilot standard deviation")),
    "mean": message(QT_TRANSLATE_NOOP("PlotwiseEngine", "pilot mean count")),
    "cost": message(QT_TRANSLATE_NOOP("PlotwiseEngine", "cost per unit")),
}


# ----------------------------------------------------------------------------
# results
# ----------------------------------------------------------------------------
@dataclass(frozen=True, eq=False)
class Precision:
    """Expected precision of a stratified design (Cochran 1977, ch. 5).

    Attributes
    ----------
    variance_mean : float
        ``V = sum W_h^2 S_h^2 (1 - f_h) / n_h``, variance of the overall mean
        count per unit (NaN without standard deviations).
    se_mean : float
        ``sqrt(V)``.
    se_density : float
        ``sqrt(V) / a``: standard error of the overall density, in counts per
        area unit of ``unit_area``.
    overall_mean : float
        ``sum W_h ybar_h``, the pilot mean count per unit (NaN without means).
    cv : float
        ``sqrt(V) / sum W_h ybar_h``, expected CV of the overall density (NaN
        without means). The unit area cancels.
    stratum_se_mean, stratum_se_density, stratum_cv : ndarray
        The same per stratum: ``S_h sqrt((1 - f_h) / n_h)``, divided by ``a``,
        and divided by ``ybar_h`` (NaN where the mean is zero or missing).
    """

    variance_mean: float
    se_mean: float
    se_density: float
    overall_mean: float
    cv: float
    stratum_se_mean: np.ndarray
    stratum_se_density: np.ndarray
    stratum_cv: np.ndarray


@dataclass(frozen=True, eq=False)
class MethodComparison:
    """One allocation method evaluated at a common total, for comparison."""

    method: str
    n: np.ndarray
    precision: Precision
    relative_variance: float
    """Variance divided by that of the chosen allocation (NaN without SDs)."""


@dataclass(frozen=True, eq=False)
class Allocation:
    """Units per stratum, with the expected precision they buy.

    Attributes
    ----------
    method : str
        The method asked for (one of :data:`METHODS`).
    method_used : str
        The method applied after fallbacks (no SDs, or all SDs zero, gives
        ``proportional``; the cost method then uses ``W_h / sqrt(c_h)``).
    target : str
        ``"total"``, ``"budget"`` or ``"target_cv"``.
    ids : tuple
        Stratum identifiers, as given.
    n : ndarray of int
        Whole units per stratum; sums to ``total``.
    n_continuous : ndarray of float
        The bounded allocation before rounding.
    total : int
    lower, upper : ndarray of int
        The bounds applied per stratum (``upper`` = whole units that fit).
    capacity : ndarray of float
        ``N_h = A_h / a``, used in the finite-population correction.
    cost : float
        ``c0 + sum c_h n_h`` (NaN without costs).
    precision : Precision
    comparison : tuple of MethodComparison
        Equal, proportional and Neyman at ``total``, with the same bounds.
    warnings : tuple of str
    fpc : bool
        Whether the precision carries the finite-population correction.
    """

    method: str
    method_used: str
    target: str
    ids: tuple
    n: np.ndarray
    n_continuous: np.ndarray
    total: int
    lower: np.ndarray
    upper: np.ndarray
    capacity: np.ndarray
    cost: float
    precision: Precision
    comparison: tuple
    warnings: tuple
    fpc: bool = True


# ----------------------------------------------------------------------------
# continuous allocations (no bounds)
# ----------------------------------------------------------------------------
def stratum_weights(areas):
    """Area shares ``W_h = A_h / sum_k A_k``."""
    areas = np.asarray(areas, dtype=float)
    return areas / areas.sum()


def unit_capacity(areas, unit_area):
    """Units that fit in each stratum, ``N_h = A_h / a`` (same area unit for both)."""
    return np.asarray(areas, dtype=float) / float(unit_area)


def allocation_scores(method, areas, sds=None, costs=None):
    """Relative share ``q_h`` of each stratum under ``method``.

    ``equal``: 1; ``proportional``: ``W_h``; ``neyman``: ``W_h S_h``;
    ``optimal_cost``: ``W_h S_h / sqrt(c_h)`` (Cochran 1977, ch. 5). With
    ``sds=None`` the Neyman score is taken as proportional and the cost score as
    ``W_h / sqrt(c_h)`` (equal SDs assumed).
    """
    if method not in METHODS:
        raise ValueError(f"Unknown allocation method {method!r}; use one of {METHODS}.")
    w = stratum_weights(areas)
    if method == "equal":
        return np.ones_like(w)
    if method == "proportional":
        return w
    s = np.ones_like(w) if sds is None else np.asarray(sds, dtype=float)
    if method == "neyman":
        return w * s
    if costs is None:
        raise ValueError("The cost method needs a cost per unit for every stratum.")
    return w * s / np.sqrt(np.asarray(costs, dtype=float))


def equal_allocation(total, n_strata):
    """``n_h = n / H``."""
    return np.full(int(n_strata), float(total) / int(n_strata))


def proportional_allocation(total, areas):
    """``n_h = n W_h`` (Cochran 1977, ch. 5)."""
    return float(total) * stratum_weights(areas)


def neyman_allocation(total, areas, sds):
    """``n_h = n W_h S_h / sum_k W_k S_k`` (Neyman 1934; Cochran 1977, ch. 5).

    Minimises ``V`` for a fixed total ``n`` (continuous, without bounds).
    """
    q = allocation_scores("neyman", areas, sds)
    return float(total) * q / q.sum()


def cost_optimal_allocation(total, areas, sds, costs):
    """``n_h = n (W_h S_h / sqrt(c_h)) / sum_k (W_k S_k / sqrt(c_k))`` (Cochran 1977, ch. 5)."""
    q = allocation_scores("optimal_cost", areas, sds, costs)
    return float(total) * q / q.sum()


def cost_optimal_total(budget, areas, sds, costs, fixed_cost=0.0):
    """Total units that a budget buys under the cost-optimal allocation.

    ``n = (C - c0) sum(W_h S_h / sqrt(c_h)) / sum(W_h S_h sqrt(c_h))``
    (Cochran 1977, ch. 5).
    """
    w = stratum_weights(areas)
    s = np.asarray(sds, dtype=float)
    c = np.asarray(costs, dtype=float)
    return (float(budget) - float(fixed_cost)) * np.sum(w * s / np.sqrt(c)) / np.sum(w * s * np.sqrt(c))


# ----------------------------------------------------------------------------
# bounds and rounding
# ----------------------------------------------------------------------------
def bounded_allocation(scores, amount, lower, upper, costs=None):
    """Share ``amount`` in proportion to ``scores`` within per-stratum bounds.

    Returns ``n_h = clip(lambda q_h, lower_h, upper_h)`` with ``lambda`` such that
    ``sum c_h n_h = amount`` (``c_h = 1`` when ``costs`` is None, so the amount is
    a total of units). This is the stable end of the iterative re-allocation:
    strata over a bound are set to it and the rest of the effort is shared among
    the others in proportion to ``q_h`` (Cochran 1977, ch. 5). ``g(lambda)`` is
    piecewise linear and non-decreasing, so ``lambda`` is found exactly between
    two of its break points. Strata with a zero score stay at their lower bound
    unless the others are all full, and then share the rest equally.

    Parameters
    ----------
    scores : array_like, non-negative
    amount : float
        Total units (or budget net of the fixed cost when ``costs`` is given).
    lower, upper : array_like
        Bounds, ``lower <= upper``; ``sum c lower <= amount <= sum c upper``.
    costs : array_like, optional

    Returns
    -------
    ndarray of float
    """
    q = np.asarray(scores, dtype=float)
    lo = np.asarray(lower, dtype=float)
    hi = np.asarray(upper, dtype=float)
    c = np.ones_like(q) if costs is None else np.asarray(costs, dtype=float)
    amount = float(amount)
    tol = 1e-9 * max(1.0, abs(amount))
    if amount < np.sum(c * lo) - tol or amount > np.sum(c * hi) + tol:
        raise ValueError("The amount to allocate lies outside the bounds.")
    positive = q > 0
    if not positive.any():
        return bounded_allocation(np.ones_like(q), amount, lo, hi, c)
    full = np.where(positive, hi, lo)
    if amount > np.sum(c * full) + tol:
        # every stratum with a positive score is full: the zero-score strata take the rest
        zero = ~positive
        rest = amount - np.sum(c[positive] * hi[positive])
        out = hi.copy()
        out[zero] = bounded_allocation(np.ones(zero.sum()), rest, lo[zero], hi[zero], c[zero])
        return out
    breaks = np.unique(np.concatenate(([0.0], lo[positive] / q[positive], hi[positive] / q[positive])))
    spent = np.sum(c * np.clip(breaks[:, None] * q, lo, hi), axis=1)
    k = int(np.searchsorted(spent, amount, side="left"))
    if k == 0:
        lam = breaks[0]
    elif k >= breaks.size:
        lam = breaks[-1]
    else:
        g0, g1 = spent[k - 1], spent[k]
        t = 0.0 if g1 <= g0 else (amount - g0) / (g1 - g0)
        lam = breaks[k - 1] + t * (breaks[k] - breaks[k - 1])
    return np.clip(lam * q, lo, hi)


def largest_remainder_round(n_continuous, total, lower, upper):
    """Whole units that sum to ``total`` and stay within the bounds.

    Each stratum gets the whole part of its share; the units still missing go,
    one each, to the strata with the largest fractional parts that are below
    their upper bound (Hamilton's largest-remainder method). Integer bounds and
    ``lower <= n_continuous <= upper`` guarantee the result stays within them.
    """
    x = np.asarray(n_continuous, dtype=float)
    lo = np.asarray(lower, dtype=int)
    hi = np.asarray(upper, dtype=int)
    total = int(total)
    n = np.clip(np.floor(x + 1e-9).astype(int), lo, hi)
    frac = x - n
    missing = total - int(n.sum())
    # stable sort: ties go to the earlier stratum
    if missing > 0:
        order = np.argsort(-np.where(n < hi, frac, -np.inf), kind="stable")
        take = order[:missing]
        n[take] += 1
    elif missing < 0:
        order = np.argsort(np.where(n > lo, frac, np.inf), kind="stable")
        n[order[:-missing]] -= 1
    if int(n.sum()) != total or np.any(n < lo) or np.any(n > hi):
        raise ValueError("The total cannot be met within the bounds.")
    return n


def round_within_budget(n_continuous, budget, costs, lower, upper):
    """Whole units whose cost ``sum c_h n_h`` stays within ``budget``.

    The whole parts first; then, by largest fractional part, one more unit in
    each stratum whose cost still fits the budget and which is below its upper
    bound.
    """
    x = np.asarray(n_continuous, dtype=float)
    c = np.asarray(costs, dtype=float)
    lo = np.asarray(lower, dtype=int)
    hi = np.asarray(upper, dtype=int)
    n = np.clip(np.floor(x + 1e-9).astype(int), lo, hi)
    left = float(budget) - float(np.sum(c * n))
    for h in np.argsort(-(x - n), kind="stable"):
        if n[h] < hi[h] and c[h] <= left + 1e-9 * max(1.0, abs(float(budget))):
            n[h] += 1
            left -= c[h]
    return n


# ----------------------------------------------------------------------------
# precision
# ----------------------------------------------------------------------------
def expected_precision(n, areas, unit_area, sds=None, means=None, fpc=True):
    """Expected SE and CV of the stratified density (Cochran 1977, ch. 5).

    ``V = sum W_h^2 S_h^2 (1 - f_h) / n_h`` with ``f_h = n_h a / A_h`` (0 when
    ``fpc`` is False); stratum CV ``S_h sqrt((1 - f_h)/n_h) / ybar_h``; overall
    CV ``sqrt(V) / sum W_h ybar_h``. Areas and ``unit_area`` in the same unit;
    densities per that area unit.
    """
    n = np.asarray(n, dtype=float)
    w = stratum_weights(areas)
    a = float(unit_area)
    nan = np.full(n.shape, np.nan)
    if sds is None:
        return Precision(np.nan, np.nan, np.nan, np.nan, np.nan, nan, nan.copy(), nan.copy())
    s = np.asarray(sds, dtype=float)
    f = n / unit_capacity(areas, a) if fpc else np.zeros_like(n)
    one_minus_f = np.clip(1.0 - f, 0.0, 1.0)
    with np.errstate(divide="ignore", invalid="ignore"):
        stratum_var = np.where(n > 0, s**2 * one_minus_f / n, np.inf)
        variance = float(np.sum(w**2 * stratum_var))
        stratum_se = np.sqrt(stratum_var)
        if means is None:
            overall_mean, cv, stratum_cv = np.nan, np.nan, nan.copy()
        else:
            m = np.asarray(means, dtype=float)
            overall_mean = float(np.sum(w * m))
            cv = float(np.sqrt(variance) / overall_mean) if overall_mean > 0 else np.nan
            stratum_cv = np.where(m > 0, stratum_se / m, np.nan)
    return Precision(
        variance_mean=variance,
        se_mean=float(np.sqrt(variance)),
        se_density=float(np.sqrt(variance) / a),
        overall_mean=overall_mean,
        cv=cv,
        stratum_se_mean=stratum_se,
        stratum_se_density=stratum_se / a,
        stratum_cv=stratum_cv,
    )


# ----------------------------------------------------------------------------
# input checks
# ----------------------------------------------------------------------------
def _listing(ids, mask):
    """The ids where ``mask`` holds, and their listing for a message."""
    chosen = [ids[i] for i in np.flatnonzero(mask)]
    return chosen, listed_ids(chosen)


def _as_number(value):
    """A float, or NaN for None and anything that is not a number."""
    try:
        return np.nan if value is None else float(value)
    except (TypeError, ValueError):
        return np.nan


def _is_null(value):
    return value is None or (isinstance(value, float) and value != value)


def _shown_id(value):
    """A stratum id as shown in a message: text in quotes, numbers as they are."""
    return f"'{value}'" if isinstance(value, str) else str(value)


def check_stratum_ids(values, feature_ids, layer, field):
    """Refuse stratum ids that are empty (NULL) or carried by more than one feature.

    Every feature of the strata layer is allocated as one stratum, so a stratum
    split over several features would get several allocations under one id, and
    a feature without an id could not be matched by the layout. Both are errors.

    Parameters
    ----------
    values : sequence
        The stratum id of each feature (None or NaN for NULL).
    feature_ids : sequence
        The host's feature ids, named in the messages.
    layer, field : str
        Layer and field names, named in the messages.

    Raises
    ------
    InputError
        Naming the layer, the field, the id and the feature ids, with the remedy.
    """
    values, feature_ids = list(values), list(feature_ids)
    null = np.array([_is_null(v) for v in values], dtype=bool)
    if null.any():
        chosen, shown = _listing(feature_ids, null)
        raise InputError(message(
            QT_TRANSLATE_NOOP("PlotwiseEngine",
                "Stratum field '{field}' of layer '{layer}' is empty (NULL) for feature(s) {ids}. Give every "
                "stratum an id, or remove those features from the layer."), field=field, layer=layer, ids=shown),
            ids=chosen)
    features = {}
    for value, fid in zip(values, feature_ids):
        try:
            features.setdefault(value, []).append(fid)
        except TypeError:  # an unhashable value: compare by its text
            features.setdefault(str(value), []).append(fid)
    repeated = [(value, fids) for value, fids in features.items() if len(fids) > 1]
    if not repeated:
        return
    value, fids = repeated[0]
    _, shown = _listing(fids, np.ones(len(fids), dtype=bool))
    chosen = [fid for _, group in repeated for fid in group]
    if len(repeated) == 1:
        text = message(
            QT_TRANSLATE_NOOP("PlotwiseEngine",
                "Features {ids} of layer '{layer}' carry the same stratum id {value} in field '{field}', so each "
                "would get its own allocation. Dissolve the strata by '{field}' first (the host's Dissolve tool; "
                "then recompute the area field, or leave AREA_FIELD empty to use the polygon areas), or give each "
                "feature its own id."), ids=shown, layer=layer, value=_shown_id(value), field=field)
    else:
        others = ", ".join(_shown_id(v) for v, _ in repeated[1:21]) + (" …" if len(repeated) > 21 else "")
        text = message(
            QT_TRANSLATE_NOOP("PlotwiseEngine",
                "Several stratum ids in field '{field}' of layer '{layer}' are carried by more than one feature: "
                "{value} (features {ids}) and {more} other id(s) ({others}), so each of those features would get "
                "its own allocation. Dissolve the strata by '{field}' first (the host's Dissolve tool; then "
                "recompute the area field, or leave AREA_FIELD empty to use the polygon areas), or give each "
                "feature its own id."), field=field, layer=layer, value=_shown_id(value), ids=shown,
            more=len(repeated) - 1, others=others)
    raise InputError(text, ids=chosen)


def check_values(values, name, ids, allow_zero=False):
    """Return ``values`` as floats, or raise :class:`InputError` naming the bad strata.

    NULL (None/NaN), text, negative and (unless ``allow_zero``) zero values are refused.
    """
    v = np.array([_as_number(x) for x in values], dtype=float)
    bad = ~np.isfinite(v) | (v < 0 if allow_zero else v <= 0)
    if bad.any():
        chosen, shown = _listing(ids, bad)
        if allow_zero:
            text = message(
                QT_TRANSLATE_NOOP("PlotwiseEngine",
                    "The {name} is NULL or negative for stratum feature(s) {shown}. Fill in a non-negative value "
                    "for every stratum, or remove those strata from the layer."), name=name, shown=shown)
        else:
            text = message(
                QT_TRANSLATE_NOOP("PlotwiseEngine",
                    "The {name} is NULL, negative or zero for stratum feature(s) {shown}. Fill in a positive value "
                    "for every stratum, or remove those strata from the layer."), name=name, shown=shown)
        raise InputError(text, ids=chosen)
    return v


# ----------------------------------------------------------------------------
# the whole step
# ----------------------------------------------------------------------------
@dataclass(frozen=True, eq=False)
class AllocationInput:
    """The input of :func:`allocate` after :func:`_allocate_iv`, checked.

    ``s``, ``m`` and ``c`` are the pilot SDs, means and costs (None when not
    given); ``lower`` and ``upper`` the bounds per stratum; ``target`` the
    target used (``"total"``, ``"budget"`` or ``"target_cv"``).
    """

    method: str
    ids: tuple
    area: np.ndarray
    unit_area: float
    s: object
    m: object
    c: object
    fixed_cost: float
    min_per_stratum: int
    capacity: np.ndarray
    lower: np.ndarray
    upper: np.ndarray
    target: str
    total: object
    budget: object
    target_cv: object
    fpc: bool
    names: dict
    warnings: tuple


def _allocate_iv(areas, unit_area, method, total, budget, target_cv, sds, means, costs, fixed_cost, min_per_stratum,
                 ids, names, fpc):
    names = {**_DEFAULT_NAMES, **(names or {})}
    if method not in METHODS:
        raise InputError(message(QT_TRANSLATE_NOOP("PlotwiseEngine",
            "Unknown allocation method {method!r}; use one of: {methods}."),
                                 method=method, methods=", ".join(METHODS)))
    n_strata = len(areas)
    if n_strata == 0:
        raise InputError(message(QT_TRANSLATE_NOOP("PlotwiseEngine",
            "The strata layer has no features. Run the stratification first.")))
    ids = list(range(1, n_strata + 1)) if ids is None else list(ids)
    area = check_values(areas, names["area"], ids)
    unit_area = float(unit_area)
    if not np.isfinite(unit_area) or unit_area <= 0:
        raise InputError(message(QT_TRANSLATE_NOOP("PlotwiseEngine", "The unit area must be a positive number.")))
    min_per_stratum = int(min_per_stratum)
    if min_per_stratum < 1:
        raise InputError(message(
            QT_TRANSLATE_NOOP("PlotwiseEngine",
                "The minimum per stratum must be at least 1 (2 lets each stratum variance be estimated).")))
    s = None if sds is None else check_values(sds, names["sd"], ids, allow_zero=True)
    m = None if means is None else check_values(means, names["mean"], ids, allow_zero=True)
    target = "target_cv" if target_cv is not None and target_cv > 0 else (
        "budget" if budget is not None and budget > 0 else "total")
    c = None
    if costs is not None:
        c = check_values(costs, names["cost"], ids)
    elif method == "optimal_cost" or target == "budget":
        raise InputError(
            message(QT_TRANSLATE_NOOP("PlotwiseEngine",
                "The cost method needs a cost per unit for every stratum: choose the cost field."))
            if method == "optimal_cost"
            else message(QT_TRANSLATE_NOOP("PlotwiseEngine",
                "The budget needs a cost per unit for every stratum: choose the cost field."))
        )
    fixed_cost = float(fixed_cost or 0.0)
    if fixed_cost < 0:
        raise InputError(message(QT_TRANSLATE_NOOP("PlotwiseEngine", "The fixed cost must be zero or positive.")))
    capacity, lower, upper, warnings = _stratum_bounds(area, unit_area, min_per_stratum, ids)
    if target == "target_cv" and budget is not None and budget > 0:
        warnings.append(message(QT_TRANSLATE_NOOP("PlotwiseEngine", "A target CV is set: the budget is not used.")))
    return AllocationInput(method, tuple(ids), area, unit_area, s, m, c, fixed_cost, min_per_stratum, capacity,
                           lower, upper, target, total, budget, target_cv, bool(fpc), names, tuple(warnings))


def _stratum_bounds(area, unit_area, min_per_stratum, ids):
    """``N_h = A_h / a``, the bounds ``min(minimum, ⌊N_h⌋) ≤ n_h ≤ ⌊N_h⌋``, and warnings."""
    capacity = unit_capacity(area, unit_area)
    upper = np.floor(capacity + 1e-9).astype(int)
    if np.any(upper < 1):
        chosen, shown = _listing(ids, upper < 1)
        raise InputError(
            message(QT_TRANSLATE_NOOP("PlotwiseEngine",
                "Stratum feature(s) {shown} are smaller than one sample unit of {unit_area:g}. "
                "Merge them with a neighbour or use a smaller unit area."), shown=shown, unit_area=unit_area),
            ids=chosen,
        )
    lower = np.minimum(min_per_stratum, upper)
    warnings = []
    if np.any(upper < min_per_stratum):
        _, shown = _listing(ids, upper < min_per_stratum)
        warnings.append(message(
            QT_TRANSLATE_NOOP("PlotwiseEngine",
                "Stratum feature(s) {shown} hold fewer than {minimum} units: they get all the units that fit."),
            shown=shown, minimum=min_per_stratum))
    return capacity, lower, upper, warnings


def _method_applied(inp):
    """The method used after the fallbacks for missing or zero pilot SDs, and its warnings."""
    method, s, names, ids = inp.method, inp.s, inp.names, list(inp.ids)
    if method not in ("neyman", "optimal_cost"):
        return method, []
    if s is None:
        return ("proportional" if method == "neyman" else method), [
            message(QT_TRANSLATE_NOOP("PlotwiseEngine",
                "No pilot standard deviations: the allocation assumes equal SDs in all strata "
                "(proportional to area)."))
            if method == "neyman"
            else message(QT_TRANSLATE_NOOP("PlotwiseEngine",
                "No pilot standard deviations: the allocation assumes equal SDs in all strata "
                "(area / square root of cost)."))]
    if not np.any(s > 0):
        return "proportional", [message(QT_TRANSLATE_NOOP("PlotwiseEngine",
            "All pilot standard deviations are zero: proportional allocation is used "
            "instead."))]
    if np.any(s == 0):
        _, shown = _listing(ids, s == 0)
        return method, [message(
            QT_TRANSLATE_NOOP("PlotwiseEngine",
                "The {name} is zero for stratum feature(s) {shown}: they get only the minimum "
                "of {minimum} unit(s). A pilot with no variation is rarely the truth; check it."),
            name=names["sd"], shown=shown, minimum=inp.min_per_stratum)]
    return method, []


def _allocation_for_budget(inp, scores):
    c, lower, upper = inp.c, inp.lower, inp.upper
    minimum = inp.fixed_cost + float(np.sum(c * lower))
    maximum = inp.fixed_cost + float(np.sum(c * upper))
    if inp.budget < minimum:
        raise InputError(message(
            QT_TRANSLATE_NOOP("PlotwiseEngine",
                "The budget {budget:g} is below the minimum of {minimum:g} (fixed cost {fixed_cost:g} plus "
                "{per_stratum} unit(s) in every stratum at its cost). Raise the budget or lower the "
                "minimum per stratum."), budget=inp.budget, minimum=minimum, fixed_cost=inp.fixed_cost,
            per_stratum=inp.min_per_stratum))
    spend = min(float(inp.budget), maximum) - inp.fixed_cost
    warnings = []
    if inp.budget > maximum:
        warnings.append(message(
            QT_TRANSLATE_NOOP("PlotwiseEngine",
                "The budget exceeds the cost of every unit that fits ({maximum:g}): all units are taken."),
            maximum=maximum))
    x = bounded_allocation(scores, spend, lower, upper, c)
    return round_within_budget(x, spend, c, lower, upper), x, warnings


def _allocation_for_total(inp, scores):
    total, lower, upper = inp.total, inp.lower, inp.upper
    if total is None or total <= 0:
        raise InputError(message(QT_TRANSLATE_NOOP("PlotwiseEngine",
            "Give a total number of units, a budget (with costs) or a target CV.")))
    total = int(round(total))
    if total < lower.sum():
        raise InputError(message(
            QT_TRANSLATE_NOOP("PlotwiseEngine",
                "The total of {total} units is below the minimum of {minimum} "
                "({per_stratum} per stratum over {n_strata} strata). Raise the total or lower the minimum."),
            total=total, minimum=int(lower.sum()), per_stratum=inp.min_per_stratum, n_strata=len(inp.ids)))
    if total > upper.sum():
        raise InputError(message(
            QT_TRANSLATE_NOOP("PlotwiseEngine",
                "The total of {total} units exceeds the {fit} units of {unit_area:g} that fit "
                "in the strata. Lower the total or use smaller units."),
            total=total, fit=int(upper.sum()), unit_area=inp.unit_area))
    x = bounded_allocation(scores, total, lower, upper)
    return largest_remainder_round(x, total, lower, upper), x, []


def _result_warnings(inp, n, x):
    ids, warnings = list(inp.ids), []
    if np.any(n == 1):
        _, shown = _listing(ids, n == 1)
        warnings.append(message(
            QT_TRANSLATE_NOOP("PlotwiseEngine",
                "Stratum feature(s) {shown} get one unit only: their variance cannot be estimated."), shown=shown))
    x_at_cap = np.isclose(x, inp.upper) & (inp.upper > inp.lower)
    if np.any(x_at_cap):
        _, shown = _listing(ids, x_at_cap)
        warnings.append(message(QT_TRANSLATE_NOOP("PlotwiseEngine",
            "Stratum feature(s) {shown} are sampled completely (every unit that fits)."),
                                shown=shown))
    if inp.m is not None and np.any(inp.m == 0):
        _, shown = _listing(ids, inp.m == 0)
        warnings.append(message(QT_TRANSLATE_NOOP("PlotwiseEngine",
            "The {name} is zero in stratum feature(s) {shown}: their CV is undefined."),
                                name=inp.names["mean"], shown=shown))
    return warnings


def allocate(
    areas,
    unit_area,
    method="neyman",
    *,
    total=None,
    budget=None,
    target_cv=None,
    sds=None,
    means=None,
    costs=None,
    fixed_cost=0.0,
    min_per_stratum=DEFAULT_MIN_PER_STRATUM,
    ids=None,
    names=None,
    fpc=True,
    layout_design=None,
):
    """Units per stratum for a total, a budget or a target CV.

    Exactly one target is used: ``target_cv`` if given (> 0), else ``budget``
    (> 0, needs ``costs``), else ``total``. For a target CV the smallest total is
    found (by bisection, the CV falls as the total grows) whose rounded allocation
    has an expected CV of the overall density at most ``target_cv`` (Cochran
    1977, ch. 5).

    Parameters
    ----------
    areas : array_like
        Stratum areas ``A_h`` (same area unit as ``unit_area``).
    unit_area : float
        Area of one sample unit ``a``.
    method : {"equal", "proportional", "neyman", "optimal_cost"}
    total : int, optional
    budget : float, optional
        ``C`` in ``C = c0 + sum c_h n_h``.
    target_cv : float, optional
        Wanted CV of the overall density, e.g. 0.2.
    sds, means, costs : array_like, optional
        Pilot SD and mean of counts per unit, cost per unit, per stratum.
    fixed_cost : float
        ``c0``, the cost that does not depend on the number of units.
    min_per_stratum : int
        Lower bound per stratum (default 2: common practice).
    ids : sequence, optional
        Stratum identifiers used in messages.
    names : dict, optional
        Display names for ``area``, ``sd``, ``mean`` and ``cost`` in messages
        (e.g. the field names).
    fpc : bool
        Apply the finite-population correction ``1 − n_h a / A_h``.
    layout_design : str, optional
        The design record of the layout to come (:data:`edge.DESIGN_RECORDS`);
        when given it decides ``fpc``: the correction only where the units
        cannot overlap (:func:`edge.fpc_holds`).

    Returns
    -------
    Allocation
    """
    if layout_design is not None:
        fpc = bool(edge.fpc_holds(layout_design))
    inp = _allocate_iv(areas, unit_area, method, total, budget, target_cv, sds, means, costs, fixed_cost,
                       min_per_stratum, ids, names, fpc)
    used, warnings = _method_applied(inp)
    warnings = list(inp.warnings) + warnings
    n, x, more = _units_for_target(inp, allocation_scores(used, inp.area, inp.s, inp.c))
    warnings += more + _result_warnings(inp, n, x)
    total = int(n.sum())
    precision = expected_precision(n, inp.area, inp.unit_area, inp.s, inp.m, inp.fpc)
    comparison = compare_methods(total, inp.area, inp.unit_area, inp.s, inp.m, inp.lower, inp.upper,
                                 precision.variance_mean, inp.fpc)
    return Allocation(
        method=method, method_used=used, target=inp.target, ids=inp.ids, n=n, n_continuous=x, total=total,
        lower=inp.lower, upper=inp.upper, capacity=inp.capacity,
        cost=float(inp.fixed_cost + np.sum(inp.c * n)) if inp.c is not None else np.nan,
        precision=precision, comparison=comparison, warnings=tuple(warnings), fpc=inp.fpc,
    )


def _units_for_target(inp, scores):
    """Whole and continuous units per stratum for the run's target (target CV, budget or total), and warnings."""
    if inp.target == "target_cv":
        n, x = _allocation_for_cv(float(inp.target_cv), scores, inp.area, inp.unit_area, inp.s, inp.m, inp.lower,
                                  inp.upper, inp.fpc, inp.names)
        return n, x, []
    if inp.target == "budget":
        return _allocation_for_budget(inp, scores)
    return _allocation_for_total(inp, scores)


def _allocation_for_cv(target_cv, scores, area, unit_area, s, m, lower, upper, fpc, names):
    """Smallest total whose rounded allocation has expected CV <= target (bisection)."""
    if s is None or m is None:
        raise InputError(message(
            QT_TRANSLATE_NOOP("PlotwiseEngine",
                "A target CV needs both the pilot standard deviation and the pilot mean count per unit: "
                "choose the SD field and the mean field.")
        ))
    if not np.sum(stratum_weights(area) * m) > 0:
        raise InputError(message(QT_TRANSLATE_NOOP("PlotwiseEngine",
            "The {name} is zero in every stratum: no CV can be computed."), name=names["mean"]))

    def design(total):
        x = bounded_allocation(scores, total, lower, upper)
        n = largest_remainder_round(x, total, lower, upper)
        return n, x, expected_precision(n, area, unit_area, s, m, fpc).cv

    lo_total, hi_total = int(lower.sum()), int(upper.sum())
    n, x, cv = design(hi_total)
    if cv > target_cv:
        raise InputError(message(
            QT_TRANSLATE_NOOP("PlotwiseEngine",
                "The target CV of {target_cv:.3g} cannot be reached: even all {fit} units that fit give "
                "an expected CV of {cv:.3g}. Accept a CV of at least {cv:.3g}, or use smaller units."),
            target_cv=target_cv, fit=hi_total, cv=cv))
    best = (n, x)
    n, x, cv = design(lo_total)
    if cv <= target_cv:
        return n, x
    while hi_total - lo_total > 1:  # invariant: cv(lo_total) > target >= cv(hi_total)
        mid = (lo_total + hi_total) // 2
        n, x, cv = design(mid)
        if cv <= target_cv:
            hi_total, best = mid, (n, x)
        else:
            lo_total = mid
    return best


def compare_methods(total, areas, unit_area, sds, means, lower, upper, reference_variance=np.nan, fpc=True):
    """Equal, proportional and Neyman allocations of ``total`` with the same bounds.

    Returns a tuple of :class:`MethodComparison`; Neyman is left out without SDs
    (or when all are zero). ``relative_variance`` is the variance divided by
    ``reference_variance``.
    """
    rows = []
    methods = ["equal", "proportional"]
    if sds is not None and np.any(np.asarray(sds) > 0):
        methods.append("neyman")
    for method in methods:
        q = allocation_scores(method, areas, sds)
        n = largest_remainder_round(bounded_allocation(q, total, lower, upper), total, lower, upper)
        p = expected_precision(n, areas, unit_area, sds, means, fpc)
        rel = p.variance_mean / reference_variance if reference_variance > 0 else np.nan
        rows.append(MethodComparison(method, n, p, float(rel)))
    return tuple(rows)
