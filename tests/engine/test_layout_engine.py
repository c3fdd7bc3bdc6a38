"""Layout engine: Halton sequence, counts per stratum, bad input, weights and coordinates."""
import numpy as np
import pyproj
import pytest
from scipy.stats import qmc
from shapely.geometry import MultiPolygon, Polygon, box

from plotwise.processing.engine import halton
from plotwise.processing.engine import layout as L
from plotwise.processing.engine.errors import InputError

CRS = "EPSG:32736"  # WGS 84 / UTM 36S


def test_halton_equals_scipy():
    ref = qmc.Halton(d=2, scramble=False).random(2000)  # scipy.stats.qmc, the reference library
    np.testing.assert_allclose(halton.halton_points(np.arange(2000)), ref, rtol=0, atol=1e-15)


def test_radical_inverse_by_hand():
    # Halton (1960): 6 = 110 in base 2 -> 0.011 = 0.375; 5 = 12 in base 3 -> 0.21 = 7/9
    assert halton.radical_inverse([6], 2)[0] == 0.375
    assert halton.radical_inverse([5], 3)[0] == pytest.approx(7 / 9)


def test_digit_reversal_inverts_the_radical_inverse():
    i = np.arange(0, 3**7, 13)
    u = halton.digit_reversal(i, 3, 7)
    np.testing.assert_allclose(halton.radical_inverse(u, 3), i / 3**7)


def test_balanced_start_is_the_uniform_point_and_sequence_continues():
    region = box(0, 0, 100, 50)
    draw = halton.balanced_acceptance_sample(region, 20, np.random.default_rng(2))
    np.testing.assert_array_equal(draw.indices, np.arange(20))  # a full box accepts every point
    # later points are the random-start Halton points, moved by under one cell
    later = halton.halton_points(np.arange(1, 20), draw.start) * [100, 50]
    np.testing.assert_allclose(draw.points[1:], later, atol=1e-6)


def test_proportional_counts_with_minimum():
    # shares of 100 by area 70/20/9/1 -> 70, 20, 9, 1; the last is raised to 2 and the rest re-shared
    n = L.proportional_counts([70, 20, 9, 1], 100)
    assert n.sum() == 100 and n.min() >= 2 and n[-1] == 2
    exact = 98 * np.array([70, 20, 9]) / 99  # Cochran (1977) ch. 5, proportional allocation
    assert np.all(np.abs(n[:3] - exact) < 1)
    assert list(L.proportional_counts([1, 1, 1], 4)) == [2, 2, 2]


@pytest.mark.parametrize(
    "values, word, ids",
    [([3, None, 4], "NULL", [11]), ([3, -2, 4], "negative", [11]), ([3, 2.5, 4], "whole number", [11])],
)
def test_bad_n_field_names_the_feature(values, word, ids):
    geoms = [box(0, 0, 100, 100), box(100, 0, 200, 100), box(200, 0, 300, 100)]
    with pytest.raises(InputError, match=word) as err:
        L.prepare_strata(geoms, feature_ids=[10, 11, 12], strata=[1, 2, 3], n_values=values)
    assert err.value.ids == ids and "11" in str(err.value)


def test_invalid_repaired_and_empty_skipped_with_warnings():
    bow = Polygon([(0, 0), (200, 200), (200, 0), (0, 200)])
    flat = Polygon([(0, 0), (10, 0), (20, 0)])
    frame = L.prepare_strata([bow, flat, box(300, 0, 500, 200)], feature_ids=[1, 2, 3], strata=["a", "a", "b"],
                             n_units=6)
    text = " ".join(frame.warnings)
    assert "repaired" in text and "1" in text
    assert "skipped" in text and frame.skipped_ids == (2,)
    assert [s.key for s in frame.strata] == ["a", "b"]


def test_inside_stratum_too_small_names_it():
    spec = L.LayoutSpec(shape=2, size=30, inside=True)
    with pytest.raises(InputError, match="Stratum tiny") as err:
        L.prepare_strata([box(0, 0, 1000, 1000), box(1000, 0, 1040, 1000)], strata=["big", "tiny"], n_units=6,
                         spec=spec)
    assert "SIZE" in str(err.value)


