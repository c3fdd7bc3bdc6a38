"""plotwise:allocate: how many sample units each stratum gets, and the precision they buy."""
from dataclasses import dataclass

import numpy as np
from qgis.core import (
    QgsFields,
    QgsProcessingException,
    QgsProcessingOutputNumber,
    QgsProcessingParameterBoolean,
    QgsProcessingParameterEnum,
    QgsProcessingParameterFeatureSink,
    QgsProcessingParameterFeatureSource,
    QgsProcessingParameterField,
    QgsProcessingParameterNumber,
    QgsWkbTypes,
)

from .. import compat
from .. import bridge
from ..engine import allocation
from ..engine import edge
from ..report import allocate as report_allocate
from .base import PlotwiseAlgorithm

HA_PER_M2 = 1e-4
SD_PROXY_FIELD = "cov_sd"  # written by plotwise:stratify
# LAYOUT_DESIGN: the layout that will place the units, as the design record it will write
LAYOUT_RECORDS = (edge.RANDOM, edge.RANDOM_APART, edge.GRID, edge.BALANCED)


@dataclass(frozen=True)
class _StrataFields:
    """The fields of the strata layer the run uses (None: not given)."""

    stratum: object
    area: object
    sd: object
    mean: object
    cost: object
    sd_proxy: bool = False  # the covariate SD of plotwise:stratify stands in for a pilot SD

