"""Halton sequences and balanced acceptance sampling (BAS).

The radical inverse of the whole number ``k = sum_j d_j b**j`` (digits
``0 <= d_j < b``) in base ``b`` mirrors its digits about the radix point:

    phi_b(k) = sum_j d_j b**(-j - 1)

and the two-dimensional Halton sequence is ``x_k = (phi_2(k), phi_3(k))``,
``k = 0, 1, 2, ...`` (Halton 1960, Numerische Mathematik 2:84-90).

Balanced acceptance sampling (Robertson, Brown, McDonald & Jaksons 2013,
"BAS: Balanced acceptance sampling of natural resources", Biometrics
69:776-784) maps the random-start Halton sequence

    x_k = (phi_2(k + u_1), phi_3(k + u_2)),   k = 0, 1, 2, ...

with random whole numbers ``u_1, u_2``, onto the bounding box of the region and
keeps, in order, the points that fall inside the region. Every prefix of the
accepted points is spread evenly over the region (the sequence is a
low-discrepancy sequence whatever its start), so extra units taken as the next
accepted points keep the sample balanced.

The random start
----------------
The sequence is used modulo ``B = 2**J1 3**J2`` (``J1 = 30``, ``J2 = 19``): the
box is cut into ``B`` cells of ``2**-J1 x 3**-J2`` and indices ``k`` and
``k mod B`` fall in the same cell. Within the cell every point is moved by the
same sub-cell offset ``delta``.

If ``(u_1, u_2)`` were drawn uniformly over all indices, a fixed-size sample
would favour locations that follow a long run of sequence points outside the
region (they are more often the first accepted point); our checks found this
bias clearly for small samples in ragged strata. Here the start is drawn
uniformly among the starts whose *first point lies in the region*: a uniform
random point ``Y`` of the region is drawn, its cell gives ``(u_1, u_2)`` by
reversing the digits of ``floor(2**J1 t_1)`` and ``floor(3**J2 t_2)``
(``t`` = ``Y`` in unit-box coordinates), and ``delta`` is ``Y``'s position in
its cell, so ``x_0 = Y``. Given ``delta``, the start is then uniform over the
accepted cells, and a sample of the next ``n`` accepted points of a cycle
includes every accepted cell with the same probability ``n / N``: the inclusion
density is uniform over the region (to the cell size, about 1e-9 of the box).
"""
from dataclasses import dataclass

import numpy as np

from .errors import QT_TRANSLATE_NOOP, Cancelled, InputError, message
from .geometry import region_test, triangle_cover, uniform_points

BASES = (2, 3)
DIGITS = (30, 19)
CYCLE = (2**30, 3**19)


def radical_inverse(k, base):
    """Radical inverse ``phi_b(k)`` of whole numbers ``k`` in ``base``.

    Parameters
    ----------
    k : array_like of int (>= 0, below 2**62)
    base : int >= 2

    Returns
    -------
    ndarray of float in [0, 1)
    """
    k = np.array(k, dtype=np.int64, copy=True)
    result = np.zeros(k.shape, dtype=float)
    scale = 1.0 / base
    while np.any(k > 0):
        k, digit = np.divmod(k, base)
        result += digit * scale
        scale /= base
    return result


def halton_points(indices, starts=(0, 0)):
    """Halton points ``(phi_2(k + u_1), phi_3(k + u_2))`` for ``k`` in ``indices``.

    With ``starts=(0, 0)`` these equal
    ``scipy.stats.qmc.Halton(d=2, scramble=False).random(n)`` for
    ``indices = range(n)``.

    Returns
    -------
    ndarray, shape (len(indices), 2)
    """
    k = np.asarray(indices, dtype=np.int64)
    return np.stack(
        [radical_inverse(k + int(starts[0]), BASES[0]), radical_inverse(k + int(starts[1]), BASES[1])],
        axis=1,
    )


def digit_reversal(i, base, digits):
    """The whole number ``u`` with ``phi_b(u) = i / b**digits`` (digits of ``i`` reversed).

    Inverse of the radical inverse on ``0 <= i < b**digits``.
    """
    i = np.array(i, dtype=np.int64, copy=True)
    u = np.zeros(i.shape, dtype=np.int64)
    for _ in range(int(digits)):
        i, d = np.divmod(i, base)
        u = u * base + d
    return u


def cyclic_points(k, start, shift=(0.0, 0.0)):
    """Points ``(phi_2((k + u_1) mod 2**30), phi_3((k + u_2) mod 3**19)) + delta`` (cell units).

    ``shift`` is ``delta`` in [0, 1)^2, in units of one cell (``2**-30``,
    ``3**-19``).
    """
    k = np.asarray(k, dtype=np.int64)
    cols = []
    for dim in range(2):
        idx = (k + int(start[dim])) % CYCLE[dim]
        cols.append(radical_inverse(idx, BASES[dim]) + float(shift[dim]) / CYCLE[dim])
    return np.stack(cols, axis=1)


