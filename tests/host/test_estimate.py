"""plotwise:estimate run through the host's Processing framework on small memory layers with known numbers.

Expected values are recomputed here from the textbook formulas (Cochran 1977; equation
numbers from memory) with numpy and scipy.stats.
"""
import math

import numpy as np
import pytest
from recording_feedback import RecordingFeedback as Warnings

qgis_core = pytest.importorskip("qgis.core")
from qgis.core import (  # noqa: E402
    QgsApplication,
    QgsFeature,
    QgsGeometry,
    QgsProcessingException,
    QgsVectorLayer,
)
from scipy import stats  # noqa: E402

# two strata of 1 km × 2 km (200 ha) and 1 km × 1 km (100 ha), side by side, EPSG:32633
STRATA = {1: (0.0, 1000.0, 2000.0), 2: (1000.0, 2000.0, 1000.0)}
UNIT_M2 = 10_000.0  # 1 ha square plots
COUNTS = {1: [3, 0, 5, 2, 4], 2: [10, 12, 7, 9]}



@pytest.fixture
def registered(plotwise_provider):
    assert QgsApplication.processingRegistry().algorithmById("plotwise:estimate") is not None


def _strata_layer():
    from plotwise.processing import compat

    layer = QgsVectorLayer("Polygon?crs=EPSG:32633", "strata", "memory")
    layer.dataProvider().addAttributes([compat.make_field("stratum", "int")])
    layer.updateFields()
    features = []
    for stratum, (x0, x1, height) in STRATA.items():
        f = QgsFeature(layer.fields())
        f.setGeometry(QgsGeometry.fromWkt(f"POLYGON(({x0} 0, {x1} 0, {x1} {height}, {x0} {height}, {x0} 0))"))
        f.setAttributes([stratum])
        features.append(f)
    layer.dataProvider().addFeatures(features)
    return layer


def _units_layer(counts=COUNTS, extra=(), role=False):
    """Square 100 m plots along a line in each stratum; ``extra`` adds (stratum, count, role) rows."""
    from plotwise.processing import compat

    layer = QgsVectorLayer("Polygon?crs=EPSG:32633", "units", "memory")
    spec = [("unit_id", "int"), ("stratum", "int"), ("count", "string" if any(
        isinstance(c, str) for _, c, _ in extra) else "double")]
    if role:
        spec.append(("role", "string"))
    layer.dataProvider().addAttributes([compat.make_field(*s) for s in spec])
    layer.updateFields()
    rows = [(h, c, "primary") for h, values in counts.items() for c in values] + list(extra)
    features = []
    for i, (stratum, count, kind) in enumerate(rows):
        x0 = STRATA[stratum][0] + 50 + 120 * (i % 7)
        y0 = 50 + 150 * i
        f = QgsFeature(layer.fields())
        f.setGeometry(QgsGeometry.fromWkt(
            f"POLYGON(({x0} {y0}, {x0 + 100} {y0}, {x0 + 100} {y0 + 100}, {x0} {y0 + 100}, {x0} {y0}))"))
        f.setAttributes([i + 1, stratum, count] + ([kind] if role else []))
        features.append(f)
    layer.dataProvider().addFeatures(features)
    return layer


def _expected(area_unit_m2=1e6):
    """Cochran (1977), eqs. 5.1, 5.7 (no FPC) and 5.16 with scipy.stats.t, equal 1 ha units."""
    total, var, comps = 0.0, 0.0, []
    for h, values in COUNTS.items():
        area = (STRATA[h][1] - STRATA[h][0]) * STRATA[h][2] / area_unit_m2
        a = UNIT_M2 / area_unit_m2
        d = np.mean(values) / a
        v = area ** 2 * np.var(values, ddof=1) / len(values) / a ** 2
        total += d * area
        var += v
        comps.append((v, len(values) - 1))
    df = var ** 2 / sum(v ** 2 / k for v, k in comps)
    se = math.sqrt(var)
    q = stats.t.ppf(0.975, df)
    return total, se, df, total - q * se, total + q * se


