"""plotwise:stratify run through the host's Processing framework.

Outside references:
* numpy on the stratum raster written (cell counts x cell area);
* pyproj.Geod(ellps="WGS84").geometry_area_perimeter of the output polygons after
  transforming them to WGS 84 (Karney 2013), within 0.5 %;
* numpy.quantile on the frame's cells for the quantile boundaries.
"""
import numpy as np
import pytest
from recording_feedback import RecordingFeedback as Recorder

pytest.importorskip("qgis.core")
from osgeo import gdal  # noqa: E402
from pyproj import CRS, Geod, Transformer  # noqa: E402
from qgis.core import (  # noqa: E402
    QgsApplication,
    QgsFeature,
    QgsGeometry,
    QgsProcessingException,
    QgsProcessingProvider,
    QgsVectorLayer,
)
from shapely import wkb as shapely_wkb  # noqa: E402
from shapely.geometry.polygon import orient  # noqa: E402
from shapely.ops import transform  # noqa: E402

_KEEP = []


@pytest.fixture
def alg_id(plotwise_provider):
    """``plotwise:stratify`` when the provider lists it, else a provider holding only Stratify."""
    registry = QgsApplication.processingRegistry()
    if registry.algorithmById("plotwise:stratify") is not None:
        return "plotwise:stratify"
    from plotwise.processing.algorithms.stratify import Stratify

    class _StratifyOnly(QgsProcessingProvider):
        def id(self):
            return "plotwise_stratify_test"

        def name(self):
            return "Plotwise (stratify test)"

        def loadAlgorithms(self):  # noqa: N802
            self.addAlgorithm(Stratify())

    if registry.providerById("plotwise_stratify_test") is None:
        _KEEP.append(_StratifyOnly())
        registry.addProvider(_KEEP[-1])
    return "plotwise_stratify_test:stratify"



def _features(path):
    layer = QgsVectorLayer(path, "strata", "ogr")
    assert layer.isValid()
    return layer, list(layer.getFeatures())


def _geodesic_m2(geometry_wkb, epsg):
    to_wgs = Transformer.from_crs(CRS.from_epsg(epsg), CRS.from_epsg(4326), always_xy=True)
    g = transform(to_wgs.transform, shapely_wkb.loads(geometry_wkb))
    geod = Geod(ellps="WGS84")
    return sum(geod.geometry_area_perimeter(orient(p, 1.0))[0] for p in getattr(g, "geoms", [g]))


def test_kmeans_on_the_demo_reserve(alg_id, run_alg, demo_reserve_outputs, tmp_path):
    d = demo_reserve_outputs
    out = run_alg(alg_id, {
        "FRAME": d["OUTPUT_AREA"],
        "COVARIATES": [d["OUTPUT_GREENNESS"], d["OUTPUT_ELEVATION"]],
        "METHOD": 3, "STRATA": 4, "MIN_AREA": 0.0, "SEED": 5,
        "OUTPUT_RASTER": str(tmp_path / "strata.tif"),
        "OUTPUT": str(tmp_path / "strata.gpkg"),
        "REPORT": str(tmp_path / "strata.html"),
    })
    layer, feats = _features(out["OUTPUT"])
    names = [f.name() for f in layer.fields()]
    for name in ("stratum", "label", "area_ha", "cov_mean", "cov_sd", "cov2_mean", "cov2_sd"):
        assert name in names and len(name) <= 10
    assert sorted(f["stratum"] for f in feats) == [1, 2, 3, 4]
    assert out["N_STRATA"] == 4
    # strata ordered by the first covariate's mean
    means = [f["cov_mean"] for f in sorted(feats, key=lambda f: f["stratum"])]
    assert means == sorted(means)
    # areas: cell counts of the stratum raster x cell area (numpy)
    ds = gdal.Open(out["OUTPUT_RASTER"])
    ids = ds.GetRasterBand(1).ReadAsArray()
    gt = ds.GetGeoTransform()
    cell_ha = abs(gt[1] * gt[5]) / 1e4
    counts = np.bincount(ids.ravel(), minlength=5)[1:]
    epsg = int(CRS.from_wkt(ds.GetProjection()).to_epsg())
    for f in feats:
        assert f["area_ha"] == pytest.approx(counts[f["stratum"] - 1] * cell_ha)
        # geodesic area of the polygon (pyproj Geod) within 0.5 %
        assert _geodesic_m2(bytes(f.geometry().asWkb()), epsg) == pytest.approx(f["area_ha"] * 1e4, rel=0.005)
    html = open(out["REPORT"], encoding="utf-8").read()
    assert "<svg" in html and "R²" in html and "Seed (SEED)" in html and "Field safety" in html


