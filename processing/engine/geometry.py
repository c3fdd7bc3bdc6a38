"""Planar geometry for sampling: point-in-polygon, repair, inward buffers and a
triangle cover for area-weighted sampling.

Everything here works with shapely 1.8 and shapely 2.0 and takes projected
coordinates in metres.

Uniform points in a polygon
---------------------------
A uniform point in a polygon ``P`` is drawn by picking a triangle with
probability proportional to its area, then a uniform point in that triangle
(Turk 1990, "Generating random points in triangles", Graphics Gems I, p. 24):

    q = a + u (b - a) + v (c - a),   u, v ~ U(0, 1), reflected when u + v > 1.

A constrained triangulation is not available in shapely 1.8 or 2.0
(``shapely.ops.triangulate`` is the Delaunay triangulation of the vertices and
its triangles may cross the boundary). :func:`triangle_cover` therefore
triangulates the vertices (Delaunay, scipy/Qhull) and sorts every triangle into

* wholly inside ``P``: points drawn there are kept as they are;
* crossed by the boundary ("mixed"): points drawn there are kept only when they
  fall inside ``P`` (rejection);
* wholly outside ``P``: dropped.

Drawing from the kept triangles by area and rejecting the points of mixed
triangles that fall outside is rejection sampling from a region that contains
``P``, so the accepted points are exactly uniform on ``P`` (von Neumann 1951).
Only the thin band of mixed triangles costs point-in-polygon tests, so a ragged
or thin polygon costs little more than a compact one.

A triangle is mixed exactly when a polygon edge that is not a Delaunay edge
passes through it. Those triangles are found by walking each such edge through
the triangulation (Lawson's walk; Devillers, Pion & Teillaud 2002, "Walking in a
triangulation", Int. J. Found. Comput. Sci. 13:181-199). Triangles that are not
mixed are labelled inside or outside per connected group (a group has no
boundary in it), with one point-in-polygon test per group. Degenerate cases (a
vertex exactly on another edge) fall back to marking every triangle whose
bounding box meets that edge as mixed, which is conservative and keeps the
sampler exact.
"""
from dataclasses import dataclass
from functools import cached_property

import numpy as np
import shapely
from scipy import sparse
from scipy.sparse.csgraph import connected_components
from scipy.spatial import Delaunay
from shapely.geometry import MultiPolygon, Polygon
from shapely.geometry.base import BaseGeometry

from .errors import QT_TRANSLATE_NOOP, Message, message
from .geometry_types import polygonal_part, valid_polygonal
from .point_in_polygon import PointLocator

SHAPELY_2 = int(shapely.__version__.split(".")[0]) >= 2

if not SHAPELY_2:  # pragma: no cover - exercised in the shapely 1.8 venv
    import shapely.vectorized as _vectorized


# ----------------------------------------------------------------------------
# point in polygon
# ----------------------------------------------------------------------------
def contains_xy(geometry, x, y):
    """Vectorised point-in-polygon: True where (x, y) lies in ``geometry``.

    Uses ``shapely.contains_xy`` on shapely 2.0 and
    ``shapely.vectorized.contains`` on shapely 1.8. Points on the boundary count
    as outside (GEOS "contains").

    Parameters
    ----------
    geometry : shapely geometry
    x, y : array_like of float

    Returns
    -------
    ndarray of bool, shape of ``x``
    """
    x = np.asarray(x, dtype=float)
    y = np.asarray(y, dtype=float)
    if geometry is None or geometry.is_empty or x.size == 0:
        return np.zeros(x.shape, dtype=bool)
    if SHAPELY_2:
        shapely.prepare(geometry)
        return np.asarray(shapely.contains_xy(geometry, x, y), dtype=bool)
    return np.asarray(_vectorized.contains(geometry, x, y), dtype=bool)


def point_locator(geometry):
    """A :class:`point_in_polygon.PointLocator` of ``geometry``: the answers of :func:`contains_xy`, fast
    for many points on long, ragged outlines (GEOS decides what the grid cannot)."""
    return PointLocator(geometry, _rings(geometry), lambda x, y: contains_xy(geometry, x, y))


