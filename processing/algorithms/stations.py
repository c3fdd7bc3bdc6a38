"""plotwise:stations: camera-trap or recorder stations over a frame, spaced from the species' home range."""
from qgis.PyQt.QtCore import QCoreApplication
from qgis.core import (
    QgsProcessingException,
    QgsProcessingOutputNumber,
    QgsProcessingParameterEnum,
    QgsProcessingParameterFeatureSink,
    QgsProcessingParameterFeatureSource,
    QgsProcessingParameterField,
    QgsProcessingParameterFileDestination,
    QgsProcessingParameterNumber,
)

from .. import compat
from ..translation import active_language
from .. import bridge
from ..engine import stations as engine
from ..report.stations import StationsRun, stations_report
from .base import PlotwiseAlgorithm


class Stations(PlotwiseAlgorithm):
    """Grid, clusters or spatially balanced stations, with reserves and GPS waypoints."""

    ALGORITHM_NAME = "stations"
    GROUP_ID = "design"

    FRAME = "FRAME"
    STRATUM_FIELD = "STRATUM_FIELD"
    N_STATIONS = "N_STATIONS"
    ARRAY = "ARRAY"
    HOME_RANGE = "HOME_RANGE"
    SPACING = "SPACING"
    SPACING_RULE = "SPACING_RULE"
    CLUSTER_SIZE = "CLUSTER_SIZE"
    MIN_SPACING = "MIN_SPACING"
    RESERVE = "RESERVE"
    SERVICE_HOURS = "SERVICE_HOURS"
    WORKDAY_HOURS = "WORKDAY_HOURS"
    OUTPUT = "OUTPUT"
    OUTPUT_GPX = "OUTPUT_GPX"
    SPACING_USED = "SPACING_USED"
    SIGMA = "SIGMA"
    N_PRIMARY = "N_PRIMARY"

    def displayName(self):  # noqa: N802 (host naming)
        return self.tr("Lay out camera-trap or recorder stations")

    def shortHelpString(self):  # noqa: N802 (host naming)
        return self.tr(
            "Places camera-trap or acoustic-recorder stations over a sampling frame (optionally by stratum), spaced "
            "from the species' home range, with reserve stations and GPS waypoints.\n\n"
            "Spacing: from the home range (km²), taken as the 95% range of a circular bivariate normal distribution "
            "of the animal's positions, σ = √(HR/π) / 2.448. Rule 0, independent occupancy sites: stations at least "
            "one home-range diameter 2√(HR/π) apart (common practice). Rule 1, spatial capture-recapture: stations "
            "about 2σ apart (Sollmann et al. 2012; Sun et al. 2014). A spacing (m) above 0 replaces the rule.\n\n"
            "Arrays:\n"
            "• Grid: one square lattice at the spacing over the frame, north-aligned, with a random start. Number of "
            "stations 0 takes every lattice point in the frame; a number above 0 takes that many lattice points "
            "nearest a random point of the frame (a compact block). Strata only label the stations.\n"
            "• Clusters: groups of CLUSTER_SIZE stations at the spacing (a small square lattice around a centre), "
            "the centres spatially balanced (Robertson et al. 2013) and far enough apart that neighbouring clusters "
            "keep the spacing; every station lies inside its stratum. Reserves are whole clusters.\n"
            "• Balanced: single spatially balanced stations, each at least the spacing from every other.\n"
            "The number of stations is split over the strata by area, at least 2 each (clusters: the stations of a "
            "stratum rounded up to whole clusters).\n\n"
            "Minimum spacing (m) holds between all stations. Reserves: per stratum, in draw order (draw_ord); a "
            "station that cannot be set is replaced by the next unused reserve of its stratum.\n"
            "Service time (hours per station visit, travel included; 0: not given) and the working day give the "
            "stations one team services per day, and the team-days for one round.\n\n"
            "Output fields: station, stratum, cluster, role (primary or reserve), draw_ord, lon/lat (WGS 84). The "
            "GPX file holds one waypoint per station, named by its id. The report compares the array's extent with "
            "the home range: an array smaller than a few home ranges cannot estimate density.\n\n"
            "Check every station's access and safety before fieldwork: the tool never makes a location safe. "
            "Follow your agency's field-safety rules and local law."
        )

    def initAlgorithm(self, config=None):  # noqa: N802 (host naming)
        self.addParameter(QgsProcessingParameterFeatureSource(
            self.FRAME, self.tr("Sampling frame or strata"), [compat.TYPE_VECTOR_POLYGON]))
        self.addParameter(QgsProcessingParameterField(
            self.STRATUM_FIELD, self.tr("Stratum field (empty: the frame is one stratum)"), None, self.FRAME,
            compat.FIELD_ANY, optional=True))
        self.addParameter(QgsProcessingParameterNumber(
            self.N_STATIONS, self.tr("Number of stations (grid: 0 takes every grid point)"),
            type=compat.NUMBER_INTEGER, defaultValue=30, minValue=0))
        self.addParameter(QgsProcessingParameterEnum(
            self.ARRAY, self.tr("Array"), [self.tr("Grid"), self.tr("Clusters"), self.tr("Balanced single stations")],
            defaultValue=2))
        self.addParameter(QgsProcessingParameterNumber(
            self.HOME_RANGE, self.tr("Home range of the species (km²; 0: not given)"), type=compat.NUMBER_DOUBLE,
            defaultValue=0.0, minValue=0.0))
        self.addParameter(QgsProcessingParameterNumber(
            self.SPACING, self.tr("Station spacing (m; 0: from the home range)"), type=compat.NUMBER_DOUBLE,
            defaultValue=0.0, minValue=0.0))
        self.addParameter(QgsProcessingParameterEnum(
            self.SPACING_RULE, self.tr("Spacing rule (when the spacing comes from the home range)"),
            [self.tr("Independent occupancy sites: one home-range diameter"),
             self.tr("Spatial capture-recapture: 2σ")], defaultValue=0))
        self.addParameter(QgsProcessingParameterNumber(
            self.CLUSTER_SIZE, self.tr("Stations per cluster"), type=compat.NUMBER_INTEGER, defaultValue=4,
            minValue=2, maxValue=100))
        self.addParameter(QgsProcessingParameterNumber(
            self.MIN_SPACING, self.tr("Minimum spacing between stations (m; 0: none)"), type=compat.NUMBER_DOUBLE,
            defaultValue=0.0, minValue=0.0))
        self.addParameter(QgsProcessingParameterNumber(
            self.RESERVE, self.tr("Reserve stations per stratum (clusters: reserve clusters)"),
            type=compat.NUMBER_INTEGER, defaultValue=0, minValue=0))
        self.add_seed_parameter()
        for name, label, default in (
            (self.SERVICE_HOURS, self.tr("Service time per station visit (hours, travel included; 0: not given)"), 0.0),
            (self.WORKDAY_HOURS, self.tr("Working day of a field team (hours)"), 8.0),
        ):
            parameter = QgsProcessingParameterNumber(name, label, type=compat.NUMBER_DOUBLE, defaultValue=default,
                                                     minValue=0.0, maxValue=24.0)
            parameter.setFlags(parameter.flags() | compat.FLAG_ADVANCED)
            self.addParameter(parameter)
        self.addParameter(QgsProcessingParameterFeatureSink(self.OUTPUT, self.tr("Stations")))
        self.addParameter(QgsProcessingParameterFileDestination(
            self.OUTPUT_GPX, self.tr("Waypoints for GPS (GPX)"), self.tr("GPX files (*.gpx)"), createByDefault=False,
            optional=True))
        self.add_report_parameter()
        for name, label in ((self.SPACING_USED, self.tr("Station spacing used (m)")),
                            (self.SIGMA, self.tr("σ of the home range (m)")),
                            (self.N_PRIMARY, self.tr("Number of primary stations"))):
            self.addOutput(QgsProcessingOutputNumber(name, label))

    # -- run -------------------------------------------------------------------------
    def processAlgorithm(self, parameters, context, feedback):  # noqa: N802 (host naming)
        source = self.parameterAsSource(parameters, self.FRAME, context)
        if source is None:
            raise QgsProcessingException(self.invalidSourceError(parameters, self.FRAME))
        layer_name = source.sourceName() or self.FRAME
        stratum_field = self.field_name(parameters, self.STRATUM_FIELD, context, source, layer_name)
        settings = dict(
            array=self.parameterAsEnum(parameters, self.ARRAY, context),
            n_stations=self.parameterAsInt(parameters, self.N_STATIONS, context),
            home_range=self.parameterAsDouble(parameters, self.HOME_RANGE, context),
            spacing=self.parameterAsDouble(parameters, self.SPACING, context),
            rule=self.parameterAsEnum(parameters, self.SPACING_RULE, context),
            cluster_size=self.parameterAsInt(parameters, self.CLUSTER_SIZE, context),
            min_spacing=self.parameterAsDouble(parameters, self.MIN_SPACING, context),
            reserve=self.parameterAsInt(parameters, self.RESERVE, context))
        service_hours = self.parameterAsDouble(parameters, self.SERVICE_HOURS, context)
        workday_hours = self.parameterAsDouble(parameters, self.WORKDAY_HOURS, context)
        seeded = self.seeded_generator(parameters, context, feedback)
        crs = bridge.computation_crs(source.sourceCrs(), source.sourceExtent(), context, feedback, layer_name)
        records = bridge.read_features(source, crs, context, feedback, (stratum_field,) if stratum_field else (),
                                       layer_name, repair=False, drop_empty=False)
        if feedback.isCanceled():
            raise self.cancelled_error()
        feedback.setProgress(10)
        with self.engine_errors():
            result = engine.place_stations(
                records.geometries, [int(i) for i in records.fids],
                records.attributes[stratum_field] if stratum_field else None, seeded.generator,
                crs=bridge.crs_wkt(crs), progress=self.progress_callback(feedback, 10, 60), **settings)
            spec, n_primary = result.spec, int(result.is_primary.sum())
            service = engine.service_plan(n_primary, service_hours, workday_hours,
                                          spec.cluster_size if spec.array == engine.CLUSTERS else 0)
        warnings = [self.tr("Layer '{layer}': {text}").format(layer=layer_name, text=self.translate_message(w))
                    for w in result.warnings]
        self.push_warnings(feedback, warnings)

        with self.discard_on_failure(self.parameterAsOutputLayer(parameters, self.OUTPUT, context)):
            dest_id = self._write_stations(parameters, context, feedback, source, stratum_field, result, crs)
        outputs = {self.OUTPUT: dest_id}
        self.style_output(context, dest_id, "stations")
        gpx_path = self.parameterAsFileOutput(parameters, self.OUTPUT_GPX, context)
        if gpx_path:
            waypoints = engine.station_waypoints(result, bridge.crs_wkt(crs))
            bridge.write_gpx_waypoints(gpx_path, waypoints.name, waypoints.lon, waypoints.lat,
                                       [self.translate_message(d) for d in waypoints.description], list(result.role))
            outputs[self.OUTPUT_GPX] = gpx_path
            feedback.pushInfo(self.tr("{n} waypoints written to {path}").format(n=len(waypoints.name), path=gpx_path))
        feedback.pushInfo(self.tr("{n} primary and {r} reserve stations, {s:.0f} m apart.").format(
            n=n_primary, r=len(result) - n_primary, s=spec.spacing))
        report = stations_report(
            result, StationsRun(layer_name, stratum_field or "", self._crs_text(crs, source),
                                              seeded.seed, service_hours, workday_hours),
            service, warnings, translate=QCoreApplication.translate, language=active_language())
        path = self.write_report(report, parameters, context, feedback)
        if path:
            outputs[self.REPORT] = path
        outputs[self.SPACING_USED] = float(spec.spacing)
        outputs[self.SIGMA] = float(spec.sigma) if spec.home_range > 0 else None
        outputs[self.N_PRIMARY] = n_primary
        feedback.setProgress(100)
        return outputs

    def _crs_text(self, crs, source):
        text = f"{crs.authid()} ({crs.description()})"
        if crs != source.sourceCrs():
            text += self.tr(", projected from {src} (UTM zone of the frame's centre)").format(
                src=source.sourceCrs().authid())
        return text

    def _write_stations(self, parameters, context, feedback, source, stratum_field, result, crs):
        fields = bridge.make_fields([("station", "string", 24)])
        fields.append(bridge.stratum_field_like(source, stratum_field))
        for item in (("cluster", "string", 24), ("role", "string", 8), ("draw_ord", "int"), ("lon", "double", 14, 8),
                     ("lat", "double", 14, 8)):
            fields.append(compat.make_field(*item))
        sink, dest_id = self.parameterAsSink(parameters, self.OUTPUT, context, fields, compat.WKB_POINT, crs)
        if sink is None:
            raise QgsProcessingException(self.invalidSinkError(parameters, self.OUTPUT))
        null = bridge.sink_value(None)
        rows = [[s, 1 if k is None else k, null if c is None else c, r, int(o), float(x), float(y)]
                for s, k, c, r, o, x, y in zip(result.station, result.stratum, result.cluster, result.role,
                                               result.draw_ord, result.lon, result.lat)]
        if not bridge.write_rows(sink, bridge.wkb_geometries(result.xy, "point"), rows, feedback, (60.0, 85.0)):
            raise self.cancelled_error()
        return dest_id
