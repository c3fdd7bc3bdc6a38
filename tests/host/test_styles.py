"""Styled outputs: the named styles, the palette's legibility, and the layer post-processor.

Outside sources:
* colour-vision deficiency: the dichromat simulation matrices of Machado, Oliveira &
  Fernandes (2009) "A physiologically-based model for simulation of color vision
  deficiency", IEEE TVCG 15(6), severity 1.0, applied to linear RGB (# from memory);
* colour difference: CIE 1976 L*a*b* and ΔE*ab (CIE 15:2004), from sRGB (IEC 61966-2-1)
  with the D65 white;
* the host's own post-processing path (``processing.runAndLoadResults``, the code the
  toolbox runs when an algorithm finishes).
"""
import gc
import itertools

import numpy as np
import pytest

from plotwise.processing import styles
from plotwise.processing.report.style import CATEGORY_COLOURS, INK

# -- colour science (outside formulas) -------------------------------------------------
# Machado et al. (2009), Table 1, severity 1.0 (# from memory)
MACHADO = {
    "protanopia": [[0.152286, 1.052583, -0.204868], [0.114503, 0.786281, 0.099216], [-0.003882, -0.048116, 1.051998]],
    "deuteranopia": [[0.367322, 0.860646, -0.227968], [0.280085, 0.672501, 0.047413], [-0.011820, 0.042940, 0.968881]],
    "tritanopia": [[1.255528, -0.076749, -0.178779], [-0.078411, 0.930809, 0.147602], [0.004733, 0.691367, 0.303900]],
    "normal": np.eye(3).tolist(),
}
# IEC 61966-2-1 sRGB -> XYZ (D65)
SRGB_TO_XYZ = np.array([[0.4124, 0.3576, 0.1805], [0.2126, 0.7152, 0.0722], [0.0193, 0.1192, 0.9505]])


def linear_rgb(hex_colours):
    c = np.array([[int(h.lstrip("#")[i:i + 2], 16) / 255 for i in (0, 2, 4)] for h in hex_colours])
    return np.where(c <= 0.04045, c / 12.92, ((c + 0.055) / 1.055) ** 2.4)  # IEC 61966-2-1


def cielab(linear):
    xyz = np.clip(linear, 0, 1) @ SRGB_TO_XYZ.T / SRGB_TO_XYZ.sum(axis=1)
    f = np.where(xyz > (6 / 29) ** 3, np.cbrt(xyz), xyz / (3 * (6 / 29) ** 2) + 4 / 29)  # CIE 15:2004
    return np.column_stack([116 * f[:, 1] - 16, 500 * (f[:, 0] - f[:, 1]), 200 * (f[:, 1] - f[:, 2])])


def min_delta_e(hex_colours, matrix):
    lab = cielab(linear_rgb(hex_colours) @ np.array(matrix).T)
    return min(np.linalg.norm(lab[i] - lab[j]) for i, j in itertools.combinations(range(len(lab)), 2))


@pytest.mark.parametrize("vision", sorted(MACHADO))
def test_strata_colours_stay_apart_for_colour_blind_readers(vision):
    # up to six strata (the usual range) stay distinguishable: ΔE*ab > 10 # common practice
    assert min_delta_e(CATEGORY_COLOURS[:6], MACHADO[vision]) > 10
    # primary and reserve units differ strongly even before their shapes differ
    assert min_delta_e([styles.PRIMARY_COLOUR, styles.RESERVE_COLOUR], MACHADO[vision]) > 40


@pytest.mark.parametrize("ramp", [styles.DENSITY_RAMP, styles.ELEVATION_RAMP, styles.GREENNESS_RAMP])
def test_sequential_ramps_darken_steadily_for_grey_scale_print(ramp):
    lightness = cielab(linear_rgb(ramp))[:, 0]  # CIE L*
    assert np.all(np.diff(lightness) < -5)  # strictly darker, visible step # common practice
    assert lightness[0] - lightness[-1] > 50


