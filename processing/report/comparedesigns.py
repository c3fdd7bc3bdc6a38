"""The report of plotwise:comparedesigns, built from the comparison's named fields (never imports the host)."""

import numpy as np

from ..engine import design_comparison as engine
from ..engine.unit_shapes import LINE
from . import svg

REFERENCES = (
    "Cochran, W. G. (1977). Sampling Techniques, 3rd ed. Wiley (ch. 5 stratified random sampling, "
    "ch. 6 ratio estimators, ch. 8 systematic sampling).",
    "Neyman, J. (1934). On the two different aspects of the representative method. Journal of the Royal "
    "Statistical Society 97, 558-625.",
    "Robertson, B. L., Brown, J. A., McDonald, T. & Jaksons, P. (2013). BAS: Balanced acceptance sampling "
    "of natural resources. Biometrics 69, 776-784.",
    "Satterthwaite, F. E. (1946). An approximate distribution of estimates of variance components. "
    "Biometrics Bulletin 2, 110-114.",
    "Johnson, N. L., Kemp, A. W. & Kotz, S. (2005). Univariate Discrete Distributions, 3rd ed. Wiley "
    "(Poisson sums; the negative binomial as a gamma-Poisson mixture).",
    "Morris, T. P., White, I. R. & Crowther, M. J. (2019). Using simulation studies to evaluate statistical "
    "methods. Statistics in Medicine 38, 2074-2102.",
    "Gregoire, T. G. & Valentine, H. T. (2008). Sampling Strategies for Natural Resources and the Environment. "
    "Chapman & Hall/CRC, ch. 10 (plus sampling at the edges).",
)
LOCAL_REFERENCE = (
    "Stevens, D. L. & Olsen, A. R. (2003). Variance estimation for spatially balanced samples of "
    "environmental resources. Environmetrics 14, 593-610."
)


def _design_name(report, design):
    return report.translate("PlotwiseEngine", engine.DESIGNS[design])


def _pct(value, digits=1):
    if value is None or not np.isfinite(value):
        return None
    return f"{value:.{digits}%}"


def comparedesigns_report(report, comparison, curve, setup, settings, warnings):
    """Fill ``report`` from the :class:`engine.design_comparison.Comparison` (named fields); returns it."""
    report.title = report.translate("PlotwiseReport", "Survey designs compared by simulation")
    best = comparison.by_design(comparison.recommended) if comparison.recommended is not None else None
    _key_figures(report, best, setup.grid)
    _parameters(report, setup, settings)
    report.warnings(warnings)
    _performance(report, comparison, settings)
    _recommendation(report, comparison, best)
    if setup.strata is not None:
        _strata_section(report, comparison, setup)
    if curve:
        _curve_section(report, comparison, curve)
    _simulation_method(report, comparison, settings)
    report.references(REFERENCES)
    if settings["variance_method"] == "local":
        report.references([LOCAL_REFERENCE])
    report.field_safety()
    return report


def _key_figures(report, best, grid):
    figures = []
    if best is not None:
        figures += [
            (report.translate("PlotwiseReport", "recommended design"), _design_name(report, best.design)),
            (report.translate("PlotwiseReport", "its RMSE (animals)"), f"{best.rmse:,.1f}"),
            (report.translate("PlotwiseReport", "its RMSE relative to the total"), f"{best.rel_rmse:.1%}"),
            (report.translate("PlotwiseReport", "its 95 % interval coverage"), f"{best.coverage:.0%}"),
        ]
    figures.append((report.translate("PlotwiseReport", "expected animals in the frame"), f"{grid.expected_total:,.0f}"))
    report.key_figures(figures)


