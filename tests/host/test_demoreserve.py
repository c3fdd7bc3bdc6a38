"""plotwise:demoreserve and plotwise:simulatecounts through the host's Processing framework."""
import numpy as np
import pytest
from osgeo import gdal

from plotwise.processing.engine import demo_reserve


def test_demo_reserve_outputs(demo_reserve_outputs):
    from qgis.core import QgsVectorLayer

    area = QgsVectorLayer(demo_reserve_outputs["OUTPUT_AREA"], "area", "ogr")
    assert area.isValid() and area.featureCount() == 1
    assert area.crs().authid() == "EPSG:32736"
    feature = next(area.getFeatures())
    # issue 2: a reserve of 200–400 km²
    assert 200e6 <= feature.geometry().area() <= 400e6
    assert abs(feature["area_ha"] - feature.geometry().area() / 1e4) < 1e-6 * feature["area_ha"]

    excluded = QgsVectorLayer(demo_reserve_outputs["OUTPUT_EXCLUDED"], "excluded", "ogr")
    assert sorted(f["kind"] for f in excluded.getFeatures()) == ["inholding", "lake"]

    animals = QgsVectorLayer(demo_reserve_outputs["OUTPUT_ANIMALS"], "animals", "ogr")
    assert animals.featureCount() == demo_reserve_outputs["TRUE_TOTAL"]
    assert 1000 <= animals.featureCount() <= 10000  # "a few thousand individuals"

    elevation = gdal.Open(demo_reserve_outputs["OUTPUT_ELEVATION"])
    assert elevation.GetGeoTransform()[1] == 100.0
    html = open(demo_reserve_outputs["REPORT"], encoding="utf-8").read()
    assert "Field safety" in html and "<script" not in html


def test_demo_reserve_is_deterministic(run_alg, tmp_path):
    # same seed, same reserve (DESIGN.md, Randomness)
    totals = []
    for i in range(2):
        result = run_alg("plotwise:demoreserve", {
            "SEED": 5, "CELL_SIZE": 200.0,
            "OUTPUT_AREA": "memory:", "OUTPUT_EXCLUDED": "memory:", "OUTPUT_ANIMALS": "memory:",
            "OUTPUT_ELEVATION": str(tmp_path / f"e{i}.tif"), "OUTPUT_GREENNESS": str(tmp_path / f"g{i}.tif"),
            "OUTPUT_INTENSITY": str(tmp_path / f"d{i}.tif"), "REPORT": str(tmp_path / f"r{i}.html"),
        })
        totals.append(result["TRUE_TOTAL"])
        band = gdal.Open(str(tmp_path / f"e{i}.tif")).ReadAsArray()
        if i == 0:
            first = band
    assert totals[0] == totals[1]
    np.testing.assert_array_equal(first, band)


def test_simulate_counts_on_polygons(run_alg, demo_reserve_outputs):
    """Counts in square plots equal a direct numpy count of the animal points (truth by construction)."""
    from qgis.core import NULL, QgsFeature, QgsGeometry, QgsRectangle, QgsVectorLayer

    animals = QgsVectorLayer(demo_reserve_outputs["OUTPUT_ANIMALS"], "animals", "ogr")
    xy = np.array([[f.geometry().asPoint().x(), f.geometry().asPoint().y()] for f in animals.getFeatures()])
    units = QgsVectorLayer("Polygon?crs=EPSG:32736&field=unit_id:string&field=count:integer", "units", "memory")
    centre = xy.mean(axis=0)
    boxes = [(centre[0] + dx, centre[1] + dy, 1500.0) for dx in (-3000, 0, 3000) for dy in (-3000, 0, 3000)]
    features = []
    for i, (x, y, side) in enumerate(boxes):
        feature = QgsFeature(units.fields())
        feature.setGeometry(QgsGeometry.fromRect(QgsRectangle(x, y, x + side, y + side)))
        feature.setAttributes([f"U{i}", None])
        features.append(feature)
    units.dataProvider().addFeatures(features)
    result = run_alg("plotwise:simulatecounts",
                     {"UNITS": units, "ANIMALS": animals, "DETECTION": 1.0, "SEED": 3, "OUTPUT": "memory:"})
    out = result["OUTPUT"]
    got = {f["unit_id"]: f["count"] for f in out.getFeatures()}
    for i, (x, y, side) in enumerate(boxes):
        expected = int(np.sum((xy[:, 0] > x) & (xy[:, 0] < x + side) & (xy[:, 1] > y) & (xy[:, 1] < y + side)))
        assert got[f"U{i}"] == expected
    assert all(f["count"] == NULL for f in units.getFeatures())  # the input is not modified


