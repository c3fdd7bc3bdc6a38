"""Trends over the years of a monitoring programme.

From unit counts
----------------
Counts ``y_it`` of unit i in year t (not every unit every year: revisit panels) with
survey effort ``e_it`` (1 unless a unit-area field is given) follow a log-linear
Poisson model with one effect per unit (McCullagh & Nelder 1989, ch. 6):

    log E[y_it] = log e_it + α_i + β (t − t̄)

The annual change is ``exp(β) − 1``. Given β the unit effects have a closed form,
``exp(α_i) = Y_i / Σ_t e_it exp(β (t − t̄))`` with ``Y_i = Σ_t y_it``, so only β is
fitted (Newton's method on the profile log-likelihood, which is concave; the profile
information equals the Schur complement of the full information, so the standard
error is the full model's). Units that counted nothing in every visit carry no
information on β and are left out of the fit.

Overdispersion is handled by quasi-likelihood (McCullagh & Nelder 1989, ch. 9) at two
levels:

* between units: the Pearson scale ``φ = X² / (N − n − 1)`` of the trend model gives
  ``se_unit = √(φ / I_β)`` (``I_β`` the Poisson profile information); this is the
  standard error of a Poisson GLM with unit dummies and Pearson scale;
* between years: counts of one year share that year's weather, observers and
  conditions, which the unit-level scale does not see. The model with one effect per
  year, ``log E[y_it] = log e_it + α_i + γ_t`` (fitted by iterative proportional fitting
  of the unit and year totals; Bishop, Fienberg & Holland 1975), gives the deviance drop
  ``ΔD`` from the trend model on ``d = T − c − 1`` degrees of freedom (T years, c linked
  sets of units and years: 1 unless rotating panels never meet). With year effects
  ``γ̂ = β x + v + e``, ``Var(v) = σ_Y² I`` (year-to-year variation) and
  ``Var(e) = φ S⁻`` (S the year effects' information, φ the Pearson scale within years),
  ``E[ΔD] = φ d + σ_Y² tr(Q)`` with ``Q = S − S x x'S / x'S x``, and the GLM slope
  ``β̂ ≈ x'S γ̂ / x'S x`` has variance ``φ / I_β + σ_Y² L``, ``L = ‖S x‖² / (x'S x)²``.
  When every unit visits every year of its linked set (the every-year and rotating
  designs) the standard error used is ``se = √(ΔD / d / I_β)``, the quasi-likelihood F
  scaling (McCullagh & Nelder 1989, ch. 9): with large counts, the t test of the slope
  of the weighted regression of the log yearly totals on year. With split panels the
  slope leans on single years more than the average lack-of-fit contrast does, and
  ``se = √(ΔD / d · max(L d / tr(Q), 1 / I_β))``: unbiased when the year-to-year
  variation dominates, on the safe side without it (our derivation, checked by
  simulation in the tests). Student's t on d degrees of freedom in both cases. Our
  choice: always allow for year-to-year variation. The
  moment estimate ``σ_Y² = max(0, (ΔD − φ d) / tr(Q))`` (DerSimonian & Laird 1986, here
  for a log-linear model) is reported.

Yearly indices are the year-effect model's expected mean count per unit at the mean
effort, with delta-method intervals from the Pearson scale of that model.

From yearly estimates
---------------------
Estimates ``N_t`` with standard errors ``s_t`` (as ``plotwise:estimate`` writes them)
are regressed on the log scale, ``log N_t = a + β (t − t̄) + e_t``, with
``Var(e_t) = v_t + τ²``: ``v_t = ln(1 + (s_t / N_t)²)`` the sampling variance of
``log N_t`` and τ² the year-to-year (process) variance, estimated by the method of
moments of DerSimonian & Laird (1986) in its regression form (Thompson & Sharp 1999):

    τ² = max(0, (Q − (k − 2)) / (Σ w − tr((X'WX)⁻¹ X'W²X))),   w = 1 / v,

Q the weighted residual sum of squares. The trend is then the weighted regression with
``w* = 1 / (v + τ²)``, so a noisy year counts less; its variance is scaled by the
weighted residual mean square and tested with t on k − 2 degrees of freedom
(Hartung & Knapp 2001).

Nothing here imports the host.
"""
from dataclasses import dataclass

import numpy as np
from scipy import sparse, stats
from scipy.sparse.csgraph import connected_components

from .errors import QT_TRANSLATE_NOOP, InputError, message
from .listing import listed_ids

MIN_YEARS = 3
NEWTON_TOL = 1e-12
NEWTON_MAX = 100
MAX_STEP = 1.0  # at most a change of exp(1) per year and iteration
IPF_TOL = 1e-11
IPF_MAX = 2000
SOURCE_COUNTS, SOURCE_ESTIMATES = "counts", "estimates"


# ----------------------------------------------------------------------------
# the counts as a unit x year table
# ----------------------------------------------------------------------------
@dataclass(frozen=True)
class CountTable:
    """Unit counts as (units, years) arrays: ``counts`` (0 where not visited),
    ``visited``, ``effort`` (0 where not visited); ``years`` sorted calendar years;
    ``strata`` one per unit or None; ``skipped`` records without a count."""

    unit_ids: tuple
    years: np.ndarray
    counts: np.ndarray
    visited: np.ndarray
    effort: np.ndarray
    strata: tuple
    n_records: int
    skipped: int

    @property
    def x(self):
        """Years centred on the mean of the years with data."""
        return self.years - self.years.mean()


def _as_float(values):
    return np.array([np.nan if v is None else float(v) for v in values], dtype=float)


