"""The sampling frame: the part of the study area that a survey can speak for.

The frame is built by removing, in this order,

1. the excluded polygons (water, private inholdings, ...),
2. the mask polygons (raster cells outside the accepted range, e.g. slope above
   30 degrees; see :mod:`plotwise.processing.gdal_io.masking`),
3. an inward edge buffer: the strip within ``edge_buffer`` metres of the study
   area's own boundary.

Each rule is charged only with the area that was still in the frame when it was
applied, so that

    A_study = A_frame + L_exclude + L_mask + L_edge                       (1)

holds by construction. All areas are planar, in the square units of a projected
CRS (metres); the caller projects geographic inputs first.

Every function here is pure shapely/numpy and works with shapely 1.8 and 2.0.
"""
from dataclasses import dataclass, field

import numpy as np
from shapely.geometry import Polygon
from shapely.geometry.base import BaseGeometry
from shapely.ops import unary_union

from .errors import QT_TRANSLATE_NOOP, Cancelled, InputError, message
from .geometry import without_slivers
from .geometry_types import polygonal_part, valid_polygonal

#: Order in which the rules are applied, with the words used in messages.
RULES = (
    ("exclude", "excluded polygons (EXCLUDE)"),
    ("mask", "raster mask (MASK outside [MASK_MIN, MASK_MAX] or NoData)"),
    ("edge_buffer", "inward edge buffer (EDGE_BUFFER)"),
)
_RULE_LABEL = dict(RULES)


@dataclass(frozen=True)
class CleanedPolygons:
    """Polygonal geometries made ready for overlay.

    Attributes
    ----------
    geometries : tuple of shapely Polygon or MultiPolygon
        Valid, non-empty geometries with positive area, in input order.
    ids : tuple
        Feature id of each kept geometry.
    skipped_ids : tuple
        Ids of features that were empty, had no polygonal part or zero area.
    repaired_ids : tuple
        Ids of kept features whose geometry was invalid and has been repaired
        (a feature that has no area left after repair is only in ``skipped_ids``).
    """

    geometries: tuple
    ids: tuple
    skipped_ids: tuple = ()
    repaired_ids: tuple = ()

    @property
    def union(self):
        """Dissolved union of the kept geometries (an empty Polygon if none)."""
        return dissolve(self.geometries)


@dataclass(frozen=True)
class FrameLoss:
    """Area removed from the frame by one rule.

    Attributes
    ----------
    rule : str
        ``"exclude"``, ``"mask"`` or ``"edge_buffer"``.
    label : str
        The rule in words, for reports and messages.
    area_m2 : float
        Area removed by this rule, counting only what was still in the frame
        when the rule was applied (eq. 1 of the module docstring).
    """

    rule: str
    label: str
    area_m2: float

    @property
    def area_ha(self):
        return self.area_m2 / 1e4


@dataclass(frozen=True)
class SamplingFrame:
    """The result of :func:`build_frame`.

    Attributes
    ----------
    geometry : shapely Polygon or MultiPolygon
        The dissolved, valid frame.
    study_area_m2 : float
        Area of the dissolved study area.
    area_m2 : float
        Area of the frame.
    losses : tuple of FrameLoss
        Area lost to each rule, in the order the rules were applied.
    edge_buffer_m : float
        The inward edge buffer that was applied.
    """

    geometry: BaseGeometry
    study_area_m2: float
    area_m2: float
    losses: tuple = field(default_factory=tuple)
    edge_buffer_m: float = 0.0

    @property
    def area_ha(self):
        return self.area_m2 / 1e4

    @property
    def kept_fraction(self):
        """Frame area as a fraction of the study area."""
        return self.area_m2 / self.study_area_m2 if self.study_area_m2 > 0 else 0.0

    def loss(self, rule):
        """Area in m² lost to ``rule`` (0 when the rule was not applied)."""
        for item in self.losses:
            if item.rule == rule:
                return item.area_m2
        return 0.0


