"""Patches of the stratum raster below the minimum area: GDAL's speck sieve, then the patch-graph merge."""
from dataclasses import dataclass
import math

import numpy as np
from osgeo import gdal

from ..engine import stratification as strat
from ..engine.errors import Cancelled, InputError, message
from .covariate_stack import BLOCK_CELLS, block_windows
from .grids import GdalProgress

#: MIN_AREA (ha) offered by the algorithm (our choice): a patch of a stratum should hold a few sample units with
#: room between them (four 20 m x 20 m plots 50 m apart fill about 1 ha); smaller patches are noise of the
#: covariate, not zones a team can survey
DEFAULT_MIN_AREA_HA = 1.0
#: most patches turned into polygons (our choice): GDAL's polygonize holds every open patch in memory (about
#: 0.4 GB for 250,000 ragged patches on 10^8 cells, tests/benchmarks/bench_stratify.py), and a field map with
#: more patches than this is speckle, not strata
MAX_POLYGON_PATCHES = 100_000
#: most patches given to the patch-graph merge (about 2 kB each in Python: 0.5 GB at most)
MAX_GRAPH_PATCHES = 250_000
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


#: patches below this many cells are specks, merged by GDAL's sieve before :func:`merge_raster_patches`
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
    GDAL is fast on the many tiny patches of a noisy covariate, and after it
    at most one patch in :data:`SPECK_CELLS` cells is left for
    :func:`merge_raster_patches`, which brings every patch up to ``min_cells``.
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
    return patches.size - still_open.size, _Frontier(patch, ids[-1].copy(), start[-1].copy())


def count_patches(path, progress=None):
    """Number of patches (4-connected groups of cells of one stratum, id > 0) of a stratum raster.

    One pass by strips of full rows, in memory bounded by the strip: runs of
    equal ids along the rows are the nodes, runs of neighbouring rows that
    share a cell edge are joined (connected components, scipy.sparse.csgraph),
    and only the patches still open at a strip's last row are carried on.
    """
    ds = gdal.Open(path)
    band = ds.GetRasterBand(1)
    width, height = band.XSize, band.YSize
    rows = _strip_rows(width, band.GetBlockSize()[1])
    closed, frontier = 0, None
    n = -(-height // rows)
    for i, y0 in enumerate(range(0, height, rows)):
        ids = band.ReadAsArray(0, y0, width, min(rows, height - y0))
        done, frontier = _count_strip(ids, frontier)
        closed += done
        if progress is not None and progress((i + 1) / n):
            raise Cancelled("Stratification cancelled.")
    band = ds = None
    return closed + (frontier.open if frontier is not None else 0)


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
        "The strata form {n:,} patches (4-connected groups of cells of one stratum), more than the {limit:,} "
        "that can be turned into polygons: the covariate is speckled at the scale of its cells. Set MIN_AREA to "
        "{suggested:g} ha or more (it is {min_area:g} ha): patches below it join a neighbouring stratum, which "
        "leaves at most {limit:,} patches on the {area:,.0f} ha stratified. Smoothing the covariate first also "
        "helps.", n=int(n_patches), limit=int(limit), suggested=suggested, min_area=float(min_area_ha),
        area=float(stratified_ha)))


