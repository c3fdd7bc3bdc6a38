"""The report of ``plotwise:panels``: the revisit schedule as a chart and tables, the
spread of each panel, method, references and the field-safety caution. Built from the
engine's :class:`PanelAssignment` and :class:`BalanceCheck`; never imports the host."""
from dataclasses import dataclass

import numpy as np

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
    design_source: str = ""


def panel_label(panel, design, tr):
    """A readable panel name: the every-year panel, the core, or panel p."""
    if panel == 0:
        return tr("every year (all units)") if design == 0 else tr("core (every year)")
    return tr("panel {p}").format(p=panel)


def fill_panels_report(report, assignment, balance, run, tr, warnings=()):
    """Fill ``report`` (an :class:`html.Report`) for a panel assignment; ``warnings`` are
    the run's warnings in the user's language."""
    spec = assignment.spec
    design_names = (tr("every year"), tr("rotating panels"), tr("split panels"))
    per_year = assignment.units_per_year()
    n_assigned = int((assignment.panel >= 0).sum())
    report.key_figures([
        (tr("design"), design_names[spec.design]),
        (tr("units in panels"), f"{n_assigned:,}"),
        (tr("units per year"), f"{per_year.min():,}" if per_year.min() == per_year.max()
         else f"{per_year.min():,}–{per_year.max():,}"),
        (tr("years"), f"{spec.start_year}–{spec.start_year + spec.years - 1}"),
    ])
    parameters = {
        tr("Units layer"): run.layer,
        tr("Panel design (PANEL_DESIGN)"): design_names[spec.design],
        tr("Rotating panels (PANELS)"): spec.panels if spec.design else "–",
        tr("Share of units in the core (CORE_SHARE)"): f"{spec.core_share:g}" if spec.design == 2 else "–",
        tr("First year (START_YEAR)"): spec.start_year,
        tr("Years (YEARS)"): spec.years,
        tr("Draw-order field"): run.order_field or tr("none: the order of the features"),
        tr("Stratum field"): run.stratum_field or tr("none: one stratum"),
        tr("Field days per unit visit"): f"{assignment.days_per_unit:g}" if assignment.days_per_unit > 0 else "–",
        tr("Reserve units (no panel)"): run.n_reserves,
        tr("Seed (balance check only)"): run.seed,
        tr("CRS"): run.crs,
    }
    report.parameters(parameters)
    report.warnings(list(warnings))
    _schedule_section(report, assignment, tr)
    _balance_section(report, balance, run, tr)
    _method_section(report, spec, tr)
    report.references(REFERENCES)
    report.field_safety()
    return report


def _schedule_section(report, assignment, tr):
    spec = assignment.spec
    numbers = spec.panel_numbers
    units = [int((assignment.panel == p).sum()) for p in numbers]
    labels = [panel_label(p, spec.design, tr) for p in numbers]
    visits = np.array([spec.visited(p) for p in numbers])
    report.section(tr("Schedule"))
    report.figure(schedule_svg(spec.calendar, labels, visits, units, total_label=tr("units per year")),
                  tr("Years in which each panel is visited, with its number of units; the last row adds them up."))
    rows = [[label, n, ", ".join(str(y) for y in spec.visit_years(p))] for label, n, p in zip(labels, units, numbers)]
    report.table([tr("Panel"), tr("Units"), tr("Visited in")], rows)
    per_year = assignment.units_per_year()
    header = [tr("Year"), tr("Panels visited"), tr("Units")]
    if assignment.days_per_unit > 0:
        header.append(tr("Field days"))
    year_rows = []
    for year, n in zip(spec.calendar, per_year):
        visited = [panel_label(r.panel, spec.design, tr) for r in assignment.schedule if r.year == int(year)]
        row = [str(int(year)), ", ".join(visited), int(n)]
        if assignment.days_per_unit > 0:
            row.append(float(n * assignment.days_per_unit))
        year_rows.append(row)
    report.table(header, year_rows)
    if len(assignment.strata) > 1:
        strata_rows = [[str(key)] + [assignment.sizes.get((key, p), 0) for p in numbers] for key in assignment.strata]
        report.table([tr("Stratum")] + labels, strata_rows, caption=tr("Units of each stratum in each panel."))


def _balance_section(report, balance, run, tr):
    report.section(tr("Spread of the panels"))
    if run.design_source:
        report.paragraph(run.design_source)
    if not balance.rows:
        report.paragraph(tr("No panel could be checked: the units need at least 3 positions not on one line, and a "
                            "panel at least 2 units."))
        return
    rows = [[panel_label(r.panel, 1, tr), r.n_units, r.measure, r.random_median] for r in balance.rows]
    report.table([tr("Panel"), tr("Units"), tr("Spread measure"), tr("Random panels of the same make-up")], rows,
                 caption=tr("Spread measure of Stevens & Olsen (2004) over the whole layout: 0 for a perfectly even "
                            "spread, larger for clumps and gaps. The random panels take the same number of units "
                            "from each stratum (median over the rearrangements of the check)."))
    if balance.balanced:
        report.paragraph(tr(
            "The panels are more evenly spread than random parts of the layout (p = {p:.3f} from {b} random "
            "rearrangements): as expected when the layout is spatially balanced and the panels follow its draw "
            "order.").format(p=balance.p_value, b=balance.rearrangements))
    else:
        report.note(tr(
            "The panels are not shown to be more evenly spread than random parts of the layout (p = {p:.3f} from {b} "
            "random rearrangements). If the layout was simple random, each panel is just a random part of it; if it "
            "was a systematic grid, whose draw order runs row by row, the panels are bands. For evenly spread panels, "
            "lay out the units with the spatially balanced design. With few units the check may also "
            "miss a real balance.").format(p=balance.p_value, b=balance.rearrangements))


def _method_section(report, spec, tr):
    report.section(tr("Method"))
    report.paragraph(tr(
        "Within each stratum the primary units are taken in draw order and cut into consecutive blocks: the core "
        "(split panels) first, then panel 1, panel 2 and so on, as evenly as possible. Rotating panel p is visited "
        "in the years start + (p − 1) + m·K, so that each of its units is revisited every K years and about 1/K of "
        "the rotating units are surveyed each year; the core, and the single panel of the every-year design, are "
        "visited every year (Urquhart & Kincaid 1999; McDonald 2003)."))
    report.paragraph(tr(
        "In a spatially balanced layout every run of consecutive units of the draw order is itself spread over the "
        "stratum (Robertson et al. 2013), so each panel covers the whole stratum. The check compares the Voronoi "
        "spread measure of the panels (Stevens & Olsen 2004), computed over a fine grid on the convex hull of the "
        "units, with random rearrangements of the panels within each stratum."))
    report.paragraph(tr(
        "Reserve units get no panel. A reserve that replaces a primary unit takes over the primary's panel and "
        "years; record the replacement."))
    report.note(tr(
        "Revisiting the same units every year gives the most precise trend for the effort; rotating panels cover "
        "more ground over a cycle but link the years only through the units they share. The split design keeps a "
        "core for the year-to-year links. Compare the options with the power analysis (plotwise:trendpower) before "
        "committing to a schedule."))