# -- layers ------------------------------------------------------------------------
def memory_layer(geometry, fields, rows, wkt):
    from qgis.core import QgsFeature, QgsGeometry, QgsVectorLayer

    spec = "&".join(f"field={name}:{kind}" for name, kind in fields)
    layer = QgsVectorLayer(f"{geometry}?crs=EPSG:32736&{spec}", "test layer", "memory")
    features = []
    for row, shape in zip(rows, wkt):
        feature = QgsFeature(layer.fields())
        feature.setAttributes(list(row))
        feature.setGeometry(QgsGeometry.fromWkt(shape))
        features.append(feature)
    assert layer.dataProvider().addFeatures(features)
    layer.updateExtents()
    return layer


def squares(n):
    return [f"POLYGON(({i * 10} 0, {i * 10 + 9} 0, {i * 10 + 9} 9, {i * 10} 9, {i * 10} 0))" for i in range(n)]


def test_strata_categorised_by_stratum_in_natural_order(qgis_app):
    from qgis.core import QgsCategorizedSymbolRenderer

    layer = memory_layer("Polygon", [("stratum", "string"), ("label", "string")],
                         [["10", "high"], ["2", "middle"], ["1", "low"]], squares(3))
    assert styles.apply_style(layer, "strata")
    renderer = layer.renderer()
    assert isinstance(renderer, QgsCategorizedSymbolRenderer)
    assert renderer.classAttribute() == "stratum"
    categories = renderer.categories()
    assert [c.value() for c in categories] == ["1", "2", "10"]  # stratum 2 before 10
    assert [c.label() for c in categories] == ["1 – low", "2 – middle", "10 – high"]
    assert [c.symbol().color().name() for c in categories] == list(CATEGORY_COLOURS[:3])


def test_strata_without_the_field_get_one_symbol(qgis_app):
    from qgis.core import QgsSingleSymbolRenderer

    layer = memory_layer("Polygon", [("zone", "integer")], [[1]], squares(1))
    styles.apply_style(layer, "strata")
    assert isinstance(layer.renderer(), QgsSingleSymbolRenderer)
    styles.apply_style(layer, "strata", field="zone")
    assert layer.renderer().classAttribute() == "zone"


@pytest.mark.parametrize("geometry, wkt", [
    ("Point", ["POINT(0 0)", "POINT(5 5)", "POINT(9 9)"]),
    ("Polygon", squares(3)),
    ("LineString", ["LINESTRING(0 0, 10 0)", "LINESTRING(0 5, 10 5)", "LINESTRING(0 9, 10 9)"]),
])
def test_units_by_role_and_labelled_with_unit_id(qgis_app, geometry, wkt):
    from qgis.core import QgsCategorizedSymbolRenderer

    layer = memory_layer(geometry, [("unit_id", "integer"), ("role", "string")],
                         [[1, "primary"], [2, "reserve"], [3, "primary"]], wkt)
    assert styles.apply_style(layer, "units")
    renderer = layer.renderer()
    assert isinstance(renderer, QgsCategorizedSymbolRenderer) and renderer.classAttribute() == "role"
    by_value = {c.value(): c for c in renderer.categories()}
    assert set(by_value) == {"primary", "reserve"}
    primary, reserve = by_value["primary"].symbol(), by_value["reserve"].symbol()
    # the two roles differ in more than colour: shape, fill or dash
    assert primary.symbolLayer(0).properties() != reserve.symbolLayer(0).properties()
    assert layer.labelsEnabled()
    assert layer.labeling().settings().fieldName == "unit_id"


def test_units_without_role_are_drawn_as_primary(qgis_app):
    from qgis.core import QgsSingleSymbolRenderer

    layer = memory_layer("Point", [("unit_id", "integer")], [[1]], ["POINT(1 1)"])
    styles.apply_style(layer, "units")
    assert isinstance(layer.renderer(), QgsSingleSymbolRenderer)
    assert layer.renderer().symbol().color().name() == styles.PRIMARY_COLOUR


def estimate_layer(densities):
    return memory_layer("MultiPolygon", [("stratum", "string"), ("dens", "double")],
                        [[str(i + 1), d] for i, d in enumerate(densities)], squares(len(densities)))


