"""Inline SVG figures for the reports: maps of shapely geometries and simple charts.

Every function returns SVG markup as a string, with every text escaped, sized by a
``viewBox`` so that it scales to the page width. Nothing here imports the host.
"""
from dataclasses import dataclass, field

import numpy as np

from .html import escape, format_number
from .style import ACCENT, CATEGORY_COLOURS, INK, MUTED, RULE

FONT = 'font-family="DejaVu Sans,Verdana,Arial,sans-serif"'


def category_colour(index):
    """Colour of the ``index``-th category (0-based), cycling through our palette."""
    return CATEGORY_COLOURS[int(index) % len(CATEGORY_COLOURS)]


@dataclass(frozen=True)
class MapLayer:
    """Geometries drawn with one style on a map.

    ``fills`` may give one colour per geometry (for categorised strata); ``label`` goes in the legend.
    Points are drawn as circles of ``point_radius`` pixels.
    """

    geometries: tuple
    label: str = ""
    fill: str = "none"
    stroke: str = INK
    stroke_width: float = 1.0
    opacity: float = 1.0
    fills: tuple = field(default_factory=tuple)
    point_radius: float = 2.5
    legend: tuple = field(default_factory=tuple)  # extra (label, colour) entries, e.g. per stratum
    points: object = None  # optional (n, 2) array of x, y drawn as circles: fast for thousands of points


def _geom_parts(geometry):
    kind = geometry.geom_type
    if kind.startswith("Multi") or kind == "GeometryCollection":
        for part in geometry.geoms:
            yield from _geom_parts(part)
    else:
        yield geometry


def _ring_path(coords, tx):
    xy = tx(np.asarray(coords)[:, :2])
    if len(xy) == 0:
        return ""
    return "M" + " L".join(f"{x:.1f},{y:.1f}" for x, y in xy) + " Z"


def _for_screen(geometry, pixel):
    """Simplify lines and polygons to about half a pixel (keeps the SVG small, shapes true)."""
    if geometry.geom_type in ("Point", "MultiPoint"):
        return geometry
    simplified = geometry.simplify(pixel * 0.5, preserve_topology=True)
    return geometry if simplified.is_empty else simplified


def map_svg(layers, width=900, height=None, title=None, scale_bar=True):
    """A map of ``layers`` (list of :class:`MapLayer`), in the layers' projected coordinates (m).

    North is up. A scale bar in km and a legend are drawn.
    """
    geoms = [g for layer in layers for g in layer.geometries if g is not None and not g.is_empty]
    point_sets = [np.asarray(layer.points, dtype=float).reshape(-1, 2) for layer in layers if layer.points is not None]
    point_sets = [p for p in point_sets if len(p)]
    if not geoms and not point_sets:
        return (f'<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 {width} 60"><text x="10" y="30" {FONT}>'
                f"no geometry</text></svg>")
    bounds = np.array([g.bounds for g in geoms] + [(*p.min(axis=0), *p.max(axis=0)) for p in point_sets])
    view = _MapView.fitted(bounds, width, height, layers)
    out = [f'<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 {width} {view.total_height}" role="img">']
    if title:
        out.append(f"<title>{escape(title)}</title>")
    for layer in layers:
        out.extend(_layer_markup(layer, view))
    y0 = view.pad + view.plot_height + 20
    if scale_bar:
        out.extend(_scale_bar_and_north_arrow(view, width, y0))
    out.extend(_legend(layers, view.pad, y0 + 22))
    out.append("</svg>")
    return "".join(out)


