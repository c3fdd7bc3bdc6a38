"""Layout of sample units over a stratified area frame.

Steps (:func:`prepare_strata`, then :func:`draw_layout`):

1. Features are repaired (invalid ones, with a warning), empty or zero-area
   ones are skipped (with a warning), and features of the same stratum merged.
2. The number of units per stratum ``n_h`` comes from a per-stratum field
   (for example the allocation step's ``n_alloc``) or from a total split in
   proportion to area with at least two units per stratum
   (:func:`proportional_counts`).
3. With ``inside``, unit centres are drawn from the stratum shrunk by the
   unit's circumscribing radius ``R`` (:func:`geometry.inward_buffer`), so every
   unit lies wholly in its stratum and every admissible centre has the same
   chance. Otherwise (the default) by plus sampling (:mod:`.edge`): centres
   are drawn from the stratum grown by ``R``, and a unit counts only the part
   inside its stratum. The effective frame area ``A'_h`` is the area of the
   region the centres are drawn from.
4. Centres are drawn by one of three designs:

   * simple random: independent uniform points (triangle cover, see
     :mod:`.geometry`);
   * systematic grid: a square grid of spacing ``s_h = sqrt(A'_h / n_h)`` with a
     uniform random start, rotated by the bearing (random rotation when
     ``bearing = -1``); the realised number of units varies about ``n_h``;
   * spatially balanced: balanced acceptance sampling (Robertson et al. 2013,
     see :mod:`.halton`).

5. Reserve units follow the primaries in draw order: the next independent
   draws (simple random), the next accepted points of the same Halton sequence
   (balanced), or the centres of the primary grid's cells in random order
   (systematic: the reserves then sit halfway between primaries).
6. A minimum spacing between the centres of all units of the layout (primaries
   and reserves of every stratum) is kept by sequential inhibition: a
   candidate closer than ``d`` to an accepted unit is passed over (Diggle 2003,
   "Statistical analysis of spatial point patterns", 2nd ed., §5.8.2: simple
   sequential inhibition). Inhibition lowers the inclusion density slightly
   near units of neighbouring strata; away from them it stays uniform.

Inclusion probabilities and weights
-----------------------------------
With ``n_h`` units of area ``a`` in a stratum of (effective) area ``A'_h``, the
first-order inclusion probability of a unit is

    incl_p = n_h a / A'_h,        weight = 1 / incl_p,

(the share of the stratum the design covers; Cochran 1977, §2.3 for equal
probability designs). A point station with a counting radius ``r`` (SIZE)
counts in a circle, ``a = pi r**2``. Line transects and point stations without
a radius have no area of their own (``area_m2`` NaN, written as NULL): for them
``incl_p`` is the inclusion *density* of the design at any location,
``n_h / A'_h`` per m², and ``weight = A'_h / n_h`` m² is the area each unit
stands for (Cordy 1993, "An extension of the
Horvitz-Thompson theorem to point sampling from a continuous universe",
Statistics & Probability Letters 18:353-362). Reserves carry the weight of the
primary they would replace. For the systematic grid ``n_h`` is the expected
number of units, ``A'_h / s_h**2``.
"""
from dataclasses import dataclass
import math
import re
import threading

import numpy as np
from shapely.ops import unary_union

from . import geometry as geo
from .crs import lonlat_transformer
from .edge import INSIDE as EDGE_INSIDE, PLUS as EDGE_PLUS, design_record, plus_region
from .errors import QT_TRANSLATE_NOOP, Cancelled, InputError, message
from .halton import balanced_acceptance_sample
from .listing import listed_ids, natural_key
from .unit_shapes import (  # noqa: F401 (CIRCLE, SQUARE re-exported for the algorithm)
    CIRCLE, LINE, POINT, SHAPES, SQUARE, circumscribing_radius, transect_ends, unit_area, unit_outlines,
)

DESIGNS = (
    QT_TRANSLATE_NOOP("PlotwiseEngine", "simple random"),
    QT_TRANSLATE_NOOP("PlotwiseEngine", "systematic grid"),
    QT_TRANSLATE_NOOP("PlotwiseEngine", "spatially balanced"),
)
SIMPLE_RANDOM, SYSTEMATIC_GRID, SPATIALLY_BALANCED = range(3)
RANDOM_BEARING = -1

