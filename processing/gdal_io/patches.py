"""Patches of the stratum raster below the minimum area: GDAL's speck sieve, then the patch-graph merge."""
from dataclasses import dataclass, replace
import math

import numpy as np
from osgeo import gdal

from ..engine import stratification as strat
from ..engine.errors import QT_TRANSLATE_NOOP, Cancelled, InputError, message
from .covariate_stack import BLOCK_CELLS
from .grids import GdalProgress, Grid
from .runs import StripRuns, run_links
from .stratum_raster import StratumRaster

#: MIN_AREA (ha) offered by the algorithm (our choice): a patch of a stratum should hold a few sample units with
#: room between them (four 20 m x 20 m plots 50 m apart fill about 1 ha); smaller patches are noise of the
#: covariate, not zones a team can survey
DEFAULT_MIN_AREA_HA = 1.0
#: most patches turned into polygons (our choice): GDAL's polygonize holds every open patch in memory (about
#: 0.4 GB for 250,000 ragged patches on 10^8 cells, tests/benchmarks/bench_stratify.py), and a field map with
#: more patches than this is speckle, not strata
MAX_POLYGON_PATCHES = 100_000
#: most patches given to the patch-graph merge, which runs in Python (about 2 kB and 0.1 ms each: 0.1 GB and
#: a few seconds at most); beyond, the sieve rule takes doubling thresholds first
MAX_GRAPH_PATCHES = 50_000
#: most runs (of equal ids along the rows) read into memory to find the patches (about 100 bytes each at peak);
#: a raster with more has its specks sieved by GDAL in place first
MAX_GRAPH_RUNS = 3_000_000
#: most patches given to GDAL's sieve on the whole raster (GDAL 3.6 needs about 35 bytes per patch: 2.1 GB for
#: the 6 x 10^7 patches of 10^8 cells of noise in 5 strata; 0.2 GB at this limit)
MAX_SIEVE_PATCHES = 5_000_000
#: cells per strip when the stratum raster is read by full rows (4 MB of ids; about 0.2 GB of work arrays on noise)
STRIP_CELLS = 1 << 22


def sieve_cells(min_area_ha, cell_area_m2):
    """Patch size in cells below which a patch is merged: ceil(MIN_AREA × 10,000 / cell area)."""
    if not min_area_ha or min_area_ha <= 0:
        return 0
    return int(math.ceil(min_area_ha * 10000.0 / cell_area_m2 - 1e-9))


#: patches below this many cells are specks, joined to their largest neighbour before the patch-graph merge
SPECK_CELLS = 8


def _speck_steps(min_cells):
    return [t for t in (2, 4, 8) if t <= min(int(min_cells), SPECK_CELLS)]


def speck_cells(min_cells):
    """Patches below this many cells are specks for :func:`sieve_strata` (0: none)."""
    steps = _speck_steps(min_cells)
    return steps[-1] if steps else 0


def sieve_strata(path, min_cells, progress=None):
    """Merge specks into their largest neighbour (GDAL's sieve filter, 4-connected).

    Specks are patches of fewer than :func:`speck_cells` cells. The
    threshold grows (2, 4, 8), so that clusters of specks merge step by step.
    Used on rasters with more runs than :data:`MAX_GRAPH_RUNS` (a speckled
    covariate): GDAL works in place, in memory that grows with the patches
    only, and after it at most one patch in :data:`SPECK_CELLS` cells is left
    for :func:`merge_raster_patches`, which brings every patch up to ``min_cells``.
    The sieve stops at :data:`SPECK_CELLS`: GDAL merges a small patch only
    when its chain of largest neighbours reaches a big patch, and with larger
    thresholds a few big patches swallow a whole mosaic of small ones, strata
    and all.

    Cells with id 0 (outside the frame or NoData) are never changed and never
    absorb a patch.
    """
    gdal_sieve(path, _speck_steps(min_cells), progress)


def gdal_sieve(path, thresholds, progress=None):
    """GDAL's sieve filter (4-connected) on the stratum raster, in place, once per threshold in turn."""
    if not thresholds:
        return
    ds = gdal.Open(path, gdal.GA_Update)
    band = ds.GetRasterBand(1)
    n = len(thresholds)
    try:
        for i, t in enumerate(thresholds):
            cb = GdalProgress(strat.scaled_progress(progress, i / n, (i + 1) / n))
            try:
                gdal.SieveFilter(band, band, band, int(t), 4, callback=cb)
            except RuntimeError:
                cb.check()
                raise
            cb.check()
    finally:
        band.FlushCache()
        band = ds = None


