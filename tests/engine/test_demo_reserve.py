"""The demo reserve: its population total against the Thomas-process moments, and determinism."""
import numpy as np
import pytest

from plotwise.processing.engine.demo_reserve import build_demo_reserve
from plotwise.processing.engine.rng import make_rng


def _reserve(seed, cell_size=100.0):
    seeded = make_rng(seed)
    return build_demo_reserve(seeded.generator, seeded.seed, cell_size)


def test_population_total_matches_thomas_moments():
    """Truth by construction.

    For a Thomas cluster process with group-centre intensity kappa(x), Poisson(mu) members per
    group, normal displacement, and members kept when they land on the habitat (share q(x)):
        E[N] = ∫ kappa mu q dx,  Var[N] = ∫ kappa (mu q + mu² q²) dx
    (Campbell's theorem applied to the Poisson parent process; Diggle (2013) §5.3 for the
    cluster-process moments). Over 24 seeds the standardised totals z = (N − E[N]) / sd[N]
    should have mean 0 (tolerance 4 / sqrt(24)) and variance 1 (chi-square bounds, 23 df).
    """
    from scipy import stats

    z = []
    for seed in range(101, 125):
        reserve = _reserve(seed, cell_size=200.0)
        z.append((reserve.true_total - reserve.expected_total) / np.sqrt(reserve.total_variance))
    z = np.asarray(z)
    print("standardised totals: mean", z.mean(), "variance", z.var(ddof=1))
    assert abs(z.mean()) < 4.0 / np.sqrt(len(z))
    lo, hi = stats.chi2.ppf([0.0005, 0.9995], len(z) - 1) / (len(z) - 1)  # scipy.stats.chi2 as the reference
    assert lo < z.var(ddof=1) < hi


def test_variance_exceeds_poisson_by_the_cluster_factor():
    # Thomas process: Var[N] ≈ E[N] (1 + mu) when q ≈ 1 (Diggle 2013 §5.3); edges pull it slightly below.
    reserve = _reserve(7)
    ratio = reserve.total_variance / reserve.expected_total
    assert 0.9 * (1 + reserve.mean_group_size) < ratio <= 1 + reserve.mean_group_size + 1e-9


def test_scenario_as_specified():
    reserve = _reserve(3)
    assert 200e6 <= reserve.boundary.area <= 400e6  # issue 2: 200–400 km²
    assert reserve.boundary.is_valid and reserve.boundary.contains(reserve.lake)
    assert reserve.inholding.area > 1e6 and reserve.boundary.buffer(1).contains(reserve.inholding)
    assert 1000 < reserve.true_total < 10000
    inside = reserve.habitat
    from plotwise.processing.engine.geometry import contains_xy

    assert contains_xy(inside, reserve.animals_xy[:, 0], reserve.animals_xy[:, 1]).all()
    # greenness correlated with elevation (negatively), plus noise
    r = np.corrcoef(reserve.elevation.ravel(), reserve.greenness.ravel())[0, 1]
    assert -0.98 < r < -0.6
    # the escarpment gives slopes steeper than 30 degrees (numpy gradient as the slope oracle)
    dz_dy, dz_dx = np.gradient(reserve.elevation.astype(float), 100.0)
    slope = np.degrees(np.arctan(np.hypot(dz_dx, dz_dy)))
    assert slope.max() > 30.0


def test_same_seed_same_reserve():
    a, b = _reserve(42, 200.0), _reserve(42, 200.0)
    assert a.boundary.equals(b.boundary)
    np.testing.assert_array_equal(a.animals_xy, b.animals_xy)
    np.testing.assert_array_equal(a.elevation, b.elevation)
    c = _reserve(43, 200.0)
    assert not a.boundary.equals(c.boundary)


def test_cell_size_out_of_range():
    from plotwise.processing.engine.errors import InputError

    with pytest.raises(InputError, match="cell size"):
        _reserve(1, 5.0)


def test_reserve_lies_in_open_ocean():
    # The invented reserve must sit on no real land. Its UTM zone 36S spans 30° E to 36° E;
    # there the African coast ends north of 35° S and the Antarctic ice starts south of 65° S
    # (from memory, any atlas), so 38° S to 60° S is open ocean.
    import pyproj

    reserve = _reserve(7, cell_size=250.0)
    to_geo = pyproj.Transformer.from_crs(reserve.crs_epsg, 4326, always_xy=True)
    x0, y0, x1, y1 = reserve.boundary.bounds
    lons, lats = to_geo.transform([x0, x1, x0, x1], [y0, y0, y1, y1])
    assert all(30.0 < lon < 36.0 for lon in lons)
    assert all(-60.0 < lat < -38.0 for lat in lats)