def region_test(geometry, cover=None):
    """``inside(x, y)`` for ``geometry``: the locator of ``cover`` when it covers ``geometry``, else GEOS."""
    if cover is not None and cover.geometry is geometry and cover.locator is not None:
        return cover.locator.contains
    return lambda x, y: contains_xy(geometry, x, y)


# ----------------------------------------------------------------------------
# parts, repair, buffers
# ----------------------------------------------------------------------------
def polygons_of(geometry):
    """The list of polygons of a (multi)polygon or collection."""
    if geometry is None or geometry.is_empty:
        return []
    geometry = polygonal_part(geometry)
    if geometry.is_empty:
        return []
    if isinstance(geometry, Polygon):
        return [geometry]
    if isinstance(geometry, MultiPolygon):
        return list(geometry.geoms)
    return []


def as_polygonal(polygons):
    """A Polygon, a MultiPolygon or an empty Polygon from a list of polygons."""
    polygons = [p for p in polygons if not p.is_empty]
    if not polygons:
        return Polygon()
    if len(polygons) == 1:
        return polygons[0]
    return MultiPolygon(polygons)


@dataclass(frozen=True)
class Repaired:
    """A polygonal geometry after repair.

    Attributes
    ----------
    geometry : Polygon or MultiPolygon (possibly empty)
    was_invalid : bool
        The input was not valid (self-intersection, bad ring, ...).
    """

    geometry: BaseGeometry
    was_invalid: bool


def repair_polygonal(geometry, known_valid=False):
    """Make ``geometry`` valid and keep its polygonal part (see ``geometry_types.valid_polygonal``).

    ``known_valid``: the caller's own GEOS validity check (the host's) found it valid; it is not
    checked again (the check is the costly part for long outlines).

    Returns
    -------
    Repaired
    """
    if geometry is None or geometry.is_empty:
        return Repaired(Polygon(), False)
    if known_valid or geometry.is_valid:  # one validity check: it is the costly part for long outlines
        return Repaired(polygonal_part(geometry), False)
    return Repaired(valid_polygonal(geometry), True)


#: polygons (or parts) smaller than this many square metres are slivers: left-overs of overlays and
#: reprojection, too small for any sample unit (our choice; a real stratum is thousands of m²)
SLIVER_AREA = 1.0


def without_slivers(geometry, min_area=SLIVER_AREA):
    """``geometry`` without its polygon parts of less than ``min_area`` (m²), and the area removed.

    Returns
    -------
    (Polygon or MultiPolygon, float)
        The kept parts (an empty Polygon when none is left) and the removed area.
    """
    parts = polygons_of(geometry)
    kept = [p for p in parts if p.area >= min_area]
    if len(kept) == len(parts):
        return geometry, 0.0
    return as_polygonal(kept), float(sum(p.area for p in parts if p.area < min_area))


def overlapping_pairs(geometries, min_area=SLIVER_AREA):
    """Pairs of polygonal geometries that overlap by ``min_area`` (m²) or more.

    Only pairs whose bounding boxes meet are intersected; touching along an edge
    is no overlap.

    Returns
    -------
    list of (i, j, area)
        Indexes into ``geometries`` (i < j) and the area they share.
    """
    bounds = np.array([g.bounds if not g.is_empty else (np.inf, np.inf, -np.inf, -np.inf) for g in geometries],
                      dtype=float).reshape(-1, 4)
    meet = ((bounds[:, None, 0] <= bounds[None, :, 2]) & (bounds[None, :, 0] <= bounds[:, None, 2])
            & (bounds[:, None, 1] <= bounds[None, :, 3]) & (bounds[None, :, 1] <= bounds[:, None, 3]))
    pairs = []
    for i, j in zip(*np.nonzero(np.triu(meet, 1))):
        area = float(geometries[i].intersection(geometries[j]).area)
        if area >= min_area:
            pairs.append((int(i), int(j), area))
    return pairs


