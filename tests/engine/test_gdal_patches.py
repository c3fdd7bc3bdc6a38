"""Patches of the stratum raster (processing/gdal_io/patches.py) against scipy.ndimage.label, and the limits on them.

Oracle: ``scipy.ndimage.label`` (4-connected, its default structure) of each stratum's cells counts the
patches; speckled covariates are white noise (numpy's generator), whose strata form patches of a few cells.
"""
import numpy as np
import pytest
from osgeo import gdal
from pyproj import CRS
from scipy import ndimage
from shapely.geometry import box

from plotwise.processing.engine import stratification as s
from plotwise.processing.engine.errors import InputError
from plotwise.processing.gdal_io import patches
from plotwise.processing.gdal_io.covariate_stack import Covariate
from plotwise.processing.gdal_io.stratify_pipeline import stratify_rasters

UTM33 = CRS.from_epsg(32633).to_wkt()
GT = (497000.0, 10.0, 0.0, 5001000.0, 0.0, -10.0)  # 10 m cells: 1 ha = 100 cells


def _write(path, a, dtype=gdal.GDT_Float32, tile=None):
    opts = ["TILED=YES", f"BLOCKXSIZE={tile}", f"BLOCKYSIZE={tile}"] if tile else []
    ds = gdal.GetDriverByName("GTiff").Create(str(path), a.shape[1], a.shape[0], 1, dtype, opts)
    ds.SetGeoTransform(GT)
    ds.SetProjection(UTM33)
    ds.GetRasterBand(1).WriteArray(a)
    ds = None
    return str(path)


def _scipy_patches(ids):
    return sum(ndimage.label(ids == h)[1] for h in np.unique(ids) if h > 0)


def _read(path):
    ds = gdal.Open(path)
    return ds.GetRasterBand(1).ReadAsArray()


def _whole(shape):
    return box(GT[0], GT[3] - shape[0] * 10, GT[0] + shape[1] * 10, GT[3]).wkb


def test_patch_count_equals_scipy_label_across_strips(tmp_path, monkeypatch):
    # strips of a few rows, so that patches cross many strip seams; blocky and speckled rasters with id 0 holes
    monkeypatch.setattr(patches, "STRIP_CELLS", 500)
    rng = np.random.default_rng(4)
    for trial in range(12):
        shape = (int(rng.integers(1, 80)), int(rng.integers(1, 60)))
        ids = rng.integers(0, int(rng.integers(2, 6)), shape).astype(np.uint8)
        if trial % 2:
            ids = np.kron(ids, np.ones((3, 2), np.uint8))[:shape[0], :shape[1]]
        path = _write(tmp_path / f"ids{trial}.tif", ids, gdal.GDT_Byte, tile=16)
        assert patches.count_patches(path) == _scipy_patches(ids)


def test_a_u_shaped_patch_joined_below_a_seam_counts_once(tmp_path, monkeypatch):
    # truth by construction: the two arms of a U meet in the last row only, three strips further down
    monkeypatch.setattr(patches, "STRIP_CELLS", 1)  # one tile row (16 rows) per strip
    ids = np.full((64, 20), 2, np.uint8)
    ids[:63, 3] = ids[:63, 15] = 1
    ids[63, 3:16] = 1
    path = _write(tmp_path / "u.tif", ids, gdal.GDT_Byte, tile=16)
    assert patches.count_patches(path) == 1 + 3 == _scipy_patches(ids)  # the U; stratum 2 left, inside, right


def test_nice_area_above():
    # 1, 2, 5 x 10^k at or above the value
    assert [patches.nice_area_above(v) for v in (0.31, 0.5, 0.51, 3, 7.5, 40, 120)] == [0.5, 0.5, 1, 5, 10, 50, 200]


def test_speckled_covariate_without_min_area_is_an_error_naming_a_min_area_that_works(tmp_path, monkeypatch):
    # white noise in 4 quantile strata: patches of a few cells. With the limit at 400 patches the error gives the
    # count (scipy) and a MIN_AREA; running again with that MIN_AREA gives at most 400 patches (scipy)
    monkeypatch.setattr(patches, "MAX_POLYGON_PATCHES", 400)
    noise = np.random.default_rng(9).random((120, 150)).astype(np.float32)
    path = _write(tmp_path / "noise.tif", noise)
    out = str(tmp_path / "st.tif")
    with pytest.raises(InputError) as err:
        stratify_rasters([Covariate(path, "noise")], [_whole(noise.shape)], UTM33, s.QUANTILE, 4, out)
    n = _scipy_patches(_read(out))
    assert f"form {n:,} patches" in err.value.message and "MIN_AREA" in err.value.message
    # 180 ha stratified / 400 patches = 0.45 ha -> 0.5 ha suggested
    assert "Set MIN_AREA to 0.5 ha or more" in err.value.message
    r = stratify_rasters([Covariate(path, "noise")], [_whole(noise.shape)], UTM33, s.QUANTILE, 4, out, min_area_ha=0.5)
    ids = _read(out)
    assert r.patches == _scipy_patches(ids) <= 400
    for h in range(1, r.result.n_strata + 1):
        lab, _ = ndimage.label(ids == h)
        assert np.bincount(lab.ravel())[1:].min() >= 50  # 0.5 ha of 10 m cells


def test_too_speckled_to_merge_is_an_error_before_gdal_runs(tmp_path, monkeypatch):
    monkeypatch.setattr(patches, "MAX_SIEVE_PATCHES", 1000)
    monkeypatch.setattr(patches, "gdal_sieve", lambda *a, **k: pytest.fail("the sieve must not run"))
    noise = np.random.default_rng(2).random((100, 100)).astype(np.float32)
    path = _write(tmp_path / "noise.tif", noise)
    out = str(tmp_path / "st.tif")
    with pytest.raises(InputError, match="Smooth or coarsen it first") as err:
        stratify_rasters([Covariate(path, "noise")], [_whole(noise.shape)], UTM33, s.QUANTILE, 5, out, min_area_ha=1.0)
    # the quintile strata by numpy: stratum h holds b_{h-1} <= x < b_h, the boundaries numpy.quantile's
    ids = np.digitize(noise, np.quantile(noise, [0.2, 0.4, 0.6, 0.8])) + 1
    assert f"form {_scipy_patches(ids):,} patches" in err.value.message
    assert "cells of about 100 m" in err.value.message  # sqrt(1 ha)


def test_too_many_patches_for_the_graph_merge_fall_back_on_gdal_sieve_with_a_warning(tmp_path, monkeypatch):
    # after the specks, more patches than the graph merge may take: GDAL's sieve doubles its threshold up to
    # MIN_AREA (100 cells); every patch then reaches it (scipy), and a warning says so
    monkeypatch.setattr(patches, "MAX_GRAPH_PATCHES", 200)
    noise = np.random.default_rng(5).random((150, 160)).astype(np.float32)
    path = _write(tmp_path / "noise.tif", noise)
    out = str(tmp_path / "st.tif")
    r = stratify_rasters([Covariate(path, "noise")], [_whole(noise.shape)], UTM33, s.QUANTILE, 4, out, min_area_ha=1.0)
    assert any("GDAL's sieve" in w for w in r.warnings)
    ids = _read(out)
    for h in range(1, r.result.n_strata + 1):
        lab, _ = ndimage.label(ids == h)
        assert np.bincount(lab.ravel())[1:].min() >= 100
    assert r.patches == _scipy_patches(ids)
    np.testing.assert_allclose(r.area_ha, np.bincount(ids.ravel(), minlength=r.result.n_strata + 1)[1:] * 0.01)
