"""The report of plotwise:allocate, built from :class:`engine.allocation.Allocation` (never imports the host)."""

from dataclasses import dataclass

import numpy as np

from . import svg

KM2_PER_HA = 0.01
REFERENCES = (
    "Neyman, J. (1934). On the two different aspects of the representative method: the method of "
    "stratified sampling and the method of purposive selection. Journal of the Royal Statistical "
    "Society 97, 558-625.",
    "Cochran, W. G. (1977). Sampling Techniques, 3rd ed., chapter 5 (stratified random sampling). Wiley.",
    "Cordy, C. B. (1993). An extension of the Horvitz-Thompson theorem to point sampling from a continuous "
    "universe. Statistics & Probability Letters 18, 353-362 (no finite-population correction for units "
    "that may overlap).",
)


@dataclass(frozen=True)
class AllocateReportInputs:
    """Names and settings the allocation report shows (host-free)."""

    layer: str
    crs: str
    unit_area_m2: float
    sd_field: object
    sd_proxy: bool
    mean_field: object
    cost_field: object
    cost_in_days: bool
    settings: dict
    layout_design: str = ""


def method_names_of(report):
    """The allocation methods (engine keys) in the report's language."""
    return {
        "equal": report.translate("PlotwiseReport", "equal"),
        "proportional": report.translate("PlotwiseReport", "proportional to area"),
        "neyman": report.translate("PlotwiseReport", "Neyman"),
        "optimal_cost": report.translate("PlotwiseReport", "optimal with cost"),
    }


def allocate_report(report, result, labels, inputs, warnings):
    """Fill ``report`` with the allocation (named fields of :class:`engine.allocation.Allocation`); returns it."""
    report.title = report.translate("PlotwiseReport", "Allocation of survey effort")
    _key_figures(report, result, inputs)
    _parameters(report, result, inputs)
    report.warnings(warnings)
    _units_per_stratum(report, result, labels, inputs)
    report.figure(
        svg.bar_chart_svg(
            [str(label) for label in labels],
            [int(v) for v in result.n],
            report.translate("PlotwiseReport", "units per stratum"),
        ),
        report.translate("PlotwiseReport", "Units allocated to each stratum"),
    )
    _precision_and_cost(report, result, inputs)
    _methods_compared(report, result, labels, inputs)
    report.references(REFERENCES)
    report.field_safety()
    return report


def _cost_unit(report, inputs):
    if inputs.cost_in_days:
        return report.translate("PlotwiseReport", "field days")
    return report.translate("PlotwiseReport", "cost units")


def _se_label(report, inputs):
    if inputs.sd_proxy:
        return report.translate("PlotwiseReport", "SE of mean per unit (covariate units)")
    return report.translate("PlotwiseReport", "SE of mean count per unit")


def _key_figures(report, result, inputs):
    p = result.precision
    figures = [
        (report.translate("PlotwiseReport", "units in total"), f"{result.total:,}"),
        (report.translate("PlotwiseReport", "method"), method_names_of(report)[result.method_used]),
    ]
    if inputs.mean_field is not None and np.isfinite(p.cv):
        figures.append((report.translate("PlotwiseReport", "expected CV of the overall density"), f"{p.cv:.3f}"))
    if inputs.cost_field:
        figures.append(
            (
                report.translate("PlotwiseReport", "field days needed")
                if inputs.cost_in_days
                else report.translate("PlotwiseReport", "cost"),
                f"{result.cost:,.1f}",
            )
        )
    report.key_figures(figures)


def _parameters(report, result, inputs):
    settings, cost_field = inputs.settings, inputs.cost_field
    method_names = method_names_of(report)
    targets = {
        "total": report.translate("PlotwiseReport", "a total number of units"),
        "budget": report.translate("PlotwiseReport", "a budget"),
        "target_cv": report.translate("PlotwiseReport", "a target CV"),
    }
    sd_text = "–"
    if inputs.sd_field is not None:
        proxy = report.translate("PlotwiseReport", " (covariate proxy)") if inputs.sd_proxy else ""
        sd_text = inputs.sd_field + proxy
    yes, no = report.translate("PlotwiseReport", "yes"), report.translate("PlotwiseReport", "no")
    report.parameters(
        {
            report.translate("PlotwiseReport", "Strata layer"): inputs.layer,
            report.translate("PlotwiseReport", "Computation CRS"): inputs.crs,
            report.translate("PlotwiseReport", "Method asked for"): method_names[result.method],
            report.translate("PlotwiseReport", "Method applied"): method_names[result.method_used],
            report.translate("PlotwiseReport", "Target"): targets[result.target],
            report.translate("PlotwiseReport", "Total asked for"): settings["total"]
            if result.target == "total"
            else "–",
            report.translate("PlotwiseReport", "Budget"): settings["budget"] if result.target == "budget" else "–",
            report.translate("PlotwiseReport", "Target CV"): settings["target_cv"]
            if result.target == "target_cv"
            else "–",
            report.translate("PlotwiseReport", "Unit area (m²)"): inputs.unit_area_m2,
            report.translate("PlotwiseReport", "Minimum units per stratum"): settings["min_per_stratum"],
            report.translate("PlotwiseReport", "SD field"): sd_text,
            report.translate("PlotwiseReport", "Mean field"): inputs.mean_field or "–",
            report.translate("PlotwiseReport", "Cost field"): (
                f"{cost_field} ({_cost_unit(report, inputs)})" if cost_field else "–"),
            report.translate("PlotwiseReport", "Fixed cost c0"): settings["fixed_cost"] if cost_field else "–",
            report.translate("PlotwiseReport", "Layout to come"): inputs.layout_design or "–",
            report.translate("PlotwiseReport", "Finite-population correction"): yes if result.fpc else no,
        }
    )


