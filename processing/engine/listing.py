"""How messages list feature ids, and the order in which ids and strata are shown.

Every message that names features lists them through :func:`listed_ids`, so that a GIS officer
meets one form everywhere ("3, 7, 12", or the first twenty and the total), and every table,
map legend and message orders stratum ids by :func:`natural_key` (stratum 2 before stratum 10).
"""
import math

from .errors import QT_TRANSLATE_NOOP, message

MAX_LISTED_IDS = 20  # ids a message shows before it gives the total


def listed_ids(ids, limit=MAX_LISTED_IDS):
    """``"3, 7, 12"``; past ``limit`` ids, the first ``limit`` and the total: ``"3, 7, … (45 in all)"``."""
    ids = [str(i) for i in ids]
    shown = ", ".join(ids[:limit])
    if len(ids) > limit:
        return message(QT_TRANSLATE_NOOP("PlotwiseEngine", "{shown} … ({n} in all)"), shown=shown, n=len(ids))
    return shown


def natural_key(value):
    """Sort key: numbers (and numeric text) first in numeric order, then other text in text order."""
    text = str(value)
    try:
        number = float(value)
    except (TypeError, ValueError):
        return (1, 0.0, text)
    if math.isnan(number):
        return (1, 0.0, text)
    return (0, number, text)


def natural_sorted(values):
    """``values`` without None in :func:`natural_key` order."""
    return sorted((v for v in values if v is not None), key=natural_key)
