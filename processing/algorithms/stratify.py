"""plotwise:stratify: strata from raster covariates, as a stratum raster and one polygon per stratum."""
import numpy as np
from qgis.core import (
    QgsProcessingException,
    QgsProcessingOutputNumber,
    QgsProcessingParameterEnum,
    QgsProcessingParameterFeatureSink,
    QgsProcessingParameterFeatureSource,
    QgsProcessingParameterMultipleLayers,
    QgsProcessingParameterNumber,
    QgsProcessingParameterRasterDestination,
    QgsRasterLayer,
)
from shapely import wkb as shapely_wkb

from .. import compat
from .. import bridge
from ..gdal_io.covariate_stack import Covariate
from ..gdal_io.patches import DEFAULT_MIN_AREA_HA, MAX_POLYGON_PATCHES, MAX_SIEVE_PATCHES, speck_cells
from ..gdal_io.stratify_pipeline import stratify_rasters
from ..engine import stratification as strat
from ..report import MapLayer, category_colour, format_number, map_svg
from ..report.svg import stacked_histogram_svg
from ..report.style import INK
from .base import PlotwiseAlgorithm

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

MAX_COVARIATES = 10  # cov10_mean is the longest field name that fits in 10 characters


def covariate_fields(n_covariates):
    """Output field names per covariate: ``cov_mean``/``cov_sd`` for the first, ``cov2_mean``... after."""
    names = []
    for i in range(n_covariates):
        tag = "cov" if i == 0 else f"cov{i + 1}"
        names.append((f"{tag}_mean", f"{tag}_sd"))
    return names


