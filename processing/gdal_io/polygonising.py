"""Strata as polygons, traced from the stratum raster with numpy (no host import).

GDAL 3.6's polygonize costs about 150 ns per cell whatever the raster holds (15 s
for 10^8 cells in a thousand patches, tests/benchmarks/bench_stratify.py). The
trace here spends its time on the boundaries, which a stratum raster has few of:

1. **Runs and patches.** The raster is read by strips of full rows. Runs of equal
   ids along each row are joined with the runs of the next row that share a cell
   edge (scipy.sparse.csgraph.connected_components): a component is a patch,
   4-connected as GDAL's polygonize with its default connectedness.
2. **Boundary edges.** Every cell edge between two different ids (the outside of
   the raster counts as 0) is an edge of the stratum on either side, directed so
   that the stratum lies on its left. Unit edges along one line are joined into
   segments.
3. **Rings.** Each segment goes on with the segment of its stratum that starts
   where it ends. Where two start there (two cells of the stratum meet at a
   corner only): the left turn when the cells belong to two patches, which keeps
   4-connected patches apart; the right turn when they belong to one, which
   makes an outer ring and a hole that touch at that corner (valid polygons, no
   ring that touches itself). The cycles are put in order by pointer jumping.
4. **Polygons.** A ring's signed area (shoelace formula) tells the outer ring of
   a patch (counter-clockwise, positive) from its holes (clockwise); rings are
   grouped by patch and by stratum into one multipolygon per stratum, written as
   WKB in one numpy buffer.

Every step is a numpy operation over all the edges: no Python loop runs over patches or rings.
Grid vertices are (row, column) of cell corners; directions are those of the map (east, north, west,
south: a left turn adds 1 modulo 4).
"""
from dataclasses import dataclass

import numpy as np
from osgeo import gdal

from ..engine.errors import Cancelled
from .runs import StripRuns, run_links

#: cells per strip read from the stratum raster
STRIP_CELLS = 1 << 22
EAST, NORTH, WEST, SOUTH = 0, 1, 2, 3
#: (row, column) step of each direction (rows grow southwards)
STEP = np.array([[0, 1], [-1, 0], [0, -1], [1, 0]], np.int64)


def _edges_across_rows(above, below, run_above, run_below, line):
    """Unit edges on the grid rows between two stacks of rows: the cell above walks east, the one below west.

    ``above`` and ``below`` are 2-D (row r of each is a pair); ``line`` is the grid row of the first pair;
    ``run_above(r, c)`` / ``run_below(r, c)`` give the runs of the cells.
    """
    flat = np.flatnonzero(above != below)
    r, c = np.divmod(flat, above.shape[1])
    out = []
    for values, run_of, direction, dc in ((above, run_above, EAST, 0), (below, run_below, WEST, 1)):
        v = values[r, c]
        keep = v > 0
        rr, cc = r[keep], c[keep]
        out.append((rr + line, cc + dc, np.full(rr.size, direction, np.int8), v[keep], run_of(rr, cc)))
    return out


def _edges_across_columns(ids, runs, row0):
    """Unit edges on the grid columns of a strip: the cell right of a line walks south, the one left of it north.

    Inside the raster a line between two ids is where a run starts; the raster's
    west and east edges bound the cells of a stratum in the first and last column.
    """
    h, w = ids.shape
    inner = runs.first[runs.first % w > 0]
    r, c = np.divmod(inner, w)
    west = np.flatnonzero(ids[:, 0] > 0)
    east = np.flatnonzero(ids[:, -1] > 0)
    out = []
    # the cell right of grid column c (c, inner starts; 0, the west edge) walks south from its top corner
    rr = np.concatenate([r, west])
    cc = np.concatenate([c, np.zeros(west.size, np.int64)])
    v = ids[rr, cc]
    keep = v > 0
    rr, cc = rr[keep], cc[keep]
    out.append((rr + row0, cc, np.full(rr.size, SOUTH, np.int8), v[keep], runs.run_of(rr * w + cc)))
    # the cell left of grid column c (c - 1; w - 1 at the east edge) walks north from its bottom corner
    rr = np.concatenate([r, east])
    cc = np.concatenate([c - 1, np.full(east.size, w - 1, np.int64)])
    v = ids[rr, cc]
    keep = v > 0
    rr, cc = rr[keep], cc[keep]
    out.append((rr + row0 + 1, cc + 1, np.full(rr.size, NORTH, np.int8), v[keep], runs.run_of(rr * w + cc)))
    return out