def _whole(values):
    """True where the floats ``values`` are finite whole numbers."""
    with np.errstate(invalid="ignore"):
        return np.isfinite(values) & (values == np.round(values))


def _refuse_records(record_ids, mask, text):
    """Stop with ``text`` (a ``PlotwiseEngine`` text with ``{ids}``), naming the records where ``mask`` holds."""
    bad = [record_ids[i] for i in np.flatnonzero(mask)]
    if bad:
        raise InputError(message(text, ids=listed_ids(bad)), ids=bad)


def count_table_iv(unit_ids, years, counts, effort=None, strata=None, record_ids=None):
    """Check unit-count records and arrange them as a :class:`CountTable`.

    Parameters
    ----------
    unit_ids, years, counts : sequences of one value per record
        A count of None means the unit was not surveyed that year (the record is skipped).
    effort : sequence, optional
        The area (or length) surveyed in the record, above 0.
    strata : sequence, optional
        The stratum of each record's unit.
    record_ids : sequence, optional
        Feature ids for messages (default: the record number).

    Raises
    ------
    InputError
        For missing unit ids or years, years that are not whole numbers, negative or
        non-finite counts, effort not above 0, a unit counted twice in a year, a unit in
        two strata, or fewer than 3 years with counts.
    """
    n = len(unit_ids)
    record_ids = list(record_ids) if record_ids is not None else list(range(1, n + 1))
    year_values = _as_float(years)
    no_unit = np.array([u is None for u in unit_ids], dtype=bool)
    _refuse_records(record_ids, no_unit | ~_whole(year_values), QT_TRANSLATE_NOOP(
        "PlotwiseEngine",
        "Records {ids} have no unit id or no whole-number year. Fill both in, or remove the records."))
    count_values = _as_float(counts)
    given = np.array([c is not None for c in counts], dtype=bool)
    _refuse_records(record_ids, given & ~(np.isfinite(count_values) & (count_values >= 0)), QT_TRANSLATE_NOOP(
        "PlotwiseEngine",
        "Records {ids} have a negative or non-numeric count. Counts are 0 or more; leave the count empty (NULL) "
        "when the unit was not surveyed."))
    effort_values = np.ones(n) if effort is None else _as_float(effort)
    _refuse_records(record_ids, given & ~(np.isfinite(effort_values) & (effort_values > 0)), QT_TRANSLATE_NOOP(
        "PlotwiseEngine",
        "Records {ids} have no unit area (or one not above 0). Give every surveyed record its area, or leave the "
        "unit-area field empty."))
    keep = np.flatnonzero(given)
    return _arrange_counts(
        [unit_ids[i] for i in keep], year_values[keep].astype(int), count_values[keep], effort_values[keep],
        None if strata is None else [strata[i] for i in keep], [record_ids[i] for i in keep], n - len(keep))


def _arrange_counts(units, years, counts, effort, strata, record_ids, skipped):
    unit_keys = tuple(dict.fromkeys(units))
    calendar = np.unique(years)
    if len(calendar) < MIN_YEARS:
        raise InputError(message(QT_TRANSLATE_NOOP(
            "PlotwiseEngine",
            "A trend needs counts from at least {k} different years; the records hold {found}."),
            k=MIN_YEARS, found=", ".join(str(y) for y in calendar) or "none"))
    row = {key: i for i, key in enumerate(unit_keys)}
    rows = np.array([row[u] for u in units], dtype=int)
    cols = np.searchsorted(calendar, years)
    seen = {}
    twice = []
    for r, c, rid in zip(rows, cols, record_ids):
        if (r, c) in seen:
            twice.append(f"{unit_keys[r]} {calendar[c]} ({seen[(r, c)]}, {rid})")
        seen[(r, c)] = rid
    if twice:
        raise InputError(message(QT_TRANSLATE_NOOP(
            "PlotwiseEngine",
            "Units were counted twice in one year (unit, year and record ids): {items}. Keep one record per unit and "
            "year (add the counts of repeated visits first)."),
            items=listed_ids(twice)))
    shape = (len(unit_keys), len(calendar))
    table, visited, area = np.zeros(shape), np.zeros(shape, dtype=bool), np.zeros(shape)
    table[rows, cols], visited[rows, cols], area[rows, cols] = counts, True, effort
    return CountTable(unit_keys, calendar.astype(float), table, visited, area,
                      _unit_strata(unit_keys, units, strata), len(units), int(skipped))


def _unit_strata(unit_keys, units, strata):
    if strata is None:
        return None
    by_unit = {}
    for u, s in zip(units, strata):
        by_unit.setdefault(u, set()).add(s)
    mixed = [u for u, s in by_unit.items() if len(s) > 1]
    if mixed:
        raise InputError(message(QT_TRANSLATE_NOOP(
            "PlotwiseEngine",
            "Units {ids} lie in more than one stratum across their records. A unit keeps its stratum over the years: "
            "correct the stratum field."),
            ids=listed_ids(mixed)), ids=mixed)
    return tuple(next(iter(by_unit[u])) for u in unit_keys)


