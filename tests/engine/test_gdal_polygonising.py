"""The strata traced as polygons (processing/gdal_io/polygonising.py) against GDAL's own polygonize.

References: ``gdal.Polygonize`` (4-connected, GDAL's default) on the same raster, its polygons unioned per
stratum with shapely; ``scipy.ndimage.label`` (4-connected) for the number of patches; cell counts (numpy)
times the cell area for the areas; shapely's validity test (OGC rules).
"""
import numpy as np
import pytest
from osgeo import gdal, ogr
from scipy import ndimage
from shapely import wkb
from shapely.ops import unary_union

from plotwise.processing.engine.errors import Cancelled
from plotwise.processing.gdal_io import polygonising

GT = (497000.0, 30.0, 0.0, 5001000.0, 0.0, -30.0)


def _write(path, ids):
    ds = gdal.GetDriverByName("GTiff").Create(str(path), ids.shape[1], ids.shape[0], 1, gdal.GDT_Byte)
    ds.SetGeoTransform(GT)
    ds.GetRasterBand(1).WriteArray(ids)
    ds = None
    return str(path)


def _gdal_polygons(path, k):
    ds = gdal.Open(path)
    band = ds.GetRasterBand(1)
    mem = ogr.GetDriverByName("Memory").CreateDataSource("m")
    layer = mem.CreateLayer("s", None, ogr.wkbPolygon)
    layer.CreateField(ogr.FieldDefn("st", ogr.OFTInteger))
    gdal.Polygonize(band, band, layer, 0, [])
    parts = {h: [] for h in range(1, k + 1)}
    for feat in layer:
        parts[feat.GetField(0)].append(wkb.loads(bytes(feat.GetGeometryRef().ExportToWkb())))
    return parts


def _rasters(seed, n):
    rng = np.random.default_rng(seed)
    for trial in range(n):
        shape = (int(rng.integers(1, 45)), int(rng.integers(1, 45)))
        ids = rng.integers(0, 4, shape).astype(np.uint8)  # speckle: many corner-only contacts
        if trial % 3 == 1:
            ids = np.kron(ids, np.ones((2, 3), np.uint8))[:shape[0], :shape[1]]
        if trial % 3 == 2:
            ids = ndimage.zoom(rng.integers(0, 4, (6, 6)), 8, order=1)[:shape[0], :shape[1]].astype(np.uint8)
        yield ids


def test_strata_polygons_equal_gdal_polygonize(tmp_path, monkeypatch):
    monkeypatch.setattr(polygonising, "STRIP_CELLS", 150)  # many strips: rings cross the strip seams
    for i, ids in enumerate(_rasters(3, 45)):
        path = _write(tmp_path / f"s{i}.tif", ids)
        ours = polygonising.polygonise_strata(path, 3)
        ref = _gdal_polygons(path, 3)
        for h in range(1, 4):
            g = wkb.loads(ours[h - 1])
            assert g.is_valid, (i, h)
            parts = 0 if g.is_empty else len(g.geoms)
            assert parts == ndimage.label(ids == h)[1]  # one polygon per 4-connected patch
            assert g.area == pytest.approx(np.count_nonzero(ids == h) * 900.0, abs=1e-6)
            if ref[h]:
                assert g.symmetric_difference(unary_union(ref[h])).area < 1e-6


def test_a_patch_touching_itself_at_a_corner_has_a_hole_touching_its_outer_ring(tmp_path):
    # truth by construction: a ring of stratum 1 closed by a corner-only contact at its north-east, around a
    # single cell of stratum 2; OGC: one polygon whose hole touches the outer ring at one point
    path = _write(tmp_path / "pinch.tif", np.array([[1, 1, 0], [1, 2, 1], [1, 1, 1]], np.uint8))
    g = wkb.loads(polygonising.polygonise_strata(path, 2)[0])
    assert g.is_valid and len(g.geoms) == 1 and len(g.geoms[0].interiors) == 1
    assert g.area == pytest.approx(7 * 900.0)


def test_empty_stratum_and_cancel(tmp_path):
    path = _write(tmp_path / "e.tif", np.ones((5, 6), np.uint8))
    out = polygonising.polygonise_strata(path, 2)
    assert wkb.loads(out[1]).is_empty and wkb.loads(out[0]).area == pytest.approx(30 * 900.0)
    with pytest.raises(Cancelled):
        polygonising.polygonise_strata(path, 2, progress=lambda f: True)