def _parameters(report, setup, settings):
    grid = setup.grid
    shapes = [
        report.translate("PlotwiseReport", "point station"),
        report.translate("PlotwiseReport", "square plot"),
        report.translate("PlotwiseReport", "circular plot"),
        report.translate("PlotwiseReport", "line transect"),
    ]
    size_labels = [
        report.translate("PlotwiseReport", "counting radius"),
        report.translate("PlotwiseReport", "side"),
        report.translate("PlotwiseReport", "radius"),
        report.translate("PlotwiseReport", "length"),
    ]
    shape = settings["shape"]
    unit_text = f"{shapes[shape]}, {size_labels[shape]} {settings['size']:g} m"
    if shape == LINE:
        unit_text += report.translate("PlotwiseReport", ", strip half-width {w:g} m").format(w=settings["half_width"])
    params = {
        report.translate("PlotwiseReport", "Density surface"): settings["surface"],
        report.translate("PlotwiseReport", "Sampling frame"): settings["frame"],
        report.translate("PlotwiseReport", "Strata"): settings["strata"] or report.translate("PlotwiseReport", "none"),
        report.translate("PlotwiseReport", "Stratum field"): settings["stratum_field"]
        or ("–" if not settings["strata"] else report.translate("PlotwiseReport", "feature id")),
        report.translate("PlotwiseReport", "Computation CRS"): settings["crs"],
        report.translate("PlotwiseReport", "Surface cell"): f"{grid.cell_width:g} × {grid.cell_height:g} m",
        report.translate("PlotwiseReport", "Sub-cells per cell side (for counting)"): setup.factor,
        report.translate("PlotwiseReport", "Unit"): unit_text,
        report.translate("PlotwiseReport", "Counted area per unit (m²)"): round(setup.region.area, 1),
        report.translate("PlotwiseReport", "Bearing"): report.translate("PlotwiseReport", "random")
        if settings["bearing"] < 0
        else f"{settings['bearing']:g}°",
        report.translate("PlotwiseReport", "Units wholly inside their stratum"): report.translate(
            "PlotwiseReport", "yes"
        )
        if settings["inside"]
        else report.translate("PlotwiseReport", "no"),
        report.translate("PlotwiseReport", "Number of units"): settings["n_units"],
        report.translate("PlotwiseReport", "Simulated surveys per design"): settings["replicates"],
        report.translate("PlotwiseReport", "Counts per cell"): (
            report.translate("PlotwiseReport", "negative binomial, k = {k:g}").format(k=settings["k"])
            if settings["k"] > 0
            else report.translate("PlotwiseReport", "Poisson")
        ),
        report.translate("PlotwiseReport", "Variance estimator (grid, balanced)"): (
            report.translate("PlotwiseReport", "local neighbourhood")
            if settings["variance_method"] == "local"
            else report.translate("PlotwiseReport", "simple random sampling formula")
        ),
        report.translate("PlotwiseReport", "Confidence level"): "95 %",
        report.translate("PlotwiseReport", "Seed"): settings["seed"],
    }
    report.parameters(params)


def _performance(report, comparison, settings):
    """Bias, SE, RMSE and coverage of each design at the chosen n, with their Monte Carlo error."""
    report.section(report.translate("PlotwiseReport", "How the designs did at {n} units").format(n=comparison.n_units))
    header = [
        report.translate("PlotwiseReport", "Design"),
        report.translate("PlotwiseReport", "Mean units surveyed"),
        report.translate("PlotwiseReport", "Relative bias"),
        report.translate("PlotwiseReport", "Empirical SE (animals)"),
        report.translate("PlotwiseReport", "RMSE (animals)"),
        report.translate("PlotwiseReport", "± Monte Carlo SE"),
        report.translate("PlotwiseReport", "RMSE / total"),
        report.translate("PlotwiseReport", "Mean estimated CV"),
        report.translate("PlotwiseReport", "95 % interval coverage"),
        report.translate("PlotwiseReport", "Surveys without an estimate"),
    ]
    rows = []
    for p in comparison.performance:
        name = _design_name(report, p.design) + (" ★" if p.design == comparison.recommended else "")
        rows.append(
            [
                name,
                p.mean_n,
                _pct(p.rel_bias),
                p.emp_se,
                p.rmse,
                p.rmse_mc_se,
                _pct(p.rel_rmse),
                p.mean_cv,
                _pct(p.coverage, 0),
                p.failed,
            ]
        )
    report.table(header, rows)
    tested = [p for p in comparison.performance if np.isfinite(engine.bias_standard_error(p))]
    noises = [engine.bias_noise(p, len(tested)) for p in tested]  # the threshold of the bias warning
    noises = [v for v in noises if np.isfinite(v)]
    if noises:
        noise = max(noises)
        report.paragraph(
            report.translate(
                "PlotwiseReport",
                "Each figure is itself an estimate from {reps} simulated surveys: relative biases within about "
                "±{noise:.1%} cannot be told from zero, and RMSEs closer than two Monte Carlo SEs are a tie. "
                "More surveys per design narrow both."
            ).format(reps=settings["replicates"], noise=noise)
        )
    names = [_design_name(report, p.design) for p in comparison.performance]
    highlight = next((i for i, p in enumerate(comparison.performance) if p.design == comparison.recommended), None)
    report.figure(
        svg.bar_chart_svg(
            names,
            [p.rmse for p in comparison.performance],
            report.translate("PlotwiseReport", "RMSE of the abundance (animals)"),
            highlight=highlight,
        ),
        report.translate(
            "PlotwiseReport", "Root mean square error of the abundance estimate, by design (lower is better)"
        ),
    )