@dataclass(frozen=True)
class _MapView:
    """Where the map's coordinates land on the page: ``x → pad + (x − minx)·scale``, north up."""

    minx: float
    maxy: float
    span_x: float
    scale: float
    pad: int
    plot_height: float
    total_height: int

    @classmethod
    def fitted(cls, bounds, width, height, layers, pad=20):
        minx, miny = bounds[:, 0].min(), bounds[:, 1].min()
        maxx, maxy = bounds[:, 2].max(), bounds[:, 3].max()
        span_x = max(maxx - minx, 1e-9)
        span_y = max(maxy - miny, 1e-9)
        legend_h = 22 * (sum(1 for layer in layers if layer.label) + sum(len(layer.legend) for layer in layers)) + 10
        scale = (width - 2 * pad) / span_x
        plot_h = span_y * scale
        if height is not None and plot_h > height:
            scale = height / span_y
            plot_h = height
        return cls(minx, maxy, span_x, scale, pad, plot_h, int(plot_h + 2 * pad + 30 + legend_h))

    def tx(self, xy):
        out = np.empty_like(xy, dtype=float)
        out[:, 0] = self.pad + (xy[:, 0] - self.minx) * self.scale
        out[:, 1] = self.pad + (self.maxy - xy[:, 1]) * self.scale
        return out


def _layer_markup(layer, view):
    """SVG elements of one layer: its polygons, lines and points, then its point array."""
    out = []
    for i, g in enumerate(layer.geometries):
        if g is None or g.is_empty:
            continue
        fill = layer.fills[i] if layer.fills else layer.fill
        for part in _geom_parts(_for_screen(g, 1.0 / view.scale)):
            kind = part.geom_type
            if kind == "Polygon":
                d = _ring_path(part.exterior.coords, view.tx)
                for ring in part.interiors:
                    d += " " + _ring_path(ring.coords, view.tx)
                out.append(
                    f'<path d="{d}" fill="{fill}" fill-rule="evenodd" fill-opacity="{layer.opacity}" '
                    f'stroke="{layer.stroke}" stroke-width="{layer.stroke_width}"/>'
                )
            elif kind in ("LineString", "LinearRing"):
                xy = view.tx(np.asarray(part.coords)[:, :2])
                pts = " ".join(f"{x:.1f},{y:.1f}" for x, y in xy)
                out.append(
                    f'<polyline points="{pts}" fill="none" stroke="{layer.stroke}" '
                    f'stroke-width="{max(layer.stroke_width, 1.5)}"/>'
                )
            elif kind == "Point":
                x, y = view.tx(np.array([[part.x, part.y]]))[0]
                colour = fill if fill != "none" else layer.stroke
                out.append(
                    f'<circle cx="{x:.1f}" cy="{y:.1f}" r="{layer.point_radius}" fill="{colour}" '
                    f'stroke="{layer.stroke}" stroke-width="0.6"/>'
                )
    if layer.points is not None and len(layer.points):
        fill = layer.fill if layer.fill != "none" else layer.stroke
        out.append(f'<g fill="{fill}" stroke="{layer.stroke}" stroke-width="0.6">')
        out.extend(
            f'<circle cx="{x:.1f}" cy="{y:.1f}" r="{layer.point_radius}"/>'
            for x, y in view.tx(np.asarray(layer.points, dtype=float).reshape(-1, 2)).tolist()
        )
        out.append("</g>")
    return out


def _scale_bar_and_north_arrow(view, width, y0):
    pad = view.pad
    km = _nice_length(view.span_x / 4.0)
    bar_px = km * view.scale
    return [
        f'<rect x="{pad}" y="{y0 - 6:.1f}" width="{bar_px:.1f}" height="5" fill="{INK}"/>',
        f'<text x="{pad + bar_px + 6:.1f}" y="{y0:.1f}" font-size="12" {FONT} fill="{INK}">'
        f"{escape(format_number(km / 1000.0))} km</text>",
        f'<text x="{width - pad - 10}" y="{pad + 14}" font-size="14" {FONT} fill="{INK}" '
        f'text-anchor="middle">N</text>'
        f'<path d="M{width - pad - 10},{pad + 18} l-5,14 l5,-4 l5,4 Z" fill="{INK}"/>',
    ]


