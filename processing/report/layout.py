"""The report of plotwise:layout, built from :class:`engine.layout.Layout` and the prepared strata
(named fields; never imports the host)."""

import math
from dataclasses import dataclass

import numpy as np
from shapely.geometry import LineString, Polygon

from ..engine import geometry
from ..engine import layout as engine
from .html import crs_text, format_number
from .style import INK
from .svg import MapLayer, map_svg, strata_layer

REFERENCES = (
    "Robertson, B. L., Brown, J. A., McDonald, T. & Jaksons, P. (2013). BAS: Balanced acceptance "
    "sampling of natural resources. Biometrics 69, 776-784.",
    "Halton, J. H. (1960). On the efficiency of certain quasi-random sequences of points in evaluating "
    "multi-dimensional integrals. Numerische Mathematik 2, 84-90.",
    "Stevens, D. L. & Olsen, A. R. (2004). Spatially balanced sampling of natural resources. Journal of "
    "the American Statistical Association 99, 262-278.",
    "Cochran, W. G. (1977). Sampling Techniques, 3rd ed. Wiley (ch. 5 stratified, ch. 8 systematic sampling).",
    "Cordy, C. B. (1993). An extension of the Horvitz-Thompson theorem to point sampling from a continuous "
    "universe. Statistics & Probability Letters 18, 353-362.",
    "Diggle, P. J. (2003). Statistical Analysis of Spatial Point Patterns, 2nd ed. Arnold (simple sequential "
    "inhibition).",
    "Turk, G. (1990). Generating random points in triangles. In Graphics Gems, ed. A. Glassner, 24-28. "
    "Academic Press.",
    "Gregoire, T. G. & Valentine, H. T. (2008). Sampling Strategies for Natural Resources and the Environment. "
    "Chapman & Hall/CRC, ch. 10 (plus sampling at the edges).",
)

MAX_MAP_UNITS = 3000  # more units than this are drawn as a systematic subset on the report map


@dataclass(frozen=True)
class LayoutReportInputs:
    """Names and settings the layout report shows (host-free).

    ``stratum_field`` and ``n_field`` are None when not given; ``crs`` names the computation CRS
    (``"EPSG:32736 (WGS 84 / UTM zone 36S)"``) and ``projected_from`` the frame's own CRS when it
    was projected.
    """

    frame: str
    seed: int
    crs: str
    stratum_field: object = None
    n_field: object = None
    n_units: int = 0
    projected_from: object = None


def _design_name(report, spec):
    return report.translate("PlotwiseEngine", engine.DESIGNS[spec.design])


def layout_report(report, result, frame, inputs, warnings):
    """Fill ``report`` with the units of ``result`` drawn over ``frame`` (the prepared strata); returns it."""
    spec = result.spec
    report.title = report.translate("PlotwiseReport", "Sample-unit layout")
    report.field_safety()
    report.warnings(warnings)
    primary = result.is_primary
    report.key_figures([
        (report.translate("PlotwiseReport", "primary units"), format_number(int(primary.sum()))),
        (report.translate("PlotwiseReport", "reserve units"), format_number(int((~primary).sum()))),
        (report.translate("PlotwiseReport", "strata"), format_number(len(result.strata))),
        (report.translate("PlotwiseReport", "design"), _design_name(report, spec)),
    ])
    report.section(report.translate("PlotwiseReport", "Replacing units in the field"))
    report.note(report.translate(
        "PlotwiseReport",
        "A primary unit that cannot be surveyed (no safe access, no permission, flooded, ...) is replaced "
        "by the next unused reserve unit of the same stratum, in draw order (draw_ord). Record the primary "
        "as not surveyed and why; never move a unit to a more convenient place, and never take a reserve "
        "of another stratum. Reserves carry the same incl_p and weight as the primaries they replace."))
    _units_per_stratum(report, result)
    _edges_and_inclusion(report, spec)
    report.section(report.translate("PlotwiseReport", "Map"))
    report.figure(layout_map(report, result, frame),
                  report.translate("PlotwiseReport", "Strata (filled), primary units (dark) and reserve units (light)"))
    report.section(report.translate("PlotwiseReport", "Method"))
    report.paragraph(method_text(report, spec))
    _parameters(report, spec, inputs)
    report.references(REFERENCES)
    return report


