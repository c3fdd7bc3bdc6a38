"""The report of plotwise:buildframe, built from :class:`engine.frame.SamplingFrame` and
:class:`gdal_io.masking.RasterMask` (named fields; never imports the host)."""

from dataclasses import dataclass

from ..engine import frame as frame_engine
from .html import format_number
from .style import ACCENT, CAUTION_EDGE, INK, MUTED
from .svg import MapLayer, map_svg


@dataclass(frozen=True)
class BuildFrameReportInputs:
    """Names and settings the frame report shows, and the geometries its map draws (host-free).

    ``exclude``, ``mask``, ``mask_min`` and ``mask_max`` are None when not given; ``crs`` names the
    computation CRS (``"EPSG:32736 (WGS 84 / UTM zone 36S)"``) and ``projected_from`` the study
    area's own CRS when it was projected. ``study_union`` is the study area, ``exclusions`` and
    ``mask_polygons`` the polygons of the two rules (empty when not used).
    """

    study: str
    crs: str
    study_union: object
    exclude: object = None
    mask: object = None
    mask_min: object = None
    mask_max: object = None
    edge_buffer: float = 0.0
    projected_from: object = None
    exclusions: tuple = ()
    mask_polygons: tuple = ()


def buildframe_report(report, result, raster, inputs, warnings):
    """Fill ``report`` with the frame ``result`` (and the mask ``raster``, or None); returns it."""
    report.title = report.translate("PlotwiseReport", "Sampling frame")
    report.field_safety()
    report.warnings(warnings)
    study_ha = result.study_area_m2 / 1e4
    report.key_figures([
        (report.translate("PlotwiseReport", "study area (ha)"), format_number(study_ha)),
        (report.translate("PlotwiseReport", "frame (ha)"), format_number(result.area_ha)),
        (report.translate("PlotwiseReport", "kept"), f"{format_number(100 * result.kept_fraction)} %"),
    ])
    report.note(report.translate(
        "PlotwiseReport",
        "Estimates from a survey on this frame apply to the frame ({ha} ha) only, not to the "
        "whole study area.").format(ha=format_number(result.area_ha)))
    _losses(report, result)
    if raster is not None:
        _mask_raster(report, raster)
    report.section(report.translate("PlotwiseReport", "Map"))
    report.figure(frame_map(report, result, inputs),
                  report.translate("PlotwiseReport", "Frame (filled), with the areas lost to each rule"))
    _parameters(report, inputs)
    return report


def _losses(report, result):
    report.section(report.translate("PlotwiseReport", "Area kept and area lost to each rule"))
    rule_names = {
        "exclude": report.translate("PlotwiseReport", "lost to the excluded polygons (EXCLUDE)"),
        "mask": report.translate("PlotwiseReport",
                                 "lost to the raster mask (MASK outside the accepted range, or NoData)"),
        "edge_buffer": report.translate("PlotwiseReport", "lost to the inward edge buffer (EDGE_BUFFER)"),
    }
    rows = [[report.translate("PlotwiseReport", "study area"), result.study_area_m2 / 1e4, 100.0]]
    for loss in result.losses:
        rows.append([rule_names[loss.rule], loss.area_ha, 100 * loss.area_m2 / result.study_area_m2])
    rows.append([report.translate("PlotwiseReport", "sampling frame (kept)"), result.area_ha,
                 100 * result.kept_fraction])
    report.table([report.translate("PlotwiseReport", "Item"), report.translate("PlotwiseReport", "Area (ha)"),
                  report.translate("PlotwiseReport", "% of study area")], rows)
    report.paragraph(report.translate(
        "PlotwiseReport",
        "Rules are applied in the order shown; each is charged only with area that was still in "
        "the frame, so the frame and the areas lost add up to the study area."))


