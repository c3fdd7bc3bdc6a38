"""Raster cells outside an accepted value range, as polygons (GDAL; no host import).

A sampling frame may leave out terrain that a team cannot work in, given as a
raster (slope in degrees, distance from a track in metres, ...). Each cell whose
value lies outside ``[mask_min, mask_max]``, or is NoData, becomes part of the
mask. The cells are read over the study area's extent only, on a grid in the
computation CRS:

* same CRS, north-up raster: the raster's own grid, read as is (no resampling);
* other CRS (or a rotated grid): the raster is warped on the fly with GDAL
  (nearest neighbour, so that values are never blended across the threshold).

Cells of the extent that the raster does not cover count as NoData, hence masked.
The out-of-range cells are turned into polygons with ``gdal.Polygonize``
(4-connected regions), so the mask area equals the number of masked cells times
the cell area exactly.
"""
import math
from dataclasses import dataclass

import numpy as np
import pyproj
from osgeo import gdal, ogr, osr
from shapely import wkb

from ..engine.errors import QT_TRANSLATE_NOOP, Cancelled, InputError, message
from .grids import GdalProgress, read_window, same_crs

#: Upper limit on the number of cells read over the extent (about 0.6 GB at peak).
MAX_CELLS = 50_000_000


@dataclass(frozen=True)
class RasterMask:
    """Out-of-range cells of a raster over an extent.

    Attributes
    ----------
    polygons : tuple of shapely Polygon
        One polygon per 4-connected region of masked cells, in the computation CRS.
    cell_area_m2 : float
        Area of one cell of the grid that was tested.
    masked_cells, below_cells, above_cells, nodata_cells, total_cells : int
        Cells masked in total; below ``mask_min``; above ``mask_max``; NoData
        (including cells outside the raster's coverage); cells in the extent.
    uncovered_cells : int
        Cells of the extent that the raster does not cover (part of ``nodata_cells``).
    warped : bool
        True when the raster was reprojected or resampled on the fly.
    shape : tuple of int
        Rows and columns of the tested grid.
    geotransform : tuple
        GDAL geotransform of the tested grid.
    """

    polygons: tuple
    cell_area_m2: float
    masked_cells: int
    below_cells: int
    above_cells: int
    nodata_cells: int
    total_cells: int
    uncovered_cells: int
    warped: bool
    shape: tuple
    geotransform: tuple

    @property
    def masked_area_m2(self):
        return self.masked_cells * self.cell_area_m2


def out_of_range_cells(values, mask_min=None, mask_max=None):
    """Boolean arrays of the cells to mask.

    A cell is masked when ``value < mask_min`` or ``value > mask_max`` (the bounds
    themselves are accepted; ``None`` leaves a side open) or when it is NaN
    (NoData has been turned into NaN by the reader).

    Returns
    -------
    masked, below, above, nodata : ndarray of bool
    """
    values = np.asarray(values, dtype=float)
    nodata = np.isnan(values)
    with np.errstate(invalid="ignore"):
        below = (values < mask_min) if mask_min is not None else np.zeros(values.shape, bool)
        above = (values > mask_max) if mask_max is not None else np.zeros(values.shape, bool)
    below &= ~nodata
    above &= ~nodata
    return below | above | nodata, below, above, nodata


def _open(source):
    if isinstance(source, gdal.Dataset):
        return source
    try:
        ds = gdal.Open(str(source), gdal.GA_ReadOnly)
    except RuntimeError:  # GDAL with exceptions enabled
        ds = None
    if ds is None:
        raise InputError(message(QT_TRANSLATE_NOOP("PlotwiseEngine",
            "The mask raster (MASK) '{source}' cannot be opened by GDAL."), source=str(source)))
    return ds


def _snapped_grid(extent, origin_x, origin_y, res_x, res_y):
    """Grid aligned on (origin, res) that covers ``extent``; res_y < 0 (north up)."""
    xmin, ymin, xmax, ymax = extent
    c0 = math.floor((xmin - origin_x) / res_x + 1e-9)
    c1 = math.ceil((xmax - origin_x) / res_x - 1e-9)
    r0 = math.floor((ymax - origin_y) / res_y + 1e-9)
    r1 = math.ceil((ymin - origin_y) / res_y - 1e-9)
    cols, rows = max(c1 - c0, 1), max(r1 - r0, 1)
    return c0, r0, cols, rows


