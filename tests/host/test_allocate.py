"""plotwise:allocate run through the host's Processing framework on a small memory layer."""
import math

import pytest

qgis_core = pytest.importorskip("qgis.core")
from qgis.core import (  # noqa: E402
    QgsApplication,
    QgsFeature,
    QgsGeometry,
    QgsProcessingException,
    QgsVectorLayer,
)


@pytest.fixture
def plotwise_registered(plotwise_provider):
    """The plotwise provider from tests/host/conftest.py, with this algorithm in it."""
    registry = QgsApplication.processingRegistry()
    assert registry.algorithmById("plotwise:allocate") is not None
    return registry


def _strata_layer(rows):
    """Square strata side by side in EPSG:32633, with the fields of plotwise:stratify plus pilot figures."""
    layer = QgsVectorLayer("Polygon?crs=EPSG:32633", "strata", "memory")
    from plotwise.processing import compat

    layer.dataProvider().addAttributes(
        [compat.make_field(n, k) for n, k in (
            ("stratum", "int"), ("area_ha", "double"), ("cov_sd", "double"),
            ("sd_c", "double"), ("mean_c", "double"), ("days", "double"))]
    )
    layer.updateFields()
    features, x = [], 0.0
    for stratum, area_ha, cov_sd, sd_c, mean_c, days in rows:
        side = math.sqrt((area_ha if area_ha else 1.0) * 1e4)
        feature = QgsFeature(layer.fields())
        feature.setGeometry(QgsGeometry.fromWkt(
            f"POLYGON(({x} 0, {x + side} 0, {x + side} {side}, {x} {side}, {x} 0))"))
        feature.setAttributes([stratum, area_ha, cov_sd, sd_c, mean_c, days])
        features.append(feature)
        x += side + 10
    layer.dataProvider().addFeatures(features)
    return layer


ROWS = [  # stratum, area_ha, cov_sd, sd_c, mean_c, days
    (1, 400.0, 12.0, 2.0, 1.5, 0.5),
    (2, 250.0, 30.0, 6.0, 5.0, 1.0),
    (3, 90.0, 45.0, 9.0, 8.0, 2.0),
]


def test_neyman_total_fields_and_report(plotwise_registered, tmp_path):
    import processing

    layer = _strata_layer(ROWS)
    report = tmp_path / "allocation.html"
    result = processing.run("plotwise:allocate", {
        "STRATA": layer, "STRATUM_FIELD": "stratum", "AREA_FIELD": "area_ha", "SD_FIELD": "sd_c",
        "MEAN_FIELD": "mean_c", "METHOD": 2, "TOTAL": 60, "UNIT_AREA": 10000.0, "MIN_PER_STRATUM": 2,
        "OUTPUT": "memory:", "REPORT": str(report),
    })
    out = result["OUTPUT"]
    names = out.fields().names()
    assert names[:6] == ["stratum", "area_ha", "cov_sd", "sd_c", "mean_c", "days"]  # input fields kept
    assert "n_alloc" in names and "exp_cv" in names
    n = {f["stratum"]: f["n_alloc"] for f in out.getFeatures()}
    assert sum(n.values()) == 60  # the requested total, exactly
    # Neyman (1934): n_h ∝ A_h S_h = 800, 1500, 810 of 3110
    expected = {1: 60 * 800 / 3110, 2: 60 * 1500 / 3110, 3: 60 * 810 / 3110}
    assert all(abs(n[h] - expected[h]) < 1 for h in n)
    assert 0 < result["EXPECTED_CV"] < 1
    assert all(0 < f["exp_cv"] < 1 for f in out.getFeatures())
    html = report.read_text(encoding="utf-8")
    assert "Neyman" in html and "proportional" in html and "<script" not in html
    assert layer.fields().names() == ["stratum", "area_ha", "cov_sd", "sd_c", "mean_c", "days"]  # input untouched


def test_cov_sd_proxy_and_field_days(plotwise_registered):
    import processing

    result = processing.run("plotwise:allocate", {
        "STRATA": _strata_layer(ROWS), "COST_FIELD": "days", "COST_IN_DAYS": True, "FIXED_COST": 3.0,
        "METHOD": 3, "BUDGET": 40.0, "UNIT_AREA": 10000.0, "OUTPUT": "memory:",
    })
    out = result["OUTPUT"]
    n = [f["n_alloc"] for f in out.getFeatures()]
    days = [r[5] for r in ROWS]
    assert 3.0 + sum(c * k for c, k in zip(days, n)) <= 40.0  # within the budget of field days
    assert all(k >= 2 for k in n)
    assert result["EXPECTED_CV"] is None  # no mean field