def _mask_raster(report, raster):
    report.subsection(report.translate("PlotwiseReport", "Mask raster"))
    warped = report.translate("PlotwiseReport", "yes") if raster.warped else report.translate("PlotwiseReport", "no")
    report.table([report.translate("PlotwiseReport", "Item"), report.translate("PlotwiseReport", "Value")], [
        [report.translate("PlotwiseReport", "cells tested over the study area's extent"), raster.total_cells],
        [report.translate("PlotwiseReport", "cell size (m)"), raster.cell_area_m2 ** 0.5],
        [report.translate("PlotwiseReport", "cells below the lowest accepted value"), raster.below_cells],
        [report.translate("PlotwiseReport", "cells above the highest accepted value"), raster.above_cells],
        [report.translate("PlotwiseReport", "NoData cells (including cells outside the raster)"),
         raster.nodata_cells],
        [report.translate("PlotwiseReport", "reprojected on the fly (nearest neighbour)"), warped],
    ])


def _parameters(report, inputs):
    def shown(value):
        return report.translate("PlotwiseReport", "(none)") if value is None else value

    crs = inputs.crs
    if inputs.projected_from:
        crs += report.translate(
            "PlotwiseReport", ", projected from {src} (UTM zone of the study area's centre)").format(
            src=inputs.projected_from)
    report.parameters({
        report.translate("PlotwiseReport", "Study area (INPUT)"): inputs.study,
        report.translate("PlotwiseReport", "Areas to exclude (EXCLUDE)"): shown(inputs.exclude),
        report.translate("PlotwiseReport", "Mask raster (MASK)"): shown(inputs.mask),
        report.translate("PlotwiseReport", "Lowest accepted mask value (MASK_MIN)"): shown(inputs.mask_min),
        report.translate("PlotwiseReport", "Highest accepted mask value (MASK_MAX)"): shown(inputs.mask_max),
        report.translate("PlotwiseReport", "Inward edge buffer (EDGE_BUFFER, m)"): inputs.edge_buffer,
        report.translate("PlotwiseReport", "CRS of the computation and the output"): crs,
    })


def for_screen(geometry, tolerance, max_ring_points=500):
    """``geometry`` simplified until no ring has more than ``max_ring_points`` vertices.

    Raster-cell outlines are staircases with many vertices; simplifying them (rather than
    dropping vertices) keeps the map faithful at report size.
    """
    for _ in range(8):
        simple = geometry.simplify(tolerance, preserve_topology=True)
        rings = [r for p in getattr(simple, "geoms", [simple]) if p.geom_type == "Polygon"
                 for r in (p.exterior, *p.interiors)]
        if not rings or max(len(r.coords) for r in rings) <= max_ring_points:
            return simple
        tolerance *= 2.0
    return simple


def frame_map(report, result, inputs):
    """The frame filled, the areas each rule removed, and the study area's outline."""
    study_union, exclusions, mask = inputs.study_union, inputs.exclusions, inputs.mask_polygons
    minx, miny, maxx, maxy = study_union.bounds
    tolerance = max(maxx - minx, maxy - miny) / 1800.0  # about half a pixel at 900 px

    def for_display(geometries, already_shown=None):
        # the part of the study area that this rule removed, simplified for the screen
        if not geometries:
            return ()
        merged = frame_engine.dissolve(geometries).intersection(study_union)
        if already_shown is not None and not already_shown.is_empty:
            merged = merged.difference(already_shown)
        merged = for_screen(merged, tolerance)
        return (merged,) if not merged.is_empty else ()

    layers = [MapLayer((for_screen(result.geometry, tolerance),),
                       label=report.translate("PlotwiseReport", "sampling frame"), fill=ACCENT, stroke=ACCENT,
                       opacity=0.55)]
    if exclusions:
        layers.append(MapLayer(for_display(exclusions), label=report.translate("PlotwiseReport", "excluded polygons"),
                               fill=MUTED, stroke=MUTED, opacity=0.6))
    if mask:
        shown = frame_engine.dissolve(exclusions) if exclusions else None
        layers.append(MapLayer(for_display(mask, shown), label=report.translate("PlotwiseReport", "raster mask"),
                               fill=CAUTION_EDGE, stroke="none", opacity=0.6, stroke_width=0))
    layers.append(MapLayer((study_union,), label=report.translate("PlotwiseReport", "study area boundary"),
                           stroke=INK, stroke_width=1.5))
    return map_svg(layers)
