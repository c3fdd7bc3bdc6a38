"""GDAL side of the stratification (processing/gdal_io) against outside references: numpy, shapely, pyproj, scipy."""
import numpy as np
import pytest
from osgeo import gdal
from pyproj import CRS, Geod, Transformer
from scipy import ndimage
from shapely import wkb
from shapely.geometry import Polygon, box
from shapely.geometry.polygon import orient
from shapely.ops import transform

from plotwise.processing.gdal_io import patches
from plotwise.processing.gdal_io.covariate_stack import Covariate, block_windows
from plotwise.processing.gdal_io.stratify_pipeline import stratify_rasters
from plotwise.processing.engine import stratification as s
from plotwise.processing.engine.errors import Cancelled, InputError

UTM33 = CRS.from_epsg(32633).to_wkt()
GT = (497000.0, 30.0, 0.0, 5001000.0, 0.0, -30.0)  # near the zone's central meridian (15° E)
H, W = 220, 260


def _write(path, a, gt=GT, wkt=UTM33, nodata=None, dtype=gdal.GDT_Float32):
    ds = gdal.GetDriverByName("GTiff").Create(str(path), a.shape[1], a.shape[0], 1, dtype)
    ds.SetGeoTransform(gt)
    ds.SetProjection(wkt)
    band = ds.GetRasterBand(1)
    if nodata is not None:
        band.SetNoDataValue(nodata)
    band.WriteArray(a)
    ds = None
    return str(path)


def _centres(gt=GT, shape=(H, W)):
    rows, cols = np.mgrid[0:shape[0], 0:shape[1]]
    return gt[0] + (cols + 0.5) * gt[1], gt[3] + (rows + 0.5) * gt[5]


def _contains(poly, x, y):
    """Cell centres inside a polygon; shapely 2 and 1.8."""
    try:
        from shapely import contains_xy
        return contains_xy(poly, x, y)
    except ImportError:
        from shapely import vectorized
        return vectorized.contains(poly, x, y)


def _elevation(nodata_box=True):
    x, y = _centres()
    rng = np.random.default_rng(3)
    a = (900 + 0.08 * (x - GT[0]) + 60 * np.sin((y - GT[3]) / 700) + rng.normal(0, 5, x.shape)).astype(np.float32)
    if nodata_box:
        a[100:112, 90:130] = -9999
    return a


FRAME = Polygon([(498012, 4999013), (503987, 4998521), (504411, 4995103), (500023, 4994608), (498311, 4996517)])


def _read(path):
    ds = gdal.Open(path)
    return ds.GetRasterBand(1).ReadAsArray()


def test_quantile_boundaries_areas_and_geodesic_area(tmp_path):
    elev = _elevation()
    path = _write(tmp_path / "elev.tif", elev, nodata=-9999)
    out = str(tmp_path / "strata.tif")
    r = stratify_rasters([Covariate(path, "elevation")], [FRAME.wkb], UTM33, s.QUANTILE, 5, out)
    x, y = _centres()
    inside = _contains(FRAME, x, y)
    ok = inside & (elev != -9999)
    cells = elev[ok].astype(float)
    q = np.quantile(cells, [0.2, 0.4, 0.6, 0.8])  # numpy.quantile on the same cells
    np.testing.assert_allclose(r.result.boundaries, q, rtol=0, atol=1e-9)
    cell_ha = 30.0 * 30.0 / 1e4
    # areas: cell count x cell area, the counts equal numpy.digitize on the shapely-selected cells
    counts = np.bincount(np.digitize(cells, q), minlength=5)
    np.testing.assert_allclose(r.area_ha, counts * cell_ha)
    assert np.all(np.abs(counts - cells.size / 5) <= np.array([1, 2, 2, 2, 1]))  # definition of quantiles
    assert r.nodata_ha == pytest.approx(np.count_nonzero(inside & (elev == -9999)) * cell_ha)
    assert r.frame_ha == pytest.approx(FRAME.area / 1e4)  # shapely area
    assert any("%" in w and "NoData" in w for w in r.warnings)
    # the raster written holds the same strata as numpy.digitize
    ref = np.zeros((H, W), np.uint8)
    ref[ok] = np.digitize(cells, q) + 1
    np.testing.assert_array_equal(_read(out), _window(ref, r.grid))
    # geodesic area of the polygons (pyproj.Geod on WGS 84) within 0.5 % of cells x cell area
    to_wgs = Transformer.from_crs(CRS.from_epsg(32633), CRS.from_epsg(4326), always_xy=True)
    geod = Geod(ellps="WGS84")
    for h, blob in enumerate(r.polygons):
        g = transform(to_wgs.transform, wkb.loads(blob))
        # pyproj's area is signed by ring orientation: shells counter-clockwise, holes clockwise
        area = sum(geod.geometry_area_perimeter(orient(part, 1.0))[0] for part in getattr(g, "geoms", [g]))
        assert area == pytest.approx(r.area_ha[h] * 1e4, rel=0.005)


