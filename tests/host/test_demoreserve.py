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
    result = run_alg("plotwise:simulatecounts", {"UNITS": units, "ANIMALS": animals, "DETECTION": 1.0, "SEED": 3, "OUTPUT": "memory:"})
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
        run_alg("plotwise:simulatecounts", {"UNITS": units, "ANIMALS": demo_reserve_outputs["OUTPUT_ANIMALS"], "OUTPUT": "memory:"})


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
