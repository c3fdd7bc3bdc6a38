"""The report of plotwise:distancedensity, built from the engine's result dataclasses. Never imports the host.

:func:`build_report` takes a :class:`~..engine.distance_density.DistanceDensityResult` and a mapping
of what the host knows (layer and field names, CRS, seed, the strata and unit geometries) and returns
a :class:`Report` ready to write. Every string is marked ``report.translate("PlotwiseReport", "…")``.
"""
import math

import numpy as np

from ..engine import detection_functions as df
from ..engine.distance_density import OVERALL, SIZE_REGRESSION
from .html import Report, escape, format_number
from .style import ACCENT, CATEGORY_COLOURS, INK, RULE
from .svg import FONT, MapLayer, interval_chart_svg, line_chart_svg, map_svg

REFERENCES = (
    "Buckland, S. T., Anderson, D. R., Burnham, K. P., Laake, J. L., Borchers, D. L. & Thomas, L. (2001). "
    "Introduction to Distance Sampling. Oxford University Press (key functions and cosine adjustments with "
    "the monotonicity constraint, effective strip width, point transects, size-bias regression, the delta "
    "method, Satterthwaite's degrees of freedom and the log-normal interval).",
    "Fewster, R. M., Buckland, S. T., Burnham, K. P., Borchers, D. L., Jupp, P. E., Laake, J. L. & Thomas, "
    "L. (2009). Estimating the encounter rate variance in distance sampling. Biometrics 65, 225-236 "
    "(estimator R2).",
    "Akaike, H. (1973). Information theory and an extension of the maximum likelihood principle. In "
    "Second International Symposium on Information Theory, 267-281 (AIC).",
    "Satterthwaite, F. E. (1946). An approximate distribution of estimates of variance components. "
    "Biometrics Bulletin 2, 110-114.",
    "Seber, G. A. F. (1982). The Estimation of Animal Abundance and Related Parameters, 2nd ed. Griffin "
    "(the delta method).",
    "Csörgő, S. & Faraway, J. J. (1996). The exact and asymptotic distributions of Cramér-von Mises "
    "statistics. Journal of the Royal Statistical Society B 58, 221-234.",
)
DENSITY_RAMP = ("#f5efd9", "#cfe0c3", "#8fc0b1", "#4b9296", "#2a6475", "#1f3a44")  # as processing.styles
NO_ESTIMATE = "#c9cfcd"


def _finite(value):
    return value is not None and isinstance(value, (int, float)) and math.isfinite(value)


def _shade(value, lo, hi):
    """The density ramp at ``value`` (light to dark), grey when missing."""
    if not _finite(value):
        return NO_ESTIMATE
    t = 0.0 if hi <= lo else min(max((value - lo) / (hi - lo), 0.0), 1.0)
    stops = [tuple(int(c[i:i + 2], 16) for i in (1, 3, 5)) for c in DENSITY_RAMP]
    position = t * (len(stops) - 1)
    k = min(int(position), len(stops) - 2)
    f = position - k
    return "#" + "".join(f"{round(a + (b - a) * f):02x}" for a, b in zip(stops[k], stops[k + 1]))


# --------------------------------------------------------------------------- the distance chart


