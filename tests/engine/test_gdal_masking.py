"""Tests of the raster mask (processing/gdal_io/masking.py), GDAL only, no host.

Outside references:
* numpy's count of the out-of-range cells times the cell area (the oracle for
  the area of the mask polygons);
* for a raster in another CRS: the nearest-neighbour rule evaluated with pyproj
  (each target cell takes the value of the source cell containing its centre),
  and the geodesic area of the out-of-range block from
  pyproj.Geod(ellps="WGS84") (Karney 2013).
"""
import math

import numpy as np
import pyproj
import pytest
from osgeo import gdal, osr
from shapely.geometry import box
from shapely.ops import unary_union

from plotwise.processing.gdal_io import masking as rm
from plotwise.processing.engine.errors import InputError

gdal.UseExceptions()

UTM = "EPSG:32633"
X0, Y0, RES = 500_000.0, 5_000_000.0, 30.0  # raster origin (upper left) and cell size
ROWS, COLS = 80, 100


def _write(path, bands, gt, epsg, nodata=None, dtype=gdal.GDT_Float32):
    """GeoTIFF from an array of shape (bands, rows, cols)."""
    ds = gdal.GetDriverByName("GTiff").Create(str(path), bands.shape[2], bands.shape[1],
                                              bands.shape[0], dtype)
    ds.SetGeoTransform(gt)
    srs = osr.SpatialReference()
    srs.ImportFromEPSG(epsg)
    ds.SetProjection(srs.ExportToWkt())
    for i in range(bands.shape[0]):
        band = ds.GetRasterBand(i + 1)
        if nodata is not None:
            band.SetNoDataValue(nodata)
        band.WriteArray(bands[i])
    ds.FlushCache()
    ds = None
    return str(path)


def _slope_like(rng):
    values = rng.uniform(0, 50, size=(ROWS, COLS)).astype(np.float32)
    values[5:9, 10:20] = -9999.0  # NoData block
    return values


@pytest.fixture
def utm_raster(tmp_path):
    rng = np.random.default_rng(20261201)
    values = _slope_like(rng)
    path = _write(tmp_path / "slope.tif", values[None], (X0, RES, 0, Y0, 0, -RES), 32633,
                  nodata=-9999.0)
    return path, values


def _covering_window(extent):
    """Cells of the raster grid that intersect ``extent`` (indices; may run off the raster)."""
    xmin, ymin, xmax, ymax = extent
    c0, c1 = math.floor((xmin - X0) / RES), math.ceil((xmax - X0) / RES)
    r0, r1 = math.floor((Y0 - ymax) / RES), math.ceil((Y0 - ymin) / RES)
    return r0, r1, c0, c1


def _area(polygons):
    return sum(p.area for p in polygons)


@pytest.mark.parametrize("lo, hi", [(5.0, 30.0), (None, 30.0), (12.5, None), (None, None)])
def test_mask_area_equals_numpy_cell_count(utm_raster, lo, hi):
    path, values = utm_raster
    extent = (X0 + 100.0, Y0 - 2_000.0, X0 + 2_500.0, Y0 - 95.0)  # not on the grid
    r0, r1, c0, c1 = _covering_window(extent)
    win = values[r0:r1, c0:c1].astype(float)
    nodata = win == -9999.0
    out = nodata.copy()
    if lo is not None:
        out |= ~nodata & (win < lo)
    if hi is not None:
        out |= ~nodata & (win > hi)
    expected_cells = int(np.count_nonzero(out))  # numpy count as the oracle

    result = rm.mask_polygons(path, extent, UTM, lo, hi)

    assert not result.warped
    assert result.shape == win.shape
    assert result.total_cells == win.size
    assert result.masked_cells == expected_cells
    assert result.nodata_cells == int(nodata.sum())
    assert result.cell_area_m2 == pytest.approx(RES * RES)
    assert _area(result.polygons) == pytest.approx(expected_cells * RES * RES, rel=1e-9)
    assert all(p.is_valid for p in result.polygons)
    # the polygons sit on the masked cells: masked cell centres inside, kept ones outside
    union = unary_union(result.polygons) if result.polygons else box(0, 0, 0, 0)
    rows, cols = np.nonzero(out)
    kept_rows, kept_cols = np.nonzero(~out)
    cx = X0 + (c0 + np.r_[cols, kept_cols] + 0.5) * RES
    cy = Y0 - (r0 + np.r_[rows, kept_rows] + 0.5) * RES
    inside = _contains(union, cx, cy)
    assert inside[: rows.size].all()
    assert not inside[rows.size:].any()


