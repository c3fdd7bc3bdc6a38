"""Covariates on one grid, cut to the frame, served block by block (GDAL; no host import).

:class:`CovariateStack` puts every covariate on one grid: the first covariate's
grid in the computation CRS (the first covariate is warped when it lies in
another CRS; the others are read directly when their grid lines up with it, and
warped or resampled with GDAL otherwise), cut to the frame's extent. The frame
is rasterised on that grid (a cell belongs to the frame when its centre lies
inside). Blocks are served one at a time, so memory stays bounded whatever the
raster's size.
"""
from dataclasses import dataclass
import math
import os
import shutil
import tempfile

import numpy as np
from osgeo import gdal, gdal_array, ogr

from ..engine import stratification as strat
from ..engine.errors import QT_TRANSLATE_NOOP, InputError, message
from .grids import Grid, read_window, same_crs, srs_from_wkt

#: cells per block: 256 Ki cells (one 512 x 512 tile; 2 MB per float64 covariate), small enough for the
#: temporaries to stay in the processor's cache
BLOCK_CELLS = 1 << 18
#: rasters up to this many cells keep the frame mask in memory
MEM_MASK_CELLS = 1 << 25
#: blocks read between two releases of GDAL's block cache (16 blocks: 4 Mi cells, 16 MB of float32 per band)
CACHE_RELEASE_BLOCKS = 16
#: what a pass found out about a block, kept for the next passes: no cell in the frame; every cell in the frame
#: and with a value in every covariate (its frame mask and validity need no reading or testing again)
_OUTSIDE, _VALID = 1, 2


@dataclass(frozen=True)
class Covariate:
    """A raster covariate: a GDAL-readable ``path`` and band, with a display ``name``."""

    path: str
    name: str
    band: int = 1



def _open(cov):
    try:
        ds = gdal.Open(cov.path)
    except RuntimeError as exc:
        raise InputError(message(QT_TRANSLATE_NOOP("PlotwiseEngine",
            "Covariate '{name}' cannot be read ({error}). Check the file."), name=cov.name,
                                 error=str(exc)))
    if ds is None or not (1 <= cov.band <= ds.RasterCount):
        raise InputError(message(QT_TRANSLATE_NOOP("PlotwiseEngine",
            "Covariate '{name}' has no band {band}."), name=cov.name, band=int(cov.band)))
    gt = ds.GetGeoTransform()
    if gt[2] or gt[4]:
        ds = gdal.Warp("", ds, format="VRT")  # rotated grid: make it north-up
    return ds


def _grid_of(ds, crs_wkt):
    wkt = ds.GetProjection() or crs_wkt
    return Grid(tuple(ds.GetGeoTransform()), ds.RasterXSize, ds.RasterYSize, wkt)



class _WindowReader:
    """Reads windows of the stack grid from a band whose grid lines up with it.

    ``col_off``/``row_off`` place the stack grid's origin on the band's grid;
    cells outside the band come back as NaN (the block is then float64).
    """

    def __init__(self, ds, band, col_off, row_off):
        self.ds = ds  # keep the dataset alive
        self.band = ds.GetRasterBand(band)
        self.col_off, self.row_off = col_off, row_off
        self.nodata = self.band.GetNoDataValue()
        self.dtype = np.dtype(gdal_array.GDALTypeCodeToNumericTypeCode(self.band.DataType))

    def read(self, xoff, yoff, xsize, ysize, ring=None):
        c0, r0 = xoff + self.col_off, yoff + self.row_off
        if c0 >= 0 and r0 >= 0 and c0 + xsize <= self.band.XSize and r0 + ysize <= self.band.YSize:
            if ring is None:
                return self.band.ReadAsArray(c0, r0, xsize, ysize)
            buf = ring.get(id(self), (ysize, xsize), self.dtype)
            return self.band.ReadAsArray(c0, r0, xsize, ysize, buf_obj=buf)
        return read_window(self.band, c0, r0, xsize, ysize)[0]


class _BufferRing:
    """A few reusable read buffers per (reader, shape): the blocks in flight never exceed ``size``.

    Fresh arrays for every block cost page faults; a ring of buffers, reused in
    turn, avoids them. ``size`` must exceed the blocks a consumer holds at once
    (:func:`~.engine.stratification.map_blocks` holds at most its workers + 2).
    """

    def __init__(self, size):
        self.size = size
        self._buffers = {}

    def get(self, key, shape, dtype):
        k = (key, shape, np.dtype(dtype).str)
        entry = self._buffers.get(k)
        if entry is None:
            entry = self._buffers[k] = [[np.empty(shape, dtype) for _ in range(self.size)], 0]
        buffers, i = entry
        entry[1] = (i + 1) % self.size
        return buffers[i]