def _run(run_alg, tmp_path, units, **extra):
    parameters = {
        "UNITS": units, "COUNT_FIELD": "count", "STRATUM_FIELD": "stratum", "STRATA": _strata_layer(),
        "STRATA_ID_FIELD": "stratum", "OUTPUT": "memory:", "OUTPUT_TABLE": "memory:",
        "REPORT": str(tmp_path / "estimate.html"),
    }
    parameters.update(extra)
    feedback = Warnings()
    return run_alg("plotwise:estimate", parameters, feedback=feedback), feedback


def _layer(value):
    """An output of processing.run: a layer object, or a layer id/path to load."""
    if not isinstance(value, str):
        return value
    from qgis.core import QgsProcessingContext, QgsProcessingUtils

    return QgsProcessingUtils.mapLayerFromString(value, QgsProcessingContext())


def test_known_numbers_and_outputs(registered, run_alg, tmp_path):
    results, _ = _run(run_alg, tmp_path, _units_layer())
    total, se, df, lo, hi = _expected()
    assert results["ABUNDANCE"] == pytest.approx(total, rel=1e-9)
    assert results["ABUNDANCE_LO"] == pytest.approx(lo, rel=1e-9)
    assert results["ABUNDANCE_HI"] == pytest.approx(hi, rel=1e-9)
    assert results["DENSITY"] == pytest.approx(total / 3.0, rel=1e-9)  # 3 km² frame
    assert results["DENSITY_SE"] == pytest.approx(se / 3.0, rel=1e-9)
    assert results["CV"] == pytest.approx(se / total, rel=1e-9)

    out, tab = _layer(results["OUTPUT"]), _layer(results["OUTPUT_TABLE"])
    names = [f.name() for f in tab.fields()]
    assert names == ["stratum", "area", "n", "mean_c", "sd_c", "dens", "dens_se", "dens_lo", "dens_hi", "abund",
                     "abund_se", "abund_lo", "abund_hi", "cv", "df", "n_next"]
    rows = {f["stratum"]: f for f in tab.getFeatures()}
    assert set(rows) == {"1", "2", "all"}
    assert rows["all"]["df"] == pytest.approx(df, rel=1e-9)
    assert rows["1"]["mean_c"] == pytest.approx(np.mean(COUNTS[1]))
    assert rows["2"]["sd_c"] == pytest.approx(np.std(COUNTS[2], ddof=1))
    assert rows["1"]["area"] == pytest.approx(2.0) and rows["all"]["n"] == 9
    assert out.featureCount() == 2
    assert [f.name() for f in out.fields()] == names
    html = (tmp_path / "estimate.html").read_text(encoding="utf-8")
    assert "frame only" in html and "Stevens" in html and "<svg" in html
    assert "http://" not in html.replace('xmlns="http://www.w3.org/2000/svg"', "")


def test_hectares_and_lognormal(registered, run_alg, tmp_path):
    results, _ = _run(run_alg, tmp_path, _units_layer(), AREA_UNIT=1, CI_METHOD=1)
    total, se, df, _, _ = _expected(area_unit_m2=1e4)
    assert results["DENSITY"] == pytest.approx(total / 300.0, rel=1e-9)  # per ha
    # Buckland et al. (2001), §3.6.1: t with the Satterthwaite df, scipy.stats as the oracle
    c = math.exp(stats.t.ppf(0.975, df) * math.sqrt(math.log(1 + (se / total) ** 2)))
    assert results["ABUNDANCE_LO"] == pytest.approx(total / c, rel=1e-9)


def test_null_count_is_non_response_and_unused_reserve_is_skipped(registered, run_alg, tmp_path):
    units = _units_layer(extra=[(1, None, "primary"), (2, None, "reserve")], role=True)
    results, feedback = _run(run_alg, tmp_path, units)
    total, _, _, _, _ = _expected()
    assert results["ABUNDANCE"] == pytest.approx(total, rel=1e-9)
    assert any("non-response" in w and "10" in w for w in feedback.warnings)
    assert not any("11" in w.split(":")[-1] for w in feedback.warnings if "non-response" in w)


def test_non_numeric_count_names_the_unit(registered, run_alg, tmp_path):
    counts = {h: [str(c) for c in v] for h, v in COUNTS.items()}
    units = _units_layer(counts=counts, extra=[(2, "lots", "primary")])
    with pytest.raises(QgsProcessingException) as err:
        _run(run_alg, tmp_path, units)
    assert "10" in str(err.value) and "count" in str(err.value)


