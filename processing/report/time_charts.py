"""Inline SVG charts over years for the monitoring reports: the revisit schedule, power
curves and a yearly index with its fitted trend. Every text is escaped; nothing here
imports the host."""
import numpy as np

from .html import escape, format_number
from .style import ACCENT, CATEGORY_COLOURS, INK, MUTED, RULE
from .svg import FONT, _axis_ticks, category_colour

BAND = "#cfe3e1"


def _text(x, y, text, size=11, anchor="start", colour=INK, extra=""):
    return (f'<text x="{x:.1f}" y="{y:.1f}" font-size="{size}" {FONT} text-anchor="{anchor}" fill="{colour}"{extra}>'
            f"{escape(text)}</text>")


def schedule_svg(years, panel_labels, visits, units, total_label="", width=900):
    """The revisit schedule: one row per panel, one column per year, a filled cell with the
    panel's units where the panel is visited; a last row gives the units per year.

    ``visits`` is a (panels, years) boolean array, ``units`` the units per panel.
    """
    years = list(years)
    n_rows, n_cols = len(panel_labels), len(years)
    left, top, right = 130, 24, 14
    cell_w = max(8.0, (width - left - right) / max(n_cols, 1))
    cell_h = 24
    height = top + cell_h * (n_rows + 1) + 30
    out = [f'<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 {width} {height}" role="img">']
    step = max(1, int(np.ceil(n_cols * 34 / (width - left - right))))
    for j, year in enumerate(years):
        if j % step == 0:
            out.append(_text(left + (j + 0.5) * cell_w, top - 8, str(year), anchor="middle"))
    show_numbers = cell_w >= 24
    for i, label in enumerate(panel_labels):
        y = top + i * cell_h
        out.append(_text(left - 8, y + cell_h / 2 + 4, label, anchor="end"))
        for j in range(n_cols):
            x = left + j * cell_w
            fill = category_colour(i) if visits[i][j] else "#ffffff"
            out.append(f'<rect x="{x + 1:.1f}" y="{y + 1}" width="{cell_w - 2:.1f}" height="{cell_h - 2}" '
                       f'fill="{fill}" stroke="{RULE}"/>')
            if visits[i][j] and show_numbers:
                out.append(_text(x + cell_w / 2, y + cell_h / 2 + 4, format_number(int(units[i])), size=10,
                                 anchor="middle", colour="#ffffff" if i % len(CATEGORY_COLOURS) != 1 else INK))
    y = top + n_rows * cell_h
    out.append(_text(left - 8, y + cell_h / 2 + 4, total_label, anchor="end", colour=MUTED))
    per_year = np.asarray(visits, dtype=float).T @ np.asarray(units, dtype=float)
    for j in range(n_cols):
        if show_numbers or j % step == 0:
            out.append(_text(left + (j + 0.5) * cell_w, y + cell_h / 2 + 4, format_number(int(per_year[j])),
                             size=10, anchor="middle", colour=MUTED))
    out.append("</svg>")
    return "".join(out)


def _frame(width, height, left, top, pw, ph, xlo, xhi, ylo, yhi, x_label, y_label, y_ticks=None):
    def sx(v):
        return left + (v - xlo) / (xhi - xlo) * pw

    def sy(v):
        return top + ph - (v - ylo) / (yhi - ylo) * ph

    out = [f'<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 {width} {height}" role="img">',
           f'<line x1="{left}" y1="{top + ph}" x2="{left + pw}" y2="{top + ph}" stroke="{INK}"/>',
           f'<line x1="{left}" y1="{top}" x2="{left}" y2="{top + ph}" stroke="{INK}"/>']
    for t in _axis_ticks(xlo, xhi):
        label = f"{t:.0f}" if abs(t - round(t)) < 1e-9 else format_number(float(t))
        out.append(_text(sx(t), top + ph + 16, label, anchor="middle"))
    for t in (y_ticks if y_ticks is not None else _axis_ticks(ylo, yhi)):
        out.append(f'<line x1="{left}" y1="{sy(t):.1f}" x2="{left + pw}" y2="{sy(t):.1f}" stroke="{RULE}"/>')
        out.append(_text(left - 6, sy(t) + 4, format_number(float(t)), anchor="end"))
    out.append(_text(left + pw / 2, height - 6, x_label, size=12, anchor="middle"))
    out.append(_text(14, top + ph / 2, y_label, size=12, anchor="middle",
                     extra=f' transform="rotate(-90 14 {top + ph / 2:.1f})"'))
    return out, sx, sy


