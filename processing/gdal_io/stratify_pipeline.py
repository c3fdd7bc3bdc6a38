"""The whole stratification on GDAL rasters: stack, assign, merge small patches, polygonise (no host import)."""
from dataclasses import dataclass, field, replace
import os

import numpy as np

from ..engine import stratification as strat
from ..engine.errors import QT_TRANSLATE_NOOP, InputError, message
from .covariate_stack import BLOCK_CELLS, CovariateStack
from .grids import Grid
from . import patches as patch_limits
from .patches import enforce_min_area, sieve_cells, too_many_patches
from .polygonising import display_polygons, polygonise_strata
from .stratum_raster import StratumRaster, remap_strata

#: loss of R² (first covariate) from merging patches below MIN_AREA worth a warning (our choice)
R2_LOSS_WARNING = 0.1


@dataclass(frozen=True)
class RasterStratification:
    """Everything the algorithm writes and reports.

    Areas are in hectares, computed as cells × cell area in the computation CRS.
    ``coverage`` is the share of the frame's area with a value in every
    covariate: (frame area on the raster / frame area) × (valid cells / frame cells).
    """

    result: strat.Stratification
    names: list
    units: list
    labels: list
    grid: Grid
    polygons: list
    area_ha: np.ndarray
    frame_ha: float
    frame_cells_ha: float
    nodata_ha: float
    outside_ha: float
    coverage: float
    sieve_cells: int
    warped: list
    output_raster: str
    warnings: list = field(default_factory=list)
    patches_merged: int = 0
    """Patches that GDAL's sieve left below MIN_AREA and :func:`merge_raster_patches` merged."""
    small_patches: int = 0
    """Patches still below MIN_AREA (they touch no other stratum)."""
    small_patches_ha: float = 0.0
    patches: int = 0
    """Patches (4-connected groups of cells of one stratum) of the strata polygonised."""
    map_polygons: list = None
    """Polygons for the report's map, traced at a coarser cell on large rasters (None: ``polygons``)."""


def stratify_rasters(covariates, frame_wkb, crs_wkt, method, n_strata, output_raster, min_area_ha=0.0,
                     rng=None, sample_size=100_000, progress=None, block_cells=BLOCK_CELLS):
    """Strata from raster covariates clipped to a frame, as a raster and as polygons.

    Steps: stack the covariates on the first one's grid (:class:`CovariateStack`),
    find the rule and assign every cell (:func:`assign_strata`), merge the
    patches below MIN_AREA and recount the statistics (:func:`merge_below_min_area`;
    strata renumbered by first-covariate mean), check that the patches are few
    enough to turn into polygons (:data:`~.patches.MAX_POLYGON_PATCHES`),
    polygonise (:func:`~.polygonising.polygonise_strata`).
    """
    categorical = method == strat.RASTER_CLASSES
    progress = strat.throttled_progress(progress)
    with CovariateStack(covariates, frame_wkb, crs_wkt, categorical, block_cells) as stack:
        cells = sieve_cells(min_area_ha, stack.cell_area)
        # patches to merge: the assignment goes to a provisional raster, the merge writes the output once
        provisional = os.path.join(stack.workdir, "strata_provisional.tif") if cells > 1 else output_raster
        res, runs = assign_strata(stack, method, n_strata, provisional, rng, sample_size,
                                  strat.scaled_progress(progress, 0, 0.75))
        warnings = list(res.warnings)
        res, patches = merge_below_min_area(stack, res, output_raster, cells, min_area_ha, block_cells, warnings,
                                            strat.scaled_progress(progress, 0.75, 0.9), runs, provisional)
        if patches.patches > patch_limits.MAX_POLYGON_PATCHES:
            raise too_many_patches(patches.patches, res.cells_valid * stack.cell_area / 10000.0, min_area_ha)
        polygons = polygonise_strata(output_raster, res.n_strata, strat.scaled_progress(progress, 0.9, 1.0))
        result = _raster_stratification(stack, res, polygons, cells, patches, output_raster, warnings)
        return replace(result, map_polygons=display_polygons(output_raster, res.n_strata))


def assign_strata(stack, method, n_strata, output_raster, rng=None, sample_size=100_000, progress=None):
    """The rule and every cell's stratum (:func:`~..engine.stratification.stratify_cells`), written as a raster.

    The strata are renumbered by first-covariate mean in the raster when the
    engine reordered or dropped some. Returns ``(result, runs)``: ``runs`` is an
    upper bound on the raster's runs of equal ids along the rows.
    """
    writer = StratumRaster(output_raster, stack.grid)
    try:
        hint = stack.approximate_range() if method == strat.QUANTILE else None
        res = strat.stratify_cells(stack.source(), method, n_strata, stack.names, rng=rng, value_range=hint,
                                   sample_size=sample_size, write=writer.write,
                                   progress=strat.scaled_progress(progress, 0, 0.93))
    finally:
        writer.close()
    if res.needs_remap:
        remap_strata(output_raster, res.lut, progress=strat.scaled_progress(progress, 0.93, 1.0))
    return res, writer.row_runs


