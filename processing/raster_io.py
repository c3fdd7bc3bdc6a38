"""Raster work with GDAL for the stratification: never imports the host.

* :class:`CovariateStack` puts every covariate on one grid: the first
  covariate's grid in the computation CRS (the first covariate is warped when
  it lies in another CRS; the others are read directly when their grid lines
  up with it, and warped or resampled with GDAL otherwise), cut to the frame's
  extent. The frame is rasterised on that grid (a cell belongs to the frame
  when its centre lies inside). Blocks of rows are served one at a time, so
  memory stays bounded whatever the raster's size.
* :class:`StratumRaster` writes the stratum ids (Byte GeoTIFF, 0 = NoData).
* :func:`sieve_strata` merges specks (patches of a few cells) into their
  largest neighbour (GDAL's sieve filter), :func:`merge_small_patches` brings
  every patch up to the minimum area, :func:`polygonise_strata` turns the
  raster into one multipolygon per stratum.
* :func:`stratify_rasters` chains them with the engine.
"""
from dataclasses import dataclass, field
import math
import os
import shutil
import tempfile

import numpy as np
from osgeo import gdal, gdal_array, ogr, osr

from .engine import stratification as strat
from .engine.errors import QT_TRANSLATE_NOOP, Cancelled, InputError, message

gdal.UseExceptions()
ogr.UseExceptions()
osr.UseExceptions()

#: cells per block: 256 Ki cells (one 512 x 512 tile; 2 MB per float64 covariate), small enough for the
#: temporaries to stay in the processor's cache
BLOCK_CELLS = 1 << 18
#: rasters up to this many cells keep the frame mask in memory
MEM_MASK_CELLS = 1 << 25


@dataclass(frozen=True)
class Covariate:
    """A raster covariate: a GDAL-readable ``path`` and band, with a display ``name``."""

    path: str
    name: str
    band: int = 1


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


def _srs(wkt):
    s = osr.SpatialReference()
    s.ImportFromWkt(wkt)
    s.SetAxisMappingStrategy(osr.OAMS_TRADITIONAL_GIS_ORDER)
    return s


def same_crs(a_wkt, b_wkt):
    """True when two WKT CRS are the same (a raster without a CRS is taken to be in the other's)."""
    if not a_wkt or not b_wkt:
        return True
    return bool(_srs(a_wkt).IsSame(_srs(b_wkt)))


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

        self._windows = _block_windows(self.grid.width, self.grid.height, band0.GetBlockSize(), (c0, r0),
                                       block_cells)
        self.n_blocks = len(self._windows)

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
                                                      1, gdal.GDT_Byte, ["TILED=YES", "SPARSE_OK=YES"])
        ds.SetGeoTransform(g.geotransform)
        ds.SetProjection(g.crs_wkt)
        mem = ogr.GetDriverByName("Memory").CreateDataSource("frame")
        layer = mem.CreateLayer("frame", _srs(g.crs_wkt), ogr.wkbMultiPolygon)
        feat = ogr.Feature(layer.GetLayerDefn())
        feat.SetGeometry(frame)
        layer.CreateFeature(feat)
        gdal.RasterizeLayer(ds, [1], layer, burn_values=[1])
        return ds

    # -- serving -------------------------------------------------------------
    @property
    def cell_area(self):
        return self.grid.cell_area

    def windows(self):
        """``(xoff, yoff, xsize, ysize)`` of each block, in reading order."""
        return iter(self._windows)

    def blocks(self, strata_band=None, keep=None):
        """Iterator of :class:`~.engine.stratification.CellBlock` (only those with ``keep`` True, if given)."""
        ring = _BufferRing(max(strat.WORKERS, 1) + 3)
        for i, win in enumerate(self.windows()):
            if keep is not None and not keep[i]:
                continue
            xo, yo, xs, ys = win
            mask = self._mask_band.ReadAsArray(xo, yo, xs, ys, buf_obj=ring.get("frame", (ys, xs), np.uint8))
            frame = mask.view(bool)  # burnt 0/1
            if not frame.any():
                empty = np.broadcast_to(np.zeros(1, np.float32), (ys, xs))
                vals = (empty,) * len(self._readers)
                yield strat.CellBlock(win, vals, frame, frame, None if strata_band is None else
                                      np.zeros((ys, xs), np.uint8))
                continue
            vals = tuple(r.read(xo, yo, xs, ys, ring) for r in self._readers)
            strata = None if strata_band is None else strata_band.ReadAsArray(xo, yo, xs, ys)
            yield strat.CellBlock(win, vals, frame, None, strata, self.nodata)  # validity: worked out by the worker

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


