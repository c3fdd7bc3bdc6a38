"""Survey designs compared by simulation on a density surface.

Each replicate realises one population on the surface, lays out every design
with the layout engine (:mod:`.layout`), counts the animals in each unit and
estimates the abundance with the estimation engine (:mod:`.estimation`). All
designs of one replicate survey the *same* population (common random numbers),
so differences between designs are not blurred by differences between
populations.

Population
----------
A surface cell *c* of area ``a_c`` with expected density ``λ_c`` (animals per
km²) holds ``μ_c = λ_c a_c`` animals on average. Counts are Poisson,
``N_c ~ Poisson(μ_c)``, or with overdispersion negative binomial with the
user's k, built as the gamma–Poisson mixture ``N_c ~ Poisson(μ_c G_c)``,
``G_c ~ Gamma(k, 1/k)``, so ``Var N_c = μ_c + μ_c²/k`` (Johnson, Kemp & Kotz
2005, "Univariate discrete distributions", §5.3; Bliss & Fisher 1953).

Only cells that some unit of the replicate covers need their own count. The
cells no unit covers enter the realised total as one draw: exactly
``Poisson(Σ μ_c)`` for Poisson counts (the sum of independent Poisson
variables, Johnson et al. 2005, §4.8), and for the negative binomial
``Poisson(Γ)`` with ``Γ`` a gamma variable with the exact mean ``Σ μ_c`` and
variance ``Σ μ_c²/k`` of ``Σ μ_c G_c`` (moment matching as in Satterthwaite
1946). The realised total is the truth each estimate is judged against.

Counting
--------
A unit counts the animals of the cells whose centres it covers, and its
surveyed area is the area of those cells. When the units are small against the
surface cells, every cell is split into ``f × f`` sub-cells that share the
cell's density and its gamma multiplier (the animals of a cell lie uniformly in
it), so that a unit spans at least :data:`MIN_CELLS_ACROSS` sub-cells. The edge
protocol is the real chain's (:mod:`.edge`): by default plus sampling, with
centres drawn by the layout engine over each stratum (or the frame) grown by
the unit's reach, a unit counting only the cells of its own stratum (stratified
designs) or of the frame (others), with its nominal area, and the estimate
expanding to the plus region's area; with ``inside`` the layout's inward buffer.
Units are enumerated row by row of (sub-)cells, with the column interval of each
row found analytically for circles and rotated rectangles, so the work grows
with the cells covered, not with a bounding box. Point stations
count a circle of radius SIZE (their counting radius), line transects a strip
of a given half-width on either side of the line.

Designs
-------
0. simple random: uniform centres over the frame (one stratum);
1. stratified, proportional: simple random within strata, ``n_h ∝ A_h``;
2. stratified, Neyman, best case: ``n_h ∝ A_h S_h`` (Neyman 1934; Cochran
   1977, §5.5), with ``S_h`` the standard deviation of a unit's count in
   stratum h implied by the surface (an oracle no survey has):
   ``S_h² = Var_h(Λ) + E_h(Λ) + E_h(Σ_c (m_c μ_c / f²)² / k)`` over random unit
   positions, ``Λ`` the unit's expected count (law of total variance);
3. systematic grid with a random start (the realised n varies);
4. spatially balanced (balanced acceptance sampling, Robertson et al. 2013);
5. stratified, Neyman from a pilot: in every replicate ``S_h`` is the sample
   SD of a pilot of ``pilot_units`` simple random units per stratum
   (:func:`pilot_sd`), as a survey would have it.

Performance (per design, over the replicates r with an estimate ``N̂_r`` of the
realised total ``N_r``; Morris, White & Crowther 2019, Statistics in Medicine
38:2074–2102, table 6):

* relative bias ``Σ (N̂_r − N_r) / Σ N_r``, with its Monte Carlo standard
  error ``emp_se / (√R · mean N_r)``; a bias is reported as beyond the
  simulation's noise when it exceeds 2 % and both Student's t of the mean
  error and its skewness-corrected form (Johnson 1978, made monotone by
  Hall 1992) pass Student's t quantile (R − 1 df) at ``1 − 0.01 / (2 m)``:
  a two-sided test with the Bonferroni correction over the m designs (at
  most 1 % false alarms per comparison);
* empirical SE, the standard deviation of the errors ``N̂_r − N_r``;
* RMSE ``√(mean (N̂_r − N_r)²)``, with its Monte Carlo standard error
  ``sd((N̂ − N)²) / (2 RMSE √R)`` (delta method);
* mean estimated CV, and coverage: the share of replicates whose t interval
  (Satterthwaite df) holds ``N_r``.

Nothing here imports the host.
"""
from dataclasses import dataclass, replace
import functools
import math

import numpy as np

from . import allocation, estimation, layout
from .errors import QT_TRANSLATE_NOOP, Cancelled, InputError, message
from .geometry import contains_xy
from .unit_shapes import CIRCLE, LINE, POINT, SQUARE

DESIGNS = (
    QT_TRANSLATE_NOOP("PlotwiseEngine", "simple random"),
    QT_TRANSLATE_NOOP("PlotwiseEngine", "stratified proportional"),
    QT_TRANSLATE_NOOP("PlotwiseEngine", "stratified Neyman (best case)"),
    QT_TRANSLATE_NOOP("PlotwiseEngine", "systematic grid"),
    QT_TRANSLATE_NOOP("PlotwiseEngine", "spatially balanced"),
    QT_TRANSLATE_NOOP("PlotwiseEngine", "stratified Neyman (pilot)"),
)
(SIMPLE_RANDOM, STRATIFIED_PROPORTIONAL, STRATIFIED_NEYMAN, SYSTEMATIC_GRID, SPATIALLY_BALANCED,
 STRATIFIED_NEYMAN_PILOT) = range(6)
DEFAULT_PILOT_UNITS = 5  # pilot units per stratum for the pilot-based Neyman design (our choice)
_SIZE_NOT_POSITIVE = {  # by unit shape: every word of a message sits in its template
    POINT: QT_TRANSLATE_NOOP(
        "PlotwiseEngine",
        "SIZE must be more than 0 m: it is the counting radius of a point station."),
    SQUARE: QT_TRANSLATE_NOOP("PlotwiseEngine", "SIZE must be more than 0 m: it is the square unit's size."),
    CIRCLE: QT_TRANSLATE_NOOP("PlotwiseEngine", "SIZE must be more than 0 m: it is the circle unit's size."),
    LINE: QT_TRANSLATE_NOOP("PlotwiseEngine", "SIZE must be more than 0 m: it is the line unit's size."),
}
STRATIFIED_DESIGNS = (STRATIFIED_PROPORTIONAL, STRATIFIED_NEYMAN, STRATIFIED_NEYMAN_PILOT)
LAYOUT_DESIGN = {
    SIMPLE_RANDOM: layout.SIMPLE_RANDOM,
    STRATIFIED_PROPORTIONAL: layout.SIMPLE_RANDOM,
    STRATIFIED_NEYMAN: layout.SIMPLE_RANDOM,
    SYSTEMATIC_GRID: layout.SYSTEMATIC_GRID,
    SPATIALLY_BALANCED: layout.SPATIALLY_BALANCED,
    STRATIFIED_NEYMAN_PILOT: layout.SIMPLE_RANDOM,
}
MIN_CELLS_ACROSS = 4  # a unit spans at least this many (sub-)cells: our choice, checked in the tests
MAX_SUBDIVISION = 256
SD_DRAWS = 400  # random unit positions per stratum for S_h
MAX_CELLS_PER_REPLICATE = 5_000_000  # (unit, cell) pairs of one replicate: about 200 MB of work arrays
FRAME_LABEL = "frame"
M2_PER_KM2 = 1e6
ACCEPTABLE_COVERAGE = 0.90  # common practice: an interval that covers less than 90 % misleads
NOTABLE_BIAS = 0.02  # relative bias worth a warning when also beyond the Monte Carlo noise (the 2 %)
BIAS_TEST_LEVEL = 0.01  # chance that noise alone raises the bias warning in a comparison (our choice)


