"""plotwise:layout run through the host's Processing framework.

Outside references: GDAL's GPX driver reading the waypoints back (ogr.Open), pyproj for
lon/lat and for the UTM projection of a geographic frame, shapely for "inside the stratum".
"""
import math

import numpy as np
import pyproj
import pytest
from recording_feedback import RecordingFeedback

pytest.importorskip("qgis.core")
from osgeo import ogr  # noqa: E402
from qgis.core import (  # noqa: E402
    QgsApplication,
    QgsFeature,
    QgsGeometry,
    QgsProcessingException,
    QgsProcessingFeedback,
    QgsVectorLayer,
)
from shapely import wkb as shapely_wkb  # noqa: E402
from shapely import wkt as shapely_wkt  # noqa: E402

STRATA = [  # stratum, n_alloc, polygon (EPSG:32736, invented)
    (1, 6, "POLYGON((500000 9000000, 503000 9000000, 503000 9002000, 500000 9002000, 500000 9000000))"),
    (2, 4, "POLYGON((503000 9000000, 505000 9000000, 505000 9001000, 503000 9001000, 503000 9000000))"),
    (3, 3, "POLYGON((503000 9001000, 505000 9001000, 504000 9002500, 503000 9001000))"),
]


@pytest.fixture
def registered(plotwise_provider):
    assert QgsApplication.processingRegistry().algorithmById("plotwise:layout") is not None


def strata_layer(rows=STRATA, crs="EPSG:32736", n_type="int"):
    from plotwise.processing import compat

    layer = QgsVectorLayer(f"Polygon?crs={crs}", "strata", "memory")
    layer.dataProvider().addAttributes([compat.make_field("stratum", "int"), compat.make_field("n_alloc", n_type)])
    layer.updateFields()
    features = []
    for stratum, n, wkt in rows:
        f = QgsFeature(layer.fields())
        f.setGeometry(QgsGeometry.fromWkt(wkt))
        f.setAttributes([stratum, n])
        features.append(f)
    layer.dataProvider().addFeatures(features)
    return layer


def base_parameters(layer, **extra):
    p = {
        "FRAME": layer, "STRATUM_FIELD": "stratum", "N_FIELD": "n_alloc", "N_UNITS": 0, "DESIGN": 2,
        "SHAPE": 2, "SIZE": 20.0, "BEARING": -1.0, "INSIDE": True, "MIN_SPACING": 50.0, "RESERVE": 2,
        "SEED": 123, "OUTPUT": "memory:",
    }
    p.update(extra)
    return p


def test_balanced_circles_fields_gpx_and_report(registered, tmp_path):
    import processing

    gpx = tmp_path / "units.gpx"
    report = tmp_path / "layout.html"
    result = processing.run("plotwise:layout", base_parameters(strata_layer(), OUTPUT_GPX=str(gpx), REPORT=str(report)))
    out = result["OUTPUT"]
    assert out.fields().names() == ["unit_id", "stratum", "role", "draw_ord", "area_m2", "incl_p", "weight", "lon",
                                    "lat", "count", "design", "edge", "reach_m"]
    feats = list(out.getFeatures())
    assert len(feats) == 6 + 4 + 3 + 3 * 2
    geoms = {s: shapely_wkt.loads(w) for s, _, w in STRATA}
    to_wgs = pyproj.Transformer.from_crs("EPSG:32736", "EPSG:4326", always_xy=True)
    for f in feats:
        unit = shapely_wkb.loads(bytes(f.geometry().asWkb()))
        assert geoms[f["stratum"]].buffer(1e-6).contains(unit)  # INSIDE, shapely as the oracle
        assert f["area_m2"] == pytest.approx(math.pi * 400, rel=1e-9)
        assert f["weight"] == pytest.approx(1 / f["incl_p"])
        lon, lat = to_wgs.transform(unit.centroid.x, unit.centroid.y)
        assert f["lon"] == pytest.approx(lon, abs=1e-6) and f["lat"] == pytest.approx(lat, abs=1e-6)  # pyproj
        assert f["count"] is None or f["count"] != f["count"] or str(f["count"]) == "NULL"
    roles = [(f["stratum"], f["role"], f["draw_ord"]) for f in feats if f["stratum"] == 2]
    assert [r[1] for r in roles] == ["primary"] * 4 + ["reserve"] * 2 and [r[2] for r in roles] == [1, 2, 3, 4, 5, 6]
    # GPX read back through GDAL (standard schema): one waypoint per unit, named by unit_id
    ds = ogr.Open(str(gpx))
    assert ds is not None
    wpts = ds.GetLayerByName("waypoints")
    names = sorted(w.GetField("name") for w in wpts)
    assert names == sorted(f["unit_id"] for f in feats)
    text = report.read_text(encoding="utf-8")
    for needle in ("<svg", "Field safety", "next unused reserve", "123", "EPSG:32736", "Robertson"):
        assert needle in text
    assert "<script" not in text and "http://" not in text.replace("http://www.w3.org/2000/svg", "")