class Allocate(PlotwiseAlgorithm):
    ALGORITHM_NAME = "allocate"
    GROUP_ID = "design"

    STRATA = "STRATA"
    STRATUM_FIELD = "STRATUM_FIELD"
    AREA_FIELD = "AREA_FIELD"
    SD_FIELD = "SD_FIELD"
    MEAN_FIELD = "MEAN_FIELD"
    COST_FIELD = "COST_FIELD"
    COST_IN_DAYS = "COST_IN_DAYS"
    FIXED_COST = "FIXED_COST"
    METHOD = "METHOD"
    TOTAL = "TOTAL"
    BUDGET = "BUDGET"
    TARGET_CV = "TARGET_CV"
    UNIT_AREA = "UNIT_AREA"
    MIN_PER_STRATUM = "MIN_PER_STRATUM"
    LAYOUT_DESIGN = "LAYOUT_DESIGN"
    OUTPUT = "OUTPUT"
    EXPECTED_CV = "EXPECTED_CV"

    def displayName(self):  # noqa: N802 (host naming)
        return self.tr("Allocate effort to strata")

    def shortHelpString(self):  # noqa: N802 (host naming)
        return self.tr(
            "Decides how many sample units each stratum gets, and shows beforehand the precision they buy.\n\n"
            "Methods: equal; proportional to stratum area; Neyman, n_h ∝ A_h·S_h (Neyman 1934; "
            "Cochran 1977, ch. 5); optimal with cost, n_h ∝ A_h·S_h/√c_h, under a budget "
            "C = c0 + Σ c_h·n_h (Cochran 1977, ch. 5).\n\n"
            "Target: a target CV (if above 0) finds the smallest total whose expected CV of the overall "
            "density meets it; else a budget (if above 0, needs the "
            "cost field); else the total number of units.\n\n"
            "Bounds: at least the minimum per stratum (2 by default, so that each stratum variance can be "
            "estimated) and at most the units that fit (stratum area / unit area). A stratum that reaches "
            "a bound keeps it and the rest is shared among the others, until stable. Whole units are "
            "rounded by largest remainder, keeping the total.\n\n"
            "Area field: the stratum area in hectares (default area_ha, as written by the stratification); "
            "when it is empty or missing, the polygon area is used.\n"
            "SD field: the pilot standard deviation of counts per unit. Without it the covariate SD "
            "(cov_sd) is used as a proxy, which assumes that counts scale with the covariate; without "
            "either, the allocation is proportional.\n"
            "Mean field: the pilot mean count per unit, needed for CVs and for a target CV. "
            "Cost field: cost of surveying one unit in each stratum (for instance field days).\n\n"
            "Layout to come: the finite-population correction 1 − n·a/A is used only when the units will not "
            "overlap (systematic grid, spatially balanced, or simple random with a minimum spacing of at least "
            "the unit's width); simple random centres without one may overlap, a continuous population with no "
            "such correction (Cordy 1993). plotwise:estimate applies the same rule.\n\n"
            "Output: the strata with n_alloc (units) and exp_cv (expected CV of the stratum density), "
            "and a report comparing equal, proportional and Neyman allocation at the same total."
        )

    def initAlgorithm(self, config=None):  # noqa: N802 (host naming)
        self._add_strata_parameters()
        self._add_target_parameters()
        self.addParameter(QgsProcessingParameterFeatureSink(self.OUTPUT, self.tr("Strata with allocation")))
        self.add_report_parameter()
        self.addOutput(QgsProcessingOutputNumber(self.EXPECTED_CV, self.tr("Expected CV of the overall density")))

    def _add_strata_parameters(self):
        """The strata layer and its fields: identifier, area, pilot SD and mean, cost."""
        self.addParameter(
            QgsProcessingParameterFeatureSource(self.STRATA, self.tr("Strata"), [compat.TYPE_VECTOR_POLYGON])
        )
        self.addParameter(
            QgsProcessingParameterField(
                self.STRATUM_FIELD, self.tr("Stratum identifier field"), "stratum", self.STRATA,
                compat.FIELD_ANY, optional=True,
            )
        )
        self.addParameter(
            QgsProcessingParameterField(
                self.AREA_FIELD, self.tr("Stratum area field (hectares; empty: polygon area)"), "area_ha",
                self.STRATA, compat.FIELD_NUMERIC, optional=True,
            )
        )
        for name, label in (
            (self.SD_FIELD, self.tr("Pilot SD of counts per unit")),
            (self.MEAN_FIELD, self.tr("Pilot mean count per unit")),
            (self.COST_FIELD, self.tr("Cost per unit")),
        ):
            self.addParameter(
                QgsProcessingParameterField(name, label, None, self.STRATA, compat.FIELD_NUMERIC, optional=True)
            )
        self.addParameter(
            QgsProcessingParameterBoolean(self.COST_IN_DAYS, self.tr("Costs are field days"), defaultValue=False)
        )
        self.addParameter(
            QgsProcessingParameterNumber(
                self.FIXED_COST, self.tr("Fixed cost of the survey (c0, in the cost unit)"),
                type=compat.NUMBER_DOUBLE, defaultValue=0.0, minValue=0.0,
            )
        )

    def _add_target_parameters(self):
        """The method, the target (total, budget or CV), the unit, the minimum and the layout to come."""
        self.addParameter(
            QgsProcessingParameterEnum(
                self.METHOD,
                self.tr("Allocation method"),
                [self.tr("Equal"), self.tr("Proportional to area"), self.tr("Neyman"), self.tr("Optimal with cost")],
                defaultValue=2,
            )
        )
        self.addParameter(
            QgsProcessingParameterNumber(
                self.TOTAL, self.tr("Total number of units"), type=compat.NUMBER_INTEGER, defaultValue=30, minValue=0
            )
        )
        self.addParameter(
            QgsProcessingParameterNumber(
                self.BUDGET, self.tr("Budget (0: not used; needs the cost field)"), type=compat.NUMBER_DOUBLE,
                defaultValue=0.0, minValue=0.0,
            )
        )
        self.addParameter(
            QgsProcessingParameterNumber(
                self.TARGET_CV, self.tr("Target CV of the overall density (0: not used; e.g. 0.2)"),
                type=compat.NUMBER_DOUBLE, defaultValue=0.0, minValue=0.0, maxValue=10.0,
            )
        )
        self.addParameter(
            QgsProcessingParameterNumber(
                self.UNIT_AREA, self.tr("Area of one sample unit (m²)"), type=compat.NUMBER_DOUBLE,
                defaultValue=10000.0, minValue=0.0001,
            )
        )
        self.addParameter(
            QgsProcessingParameterNumber(
                self.MIN_PER_STRATUM, self.tr("Minimum units per stratum"), type=compat.NUMBER_INTEGER,
                defaultValue=allocation.DEFAULT_MIN_PER_STRATUM, minValue=1,
            )
        )
        self.addParameter(
            QgsProcessingParameterEnum(
                self.LAYOUT_DESIGN, self.tr("Layout to come (decides the finite-population correction)"),
                [self.tr("Simple random (units may overlap: no correction)"),
                 self.tr("Simple random with a minimum spacing of at least the unit's width"),
                 self.tr("Systematic grid"), self.tr("Spatially balanced")], defaultValue=3, optional=True,
            )
        )

    # ------------------------------------------------------------------------------
    def processAlgorithm(self, parameters, context, feedback):  # noqa: N802 (host naming)
        source = self.parameterAsSource(parameters, self.STRATA, context)
        if source is None:
            raise QgsProcessingException(self.tr("The strata layer could not be opened."))
        layer = source.sourceName()
        fields = self._strata_fields(parameters, context, source, layer, feedback)
        crs = bridge.computation_crs(source.sourceCrs(), source.sourceExtent(), context, feedback, layer)
        records = bridge.read_features(source, crs, context, feedback, source.fields().names(), layer_name=layer)
        if len(records) == 0:
            raise QgsProcessingException(self.tr("Layer '{layer}' has no strata with an area.").format(layer=layer))
        fids = [int(f) for f in records.fids]
        if fields.stratum:  # one feature per stratum, each with an id: layout relies on both
            with self.engine_errors():
                allocation.check_stratum_ids(records.attributes[fields.stratum], fids, layer, fields.stratum)
        labels = records.attributes[fields.stratum] if fields.stratum else fids

        method = allocation.METHODS[self.parameterAsEnum(parameters, self.METHOD, context)]
        unit_area_m2 = self.parameterAsDouble(parameters, self.UNIT_AREA, context)
        settings = self._settings(parameters, context)
        layout_design = LAYOUT_RECORDS[self.parameterAsEnum(parameters, self.LAYOUT_DESIGN, context)]
        warnings = list(records.warnings) + self._proxy_warnings(fields)
        result = self._allocate(records, fields, layer, method, unit_area_m2, settings, layout_design)
        warnings.extend(self.translate_message(w) for w in result.warnings)
        self.push_warnings(feedback, warnings[len(records.warnings):])
        feedback.setProgress(60)
        dest_id = self._write_strata(parameters, context, feedback, source, records, result, fields, crs)

        overall_cv = result.precision.cv if fields.mean and np.isfinite(result.precision.cv) else None
        inputs = report_allocate.AllocateReportInputs(
            layer, crs.authid(), unit_area_m2, fields.sd, fields.sd_proxy, fields.mean, fields.cost,
            self.parameterAsBool(parameters, self.COST_IN_DAYS, context), settings, layout_design)
        report = report_allocate.allocate_report(self.new_report(""), result, labels, inputs, warnings)
        report_path = self.write_report(report, parameters, context, feedback)
        feedback.pushInfo(
            self.tr("{total} units allocated ({method}); expected CV of the overall density: {cv}.").format(
                total=result.total, method=self._method_names()[result.method_used],
                cv="–" if overall_cv is None else f"{overall_cv:.3f}")
        )
        feedback.setProgress(100)
        self.style_output(context, dest_id, "strata", field=fields.stratum)
        return {self.OUTPUT: dest_id, self.REPORT: report_path, self.EXPECTED_CV: overall_cv}

    def _strata_fields(self, parameters, context, source, layer, feedback):
        """The fields chosen (by the one policy for a field the layer lacks), with the covariate SD as proxy."""
        def field(name):
            return self.field_name(parameters, name, context, source, layer)

        stratum_field, area_field = field(self.STRATUM_FIELD), field(self.AREA_FIELD)
        sd_field, mean_field, cost_field = field(self.SD_FIELD), field(self.MEAN_FIELD), field(self.COST_FIELD)
        if area_field is None:
            feedback.pushInfo(self.tr("Layer '{layer}' has no area field: the polygon areas are used.").format(
                layer=layer))
        sd_proxy = False
        if sd_field is None and SD_PROXY_FIELD in source.fields().names():
            sd_field, sd_proxy = SD_PROXY_FIELD, True
        return _StrataFields(stratum_field, area_field, sd_field, mean_field, cost_field, sd_proxy)

    def _settings(self, parameters, context):
        """The target and bounds, as the engine's keywords."""
        return dict(
            total=self.parameterAsInt(parameters, self.TOTAL, context),
            budget=self.parameterAsDouble(parameters, self.BUDGET, context),
            target_cv=self.parameterAsDouble(parameters, self.TARGET_CV, context),
            fixed_cost=self.parameterAsDouble(parameters, self.FIXED_COST, context),
            min_per_stratum=self.parameterAsInt(parameters, self.MIN_PER_STRATUM, context),
        )

    def _proxy_warnings(self, fields):
        if not fields.sd_proxy:
            return []
        return [self.tr(
            "No pilot SD field: the covariate SD ('{field}') is used as a proxy. This assumes that counts "
            "scale with the covariate; replace it with the SD of a pilot survey when you have one. The "
            "expected SEs are then in covariate units, not counts."
        ).format(field=SD_PROXY_FIELD)]

    def _allocate(self, records, fields, layer, method, unit_area_m2, settings, layout_design):
        """The engine's allocation of the strata in ``records``, naming the fields in its messages."""
        if fields.area:
            areas_ha = records.attributes[fields.area]
        else:
            areas_ha = [g.area * HA_PER_M2 for g in records.geometries]

        def column(name):
            return None if name is None else records.attributes[name]

        def naming(name, fallback):
            return self.tr("field '{name}' of layer '{layer}'").format(name=name, layer=layer) if name else fallback

        with self.engine_errors():
            return allocation.allocate(
                areas_ha,
                unit_area_m2 * HA_PER_M2,
                method,
                sds=column(fields.sd),
                means=column(fields.mean),
                costs=column(fields.cost),
                ids=[int(f) for f in records.fids],
                names={
                    "area": naming(fields.area, self.tr("polygon area")),
                    "sd": naming(fields.sd, self.tr("pilot SD")),
                    "mean": naming(fields.mean, self.tr("pilot mean")),
                    "cost": naming(fields.cost, self.tr("cost")),
                },
                layout_design=layout_design,
                **settings,
            )

    def _write_strata(self, parameters, context, feedback, source, records, result, fields, crs):
        """The input fields, plus (or refreshed) n_alloc and exp_cv; returns the sink's id."""
        out_fields = QgsFields(source.fields())
        for name, kind in (("n_alloc", "int"), ("exp_cv", "double")):
            if out_fields.lookupField(name) < 0:
                out_fields.append(compat.make_field(name, kind))
        field_names, names_out = source.fields().names(), out_fields.names()
        exp_cv = result.precision.stratum_cv
        rows = []
        for i in range(len(records)):
            values = {name: records.attributes[name][i] for name in field_names}
            values["n_alloc"] = int(result.n[i])
            values["exp_cv"] = float(exp_cv[i]) if fields.mean else None
            rows.append([values.get(name) for name in names_out])
        sink, dest_id = self.parameterAsSink(parameters, self.OUTPUT, context, out_fields,
                                             QgsWkbTypes.multiType(source.wkbType()), crs)
        if sink is None:
            raise QgsProcessingException(self.tr("The output layer could not be created."))
        if not bridge.write_features(sink, out_fields, records.geometries, rows, feedback, (60.0, 90.0)):
            raise self.cancelled_error()
        return dest_id

    # ------------------------------------------------------------------------------
    def _method_names(self):
        """The allocation methods (engine keys) in the user's language."""
        return {
            "equal": self.tr("equal"), "proportional": self.tr("proportional to area"),
            "neyman": self.tr("Neyman"), "optimal_cost": self.tr("optimal with cost"),
        }
