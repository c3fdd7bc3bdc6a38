"""plotwise:estimate: density and abundance per stratum and for the frame, from the counts in sample units."""
import math

import numpy as np
from qgis.core import (
    QgsCoordinateReferenceSystem,
    QgsProcessingException,
    QgsProcessingOutputNumber,
    QgsProcessingParameterBoolean,
    QgsProcessingParameterEnum,
    QgsProcessingParameterFeatureSink,
    QgsProcessingParameterFeatureSource,
    QgsProcessingParameterField,
    QgsProcessingParameterNumber,
)
from shapely.geometry import MultiPolygon, Polygon

from .. import compat
from .. import bridge
from ..engine import estimation, variance
from ..engine.listing import natural_key
from ..report import estimate as report_estimate
from ..styles import DENSITY_RAMP, NO_ESTIMATE_COLOUR
from .base import PlotwiseAlgorithm

M2_PER = {0: 1e6, 1: 1e4}  # AREA_UNIT: 0 km², 1 ha
UNIT_NAMES = {0: "km²", 1: "ha"}
CI_METHODS = (estimation.CI_T, estimation.CI_LOGNORMAL, estimation.CI_BOOTSTRAP)
VARIANCE_METHODS = (estimation.VARIANCE_SRS, estimation.VARIANCE_LOCAL, estimation.VARIANCE_LOCAL_SCALED)
ONE_STRATUM = "frame"
RECORD_FIELDS = ("unit_id", "role", "incl_p", "design", "edge", "reach_m")  # written by plotwise:layout

OUTPUT_FIELDS = (
    ("stratum", "string", 40), ("area", "double"), ("n", "int"), ("mean_c", "double"), ("sd_c", "double"),
    ("dens", "double"), ("dens_se", "double"), ("dens_lo", "double"), ("dens_hi", "double"),
    ("abund", "double"), ("abund_se", "double"), ("abund_lo", "double"), ("abund_hi", "double"),
    ("cv", "double"), ("df", "double"), ("n_next", "int"),
)