def _window(full, grid):
    """Cut an array on GT to the stack's window grid."""
    c0 = int(round((grid.geotransform[0] - GT[0]) / GT[1]))
    r0 = int(round((grid.geotransform[3] - GT[3]) / GT[5]))
    return full[r0:r0 + grid.height, c0:c0 + grid.width]


def test_warped_covariates_land_on_the_first_grid(tmp_path):
    elev = _elevation(nodata_box=False)
    p1 = _write(tmp_path / "elev.tif", elev)
    # greenness defined in lon/lat, stored in WGS 84: g = 10 * (lon - 15) + 5 * (lat - 45)
    to_ll = Transformer.from_crs(CRS.from_epsg(32633), CRS.from_epsg(4326), always_xy=True)
    lon0, lat1 = to_ll.transform(GT[0] - 2000, GT[3] + 2000)
    lon1, lat0 = to_ll.transform(GT[0] + W * 30 + 2000, GT[3] - H * 30 - 2000)
    n_lon, n_lat = 400, 300
    dlon, dlat = (lon1 - lon0) / n_lon, (lat1 - lat0) / n_lat
    lon_c = lon0 + (np.arange(n_lon) + 0.5) * dlon
    lat_c = lat1 - (np.arange(n_lat) + 0.5) * dlat
    green = 10 * (lon_c[None, :] - 15) + 5 * (lat_c[:, None] - 45)
    p2 = _write(tmp_path / "green.tif", green, gt=(lon0, dlon, 0, lat1, 0, -dlat), wkt=CRS.from_epsg(4326).to_wkt(),
                dtype=gdal.GDT_Float64)
    r = stratify_rasters([Covariate(p1, "elevation"), Covariate(p2, "greenness")], [FRAME.wkb], UTM33,
                             s.EQUAL_INTERVAL, 3, str(tmp_path / "st.tif"))
    assert r.warped == ["greenness"]
    # truth: the same linear function at each cell centre converted with pyproj; bilinear warping keeps it
    x, y = _centres()
    lon, lat = to_ll.transform(x, y)
    truth = 10 * (lon - 15) + 5 * (lat - 45)
    ids = _read(str(tmp_path / "st.tif"))
    t = _window(truth, r.grid)
    for h in range(3):
        np.testing.assert_allclose(r.result.statistics.mean[h, 1], t[ids == h + 1].mean(), atol=2e-4)


def test_first_covariate_in_another_crs_is_warped(tmp_path):
    elev = _elevation(nodata_box=False)
    p1 = _write(tmp_path / "elev.tif", elev)
    p_ll = str(tmp_path / "elev_ll.tif")
    gdal.Warp(p_ll, p1, dstSRS="EPSG:4326")
    r = stratify_rasters([Covariate(p_ll, "elevation")], [FRAME.wkb], UTM33, s.QUANTILE, 3,
                             str(tmp_path / "st.tif"))
    assert r.warped == ["elevation"]
    assert r.grid.crs_wkt == UTM33
    assert abs(r.area_ha.sum() - FRAME.area / 1e4) / (FRAME.area / 1e4) < 0.01  # shapely area of the frame