def _block_windows(width, height, source_block, offset, block_cells):
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

    def blocks_where(self, keep):
        if self.strata_path is None:
            yield from self.stack.blocks(keep=keep)
            return
        ds = gdal.Open(self.strata_path)
        try:
            yield from self.stack.blocks(ds.GetRasterBand(1), keep=keep)
        finally:
            ds = None


# ---------------------------------------------------------------------------
# the stratum raster
# ---------------------------------------------------------------------------
class StratumRaster:
    """Byte GeoTIFF of stratum ids on the stack grid (0 = NoData), written block by block."""

    def __init__(self, path, grid):
        self.path = path
        opts = ["TILED=YES", "BIGTIFF=IF_SAFER"] + _fast_compression()
        self.ds = gdal.GetDriverByName("GTiff").Create(path, grid.width, grid.height, 1, gdal.GDT_Byte, opts)
        if self.ds is None:
            raise InputError(message(QT_TRANSLATE_NOOP("PlotwiseEngine",
                "Cannot write the stratum raster '{path}'."), path=path))
        self.ds.SetGeoTransform(grid.geotransform)
        self.ds.SetProjection(grid.crs_wkt)
        self.band = self.ds.GetRasterBand(1)
        self.band.SetNoDataValue(0)

    def write(self, window, ids):
        self.band.WriteArray(ids.astype(np.uint8, copy=False), int(window[0]), int(window[1]))

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
        if progress is not None and progress((i + 1) / n):
            raise Cancelled("Stratification cancelled.")
    band.FlushCache()
    band = ds = None


def sieve_cells(min_area_ha, cell_area_m2):
    """Patch size in cells below which a patch is merged: ceil(MIN_AREA × 10,000 / cell area)."""
    if not min_area_ha or min_area_ha <= 0:
        return 0
    return int(math.ceil(min_area_ha * 10000.0 / cell_area_m2 - 1e-9))


#: patches below this many cells are specks, merged by GDAL's sieve before :func:`merge_small_patches`
SPECK_CELLS = 8


def _speck_steps(min_cells):
    return [t for t in (2, 4, 8) if t <= min(int(min_cells), SPECK_CELLS)]


def speck_cells(min_cells):
    """Patches below this many cells are specks for :func:`sieve_strata` (0: none)."""
    steps = _speck_steps(min_cells)
    return steps[-1] if steps else 0


def sieve_strata(path, min_cells, progress=None):
    """Merge specks into their largest neighbour (GDAL's sieve filter, 4-connected).

    Specks are patches of fewer than :func:`speck_cells` cells. The
    threshold grows (2, 4, 8), so that clusters of specks merge step by step.
    GDAL is fast on the many tiny patches of a noisy covariate, and after it
    at most one patch in :data:`SPECK_CELLS` cells is left for
    :func:`merge_small_patches`, which brings every patch up to ``min_cells``.
    The sieve stops at :data:`SPECK_CELLS`: GDAL merges a small patch only
    when its chain of largest neighbours reaches a big patch, and with larger
    thresholds a few big patches swallow a whole mosaic of small ones, strata
    and all.

    Cells with id 0 (outside the frame or NoData) are never changed and never
    absorb a patch.
    """
    steps = _speck_steps(min_cells)
    if not steps:
        return
    ds = gdal.Open(path, gdal.GA_Update)
    band = ds.GetRasterBand(1)
    try:
        for i, t in enumerate(steps):
            cb = GdalProgress(strat.scaled_progress(progress, i / len(steps), (i + 1) / len(steps)))
            try:
                gdal.SieveFilter(band, band, band, t, 4, callback=cb)
            except RuntimeError:
                cb.check()
                raise
            cb.check()
    finally:
        band.FlushCache()
        band = ds = None


#: loss of R² (first covariate) from merging patches below MIN_AREA worth a warning (our choice)
R2_LOSS_WARNING = 0.1


@dataclass(frozen=True)
class PatchCheck:
    """What :func:`merge_small_patches` did: patches merged, and those still below the minimum."""

    merged: int
    left: int
    left_cells: int


