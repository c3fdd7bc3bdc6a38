"""Tests of the sampling frame (processing/engine/frame.py).

Outside references:
* areas of axis-aligned rectangles, known analytically (width x height), so the
  area lost to each rule is known by construction;
* pyproj.Geod(ellps="WGS84").geometry_area_perimeter, the geodesic area of the
  frame transformed to WGS 84 (Karney 2013, J. Geodesy 87:43-55, as implemented
  by PROJ's geodesic library).
"""
import numpy as np
import pyproj
import pytest
from shapely.geometry import MultiPolygon, Point, Polygon, box
from shapely.ops import transform

from plotwise.processing.engine import crs as pw_crs
from plotwise.processing.engine import frame as fr
from plotwise.processing.engine import geometry_types
from plotwise.processing.engine.errors import Cancelled, InputError

STUDY = box(0, 0, 10_000, 6_000)  # 6.0e7 m²
EXCL_A = box(1_000, 1_000, 3_000, 2_000)  # 2.0e6 m²
EXCL_B = box(2_000, 1_000, 4_000, 2_000)  # overlaps A by 1.0e6 m²: union 3.0e6 m²
EXCL_C = box(9_000, 0, 11_000, 1_000)  # 1.0e6 m² of it inside the study area
MASK_M = box(3_500, 1_500, 6_000, 2_500)  # 2.5e6 m², 0.25e6 m² already excluded by B
EDGE = 100.0


def test_rectangles_losses_known_analytically():
    # by construction (rectangle areas):
    lost_exclude = 3.0e6 + 1.0e6
    lost_mask = 2.5e6 - 500 * 500
    strip = 6.0e7 - (10_000 - 2 * EDGE) * (6_000 - 2 * EDGE)  # 3.16e6
    c_in_strip = 1.0e6 - 900 * 900  # part of C inside the strip, already excluded
    lost_edge = strip - c_in_strip
    expected_frame = 6.0e7 - lost_exclude - lost_mask - lost_edge

    result = fr.build_frame([STUDY], [EXCL_A, EXCL_B, EXCL_C], [MASK_M], edge_buffer=EDGE)

    assert result.study_area_m2 == pytest.approx(6.0e7, rel=1e-12)
    assert [loss.rule for loss in result.losses] == ["exclude", "mask", "edge_buffer"]
    assert result.loss("exclude") == pytest.approx(lost_exclude, rel=1e-9)
    assert result.loss("mask") == pytest.approx(lost_mask, rel=1e-9)
    assert result.loss("edge_buffer") == pytest.approx(lost_edge, rel=1e-9)
    assert result.area_m2 == pytest.approx(expected_frame, rel=1e-9)
    assert result.area_ha == pytest.approx(expected_frame / 1e4, rel=1e-9)
    # eq. (1): the losses and the frame add up to the study area
    total = result.area_m2 + sum(loss.area_m2 for loss in result.losses)
    assert total == pytest.approx(result.study_area_m2, rel=1e-12)
    assert result.geometry.is_valid
    assert result.geometry.area == pytest.approx(result.area_m2)


def test_rules_are_optional_and_losses_only_for_applied_rules():
    only_mask = fr.build_frame(STUDY, mask=[MASK_M])
    assert [loss.rule for loss in only_mask.losses] == ["mask"]
    assert only_mask.area_m2 == pytest.approx(6.0e7 - 2.5e6)  # rectangle areas
    nothing = fr.build_frame(STUDY)
    assert nothing.losses == ()
    assert nothing.area_m2 == pytest.approx(6.0e7)
    assert nothing.loss("mask") == 0.0


def test_study_features_are_dissolved():
    # two overlapping squares: union = 2 * 100² - 50 * 100 (inclusion-exclusion)
    a, b = box(0, 0, 100, 100), box(50, 0, 150, 100)
    result = fr.build_frame([a, b])
    assert result.study_area_m2 == pytest.approx(2 * 100**2 - 50 * 100)
    assert isinstance(result.geometry, Polygon)


def test_edge_buffer_also_widens_the_study_areas_own_holes():
    # a 1000 m square with a 200 m square hole in the middle; inward buffer 10 m
    # removes a 10 m rim inside the outer ring and around the hole.  With round
    # joins the hole grows to a rounded square: (200 + 20)² - (4 - pi) * 10²
    outer = [(0, 0), (1000, 0), (1000, 1000), (0, 1000)]
    hole = [(400, 400), (600, 400), (600, 600), (400, 600)]
    study = Polygon(outer, [hole])
    result = fr.build_frame(study, edge_buffer=10.0)
    hole_grown = 220**2 - (4 - np.pi) * 10**2  # Minkowski sum of a square and a disc
    expected = 980**2 - hole_grown
    assert result.area_m2 == pytest.approx(expected, rel=1e-3)  # polygonised arcs


