"""Counting simulated animals in units: brute-force counts and binomial thinning."""
import numpy as np
import pytest
from shapely.geometry import LineString, Point, box

from plotwise.processing.engine import counting


def test_counts_equal_brute_force():
    rng = np.random.default_rng(1)
    xy = rng.uniform(0, 1000, (5000, 2))
    squares = [box(x, y, x + 100, y + 100) for x, y in rng.uniform(0, 900, (30, 2))]
    got = counting.animals_in_regions(squares, xy)
    for square, n in zip(squares, got):
        minx, miny, maxx, maxy = square.bounds
        # numpy comparison as the oracle (points on edges have probability 0)
        assert n == np.sum((xy[:, 0] > minx) & (xy[:, 0] < maxx) & (xy[:, 1] > miny) & (xy[:, 1] < maxy))


def test_point_and_line_units_count_in_regions_of_their_area():
    circle = counting.counting_region(Point(0, 0), 10_000.0)
    # the polygon has the circle's area: (m/2) ρ² sin(2π/m) = π r² for a regular m-gon (Euclid as the oracle)
    assert circle.area == pytest.approx(10_000.0, rel=1e-9)
    strip = counting.counting_region(LineString([(0, 0), (500, 0)]), 10_000.0)
    assert strip.area == pytest.approx(10_000.0, rel=1e-9)  # flat caps: length × width exactly


def test_binomial_thinning_mean_and_variance():
    # Binomial(n, p): mean n p, variance n p (1 − p)
    rng = np.random.default_rng(2)
    xy = np.column_stack([rng.uniform(0, 10, 200), rng.uniform(0, 10, 200)])
    regions = [box(0, 0, 10, 10)] * 4000
    result = counting.simulate_counts(regions, xy, 0.3, rng)
    assert np.all(result.present == 200)
    assert result.seen.mean() == pytest.approx(60.0, abs=4 * np.sqrt(42.0 / 4000))
    assert result.seen.var() == pytest.approx(42.0, rel=0.08)


def test_units_count_only_inside_their_stratum():
    # truth by construction: a 10 × 10 grid of animals at 0.5, 1.5, ..., 9.5; two strata split at x = 5; a
    # square over the split counts only its own stratum's side (numpy comparison as the oracle)
    g = np.arange(10) + 0.5
    xy = np.array([(x, y) for x in g for y in g])
    strata = [box(0, 0, 5, 10), box(5, 0, 10, 10)]
    unit = box(3, 3, 7, 7)
    result = counting.simulate_counts([unit, unit, unit], xy, 1.0, np.random.default_rng(0), strata=strata,
                                      unit_stratum=[0, 1, -1])
    inside = (xy[:, 0] > 3) & (xy[:, 0] < 7) & (xy[:, 1] > 3) & (xy[:, 1] < 7)
    assert result.present.tolist() == [np.sum(inside & (xy[:, 0] < 5)), np.sum(inside & (xy[:, 0] > 5)), 0]
