"""The report of ``plotwise:panels``: the revisit schedule as a chart and tables, the
spread of each panel, method, references and the field-safety caution. Built from the
engine's :class:`PanelAssignment` and :class:`BalanceCheck`; never imports the host.

Every string is marked ``report.translate("PlotwiseReport", "…")`` (or
``QT_TRANSLATE_NOOP("PlotwiseReport", "…")`` for the constants below).
"""
from dataclasses import dataclass

import numpy as np

from ..engine.errors import QT_TRANSLATE_NOOP
from .time_charts import schedule_svg

REFERENCES = (
    "Urquhart, N. S. & Kincaid, T. M. (1999). Designs for detecting trend from repeated surveys of ecological "
    "resources. Journal of Agricultural, Biological, and Environmental Statistics 4, 404-414.",
    "McDonald, T. L. (2003). Review of environmental monitoring methods: survey designs. Environmental "
    "Monitoring and Assessment 85, 277-292.",
    "Robertson, B. L., Brown, J. A., McDonald, T. & Jaksons, P. (2013). BAS: balanced acceptance sampling of "
    "natural resources. Biometrics 69, 776-784.",
    "Stevens, D. L. & Olsen, A. R. (2004). Spatially balanced sampling of natural resources. Journal of the "
    "American Statistical Association 99, 262-278 (the Voronoi measure of spatial balance).",
)
DESIGN_NAMES = (
    QT_TRANSLATE_NOOP("PlotwiseReport", "every year"),
    QT_TRANSLATE_NOOP("PlotwiseReport", "rotating panels"),
    QT_TRANSLATE_NOOP("PlotwiseReport", "split panels"),
)
PANEL_HEADER = (
    QT_TRANSLATE_NOOP("PlotwiseReport", "Panel"),
    QT_TRANSLATE_NOOP("PlotwiseReport", "Units"),
    QT_TRANSLATE_NOOP("PlotwiseReport", "Visited in"),
)
YEAR_HEADER = (
    QT_TRANSLATE_NOOP("PlotwiseReport", "Year"),
    QT_TRANSLATE_NOOP("PlotwiseReport", "Panels visited"),
    QT_TRANSLATE_NOOP("PlotwiseReport", "Units"),
    QT_TRANSLATE_NOOP("PlotwiseReport", "Field days"),
)
BALANCE_HEADER = (
    QT_TRANSLATE_NOOP("PlotwiseReport", "Panel"),
    QT_TRANSLATE_NOOP("PlotwiseReport", "Units"),
    QT_TRANSLATE_NOOP("PlotwiseReport", "Spread measure"),
    QT_TRANSLATE_NOOP("PlotwiseReport", "Random panels of the same make-up"),
)


@dataclass(frozen=True)
class PanelsRun:
    """What the algorithm read: the ``layer`` name, the draw-order and stratum fields (or
    None), the units with role reserve, the ``seed`` of the balance check and the ``crs``."""

    layer: str
    order_field: object
    stratum_field: object
    n_reserves: int
    seed: int
    crs: str
    recorded_design: object = None  # "balanced", "random" or "grid" from the units' design field, or None


def _words(report, constants):
    return [report.translate("PlotwiseReport", text) for text in constants]


def panel_label(report, panel, design):
    """A readable panel name: the every-year panel, the core, or panel p."""
    if panel == 0 and design == 0:
        return report.translate("PlotwiseReport", "every year (all units)")
    if panel == 0:
        return report.translate("PlotwiseReport", "core (every year)")
    return report.translate("PlotwiseReport", "panel {p}").format(p=panel)


