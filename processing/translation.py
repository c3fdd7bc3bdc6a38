"""Install the Plotwise translator for the host's user interface language."""
import os

from qgis.core import QgsApplication, QgsSettings
from qgis.PyQt.QtCore import QCoreApplication, QLocale, QTranslator

_INSTALLED = {}  # translator -> language, for the reports' lang attribute

I18N_DIR = os.path.join(os.path.dirname(os.path.dirname(os.path.abspath(__file__))), "i18n")


def host_language():
    """Two-letter language of the host UI: the user's override, else the system locale."""
    settings = QgsSettings()
    if settings.value("locale/overrideFlag", False, type=bool):
        locale = settings.value("locale/userLocale", "") or ""
    else:
        locale = QgsApplication.locale() or QLocale.system().name()
    return (locale or "en")[:2]


def install_translator(language=None):
    """Load ``i18n/plotwise_<lang>.qm`` into the application; return the translator or None."""
    language = language or host_language()
    path = os.path.join(I18N_DIR, f"plotwise_{language}.qm")
    if not os.path.exists(path):
        return None
    translator = QTranslator()
    if not translator.load(path):
        return None
    QCoreApplication.installTranslator(translator)
    _INSTALLED[translator] = language
    return translator


def active_language():
    """Language of the Plotwise translator in use ("en" when none is installed)."""
    return next(reversed(_INSTALLED.values()), "en")


def remove_translator(translator):
    if translator is not None:
        QCoreApplication.removeTranslator(translator)
        _INSTALLED.pop(translator, None)


def translated_message(item):
    """The user's-language text of an engine :class:`~.engine.errors.Message` (context ``PlotwiseEngine``);
    any other value as it is. Placeholder values that are messages themselves are translated first."""
    from .engine.errors import ENGINE_CONTEXT, Message

    if not isinstance(item, Message):
        return item
    values = {name: translated_message(value) for name, value in item.values}
    try:
        return QCoreApplication.translate(ENGINE_CONTEXT, item.template).format(**values)
    except (KeyError, IndexError, ValueError):  # a broken translation: the English text
        return str(item)