def test_empty_stratum_error_and_leaving_it_out(registered, run_alg, tmp_path):
    units = _units_layer(counts={1: COUNTS[1]})
    with pytest.raises(QgsProcessingException) as err:
        _run(run_alg, tmp_path, units)
    assert "2" in str(err.value)
    results, feedback = _run(run_alg, tmp_path, units, DROP_EMPTY=True)
    assert results["ABUNDANCE"] == pytest.approx(np.mean(COUNTS[1]) * 200, rel=1e-9)
    assert any("shrank" in w for w in feedback.warnings)
    assert "frame shrank" in (tmp_path / "estimate.html").read_text(encoding="utf-8")


def test_true_total_shown_in_report(registered, run_alg, tmp_path):
    _run(run_alg, tmp_path, _units_layer(), TRUE_TOTAL=2500)
    html = (tmp_path / "estimate.html").read_text(encoding="utf-8")
    assert "2,500" in html and "Only a simulation can show this" in html


def test_target_cv_and_bootstrap_seeded(registered, run_alg, tmp_path):
    first, _ = _run(run_alg, tmp_path, _units_layer(), CI_METHOD=2, SEED=7, TARGET_CV=0.1)
    again, _ = _run(run_alg, tmp_path, _units_layer(), CI_METHOD=2, SEED=7, TARGET_CV=0.1)
    assert first["ABUNDANCE_LO"] == again["ABUNDANCE_LO"]
    assert first["ABUNDANCE_LO"] < first["ABUNDANCE"] < first["ABUNDANCE_HI"]
    rows = {f["stratum"]: f for f in _layer(first["OUTPUT_TABLE"]).getFeatures()}
    # Neyman (1934); Cochran (1977), eq. 5.26 without FPC: M_h units of 1 ha, S_h the SD of counts
    m = np.array([200.0, 100.0])
    s = np.array([np.std(COUNTS[1], ddof=1), np.std(COUNTS[2], ddof=1)])
    total = sum(np.mean(COUNTS[h]) * m[h - 1] for h in (1, 2))
    n = (m * s).sum() ** 2 / (0.1 * total) ** 2
    planned = np.array([rows["1"]["n_next"], rows["2"]["n_next"]])
    assert rows["all"]["n_next"] == planned.sum() and np.all(planned >= 2)
    # the plan meets the CV (Cochran 1977, eq. 5.7) at no more than one unit per stratum above the optimum
    assert math.sqrt(np.sum(m ** 2 * s ** 2 / planned)) / total <= 0.1
    assert math.ceil(n) <= planned.sum() <= math.ceil(n) + 2
    html = (tmp_path / "estimate.html").read_text(encoding="utf-8")
    assert "Seed" in html and "bootstrap resamples" in html and "The overall interval by method" in html


def test_presence_gives_naive_occupancy(registered, run_alg, tmp_path):
    presence = {1: [1, 0, 0, 1, 0], 2: [1, 1, 0, 1]}
    results, _ = _run(run_alg, tmp_path, _units_layer(counts=presence), PRESENCE=True)
    # stratified proportion, strata weighted by their units (Cochran 1977, eq. 5.52): 200 and 100 plots
    assert results["DENSITY"] == pytest.approx((200 * 0.4 + 100 * 0.75) / 300, rel=1e-9)
    html = (tmp_path / "estimate.html").read_text(encoding="utf-8")
    assert "naive occupancy" in html.lower() and "repeat visits" in html


def _points_layer():
    from plotwise.processing import compat

    layer = QgsVectorLayer("Point?crs=EPSG:32633", "stations", "memory")
    layer.dataProvider().addAttributes([compat.make_field("stratum", "int"), compat.make_field("count", "int")])
    layer.updateFields()
    features = []
    for i, (stratum, count) in enumerate((h, c) for h, values in COUNTS.items() for c in values):
        f = QgsFeature(layer.fields())
        f.setGeometry(QgsGeometry.fromWkt(f"POINT({STRATA[stratum][0] + 100 + 150 * (i % 5)} {100 + 180 * i})"))
        f.setAttributes([stratum, count])
        features.append(f)
    layer.dataProvider().addFeatures(features)
    return layer


