"""Statistical checks of the three layout designs against outside references.

* uniform inclusion: ``scipy.stats.chisquare`` on counts per cell over 2,000 seeds,
  expected counts from the cell areas computed by shapely (the oracle);
* spatial balance: the variance of Voronoi inclusion sums (Stevens & Olsen 2004,
  JASA 99:262-278, eq. 6 and §4), lower for balanced acceptance sampling than for
  simple random sampling;
* exact grid spacing, units inside the frame, reproducibility and the minimum
  spacing, each checked with shapely / scipy.spatial as the oracle.
"""
import numpy as np
import pytest
from scipy import stats
from scipy.spatial import cKDTree
from scipy.spatial.distance import pdist
from shapely.geometry import Point, Polygon, box

from plotwise.processing.engine import layout as L
from plotwise.processing.engine.errors import InputError

SEEDS = 2000


def irregular_stratum():
    """A ragged, non-convex stratum with a hole, inside [0, 1000]^2 (invented)."""
    t = np.linspace(0, 2 * np.pi, 90, endpoint=False)
    r = 340 + 140 * np.sin(5 * t) + 40 * np.cos(11 * t)
    outer = Polygon(np.c_[500 + r * np.cos(t), 500 + r * np.sin(t)])
    notch = Polygon([(480, 500), (1000, 430), (1000, 600)])
    hole = Point(380, 420).buffer(70)
    g = outer.difference(notch).difference(hole)
    assert g.is_valid and g.area < 0.5 * (np.ptp(g.bounds[::2]) * np.ptp(g.bounds[1::2]))
    return g


@pytest.fixture(scope="module")
def stratum():
    return irregular_stratum()


def cell_expected(geom, nx=10):
    minx, miny, maxx, maxy = geom.bounds
    xs = np.linspace(minx, maxx, nx + 1)
    ys = np.linspace(miny, maxy, nx + 1)
    areas = np.array(
        [[geom.intersection(box(xs[i], ys[j], xs[i + 1], ys[j + 1])).area for i in range(nx)] for j in range(nx)]
    ).ravel()
    return xs, ys, areas / areas.sum()


def chisquare_counts(points, xs, ys, share):
    ix = np.clip(np.searchsorted(xs, points[:, 0], side="right") - 1, 0, len(xs) - 2)
    iy = np.clip(np.searchsorted(ys, points[:, 1], side="right") - 1, 0, len(ys) - 2)
    counts = np.bincount(iy * (len(xs) - 1) + ix, minlength=share.size).astype(float)
    expected = share * counts.sum()
    assert counts[share == 0].sum() == 0  # nothing outside the stratum
    big = expected >= 5
    obs = np.r_[counts[big], counts[~big].sum()]
    exp = np.r_[expected[big], expected[~big].sum()]
    if exp[-1] == 0:
        obs, exp = obs[:-1], exp[:-1]
    return stats.chisquare(obs, exp)


@pytest.mark.slow
@pytest.mark.parametrize(
    "design, cover, bearing",
    [
        (L.SIMPLE_RANDOM, "delaunay", 0.0),
        (L.SIMPLE_RANDOM, "bbox", 0.0),
        (L.SYSTEMATIC_GRID, "auto", 0.0),
        (L.SYSTEMATIC_GRID, "auto", -1.0),  # random rotation as well as a random start
        (L.SPATIALLY_BALANCED, "delaunay", 0.0),
    ],
)
def test_inclusion_is_uniform_over_seeds(stratum, design, cover, bearing):
    spec = L.LayoutSpec(design=design, bearing=bearing)
    frame = L.prepare_strata([stratum], n_units=12, spec=spec, cover_method=cover)
    pts = np.concatenate(
        [L.draw_layout(frame, spec, np.random.default_rng(seed)).centres for seed in range(1, SEEDS + 1)]
    )
    xs, ys, share = cell_expected(stratum)
    res = chisquare_counts(pts, xs, ys, share)
    print(f"{L.DESIGNS[design]} ({cover} cover, bearing {bearing:g}): {len(pts)} units, "
          f"chi-square p = {res.pvalue:.4f}")
    assert res.pvalue > 0.001  # scipy.stats.chisquare, uniform inclusion


@pytest.mark.slow
def test_inclusion_uniform_inside_inward_buffer(stratum):
    # squares kept inside: centres uniform over the stratum shrunk by the half diagonal
    spec = L.LayoutSpec(design=L.SIMPLE_RANDOM, shape=1, size=40, bearing=-1, inside=True)
    frame = L.prepare_strata([stratum], n_units=12, spec=spec)
    region = frame.strata[0].region
    pts = np.concatenate([L.draw_layout(frame, spec, np.random.default_rng(s)).centres for s in range(1, 1001)])
    xs, ys, share = cell_expected(region)
    assert chisquare_counts(pts, xs, ys, share).pvalue > 0.001  # scipy.stats.chisquare


def voronoi_inclusion_variance(sample, population, n):
    """Stevens & Olsen (2004) §4: v_i = sum of pi_j over population points nearest sample point i."""
    nearest = cKDTree(sample).query(population)[1]
    v = np.bincount(nearest, minlength=len(sample)) * (n / len(population))
    return np.var(v)


