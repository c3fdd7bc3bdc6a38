"""Geometry helpers checked against shapely's own scalar predicates and areas (the oracle)."""
import numpy as np
import pytest
from scipy import stats
from shapely.geometry import MultiPolygon, Point, Polygon, box
from shapely.ops import unary_union

from plotwise.processing.engine import geometry as geo


def ragged(n=300, seed=2):
    rng = np.random.default_rng(seed)
    t = np.linspace(0, 2 * np.pi, n, endpoint=False)
    r = 1000 * (1 + 0.35 * np.sin(6 * t) + 0.08 * rng.random(n))
    return Polygon(np.c_[r * np.cos(t), r * np.sin(t)])


def comb():
    pts = [(0, 0)]
    for i in range(15):
        pts += [(i * 2 + 1, 0), (i * 2 + 1, 10), (i * 2 + 1.5, 10), (i * 2 + 1.5, 0)]
    pts += [(31, 0), (31, -1), (0, -1)]
    return Polygon(pts)


POLYGONS = {
    "ragged": ragged(),
    "holes_and_parts": Point(0, 0).buffer(1000).difference(Point(300, 0).buffer(300)).union(Point(3000, 0).buffer(500)),
    "comb": comb(),
    "L": Polygon([(0, 0), (10, 0), (10, 1), (1, 1), (1, 10), (0, 10)]),
    "spiral_notch": Polygon([(0, 0), (10, 0), (10, 10), (2, 10), (2, 4), (6, 4), (6, 6), (4, 6), (4, 8), (8, 8), (8, 2),
                             (0, 2)]),
}


def test_contains_xy_matches_scalar_contains():
    poly = POLYGONS["holes_and_parts"]
    rng = np.random.default_rng(0)
    x = rng.uniform(-1100, 3600, 500)
    y = rng.uniform(-1100, 1100, 500)
    expected = np.array([poly.contains(Point(a, b)) for a, b in zip(x, y)])  # shapely scalar predicate
    np.testing.assert_array_equal(geo.contains_xy(poly, x, y), expected)


@pytest.mark.parametrize("name", sorted(POLYGONS))
def test_triangle_cover_contains_polygon_and_inside_triangles_lie_in_it(name):
    poly = POLYGONS[name]
    cover = geo.triangle_cover(poly, method="delaunay")
    tris = [Polygon(t) for t in cover.triangles]
    union = unary_union(tris)
    assert poly.difference(union).area <= 1e-9 * poly.area  # the cover holds the polygon
    inside = unary_union([t for t, i in zip(tris, cover.inside) if i])
    assert inside.difference(poly).area <= 1e-9 * poly.area  # inside triangles lie in it
    np.testing.assert_allclose(cover.areas, [t.area for t in tris], rtol=1e-9)  # shapely areas


def test_compact_polygon_uses_the_box():
    cover = geo.triangle_cover(Point(0, 0).buffer(10))
    assert len(cover.areas) == 2 and not cover.inside.any()
    assert cover.efficiency == pytest.approx(Point(0, 0).buffer(10).area / 400)


@pytest.mark.parametrize("method", ["delaunay", "bbox"])
def test_uniform_points_pass_chisquare(method):
    poly = POLYGONS["spiral_notch"]
    cover = geo.triangle_cover(poly, method=method)
    pts = geo.uniform_points(cover, poly, 40000, np.random.default_rng(5))
    assert geo.contains_xy(poly, pts[:, 0], pts[:, 1]).all()
    cells = [box(i, j, i + 1, j + 1) for i in range(10) for j in range(10)]
    expected = np.array([poly.intersection(c).area for c in cells]) / poly.area * len(pts)
    counts = np.array([
        ((pts[:, 0] >= c.bounds[0]) & (pts[:, 0] < c.bounds[2]) & (pts[:, 1] >= c.bounds[1])
         & (pts[:, 1] < c.bounds[3])).sum()
        for c in cells
    ])
    keep = expected > 0
    assert counts[~keep].sum() == 0
    assert stats.chisquare(counts[keep], expected[keep]).pvalue > 0.001  # scipy.stats.chisquare


def test_points_in_triangles_are_uniform():
    # Turk (1990): the reflected parallelogram draw is uniform; mean is the centroid
    tri = np.array([[[0.0, 0.0], [3.0, 0.0], [0.0, 6.0]]])
    pts = geo.points_in_triangles(np.repeat(tri, 50000, axis=0), np.random.default_rng(1))
    np.testing.assert_allclose(pts.mean(axis=0), [1.0, 2.0], atol=0.03)
    assert (pts[:, 0] >= 0).all() and (pts[:, 1] >= 0).all() and (2 * pts[:, 0] + pts[:, 1] <= 6 + 1e-9).all()


def test_repair_of_a_bow_tie_keeps_both_lobes():
    bow = Polygon([(0, 0), (2, 2), (2, 0), (0, 2)])
    assert not bow.is_valid
    fixed = geo.repair_polygonal(bow)
    assert fixed.was_invalid and fixed.geometry.is_valid
    assert fixed.geometry.area == pytest.approx(2.0)  # two triangles of area 1 (by construction)
    ok = geo.repair_polygonal(box(0, 0, 1, 1))
    assert not ok.was_invalid


def test_inward_buffer_keeps_only_points_far_from_the_edge():
    poly = POLYGONS["ragged"]
    shrunk = geo.inward_buffer(poly, 50)
    rng = np.random.default_rng(3)
    pts = geo.uniform_points(geo.triangle_cover(shrunk), shrunk, 300, rng)
    dist = np.array([poly.exterior.distance(Point(p)) for p in pts])  # shapely distance as the oracle
    assert dist.min() >= 50 - 1e-6
    assert geo.inward_buffer(box(0, 0, 10, 10), 6).is_empty
    assert geo.inward_buffer(box(0, 0, 10, 10), 2).area == pytest.approx(36.0)


def test_polygons_of_collections():
    mp = MultiPolygon([box(0, 0, 1, 1), box(2, 0, 3, 1)])
    assert len(geo.polygons_of(mp)) == 2
    assert geo.as_polygonal([]).is_empty


def test_without_slivers_and_overlapping_pairs_against_shapely():
    real, sliver = box(0, 0, 10, 10), box(20, 0, 20.001, 100)  # 0.1 m²
    kept, removed = geo.without_slivers(MultiPolygon([real, sliver]))
    assert kept.equals(real) and removed == pytest.approx(sliver.area)  # shapely areas
    assert geo.without_slivers(real) == (real, 0.0)
    shapes = [box(0, 0, 10, 10), box(5, 0, 15, 10), box(10, 0, 20, 10), box(100, 100, 110, 110)]
    pairs = geo.overlapping_pairs(shapes)
    expected = [(i, j, shapes[i].intersection(shapes[j]).area) for i in range(4) for j in range(i + 1, 4)
                if shapes[i].intersection(shapes[j]).area >= 1.0]  # shapely's intersection as the oracle
    assert [p[:2] for p in pairs] == [e[:2] for e in expected]  # (0, 1) and (1, 2); (0, 2) only touch
    np.testing.assert_allclose([p[2] for p in pairs], [e[2] for e in expected])