def distance_histogram_svg(edges, counts, curve_x, curve_y, x_label, y_label, curve_label, width=900, height=320):
    """Bars of detections per metre of each band, with the fitted curve drawn over them.

    ``counts`` per band of ``edges`` (bands may differ in width); ``curve_y`` in the same unit
    (detections per metre: n · f(x)). Every text is escaped.
    """
    edges, counts = np.asarray(edges, dtype=float), np.asarray(counts, dtype=float)
    heights = counts / np.diff(edges)
    curve_x, curve_y = np.asarray(curve_x, dtype=float), np.asarray(curve_y, dtype=float)
    left, right, top, bottom = 64, 24, 26, 46
    pw, ph = width - left - right, height - top - bottom
    x_hi = edges[-1] if edges[-1] > edges[0] else edges[0] + 1.0
    y_hi = max(float(np.max(heights, initial=0.0)), float(np.nanmax(curve_y, initial=0.0))) * 1.08 or 1.0

    def sx(v):
        return left + (v - edges[0]) / (x_hi - edges[0]) * pw

    def sy(v):
        return top + ph - v / y_hi * ph

    out = [f'<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 {width} {height}" role="img">']
    for a, b, h in zip(edges[:-1], edges[1:], heights):
        out.append(f'<rect x="{sx(a):.1f}" y="{sy(h):.1f}" width="{max(sx(b) - sx(a) - 1.0, 0.5):.1f}" '
                   f'height="{top + ph - sy(h):.1f}" fill="{ACCENT}" fill-opacity="0.35" stroke="{ACCENT}"/>')
    points = " ".join(f"{sx(a):.1f},{sy(b):.1f}" for a, b in zip(curve_x, curve_y) if math.isfinite(b))
    out.append(f'<polyline points="{points}" fill="none" stroke="{CATEGORY_COLOURS[3]}" stroke-width="2.5"/>')
    out.append(f'<line x1="{left}" y1="{top + ph}" x2="{left + pw}" y2="{top + ph}" stroke="{INK}"/>')
    out.append(f'<line x1="{left}" y1="{top}" x2="{left}" y2="{top + ph}" stroke="{INK}"/>')
    for t in _ticks(edges[0], x_hi):
        out.append(f'<text x="{sx(t):.1f}" y="{top + ph + 16}" font-size="11" {FONT} text-anchor="middle" '
                   f'fill="{INK}">{escape(format_number(float(t)))}</text>')
    for t in _ticks(0.0, y_hi):
        out.append(f'<line x1="{left - 4}" y1="{sy(t):.1f}" x2="{left + pw}" y2="{sy(t):.1f}" stroke="{RULE}"/>')
        out.append(f'<text x="{left - 6}" y="{sy(t) + 4:.1f}" font-size="11" {FONT} text-anchor="end" '
                   f'fill="{INK}">{escape(format_number(float(t)))}</text>')
    out.append(f'<rect x="{left + pw - 230}" y="{top - 20}" width="16" height="4" fill="{CATEGORY_COLOURS[3]}"/>')
    out.append(f'<text x="{left + pw - 208}" y="{top - 14}" font-size="11" {FONT} fill="{INK}">'
               f'{escape(curve_label)}</text>')
    out.append(f'<text x="{left + pw / 2:.1f}" y="{height - 6}" font-size="12" {FONT} text-anchor="middle" '
               f'fill="{INK}">{escape(x_label)}</text>')
    out.append(f'<text x="14" y="{top + ph / 2:.1f}" font-size="12" {FONT} text-anchor="middle" fill="{INK}" '
               f'transform="rotate(-90 14 {top + ph / 2:.1f})">{escape(y_label)}</text>')
    out.append("</svg>")
    return "".join(out)


def _ticks(lo, hi, count=5):
    raw = (hi - lo) / count if hi > lo else 1.0
    power = 10.0 ** math.floor(math.log10(raw))
    step = next(s * power for s in (1, 2, 5, 10) if s * power >= raw)
    return np.arange(math.ceil(lo / step) * step, hi + step * 1e-6, step)


# --------------------------------------------------------------------------- sections


def _headline(report, result, info):
    o, per = result.overall, info["area_unit"]
    line = result.survey.survey == df.LINE
    interval = report.translate("PlotwiseReport", "{level} interval").format(level=f"{result.confidence:.0%}")
    density = report.translate("PlotwiseReport", "animals per {unit}").format(unit=per)
    units = report.translate("PlotwiseReport", "transects") if line else report.translate("PlotwiseReport", "points")
    figures = [
        (report.translate("PlotwiseReport", "estimated animals in the frame"), f"{o.abund:,.0f}"),
        (interval, f"{o.abund_lo:,.0f} – {o.abund_hi:,.0f}"),
        (density, format_number(o.dens)),
        (report.translate("PlotwiseReport", "CV"), format_number(o.cv)),
        (report.translate("PlotwiseReport", "detections used"), f"{o.n_det:,}"),
        (units, f"{o.n_units:,}"),
    ]
    if not result.per_stratum:
        p_label = report.translate("PlotwiseReport", "detection probability within the truncation distance")
        width_label = (report.translate("PlotwiseReport", "effective strip half-width (m)") if line
                       else report.translate("PlotwiseReport", "effective detection radius (m)"))
        figures += [(p_label, format_number(o.p_det)), (width_label, format_number(o.esw))]
    report.key_figures(figures)