# ----------------------------------------------------------------------------
# the population grid
# ----------------------------------------------------------------------------
@dataclass(frozen=True, eq=False)
class PopulationGrid:
    """The surface cells of the frame.

    Attributes
    ----------
    mu : ndarray, shape (rows, cols)
        Expected animals per cell ``μ_c`` (0 outside the frame).
    code : ndarray of int, shape (rows, cols)
        Stratum index of the cell (its centre lies in that stratum), -1 outside
        the frame.
    geotransform : tuple
        GDAL geotransform of the grid (north-up).
    keys : tuple
        Stratum values, in the order of the codes (``(None,)`` without strata).
    stratum_cells : ndarray of int
        Cells per stratum.
    warnings : tuple of str
    """

    mu: np.ndarray
    code: np.ndarray
    geotransform: tuple
    keys: tuple
    stratum_cells: np.ndarray
    warnings: tuple = ()

    @property
    def shape(self):
        return self.mu.shape

    @property
    def cell_width(self):
        return float(self.geotransform[1])

    @property
    def cell_height(self):
        return float(-self.geotransform[5])

    @property
    def cell_area(self):
        """Area of one cell (m²)."""
        return self.cell_width * self.cell_height

    @property
    def stratum_areas_km2(self):
        """Area of every stratum, from its cells (km²)."""
        return self.stratum_cells * self.cell_area / M2_PER_KM2

    @functools.cached_property
    def expected_total(self):
        """``Σ μ_c`` over the frame (computed once: every replicate needs it)."""
        return float(self.mu.sum())

    @functools.cached_property
    def sum_mu_squared(self):
        """``Σ μ_c²`` over the frame (computed once)."""
        return float(np.sum(self.mu * self.mu))

    @functools.cached_property
    def count_tables(self):
        """The grid's :class:`CountTables` (built once, on first use)."""
        return count_tables(self)


def population_grid(density, geotransform, frame, strata=None, keys=None, progress=None):
    """Cells of the density surface inside the frame, with their stratum.

    A cell belongs to the frame (and to a stratum) when its centre lies inside
    it. The grid is cut to the frame's bounding box.

    Parameters
    ----------
    density : array_like, shape (rows, cols)
        Expected animals per km² (NaN: no data).
    geotransform : tuple
        GDAL geotransform ``(x0, dx, 0, y0, 0, dy)``, north-up (``dy < 0``), in
        the frame's projected CRS (metres).
    frame : Polygon or MultiPolygon
    strata : sequence of Polygon or MultiPolygon, optional
        Stratum polygons (cut to the frame); features with the same key are one
        stratum.
    keys : sequence, optional
        Stratum value of each polygon of ``strata``.

    Returns
    -------
    PopulationGrid

    Raises
    ------
    InputError
        When the surface does not overlap the frame, has negative values in it,
        or no cell of the frame has a value.
    """
    density = np.asarray(density, dtype=float)
    if density.ndim != 2:
        raise InputError(message(QT_TRANSLATE_NOOP("PlotwiseEngine",
            "The density surface must be a single raster band.")))
    x0, dx, rx, y0, ry, dy = (float(v) for v in geotransform)
    if rx or ry or dx <= 0 or dy >= 0:
        raise InputError(message(QT_TRANSLATE_NOOP("PlotwiseEngine",
            "The density surface must be a north-up raster (no rotation); warp it first.")))
    rows, cols = density.shape
    minx, miny, maxx, maxy = frame.bounds
    c0 = max(0, int(math.floor((minx - x0) / dx)))
    c1 = min(cols, int(math.ceil((maxx - x0) / dx)))
    r0 = max(0, int(math.floor((y0 - maxy) / -dy)))
    r1 = min(rows, int(math.ceil((y0 - miny) / -dy)))
    if c1 <= c0 or r1 <= r0:
        raise InputError(message(
            QT_TRANSLATE_NOOP("PlotwiseEngine",
                "The density surface does not overlap the frame. Check that both cover the same area "
                "(and their coordinate reference systems).")
        ))
    sub = density[r0:r1, c0:c1]
    gt = (x0 + c0 * dx, dx, 0.0, y0 + r0 * dy, 0.0, dy)
    h, w = sub.shape
    xs = gt[0] + (np.arange(w) + 0.5) * dx
    ys = gt[3] + (np.arange(h) + 0.5) * dy
    regions, stratum_keys = _stratum_regions(frame, strata, keys)
    code, warnings = _cell_codes(regions, xs, ys, progress)
    return _checked_grid(sub, code, gt, stratum_keys, warnings)


def _stratum_regions(frame, strata, keys):
    """The strata cut to the frame, one (Multi)Polygon per stratum value, and the values in order."""
    if strata is None:
        regions, stratum_keys = [frame], (None,)
    else:
        strata = list(strata)
        keys = list(range(len(strata))) if keys is None else list(keys)
        groups = {}
        for g, k in zip(strata, keys):
            if k is None:
                raise InputError(message(QT_TRANSLATE_NOOP("PlotwiseEngine",
                    "A stratum has no stratum value (NULL). Give every stratum a value.")))
            groups.setdefault(k, []).append(g)
        stratum_keys = tuple(_sorted_keys(groups))
        regions = []
        for k in stratum_keys:
            parts = [p.intersection(frame) for p in groups[k]]
            regions.append(parts[0] if len(parts) == 1 else _union(parts))
    return regions, stratum_keys


def _cell_codes(regions, xs, ys, progress):
    """Stratum index of every cell whose centre lies in a region (−1 elsewhere), and a warning for overlaps."""
    code = np.full((ys.size, xs.size), -1, dtype=np.int32)
    warnings = []
    overlap = 0
    for index, region in enumerate(regions):
        if region.is_empty:
            continue
        bx0, by0, bx1, by1 = region.bounds
        cs = np.flatnonzero((xs > bx0) & (xs < bx1))
        rs = np.flatnonzero((ys > by0) & (ys < by1))
        if cs.size == 0 or rs.size == 0:
            continue
        xx, yy = np.meshgrid(xs[cs], ys[rs])
        inside = contains_xy(region, xx, yy)
        window = code[rs[0]:rs[-1] + 1, cs[0]:cs[-1] + 1]
        overlap += int(np.count_nonzero(inside & (window >= 0)))
        window[inside & (window < 0)] = index
        if progress is not None and progress((index + 1) / len(regions)):
            raise Cancelled("Cancelled while reading the surface.")
    if overlap:
        warnings.append(message(
            QT_TRANSLATE_NOOP("PlotwiseEngine",
                "{overlap} surface cell(s) lie in more than one stratum; each was given to the first of them. "
                "Strata should not overlap."), overlap=overlap))
    return code, warnings


def _checked_grid(sub, code, gt, stratum_keys, warnings):
    """The :class:`PopulationGrid`, refusing a surface with no, negative or missing values in the frame."""
    dx, dy = gt[1], gt[5]
    inside = code >= 0
    if not inside.any():
        raise InputError(message(
            QT_TRANSLATE_NOOP("PlotwiseEngine",
                "No cell centre of the density surface lies in the frame: the surface cells are too coarse for "
                "the frame, or the two do not overlap.")
        ))
    negative = inside & (sub < 0)
    if negative.any():
        raise InputError(message(
            QT_TRANSLATE_NOOP("PlotwiseEngine",
                "The density surface has {n} negative cell(s) in the frame. Expected animals "
                "per km² must be 0 or more: correct the surface (for instance clip it at 0)."), n=int(negative.sum())))
    missing = inside & ~np.isfinite(sub)
    if missing.any():
        share = missing.sum() / inside.sum()
        warnings.append(message(
            QT_TRANSLATE_NOOP("PlotwiseEngine",
                "{n} cell(s) of the frame ({share:.1%}) have no value on the density surface "
                "and are left out of the population: the comparison speaks for the rest of the frame."),
            n=int(missing.sum()), share=share))
        code[missing] = -1
        inside &= ~missing
        if not inside.any():
            raise InputError(message(QT_TRANSLATE_NOOP("PlotwiseEngine",
                "The density surface has no value in the frame.")))
    mu = np.where(inside, np.nan_to_num(sub) * dx * -dy / M2_PER_KM2, 0.0)
    cells = np.bincount(code[inside], minlength=len(stratum_keys)).astype(np.int64)
    empty = [k for k, n in zip(stratum_keys, cells) if n == 0]
    if empty:
        raise InputError(
            message(QT_TRANSLATE_NOOP("PlotwiseEngine",
                "Strata {ids} hold no cell centre of the density surface inside the "
                "frame. Remove them, merge them with a neighbour, or use a finer surface."),
                    ids=", ".join(str(k) for k in empty)),
            ids=empty,
        )
    return PopulationGrid(mu, code, gt, stratum_keys, cells, tuple(warnings))


def _sorted_keys(keys):
    try:
        return sorted(keys)
    except TypeError:
        return sorted(keys, key=str)


def _union(parts):
    from shapely.ops import unary_union

    return unary_union(parts)


# ----------------------------------------------------------------------------
# the counting region of a unit and the cells it covers
# ----------------------------------------------------------------------------
@dataclass(frozen=True)
class CountingRegion:
    """What a unit counts, about its centre.

    ``kind`` is ``"circle"`` (``radius``) or ``"rectangle"`` (``half_length``
    along the bearing, ``half_width`` across it).
    """

    kind: str
    radius: float = 0.0
    half_length: float = 0.0
    half_width: float = 0.0

    @property
    def area(self):
        """Nominal area (m²)."""
        if self.kind == "circle":
            return math.pi * self.radius ** 2
        return 4.0 * self.half_length * self.half_width

    @property
    def reach(self):
        """Radius of the circle about the centre that holds the region (m)."""
        return self.radius if self.kind == "circle" else math.hypot(self.half_length, self.half_width)

    @property
    def narrowest(self):
        """Smallest width of the region (m)."""
        return 2.0 * (self.radius if self.kind == "circle" else min(self.half_length, self.half_width))


