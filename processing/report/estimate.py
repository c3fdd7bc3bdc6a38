"""The report of plotwise:estimate, built from :class:`engine.estimation.Estimate` (never imports the host)."""

import math
from dataclasses import dataclass

import numpy as np

from ..engine.listing import natural_key
from .style import CATEGORY_COLOURS, INK, MUTED
from .svg import MapLayer, histogram_svg, interval_chart_svg, map_svg

UNIT_COLOUR = CATEGORY_COLOURS[1]  # amber: visible on the pale and the dark end of the density shading

REFERENCES = (
    "Cochran, W. G. (1977). Sampling Techniques, 3rd ed. Wiley. Chapter 5 (stratified random sampling, "
    "Satterthwaite's degrees of freedom, §5A.12 one unit per stratum: collapsed strata) and chapter 6 (ratio "
    "estimators).",
    "Hansen, M. H., Hurwitz, W. N. & Madow, W. G. (1953). Sample Survey Methods and Theory, vol. I. Wiley "
    "(collapsed strata of unequal size).",
    "Satterthwaite, F. E. (1946). An approximate distribution of estimates of variance components. "
    "Biometrics Bulletin 2, 110-114.",
    "Box, G. E. P. (1954). Some theorems on quadratic forms applied in the study of analysis of variance "
    "problems, I. Annals of Mathematical Statistics 25, 290-302.",
    "Seber, G. A. F. (1982). The Estimation of Animal Abundance and Related Parameters, 2nd ed. Griffin "
    "(the delta method).",
    "Burnham, K. P., Anderson, D. R., White, G. C., Brownie, C. & Pollock, K. H. (1987). Design and "
    "analysis methods for fish survival experiments based on release-recapture. American Fisheries "
    "Society Monograph 5 (log-normal intervals).",
    "Buckland, S. T., Anderson, D. R., Burnham, K. P., Laake, J. L., Borchers, D. L. & Thomas, L. (2001). "
    "Introduction to Distance Sampling. Oxford University Press (§3.6.1 log-normal intervals with t, eq. 3.75 "
    "degrees of freedom of a combined CV, bootstrap).",
    "Garwood, F. (1936). Fiducial limits for the Poisson distribution. Biometrika 28, 437-442.",
    "Gregoire, T. G. & Valentine, H. T. (2008). Sampling Strategies for Natural Resources and the Environment. "
    "Chapman & Hall/CRC, ch. 10 (plus sampling at the edges).",
    "Cordy, C. B. (1993). An extension of the Horvitz-Thompson theorem to point sampling from a continuous "
    "universe. Statistics & Probability Letters 18, 353-362.",
    "Efron, B. & Tibshirani, R. J. (1993). An Introduction to the Bootstrap. Chapman & Hall.",
    "Rao, J. N. K. & Wu, C. F. J. (1988). Resampling inference with complex survey data. Journal of the "
    "American Statistical Association 83, 231-241 (the rescaled bootstrap).",
    "Stevens, D. L. & Olsen, A. R. (2003). Variance estimation for spatially balanced samples of "
    "environmental resources. Environmetrics 14, 593-610.",
    "Neyman, J. (1934). On the two different aspects of the representative method. Journal of the Royal "
    "Statistical Society 97, 558-625.",
)


@dataclass(frozen=True)
class EstimateReportInputs:
    """What the report shows besides the result: names, settings, the map's geometries (host-free)."""

    units: str
    strata: str
    count_field: str
    stratum_field: object
    area_field: object
    unit_area_m2: float
    strip_width: float
    area_unit: str
    crs: str
    seed: object
    true_total: object
    frame_geometries: dict
    surveyed_points: tuple = ()
    missing_points: tuple = ()
    ramp: tuple = ("#ffffff", "#000000")  # the styled layer's density ramp, light to dark
    missing_colour: str = "#cccccc"


def sequential_colour(value, lo, hi, ramp, missing_colour="#cccccc"):
    """The density ramp (light to dark) at ``value``; ``missing_colour`` when missing."""
    if value is None or not np.isfinite(value):
        return missing_colour
    t = 0.0 if hi <= lo else min(max((value - lo) / (hi - lo), 0.0), 1.0)
    stops = [tuple(int(c[i : i + 2], 16) for i in (1, 3, 5)) for c in ramp]
    position = t * (len(stops) - 1)
    k = min(int(position), len(stops) - 2)
    f = position - k
    return "#" + "".join(f"{round(a + (b - a) * f):02x}" for a, b in zip(stops[k], stops[k + 1]))


