"""The plugin object the host creates through ``classFactory``."""
from qgis.core import QgsApplication, QgsMessageLog
from qgis.PyQt.QtCore import QCoreApplication

from ..processing import compat
from .dependencies import missing_dependencies
from ..processing.translation import install_translator, remove_translator

LOG_TAG = "Plotwise"


class PlotwisePlugin:
    """Registers the ``plotwise`` processing provider, or explains why it cannot."""

    def __init__(self, iface):
        self.iface = iface
        self.provider = None
        self.translator = None
        self.problems = []

    # the host calls initProcessing() (also in qgis_process), then initGui() when there is a GUI
    def initProcessing(self):  # noqa: N802 (host naming)
        if self.provider is not None:
            return
        if self.translator is None:
            self.translator = install_translator()
        self.problems = missing_dependencies()
        if self.problems:
            self._explain_missing()
            return
        from ..processing.provider import PlotwiseProvider

        self.provider = PlotwiseProvider()
        QgsApplication.processingRegistry().addProvider(self.provider)

    def initGui(self):  # noqa: N802 (host naming)
        self.initProcessing()

    def unload(self):
        if self.provider is not None:
            QgsApplication.processingRegistry().removeProvider(self.provider)
            self.provider = None
        remove_translator(self.translator)
        self.translator = None

    @staticmethod
    def _problem_text(problem):
        if problem.missing:
            return QCoreApplication.translate("PlotwisePlugin", "{name} is missing ({error}).").format(
                name=problem.name, error=problem.error)
        return QCoreApplication.translate(
            "PlotwisePlugin", "{name} {version} is too old; version {wanted} or newer is needed.").format(
            name=problem.name, version=problem.version, wanted=problem.wanted)

    def _explain_missing(self):
        text = QCoreApplication.translate(
            "PlotwisePlugin",
            "Plotwise cannot start because a library it needs is missing or too old: {problems} "
            "Install the host's standard packages (on Debian or Ubuntu: python3-numpy, python3-scipy, "
            "python3-shapely, python3-pyproj, python3-gdal) and restart QGIS. "
            "No Plotwise algorithm has been added."
        ).format(problems=" ".join(self._problem_text(p) for p in self.problems))
        QgsMessageLog.logMessage(text, LOG_TAG, compat.LEVEL_CRITICAL)
        if self.iface is not None:
            try:
                self.iface.messageBar().pushMessage(LOG_TAG, text, level=compat.LEVEL_CRITICAL, duration=0)
            except Exception as error:  # a message bar failure must not stop the host
                QgsMessageLog.logMessage(f"message bar unavailable: {error}", LOG_TAG, compat.LEVEL_WARNING)
