"""plotwise:panels, plotwise:trendpower and plotwise:trend through the host's Processing framework and
through qgis_process with only their pinned parameters.

Outside references: statsmodels' Poisson GLM (test-only) for the change per year from unit counts; the
definition of the revisit designs (McDonald 2003) for the visit years; GDAL (ogr) to write the inputs that
qgis_process reads.
"""
import numpy as np
import pytest
from recording_feedback import RecordingFeedback

pytest.importorskip("qgis.core")
from qgis.core import NULL, QgsFeature, QgsGeometry, QgsProcessingException, QgsVectorLayer  # noqa: E402

FRAME = [  # stratum, polygon (EPSG:32736, invented)
    (1, "POLYGON((500000 9000000, 506000 9000000, 506000 9004000, 500000 9004000, 500000 9000000))"),
    (2, "POLYGON((506000 9000000, 509000 9000000, 509000 9004000, 506000 9004000, 506000 9000000))"),
]


def frame_layer():
    from plotwise.processing import compat

    layer = QgsVectorLayer("Polygon?crs=EPSG:32736", "frame", "memory")
    layer.dataProvider().addAttributes([compat.make_field("stratum", "int")])
    layer.updateFields()
    for stratum, wkt in FRAME:
        feature = QgsFeature(layer.fields())
        feature.setAttributes([stratum])
        feature.setGeometry(QgsGeometry.fromWkt(wkt))
        layer.dataProvider().addFeature(feature)
    return layer


def table_layer(name, fields, rows):
    from plotwise.processing import compat

    layer = QgsVectorLayer("None", name, "memory")
    layer.dataProvider().addAttributes([compat.make_field(n, k) for n, k in fields])
    layer.updateFields()
    features = []
    for row in rows:
        feature = QgsFeature(layer.fields())
        feature.setAttributes(list(row))
        features.append(feature)
    layer.dataProvider().addFeatures(features)
    return layer


@pytest.fixture
def layout(run_alg):
    def make(design=2, n=60, seed=4, output="memory:"):
        return run_alg("plotwise:layout", {
            "FRAME": frame_layer(), "STRATUM_FIELD": "stratum", "N_UNITS": n, "DESIGN": design, "SHAPE": 1,
            "SIZE": 200.0, "RESERVE": 2, "SEED": seed, "OUTPUT": output})["OUTPUT"]
    return make


def test_panels_give_each_unit_the_years_of_its_panel(run_alg, layout, tmp_path):
    feedback = RecordingFeedback()
    result = run_alg("plotwise:panels", {
        "UNITS": layout(), "PANEL_DESIGN": 2, "PANELS": 3, "CORE_SHARE": 0.3, "START_YEAR": 2030, "YEARS": 9,
        "UNIT_DAYS": 0.5, "OUTPUT": "memory:", "OUTPUT_SCHEDULE": "memory:", "REPORT": str(tmp_path / "p.html")},
        feedback=feedback)
    units = list(result["OUTPUT"].getFeatures())
    assert len(units) == 60 + 2 * 2
    for unit in units:
        if unit["role"] == "reserve":
            assert unit["panel"] == NULL and unit["years"] == NULL  # reserves get no panel
            continue
        panel = unit["panel"]
        # McDonald (2003): the core every year, rotating panel p in 2030 + (p − 1) + 3m
        wanted = list(range(2030, 2039)) if panel == 0 else list(range(2030 + panel - 1, 2039, 3))
        assert [int(y) for y in unit["years"].split(",")] == wanted
    schedule = list(result["OUTPUT_SCHEDULE"].getFeatures())
    assert {f["year"] for f in schedule} == set(range(2030, 2039))
    assert sum(f["n_units"] for f in schedule) == sum(len(u["years"].split(",")) for u in units if u["years"] != NULL)
    assert all(f["days"] == pytest.approx(0.5 * f["n_units"]) for f in schedule)
    assert not any("evenly spread" in w for w in feedback.warnings)  # a balanced layout
    html = (tmp_path / "p.html").read_text(encoding="utf-8")
    assert "Schedule" in html and "<svg" in html and "Field safety" in html


def test_panels_warn_when_the_layout_was_simple_random(run_alg, layout):
    feedback = RecordingFeedback()
    run_alg("plotwise:panels", {"UNITS": layout(design=0, n=90, seed=6), "PANEL_DESIGN": 1, "PANELS": 3,
                                "START_YEAR": 2030, "YEARS": 9, "OUTPUT": "memory:", "OUTPUT_SCHEDULE": "memory:"},
            feedback=feedback)
    assert any("simple random (its units' design field says so)" in w for w in feedback.warnings)