def _truncation_text(report, survey):
    text = f"{survey.truncation:.1f} m"
    if survey.cutpoints is not None:
        return text + " (" + report.translate("PlotwiseReport", "the last band edge") + ")"
    if survey.truncation_auto:
        automatic = report.translate("PlotwiseReport", "automatic: the farthest 5 % of the distances left out")
        return text + " (" + automatic + ")"
    return text


def _inputs(report, result, info):
    survey = result.survey
    none = report.translate("PlotwiseReport", "none")
    units = report.translate("PlotwiseReport", "{layer} (id field {field})").format(
        layer=info["units"], field=info["unit_field"])
    observations = report.translate("PlotwiseReport", "{layer} (unit field {unit}, distance field {distance})").format(
        layer=info["observations"], unit=info["obs_unit_field"], distance=info["distance_field"])
    survey_type = (report.translate("PlotwiseReport", "line transects") if survey.survey == df.LINE
                   else report.translate("PlotwiseReport", "point transects"))
    bands = (", ".join(f"{c:g}" for c in survey.cutpoints) if survey.cutpoints is not None
             else report.translate("PlotwiseReport", "none: exact distances"))
    functions = (report.translate("PlotwiseReport", "one per stratum") if result.per_stratum
                 else report.translate("PlotwiseReport", "one for all strata"))
    size_methods = {
        "automatic": report.translate("PlotwiseReport",
                                      "mean, or size-bias regression when larger groups are seen farther"),
        "mean": report.translate("PlotwiseReport", "mean of the detected groups"),
        "regression": report.translate("PlotwiseReport", "size-bias regression"),
    }
    resamples = result.bootstrap.replicates + result.bootstrap.failed if result.bootstrap else none
    seed = (info["seed"] if info.get("seed") is not None
            else report.translate("PlotwiseReport", "not used (no bootstrap)"))
    report.parameters({
        report.translate("PlotwiseReport", "Transects or points"): units,
        report.translate("PlotwiseReport", "Survey type"): survey_type,
        report.translate("PlotwiseReport", "Stratum field"):
            info["stratum_field"] or report.translate("PlotwiseReport", "none: one stratum"),
        report.translate("PlotwiseReport", "Visits field"): info.get("visits_field") or "–",
        report.translate("PlotwiseReport", "Observations"): observations,
        report.translate("PlotwiseReport", "Group size field"):
            info["size_field"] or report.translate("PlotwiseReport", "none: each detection is one animal"),
        report.translate("PlotwiseReport", "Strata (frame)"): info["strata"],
        report.translate("PlotwiseReport", "Truncation distance"): _truncation_text(report, survey),
        report.translate("PlotwiseReport", "Distance bands (m)"): bands,
        report.translate("PlotwiseReport", "Key functions tried"): ", ".join(info["keys"]),
        report.translate("PlotwiseReport", "Most cosine terms per key"): info["max_adjustments"],
        report.translate("PlotwiseReport", "Detection function"): functions,
        report.translate("PlotwiseReport", "Group size"): size_methods[result.size_method],
        report.translate("PlotwiseReport", "Confidence level"): f"{result.confidence:.0%}",
        report.translate("PlotwiseReport", "Area unit"): info["area_unit"],
        report.translate("PlotwiseReport", "Computation CRS"): info["crs"],
        report.translate("PlotwiseReport", "Bootstrap resamples"): resamples,
        report.translate("PlotwiseReport", "Seed"): seed,
    })