def merge_below_min_area(stack, res, output_raster, cells, min_area_ha, block_cells, warnings, progress=None,
                         runs=None, provisional=None):
    """Patches below ``cells`` cells merged (:func:`~.patches.enforce_min_area`), statistics updated.

    Returns ``(result, PatchCheck)``; warnings are appended to ``warnings``. With
    ``cells`` <= 1 the patches are only counted. ``runs``: an upper bound on the
    raster's runs (:func:`assign_strata`). ``provisional``: the raster the
    assignment wrote, when not ``output_raster`` (the merge then writes that).
    """
    source = output_raster if provisional is None else provisional
    patches = enforce_min_area(source, cells, min_area_ha, block_cells, strat.scaled_progress(progress, 0, 0.6),
                               runs, None if source == output_raster else output_raster)
    if cells <= 1:
        return res, patches
    if patches.sieved_to:
        warnings.append(message(
            QT_TRANSLATE_NOOP("PlotwiseEngine",
                "The strata formed too many small patches to merge one by one: patches below {cells:,} cells were "
            "first merged into their largest neighbour (the rule of GDAL's sieve filter), which can join a mosaic "
            "of small patches into one stratum. Smoothing the covariate before stratifying keeps the strata closer "
            "to its pattern."),
            cells=int(patches.sieved_to)))
    stats = _statistics_after_merge(stack, res, patches, output_raster, strat.scaled_progress(progress, 0.6, 1.0))
    lut, order = strat.stratum_order(stats)
    if order.size < 2:
        raise InputError(message(
            QT_TRANSLATE_NOOP("PlotwiseEngine",
                "With MIN_AREA {min_area:g} ha, merging the patches below it left a single stratum, so there "
            "is nothing to stratify. Lower MIN_AREA."), min_area=min_area_ha))
    provisional = res.provisional
    r2_before = float(res.statistics.r_squared()[0])
    if not np.array_equal(lut, np.arange(lut.size)):
        if order.size < stats.n_strata:
            warnings.append(message(QT_TRANSLATE_NOOP("PlotwiseEngine",
                "{merged} strata consisted only of patches below MIN_AREA and were "
                                    "merged away."), merged=int(stats.n_strata - order.size)))
        remap_strata(output_raster, lut)
        stats, provisional = stats.reordered(order), provisional[order]
    res = res.with_statistics(stats, provisional)
    r2_after = float(stats.r_squared()[0])
    if np.isfinite(r2_before) and np.isfinite(r2_after) and r2_after < r2_before - R2_LOSS_WARNING:
        warnings.append(message(
            QT_TRANSLATE_NOOP("PlotwiseEngine",
                "Merging the patches below MIN_AREA moved cells between strata: the share of the variance of "
            "'{name}' that the strata explain fell from {before:.2f} to {after:.2f}. A smaller MIN_AREA "
            "keeps the strata closer to the covariates."), name=stack.names[0], before=r2_before, after=r2_after))
    if patches.left:
        warnings.append(message(
            QT_TRANSLATE_NOOP("PlotwiseEngine",
                "{n} patch(es) covering {ha:,.2f} ha stay below MIN_AREA ({min_area:g} ha): they touch no "
            "other stratum (islands of the frame, or patches ringed by NoData). Remove such islands from "
            "the frame, fill the NoData in the covariates, or lower MIN_AREA."),
            n=patches.left, ha=patches.left_cells * stack.cell_area / 10000.0, min_area=min_area_ha))
    return res, patches


def _statistics_after_merge(stack, res, patches, output_raster, progress):
    """The strata's statistics after the merge: from the moved cells alone when the strata need no minimum and
    maximum (threshold rules) and the merge knows every cell it moved; else recounted over every cell."""
    threshold = isinstance(res.rule, strat.ThresholdRule)  # their strata need no minimum and maximum, as before
    if threshold and patches.moves is not None:
        return strat.statistics_after_moves(stack.source(), res.statistics, patches.moves, res.histogram, progress)
    return strat.accumulate_statistics(stack.source(output_raster), res.n_strata, shift=res.statistics.overall_mean(),
                                       chart_range=res.statistics.chart_range, extremes=not threshold,
                                       progress=progress)


def _raster_stratification(stack, res, polygons, cells, patches, output_raster, warnings):
    """The areas, coverage and labels of the result; a warning when the covariates miss part of the frame."""
    ca = stack.cell_area / 10000.0
    frame_ha = stack.frame_area / 10000.0
    outside_ha = max(0.0, (stack.frame_area - stack.frame_area_on_grid) / 10000.0)
    on_grid = stack.frame_area_on_grid / stack.frame_area if stack.frame_area > 0 else 0.0
    coverage = on_grid * res.cells_valid / res.cells_in_frame if res.cells_in_frame else 0.0
    if res.cells_nodata or on_grid < 1 - 1e-6:
        warnings.append(message(QT_TRANSLATE_NOOP("PlotwiseEngine",
            "The covariates cover {percent:.1f}% of the frame: {outside_ha:,.2f} ha lie "
                                "outside the rasters and {nodata_ha:,.2f} ha have NoData in at least one "
                                "covariate; the strata speak for the covered part only."),
                                percent=100 * coverage, outside_ha=outside_ha, nodata_ha=res.cells_nodata * ca))
    labels = strat.stratum_label_texts(res, stack.names, stack.units)
    return RasterStratification(res, stack.names, stack.units, labels, stack.grid, polygons,
                                res.statistics.count * ca, frame_ha, res.cells_in_frame * ca,
                                res.cells_nodata * ca, outside_ha, coverage, cells, list(stack.warped),
                                output_raster, warnings, patches.merged, patches.left,
                                patches.left_cells * ca, max(patches.patches, 0))