# message templates that differ by unit shape (every word of a message sits in its template)
_SIZE_NOT_POSITIVE = {
    POINT: QT_TRANSLATE_NOOP("PlotwiseEngine", "SIZE must be more than 0 m for a point unit; it is {size}."),
    SQUARE: QT_TRANSLATE_NOOP("PlotwiseEngine", "SIZE must be more than 0 m for a square unit; it is {size}."),
    CIRCLE: QT_TRANSLATE_NOOP("PlotwiseEngine", "SIZE must be more than 0 m for a circle unit; it is {size}."),
    LINE: QT_TRANSLATE_NOOP("PlotwiseEngine", "SIZE must be more than 0 m for a line unit; it is {size}."),
}
_TOO_SMALL = {  # (whole frame?, shape)
    (True, POINT): QT_TRANSLATE_NOOP(
        "PlotwiseEngine",
        "The frame is too small for a point unit of SIZE {size:g} m wholly inside it: no point lies "
        "{radius:.1f} m or more from its edge (features {ids}). Use a smaller SIZE, untick INSIDE, or "
        "merge the stratum with a neighbour."),
    (True, SQUARE): QT_TRANSLATE_NOOP(
        "PlotwiseEngine",
        "The frame is too small for a square unit of SIZE {size:g} m wholly inside it: no point lies "
        "{radius:.1f} m or more from its edge (features {ids}). Use a smaller SIZE, untick INSIDE, or "
        "merge the stratum with a neighbour."),
    (True, CIRCLE): QT_TRANSLATE_NOOP(
        "PlotwiseEngine",
        "The frame is too small for a circle unit of SIZE {size:g} m wholly inside it: no point lies "
        "{radius:.1f} m or more from its edge (features {ids}). Use a smaller SIZE, untick INSIDE, or "
        "merge the stratum with a neighbour."),
    (True, LINE): QT_TRANSLATE_NOOP(
        "PlotwiseEngine",
        "The frame is too small for a line unit of SIZE {size:g} m wholly inside it: no point lies "
        "{radius:.1f} m or more from its edge (features {ids}). Use a smaller SIZE, untick INSIDE, or "
        "merge the stratum with a neighbour."),
    (False, POINT): QT_TRANSLATE_NOOP(
        "PlotwiseEngine",
        "Stratum {key} is too small for a point unit of SIZE {size:g} m wholly inside it: no point "
        "lies {radius:.1f} m or more from its edge (features {ids}). Use a smaller SIZE, untick "
        "INSIDE, or merge the stratum with a neighbour."),
    (False, SQUARE): QT_TRANSLATE_NOOP(
        "PlotwiseEngine",
        "Stratum {key} is too small for a square unit of SIZE {size:g} m wholly inside it: no point "
        "lies {radius:.1f} m or more from its edge (features {ids}). Use a smaller SIZE, untick "
        "INSIDE, or merge the stratum with a neighbour."),
    (False, CIRCLE): QT_TRANSLATE_NOOP(
        "PlotwiseEngine",
        "Stratum {key} is too small for a circle unit of SIZE {size:g} m wholly inside it: no point "
        "lies {radius:.1f} m or more from its edge (features {ids}). Use a smaller SIZE, untick "
        "INSIDE, or merge the stratum with a neighbour."),
    (False, LINE): QT_TRANSLATE_NOOP(
        "PlotwiseEngine",
        "Stratum {key} is too small for a line unit of SIZE {size:g} m wholly inside it: no point "
        "lies {radius:.1f} m or more from its edge (features {ids}). Use a smaller SIZE, untick "
        "INSIDE, or merge the stratum with a neighbour."),
}
# most candidate points a systematic grid may test in one stratum (about 0.5 GB of work arrays)
MAX_GRID_CANDIDATES = 5_000_000
PRIMARY, RESERVE = "primary", "reserve"
# GPS waypoint descriptions: one template per unit shape and role (and transect end), so that a
# translator sees each whole phrase; the English text is what the GPX files always carried
_WAYPOINT_TEXT = {
    (POINT, PRIMARY): QT_TRANSLATE_NOOP("PlotwiseEngine", "point unit {unit} (primary, stratum {stratum})"),
    (POINT, RESERVE): QT_TRANSLATE_NOOP("PlotwiseEngine", "point unit {unit} (reserve, stratum {stratum})"),
    (SQUARE, PRIMARY): QT_TRANSLATE_NOOP("PlotwiseEngine", "square unit {unit} (primary, stratum {stratum})"),
    (SQUARE, RESERVE): QT_TRANSLATE_NOOP("PlotwiseEngine", "square unit {unit} (reserve, stratum {stratum})"),
    (CIRCLE, PRIMARY): QT_TRANSLATE_NOOP("PlotwiseEngine", "circle unit {unit} (primary, stratum {stratum})"),
    (CIRCLE, RESERVE): QT_TRANSLATE_NOOP("PlotwiseEngine", "circle unit {unit} (reserve, stratum {stratum})"),
}
_TRANSECT_END_TEXT = {
    ("start", PRIMARY): QT_TRANSLATE_NOOP(
        "PlotwiseEngine",
        "start of transect {unit} (primary, stratum {stratum}, bearing {bearing:.0f} deg)"),
    ("start", RESERVE): QT_TRANSLATE_NOOP(
        "PlotwiseEngine",
        "start of transect {unit} (reserve, stratum {stratum}, bearing {bearing:.0f} deg)"),
    ("end", PRIMARY): QT_TRANSLATE_NOOP(
        "PlotwiseEngine",
        "end of transect {unit} (primary, stratum {stratum}, bearing {bearing:.0f} deg)"),
    ("end", RESERVE): QT_TRANSLATE_NOOP(
        "PlotwiseEngine",
        "end of transect {unit} (reserve, stratum {stratum}, bearing {bearing:.0f} deg)"),
}
MIN_PER_STRATUM = 2  # a stratum variance needs two units: common practice
# With INSIDE, a warning when the edge band where no centre can fall exceeds this share of a
# stratum: the estimate then carries the inner part's density over a large unsampled band (our choice).
EDGE_BAND_WARNING_SHARE = 0.2


# ----------------------------------------------------------------------------
# results
# ----------------------------------------------------------------------------
@dataclass(frozen=True)
class LayoutSpec:
    """The design of a layout (the algorithm's parameters, checked).

    Attributes
    ----------
    design : int
        0 simple random, 1 systematic grid, 2 spatially balanced.
    shape : int
        0 point, 1 square (side ``size``), 2 circle (radius ``size``), 3 line
        transect (length ``size``).
    size : float
        Metres.
    bearing : float
        Degrees clockwise from grid north, or -1 for random.
    inside : bool
        Keep every unit wholly inside its stratum.
    min_spacing : float
        Metres between unit centres over the whole layout (0: none).
    reserve : int
        Reserve units per stratum.
    margin : float
        Metres added to the plus-sampling reach (the design comparison adds the
        half-diagonal of its surface cells); 0 for a real layout.
    """

    design: int = SPATIALLY_BALANCED
    shape: int = POINT
    size: float = 0.0
    bearing: float = 0.0
    inside: bool = False
    min_spacing: float = 0.0
    reserve: int = 0
    margin: float = 0.0

    def __post_init__(self):
        if self.design not in (0, 1, 2):
            raise InputError(message(QT_TRANSLATE_NOOP("PlotwiseEngine",
                "DESIGN must be 0 (simple random), 1 (systematic grid) or 2 (spatially balanced).")))
        if self.shape not in (0, 1, 2, 3):
            raise InputError(message(QT_TRANSLATE_NOOP("PlotwiseEngine",
                "SHAPE must be 0 (point), 1 (square), 2 (circle) or 3 (line transect).")))
        if not self.size >= 0 or (self.shape != POINT and not self.size > 0):
            raise InputError(message(_SIZE_NOT_POSITIVE[self.shape], size=self.size))
        if self.bearing != RANDOM_BEARING and not (0 <= self.bearing < 360):
            raise InputError(message(QT_TRANSLATE_NOOP("PlotwiseEngine",
                "BEARING must be -1 (random) or between 0 and 360 degrees; it is {bearing}."),
                                     bearing=self.bearing))
        if self.min_spacing < 0:
            raise InputError(message(QT_TRANSLATE_NOOP("PlotwiseEngine", "MIN_SPACING must be 0 or more metres.")))
        if self.reserve < 0 or int(self.reserve) != self.reserve:
            raise InputError(message(QT_TRANSLATE_NOOP("PlotwiseEngine",
                "RESERVE must be 0 or a positive whole number.")))

    @property
    def radius(self):
        """Circumscribing radius of one unit (m)."""
        return circumscribing_radius(self.shape, self.size)

    @property
    def unit_area(self):
        """Area of one unit (m²; NaN for transects and for points without a counting radius)."""
        return unit_area(self.shape, self.size)

    @property
    def edge(self):
        """The edge protocol: :data:`edge.INSIDE` with ``inside``, else plus sampling."""
        return EDGE_INSIDE if self.inside else EDGE_PLUS

    @property
    def reach(self):
        """How far the region of the centres differs from the stratum (m): in by ``R``, or out by ``R + margin``."""
        return self.radius if self.inside else self.radius + float(self.margin)


