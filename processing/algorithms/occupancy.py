"""plotwise:occupancy: single-season occupancy (psi) and detection (p) from repeat visits to sites."""
import math

import numpy as np
from qgis.PyQt.QtCore import QCoreApplication
from qgis.core import (
    QgsCoordinateReferenceSystem,
    QgsFeature,
    QgsProcessingException,
    QgsProcessingOutputNumber,
    QgsProcessingParameterFeatureSink,
    QgsProcessingParameterFeatureSource,
    QgsProcessingParameterField,
    QgsProcessingParameterNumber,
    QgsProcessingParameterString,
)

from .. import compat
from ..translation import active_language
from .. import bridge
from ..engine import occupancy as engine
from ..report.occupancy import OccupancyRun, occupancy_report
from .base import PlotwiseAlgorithm

SITE_FIELDS = (("psi", "double", 12, 6), ("psi_cond", "double", 12, 6), ("naive", "int"))
TABLE_FIELDS = (("param", "string", 60), ("estimate", "double"), ("se", "double"), ("lo", "double"), ("hi", "double"))
MODEL_FIELDS = (("model", "string", 200), ("n_par", "int"), ("loglik", "double"), ("aic", "double"),
                ("aicc", "double"), ("delta_aic", "double"), ("weight", "double"), ("psi", "double"), ("p", "double"),
                ("status", "string", 12))


def _number(value):
    return None if value is None or not np.isfinite(value) else float(value)