def _legend(layers, pad, y):
    """One swatch and label per labelled layer and per extra legend entry, from ``y`` down."""
    out = []
    for layer in layers:
        entries = []
        if layer.label:
            swatch = layer.fill if layer.fill != "none" else layer.stroke
            entries.append((layer.label, swatch))
        entries.extend(layer.legend)
        for label, colour in entries:
            out.append(f'<rect x="{pad}" y="{y - 11}" width="14" height="14" fill="{colour}" stroke="{INK}" '
                       f'stroke-width="0.5"/>')
            out.append(f'<text x="{pad + 20}" y="{y}" font-size="12" {FONT} fill="{INK}">{escape(label)}</text>')
            y += 22
    return out


def stratum_name(report, key):
    """A stratum as the reports name it: "stratum 2", or "the frame" for a frame without strata (key None)."""
    if key is None:
        return report.translate("PlotwiseReport", "the frame")
    return report.translate("PlotwiseReport", "stratum {key}").format(key=key)


def strata_layer(report, strata, thin=None, width=900):
    """The strata (objects with ``geometry`` and ``key``) filled by category, as one map layer, and the
    map's pixel (m).

    Each outline is simplified to half a pixel of a ``width``-pixel map (a fast Douglas-Peucker pass, after
    ``thin(geometry)`` when given); the legend names the strata (none for a single stratum).
    """
    bounds = np.array([s.geometry.bounds for s in strata])
    pixel = max(bounds[:, 2].max() - bounds[:, 0].min(), bounds[:, 3].max() - bounds[:, 1].min(), 1.0) / width
    geoms = []
    for s in strata:
        outline = thin(s.geometry) if thin is not None else s.geometry
        quick = outline.simplify(0.5 * pixel, preserve_topology=False)
        geoms.append(quick if not quick.is_empty else s.geometry)
    fills = tuple(category_colour(i) for i in range(len(geoms)))
    legend = tuple((stratum_name(report, s.key), category_colour(i)) for i, s in enumerate(strata))
    layer = MapLayer(tuple(geoms), fills=fills, fill=fills[0] if fills else "none", stroke=MUTED, stroke_width=0.8,
                     opacity=0.35, legend=legend if len(geoms) > 1 else ())
    return layer, pixel


def _nice_length(metres):
    """A round length (1, 2 or 5 × 10^k metres) near ``metres``."""
    if metres <= 0:
        return 1.0
    power = 10 ** np.floor(np.log10(metres))
    for step in (5, 2, 1):
        if step * power <= metres:
            return float(step * power)
    return float(power)


def _axis_ticks(lo, hi, count=5):
    if hi <= lo:
        hi = lo + 1.0
    raw = (hi - lo) / count
    step = _nice_length(raw) if raw > 0 else 1.0
    start = np.ceil(lo / step) * step
    return np.arange(start, hi + step * 0.001, step)


def _histogram_axes(lo, hi, sx, left, top, pw, ph, height, x_label, y_label):
    """The axes, x ticks and axis labels shared by the histograms."""
    out = [
        f'<line x1="{left}" y1="{top + ph}" x2="{left + pw}" y2="{top + ph}" stroke="{INK}"/>',
        f'<line x1="{left}" y1="{top}" x2="{left}" y2="{top + ph}" stroke="{INK}"/>',
    ]
    for t in _axis_ticks(lo, hi):
        out.append(f'<text x="{sx(t):.1f}" y="{top + ph + 16}" font-size="11" {FONT} text-anchor="middle" '
                   f'fill="{INK}">{escape(format_number(float(t)))}</text>')
    out.append(f'<text x="{left + pw / 2:.1f}" y="{height - 6}" font-size="12" {FONT} text-anchor="middle" '
               f'fill="{INK}">{escape(x_label)}</text>')
    out.append(f'<text x="14" y="{top + ph / 2:.1f}" font-size="12" {FONT} text-anchor="middle" fill="{INK}" '
               f'transform="rotate(-90 14 {top + ph / 2:.1f})">{escape(y_label)}</text>')
    return out


