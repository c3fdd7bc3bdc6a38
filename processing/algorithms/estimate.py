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

from ...plugin import compat
from .. import bridge
from ..engine import estimation, variance
from ..report import MapLayer, histogram_svg, interval_chart_svg, map_svg
from ..report.style import CATEGORY_COLOURS, INK, MUTED
from ..styles import DENSITY_RAMP, NO_ESTIMATE_COLOUR
from .base import PlotwiseAlgorithm

M2_PER = {0: 1e6, 1: 1e4}  # AREA_UNIT: 0 km², 1 ha
UNIT_NAMES = {0: "km²", 1: "ha"}
CI_METHODS = (estimation.CI_T, estimation.CI_LOGNORMAL, estimation.CI_BOOTSTRAP)
VARIANCE_METHODS = (estimation.VARIANCE_SRS, estimation.VARIANCE_LOCAL)
ONE_STRATUM = "frame"
UNIT_COLOUR = CATEGORY_COLOURS[1]  # amber: visible on the pale and the dark end of the density shading

OUTPUT_FIELDS = (
    ("stratum", "string", 40), ("area", "double"), ("n", "int"), ("mean_c", "double"), ("sd_c", "double"),
    ("dens", "double"), ("dens_se", "double"), ("dens_lo", "double"), ("dens_hi", "double"),
    ("abund", "double"), ("abund_se", "double"), ("abund_lo", "double"), ("abund_hi", "double"),
    ("cv", "double"), ("df", "double"), ("n_next", "int"),
)

REFERENCES = (
    "Cochran, W. G. (1977). Sampling Techniques, 3rd ed. Wiley. Chapter 5 (stratified random sampling, "
    "Satterthwaite's degrees of freedom, §5A.12 collapsed strata) and chapter 6 (ratio estimators).",
    "Satterthwaite, F. E. (1946). An approximate distribution of estimates of variance components. "
    "Biometrics Bulletin 2, 110-114.",
    "Seber, G. A. F. (1982). The Estimation of Animal Abundance and Related Parameters, 2nd ed. Griffin "
    "(the delta method).",
    "Burnham, K. P., Anderson, D. R., White, G. C., Brownie, C. & Pollock, K. H. (1987). Design and "
    "analysis methods for fish survival experiments based on release-recapture. American Fisheries "
    "Society Monograph 5 (log-normal intervals).",
    "Buckland, S. T., Anderson, D. R., Burnham, K. P., Laake, J. L., Borchers, D. L. & Thomas, L. (2001). "
    "Introduction to Distance Sampling. Oxford University Press (log-normal intervals, combining CVs, "
    "bootstrap).",
    "Efron, B. & Tibshirani, R. J. (1993). An Introduction to the Bootstrap. Chapman & Hall.",
    "Rao, J. N. K. & Wu, C. F. J. (1988). Resampling inference with complex survey data. Journal of the "
    "American Statistical Association 83, 231-241 (the rescaled bootstrap).",
    "Stevens, D. L. & Olsen, A. R. (2003). Variance estimation for spatially balanced samples of "
    "environmental resources. Environmetrics 14, 593-610.",
    "Neyman, J. (1934). On the two different aspects of the representative method. Journal of the Royal "
    "Statistical Society 97, 558-625.",
)