# ----------------------------------------------------------------------------
# the fits, on the unit (or group) and year totals, replicates first
# ----------------------------------------------------------------------------
@dataclass(frozen=True)
class TrendFit:
    """The two models fitted to R sets of counts (arrays over replicates).

    ``beta`` the log-linear trend per year, ``information`` its Poisson profile
    information ``I_β``, ``lack_of_fit`` the deviance drop ``ΔD`` from the trend model
    to the year-effect model on ``lof_df`` degrees of freedom, ``converged`` whether
    Newton's method met its tolerance; ``dispersion`` the Pearson scale φ of the
    year-effect model (variation between units within years) on ``dispersion_df``
    degrees of freedom, ``year_variance`` the moment estimate of the year-to-year
    variance σ_Y² on the log scale, ``year_leverage`` the factor ``‖S x‖² / (x'S x)²``
    that turns it into variance of β, ``year_trace`` the ``tr(Q)`` of the estimate and
    ``complete`` whether every unit visits every year of its linked set. ``group_effect``
    (R, P) are the trend model's ``exp(α_p)``; ``year_group_effect`` (R, P) and
    ``year_effect`` (R, T) the year-effect model's ``exp(α_p)`` and ``exp(γ_t)``.
    """

    beta: np.ndarray
    information: np.ndarray
    lack_of_fit: np.ndarray
    lof_df: np.ndarray
    converged: np.ndarray
    dispersion: np.ndarray
    dispersion_df: np.ndarray
    year_variance: np.ndarray
    year_leverage: np.ndarray
    year_trace: np.ndarray
    complete: np.ndarray
    group_effect: np.ndarray
    year_group_effect: np.ndarray
    year_effect: np.ndarray
    mean_x: np.ndarray

    @property
    def year_dispersion(self):
        """``ΔD / d``, the deviance drop per degree of freedom (NaN where d < 1)."""
        with np.errstate(divide="ignore", invalid="ignore"):
            return np.where(self.lof_df >= 1, self.lack_of_fit / np.maximum(self.lof_df, 1), np.nan)

    @property
    def se(self):
        """The standard error of β allowing for variation between units and from year to
        year (NaN where d < 1): ``√(ΔD / d / I_β)`` when every unit visits every year of its
        linked set, else ``√(ΔD / d · max(L d / tr(Q), 1 / I_β))`` (see the module notes)."""
        with np.errstate(divide="ignore", invalid="ignore"):
            d = np.maximum(self.lof_df, 1)
            factor = np.where(self.complete, 1.0 / self.information,
                              np.maximum(self.year_leverage * d / self.year_trace, 1.0 / self.information))
            return np.where(self.lof_df >= 1, np.sqrt(self.lack_of_fit / d * factor), np.nan)


def _moments(beta, effort, x):
    """``S_k = Σ_t e_pt x_t^k exp(β x_t)`` for k = 0, 1, 2: arrays (R, P)."""
    g = np.exp(beta[:, None] * x[None, :])
    return g @ effort.T, (g * x) @ effort.T, (g * x * x) @ effort.T


def fit_trend_slope(group_totals, year_totals, effort, x):
    """Newton's method for β on the profile log-likelihood
    ``ℓ(β) = β Σ_t Y_·t x_t − Σ_p Y_p log Σ_t e_pt exp(β x_t)``.

    Parameters
    ----------
    group_totals : (R, P) array
        ``Y_p``, the counts of each unit (or group of units with the same visits) summed
        over its visits.
    year_totals : (R, T) array
        ``Y_·t``, the counts of each year.
    effort : (P, T) array
        Effort of each group in each year, 0 where not visited.
    x : (T,) array
        Centred years.

    Returns
    -------
    beta, information, converged : arrays (R,)
    """
    target = year_totals @ x
    beta = np.zeros(len(group_totals))
    converged = np.zeros(len(beta), dtype=bool)
    information = np.zeros(len(beta))
    with np.errstate(divide="ignore", invalid="ignore"):
        for _ in range(NEWTON_MAX):
            s0, s1, s2 = _moments(beta, effort, x)
            m1 = np.where(s0 > 0, s1 / s0, 0.0)
            m2 = np.where(s0 > 0, s2 / s0, 0.0)
            information = np.sum(group_totals * (m2 - m1 * m1), axis=1)
            step = np.clip((target - np.sum(group_totals * m1, axis=1)) / information, -MAX_STEP, MAX_STEP)
            step = np.where(information > 0, step, 0.0)
            beta = beta + np.where(converged, 0.0, step)
            converged |= np.abs(step) <= NEWTON_TOL * (1.0 + np.abs(beta))
            if converged.all():
                break
    bad = ~(information > 1e-12 * np.maximum(group_totals.sum(axis=1), 1.0))
    return np.where(bad, np.nan, beta), np.where(bad, np.nan, information), converged & ~bad


def fit_year_effects(group_totals, year_totals, effort):
    """The model with unit and year effects by iterative proportional fitting:
    ``A_p = Y_p / Σ_t e_pt b_t`` and ``b_t = Y_·t / Σ_p A_p e_pt`` until both margins fit
    (Bishop, Fienberg & Holland 1975, ch. 3; the maximum-likelihood fit of a log-linear
    model, incomplete tables included). Returns ``A`` (R, P) and ``b`` (R, T)."""
    b = np.ones(year_totals.shape)
    scale = np.maximum(group_totals, 1.0)
    with np.errstate(divide="ignore", invalid="ignore"):
        for _ in range(IPF_MAX):
            sb = b @ effort.T
            a = np.where(sb > 0, group_totals / sb, 0.0)
            sa = a @ effort
            b = np.where(sa > 0, year_totals / sa, 0.0)
            if np.max(np.abs(a * (b @ effort.T) - group_totals) / scale) < IPF_TOL:
                break
    return a, b


