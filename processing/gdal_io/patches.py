"""Patches of the stratum raster below the minimum area: GDAL's speck sieve, then the patch-graph merge."""
from dataclasses import dataclass
import math

import numpy as np
from osgeo import gdal

from ..engine import stratification as strat
from ..engine.errors import Cancelled
from .covariate_stack import BLOCK_CELLS, block_windows
from .grids import GdalProgress


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
    steps = _speck_steps(min_cells)
    if not steps:
        return
    ds = gdal.Open(path, gdal.GA_Update)
    band = ds.GetRasterBand(1)
    try:
        for i, t in enumerate(steps):
            cb = GdalProgress(strat.scaled_progress(progress, i / len(steps), (i + 1) / len(steps)))
            try:
                gdal.SieveFilter(band, band, band, t, 4, callback=cb)
            except RuntimeError:
                cb.check()
                raise
            cb.check()
    finally:
        band.FlushCache()
        band = ds = None



@dataclass(frozen=True)
class PatchCheck:
    """What :func:`merge_raster_patches` did: patches merged, and those still below the minimum."""

    merged: int
    left: int
    left_cells: int


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
    from scipy.sparse import coo_matrix
    from scipy.sparse.csgraph import connected_components

    if min_cells <= 1:
        return PatchCheck(0, 0, 0)
    ds = gdal.Open(path, gdal.GA_Update)
    band = ds.GetRasterBand(1)
    try:
        width, height = band.XSize, band.YSize
        blocks = [(y, rows) for _, y, _, rows in block_windows(width, height, (width, 1), (0, 0), block_cells)]
        bases, sizes, strata, first = [], [], [], []
        seam_a, seam_b = [], []
        codes, counts = np.zeros(0, np.int64), np.zeros(0, np.int64)
        prev_ids = prev_lab = None
        base = 0
        for i, (y0, rows) in enumerate(blocks):  # pass 1: patches, sizes, shared edges
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
            if progress is not None and progress(0.6 * (i + 1) / len(blocks)):
                raise Cancelled("Stratification cancelled.")
        if base == 0:
            return PatchCheck(0, 0, 0)
        # local labels 1..base -> patches: parts joined across block boundaries, numbered by their first cell
        seam_a = np.concatenate(seam_a) - 1 if seam_a else np.zeros(0, np.int64)
        seam_b = np.concatenate(seam_b) - 1 if seam_b else np.zeros(0, np.int64)
        graph = coo_matrix((np.ones(seam_a.size), (seam_a, seam_b)), shape=(base, base))
        n_patches, part_of = connected_components(graph, directed=False)
        first = np.concatenate(first)
        patch_first = np.full(n_patches, np.iinfo(np.int64).max)
        np.minimum.at(patch_first, part_of, first)
        rank = np.empty(n_patches, np.int64)
        rank[np.argsort(patch_first, kind="stable")] = np.arange(1, n_patches + 1)
        patch = rank[part_of]  # patch (1..n) of each local label (0-based)
        local_strata = np.asarray(strata, np.int64)
        patch_sizes = np.bincount(patch, weights=np.concatenate(sizes), minlength=n_patches + 1).astype(np.int64)
        patch_strata = np.zeros(n_patches + 1, np.int64)
        patch_strata[patch] = local_strata
        small = patch_sizes < min_cells
        small[0] = False
        if not small.any():
            return PatchCheck(0, 0, 0)
        a, b = patch[(codes >> 32) - 1], patch[(codes & 0xFFFFFFFF) - 1]
        keep = small[a] | small[b]
        pair_codes, shared = _count_codes(np.zeros(0, np.int64), np.zeros(0, np.int64),
                                          _pair_codes(a[keep], b[keep]), counts[keep])
        pairs = np.column_stack([pair_codes >> 32, pair_codes & 0xFFFFFFFF])
        merge = strat.merge_patch_graph(patch_sizes, patch_strata, pairs, shared, min_cells)
        if merge.merged:
            lut = np.concatenate([[0], merge.strata[patch]]).astype(np.uint8)  # local label -> stratum
            changed = np.concatenate([[False], merge.strata[patch] != local_strata])
            for i, (y0, rows) in enumerate(blocks):  # pass 2: the same labels, the new strata
                ids = band.ReadAsArray(0, y0, width, rows)
                lab, _ = _block_patches(ids)
                lab[lab > 0] += bases[i]
                if changed[lab].any():
                    band.WriteArray(lut[lab], 0, y0)
                if progress is not None and progress(0.6 + 0.4 * (i + 1) / len(blocks)):
                    raise Cancelled("Stratification cancelled.")
        return PatchCheck(merge.merged, int(merge.left.size), int(merge.left_cells.sum()))
    finally:
        band.FlushCache()
        band = ds = None
