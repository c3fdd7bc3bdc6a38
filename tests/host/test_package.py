"""The path a real user takes: the zip, a fresh host profile, qgis_process (issue 2)."""
import os
import subprocess
import zipfile
from pathlib import Path

import pytest

REPO = Path(__file__).resolve().parents[2]
QGIS_PROCESS = "/usr/bin/qgis_process.bin"  # the Debian wrapper passes a flag 3.22 rejects

pytestmark = pytest.mark.package


@pytest.fixture(scope="module")
def package_zip():
    run = subprocess.run(["make", "-s", "package"], cwd=REPO, capture_output=True, text=True, timeout=300)
    assert run.returncode == 0, run.stderr
    version = next(line.split("=", 1)[1] for line in (REPO / "metadata.txt").read_text().splitlines()
                   if line.startswith("version="))
    path = REPO / "dist" / f"plotwise-{version}.zip"
    assert path.exists()
    return path


def test_zip_holds_runtime_files_only(package_zip):
    names = zipfile.ZipFile(package_zip).namelist()
    assert {n.split("/")[0] for n in names} == {"plotwise"}
    for required in ("plotwise/__init__.py", "plotwise/metadata.txt", "plotwise/processing/provider.py",
                     "plotwise/LICENSE"):
        assert required in names
    for name in names:
        assert not name.startswith(("plotwise/tests/", "plotwise/.venv", "plotwise/scripts/", "plotwise/.git"))
        assert "__pycache__" not in name and not name.endswith(".pyc")


def test_zip_installs_and_runs_in_a_fresh_profile(package_zip, tmp_path):
    profile = tmp_path / "profile"
    plugins = profile / "profiles" / "default" / "python" / "plugins"
    plugins.mkdir(parents=True)
    zipfile.ZipFile(package_zip).extractall(plugins)
    env = dict(os.environ, QGIS_CUSTOM_CONFIG_PATH=str(profile), QT_QPA_PLATFORM="offscreen",
               XDG_RUNTIME_DIR=str(tmp_path))

    def qgis_process(*args):
        run = subprocess.run([QGIS_PROCESS, *args], capture_output=True, text=True, env=env, timeout=300)
        assert run.returncode == 0, run.stdout + run.stderr
        return run.stdout

    qgis_process("plugins", "enable", "plotwise")
    listing = qgis_process("list")
    assert "plotwise:demoreserve" in listing and "plotwise:simulatecounts" in listing
    out = tmp_path / "out"
    out.mkdir()
    stdout = qgis_process(
        "run", "plotwise:demoreserve", "--", "SEED=3", "CELL_SIZE=250",
        f"OUTPUT_AREA={out / 'area.gpkg'}", f"OUTPUT_EXCLUDED={out / 'excluded.gpkg'}",
        f"OUTPUT_ANIMALS={out / 'animals.gpkg'}", f"OUTPUT_ELEVATION={out / 'elevation.tif'}",
        f"OUTPUT_GREENNESS={out / 'greenness.tif'}", f"OUTPUT_INTENSITY={out / 'intensity.tif'}",
        f"REPORT={out / 'report.html'}",
    )
    assert "TRUE_TOTAL" in stdout
    assert (out / "animals.gpkg").exists() and (out / "report.html").exists()
    # the next steps of a season, as a script would call them: frame, then a layout with waypoints
    qgis_process(
        "run", "plotwise:buildframe", "--", f"INPUT={out / 'area.gpkg'}", f"EXCLUDE={out / 'excluded.gpkg'}",
        "EDGE_BUFFER=50", f"OUTPUT={out / 'frame.gpkg'}", f"REPORT={out / 'frame.html'}",
    )
    qgis_process(
        "run", "plotwise:layout", "--", f"FRAME={out / 'frame.gpkg'}", "N_UNITS=12", "DESIGN=2", "SHAPE=1",
        "SIZE=300", "RESERVE=2", "SEED=4", f"OUTPUT={out / 'units.gpkg'}", f"OUTPUT_GPX={out / 'units.gpx'}",
        f"REPORT={out / 'layout.html'}",
    )
    from osgeo import ogr

    gpx = ogr.Open(str(out / "units.gpx"))  # keep the dataset alive while its layer is read
    assert gpx.GetLayerByName("waypoints").GetFeatureCount() == 12 + 2  # one waypoint per square plot