def _synthetic(tmp_path, epsg=32633, nodata_band=False):
    rows, cols = 120, 150
    y, x = np.mgrid[0:rows, 0:cols]
    elev = (800 + 3.0 * x + 40 * np.sin(y / 9.0)).astype(np.float32)
    if nodata_band:
        elev[:, :20] = -9999
    path = str(tmp_path / "elev.tif")
    ds = gdal.GetDriverByName("GTiff").Create(path, cols, rows, 1, gdal.GDT_Float32)
    ds.SetGeoTransform((500000, 25, 0, 4000000, 0, -25))
    ds.SetProjection(CRS.from_epsg(epsg).to_wkt())
    ds.GetRasterBand(1).SetNoDataValue(-9999)
    ds.GetRasterBand(1).WriteArray(elev)
    ds = None
    return path, elev


def _frame_layer(wkt, epsg=32633):
    layer = QgsVectorLayer(f"Polygon?crs=EPSG:{epsg}", "frame", "memory")
    feat = QgsFeature()
    feat.setGeometry(QgsGeometry.fromWkt(wkt))
    layer.dataProvider().addFeatures([feat])
    return layer


def test_quantile_with_partial_coverage_warns(alg_id, run_alg, tmp_path):
    path, elev = _synthetic(tmp_path, nodata_band=True)
    # the whole raster plus a strip east of it
    frame = _frame_layer("POLYGON((500000 4000000, 504500 4000000, 504500 3997000, 500000 3997000, 500000 4000000))")
    fb = Recorder()
    out = run_alg(alg_id, {
        "FRAME": frame, "COVARIATES": [path], "METHOD": 0, "STRATA": 5, "MIN_AREA": 0.0,
        "OUTPUT_RASTER": str(tmp_path / "q.tif"), "OUTPUT": str(tmp_path / "q.gpkg"),
        "REPORT": str(tmp_path / "q.html"),
    }, feedback=fb)
    _, feats = _features(out["OUTPUT"])
    cells = elev[elev != -9999].astype(float)
    areas = sorted((f["stratum"], f["area_ha"]) for f in feats)
    counts = np.array([a for _, a in areas]) / (25 * 25 / 1e4)
    assert np.all(np.abs(counts - cells.size / 5) <= 2)  # equal-count strata (numpy.quantile boundaries)
    # covered share: raster cells with values / frame area
    share = cells.size * 625.0 / (4500 * 3000)
    assert any(f"{100 * share:.1f}%" in w for w in fb.warnings), fb.warnings


def test_bad_input_is_a_clear_error(alg_id, run_alg, tmp_path):
    path, _ = _synthetic(tmp_path)
    far = _frame_layer("POLYGON((700000 4000000, 701000 4000000, 701000 3999000, 700000 3999000, 700000 4000000))")
    base = {"COVARIATES": [path], "STRATA": 4, "OUTPUT_RASTER": str(tmp_path / "b.tif"),
            "OUTPUT": str(tmp_path / "b.gpkg")}
    with pytest.raises(QgsProcessingException, match="does not overlap"):
        run_alg(alg_id, {**base, "FRAME": far, "METHOD": 0})
    near = _frame_layer("POLYGON((500000 4000000, 503000 4000000, 503000 3998000, 500000 3998000, 500000 4000000))")
    with pytest.raises(QgsProcessingException, match="reclassify"):
        run_alg(alg_id, {**base, "FRAME": near, "METHOD": 4})