#: strata sharing more than this share of the smaller one are an error; less (digitising noise), a warning
#: (our choice; layout and estimate apply the same rule, so strata accepted for a layout are accepted after)
OVERLAP_ERROR_SHARE = 0.001


def worst_overlap_share(geometries, pairs):
    """The largest shared area of :func:`overlapping_pairs` as a share of the smaller geometry of its pair."""
    return max(shared / min(geometries[i].area, geometries[j].area) for i, j, shared in pairs)


def listed_overlaps(names, pairs, m2_per_unit=1.0, unit="m²", limit=20):
    """The pairs of :func:`overlapping_pairs` as a translatable list, ``"1 and 2 (0.35 ha); …"``.

    ``names`` name the geometries; at most ``limit`` pairs are shown.
    """
    items = tuple(
        (f"p{n}", message(QT_TRANSLATE_NOOP("PlotwiseEngine",
            "{first} and {second} ({area:.4g} {unit})"), first=names[i], second=names[j],
                          area=shared / m2_per_unit, unit=unit))
        for n, (i, j, shared) in enumerate(pairs[:limit])
    )
    listed = Message("; ".join("{%s}" % name for name, _ in items), items)  # a list: no words of its own
    if len(pairs) > limit:
        listed = message(QT_TRANSLATE_NOOP("PlotwiseEngine", "{shown} … ({n} in all)"), shown=listed, n=len(pairs))
    return listed


def thinned_outline(geometry, max_vertices=2000):
    """``geometry`` with its long rings thinned to every ``k``-th vertex, for a map at screen scale.

    ``k = ceil(vertices / max_vertices)``; rings of fewer than ``8 k`` vertices are kept whole. On a
    900-pixel map a ring of tens of thousands of vertices has many per pixel: every ``k``-th keeps its
    look, and the simplification that follows (GEOS Douglas-Peucker, costly on saw-tooth outlines)
    gets a few thousand. The result is for drawing only: it may be invalid.
    """
    polygons = polygons_of(geometry)
    total = sum(len(p.exterior.coords) + sum(len(r.coords) for r in p.interiors) for p in polygons)
    if total <= max_vertices:
        return geometry
    k = int(np.ceil(total / max_vertices))

    def thin(ring):
        xy = np.asarray(ring.coords)[:, :2]
        return xy if len(xy) < 8 * k else np.vstack([xy[:-1:k], xy[:1]])

    return as_polygonal([Polygon(thin(p.exterior), [thin(r) for r in p.interiors]) for p in polygons])


def inward_buffer(geometry, distance, quad_segs=16):
    """The part of ``geometry`` farther than ``distance`` from its boundary.

    This is the set of centres of discs of radius ``distance`` that lie wholly
    inside ``geometry`` (morphological erosion, with arcs approximated by
    ``quad_segs`` segments per quarter circle; the approximation lies inside the
    true arc, so the result is slightly conservative).

    Parameters
    ----------
    geometry : Polygon or MultiPolygon
    distance : float
        Metres, >= 0.
    """
    if distance <= 0 or geometry.is_empty:
        return geometry
    # buffer's second positional argument is ``resolution`` on 1.8 and
    # ``quad_segs`` on 2.0: the same thing
    shrunk = geometry.buffer(-float(distance), int(quad_segs))
    return as_polygonal(polygons_of(shrunk))


# ----------------------------------------------------------------------------
# triangle cover
# ----------------------------------------------------------------------------
@dataclass(frozen=True, eq=False)
class TriangleCover:
    """Triangles whose union contains a polygon, for area-weighted sampling.

    Attributes
    ----------
    triangles : ndarray, shape (k, 3, 2)
        Vertex coordinates of the kept triangles.
    areas : ndarray, shape (k,)
    inside : ndarray of bool, shape (k,)
        True for triangles wholly inside the polygon; False for triangles the
        boundary passes through (their points need a point-in-polygon test).
    polygon_area : float
        Area of the polygon covered.
    geometry : Polygon or MultiPolygon, optional
        The polygon covered; its :attr:`locator` answers point-in-polygon tests.
    """

    triangles: np.ndarray
    areas: np.ndarray
    inside: np.ndarray
    polygon_area: float
    geometry: object = None

    @cached_property
    def locator(self):
        """Point locator of :attr:`geometry` (built on first use; None without a geometry)."""
        if self.geometry is None or self.geometry.is_empty:
            return None
        return point_locator(self.geometry)

    @property
    def efficiency(self):
        """Expected share of drawn points that are accepted."""
        total = float(self.areas.sum())
        return self.polygon_area / total if total > 0 else 0.0


