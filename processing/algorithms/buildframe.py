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
from ..report import MapLayer, format_number, map_svg
from ..report.style import ACCENT, CAUTION_EDGE, INK, MUTED
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
        mask_min = self._optional_number(parameters, self.MASK_MIN, context)
        mask_max = self._optional_number(parameters, self.MASK_MAX, context)
        edge_buffer = self.parameterAsDouble(parameters, self.EDGE_BUFFER, context)
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

        crs = bridge.computation_crs(source.sourceCrs(), source.sourceExtent(), context, feedback, study_name)
        projected_from = source.sourceCrs().authid() if crs != source.sourceCrs() else None
        warnings = []
        feedback.setProgress(2)

        study, found = self._read_polygons(source, crs, context, feedback, study_name)
        warnings += found
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
        feedback.setProgress(10)

        raster = None
        mask = None
        study_union = study.union
        if mask_layer is not None:
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
            mask = raster.polygons
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

        with self.engine_errors():
            result = frame_engine.build_frame(
                study.geometries, exclusions, mask, edge_buffer,
                progress=self.progress_callback(feedback, 50, 90),
            )

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
        feedback.setProgress(95)

        report = self._report(
            result, study_union, exclusions, mask, raster, crs, projected_from, warnings,
            {
                "study": study_name, "exclude": exclude_name,
                "mask": mask_layer.name() if mask_layer is not None else None,
                "mask_min": mask_min, "mask_max": mask_max, "edge": edge_buffer,
            },
        )
        outputs = {self.OUTPUT: dest_id}
        self.style_output(context, dest_id, "frame")
        path = self.write_report(report, parameters, context, feedback)
        if path:
            outputs[self.REPORT] = path
        feedback.setProgress(100)
        return outputs

    # -- report ----------------------------------------------------------------------
    def _report(self, result, study_union, exclusions, mask, raster, crs, projected_from, warnings, inputs):
        report = self.new_report(self.tr("Sampling frame"))
        report.field_safety()
        report.warnings(warnings)
        study_ha = result.study_area_m2 / 1e4
        report.key_figures([
            (self.tr("study area (ha)"), format_number(study_ha)),
            (self.tr("frame (ha)"), format_number(result.area_ha)),
            (self.tr("kept"), f"{format_number(100 * result.kept_fraction)} %"),
        ])
        report.note(
            self.tr("Estimates from a survey on this frame apply to the frame ({ha} ha) only, not to the "
               "whole study area.").format(ha=format_number(result.area_ha))
        )
        report.section(self.tr("Area kept and area lost to each rule"))
        rule_names = {
            "exclude": self.tr("lost to the excluded polygons (EXCLUDE)"),
            "mask": self.tr("lost to the raster mask (MASK outside the accepted range, or NoData)"),
            "edge_buffer": self.tr("lost to the inward edge buffer (EDGE_BUFFER)"),
        }
        rows = [[self.tr("study area"), study_ha, 100.0]]
        for loss in result.losses:
            rows.append([rule_names[loss.rule], loss.area_ha, 100 * loss.area_m2 / result.study_area_m2])
        rows.append([self.tr("sampling frame (kept)"), result.area_ha, 100 * result.kept_fraction])
        report.table([self.tr("Item"), self.tr("Area (ha)"), self.tr("% of study area")], rows)
        report.paragraph(
            self.tr("Rules are applied in the order shown; each is charged only with area that was still in "
               "the frame, so the frame and the areas lost add up to the study area.")
        )
        if raster is not None:
            report.subsection(self.tr("Mask raster"))
            report.table([self.tr("Item"), self.tr("Value")], [
                [self.tr("cells tested over the study area's extent"), raster.total_cells],
                [self.tr("cell size (m)"), raster.cell_area_m2 ** 0.5],
                [self.tr("cells below the lowest accepted value"), raster.below_cells],
                [self.tr("cells above the highest accepted value"), raster.above_cells],
                [self.tr("NoData cells (including cells outside the raster)"), raster.nodata_cells],
                [self.tr("reprojected on the fly (nearest neighbour)"), self.tr("yes") if raster.warped else self.tr("no")],
            ])

        report.section(self.tr("Map"))
        report.figure(self._map(result, study_union, exclusions, mask), self.tr("Frame (filled), with the areas lost to each rule"))

        def shown(value):
            return self.tr("(none)") if value is None else value

        crs_text = f"{crs.authid()} ({crs.description()})"
        if projected_from:
            crs_text += self.tr(", projected from {src} (UTM zone of the study area's centre)").format(src=projected_from)
        report.parameters({
            self.tr("Study area (INPUT)"): inputs["study"],
            self.tr("Areas to exclude (EXCLUDE)"): shown(inputs["exclude"]),
            self.tr("Mask raster (MASK)"): shown(inputs["mask"]),
            self.tr("Lowest accepted mask value (MASK_MIN)"): shown(inputs["mask_min"]),
            self.tr("Highest accepted mask value (MASK_MAX)"): shown(inputs["mask_max"]),
            self.tr("Inward edge buffer (EDGE_BUFFER, m)"): inputs["edge"],
            self.tr("CRS of the computation and the output"): crs_text,
        })
        return report

    @staticmethod
    def _for_screen(geometry, tolerance, max_ring_points=500):
        """``geometry`` simplified until no ring has more than ``max_ring_points`` vertices.

        Raster-cell outlines are staircases with many vertices; simplifying them (rather than
        dropping vertices) keeps the map faithful at report size.
        """
        for _ in range(8):
            simple = geometry.simplify(tolerance, preserve_topology=True)
            rings = [r for p in getattr(simple, "geoms", [simple]) if p.geom_type == "Polygon"
                     for r in (p.exterior, *p.interiors)]
            if not rings or max(len(r.coords) for r in rings) <= max_ring_points:
                return simple
            tolerance *= 2.0
        return simple

    def _map(self, result, study_union, exclusions, mask):
        minx, miny, maxx, maxy = study_union.bounds
        tolerance = max(maxx - minx, maxy - miny) / 1800.0  # about half a pixel at 900 px

        def for_display(geometries, already_shown=None):
            # the part of the study area that this rule removed, simplified for the screen
            if not geometries:
                return ()
            merged = frame_engine.dissolve(geometries).intersection(study_union)
            if already_shown is not None and not already_shown.is_empty:
                merged = merged.difference(already_shown)
            merged = self._for_screen(merged, tolerance)
            return (merged,) if not merged.is_empty else ()

        layers = [MapLayer((self._for_screen(result.geometry, tolerance),),
                           label=self.tr("sampling frame"), fill=ACCENT, stroke=ACCENT, opacity=0.55)]
        if exclusions:
            layers.append(MapLayer(for_display(exclusions), label=self.tr("excluded polygons"),
                                   fill=MUTED, stroke=MUTED, opacity=0.6))
        if mask:
            shown = frame_engine.dissolve(exclusions) if exclusions else None
            layers.append(MapLayer(for_display(mask, shown), label=self.tr("raster mask"),
                                   fill=CAUTION_EDGE, stroke="none", opacity=0.6, stroke_width=0))
        layers.append(MapLayer((study_union,), label=self.tr("study area boundary"), stroke=INK, stroke_width=1.5))
        return map_svg(layers)
