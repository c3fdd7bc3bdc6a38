"""The report of plotwise:distancedensity, built from the engine's result dataclasses. Never imports the host.

:func:`build_report` takes a :class:`~..engine.distance_density.DistanceDensityResult` and a mapping
of what the host knows (layer and field names, CRS, seed, the strata and unit geometries) and returns
a :class:`Report` ready to write.
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


def _identity(text):
    return text


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


def _headline(report, result, info, tr):
    o, per = result.overall, info["area_unit"]
    level = f"{result.confidence:.0%}"
    line = result.survey.survey == df.LINE
    figures = [
        (tr("estimated animals in the frame"), f"{o.abund:,.0f}"),
        (tr("{level} interval").format(level=level), f"{o.abund_lo:,.0f} – {o.abund_hi:,.0f}"),
        (tr("animals per {unit}").format(unit=per), format_number(o.dens)),
        (tr("CV"), format_number(o.cv)),
        (tr("detections used"), f"{o.n_det:,}"),
        (tr("transects") if line else tr("points"), f"{o.n_units:,}"),
    ]
    if not result.per_stratum:
        figures.append((tr("detection probability within the truncation distance"), format_number(o.p_det)))
        figures.append((tr("effective strip half-width (m)") if line else tr("effective detection radius (m)"),
                        format_number(o.esw)))
    report.key_figures(figures)


def _inputs(report, result, info, tr):
    survey = result.survey
    keys = ", ".join(info["keys"])
    truncation = f"{survey.truncation:.1f} m"
    if survey.cutpoints is not None:
        truncation += " (" + tr("the last band edge") + ")"
    elif survey.truncation_auto:
        truncation += " (" + tr("automatic: the farthest 5 % of the distances left out") + ")"
    report.parameters({
        tr("Transects or points"): f"{info['units']} ({tr('id field')} {info['unit_field']})",
        tr("Survey type"): tr("line transects") if survey.survey == df.LINE else tr("point transects"),
        tr("Stratum field"): info["stratum_field"] or tr("none: one stratum"),
        tr("Visits field"): info.get("visits_field") or "–",
        tr("Observations"): f"{info['observations']} ({tr('unit field')} {info['obs_unit_field']}, "
                            f"{tr('distance field')} {info['distance_field']})",
        tr("Group size field"): info["size_field"] or tr("none: each detection is one animal"),
        tr("Strata (frame)"): info["strata"],
        tr("Truncation distance"): truncation,
        tr("Distance bands (m)"): ", ".join(f"{c:g}" for c in survey.cutpoints) if survey.cutpoints is not None
        else tr("none: exact distances"),
        tr("Key functions tried"): keys,
        tr("Most cosine terms per key"): info["max_adjustments"],
        tr("Detection function"): tr("one per stratum") if result.per_stratum else tr("one for all strata"),
        tr("Group size"): {"automatic": tr("mean, or size-bias regression when larger groups are seen farther"),
                           "mean": tr("mean of the detected groups"),
                           "regression": tr("size-bias regression")}[result.size_method],
        tr("Confidence level"): f"{result.confidence:.0%}",
        tr("Area unit"): info["area_unit"],
        tr("Computation CRS"): info["crs"],
        tr("Bootstrap resamples"): result.bootstrap.replicates + result.bootstrap.failed if result.bootstrap
        else tr("none"),
        tr("Seed"): info["seed"] if info.get("seed") is not None else tr("not used (no bootstrap)"),
    })


def _detection_section(report, result, tr):
    line = result.survey.survey == df.LINE
    report.section(tr("Detection function"))
    survey = result.survey
    report.paragraph(tr(
        "{n} of the {recorded} recorded detections lie within the truncation distance of {w:.1f} m and were used; "
        "{dropped} farther ones were left out.").format(n=survey.n, recorded=survey.n_recorded, w=survey.truncation,
                                                         dropped=survey.n_dropped))
    for analysis in result.analyses:
        fit = analysis.fit
        where = "" if analysis.stratum == OVERALL else tr("stratum {stratum}: ").format(stratum=analysis.stratum)
        data = df.distance_data_iv(analysis.distances, survey.truncation, survey.survey, survey.cutpoints)
        edges, counts = df.chi_square_bands(data)
        x = np.linspace(0.0, survey.truncation, 241)
        curve = analysis.n * df.distance_pdf(fit, x)
        report.figure(distance_histogram_svg(
            edges, counts, x, curve,
            x_label=tr("perpendicular distance from the line (m)") if line else tr("distance from the point (m)"),
            y_label=tr("detections per metre of distance"),
            curve_label=tr("fitted: {model}").format(model=fit.label)),
            where + (tr("Distances seen from the lines, with the fitted detection function scaled to the detections "
                        "(its height at 0 is where every animal is seen)") if line else
                     tr("Distances seen from the points, with the fitted probability density of the distances: it "
                        "rises from 0 because there is more ground farther from a point, then falls as detection "
                        "drops")))
        _models_table(report, analysis, line, tr)
    _curves_figure(report, result, line, tr)


def _models_table(report, analysis, line, tr):
    selection = analysis.selection
    rows = []
    for i, fit in enumerate(selection.fits):
        gof = fit.gof
        rows.append([fit.label, fit.n_par, fit.aic, selection.delta_aic(i), fit.p_det, fit.esw,
                     gof.chi2_p if gof else None, gof.cvm_p if gof else None,
                     tr("yes") if i == selection.chosen else ""])
    header = [tr("Model"), tr("Parameters"), tr("AIC"), tr("AIC above the best"),
              tr("Detection probability within w"),
              tr("Effective half-width (m)") if line else tr("Effective radius (m)"),
              tr("Fit, χ² p"), tr("Fit, Cramér–von Mises p"), tr("Chosen")]
    caption = tr("Every model tried, in the order fitted ({n} detections). The smallest AIC is chosen; a fit p "
                 "below 0.05 means the model misses the shape of the distances.").format(n=analysis.n)
    if analysis.stratum != OVERALL:
        caption = tr("Stratum {stratum}.").format(stratum=analysis.stratum) + " " + caption
    report.table(header, rows, caption=caption)
    size = analysis.group_size
    if size.method == "none":
        return
    text = tr("Group size: {n} groups seen, mean size {mean:.3g}.").format(n=size.n, mean=size.mean)
    if math.isfinite(size.slope):
        text += " " + tr("The regression of ln(size) on the detection probability has slope {b:.3g} (p = {p:.3f}).") \
            .format(b=size.slope, p=size.slope_p)
    if size.method == SIZE_REGRESSION:
        text += " " + tr("Larger groups are seen farther away, so the expected size where every group is seen, "
                         "{e:.3g} (SE {se:.3g}), is used instead of the mean.").format(e=size.expected, se=size.se)
    else:
        text += " " + tr("The mean is used (SE {se:.3g}).").format(se=size.se)
    report.paragraph(text)


def _curves_figure(report, result, line, tr):
    """g(x) of the best model of each key (of the first analysis)."""
    analysis = result.analyses[0]
    x = np.linspace(0.0, result.survey.truncation, 121)
    series, seen = [], set()
    for fit in sorted(analysis.selection.fits, key=lambda f: f.aic):
        if fit.model.key in seen:
            continue
        seen.add(fit.model.key)
        series.append((fit.label, df.detection_curve(fit, x)))
    report.figure(line_chart_svg(x, series, x_label=tr("distance (m)"), y_label=tr("probability of detection")),
                  tr("The best model of each key function: the probability of seeing an animal at each distance "
                     "(1 on the line or at the point, by assumption)"))


def _estimate_rows(result, info, tr):
    line = result.survey.survey == df.LINE
    rows, abundance = [], []
    for r in result.table():
        label = tr("all strata") if r.stratum == OVERALL else r.stratum
        rows.append([label, r.area, r.n_units, r.effort, r.n_det, r.encounter_rate, r.dens, r.dens_se, r.dens_lo,
                     r.dens_hi, r.cv, r.df])
        abundance.append([label, r.abund, r.abund_se, r.abund_lo, r.abund_hi])
    per = info["area_unit"]
    header = [tr("Stratum"), tr("Area ({unit})").format(unit=per), tr("Transects") if line else tr("Points"),
              tr("Line length (km)") if line else tr("Visits"), tr("Detections"),
              tr("Detections per km") if line else tr("Detections per visit"),
              tr("Animals per {unit}").format(unit=per), tr("SE"), tr("Lower limit"), tr("Upper limit"), tr("CV"),
              tr("df")]
    return header, rows, abundance


def _estimate_section(report, result, info, tr):
    report.section(tr("Density and abundance"))
    level = f"{result.confidence:.0%}"
    header, rows, abundance = _estimate_rows(result, info, tr)
    method = tr("bootstrap percentile limits") if result.bootstrap else tr("log-normal limits with t")
    report.table(header, rows, caption=tr("Density by stratum, {method} at {level}.").format(method=method,
                                                                                          level=level))
    report.table([tr("Stratum"), tr("Animals"), tr("SE"), tr("Lower limit"), tr("Upper limit")], abundance,
                 caption=tr("Abundance in the frame, limits at {level}.").format(level=level))
    parts = []
    for r in result.delta_rows:
        shares = {name: c2 for name, c2, _ in r.components}
        total = sum(v for v in shares.values() if _finite(v)) or float("nan")
        label = tr("all strata") if r.stratum == OVERALL else r.stratum
        parts.append([label] + [shares.get(k, 0.0) / total if _finite(total) else None
                                for k in ("encounter rate", "detection", "group size")])
    report.table([tr("Stratum"), tr("Share from the encounter rate"), tr("Share from the detection function"),
                  tr("Share from group size")], parts,
                 caption=tr("Where the uncertainty comes from: each part's share of CV² (delta method). A large "
                            "encounter-rate share calls for more transects; a large detection share for more "
                            "detections."))
    if result.bootstrap:
        report.table([tr("Stratum"), tr("Lower limit"), tr("Upper limit"), tr("CV")],
                     [[tr("all strata") if r.stratum == OVERALL else r.stratum, r.abund_lo, r.abund_hi, r.cv]
                      for r in result.delta_rows],
                     caption=tr("For comparison: the abundance's delta-method interval (log-normal with t)."))
    labels = [r.stratum for r in result.strata] + [tr("all strata")]
    table = result.table()
    report.figure(interval_chart_svg(labels, [r.dens for r in table], [r.dens_lo for r in table],
                                     [r.dens_hi for r in table],
                                     value_label=tr("animals per {unit}").format(unit=info["area_unit"])),
                  tr("Density by stratum with {level} intervals").format(level=level))
    _map(report, result, info, tr)


def _map(report, result, info, tr):
    geometries = info.get("strata_geometries") or {}
    if not geometries:
        return
    shown = {r.stratum: r.dens for r in result.strata}
    finite = [v for v in shown.values() if _finite(v)]
    lo, hi = (min(finite), max(finite)) if finite else (0.0, 1.0)
    order = [r.stratum for r in result.strata if r.stratum in geometries]
    layers = [MapLayer(tuple(geometries[k] for k in order), fills=tuple(_shade(shown.get(k), lo, hi) for k in order),
                       stroke=INK, stroke_width=0.8,
                       legend=((f"{tr('lowest')}: {lo:.3g}", _shade(lo, lo, hi)),
                               (f"{tr('highest')}: {hi:.3g}", _shade(hi, lo, hi))))]
    units = tuple(g for g in info.get("unit_geometries", ()) if g is not None)
    line = result.survey.survey == df.LINE
    layers.append(MapLayer(units, label=tr("transects") if line else tr("points"), fill=CATEGORY_COLOURS[1],
                           stroke=CATEGORY_COLOURS[1] if line else INK, stroke_width=2.0, point_radius=3.0))
    per = info["area_unit"]
    report.figure(map_svg(layers, title=tr("animals per {unit}").format(unit=per)),
                  tr("Strata shaded by density (animals per {unit}), with the surveyed {what}").format(
                      unit=per, what=tr("transects") if line else tr("points")))


def _method_section(report, result, tr):
    line = result.survey.survey == df.LINE
    report.section(tr("Method"))
    report.paragraph(tr(
        "Each detection function is a key (half-normal, hazard-rate or uniform) with up to the chosen number of "
        "cosine terms, fitted to the distances by maximum likelihood; terms are added one at a time while AIC "
        "falls, under the constraint that detection never rises with distance, and the model with the smallest "
        "AIC is used (Buckland et al. 2001)."))
    report.paragraph(tr(
        "Density in a stratum is D = n·E(s) / (2·w·L·P), with n the groups seen within the truncation distance w, "
        "L the line length, P the probability of seeing a group within w and E(s) the expected group size "
        "(Buckland et al. 2001).") if line else tr(
        "Density in a stratum is D = n·E(s) / (k·π·w²·P), with n the groups seen within the truncation distance "
        "w, k the number of point visits, P the probability of seeing a group within w and E(s) the expected group "
        "size (Buckland et al. 2001)."))
    report.paragraph(tr(
        "The squared CV of the density is the sum of those of the encounter rate, of P and of E(s) (delta method). "
        "The encounter rate's variance comes from the differences between transects within each stratum "
        "(estimator R2 of Fewster et al. 2009), that of P from the curvature of the likelihood, that of E(s) from "
        "the spread of group sizes. Intervals are log-normal, D/C to D·C with C = exp(t·√ln(1 + CV²)), t with "
        "Satterthwaite's degrees of freedom (Buckland et al. 2001). With one detection function for all strata, "
        "its uncertainty is shared by every stratum and counted once in the overall estimate."))
    if result.bootstrap:
        report.paragraph(tr(
            "The intervals reported are bootstrap percentile intervals: {b} resamples drawn from the recorded seed, "
            "each taking as many transects or points per stratum as were surveyed, with replacement, refitting the "
            "chosen detection function and group size to their detections (AIC is not rerun). {f} resamples could "
            "not be fitted.").format(b=result.bootstrap.replicates, f=result.bootstrap.failed))


def _cautions(report, result, tr):
    line = result.survey.survey == df.LINE
    report.section(tr("Assumptions and cautions"))
    report.paragraph(tr("The estimate is only as good as three things that happened in the field:"))
    report.note(tr("Animals on the line (or at the point) are always seen. Any missed there makes the estimate too "
                   "low by the same share, and no interval shows it.") if line else
                tr("Animals at the point are always seen. Any missed there makes the estimate too low by the same "
                   "share, and no interval shows it."))
    report.note(tr("Distances are measured accurately, with a rangefinder and compass where possible. Rounding to "
                   "round numbers, or guessing, distorts the detection function; distance bands are then safer."))
    report.note(tr("Animals do not move before they are detected: animals fleeing from the observer look like a "
                   "detection function that falls too early, and animals drawn to the observer like one that falls "
                   "too late."))
    report.note(tr("The transects or points were placed at random (or on a randomly placed grid) with respect to "
                   "the animals, and each stratum's estimate covers its polygons only: tracks and roads are not "
                   "random lines."))


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
        The host's translation of report strings (context ``PlotwiseReport``).
    """
    tr = translate or _identity
    report = Report(tr("Density from detection distances"), algorithm_id="plotwise:distancedensity", translate=tr,
                    language=language)
    _headline(report, result, info, tr)
    _inputs(report, result, info, tr)
    report.warnings(info.get("warnings", ()))
    _detection_section(report, result, tr)
    _estimate_section(report, result, info, tr)
    _method_section(report, result, tr)
    _cautions(report, result, tr)
    report.references(REFERENCES)
    report.field_safety()
    return report

