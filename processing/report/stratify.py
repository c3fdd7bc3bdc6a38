"""The report of plotwise:stratify, built from :class:`gdal_io.stratify_pipeline.RasterStratification`
(named fields; never imports the host)."""

from dataclasses import dataclass

import numpy as np
from shapely import wkb
from shapely.geometry import MultiPolygon
from shapely.ops import unary_union

from ..engine import stratification as strat
from ..gdal_io.patches import speck_cells
from .html import crs_text, format_number
from .style import INK
from .svg import MapLayer, category_colour, map_svg, stacked_histogram_svg

REFERENCES = [
    "Cochran, W. G. (1977) Sampling Techniques, 3rd ed. Wiley. Ch. 5 (gain from stratification) and "
    "5A (construction of strata, the cum √f rule).",
    "Dalenius, T. & Hodges, J. L. (1959) Minimum variance stratification. Journal of the American "
    "Statistical Association 54:88–101.",
    "Hyndman, R. J. & Fan, Y. (1996) Sample quantiles in statistical packages. The American "
    "Statistician 50:361–365 (definition 7).",
    "Arthur, D. & Vassilvitskii, S. (2007) k-means++: the advantages of careful seeding. Proceedings of "
    "the 18th ACM-SIAM Symposium on Discrete Algorithms, 1027–1035.",
    "Lloyd, S. P. (1982) Least squares quantization in PCM. IEEE Transactions on Information Theory 28:129–137.",
]


@dataclass(frozen=True)
class StratifyReportInputs:
    """What the stratify report shows besides the result (host-free).

    ``labels`` are the strata's labels in the report's language (the result holds engine
    messages); ``seed`` is the seed of a k-means run, None for the other methods; ``crs`` names
    the computation CRS (``"EPSG:32736 (WGS 84 / UTM zone 36S)"``) and ``projected_from`` the
    frame's own CRS when it was projected.
    """

    frame: str
    covariates: tuple
    method: int
    n_strata: int
    min_area_ha: float
    crs: str
    labels: tuple
    frame_polygons: tuple
    seed: object = None
    projected_from: object = None


def stratify_report(report, result, shapes, inputs, warnings):
    """Fill ``report`` with the strata of ``result`` (polygons ``shapes``, one per stratum); returns it."""
    report.title = report.translate("PlotwiseReport", "Strata from raster covariates")
    report.field_safety()
    report.warnings(warnings)
    _key_figures(report, result)
    _strata(report, result, inputs)
    _merging(report, result, inputs.min_area_ha)
    _method(report, result, inputs)
    _variance_explained(report, result)
    _histogram(report, result)
    report.section(report.translate("PlotwiseReport", "Map"))
    shown = shapes if result.map_polygons is None else [wkb.loads(bytes(b)) for b in result.map_polygons]
    report.figure(strata_map(shown, inputs.frame_polygons, inputs.labels),
                  report.translate("PlotwiseReport", "Strata within the sampling frame"))
    _coverage(report, result)
    _parameters(report, inputs)
    report.references(REFERENCES)
    return report


def _key_figures(report, result):
    stats = result.result.statistics
    covered_ha = float(result.area_ha.sum())
    report.key_figures([
        (report.translate("PlotwiseReport", "strata"), str(stats.n_strata)),
        (report.translate("PlotwiseReport", "area stratified (ha)"), format_number(covered_ha)),
        (report.translate("PlotwiseReport", "frame covered"), f"{format_number(100 * result.coverage)} %"),
        (report.translate("PlotwiseReport", "R² of {name}").format(name=result.names[0]),
         format_number(float(stats.r_squared()[0]))),
    ])
    report.note(report.translate(
        "PlotwiseReport",
        "The strata cover the frame's cells that have a value in every covariate ({ha} ha). A survey "
        "allocated on these strata speaks for that area only."
    ).format(ha=format_number(covered_ha)))


def _strata(report, result, inputs):
    stats = result.result.statistics
    covered_ha = float(result.area_ha.sum())
    report.section(report.translate("PlotwiseReport", "Strata"))
    header = [report.translate("PlotwiseReport", "Stratum"), report.translate("PlotwiseReport", "Label"),
              report.translate("PlotwiseReport", "Area (ha)"), report.translate("PlotwiseReport", "% of area"),
              report.translate("PlotwiseReport", "Cells")]
    for name, unit in zip(result.names, result.units):
        u = f" ({unit})" if unit else ""
        header += [report.translate("PlotwiseReport", "{name} mean").format(name=name) + u,
                   report.translate("PlotwiseReport", "{name} SD").format(name=name) + u]
    rows = []
    for h in range(stats.n_strata):
        row = [h + 1, inputs.labels[h], float(result.area_ha[h]), 100 * float(result.area_ha[h]) / covered_ha,
               int(stats.count[h])]
        for c in range(len(result.names)):
            row += [float(stats.mean[h, c]), float(stats.sd[h, c])]
        rows.append(row)
    report.table(header, rows)


