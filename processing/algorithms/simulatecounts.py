"""plotwise:simulatecounts — fill the `count` field of sample units from a point population."""
from qgis.core import (
    QgsFeature,
    QgsProcessingException,
    QgsProcessingParameterBoolean,
    QgsProcessingParameterFeatureSink,
    QgsProcessingParameterFeatureSource,
    QgsProcessingParameterField,
    QgsProcessingParameterNumber,
)

from shapely.ops import unary_union

from ...plugin import compat
from .. import bridge
from ..engine import counting
from ..engine.errors import InputError
from ..engine.estimation import stratum_label
from .base import PlotwiseAlgorithm


class SimulateCounts(PlotwiseAlgorithm):
    ALGORITHM_NAME = "simulatecounts"
    GROUP_ID = "training"

    UNITS = "UNITS"
    ANIMALS = "ANIMALS"
    DETECTION = "DETECTION"
    COUNT_RESERVES = "COUNT_RESERVES"
    STRATA = "STRATA"
    STRATA_ID_FIELD = "STRATA_ID_FIELD"
    OUTPUT = "OUTPUT"

    def displayName(self):  # noqa: N802
        return self.tr("Simulate counts in sample units")

    def shortHelpString(self):  # noqa: N802
        return self.tr(
            "<p>Fills the <i>count</i> field of sample units with the number of simulated animals seen in "
            "each, for training, demonstrations and tests of the estimate. Real surveys type the counts "
            "in after fieldwork instead.</p><ul>"
            "<li><b>Sample units</b>: polygons count the animals inside them. Points count within a circle of "
            "the unit's <i>area_m2</i>, lines within a strip of that area along the line.</li>"
            "<li><b>Animal points</b>: one point per animal, for example the demo reserve's simulated animals.</li>"
            "<li><b>Detection probability</b>: each animal in a unit is seen with this probability "
            "(binomial thinning). 1 means every animal is seen.</li>"
            "<li><b>Count reserve units too</b>: off by default, so that units whose <i>role</i> is "
            "<i>reserve</i> keep an empty count (not surveyed), as in a survey where no primary unit "
            "needed replacing.</li>"
            "<li><b>Strata</b> (optional, with their id field): each unit counts only the animals inside its own "
            "stratum (matched by the units' <i>stratum</i> field; without an id field, inside the strata), the "
            "rule of plus sampling, the layout's default at the edges (Gregoire &amp; Valentine 2008, ch. 10). "
            "Give the strata the units were laid out on.</li>"
            "<li><b>Random seed</b>: 0 draws a seed and records it.</li></ul>"
            "<p>The output is a copy of the units with <i>count</i> filled (added when missing) and "
            "<i>present</i>, the animals actually in the unit. The input is not changed.</p>"
        )

    def initAlgorithm(self, config=None):  # noqa: N802
        self.addParameter(QgsProcessingParameterFeatureSource(self.UNITS, self.tr("Sample units"), [compat.TYPE_VECTOR_ANY]))
        self.addParameter(QgsProcessingParameterFeatureSource(self.ANIMALS, self.tr("Animal points"), [compat.TYPE_VECTOR_POINT]))
        self.addParameter(
            QgsProcessingParameterNumber(
                self.DETECTION, self.tr("Detection probability"), type=compat.NUMBER_DOUBLE,
                defaultValue=1.0, minValue=0.001, maxValue=1.0,
            )
        )
        self.addParameter(
            QgsProcessingParameterBoolean(self.COUNT_RESERVES, self.tr("Count reserve units too"), defaultValue=False)
        )
        self.add_seed_parameter()
        self.addParameter(QgsProcessingParameterFeatureSource(
            self.STRATA, self.tr("Strata: count only inside each unit's stratum (plus sampling)"),
            [compat.TYPE_VECTOR_POLYGON], optional=True))
        self.addParameter(QgsProcessingParameterField(
            self.STRATA_ID_FIELD, self.tr("Stratum id field of the strata"), "stratum", self.STRATA,
            compat.FIELD_ANY, optional=True))
        self.addParameter(QgsProcessingParameterFeatureSink(self.OUTPUT, self.tr("Units with simulated counts")))

    def processAlgorithm(self, parameters, context, feedback):  # noqa: N802
        units = self.parameterAsSource(parameters, self.UNITS, context)
        animals = self.parameterAsSource(parameters, self.ANIMALS, context)
        if units is None or animals is None:
            raise QgsProcessingException(self.invalidSourceError(parameters, self.UNITS if units is None else self.ANIMALS))
        detection = self.parameterAsDouble(parameters, self.DETECTION, context)
        count_reserves = self.parameterAsBoolean(parameters, self.COUNT_RESERVES, context)
        seeded = self.seeded_generator(parameters, context, feedback)
        crs = bridge.computation_crs(units.sourceCrs(), units.sourceExtent(), context, feedback, units.sourceName())
        wanted = tuple(name for name in ("area_m2", "role", "stratum") if units.fields().lookupField(name) >= 0)
        unit_records = bridge.read_features(units, crs, context, feedback, wanted, units.sourceName(), drop_empty=False)
        roles = unit_records.attributes.get("role", [None] * len(unit_records))
        animal_records = bridge.read_features(animals, crs, context, feedback, (), animals.sourceName())
        regions, problems = [], []
        for fid, geometry, area in zip(unit_records.fids, unit_records.geometries, unit_records.attributes.get("area_m2", [None] * len(unit_records))):
            try:
                if geometry is None:
                    raise InputError(self.tr("has no geometry"))
                regions.append(counting.counting_region(geometry, None if area is None else float(area)))
            except InputError as error:
                problems.append(f"{fid} ({self.translate_message(error.detail or error.message)})")
        if problems:
            raise QgsProcessingException(
                self.tr(
                    "Layer '{layer}': these features cannot be counted: {items}. Point and line units need a "
                    "positive 'area_m2' field (the layout step writes it); polygons need a geometry."
                ).format(layer=units.sourceName(), items="; ".join(problems[:20]))
            )
        strata, unit_stratum = self._strata(parameters, context, feedback, crs, unit_records)
        with self.engine_errors():
            result = counting.simulate_counts(
                regions, bridge.point_coordinates(animal_records), detection, seeded.generator,
                progress=self.progress_callback(feedback, 10, 80), strata=strata, unit_stratum=unit_stratum,
            )

        fields = units.fields()
        out_fields = bridge.make_fields([])
        for field in fields:
            out_fields.append(field)
        for name in ("count", "present"):
            if out_fields.lookupField(name) < 0:
                out_fields.append(compat.make_field(name, "int"))
        count_index, present_index = out_fields.lookupField("count"), out_fields.lookupField("present")
        sink, dest = self.parameterAsSink(parameters, self.OUTPUT, context, out_fields, units.wkbType(), units.sourceCrs())
        if sink is None:
            raise QgsProcessingException(self.invalidSinkError(parameters, self.OUTPUT))
        by_fid = {int(fid): i for i, fid in enumerate(unit_records.fids)}
        for feature in units.getFeatures():
            if feedback.isCanceled():
                raise self.cancelled_error()
            out = QgsFeature(out_fields)
            out.setGeometry(feature.geometry())
            attributes = list(feature.attributes()) + [None] * (len(out_fields) - len(fields))
            i = by_fid[feature.id()]
            surveyed = count_reserves or roles[i] != "reserve"
            attributes[count_index] = int(result.seen[i]) if surveyed else None
            attributes[present_index] = int(result.present[i])
            out.setAttributes(attributes)
            sink.addFeature(out, compat.FAST_INSERT)
        feedback.setProgress(100)
        surveyed = [count_reserves or role != "reserve" for role in roles]
        seen = sum(int(v) for v, s in zip(result.seen, surveyed) if s)
        feedback.pushInfo(
            self.tr("{n} units counted: {seen} animals seen of {present} present (detection {p:g}); {r} reserve units left empty.").format(
                n=sum(surveyed), seen=seen, present=int(result.present.sum()), p=detection, r=len(roles) - sum(surveyed)
            )
        )
        self.style_output(context, dest, "units")
        return {self.OUTPUT: dest}

    def _strata(self, parameters, context, feedback, crs, unit_records):
        """The strata polygons and each unit's index among them (None, None without a strata layer)."""
        source = self.parameterAsSource(parameters, self.STRATA, context)
        if source is None:
            return None, None
        read = getattr(self, "parameterAsStrings", None) or self.parameterAsFields
        id_field = (read(parameters, self.STRATA_ID_FIELD, context) or [None])[0]
        if id_field and source.fields().lookupField(id_field) < 0:
            id_field = None
        records = bridge.read_features(source, crs, context, feedback, (id_field,) if id_field else (),
                                       source.sourceName())
        unit_ids = unit_records.attributes.get("stratum")
        if not id_field or unit_ids is None:  # one stratum: the union of the polygons
            return [unary_union([g for g in records.geometries if g is not None])], [0] * len(unit_records)
        index = {}
        for label, geometry in zip(records.attributes[id_field], records.geometries):
            index.setdefault(stratum_label(label), []).append(geometry)
        labels = list(index)
        position = {label: k for k, label in enumerate(labels)}
        return ([unary_union(index[k]) for k in labels],
                [position.get(stratum_label(v), -1) for v in unit_ids])
