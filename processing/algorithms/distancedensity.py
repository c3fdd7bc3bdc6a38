"""plotwise:distancedensity: density and abundance from the distances of detections on line or point transects."""
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
    QgsProcessingParameterString,
)
from qgis.PyQt.QtCore import QCoreApplication
from shapely.geometry import MultiPolygon, Polygon

from .. import compat
from .. import bridge
from ..translation import active_language
from ..engine import detection_functions as df
from ..engine import distance_density as dd
from ..engine import estimation
from ..report.distancedensity import build_report
from .base import PlotwiseAlgorithm

M2_PER = {0: 1e6, 1: 1e4}  # AREA_UNIT: 0 km², 1 ha
UNIT_NAMES = {0: "km²", 1: "ha"}
ONE_STRATUM = "frame"
SIZE_METHODS = (dd.SIZE_AUTO, dd.SIZE_MEAN, dd.SIZE_REGRESSION)

OUTPUT_FIELDS = (
    ("stratum", "string", 40), ("area", "double"), ("n_units", "int"), ("effort", "double"), ("n_det", "int"),
    ("p_det", "double"), ("esw", "double"), ("dens", "double"), ("dens_se", "double"), ("dens_lo", "double"),
    ("dens_hi", "double"), ("abund", "double"), ("abund_se", "double"), ("abund_lo", "double"),
    ("abund_hi", "double"), ("cv", "double"), ("df", "double"),
)
MODEL_FIELDS = (
    ("model", "string", 60), ("n_par", "int"), ("aic", "double"), ("delta_aic", "double"), ("p_det", "double"),
    ("esw", "double"), ("gof_p", "double"), ("chosen", "int"),
    ("stratum", "string", 40), ("n_det", "int"), ("chisq_p", "double"), ("cvm_p", "double"),
)


def _value(v):
    return None if v is None or (isinstance(v, float) and not math.isfinite(v)) else v