@pytest.mark.slow
def test_balanced_is_more_balanced_than_simple_random(stratum):
    n = 30
    gx, gy = np.meshgrid(np.linspace(0, 1000, 120), np.linspace(0, 1000, 120))
    from plotwise.processing.engine.geometry import contains_xy

    keep = contains_xy(stratum, gx.ravel(), gy.ravel())
    population = np.c_[gx.ravel()[keep], gy.ravel()[keep]]
    result = {}
    for design in (L.SIMPLE_RANDOM, L.SPATIALLY_BALANCED):
        spec = L.LayoutSpec(design=design)
        frame = L.prepare_strata([stratum], n_units=n, spec=spec)
        result[design] = np.mean(
            [
                voronoi_inclusion_variance(L.draw_layout(frame, spec, np.random.default_rng(s)).centres, population, n)
                for s in range(1, 201)
            ]
        )
    print(
        f"variance of Voronoi inclusion sums: simple random {result[L.SIMPLE_RANDOM]:.4f}, "
        f"balanced acceptance {result[L.SPATIALLY_BALANCED]:.4f}"
    )
    # Stevens & Olsen (2004): a spatially balanced design has the smaller variance;
    # Robertson et al. (2013), Table 1, report BAS well below simple random
    assert result[L.SPATIALLY_BALANCED] < 0.8 * result[L.SIMPLE_RANDOM]


def test_systematic_spacing_is_exact():
    region = box(0, 0, 2000, 1500)
    spec = L.LayoutSpec(design=L.SYSTEMATIC_GRID, bearing=30)
    frame = L.prepare_strata([region], n_units=48, spec=spec)
    lay = L.draw_layout(frame, spec, np.random.default_rng(7))
    s = lay.strata[0].spacing
    assert s == pytest.approx(np.sqrt(region.area / 48), rel=1e-12)  # s = sqrt(A / n), by construction
    prim = lay.centres[lay.is_primary]
    d, _ = cKDTree(prim).query(prim, k=2)
    np.testing.assert_allclose(d[:, 1], s, rtol=1e-9)
    # every difference is a whole number of steps along the rotated axes
    u, v = L.grid_axes(30.0)
    diff = prim - prim[0]
    for axis in (u, v):
        steps = diff @ axis / s
        np.testing.assert_allclose(steps, np.round(steps), atol=1e-9)
    # realised n over the seeds averages n (uniform random start): A / s^2 = 48
    realised = [
        L.draw_layout(frame, spec, np.random.default_rng(k)).strata[0].n_primary for k in range(1, 301)
    ]
    assert np.mean(realised) == pytest.approx(48, abs=0.6)


@pytest.mark.parametrize("design", [0, 1, 2])
@pytest.mark.parametrize("shape", [0, 1, 2, 3])
def test_every_unit_inside_its_stratum(stratum, design, shape):
    strata = [stratum, box(1100, 0, 1600, 400)]
    spec = L.LayoutSpec(design=design, shape=shape, size=25, bearing=-1, inside=True, reserve=4)
    lay = L.layout_units(strata, spec, np.random.default_rng(11), strata=["a", "b"], n_units=40)
    from shapely.geometry import LineString

    for key, geom in zip(["a", "b"], strata):
        sel = np.array([s == key for s in lay.stratum])
        for outline in lay.outlines[sel]:
            unit = Point(outline) if shape == 0 else LineString(outline) if shape == 3 else Polygon(outline)
            assert geom.buffer(1e-6).contains(unit)  # shapely as the oracle


@pytest.mark.parametrize("design", [0, 1, 2])
def test_same_seed_same_layout(stratum, design):
    spec = L.LayoutSpec(design=design, shape=3, size=50, bearing=-1, reserve=3, min_spacing=20)
    a = L.layout_units([stratum], spec, np.random.default_rng(42), n_units=15)
    b = L.layout_units([stratum], spec, np.random.default_rng(42), n_units=15)
    c = L.layout_units([stratum], spec, np.random.default_rng(43), n_units=15)
    np.testing.assert_array_equal(a.centres, b.centres)
    np.testing.assert_array_equal(a.bearing, b.bearing)
    assert a.unit_id == b.unit_id and a.role == b.role
    assert not np.array_equal(a.centres[:5], c.centres[:5])


@pytest.mark.parametrize("design", [0, 1, 2])
def test_min_spacing_holds_over_the_whole_layout(design):
    strata = [box(0, 0, 1000, 1000), box(1000, 0, 2000, 1000)]  # touching strata
    spec = L.LayoutSpec(design=design, min_spacing=90, reserve=5)
    lay = L.layout_units(strata, spec, np.random.default_rng(3), strata=[1, 2], n_units=60)
    assert len(lay) >= 60
    assert pdist(lay.centres).min() >= 90 - 1e-9  # scipy.spatial.distance.pdist


def test_min_spacing_infeasible_states_the_count():
    region = box(0, 0, 1000, 1000)
    spec = L.LayoutSpec(design=L.SIMPLE_RANDOM, min_spacing=100)
    with pytest.raises(InputError) as err:
        L.layout_units([region], spec, np.random.default_rng(1), n_units=500)
    # hexagonal packing: about A / (sqrt(3)/2 d^2) = 115 points (Thue's theorem), plus edge points
    fit = int(str(err.value).split("at most about ")[1].split()[0])
    assert 110 <= fit <= 135
    spec = L.LayoutSpec(design=L.SYSTEMATIC_GRID, min_spacing=100)
    with pytest.raises(InputError, match="holds about 100 units"):  # A / d^2 on a square grid
        L.layout_units([region], spec, np.random.default_rng(1), n_units=500)


def test_reserves_follow_primaries_in_draw_order(stratum):
    spec = L.LayoutSpec(design=L.SPATIALLY_BALANCED, reserve=5)
    lay = L.layout_units([stratum], spec, np.random.default_rng(9), n_units=10)
    assert lay.role == ("primary",) * 10 + ("reserve",) * 5
    np.testing.assert_array_equal(lay.draw_ord, np.arange(1, 16))
    # balanced: the first 10 + 5 are the first 15 of the same sequence (prefix property)
    longer = L.layout_units([stratum], L.LayoutSpec(design=2), np.random.default_rng(9), n_units=15)
    np.testing.assert_allclose(lay.centres, longer.centres)
