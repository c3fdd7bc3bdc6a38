"""The example chains in processing/models run headless on the demo reserve (issue 7)."""
import pytest


@pytest.fixture(scope="module")
def slope_raster(plotwise_provider, demo_reserve_outputs, tmp_path_factory):
    import processing

    path = str(tmp_path_factory.mktemp("slope") / "slope.tif")
    processing.run("native:slope", {"INPUT": demo_reserve_outputs["OUTPUT_ELEVATION"], "Z_FACTOR": 1.0, "OUTPUT": path})
    return path


def test_example_chains_are_offered(plotwise_provider):
    ids = {a.id() for a in plotwise_provider.algorithms()}
    assert {"plotwise:plan_survey", "plotwise:estimate_simulated_counts"} <= ids


def test_plan_survey_chain_runs(run_alg, demo_reserve_outputs, slope_raster, tmp_path):
    from qgis.core import QgsVectorLayer

    results = run_alg("plotwise:plan_survey", {
        "study_area": demo_reserve_outputs["OUTPUT_AREA"],
        "exclusions": demo_reserve_outputs["OUTPUT_EXCLUDED"],
        "slope": slope_raster, "max_slope": 30.0,
        "covariates": [demo_reserve_outputs["OUTPUT_GREENNESS"], demo_reserve_outputs["OUTPUT_ELEVATION"]],
        "n_strata": 3, "total_units": 20, "plot_side": 400.0, "seed": 5,
        "units:Sample units": str(tmp_path / "units.gpkg"),
        "units:Waypoints (GPX)": str(tmp_path / "units.gpx"),
        "units:Layout report": str(tmp_path / "layout.html"),
        "effort:Strata with units allocated": str(tmp_path / "effort.gpkg"),
        "frame:Sampling frame": "TEMPORARY_OUTPUT", "strata:Strata": "TEMPORARY_OUTPUT",
    })
    units = QgsVectorLayer(results["units:Sample units"], "units", "ogr")
    roles = [f["role"] for f in units.getFeatures()]
    assert roles.count("primary") == 20  # the TOTAL asked of the allocation (exact by construction)
    assert roles.count("reserve") == 3 * 3  # 3 reserves in each of the 3 strata
    effort = QgsVectorLayer(results["effort:Strata with units allocated"], "effort", "ogr")
    assert sum(f["n_alloc"] for f in effort.getFeatures()) == 20
    assert (tmp_path / "units.gpx").exists() and (tmp_path / "layout.html").exists()


def test_estimate_chain_runs(run_alg, demo_reserve_outputs, tmp_path):
    from qgis.core import QgsVectorLayer

    layout = run_alg("plotwise:layout", {
        "FRAME": demo_reserve_outputs["OUTPUT_AREA"], "N_UNITS": 30, "DESIGN": 0, "SHAPE": 1, "SIZE": 400.0,
        "BEARING": 0.0, "SEED": 8, "OUTPUT": str(tmp_path / "units.gpkg"), "OUTPUT_GPX": str(tmp_path / "u.gpx"),
        "REPORT": str(tmp_path / "layout.html"),
    })
    results = run_alg("plotwise:estimate_simulated_counts", {
        "units": layout["OUTPUT"], "animals": demo_reserve_outputs["OUTPUT_ANIMALS"],
        "strata": demo_reserve_outputs["OUTPUT_AREA"], "detection": 1.0, "seed": 9,
        "estimate:Estimate table": str(tmp_path / "table.gpkg"),
        "estimate:Estimate report": str(tmp_path / "estimate.html"),
        "counts:Units with counts": "TEMPORARY_OUTPUT", "estimate:Estimate by stratum": "TEMPORARY_OUTPUT",
    })
    table = QgsVectorLayer(results["estimate:Estimate table"], "table", "ogr")
    rows = {str(f["stratum"]): f for f in table.getFeatures()}
    assert "all" in rows and rows["all"]["n"] == 30
    # the overall abundance is density × frame area (Cochran 1977 §5.2, by construction of the estimator)
    assert rows["all"]["abund"] == pytest.approx(rows["all"]["dens"] * rows["all"]["area"], rel=1e-9)