def _units_per_stratum(report, result, labels, inputs):
    p = result.precision
    with_sd, with_mean, sd_proxy = inputs.sd_field is not None, inputs.mean_field is not None, inputs.sd_proxy
    report.section(report.translate("PlotwiseReport", "Units per stratum"))
    header = [
        report.translate("PlotwiseReport", "Stratum"),
        report.translate("PlotwiseReport", "Units that fit"),
        report.translate("PlotwiseReport", "Lower bound"),
        report.translate("PlotwiseReport", "Share before rounding"),
        report.translate("PlotwiseReport", "Units (n_alloc)"),
        report.translate("PlotwiseReport", "Sampling fraction"),
    ]
    if with_sd:
        header.append(_se_label(report, inputs))
        if not sd_proxy:
            header.append(report.translate("PlotwiseReport", "SE of density (per km²)"))
    if with_mean:
        header.append(report.translate("PlotwiseReport", "Expected CV (exp_cv)"))
    rows = []
    for h, label in enumerate(labels):
        row = [
            str(label),
            int(result.upper[h]),
            int(result.lower[h]),
            float(result.n_continuous[h]),
            int(result.n[h]),
            float(result.n[h] / result.capacity[h]),
        ]
        if with_sd:
            row.append(float(p.stratum_se_mean[h]))
            if not sd_proxy:
                row.append(float(p.stratum_se_density[h] / KM2_PER_HA))
        if with_mean:
            row.append(float(p.stratum_cv[h]))
        rows.append(row)
    overall = [
        report.translate("PlotwiseReport", "all strata"),
        int(result.upper.sum()),
        int(result.lower.sum()),
        float(result.n_continuous.sum()),
        int(result.total),
        float(result.total / result.capacity.sum()),
    ]
    if with_sd:
        overall.append(float(p.se_mean))
        if not sd_proxy:
            overall.append(float(p.se_density / KM2_PER_HA))  # density SE per km² (areas are in ha in the engine)
    if with_mean:
        overall.append(float(p.cv))
    rows.append(overall)
    report.table(header, rows)


def _precision_and_cost(report, result, inputs):
    """What the expected precision assumes (with or without the correction), and the cost of the design."""
    report.note(
        report.translate(
            "PlotwiseReport",
            "Expected precision uses the pilot figures as if they were the truth, with the finite-population "
            "correction 1 − n_h·a/A_h, since the layout named draws units that do not overlap (Cochran 1977, ch. 5). "
            "Real precision depends on the counts the survey finds."
        )
        if result.fpc
        else report.translate(
            "PlotwiseReport",
            "Expected precision uses the pilot figures as if they were the truth, without a finite-population "
            "correction: a simple random layout's units may overlap, so their possible positions are a continuous "
            "population (Cordy 1993). Real precision depends on the counts the survey finds."
        )
    )
    if inputs.cost_field:
        settings = inputs.settings
        report.paragraph(
            report.translate(
                "PlotwiseReport", "{what}: c0 + Σ c_h·n_h = {c0:g} + {var:,.1f} = {total:,.1f} {unit}."
            ).format(
                what=report.translate("PlotwiseReport", "Field days needed")
                if inputs.cost_in_days
                else report.translate("PlotwiseReport", "Cost of the design"),
                c0=settings["fixed_cost"],
                var=result.cost - settings["fixed_cost"],
                total=result.cost,
                unit=_cost_unit(report, inputs),
            )
        )


def _methods_compared(report, result, labels, inputs):
    with_sd, with_mean = inputs.sd_field is not None, inputs.mean_field is not None
    method_names = method_names_of(report)
    report.section(
        report.translate("PlotwiseReport", "What the choice of method buys, at {n} units").format(n=result.total)
    )
    header = [report.translate("PlotwiseReport", "Method")] + [
        report.translate("PlotwiseReport", "stratum {label}").format(label=label) for label in labels
    ]
    if with_sd:
        header += [_se_label(report, inputs),
                   report.translate("PlotwiseReport", "Variance relative to the applied allocation")]
    if with_mean:
        header.append(report.translate("PlotwiseReport", "Expected CV"))
    rows = []
    for row in result.comparison:
        cells = [method_names[row.method]] + [int(v) for v in row.n]
        if with_sd:
            cells += [float(row.precision.se_mean), float(row.relative_variance)]
        if with_mean:
            cells.append(float(row.precision.cv))
        rows.append(cells)
    report.table(header, rows)
    if not with_sd:
        report.paragraph(
            report.translate(
                "PlotwiseReport", "Without standard deviations the precision of the designs cannot be compared."
            )
        )
