"""Strata as polygons: GDAL's polygonize on the stratum raster (no host import)."""
from osgeo import gdal, ogr

from .grids import GdalProgress


def polygonise_strata(path, n_strata, progress=None):
    """One multipolygon (WKB) per stratum id 1..n_strata from the stratum raster (GDAL polygonize, 4-connected)."""
    ds = gdal.Open(path)
    band = ds.GetRasterBand(1)
    mem = ogr.GetDriverByName("Memory").CreateDataSource("strata")
    srs = ds.GetSpatialRef()
    layer = mem.CreateLayer("strata", srs, ogr.wkbPolygon)
    layer.CreateField(ogr.FieldDefn("stratum", ogr.OFTInteger))
    cb = GdalProgress(progress)
    try:
        gdal.Polygonize(band, band, layer, 0, [], callback=cb)
    except RuntimeError:
        cb.check()
        raise
    cb.check()
    parts = [ogr.Geometry(ogr.wkbMultiPolygon) for _ in range(n_strata)]
    layer.ResetReading()
    for feat in layer:
        h = feat.GetField(0)
        if 1 <= h <= n_strata:
            parts[h - 1].AddGeometry(feat.GetGeometryRef())
    out = [bytes(p.ExportToWkb()) for p in parts]
    layer = mem = band = ds = None
    return out