def linked_groups(effort, active, complete=False):
    """Number of linked sets ``c`` and of years ``T`` reached, per replicate.

    Groups with ``active`` (R, P) True and the years they visit form a bipartite graph;
    ``c`` is its number of connected components, ``T`` the years it holds. Replicates
    with the same active groups share one graph. With ``complete``, also whether every
    active group visits every year of its component (a complete table in each linked
    set: the every-year and the rotating designs, not split panels).
    """
    visits = effort > 0
    patterns, inverse = np.unique(np.asarray(active, dtype=bool), axis=0, return_inverse=True)
    c = np.zeros(len(patterns), dtype=int)
    t = np.zeros(len(patterns), dtype=int)
    full = np.zeros(len(patterns), dtype=bool)
    n_groups, n_years = visits.shape
    for k, pattern in enumerate(patterns):
        block = visits & pattern[:, None]
        years = block.any(axis=0)
        rows, cols = np.nonzero(block)
        graph = sparse.coo_matrix((np.ones(len(rows)), (rows, n_groups + cols)), shape=(n_groups + n_years,) * 2)
        _, labels = connected_components(graph, directed=False)
        used = np.concatenate([pattern, years])
        c[k] = len(np.unique(labels[used])) if used.any() else 0
        t[k] = int(years.sum())
        group_labels, year_labels = labels[:n_groups], labels[n_groups:]
        full[k] = all(np.array_equal(block[g], years & (year_labels == group_labels[g]))
                      for g in np.flatnonzero(pattern & block.any(axis=1)))
    inverse = np.asarray(inverse).ravel()
    return (c[inverse], t[inverse], full[inverse]) if complete else (c[inverse], t[inverse])


def _xlogy_sum(weights, values, axis=1):
    with np.errstate(divide="ignore", invalid="ignore"):
        return np.sum(np.where(weights > 0, weights * np.log(np.where(weights > 0, values, 1.0)), 0.0), axis=axis)


def year_information(a, b, effort, totals):
    """The year-effect model's information for the year effects with the unit effects
    profiled out, ``S = diag(M) − Σ_p μ_p μ_p' / Y_p`` (R, T, T), ``μ_pt = A_p b_t e_pt``,
    ``M_t = Σ_p μ_pt`` (McCullagh & Nelder 1989, ch. 6; the Schur complement)."""
    mu = a[:, :, None] * b[:, None, :] * effort[None]
    with np.errstate(divide="ignore", invalid="ignore"):
        scaled = np.where(totals[:, :, None] > 0, mu / np.where(totals > 0, totals, 1.0)[:, :, None], 0.0)
    schur = -np.einsum("rpt,rps->rts", scaled, mu)
    idx = np.arange(mu.shape[2])
    schur[:, idx, idx] += mu.sum(axis=1)
    return schur


def year_to_year_variance(schur, x, drop, df, dispersion):
    """The moment estimate of the year-to-year variance (DerSimonian & Laird 1986 in the form
    of a log-linear model): year effects ``γ̂ = β x + v + e`` with ``Var(v) = σ² I`` and
    ``Var(e) = φ S⁻``; the deviance drop is ``ΔD ≈ γ̂' Q γ̂``, ``Q = S − S x x' S / x'S x``,
    so ``E[ΔD] = φ d + σ² tr(Q)`` and ``σ² = max(0, (ΔD − φ d) / tr(Q))``. The GLM slope is
    ``β̂ ≈ x' S γ̂ / x'S x``, which adds ``σ² ‖S x‖² / (x'S x)²`` to its variance (a first-order
    expansion: our derivation, checked by simulation in the tests).

    Returns ``(σ², ‖S x‖² / (x'S x)², tr(Q))``, arrays (R,).
    """
    sx = schur @ x
    xsx = sx @ x
    with np.errstate(divide="ignore", invalid="ignore"):
        trace_q = np.trace(schur, axis1=1, axis2=2) - np.sum(sx * sx, axis=1) / xsx
        sigma2 = np.where(trace_q > 0, np.maximum(drop - dispersion * df, 0.0) / trace_q, 0.0)
        return sigma2, np.sum(sx * sx, axis=1) / xsx ** 2, trace_q


def cell_dispersion(counts, mu, cells, parameters):
    """Pearson scale ``Σ (y − μ)² / μ / (N − parameters)`` over the ``cells`` with μ > 0
    (arrays (R, ..., T)), 1 where no degree of freedom is left, and its degrees of freedom."""
    use = cells & (mu > 0)
    with np.errstate(divide="ignore", invalid="ignore"):
        x2 = np.sum(np.where(use, (counts - mu) ** 2 / np.where(use, mu, 1.0), 0.0), axis=tuple(range(1, mu.ndim)))
    df = use.sum(axis=tuple(range(1, mu.ndim))) - parameters
    return np.where(df > 0, x2 / np.maximum(df, 1), 1.0), np.maximum(df, 0)


def unit_dispersion(unit_counts, unit_group, effort, b, linked_parameters):
    """Pearson scale of the year-effect model from the counts of single units (R, n, T) whose
    groups (visits and effort) are ``unit_group``: ``μ_it = a_i b_t e_it`` with
    ``a_i = Y_i / Σ_s b_s e_is``. Because each unit's fitted total is its count total,
    ``X² = Σ y² / μ − Σ y``, summed unit by unit without forming μ. Returns the scale and
    its degrees of freedom."""
    unit_effort = effort[unit_group]
    visits = unit_effort > 0
    counts = unit_counts * visits[None]
    totals = counts.sum(axis=2)
    with np.errstate(divide="ignore", invalid="ignore"):
        a = np.where(totals > 0, totals / (b @ unit_effort.T), 0.0)
        inverse_b = np.where(b > 0, 1.0 / b, 0.0)
        inverse_e = np.where(visits, 1.0 / np.where(visits, unit_effort, 1.0), 0.0)
        squares = np.einsum("rit,rt,it->ri", counts * counts, inverse_b, inverse_e)
        x2 = np.sum(np.where(a > 0, squares / np.where(a > 0, a, 1.0), 0.0), axis=1) - totals.sum(axis=1)
    cells = np.sum(np.where(a > 0, np.einsum("it,rt->ri", visits.astype(float), (b > 0).astype(float)), 0.0), axis=1)
    df = cells - (totals > 0).sum(axis=1) - linked_parameters
    return np.where(df > 0, x2 / np.maximum(df, 1), 1.0), np.maximum(df, 0)