def test_points_need_a_unit_area(registered, run_alg, tmp_path):
    with pytest.raises(QgsProcessingException) as err:
        _run(run_alg, tmp_path, _points_layer())
    assert "area" in str(err.value)
    results, _ = _run(run_alg, tmp_path, _points_layer(), UNIT_AREA=UNIT_M2)
    assert results["ABUNDANCE"] == pytest.approx(_expected()[0], rel=1e-9)


def test_detection_by_delta_method_through_the_host(registered, run_alg, tmp_path):
    results, _ = _run(run_alg, tmp_path, _points_layer(), UNIT_AREA=UNIT_M2, DETECTION_P=0.8, DETECTION_SE=0.05)
    total, se, _, _, _ = _expected()
    assert results["ABUNDANCE"] == pytest.approx(total / 0.8, rel=1e-9)
    # Seber (1982): squared CVs add
    assert results["CV"] == pytest.approx(math.sqrt((se / total) ** 2 + (0.05 / 0.8) ** 2), rel=1e-9)
    html = (tmp_path / "estimate.html").read_text(encoding="utf-8")
    assert "separate study" in html


def test_local_variance_option_runs(registered, run_alg, tmp_path):
    srs, _ = _run(run_alg, tmp_path, _points_layer(), UNIT_AREA=UNIT_M2)
    local, _ = _run(run_alg, tmp_path, _points_layer(), UNIT_AREA=UNIT_M2, VARIANCE_METHOD=1)
    assert local["ABUNDANCE"] == pytest.approx(srs["ABUNDANCE"], rel=1e-12)
    assert local["DENSITY_SE"] > 0 and local["DENSITY_SE"] != srs["DENSITY_SE"]
    assert "Stevens" in (tmp_path / "estimate.html").read_text(encoding="utf-8")


def test_single_unit_stratum_is_collapsed_with_a_warning(registered, run_alg, tmp_path):
    results, feedback = _run(run_alg, tmp_path, _units_layer(counts={1: COUNTS[1], 2: [10]}))
    assert any("collapsed" in w and "2" in w for w in feedback.warnings)
    rows = {f["stratum"]: f for f in _layer(results["OUTPUT_TABLE"]).getFeatures()}
    # the pairs formula's one contrast: 1 df (Cochran 1977, §5A.12); the partner keeps its own n − 1
    assert rows["2"]["abund_se"] > 0 and rows["2"]["df"] == 1 and rows["1"]["df"] == len(COUNTS[1]) - 1


def test_without_stratum_field_the_frame_is_one_stratum(registered, run_alg, tmp_path):
    frame = QgsVectorLayer("Polygon?crs=EPSG:32633", "frame", "memory")
    f = QgsFeature(frame.fields())
    f.setGeometry(QgsGeometry.fromWkt("POLYGON((0 0, 2000 0, 2000 1000, 1000 1000, 1000 2000, 0 2000, 0 0))"))
    frame.dataProvider().addFeatures([f])
    results, feedback = _run(run_alg, tmp_path, _units_layer(), STRATA=frame)
    assert any("one stratum" in w for w in feedback.warnings)
    values = [c for v in COUNTS.values() for c in v]
    # simple random sampling over the whole 3 km² frame (Cochran 1977, eqs. 2.8 and 2.12, no FPC)
    assert results["ABUNDANCE"] == pytest.approx(np.mean(values) / 0.01 * 3.0, rel=1e-9)
    assert results["DENSITY_SE"] == pytest.approx(np.std(values, ddof=1) / math.sqrt(len(values)) / 0.01, rel=1e-9)
    rows = {f["stratum"]: f for f in _layer(results["OUTPUT_TABLE"]).getFeatures()}
    assert set(rows) == {"frame", "all"}