@dataclass(frozen=True, eq=False)
class PreparedStratum:
    """A stratum ready for drawing.

    Attributes
    ----------
    key : object
        The stratum value (None when the whole frame is one stratum).
    label : str
        Prefix of the unit ids (``S1``, ``forest``, ``U``).
    geometry : Polygon or MultiPolygon
        The stratum, repaired and merged.
    area : float
        ``A_h`` (m²).
    region : Polygon or MultiPolygon
        Where centres are drawn: ``geometry``, or with ``inside`` its inward
        buffer by the unit's circumscribing radius.
    effective_area : float
        ``A'_h``, the area of ``region`` (m²).
    cover : geometry.TriangleCover
        For uniform draws in ``region``.
    n : int
        Primary units asked for.
    feature_ids : tuple
        Input features of this stratum.
    """

    key: object
    label: str
    geometry: object
    area: float
    region: object
    effective_area: float
    cover: object
    n: int
    feature_ids: tuple


@dataclass(frozen=True)
class StratumSummary:
    """What was drawn in one stratum."""

    key: object
    label: str
    area: float
    effective_area: float
    n_requested: int
    n_primary: int
    n_reserve: int
    incl_p: float
    spacing: float = float("nan")  # systematic grid spacing (m)
    rotation: float = float("nan")  # systematic grid rotation (degrees)


@dataclass(frozen=True, eq=False)
class Layout:
    """Sample units in draw order, stratum by stratum.

    Per-unit arrays (length ``len(layout)``): ``unit_id``, ``stratum`` (keys),
    ``role`` ("primary" / "reserve"), ``draw_ord`` (1, 2, ... within the
    stratum), ``centres`` (n, 2), ``bearing`` (degrees), ``area_m2``,
    ``incl_p``, ``weight``, ``lon``, ``lat`` (WGS 84; NaN without a CRS) and
    ``outlines`` (coordinates per :func:`unit_shapes.unit_outlines`).
    """

    unit_id: tuple
    stratum: tuple
    role: tuple
    draw_ord: np.ndarray
    centres: np.ndarray
    bearing: np.ndarray
    area_m2: np.ndarray
    incl_p: np.ndarray
    weight: np.ndarray
    lon: np.ndarray
    lat: np.ndarray
    outlines: np.ndarray
    spec: LayoutSpec
    strata: tuple
    warnings: tuple = ()
    design: tuple = ()  # per unit: the design record (edge.design_record), for the finite-population correction

    def __len__(self):
        return len(self.unit_id)

    @property
    def is_primary(self):
        return np.asarray(self.role) == PRIMARY if self.role else np.zeros(0, dtype=bool)


@dataclass(frozen=True)
class PreparedFrame:
    """Output of :func:`prepare_strata`: the strata and the warnings met."""

    strata: tuple
    warnings: tuple = ()
    skipped_ids: tuple = ()
    repaired_ids: tuple = ()


# ----------------------------------------------------------------------------
# counts per stratum
# ----------------------------------------------------------------------------
def proportional_counts(areas, total, minimum=MIN_PER_STRATUM):
    """Split ``total`` units in proportion to ``areas`` with at least ``minimum`` each.

    ``n_h = max(minimum, total A_h / sum A)`` by repeated re-sharing: strata
    below the minimum get it and the rest of the total is shared among the
    others in proportion to area (Cochran 1977, ch. 5, proportional
    allocation). Whole numbers by largest remainders (Hamilton's method). When
    ``total < minimum H`` every stratum gets ``minimum``.

    Returns
    -------
    ndarray of int
    """
    areas = np.asarray(areas, dtype=float)
    h = len(areas)
    total = int(total)
    if h == 0:
        return np.zeros(0, dtype=int)
    if total <= minimum * h:
        return np.full(h, minimum, dtype=int)
    fixed = np.zeros(h, dtype=bool)
    share = np.zeros(h)
    for _ in range(h + 1):
        free_total = total - minimum * fixed.sum()
        free_area = areas[~fixed].sum()
        share = np.where(fixed, float(minimum), free_total * areas / free_area if free_area > 0 else 0.0)
        low = ~fixed & (share < minimum)
        if not low.any():
            break
        fixed |= low
    counts = np.floor(share).astype(int)
    left = total - counts.sum()
    if left > 0:
        remainder = share - counts
        remainder[fixed] = -1.0
        counts[np.argsort(-remainder, kind="stable")[:left]] += 1
    return np.maximum(counts, minimum)


def counts_from_field(values, feature_ids, field_name="N_FIELD"):
    """Whole numbers of units per feature, checked.

    Raises
    ------
    InputError
        Naming the features whose value is empty (NULL), negative or not a
        whole number.
    """
    bad_null, bad_neg, bad_frac = [], [], []
    out = []
    for fid, v in zip(feature_ids, values):
        try:
            f = float(v) if v is not None else float("nan")
        except (TypeError, ValueError):
            f = float("nan")
        if not math.isfinite(f):
            bad_null.append(fid)
        elif f < 0:
            bad_neg.append(fid)
        elif f != math.floor(f):
            bad_frac.append(fid)
        out.append(int(f) if math.isfinite(f) and f >= 0 and f == math.floor(f) else -1)
    if bad_null:
        raise InputError(
            message(QT_TRANSLATE_NOOP("PlotwiseEngine", "{field} is empty (NULL) or not a number for feature(s) {ids}. "
                    "Give every stratum a whole number of units, or leave N_FIELD unset to use N_UNITS."),
                    field=field_name, ids=listed_ids(bad_null)),
            ids=bad_null,
        )
    if bad_neg:
        raise InputError(
            message(QT_TRANSLATE_NOOP("PlotwiseEngine",
                "{field} is negative for feature(s) {ids}. Use 0 or a positive whole number."),
                    field=field_name, ids=listed_ids(bad_neg)),
            ids=bad_neg,
        )
    if bad_frac:
        raise InputError(
            message(QT_TRANSLATE_NOOP("PlotwiseEngine",
                "{field} is not a whole number for feature(s) {ids}. Round the allocation to whole units first."),
                    field=field_name, ids=listed_ids(bad_frac)),
            ids=bad_frac,
        )
    return np.asarray(out, dtype=int)


def unit_id_prefix(key):
    """Unit-id prefix for a stratum value: ``S3`` for 3, ``forest`` for "forest"."""
    if key is None:
        return "U"
    try:
        f = float(key)
        if math.isfinite(f) and f == math.floor(f):
            return f"S{int(f)}"
    except (TypeError, ValueError):
        pass
    text = re.sub(r"[^A-Za-z0-9_]+", "_", str(key)).strip("_")[:12]
    return text or "S"


# ----------------------------------------------------------------------------
# preparing the strata
# ----------------------------------------------------------------------------
@dataclass(frozen=True, eq=False)
class FrameInput:
    """The checked input of :func:`prepare_strata` (see there for the meaning of each field).

    ``known_valid`` holds, per feature, whether the caller's own validity check (the host's)
    found its geometry valid; the others are checked here.
    """

    geometries: tuple
    feature_ids: tuple
    strata: tuple
    n_values: tuple
    n_units: int
    spec: LayoutSpec
    stratum_field: str
    n_field: str
    cover_method: str
    known_valid: tuple