def _recommendation(report, comparison, best):
    report.section(report.translate("PlotwiseReport", "Recommendation"))
    if best is None:
        report.paragraph(report.translate("PlotwiseReport", "No design gave estimates: see the warnings."))
    else:
        text = report.translate(
            "PlotwiseReport",
            "{name} gave the lowest root mean square error ({rmse:,.1f} animals, {rel:.1%} of the mean true "
            "total of {total:,.0f}) among the designs whose 95 % intervals held the truth at least 90 % of the "
            "time."
        ).format(name=_design_name(report, best.design), rmse=best.rmse, rel=best.rel_rmse, total=best.mean_true)
        if comparison.near_best:
            text += " " + report.translate(
                "PlotwiseReport",
                "{others} did about as well: the differences lie within the Monte Carlo error of the simulation. "
                "Among these, choose the one that is easiest to carry out in the field."
            ).format(others=", ".join(_design_name(report, d) for d in comparison.near_best))
        report.paragraph(text)
        poor = [
            _design_name(report, p.design)
            for p in comparison.performance
            if np.isfinite(p.coverage) and p.coverage < engine.ACCEPTABLE_COVERAGE
        ]
        if poor:
            report.paragraph(
                report.translate(
                    "PlotwiseReport",
                    "The intervals of {names} held the truth less than 90 % of the time: their stated precision would "
                    "mislead."
                ).format(names=", ".join(poor))
            )
        if best.design == engine.SYSTEMATIC_GRID or any(
            p.design == engine.SYSTEMATIC_GRID for p in comparison.performance
        ):
            report.note(
                report.translate(
                    "PlotwiseReport",
                    "The systematic grid's number of units varies from survey to survey (mean shown). With the simple "
                    "random sampling formula its interval is usually conservative on smooth surfaces."
                )
            )


def _simulation_method(report, comparison, settings):
    """How the populations and the surveys were simulated, and what the comparison assumes."""
    report.section(report.translate("PlotwiseReport", "How the simulation works"))
    report.paragraph(
        report.translate(
            "PlotwiseReport",
            "Each simulated survey draws a population on the surface: Poisson counts in every surface cell, or "
            "negative binomial counts (gamma-Poisson) when k is above 0. All designs survey the same populations. "
            "Every design is laid out with the layout engine and follows the real chain's edge protocol: by "
            "default plus sampling, with centres over each stratum (or the frame) grown by the unit's reach (and half "
            "a surface cell), each unit counting the animals of the cells of its own stratum whose centres it covers, "
            "with its nominal area, and the estimation engine expanding the counts to the grown area (Gregoire & "
            "Valentine 2008, ch. 10); the abundance is the ratio estimator with its t interval (Satterthwaite degrees "
            "of freedom). Each estimate is judged against the true total of its own population."
        )
    )
    if any(p.design == engine.STRATIFIED_NEYMAN for p in comparison.performance):
        report.paragraph(
            report.translate(
                "PlotwiseReport",
                "The stratified Neyman design with the true S_h is the best case: it allocates with the standard "
                "deviations the surface implies, which no survey knows. The pilot-based Neyman design estimates S_h "
                "in every simulated survey from a pilot of {pilot} simple random units per stratum (an independent "
                "realisation: a pilot season), as a survey would; its pilot units are not counted in its n."
            ).format(pilot=settings.get("pilot_units", engine.DEFAULT_PILOT_UNITS))
        )
    report.note(
        report.translate(
            "PlotwiseReport",
            "Assumptions: the surface is the truth, every animal in a unit is counted (no detection error), animals "
            "do not move during the survey, and every unit can be reached. Real surveys meet none of these exactly; "
            "use the comparison to rank designs and to size the effort, not as a promise of precision."
        )
    )


