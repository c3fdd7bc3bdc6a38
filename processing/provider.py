"""The ``plotwise`` processing provider: one instance of every Plotwise algorithm."""
import glob
import os

from qgis.core import QgsMessageLog, QgsProcessingModelAlgorithm, QgsProcessingProvider
from qgis.PyQt.QtCore import QT_TRANSLATE_NOOP, QCoreApplication
from qgis.PyQt.QtGui import QIcon

from .algorithms.allocate import Allocate
from .algorithms.buildframe import BuildFrame
from .algorithms.comparedesigns import CompareDesigns
from .algorithms.demoreserve import DemoReserve
from .algorithms.estimate import Estimate
from .algorithms.layout import LayoutUnits
from .algorithms.occupancy import Occupancy
from .algorithms.simulatecounts import SimulateCounts
from .algorithms.simulatedetections import SimulateDetections
from .algorithms.stations import Stations
from .algorithms.stratify import Stratify
from .algorithms.distancedensity import DistanceDensity
from .algorithms.panels import Panels
from .algorithms.trend import Trend
from .algorithms.trendpower import TrendPower

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
    Stations,
    Occupancy,
    SimulateDetections,
    DistanceDensity,
    Panels,
    TrendPower,
    Trend,
]


# name in the .model3 file -> (display name, help); translated when shown. The parameter labels of the
# chains are marked in scripts/build_models.py, which writes the .model3 files.
EXAMPLE_CHAINS = {
    "plan_survey": (
        QT_TRANSLATE_NOOP("ExampleChain", "Example chain: plan a survey (frame, strata, effort, layout)"),
        QT_TRANSLATE_NOOP("ExampleChain",
            "Builds the sampling frame (study area minus exclusions and cells over the slope limit), draws "
            "k-means strata from the covariate rasters, allocates the units by Neyman allocation with the "
            "covariate standard deviation as a proxy, and lays out spatially balanced square plots with 3 "
            "reserve units per stratum. Open it in the modeler to change any step. Check every unit's access "
            "and safety before sending a team: the tool never makes a location safe. Follow your agency's "
            "field-safety rules and local law."),
    ),
    "estimate_simulated_counts": (
        QT_TRANSLATE_NOOP("ExampleChain", "Example chain: estimate from simulated counts"),
        QT_TRANSLATE_NOOP("ExampleChain",
            "For training: fills the units' count field from a simulated population, then estimates density "
            "and abundance per stratum and overall. With real fieldwork, run the estimate on the counted units "
            "instead."),
    ),
}


class ExampleChain(QgsProcessingModelAlgorithm):
    """An example .model3 chain with a translated name, help and parameter labels."""

    def __init__(self, path):
        super().__init__()
        self.path = path
        self.loaded = self.fromFile(path)
        for parameter in self.parameterDefinitions():  # labels from the .model3, marked in scripts/build_models.py
            parameter.setDescription(QCoreApplication.translate("ExampleChain", parameter.description()))

    def displayName(self):  # noqa: N802
        entry = EXAMPLE_CHAINS.get(self.name())
        return QCoreApplication.translate("ExampleChain", entry[0]) if entry else super().displayName()

    def shortHelpString(self):  # noqa: N802
        entry = EXAMPLE_CHAINS.get(self.name())
        return QCoreApplication.translate("ExampleChain", entry[1]) if entry else super().shortHelpString()

    def group(self):
        return QCoreApplication.translate("ExampleChain", "Example chains")

    def groupId(self):  # noqa: N802
        return "examples"

    def createInstance(self):  # noqa: N802
        return ExampleChain(self.path)


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
        model = ExampleChain(path)
        if model.loaded:
            self.addAlgorithm(model)
        else:
            QgsMessageLog.logMessage(
                QCoreApplication.translate("PlotwiseProvider", "The example model {path} could not be read.").format(
                    path=path),
                "Plotwise",
            )
