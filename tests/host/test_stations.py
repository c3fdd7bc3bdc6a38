"""plotwise:stations run through the host's Processing framework and through qgis_process.

Outside references: shapely for "inside the frame", GDAL's GPX driver reading the waypoints back,
pyproj for lon/lat, and the closed-form spacing rules (95% range of a circular bivariate normal:
chi-square with 2 degrees of freedom, scipy.stats.chi2).
"""
import math

import numpy as np
import pyproj
import pytest
from scipy import stats

pytest.importorskip("qgis.core")
from osgeo import ogr  # noqa: E402
from qgis.core import QgsFeature, QgsGeometry, QgsProcessingException, QgsVectorLayer  # noqa: E402
from shapely import wkb as shapely_wkb  # noqa: E402
from shapely import wkt as shapely_wkt  # noqa: E402

STRATA = [  # stratum, polygon (EPSG:32736, invented)
    (1, "POLYGON((500000 9000000, 512000 9000000, 512000 9008000, 500000 9008000, 500000 9000000))"),
    (2, "POLYGON((512000 9000000, 518000 9000000, 518000 9008000, 512000 9008000, 512000 9000000))"),
]
PINNED = ("FRAME", "STRATUM_FIELD", "N_STATIONS", "ARRAY", "HOME_RANGE", "SPACING", "CLUSTER_SIZE", "MIN_SPACING",
          "RESERVE", "SEED")


def frame_layer(rows=STRATA, name="strata"):
    from plotwise.processing import compat

    layer = QgsVectorLayer("Polygon?crs=EPSG:32736", name, "memory")
    layer.dataProvider().addAttributes([compat.make_field("stratum", "int")])
    layer.updateFields()
    features = []
    for stratum, wkt in rows:
        f = QgsFeature(layer.fields())
        f.setGeometry(QgsGeometry.fromWkt(wkt))
        f.setAttributes([stratum])
        features.append(f)
    layer.dataProvider().addFeatures(features)
    return layer


def parameters(**extra):
    p = {"FRAME": frame_layer(), "STRATUM_FIELD": "stratum", "N_STATIONS": 20, "ARRAY": 2, "HOME_RANGE": 2.0,
         "SPACING": 0.0, "CLUSTER_SIZE": 4, "MIN_SPACING": 0.0, "RESERVE": 2, "SEED": 7, "OUTPUT": "memory:"}
    p.update(extra)
    return p


def points(layer):
    return [(f, shapely_wkb.loads(bytes(f.geometry().asWkb()))) for f in layer.getFeatures()]


def test_balanced_stations_fields_spacing_gpx_and_report(run_alg, tmp_path):
    gpx, report = tmp_path / "stations.gpx", tmp_path / "stations.html"
    result = run_alg("plotwise:stations", parameters(OUTPUT_GPX=str(gpx), REPORT=str(report), SERVICE_HOURS=1.5))
    out = result["OUTPUT"]
    assert out.fields().names() == ["station", "stratum", "cluster", "role", "draw_ord", "lon", "lat"]
    feats = points(out)
    assert len(feats) == 20 + 2 * 2
    # the rule of independent occupancy sites: one home-range diameter 2 sqrt(HR / pi) apart (common practice)
    diameter = 2 * math.sqrt(2.0e6 / math.pi)
    assert result["SPACING_USED"] == pytest.approx(diameter, rel=1e-12)
    # 95% of a circular bivariate normal lies within r: chi-square(2) cdf of (r / sigma)^2 (scipy.stats.chi2)
    r95 = math.sqrt(2.0e6 / math.pi)
    assert stats.chi2(2).cdf((r95 / result["SIGMA"]) ** 2) == pytest.approx(0.95, abs=1e-12)
    xy = np.array([[g.x, g.y] for _, g in feats])
    gaps = np.hypot(*(xy[:, None, :] - xy[None, :, :]).transpose(2, 0, 1))[np.triu_indices(len(xy), 1)]
    assert gaps.min() >= diameter - 1e-6
    frame = {s: shapely_wkt.loads(w) for s, w in STRATA}
    to_wgs = pyproj.Transformer.from_crs("EPSG:32736", "EPSG:4326", always_xy=True)
    for f, g in feats:
        assert frame[f["stratum"]].contains(g)
        lon, lat = to_wgs.transform(g.x, g.y)
        assert (f["lon"], f["lat"]) == (pytest.approx(lon, abs=1e-7), pytest.approx(lat, abs=1e-7))
    for s in (1, 2):  # draw order 1.. per stratum, reserves after the primaries
        roles = [f["role"] for f, _ in sorted(((f, g) for f, g in feats if f["stratum"] == s),
                                             key=lambda item: item[0]["draw_ord"])]
        assert roles[-2:] == ["reserve", "reserve"] and set(roles[:-2]) == {"primary"}
    dataset = ogr.Open(str(gpx))
    waypoints = dataset.GetLayerByName("waypoints")
    assert waypoints.GetFeatureCount() == len(feats)
    names = {w.GetField("name") for w in waypoints}
    assert names == {f["station"] for f, _ in feats}
    html = report.read_text(encoding="utf-8")
    for text in ("Field safety", "σ = √(HR/π)", "home ranges", "team-day", "Sollmann"):
        assert text in html