def test_transects_get_start_and_end_waypoints(registered, tmp_path):
    import processing

    gpx = tmp_path / "lines.gpx"
    result = processing.run("plotwise:layout", base_parameters(
        strata_layer(), SHAPE=3, SIZE=150.0, DESIGN=0, RESERVE=0, MIN_SPACING=0.0, OUTPUT_GPX=str(gpx)))
    feats = list(result["OUTPUT"].getFeatures())
    ds = ogr.Open(str(gpx))  # keep the dataset alive while its layer is read
    wpts = list(ds.GetLayerByName("waypoints"))
    assert len(wpts) == 2 * len(feats)
    assert {w.GetField("name") for w in wpts} == {f["unit_id"] + e for f in feats for e in "AB"}
    geod = pyproj.Geod(ellps="WGS84")
    lon = np.array([w.GetGeometryRef().GetX() for w in wpts])
    lat = np.array([w.GetGeometryRef().GetY() for w in wpts])
    ds = None
    _, _, d = geod.inv(lon[0::2], lat[0::2], lon[1::2], lat[1::2])
    np.testing.assert_allclose(d, 150.0, rtol=2e-3)  # pyproj.Geod: one transect length, within the UTM scale
    assert all(f["area_m2"] is None or str(f["area_m2"]) == "NULL" for f in feats)


def test_systematic_grid_from_total_in_geographic_crs(registered):
    import processing

    to_geo = pyproj.Transformer.from_crs("EPSG:32736", "EPSG:4326", always_xy=True)
    rows = []
    from shapely.ops import transform

    for s, n, w in STRATA:
        rows.append((s, n, transform(to_geo.transform, shapely_wkt.loads(w)).wkt))
    feedback = QgsProcessingFeedback()
    result = processing.run("plotwise:layout", base_parameters(
        strata_layer(rows, crs="EPSG:4326"), N_FIELD=None, N_UNITS=20, DESIGN=1, SHAPE=1, SIZE=30.0,
        BEARING=0.0, MIN_SPACING=0.0, RESERVE=1), feedback=feedback)
    out = result["OUTPUT"]
    assert out.crs().authid() == "EPSG:32736"  # the UTM zone of the frame's centre
    counts = {}
    for f in out.getFeatures():
        counts[f["stratum"]] = counts.get(f["stratum"], 0) + (f["role"] == "primary")
    assert min(counts.values()) >= 1 and sum(counts.values()) == pytest.approx(20, abs=4)


@pytest.mark.parametrize("value, word", [(None, "NULL"), (-1, "negative"), (2.5, "whole number")])
def test_bad_n_field_names_the_feature(registered, value, word):
    import processing

    rows = [STRATA[0], (2, value, STRATA[1][2]), STRATA[2]]
    layer = strata_layer(rows, n_type="double")
    with pytest.raises(QgsProcessingException, match=word) as err:
        processing.run("plotwise:layout", base_parameters(layer))
    fid = [f.id() for f in layer.getFeatures()][1]
    assert str(fid) in str(err.value) and "n_alloc" in str(err.value)


def test_stratum_too_small_for_inside_units(registered):
    import processing

    rows = STRATA + [
        (4, 2, "POLYGON((506000 9000000, 506030 9000000, 506030 9001000, 506000 9001000, 506000 9000000))")]
    with pytest.raises(QgsProcessingException, match="tratum 4 is too small"):
        processing.run("plotwise:layout", base_parameters(strata_layer(rows)))


def test_spacing_infeasible_states_count(registered):
    import processing

    with pytest.raises(QgsProcessingException, match="at most about"):
        processing.run("plotwise:layout", base_parameters(strata_layer(), MIN_SPACING=900.0, DESIGN=0))