def fit_trend(table, effort, x, units=None):
    """Both models on R tables of counts: :class:`TrendFit`.

    Parameters
    ----------
    table : (R, P, T) array
        Counts of each unit, or group of units with the same visits and effort, in each
        year (0 where not visited).
    effort : (P, T) array
        Effort, 0 where not visited.
    x : (T,) array
        Centred years.
    units : tuple, optional
        ``(counts (R, n, T), group of each unit (n,))``: the counts of the single units when
        ``table`` holds groups of units, for the Pearson scale between units within years.
        Without it, the groups are taken as the units.

    Only the totals enter the fits: ``Y_p`` and ``Y_·t`` are sufficient for both log-linear
    models, and the deviance drop is

        ΔD = 2 [Σ_p Y_p (log S0_p − log Σ_t e_pt b_t) + Σ_t Y_·t (log b_t − β x_t)]

    (the terms ``y − μ`` vanish because each model fits every unit's total).
    """
    table = np.asarray(table, dtype=float)
    table = table[None] if table.ndim == 2 else table
    group_totals, year_totals = table.sum(axis=2), table.sum(axis=1)
    beta, information, converged = fit_trend_slope(group_totals, year_totals, effort, x)
    a, b = fit_year_effects(group_totals, year_totals, effort)
    s0, s1, _ = _moments(np.nan_to_num(beta), effort, x)
    with np.errstate(divide="ignore", invalid="ignore"):
        trend_effect = np.where(s0 > 0, group_totals / s0, 0.0)
        mean_x = np.where(s0 > 0, s1 / s0, 0.0)
    drop = 2.0 * (_xlogy_sum(group_totals, s0) - _xlogy_sum(group_totals, b @ effort.T)
                  + _xlogy_sum(year_totals, b) - year_totals @ x * np.nan_to_num(beta))
    c, years, complete = linked_groups(effort, group_totals > 0, complete=True)
    drop = np.where(np.isfinite(beta), np.maximum(drop, 0.0), np.nan)
    df = years - c - 1
    if units is None:
        mu = a[:, :, None] * b[:, None, :] * effort[None]
        dispersion, dispersion_df = cell_dispersion(table, mu, np.broadcast_to(effort > 0, mu.shape),
                                                    (group_totals > 0).sum(axis=1) + years - c)
    else:
        dispersion, dispersion_df = unit_dispersion(units[0], units[1], effort, b, years - c)
    sigma2, leverage, trace = year_to_year_variance(year_information(a, b, effort, group_totals), x, drop, df,
                                                    dispersion)
    return TrendFit(beta, information, drop, df, converged, dispersion, dispersion_df, sigma2, leverage, trace,
                    complete, trend_effect, a, b, mean_x)


# ----------------------------------------------------------------------------
# results
# ----------------------------------------------------------------------------
@dataclass(frozen=True)
class StratumTrend:
    """The trend of one stratum's units: change in % per year with its interval."""

    stratum: object
    n_units: int
    change: float
    change_lo: float
    change_hi: float
    p_value: float
    df: float


@dataclass(frozen=True)
class CountDetails:
    """What the unit-count fit saw: units (``n_units`` in the records, ``n_used`` in the
    fit), ``zero_units`` (counted nothing: left out), records used and ``skipped``
    (no count), the between-unit Pearson scale ``unit_dispersion`` with ``se_unit`` (the
    standard error a Poisson GLM with unit dummies and Pearson scale gives), ``year_sd``
    (the year-to-year SD on the log scale, from ``lack_of_fit`` on ``lof_df`` degrees of
    freedom), ``index_dispersion`` (the Pearson scale of the year-effect model: variation
    between units within years, for the index intervals and the trend), ``linked``
    (c, linked sets of units and years) and ``mean_effort``."""

    n_units: int
    n_used: int
    zero_units: tuple
    n_records: int
    skipped: int
    unit_dispersion: float
    se_unit: float
    year_sd: float
    lack_of_fit: float
    lof_df: int
    index_dispersion: float
    linked: int
    mean_effort: float
    year_level: bool


@dataclass(frozen=True)
class EstimateDetails:
    """What the yearly-estimate fit saw: ``sampling_cv`` per year, the process variance
    ``tau2`` on the log scale (method of moments), ``q`` (the weighted residual sum of
    squares without process variance), ``kh_scale`` (the residual mean square that
    scales the variance) and ``se_sampling_only`` (the standard error with τ² = 0 and no
    scaling)."""

    sampling_cv: np.ndarray
    tau2: float
    q: float
    kh_scale: float
    se_sampling_only: float


@dataclass(frozen=True)
class TrendResult:
    """A trend over years.

    ``years``, ``index`` with ``index_lo``/``index_hi`` (the yearly index: the expected
    mean count per unit, or the yearly estimate), ``fit`` with ``fit_lo``/``fit_hi``
    (the fitted trend line and its band at the years); ``beta`` (log-linear change per
    year) with ``se`` and ``df``; ``change``, ``change_lo``, ``change_hi`` in % per year;
    ``p_value`` (two-sided, no trend); ``details`` (:class:`CountDetails` or
    :class:`EstimateDetails`); ``strata`` (:class:`StratumTrend` per stratum).
    """

    source: str
    confidence: float
    years: np.ndarray
    index: np.ndarray
    index_lo: np.ndarray
    index_hi: np.ndarray
    fit: np.ndarray
    fit_lo: np.ndarray
    fit_hi: np.ndarray
    beta: float
    se: float
    df: float
    change: float
    change_lo: float
    change_hi: float
    p_value: float
    details: object
    strata: tuple = ()
    warnings: tuple = ()


