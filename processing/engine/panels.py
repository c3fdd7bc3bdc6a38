"""Revisit panels for a monitoring programme: which units are surveyed in which years.

A monitoring programme surveys the units of one layout over many years. The units are
split into *panels*; all units of a panel are visited in the same years (Urquhart &
Kincaid 1999; McDonald 2003):

* **every year**: one panel, visited every year;
* **rotating panels**: ``K`` panels, panel ``p`` (1..K) visited in the years
  ``start + (p - 1) + m K``, m = 0, 1, ...: each unit once every ``K`` years, and
  ``1/K`` of the units each year;
* **split panels**: a core panel (panel 0) visited every year, the other units in
  ``K`` rotating panels as above. The core gives the year-to-year links, the rotating
  panels cover more ground over a cycle.

Panels follow the layout's draw order, stratum by stratum: the core takes the first
units of the draw order, panel 1 the next block, and so on. In a spatially balanced
layout (balanced acceptance sampling on a Halton sequence, Robertson et al. 2013) every
run of consecutive units of the draw order is itself spread over the stratum, so each
panel is a spatially balanced sample. :func:`panel_balance_check` measures that with the
Voronoi measure of Stevens & Olsen (2004) against random rearrangements of the panels: a
simple random layout gives panels no better spread than chance (and a systematic grid,
whose draw order runs row by row, gives bands).

Nothing here imports the host.
"""
from dataclasses import dataclass

import numpy as np
from scipy.spatial import cKDTree
from shapely.geometry import MultiPoint

from .edge import BALANCED, GRID, GRID_OVERLAP, RANDOM, RANDOM_APART
from .errors import QT_TRANSLATE_NOOP, InputError, message
from .geometry import contains_xy
from .listing import listed_ids

EVERY_YEAR, ROTATING, SPLIT = 0, 1, 2
DESIGNS = (
    QT_TRANSLATE_NOOP("PlotwiseEngine", "every year"),
    QT_TRANSLATE_NOOP("PlotwiseEngine", "rotating panels"),
    QT_TRANSLATE_NOOP("PlotwiseEngine", "split panels"),
)
CORE = 0  # the panel of units visited every year
MAX_YEARS = 50  # the `years` text of a unit must fit a 254-character field
RESERVE = "reserve"
RANDOM_SUBSETS = 199
BALANCE_ALPHA = 0.1
BALANCE_RATIO = 0.9  # our choice: 0 of 80 balanced and 65-78% of simple random test layouts fall above
MAX_BALANCE_POPULATION = 5000


@dataclass(frozen=True)
class PanelSpec:
    """A revisit design: ``design`` (EVERY_YEAR, ROTATING, SPLIT), ``panels`` (K, the
    rotating panels), ``core_share`` (split panels: the share of units in the core),
    ``start_year`` and ``years`` (the programme's length)."""

    design: int
    panels: int
    core_share: float
    start_year: int
    years: int

    @property
    def calendar(self):
        """The programme's years, ``start_year`` .. ``start_year + years - 1``."""
        return np.arange(self.start_year, self.start_year + self.years)

    @property
    def panel_numbers(self):
        """The panels of the design: (0,) every year; (1..K) rotating; (0, 1..K) split."""
        if self.design == EVERY_YEAR:
            return (CORE,)
        rotating = tuple(range(1, self.panels + 1))
        return rotating if self.design == ROTATING else (CORE,) + rotating

    def visited(self, panel):
        """Boolean (years,) mask of the years in which ``panel`` is visited.

        Panel 0 every year; rotating panel p in the years ``(t - (p - 1)) mod K = 0``,
        t = 0, 1, ... counted from the start year.
        """
        t = np.arange(self.years)
        if panel == CORE:
            return np.ones(self.years, dtype=bool)
        return (t - (int(panel) - 1)) % self.panels == 0

    def visit_years(self, panel):
        """The calendar years in which ``panel`` is visited (a tuple of int)."""
        return tuple(int(y) for y in self.calendar[self.visited(panel)])


