"""plotwise:buildframe run through the host's Processing framework.

Outside references:
* rectangle areas known analytically (the same construction as
  tests/engine/test_frame.py, here passed through the host: memory layers, a
  GeoTIFF mask on a 100 m grid and the feature sink);
* pyproj.Geod(ellps="WGS84").geometry_area_perimeter for a study area given
  in geographic coordinates (Karney 2013).
"""
import numpy as np
import pyproj
import pytest
from recording_feedback import RecordingFeedback as Recorder

pytest.importorskip("qgis.core")
from osgeo import gdal, osr  # noqa: E402
from qgis.core import (  # noqa: E402
    QgsFeature,
    QgsGeometry,
    QgsProcessingException,
    QgsVectorLayer,
)
from shapely import wkb as shapely_wkb  # noqa: E402
from shapely.ops import transform  # noqa: E402

EDGE = 100.0


@pytest.fixture
def registry(plotwise_provider):
    """The id of the algorithm under test (the provider is registered by tests/host/conftest.py)."""
    return "plotwise:buildframe"



def _layer(wkts, crs="EPSG:32633", name="polygons"):
    layer = QgsVectorLayer(f"Polygon?crs={crs}", name, "memory")
    features = []
    for wkt in wkts:
        feature = QgsFeature(layer.fields())
        if wkt:
            feature.setGeometry(QgsGeometry.fromWkt(wkt))
        features.append(feature)
    layer.dataProvider().addFeatures(features)
    return layer


def _box(x0, y0, x1, y1):
    return f"POLYGON(({x0} {y0},{x1} {y0},{x1} {y1},{x0} {y1},{x0} {y0}))"


def _mask_raster(path):
    """100 m cells over (-500, -500)-(10500, 6500); 45 in box(3500, 1500, 6000, 2500), else 10."""
    x0, y1, res = -500.0, 6500.0, 100.0
    cols, rows = 110, 70
    values = np.full((rows, cols), 10.0, np.float32)
    c0, c1 = int((3500 - x0) / res), int((6000 - x0) / res)
    r0, r1 = int((y1 - 2500) / res), int((y1 - 1500) / res)
    values[r0:r1, c0:c1] = 45.0
    ds = gdal.GetDriverByName("GTiff").Create(str(path), cols, rows, 1, gdal.GDT_Float32)
    ds.SetGeoTransform((x0, res, 0, y1, 0, -res))
    srs = osr.SpatialReference()
    srs.ImportFromEPSG(32633)
    ds.SetProjection(srs.ExportToWkt())
    ds.GetRasterBand(1).WriteArray(values)
    ds = None
    return str(path)


def _only_feature(layer):
    features = list(layer.getFeatures())
    assert len(features) == 1
    return features[0]


def test_rectangles_through_the_host(registry, tmp_path):
    import processing

    study = _layer([_box(0, 0, 10_000, 6_000)], name="reserve")
    exclude = _layer(
        [_box(1_000, 1_000, 3_000, 2_000), _box(2_000, 1_000, 4_000, 2_000),
         _box(9_000, 0, 11_000, 1_000), None,
         "POLYGON((0 0, 0 0, 0 0, 0 0))",  # zero area
         "POLYGON((5000 4000, 5200 4200, 5200 4000, 5000 4200, 5000 4000))"],  # bow-tie, 2 x 100² m²
        name="lake and inholding",
    )
    report = tmp_path / "frame.html"
    feedback = Recorder()
    result = processing.run(
        registry,
        {"INPUT": study, "EXCLUDE": exclude, "MASK": _mask_raster(tmp_path / "slope.tif"),
         "MASK_MAX": 30.0, "EDGE_BUFFER": EDGE, "OUTPUT": "memory:", "REPORT": str(report)},
        feedback=feedback,
    )
    # by construction (rectangle areas, see tests/engine/test_frame.py), plus the bow-tie
    lost_exclude = 3.0e6 + 1.0e6
    bowtie = 2 * (200 * 100 / 2)  # two triangles, base 200 m, height 100 m
    lost_mask = 2.5e6 - 500 * 500
    lost_edge = (6.0e7 - (10_000 - 2 * EDGE) * (6_000 - 2 * EDGE)) - (1.0e6 - 900 * 900)
    expected = 6.0e7 - lost_exclude - lost_mask - lost_edge
    frame = _only_feature(result["OUTPUT"])
    assert frame["frame_id"] == 1
    from plotwise.processing.engine import geometry_types

    if geometry_types._make_valid is not None:  # MakeValid keeps both lobes of the bow-tie
        assert frame["area_ha"] * 1e4 == pytest.approx(expected - bowtie, rel=1e-9)
    else:  # buffer(0) may keep one lobe only
        assert frame["area_ha"] * 1e4 == pytest.approx(expected - bowtie, abs=bowtie / 2 + 1.0)
    assert frame.geometry().area() == pytest.approx(frame["area_ha"] * 1e4, rel=1e-9)
    assert result["OUTPUT"].crs().authid() == "EPSG:32633"
    joined = " ".join(feedback.warnings)
    assert "repaired" in joined and "skipped" in joined

    html = report.read_text(encoding="utf-8")
    assert "<svg" in html and "<script" not in html
    assert "access and safety" in html  # the field-safety caution
    assert "EDGE_BUFFER" in html and "EPSG:32633" in html
    assert "lost to the raster mask" in html


