"""The report of ``plotwise:trend``: the yearly index with the fitted trend and its band, the
change per year in words, the model's details, method, cautions and references. Built
from the engine's :class:`TrendResult`; never imports the host.

Every string is marked ``report.translate("PlotwiseReport", "…")`` (or
``QT_TRANSLATE_NOOP("PlotwiseReport", "…")`` for the constants below).
"""
from dataclasses import dataclass

import numpy as np

from ..engine.errors import QT_TRANSLATE_NOOP
from .time_charts import index_trend_svg

REFERENCES = (
    "McCullagh, P. & Nelder, J. A. (1989). Generalized Linear Models, 2nd ed. Chapman & Hall (log-linear "
    "models, ch. 6; quasi-likelihood and overdispersion, ch. 9).",
    "Bishop, Y. M. M., Fienberg, S. E. & Holland, P. W. (1975). Discrete Multivariate Analysis. MIT Press "
    "(iterative proportional fitting of incomplete tables).",
    "DerSimonian, R. & Laird, N. (1986). Meta-analysis in clinical trials. Controlled Clinical Trials 7, "
    "177-188 (the method-of-moments estimate of between-occasion variance).",
    "Thompson, S. G. & Sharp, S. J. (1999). Explaining heterogeneity in meta-analysis: a comparison of "
    "methods. Statistics in Medicine 18, 2693-2708 (the moment estimator with a covariate).",
    "Hartung, J. & Knapp, G. (2001). On tests of the overall treatment effect in meta-analysis with normally "
    "distributed responses. Statistics in Medicine 20, 1771-1782.",
    "Urquhart, N. S. & Kincaid, T. M. (1999). Designs for detecting trend from repeated surveys of ecological "
    "resources. Journal of Agricultural, Biological, and Environmental Statistics 4, 404-414.",
)
INDEX_HEADER = (
    QT_TRANSLATE_NOOP("PlotwiseReport", "Year"),
    QT_TRANSLATE_NOOP("PlotwiseReport", "Index"),
    QT_TRANSLATE_NOOP("PlotwiseReport", "Lower limit"),
    QT_TRANSLATE_NOOP("PlotwiseReport", "Upper limit"),
    QT_TRANSLATE_NOOP("PlotwiseReport", "Trend"),
    QT_TRANSLATE_NOOP("PlotwiseReport", "Trend, lower"),
    QT_TRANSLATE_NOOP("PlotwiseReport", "Trend, upper"),
)
STRATUM_HEADER = (
    QT_TRANSLATE_NOOP("PlotwiseReport", "Stratum"),
    QT_TRANSLATE_NOOP("PlotwiseReport", "Units"),
    QT_TRANSLATE_NOOP("PlotwiseReport", "Change per year (%)"),
    QT_TRANSLATE_NOOP("PlotwiseReport", "Lower limit"),
    QT_TRANSLATE_NOOP("PlotwiseReport", "Upper limit"),
    QT_TRANSLATE_NOOP("PlotwiseReport", "p-value"),
)
COUNT_FIT_ROWS = (  # (label, CountDetails field or "se" for the standard error used)
    (QT_TRANSLATE_NOOP("PlotwiseReport", "Units in the records"), "n_units"),
    (QT_TRANSLATE_NOOP("PlotwiseReport", "Units in the fit (some animals counted)"), "n_used"),
    (QT_TRANSLATE_NOOP("PlotwiseReport", "Records used"), "n_records"),
    (QT_TRANSLATE_NOOP("PlotwiseReport", "Records without a count (not surveyed)"), "skipped"),
    (QT_TRANSLATE_NOOP("PlotwiseReport", "Scale between units (Pearson)"), "unit_dispersion"),
    (QT_TRANSLATE_NOOP("PlotwiseReport",
                       "Standard error of the log change allowing only for variation between units"), "se_unit"),
    (QT_TRANSLATE_NOOP("PlotwiseReport", "Year-to-year SD, log scale (method of moments)"), "year_sd"),
    (QT_TRANSLATE_NOOP("PlotwiseReport", "Scale between units within years (Pearson)"), "index_dispersion"),
    (QT_TRANSLATE_NOOP("PlotwiseReport", "Deviance drop from the trend to one effect per year"), "lack_of_fit"),
    (QT_TRANSLATE_NOOP("PlotwiseReport", "Degrees of freedom between years"), "lof_df"),
    (QT_TRANSLATE_NOOP("PlotwiseReport", "Standard error of the log change used"), "se"),
    (QT_TRANSLATE_NOOP("PlotwiseReport", "Linked sets of units and years"), "linked"),
)