def confidence_iv(confidence):
    confidence = float(confidence)
    if not 0.5 <= confidence < 1.0:
        raise InputError(message(QT_TRANSLATE_NOOP(
            "PlotwiseEngine",
            "CONFIDENCE must lie between 0.5 and 1 (for example 0.95); got {c:g}."),
            c=confidence))
    return confidence


def change_summary(beta, se, df, confidence):
    """Change in % per year ``100 (exp(β) − 1)``, its t interval and the two-sided p-value."""
    if not (np.isfinite(beta) and np.isfinite(se) and df >= 1):
        return float("nan"), float("nan"), float("nan"), float("nan")
    q = stats.t.ppf(0.5 + confidence / 2.0, df)
    p = 2.0 * stats.t.sf(abs(beta) / se, df) if se > 0 else 0.0
    to_pct = lambda b: 100.0 * np.expm1(b)  # noqa: E731
    return float(to_pct(beta)), float(to_pct(beta - q * se)), float(to_pct(beta + q * se)), float(p)


# ----------------------------------------------------------------------------
# the trend from unit counts
# ----------------------------------------------------------------------------
def _pearson(counts, mu, cells):
    with np.errstate(divide="ignore", invalid="ignore"):
        return float(np.sum(np.where(cells, (counts - mu) ** 2 / np.where(cells, mu, 1.0), 0.0)))


def _link_labels(cells):
    """Component label of every unit and every year of the (units, years) ``cells`` graph
    (-1 for units and years without cells)."""
    n, t = cells.shape
    rows, cols = np.nonzero(cells)
    graph = sparse.coo_matrix((np.ones(len(rows)), (rows, n + cols)), shape=(n + t,) * 2)
    _, labels = connected_components(graph, directed=False)
    unit_labels, year_labels = labels[:n].copy(), labels[n:].copy()
    unit_labels[~cells.any(axis=1)] = -1
    year_labels[~cells.any(axis=0)] = -1
    return unit_labels, year_labels


def _index_variance(t, members, a, mu, totals, free, schur_inv):
    """Delta-method variance (per unit of scale) of ``log(b_t Σ_{i in members} a_i)``:
    ``Σ w_i² / Y_i + (u − e_t)' S⁻¹ (u − e_t)``, ``w_i = a_i / Σ a``, ``u = B' (w / Y)``
    (B the fitted means of the free years, S their Schur complement)."""
    w = a[members] / a[members].sum()
    u = mu[members][:, free].T @ (w / totals[members])
    u[free == t] -= 1.0
    return float(np.sum(w * w / totals[members]) + u @ schur_inv @ u)


def year_index(table, a, b, dispersion, confidence):
    """Yearly index ``ē b_t Σ_{i∈C} a_i / n_C`` (C the linked set of year t, zero-count units
    included in ``n_C``) with delta-method intervals from the year-effect model's
    information (reference year: the first of each linked set) and ``dispersion``."""
    totals = table.counts.sum(axis=1)
    cells = table.visited & (totals > 0)[:, None]
    unit_labels, year_labels = _link_labels(cells)
    mu = a[:, None] * b[None, :] * table.effort * cells
    references = {lab: int(np.flatnonzero(year_labels == lab)[0]) for lab in set(year_labels.tolist()) if lab >= 0}
    free = np.array([t for t in range(len(table.years)) if year_labels[t] >= 0 and references[year_labels[t]] != t])
    used = totals > 0
    schur = np.diag(mu[:, free].sum(axis=0)) - (mu[used][:, free].T / totals[used]) @ mu[used][:, free]
    schur_inv = np.linalg.pinv(schur) if len(free) else np.zeros((0, 0))
    first_label = np.array([year_labels[np.flatnonzero(row)[0]] for row in table.visited])
    mean_effort = float(table.effort[table.visited].mean())
    z = stats.norm.ppf(0.5 + confidence / 2.0)
    index, lo, hi = (np.full(len(table.years), np.nan) for _ in range(3))
    for t in range(len(table.years)):
        lab = year_labels[t]
        if lab < 0:
            continue
        members = np.flatnonzero(unit_labels == lab)
        n_c = int(np.sum((unit_labels == lab) | (~used & (first_label == lab))))
        index[t] = mean_effort * b[t] * a[members].sum() / n_c
        if index[t] > 0:
            half = z * np.sqrt(dispersion * _index_variance(t, members, a, mu, totals, free, schur_inv))
            lo[t], hi[t] = index[t] * np.exp(-half), index[t] * np.exp(half)
    return index, lo, hi


def trend_line(table, fit, df, confidence):
    """The fitted trend ``ē Σ_i a_i exp(β x_t) / n`` at the years and its band,

        Var(log line_t) = φ (Σ w_i² / Y_i + (u − x_t)² / I_β) + σ_Y² (Σ_t m_t² + (u − x_t)² L)

    with ``w_i = a_i / Σ a``, ``u = Σ w_i x̄_i`` (x̄_i the unit's fitted mean year), ``m_t``
    the years' shares of the fitted counts, σ_Y² the year-to-year variance and L its
    leverage on β (:func:`year_to_year_variance`); t quantile on ``df``."""
    totals = table.counts.sum(axis=1)
    a = fit.group_effect[0]
    beta, info = float(fit.beta[0]), float(fit.information[0])
    used = totals > 0
    w = a[used] / a[used].sum()
    u = float(np.sum(w * fit.mean_x[0][used]))
    x = table.x
    line = float(table.effort[table.visited].mean()) * a.sum() * np.exp(beta * x) / len(a)
    shares = (a[:, None] * table.effort * np.exp(beta * x)[None, :]).sum(axis=0)
    shares = shares / shares.sum()
    variance = float(fit.dispersion[0]) * (np.sum(w * w / totals[used]) + (u - x) ** 2 / info)
    variance = variance + float(fit.year_variance[0]) * (np.sum(shares ** 2) + (u - x) ** 2 * float(
        fit.year_leverage[0]))
    half = stats.t.ppf(0.5 + confidence / 2.0, df) * np.sqrt(variance)
    return line, line * np.exp(-half), line * np.exp(half)