def _rings(geometry):
    rings = []
    for polygon in polygons_of(geometry):
        rings.append(np.asarray(polygon.exterior.coords, dtype=float)[:, :2])
        rings.extend(np.asarray(r.coords, dtype=float)[:, :2] for r in polygon.interiors)
    return rings


def _cross(o, a, b):
    """z of (a - o) x (b - o), row-wise."""
    return (a[..., 0] - o[..., 0]) * (b[..., 1] - o[..., 1]) - (a[..., 1] - o[..., 1]) * (
        b[..., 0] - o[..., 0]
    )


def _boundary_edges(geometry):
    """Unique vertices and the boundary edges as vertex index pairs."""
    rings = [r for r in _rings(geometry) if len(r) >= 4]
    coords = np.concatenate(rings)
    offsets = np.cumsum([0] + [len(r) for r in rings[:-1]])
    starts = np.concatenate([np.arange(len(r) - 1) + off for r, off in zip(rings, offsets)])
    points, inverse = np.unique(coords, axis=0, return_inverse=True)
    inverse = inverse.ravel()
    edges = np.stack([inverse[starts], inverse[starts + 1]], axis=1)
    edges = edges[edges[:, 0] != edges[:, 1]]
    return points, edges


def _bbox_overlap(triangles, segment):
    lo = segment.min(axis=0)
    hi = segment.max(axis=0)
    tlo = triangles.min(axis=1)
    thi = triangles.max(axis=1)
    return np.all((tlo <= hi) & (thi >= lo), axis=1)


def _mixed_triangles(points, simplices, neighbors, missing):
    """Flags of the triangles crossed by the ``missing`` edges (vertex pairs).

    Each edge ``a -> b`` is walked from the triangle at ``a`` whose angle holds the direction
    to ``b`` (:func:`_walk_starts`) through the triangles it crosses (:func:`_walk_edges`).
    Edges whose walk meets a degenerate case (through a vertex, along a triangle edge) mark
    every triangle whose bounding box meets them instead.
    """
    n_tri = len(simplices)
    mixed = np.zeros(n_tri, dtype=bool)
    if len(missing) == 0:
        return mixed
    pa = points[missing[:, 0]]
    pb = points[missing[:, 1]]
    seg_len = np.hypot(*(pb - pa).T)
    start_tri, start_k, degenerate = _walk_starts(points, simplices, missing, seg_len)
    degenerate |= _walk_edges(points, simplices, neighbors, missing, seg_len, start_tri, start_k, degenerate, mixed)
    tris = points[simplices]
    for e in np.flatnonzero(degenerate):
        mixed |= _bbox_overlap(tris, np.stack([pa[e], pb[e]]))
    return mixed