def fill_panels_report(report, assignment, balance, run, warnings=()):
    """Fill ``report`` (an :class:`html.Report`) for a panel assignment; ``warnings`` are
    the run's warnings in the user's language."""
    spec = assignment.spec
    design = report.translate("PlotwiseReport", DESIGN_NAMES[spec.design])
    per_year = assignment.units_per_year()
    low, high = int(per_year.min()), int(per_year.max())
    report.key_figures([
        (report.translate("PlotwiseReport", "design"), design),
        (report.translate("PlotwiseReport", "units in panels"), f"{int((assignment.panel >= 0).sum()):,}"),
        (report.translate("PlotwiseReport", "units per year"), f"{low:,}" if low == high else f"{low:,}–{high:,}"),
        (report.translate("PlotwiseReport", "years"), f"{spec.start_year}–{spec.start_year + spec.years - 1}"),
    ])
    report.parameters(_parameters(report, assignment, run, design))
    report.warnings(list(warnings))
    _schedule_section(report, assignment)
    _balance_section(report, balance, run)
    _method_section(report)
    report.references(REFERENCES)
    report.field_safety()
    return report


def _parameters(report, assignment, run, design):
    spec = assignment.spec
    days = assignment.days_per_unit
    no_order = report.translate("PlotwiseReport", "none: the order of the features")
    no_strata = report.translate("PlotwiseReport", "none: one stratum")
    return {
        report.translate("PlotwiseReport", "Units layer"): run.layer,
        report.translate("PlotwiseReport", "Panel design (PANEL_DESIGN)"): design,
        report.translate("PlotwiseReport", "Rotating panels (PANELS)"): spec.panels if spec.design else "–",
        report.translate("PlotwiseReport", "Share of units in the core (CORE_SHARE)"):
            f"{spec.core_share:g}" if spec.design == 2 else "–",
        report.translate("PlotwiseReport", "First year (START_YEAR)"): spec.start_year,
        report.translate("PlotwiseReport", "Years (YEARS)"): spec.years,
        report.translate("PlotwiseReport", "Draw-order field"): run.order_field or no_order,
        report.translate("PlotwiseReport", "Stratum field"): run.stratum_field or no_strata,
        report.translate("PlotwiseReport", "Field days per unit visit"): f"{days:g}" if days > 0 else "–",
        report.translate("PlotwiseReport", "Reserve units (no panel)"): run.n_reserves,
        report.translate("PlotwiseReport", "Seed (balance check only)"): run.seed,
        report.translate("PlotwiseReport", "CRS"): run.crs,
    }


def _schedule_section(report, assignment):
    spec = assignment.spec
    numbers = spec.panel_numbers
    units = [int((assignment.panel == p).sum()) for p in numbers]
    labels = [panel_label(report, p, spec.design) for p in numbers]
    visits = np.array([spec.visited(p) for p in numbers])
    report.section(report.translate("PlotwiseReport", "Schedule"))
    chart = schedule_svg(spec.calendar, labels, visits, units,
                         total_label=report.translate("PlotwiseReport", "units per year"))
    report.figure(chart, report.translate(
        "PlotwiseReport", "Years in which each panel is visited, with its number of units; the last row adds them up."))
    rows = [[label, n, ", ".join(str(y) for y in spec.visit_years(p))] for label, n, p in zip(labels, units, numbers)]
    report.table(_words(report, PANEL_HEADER), rows)
    with_days = assignment.days_per_unit > 0
    year_rows = []
    for year, n in zip(spec.calendar, assignment.units_per_year()):
        visited = [panel_label(report, r.panel, spec.design) for r in assignment.schedule if r.year == int(year)]
        row = [str(int(year)), ", ".join(visited), int(n)]
        year_rows.append(row + [float(n * assignment.days_per_unit)] if with_days else row)
    report.table(_words(report, YEAR_HEADER if with_days else YEAR_HEADER[:3]), year_rows)
    if len(assignment.strata) > 1:
        strata_rows = [[str(key)] + [assignment.sizes.get((key, p), 0) for p in numbers] for key in assignment.strata]
        report.table([report.translate("PlotwiseReport", "Stratum")] + labels, strata_rows,
                     caption=report.translate("PlotwiseReport", "Units of each stratum in each panel."))


