"""The stratum raster: a Byte GeoTIFF of stratum ids written block by block, and renumbered in place."""
import numpy as np
from osgeo import gdal

from ..engine.errors import QT_TRANSLATE_NOOP, Cancelled, InputError, message


class StratumRaster:
    """Byte GeoTIFF of stratum ids on the stack grid (0 = NoData), written block by block.

    ``row_runs`` counts the runs (stretches of one id along a row) of the blocks
    written: an upper bound on the runs along the raster's full rows.
    """

    def __init__(self, path, grid):
        self.path = path
        self.row_runs = 0
        opts = ["TILED=YES", "BIGTIFF=IF_SAFER"] + _fast_compression()
        self.ds = gdal.GetDriverByName("GTiff").Create(path, grid.width, grid.height, 1, gdal.GDT_Byte, opts)
        if self.ds is None:
            raise InputError(message(QT_TRANSLATE_NOOP("PlotwiseEngine",
                "Cannot write the stratum raster '{path}'."), path=path))
        self.ds.SetGeoTransform(grid.geotransform)
        self.ds.SetProjection(grid.crs_wkt)
        self.band = self.ds.GetRasterBand(1)
        self.band.SetNoDataValue(0)

    #: blocks written between two flushes of GDAL's cache (it would otherwise hold the whole raster)
    FLUSH_BLOCKS = 64

    def write(self, window, ids):
        ids = ids.astype(np.uint8, copy=False)
        self.row_runs += ids.shape[0] + int(np.count_nonzero(ids[:, 1:] != ids[:, :-1]))
        self.band.WriteArray(ids, int(window[0]), int(window[1]))
        self._written = getattr(self, "_written", 0) + 1
        if self._written % self.FLUSH_BLOCKS == 0:
            self.band.FlushCache()

    def flush(self):
        """Hand the blocks written so far to the file (GDAL's cache would otherwise keep them)."""
        self.band.FlushCache()

    def close(self):
        if self.ds is not None:
            self.band.FlushCache()
            self.band = None
            self.ds = None


def _fast_compression():
    """ZSTD level 1 where GDAL has it (fastest and smallest for stratum ids), DEFLATE otherwise."""
    options = gdal.GetDriverByName("GTiff").GetMetadataItem("DMD_CREATIONOPTIONLIST") or ""
    if "ZSTD" in options:
        return ["COMPRESS=ZSTD", "ZSTD_LEVEL=1"]
    return ["COMPRESS=DEFLATE", "ZLEVEL=1"]



def remap_strata(path, lut, block_rows=2048, progress=None):
    """Replace every stratum id ``i`` by ``lut[i]`` in place, block by block."""
    lut = np.asarray(lut).astype(np.uint8)
    ds = gdal.Open(path, gdal.GA_Update)
    band = ds.GetRasterBand(1)
    H, W = band.YSize, band.XSize
    n = -(-H // block_rows)
    for i, y0 in enumerate(range(0, H, block_rows)):
        ys = min(block_rows, H - y0)
        band.WriteArray(lut[band.ReadAsArray(0, y0, W, ys)], 0, y0)
        band.FlushCache()
        if progress is not None and progress((i + 1) / n):
            raise Cancelled("Stratification cancelled.")
    band.FlushCache()
    band = ds = None
