"""Strata from raster covariates, computed block by block with bounded memory.

The cells of the sampling frame are read from a *cell source*: any object with
a ``blocks()`` method returning a fresh iterator of :class:`CellBlock` and an
``n_blocks`` attribute. Every function here makes one or more passes over the
source, so memory never depends on the raster's size.
:class:`ArrayCellSource` serves arrays already in memory (tests, small rasters);
``processing/gdal_io/covariate_stack.py`` serves GDAL rasters.

Methods
-------
quantile
    Equal-count strata on the first covariate; the boundaries are the exact
    sample quantiles (the ``linear`` rule of Hyndman & Fan (1996), definition 7,
    which is also ``numpy.quantile``'s default).
equal interval
    The first covariate's range cut into equal widths.
cumulative root frequency
    Dalenius & Hodges (1959), JASA 54:88-101; Cochran (1977) ch. 5A.
k-means
    Lloyd (1982) iterations from k-means++ seeds (Arthur & Vassilvitskii 2007),
    on all covariates standardised to mean 0 and standard deviation 1, fitted on
    a seeded subsample of cells; then every cell goes to its nearest centre.
raster classes
    Each value of a categorical first covariate is a stratum.

A cell with no value in any covariate is left out. Strata are numbered 1..k by
increasing mean of the first covariate; 0 means "no stratum".
"""
from collections import deque
from concurrent.futures import ThreadPoolExecutor
from dataclasses import dataclass, field, replace
import math
import os
import threading

import numpy as np

from .errors import QT_TRANSLATE_NOOP, Cancelled, InputError, message

QUANTILE = 0
EQUAL_INTERVAL = 1
CUM_ROOT_F = 2
KMEANS = 3
RASTER_CLASSES = 4
METHOD_NAMES = ("quantile", "equal interval", "cumulative root frequency", "k-means", "raster classes")

#: fine histogram used to locate quantiles; divisible by the coarse class counts below
FINE_BINS = 64000
#: classes of the frequency table for the cum sqrt(f) rule  # common practice
CUM_ROOT_F_CLASSES = 100
#: classes of the histogram drawn in the report
CHART_BINS = 40
#: most classes a categorical raster may have
MAX_CLASSES = 50
#: most values held in memory at once while selecting exact quantiles
SELECTION_CAP = 4_000_000


# ---------------------------------------------------------------------------
# cell sources
# ---------------------------------------------------------------------------
class CellBlock:
    """One window of the covariate stack.

    Attributes
    ----------
    window : tuple of int
        ``(xoff, yoff, xsize, ysize)`` on the stack's grid.
    values : tuple of numpy.ndarray
        One ``(ysize, xsize)`` array per covariate, in the raster's own dtype.
    in_frame : numpy.ndarray of bool
        Cells whose centre lies inside the frame.
    valid : numpy.ndarray of bool
        Cells inside the frame with a value in every covariate. When not given,
        it is worked out on first use from ``values``, ``in_frame`` and
        ``nodata`` (so that a worker thread, not the reader, does it).
    strata : numpy.ndarray or None
        Stratum id per cell (0 = none) when the source carries a stratum raster.
    nodata : sequence or None
        NoData value per covariate (None: NaN only).
    on_all_valid : callable or None
        Called with the answer of :attr:`all_valid` once it is worked out (a
        source can remember it for later passes over the same cells).
    """

    __slots__ = ("window", "values", "in_frame", "strata", "nodata", "_valid", "_all_valid", "_on_all_valid")

    def __init__(self, window, values, in_frame, valid=None, strata=None, nodata=None, on_all_valid=None):
        self.window, self.values, self.in_frame = window, values, in_frame
        self.strata, self.nodata, self._valid = strata, nodata, valid
        self._all_valid = None
        self._on_all_valid = on_all_valid

    @property
    def valid(self):
        if self._valid is None:
            nodata = self.nodata if self.nodata is not None else (None,) * len(self.values)
            self._valid = valid_cells(self.values, self.in_frame, nodata)
        return self._valid

    @property
    def all_valid(self):
        """True when every cell of the block is valid (a block wholly inside the frame, without NoData)."""
        if self._all_valid is None:
            self._all_valid = bool(self.valid.all())
            if self._on_all_valid is not None:
                self._on_all_valid(self._all_valid)
        return self._all_valid

    def spread(self, ids):
        """Per-cell array of the block's shape: ``ids`` (one per valid cell) in place, 0 elsewhere."""
        if self.all_valid:
            return ids.reshape(self.valid.shape)
        full = np.zeros(self.valid.shape, ids.dtype)
        full[self.valid] = ids
        return full