def _merging(report, result, min_area):
    """How patches below the minimum area were merged, and what is left of them."""
    if result.sieve_cells <= 1:
        return
    if not result.patches_merged:
        report.paragraph(report.translate(
            "PlotwiseReport",
            "Patches smaller than {ha} ha ({cells} cells) were merged into their largest neighbour (GDAL "
            "sieve, 4-connected) before polygonising; areas and statistics are those after merging, so a "
            "stratum may hold a few cells that the rule alone would have put in a neighbouring stratum."
        ).format(ha=format_number(min_area), cells=result.sieve_cells))
    else:
        report.paragraph(report.translate(
            "PlotwiseReport",
            "Patches smaller than {ha} ha ({cells} cells) were merged before polygonising (4-connected): "
            "specks of fewer than {specks} cells into their largest neighbour (GDAL sieve), then {n} more "
            "patches, smallest first, each into the neighbouring stratum that made the smallest patch of at "
            "least {ha} ha (or, failing that, the largest patch), so that a mosaic of small patches is not "
            "swallowed by one growing patch. Areas and statistics are those after merging, so a stratum may "
            "hold cells that the rule alone would have put in another stratum."
        ).format(ha=format_number(min_area), cells=result.sieve_cells,
                 specks=speck_cells(result.sieve_cells), n=result.patches_merged))
    if result.small_patches:
        report.paragraph(report.translate(
            "PlotwiseReport",
            "{n} patch(es) covering {area} ha touch no other stratum (islands of the frame, or patches "
            "ringed by NoData) and stay smaller than {ha} ha."
        ).format(n=result.small_patches, area=format_number(result.small_patches_ha),
                 ha=format_number(min_area)))
    else:
        report.paragraph(report.translate(
            "PlotwiseReport", "Every patch of the strata now covers at least {ha} ha.").format(
            ha=format_number(min_area)))


def _method(report, result, inputs):
    res = result.result
    name = result.names[0]
    report.section(report.translate("PlotwiseReport", "Method: {name}").format(
        name=strat.METHOD_NAMES[inputs.method]))
    if res.boundaries is not None:
        _boundaries(report, res, inputs.method, name)
    elif res.kmeans is not None:
        report.paragraph(report.translate(
            "PlotwiseReport",
            "Covariates standardised with their mean and SD over the frame; k-means++ seeds and Lloyd "
            "iterations on a random sample of {m} cells (seed {seed}); {it} iterations. Then every cell "
            "went to its nearest centre."
        ).format(m=f"{res.sample_size:,}", seed=inputs.seed if inputs.seed is not None else "–",
                 it=res.kmeans.iterations))
    else:
        report.paragraph(report.translate(
            "PlotwiseReport", "Each class of '{name}' is one stratum ({k} classes).").format(
            name=name, k=res.statistics.n_strata))


def _boundaries(report, res, method, name):
    lo, hi = strat.stratum_ranges(res)
    d = strat.display_decimals(np.concatenate([lo, hi]))
    report.paragraph(report.translate(
        "PlotwiseReport", "Stratum h holds the cells with b(h−1) ≤ {name} < b(h). Boundaries on {name}:"
    ).format(name=name))
    report.table([report.translate("PlotwiseReport", "Boundary"), report.translate("PlotwiseReport", "Value")],
                 [[i + 1, strat.format_covariate_value(b, d + 2)] for i, b in enumerate(res.boundaries)])
    if method == strat.QUANTILE:
        report.paragraph(report.translate(
            "PlotwiseReport",
            "Exact sample quantiles at h/k of the frame's cells (Hyndman & Fan 1996, definition 7), "
            "found in two passes: a 64,000-class histogram locates each quantile, then the cells of "
            "that class are sorted."))
    elif method == strat.CUM_ROOT_F:
        report.paragraph(report.translate(
            "PlotwiseReport",
            "Dalenius & Hodges (1959): on a {n}-class histogram of {name}, the boundaries are the "
            "class tops where the cumulative √f is nearest to h/k of its total."
        ).format(n=strat.CUM_ROOT_F_CLASSES, name=name))


def _variance_explained(report, result):
    stats = result.result.statistics
    report.section(report.translate("PlotwiseReport", "Share of covariate variance explained by the strata (R²)"))
    report.table([report.translate("PlotwiseReport", "Covariate"), report.translate("PlotwiseReport", "Mean"),
                  report.translate("PlotwiseReport", "SD"), report.translate("PlotwiseReport", "R²")],
                 [[n, float(m), float(s), float(r)] for n, m, s, r in
                  zip(result.names, stats.overall_mean(), stats.overall_sd(), stats.r_squared())])
    report.paragraph(report.translate(
        "PlotwiseReport",
        "R² = 1 − Σ N_h S_h² / (N S²): the between-strata share of the covariate's variance over the cells. "
        "For a quantity that follows the covariate exactly, proportional allocation over these strata "
        "would lower the variance of the estimated mean by this share compared with simple random "
        "sampling (Cochran 1977, ch. 5, large-population approximation). The gain for animal density "
        "is smaller the less closely density follows the covariate."))


