"""plotwise:comparedesigns run through the host's Processing framework on a small surface, frame and strata.

Outside reference: the surface is built so that its expected total is known
(∫ density dA by hand), and Cochran (1977), ch. 5 for the ranking of stratified
against simple random sampling on a steep gradient.
"""
import math

import numpy as np
import pytest
from recording_feedback import RecordingFeedback

qgis_core = pytest.importorskip("qgis.core")
from osgeo import gdal, osr  # noqa: E402
from qgis.core import (  # noqa: E402
    QgsApplication,
    QgsFeature,
    QgsGeometry,
    QgsProcessingException,
    QgsVectorLayer,
)

FIELDS = ["design", "code", "n_asked", "mean_n", "alloc", "true_mean", "est_mean", "rel_bias", "emp_se", "rmse",
          "rmse_mcse", "rel_rmse", "mean_cv", "coverage", "n_reps", "n_failed", "recommend"]


@pytest.fixture
def registered(plotwise_provider):
    assert QgsApplication.processingRegistry().algorithmById("plotwise:comparedesigns") is not None


def _surface(path, epsg=32633, origin=(500000.0, 6000000.0), cells=(40, 40), cell=100.0):
    """Density per km² rising steeply from west to east: 2·exp(x / 1 km)."""
    nx, ny = cells
    x = (np.arange(nx) + 0.5) * cell
    values = np.tile(2.0 * np.exp(x / 1000.0), (ny, 1)).astype(np.float32)
    ds = gdal.GetDriverByName("GTiff").Create(str(path), nx, ny, 1, gdal.GDT_Float32)
    ds.SetGeoTransform((origin[0], cell, 0, origin[1] + ny * cell, 0, -cell))
    srs = osr.SpatialReference()
    srs.ImportFromEPSG(epsg)
    ds.SetProjection(srs.ExportToWkt())
    ds.GetRasterBand(1).WriteArray(values)
    ds.GetRasterBand(1).SetNoDataValue(-9999)
    ds = None
    return str(path)


def _polygons(rows, fields=(), crs="EPSG:32633"):
    from plotwise.processing import compat

    layer = QgsVectorLayer(f"Polygon?crs={crs}", "polys", "memory")
    if fields:
        layer.dataProvider().addAttributes([compat.make_field(n, k) for n, k in fields])
        layer.updateFields()
    features = []
    for wkt, attrs in rows:
        f = QgsFeature(layer.fields())
        f.setGeometry(QgsGeometry.fromWkt(wkt))
        f.setAttributes(list(attrs))
        features.append(f)
    layer.dataProvider().addFeatures(features)
    return layer


def _box(x0, y0, x1, y1):
    return f"POLYGON(({x0} {y0}, {x1} {y0}, {x1} {y1}, {x0} {y1}, {x0} {y0}))"


X0, Y0 = 500000.0, 6000000.0
FRAME = _box(X0, Y0, X0 + 4000, Y0 + 4000)
STRATA = [(_box(X0, Y0, X0 + 2500, Y0 + 4000), ["low"]), (_box(X0 + 2500, Y0, X0 + 4000, Y0 + 4000), ["high"])]


def test_five_designs_table_and_report(registered, run_alg, tmp_path):
    surface = _surface(tmp_path / "density.tif")
    report = tmp_path / "compare.html"
    result = run_alg("plotwise:comparedesigns", {
        "SURFACE": surface,
        "FRAME": _polygons([(FRAME, [])]),
        "STRATA": _polygons(STRATA, [("stratum", "string")]),
        "STRATUM_FIELD": "stratum",
        "DESIGNS": [0, 1, 2, 3, 4],
        "N_UNITS": 20,
        "SHAPE": 1,
        "SIZE": 200.0,
        "REPLICATES": 200,
        "N_RANGE": "10, 30",
        "SEED": 42,
        "OUTPUT_TABLE": "memory:",
        "REPORT": str(report),
    })
    table = result["OUTPUT_TABLE"]
    if isinstance(table, str):
        from qgis.core import QgsProcessingContext, QgsProcessingUtils

        table = QgsProcessingUtils.mapLayerFromString(table, QgsProcessingContext())
    assert [f.name() for f in table.fields()] == FIELDS
    assert all(len(name) <= 10 for name in FIELDS)
    rows = {f["code"]: f for f in table.getFeatures()}
    assert sorted(rows) == [0, 1, 2, 3, 4]
    # expected total by hand: 4 km north-south × ∫_0^4 2 e^x dx = 4 · 2 (e^4 − 1) animals (cells as a midpoint sum)
    expected = sum(2.0 * math.exp((i + 0.5) / 10) for i in range(40)) * 40 * 0.01
    assert expected == pytest.approx(8 * (math.exp(4) - 1), rel=0.01)
    for f in rows.values():
        assert f["true_mean"] == pytest.approx(expected, rel=0.05)  # truth by construction
        assert f["n_reps"] + f["n_failed"] == 200
        assert 0 <= f["coverage"] <= 1
    assert sum(f["recommend"] for f in rows.values()) == 1
    assert rows[0]["mean_n"] == 20
    assert rows[2]["alloc"].count("/") == 1
    # Cochran (1977), eqs. 5.26 and 5.27: on this surface with 200 m squares (Poisson counts of mean
    # 0.04·e^x, x in km) the unit variances are S² = 2.30 overall and S_h = 0.647, 1.786 in the two strata
    # (worked by hand from the integrals of e^x and e^2x), so Neyman's RMSE is about 0.71 of simple
    # random's. Monte Carlo error with 200 replicates: SE of log RMSE about 1/√400 = 0.05 per design,
    # so the expected log ratio −0.34 lies about 4.8 SE below 0.
    assert rows[2]["rmse"] < rows[0]["rmse"]
    assert result["RECOMMENDED"] in [f["design"] for f in rows.values()]
    html = report.read_text(encoding="utf-8")
    assert "Field safety" in html and "check every unit" in html.lower()
    assert html.count("<svg") >= 2  # bar chart and the RMSE-against-n chart
    assert "RMSE against the number of units" in html
    assert "Seed" in html and "42" in html
    assert "http://" not in html.replace("http://www.w3.org/2000/svg", "")