def too_speckled(n_patches, min_area_ha, limit=None):
    """The error for strata with more patches than the merge below MIN_AREA can take in bounded memory."""
    limit = MAX_SIEVE_PATCHES if limit is None else limit
    return InputError(message(
        "The strata form {n:,} patches (4-connected groups of cells of one stratum), more than the {limit:,} "
        "that can be merged below MIN_AREA in bounded memory: the covariate is speckled at the scale of its "
        "cells. Smooth or coarsen it first (for example, resample it with the average to cells of about {cell:g} "
        "m, so that one cell covers MIN_AREA), then run the stratification again.",
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
        Largest threshold of GDAL's sieve beyond the specks, used when the patches
        were too many for the patch-graph merge (0: specks only).
    """

    merged: int
    left: int
    left_cells: int
    patches: int = -1
    sieved_to: int = 0


def enforce_min_area(path, min_cells, min_area_ha=0.0, block_cells=BLOCK_CELLS, progress=None):
    """Bring every patch of the stratum raster up to ``min_cells``, in bounded memory and time.

    Steps: count the patches (:func:`count_patches`); with more than
    :data:`MAX_SIEVE_PATCHES` an :class:`InputError` (GDAL's sieve would need
    memory in proportion); the speck sieve (:func:`sieve_strata`); while more
    than :data:`MAX_GRAPH_PATCHES` patches are left, GDAL's sieve with a
    doubled threshold (up to ``min_cells``); then the patch-graph merge
    (:func:`merge_raster_patches`). With ``min_cells`` <= 1 it only counts.
    """
    counted = count_patches(path, strat.scaled_progress(progress, 0, 0.15))
    if min_cells <= 1:
        return PatchCheck(0, 0, 0, counted)
    if counted > MAX_SIEVE_PATCHES:
        raise too_speckled(counted, min_area_ha)
    sieve_strata(path, min_cells, strat.scaled_progress(progress, 0.15, 0.35))
    threshold, sieved_to = speck_cells(min_cells), 0
    counted = count_patches(path, strat.scaled_progress(progress, 0.35, 0.4))
    while counted > MAX_GRAPH_PATCHES and threshold < min_cells:
        threshold = min(2 * threshold, int(min_cells))
        gdal_sieve(path, [threshold])
        sieved_to = threshold
        counted = count_patches(path)
    if counted > MAX_GRAPH_PATCHES:
        return PatchCheck(0, 0, 0, counted, sieved_to)
    check = merge_raster_patches(path, min_cells, block_cells, strat.scaled_progress(progress, 0.4, 1.0))
    return PatchCheck(check.merged, check.left, check.left_cells, check.patches, sieved_to)


def _block_patches(ids):
    """4-connected patches of one stratum block (scipy.ndimage.label per stratum): labels 1..k (0: none), strata."""
    from scipy import ndimage

    labels = np.zeros(ids.shape, np.int64)
    strata = []
    for h in np.unique(ids):
        if h == 0:
            continue
        lab, k = ndimage.label(ids == h)
        inside = lab > 0
        labels[inside] = lab[inside] + len(strata)
        strata.extend([int(h)] * k)
    return labels, strata


def _pair_codes(a, b):
    """Codes of unordered label pairs (labels below 2³¹): min · 2³² + max."""
    return (np.minimum(a, b) << 32) | np.maximum(a, b)


def _count_codes(codes, counts, new_codes, new_counts=None):
    """Add ``new_codes`` (with ``new_counts``, default one each) to the running (codes, counts)."""
    if new_codes.size == 0:
        return codes, counts
    if new_counts is None:
        new_codes, new_counts = np.unique(new_codes, return_counts=True)
    merged, inverse = np.unique(np.concatenate([codes, new_codes]), return_inverse=True)
    total = np.bincount(inverse, weights=np.concatenate([counts, new_counts]), minlength=merged.size)
    return merged, np.rint(total).astype(np.int64)


def merge_raster_patches(path, min_cells, block_cells=BLOCK_CELLS, progress=None):
    """Merge the patches below ``min_cells`` after the speck sieve (:func:`~..engine.stratification.merge_patch_graph`).

    Two passes over the stratum raster by blocks of rows. The first labels the
    4-connected patches of each block (scipy.ndimage.label), joins the parts of
    a patch that a block boundary cuts (scipy.sparse.csgraph), counts every
    patch's cells and the cell edges neighbouring patches share, and numbers
    the patches by their first cell in reading order, so the result does not
    depend on the blocks. The engine then merges the small patches; the second
    pass labels each block again and writes the new strata. Memory grows with
    the number of patches, not with the raster.

    Returns
    -------
    PatchCheck
        Patches merged, and the patches (and their cells) still below the
        minimum because they touch no other stratum.
    """
    if min_cells <= 1:
        return PatchCheck(0, 0, 0)
    ds = gdal.Open(path, gdal.GA_Update)
    band = ds.GetRasterBand(1)
    try:
        width, height = band.XSize, band.YSize
        blocks = [(y, rows) for _, y, _, rows in block_windows(width, height, (width, 1), (0, 0), block_cells)]
        labels = _label_blocks(band, blocks, strat.scaled_progress(progress, 0, 0.6))
        if labels.count == 0:
            return PatchCheck(0, 0, 0, 0)
        patch, patch_sizes, patch_strata = _number_patches(labels)
        small = patch_sizes < min_cells
        small[0] = False
        if not small.any():
            return PatchCheck(0, 0, 0, int(patch_sizes.size - 1))
        a, b = patch[(labels.codes >> 32) - 1], patch[(labels.codes & 0xFFFFFFFF) - 1]
        keep = small[a] | small[b]
        pair_codes, shared = _count_codes(np.zeros(0, np.int64), np.zeros(0, np.int64),
                                          _pair_codes(a[keep], b[keep]), labels.counts[keep])
        pairs = np.column_stack([pair_codes >> 32, pair_codes & 0xFFFFFFFF])
        merge = strat.merge_patch_graph(patch_sizes, patch_strata, pairs, shared, min_cells)
        if merge.merged:
            lut = np.concatenate([[0], merge.strata[patch]]).astype(np.uint8)  # local label -> stratum
            changed = np.concatenate([[False], merge.strata[patch] != labels.strata])
            _rewrite_blocks(band, blocks, labels.bases, lut, changed, strat.scaled_progress(progress, 0.6, 1.0))
        return PatchCheck(merge.merged, int(merge.left.size), int(merge.left_cells.sum()), merge.patches)
    finally:
        band.FlushCache()
        band = ds = None


@dataclass(frozen=True)
class _BlockLabels:
    """Patches of each block of rows (local labels 1..count over all blocks) and how they touch.

    ``bases`` is each block's first label - 1; ``sizes``, ``strata`` and
    ``first`` (flat index of the first cell) are per local label; ``seam_a`` /
    ``seam_b`` pair the 0-based local labels that a block boundary cuts from one
    patch; ``codes`` / ``counts`` are the pairs of local labels of different
    strata that share cell edges, and how many.
    """

    bases: list
    sizes: np.ndarray
    strata: np.ndarray
    first: np.ndarray
    seam_a: np.ndarray
    seam_b: np.ndarray
    codes: np.ndarray
    counts: np.ndarray

    @property
    def count(self):
        return int(self.sizes.size)


def _label_blocks(band, blocks, progress=None):
    """Pass 1 of :func:`merge_raster_patches`: every block's patches labelled (scipy.ndimage.label)."""
    width = band.XSize
    bases, sizes, strata, first = [], [], [], []
    seam_a, seam_b = [], []
    codes, counts = np.zeros(0, np.int64), np.zeros(0, np.int64)
    prev_ids = prev_lab = None
    base = 0
    for i, (y0, rows) in enumerate(blocks):
        ids = band.ReadAsArray(0, y0, width, rows)
        lab, block_strata = _block_patches(ids)
        k = len(block_strata)
        sizes.append(np.bincount(lab.ravel(), minlength=k + 1)[1:])
        lab[lab > 0] += base
        bases.append(base)
        strata.extend(block_strata)
        seen, at = np.unique(lab.ravel(), return_index=True)  # each label's first cell in the block
        first.append((y0 * width + at[seen > 0]).astype(np.int64))
        found = []
        for a, b, same in ((lab[:, :-1], lab[:, 1:], None), (lab[:-1], lab[1:], None),
                           (prev_lab, lab[:1], None if prev_ids is None else prev_ids == ids[:1])):
            if a is None:
                continue
            touch = (a != b) & (a > 0) & (b > 0)
            if same is not None:  # across the block boundary: one patch cut in two, or two patches
                seam = touch & same
                seam_a.append(a[seam])
                seam_b.append(b[seam])
                touch &= ~same
            found.append(_pair_codes(a[touch], b[touch]))
        codes, counts = _count_codes(codes, counts, np.concatenate(found))
        prev_ids, prev_lab = ids[-1:], lab[-1:]
        base += k
        if progress is not None and progress((i + 1) / len(blocks)):
            raise Cancelled("Stratification cancelled.")
    empty = np.zeros(0, np.int64)
    return _BlockLabels(bases, np.concatenate(sizes) if sizes else empty, np.asarray(strata, np.int64),
                        np.concatenate(first) if first else empty,
                        np.concatenate(seam_a) - 1 if seam_a else empty,
                        np.concatenate(seam_b) - 1 if seam_b else empty, codes, counts)


def _number_patches(labels):
    """Local labels joined across block boundaries (scipy.sparse.csgraph) into patches 1..n, numbered by first cell.

    Returns ``(patch of each local label, cells per patch, stratum per patch)``; index 0 of the last two is
    "no patch". Numbering by the first cell in reading order makes the result independent of the blocks.
    """
    from scipy.sparse import coo_matrix
    from scipy.sparse.csgraph import connected_components

    n = labels.count
    graph = coo_matrix((np.ones(labels.seam_a.size), (labels.seam_a, labels.seam_b)), shape=(n, n))
    n_patches, part_of = connected_components(graph, directed=False)
    patch_first = np.full(n_patches, np.iinfo(np.int64).max)
    np.minimum.at(patch_first, part_of, labels.first)
    rank = np.empty(n_patches, np.int64)
    rank[np.argsort(patch_first, kind="stable")] = np.arange(1, n_patches + 1)
    patch = rank[part_of]
    patch_sizes = np.bincount(patch, weights=labels.sizes, minlength=n_patches + 1).astype(np.int64)
    patch_strata = np.zeros(n_patches + 1, np.int64)
    patch_strata[patch] = labels.strata
    return patch, patch_sizes, patch_strata


def _rewrite_blocks(band, blocks, bases, lut, changed, progress=None):
    """Pass 2 of :func:`merge_raster_patches`: the same labels again, the blocks that changed written anew."""
    width = band.XSize
    for i, (y0, rows) in enumerate(blocks):
        ids = band.ReadAsArray(0, y0, width, rows)
        lab, _ = _block_patches(ids)
        lab[lab > 0] += bases[i]
        if changed[lab].any():
            band.WriteArray(lut[lab], 0, y0)
        if progress is not None and progress((i + 1) / len(blocks)):
            raise Cancelled("Stratification cancelled.")