def test_geographic_input_is_projected_and_area_is_geodesic(registry):
    import processing

    lon0, lat0 = 24.62, -18.31
    ring = [(lon0, lat0), (lon0 + 0.11, lat0 + 0.01), (lon0 + 0.13, lat0 + 0.09),
            (lon0 + 0.04, lat0 + 0.12), (lon0 - 0.02, lat0 + 0.06), (lon0, lat0)]
    wkt = "POLYGON((" + ",".join(f"{x} {y}" for x, y in ring) + "))"
    study = _layer([wkt], crs="EPSG:4326", name="reserve (lon/lat)")
    hole = _layer([_box(lon0 + 0.03, lat0 + 0.03, lon0 + 0.06, lat0 + 0.06)], crs="EPSG:4326")
    feedback = Recorder()
    result = processing.run(
        registry, {"INPUT": study, "EXCLUDE": hole, "EDGE_BUFFER": 50.0, "OUTPUT": "memory:"},
        feedback=feedback,
    )
    layer = result["OUTPUT"]
    assert layer.crs().authid() == "EPSG:32735"  # UTM zone 35 south spans 24°E to 30°E
    assert any("UTM" in line for line in feedback.infos)
    frame = _only_feature(layer)
    geom = shapely_wkb.loads(bytes(frame.geometry().asWkb()))
    back = pyproj.Transformer.from_crs(32735, 4326, always_xy=True).transform
    area_geod, _ = pyproj.Geod(ellps="WGS84").geometry_area_perimeter(transform(back, geom))
    assert frame["area_ha"] * 1e4 == pytest.approx(abs(area_geod), rel=0.005)  # issue 3: 0.5 %


def test_errors_name_the_rule_or_parameter(registry, tmp_path):
    import processing

    study = _layer([_box(0, 0, 1_000, 1_000)], name="reserve")
    everything = _layer([_box(-10, -10, 1_010, 1_010)], name="all water")
    with pytest.raises(QgsProcessingException, match="EXCLUDE"):
        processing.run(registry, {"INPUT": study, "EXCLUDE": everything, "OUTPUT": "memory:"})
    with pytest.raises(QgsProcessingException, match="EDGE_BUFFER"):
        processing.run(registry, {"INPUT": study, "EDGE_BUFFER": 600.0, "OUTPUT": "memory:"})
    with pytest.raises(QgsProcessingException, match="MASK_MIN"):
        processing.run(registry, {"INPUT": study, "MASK": _mask_raster(tmp_path / "m.tif"),
                                  "MASK_MIN": 40.0, "MASK_MAX": 20.0, "OUTPUT": "memory:"})
    with pytest.raises(QgsProcessingException, match="MASK"):
        processing.run(registry, {"INPUT": study, "MASK": _mask_raster(tmp_path / "m2.tif"),
                                  "MASK_MIN": 50.0, "OUTPUT": "memory:"})


def test_mask_in_another_crs_is_warped(registry, tmp_path):
    """Study area in UTM 33N, slope raster in WGS 84: the steep block is removed after warping."""
    import processing

    lon0, lat0, d = 15.25, 45.15, 0.001
    values = np.full((100, 120), 10.0, np.float32)
    values[30:70, 40:90] = 45.0  # a block of 40 x 50 cells of 0.001°
    path = str(tmp_path / "slope_ll.tif")
    ds = gdal.GetDriverByName("GTiff").Create(path, 120, 100, 1, gdal.GDT_Float32)
    ds.SetGeoTransform((lon0, d, 0, lat0, 0, -d))
    srs = osr.SpatialReference()
    srs.ImportFromEPSG(4326)
    ds.SetProjection(srs.ExportToWkt())
    ds.GetRasterBand(1).WriteArray(values)
    ds = None
    to_utm = pyproj.Transformer.from_crs(4326, 32633, always_xy=True)
    xs, ys = to_utm.transform([lon0 + 0.01, lon0 + 0.11], [lat0 - 0.09, lat0 - 0.01])
    x0, x1 = sorted(xs)
    y0, y1 = sorted(ys)
    study = _layer([_box(x0, y0, x1, y1)], name="reserve")
    feedback = Recorder()
    result = processing.run(
        registry, {"INPUT": study, "MASK": path, "MASK_MAX": 30.0, "OUTPUT": "memory:"},
        feedback=feedback,
    )
    assert any("reprojected" in line for line in feedback.infos)
    frame = _only_feature(result["OUTPUT"])
    block = "POLYGON(({0} {1},{2} {1},{2} {3},{0} {3},{0} {1}))".format(
        lon0 + 40 * d, lat0 - 70 * d, lon0 + 90 * d, lat0 - 30 * d)
    from shapely import wkt as shapely_wkt

    area_block = abs(pyproj.Geod(ellps="WGS84").geometry_area_perimeter(shapely_wkt.loads(block))[0])
    lost = (x1 - x0) * (y1 - y0) - frame["area_ha"] * 1e4
    # geodesic area of the block (Karney 2013); nearest-neighbour warping moves its rim
    # by less than a cell, and UTM's scale factor changes areas by < 0.1 % here
    assert lost == pytest.approx(area_block, rel=0.03)
