"""Host fixtures: Processing initialised (pytest-qgis) and the Plotwise provider registered."""
import pytest


@pytest.fixture(scope="session")
def plotwise_provider(qgis_app, qgis_processing):
    """The ``plotwise`` provider, registered once for the whole test session."""
    from qgis.core import QgsApplication

    from plotwise.processing.provider import PlotwiseProvider

    registry = QgsApplication.processingRegistry()
    provider = registry.providerById("plotwise")
    if provider is None:
        provider = PlotwiseProvider()
        assert registry.addProvider(provider)
    return provider


@pytest.fixture()
def run_alg(plotwise_provider):
    """Run a Processing algorithm by id and return its results (raises QgsProcessingException on failure)."""
    import processing
    from qgis.core import QgsProcessingFeedback

    def run(algorithm_id, parameters, feedback=None, context=None):
        return processing.run(algorithm_id, parameters, feedback=feedback or QgsProcessingFeedback(), context=context)

    return run


@pytest.fixture(scope="session")
def demo_reserve_outputs(plotwise_provider, tmp_path_factory):
    """One demo reserve (seed 11, 100 m cells) written to files, shared by host tests."""
    import processing

    folder = tmp_path_factory.mktemp("demo_reserve")
    results = processing.run(
        "plotwise:demoreserve",
        {
            "SEED": 11,
            "CELL_SIZE": 100.0,
            "OUTPUT_AREA": str(folder / "area.gpkg"),
            "OUTPUT_EXCLUDED": str(folder / "excluded.gpkg"),
            "OUTPUT_ELEVATION": str(folder / "elevation.tif"),
            "OUTPUT_GREENNESS": str(folder / "greenness.tif"),
            "OUTPUT_INTENSITY": str(folder / "intensity.tif"),
            "OUTPUT_ANIMALS": str(folder / "animals.gpkg"),
            "REPORT": str(folder / "demoreserve.html"),
        },
    )
    return results


@pytest.fixture(scope="session")
def qgis_process(tmp_path_factory):
    """Run ``qgis_process.bin`` as a user would, in a throwaway profile holding this clone as
    the enabled plugin ``plotwise``. Returns ``run(*args) -> stdout``; a failing run fails the test."""
    import os
    import subprocess
    from pathlib import Path

    repo = Path(__file__).resolve().parents[2]
    home = tmp_path_factory.mktemp("qgis_process_profile")
    plugins = home / "profiles" / "default" / "python" / "plugins"
    plugins.mkdir(parents=True)
    (plugins / "plotwise").symlink_to(repo, target_is_directory=True)
    env = dict(os.environ, QGIS_CUSTOM_CONFIG_PATH=str(home), QT_QPA_PLATFORM="offscreen", XDG_RUNTIME_DIR=str(home))

    def run(*args, check=True):
        done = subprocess.run(["/usr/bin/qgis_process.bin", *map(str, args)], capture_output=True, text=True,
                              env=env, timeout=600)
        if check:
            assert done.returncode == 0, done.stdout[-4000:] + done.stderr[-4000:]
        return done.stdout if check else done

    run("plugins", "enable", "plotwise")
    return run