def _block_patches(ids):
    """4-connected patches of one stratum block (scipy.ndimage.label per stratum): labels 1..k (0: none), strata."""
    from scipy import ndimage

    labels = np.zeros(ids.shape, np.int64)
    strata = []
    for h in np.unique(ids):
        if h == 0:
            continue
        lab, k = ndimage.label(ids == h)
        inside = lab > 0
        labels[inside] = lab[inside] + len(strata)
        strata.extend([int(h)] * k)
    return labels, strata


def _pair_codes(a, b):
    """Codes of unordered label pairs (labels below 2³¹): min · 2³² + max."""
    return (np.minimum(a, b) << 32) | np.maximum(a, b)


def _count_codes(codes, counts, new_codes, new_counts=None):
    """Add ``new_codes`` (with ``new_counts``, default one each) to the running (codes, counts)."""
    if new_codes.size == 0:
        return codes, counts
    if new_counts is None:
        new_codes, new_counts = np.unique(new_codes, return_counts=True)
    merged, inverse = np.unique(np.concatenate([codes, new_codes]), return_inverse=True)
    total = np.bincount(inverse, weights=np.concatenate([counts, new_counts]), minlength=merged.size)
    return merged, np.rint(total).astype(np.int64)


def merge_small_patches(path, min_cells, block_cells=BLOCK_CELLS, progress=None):
    """Merge the patches below ``min_cells`` after the speck sieve (:func:`~.engine.stratification.merge_small_patches`).

    Two passes over the stratum raster by blocks of rows. The first labels the
    4-connected patches of each block (scipy.ndimage.label), joins the parts of
    a patch that a block boundary cuts (scipy.sparse.csgraph), counts every
    patch's cells and the cell edges neighbouring patches share, and numbers
    the patches by their first cell in reading order, so the result does not
    depend on the blocks. The engine then merges the small patches; the second
    pass labels each block again and writes the new strata. Memory grows with
    the number of patches, not with the raster.

    Returns
    -------
    PatchCheck
        Patches merged, and the patches (and their cells) still below the
        minimum because they touch no other stratum.
    """
    from scipy.sparse import coo_matrix
    from scipy.sparse.csgraph import connected_components

    if min_cells <= 1:
        return PatchCheck(0, 0, 0)
    ds = gdal.Open(path, gdal.GA_Update)
    band = ds.GetRasterBand(1)
    try:
        width, height = band.XSize, band.YSize
        blocks = [(y, rows) for _, y, _, rows in _block_windows(width, height, (width, 1), (0, 0), block_cells)]
        bases, sizes, strata, first = [], [], [], []
        seam_a, seam_b = [], []
        codes, counts = np.zeros(0, np.int64), np.zeros(0, np.int64)
        prev_ids = prev_lab = None
        base = 0
        for i, (y0, rows) in enumerate(blocks):  # pass 1: patches, sizes, shared edges
            ids = band.ReadAsArray(0, y0, width, rows)
            lab, block_strata = _block_patches(ids)
            k = len(block_strata)
            sizes.append(np.bincount(lab.ravel(), minlength=k + 1)[1:])
            lab[lab > 0] += base
            bases.append(base)
            strata.extend(block_strata)
            seen, at = np.unique(lab.ravel(), return_index=True)  # each label's first cell in the block
            first.append((y0 * width + at[seen > 0]).astype(np.int64))
            found = []
            for a, b, same in ((lab[:, :-1], lab[:, 1:], None), (lab[:-1], lab[1:], None),
                               (prev_lab, lab[:1], None if prev_ids is None else prev_ids == ids[:1])):
                if a is None:
                    continue
                touch = (a != b) & (a > 0) & (b > 0)
                if same is not None:  # across the block boundary: one patch cut in two, or two patches
                    seam = touch & same
                    seam_a.append(a[seam])
                    seam_b.append(b[seam])
                    touch &= ~same
                found.append(_pair_codes(a[touch], b[touch]))
            codes, counts = _count_codes(codes, counts, np.concatenate(found))
            prev_ids, prev_lab = ids[-1:], lab[-1:]
            base += k
            if progress is not None and progress(0.6 * (i + 1) / len(blocks)):
                raise Cancelled("Stratification cancelled.")
        if base == 0:
            return PatchCheck(0, 0, 0)
        # local labels 1..base -> patches: parts joined across block boundaries, numbered by their first cell
        seam_a = np.concatenate(seam_a) - 1 if seam_a else np.zeros(0, np.int64)
        seam_b = np.concatenate(seam_b) - 1 if seam_b else np.zeros(0, np.int64)
        graph = coo_matrix((np.ones(seam_a.size), (seam_a, seam_b)), shape=(base, base))
        n_patches, part_of = connected_components(graph, directed=False)
        first = np.concatenate(first)
        patch_first = np.full(n_patches, np.iinfo(np.int64).max)
        np.minimum.at(patch_first, part_of, first)
        rank = np.empty(n_patches, np.int64)
        rank[np.argsort(patch_first, kind="stable")] = np.arange(1, n_patches + 1)
        patch = rank[part_of]  # patch (1..n) of each local label (0-based)
        local_strata = np.asarray(strata, np.int64)
        patch_sizes = np.bincount(patch, weights=np.concatenate(sizes), minlength=n_patches + 1).astype(np.int64)
        patch_strata = np.zeros(n_patches + 1, np.int64)
        patch_strata[patch] = local_strata
        small = patch_sizes < min_cells
        small[0] = False
        if not small.any():
            return PatchCheck(0, 0, 0)
        a, b = patch[(codes >> 32) - 1], patch[(codes & 0xFFFFFFFF) - 1]
        keep = small[a] | small[b]
        pair_codes, shared = _count_codes(np.zeros(0, np.int64), np.zeros(0, np.int64),
                                          _pair_codes(a[keep], b[keep]), counts[keep])
        pairs = np.column_stack([pair_codes >> 32, pair_codes & 0xFFFFFFFF])
        merge = strat.merge_small_patches(patch_sizes, patch_strata, pairs, shared, min_cells)
        if merge.merged:
            lut = np.concatenate([[0], merge.strata[patch]]).astype(np.uint8)  # local label -> stratum
            changed = np.concatenate([[False], merge.strata[patch] != local_strata])
            for i, (y0, rows) in enumerate(blocks):  # pass 2: the same labels, the new strata
                ids = band.ReadAsArray(0, y0, width, rows)
                lab, _ = _block_patches(ids)
                lab[lab > 0] += bases[i]
                if changed[lab].any():
                    band.WriteArray(lut[lab], 0, y0)
                if progress is not None and progress(0.6 + 0.4 * (i + 1) / len(blocks)):
                    raise Cancelled("Stratification cancelled.")
        return PatchCheck(merge.merged, int(merge.left.size), int(merge.left_cells.sum()))
    finally:
        band.FlushCache()
        band = ds = None


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


