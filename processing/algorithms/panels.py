"""plotwise:panels: assign the units of a layout to revisit panels for a monitoring programme."""
import datetime

from qgis.core import (
    QgsFeature,
    QgsProcessingException,
    QgsProcessingParameterEnum,
    QgsProcessingParameterFeatureSink,
    QgsProcessingParameterFeatureSource,
    QgsProcessingParameterField,
    QgsProcessingParameterNumber,
)

from .. import compat
from .. import bridge
from ..engine import panels as engine
from ..report.panels import PanelsRun, fill_panels_report
from .base import PlotwiseAlgorithm

OUTPUT_FIELDS = ("panel", "years")


class Panels(PlotwiseAlgorithm):
    ALGORITHM_NAME = "panels"
    GROUP_ID = "design"

    UNITS = "UNITS"
    PANEL_DESIGN = "PANEL_DESIGN"
    PANELS = "PANELS"
    CORE_SHARE = "CORE_SHARE"
    START_YEAR = "START_YEAR"
    YEARS = "YEARS"
    ORDER_FIELD = "ORDER_FIELD"
    STRATUM_FIELD = "STRATUM_FIELD"
    UNIT_DAYS = "UNIT_DAYS"
    OUTPUT = "OUTPUT"
    OUTPUT_SCHEDULE = "OUTPUT_SCHEDULE"

    def displayName(self):  # noqa: N802 (host naming)
        return self.tr("Revisit panels for monitoring")

    def shortHelpString(self):  # noqa: N802 (host naming)
        return self.tr(
            "Assigns the units of a layout to revisit panels for a monitoring programme over several years, and "
            "writes the schedule: which units are surveyed in which year.\n\n"
            "Sample units: the layout's units (any geometry). Units whose role is reserve get no panel; a reserve "
            "that replaces a primary unit takes over the primary's panel and years.\n"
            "Panel design: every year (one panel, panel 0, visited every year); rotating panels (PANELS panels, "
            "panel p visited in the years start + (p − 1), start + (p − 1) + K, ..., so each unit once every K "
            "years); split panels (a core, panel 0, visited every year, plus K rotating panels).\n"
            "Rotating panels (K): 2 or more, at most the number of years. Share of units in the core: split panels "
            "only, between 0 and 1.\n"
            "First year and years: the programme's calendar; at most 50 years.\n"
            "Draw-order field (default draw_ord, as the layout writes it): panels follow the draw order within each "
            "stratum, in consecutive blocks: the core first, then panel 1, panel 2, ... In a spatially balanced "
            "layout every run of consecutive units of the draw order is spread over the stratum (Robertson et al. "
            "2013), so every panel is. Without the field, the order of the features is used, with a warning.\n"
            "Stratum field (default stratum): panels are cut within each stratum, so each panel holds every "
            "stratum's share.\n"
            "Field days per unit visit (0: none): adds field days to the schedule.\n"
            "Random seed: only for the check of the panels' spread (the panels themselves follow the draw order).\n\n"
            "The layout's design: plotwise:layout records it in the units' design field. A simple random layout "
            "(random, random_sep) gives panels that are random parts of it, a systematic grid (grid, grid_ovl) "
            "bands, because its draw order runs row by row: both are warned about. Without the field, the check "
            "below decides.\n"
            "The check: the spread of each panel is measured by the Voronoi measure of Stevens & Olsen (2004) over "
            "a fine grid on the convex hull of the units, and compared with random rearrangements of the panels "
            "within each stratum. When the panels are not more evenly spread than chance (and not clearly more even "
            "than random panels either: a spread measure at least 90% of theirs), a warning says so: the "
            "layout was probably simple random (each panel is then a random part of it) or a systematic grid "
            "(whose draw order runs row by row, so panels are bands). With few units the check can miss a real "
            "balance.\n\n"
            "Outputs: the units with panel (0 core or every-year panel, 1..K rotating, empty for reserves) and years "
            "(the years the unit is visited, comma-separated); the schedule table (year, panel, n_units, days); an "
            "HTML report with the schedule as a chart.\n\n"
            "References: Urquhart & Kincaid (1999); McDonald (2003); Robertson et al. (2013); Stevens & Olsen "
            "(2004).\n\n"
            "Field safety: check every unit's access and safety before sending a team, each year again: the tool "
            "never makes a location safe. Follow your agency's field-safety rules and local law."
        )

    def initAlgorithm(self, config=None):  # noqa: N802 (host naming)
        self.addParameter(QgsProcessingParameterFeatureSource(
            self.UNITS, self.tr("Sample units (a layout)"), [compat.TYPE_VECTOR_ANY]))
        self.addParameter(QgsProcessingParameterEnum(
            self.PANEL_DESIGN, self.tr("Panel design"),
            [self.tr("Every unit every year"), self.tr("Rotating panels"), self.tr("Split panels (core + rotating)")],
            defaultValue=2))
        self.addParameter(QgsProcessingParameterNumber(
            self.PANELS, self.tr("Rotating panels (K: each unit once every K years)"), type=compat.NUMBER_INTEGER,
            defaultValue=3, minValue=1, maxValue=engine.MAX_YEARS))
        self.addParameter(QgsProcessingParameterNumber(
            self.CORE_SHARE, self.tr("Share of units in the core (split panels)"), type=compat.NUMBER_DOUBLE,
            defaultValue=0.3, minValue=0.0, maxValue=1.0))
        self.addParameter(QgsProcessingParameterNumber(
            self.START_YEAR, self.tr("First year"), type=compat.NUMBER_INTEGER,
            defaultValue=datetime.date.today().year, minValue=1000, maxValue=9999))
        self.addParameter(QgsProcessingParameterNumber(
            self.YEARS, self.tr("Years of the programme"), type=compat.NUMBER_INTEGER, defaultValue=10, minValue=1,
            maxValue=engine.MAX_YEARS))
        self.addParameter(QgsProcessingParameterField(
            self.ORDER_FIELD, self.tr("Draw-order field"), "draw_ord", self.UNITS, compat.FIELD_NUMERIC,
            optional=True))
        self.addParameter(QgsProcessingParameterField(
            self.STRATUM_FIELD, self.tr("Stratum field"), "stratum", self.UNITS, compat.FIELD_ANY, optional=True))
        self.addParameter(QgsProcessingParameterNumber(
            self.UNIT_DAYS, self.tr("Field days per unit visit (0: none)"), type=compat.NUMBER_DOUBLE,
            defaultValue=0.0, minValue=0.0))
        self.add_seed_parameter(default=1)
        self.addParameter(QgsProcessingParameterFeatureSink(self.OUTPUT, self.tr("Units with panels")))
        self.addParameter(QgsProcessingParameterFeatureSink(
            self.OUTPUT_SCHEDULE, self.tr("Schedule"), compat.TYPE_VECTOR))
        self.add_report_parameter()

    # ------------------------------------------------------------------------------
    def processAlgorithm(self, parameters, context, feedback):  # noqa: N802 (host naming)
        units = self.parameterAsSource(parameters, self.UNITS, context)
        if units is None:
            raise QgsProcessingException(self.invalidSourceError(parameters, self.UNITS))
        names = units.fields().names()
        order_field = self.field_name(parameters, self.ORDER_FIELD, context, units)
        stratum_field = self.field_name(parameters, self.STRATUM_FIELD, context, units)
        with self.engine_errors():
            spec = engine.panel_spec_iv(
                self.parameterAsEnum(parameters, self.PANEL_DESIGN, context),
                self.parameterAsInt(parameters, self.PANELS, context),
                self.parameterAsDouble(parameters, self.CORE_SHARE, context),
                self.parameterAsInt(parameters, self.START_YEAR, context),
                self.parameterAsInt(parameters, self.YEARS, context))
        seeded = self.seeded_generator(parameters, context, feedback)
        crs = bridge.computation_crs(units.sourceCrs(), units.sourceExtent(), context, feedback, units.sourceName())
        layout_fields = tuple(n for n in ("role", "unit_id", "design") if n in names)  # written by plotwise:layout
        wanted = tuple(dict.fromkeys(f for f in (order_field, stratum_field, *layout_fields) if f))
        records = bridge.read_features(units, crs, context, feedback, wanted, units.sourceName(), drop_empty=False)
        empty = [int(f) for f, g in zip(records.fids, records.geometries) if g is None]
        if empty:
            raise QgsProcessingException(self.tr(
                "Layer '{layer}': features {ids} have no geometry. Every unit needs its location: remove them or "
                "give them a geometry.").format(layer=units.sourceName(), ids=bridge.id_list(empty)))
        unit_ids = records.attributes.get("unit_id") or [int(f) for f in records.fids]
        days = self.parameterAsDouble(parameters, self.UNIT_DAYS, context)
        with self.engine_errors():
            assignment = engine.assign_panels(
                unit_ids, spec, strata=records.attributes.get(stratum_field) if stratum_field else None,
                draw_ord=records.attributes.get(order_field) if order_field else None,
                roles=records.attributes.get("role"), days_per_unit=days)
        feedback.setProgress(30)
        xy = [(g.centroid.x, g.centroid.y) if g.geom_type != "Point" else (g.x, g.y) for g in records.geometries]
        balance = engine.panel_balance_check(xy, assignment, seeded.generator)
        design = engine.recorded_design(records.attributes.get("design"), records.attributes.get("role"))
        spread = engine.spread_warning(design, balance)
        warnings = [self.translate_message(w) for w in assignment.warnings + ((spread,) if spread else ())]
        for warning in warnings:
            feedback.pushWarning(warning)
        feedback.setProgress(60)
        dest = self._write_units(parameters, context, feedback, units, records, assignment)
        schedule = self._write_schedule(parameters, context, assignment)
        report = self.new_report(self.tr("Revisit panels"))
        fill_panels_report(report, assignment, balance, PanelsRun(
            units.sourceName(), order_field, stratum_field, int((assignment.panel < 0).sum()), seeded.seed,
            crs.authid(), design), warnings)
        self.style_output(context, dest, "panels")
        result = {self.OUTPUT: dest, self.OUTPUT_SCHEDULE: schedule}
        path = self.write_report(report, parameters, context, feedback)
        if path:
            result[self.REPORT] = path
        return result

    def _write_units(self, parameters, context, feedback, source, records, assignment):
        in_fields = [f for f in source.fields() if f.name() not in OUTPUT_FIELDS]
        fields = bridge.make_fields([])
        for field in in_fields:
            fields.append(field)
        fields.append(compat.make_field("panel", "int"))
        fields.append(compat.make_field("years", "string", 254))
        sink, dest = self.parameterAsSink(parameters, self.OUTPUT, context, fields, source.wkbType(),
                                          source.sourceCrs())
        if sink is None:
            raise QgsProcessingException(self.invalidSinkError(parameters, self.OUTPUT))
        by_fid = {int(f): i for i, f in enumerate(records.fids)}
        keep = [source.fields().indexOf(f.name()) for f in in_fields]
        null = bridge.sink_value(None)
        for feature in source.getFeatures():
            if feedback.isCanceled():
                raise self.cancelled_error()
            i = by_fid[feature.id()]
            out = QgsFeature(fields)
            out.setGeometry(feature.geometry())
            panel = int(assignment.panel[i])
            attributes = feature.attributes()
            out.setAttributes([attributes[k] for k in keep] + (
                [panel, assignment.years_text[i]] if panel >= 0 else [null, null]))
            sink.addFeature(out, compat.FAST_INSERT)
        return dest

    def _write_schedule(self, parameters, context, assignment):
        fields = bridge.make_fields([("year", "int"), ("panel", "int"), ("n_units", "int"), ("days", "double")])
        sink, dest = self.parameterAsSink(parameters, self.OUTPUT_SCHEDULE, context, fields, compat.WKB_NOGEOMETRY)
        if sink is None:
            raise QgsProcessingException(self.invalidSinkError(parameters, self.OUTPUT_SCHEDULE))
        rows = [[r.year, r.panel, r.n_units, r.days] for r in assignment.schedule]
        bridge.write_features(sink, fields, [None] * len(rows), rows)
        return dest