def test_without_strata_the_stratified_designs_are_left_out(registered, run_alg, tmp_path):

    feedback = RecordingFeedback()
    warnings = feedback.warnings

    result = run_alg("plotwise:comparedesigns", {
        "SURFACE": _surface(tmp_path / "density.tif"),
        "FRAME": _polygons([(FRAME, [])]),
        "N_UNITS": 12, "SHAPE": 0, "SIZE": 60.0, "BEARING": -1, "REPLICATES": 20, "SEED": 3,
        "OVERDISPERSION": 1.5,
        "OUTPUT_TABLE": "memory:",
    }, feedback=feedback)
    table = result["OUTPUT_TABLE"]
    if isinstance(table, str):
        from qgis.core import QgsProcessingContext, QgsProcessingUtils

        table = QgsProcessingUtils.mapLayerFromString(table, QgsProcessingContext())
    assert sorted(f["code"] for f in table.getFeatures()) == [0, 3, 4]
    assert any("stratified designs are left out" in w for w in warnings)


def test_frame_in_geographic_coordinates_warps_the_surface(registered, run_alg, tmp_path):
    # the frame in WGS 84 is projected to its UTM zone (33N here) and the surface (in 32633) read as it is
    from qgis.core import QgsCoordinateReferenceSystem, QgsCoordinateTransform, QgsProject

    to_wgs = QgsCoordinateTransform(QgsCoordinateReferenceSystem("EPSG:32633"),
                                    QgsCoordinateReferenceSystem("EPSG:4326"), QgsProject.instance())
    geometry = QgsGeometry.fromWkt(_box(X0 + 500, Y0 + 500, X0 + 3500, Y0 + 3500))
    geometry.transform(to_wgs)
    result = run_alg("plotwise:comparedesigns", {
        "SURFACE": _surface(tmp_path / "density.tif"),
        "FRAME": _polygons([(geometry.asWkt(), [])], crs="EPSG:4326"),
        "DESIGNS": [0], "N_UNITS": 10, "SHAPE": 2, "SIZE": 60.0, "REPLICATES": 10, "SEED": 8,
        "OUTPUT_TABLE": "memory:",
    })
    assert result["RECOMMENDED"] == "simple random"


def test_surface_elsewhere_is_refused(registered, run_alg, tmp_path):
    surface = _surface(tmp_path / "far.tif", origin=(700000.0, 6500000.0))
    with pytest.raises(QgsProcessingException, match="does not overlap"):
        run_alg("plotwise:comparedesigns", {
            "SURFACE": surface, "FRAME": _polygons([(FRAME, [])]), "DESIGNS": [0], "REPLICATES": 10,
            "OUTPUT_TABLE": "memory:",
        })


def test_transect_without_strip_is_refused(registered, run_alg, tmp_path):
    with pytest.raises(QgsProcessingException, match="half-width"):
        run_alg("plotwise:comparedesigns", {
            "SURFACE": _surface(tmp_path / "density.tif"), "FRAME": _polygons([(FRAME, [])]), "DESIGNS": [3],
            "SHAPE": 3, "SIZE": 500.0, "HALF_WIDTH": 0.0, "REPLICATES": 10, "OUTPUT_TABLE": "memory:",
        })


def test_too_few_units_in_the_range_are_left_out_with_a_warning(registered, run_alg, tmp_path):

    feedback = RecordingFeedback()
    warnings = feedback.warnings

    report = tmp_path / "r.html"
    run_alg("plotwise:comparedesigns", {
        "SURFACE": _surface(tmp_path / "density.tif"), "FRAME": _polygons([(FRAME, [])]),
        "STRATA": _polygons(STRATA, [("stratum", "string")]), "DESIGNS": [2], "N_UNITS": 8, "N_RANGE": "3, 12",
        "SHAPE": 3, "SIZE": 400.0, "HALF_WIDTH": 20.0, "REPLICATES": 10, "SEED": 5,
        "OUTPUT_TABLE": "memory:", "REPORT": str(report),
    }, feedback=feedback)
    assert any("3 units were left out of the range" in w for w in warnings)
    assert "RMSE against the number of units" in report.read_text(encoding="utf-8")