def test_partial_coverage_warns_with_the_share_covered(tmp_path):
    path = _write(tmp_path / "elev.tif", _elevation(nodata_box=False))
    frame = Polygon([(503000, 4998000), (506000, 4998000), (506000, 4996000), (503000, 4996000)])
    r = stratify_rasters([Covariate(path, "elevation")], [frame.wkb], UTM33, s.QUANTILE, 2,
                             str(tmp_path / "st.tif"))
    raster = box(GT[0], GT[3] - H * 30, GT[0] + W * 30, GT[3])
    share = frame.intersection(raster).area / frame.area  # shapely
    assert r.coverage == pytest.approx(share, rel=1e-6)
    assert any(("%.1f%%" % (100 * share)) in w for w in r.warnings)


def test_no_overlap_is_an_error(tmp_path):
    path = _write(tmp_path / "elev.tif", _elevation())
    far = Polygon([(600000, 4000000), (601000, 4000000), (601000, 4001000)])
    with pytest.raises(InputError, match="does not overlap"):
        stratify_rasters([Covariate(path, "elevation")], [far.wkb], UTM33, s.QUANTILE, 3,
                             str(tmp_path / "st.tif"))


def test_sieve_leaves_no_patch_below_min_area(tmp_path):
    rng = np.random.default_rng(5)
    noisy = ndimage.gaussian_filter(rng.normal(size=(H, W)), 1.5).astype(np.float32)
    path = _write(tmp_path / "n.tif", noisy)
    whole = box(GT[0], GT[3] - H * 30, GT[0] + W * 30, GT[3])
    out = str(tmp_path / "st.tif")
    r = stratify_rasters([Covariate(path, "noise")], [whole.wkb], UTM33, s.QUANTILE, 4, out, min_area_ha=2.0)
    assert r.sieve_cells == 23  # ceil(2 ha / 0.09 ha)
    ids = _read(out)
    for h in range(1, r.result.n_strata + 1):
        lab, n = ndimage.label(ids == h)  # scipy, 4-connected
        sizes = np.bincount(lab.ravel())[1:]
        assert sizes.min() >= 23
    # statistics are those of the sieved strata (numpy on the raster)
    for h in range(r.result.n_strata):
        np.testing.assert_allclose(r.result.statistics.mean[h, 0], noisy[ids == h + 1].astype(float).mean(),
                                   rtol=1e-9)
    np.testing.assert_allclose(r.area_ha, np.bincount(ids.ravel(), minlength=5)[1:] * 0.09)


def test_statistics_after_the_merge_equal_numpy_on_the_written_raster(tmp_path, monkeypatch):
    # oracle: numpy on the stratum raster written. Two covariates (elevation and a smoothed noise on the same
    # grid); the merge moves cells between strata and the statistics follow the moved cells alone: no
    # recount over the raster and no separate patch count (the runs written are few)
    elev = _elevation()
    other = ndimage.gaussian_filter(np.random.default_rng(8).normal(size=(H, W)), 3.0).astype(np.float32)
    p1, p2 = _write(tmp_path / "e.tif", elev, nodata=-9999), _write(tmp_path / "o.tif", other)
    covariates = [Covariate(p1, "e"), Covariate(p2, "o")]
    unmerged = str(tmp_path / "unmerged.tif")
    stratify_rasters(covariates, [FRAME.wkb], UTM33, s.QUANTILE, 4, unmerged)
    rules = []
    accumulate = s.accumulate_statistics

    def spy(source, n_strata, rule=None, *args, **kwargs):
        rules.append(rule)
        return accumulate(source, n_strata, rule, *args, **kwargs)

    monkeypatch.setattr(s, "accumulate_statistics", spy)
    monkeypatch.setattr(patches, "count_patches_and_runs", lambda *a, **k: pytest.fail("no separate patch count"))
    out = str(tmp_path / "st.tif")
    r = stratify_rasters(covariates, [FRAME.wkb], UTM33, s.QUANTILE, 4, out, min_area_ha=2.0, block_cells=4000)
    assert None not in rules  # the only pass summing statistics is the assignment's
    ids = _read(out)
    assert np.count_nonzero(ids != _read(unmerged)) > 100  # the merge moved cells
    gt = gdal.Open(out).GetGeoTransform()  # the raster covers the frame's window of the grid
    c0, r0 = round((gt[0] - GT[0]) / GT[1]), round((gt[3] - GT[3]) / GT[5])
    window = (slice(r0, r0 + ids.shape[0]), slice(c0, c0 + ids.shape[1]))
    elev, other = elev[window], other[window]
    x, y = (v[window] for v in _centres())
    ok = _contains(FRAME, x, y) & (elev != -9999)
    np.testing.assert_array_equal(ids > 0, ok)
    np.testing.assert_allclose(r.area_ha, np.bincount(ids[ok], minlength=5)[1:] * 0.09)
    st = r.result.statistics
    for c, values in enumerate((elev, other)):
        groups = [values[ids == h].astype(float) for h in range(1, r.result.n_strata + 1)]
        np.testing.assert_allclose(st.mean[:, c], [g.mean() for g in groups], rtol=1e-9)
        np.testing.assert_allclose(st.sd[:, c], [g.std() for g in groups], rtol=1e-7)
    np.testing.assert_array_equal(st.chart_counts.sum(axis=1), st.count)
    assert st.chart_counts.min() >= 0
    for h in range(1, r.result.n_strata + 1):  # every patch reaches MIN_AREA (23 cells), scipy 4-connected
        lab, _ = ndimage.label(ids == h)
        assert np.bincount(lab.ravel())[1:].min() >= 23


