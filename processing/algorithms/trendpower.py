"""plotwise:trendpower: power of a monitoring programme to detect a trend, by simulation."""
from qgis.core import (
    QgsProcessingException,
    QgsProcessingParameterBoolean,
    QgsProcessingParameterEnum,
    QgsProcessingParameterFeatureSink,
    QgsProcessingParameterFeatureSource,
    QgsProcessingParameterNumber,
    QgsProcessingParameterString,
)

from .. import compat
from .. import bridge
from ..engine import panels as panel_engine
from ..engine import trend_power as engine
from ..report.trendpower import PowerRun, fill_power_report
from .base import PlotwiseAlgorithm


class TrendPower(PlotwiseAlgorithm):
    ALGORITHM_NAME = "trendpower"
    GROUP_ID = "design"

    N_UNITS = "N_UNITS"
    YEARS = "YEARS"
    PANEL_DESIGN = "PANEL_DESIGN"
    PANELS = "PANELS"
    CORE_SHARE = "CORE_SHARE"
    PANEL_LAYER = "PANEL_LAYER"
    CHANGES = "CHANGES"
    MEAN_COUNT = "MEAN_COUNT"
    SD_UNIT = "SD_UNIT"
    SD_UNIT_YEAR = "SD_UNIT_YEAR"
    SD_YEAR = "SD_YEAR"
    PILOT = "PILOT"
    DETECTION = "DETECTION"
    ALPHA = "ALPHA"
    TWO_SIDED = "TWO_SIDED"
    REPLICATES = "REPLICATES"
    OUTPUT_TABLE = "OUTPUT_TABLE"

    def displayName(self):  # noqa: N802 (host naming)
        return self.tr("Power to detect a trend")

    def shortHelpString(self):  # noqa: N802 (host naming)
        return self.tr(
            "Estimates, by simulation, how likely a monitoring programme is to detect a given change per year: "
            "the power, by number of years and number of units, and the years needed for 80% power.\n\n"
            "Units per year and panels: N_UNITS units over YEARS years, in the panel design of plotwise:panels "
            "(0 every unit every year; 1 rotating: PANELS panels, each unit once every PANELS years; 2 split: a "
            "core of CORE_SHARE of the units every year plus rotating panels). Or give a panels layer (the output "
            "of plotwise:panels): its units and their visit years replace N_UNITS, YEARS and the design.\n"
            "Changes to detect: annual changes in % per year, several separated by commas (e.g. -3, -5).\n"
            "Mean count: the mean number of animals per unit in the first year (before detection).\n"
            "Variance components, as standard deviations on the log scale: between units (SD_UNIT, lasting "
            "differences between units), unit × year (SD_UNIT_YEAR, a unit's ups and downs) and year to year "
            "(SD_YEAR, shared by all units: weather, observers, conditions). The defaults (1.0, 0.3, 0.1) are "
            "illustrative only: use your own values. A pilot table (the estimate step's output table, fields n, "
            "mean_c and sd_c) can give the mean count and SD_UNIT: they are then taken from it by matching a "
            "Poisson–log-normal count. The other two need several years of counts.\n"
            "Detection probability: each animal is counted with this probability (constant over the years).\n"
            "Significance level and test: the level of the t test on the trend; two-sided, or one-sided in the "
            "direction of the change. 0.1 is often used in monitoring (common practice).\n"
            "Replicates: simulated programmes per change (1,000 give a Monte Carlo SE of at most 0.016). Random "
            "seed: 0 draws one and records it.\n\n"
            "Each replicate simulates Poisson counts for every unit and visit, estimates the trend with the same "
            "model as plotwise:trend (log-linear Poisson with unit effects, quasi-likelihood scale between years) "
            "and records whether the change was detected (Gerrodette 1987 for the setting).\n\n"
            "Outputs: a table of power with its Monte Carlo SE by years, n_units and change; an HTML report with the "
            "power curves against years and against units and the years needed for 80% power. Power depends on "
            "the variance components assumed.\n\n"
            "References: Gerrodette (1987); Urquhart & Kincaid (1999); McDonald (2003); McCullagh & Nelder (1989).\n\n"
            "A monitoring programme sends teams out every year: check every unit's access and safety before each "
            "season; the tool never makes a location safe. Follow your agency's field-safety rules and local law."
        )

    def initAlgorithm(self, config=None):  # noqa: N802 (host naming)
        integer, double = compat.NUMBER_INTEGER, compat.NUMBER_DOUBLE
        self.addParameter(QgsProcessingParameterNumber(
            self.N_UNITS, self.tr("Units (N_UNITS)"), type=integer, defaultValue=50, minValue=1, maxValue=100000))
        self.addParameter(QgsProcessingParameterNumber(
            self.YEARS, self.tr("Years of the programme"), type=integer, defaultValue=10, minValue=3,
            maxValue=panel_engine.MAX_YEARS))
        self.addParameter(QgsProcessingParameterEnum(
            self.PANEL_DESIGN, self.tr("Panel design"),
            [self.tr("Every unit every year"), self.tr("Rotating panels"), self.tr("Split panels (core + rotating)")],
            defaultValue=0))
        self.addParameter(QgsProcessingParameterNumber(
            self.PANELS, self.tr("Rotating panels (K)"), type=integer, defaultValue=3, minValue=1,
            maxValue=panel_engine.MAX_YEARS))
        self.addParameter(QgsProcessingParameterNumber(
            self.CORE_SHARE, self.tr("Share of units in the core (split panels)"), type=double, defaultValue=0.3,
            minValue=0.0, maxValue=1.0))
        self.addParameter(QgsProcessingParameterFeatureSource(
            self.PANEL_LAYER, self.tr("Panels layer (output of plotwise:panels; replaces the design)"),
            [compat.TYPE_VECTOR], optional=True))
        self.addParameter(QgsProcessingParameterString(
            self.CHANGES, self.tr("Changes to detect (% per year, comma-separated)"), defaultValue="-3, -5"))
        for name, label, default, top in (
            (self.MEAN_COUNT, self.tr("Mean animals per unit in the first year"), 5.0, 1e6),
            (self.SD_UNIT, self.tr("SD between units (log scale)"), 1.0, 5.0),
            (self.SD_UNIT_YEAR, self.tr("SD unit × year (log scale)"), 0.3, 5.0),
            (self.SD_YEAR, self.tr("SD year to year (log scale)"), 0.1, 5.0),
        ):
            self.addParameter(QgsProcessingParameterNumber(name, label, type=double, defaultValue=default,
                                                           minValue=0.0, maxValue=top))
        self.addParameter(QgsProcessingParameterFeatureSource(
            self.PILOT, self.tr("Pilot estimate table (gives the mean count and SD between units; optional)"),
            [compat.TYPE_VECTOR], optional=True))
        self.addParameter(QgsProcessingParameterNumber(
            self.DETECTION, self.tr("Detection probability"), type=double, defaultValue=1.0, minValue=0.001,
            maxValue=1.0))
        self.addParameter(QgsProcessingParameterNumber(
            self.ALPHA, self.tr("Significance level"), type=double, defaultValue=0.05, minValue=0.001, maxValue=0.49))
        self.addParameter(QgsProcessingParameterBoolean(self.TWO_SIDED, self.tr("Two-sided test"), defaultValue=True))
        self.addParameter(QgsProcessingParameterNumber(
            self.REPLICATES, self.tr("Replicates"), type=integer, defaultValue=1000, minValue=10,
            maxValue=engine.MAX_REPLICATES))
        self.add_seed_parameter()
        self.addParameter(QgsProcessingParameterFeatureSink(self.OUTPUT_TABLE, self.tr("Power table"),
                                                            compat.TYPE_VECTOR))
        self.add_report_parameter()

    # ------------------------------------------------------------------------------
    def _plan(self, parameters, context):
        """The visit plan, its readable name, the number of units and the layer it came from (or None)."""
        layer = self.parameterAsSource(parameters, self.PANEL_LAYER, context)
        design_names = (self.tr("every unit every year"), self.tr("rotating panels"), self.tr("split panels"))
        if layer is None:
            with self.engine_errors():
                spec = panel_engine.panel_spec_iv(
                    self.parameterAsEnum(parameters, self.PANEL_DESIGN, context),
                    self.parameterAsInt(parameters, self.PANELS, context),
                    self.parameterAsDouble(parameters, self.CORE_SHARE, context), 1,
                    self.parameterAsInt(parameters, self.YEARS, context))
            name = design_names[spec.design]
            if spec.design:
                name += " " + self.tr("(K = {k})").format(k=spec.panels)
            return engine.plan_from_spec(spec), name, self.parameterAsInt(parameters, self.N_UNITS, context), None
        _, values = bridge.read_attributes(layer, ["years"])
        lists = [[int(y) for y in str(text).split(",") if y.strip()] for text in values["years"] if text]
        with self.engine_errors():
            plan = engine.plan_from_years(lists)
        return plan, self.tr("{k} panels from the layer").format(k=len(plan.labels)), len(lists), layer.sourceName()

    def _components(self, parameters, context):
        """Mean count and SD_UNIT (from the pilot table when one is given) and the pilot's name."""
        mean = self.parameterAsDouble(parameters, self.MEAN_COUNT, context)
        sd_unit = self.parameterAsDouble(parameters, self.SD_UNIT, context)
        pilot = self.parameterAsSource(parameters, self.PILOT, context)
        if pilot is None:
            return mean, sd_unit, None
        _, values = bridge.read_attributes(pilot, ["stratum", "n", "mean_c", "sd_c"])
        rows = [i for i, s in enumerate(values["stratum"]) if str(s).strip().lower() != "all"]
        pick = lambda name: [values[name][i] if values[name][i] is not None else float("nan") for i in rows]  # noqa
        with self.engine_errors():
            mean, sd_unit = engine.unit_sd_from_pilot(pick("mean_c"), pick("sd_c"), pick("n"),
                                                      self.parameterAsDouble(parameters, self.SD_UNIT_YEAR, context))
        return mean, sd_unit, pilot.sourceName()

    def processAlgorithm(self, parameters, context, feedback):  # noqa: N802 (host naming)
        plan, design_name, n_units, design_from = self._plan(parameters, context)
        mean, sd_unit, pilot_from = self._components(parameters, context)
        with self.engine_errors():
            spec = engine.power_spec_iv(
                plan, n_units, engine.parse_changes(self.parameterAsString(parameters, self.CHANGES, context)), mean,
                sd_unit, self.parameterAsDouble(parameters, self.SD_UNIT_YEAR, context),
                self.parameterAsDouble(parameters, self.SD_YEAR, context),
                self.parameterAsDouble(parameters, self.DETECTION, context),
                self.parameterAsDouble(parameters, self.ALPHA, context),
                self.parameterAsBoolean(parameters, self.TWO_SIDED, context),
                self.parameterAsInt(parameters, self.REPLICATES, context))
        seeded = self.seeded_generator(parameters, context, feedback)
        with self.engine_errors():
            result = engine.trend_power(spec, seeded.generator, progress=self.progress_callback(feedback, 0, 90))
        warnings = [self.translate_message(w) for w in result.warnings]
        for warning in warnings:
            feedback.pushWarning(warning)
        fields = bridge.make_fields([("years", "int"), ("n_units", "int"), ("change", "double"), ("power", "double"),
                                     ("power_se", "double"), ("failed", "int"), ("curve", "string", 12)])
        sink, dest = self.parameterAsSink(parameters, self.OUTPUT_TABLE, context, fields, compat.WKB_NOGEOMETRY)
        if sink is None:
            raise QgsProcessingException(self.invalidSinkError(parameters, self.OUTPUT_TABLE))
        rows = [[r.years, r.n_units, r.change, r.power, r.power_se, r.failed, r.curve] for r in result.rows]
        bridge.write_features(sink, fields, [None] * len(rows), rows)
        for change, years in result.years_needed.items():
            feedback.pushInfo(self.tr("Change {c:+g}% per year: 80% power after {t} years.").format(c=change, t=years)
                              if years else
                              self.tr("Change {c:+g}% per year: 80% power not reached within {t} years.").format(
                                  c=change, t=plan.years))
        report = self.new_report(self.tr("Power to detect a trend"))
        fill_power_report(report, result, PowerRun(design_from, pilot_from, seeded.seed), design_name, warnings)
        outputs = {self.OUTPUT_TABLE: dest}
        path = self.write_report(report, parameters, context, feedback)
        if path:
            outputs[self.REPORT] = path
        return outputs