def power_curves_svg(series, x_label="", y_label="", target=0.8, target_label="", width=900, height=320):
    """Power curves: ``series`` is ``[(label, x, power, power_se), ...]``; each point carries
    a ±2 SE Monte Carlo bar; a dashed line marks ``target``."""
    left, right, top, bottom = 70, 190, 15, 45
    pw, ph = width - left - right, height - top - bottom
    xs = np.concatenate([np.asarray(s[1], dtype=float) for s in series]) if series else np.array([0.0, 1.0])
    xlo, xhi = float(xs.min()), float(xs.max())
    if xhi <= xlo:
        xlo, xhi = xlo - 1.0, xhi + 1.0
    out, sx, sy = _frame(width, height, left, top, pw, ph, xlo, xhi, 0.0, 1.0, x_label, y_label,
                         y_ticks=(0.0, 0.2, 0.4, 0.6, 0.8, 1.0))
    out.append(f'<line x1="{left}" y1="{sy(target):.1f}" x2="{left + pw}" y2="{sy(target):.1f}" stroke="#b4443b" '
               f'stroke-dasharray="6,3" stroke-width="1.5"/>')
    out.append(_text(left + 6, sy(target) - 5, target_label, colour="#b4443b"))
    for i, (label, x, power, se) in enumerate(series):
        colour = category_colour(i)
        pts = " ".join(f"{sx(a):.1f},{sy(b):.1f}" for a, b in zip(x, power))
        out.append(f'<polyline points="{pts}" fill="none" stroke="{colour}" stroke-width="2"/>')
        for a, b, s in zip(x, power, se):
            lo, hi = max(b - 2 * s, 0.0), min(b + 2 * s, 1.0)
            out.append(f'<line x1="{sx(a):.1f}" y1="{sy(lo):.1f}" x2="{sx(a):.1f}" y2="{sy(hi):.1f}" '
                       f'stroke="{colour}"/>')
            out.append(f'<circle cx="{sx(a):.1f}" cy="{sy(b):.1f}" r="3" fill="{colour}"/>')
        ly = top + 34 + 20 * i
        out.append(f'<rect x="{left + pw + 12}" y="{ly - 10}" width="14" height="4" fill="{colour}"/>')
        out.append(_text(left + pw + 32, ly - 4, label))
    out.append("</svg>")
    return "".join(out)


def index_trend_svg(years, index, lo, hi, fit, fit_lo, fit_hi, x_label="", y_label="", index_label="",
                    fit_label="", width=900, height=340):
    """The yearly index (points with interval bars) and the fitted trend line with its band."""
    left, right, top, bottom = 70, 190, 15, 45
    pw, ph = width - left - right, height - top - bottom
    years = np.asarray(years, dtype=float)
    values = np.concatenate([np.asarray(v, dtype=float) for v in (index, lo, hi, fit_lo, fit_hi)])
    values = values[np.isfinite(values)]
    yhi = float(values.max()) * 1.08 if values.size and values.max() > 0 else 1.0
    xlo, xhi = float(years.min()) - 0.5, float(years.max()) + 0.5
    out, sx, sy = _frame(width, height, left, top, pw, ph, xlo, xhi, 0.0, yhi, x_label, y_label)
    band = [(a, b) for a, b in zip(years, fit_hi) if np.isfinite(b)] + \
        [(a, b) for a, b in zip(years[::-1], np.asarray(fit_lo)[::-1]) if np.isfinite(b)]
    if band:
        pts = " ".join(f"{sx(a):.1f},{sy(b):.1f}" for a, b in band)
        out.append(f'<polygon points="{pts}" fill="{BAND}" stroke="none"/>')
    pts = " ".join(f"{sx(a):.1f},{sy(b):.1f}" for a, b in zip(years, fit) if np.isfinite(b))
    out.append(f'<polyline points="{pts}" fill="none" stroke="{ACCENT}" stroke-width="2.5"/>')
    for a, b, c, d in zip(years, index, lo, hi):
        if np.isfinite(c) and np.isfinite(d):
            out.append(f'<line x1="{sx(a):.1f}" y1="{sy(c):.1f}" x2="{sx(a):.1f}" y2="{sy(d):.1f}" stroke="{INK}" '
                       f'stroke-width="1.5"/>')
        if np.isfinite(b):
            out.append(f'<circle cx="{sx(a):.1f}" cy="{sy(b):.1f}" r="4.5" fill="{CATEGORY_COLOURS[1]}" '
                       f'stroke="{INK}"/>')
    lx = left + pw + 12
    out.append(f'<circle cx="{lx + 7}" cy="{top + 20}" r="4.5" fill="{CATEGORY_COLOURS[1]}" stroke="{INK}"/>')
    out.append(_text(lx + 20, top + 24, index_label))
    out.append(f'<rect x="{lx}" y="{top + 38}" width="14" height="10" fill="{BAND}"/>'
               f'<line x1="{lx}" y1="{top + 43}" x2="{lx + 14}" y2="{top + 43}" stroke="{ACCENT}" stroke-width="2.5"/>')
    out.append(_text(lx + 20, top + 47, fit_label))
    out.append("</svg>")
    return "".join(out)