def test_small_blocks_give_the_same_strata(tmp_path):
    path = _write(tmp_path / "elev.tif", _elevation(), nodata=-9999)
    a = stratify_rasters([Covariate(path, "e")], [FRAME.wkb], UTM33, s.KMEANS, 3, str(tmp_path / "a.tif"),
                             rng=np.random.default_rng(4))
    b = stratify_rasters([Covariate(path, "e")], [FRAME.wkb], UTM33, s.KMEANS, 3, str(tmp_path / "b.tif"),
                             rng=np.random.default_rng(4), block_cells=1000)
    np.testing.assert_array_equal(_read(str(tmp_path / "a.tif")), _read(str(tmp_path / "b.tif")))
    np.testing.assert_allclose(a.area_ha, b.area_ha)


def test_cancel(tmp_path):
    path = _write(tmp_path / "elev.tif", _elevation())
    with pytest.raises(Cancelled):
        stratify_rasters([Covariate(path, "e")], [FRAME.wkb], UTM33, s.QUANTILE, 3, str(tmp_path / "c.tif"),
                             progress=lambda f: f > 0.3, block_cells=5000)


@pytest.mark.parametrize("stage", [0.77, 0.95])  # during the sieve, during polygonising
def test_cancel_inside_gdal_steps(tmp_path, stage):
    path = _write(tmp_path / "elev.tif", _elevation())
    with pytest.raises(Cancelled):
        stratify_rasters([Covariate(path, "e")], [FRAME.wkb], UTM33, s.QUANTILE, 3, str(tmp_path / "c.tif"),
                             min_area_ha=1.0, progress=lambda f: f > stage)


@pytest.mark.parametrize("block, offset", [((256, 256), (100, 30)), ((150, 1), (0, 0)), ((64, 64), (0, 0))])
def test_block_windows_cover_the_grid_once(block, offset):
    cover = np.zeros((700, 1000), int)
    for x, y, w, h in block_windows(1000, 700, block, offset, 1 << 16):
        cover[y:y + h, x:x + w] += 1
        if block[1] > 1:  # tiled: windows start on the source's tile edges
            assert (x + offset[0]) % block[0] == 0 or x == 0
    assert cover.min() == 1 and cover.max() == 1


def test_tiled_covariate_gives_the_same_strata(tmp_path):
    elev = _elevation()
    p_strip = _write(tmp_path / "strip.tif", elev, nodata=-9999)
    p_tiled = str(tmp_path / "tiled.tif")
    gdal.Translate(p_tiled, p_strip, creationOptions=["TILED=YES", "BLOCKXSIZE=32", "BLOCKYSIZE=32"])
    a = stratify_rasters([Covariate(p_strip, "e")], [FRAME.wkb], UTM33, s.QUANTILE, 4, str(tmp_path / "a.tif"))
    b = stratify_rasters([Covariate(p_tiled, "e")], [FRAME.wkb], UTM33, s.QUANTILE, 4, str(tmp_path / "b.tif"),
                             block_cells=3000)
    np.testing.assert_array_equal(_read(str(tmp_path / "a.tif")), _read(str(tmp_path / "b.tif")))
    np.testing.assert_array_equal(a.result.boundaries, b.result.boundaries)


