"""Regression check: a fixed seed gives the same units as the layout code of main at e528c56.

This is no correctness check (the statistical and geometric checks live in test_layout_draws.py,
test_layout_engine.py and test_geometry.py): it guards reproducibility, the promise that a seed
recorded in last season's report gives the same units again. The fingerprints below were recorded
with the code before the point-in-polygon and validity work (shapely 1.8.5 and 2.0.7 gave the same
values; they were first recorded at 7cd9fd5, and again at e528c56, whose plus sampling and circle
outlines changed the units on purpose), by running this file as a script:

    .venv/bin/python tests/engine/test_layout_regression.py
"""
import hashlib
import sys

import numpy as np
import pytest
from shapely.geometry import MultiPolygon, Point, Polygon, box

from plotwise.processing.engine import layout as L
from plotwise.processing.engine import point_in_polygon


def _ragged(n, seed, radius=1000.0, noise=0.1, x0=0.0, y0=0.0):
    """A saw-tooth outline: radial noise at every vertex (invented)."""
    rng = np.random.default_rng(seed)
    t = np.linspace(0, 2 * np.pi, n, endpoint=False)
    r = radius * (1 + 0.3 * np.sin(7 * t) + noise * rng.random(n))
    return Polygon(np.c_[x0 + r * np.cos(t), y0 + r * np.sin(t)])


def _with_hole():
    outer = _ragged(2000, 3, noise=0.02)
    return outer.difference(Point(150, -100).buffer(180)).difference(box(-700, 300, -400, 500))


def _three_strata():
    a = MultiPolygon([box(0, 0, 1000, 800), box(0, 1200, 600, 2000)])
    b = _ragged(3000, 4, radius=500, x0=2200, y0=900)
    c = box(1000, 0, 1600, 800).difference(Point(1300, 400).buffer(150))
    return [a, b, c]


CASES = {
    # name: (geometries, strata, n_values, n_units, spec, cover_method)
    "srs_saw_auto": ([_ragged(5000, 1)], None, None, 400, L.LayoutSpec(design=0, reserve=5), "auto"),
    "srs_saw_bbox": ([_ragged(5000, 1)], None, None, 300, L.LayoutSpec(design=0), "bbox"),
    "srs_hole_delaunay": ([_with_hole()], None, None, 300, L.LayoutSpec(design=0, bearing=-1), "delaunay"),
    "srs_circles_inside_spacing": ([_with_hole()], None, None, 60,
                                   L.LayoutSpec(design=0, shape=2, size=20, inside=True, min_spacing=60, reserve=10),
                                   "auto"),
    "grid_hole_random": ([_with_hole()], None, None, 150, L.LayoutSpec(design=1, bearing=-1, reserve=20), "auto"),
    "grid_squares_inside": (_three_strata(), [1, 2, 3], [40, 30, 20], None,
                            L.LayoutSpec(design=1, shape=1, size=25, bearing=0, inside=True, reserve=5), "auto"),
    "grid_box_bearing0": ([box(0, 0, 1000, 500)], None, None, 50, L.LayoutSpec(design=1, bearing=0, reserve=8), "auto"),
    "bas_three_strata_spacing": (_three_strata(), ["a", "b", "c"], None, 120,
                                 L.LayoutSpec(design=2, min_spacing=40, reserve=6, bearing=-1), "auto"),
    "bas_saw_transects": ([_ragged(5000, 2)], None, None, 80,
                          L.LayoutSpec(design=2, shape=3, size=100, inside=True, reserve=4), "auto"),
    "bas_box": ([box(0, 0, 1000, 500)], None, None, 64, L.LayoutSpec(design=2, reserve=4), "auto"),
    "srs_plus_squares": ([_with_hole()], None, None, 120, L.LayoutSpec(design=0, shape=1, size=30, bearing=-1), "auto"),
    "bas_plus_circles_saw": ([_ragged(5000, 6)], None, None, 90, L.LayoutSpec(design=2, shape=2, size=15, reserve=5),
                             "auto"),
    "srs_merged_features": ([box(0, 0, 500, 500), box(500, 0, 900, 300), _ragged(800, 5, radius=300, x0=2000)],
                            [7, 7, 8], [25, 25, 10], None, L.LayoutSpec(design=0, reserve=3), "auto"),
}