def _read_aligned(ds, band_no, extent):
    """Values over ``extent`` on the raster's own grid; NoData and uncovered -> NaN."""
    gt = ds.GetGeoTransform()
    c0, r0, cols, rows = _snapped_grid(extent, gt[0], gt[3], gt[1], gt[5])
    _check_size(rows, cols)
    values, covered = read_window(ds.GetRasterBand(band_no), c0, r0, cols, rows)
    out_gt = (gt[0] + c0 * gt[1], gt[1], 0.0, gt[3] + r0 * gt[5], 0.0, gt[5])
    return values, covered, out_gt


def _check_size(rows, cols):
    if rows * cols > MAX_CELLS:
        raise InputError(message(QT_TRANSLATE_NOOP("PlotwiseEngine",
            "The mask raster (MASK) would need {rows} x {cols} cells over the study area; "
            "that is more than {max_cells:,}. Resample the raster to coarser cells first."),
            rows=rows, cols=cols, max_cells=MAX_CELLS,
        ))


def _target_resolution(ds, target_wkt):
    """Cell size GDAL suggests for ``ds`` in the target CRS (square cells)."""
    vrt = gdal.AutoCreateWarpedVRT(ds, None, target_wkt, gdal.GRA_NearestNeighbour)
    if vrt is None:
        raise InputError(message(QT_TRANSLATE_NOOP("PlotwiseEngine",
            "The mask raster (MASK) cannot be reprojected to the computation CRS.")))
    gt = vrt.GetGeoTransform()
    return float(min(abs(gt[1]), abs(gt[5])))


def _read_warped(ds, band_no, extent, target_wkt, resolution=None):
    """Values over ``extent`` warped to the target CRS; NoData and uncovered -> NaN."""
    single = gdal.Translate("", ds, format="VRT", bandList=[band_no])
    res = float(resolution) if resolution else _target_resolution(single, target_wkt)
    c0, r0, cols, rows = _snapped_grid(extent, 0.0, 0.0, res, -res)
    _check_size(rows, cols)
    x0, y1 = c0 * res, -r0 * res
    bounds = (x0, y1 - rows * res, x0 + cols * res, y1)
    options = gdal.WarpOptions(
        format="MEM",
        dstSRS=target_wkt,
        outputBounds=bounds,
        width=cols,
        height=rows,
        resampleAlg=gdal.GRA_NearestNeighbour,
        outputType=gdal.GDT_Float64,
        dstNodata=float("nan"),
        dstAlpha=True,
        errorThreshold=0.0,
        multithread=False,
    )
    out = gdal.Warp("", single, options=options)
    if out is None:
        raise InputError(message(QT_TRANSLATE_NOOP("PlotwiseEngine",
            "The mask raster (MASK) cannot be reprojected to the computation CRS.")))
    values = out.GetRasterBand(1).ReadAsArray().astype(float)
    covered = out.GetRasterBand(2).ReadAsArray() > 0
    values[~covered] = np.nan
    return values, covered, out.GetGeoTransform()


def _polygonize(masked, geotransform, target_wkt, progress=None):
    rows, cols = masked.shape
    mem = gdal.GetDriverByName("MEM").Create("", cols, rows, 1, gdal.GDT_Byte)
    mem.SetGeoTransform(geotransform)
    if target_wkt:
        mem.SetProjection(target_wkt)
    band = mem.GetRasterBand(1)
    band.WriteArray(masked.astype(np.uint8))
    vec = ogr.GetDriverByName("Memory").CreateDataSource("mask")
    srs = osr.SpatialReference()
    if target_wkt:
        srs.ImportFromWkt(target_wkt)
    layer = vec.CreateLayer("mask", srs=srs, geom_type=ogr.wkbPolygon)
    layer.CreateField(ogr.FieldDefn("v", ogr.OFTInteger))

    callback = GdalProgress(progress, "Masking the raster was cancelled.")
    try:
        err = gdal.Polygonize(band, band, layer, 0, [], callback=callback)
    except RuntimeError:  # GDAL with exceptions on: a stop asked by the callback raises too
        callback.check()
        raise
    callback.check()
    if err != 0:
        raise InputError(message(QT_TRANSLATE_NOOP("PlotwiseEngine",
            "GDAL could not turn the masked raster cells into polygons.")))
    polygons = []
    layer.ResetReading()
    for feat in layer:
        polygons.append(wkb.loads(bytes(feat.GetGeometryRef().ExportToWkb())))
    return tuple(polygons)