def clean_polygons(geometries, ids=None):
    """Repair invalid geometries and drop empty or zero-area ones.

    Parameters
    ----------
    geometries : sequence of shapely geometries (None allowed)
    ids : sequence, optional
        Feature ids, same length as ``geometries`` (default ``0..n-1``).

    Returns
    -------
    CleanedPolygons
        The host algorithm turns ``skipped_ids`` and ``repaired_ids`` into
        warnings.
    """
    geometries = list(geometries)
    ids = list(range(len(geometries))) if ids is None else list(ids)
    if len(ids) != len(geometries):
        raise ValueError("ids and geometries differ in length")
    kept, kept_ids, skipped, repaired = [], [], [], []
    for fid, geom in zip(ids, geometries):
        if geom is None or geom.is_empty:
            skipped.append(fid)
            continue
        was_valid = geom.is_valid
        geom = polygonal_part(geom) if was_valid else valid_polygonal(geom)
        if geom.is_empty or not geom.area > 0.0:
            skipped.append(fid)
            continue
        if not was_valid:
            repaired.append(fid)
        kept.append(geom)
        kept_ids.append(fid)
    return CleanedPolygons(tuple(kept), tuple(kept_ids), tuple(skipped), tuple(repaired))


def dissolve(geometries):
    """Union of polygonal ``geometries`` as one valid Polygon or MultiPolygon."""
    if isinstance(geometries, BaseGeometry):
        geometries = [geometries]
    geometries = [g for g in geometries if g is not None and not g.is_empty]
    if not geometries:
        return Polygon()
    merged = unary_union(geometries)
    if not merged.is_valid:  # overlay output is valid; this is a safety net
        merged = valid_polygonal(merged)
    return polygonal_part(merged)


def _check_cancel(progress, fraction):
    if progress is not None and progress(float(fraction)):
        raise Cancelled("Building the sampling frame was cancelled.")


def build_frame(study_area, exclusions=None, mask=None, edge_buffer=0.0, progress=None):
    """Sampling frame = study area − exclusions − mask − inward edge buffer.

    Parameters
    ----------
    study_area : shapely geometry or sequence of them
        Valid polygonal geometries (see :func:`clean_polygons`), in a projected
        CRS in metres. They are dissolved into one geometry.
    exclusions : shapely geometry or sequence, optional
        Polygons removed first (EXCLUDE).
    mask : shapely geometry or sequence, optional
        Polygons removed second: the raster cells outside the accepted range
        (MASK, MASK_MIN, MASK_MAX).
    edge_buffer : float
        Width in metres of the strip along the study area's boundary that is
        removed last (EDGE_BUFFER, >= 0). The strip is ``S \\ buffer(S, -d)``:
        every point closer than ``d`` to the boundary of the dissolved study
        area ``S`` (its outer boundary and the rims of its own holes).
    progress : callable, optional
        ``progress(fraction) -> bool``; True cancels (raises ``Cancelled``).

    Returns
    -------
    SamplingFrame
        With the area lost to each applied rule such that eq. (1) of the module
        docstring holds.

    Raises
    ------
    InputError
        If the study area has no area, ``edge_buffer`` is negative, or a rule
        removes everything that was left (the message names the rule).
    """
    inp = _build_frame_iv(study_area, exclusions, mask, edge_buffer, progress)
    frame = inp.study
    losses = []
    for k, (rule, geoms) in enumerate(inp.steps):
        _check_cancel(progress, (k + 0.1) / (len(inp.steps) + 1))
        before = float(frame.area)
        frame = _apply_rule(frame, rule, geoms, inp)
        after = float(frame.area) if not frame.is_empty else 0.0
        losses.append(FrameLoss(rule, _RULE_LABEL[rule], before - after))
        if frame.is_empty or after <= 0.0:
            raise InputError(_emptied_message(rule, before, inp.edge_buffer, inp.study))
    _check_cancel(progress, 1.0)
    if not frame.is_valid:
        frame = valid_polygonal(frame)
    return SamplingFrame(
        geometry=frame,
        study_area_m2=inp.study_m2,
        area_m2=float(frame.area),
        losses=tuple(losses),
        edge_buffer_m=inp.edge_buffer,
    )