def test_panels_without_a_design_record_rely_on_the_check(run_alg, layout):
    import processing

    bare = processing.run("native:deletecolumn", {"INPUT": layout(design=0, n=90, seed=6), "COLUMN": ["design"],
                                                  "OUTPUT": "memory:"})["OUTPUT"]
    feedback = RecordingFeedback()
    run_alg("plotwise:panels", {"UNITS": bare, "PANEL_DESIGN": 1, "PANELS": 3, "START_YEAR": 2030, "YEARS": 9,
                                "OUTPUT": "memory:", "OUTPUT_SCHEDULE": "memory:"}, feedback=feedback)
    assert any("not more evenly spread than random parts" in w for w in feedback.warnings)


def test_panels_reject_too_many_panels(run_alg, layout):
    with pytest.raises(QgsProcessingException, match="never be visited"):
        run_alg("plotwise:panels", {"UNITS": layout(), "PANEL_DESIGN": 1, "PANELS": 6, "START_YEAR": 2030,
                                    "YEARS": 4, "OUTPUT": "memory:", "OUTPUT_SCHEDULE": "memory:"})


def count_rows(seed=1):
    rng = np.random.default_rng(seed)
    rows = []
    for i in range(30):
        level = rng.normal(1.0, 0.7)
        for t in range(8):
            rows.append([f"u{i}", 2015 + t, int(rng.poisson(np.exp(level - 0.05 * t + rng.normal(0, 0.1)))),
                         1 + i % 2])
    return rows


def test_trend_from_unit_counts_equals_the_poisson_glm(run_alg, tmp_path):
    import statsmodels.api as sm

    rows = count_rows()
    layer = table_layer("counts", [("unit_id", "string"), ("year", "int"), ("count", "int"), ("stratum", "int")],
                        rows)
    result = run_alg("plotwise:trend", {"INPUT": layer, "SOURCE": 0, "STRATUM_FIELD": "stratum",
                                        "OUTPUT_TABLE": "memory:", "REPORT": str(tmp_path / "t.html")})
    units = sorted({r[0] for r in rows})
    X = np.column_stack([np.array([[r[0] == u for u in units] for r in rows], dtype=float),
                         [r[1] - 2018.5 for r in rows]])
    glm = sm.GLM(np.array([r[2] for r in rows], dtype=float), X, family=sm.families.Poisson()).fit(tol=1e-13)
    assert result["CHANGE"] == pytest.approx(100 * np.expm1(glm.params[-1]), abs=1e-6)  # statsmodels
    assert result["CHANGE_LO"] < result["CHANGE"] < result["CHANGE_HI"] and 0 <= result["P_VALUE"] <= 1
    index = list(result["OUTPUT_TABLE"].getFeatures())
    assert [f["year"] for f in index] == list(range(2015, 2023))
    assert all(f["index_lo"] < f["index"] < f["index_hi"] for f in index)
    html = (tmp_path / "t.html").read_text(encoding="utf-8")
    assert "per year, 95% interval" in html and "only if detection did not change" in html


def test_trend_from_yearly_estimates_uses_the_overall_rows(run_alg):
    rng = np.random.default_rng(2)
    rows = []
    for t in range(9):
        total = float(800 * 0.96 ** t * np.exp(rng.normal(0, 0.1)))
        rows += [["1", 2010 + t, total * 0.6, total * 0.1], ["2", 2010 + t, total * 0.4, total * 0.1],
                 ["all", 2010 + t, total, total * 0.15]]
    layer = table_layer("estimates", [("stratum", "string"), ("year", "int"), ("abund", "double"),
                                      ("abund_se", "double")], rows)
    result = run_alg("plotwise:trend", {"INPUT": layer, "SOURCE": 1, "STRATUM_FIELD": "stratum",
                                        "OUTPUT_TABLE": "memory:"})
    table = list(result["OUTPUT_TABLE"].getFeatures())
    assert len(table) == 9
    assert [f["index"] for f in table] == pytest.approx([r[2] for r in rows if r[0] == "all"])
    assert -20 < result["CHANGE"] < 10


def test_trend_names_the_records_counted_twice(run_alg):
    layer = table_layer("counts", [("unit_id", "string"), ("year", "int"), ("count", "int")],
                        [["a", 2020, 1], ["a", 2020, 3], ["b", 2021, 2], ["b", 2022, 2]])
    with pytest.raises(QgsProcessingException, match="counted twice"):
        run_alg("plotwise:trend", {"INPUT": layer, "SOURCE": 0, "OUTPUT_TABLE": "memory:"})