# ---------------------------------------------------------------------------
# the whole job
# ---------------------------------------------------------------------------
@dataclass(frozen=True)
class RasterStratification:
    """Everything the algorithm writes and reports.

    Areas are in hectares, computed as cells × cell area in the computation CRS.
    ``coverage`` is the share of the frame's area with a value in every
    covariate: (frame area on the raster / frame area) × (valid cells / frame cells).
    """

    result: strat.Stratification
    names: list
    units: list
    labels: list
    grid: Grid
    polygons: list
    area_ha: np.ndarray
    frame_ha: float
    frame_cells_ha: float
    nodata_ha: float
    outside_ha: float
    coverage: float
    sieve_cells: int
    warped: list
    output_raster: str
    warnings: list = field(default_factory=list)
    patches_merged: int = 0
    """Patches that GDAL's sieve left below MIN_AREA and :func:`merge_small_patches` merged."""
    small_patches: int = 0
    """Patches still below MIN_AREA (they touch no other stratum)."""
    small_patches_ha: float = 0.0


def stratify_rasters(covariates, frame_wkb, crs_wkt, method, n_strata, output_raster, min_area_ha=0.0,
                     rng=None, sample_size=100_000, progress=None, block_cells=BLOCK_CELLS):
    """Strata from raster covariates clipped to a frame, as a raster and as polygons.

    Steps: stack the covariates on the first one's grid (:class:`CovariateStack`),
    find the rule and assign every cell (:func:`~.engine.stratification.stratify_cells`),
    renumber strata by first-covariate mean, merge patches below MIN_AREA
    (specks with GDAL's sieve, then :func:`merge_small_patches`) and recount
    the statistics, polygonise.
    """
    categorical = method == strat.RASTER_CLASSES
    warnings = []
    with CovariateStack(covariates, frame_wkb, crs_wkt, categorical, block_cells) as stack:
        names, units = stack.names, stack.units
        writer = StratumRaster(output_raster, stack.grid)
        try:
            hint = stack.approximate_range() if method == strat.QUANTILE else None
            res = strat.stratify_cells(stack.source(), method, n_strata, names, rng=rng, value_range=hint,
                                       sample_size=sample_size, write=writer.write,
                                       progress=strat.scaled_progress(progress, 0, 0.7))
        finally:
            writer.close()
        warnings.extend(res.warnings)
        if res.needs_remap:
            remap_strata(output_raster, res.lut, progress=strat.scaled_progress(progress, 0.7, 0.75))
        cells = sieve_cells(min_area_ha, stack.cell_area)
        patches = PatchCheck(0, 0, 0)
        if cells > 1:
            sieve_strata(output_raster, cells, strat.scaled_progress(progress, 0.75, 0.8))
            patches = merge_small_patches(output_raster, cells, block_cells, strat.scaled_progress(progress, 0.8, 0.84))
            stats = strat.accumulate_statistics(stack.source(output_raster), res.n_strata,
                                                shift=res.statistics.overall_mean(),
                                                chart_range=res.statistics.chart_range,
                                                progress=strat.scaled_progress(progress, 0.84, 0.9))
            lut, order = strat.stratum_order(stats)
            if order.size < 2:
                raise InputError(message(QT_TRANSLATE_NOOP("PlotwiseEngine",
                    "With MIN_AREA {min_area:g} ha, merging the patches below it left a single stratum, so there "
                    "is nothing to stratify. Lower MIN_AREA."), min_area=min_area_ha))
            provisional = res.provisional
            r2_before = float(res.statistics.r_squared()[0])
            if not np.array_equal(lut, np.arange(lut.size)):
                if order.size < stats.n_strata:
                    warnings.append(message(QT_TRANSLATE_NOOP("PlotwiseEngine",
                        "{merged} strata consisted only of patches below MIN_AREA and were "
                        "merged away."), merged=int(stats.n_strata - order.size)))
                remap_strata(output_raster, lut)
                stats, provisional = stats.reordered(order), provisional[order]
            res = res.with_statistics(stats, provisional)
            r2_after = float(stats.r_squared()[0])
            if np.isfinite(r2_before) and np.isfinite(r2_after) and r2_after < r2_before - R2_LOSS_WARNING:
                warnings.append(message(QT_TRANSLATE_NOOP("PlotwiseEngine",
                    "Merging the patches below MIN_AREA moved cells between strata: the share of the variance of "
                    "'{name}' that the strata explain fell from {before:.2f} to {after:.2f}. A smaller MIN_AREA "
                    "keeps the strata closer to the covariates."), name=names[0], before=r2_before, after=r2_after))
            if patches.left:
                warnings.append(message(QT_TRANSLATE_NOOP("PlotwiseEngine",
                    "{n} patch(es) covering {ha:,.2f} ha stay below MIN_AREA ({min_area:g} ha): they touch no "
                    "other stratum (islands of the frame, or patches ringed by NoData). Remove such islands from "
                    "the frame, fill the NoData in the covariates, or lower MIN_AREA."),
                    n=patches.left, ha=patches.left_cells * stack.cell_area / 10000.0, min_area=min_area_ha))
        polygons = polygonise_strata(output_raster, res.n_strata, strat.scaled_progress(progress, 0.9, 1.0))
        ca = stack.cell_area / 10000.0
        frame_ha = stack.frame_area / 10000.0
        outside_ha = max(0.0, (stack.frame_area - stack.frame_area_on_grid) / 10000.0)
        on_grid = stack.frame_area_on_grid / stack.frame_area if stack.frame_area > 0 else 0.0
        coverage = on_grid * res.cells_valid / res.cells_in_frame if res.cells_in_frame else 0.0
        if res.cells_nodata or on_grid < 1 - 1e-6:
            warnings.append(message(QT_TRANSLATE_NOOP("PlotwiseEngine",
                "The covariates cover {percent:.1f}% of the frame: {outside_ha:,.2f} ha lie "
                "outside the rasters and {nodata_ha:,.2f} ha have NoData in at least one "
                "covariate; the strata speak for the covered part only."),
                                    percent=100 * coverage, outside_ha=outside_ha, nodata_ha=res.cells_nodata * ca))
        labels = strat.stratum_labels(res, names, units)
        return RasterStratification(res, names, units, labels, stack.grid, polygons,
                                    res.statistics.count * ca, frame_ha, res.cells_in_frame * ca,
                                    res.cells_nodata * ca, outside_ha, coverage, cells, list(stack.warped),
                                    output_raster, warnings, patches.merged, patches.left,
                                    patches.left_cells * ca)


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