@dataclass(frozen=True)
class TrendRun:
    """What the algorithm read: the ``layer`` name and the fields used (None when not used)."""

    layer: str
    unit_field: object
    year_field: object
    count_field: object
    estimate_field: object
    se_field: object
    stratum_field: object
    area_field: object


def _words(report, constants):
    return [report.translate("PlotwiseReport", text) for text in constants]


def _p_text(p):
    if not np.isfinite(p):
        return "–"
    return "< 0.001" if p < 0.001 else f"{p:.3f}"


def _pct(value):
    return f"{abs(value):.1f}%"


def change_in_words(report, change, lo, hi, confidence):
    """The change per year as a sentence: "a decline of 3.1% per year, 95% interval 0.4% to 5.7%"."""
    if not all(np.isfinite(v) for v in (change, lo, hi)):
        return report.translate("PlotwiseReport", "The change per year could not be estimated.")
    level = f"{100 * confidence:g}%"
    if abs(change) < 0.05:
        head = report.translate("PlotwiseReport", "no change (0.0% per year)")
    elif change < 0:
        head = report.translate("PlotwiseReport", "a decline of {c} per year").format(c=_pct(change))
    else:
        head = report.translate("PlotwiseReport", "an increase of {c} per year").format(c=_pct(change))
    if hi < 0 or lo > 0:
        near, far = (hi, lo) if hi < 0 else (lo, hi)
        interval = report.translate("PlotwiseReport", "{level} interval {a} to {b}").format(
            level=level, a=_pct(near), b=_pct(far))
    else:
        interval = report.translate(
            "PlotwiseReport", "{level} interval from a decline of {a} to an increase of {b}").format(
            level=level, a=_pct(lo), b=_pct(hi))
    return f"{head}, {interval}"


def fill_trend_report(report, result, run, warnings=()):
    """Fill ``report`` for a :class:`TrendResult`; ``warnings`` in the user's language."""
    words = change_in_words(report, result.change, result.change_lo, result.change_hi, result.confidence)
    first, last = int(result.years[0]), int(result.years[-1])
    finite = np.isfinite(result.change_lo)
    report.key_figures([
        (report.translate("PlotwiseReport", "change per year"),
         f"{result.change:+.1f}%" if np.isfinite(result.change) else "–"),
        (report.translate("PlotwiseReport", "{level} interval").format(level=f"{100 * result.confidence:g}%"),
         f"{result.change_lo:+.1f}% … {result.change_hi:+.1f}%" if finite else "–"),
        (report.translate("PlotwiseReport", "p-value (no trend)"), _p_text(result.p_value)),
        (report.translate("PlotwiseReport", "years"), f"{first}–{last} ({len(result.years)})"),
    ])
    report.paragraph(report.translate("PlotwiseReport", "Over {first}–{last} the trend is {words}.").format(
        first=first, last=last, words=words))
    report.parameters(_parameters(report, result, run))
    report.warnings(list(warnings))
    _index_section(report, result)
    if result.source == "counts":
        _count_details(report, result)
    else:
        _estimate_details(report, result)
    _method(report, result)
    _cautions(report)
    report.references(REFERENCES)
    report.field_safety()
    return report


