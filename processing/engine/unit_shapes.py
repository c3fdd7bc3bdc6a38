"""Shapes of sample units around their drawn centres.

Shapes (the order of the algorithm's SHAPE parameter):

* 0 point station: the centre itself. ``size`` is an optional counting radius
  ``r``: then the station counts in a circle of area ``pi r**2`` (circumscribing
  radius ``r``); with ``size = 0`` its area is unknown (NaN).
* 1 square plot of side ``s``: area ``s**2``; circumscribing radius ``s / sqrt(2)``.
* 2 circular plot of radius ``r``: area ``pi r**2``; circumscribing radius ``r``.
* 3 line transect of length ``L``, centred on the drawn point: area 0 (the strip
  width is chosen when counts are analysed); circumscribing radius ``L / 2``.

Bearings are degrees clockwise from grid north (the +y axis). A square's sides
and a transect's direction follow the bearing.
"""
import numpy as np

from .errors import QT_TRANSLATE_NOOP

SHAPES = (
    QT_TRANSLATE_NOOP("PlotwiseEngine", "point"),
    QT_TRANSLATE_NOOP("PlotwiseEngine", "square"),
    QT_TRANSLATE_NOOP("PlotwiseEngine", "circle"),
    QT_TRANSLATE_NOOP("PlotwiseEngine", "line"),
)
POINT, SQUARE, CIRCLE, LINE = range(4)


def unit_area(shape, size):
    """Area in m² of one unit of ``shape`` and ``size`` (NaN where it is not defined)."""
    shape = int(shape)
    if shape == SQUARE:
        return float(size) ** 2
    if shape == CIRCLE or (shape == POINT and float(size) > 0):
        return float(np.pi * float(size) ** 2)
    return float("nan")


def circumscribing_radius(shape, size):
    """Radius of the smallest circle about the centre that holds the unit."""
    shape = int(shape)
    if shape == SQUARE:
        return float(size) / np.sqrt(2.0)
    if shape in (CIRCLE, POINT):
        return max(float(size), 0.0)
    if shape == LINE:
        return float(size) / 2.0
    return 0.0


def _direction(bearing_deg):
    theta = np.radians(np.asarray(bearing_deg, dtype=float))
    return np.stack([np.sin(theta), np.cos(theta)], axis=-1)


def transect_ends(centres, bearings, length):
    """Start and end of line transects centred on ``centres``.

    ``start = c - (L/2) d``, ``end = c + (L/2) d`` with ``d = (sin b, cos b)``.

    Returns
    -------
    ndarray, shape (n, 2, 2): ``[:, 0]`` starts, ``[:, 1]`` ends.
    """
    centres = np.asarray(centres, dtype=float).reshape(-1, 2)
    d = _direction(bearings).reshape(-1, 2) * (float(length) / 2.0)
    return np.stack([centres - d, centres + d], axis=1)


def square_rings(centres, bearings, side):
    """Closed rings (n, 5, 2) of squares of ``side`` centred on ``centres``."""
    centres = np.asarray(centres, dtype=float).reshape(-1, 2)
    h = float(side) / 2.0
    local = np.array([[-h, -h], [h, -h], [h, h], [-h, h], [-h, -h]])
    theta = np.radians(np.asarray(bearings, dtype=float).reshape(-1))
    c, s = np.cos(theta), np.sin(theta)
    # clockwise rotation by the bearing: (x, y) -> (x c + y s, -x s + y c)
    x = local[None, :, 0] * c[:, None] + local[None, :, 1] * s[:, None]
    y = -local[None, :, 0] * s[:, None] + local[None, :, 1] * c[:, None]
    return np.stack([x, y], axis=2) + centres[:, None, :]


def circle_rings(centres, radius, segments=64):
    """Closed rings (n, segments + 1, 2) of regular polygons with the circle's area ``π r²``.

    A regular m-gon of circumradius ρ has the area ``(m/2) ρ² sin(2π/m)``; its
    vertices lie at ``ρ = r √(2π / (m sin(2π/m)))``, just outside the circle, so
    that the outline's area is the unit's ``area_m2`` and a count of the animals
    inside the outline has the expectation of a count in the circle.
    """
    centres = np.asarray(centres, dtype=float).reshape(-1, 2)
    m = int(segments)
    t = np.linspace(0.0, 2.0 * np.pi, m + 1)
    t[-1] = 0.0
    rho = float(radius) * np.sqrt(2.0 * np.pi / (m * np.sin(2.0 * np.pi / m)))
    ring = rho * np.stack([np.cos(t), np.sin(t)], axis=1)
    return ring[None, :, :] + centres[:, None, :]


def unit_outlines(shape, centres, bearings, size):
    """Coordinates of every unit: (n, 2) points, (n, 2, 2) lines or (n, m, 2) rings."""
    shape = int(shape)
    centres = np.asarray(centres, dtype=float).reshape(-1, 2)
    if shape == SQUARE:
        return square_rings(centres, bearings, size)
    if shape == CIRCLE:
        return circle_rings(centres, size)
    if shape == LINE:
        return transect_ends(centres, bearings, size)
    return centres.copy()