def _walk_starts(points, simplices, missing, seg_len):
    """For each missing edge ``a -> b``: the triangle at ``a`` whose angle holds ``b``, the corner
    index of ``a`` in it, and whether that start is degenerate (no such triangle, or ``b`` on one of
    its rays)."""
    n_tri = len(simplices)
    degenerate = np.zeros(len(missing), dtype=bool)
    a_idx = missing[:, 0]
    pa = points[a_idx]
    pb = points[missing[:, 1]]
    inc_tri = np.repeat(np.arange(n_tri), 3)
    inc_k = np.tile(np.arange(3), n_tri)
    inc_v = simplices.ravel()
    order = np.argsort(inc_v, kind="stable")
    inc_tri, inc_k, inc_v = inc_tri[order], inc_k[order], inc_v[order]
    lo = np.searchsorted(inc_v, a_idx, side="left")
    hi = np.searchsorted(inc_v, a_idx, side="right")
    counts = hi - lo
    edge_of = np.repeat(np.arange(len(missing)), counts)
    pos = np.repeat(lo - np.cumsum(np.r_[0, counts[:-1]]), counts) + np.arange(counts.sum())
    cand_tri = inc_tri[pos]
    cand_k = inc_k[pos]
    u = points[simplices[cand_tri, (cand_k + 1) % 3]]
    v = points[simplices[cand_tri, (cand_k + 2) % 3]]
    a = pa[edge_of]
    b = pb[edge_of]
    c1 = _cross(a, u, b)
    c2 = _cross(a, v, b)
    hit = (c1 > 0) & (c2 < 0)
    n_hits = np.bincount(edge_of[hit], minlength=len(missing))
    degenerate |= n_hits != 1
    # touching rays (b on the ray a->u or a->v) are degenerate
    scale = seg_len[edge_of] * np.maximum(np.hypot(*(u - a).T), np.hypot(*(v - a).T))
    near = (np.abs(c1) <= 1e-12 * scale) | (np.abs(c2) <= 1e-12 * scale)
    degenerate[edge_of[near & ((c1 >= 0) & (c2 <= 0))]] = True
    start_tri = np.full(len(missing), -1)
    start_k = np.full(len(missing), -1)
    start_tri[edge_of[hit]] = cand_tri[hit]
    start_k[edge_of[hit]] = cand_k[hit]
    return start_tri, start_k, degenerate


def _walk_edges(points, simplices, neighbors, missing, seg_len, start_tri, start_k, degenerate, mixed):
    """Walk every non-degenerate missing edge through the triangles it crosses (Lawson's walk),
    marking them in ``mixed``; returns the flags of the edges whose walk turned degenerate."""
    n_tri = len(simplices)
    degenerate = degenerate.copy()
    b_idx = missing[:, 1]
    pa = points[missing[:, 0]]
    pb = points[b_idx]
    active = np.flatnonzero(~degenerate)
    cur = start_tri[active]
    mixed[cur] = True
    nxt = neighbors[cur, start_k[active]]
    prev = cur
    for _ in range(n_tri + 1):
        if active.size == 0:
            break
        bad = nxt < 0
        if bad.any():
            degenerate[active[bad]] = True
            keep = ~bad
            active, nxt, prev = active[keep], nxt[keep], prev[keep]
            if active.size == 0:
                break
        mixed[nxt] = True
        tri = simplices[nxt]
        shared = (tri[:, :, None] == simplices[prev][:, None, :]).any(axis=2)
        w_k = np.argmin(shared, axis=1)  # the vertex not in the previous triangle
        w = tri[np.arange(len(tri)), w_k]
        done = w == b_idx[active]
        a = pa[active]
        b = pb[active]
        side = np.stack([_cross(a, b, points[tri[:, k]]) for k in range(3)], axis=1)
        tol = 1e-12 * seg_len[active][:, None] * np.hypot(
            *(points[tri] - a[:, None, :]).transpose(2, 0, 1)
        )
        on_line = (np.abs(side) <= tol) & ~done[:, None]
        flat = on_line.any(axis=1)
        degenerate[active[flat]] = True
        go = ~done & ~flat
        # exit through the edge that has w and the entry vertex on the other side
        # of the line: its opposite vertex is the entry vertex on w's side
        w_left = side[np.arange(len(tri)), w_k] > 0
        k1 = (w_k + 1) % 3
        k2 = (w_k + 2) % 3
        v1_left = side[np.arange(len(tri)), k1] > 0
        opposite = np.where(w_left == v1_left, k1, k2)
        new_next = neighbors[nxt, opposite]
        active, prev, nxt = active[go], nxt[go], new_next[go]
    else:  # pragma: no cover - a walk longer than the triangulation
        degenerate[active] = True
    return degenerate