def test_estimate_graduated_by_density_with_the_area_unit_in_the_legend(qgis_app):
    from qgis.core import QgsGraduatedSymbolRenderer

    densities = [0.4, 2.5, 1.1, 7.0]
    layer = estimate_layer(densities)
    assert styles.apply_style(layer, "estimate", area_unit="ha")
    renderer = layer.renderer()
    assert isinstance(renderer, QgsGraduatedSymbolRenderer) and renderer.classAttribute() == "dens"
    ranges = renderer.ranges()
    assert len(ranges) == 4  # one class per stratum when there are few
    assert all("per ha" in r.label() for r in ranges)
    assert "per ha" in layer.title()
    # every stratum falls in a class, and darker means denser (CIE L* falls)
    for d in densities:
        assert renderer.symbolForValue(d) is not None
    lightness = cielab(linear_rgb([r.symbol().color().name() for r in ranges]))[:, 0]
    assert np.all(np.diff(lightness) < 0)


def test_estimate_keeps_strata_without_estimate_on_the_map(qgis_app):
    from qgis.core import QgsRenderContext, QgsRuleBasedRenderer

    layer = estimate_layer([0.4, None, 1.1])
    styles.apply_style(layer, "estimate")
    renderer = layer.renderer()
    assert isinstance(renderer, QgsRuleBasedRenderer)
    context = QgsRenderContext()
    renderer.startRender(context, layer.fields())
    try:
        drawn = [bool(renderer.symbolsForFeature(f, context)) for f in layer.getFeatures()]
    finally:
        renderer.stopRender(context)
    assert drawn == [True, True, True]
    assert any("no estimate" in r.label() for r in renderer.rootRule().children())


def test_a_table_without_geometry_is_left_alone(qgis_app):
    from qgis.core import QgsVectorLayer

    table = QgsVectorLayer("None?field=stratum:string&field=dens:double", "table", "memory")
    assert styles.apply_style(table, "estimate") is False
    with pytest.raises(KeyError):
        styles.apply_style(table, "no such style")


def test_raster_styles_use_our_ramps(demo_reserve_outputs):
    from qgis.core import QgsRasterLayer, QgsSingleBandPseudoColorRenderer

    layer = QgsRasterLayer(demo_reserve_outputs["OUTPUT_ELEVATION"], "elevation", "gdal")
    assert styles.apply_style(layer, "elevation")
    renderer = layer.renderer()
    assert isinstance(renderer, QgsSingleBandPseudoColorRenderer)
    items = renderer.shader().rasterShaderFunction().colorRampItemList()
    assert items[0].color.name() == styles.ELEVATION_RAMP[0]
    assert items[-1].color.name() == styles.ELEVATION_RAMP[-1]
    stats = layer.dataProvider().bandStatistics(1)
    assert items[0].value == pytest.approx(stats.minimumValue)
    assert items[-1].value == pytest.approx(stats.maximumValue)


# -- post-processor ----------------------------------------------------------------
def test_post_processor_survives_garbage_collection(qgis_app):
    from qgis.core import QgsProcessingContext, QgsProcessingFeedback, QgsProject

    context = QgsProcessingContext()
    context.addLayerToLoadOnCompletion("units-out", QgsProcessingContext.LayerDetails("Units", QgsProject.instance()))
    assert styles.style_on_completion(context, "not-loaded", "units") is None
    assert styles.style_on_completion(context, "units-out", "units") is not None
    gc.collect()
    layer = memory_layer("Point", [("unit_id", "integer"), ("role", "string")], [[1, "reserve"]], ["POINT(1 1)"])
    context.layerToLoadOnCompletionDetails("units-out").postProcessor().postProcessLayer(
        layer, context, QgsProcessingFeedback())
    assert layer.renderer().classAttribute() == "role"


