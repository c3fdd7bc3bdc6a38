"""plotwise:demoreserve — the invented Hollin Ridge Reserve with a simulated velmar population."""
from qgis.core import (
    QgsCoordinateReferenceSystem,
    QgsProcessingException,
    QgsProcessingOutputNumber,
    QgsProcessingParameterFeatureSink,
    QgsProcessingParameterNumber,
    QgsProcessingParameterRasterDestination,
)

from .. import compat
from .. import bridge
from ..engine import demo_reserve
from ..report.demoreserve import demoreserve_report
from .base import PlotwiseAlgorithm


class DemoReserve(PlotwiseAlgorithm):
    ALGORITHM_NAME = "demoreserve"
    GROUP_ID = "training"

    CELL_SIZE = "CELL_SIZE"
    OUTPUT_AREA = "OUTPUT_AREA"
    OUTPUT_EXCLUDED = "OUTPUT_EXCLUDED"
    OUTPUT_ELEVATION = "OUTPUT_ELEVATION"
    OUTPUT_GREENNESS = "OUTPUT_GREENNESS"
    OUTPUT_INTENSITY = "OUTPUT_INTENSITY"
    OUTPUT_ANIMALS = "OUTPUT_ANIMALS"
    TRUE_TOTAL = "TRUE_TOTAL"
    EXPECTED_TOTAL = "EXPECTED_TOTAL"

    def displayName(self):  # noqa: N802
        return self.tr("Demo reserve with a simulated population")

    def shortHelpString(self):  # noqa: N802
        return self.tr(
            "<p>Builds Hollin Ridge Reserve, an invented upland reserve for demonstrations, training and "
            "tests, and a simulated population of the velmar, an invented grazing antelope. Nothing in it "
            "describes a real place or species.</p>"
            "<p>The reserve covers 250–350 km² in WGS 84 / UTM zone 36S, with an irregular boundary, a lake "
            "and a private inholding (both in the excluded-areas layer), an elevation raster (synthetic "
            "fractal terrain with a steep escarpment) and a greenness raster (a vegetation index from 0 to 1, "
            "correlated with elevation, plus noise).</p>"
            "<p>The velmar live in groups: an inhomogeneous Thomas cluster process whose group centres are "
            "denser where greenness is high and elevation low. The true total is known, and the expected "
            "number of animals per km² is written as a raster, so that survey designs and estimates can be "
            "checked against the truth.</p>"
            "<h3>Parameters</h3><ul>"
            "<li><b>Random seed</b>: the same seed gives the same reserve and animals. 0 draws a seed and records "
            "it.</li>"
            "<li><b>Raster cell size</b>: metres, 10 to 500 (default 50).</li></ul>"
            "<h3>Outputs</h3><ul><li>Reserve boundary (<i>name</i>, <i>area_ha</i>)</li>"
            "<li>Excluded areas (<i>kind</i> lake or inholding, <i>name</i>, <i>area_ha</i>)</li>"
            "<li>Elevation (m), greenness (0–1) and expected velmar per km² rasters</li>"
            "<li>Animals (<i>animal_id</i>, <i>group_id</i>)</li><li>An HTML report</li></ul>"
            "<p>References: Thomas, M. (1949) A generalization of Poisson's binomial limit for use in ecology. "
            "Biometrika 36:18–25. Diggle, P. J. (2013) Statistical Analysis of Spatial and Spatio-Temporal "
            "Point Patterns, 3rd ed., CRC Press.</p>"
        )

    def initAlgorithm(self, config=None):  # noqa: N802
        self.add_seed_parameter(default=1)
        self.addParameter(
            QgsProcessingParameterNumber(
                self.CELL_SIZE, self.tr("Raster cell size (m)"), type=compat.NUMBER_DOUBLE,
                defaultValue=50.0, minValue=10.0, maxValue=500.0,
            )
        )
        self.addParameter(QgsProcessingParameterFeatureSink(self.OUTPUT_AREA, self.tr("Reserve boundary"),
                                                            compat.TYPE_VECTOR_POLYGON))
        self.addParameter(QgsProcessingParameterFeatureSink(self.OUTPUT_EXCLUDED,
                                                            self.tr("Excluded areas (lake, inholding)"),
                                                            compat.TYPE_VECTOR_POLYGON))
        self.addParameter(QgsProcessingParameterRasterDestination(self.OUTPUT_ELEVATION, self.tr("Elevation (m)")))
        self.addParameter(QgsProcessingParameterRasterDestination(self.OUTPUT_GREENNESS, self.tr("Greenness (0–1)")))
        self.addParameter(QgsProcessingParameterRasterDestination(
            self.OUTPUT_INTENSITY, self.tr("Expected animals per km²"), optional=True, createByDefault=False))
        self.addParameter(QgsProcessingParameterFeatureSink(self.OUTPUT_ANIMALS, self.tr("Simulated animals"),
                                                            compat.TYPE_VECTOR_POINT))
        self.add_report_parameter()
        self.addOutput(QgsProcessingOutputNumber(self.TRUE_TOTAL, self.tr("True number of animals")))
        self.addOutput(QgsProcessingOutputNumber(self.EXPECTED_TOTAL, self.tr("Expected number of animals")))

    def processAlgorithm(self, parameters, context, feedback):  # noqa: N802
        seeded = self.seeded_generator(parameters, context, feedback)
        cell_size = self.parameterAsDouble(parameters, self.CELL_SIZE, context)
        with self.engine_errors():
            reserve = demo_reserve.build_demo_reserve(
                seeded.generator, seeded.seed, cell_size, progress=self.progress_callback(feedback, 0, 70)
            )
        crs = QgsCoordinateReferenceSystem(f"EPSG:{reserve.crs_epsg}")
        results = {self.TRUE_TOTAL: reserve.true_total, self.EXPECTED_TOTAL: reserve.expected_total}

        fields = bridge.make_fields([("name", "string", 80), ("area_ha", "double", 14, 2)])
        sink, results[self.OUTPUT_AREA] = self.parameterAsSink(parameters, self.OUTPUT_AREA, context, fields,
                                                               compat.WKB_MULTIPOLYGON, crs)
        self._check_sink(sink, self.OUTPUT_AREA)
        bridge.write_features(sink, fields, [reserve.boundary],
                              [[demo_reserve.RESERVE_NAME, reserve.boundary.area / 1e4]])

        fields = bridge.make_fields([("kind", "string", 20), ("name", "string", 80), ("area_ha", "double", 14, 2)])
        sink, results[self.OUTPUT_EXCLUDED] = self.parameterAsSink(parameters, self.OUTPUT_EXCLUDED, context, fields,
                                                                   compat.WKB_MULTIPOLYGON, crs)
        self._check_sink(sink, self.OUTPUT_EXCLUDED)
        bridge.write_features(
            sink, fields, [reserve.lake, reserve.inholding],
            [["lake", "Tarnmere", reserve.lake.area / 1e4],
             ["inholding", "Quillimer croft (private)", reserve.inholding.area / 1e4]],
        )
        feedback.setProgress(75)

        for key, array in ((self.OUTPUT_ELEVATION, reserve.elevation), (self.OUTPUT_GREENNESS, reserve.greenness),
                           (self.OUTPUT_INTENSITY, reserve.intensity)):
            path = self.parameterAsOutputLayer(parameters, key, context)
            if not path:  # an optional output left out
                continue
            bridge.write_geotiff(path, array, reserve.geotransform, crs, nodata=-9999.0)
            results[key] = path
        feedback.setProgress(85)

        fields = bridge.make_fields([("animal_id", "int"), ("group_id", "int")])
        sink, results[self.OUTPUT_ANIMALS] = self.parameterAsSink(parameters, self.OUTPUT_ANIMALS, context, fields,
                                                                  compat.WKB_POINT, crs)
        self._check_sink(sink, self.OUTPUT_ANIMALS)
        from shapely.geometry import Point

        points = [Point(x, y) for x, y in reserve.animals_xy]
        rows = [[i + 1, int(g)] for i, g in enumerate(reserve.group_ids)]
        if not bridge.write_features(sink, fields, points, rows, feedback, (85, 98)):
            raise self.cancelled_error()

        feedback.pushInfo(
            self.tr("{name}: {area:,.1f} km², {n:,} velmar in {g:,} groups (expected {e:,.0f}).").format(
                name=demo_reserve.RESERVE_NAME, area=reserve.boundary.area / 1e6, n=reserve.true_total,
                g=reserve.n_groups, e=reserve.expected_total,
            )
        )
        report = demoreserve_report(self.new_report(""), reserve, cell_size, bridge.crs_label(crs))
        results[self.REPORT] = self.write_report(report, parameters, context, feedback)
        for key, style in ((self.OUTPUT_AREA, "outline"), (self.OUTPUT_EXCLUDED, "excluded"),
                           (self.OUTPUT_ELEVATION, "elevation"), (self.OUTPUT_GREENNESS, "greenness"),
                           (self.OUTPUT_INTENSITY, "intensity"), (self.OUTPUT_ANIMALS, "animals")):
            if results.get(key):
                self.style_output(context, results[key], style)
        return results

    def _check_sink(self, sink, key):
        if sink is None:
            raise QgsProcessingException(self.invalidSinkError({}, key))
