"""The survey's protocol at the edges of its strata, and the design record the units carry.

Edges: plus sampling
--------------------
A unit whose centre lies near the edge of its stratum reaches over it. Counting
it whole, or keeping every unit inside, biases the estimate wherever the animals
near the edge differ from those inside (a lake shore, a forest edge). Plus
sampling (Gregoire & Valentine 2008, "Sampling Strategies for Natural Resources
and the Environment", ch. 10, §10.3; Schmid-Haas 1969 for the idea) removes the
bias for any outline and any unit shape:

* unit centres are drawn uniformly over the stratum grown by the unit's reach
  ``R`` (the radius of the smallest circle about the centre that holds the
  unit), the *plus region* ``S⁺ = S ⊕ B(R)`` of area ``A⁺``;
* a unit counts only the animals inside its own stratum (the part of the unit
  over the edge is not surveyed); its area stays the nominal area ``a``;
* an animal at ``u`` in the stratum is counted by the units centred in
  ``u − unit``, a set of area ``a`` that lies wholly in ``S⁺``, so every animal
  has the inclusion probability ``a / A⁺`` per unit, and
  ``N̂_h = A⁺_h · Σ y / Σ a`` is unbiased for the stratum total (with equal
  units the Horvitz-Thompson estimator of the plus design).

The plus region is the stratum buffered by ``R`` with its arcs drawn as chords
*outside* the true circle (the distance is divided by ``cos(π / 4k)`` for ``k``
segments per quarter circle), so that it holds the exact Minkowski sum and the
argument above holds exactly; its area is the one the estimate expands by. The
layout, the counting of simulated animals, the estimate and the design
comparison all use :func:`plus_region`.

Design record and the finite-population correction
--------------------------------------------------
The correction ``1 − Σa / A`` belongs to a finite population of units that do
not overlap, sampled without replacement (Cochran 1977, §2.4 and ch. 5). Units
whose centres are drawn independently and uniformly may overlap: their
population is continuous and there is no such correction (Cordy 1993; Gregoire
& Valentine 2008, ch. 10). The layout records on every unit which case holds
(:func:`design_record`, the field ``design``); the estimate and the allocation
apply the correction only where :func:`fpc_holds`.
"""
import math

import numpy as np

from .geometry import as_polygonal, polygons_of

PLUS = "plus"  # plus sampling: centres over the stratum grown by R, count inside the stratum only
INSIDE = "inside"  # units kept wholly inside: no centre within R of the edge
EDGE_PROTOCOLS = (PLUS, INSIDE)

# values of the units' ``design`` field (at most 10 characters)
RANDOM = "random"  # simple random, units may overlap: no finite-population correction
RANDOM_APART = "random_sep"  # simple random with a minimum spacing of at least 2R: units never overlap
GRID = "grid"  # systematic grid with a spacing of at least 2R
GRID_OVERLAP = "grid_ovl"  # systematic grid denser than the units: they overlap
BALANCED = "balanced"  # spatially balanced (balanced acceptance sampling)
DESIGN_RECORDS = (RANDOM, RANDOM_APART, GRID, GRID_OVERLAP, BALANCED)
NON_OVERLAPPING = (RANDOM_APART, GRID, BALANCED)
PLUS_SEGMENTS = 16  # segments per quarter circle of the plus region's arcs


def design_record(design, min_spacing=0.0, reach=0.0, grid_spacing=float("nan")):
    """The ``design`` field value for units drawn by ``design`` (0 random, 1 grid, 2 balanced).

    Units of reach ``R`` never overlap when their centres are at least ``2R``
    apart: so a minimum spacing of ``2R`` or more keeps any design's units
    apart, and a systematic grid of spacing ``s ≥ 2R`` too. Balanced acceptance
    sampling draws one point per cell of a Halton partition of the stratum
    (Robertson et al. 2013), like a grid with a random point per cell: it is
    recorded as drawing units that do not overlap, the case the finite-population
    correction assumes.
    """
    apart = float(min_spacing) >= 2.0 * float(reach) and float(min_spacing) > 0
    if int(design) == 1:
        return GRID if apart or not float(grid_spacing) < 2.0 * float(reach) else GRID_OVERLAP
    if int(design) == 2:
        return BALANCED
    return RANDOM_APART if apart else RANDOM


def fpc_holds(record):
    """True where units of this design record do not overlap, False where they may, None without a record."""
    if record is None:
        return None
    text = str(record).strip().lower()
    if not text:
        return None
    if text in NON_OVERLAPPING:
        return True
    if text in (RANDOM, GRID_OVERLAP):
        return False
    return None


def plus_distance(reach, quad_segs=PLUS_SEGMENTS):
    """The buffer distance whose chords lie outside the circle of radius ``reach``: ``R / cos(π / 4k)``."""
    return float(reach) / math.cos(math.pi / (4.0 * int(quad_segs)))


def plus_region(geometry, reach, quad_segs=PLUS_SEGMENTS):
    """The plus region ``S ⊕ B(R)`` of a stratum: where plus sampling draws unit centres.

    Parameters
    ----------
    geometry : Polygon or MultiPolygon
        The stratum (projected CRS, metres).
    reach : float
        The unit's circumscribing radius ``R`` in metres (0: the stratum itself).

    Returns
    -------
    Polygon or MultiPolygon
        Holds every point within ``R`` of the stratum (see the module docstring).
    """
    if not reach > 0 or geometry is None or geometry.is_empty:
        return geometry
    grown = geometry.buffer(plus_distance(reach, quad_segs), int(quad_segs))
    return as_polygonal(polygons_of(grown))


def expansion_areas(geometries, reach, quad_segs=PLUS_SEGMENTS):
    """Area ``A⁺_h`` of the plus region of each stratum (m², as the geometries' CRS).

    Parameters
    ----------
    geometries : mapping
        Stratum label → Polygon or MultiPolygon.
    reach : float or mapping
        ``R`` in metres, one for all strata or one per label.

    Returns
    -------
    dict
        Label → ``A⁺_h``; ``A_h`` itself where the reach is 0.
    """
    out = {}
    for label, geometry in dict(geometries).items():
        r = reach.get(label, 0.0) if isinstance(reach, dict) else reach
        r = float(r) if r is not None and np.isfinite(r) else 0.0
        out[label] = float(plus_region(geometry, r, quad_segs).area)
    return out