def test_aligned_covariate_covering_part_of_the_grid(tmp_path):
    elev = _elevation(nodata_box=False)
    p1 = _write(tmp_path / "elev.tif", elev)
    # same grid, but only the northern 100 rows: read directly (no warp), the rest counts as NoData
    green = np.linspace(0, 1, 100 * W, dtype=np.float32).reshape(100, W)
    p2 = _write(tmp_path / "green.tif", green)
    r = stratify_rasters([Covariate(p1, "elevation"), Covariate(p2, "greenness")], [FRAME.wkb], UTM33,
                             s.KMEANS, 3, str(tmp_path / "st.tif"), rng=np.random.default_rng(3))
    assert r.warped == []
    x, y = _centres()
    inside = _contains(FRAME, x, y)  # shapely
    rows = np.arange(H)[:, None] * np.ones((1, W), int)
    valid = inside & (rows < 100)
    assert r.result.cells_valid == int(valid.sum())
    assert r.nodata_ha == pytest.approx(int((inside & (rows >= 100)).sum()) * 0.09)
    ids = _read(str(tmp_path / "st.tif"))
    np.testing.assert_array_equal(ids > 0, _window(valid, r.grid))
    assert any("%" in w for w in r.warnings)


def test_worker_threads_give_the_same_rasters(tmp_path, monkeypatch):
    elev = _elevation()
    p_tiled = str(tmp_path / "tiled.tif")
    gdal.Translate(p_tiled, _write(tmp_path / "e.tif", elev, nodata=-9999),
                   creationOptions=["TILED=YES", "BLOCKXSIZE=32", "BLOCKYSIZE=32"])
    outs = []
    for workers in (0, 2):
        monkeypatch.setattr(s, "WORKERS", workers)
        for method in (s.QUANTILE, s.KMEANS):
            path = str(tmp_path / f"w{workers}_{method}.tif")
            r = stratify_rasters([Covariate(p_tiled, "e")], [FRAME.wkb], UTM33, method, 4, path,
                                     rng=np.random.default_rng(8), block_cells=2048)
            outs.append((_read(path), r.result.statistics.mean))
    for (a, ma), (b, mb) in zip(outs[:2], outs[2:]):
        np.testing.assert_array_equal(a, b)
        np.testing.assert_array_equal(ma, mb)


