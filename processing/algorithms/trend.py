"""plotwise:trend: the trend over years of a monitoring programme, from unit counts or yearly estimates."""
from qgis.core import (
    QgsProcessingException,
    QgsProcessingOutputNumber,
    QgsProcessingParameterEnum,
    QgsProcessingParameterFeatureSink,
    QgsProcessingParameterFeatureSource,
    QgsProcessingParameterField,
    QgsProcessingParameterNumber,
)

from .. import compat
from .. import bridge
from ..engine import trend as engine
from ..report.trend import TrendRun, fill_trend_report
from .base import PlotwiseAlgorithm


class Trend(PlotwiseAlgorithm):
    ALGORITHM_NAME = "trend"
    GROUP_ID = "estimation"

    INPUT = "INPUT"
    SOURCE = "SOURCE"
    UNIT_ID_FIELD = "UNIT_ID_FIELD"
    YEAR_FIELD = "YEAR_FIELD"
    COUNT_FIELD = "COUNT_FIELD"
    ESTIMATE_FIELD = "ESTIMATE_FIELD"
    SE_FIELD = "SE_FIELD"
    STRATUM_FIELD = "STRATUM_FIELD"
    AREA_FIELD = "AREA_FIELD"
    CONFIDENCE = "CONFIDENCE"
    OUTPUT_TABLE = "OUTPUT_TABLE"
    CHANGE = "CHANGE"
    CHANGE_LO = "CHANGE_LO"
    CHANGE_HI = "CHANGE_HI"
    P_VALUE = "P_VALUE"

    def displayName(self):  # noqa: N802 (host naming)
        return self.tr("Trend over years")

    def shortHelpString(self):  # noqa: N802 (host naming)
        return self.tr(
            "Estimates the change per year of a monitored population, with its confidence interval and p-value, "
            "and a yearly index.\n\n"
            "Input: a layer or table with one record per unit and year (unit counts), or one record per year "
            "(yearly estimates).\n"
            "Source 0, unit counts: unit id, year and count fields; optionally a stratum field (a trend per "
            "stratum is added to the report) and a unit-area field (the area or length surveyed in that record: "
            "counts are compared per unit of effort). A NULL count means not surveyed. Units need not be "
            "surveyed every year (revisit panels). The model is log-linear Poisson with one effect per unit, log "
            "E[count] = log(area) + unit effect + β·year (McCullagh & Nelder 1989), fitted by Newton's method with "
            "the unit effects in closed form. Overdispersion by quasi-likelihood: the interval uses the deviance "
            "drop between a model with one effect per year and the trend model, per degree of freedom, so that "
            "years that differ as a whole (weather, observers) widen it, with Student's t. Units that never "
            "counted an animal are left out of the fit (they carry no information on the trend).\n"
            "Source 1, yearly estimates: year, estimate and standard-error fields (for example the abund and "
            "abund_se of the estimate step, one season per record; with a stratum field, the rows 'all' are used). "
            "Weighted log-linear regression in which each year's variance is its sampling variance ln(1 + CV²) "
            "plus the year-to-year process variance, estimated by the method of moments (DerSimonian & Laird 1986; "
            "Thompson & Sharp 1999); the slope's variance is scaled by the residual mean square, with t on k − 2 "
            "degrees of freedom (Hartung & Knapp 2001).\n"
            "Confidence level: of the intervals (default 0.95).\n\n"
            "Outputs: the yearly index table (year, index with index_lo and index_hi, and the fitted trend with "
            "trend_lo and trend_hi); the numbers CHANGE, CHANGE_LO, CHANGE_HI (% per year) and P_VALUE (two-sided, "
            "no trend); an HTML report with the index and the trend, the change per year in words, and the "
            "cautions.\n\n"
            "At least 3 years are needed; a unit counted twice in a year, negative counts or estimates not above 0 "
            "stop the run, naming the records.\n\n"
            "A trend in counts is a trend in the population only if detection did not change over the years.\n\n"
            "References: McCullagh & Nelder (1989); Bishop, Fienberg & Holland (1975); DerSimonian & Laird (1986); "
            "Thompson & Sharp (1999); Hartung & Knapp (2001); Urquhart & Kincaid (1999)."
        )

    def initAlgorithm(self, config=None):  # noqa: N802 (host naming)
        self.addParameter(QgsProcessingParameterFeatureSource(
            self.INPUT, self.tr("Counts or yearly estimates (layer or table)"), [compat.TYPE_VECTOR]))
        self.addParameter(QgsProcessingParameterEnum(
            self.SOURCE, self.tr("What the input holds"), [self.tr("Unit counts"), self.tr("Yearly estimates")],
            defaultValue=0))
        fields = (
            (self.UNIT_ID_FIELD, self.tr("Unit id field (unit counts)"), "unit_id", compat.FIELD_ANY),
            (self.YEAR_FIELD, self.tr("Year field"), "year", compat.FIELD_NUMERIC),
            (self.COUNT_FIELD, self.tr("Count field (unit counts)"), "count", compat.FIELD_NUMERIC),
            (self.ESTIMATE_FIELD, self.tr("Estimate field (yearly estimates)"), "abund", compat.FIELD_NUMERIC),
            (self.SE_FIELD, self.tr("Standard-error field (yearly estimates)"), "abund_se", compat.FIELD_NUMERIC),
            (self.STRATUM_FIELD, self.tr("Stratum field (optional)"), None, compat.FIELD_ANY),
            (self.AREA_FIELD, self.tr("Unit-area field: area surveyed per record (optional)"), None,
             compat.FIELD_NUMERIC),
        )
        for name, label, default, kind in fields:
            self.addParameter(QgsProcessingParameterField(name, label, default, self.INPUT, kind, optional=True))
        self.addParameter(QgsProcessingParameterNumber(
            self.CONFIDENCE, self.tr("Confidence level"), type=compat.NUMBER_DOUBLE, defaultValue=0.95,
            minValue=0.5, maxValue=0.999))
        self.addParameter(QgsProcessingParameterFeatureSink(
            self.OUTPUT_TABLE, self.tr("Yearly index"), compat.TYPE_VECTOR))
        self.add_report_parameter()
        for name, label in ((self.CHANGE, self.tr("Change per year (%)")),
                            (self.CHANGE_LO, self.tr("Lower limit of the change per year (%)")),
                            (self.CHANGE_HI, self.tr("Upper limit of the change per year (%)")),
                            (self.P_VALUE, self.tr("p-value of the trend (two-sided)"))):
            self.addOutput(QgsProcessingOutputNumber(name, label))

    # ------------------------------------------------------------------------------
    def processAlgorithm(self, parameters, context, feedback):  # noqa: N802 (host naming)
        source = self.parameterAsSource(parameters, self.INPUT, context)
        if source is None:
            raise QgsProcessingException(self.invalidSourceError(parameters, self.INPUT))
        counts = self.parameterAsEnum(parameters, self.SOURCE, context) == 0
        confidence = self.parameterAsDouble(parameters, self.CONFIDENCE, context)
        field = lambda name, required: self.field_name(parameters, name, context, source, required=required)  # noqa: E731
        run = TrendRun(
            source.sourceName(), field(self.UNIT_ID_FIELD, counts) if counts else None,
            field(self.YEAR_FIELD, True), field(self.COUNT_FIELD, counts) if counts else None,
            None if counts else field(self.ESTIMATE_FIELD, True), None if counts else field(self.SE_FIELD, True),
            field(self.STRATUM_FIELD, False), field(self.AREA_FIELD, False) if counts else None)
        names = [n for n in (run.unit_field, run.year_field, run.count_field, run.estimate_field, run.se_field,
                             run.stratum_field, run.area_field) if n]
        fids, values = bridge.read_attributes(source, list(dict.fromkeys(names)))
        feedback.setProgress(20)
        with self.engine_errors():
            result = self._trend(run, values, fids, confidence)
        warnings = [self.translate_message(w) for w in result.warnings]
        for warning in warnings:
            feedback.pushWarning(warning)
        table = self._write_table(parameters, context, result)
        report = self.new_report(self.tr("Trend over years"))
        fill_trend_report(report, result, run, warnings)
        feedback.pushInfo(self.tr("Change per year: {c:+.2f}% ({lo:+.2f}% to {hi:+.2f}%), p = {p:.3g}.").format(
            c=result.change, lo=result.change_lo, hi=result.change_hi, p=result.p_value))
        outputs = {self.OUTPUT_TABLE: table, self.CHANGE: result.change, self.CHANGE_LO: result.change_lo,
                   self.CHANGE_HI: result.change_hi, self.P_VALUE: result.p_value}
        path = self.write_report(report, parameters, context, feedback)
        if path:
            outputs[self.REPORT] = path
        return outputs

    @staticmethod
    def _trend(run, values, fids, confidence):
        if run.count_field:
            table = engine.count_table_iv(
                values[run.unit_field], values[run.year_field], values[run.count_field],
                values[run.area_field] if run.area_field else None,
                values[run.stratum_field] if run.stratum_field else None, record_ids=fids)
            return engine.unit_count_trend(table, confidence)
        keep = engine.overall_rows(values[run.stratum_field]) if run.stratum_field else [True] * len(fids)
        pick = lambda name: [v for v, k in zip(values[name], keep) if k]  # noqa: E731
        series = engine.estimate_series_iv(pick(run.year_field), pick(run.estimate_field), pick(run.se_field),
                                           record_ids=[f for f, k in zip(fids, keep) if k])
        return engine.estimate_trend(series, confidence)

    def _write_table(self, parameters, context, result):
        fields = bridge.make_fields([("year", "int"), ("index", "double"), ("index_lo", "double"),
                                     ("index_hi", "double"), ("trend", "double"), ("trend_lo", "double"),
                                     ("trend_hi", "double")])
        sink, dest = self.parameterAsSink(parameters, self.OUTPUT_TABLE, context, fields, compat.WKB_NOGEOMETRY)
        if sink is None:
            raise QgsProcessingException(self.invalidSinkError(parameters, self.OUTPUT_TABLE))
        rows = [[int(y), float(i), float(a), float(b), float(f), float(fa), float(fb)] for y, i, a, b, f, fa, fb in
                zip(result.years, result.index, result.index_lo, result.index_hi, result.fit, result.fit_lo,
                    result.fit_hi)]
        bridge.write_features(sink, fields, [None] * len(rows), rows)
        return dest