def test_line_transects_use_strip_width_times_length(registered, run_alg, tmp_path):
    from plotwise.processing import compat

    layer = QgsVectorLayer("LineString?crs=EPSG:32633", "transects", "memory")
    layer.dataProvider().addAttributes([compat.make_field("stratum", "int"), compat.make_field("count", "int")])
    layer.updateFields()
    features, lengths = [], {1: [400, 500, 600], 2: [300, 500]}
    counts = {1: [4, 6, 5], 2: [9, 12]}
    for h in (1, 2):
        for i, (length, count) in enumerate(zip(lengths[h], counts[h])):
            x = STRATA[h][0] + 100 + 200 * i
            f = QgsFeature(layer.fields())
            f.setGeometry(QgsGeometry.fromWkt(f"LINESTRING({x} 50, {x} {50 + length})"))
            f.setAttributes([h, count])
            features.append(f)
    layer.dataProvider().addFeatures(features)
    results, _ = _run(run_alg, tmp_path, layer, STRIP_WIDTH=40.0)
    # ratio estimator, Cochran (1977), eq. 6.1: Σy / Σ(w·L) per stratum, times the stratum area (km²)
    expected = sum(sum(counts[h]) / (40.0 * sum(lengths[h]) / 1e6) * area for h, area in ((1, 2.0), (2, 1.0)))
    assert results["ABUNDANCE"] == pytest.approx(expected, rel=1e-9)


def _strata_from(rects, name="strata"):
    """A strata layer of rectangles ``(x0, y0, x1, y1, stratum)``; a stratum of None is a NULL id."""
    from plotwise.processing import compat

    layer = QgsVectorLayer("Polygon?crs=EPSG:32633", name, "memory")
    layer.dataProvider().addAttributes([compat.make_field("stratum", "int")])
    layer.updateFields()
    features = []
    for x0, y0, x1, y1, stratum in rects:
        f = QgsFeature(layer.fields())
        f.setGeometry(QgsGeometry.fromWkt(f"POLYGON(({x0} {y0}, {x1} {y0}, {x1} {y1}, {x0} {y1}, {x0} {y0}))"))
        f.setAttributes([stratum])
        features.append(f)
    layer.dataProvider().addFeatures(features)
    return layer


def test_overlapping_strata_stop_the_run_naming_them(registered, run_alg, tmp_path):
    from shapely.geometry import box

    # a second polygon of stratum 2 lies inside stratum 1: 100 ha would be counted twice
    rects = [(0, 0, 1000, 2000, 1), (1000, 0, 2000, 1000, 2), (0, 500, 1000, 1500, 2)]
    with pytest.raises(QgsProcessingException) as err:
        _run(run_alg, tmp_path, _units_layer(), STRATA=_strata_from(rects, "strata_overlap"), AREA_UNIT=1)
    shared = box(*rects[0][:4]).intersection(box(*rects[2][:4])).area / 1e4  # shapely's intersection: 100 ha
    text = str(err.value)
    assert "'strata_overlap'" in text and f"1 and 2 ({shared:.4g} ha)" in text and "do not overlap" in text


def test_a_sliver_of_overlap_is_a_warning(registered, run_alg, tmp_path):
    from shapely.geometry import box

    rects = [(0, 0, 1000.5, 2000, 1), (1000, 0, 2000, 1000, 2)]  # stratum 1 overlaps 2 by a 0.5 m × 1 km sliver
    results, feedback = _run(run_alg, tmp_path, _units_layer(), STRATA=_strata_from(rects), AREA_UNIT=1)
    shared = box(*rects[0][:4]).intersection(box(*rects[1][:4])).area / 1e4  # shapely
    assert any("overlap" in w and f"1 and 2 ({shared:.4g} ha)" in w for w in feedback.warnings)
    assert "counted in more than one stratum" in (tmp_path / "estimate.html").read_text(encoding="utf-8")
    # the run goes on with each stratum's own area (shapely), the sliver counted in both (Cochran 1977, eq. 5.1)
    areas = [box(*r[:4]).area / 1e4 for r in rects]
    assert results["ABUNDANCE"] == pytest.approx(np.mean(COUNTS[1]) * areas[0] + np.mean(COUNTS[2]) * areas[1],
                                                 rel=1e-9)


def test_null_stratum_id_is_an_error_unless_left_out(registered, run_alg, tmp_path):
    rects = [(0, 0, 1000, 2000, 1), (1000, 0, 2000, 1000, 2), (1000, 1000, 2000, 2000, None)]
    strata = _strata_from(rects, "strata_null_id")
    null_fid = [f.id() for f in strata.getFeatures()][2]  # the third square has no id
    with pytest.raises(QgsProcessingException) as err:
        _run(run_alg, tmp_path, _units_layer(), STRATA=strata, AREA_UNIT=1)
    text = str(err.value)
    assert "'strata_null_id'" in text and "(NULL)" in text and f"feature id(s) {null_fid}" in text
    assert "100 ha" in text  # the 1 km² square no stratum covers
    results, feedback = _run(run_alg, tmp_path, _units_layer(), STRATA=strata, AREA_UNIT=1, DROP_EMPTY=True)
    total, _, _, _, _ = _expected(area_unit_m2=1e4)
    assert results["ABUNDANCE"] == pytest.approx(total, rel=1e-9)  # the frame of strata 1 and 2 (Cochran 1977)
    assert any("(NULL)" in w and "shrank" in w and str(null_fid) in w for w in feedback.warnings)