def test_invalid_repaired_and_empty_skipped_with_warnings(registered):
    import processing

    rows = STRATA + [
        (4, 2, "POLYGON((506000 9000000, 507000 9001000, 507000 9000000, 506000 9001000, 506000 9000000))"),
        (5, 2, "POLYGON((508000 9000000, 508100 9000000, 508200 9000000, 508000 9000000))"),
    ]

    fb = RecordingFeedback()
    result = processing.run("plotwise:layout", base_parameters(strata_layer(rows), INSIDE=False, MIN_SPACING=0.0),
                            feedback=fb)
    text = " ".join(fb.warnings)
    assert "repaired" in text and "skipped" in text
    assert {f["stratum"] for f in result["OUTPUT"].getFeatures()} == {1, 2, 3, 4}


@pytest.mark.parametrize("kind, shape, geom_type", [("point", (5, 2), "Point"), ("line", (5, 2, 2), "LineString"),
                                                    ("polygon", (5, 9, 2), "Polygon")])
def test_packed_wkb_reads_back_in_shapely_and_the_host(kind, shape, geom_type):
    from plotwise.processing import bridge

    xy = np.random.default_rng(4).uniform(0, 1e5, shape)
    if kind == "polygon":
        xy[:, -1] = xy[:, 0]  # closed rings
    for coords, wkb in zip(xy, bridge.wkb_geometries(xy, kind)):
        shape_ = shapely_wkb.loads(wkb)  # shapely's WKB reader as the oracle (OGC simple features)
        assert shape_.geom_type == geom_type
        ring = shape_.exterior if kind == "polygon" else shape_
        np.testing.assert_array_equal(np.asarray(ring.coords).reshape(coords.shape), coords)
        host = QgsGeometry()
        host.fromWkb(wkb)
        assert host.asWkb() == wkb


def test_write_rows_to_a_geopackage_reads_back_in_ogr(tmp_path):
    """Several chunks, geometries and empty ones mixed: every feature reads back as written (GDAL/OGR as the reader)."""
    from plotwise.processing import compat
    from plotwise.processing import bridge
    from qgis.core import QgsCoordinateReferenceSystem, QgsProject, QgsVectorFileWriter

    n = 2500
    xy = np.random.default_rng(9).uniform(0, 1000, (n, 2))
    wkb = [None if i % 7 == 3 else w for i, w in enumerate(bridge.wkb_geometries(xy, "point"))]
    rows = [[f"U-{i:05d}", i, None if i % 5 == 0 else 0.5 * i] for i in range(n)]
    fields = bridge.make_fields([("unit_id", "string", 24), ("k", "int"), ("value", "double", 20, 3)])
    path = str(tmp_path / "units.gpkg")
    options = QgsVectorFileWriter.SaveVectorOptions()
    options.driverName = "GPKG"
    writer = QgsVectorFileWriter.create(path, fields, compat.WKB_POINT, QgsCoordinateReferenceSystem("EPSG:32736"),
                                        QgsProject.instance().transformContext(), options)
    assert bridge.write_rows(writer, wkb, [[bridge.sink_value(v) for v in row] for row in rows], chunk=1000)
    del writer  # closes the file
    ds = ogr.Open(path)
    features = list(ds.GetLayer(0))
    assert len(features) == n
    for i, f in enumerate(features):
        assert f.GetField("unit_id") == rows[i][0] and f.GetField("k") == i
        assert (f.GetField("value") is None) == (rows[i][2] is None)
        g = f.GetGeometryRef()
        if wkb[i] is None:
            assert g is None or g.IsEmpty()
        else:
            assert (g.GetX(), g.GetY()) == tuple(xy[i])


def test_write_rows_to_a_memory_layer_reads_back(tmp_path):
    from plotwise.processing import bridge

    n = 2300
    xy = np.random.default_rng(10).uniform(0, 1000, (n, 2))
    wkb = [None if i % 11 == 5 else w for i, w in enumerate(bridge.wkb_geometries(xy, "point"))]
    rows = [[f"U-{i:05d}", i] for i in range(n)]
    layer = QgsVectorLayer("Point?crs=EPSG:32736", "u", "memory")
    layer.dataProvider().addAttributes(bridge.make_fields([("unit_id", "string", 24), ("k", "int")]).toList())
    layer.updateFields()
    assert bridge.write_rows(layer.dataProvider(), wkb, rows, chunk=1000)
    got = sorted(layer.getFeatures(), key=lambda f: f["k"])
    assert len(got) == n
    for i, f in enumerate(got):
        assert f.attributes() == rows[i]
        if wkb[i] is None:
            assert not f.hasGeometry()
        else:
            p = f.geometry().asPoint()
            assert (p.x(), p.y()) == tuple(xy[i])