def panel_spec_iv(design, panels=1, core_share=0.0, start_year=2025, years=10):
    """Check a revisit design and return its :class:`PanelSpec`.

    Raises
    ------
    InputError
        For an unknown design, fewer than 1 or more than ``MAX_YEARS`` years, fewer than
        2 rotating panels, rotating panels that would never be visited, or a core share
        outside (0, 1) for split panels.
    """
    design, panels, years = int(design), int(panels), int(years)
    if design not in (EVERY_YEAR, ROTATING, SPLIT):
        raise InputError(message(QT_TRANSLATE_NOOP(
            "PlotwiseEngine",
            "PANEL_DESIGN must be 0 (every year), 1 (rotating) or 2 (split); got {design}."),
            design=design))
    if not 1 <= years <= MAX_YEARS:
        raise InputError(message(QT_TRANSLATE_NOOP(
            "PlotwiseEngine",
            "YEARS must be between 1 and {most}; got {years}."),
            most=MAX_YEARS, years=years))
    if design == EVERY_YEAR:
        return PanelSpec(EVERY_YEAR, 1, 1.0, int(start_year), years)
    if panels < 2:
        raise InputError(message(QT_TRANSLATE_NOOP(
            "PlotwiseEngine",
            "Rotating and split designs need at least 2 rotating panels (PANELS = {panels}); with one panel every "
            "unit is visited every year: choose the every-year design."),
            panels=panels))
    if panels > years:
        raise InputError(message(QT_TRANSLATE_NOOP(
            "PlotwiseEngine",
            "With {panels} panels over {years} years, panels {first} to {panels} would never be visited: use at most "
            "{years} panels or more years."),
            panels=panels, years=years, first=years + 1))
    share = float(core_share)
    if design == SPLIT and not 0.0 < share < 1.0:
        raise InputError(message(QT_TRANSLATE_NOOP(
            "PlotwiseEngine",
            "CORE_SHARE must lie between 0 and 1 for split panels (the share of units visited every year); got "
            "{share:g}."),
            share=share))
    return PanelSpec(design, panels, share if design == SPLIT else 0.0, int(start_year), years)


