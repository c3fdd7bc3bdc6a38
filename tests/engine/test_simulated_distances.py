"""Simulated sightings: distances against shapely, and their distribution against the model they were drawn from."""
import numpy as np
import pytest
from scipy import stats
from shapely.geometry import LineString, Point

from plotwise.processing.engine import simulated_distances as sim
from plotwise.processing.engine.errors import InputError


def test_distance_to_line_matches_shapely():
    line = LineString([(0, 0), (300, 50), (500, -100), (520, 400)])
    rng = np.random.default_rng(1)
    x, y = rng.uniform(-200, 700, 300), rng.uniform(-300, 600, 300)
    ours = sim.distance_to_line(line, x, y)
    reference = np.array([line.distance(Point(a, b)) for a, b in zip(x, y)])  # shapely (GEOS)
    assert np.allclose(ours, reference, atol=1e-9)


def test_automatic_width_is_where_g_falls_to_one_percent():
    for function, shape in ((sim.HALF_NORMAL, 1.0), (sim.HAZARD_RATE, 2.5)):
        width = sim.automatic_max_distance(function, 30.0, shape)
        assert sim.detection_probability(function, width, 30.0, shape) == pytest.approx(0.01)


def _uniform_animals(rng, density_m2, box):
    n = rng.poisson(density_m2 * (box[2] - box[0]) * (box[3] - box[1]))
    return np.column_stack([rng.uniform(box[0], box[2], n), rng.uniform(box[1], box[3], n)])


def test_line_sightings_follow_the_half_normal_and_the_strip_holds_the_expected_animals():
    rng = np.random.default_rng(2)
    lines = [LineString([(x0, 0), (x0, 2000)]) for x0 in range(0, 20000, 1000)]
    animals = _uniform_animals(rng, 400e-6, (-500, -500, 20500, 2500))
    sighted = sim.simulate_sightings(lines, animals, sim.HALF_NORMAL, 40.0, rng=rng)
    width = sighted.max_distance
    # truth by construction: a strip of 2W × 2 km per line holds Poisson(D · 2W · L) animals
    expected = 400e-6 * 2 * width * 2000 * len(lines)
    assert abs(sighted.present.sum() - expected) < 4 * np.sqrt(expected)
    # perpendicular distances of uniform animals thinned by g are half-normal truncated at W
    ks = stats.kstest(sighted.distance, stats.truncnorm(0, width / 40.0, scale=40.0).cdf)
    assert ks.pvalue > 0.001
    assert sighted.seen.sum() == sighted.distance.size and np.all(sighted.size == 1)


def test_point_sightings_follow_the_radial_distribution():
    # a uniform animal at radius r from a point has density 2r/W²; thinned by a half-normal g the
    # radial distances are Rayleigh(σ) truncated at W (Buckland et al. 2001, point transects)
    rng = np.random.default_rng(3)
    points = [Point(x0, y0) for x0 in range(0, 10000, 1000) for y0 in range(0, 5000, 1000)]
    animals = _uniform_animals(rng, 2000e-6, (-500, -500, 10500, 5500))
    sizes = rng.integers(1, 4, len(animals))
    sighted = sim.simulate_sightings(points, animals, sim.HALF_NORMAL, 30.0, rng=rng, sizes=sizes, max_distance=80.0)
    rayleigh = stats.rayleigh(scale=30.0)
    ks = stats.kstest(sighted.distance, lambda r: rayleigh.cdf(r) / rayleigh.cdf(80.0))
    assert ks.pvalue > 0.001 and sighted.distance.max() <= 80.0
    assert np.array_equal(sighted.size, sizes[sighted.animal])
    assert sighted.seen.sum() == pytest.approx(sighted.size.sum())


def test_g0_below_one_thins_everything_and_polygons_are_refused():
    rng = np.random.default_rng(4)
    lines = [LineString([(0, 0), (0, 50000)])]
    animals = _uniform_animals(rng, 500e-6, (-200, 0, 200, 50000))
    full = sim.simulate_sightings(lines, animals, sim.HAZARD_RATE, 20.0, 3.0, rng=np.random.default_rng(5))
    half = sim.simulate_sightings(lines, animals, sim.HAZARD_RATE, 20.0, 3.0, rng=np.random.default_rng(5), g0=0.5)
    assert half.seen.sum() == pytest.approx(0.5 * full.seen.sum(), rel=0.1)
    with pytest.raises(InputError, match="Units 7 are neither points nor lines"):
        sim.simulate_sightings([Point(0, 0).buffer(10)], animals, sim.HALF_NORMAL, 20.0, rng=rng, unit_ids=[7])