class DistanceDensity(PlotwiseAlgorithm):
    ALGORITHM_NAME = "distancedensity"
    GROUP_ID = "estimation"

    UNITS = "UNITS"
    UNIT_ID_FIELD = "UNIT_ID_FIELD"
    STRATUM_FIELD = "STRATUM_FIELD"
    VISITS_FIELD = "VISITS_FIELD"
    OBSERVATIONS = "OBSERVATIONS"
    OBS_UNIT_FIELD = "OBS_UNIT_FIELD"
    DISTANCE_FIELD = "DISTANCE_FIELD"
    SIZE_FIELD = "SIZE_FIELD"
    SURVEY_TYPE = "SURVEY_TYPE"
    TRUNCATION = "TRUNCATION"
    CUTPOINTS = "CUTPOINTS"
    KEYS = "KEYS"
    MAX_ADJUSTMENTS = "MAX_ADJUSTMENTS"
    SIZE_METHOD = "SIZE_METHOD"
    PER_STRATUM = "PER_STRATUM"
    STRATA = "STRATA"
    STRATA_ID_FIELD = "STRATA_ID_FIELD"
    CONFIDENCE = "CONFIDENCE"
    AREA_UNIT = "AREA_UNIT"
    BOOTSTRAP = "BOOTSTRAP"
    OUTPUT = "OUTPUT"
    OUTPUT_MODELS = "OUTPUT_MODELS"
    DENSITY = "DENSITY"
    ABUNDANCE = "ABUNDANCE"
    ABUNDANCE_LO = "ABUNDANCE_LO"
    ABUNDANCE_HI = "ABUNDANCE_HI"
    CV = "CV"
    P_DETECT = "P_DETECT"
    ESW = "ESW"

    def displayName(self):  # noqa: N802 (host naming)
        return self.tr("Density from detection distances (line and point transects)")

    def shortHelpString(self):  # noqa: N802 (host naming)
        return self.tr(
            "Estimates density and abundance per stratum and for the frame from the distances at which animals "
            "(or groups) were seen from line transects or point stations. A detection function fitted to the "
            "distances gives the probability of seeing an animal, so the estimate needs no detection probability "
            "typed in by hand (Buckland et al. 2001).\n\n"
            "Transects or points: the units from the layout (line transects or point stations), with their id "
            "field (unit_id) and stratum field (stratum). Line length comes from the geometry; a visits field "
            "gives the visits to each point (empty or 0: not surveyed). Every surveyed unit counts, also those "
            "with no detection. Units whose role is 'reserve' are left out unless an observation names them; "
            "set the role of a surveyed reserve that saw nothing to 'primary'.\n\n"
            "Observations: a table or point layer with one row per detection: the unit id, the distance in m "
            "(perpendicular to the line for line transects, from the point for point transects) and, optionally, "
            "the group size (empty field: each detection is one animal). A negative or missing distance, a group "
            "size not above 0, or a unit id the units layer does not have stops the run, naming the "
            "observations.\n\n"
            "Survey type: line or point transects. Truncation distance (m): detections farther away are left "
            "out; 0 drops the farthest 5 % (common practice). Distance bands (m, optional, e.g. 0, 10, 25, 50, "
            "100): for surveys that record bands; the fit then uses the counts per band, and the last edge is "
            "the truncation distance.\n\n"
            "Key functions: half-normal, hazard-rate and uniform; each is fitted alone, then with cosine terms "
            "added one at a time while AIC improves (at most the number given), under the constraint that "
            "detection never rises with distance. The model with the smallest AIC is used; the models table "
            "lists every model tried with its AIC, the difference to the best, the detection probability, the "
            "effective strip half-width (lines) or effective detection radius (points) and goodness-of-fit "
            "p-values (χ² on distance bands; Cramér–von Mises on exact distances).\n\n"
            "Group size: the mean size of the detected groups, or the size-bias regression of ln(size) on the "
            "detection probability when larger groups are seen farther away (automatic: when the slope is "
            "negative at p < 0.15, common practice).\n\n"
            "One detection function per stratum (option): each stratum then needs at least 20 detections (60 "
            "to 80 advised, common practice); otherwise one function serves all strata.\n\n"
            "Density: D = n·E(s) / (2wL·P) for lines and n·E(s) / (kπw²·P) for points. Variance by the delta "
            "method: the encounter rate's variance between transects within each stratum (estimator R2 of "
            "Fewster et al. 2009), the detection function's from its likelihood, the group size's from the sizes; "
            "Satterthwaite's degrees of freedom and a log-normal interval with t (Buckland et al. 2001). Bootstrap "
            "resamples (0: none) resample transects or points within strata and refit the chosen model, seeded; "
            "the outputs then carry the bootstrap's percentile interval.\n\n"
            "Strata: polygons with an id field matching the units' stratum field; their areas define the frame "
            "(as in the estimate algorithm). Every stratum needs at least two surveyed units. At least 20 "
            "detections within the truncation distance are needed (an error names the count), 60 are advised (a "
            "warning).\n\n"
            "Confidence level of the intervals; area unit of the results (km² or hectares); random seed, used by "
            "the bootstrap only (0 draws one and records it); most cosine terms per key function (0: the keys "
            "alone).\n\n"
            "Outputs: the strata with stratum, area, n_units (transects or points), effort (km of line, or point "
            "visits), n_det (detections within the truncation distance), p_det (detection probability within it), "
            "esw (effective strip half-width for lines, effective detection radius for points, m), dens, abund "
            "with their SE, limits and CV, and df; a models table (model, n_par, aic, delta_aic, p_det, esw, gof_p, "
            "chosen, then stratum, n_det, chisq_p, cvm_p); an HTML report (histogram of the distances with the "
            "fitted function, models, estimates, map, assumptions); and the overall numbers for models.\n\n"
            "References: Buckland, S. T. et al. (2001) Introduction to Distance Sampling, Oxford University "
            "Press. Fewster, R. M. et al. (2009) Biometrics 65:225–236.\n\n"
            "Field safety: distance sampling sends observers along lines and to points. Check every unit's "
            "access and safety before sending a team: the tool never makes a location safe. Follow your "
            "agency's field-safety rules and local law."
        )

    def initAlgorithm(self, config=None):  # noqa: N802 (host naming)
        # the field parameters are optional for the host, with the usual names as defaults, so that a run naming
        # only the layers works; a field that the layer does not have is our own clear error
        self.addParameter(QgsProcessingParameterFeatureSource(
            self.UNITS, self.tr("Transects or points surveyed"), [compat.TYPE_VECTOR_LINE, compat.TYPE_VECTOR_POINT]))
        self.addParameter(QgsProcessingParameterField(
            self.UNIT_ID_FIELD, self.tr("Unit id field"), "unit_id", self.UNITS, compat.FIELD_ANY, optional=True))
        self.addParameter(QgsProcessingParameterField(
            self.STRATUM_FIELD, self.tr("Stratum field of the units"), "stratum", self.UNITS, compat.FIELD_ANY,
            optional=True))
        self.addParameter(QgsProcessingParameterFeatureSource(
            self.OBSERVATIONS, self.tr("Observations (one row per detection)"), [compat.TYPE_VECTOR]))
        self.addParameter(QgsProcessingParameterField(
            self.OBS_UNIT_FIELD, self.tr("Unit id field of the observations"), "unit_id", self.OBSERVATIONS,
            compat.FIELD_ANY, optional=True))
        self.addParameter(QgsProcessingParameterField(
            self.DISTANCE_FIELD, self.tr("Distance field (m)"), "distance", self.OBSERVATIONS, compat.FIELD_ANY,
            optional=True))
        self.addParameter(QgsProcessingParameterField(
            self.SIZE_FIELD, self.tr("Group size field (empty: each detection is one animal)"), "size",
            self.OBSERVATIONS, compat.FIELD_ANY, optional=True))
        self.addParameter(QgsProcessingParameterEnum(
            self.SURVEY_TYPE, self.tr("Survey type"), [self.tr("Line transects"), self.tr("Point transects")],
            defaultValue=0))
        self.addParameter(QgsProcessingParameterNumber(
            self.TRUNCATION, self.tr("Truncation distance (m; 0: drop the farthest 5 %)"), type=compat.NUMBER_DOUBLE,
            defaultValue=0.0, minValue=0.0))
        self.addParameter(QgsProcessingParameterEnum(
            self.KEYS, self.tr("Key functions to try"),
            [self.tr("Half-normal"), self.tr("Hazard-rate"), self.tr("Uniform with cosine terms")],
            allowMultiple=True, defaultValue=[0, 1, 2]))
        self.addParameter(QgsProcessingParameterFeatureSource(
            self.STRATA, self.tr("Strata (the frame)"), [compat.TYPE_VECTOR_POLYGON]))
        self.addParameter(QgsProcessingParameterField(
            self.STRATA_ID_FIELD, self.tr("Stratum id field of the strata"), "stratum", self.STRATA,
            compat.FIELD_ANY, optional=True))
        self.addParameter(QgsProcessingParameterNumber(
            self.CONFIDENCE, self.tr("Confidence level"), type=compat.NUMBER_DOUBLE, defaultValue=0.95,
            minValue=0.5, maxValue=0.999))
        self.addParameter(QgsProcessingParameterEnum(
            self.AREA_UNIT, self.tr("Area unit of the results"), [self.tr("km²"), self.tr("hectares")],
            defaultValue=0))
        self.add_seed_parameter()
        self._optional_parameters()
        self.addParameter(QgsProcessingParameterFeatureSink(
            self.OUTPUT, self.tr("Strata with distance estimates"), compat.TYPE_VECTOR_POLYGON))
        self.addParameter(QgsProcessingParameterFeatureSink(
            self.OUTPUT_MODELS, self.tr("Detection function models"), compat.TYPE_VECTOR))
        self.add_report_parameter()
        for name, label in (
            (self.DENSITY, self.tr("Overall density")), (self.ABUNDANCE, self.tr("Overall abundance")),
            (self.ABUNDANCE_LO, self.tr("Lower confidence limit of the abundance")),
            (self.ABUNDANCE_HI, self.tr("Upper confidence limit of the abundance")),
            (self.CV, self.tr("CV of the overall estimate")),
            (self.P_DETECT, self.tr("Detection probability within the truncation distance")),
            (self.ESW, self.tr("Effective strip half-width or detection radius (m)")),
        ):
            self.addOutput(QgsProcessingOutputNumber(name, label))

    def _optional_parameters(self):
        self.addParameter(QgsProcessingParameterField(
            self.VISITS_FIELD, self.tr("Visits field of the points (empty: one visit each)"), None, self.UNITS,
            compat.FIELD_NUMERIC, optional=True))
        self.addParameter(QgsProcessingParameterString(
            self.CUTPOINTS, self.tr("Distance bands (m, from 0, comma-separated; empty: exact distances)"), "",
            optional=True))
        self.addParameter(QgsProcessingParameterNumber(
            self.MAX_ADJUSTMENTS, self.tr("Most cosine terms per key function"), type=compat.NUMBER_INTEGER,
            defaultValue=df.MAX_ADJUSTMENTS, minValue=0, maxValue=5))
        self.addParameter(QgsProcessingParameterEnum(
            self.SIZE_METHOD, self.tr("Group size"),
            [self.tr("Automatic: mean, or size-bias regression when larger groups are seen farther"),
             self.tr("Mean of the detected groups"), self.tr("Size-bias regression")], defaultValue=0))
        self.addParameter(QgsProcessingParameterBoolean(
            self.PER_STRATUM, self.tr("One detection function per stratum"), defaultValue=False))
        self.addParameter(QgsProcessingParameterNumber(
            self.BOOTSTRAP, self.tr("Bootstrap resamples over transects (0: none)"), type=compat.NUMBER_INTEGER,
            defaultValue=0, minValue=0, maxValue=9999))

    # ------------------------------------------------------------------------------ reading
    def _cutpoints(self, parameters, context):
        text = (self.parameterAsString(parameters, self.CUTPOINTS, context) or "").strip()
        if not text:
            return None
        try:
            return [float(v) for v in text.replace(";", ",").split(",") if v.strip()]
        except ValueError:
            raise QgsProcessingException(self.tr(
                "The distance bands '{text}' are not numbers. Write the band edges in m, from 0, separated by "
                "commas, e.g. 0, 10, 25, 50, 100.").format(text=text)) from None

    def _read_units(self, units, fields, survey, crs, context, feedback, observed_units):
        """Ids, strata, effort and geometries of the surveyed units (unused reserves and unvisited points out)."""
        wanted = tuple(dict.fromkeys(f for f in (fields["unit"], fields["stratum"], fields["visits"], "role")
                                     if f and units.fields().lookupField(f) >= 0))
        records = bridge.read_features(units, crs, context, feedback, wanted, units.sourceName(), drop_empty=False)
        if len(records) == 0:
            raise QgsProcessingException(self.tr("Layer '{layer}' has no features.").format(layer=units.sourceName()))
        kinds = {g.geom_type for g in records.geometries if g is not None}
        expected = ("LineString", "MultiLineString") if survey == df.LINE else ("Point", "MultiPoint")
        if not kinds & set(expected):  # (a line of zero length may come back from the repair as a point)
            raise QgsProcessingException(self.tr(
                "Layer '{layer}' holds {kinds} geometries, but the survey type is {survey}. Choose the survey type "
                "that matches the units (line transects need lines, point transects points).").format(
                layer=units.sourceName(), kinds=", ".join(sorted(kinds)),
                survey=self.tr("line transects") if survey == df.LINE else self.tr("point transects")))
        attrs = records.attributes
        ids = attrs[fields["unit"]]
        labels = [estimation.stratum_label(v) for v in ids]
        keep = np.ones(len(records), dtype=bool)
        if "role" in attrs:
            unused = np.array([str(r).lower() == "reserve" and lab not in observed_units
                               for r, lab in zip(attrs["role"], labels)])
            if unused.any():
                feedback.pushInfo(self.tr("{n} reserve unit(s) without observations were left out (not "
                                          "surveyed).").format(n=int(unused.sum())))
            keep &= ~unused
        if survey == df.LINE:
            effort = np.array([g.length if g is not None and g.geom_type in expected else 0.0
                               for g in records.geometries])
        else:
            effort = self._visits(attrs, fields["visits"], labels, observed_units, keep, units.sourceName(), feedback)
            keep &= effort > 0
        strata = attrs[fields["stratum"]] if fields["stratum"] else [ONE_STRATUM] * len(records)
        pick = np.flatnonzero(keep)
        return ([ids[i] for i in pick], [strata[i] for i in pick], effort[pick],
                [records.geometries[i] for i in pick], list(records.warnings))

    def _visits(self, attrs, field, labels, observed_units, keep, layer, feedback):
        if not field:
            return np.ones(len(labels))
        raw = attrs[field]
        visits = np.array([float(v) if isinstance(v, (int, float)) and not isinstance(v, bool) else 0.0 for v in raw])
        bad = [lab for lab, v in zip(labels, visits) if v < 0 or v != round(v)]
        if bad:
            raise QgsProcessingException(self.tr(
                "Layer '{layer}': the points {ids} have a number of visits in the field '{field}' that is not a "
                "whole number of 0 or more. Correct them.").format(layer=layer, ids=bridge.listed_ids(bad),
                                                                  field=field))
        unvisited = [lab for lab, v, k in zip(labels, visits, keep) if v == 0 and lab in observed_units and k]
        if unvisited:
            raise QgsProcessingException(self.tr(
                "Layer '{layer}': observations name the points {ids}, whose visits field '{field}' is empty or 0. "
                "Give them their number of visits, or correct the observations' unit ids.").format(
                layer=layer, ids=bridge.listed_ids(unvisited), field=field))
        skipped = int(np.sum((visits == 0) & keep))
        if skipped:
            feedback.pushInfo(self.tr("{n} point(s) with no visits were left out (not surveyed).").format(n=skipped))
        return visits

    def _strata(self, parameters, context, feedback, strata_source, crs, stratum_field, m2_per_unit, unit_name):
        """``(stratum areas, geometries, strata id field, warnings, stratum field)`` as the estimate reads them."""
        strata_id_field = self.field_name(parameters, self.STRATA_ID_FIELD, context, strata_source)
        warnings = []
        if stratum_field and not strata_id_field:
            if strata_source.featureCount() != 1:
                raise QgsProcessingException(self.tr(
                    "Layer '{layer}' has no stratum id field matching the units' field '{field}'. Choose the strata "
                    "layer's id field, or give a frame layer of one polygon to treat the frame as one "
                    "stratum.").format(layer=strata_source.sourceName(), field=stratum_field))
            warnings.append(self.tr("Layer '{layer}' is one polygon without a stratum id field: the frame is treated "
                                    "as one stratum.").format(layer=strata_source.sourceName()))
            stratum_field = None
        if not stratum_field:
            strata_id_field = None
        records = bridge.read_features(strata_source, crs, context, feedback,
                                       (strata_id_field,) if strata_id_field else (), strata_source.sourceName())
        if len(records) == 0:
            raise QgsProcessingException(self.tr("Layer '{layer}' has no polygons with an area.").format(
                layer=strata_source.sourceName()))
        stratum_ids = records.attributes[strata_id_field] if strata_id_field else [ONE_STRATUM] * len(records)
        with self.engine_errors():
            frame = estimation.frame_strata(stratum_ids, records.geometries, records.fids.tolist(),
                                            m2_per_unit=m2_per_unit, unit=unit_name, layer=strata_source.sourceName(),
                                            field=strata_id_field or "")
        warnings.extend(self.translate_message(w) for w in frame.warnings)
        return frame.areas, frame.geometries, strata_id_field, warnings + list(records.warnings), stratum_field

    # ------------------------------------------------------------------------------ run
    def processAlgorithm(self, parameters, context, feedback):  # noqa: N802 (host naming)
        units = self.parameterAsSource(parameters, self.UNITS, context)
        observations = self.parameterAsSource(parameters, self.OBSERVATIONS, context)
        strata_source = self.parameterAsSource(parameters, self.STRATA, context)
        for name, source in ((self.UNITS, units), (self.OBSERVATIONS, observations), (self.STRATA, strata_source)):
            if source is None:
                raise QgsProcessingException(self.invalidSourceError(parameters, name))
        survey = (df.LINE, df.POINT)[self.parameterAsEnum(parameters, self.SURVEY_TYPE, context)]
        area_unit = self.parameterAsEnum(parameters, self.AREA_UNIT, context)
        fields = dict(
            unit=self.field_name(parameters, self.UNIT_ID_FIELD, context, units, required=True),
            stratum=self.field_name(parameters, self.STRATUM_FIELD, context, units),
            visits=self.field_name(parameters, self.VISITS_FIELD, context, units)
            if survey == df.POINT else None,
            obs_unit=self.field_name(parameters, self.OBS_UNIT_FIELD, context, observations, required=True),
            distance=self.field_name(parameters, self.DISTANCE_FIELD, context, observations, required=True),
            size=self.field_name(parameters, self.SIZE_FIELD, context, observations),
        )
        n_bootstrap = self.parameterAsInt(parameters, self.BOOTSTRAP, context)
        seeded = self.seeded_generator(parameters, context, feedback) if n_bootstrap else None
        crs = bridge.computation_crs(units.sourceCrs(), units.sourceExtent(), context, feedback, units.sourceName())

        obs = bridge.read_features(observations, crs, context, feedback,
                                   tuple(f for f in (fields["obs_unit"], fields["distance"], fields["size"]) if f),
                                   observations.sourceName(), drop_empty=False)
        observed_units = {estimation.stratum_label(v) for v in obs.attributes[fields["obs_unit"]]}
        ids, unit_strata, effort, geometries, warnings = self._read_units(units, fields, survey, crs, context,
                                                                          feedback, observed_units)
        feedback.setProgress(15)
        areas, strata_geometries, strata_id_field, strata_warnings, fields["stratum"] = self._strata(
            parameters, context, feedback, strata_source, crs, fields["stratum"], M2_PER[area_unit],
            UNIT_NAMES[area_unit])
        if not fields["stratum"]:
            unit_strata = [ONE_STRATUM] * len(ids)
        warnings += strata_warnings
        already_pushed = len(warnings)
        feedback.setProgress(20)
        keys = [df.KEYS[i] for i in self.parameterAsEnums(parameters, self.KEYS, context)] or list(df.KEYS)
        with self.engine_errors():
            result = dd.estimate_distance_density(
                ids, unit_strata, effort, areas, obs.attributes[fields["obs_unit"]],
                obs.attributes[fields["distance"]], obs.attributes[fields["size"]] if fields["size"] else None,
                survey=survey, truncation=self.parameterAsDouble(parameters, self.TRUNCATION, context) or None,
                cutpoints=self._cutpoints(parameters, context), keys=keys,
                max_adjustments=self.parameterAsInt(parameters, self.MAX_ADJUSTMENTS, context),
                per_stratum=self.parameterAsBool(parameters, self.PER_STRATUM, context),
                size_method=SIZE_METHODS[self.parameterAsEnum(parameters, self.SIZE_METHOD, context)],
                confidence=self.parameterAsDouble(parameters, self.CONFIDENCE, context),
                m2_per_unit=M2_PER[area_unit], n_bootstrap=n_bootstrap,
                rng=None if seeded is None else seeded.generator, obs_ids=obs.fids.tolist(),
                names=dd.SourceNames(units.sourceName(), fields["unit"], observations.sourceName(),
                                     fields["obs_unit"], fields["distance"], fields["size"] or ""),
                progress=self.progress_callback(feedback, 20, 85))
        warnings.extend(self.translate_message(w) for w in result.warnings)
        self.push_warnings(feedback, warnings[already_pushed:])

        outputs = self._write(parameters, context, feedback, result, strata_geometries, crs, area_unit)
        info = dict(
            units=units.sourceName(), unit_field=fields["unit"], stratum_field=fields["stratum"],
            visits_field=fields["visits"], observations=observations.sourceName(), obs_unit_field=fields["obs_unit"],
            distance_field=fields["distance"], size_field=fields["size"], strata=strata_source.sourceName(),
            area_unit=UNIT_NAMES[area_unit], crs=crs.authid(), seed=None if seeded is None else seeded.seed,
            keys=keys, max_adjustments=self.parameterAsInt(parameters, self.MAX_ADJUSTMENTS, context),
            warnings=warnings, strata_geometries=strata_geometries, unit_geometries=geometries)
        outputs[self.REPORT] = self._report(result, info, parameters, context, feedback)
        return outputs

    def _report(self, result, info, parameters, context, feedback):
        report = build_report(result, info, translate=QCoreApplication.translate, language=active_language())
        return self.write_report(report, parameters, context, feedback)

    # ------------------------------------------------------------------------------ writing
    def _write(self, parameters, context, feedback, result, strata_geometries, crs, area_unit):
        fields = bridge.make_fields(OUTPUT_FIELDS)
        rows, polygons = [], []
        for r in result.strata:
            rows.append([_value(v) for v in (
                r.stratum, r.area, r.n_units, r.effort, r.n_det, r.p_det, r.esw, r.dens, r.dens_se, r.dens_lo,
                r.dens_hi, r.abund, r.abund_se, r.abund_lo, r.abund_hi, r.cv, r.df)])
            geometry = strata_geometries[r.stratum]
            polygons.append(MultiPolygon([geometry]) if isinstance(geometry, Polygon) else geometry)
        sink, dest = self.parameterAsSink(parameters, self.OUTPUT, context, fields, compat.WKB_MULTIPOLYGON, crs)
        if sink is None:
            raise QgsProcessingException(self.invalidSinkError(parameters, self.OUTPUT))
        if not bridge.write_features(sink, fields, polygons, rows, feedback, (85.0, 92.0)):
            raise self.cancelled_error()
        self.style_output(context, dest, "estimate", area_unit=UNIT_NAMES[area_unit])

        model_fields = bridge.make_fields(MODEL_FIELDS)
        model_rows = []
        for analysis in result.analyses:
            selection = analysis.selection
            for i, fit in enumerate(selection.fits):
                gof = fit.gof
                model_rows.append([_value(v) for v in (
                    fit.label, fit.n_par, fit.aic, selection.delta_aic(i), fit.p_det, fit.esw, fit.gof_p,
                    int(i == selection.chosen), analysis.stratum, fit.n, gof.chi2_p if gof else None,
                    gof.cvm_p if gof else None)])
        table, table_dest = self.parameterAsSink(parameters, self.OUTPUT_MODELS, context, model_fields,
                                                 compat.WKB_NOGEOMETRY, QgsCoordinateReferenceSystem())
        if table is None:
            raise QgsProcessingException(self.invalidSinkError(parameters, self.OUTPUT_MODELS))
        bridge.write_features(table, model_fields, [None] * len(model_rows), model_rows, feedback, (92.0, 95.0))

        o = result.overall
        for analysis in result.analyses:
            fit = analysis.fit
            feedback.pushInfo(self.tr("Detection function{where}: {model}, P = {p:.3f}, effective width {esw:.1f} m, "
                                      "{n} detections.").format(
                where="" if analysis.stratum == dd.OVERALL else f" ({analysis.stratum})", model=fit.label,
                p=fit.p_det, esw=fit.esw, n=analysis.n))
        feedback.pushInfo(self.tr("Overall abundance {n:,.1f} ({lo:,.1f} to {hi:,.1f}), CV {cv:.3f}.").format(
            n=o.abund, lo=o.abund_lo, hi=o.abund_hi, cv=o.cv))
        feedback.setProgress(100)

        def number(value):
            return None if value is None or not np.isfinite(value) else float(value)

        return {
            self.OUTPUT: dest, self.OUTPUT_MODELS: table_dest, self.DENSITY: number(o.dens),
            self.ABUNDANCE: number(o.abund), self.ABUNDANCE_LO: number(o.abund_lo),
            self.ABUNDANCE_HI: number(o.abund_hi), self.CV: number(o.cv), self.P_DETECT: number(o.p_det),
            self.ESW: number(o.esw),
        }
