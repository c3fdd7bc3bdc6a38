"""plotwise:occupancy and plotwise:simulatedetections run through the host, and through qgis_process.

Outside references: MacKenzie et al. (2002)'s likelihood maximised directly with scipy (written in
the test), and truth known by construction (simulated detections).
"""
import math
import numpy as np
import pytest
from recording_feedback import RecordingFeedback
from scipy import optimize

pytest.importorskip("qgis.core")
from osgeo import ogr  # noqa: E402
from qgis.core import QgsFeature, QgsGeometry, QgsProcessingException, QgsVectorLayer  # noqa: E402

PINNED = ("SITES", "SITE_ID_FIELD", "HISTORY_FIELDS", "PSI_COVARIATES", "P_COVARIATES", "CONFIDENCE", "TARGET_SE")
K = 5


def site_layer(y, extra=None, geometry="Point", name="cameras", kinds=None):
    """Invented camera sites (EPSG:32736) with det_1..det_K (NULL for NaN) and extra numeric fields."""
    from plotwise.processing import compat

    extra = extra or {}
    layer = QgsVectorLayer(f"{geometry}?crs=EPSG:32736" if geometry else "None", name, "memory")
    fields = [compat.make_field("site", "string")]
    fields += [compat.make_field(f"det_{j + 1}", (kinds or {}).get(j, "int")) for j in range(y.shape[1])]
    fields += [compat.make_field(n, "double") for n in extra]
    layer.dataProvider().addAttributes(fields)
    layer.updateFields()
    features = []
    for i, row in enumerate(y):
        f = QgsFeature(layer.fields())
        if geometry:
            f.setGeometry(QgsGeometry.fromWkt(f"POINT({500000 + 700 * (i % 10)} {9000000 + 700 * (i // 10)})"))
        f.setAttributes([f"C{i:03d}"] + [None if np.isnan(v) else v for v in row.tolist()]
                        + [float(extra[n][i]) for n in extra])
        features.append(f)
    layer.dataProvider().addFeatures(features)
    return layer


def simulated(seed=1, s=80, psi=0.55, p=0.35, missing=0.1):
    rng = np.random.default_rng(seed)
    z = rng.random(s) < psi
    y = ((rng.random((s, K)) < p) & z[:, None]).astype(float)
    y[rng.random((s, K)) < missing] = np.nan
    return y


def parameters(layer, **extra):
    p = {"SITES": layer, "SITE_ID_FIELD": "site", "HISTORY_FIELDS": [f"det_{j + 1}" for j in range(K)],
         "PSI_COVARIATES": [], "P_COVARIATES": [], "CONFIDENCE": 0.95, "TARGET_SE": 0.05,
         "OUTPUT": "memory:", "OUTPUT_TABLE": "memory:"}
    p.update(extra)
    return p


def direct_constant_fit(y):
    """psi, p maximising MacKenzie et al. (2002)'s likelihood (surveys not made left out), scipy directly."""
    m = ~np.isnan(y)
    y0 = np.nan_to_num(y)
    detected = (y0 * m).sum(axis=1) > 0

    def negative(q):
        a = np.prod(np.where(m, q[1] ** y0 * (1 - q[1]) ** (1 - y0), 1.0), axis=1)
        return -np.sum(np.log(q[0] * a + (1 - q[0]) * ~detected))

    return optimize.minimize(negative, [0.5, 0.5], method="Nelder-Mead",
                             options={"xatol": 1e-12, "fatol": 1e-14, "maxiter": 20000}).x