def _histogram_texts(report, line):
    """``(x label, caption)`` of the distance histogram."""
    if line:
        return (report.translate("PlotwiseReport", "perpendicular distance from the line (m)"),
                report.translate("PlotwiseReport", "Distances seen from the lines, with the fitted detection function "
                                 "scaled to the detections (its height at 0 is where every animal is seen)"))
    return (report.translate("PlotwiseReport", "distance from the point (m)"),
            report.translate("PlotwiseReport", "Distances seen from the points, with the fitted probability density "
                             "of the distances: it rises from 0 because there is more ground farther from a point, "
                             "then falls as detection drops"))


def _detection_section(report, result):
    line = result.survey.survey == df.LINE
    survey = result.survey
    report.section(report.translate("PlotwiseReport", "Detection function"))
    report.paragraph(report.translate(
        "PlotwiseReport",
        "{n} of the {recorded} recorded detections lie within the truncation distance of {w:.1f} m and were used; "
        "{dropped} farther ones were left out.").format(n=survey.n, recorded=survey.n_recorded, w=survey.truncation,
                                                         dropped=survey.n_dropped))
    x_label, caption = _histogram_texts(report, line)
    for analysis in result.analyses:
        fit = analysis.fit
        data = df.distance_data_iv(analysis.distances, survey.truncation, survey.survey, survey.cutpoints)
        edges, counts = df.chi_square_bands(data)
        x = np.linspace(0.0, survey.truncation, 241)
        figure = distance_histogram_svg(
            edges, counts, x, analysis.n * df.distance_pdf(fit, x), x_label=x_label,
            y_label=report.translate("PlotwiseReport", "detections per metre of distance"),
            curve_label=report.translate("PlotwiseReport", "fitted: {model}").format(model=fit.label))
        where = "" if analysis.stratum == OVERALL else report.translate(
            "PlotwiseReport", "Stratum {stratum}.").format(stratum=analysis.stratum) + " "
        report.figure(figure, where + caption)
        _models_table(report, analysis, line)
    _curves_figure(report, result)


def _models_table(report, analysis, line):
    selection = analysis.selection
    rows = []
    for i, fit in enumerate(selection.fits):
        gof = fit.gof
        rows.append([fit.label, fit.n_par, fit.aic, selection.delta_aic(i), fit.p_det, fit.esw,
                     gof.chi2_p if gof else None, gof.cvm_p if gof else None,
                     report.translate("PlotwiseReport", "yes") if i == selection.chosen else ""])
    width = (report.translate("PlotwiseReport", "Effective half-width (m)") if line
             else report.translate("PlotwiseReport", "Effective radius (m)"))
    header = [report.translate("PlotwiseReport", "Model"), report.translate("PlotwiseReport", "Parameters"),
              report.translate("PlotwiseReport", "AIC"), report.translate("PlotwiseReport", "AIC above the best"),
              report.translate("PlotwiseReport", "Detection probability within w"), width,
              report.translate("PlotwiseReport", "Fit, χ² p"),
              report.translate("PlotwiseReport", "Fit, Cramér–von Mises p"),
              report.translate("PlotwiseReport", "Chosen")]
    caption = report.translate(
        "PlotwiseReport",
        "Every model tried, in the order fitted ({n} detections). The smallest AIC is chosen; a fit p below 0.05 "
        "means the model misses the shape of the distances.").format(n=analysis.n)
    if analysis.stratum != OVERALL:
        where = report.translate("PlotwiseReport", "Stratum {stratum}.").format(stratum=analysis.stratum)
        caption = where + " " + caption
    report.table(header, rows, caption=caption)
    _group_size_text(report, analysis.group_size)


