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
    from qgis.core import QgsProcessingContext, QgsProcessingFeedback

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
