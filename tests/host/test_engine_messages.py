"""Engine errors and warnings reach a French user in French, with the ids filled in.

The French translator (``i18n/plotwise_fr.qm``, compiled by ``make translations``) is installed
the way the plugin installs it (``processing.translation.install_translator``) and removed after each
test. The expected texts come from outside the running code: the committed French translation
in ``i18n/plotwise_fr.ts`` of each English template (looked up by the English source written out
below), filled with the feature ids and field names of the invented test layers.
"""
import math
import subprocess
import xml.etree.ElementTree as ET
from pathlib import Path

import pytest
from recording_feedback import RecordingFeedback as Warnings

qgis_core = pytest.importorskip("qgis.core")
from qgis.core import (  # noqa: E402
    QgsFeature,
    QgsGeometry,
    QgsProcessingException,
    QgsVectorLayer,
)

REPO = Path(__file__).resolve().parents[2]
I18N = REPO / "i18n"


def _ensure_qm():
    ts, qm = I18N / "plotwise_fr.ts", I18N / "plotwise_fr.qm"
    if not qm.exists() or qm.stat().st_mtime < ts.stat().st_mtime:
        run = subprocess.run(["make", "--no-print-directory", "translations"], cwd=REPO, capture_output=True,
                             text=True, timeout=120)
        assert run.returncode == 0, run.stdout + run.stderr
    assert qm.exists()


def french(context, source):
    """The committed French translation of ``source`` in ``context`` (from the .ts file)."""
    root = ET.parse(I18N / "plotwise_fr.ts").getroot()
    for ctx in root.iter("context"):
        if ctx.findtext("name") != context:
            continue
        for message in ctx.iter("message"):
            if message.findtext("source") == source:
                text = message.findtext("translation")
                assert text and text != source, (context, source)
                return text
    raise AssertionError(f"no translation of {source!r} in context {context}")


@pytest.fixture
def french_ui(plotwise_provider):
    from plotwise.processing.translation import install_translator, remove_translator

    _ensure_qm()
    translator = install_translator("fr")
    assert translator is not None
    try:
        yield
    finally:
        remove_translator(translator)



def _squares(fields, rows, crs="EPSG:32633"):
    """Square polygons side by side; ``rows`` are (side_m, attributes...)."""
    from plotwise.processing import compat

    layer = QgsVectorLayer(f"Polygon?crs={crs}", "strata", "memory")
    layer.dataProvider().addAttributes([compat.make_field(name, kind) for name, kind in fields])
    layer.updateFields()
    features, x = [], 500000.0
    for side, *values in rows:
        feature = QgsFeature(layer.fields())
        feature.setGeometry(QgsGeometry.fromWkt(
            f"POLYGON(({x} 9000000, {x + side} 9000000, {x + side} {9000000 + side}, {x} {9000000 + side}, "
            f"{x} 9000000))"))
        feature.setAttributes(values)
        features.append(feature)
        x += side + 10
    layer.dataProvider().addFeatures(features)
    return layer


def test_allocate_zero_area_error_in_french(french_ui):
    import processing

    layer = _squares([("stratum", "int"), ("area_ha", "double"), ("sd_c", "double")],
                     [(2000.0, 1, 400.0, 2.0), (1500.0, 2, 0.0, 6.0), (900.0, 3, 90.0, 9.0)])
    zero_fid = [f.id() for f in layer.getFeatures()][1]
    with pytest.raises(QgsProcessingException) as err:
        processing.run("plotwise:allocate", {
            "STRATA": layer, "AREA_FIELD": "area_ha", "SD_FIELD": "sd_c", "METHOD": 2,
            "TOTAL": 20, "UNIT_AREA": 10000.0, "OUTPUT": "memory:",
        })
    name = french("Allocate", "field '{name}' of layer '{layer}'").format(name="area_ha", layer="strata")
    expected = french(
        "PlotwiseEngine",
        "The {name} is NULL, negative or zero for stratum feature(s) {shown}. Fill in a positive value for every "
        "stratum, or remove those strata from the layer.",
    ).format(name=name, shown=str(zero_fid))
    assert str(err.value) == expected
    assert "Valeur NULL" in expected and "area_ha" in expected  # French, with the field named


def test_layout_null_units_field_error_in_french(french_ui):
    import processing

    layer = _squares([("stratum", "int"), ("n_alloc", "double")],
                     [(3000.0, 1, 6), (2000.0, 2, None), (1500.0, 3, 3)], crs="EPSG:32736")
    null_fid = [f.id() for f in layer.getFeatures()][1]
    with pytest.raises(QgsProcessingException) as err:
        processing.run("plotwise:layout", {
            "FRAME": layer, "STRATUM_FIELD": "stratum", "N_FIELD": "n_alloc", "N_UNITS": 0, "DESIGN": 0,
            "SHAPE": 2, "SIZE": 20.0, "BEARING": -1.0, "INSIDE": True, "MIN_SPACING": 0.0, "RESERVE": 0,
            "SEED": 5, "OUTPUT": "memory:",
        })
    field = french("LayoutUnits", "Units field '{field}' of layer '{layer}'").format(field="n_alloc", layer="strata")
    expected = french(
        "PlotwiseEngine",
        "{field} is empty (NULL) or not a number for feature(s) {ids}. Give every stratum a whole number of units, "
        "or leave N_FIELD unset to use N_UNITS.",
    ).format(field=field, ids=str(null_fid))
    assert str(err.value) == expected
    assert "NULL" in expected and str(null_fid) in expected and "Donnez" in expected


