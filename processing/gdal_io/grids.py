"""Grids, CRS comparison, window reads and GDAL progress callbacks shared by the GDAL modules (no host import)."""
from dataclasses import dataclass
import math

import numpy as np
from osgeo import gdal, ogr, osr

from ..engine.errors import Cancelled

gdal.UseExceptions()
ogr.UseExceptions()
osr.UseExceptions()


@dataclass(frozen=True)
class Grid:
    """A north-up grid: GDAL geotransform, size and CRS (WKT)."""

    geotransform: tuple
    width: int
    height: int
    crs_wkt: str

    @property
    def cell_area(self):
        """Area of one cell in CRS units squared (m² in a projected CRS)."""
        return abs(self.geotransform[1] * self.geotransform[5])

    @property
    def extent(self):
        """(xmin, ymin, xmax, ymax)."""
        x0, dx, _, y0, _, dy = self.geotransform
        xs = (x0, x0 + dx * self.width)
        ys = (y0, y0 + dy * self.height)
        return min(xs), min(ys), max(xs), max(ys)

    def window_grid(self, col0, row0, width, height):
        x0, dx, rx, y0, ry, dy = self.geotransform
        return Grid((x0 + col0 * dx, dx, rx, y0 + row0 * dy, ry, dy), width, height, self.crs_wkt)


def srs_from_wkt(wkt):
    s = osr.SpatialReference()
    s.ImportFromWkt(wkt)
    s.SetAxisMappingStrategy(osr.OAMS_TRADITIONAL_GIS_ORDER)
    return s


def same_crs(a_wkt, b_wkt):
    """True when two WKT CRS are the same (a raster without a CRS is taken to be in the other's)."""
    if not a_wkt or not b_wkt:
        return True
    return bool(srs_from_wkt(a_wkt).IsSame(srs_from_wkt(b_wkt)))



def read_window(band, col0, row0, cols, rows):
    """A window of a band as float64, NoData and cells beyond the raster as NaN.

    The window (``cols`` x ``rows`` cells from column ``col0``, row ``row0`` of the
    band's grid) may reach past the raster's edges. Returns ``(values, covered)``:
    ``covered`` is True for the cells the raster holds.
    """
    values = np.full((rows, cols), np.nan)
    covered = np.zeros((rows, cols), bool)
    a0, b0 = max(col0, 0), max(row0, 0)
    a1, b1 = min(col0 + cols, band.XSize), min(row0 + rows, band.YSize)
    if a1 > a0 and b1 > b0:
        part = band.ReadAsArray(a0, b0, a1 - a0, b1 - b0).astype(np.float64)
        nodata = band.GetNoDataValue()
        if nodata is not None and not math.isnan(nodata):
            part[part == nodata] = np.nan
        inside = (slice(b0 - row0, b1 - row0), slice(a0 - col0, a1 - col0))
        values[inside] = part
        covered[inside] = True
    return values, covered



class GdalProgress:
    """GDAL progress callback over our ``progress(fraction) -> cancelled``; remembers a cancel.

    GDAL stops when the callback returns 0 (and raises, with exceptions on): call
    :meth:`check` after the GDAL call, and in its ``except RuntimeError``, to raise
    :class:`Cancelled` with ``cancel_text`` instead.
    """

    def __init__(self, progress, cancel_text="Stratification cancelled."):
        self.progress = progress
        self.cancel_text = cancel_text
        self.cancelled = False

    def __call__(self, fraction, message, data):
        if self.progress is not None and self.progress(fraction):
            self.cancelled = True
            return 0
        return 1

    def check(self):
        if self.cancelled:
            raise Cancelled(self.cancel_text)
