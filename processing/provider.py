"""The ``plotwise`` processing provider: one instance of every Plotwise algorithm."""
import glob
import os

from qgis.core import QgsMessageLog, QgsProcessingModelAlgorithm, QgsProcessingProvider
from qgis.PyQt.QtCore import QCoreApplication
from qgis.PyQt.QtGui import QIcon

from .algorithms.allocate import Allocate
from .algorithms.buildframe import BuildFrame
from .algorithms.comparedesigns import CompareDesigns
from .algorithms.demoreserve import DemoReserve
from .algorithms.estimate import Estimate
from .algorithms.layout import LayoutUnits
from .algorithms.simulatecounts import SimulateCounts
from .algorithms.stratify import Stratify

MODELS = os.path.join(os.path.dirname(os.path.abspath(__file__)), "models")
ICON = os.path.join(os.path.dirname(os.path.dirname(os.path.abspath(__file__))), "plugin", "icons", "plotwise.svg")

# One entry per algorithm; each issue adds its class here.
ALGORITHM_CLASSES = [
    Allocate,
    BuildFrame,
    CompareDesigns,
    DemoReserve,
    Estimate,
    LayoutUnits,
    SimulateCounts,
    Stratify,
]


class PlotwiseProvider(QgsProcessingProvider):
    def id(self):
        return "plotwise"

    def name(self):
        return QCoreApplication.translate("PlotwiseProvider", "Plotwise")

    def longName(self):  # noqa: N802 (host naming)
        return QCoreApplication.translate("PlotwiseProvider", "Plotwise survey design and estimation")

    def icon(self):
        return QIcon(ICON)

    def svgIconPath(self):  # noqa: N802 (host naming)
        return ICON

    def loadAlgorithms(self):  # noqa: N802 (host naming)
        for algorithm_class in ALGORITHM_CLASSES:
            self.addAlgorithm(algorithm_class())
        for path in sorted(glob.glob(os.path.join(MODELS, "*.model3"))):
            self.add_model(path)

    def add_model(self, path):
        """Offer an example chain (.model3) in the toolbox, under the provider."""
        model = QgsProcessingModelAlgorithm()
        if model.fromFile(path):
            self.addAlgorithm(model)
        else:
            QgsMessageLog.logMessage(
                QCoreApplication.translate("PlotwiseProvider", "The example model {path} could not be read.").format(path=path),
                "Plotwise",
            )