def test_zero_area_is_an_error_naming_the_feature(plotwise_registered):
    import processing

    rows = [ROWS[0], (2, 0.0, 30.0, 6.0, 5.0, 1.0), ROWS[2]]
    with pytest.raises(QgsProcessingException) as err:
        processing.run("plotwise:allocate", {
            "STRATA": _strata_layer(rows), "AREA_FIELD": "area_ha", "SD_FIELD": "sd_c", "METHOD": 2,
            "TOTAL": 20, "UNIT_AREA": 10000.0, "OUTPUT": "memory:",
        })
    message = str(err.value)
    assert "area_ha" in message and "zero" in message


def test_budget_below_minimum_gives_the_minimum(plotwise_registered):
    import processing

    # minimum = c0 + 2 * (0.5 + 1 + 2) = 1 + 7 = 8
    with pytest.raises(QgsProcessingException, match="minimum of 8"):
        processing.run("plotwise:allocate", {
            "STRATA": _strata_layer(ROWS), "SD_FIELD": "sd_c", "COST_FIELD": "days", "FIXED_COST": 1.0,
            "METHOD": 3, "BUDGET": 7.5, "UNIT_AREA": 10000.0, "OUTPUT": "memory:",
        })


class _Feedback(qgis_core.QgsProcessingFeedback):
    def __init__(self):
        super().__init__()
        self.warnings = []

    def pushWarning(self, warning):  # noqa: N802 (host naming)
        self.warnings.append(warning)
        super().pushWarning(warning)


def test_polygon_area_and_cov_sd_proxy_warning(plotwise_registered):
    import processing

    feedback = _Feedback()
    result = processing.run("plotwise:allocate", {
        "STRATA": _strata_layer(ROWS), "AREA_FIELD": None, "METHOD": 1, "TOTAL": 74,
        "UNIT_AREA": 10000.0, "OUTPUT": "memory:",
    }, feedback=feedback)
    # proportional to the polygon areas 400, 250, 90 ha (Cochran 1977, ch. 5): 40, 25, 9
    assert [f["n_alloc"] for f in result["OUTPUT"].getFeatures()] == [40, 25, 9]
    assert any("cov_sd" in w and "proxy" in w for w in feedback.warnings)


def test_duplicate_stratum_id_is_an_error_naming_features_and_remedy(plotwise_registered):
    import processing

    # truth by construction: stratum 1 is split over features 1 and 2 (memory-layer ids start at 1)
    rows = [ROWS[0], (1, 250.0, 30.0, 6.0, 5.0, 1.0), ROWS[2]]
    layer = _strata_layer(rows)
    with pytest.raises(QgsProcessingException) as err:
        processing.run("plotwise:allocate", {
            "STRATA": layer, "STRATUM_FIELD": "stratum", "AREA_FIELD": "area_ha", "SD_FIELD": "sd_c",
            "METHOD": 2, "TOTAL": 30, "UNIT_AREA": 10000.0, "OUTPUT": "memory:",
        })
    text = str(err.value)
    assert "Features 1, 2" in text and "stratum id 1 " in text and "'stratum'" in text and "'strata'" in text
    assert "Dissolve" in text
    del err


def test_null_stratum_id_is_an_error_naming_the_feature(plotwise_registered):
    import processing

    # truth by construction: feature 2 has no stratum id
    rows = [ROWS[0], (None, 250.0, 30.0, 6.0, 5.0, 1.0), ROWS[2]]
    with pytest.raises(QgsProcessingException) as err:
        processing.run("plotwise:allocate", {
            "STRATA": _strata_layer(rows), "STRATUM_FIELD": "stratum", "AREA_FIELD": "area_ha", "METHOD": 1,
            "TOTAL": 30, "UNIT_AREA": 10000.0, "OUTPUT": "memory:",
        })
    text = str(err.value)
    assert "NULL" in text and "feature(s) 2." in text and "'stratum'" in text and "'strata'" in text
    del err


def test_layout_design_decides_the_finite_population_correction(plotwise_registered, tmp_path):
    # Cochran (1977), ch. 5: V = Σ W² S² (1 − f) / n for non-overlapping units; simple random centres may overlap
    # and get no correction (Cordy 1993), so their expected CV is larger at the same allocation
    import processing

    common = {"STRATA": _strata_layer(ROWS), "STRATUM_FIELD": "stratum", "AREA_FIELD": "area_ha", "SD_FIELD": "sd_c",
              "MEAN_FIELD": "mean_c", "METHOD": 2, "TOTAL": 60, "UNIT_AREA": 100000.0, "OUTPUT": "memory:",
              "REPORT": str(tmp_path / "a.html")}
    grid = processing.run("plotwise:allocate", dict(common, LAYOUT_DESIGN=2))
    srs = processing.run("plotwise:allocate", dict(common, LAYOUT_DESIGN=0))
    assert srs["EXPECTED_CV"] > grid["EXPECTED_CV"]
    assert "without a finite-population correction" in (tmp_path / "a.html").read_text(encoding="utf-8")