def triangle_cover(geometry, method="auto", compact_share=0.5, expected_points=None):
    """Triangles that cover ``geometry``, each marked wholly inside or mixed.

    See the module docstring for the method. The union of the kept triangles
    contains ``geometry``; the inside triangles lie wholly in it.

    A compact polygon (area at least ``compact_share`` of its bounding box) is
    covered by the two triangles of its bounding box, both mixed: rejection
    from the box then accepts at least half of the points and needs no
    triangulation, which is cheaper for polygons with many vertices. Ragged,
    thin or sparse polygons get the Delaunay cover, unless ``expected_points``
    says so few points will be drawn that testing ``expected_points / share``
    box points costs less than triangulating (taken as ``2 x vertices`` point
    tests): the cheaper exact sampler is used either way.

    Parameters
    ----------
    geometry : Polygon or MultiPolygon, valid, projected coordinates
    method : {"auto", "delaunay", "bbox"}
    compact_share : float
        Threshold of ``area / bounding-box area`` for the box cover in "auto".
    expected_points : int, optional
        Points that will be drawn from the cover ("auto" only).

    Returns
    -------
    TriangleCover
    """
    area = float(geometry.area) if geometry is not None else 0.0
    empty = TriangleCover(np.zeros((0, 3, 2)), np.zeros(0), np.zeros(0, bool), area, geometry)
    if geometry is None or geometry.is_empty or area <= 0:
        return empty
    minx, miny, maxx, maxy = geometry.bounds
    box_area = (maxx - minx) * (maxy - miny)
    share = area / box_area if box_area > 0 else 1.0
    if method == "bbox" or (method == "auto" and share >= compact_share):
        return _bbox_cover(geometry)
    if method == "auto" and expected_points is not None:
        vertices = sum(len(r) for r in _rings(geometry))
        if expected_points / share < 2 * vertices:
            return _bbox_cover(geometry)
    return _delaunay_cover(geometry, area)


def _delaunay_cover(geometry, area):
    """The Delaunay cover of :func:`triangle_cover`: triangles of the vertices, sorted into inside,
    mixed (walked by the boundary edges that are no Delaunay edges) and outside (dropped)."""
    points, edges = _boundary_edges(geometry)
    # work relative to the centre: better conditioned orientation tests
    centre = points.mean(axis=0)
    local = points - centre
    try:
        tri = Delaunay(local)
    except Exception:  # pragma: no cover - Qhull failure on degenerate input
        return _bbox_cover(geometry)
    simplices = tri.simplices.copy()
    neighbors = tri.neighbors.copy()
    # orient every triangle counter-clockwise
    cw = _cross(local[simplices[:, 0]], local[simplices[:, 1]], local[simplices[:, 2]]) < 0
    simplices[cw] = simplices[cw][:, [0, 2, 1]]
    neighbors[cw] = neighbors[cw][:, [0, 2, 1]]
    n_pts = len(local)
    # Qhull may drop coincident points ("coplanar"); their edges are walked as degenerate
    tri_edges = np.concatenate([simplices[:, [1, 2]], simplices[:, [2, 0]], simplices[:, [0, 1]]])
    tri_keys = np.sort(tri_edges, axis=1) @ np.array([n_pts, 1])
    edge_keys = np.sort(edges, axis=1) @ np.array([n_pts, 1])
    missing = edges[~np.isin(edge_keys, tri_keys)]
    mixed = _mixed_triangles(local, simplices, neighbors, missing)
    inside = _unmixed_inside(geometry, local, centre, simplices, neighbors, edge_keys, mixed)
    keep = inside | mixed
    tris = local[simplices][keep] + centre
    areas = 0.5 * np.abs(_cross(tris[:, 0], tris[:, 1], tris[:, 2]))
    ok = areas > 0
    return TriangleCover(tris[ok], areas[ok], inside[keep][ok], area, geometry)


