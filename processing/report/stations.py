"""The report of plotwise:stations, built from the engine's results (host-free).

``translate(context, text)`` is the host's translator (``QCoreApplication.translate``); without it
the report stays in English. Every string is marked ``report.translate("PlotwiseReport", "…")``.
"""
from dataclasses import dataclass
import math

import numpy as np

from ..engine.errors import QT_TRANSLATE_NOOP
from .html import Report, format_number
from .style import INK
from .svg import MapLayer, map_svg, strata_layer

REFERENCES = (
    "Sollmann, R., Gardner, B. & Belant, J. L. (2012). How does spatial study design influence density estimates "
    "from spatial capture-recapture models? PLoS ONE 7, e34575.",
    "Sun, C. C., Fuller, A. K. & Royle, J. A. (2014). Trap configuration and spacing influences parameter estimates "
    "in spatial capture-recapture models. PLoS ONE 9, e88025.",
    "MacKenzie, D. I. & Royle, J. A. (2005). Designing occupancy studies: general advice and allocating survey "
    "effort. Journal of Applied Ecology 42, 1105-1114.",
    "Robertson, B. L., Brown, J. A., McDonald, T. & Jaksons, P. (2013). BAS: Balanced acceptance sampling of "
    "natural resources. Biometrics 69, 776-784.",
    "Cochran, W. G. (1977). Sampling Techniques, 3rd ed. Wiley (ch. 8, systematic sampling).",
    "Diggle, P. J. (2003). Statistical Analysis of Spatial Point Patterns, 2nd ed. Arnold (simple sequential "
    "inhibition).",
)
ARRAY_NAMES = (
    QT_TRANSLATE_NOOP("PlotwiseReport", "grid"),
    QT_TRANSLATE_NOOP("PlotwiseReport", "clusters"),
    QT_TRANSLATE_NOOP("PlotwiseReport", "balanced"),
)
RULE_NAMES = (
    QT_TRANSLATE_NOOP("PlotwiseReport", "independent occupancy sites (one home-range diameter apart)"),
    QT_TRANSLATE_NOOP("PlotwiseReport", "spatial capture-recapture (2σ apart)"),
)


@dataclass(frozen=True)
class StationsRun:
    """What the run was given (for the parameters table)."""

    layer: str
    stratum_field: str
    crs: str
    seed: int
    service_hours: float
    workday_hours: float


def stations_report(result, run, service=None, warnings=(), translate=None, language="en"):
    """The HTML report of a station layout.

    Parameters
    ----------
    result : engine.stations.StationLayout
        With its ``frame`` (for the map).
    run : StationsRun
    service : engine.stations.ServicePlan or None
    warnings : sequence of str (already translated)
    translate : callable ``(context, text) -> text``, optional
    """
    spec = result.spec
    report = Report("", algorithm_id="plotwise:stations", translate=translate, language=language)
    report.title = report.translate("PlotwiseReport", "Camera-trap and recorder stations")
    report.field_safety()
    report.warnings(warnings)
    primary = result.is_primary
    report.key_figures([
        (report.translate("PlotwiseReport", "primary stations"), format_number(int(primary.sum()))),
        (report.translate("PlotwiseReport", "reserve stations"), format_number(int((~primary).sum()))),
        (report.translate("PlotwiseReport", "spacing used (m)"), format_number(round(spec.spacing))),
        (report.translate("PlotwiseReport", "array"), report.translate("PlotwiseReport", ARRAY_NAMES[spec.array])),
    ])
    _spacing_section(report, spec)
    _extent_section(report, result)
    if service is not None:
        _service_section(report, service, spec)
    _strata_section(report, result)
    report.section(report.translate("PlotwiseReport", "Replacing stations in the field"))
    report.note(report.translate(
        "PlotwiseReport",
        "A primary station that cannot be set (no safe access, no permission, flooded, ...) is replaced by the next "
        "unused reserve station of its stratum, in draw order (draw_ord); for clusters, a whole cluster by the next "
        "reserve cluster. Record the primary as not set and why; never move a station to a more convenient place."))
    report.section(report.translate("PlotwiseReport", "Map"))
    report.figure(stations_map(result, report), report.translate(
        "PlotwiseReport", "Strata (filled), primary stations (dark) and reserve stations (light)"))
    report.section(report.translate("PlotwiseReport", "Method"))
    report.paragraph(_method_text(spec, report))
    report.parameters(_parameters(report, spec, run))
    report.references(REFERENCES)
    return report


