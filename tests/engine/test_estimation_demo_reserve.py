"""Truth known by construction on the demo reserve: 500 repeated surveys of its simulated velmar.

Each survey is a fresh layout from the layout engine (its own seed), circular
plots counted against the simulated animals, and the estimate. The population is
fixed, so its true total is known. Plots are placed over the habitat buffered by
the plot radius ("plus sampling"), so that every animal's plot-sized
neighbourhood lies in the frame and the estimator is unbiased for the total
(Cochran 1977, Theorem 5.1 for the strata; Cordy 1993 for points in a continuous
frame).
"""
import numpy as np
import pytest
from scipy.spatial import cKDTree
from shapely.geometry import Point, box

from plotwise.processing.engine import counting, estimation, layout
from plotwise.processing.engine.demo_reserve import build_demo_reserve
from plotwise.processing.engine.rng import make_rng

RADIUS = 300.0  # m
N_PER_STRATUM = (40, 60, 40)


@pytest.fixture(scope="module")
def reserve():
    demo = build_demo_reserve(make_rng(7).generator, 7, cell_size=200.0)
    habitat = demo.boundary.difference(demo.lake).buffer(RADIUS)
    minx, miny, maxx, maxy = habitat.bounds
    cuts = np.linspace(minx, maxx, 4)  # three strata: west, centre, east
    strata = [habitat.intersection(box(cuts[i], miny, cuts[i + 1], maxy)) for i in range(3)]
    return demo, strata


def surveys(reserve, design, n_surveys):
    demo, strata = reserve
    spec = layout.LayoutSpec(design=design, shape=2, size=RADIUS)
    frame = layout.prepare_strata(strata, strata=[1, 2, 3], n_values=list(N_PER_STRATUM), spec=spec)
    layouts = [layout.draw_layout(frame, spec, make_rng(1000 + s).generator) for s in range(n_surveys)]
    centres = np.concatenate([lay.centres for lay in layouts])
    # all plots of all surveys counted in one call
    counts = cKDTree(demo.animals_xy).query_ball_point(centres, RADIUS, return_length=True)
    ends = np.cumsum([len(lay.centres) for lay in layouts])
    areas = {h: g.area / 1e6 for h, g in zip((1, 2, 3), strata)}
    return layouts, np.split(counts.astype(float), ends[:-1]), areas


def _coverage(rows, truth):
    rows = np.array(rows)
    return np.mean((rows[:, 1] <= truth) & (truth <= rows[:, 2])), rows[:, 0].mean() / truth


def test_counts_agree_with_the_counting_engine(reserve):
    demo, _ = reserve
    layouts, counts, _ = surveys(reserve, layout.SIMPLE_RANDOM, 1)
    regions = [counting.counting_region(Point(xy), np.pi * RADIUS ** 2) for xy in layouts[0].centres[:40]]
    by_engine = counting.animals_in_regions(regions, demo.animals_xy)
    # the counting engine's circles are 256-gons of the same area: allow an animal on the rim
    assert np.abs(by_engine - counts[0][:40]).max() <= 1


def test_simple_random_surveys_cover_the_true_total(reserve):
    demo, _ = reserve
    truth = len(demo.animals_xy)
    layouts, counts, areas = surveys(reserve, layout.SIMPLE_RANDOM, 500)
    plot_km2 = np.pi * RADIUS ** 2 / 1e6
    rows = {"t": [], "lognormal": []}
    for lay, y in zip(layouts, counts):
        for method in rows:
            o = estimation.estimate_density(y, np.full(y.size, plot_km2), np.array(lay.stratum), areas,
                                            ci_method=method).overall
            rows[method].append((o.abund, o.abund_lo, o.abund_hi))
    t_cover, t_mean = _coverage(rows["t"], truth)
    ln_cover, _ = _coverage(rows["lognormal"], truth)
    print(f"\ndemo reserve, {truth} velmar: mean estimate / truth {t_mean:.4f}; "
          f"95% coverage t {t_cover:.3f}, log-normal {ln_cover:.3f}")
    assert abs(t_mean - 1) < 0.02  # design-unbiased (Cochran 1977, Theorem 5.1)
    assert 0.92 <= t_cover <= 0.98
    assert 0.91 <= ln_cover <= 0.99  # log-normal: near nominal on skewed counts (Buckland et al. 2001, §3.7)


def test_spatially_balanced_surveys_and_local_variance(reserve):
    """Balanced layouts: the SRS formula is conservative; the local neighbourhood
    estimator (Stevens & Olsen 2003) gives smaller SEs and still covers."""
    demo, _ = reserve
    truth = len(demo.animals_xy)
    layouts, counts, areas = surveys(reserve, layout.SPATIALLY_BALANCED, 200)
    plot_km2 = np.pi * RADIUS ** 2 / 1e6
    srs, local = [], []
    for lay, y in zip(layouts, counts):
        a = np.full(y.size, plot_km2)
        o = estimation.estimate_density(y, a, np.array(lay.stratum), areas).overall
        srs.append((o.abund, o.abund_lo, o.abund_hi, o.abund_se))
        o = estimation.estimate_density(y, a, np.array(lay.stratum), areas, variance_method="local",
                                        coords=lay.centres).overall
        local.append((o.abund, o.abund_lo, o.abund_hi, o.abund_se))
    srs, local = np.array(srs), np.array(local)
    srs_cover, mean = _coverage(srs, truth)
    local_cover, _ = _coverage(local, truth)
    true_sd = srs[:, 0].std()
    print(f"\nbalanced: mean / truth {mean:.4f}; true SD {true_sd:.0f}; mean SE srs {srs[:, 3].mean():.0f}, "
          f"local {local[:, 3].mean():.0f}; coverage srs {srs_cover:.3f}, local {local_cover:.3f}")
    assert abs(mean - 1) < 0.02
    assert local[:, 3].mean() < srs[:, 3].mean()
    assert local_cover >= 0.93