def _strip_rows(width, tile_rows=256):
    """Rows per strip: about :data:`STRIP_CELLS` cells, whole tiles of the stratum raster."""
    rows = max(1, STRIP_CELLS // max(1, width))
    return max(tile_rows, rows // tile_rows * tile_rows)


def _row_runs(ids):
    """Runs of equal ids along each row: a flag on each run's first cell, and each cell's run (0-based)."""
    start = np.empty(ids.shape, bool)
    start[:, 0] = True
    np.not_equal(ids[:, 1:], ids[:, :-1], out=start[:, 1:])
    return start, np.cumsum(start.ravel(), dtype=np.int64).reshape(ids.shape) - 1


def _run_links(upper, lower, upper_start, lower_start):
    """Cells that join the run above to the run below: equal stratum ids (not 0) where either run starts.

    Two runs of neighbouring rows that overlap share the column where the later
    of the two starts, so one cell per pair of runs is enough.
    """
    return (upper == lower) & (lower > 0) & (upper_start | lower_start)


@dataclass
class _Frontier:
    """Patches still open at the last row read: each cell's patch (0..open-1, -1 for id 0), ids, run starts."""

    patch: np.ndarray
    ids: np.ndarray
    start: np.ndarray

    @property
    def open(self):
        return int(self.patch.max()) + 1 if self.patch.size else 0


def _count_strip(ids, frontier):
    """Patches of a strip closed before its last row, and the frontier at that row.

    Nodes: the frontier's open patches, then the strip's runs; edges: the run
    links inside the strip and across the seam with the row above. Connected
    components (scipy.sparse.csgraph) are the patches.
    """
    from scipy.sparse import coo_matrix
    from scipy.sparse.csgraph import connected_components

    start, run = _row_runs(ids)
    m = frontier.open if frontier is not None else 0
    inner = _run_links(ids[:-1], ids[1:], start[:-1], start[1:])
    a, b = [run[:-1][inner]], [run[1:][inner]]
    if frontier is not None:
        seam = _run_links(frontier.ids, ids[0], frontier.start, start[0])
        a.append(frontier.patch[seam] - m)  # frontier nodes come first: shift back below
        b.append(run[0][seam])
    a = np.concatenate(a) + m
    b = np.concatenate(b) + m
    n = m + int(run[-1, -1]) + 1
    _, comp = connected_components(coo_matrix((np.ones(a.size, np.int8), (a, b)), shape=(n, n)), directed=False)
    run_ids = ids.ravel()[start.ravel()]
    valid = np.concatenate([np.ones(m, bool), run_ids > 0])
    patches = np.unique(comp[valid])
    last = ids[-1] > 0
    still_open = np.unique(comp[m + run[-1][last]])
    patch = np.full(ids.shape[1], -1, np.int64)
    patch[last] = np.searchsorted(still_open, comp[m + run[-1][last]])
    return patches.size - still_open.size, _Frontier(patch, ids[-1].copy(), start[-1].copy()), n - m


def count_patches(path, progress=None):
    """Number of patches of a stratum raster (:func:`count_patches_and_runs`)."""
    return count_patches_and_runs(path, progress)[0]


def count_patches_and_runs(path, progress=None):
    """Patches (4-connected groups of cells of one stratum, id > 0) and runs (of equal ids along rows) of a raster.

    One pass by strips of full rows, in memory bounded by the strip: runs of
    equal ids along the rows are the nodes, runs of neighbouring rows that
    share a cell edge are joined (connected components, scipy.sparse.csgraph),
    and only the patches still open at a strip's last row are carried on.
    """
    ds = gdal.Open(path)
    band = ds.GetRasterBand(1)
    width, height = band.XSize, band.YSize
    rows = _strip_rows(width, band.GetBlockSize()[1])
    closed, frontier, runs = 0, None, 0
    n = -(-height // rows)
    for i, y0 in enumerate(range(0, height, rows)):
        ids = band.ReadAsArray(0, y0, width, min(rows, height - y0))
        band.FlushCache()  # GDAL's cache would keep every strip read
        done, frontier, strip_runs = _count_strip(ids, frontier)
        closed += done
        runs += strip_runs
        if progress is not None and progress((i + 1) / n):
            raise Cancelled("Stratification cancelled.")
    band = ds = None
    return closed + (frontier.open if frontier is not None else 0), runs


def nice_area_above(area_ha):
    """The smallest of 1, 2, 5 x 10^k ha at or above ``area_ha`` (a MIN_AREA to suggest)."""
    if area_ha <= 0:
        return 0.0
    k = math.floor(math.log10(area_ha))
    for step in (1, 2, 5, 10):
        value = step * 10.0 ** k
        if value >= area_ha * (1 - 1e-12):
            return float(f"{value:.12g}")
    return 10.0 ** (k + 1)


def too_many_patches(n_patches, stratified_ha, min_area_ha, limit=None):
    """The error for strata that form more than ``limit`` patches, with the MIN_AREA that brings them under it.

    Every patch reaches MIN_AREA after merging (but for the few that touch no
    other stratum), so at most ``stratified area / MIN_AREA`` patches remain:
    a MIN_AREA of ``stratified area / limit`` or more brings them under the limit.
    """
    limit = MAX_POLYGON_PATCHES if limit is None else limit
    suggested = nice_area_above(max(stratified_ha / limit, min_area_ha * 2 if min_area_ha > 0 else 0.0))
    return InputError(message(
        QT_TRANSLATE_NOOP("PlotwiseEngine",
            "The strata form {n:,} patches (4-connected groups of cells of one stratum), more than the {limit:,} "
        "that can be turned into polygons: the covariate is speckled at the scale of its cells. Set MIN_AREA to "
        "{suggested:g} ha or more (it is {min_area:g} ha): patches below it join a neighbouring stratum, which "
        "leaves at most {limit:,} patches on the {area:,.0f} ha stratified. Smoothing the covariate first also "
        "helps."), n=int(n_patches), limit=int(limit), suggested=suggested, min_area=float(min_area_ha),
        area=float(stratified_ha)))


def too_speckled(n_patches, min_area_ha, limit=None):
    """The error for strata with more patches than the merge below MIN_AREA can take in bounded memory."""
    limit = MAX_SIEVE_PATCHES if limit is None else limit
    return InputError(message(
        QT_TRANSLATE_NOOP("PlotwiseEngine",
            "The strata form {n:,} patches (4-connected groups of cells of one stratum), more than the {limit:,} "
        "that can be merged below MIN_AREA in bounded memory: the covariate is speckled at the scale of its "
        "cells. Smooth or coarsen it first (for example, resample it with the average to cells of about {cell:g} "
        "m, so that one cell covers MIN_AREA), then run the stratification again."),
        n=int(n_patches), limit=int(limit), cell=round(math.sqrt(max(min_area_ha, 0.01) * 10000.0))))


@dataclass(frozen=True)
class PatchCheck:
    """Patches of the stratum raster after the merge below the minimum area.

    Attributes
    ----------
    merged : int
        Patches that the patch-graph merge moved to another stratum.
    left, left_cells : int
        Patches (and their cells) still below the minimum: they touch no other stratum.
    patches : int
        Patches of the raster after merging (-1: not counted).
    sieved_to : int
        Largest threshold of the sieve rule beyond the specks, used when the patches
        were too many for the patch-graph merge (0: specks only).
    """

    merged: int
    left: int
    left_cells: int
    patches: int = -1
    sieved_to: int = 0
    moves: strat.CellMoves = None
    """The runs of cells the merge moved to another stratum (None when GDAL's sieve changed the raster too)."""


def enforce_min_area(path, min_cells, min_area_ha=0.0, block_cells=BLOCK_CELLS, progress=None, runs_at_most=None,
                     out_path=None):
    """Bring every patch of the stratum raster up to ``min_cells``, in bounded memory and time.

    Steps: count the patches and runs (:func:`count_patches_and_runs`); with more
    than :data:`MAX_SIEVE_PATCHES` patches an :class:`InputError`; with more than
    :data:`MAX_GRAPH_RUNS` runs, GDAL's speck sieve in place first
    (:func:`sieve_strata`); then :func:`merge_raster_patches`. With
    ``min_cells`` <= 1 it only counts. ``runs_at_most`` (an upper bound on the
    runs, from writing the raster) skips the count when it is within both
    limits: there are no more patches than runs of ids above 0. With
    ``out_path`` the merged raster is written there (``path`` is then a
    provisional raster, which the speck sieve may change).
    """
    if min_cells > 1 and runs_at_most is not None and runs_at_most <= min(MAX_GRAPH_RUNS, MAX_SIEVE_PATCHES):
        return merge_raster_patches(path, min_cells, block_cells, progress, out_path)
    counted, runs = count_patches_and_runs(path, strat.scaled_progress(progress, 0, 0.15))
    if min_cells <= 1:
        return PatchCheck(0, 0, 0, counted)
    if counted > MAX_SIEVE_PATCHES:
        raise too_speckled(counted, min_area_ha)
    if runs > MAX_GRAPH_RUNS:
        sieve_strata(path, min_cells, strat.scaled_progress(progress, 0.15, 0.4))
        return replace(merge_raster_patches(path, min_cells, block_cells, strat.scaled_progress(progress, 0.4, 1.0),
                                            out_path), moves=None)
    return merge_raster_patches(path, min_cells, block_cells, strat.scaled_progress(progress, 0.4, 1.0), out_path)


def _pair_codes(a, b):
    """Codes of unordered label pairs (labels below 2³¹): min · 2³² + max."""
    return (np.minimum(a, b) << 32) | np.maximum(a, b)


def merge_raster_patches(path, min_cells, block_cells=BLOCK_CELLS, progress=None, out_path=None):
    """Merge the patches below ``min_cells``: specks by the sieve rule, then the patch-graph merge.

    Two passes over the stratum raster by strips of full rows. The first finds
    the runs of equal ids along the rows, joins the runs of neighbouring rows
    that share a cell edge into 4-connected patches (scipy.sparse.csgraph),
    counts every patch's cells and the cell edges neighbouring patches share,
    and numbers the patches by their first cell in reading order, so the result
    does not depend on the strips. On that graph, specks (below
    :func:`speck_cells`) join their largest neighbour
    (:func:`~..engine.stratification.sieve_patch_graph`, thresholds 2, 4, 8);
    while more than :data:`MAX_GRAPH_PATCHES` patches are left, the threshold
    doubles up to ``min_cells`` (``sieved_to`` in the result); then the
    patch-graph merge (:func:`~..engine.stratification.merge_patch_graph`) takes
    the rest. The second pass rewrites the strips whose runs changed stratum,
    in place, or writes every strip to a fresh raster at ``out_path`` (GDAL
    rewrites compressed tiles in place several times slower than it writes new
    ones). Memory grows with the number of runs, not with the raster.
    (``block_cells`` is kept for callers; the strips follow :data:`STRIP_CELLS`.)

    Returns
    -------
    PatchCheck
    """
    if min_cells <= 1:
        return PatchCheck(0, 0, 0)
    ds = gdal.Open(path, gdal.GA_Update if out_path is None else gdal.GA_ReadOnly)
    band = ds.GetRasterBand(1)
    out = None if out_path is None else StratumRaster(out_path, Grid(ds.GetGeoTransform(), ds.RasterXSize,
                                                                     ds.RasterYSize, ds.GetProjection()))
    try:
        graph = _run_graph(band, strat.scaled_progress(progress, 0, 0.6))
        if graph.lengths.size == 0 or not np.any(graph.values):
            _rewrite_runs(band, graph, graph.values, out=out)
            return PatchCheck(0, 0, 0, 0)
        patch, patch_sizes, patch_strata = _number_patches(graph)
        pair_codes, shared = np.unique(_pair_codes(patch[graph.codes >> 32], patch[graph.codes & 0xFFFFFFFF]),
                                       return_counts=True)
        shared = shared.astype(np.int64)
        pairs = np.column_stack([pair_codes >> 32, pair_codes & 0xFFFFFFFF])
        groups, sieved_to = _sieve_groups(patch_sizes, patch_strata, pairs, shared, int(min_cells))
        if groups.n_patches > MAX_GRAPH_PATCHES:
            final, check = groups.strata, PatchCheck(0, 0, 0, groups.n_patches, sieved_to)
        else:
            merge = strat.merge_patch_graph(groups.sizes, groups.strata, groups.pairs, groups.shared, min_cells)
            final = merge.strata
            check = PatchCheck(merge.merged, int(merge.left.size), int(merge.left_cells.sum()), merge.patches,
                               sieved_to)
        run_strata = final[groups.group[patch]].astype(np.uint8)
        moves = _rewrite_runs(band, graph, run_strata, strat.scaled_progress(progress, 0.6, 1), out)
        return replace(check, moves=moves)
    finally:
        if out is not None:
            out.close()
        band.FlushCache()
        band = ds = None


def _sieve_groups(sizes, strata, pairs, shared, min_cells):
    """Specks joined to their largest neighbour (2, 4, 8 cells), then doubling thresholds while too many are left.

    Returns ``(groups, sieved_to)``: the largest threshold used beyond the specks (0 when none was needed).
    """
    groups = strat.PatchGroups(np.arange(sizes.size), sizes, strata, pairs, shared)
    for threshold in _speck_steps(min_cells):
        groups = _resieve(groups, threshold)
    threshold, sieved_to = speck_cells(min_cells), 0
    while groups.n_patches > MAX_GRAPH_PATCHES and threshold < min_cells:
        threshold = min(2 * threshold, min_cells)
        groups = _resieve(groups, threshold)
        sieved_to = threshold
    return groups, sieved_to


def _resieve(groups, threshold):
    """:func:`~..engine.stratification.sieve_patch_graph` on groups, composed with their groups so far."""
    again = strat.sieve_patch_graph(groups.sizes, groups.strata, groups.pairs, groups.shared, threshold)
    return strat.PatchGroups(again.group[groups.group], again.sizes, again.strata, again.pairs, again.shared)


@dataclass(frozen=True)
class _RunGraph:
    """Runs of the whole stratum raster (numbered in reading order) and how they touch.

    ``strips`` are the (first row, rows, runs) read; per run: ``lengths``, ``values``
    (stratum id) and ``first`` (flat index of its first cell in the raster);
    ``link_a``/``link_b`` pair runs of one stratum that share a cell edge;
    ``codes`` holds, per cell edge between two strata, the pair of runs on its
    sides (:func:`_pair_codes`).
    """

    strips: list
    lengths: np.ndarray
    values: np.ndarray
    first: np.ndarray
    link_a: np.ndarray
    link_b: np.ndarray
    codes: np.ndarray


def _neighbour_runs(ids, runs, prev, prev_runs):
    """Pairs of runs of two strata (both not 0) sharing a cell edge: along the rows, down the strip, at its seam."""
    width = ids.shape[1]
    values = ids.ravel()[runs.first]
    k = np.flatnonzero((values[:-1] > 0) & (values[1:] > 0) & (runs.first[1:] % width != 0))
    a, b = [k + runs.offset], [k + 1 + runs.offset]
    down = np.flatnonzero(ids[:-1] != ids[1:])  # few cells: the tests for id 0 on those alone
    flat_ids = ids.ravel()
    down = down[(flat_ids[down] > 0) & (flat_ids[down + width] > 0)]
    a.append(runs.run_of(down))
    b.append(runs.run_of(down + width))
    if prev is not None:
        seam = np.flatnonzero((prev[0] != ids[0]) & (prev[0] > 0) & (ids[0] > 0))
        a.append(prev_runs.last_row(0, seam))
        b.append(runs.run_at(0, seam))
    return _pair_codes(np.concatenate(a), np.concatenate(b))


def _run_graph(band, progress=None):
    """Pass 1 of :func:`merge_raster_patches`: the runs of every strip, their links and neighbours."""
    width, height = band.XSize, band.YSize
    rows = _strip_rows(width, band.GetBlockSize()[1])
    strips = []
    lengths, values, first, link_a, link_b, neighbours = [], [], [], [], [], []
    offset = 0
    prev = prev_runs = None
    n_strips = -(-height // rows)
    for i, y0 in enumerate(range(0, height, rows)):
        ids = band.ReadAsArray(0, y0, width, min(rows, height - y0))
        band.FlushCache()  # GDAL's cache would keep every strip read
        runs = StripRuns(ids, offset)
        strips.append((y0, ids.shape[0], runs.count))
        lengths.append(np.diff(np.append(runs.first, ids.size)))
        values.append(ids.ravel()[runs.first])
        first.append(runs.first + y0 * width)
        a, b = run_links(ids, runs)
        link_a.append(a)
        link_b.append(b)
        if prev is not None:
            seam = np.flatnonzero((prev[0] == ids[0]) & (ids[0] > 0) & (prev_runs.start[-1] | runs.start[0]))
            link_a.append(prev_runs.last_row(0, seam))
            link_b.append(runs.run_at(0, seam))
        neighbours.append(_neighbour_runs(ids, runs, prev, prev_runs))
        prev, prev_runs = ids[-1:].copy(), runs
        offset += runs.count
        if progress is not None and progress((i + 1) / n_strips):
            raise Cancelled("Stratification cancelled.")
    empty = np.zeros(0, np.int64)

    def joined(parts, dtype=np.int64):
        return np.concatenate(parts).astype(dtype, copy=False) if parts else empty.astype(dtype)

    return _RunGraph(strips, joined(lengths), joined(values, np.uint8), joined(first), joined(link_a),
                     joined(link_b), joined(neighbours))


def _number_patches(graph):
    """Runs joined into patches 1..n (scipy.sparse.csgraph), numbered by their first cell in reading order.

    Returns ``(patch of each run, cells per patch, stratum per patch)``; index 0 of the last two is "no
    patch" (the runs of id 0 are left out). Numbering by the first cell makes the result independent of
    the strips.
    """
    from scipy.sparse import coo_matrix
    from scipy.sparse.csgraph import connected_components

    n = graph.lengths.size
    matrix = coo_matrix((np.ones(graph.link_a.size, np.int8), (graph.link_a, graph.link_b)), shape=(n, n))
    n_comp, comp = connected_components(matrix, directed=False)
    inside = graph.values > 0
    peak = np.maximum.accumulate(comp)
    if peak[0] == 0 and peak[-1] == n_comp - 1 and not np.any(np.diff(peak) > 1):
        # components numbered in the order of their first run, hence of their first cell (scipy numbers them
        # so): the patches keep that order, without a sort
        is_patch = np.zeros(n_comp, bool)
        is_patch[comp[inside]] = True
        rank = np.cumsum(is_patch)
        patch = np.where(inside, rank[comp], 0)
        patch_sizes = np.bincount(patch, weights=graph.lengths, minlength=int(rank[-1]) + 1).astype(np.int64)
        patch_sizes[0] = 0
        patch_strata = np.zeros(int(rank[-1]) + 1, np.int64)
        patch_strata[patch[inside]] = graph.values[inside]
        return patch, patch_sizes, patch_strata
    comp = np.where(inside, comp, -1)
    stratum_comps, comp = np.unique(comp, return_inverse=True)
    if stratum_comps[0] == -1:  # the runs of id 0 form no patch
        comp -= 1
    n_patches = int(comp.max()) + 1
    inside = comp >= 0
    patch_first = np.full(n_patches, np.iinfo(np.int64).max)
    np.minimum.at(patch_first, comp[inside], graph.first[inside])
    rank = np.empty(n_patches, np.int64)
    rank[np.argsort(patch_first, kind="stable")] = np.arange(1, n_patches + 1)
    patch = np.zeros(n, np.int64)
    patch[inside] = rank[comp[inside]]
    patch_sizes = np.bincount(patch, weights=graph.lengths, minlength=n_patches + 1).astype(np.int64)
    patch_sizes[0] = 0
    patch_strata = np.zeros(n_patches + 1, np.int64)
    patch_strata[patch[inside]] = graph.values[inside]
    return patch, patch_sizes, patch_strata


def _rewrite_runs(band, graph, run_strata, progress=None, out=None):
    """Pass 2 of :func:`merge_raster_patches`: the cells of the runs that changed stratum rewritten, strip by strip.

    In place, or every strip written to ``out`` (a :class:`~.stratum_raster.StratumRaster`).
    Returns the runs moved (:class:`~..engine.stratification.CellMoves`).
    """
    run_strata = np.where(graph.values > 0, run_strata, 0).astype(np.uint8)
    changed = run_strata != graph.values
    moved = np.flatnonzero(changed)
    width = band.XSize
    moves = strat.CellMoves(width, graph.first[moved], graph.lengths[moved], graph.values[moved], run_strata[moved])
    offset = 0
    for i, (y0, n_rows, count) in enumerate(graph.strips):
        changes = changed[offset:offset + count].any()
        if changes or out is not None:
            ids = band.ReadAsArray(0, y0, width, n_rows)
            if changes:
                flat, _, new = moves.cells_in((0, y0, width, n_rows))
                ids.reshape(-1)[flat] = new
            if out is None:
                band.WriteArray(ids, 0, y0)
            else:
                out.write((0, y0), ids)
                out.flush()
            band.FlushCache()
        offset += count
        if progress is not None and progress((i + 1) / len(graph.strips)):
            raise Cancelled("Stratification cancelled.")
    return moves