def _parameters(report, spec, run):
    not_given = report.translate("PlotwiseReport", "(not given)")
    return {
        report.translate("PlotwiseReport", "Frame (FRAME)"): run.layer,
        report.translate("PlotwiseReport", "Stratum field (STRATUM_FIELD)"):
            run.stratum_field or report.translate("PlotwiseReport", "(none: one stratum)"),
        report.translate("PlotwiseReport", "Stations (N_STATIONS)"):
            spec.n_stations if spec.n_stations else report.translate("PlotwiseReport", "0: every grid point"),
        report.translate("PlotwiseReport", "Array (ARRAY)"):
            report.translate("PlotwiseReport", ARRAY_NAMES[spec.array]),
        report.translate("PlotwiseReport", "Home range (HOME_RANGE, km²)"):
            spec.home_range if spec.home_range > 0 else not_given,
        report.translate("PlotwiseReport", "Spacing (SPACING, m)"):
            report.translate("PlotwiseReport", "from the home range") if spec.from_home_range else spec.spacing,
        report.translate("PlotwiseReport", "Spacing rule (SPACING_RULE)"):
            report.translate("PlotwiseReport", RULE_NAMES[spec.rule]),
        report.translate("PlotwiseReport", "Stations per cluster (CLUSTER_SIZE)"):
            spec.cluster_size if spec.array == 1 else report.translate("PlotwiseReport", "(not used)"),
        report.translate("PlotwiseReport", "Minimum spacing (MIN_SPACING, m)"): spec.min_spacing,
        report.translate("PlotwiseReport", "Reserves per stratum (RESERVE)"): spec.reserve,
        report.translate("PlotwiseReport", "Service time per station (SERVICE_HOURS, hours)"):
            run.service_hours if run.service_hours > 0 else not_given,
        report.translate("PlotwiseReport", "Working day (WORKDAY_HOURS, hours)"): run.workday_hours,
        report.translate("PlotwiseReport", "Seed (SEED)"): run.seed,
        report.translate("PlotwiseReport", "CRS of the computation and the output"): run.crs,
    }


def _spacing_section(report, spec):
    report.section(report.translate("PlotwiseReport", "Spacing"))
    diameter = 2.0 * math.sqrt(spec.home_range * 1e6 / math.pi) if spec.home_range > 0 else math.nan
    if spec.home_range > 0:
        report.paragraph(report.translate(
            "PlotwiseReport",
            "Home range {hr} km², taken as the 95% range of a circular bivariate normal distribution of the animal's "
            "positions: σ = √(HR/π) / 2.448 = {sigma} m (2.448 = √(−2 ln 0.05)); home-range diameter {diameter} m."
        ).format(hr=format_number(spec.home_range), sigma=format_number(round(spec.sigma)),
                 diameter=format_number(round(diameter))))
    if spec.from_home_range and spec.rule == 1:
        text = report.translate(
            "PlotwiseReport",
            "Rule used: spatial capture-recapture, stations about 2σ = {s} m apart, so that an animal meets several "
            "stations (Sollmann et al. 2012; Sun et al. 2014).")
    elif spec.from_home_range:
        text = report.translate(
            "PlotwiseReport",
            "Rule used: independent occupancy sites, stations at least one home-range diameter = {s} m apart, so "
            "that one animal rarely uses two sites (common practice).")
    else:
        text = report.translate("PlotwiseReport", "Spacing given by the user: {s} m (no rule applied).")
    report.paragraph(text.format(s=format_number(round(spec.spacing))))
    if not spec.from_home_range and spec.home_range > 0:
        report.paragraph(report.translate(
            "PlotwiseReport",
            "For comparison: 2σ = {scr} m (spatial capture-recapture); one home-range diameter = {occ} m "
            "(independent occupancy sites).").format(scr=format_number(round(2 * spec.sigma)),
                                                     occ=format_number(round(diameter))))


def _extent_section(report, result):
    e, spec = result.extent, result.spec
    report.section(report.translate("PlotwiseReport", "Array extent"))
    text = report.translate(
        "PlotwiseReport",
        "The primary stations span {span} km (largest distance between two of them); their convex hull covers "
        "{area} km².").format(span=format_number(e.span / 1e3), area=format_number(e.hull_area / 1e6))
    if spec.home_range > 0:
        text += " " + report.translate(
            "PlotwiseReport", "That is {n} home ranges of {hr} km², and {d} home-range diameters across.").format(
            n=format_number(e.home_ranges), hr=format_number(spec.home_range), d=format_number(e.diameters))
    report.paragraph(text)
    if spec.home_range > 0 and e.home_ranges < 3.0:
        report.note(report.translate(
            "PlotwiseReport",
            "An array smaller than a few home ranges cannot estimate density by spatial capture-recapture: too few "
            "animals have their range inside it, and movement cannot be separated from density. Spread the "
            "stations wider or add stations."))


