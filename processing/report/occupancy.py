"""The report of plotwise:occupancy, built from the engine's results (host-free).

``translate(context, text)`` is the host's translator (``QCoreApplication.translate``); without it
the report stays in English. Every string is marked ``report.translate("PlotwiseReport", "…")``.
"""
from dataclasses import dataclass
import math

import numpy as np

from ..engine.errors import QT_TRANSLATE_NOOP
from .html import Report, format_number
from .style import INK, MUTED, PROBABILITY_RAMP
from .svg import MapLayer, bar_chart_svg, line_chart_svg, map_svg

REFERENCES = (
    "MacKenzie, D. I., Nichols, J. D., Lachman, G. B., Droege, S., Royle, J. A. & Langtimm, C. A. (2002). "
    "Estimating site occupancy rates when detection probabilities are less than one. Ecology 83, 2248-2255.",
    "MacKenzie, D. I. & Bailey, L. L. (2004). Assessing the fit of site-occupancy models. Journal of Agricultural, "
    "Biological, and Environmental Statistics 9, 300-318.",
    "MacKenzie, D. I. & Royle, J. A. (2005). Designing occupancy studies: general advice and allocating survey "
    "effort. Journal of Applied Ecology 42, 1105-1114.",
    "Louis, T. A. (1982). Finding the observed information matrix when using the EM algorithm. Journal of the Royal "
    "Statistical Society B 44, 226-233.",
    "Akaike, H. (1973). Information theory and an extension of the maximum likelihood principle. In Second "
    "International Symposium on Information Theory, 267-281. Akadémiai Kiadó.",
    "Burnham, K. P. & Anderson, D. R. (2002). Model Selection and Multimodel Inference, 2nd ed. Springer.",
    "Hurvich, C. M. & Tsai, C.-L. (1989). Regression and time series model selection in small samples. "
    "Biometrika 76, 297-307.",
)
MAX_MAP_SITES = 5000
STATUS_NAMES = {
    "converged": QT_TRANSLATE_NOOP("PlotwiseReport", "converged"),
    "boundary": QT_TRANSLATE_NOOP("PlotwiseReport", "at the boundary"),
    "failed": QT_TRANSLATE_NOOP("PlotwiseReport", "not fitted"),
}


@dataclass(frozen=True)
class OccupancyRun:
    """What the run was given (for the parameters table)."""

    layer: str
    site_id_field: str
    history_fields: tuple
    effort_fields: tuple
    models_text: str
    crs: str
    seed: object  # None without the bootstrap


def probability_colour(value, ramp=PROBABILITY_RAMP):
    """The colour of a probability on our sequential ramp (grey when missing)."""
    if value is None or not np.isfinite(value):
        return "#c9cfcd"
    position = min(max(float(value), 0.0), 1.0) * (len(ramp) - 1)
    k = min(int(position), len(ramp) - 2)
    f = position - k
    a, b = (tuple(int(c[i:i + 2], 16) for i in (1, 3, 5)) for c in (ramp[k], ramp[k + 1]))
    return "#" + "".join(f"{round(x + (y - x) * f):02x}" for x, y in zip(a, b))