def _contains(geom, x, y):
    try:
        from shapely import contains_xy  # shapely 2

        return contains_xy(geom, x, y)
    except ImportError:
        from shapely.vectorized import contains  # shapely 1.8

        return contains(geom, x, y)


def test_bounds_are_inclusive():
    # documented rule: a value equal to a bound is kept
    values = np.array([[1.0, 2.0, 3.0, np.nan]])
    masked, below, above, nodata = rm.out_of_range_cells(values, 2.0, 3.0)
    assert masked.tolist() == [[True, False, False, True]]
    assert below.tolist() == [[True, False, False, False]]
    assert above.tolist() == [[False, False, False, False]]
    assert nodata.tolist() == [[False, False, False, True]]


def test_extent_beyond_the_raster_counts_as_nodata(utm_raster):
    path, values = utm_raster
    # 10 cells west of the raster and 5 cells north of it; 20 x 15 cells in all
    extent = (X0 - 10 * RES, Y0 - 10 * RES, X0 + 10 * RES, Y0 + 5 * RES)
    result = rm.mask_polygons(path, extent, UTM, None, None)
    assert result.shape == (15, 20)
    covered = 10 * 10  # cells of the raster inside the extent
    assert result.uncovered_cells == 15 * 20 - covered
    inside = values[0:10, 0:10]
    expected = result.uncovered_cells + int(np.count_nonzero(inside == -9999.0))
    assert result.masked_cells == expected
    assert _area(result.polygons) == pytest.approx(expected * RES * RES)


def test_band_choice(tmp_path):
    first = np.zeros((10, 10), np.float32)
    second = np.full((10, 10), 100.0, np.float32)
    second[:3, :] = 0.0
    path = _write(tmp_path / "two.tif", np.stack([first, second]), (X0, RES, 0, Y0, 0, -RES),
                  32633)
    extent = (X0, Y0 - 10 * RES, X0 + 10 * RES, Y0)
    assert rm.mask_polygons(path, extent, UTM, None, 50.0, band=1).masked_cells == 0
    assert rm.mask_polygons(path, extent, UTM, None, 50.0, band=2).masked_cells == 70
    with pytest.raises(InputError, match="band 3"):
        rm.mask_polygons(path, extent, UTM, None, 50.0, band=3)


def test_min_above_max_is_an_error(utm_raster):
    with pytest.raises(InputError, match="MASK_MIN"):
        rm.mask_polygons(utm_raster[0], (X0, Y0 - 300, X0 + 300, Y0), UTM, 40.0, 10.0)