def _sequential_colour(value, lo, hi, ramp=DENSITY_RAMP):
    """The density ramp of the styled layer (light to dark) at ``value``; grey when missing."""
    if value is None or not np.isfinite(value):
        return NO_ESTIMATE_COLOUR
    t = 0.0 if hi <= lo else min(max((value - lo) / (hi - lo), 0.0), 1.0)
    stops = [tuple(int(c[i:i + 2], 16) for i in (1, 3, 5)) for c in ramp]
    position = t * (len(stops) - 1)
    k = min(int(position), len(stops) - 2)
    f = position - k
    return "#" + "".join(f"{round(a + (b - a) * f):02x}" for a, b in zip(stops[k], stops[k + 1]))


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
            "abundance N_h = D_h·A_h; overall N = Σ N_h and D = N / Σ A_h, with the variances added. "
            "The finite-population correction 1 − Σa/A_h is applied when asked for.\n\n"
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
            "stratum with one surveyed unit is collapsed with a neighbour for its variance (Cochran 1977, "
            "§5A.12), with a warning. A stratum with none is an error, unless you choose to leave it out: "
            "then the frame shrinks, and the report says so. Strata must not overlap (an overlap of more than "
            "0.1 % of the smaller stratum is an error, a smaller one a warning), and every strata polygon needs its "
            "id: a polygon without one is an error, unless strata with no surveyed unit may be left out.\n\n"
            "Intervals: t with Satterthwaite's degrees of freedom (Satterthwaite 1946; Cochran 1977); "
            "log-normal, N/C to N·C with C = exp(z√ln(1+CV²)) (Burnham et al. 1987; Buckland et al. "
            "2001); or a rescaled stratified percentile bootstrap of 2,000 resamples (seeded; Rao & Wu 1988), "
            "which carries the finite-population correction.\n\n"
            "Variance: the simple random sampling formula, or the local neighbourhood estimator "
            "(Stevens & Olsen 2003) for systematic grids and spatially balanced layouts, where the simple "
            "formula overstates the variance.\n\n"
            "Detection: with a detection probability p below 1, estimates are divided by p and the squared "
            "CVs add (delta method, Seber 1982). p and its SE must come from a separate study.\n\n"
            "Presence data: with the presence option a 0/1 field gives the stratified proportion of units "
            "where the species was detected (naive occupancy, not corrected for detection), and abund is the "
            "number of occupied units in the frame.\n\n"
            "Target CV (above 0): n_next is the number of units each stratum needs next time for that CV of "
            "the overall abundance, by Neyman allocation on the observed standard deviations (Neyman 1934; "
            "Cochran 1977, eq. 5.26).\n\n"
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
        self.addParameter(QgsProcessingParameterEnum(
            self.VARIANCE_METHOD, self.tr("Variance estimator"),
            [self.tr("Simple random sampling formula"),
             self.tr("Local neighbourhood (systematic or spatially balanced layouts)")], defaultValue=0))
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
    def _field(self, parameters, name, context, layer_fields):
        read = getattr(self, "parameterAsStrings", None) or self.parameterAsFields
        chosen = read(parameters, name, context)
        chosen = chosen[0] if chosen else None
        return chosen if chosen and chosen in layer_fields else None

    def processAlgorithm(self, parameters, context, feedback):  # noqa: N802 (host naming)
        units = self.parameterAsSource(parameters, self.UNITS, context)
        strata_source = self.parameterAsSource(parameters, self.STRATA, context)
        if units is None or strata_source is None:
            raise QgsProcessingException(
                self.invalidSourceError(parameters, self.UNITS if units is None else self.STRATA))
        units_name, strata_name = units.sourceName(), strata_source.sourceName()
        unit_fields, strata_fields = units.fields().names(), strata_source.fields().names()

        read = getattr(self, "parameterAsStrings", None) or self.parameterAsFields
        count_field = (read(parameters, self.COUNT_FIELD, context) or [None])[0]
        if not count_field or count_field not in unit_fields:
            raise QgsProcessingException(self.tr(
                "Layer '{layer}' has no count field '{field}'. Choose the field that holds the counts.").format(
                layer=units_name, field=count_field or ""))
        stratum_field = self._field(parameters, self.STRATUM_FIELD, context, unit_fields)
        area_field = self._field(parameters, self.UNIT_AREA_FIELD, context, unit_fields)
        strata_id_field = self._field(parameters, self.STRATA_ID_FIELD, context, strata_fields)
        one_stratum_note = ""
        if stratum_field and not strata_id_field:
            if strata_source.featureCount() != 1:
                raise QgsProcessingException(self.tr(
                    "Layer '{layer}' has no stratum id field matching the units' field '{field}'. Choose the "
                    "strata layer's id field (plotwise:stratify writes 'stratum'), or give a frame layer of one "
                    "polygon to treat the frame as one stratum.").format(layer=strata_name, field=stratum_field))
            one_stratum_note = self.tr(
                "Layer '{layer}' is one polygon without a stratum id field: the frame is treated as one stratum, "
                "and the units' field '{field}' is not used. If the units were allocated to strata unequally, "
                "give the strata instead: an unstratified mean is then biased.").format(
                layer=strata_name, field=stratum_field)
            stratum_field = None
        unit_area_m2 = self.parameterAsDouble(parameters, self.UNIT_AREA, context)
        area_unit = self.parameterAsEnum(parameters, self.AREA_UNIT, context)
        m2_per_unit = M2_PER[area_unit]
        settings = dict(
            confidence=self.parameterAsDouble(parameters, self.CONFIDENCE, context),
            ci_method=CI_METHODS[self.parameterAsEnum(parameters, self.CI_METHOD, context)],
            fpc=self.parameterAsBool(parameters, self.FPC, context),
            detection_p=self.parameterAsDouble(parameters, self.DETECTION_P, context),
            detection_se=self.parameterAsDouble(parameters, self.DETECTION_SE, context),
            target_cv=self.parameterAsDouble(parameters, self.TARGET_CV, context) or None,
            variance_method=VARIANCE_METHODS[self.parameterAsEnum(parameters, self.VARIANCE_METHOD, context)],
            presence=self.parameterAsBool(parameters, self.PRESENCE, context),
            drop_empty_strata=self.parameterAsBool(parameters, self.DROP_EMPTY, context),
        )
        true_total = self.parameterAsDouble(parameters, self.TRUE_TOTAL, context) or None
        seeded = self.seeded_generator(parameters, context, feedback) if settings["ci_method"] == "bootstrap" else None

        # -- read ------------------------------------------------------------------
        crs = bridge.computation_crs(units.sourceCrs(), units.sourceExtent(), context, feedback, units_name)
        wanted = [count_field] + [f for f in (stratum_field, area_field, "unit_id", "role", "incl_p")
                                  if f and f in unit_fields]
        records = bridge.read_features(units, crs, context, feedback, tuple(dict.fromkeys(wanted)),
                                       layer_name=units_name, drop_empty=False)
        if len(records) == 0:
            raise QgsProcessingException(self.tr("Layer '{layer}' has no features.").format(layer=units_name))
        feedback.setProgress(15)
        strata_records = bridge.read_features(strata_source, crs, context, feedback,
                                              (strata_id_field,) if strata_id_field else (), layer_name=strata_name)
        if len(strata_records) == 0:
            raise QgsProcessingException(self.tr("Layer '{layer}' has no polygons with an area.").format(
                layer=strata_name))
        feedback.setProgress(30)
        warnings = list(records.warnings) + list(strata_records.warnings)
        already_pushed = len(warnings)  # bridge.read_features pushes its own warnings
        if one_stratum_note:
            warnings.append(one_stratum_note)

        attrs = records.attributes
        ids = np.array(attrs["unit_id"] if "unit_id" in attrs else records.fids.tolist(), dtype=object)
        ids = np.where([v is None for v in ids], records.fids.astype(object), ids)
        counts = np.array(attrs[count_field], dtype=object)
        if "role" in attrs:
            unused = np.array([str(r).lower() == "reserve" and c is None for r, c in zip(attrs["role"], counts)])
        else:
            unused = np.zeros(len(records), dtype=bool)
        if unused.any():
            feedback.pushInfo(self.tr("{n} unused reserve unit(s) without a count were skipped.").format(
                n=int(unused.sum())))
        keep = ~unused
        if stratum_field:
            unit_strata = np.array(attrs[stratum_field], dtype=object)
            strata_ids = strata_records.attributes[strata_id_field]
        else:
            unit_strata = np.full(len(records), ONE_STRATUM, dtype=object)
            strata_ids = [ONE_STRATUM] * len(strata_records)
        # one polygon per stratum; overlapping strata and polygons without an id are errors or warnings
        with self.engine_errors():
            frame = estimation.frame_strata(
                strata_ids, strata_records.geometries, strata_records.fids.tolist(), m2_per_unit=m2_per_unit,
                unit=UNIT_NAMES[area_unit], layer=strata_name, field=strata_id_field or "",
                drop_unlabelled=settings["drop_empty_strata"])
        warnings.extend(self.translate_message(w) for w in frame.warnings)
        frame_geoms, stratum_areas = frame.geometries, frame.areas

        # a one-unit stratum is collapsed with a stratum that touches it on the map
        frame_labels = list(frame_geoms)
        touching = variance.adjacent_strata([frame_geoms[k] for k in frame_labels])
        neighbours = {frame_labels[i]: [frame_labels[j] for j in js] for i, js in touching.items()}

        strip_width = self.parameterAsDouble(parameters, self.STRIP_WIDTH, context)
        unit_areas_m2 = self._unit_areas(records, area_field, unit_area_m2, strip_width, ids, counts, units_name)
        coords = None
        if settings["variance_method"] == estimation.VARIANCE_LOCAL:
            coords = np.array([[g.centroid.x, g.centroid.y] if g is not None else [np.nan, np.nan]
                               for g in records.geometries])
            coords = coords[keep]
            no_position = np.isnan(coords[:, 0]) & np.array([c is not None for c in counts[keep]])
            if no_position.any():
                raise QgsProcessingException(self.tr(
                    "Layer '{layer}': units {ids} have no geometry, so the local neighbourhood variance cannot use "
                    "them. Give them their location, or use the simple random sampling formula.").format(
                    layer=units_name, ids=bridge.id_list(ids[keep][no_position])))
        if not settings["presence"]:
            numeric = [c for c in counts[keep] if isinstance(c, (int, float)) and not isinstance(c, bool)]
            if numeric and set(numeric) <= {0, 1} and 1 in numeric and len(numeric) >= 5:
                warnings.append(self.tr(
                    "Every count is 0 or 1. If the field records presence/absence, run again with the presence "
                    "option: the result is then the proportion of units occupied (naive occupancy)."))
        design_note = self._design_note(attrs, unit_strata, keep)
        if design_note:
            warnings.append(design_note)

        with self.engine_errors():
            result = estimation.estimate_density(
                counts[keep], unit_areas_m2[keep] / m2_per_unit, unit_strata[keep], stratum_areas,
                unit_ids=ids[keep], coords=coords, neighbours=neighbours, rng=None if seeded is None else seeded.generator,
                progress=self.progress_callback(feedback, 30, 80), **settings,
            )
        warnings.extend(self.translate_message(w) for w in result.warnings)
        self.push_warnings(feedback, warnings[already_pushed:])

        # -- write -----------------------------------------------------------------
        fields = bridge.make_fields(OUTPUT_FIELDS)
        table_rows = [self._row(r, stratum_areas.get(r.stratum, r.area), result.presence) for r in result.table()]
        table_rows[-1][1] = sum(stratum_areas[r.stratum] for r in result.strata)
        by_label = {row[0]: row for row in table_rows}
        polygon_rows, polygons = [], []
        for label in sorted(frame_geoms, key=estimation.natural_key):
            row = by_label.get(label) or [label, stratum_areas[label], 0] + [None] * (len(OUTPUT_FIELDS) - 3)
            polygon_rows.append(row)
            geometry = frame_geoms[label]
            polygons.append(MultiPolygon([geometry]) if isinstance(geometry, Polygon) else geometry)
        sink, dest = self.parameterAsSink(parameters, self.OUTPUT, context, fields, compat.WKB_MULTIPOLYGON, crs)
        if sink is None:
            raise QgsProcessingException(self.invalidSinkError(parameters, self.OUTPUT))
        if not bridge.write_features(sink, fields, polygons, polygon_rows, feedback, (80.0, 88.0)):
            raise self.cancelled_error()
        if not settings["presence"]:
            self.style_output(context, dest, "estimate", area_unit=UNIT_NAMES[area_unit])
        table_sink, table_dest = self.parameterAsSink(
            parameters, self.OUTPUT_TABLE, context, fields, compat.WKB_NOGEOMETRY, QgsCoordinateReferenceSystem())
        if table_sink is None:
            raise QgsProcessingException(self.invalidSinkError(parameters, self.OUTPUT_TABLE))
        bridge.write_features(table_sink, fields, [None] * len(table_rows), table_rows, feedback, (88.0, 90.0))

        report = self._report(result, stratum_areas, frame_geoms, records, keep, unit_strata, warnings, dict(
            units=units_name, strata=strata_name, count_field=count_field, stratum_field=stratum_field,
            area_field=area_field, unit_area_m2=unit_area_m2, strip_width=strip_width,
            area_unit=UNIT_NAMES[area_unit], crs=crs.authid(),
            seed=None if seeded is None else seeded.seed, true_total=true_total))
        report_path = self.write_report(report, parameters, context, feedback)
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
    def _unit_areas(self, records, area_field, unit_area_m2, strip_width, ids, counts, layer):
        """Surveyed area per unit in m² (see :func:`estimation.surveyed_areas`); an error names units without."""
        areas = estimation.surveyed_areas(
            records.geometries, records.attributes[area_field] if area_field else None, unit_area_m2, strip_width)
        surveyed = np.array([c is not None for c in counts])
        lacking = surveyed & np.isnan(areas)
        if lacking.any():
            raise QgsProcessingException(self.tr(
                "Layer '{layer}': units {ids} have no surveyed area. Point units need the unit area field "
                "(area_m2 above 0) or a fixed unit area (m²); line units the area field, a strip width or a fixed "
                "unit area; polygons use their own area.").format(layer=layer, ids=bridge.id_list(ids[lacking])))
        return areas

    def _design_note(self, attrs, unit_strata, keep):
        """A warning when inclusion probabilities differ within a stratum (the estimator assumes equal ones)."""
        if "incl_p" not in attrs:
            return ""
        incl = np.array([v if isinstance(v, (int, float)) else np.nan for v in attrs["incl_p"]], dtype=float)[keep]
        labels = np.array([estimation.stratum_label(s) for s in unit_strata[keep]], dtype=object)
        uneven = []
        for label in sorted({lab for lab in labels if lab is not None}, key=estimation.natural_key):
            values = incl[(labels == label) & np.isfinite(incl)]
            if values.size > 1 and values.max() > 1.01 * values.min():
                uneven.append(label)
        if not uneven:
            return ""
        return self.tr(
            "In strata {strata} the units' inclusion probabilities (incl_p) differ. This estimator assumes equal "
            "chances within a stratum; check the design the units came from.").format(strata=", ".join(uneven))

    @staticmethod
    def _row(r, area, presence=False):
        """Output fields of one estimate row; ``area`` is the stratum's area (in presence mode the
        engine's own area is a number of units)."""
        def value(v):
            return None if v is None or (isinstance(v, float) and not math.isfinite(v)) else v

        return [r.stratum, area, r.n, value(r.mean_c), value(r.sd_c), value(r.dens), value(r.dens_se),
                value(r.dens_lo), value(r.dens_hi), value(r.abund), value(r.abund_se), value(r.abund_lo),
                value(r.abund_hi), value(r.cv), value(r.df), r.n_next]

    # ------------------------------------------------------------------------------
    def _report(self, result, stratum_areas, frame_geoms, records, keep, unit_strata, warnings, info):
        o = result.overall
        per = info["area_unit"]
        presence = result.presence
        what = self.tr("occupied units") if presence else self.tr("animals")
        title = self.tr("Naive occupancy from presence data") if presence else self.tr("Density and abundance estimate")
        report = self.new_report(title)
        level = f"{result.confidence:.0%}"
        dens_label = self.tr("proportion of units occupied (naive)") if presence else self.tr("density per {unit}").format(unit=per)
        figures = [
            (self.tr("estimated {what} in the frame").format(what=what), f"{o.abund:,.0f}"),
            (self.tr("{level} interval").format(level=level), f"{o.abund_lo:,.0f} – {o.abund_hi:,.0f}"),
            (dens_label, f"{o.dens:.3g}"),
            (self.tr("CV"), "–" if not np.isfinite(o.cv) else f"{o.cv:.3f}"),
            (self.tr("units surveyed"), f"{o.n:,}"),
        ]
        if info["true_total"]:
            figures.append((self.tr("true total of the simulated population"), f"{info['true_total']:,.0f}"))
        report.key_figures(figures)
        if info["true_total"]:
            truth = info["true_total"]
            inside = o.abund_lo <= truth <= o.abund_hi
            report.note(self.tr(
                "Simulation only: the true total ({truth:,.0f}) is known here because the population was "
                "simulated. The estimate is {est:,.0f} ({error:+.1%} from the truth), and the {level} interval "
                "{verdict} the truth. Only a simulation can show this; a real survey never knows its true total, "
                "and one survey's interval may miss it by chance (about {miss:.0%} of surveys should).").format(
                truth=truth, est=o.abund, error=o.abund / truth - 1, level=level,
                verdict=self.tr("covers") if inside else self.tr("misses"), miss=1 - result.confidence))

        ci_names = {"t": self.tr("t with Satterthwaite degrees of freedom"), "lognormal": self.tr("log-normal"),
                    "bootstrap": self.tr("stratified percentile bootstrap")}
        variance_names = {"srs": self.tr("simple random sampling formula"),
                          "local": self.tr("local neighbourhood (Stevens & Olsen 2003)")}
        parameters = {
            self.tr("Sample units"): info["units"],
            self.tr("Count field"): info["count_field"] + (self.tr(" (presence/absence)") if presence else ""),
            self.tr("Stratum field"): info["stratum_field"] or self.tr("none: one stratum"),
            self.tr("Unit area"): (self.tr("field {field} (m²)").format(field=info["area_field"]) if info["area_field"]
                              else self.tr("polygon area"))
            + ("; " + self.tr("strip width") + f" {info['strip_width']:g} m" if info["strip_width"] > 0 else "")
            + ("; " + self.tr("fixed") + f" {info['unit_area_m2']:g} m²" if info["unit_area_m2"] > 0 else ""),
            self.tr("Strata (frame)"): info["strata"],
            self.tr("Computation CRS"): info["crs"],
            self.tr("Area unit"): per,
            self.tr("Confidence level"): level,
            self.tr("Interval"): ci_names[result.ci_method],
            self.tr("Variance estimator"): variance_names[result.variance_method],
            self.tr("Finite-population correction"): self.tr("yes") if result.fpc else self.tr("no"),
            self.tr("Detection probability p"): f"{result.detection_p:g} (SE {result.detection_se:g})",
            self.tr("Target CV for the next survey"): f"{result.target_cv:g}" if result.target_cv else "–",
        }
        if result.ci_method == "bootstrap":
            parameters[self.tr("Bootstrap resamples")] = result.n_bootstrap
            parameters[self.tr("Seed")] = info["seed"]
        else:
            parameters[self.tr("Seed")] = self.tr("not used (no random draws without the bootstrap)")
        report.parameters(parameters)
        report.warnings(warnings)

        report.section(self.tr("Estimates by stratum"))
        density_header = [self.tr("Stratum"), self.tr("Area ({unit})").format(unit=per), self.tr("Units (n)"), self.tr("Not surveyed"),
                          self.tr("Mean count"), self.tr("SD of counts"), dens_label[:1].upper() + dens_label[1:], self.tr("SE"),
                          self.tr("Lower limit"),
                          self.tr("Upper limit"), self.tr("CV"), self.tr("df")]
        abundance_header = [self.tr("Stratum"), self.tr("Occupied units") if presence else self.tr("Abundance"), self.tr("SE"),
                            self.tr("Lower limit"), self.tr("Upper limit")]
        if result.target_cv:
            abundance_header.append(self.tr("Units next time (n_next)"))
        density_rows, abundance_rows = [], []
        total_area = sum(stratum_areas[s.stratum] for s in result.strata)
        for r in result.table():
            row = self._row(r, total_area if r.stratum == "all" else stratum_areas.get(r.stratum, r.area), presence)
            label = self.tr("all strata") if r.stratum == "all" else r.stratum
            density_rows.append([label, row[1], r.n, r.n_missing] + row[3:9] + row[13:15])
            abundance_rows.append([label] + row[9:13] + ([r.n_next] if result.target_cv else []))
        report.table(density_header, density_rows, caption=self.tr("{what}, limits at {level}.").format(
            what=dens_label.capitalize(), level=level))
        report.table(abundance_header, abundance_rows, caption=self.tr("{what} in the frame, limits at {level}.").format(
            what=self.tr("Occupied units") if presence else self.tr("Abundance"), level=level))
        if result.dropped_strata:
            report.note(self.tr(
                "The frame shrank: strata {strata} had no surveyed unit and were left out ({area:,.3g} {unit}). "
                "The estimate covers the remaining strata only.").format(
                strata=", ".join(result.dropped_strata), area=result.dropped_area, unit=per))
        if result.missing_ids:
            report.paragraph(self.tr("Non-response: {n} unit(s) were not surveyed (no count) and were left out: {ids}.").format(
                n=len(result.missing_ids), ids=bridge.id_list(result.missing_ids, limit=60)))

        report.subsection(self.tr("The overall interval by method"))
        report.table(
            [self.tr("Interval"), self.tr("Lower limit"), self.tr("Upper limit"), self.tr("Used in the outputs")],
            [[ci_names[m], lo, hi, self.tr("yes") if m == result.ci_method else self.tr("no")]
             for m, lo, hi in result.overall_intervals])
        report.paragraph(self.tr(
            "The t interval is symmetric about the estimate; the log-normal interval is skewed to the right like "
            "the sampling distribution of a count-based estimate, and suits small samples of clumped animals "
            "better. Choose the method before looking at the results."))
        if result.bootstrap_totals is not None and np.all(np.isfinite(result.bootstrap_totals)):
            edges = np.histogram_bin_edges(result.bootstrap_totals, bins=40)
            frequencies, _ = np.histogram(result.bootstrap_totals, bins=edges)
            report.figure(
                histogram_svg(edges, frequencies, marks=(o.abund_lo, o.abund_hi),
                              x_label=self.tr("overall abundance in a resample"), y_label=self.tr("resamples"),
                              mark_label=self.tr("{level} percentile limits").format(level=level)),
                self.tr("The {n:,} bootstrap resamples of the overall abundance").format(n=result.n_bootstrap))

        labels = [r.stratum for r in result.strata]
        dens_rows = [self._row(r, stratum_areas.get(r.stratum, r.area), presence) for r in result.strata]
        overall_row = self._row(o, sum(stratum_areas[s.stratum] for s in result.strata), presence)
        reference = None
        reference_label = ""
        if info["true_total"] and not presence:
            reference = info["true_total"] / overall_row[1]
            reference_label = self.tr("true density (simulation)")
        chart = interval_chart_svg(
            labels + [self.tr("all strata")], [row[5] for row in dens_rows] + [overall_row[5]],
            [row[7] for row in dens_rows] + [overall_row[7]], [row[8] for row in dens_rows] + [overall_row[8]],
            value_label=dens_label, reference=reference, reference_label=reference_label)
        report.figure(chart, self.tr("{what} by stratum with {level} confidence intervals").format(
            what=dens_label.capitalize(), level=level))

        values = [by[5] for by in dens_rows]
        finite = [v for v in values if v is not None]
        lo, hi = (min(finite), max(finite)) if finite else (0.0, 1.0)
        shown = {row[0]: row[5] for row in dens_rows}
        order = sorted(frame_geoms, key=estimation.natural_key)
        layers = [MapLayer(
            tuple(frame_geoms[k] for k in order), fills=tuple(_sequential_colour(shown.get(k), lo, hi) for k in order),
            stroke=INK, stroke_width=0.8,
            legend=((self.tr("lowest") + f": {lo:.3g}", _sequential_colour(lo, lo, hi)),
                    (self.tr("highest") + f": {hi:.3g}", _sequential_colour(hi, lo, hi))),
        )]
        surveyed = np.array([c is not None for c in records.attributes[info["count_field"]]]) & keep
        points = [g.centroid if g is not None and g.geom_type != "Point" else g for g in records.geometries]
        layers.append(MapLayer(tuple(p for p, s in zip(points, surveyed) if s and p is not None),
                               label=self.tr("surveyed units"), fill=UNIT_COLOUR, stroke=INK, point_radius=3.0))
        missing = [p for p, s, k in zip(points, surveyed, keep) if k and not s and p is not None]
        if missing:
            layers.append(MapLayer(tuple(missing), label=self.tr("not surveyed"), fill="#ffffff", stroke=MUTED,
                                   point_radius=3.0))
        report.figure(map_svg(layers, title=dens_label), self.tr("Strata shaded by {what}, with the units").format(
            what=dens_label))

        report.section(self.tr("Method"))
        if presence:
            report.paragraph(self.tr(
                "Each stratum's value is the proportion of its surveyed units where the species was detected; "
                "the frame's value weights the strata by the number of units they hold (area / unit area). "
                "This is naive occupancy: it is not corrected for detection, so it understates true occupancy "
                "whenever the species can be present and missed. Detection-corrected occupancy needs repeat "
                "visits to the same units (occupancy models)."))
        else:
            report.paragraph(self.tr(
                "Density in each stratum is the total count divided by the total surveyed area, D_h = Σy/Σa "
                "(the ratio estimator, Cochran 1977, ch. 6), with the linearised variance "
                "v(D_h) = (1 − f_h)/(n_h ā_h²) · Σ(y − D_h a)²/(n_h − 1), where f_h = Σa/A_h when the "
                "finite-population correction is applied and 0 otherwise. Abundance is N_h = D_h A_h; the "
                "frame's abundance is the sum over strata, its variance the sum of the strata variances, and "
                "its density N / Σ A_h (Cochran 1977, ch. 5)."))
        report.paragraph({
            "t": self.tr("Intervals use Student's t with Satterthwaite's effective degrees of freedom, "
                    "ν = (Σ v_h)² / Σ (v_h² / (n_h − 1)) (Satterthwaite 1946; Cochran 1977, ch. 5). Lower limits "
                    "below 0 are shown as 0."),
            "lognormal": self.tr("Intervals are log-normal: N/C to N·C with C = exp(z·√ln(1 + CV²)) (Burnham et al. "
                            "1987; Buckland et al. 2001). They are asymmetric and never go below 0."),
            "bootstrap": self.tr("Intervals are rescaled stratified percentile bootstrap intervals, from {b:,} resamples "
                            "drawn from the recorded seed: in each stratum n − 1 units are drawn with replacement "
                            "and their density is moved towards the stratum's estimate by the factor √(1 − f), so "
                            "that the resamples vary as much as the stratified variance says, with the "
                            "finite-population correction when it is asked for (Rao & Wu 1988; Efron & "
                            "Tibshirani 1993).").format(b=result.n_bootstrap),
        }[result.ci_method])
        if result.variance_method == "local":
            report.paragraph(self.tr(
                "Variances use the local neighbourhood estimator of Stevens & Olsen (2003): each unit and its "
                "three nearest units in the stratum form a neighbourhood, and only differences within "
                "neighbourhoods count as variance. For systematic and spatially balanced layouts the simple "
                "random sampling formula overstates the variance; this estimator does not, as long as the "
                "layout really was systematic or spatially balanced; for a simple random layout use the simple "
                "formula. The sum of the local variances is scaled once so that it agrees on average with the "
                "simple formula when the population has no spatial pattern (our choice)."))
        if any(r.collapsed_with for r in result.strata):
            report.paragraph(self.tr(
                "Strata with one surveyed unit were collapsed with a neighbour (of the strata touching it on "
                "the map, or else the strata next to it in id order, the one with the closer density): the members of a collapsed group share the group's pooled residual "
                "variance (Cochran 1977, §5A.12). Differences between the collapsed strata then count as "
                "variance, so their standard errors tend to be too large."))
            if result.ci_method == "bootstrap":
                report.paragraph(self.tr(
                    "In the bootstrap, a collapsed stratum draws as many residuals as it has units from the pooled "
                    "units of its group (each unit's count minus the group's density times the unit's area), adds "
                    "them to its own estimate and rescales them, so that its resamples are centred on its own "
                    "estimate and vary as much as the collapsed-strata variance says."))
        if result.detection_p < 1 or result.detection_se > 0:
            report.paragraph(self.tr(
                "Detection: estimates are divided by p = {p:g}, and the squared CVs of the count estimate and of p "
                "(SE {se:g}, CV {cv:.3f}) add (delta method, Seber 1982). The t interval's degrees of freedom "
                "combine the two parts (Buckland et al. 2001), p's part counting as known with infinite degrees "
                "of freedom.").format(p=result.detection_p, se=result.detection_se,
                                      cv=result.detection_se / result.detection_p))
        if result.target_cv:
            report.paragraph(self.tr(
                "Next survey: n_next is the number of units each stratum needs for a CV of {cv:g} of the overall "
                "abundance, by Neyman allocation n_h ∝ M_h S_h on the standard deviations observed now "
                "(Neyman 1934; Cochran 1977, eq. 5.26), at least 2 per stratum. The observed SDs are themselves "
                "uncertain, especially from few units.").format(cv=result.target_cv))

        report.section(self.tr("Cautions"))
        report.note(self.tr(
            "The inference covers the sampling frame only: the strata polygons given here. It says nothing "
            "about land outside them (excluded areas, inaccessible ground, neighbouring land)."))
        if presence:
            report.note(self.tr("Presence data: a non-detection is not an absence. Naive occupancy needs repeat visits "
                           "before it can be corrected for detection."))
        elif result.detection_p < 1:
            report.note(self.tr(
                "Detection: p must come from a separate study (double observers, marked animals, distance "
                "sampling) of the same species, season, habitat and observers. If the detection in this survey "
                "differs, the estimate is biased by the same factor, and no interval here shows it."))
        else:
            report.note(self.tr(
                "Detection: with p = 1 the estimate assumes every animal in a surveyed unit was counted. Animals "
                "missed make it too low, and the interval does not show that bias."))
        report.note(self.tr(
            "The design the units came from: the formulas assume the units were placed at random within each "
            "stratum with equal chances (simple random, systematic grid or spatially balanced layout), that "
            "unsurveyed units are missing by chance, and that reserve units replaced primaries in draw order. "
            "Units chosen for convenience (near roads or camps) or skipped because of what was expected there "
            "bias the estimate in ways no standard error shows."))
        report.references(REFERENCES)
        report.field_safety()
        return report