def test_bootstrap_interval_of_a_one_unit_stratum_holds_its_estimate(registered, run_alg, tmp_path):
    results, _ = _run(run_alg, tmp_path, _units_layer(counts={1: [3, 0, 5], 2: [10]}), CI_METHOD=2, SEED=5)
    rows = {f["stratum"]: f for f in _layer(results["OUTPUT_TABLE"]).getFeatures()}
    # 10 animals in a 1 ha unit of a 1 km² stratum: 1000 (ratio estimator, Cochran 1977, ch. 6)
    assert rows["2"]["abund"] == pytest.approx(1000.0, rel=1e-12)
    assert rows["2"]["abund_lo"] < 1000.0 < rows["2"]["abund_hi"]
    assert results["ABUNDANCE_LO"] < results["ABUNDANCE"] < results["ABUNDANCE_HI"]
    html = (tmp_path / "estimate.html").read_text(encoding="utf-8")
    assert "were paired with a partner fixed before the counts were seen" in html


def test_warnings_of_reading_the_layers_are_shown_once(registered, run_alg, tmp_path):
    # a bow-tie stratum polygon is repaired while reading, with one warning naming the feature
    strata = _strata_from([(0, 0, 1000, 2000, 1), (1000, 0, 2000, 1000, 2)])
    bowtie = QgsFeature(strata.fields())
    bowtie.setGeometry(QgsGeometry.fromWkt("POLYGON((3000 0, 3100 100, 3100 0, 3000 100, 3000 0))"))
    bowtie.setAttributes([2])
    strata.dataProvider().addFeatures([bowtie])
    _, feedback = _run(run_alg, tmp_path, _units_layer(), STRATA=strata)
    assert sum("invalid geometry repaired" in w for w in feedback.warnings) == 1


def _with_design(layer, design, edge="", reach=0.0):
    """A copy of ``layer`` whose units carry the layout's design record (fields design, edge, reach_m)."""
    from plotwise.processing import compat

    out = QgsVectorLayer("Polygon?crs=EPSG:32633", "units", "memory")
    out.dataProvider().addAttributes(list(layer.fields()) + [compat.make_field("design", "string", 10),
                                                              compat.make_field("edge", "string", 8),
                                                              compat.make_field("reach_m", "double")])
    out.updateFields()
    features = []
    for f in layer.getFeatures():
        g = QgsFeature(out.fields())
        g.setGeometry(f.geometry())
        g.setAttributes(list(f.attributes()) + [design, edge, reach])
        features.append(g)
    out.dataProvider().addFeatures(features)
    return out


def test_only_the_pinned_parameters_run(registered, run_alg):
    # DESIGN.md: a model naming only the pinned parameters must run (DETECTION_DF and the rest take defaults)
    results = run_alg("plotwise:estimate", {
        "UNITS": _units_layer(), "COUNT_FIELD": "count", "STRATUM_FIELD": "stratum", "UNIT_AREA_FIELD": "",
        "UNIT_AREA": 0.0, "STRATA": _strata_layer(), "STRATA_ID_FIELD": "stratum", "CONFIDENCE": 0.95,
        "CI_METHOD": 0, "FPC": False, "DETECTION_P": 1.0, "DETECTION_SE": 0.0, "AREA_UNIT": 0, "TARGET_CV": 0.0,
        "SEED": 1, "OUTPUT": "memory:", "OUTPUT_TABLE": "memory:"})
    assert results["ABUNDANCE"] == pytest.approx(_expected()[0], rel=1e-9)