def _number(value):
    return None if value is None or (isinstance(value, float) and not math.isfinite(value)) else value


def estimate_report(report, result, inputs, warnings):
    """Fill ``report`` (a :class:`report.Report`) with the estimate's results; returns it."""
    presence = result.presence
    report.title = (
        report.translate("PlotwiseReport", "Naive occupancy from presence data")
        if presence
        else report.translate("PlotwiseReport", "Density and abundance estimate")
    )
    _key_figures(report, result, inputs)
    _parameters(report, result, inputs)
    report.warnings(warnings)
    _tables(report, result, inputs)
    _figures(report, result, inputs)
    _method(report, result)
    _cautions(report, result)
    report.references(REFERENCES)
    report.field_safety()
    return report


def _labels(report, result, per):
    if result.presence:
        return report.translate("PlotwiseReport", "proportion of units occupied (naive)"), report.translate(
            "PlotwiseReport", "occupied units"
        )
    return report.translate("PlotwiseReport", "density per {unit}").format(unit=per), report.translate(
        "PlotwiseReport", "animals"
    )


def _key_figures(report, result, inputs):
    o = result.overall
    level = f"{result.confidence:.0%}"
    dens_label, what = _labels(report, result, inputs.area_unit)
    interval = (
        report.translate("PlotwiseReport", "0 – {hi} (one-sided)").format(hi=f"{o.abund_hi:,.0f}")
        if o.upper_only
        else f"{o.abund_lo:,.0f} – {o.abund_hi:,.0f}"
    )
    figures = [
        (report.translate("PlotwiseReport", "estimated {what} in the frame").format(what=what), f"{o.abund:,.0f}"),
        (report.translate("PlotwiseReport", "{level} interval").format(level=level), interval),
        (dens_label, f"{o.dens:.3g}"),
        (report.translate("PlotwiseReport", "CV"), "–" if not np.isfinite(o.cv) else f"{o.cv:.3f}"),
        (report.translate("PlotwiseReport", "units surveyed"), f"{o.n:,}"),
    ]
    if inputs.true_total:
        figures.append(
            (report.translate("PlotwiseReport", "true total of the simulated population"), f"{inputs.true_total:,.0f}")
        )
    report.key_figures(figures)
    if inputs.true_total:
        truth = inputs.true_total
        report.note(
            report.translate(
                "PlotwiseReport",
                "Simulation only: the true total ({truth:,.0f}) is known here because the population was "
                "simulated. The estimate is {est:,.0f} ({error:+.1%} from the truth), and the {level} interval "
                "{verdict} the truth. Only a simulation can show this; a real survey never knows its true total, "
                "and one survey's interval may miss it by chance (about {miss:.0%} of surveys should)."
            ).format(
                truth=truth,
                est=o.abund,
                error=o.abund / truth - 1,
                level=level,
                verdict=report.translate("PlotwiseReport", "covers")
                if o.abund_lo <= truth <= o.abund_hi
                else report.translate("PlotwiseReport", "misses"),
                miss=1 - result.confidence,
            )
        )


def _method_names(report):
    ci = {
        "t": report.translate("PlotwiseReport", "t with Satterthwaite degrees of freedom"),
        "lognormal": report.translate("PlotwiseReport", "log-normal (with t)"),
        "bootstrap": report.translate("PlotwiseReport", "stratified percentile bootstrap"),
    }
    variance = {
        "srs": report.translate("PlotwiseReport", "simple random sampling formula"),
        "local": report.translate("PlotwiseReport", "local neighbourhood (Stevens & Olsen 2003)"),
        "local_scaled": report.translate(
            "PlotwiseReport", "local neighbourhood, scaled to the simple formula (our variant)"
        ),
    }
    return ci, variance