def histogram_svg(edges, counts, marks=(), x_label="", y_label="cells", width=900, height=300, mark_label=""):
    """A histogram of ``counts`` over bins ``edges`` with vertical lines at ``marks`` (e.g. stratum boundaries)."""
    edges = np.asarray(edges, dtype=float)
    counts = np.asarray(counts, dtype=float)
    left, right, top, bottom = 60, 20, 15, 45
    pw, ph = width - left - right, height - top - bottom
    lo, hi = edges[0], edges[-1]
    span = hi - lo if hi > lo else 1.0
    cmax = counts.max() if counts.size and counts.max() > 0 else 1.0

    def sx(v):
        return left + (v - lo) / span * pw

    def sy(c):
        return top + ph - c / cmax * ph

    out = [f'<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 {width} {height}" role="img">']
    for i, c in enumerate(counts):
        x0, x1 = sx(edges[i]), sx(edges[i + 1])
        out.append(f'<rect x="{x0:.1f}" y="{sy(c):.1f}" width="{max(x1 - x0 - 0.5, 0.5):.1f}" '
                   f'height="{top + ph - sy(c):.1f}" fill="{ACCENT}" fill-opacity="0.75"/>')
    for m in marks:
        x = sx(m)
        out.append(f'<line x1="{x:.1f}" y1="{top}" x2="{x:.1f}" y2="{top + ph}" stroke="#b4443b" stroke-width="2" '
                   f'stroke-dasharray="6,3"/>')
    out.extend(_histogram_axes(lo, hi, sx, left, top, pw, ph, height, x_label, y_label))
    if mark_label and len(marks):
        out.append(f'<text x="{left + pw}" y="{top + 10}" font-size="11" {FONT} text-anchor="end" '
                   f'fill="#b4443b">{escape(mark_label)}</text>')
    out.append("</svg>")
    return "".join(out)


def interval_chart_svg(labels, estimates, lows, highs, value_label="", width=900, reference=None, reference_label=""):
    """Point estimates with interval bars, one row per label (e.g. density by stratum with CIs)."""
    n = len(labels)
    row_h, left, right, top = 30, 160, 30, 20
    height = top + row_h * n + 50
    values = [v for v in list(lows) + list(highs) + list(estimates) if v is not None and np.isfinite(v)]
    values = np.array(values or [0.0, 1.0])
    lo = min(0.0, values.min())
    hi = values.max() if values.max() > lo else lo + 1.0
    if reference is not None and np.isfinite(reference):
        hi = max(hi, reference)
    hi *= 1.05
    pw = width - left - right

    def sx(v):
        return left + (v - lo) / (hi - lo) * pw

    out = [f'<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 {width} {height}" role="img">']
    for t in _axis_ticks(lo, hi):
        x = sx(t)
        out.append(f'<line x1="{x:.1f}" y1="{top - 5}" x2="{x:.1f}" y2="{top + row_h * n}" stroke="{RULE}"/>')
        out.append(f'<text x="{x:.1f}" y="{top + row_h * n + 16}" font-size="11" {FONT} text-anchor="middle" '
                   f'fill="{INK}">{escape(format_number(float(t)))}</text>')
    if reference is not None and np.isfinite(reference):
        x = sx(reference)
        out.append(f'<line x1="{x:.1f}" y1="{top - 5}" x2="{x:.1f}" y2="{top + row_h * n}" stroke="#b4443b" '
                   f'stroke-dasharray="5,3" stroke-width="1.5"/>')
        out.append(f'<text x="{x + 4:.1f}" y="{top + 6}" font-size="11" {FONT} '
                   f'fill="#b4443b">{escape(reference_label)}</text>')
    for i, (label, est, a, b) in enumerate(zip(labels, estimates, lows, highs)):
        y = top + row_h * i + row_h / 2
        out.append(f'<text x="{left - 8}" y="{y + 4:.1f}" font-size="12" {FONT} text-anchor="end" '
                   f'fill="{INK}">{escape(label)}</text>')
        if a is not None and b is not None and np.isfinite(a) and np.isfinite(b):
            out.append(f'<line x1="{sx(a):.1f}" y1="{y:.1f}" x2="{sx(b):.1f}" y2="{y:.1f}" stroke="{INK}" '
                       f'stroke-width="2"/>')
            for v in (a, b):
                out.append(f'<line x1="{sx(v):.1f}" y1="{y - 6:.1f}" x2="{sx(v):.1f}" y2="{y + 6:.1f}" stroke="{INK}" '
                           f'stroke-width="2"/>')
        if est is not None and np.isfinite(est):
            out.append(f'<circle cx="{sx(est):.1f}" cy="{y:.1f}" r="5" fill="{category_colour(i)}" stroke="{INK}"/>')
    out.append(f'<text x="{left + pw / 2:.1f}" y="{height - 8}" font-size="12" {FONT} text-anchor="middle" '
               f'fill="{INK}">{escape(value_label)}</text>')
    out.append("</svg>")
    return "".join(out)


