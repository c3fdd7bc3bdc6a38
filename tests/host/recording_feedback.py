"""A Processing feedback that keeps what an algorithm said, for host tests to inspect."""
from qgis.core import QgsProcessingFeedback


class RecordingFeedback(QgsProcessingFeedback):
    """Feedback that records the info lines and warnings pushed during a run."""

    def __init__(self):
        super().__init__()
        self.infos, self.warnings = [], []

    def pushInfo(self, info):  # noqa: N802 (host naming)
        self.infos.append(info)
        super().pushInfo(info)

    def pushWarning(self, warning):  # noqa: N802 (host naming)
        self.warnings.append(warning)
        super().pushWarning(warning)
