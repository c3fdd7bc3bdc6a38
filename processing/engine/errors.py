"""Exceptions raised by the engine.

Host algorithms turn :class:`InputError` into a ``QgsProcessingException``; the
message is written for the GIS officer: what is wrong, where, and what to do.
"""


class InputError(ValueError):
    """Input that the engine cannot work with.

    Parameters
    ----------
    message : str
        Full sentence(s) naming the offending item and the remedy.
    ids : sequence, optional
        Feature ids, unit ids or stratum ids the message is about.
    """

    def __init__(self, message, ids=None):
        super().__init__(message)
        self.message = message
        self.ids = list(ids) if ids is not None else []


class Cancelled(RuntimeError):
    """Raised when the caller's cancel check returns True."""