def bar_chart_svg(labels, values, value_label="", width=900, highlight=None):
    """Horizontal bars, one per label; ``highlight`` is the index drawn in the accent colour."""
    n = len(labels)
    row_h, left, right, top = 28, 200, 80, 12
    height = top + row_h * n + 40
    vals = np.asarray([v if v is not None and np.isfinite(v) else 0.0 for v in values], dtype=float)
    vmax = vals.max() if vals.size and vals.max() > 0 else 1.0
    pw = width - left - right
    out = [f'<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 {width} {height}" role="img">']
    for i, (label, v) in enumerate(zip(labels, vals)):
        y = top + row_h * i
        colour = ACCENT if highlight is None or i == highlight else MUTED
        out.append(f'<text x="{left - 8}" y="{y + row_h / 2 + 4:.1f}" font-size="12" {FONT} text-anchor="end" '
                   f'fill="{INK}">{escape(label)}</text>')
        out.append(f'<rect x="{left}" y="{y + 4}" width="{v / vmax * pw:.1f}" height="{row_h - 8}" fill="{colour}"/>')
        out.append(f'<text x="{left + v / vmax * pw + 6:.1f}" y="{y + row_h / 2 + 4:.1f}" font-size="11" {FONT} '
                   f'fill="{INK}">{escape(format_number(float(v)))}</text>')
    out.append(f'<text x="{left + pw / 2:.1f}" y="{height - 8}" font-size="12" {FONT} text-anchor="middle" '
               f'fill="{INK}">{escape(value_label)}</text>')
    out.append("</svg>")
    return "".join(out)


