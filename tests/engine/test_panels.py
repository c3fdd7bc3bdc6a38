"""Revisit panels: the schedule each design defines, draw order, and the spread of the panels.

Outside references:
* the designs themselves (Urquhart & Kincaid 1999; McDonald 2003): a rotating panel p of K
  is visited in the years start + (p − 1) + mK, a core every year. The expected years are
  written out here from that definition, not taken from the code.
* Stevens & Olsen (2004), section 3: the Voronoi measure of spatial balance,
  ``(1/n) Σ (v_i − 1)²`` with ``v_i`` the inclusion probability in sample point i's polygon.
"""
import numpy as np
import pytest
from shapely.geometry import Polygon

from plotwise.processing.engine import halton
from plotwise.processing.engine import panels as pe
from plotwise.processing.engine.errors import InputError
from plotwise.processing.engine.geometry import contains_xy, triangle_cover, uniform_points

REGION = Polygon([(0, 0), (10000, 0), (10000, 6000), (4000, 8000), (0, 6000)])  # invented frame, metres


def expected_years(design, panel, k, start, years):
    """The visit years by the designs' definition (McDonald 2003): written out, not computed by the engine."""
    calendar = list(range(start, start + years))
    if design == pe.EVERY_YEAR or panel == 0:
        return calendar
    return [start + (panel - 1) + m * k for m in range(years) if start + (panel - 1) + m * k < start + years]


@pytest.mark.parametrize("design, k, share, years", [(0, 1, 0.0, 7), (1, 3, 0.0, 10), (1, 4, 0.0, 9),
                                                     (2, 3, 0.3, 12), (2, 5, 0.5, 10)])
def test_every_unit_is_visited_exactly_in_the_years_of_its_panel(design, k, share, years):
    spec = pe.panel_spec_iv(design, k, share, 2031, years)
    n = 47
    strata = [("north" if i % 3 else "south") for i in range(n)]
    roles = ["reserve" if i in (5, 40) else "primary" for i in range(n)]
    order = np.random.default_rng(1).permutation(n) + 1  # draw order within strata need not follow the rows
    assignment = pe.assign_panels([f"u{i}" for i in range(n)], spec, strata=strata, draw_ord=order, roles=roles)
    visits = pe.visit_matrix(assignment.panel, spec)
    for i in range(n):
        if roles[i] == "reserve":
            assert assignment.panel[i] == -1 and assignment.years_text[i] == "" and not visits[i].any()
            continue
        wanted = expected_years(design, int(assignment.panel[i]), k, 2031, years)
        assert [int(y) for y in assignment.years_text[i].split(",")] == wanted
        assert list(spec.calendar[visits[i]]) == wanted
    # the schedule lists each panel in exactly its years, with its units
    for row in assignment.schedule:
        assert row.year in expected_years(design, row.panel, k, 2031, years)
        assert row.n_units == int(np.sum(assignment.panel == row.panel))
    assert assignment.units_per_year().sum() == visits.sum()


def test_panels_follow_the_draw_order_within_each_stratum():
    spec = pe.panel_spec_iv(pe.SPLIT, 3, 0.25, 2025, 9)
    strata = ["a"] * 20 + ["b"] * 13
    order = np.concatenate([np.arange(20, 0, -1), np.arange(1, 14)])
    assignment = pe.assign_panels(list(range(33)), spec, strata=strata, draw_ord=order)
    for key, rows in (("a", np.arange(20)), ("b", np.arange(20, 33))):
        by_order = assignment.panel[rows][np.argsort(order[rows])]
        assert np.all(np.diff(by_order) >= 0)  # core (0) first, then panel 1, 2, 3 in consecutive blocks
        sizes = np.bincount(by_order, minlength=4)
        assert sizes[0] == round(0.25 * len(rows))  # the core share, rounded
        assert sizes[1:].max() - sizes[1:].min() <= 1  # rotating panels as even as possible
        assert assignment.sizes[(key, 0)] == sizes[0]


def test_design_errors_name_the_remedy():
    with pytest.raises(InputError, match="never be visited"):
        pe.panel_spec_iv(pe.ROTATING, 6, 0.0, 2025, 4)
    with pytest.raises(InputError, match="CORE_SHARE"):
        pe.panel_spec_iv(pe.SPLIT, 3, 1.0, 2025, 9)
    with pytest.raises(InputError, match="at least 2 rotating panels"):
        pe.panel_spec_iv(pe.ROTATING, 1, 0.0, 2025, 9)
    spec = pe.panel_spec_iv(pe.ROTATING, 2, 0.0, 2025, 4)
    with pytest.raises(InputError, match="u2, u3") as caught:
        pe.assign_panels(["u1", "u2", "u3"], spec, draw_ord=[1, 2, 2])
    assert caught.value.ids == ["u2", "u3"]
    with pytest.raises(InputError, match="no draw order"):
        pe.assign_panels(["u1", "u2"], spec, draw_ord=[1, None])


