"""A headless QGIS with Processing and the Plotwise provider, for the scripts in this folder."""
import os
import sys
from pathlib import Path

REPO = Path(__file__).resolve().parents[1]


def start_host():
    """Start QGIS without a GUI, initialise Processing, register the clone's provider.

    Returns ``(app, processing)``. The clone is imported as the package ``plotwise``
    (tests/conftest.py), and our ``processing/`` folder is kept off ``sys.path`` so that it
    does not shadow the host's ``processing`` module.
    """
    os.environ.setdefault("QT_QPA_PLATFORM", "offscreen")
    sys.path[:] = [p for p in sys.path if p not in ("", ".") and Path(p).resolve() not in (REPO, REPO / "scripts")]
    sys.path.insert(0, "/usr/share/qgis/python/plugins")
    sys.path.insert(0, str(REPO / "tests"))
    import conftest  # noqa: F401  (registers the clone as the package `plotwise`)
    from qgis.core import QgsApplication

    app = QgsApplication([], False)
    app.initQgis()
    import processing
    from processing.core.Processing import Processing

    Processing.initialize()
    from plotwise.processing.provider import PlotwiseProvider

    provider = PlotwiseProvider()
    if not QgsApplication.processingRegistry().addProvider(provider):
        raise SystemExit("The Plotwise provider could not be registered.")
    app.plotwise_provider = provider  # keep a reference for the whole run
    return app, processing


def stop_host():
    """Leave at once: PyQGIS can crash while tearing down a standalone application."""
    sys.stdout.flush()
    sys.stderr.flush()
    os._exit(0)
