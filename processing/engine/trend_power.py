"""Power to detect a trend, by simulating monitoring programmes.

Each replicate simulates the counts of every unit in every year it is visited,

    y_it ~ Poisson(p λ_it),
    log λ_it = log m + β t + u_i + v_t + w_it − (σ_u² + σ_v² + σ_w²) / 2,

with t = 0, 1, ... the years since the start, ``β = log(1 + r/100)`` for an annual
change of r %, ``m`` the mean number of animals per unit in the first year, ``p`` the
detection probability, and independent normal unit effects ``u_i`` (SD σ_u), year
effects ``v_t`` (σ_v, shared by all units: weather, observers) and unit × year effects
``w_it`` (σ_w). The variance terms keep ``m`` the mean. The replicate's trend is then
estimated by :func:`trend.fit_trend`, the same engine as the trend from unit counts, and
the change counts as detected when the t test on β rejects at level ``alpha`` (two-sided,
or one-sided in the direction of the change). The power is the share of detections,
with its Monte Carlo standard error ``√(P (1 − P) / R)``.

Both log-linear models depend on the counts only through the unit totals and the year
totals, and units of one panel share their visits, so each replicate is reduced to a
table of panel × year totals before fitting; power after fewer years uses the first
years of the same programmes, power with more or fewer units the first units of larger
simulated programmes, assigned to panels anew (common random numbers). The setting is
Gerrodette's (1987) power analysis of a linear or exponential trend, by simulation
rather than by formula so that panels, unit effects and Poisson counts enter.

Nothing here imports the host.
"""
from dataclasses import dataclass

import numpy as np
from scipy import stats

from . import panels as panel_engine
from .errors import QT_TRANSLATE_NOOP, Cancelled, InputError, message
from .trend import MIN_YEARS, fit_trend, linked_groups

UNIT_FACTORS = (0.25, 0.5, 1.0, 1.5, 2.0)
TARGET_POWER = 0.8
CHUNK_CELLS = 2_000_000  # replicates x units x years simulated at once
MAX_REPLICATES = 100_000


@dataclass(frozen=True)
class VisitPlan:
    """The panels of a programme: ``patterns`` (P, years) visit masks, ``shares`` of the
    units in each panel, ``labels`` (the panel numbers), ``start_year``; ``sizes(n)``
    gives the units per panel for n units."""

    patterns: np.ndarray
    shares: np.ndarray
    labels: tuple
    start_year: int
    spec: object = None

    @property
    def years(self):
        return self.patterns.shape[1]

    def sizes(self, n_units):
        if self.spec is not None:
            return panel_engine.panel_sizes(n_units, self.spec)
        raw = self.shares * n_units
        sizes = np.floor(raw).astype(int)
        order = np.argsort(-(raw - sizes), kind="stable")
        sizes[order[:n_units - sizes.sum()]] += 1
        return sizes


def plan_from_spec(spec):
    """The :class:`VisitPlan` of a :class:`panels.PanelSpec` (the same panel sizes as
    ``plotwise:panels`` gives)."""
    patterns = np.array([spec.visited(p) for p in spec.panel_numbers])
    sizes = panel_engine.panel_sizes(1000, spec)
    return VisitPlan(patterns, sizes / sizes.sum(), tuple(spec.panel_numbers), spec.start_year, spec)


def plan_from_years(year_lists, panel_labels=None):
    """A :class:`VisitPlan` from the visit years of each unit (a ``panels`` output): one
    panel per distinct set of years, its share the share of units with that set."""
    sets = [tuple(sorted(int(y) for y in years)) for years in year_lists if years]
    if not sets:
        raise InputError(message(QT_TRANSLATE_NOOP(
            "PlotwiseEngine",
            "The panels layer holds no unit with visit years (field years).")))
    first = min(s[0] for s in sets)
    last = max(s[-1] for s in sets)
    distinct = sorted(set(sets), key=lambda s: (-len(s), s))
    patterns = np.zeros((len(distinct), last - first + 1), dtype=bool)
    for k, s in enumerate(distinct):
        patterns[k, np.array(s) - first] = True
    counts = np.array([sets.count(s) for s in distinct], dtype=float)
    labels = tuple(range(1, len(distinct) + 1)) if panel_labels is None else tuple(panel_labels)
    return VisitPlan(patterns, counts / counts.sum(), labels, first)


@dataclass(frozen=True)
class PowerSpec:
    """A power analysis: the plan, ``n_units``, the ``changes`` (% per year), mean count,
    SDs on the log scale, detection, ``alpha``, ``two_sided`` and ``replicates``."""

    plan: VisitPlan
    n_units: int
    changes: tuple
    mean_count: float
    sd_unit: float
    sd_unit_year: float
    sd_year: float
    detection: float
    alpha: float
    two_sided: bool
    replicates: int


