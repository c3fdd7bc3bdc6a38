"""A density surface read over a window, warped to the target CRS when needed (GDAL; no host import)."""
import math

import numpy as np
from osgeo import gdal

from ..engine.errors import QT_TRANSLATE_NOOP, InputError, message
from .grids import read_window, same_crs


def read_surface_window(path, name, surface_wkt, target_wkt, target_label, bounds):
    """A density surface's first band over ``bounds`` in the target CRS.

    A surface already in the target CRS and north-up is read as it is (a window with one cell
    of margin); otherwise it is warped with GDAL (bilinear: densities are smooth quantities).

    Returns
    -------
    (values, geotransform, warped)
        ``values`` as float64 with NaN for NoData.
    """
    try:
        dataset = gdal.Open(path)
    except RuntimeError as error:
        raise InputError(message(QT_TRANSLATE_NOOP("PlotwiseEngine",
            "The density surface '{name}' cannot be read by GDAL ({error}). Save it as a "
                                 "GeoTIFF first."), name=name, error=error)) from None
    minx, miny, maxx, maxy = bounds
    gt = dataset.GetGeoTransform()
    if same_crs(surface_wkt, target_wkt) and gt[2] == 0 and gt[4] == 0 and gt[5] < 0:
        band = dataset.GetRasterBand(1)
        c0 = max(0, int(math.floor((minx - gt[0]) / gt[1])) - 1)
        c1 = min(dataset.RasterXSize, int(math.ceil((maxx - gt[0]) / gt[1])) + 1)
        r0 = max(0, int(math.floor((gt[3] - maxy) / -gt[5])) - 1)
        r1 = min(dataset.RasterYSize, int(math.ceil((gt[3] - miny) / -gt[5])) + 1)
        if c1 <= c0 or r1 <= r0:
            raise InputError(message(QT_TRANSLATE_NOOP("PlotwiseEngine",
                "The density surface '{name}' does not overlap the sampling frame. Check that "
                                     "both cover the same area."), name=name))
        values, _ = read_window(band, c0, r0, c1 - c0, r1 - r0)
        return values, (gt[0] + c0 * gt[1], gt[1], 0.0, gt[3] + r0 * gt[5], 0.0, gt[5]), False
    try:
        warped = gdal.Warp("", dataset, format="MEM", dstSRS=target_wkt, outputBounds=(minx, miny, maxx, maxy),
                           resampleAlg="bilinear", outputType=gdal.GDT_Float64, dstNodata=float("nan"))
    except RuntimeError as error:
        raise InputError(message(QT_TRANSLATE_NOOP("PlotwiseEngine",
            "The density surface '{name}' could not be warped to {crs} ({error})."),
                                 name=name, crs=target_label, error=error)) from None
    values = warped.GetRasterBand(1).ReadAsArray().astype(np.float64)
    return values, tuple(warped.GetGeoTransform()), True