def _histogram(report, result):
    res = result.result
    stats = res.statistics
    k = stats.n_strata
    name = result.names[0]
    report.section(report.translate("PlotwiseReport", "Histogram of {name}").format(name=name))
    lo, hi = stats.chart_range
    if not (np.isfinite(lo) and np.isfinite(hi) and hi > lo):
        return
    edges = np.linspace(lo, hi, strat.CHART_BINS + 1)
    marks = res.boundaries if res.boundaries is not None else ()
    chart = stacked_histogram_svg(
        edges, stats.chart_counts, [category_colour(h) for h in range(k)],
        labels=[report.translate("PlotwiseReport", "stratum {h}").format(h=h + 1) for h in range(k)], marks=marks,
        x_label=name, y_label=report.translate("PlotwiseReport", "cells"))
    if len(marks):
        caption = report.translate(
            "PlotwiseReport", "Frame cells by {name}, coloured by stratum; dashed lines: stratum boundaries.")
    else:
        caption = report.translate(
            "PlotwiseReport",
            "Frame cells by {name}, coloured by stratum (k-means strata may overlap on one covariate).")
    report.figure(chart, caption.format(name=name))


def _coverage(report, result):
    report.section(report.translate("PlotwiseReport", "Coverage"))
    report.table([report.translate("PlotwiseReport", "Item"), report.translate("PlotwiseReport", "Value")], [
        [report.translate("PlotwiseReport", "frame area (ha)"), float(result.frame_ha)],
        [report.translate("PlotwiseReport", "frame area outside the first covariate's extent (ha)"),
         float(result.outside_ha)],
        [report.translate("PlotwiseReport", "frame cells with NoData in a covariate (ha)"),
         float(result.nodata_ha)],
        [report.translate("PlotwiseReport", "area stratified (ha)"), float(result.area_ha.sum())],
        [report.translate("PlotwiseReport", "share of the frame covered"),
         f"{format_number(100 * result.coverage)} %"],
        [report.translate("PlotwiseReport", "cells stratified"), int(result.result.cells_valid)],
        [report.translate("PlotwiseReport", "cell size (m)"), float(np.sqrt(result.grid.cell_area))],
        [report.translate("PlotwiseReport", "grid"), f"{result.grid.width} × {result.grid.height}"],
        [report.translate("PlotwiseReport", "covariates warped on the fly"),
         ", ".join(result.warped) or report.translate("PlotwiseReport", "none")],
    ])


def _parameters(report, inputs):
    method_name = strat.METHOD_NAMES[inputs.method]
    n_strata = (inputs.n_strata if inputs.method != strat.RASTER_CLASSES
                else report.translate("PlotwiseReport", "ignored"))
    params = {
        report.translate("PlotwiseReport", "Sampling frame (FRAME)"): inputs.frame,
        report.translate("PlotwiseReport", "Covariates (COVARIATES)"): ", ".join(inputs.covariates),
        report.translate("PlotwiseReport", "Method (METHOD)"): f"{inputs.method} ({method_name})",
        report.translate("PlotwiseReport", "Number of strata (STRATA)"): n_strata,
        report.translate("PlotwiseReport", "Minimum patch area (MIN_AREA, ha)"): inputs.min_area_ha,
        report.translate("PlotwiseReport", "CRS of the computation and the outputs"):
            crs_text(report, inputs.crs, inputs.projected_from),
    }
    if inputs.seed is not None:
        params[report.translate("PlotwiseReport", "Seed (SEED)")] = inputs.seed
    report.parameters(params)


def strata_map(shapes, frame_polygons, labels):
    """The strata (one colour each, simplified to about half a pixel) inside the frame's outline."""
    frame = unary_union(frame_polygons)
    minx, miny, maxx, maxy = frame.bounds
    tolerance = max(maxx - minx, maxy - miny) / 1800.0  # about half a pixel at 900 px
    shown, fills, legend = [], [], []
    for h, shape in enumerate(shapes):
        simple = shape.simplify(tolerance, preserve_topology=True)
        parts = [p for p in getattr(simple, "geoms", [simple]) if p.area >= (2 * tolerance) ** 2]
        if parts:
            shown.append(MultiPolygon(parts))
            fills.append(category_colour(h))
        legend.append((f"{h + 1}: {labels[h]}", category_colour(h)))
    layers = [MapLayer(tuple(shown), fills=tuple(fills), stroke="none", stroke_width=0, opacity=0.85,
                       legend=tuple(legend)),
              MapLayer((frame.boundary,), label="", stroke=INK, stroke_width=1.2)]
    return map_svg(layers)
