"""plotwise:distancedensity (and simulatecounts' distances) through the host, on the demo reserve.

The truth is known by construction: the demo reserve's simulated velmar population (TRUE_TOTAL) and the
detection function the sightings were simulated with (half-normal, σ = 80 m). Effective strip
half-width of a truncated half-normal: μ = σ√(2π)(Φ(w/σ) − ½) (Buckland et al. 2001, ch. 3).
"""
import math
from pathlib import Path

import pytest

qgis_core = pytest.importorskip("qgis.core")
from qgis.core import NULL, QgsFeature, QgsProcessingException, QgsVectorLayer  # noqa: E402
from scipy import stats  # noqa: E402

SIGMA = 80.0
PINNED_STRATA_FIELDS = ["stratum", "area", "n_units", "effort", "n_det", "p_det", "esw", "dens", "dens_se", "dens_lo",
                        "dens_hi", "abund", "abund_se", "abund_lo", "abund_hi", "cv", "df"]
PINNED_MODEL_FIELDS = ["model", "n_par", "aic", "delta_aic", "p_det", "esw", "gof_p", "chosen"]


@pytest.fixture(scope="module")
def line_survey(plotwise_provider, demo_reserve_outputs, tmp_path_factory):
    """60 random 2 km line transects over the demo reserve, sightings simulated with a half-normal (σ = 80 m)."""
    import processing

    folder = tmp_path_factory.mktemp("distance")
    layout = processing.run("plotwise:layout", {
        "FRAME": demo_reserve_outputs["OUTPUT_AREA"], "N_UNITS": 60, "DESIGN": 0, "SHAPE": 3, "SIZE": 2000.0,
        "BEARING": -1.0, "INSIDE": True, "SEED": 5, "OUTPUT": str(folder / "lines.gpkg")})
    counted = processing.run("plotwise:simulatecounts", {
        "UNITS": layout["OUTPUT"], "ANIMALS": demo_reserve_outputs["OUTPUT_ANIMALS"], "DETECTION": 1.0, "SEED": 6,
        "DETECTION_FUNCTION": 1, "SIGMA": SIGMA, "OUTPUT": str(folder / "counted.gpkg"),
        "OUTPUT_OBSERVATIONS": str(folder / "observations.gpkg")})
    return {"folder": folder, "units": counted["OUTPUT"], "observations": counted["OUTPUT_OBSERVATIONS"],
            "strata": demo_reserve_outputs["OUTPUT_AREA"], "true_total": demo_reserve_outputs["TRUE_TOTAL"]}


def _run(run_alg, survey, **extra):
    parameters = {"UNITS": survey["units"], "OBSERVATIONS": survey["observations"], "STRATA": survey["strata"],
                  "SEED": 3, "OUTPUT": "memory:", "OUTPUT_MODELS": "memory:",
                  "REPORT": str(survey["folder"] / "distancedensity.html")}
    parameters.update(extra)
    return run_alg("plotwise:distancedensity", parameters)


def _layer(value):
    from qgis.core import QgsProcessingContext, QgsProcessingUtils

    return value if not isinstance(value, str) else QgsProcessingUtils.mapLayerFromString(value, QgsProcessingContext())


def test_simulated_observations_have_the_pinned_fields(line_survey):
    observations = QgsVectorLayer(line_survey["observations"], "observations", "ogr")
    assert observations.fields().names()[-3:] == ["unit_id", "distance", "size"]
    values = [(f["unit_id"], f["distance"], f["size"]) for f in observations.getFeatures()]
    assert len(values) > 150
    assert all(d >= 0 for _, d, _ in values) and all(s == 1 for _, _, s in values)
    units = QgsVectorLayer(line_survey["units"], "units", "ogr")
    counts = {f["unit_id"]: f["count"] for f in units.getFeatures()}
    assert sum(counts.values()) == len(values)  # the count field agrees with the sightings