def test_effective_area_and_weights():
    # squares of side 20 kept inside a 1000 x 500 stratum: centres from the stratum shrunk by 10 sqrt(2)
    spec = L.LayoutSpec(design=0, shape=1, size=20, bearing=0, inside=True, reserve=2)
    lay = L.layout_units([box(0, 0, 1000, 500)], spec, np.random.default_rng(1), n_units=25)
    st = lay.strata[0]
    r = 10 * np.sqrt(2)
    assert st.effective_area == pytest.approx((1000 - 2 * r) * (500 - 2 * r), rel=1e-6)  # erosion of a rectangle
    np.testing.assert_allclose(lay.incl_p, 25 * 400 / st.effective_area)  # n a / A'
    prim = lay.is_primary
    # Horvitz-Thompson by construction: sum of primary weights times unit area = frame area
    assert (lay.weight[prim] * lay.area_m2[prim]).sum() == pytest.approx(st.effective_area)
    assert lay.role.count("reserve") == 2


def test_points_use_inclusion_density():
    # Cordy (1993): inclusion density n / A per m2; weights sum to the area
    lay = L.layout_units([box(0, 0, 1000, 1000)], L.LayoutSpec(), np.random.default_rng(1), n_units=10)
    np.testing.assert_allclose(lay.incl_p, 1e-5)
    assert lay.weight.sum() == pytest.approx(1e6)
    assert np.isnan(lay.area_m2).all()
    # a point station with a counting radius counts in a circle: incl_p = n pi r^2 / A+, with plus sampling over
    # the square grown by r, of area A + P r + pi r^2 (Steiner's formula for a convex set)
    lay = L.layout_units([box(0, 0, 1000, 1000)], L.LayoutSpec(size=10), np.random.default_rng(1), n_units=10)
    # (the region is drawn with its arcs just outside the circle, edge.plus_region: 0.12 % farther out)
    np.testing.assert_allclose(lay.incl_p, 10 * np.pi * 100 / (1e6 + 4000 * 10 + np.pi * 100), rtol=1e-4)
    inside = L.layout_units([box(0, 0, 1000, 1000)], L.LayoutSpec(size=10, inside=True), np.random.default_rng(1),
                            n_units=10)
    np.testing.assert_allclose(inside.incl_p, 10 * np.pi * 100 / 980 ** 2, rtol=1e-9)  # the square shrunk by r


def test_lon_lat_match_pyproj():
    spec = L.LayoutSpec()
    lay = L.layout_units([box(500000, 9000000, 502000, 9002000)], spec, np.random.default_rng(4), n_units=8, crs=CRS)
    to_wgs84 = pyproj.Transformer.from_crs(CRS, "EPSG:4326", always_xy=True)
    lon, lat = to_wgs84.transform(lay.centres[:, 0], lay.centres[:, 1])
    np.testing.assert_allclose(lay.lon, lon)  # pyproj as the oracle
    np.testing.assert_allclose(lay.lat, lat)
    assert (lay.lat < 0).all()


def test_unit_ids_and_strata_order():
    lay = L.layout_units([box(0, 0, 100, 100), box(100, 0, 300, 100)], L.LayoutSpec(reserve=1),
                         np.random.default_rng(2), strata=[2, 1], n_units=6)
    assert lay.unit_id[0] == "S1-001" and lay.stratum[0] == 1
    assert lay.unit_id[-1].startswith("S2-")


def test_transect_waypoints_start_and_end():
    spec = L.LayoutSpec(shape=3, size=200, bearing=-1)
    lay = L.layout_units([box(500000, 9000000, 505000, 9005000)], spec, np.random.default_rng(6), n_units=4, crs=CRS)
    wp = L.layout_waypoints(lay, CRS)
    assert wp.name[:2] == (lay.unit_id[0] + "A", lay.unit_id[0] + "B")
    # the two ends are one transect length apart on the ground (pyproj.Geod, within UTM scale error)
    geod = pyproj.Geod(ellps="WGS84")
    _, _, dist = geod.inv(wp.lon[0::2], wp.lat[0::2], wp.lon[1::2], wp.lat[1::2])
    np.testing.assert_allclose(dist, 200, rtol=2e-3)


def test_spec_rejects_bad_parameters():
    with pytest.raises(InputError, match="SIZE"):
        L.LayoutSpec(shape=1, size=0)
    with pytest.raises(InputError, match="BEARING"):
        L.LayoutSpec(bearing=400)
    with pytest.raises(InputError, match="DESIGN"):
        L.LayoutSpec(design=5)