EXPECTED = {  # recorded at e528c56 with shapely 1.8.5 and 2.0.7
    "bas_box": "e27aa31902cdfd464d770842",
    "bas_plus_circles_saw": "74f220812dbd0e760a108186",
    "bas_saw_transects": "e1f163c5b2440f6011530288",
    "bas_three_strata_spacing": "8ac708473a8ebc01449eb2ad",
    "grid_box_bearing0": "5a4fe67588a3e5f00df4702a",
    "grid_hole_random": "2b719e80927d66b5a49ac5fb",
    "grid_squares_inside": "50e81447c16c399a22954f2d",
    "srs_circles_inside_spacing": "67c1c272ac03e7d77596b806",
    "srs_hole_delaunay": "71ec40508d57ddeef8e49b93",
    "srs_merged_features": "bbad15be86f49441cb305569",
    "srs_plus_squares": "c8ef78ffbba7f3aab71f09fe",
    "srs_saw_auto": "da38b0a82e8952e029a6a459",
    "srs_saw_bbox": "9aae77551432ebfc12816cd2",
}

CAPACITY_CASES = {  # hexagonal_capacity: lattice points fall exactly on the edges of boxes
    "box": (box(0, 0, 1000, 500), 50.0),
    "box_with_hole": (box(0, 0, 1000, 600).difference(box(200, 200, 400, 300)), 25.0),
    "saw": (_ragged(5000, 1), 70.0),
}

EXPECTED_CAPACITY = {  # recorded at 7cd9fd5 and again at e528c56
    "box": 234,
    "box_with_hole": 1064,
    "saw": 850,
}


def fingerprint(layout):
    """sha256 over the units' ids, roles, centres, bearings and inclusion probabilities (exact bits)."""
    h = hashlib.sha256()
    h.update("|".join(layout.unit_id).encode())
    h.update("|".join(layout.role).encode())
    h.update("|".join(str(d) for d in getattr(layout, "design", ())).encode())
    for array in (layout.centres, layout.bearing, layout.incl_p, layout.outlines):
        h.update(np.ascontiguousarray(array, dtype="<f8").tobytes())
    return h.hexdigest()[:24]


def run_case(name, seed=20240611):
    geometries, strata, n_values, n_units, spec, cover = CASES[name]
    frame = L.prepare_strata(geometries, strata=strata, n_values=n_values, n_units=n_units, spec=spec,
                             cover_method=cover)
    return L.draw_layout(frame, spec, np.random.default_rng(seed))


@pytest.fixture(params=["as shipped", "grid everywhere"])
def locator_use(request, monkeypatch):
    """Run each case as shipped, and with the grid point locator used on every outline."""
    if request.param == "grid everywhere":
        monkeypatch.setattr(point_in_polygon, "MIN_EDGES", 3)
        monkeypatch.setattr(point_in_polygon, "MIN_CROSSINGS_PER_LINE", 0.0)
    return request.param


@pytest.mark.parametrize("name", sorted(CASES))
def test_fixed_seed_gives_the_recorded_units(name, locator_use):
    assert fingerprint(run_case(name)) == EXPECTED[name]


@pytest.mark.parametrize("name", sorted(CAPACITY_CASES))
def test_hexagonal_capacity_is_the_recorded_count(name, locator_use):
    region, distance = CAPACITY_CASES[name]
    cover = L.geo.triangle_cover(region)
    assert L.hexagonal_capacity(region, distance, cover=cover) == EXPECTED_CAPACITY[name]


if __name__ == "__main__":  # print the fingerprints (run with the code whose behaviour is to be kept)
    sys.path.insert(0, str(__import__("pathlib").Path(__file__).resolve().parents[1]))
    for case in sorted(CASES):
        print(f'    "{case}": "{fingerprint(run_case(case))}",')
    for case in sorted(CAPACITY_CASES):
        print(f'    "{case}": {L.hexagonal_capacity(*CAPACITY_CASES[case])},')