def line_chart_svg(x, series, x_label="", y_label="", width=900, height=320):
    """Lines of ``series`` (``[(label, y_values), ...]``) against ``x``, with a legend."""
    x = np.asarray(x, dtype=float)
    left, right, top, bottom = 70, 160, 15, 45
    pw, ph = width - left - right, height - top - bottom
    ys = np.concatenate([np.asarray(v, dtype=float) for _, v in series]) if series else np.array([0.0, 1.0])
    ys = ys[np.isfinite(ys)]
    ylo, yhi = 0.0, (ys.max() * 1.05 if ys.size and ys.max() > 0 else 1.0)
    xlo, xhi = (x.min(), x.max()) if x.size and x.max() > x.min() else (0.0, 1.0)

    def sx(v):
        return left + (v - xlo) / (xhi - xlo) * pw

    def sy(v):
        return top + ph - (v - ylo) / (yhi - ylo) * ph

    out = [f'<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 {width} {height}" role="img">']
    out.append(f'<line x1="{left}" y1="{top + ph}" x2="{left + pw}" y2="{top + ph}" stroke="{INK}"/>')
    out.append(f'<line x1="{left}" y1="{top}" x2="{left}" y2="{top + ph}" stroke="{INK}"/>')
    for t in _axis_ticks(xlo, xhi):
        out.append(f'<text x="{sx(t):.1f}" y="{top + ph + 16}" font-size="11" {FONT} text-anchor="middle" '
                   f'fill="{INK}">{escape(format_number(float(t)))}</text>')
    for t in _axis_ticks(ylo, yhi):
        out.append(f'<text x="{left - 6}" y="{sy(t) + 4:.1f}" font-size="11" {FONT} text-anchor="end" '
                   f'fill="{INK}">{escape(format_number(float(t)))}</text>')
    for i, (label, values) in enumerate(series):
        values = np.asarray(values, dtype=float)
        pts = " ".join(f"{sx(a):.1f},{sy(b):.1f}" for a, b in zip(x, values) if np.isfinite(b))
        colour = category_colour(i)
        out.append(f'<polyline points="{pts}" fill="none" stroke="{colour}" stroke-width="2"/>')
        ly = top + 16 + 20 * i
        out.append(f'<rect x="{left + pw + 12}" y="{ly - 10}" width="14" height="4" fill="{colour}"/>')
        out.append(f'<text x="{left + pw + 32}" y="{ly - 4}" font-size="11" {FONT} fill="{INK}">{escape(label)}</text>')
    out.append(f'<text x="{left + pw / 2:.1f}" y="{height - 6}" font-size="12" {FONT} text-anchor="middle" '
               f'fill="{INK}">{escape(x_label)}</text>')
    out.append(f'<text x="14" y="{top + ph / 2:.1f}" font-size="12" {FONT} text-anchor="middle" fill="{INK}" '
               f'transform="rotate(-90 14 {top + ph / 2:.1f})">{escape(y_label)}</text>')
    out.append("</svg>")
    return "".join(out)


def stacked_histogram_svg(edges, counts, colours, labels=(), marks=(), x_label="", y_label="cells", width=900,
                          height=320):
    """A histogram whose bars are stacked by group (rows of ``counts``, e.g. strata), with a legend.

    ``counts`` is (groups, bins) over bins ``edges``; ``colours`` gives one colour per group;
    ``marks`` draws dashed vertical lines (e.g. stratum boundaries).
    """
    edges = np.asarray(edges, dtype=float)
    counts = np.atleast_2d(np.asarray(counts, dtype=float))
    legend_w = 190 if len(labels) else 20
    left, right, top, bottom = 60, legend_w, 15, 45
    pw, ph = width - left - right, height - top - bottom
    lo, hi = edges[0], edges[-1]
    span = hi - lo if hi > lo else 1.0
    totals = counts.sum(axis=0)
    cmax = totals.max() if totals.size and totals.max() > 0 else 1.0

    def sx(v):
        return left + (v - lo) / span * pw

    def sh(c):
        return c / cmax * ph

    out = [f'<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 {width} {height}" role="img">']
    for i in range(counts.shape[1]):
        x0, x1 = sx(edges[i]), sx(edges[i + 1])
        base = top + ph
        for g in range(counts.shape[0]):
            h = sh(counts[g, i])
            if h <= 0:
                continue
            out.append(f'<rect x="{x0:.1f}" y="{base - h:.1f}" width="{max(x1 - x0 - 0.5, 0.5):.1f}" height="{h:.1f}" '
                       f'fill="{colours[g % len(colours)]}"/>')
            base -= h
    for m in marks:
        x = sx(m)
        out.append(f'<line x1="{x:.1f}" y1="{top}" x2="{x:.1f}" y2="{top + ph}" stroke="{INK}" stroke-width="1.5" '
                   f'stroke-dasharray="6,3"/>')
    out.extend(_histogram_axes(lo, hi, sx, left, top, pw, ph, height, x_label, y_label))
    for g, label in enumerate(labels):
        y = top + 14 + 20 * g
        out.append(f'<rect x="{left + pw + 14}" y="{y - 10}" width="12" height="12" '
                   f'fill="{colours[g % len(colours)]}"/>')
        out.append(f'<text x="{left + pw + 32}" y="{y}" font-size="11" {FONT} fill="{INK}">{escape(label)}</text>')
    out.append("</svg>")
    return "".join(out)