def _unmixed_inside(geometry, local, centre, simplices, neighbors, edge_keys, mixed):
    """Inside flags of the triangles that no boundary edge crosses, one point-in-polygon test per
    connected group (triangles sharing an edge that is not a boundary edge)."""
    n_pts = len(local)
    n_tri = len(simplices)
    opp_tri = np.repeat(np.arange(n_tri), 3)
    nb = neighbors.ravel()
    pairs = ([1, 2], [2, 0], [0, 1])
    shared_edge_keys = np.concatenate([np.sort(simplices[:, pair], axis=1) for pair in pairs], axis=0)
    # reorder to match ravel order of neighbors (tri, k)
    shared_edge_keys = shared_edge_keys.reshape(3, n_tri, 2).transpose(1, 0, 2).reshape(-1, 2) @ np.array([n_pts, 1])
    link = (
        (nb >= 0)
        & ~np.isin(shared_edge_keys, edge_keys)
        & ~mixed[opp_tri]
        & ~mixed[np.where(nb >= 0, nb, 0)]
    )
    graph = sparse.coo_matrix(
        (np.ones(int(link.sum())), (opp_tri[link], nb[link])), shape=(n_tri, n_tri)
    )
    _, group = connected_components(graph, directed=False)
    tris = local[simplices]
    centroids = tris.mean(axis=1) + centre
    first = np.unique(group, return_index=True)[1]
    rep = first[~mixed[first]]
    # a group is either all mixed (singletons) or all unmixed
    rep_inside = contains_xy(geometry, centroids[rep, 0], centroids[rep, 1])
    group_inside = np.zeros(group.max() + 1, dtype=bool)
    group_inside[group[rep]] = rep_inside
    return ~mixed & group_inside[group]


def _bbox_cover(geometry):
    minx, miny, maxx, maxy = geometry.bounds
    tris = np.array(
        [[[minx, miny], [maxx, miny], [maxx, maxy]], [[minx, miny], [maxx, maxy], [minx, maxy]]],
        dtype=float,
    )
    areas = 0.5 * np.abs(_cross(tris[:, 0], tris[:, 1], tris[:, 2]))
    return TriangleCover(tris, areas, np.zeros(2, bool), float(geometry.area), geometry)


def points_in_triangles(triangles, rng):
    """One uniform point in each triangle (Turk 1990).

    Parameters
    ----------
    triangles : ndarray, shape (m, 3, 2)
    rng : numpy.random.Generator

    Returns
    -------
    ndarray, shape (m, 2)
    """
    uv = rng.random((len(triangles), 2))
    flip = uv.sum(axis=1) > 1
    uv[flip] = 1 - uv[flip]
    a = triangles[:, 0]
    return a + uv[:, :1] * (triangles[:, 1] - a) + uv[:, 1:] * (triangles[:, 2] - a)


def uniform_points(cover, geometry, n, rng, max_rounds=200):
    """``n`` independent uniform points in ``geometry``, in draw order.

    Triangles are drawn with probability ``area / sum(area)``, a uniform point
    is drawn in each, and points of mixed triangles that fall outside
    ``geometry`` are rejected (see the module docstring).

    Parameters
    ----------
    cover : TriangleCover
        From :func:`triangle_cover` on the same ``geometry``.
    geometry : Polygon or MultiPolygon
    n : int
    rng : numpy.random.Generator

    Returns
    -------
    ndarray, shape (n, 2)
    """
    n = int(n)
    out = np.zeros((0, 2))
    if n <= 0 or len(cover.areas) == 0:
        return out
    inside = region_test(geometry, cover)
    cum = np.cumsum(cover.areas)
    cum /= cum[-1]
    eff = max(cover.efficiency, 1e-3)
    chunks = []
    have = 0
    for _ in range(max_rounds):
        m = int(np.ceil((n - have) / eff * 1.1)) + 8
        pick = np.minimum(np.searchsorted(cum, rng.random(m), side="right"), len(cum) - 1)
        pts = points_in_triangles(cover.triangles[pick], rng)
        ok = cover.inside[pick].copy()
        test = ~ok
        if test.any():
            ok[test] = inside(pts[test, 0], pts[test, 1])
        pts = pts[ok]
        chunks.append(pts)
        have += len(pts)
        if have >= n:
            break
    out = np.concatenate(chunks)[:n]
    return out