class ArrayCellSource:
    """Cells held in memory, served in strips of ``block_rows`` rows.

    Parameters
    ----------
    values : sequence of 2-D arrays
        One array per covariate, all of the same shape. NaN marks NoData.
    in_frame : 2-D bool array, optional
        Cells inside the frame (default: all).
    nodata : sequence, optional
        NoData value per covariate (``None`` for none), besides NaN.
    strata : 2-D int array, optional
        A stratum raster to serve with the blocks.
    """

    def __init__(self, values, in_frame=None, nodata=None, block_rows=64, strata=None):
        self.values = tuple(np.asarray(v) for v in values)
        shape = self.values[0].shape
        if any(v.shape != shape for v in self.values):
            raise ValueError("All covariate arrays must have the same shape.")
        self.in_frame = np.ones(shape, bool) if in_frame is None else np.asarray(in_frame, bool)
        self.nodata = tuple(nodata) if nodata is not None else (None,) * len(self.values)
        self.block_rows = max(1, int(block_rows))
        self.strata = strata
        self.n_blocks = -(-shape[0] // self.block_rows)

    @property
    def shape(self):
        return self.values[0].shape

    def with_strata(self, strata):
        """The same cells served together with a stratum raster."""
        return ArrayCellSource(self.values, self.in_frame, self.nodata, self.block_rows, strata)

    def blocks(self):
        return self.blocks_where(None)

    def windows(self):
        """``(xoff, yoff, xsize, ysize)`` of each block, in reading order."""
        rows, cols = self.shape
        return [(0, y0, cols, min(rows, y0 + self.block_rows) - y0) for y0 in range(0, rows, self.block_rows)]

    def blocks_where(self, keep):
        """The blocks whose ``keep`` entry is True (all when ``keep`` is None)."""
        rows, cols = self.shape
        for i, y0 in enumerate(range(0, rows, self.block_rows)):
            if keep is not None and not keep[i]:
                continue
            y1 = min(rows, y0 + self.block_rows)
            vals = tuple(v[y0:y1] for v in self.values)
            frame = self.in_frame[y0:y1]
            strata = None if self.strata is None else np.asarray(self.strata[y0:y1])
            yield CellBlock((0, y0, cols, y1 - y0), vals, frame, valid_cells(vals, frame, self.nodata), strata)


def valid_cells(values, in_frame, nodata):
    """Cells inside the frame with a value (not NaN, not NoData) in every covariate."""
    ok = np.array(in_frame, bool, copy=True)  # never a view of the caller's mask
    for v, nd in zip(values, nodata):
        if v.dtype.kind == "f":
            ok &= np.isfinite(v)
        if nd is not None and not (isinstance(nd, float) and math.isnan(nd)):
            ok &= v != nd
    return ok


def scaled_progress(progress, start, stop):
    """A progress callable mapping [0, 1] onto [start, stop] of ``progress``."""
    if progress is None:
        return None
    return lambda f: progress(start + (stop - start) * min(1.0, max(0.0, f)))


def throttled_progress(progress, step=0.005):
    """A progress callable that passes on a fraction only once it has grown by ``step`` (and at the end).

    The host's progress report costs a fraction of a millisecond a call, and the
    passes tick once per block; in between the callable answers "not cancelled".
    """
    if progress is None:
        return None
    last = [-1.0]

    def tick(fraction):
        if fraction - last[0] < step and fraction < 1.0:
            return False
        last[0] = fraction
        return progress(fraction)
    return tick


def _tick(progress, i, n):
    if progress is not None and progress((i + 1) / max(1, n)):
        raise Cancelled("Stratification cancelled.")


#: threads that work on blocks while the calling thread reads the next ones (0: all in the calling thread).
#: One core: none. Two cores: one, so that reading and computing overlap (a quarter off the wall time of
#: a stratification on 10^8 cells, tests/benchmarks/bench_stratify.py). More: two; the reader is then the
#: bottleneck. The environment variable PLOTWISE_WORKERS overrides the choice.
WORKERS = int(os.environ.get("PLOTWISE_WORKERS", min(2, max(0, (os.cpu_count() or 1) - 1))))


def _kept_blocks(source, keep):
    """The source's blocks, leaving out those with ``keep`` False (unread when the source can skip)."""
    if keep is None:
        return source.blocks()
    if hasattr(source, "blocks_where"):
        return source.blocks_where(keep)
    return (b for b, k in zip(source.blocks(), keep) if k)


def map_blocks(source, work, progress=None, workers=None, keep=None):
    """``work(block)`` for every block of ``source``, yielded in reading order.

    The blocks are read in the calling thread (a GDAL dataset must not be shared
    between threads); ``work`` runs on a small thread pool, where numpy releases
    the interpreter lock in its array loops. At most ``workers + 1`` blocks are
    in flight, so memory stays bounded. Results come back in reading order, so
    every total is summed in the same order as in a serial run: the results do
    not depend on the number of workers. ``progress`` is ticked per block and a
    cancel raises :class:`Cancelled`. ``keep`` (one bool per block) leaves
    blocks out; sources with a ``blocks_where(keep)`` method do not even read them.
    """
    workers = WORKERS if workers is None else int(workers)
    n = source.n_blocks if keep is None else int(np.count_nonzero(keep))
    if workers <= 0:
        for i, block in enumerate(_kept_blocks(source, keep)):
            yield work(block)
            _tick(progress, i, n)
        return
    pending = deque()
    done = 0
    with ThreadPoolExecutor(workers) as pool:
        try:
            for block in _kept_blocks(source, keep):
                pending.append(pool.submit(work, block))
                if len(pending) > workers:
                    yield pending.popleft().result()
                    _tick(progress, done, n)
                    done += 1
            while pending:
                yield pending.popleft().result()
                _tick(progress, done, n)
                done += 1
        finally:
            for future in pending:
                future.cancel()


def _work_dtype(dtype):
    """float32 data stay float32 (exact and twice as fast); everything else is float64."""
    return np.float32 if np.dtype(dtype) in (np.float32, np.int8, np.uint8, np.int16, np.uint16) else np.float64


def _valid_values(block, covariate):
    """The covariate's valid cells, in reading order; read only (a view of the block when all are valid).

    Boolean indexing is numpy's fastest gather; a block wholly inside the frame needs none.
    """
    if block.all_valid:
        return block.values[covariate].reshape(-1)
    return block.values[covariate][block.valid]


def _column(block, covariate):
    v = _valid_values(block, covariate)
    return v.astype(_work_dtype(v.dtype), copy=False)


# ---------------------------------------------------------------------------
# pass 1: the covariates' range, mean and spread
# ---------------------------------------------------------------------------
@dataclass(frozen=True)
class CovariateSummary:
    """Per covariate over the valid cells; ``sd`` is the population SD (ddof 0)."""

    count: int
    cells_in_frame: int
    minimum: np.ndarray
    maximum: np.ndarray
    mean: np.ndarray
    sd: np.ndarray

    @property
    def cells_nodata(self):
        return self.cells_in_frame - self.count


def covariate_summary(source, progress=None):
    """Count, range, mean and SD of every covariate over the valid cells.

    Block results are merged with the pairwise update of Chan, Golub & LeVeque
    (1983): for parts A, B with counts n, means m and sums of squared deviations
    M2, ``M2 = M2_A + M2_B + (m_B - m_A)^2 n_A n_B / (n_A + n_B)``.
    """
    def work(block):
        cols = [v[block.valid].astype(np.float64, copy=False) for v in block.values]
        nb = cols[0].size if cols else 0
        if not nb:
            return int(np.count_nonzero(block.in_frame)), 0, None
        means = np.array([c.mean() for c in cols])
        return (int(np.count_nonzero(block.in_frame)), nb,
                (np.array([c.min() for c in cols]), np.array([c.max() for c in cols]), means,
                 np.array([np.square(c - m).sum() for c, m in zip(cols, means)])))

    n = 0
    frame = 0
    lo = hi = mean = m2 = None
    for nf, nb, part in map_blocks(source, work, progress):
        frame += nf
        if not nb:
            continue
        bmin, bmax, bmean, bm2 = part
        if n == 0:
            lo, hi, mean, m2 = bmin, bmax, bmean, bm2
        else:
            lo, hi = np.minimum(lo, bmin), np.maximum(hi, bmax)
            delta = bmean - mean
            tot = n + nb
            mean = mean + delta * nb / tot
            m2 = m2 + bm2 + delta**2 * n * nb / tot
        n += nb
    if n == 0:
        return CovariateSummary(0, frame, np.array([]), np.array([]), np.array([]), np.array([]))
    return CovariateSummary(n, frame, lo, hi, mean, np.sqrt(m2 / n))


# ---------------------------------------------------------------------------
# streamed histograms and exact quantiles
# ---------------------------------------------------------------------------
@dataclass(frozen=True)
class Histogram:
    """Equal-width frequency table of the first covariate over [lo, hi].

    Values below ``lo`` count in the first class and values above ``hi`` in the
    last, so the classes hold every cell. ``minimum``/``maximum`` are exact.
    ``block_ranges`` holds, per block of the pass, the class indexes of the
    block's smallest and largest value ((-1, -1) for a block without cells):
    a later pass that needs only some classes can skip the other blocks.
    """

    lo: float
    hi: float
    counts: np.ndarray
    minimum: float
    maximum: float
    block_ranges: np.ndarray = None

    @property
    def edges(self):
        return np.linspace(self.lo, self.hi, self.counts.size + 1)

    @property
    def total(self):
        return int(self.counts.sum())

    def coarsen(self, classes):
        """Merge neighbouring classes down to ``classes`` (must divide the count)."""
        if self.counts.size % classes:
            raise ValueError("classes must divide the number of histogram classes")
        return Histogram(self.lo, self.hi, self.counts.reshape(classes, -1).sum(axis=1), self.minimum, self.maximum)


_SCRATCH = threading.local()


def _scratch(name, n, dtype):
    """A reusable work array of ``n`` items for this thread (valid until the next call with ``name``).

    Fresh large temporaries cost page faults on every block; reusing a few per
    thread keeps the passes close to memory speed.
    """
    pool = getattr(_SCRATCH, "pool", None)
    if pool is None:
        pool = _SCRATCH.pool = {}
    key = (name, np.dtype(dtype).str)
    buf = pool.get(key)
    if buf is None or buf.size < n:
        buf = pool[key] = np.empty(max(n, 1), dtype)
    return buf[:n]


def histogram_class_index(v, lo, hi, bins, reuse=False):
    """Class index of each value, ``floor((v - lo) * bins / (hi - lo))`` clipped to [0, bins-1].

    The arithmetic runs in ``v``'s dtype. Rounded subtraction and multiplication
    by a positive constant are monotone, so the index never decreases as ``v``
    grows; the exact quantile search relies on that, not on exact class edges.
    With ``reuse`` the result lives in this thread's scratch space: use it
    before the next call.
    """
    dt = v.dtype
    scale = dt.type(bins / (hi - lo)) if hi > lo else dt.type(0)
    t = _scratch("class-float", v.size, dt) if reuse else np.empty(v.size, dt)
    np.subtract(v, dt.type(lo), out=t)
    t *= scale
    np.minimum(t, dt.type(bins - 1), out=t)
    np.maximum(t, dt.type(0), out=t)
    if not reuse:
        return t.astype(np.intp)
    out = _scratch("class-index", v.size, np.intp)
    np.copyto(out, t, casting="unsafe")  # truncation, as astype
    return out


def class_counts(v, lo, hi, bins, ends):
    """``numpy.bincount(histogram_class_index(v, lo, hi, bins), minlength=bins)``, faster inside the range.

    ``ends`` holds ``v``'s minimum and maximum. When the unclipped class
    positions ``(v - lo) * bins / (hi - lo)`` of both ends lie in (-1, bins + 1),
    so do all the others (the arithmetic is monotone): truncation to int32 then
    gives every class as the clipped index does, but for position ``bins``,
    counted with the last class; no clipping pass is needed.
    """
    dt = v.dtype
    scale = dt.type(bins / (hi - lo)) if hi > lo else dt.type(0)
    edge = (np.asarray(ends, dt) - dt.type(lo)) * scale
    if not (edge[0] > -1 and edge[1] < bins + 1):
        return np.bincount(histogram_class_index(v, lo, hi, bins, reuse=True), minlength=bins)
    t = _scratch("class-float", v.size, dt)
    np.subtract(v, dt.type(lo), out=t)
    t *= scale
    small = _scratch("class-int32", v.size, np.int32)
    np.copyto(small, t, casting="unsafe")  # truncation, as astype
    index = _scratch("class-index", v.size, np.intp)
    np.copyto(index, small)
    counts = np.bincount(index, minlength=bins + 1)
    counts[bins - 1] += counts[bins]
    return counts[:bins]


def streamed_histogram(source, bins, value_range=None, covariate=0, progress=None):
    """Frequency table of one covariate in one pass over the valid cells.

    Parameters
    ----------
    value_range : (lo, hi), optional
        Range of the classes. Any range works (values outside fall into the end
        classes); without one, a first pass finds the exact minimum and maximum.
    """
    if value_range is None:
        s = covariate_summary(_OneCovariate(source, covariate), scaled_progress(progress, 0, 0.5))
        if s.count == 0:
            return Histogram(0.0, 0.0, np.zeros(bins, np.int64), math.nan, math.nan)
        value_range = (float(s.minimum[0]), float(s.maximum[0]))
        progress = scaled_progress(progress, 0.5, 1)
    lo, hi = float(value_range[0]), float(value_range[1])
    def work(block):
        v = _column(block, covariate)
        if not v.size:
            return None
        ends = np.array([v.min(), v.max()], v.dtype)
        return class_counts(v, lo, hi, bins, ends), float(ends[0]), float(ends[1]), histogram_class_index(ends, lo, hi,
                                                                                                           bins)

    counts = np.zeros(bins, np.int64)
    vmin, vmax = math.inf, -math.inf
    ranges = []
    for part in map_blocks(source, work, progress):
        if part is None:
            ranges.append((-1, -1))
            continue
        counts += part[0]
        vmin, vmax = min(vmin, part[1]), max(vmax, part[2])
        ranges.append(tuple(part[3]))
    return Histogram(lo, hi, counts, vmin, vmax, np.array(ranges, np.int64).reshape(-1, 2))


class _OneCovariate:
    """View of a source restricted to one covariate (validity still uses all)."""

    def __init__(self, source, covariate):
        self.source, self.covariate, self.n_blocks = source, covariate, source.n_blocks

    def blocks(self):
        for b in self.source.blocks():
            yield CellBlock(b.window, (b.values[self.covariate],), b.in_frame, b.valid, b.strata)  # valid of all


def _numpy_lerp(a, b, t):
    """``numpy.quantile``'s interpolation (numpy 1.22+ ``_lerp``), for identical results."""
    diff = b - a
    return np.where(t >= 0.5, b - diff * (1 - t), a + diff * t)


def exact_quantiles(source, probabilities, value_range=None, covariate=0, bins=FINE_BINS,
                    cap=None, progress=None, histogram=None):
    """Exact sample quantiles of a covariate over the valid cells, in bounded memory.

    The result equals ``numpy.quantile(cells, probabilities)`` (linear rule,
    Hyndman & Fan 1996 def. 7: with sorted cells x_(0..n-1) and h = (n-1)p,
    Q(p) = x_(floor h) + (h - floor h)(x_(floor h + 1) - x_(floor h))).

    Two passes of selection by bucketing (a histogram narrows each order
    statistic down to one class, whose cells alone are then kept):

    1. a fine histogram (``bins`` classes) locates the class holding each
       order statistic needed and the rank within that class;
    2. a second pass keeps only the cells of those classes (at most ``cap``
       values in memory) and takes the order statistics with
       ``numpy.partition``.

    A class holding more than its share of ``cap`` cells (heavy ties, or most
    cells in one class) is split again by a finer histogram of its own cells on
    a further pass, until it is small enough or holds a single value.

    Returns
    -------
    quantiles : numpy.ndarray of float64
    histogram : Histogram
        The pass-1 frequency table (reused for the distinct-value check).
    """
    p = np.asarray(probabilities, float)
    cap = SELECTION_CAP if cap is None else int(cap)
    if histogram is None:
        histogram = streamed_histogram(source, bins, value_range, covariate, scaled_progress(progress, 0, 0.5))
    n = histogram.total
    if n == 0:
        raise InputError(message(QT_TRANSLATE_NOOP("PlotwiseEngine",
            "No cell of the frame has a value in every covariate.")))
    h = (n - 1) * p
    low = np.floor(h).astype(np.int64)
    high = np.minimum(low + 1, n - 1)
    ranks = np.unique(np.concatenate([low, high]))
    order_stats = _order_statistics(source, ranks, histogram, covariate, cap,
                                    scaled_progress(progress, 0.5, 1))
    lookup = dict(zip(ranks.tolist(), order_stats))
    a = np.array([lookup[r] for r in low.tolist()], float)
    b = np.array([lookup[r] for r in high.tolist()], float)
    return _numpy_lerp(a, b, h - low), histogram


def _order_statistics(source, ranks, histogram, covariate, cap, progress):
    """Values of the given 0-based ranks (see :func:`exact_quantiles`)."""
    bins = histogram.counts.size
    cum = np.cumsum(histogram.counts)
    # a task: chain of (lo, hi, bins, class) levels, ranks inside the member set
    tasks = []
    for cls in np.unique(np.searchsorted(cum, ranks, side="right")):
        inside = ranks[np.searchsorted(cum, ranks, side="right") == cls]
        start = cum[cls - 1] if cls else 0
        lo, hi = _class_range(histogram.lo, histogram.hi, bins, cls, histogram.minimum, histogram.maximum)
        tasks.append(dict(chain=[(histogram.lo, histogram.hi, bins, int(cls))], ranks=inside - start,
                          count=int(histogram.counts[cls]), range=(lo, hi), ranks_abs=inside))
    result = {}
    level = 0
    while tasks:
        share = max(1, cap // len(tasks))
        for t in tasks:
            t["collect"] = t["count"] <= share or level >= 12
            t["values"], t["hist"], t["min"], t["max"] = [], np.zeros(FINE_BINS, np.int64), math.inf, -math.inf
        level0 = np.zeros(bins, bool)
        level0[[t["chain"][0][3] for t in tasks]] = True
        keep = _blocks_holding(histogram.block_ranges, np.flatnonzero(level0), source.n_blocks)

        near = _class_neighbourhoods(histogram, np.flatnonzero(level0))

        def work(block, tasks=tasks, level0=level0):
            """Per task: the block's member cells (or their sub-histogram), their min and max."""
            v = _column(block, covariate)
            out = []
            if not v.size:
                return out
            v = _cells_near(v, near)
            if not v.size:
                return [None] * len(tasks)
            i0 = histogram_class_index(v, histogram.lo, histogram.hi, bins)
            keep = level0[i0]
            v, i0 = v[keep], i0[keep]
            for t in tasks:
                m = v[i0 == t["chain"][0][3]]
                for lo, hi, nb, cls in t["chain"][1:]:
                    m = m[histogram_class_index(m, lo, hi, nb) == cls]
                if m.size == 0:
                    out.append(None)
                elif t["collect"]:
                    out.append((m, float(m.min()), float(m.max())))
                else:
                    lo, hi = t["range"]
                    sub = np.bincount(histogram_class_index(m, lo, hi, FINE_BINS), minlength=FINE_BINS)
                    out.append((sub, float(m.min()), float(m.max())))
            return out

        for parts in map_blocks(source, work, progress, keep=keep):
            for t, part in zip(tasks, parts):
                if part is None:
                    continue
                data, pmin, pmax = part
                t["min"], t["max"] = min(t["min"], pmin), max(t["max"], pmax)
                if t["collect"]:
                    t["values"].append(data)
                else:
                    t["hist"] += data
        nxt = []
        for t in tasks:
            if t["min"] == t["max"]:
                result.update((int(r), t["min"]) for r in t["ranks_abs"])
            elif t["collect"]:
                vals = np.concatenate(t["values"]).astype(np.float64)
                part = np.partition(vals, t["ranks"])
                result.update((int(r), float(part[k])) for r, k in zip(t["ranks_abs"], t["ranks"]))
            else:
                lo, hi = t["range"]
                sub_cum = np.cumsum(t["hist"])
                where = np.searchsorted(sub_cum, t["ranks"], side="right")
                for cls in np.unique(where):
                    sel = where == cls
                    start = sub_cum[cls - 1] if cls else 0
                    rng = _class_range(lo, hi, FINE_BINS, cls, t["min"], t["max"])
                    nxt.append(dict(chain=t["chain"] + [(lo, hi, FINE_BINS, int(cls))], ranks=t["ranks"][sel] - start,
                                    count=int(t["hist"][cls]), range=rng, ranks_abs=t["ranks_abs"][sel]))
        tasks = nxt
        level += 1
    return [result[int(r)] for r in ranks]


def _class_neighbourhoods(histogram, classes):
    """Value intervals that hold every cell of the given classes: each class widened by a class width and
    four units in the last place on both sides (rounding of the class index), overlapping ones joined."""
    bins = histogram.counts.size
    width = (histogram.hi - histogram.lo) / bins
    slack = width + 4 * float(np.spacing(np.float32(max(abs(histogram.lo), abs(histogram.hi)))))
    lows = np.where(classes > 0, histogram.lo + classes * width - slack, -np.inf)
    highs = np.where(classes < bins - 1, histogram.lo + (classes + 1) * width + slack, np.inf)
    intervals = []
    for a, b in zip(lows, highs):
        if intervals and a <= intervals[-1][1]:
            intervals[-1][1] = max(intervals[-1][1], b)
        else:
            intervals.append([a, b])
    return intervals


def _cells_near(v, intervals):
    """The values of ``v`` inside any of ``intervals`` (a cheap filter before the exact class index)."""
    vmin, vmax = v.min(), v.max()
    inside = None
    for a, b in intervals:
        if b < vmin or a > vmax:
            continue
        m = v >= v.dtype.type(a) if np.isfinite(a) else np.ones(v.shape, bool)
        if np.isfinite(b):
            m &= v <= v.dtype.type(b)
        inside = m if inside is None else (inside | m)
    return v[:0] if inside is None else v[inside]


def _blocks_holding(block_ranges, classes, n_blocks):
    """Which blocks can hold cells of the given classes (None: all, when ranges are unknown).

    Class indexes never decrease with the value, so a block whose smallest and
    largest values fall in classes a and b holds no cell outside [a, b].
    """
    if block_ranges is None or len(block_ranges) != n_blocks:
        return None
    classes = np.sort(np.asarray(classes))
    lo, hi = block_ranges[:, 0], block_ranges[:, 1]
    inside = np.searchsorted(classes, hi, side="right") - np.searchsorted(classes, lo, side="left")
    return (inside > 0) & (lo >= 0)


def _class_range(lo, hi, bins, cls, vmin, vmax):
    width = (hi - lo) / bins
    a = lo + cls * width if cls > 0 else vmin
    b = lo + (cls + 1) * width if cls < bins - 1 else vmax
    a, b = max(a, vmin), min(b, vmax)
    return (a, b) if b > a else (vmin, vmax)


# ---------------------------------------------------------------------------
# boundaries
# ---------------------------------------------------------------------------
def quantile_probabilities(n_strata):
    """Probabilities h/k, h = 1..k-1, of equal-count strata."""
    return np.arange(1, n_strata) / n_strata


def equal_interval_boundaries(minimum, maximum, n_strata):
    """``b_h = min + h (max - min) / k`` for h = 1..k-1."""
    return minimum + (maximum - minimum) * np.arange(1, n_strata) / n_strata


def cum_root_f_boundaries(edges, counts, n_strata):
    """Dalenius–Hodges cumulative root frequency boundaries.

    Dalenius & Hodges (1959), JASA 54:88-101; Cochran (1977) ch. 5A. With J
    classes of frequencies f_j and widths d_j, form ``C_j = sum_{i<=j} sqrt(f_i d_i)``
    (equal widths: ``sqrt(f_i)``). The boundary of stratum h is the upper edge of
    the class whose ``C_j`` lies nearest to ``h C_J / k``, h = 1..k-1.

    Parameters
    ----------
    edges : array of J+1 class edges
    counts : array of J frequencies

    Returns
    -------
    numpy.ndarray of k-1 boundaries (class upper edges), ascending; equal
    targets may pick the same edge, which the caller must merge.
    """
    edges = np.asarray(edges, float)
    f = np.asarray(counts, float)
    widths = np.diff(edges)
    equal = np.allclose(widths, widths[0])
    root = np.sqrt(f) if equal else np.sqrt(f * widths / widths.min())
    cum = np.cumsum(root)
    targets = cum[-1] * np.arange(1, n_strata) / n_strata
    # the nearest C_j among the first J-1 class tops (the last edge closes the range)
    candidates = cum[:-1]
    idx = np.abs(candidates[None, :] - targets[:, None]).argmin(axis=1)
    return edges[idx + 1]


# ---------------------------------------------------------------------------
# k-means
# ---------------------------------------------------------------------------
@dataclass(frozen=True)
class KMeansFit:
    """Lloyd iterations' result on the (standardised) sample."""

    centres: np.ndarray
    initial_centres: np.ndarray
    labels: np.ndarray
    iterations: int
    inertia: float


def _sq_distances(x, centres):
    """Squared Euclidean distances (n, k), computed per centre to keep memory at O(n)."""
    return np.stack([np.square(x - c).sum(axis=1) for c in centres], axis=1)


def kmeans_plusplus(x, n_clusters, rng):
    """k-means++ seeds (Arthur & Vassilvitskii 2007).

    The first centre is a uniformly drawn point; each next one is drawn with
    probability proportional to D(x)^2, the squared distance to the nearest
    centre chosen so far.
    """
    n = x.shape[0]
    centres = [x[rng.integers(n)]]
    d2 = np.square(x - centres[0]).sum(axis=1)
    for _ in range(1, n_clusters):
        total = d2.sum()
        if total <= 0:
            raise InputError(message(QT_TRANSLATE_NOOP("PlotwiseEngine",
                "The covariates take fewer distinct value combinations than strata asked for.")))
        c = x[rng.choice(n, p=d2 / total)]
        centres.append(c)
        np.minimum(d2, np.square(x - c).sum(axis=1), out=d2)
    return np.array(centres, float)


def lloyd_kmeans(x, initial_centres, max_iter=300):
    """Lloyd (1982) iterations until no point changes cluster (or ``max_iter``).

    Each point goes to its nearest centre (lowest index on ties); each centre
    moves to the mean of its points. An emptied cluster takes the point
    farthest from its own centre.
    """
    centres = np.array(initial_centres, float, copy=True)
    k = centres.shape[0]
    labels = None
    it = 0
    for it in range(1, max_iter + 1):
        d2 = _sq_distances(x, centres)
        new = d2.argmin(axis=1)
        if labels is not None and np.array_equal(new, labels):
            break
        labels = new
        counts = np.bincount(labels, minlength=k)
        for j in np.flatnonzero(counts == 0):
            far = d2[np.arange(x.shape[0]), labels].argmax()
            labels[far] = j
            counts = np.bincount(labels, minlength=k)
        for d in range(x.shape[1]):
            centres[:, d] = np.bincount(labels, weights=x[:, d], minlength=k) / counts
    d2 = _sq_distances(x, centres)
    labels = d2.argmin(axis=1)
    return KMeansFit(centres, np.array(initial_centres, float), labels, it, float(d2.min(axis=1).sum()))


def cell_sample(source, n_cells, size, rng, progress=None):
    """A simple random sample without replacement of ``size`` valid cells (all if fewer).

    The ranks of the sampled cells in reading order are drawn first
    (``rng.choice``), then one pass picks them up. Returns an (m, n_covariates)
    float64 array in reading order.
    """
    if size >= n_cells:
        picks = None
    else:
        picks = np.sort(rng.choice(n_cells, size=size, replace=False))
    rows = []
    offset = 0
    for i, block in enumerate(source.blocks()):
        cols = [block.values[c][block.valid] for c in range(len(block.values))]
        nb = cols[0].size
        if nb:
            if picks is None:
                sel = slice(None)
            else:
                a, b = np.searchsorted(picks, [offset, offset + nb])
                sel = picks[a:b] - offset
            rows.append(np.column_stack([c[sel].astype(np.float64) for c in cols]))
        offset += nb
        _tick(progress, i, source.n_blocks)
    return np.concatenate(rows) if rows else np.empty((0, 0))


# ---------------------------------------------------------------------------
# assignment rules
# ---------------------------------------------------------------------------
@dataclass(frozen=True)
class ThresholdRule:
    """Stratum h holds ``b_{h-1} <= x < b_h`` of one covariate (b_0 = -inf, b_k = +inf)."""

    boundaries: np.ndarray
    covariate: int = 0

    @property
    def n_strata(self):
        return len(self.boundaries) + 1

    def assign(self, columns):
        """Stratum id per valid cell; ``columns`` holds each covariate's valid cells."""
        v = columns[self.covariate]
        v = v.astype(_work_dtype(v.dtype), copy=False)
        if len(self.boundaries) <= 16:
            ids = np.ones(v.size, np.uint8)
            for b in self.boundaries:
                ids += v >= exact_threshold(b, v.dtype)
            return ids
        return (np.searchsorted(self.boundaries, v, side="right") + 1).astype(np.uint16)


def exact_threshold(b, dtype):
    """The smallest value t of ``dtype`` with t >= b, so that ``v >= t`` equals ``v >= b`` exactly.

    Comparing a float32 array with a float64 scalar would otherwise round the
    scalar to float32 first (numpy's value-based casting) and misplace cells
    that lie between the two.
    """
    t = np.dtype(dtype).type(b)
    if float(t) < b:
        t = np.nextafter(t, np.dtype(dtype).type(np.inf))
    return t


@dataclass(frozen=True)
class NearestCentreRule:
    """Nearest centre in covariates standardised by ``(x - mean) / sd``."""

    centres: np.ndarray
    mean: np.ndarray
    sd: np.ndarray

    @property
    def n_strata(self):
        return self.centres.shape[0]

    def assign(self, columns):
        """Stratum id per valid cell; ``columns`` holds each covariate's valid cells."""
        n = columns[0].size
        best = np.full(n, np.inf)
        ids = np.ones(n, np.uint8)
        z = [(col.astype(np.float64) - m) / sd for col, m, sd in zip(columns, self.mean, self.sd)]
        for j, c in enumerate(self.centres):
            d2 = np.zeros(n)
            for d in range(len(z)):
                d2 += np.square(z[d] - c[d])
            closer = d2 < best
            best[closer] = d2[closer]
            ids[closer] = j + 1
        return ids


@dataclass(frozen=True)
class ClassRule:
    """Stratum h holds the cells whose first covariate equals ``classes[h-1]``."""

    classes: np.ndarray
    covariate: int = 0

    @property
    def n_strata(self):
        return len(self.classes)

    def assign(self, columns):
        """Stratum id per valid cell; ``columns`` holds each covariate's valid cells."""
        v = columns[self.covariate]
        return (np.searchsorted(self.classes, v) + 1).astype(np.uint8)


# ---------------------------------------------------------------------------
# per-stratum statistics
# ---------------------------------------------------------------------------
@dataclass(frozen=True)
class StratumStatistics:
    """Cell counts and covariate statistics per stratum (rows = strata 1..k).

    ``mean``, ``sd``, ``minimum``, ``maximum`` are (k, n_covariates); ``sd`` is
    the population SD of the stratum's cells (ddof 0). ``chart_counts`` is a
    (k, CHART_BINS) histogram of the first covariate per stratum over
    ``chart_range``. ``cells_in_frame`` counts every frame cell of the grid,
    with or without values.
    """

    count: np.ndarray
    mean: np.ndarray
    sd: np.ndarray
    minimum: np.ndarray
    maximum: np.ndarray
    chart_range: tuple
    chart_counts: np.ndarray
    cells_in_frame: int = 0

    @property
    def n_strata(self):
        return self.count.size

    @property
    def total(self):
        return int(self.count.sum())

    def overall_mean(self):
        return (self.count[:, None] * self.mean).sum(axis=0) / self.total

    def overall_sd(self):
        """Population SD of all cells, from the strata: total SS = within SS + between SS."""
        m = self.overall_mean()
        ss = (self.count[:, None] * (self.sd**2 + (self.mean - m) ** 2)).sum(axis=0)
        return np.sqrt(ss / self.total)

    def r_squared(self):
        """Share of each covariate's variance explained by the strata.

        ``R^2 = 1 - sum_h N_h S_h^2 / (N S^2)`` with population variances: the
        between-strata sum of squares over the total sum of squares (one-way
        analysis of variance). Cochran (1977) ch. 5 shows the variance of the
        stratified mean under proportional allocation shrinks by this share.
        """
        within = (self.count[:, None] * self.sd**2).sum(axis=0)
        total = self.total * self.overall_sd() ** 2
        with np.errstate(invalid="ignore", divide="ignore"):
            return np.where(total > 0, 1 - within / total, np.nan)

    def reordered(self, order):
        """Rows taken in ``order`` (an index array)."""
        o = np.asarray(order)
        return StratumStatistics(self.count[o], self.mean[o], self.sd[o], self.minimum[o], self.maximum[o],
                                 self.chart_range, self.chart_counts[o], self.cells_in_frame)


def accumulate_statistics(source, n_strata, rule=None, write=None, shift=None, chart_range=None,
                          extremes=True, progress=None):
    """One pass: assign cells to strata (if ``rule``) or read ``block.strata``, and sum up.

    Per stratum h and covariate x: N_h, sum(x - c), sum((x - c)^2) and, with
    ``extremes``, min and max; c = ``shift`` is close to the covariate's mean so
    that ``S_h^2 = sum((x-c)^2)/N_h - (sum(x-c)/N_h)^2`` keeps its precision.

    Parameters
    ----------
    rule : ThresholdRule, NearestCentreRule or ClassRule, optional
        Without a rule the source must carry a stratum raster.
    write : callable ``write(window, ids)``, optional
        Receives each block's stratum ids (uint8/uint16, 0 = no stratum).
    chart_range : (lo, hi), optional
        Range of the per-stratum histogram of the first covariate.
    extremes : bool
        Also track each stratum's minimum and maximum (NaN otherwise). Threshold
        strata are bounded by their boundaries, so the quantile path skips it.

    Returns
    -------
    StratumStatistics
    """
    k = int(n_strata)

    def work(block):
        return _block_sums(block, k, rule, shift, chart_range, extremes, write is not None)

    s1 = s2 = mn = mx = None
    count = np.zeros(k + 1, np.int64)
    chart = np.zeros((k + 1) * CHART_BINS, np.int64)
    frame = 0
    for window, full, part in map_blocks(source, work, progress):
        if write is not None and full is not None:
            write(window, full)
        nf, bcount, bs1, bs2, bmn, bmx, bchart = part
        frame += nf
        if bs1 is None:
            continue
        if s1 is None:
            s1, s2 = np.zeros_like(bs1), np.zeros_like(bs2)
            mn, mx = np.full_like(bs1, np.inf), np.full_like(bs1, -np.inf)
        count += bcount
        s1 += bs1
        s2 += bs2
        if bmn is not None:
            np.minimum(mn, bmn, out=mn)
            np.maximum(mx, bmx, out=mx)
        if bchart is not None:
            chart += bchart
    if s1 is None and frame == 0:
        raise InputError(message(QT_TRANSLATE_NOOP("PlotwiseEngine", "The frame holds no raster cell.")))
    if s1 is None:
        ncov = _n_covariates(source)
        s1, s2 = np.zeros((ncov, k + 1)), np.zeros((ncov, k + 1))
        mn, mx = np.full((ncov, k + 1), np.inf), np.full((ncov, k + 1), -np.inf)
    shift = np.zeros(s1.shape[0]) if shift is None else np.asarray(shift, float)
    with np.errstate(invalid="ignore", divide="ignore"):
        n = count[1:].astype(float)
        m = s1[:, 1:] / n
        var = np.maximum(s2[:, 1:] / n - m**2, 0.0)
        lo = np.where(np.isfinite(mn[:, 1:]), mn[:, 1:] + shift[:, None], np.nan)
        hi = np.where(np.isfinite(mx[:, 1:]), mx[:, 1:] + shift[:, None], np.nan)
    return StratumStatistics(count[1:], (m + shift[:, None]).T, np.sqrt(var).T, lo.T, hi.T,
                             tuple(chart_range) if chart_range is not None else (math.nan, math.nan),
                             chart.reshape(k + 1, CHART_BINS)[1:], frame)


def _n_covariates(source):
    for block in source.blocks():
        return len(block.values)
    return 0


def _block_sums(block, k, rule, shift, chart_range, extremes, want_ids):
    """One block's share of :func:`accumulate_statistics`: ``(window, ids or None, sums)``.

    ``sums`` = (frame cells, N_h, sum(x-c), sum((x-c)^2), min-c, max-c, chart);
    the arrays are (n_covariates, k+1) with column 0 for "no stratum".
    """
    ncov = len(block.values)
    c0 = np.zeros(ncov) if shift is None else np.asarray(shift, float)
    nf = int(np.count_nonzero(block.in_frame))
    cols = [_valid_values(block, c) for c in range(ncov)]
    n = cols[0].size
    full = None
    if n == 0:
        if want_ids and rule is not None:
            full = np.zeros(block.valid.shape, np.uint8)
        return block.window, full, (nf, None, None, None, None, None, None)
    if rule is not None:
        ids = rule.assign(cols)
        if want_ids:
            full = block.spread(ids)
    else:
        ids = block.strata[block.valid]
        if ids.max() > k:
            raise ValueError("stratum raster holds ids beyond n_strata")
    count, s1, s2, mn, mx = stratum_sums(ids, cols, c0, k, extremes)
    chart = None
    if chart_range is not None:
        v0 = cols[0].astype(_work_dtype(cols[0].dtype), copy=False)
        cls = histogram_class_index(v0, chart_range[0], chart_range[1], CHART_BINS)
        cls += ids.astype(np.intp) * CHART_BINS
        chart = np.bincount(cls, minlength=(k + 1) * CHART_BINS)
    return block.window, full, (nf, count, s1, s2, mn, mx, chart)


def run_starts(ids):
    """Index of the first cell of each run (a stretch of equal ids) of a 1-D array."""
    starts = np.flatnonzero(ids[1:] != ids[:-1])
    starts += 1
    return np.concatenate([np.zeros(1, starts.dtype), starts]) if ids.size else starts


def stratum_sums(ids, cols, shift, k, extremes=False):
    """Per stratum h and covariate x: N_h, sum(x - c), sum((x - c)^2) and, with ``extremes``, min and max - c.

    ``ids`` and each of ``cols`` hold the same cells in reading order, where a
    stratum's cells lie in runs (stretches of one id, long on a smooth
    covariate): each run is summed with ``numpy.add.reduceat`` and the runs'
    sums are added up per stratum (``numpy.bincount``), far cheaper than one
    masked sum per stratum. Arrays are (n_covariates, k+1), column 0 for id 0.
    """
    ncov, n = len(cols), ids.size
    starts = run_starts(ids)
    run_ids = ids[starts].astype(np.intp)
    lengths = np.diff(np.append(starts, n))
    count = np.bincount(run_ids, weights=lengths, minlength=k + 1).astype(np.int64)
    s1, s2 = np.zeros((ncov, k + 1)), np.zeros((ncov, k + 1))
    mn = mx = None
    if extremes:
        mn, mx = np.full((ncov, k + 1), np.inf), np.full((ncov, k + 1), -np.inf)
        present = np.flatnonzero(count)
        order = np.argsort(run_ids.astype(np.uint16), kind="stable")  # radix sort for small integer ids
        firsts = np.concatenate([[0], np.cumsum(np.bincount(run_ids, minlength=k + 1)[present])[:-1]])
    x = _scratch("x", n, np.float64)
    for c in range(ncov):
        np.subtract(cols[c], shift[c], out=x, dtype=np.float64)
        if extremes:
            mn[c, present] = np.minimum.reduceat(np.minimum.reduceat(x, starts)[order], firsts)
            mx[c, present] = np.maximum.reduceat(np.maximum.reduceat(x, starts)[order], firsts)
        s1[c] = np.bincount(run_ids, weights=np.add.reduceat(x, starts), minlength=k + 1)
        np.multiply(x, x, out=x)
        s2[c] = np.bincount(run_ids, weights=np.add.reduceat(x, starts), minlength=k + 1)
    return count, s1, s2, mn, mx


@dataclass(frozen=True)
class CellMoves:
    """Runs of cells (stretches along one row of the grid) that moved from one stratum to another.

    ``first`` is the flat index (row × ``width`` + column) of each run's first
    cell on the source's grid, in increasing order; ``length`` its cells; ``old``
    and ``new`` the stratum ids (1..k) before and after.
    """

    width: int
    first: np.ndarray
    length: np.ndarray
    old: np.ndarray
    new: np.ndarray

    @property
    def cells(self):
        return int(np.sum(self.length))

    def cells_in(self, window):
        """The moved cells inside ``window`` (xoff, yoff, xsize, ysize): flat indexes in it, old and new ids."""
        x0, y0, xs, ys = (int(v) for v in window)
        a, b = np.searchsorted(self.first, [y0 * self.width, (y0 + ys) * self.width])
        row, col = np.divmod(self.first[a:b], self.width)
        c0, c1 = np.maximum(col, x0), np.minimum(col + self.length[a:b], x0 + xs)
        ok = c1 > c0
        lengths = (c1 - c0)[ok]
        start = (row[ok] - y0) * xs + (c0[ok] - x0)
        flat = np.repeat(start - np.cumsum(lengths) + lengths, lengths) + np.arange(int(lengths.sum()))
        return flat, np.repeat(self.old[a:b][ok], lengths), np.repeat(self.new[a:b][ok], lengths)


def statistics_after_moves(source, statistics, moves, histogram=None, progress=None):
    """Per-stratum statistics after ``moves`` (:class:`CellMoves`) changed some cells' stratum, from those cells.

    With c the overall mean, S1_h = sum(x - c) = N_h (mean_h - c) and
    S2_h = sum((x - c)^2) = N_h (sd_h^2 + (mean_h - c)^2) over stratum h: a
    moved cell's 1, x - c and (x - c)^2 leave its old stratum's sums and join
    the new one's, and so does its count in the report's histogram (by its fine
    class of ``histogram`` as :func:`chart_from_histogram` bins, else by its
    value over the chart range). Only the blocks holding moved cells are read
    (sources with a ``windows()`` method). A minimum and maximum cannot be
    updated this way: ``statistics`` must have none (threshold rules).
    """
    k, shift = statistics.n_strata, statistics.overall_mean()
    windows = list(source.windows()) if hasattr(source, "windows") else None
    keep = None if windows is None else np.array([moves.cells_in(w)[0].size > 0 for w in windows], bool)
    bins = statistics.chart_counts.shape[1]
    chart_of_fine = None if histogram is None else chart_classes(histogram, statistics.chart_range, bins)

    def work(block):
        flat, old, new = moves.cells_in(block.window)
        if not flat.size:
            return None
        old, new = old.astype(np.intp), new.astype(np.intp)
        xs = [block.values[c].reshape(-1)[flat] for c in range(len(block.values))]
        x = [v.astype(np.float64) - shift[c] for c, v in enumerate(xs)]
        v0 = xs[0].astype(_work_dtype(xs[0].dtype), copy=False)
        if chart_of_fine is None:
            cls = histogram_class_index(v0, statistics.chart_range[0], statistics.chart_range[1], bins)
        else:
            cls = chart_of_fine[histogram_class_index(v0, histogram.lo, histogram.hi, histogram.counts.size)]

        def change(weights=None, by=None, size=k + 1):
            to, fro = (new, old) if by is None else (new * bins + by, old * bins + by)
            return np.bincount(to, weights, minlength=size) - np.bincount(fro, weights, minlength=size)
        return (change(), np.array([change(d) for d in x]), np.array([change(d * d) for d in x]),
                change(by=cls, size=(k + 1) * bins))

    dn, ds1, ds2 = np.zeros(k + 1, np.int64), np.zeros((len(shift), k + 1)), np.zeros((len(shift), k + 1))
    dchart = np.zeros((k + 1) * bins, np.int64)
    for part in map_blocks(source, work, progress, keep=keep):
        if part is not None:
            dn += part[0]
            ds1 += part[1]
            ds2 += part[2]
            dchart += part[3]
    return _statistics_with_changes(statistics, shift, dn[1:], ds1[:, 1:].T, ds2[:, 1:].T,
                                    dchart.reshape(k + 1, bins)[1:])


def _statistics_with_changes(statistics, shift, dn, ds1, ds2, dchart):
    """Statistics with changes of N_h, S1_h and S2_h (:func:`statistics_after_moves`) added."""
    n0 = statistics.count.astype(float)[:, None]
    dev = np.where(n0 > 0, statistics.mean - shift, 0.0)
    s1 = n0 * dev + ds1
    s2 = n0 * (np.where(n0 > 0, statistics.sd**2, 0.0) + dev**2) + ds2
    count = statistics.count + dn
    with np.errstate(invalid="ignore", divide="ignore"):
        m = s1 / count[:, None]
        var = np.maximum(s2 / count[:, None] - m**2, 0.0)
    return StratumStatistics(count, m + shift, np.sqrt(var), statistics.minimum, statistics.maximum,
                             statistics.chart_range, statistics.chart_counts + dchart, statistics.cells_in_frame)


def stratum_order(statistics):
    """Lookup table old id -> new id: non-empty strata renumbered 1..m by first-covariate mean.

    Entry 0 stays 0; empty strata map to 0. Also returns the old (0-based)
    index of each new stratum.
    """
    k = statistics.n_strata
    keep = np.flatnonzero(statistics.count > 0)
    order = keep[np.argsort(statistics.mean[keep, 0], kind="stable")]
    lut = np.zeros(k + 1, np.int64)
    lut[order + 1] = np.arange(1, order.size + 1)
    return lut, order


# ---------------------------------------------------------------------------
# patches below the minimum area
# ---------------------------------------------------------------------------
@dataclass(frozen=True, eq=False)
class PatchMerge:
    """Result of :func:`merge_patch_graph`.

    Attributes
    ----------
    strata : ndarray of int
        The stratum of every patch after merging.
    merged : int
        Patches that changed stratum.
    left : ndarray of int
        The patches (indices; each the representative of its merged group) still
        below the minimum: they touch no patch of another stratum.
    left_cells : ndarray of int
        The cells of each of ``left``.
    patches : int
        Patches after merging (each group of joined patches counts once).
    """

    strata: np.ndarray
    merged: int
    left: np.ndarray
    left_cells: np.ndarray
    patches: int = -1


def merge_patch_graph(sizes, strata, pairs, shared, min_cells):
    """Merge patches below ``min_cells`` with a neighbouring stratum, smallest patch first.

    A patch is a 4-connected group of cells of one stratum; two patches are
    neighbours when they share cell edges (they then belong to different
    strata). "Join the largest neighbour" (GDAL's sieve) fails on a mosaic of
    small patches: with no big neighbour it merges nothing, and once one patch
    has grown past the minimum it swallows the whole mosaic, strata and all.

    The rule (our choice): the smallest patch below the minimum (ties: the
    lowest index) takes the stratum of a neighbour. Taking stratum s joins it
    with all its neighbours of stratum s into one patch; the stratum chosen is
    the one whose joined patch is the smallest that reaches the minimum, so
    that as few cells as possible are tied together and the map's pattern is
    kept; when no stratum gets there, the one whose joined patch is largest.
    Ties: the longest boundary shared with the stratum, then the lowest patch
    index. Sizes and neighbours are updated and the next smallest patch
    follows, until every patch reaches the minimum or touches no other stratum.
    The fixed order makes the result deterministic.

    Parameters
    ----------
    sizes : array_like of int
        Cells per patch (a patch of 0 cells, e.g. index 0 for "no stratum", is ignored).
    strata : array_like of int
        Stratum of each patch.
    pairs : array_like of int, shape (m, 2)
        Neighbouring patches (indices), each pair once.
    shared : array_like of int, shape (m,)
        Cell edges each pair shares.
    min_cells : int

    Returns
    -------
    PatchMerge
    """
    import heapq

    graph = _PatchGraph(sizes, strata, pairs, shared)
    heap = [(graph.size[i], i) for i in range(graph.n) if 0 < graph.size[i] < min_cells]
    heapq.heapify(heap)
    left = []
    while heap:
        cells, p = heapq.heappop(heap)
        if graph.parent[p] != p or graph.size[p] != cells:
            continue  # merged away, or grown since it was queued
        if not graph.neighbours[p]:
            left.append(p)
            continue
        root = graph.take_stratum(p, graph.preferred_stratum(p, min_cells))
        if graph.size[root] < min_cells:
            heapq.heappush(heap, (graph.size[root], root))
    final = np.array([graph.stratum[graph.find(i)] for i in range(graph.n)], dtype=np.int64)
    left = [p for p in left if graph.parent[p] == p]
    return PatchMerge(final, int(np.count_nonzero(final != np.asarray(strata).ravel())),
                      np.asarray(left, dtype=np.int64), np.asarray([graph.size[p] for p in left], dtype=np.int64),
                      graph.groups())


@dataclass(frozen=True, eq=False)
class PatchGroups:
    """Patches joined into groups by :func:`sieve_patch_graph` (index 0 is "no patch" throughout).

    Attributes
    ----------
    group : ndarray of int
        The group of every patch of the input.
    sizes, strata : ndarray of int
        Cells and stratum of every group.
    pairs, shared : ndarray of int
        Neighbouring groups (each pair once, of two strata) and the cell edges they share.
    """

    group: np.ndarray
    sizes: np.ndarray
    strata: np.ndarray
    pairs: np.ndarray
    shared: np.ndarray

    @property
    def n_patches(self):
        return int(np.count_nonzero(self.sizes))


def sieve_patch_graph(sizes, strata, pairs, shared, threshold):
    """Patches below ``threshold`` cells join their largest neighbour, all at once, in rounds (vectorised).

    The rule of GDAL's sieve filter on a patch graph: each patch below the
    threshold points at its largest neighbour (ties: the lowest index), if that
    one is larger than itself; chains are followed to their end (pointer
    jumping), and every patch takes the stratum at the end of its chain.
    Groups of one stratum that now touch are one patch. Rounds repeat until no
    group below the threshold has a larger neighbour. A patch with no neighbour
    stays as it is.

    Parameters
    ----------
    sizes, strata : array_like of int
        Per patch; index 0 (size 0) is "no patch".
    pairs, shared : array_like of int
        Neighbouring patches (each pair once) and the cell edges they share.

    Returns
    -------
    PatchGroups
        Groups numbered by their lowest patch index, so the numbering keeps the patches' order.
    """
    groups = PatchGroups(np.arange(len(sizes)), np.asarray(sizes, np.int64), np.asarray(strata, np.int64),
                         np.asarray(pairs, np.int64).reshape(-1, 2), np.asarray(shared, np.int64))
    while True:
        target = _largest_larger_neighbour(groups, threshold)
        if target is None:
            return groups
        groups = _contract(groups, target)


def _largest_larger_neighbour(groups, threshold):
    """Per group, the group it joins (itself when none): its largest neighbour, for groups below ``threshold``."""
    n = groups.sizes.size
    key = groups.sizes * n + (n - 1 - np.arange(n))  # larger first, then the lower index
    src = np.concatenate([groups.pairs[:, 0], groups.pairs[:, 1]])
    dst = np.concatenate([groups.pairs[:, 1], groups.pairs[:, 0]])
    keep = (groups.sizes[src] < threshold) & (groups.sizes[src] > 0) & (key[dst] > key[src])
    if not keep.any():
        return None
    src, dst = src[keep], dst[keep]
    order = np.lexsort((key[dst], src))
    src, dst = src[order], dst[order]
    last = np.r_[src[1:] != src[:-1], True]
    target = np.arange(n)
    target[src[last]] = dst[last]
    while True:  # chains end where a group points at itself (keys grow along a chain: no cycle)
        nxt = target[target]
        if np.array_equal(nxt, target):
            return target
        target = nxt


def _contract(groups, target):
    """Groups joined into their targets, then groups of one stratum that touch joined too; renumbered."""
    from scipy.sparse import coo_matrix
    from scipy.sparse.csgraph import connected_components

    n = groups.sizes.size
    strata = groups.strata[target]
    a, b = target[groups.pairs[:, 0]], target[groups.pairs[:, 1]]
    same = (a != b) & (strata[a] == strata[b])
    _, comp = connected_components(coo_matrix((np.ones(int(same.sum()), np.int8), (a[same], b[same])), shape=(n, n)),
                                   directed=False)
    root = comp[target]
    lowest = np.full(comp.max() + 1, n, np.int64)
    np.minimum.at(lowest, root, np.arange(n))
    used = np.unique(root)
    rank = np.empty(comp.max() + 1, np.int64)
    rank[used[np.argsort(lowest[used], kind="stable")]] = np.arange(used.size)
    new = rank[root]
    sizes = np.bincount(new, weights=groups.sizes, minlength=used.size).astype(np.int64)
    new_strata = np.zeros(used.size, np.int64)
    new_strata[new] = strata
    a, b = new[groups.pairs[:, 0]], new[groups.pairs[:, 1]]
    other = a != b
    lo, hi = np.minimum(a[other], b[other]), np.maximum(a[other], b[other])
    codes, inverse = np.unique(lo * used.size + hi, return_inverse=True)
    shared = np.bincount(inverse, weights=groups.shared[other], minlength=codes.size).astype(np.int64)
    pairs = np.column_stack([codes // used.size, codes % used.size])
    return PatchGroups(new[groups.group], sizes, new_strata, pairs, shared)


class _PatchGraph:
    """Patches (nodes) and the cell edges neighbouring patches share; merged groups kept by union-find.

    ``size``, ``stratum`` and ``neighbours`` (patch -> shared edges) are those of
    each group's root.
    """

    def __init__(self, sizes, strata, pairs, shared):
        self.size = [int(v) for v in np.asarray(sizes).ravel()]
        self.stratum = [int(v) for v in np.asarray(strata).ravel()]
        self.n = len(self.size)
        self.parent = list(range(self.n))
        self.neighbours = [dict() for _ in range(self.n)]
        for (a, b), length in zip(np.asarray(pairs, dtype=np.int64).reshape(-1, 2).tolist(),
                                  np.asarray(shared).ravel().tolist()):
            if a != b:
                self.neighbours[a][b] = self.neighbours[a].get(b, 0) + int(length)
                self.neighbours[b][a] = self.neighbours[b].get(a, 0) + int(length)

    def find(self, i):
        parent = self.parent
        root = i
        while parent[root] != root:
            root = parent[root]
        while parent[i] != root:
            parent[i], i = root, parent[i]
        return root

    def join(self, target, other):
        """``other`` (a root) into ``target``'s stratum: the root with more neighbours absorbs the other."""
        nb = self.neighbours
        keep, gone = (target, other) if len(nb[target]) >= len(nb[other]) else (other, target)
        self.parent[gone] = keep
        self.size[keep] += self.size[gone]
        self.stratum[keep] = self.stratum[target]
        for x, length in nb[gone].items():
            del nb[x][gone]
            if x == keep:
                continue
            nb[keep][x] = nb[keep].get(x, 0) + length
            nb[x][keep] = nb[x].get(keep, 0) + length
        nb[gone] = {}
        return keep

    def preferred_stratum(self, p, min_cells):
        """The neighbouring stratum whose joined patch is the smallest reaching ``min_cells`` (else the largest).

        Ties: the longest shared boundary, then the lowest neighbour index.
        """
        options = {}  # stratum -> [joined size, shared boundary, lowest neighbour]
        for x, length in self.neighbours[p].items():
            entry = options.setdefault(self.stratum[x], [self.size[p], 0, x])
            entry[0] += self.size[x]
            entry[1] += length
            entry[2] = min(entry[2], x)

        def preference(item):
            joined, boundary, lowest = item[1]
            reaches = joined >= min_cells
            return (reaches, -joined if reaches else joined, boundary, -lowest)

        return max(options.items(), key=preference)[0]

    def take_stratum(self, p, chosen):
        """Patch ``p`` joins all its neighbours of stratum ``chosen``; returns the root of the joined patch."""
        root = p
        for x in [x for x in self.neighbours[p] if self.stratum[x] == chosen]:
            root = self.join(x, root)
        return root

    def groups(self):
        """Patches after merging: roots of at least one cell."""
        return sum(1 for i in range(self.n) if self.parent[i] == i and self.size[i] > 0)


# ---------------------------------------------------------------------------
# the whole job
# ---------------------------------------------------------------------------
@dataclass(frozen=True)
class Stratification:
    """Result of :func:`stratify_cells`.

    ``lut`` maps the provisional ids written during assignment to the final
    ids (identity when nothing was reordered or dropped); the caller applies
    it to the stratum raster when ``needs_remap``. ``statistics`` is already in
    the final order; ``provisional`` gives each final stratum's 0-based index
    in ``rule`` (its boundaries, centre or class).
    """

    method: int
    rule: object
    boundaries: np.ndarray
    statistics: StratumStatistics
    lut: np.ndarray
    provisional: np.ndarray
    cells_valid: int
    n_distinct: int
    sample_size: int
    value_range: tuple
    kmeans: KMeansFit = None
    warnings: tuple = field(default_factory=tuple)
    histogram: Histogram = None
    """Threshold methods: the fine histogram of the first covariate (:func:`statistics_after_moves` uses it)."""

    @property
    def n_strata(self):
        return self.statistics.n_strata

    @property
    def needs_remap(self):
        return not np.array_equal(self.lut, np.arange(self.lut.size))

    @property
    def cells_in_frame(self):
        return self.statistics.cells_in_frame

    @property
    def cells_nodata(self):
        return self.cells_in_frame - self.cells_valid

    def with_statistics(self, statistics, provisional=None):
        """The same result with statistics recounted (e.g. after sieving); ids are now final.

        ``provisional`` replaces the rule index of each stratum when the
        recount dropped or reordered strata.
        """
        k = statistics.n_strata
        prov = self.provisional if provisional is None else np.asarray(provisional)
        return Stratification(self.method, self.rule, self.boundaries, statistics, np.arange(k + 1),
                              prov, statistics.total, self.n_distinct, self.sample_size, self.value_range,
                              self.kmeans, self.warnings, self.histogram)


def count_distinct(source, cap, covariate=0, progress=None):
    """Distinct values of a covariate over the valid cells, stopping once more than ``cap`` are seen.

    Returns ``(number, values)``; the number is exact when it is at most ``cap``.
    """
    seen = np.empty(0)
    for i, block in enumerate(source.blocks()):
        v = block.values[covariate][block.valid]
        if v.size:
            seen = np.union1d(seen, np.unique(v))
            if seen.size > cap:
                return seen.size, seen
        _tick(progress, i, source.n_blocks)
    return seen.size, seen


def _constant_error(name, value):
    return InputError(message(QT_TRANSLATE_NOOP("PlotwiseEngine",
        "Covariate '{name}' is constant ({value:g}) over the frame: it cannot define strata. "
        "Use another covariate, or check the frame and the raster."), name=name, value=value))


@dataclass(frozen=True)
class _StratifyInput:
    """Validated arguments of :func:`stratify_cells`."""

    method: int
    n_strata: int
    names: tuple
    rng: object
    sample_size: int


def _stratify_iv(method, n_strata, names, rng, sample_size):
    if method not in (QUANTILE, EQUAL_INTERVAL, CUM_ROOT_F, KMEANS, RASTER_CLASSES):
        raise InputError(message(QT_TRANSLATE_NOOP("PlotwiseEngine",
            "Unknown METHOD {method!r}: use 0 (quantile) to 4 (raster classes)."), method=method))
    k = int(n_strata)
    if method != RASTER_CLASSES and k < 2:
        raise InputError(message(QT_TRANSLATE_NOOP("PlotwiseEngine", "Ask for at least 2 strata (STRATA).")))
    if method == KMEANS and rng is None:
        raise ValueError("k-means needs rng")
    return _StratifyInput(method, k, tuple(names), rng, int(sample_size))


def _no_cell_error(names):
    return InputError(message(QT_TRANSLATE_NOOP("PlotwiseEngine",
        "No cell of the frame has a value in every covariate ({names}). Check that the "
                              "rasters cover the frame and that their NoData value is right."),
                              names=", ".join(names)))


@dataclass(frozen=True)
class _FirstPass:
    """What the first pass over the cells found: the first covariate's range, the shift for the sums."""

    vmin: float
    vmax: float
    shift: np.ndarray
    summary: CovariateSummary = None
    histogram: Histogram = None


def _first_pass(source, inp, value_range, progress):
    """Quantile: the fine histogram (exact range included); other methods: every covariate's summary.

    Raises InputError for no valid cell and a constant first covariate (k-means: any constant covariate).
    """
    if inp.method == QUANTILE:
        hist = streamed_histogram(source, FINE_BINS, value_range, 0, progress)
        if hist.total == 0:
            raise _no_cell_error(inp.names)
        shift = np.zeros(len(inp.names))
        shift[0] = 0.5 * (hist.minimum + hist.maximum)
        first = _FirstPass(hist.minimum, hist.maximum, shift, histogram=hist)
    else:
        summ = covariate_summary(source, progress)
        if summ.count == 0:
            raise _no_cell_error(inp.names)
        first = _FirstPass(float(summ.minimum[0]), float(summ.maximum[0]), summ.mean, summary=summ)
        if inp.method == KMEANS:
            for c, nm in enumerate(inp.names):
                if summ.minimum[c] == summ.maximum[c]:
                    raise _constant_error(nm, summ.minimum[c])
    if first.vmin == first.vmax:
        raise _constant_error(inp.names[0], first.vmin)
    return first


def _threshold_rule(source, inp, first, progress, warnings):
    """Boundaries on the first covariate (quantile, equal interval, cum sqrt(f)): ``(rule, histogram, n_distinct)``."""
    k, name0 = inp.n_strata, inp.names[0]
    hist = first.histogram
    if hist is None:
        hist = streamed_histogram(source, FINE_BINS, (first.vmin, first.vmax), 0, scaled_progress(progress, 0, 0.4))
    n_distinct = int(np.count_nonzero(hist.counts))  # a lower bound, enough when >= k
    if n_distinct < k:
        n_distinct, _ = count_distinct(source, k)
        if n_distinct < k:
            raise InputError(message(
                QT_TRANSLATE_NOOP("PlotwiseEngine",
                    "Covariate '{name}' takes only {n_distinct} distinct values over the frame, fewer than the "
                "{k} strata asked for. Lower STRATA to {n_distinct} or fewer."),
                name=name0, n_distinct=int(n_distinct), k=k))
    if inp.method == QUANTILE:
        boundaries, _ = exact_quantiles(source, quantile_probabilities(k), histogram=hist,
                                        progress=scaled_progress(progress, 0.4, 1.0))
    elif inp.method == EQUAL_INTERVAL:
        boundaries = equal_interval_boundaries(first.vmin, first.vmax, k)
    else:
        coarse = hist.coarsen(CUM_ROOT_F_CLASSES)
        boundaries = cum_root_f_boundaries(coarse.edges, coarse.counts, k)
    unique = np.unique(boundaries)
    if unique.size < boundaries.size:
        warnings.append(message(QT_TRANSLATE_NOOP("PlotwiseEngine",
            "Some boundaries coincide (many cells share the same value of '{name}'); "
                                "{formed} strata are formed instead of {k}."),
                                name=name0, formed=int(unique.size + 1), k=k))
    return ThresholdRule(unique), hist, n_distinct


def _kmeans_rule(source, inp, summ, progress):
    """Nearest-centre rule of k-means on a standardised sample: ``(rule, fit, n_distinct, sample_n)``."""
    k = inp.n_strata
    sample = cell_sample(source, summ.count, inp.sample_size, inp.rng, progress)
    sample_n = sample.shape[0]
    z = (sample - summ.mean) / summ.sd
    n_distinct = np.unique(z, axis=0).shape[0]
    if n_distinct < k:
        if sample_n == summ.count:
            text = message(QT_TRANSLATE_NOOP("PlotwiseEngine",
                "The covariates take only {n_distinct} distinct value combinations over the frame, "
                           "fewer than the {k} strata asked for. Lower STRATA to {n_distinct} or fewer."),
                           n_distinct=int(n_distinct), k=k)
        else:
            text = message(QT_TRANSLATE_NOOP("PlotwiseEngine",
                "The covariates take only {n_distinct} distinct value combinations in a sample of "
                           "{sample_n} cells, fewer than the {k} strata asked for. Lower STRATA to "
                           "{n_distinct} or fewer."), n_distinct=int(n_distinct), sample_n=int(sample_n), k=k)
        raise InputError(text)
    fit = lloyd_kmeans(z, kmeans_plusplus(z, k, inp.rng))
    order = np.argsort(fit.centres[:, 0], kind="stable")
    return NearestCentreRule(fit.centres[order], summ.mean, summ.sd), fit, int(n_distinct), int(sample_n)


def _class_rule(source, inp, progress):
    """One stratum per class of a categorical first covariate: ``(rule, n_distinct)``."""
    n_distinct, classes = count_distinct(source, MAX_CLASSES, progress=progress)
    if n_distinct > MAX_CLASSES:
        raise InputError(message(
            QT_TRANSLATE_NOOP("PlotwiseEngine",
                "Covariate '{name}' has more than {max_classes} classes (at least {n_distinct} distinct values "
            "over the frame): reclassify it into {max_classes} classes or fewer first (for example with the "
            "host's reclassify by table tool), or choose another METHOD."),
            name=inp.names[0], max_classes=MAX_CLASSES, n_distinct=int(n_distinct)))
    return ClassRule(np.asarray(classes)), int(n_distinct)


def stratify_cells(source, method, n_strata, names, rng=None, value_range=None, sample_size=100_000,
                   write=None, progress=None):
    """Strata for the valid cells of ``source``; see the module docstring for the methods.

    Passes over the source: quantile 3 (histogram, exact selection,
    assignment), equal interval and cum sqrt(f) 3 (summary, histogram,
    assignment), k-means 3 (summary, subsample, assignment), raster classes 3
    (summary, distinct values, assignment).

    Parameters
    ----------
    method : int
        QUANTILE, EQUAL_INTERVAL, CUM_ROOT_F, KMEANS or RASTER_CLASSES.
    n_strata : int
        Strata wanted (ignored for raster classes).
    names : sequence of str
        Covariate names, for messages.
    rng : numpy.random.Generator
        Needed by k-means (subsample and seeds).
    value_range : (lo, hi), optional
        An approximate range of the first covariate (quantile: saves one pass).
    sample_size : int
        Cells in the k-means subsample.
    write : callable ``write(window, ids)``, optional
        Receives the provisional stratum ids of each block.

    Raises
    ------
    InputError
        No valid cell, a constant covariate, more strata than distinct values,
        a categorical raster with more than 50 classes.
    """
    inp = _stratify_iv(method, n_strata, names, rng, sample_size)
    warnings = []
    first = _first_pass(source, inp, value_range, scaled_progress(progress, 0, 0.3 if method == QUANTILE else 0.2))
    hist = kfit = None
    sample_n = 0
    if method in (QUANTILE, EQUAL_INTERVAL, CUM_ROOT_F):
        lo = 0.3 if method == QUANTILE else 0.2
        rule, hist, n_distinct = _threshold_rule(source, inp, first, scaled_progress(progress, lo, 0.55), warnings)
    elif method == KMEANS:
        rule, kfit, n_distinct, sample_n = _kmeans_rule(source, inp, first.summary, scaled_progress(progress, 0.2, 0.4))
    else:
        rule, n_distinct = _class_rule(source, inp, scaled_progress(progress, 0.2, 0.4))
    stats = _assign_and_count(source, rule, hist, first, write, scaled_progress(progress, 0.55, 1.0))
    lut, order = stratum_order(stats)
    dropped = rule.n_strata - order.size
    if dropped:
        warnings.append(message(QT_TRANSLATE_NOOP("PlotwiseEngine",
            "{dropped} of the {k} strata hold no cell and were dropped."),
                                dropped=int(dropped), k=rule.n_strata))
    boundaries = rule.boundaries if isinstance(rule, ThresholdRule) else None
    return Stratification(method, rule, boundaries, stats.reordered(order), lut, order, int(stats.total),
                          int(n_distinct), int(sample_n), (float(first.vmin), float(first.vmax)), kfit,
                          tuple(warnings), hist)


def _assign_and_count(source, rule, hist, first, write, progress):
    """The assignment pass: every cell's stratum written, per-stratum statistics summed.

    Threshold strata take their report histogram from the fine histogram
    (:func:`chart_from_histogram`); the other rules count it in the pass.
    """
    threshold = isinstance(rule, ThresholdRule)
    value_range = (first.vmin, first.vmax)
    stats = accumulate_statistics(source, rule.n_strata, rule, write, first.shift, None if threshold else value_range,
                                  extremes=not threshold, progress=progress)
    if threshold:
        stats = replace(stats, chart_range=value_range,
                        chart_counts=chart_from_histogram(hist, rule.boundaries, value_range, stats.count))
    return stats


def chart_from_histogram(hist, boundaries, value_range, counts=None, bins=CHART_BINS):
    """(k, bins) counts for the report's histogram, re-binned from a fine histogram.

    Each fine class goes to the chart class of its centre (:func:`chart_classes`).
    Without ``counts`` a fine class goes whole to the stratum of its centre. With
    ``counts`` (the exact cells per stratum) the fine classes that a boundary
    cuts are split exactly: the cells at or above boundary b_i are the top
    N_{i+1} + ... + N_k cells, so the class holding the cell of rank
    n - (N_{i+1} + ... + N_k) is the one cut by b_i, and the count above b_i in
    it follows from the cumulative histogram. Every cell is then counted in its
    own stratum; the chart is for display, its classes exact to one fine class
    (1/64,000 of the range).
    """
    k = len(boundaries) + 1
    cls = chart_classes(hist, value_range, bins)
    if counts is None:
        centres = 0.5 * (hist.edges[:-1] + hist.edges[1:])
        h = np.searchsorted(np.asarray(boundaries, float), centres, side="right")
        return np.bincount(h * bins + cls, weights=hist.counts, minlength=k * bins).reshape(k, bins).astype(np.int64)
    cum = np.cumsum(hist.counts)
    n = int(cum[-1])
    above = np.cumsum(np.asarray(counts, np.int64)[::-1])[::-1][1:]  # cells at or above each boundary
    rank = n - above
    cut = np.minimum(np.searchsorted(cum, rank, side="right"), cum.size - 1)  # the fine class cut by each boundary
    moved = np.where(rank < n, cum[cut] - rank, 0)  # its cells at or above the boundary
    h = np.searchsorted(cut, np.arange(cum.size), side="left")  # stratum of the cells below every cut in the class
    chart = np.bincount(h * bins + cls, weights=hist.counts, minlength=k * bins).astype(np.int64).reshape(k, bins)
    for i in range(k - 1):  # boundary i moves its class's cells above it from stratum i to i + 1
        chart[i, cls[cut[i]]] -= moved[i]
        chart[i + 1, cls[cut[i]]] += moved[i]
    return chart


def chart_classes(hist, value_range, bins=CHART_BINS):
    """The chart class of each fine class of ``hist``: the class of its centre over ``value_range``."""
    centres = 0.5 * (hist.edges[:-1] + hist.edges[1:])
    return histogram_class_index(centres, value_range[0], value_range[1], bins)


# ---------------------------------------------------------------------------
# labels
# ---------------------------------------------------------------------------
def display_decimals(values):
    """Decimals that show ``values`` distinctly: about three significant digits of their spread.

    Whole numbers get none.
    """
    v = np.asarray(values, float)
    v = v[np.isfinite(v)]
    if v.size == 0 or np.all(v == np.round(v)):
        return 0
    spread = float(v.max() - v.min()) or abs(float(v.max())) or 1.0
    return int(min(6, max(0, 2 - math.floor(math.log10(spread)))))


def format_covariate_value(x, decimals):
    """``1240.3`` -> ``"1,240"`` (thousands separated, fixed decimals)."""
    return f"{x:,.{decimals}f}"


def stratum_ranges(result):
    """(lower, upper) of the first covariate per final stratum for threshold methods.

    The nominal boundaries, with the covariate's minimum and maximum at the ends
    (after sieving, a stratum also holds the merged patches' cells outside its range).
    """
    b = np.asarray(result.rule.boundaries, float)
    lo, hi = result.value_range  # the first covariate's exact range over the valid cells
    edges = np.concatenate([[lo], b, [hi]])
    p = np.asarray(result.provisional)
    return edges[p], edges[p + 1]


def stratum_label_texts(result, names, units=None):
    """Label text per final stratum, e.g. ``"elevation 1,240–1,610 m"``.

    Threshold methods give the first covariate's range of the stratum;
    k-means gives the stratum's mean of every covariate; raster classes give
    the class value. The words of the last two are translatable messages.
    """
    units = list(units) if units is not None else [""] * len(names)

    def unit(c):
        return (" " + units[c]) if units[c] else ""

    st = result.statistics
    if isinstance(result.rule, ThresholdRule):
        lo, hi = stratum_ranges(result)
        d = display_decimals(np.concatenate([lo, hi]))
        return ["%s %s\u2013%s%s" % (names[0], format_covariate_value(a, d), format_covariate_value(z, d), unit(0))
                for a, z in zip(lo, hi)]
    if isinstance(result.rule, ClassRule):
        values = np.asarray(result.rule.classes, float)[result.provisional]
        d = display_decimals(values)
        return [message(QT_TRANSLATE_NOOP("PlotwiseEngine",
            "{name} class {value}"), name=names[0], value=format_covariate_value(v, d)) for v in values]
    decs = [display_decimals(st.mean[:, c]) for c in range(len(names))]
    return [message(QT_TRANSLATE_NOOP("PlotwiseEngine", "mean {values}"), values=", ".join(
        "%s %s%s" % (names[c], format_covariate_value(st.mean[h, c], decs[c]), unit(c)) for c in range(len(names))))
        for h in range(st.n_strata)]