def test_no_units_field_and_no_total_is_the_engine_error(registered):
    import processing

    with pytest.raises(QgsProcessingException, match="Give N_FIELD"):
        processing.run("plotwise:layout", base_parameters(strata_layer(), N_FIELD=None, N_UNITS=0))


def test_unknown_field_is_named(registered):
    import processing

    with pytest.raises(QgsProcessingException, match="no field named 'zone'"):
        processing.run("plotwise:layout", base_parameters(strata_layer(), STRATUM_FIELD="zone"))


def test_host_validity_check_decides_what_is_repaired(registered):
    """A feature the host's GEOS check passes is used as it is; a bow-tie it flags is repaired (shapely as oracle)."""
    import processing
    from plotwise.processing import bridge
    from qgis.core import QgsCoordinateReferenceSystem, QgsProcessingContext, QgsProcessingFeatureSource

    bow = "POLYGON((506000 9000000, 507000 9001000, 507000 9000000, 506000 9001000, 506000 9000000))"
    layer = strata_layer(STRATA + [(4, 2, bow)])
    context = QgsProcessingContext()
    source = QgsProcessingFeatureSource(layer, context)
    records = bridge.read_features(source, QgsCoordinateReferenceSystem("EPSG:32736"), context, QgsProcessingFeedback(),
                                   ["stratum"], "strata", repair=False, drop_empty=False, check_validity=True)
    assert records.valid == tuple(g.is_valid for g in records.geometries) == (True, True, True, False)  # shapely
    fb = RecordingFeedback()
    result = processing.run("plotwise:layout", base_parameters(layer, INSIDE=False, MIN_SPACING=0.0), feedback=fb)
    assert "repaired" in " ".join(fb.warnings)
    from shapely.validation import make_valid

    repaired = make_valid(shapely_wkt.loads(bow))  # shapely's repair as the oracle: both lobes of the bow-tie
    units4 = [shapely_wkb.loads(bytes(f.geometry().asWkb()))
              for f in result["OUTPUT"].getFeatures() if f["stratum"] == 4]
    # plus sampling (INSIDE off): centres lie in the repaired stratum grown by the circles' 20 m reach
    assert units4 and all(repaired.buffer(20.001).contains(u.centroid) for u in units4)


def test_write_columns_sets_constant_columns_once_and_reads_back():
    """Constant and varying columns, NULL among numbers, several chunks: each feature reads back as its row."""
    from plotwise.processing import bridge
    from qgis.core import NULL

    n = 2300
    xy = np.random.default_rng(11).uniform(0, 1000, (n, 2))
    wkb = [None if i % 13 == 4 else w for i, w in enumerate(bridge.wkb_geometries(xy, "point"))]
    columns = [
        [f"U-{i:05d}" for i in range(n)],  # varying
        [7] * n,  # constant
        [NULL if i % 3 == 0 else 0.25 * i for i in range(n)],  # NULL first, then numbers
        ["plus"] * n,  # constant
        [NULL] * n,  # constant NULL
    ]
    layer = QgsVectorLayer("Point?crs=EPSG:32736", "u", "memory")
    layer.dataProvider().addAttributes(bridge.make_fields(
        [("unit_id", "string", 24), ("k", "int"), ("value", "double", 20, 3), ("edge", "string", 8),
         ("count", "int")]).toList())
    layer.updateFields()
    assert bridge.write_columns(layer.dataProvider(), wkb, columns, chunk=1000)
    got = sorted(layer.getFeatures(), key=lambda f: f["unit_id"])
    assert len(got) == n
    for i, f in enumerate(got):
        assert f.attributes() == [c[i] for c in columns]
        assert f.hasGeometry() == (wkb[i] is not None)
        if wkb[i] is not None:
            p = f.geometry().asPoint()
            assert (p.x(), p.y()) == tuple(xy[i])