def test_layout_warning_in_french(french_ui):
    import processing

    layer = _squares([("stratum", "int"), ("n_alloc", "int")],
                     [(3000.0, 1, 4), (2000.0, 2, 1)], crs="EPSG:32736")
    feedback = Warnings()
    processing.run("plotwise:layout", {
        "FRAME": layer, "STRATUM_FIELD": "stratum", "N_FIELD": "n_alloc", "N_UNITS": 0, "DESIGN": 0,
        "SHAPE": 2, "SIZE": 20.0, "BEARING": -1.0, "INSIDE": True, "MIN_SPACING": 0.0, "RESERVE": 0,
        "SEED": 5, "OUTPUT": "memory:",
    }, feedback=feedback)
    engine_text = french("PlotwiseEngine", "Stratum {key} gets one unit only; its variance cannot be estimated.")
    expected = french("LayoutUnits", "Layer '{layer}': {text}").format(layer="strata", text=engine_text.format(key=2))
    assert expected in feedback.warnings, feedback.warnings


def test_allocate_warning_in_french(french_ui):
    import processing

    # stratum 3 holds one 1-ha unit only (common practice: a minimum of 2 per stratum)
    layer = _squares([("stratum", "int"), ("area_ha", "double"), ("sd_c", "double")],
                     [(math.sqrt(4e6), 1, 400.0, 2.0), (math.sqrt(2.5e6), 2, 250.0, 6.0), (100.0, 3, 1.0, 9.0)])
    small_fid = [f.id() for f in layer.getFeatures()][2]
    feedback = Warnings()
    processing.run("plotwise:allocate", {
        "STRATA": layer, "AREA_FIELD": "area_ha", "SD_FIELD": "sd_c", "METHOD": 2,
        "TOTAL": 20, "UNIT_AREA": 10000.0, "OUTPUT": "memory:",
    }, feedback=feedback)
    expected = french(
        "PlotwiseEngine",
        "Stratum feature(s) {shown} hold fewer than {minimum} units: they get all the units that fit.",
    ).format(shown=str(small_fid), minimum=2)
    assert expected in feedback.warnings, feedback.warnings


def test_gpx_waypoint_descriptions_in_french(french_ui, tmp_path):
    import processing
    from osgeo import ogr

    layer = _squares([("stratum", "int"), ("n_alloc", "int")], [(3000.0, 1, 3), (2000.0, 2, 2)], crs="EPSG:32736")
    gpx = tmp_path / "units.gpx"
    result = processing.run("plotwise:layout", {
        "FRAME": layer, "STRATUM_FIELD": "stratum", "N_FIELD": "n_alloc", "N_UNITS": 0, "DESIGN": 0,
        "SHAPE": 3, "SIZE": 100.0, "BEARING": 90.0, "INSIDE": True, "MIN_SPACING": 0.0, "RESERVE": 1,
        "SEED": 5, "OUTPUT": "memory:", "OUTPUT_GPX": str(gpx),
    })
    units = {f["unit_id"]: f for f in result["OUTPUT"].getFeatures()}
    ds = ogr.Open(str(gpx))  # GDAL's GPX driver reads the standard schema back
    described = {w.GetField("name"): w.GetField("desc") for w in ds.GetLayerByName("waypoints")}
    ds = None
    assert len(described) == 2 * len(units)
    for name, text in described.items():
        unit = units[name[:-1]]
        source = "{end} of transect {{unit}} ({role}, stratum {{stratum}}, bearing {{bearing:.0f}} deg)".format(
            end="start" if name.endswith("A") else "end", role=unit["role"])
        expected = french("PlotwiseEngine", source).format(unit=unit["unit_id"], stratum=unit["stratum"], bearing=90.0)
        assert text == expected
    assert any(t.startswith("début du transect") for t in described.values())
    assert any("de réserve" in t for t in described.values())


def test_raster_class_labels_in_french(french_ui, tmp_path):
    import numpy as np
    import processing
    from osgeo import gdal, osr

    path = str(tmp_path / "cover.tif")  # two invented cover classes, 10 and 20, on 20 m cells
    ds = gdal.GetDriverByName("GTiff").Create(path, 40, 30, 1, gdal.GDT_Byte)
    ds.SetGeoTransform((500000.0, 20.0, 0.0, 9000600.0, 0.0, -20.0))
    srs = osr.SpatialReference()
    srs.ImportFromEPSG(32736)
    ds.SetProjection(srs.ExportToWkt())
    ds.GetRasterBand(1).WriteArray(np.where(np.arange(40)[None, :] < 20, 10, 20).repeat(30, axis=0).astype(np.uint8))
    ds = None
    frame = _squares([("id", "int")], [(600.0, 1)], crs="EPSG:32736")
    result = processing.run("plotwise:stratify", {
        "FRAME": frame, "COVARIATES": [path], "METHOD": 4, "STRATA": 2, "MIN_AREA": 0.0, "SEED": 1,
        "OUTPUT_RASTER": str(tmp_path / "classes.tif"), "OUTPUT": "memory:",
    })
    labels = sorted(f["label"] for f in result["OUTPUT"].getFeatures())
    template = french("PlotwiseEngine", "{name} class {value}")
    assert labels == [template.format(name="cover", value=v) for v in ("10", "20")]
    assert "classe" in template
