"""Point in polygon for many points against one polygon with many vertices (the grid method).

GEOS answers "is this point in the interior?" by counting the crossings of a ray from the
point with the boundary (Shimrat 1962, "Algorithm 112: Position of point relative to polygon",
Comm. ACM 5:434). On outlines whose edges are long and close together (a saw-tooth, a
digitised ridge line) a ray crosses hundreds of edges, and each test costs that many edge
checks. The grid method (Haines 1994, "Point in polygon strategies", Graphics Gems IV,
pp. 24-46; Zalik & Kolingerova 2001, "A cell-based point-in-polygon algorithm suitable for
large sets of points", Computers & Geosciences 27:1135-1145) counts crossings on a short path
instead:

1. The polygon's bounding box is cut into square cells, about one per edge, and every
   edge is listed in each cell it passes through (column by column, so no cell lists an edge
   twice).
2. Each grid node (cell corner) is classified once, by the crossing number of the grid line
   it lies on: the edges that cross the line ``y = Y_r`` (half-open rule ``y_1 <= Y_r < y_2``)
   and the parity of the crossings left of the node.
3. A point ``p`` in a cell is inside exactly when the cell's reference node ``q`` (its
   lower-left corner, or another corner where that one lies on an edge) is inside and the
   segment ``p q`` crosses the cell's edges an even number of times, or ``q`` is outside and
   it crosses them an odd number of times: ``p q`` stays in the cell, so only the cell's
   edges can cross it.

Exactness
---------
Every orientation sign is taken only where its floating-point value exceeds the error bound
of the orientation determinant (Shewchuk 1997, "Adaptive precision floating-point arithmetic
and fast robust geometric predicates", Discrete Comput. Geom. 18:305-363, bound
``(3 + 16 eps) eps (|a| + |b|)``, here with a safety factor of 4). A point whose answer hangs on
a sign below its bound (a point on or within rounding distance of an edge, a path through a
vertex, a node on an edge) is passed to GEOS, as is everything for a geometry the grid cannot
hold. The answers are therefore those of GEOS ``contains`` (points on the boundary are outside),
point for point, which keeps a seeded layout identical whatever the installed shapely.

The crossing parity over all rings of a valid polygon or multipolygon is its interior
(holes and parts included); the locator is meant for valid geometries, as GEOS is.
"""
import numpy as np

_EPS = np.finfo(float).eps / 2.0  # unit roundoff, 2**-53
_ORIENT_BOUND = 4.0 * (3.0 + 16.0 * _EPS) * _EPS  # Shewchuk (1997) ccwerrboundA, times 4
MAX_PAIRS = 1_000_000  # point-edge pairs tested at once (memory bound, about 100 MB of work arrays)
MAX_CELLS_PER_SIDE = 4096
CELLS_PER_EDGE = 0.5  # cells per edge: build and query cost balance about there (measured)
# GEOS's indexed ray count examines the edges a horizontal line crosses; below this many on
# average (smooth outlines cross it a few times) it is as fast as the grid and needs no building
MIN_CROSSINGS_PER_LINE = 48
MIN_EDGES = 256
MAX_EDGES = 2_000_000  # beyond this the index would take hundreds of MB: GEOS answers alone
MAX_CELLS = 2**20


def _orientation(ax, ay, bx, by, cx, cy):
    """Sign of the orientation of ``c`` against ``a -> b``: +1 left, -1 right, 0 too close to call."""
    left = (bx - ax) * (cy - ay)
    right = (by - ay) * (cx - ax)
    det = left - right
    bound = _ORIENT_BOUND * (np.abs(left) + np.abs(right))
    return np.where(det > bound, 1, np.where(det < -bound, -1, 0)).astype(np.int8)


def _ring_edges(rings):
    """Edges ``(x1, y1, x2, y2)`` of closed coordinate rings, without zero-length ones."""
    parts = [np.c_[r[:-1], r[1:]] for r in rings if len(r) >= 2]
    if not parts:
        return np.zeros((0, 4))
    edges = np.concatenate(parts)
    return edges[(edges[:, 0] != edges[:, 2]) | (edges[:, 1] != edges[:, 3])]


