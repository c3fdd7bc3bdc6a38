"""The grid point locator (engine/point_in_polygon.py) against GEOS through shapely, the outside reference.

Points: uniform in and around the bounding box, every vertex, edge midpoints, points exactly on
axis-parallel edges, points one floating-point step off vertices, and the grid's own nodes and
lines (where the method's reference points sit). Outlines: saw-tooth, holes, a part inside another
part's hole, a comb, UTM-sized coordinates. The locator must give GEOS's answer (``contains``: the
boundary is outside) for every point, and decide nearly all random points itself, so that the check
is of the grid and not of its GEOS fallback.
"""
import numpy as np
import pytest
from shapely.geometry import MultiPolygon, Point, Polygon, box

from plotwise.processing.engine import geometry as geo
from plotwise.processing.engine import point_in_polygon


def saw_tooth(n=3000, seed=1, x0=0.0, y0=0.0, radius=1000.0):
    rng = np.random.default_rng(seed)
    t = np.linspace(0, 2 * np.pi, n, endpoint=False)
    r = radius * (1 + 0.3 * np.sin(7 * t) + 0.1 * rng.random(n))
    return Polygon(np.c_[x0 + r * np.cos(t), y0 + r * np.sin(t)])


def comb():
    pts = [(0, 0)]
    for i in range(15):
        pts += [(i * 2 + 1, 0), (i * 2 + 1, 10), (i * 2 + 1.5, 10), (i * 2 + 1.5, 0)]
    pts += [(31, 0), (31, -1), (0, -1)]
    return Polygon(pts)


def island_in_lake():
    """A shell with a hole, and a second part inside that hole (a valid multipolygon)."""
    outer = box(0, 0, 100, 100).difference(box(20, 20, 80, 80))
    return MultiPolygon([outer, box(40, 40, 60, 60)])


def raster_patches(seed=4, n=40):
    """Cells of a 10 m raster merged into patches, as a polygonised stratum raster gives them (invented)."""
    rng = np.random.default_rng(seed)
    field = rng.random((n, n)) + np.add.outer(np.sin(np.arange(n) / 4), np.cos(np.arange(n) / 5))
    cells = [box(10 * j, 10 * i, 10 * j + 10, 10 * i + 10) for i, j in zip(*np.nonzero(field > 0.9))]
    from shapely.ops import unary_union
    return unary_union(cells)


OUTLINES = {
    "raster patches": raster_patches(),
    "saw-tooth": saw_tooth(),
    "saw-tooth at UTM coordinates": saw_tooth(x0=500_000.0, y0=9_000_000.0),
    "holes and parts": Point(0, 0).buffer(1000).difference(Point(300, 0).buffer(300)).union(Point(3000, 0).buffer(500)),
    "island in a lake": island_in_lake(),
    "comb": comb(),
    "box with a hole": box(0, 0, 10, 10).difference(box(2, 2, 4, 4)),
}


@pytest.fixture
def grid_everywhere(monkeypatch):
    """Use the grid on every outline (as shipped it leaves smooth or small ones to GEOS)."""
    monkeypatch.setattr(point_in_polygon, "MIN_EDGES", 3)
    monkeypatch.setattr(point_in_polygon, "MIN_CROSSINGS_PER_LINE", 0.0)


def probe_points(geometry, locator, rng):
    minx, miny, maxx, maxy = geometry.bounds
    pad = 0.05 * max(maxx - minx, maxy - miny)
    random = rng.uniform([minx - pad, miny - pad], [maxx + pad, maxy + pad], (20_000, 2))
    vertices = np.concatenate(geo._rings(geometry))
    mids = (vertices[:-1] + vertices[1:]) / 2.0
    off = np.nextafter(vertices, vertices + 1.0)  # one step off each vertex
    nodes = np.stack(np.meshgrid(locator.xs, locator.ys), axis=-1).reshape(-1, 2)
    on_lines = np.c_[rng.uniform(minx, maxx, 2000), rng.choice(locator.ys, 2000)]
    rounded = np.round(random[:3000])  # on the integer edges of the boxes and the comb
    return random, np.concatenate([vertices, mids, off, nodes, on_lines, rounded])


@pytest.mark.parametrize("name", sorted(OUTLINES))
def test_locator_gives_the_answer_of_geos_for_every_point(name, grid_everywhere):
    geometry = OUTLINES[name]
    assert geometry.is_valid
    sent = []

    def geos(x, y):  # the fallback, counted
        sent.append(len(x))
        return geo.contains_xy(geometry, x, y)

    locator = point_in_polygon.PointLocator(geometry, geo._rings(geometry), geos)
    assert locator.usable
    random, special = probe_points(geometry, locator, np.random.default_rng(7))
    ours = locator.contains(random[:, 0], random[:, 1])
    assert sum(sent) <= 0.01 * len(random)  # the grid itself decided nearly every random point
    np.testing.assert_array_equal(ours, geo.contains_xy(geometry, random[:, 0], random[:, 1]))  # GEOS
    np.testing.assert_array_equal(locator.contains(special[:, 0], special[:, 1]),
                                  geo.contains_xy(geometry, special[:, 0], special[:, 1]))
    # and a sample against shapely's scalar predicate, one Point at a time
    pick = np.r_[np.arange(0, len(random), 97), len(random) + np.arange(0, len(special), 53)]
    both = np.concatenate([random, special])[pick]
    expected = [geometry.contains(Point(x, y)) for x, y in both]
    np.testing.assert_array_equal(locator.contains(both[:, 0], both[:, 1]), expected)


def test_points_on_the_boundary_are_outside_as_in_geos(grid_everywhere):
    square = box(0, 0, 10, 10)
    locator = geo.point_locator(square)
    x = np.array([0.0, 10.0, 5.0, 5.0, 0.0, 5.0, 5.0 + 1e-13])
    y = np.array([5.0, 5.0, 0.0, 10.0, 0.0, 5.0, 10.0 - 1e-13])
    expected = [square.contains(Point(a, b)) for a, b in zip(x, y)]  # shapely: boundary is not "contains"
    assert expected == [False, False, False, False, False, True, True]
    np.testing.assert_array_equal(locator.contains(x, y), expected)


def test_uniform_points_draw_the_same_with_and_without_the_grid(monkeypatch):
    region = saw_tooth(4000, seed=3)
    cover = geo.triangle_cover(region, "bbox")
    reference = geo.uniform_points(cover, region, 3000, np.random.default_rng(11))
    monkeypatch.setattr(point_in_polygon, "MIN_CROSSINGS_PER_LINE", 0.0)
    cover = geo.triangle_cover(region, "bbox")
    assert cover.locator.usable
    np.testing.assert_array_equal(geo.uniform_points(cover, region, 3000, np.random.default_rng(11)), reference)