def _count_fit(table):
    """The fit of :func:`fit_trend` on one table, and the Pearson scale of the trend model."""
    totals = table.counts.sum(axis=1)
    if totals.sum() <= 0:
        raise InputError(message(QT_TRANSLATE_NOOP(
            "PlotwiseEngine",
            "Every count is 0: no trend can be estimated from records without animals.")))
    fit = fit_trend(table.counts[None], table.effort, table.x)
    if not np.isfinite(fit.beta[0]):
        raise InputError(message(QT_TRANSLATE_NOOP(
            "PlotwiseEngine",
            "The trend cannot be estimated: no unit with animals was counted in two different years. A trend needs "
            "units revisited over the years.")))
    if not fit.converged[0]:
        raise InputError(message(QT_TRANSLATE_NOOP(
            "PlotwiseEngine",
            "The trend did not converge (the counts may lie all in the first or all in the last years). Check the "
            "year and count fields.")))
    cells = table.visited & (totals > 0)[:, None]
    n_cells, n_used = int(cells.sum()), int((totals > 0).sum())
    mu_trend = fit.group_effect[0][:, None] * table.effort * np.exp(fit.beta[0] * table.x)[None, :]
    linked = int(len(set(_link_labels(cells)[1].tolist()) - {-1}))
    df_unit = n_cells - n_used - 1
    phi_unit = _pearson(table.counts, mu_trend, cells) / df_unit if df_unit > 0 else float("nan")
    return fit, phi_unit, df_unit, linked


def unit_count_trend(table, confidence=0.95, with_strata=True):
    """The log-linear trend from unit counts (see the module notes): :class:`TrendResult`."""
    confidence = confidence_iv(confidence)
    fit, phi_unit, df_unit, linked = _count_fit(table)
    totals = table.counts.sum(axis=1)
    beta, info = float(fit.beta[0]), float(fit.information[0])
    se_unit = float(np.sqrt(phi_unit / info)) if np.isfinite(phi_unit) else float("nan")
    lof_df = int(fit.lof_df[0])
    warnings = []
    year_level = lof_df >= 1
    if year_level:
        se, df = float(fit.se[0]), lof_df
    else:
        se, df = se_unit, max(df_unit, 1)
        warnings.append(message(QT_TRANSLATE_NOOP(
            "PlotwiseEngine",
            "This revisit design leaves no degrees of freedom for year-to-year variation (the panels do not link "
            "enough years): the interval allows only for variation between units, and is too narrow if whole years "
            "differ. Add a core of units visited every year.")))
    change, lo, hi, p = change_summary(beta, se, df, confidence)
    phi_index = float(fit.dispersion[0])
    index, index_lo, index_hi = year_index(table, fit.year_group_effect[0], fit.year_effect[0], phi_index, confidence)
    line, line_lo, line_hi = trend_line(table, fit, df, confidence)
    zero = tuple(u for u, y in zip(table.unit_ids, totals) if y <= 0)
    details = CountDetails(
        len(table.unit_ids), int((totals > 0).sum()), zero, table.n_records, table.skipped, phi_unit, se_unit,
        float(np.sqrt(fit.year_variance[0])) if year_level else float("nan"), float(fit.lack_of_fit[0]), lof_df,
        phi_index, linked, float(table.effort[table.visited].mean()), year_level)
    strata = stratum_trends(table, confidence) if with_strata and table.strata is not None else ()
    return TrendResult(SOURCE_COUNTS, confidence, table.years, index, index_lo, index_hi, line, line_lo, line_hi,
                       beta, se, float(df), change, lo, hi, p, details, strata, tuple(warnings))


def stratum_trends(table, confidence):
    """:class:`StratumTrend` for each stratum's units fitted on their own (strata that cannot
    give a trend, too few units or years, get NaN)."""
    rows = []
    for key in dict.fromkeys(table.strata):
        keep = np.array([s == key for s in table.strata])
        years = table.visited[keep].any(axis=0)
        sub = CountTable(tuple(u for u, k in zip(table.unit_ids, keep) if k), table.years[years],
                         table.counts[keep][:, years], table.visited[keep][:, years], table.effort[keep][:, years],
                         None, int(table.visited[keep].sum()), 0)
        missing = StratumTrend(key, int(keep.sum()), *(float("nan"),) * 5)
        if years.sum() < MIN_YEARS:
            rows.append(missing)
            continue
        try:
            result = unit_count_trend(sub, confidence, with_strata=False)
            rows.append(StratumTrend(key, int(keep.sum()), result.change, result.change_lo, result.change_hi,
                                     result.p_value, result.df))
        except InputError:
            rows.append(missing)
    return tuple(rows)


# ----------------------------------------------------------------------------
# the trend from yearly estimates
# ----------------------------------------------------------------------------
@dataclass(frozen=True)
class EstimateSeries:
    """Yearly estimates sorted by year: ``years``, ``estimates``, ``se``."""

    years: np.ndarray
    estimates: np.ndarray
    se: np.ndarray

    @property
    def x(self):
        return self.years - self.years.mean()