def test_surface_in_another_crs_is_warped(registered, run_alg, tmp_path):
    # the surface in ETRS89-LAEA (EPSG:3035), the frame in UTM 33N: the density is warped onto the frame;
    # the expected total of a density (an intensive quantity) survives bilinear warping (truth by construction)
    source = _surface(tmp_path / "utm.tif")
    laea = str(tmp_path / "laea.tif")
    gdal.Warp(laea, source, dstSRS="EPSG:3035", xRes=80, yRes=80, resampleAlg="bilinear", dstNodata=-9999)

    feedback = RecordingFeedback()
    warnings = feedback.warnings

    inner = _box(X0 + 500, Y0 + 500, X0 + 3500, Y0 + 3500)
    result = run_alg("plotwise:comparedesigns", {
        "SURFACE": laea, "FRAME": _polygons([(inner, [])]), "DESIGNS": [0], "N_UNITS": 10, "SHAPE": 1,
        "SIZE": 100.0, "REPLICATES": 10, "SEED": 2, "OUTPUT_TABLE": "memory:",
    }, feedback=feedback)
    table = result["OUTPUT_TABLE"]
    if isinstance(table, str):
        from qgis.core import QgsProcessingContext, QgsProcessingUtils

        table = QgsProcessingUtils.mapLayerFromString(table, QgsProcessingContext())
    row = next(table.getFeatures())
    expected = 3.0 * 2.0 * (math.exp(3.5) - math.exp(0.5))  # 3 km × ∫_0.5^3.5 2 e^x dx
    assert row["true_mean"] == pytest.approx(expected, rel=0.06)
    assert any("warped" in w for w in warnings)


def test_unit_too_big_names_the_strata_feature_id(registered, run_alg, tmp_path):
    # truth by construction: a 5,000 m square kept inside fits in neither stratum; memory-layer feature ids
    # start at 1, so stratum 'high' (checked first, in sorted order) is feature 2
    with pytest.raises(QgsProcessingException) as err:
        run_alg("plotwise:comparedesigns", {
            "SURFACE": _surface(tmp_path / "density.tif"), "FRAME": _polygons([(FRAME, [])]),
            "STRATA": _polygons(STRATA, [("stratum", "string")]), "STRATUM_FIELD": "stratum", "DESIGNS": [0],
            "N_UNITS": 10, "SHAPE": 1, "SIZE": 5000.0, "INSIDE": True, "REPLICATES": 10, "SEED": 3,
            "OUTPUT_TABLE": "memory:",
        })
    text = str(err.value)
    assert "Stratum high is too small" in text and "(features 2)" in text
    del err


def test_unit_range_starting_above_its_stop_is_an_error(registered, run_alg, tmp_path):
    with pytest.raises(QgsProcessingException) as err:
        run_alg("plotwise:comparedesigns", {
            "SURFACE": _surface(tmp_path / "density.tif"), "FRAME": _polygons([(FRAME, [])]), "DESIGNS": [0],
            "N_UNITS": 20, "SHAPE": 1, "SIZE": 100.0, "REPLICATES": 10, "N_RANGE": "100:20:20", "SEED": 3,
            "OUTPUT_TABLE": "memory:",
        })
    assert "100:20:20" in str(err.value) and "20:100:20" in str(err.value)
    del err


def test_pilot_based_neyman_is_compared_beside_the_best_case(registered, run_alg, tmp_path):
    surface = _surface(tmp_path / "density.tif")
    report = tmp_path / "compare.html"
    result = run_alg("plotwise:comparedesigns", {
        "SURFACE": surface, "FRAME": _polygons([(FRAME, [])]), "STRATA": _polygons(STRATA, [("stratum", "string")]),
        "STRATUM_FIELD": "stratum", "DESIGNS": [2, 5], "N_UNITS": 20, "SHAPE": 1, "SIZE": 100.0, "REPLICATES": 20,
        "PILOT_UNITS": 4, "SEED": 3, "OUTPUT_TABLE": "memory:", "REPORT": str(report),
    })
    table = result["OUTPUT_TABLE"]
    if isinstance(table, str):
        from qgis.core import QgsProcessingContext, QgsProcessingUtils

        table = QgsProcessingUtils.mapLayerFromString(table, QgsProcessingContext())
    names = {f["code"]: f["design"] for f in table.getFeatures()}
    assert "best case" in names[2] and "pilot" in names[5]
    html = report.read_text(encoding="utf-8")
    assert "pilot of 4 simple random units per stratum" in html