class CovariateStack:
    """Covariates on one grid, cut to the frame, served block by block.

    Parameters
    ----------
    covariates : sequence of Covariate
    frame_wkb : sequence of bytes
        The frame's polygons (WKB) in the computation CRS.
    crs_wkt : str
        The computation CRS (projected, metres).
    categorical : bool
        The first covariate holds classes: warp it with nearest neighbour.
    block_cells : int
        Cells per block.

    Use as a context manager (temporary files are removed on exit).
    """

    def __init__(self, covariates, frame_wkb, crs_wkt, categorical=False, block_cells=BLOCK_CELLS, workdir=None):
        if not covariates:
            raise InputError(message(QT_TRANSLATE_NOOP("PlotwiseEngine", "Give at least one raster in COVARIATES.")))
        self.covariates = list(covariates)
        self.names = [c.name for c in self.covariates]
        self.crs_wkt = crs_wkt
        self.warped = []
        self._own_dir = workdir is None
        self.workdir = tempfile.mkdtemp(prefix="plotwise_") if workdir is None else workdir
        self._datasets = []
        try:
            self._build(frame_wkb, categorical, block_cells)
        except Exception:
            self.close()
            raise

    # -- construction -----------------------------------------------------
    def _build(self, frame_wkb, categorical, block_cells):
        first = self.covariates[0]
        ds0 = _open(first)
        if not same_crs(ds0.GetProjection(), self.crs_wkt):
            ds0 = gdal.Warp("", ds0, format="VRT", dstSRS=self.crs_wkt,
                            resampleAlg="near" if categorical else "bilinear")
            self.warped.append(first.name)
        self._datasets.append(ds0)
        band0 = ds0.GetRasterBand(first.band)
        self.units = [band0.GetUnitType() or ""]
        base = _grid_of(ds0, self.crs_wkt)
        base = Grid(base.geotransform, base.width, base.height, self.crs_wkt)
        self.base_grid = base

        geoms = [ogr.CreateGeometryFromWkb(bytes(w)) for w in frame_wkb]
        geoms = [g for g in geoms if g is not None and not g.IsEmpty()]
        if not geoms:
            raise InputError(message(QT_TRANSLATE_NOOP("PlotwiseEngine", "The frame has no polygon.")))
        frame = ogr.Geometry(ogr.wkbMultiPolygon)
        for g in geoms:
            for part in (g if g.GetGeometryType() in (ogr.wkbMultiPolygon, ogr.wkbMultiPolygon25D) else [g]):
                frame.AddGeometry(part.Clone())
        frame = frame.UnionCascaded() if frame.GetGeometryCount() > 1 else frame
        self.frame_area = frame.GetArea()
        bx0, by0, bx1, by1 = base.extent
        box = ogr.CreateGeometryFromWkt("POLYGON((%r %r,%r %r,%r %r,%r %r,%r %r))" % (
            bx0, by0, bx1, by0, bx1, by1, bx0, by1, bx0, by0))
        inter = frame.Intersection(box)
        self.frame_area_on_grid = inter.GetArea() if inter is not None else 0.0
        if self.frame_area_on_grid <= 0:
            raise self._no_overlap()

        # the window of the base grid that holds the frame
        fx0, fx1, fy0, fy1 = frame.GetEnvelope()
        x0, dx, _, y0, _, dy = base.geotransform
        cols = sorted(((fx0 - x0) / dx, (fx1 - x0) / dx))
        rows = sorted(((fy0 - y0) / dy, (fy1 - y0) / dy))
        c0, c1 = max(0, int(math.floor(cols[0]))), min(base.width, int(math.ceil(cols[1])))
        r0, r1 = max(0, int(math.floor(rows[0]))), min(base.height, int(math.ceil(rows[1])))
        if c1 <= c0 or r1 <= r0:
            raise self._no_overlap()
        self.grid = base.window_grid(c0, r0, c1 - c0, r1 - r0)
        self.window_offset = (c0, r0)

        self._readers = [_WindowReader(ds0, first.band, c0, r0)]
        self.nodata = [band0.GetNoDataValue()]
        for cov in self.covariates[1:]:
            reader, unit = self._reader_for(cov)
            self._readers.append(reader)
            self.units.append(unit)
            self.nodata.append(reader.nodata)

        # the frame on the grid
        self._mask_ds = self._rasterise(frame)
        self._mask_band = self._mask_ds.GetRasterBand(1)

        self._windows = block_windows(self.grid.width, self.grid.height, band0.GetBlockSize(), (c0, r0),
                                       block_cells)
        self.n_blocks = len(self._windows)
        self._known = {}  # block index -> _OUTSIDE or _VALID, once a pass has found it so

    def _no_overlap(self):
        return InputError(message(QT_TRANSLATE_NOOP("PlotwiseEngine",
            "The frame does not overlap covariate '{name}' ({path}). Use a raster that covers "
                                  "the frame, or check both layers' CRS."), name=self.covariates[0].name,
                                  path=self.covariates[0].path))

    def _reader_for(self, cov):
        ds = _open(cov)
        self._datasets.append(ds)
        unit = ds.GetRasterBand(cov.band).GetUnitType() or ""
        g = _grid_of(ds, self.crs_wkt)
        gx0, gdx, _, gy0, _, gdy = self.grid.geotransform
        sx0, sdx, _, sy0, _, sdy = g.geotransform
        if same_crs(g.crs_wkt, self.crs_wkt) and math.isclose(sdx, gdx, rel_tol=1e-9) and \
                math.isclose(sdy, gdy, rel_tol=1e-9):
            co, ro = (gx0 - sx0) / sdx, (gy0 - sy0) / sdy
            if abs(co - round(co)) < 1e-6 and abs(ro - round(ro)) < 1e-6:
                return _WindowReader(ds, cov.band, int(round(co)), int(round(ro))), unit
        xmin, ymin, xmax, ymax = self.grid.extent
        src_nd = ds.GetRasterBand(cov.band).GetNoDataValue()
        opts = dict(format="VRT", dstSRS=self.crs_wkt, outputBounds=(xmin, ymin, xmax, ymax),
                    width=self.grid.width, height=self.grid.height, resampleAlg="bilinear",
                    outputType=gdal.GDT_Float64, dstNodata=float("nan"), bandList=[cov.band])
        if src_nd is not None:
            opts["srcNodata"] = src_nd
        try:
            warped = gdal.Warp("", ds, **opts)
        except TypeError:  # old bindings without bandList
            opts.pop("bandList")
            warped = gdal.Warp("", ds, **opts)
        self._datasets.append(warped)
        self.warped.append(cov.name)
        band = 1 if warped.RasterCount == 1 else cov.band
        return _WindowReader(warped, band, 0, 0), unit

    def _rasterise(self, frame):
        g = self.grid
        if g.width * g.height <= MEM_MASK_CELLS:
            ds = gdal.GetDriverByName("MEM").Create("", g.width, g.height, 1, gdal.GDT_Byte)
        else:
            ds = gdal.GetDriverByName("GTiff").Create(os.path.join(self.workdir, "frame.tif"), g.width, g.height,
                                                      1, gdal.GDT_Byte, ["TILED=YES", "SPARSE_OK=YES", "BLOCKXSIZE=512",
                                                                         "BLOCKYSIZE=512"])
        ds.SetGeoTransform(g.geotransform)
        ds.SetProjection(g.crs_wkt)
        mem = ogr.GetDriverByName("Memory").CreateDataSource("frame")
        layer = mem.CreateLayer("frame", srs_from_wkt(g.crs_wkt), ogr.wkbMultiPolygon)
        feat = ogr.Feature(layer.GetLayerDefn())
        feat.SetGeometry(frame)
        layer.CreateFeature(feat)
        gdal.RasterizeLayer(ds, [1], layer, burn_values=[1])
        ds.FlushCache()  # read back from the file, not from GDAL's cache of written blocks (three times slower)
        return ds

    # -- serving -------------------------------------------------------------
    @property
    def cell_area(self):
        return self.grid.cell_area

    def windows(self):
        """``(xoff, yoff, xsize, ysize)`` of each block, in reading order."""
        return iter(self._windows)

    def blocks(self, strata_band=None, keep=None):
        """Iterator of :class:`~.engine.stratification.CellBlock` (only those with ``keep`` True, if given).

        GDAL reads uncompressed GeoTIFF blocks straight into our buffers
        (``GTIFF_DIRECT_IO``, set for the reading thread only): five times
        faster than through its block cache, which every block would pass once.
        """
        previous = gdal.GetThreadLocalConfigOption("GTIFF_DIRECT_IO", None)
        gdal.SetThreadLocalConfigOption("GTIFF_DIRECT_IO", "YES")
        try:
            yield from self._blocks(strata_band, keep)
        finally:
            gdal.SetThreadLocalConfigOption("GTIFF_DIRECT_IO", previous)

    def _blocks(self, strata_band, keep):
        ring = _BufferRing(max(strat.WORKERS, 1) + 3)
        for i, win in enumerate(self.windows()):
            if keep is not None and not keep[i]:
                continue
            if i % CACHE_RELEASE_BLOCKS == 0:
                self._release_cache(strata_band)
            xo, yo, xs, ys = win
            known = self._known.get(i)
            if known == _OUTSIDE:
                frame = np.broadcast_to(np.zeros(1, bool), (ys, xs))
            elif known == _VALID:  # wholly inside the frame, a value in every covariate: seen in an earlier pass
                frame = np.broadcast_to(np.ones(1, bool), (ys, xs))
                vals = tuple(r.read(xo, yo, xs, ys, ring) for r in self._readers)
                strata = None if strata_band is None else strata_band.ReadAsArray(xo, yo, xs, ys)
                yield strat.CellBlock(win, vals, frame, frame, strata, self.nodata)
                continue
            else:
                frame = self._mask_band.ReadAsArray(xo, yo, xs, ys, buf_obj=ring.get("frame", (ys, xs), np.uint8))
                frame = frame.view(bool)  # burnt 0/1
            if not frame.any():
                self._known[i] = _OUTSIDE
                empty = np.broadcast_to(np.zeros(1, np.float32), (ys, xs))
                yield strat.CellBlock(win, (empty,) * len(self._readers), frame, frame,
                                      None if strata_band is None else np.zeros((ys, xs), np.uint8))
                continue
            vals = tuple(r.read(xo, yo, xs, ys, ring) for r in self._readers)
            strata = None if strata_band is None else strata_band.ReadAsArray(xo, yo, xs, ys)
            remember = self._remember_valid(i) if frame.all() else None
            # validity: worked out by the worker
            yield strat.CellBlock(win, vals, frame, None, strata, self.nodata, on_all_valid=remember)

    def _remember_valid(self, i):
        def remember(all_valid):
            if all_valid:
                self._known[i] = _VALID
        return remember

    def _release_cache(self, strata_band=None):
        """Drop GDAL's cached blocks of the bands read: every block is read into our own buffers.

        GDAL keeps the blocks it has read (up to 5 % of the RAM by default): on a
        10^8-cell covariate that alone is half a gigabyte.
        """
        for band in [r.band for r in self._readers] + [self._mask_band, strata_band]:
            if band is not None:
                band.FlushCache()

    def source(self, strata_path=None):
        """A cell source for the engine, optionally carrying a stratum raster."""
        return _StackSource(self, strata_path)

    def approximate_range(self):
        """GDAL's quick (approximate) minimum and maximum of the first covariate, or None."""
        try:
            band = self._readers[0].band
            lo, hi = band.ComputeRasterMinMax(True)
            return (float(lo), float(hi)) if math.isfinite(lo) and math.isfinite(hi) and hi > lo else None
        except RuntimeError:
            return None

    def close(self):
        self._mask_band = None
        self._mask_ds = None
        self._readers = []
        self._datasets = []
        if self._own_dir and self.workdir and os.path.isdir(self.workdir):
            shutil.rmtree(self.workdir, ignore_errors=True)

    def __enter__(self):
        return self

    def __exit__(self, *exc):
        self.close()


