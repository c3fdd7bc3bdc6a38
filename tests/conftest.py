"""Make the repository importable as the package ``plotwise``, whatever the clone folder is called,
and end the test process cleanly (see the end of this file).

The host loads the plugin as a package named after its folder (``plotwise`` once
installed). In a clone the folder may have any name, so the package is registered
here under its installed name before any test imports it.
"""
import importlib.util
import os
import sys
from pathlib import Path

import pytest

REPO = Path(__file__).resolve().parents[1]
os.environ.setdefault("QT_QPA_PLATFORM", "offscreen")


def _register_package(name="plotwise"):
    if name in sys.modules:
        return sys.modules[name]
    spec = importlib.util.spec_from_file_location(
        name, REPO / "__init__.py", submodule_search_locations=[str(REPO)]
    )
    module = importlib.util.module_from_spec(spec)
    sys.modules[name] = module
    spec.loader.exec_module(module)
    return module


def _keep_host_processing_importable():
    """``python -m pytest`` puts the clone on sys.path, where our ``processing/`` folder would
    shadow the host's ``processing`` module. Our code is reached only as ``plotwise.processing``."""
    sys.path[:] = [p for p in sys.path if p not in ("", ".") and Path(p).resolve() != REPO]
    shadow = sys.modules.get("processing")
    if shadow is not None and str(REPO) in str(getattr(shadow, "__file__", "") or ""):
        for name in [n for n in sys.modules if n == "processing" or n.startswith("processing.")]:
            del sys.modules[name]


_keep_host_processing_importable()
_register_package()
import plotwise.processing.engine  # noqa: E402,F401  (points pyproj at PROJ's data before a test imports it)

# the host's Processing framework (module ``processing``) lives here on Debian
_HOST_PLUGINS = "/usr/share/qgis/python/plugins"
if os.path.isdir(_HOST_PLUGINS) and _HOST_PLUGINS not in sys.path:
    sys.path.insert(0, _HOST_PLUGINS)


# -- leaving the test process ----------------------------------------------------------
# A host object that a test leaves alive (a layer held by a caught exception's traceback,
# say) is destroyed by Python after QGIS has shut down, and PyQGIS then crashes the process
# after every test has passed and been reported. The process therefore ends right after
# pytest has reported, with pytest's own exit status. PLOTWISE_FULL_TEARDOWN=1 keeps the
# normal teardown (to hunt such objects).
_SESSION = {"status": None}


def pytest_sessionfinish(session, exitstatus):
    _SESSION["status"] = int(exitstatus)



@pytest.hookimpl(trylast=True)
def pytest_unconfigure(config):
    if _SESSION["status"] is not None and os.environ.get("PLOTWISE_FULL_TEARDOWN") != "1":
        sys.stdout.flush()
        sys.stderr.flush()
        os._exit(_SESSION["status"])
