"""Runs of equal stratum ids along the rows of a strip, and the runs of neighbouring rows that touch.

The stratum raster is read by strips of full rows; a *run* is a maximal stretch
of one id along a row. A stratum raster has few runs (a few per row on a smooth
covariate), so the patches, their sizes and their neighbours are worked out on
runs rather than cells: only run starts and boundary cells are ever looked at.
"""
import numpy as np


class StripRuns:
    """Runs of equal ids along the rows of a strip: flat index of each run's first cell, numbered from ``offset``.

    ``run_of(flat)`` gives the run of cells by their flat index in the strip (a
    binary search among the run starts: only boundary cells are ever looked up).
    """

    def __init__(self, ids, offset):
        self.start = np.empty(ids.shape, bool)
        self.start[:, 0] = True
        np.not_equal(ids[:, 1:], ids[:, :-1], out=self.start[:, 1:])
        self.first = np.flatnonzero(self.start)
        self.offset = offset
        self.rows, self.width = ids.shape

    @property
    def count(self):
        return int(self.first.size)

    def run_of(self, flat):
        return np.searchsorted(self.first, flat, side="right") - 1 + self.offset

    def run_at(self, r, c):
        """Runs of the cells (r, c) of the strip."""
        return self.run_of(r * self.width + c)

    def last_row(self, r, c):
        """Runs of the cells (0, c) of a one-row view of the strip's last row (``r`` is 0)."""
        return self.run_of((self.rows - 1 + r) * self.width + c)

    def next_row(self, r, c):
        """Runs of the cells (r + 1, c): the lower rows of the pairs of neighbouring rows."""
        return self.run_of((r + 1) * self.width + c)


def run_links(ids, runs):
    """Pairs of runs of neighbouring rows of a strip that share a cell edge (equal ids, not 0).

    Two overlapping runs share the column where the later one starts: only run starts are tested.
    """
    h, w = ids.shape
    r, c = np.divmod(runs.first, w)
    a, b = [], []
    for dr in (1, -1):  # the row below a run start, the row above it
        ok = (r + dr >= 0) & (r + dr < h)
        rr, cc = r[ok], c[ok]
        v = ids[rr, cc]
        same = (ids[rr + dr, cc] == v) & (v > 0)
        a.append(runs.run_of(rr[same] * w + cc[same]))
        b.append(runs.run_of((rr[same] + dr) * w + cc[same]))
    return np.concatenate(a), np.concatenate(b)
