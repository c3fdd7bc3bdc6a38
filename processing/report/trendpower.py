"""The report of ``plotwise:trendpower``: power curves against years and against units, the
years needed for 80% power, the assumptions and the caution that power depends on them.
Built from the engine's :class:`PowerResult`; never imports the host.

Every string is marked ``report.translate("PlotwiseReport", "…")`` (or
``QT_TRANSLATE_NOOP("PlotwiseReport", "…")`` for the constants below).
"""
from dataclasses import dataclass

import numpy as np

from ..engine.errors import QT_TRANSLATE_NOOP
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
POWER_HEADER = (
    QT_TRANSLATE_NOOP("PlotwiseReport", "Years"),
    QT_TRANSLATE_NOOP("PlotwiseReport", "Units"),
    QT_TRANSLATE_NOOP("PlotwiseReport", "Change (% per year)"),
    QT_TRANSLATE_NOOP("PlotwiseReport", "Power"),
    QT_TRANSLATE_NOOP("PlotwiseReport", "Monte Carlo SE"),
    QT_TRANSLATE_NOOP("PlotwiseReport", "Fits that failed"),
)


@dataclass(frozen=True)
class PowerRun:
    """Where the design and the variance components came from: ``design_from`` (the name
    of a panels layer or None), ``pilot_from`` (the name of a pilot table or None) and the
    ``seed``."""

    design_from: object
    pilot_from: object
    seed: int


def _change_label(report, change):
    return report.translate("PlotwiseReport", "{c:+g}% per year").format(c=change)


def fill_power_report(report, result, run, design_name, warnings=()):
    """Fill ``report`` for a :class:`PowerResult`; ``design_name`` describes the panels,
    ``warnings`` are in the user's language."""
    spec = result.spec
    years = spec.plan.years
    planned = {row.change: row for row in result.rows if row.years == years and row.n_units == spec.n_units}
    figures = [(report.translate("PlotwiseReport", "power for {c} after {t} years").format(
        c=_change_label(report, c), t=years), f"{planned[c].power:.2f} ± {planned[c].power_se:.2f}")
        for c in spec.changes]
    for change in spec.changes:
        needed = result.years_needed[change]
        figures.append((report.translate("PlotwiseReport", "years for 80% power ({c})").format(
            c=_change_label(report, change)), str(needed) if needed else report.translate(
            "PlotwiseReport", "more than {t}").format(t=years)))
    report.key_figures(figures)
    for change in spec.changes:
        needed, label = result.years_needed[change], _change_label(report, change)
        if needed:
            report.paragraph(report.translate(
                "PlotwiseReport",
                "A change of {c} is detected with 80% power after {t} years of this programme.").format(
                c=label, t=needed))
        else:
            report.paragraph(report.translate(
                "PlotwiseReport",
                "A change of {c} is not detected with 80% power within {t} years of this programme.").format(
                c=label, t=years))
    report.parameters(_parameters(report, result, run, design_name))
    report.warnings(list(warnings))
    _curves(report, result)
    _method(report, result)
    _cautions(report)
    report.references(REFERENCES)
    report.field_safety()
    return report


def _parameters(report, result, run, design_name):
    spec = result.spec
    if run.design_from:
        design_name = report.translate("PlotwiseReport", "{design} (from {layer})").format(
            design=design_name, layer=run.design_from)
    two_sided = report.translate("PlotwiseReport", "two-sided")
    one_sided = report.translate("PlotwiseReport", "one-sided, in the direction of the change")
    return {
        report.translate("PlotwiseReport", "Units (N_UNITS)"): spec.n_units,
        report.translate("PlotwiseReport", "Years (YEARS)"): spec.plan.years,
        report.translate("PlotwiseReport", "Panel design"): design_name,
        report.translate("PlotwiseReport", "Changes to detect (% per year)"):
            ", ".join(f"{c:+g}" for c in spec.changes),
        report.translate("PlotwiseReport", "Mean animals per unit in the first year (MEAN_COUNT)"):
            f"{spec.mean_count:g}",
        report.translate("PlotwiseReport", "SD between units, log scale (SD_UNIT)"): f"{spec.sd_unit:.3g}",
        report.translate("PlotwiseReport", "SD unit × year, log scale (SD_UNIT_YEAR)"): f"{spec.sd_unit_year:.3g}",
        report.translate("PlotwiseReport", "SD year to year, log scale (SD_YEAR)"): f"{spec.sd_year:.3g}",
        report.translate("PlotwiseReport", "Mean count and SD between units from"):
            run.pilot_from or report.translate("PlotwiseReport", "the parameters"),
        report.translate("PlotwiseReport", "Detection probability (DETECTION)"): f"{spec.detection:g}",
        report.translate("PlotwiseReport", "Significance level (ALPHA)"): f"{spec.alpha:g}",
        report.translate("PlotwiseReport", "Test"): two_sided if spec.two_sided else one_sided,
        report.translate("PlotwiseReport", "Replicates (REPLICATES)"): spec.replicates,
        report.translate("PlotwiseReport", "Seed"): run.seed,
        report.translate("PlotwiseReport", "Largest Monte Carlo standard error of a power"):
            f"{0.5 / np.sqrt(spec.replicates):.3f}",
    }