def _prepare_strata_iv(geometries, feature_ids, strata, n_values, n_units, spec, stratum_field, n_field, cover_method,
                       valid):
    """Check the arguments of :func:`prepare_strata` and freeze them into a :class:`FrameInput`."""
    geometries = tuple(geometries)
    feature_ids = tuple(range(len(geometries))) if feature_ids is None else tuple(feature_ids)
    if n_values is None and (n_units is None or int(n_units) < 1):
        raise InputError(message(QT_TRANSLATE_NOOP("PlotwiseEngine",
            "Give N_FIELD (units per stratum) or N_UNITS (a total of at least 1).")))
    known_valid = tuple(bool(v) for v in valid) if valid is not None else (False,) * len(geometries)
    return FrameInput(
        geometries, feature_ids, None if strata is None else tuple(strata),
        None if n_values is None else tuple(n_values), None if n_units is None else int(n_units),
        spec or LayoutSpec(), stratum_field, n_field, cover_method, known_valid,
    )


@dataclass(frozen=True, eq=False)
class _UsableFeatures:
    """Features kept for the frame (index into the input, repaired geometry) and those left out."""

    kept: tuple
    skipped_ids: tuple
    repaired_ids: tuple
    warnings: tuple


def usable_features(frame_input):
    """Repair invalid features, skip empty ones, zero-area ones and slivers (with warnings).

    Only features that the caller's check did not find valid are checked again (GEOS validity:
    one check per feature, the costly part for long outlines). Sliver parts, under
    ``geometry.SLIVER_AREA``, are removed: they would only stretch the grid's extent.

    Raises
    ------
    InputError
        When no feature is left.
    """
    ids = frame_input.feature_ids
    keep, skipped, slivers, repaired = [], [], [], []
    for i, (g, known) in enumerate(zip(frame_input.geometries, frame_input.known_valid)):
        fixed = geo.repair_polygonal(g, known_valid=known)
        if fixed.was_invalid:
            repaired.append(ids[i])
        if fixed.geometry.is_empty or fixed.geometry.area <= 0:
            skipped.append(ids[i])
            continue
        kept, _ = geo.without_slivers(fixed.geometry)
        if kept.is_empty:
            slivers.append(ids[i])
            continue
        keep.append((i, kept))
    warnings = []
    if repaired:
        warnings.append(message(QT_TRANSLATE_NOOP("PlotwiseEngine",
            "Invalid geometry was repaired for feature(s) {ids}; check their outlines."),
                                ids=listed_ids(repaired)))
    if skipped:
        warnings.append(message(QT_TRANSLATE_NOOP("PlotwiseEngine",
            "Empty or zero-area feature(s) {ids} were skipped."), ids=listed_ids(skipped)))
    if slivers:
        warnings.append(message(QT_TRANSLATE_NOOP("PlotwiseEngine",
            "Feature(s) {ids} have less than {area:g} m² of area (slivers, e.g. left over by an "
            "overlay or a reprojection) and were skipped."), ids=listed_ids(slivers),
                                area=geo.SLIVER_AREA))
    if not keep:
        raise InputError(message(QT_TRANSLATE_NOOP("PlotwiseEngine",
            "The frame has no polygon of {area:g} m² or more: every feature is empty, has zero "
            "area or is a sliver."), area=geo.SLIVER_AREA))
    return _UsableFeatures(tuple(keep), tuple(skipped + slivers), tuple(repaired), tuple(warnings))


@dataclass(frozen=True, eq=False)
class _MergedStrata:
    """Strata in sorted key order: keys, unit-id labels, merged geometries, areas, members."""

    keys: tuple
    labels: tuple
    geometries: tuple
    areas: tuple
    members: tuple  # per stratum: the input indexes of its features
    feature_ids: tuple  # per stratum: their ids


def merge_strata(frame_input, kept):
    """Group the kept features by stratum value and merge each group into one geometry.

    Raises
    ------
    InputError
        For a feature without a stratum value (NULL) when strata are given.
    """
    ids, strata = frame_input.feature_ids, frame_input.strata
    groups = {}
    for i, g in kept:
        key = strata[i] if strata is not None else None
        if strata is not None and key is None:
            raise InputError(
                message(QT_TRANSLATE_NOOP("PlotwiseEngine",
                    "{field} is empty (NULL) for feature {fid}. Give it a stratum value."),
                        field=frame_input.stratum_field, fid=ids[i]),
                ids=[ids[i]],
            )
        groups.setdefault(key, []).append((i, g))
    keys = sorted(groups, key=natural_key)
    labels = [unit_id_prefix(k) for k in keys]
    if len(set(labels)) != len(labels):  # e.g. "a b" and "a_b"
        labels = [f"S{j + 1}" for j in range(len(keys))]
    merged = []
    for key in keys:
        members = groups[key]
        if len(members) == 1:
            merged.append(members[0][1])  # repaired already
        else:
            merged.append(geo.repair_polygonal(unary_union([m[1] for m in members])).geometry)
    return _MergedStrata(
        tuple(keys), tuple(labels), tuple(merged), tuple(float(g.area) for g in merged),
        tuple(tuple(i for i, _ in groups[k]) for k in keys),
        tuple(tuple(ids[i] for i, _ in groups[k]) for k in keys),
    )


def units_per_stratum(frame_input, kept, merged):
    """``n_h`` per stratum, from the units field or the total by area, and the warnings met.

    The units field is checked on the kept features only (a skipped empty feature may lack a
    value) and must carry one value per stratum.

    Returns
    -------
    (ndarray of int, list of Message)
    """
    if frame_input.n_values is None:
        n_units = frame_input.n_units
        counts = proportional_counts(merged.areas, n_units)
        if n_units < MIN_PER_STRATUM * len(merged.keys):
            return counts, [message(
                QT_TRANSLATE_NOOP("PlotwiseEngine",
                    "N_UNITS = {n_units} is fewer than {minimum} per stratum for {n_strata} strata; "
                    "every stratum gets {minimum} ({total} units)."),
                n_units=n_units, minimum=MIN_PER_STRATUM, n_strata=len(merged.keys), total=int(counts.sum()))]
        return counts, []
    ids = frame_input.feature_ids
    rows = [i for i, _ in kept]
    n_feat = dict(zip(rows, counts_from_field([frame_input.n_values[i] for i in rows], [ids[i] for i in rows],
                                              frame_input.n_field)))
    counts = []
    for key, members, member_ids in zip(merged.keys, merged.members, merged.feature_ids):
        values = {int(n_feat[i]) for i in members}
        if len(values) > 1:
            n_field = frame_input.n_field
            raise InputError(
                message(
                    QT_TRANSLATE_NOOP("PlotwiseEngine",
                        "The features of the frame (no stratum field) carry different {n_field} values ({values}) "
                        "(features {ids}). {n_field} is the number of units of the whole stratum: give its features "
                        "the same value or choose a stratum field so that each feature is a stratum.")
                    if key is None else
                    QT_TRANSLATE_NOOP("PlotwiseEngine",
                        "The features of stratum {key} carry different {n_field} values ({values}) (features {ids}). "
                        "{n_field} is the number of units of the whole stratum: give its features the same value."),
                    key=key, n_field=n_field, values=", ".join(str(v) for v in sorted(values)),
                    ids=listed_ids(member_ids)),
                ids=list(member_ids),
            )
        counts.append(values.pop())
    return np.asarray(counts, dtype=int), []