class PointLocator:
    """Grid index of a polygonal geometry's edges answering ``contains`` for many points.

    Parameters
    ----------
    geometry : Polygon or MultiPolygon (valid)
    rings : list of ndarray (k, 2)
        The closed rings of ``geometry`` (shell and holes of every part).
    fallback : callable
        ``fallback(x, y) -> bool array``, the reference answer (GEOS) for the few points the
        grid cannot decide.
    """

    def __init__(self, geometry, rings, fallback):
        self.geometry = geometry
        self.fallback = fallback
        self.usable = _worth_a_grid(rings)
        if not self.usable:
            return
        edges = _ring_edges(rings)
        self.usable = len(edges) >= MIN_EDGES and bool(np.isfinite(edges).all())
        if not self.usable:
            return
        self.edges = edges
        self.minx, self.miny = float(edges[:, [0, 2]].min()), float(edges[:, [1, 3]].min())
        self.maxx, self.maxy = float(edges[:, [0, 2]].max()), float(edges[:, [1, 3]].max())
        width, height = self.maxx - self.minx, self.maxy - self.miny
        if not (width > 0 and height > 0):
            self.usable = False
            return
        self._lay_grid(width, height, len(edges))
        self._classify_nodes()
        self._list_cell_edges()

    # -- building ---------------------------------------------------------------------
    def _lay_grid(self, width, height, n_edges):
        """Cells of about equal sides, about one per edge, a margin around the box."""
        scale = max(abs(self.minx), abs(self.maxx), abs(self.miny), abs(self.maxy), width, height)
        self.tol = 1e-9 * scale  # far above rounding (1e-16 scale), far below any cell
        margin = 1e-6 * max(width, height)
        x0, y0 = self.minx - margin, self.miny - margin
        full_w, full_h = width + 2 * margin, height + 2 * margin
        side = np.sqrt(full_w * full_h / min(max(CELLS_PER_EDGE * n_edges, 16), MAX_CELLS))
        self.nx = int(min(max(np.ceil(full_w / side), 1), MAX_CELLS_PER_SIDE))
        self.ny = int(min(max(np.ceil(full_h / side), 1), MAX_CELLS_PER_SIDE))
        self.cw, self.ch = full_w / self.nx, full_h / self.ny
        self.x0, self.y0 = x0, y0
        self.xs = x0 + self.cw * np.arange(self.nx + 1)
        self.ys = y0 + self.ch * np.arange(self.ny + 1)

    def _classify_nodes(self):
        """Inside (1), outside (0) or undecided (-1) for every grid node, row by row."""
        x1, y1, x2, y2 = self.edges.T
        ylo, yhi = np.minimum(y1, y2), np.maximum(y1, y2)
        # candidate lines within ``tol`` of the edge's y-range (far more than the division's rounding);
        # the exact test below decides
        r_lo = np.clip(np.floor((ylo - self.tol - self.y0) / self.ch).astype(np.int64) + 1, 0, self.ny + 1)
        r_hi = np.clip(np.floor((yhi + self.tol - self.y0) / self.ch).astype(np.int64) + 1, 0, self.ny + 1)
        edge, row = _expand_ranges(r_lo, r_hi)
        line = self.ys[row]
        keep = (ylo[edge] <= line) & (line < yhi[edge])  # half-open: exact comparisons
        edge, row, line = edge[keep], row[keep], line[keep]
        cross_x = x1[edge] + (line - y1[edge]) * ((x2[edge] - x1[edge]) / (y2[edge] - y1[edge]))
        # crossing k counts for every node right of it: parity of the cumulative count
        first_right = np.searchsorted(self.xs, cross_x, side="right")
        width = self.nx + 2
        counts = np.bincount(row * width + first_right, minlength=(self.ny + 1) * width).reshape(self.ny + 1, width)
        status = (np.cumsum(counts, axis=1)[:, : self.nx + 1] & 1).astype(np.int8)
        # a node within rounding distance of a crossing cannot be classified by it
        near_left = cross_x - self.xs[np.maximum(first_right - 1, 0)] <= self.tol
        near_right = np.abs(self.xs[np.minimum(first_right, self.nx)] - cross_x) <= self.tol
        status[row[near_left], np.maximum(first_right - 1, 0)[near_left]] = -1
        status[row[near_right], np.minimum(first_right, self.nx)[near_right]] = -1
        self.node_status = status
        # each cell's reference: its first classified corner (lower left, lower right, upper left, upper right)
        ref_col = np.tile(np.arange(self.nx), self.ny)
        ref_row = np.repeat(np.arange(self.ny), self.nx)
        ref_status = np.full(self.nx * self.ny, -1, dtype=np.int8)
        cols, rows = ref_col.copy(), ref_row.copy()
        for dc, dr in ((1, 1), (0, 1), (1, 0), (0, 0)):  # the last one written wins
            corner = status[rows + dr, cols + dc]
            take = corner >= 0
            ref_status[take] = corner[take]
            ref_col[take], ref_row[take] = cols[take] + dc, rows[take] + dr
        self.ref_status, self.ref_x, self.ref_y = ref_status, self.xs[ref_col], self.ys[ref_row]

    def _list_cell_edges(self):
        """Edges per cell in compressed rows: ``cell_edges[cell_start[c]:cell_start[c + 1]]``."""
        x1, y1, x2, y2 = self.edges.T
        xl, xr = np.minimum(x1, x2), np.maximum(x1, x2)
        ylo, yhi = np.minimum(y1, y2), np.maximum(y1, y2)
        c_lo = np.clip(np.floor((xl - self.tol - self.x0) / self.cw).astype(np.int64), 0, self.nx - 1)
        c_hi = np.clip(np.floor((xr + self.tol - self.x0) / self.cw).astype(np.int64), 0, self.nx - 1)
        edge, col = _expand_ranges(c_lo, c_hi + 1)
        # the edge's y-range within the column, widened by the rounding of the line equation
        dx = x2[edge] - x1[edge]
        spans = (c_lo[edge] != c_hi[edge]) & (dx != 0)  # else: the edge's whole y-range
        slope = np.divide(y2[edge] - y1[edge], dx, out=np.zeros_like(dx), where=spans)
        xa = np.maximum(xl[edge], self.xs[col])
        xb = np.minimum(xr[edge], self.xs[col + 1])
        ya = y1[edge] + (xa - x1[edge]) * slope
        yb = y1[edge] + (xb - x1[edge]) * slope
        pad = self.tol * (1.0 + np.abs(slope))
        lo = np.where(spans, np.maximum(np.minimum(ya, yb) - pad, ylo[edge]), ylo[edge])
        hi = np.where(spans, np.minimum(np.maximum(ya, yb) + pad, yhi[edge]), yhi[edge])
        r_lo = np.clip(np.floor((lo - self.tol - self.y0) / self.ch).astype(np.int64), 0, self.ny - 1)
        r_hi = np.clip(np.floor((hi + self.tol - self.y0) / self.ch).astype(np.int64), 0, self.ny - 1)
        which, row = _expand_ranges(r_lo, r_hi + 1)
        cell = row * self.nx + col[which]
        order = _order_by_cell(cell)
        self.cell_edges = edge[which][order]
        self.cell_start = np.r_[0, np.cumsum(np.bincount(cell, minlength=self.nx * self.ny))]

    # -- answering --------------------------------------------------------------------
    def contains(self, x, y):
        """True where ``(x, y)`` lies in the interior (GEOS ``contains``; the boundary is outside)."""
        x = np.asarray(x, dtype=float)
        y = np.asarray(y, dtype=float)
        shape = x.shape
        x, y = x.ravel(), y.ravel()
        if not self.usable:
            return np.asarray(self.fallback(x, y), dtype=bool).reshape(shape)
        result = np.zeros(x.size, dtype=bool)
        # the interior lies strictly inside the bounding box (NaN fails every comparison)
        idx = np.flatnonzero((x > self.minx) & (x < self.maxx) & (y > self.miny) & (y < self.maxy))
        decided, answer = self._grid_answer(x[idx], y[idx])
        result[idx[decided]] = answer[decided]
        rest = idx[~decided]
        if rest.size:
            result[rest] = np.asarray(self.fallback(x[rest], y[rest]), dtype=bool)
        return result.reshape(shape)

    def _grid_answer(self, px, py):
        """``(decided, inside)`` for points inside the box, by the path to their cell's node."""
        ci = np.clip(np.floor((px - self.x0) / self.cw).astype(np.int64), 0, self.nx - 1)
        ri = np.clip(np.floor((py - self.y0) / self.ch).astype(np.int64), 0, self.ny - 1)
        cell = ri * self.nx + ci
        status = self.ref_status[cell]
        start = self.cell_start[cell]
        count = self.cell_start[cell + 1] - start
        decided = status >= 0
        inside = status == 1
        busy = np.flatnonzero(decided & (count > 0))
        if busy.size:  # in chunks of points whose pairs with their cell's edges stay under MAX_PAIRS
            cumulative = np.cumsum(count[busy])
            cuts = np.searchsorted(cumulative, np.arange(MAX_PAIRS, cumulative[-1], MAX_PAIRS), side="right")
            for chunk in np.split(busy, np.unique(cuts)):
                if chunk.size == 0:
                    continue
                crossings, unsure = self._path_crossings(px[chunk], py[chunk], cell[chunk], start[chunk], count[chunk])
                inside[chunk] ^= (crossings & 1).astype(bool)
                decided[chunk] &= ~unsure
        return decided, inside

    def _path_crossings(self, px, py, cell, start, count):
        """Crossings of each path ``p -> q`` with its cell's edges, and whether any was too close to call."""
        point, k = _expand_ranges(np.zeros_like(count), count)
        e = self.cell_edges[start[point] + k]
        ax, ay, bx, by = self.edges[e].T
        x, y = px[point], py[point]
        qx, qy = self.ref_x[cell[point]], self.ref_y[cell[point]]
        s1 = _orientation(ax, ay, bx, by, x, y)
        s2 = _orientation(ax, ay, bx, by, qx, qy)
        s3 = _orientation(x, y, qx, qy, ax, ay)
        s4 = _orientation(x, y, qx, qy, bx, by)
        apart = ((s1 == s2) & (s1 != 0)) | ((s3 == s4) & (s3 != 0))  # certainly no common point
        crossing = (s1 * s2 == -1) & (s3 * s4 == -1)  # certainly one proper crossing
        n = len(px)
        crossings = np.bincount(point[crossing], minlength=n)
        unsure = np.bincount(point[~apart & ~crossing], minlength=n) > 0
        return crossings, unsure