def _strata_section(report, comparison, setup):
    report.section(report.translate("PlotwiseReport", "Strata"))
    grid = setup.grid
    allocations = {plan.design: plan.allocation for plan in comparison.plans}
    header = [
        report.translate("PlotwiseReport", "Stratum"),
        report.translate("PlotwiseReport", "Area (km²)"),
        report.translate("PlotwiseReport", "Mean expected count per unit"),
        report.translate("PlotwiseReport", "S_h (count SD per unit)"),
    ]
    if engine.STRATIFIED_PROPORTIONAL in allocations:
        header.append(report.translate("PlotwiseReport", "Units, proportional"))
    if engine.STRATIFIED_NEYMAN in allocations:
        header.append(report.translate("PlotwiseReport", "Units, Neyman (best case)"))
    if engine.STRATIFIED_NEYMAN_PILOT in allocations:
        header.append(report.translate("PlotwiseReport", "Units, Neyman from a pilot (mean)"))
    rows = []
    for i, st in enumerate(setup.strata.strata):
        row = [
            str(st.key),
            float(grid.stratum_areas_km2[setup.stratum_codes[i]]),
            float(setup.stratum_mean[i]),
            float(setup.stratum_sd[i]),
        ]
        for design in (engine.STRATIFIED_PROPORTIONAL, engine.STRATIFIED_NEYMAN, engine.STRATIFIED_NEYMAN_PILOT):
            if design in allocations:
                row.append(int(allocations[design][i]))
        rows.append(row)
    report.table(header, rows)
    report.paragraph(
        report.translate(
            "PlotwiseReport",
            "S_h is the standard deviation of one unit's count in the stratum implied by the surface: the spread of "
            "the expected counts over {draws} random unit positions plus the Poisson (and negative binomial) "
            "variation about them. Neyman allocation gives each stratum units in proportion to A_h·S_h (Neyman "
            "1934; Cochran 1977, §5.5), with at least 2 per stratum."
        ).format(draws=engine.SD_DRAWS)
    )


def _curve_section(report, comparison, curve):
    report.section(report.translate("PlotwiseReport", "RMSE against the number of units"))
    points = sorted([comparison] + [c for c in curve if c.n_units != comparison.n_units], key=lambda c: c.n_units)
    ns = [c.n_units for c in points]
    series = []
    for p in comparison.performance:
        series.append((_design_name(report, p.design), [c.by_design(p.design).rmse for c in points]))
    report.figure(
        svg.line_chart_svg(
            ns,
            series,
            report.translate("PlotwiseReport", "number of units"),
            report.translate("PlotwiseReport", "RMSE (animals)"),
        ),
        report.translate("PlotwiseReport", "RMSE of the abundance estimate against the number of units"),
    )
    header = [report.translate("PlotwiseReport", "Units")] + [
        _design_name(report, p.design) for p in comparison.performance
    ]
    rows = [[c.n_units] + [c.by_design(p.design).rmse for p in comparison.performance] for c in points]
    report.table(header, rows, caption=report.translate("PlotwiseReport", "RMSE (animals)"))
    best = comparison.recommended if comparison.recommended is not None else comparison.performance[0].design
    values = [c.by_design(best).rmse for c in points]
    if len(points) >= 2 and all(np.isfinite(values)):
        gains = []
        for (a, va), (b, vb) in zip(zip(ns, values), zip(ns[1:], values[1:])):
            change = vb / va - 1 if va > 0 else 0
            gains.append(
                report.translate("PlotwiseReport", "{a} → {b} units: RMSE {change:+.0%}").format(
                    a=a, b=b, change=change
                )
            )
        report.paragraph(
            report.translate("PlotwiseReport", "For {name}: ").format(name=_design_name(report, best))
            + "; ".join(gains)
            + "."
        )
    report.note(
        report.translate(
            "PlotwiseReport",
            "The RMSE of a design falls roughly as 1/√n: doubling the units lowers it by about 30 %. Where the curve "
            "flattens, more units buy little; spend the effort on better counts (detection) or a better surface "
            "instead."
        )
    )