def test_estimate_from_simulated_line_transects_is_near_the_truth(run_alg, line_survey):
    result = _run(run_alg, line_survey, TRUNCATION=200.0, KEYS=[0], AREA_UNIT=0)
    strata = _layer(result["OUTPUT"])
    assert strata.fields().names() == PINNED_STRATA_FIELDS
    row = next(strata.getFeatures())
    models = _layer(result["OUTPUT_MODELS"])
    assert models.fields().names()[:len(PINNED_MODEL_FIELDS)] == PINNED_MODEL_FIELDS
    assert sum(f["chosen"] for f in models.getFeatures()) == 1
    # detection: truth by construction, σ = 80 m, w = 200 m
    w = 200.0
    mu = SIGMA * math.sqrt(2 * math.pi) * (stats.norm.cdf(w / SIGMA) - 0.5)
    p_true = mu / w
    p_se = row["p_det"] * 0.1  # generous: the CV of P from ~250 distances is about 5 %
    assert abs(result["P_DETECT"] - p_true) < 3 * p_se
    assert result["ESW"] == pytest.approx(result["P_DETECT"] * w)
    # abundance: the reserve's true total lies within the 95 % interval, and within 3 SE
    truth = line_survey["true_total"]
    assert result["ABUNDANCE_LO"] <= truth <= result["ABUNDANCE_HI"]
    assert abs(result["ABUNDANCE"] - truth) < 3 * row["abund_se"]
    assert row["n_units"] == 60 and row["effort"] == pytest.approx(120.0, rel=1e-6)  # 60 × 2 km
    assert result["DENSITY"] == pytest.approx(row["dens"]) and result["CV"] == pytest.approx(row["cv"])
    html = Path(result["REPORT"]).read_text(encoding="utf-8")
    for needle in ("<svg", "Detection function", "Assumptions and cautions", "Field safety", "Fewster"):
        assert needle in html


def test_all_keys_and_a_bootstrap_run(run_alg, line_survey):
    result = _run(run_alg, line_survey, BOOTSTRAP=30, SEED=11, AREA_UNIT=1)
    models = [f["model"] for f in _layer(result["OUTPUT_MODELS"]).getFeatures()]
    assert {"half-normal", "hazard-rate", "uniform"} <= set(models)
    again = _run(run_alg, line_survey, BOOTSTRAP=30, SEED=11, AREA_UNIT=1)
    assert again["ABUNDANCE_LO"] == result["ABUNDANCE_LO"]  # seeded
    assert result["DENSITY"] == pytest.approx(result["ABUNDANCE"] / _area_ha(line_survey["strata"]))


def test_distance_bands(run_alg, line_survey):
    """Grouped distances: the fit uses the counts per band, so the models table has χ² p-values only."""
    result = _run(run_alg, line_survey, CUTPOINTS="0, 25, 50, 75, 100, 150, 200", KEYS=[0, 1])
    models = list(_layer(result["OUTPUT_MODELS"]).getFeatures())
    assert all(f["cvm_p"] == NULL for f in models)
    assert all(f["gof_p"] == f["chisq_p"] for f in models if f["chisq_p"] != NULL)
    assert result["ESW"] == pytest.approx(result["P_DETECT"] * 200.0)  # the last band edge is the truncation
    with pytest.raises(QgsProcessingException, match="not numbers"):
        _run(run_alg, line_survey, CUTPOINTS="0, ten, 20")


def _area_ha(path):
    layer = QgsVectorLayer(path, "area", "ogr")
    return sum(f.geometry().area() for f in layer.getFeatures()) / 1e4


def test_point_transects_with_a_hazard_rate(run_alg, plotwise_provider, demo_reserve_outputs, tmp_path):
    layout = run_alg("plotwise:layout", {
        "FRAME": demo_reserve_outputs["OUTPUT_AREA"], "N_UNITS": 80, "DESIGN": 1, "SHAPE": 0, "SIZE": 0.0,
        "SEED": 8, "OUTPUT": str(tmp_path / "points.gpkg")})
    counted = run_alg("plotwise:simulatecounts", {
        "UNITS": layout["OUTPUT"], "ANIMALS": demo_reserve_outputs["OUTPUT_ANIMALS"], "SEED": 9,
        "DETECTION_FUNCTION": 2, "SIGMA": 120.0, "SHAPE_PARAM": 3.0, "OUTPUT": "memory:",
        "OUTPUT_OBSERVATIONS": "memory:"})
    result = run_alg("plotwise:distancedensity", {
        "UNITS": counted["OUTPUT"], "OBSERVATIONS": counted["OUTPUT_OBSERVATIONS"], "SURVEY_TYPE": 1,
        "STRATA": demo_reserve_outputs["OUTPUT_AREA"], "KEYS": [0, 1], "OUTPUT": "memory:",
        "OUTPUT_MODELS": "memory:", "REPORT": str(tmp_path / "points.html")})
    row = next(_layer(result["OUTPUT"]).getFeatures())
    assert row["effort"] == row["n_units"]  # one visit per point
    assert 0 < result["P_DETECT"] < 1 and result["ESW"] > 0  # the effective detection radius
    assert result["ABUNDANCE_LO"] < result["ABUNDANCE"] < result["ABUNDANCE_HI"]
    assert "distance from the point" in Path(result["REPORT"]).read_text(encoding="utf-8")


# --------------------------------------------------------------------------- errors


