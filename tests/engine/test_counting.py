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
    assert circle.area == pytest.approx(10_000.0, rel=2e-3)  # a 64-segment circle is within 0.2% of pi r²
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
