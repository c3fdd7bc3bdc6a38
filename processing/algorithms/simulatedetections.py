"""plotwise:simulatedetections: detection histories at stations from a simulated population (training)."""
from qgis.core import (
    QgsFeature,
    QgsProcessingException,
    QgsProcessingParameterFeatureSink,
    QgsProcessingParameterFeatureSource,
    QgsProcessingParameterField,
    QgsProcessingParameterNumber,
)

from .. import compat
from .. import bridge
from ..engine import detections
from .base import PlotwiseAlgorithm

MAX_OCCASIONS = 99


def history_field_names(occasions):
    """``det_01``, ``det_02``, ... (at most 10 characters)."""
    return [f"det_{j:02d}" for j in range(1, int(occasions) + 1)]


class SimulateDetections(PlotwiseAlgorithm):
    ALGORITHM_NAME = "simulatedetections"
    GROUP_ID = "training"

    STATIONS = "STATIONS"
    ANIMALS = "ANIMALS"
    GROUP_FIELD = "GROUP_FIELD"
    OCCASIONS = "OCCASIONS"
    P_MAX = "P_MAX"
    SIGMA = "SIGMA"
    NOT_SURVEYED = "NOT_SURVEYED"
    OUTPUT = "OUTPUT"

    def displayName(self):  # noqa: N802
        return self.tr("Simulate detections at stations")

    def shortHelpString(self):  # noqa: N802
        return self.tr(
            "<p>Fills detection histories of camera-trap or recorder stations from a simulated population, for "
            "training, demonstrations and tests of the occupancy analysis. Real surveys type the detections in "
            "after fieldwork instead.</p><ul>"
            "<li><b>Stations</b>: points (for example from the stations step).</li>"
            "<li><b>Animal points</b> and their <b>group field</b> (default group_id, as the demo reserve writes it): "
            "a group sits at the mean position of its members; without a group field each animal is a group.</li>"
            "<li><b>Occasions</b>: the number of survey occasions (days, weeks).</li>"
            "<li><b>Detection at a group</b> and <b>σ (m)</b>: on each occasion a station detects the species with "
            "probability p = p_max·exp(−d²/(2σ²)), d the distance to the nearest group, independently between "
            "occasions.</li>"
            "<li><b>Share not surveyed</b>: the share of station-occasions left empty (NULL), as a camera that "
            "failed.</li><li><b>Random seed</b>: 0 draws a seed and records it.</li></ul>"
            "<p>The output is a copy of the stations with det_01, det_02, … (1 detected, 0 not, NULL not surveyed), "
            "dist_grp (m to the nearest group) and p_true (the per-occasion detection probability). The input is "
            "not changed.</p>"
        )

    def initAlgorithm(self, config=None):  # noqa: N802
        self.addParameter(QgsProcessingParameterFeatureSource(self.STATIONS, self.tr("Stations"),
                                                              [compat.TYPE_VECTOR_POINT]))
        self.addParameter(QgsProcessingParameterFeatureSource(self.ANIMALS, self.tr("Animal points"),
                                                              [compat.TYPE_VECTOR_POINT]))
        self.addParameter(QgsProcessingParameterField(
            self.GROUP_FIELD, self.tr("Group field of the animals (empty: each animal is a group)"), "group_id",
            self.ANIMALS, compat.FIELD_ANY, optional=True))
        self.addParameter(QgsProcessingParameterNumber(
            self.OCCASIONS, self.tr("Occasions"), type=compat.NUMBER_INTEGER, defaultValue=8, minValue=1,
            maxValue=MAX_OCCASIONS))
        self.addParameter(QgsProcessingParameterNumber(
            self.P_MAX, self.tr("Detection probability per occasion at a group"), type=compat.NUMBER_DOUBLE,
            defaultValue=0.5, minValue=0.001, maxValue=1.0))
        self.addParameter(QgsProcessingParameterNumber(
            self.SIGMA, self.tr("σ of the decline with distance (m)"), type=compat.NUMBER_DOUBLE, defaultValue=500.0,
            minValue=0.001))
        self.addParameter(QgsProcessingParameterNumber(
            self.NOT_SURVEYED, self.tr("Share of occasions not surveyed"), type=compat.NUMBER_DOUBLE,
            defaultValue=0.0, minValue=0.0, maxValue=0.95))
        self.add_seed_parameter()
        self.addParameter(QgsProcessingParameterFeatureSink(self.OUTPUT, self.tr("Stations with detection histories")))

    def processAlgorithm(self, parameters, context, feedback):  # noqa: N802
        stations = self.parameterAsSource(parameters, self.STATIONS, context)
        animals = self.parameterAsSource(parameters, self.ANIMALS, context)
        if stations is None or animals is None:
            raise QgsProcessingException(self.invalidSourceError(
                parameters, self.STATIONS if stations is None else self.ANIMALS))
        # the default group_id on a layer without it: each animal is a group
        group_field = self.field_name(parameters, self.GROUP_FIELD, context, animals)
        occasions = self.parameterAsInt(parameters, self.OCCASIONS, context)
        seeded = self.seeded_generator(parameters, context, feedback)
        crs = bridge.computation_crs(stations.sourceCrs(), stations.sourceExtent(), context, feedback,
                                     stations.sourceName())
        station_records = bridge.read_features(stations, crs, context, feedback, (), stations.sourceName())
        animal_records = bridge.read_features(animals, crs, context, feedback, (group_field,) if group_field else (),
                                              animals.sourceName())
        with self.engine_errors():
            groups = detections.group_positions(bridge.point_coordinates(animal_records),
                                                animal_records.attributes[group_field] if group_field else None)
            result = detections.simulate_detections(
                bridge.point_coordinates(station_records), groups, occasions,
                self.parameterAsDouble(parameters, self.P_MAX, context),
                self.parameterAsDouble(parameters, self.SIGMA, context), seeded.generator,
                self.parameterAsDouble(parameters, self.NOT_SURVEYED, context))
        feedback.setProgress(50)
        dest = self._write(parameters, context, feedback, stations, station_records, result, occasions)
        detected = (result.histories == 1).any(axis=1)
        feedback.pushInfo(self.tr("{n} stations, {k} occasions: the species was detected at {d} stations "
                                  "({g} animal groups).").format(n=len(result.p), k=occasions,
                                                                 d=int(detected.sum()), g=result.n_groups))
        self.style_output(context, dest, "stations")
        feedback.setProgress(100)
        return {self.OUTPUT: dest}

    def _write(self, parameters, context, feedback, stations, records, result, occasions):
        names = history_field_names(occasions) + ["dist_grp", "p_true"]
        fields = bridge.make_fields([])
        for field in stations.fields():
            if field.name() not in names:
                fields.append(field)
        kept = len(fields)
        for name in history_field_names(occasions):
            fields.append(compat.make_field(name, "int"))
        fields.append(compat.make_field("dist_grp", "double", 14, 2))
        fields.append(compat.make_field("p_true", "double", 12, 6))
        sink, dest = self.parameterAsSink(parameters, self.OUTPUT, context, fields, stations.wkbType(),
                                          stations.sourceCrs())
        if sink is None:
            raise QgsProcessingException(self.invalidSinkError(parameters, self.OUTPUT))
        by_fid = {int(fid): i for i, fid in enumerate(records.fids)}
        null = bridge.sink_value(None)
        for feature in stations.getFeatures():
            if feedback.isCanceled():
                raise self.cancelled_error()
            out = QgsFeature(fields)
            out.setGeometry(feature.geometry())
            values = [feature[f.name()] for f in list(fields)[:kept]]
            i = by_fid.get(feature.id())
            if i is None:  # a station without geometry: nothing simulated
                values += [null] * (len(fields) - kept)
            else:
                values += [null if v != v else int(v) for v in result.histories[i].tolist()]
                values += [float(result.distance[i]), float(result.p[i])]
            out.setAttributes(values)
            sink.addFeature(out, compat.FAST_INSERT)
        return dest