def _parameters(report, result, inputs):
    ci_names, variance_names = _method_names(report)
    edge_names = {
        "plus": report.translate("PlotwiseReport", "plus sampling (units count only inside their stratum)"),
        "inside": report.translate("PlotwiseReport", "units kept wholly inside their stratum"),
        "": report.translate("PlotwiseReport", "no record: whole units"),
    }
    unit_area = (
        report.translate("PlotwiseReport", "field {field} (m²)").format(field=inputs.area_field)
        if inputs.area_field
        else report.translate("PlotwiseReport", "polygon area")
    )
    if inputs.strip_width > 0:
        unit_area += "; " + report.translate("PlotwiseReport", "strip width") + f" {inputs.strip_width:g} m"
    if inputs.unit_area_m2 > 0:
        unit_area += "; " + report.translate("PlotwiseReport", "fixed") + f" {inputs.unit_area_m2:g} m²"
    if result.fpc_refused:
        fpc = report.translate(
            "PlotwiseReport", "asked for; applied in strata {yes}, refused in {no} (units may overlap)"
        ).format(yes=", ".join(result.fpc_strata) or "–", no=", ".join(result.fpc_refused))
    else:
        fpc = report.translate("PlotwiseReport", "yes") if result.fpc else report.translate("PlotwiseReport", "no")
    df_p = "∞" if not np.isfinite(result.detection_df) else f"{result.detection_df:g}"
    parameters = {
        report.translate("PlotwiseReport", "Sample units"): inputs.units,
        report.translate("PlotwiseReport", "Count field"): inputs.count_field
        + (report.translate("PlotwiseReport", " (presence/absence)") if result.presence else ""),
        report.translate("PlotwiseReport", "Stratum field"): inputs.stratum_field
        or report.translate("PlotwiseReport", "none: one stratum"),
        report.translate("PlotwiseReport", "Unit area"): unit_area,
        report.translate("PlotwiseReport", "Strata (frame)"): inputs.strata,
        report.translate("PlotwiseReport", "Computation CRS"): inputs.crs,
        report.translate("PlotwiseReport", "Area unit"): inputs.area_unit,
        report.translate("PlotwiseReport", "Confidence level"): f"{result.confidence:.0%}",
        report.translate("PlotwiseReport", "Interval"): ci_names[result.ci_method],
        report.translate("PlotwiseReport", "Variance estimator"): variance_names[result.variance_method],
        report.translate("PlotwiseReport", "Finite-population correction"): fpc,
        report.translate("PlotwiseReport", "Edge protocol of the units"): edge_names.get(result.edge, result.edge),
        report.translate(
            "PlotwiseReport", "Detection probability p"
        ): f"{result.detection_p:g} (SE {result.detection_se:g}, df {df_p})",
        report.translate("PlotwiseReport", "Target CV for the next survey"): f"{result.target_cv:g}"
        if result.target_cv
        else "–",
    }
    if result.ci_method == "bootstrap":
        parameters[report.translate("PlotwiseReport", "Bootstrap resamples")] = result.n_bootstrap
        parameters[report.translate("PlotwiseReport", "Seed")] = inputs.seed
    else:
        parameters[report.translate("PlotwiseReport", "Seed")] = report.translate(
            "PlotwiseReport", "not used (no random draws without the bootstrap)"
        )
    report.parameters(parameters)


