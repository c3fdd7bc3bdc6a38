"""plotwise:buildframe: the sampling frame from the study area, exclusions, a raster mask and an edge buffer."""
from qgis.core import (
    QgsProcessingException,
    QgsProcessingParameterFeatureSink,
    QgsProcessingParameterFeatureSource,
    QgsProcessingParameterNumber,
    QgsProcessingParameterRasterLayer,
)
from shapely.geometry import MultiPolygon, Polygon

from .. import compat
from .. import bridge
from ..engine import frame as frame_engine
from ..gdal_io.masking import mask_polygons
from ..report import format_number
from ..report.buildframe import BuildFrameReportInputs, buildframe_report
from .base import PlotwiseAlgorithm


class BuildFrame(PlotwiseAlgorithm):
    """Study area minus excluded polygons, minus out-of-range raster cells, minus an inward edge buffer."""

    ALGORITHM_NAME = "buildframe"
    GROUP_ID = "design"

    INPUT = "INPUT"
    EXCLUDE = "EXCLUDE"
    MASK = "MASK"
    MASK_MIN = "MASK_MIN"
    MASK_MAX = "MASK_MAX"
    EDGE_BUFFER = "EDGE_BUFFER"
    OUTPUT = "OUTPUT"

    def displayName(self):  # noqa: N802 (host naming)
        return self.tr("Build sampling frame")

    def shortHelpString(self):  # noqa: N802 (host naming)
        return self.tr(
            "Builds the sampling frame: the part of the study area that the survey can speak for.\n\n"
            "Three rules are applied in this order, each one charged only with the area still in the "
            "frame when it is applied:\n"
            "1. Excluded polygons (water, private inholdings, ...) are removed.\n"
            "2. Cells of the mask raster (band 1) whose value lies outside [minimum, maximum], or is "
            "NoData, are removed. Either bound may be left empty. Cells of the study area that the "
            "raster does not cover count as NoData. A raster in another CRS is reprojected on the fly "
            "(nearest neighbour). Example: a slope raster in degrees with maximum 30.\n"
            "3. An inward strip of the given width (metres) along the study area's boundary is removed.\n\n"
            "The result is dissolved into one valid feature with fields frame_id and area_ha. The "
            "report gives the area kept, the area lost to each rule and a map.\n\n"
            "A study area in geographic coordinates is projected to the UTM zone of its centre; the "
            "output is in that CRS. Empty or zero-area features are skipped and invalid geometries "
            "repaired, each with a warning.\n\n"
            "Estimates from a survey on this frame apply to the frame only. Excluding steep terrain "
            "does not make the remaining terrain safe: check every unit's access and safety before "
            "fieldwork."
        )

    def initAlgorithm(self, config=None):  # noqa: N802 (host naming)
        self.addParameter(
            QgsProcessingParameterFeatureSource(
                self.INPUT, self.tr("Study area"), [compat.TYPE_VECTOR_POLYGON]
            )
        )
        self.addParameter(
            QgsProcessingParameterFeatureSource(
                self.EXCLUDE,
                self.tr("Areas to exclude (water, inholdings, ...)"),
                [compat.TYPE_VECTOR_POLYGON],
                optional=True,
            )
        )
        self.addParameter(
            QgsProcessingParameterRasterLayer(
                self.MASK, self.tr("Mask raster (cells outside the range are excluded)"), optional=True
            )
        )
        self.addParameter(
            QgsProcessingParameterNumber(
                self.MASK_MIN,
                self.tr("Lowest accepted mask value (empty: no lower limit)"),
                type=compat.NUMBER_DOUBLE,
                optional=True,
            )
        )
        self.addParameter(
            QgsProcessingParameterNumber(
                self.MASK_MAX,
                self.tr("Highest accepted mask value (empty: no upper limit)"),
                type=compat.NUMBER_DOUBLE,
                optional=True,
            )
        )
        self.addParameter(
            QgsProcessingParameterNumber(
                self.EDGE_BUFFER,
                self.tr("Inward edge buffer (m)"),
                type=compat.NUMBER_DOUBLE,
                defaultValue=0.0,
                minValue=0.0,
            )
        )
        self.addParameter(
            QgsProcessingParameterFeatureSink(
                self.OUTPUT, self.tr("Sampling frame"), compat.TYPE_VECTOR_POLYGON
            )
        )
        self.add_report_parameter()

    # -- parameters ----------------------------------------------------------------
    def _optional_number(self, parameters, name, context):
        value = parameters.get(name)
        if value is None or (isinstance(value, str) and not value.strip()):
            return None
        if hasattr(value, "isNull") and value.isNull():
            return None
        return self.parameterAsDouble(parameters, name, context)

    def _read_polygons(self, source, crs, context, feedback, label):
        records = bridge.read_features(
            source, crs, context, feedback, layer_name=label, repair=False, drop_empty=False
        )
        cleaned = frame_engine.clean_polygons(records.geometries, [int(i) for i in records.fids])
        warnings = []
        if cleaned.repaired_ids:
            warnings.append(
                self.tr("Layer '{layer}': invalid geometry repaired for feature id(s) {ids}.").format(
                    layer=label, ids=bridge.listed_ids(cleaned.repaired_ids)
                )
            )
        if cleaned.skipped_ids:
            warnings.append(
                self.tr("Layer '{layer}': empty or zero-area feature id(s) {ids} skipped.").format(
                    layer=label, ids=bridge.listed_ids(cleaned.skipped_ids)
                )
            )
        self.push_warnings(feedback, warnings)
        return cleaned, warnings

    # -- run -------------------------------------------------------------------------
    def processAlgorithm(self, parameters, context, feedback):  # noqa: N802 (host naming)
        source = self.parameterAsSource(parameters, self.INPUT, context)
        if source is None:
            raise QgsProcessingException(self.invalidSourceError(parameters, self.INPUT))
        study_name = source.sourceName() or self.INPUT
        exclude = self.parameterAsSource(parameters, self.EXCLUDE, context)
        mask_layer = self.parameterAsRasterLayer(parameters, self.MASK, context)
        mask_min, mask_max = self._mask_limits(parameters, context, mask_layer)
        edge_buffer = self.parameterAsDouble(parameters, self.EDGE_BUFFER, context)

        crs = bridge.computation_crs(source.sourceCrs(), source.sourceExtent(), context, feedback, study_name)
        projected_from = source.sourceCrs().authid() if crs != source.sourceCrs() else None
        feedback.setProgress(2)
        study, exclusions, exclude_name, warnings = self._read_study_and_exclusions(
            source, exclude, crs, context, feedback, study_name)
        feedback.setProgress(10)
        raster = None
        if mask_layer is not None:
            raster = self._read_mask(mask_layer, mask_min, mask_max, study.union, crs, feedback, warnings)

        with self.engine_errors():
            result = frame_engine.build_frame(
                study.geometries, exclusions, raster.polygons if raster is not None else None, edge_buffer,
                progress=self.progress_callback(feedback, 50, 90),
            )
        dest_id = self._write_frame(parameters, context, feedback, result, crs)
        feedback.setProgress(95)

        inputs = BuildFrameReportInputs(
            study=study_name, crs=bridge.crs_label(crs), study_union=study.union, exclude=exclude_name,
            mask=mask_layer.name() if mask_layer is not None else None, mask_min=mask_min, mask_max=mask_max,
            edge_buffer=edge_buffer, projected_from=projected_from, exclusions=tuple(exclusions or ()),
            mask_polygons=tuple(raster.polygons) if raster is not None else ())
        report = buildframe_report(self.new_report(""), result, raster, inputs, warnings)
        outputs = {self.OUTPUT: dest_id}
        self.style_output(context, dest_id, "frame")
        path = self.write_report(report, parameters, context, feedback)
        if path:
            outputs[self.REPORT] = path
        feedback.setProgress(100)
        return outputs

    def _mask_limits(self, parameters, context, mask_layer):
        """MASK_MIN and MASK_MAX (None when empty), checked against each other and against MASK."""
        mask_min = self._optional_number(parameters, self.MASK_MIN, context)
        mask_max = self._optional_number(parameters, self.MASK_MAX, context)
        if mask_layer is None and (mask_min is not None or mask_max is not None):
            raise QgsProcessingException(
                self.tr("MASK_MIN or MASK_MAX is set but no mask raster (MASK) is given. "
                        "Choose a raster or leave both limits empty.")
            )
        if mask_min is not None and mask_max is not None and mask_min > mask_max:
            raise QgsProcessingException(
                self.tr("The lowest accepted mask value (MASK_MIN = {lo}) is greater than the highest "
                        "(MASK_MAX = {hi}). Swap them or leave one empty.").format(lo=mask_min, hi=mask_max)
            )
        return mask_min, mask_max

    def _read_study_and_exclusions(self, source, exclude, crs, context, feedback, study_name):
        """The study area's cleaned polygons, the excluded polygons (or None), their layer's name, the warnings."""
        study, warnings = self._read_polygons(source, crs, context, feedback, study_name)
        if not study.geometries:
            raise QgsProcessingException(
                self.tr("Layer '{layer}' (INPUT) has no polygon with a positive area. "
                        "Choose the study-area polygon layer.").format(layer=study_name)
            )
        exclusions, exclude_name = None, None
        if exclude is not None:
            exclude_name = exclude.sourceName() or self.EXCLUDE
            cleaned, found = self._read_polygons(exclude, crs, context, feedback, exclude_name)
            warnings += found
            exclusions = cleaned.geometries
        if feedback.isCanceled():
            raise self.cancelled_error()
        return study, exclusions, exclude_name, warnings

    def _read_mask(self, mask_layer, mask_min, mask_max, study_union, crs, feedback, warnings):
        """The mask raster's out-of-range cells as polygons (:class:`gdal_io.masking.RasterMask`)."""
        if mask_min is None and mask_max is None:
            warnings.append(
                self.tr("Mask raster '{layer}' is given without limits: only its NoData cells are excluded.").format(
                    layer=mask_layer.name()
                )
            )
            feedback.pushWarning(warnings[-1])
        if mask_layer.providerType() != "gdal":
            raise QgsProcessingException(
                self.tr("Mask raster '{layer}' is not a file raster that GDAL can read. "
                        "Save it as a GeoTIFF first.").format(layer=mask_layer.name())
            )
        feedback.pushInfo(self.tr("Reading mask raster '{layer}'…").format(layer=mask_layer.name()))
        with self.engine_errors():
            raster = mask_polygons(
                mask_layer.source(),
                study_union.bounds,
                bridge.crs_wkt(crs),
                mask_min,
                mask_max,
                source_crs=bridge.crs_wkt(mask_layer.crs()) if mask_layer.crs().isValid() else None,
                progress=self.progress_callback(feedback, 10, 50),
            )
        if raster.warped:
            feedback.pushInfo(
                self.tr("Mask raster reprojected to {crs} on the fly: {rows} × {cols} cells of {size} m.").format(
                    crs=crs.authid(), rows=raster.shape[0], cols=raster.shape[1],
                    size=format_number(raster.cell_area_m2 ** 0.5),
                )
            )
        if raster.uncovered_cells:
            warnings.append(
                self.tr("Mask raster '{layer}' does not cover {n} of the {total} cells over the study "
                        "area's extent; those cells count as NoData and are excluded.").format(
                    layer=mask_layer.name(), n=raster.uncovered_cells, total=raster.total_cells
                )
            )
            feedback.pushWarning(warnings[-1])
        return raster

    def _write_frame(self, parameters, context, feedback, result, crs):
        """The frame as one multipolygon feature (frame_id, area_ha); returns the sink's id."""
        geometry = result.geometry
        if isinstance(geometry, Polygon):
            geometry = MultiPolygon([geometry])
        fields = bridge.make_fields([("frame_id", "int"), ("area_ha", "double", 20, 4)])
        sink, dest_id = self.parameterAsSink(
            parameters, self.OUTPUT, context, fields, compat.WKB_MULTIPOLYGON, crs
        )
        if sink is None:
            raise QgsProcessingException(self.invalidSinkError(parameters, self.OUTPUT))
        bridge.write_features(sink, fields, [geometry], [[1, result.area_ha]])
        feedback.pushInfo(
            self.tr("Frame: {kept} ha of {total} ha ({pct} %).").format(
                kept=format_number(result.area_ha), total=format_number(result.study_area_m2 / 1e4),
                pct=format_number(100 * result.kept_fraction),
            )
        )
        return dest_id