def _service_section(report, service, spec):
    report.section(report.translate("PlotwiseReport", "Field effort"))
    text = report.translate(
        "PlotwiseReport",
        "With {h} hours per station visit (travel included) and a working day of {day} hours, one team services "
        "{n} stations per team-day; one round of every primary station takes {days} team-days.").format(
        h=format_number(service.service_hours), day=format_number(service.workday_hours),
        n=format_number(service.per_team_day), days=format_number(service.team_days))
    if spec.array == 1 and np.isfinite(service.cluster_hours):
        if service.cluster_hours <= service.workday_hours:
            more = report.translate("PlotwiseReport", "A cluster of {k} stations takes {c} hours: one team can "
                                                      "service a cluster in a day.")
        else:
            more = report.translate("PlotwiseReport", "A cluster of {k} stations takes {c} hours: more than one "
                                                      "team-day; use smaller clusters or two teams.")
        text += " " + more.format(k=spec.cluster_size, c=format_number(service.cluster_hours))
    report.paragraph(text)


def _strata_section(report, result):
    report.section(report.translate("PlotwiseReport", "Stations per stratum"))
    grid = result.spec.array == 0
    rows = [[report.translate("PlotwiseReport", "frame") if s.key is None else str(s.key), s.area / 1e4,
             None if grid else s.n_requested, s.n_primary, s.n_reserve,
             s.n_clusters if result.spec.array == 1 else None] for s in result.strata]
    report.table([
        report.translate("PlotwiseReport", "Stratum"), report.translate("PlotwiseReport", "Area (ha)"),
        report.translate("PlotwiseReport", "Stations asked"), report.translate("PlotwiseReport", "Primary"),
        report.translate("PlotwiseReport", "Reserve"), report.translate("PlotwiseReport", "Clusters"),
    ], rows)


def _method_text(spec, report):
    if spec.array == 0:
        text = report.translate(
            "PlotwiseReport",
            "Grid: one square lattice over the frame, aligned with grid north, with a uniform random start. With "
            "N_STATIONS = 0 every lattice point in the frame is a station (reserves: the lattice's cell centres in "
            "random order, which sit s/√2 from the nearest primaries); otherwise the N lattice points nearest a "
            "uniform random point of the frame form a compact block (reserves: the next nearest lattice points).")
    elif spec.array == 1:
        text = report.translate(
            "PlotwiseReport",
            "Clusters: the stations of a cluster are the k points of a square lattice of the spacing nearest its "
            "centre; the centres are drawn by balanced acceptance sampling (Robertson et al. 2013) from each "
            "stratum shrunk by the cluster's radius, so that every station lies in its stratum, and at least twice "
            "the radius plus the spacing apart. Reserve clusters are the next points of the same sequence.")
    else:
        text = report.translate(
            "PlotwiseReport",
            "Balanced: single stations by balanced acceptance sampling (Robertson et al. 2013), each at least the "
            "spacing from every other (simple sequential inhibition); reserves are the next accepted points of the "
            "same sequence.")
    if spec.min_spacing > 0:
        text += " " + report.translate(
            "PlotwiseReport", "MIN_SPACING = {d} m holds between all stations of the layout.").format(
            d=format_number(spec.min_spacing))
    return text


def stations_map(result, report, max_points=5000):
    """Strata filled by category, primary stations dark, reserves light."""
    frame = result.frame
    layers = [strata_layer(report, frame.strata)[0]]
    primary = result.is_primary
    labels = (report.translate("PlotwiseReport", "primary stations"),
              report.translate("PlotwiseReport", "reserve stations"))
    for mask, label, fill in ((primary, labels[0], INK), (~primary, labels[1], "#ffffff")):
        idx = np.flatnonzero(mask)
        if len(idx) > max_points:
            idx = idx[:: int(math.ceil(len(idx) / max_points))]
        if len(idx):
            layers.append(MapLayer((), label=label, fill=fill, stroke=INK, point_radius=3.0, points=result.xy[idx]))
    return map_svg(layers)