def parse_changes(text):
    """Annual changes in % from a text list (``"-3, -5; 2.5"``)."""
    parts = [p for p in str(text or "").replace(";", ",").replace(" ", ",").split(",") if p.strip()]
    try:
        values = tuple(float(p.replace("−", "-")) for p in parts)
    except ValueError:
        raise InputError(message(QT_TRANSLATE_NOOP(
            "PlotwiseEngine",
            "CHANGES must be a list of annual changes in % per year, separated by commas (for example -3, -5); got "
            "'{text}'."),
            text=text)) from None
    if not values:
        raise InputError(message(QT_TRANSLATE_NOOP(
            "PlotwiseEngine",
            "CHANGES is empty: give at least one annual change in % (for example -3).")))
    if any(v <= -100 or not np.isfinite(v) for v in values):
        raise InputError(message(QT_TRANSLATE_NOOP(
            "PlotwiseEngine",
            "Annual changes must be above -100 % per year; got {values}."),
            values=", ".join(f"{v:g}" for v in values)))
    return tuple(dict.fromkeys(values))


def power_spec_iv(plan, n_units, changes, mean_count, sd_unit, sd_unit_year, sd_year, detection, alpha,
                  two_sided, replicates):
    """Check the inputs of :func:`trend_power` and return a :class:`PowerSpec`."""
    n_units, replicates = int(n_units), int(replicates)
    if n_units < len(plan.labels):
        raise InputError(message(QT_TRANSLATE_NOOP(
            "PlotwiseEngine",
            "N_UNITS = {n} is fewer than the {k} panels of the design: every panel needs a unit."),
            n=n_units, k=len(plan.labels)))
    if plan.years < MIN_YEARS:
        raise InputError(message(QT_TRANSLATE_NOOP(
            "PlotwiseEngine",
            "A trend needs at least {k} years; YEARS = {years}."),
            k=MIN_YEARS, years=plan.years))
    if not 10 <= replicates <= MAX_REPLICATES:
        raise InputError(message(QT_TRANSLATE_NOOP(
            "PlotwiseEngine",
            "REPLICATES must lie between 10 and {most}; got {r}."),
            most=MAX_REPLICATES, r=replicates))
    if not mean_count > 0:
        raise InputError(message(QT_TRANSLATE_NOOP(
            "PlotwiseEngine",
            "MEAN_COUNT must be above 0 (animals per unit in the first year).")))
    if min(sd_unit, sd_unit_year, sd_year) < 0:
        raise InputError(message(QT_TRANSLATE_NOOP(
            "PlotwiseEngine",
            "The standard deviations SD_UNIT, SD_UNIT_YEAR and SD_YEAR cannot be negative.")))
    if not 0 < detection <= 1:
        raise InputError(message(QT_TRANSLATE_NOOP(
            "PlotwiseEngine",
            "DETECTION must lie in (0, 1]; got {p:g}."),
            p=detection))
    if not 0 < alpha < 0.5:
        raise InputError(message(QT_TRANSLATE_NOOP(
            "PlotwiseEngine",
            "ALPHA must lie between 0 and 0.5 (for example 0.05 or 0.1); got {a:g}."),
            a=alpha))
    return PowerSpec(plan, n_units, tuple(float(c) for c in changes), float(mean_count), float(sd_unit),
                     float(sd_unit_year), float(sd_year), float(detection), float(alpha), bool(two_sided), replicates)


def unit_sd_from_pilot(means, sds, ns, sd_unit_year=0.0):
    """Mean count and between-unit SD (log scale) from a one-season pilot's strata.

    Pools the strata (``means``, ``sds`` of the counts, ``ns`` units) into the mean ``m``
    and variance ``s²`` of the counts of all units, and matches the moments of a
    Poisson–log-normal count, ``Var = m + m² (exp(σ²) − 1)`` (common practice):
    ``σ² = ln(1 + max(s² − m, 0) / m²)``. One season cannot tell lasting unit effects
    from unit × year effects, so ``sd_unit_year²`` is taken off (floored at 0).
    Returns ``(m, σ_u)``.
    """
    means, sds, ns = (np.asarray(v, dtype=float) for v in (means, sds, ns))
    keep = np.isfinite(means) & np.isfinite(sds) & (ns >= 2)
    if not keep.any():
        raise InputError(message(QT_TRANSLATE_NOOP(
            "PlotwiseEngine",
            "The pilot table has no stratum with 2 or more units and a mean and SD of the counts (fields n, mean_c, "
            "sd_c of the estimate step).")))
    means, sds, ns = means[keep], sds[keep], ns[keep]
    total = ns.sum()
    m = float(np.sum(ns * means) / total)
    if m <= 0:
        raise InputError(message(QT_TRANSLATE_NOOP(
            "PlotwiseEngine",
            "The pilot counted no animal: its mean count is 0, so no power can be computed.")))
    variance = (np.sum((ns - 1) * sds ** 2) + np.sum(ns * (means - m) ** 2)) / (total - 1)
    sigma2 = np.log1p(max(variance - m, 0.0) / m ** 2) - sd_unit_year ** 2
    return m, float(np.sqrt(max(sigma2, 0.0)))