def panel_sizes(n_units, spec):
    """Units per panel for ``n_units`` units, in the order of ``spec.panel_numbers``.

    Split panels: the core gets ``round(core_share n)`` units (at least 1), the rest is
    shared among the rotating panels as evenly as possible (the first panels get the
    extra units). Rotating: ``n`` shared among the K panels the same way.
    """
    n = int(n_units)
    if spec.design == EVERY_YEAR:
        return np.array([n])
    core = 0
    if spec.design == SPLIT:
        core = min(max(int(round(spec.core_share * n)), 1 if n else 0), n)
    rest = n - core
    rotating = np.full(spec.panels, rest // spec.panels) + (np.arange(spec.panels) < rest % spec.panels)
    return np.concatenate([[core], rotating]) if spec.design == SPLIT else rotating


def panels_in_draw_order(n_units, spec):
    """Panel numbers for ``n_units`` units taken in draw order: consecutive blocks,
    the core first, then panel 1, 2, ... (see :func:`panel_sizes`)."""
    return np.repeat(np.array(spec.panel_numbers), panel_sizes(n_units, spec))


def visit_matrix(panel_of_unit, spec):
    """Boolean (units, years) matrix: unit i is visited in year t. Units without a
    panel (negative numbers: reserves) are never visited."""
    panel_of_unit = np.asarray(panel_of_unit, dtype=int)
    visits = np.zeros((len(panel_of_unit), spec.years), dtype=bool)
    for panel in spec.panel_numbers:
        visits[panel_of_unit == panel] = spec.visited(panel)
    return visits


# ----------------------------------------------------------------------------
# assigning the units of a layout
# ----------------------------------------------------------------------------
@dataclass(frozen=True)
class ScheduleRow:
    """One visit of one panel: the ``year``, the ``panel``, its ``n_units`` (every
    stratum) and the field ``days`` (``n_units`` times the days per unit; NaN without)."""

    year: int
    panel: int
    n_units: int
    days: float


@dataclass(frozen=True)
class PanelAssignment:
    """Panels of the units of a layout, aligned with the input units.

    ``panel`` is the panel number (0 the core or the every-year panel, 1..K rotating;
    -1 for reserve units, which take the panel of the primary they replace);
    ``years_text`` the years each unit is visited, comma-separated (empty for reserves);
    ``schedule`` one :class:`ScheduleRow` per visit of a panel; ``sizes`` maps
    ``(stratum, panel)`` to the number of units; ``strata`` lists the strata in order of
    appearance and ``unit_strata`` gives each unit's stratum.
    """

    panel: np.ndarray
    years_text: tuple
    schedule: tuple
    sizes: dict
    spec: PanelSpec
    strata: tuple
    unit_strata: tuple
    days_per_unit: float
    warnings: tuple = ()

    def units_per_year(self):
        """Units visited in each year of the programme (an array over ``spec.calendar``)."""
        totals = {int(y): 0 for y in self.spec.calendar}
        for row in self.schedule:
            totals[row.year] += row.n_units
        return np.array([totals[int(y)] for y in self.spec.calendar])


@dataclass(frozen=True)
class _UnitsInput:
    unit_ids: tuple
    strata: tuple
    draw_ord: np.ndarray
    primary: np.ndarray
    order_given: bool


def _units_iv(unit_ids, strata, draw_ord, roles):
    n = len(unit_ids)
    strata = tuple(strata) if strata is not None else (None,) * n
    roles = tuple(roles) if roles is not None else ("primary",) * n
    primary = np.array([r != RESERVE for r in roles], dtype=bool)
    if n == 0 or not primary.any():
        raise InputError(message(QT_TRANSLATE_NOOP(
            "PlotwiseEngine",
            "The units layer has no primary unit to assign to panels.")))
    order_given = draw_ord is not None
    if not order_given:
        return _UnitsInput(tuple(unit_ids), strata, np.arange(1, n + 1, dtype=float), primary, False)
    values = np.array([np.nan if v is None else float(v) for v in draw_ord])
    missing = [unit_ids[i] for i in np.flatnonzero(~np.isfinite(values) & primary)]
    if missing:
        raise InputError(message(QT_TRANSLATE_NOOP(
            "PlotwiseEngine",
            "Units {ids} have no draw order (draw_ord is empty). Panels follow the draw order of the layout: fill it "
            "or choose another draw-order field."),
            ids=listed_ids(missing)), ids=missing)
    repeated = []
    for key in dict.fromkeys(strata):
        members = np.flatnonzero(primary & np.array([s == key for s in strata]))
        values_h = values[members]
        shared, counts = np.unique(values_h, return_counts=True)
        repeated += [unit_ids[i] for i in members[np.isin(values_h, shared[counts > 1])]]
    if repeated:
        raise InputError(message(QT_TRANSLATE_NOOP(
            "PlotwiseEngine",
            "Units {ids} share their draw order with another primary unit of the same stratum. Each stratum's draw "
            "order must run 1, 2, 3, ... without repeats: use the layout's draw_ord field."),
            ids=listed_ids(repeated)), ids=repeated)
    return _UnitsInput(tuple(unit_ids), strata, values, primary, True)


def assign_panels(unit_ids, spec, strata=None, draw_ord=None, roles=None, days_per_unit=0.0):
    """Assign the primary units of a layout to the panels of ``spec``, stratum by stratum.

    Within each stratum the primary units are taken in draw order and cut into consecutive
    blocks (:func:`panels_in_draw_order`), so that every panel holds the stratum's share.

    Parameters
    ----------
    unit_ids : sequence
        Unit ids (for messages).
    spec : PanelSpec
    strata : sequence, optional
        Stratum of each unit (None: one stratum).
    draw_ord : sequence of numbers, optional
        Draw order within the stratum (the layout's ``draw_ord``). None: the input order,
        with a warning.
    roles : sequence of str, optional
        ``"reserve"`` units get no panel.
    days_per_unit : float
        Field days per unit visit, for the schedule (0: none).

    Returns
    -------
    PanelAssignment
    """
    units = _units_iv(unit_ids, strata, draw_ord, roles)
    panel = np.full(len(units.unit_ids), -1, dtype=int)
    sizes, warnings = {}, []
    keys = tuple(dict.fromkeys(s for s, p in zip(units.strata, units.primary) if p))
    for key in keys:
        members = np.flatnonzero(units.primary & np.array([s == key for s in units.strata]))
        members = members[np.argsort(units.draw_ord[members], kind="stable")]
        panel[members] = panels_in_draw_order(len(members), spec)
        counts = panel_sizes(len(members), spec)
        sizes.update({(key, p): int(c) for p, c in zip(spec.panel_numbers, counts)})
        empty = [p for p, c in zip(spec.panel_numbers, counts) if c == 0]
        if empty:
            warnings.append(message(QT_TRANSLATE_NOOP(
                "PlotwiseEngine",
                "Stratum {key} has {n} primary units, too few for {k} panels: panels {empty} get none of its units "
                "in that stratum."),
                key=key if key is not None else "(all)",
                n=len(members),
                k=len(spec.panel_numbers),
                empty=", ".join(str(p) for p in empty)))
    if not units.order_given:
        warnings.append(message(QT_TRANSLATE_NOOP(
            "PlotwiseEngine",
            "The units have no draw-order field: panels follow the order of the features in the layer. Panels are "
            "evenly spread only when that order is the draw order of a spatially balanced layout.")))
    return PanelAssignment(
        panel, _years_texts(panel, spec), _schedule(panel, spec, days_per_unit), sizes, spec, keys,
        units.strata, float(days_per_unit), tuple(warnings))


def _years_texts(panel, spec):
    texts = {p: ",".join(str(y) for y in spec.visit_years(p)) for p in spec.panel_numbers}
    return tuple(texts.get(int(p), "") for p in panel)


def _schedule(panel, spec, days_per_unit):
    rows = []
    for t, year in enumerate(spec.calendar):
        for p in spec.panel_numbers:
            if spec.visited(p)[t]:
                n = int((panel == p).sum())
                rows.append(ScheduleRow(int(year), int(p), n, n * days_per_unit if days_per_unit > 0 else float("nan")))
    return tuple(rows)


# ----------------------------------------------------------------------------
# spatial balance of the panels
# ----------------------------------------------------------------------------
def voronoi_balance(sample_xy, population_xy, inclusion=None):
    """The spatial balance of a sample: Stevens & Olsen (2004), section 3.

    Each population point belongs to the Voronoi polygon of its nearest sample point.
    ``v_i`` is the sum of the inclusion probabilities of the population points in the
    polygon of sample point i; its expectation is 1, and the balance measure is

        B = (1 / n) Σ_i (v_i − 1)²

    Small values mean an evenly spread sample (0 for a perfect spread).

    Parameters
    ----------
    sample_xy : (n, 2) array
    population_xy : (N, 2) array
        The population (the frame's units, or a fine grid of points over the frame).
    inclusion : (N,) array, optional
        Inclusion probabilities; default ``n / N`` for every point (equal probability).
    """
    sample_xy = np.asarray(sample_xy, dtype=float).reshape(-1, 2)
    population_xy = np.asarray(population_xy, dtype=float).reshape(-1, 2)
    n, big_n = len(sample_xy), len(population_xy)
    if inclusion is None:
        inclusion = np.full(big_n, n / big_n)
    _, nearest = cKDTree(sample_xy).query(population_xy)
    v = np.bincount(nearest, weights=inclusion, minlength=n)
    return float(np.mean((v - 1.0) ** 2))


def hull_population(xy, points=2000):
    """About ``points`` grid points over the convex hull of ``xy``: a stand-in for the frame
    when only the units are known (the same population for a panel and for its random
    counterparts, so the comparison stays fair). None when the hull has no area."""
    hull = MultiPoint([tuple(p) for p in np.asarray(xy, dtype=float)]).convex_hull
    if hull.geom_type != "Polygon" or hull.area <= 0:
        return None
    step = np.sqrt(hull.area / points)
    minx, miny, maxx, maxy = hull.bounds
    gx, gy = np.meshgrid(np.arange(minx + step / 2, maxx, step), np.arange(miny + step / 2, maxy, step))
    grid = np.column_stack([gx.ravel(), gy.ravel()])
    return grid[contains_xy(hull, grid[:, 0], grid[:, 1])]


@dataclass(frozen=True)
class PanelBalance:
    """The spread of one panel over the layout: ``measure`` (Stevens & Olsen 2004) and
    ``random_median``, the median measure of random panels of the same make-up (the same
    number of units from each stratum), from the rearrangements of the check."""

    panel: int
    n_units: int
    measure: float
    random_median: float


@dataclass(frozen=True)
class BalanceCheck:
    """The permutation check of :func:`panel_balance_check`: every panel's
    :class:`PanelBalance`, the ``p_value`` of the panels' spread against random
    rearrangements (small: panels spread more evenly than chance), ``spread_ratio`` (the
    geometric mean over panels of measure / random median: below 1 when the panels are
    more even than random ones) and ``balanced``: the p-value at most ``alpha``, or the
    panels at least ``1 − BALANCE_RATIO`` more even than random ones (a small layout whose
    balance the test cannot confirm). ``rows`` is empty when nothing could be checked (the
    units need 3 positions not on one line, and a panel 2 units and fewer than all)."""

    rows: tuple
    p_value: float
    spread_ratio: float
    balanced: bool
    rearrangements: int
    alpha: float


MAX_DISTANCE_CELLS = 4_000_000  # population points x units kept as one distance matrix


class _SubsetSpread:
    """The Voronoi measure of any subset of the units over a fixed population, from the
    population-to-unit distances computed once (or a k-d tree per subset when too many)."""

    def __init__(self, xy, population):
        self.xy, self.population = xy, population
        cells = len(xy) * len(population)
        self.distances = None
        if cells <= MAX_DISTANCE_CELLS:
            diff = population[:, None, :] - xy[None, :, :]
            self.distances = np.einsum("ijk,ijk->ij", diff, diff)

    def measure(self, chosen):
        if self.distances is None:
            return voronoi_balance(self.xy[chosen], self.population)
        columns = np.flatnonzero(chosen)
        nearest = np.argmin(self.distances[:, columns], axis=1)
        v = np.bincount(nearest, minlength=len(columns)) * (len(columns) / len(self.population))
        return float(np.mean((v - 1.0) ** 2))


def panel_balance_check(xy, assignment, rng, rearrangements=RANDOM_SUBSETS, alpha=BALANCE_ALPHA):
    """Are the panels more evenly spread than random parts of the layout?

    The population is a fine grid over the convex hull of the primary units
    (:func:`hull_population`); each panel (its units in every stratum) gets the Voronoi
    measure :func:`voronoi_balance` of Stevens & Olsen (2004), and the statistic is the sum
    of their logarithms. Its null distribution comes from ``rearrangements`` random
    permutations of the panel labels within each stratum (each panel keeps its units per
    stratum): the labels of a (stratified) simple random layout are exchangeable within
    strata, so the p-value ``(1 + #{permuted <= observed}) / (rearrangements + 1)`` is
    uniform for it, and small when the draw order spreads every panel evenly. With few
    units the test has little power, so panels that are on average clearly more even than
    random ones (``spread_ratio`` below ``BALANCE_RATIO``) also count as balanced.
    """
    xy = np.asarray(xy, dtype=float).reshape(-1, 2)
    members = np.flatnonzero(assignment.panel >= 0)
    labels = assignment.panel[members]
    numbers = [p for p in assignment.spec.panel_numbers if 2 <= np.sum(labels == p) < len(members)]
    population = hull_population(xy[members]) if numbers and len(members) >= 3 else None
    if population is None or not len(population):
        return BalanceCheck((), float("nan"), float("nan"), False, int(rearrangements), float(alpha))
    spread = _SubsetSpread(xy[members], population)
    strata = [s for i, s in enumerate(assignment.unit_strata) if assignment.panel[i] >= 0]
    blocks = [np.flatnonzero(np.array([s == key for s in strata])) for key in dict.fromkeys(strata)]
    log = lambda value: np.log(max(value, 1e-12))  # noqa: E731
    observed = sum(log(spread.measure(labels == p)) for p in numbers)
    null = np.zeros(rearrangements)
    random_measures = {p: [] for p in numbers}
    for b in range(rearrangements):
        shuffled = labels.copy()
        for block in blocks:
            shuffled[block] = rng.permutation(labels[block])
        for p in numbers:
            measure = spread.measure(shuffled == p)
            random_measures[p].append(measure)
            null[b] += log(measure)
    rows = tuple(PanelBalance(int(p), int(np.sum(labels == p)), spread.measure(labels == p),
                              float(np.median(random_measures[p]))) for p in numbers)
    p_value = float((1 + np.sum(null <= observed)) / (rearrangements + 1))
    ratio = float(np.exp(np.mean([np.log(max(r.measure, 1e-12) / max(r.random_median, 1e-12)) for r in rows])))
    balanced = p_value <= alpha or ratio < BALANCE_RATIO
    return BalanceCheck(rows, p_value, ratio, balanced, int(rearrangements), float(alpha))


# ----------------------------------------------------------------------------
# the layout's own design record
# ----------------------------------------------------------------------------
RECORDED_BALANCED, RECORDED_RANDOM, RECORDED_GRID = "balanced", "random", "grid"
_RECORD_KINDS = {BALANCED: RECORDED_BALANCED, RANDOM: RECORDED_RANDOM, RANDOM_APART: RECORDED_RANDOM,
                 GRID: RECORDED_GRID, GRID_OVERLAP: RECORDED_GRID}


def recorded_design(values, roles=None):
    """The layout's design from its primary units' ``design`` field (the design record
    ``plotwise:layout`` writes, :func:`edge.design_record`): ``"balanced"``, ``"random"``
    or ``"grid"``; None when the field is missing, empty, unknown or mixed."""
    if values is None:
        return None
    roles = roles if roles is not None else [None] * len(values)
    kinds = {_RECORD_KINDS.get(str(v).strip().lower()) for v, r in zip(values, roles)
             if r != RESERVE and v is not None and str(v).strip()}
    return kinds.pop() if len(kinds) == 1 and None not in kinds else None


def spread_warning(design, balance):
    """The warning about the panels' spread, or None: from the layout's design record when it
    has one (simple random: each panel is a random part of the layout; systematic grid: the
    draw order runs row by row, so panels are bands), else from :func:`panel_balance_check`."""
    if design == RECORDED_RANDOM:
        return message(QT_TRANSLATE_NOOP(
            "PlotwiseEngine",
            "The layout was simple random (its units' design field says so): each panel is a random part of it, "
            "not an evenly spread sample of the frame. Use a spatially balanced layout for evenly spread panels."))
    if design == RECORDED_GRID:
        return message(QT_TRANSLATE_NOOP(
            "PlotwiseEngine",
            "The layout was a systematic grid (its units' design field says so): its draw order runs row by row, "
            "so consecutive blocks of it are bands across the frame. Use a spatially balanced layout for evenly "
            "spread panels."))
    if design is None and balance.rows and not balance.balanced:
        return message(QT_TRANSLATE_NOOP(
            "PlotwiseEngine",
            "The panels are not more evenly spread than random parts of the layout (p = {p:.2f}). The layout was "
            "probably simple random or a systematic grid: each panel then covers the frame unevenly. Use a "
            "spatially balanced layout for evenly spread panels."), p=balance.p_value)
    return None