def test_constant_model_outputs_and_report(run_alg, tmp_path):
    y = simulated()
    y[7] = np.nan  # a site never surveyed: left out and listed
    feedback = RecordingFeedback()
    report = tmp_path / "occupancy.html"
    result = run_alg("plotwise:occupancy", parameters(site_layer(y), REPORT=str(report), OUTPUT_MODELS="memory:"),
                     feedback=feedback)
    psi, p = direct_constant_fit(np.delete(y, 7, axis=0))
    assert result["PSI"] == pytest.approx(psi, abs=1e-6)  # MacKenzie et al. (2002), maximised directly
    assert result["P"] == pytest.approx(p, abs=1e-6)
    assert result["PSI_LO"] < result["PSI"] < result["PSI_HI"] and result["PSI_SE"] > 0 and result["P_SE"] > 0
    used = np.delete(y, 7, axis=0)
    assert result["NAIVE"] == pytest.approx(np.mean(np.nansum(used, axis=1) > 0))
    # occasions for 1 - (1 - p)^K >= 0.95: ceil(ln 0.05 / ln(1 - p))
    assert result["OCCASIONS_NEEDED"] == math.ceil(math.log(0.05) / math.log(1 - result["P"]))
    assert any("C007" in w for w in feedback.warnings)
    out = result["OUTPUT"]
    assert out.fields().names()[-3:] == ["psi", "psi_cond", "naive"]
    for f in out.getFeatures():
        if f["site"] == "C007":
            assert f["psi"] is None or str(f["psi"]) == "NULL"
            continue
        detected = any(f[f"det_{j + 1}"] == 1 for j in range(K))
        assert f["naive"] == int(detected)
        assert f["psi"] == pytest.approx(result["PSI"])
        if detected:
            assert f["psi_cond"] == pytest.approx(1.0)
        else:
            assert 0 < f["psi_cond"] < f["psi"]  # Bayes: an undetected site is less likely occupied
    table = {f["param"]: f for f in result["OUTPUT_TABLE"].getFeatures()}
    assert table.keys() == {"logit_psi:const", "logit_p:const", "psi", "p"}
    assert table["psi"]["estimate"] == pytest.approx(result["PSI"])
    assert [f.name() for f in result["OUTPUT_TABLE"].fields()] == ["param", "estimate", "se", "lo", "hi"]
    assert result["OUTPUT_MODELS"].featureCount() == 1
    html = report.read_text(encoding="utf-8")
    for text in ("Field safety", "Detection histories", "Cumulative detection", "Design advice", "psi_cond",
                 "MacKenzie", "C007"):
        assert text in html


def test_covariates_effort_models_and_goodness_of_fit(run_alg, tmp_path):
    rng = np.random.default_rng(3)
    s = 120
    cover = rng.normal(40.0, 10.0, s)
    effort = rng.uniform(2.0, 7.0, (s, K))
    psi = 1 / (1 + np.exp(-(0.2 + 0.08 * (cover - 40.0))))
    p = 1 / (1 + np.exp(-(-1.5 + 0.25 * effort)))
    z = rng.random(s) < psi
    y = ((rng.random((s, K)) < p) & z[:, None]).astype(float)
    extra = {"cover": cover, **{f"eff_{j + 1}": effort[:, j] for j in range(K)}}
    result = run_alg("plotwise:occupancy", parameters(
        site_layer(y, extra), PSI_COVARIATES=["cover"], EFFORT_FIELDS=[f"eff_{j + 1}" for j in range(K)],
        MODELS="psi: cover\np: effort", GOF_REPLICATES=40, SEED=4, OUTPUT_MODELS="memory:",
        REPORT=str(tmp_path / "r.html")))
    table = {f["param"]: f for f in result["OUTPUT_TABLE"].getFeatures()}
    assert set(table) == {"logit_psi:const", "logit_psi:cover", "logit_p:const", "logit_p:effort", "psi", "p"}
    assert table["logit_psi:cover"]["lo"] < 0.08 < table["logit_psi:cover"]["hi"]  # the true slope, by construction
    models = sorted(f["model"] for f in result["OUTPUT_MODELS"].getFeatures())
    assert models == sorted(["psi: cover; p: effort", "psi: constant; p: constant", "psi: cover; p: constant",
                             "psi: constant; p: effort"])
    assert 0 < result["GOF_P"] <= 1 and result["C_HAT"] > 0


def test_a_table_without_geometry_works(run_alg):
    result = run_alg("plotwise:occupancy", parameters(site_layer(simulated(seed=5), geometry=None)))
    assert result["OUTPUT"].featureCount() == 80 and 0 < result["PSI"] <= 1


def test_bad_history_value_names_field_and_sites(run_alg):
    y = simulated(seed=6)
    y[[4, 9], 2] = 2.0
    with pytest.raises(QgsProcessingException) as caught:
        run_alg("plotwise:occupancy", parameters(site_layer(y)))
    assert "det_3" in str(caught.value) and "C004, C009" in str(caught.value)