def _tables(report, result, inputs):
    per = inputs.area_unit
    level = f"{result.confidence:.0%}"
    dens_label, _ = _labels(report, result, per)
    report.section(report.translate("PlotwiseReport", "Estimates by stratum"))
    density_header = [
        report.translate("PlotwiseReport", "Stratum"),
        report.translate("PlotwiseReport", "Area ({unit})").format(unit=per),
        report.translate("PlotwiseReport", "Units (n)"),
        report.translate("PlotwiseReport", "Not surveyed"),
        report.translate("PlotwiseReport", "Mean count"),
        report.translate("PlotwiseReport", "SD of counts"),
        dens_label[:1].upper() + dens_label[1:],
        report.translate("PlotwiseReport", "SE"),
        report.translate("PlotwiseReport", "Lower limit"),
        report.translate("PlotwiseReport", "Upper limit"),
        report.translate("PlotwiseReport", "CV"),
        report.translate("PlotwiseReport", "df"),
    ]
    abundance_header = [
        report.translate("PlotwiseReport", "Stratum"),
        report.translate("PlotwiseReport", "Occupied units")
        if result.presence
        else report.translate("PlotwiseReport", "Abundance"),
        report.translate("PlotwiseReport", "SE"),
        report.translate("PlotwiseReport", "Lower limit"),
        report.translate("PlotwiseReport", "Upper limit"),
    ]
    if result.target_cv:
        abundance_header.append(report.translate("PlotwiseReport", "Units next time (n_next)"))
    density_rows, abundance_rows = [], []
    for r in result.table():
        label = report.translate("PlotwiseReport", "all strata") if r.stratum == "all" else r.stratum
        if r.upper_only:
            label += " †"
        density_rows.append(
            [label, r.area, r.n, r.n_missing]
            + [_number(v) for v in (r.mean_c, r.sd_c, r.dens, r.dens_se, r.dens_lo, r.dens_hi, r.cv, r.df)]
        )
        abundance_rows.append(
            [label]
            + [_number(v) for v in (r.abund, r.abund_se, r.abund_lo, r.abund_hi)]
            + ([r.n_next] if result.target_cv else [])
        )
    report.table(
        density_header,
        density_rows,
        caption=report.translate("PlotwiseReport", "{what}, limits at {level}.").format(
            what=dens_label.capitalize(), level=level
        ),
    )
    report.table(
        abundance_header,
        abundance_rows,
        caption=report.translate("PlotwiseReport", "{what} in the frame, limits at {level}.").format(
            what=report.translate("PlotwiseReport", "Occupied units")
            if result.presence
            else report.translate("PlotwiseReport", "Abundance"),
            level=level,
        ),
    )
    _table_notes(report, result, per, level)
    _intervals_table(report, result, level)


def _table_notes(report, result, per, level):
    """Below the tables: zero counts, strata left out, units not surveyed and reserves skipped."""
    if any(r.upper_only for r in result.table()):
        report.note(
            report.translate(
                "PlotwiseReport",
                "† Every count was 0: the estimate is 0 and the interval runs from 0 to the one-sided upper limit "
                "−ln(1 − {level}) · A / Σa of a Poisson count of 0 (Garwood 1936; about 3 · A / Σa at 95 %), divided "
                "by p with detection. For the frame it assumes one density over the strata."
            ).format(level=level)
        )
    if result.dropped_strata:
        report.note(
            report.translate(
                "PlotwiseReport",
                "The frame shrank: strata {strata} had no surveyed unit and were left out ({area:,.3g} {unit}). "
                "The estimate covers the remaining strata only."
            ).format(strata=", ".join(result.dropped_strata), area=result.dropped_area, unit=per)
        )
    if result.missing_ids:
        shown = ", ".join(str(i) for i in result.missing_ids[:60]) + (" …" if len(result.missing_ids) > 60 else "")
        report.paragraph(
            report.translate(
                "PlotwiseReport", "Non-response: {n} unit(s) were not surveyed (no count) and were left out: {ids}."
            ).format(n=len(result.missing_ids), ids=shown)
        )
    if result.unused_reserves:
        report.paragraph(
            report.translate("PlotwiseReport", "{n} unused reserve unit(s) without a count were skipped.").format(
                n=result.unused_reserves
            )
        )


def _intervals_table(report, result, level):
    ci_names, _ = _method_names(report)
    report.subsection(report.translate("PlotwiseReport", "The overall interval by method"))
    report.table(
        [
            report.translate("PlotwiseReport", "Interval"),
            report.translate("PlotwiseReport", "Lower limit"),
            report.translate("PlotwiseReport", "Upper limit"),
            report.translate("PlotwiseReport", "Used in the outputs"),
        ],
        [
            [
                ci_names[m],
                lo,
                hi,
                report.translate("PlotwiseReport", "yes")
                if m == result.ci_method
                else report.translate("PlotwiseReport", "no"),
            ]
            for m, lo, hi in result.overall_intervals
        ],
    )
    report.paragraph(
        report.translate(
            "PlotwiseReport",
            "The t interval is symmetric about the estimate; the log-normal interval is skewed to the right like "
            "the sampling distribution of a count-based estimate, and suits small samples of clumped animals "
            "better. Choose the method before looking at the results."
        )
    )
    totals = result.bootstrap_totals
    if totals is not None and np.all(np.isfinite(totals)):
        edges = np.histogram_bin_edges(totals, bins=40)
        frequencies, _ = np.histogram(totals, bins=edges)
        report.figure(
            histogram_svg(
                edges,
                frequencies,
                marks=(result.overall.abund_lo, result.overall.abund_hi),
                x_label=report.translate("PlotwiseReport", "overall abundance in a resample"),
                y_label=report.translate("PlotwiseReport", "resamples"),
                mark_label=report.translate("PlotwiseReport", "{level} percentile limits").format(level=level),
            ),
            report.translate("PlotwiseReport", "The {n:,} bootstrap resamples of the overall abundance").format(
                n=result.n_bootstrap
            ),
        )