def test_geographic_frame_is_projected_and_errors_name_the_covariate(alg_id, run_alg, tmp_path):
    path, elev = _synthetic(tmp_path)
    # the raster's centre area as a lon/lat polygon (pyproj), frame in EPSG:4326
    to_ll = Transformer.from_crs(CRS.from_epsg(32633), CRS.from_epsg(4326), always_xy=True)
    ring = [to_ll.transform(x, y) for x, y in ((500500, 3999500), (503000, 3999500), (503000, 3997500),
                                                (500500, 3997500), (500500, 3999500))]
    frame = _frame_layer("POLYGON((" + ", ".join(f"{lon} {lat}" for lon, lat in ring) + "))", epsg=4326)
    out = run_alg(alg_id, {
        "FRAME": frame, "COVARIATES": [path], "METHOD": 1, "STRATA": 3, "MIN_AREA": 1.0,
        "OUTPUT_RASTER": str(tmp_path / "g.tif"), "OUTPUT": str(tmp_path / "g.gpkg"),
    })
    layer, feats = _features(out["OUTPUT"])
    assert layer.crs().authid() == "EPSG:32633"  # UTM zone of the frame's centre, the covariate's own CRS
    assert sum(f["area_ha"] for f in feats) == pytest.approx(2500 * 2000 / 1e4, rel=0.01)
    del layer, feats
    flat = str(tmp_path / "flat.tif")
    gdal.Translate(flat, path, scaleParams=[[0, 1e9, 7, 7]], outputType=gdal.GDT_Float32)
    with pytest.raises(QgsProcessingException, match="constant"):
        run_alg(alg_id, {"FRAME": frame, "COVARIATES": [flat], "METHOD": 0, "STRATA": 3,
                         "OUTPUT_RASTER": str(tmp_path / "f.tif"), "OUTPUT": str(tmp_path / "f.gpkg")})