def sampling_region(key, geometry, area, n, feature_ids, spec):
    """Where the centres of a stratum are drawn, its effective area ``A'_h`` and the warnings met.

    With ``inside`` the region is the stratum shrunk by the unit's circumscribing radius
    (:func:`geometry.inward_buffer`); a band of more than ``EDGE_BAND_WARNING_SHARE`` of the
    stratum where no centre can fall is warned about, as are strata with no or one unit.
    Otherwise it is the stratum grown by the unit's reach, for plus sampling
    (:func:`edge.plus_region`).

    Raises
    ------
    InputError
        When units are asked for and nothing is left after shrinking.
    """
    radius = spec.radius if spec.inside else 0.0
    if radius > 0:
        region = geo.inward_buffer(geometry, radius)
    else:
        region = plus_region(geometry, 0.0 if spec.inside else spec.reach)
    effective = float(region.area) if not region.is_empty else 0.0
    if effective <= 0 and n + spec.reserve > 0:
        raise InputError(
            message(_TOO_SMALL[key is None, spec.shape], key=key, size=spec.size, radius=radius,
                    ids=listed_ids(feature_ids)),
            ids=list(feature_ids),
        )
    warnings = []
    band = 1.0 - effective / area if area > 0 else 0.0
    if radius > 0 and effective > 0 and band > EDGE_BAND_WARNING_SHARE:
        warnings.append(message(
            QT_TRANSLATE_NOOP("PlotwiseEngine",
                "Keeping units inside leaves {share:.0%} of the frame (the band within {radius:g} m of its edge) "
                "where no unit centre can fall; the estimate carries the inner part's density over that band. "
                "If density differs near edges, turn INSIDE off or use smaller units.") if key is None else
            QT_TRANSLATE_NOOP("PlotwiseEngine",
                "Keeping units inside leaves {share:.0%} of stratum {key} (the band within {radius:g} m of its "
                "edge) where no unit centre can fall; the estimate carries the inner part's density over that "
                "band. If density differs near edges, turn INSIDE off or use smaller units."),
            share=band, radius=radius, key=key))
    if n == 0:
        warnings.append(message(QT_TRANSLATE_NOOP("PlotwiseEngine",
            "The frame gets no units; the estimate cannot speak for it.") if key is None
                                else QT_TRANSLATE_NOOP("PlotwiseEngine",
                                    "Stratum {key} gets no units; the estimate cannot speak for it."), key=key))
    elif n == 1:
        warnings.append(message(QT_TRANSLATE_NOOP("PlotwiseEngine",
            "The frame gets one unit only; its variance cannot be estimated.") if key is None
                                else QT_TRANSLATE_NOOP("PlotwiseEngine",
                                    "Stratum {key} gets one unit only; its variance cannot be estimated."), key=key))
    return region, effective, warnings


def _cover_for_design(region, effective, n, spec, cover_method):
    """The triangle cover of a region, sized for the uniform points the design will draw there."""
    if effective <= 0:
        return geo.triangle_cover(None)
    if spec.design == SIMPLE_RANDOM:
        draws = (n + spec.reserve) * (3 if spec.min_spacing > 0 else 1.1)
    else:  # the balanced start is one uniform point; the grid needs none
        draws = 1
    return geo.triangle_cover(region, cover_method, expected_points=draws)


def prepare_strata(
    geometries,
    feature_ids=None,
    strata=None,
    n_values=None,
    n_units=None,
    spec=None,
    stratum_field="STRATUM_FIELD",
    n_field="N_FIELD",
    cover_method="auto",
    valid=None,
):
    """Repair, merge and size the strata of a frame.

    Parameters
    ----------
    geometries : sequence of shapely geometries (projected, metres)
    feature_ids : sequence, optional
        Ids used in messages (default 0, 1, ...).
    strata : sequence, optional
        Stratum value of each feature; None: the whole frame is one stratum.
    n_values : sequence, optional
        Units per stratum, one value per feature (the same value on every
        feature of a stratum). Takes precedence over ``n_units``.
    n_units : int, optional
        Total units split by area (:func:`proportional_counts`).
    spec : LayoutSpec
        For ``inside``, the unit radius and the design.
    stratum_field, n_field : str
        How messages name the stratum and units fields.
    cover_method : {"auto", "delaunay", "bbox"}
        Sampler for uniform points (:func:`geometry.triangle_cover`); "auto"
        picks the cheaper exact one for the number of points the design draws.
    valid : sequence of bool, optional
        Per feature, True where the caller's own GEOS validity check (the
        host's) found it valid: it is not checked again.

    Returns
    -------
    PreparedFrame
    """
    frame_input = _prepare_strata_iv(geometries, feature_ids, strata, n_values, n_units, spec, stratum_field, n_field,
                                     cover_method, valid)
    spec = frame_input.spec
    usable = usable_features(frame_input)
    merged = merge_strata(frame_input, usable.kept)
    warnings = list(usable.warnings) + _overlap_problems(merged.keys, merged.geometries)
    counts, count_warnings = units_per_stratum(frame_input, usable.kept, merged)
    warnings += count_warnings
    out = []
    for key, label, g, area, n, ids in zip(merged.keys, merged.labels, merged.geometries, merged.areas, counts,
                                           merged.feature_ids):
        region, effective, region_warnings = sampling_region(key, g, area, int(n), ids, spec)
        warnings += region_warnings
        cover = _cover_for_design(region, effective, int(n), spec, frame_input.cover_method)
        out.append(PreparedStratum(key, label, g, area, region, effective, cover, int(n), ids))
    return PreparedFrame(tuple(out), tuple(warnings), usable.skipped_ids, usable.repaired_ids)


def _overlap_problems(keys, geometries):
    """Warnings for strata that overlap a little; an error when they overlap by more than a trace.

    A location belongs to one stratum: where two overlap, units are drawn in both and their
    weights count the shared area twice. The rule is ``geometry.OVERLAP_ERROR_SHARE``'s.
    """
    pairs = geo.overlapping_pairs(geometries) if len(keys) > 1 else []
    if not pairs:
        return []
    listed = geo.listed_overlaps(keys, pairs, 1e4, "ha")
    if geo.worst_overlap_share(geometries, pairs) > geo.OVERLAP_ERROR_SHARE:
        raise InputError(message(QT_TRANSLATE_NOOP("PlotwiseEngine",
            "Strata overlap ({pairs}): a location belongs to one stratum only, and units in a shared area would be "
            "drawn in both strata and weighted twice. Make the strata polygons disjoint (for example with the "
            "host's Difference or Union tools) and run again."), pairs=listed))
    return [message(QT_TRANSLATE_NOOP("PlotwiseEngine",
        "Strata overlap slightly ({pairs}); units there belong to both. Make the strata polygons "
        "disjoint if this is more than digitising noise."), pairs=listed)]