def test_voronoi_measure_by_construction():
    # Stevens & Olsen (2004): one sample point at the centre of each quarter of a square, population a fine
    # grid, equal inclusion: every Voronoi polygon is a quarter, v_i = 1, the measure is 0.
    g = (np.arange(200) + 0.5) / 200
    grid = np.column_stack([a.ravel() for a in np.meshgrid(g, g)])
    quarters = np.array([[0.25, 0.25], [0.75, 0.25], [0.25, 0.75], [0.75, 0.75]])
    assert pe.voronoi_balance(quarters, grid) == pytest.approx(0.0, abs=1e-12)
    # two points (0.1, 0.5) and (0.3, 0.5): their polygons split the square at x = 0.2, so v = 2·0.2 = 0.4 and
    # 2·0.8 = 1.6, and the measure is ((0.4 − 1)² + (1.6 − 1)²) / 2 = 0.36
    pair = np.array([[0.1, 0.5], [0.3, 0.5]])
    assert pe.voronoi_balance(pair, grid) == pytest.approx(((0.4 - 1) ** 2 + (1.6 - 1) ** 2) / 2, abs=1e-9)


def _frame_grid(step=150.0):
    g = np.arange(step / 2, 10000, step)
    grid = np.column_stack([a.ravel() for a in np.meshgrid(g, g)])
    return grid[contains_xy(REGION, grid[:, 0], grid[:, 1])]


def test_each_rotating_panel_of_a_balanced_layout_is_spread_more_evenly_than_a_random_subset():
    """Stevens & Olsen (2004) measure over a fine grid of the frame (about 3,000 points). 40 balanced layouts
    (BAS, Robertson et al. 2013) of 48 units in 4 rotating panels (160 panels), each panel against 12 random
    subsets of the same layout of the same size. Truth by construction: a random subset is an unbalanced sample
    of the frame."""
    rng = np.random.default_rng(20)
    grid = _frame_grid()
    spec = pe.panel_spec_iv(pe.ROTATING, 4, 0.0, 2025, 8)
    ratios = []
    for _ in range(40):
        xy = halton.balanced_acceptance_sample(REGION, 48, rng).points
        panel = pe.panels_in_draw_order(48, spec)
        for p in spec.panel_numbers:
            chosen = panel == p
            measure = pe.voronoi_balance(xy[chosen], grid)
            random = np.mean([pe.voronoi_balance(xy[rng.choice(48, chosen.sum(), replace=False)], grid)
                              for _ in range(12)])
            ratios.append(measure / random)
    ratios = np.array(ratios)
    # each panel is better spread than the mean random subset of its size in nearly every case
    share = np.mean(ratios < 1.0)
    assert share >= 0.95, share  # observed 1.0; binomial MC SE at a true 0.98 would be 0.011
    assert np.mean(ratios) < 0.6, np.mean(ratios)  # observed about 0.35 here


@pytest.mark.slow
def test_the_check_tells_balanced_panels_from_a_simple_random_layout():
    """The permutation check's p-value is uniform for a simple random layout (exchangeable labels), so about
    90% of them fail the test at alpha = 0.1, and about 70% are also no more even than random panels by the
    spread ratio (both needed for a flag); balanced layouts of 60 units in split panels pass. 24 layouts of each
    kind, 49 rearrangements each (binomial MC SE of a share about 0.09)."""
    rng = np.random.default_rng(21)
    cover = triangle_cover(REGION)
    spec = pe.panel_spec_iv(pe.SPLIT, 4, 0.2, 2025, 12)
    flagged = {"balanced": 0, "random": 0}
    for kind in flagged:
        for _ in range(24):
            xy = (halton.balanced_acceptance_sample(REGION, 60, rng).points if kind == "balanced"
                  else uniform_points(cover, REGION, 60, rng))
            assignment = pe.assign_panels(list(range(60)), spec, draw_ord=np.arange(1, 61))
            check = pe.panel_balance_check(xy, assignment, rng, rearrangements=49)
            flagged[kind] += not check.balanced
    assert flagged["balanced"] <= 2, flagged  # observed: none of 40 in trials
    assert flagged["random"] >= 11, flagged  # expected about 0.7 x 24 = 17


def test_the_layout_design_record_decides_the_warning():
    """plotwise:layout writes the design of its units (edge.design_record); a recorded simple random or grid
    layout is warned about whatever the check says, a balanced one never, a missing record falls back on the
    check."""
    from plotwise.processing.engine import edge

    passed = pe.BalanceCheck((pe.PanelBalance(1, 5, 0.2, 0.4),), 0.02, 0.5, True, 199, 0.1)
    failed = pe.BalanceCheck((pe.PanelBalance(1, 5, 0.4, 0.4),), 0.6, 1.0, False, 199, 0.1)
    assert pe.recorded_design([edge.BALANCED] * 3) == pe.RECORDED_BALANCED
    assert pe.recorded_design([edge.RANDOM_APART, edge.RANDOM, "x"], roles=["primary", "primary", "reserve"]) == \
        pe.RECORDED_RANDOM
    assert pe.recorded_design([edge.GRID, edge.BALANCED]) is None  # mixed: no record to trust
    assert pe.recorded_design(None) is None
    assert "simple random" in pe.spread_warning(pe.RECORDED_RANDOM, passed)
    assert "systematic grid" in pe.spread_warning(pe.RECORDED_GRID, passed)
    assert pe.spread_warning(pe.RECORDED_BALANCED, failed) is None
    assert pe.spread_warning(None, passed) is None
    assert "p = 0.60" in pe.spread_warning(None, failed)