def _figures(report, result, inputs):
    level = f"{result.confidence:.0%}"
    dens_label, _ = _labels(report, result, inputs.area_unit)
    rows = list(result.strata)
    reference, reference_label = None, ""
    if inputs.true_total and not result.presence:
        reference = inputs.true_total / result.overall.area
        reference_label = report.translate("PlotwiseReport", "true density (simulation)")
    chart = interval_chart_svg(
        [r.stratum for r in rows] + [report.translate("PlotwiseReport", "all strata")],
        [_number(r.dens) for r in rows + [result.overall]],
        [_number(r.dens_lo) for r in rows + [result.overall]],
        [_number(r.dens_hi) for r in rows + [result.overall]],
        value_label=dens_label,
        reference=reference,
        reference_label=reference_label,
    )
    report.figure(
        chart,
        report.translate("PlotwiseReport", "{what} by stratum with {level} confidence intervals").format(
            what=dens_label.capitalize(), level=level
        ),
    )
    shown = {r.stratum: _number(r.dens) for r in rows}
    finite = [v for v in shown.values() if v is not None]
    lo, hi = (min(finite), max(finite)) if finite else (0.0, 1.0)
    order = sorted(inputs.frame_geometries, key=natural_key)

    def colour(value):
        return sequential_colour(value, lo, hi, inputs.ramp, inputs.missing_colour)

    layers = [
        MapLayer(
            tuple(inputs.frame_geometries[k] for k in order),
            fills=tuple(colour(shown.get(k)) for k in order),
            stroke=INK,
            stroke_width=0.8,
            legend=(
                (report.translate("PlotwiseReport", "lowest") + f": {lo:.3g}", colour(lo)),
                (report.translate("PlotwiseReport", "highest") + f": {hi:.3g}", colour(hi)),
            ),
        )
    ]
    layers.append(
        MapLayer(
            tuple(inputs.surveyed_points),
            label=report.translate("PlotwiseReport", "surveyed units"),
            fill=UNIT_COLOUR,
            stroke=INK,
            point_radius=3.0,
        )
    )
    if inputs.missing_points:
        layers.append(
            MapLayer(
                tuple(inputs.missing_points),
                label=report.translate("PlotwiseReport", "not surveyed"),
                fill="#ffffff",
                stroke=MUTED,
                point_radius=3.0,
            )
        )
    report.figure(
        map_svg(layers, title=dens_label),
        report.translate("PlotwiseReport", "Strata shaded by {what}, with the units").format(what=dens_label),
    )


