"""Station layouts: spacing rules, frame, lattice, minimum spacing, draw order and reserves.

Outside references: scipy.stats.chi2 (the 95% radius of a circular bivariate normal), shapely
(inside the frame), scipy.spatial (distances), and lattices known by construction.
"""
import math

import numpy as np
import pytest
from scipy import stats
from scipy.spatial import distance
from shapely.geometry import Point, Polygon, box

from plotwise.processing.engine import stations as st
from plotwise.processing.engine.errors import InputError
from plotwise.processing.engine.rng import make_rng

# an invented frame with a lake (hole) and a ragged edge, metres
RAGGED = Polygon(
    [(0, 0), (14000, 0), (14000, 3000), (9000, 4000), (14000, 6000), (14000, 10000), (0, 10000)],
    [[(3000, 3000), (6000, 3000), (6000, 6000), (3000, 6000)]],
)


def layout(frame=(RAGGED,), strata=None, seed=1, **settings):
    return st.place_stations(list(frame), strata=strata, rng=make_rng(seed).generator, **settings)


@pytest.mark.parametrize("home_range", [0.5, 2.0, 25.0])
def test_sigma_is_the_95_percent_radius_of_a_bivariate_normal(home_range):
    sigma = st.home_range_sigma(home_range)
    radius = math.sqrt(home_range * 1e6 / math.pi)  # the circle of the home range's area
    # (distance / sigma)^2 is chi-square with 2 df for a circular bivariate normal (scipy.stats.chi2)
    assert stats.chi2(2).cdf((radius / sigma) ** 2) == pytest.approx(0.95, abs=1e-12)
    assert radius / sigma == pytest.approx(2.45, abs=0.005)  # the usual "2.45" of the 95% range


def test_spacing_rules_in_closed_form():
    hr = 4.0  # km²
    diameter = 2 * math.sqrt(hr * 1e6 / math.pi)  # one home-range diameter: independent sites (common practice)
    sigma = math.sqrt(hr * 1e6 / math.pi) / math.sqrt(-2 * math.log(0.05))
    assert st._stations_iv(home_range=hr, rule=st.RULE_OCCUPANCY).spacing == pytest.approx(diameter, rel=1e-12)
    assert st._stations_iv(home_range=hr, rule=st.RULE_SCR).spacing == pytest.approx(2 * sigma, rel=1e-12)  # Sun 2014
    assert st._stations_iv(home_range=hr, spacing=750.0).spacing == 750.0  # a given spacing replaces the rule


@pytest.mark.parametrize("array", [st.GRID, st.CLUSTERS, st.BALANCED])
def test_every_station_lies_inside_the_frame(array):
    result = layout(array=array, n_stations=24, spacing=900.0, reserve=2, cluster_size=4)
    assert len(result) > 0
    for x, y in result.xy:
        assert RAGGED.contains(Point(x, y))  # shapely as the oracle (the lake is outside)


def test_balanced_stations_keep_the_rule_spacing():
    result = layout(array=st.BALANCED, n_stations=20, home_range=1.5, reserve=3)
    diameter = 2 * math.sqrt(1.5e6 / math.pi)
    assert distance.pdist(result.xy).min() >= diameter - 1e-6
    assert len(result) == 23


def test_full_grid_is_the_expected_lattice():
    frame = box(0, 0, 10000, 6000)
    result = layout(frame=(frame,), array=st.GRID, n_stations=0, spacing=1000.0)
    xy = result.xy
    # every point is the random start plus whole multiples of the spacing (north-aligned square lattice)
    start = np.array(result.grid_offset)
    steps = (xy - xy.min(axis=0)) / 1000.0
    assert np.allclose(steps, np.round(steps), atol=1e-9)
    assert np.all((0 <= start) & (start < 1000.0))
    # a 10 km x 6 km rectangle holds 10 x 6 lattice points at 1 km for any start (by construction)
    assert len(xy) == 60
    # nearest neighbour of every station at exactly the spacing
    d = distance.squareform(distance.pdist(xy))
    np.fill_diagonal(d, np.inf)
    assert np.allclose(d.min(axis=1), 1000.0)


