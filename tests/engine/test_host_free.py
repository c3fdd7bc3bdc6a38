"""The engine and the report builder never import the host (DESIGN.md: "Never imports qgis").

The engine tests run inside the host's test process, where ``qgis`` is already imported, so a stray
``import qgis`` in an engine module would pass them unnoticed. Here every module of
``processing/engine`` and ``processing/report`` is imported in a fresh interpreter in which any
import of ``qgis`` (or of the host's ``processing`` framework) raises.
"""
import subprocess
import sys
from pathlib import Path

REPO = Path(__file__).resolve().parents[2]
HOST_FREE = ("processing/engine", "processing/report")

PROBE = """
import importlib, importlib.abc, importlib.util, sys

class NoHost(importlib.abc.MetaPathFinder):
    def find_spec(self, name, path=None, target=None):
        if name.split(".")[0] in ("qgis", "processing"):
            raise ImportError("host module imported: " + name)
        return None

sys.meta_path.insert(0, NoHost())
sys.path[:] = [p for p in sys.path if p not in ("", ".")]
spec = importlib.util.spec_from_file_location("plotwise", {root!r} + "/__init__.py",
                                              submodule_search_locations=[{root!r}])
package = importlib.util.module_from_spec(spec)
sys.modules["plotwise"] = package
spec.loader.exec_module(package)
failed = []
for name in {modules!r}:
    try:
        importlib.import_module(name)
    except Exception as error:
        failed.append(name + ": " + repr(error))
print("\\n".join(failed))
sys.exit(1 if failed else 0)
"""


def _modules():
    names = []
    for folder in HOST_FREE:
        for path in sorted((REPO / folder).rglob("*.py")):
            parts = path.relative_to(REPO).with_suffix("").parts
            names.append(".".join(("plotwise",) + (parts[:-1] if parts[-1] == "__init__" else parts)))
    return names


def test_engine_and_report_modules_import_without_the_host():
    modules = _modules()
    assert len(modules) > 10  # the folders were found
    code = PROBE.format(root=str(REPO), modules=modules)
    done = subprocess.run([sys.executable, "-c", code], capture_output=True, text=True, timeout=120)
    assert done.returncode == 0, done.stdout + done.stderr
