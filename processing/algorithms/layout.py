"""plotwise:layout: sample units over a frame or its strata, with reserves and GPS waypoints."""
import numpy as np
from qgis.core import (
    QgsProcessingException,
    QgsProcessingParameterBoolean,
    QgsProcessingParameterEnum,
    QgsProcessingParameterFeatureSink,
    QgsProcessingParameterFeatureSource,
    QgsProcessingParameterField,
    QgsProcessingParameterFileDestination,
    QgsProcessingParameterNumber,
)

from .. import compat
from .. import bridge
from ..engine import layout as engine
from ..report.layout import LayoutReportInputs, layout_report
from .base import PlotwiseAlgorithm

class LayoutUnits(PlotwiseAlgorithm):
    """Draws sample units per stratum: simple random, systematic grid or spatially balanced."""

    ALGORITHM_NAME = "layout"
    GROUP_ID = "design"

    FRAME = "FRAME"
    STRATUM_FIELD = "STRATUM_FIELD"
    N_FIELD = "N_FIELD"
    N_UNITS = "N_UNITS"
    DESIGN = "DESIGN"
    SHAPE = "SHAPE"
    SIZE = "SIZE"
    BEARING = "BEARING"
    INSIDE = "INSIDE"
    MIN_SPACING = "MIN_SPACING"
    RESERVE = "RESERVE"
    OUTPUT = "OUTPUT"
    OUTPUT_GPX = "OUTPUT_GPX"

    def displayName(self):  # noqa: N802 (host naming)
        return self.tr("Lay out sample units")

    def shortHelpString(self):  # noqa: N802 (host naming)
        return self.tr(
            "Draws the sample units of a survey over a sampling frame, stratum by stratum (one stratum per "
            "value of the stratum field; without it the frame is one stratum).\n\n"
            "Units per stratum: the units field (for example n_alloc from the allocation step; the same "
            "whole number on every feature of a stratum), else the total split in proportion to area with "
            "at least 2 per stratum.\n\n"
            "Designs:\n"
            "• Simple random: independent points, uniform over the stratum (triangles chosen by area, then a "
            "point within; Turk 1990).\n"
            "• Systematic grid: a square grid of spacing √(A/n) with a random start; with bearing −1 the grid "
            "also gets a random rotation, otherwise it is turned to the bearing. The realised number of "
            "units varies around n and is reported.\n"
            "• Spatially balanced: balanced acceptance sampling on a Halton sequence (Robertson et al. 2013). "
            "Every leading part of the draw order is itself spread evenly, so reserves are the next points "
            "of the same sequence. The start is a uniform random point of the stratum, which keeps "
            "inclusion equal for any sample size.\n\n"
            "Shapes: point station (size: optional counting radius, m), square plot (size: side, m), circular "
            "plot (size: radius, m), line transect (size: length, m; centred on the drawn point). Bearing in "
            "degrees clockwise from grid north, or −1 for a random bearing per unit.\n"
            "Edges: by default plus sampling (Gregoire & Valentine 2008, ch. 10): centres are drawn over the "
            "stratum grown by the unit's reach R (its circumscribing radius), and a unit near or beyond the edge "
            "is surveyed only inside its own stratum (count only the animals inside the stratum; a centre may "
            "lie outside it, even outside the frame: never enter ground that was excluded as unsafe, survey the "
            "part inside from within). Every animal then has the same chance of being counted, and "
            "plotwise:estimate expands the counts to the grown area. Keep units inside instead draws centres "
            "from the stratum shrunk by R, so every unit lies wholly inside its stratum but the edge band is "
            "never reached (biased where animals near the edge differ). The effective area (grown or shrunk) is "
            "reported and used for the inclusion probabilities.\n"
            "Minimum spacing (m) between the centres of all units, primaries and reserves, over the whole layout.\n"
            "Reserves: extra units per stratum, role = reserve, in draw order. Replacement rule: a primary unit "
            "that cannot be surveyed is replaced by the next unused reserve of the same stratum.\n\n"
            "Output fields: unit_id, stratum, role, draw_ord, area_m2, incl_p (n·a/A; for transects and points "
            "without a radius the inclusion density n/A per m²), weight = 1/incl_p, lon/lat (WGS 84), an "
            "empty count field for the field teams, and the design record for the estimate: design (random, "
            "random_sep, grid, grid_ovl or balanced: whether the units can overlap, which decides the "
            "finite-population correction), edge (plus or inside) and reach_m (R, m). The GPX file holds one "
            "waypoint per unit (a start and an end waypoint per transect), named by unit_id.\n\n"
            "Strata must not overlap: an overlap of more than 0.1 % of the smaller stratum is an error, a smaller "
            "one a warning. Features under 1 m² (slivers) are skipped, with a warning.\n\n"
            "A frame in geographic coordinates is projected to the UTM zone of its centre. Check every unit's "
            "access and safety before fieldwork: the tool never makes a location safe."
        )

    def initAlgorithm(self, config=None):  # noqa: N802 (host naming)
        self.addParameter(
            QgsProcessingParameterFeatureSource(self.FRAME, self.tr("Sampling frame or strata"),
                                                [compat.TYPE_VECTOR_POLYGON])
        )
        self.addParameter(
            QgsProcessingParameterField(
                self.STRATUM_FIELD, self.tr("Stratum field (empty: the frame is one stratum)"), None, self.FRAME,
                compat.FIELD_ANY, optional=True,
            )
        )
        self.addParameter(
            QgsProcessingParameterField(
                self.N_FIELD, self.tr("Units per stratum field (e.g. n_alloc; empty: split the total by area)"), None,
                self.FRAME, compat.FIELD_NUMERIC, optional=True,
            )
        )
        self.addParameter(
            QgsProcessingParameterNumber(
                self.N_UNITS, self.tr("Total number of units (when no units field is given)"),
                type=compat.NUMBER_INTEGER, defaultValue=30, minValue=0,
            )
        )
        self.addParameter(
            QgsProcessingParameterEnum(
                self.DESIGN, self.tr("Design"),
                [self.tr("Simple random"), self.tr("Systematic grid"), self.tr("Spatially balanced")], defaultValue=2,
            )
        )
        self.addParameter(
            QgsProcessingParameterEnum(
                self.SHAPE, self.tr("Unit shape"),
                [self.tr("Point station"), self.tr("Square plot"), self.tr("Circular plot"), self.tr("Line transect")],
                defaultValue=0,
            )
        )
        self.addParameter(
            QgsProcessingParameterNumber(
                self.SIZE, self.tr("Unit size (m): square side, circle radius, transect length, point counting radius"),
                type=compat.NUMBER_DOUBLE, defaultValue=0.0, minValue=0.0,
            )
        )
        self.addParameter(
            QgsProcessingParameterNumber(
                self.BEARING, self.tr("Bearing (degrees from grid north; -1: random)"),
                type=compat.NUMBER_DOUBLE, defaultValue=-1.0, minValue=-1.0, maxValue=359.999,
            )
        )
        self.addParameter(
            QgsProcessingParameterBoolean(
                self.INSIDE, self.tr("Keep every unit wholly inside its stratum (off: plus sampling)"),
                defaultValue=False)
        )
        self.addParameter(
            QgsProcessingParameterNumber(
                self.MIN_SPACING, self.tr("Minimum spacing between unit centres (m; 0: none)"),
                type=compat.NUMBER_DOUBLE, defaultValue=0.0, minValue=0.0,
            )
        )
        self.addParameter(
            QgsProcessingParameterNumber(
                self.RESERVE, self.tr("Reserve units per stratum"), type=compat.NUMBER_INTEGER, defaultValue=0,
                minValue=0,
            )
        )
        self.add_seed_parameter()
        self.addParameter(QgsProcessingParameterFeatureSink(self.OUTPUT, self.tr("Sample units")))
        self.addParameter(
            QgsProcessingParameterFileDestination(
                self.OUTPUT_GPX, self.tr("Waypoints for GPS (GPX)"), self.tr("GPX files (*.gpx)"),
                createByDefault=False, optional=True,
            )
        )
        self.add_report_parameter()

    # -- run -------------------------------------------------------------------------
    def _field_name(self, parameters, name, context):
        """The chosen field, or None (bridge.read_features checks that it exists)."""
        return self.parameterAsString(parameters, name, context) or None

    def processAlgorithm(self, parameters, context, feedback):  # noqa: N802 (host naming)
        source = self.parameterAsSource(parameters, self.FRAME, context)
        if source is None:
            raise QgsProcessingException(self.invalidSourceError(parameters, self.FRAME))
        layer_name = source.sourceName() or self.FRAME
        stratum_field = self._field_name(parameters, self.STRATUM_FIELD, context)
        n_field = self._field_name(parameters, self.N_FIELD, context)
        n_units = self.parameterAsInt(parameters, self.N_UNITS, context)
        spec = self._layout_spec(parameters, context)
        seeded = self.seeded_generator(parameters, context, feedback)
        crs = bridge.computation_crs(source.sourceCrs(), source.sourceExtent(), context, feedback, layer_name)
        projected_from = source.sourceCrs().authid() if crs != source.sourceCrs() else None
        feedback.setProgress(2)

        frame, result, warnings = self._draw_layout(source, crs, context, feedback, layer_name, stratum_field, n_field,
                                                    n_units, spec, seeded)
        with self.discard_on_failure(self.parameterAsOutputLayer(parameters, self.OUTPUT, context)):
            dest_id = self._write_units(parameters, context, feedback, source, stratum_field, result, crs)
        outputs = {self.OUTPUT: dest_id}
        self.style_output(context, dest_id, "units")
        gpx_path = self._write_gpx(parameters, context, feedback, result, crs)
        if gpx_path:
            outputs[self.OUTPUT_GPX] = gpx_path
        feedback.setProgress(90)
        for s in result.strata:
            feedback.pushInfo(
                self.tr("{stratum}: {n} primary and {r} reserve units").format(
                    stratum=self._stratum_text(s.key), n=s.n_primary, r=s.n_reserve
                )
            )
        inputs = LayoutReportInputs(frame=layer_name, seed=seeded.seed, crs=bridge.crs_label(crs),
                                    stratum_field=stratum_field, n_field=n_field, n_units=n_units,
                                    projected_from=projected_from)
        report = layout_report(self.new_report(""), result, frame, inputs, warnings)
        path = self.write_report(report, parameters, context, feedback)
        if path:
            outputs[self.REPORT] = path
        feedback.setProgress(100)
        return outputs

    def _draw_layout(self, source, crs, context, feedback, layer_name, stratum_field, n_field, n_units, spec, seeded):
        """Read the frame, prepare its strata and draw the units; returns ``(frame, layout, warnings)``."""
        records = bridge.read_features(  # the engine repairs what the host's validity check flags
            source, crs, context, feedback, [f for f in (stratum_field, n_field) if f], layer_name,
            repair=False, drop_empty=False, check_validity=True,
        )
        if feedback.isCanceled():
            raise self.cancelled_error()
        feedback.setProgress(10)
        fids = [int(i) for i in records.fids]
        with self.engine_errors():
            frame = engine.prepare_strata(
                records.geometries,
                feature_ids=fids,
                strata=records.attributes[stratum_field] if stratum_field else None,
                n_values=records.attributes[n_field] if n_field else None,
                n_units=n_units,
                spec=spec,
                stratum_field=self.tr("Stratum field '{field}' of layer '{layer}'").format(
                    field=stratum_field, layer=layer_name),
                n_field=self.tr("Units field '{field}' of layer '{layer}'").format(field=n_field, layer=layer_name),
                valid=records.valid,
            )
            feedback.setProgress(30)
            result = engine.draw_layout(
                frame, spec, seeded.generator, crs=bridge.crs_wkt(crs),
                progress=self.progress_callback(feedback, 30, 70)
            )
        warnings = [self.tr("Layer '{layer}': {text}").format(layer=layer_name, text=self.translate_message(w))
                    for w in result.warnings]
        self.push_warnings(feedback, warnings)
        if len(result) == 0:
            raise QgsProcessingException(
                self.tr("No unit could be placed in layer '{layer}'. Ask for more units or use another design.").format(
                    layer=layer_name)
            )
        return frame, result, warnings

    def _layout_spec(self, parameters, context):
        with self.engine_errors():
            return engine.LayoutSpec(
                design=self.parameterAsEnum(parameters, self.DESIGN, context),
                shape=self.parameterAsEnum(parameters, self.SHAPE, context),
                size=self.parameterAsDouble(parameters, self.SIZE, context),
                bearing=self.parameterAsDouble(parameters, self.BEARING, context),
                inside=self.parameterAsBool(parameters, self.INSIDE, context),
                min_spacing=self.parameterAsDouble(parameters, self.MIN_SPACING, context),
                reserve=self.parameterAsInt(parameters, self.RESERVE, context),
            )

    def _write_gpx(self, parameters, context, feedback, result, crs):
        """The GPS waypoints, when OUTPUT_GPX is set: its path, else None."""
        gpx_path = self.parameterAsFileOutput(parameters, self.OUTPUT_GPX, context)
        if not gpx_path:
            return None
        waypoints = engine.layout_waypoints(result, bridge.crs_wkt(crs))
        kinds = [role for role in result.role for _ in range(2 if result.spec.shape == engine.LINE else 1)]
        descriptions = [self.translate_message(d) for d in waypoints.description]
        bridge.write_gpx_waypoints(gpx_path, waypoints.name, waypoints.lon, waypoints.lat, descriptions, kinds)
        feedback.pushInfo(self.tr("{n} waypoints written to {path}").format(n=len(waypoints.name), path=gpx_path))
        return gpx_path

    def _stratum_text(self, key):
        return self.tr("the frame") if key is None else self.tr("stratum {key}").format(key=key)

    # -- output --------------------------------------------------------------------
    def _write_units(self, parameters, context, feedback, source, stratum_field, result, crs):
        spec = result.spec
        fields = bridge.make_fields([("unit_id", "string", 24)])
        fields.append(bridge.stratum_field_like(source, stratum_field))
        for item in (
            ("role", "string", 8), ("draw_ord", "int"), ("area_m2", "double", 20, 3), ("incl_p", "double", 24, 12),
            ("weight", "double", 24, 6), ("lon", "double", 14, 8), ("lat", "double", 14, 8), ("count", "int"),
            ("design", "string", 10), ("edge", "string", 8), ("reach_m", "double", 20, 3),
        ):
            fields.append(compat.make_field(*item))
        wkb = {engine.POINT: compat.WKB_POINT, engine.LINE: compat.WKB_LINESTRING}.get(spec.shape, compat.WKB_POLYGON)
        sink, dest_id = self.parameterAsSink(parameters, self.OUTPUT, context, fields, wkb, crs)
        if sink is None:
            raise QgsProcessingException(self.invalidSinkError(parameters, self.OUTPUT))
        null = bridge.sink_value(None)

        def column(values):  # plain Python values, NaN as NULL
            return [null if v != v else v for v in np.asarray(values, dtype=float).tolist()]

        columns = [
            list(result.unit_id), [1 if k is None else k for k in result.stratum], list(result.role),
            result.draw_ord.tolist(), column(result.area_m2), column(result.incl_p), column(result.weight),
            column(result.lon), column(result.lat), [null] * len(result),
            list(result.design), [spec.edge] * len(result), [float(spec.reach)] * len(result),
        ]
        kind = {engine.POINT: "point", engine.LINE: "line"}.get(spec.shape, "polygon")
        written = bridge.write_columns(sink, bridge.wkb_geometries(result.outlines, kind), columns, feedback,
                                       (70.0, 85.0))
        if not written:
            raise self.cancelled_error()
        return dest_id