def test_trendpower_table_and_a_panels_layer_as_the_design(run_alg, layout, tmp_path):
    result = run_alg("plotwise:trendpower", {
        "N_UNITS": 40, "YEARS": 8, "PANEL_DESIGN": 2, "PANELS": 3, "CORE_SHARE": 0.3, "CHANGES": "-5, -10",
        "REPLICATES": 100, "SEED": 3, "OUTPUT_TABLE": "memory:", "REPORT": str(tmp_path / "power.html")})
    rows = list(result["OUTPUT_TABLE"].getFeatures())
    assert {f["change"] for f in rows} == {-5.0, -10.0}
    assert all(0 <= f["power"] <= 1 and f["power_se"] == pytest.approx(np.sqrt(f["power"] * (1 - f["power"]) / 100))
               for f in rows)
    assert "Power against years" in (tmp_path / "power.html").read_text(encoding="utf-8")
    panels = run_alg("plotwise:panels", {"UNITS": layout(), "PANEL_DESIGN": 1, "PANELS": 2, "START_YEAR": 2030,
                                         "YEARS": 6, "OUTPUT": "memory:", "OUTPUT_SCHEDULE": "memory:"})["OUTPUT"]
    from_layer = run_alg("plotwise:trendpower", {"PANEL_LAYER": panels, "CHANGES": "-8", "REPLICATES": 50,
                                                 "SEED": 1, "OUTPUT_TABLE": "memory:"})["OUTPUT_TABLE"]
    planned = [f for f in from_layer.getFeatures() if f["years"] == 6 and f["n_units"] == 60]
    assert len(planned) == 1  # the layer's 60 primary units over its 6 years


# -- qgis_process with only the pinned parameters (the shared qgis_process fixture of conftest.py) ------
def write_counts_gpkg(path):
    from osgeo import ogr

    source = ogr.GetDriverByName("GPKG").CreateDataSource(str(path))
    layer = source.CreateLayer("counts", geom_type=ogr.wkbNone)
    for name, kind in (("unit_id", ogr.OFTString), ("year", ogr.OFTInteger), ("count", ogr.OFTInteger)):
        layer.CreateField(ogr.FieldDefn(name, kind))
    for unit, year, count, _ in count_rows():
        feature = ogr.Feature(layer.GetLayerDefn())
        feature.SetField("unit_id", unit)
        feature.SetField("year", year)
        feature.SetField("count", count)
        layer.CreateFeature(feature)
    source = None


def test_the_three_algorithms_run_in_qgis_process_with_pinned_parameters_only(qgis_process, layout, tmp_path):
    run, base = qgis_process, tmp_path
    units = base / "units.gpkg"
    layout(output=str(units))
    out = run("run", "plotwise:panels", "--", f"UNITS={units}", "PANEL_DESIGN=2", "PANELS=3", "CORE_SHARE=0.3",
              "START_YEAR=2030", "YEARS=9", f"OUTPUT={base / 'panels.gpkg'}",
              f"OUTPUT_SCHEDULE={base / 'schedule.gpkg'}")
    assert (base / "panels.gpkg").exists() and (base / "schedule.gpkg").exists()
    out = run("run", "plotwise:trendpower", "--", "N_UNITS=30", "YEARS=6", "PANEL_DESIGN=0", "PANELS=3",
              "CORE_SHARE=0.3", "CHANGES=-5", "MEAN_COUNT=5", "SD_UNIT=1", "SD_UNIT_YEAR=0.3", "SD_YEAR=0.1",
              "DETECTION=1", "ALPHA=0.05", "TWO_SIDED=true", "REPLICATES=50", "SEED=2",
              f"OUTPUT_TABLE={base / 'power.gpkg'}")
    assert (base / "power.gpkg").exists()
    counts = base / "counts.gpkg"
    write_counts_gpkg(counts)
    out = run("run", "plotwise:trend", "--", f"INPUT={counts}", "SOURCE=0", "UNIT_ID_FIELD=unit_id",
              "YEAR_FIELD=year", "COUNT_FIELD=count", "CONFIDENCE=0.95", f"OUTPUT_TABLE={base / 'index.gpkg'}")
    assert "CHANGE" in out and "P_VALUE" in out and (base / "index.gpkg").exists()


def test_panels_style_colours_each_panel(run_alg, layout):
    from qgis.core import QgsCategorizedSymbolRenderer

    from plotwise.processing import styles

    units = run_alg("plotwise:panels", {"UNITS": layout(), "PANEL_DESIGN": 1, "PANELS": 3, "START_YEAR": 2030,
                                        "YEARS": 6, "OUTPUT": "memory:", "OUTPUT_SCHEDULE": "memory:"})["OUTPUT"]
    assert styles.apply_style(units, "panels")
    renderer = units.renderer()
    assert isinstance(renderer, QgsCategorizedSymbolRenderer) and renderer.classAttribute() == "panel"
    values = {c.value() for c in renderer.categories()}
    assert {1, 2, 3} <= values  # one category per panel (and one for the reserves without a panel)