def mask_polygons(
    source, extent, crs, mask_min=None, mask_max=None, band=1, resolution=None, source_crs=None,
    progress=None,
):
    """Polygons of the raster cells outside ``[mask_min, mask_max]`` or NoData.

    Parameters
    ----------
    source : str or gdal.Dataset
        The mask raster (MASK).
    extent : tuple of float
        ``(xmin, ymin, xmax, ymax)`` of the study area in the computation CRS.
    crs : str or pyproj.CRS
        The computation CRS (projected, metres).
    mask_min, mask_max : float or None
        Accepted range, bounds included; None leaves that side open.
    band : int
        Band number (1-based).
    resolution : float, optional
        Cell size in metres when the raster must be warped (default: the size
        GDAL suggests for the reprojected raster).
    source_crs : str or pyproj.CRS, optional
        CRS of the raster when it differs from the one in its file (the host may
        have it set by the user); default: the file's own CRS.
    progress : callable, optional
        ``progress(fraction) -> bool``; True cancels (raises ``Cancelled``).

    Returns
    -------
    RasterMask
    """
    if mask_min is not None and mask_max is not None and mask_min > mask_max:
        raise InputError(message(QT_TRANSLATE_NOOP("PlotwiseEngine",
            "MASK_MIN ({mask_min:g}) is greater than MASK_MAX ({mask_max:g}); no cell could be "
            "kept. Swap the two values or leave one of them empty."), mask_min=mask_min, mask_max=mask_max,
        ))
    ds = _open(source)
    if band < 1 or band > ds.RasterCount:
        raise InputError(message(QT_TRANSLATE_NOOP("PlotwiseEngine",
            "The mask raster (MASK) has no band {band}; it has {count}."), band=band,
                                 count=ds.RasterCount))
    target = pyproj.CRS.from_user_input(crs)
    target_wkt = target.to_wkt()
    if source_crs is not None:
        source_wkt = pyproj.CRS.from_user_input(source_crs).to_wkt()
        if not same_crs(ds.GetProjection(), source_wkt):
            ds = gdal.Translate("", ds, format="VRT", outputSRS=source_wkt)
    gt = ds.GetGeoTransform()
    north_up = gt[2] == 0 and gt[4] == 0 and gt[5] < 0
    if same_crs(ds.GetProjection(), target_wkt) and north_up and not resolution:
        values, covered, out_gt = _read_aligned(ds, band, extent)
        warped = False
    else:
        values, covered, out_gt = _read_warped(ds, band, extent, target_wkt, resolution)
        warped = True
    if progress is not None and progress(0.3):
        raise Cancelled("Masking the raster was cancelled.")
    masked, below, above, nodata = out_of_range_cells(values, mask_min, mask_max)

    def sub_progress(fraction):
        return progress(0.3 + 0.7 * fraction) if progress is not None else False

    polygons = _polygonize(masked, out_gt, target_wkt, sub_progress) if masked.any() else ()
    return RasterMask(
        polygons=polygons,
        cell_area_m2=abs(out_gt[1] * out_gt[5]),
        masked_cells=int(masked.sum()),
        below_cells=int(below.sum()),
        above_cells=int(above.sum()),
        nodata_cells=int(nodata.sum()),
        total_cells=int(masked.size),
        uncovered_cells=int((~covered).sum()),
        warped=warped,
        shape=masked.shape,
        geotransform=tuple(out_gt),
    )
