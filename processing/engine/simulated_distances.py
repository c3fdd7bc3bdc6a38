"""Simulated sightings with distances from line transects and point stations (training, demos, tests).

Each animal within ``W`` of a unit (the strip ``W`` either side of a line, flat at its ends, or
the disc of radius ``W`` about a point) is seen with probability ``g0 · g(x)``, where ``x`` is its
perpendicular (lines) or radial (points) distance and ``g`` a half-normal or hazard-rate key
(Buckland et al. 2001, §2.3). ``g0 < 1`` imitates animals missed on the line itself, which
distance sampling assumes away. ``W`` defaults to the distance where ``g`` falls to 1 %, so that
hardly any detectable animal lies beyond it. A unit counts the animals in its own strip or disc;
strips that overlap count the same animals twice, as two field teams would.
"""
from dataclasses import dataclass, field

import numpy as np

from . import detection_functions as df
from .errors import QT_TRANSLATE_NOOP, Cancelled, InputError, message
from .geometry import contains_xy

NONE, HALF_NORMAL, HAZARD_RATE = 0, 1, 2  # the order of simulatecounts' DETECTION_FUNCTION
FUNCTION_KEYS = {HALF_NORMAL: df.HALF_NORMAL, HAZARD_RATE: df.HAZARD_RATE}
FARTHEST_G = 0.01  # the automatic simulation width: where g falls to 1 %


@dataclass(frozen=True)
class SimulatedSightings:
    """Animals present within ``max_distance`` of each unit, and each sighting.

    ``present`` and ``seen`` are animals per unit (sums of group sizes); ``unit``, ``animal``,
    ``distance`` and ``size`` describe each sighting, in unit order.
    """

    present: np.ndarray = field(repr=False)
    seen: np.ndarray = field(repr=False)
    unit: np.ndarray = field(repr=False)
    animal: np.ndarray = field(repr=False)
    distance: np.ndarray = field(repr=False)
    size: np.ndarray = field(repr=False)
    max_distance: float


def detection_probability(function, x, sigma, shape=1.0):
    """``g(x)`` of the simulated half-normal (1) or hazard-rate (2) key."""
    return df.key_function(FUNCTION_KEYS[function], x, sigma, shape)


def automatic_max_distance(function, sigma, shape=1.0):
    """The distance where ``g`` falls to 1 %: σ√(2 ln 100) (half-normal), σ(−ln 0.99)^(−1/b) (hazard-rate)."""
    if function == HALF_NORMAL:
        return float(sigma * np.sqrt(-2.0 * np.log(FARTHEST_G)))
    return float(sigma * (-np.log1p(-FARTHEST_G)) ** (-1.0 / shape))


def _segments(geometry):
    parts = geometry.geoms if geometry.geom_type.startswith("Multi") else [geometry]
    for part in parts:
        xy = np.asarray(part.coords, dtype=float)[:, :2]
        yield from zip(xy[:-1], xy[1:])


def distance_to_line(geometry, x, y):
    """Shortest distance from each point (x, y) to the segments of a (multi)line, vectorised over points."""
    best = np.full(np.shape(x), np.inf)
    for (x0, y0), (x1, y1) in _segments(geometry):
        dx, dy = x1 - x0, y1 - y0
        length2 = dx * dx + dy * dy
        t = np.clip(((x - x0) * dx + (y - y0) * dy) / length2, 0.0, 1.0) if length2 > 0 else np.zeros(np.shape(x))
        best = np.minimum(best, np.hypot(x - x0 - t * dx, y - y0 - t * dy))
    return best


def _animals_near(geometry, width, xs, ys, order):
    """Indices (into the animals) of those within the unit's strip or disc, and their distances."""
    minx, miny, maxx, maxy = geometry.bounds
    lo, hi = np.searchsorted(xs, minx - width, side="left"), np.searchsorted(xs, maxx + width, side="right")
    near = np.flatnonzero((ys[lo:hi] >= miny - width) & (ys[lo:hi] <= maxy + width)) + lo
    px, py = xs[near], ys[near]
    if geometry.geom_type in ("Point", "MultiPoint"):
        point = geometry.geoms[0] if geometry.geom_type == "MultiPoint" else geometry
        distance = np.hypot(px - point.x, py - point.y)
        inside = distance <= width
    else:
        strip = geometry.buffer(width, cap_style=2)  # flat ends: the strip is as long as the line
        inside = contains_xy(strip, px, py)
        distance = distance_to_line(geometry, px, py)
        inside &= distance <= width
    return order[near[inside]], distance[inside]