class Occupancy(PlotwiseAlgorithm):
    ALGORITHM_NAME = "occupancy"
    GROUP_ID = "estimation"

    SITES = "SITES"
    SITE_ID_FIELD = "SITE_ID_FIELD"
    HISTORY_FIELDS = "HISTORY_FIELDS"
    PSI_COVARIATES = "PSI_COVARIATES"
    P_COVARIATES = "P_COVARIATES"
    EFFORT_FIELDS = "EFFORT_FIELDS"
    MODELS = "MODELS"
    CONFIDENCE = "CONFIDENCE"
    TARGET_SE = "TARGET_SE"
    GOF_REPLICATES = "GOF_REPLICATES"
    OUTPUT = "OUTPUT"
    OUTPUT_TABLE = "OUTPUT_TABLE"
    OUTPUT_MODELS = "OUTPUT_MODELS"
    NUMBERS = ("PSI", "PSI_SE", "PSI_LO", "PSI_HI", "P", "P_SE", "NAIVE", "OCCASIONS_NEEDED", "SITES_NEEDED",
               "C_HAT", "GOF_P")

    def displayName(self):  # noqa: N802
        return self.tr("Estimate occupancy from repeat visits")

    def shortHelpString(self):  # noqa: N802
        return self.tr(
            "Estimates the share of sites the species occupies (ψ), corrected for the surveys on which it was there "
            "but not detected (p), from detection histories: single-season occupancy model (MacKenzie et al. 2002).\n\n"
            "Sites: a layer or a table with one row per site (station) and one history field per occasion, holding "
            "1 (detected), 0 (not detected) or NULL (not surveyed that occasion). Any other value stops the run, "
            "naming the field and the sites. Sites with no surveyed occasion are left out and listed. Site id field: "
            "the ids used in messages (default: the feature ids); they must be unique.\n\n"
            "Covariates: numeric site fields for ψ and for p; effort fields (one per history field, in the same "
            "order, e.g. camera-days per occasion) add an occasion-level effort to p. logit ψ and logit p are linear "
            "in their covariates. A NULL covariate at a surveyed site is an error.\n\n"
            "Models compared (optional): one model per line, or models separated by ;; such as "
            "\"psi: elevation  p: effort\" (terms separated by commas or +; a missing part is constant; the word "
            "effort means the effort fields). The chosen model, the constant model and these are compared by AIC; "
            "the outputs come from the chosen model (the covariates above).\n\n"
            "Maximum likelihood with scipy; standard errors from the observed information, intervals on the logit "
            "scale at the confidence level. A model that does not converge gives no number, and a parameter at the "
            "boundary (ψ = 1, p = 1, a covariate that separates the sites) is reported as such, without SE.\n\n"
            "Design advice: the occasions needed for a cumulative detection of 0.95, and the sites needed for the "
            "target SE of ψ, from the asymptotic variance of MacKenzie & Royle (2005).\n"
            "Goodness of fit (replicates above 0): parametric bootstrap of the χ² of the detection-history "
            "frequencies (MacKenzie & Bailey 2004), with ĉ; seeded.\n\n"
            "Outputs: the sites with psi (fitted ψ), psi_cond (probability of occupancy given the site's history; "
            "1 where detected) and naive (1 where detected at least once); a parameters table (param, estimate, se, "
            "lo, hi); optionally the model table; an HTML report; and the numbers PSI, PSI_SE, PSI_LO, PSI_HI, P, "
            "P_SE, NAIVE, OCCASIONS_NEEDED, SITES_NEEDED, C_HAT, GOF_P.\n\n"
            "More fieldwork follows from the design advice: check every site's access and safety before sending a "
            "team; the tool never makes a location safe. Follow your agency's field-safety rules and local law."
        )

    def initAlgorithm(self, config=None):  # noqa: N802
        self.addParameter(QgsProcessingParameterFeatureSource(
            self.SITES, self.tr("Sites with detection histories"), [compat.TYPE_VECTOR]))
        self.addParameter(QgsProcessingParameterField(
            self.SITE_ID_FIELD, self.tr("Site id field (empty: feature ids)"), None, self.SITES, compat.FIELD_ANY,
            optional=True))
        self.addParameter(QgsProcessingParameterField(
            self.HISTORY_FIELDS, self.tr("History fields, one per occasion, in order"), None, self.SITES,
            compat.FIELD_ANY, allowMultiple=True))
        for name, label in ((self.PSI_COVARIATES, self.tr("Site covariates of occupancy ψ")),
                            (self.P_COVARIATES, self.tr("Site covariates of detection p")),
                            (self.EFFORT_FIELDS, self.tr("Effort fields, one per history field (optional)"))):
            self.addParameter(QgsProcessingParameterField(name, label, None, self.SITES, compat.FIELD_NUMERIC,
                                                          allowMultiple=True, optional=True))
        self.addParameter(QgsProcessingParameterString(
            self.MODELS, self.tr("Models to compare by AIC (one per line, e.g. psi: elevation  p: effort)"),
            multiLine=True, optional=True))
        self.addParameter(QgsProcessingParameterNumber(
            self.CONFIDENCE, self.tr("Confidence level"), type=compat.NUMBER_DOUBLE, defaultValue=0.95,
            minValue=0.5, maxValue=0.999))
        self.addParameter(QgsProcessingParameterNumber(
            self.TARGET_SE, self.tr("Target SE of ψ for the design advice (0: none)"), type=compat.NUMBER_DOUBLE,
            defaultValue=0.05, minValue=0.0, maxValue=0.5))
        self.addParameter(QgsProcessingParameterNumber(
            self.GOF_REPLICATES, self.tr("Goodness-of-fit bootstrap replicates (0: no test)"),
            type=compat.NUMBER_INTEGER, defaultValue=0, minValue=0, maxValue=10000))
        self.add_seed_parameter()
        self.addParameter(QgsProcessingParameterFeatureSink(self.OUTPUT, self.tr("Sites with occupancy")))
        self.addParameter(QgsProcessingParameterFeatureSink(
            self.OUTPUT_TABLE, self.tr("Occupancy parameters"), compat.TYPE_VECTOR))
        self.addParameter(QgsProcessingParameterFeatureSink(
            self.OUTPUT_MODELS, self.tr("Model comparison"), compat.TYPE_VECTOR, optional=True,
            createByDefault=False))
        self.add_report_parameter()
        labels = (self.tr("Occupancy ψ"), self.tr("SE of ψ"), self.tr("Lower limit of ψ"), self.tr("Upper limit of ψ"),
                  self.tr("Detection p per survey"), self.tr("SE of p"), self.tr("Naive occupancy"),
                  self.tr("Occasions for a cumulative detection of 0.95"),
                  self.tr("Sites needed for the target SE of ψ"), self.tr("c-hat of the goodness of fit"),
                  self.tr("p-value of the goodness of fit"))
        for name, label in zip(self.NUMBERS, labels):
            self.addOutput(QgsProcessingOutputNumber(name, label))

    # ------------------------------------------------------------------------------
    def processAlgorithm(self, parameters, context, feedback):  # noqa: N802
        source = self.parameterAsSource(parameters, self.SITES, context)
        if source is None:
            raise QgsProcessingException(self.invalidSourceError(parameters, self.SITES))
        layer = source.sourceName() or self.SITES
        names = source.fields().names()
        id_field = self.field_name(parameters, self.SITE_ID_FIELD, context, source, layer)
        history = self.field_names(parameters, self.HISTORY_FIELDS, context, source, layer)
        psi_cov = self.field_names(parameters, self.PSI_COVARIATES, context, source, layer)
        p_cov = self.field_names(parameters, self.P_COVARIATES, context, source, layer)
        effort_fields = self.field_names(parameters, self.EFFORT_FIELDS, context, source, layer)
        models_text = self.parameterAsString(parameters, self.MODELS, context) or ""
        gof_replicates = self.parameterAsInt(parameters, self.GOF_REPLICATES, context)
        seeded = self.seeded_generator(parameters, context, feedback) if gof_replicates > 0 else None

        spatial = source.wkbType() != compat.WKB_NOGEOMETRY and source.sourceCrs().isValid()
        crs = bridge.computation_crs(source.sourceCrs(), source.sourceExtent(), context, feedback, layer) \
            if spatial else source.sourceCrs()
        numeric = [f for f in names if compat.field_is_numeric(source.fields().field(f))]
        wanted = tuple(dict.fromkeys([id_field] + history + psi_cov + p_cov + effort_fields + numeric))
        records = bridge.read_features(source, crs, context, feedback, tuple(f for f in wanted if f), layer,
                                       repair=False, drop_empty=False)
        if len(records) == 0:
            raise QgsProcessingException(self.tr("Layer '{layer}' has no features.").format(layer=layer))
        feedback.setProgress(10)
        attrs = records.attributes
        site_ids = attrs[id_field] if id_field else [int(i) for i in records.fids]
        with self.engine_errors():
            histories = engine.detection_histories([attrs[f] for f in history], history, site_ids, layer)
            effort = None
            if effort_fields:
                effort = np.array([attrs[f] for f in effort_fields], dtype=object).T
            models = engine.parse_models(models_text, numeric, bool(effort_fields))
            result = engine.occupancy_analysis(
                histories, psi_cov, p_cov, {f: attrs[f] for f in numeric}, effort, models,
                self.parameterAsDouble(parameters, self.CONFIDENCE, context),
                self.parameterAsDouble(parameters, self.TARGET_SE, context), gof_replicates, layer, effort_fields,
                rng=seeded.generator if seeded else None, progress=self.progress_callback(feedback, 10, 85))
        warnings = [self.translate_message(w) for w in result.warnings]
        self.push_warnings(feedback, warnings)

        outputs = self._write(parameters, context, feedback, source, records, result)
        geometries = [g for g, k in zip(records.geometries, histories.kept) if k] if spatial else None
        run = OccupancyRun(layer, id_field or "", tuple(history), tuple(effort_fields), models_text,
                           f"{crs.authid()} ({crs.description()})" if spatial else self.tr("(a table: no map)"),
                           seeded.seed if seeded else None)
        report = occupancy_report(result, run, geometries, warnings, translate=QCoreApplication.translate,
                                  language=active_language())
        path = self.write_report(report, parameters, context, feedback)
        if path:
            outputs[self.REPORT] = path
        outputs.update(self._numbers(result))
        main = result.main
        info = self.tr("ψ = {psi:.3f} (SE {se}), p = {p:.3f}, naive occupancy {naive:.3f}, {n} sites.")
        feedback.pushInfo(info.format(
            psi=main.psi_mean.estimate, se="–" if not np.isfinite(main.psi_mean.se) else f"{main.psi_mean.se:.3f}",
            p=main.p_mean.estimate, naive=result.summary.naive, n=result.summary.n_used))
        feedback.setProgress(100)
        return outputs

    def _numbers(self, result):
        main, advice, gof = result.main, result.advice, result.gof
        sites = math.ceil(advice.sites_needed) if np.isfinite(advice.sites_needed) else None
        values = (main.psi_mean.estimate, main.psi_mean.se, main.psi_mean.lo, main.psi_mean.hi, main.p_mean.estimate,
                  main.p_mean.se, result.summary.naive, advice.occasions_95, sites,
                  gof.c_hat if gof else None, gof.p_value if gof else None)
        return {name: _number(v) for name, v in zip(self.NUMBERS, values)}

    # ------------------------------------------------------------------------------
    def _write(self, parameters, context, feedback, source, records, result):
        fields = bridge.make_fields([])
        for field in source.fields():
            if field.name() not in [f[0] for f in SITE_FIELDS]:
                fields.append(field)
        kept_count = len(fields)
        for item in SITE_FIELDS:
            fields.append(compat.make_field(*item))
        sink, dest = self.parameterAsSink(parameters, self.OUTPUT, context, fields, source.wkbType(),
                                          source.sourceCrs())
        if sink is None:
            raise QgsProcessingException(self.invalidSinkError(parameters, self.OUTPUT))
        main, kept = result.main, result.histories.kept
        position = np.cumsum(kept) - 1
        naive = np.nansum(result.histories.y, axis=1) > 0
        by_fid = {int(fid): i for i, fid in enumerate(records.fids)}
        null = bridge.sink_value(None)
        for feature in source.getFeatures():
            if feedback.isCanceled():
                raise self.cancelled_error()
            out = QgsFeature(fields)
            out.setGeometry(feature.geometry())
            values = [feature[f.name()] for f in list(fields)[:kept_count]]
            i = by_fid.get(feature.id())
            if i is not None and kept[i]:
                j = position[i]
                values += [float(main.psi[j]), float(main.psi_cond[j]), int(naive[i])]
            else:
                values += [null, null, null]
            out.setAttributes(values)
            sink.addFeature(out, compat.FAST_INSERT)
        self.style_output(context, dest, "occupancy")
        outputs = {self.OUTPUT: dest, self.OUTPUT_TABLE: self._write_table(parameters, context, result)}
        models = self._write_models(parameters, context, result)
        if models is not None:
            outputs[self.OUTPUT_MODELS] = models
        return outputs

    def _write_table(self, parameters, context, result):
        fields = bridge.make_fields(TABLE_FIELDS)
        sink, dest = self.parameterAsSink(parameters, self.OUTPUT_TABLE, context, fields, compat.WKB_NOGEOMETRY,
                                          QgsCoordinateReferenceSystem())
        if sink is None:
            raise QgsProcessingException(self.invalidSinkError(parameters, self.OUTPUT_TABLE))
        main = result.main
        rows = [[n, _number(e), _number(s), _number(lo), _number(hi)]
                for n, e, s, lo, hi in zip(main.names, main.estimate, main.se, main.lo, main.hi)]
        for name, d in (("psi", main.psi_mean), ("p", main.p_mean)):
            rows.append([name, _number(d.estimate), _number(d.se), _number(d.lo), _number(d.hi)])
        bridge.write_features(sink, fields, [None] * len(rows), rows)
        return dest

    def _write_models(self, parameters, context, result):
        fields = bridge.make_fields(MODEL_FIELDS)
        sink, dest = self.parameterAsSink(parameters, self.OUTPUT_MODELS, context, fields, compat.WKB_NOGEOMETRY,
                                          QgsCoordinateReferenceSystem())
        if sink is None:  # optional and not asked for
            return None
        rows = [[f.terms.label, f.n_par, _number(f.log_likelihood), _number(f.aic), _number(f.aicc), _number(d),
                 _number(w), _number(f.psi_mean.estimate), _number(f.p_mean.estimate), f.status]
                for f, d, w in zip(result.fits, result.delta_aic, result.aic_weights)]
        bridge.write_features(sink, fields, [None] * len(rows), rows)
        return dest