def _mosaic(tmp_path):
    """4 x 4-cell squares (25 m cells: 1 ha) taking 3 values in diagonal bands, with a little jitter."""
    rows, cols = 120, 150
    y, x = np.mgrid[0:rows, 0:cols]
    values = ((((x // 4) + (y // 4)) % 3) + np.random.default_rng(4).random((rows, cols)) * 0.1).astype(np.float32)
    path = str(tmp_path / "mosaic.tif")
    ds = gdal.GetDriverByName("GTiff").Create(path, cols, rows, 1, gdal.GDT_Float32)
    ds.SetGeoTransform((500000, 25, 0, 4000000, 0, -25))
    ds.SetProjection(CRS.from_epsg(32633).to_wkt())
    ds.GetRasterBand(1).WriteArray(values)
    ds = None
    return path


def test_min_area_is_met_on_a_mosaic_of_small_patches(alg_id, run_alg, tmp_path):
    # truth by construction: every patch of the terciles is 1 ha or less (4 x 4 cells of 25 m) and borders only
    # patches as small, where GDAL's sieve merges nothing; MIN_AREA 1.5 ha. Oracle: shapely areas of the parts
    frame = _frame_layer("POLYGON((500100 3999900, 503600 3999900, 503600 3997100, 500100 3997100, 500100 3999900))")
    fb = Recorder()
    out = run_alg(alg_id, {
        "FRAME": frame, "COVARIATES": [_mosaic(tmp_path)], "METHOD": 0, "STRATA": 3, "MIN_AREA": 1.5,
        "OUTPUT_RASTER": str(tmp_path / "m.tif"), "OUTPUT": str(tmp_path / "m.gpkg"),
        "REPORT": str(tmp_path / "m.html"),
    }, feedback=fb)
    layer, feats = _features(out["OUTPUT"])
    assert len(feats) == 3
    parts = [p for f in feats for p in getattr(shapely_wkb.loads(bytes(f.geometry().asWkb())), "geoms", [])]
    assert parts and min(p.area for p in parts) >= 1.5e4  # shapely
    assert sum(p.area for p in parts) == pytest.approx(3500 * 2800)
    html = open(out["REPORT"], encoding="utf-8").read()
    assert "Every patch of the strata now covers at least 1.5 ha." in html
    assert "specks of fewer than 8 cells" in html and "smallest first" in html
    assert any("fell from" in w for w in fb.warnings)
    del layer, feats


def test_min_area_warns_about_an_island_it_cannot_merge(alg_id, run_alg, tmp_path):
    # truth by construction: a 0.5 ha island of the frame (8 cells of 25 m) touches no other stratum; it stays
    # below MIN_AREA 2 ha, with a warning naming its number and area and a sentence in the report
    path, _ = _synthetic(tmp_path)
    layer = QgsVectorLayer("Polygon?crs=EPSG:32633", "frame", "memory")
    features = []
    for wkt in ("POLYGON((500000 4000000, 502000 4000000, 502000 3998000, 500000 3998000, 500000 4000000))",
                "POLYGON((503000 3998000, 503100 3998000, 503100 3997950, 503000 3997950, 503000 3998000))"):
        feat = QgsFeature()
        feat.setGeometry(QgsGeometry.fromWkt(wkt))
        features.append(feat)
    layer.dataProvider().addFeatures(features)
    fb = Recorder()
    out = run_alg(alg_id, {
        "FRAME": layer, "COVARIATES": [path], "METHOD": 0, "STRATA": 3, "MIN_AREA": 2.0,
        "OUTPUT_RASTER": str(tmp_path / "i.tif"), "OUTPUT": str(tmp_path / "i.gpkg"),
        "REPORT": str(tmp_path / "i.html"),
    }, feedback=fb)
    assert any(w.startswith("1 patch(es) covering 0.50 ha stay below MIN_AREA (2 ha)")
               for w in fb.warnings), fb.warnings
    html = open(out["REPORT"], encoding="utf-8").read()
    assert "touch no other stratum" in html and "Every patch of the strata now covers" not in html


def _speckled(tmp_path, shape=(160, 200)):
    """White noise (numpy's generator) on 10 m cells in UTM 33N: its strata form patches of a few cells."""
    path = str(tmp_path / "speckled.tif")
    ds = gdal.GetDriverByName("GTiff").Create(path, shape[1], shape[0], 1, gdal.GDT_Float32)
    ds.SetGeoTransform((500000.0, 10.0, 0.0, 4000000.0, 0.0, -10.0))
    ds.SetProjection(CRS.from_epsg(32633).to_wkt())
    ds.GetRasterBand(1).WriteArray(np.random.default_rng(21).random(shape).astype(np.float32))
    ds = None
    return path


def test_pinned_parameters_only_merge_a_speckled_covariate_to_the_default_min_area(alg_id, run_alg, tmp_path):
    # only the pinned parameters (DESIGN.md): MIN_AREA takes its default of 1 ha = 100 cells of 10 m. Oracle:
    # scipy.ndimage.label (4-connected) of the stratum raster: every patch reaches 100 cells
    from scipy import ndimage

    frame = _frame_layer("POLYGON((500000 4000000, 502000 4000000, 502000 3998400, 500000 3998400, 500000 4000000))")
    out = run_alg(alg_id, {
        "FRAME": frame, "COVARIATES": [_speckled(tmp_path)], "METHOD": 0, "STRATA": 5,
        "OUTPUT_RASTER": str(tmp_path / "p.tif"), "OUTPUT": str(tmp_path / "p.gpkg"),
        "REPORT": str(tmp_path / "p.html"),
    })
    ds = gdal.Open(out["OUTPUT_RASTER"])
    ids = ds.GetRasterBand(1).ReadAsArray()
    ds = None
    assert ids.min() >= 1
    for h in np.unique(ids):
        lab, _ = ndimage.label(ids == h)
        assert np.bincount(lab.ravel())[1:].min() >= 100
    html = open(out["REPORT"], encoding="utf-8").read()
    assert "Every patch of the strata now covers at least 1 ha." in html


def test_speckled_covariate_without_min_area_is_a_clear_error(alg_id, run_alg, tmp_path, monkeypatch):
    from plotwise.processing.gdal_io import patches

    monkeypatch.setattr(patches, "MAX_POLYGON_PATCHES", 1000)
    frame = _frame_layer("POLYGON((500000 4000000, 502000 4000000, 502000 3998400, 500000 3998400, 500000 4000000))")
    with pytest.raises(QgsProcessingException, match=r"patches .*more than the 1,000 .*Set MIN_AREA to 0\.5 ha"):
        run_alg(alg_id, {
            "FRAME": frame, "COVARIATES": [_speckled(tmp_path)], "METHOD": 0, "STRATA": 5, "MIN_AREA": 0.0,
            "OUTPUT_RASTER": str(tmp_path / "e.tif"), "OUTPUT": str(tmp_path / "e.gpkg"),
        })
