"""What every Plotwise algorithm shares: translation, groups, seed, report, progress, errors."""
import contextlib
import os

from qgis.core import (
    QgsProcessingAlgorithm,
    QgsProcessingException,
    QgsProcessingParameterFileDestination,
    QgsProcessingParameterNumber,
)
from qgis.PyQt.QtCore import QT_TRANSLATE_NOOP, QCoreApplication
from qgis.PyQt.QtGui import QIcon

from .. import compat
from ..translation import active_language, translated_message
from ..engine.errors import ENGINE_CONTEXT, Cancelled, InputError
from ..engine.rng import make_rng
from ..report import Report
from .. import styles

ICON = os.path.join(os.path.dirname(os.path.dirname(os.path.dirname(os.path.abspath(__file__)))), "plugin", "icons",
                    "plotwise.svg")

# group id -> display name (translated in group())
GROUPS = {
    "design": QT_TRANSLATE_NOOP("PlotwiseAlgorithm", "Survey design"),
    "estimation": QT_TRANSLATE_NOOP("PlotwiseAlgorithm", "Estimation"),
    "training": QT_TRANSLATE_NOOP("PlotwiseAlgorithm", "Demo and training"),
}


class PlotwiseAlgorithm(QgsProcessingAlgorithm):
    """Base class: subclasses set ``ALGORITHM_NAME``, ``GROUP_ID`` and implement the usual methods."""

    ALGORITHM_NAME = ""
    GROUP_ID = "design"
    SEED = "SEED"
    REPORT = "REPORT"

    # -- host boilerplate ----------------------------------------------------------
    def tr(self, text):
        """``text`` in the user's language, in the context of the algorithm's class.

        pylupdate5 files ``self.tr("…")`` under the name of the class the call is written in, so call
        it with a literal in the algorithm's own class; the shared code of this base class uses
        ``QCoreApplication.translate("PlotwiseAlgorithm", "…")``.
        """
        return QCoreApplication.translate(type(self).__name__, text)

    def createInstance(self):  # noqa: N802 (host naming)
        return type(self)()

    def name(self):
        return self.ALGORITHM_NAME

    def group(self):
        return QCoreApplication.translate("PlotwiseAlgorithm", GROUPS[self.GROUP_ID])

    def groupId(self):  # noqa: N802 (host naming)
        return self.GROUP_ID

    def icon(self):
        return QIcon(ICON)

    def helpUrl(self):  # noqa: N802 (host naming)
        return ""  # the help is in shortHelpString; we publish no web page

    # -- shared parameters ---------------------------------------------------------
    def add_seed_parameter(self, default=0):
        self.addParameter(
            QgsProcessingParameterNumber(
                self.SEED,
                QCoreApplication.translate("PlotwiseAlgorithm", "Random seed (0 draws one and records it)"),
                type=compat.NUMBER_INTEGER,
                defaultValue=default,
                minValue=0,
                maxValue=2**31 - 1,
            )
        )

    def add_report_parameter(self):
        self.addParameter(
            QgsProcessingParameterFileDestination(
                self.REPORT,
                QCoreApplication.translate("PlotwiseAlgorithm", "Report (HTML)"),
                QCoreApplication.translate("PlotwiseAlgorithm", "HTML files (*.html)"),
                createByDefault=True,
                optional=True,
            )
        )

    # -- shared behaviour ----------------------------------------------------------
    def seeded_generator(self, parameters, context, feedback):
        """The run's one generator; logs the seed actually used."""
        seed = self.parameterAsInt(parameters, self.SEED, context)
        seeded = make_rng(seed)
        feedback.pushInfo(QCoreApplication.translate("PlotwiseAlgorithm", "Seed used: {seed}").format(seed=seeded.seed))
        return seeded

    @staticmethod
    def progress_callback(feedback, start=0.0, end=100.0):
        """A ``progress(fraction) -> cancelled`` callable for the engine, mapped onto [start, end] %."""

        def progress(fraction):
            feedback.setProgress(start + (end - start) * min(max(float(fraction), 0.0), 1.0))
            return feedback.isCanceled()

        return progress

    @contextlib.contextmanager
    def engine_errors(self):
        """Turn engine exceptions into the host's ``QgsProcessingException``."""
        try:
            yield
        except InputError as error:
            text = self.translate_message(error.detail) if error.detail is not None else error.message
            raise QgsProcessingException(text) from None
        except Cancelled:
            raise self.cancelled_error() from None

    def cancelled_error(self):
        """The exception a cancelled run ends with."""
        return QgsProcessingException(
            QCoreApplication.translate("PlotwiseAlgorithm", "Cancelled by the user. No result was written."))

    def style_output(self, context, dest_id, style_name, **options):
        """Style output ``dest_id`` (a name from ``processing.styles.STYLES``) when the host loads it."""
        return styles.style_on_completion(context, dest_id, style_name, **options)

    @staticmethod
    def engine_term(text):
        """A term the engine marks with ``QT_TRANSLATE_NOOP("PlotwiseEngine", …)`` (a design or shape name,
        the demo species), in the user's language."""
        return QCoreApplication.translate(ENGINE_CONTEXT, text)

    def translate_message(self, item):
        """The user's-language text of an engine :class:`Message` (context ``PlotwiseEngine``); a str as is."""
        return translated_message(item)

    # -- field parameters: the one policy for a field the layer lacks ----------------------
    def field_names(self, parameters, name, context, source, layer_name=None, required=False):
        """The fields that field parameter ``name`` holds, checked against ``source``'s fields.

        One policy for every algorithm: a field the user chose that the layer lacks is an error
        naming the layer, the parameter, the field and the fields the layer has. A parameter left at
        its default (models and batch runs store defaults too, so a value equal to the default counts as
        left) whose default field the layer lacks is simply not used (an empty list), unless it is
        ``required``, which is then an error too. Returns a list (empty when the parameter is unset).
        """
        chosen = compat.parameter_as_fields(self, parameters, name, context)
        available = source.fields().names() if source is not None else []
        missing = [field for field in chosen if field not in available]
        given = self._names_other_than_default(parameters, name, chosen)
        if missing and (given or required):
            raise QgsProcessingException(QCoreApplication.translate(
                "PlotwiseAlgorithm",
                "Layer '{layer}' has no field {fields} ({param}). Its fields are: {available}. "
                "Choose one of them.").format(
                layer=layer_name or (source.sourceName() if source is not None else name),
                fields=", ".join(f"'{f}'" for f in missing), param=name, available=", ".join(available)))
        chosen = [field for field in chosen if field in available]
        if required and not chosen:
            raise QgsProcessingException(QCoreApplication.translate(
                "PlotwiseAlgorithm",
                "Choose a field of layer '{layer}' for {param}. Its fields are: {available}.").format(
                layer=layer_name or (source.sourceName() if source is not None else name), param=name,
                available=", ".join(available)))
        return chosen

    def _names_other_than_default(self, parameters, name, chosen):
        if parameters.get(name) in (None, "", []):
            return False
        default = self.parameterDefinition(name).defaultValue()
        if isinstance(default, str):
            default = [field for field in default.split(";") if field]
        return list(chosen) != list(default or [])

    def field_name(self, parameters, name, context, source, layer_name=None, required=False):
        """The one field a single-field parameter holds, or None, by the policy of :meth:`field_names`."""
        chosen = self.field_names(parameters, name, context, source, layer_name, required)
        return chosen[0] if chosen else None

    @staticmethod
    @contextlib.contextmanager
    def discard_on_failure(*paths):
        """Delete the files a run has started writing (and GDAL's side files) when it fails or is cancelled,
        so that nothing half-written can pass for a finished result."""
        try:
            yield
        except BaseException:
            for path in paths:
                side_files = (".aux.xml", ".ovr", "-wal", "-shm", "-journal")  # GDAL and SQLite (GeoPackage)
                for candidate in (path, *(path + suffix for suffix in side_files)) if path else ():
                    if os.path.isfile(candidate):
                        os.remove(candidate)
            raise

    def push_warnings(self, feedback, warnings):
        for warning in warnings:
            feedback.pushWarning(self.translate_message(warning))

    def new_report(self, title):
        return Report(title, algorithm_id=f"plotwise:{self.name()}", translate=QCoreApplication.translate,
                      language=active_language())

    def write_report(self, report, parameters, context, feedback):
        """Write ``report`` to the REPORT destination (when one is set); return the path or None."""
        path = self.parameterAsFileOutput(parameters, self.REPORT, context)
        if not path:
            return None
        report.write(path)
        feedback.pushInfo(QCoreApplication.translate("PlotwiseAlgorithm", "Report written to {path}").format(path=path))
        return path