def test_regular_grid_is_the_expected_lattice(run_alg):
    result = run_alg("plotwise:stations", parameters(ARRAY=0, N_STATIONS=0, SPACING=1000.0, RESERVE=0))
    xy = np.array([[g.x, g.y] for _, g in points(result["OUTPUT"])])
    # a north-aligned square lattice of 1000 m: every offset from the first point is a whole multiple of 1000 m
    offsets = (xy - xy[0]) / 1000.0
    assert np.allclose(offsets, np.round(offsets), atol=1e-9)
    # a square lattice of spacing s over an 18 km x 8 km rectangle holds exactly 18 x 8 points
    # whatever its start, when no point lies on the boundary (Cochran 1977, ch. 8)
    assert len(xy) == 18 * 8


def test_clusters_keep_their_pattern_and_stay_inside(run_alg):
    result = run_alg("plotwise:stations", parameters(ARRAY=1, N_STATIONS=16, HOME_RANGE=1.0, SPACING_RULE=1,
                                                     RESERVE=1))
    sigma = math.sqrt(1.0e6 / math.pi) / math.sqrt(-2 * math.log(0.05))
    assert result["SPACING_USED"] == pytest.approx(2 * sigma, rel=1e-12)  # Sun et al. (2014): 2 sigma for SCR
    feats = points(result["OUTPUT"])
    frame = {s: shapely_wkt.loads(w) for s, w in STRATA}
    clusters = {}
    for f, g in feats:
        assert frame[f["stratum"]].contains(g)
        clusters.setdefault(f["cluster"], []).append((g.x, g.y))
    for members in clusters.values():  # four stations: a square of side 2 sigma
        xy = np.array(members)
        d = np.sort(np.hypot(*(xy[:, None] - xy[None]).transpose(2, 0, 1))[np.triu_indices(4, 1)])
        assert np.allclose(d, [2 * sigma] * 4 + [2 * sigma * math.sqrt(2)] * 2)


def test_neither_home_range_nor_spacing_is_a_clear_error(run_alg):
    with pytest.raises(QgsProcessingException, match="HOME_RANGE"):
        run_alg("plotwise:stations", parameters(HOME_RANGE=0.0, SPACING=0.0))


def test_qgis_process_with_the_pinned_parameters_only(qgis_process, tmp_path):
    """A script naming only the pinned parameters runs, the way users call it."""
    from qgis.core import QgsVectorFileWriter

    frame = tmp_path / "frame.gpkg"
    layer = frame_layer()
    QgsVectorFileWriter.writeAsVectorFormat(layer, str(frame), "utf-8", layer.crs(), "GPKG")
    values = {"FRAME": str(frame), "STRATUM_FIELD": "stratum", "N_STATIONS": "12", "ARRAY": "2", "HOME_RANGE": "3",
              "SPACING": "0", "CLUSTER_SIZE": "4", "MIN_SPACING": "100", "RESERVE": "1", "SEED": "5"}
    assert set(values) == set(PINNED)
    out = tmp_path / "stations.gpkg"
    stdout = qgis_process("run", "plotwise:stations", "--", *(f"{k}={v}" for k, v in values.items()),
                          f"OUTPUT={out}", f"OUTPUT_GPX={tmp_path / 's.gpx'}", f"REPORT={tmp_path / 's.html'}")
    assert "SPACING_USED" in stdout
    dataset = ogr.Open(str(out))  # keep the dataset alive while its layer is read
    assert dataset.GetLayer(0).GetFeatureCount() == 12 + 2
