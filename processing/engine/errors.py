"""Exceptions raised by the engine, and the translatable message type they carry.

Host algorithms turn :class:`InputError` into a ``QgsProcessingException``; the
message is written for the GIS officer: what is wrong, where, and what to do.

Engine messages are built with :func:`message`: an English template with named
``{placeholders}`` and the values that fill them (numbers, ids, layer and field
names, lists of ids). ``str()`` of a :class:`Message` is the English text; the host
translates the template (context ``PlotwiseEngine``) and fills in the same values.
Every word of the sentence sits in the template, so a translator sees the whole
sentence; numbers are formatted in the template (``{cv:.3f}``).

The template is marked for the translators where it is written::

    message(QT_TRANSLATE_NOOP("PlotwiseEngine", "Stratum {ids} is empty."), ids=shown)

``pylupdate5`` (``make update-translations``) reads ``QT_TRANSLATE_NOOP("context", "text")``
calls and writes the text into ``i18n/*.ts`` under that context; the marker itself only
returns the text, so the engine stays free of the host.
"""

ENGINE_CONTEXT = "PlotwiseEngine"


def QT_TRANSLATE_NOOP(context, text):
    """Mark ``text`` for translation in ``context`` and return it unchanged.

    The name and signature of Qt's marker, which every lupdate tool recognises. ``context``
    must be a string literal (pylupdate5 skips a call whose context is a variable), and so
    must ``text``, without ``\\u``/``\\N`` escapes (pylupdate5 does not decode them: write the
    character itself). Engine templates use the context ``"PlotwiseEngine"``; host-free report
    code uses ``"PlotwiseReport"``.
    """
    return text


class Message(str):
    """An English sentence that remembers its template and the values that fill it.

    The string value is the English text, ``template.format(**dict(values))``, so a
    ``Message`` is used wherever the engine used a str before (``"zero" in warning``,
    ``" ".join(warnings)``, ``feedback.pushWarning(warning)``); the host translates
    ``template`` and fills in the same ``values``. Immutable and hashable (as its text).

    Attributes
    ----------
    template : str
        Text for ``str.format`` with named placeholders, e.g. ``"Stratum {ids} is empty."``.
    values : tuple of (str, object)
        ``(name, value)`` pairs. A value may itself be a :class:`Message` (formatted, and
        translated, first).
    """

    def __new__(cls, template, values=()):
        values = tuple((str(name), value) for name, value in values)
        self = super().__new__(cls, template.format(**dict(values)))
        object.__setattr__(self, "template", template)
        object.__setattr__(self, "values", values)
        return self

    def __setattr__(self, name, value):
        raise AttributeError("Message is immutable")

    __delattr__ = __setattr__

    def __reduce__(self):
        return (Message, (self.template, self.values))

    def __repr__(self):
        return f"message({self.template!r}, **{dict(self.values)!r})"


def message(template, **values):
    """A :class:`Message` from an English ``template`` and its placeholder values."""
    return Message(template, tuple(values.items()))


class InputError(ValueError):
    """Input that the engine cannot work with.

    Parameters
    ----------
    message : str or Message
        Full sentence(s) naming the offending item and the remedy.
    ids : sequence, optional
        Feature ids, unit ids or stratum ids the message is about.

    Attributes
    ----------
    message : str
        The English text.
    detail : Message or None
        The translatable message, when one was given.
    ids : list
    """

    def __init__(self, message, ids=None):
        text = str(message)
        super().__init__(text)
        self.message = text
        self.detail = message if isinstance(message, Message) else None
        self.ids = list(ids) if ids is not None else []


class Cancelled(RuntimeError):
    """Raised when the caller's cancel check returns True."""
