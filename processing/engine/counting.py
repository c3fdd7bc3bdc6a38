"""Counts of simulated animals in sample units (for training, demos and tests).

A unit polygon counts the animals inside it. A point unit counts those within a
circle of the unit's area; a line unit those within a strip of the unit's area
around the line (half-width = area / (2 × length)). Each animal in a unit is seen
independently with probability ``detection`` (binomial thinning).
"""
from dataclasses import dataclass

import numpy as np

from .errors import QT_TRANSLATE_NOOP, Cancelled, InputError, message
from .geometry import contains_xy


@dataclass(frozen=True)
class UnitCounts:
    """Animals present in each unit and those seen."""

    present: np.ndarray
    seen: np.ndarray
    detection: float


def counting_region(geometry, area_m2=None):
    """The polygon a unit counts in: the polygon itself, or a circle / strip of ``area_m2``."""
    kind = geometry.geom_type
    if kind in ("Polygon", "MultiPolygon"):
        return geometry
    if area_m2 is None or not np.isfinite(area_m2) or area_m2 <= 0:
        raise InputError(message(QT_TRANSLATE_NOOP("PlotwiseEngine", "needs a positive area_m2")))
    if kind in ("Point", "MultiPoint"):
        return geometry.buffer(np.sqrt(area_m2 / np.pi), 64)
    if kind in ("LineString", "MultiLineString"):
        if geometry.length <= 0:
            raise InputError(message(QT_TRANSLATE_NOOP("PlotwiseEngine", "has a line of zero length")))
        return geometry.buffer(area_m2 / (2.0 * geometry.length), cap_style=2)
    raise InputError(message(QT_TRANSLATE_NOOP("PlotwiseEngine",
        "has an unsupported geometry type ({kind})"), kind=kind))


def animals_in_regions(regions, animals_xy, progress=None):
    """Number of animal points inside each region (vectorised per region, bounding boxes first)."""
    animals_xy = np.asarray(animals_xy, dtype=float).reshape(-1, 2)
    order = np.argsort(animals_xy[:, 0], kind="stable")
    xs = animals_xy[order, 0]
    ys = animals_xy[order, 1]
    counts = np.zeros(len(regions), dtype=np.int64)
    for i, region in enumerate(regions):
        minx, miny, maxx, maxy = region.bounds
        lo, hi = np.searchsorted(xs, [minx, maxx], side="left")[0], np.searchsorted(xs, maxx, side="right")
        if hi > lo:
            sx, sy = xs[lo:hi], ys[lo:hi]
            near = (sy >= miny) & (sy <= maxy)
            if near.any():
                counts[i] = int(contains_xy(region, sx[near], sy[near]).sum())
        if progress is not None and i % 200 == 0 and progress(i / max(len(regions), 1)):
            raise Cancelled()
    return counts


def simulate_counts(regions, animals_xy, detection, rng, progress=None):
    """Counts seen in each region: Binomial(present, ``detection``), seeded by ``rng``."""
    if not 0.0 < detection <= 1.0:
        raise InputError(message(QT_TRANSLATE_NOOP("PlotwiseEngine",
            "The detection probability must be in (0, 1] (got {detection:g})."), detection=detection))
    present = animals_in_regions(regions, animals_xy, progress)
    seen = rng.binomial(present, detection) if detection < 1.0 else present.copy()
    return UnitCounts(present=present, seen=np.asarray(seen, dtype=np.int64), detection=float(detection))