def _parameters(report, result, run):
    mapping = {report.translate("PlotwiseReport", "Input"): run.layer}
    if result.source == "counts":
        mapping[report.translate("PlotwiseReport", "Source (SOURCE)")] = report.translate(
            "PlotwiseReport", "unit counts")
        mapping[report.translate("PlotwiseReport", "Unit id field")] = run.unit_field
        mapping[report.translate("PlotwiseReport", "Count field")] = run.count_field
        mapping[report.translate("PlotwiseReport", "Unit area field")] = run.area_field or report.translate(
            "PlotwiseReport", "none: equal effort")
    else:
        mapping[report.translate("PlotwiseReport", "Source (SOURCE)")] = report.translate(
            "PlotwiseReport", "yearly estimates")
        mapping[report.translate("PlotwiseReport", "Estimate field")] = run.estimate_field
        mapping[report.translate("PlotwiseReport", "Standard error field")] = run.se_field
    mapping[report.translate("PlotwiseReport", "Year field")] = run.year_field
    mapping[report.translate("PlotwiseReport", "Stratum field")] = run.stratum_field or "–"
    mapping[report.translate("PlotwiseReport", "Confidence level")] = f"{result.confidence:g}"
    mapping[report.translate("PlotwiseReport", "Seed")] = report.translate(
        "PlotwiseReport", "not used (no random draws)")
    return mapping


def _index_section(report, result):
    counts = result.source == "counts"
    report.section(report.translate("PlotwiseReport", "Yearly index and trend"))
    if counts:
        y_label = report.translate("PlotwiseReport", "mean count per unit")
        caption = report.translate(
            "PlotwiseReport", "Index: the expected mean count per unit in each year, at the mean survey effort.")
    else:
        y_label = report.translate("PlotwiseReport", "estimate")
        caption = report.translate(
            "PlotwiseReport", "Index: the yearly estimate; its interval shows the sampling error only.")
    chart = index_trend_svg(
        result.years, result.index, result.index_lo, result.index_hi, result.fit, result.fit_lo, result.fit_hi,
        x_label=report.translate("PlotwiseReport", "year"), y_label=y_label,
        index_label=report.translate("PlotwiseReport", "yearly index"),
        fit_label=report.translate("PlotwiseReport", "trend"))
    report.figure(chart, report.translate(
        "PlotwiseReport",
        "Yearly index with {level} intervals (points and bars) and the fitted trend with its {level} band.").format(
        level=f"{100 * result.confidence:g}%"))
    header = _words(report, INDEX_HEADER)
    rows = [[str(int(y)), i, a, b, f, fa, fb] for y, i, a, b, f, fa, fb in zip(
        result.years, result.index, result.index_lo, result.index_hi, result.fit, result.fit_lo, result.fit_hi)]
    if not counts:
        header.insert(2, report.translate("PlotwiseReport", "CV"))
        for row, cv in zip(rows, result.details.sampling_cv):
            row.insert(2, float(cv))
    report.table(header, rows, caption=caption)


def _count_details(report, result):
    d = result.details
    report.subsection(report.translate("PlotwiseReport", "The fit"))
    rows = [[report.translate("PlotwiseReport", label), result.se if name == "se" else getattr(d, name)]
            for label, name in COUNT_FIT_ROWS]
    report.table(_words(report, (QT_TRANSLATE_NOOP("PlotwiseReport", "Item"),
                                 QT_TRANSLATE_NOOP("PlotwiseReport", "Value"))), rows)
    if d.zero_units:
        report.paragraph(report.translate(
            "PlotwiseReport",
            "Units that counted no animal in any visit carry no information on the trend and were left out of the "
            "fit: {ids}.").format(ids=", ".join(str(u) for u in d.zero_units[:60])))
    if result.strata:
        report.subsection(report.translate("PlotwiseReport", "Trend by stratum"))
        rows = [[str(s.stratum), s.n_units, s.change, s.change_lo, s.change_hi, s.p_value] for s in result.strata]
        report.table(_words(report, STRATUM_HEADER), rows, caption=report.translate(
            "PlotwiseReport",
            "Each stratum's units fitted on their own; strata with too few units or years show no value."))


