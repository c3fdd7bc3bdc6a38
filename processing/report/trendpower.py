"""The report of ``plotwise:trendpower``: power curves against years and against units, the
years needed for 80% power, the assumptions and the caution that power depends on them.
Built from the engine's :class:`PowerResult`; never imports the host."""
from dataclasses import dataclass

import numpy as np

from .time_charts import power_curves_svg

REFERENCES = (
    "Gerrodette, T. (1987). A power analysis for detecting trends. Ecology 68, 1364-1372.",
    "Urquhart, N. S. & Kincaid, T. M. (1999). Designs for detecting trend from repeated surveys of ecological "
    "resources. Journal of Agricultural, Biological, and Environmental Statistics 4, 404-414.",
    "McDonald, T. L. (2003). Review of environmental monitoring methods: survey designs. Environmental "
    "Monitoring and Assessment 85, 277-292.",
    "McCullagh, P. & Nelder, J. A. (1989). Generalized Linear Models, 2nd ed. Chapman & Hall (log-linear "
    "models and quasi-likelihood, the test used on each simulated programme).",
)


@dataclass(frozen=True)
class PowerRun:
    """Where the design and the variance components came from: ``design_from`` (the name
    of a panels layer or None), ``pilot_from`` (the name of a pilot table or None) and the
    ``seed``."""

    design_from: object
    pilot_from: object
    seed: int


def _change_label(change, tr):
    return tr("{c:+g}% per year").format(c=change)


def fill_power_report(report, result, run, design_name, tr, warnings=()):
    """Fill ``report`` for a :class:`PowerResult`; ``design_name`` describes the panels,
    ``warnings`` are in the user's language."""
    spec = result.spec
    planned = {row.change: row for row in result.rows if row.years == spec.plan.years and row.n_units == spec.n_units}
    report.key_figures(
        [(tr("power for {c} after {t} years").format(c=_change_label(c, tr), t=spec.plan.years),
          f"{planned[c].power:.2f} ± {planned[c].power_se:.2f}") for c in spec.changes]
        + [(tr("years for 80% power ({c})").format(c=_change_label(c, tr)),
            str(result.years_needed[c]) if result.years_needed[c] else tr("more than {t}").format(t=spec.plan.years))
           for c in spec.changes])
    for change in spec.changes:
        needed = result.years_needed[change]
        report.paragraph(
            tr("A change of {c} is detected with 80% power after {t} years of this programme.").format(
                c=_change_label(change, tr), t=needed) if needed else
            tr("A change of {c} is not detected with 80% power within {t} years of this programme.").format(
                c=_change_label(change, tr), t=spec.plan.years))
    report.parameters(_parameters(result, run, design_name, tr))
    report.warnings(list(warnings))
    _curves(report, result, tr)
    _method(report, result, tr)
    report.section(tr("Cautions"))
    report.note(tr(
        "Power depends on the variance components assumed: the spread between units, the unit × year noise and "
        "above all the year-to-year variation shared by all units. Larger values than those entered give less "
        "power. The defaults are illustrative, not measured: use values from a pilot or from earlier years of the "
        "programme, and try a range."))
    report.note(tr(
        "The simulation assumes a steady change in % per year, constant detection, and that every planned visit "
        "happens. Missed visits, a change in detection or a trend that is not steady reduce the power."))
    report.references(REFERENCES)
    report.field_safety()
    return report


