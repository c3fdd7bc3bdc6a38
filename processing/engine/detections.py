"""Simulated detection histories at stations, from a point population (training, demos, tests).

A station detects the species on an occasion with a probability that falls with
the distance ``d`` to the nearest animal group (a half-normal decline):

    p(d) = p_max exp(-d**2 / (2 sigma**2)),

independently between occasions. A group's position is the mean of its
members' positions (or each animal is its own group when no group ids are
given). A share of the site-occasions may be marked "not surveyed" (a camera
that failed, a recorder stolen): those are NaN.
"""
from dataclasses import dataclass

import numpy as np
from scipy.spatial import cKDTree

from .errors import QT_TRANSLATE_NOOP, InputError, message


@dataclass(frozen=True, eq=False)
class SimulatedDetections:
    """Per station: the distance to the nearest group (m), its detection probability and its history."""

    distance: np.ndarray
    p: np.ndarray
    histories: np.ndarray  # (s, K): 1, 0, NaN (not surveyed)
    n_groups: int


def group_positions(animals_xy, group_ids=None):
    """Mean position of each group's members; the animals themselves when ``group_ids`` is None."""
    xy = np.asarray(animals_xy, dtype=float).reshape(-1, 2)
    if group_ids is None:
        return xy
    keys = np.array([str(g) for g in group_ids], dtype=object)
    _, index = np.unique(keys, return_inverse=True)
    index = np.asarray(index).ravel()
    counts = np.bincount(index)
    return np.column_stack([np.bincount(index, xy[:, 0]) / counts, np.bincount(index, xy[:, 1]) / counts])


def half_normal_detection(distance, p_max, sigma):
    """``p_max exp(-d^2 / (2 sigma^2))``."""
    d = np.asarray(distance, dtype=float)
    return p_max * np.exp(-0.5 * (d / sigma) ** 2)


def simulate_detections(stations_xy, groups_xy, occasions, p_max, sigma, rng, not_surveyed=0.0):
    """Detection histories of ``occasions`` occasions at each station (see the module docstring)."""
    if int(occasions) != occasions or occasions < 1:
        raise InputError(message(QT_TRANSLATE_NOOP("PlotwiseEngine",
                                 "OCCASIONS must be a whole number of at least 1.")))
    if not 0.0 < p_max <= 1.0:
        raise InputError(message(QT_TRANSLATE_NOOP("PlotwiseEngine",
                                 "The detection probability at a group must be in (0, 1]; it is {p:g}."), p=p_max))
    if not sigma > 0:
        raise InputError(message(QT_TRANSLATE_NOOP("PlotwiseEngine",
                                 "The detection scale SIGMA must be more than 0 m.")))
    if not 0.0 <= not_surveyed < 1.0:
        raise InputError(message(QT_TRANSLATE_NOOP("PlotwiseEngine",
                                 "The share of occasions not surveyed must be at least 0 and below 1.")))
    groups = np.asarray(groups_xy, dtype=float).reshape(-1, 2)
    if len(groups) == 0:
        raise InputError(message(QT_TRANSLATE_NOOP("PlotwiseEngine",
                                 "The animal layer holds no animal: there is nothing to detect.")))
    stations = np.asarray(stations_xy, dtype=float).reshape(-1, 2)
    distance, _ = cKDTree(groups).query(stations)
    p = half_normal_detection(distance, p_max, sigma)
    k = int(occasions)
    detected = (rng.random((len(stations), k)) < p[:, None]).astype(float)
    missing = rng.random((len(stations), k)) < not_surveyed
    return SimulatedDetections(np.asarray(distance, float), p, np.where(missing, np.nan, detected), len(groups))