# ----------------------------------------------------------------------------
# minimum spacing
# ----------------------------------------------------------------------------
class SpacingGuard:
    """Sequential inhibition: accepts a point only if it is at least ``d`` from every accepted point.

    Accepted points are kept in a hash of square cells of side ``d``, so a test
    looks at 3 x 3 cells (Diggle 2003, §5.8.2).
    """

    def __init__(self, distance):
        self.d = float(distance)
        self.d2 = self.d * self.d
        self.cells = {}

    def _cell(self, x, y):
        return (math.floor(x / self.d), math.floor(y / self.d))

    def take(self, points, limit=None):
        """Accept points in order; return the mask of accepted ones (at most ``limit``)."""
        points = np.asarray(points, dtype=float).reshape(-1, 2)
        mask = np.zeros(len(points), dtype=bool)
        if limit is None:
            limit = len(points)
        taken = 0
        cells = self.cells
        d2 = self.d2
        for j, (x, y) in enumerate(points.tolist()):
            if taken >= limit:
                break
            cx, cy = self._cell(x, y)
            clear = True
            for ix in (cx - 1, cx, cx + 1):
                for iy in (cy - 1, cy, cy + 1):
                    for px, py in cells.get((ix, iy), ()):
                        if (px - x) ** 2 + (py - y) ** 2 < d2:
                            clear = False
                            break
                    if not clear:
                        break
                if not clear:
                    break
            if clear:
                cells.setdefault((cx, cy), []).append((x, y))
                mask[j] = True
                taken += 1
        return mask


