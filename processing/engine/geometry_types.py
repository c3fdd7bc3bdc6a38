"""Polygon clean-up shared by the engine, working on shapely 1.8 and 2.0."""
from shapely.geometry import GeometryCollection, MultiPolygon, Polygon

try:  # shapely >= 1.8 built against GEOS >= 3.8
    from shapely.validation import make_valid as _make_valid
except ImportError:  # pragma: no cover - depends on the host's GEOS
    _make_valid = None


def polygonal_part(geometry):
    """The polygonal part of ``geometry`` as a Polygon or MultiPolygon.

    Points and lines (which a repair or an intersection may leave behind) are
    dropped. Returns an empty Polygon when nothing polygonal remains.
    """
    if geometry is None or geometry.is_empty:
        return Polygon()
    if isinstance(geometry, (Polygon, MultiPolygon)):
        return geometry
    if isinstance(geometry, GeometryCollection) or hasattr(geometry, "geoms"):
        parts = []
        for part in geometry.geoms:
            sub = polygonal_part(part)
            if not sub.is_empty:
                parts.extend(sub.geoms if isinstance(sub, MultiPolygon) else [sub])
        if not parts:
            return Polygon()
        return parts[0] if len(parts) == 1 else MultiPolygon(parts)
    return Polygon()


def valid_polygonal(geometry):
    """A valid polygonal version of ``geometry``.

    Uses GEOS ``MakeValid`` (``shapely.validation.make_valid``) where the installed
    shapely offers it, which keeps every piece of a self-crossing ring. Otherwise
    falls back on the zero-width buffer ``buffer(0)``, the classic repair, which may
    drop the inverted lobes of a bow-tie.
    """
    if geometry is None or geometry.is_empty:
        return Polygon()
    if geometry.is_valid:
        return polygonal_part(geometry)
    if _make_valid is not None:
        repaired = polygonal_part(_make_valid(geometry))
        if repaired.is_valid:
            return repaired
    return polygonal_part(geometry.buffer(0))