def test_toolbox_run_loads_the_demo_reserve_styled(plotwise_provider, tmp_path):
    """The path the toolbox takes: outputs loaded into the project, then post-processed."""
    import processing
    from qgis.core import QgsProject

    project = QgsProject.instance()
    project.removeAllMapLayers()
    processing.runAndLoadResults("plotwise:demoreserve", {
        "SEED": 5, "CELL_SIZE": 250.0,
        "OUTPUT_AREA": "TEMPORARY_OUTPUT", "OUTPUT_EXCLUDED": "TEMPORARY_OUTPUT",
        "OUTPUT_ELEVATION": str(tmp_path / "e.tif"), "OUTPUT_GREENNESS": str(tmp_path / "g.tif"),
        "OUTPUT_INTENSITY": str(tmp_path / "i.tif"), "OUTPUT_ANIMALS": str(tmp_path / "a.gpkg"),
        "REPORT": str(tmp_path / "r.html"),
    })
    layers = {layer.name(): layer for layer in project.mapLayers().values()}
    try:
        boundary = layers["Reserve boundary"].renderer().symbol()
        assert boundary.symbolLayer(0).properties()["outline_color"].startswith("31,58,68")  # INK
        assert INK == "#1f3a44"
        hatching = layers["Excluded areas (lake, inholding)"].renderer().symbol().symbolLayer(0).properties()
        assert hatching["style"] == "b_diagonal"
        assert layers["Simulated animals"].renderer().symbol().color().name() == styles.ANIMAL_COLOUR
        ramp = layers["Expected animals per km²"].renderer().shader().rasterShaderFunction().colorRampItemList()
        assert ramp[-1].color.name() == styles.DENSITY_RAMP[-1]
        greenness = layers["Greenness (0–1)"].renderer().shader().rasterShaderFunction().colorRampItemList()
        assert greenness[-1].color.name() == styles.GREENNESS_RAMP[-1]
    finally:
        project.removeAllMapLayers()


def test_every_spatial_output_loads_styled(plotwise_provider, demo_reserve_outputs, tmp_path):
    """Each algorithm of the chain run the toolbox's way: every map layer it loads is ours."""
    import processing
    from qgis.core import QgsProject, QgsRasterLayer
    from test_report_rendering import run_chain  # the same small invented chain

    project = QgsProject.instance()
    project.removeAllMapLayers()
    try:
        run_chain(tmp_path, demo_reserve_outputs,
                  run=lambda alg, parameters: processing.runAndLoadResults(alg, parameters))
        spatial = [layer for layer in project.mapLayers().values()
                   if isinstance(layer, QgsRasterLayer) or layer.isSpatial()]
        applied = {layer.name(): layer.customProperty(styles.STYLE_PROPERTY) for layer in spatial}
        assert all(applied.values()), applied
        # frame (buildframe), strata and their raster (stratify), strata (allocate), units (layout,
        # simulatecounts), estimate (estimate); comparedesigns, trendpower and trend write tables only; stations
        # (stations, simulatedetections) and the sites with occupancy (occupancy); line transects (layout), with
        # sightings (simulatecounts: units and the observations as dots; the units layers share their names
        # with the first two, so this mapping by name holds them once), estimate (distancedensity); the units
        # with panels (panels)
        assert sorted(applied.values()) == ["animals", "estimate", "estimate", "frame", "occupancy", "panels",
                                            "stations", "stations", "strata", "strata",
                                            "strata_raster", "units", "units"]
    finally:
        project.removeAllMapLayers()


def test_outputs_of_a_model_load_styled(plotwise_provider, demo_reserve_outputs, tmp_path):
    """The example chain (processing/models) run the toolbox's way: its final outputs are styled too."""
    import processing
    from qgis.core import QgsProject

    layout = processing.run("plotwise:layout", {
        "FRAME": demo_reserve_outputs["OUTPUT_AREA"], "N_UNITS": 20, "DESIGN": 0, "SHAPE": 1, "SIZE": 400.0,
        "BEARING": 0.0, "SEED": 8, "OUTPUT": str(tmp_path / "units.gpkg"),
    })
    project = QgsProject.instance()
    project.removeAllMapLayers()
    try:
        processing.runAndLoadResults("plotwise:estimate_simulated_counts", {
            "units": layout["OUTPUT"], "animals": demo_reserve_outputs["OUTPUT_ANIMALS"],
            "strata": demo_reserve_outputs["OUTPUT_AREA"], "detection": 1.0, "seed": 9,
            "estimate:Estimate table": str(tmp_path / "table.gpkg"),
            "estimate:Estimate report": str(tmp_path / "estimate.html"),
            "counts:Units with counts": "TEMPORARY_OUTPUT", "estimate:Estimate by stratum": "TEMPORARY_OUTPUT",
        })
        applied = {layer.name(): layer.customProperty(styles.STYLE_PROPERTY) for layer in project.mapLayers().values()
                   if layer.isSpatial()}
        assert sorted(applied.values()) == ["estimate", "units"], applied
    finally:
        project.removeAllMapLayers()
