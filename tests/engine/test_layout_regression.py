"""Regression check: a fixed seed gives the same units as the layout code of main at 7cd9fd5.

This is no correctness check (the statistical and geometric checks live in test_layout_draws.py,
test_layout_engine.py and test_geometry.py): it guards reproducibility, the promise that a seed
recorded in last season's report gives the same units again. The fingerprints below were recorded
with the code before the point-in-polygon and validity work (shapely 1.8.5 and 2.0.7 gave the same
values), by running this file as a script:

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
    "srs_merged_features": ([box(0, 0, 500, 500), box(500, 0, 900, 300), _ragged(800, 5, radius=300, x0=2000)],
                            [7, 7, 8], [25, 25, 10], None, L.LayoutSpec(design=0, reserve=3), "auto"),
}

EXPECTED = {  # recorded at 7cd9fd5 with shapely 1.8.5 and 2.0.7
    "bas_box": "261a32147921336641217d81",
    "bas_saw_transects": "2cdba1c7c37f1ba1bc4d0ae3",
    "bas_three_strata_spacing": "859c5d78ae11c319fed6b824",
    "grid_box_bearing0": "1237b3106a4ccb4f79df66c5",
    "grid_hole_random": "d09405856dd579005f52c310",
    "grid_squares_inside": "0dbc7dd6ffd19490dd2e9a34",
    "srs_circles_inside_spacing": "ec22b7c1b6177f99e9893027",
    "srs_hole_delaunay": "5d0db3b21c40e17dcce7b087",
    "srs_merged_features": "807e58c163bc14127870e3e6",
    "srs_saw_auto": "df4ef712928c1a5b4c133425",
    "srs_saw_bbox": "bc83d1c8ccbfba796aa1de93",
}

CAPACITY_CASES = {  # hexagonal_capacity: lattice points fall exactly on the edges of boxes
    "box": (box(0, 0, 1000, 500), 50.0),
    "box_with_hole": (box(0, 0, 1000, 600).difference(box(200, 200, 400, 300)), 25.0),
    "saw": (_ragged(5000, 1), 70.0),
}

EXPECTED_CAPACITY = {  # recorded at 7cd9fd5
    "box": 234,
    "box_with_hole": 1064,
    "saw": 850,
}


def fingerprint(layout):
    """sha256 over the units' ids, roles, centres, bearings and inclusion probabilities (exact bits)."""
    h = hashlib.sha256()
    h.update("|".join(layout.unit_id).encode())
    h.update("|".join(layout.role).encode())
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
