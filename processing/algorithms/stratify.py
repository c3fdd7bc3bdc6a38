"""plotwise:stratify: strata from raster covariates, as a stratum raster and one polygon per stratum."""
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
from ..gdal_io.patches import DEFAULT_MIN_AREA_HA, MAX_POLYGON_PATCHES, MAX_SIEVE_PATCHES
from ..gdal_io.stratify_pipeline import stratify_rasters
from ..engine import stratification as strat
from ..report import format_number
from ..report.stratify import StratifyReportInputs, stratify_report
from .base import PlotwiseAlgorithm

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
        records, polygons = self._frame_polygons(source, crs, context, feedback, frame_name)
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

        shapes = [shapely_wkb.loads(bytes(blob)) for blob in result.polygons]
        labels = [self.translate_message(label) for label in result.labels]
        dest_id = self._write_strata(parameters, context, feedback, result, shapes, labels, crs)

        k = result.result.statistics.n_strata
        r2 = result.result.statistics.r_squared()
        feedback.pushInfo(self.tr("{k} strata on {ha} ha; R² of '{name}': {r2}.").format(
            k=k, ha=format_number(float(result.area_ha.sum())), name=covariates[0].name,
            r2=format_number(float(r2[0]))))
        outputs = {self.OUTPUT: dest_id, self.OUTPUT_RASTER: raster_path, self.N_STRATA: k,
                   self.R_SQUARED: float(r2[0])}
        inputs = StratifyReportInputs(
            frame=frame_name, covariates=tuple(c.name for c in covariates), method=method, n_strata=n_strata,
            min_area_ha=min_area, crs=bridge.crs_label(crs), labels=tuple(labels),
            frame_polygons=tuple(polygons), seed=seeded.seed if seeded is not None else None,
            projected_from=projected_from)
        report = stratify_report(self.new_report(""), result, shapes, inputs, warnings)
        path = self.write_report(report, parameters, context, feedback)
        if path:
            outputs[self.REPORT] = path
        self.style_output(context, dest_id, "strata")
        self.style_output(context, raster_path, "strata_raster")
        feedback.setProgress(100)
        return outputs

    def _frame_polygons(self, source, crs, context, feedback, frame_name):
        """The frame's features in ``crs`` and its polygons (an error when it has none)."""
        records = bridge.read_features(source, crs, context, feedback, layer_name=frame_name)
        if feedback.isCanceled():
            raise self.cancelled_error()
        polygons = [g for g in records.geometries if g is not None and g.geom_type in ("Polygon", "MultiPolygon")]
        if not polygons:
            raise QgsProcessingException(self.tr(
                "Layer '{layer}' (FRAME) has no polygon with a positive area. Choose the sampling-frame layer."
            ).format(layer=frame_name))
        return records, polygons

    def _write_strata(self, parameters, context, feedback, result, shapes, labels, crs):
        """One feature per stratum: its label, area and the covariates' mean and SD; returns the sink's id."""
        stats = result.result.statistics
        n_covariates = len(result.names)
        spec = [("stratum", "int"), ("label", "string", 160), ("area_ha", "double", 20, 4)]
        for mean_name, sd_name in covariate_fields(n_covariates):
            spec += [(mean_name, "double", 20, 6), (sd_name, "double", 20, 6)]
        fields = bridge.make_fields(spec)
        sink, dest_id = self.parameterAsSink(parameters, self.OUTPUT, context, fields, compat.WKB_MULTIPOLYGON, crs)
        if sink is None:
            raise QgsProcessingException(self.invalidSinkError(parameters, self.OUTPUT))
        rows = []
        for h in range(stats.n_strata):
            row = [h + 1, labels[h], float(result.area_ha[h])]
            for c in range(n_covariates):
                row += [float(stats.mean[h, c]), float(stats.sd[h, c])]
            rows.append(row)
        if not bridge.write_features(sink, fields, shapes, rows, feedback, (90, 96)):
            raise self.cancelled_error()
        return dest_id
