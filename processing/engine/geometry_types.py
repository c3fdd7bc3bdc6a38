"""Small geometry-type helpers that work on shapely 1.8 and 2.0."""
from shapely.geometry import MultiPolygon, Polygon


def polygonal_part(geometry):
    """The polygons of a geometry (a repaired polygon may come back as a collection)."""
    if geometry is None or geometry.is_empty:
        return geometry
    if isinstance(geometry, (Polygon, MultiPolygon)):
        return geometry
    polygons = []
    for part in getattr(geometry, "geoms", []):
        part = polygonal_part(part)
        if isinstance(part, Polygon):
            polygons.append(part)
        elif isinstance(part, MultiPolygon):
            polygons.extend(part.geoms)
    if not polygons:
        return geometry
    return polygons[0] if len(polygons) == 1 else MultiPolygon(polygons)


def contains_xy(geometry, x, y):
    """Vectorised point-in-polygon test (boolean array), on shapely 2.0 and 1.8.

    Shapely 2 has ``shapely.contains_xy``; shapely 1.8 has ``shapely.vectorized.contains``.
    Points on the boundary may count either way.
    """
    import numpy as np

    x = np.asarray(x, dtype=float)
    y = np.asarray(y, dtype=float)
    try:
        from shapely import contains_xy as _contains_xy  # shapely >= 2.0
    except ImportError:
        from shapely.vectorized import contains as _contains_xy  # shapely 1.8
    return np.asarray(_contains_xy(geometry, x, y), dtype=bool)