def _method(report, result):
    report.section(report.translate("PlotwiseReport", "Method"))
    if result.presence:
        report.paragraph(
            report.translate(
                "PlotwiseReport",
                "Each stratum's value is the proportion of its surveyed units where the species was detected; "
                "the frame's value weights the strata by the number of units they hold (area / unit area). "
                "This is naive occupancy: it is not corrected for detection, so it understates true occupancy "
                "whenever the species can be present and missed. Detection-corrected occupancy needs repeat "
                "visits to the same units (occupancy models)."
            )
        )
    else:
        report.paragraph(
            report.translate(
                "PlotwiseReport",
                "Density in each stratum is the total count divided by the total surveyed area, D_h = Σy/Σa "
                "(the ratio estimator, Cochran 1977, ch. 6), with the linearised variance "
                "v(D_h) = (1 − f_h)/(n_h ā_h²) · Σ(y − D_h a)²/(n_h − 1), where f_h = Σa/A_h when the "
                "finite-population correction applies and 0 otherwise. Abundance is N_h = D_h A_h; the "
                "frame's abundance is the sum over strata, its variance the sum of the strata variances, and "
                "its density N / Σ A_h (Cochran 1977, ch. 5)."
            )
        )
    if result.edge == "plus":
        report.paragraph(
            report.translate(
                "PlotwiseReport",
                "Edges: the units were laid out by plus sampling (Gregoire & Valentine 2008, ch. 10): their centres "
                "were drawn over each stratum grown by the unit's reach, and each unit counts only the animals inside "
                "its own stratum. Every animal then has the same chance of being counted, and the counts expand to "
                "the grown area A⁺_h: N_h = A⁺_h Σy/Σa (column of the expansion areas in the output)."
            )
        )
    elif result.edge == "inside":
        report.paragraph(
            report.translate(
                "PlotwiseReport",
                "Edges: the units were kept wholly inside their strata, so no unit reaches the band within a unit's "
                "reach of the edge; the estimate carries the inner density over that band. Where the animals near "
                "the edge differ (a shore, a forest edge), it is biased; plus sampling (INSIDE off) is not."
            )
        )
    _interval_method(report, result)
    _variance_method(report, result)
    _fpc_method(report, result)
    if result.detection_p < 1 or result.detection_se > 0:
        df_text = "∞" if not np.isfinite(result.detection_df) else f"{result.detection_df:g}"
        report.paragraph(
            report.translate(
                "PlotwiseReport",
                "Detection: estimates are divided by p = {p:g}, and the squared CVs of the count estimate and of p "
                "(SE {se:g}, CV {cv:.3f}) add (delta method, Seber 1982). The degrees of freedom of the two parts "
                "combine by Satterthwaite's rule, df = CV⁴ / (CV_n⁴/df_n + CV_p⁴/df_p) (Buckland et al. 2001, "
                "eq. 3.75), with df_p = {df} for p."
            ).format(
                p=result.detection_p, se=result.detection_se, cv=result.detection_se / result.detection_p, df=df_text
            )
        )
    if result.target_cv:
        report.paragraph(
            report.translate(
                "PlotwiseReport",
                "Next survey: n_next is the number of units each stratum needs for a CV of {cv:g} of the overall "
                "abundance, by Neyman allocation n_h ∝ M_h S_h on the standard deviations the variance estimator "
                "implies now (Neyman 1934; Cochran 1977, eq. 5.26), at least 2 and at most the units a stratum "
                "holds. The observed SDs are themselves uncertain, especially from few units."
            ).format(cv=result.target_cv)
        )


def _interval_method(report, result):
    report.paragraph(
        {
            "t": report.translate(
                "PlotwiseReport",
                "Intervals use Student's t with Satterthwaite's effective degrees of freedom, "
                "ν = (Σ v_h)² / Σ (v_h² / ν_h) (Satterthwaite 1946; Cochran 1977, ch. 5). Lower limits "
                "below 0 are shown as 0."
            ),
            "lognormal": report.translate(
                "PlotwiseReport",
                "Intervals are log-normal: N/C to N·C with C = exp(t_df · √ln(1 + CV²)), t with the "
                "estimate's Satterthwaite degrees of freedom (Buckland et al. 2001, §3.6.1; the normal "
                "quantile only for infinite df, Burnham et al. 1987). They are asymmetric and never go "
                "below 0."
            ),
            "bootstrap": report.translate(
                "PlotwiseReport",
                "Intervals are rescaled stratified percentile bootstrap intervals, from {b:,} resamples "
                "drawn from the recorded seed: in each stratum n − 1 units are drawn with replacement "
                "and their density is moved towards the stratum's estimate by the factor √(1 − f), so "
                "that the resamples vary as much as the stratified variance says, with the "
                "finite-population correction where it applies (Rao & Wu 1988; Efron & "
                "Tibshirani 1993)."
            ).format(b=result.n_bootstrap),
        }[result.ci_method]
    )