@dataclass(frozen=True)
class _FrameInput:
    """The checked inputs of :func:`build_frame`: the dissolved study area and the rules to apply, in order."""

    study: BaseGeometry
    study_m2: float
    steps: tuple  # (rule, geometries or None)
    edge_buffer: float


def _build_frame_iv(study_area, exclusions, mask, edge_buffer, progress):
    edge_buffer = float(edge_buffer or 0.0)
    if not np.isfinite(edge_buffer) or edge_buffer < 0:
        raise InputError(message(QT_TRANSLATE_NOOP("PlotwiseEngine",
            "EDGE_BUFFER is {edge_buffer} m; it must be zero or a positive distance in metres."),
            edge_buffer=edge_buffer))
    _check_cancel(progress, 0.0)
    study = dissolve(study_area)
    study_m2 = float(study.area)
    if study.is_empty or study_m2 <= 0.0:
        raise InputError(message(
            QT_TRANSLATE_NOOP("PlotwiseEngine", "The study area (INPUT) has no polygon with a positive area. "
            "Check that the layer holds polygons and is in a projected CRS in metres.")
        ))
    steps = []
    if exclusions is not None:
        steps.append(("exclude", exclusions))
    if mask is not None:
        steps.append(("mask", mask))
    if edge_buffer > 0:
        steps.append(("edge_buffer", None))
    return _FrameInput(study, study_m2, tuple(steps), edge_buffer)


def _apply_rule(frame, rule, geoms, inp):
    """The frame after one rule: the rule's polygons removed, or the part farther than the edge buffer from
    the study area's boundary kept."""
    if rule == "edge_buffer":
        inner = polygonal_part(inp.study.buffer(-inp.edge_buffer))
        frame = polygonal_part(frame.intersection(inner)) if not inner.is_empty else Polygon()
    else:
        removed = dissolve(geoms)
        if not removed.is_empty:
            frame = polygonal_part(frame.difference(removed))
    # an overlay leaves slivers where edges nearly coincide (e.g. layers reprojected from other CRS):
    # parts under 1 m² are no frame, and count as lost to the rule that cut them off
    frame, _ = without_slivers(frame)
    return frame


def _emptied_message(rule, before_m2, edge_buffer, study):
    """Error text naming the rule that left nothing of the frame."""
    hectares = before_m2 / 1e4
    if rule == "exclude":
        return message(QT_TRANSLATE_NOOP("PlotwiseEngine",
            "Nothing is left of the study area (INPUT) after removing the excluded polygons "
            "(EXCLUDE): they cover all {hectares:.4g} ha. Check that EXCLUDE holds only the areas to leave out."),
            hectares=hectares,
        )
    if rule == "mask":
        return message(QT_TRANSLATE_NOOP("PlotwiseEngine",
            "Nothing is left of the frame after the raster mask (MASK): every cell over the "
            "remaining {hectares:.4g} ha is outside [MASK_MIN, MASK_MAX] or NoData. Widen the range, "
            "check the raster's units, or check that the raster covers the study area."),
            hectares=hectares,
        )
    minx, miny, maxx, maxy = study.bounds
    return message(
        QT_TRANSLATE_NOOP("PlotwiseEngine", "Nothing is left of the frame after the inward edge buffer (EDGE_BUFFER = "
        "{edge_buffer:g} m): the remaining {hectares:.4g} ha all lie within that distance of the study "
        "area's boundary (study area extent {width:.0f} m x {height:.0f} m). "
        "Use a smaller EDGE_BUFFER."),
        edge_buffer=edge_buffer, hectares=hectares, width=maxx - minx, height=maxy - miny,
    )