@dataclass(frozen=True)
class _UnitEdges:
    """Directed unit boundary edges (start vertex, direction, stratum on the left, its run) and the run links."""

    row: np.ndarray
    col: np.ndarray
    direction: np.ndarray
    stratum: np.ndarray
    run: np.ndarray
    link_a: np.ndarray
    link_b: np.ndarray
    n_runs: int


def _unit_edges(band, progress=None):
    """One pass over the raster by strips: the unit edges of every stratum and the links between runs."""
    width, height = band.XSize, band.YSize
    rows = max(1, STRIP_CELLS // max(1, width))
    parts, link_a, link_b = [], [], []
    offset = 0
    prev = prev_runs = None
    zeros = np.zeros((1, width), np.uint8)
    n = -(-height // rows)
    for i, y0 in enumerate(range(0, height, rows)):
        ids = band.ReadAsArray(0, y0, width, min(rows, height - y0))
        band.FlushCache()  # GDAL's cache would keep every strip read
        runs = StripRuns(ids, offset)
        if prev is None:
            parts += _edges_across_rows(zeros, ids[:1], runs.run_at, runs.run_at, y0)
        else:  # the grid row between the previous strip and this one
            parts += _edges_across_rows(prev, ids[:1], prev_runs.last_row, runs.run_at, y0)
            seam = np.flatnonzero((prev[0] == ids[0]) & (ids[0] > 0) & (prev_runs.start[-1] | runs.start[0]))
            link_a.append(prev_runs.last_row(0, seam))
            link_b.append(runs.run_at(0, seam))
        parts += _edges_across_rows(ids[:-1], ids[1:], runs.run_at, runs.next_row, y0 + 1)
        parts += _edges_across_columns(ids, runs, y0)
        a, b = run_links(ids, runs)
        link_a.append(a)
        link_b.append(b)
        prev, prev_runs = ids[-1:].copy(), runs
        offset += runs.count
        if progress is not None and progress((i + 1) / n):
            raise Cancelled("Stratification cancelled.")
    if prev is not None:
        parts += _edges_across_rows(prev, zeros, prev_runs.last_row, prev_runs.last_row, height)
    cols = [np.concatenate([p[k] for p in parts]) for k in range(5)] if parts else [np.zeros(0, np.int64)] * 5
    return _UnitEdges(*cols, np.concatenate(link_a) if link_a else np.zeros(0, np.int64),
                      np.concatenate(link_b) if link_b else np.zeros(0, np.int64), offset)


def _patches_of_runs(edges):
    """Patch (connected component) of every run, from the links between runs of neighbouring rows."""
    from scipy.sparse import coo_matrix
    from scipy.sparse.csgraph import connected_components

    n = max(edges.n_runs, 1)
    graph = coo_matrix((np.ones(edges.link_a.size, np.int8), (edges.link_a, edges.link_b)), shape=(n, n))
    return connected_components(graph, directed=False)[1]


@dataclass(frozen=True)
class _Segments:
    """Maximal straight boundary pieces: start and end vertex, direction, stratum on the left, its patch."""

    start: np.ndarray  # (n, 2) row, column
    end: np.ndarray
    direction: np.ndarray
    stratum: np.ndarray
    patch: np.ndarray


def _segments(edges, patch_of_run):
    """Unit edges joined along their line: same direction, line and stratum, consecutive positions."""
    d = edges.direction.astype(np.int64)
    vertical = (d == NORTH) | (d == SOUTH)
    line = np.where(vertical, edges.col, edges.row)
    along = np.where(vertical, edges.row, edges.col)
    span = np.int64(max(int(edges.row.max()), int(edges.col.max())) + 2) if d.size else np.int64(1)
    order = np.argsort(((d * span + line) * 256 + edges.stratum) * span + along, kind="stable")
    d, line, along, stratum = d[order], line[order], along[order], edges.stratum[order]
    new = np.ones(d.size, bool)
    new[1:] = ((d[1:] != d[:-1]) | (line[1:] != line[:-1]) | (stratum[1:] != stratum[:-1])
               | (along[1:] != along[:-1] + 1))
    first = np.flatnonzero(new)
    last = np.append(first[1:], d.size) - 1
    start = np.column_stack([edges.row[order], edges.col[order]])
    # along increases in sorting order: east and south segments start at their first unit edge, west and
    # north ones at their last; every segment ends one step beyond its other end
    forward = (d[first] == EAST) | (d[first] == SOUTH)
    seg_start = np.where(forward[:, None], start[first], start[last])
    seg_end = np.where(forward[:, None], start[last], start[first]) + STEP[d[first]]
    return _Segments(seg_start, seg_end, d[first], stratum[first], patch_of_run[edges.run[order][first]])


def _successors(seg, width, height):
    """The segment that follows each one on its ring: same stratum, starting at its end, the left turn first."""
    nv = np.int64(width + 1)
    vertices = nv * np.int64(height + 1)

    def vertex(p):
        return p[:, 0] * nv + p[:, 1]

    def key(stratum, v, d):
        return (stratum.astype(np.int64) * vertices + v) * 4 + d

    keys = key(seg.stratum, vertex(seg.start), seg.direction)
    order = np.argsort(keys, kind="stable")
    sorted_keys = keys[order]
    want = key(seg.stratum, vertex(seg.end), 0)  # the first key of the segments of the stratum starting there
    asked = np.argsort(want)
    at = np.searchsorted(sorted_keys, want[asked])
    turn = {1: np.full(keys.size, -1, np.int64), 3: np.full(keys.size, -1, np.int64)}  # the left, the right turn
    for step in (0, 1):  # at most two segments of one stratum start at a vertex (two cells meeting at a corner)
        pos = np.minimum(at + step, keys.size - 1)
        found = sorted_keys[pos]
        here = (found >> 2) == (want[asked] >> 2)
        for t, hit in turn.items():
            ok = here & ((found & 3) == (seg.direction[asked] + t) % 4)
            hit[asked[ok]] = order[pos[ok]]
    left, right = turn[1], turn[3]
    # where both exist, two cells of the stratum meet at a corner: one patch goes on with the right turn (its
    # ring splits into an outer ring and a hole that touch there), two patches with the left (each its own ring)
    same_patch = (right >= 0) & (seg.patch[np.maximum(right, 0)] == seg.patch)
    succ = np.where((left >= 0) & ~same_patch, left, right)
    if np.any(succ < 0):
        raise RuntimeError("open boundary while tracing the strata")
    return succ


def _ring_order(succ):
    """Each segment's ring (numbered 0..) and its position along all the rings, in one depth-first walk.

    The rings are the cycles of ``succ`` (scipy.sparse.csgraph.connected_components);
    each is cut before its lowest segment and its last segment linked to the next
    ring's lowest one, so that one walk (scipy.sparse.csgraph.depth_first_order)
    from the first ring's lowest segment passes every ring in turn.
    """
    from scipy.sparse import csr_matrix
    from scipy.sparse.csgraph import connected_components, depth_first_order

    n = succ.size
    idx = np.arange(n)
    ones = np.ones(n, np.int8)
    _, comp = connected_components(csr_matrix((ones, (idx, succ)), shape=(n, n)), directed=True, connection="weak")
    heads = np.full(comp.max() + 1, n, np.int64)
    np.minimum.at(heads, comp, idx)
    heads.sort()  # ring k starts at heads[k]
    ring_of_head = np.empty(n, np.int64)
    ring_of_head[heads] = np.arange(heads.size)
    nxt = succ.copy()
    tails = np.flatnonzero(np.isin(succ, heads) & (comp[succ] == comp))
    tails = tails[np.argsort(ring_of_head[succ[tails]])]  # the tail of ring k, for k = 0, 1, ...
    nxt[tails[:-1]] = heads[1:]
    walk_graph = csr_matrix((ones[:-1], (np.delete(idx, tails[-1]), np.delete(nxt, tails[-1]))), shape=(n, n))
    visit = depth_first_order(walk_graph, heads[0], directed=True, return_predecessors=False)
    position = np.empty(n, np.int64)
    position[visit] = np.arange(n)
    ring = np.searchsorted(position[heads], position, side="right") - 1
    return ring, position


def _multipolygon_wkb(points, ring_points, ring_polygon_first, polygon_rings):
    """One MultiPolygon WKB (little endian) from rings in order: closed point arrays, polygon starts flagged."""
    coords = np.ascontiguousarray(points, "<f8").view(np.uint8).ravel()
    nr = ring_points.size
    header_len = np.where(ring_polygon_first, 13, 4)
    header_at = np.concatenate([[0], np.cumsum(header_len)[:-1]])
    values = np.zeros(int(header_len.sum()), np.uint8)
    first = np.flatnonzero(ring_polygon_first)
    poly = np.zeros((first.size, 9), np.uint8)
    poly[:, 0] = 1
    poly[:, 1:5] = np.array([3], "<u4").view(np.uint8)
    poly[:, 5:9] = np.asarray(polygon_rings, "<u4").view(np.uint8).reshape(-1, 4)
    values[header_at[first][:, None] + np.arange(9)] = poly
    count_at = header_at + header_len - 4
    values[count_at[:, None] + np.arange(4)] = np.asarray(ring_points, "<u4").view(np.uint8).reshape(-1, 4)
    ring_byte = 16 * np.concatenate([[0], np.cumsum(ring_points)[:-1]]) if nr else np.zeros(0, np.int64)
    body = np.insert(coords, np.repeat(ring_byte, header_len), values)
    head = np.zeros(9, np.uint8)
    head[0] = 1
    head[1:5] = np.array([6], "<u4").view(np.uint8)
    head[5:9] = np.array([first.size], "<u4").view(np.uint8)
    return bytes(head) + body.tobytes()


def polygonise_strata(path, n_strata, progress=None):
    """One multipolygon (WKB) per stratum id 1..n_strata from the stratum raster (4-connected patches).

    The polygons cover exactly the cells of each stratum: the area of a stratum's
    multipolygon is its cells times the cell area. Each patch is one polygon with
    its holes; patches of a stratum that touch at a corner only are separate
    polygons of its multipolygon.
    """
    ds = gdal.Open(path)
    try:
        return _trace_band(ds.GetRasterBand(1), ds.GetGeoTransform(), n_strata, progress)
    finally:
        ds = None


#: most polygons drawn on the report's map (our choice: the map is an overview a few hundred pixels wide)
MAP_PATCHES = 3000


def display_polygons(path, n_strata, max_side=400):
    """Polygons of the strata for a map of at most ``max_side`` cells a side, or None when the raster is smaller.

    The stratum raster is read at a coarser cell (nearest neighbour, GDAL's
    decimating read) and traced as :func:`polygonise_strata` does; patches of
    fewer than 4 coarse cells join their largest neighbour (GDAL's sieve), and
    more (8, 16, ...) while more than :data:`MAP_PATCHES` polygons are left. A
    map of a few hundred pixels shows no finer detail, and a speckled raster's
    exact polygons would cost the report more than the stratification itself.
    """
    ds = gdal.Open(path)
    band = ds.GetRasterBand(1)
    width, height = band.XSize, band.YSize
    factor = -(-max(width, height) // max_side)
    if factor <= 1:
        return None
    w, h = -(-width // factor), -(-height // factor)
    ids = band.ReadAsArray(0, 0, width, height, buf_xsize=w, buf_ysize=h)
    gt = ds.GetGeoTransform()
    band = ds = None
    mem = gdal.GetDriverByName("MEM").Create("", w, h, 1, gdal.GDT_Byte)
    coarse = (gt[0], gt[1] * width / w, 0.0, gt[3], 0.0, gt[5] * height / h)
    mem_band = mem.GetRasterBand(1)
    mem_band.WriteArray(ids)
    try:
        threshold = 4
        while True:
            gdal.SieveFilter(mem_band, mem_band, mem_band, threshold, 4)
            polygons = _trace_band(mem_band, coarse, n_strata)
            parts = sum(int.from_bytes(p[5:9], "little") for p in polygons)
            if parts <= MAP_PATCHES or threshold >= w * h:
                return polygons
            threshold *= 2
    finally:
        mem_band = mem = None


def _trace_band(band, gt, n_strata, progress=None):
    """The four steps of the module docstring on an open band with geotransform ``gt``."""
    width, height = band.XSize, band.YSize
    edges = _unit_edges(band, progress if progress is None else (lambda f: progress(0.6 * f)))
    seg = _segments(edges, _patches_of_runs(edges))
    del edges
    if seg.direction.size == 0:
        return [_multipolygon_wkb(np.zeros((0, 2)), np.zeros(0, np.int64), np.zeros(0, bool), [])
                for _ in range(n_strata)]
    ring, position = _ring_order(_successors(seg, width, height))
    if progress is not None and progress(0.8):
        raise Cancelled("Stratification cancelled.")
    return _strata_wkb(seg, ring, position, gt, n_strata)


def _strata_wkb(seg, ring, position, gt, n_strata):
    """Rings grouped into polygons (outer ring first) and strata; one WKB per stratum."""
    twice_area = np.bincount(ring, weights=(seg.end[:, 1] * seg.start[:, 0] - seg.start[:, 1] * seg.end[:, 0])
                             .astype(float), minlength=ring.max() + 1)
    hole = twice_area[ring] < 0
    # rings in traversal order; within a patch the outer ring first (one int64 key: stratum, patch, hole, position)
    n = np.int64(position.size + 1)
    order = np.argsort(((seg.stratum.astype(np.int64) * n + seg.patch) * 2 + hole) * n + position, kind="stable")
    ring_o, stratum_o, patch_o = ring[order], seg.stratum[order], seg.patch[order]
    ring_start = np.flatnonzero(np.r_[True, ring_o[1:] != ring_o[:-1]])
    ring_len = np.diff(np.r_[ring_start, ring_o.size])
    # the points of each ring: its segments' starts, and the first again to close it
    closing = np.repeat(np.arange(ring_start.size), ring_len)
    pick = np.concatenate([order, order[ring_start]])
    slot = np.concatenate([np.arange(order.size) + closing, ring_start + ring_len + np.arange(ring_start.size)])
    vertices = np.empty((pick.size, 2), np.float64)
    vertices[slot, 0] = gt[0] + seg.start[pick, 1] * gt[1]
    vertices[slot, 1] = gt[3] + seg.start[pick, 0] * gt[5]
    ring_points = ring_len + 1
    ring_stratum, ring_patch = stratum_o[ring_start], patch_o[ring_start]
    polygon_first = np.r_[True, (ring_patch[1:] != ring_patch[:-1]) | (ring_stratum[1:] != ring_stratum[:-1])]
    point_start = np.r_[0, np.cumsum(ring_points)]
    polygon_id = np.cumsum(polygon_first) - 1
    rings_per_polygon = np.bincount(polygon_id)
    out = []
    for h in range(1, n_strata + 1):  # one WKB per stratum (at most 50)
        lo, hi = np.searchsorted(ring_stratum, [h, h + 1])
        polygons = np.unique(polygon_id[lo:hi])
        out.append(_multipolygon_wkb(vertices[point_start[lo]:point_start[hi]], ring_points[lo:hi],
                                     polygon_first[lo:hi], rings_per_polygon[polygons]))
    return out