def _group_size_text(report, size):
    if size.method == "none":
        return
    text = report.translate("PlotwiseReport", "Group size: {n} groups seen, mean size {mean:.3g}.").format(
        n=size.n, mean=size.mean)
    if math.isfinite(size.slope):
        text += " " + report.translate(
            "PlotwiseReport", "The regression of ln(size) on the detection probability has slope {b:.3g} "
            "(p = {p:.3f}).").format(b=size.slope, p=size.slope_p)
    if size.method == SIZE_REGRESSION:
        text += " " + report.translate(
            "PlotwiseReport", "Larger groups are seen farther away, so the expected size where every group is seen, "
            "{e:.3g} (SE {se:.3g}), is used instead of the mean.").format(e=size.expected, se=size.se)
    else:
        text += " " + report.translate("PlotwiseReport", "The mean is used (SE {se:.3g}).").format(se=size.se)
    report.paragraph(text)


def _curves_figure(report, result):
    """g(x) of the best model of each key (of the first analysis)."""
    analysis = result.analyses[0]
    x = np.linspace(0.0, result.survey.truncation, 121)
    series, seen = [], set()
    for fit in sorted(analysis.selection.fits, key=lambda f: f.aic):
        if fit.model.key in seen:
            continue
        seen.add(fit.model.key)
        series.append((fit.label, df.detection_curve(fit, x)))
    chart = line_chart_svg(x, series, x_label=report.translate("PlotwiseReport", "distance (m)"),
                           y_label=report.translate("PlotwiseReport", "probability of detection"))
    report.figure(chart, report.translate(
        "PlotwiseReport", "The best model of each key function: the probability of seeing an animal at each "
        "distance (1 on the line or at the point, by assumption)"))


def _estimate_header(report, line, per):
    units = report.translate("PlotwiseReport", "Transects") if line else report.translate("PlotwiseReport", "Points")
    effort = (report.translate("PlotwiseReport", "Line length (km)") if line
              else report.translate("PlotwiseReport", "Visits"))
    rate = (report.translate("PlotwiseReport", "Detections per km") if line
            else report.translate("PlotwiseReport", "Detections per visit"))
    return [report.translate("PlotwiseReport", "Stratum"),
            report.translate("PlotwiseReport", "Area ({unit})").format(unit=per), units, effort,
            report.translate("PlotwiseReport", "Detections"), rate,
            report.translate("PlotwiseReport", "Animals per {unit}").format(unit=per),
            report.translate("PlotwiseReport", "SE"), report.translate("PlotwiseReport", "Lower limit"),
            report.translate("PlotwiseReport", "Upper limit"), report.translate("PlotwiseReport", "CV"),
            report.translate("PlotwiseReport", "df")]


def _stratum_name(report, stratum):
    return report.translate("PlotwiseReport", "all strata") if stratum == OVERALL else stratum


def _estimate_tables(report, result, info):
    level = f"{result.confidence:.0%}"
    rows = [[_stratum_name(report, r.stratum), r.area, r.n_units, r.effort, r.n_det, r.encounter_rate, r.dens,
             r.dens_se, r.dens_lo, r.dens_hi, r.cv, r.df] for r in result.table()]
    method = (report.translate("PlotwiseReport", "bootstrap percentile limits") if result.bootstrap
              else report.translate("PlotwiseReport", "log-normal limits with t"))
    report.table(_estimate_header(report, result.survey.survey == df.LINE, info["area_unit"]), rows,
                 caption=report.translate("PlotwiseReport", "Density by stratum, {method} at {level}.").format(
                     method=method, level=level))
    limits = [report.translate("PlotwiseReport", "Lower limit"), report.translate("PlotwiseReport", "Upper limit")]
    report.table([report.translate("PlotwiseReport", "Stratum"), report.translate("PlotwiseReport", "Animals"),
                   report.translate("PlotwiseReport", "SE")] + limits,
                 [[_stratum_name(report, r.stratum), r.abund, r.abund_se, r.abund_lo, r.abund_hi]
                  for r in result.table()],
                 caption=report.translate("PlotwiseReport", "Abundance in the frame, limits at {level}.").format(
                     level=level))
    if result.bootstrap:
        header = [report.translate("PlotwiseReport", "Stratum")] + limits + [report.translate("PlotwiseReport", "CV")]
        report.table(header,
                     [[_stratum_name(report, r.stratum), r.abund_lo, r.abund_hi, r.cv] for r in result.delta_rows],
                     caption=report.translate("PlotwiseReport", "For comparison: the abundance's delta-method "
                                              "interval (log-normal with t)."))