def _mosaic(tmp_path, size=4):
    """A covariate of size x size-cell squares taking 3 values in diagonal bands (30 m cells: 16 cells = 1.44 ha)."""
    rows, cols = np.mgrid[0:H, 0:W]
    jitter = np.random.default_rng(2).random((H, W)) * 0.1  # distinct values: the tercile cuts fall between bands
    values = ((((cols // size) + (rows // size)) % 3) + jitter).astype(np.float32)
    return _write(tmp_path / "mosaic.tif", values)


def _parts(polygons):
    return [p for blob in polygons for p in getattr(wkb.loads(blob), "geoms", [wkb.loads(blob)])]


def test_min_area_on_a_mosaic_where_every_patch_is_small(tmp_path):
    # truth by construction: the tercile strata follow the covariate's squares, so every patch is 1.44 ha
    # (16 cells; less where the frame cuts one), below MIN_AREA 2 ha (23 cells), and so is every neighbour:
    # "join the largest neighbour" has nothing to join. Oracles: shapely areas of the polygons and
    # scipy.ndimage.label (4-connected) of the stratum raster
    path = _mosaic(tmp_path)
    frame = box(GT[0] + 300, GT[3] - 6000, GT[0] + 6000, GT[3] - 300)
    out = str(tmp_path / "st.tif")
    r = stratify_rasters([Covariate(path, "mosaic")], [frame.wkb], UTM33, s.QUANTILE, 3, out,
                             min_area_ha=2.0)
    assert r.sieve_cells == 23 and r.patches_merged > 0 and r.small_patches == 0
    areas = [p.area for p in _parts(r.polygons)]  # shapely
    assert min(areas) >= 2.0e4
    assert sum(areas) == pytest.approx(frame.area)
    ids = _read(out)
    for h in range(1, r.result.n_strata + 1):
        lab, _ = ndimage.label(ids == h)
        assert np.bincount(lab.ravel())[1:].min() >= 23
    assert r.result.n_strata >= 2
    assert any("fell from" in w and "MIN_AREA" in w for w in r.warnings)  # R² of the mosaic's strata drops
    again = str(tmp_path / "again.tif")
    stratify_rasters([Covariate(path, "mosaic")], [frame.wkb], UTM33, s.QUANTILE, 3, again,
                         min_area_ha=2.0, block_cells=5000)
    np.testing.assert_array_equal(_read(again), ids)  # deterministic, whatever the blocks


def test_small_island_of_the_frame_stays_below_min_area_with_a_warning(tmp_path):
    # truth by construction: a 0.81 ha island (3 x 3 cells, cell-aligned) far from the main frame touches no
    # other stratum, so it stays below MIN_AREA 2 ha; its area from shapely
    path = _write(tmp_path / "elev.tif", _elevation(nodata_box=False))
    main = box(GT[0] + 300, GT[3] - 3000, GT[0] + 3000, GT[3] - 300)
    island = box(GT[0] + 6000, GT[3] - 5400, GT[0] + 6090, GT[3] - 5310)
    r = stratify_rasters([Covariate(path, "e")], [main.wkb, island.wkb], UTM33, s.QUANTILE, 3,
                             str(tmp_path / "st.tif"), min_area_ha=2.0)
    assert r.small_patches == 1 and r.small_patches_ha == pytest.approx(island.area / 1e4)
    text = next(w for w in r.warnings if "stay below MIN_AREA" in w)
    assert text.startswith("1 patch(es) covering 0.81 ha") and "lower MIN_AREA" in text
    assert min(p.area for p in _parts(r.polygons)) == pytest.approx(island.area)  # shapely


def test_min_area_leaving_one_stratum_is_an_error(tmp_path):
    # truth by construction: MIN_AREA above the frame's area leaves no room for two strata
    path = _mosaic(tmp_path)
    frame = box(GT[0] + 300, GT[3] - 1500, GT[0] + 1500, GT[3] - 300)  # 144 ha
    with pytest.raises(InputError, match="single stratum"):
        stratify_rasters([Covariate(path, "mosaic")], [frame.wkb], UTM33, s.QUANTILE, 3,
                             str(tmp_path / "st.tif"), min_area_ha=200.0)


def test_min_area_with_nodata_and_small_blocks_matches_scipy_patches(tmp_path):
    # oracle: scipy.ndimage.label (4-connected) of the stratum raster written. Every patch reaches MIN_AREA
    # (2 ha, 23 cells) but those touching no other stratum, which the result counts; the same raster comes
    # out whatever the block size (the patches are numbered by their first cell, not by block)
    rng = np.random.default_rng(11)
    noisy = ndimage.gaussian_filter(rng.normal(size=(H, W)), 2.0).astype(np.float32)
    noisy[100:112, 90:130] = -9999
    path = _write(tmp_path / "n.tif", noisy, nodata=-9999)
    out = str(tmp_path / "a.tif")
    r = stratify_rasters([Covariate(path, "noise")], [FRAME.wkb], UTM33, s.QUANTILE, 4, out,
                             min_area_ha=2.0)
    ids = _read(out)
    small, small_cells = 0, 0
    for h in range(1, r.result.n_strata + 1):
        lab, n = ndimage.label(ids == h)
        sizes = np.bincount(lab.ravel())[1:]
        for j in np.flatnonzero(sizes < 23):
            ring = ndimage.binary_dilation(lab == j + 1) & ~(lab == j + 1)  # 4-neighbours of the patch
            assert not np.any((ids[ring] > 0) & (ids[ring] != h))  # it touches no other stratum
            small, small_cells = small + 1, small_cells + sizes[j]
    assert (r.small_patches, r.small_patches_ha) == (small, pytest.approx(small_cells * 0.09))
    b = stratify_rasters([Covariate(path, "noise")], [FRAME.wkb], UTM33, s.QUANTILE, 4,
                             str(tmp_path / "b.tif"), min_area_ha=2.0, block_cells=3000)
    np.testing.assert_array_equal(_read(str(tmp_path / "b.tif")), ids)
    assert b.patches_merged == r.patches_merged