def occupancy_report(result, run, geometries=None, warnings=(), translate=None, language="en"):
    """The HTML report of an occupancy analysis.

    Parameters
    ----------
    result : engine.occupancy.OccupancyResult
    run : OccupancyRun
    geometries : sequence of shapely geometries (or None) of the sites used, in order, for the map
    warnings : sequence of str (already translated)
    translate : callable ``(context, text) -> text``, optional
    """
    main = result.main
    level = f"{result.confidence:.0%}"
    report = Report("", algorithm_id="plotwise:occupancy", translate=translate, language=language)
    report.title = report.translate("PlotwiseReport", "Occupancy from repeat visits")
    report.field_safety()
    report.warnings(warnings)
    report.key_figures([
        (report.translate("PlotwiseReport", "occupancy ψ (share of sites used)"),
         format_number(main.psi_mean.estimate)),
        (report.translate("PlotwiseReport", "{level} interval of ψ").format(level=level), _interval(main.psi_mean)),
        (report.translate("PlotwiseReport", "detection p per survey"), format_number(main.p_mean.estimate)),
        (report.translate("PlotwiseReport", "naive occupancy (detected at least once)"),
         format_number(result.summary.naive)),
        (report.translate("PlotwiseReport", "sites used"), format_number(result.summary.n_used)),
    ])
    report.paragraph(report.translate(
        "PlotwiseReport",
        "Model: {model}. ψ is the mean fitted occupancy probability of the sites used; with covariates it varies "
        "by site (field psi).").format(model=main.terms.label))
    _history_section(report, result)
    _estimate_section(report, result, level)
    _models_section(report, result)
    _detection_section(report, result)
    _advice_section(report, result)
    if result.gof is not None:
        _gof_section(report, result.gof)
    if geometries is not None and any(g is not None for g in geometries):
        report.section(report.translate("PlotwiseReport", "Map of psi_cond"))
        report.figure(psi_cond_map(geometries, main.psi_cond, report), report.translate(
            "PlotwiseReport",
            "Sites shaded by psi_cond, the probability that the site is occupied given its detection history (1 "
            "where the species was detected)"))
    report.section(report.translate("PlotwiseReport", "Method"))
    report.paragraph(report.translate(
        "PlotwiseReport",
        "Single-season occupancy model (MacKenzie et al. 2002): a site is occupied with probability ψ and, when "
        "occupied, each survey detects the species with probability p; logit ψ and logit p are linear in the "
        "covariates. Maximum likelihood with scipy (BFGS, then Newton steps); standard errors from the observed "
        "information (Louis 1982), intervals on the logit scale. Covariates are centred and scaled for the fit; "
        "the table gives their coefficients in the covariates' own units. Occasions not surveyed (NULL) are left "
        "out of a site's likelihood."))
    report.parameters(_parameters(report, result, run, level))
    report.references(REFERENCES)
    return report


def _parameters(report, result, run, level):
    main, none = result.main, report.translate("PlotwiseReport", "(none)")
    return {
        report.translate("PlotwiseReport", "Sites (SITES)"): run.layer,
        report.translate("PlotwiseReport", "Site id field (SITE_ID_FIELD)"):
            run.site_id_field or report.translate("PlotwiseReport", "(none: feature ids)"),
        report.translate("PlotwiseReport", "History fields (HISTORY_FIELDS)"): ", ".join(run.history_fields),
        report.translate("PlotwiseReport", "Covariates of ψ (PSI_COVARIATES)"): ", ".join(main.terms.psi) or none,
        report.translate("PlotwiseReport", "Covariates of p (P_COVARIATES)"):
            ", ".join(c for c in main.terms.p if c != "effort") or none,
        report.translate("PlotwiseReport", "Effort fields (EFFORT_FIELDS)"): ", ".join(run.effort_fields) or none,
        report.translate("PlotwiseReport", "Models compared (MODELS)"):
            run.models_text or report.translate("PlotwiseReport", "(the constant model only)"),
        report.translate("PlotwiseReport", "Confidence level (CONFIDENCE)"): level,
        report.translate("PlotwiseReport", "Target SE of ψ (TARGET_SE)"):
            result.advice.target_se if result.advice.target_se > 0 else none,
        report.translate("PlotwiseReport", "Goodness-of-fit replicates (GOF_REPLICATES)"):
            result.gof.replicates + result.gof.failed if result.gof else 0,
        report.translate("PlotwiseReport", "Seed (SEED)"):
            run.seed if run.seed is not None else report.translate("PlotwiseReport", "not used (no bootstrap)"),
        report.translate("PlotwiseReport", "CRS"): run.crs,
    }


def _interval(d):
    if not (np.isfinite(d.lo) and np.isfinite(d.hi)):
        return "–"
    return f"{format_number(d.lo)} – {format_number(d.hi)}"