def _observations_copy(survey, change):
    source = QgsVectorLayer(survey["observations"], "observations", "ogr")
    layer = QgsVectorLayer("Point?crs=" + source.crs().authid(), "bad observations", "memory")
    layer.dataProvider().addAttributes(source.fields().toList()[-3:])
    layer.updateFields()
    features = []
    for i, f in enumerate(source.getFeatures()):
        out = QgsFeature(layer.fields())
        out.setGeometry(f.geometry())
        out.setAttributes(change(i, [f["unit_id"], f["distance"], f["size"]]))
        features.append(out)
    layer.dataProvider().addFeatures(features)
    return layer


def test_bad_observations_are_clear_errors(run_alg, line_survey):
    unknown = _observations_copy(line_survey, lambda i, a: [9001 if i == 0 else (9002 if i == 1 else a[0])] + a[1:])
    with pytest.raises(QgsProcessingException, match=r"does not have \(field 'unit_id'\): 9001, 9002"):
        _run(run_alg, line_survey, OBSERVATIONS=unknown)
    negative = _observations_copy(line_survey, lambda i, a: [a[0], -3.0 if i == 4 else a[1], a[2]])
    with pytest.raises(QgsProcessingException, match="the observations 5 have a negative distance"):
        _run(run_alg, line_survey, OBSERVATIONS=negative)  # memory feature ids start at 1
    with pytest.raises(QgsProcessingException, match=r"Only \d+ detections lie within the truncation distance of 5 m"):
        _run(run_alg, line_survey, TRUNCATION=5.0)
    with pytest.raises(QgsProcessingException, match="holds LineString geometries, but the survey type is point"):
        _run(run_alg, line_survey, SURVEY_TYPE=1)
    del unknown, negative


def test_a_zero_length_transect_is_an_error(run_alg, line_survey):
    source = QgsVectorLayer(line_survey["units"], "units", "ogr")
    layer = QgsVectorLayer("LineString?crs=" + source.crs().authid(), "short units", "memory")
    layer.dataProvider().addAttributes(source.fields().toList())
    layer.updateFields()
    features = []
    for f in source.getFeatures():
        out = QgsFeature(layer.fields())
        geometry = f.geometry()
        if f["unit_id"] == "U-003":
            start = geometry.asPolyline()[0]
            geometry = qgis_core.QgsGeometry.fromPolylineXY([start, start])
        out.setGeometry(geometry)
        out.setAttributes(f.attributes())
        features.append(out)
    layer.dataProvider().addFeatures(features)
    with pytest.raises(QgsProcessingException, match="the transects U-003 have zero length"):
        _run(run_alg, line_survey, UNITS=layer)
    del layer


# --------------------------------------------------------------------------- as users run it


def test_qgis_process_with_the_pinned_parameters_only(qgis_process, line_survey, demo_reserve_outputs, tmp_path):
    """simulatecounts' pinned distance parameters and distancedensity's pinned parameters, in a fresh profile
    (the shared ``qgis_process`` fixture of tests/host/conftest.py)."""
    out = tmp_path / "out"
    out.mkdir()
    layout = QgsVectorLayer(str(line_survey["folder"] / "lines.gpkg"), "lines", "ogr")
    assert layout.isValid()
    qgis_process("run", "plotwise:simulatecounts", "--", f"UNITS={line_survey['folder'] / 'lines.gpkg'}",
                 f"ANIMALS={demo_reserve_outputs['OUTPUT_ANIMALS']}", "DETECTION=1", "SEED=4",
                 "DETECTION_FUNCTION=1", "SIGMA=80", "SHAPE_PARAM=3", f"OUTPUT={out / 'counted.gpkg'}",
                 f"OUTPUT_OBSERVATIONS={out / 'observations.gpkg'}")
    stdout = qgis_process(
        "run", "plotwise:distancedensity", "--", f"UNITS={out / 'counted.gpkg'}", "UNIT_ID_FIELD=unit_id",
        "STRATUM_FIELD=stratum", f"OBSERVATIONS={out / 'observations.gpkg'}", "OBS_UNIT_FIELD=unit_id",
        "DISTANCE_FIELD=distance", "SIZE_FIELD=size", "SURVEY_TYPE=0", "TRUNCATION=0", "KEYS=0,1",
        f"STRATA={line_survey['strata']}", "STRATA_ID_FIELD=", "CONFIDENCE=0.95", "AREA_UNIT=0", "SEED=1",
        f"OUTPUT={out / 'estimate.gpkg'}", f"OUTPUT_MODELS={out / 'models.gpkg'}", f"REPORT={out / 'report.html'}")
    for name in ("DENSITY", "ABUNDANCE", "ABUNDANCE_LO", "ABUNDANCE_HI", "CV", "P_DETECT", "ESW"):
        assert name in stdout
    assert (out / "report.html").exists()
    estimate = QgsVectorLayer(str(out / "estimate.gpkg"), "estimate", "ogr")
    assert [n for n in estimate.fields().names() if n != "fid"] == PINNED_STRATA_FIELDS