def _uncertainty_table(report, result):
    parts = []
    for r in result.delta_rows:
        shares = {name: c2 for name, c2, _ in r.components}
        total = sum(v for v in shares.values() if _finite(v)) or float("nan")
        parts.append([_stratum_name(report, r.stratum)] + [shares.get(k, 0.0) / total if _finite(total) else None
                                                           for k in ("encounter rate", "detection", "group size")])
    header = [report.translate("PlotwiseReport", "Stratum"),
              report.translate("PlotwiseReport", "Share from the encounter rate"),
              report.translate("PlotwiseReport", "Share from the detection function"),
              report.translate("PlotwiseReport", "Share from group size")]
    report.table(header, parts, caption=report.translate(
        "PlotwiseReport", "Where the uncertainty comes from: each part's share of CV² (delta method). A large "
        "encounter-rate share calls for more transects; a large detection share for more detections."))


def _estimate_section(report, result, info):
    report.section(report.translate("PlotwiseReport", "Density and abundance"))
    _estimate_tables(report, result, info)
    _uncertainty_table(report, result)
    table = result.table()
    labels = [_stratum_name(report, r.stratum) for r in table]
    value_label = report.translate("PlotwiseReport", "animals per {unit}").format(unit=info["area_unit"])
    chart = interval_chart_svg(labels, [r.dens for r in table], [r.dens_lo for r in table],
                               [r.dens_hi for r in table], value_label=value_label)
    report.figure(chart, report.translate("PlotwiseReport", "Density by stratum with {level} intervals").format(
        level=f"{result.confidence:.0%}"))
    _map(report, result, info)


def _map(report, result, info):
    geometries = info.get("strata_geometries") or {}
    if not geometries:
        return
    shown = {r.stratum: r.dens for r in result.strata}
    finite = [v for v in shown.values() if _finite(v)]
    lo, hi = (min(finite), max(finite)) if finite else (0.0, 1.0)
    order = [r.stratum for r in result.strata if r.stratum in geometries]
    lowest = report.translate("PlotwiseReport", "lowest: {value:.3g}").format(value=lo)
    highest = report.translate("PlotwiseReport", "highest: {value:.3g}").format(value=hi)
    layers = [MapLayer(tuple(geometries[k] for k in order), fills=tuple(_shade(shown.get(k), lo, hi) for k in order),
                       stroke=INK, stroke_width=0.8,
                       legend=((lowest, _shade(lo, lo, hi)), (highest, _shade(hi, lo, hi))))]
    line = result.survey.survey == df.LINE
    what = report.translate("PlotwiseReport", "transects") if line else report.translate("PlotwiseReport", "points")
    units = tuple(g for g in info.get("unit_geometries", ()) if g is not None)
    layers.append(MapLayer(units, label=what, fill=CATEGORY_COLOURS[1], stroke=CATEGORY_COLOURS[1] if line else INK,
                           stroke_width=2.0, point_radius=3.0))
    per = info["area_unit"]
    title = report.translate("PlotwiseReport", "animals per {unit}").format(unit=per)
    report.figure(map_svg(layers, title=title), report.translate(
        "PlotwiseReport", "Strata shaded by density (animals per {unit}), with the surveyed {what}").format(
        unit=per, what=what))