def crossings_per_line(rings):
    """Mean number of edges that a horizontal line through the bounding box crosses: ``sum |dy| / height``."""
    rings = [r for r in rings if len(r) >= 2]
    if not rings:
        return 0.0
    height = max(r[:, 1].max() for r in rings) - min(r[:, 1].min() for r in rings)
    rise = sum(float(np.abs(np.diff(r[:, 1])).sum()) for r in rings)
    return rise / height if height > 0 else 0.0


def _worth_a_grid(rings):
    """Whether the grid beats GEOS's own index: enough edges, not too many, many per horizontal line."""
    n_edges = sum(max(len(r) - 1, 0) for r in rings)
    return MIN_EDGES <= n_edges <= MAX_EDGES and crossings_per_line(rings) >= MIN_CROSSINGS_PER_LINE


def _order_by_cell(cell):
    """Stable order of whole numbers ``0 <= cell < 2**32``: two passes of numpy's radix sort on 16 bits."""
    low = np.argsort((cell & 0xFFFF).astype(np.uint16), kind="stable")
    high = np.argsort((cell[low] >> 16).astype(np.uint16), kind="stable")
    return low[high]


def _expand_ranges(lo, hi):
    """``(owner, value)`` for every whole number ``lo[i] <= value < hi[i]`` (empty ranges skipped)."""
    size = np.maximum(hi - lo, 0)
    owner = np.repeat(np.arange(len(lo)), size)
    offsets = np.cumsum(size) - size
    value = lo[owner] + (np.arange(int(size.sum())) - offsets[owner])
    return owner, value