def _units_per_stratum(report, result):
    systematic = result.spec.design == engine.SYSTEMATIC_GRID
    report.section(report.translate("PlotwiseReport", "Units per stratum"))
    header = [report.translate("PlotwiseReport", "Stratum"), report.translate("PlotwiseReport", "Area (ha)"),
              report.translate("PlotwiseReport", "Effective area (ha)"),
              report.translate("PlotwiseReport", "Units asked"), report.translate("PlotwiseReport", "Primary"),
              report.translate("PlotwiseReport", "Reserve"), report.translate("PlotwiseReport", "incl_p"),
              report.translate("PlotwiseReport", "weight")]
    if systematic:
        header += [report.translate("PlotwiseReport", "Grid spacing (m)"),
                   report.translate("PlotwiseReport", "Grid rotation (°)")]
    rows = []
    for s in result.strata:
        row = [report.translate("PlotwiseReport", "frame") if s.key is None else str(s.key), s.area / 1e4,
               s.effective_area / 1e4, s.n_requested, s.n_primary, s.n_reserve, s.incl_p,
               1.0 / s.incl_p if s.incl_p and s.incl_p > 0 else None]
        if systematic:
            row += [s.spacing, s.rotation]
        rows.append(row)
    report.table(header, rows)


def _edges_and_inclusion(report, spec):
    """What incl_p means for these units, how the edges were handled, and the grid's realised n."""
    if not (spec.unit_area > 0):
        report.paragraph(report.translate(
            "PlotwiseReport",
            "incl_p is the inclusion density n/A per m² (the units have no area of their own); weight = A/n is "
            "the area in m² each unit stands for (Cordy 1993)."))
    else:
        report.paragraph(report.translate(
            "PlotwiseReport",
            "incl_p = n × unit area / stratum area is each unit's first-order inclusion probability; "
            "weight = 1/incl_p."))
    if not spec.inside and spec.reach > 0:
        report.paragraph(report.translate(
            "PlotwiseReport",
            "Plus sampling: centres were drawn over each stratum grown by {r} m (the unit's reach), so "
            "units near the edge reach over it, and some centres lie outside their stratum. Survey only the "
            "part of each unit inside its own stratum and count only the animals there (the map shows the "
            "strata); a unit that reaches nothing of its stratum counts 0. Never cross into excluded or "
            "unsafe ground to reach a centre: survey the part inside the stratum from within it. The "
            "effective area is the grown area, and plotwise:estimate expands the counts to it (Gregoire & "
            "Valentine 2008, ch. 10).").format(r=format_number(spec.reach)))
    if spec.inside and spec.radius > 0:
        report.paragraph(report.translate(
            "PlotwiseReport",
            "Units are kept wholly inside their stratum: centres were drawn from the stratum shrunk by {r} m "
            "(the unit's circumscribing radius). The effective area is that shrunk area and the inclusion "
            "probabilities use it; the edge strip is covered less often, which the report of the estimate "
            "should mention.").format(r=format_number(spec.radius)))
    if spec.design == engine.SYSTEMATIC_GRID:
        report.paragraph(report.translate(
            "PlotwiseReport",
            "The grid spacing is √(A/n) for the asked n; with a random start the realised number of units "
            "varies around n (column Primary) while the inclusion density stays n/A everywhere."))


