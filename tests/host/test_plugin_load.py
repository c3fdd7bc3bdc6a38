"""Loading the plugin the way the host does: provider registration, unload, missing libraries."""
import json
import os
import subprocess
import sys
import textwrap
from pathlib import Path

REPO = Path(__file__).resolve().parents[2]


LOADER = textwrap.dedent(
    f"""
    import json, os, sys
    os.environ["QT_QPA_PLATFORM"] = "offscreen"
    BLOCK_SHAPELY = {{block}}
    if BLOCK_SHAPELY:
        import importlib.abc

        class BlockShapely(importlib.abc.MetaPathFinder):
            def find_spec(self, name, path=None, target=None):
                if name == "shapely" or name.startswith("shapely."):
                    raise ImportError("No module named 'shapely' (blocked by the test)")
                return None

        sys.meta_path.insert(0, BlockShapely())
    sys.path.insert(0, "/usr/share/qgis/python/plugins")
    sys.path.insert(0, {str(REPO / "tests")!r})
    import conftest  # registers the clone as `plotwise`
    from qgis.core import QgsApplication
    app = QgsApplication([], False)
    app.initQgis()
    from processing.core.Processing import Processing
    Processing.initialize()
    logged = []
    QgsApplication.messageLog().messageReceived.connect(lambda msg, tag, level: logged.append((tag, msg)))

    class Bar:
        def __init__(self): self.messages = []
        def pushMessage(self, title, text, level=None, duration=None): self.messages.append(text)

    class Iface:
        def __init__(self): self.bar = Bar()
        def messageBar(self): return self.bar

    import plotwise
    registry = QgsApplication.processingRegistry()
    iface = Iface()
    plugin = plotwise.classFactory(iface)
    plugin.initProcessing()
    plugin.initGui()  # the host calls both; the second must not register twice
    QgsApplication.processEvents()
    provider = registry.providerById("plotwise")
    result = {{{{
        "provider": provider is not None,
        "algorithms": sorted(a.id() for a in provider.algorithms()) if provider else [],
        "bar": iface.bar.messages,
        "log": [m for t, m in logged if t == "Plotwise"],
    }}}}
    plugin.unload()
    result["after_unload"] = registry.providerById("plotwise") is not None
    print("RESULT " + json.dumps(result))
    sys.stdout.flush()
    os._exit(0)
    """
)


def _load_plugin(tmp_path, block_shapely):
    """Load the plugin as the host does, in a fresh process (unload deletes what it added)."""
    path = tmp_path / "load_plugin.py"
    path.write_text(LOADER.format(block=block_shapely))
    private = str(tmp_path / "qgis")  # a fresh QGIS profile: the host's default (English) user interface
    env = dict(os.environ, QGIS_CUSTOM_CONFIG_PATH=private, QGIS_OPTIONS_PATH=private)
    run = subprocess.run([sys.executable, str(path)], capture_output=True, text=True, timeout=120, env=env)
    assert run.returncode == 0, run.stderr
    assert "Traceback" not in run.stderr, run.stderr
    line = next(text for text in run.stdout.splitlines() if text.startswith("RESULT "))
    return json.loads(line[len("RESULT "):])


def test_plugin_registers_and_unloads_provider(tmp_path):
    result = _load_plugin(tmp_path, block_shapely=False)
    assert result["provider"] is True
    expected = {"plotwise:demoreserve", "plotwise:simulatecounts", "plotwise:layout", "plotwise:estimate"}
    assert expected <= set(result["algorithms"])
    assert result["bar"] == [] and result["after_unload"] is False


def test_missing_shapely_gives_a_message_and_no_crash(tmp_path):
    """Without shapely the plugin loads, registers nothing and says why (issue 2)."""
    result = _load_plugin(tmp_path, block_shapely=True)
    assert result["provider"] is False
    assert result["bar"] and "shapely is missing" in result["bar"][0]
    assert any("shapely is missing" in m for m in result["log"])
    assert result["after_unload"] is False