def test_fpc_is_refused_for_units_that_may_overlap(registered, run_alg, tmp_path):
    # Cordy (1993): simple random centres form a continuous population, no correction; a grid's units do not
    # overlap, so the correction applies (Cochran 1977, §2.4); by hand with the textbook formulas above
    random_units, feedback = _run(run_alg, tmp_path, _with_design(_units_layer(), "random"), FPC=True)
    plain, _ = _run(run_alg, tmp_path, _units_layer(), FPC=False)
    assert random_units["ABUNDANCE_HI"] == pytest.approx(plain["ABUNDANCE_HI"], rel=1e-12)
    assert any("finite-population correction was not applied" in w for w in feedback.warnings)
    grid, _ = _run(run_alg, tmp_path, _with_design(_units_layer(), "grid"), FPC=True)
    assert grid["ABUNDANCE_HI"] < plain["ABUNDANCE_HI"]
    html = (tmp_path / "estimate.html").read_text(encoding="utf-8")
    assert "assumes that the units do not overlap" not in html  # recorded: nothing to assume
    _run(run_alg, tmp_path, _units_layer(), FPC=True)
    assert "assumes that the units do not overlap" in (tmp_path / "estimate.html").read_text(encoding="utf-8")


def test_plus_sampled_units_expand_to_the_grown_strata(registered, run_alg, tmp_path):
    # Gregoire & Valentine (2008), ch. 10: N_h = A⁺_h Σy / Σa. A rectangle buffered by d = R / cos(π/64) (the
    # plus region keeps its 16 chords per quarter circle outside the circle of radius R) has the area
    # A + P d + 32 d² sin(2π/64): its edges moved out by d, and the corners a regular 64-gon of circumradius d
    reach = 70.0
    d = reach / math.cos(math.pi / 64)
    results, _ = _run(run_alg, tmp_path, _with_design(_units_layer(), "random", "plus", reach))
    expected = 0.0
    for h, values in COUNTS.items():
        width, height = STRATA[h][1] - STRATA[h][0], STRATA[h][2]
        grown = width * height + 2 * (width + height) * d + 32 * d ** 2 * math.sin(2 * math.pi / 64)
        expected += np.mean(values) / UNIT_M2 * grown
    assert results["ABUNDANCE"] == pytest.approx(expected, rel=1e-9)


def test_detection_df_narrows_nothing_and_widens_the_interval(registered, run_alg, tmp_path):
    known, _ = _run(run_alg, tmp_path, _units_layer(), DETECTION_P=0.6, DETECTION_SE=0.1)
    few, feedback = _run(run_alg, tmp_path, _units_layer(), DETECTION_P=0.6, DETECTION_SE=0.1, DETECTION_DF=4)
    # Buckland et al. (2001), eq. 3.75: fewer df for p, a larger t quantile, the same estimate and SE
    assert few["ABUNDANCE"] == pytest.approx(known["ABUNDANCE"], rel=1e-12)
    assert few["ABUNDANCE_HI"] > known["ABUNDANCE_HI"]


def test_unknown_field_policy(registered, run_alg, tmp_path):
    # One policy for a field the layer lacks (PlotwiseAlgorithm.field_names): a field the user chose
    # is an error naming the layer, the parameter and the fields there are ...
    with pytest.raises(QgsProcessingException, match=r"Layer 'units' has no field 'strat' \(STRATUM_FIELD\)\. "
                                                     r"Its fields are: unit_id, stratum, count"):
        _run(run_alg, tmp_path, _units_layer(), STRATUM_FIELD="strat")
    # ... a required one at its default ("count") that the layer lacks too ...
    bare = QgsVectorLayer("Polygon?crs=EPSG:32633&field=unit_id:integer", "bare units", "memory")
    with pytest.raises(QgsProcessingException, match=r"Layer 'bare units' has no field 'count' \(COUNT_FIELD\)"):
        _run(run_alg, tmp_path, bare, STRATUM_FIELD=None)
    # ... while a default field the layer lacks is not used (here: the frame is one stratum)
    frame = QgsVectorLayer("Polygon?crs=EPSG:32633", "frame", "memory")
    f = QgsFeature(frame.fields())
    f.setGeometry(QgsGeometry.fromWkt("POLYGON((0 0, 2000 0, 2000 2000, 0 2000, 0 0))"))
    frame.dataProvider().addFeatures([f])
    results, feedback = _run(run_alg, tmp_path, _units_layer(), STRATA=frame)
    assert any("one stratum" in w for w in feedback.warnings)