def _cuts(size, offset, step):
    """Cut points in [0, size] at multiples of ``step`` of the source grid (offset = window origin)."""
    first = step - offset % step
    inner = list(range(first, size, step)) if first < size else []
    return [0] + [c for c in inner if c > 0] + [size]


def block_windows(width, height, source_block, offset, block_cells):
    """Windows of about ``block_cells`` cells that follow the first covariate's own blocks.

    Tiled rasters are read by groups of whole tiles, striped ones by groups of
    whole strips, so that GDAL decodes each of its blocks once.
    """
    bw, bh = int(source_block[0]), int(source_block[1])
    if bw >= width or bw <= 1:  # strips: full-width rows
        rows = max(1, block_cells // max(1, width))
        if bh > 1 and rows >= bh:
            rows = rows // bh * bh
        return [(0, y, width, min(rows, height - y)) for y in range(0, height, rows)]
    tiles = max(1, block_cells // (bw * bh))
    nx = max(1, int(math.sqrt(tiles)))
    ny = max(1, tiles // nx)
    xs = _cuts(width, offset[0], bw)[::1]
    ys = _cuts(height, offset[1], bh)
    xs = xs[::nx] + ([xs[-1]] if (len(xs) - 1) % nx else [])
    ys = ys[::ny] + ([ys[-1]] if (len(ys) - 1) % ny else [])
    return [(x0, y0, x1 - x0, y1 - y0) for y0, y1 in zip(ys[:-1], ys[1:]) for x0, x1 in zip(xs[:-1], xs[1:])]


class _StackSource:
    def __init__(self, stack, strata_path=None):
        self.stack, self.strata_path = stack, strata_path
        self.n_blocks = stack.n_blocks

    def blocks(self):
        return self.blocks_where(None)

    def windows(self):
        return self.stack.windows()

    def blocks_where(self, keep):
        if self.strata_path is None:
            yield from self.stack.blocks(keep=keep)
            return
        ds = gdal.Open(self.strata_path)
        try:
            yield from self.stack.blocks(ds.GetRasterBand(1), keep=keep)
        finally:
            ds = None