def _simulation_iv(geometries, function, sigma, shape, max_distance, g0, unit_ids):
    if function not in FUNCTION_KEYS:
        raise InputError(message(QT_TRANSLATE_NOOP(
            "PlotwiseEngine",
            "The detection function must be 1 (half-normal) or 2 (hazard-rate).")))
    if not sigma > 0 or (function == HAZARD_RATE and not shape > 0):
        raise InputError(message(QT_TRANSLATE_NOOP(
            "PlotwiseEngine",
            "The scale σ must be above 0 m and the hazard-rate shape above 0 (got σ = {sigma:g} m, shape {shape:g})."),
            sigma=sigma, shape=shape))
    if not 0.0 < g0 <= 1.0:
        raise InputError(message(QT_TRANSLATE_NOOP(
            "PlotwiseEngine",
            "The detection probability on the line must be in (0, 1] (got {g0:g})."),
            g0=g0))
    unit_ids = list(range(len(geometries))) if unit_ids is None else list(unit_ids)
    kinds = ("Point", "MultiPoint", "LineString", "MultiLineString")
    unusable = [str(i) for i, g in zip(unit_ids, geometries)
                if g is None or g.is_empty or g.geom_type not in kinds or (g.geom_type in kinds[2:] and g.length <= 0)]
    if unusable:
        raise InputError(message(QT_TRANSLATE_NOOP(
            "PlotwiseEngine",
            "Units {ids} are neither points nor lines of some length; simulated distances need line transects or "
            "point stations."),
            ids=", ".join(unusable[:30])), ids=unusable)
    width = float(max_distance) if max_distance and max_distance > 0 else automatic_max_distance(function, sigma, shape)
    return width


def simulate_sightings(geometries, animals_xy, function, sigma, shape=1.0, rng=None, sizes=None, max_distance=0.0,
                       g0=1.0, unit_ids=None, progress=None):
    """Sightings of animal points from line transects or point stations, with distances.

    Parameters
    ----------
    geometries : sequence of shapely Point or LineString (projected, m)
    animals_xy : array_like, shape (m, 2)
        One point per animal or group.
    function : int
        1 half-normal, 2 hazard-rate; ``sigma`` in m, ``shape`` the hazard-rate's b.
    rng : numpy.random.Generator
    sizes : array_like, optional
        Group size of each point (default 1).
    max_distance : float
        ``W`` in m (0: where g falls to 1 %).
    g0 : float
        Detection probability at distance 0.
    progress : callable, optional
        ``progress(fraction) -> cancelled``.

    Returns
    -------
    SimulatedSightings
    """
    width = _simulation_iv(geometries, function, sigma, shape, max_distance, g0, unit_ids)
    xy = np.asarray(animals_xy, dtype=float).reshape(-1, 2)
    group = np.ones(len(xy)) if sizes is None else np.asarray(sizes, dtype=float)
    order = np.argsort(xy[:, 0], kind="stable")
    xs, ys = xy[order, 0], xy[order, 1]
    present, seen = np.zeros(len(geometries)), np.zeros(len(geometries))
    units, animals, distances = [], [], []
    for i, geometry in enumerate(geometries):
        near, distance = _animals_near(geometry, width, xs, ys, order)
        detected = rng.random(near.size) < g0 * detection_probability(function, distance, sigma, shape)
        present[i], seen[i] = group[near].sum(), group[near[detected]].sum()
        units.append(np.full(int(detected.sum()), i))
        animals.append(near[detected])
        distances.append(distance[detected])
        if progress is not None and i % 100 == 0 and progress(i / max(len(geometries), 1)):
            raise Cancelled()
    animal = np.concatenate(animals).astype(np.int64) if animals else np.zeros(0, dtype=np.int64)
    return SimulatedSightings(
        present=present, seen=seen, unit=np.concatenate(units).astype(np.int64) if units else animal.copy(),
        animal=animal, distance=np.concatenate(distances) if distances else np.zeros(0), size=group[animal],
        max_distance=width)