def _history_section(report, result):
    s = result.summary
    report.section(report.translate("PlotwiseReport", "Detection histories"))
    report.table([report.translate("PlotwiseReport", "Item"), report.translate("PlotwiseReport", "Value")], [
        [report.translate("PlotwiseReport", "sites in the layer"), s.n_sites],
        [report.translate("PlotwiseReport", "sites used (at least one surveyed occasion)"), s.n_used],
        [report.translate("PlotwiseReport", "sites left out (no surveyed occasion)"), s.n_sites - s.n_used],
        [report.translate("PlotwiseReport", "occasions"), s.n_occasions],
        [report.translate("PlotwiseReport", "surveys (site-occasions surveyed)"), s.n_surveys],
        [report.translate("PlotwiseReport", "site-occasions not surveyed (NULL)"), s.n_missing],
        [report.translate("PlotwiseReport", "sites with a detection"), s.n_detected_sites],
        [report.translate("PlotwiseReport", "detections"), s.n_detections],
    ])
    label = report.translate("PlotwiseReport", "{n} detections")
    labels = [label.format(n=k) for k in range(len(s.detections_per_site))]
    report.figure(bar_chart_svg(labels, list(s.detections_per_site), report.translate("PlotwiseReport", "sites")),
                  report.translate("PlotwiseReport", "Sites by their number of detections"))
    report.table([report.translate("PlotwiseReport", "History (1 detected, 0 not, - not surveyed)"),
                  report.translate("PlotwiseReport", "Sites")], [list(f) for f in s.frequent],
                 caption=report.translate("PlotwiseReport", "The most frequent detection histories"))


def _estimate_section(report, result, level):
    main = result.main
    report.section(report.translate("PlotwiseReport", "Estimates"))
    rows = [[n, e, s, lo, hi] for n, e, s, lo, hi in zip(main.names, main.estimate, main.se, main.lo, main.hi)]
    for name, d in (("psi", main.psi_mean), ("p", main.p_mean)):
        rows.append([name, d.estimate, d.se, d.lo, d.hi])
    report.table([report.translate("PlotwiseReport", "Parameter"), report.translate("PlotwiseReport", "Estimate"),
                  report.translate("PlotwiseReport", "SE"),
                  report.translate("PlotwiseReport", "Lower ({level})").format(level=level),
                  report.translate("PlotwiseReport", "Upper ({level})").format(level=level)], rows, digits=4)
    report.paragraph(report.translate(
        "PlotwiseReport",
        "Rows logit_psi:… and logit_p:… are coefficients on the logit scale (const: the logit at covariates 0; a "
        "slope per unit of its covariate). Rows psi and p are the mean fitted probabilities, with delta-method SEs "
        "and intervals on the logit scale."))
    if main.status == "boundary":
        report.note(report.translate(
            "PlotwiseReport",
            "Parameters at the boundary of their range: {names}. They get no SE or interval; the other estimates are "
            "conditional on them.").format(names=", ".join(main.boundary)))


def _models_section(report, result):
    report.section(report.translate("PlotwiseReport", "Model comparison"))
    rows = []
    for f, delta, weight in zip(result.fits, result.delta_aic, result.aic_weights):
        rows.append([f.terms.label, f.n_par, f.log_likelihood, f.aic, f.aicc, delta, weight, f.psi_mean.estimate,
                     f.p_mean.estimate, report.translate("PlotwiseReport", STATUS_NAMES[f.status])])
    report.table([
        report.translate("PlotwiseReport", "Model"), report.translate("PlotwiseReport", "Parameters"),
        report.translate("PlotwiseReport", "log L"), report.translate("PlotwiseReport", "AIC"),
        report.translate("PlotwiseReport", "AICc"), report.translate("PlotwiseReport", "ΔAIC"),
        report.translate("PlotwiseReport", "AIC weight"), report.translate("PlotwiseReport", "ψ"),
        report.translate("PlotwiseReport", "p"), report.translate("PlotwiseReport", "Fit"),
    ], rows)
    best = int(np.nanargmin(result.delta_aic)) if np.isfinite(result.delta_aic).any() else 0
    if best != 0 and result.delta_aic[0] > 2.0:
        report.note(report.translate(
            "PlotwiseReport",
            "The model with the lowest AIC is {model}, {d} AIC units below the model reported above. Consider "
            "running again with its covariates.").format(model=result.fits[best].terms.label,
                                                         d=format_number(result.delta_aic[0])))