def _method_section(report, result):
    report.section(report.translate("PlotwiseReport", "Method"))
    report.paragraph(report.translate(
        "PlotwiseReport",
        "Each detection function is a key (half-normal, hazard-rate or uniform) with up to the chosen number of "
        "cosine terms, fitted to the distances by maximum likelihood; terms are added one at a time while AIC "
        "falls, under the constraint that detection never rises with distance, and the model with the smallest "
        "AIC is used (Buckland et al. 2001)."))
    if result.survey.survey == df.LINE:
        report.paragraph(report.translate(
            "PlotwiseReport",
            "Density in a stratum is D = n·E(s) / (2·w·L·P), with n the groups seen within the truncation distance "
            "w, L the line length, P the probability of seeing a group within w and E(s) the expected group size "
            "(Buckland et al. 2001)."))
    else:
        report.paragraph(report.translate(
            "PlotwiseReport",
            "Density in a stratum is D = n·E(s) / (k·π·w²·P), with n the groups seen within the truncation distance "
            "w, k the number of point visits, P the probability of seeing a group within w and E(s) the expected "
            "group size (Buckland et al. 2001)."))
    report.paragraph(report.translate(
        "PlotwiseReport",
        "The squared CV of the density is the sum of those of the encounter rate, of P and of E(s) (delta method). "
        "The encounter rate's variance comes from the differences between transects within each stratum "
        "(estimator R2 of Fewster et al. 2009), that of P from the curvature of the likelihood, that of E(s) from "
        "the spread of group sizes. Intervals are log-normal, D/C to D·C with C = exp(t·√ln(1 + CV²)), t with "
        "Satterthwaite's degrees of freedom (Buckland et al. 2001). With one detection function for all strata, "
        "its uncertainty is shared by every stratum and counted once in the overall estimate."))
    if result.bootstrap:
        report.paragraph(report.translate(
            "PlotwiseReport",
            "The intervals reported are bootstrap percentile intervals: {b} resamples drawn from the recorded seed, "
            "each taking as many transects or points per stratum as were surveyed, with replacement, refitting the "
            "chosen detection function and group size to their detections (AIC is not rerun). {f} resamples could "
            "not be fitted.").format(b=result.bootstrap.replicates, f=result.bootstrap.failed))


def _cautions(report, result):
    report.section(report.translate("PlotwiseReport", "Assumptions and cautions"))
    report.paragraph(report.translate(
        "PlotwiseReport", "The estimate is only as good as three things that happened in the field:"))
    if result.survey.survey == df.LINE:
        report.note(report.translate(
            "PlotwiseReport", "Animals on the line are always seen. Any missed there makes the estimate too low by "
            "the same share, and no interval shows it."))
    else:
        report.note(report.translate(
            "PlotwiseReport", "Animals at the point are always seen. Any missed there makes the estimate too low by "
            "the same share, and no interval shows it."))
    report.note(report.translate(
        "PlotwiseReport", "Distances are measured accurately, with a rangefinder and compass where possible. "
        "Rounding to round numbers, or guessing, distorts the detection function; distance bands are then safer."))
    report.note(report.translate(
        "PlotwiseReport", "Animals do not move before they are detected: animals fleeing from the observer look like "
        "a detection function that falls too early, and animals drawn to the observer like one that falls too "
        "late."))
    report.note(report.translate(
        "PlotwiseReport", "The transects or points were placed at random (or on a randomly placed grid) with respect "
        "to the animals, and each stratum's estimate covers its polygons only: tracks and roads are not random "
        "lines."))


def build_report(result, info, translate=None, language="en"):
    """The HTML report of one run.

    Parameters
    ----------
    result : DistanceDensityResult
    info : mapping
        ``units``, ``unit_field``, ``stratum_field``, ``visits_field``, ``observations``,
        ``obs_unit_field``, ``distance_field``, ``size_field``, ``strata``, ``area_unit``, ``crs``,
        ``seed`` (or None), ``keys`` (labels), ``max_adjustments``, ``warnings`` (text),
        ``strata_geometries`` (stratum → polygon) and ``unit_geometries``.
    translate : callable, optional
        The host's translator ``translate(context, text)`` (``QCoreApplication.translate``); without
        it the report stays in English.
    """
    report = Report("", algorithm_id="plotwise:distancedensity", translate=translate, language=language)
    report.title = report.translate("PlotwiseReport", "Density from detection distances")
    _headline(report, result, info)
    _inputs(report, result, info)
    report.warnings(info.get("warnings", ()))
    _detection_section(report, result)
    _estimate_section(report, result, info)
    _method_section(report, result)
    _cautions(report, result)
    report.references(REFERENCES)
    report.field_safety()
    return report