def test_frame_area_matches_geodesic_area():
    # study area given in WGS 84 (a lake-shaped hole and an inholding removed),
    # projected to the UTM zone of its centroid as the host algorithm does.
    lon0, lat0 = 24.62, -18.31
    ring = [(lon0, lat0), (lon0 + 0.11, lat0 + 0.01), (lon0 + 0.13, lat0 + 0.09),
            (lon0 + 0.04, lat0 + 0.12), (lon0 - 0.02, lat0 + 0.06)]
    study_ll = Polygon(ring)
    lake_ll = Point(lon0 + 0.05, lat0 + 0.05).buffer(0.015)
    inholding_ll = box(lon0 + 0.09, lat0 + 0.02, lon0 + 0.11, lat0 + 0.04)
    epsg = pw_crs.utm_epsg_for_lonlat(*study_ll.centroid.coords[0])
    assert epsg == 32735  # UTM zone 35 south spans 24°E to 30°E (standard UTM zoning)
    fwd = pyproj.Transformer.from_crs(4326, epsg, always_xy=True).transform
    back = pyproj.Transformer.from_crs(epsg, 4326, always_xy=True).transform
    result = fr.build_frame(
        transform(fwd, study_ll), [transform(fwd, lake_ll), transform(fwd, inholding_ll)],
        edge_buffer=150.0,
    )
    geod = pyproj.Geod(ellps="WGS84")
    area_geod, _ = geod.geometry_area_perimeter(transform(back, result.geometry))
    assert abs(area_geod) == pytest.approx(result.area_m2, rel=0.005)  # issue 3: within 0.5%


def test_each_emptying_rule_is_named():
    with pytest.raises(InputError, match="EXCLUDE"):
        fr.build_frame(STUDY, [box(-1, -1, 10_001, 6_001)])
    with pytest.raises(InputError, match="MASK"):
        fr.build_frame(STUDY, [EXCL_A], [box(-1, -1, 10_001, 6_001)])
    with pytest.raises(InputError, match="EDGE_BUFFER"):
        fr.build_frame(STUDY, edge_buffer=3_000)
    with pytest.raises(InputError, match="EDGE_BUFFER"):
        fr.build_frame(STUDY, edge_buffer=-5)
    with pytest.raises(InputError, match="INPUT"):
        fr.build_frame([Polygon()])


def test_cancel_is_honoured():
    with pytest.raises(Cancelled):
        fr.build_frame(STUDY, [EXCL_A], progress=lambda f: f > 0.2)
    calls = []
    fr.build_frame(STUDY, [EXCL_A], progress=lambda f: calls.append(f) and False)
    assert calls[0] == 0.0 and calls[-1] == 1.0


BOWTIE = Polygon([(0, 0), (2, 2), (2, 0), (0, 2)])  # self-crossing ring


@pytest.mark.parametrize("use_make_valid", [True, False])
def test_clean_polygons_repairs_and_skips(monkeypatch, use_make_valid):
    if not use_make_valid:  # the buffer(0) fallback for shapely without MakeValid
        monkeypatch.setattr(geometry_types, "_make_valid", None)
    elif geometry_types._make_valid is None:
        pytest.skip("this shapely has no make_valid")
    flat = Polygon([(0, 0), (1, 0), (2, 0)])  # zero area
    geoms = [box(0, 0, 1, 1), None, Polygon(), flat, BOWTIE]
    cleaned = fr.clean_polygons(geoms, ids=[10, 11, 12, 13, 14])
    assert cleaned.ids == (10, 14)
    assert cleaned.skipped_ids == (11, 12, 13)
    assert cleaned.repaired_ids == (14,)
    repaired = cleaned.geometries[1]
    assert repaired.is_valid and repaired.area > 0
    # the bow-tie is two triangles of 1 m² each (by construction);
    # MakeValid keeps both, buffer(0) keeps one or both
    if use_make_valid:
        assert repaired.area == pytest.approx(2.0)
    else:
        assert repaired.area == pytest.approx(1.0) or repaired.area == pytest.approx(2.0)
    result = fr.build_frame(cleaned.geometries)
    assert result.geometry.is_valid


def test_polygonal_part_drops_lines_and_points():
    from shapely.geometry import GeometryCollection, LineString

    mixed = GeometryCollection([box(0, 0, 1, 1), LineString([(0, 0), (5, 5)]), Point(3, 3),
                                MultiPolygon([box(2, 2, 3, 3), box(4, 4, 5, 5)])])
    part = fr.polygonal_part(mixed)
    assert isinstance(part, MultiPolygon)
    assert part.area == pytest.approx(3.0)  # three unit squares
    assert fr.polygonal_part(LineString([(0, 0), (1, 1)])).is_empty


def test_frame_result_is_frozen():
    result = fr.build_frame(STUDY)
    with pytest.raises(Exception):
        result.area_m2 = 0.0


def test_exclusion_slivers_left_by_a_reprojection_leave_nothing():
    # the study square and the same square sent to WGS 84 and back (pyproj): their difference is
    # slivers of floating-point noise, not frame
    square = box(500000, 9000000, 504000, 9004000)
    to_geo = pyproj.Transformer.from_crs("EPSG:32736", "EPSG:4326", always_xy=True)
    back = pyproj.Transformer.from_crs("EPSG:4326", "EPSG:32736", always_xy=True)
    round_trip = transform(back.transform, transform(to_geo.transform, square))
    slightly_off = transform(lambda x, y: (x + 1e-7 * (y - 9000000) / 4000, y), square)  # a 0.1 µm skew
    for exclusion in (round_trip, slightly_off):
        with pytest.raises(InputError, match="Nothing is left"):
            fr.build_frame(square, exclusions=[exclusion])