def _estimate_details(report, result):
    d = result.details
    report.subsection(report.translate("PlotwiseReport", "The fit"))
    rows = [
        (QT_TRANSLATE_NOOP("PlotwiseReport", "Year-to-year process SD (log scale)"), float(np.sqrt(d.tau2))),
        (QT_TRANSLATE_NOOP("PlotwiseReport", "Weighted residual sum of squares without process variance"), d.q),
        (QT_TRANSLATE_NOOP("PlotwiseReport", "Residual mean square that scales the variance"), d.kh_scale),
        (QT_TRANSLATE_NOOP("PlotwiseReport", "Standard error of the log change with sampling error only"),
         d.se_sampling_only),
        (QT_TRANSLATE_NOOP("PlotwiseReport", "Standard error of the log change used"), result.se),
        (QT_TRANSLATE_NOOP("PlotwiseReport", "Degrees of freedom"), int(result.df)),
    ]
    report.table(_words(report, (QT_TRANSLATE_NOOP("PlotwiseReport", "Item"),
                                 QT_TRANSLATE_NOOP("PlotwiseReport", "Value"))),
                 [[report.translate("PlotwiseReport", label), value] for label, value in rows])


def _method(report, result):
    report.section(report.translate("PlotwiseReport", "Method"))
    if result.source == "counts":
        report.paragraph(report.translate(
            "PlotwiseReport",
            "The counts follow a log-linear Poisson model with one effect per unit and a common change per year, "
            "log E[y] = log(effort) + unit effect + β·year (McCullagh & Nelder 1989). Given β the unit effects have "
            "a closed form, so β is fitted by Newton's method on the profile likelihood. The change per year is "
            "exp(β) − 1."))
        report.paragraph(report.translate(
            "PlotwiseReport",
            "Overdispersion (quasi-likelihood): counts of one year share that year's conditions. The model with one "
            "effect per year (fitted by iterative proportional fitting; Bishop, Fienberg & Holland 1975) is "
            "compared with the trend model: the deviance drop per degree of freedom scales the variance of β "
            "(McCullagh & Nelder 1989), in proportion to how strongly the slope depends on single years, and β is "
            "tested with Student's t on the degrees of freedom between years. So years that differ as a whole "
            "widen the interval. The year-to-year SD is estimated from the same drop by the method of moments "
            "(DerSimonian & Laird 1986, here for a log-linear model). The standard error allowing only for "
            "variation between units (the Pearson-scaled GLM) is shown for comparison. The index of each year is "
            "the year model's expected mean count per unit, with delta-method intervals from the Pearson scale "
            "within years."))
    else:
        report.paragraph(report.translate(
            "PlotwiseReport",
            "The log yearly estimates are regressed on year by weighted least squares. Each year's variance is its "
            "sampling variance ln(1 + CV²) plus the year-to-year process variance τ², estimated by the method of "
            "moments (DerSimonian & Laird 1986; Thompson & Sharp 1999), so that a noisy year counts less and real "
            "ups and downs between years widen the interval. The variance of the slope is scaled by the weighted "
            "residual mean square and tested with t on k − 2 degrees of freedom (Hartung & Knapp 2001)."))


def _cautions(report):
    report.section(report.translate("PlotwiseReport", "Cautions"))
    report.note(report.translate(
        "PlotwiseReport",
        "A trend in counts is a trend in the population only if detection did not change: new observers, another "
        "season or time of day, denser vegetation or a different method change the counts without any change in "
        "the animals. Keep the field protocol the same, or measure detection each year."))
    report.note(report.translate(
        "PlotwiseReport",
        "The trend is the average change over these years, on a log scale. It is not a forecast, and it says "
        "nothing about units or land outside the programme's frame."))
