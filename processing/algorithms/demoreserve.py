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
from ..report import MapLayer, map_svg
from ..report.style import CATEGORY_COLOURS
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
            "<li><b>Random seed</b>: the same seed gives the same reserve and animals. 0 draws a seed and records it.</li>"
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
        self.addParameter(QgsProcessingParameterFeatureSink(self.OUTPUT_AREA, self.tr("Reserve boundary"), compat.TYPE_VECTOR_POLYGON))
        self.addParameter(QgsProcessingParameterFeatureSink(self.OUTPUT_EXCLUDED, self.tr("Excluded areas (lake, inholding)"), compat.TYPE_VECTOR_POLYGON))
        self.addParameter(QgsProcessingParameterRasterDestination(self.OUTPUT_ELEVATION, self.tr("Elevation (m)")))
        self.addParameter(QgsProcessingParameterRasterDestination(self.OUTPUT_GREENNESS, self.tr("Greenness (0–1)")))
        self.addParameter(QgsProcessingParameterRasterDestination(
            self.OUTPUT_INTENSITY, self.tr("Expected animals per km²"), optional=True, createByDefault=False))
        self.addParameter(QgsProcessingParameterFeatureSink(self.OUTPUT_ANIMALS, self.tr("Simulated animals"), compat.TYPE_VECTOR_POINT))
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
        sink, results[self.OUTPUT_AREA] = self.parameterAsSink(parameters, self.OUTPUT_AREA, context, fields, compat.WKB_MULTIPOLYGON, crs)
        self._check_sink(sink, self.OUTPUT_AREA)
        bridge.write_features(sink, fields, [reserve.boundary], [[demo_reserve.RESERVE_NAME, reserve.boundary.area / 1e4]])

        fields = bridge.make_fields([("kind", "string", 20), ("name", "string", 80), ("area_ha", "double", 14, 2)])
        sink, results[self.OUTPUT_EXCLUDED] = self.parameterAsSink(parameters, self.OUTPUT_EXCLUDED, context, fields, compat.WKB_MULTIPOLYGON, crs)
        self._check_sink(sink, self.OUTPUT_EXCLUDED)
        bridge.write_features(
            sink, fields, [reserve.lake, reserve.inholding],
            [["lake", "Tarnmere", reserve.lake.area / 1e4], ["inholding", "Quillimer croft (private)", reserve.inholding.area / 1e4]],
        )
        feedback.setProgress(75)

        for key, array in ((self.OUTPUT_ELEVATION, reserve.elevation), (self.OUTPUT_GREENNESS, reserve.greenness), (self.OUTPUT_INTENSITY, reserve.intensity)):
            path = self.parameterAsOutputLayer(parameters, key, context)
            if not path:  # an optional output left out
                continue
            bridge.write_geotiff(path, array, reserve.geotransform, crs, nodata=-9999.0)
            results[key] = path
        feedback.setProgress(85)

        fields = bridge.make_fields([("animal_id", "int"), ("group_id", "int")])
        sink, results[self.OUTPUT_ANIMALS] = self.parameterAsSink(parameters, self.OUTPUT_ANIMALS, context, fields, compat.WKB_POINT, crs)
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
        results[self.REPORT] = self.write_report(self._report(reserve, cell_size, crs), parameters, context, feedback)
        for key, style in ((self.OUTPUT_AREA, "outline"), (self.OUTPUT_EXCLUDED, "excluded"), (self.OUTPUT_ELEVATION, "elevation"),
                           (self.OUTPUT_GREENNESS, "greenness"), (self.OUTPUT_INTENSITY, "intensity"), (self.OUTPUT_ANIMALS, "animals")):
            if results.get(key):
                self.style_output(context, results[key], style)
        return results

    def _check_sink(self, sink, key):
        if sink is None:
            raise QgsProcessingException(self.invalidSinkError({}, key))

    def _report(self, reserve, cell_size, crs):
        report = self.new_report(self.tr("Demo reserve: {name}").format(name=demo_reserve.RESERVE_NAME))
        report.note(self.tr(
            "Invented data for demonstrations, training and tests. {name} and the velmar ({desc}) do not exist."
        ).format(name=demo_reserve.RESERVE_NAME, desc=self.engine_term(demo_reserve.SPECIES_DESCRIPTION)))
        report.key_figures([
            (self.tr("reserve area"), f"{reserve.boundary.area / 1e6:,.1f} km²"),
            (self.tr("true number of velmar"), f"{reserve.true_total:,}"),
            (self.tr("expected number"), f"{reserve.expected_total:,.0f} ± {reserve.total_variance ** 0.5:,.0f} (1 SD)"),
            (self.tr("groups"), f"{reserve.n_groups:,}"),
        ])
        report.parameters({
            self.tr("Seed"): reserve.seed,
            self.tr("Raster cell size (m)"): cell_size,
            self.tr("CRS"): f"{crs.authid()} ({crs.description()})",
            self.tr("Mean group size (mu)"): reserve.mean_group_size,
            self.tr("Group spread, SD of members around the centre (m)"): reserve.group_spread,
        })
        report.section(self.tr("Areas"))
        report.table(
            [self.tr("Part"), self.tr("Area (km²)")],
            [[self.tr("Reserve"), reserve.boundary.area / 1e6], [self.tr("Lake (excluded)"), reserve.lake.area / 1e6],
             [self.tr("Private inholding (excluded)"), reserve.inholding.area / 1e6]],
        )
        report.section(self.tr("Map"))
        from shapely.geometry import MultiPoint

        report.figure(map_svg([
            MapLayer((reserve.boundary,), label=self.tr("Reserve"), fill="#eef3e8", stroke="#1f3a44", stroke_width=1.5),
            MapLayer((reserve.lake,), label=self.tr("Lake"), fill="#9cc3d9", stroke="#3b6e8f"),
            MapLayer((reserve.inholding,), label=self.tr("Private inholding"), fill="#e6d3b3", stroke="#a8875b"),
            MapLayer((MultiPoint([tuple(p) for p in reserve.animals_xy[::3]]),) if reserve.true_total else (),
                     label=self.tr("Velmar (every third animal)"), fill=CATEGORY_COLOURS[3], stroke=CATEGORY_COLOURS[3], point_radius=1.2),
        ]), self.tr("Hollin Ridge Reserve, the excluded areas and the simulated animals."))
        report.section(self.tr("How the population was simulated"))
        report.paragraph(self.tr(
            "Group centres form an inhomogeneous Poisson process on the habitat (the reserve without the lake); "
            "their intensity is proportional to exp(0.9 × standardised greenness − 0.6 × standardised elevation). "
            "Each group has a Poisson number of members (mean {mu:g}) spread around its centre with a normal "
            "displacement of {sigma:g} m; members that fall off the habitat are not part of the population. "
            "This is a Thomas cluster process. Its expected total and variance are computed from the intensity "
            "surface on the raster grid."
        ).format(mu=reserve.mean_group_size, sigma=reserve.group_spread))
        report.references([
            "Thomas, M. (1949) A generalization of Poisson's binomial limit for use in ecology. Biometrika 36:18–25.",
            "Diggle, P. J. (2013) Statistical Analysis of Spatial and Spatio-Temporal Point Patterns. 3rd ed. CRC Press.",
        ])
        report.field_safety()
        return report
