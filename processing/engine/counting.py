"""Counts of simulated animals in sample units (for training, demos and tests).

A unit polygon counts the animals inside it. A point unit counts those within a
circle of the unit's area; a line unit those within a strip of the unit's area
around the line (half-width = area / (2 × length)). Each animal in a unit is seen
independently with probability ``detection`` (binomial thinning).

Edges: with the strata given, a unit counts only the animals inside its own
stratum, as the plus-sampling protocol asks (:mod:`.edge`): the part of a unit
over the edge of its stratum is not surveyed.
"""
from dataclasses import dataclass

import numpy as np

from .errors import QT_TRANSLATE_NOOP, Cancelled, InputError, message
from .geometry import contains_xy

CIRCLE_SEGMENTS = 64  # segments per quarter circle of a point unit's counting circle


@dataclass(frozen=True)
class UnitCounts:
    """Animals present in each unit and those seen."""

    present: np.ndarray
    seen: np.ndarray
    detection: float


def counting_region(geometry, area_m2=None):
    """The polygon a unit counts in: the polygon itself, or a circle / strip of ``area_m2``.

    The circle is a polygon of ``4 × CIRCLE_SEGMENTS`` sides with the area
    ``area_m2`` itself: its vertices lie at ``ρ = r √(2π / (m sin(2π/m)))``
    (the area of a regular m-gon of circumradius ρ is ``(m/2) ρ² sin(2π/m)``).
    """
    kind = geometry.geom_type
    if kind in ("Polygon", "MultiPolygon"):
        return geometry
    if area_m2 is None or not np.isfinite(area_m2) or area_m2 <= 0:
        raise InputError(message(QT_TRANSLATE_NOOP("PlotwiseEngine", "needs a positive area_m2")))
    if kind in ("Point", "MultiPoint"):
        m = 4 * CIRCLE_SEGMENTS
        rho = np.sqrt(area_m2 / np.pi) * np.sqrt(2.0 * np.pi / (m * np.sin(2.0 * np.pi / m)))
        return geometry.buffer(rho, CIRCLE_SEGMENTS)
    if kind in ("LineString", "MultiLineString"):
        if geometry.length <= 0:
            raise InputError(message(QT_TRANSLATE_NOOP("PlotwiseEngine", "has a line of zero length")))
        return geometry.buffer(area_m2 / (2.0 * geometry.length), cap_style=2)
    raise InputError(message(QT_TRANSLATE_NOOP("PlotwiseEngine", "has an unsupported geometry type ({kind})"),
                             kind=kind))


def animal_strata(animals_xy, strata):
    """Index of the stratum each animal lies in (−1: in none), for ``strata`` a sequence of polygons."""
    animals_xy = np.asarray(animals_xy, dtype=float).reshape(-1, 2)
    where = np.full(len(animals_xy), -1, dtype=np.int64)
    for k, polygon in enumerate(strata):  # a loop over strata (tens)
        if polygon is None or polygon.is_empty:
            continue
        free = np.flatnonzero(where < 0)
        inside = contains_xy(polygon, animals_xy[free, 0], animals_xy[free, 1])
        where[free[inside]] = k
    return where


def animals_in_regions(regions, animals_xy, progress=None, animal_stratum=None, unit_stratum=None):
    """Number of animal points inside each region (vectorised per region, bounding boxes first).

    With ``animal_stratum`` (from :func:`animal_strata`) and ``unit_stratum``
    (the index of each unit's stratum), a unit counts only the animals of its
    own stratum.
    """
    animals_xy = np.asarray(animals_xy, dtype=float).reshape(-1, 2)
    order = np.argsort(animals_xy[:, 0], kind="stable")
    xs = animals_xy[order, 0]
    ys = animals_xy[order, 1]
    owner = None if animal_stratum is None else np.asarray(animal_stratum)[order]
    counts = np.zeros(len(regions), dtype=np.int64)
    for i, region in enumerate(regions):
        minx, miny, maxx, maxy = region.bounds
        lo, hi = np.searchsorted(xs, [minx, maxx], side="left")[0], np.searchsorted(xs, maxx, side="right")
        if hi > lo:
            sx, sy = xs[lo:hi], ys[lo:hi]
            near = (sy >= miny) & (sy <= maxy)
            if owner is not None:
                near &= (owner[lo:hi] == unit_stratum[i]) & (unit_stratum[i] >= 0)
            if near.any():
                counts[i] = int(contains_xy(region, sx[near], sy[near]).sum())
        if progress is not None and i % 200 == 0 and progress(i / max(len(regions), 1)):
            raise Cancelled()
    return counts


def simulate_counts(regions, animals_xy, detection, rng, progress=None, strata=None, unit_stratum=None):
    """Counts seen in each region: Binomial(present, ``detection``), seeded by ``rng``.

    Parameters
    ----------
    strata : sequence of Polygon, optional
        The strata; with ``unit_stratum`` (each unit's index into ``strata``,
        −1 for a unit of no stratum, which then counts nothing) a unit counts
        only the animals of its own stratum (:mod:`.edge`).
    """
    if not 0.0 < detection <= 1.0:
        raise InputError(message(QT_TRANSLATE_NOOP("PlotwiseEngine",
            "The detection probability must be in (0, 1] (got {detection:g})."), detection=detection))
    owner = None
    if strata is not None:
        owner = animal_strata(animals_xy, strata)
        unit_stratum = np.asarray(unit_stratum, dtype=np.int64)
    present = animals_in_regions(regions, animals_xy, progress, owner, unit_stratum)
    seen = rng.binomial(present, detection) if detection < 1.0 else present.copy()
    return UnitCounts(present=present, seen=np.asarray(seen, dtype=np.int64), detection=float(detection))