def test_simulate_counts_point_units_need_area(run_alg, demo_reserve_outputs):
    from qgis.core import QgsFeature, QgsGeometry, QgsPointXY, QgsProcessingException, QgsVectorLayer

    units = QgsVectorLayer("Point?crs=EPSG:32736&field=unit_id:string", "stations", "memory")
    feature = QgsFeature(units.fields())
    feature.setGeometry(QgsGeometry.fromPointXY(QgsPointXY(*demo_reserve.ORIGIN)))
    feature.setAttributes(["S1"])
    units.dataProvider().addFeatures([feature])
    with pytest.raises(QgsProcessingException, match="area_m2"):
        run_alg("plotwise:simulatecounts",
                {"UNITS": units, "ANIMALS": demo_reserve_outputs["OUTPUT_ANIMALS"], "OUTPUT": "memory:"})


def test_reserve_units_stay_unsurveyed_unless_asked(run_alg, demo_reserve_outputs):
    """Reserve units keep an empty count (not surveyed) unless COUNT_RESERVES is set."""
    from qgis.core import NULL

    layout = run_alg("plotwise:layout", {
        "FRAME": demo_reserve_outputs["OUTPUT_AREA"], "N_UNITS": 6, "DESIGN": 2, "SHAPE": 1, "SIZE": 300.0,
        "BEARING": 0.0, "RESERVE": 3, "SEED": 4, "OUTPUT": "memory:", "OUTPUT_GPX": "TEMPORARY_OUTPUT",
        "REPORT": "TEMPORARY_OUTPUT",
    })
    for count_reserves in (False, True):
        out = run_alg("plotwise:simulatecounts", {
            "UNITS": layout["OUTPUT"], "ANIMALS": demo_reserve_outputs["OUTPUT_ANIMALS"], "SEED": 2,
            "COUNT_RESERVES": count_reserves, "OUTPUT": "memory:",
        })["OUTPUT"]
        by_role = {}
        for feature in out.getFeatures():
            by_role.setdefault(feature["role"], []).append(feature["count"])
        assert len(by_role["primary"]) == 6 and len(by_role["reserve"]) == 3
        assert all(c != NULL for c in by_role["primary"])
        assert all((c != NULL) == count_reserves for c in by_role["reserve"])


def test_simulated_counts_stay_inside_each_units_stratum(run_alg):
    # truth by construction: animals on a 100 m lattice; two strata split at x = 500; a 300 m square of
    # stratum 1 over the split counts only the animals west of it (numpy comparison as the oracle)
    from qgis.core import QgsFeature, QgsGeometry, QgsPointXY, QgsVectorLayer

    from plotwise.processing import compat

    animals = QgsVectorLayer("Point?crs=EPSG:32633", "animals", "memory")
    xy = np.array([(x, y) for x in np.arange(50, 1000, 100.0) for y in np.arange(50, 1000, 100.0)])
    points = []
    for x, y in xy:
        f = QgsFeature()
        f.setGeometry(QgsGeometry.fromPointXY(QgsPointXY(x, y)))
        points.append(f)
    animals.dataProvider().addFeatures(points)
    strata = QgsVectorLayer("Polygon?crs=EPSG:32633", "strata", "memory")
    strata.dataProvider().addAttributes([compat.make_field("stratum", "int")])
    strata.updateFields()
    units = QgsVectorLayer("Polygon?crs=EPSG:32633", "units", "memory")
    units.dataProvider().addAttributes([compat.make_field("unit_id", "string"), compat.make_field("stratum", "int")])
    units.updateFields()
    for layer, rows in ((strata, [(1, "POLYGON((0 0, 500 0, 500 1000, 0 1000, 0 0))"),
                                  (2, "POLYGON((500 0, 1000 0, 1000 1000, 500 1000, 500 0))")]),
                        (units, [("a", 1, "POLYGON((380 380, 680 380, 680 680, 380 680, 380 380))")])):
        feats = []
        for row in rows:
            f = QgsFeature(layer.fields())
            f.setGeometry(QgsGeometry.fromWkt(row[-1]))
            f.setAttributes(list(row[:-1]))
            feats.append(f)
        layer.dataProvider().addFeatures(feats)
    out = run_alg("plotwise:simulatecounts", {"UNITS": units, "ANIMALS": animals, "DETECTION": 1.0, "SEED": 1,
                                              "STRATA": strata, "STRATA_ID_FIELD": "stratum", "OUTPUT": "memory:"})
    count = next(out["OUTPUT"].getFeatures())["count"]
    inside = (xy[:, 0] > 380) & (xy[:, 0] < 500) & (xy[:, 1] > 380) & (xy[:, 1] < 680)
    assert count == int(inside.sum())