def _variance_method(report, result):
    if result.variance_method in ("local", "local_scaled"):
        report.paragraph(
            report.translate(
                "PlotwiseReport",
                "Variances use the local neighbourhood estimator of Stevens & Olsen (2003): each unit and its "
                "three nearest units in the stratum form a neighbourhood with weights that sum to 1 over each "
                "neighbourhood and over each unit, and v = Σ_i Σ_j w_ij (z_j − z̄_i)². Its degrees of freedom are "
                "those of a quadratic form, (tr Q)² / tr Q² (Box 1954), and the bootstrap spreads its resamples to "
                "the same variance. For a simple random layout use the simple formula."
            )
        )
        if result.variance_method == "local_scaled":
            report.paragraph(
                report.translate(
                    "PlotwiseReport",
                    "Our variant: the double sum is multiplied by n / Σ_i (1 − Σ_j w_ij²), so that it agrees on "
                    "average with the simple formula where the population has no spatial pattern; the published sum "
                    "falls about a quarter short there. This scaling is ours, not Stevens & Olsen's."
                )
            )
    if any(r.collapsed_with for r in result.strata):
        report.paragraph(
            report.translate(
                "PlotwiseReport",
                "Strata with one surveyed unit were paired with a partner fixed before the counts were seen (the "
                "stratum sharing the longest edge on the map, or else the next stratum in id order). Two one-unit "
                "strata share the pairs formula v = 4 (A_2 Ŷ_1 − A_1 Ŷ_2)² / (A_1 + A_2)² (Cochran 1977, §5A.12, "
                "with the weights of Hansen, Hurwitz & Madow 1953); a one-unit stratum paired with a stratum of "
                "several units takes (D̂_1 − D̂_2)² − v(D̂_2), at least the variance one unit has with the partner's "
                "spread, while the partner keeps its own variance. Differences between the paired strata count as "
                "variance, so these standard errors tend to be too large; each such stratum has 1 degree of "
                "freedom."
            )
        )


def _fpc_method(report, result):
    if result.fpc_refused:
        report.paragraph(
            report.translate(
                "PlotwiseReport",
                "The finite-population correction was refused in strata {ids}: their units come from a simple random "
                "layout whose units may overlap, a continuous population of possible units, which has no such "
                "correction (Cordy 1993)."
            ).format(ids=", ".join(result.fpc_refused))
        )
    if result.fpc_assumed:
        report.note(
            report.translate(
                "PlotwiseReport",
                "The finite-population correction assumes that the units do not overlap and were drawn without "
                "replacement from the units that tile each stratum. The units carry no design record (they did not "
                "come from plotwise:layout), so this could not be checked: if they may overlap, switch the "
                "correction off."
            )
        )


def _cautions(report, result):
    report.section(report.translate("PlotwiseReport", "Cautions"))
    report.note(
        report.translate(
            "PlotwiseReport",
            "The inference covers the sampling frame only: the strata polygons given here. It says nothing "
            "about land outside them (excluded areas, inaccessible ground, neighbouring land)."
        )
    )
    if result.presence:
        report.note(
            report.translate(
                "PlotwiseReport",
                "Presence data: a non-detection is not an absence. Naive occupancy needs repeat visits "
                "before it can be corrected for detection."
            )
        )
    elif result.detection_p < 1:
        report.note(
            report.translate(
                "PlotwiseReport",
                "Detection: p must come from a separate study (double observers, marked animals, distance "
                "sampling) of the same species, season, habitat and observers. If the detection in this survey "
                "differs, the estimate is biased by the same factor, and no interval here shows it."
            )
        )
    else:
        report.note(
            report.translate(
                "PlotwiseReport",
                "Detection: with p = 1 the estimate assumes every animal in a surveyed unit was counted. Animals "
                "missed make it too low, and the interval does not show that bias."
            )
        )
    report.note(
        report.translate(
            "PlotwiseReport",
            "The design the units came from: the formulas assume the units were placed at random within each "
            "stratum with equal chances (simple random, systematic grid or spatially balanced layout), that "
            "unsurveyed units are missing by chance, and that reserve units replaced primaries in draw order. "
            "Units chosen for convenience (near roads or camps) or skipped because of what was expected there "
            "bias the estimate in ways no standard error shows."
        )
    )
