"""The report of ``plotwise:trend``: the yearly index with the fitted trend and its band, the
change per year in words, the model's details, method, cautions and references. Built
from the engine's :class:`TrendResult`; never imports the host."""
from dataclasses import dataclass

import numpy as np

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


def _p_text(p):
    if not np.isfinite(p):
        return "–"
    return "< 0.001" if p < 0.001 else f"{p:.3f}"


def _pct(value):
    return f"{abs(value):.1f}%"


def change_in_words(change, lo, hi, confidence, tr):
    """The change per year as a sentence: "a decline of 3.1% per year, 95% interval 0.4% to 5.7%"."""
    if not all(np.isfinite(v) for v in (change, lo, hi)):
        return tr("The change per year could not be estimated.")
    level = f"{100 * confidence:g}%"
    if abs(change) < 0.05:
        head = tr("no change (0.0% per year)")
    elif change < 0:
        head = tr("a decline of {c} per year").format(c=_pct(change))
    else:
        head = tr("an increase of {c} per year").format(c=_pct(change))
    if hi < 0:
        interval = tr("{level} interval {a} to {b}").format(level=level, a=_pct(hi), b=_pct(lo))
    elif lo > 0:
        interval = tr("{level} interval {a} to {b}").format(level=level, a=_pct(lo), b=_pct(hi))
    else:
        interval = tr("{level} interval from a decline of {a} to an increase of {b}").format(
            level=level, a=_pct(lo), b=_pct(hi))
    return f"{head}, {interval}"


def fill_trend_report(report, result, run, tr, warnings=()):
    """Fill ``report`` for a :class:`TrendResult`; ``warnings`` in the user's language."""
    counts = result.source == "counts"
    words = change_in_words(result.change, result.change_lo, result.change_hi, result.confidence, tr)
    report.key_figures([
        (tr("change per year"), f"{result.change:+.1f}%" if np.isfinite(result.change) else "–"),
        (tr("{level} interval").format(level=f"{100 * result.confidence:g}%"),
         f"{result.change_lo:+.1f}% … {result.change_hi:+.1f}%" if np.isfinite(result.change_lo) else "–"),
        (tr("p-value (no trend)"), _p_text(result.p_value)),
        (tr("years"), f"{int(result.years[0])}–{int(result.years[-1])} ({len(result.years)})"),
    ])
    report.paragraph(tr("Over {first}–{last} the trend is {words}.").format(
        first=int(result.years[0]), last=int(result.years[-1]), words=words))
    report.parameters(_parameters(result, run, tr))
    report.warnings(list(warnings))
    _index_section(report, result, tr)
    if counts:
        _count_details(report, result, tr)
    else:
        _estimate_details(report, result, tr)
    _method(report, result, tr)
    _cautions(report, result, tr)
    report.references(REFERENCES)
    report.field_safety()
    return report


def _parameters(result, run, tr):
    counts = result.source == "counts"
    mapping = {
        tr("Input"): run.layer,
        tr("Source (SOURCE)"): tr("unit counts") if counts else tr("yearly estimates"),
        tr("Year field"): run.year_field,
    }
    if counts:
        mapping[tr("Unit id field")] = run.unit_field
        mapping[tr("Count field")] = run.count_field
        mapping[tr("Unit area field")] = run.area_field or tr("none: equal effort")
    else:
        mapping[tr("Estimate field")] = run.estimate_field
        mapping[tr("Standard error field")] = run.se_field
    mapping[tr("Stratum field")] = run.stratum_field or "–"
    mapping[tr("Confidence level")] = f"{result.confidence:g}"
    mapping[tr("Seed")] = tr("not used (no random draws)")
    return mapping


def _index_section(report, result, tr):
    counts = result.source == "counts"
    level = f"{100 * result.confidence:g}%"
    report.section(tr("Yearly index and trend"))
    y_label = tr("mean count per unit") if counts else tr("estimate")
    report.figure(
        index_trend_svg(result.years, result.index, result.index_lo, result.index_hi, result.fit, result.fit_lo,
                        result.fit_hi, x_label=tr("year"), y_label=y_label, index_label=tr("yearly index"),
                        fit_label=tr("trend")),
        tr("Yearly index with {level} intervals (points and bars) and the fitted trend with its {level} band.").format(
            level=level))
    header = [tr("Year"), tr("Index"), tr("Lower limit"), tr("Upper limit"), tr("Trend"), tr("Trend, lower"),
              tr("Trend, upper")]
    rows = [[str(int(y)), i, a, b, f, fa, fb] for y, i, a, b, f, fa, fb in
            zip(result.years, result.index, result.index_lo, result.index_hi, result.fit, result.fit_lo,
                result.fit_hi)]
    if not counts:
        header.insert(2, tr("CV"))
        for row, cv in zip(rows, result.details.sampling_cv):
            row.insert(2, float(cv))
    report.table(header, rows, caption=(
        tr("Index: the expected mean count per unit in each year, at the mean survey effort.") if counts else
        tr("Index: the yearly estimate; its interval shows the sampling error only.")))


