"""Loading the plugin the way the host does: provider registration, unload, missing libraries."""
import json
import os
import subprocess
import sys
import textwrap
from pathlib import Path

REPO = Path(__file__).resolve().parents[2]


def test_plugin_registers_and_unloads_provider(qgis_app, qgis_processing, qgis_iface):
    from qgis.core import QgsApplication

    import plotwise

    registry = QgsApplication.processingRegistry()
    existing = registry.providerById("plotwise")
    if existing is not None:  # registered by another test's fixture
        registry.removeProvider(existing)
    plugin = plotwise.classFactory(qgis_iface)
    plugin.initProcessing()
    plugin.initGui()  # a second call must not register twice
    provider = registry.providerById("plotwise")
    assert provider is not None
    ids = {a.id() for a in provider.algorithms()}
    assert {"plotwise:demoreserve", "plotwise:simulatecounts"} <= ids
    plugin.unload()
    assert registry.providerById("plotwise") is None


def test_missing_shapely_gives_a_message_and_no_crash(tmp_path):
    """Without shapely the plugin loads, registers nothing and says why (issue 2)."""
    script = textwrap.dedent(
        f"""
        import importlib.abc, json, os, sys
        os.environ["QT_QPA_PLATFORM"] = "offscreen"

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
        iface = Iface()
        plugin = plotwise.classFactory(iface)
        plugin.initProcessing()
        plugin.initGui()
        QgsApplication.processEvents()
        result = {{
            "provider": QgsApplication.processingRegistry().providerById("plotwise") is not None,
            "bar": iface.bar.messages,
            "log": [m for t, m in logged if t == "Plotwise"],
        }}
        plugin.unload()
        print("RESULT " + json.dumps(result))
        """
    )
    path = tmp_path / "load_without_shapely.py"
    path.write_text(script)
    run = subprocess.run([sys.executable, str(path)], capture_output=True, text=True, timeout=120)
    assert run.returncode == 0, run.stderr
    assert "Traceback" not in run.stderr
    line = next(l for l in run.stdout.splitlines() if l.startswith("RESULT "))
    result = json.loads(line[len("RESULT "):])
    assert result["provider"] is False
    assert result["bar"] and "shapely is missing" in result["bar"][0]
    assert any("shapely is missing" in m for m in result["log"])