def counting_region(shape, size, half_width=0.0):
    """The region a unit of ``shape`` and ``size`` counts (as in :mod:`.unit_shapes`).

    * point station: a circle of radius ``size`` (its counting radius);
    * square plot of side ``size``: itself;
    * circular plot of radius ``size``: itself;
    * line transect of length ``size``: a strip of ``half_width`` on each side
      of the line (as :mod:`.counting` does for lines).
    """
    shape = int(shape)
    size = float(size)
    half_width = float(half_width or 0.0)
    if shape not in (POINT, SQUARE, CIRCLE, LINE):
        raise InputError(message(QT_TRANSLATE_NOOP("PlotwiseEngine",
            "SHAPE must be 0 (point), 1 (square), 2 (circle) or 3 (line transect).")))
    if not size > 0:
        raise InputError(message(_SIZE_NOT_POSITIVE[shape]))
    if shape == LINE and not half_width > 0:
        raise InputError(message(
            QT_TRANSLATE_NOOP("PlotwiseEngine",
                "A line transect needs the half-width of its counting strip (more than 0 m): animals are counted "
                "up to that distance on either side of the line.")
        ))
    if shape in (POINT, CIRCLE):
        return CountingRegion("circle", radius=size)
    if shape == SQUARE:
        return CountingRegion("rectangle", half_length=size / 2.0, half_width=size / 2.0)
    return CountingRegion("rectangle", half_length=size / 2.0, half_width=half_width)


def subdivision(grid, region, min_cells=MIN_CELLS_ACROSS):
    """Sub-cells per cell side ``f`` so that the region spans at least ``min_cells`` of them."""
    cell = max(grid.cell_width, grid.cell_height)
    f = int(math.ceil(min_cells * cell / region.narrowest - 1e-9))
    return int(min(max(f, 1), MAX_SUBDIVISION))


@dataclass(frozen=True, eq=False)
class UnitCells:
    """The (sub-)cells each unit covers: one entry per (unit, sub-cell) pair.

    ``fine`` is the sub-cell's index on the subdivided grid, ``coarse`` the
    flat index of its surface cell.
    """

    unit: np.ndarray
    fine: np.ndarray
    coarse: np.ndarray
    factor: int


def _ragged(counts):
    """Owner and position within the owner of each element of a ragged expansion."""
    counts = np.asarray(counts, dtype=np.int64)
    owner = np.repeat(np.arange(counts.size), counts)
    starts = np.cumsum(counts) - counts
    return owner, np.arange(int(counts.sum()), dtype=np.int64) - starts[owner]


def _slab(a, p, q):
    """Interval of t with ``a t`` in [p, q] (``a`` may be 0)."""
    small = np.abs(a) < 1e-12
    safe = np.where(small, 1.0, a)
    t1, t2 = p / safe, q / safe
    lo, hi = np.minimum(t1, t2), np.maximum(t1, t2)
    holds = (p <= 0) & (q >= 0)
    lo = np.where(small, np.where(holds, -np.inf, np.inf), lo)
    hi = np.where(small, np.where(holds, np.inf, -np.inf), hi)
    return lo, hi


@dataclass(frozen=True, eq=False)
class UnitRows:
    """The rows of sub-cells each unit spans: one entry per (unit, row) with at least one covered sub-cell.

    ``row`` is the row on the subdivided grid, ``c_lo`` and ``c_hi`` the first
    and last covered sub-cell column (inclusive).
    """

    unit: np.ndarray
    row: np.ndarray
    c_lo: np.ndarray
    c_hi: np.ndarray
    factor: int


def unit_rows(centres, bearings, region, grid, factor):
    """The column interval of sub-cell centres each unit covers, row by row.

    Rows of sub-cells are taken within the region's reach of the centre; on a
    row at height ``y`` the covered x form one interval: ``|x − x0| ≤
    √(r² − (y − y0)²)`` for a circle, and for a rectangle the intersection of
    the slabs ``|u| ≤ L/2`` and ``|v| ≤ W/2`` with ``u = Δx sin b + Δy cos b``
    (along the bearing b, clockwise from north) and ``v = Δx cos b − Δy sin b``.

    Parameters
    ----------
    centres : ndarray, shape (n, 2)
    bearings : ndarray, shape (n,)
        Degrees clockwise from grid north.
    region : CountingRegion
    grid : PopulationGrid
    factor : int
        Sub-cells per cell side.

    Returns
    -------
    UnitRows
    """
    centres = np.asarray(centres, dtype=float).reshape(-1, 2)
    bearings = np.broadcast_to(np.asarray(bearings, dtype=float), (len(centres),))
    f = int(factor)
    h, w = grid.shape
    ox, oy = grid.geotransform[0], grid.geotransform[3]
    fdx, fdy = grid.cell_width / f, grid.cell_height / f
    rows_f, cols_f = h * f, w * f
    cx, cy = centres[:, 0], centres[:, 1]
    reach = region.reach
    r_lo = np.clip(np.ceil((oy - (cy + reach)) / fdy - 0.5), 0, rows_f)
    r_hi = np.clip(np.floor((oy - (cy - reach)) / fdy - 0.5), -1, rows_f - 1)
    n_rows = np.maximum(r_hi - r_lo + 1, 0).astype(np.int64)
    unit, step = _ragged(n_rows)
    row = r_lo.astype(np.int64)[unit] + step
    dy_row = (oy - (row + 0.5) * fdy) - cy[unit]
    if region.kind == "circle":
        room = region.radius ** 2 - dy_row ** 2
        half = np.sqrt(np.maximum(room, 0.0))
        lo = np.where(room >= 0, -half, np.inf)
        hi = np.where(room >= 0, half, -np.inf)
    else:
        b = np.radians(bearings[unit])
        s, c = np.sin(b), np.cos(b)
        hl, hw = region.half_length, region.half_width
        lo1, hi1 = _slab(s, -hl - dy_row * c, hl - dy_row * c)
        lo2, hi2 = _slab(c, -hw + dy_row * s, hw + dy_row * s)
        lo, hi = np.maximum(lo1, lo2), np.minimum(hi1, hi2)
    x = cx[unit]
    big = float(cols_f + 2)
    c_lo = np.clip(np.ceil(np.clip((x + lo - ox) / fdx - 0.5, -2.0, big)), 0, cols_f).astype(np.int64)
    c_hi = np.clip(np.floor(np.clip((x + hi - ox) / fdx - 0.5, -2.0, big)), -1, cols_f - 1).astype(np.int64)
    some = c_hi >= c_lo
    return UnitRows(unit[some], row[some], c_lo[some], c_hi[some], f)


def unit_cells(centres, bearings, region, grid, factor, unit_codes=None):
    """The sub-cells whose centres lie in each unit (and in its stratum).

    The rows and column intervals of :func:`unit_rows`, expanded to sub-cells
    by :func:`row_cells`.

    Parameters
    ----------
    centres, bearings, region, grid, factor
        As for :func:`unit_rows`.
    unit_codes : ndarray of int, optional
        Stratum code of each unit: the unit counts only cells of that stratum;
        -1 (or None) counts every cell of the frame.

    Returns
    -------
    UnitCells
    """
    return row_cells(unit_rows(centres, bearings, region, grid, factor), grid, unit_codes)