def _count_details(report, result, tr):
    d = result.details
    report.subsection(tr("The fit"))
    rows = [
        [tr("Units in the records"), d.n_units],
        [tr("Units in the fit (some animals counted)"), d.n_used],
        [tr("Records used"), d.n_records],
        [tr("Records without a count (not surveyed)"), d.skipped],
        [tr("Scale between units (Pearson)"), d.unit_dispersion],
        [tr("Standard error of the log change allowing only for variation between units"), d.se_unit],
        [tr("Year-to-year SD, log scale (method of moments)"), d.year_sd],
        [tr("Scale between units within years (Pearson)"), d.index_dispersion],
        [tr("Deviance drop from the trend to one effect per year"), d.lack_of_fit],
        [tr("Degrees of freedom between years"), d.lof_df],
        [tr("Standard error of the log change used"), result.se],
        [tr("Linked sets of units and years"), d.linked],
    ]
    report.table([tr("Item"), tr("Value")], rows)
    if d.zero_units:
        report.paragraph(tr("Units that counted no animal in any visit carry no information on the trend and were "
                            "left out of the fit: {ids}.").format(ids=", ".join(str(u) for u in d.zero_units[:60])))
    if result.strata:
        report.subsection(tr("Trend by stratum"))
        report.table([tr("Stratum"), tr("Units"), tr("Change per year (%)"), tr("Lower limit"), tr("Upper limit"),
                      tr("p-value")],
                     [[str(s.stratum), s.n_units, s.change, s.change_lo, s.change_hi, s.p_value]
                      for s in result.strata],
                     caption=tr("Each stratum's units fitted on their own; strata with too few units or years "
                                "show no value."))


def _estimate_details(report, result, tr):
    d = result.details
    report.subsection(tr("The fit"))
    report.table([tr("Item"), tr("Value")], [
        [tr("Year-to-year process SD (log scale)"), float(np.sqrt(d.tau2))],
        [tr("Weighted residual sum of squares without process variance"), d.q],
        [tr("Residual mean square that scales the variance"), d.kh_scale],
        [tr("Standard error of the log change with sampling error only"), d.se_sampling_only],
        [tr("Standard error of the log change used"), result.se],
        [tr("Degrees of freedom"), int(result.df)],
    ])


def _method(report, result, tr):
    report.section(tr("Method"))
    if result.source == "counts":
        report.paragraph(tr(
            "The counts follow a log-linear Poisson model with one effect per unit and a common change per year, "
            "log E[y] = log(effort) + unit effect + β·year (McCullagh & Nelder 1989). Given β the unit effects have "
            "a closed form, so β is fitted by Newton's method on the profile likelihood. The change per year is "
            "exp(β) − 1."))
        report.paragraph(tr(
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
        report.paragraph(tr(
            "The log yearly estimates are regressed on year by weighted least squares. Each year's variance is its "
            "sampling variance ln(1 + CV²) plus the year-to-year process variance τ², estimated by the method of "
            "moments (DerSimonian & Laird 1986; Thompson & Sharp 1999), so that a noisy year counts less and real "
            "ups and downs between years widen the interval. The variance of the slope is scaled by the weighted "
            "residual mean square and tested with t on k − 2 degrees of freedom (Hartung & Knapp 2001)."))


def _cautions(report, result, tr):
    report.section(tr("Cautions"))
    report.note(tr(
        "A trend in counts is a trend in the population only if detection did not change: new observers, another "
        "season or time of day, denser vegetation or a different method change the counts without any change in "
        "the animals. Keep the field protocol the same, or measure detection each year."))
    report.note(tr(
        "The trend is the average change over these years, on a log scale. It is not a forecast, and it says "
        "nothing about units or land outside the programme's frame."))