def region_start(point_unit):
    """Random start ``(u_1, u_2)`` and cell offset ``delta`` whose first point is ``point_unit``.

    Parameters
    ----------
    point_unit : (t_1, t_2) in [0, 1)^2
        A uniform random point of the region in unit-box coordinates.
    """
    start, shift = [], []
    for dim in range(2):
        t = min(max(float(point_unit[dim]), 0.0), np.nextafter(1.0, 0.0))
        scaled = t * CYCLE[dim]
        cell = int(np.floor(scaled))
        start.append(int(digit_reversal(cell, BASES[dim], DIGITS[dim])))
        shift.append(scaled - cell)
    return tuple(start), tuple(shift)


@dataclass(frozen=True, eq=False)
class BalancedDraw:
    """A balanced acceptance sample, in draw order.

    Attributes
    ----------
    points : ndarray, shape (n, 2)
        Accepted points in the region, in the order of the sequence.
    indices : ndarray of int
        Their positions ``k`` in the random-start Halton sequence.
    start : tuple of int
        The random start ``(u_1, u_2)``.
    shift : tuple of float
        The sub-cell offset ``delta``.
    box : tuple of float
        ``(minx, miny, maxx, maxy)`` the unit square was mapped onto.
    """

    points: np.ndarray
    indices: np.ndarray
    start: tuple
    shift: tuple
    box: tuple


def balanced_acceptance_sample(region, n, rng, box=None, accept=None, progress=None, max_tries=None, cover=None):
    """Balanced acceptance sample of ``n`` points in ``region`` (Robertson et al. 2013).

    Parameters
    ----------
    region : Polygon or MultiPolygon
    n : int
    rng : numpy.random.Generator
        Draws the random start only (one uniform point of the region).
    box : tuple, optional
        Bounding box ``(minx, miny, maxx, maxy)``; default ``region.bounds``.
    accept : callable, optional
        ``accept(points, limit) -> bool array``: an extra acceptance rule
        applied in sequence order after the region test (used for a minimum
        spacing). It receives candidates in order and accepts at most
        ``limit`` of them.
    progress : callable, optional
        ``progress(fraction) -> bool``; True cancels.
    max_tries : int, optional
        Upper bound on sequence positions examined (default ``1000 n + 10**6``).
    cover : geometry.TriangleCover, optional
        Triangle cover of ``region`` for the uniform start point (built when
        not given).

    Returns
    -------
    BalancedDraw
        ``points`` may hold fewer than ``n`` points when ``accept`` rejects too
        many within ``max_tries``.
    """
    n = int(n)
    if box is None:
        box = region.bounds
    minx, miny, maxx, maxy = (float(v) for v in box)
    span = np.array([maxx - minx, maxy - miny])
    origin = np.array([minx, miny])
    box_area = span[0] * span[1]
    share = region.area / box_area if box_area > 0 else 0.0
    if n <= 0 or share <= 0:
        return BalancedDraw(np.zeros((0, 2)), np.zeros(0, dtype=np.int64), (0, 0), (0.0, 0.0), (minx, miny, maxx, maxy))
    if cover is None:
        cover = triangle_cover(region)
    first = uniform_points(cover, region, 1, rng)
    inside = region_test(region, cover)
    if len(first) == 0:  # a region too thin for its coordinates to resolve (slivers are removed before)
        raise InputError(message(QT_TRANSLATE_NOOP("PlotwiseEngine",
            "No point of an area of {area:.3g} m² could be drawn: it is too thin to hold a "
            "sample unit. Check the frame for slivers."), area=float(region.area)))
    first = first[0]
    start, shift = region_start((first - origin) / span)
    if max_tries is None:
        max_tries = 1000 * n + 10**6
    points, indices = [], []
    have = 0
    k0 = 0
    while have < n and k0 < max_tries:
        m = int(min(max_tries - k0, np.ceil((n - have) / share * 1.2) + 16))
        k = np.arange(k0, k0 + m, dtype=np.int64)
        k0 += m
        xy = origin + cyclic_points(k, start, shift) * span
        ok = inside(xy[:, 0], xy[:, 1])
        if k[0] == 0:  # the start point is in the region by construction
            xy[0] = first
            ok[0] = True
        xy, k = xy[ok], k[ok]
        if accept is not None and len(xy):
            ok = np.asarray(accept(xy, n - have), dtype=bool)
            xy, k = xy[ok], k[ok]
        points.append(xy)
        indices.append(k)
        have += len(xy)
        if progress is not None and progress(min(have / n, 1.0)):
            raise Cancelled("Cancelled while drawing the balanced sample.")
    points = np.concatenate(points)[:n]
    indices = np.concatenate(indices)[:n]
    return BalancedDraw(points, indices, start, shift, (minx, miny, maxx, maxy))
