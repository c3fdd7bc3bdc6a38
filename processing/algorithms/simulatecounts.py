"""plotwise:simulatecounts — fill the `count` field of sample units from a point population."""
from qgis.core import (
    QgsFeature,
    QgsProcessingException,
    QgsProcessingParameterBoolean,
    QgsProcessingParameterEnum,
    QgsProcessingParameterFeatureSink,
    QgsProcessingParameterFeatureSource,
    QgsProcessingParameterField,
    QgsProcessingParameterNumber,
)

from shapely.ops import unary_union

from .. import compat
from .. import bridge
from ..engine import counting, simulated_distances
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
    DETECTION_FUNCTION = "DETECTION_FUNCTION"
    SIGMA = "SIGMA"
    SHAPE_PARAM = "SHAPE_PARAM"
    MAX_DISTANCE = "MAX_DISTANCE"
    GROUP_SIZE_FIELD = "GROUP_SIZE_FIELD"
    OUTPUT = "OUTPUT"
    OUTPUT_OBSERVATIONS = "OUTPUT_OBSERVATIONS"

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
        ) + self.tr(
            "<p>Distances (for the distance density algorithm):</p><ul>"
            "<li><b>Detection function</b>: none (the detection probability above, the same at every distance), "
            "or half-normal g(x) = exp(−x²/2σ²) or hazard-rate g(x) = 1 − exp(−(x/σ)^−b) (Buckland et al. "
            "2001), for line transects and point stations. Each animal within the maximum distance of a unit "
            "is then seen with probability p·g(x), x its perpendicular distance to the line or its distance "
            "to the point, p the detection probability above (1: animals on the line are always seen, as "
            "distance sampling assumes).</li>"
            "<li><b>Scale σ (m)</b> and <b>hazard-rate shape b</b> of the detection function.</li>"
            "<li><b>Maximum distance (m)</b>: animals farther than this from the line or point are not "
            "counted; 0 takes the distance where g falls to 1 %.</li>"
            "<li><b>Group size field</b> of the animal points (optional): each point is then a group of that "
            "many animals; otherwise each point is one animal.</li>"
            "<li><b>Observations</b> (optional, with a detection function): one point per sighting at the "
            "animal's position, with <i>unit_id</i>, <i>distance</i> (m) and <i>size</i>, ready for the "
            "distance density algorithm.</li></ul>"
            "<p>With a detection function, <i>present</i> counts the animals within the maximum distance, and the "
            "strata are not used: a line or point sees the animals within the maximum distance on both sides of "
            "a stratum edge, as observers do.</p>"
            "<p>Reference: Buckland, S. T. et al. (2001) Introduction to Distance Sampling. Oxford University "
            "Press.</p>"
        )

    def initAlgorithm(self, config=None):  # noqa: N802
        self.addParameter(QgsProcessingParameterFeatureSource(self.UNITS, self.tr("Sample units"),
                                                              [compat.TYPE_VECTOR_ANY]))
        self.addParameter(QgsProcessingParameterFeatureSource(self.ANIMALS, self.tr("Animal points"),
                                                              [compat.TYPE_VECTOR_POINT]))
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
        self.addParameter(QgsProcessingParameterEnum(
            self.DETECTION_FUNCTION, self.tr("Detection function (line transects and point stations)"),
            [self.tr("None: the same detection probability at every distance"), self.tr("Half-normal"),
             self.tr("Hazard-rate")], defaultValue=0))
        self.addParameter(QgsProcessingParameterNumber(
            self.SIGMA, self.tr("Scale σ of the detection function (m)"), type=compat.NUMBER_DOUBLE,
            defaultValue=50.0, minValue=0.01))
        self.addParameter(QgsProcessingParameterNumber(
            self.SHAPE_PARAM, self.tr("Shape b of the hazard-rate"), type=compat.NUMBER_DOUBLE, defaultValue=3.0,
            minValue=0.1, maxValue=50.0))
        self.addParameter(QgsProcessingParameterNumber(
            self.MAX_DISTANCE, self.tr("Maximum distance from the line or point (m; 0: where g falls to 1 %)"),
            type=compat.NUMBER_DOUBLE, defaultValue=0.0, minValue=0.0))
        self.addParameter(QgsProcessingParameterField(
            self.GROUP_SIZE_FIELD, self.tr("Group size field of the animal points"), None, self.ANIMALS,
            compat.FIELD_NUMERIC, optional=True))
        self.addParameter(QgsProcessingParameterFeatureSink(
            self.OUTPUT_OBSERVATIONS, self.tr("Observations with distances"), compat.TYPE_VECTOR_POINT,
            optional=True, createByDefault=False))

    def processAlgorithm(self, parameters, context, feedback):  # noqa: N802
        units = self.parameterAsSource(parameters, self.UNITS, context)
        animals = self.parameterAsSource(parameters, self.ANIMALS, context)
        if units is None or animals is None:
            raise QgsProcessingException(self.invalidSourceError(parameters,
                                                                 self.UNITS if units is None else self.ANIMALS))
        detection = self.parameterAsDouble(parameters, self.DETECTION, context)
        count_reserves = self.parameterAsBoolean(parameters, self.COUNT_RESERVES, context)
        function = self.parameterAsEnum(parameters, self.DETECTION_FUNCTION, context)
        seeded = self.seeded_generator(parameters, context, feedback)
        crs = bridge.computation_crs(units.sourceCrs(), units.sourceExtent(), context, feedback, units.sourceName())
        wanted = tuple(name for name in ("area_m2", "role", "stratum", "unit_id")
                       if units.fields().lookupField(name) >= 0)
        unit_records = bridge.read_features(units, crs, context, feedback, wanted, units.sourceName(), drop_empty=False)
        roles = unit_records.attributes.get("role", [None] * len(unit_records))
        size_field = self.field_name(parameters, self.GROUP_SIZE_FIELD, context, animals) if function else None
        animal_records = bridge.read_features(animals, crs, context, feedback, (size_field,) if size_field else (),
                                              animals.sourceName())
        sightings = None
        if function:
            sightings = self._sightings(parameters, context, feedback, unit_records, animal_records, size_field,
                                        function, detection, seeded, animals.sourceName())
            result = counting.UnitCounts(present=sightings.present, seen=sightings.seen, detection=detection)
        else:
            result = self._counts(parameters, context, feedback, crs, unit_records, animal_records, detection, seeded,
                                  units.sourceName())

        fields = units.fields()
        out_fields = bridge.make_fields([])
        for field in fields:
            out_fields.append(field)
        for name in ("count", "present"):
            if out_fields.lookupField(name) < 0:
                out_fields.append(compat.make_field(name, "int"))
        count_index, present_index = out_fields.lookupField("count"), out_fields.lookupField("present")
        sink, dest = self.parameterAsSink(parameters, self.OUTPUT, context, out_fields, units.wkbType(),
                                          units.sourceCrs())
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
            attributes[count_index] = int(round(result.seen[i])) if surveyed else None
            attributes[present_index] = int(round(result.present[i]))
            out.setAttributes(attributes)
            sink.addFeature(out, compat.FAST_INSERT)
        feedback.setProgress(100)
        surveyed = [count_reserves or role != "reserve" for role in roles]
        seen = sum(int(v) for v, s in zip(result.seen, surveyed) if s)
        feedback.pushInfo(
            self.tr("{n} units counted: {seen} animals seen of {present} present (detection {p:g}); {r} reserve "
                    "units left empty.").format(
                n=sum(surveyed), seen=seen, present=int(result.present.sum()), p=detection, r=len(roles) - sum(surveyed)
            )
        )
        self.style_output(context, dest, "units")
        results = {self.OUTPUT: dest}
        if parameters.get(self.OUTPUT_OBSERVATIONS):
            results[self.OUTPUT_OBSERVATIONS] = self._write_observations(
                parameters, context, feedback, sightings, unit_records, animal_records, surveyed, crs)
        return results

    # ------------------------------------------------------------------------------
    def _counts(self, parameters, context, feedback, crs, unit_records, animal_records, detection, seeded, layer):
        """Counts by binomial thinning in each unit's counting region (no detection function)."""
        regions, problems = [], []
        for fid, geometry, area in zip(unit_records.fids, unit_records.geometries,
                                       unit_records.attributes.get("area_m2", [None] * len(unit_records))):
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
                ).format(layer=layer, items="; ".join(problems[:20]))
            )
        strata, unit_stratum = self._strata(parameters, context, feedback, crs, unit_records)
        with self.engine_errors():
            return counting.simulate_counts(
                regions, bridge.point_coordinates(animal_records), detection, seeded.generator,
                progress=self.progress_callback(feedback, 10, 80), strata=strata, unit_stratum=unit_stratum,
            )

    def _strata(self, parameters, context, feedback, crs, unit_records):
        """The strata polygons and each unit's index among them (None, None without a strata layer)."""
        source = self.parameterAsSource(parameters, self.STRATA, context)
        if source is None:
            return None, None
        id_field = self.field_name(parameters, self.STRATA_ID_FIELD, context, source)
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

    def _sightings(self, parameters, context, feedback, unit_records, animal_records, size_field, function,
                   detection, seeded, animals_name):
        """Sightings with distances under a half-normal or hazard-rate detection function."""
        sizes = None
        if size_field:
            raw = animal_records.attributes[size_field]
            bad = [str(f) for f, v in zip(animal_records.fids, raw)
                   if not isinstance(v, (int, float)) or isinstance(v, bool) or not v > 0]
            if bad:
                raise QgsProcessingException(self.tr(
                    "Layer '{layer}': the animal points {ids} have no group size above 0 in the field '{field}'. "
                    "Fill it in, or choose no group size field.").format(
                    layer=animals_name, ids=bridge.listed_ids(bad), field=size_field))
            sizes = [float(v) for v in raw]
        ids = self._unit_ids(unit_records)
        with self.engine_errors():
            sightings = simulated_distances.simulate_sightings(
                list(unit_records.geometries), bridge.point_coordinates(animal_records), function,
                self.parameterAsDouble(parameters, self.SIGMA, context),
                self.parameterAsDouble(parameters, self.SHAPE_PARAM, context), seeded.generator, sizes=sizes,
                max_distance=self.parameterAsDouble(parameters, self.MAX_DISTANCE, context), g0=detection,
                unit_ids=ids, progress=self.progress_callback(feedback, 10, 80))
        feedback.pushInfo(self.tr("Animals within {w:.1f} m of the lines or points are counted.").format(
            w=sightings.max_distance))
        return sightings

    @staticmethod
    def _unit_ids(unit_records):
        """The units' ``unit_id`` (the feature id where it is missing)."""
        values = unit_records.attributes.get("unit_id") or [None] * len(unit_records)
        return [int(fid) if v is None else v for v, fid in zip(values, unit_records.fids)]

    def _write_observations(self, parameters, context, feedback, sightings, unit_records, animal_records, surveyed,
                            crs):
        """One point per sighting of a surveyed unit: unit_id, distance (m), size."""
        ids = self._unit_ids(unit_records)
        kinds = [type(v) for v in ids if v is not None]
        id_kind = "int" if kinds and all(k is int for k in kinds) else "string"
        fields = bridge.make_fields([("unit_id", id_kind) if id_kind == "int" else ("unit_id", "string", 40),
                                     ("distance", "double"), ("size", "double")])
        sink, dest = self.parameterAsSink(parameters, self.OUTPUT_OBSERVATIONS, context, fields, compat.WKB_POINT,
                                          crs)
        if sink is None:
            raise QgsProcessingException(self.invalidSinkError(parameters, self.OUTPUT_OBSERVATIONS))
        if sightings is None:
            feedback.pushWarning(self.tr("No detection function was chosen, so there are no distances: the "
                                         "observations layer is empty."))
            return dest
        keep = [i for i, u in enumerate(sightings.unit) if surveyed[u]]
        xy = bridge.point_coordinates(animal_records)[sightings.animal[keep]]
        rows = [[ids[sightings.unit[i]] if id_kind == "int" else str(ids[sightings.unit[i]]),
                 float(sightings.distance[i]), float(sightings.size[i])] for i in keep]
        if not bridge.write_rows(sink, bridge.wkb_geometries(xy, "point"), rows, feedback, (90.0, 100.0)):
            raise self.cancelled_error()
        self.style_output(context, dest, "animals")
        return dest