class Estimate(PlotwiseAlgorithm):
    ALGORITHM_NAME = "estimate"
    GROUP_ID = "estimation"

    UNITS = "UNITS"
    COUNT_FIELD = "COUNT_FIELD"
    STRATUM_FIELD = "STRATUM_FIELD"
    UNIT_AREA_FIELD = "UNIT_AREA_FIELD"
    UNIT_AREA = "UNIT_AREA"
    STRIP_WIDTH = "STRIP_WIDTH"
    STRATA = "STRATA"
    STRATA_ID_FIELD = "STRATA_ID_FIELD"
    CONFIDENCE = "CONFIDENCE"
    CI_METHOD = "CI_METHOD"
    FPC = "FPC"
    DETECTION_P = "DETECTION_P"
    DETECTION_SE = "DETECTION_SE"
    DETECTION_DF = "DETECTION_DF"
    AREA_UNIT = "AREA_UNIT"
    TARGET_CV = "TARGET_CV"
    VARIANCE_METHOD = "VARIANCE_METHOD"
    PRESENCE = "PRESENCE"
    DROP_EMPTY = "DROP_EMPTY"
    TRUE_TOTAL = "TRUE_TOTAL"
    OUTPUT = "OUTPUT"
    OUTPUT_TABLE = "OUTPUT_TABLE"
    DENSITY = "DENSITY"
    DENSITY_SE = "DENSITY_SE"
    ABUNDANCE = "ABUNDANCE"
    ABUNDANCE_LO = "ABUNDANCE_LO"
    ABUNDANCE_HI = "ABUNDANCE_HI"
    CV = "CV"

    def displayName(self):  # noqa: N802 (host naming)
        return self.tr("Estimate density and abundance")

    def shortHelpString(self):  # noqa: N802 (host naming)
        return self.tr(
            "Estimates density and abundance per stratum and for the whole frame from the counts in the "
            "sample units, with standard error, CV and confidence interval, and the sample size the next "
            "survey needs.\n\n"
            "Estimator: D_h = Σy / Σa per stratum (the ratio estimator; with equal units, the mean count "
            "divided by the unit area), with its linearised variance (Cochran 1977, ch. 5 and 6); "
            "abundance N_h = D_h·A_h; overall N = Σ N_h and D = N / Σ A_h, with the variances added.\n\n"
            "Finite-population correction: 1 − Σa/A_h, only for units that cannot overlap (a finite population of "
            "units drawn without replacement, Cochran 1977, §2.4). Units from plotwise:layout record their design "
            "(field design): the correction is refused, with a warning, in strata laid out by simple random "
            "centres without a minimum spacing of at least the unit's width (their units may overlap: a "
            "continuous population, Cordy 1993). For units without that record it is your choice, and the report "
            "states the assumption that they do not overlap.\n\n"
            "Edges: units laid out by plus sampling (field edge = plus, the layout's default) count only inside "
            "their stratum, and the counts expand to the stratum grown by the unit's reach (field reach_m), "
            "N_h = A⁺_h·Σy/Σa (Gregoire & Valentine 2008, ch. 10), which removes the bias at the edges.\n\n"
            "Counts: a NULL count means the unit was not surveyed: it is left out and listed as "
            "non-response. Reserve units (role = reserve) without a count are unused reserves and are "
            "skipped quietly; reserves that were surveyed count like any other unit. 0 means surveyed, "
            "none seen. Negative or non-numeric counts stop the run, naming the units.\n\n"
            "Unit area (m²): the unit area field (default area_m2, as the layout writes it) when it is "
            "above 0, else the polygon's area, else for lines the strip width × the line's length, else the "
            "fixed unit area for points and lines.\n\n"
            "Strata: polygons with an id field matching the units' stratum field; their areas define the "
            "frame. When the units have no stratum field, or the strata layer is a single polygon without "
            "an id field, all units form one stratum over the frame. A "
            "stratum with one surveyed unit is paired with a partner fixed before the counts are seen (the "
            "stratum sharing the longest edge on the map, else the next in id order) and takes its variance "
            "from the collapsed-strata pairs formula (Cochran 1977, §5A.12; Hansen, Hurwitz & Madow 1953 for "
            "unequal sizes), with 1 degree of freedom and a warning; the partner keeps its own variance. A "
            "stratum with none is an error, unless you choose to leave it out: "
            "then the frame shrinks, and the report says so. Strata must not overlap (an overlap of more than "
            "0.1 % of the smaller stratum is an error, a smaller one a warning), and every strata polygon needs its "
            "id: a polygon without one is an error, unless strata with no surveyed unit may be left out.\n\n"
            "Intervals: t with Satterthwaite's degrees of freedom (Satterthwaite 1946; Cochran 1977); "
            "log-normal, N/C to N·C with C = exp(t_df·√ln(1+CV²)), t with the same degrees of freedom (Buckland "
            "et al. 2001, §3.6.1; the normal quantile only for infinite df, Burnham et al. 1987); or a rescaled "
            "stratified percentile bootstrap of 2,000 resamples (seeded; Rao & Wu 1988), which carries the "
            "finite-population correction. Where every count is 0 the interval is one-sided, from 0 to the "
            "Poisson upper limit −ln(1 − level)·A/Σa (Garwood 1936; about 3·A/Σa at 95 %), divided by p.\n\n"
            "Variance: the simple random sampling formula, or the local neighbourhood estimator "
            "(Stevens & Olsen 2003) for systematic grids and spatially balanced layouts, where the simple "
            "formula overstates the variance, with the degrees of freedom of its quadratic form (Box 1954); or "
            "our variant of it, scaled by n / Σ(1 − Σw²) so that it agrees with the simple formula where there "
            "is no spatial pattern (the published sum falls short by about a quarter there).\n\n"
            "Detection: with a detection probability p below 1, estimates are divided by p and the squared "
            "CVs add (delta method, Seber 1982). p and its SE must come from a separate study; its degrees of "
            "freedom (0: p counts as known) enter the interval's by Satterthwaite's rule (Buckland et al. 2001, "
            "eq. 3.75). An SE above p/2 gives a warning.\n\n"
            "Presence data: with the presence option a 0/1 field gives the stratified proportion of units "
            "where the species was detected (naive occupancy, not corrected for detection), and abund is the "
            "number of occupied units in the frame.\n\n"
            "Target CV (above 0): n_next is the number of units each stratum needs next time for that CV of "
            "the overall abundance, by Neyman allocation on the standard deviations the variance estimator "
            "implies (Neyman 1934; Cochran 1977, eq. 5.26), at least 2 and at most the units a stratum holds.\n\n"
            "True total: for simulations and training only. The report then shows it beside the estimate; "
            "in a real survey the true total is never known.\n\n"
            "Outputs: the strata polygons with the estimate fields (for a choropleth), a table with one row per "
            "stratum and a row 'all', an HTML report, and the overall numbers for models."
        )

    def initAlgorithm(self, config=None):  # noqa: N802 (host naming)
        self.addParameter(QgsProcessingParameterFeatureSource(
            self.UNITS, self.tr("Sample units with counts"), [compat.TYPE_VECTOR_ANY]))
        self.addParameter(QgsProcessingParameterField(
            self.COUNT_FIELD, self.tr("Count field"), "count", self.UNITS, compat.FIELD_ANY))
        self.addParameter(QgsProcessingParameterField(
            self.STRATUM_FIELD, self.tr("Stratum field of the units"), "stratum", self.UNITS,
            compat.FIELD_ANY, optional=True))
        self.addParameter(QgsProcessingParameterField(
            self.UNIT_AREA_FIELD, self.tr("Unit area field (m²)"), "area_m2", self.UNITS, compat.FIELD_NUMERIC,
            optional=True))
        self.addParameter(QgsProcessingParameterNumber(
            self.UNIT_AREA, self.tr("Fixed unit area for points and lines (m²; 0: not used)"),
            type=compat.NUMBER_DOUBLE, defaultValue=0.0, minValue=0.0))
        self.addParameter(QgsProcessingParameterNumber(
            self.STRIP_WIDTH, self.tr("Strip width of line transects (m, full width; 0: not used)"),
            type=compat.NUMBER_DOUBLE, defaultValue=0.0, minValue=0.0))
        self.addParameter(QgsProcessingParameterFeatureSource(
            self.STRATA, self.tr("Strata (the frame)"), [compat.TYPE_VECTOR_POLYGON]))
        self.addParameter(QgsProcessingParameterField(
            self.STRATA_ID_FIELD, self.tr("Stratum id field of the strata"), "stratum", self.STRATA,
            compat.FIELD_ANY, optional=True))
        self.addParameter(QgsProcessingParameterNumber(
            self.CONFIDENCE, self.tr("Confidence level"), type=compat.NUMBER_DOUBLE, defaultValue=0.95,
            minValue=0.5, maxValue=0.999))
        self.addParameter(QgsProcessingParameterEnum(
            self.CI_METHOD, self.tr("Confidence interval"),
            [self.tr("t with Satterthwaite degrees of freedom"), self.tr("Log-normal"),
             self.tr("Stratified bootstrap (2,000 resamples)")], defaultValue=0))
        self.addParameter(QgsProcessingParameterBoolean(
            self.FPC, self.tr("Finite-population correction"), defaultValue=False))
        self.addParameter(QgsProcessingParameterNumber(
            self.DETECTION_P, self.tr("Detection probability p (from a separate study; 1: all seen)"),
            type=compat.NUMBER_DOUBLE, defaultValue=1.0, minValue=0.001, maxValue=1.0))
        self.addParameter(QgsProcessingParameterNumber(
            self.DETECTION_SE, self.tr("Standard error of p"), type=compat.NUMBER_DOUBLE, defaultValue=0.0,
            minValue=0.0))
        self.addParameter(QgsProcessingParameterEnum(
            self.AREA_UNIT, self.tr("Area unit of the results"), [self.tr("km²"), self.tr("hectares")],
            defaultValue=0))
        self.addParameter(QgsProcessingParameterNumber(
            self.TARGET_CV, self.tr("Target CV for the next survey (0: not used; e.g. 0.15)"),
            type=compat.NUMBER_DOUBLE, defaultValue=0.0, minValue=0.0, maxValue=10.0))
        self.add_seed_parameter()
        detection_df = QgsProcessingParameterNumber(
            self.DETECTION_DF, self.tr("Degrees of freedom of the detection estimate (0: p known)"),
            type=compat.NUMBER_DOUBLE, defaultValue=0.0, minValue=0.0)
        detection_df.setFlags(detection_df.flags() | compat.FLAG_ADVANCED)
        self.addParameter(detection_df)
        self.addParameter(QgsProcessingParameterEnum(
            self.VARIANCE_METHOD, self.tr("Variance estimator"),
            [self.tr("Simple random sampling formula"),
             self.tr("Local neighbourhood (systematic or spatially balanced layouts)"),
             self.tr("Local neighbourhood, scaled to the simple formula (our variant)")], defaultValue=0))
        self.addParameter(QgsProcessingParameterBoolean(
            self.PRESENCE, self.tr("The count field holds presence (1) / absence (0)"), defaultValue=False))
        self.addParameter(QgsProcessingParameterBoolean(
            self.DROP_EMPTY, self.tr("Leave out strata with no surveyed unit (the frame shrinks)"),
            defaultValue=False))
        true_total = QgsProcessingParameterNumber(
            self.TRUE_TOTAL, self.tr("True total of a simulated population (simulations and training only; 0: none)"),
            type=compat.NUMBER_DOUBLE, defaultValue=0.0, minValue=0.0)
        true_total.setFlags(true_total.flags() | compat.FLAG_ADVANCED)
        self.addParameter(true_total)
        self.addParameter(QgsProcessingParameterFeatureSink(
            self.OUTPUT, self.tr("Strata with estimates"), compat.TYPE_VECTOR_POLYGON))
        self.addParameter(QgsProcessingParameterFeatureSink(
            self.OUTPUT_TABLE, self.tr("Estimate table"), compat.TYPE_VECTOR))
        self.add_report_parameter()
        for name, label in (
            (self.DENSITY, self.tr("Overall density")), (self.DENSITY_SE, self.tr("SE of the overall density")),
            (self.ABUNDANCE, self.tr("Overall abundance")),
            (self.ABUNDANCE_LO, self.tr("Lower confidence limit of the abundance")),
            (self.ABUNDANCE_HI, self.tr("Upper confidence limit of the abundance")),
            (self.CV, self.tr("CV of the overall estimate")),
        ):
            self.addOutput(QgsProcessingOutputNumber(name, label))

    # ------------------------------------------------------------------------------
    def processAlgorithm(self, parameters, context, feedback):  # noqa: N802 (host naming)
        units = self.parameterAsSource(parameters, self.UNITS, context)
        strata_source = self.parameterAsSource(parameters, self.STRATA, context)
        if units is None or strata_source is None:
            raise QgsProcessingException(
                self.invalidSourceError(parameters, self.UNITS if units is None else self.STRATA))
        fields, warnings = self._fields(parameters, context, units, strata_source)
        area_unit = self.parameterAsEnum(parameters, self.AREA_UNIT, context)
        settings = self._settings(parameters, context)
        seeded = self.seeded_generator(parameters, context, feedback) if settings["ci_method"] == "bootstrap" else None

        crs = bridge.computation_crs(units.sourceCrs(), units.sourceExtent(), context, feedback, units.sourceName())
        records, strata_records = self._read(units, strata_source, fields, crs, context, feedback)
        warnings = list(records.warnings) + list(strata_records.warnings) + warnings
        already_pushed = len(records.warnings) + len(strata_records.warnings)  # read_features pushes its own
        strip_width = self.parameterAsDouble(parameters, self.STRIP_WIDTH, context)
        unit_area_m2 = self.parameterAsDouble(parameters, self.UNIT_AREA, context)
        frame, result, counts, found = self._estimate(
            records, strata_records, fields, settings, area_unit, unit_area_m2, strip_width, units.sourceName(),
            strata_source.sourceName(), seeded, feedback)
        warnings.extend(self.translate_message(w) for w in found)
        self.push_warnings(feedback, warnings[already_pushed:])
        if result.unused_reserves:
            feedback.pushInfo(self.tr("{n} unused reserve unit(s) without a count were skipped.").format(
                n=result.unused_reserves))

        # -- write -----------------------------------------------------------------
        dest, table_dest = self._write(parameters, context, feedback, result, frame, crs, area_unit)
        report_path = self._write_report(parameters, context, feedback, result, frame, records, counts, warnings, dict(
            units=units.sourceName(), strata=strata_source.sourceName(), count_field=fields["count"],
            stratum_field=fields["stratum"], area_field=fields["area"], unit_area_m2=unit_area_m2,
            strip_width=strip_width, area_unit=UNIT_NAMES[area_unit], crs=crs.authid(),
            seed=None if seeded is None else seeded.seed,
            true_total=self.parameterAsDouble(parameters, self.TRUE_TOTAL, context) or None))
        overall = result.overall
        feedback.pushInfo(self.tr("Overall abundance {n:,.1f} ({lo:,.1f} to {hi:,.1f}), CV {cv:.3f}.").format(
            n=overall.abund, lo=overall.abund_lo, hi=overall.abund_hi, cv=overall.cv))
        feedback.setProgress(100)

        def number(value):
            return None if value is None or not np.isfinite(value) else float(value)

        return {
            self.OUTPUT: dest, self.OUTPUT_TABLE: table_dest, self.REPORT: report_path,
            self.DENSITY: number(overall.dens), self.DENSITY_SE: number(overall.dens_se),
            self.ABUNDANCE: number(overall.abund), self.ABUNDANCE_LO: number(overall.abund_lo),
            self.ABUNDANCE_HI: number(overall.abund_hi), self.CV: number(overall.cv),
        }

    # ------------------------------------------------------------------------------
    def _fields(self, parameters, context, units, strata_source):
        """The fields chosen, checked against the layers; a note when the frame is one polygon."""
        count_field = self.field_name(parameters, self.COUNT_FIELD, context, units, required=True)
        fields = dict(count=count_field,
                      stratum=self.field_name(parameters, self.STRATUM_FIELD, context, units),
                      area=self.field_name(parameters, self.UNIT_AREA_FIELD, context, units),
                      strata_id=self.field_name(parameters, self.STRATA_ID_FIELD, context, strata_source))
        notes = []
        if fields["stratum"] and not fields["strata_id"]:
            if strata_source.featureCount() != 1:
                raise QgsProcessingException(self.tr(
                    "Layer '{layer}' has no stratum id field matching the units' field '{field}'. Choose the "
                    "strata layer's id field (plotwise:stratify writes 'stratum'), or give a frame layer of one "
                    "polygon to treat the frame as one stratum.").format(layer=strata_source.sourceName(),
                                                                         field=fields["stratum"]))
            notes.append(self.tr(
                "Layer '{layer}' is one polygon without a stratum id field: the frame is treated as one stratum, "
                "and the units' field '{field}' is not used. If the units were allocated to strata unequally, "
                "give the strata instead: an unstratified mean is then biased.").format(
                layer=strata_source.sourceName(), field=fields["stratum"]))
            fields["stratum"] = None
        return fields, notes

    def _settings(self, parameters, context):
        return dict(
            confidence=self.parameterAsDouble(parameters, self.CONFIDENCE, context),
            ci_method=CI_METHODS[self.parameterAsEnum(parameters, self.CI_METHOD, context)],
            fpc=self.parameterAsBool(parameters, self.FPC, context),
            detection_p=self.parameterAsDouble(parameters, self.DETECTION_P, context),
            detection_se=self.parameterAsDouble(parameters, self.DETECTION_SE, context),
            detection_df=self.parameterAsDouble(parameters, self.DETECTION_DF, context),
            target_cv=self.parameterAsDouble(parameters, self.TARGET_CV, context) or None,
            variance_method=VARIANCE_METHODS[self.parameterAsEnum(parameters, self.VARIANCE_METHOD, context)],
            presence=self.parameterAsBool(parameters, self.PRESENCE, context),
            drop_empty_strata=self.parameterAsBool(parameters, self.DROP_EMPTY, context),
        )

    def _read(self, units, strata_source, fields, crs, context, feedback):
        """The units (the count, stratum, area and design-record fields) and the strata, in ``crs``."""
        wanted = [fields["count"]] + [f for f in (fields["stratum"], fields["area"]) + RECORD_FIELDS
                                      if f and f in units.fields().names()]
        records = bridge.read_features(units, crs, context, feedback, tuple(dict.fromkeys(wanted)),
                                       layer_name=units.sourceName(), drop_empty=False)
        if len(records) == 0:
            raise QgsProcessingException(self.tr("Layer '{layer}' has no features.").format(layer=units.sourceName()))
        feedback.setProgress(15)
        strata_records = bridge.read_features(strata_source, crs, context, feedback,
                                              (fields["strata_id"],) if fields["strata_id"] else (),
                                              layer_name=strata_source.sourceName())
        if len(strata_records) == 0:
            raise QgsProcessingException(self.tr("Layer '{layer}' has no polygons with an area.").format(
                layer=strata_source.sourceName()))
        feedback.setProgress(30)
        return records, strata_records

    def _estimate(self, records, strata_records, fields, settings, area_unit, unit_area_m2, strip_width, units_name,
                  strata_name, seeded, feedback):
        """The frame's strata and the engine's estimate; returns them, the counts and the engine's warnings."""
        m2_per_unit = M2_PER[area_unit]
        attrs = records.attributes
        ids = np.array(attrs["unit_id"] if "unit_id" in attrs else records.fids.tolist(), dtype=object)
        ids = np.where([v is None for v in ids], records.fids.astype(object), ids)
        counts = np.array(attrs[fields["count"]], dtype=object)
        if fields["stratum"]:
            unit_strata = np.array(attrs[fields["stratum"]], dtype=object)
            strata_ids = strata_records.attributes[fields["strata_id"]]
        else:
            unit_strata = np.full(len(records), ONE_STRATUM, dtype=object)
            strata_ids = [ONE_STRATUM] * len(strata_records)
        with self.engine_errors():
            frame = estimation.frame_strata(
                strata_ids, strata_records.geometries, strata_records.fids.tolist(), m2_per_unit=m2_per_unit,
                unit=UNIT_NAMES[area_unit], layer=strata_name, field=fields["strata_id"] or "",
                drop_unlabelled=settings["drop_empty_strata"])
            expansion, expansion_warnings = estimation.plus_expansion(
                frame.geometries, unit_strata, attrs.get("edge"), attrs.get("reach_m"), m2_per_unit)
            # a one-unit stratum is paired with the stratum it shares the longest edge with on the map
            labels = list(frame.geometries)
            touching = variance.adjacent_strata([frame.geometries[k] for k in labels])
            neighbours = {labels[i]: [labels[j] for j in js] for i, js in touching.items()}
            areas_m2 = estimation.surveyed_areas(
                records.geometries, attrs[fields["area"]] if fields["area"] else None, unit_area_m2, strip_width)
            coords = np.array([[g.centroid.x, g.centroid.y] if g is not None else [np.nan, np.nan]
                               for g in records.geometries]) if settings["variance_method"] != "srs" else None
            result = estimation.estimate_density(
                counts, areas_m2 / m2_per_unit, unit_strata, frame.areas, unit_ids=ids, coords=coords,
                neighbours=neighbours, roles=attrs.get("role"), designs=attrs.get("design"), edges=attrs.get("edge"),
                incl_p=attrs.get("incl_p"), expansion_areas=expansion, layer=units_name,
                rng=None if seeded is None else seeded.generator, progress=self.progress_callback(feedback, 30, 80),
                **settings)
        return frame, result, counts, list(frame.warnings) + expansion_warnings + list(result.warnings)

    def _write(self, parameters, context, feedback, result, frame, crs, area_unit):
        fields = bridge.make_fields(OUTPUT_FIELDS)
        table_rows = [self._row(r) for r in result.table()]
        by_label = {r.stratum: row for r, row in zip(result.strata, table_rows)}
        polygon_rows, polygons = [], []
        for label in sorted(frame.geometries, key=natural_key):
            row = by_label.get(label) or [label, frame.areas[label], 0] + [None] * (len(OUTPUT_FIELDS) - 3)
            polygon_rows.append(row)
            geometry = frame.geometries[label]
            polygons.append(MultiPolygon([geometry]) if isinstance(geometry, Polygon) else geometry)
        sink, dest = self.parameterAsSink(parameters, self.OUTPUT, context, fields, compat.WKB_MULTIPOLYGON, crs)
        if sink is None:
            raise QgsProcessingException(self.invalidSinkError(parameters, self.OUTPUT))
        if not bridge.write_features(sink, fields, polygons, polygon_rows, feedback, (80.0, 88.0)):
            raise self.cancelled_error()
        if not result.presence:
            self.style_output(context, dest, "estimate", area_unit=UNIT_NAMES[area_unit])
        table_sink, table_dest = self.parameterAsSink(
            parameters, self.OUTPUT_TABLE, context, fields, compat.WKB_NOGEOMETRY, QgsCoordinateReferenceSystem())
        if table_sink is None:
            raise QgsProcessingException(self.invalidSinkError(parameters, self.OUTPUT_TABLE))
        bridge.write_features(table_sink, fields, [None] * len(table_rows), table_rows, feedback, (88.0, 90.0))
        return dest, table_dest

    @staticmethod
    def _row(r):
        """Output fields of one estimate row (named fields of the result)."""
        def value(v):
            return None if v is None or (isinstance(v, float) and not math.isfinite(v)) else v

        return [r.stratum, r.area, r.n] + [value(v) for v in (
            r.mean_c, r.sd_c, r.dens, r.dens_se, r.dens_lo, r.dens_hi, r.abund, r.abund_se, r.abund_lo, r.abund_hi,
            r.cv, r.df)] + [r.n_next]

    def _write_report(self, parameters, context, feedback, result, frame, records, counts, warnings, info):
        if not self.parameterAsFileOutput(parameters, self.REPORT, context):
            return None
        points = [g.centroid if g is not None and g.geom_type != "Point" else g for g in records.geometries]
        roles = records.attributes.get("role", [None] * len(points))
        surveyed = [p for p, c in zip(points, counts) if p is not None and c is not None]
        missing = [p for p, c, r in zip(points, counts, roles)
                   if p is not None and c is None and str(r).lower() != "reserve"]
        inputs = report_estimate.EstimateReportInputs(
            frame_geometries=frame.geometries, surveyed_points=tuple(surveyed), missing_points=tuple(missing),
            ramp=DENSITY_RAMP, missing_colour=NO_ESTIMATE_COLOUR, **info)
        report = report_estimate.estimate_report(self.new_report(""), result, inputs, warnings)
        return self.write_report(report, parameters, context, feedback)