def test_raster_in_another_crs_is_warped(tmp_path):
    # a WGS 84 raster of 0.001° cells around 15.3°E 45.1°N with a block of
    # steep values; computation CRS UTM 33N
    lon0, lat0, d = 15.25, 45.15, 0.001
    values = np.full((100, 120), 10.0, np.float32)
    values[30:70, 40:90] = 45.0  # 40 rows x 50 columns out of range
    path = _write(tmp_path / "ll.tif", values[None], (lon0, d, 0, lat0, 0, -d), 4326)
    to_utm = pyproj.Transformer.from_crs(4326, 32633, always_xy=True)
    xs, ys = to_utm.transform([lon0 + 0.01, lon0 + 0.11], [lat0 - 0.09, lat0 - 0.01])
    extent = (min(xs), min(ys), max(xs), max(ys))

    result = rm.mask_polygons(path, extent, UTM, None, 30.0)
    assert result.warped

    # oracle 1: nearest neighbour with pyproj, cell by cell on the target grid
    gt = result.geotransform
    rows, cols = result.shape
    jj, ii = np.meshgrid(np.arange(cols), np.arange(rows))
    cx, cy = gt[0] + (jj + 0.5) * gt[1], gt[3] + (ii + 0.5) * gt[5]
    lon, lat = pyproj.Transformer.from_crs(32633, 4326, always_xy=True).transform(cx, cy)
    sc = np.floor((lon - lon0) / d).astype(int)
    sr = np.floor((lat0 - lat) / d).astype(int)
    assert (sc >= 0).all() and (sr >= 0).all() and (sc < 120).all() and (sr < 100).all()
    expected = values[sr, sc] > 30.0
    mismatched = int(np.count_nonzero(expected != _masked_grid(result)))
    print("warped grid", result.shape, "masked", result.masked_cells, "mismatched", mismatched)
    assert mismatched <= max(2, expected.sum() // 500)  # centres on a cell edge may round
    assert _area(result.polygons) == pytest.approx(result.masked_cells * result.cell_area_m2)

    # oracle 2: geodesic area of the steep block (WGS 84 ellipsoid)
    geod = pyproj.Geod(ellps="WGS84")
    blk = box(lon0 + 40 * d, lat0 - 70 * d, lon0 + 90 * d, lat0 - 30 * d)
    area_geod = abs(geod.geometry_area_perimeter(blk)[0])
    # UTM scale (k0 = 0.9996 at the central meridian 15°E) changes areas by < 0.1 % here;
    # nearest-neighbour resampling moves the block's rim by under one cell on average
    assert _area(result.polygons) == pytest.approx(area_geod, rel=0.03)


def _masked_grid(result):
    """Rasterise the result polygons back on the grid by cell centres."""
    gt = result.geotransform
    rows, cols = result.shape
    jj, ii = np.meshgrid(np.arange(cols), np.arange(rows))
    cx, cy = gt[0] + (jj + 0.5) * gt[1], gt[3] + (ii + 0.5) * gt[5]
    union = unary_union(result.polygons)
    return _contains(union, cx.ravel(), cy.ravel()).reshape(rows, cols)


def test_cancel(utm_raster):
    from plotwise.processing.engine.errors import Cancelled

    with pytest.raises(Cancelled):
        rm.mask_polygons(utm_raster[0], (X0, Y0 - 900, X0 + 900, Y0), UTM, None, 30.0,
                         progress=lambda f: True)
    with pytest.raises(Cancelled):  # a stop asked while GDAL turns the cells into polygons
        rm.mask_polygons(utm_raster[0], (X0, Y0 - 900, X0 + 900, Y0), UTM, None, 30.0,
                         progress=lambda f: f > 0.3)


def test_crs_given_by_the_caller_overrides_a_missing_one(tmp_path):
    # a raster file without a CRS whose CRS the user has set in the host
    path = str(tmp_path / "nocrs.tif")
    ds = gdal.GetDriverByName("GTiff").Create(path, 10, 10, 1, gdal.GDT_Float32)
    ds.SetGeoTransform((X0, RES, 0, Y0, 0, -RES))
    values = np.zeros((10, 10), np.float32)
    values[:, :4] = 60.0  # 40 cells above 30
    ds.GetRasterBand(1).WriteArray(values)
    ds = None
    extent = (X0, Y0 - 10 * RES, X0 + 10 * RES, Y0)
    result = rm.mask_polygons(path, extent, UTM, None, 30.0, source_crs="EPSG:32633")
    assert not result.warped
    assert result.masked_cells == 40  # numpy: (values > 30).sum()
    assert _area(result.polygons) == pytest.approx(40 * RES * RES)


def test_unreadable_raster_is_an_input_error(tmp_path):
    bad = tmp_path / "bad.tif"
    bad.write_text("not a raster")
    with pytest.raises(InputError, match="MASK"):
        rm.mask_polygons(str(bad), (0, 0, 1, 1), UTM)


def test_too_many_cells_is_an_input_error(utm_raster, monkeypatch):
    monkeypatch.setattr(rm, "MAX_CELLS", 100)
    with pytest.raises(InputError, match="coarser"):
        rm.mask_polygons(utm_raster[0], (X0, Y0 - 900, X0 + 900, Y0), UTM, None, 30.0)