def _parameters(report, spec, inputs):
    bearing = (report.translate("PlotwiseReport", "random") if spec.bearing == engine.RANDOM_BEARING
               else spec.bearing)
    inside = report.translate("PlotwiseReport", "yes") if spec.inside else report.translate("PlotwiseReport", "no")
    report.parameters({
        report.translate("PlotwiseReport", "Frame (FRAME)"): inputs.frame,
        report.translate("PlotwiseReport", "Stratum field (STRATUM_FIELD)"):
            inputs.stratum_field or report.translate("PlotwiseReport", "(none: one stratum)"),
        report.translate("PlotwiseReport", "Units per stratum field (N_FIELD)"):
            inputs.n_field or report.translate("PlotwiseReport", "(none)"),
        report.translate("PlotwiseReport", "Total units (N_UNITS)"):
            inputs.n_units if not inputs.n_field else report.translate("PlotwiseReport", "(not used)"),
        report.translate("PlotwiseReport", "Design (DESIGN)"): _design_name(report, spec),
        report.translate("PlotwiseReport", "Unit shape (SHAPE)"):
            report.translate("PlotwiseEngine", engine.SHAPES[spec.shape]),
        report.translate("PlotwiseReport", "Unit size (SIZE, m)"): spec.size,
        report.translate("PlotwiseReport", "Bearing (BEARING, degrees)"): bearing,
        report.translate("PlotwiseReport", "Keep inside (INSIDE)"): inside,
        report.translate("PlotwiseReport", "Minimum spacing (MIN_SPACING, m)"): spec.min_spacing,
        report.translate("PlotwiseReport", "Reserves per stratum (RESERVE)"): spec.reserve,
        report.translate("PlotwiseReport", "Seed (SEED)"): inputs.seed,
        report.translate("PlotwiseReport", "CRS of the computation and the output"):
            crs_text(report, inputs.crs, inputs.projected_from),
    })


def method_text(report, spec):
    """How the design drew the units, in words."""
    if spec.design == engine.SIMPLE_RANDOM:
        text = report.translate(
            "PlotwiseReport",
            "Simple random: every centre is an independent uniform point of its stratum (a "
            "triangle chosen with probability proportional to its area, then a uniform point in it).")
    elif spec.design == engine.SYSTEMATIC_GRID:
        text = report.translate(
            "PlotwiseReport",
            "Systematic grid: a square grid with a uniform random start in one grid cell "
            "and a rotation, per stratum; reserves are the centres of the grid cells, in random order.")
    else:
        text = report.translate(
            "PlotwiseReport",
            "Spatially balanced: balanced acceptance sampling (Robertson et al. 2013). "
            "A Halton sequence in bases 2 and 3 is laid over the stratum's bounding box and "
            "its points inside the stratum are kept in order. The random start is a uniform "
            "random point of the stratum, so that every location has the same chance for "
            "any sample size; reserves are the next points of the same sequence.")
    if spec.min_spacing > 0:
        text += " " + report.translate(
            "PlotwiseReport",
            "A candidate closer than {d} m to an accepted unit is passed over (simple sequential "
            "inhibition), which lowers the chance of locations next to units slightly.").format(
            d=format_number(spec.min_spacing))
    return text


def layout_map(report, result, frame):
    """Strata filled by category, primary units dark, reserves light (plots as outlines when large enough)."""
    layer, pixel = strata_layer(report, frame.strata, geometry.thinned_outline)
    layers = [layer]
    primary = result.is_primary
    spec = result.spec
    small = 2 * spec.radius < 6 * pixel  # plots under a few pixels are drawn as their centres
    outlined = spec.shape == engine.LINE or (spec.shape in (engine.SQUARE, engine.CIRCLE) and not small)
    for role_mask, label, fill in ((primary, report.translate("PlotwiseReport", "primary units"), INK),
                                   (~primary, report.translate("PlotwiseReport", "reserve units"), "#ffffff")):
        idx = np.flatnonzero(role_mask)
        if len(idx) > MAX_MAP_UNITS:
            idx = idx[:: int(math.ceil(len(idx) / MAX_MAP_UNITS))]
        if len(idx) == 0:
            continue
        outlines = tuple(_unit_shape(result, i) for i in idx) if outlined else ()
        layers.append(MapLayer(outlines, label=label, fill=fill, stroke=INK, stroke_width=0.8, point_radius=2.5,
                               points=result.centres[idx] if not outlines else None))
    return map_svg(layers)


def _unit_shape(result, i):
    xy = result.outlines[i]
    if result.spec.shape == engine.LINE:
        return LineString(xy)
    return Polygon(xy)