# ----------------------------------------------------------------------------
# grids
# ----------------------------------------------------------------------------
def _config_effort(plan, n_units, years):
    """Panel x year visit table (1 visited) of the first ``years`` years for ``n_units``
    units, and the panel of each of the units (in draw order)."""
    sizes = plan.sizes(n_units)
    return plan.patterns[:, :years].astype(float), np.repeat(np.arange(len(sizes)), sizes)


def year_grid(plan, n_units):
    """Programme lengths from the first one with a year-level test (at least 1 degree of
    freedom left for year-to-year variation) to the full length."""
    out = []
    for k in range(MIN_YEARS, plan.years + 1):
        effort, panel = _config_effort(plan, n_units, k)
        present = np.bincount(panel, minlength=len(effort)) > 0
        c, t = linked_groups(effort, present[None, :])
        if t[0] - c[0] - 1 >= 1:
            out.append(k)
    if not out:
        raise InputError(message(QT_TRANSLATE_NOOP(
            "PlotwiseEngine",
            "This revisit design never links enough years to test a trend (each panel must be visited in several "
            "years, or a core visited every year): use fewer panels, a core, or more years.")))
    return tuple(out)


def unit_grid(plan, n_units):
    """Numbers of units for the curve against units: 1/4, 1/2, 1, 1.5 and 2 times N_UNITS
    (those that give every panel a unit)."""
    values = {max(int(round(f * n_units)), 1) for f in UNIT_FACTORS}
    return tuple(sorted(v for v in values if v >= len(plan.labels) and (plan.sizes(v) > 0).all()) or (n_units,))


# ----------------------------------------------------------------------------
# simulation
# ----------------------------------------------------------------------------
def _latent_log_means(spec, n_units, rng, size):
    """``log(p λ_it)`` without the trend, for ``size`` replicates: (size, units, years)."""
    years = spec.plan.years
    centre = np.log(spec.mean_count * spec.detection) - (spec.sd_unit ** 2 + spec.sd_year ** 2
                                                          + spec.sd_unit_year ** 2) / 2.0
    latent = centre + spec.sd_unit * rng.standard_normal((size, n_units, 1))
    latent = latent + spec.sd_year * rng.standard_normal((size, 1, years))
    if spec.sd_unit_year > 0:
        latent = latent + spec.sd_unit_year * rng.standard_normal((size, n_units, years))
    return latent


def panel_totals(counts, panel, n_panels):
    """(R, P, T) sums of ``counts`` (R, units, T) over the units of each panel."""
    return np.stack([counts[:, panel == p, :].sum(axis=1) for p in range(n_panels)], axis=1)


def detections(totals, effort, x, beta_true, alpha, two_sided, units=None):
    """Whether each replicate's t test on β rejects, and whether its fit failed (failed
    fits never reject). ``totals`` (R, P, T) panel totals, ``units`` the unit counts and
    panels for the scale between units (see :func:`trend.fit_trend`)."""
    fit = fit_trend(totals * effort[None], effort, x, units=units)
    with np.errstate(invalid="ignore", divide="ignore"):
        t = fit.beta / fit.se
        usable = np.isfinite(t) & (fit.lof_df >= 1)
        dfs = np.maximum(fit.lof_df, 1).astype(float)
        if two_sided:
            hit = np.abs(t) > stats.t.ppf(1.0 - alpha / 2.0, dfs)
        else:
            sign = 1.0 if beta_true > 0 else -1.0
            hit = sign * t > stats.t.ppf(1.0 - alpha, dfs)
    return hit & usable, ~usable


@dataclass(frozen=True)
class PowerRow:
    """Power for one programme: ``years``, ``n_units``, ``change`` (% per year), ``power``
    with its Monte Carlo ``power_se``, ``failed`` replicates (no usable fit: counted as
    not detected) and ``curve`` ("years" or "units": which curve the row belongs to; the
    planned programme is on both)."""

    years: int
    n_units: int
    change: float
    power: float
    power_se: float
    failed: int
    curve: str


