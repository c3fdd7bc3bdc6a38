"""Every algorithm runs through qgis_process naming only the parameters and outputs pinned in
the design card (../shared/DESIGN.md, "Pinned interface"): models and scripts saved by users name
only those, so every output added later must be optional."""
import pytest

pytestmark = pytest.mark.slow


@pytest.fixture(scope="module")
def season(qgis_process, tmp_path_factory):
    """One season's chain, every step called with pinned names only; returns the output folder."""
    out = tmp_path_factory.mktemp("pinned")
    qgis_process(
        "run", "plotwise:demoreserve", "--", "SEED=3", "CELL_SIZE=250",
        f"OUTPUT_AREA={out / 'area.gpkg'}", f"OUTPUT_EXCLUDED={out / 'excluded.gpkg'}",
        f"OUTPUT_ELEVATION={out / 'elevation.tif'}", f"OUTPUT_GREENNESS={out / 'greenness.tif'}",
        f"OUTPUT_ANIMALS={out / 'animals.gpkg'}",
    )
    return out


def _run(qgis_process, algorithm, **parameters):
    stdout = qgis_process("run", algorithm, "--", *(f"{k}={v}" for k, v in parameters.items()))
    return stdout


def test_demoreserve_with_pinned_outputs_only(season):
    for name in ("area.gpkg", "excluded.gpkg", "elevation.tif", "greenness.tif", "animals.gpkg"):
        assert (season / name).exists()


def test_the_planning_and_estimation_chain_with_pinned_names_only(qgis_process, season):
    out = season
    _run(qgis_process, "plotwise:buildframe", INPUT=out / "area.gpkg", EXCLUDE=out / "excluded.gpkg",
         EDGE_BUFFER=50, OUTPUT=out / "frame.gpkg", REPORT=out / "frame.html")
    _run(qgis_process, "plotwise:stratify", FRAME=out / "frame.gpkg", COVARIATES=out / "greenness.tif",
         METHOD=0, STRATA=3, OUTPUT_RASTER=out / "strata.tif", OUTPUT=out / "strata.gpkg")
    stdout = _run(qgis_process, "plotwise:allocate", STRATA=out / "strata.gpkg", STRATUM_FIELD="stratum",
                  AREA_FIELD="area_ha", SD_FIELD="cov_sd", METHOD=2, TOTAL=24, UNIT_AREA=40000,
                  OUTPUT=out / "allocated.gpkg")
    assert "EXPECTED_CV" in stdout
    _run(qgis_process, "plotwise:layout", FRAME=out / "allocated.gpkg", STRATUM_FIELD="stratum",
         N_FIELD="n_alloc", DESIGN=2, SHAPE=1, SIZE=200, RESERVE=1, SEED=4,
         OUTPUT=out / "units.gpkg", OUTPUT_GPX=out / "units.gpx")
    _run(qgis_process, "plotwise:simulatecounts", UNITS=out / "units.gpkg", ANIMALS=out / "animals.gpkg",
         DETECTION=1, SEED=5, OUTPUT=out / "counted.gpkg")
    stdout = _run(qgis_process, "plotwise:estimate", UNITS=out / "counted.gpkg", COUNT_FIELD="count",
                  STRATUM_FIELD="stratum", STRATA=out / "strata.gpkg", STRATA_ID_FIELD="stratum",
                  OUTPUT=out / "estimate.gpkg", OUTPUT_TABLE=out / "estimate_table.gpkg")
    assert "ABUNDANCE" in stdout
    stdout = _run(qgis_process, "plotwise:comparedesigns", SURFACE=out / "greenness.tif", FRAME=out / "frame.gpkg",
                  STRATA=out / "strata.gpkg", N_UNITS=12, SHAPE=1, SIZE=200, REPLICATES=20, SEED=6,
                  OUTPUT_TABLE=out / "designs.gpkg")
    for name in ("frame.gpkg", "strata.tif", "strata.gpkg", "allocated.gpkg", "units.gpkg", "units.gpx",
                 "counted.gpkg", "estimate.gpkg", "estimate_table.gpkg", "designs.gpkg"):
        assert (out / name).exists(), name