def estimate_series_iv(years, estimates, ses, record_ids=None):
    """Check yearly estimates: one per year, estimate and SE above 0, at least 3 years.

    Raises
    ------
    InputError
        Naming the records at fault and the remedy.
    """
    n = len(years)
    record_ids = list(record_ids) if record_ids is not None else list(range(1, n + 1))
    y, e, s = _as_float(years), _as_float(estimates), _as_float(ses)
    _refuse_records(record_ids, ~_whole(y), QT_TRANSLATE_NOOP(
        "PlotwiseEngine",
        "Records {ids} have no whole-number year."))
    _refuse_records(record_ids, ~(np.isfinite(e) & (e > 0)), QT_TRANSLATE_NOOP(
        "PlotwiseEngine",
        "Records {ids} have no estimate above 0. A log-linear trend needs estimates above 0: leave out years "
        "without an estimate, or use the unit counts instead."))
    _refuse_records(record_ids, ~(np.isfinite(s) & (s > 0)), QT_TRANSLATE_NOOP(
        "PlotwiseEngine",
        "Records {ids} have no standard error above 0. Every yearly estimate needs its standard error (the "
        "estimate step writes it)."))
    order = np.argsort(y, kind="stable")
    y, e, s = y[order], e[order], s[order]
    twice = sorted({int(v) for v in y[1:][np.diff(y) == 0]})
    if twice:
        raise InputError(message(QT_TRANSLATE_NOOP(
            "PlotwiseEngine",
            "Years {years} have more than one estimate. Keep one estimate per year (for the estimate step's table: "
            "its rows 'all', or one stratum)."),
            years=listed_ids(twice)))
    if len(y) < MIN_YEARS:
        raise InputError(message(QT_TRANSLATE_NOOP(
            "PlotwiseEngine",
            "A trend needs estimates from at least {k} different years; the records hold {n}."),
            k=MIN_YEARS, n=len(y)))
    return EstimateSeries(y, e, s)


def _weighted_fit(X, y, w):
    """Weighted least squares: coefficients, (X'WX)⁻¹ and the weighted residual sum of squares."""
    xtwx_inv = np.linalg.inv(X.T @ (w[:, None] * X))
    coef = xtwx_inv @ (X.T @ (w * y))
    resid = y - X @ coef
    return coef, xtwx_inv, float(np.sum(w * resid * resid))


def process_variance(X, y, v):
    """Method-of-moments τ² (DerSimonian & Laird 1986, in the regression form of Thompson &
    Sharp 1999): ``max(0, (Q − (k − p)) / (Σ w − tr((X'WX)⁻¹ X'W²X)))``, ``w = 1 / v``.
    Returns ``(τ², Q)``."""
    w = 1.0 / v
    _, xtwx_inv, q = _weighted_fit(X, y, w)
    k, p = X.shape
    denominator = np.sum(w) - np.trace(xtwx_inv @ (X.T @ ((w * w)[:, None] * X)))
    return max(0.0, (q - (k - p)) / denominator), q


def estimate_trend(series, confidence=0.95):
    """The log-linear trend of yearly estimates with process variance (see the module notes).

    The index is the estimate itself, with the log-normal interval ``N / C`` to ``N C``,
    ``C = exp(z √v_t)`` (sampling error only); the trend line is ``exp(a + β x_t)`` with
    its band on t(k − 2).
    """
    confidence = confidence_iv(confidence)
    y, x = np.log(series.estimates), series.x
    v = np.log1p((series.se / series.estimates) ** 2)
    X = np.column_stack([np.ones_like(x), x])
    tau2, q = process_variance(X, y, v)
    coef, xtwx_inv, rss = _weighted_fit(X, y, 1.0 / (v + tau2))
    df = len(y) - 2
    scale = rss / df
    se = float(np.sqrt(scale * xtwx_inv[1, 1]))
    _, plain_inv, _ = _weighted_fit(X, y, 1.0 / v)
    change, lo, hi, p = change_summary(float(coef[1]), se, df, confidence)
    z = stats.norm.ppf(0.5 + confidence / 2.0)
    spread = np.exp(z * np.sqrt(v))
    line = np.exp(X @ coef)
    half = stats.t.ppf(0.5 + confidence / 2.0, df) * np.sqrt(scale * np.einsum("ij,jk,ik->i", X, xtwx_inv, X))
    details = EstimateDetails(series.se / series.estimates, float(tau2), float(q), float(scale),
                              float(np.sqrt(plain_inv[1, 1])))
    warnings = []
    if len(y) < 5:
        warnings.append(message(QT_TRANSLATE_NOOP(
            "PlotwiseEngine",
            "Only {k} years: the year-to-year variation and the trend are both poorly known, and the interval is "
            "wide."),
            k=len(y)))
    return TrendResult(SOURCE_ESTIMATES, confidence, series.years, series.estimates, series.estimates / spread,
                       series.estimates * spread, line, line * np.exp(-half), line * np.exp(half), float(coef[1]),
                       se, float(df), change, lo, hi, p, details, (), tuple(warnings))


OVERALL_ROW = "all"


def overall_rows(strata):
    """Which rows of a table of yearly estimates to use: with a stratum field, the rows
    ``all`` (the overall row the estimate step writes) when there are any, else every row."""
    strata = list(strata)
    overall = np.array([s is not None and str(s).strip().lower() == OVERALL_ROW for s in strata], dtype=bool)
    return overall if overall.any() else np.ones(len(strata), dtype=bool)
