"""One self-contained HTML report builder shared by every Plotwise algorithm.

A report holds headings, paragraphs, tables, inline SVG figures, the inputs and
parameters, the seed and CRS, warnings, method references and the field-safety
caution. It has no external resources (no scripts, fonts, images or style sheets
from elsewhere) and escapes every string it is given. It never imports the host.

Usage::

    report = Report("Sample-unit layout", translate=QCoreApplication.translate)
    report.parameters({"Design": "spatially balanced", "Seed": 1234})
    report.section("Units per stratum")
    report.table(["Stratum", "Units"], [[1, 12], [2, 9]])
    report.figure(svg_text, "Map of the units")
    report.warnings(["..."])
    report.references(["Cochran, W. G. (1977) Sampling Techniques. 3rd ed. Wiley."])
    report.field_safety()
    report.write(path)

``translate(context, text)`` is the host's translator (``QCoreApplication.translate``); without it
the report stays in English. The report's own words are marked for pylupdate5 as
``self.translate("PlotwiseReport", "…")`` (or ``QT_TRANSLATE_NOOP("PlotwiseReport", "…")`` for a
constant), and report code elsewhere calls ``report.translate("PlotwiseReport", "…")`` the same way.
"""
import datetime
import html
import numbers

from ..engine.errors import QT_TRANSLATE_NOOP
from .style import STYLE_SHEET

FIELD_SAFETY_CAUTION = QT_TRANSLATE_NOOP(
    "PlotwiseReport",
    "Check every unit's access and safety before sending a team. This tool chooses locations "
    "for statistical reasons only: it never makes a location safe to reach or to work in. "
    "Steep, remote or flooded terrain, wildlife, weather and private land can put people at "
    "risk. Follow your agency's field-safety rules and local law, and leave out or replace any "
    "unit that cannot be reached safely (record it as not surveyed)."
)


def _untranslated(context, text):
    return text


def escape(value):
    """HTML-escape any value (quotes included)."""
    return html.escape("" if value is None else str(value), quote=True)


def format_number(value, digits=3):
    """A readable number: thousands separators, ``digits`` significant decimals, '–' for missing."""
    if value is None:
        return "–"
    if isinstance(value, bool):
        return "yes" if value else "no"
    if isinstance(value, numbers.Integral):
        return f"{int(value):,}"
    if isinstance(value, numbers.Real):
        v = float(value)
        if v != v:  # NaN
            return "–"
        if v in (float("inf"), float("-inf")):
            return "∞" if v > 0 else "−∞"
        if abs(v) >= 10**digits:
            return f"{v:,.0f}"
        return f"{v:.{digits}g}"
    return str(value)


def crs_text(report, crs, projected_from=None):
    """The computation CRS for a report's parameters (``crs``: "EPSG:… (name)"), saying which CRS the
    frame was projected from (to the UTM zone of its centre) when it was."""
    if not projected_from:
        return crs
    return crs + report.translate(
        "PlotwiseReport", ", projected from {src} (UTM zone of the frame's centre)").format(src=projected_from)