def row_cells(rows, grid, unit_codes=None):
    """The sub-cells of the intervals of ``rows`` (a :class:`UnitRows`) that lie in the frame and in each
    unit's stratum (``unit_codes``, as for :func:`unit_cells`)."""
    f = rows.factor
    w = grid.shape[1]
    span, step = _ragged(rows.c_hi - rows.c_lo + 1)
    col = rows.c_lo[span] + step
    row = rows.row[span]
    unit = rows.unit[span]
    coarse = (row // f) * w + (col // f)
    code = grid.code.ravel()[coarse]
    keep = code >= 0
    if unit_codes is not None:
        wanted = np.asarray(unit_codes)[unit]
        keep &= (wanted < 0) | (code == wanted)
    return UnitCells(unit[keep], row[keep] * (w * f) + col[keep], coarse[keep], f)


def _some_rows(rows, keep):
    """The entries of ``rows`` where ``keep`` (one bool per entry) holds."""
    return UnitRows(rows.unit[keep], rows.row[keep], rows.c_lo[keep], rows.c_hi[keep], rows.factor)


# ----------------------------------------------------------------------------
# expected counts of units from row sums
# ----------------------------------------------------------------------------
@dataclass(frozen=True, eq=False)
class CountTables:
    """Row sums of a :class:`PopulationGrid` that give a unit's expected count without visiting its cells.

    Attributes
    ----------
    prefix : ndarray, shape (rows, cols + 1)
        ``prefix[r, c] = Σ_{c' < c} μ[r, c']``: the running sum of every row
        (a summed-area table in one direction; Crow 1984), so that
        ``Σ_{c=a}^{b} μ[r, c] = prefix[r, b + 1] − prefix[r, a]``.
    run_end : ndarray of int32, shape (rows, cols)
        Last column of the run of equal stratum codes that holds the cell: a
        row interval ``[a, b]`` lies in one stratum when ``run_end[r, a] ≥ b``.
    """

    prefix: np.ndarray
    run_end: np.ndarray


def count_tables(grid):
    """The :class:`CountTables` of ``grid`` (about 12 bytes per cell)."""
    h, w = grid.shape
    prefix = np.zeros((h, w + 1))
    np.cumsum(grid.mu, axis=1, out=prefix[:, 1:])
    ends = np.empty((h, w), dtype=np.int32)
    ends[:, -1] = w - 1
    last = np.arange(w - 1, dtype=np.int32)
    ends[:, :-1] = np.where(grid.code[:, 1:] != grid.code[:, :-1], last, w)
    run_end = np.minimum.accumulate(ends[:, ::-1], axis=1)[:, ::-1]
    return CountTables(np.ascontiguousarray(prefix), np.ascontiguousarray(run_end))


def expected_unit_counts(rows, grid, n_units, unit_codes=None):
    """``Λ_u = Σ_c μ_c m_c / f²``: each unit's expected count, from row sums.

    On a row of sub-cells the interval ``[a, b]`` of covered sub-cell columns
    spans the surface cells ``A = a // f`` to ``B = b // f``; every sub-cell
    carries ``μ / f²`` of its cell, so the row holds

        ``f Σ_{c=A}^{B} μ_c − (a − f A) μ_A − (f B + f − 1 − b) μ_B``

    sub-cell shares (the cells from A to B counted whole, less the sub-cells
    left of ``a`` and right of ``b``), the running sums of
    :class:`CountTables` giving the middle sum in two look-ups. Cells outside
    the frame have ``μ = 0``. A unit of a stratum counts only that stratum's
    cells: a row within one run of the stratum's code is summed so, and the
    few rows that cross a stratum's edge sub-cell by sub-cell. The cells
    counted are those of :func:`unit_cells` for the same rows.

    Parameters
    ----------
    rows : UnitRows
    grid : PopulationGrid
    n_units : int
    unit_codes : ndarray of int, optional
        Stratum code of each unit (-1 or None: the whole frame).

    Returns
    -------
    ndarray, shape (n_units,)
    """
    f = rows.factor
    tables = grid.count_tables
    r, a, b = rows.row // f, rows.c_lo, rows.c_hi
    first, last = a // f, b // f
    mu = grid.mu
    share = tables.prefix[r, last + 1] - tables.prefix[r, first]
    if f > 1:  # the sub-cells of the end cells outside the interval
        share = f * share - (a - f * first) * mu[r, first] - (f * last + f - 1 - b) * mu[r, last]
    if unit_codes is not None:
        wanted = np.asarray(unit_codes)[rows.unit]
        own = np.flatnonzero(wanted >= 0)  # rows of units that count one stratum
        ro, fo, lo = r[own], first[own], last[own]
        mixed = own[(grid.code[ro, fo] != wanted[own]) | (tables.run_end[ro, fo] < lo)]
        if mixed.size:  # rows over a stratum's edge: their sub-cells one by one
            span, step = _ragged(b[mixed] - a[mixed] + 1)
            cells = r[mixed][span] * grid.shape[1] + (a[mixed][span] + step) // f
            mine = grid.code.ravel()[cells] == wanted[mixed][span]
            share[mixed] = np.bincount(span, weights=np.where(mine, mu.ravel()[cells], 0.0), minlength=mixed.size)
    return np.bincount(rows.unit, weights=share, minlength=n_units) / float(f * f)


# ----------------------------------------------------------------------------
# realising a population in the covered cells
# ----------------------------------------------------------------------------
@dataclass(frozen=True, eq=False)
class RealisedCounts:
    """Counts of one replicate.

    ``counts`` and ``areas_m2`` per unit (area of the sub-cells counted),
    ``total`` the realised number of animals in the whole frame.
    """

    counts: np.ndarray
    areas_m2: np.ndarray
    total: float


def realise_counts(cells, n_units, grid, rng, overdispersion=0.0):
    """Realise the population in the covered sub-cells and the rest of the frame.

    See the module docstring: covered sub-cells get ``Poisson(μ_c G_c / f²)``
    (``G_c = 1`` for Poisson counts, ``Gamma(k, 1/k)`` per surface cell for the
    negative binomial); the rest of the frame one aggregate draw.

    Parameters
    ----------
    cells : UnitCells
    n_units : int
    grid : PopulationGrid
    rng : numpy.random.Generator
    overdispersion : float
        The negative binomial's k (0: Poisson).

    Returns
    -------
    RealisedCounts
    """
    covered = _covered_animals(cells, n_units, grid, rng, overdispersion)
    rest = _rest_of_frame(grid, rng, overdispersion, covered)
    return RealisedCounts(covered.counts, covered.areas_m2, float(covered.animals + rest))


@dataclass(frozen=True, eq=False)
class _Covered:
    """The animals realised in covered sub-cells, and what their surface cells leave to the rest of the frame."""

    counts: np.ndarray
    areas_m2: np.ndarray
    animals: float
    mu_sum: float
    mu_square: float
    partly: float


def _covered_animals(cells, n_units, grid, rng, overdispersion):
    """``Poisson(μ_c G_c / f²)`` in every covered sub-cell, summed per unit (see :func:`realise_counts`)."""
    f2 = float(cells.factor) ** 2
    k = float(overdispersion or 0.0)
    fine, first, inverse = np.unique(cells.fine, return_index=True, return_inverse=True)
    coarse_of_fine = cells.coarse[first]
    coarse, c_inverse, fine_per_coarse = np.unique(coarse_of_fine, return_inverse=True, return_counts=True)
    mu_c = grid.mu.ravel()[coarse]
    g = rng.gamma(k, 1.0 / k, size=coarse.size) if k > 0 else np.ones(coarse.size)
    animals = rng.poisson((mu_c * g / f2)[c_inverse]) if fine.size else np.zeros(0, dtype=np.int64)
    counts = np.bincount(cells.unit, weights=animals[inverse], minlength=n_units)
    areas = np.bincount(cells.unit, minlength=n_units) * (grid.cell_area / f2)
    partly = float(np.sum(mu_c * g * (1.0 - fine_per_coarse / f2)))
    return _Covered(counts, areas, float(animals.sum()), float(mu_c.sum()), float(np.sum(mu_c * mu_c)), partly)


def _rest_of_frame(grid, rng, overdispersion, covered, apart_mean=0.0):
    """One draw for the animals of the frame outside the covered sub-cells (see the module docstring).

    ``apart_mean``: the expected count of units realised whole (:func:`realise_survey`), which leaves the rest.
    """
    k = float(overdispersion or 0.0)
    rest_mean = max(grid.expected_total - covered.mu_sum - apart_mean, 0.0)
    rest_square = max(grid.sum_mu_squared - covered.mu_square, 0.0)
    if k > 0 and rest_mean > 0 and rest_square > 0:
        shape = k * rest_mean ** 2 / rest_square
        rest_mean = rng.gamma(shape, rest_mean / shape)
    return rng.poisson(rest_mean + covered.partly)


def units_apart(rows, grid, n_units):
    """True for each unit that covers no surface cell another unit covers.

    On every row of surface cells a unit covers the columns between the ends
    of its sub-cell intervals on that row (all of them when the unit is
    convex; more, which is safe, otherwise). The (unit, row) intervals sorted
    by row and first column overlap an earlier one exactly when the running
    maximum of the earlier ends reaches their start, and the earlier interval
    that holds that maximum overlaps them too (a sweep over the intervals, as
    in Bentley & Ottmann 1979); every unit of such a pair may share cells.

    Parameters
    ----------
    rows : UnitRows
        From :func:`unit_rows` (ordered by unit, then row).
    grid : PopulationGrid
    n_units : int

    Returns
    -------
    ndarray of bool, shape (n_units,)
    """
    f = rows.factor
    w = grid.shape[1]
    apart = np.ones(int(n_units), dtype=bool)
    if rows.unit.size == 0:
        return apart
    coarse_row = rows.row // f
    key = rows.unit * grid.shape[0] + coarse_row
    starts = np.flatnonzero(np.r_[True, key[1:] != key[:-1]])
    lo = np.minimum.reduceat(rows.c_lo // f, starts) + coarse_row[starts] * w
    hi = np.maximum.reduceat(rows.c_hi // f, starts) + coarse_row[starts] * w
    order = np.argsort(lo, kind="stable")
    unit, lo, hi = rows.unit[starts][order], lo[order], hi[order]
    reach = np.maximum.accumulate(hi)
    holder = np.maximum.accumulate(np.where(hi == reach, np.arange(hi.size), 0))
    later = np.flatnonzero(reach[:-1] >= lo[1:]) + 1
    apart[unit[later]] = False
    apart[unit[holder[later - 1]]] = False
    return apart


@dataclass(frozen=True, eq=False)
class SurveyCounts:
    """Counts of one simulated survey: per unit, the realised total of the frame, and how many units were
    realised whole (:func:`realise_survey`)."""

    counts: np.ndarray
    total: float
    n_apart: int


def realise_survey(centres, bearings, unit_codes, setup, rng):
    """Realise one population and count it in every unit of a survey.

    For Poisson counts the animals of a unit that covers no surface cell
    another unit covers (:func:`units_apart`) are one draw ``Poisson(Λ_u)``, with
    ``Λ_u`` from :func:`expected_unit_counts`: the sum of independent Poisson
    counts over its sub-cells has exactly that law (Johnson, Kemp & Kotz 2005,
    §4.8), and its cells are counted by no other unit. Units that may share
    cells, and every unit of negative binomial counts (whose cells each carry
    their own gamma multiplier), are realised sub-cell by sub-cell as in
    :func:`realise_counts`, so that overlapping units count the same animals.
    The rest of the frame is one draw, its mean less the units' expected counts.

    Parameters
    ----------
    centres : ndarray, shape (n, 2)
    bearings : ndarray, shape (n,)
    unit_codes : ndarray of int, shape (n,)
        Stratum code of each unit (-1: the whole frame).
    setup : ComparisonSetup
    rng : numpy.random.Generator

    Returns
    -------
    SurveyCounts
    """
    grid, k = setup.grid, setup.overdispersion
    n = len(np.asarray(centres).reshape(-1, 2))
    unit_codes = np.broadcast_to(np.asarray(unit_codes), (n,))
    rows = unit_rows(centres, bearings, setup.region, grid, setup.factor)
    apart = units_apart(rows, grid, n) if k == 0 else np.zeros(n, dtype=bool)
    whole = apart[rows.unit]
    covered = _covered_animals(row_cells(_some_rows(rows, ~whole), grid, unit_codes), n, grid, rng, k)
    lam = expected_unit_counts(_some_rows(rows, whole), grid, n, unit_codes)[apart]
    own = rng.poisson(lam) if lam.size else np.zeros(0, dtype=np.int64)
    rest = _rest_of_frame(grid, rng, k, covered, float(lam.sum()))
    counts = np.array(covered.counts, dtype=float)
    counts[apart] = own
    return SurveyCounts(counts, float(covered.animals + own.sum() + rest), int(apart.sum()))


# ----------------------------------------------------------------------------
# setting up the designs
# ----------------------------------------------------------------------------
@dataclass(frozen=True, eq=False)
class ComparisonSetup:
    """Everything the replicates share: grid, counting region, prepared strata, S_h.

    Attributes
    ----------
    grid : PopulationGrid
    region : CountingRegion
    factor : int
    spec : layout.LayoutSpec
        Shape, size and bearing (the design is set per design).
    frame : layout.PreparedFrame
        The frame as one stratum.
    strata : layout.PreparedFrame or None
        The strata (cut to the frame).
    stratum_codes : ndarray of int
        Grid code of each prepared stratum.
    stratum_sd : ndarray or None
        ``S_h`` per prepared stratum (counts per unit) from the surface.
    stratum_mean : ndarray or None
        Mean expected count per unit in each stratum.
    overdispersion : float
    warnings : tuple of str
    pilot_units : int
        Pilot units per stratum of the pilot-based Neyman design.
    """

    grid: PopulationGrid
    region: CountingRegion
    factor: int
    spec: layout.LayoutSpec
    frame: layout.PreparedFrame
    strata: object
    stratum_codes: np.ndarray
    stratum_sd: object
    stratum_mean: object
    overdispersion: float
    warnings: tuple = ()
    pilot_units: int = DEFAULT_PILOT_UNITS

    @property
    def unit_area_km2(self):
        return self.region.area / M2_PER_KM2


def prepare_comparison(grid, frame, region, shape, size, rng, strata=None, keys=None, bearing=0.0,
                       overdispersion=0.0, sd_draws=SD_DRAWS, inside=False, strata_ids=None, frame_parts=None,
                       frame_ids=None, pilot_units=DEFAULT_PILOT_UNITS):
    """Prepare the frame, the strata and the Neyman ``S_h`` for :func:`simulate_designs`.

    Parameters
    ----------
    grid : PopulationGrid
        From :func:`population_grid` with the same frame and strata.
    frame : Polygon or MultiPolygon
    region : CountingRegion
    shape, size : int, float
        The unit as in the layout engine.
    rng : numpy.random.Generator
        Draws the random unit positions for ``S_h``.
    strata, keys : optional
        As for :func:`population_grid`.
    bearing : float
        Degrees, or -1 for random bearings (and grid rotations).
    overdispersion : float
        The negative binomial's k (0: Poisson).
    inside : bool
        Keep every unit wholly inside its stratum (or the frame), as the
        layout's INSIDE option does: centres are drawn from the region shrunk
        by the unit's circumscribing radius. Otherwise plus sampling, the
        layout's default (:mod:`.edge`): centres over the stratum grown by the
        counting region's reach plus half a surface cell's diagonal (a cell
        belongs to the stratum by its centre, so its animals lie up to that far
        outside the polygon), and units count only their stratum's cells.
    pilot_units : int
        Pilot units per stratum of the pilot-based Neyman design.
    strata_ids : sequence, optional
        The host's feature id of each polygon of ``strata``, named in messages
        (default 0, 1, ...).
    frame_parts, frame_ids : sequence, optional
        The frame's features (their union is ``frame``) and their feature ids,
        named in messages about the frame when there are no strata.
    """
    if overdispersion < 0:
        raise InputError(message(QT_TRANSLATE_NOOP("PlotwiseEngine",
            "The overdispersion k must be 0 (Poisson counts) or more.")))
    if int(pilot_units) < 2:
        raise InputError(message(QT_TRANSLATE_NOOP("PlotwiseEngine", "The pilot needs at least 2 units per stratum.")))
    spec = layout.LayoutSpec(design=layout.SIMPLE_RANDOM, shape=int(shape), size=float(size), bearing=float(bearing),
                             inside=bool(inside))
    if not inside:
        spec = replace(spec, margin=region.reach - spec.radius + 0.5 * math.hypot(grid.cell_width, grid.cell_height))
    factor = subdivision(grid, region)
    warnings = list(grid.warnings)
    prepared = None
    codes = np.zeros(0, dtype=int)
    sd = mean = None
    covered = frame
    if strata is not None:
        strata = list(strata)
        keys = list(range(len(strata))) if keys is None else list(keys)
        cut = [g.intersection(frame) for g in strata]
        covered = _union(cut)
        lost = 1.0 - covered.area / frame.area if frame.area > 0 else 0.0
        if lost > 0.005:
            warnings.append(message(
                QT_TRANSLATE_NOOP("PlotwiseEngine",
                    "The strata cover {share:.1%} of the frame: every design is compared on the part the strata "
                    "cover."), share=1 - lost))
        prepared = layout.prepare_strata(cut, feature_ids=strata_ids, strata=keys, n_units=2 * len(strata),
                                         spec=spec)
        position = {k: i for i, k in enumerate(grid.keys)}
        try:
            codes = np.array([position[st.key] for st in prepared.strata], dtype=int)
        except KeyError:
            raise InputError(message(QT_TRANSLATE_NOOP("PlotwiseEngine",
                "A stratum of the layout has no cells on the surface grid."))) from None
        sd, mean = stratum_unit_sd(grid, prepared, codes, region, factor, spec.bearing, overdispersion, rng, sd_draws)
    if strata is None and frame_parts is not None and frame_ids is not None:  # messages name the features
        whole = layout.prepare_strata(list(frame_parts), feature_ids=frame_ids,
                                      n_units=layout.MIN_PER_STRATUM, spec=spec)
    else:
        whole = layout.prepare_strata([covered], n_units=layout.MIN_PER_STRATUM, spec=spec)
    return ComparisonSetup(grid, region, factor, spec, whole, prepared, codes, sd, mean, float(overdispersion),
                           tuple(warnings), int(pilot_units))


def _bearings(spec, count, rng):
    if spec.bearing == layout.RANDOM_BEARING:
        return rng.uniform(0.0, 360.0, count)
    return np.full(count, float(spec.bearing))


def stratum_unit_sd(grid, prepared, codes, region, factor, bearing, overdispersion, rng, draws=SD_DRAWS):
    """``S_h``: the standard deviation of one unit's count in each stratum, implied by the surface.

    For ``draws`` uniform unit centres per stratum (the layout engine's simple
    random draw), the unit's expected count ``Λ = Σ μ_c m_c / f²`` (``m_c``
    sub-cells of cell c covered) and its negative-binomial extra variance
    ``Σ (μ_c m_c / f²)² / k``; then by the law of total variance
    ``S_h² = Var(Λ) + E(Λ) + E(extra)`` (Poisson given Λ).

    Returns
    -------
    (ndarray, ndarray)
        ``S_h`` and the mean expected count per unit, per prepared stratum.
    """
    f2 = float(factor) ** 2
    sds, means = [], []
    spec = layout.LayoutSpec(bearing=float(bearing))
    for st, code in zip(prepared.strata, codes):  # a loop over strata (tens)
        centres = layout.simple_random_centres(st, draws, rng)
        bearings, unit_codes = _bearings(spec, len(centres), rng), np.full(len(centres), code)
        lam = expected_unit_counts(unit_rows(centres, bearings, region, grid, factor), grid, len(centres), unit_codes)
        extra = np.zeros(len(centres))
        if overdispersion > 0:
            cells = unit_cells(centres, bearings, region, grid, factor, unit_codes)
            pair = cells.unit.astype(np.int64) * grid.mu.size + cells.coarse
            uniq, m = np.unique(pair, return_counts=True)
            mu_pair = grid.mu.ravel()[uniq % grid.mu.size] * m / f2
            extra = np.bincount(uniq // grid.mu.size, weights=mu_pair ** 2 / overdispersion, minlength=len(centres))
        if lam.size < 2:
            sds.append(0.0)
            means.append(float(lam.mean()) if lam.size else 0.0)
            continue
        sds.append(float(math.sqrt(np.var(lam, ddof=1) + lam.mean() + extra.mean())))
        means.append(float(lam.mean()))
    return np.asarray(sds), np.asarray(means)


@dataclass(frozen=True, eq=False)
class DesignPlan:
    """One design ready to be drawn: its prepared strata, layout spec and estimator labels.

    ``areas`` are the strata's areas (km²) and ``expansion`` the areas the
    counts expand to (the plus regions' ``A⁺_h``, None when units are kept inside).
    """

    design: int
    prepared: object
    spec: layout.LayoutSpec
    codes: np.ndarray
    labels: tuple
    areas: dict
    allocation: tuple
    warnings: tuple = ()
    expansion: object = None


def plan_design(setup, design, n_units, sds=None):
    """A :class:`DesignPlan` for ``design`` with ``n_units`` units in all.

    Stratified designs share ``n_units`` by the allocation engine
    (proportional, or Neyman with ``S_h`` from the surface: the best case, or
    with ``sds`` from a pilot), at least two units per stratum.
    """
    design = int(design)
    if design not in range(len(DESIGNS)):
        raise InputError(message(QT_TRANSLATE_NOOP("PlotwiseEngine", "Unknown design {design}; use 0 to {last}."),
                                 design=design, last=len(DESIGNS) - 1))
    n_units = int(n_units)
    if n_units < layout.MIN_PER_STRATUM:
        raise InputError(message(QT_TRANSLATE_NOOP("PlotwiseEngine", "N_UNITS must be at least {minimum}."),
                                 minimum=layout.MIN_PER_STRATUM))
    spec = replace(setup.spec, design=LAYOUT_DESIGN[design])
    grid = setup.grid
    if design not in STRATIFIED_DESIGNS:
        st = replace(setup.frame.strata[0], n=n_units)
        expansion = None if spec.inside else {FRAME_LABEL: st.effective_area / M2_PER_KM2}
        return DesignPlan(design, (st,), spec, np.array([-1]), (FRAME_LABEL,),
                          {FRAME_LABEL: float(grid.stratum_areas_km2.sum())}, (n_units,), (), expansion)
    if setup.strata is None:
        raise InputError(message(QT_TRANSLATE_NOOP("PlotwiseEngine",
            "The {design} design needs strata: give the STRATA layer."),
                                 design=message(DESIGNS[design])))
    strata = setup.strata.strata
    areas = grid.stratum_areas_km2[setup.stratum_codes]
    method = "proportional" if design == STRATIFIED_PROPORTIONAL else "neyman"
    if design == STRATIFIED_NEYMAN:
        sds = setup.stratum_sd
    elif design == STRATIFIED_NEYMAN_PILOT and sds is None:
        method = "proportional"  # before any pilot: a placeholder, replaced in every replicate
    result = allocation.allocate(areas, setup.unit_area_km2, method, total=n_units,
                                 sds=sds if method == "neyman" else None, ids=[st.key for st in strata], fpc=False)
    prepared = tuple(replace(st, n=int(n)) for st, n in zip(strata, result.n))
    labels = tuple(estimation.stratum_label(st.key) for st in strata)
    expansion = None if spec.inside else {lab: st.effective_area / M2_PER_KM2 for lab, st in zip(labels, strata)}
    warnings = () if design == STRATIFIED_NEYMAN_PILOT else tuple(result.warnings)
    return DesignPlan(design, prepared, spec, setup.stratum_codes, labels, dict(zip(labels, areas.tolist())),
                      tuple(int(n) for n in result.n), warnings, expansion)


def pilot_sd(setup, rng):
    """``S_h`` estimated from a pilot of ``setup.pilot_units`` simple random units per stratum.

    The pilot surveys an independent realisation of the surface (a pilot
    season): each pilot unit's count is Poisson with the unit's expected count,
    with the gamma multiplier of every surface cell it covers for negative
    binomial counts, as in :func:`realise_counts`; ``S_h`` is the sample
    standard deviation of the pilot counts (the n − 1 divisor).
    """
    grid, f2, k = setup.grid, float(setup.factor) ** 2, setup.overdispersion
    sds = []
    for st, code in zip(setup.strata.strata, setup.stratum_codes):  # a loop over strata (tens)
        centres = layout.simple_random_centres(st, setup.pilot_units, rng)
        bearings, unit_codes = _bearings(setup.spec, len(centres), rng), np.full(len(centres), code)
        if k > 0:
            cells = unit_cells(centres, bearings, setup.region, grid, setup.factor, unit_codes)
            pair = cells.unit.astype(np.int64) * grid.mu.size + cells.coarse
            uniq, m = np.unique(pair, return_counts=True)
            mu_pair = grid.mu.ravel()[uniq % grid.mu.size] * m / f2 * rng.gamma(k, 1.0 / k, size=uniq.size)
            lam = np.bincount(uniq // grid.mu.size, weights=mu_pair, minlength=len(centres))
        else:
            lam = expected_unit_counts(unit_rows(centres, bearings, setup.region, grid, setup.factor), grid,
                                       len(centres), unit_codes)
        sds.append(float(np.std(rng.poisson(lam), ddof=1)))
    return np.asarray(sds)


# ----------------------------------------------------------------------------
# the replicates
# ----------------------------------------------------------------------------
@dataclass(frozen=True, eq=False)
class ReplicateResults:
    """Per replicate and design: truth, estimate, interval, CV and units counted."""

    truth: np.ndarray
    estimate: np.ndarray
    lower: np.ndarray
    upper: np.ndarray
    cv: np.ndarray
    n: np.ndarray


def _estimate(plan, counts, areas_km2, labels, coords, confidence, variance_method):
    """The estimation engine's overall abundance for one simulated survey (None when it cannot estimate).

    Every unit was surveyed: a unit over the edge counts only its stratum's part (plus sampling), with its
    nominal area, and the counts expand to the plus regions (``plan.expansion``).
    """
    try:
        result = estimation.estimate_density(
            counts, areas_km2, labels, plan.areas, confidence=confidence, ci_method=estimation.CI_T,
            variance_method=variance_method, expansion_areas=plan.expansion,
            coords=coords if variance_method in estimation.LOCAL_METHODS else None,
        )
    except InputError:
        return None
    o = result.overall
    return o.abund, o.abund_lo, o.abund_hi, o.cv, o.n


def simulate_designs(setup, designs, n_units, replicates, rng, confidence=0.95, variance_method=estimation.VARIANCE_SRS,
                     progress=None):
    """Run the replicates for every design at ``n_units`` units.

    Parameters
    ----------
    setup : ComparisonSetup
    designs : sequence of int
        Codes of :data:`DESIGNS`.
    n_units : int
    replicates : int
    rng : numpy.random.Generator
    confidence : float
    variance_method : {"srs", "local", "local_scaled"}
        The estimation engine's variance estimator for the systematic grid and
        the spatially balanced design (Stevens & Olsen 2003, or our scaled
        variant); the other designs use the simple random sampling formula.
    progress : callable, optional
        ``progress(fraction) -> bool``; True cancels.

    Returns
    -------
    (tuple of DesignPlan, ReplicateResults)
        Arrays of shape (replicates, len(designs)); NaN where a design gave no
        estimate. The pilot-based Neyman design's plan carries the mean
        allocation over the replicates.
    """
    designs = [int(d) for d in designs]
    replicates = int(replicates)
    if replicates < 2:
        raise InputError(message(QT_TRANSLATE_NOOP("PlotwiseEngine", "REPLICATES must be at least 2.")))
    plans = tuple(plan_design(setup, d, n_units) for d in designs)
    _check_work(setup, plans)
    shape = (replicates, len(plans))
    truth = np.full(replicates, np.nan)
    est, lo, hi, cv, n = (np.full(shape, np.nan) for _ in range(5))
    pilot_allocations = []
    for r in range(replicates):
        drawn = tuple(plan_design(setup, p.design, n_units, sds=pilot_sd(setup, rng))
                      if p.design == STRATIFIED_NEYMAN_PILOT else p for p in plans)
        pilot_allocations += [p.allocation for p in drawn if p.design == STRATIFIED_NEYMAN_PILOT]
        truth[r], rows = _replicate(setup, drawn, rng, confidence, variance_method)
        for j, out in rows.items():
            est[r, j], lo[r, j], hi[r, j], cv[r, j], n[r, j] = out
        if progress is not None and progress((r + 1) / replicates):
            raise Cancelled("Cancelled while simulating surveys.")
    if pilot_allocations:
        mean_allocation = tuple(int(round(v)) for v in np.mean(pilot_allocations, axis=0))
        plans = tuple(replace(p, allocation=mean_allocation) if p.design == STRATIFIED_NEYMAN_PILOT else p
                      for p in plans)
    return plans, ReplicateResults(truth, est, lo, hi, cv, n)


def _check_work(setup, plans):
    units = sum(sum(plan.allocation) for plan in plans)
    cells = units * setup.region.area / (setup.grid.cell_area / setup.factor ** 2)
    if cells > MAX_CELLS_PER_REPLICATE:
        raise InputError(message(
            QT_TRANSLATE_NOOP("PlotwiseEngine",
                "Each simulated survey would count about {millions:.0f} million surface cells ({units} units of "
                "{unit_area:,.0f} m² on {cell_width:g} m cells), too many to simulate. Resample "
                "the surface to coarser cells, or compare fewer designs or units."),
            millions=cells / 1e6, units=units, unit_area=setup.region.area, cell_width=setup.grid.cell_width))


def _replicate(setup, plans, rng, confidence, variance_method):
    """One population and every design's survey of it: the realised total and ``{design index: estimate}``."""
    centres, bearings, codes, owners, labels = [], [], [], [], []
    for j, plan in enumerate(plans):
        drawn = layout.draw_layout(plan.prepared, plan.spec, rng)
        per = [s.n_primary + s.n_reserve for s in drawn.strata]
        centres.append(drawn.centres)
        bearings.append(drawn.bearing)
        codes.append(np.repeat(plan.codes, per))
        labels.append(np.repeat(np.asarray(plan.labels, dtype=object), per))
        owners.append(np.full(len(drawn.centres), j))
    all_centres = np.concatenate(centres)
    realised = realise_survey(all_centres, np.concatenate(bearings), np.concatenate(codes), setup, rng)
    owner = np.concatenate(owners)
    local = {SYSTEMATIC_GRID, SPATIALLY_BALANCED}
    rows = {}
    for j, plan in enumerate(plans):
        mine = owner == j
        if not mine.any():
            continue
        method = variance_method if plan.design in local else estimation.VARIANCE_SRS
        out = _estimate(plan, realised.counts[mine], np.full(int(mine.sum()), setup.unit_area_km2), labels[j],
                        all_centres[mine], confidence, method)
        if out is not None:
            rows[j] = out
    return realised.total, rows


# ----------------------------------------------------------------------------
# performance
# ----------------------------------------------------------------------------
@dataclass(frozen=True)
class DesignPerformance:
    """How one design did over the replicates (see the module docstring)."""

    design: int
    name: str
    n_asked: int
    allocation: tuple
    replicates: int
    failed: int
    mean_n: float
    mean_true: float
    mean_estimate: float
    rel_bias: float
    emp_se: float
    rmse: float
    rmse_mc_se: float
    rel_rmse: float
    mean_cv: float
    coverage: float
    error_m3: float = float("nan")
    """Third central moment of the errors ``mean((e − ē)³)``, for the skewness-corrected bias test."""


def design_performance(truth, estimate, lower, upper, cv, n):
    """Relative bias, empirical SE, RMSE (and its Monte Carlo SE), mean CV, coverage and mean n.

    Replicates without an estimate (NaN) are left out and counted as failed.
    Formulas of Morris, White & Crowther (2019), table 6, with the error
    ``N̂_r − N_r`` about each replicate's realised total.

    Returns
    -------
    dict
    """
    truth = np.asarray(truth, dtype=float)
    estimate = np.asarray(estimate, dtype=float)
    ok = np.isfinite(estimate) & np.isfinite(truth)
    m = int(ok.sum())
    out = {"replicates": m, "failed": int(truth.size - m)}
    nan = float("nan")
    if m == 0:
        out.update(mean_n=nan, mean_true=nan, mean_estimate=nan, rel_bias=nan, emp_se=nan, rmse=nan,
                   rmse_mc_se=nan, rel_rmse=nan, mean_cv=nan, coverage=nan, error_m3=nan)
        return out
    t, e = truth[ok], estimate[ok]
    err = e - t
    sq = err * err
    rmse = float(math.sqrt(sq.mean()))
    covered = (np.asarray(lower)[ok] <= t) & (t <= np.asarray(upper)[ok])
    cvs = np.asarray(cv, dtype=float)[ok]
    out.update(
        mean_n=float(np.mean(np.asarray(n, dtype=float)[ok])),
        mean_true=float(t.mean()),
        mean_estimate=float(e.mean()),
        rel_bias=float(err.sum() / t.sum()) if t.sum() > 0 else nan,
        emp_se=float(err.std(ddof=1)) if m > 1 else nan,
        rmse=rmse,
        rmse_mc_se=float(sq.std(ddof=1) / (2.0 * rmse * math.sqrt(m))) if m > 1 and rmse > 0 else nan,
        rel_rmse=rmse / float(t.mean()) if t.mean() > 0 else nan,
        mean_cv=float(np.nanmean(cvs)) if np.isfinite(cvs).any() else nan,
        coverage=float(covered.mean()),
        error_m3=float(np.mean((err - err.mean()) ** 3)),
    )
    return out


@dataclass(frozen=True, eq=False)
class Comparison:
    """The designs compared at one number of units.

    Attributes
    ----------
    n_units : int
    performance : tuple of DesignPerformance
        In the order of the designs asked for.
    recommended : int or None
        Code of the recommended design (see :func:`recommend_design`).
    near_best : tuple of int
        Designs whose RMSE is within two Monte Carlo SEs of the recommended one.
    results : ReplicateResults
    plans : tuple of DesignPlan
    warnings : tuple of str
    """

    n_units: int
    performance: tuple
    recommended: object
    near_best: tuple
    results: ReplicateResults
    plans: tuple
    warnings: tuple = ()

    def by_design(self, design):
        for p in self.performance:
            if p.design == design:
                return p
        raise KeyError(design)


def recommend_design(performance, min_coverage=ACCEPTABLE_COVERAGE):
    """The design with the lowest RMSE among those whose intervals cover at least ``min_coverage``.

    When no design reaches that coverage, the lowest RMSE overall. Designs
    whose RMSE lies within two Monte Carlo standard errors of the chosen one
    (``|ΔRMSE| ≤ 2 √(se_1² + se_2²)``) are returned as about as good.

    Returns
    -------
    (int or None, tuple of int)
    """
    usable = [p for p in performance if np.isfinite(p.rmse)]
    if not usable:
        return None, ()
    good = [p for p in usable if np.isfinite(p.coverage) and p.coverage >= min_coverage] or usable
    best = min(good, key=lambda p: p.rmse)
    near = []
    for p in good:
        if p.design == best.design:
            continue
        se = math.sqrt(np.nan_to_num(best.rmse_mc_se) ** 2 + np.nan_to_num(p.rmse_mc_se) ** 2)
        if p.rmse - best.rmse <= 2.0 * se:
            near.append(p.design)
    return best.design, tuple(near)


def bias_standard_error(performance):
    """Monte Carlo standard error of the relative bias, ``emp_se / (√R · mean true total)``.

    The relative bias is the mean error over the mean true total; the mean of R
    errors has the standard error ``emp_se / √R`` (Morris, White & Crowther 2019,
    table 6).
    """
    p = performance
    if p.replicates < 2 or not (np.isfinite(p.emp_se) and p.mean_true > 0):
        return float("nan")
    return p.emp_se / (math.sqrt(p.replicates) * p.mean_true)


@functools.lru_cache(maxsize=256)
def bias_critical_value(replicates, n_tests=1, level=BIAS_TEST_LEVEL):
    """Critical |t| of the bias test: Student's t with ``R − 1`` df at ``1 − level / (2 n_tests)``.

    A two-sided one-sample t test of "mean error = 0" for each of ``n_tests``
    designs, with the Bonferroni correction, so that with every design unbiased
    the warning fires in at most about ``level`` of the comparisons. With few
    replicates the t quantile is large: a bias must then be large to count.
    """
    from scipy.stats import t

    replicates, n_tests = int(replicates), max(int(n_tests), 1)
    if replicates < 2:
        return float("nan")
    return float(t.ppf(1.0 - level / (2.0 * n_tests), replicates - 1))


def bias_noise(performance, n_tests=1, level=BIAS_TEST_LEVEL):
    """The relative bias that noise alone stays within: critical value × Monte Carlo SE.

    See :func:`bias_standard_error` and :func:`bias_critical_value`; ``n_tests``
    is the number of designs tested together.
    """
    return bias_critical_value(performance.replicates, n_tests, level) * bias_standard_error(performance)


def bias_test_statistics(performance):
    """Student's t of the mean error, and the same corrected for the errors' skewness.

    With the R errors' mean ``ē``, standard deviation ``s``, third central
    moment ``μ₃`` and skewness ``γ = μ₃ / s³``, and ``x = ē / s``:
    ``t = √R x`` and ``t₁ = √R (x + γ x² / 3 + γ² x³ / 27 + γ / (6 R))``, Johnson's
    (1978) skewness-corrected t made monotone in ``x`` by Hall's (1992) cubic term
    (Johnson, N. J., JASA 73:536–544; Hall, P., JRSS B 54:221–228). The errors of
    a survey of few animals are skewed, and then ``t`` alone rejects more often
    than its level on one side; ``t₁`` corrects that. NaN when undefined.
    """
    p = performance
    nan = float("nan")
    if p.replicates < 2 or not (np.isfinite(p.emp_se) and p.emp_se > 0 and np.isfinite(p.rel_bias)):
        return nan, nan
    root = math.sqrt(p.replicates)
    x = p.rel_bias * p.mean_true / p.emp_se  # Σ err / Σ N = ē / mean N, so ē = rel_bias · mean N
    if not np.isfinite(p.error_m3):
        return root * x, nan
    gamma = p.error_m3 / p.emp_se ** 3
    return root * x, root * (x + gamma * x * x / 3.0 + gamma * gamma * x ** 3 / 27.0 + gamma / (6.0 * p.replicates))


def bias_warnings(performance, n_units, level=BIAS_TEST_LEVEL, inside=False):
    """Warnings for the designs whose relative bias is both notable and beyond the simulation's noise.

    A design is flagged when ``|rel_bias| > NOTABLE_BIAS`` and both Student's t
    and the skewness-corrected t of its mean error (:func:`bias_test_statistics`)
    pass the critical value of :func:`bias_critical_value` on the same side
    (Bonferroni over the designs with a bias). Requiring both keeps the chance
    that unbiased designs raise it at or below ``level`` per comparison, for
    skewed errors too and whatever the number of replicates. ``inside``: the
    units were kept inside (the likely cause is then the unsampled edge band).
    """
    tested = [p for p in performance if np.isfinite(bias_standard_error(p)) and np.isfinite(p.rel_bias)]
    warnings = []
    for p in tested:
        critical = bias_critical_value(p.replicates, len(tested), level)
        t, t1 = bias_test_statistics(p)
        beyond = abs(t) > critical and (not np.isfinite(t1) or (abs(t1) > critical and t * t1 > 0))
        if abs(p.rel_bias) > NOTABLE_BIAS and beyond:
            values = dict(design=message(DESIGNS[p.design]), n_units=n_units, bias=p.rel_bias,
                          noise=critical * bias_standard_error(p), replicates=p.replicates, level=level,
                          tests=len(tested))
            warnings.append(message(
                QT_TRANSLATE_NOOP("PlotwiseEngine",
                    "{design} at {n_units} units: relative bias {bias:+.1%}, beyond the simulation's noise "
                    "(±{noise:.1%} with {replicates} simulated surveys; tested at the {level:.0%} level across {tests} "
                    "design(s)). A likely cause: units kept inside never reach the edge of the frame or of their "
                    "stratum, so the edge band weighs less in the estimate; where its density differs from the "
                    "interior, the estimate is biased. Plus sampling (INSIDE off) removes this bias.")
                if inside else
                QT_TRANSLATE_NOOP("PlotwiseEngine",
                    "{design} at {n_units} units: relative bias {bias:+.1%}, beyond the simulation's noise "
                    "(±{noise:.1%} with {replicates} simulated surveys; tested at the {level:.0%} level across {tests} "
                    "design(s)). Plus sampling is unbiased, so the likely cause is the ratio estimator with very few "
                    "animals per unit, or a systematic grid whose realised number of units varies with the surface; "
                    "more units reduce it."), **values))
    return warnings


def compare_designs(setup, designs, n_units, replicates, rng, confidence=0.95, variance_method=estimation.VARIANCE_SRS,
                    progress=None):
    """Simulate every design at ``n_units`` units and summarise how each did.

    Returns
    -------
    Comparison
    """
    plans, results = simulate_designs(setup, designs, n_units, replicates, rng, confidence, variance_method, progress)
    performance = []
    warnings = []
    for j, plan in enumerate(plans):
        stats = design_performance(results.truth, results.estimate[:, j], results.lower[:, j], results.upper[:, j],
                                   results.cv[:, j], results.n[:, j])
        performance.append(DesignPerformance(plan.design, DESIGNS[plan.design], int(n_units), plan.allocation,
                                             **stats))
        design_name = message(DESIGNS[plan.design])
        warnings.extend(message(QT_TRANSLATE_NOOP("PlotwiseEngine", "{design}: {warning}"), design=design_name,
                                warning=w) for w in plan.warnings)
        if stats["failed"]:
            warnings.append(message(
                QT_TRANSLATE_NOOP("PlotwiseEngine",
                    "{design} at {n_units} units: {failed} of {replicates} simulated surveys "
                    "gave no estimate (a stratum without a counted unit, or no unit in the frame); they are left out "
                    "of its figures."), design=design_name, n_units=n_units, failed=stats["failed"],
                replicates=replicates))
    warnings.extend(bias_warnings(performance, n_units, inside=setup.spec.inside))
    recommended, near = recommend_design(performance)
    return Comparison(int(n_units), tuple(performance), recommended, near, results, plans, tuple(warnings))


def parse_unit_range(text):
    """Numbers of units from text such as ``"20, 40, 80"`` or ``"20:100:20"`` (start:stop:step, stop included).

    Returns
    -------
    tuple of int
        Sorted, without repeats; empty for empty text.
    """
    text = (text or "").strip()
    if not text:
        return ()
    values = []
    backwards = None
    try:
        for part in text.replace(";", ",").split(","):
            part = part.strip()
            if not part:
                continue
            if ":" in part:
                bits = [int(float(b)) for b in part.split(":")]
                if len(bits) != 3 or bits[2] <= 0:
                    raise ValueError(part)
                if bits[0] > bits[1]:
                    backwards = (part, bits[0], bits[1], bits[2])
                    break
                values.extend(range(bits[0], bits[1] + 1, bits[2]))
            else:
                values.append(int(float(part)))
    except ValueError:
        raise InputError(message(
            QT_TRANSLATE_NOOP("PlotwiseEngine",
                "The range of units '{text}' cannot be read. Give whole numbers separated by commas "
                "(e.g. 20, 40, 80) or start:stop:step (e.g. 20:100:20)."), text=text
        )) from None
    if backwards is not None:
        part, start, stop, step = backwards
        raise InputError(message(
            QT_TRANSLATE_NOOP("PlotwiseEngine",
                "In the range of units '{text}', '{part}' starts above where it stops (start {start}, stop {stop}), "
                "so it holds no number of units. Write start:stop:step with the start at or below the stop (e.g. "
                "{stop}:{start}:{step})."), text=text, part=part, start=start, stop=stop, step=step))
    if any(v < layout.MIN_PER_STRATUM for v in values):
        raise InputError(message(QT_TRANSLATE_NOOP("PlotwiseEngine",
            "Every number of units in the range must be at least {minimum}."),
                                 minimum=layout.MIN_PER_STRATUM))
    if len(set(values)) > 20:
        raise InputError(message(QT_TRANSLATE_NOOP("PlotwiseEngine",
            "The range of units holds more than 20 values; give at most 20.")))
    return tuple(sorted(set(values)))