def _parameters(result, run, design_name, tr):
    spec = result.spec
    return {
        tr("Units (N_UNITS)"): spec.n_units,
        tr("Years (YEARS)"): spec.plan.years,
        tr("Panel design"): (tr("{design} (from {layer})").format(design=design_name, layer=run.design_from)
                             if run.design_from else design_name),
        tr("Changes to detect (% per year)"): ", ".join(f"{c:+g}" for c in spec.changes),
        tr("Mean animals per unit in the first year (MEAN_COUNT)"): f"{spec.mean_count:g}",
        tr("SD between units, log scale (SD_UNIT)"): f"{spec.sd_unit:.3g}",
        tr("SD unit × year, log scale (SD_UNIT_YEAR)"): f"{spec.sd_unit_year:.3g}",
        tr("SD year to year, log scale (SD_YEAR)"): f"{spec.sd_year:.3g}",
        tr("Mean count and SD between units from"): run.pilot_from or tr("the parameters"),
        tr("Detection probability (DETECTION)"): f"{spec.detection:g}",
        tr("Significance level (ALPHA)"): f"{spec.alpha:g}",
        tr("Test"): tr("two-sided") if spec.two_sided else tr("one-sided, in the direction of the change"),
        tr("Replicates (REPLICATES)"): spec.replicates,
        tr("Seed"): run.seed,
        tr("Largest Monte Carlo standard error of a power"): f"{0.5 / np.sqrt(spec.replicates):.3f}",
    }


def _curves(report, result, tr):
    spec = result.spec
    report.section(tr("Power against years"))
    series = []
    for change in spec.changes:
        rows = [r for r in result.rows if r.change == change and "years" in r.curve]
        series.append((_change_label(change, tr), [r.years for r in rows], [r.power for r in rows],
                       [r.power_se for r in rows]))
    report.figure(power_curves_svg(series, x_label=tr("years of the programme"), y_label=tr("power"),
                                   target_label=tr("80%")),
                  tr("Power with {n} units against the number of years; bars: ±2 Monte Carlo SE.").format(
                      n=spec.n_units))
    _table(report, result, "years", tr)
    report.section(tr("Power against units"))
    series = []
    for change in spec.changes:
        rows = sorted((r for r in result.rows if r.change == change and "units" in r.curve), key=lambda r: r.n_units)
        series.append((_change_label(change, tr), [r.n_units for r in rows], [r.power for r in rows],
                       [r.power_se for r in rows]))
    report.figure(power_curves_svg(series, x_label=tr("units"), y_label=tr("power"), target_label=tr("80%")),
                  tr("Power after {t} years against the number of units; bars: ±2 Monte Carlo SE.").format(
                      t=spec.plan.years))
    _table(report, result, "units", tr)


def _table(report, result, curve, tr):
    chosen = sorted((r for r in result.rows if curve in r.curve), key=lambda r: (r.change, r.years, r.n_units))
    rows = [[r.years, r.n_units, f"{r.change:+g}", r.power, r.power_se, r.failed] for r in chosen]
    report.table([tr("Years"), tr("Units"), tr("Change (% per year)"), tr("Power"), tr("Monte Carlo SE"),
                  tr("Fits that failed")], rows)


def _method(report, result, tr):
    spec = result.spec
    report.section(tr("Method"))
    report.paragraph(tr(
        "Each of the {r:,} replicates simulates the counts of every unit in every year it is visited: "
        "count ~ Poisson(p·λ), log λ = log(mean) + β·t + unit effect + year effect + unit × year effect, with "
        "normal effects of the SDs given (on the log scale) and β = ln(1 + change/100). The replicate's trend is "
        "estimated with the same log-linear Poisson model with unit effects and quasi-likelihood scale between "
        "years as plotwise:trend, and the change counts as detected when its t test rejects at level {a:g}. "
        "Power is the share of replicates with a detection; its Monte Carlo SE is √(P(1 − P)/R) "
        "(Gerrodette 1987 for the setting).").format(r=spec.replicates, a=spec.alpha))
    report.paragraph(tr(
        "Shorter programmes are the first years of the same simulated programmes; programmes with other numbers of "
        "units are the first units of larger simulated programmes, assigned to panels anew. Power for a programme "
        "of fewer years is shown only from the first length that leaves a degree of freedom for year-to-year "
        "variation."))
    report.paragraph(tr(
        "A one-season pilot gives the mean count and the spread between units (the estimate step's mean_c and "
        "sd_c): with a Poisson–log-normal count, SD_UNIT² = ln(1 + (s² − m)/m²) − SD_UNIT_YEAR². The unit × year "
        "and year-to-year SDs need several years of counts."))