def test_grid_block_is_compact_and_its_reserves_come_next():
    frame = box(0, 0, 20000, 20000)
    result = layout(frame=(frame,), array=st.GRID, n_stations=9, spacing=1000.0, reserve=4, seed=3)
    primary = result.xy[result.is_primary]
    reserve = result.xy[~result.is_primary]
    assert len(primary) == 9 and len(reserve) == 4
    # nine lattice points nearest a point: a 3 x 3 block or close to it, spanning at most 3 spacings
    assert np.ptp(primary, axis=0).max() <= 3000.0 + 1e-9
    centre = primary.mean(axis=0)
    assert np.hypot(*(reserve - centre).T).min() >= np.hypot(*(primary - centre).T).max() - 1500.0
    assert list(result.draw_ord) == list(range(1, 14))


def test_min_spacing_is_respected_between_strata():
    left, right = box(0, 0, 5000, 5000), box(5000, 0, 10000, 5000)
    result = layout(frame=(left, right), strata=[1, 2], array=st.BALANCED, n_stations=16, spacing=600.0,
                    min_spacing=600.0, reserve=2)
    assert distance.pdist(result.xy).min() >= 600.0 - 1e-9


def test_min_spacing_above_the_spacing_is_an_error():
    with pytest.raises(InputError, match="MIN_SPACING"):
        st._stations_iv(spacing=500.0, min_spacing=800.0)


def test_reserves_follow_the_primaries_in_draw_order():
    """The balanced draw is one sequence: a run with reserves starts with the run without them."""
    without = layout(array=st.BALANCED, n_stations=12, spacing=800.0, reserve=0, seed=9)
    with_reserves = layout(array=st.BALANCED, n_stations=12, spacing=800.0, reserve=3, seed=9)
    assert np.allclose(with_reserves.xy[:12], without.xy)
    assert with_reserves.role == ("primary",) * 12 + ("reserve",) * 3
    assert list(with_reserves.draw_ord) == list(range(1, 16))


def test_cluster_pattern_is_a_square_lattice_block():
    pattern = st.cluster_pattern(4, 100.0)
    assert sorted(map(tuple, pattern)) == [(-50, -50), (-50, 50), (50, -50), (50, 50)]
    plus = st.cluster_pattern(5, 100.0)  # the centre and its four neighbours
    assert sorted(map(tuple, plus)) == [(-100, 0), (0, -100), (0, 0), (0, 100), (100, 0)]


def test_clusters_are_whole_and_apart():
    result = layout(array=st.CLUSTERS, n_stations=18, spacing=400.0, cluster_size=4, reserve=1)
    ids = np.array(result.cluster)
    assert len(set(ids)) == math.ceil(18 / 4) + 1  # 5 primary clusters (18 rounded up to whole clusters) + 1 reserve
    # stations of different clusters are at least the spacing apart (centres 2R + s apart)
    d = distance.squareform(distance.pdist(result.xy))
    other = ids[:, None] != ids[None, :]
    assert d[other].min() >= 400.0 - 1e-6
    reserve_clusters = {c for c, r in zip(ids, result.role) if r == "reserve"}
    assert len(reserve_clusters) == 1


def test_too_many_stations_for_the_spacing_is_a_clear_error():
    with pytest.raises(InputError, match="do not fit"):
        layout(frame=(box(0, 0, 3000, 3000),), array=st.BALANCED, n_stations=40, spacing=1000.0)


def test_small_arrays_warn_that_density_cannot_be_estimated():
    # four stations 200 m apart against a home range of 10 km²: far fewer than a few home ranges
    result = layout(frame=(box(0, 0, 3000, 3000),), array=st.GRID, n_stations=4, spacing=200.0, home_range=10.0)
    assert result.extent.home_ranges < 1
    assert any("cannot estimate density" in w for w in result.warnings)


def test_service_plan_per_team_day():
    plan = st.service_plan(30, 1.5, 8.0, cluster_size=4)
    assert plan.per_team_day == 5 and plan.team_days == 6  # floor(8 / 1.5) = 5; ceil(30 / 5) = 6
    assert plan.cluster_hours == 6.0
    assert st.service_plan(30, 0.0) is None