class Stratify(PlotwiseAlgorithm):
    """Strata from one or more raster covariates, clipped to the sampling frame."""

    ALGORITHM_NAME = "stratify"
    GROUP_ID = "design"

    FRAME = "FRAME"
    COVARIATES = "COVARIATES"
    METHOD = "METHOD"
    STRATA = "STRATA"
    MIN_AREA = "MIN_AREA"
    OUTPUT_RASTER = "OUTPUT_RASTER"
    OUTPUT = "OUTPUT"
    N_STRATA = "N_STRATA"
    R_SQUARED = "R_SQUARED"

    def method_names(self):
        return [
            self.tr("Quantile (equal areas on the first covariate)"),
            self.tr("Equal interval (on the first covariate)"),
            self.tr("Cumulative root frequency (Dalenius–Hodges, first covariate)"),
            self.tr("k-means (all covariates, standardised)"),
            self.tr("Raster classes (each class of the first covariate)"),
        ]

    def displayName(self):  # noqa: N802 (host naming)
        return self.tr("Stratify from raster covariates")

    def shortHelpString(self):  # noqa: N802 (host naming)
        return self.tr(
            "<p>Draws strata (zones of similar expected density) from raster covariates such as elevation, "
            "a vegetation index or a land-cover map. Only cells whose centre lies inside the sampling "
            "frame count. A cell with NoData in any covariate is left out and its area reported.</p>"
            "<p>The covariates are put on the grid of the first one, in the frame's CRS (a geographic frame "
            "is projected to the UTM zone of its centre). Rasters in another CRS or on another grid are "
            "warped on the fly (bilinear; nearest neighbour for raster classes). Rasters are read block by "
            "block, so memory stays bounded whatever their size.</p>"
            "<h3>Methods</h3><ul>"
            "<li><b>Quantile</b>: strata of equal area along the first covariate. The boundaries are the "
            "exact sample quantiles of the frame's cells (Hyndman &amp; Fan 1996, definition 7).</li>"
            "<li><b>Equal interval</b>: the first covariate's range cut into equal widths.</li>"
            "<li><b>Cumulative root frequency</b>: the Dalenius &amp; Hodges (1959) rule on a 100-class "
            "histogram of the first covariate (Cochran 1977, ch. 5A).</li>"
            "<li><b>k-means</b>: all covariates standardised to mean 0 and SD 1, k-means++ seeds (Arthur "
            "&amp; Vassilvitskii 2007) and Lloyd iterations on a random sample of 100,000 cells drawn with "
            "the seed; then every cell goes to its nearest centre.</li>"
            "<li><b>Raster classes</b>: each value of the first covariate (a categorical raster, at most 50 "
            "classes) is one stratum; the number of strata is ignored.</li></ul>"
            "<p>Strata are numbered 1..k by increasing mean of the first covariate. Patches (4-connected) smaller "
            "than the minimum patch area (ha) join a neighbouring stratum before the strata are turned into "
            "polygons: specks through GDAL's sieve, then each small patch, smallest first, the neighbour that "
            "brings it to the minimum area. A patch that touches no other stratum stays, with a warning.</p>"
            "<h3>Outputs</h3><ul>"
            "<li>Stratum raster: the stratum of each cell (0 = none).</li>"
            "<li>Strata: one multipolygon per stratum with <i>stratum</i>, <i>label</i>, <i>area_ha</i> "
            "(cells × cell area), <i>cov_mean</i> and <i>cov_sd</i> of the first covariate, and "
            "<i>cov2_mean</i>, <i>cov2_sd</i>, … for the others (SD over the stratum's cells).</li>"
            "<li>Report: boundaries, areas, covariate statistics per stratum, the share of each covariate's "
            "variance the strata explain (R²), a histogram with the boundaries and a map.</li></ul>"
            "<p>The random seed is used by k-means only (0 draws one and records it).</p>"
            "<p>Strata are a statistical device: before fieldwork, check every unit's access and safety.</p>"
        ) + self.tr(
            "<h3>Minimum patch area</h3>"
            "<p>The default of {default:g} ha is chosen for field teams: a patch smaller than a few sample units "
            "is not a stratum. Four 20 m × 20 m plots 50 m apart need about 1 ha; a zone smaller than that "
            "cannot hold the units a stratum needs for its own variance, and on the map it is noise of the "
            "covariate, not a zone to survey. Raise it for larger units (transects, camera stations); 0 keeps "
            "every cell's stratum.</p>"
            "<p>A speckled covariate (a 10 m vegetation index, a noisy classification) can form millions of "
            "patches. The patches are counted before they are merged and before they are turned into polygons: "
            "strata with more than {max_patches:,} patches stop the run with an error that gives their number and "
            "a MIN_AREA that brings them under the limit, and a covariate too speckled to merge in bounded memory "
            "(more than {max_sieve:,} patches) stops it with advice to smooth or coarsen the covariate first. "
            "When the patches left after merging the specks are too many to merge one by one, patches below "
            "MIN_AREA first join their largest neighbour (the rule of GDAL's sieve filter), with a warning.</p>"
        ).format(default=DEFAULT_MIN_AREA_HA, max_patches=MAX_POLYGON_PATCHES, max_sieve=MAX_SIEVE_PATCHES)

    def initAlgorithm(self, config=None):  # noqa: N802 (host naming)
        self.addParameter(QgsProcessingParameterFeatureSource(
            self.FRAME, self.tr("Sampling frame"), [compat.TYPE_VECTOR_POLYGON]))
        self.addParameter(QgsProcessingParameterMultipleLayers(
            self.COVARIATES, self.tr("Raster covariates (band 1 of each; the first one sets the grid)"),
            compat.TYPE_RASTER))
        self.addParameter(QgsProcessingParameterEnum(
            self.METHOD, self.tr("Method"), options=self.method_names(), defaultValue=0))
        self.addParameter(QgsProcessingParameterNumber(
            self.STRATA, self.tr("Number of strata (ignored for raster classes)"), type=compat.NUMBER_INTEGER,
            defaultValue=4, minValue=2, maxValue=strat.MAX_CLASSES))
        self.addParameter(QgsProcessingParameterNumber(
            self.MIN_AREA, self.tr("Minimum patch area (ha); smaller patches join a neighbour"),
            type=compat.NUMBER_DOUBLE, defaultValue=DEFAULT_MIN_AREA_HA, minValue=0.0))
        self.add_seed_parameter()
        self.addParameter(QgsProcessingParameterRasterDestination(self.OUTPUT_RASTER, self.tr("Stratum raster")))
        self.addParameter(QgsProcessingParameterFeatureSink(
            self.OUTPUT, self.tr("Strata"), compat.TYPE_VECTOR_POLYGON))
        self.add_report_parameter()
        self.addOutput(QgsProcessingOutputNumber(self.N_STRATA, self.tr("Number of strata formed")))
        self.addOutput(QgsProcessingOutputNumber(
            self.R_SQUARED, self.tr("Share of the first covariate's variance explained by the strata (R²)")))

    # -- inputs ----------------------------------------------------------------------
    def _covariates(self, parameters, context):
        layers = self.parameterAsLayerList(parameters, self.COVARIATES, context)
        if not layers:
            raise QgsProcessingException(self.tr("Give at least one raster in COVARIATES."))
        if len(layers) > MAX_COVARIATES:
            raise QgsProcessingException(self.tr(
                "COVARIATES holds {n} rasters; use at most {m}.").format(n=len(layers), m=MAX_COVARIATES))
        covariates = []
        for layer in layers:
            if not isinstance(layer, QgsRasterLayer):
                raise QgsProcessingException(self.tr("COVARIATES: '{name}' is not a raster layer.").format(
                    name=layer.name()))
            if layer.providerType() != "gdal":
                raise QgsProcessingException(self.tr(
                    "Covariate '{name}' is not a file raster that GDAL can read. Save it as a GeoTIFF first."
                ).format(name=layer.name()))
            covariates.append(Covariate(layer.source(), layer.name(), 1))
        names = [c.name for c in covariates]
        if len(set(names)) < len(names):  # same layer name twice: number them for the report
            covariates = [Covariate(c.path, f"{c.name} ({i + 1})", 1) for i, c in enumerate(covariates)]
        return covariates

    # -- run -------------------------------------------------------------------------
    def processAlgorithm(self, parameters, context, feedback):  # noqa: N802 (host naming)
        source = self.parameterAsSource(parameters, self.FRAME, context)
        if source is None:
            raise QgsProcessingException(self.invalidSourceError(parameters, self.FRAME))
        frame_name = source.sourceName() or self.FRAME
        covariates = self._covariates(parameters, context)
        method = self.parameterAsEnum(parameters, self.METHOD, context)
        n_strata = self.parameterAsInt(parameters, self.STRATA, context)
        min_area = self.parameterAsDouble(parameters, self.MIN_AREA, context)
        raster_path = self.parameterAsOutputLayer(parameters, self.OUTPUT_RASTER, context)

        crs = bridge.computation_crs(source.sourceCrs(), source.sourceExtent(), context, feedback, frame_name)
        projected_from = source.sourceCrs().authid() if crs != source.sourceCrs() else None
        records = bridge.read_features(source, crs, context, feedback, layer_name=frame_name)
        if feedback.isCanceled():
            raise self.cancelled_error()
        polygons = [g for g in records.geometries if g is not None and g.geom_type in ("Polygon", "MultiPolygon")]
        if not polygons:
            raise QgsProcessingException(self.tr(
                "Layer '{layer}' (FRAME) has no polygon with a positive area. Choose the sampling-frame layer."
            ).format(layer=frame_name))
        feedback.setProgress(5)

        seeded = self.seeded_generator(parameters, context, feedback) if method == strat.KMEANS else None
        with self.discard_on_failure(raster_path), self.engine_errors():
            result = stratify_rasters(
                covariates, [shapely_wkb.dumps(g) for g in polygons], bridge.crs_wkt(crs), method, n_strata,
                raster_path, min_area_ha=min_area, rng=None if seeded is None else seeded.generator,
                progress=self.progress_callback(feedback, 5, 90),
            )
        warnings = list(records.warnings) + [self.translate_message(w) for w in result.warnings]
        self.push_warnings(feedback, result.warnings)
        if result.warped:
            feedback.pushInfo(self.tr("Warped onto the grid of '{first}' in {crs}: {names}.").format(
                first=covariates[0].name, crs=crs.authid(), names=", ".join(result.warped)))

        stats = result.result.statistics
        k = stats.n_strata
        spec = [("stratum", "int"), ("label", "string", 160), ("area_ha", "double", 20, 4)]
        for mean_name, sd_name in covariate_fields(len(covariates)):
            spec += [(mean_name, "double", 20, 6), (sd_name, "double", 20, 6)]
        fields = bridge.make_fields(spec)
        sink, dest_id = self.parameterAsSink(parameters, self.OUTPUT, context, fields, compat.WKB_MULTIPOLYGON, crs)
        if sink is None:
            raise QgsProcessingException(self.invalidSinkError(parameters, self.OUTPUT))
        shapes = [shapely_wkb.loads(bytes(blob)) for blob in result.polygons]
        rows = []
        for h in range(k):
            row = [h + 1, self.translate_message(result.labels[h]), float(result.area_ha[h])]
            for c in range(len(covariates)):
                row += [float(stats.mean[h, c]), float(stats.sd[h, c])]
            rows.append(row)
        if not bridge.write_features(sink, fields, shapes, rows, feedback, (90, 96)):
            raise self.cancelled_error()

        r2 = stats.r_squared()
        feedback.pushInfo(self.tr("{k} strata on {ha} ha; R² of '{name}': {r2}.").format(
            k=k, ha=format_number(float(result.area_ha.sum())), name=covariates[0].name,
            r2=format_number(float(r2[0]))))
        outputs = {self.OUTPUT: dest_id, self.OUTPUT_RASTER: raster_path, self.N_STRATA: k,
                   self.R_SQUARED: float(r2[0])}
        report = self._report(result, shapes, polygons, method, n_strata, min_area, seeded, crs, projected_from,
                              warnings, frame_name, covariates)
        path = self.write_report(report, parameters, context, feedback)
        if path:
            outputs[self.REPORT] = path
        self.style_output(context, dest_id, "strata")
        self.style_output(context, raster_path, "strata_raster")
        feedback.setProgress(100)
        return outputs

    # -- report ----------------------------------------------------------------------
    def _report(self, result, shapes, frame_polygons, method, n_strata, min_area, seeded, crs, projected_from,
                warnings, frame_name, covariates):
        res = result.result
        stats = res.statistics
        names = result.names
        k = stats.n_strata
        report = self.new_report(self.tr("Strata from raster covariates"))
        report.field_safety()
        report.warnings(warnings)
        covered_ha = float(result.area_ha.sum())
        r2 = stats.r_squared()
        report.key_figures([
            (self.tr("strata"), str(k)),
            (self.tr("area stratified (ha)"), format_number(covered_ha)),
            (self.tr("frame covered"), f"{format_number(100 * result.coverage)} %"),
            (self.tr("R² of {name}").format(name=names[0]), format_number(float(r2[0]))),
        ])
        report.note(self.tr(
            "The strata cover the frame's cells that have a value in every covariate ({ha} ha). A survey "
            "allocated on these strata speaks for that area only."
        ).format(ha=format_number(covered_ha)))

        report.section(self.tr("Strata"))
        header = [self.tr("Stratum"), self.tr("Label"), self.tr("Area (ha)"), self.tr("% of area"), self.tr("Cells")]
        for name, unit in zip(names, result.units):
            u = f" ({unit})" if unit else ""
            header += [self.tr("{name} mean").format(name=name) + u, self.tr("{name} SD").format(name=name) + u]
        rows = []
        for h in range(k):
            row = [h + 1, self.translate_message(result.labels[h]), float(result.area_ha[h]),
                   100 * float(result.area_ha[h]) / covered_ha, int(stats.count[h])]
            for c in range(len(names)):
                row += [float(stats.mean[h, c]), float(stats.sd[h, c])]
            rows.append(row)
        report.table(header, rows)
        if result.sieve_cells > 1 and not result.patches_merged:
            report.paragraph(self.tr(
                "Patches smaller than {ha} ha ({cells} cells) were merged into their largest neighbour (GDAL "
                "sieve, 4-connected) before polygonising; areas and statistics are those after merging, so a "
                "stratum may hold a few cells that the rule alone would have put in a neighbouring stratum."
            ).format(ha=format_number(min_area), cells=result.sieve_cells))
        elif result.sieve_cells > 1:
            report.paragraph(self.tr(
                "Patches smaller than {ha} ha ({cells} cells) were merged before polygonising (4-connected): "
                "specks of fewer than {specks} cells into their largest neighbour (GDAL sieve), then {n} more "
                "patches, smallest first, each into the neighbouring stratum that made the smallest patch of at "
                "least {ha} ha (or, failing that, the largest patch), so that a mosaic of small patches is not "
                "swallowed by one growing patch. Areas and statistics are those after merging, so a stratum may "
                "hold cells that the rule alone would have put in another stratum."
            ).format(ha=format_number(min_area), cells=result.sieve_cells,
                     specks=speck_cells(result.sieve_cells), n=result.patches_merged))
        if result.sieve_cells > 1:
            if result.small_patches:
                report.paragraph(self.tr(
                    "{n} patch(es) covering {area} ha touch no other stratum (islands of the frame, or patches "
                    "ringed by NoData) and stay smaller than {ha} ha."
                ).format(n=result.small_patches, area=format_number(result.small_patches_ha),
                         ha=format_number(min_area)))
            else:
                report.paragraph(self.tr("Every patch of the strata now covers at least {ha} ha.").format(
                    ha=format_number(min_area)))

        method_name = strat.METHOD_NAMES[method]
        report.section(self.tr("Method: {name}").format(name=method_name))
        if res.boundaries is not None:
            lo, hi = strat.stratum_ranges(res)
            d = strat.display_decimals(np.concatenate([lo, hi]))
            report.paragraph(self.tr(
                "Stratum h holds the cells with b(h−1) ≤ {name} < b(h). Boundaries on {name}:"
            ).format(name=names[0]))
            report.table([self.tr("Boundary"), self.tr("Value")],
                         [[i + 1, strat.format_covariate_value(b, d + 2)] for i, b in enumerate(res.boundaries)])
            if method == strat.QUANTILE:
                report.paragraph(self.tr(
                    "Exact sample quantiles at h/k of the frame's cells (Hyndman & Fan 1996, definition 7), "
                    "found in two passes: a 64,000-class histogram locates each quantile, then the cells of "
                    "that class are sorted."))
            elif method == strat.CUM_ROOT_F:
                report.paragraph(self.tr(
                    "Dalenius & Hodges (1959): on a {n}-class histogram of {name}, the boundaries are the "
                    "class tops where the cumulative √f is nearest to h/k of its total."
                ).format(n=strat.CUM_ROOT_F_CLASSES, name=names[0]))
        elif res.kmeans is not None:
            fit = res.kmeans
            report.paragraph(self.tr(
                "Covariates standardised with their mean and SD over the frame; k-means++ seeds and Lloyd "
                "iterations on a random sample of {m} cells (seed {seed}); {it} iterations. Then every cell "
                "went to its nearest centre."
            ).format(m=f"{res.sample_size:,}", seed=seeded.seed if seeded else "–", it=fit.iterations))
        else:
            report.paragraph(self.tr("Each class of '{name}' is one stratum ({k} classes).").format(name=names[0], k=k))

        report.section(self.tr("Share of covariate variance explained by the strata (R²)"))
        report.table([self.tr("Covariate"), self.tr("Mean"), self.tr("SD"), self.tr("R²")],
                     [[n, float(m), float(s), float(r)] for n, m, s, r in
                      zip(names, stats.overall_mean(), stats.overall_sd(), r2)])
        report.paragraph(self.tr(
            "R² = 1 − Σ N_h S_h² / (N S²): the between-strata share of the covariate's variance over the cells. "
            "For a quantity that follows the covariate exactly, proportional allocation over these strata "
            "would lower the variance of the estimated mean by this share compared with simple random "
            "sampling (Cochran 1977, ch. 5, large-population approximation). The gain for animal density "
            "is smaller the less closely density follows the covariate."))

        report.section(self.tr("Histogram of {name}").format(name=names[0]))
        lo, hi = stats.chart_range
        if np.isfinite(lo) and np.isfinite(hi) and hi > lo:
            edges = np.linspace(lo, hi, strat.CHART_BINS + 1)
            marks = res.boundaries if res.boundaries is not None else ()
            colours = [category_colour(h) for h in range(k)]
            report.figure(
                stacked_histogram_svg(edges, stats.chart_counts, colours,
                                      labels=[self.tr("stratum {h}").format(h=h + 1) for h in range(k)], marks=marks,
                                      x_label=names[0], y_label=self.tr("cells")),
                self.tr("Frame cells by {name}, coloured by stratum; dashed lines: stratum boundaries.").format(
                    name=names[0]) if len(marks) else
                self.tr("Frame cells by {name}, coloured by stratum (k-means strata may overlap on one "
                   "covariate).").format(name=names[0]))

        report.section(self.tr("Map"))
        labels = [self.translate_message(label) for label in result.labels]
        shown = shapes if result.map_polygons is None else [shapely_wkb.loads(bytes(b)) for b in result.map_polygons]
        report.figure(self._map(shown, frame_polygons, labels), self.tr("Strata within the sampling frame"))

        report.section(self.tr("Coverage"))
        cell = result.grid.cell_area
        report.table([self.tr("Item"), self.tr("Value")], [
            [self.tr("frame area (ha)"), float(result.frame_ha)],
            [self.tr("frame area outside the first covariate's extent (ha)"), float(result.outside_ha)],
            [self.tr("frame cells with NoData in a covariate (ha)"), float(result.nodata_ha)],
            [self.tr("area stratified (ha)"), covered_ha],
            [self.tr("share of the frame covered"), f"{format_number(100 * result.coverage)} %"],
            [self.tr("cells stratified"), int(res.cells_valid)],
            [self.tr("cell size (m)"), float(np.sqrt(cell))],
            [self.tr("grid"), f"{result.grid.width} × {result.grid.height}"],
            [self.tr("covariates warped on the fly"), ", ".join(result.warped) or self.tr("none")],
        ])

        crs_text = f"{crs.authid()} ({crs.description()})"
        if projected_from:
            crs_text += self.tr(", projected from {src} (UTM zone of the frame's centre)").format(src=projected_from)
        params = {
            self.tr("Sampling frame (FRAME)"): frame_name,
            self.tr("Covariates (COVARIATES)"): ", ".join(c.name for c in covariates),
            self.tr("Method (METHOD)"): f"{method} ({method_name})",
            self.tr("Number of strata (STRATA)"): n_strata if method != strat.RASTER_CLASSES else self.tr("ignored"),
            self.tr("Minimum patch area (MIN_AREA, ha)"): min_area,
            self.tr("CRS of the computation and the outputs"): crs_text,
        }
        if seeded is not None:
            params[self.tr("Seed (SEED)")] = seeded.seed
        report.parameters(params)
        report.references(REFERENCES)
        return report

    @staticmethod
    def _map(shapes, frame_polygons, labels):
        from shapely.ops import unary_union

        frame = unary_union(frame_polygons)
        minx, miny, maxx, maxy = frame.bounds
        tolerance = max(maxx - minx, maxy - miny) / 1800.0  # about half a pixel at 900 px
        shown, fills, legend = [], [], []
        for h, shape in enumerate(shapes):
            simple = shape.simplify(tolerance, preserve_topology=True)
            parts = [p for p in getattr(simple, "geoms", [simple]) if p.area >= (2 * tolerance) ** 2]
            if parts:
                from shapely.geometry import MultiPolygon

                shown.append(MultiPolygon(parts))
                fills.append(category_colour(h))
            legend.append((f"{h + 1}: {labels[h]}", category_colour(h)))
        layers = [MapLayer(tuple(shown), fills=tuple(fills), stroke="none", stroke_width=0, opacity=0.85,
                           legend=tuple(legend)),
                  MapLayer((frame.boundary,), label="", stroke=INK, stroke_width=1.2)]
        return map_svg(layers)