def _series(report, result, curve, axis):
    series = []
    for change in result.spec.changes:
        rows = sorted((r for r in result.rows if r.change == change and curve in r.curve), key=lambda r: axis(r))
        series.append((_change_label(report, change), [axis(r) for r in rows], [r.power for r in rows],
                       [r.power_se for r in rows]))
    return series


def _curves(report, result):
    spec = result.spec
    target = report.translate("PlotwiseReport", "80%")
    power = report.translate("PlotwiseReport", "power")
    report.section(report.translate("PlotwiseReport", "Power against years"))
    chart = power_curves_svg(_series(report, result, "years", lambda r: r.years), y_label=power, target_label=target,
                             x_label=report.translate("PlotwiseReport", "years of the programme"))
    report.figure(chart, report.translate(
        "PlotwiseReport", "Power with {n} units against the number of years; bars: ±2 Monte Carlo SE.").format(
        n=spec.n_units))
    _table(report, result, "years")
    report.section(report.translate("PlotwiseReport", "Power against units"))
    chart = power_curves_svg(_series(report, result, "units", lambda r: r.n_units), y_label=power,
                             target_label=target, x_label=report.translate("PlotwiseReport", "units"))
    report.figure(chart, report.translate(
        "PlotwiseReport", "Power after {t} years against the number of units; bars: ±2 Monte Carlo SE.").format(
        t=spec.plan.years))
    _table(report, result, "units")


def _table(report, result, curve):
    chosen = sorted((r for r in result.rows if curve in r.curve), key=lambda r: (r.change, r.years, r.n_units))
    rows = [[r.years, r.n_units, f"{r.change:+g}", r.power, r.power_se, r.failed] for r in chosen]
    report.table([report.translate("PlotwiseReport", text) for text in POWER_HEADER], rows)


def _method(report, result):
    spec = result.spec
    report.section(report.translate("PlotwiseReport", "Method"))
    report.paragraph(report.translate(
        "PlotwiseReport",
        "Each of the {r:,} replicates simulates the counts of every unit in every year it is visited: "
        "count ~ Poisson(p·λ), log λ = log(mean) + β·t + unit effect + year effect + unit × year effect, with "
        "normal effects of the SDs given (on the log scale) and β = ln(1 + change/100). The replicate's trend is "
        "estimated with the same log-linear Poisson model with unit effects and quasi-likelihood scale between "
        "years as plotwise:trend, and the change counts as detected when its t test rejects at level {a:g}. "
        "Power is the share of replicates with a detection; its Monte Carlo SE is √(P(1 − P)/R) "
        "(Gerrodette 1987 for the setting).").format(r=spec.replicates, a=spec.alpha))
    report.paragraph(report.translate(
        "PlotwiseReport",
        "Shorter programmes are the first years of the same simulated programmes; programmes with other numbers of "
        "units are the first units of larger simulated programmes, assigned to panels anew. Power for a programme "
        "of fewer years is shown only from the first length that leaves a degree of freedom for year-to-year "
        "variation."))
    report.paragraph(report.translate(
        "PlotwiseReport",
        "A one-season pilot gives the mean count and the spread between units (the estimate step's mean_c and "
        "sd_c): with a Poisson–log-normal count, SD_UNIT² = ln(1 + (s² − m)/m²) − SD_UNIT_YEAR². The unit × year "
        "and year-to-year SDs need several years of counts."))


def _cautions(report):
    report.section(report.translate("PlotwiseReport", "Cautions"))
    report.note(report.translate(
        "PlotwiseReport",
        "Power depends on the variance components assumed: the spread between units, the unit × year noise and "
        "above all the year-to-year variation shared by all units. Larger values than those entered give less "
        "power. The defaults are illustrative, not measured: use values from a pilot or from earlier years of the "
        "programme, and try a range."))
    report.note(report.translate(
        "PlotwiseReport",
        "The simulation assumes a steady change in % per year, constant detection, and that every planned visit "
        "happens. Missed visits, a change in detection or a trend that is not steady reduce the power."))