def _balance_section(report, balance, run):
    report.section(report.translate("PlotwiseReport", "Spread of the panels"))
    if run.recorded_design == "balanced":
        report.paragraph(report.translate(
            "PlotwiseReport", "The layout records a spatially balanced design (the units' design field)."))
    elif run.recorded_design == "random":
        report.note(report.translate(
            "PlotwiseReport",
            "The layout records a simple random design (the units' design field): each panel is a random part of "
            "it, not an evenly spread sample of the frame."))
    elif run.recorded_design == "grid":
        report.note(report.translate(
            "PlotwiseReport",
            "The layout records a systematic grid (the units' design field): its draw order runs row by row, so "
            "the panels are bands across the frame."))
    else:
        report.paragraph(report.translate(
            "PlotwiseReport",
            "The units carry no design record (the design field of plotwise:layout): the check below tells whether "
            "the panels are evenly spread."))
    if not balance.rows:
        report.paragraph(report.translate(
            "PlotwiseReport",
            "No panel could be checked: the units need at least 3 positions not on one line, and a panel at least 2 "
            "units."))
        return
    rows = [[panel_label(report, r.panel, 1), r.n_units, r.measure, r.random_median] for r in balance.rows]
    report.table(_words(report, BALANCE_HEADER), rows, caption=report.translate(
        "PlotwiseReport",
        "Spread measure of Stevens & Olsen (2004) over the whole layout: 0 for a perfectly even spread, larger for "
        "clumps and gaps. The random panels take the same number of units from each stratum (median over the "
        "rearrangements of the check)."))
    if balance.balanced and balance.p_value > balance.alpha:
        report.paragraph(report.translate(
            "PlotwiseReport",
            "The panels are more evenly spread than random parts of the layout (their spread measure is {r:.0%} of "
            "that of random panels), though with this few units the check cannot confirm it (p = {p:.3f} from {b} "
            "random rearrangements).").format(r=balance.spread_ratio, p=balance.p_value, b=balance.rearrangements))
    elif balance.balanced:
        report.paragraph(report.translate(
            "PlotwiseReport",
            "The panels are more evenly spread than random parts of the layout (p = {p:.3f} from {b} random "
            "rearrangements): as expected when the layout is spatially balanced and the panels follow its draw "
            "order.").format(p=balance.p_value, b=balance.rearrangements))
    else:
        report.note(report.translate(
            "PlotwiseReport",
            "The panels are not shown to be more evenly spread than random parts of the layout (p = {p:.3f} from {b} "
            "random rearrangements). If the layout was simple random, each panel is just a random part of it; if it "
            "was a systematic grid, whose draw order runs row by row, the panels are bands. For evenly spread panels, "
            "lay out the units with the spatially balanced design. With few units the check may also miss a real "
            "balance.").format(p=balance.p_value, b=balance.rearrangements))


def _method_section(report):
    report.section(report.translate("PlotwiseReport", "Method"))
    report.paragraph(report.translate(
        "PlotwiseReport",
        "Within each stratum the primary units are taken in draw order and cut into consecutive blocks: the core "
        "(split panels) first, then panel 1, panel 2 and so on, as evenly as possible. Rotating panel p is visited "
        "in the years start + (p − 1) + m·K, so that each of its units is revisited every K years and about 1/K of "
        "the rotating units are surveyed each year; the core, and the single panel of the every-year design, are "
        "visited every year (Urquhart & Kincaid 1999; McDonald 2003)."))
    report.paragraph(report.translate(
        "PlotwiseReport",
        "In a spatially balanced layout every run of consecutive units of the draw order is itself spread over the "
        "stratum (Robertson et al. 2013), so each panel covers the whole stratum. The check compares the Voronoi "
        "spread measure of the panels (Stevens & Olsen 2004), computed over a fine grid on the convex hull of the "
        "units, with random rearrangements of the panels within each stratum."))
    report.paragraph(report.translate(
        "PlotwiseReport",
        "Reserve units get no panel. A reserve that replaces a primary unit takes over the primary's panel and "
        "years; record the replacement."))
    report.note(report.translate(
        "PlotwiseReport",
        "Revisiting the same units every year gives the most precise trend for the effort; rotating panels cover "
        "more ground over a cycle but link the years only through the units they share. The split design keeps a "
        "core for the year-to-year links. Compare the options with the power analysis (plotwise:trendpower) before "
        "committing to a schedule."))