def test_simulated_detections_from_the_demo_population(run_alg, demo_reserve_outputs):
    stations = run_alg("plotwise:stations", {
        "FRAME": demo_reserve_outputs["OUTPUT_AREA"], "N_STATIONS": 30, "ARRAY": 2, "HOME_RANGE": 3.0,
        "SPACING": 0.0, "CLUSTER_SIZE": 4, "MIN_SPACING": 0.0, "RESERVE": 0, "SEED": 3, "OUTPUT": "memory:"})
    result = run_alg("plotwise:simulatedetections", {
        "STATIONS": stations["OUTPUT"], "ANIMALS": demo_reserve_outputs["OUTPUT_ANIMALS"], "OCCASIONS": 6,
        "P_MAX": 0.6, "SIGMA": 400.0, "NOT_SURVEYED": 0.1, "SEED": 2, "OUTPUT": "memory:"})
    out = result["OUTPUT"]
    names = out.fields().names()
    assert names[:2] == ["station", "stratum"] and [f"det_{j:02d}" for j in range(1, 7)] == names[7:13]
    animals = QgsVectorLayer(demo_reserve_outputs["OUTPUT_ANIMALS"], "animals", "ogr")
    groups = {}
    for a in animals.getFeatures():  # the groups' mean positions, computed here
        point = a.geometry().asPoint()
        groups.setdefault(a["group_id"], []).append((point.x(), point.y()))
    centres = np.array([np.mean(v, axis=0) for v in groups.values()])
    for f in out.getFeatures():
        point = f.geometry().asPoint()
        nearest = np.hypot(*(centres - [point.x(), point.y()]).T).min()
        assert f["dist_grp"] == pytest.approx(nearest, abs=1e-3)
        assert f["p_true"] == pytest.approx(0.6 * math.exp(-0.5 * (nearest / 400.0) ** 2), rel=1e-9)
        assert all(f[f"det_{j:02d}"] in (0, 1, None) or str(f[f"det_{j:02d}"]) == "NULL" for j in range(1, 7))
    fitted = run_alg("plotwise:occupancy", {
        "SITES": out, "SITE_ID_FIELD": "station", "HISTORY_FIELDS": [f"det_{j:02d}" for j in range(1, 7)],
        "CONFIDENCE": 0.95, "TARGET_SE": 0.05, "OUTPUT": "memory:", "OUTPUT_TABLE": "memory:"})
    assert 0 < fitted["PSI"] <= 1


def write_gpkg(layer, path):
    from qgis.core import QgsVectorFileWriter

    QgsVectorFileWriter.writeAsVectorFormat(layer, str(path), "utf-8", layer.crs(), "GPKG")
    return path


def test_qgis_process_simulates_detections(qgis_process, tmp_path):
    from plotwise.processing import compat

    stations = site_layer(np.zeros((20, 1)))
    animals = QgsVectorLayer("Point?crs=EPSG:32736", "animals", "memory")
    animals.dataProvider().addAttributes([compat.make_field("group_id", "int")])
    animals.updateFields()
    features = []
    for i in range(30):
        f = QgsFeature(animals.fields())
        f.setGeometry(QgsGeometry.fromWkt(f"POINT({500000 + 300 * i} {9000000 + 200 * (i % 7)})"))
        f.setAttributes([i // 3])
        features.append(f)
    animals.dataProvider().addFeatures(features)
    out = tmp_path / "detections.gpkg"
    qgis_process("run", "plotwise:simulatedetections", "--", f"STATIONS={write_gpkg(stations, tmp_path / 's.gpkg')}",
                 f"ANIMALS={write_gpkg(animals, tmp_path / 'a.gpkg')}", "OCCASIONS=4", "P_MAX=0.7", "SIGMA=600",
                 "SEED=3", f"OUTPUT={out}")
    dataset = ogr.Open(str(out))  # keep the dataset alive while its layer is read
    layer = dataset.GetLayer(0)
    names = [layer.GetLayerDefn().GetFieldDefn(i).GetName() for i in range(layer.GetLayerDefn().GetFieldCount())]
    assert {"det_01", "det_04", "dist_grp", "p_true"} <= set(names) and layer.GetFeatureCount() == 20


def test_qgis_process_with_the_pinned_parameters_only(qgis_process, tmp_path):
    rng = np.random.default_rng(8)
    layer = site_layer(simulated(seed=8), {"cover": rng.normal(size=80), "wind": rng.normal(size=80)})
    sites = write_gpkg(layer, tmp_path / "sites.gpkg")
    values = [("SITES", str(sites)), ("SITE_ID_FIELD", "site")]
    values += [("HISTORY_FIELDS", f"det_{j + 1}") for j in range(K)]  # a multiple field: NAME=value once per field
    values += [("PSI_COVARIATES", "cover"), ("P_COVARIATES", "wind"), ("CONFIDENCE", "0.9"), ("TARGET_SE", "0.08")]
    assert {k for k, _ in values} == set(PINNED)
    out, table = tmp_path / "sites_out.gpkg", tmp_path / "table.gpkg"
    stdout = qgis_process("run", "plotwise:occupancy", "--", *(f"{k}={v}" for k, v in values), f"OUTPUT={out}",
                          f"OUTPUT_TABLE={table}", f"REPORT={tmp_path / 'o.html'}")
    for name in ("PSI", "PSI_SE", "PSI_LO", "PSI_HI", "P", "P_SE", "NAIVE"):
        assert name in stdout
    dataset = ogr.Open(str(table))
    params = {f.GetField("param") for f in dataset.GetLayer(0)}
    assert params == {"logit_psi:const", "logit_psi:cover", "logit_p:const", "logit_p:wind", "psi", "p"}