@dataclass(frozen=True)
class PowerResult:
    """Power by years, units and change: ``rows`` (:class:`PowerRow`), the ``spec``, the
    grids, and ``years_needed`` (per change, the fewest years with power at least 0.8 in
    the simulated grid, or None)."""

    rows: tuple
    spec: PowerSpec
    year_grid: tuple
    unit_grid: tuple
    years_needed: dict
    warnings: tuple = ()

    def curve(self, kind, change):
        return tuple(r for r in self.rows if r.change == change and kind in r.curve)


def _configurations(spec):
    years_axis, units_axis = year_grid(spec.plan, spec.n_units), unit_grid(spec.plan, spec.n_units)
    configs = {(k, spec.n_units): "years" for k in years_axis}
    for m in units_axis:
        configs[(spec.plan.years, m)] = "years,units" if (spec.plan.years, m) in configs else "units"
    return years_axis, units_axis, configs


def _chunk_hits(spec, configs, rng, size):
    """Detections and failures per (change, configuration) in one chunk of replicates."""
    n_max = max(m for _, m in configs)
    latent = _latent_log_means(spec, n_max, rng, size)
    t = np.arange(spec.plan.years, dtype=float)
    hits, failed = {}, {}
    for change in spec.changes:
        beta = np.log1p(change / 100.0)
        counts = rng.poisson(np.exp(latent + beta * t)).astype(float)
        by_units = {}
        for (k, m) in configs:
            if m not in by_units:
                effort, panel = _config_effort(spec.plan, m, spec.plan.years)
                by_units[m] = (panel_totals(counts[:, :m], panel, len(effort)), effort, panel)
            totals, effort, panel = by_units[m]
            years = t[:k] - t[:k].mean()
            hit, bad = detections(totals[:, :, :k], effort[:, :k], years, beta, spec.alpha, spec.two_sided,
                                  units=(counts[:, :m, :k], panel))
            hits[(change, k, m)] = int(hit.sum())
            failed[(change, k, m)] = int(bad.sum())
    return hits, failed


def trend_power(spec, rng, progress=None):
    """Power to detect each change of ``spec`` for every programme of the grids.

    Parameters
    ----------
    spec : PowerSpec
    rng : numpy.random.Generator
        The run's only generator.
    progress : callable, optional
        ``progress(fraction) -> bool``; True cancels (raises ``Cancelled``).

    Returns
    -------
    PowerResult
    """
    years_axis, units_axis, configs = _configurations(spec)
    n_max = max(m for _, m in configs)
    chunk = max(1, min(spec.replicates, CHUNK_CELLS // (n_max * spec.plan.years)))
    hits, failed = {}, {}
    done = 0
    while done < spec.replicates:
        size = min(chunk, spec.replicates - done)
        chunk_hits, chunk_failed = _chunk_hits(spec, configs, rng, size)
        for key, value in chunk_hits.items():
            hits[key] = hits.get(key, 0) + value
            failed[key] = failed.get(key, 0) + chunk_failed[key]
        done += size
        if progress is not None and progress(done / spec.replicates):
            raise Cancelled("Cancelled while simulating programmes.")
    return _power_result(spec, years_axis, units_axis, configs, hits, failed)


def _power_result(spec, years_axis, units_axis, configs, hits, failed):
    r = spec.replicates
    rows = []
    for change in spec.changes:
        for (k, m), curve in sorted(configs.items(), key=lambda item: ("years" not in item[1], item[0])):
            power = hits[(change, k, m)] / r
            rows.append(PowerRow(k, m, change, power, float(np.sqrt(power * (1.0 - power) / r)),
                                 failed[(change, k, m)], curve))
    needed = {}
    for change in spec.changes:
        reached = [row.years for row in rows if row.change == change and "years" in row.curve
                   and row.power >= TARGET_POWER]
        needed[change] = min(reached) if reached else None
    warnings = []
    worst = max(failed.values()) if failed else 0
    if worst > 0.01 * r:
        warnings.append(message(QT_TRANSLATE_NOOP(
            "PlotwiseEngine",
            "In up to {n} of {r} simulated programmes the trend could not be estimated (too few animals counted in "
            "revisited units); they count as not detected. Raise MEAN_COUNT or the number of units if that is "
            "unrealistic."),
            n=worst, r=r))
    return PowerResult(tuple(rows), spec, years_axis, units_axis, needed, tuple(warnings))