class Report:
    """Collects the blocks of one report and renders them as one HTML page."""

    def __init__(self, title, algorithm_id=None, translate=None, language="en"):
        self._translate = translate or _untranslated
        self.language = language
        self.title = title
        self.algorithm_id = algorithm_id
        self._blocks = []
        self._warnings = []
        self._references = []
        self._caution = False

    def translate(self, context, text):
        """``text`` in the report's language (``context`` and ``text`` literals, as pylupdate5 reads them)."""
        return self._translate(context, text)

    # -- content -----------------------------------------------------------------
    def section(self, heading):
        self._blocks.append(f"<h2>{escape(heading)}</h2>")

    def subsection(self, heading):
        self._blocks.append(f"<h3>{escape(heading)}</h3>")

    def paragraph(self, text):
        self._blocks.append(f"<p>{escape(text)}</p>")

    def note(self, text):
        """A highlighted paragraph (assumptions, scope of inference)."""
        self._blocks.append(f'<p class="note">{escape(text)}</p>')

    def key_figures(self, items):
        """A row of headline numbers: ``[(label, value_text), ...]``."""
        cells = "".join(
            f'<div class="figure-box"><div class="figure-value">{escape(value)}</div>'
            f'<div class="figure-label">{escape(label)}</div></div>'
            for label, value in items
        )
        self._blocks.append(f'<div class="figures">{cells}</div>')

    def table(self, header, rows, caption=None, digits=3):
        """A table; numbers are formatted, everything is escaped."""
        head = "".join(f"<th>{escape(h)}</th>" for h in header)
        body = []
        for row in rows:
            cells = []
            for value in row:
                numeric = isinstance(value, numbers.Number) and not isinstance(value, bool)
                if isinstance(value, bool):
                    text = self.translate("PlotwiseReport", "yes") if value else self.translate(
                        "PlotwiseReport", "no")
                else:
                    text = format_number(value, digits) if numeric or value is None else str(value)
                css = ' class="num"' if numeric else ""
                cells.append(f"<td{css}>{escape(text)}</td>")
            body.append("<tr>" + "".join(cells) + "</tr>")
        cap = f"<caption>{escape(caption)}</caption>" if caption else ""
        self._blocks.append(
            f'<div class="table-wrap"><table>{cap}<thead><tr>{head}</tr></thead>'
            f"<tbody>{''.join(body)}</tbody></table></div>"
        )

    def figure(self, svg_markup, caption=None):
        """An inline SVG figure. ``svg_markup`` must come from :mod:`.svg` (it escapes its text)."""
        cap = f"<figcaption>{escape(caption)}</figcaption>" if caption else ""
        self._blocks.append(f"<figure>{svg_markup}{cap}</figure>")

    def parameters(self, mapping, heading=None):
        """Inputs and parameters as a two-column table (seed and CRS belong here too)."""
        self.section(heading or self.translate("PlotwiseReport", "Inputs and parameters"))
        rows = [[k, str(v) if isinstance(v, numbers.Integral) and not isinstance(v, bool) else v]
                for k, v in mapping.items()]
        header = [self.translate("PlotwiseReport", "Item"), self.translate("PlotwiseReport", "Value")]
        self.table(header, rows)  # whole numbers (seeds, ids) without separators

    def warnings(self, messages):
        self._warnings.extend(str(m) for m in messages if m)

    def references(self, items):
        for item in items:
            if item not in self._references:
                self._references.append(item)

    def field_safety(self):
        """Add the field-safety caution (for every report that sends people outdoors)."""
        self._caution = True

    # -- output ------------------------------------------------------------------
    def render(self):
        parts = [
            "<!DOCTYPE html>",
            f'<html lang="{escape(self.language)}"><head><meta charset="utf-8">',
            '<meta name="viewport" content="width=device-width, initial-scale=1">',
            f"<title>{escape(self.title)}</title>",
            f"<style>{STYLE_SHEET}</style></head><body><main>",
            '<header class="report-head">',
            f'<div class="brand">Plotwise</div><h1>{escape(self.title)}</h1>',
        ]
        stamp = datetime.datetime.now().strftime("%Y-%m-%d %H:%M")
        meta = self.translate("PlotwiseReport", "Written") + f" {stamp}"
        if self.algorithm_id:
            meta += " · " + self.translate("PlotwiseReport", "algorithm") + f" {self.algorithm_id}"
        parts.append(f'<p class="meta">{escape(meta)}</p></header>')
        if self._caution:
            heading = escape(self.translate("PlotwiseReport", "Field safety"))
            caution = escape(self.translate("PlotwiseReport", FIELD_SAFETY_CAUTION))
            parts.append(f'<aside class="caution"><strong>{heading}.</strong> {caution}</aside>')
        if self._warnings:
            items = "".join(f"<li>{escape(w)}</li>" for w in self._warnings)
            heading = escape(self.translate("PlotwiseReport", "Warnings"))
            parts.append(f'<section class="warnings"><h2>{heading}</h2><ul>{items}</ul></section>')
        parts.extend(self._blocks)
        if self._references:
            items = "".join(f"<li>{escape(r)}</li>" for r in self._references)
            heading = escape(self.translate("PlotwiseReport", "Method references"))
            parts.append(f'<section class="refs"><h2>{heading}</h2><ol>{items}</ol></section>')
        parts.append("</main></body></html>")
        return "\n".join(parts)

    def write(self, path):
        with open(path, "w", encoding="utf-8") as handle:
            handle.write(self.render())
        return path
