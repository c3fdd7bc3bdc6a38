"""Exceptions raised by the engine, and the translatable message type they carry.

Host algorithms turn :class:`InputError` into a ``QgsProcessingException``; the
message is written for the GIS officer: what is wrong, where, and what to do.

Engine messages are built with :func:`message`: an English template with named
``{placeholders}`` and the values that fill them (numbers, ids, layer and field
names, lists of ids). ``str()`` of a :class:`Message` is the English text; the host
translates the template (context ``PlotwiseEngine``) and fills in the same values.
Every word of the sentence sits in the template, so a translator sees the whole
sentence; numbers are formatted in the template (``{cv:.3f}``).
"""
from dataclasses import dataclass


@dataclass(frozen=True)
class Message:
    """An English template and the values of its placeholders.

    Attributes
    ----------
    template : str
        Text for ``str.format`` with named placeholders, e.g. ``"Stratum {ids} is empty."``.
    values : tuple of (str, object)
        ``(name, value)`` pairs (a tuple, so the message stays hashable). A value may itself
        be a :class:`Message` (it is formatted, and translated, first).
    """

    template: str
    values: tuple = ()

    def __str__(self):
        return self.template.format(**dict(self.values))

    def __format__(self, spec):
        return format(str(self), spec)


def _frozen(value):
    if isinstance(value, (list, tuple)):
        return tuple(_frozen(v) for v in value)
    return value


def message(template, **values):
    """A :class:`Message` from an English ``template`` and its placeholder values."""
    return Message(template, tuple((name, _frozen(value)) for name, value in values.items()))


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