def test_zero_units_stratum_warns():
    frame = L.prepare_strata([box(0, 0, 10, 10), box(10, 0, 20, 10)], strata=[1, 2], n_values=[0, 3])
    assert any("no units" in w for w in frame.warnings)
    lay = L.draw_layout(frame, L.LayoutSpec(), np.random.default_rng(1))
    assert len(lay) == 3


def test_cancel_stops_the_draw():
    from plotwise.processing.engine.errors import Cancelled

    frame = L.prepare_strata([box(0, 0, 100, 100)], n_units=5)
    with pytest.raises(Cancelled):
        L.draw_layout(frame, L.LayoutSpec(), np.random.default_rng(1), progress=lambda f: True)


def test_features_of_one_stratum_must_agree_on_n():
    with pytest.raises(InputError, match="different") as err:
        L.prepare_strata([box(0, 0, 1, 1), box(1, 0, 2, 1)], feature_ids=[5, 6], strata=[1, 1], n_values=[3, 4])
    assert err.value.ids == [5, 6]
    # the same value on both parts: one stratum of two parts with 3 units
    frame = L.prepare_strata([box(0, 0, 1, 1), box(1, 0, 2, 1)], strata=[1, 1], n_values=[3, 3])
    assert len(frame.strata) == 1 and frame.strata[0].n == 3 and frame.strata[0].area == pytest.approx(2.0)


def test_n_field_checked_on_kept_features_only():
    # an empty feature without a value is skipped with a warning, not an error
    frame = L.prepare_strata([box(0, 0, 10, 10), Polygon()], feature_ids=[1, 2], strata=[1, 2], n_values=[3, None])
    assert frame.skipped_ids == (2,) and frame.strata[0].n == 3


def test_inside_warns_when_the_edge_band_is_large():
    """A 5,000 m × 300 m strip with 100 m squares kept inside.

    The circumscribing radius of a 100 m square is r = 50·√2 ≈ 70.7 m, so centres fall only in the
    inner (5000 − 2r) × (300 − 2r) rectangle, by construction: the band without centres is
    1 − 4858.6 × 158.6 / 1.5e6 ≈ 49% of the strip, above the 20% warning share.
    """
    from shapely.geometry import box

    from plotwise.processing.engine import layout as L

    strip = box(0, 0, 5000, 300)
    spec = L.LayoutSpec(design=L.SIMPLE_RANDOM, shape=L.SQUARE, size=100.0, inside=True)
    frame = L.prepare_strata([strip], n_units=5, spec=spec)
    text = " ".join(str(w) for w in frame.warnings)
    r = 50.0 * 2 ** 0.5
    share = 1 - (5000 - 2 * r) * (300 - 2 * r) / (5000 * 300)
    assert f"Keeping units inside leaves {share:.0%} of the frame" in text
    wide = L.prepare_strata([box(0, 0, 5000, 5000)], n_units=5, spec=spec)
    assert not any("Keeping units inside" in str(w) for w in wide.warnings)


# a reprojection sliver: a triangle 0.1 µm wide, far thinner than a double resolves at 500 km (invented)
SLIVER = Polygon([(504000, 9000000), (504000.0000001, 9000000), (504000, 9000666.667)])


@pytest.mark.parametrize("design", [L.SIMPLE_RANDOM, L.SYSTEMATIC_GRID, L.SPATIALLY_BALANCED])
def test_slivers_are_skipped_with_a_warning(design):
    spec = L.LayoutSpec(design=design)
    frame = L.prepare_strata([box(500000, 9000000, 501000, 9001000), SLIVER], feature_ids=[7, 8], n_units=10,
                             spec=spec)
    assert len(frame.strata) == 1 and frame.skipped_ids == (8,)
    assert any("8" in w and "sliver" in w for w in frame.warnings)
    with pytest.raises(InputError, match="sliver"):  # nothing but a sliver: an error, not a traceback
        L.layout_units([SLIVER], spec, np.random.default_rng(1), n_units=10, crs=CRS)