def hexagonal_capacity(region, distance, offsets=4, cover=None):
    """Number of points of a hexagonal lattice of spacing ``d`` that fall in ``region``.

    The hexagonal (triangular) lattice is the densest arrangement of points
    at least ``d`` apart (Fejes Toth 1940; Thue's theorem): about
    ``A / (sqrt(3)/2 d**2)`` points, plus an edge effect. The best of a few
    lattice offsets is returned, a count that certainly fits. ``cover`` (the region's
    :class:`geometry.TriangleCover`) lends its point locator.
    """
    d = float(distance)
    if region is None or region.is_empty or d <= 0:
        return 0
    area = region.area
    expected = area / (math.sqrt(3.0) / 2.0 * d * d)
    if expected > 2e6:  # too many to enumerate: the density bound
        return int(expected)
    minx, miny, maxx, maxy = region.bounds
    dy = d * math.sqrt(3.0) / 2.0
    inside_test = geo.region_test(region, cover)
    best = 0
    for k in range(int(offsets)):
        ox, oy = (k % 2) * d / 2.0, (k // 2) * dy / 2.0
        rows = np.arange(miny - dy + oy, maxy + dy, dy)
        cols = np.arange(minx - d + ox, maxx + d, d)
        xx, yy = np.meshgrid(cols, rows)
        xx = xx + (np.arange(len(rows))[:, None] % 2) * (d / 2.0)
        best = max(best, int(inside_test(xx.ravel(), yy.ravel()).sum()))
    return best


def _spacing_error(stratum, wanted, placed, spec):
    fit = hexagonal_capacity(stratum.region, spec.min_spacing, cover=stratum.cover)
    return InputError(
        message(QT_TRANSLATE_NOOP("PlotwiseEngine",
            "MIN_SPACING = {spacing:g} m cannot be met in the frame: {wanted} units were asked for "
            "(primaries and reserves), the draw placed {placed}, and at most about {fit} units fit at that spacing "
            "(a hexagonal lattice, the densest arrangement; random layouts fill up well before that). "
            "Ask for fewer units or reserves, or lower MIN_SPACING.")
            if stratum.key is None else
            QT_TRANSLATE_NOOP("PlotwiseEngine",
                "MIN_SPACING = {spacing:g} m cannot be met in stratum {key}: {wanted} units were asked for "
                "(primaries and reserves), the draw placed {placed}, and at most about {fit} units fit at that spacing "
                "(a hexagonal lattice, the densest arrangement; random layouts fill up well before that). "
                "Ask for fewer units or reserves, or lower MIN_SPACING."),
            spacing=spec.min_spacing, key=stratum.key, wanted=wanted, placed=placed, fit=fit),
        ids=[stratum.key] if stratum.key is not None else [],
    )


# ----------------------------------------------------------------------------
# designs
# ----------------------------------------------------------------------------
def simple_random_centres(stratum, count, rng, guard=None, max_candidates=None):
    """``count`` independent uniform centres in the stratum's region, in draw order.

    With a ``guard`` (minimum spacing) candidates are drawn until ``count`` are
    accepted or ``max_candidates`` (default ``200 count + 10000``) were tried.
    """
    count = int(count)
    if count <= 0:
        return np.zeros((0, 2))
    if guard is None:
        return geo.uniform_points(stratum.cover, stratum.region, count, rng)
    if max_candidates is None:
        max_candidates = 200 * count + 10000
    chunks, have, tried = [], 0, 0
    while have < count and tried < max_candidates:
        m = min(max(2 * (count - have), 64), max_candidates - tried)
        cand = geo.uniform_points(stratum.cover, stratum.region, m, rng)
        tried += m
        ok = guard.take(cand, count - have)
        chunks.append(cand[ok])
        have += int(ok.sum())
    return np.concatenate(chunks) if chunks else np.zeros((0, 2))


def balanced_centres(stratum, count, rng, guard=None):
    """``count`` centres by balanced acceptance sampling (Robertson et al. 2013), in draw order."""
    count = int(count)
    if count <= 0:
        return np.zeros((0, 2))
    accept = guard.take if guard is not None else None
    draw = balanced_acceptance_sample(
        stratum.region, count, rng, accept=accept, max_tries=None if guard is None else 200 * count + 100000,
        cover=stratum.cover,
    )
    return draw.points


@dataclass(frozen=True, eq=False)
class GridDraw:
    """A systematic grid in a stratum: primaries, reserve candidates, spacing and rotation."""

    primaries: np.ndarray
    reserves: np.ndarray
    spacing: float
    rotation: float
    offset: tuple


def grid_axes(rotation_deg):
    """Unit vectors of the grid's rows and columns rotated clockwise by ``rotation_deg``."""
    t = math.radians(rotation_deg)
    u = np.array([math.cos(t), -math.sin(t)])  # "east" axis
    v = np.array([math.sin(t), math.cos(t)])  # "north" axis
    return u, v


def systematic_grid(region, spacing, rng, bearing=RANDOM_BEARING, cover=None):
    """Square grid of ``spacing`` with a uniform random start (and rotation).

    Grid points are ``c + (i + o_1) s u + (j + o_2) s v`` with ``o ~ U(0, 1)^2``
    and axes ``u, v`` rotated clockwise by the bearing, or by ``U(0, 90)``
    degrees when ``bearing = -1``. Every location of the plane has the same
    inclusion density ``1 / s**2`` (Cochran 1977, ch. 8, systematic sampling
    with a random start). Reserves are the cell centres (offset ``(1/2, 1/2)``)
    inside the region, in random order.

    ``cover`` (the region's :class:`geometry.TriangleCover`) lends its point locator.

    Returns
    -------
    GridDraw
        ``primaries`` row by row (south to north in the rotated frame).
    """
    s = float(spacing)
    rotation = float(rng.uniform(0.0, 90.0)) if bearing == RANDOM_BEARING else float(bearing) % 90.0
    offset = (float(rng.random()), float(rng.random()))
    u, v = grid_axes(rotation)
    minx, miny, maxx, maxy = region.bounds
    c = np.array([(minx + maxx) / 2.0, (miny + maxy) / 2.0])
    half = math.hypot(maxx - minx, maxy - miny) / 2.0
    m = int(math.ceil(half / s)) + 1
    if (2 * m + 1) ** 2 > MAX_GRID_CANDIDATES:
        raise InputError(message(QT_TRANSLATE_NOOP("PlotwiseEngine",
            "A systematic grid of spacing {spacing:.3g} m over an area of {area:,.1f} m² that spreads over "
            "{width:,.0f} m x {height:,.0f} m would need {count:,} candidate points. The area is a thin sliver or "
            "far too small for the number of units: check the frame for slivers, ask for fewer units, or use "
            "another design."), spacing=s, area=float(region.area), width=maxx - minx, height=maxy - miny,
            count=(2 * m + 1) ** 2))
    idx = np.arange(-m, m + 1, dtype=float)
    jj, ii = np.meshgrid(idx, idx, indexing="ij")  # j rows, i columns
    inside = geo.region_test(region, cover)

    def points(o1, o2):
        p = c + ((ii.ravel() + o1) * s)[:, None] * u + ((jj.ravel() + o2) * s)[:, None] * v
        return p[inside(p[:, 0], p[:, 1])]
    primaries = points(*offset)
    reserves = points((offset[0] + 0.5) % 1.0, (offset[1] + 0.5) % 1.0)
    reserves = reserves[rng.permutation(len(reserves))]
    return GridDraw(primaries, reserves, s, rotation, offset)


# ----------------------------------------------------------------------------
# the layout
# ----------------------------------------------------------------------------
def _check_room_for_spacing(strata, spec):
    """Fail early where even the densest packing at MIN_SPACING cannot hold a stratum's units."""
    for st in strata:
        wanted = st.n + spec.reserve if st.n > 0 else 0
        if wanted and hexagonal_capacity(st.region, spec.min_spacing, cover=st.cover) < wanted:
            raise _spacing_error(st, wanted, 0, spec)


def grid_stratum_centres(stratum, spec, rng, guard, warnings):
    """Primaries and reserves of a stratum on its systematic grid (:func:`systematic_grid`).

    The spacing is ``s_h = sqrt(A'_h / n_h)``. With a minimum spacing, grid points closer than it
    to units of neighbouring strata are dropped and reserves kept only where they clear it.
    Warnings for dropped units, empty grids and missing reserves are appended to ``warnings``.

    Returns
    -------
    (centres, n_primary, spacing, rotation)
    """
    st, n, r = stratum, stratum.n, int(spec.reserve)
    whole = st.key is None  # the frame has no strata: messages name "the frame"
    spacing = math.sqrt(st.effective_area / n)
    if guard is not None and spacing < spec.min_spacing:
        fit = int(st.effective_area // spec.min_spacing**2)
        raise InputError(
            message(
                QT_TRANSLATE_NOOP("PlotwiseEngine",
                    "The grid spacing for {n} units in the frame would be {spacing:.1f} m, below MIN_SPACING = "
                    "{min_spacing:g} m. A square grid at {min_spacing:g} m holds about {fit} units there: "
                    "ask for at most that many, or lower MIN_SPACING.")
                if whole else
                QT_TRANSLATE_NOOP("PlotwiseEngine",
                    "The grid spacing for {n} units in stratum {key} would be {spacing:.1f} m, below "
                    "MIN_SPACING = {min_spacing:g} m. A square grid at {min_spacing:g} m holds about {fit} units "
                    "there: ask for at most that many, or lower MIN_SPACING."),
                n=n, key=st.key, spacing=spacing, min_spacing=spec.min_spacing, fit=fit),
            ids=[st.key] if st.key is not None else [],
        )
    grid = systematic_grid(st.region, spacing, rng, spec.bearing, cover=st.cover)
    prim, res = grid.primaries, grid.reserves
    if guard is not None:
        ok = guard.take(prim)
        if not ok.all():
            warnings.append(message(
                QT_TRANSLATE_NOOP("PlotwiseEngine",
                    "{n} grid unit(s) of the frame were dropped: closer than MIN_SPACING to units "
                    "of a neighbouring stratum.") if whole else
                QT_TRANSLATE_NOOP("PlotwiseEngine",
                    "{n} grid unit(s) of stratum {key} were dropped: closer than MIN_SPACING to units "
                    "of a neighbouring stratum."), n=int((~ok).sum()), key=st.key))
        prim = prim[ok]
        res = res[guard.take(res, r)]
    else:
        res = res[:r]
    if len(prim) == 0:
        warnings.append(message(
            QT_TRANSLATE_NOOP("PlotwiseEngine",
                "No grid point fell in the frame (spacing {spacing:.1f} m); it gets no units. "
                "Use the simple random or spatially balanced design for small or thin strata.") if whole else
            QT_TRANSLATE_NOOP("PlotwiseEngine",
                "No grid point fell in stratum {key} (spacing {spacing:.1f} m); it gets no units. "
                "Use the simple random or spatially balanced design for small or thin strata."),
            spacing=spacing, key=st.key))
    if len(res) < r:
        warnings.append(message(
            QT_TRANSLATE_NOOP("PlotwiseEngine",
                "The frame has only {n} of {r} reserve units.") if whole
            else QT_TRANSLATE_NOOP("PlotwiseEngine",
                "Stratum {key} has only {n} of {r} reserve units."), n=len(res), r=r, key=st.key))
    return np.concatenate([prim, res]), len(prim), spacing, grid.rotation


def _stratum_units(stratum, spec, rng, guard, warnings):
    """Centres (primaries then reserves), unit bearings, and the stratum's summary."""
    st, n = stratum, stratum.n
    r = int(spec.reserve) if n > 0 else 0
    spacing = rotation = float("nan")
    if n == 0:
        centres, n_primary = np.zeros((0, 2)), 0
    elif spec.design == SYSTEMATIC_GRID:
        centres, n_primary, spacing, rotation = grid_stratum_centres(st, spec, rng, guard, warnings)
    else:
        draw = simple_random_centres if spec.design == SIMPLE_RANDOM else balanced_centres
        centres = draw(st, n + r, rng, guard)
        if len(centres) < n + r:
            raise _spacing_error(st, n + r, len(centres), spec)
        n_primary = n
    m = len(centres)
    if spec.bearing == RANDOM_BEARING:
        bearings = rng.uniform(0.0, 360.0, m)
    else:
        bearings = np.full(m, float(spec.bearing))
    a = spec.unit_area
    if n > 0:
        incl = n * a / st.effective_area if a > 0 else n / st.effective_area  # a NaN: density
    else:
        incl = float("nan")
    summary = StratumSummary(st.key, st.label, st.area, st.effective_area, n, n_primary, m - n_primary, incl,
                             spacing, rotation)
    return centres, bearings, summary


_TRANSFORMERS = threading.local()  # per thread (pyproj transformers are not shared between threads)


def _lonlat(crs):
    """:func:`crs.lonlat_transformer` of ``crs``, kept for the calling thread's next layouts in the same CRS
    (making one costs more than transforming ten thousand points)."""
    kept = getattr(_TRANSFORMERS, "by_crs", None)
    if kept is None:
        kept = _TRANSFORMERS.by_crs = {}
    if crs not in kept:
        if len(kept) >= 4:
            kept.clear()
        kept[crs] = lonlat_transformer(crs)
    return kept[crs]


def _assemble_layout(strata, drawn, spec, crs, warnings):
    """The :class:`Layout` from each stratum's ``(centres, bearings, summary)``, in stratum order."""
    unit_id, stratum, role, design = [], [], [], []
    for st, (centres, _, s) in zip(strata, drawn):
        m = len(centres)
        design += [design_record(spec.design, spec.min_spacing, spec.radius, s.spacing)] * m
        template = f"{st.label}-%0{max(3, len(str(m)))}d"  # S1-001, S1-002, ...
        unit_id += [template % k for k in range(1, m + 1)]
        stratum += [st.key] * m
        role += [PRIMARY] * s.n_primary + [RESERVE] * (m - s.n_primary)
    if drawn:
        draw_ord = np.concatenate([np.arange(1, len(c) + 1) for c, _, _ in drawn])
        centres = np.concatenate([c for c, _, _ in drawn])
        bearing = np.concatenate([b for _, b, _ in drawn])
        incl_p = np.concatenate([np.full(len(c), s.incl_p) for c, _, s in drawn])
    else:
        draw_ord, centres, bearing, incl_p = np.zeros(0, int), np.zeros((0, 2)), np.zeros(0), np.zeros(0)
    weight = np.where(incl_p > 0, 1.0 / np.where(incl_p > 0, incl_p, 1.0), np.nan)
    area_m2 = np.full(len(unit_id), spec.unit_area)
    if crs is not None and len(centres):
        lon, lat = _lonlat(crs).transform(centres[:, 0], centres[:, 1])
        lon, lat = np.asarray(lon, dtype=float), np.asarray(lat, dtype=float)
    else:
        lon = lat = np.full(len(unit_id), np.nan)
    outlines = unit_outlines(spec.shape, centres, bearing, spec.size)
    return Layout(
        tuple(unit_id), tuple(stratum), tuple(role), draw_ord.astype(int), centres, bearing, area_m2, incl_p, weight,
        lon, lat, outlines, spec, tuple(s for _, _, s in drawn), tuple(warnings), tuple(design),
    )


def draw_layout(frame, spec, rng, crs=None, progress=None):
    """Draw the units of every stratum.

    Parameters
    ----------
    frame : PreparedFrame or sequence of PreparedStratum
    spec : LayoutSpec
    rng : numpy.random.Generator
        The run's only generator.
    crs : str, optional
        The computation CRS (WKT, "EPSG:n"), for ``lon``/``lat`` in WGS 84.
    progress : callable, optional
        ``progress(fraction) -> bool``; True cancels (raises ``Cancelled``).

    Returns
    -------
    Layout

    Raises
    ------
    InputError
        When MIN_SPACING cannot be met (stating the most units that fit) or a
        systematic spacing would be below MIN_SPACING.
    """
    strata = frame.strata if isinstance(frame, PreparedFrame) else tuple(frame)
    warnings = list(frame.warnings) if isinstance(frame, PreparedFrame) else []
    guard = SpacingGuard(spec.min_spacing) if spec.min_spacing > 0 else None
    if guard is not None and spec.design != SYSTEMATIC_GRID:
        _check_room_for_spacing(strata, spec)
    drawn = []
    for h, st in enumerate(strata):
        if progress is not None and progress(h / max(len(strata), 1)):
            raise Cancelled("Cancelled while drawing the layout.")
        drawn.append(_stratum_units(st, spec, rng, guard, warnings))
    layout = _assemble_layout(strata, drawn, spec, crs, warnings)
    if progress is not None and progress(1.0):
        raise Cancelled("Cancelled while drawing the layout.")
    return layout


def layout_units(geometries, spec, rng, feature_ids=None, strata=None, n_values=None, n_units=None, crs=None,
                 progress=None):
    """:func:`prepare_strata` then :func:`draw_layout` in one call."""
    frame = prepare_strata(geometries, feature_ids, strata, n_values, n_units, spec)
    return draw_layout(frame, spec, rng, crs=crs, progress=progress)


# ----------------------------------------------------------------------------
# GPS waypoints
# ----------------------------------------------------------------------------
@dataclass(frozen=True)
class Waypoints:
    """Waypoints for a GPS: names, WGS 84 positions and descriptions."""

    name: tuple
    lon: np.ndarray
    lat: np.ndarray
    description: tuple


def layout_waypoints(layout, crs):
    """One waypoint per unit centre, or a start (``<id>A``) and end (``<id>B``) per transect.

    Parameters
    ----------
    layout : Layout
    crs : str
        The computation CRS of ``layout.centres``.
    """
    to_wgs = lonlat_transformer(crs)
    if layout.spec.shape == LINE:
        ends = transect_ends(layout.centres, layout.bearing, layout.spec.size)
        x = ends[:, :, 0].ravel()
        y = ends[:, :, 1].ravel()
        names = tuple(n for uid in layout.unit_id for n in (f"{uid}A", f"{uid}B"))
        desc = tuple(
            message(_TRANSECT_END_TEXT[what, role], unit=uid, stratum=1 if s is None else s, bearing=float(b))
            for uid, role, s, b in zip(layout.unit_id, layout.role, layout.stratum, layout.bearing)
            for what in ("start", "end")
        )
    else:
        x, y = layout.centres[:, 0], layout.centres[:, 1]
        names = tuple(layout.unit_id)
        desc = tuple(
            message(_WAYPOINT_TEXT[layout.spec.shape, role], unit=uid, stratum=1 if s is None else s)
            for uid, role, s in zip(layout.unit_id, layout.role, layout.stratum)
        )
    if len(x) == 0:
        return Waypoints((), np.zeros(0), np.zeros(0), ())
    lon, lat = to_wgs.transform(np.asarray(x), np.asarray(y))
    return Waypoints(names, np.asarray(lon, float), np.asarray(lat, float), desc)