def _detection_section(report, result):
    main, advice = result.main, result.advice
    report.section(report.translate("PlotwiseReport", "Cumulative detection"))
    k_max = int(max(advice.occasions * 2, min(advice.occasions_95, 60) + 2, 6))
    ks = np.arange(1, k_max + 1)
    series = [(report.translate("PlotwiseReport", "1 − (1 − p)^K"), 1.0 - (1.0 - main.p_mean.estimate) ** ks)]
    if np.isfinite(main.p_mean.lo):
        series += [(report.translate("PlotwiseReport", "lower limit"), 1.0 - (1.0 - main.p_mean.lo) ** ks),
                   (report.translate("PlotwiseReport", "upper limit"), 1.0 - (1.0 - main.p_mean.hi) ** ks)]
    series.append(("0.95", np.full(len(ks), 0.95)))
    chart = line_chart_svg(ks, series, report.translate("PlotwiseReport", "occasions K"),
                           report.translate("PlotwiseReport", "cumulative detection"))
    report.figure(chart, report.translate(
        "PlotwiseReport", "Chance of at least one detection at an occupied site after K surveys, at the mean p"))


def _advice_section(report, result):
    a = result.advice
    report.section(report.translate("PlotwiseReport", "Design advice"))
    report.paragraph(report.translate(
        "PlotwiseReport",
        "With p = {p} per survey, {k} occasions give a cumulative detection of {c}; {k95} occasions are needed for "
        "0.95.").format(p=format_number(a.p), k=a.occasions, c=format_number(a.cumulative),
                        k95=a.occasions_95 if math.isfinite(a.occasions_95) else "–"))
    if a.target_se > 0 and math.isfinite(a.sites_needed):
        report.paragraph(report.translate(
            "PlotwiseReport",
            "For an SE of ψ of {se} with {k} occasions per site, about {s} sites are needed (asymptotic variance of "
            "MacKenzie & Royle 2005 at ψ = {psi} and p = {p}: s·Var(ψ̂) = {v}). The fewest surveys (sites × "
            "occasions) for that SE come with {kb} occasions per site and about {sb} sites.").format(
            se=format_number(a.target_se), k=a.occasions, s=format_number(math.ceil(a.sites_needed)),
            psi=format_number(a.psi), p=format_number(a.p), v=format_number(a.variance_per_site), kb=a.best_occasions,
            sb=format_number(math.ceil(a.best_sites)) if math.isfinite(a.best_sites) else "–"))
    if result.main.terms.psi or result.main.terms.p:
        report.paragraph(report.translate(
            "PlotwiseReport",
            "With covariates the advice uses the mean ψ and p of the model (the constant-model formula): a guide, "
            "not an exact figure."))


def _gof_section(report, gof):
    report.section(report.translate("PlotwiseReport", "Goodness of fit"))
    report.paragraph(report.translate(
        "PlotwiseReport",
        "Pearson's χ² of the detection-history frequencies against the model's expected frequencies (sites grouped "
        "by their surveyed occasions): {x}. Parametric bootstrap (MacKenzie & Bailey 2004) of {b} data sets "
        "simulated from the fitted model: mean χ² {m}, p = {p}; ĉ = {c}.").format(
        x=format_number(gof.chi_square), b=gof.replicates, m=format_number(gof.mean_bootstrap),
        p=format_number(gof.p_value), c=format_number(gof.c_hat)))
    report.paragraph(report.translate(
        "PlotwiseReport",
        "ĉ near 1: the model fits; above 1: the histories vary more than the model allows (multiply the variances "
        "by ĉ); well below 1 is usually harmless."))


def psi_cond_map(geometries, values, report):
    """Sites drawn in the probability ramp by ``values`` (psi_cond), with a legend of five classes."""
    geoms, fills = [], []
    for g, v in zip(geometries, values):
        if g is not None and not g.is_empty:
            geoms.append(g)
            fills.append(probability_colour(v))
    if len(geoms) > MAX_MAP_SITES:
        step = int(math.ceil(len(geoms) / MAX_MAP_SITES))
        geoms, fills = geoms[::step], fills[::step]
    edges = np.linspace(0.0, 1.0, 6)
    label = report.translate("PlotwiseReport", "{lo} to {hi}")
    legend = tuple((label.format(lo=format_number(a), hi=format_number(b)), probability_colour((a + b) / 2.0))
                   for a, b in zip(edges[:-1], edges[1:]))
    layer = MapLayer(tuple(geoms), fills=tuple(fills), fill=fills[0] if fills else "none", stroke=INK,
                     stroke_width=0.6, point_radius=4.0, legend=legend)
    return map_svg([layer]) if geoms else map_svg([MapLayer((), stroke=MUTED)])