def test_sliver_parts_are_dropped_from_a_stratum():
    real = box(500000, 9000000, 501000, 9001000)
    far_sliver = Polygon([(520000, 9000000), (520000.001, 9000000), (520000, 9000500)])  # 0.25 m², 19 km away
    frame = L.prepare_strata([MultiPolygon([real, far_sliver])], n_units=5, spec=L.LayoutSpec(design=L.SYSTEMATIC_GRID))
    assert frame.strata[0].area == pytest.approx(real.area)  # shapely's area of the real part
    assert frame.strata[0].region.bounds == real.bounds  # the grid spans the real part only


def test_overlapping_strata_are_an_error_and_a_trace_of_overlap_a_warning():
    a, b = box(0, 0, 1000, 1000), box(900, 0, 2000, 1000)  # 100 m x 1000 m shared
    with pytest.raises(InputError, match="overlap") as err:
        L.prepare_strata([a, b], strata=[1, 2], n_units=10)
    assert "1 and 2 (10 ha)" in str(err.value)  # shapely: a.intersection(b).area == 1e5 m²
    c = box(999.5, 0, 2000, 1000)  # a 0.5 m x 1000 m seam: 0.05 % of the smaller stratum
    frame = L.prepare_strata([a, c], strata=[1, 2], n_units=10)
    assert any("overlap slightly" in w and "1 and 2 (0.05 ha)" in w for w in frame.warnings)  # 500 m²
    frame = L.prepare_strata([a, box(1000, 0, 2000, 1000)], strata=[1, 2], n_units=10)  # touching only
    assert not any("overlap" in w for w in frame.warnings)


def test_systematic_grid_on_a_hair_thin_stratum_is_an_error_not_a_memory_failure():
    thin = box(0, 0, 50_000, 0.02)  # 1,000 m² spread over 50 km
    frame = L.prepare_strata([thin], n_units=10, spec=L.LayoutSpec(design=L.SYSTEMATIC_GRID))
    with pytest.raises(InputError, match="candidate points"):
        L.draw_layout(frame, L.LayoutSpec(design=L.SYSTEMATIC_GRID), np.random.default_rng(1))



def test_thinned_outline_for_the_report_map_stays_within_a_pixel():
    # a smooth 50,000-vertex outline of 12 km (invented); the report map draws it 900 pixels wide
    t = np.linspace(0, 2 * np.pi, 50_000, endpoint=False)
    r = 6000 * (1 + 0.25 * np.sin(3 * t) + 0.03 * np.sin(41 * t))
    hole = Polygon(np.c_[200 * np.cos(t[::5000]), 200 * np.sin(t[::5000])])
    poly = Polygon(np.c_[r * np.cos(t), r * np.sin(t)], [hole.exterior.coords])
    thin = L.geo.thinned_outline(poly)
    pixel = 15_000 / 900
    assert len(thin.exterior.coords) <= 2001 and len(thin.interiors) == 1
    assert len(thin.interiors[0].coords) == len(poly.interiors[0].coords)  # a short ring is kept whole
    # every original vertex lies within half a pixel of the thinned outline (shapely's buffer and GEOS's
    # point-in-polygon as the oracle), and the areas agree to a pixel-wide band along the boundary
    band = thin.exterior.buffer(0.5 * pixel)
    vertices = np.asarray(poly.exterior.coords)
    assert L.geo.contains_xy(band, vertices[:, 0], vertices[:, 1]).all()
    assert poly.symmetric_difference(thin).area < 0.5 * pixel * poly.exterior.length
    assert L.geo.thinned_outline(box(0, 0, 1, 1)).equals(box(0, 0, 1, 1))


def test_validity_known_to_the_caller_is_not_checked_again_and_changes_nothing():
    bow = Polygon([(0, 0), (200, 200), (200, 0), (0, 200)])
    geoms = [bow, box(300, 0, 500, 200), box(600, 0, 700, 100)]
    flags = [g.is_valid for g in geoms]  # shapely's (GEOS) validity check as the caller's
    assert flags == [False, True, True]
    checked = L.prepare_strata(geoms, strata=[1, 2, 3], n_units=9)
    trusted = L.prepare_strata(geoms, strata=[1, 2, 3], n_units=9, valid=flags)
    assert checked.warnings == trusted.warnings and checked.repaired_ids == trusted.repaired_ids == (0,)
    assert [s.geometry.equals(t.geometry) for s, t in zip(checked.strata, trusted.strata)] == [True] * 3
