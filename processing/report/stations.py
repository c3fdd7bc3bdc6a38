"""The report of plotwise:stations, built from the engine's results (host-free).

``tr`` translates a string in the report context (``PlotwiseReport``); the
algorithm passes its own, tests may pass nothing (English).
"""
from dataclasses import dataclass
import math

import numpy as np

from .html import Report, format_number
from .style import INK, MUTED
from .svg import MapLayer, category_colour, map_svg

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
ARRAY_NAMES = ("grid", "clusters", "balanced")
RULE_NAMES = ("independent occupancy sites (one home-range diameter apart)",
              "spatial capture-recapture (2 sigma apart)")


def _identity(text):
    return text


@dataclass(frozen=True)
class StationsRun:
    """What the run was given (for the parameters table)."""

    layer: str
    stratum_field: str
    crs: str
    seed: int
    service_hours: float
    workday_hours: float


def stations_report(result, frame, run, service=None, warnings=(), tr=_identity, language="en"):
    """The HTML report of a station layout.

    Parameters
    ----------
    result : engine.stations.StationLayout
    frame : engine.layout.PreparedFrame
    run : StationsRun
    service : engine.stations.ServicePlan or None
    warnings : sequence of str (already translated)
    """
    spec = result.spec
    report = Report(tr("Camera-trap and recorder stations"), algorithm_id="plotwise:stations", translate=tr,
                    language=language)
    report.field_safety()
    report.warnings(warnings)
    primary = result.is_primary
    report.key_figures([
        (tr("primary stations"), format_number(int(primary.sum()))),
        (tr("reserve stations"), format_number(int((~primary).sum()))),
        (tr("spacing used (m)"), format_number(round(spec.spacing))),
        (tr("array"), tr(ARRAY_NAMES[spec.array])),
    ])
    _spacing_section(report, spec, tr)
    _extent_section(report, result, tr)
    if service is not None:
        _service_section(report, service, spec, tr)
    _strata_section(report, result, tr)
    report.section(tr("Replacing stations in the field"))
    report.note(tr("A primary station that cannot be set (no safe access, no permission, flooded, ...) is replaced "
                   "by the next unused reserve station of its stratum, in draw order (draw_ord); for clusters, a "
                   "whole cluster by the next reserve cluster. Record the primary as not set and why; never move a "
                   "station to a more convenient place."))
    report.section(tr("Map"))
    report.figure(stations_map(result, frame, tr), tr("Strata (filled), primary stations (dark) and reserve "
                                                      "stations (light)"))
    report.section(tr("Method"))
    report.paragraph(_method_text(spec, tr))
    report.parameters({
        tr("Frame (FRAME)"): run.layer,
        tr("Stratum field (STRATUM_FIELD)"): run.stratum_field or tr("(none: one stratum)"),
        tr("Stations (N_STATIONS)"): spec.n_stations if spec.n_stations else tr("0: every grid point"),
        tr("Array (ARRAY)"): tr(ARRAY_NAMES[spec.array]),
        tr("Home range (HOME_RANGE, km²)"): spec.home_range if spec.home_range > 0 else tr("(not given)"),
        tr("Spacing (SPACING, m)"): tr("from the home range") if spec.from_home_range else spec.spacing,
        tr("Spacing rule (SPACING_RULE)"): tr(RULE_NAMES[spec.rule]),
        tr("Stations per cluster (CLUSTER_SIZE)"): spec.cluster_size if spec.array == 1 else tr("(not used)"),
        tr("Minimum spacing (MIN_SPACING, m)"): spec.min_spacing,
        tr("Reserves per stratum (RESERVE)"): spec.reserve,
        tr("Service time per station (hours)"): run.service_hours if run.service_hours > 0 else tr("(not given)"),
        tr("Working day (hours)"): run.workday_hours,
        tr("Seed (SEED)"): run.seed,
        tr("CRS of the computation and the output"): run.crs,
    })
    report.references(REFERENCES)
    return report


def _spacing_section(report, spec, tr):
    report.section(tr("Spacing"))
    if spec.home_range > 0:
        report.paragraph(tr(
            "Home range {hr} km², taken as the 95% range of a circular bivariate normal distribution of the "
            "animal's positions: σ = √(HR/π) / 2.448 = {sigma} m (2.448 = √(−2 ln 0.05)); home-range diameter "
            "{diameter} m.").format(hr=format_number(spec.home_range), sigma=format_number(round(spec.sigma)),
                                    diameter=format_number(round(2.0 * math.sqrt(spec.home_range * 1e6 / math.pi)))))
    if spec.from_home_range:
        text = (tr("Rule used: spatial capture-recapture, stations about 2σ = {s} m apart, so that an animal meets "
                   "several stations (Sollmann et al. 2012; Sun et al. 2014).") if spec.rule == 1 else
                tr("Rule used: independent occupancy sites, stations at least one home-range diameter = {s} m "
                   "apart, so that one animal rarely uses two sites (common practice)."))
        report.paragraph(text.format(s=format_number(round(spec.spacing))))
    else:
        report.paragraph(tr("Spacing given by the user: {s} m (no rule applied).").format(
            s=format_number(spec.spacing)))
        if spec.home_range > 0:
            report.paragraph(tr("For comparison: 2σ = {scr} m (spatial capture-recapture); one home-range diameter = "
                                "{occ} m (independent occupancy sites).").format(
                scr=format_number(round(2 * spec.sigma)),
                occ=format_number(round(2.0 * math.sqrt(spec.home_range * 1e6 / math.pi)))))


def _extent_section(report, result, tr):
    e, spec = result.extent, result.spec
    report.section(tr("Array extent"))
    text = tr("The primary stations span {span} km (largest distance between two of them); their convex hull covers "
              "{area} km².").format(span=format_number(e.span / 1e3), area=format_number(e.hull_area / 1e6))
    if spec.home_range > 0:
        text += " " + tr("That is {n} home ranges of {hr} km², and {d} home-range diameters across.").format(
            n=format_number(e.home_ranges), hr=format_number(spec.home_range), d=format_number(e.diameters))
    report.paragraph(text)
    if spec.home_range > 0 and e.home_ranges < 3.0:
        report.note(tr("An array smaller than a few home ranges cannot estimate density by spatial "
                       "capture-recapture: too few animals have their range inside it, and movement cannot be "
                       "separated from density. Spread the stations wider or add stations."))


def _service_section(report, service, spec, tr):
    report.section(tr("Field effort"))
    text = tr("With {h} hours per station visit (travel included) and a working day of {day} hours, one team "
              "services {n} stations per team-day; one round of every primary station takes {days} team-days.").format(
        h=format_number(service.service_hours), day=format_number(service.workday_hours),
        n=format_number(service.per_team_day), days=format_number(service.team_days))
    if spec.array == 1 and np.isfinite(service.cluster_hours):
        fits = service.cluster_hours <= service.workday_hours
        text += " " + (tr("A cluster of {k} stations takes {c} hours: one team can service a cluster in a day.") if fits
                       else tr("A cluster of {k} stations takes {c} hours: more than one team-day; use smaller "
                               "clusters or two teams.")).format(k=spec.cluster_size,
                                                                 c=format_number(service.cluster_hours))
    report.paragraph(text)


def _strata_section(report, result, tr):
    report.section(tr("Stations per stratum"))
    rows = [[tr("frame") if s.key is None else str(s.key), s.area / 1e4,
             s.n_requested if result.spec.array != 0 else None, s.n_primary, s.n_reserve,
             s.n_clusters if result.spec.array == 1 else None] for s in result.strata]
    report.table([tr("Stratum"), tr("Area (ha)"), tr("Stations asked"), tr("Primary"), tr("Reserve"),
                  tr("Clusters")], rows)


def _method_text(spec, tr):
    if spec.array == 0:
        text = tr("Grid: one square lattice over the frame, aligned with grid north, with a uniform random start. "
                  "With N_STATIONS = 0 every lattice point in the frame is a station (reserves: the lattice's cell "
                  "centres in random order, which sit s/√2 from the nearest primaries); otherwise the N lattice "
                  "points nearest a uniform random point of the frame form a compact block (reserves: the next "
                  "nearest lattice points).")
    elif spec.array == 1:
        text = tr("Clusters: the stations of a cluster are the k points of a square lattice of the spacing nearest "
                  "its centre; the centres are drawn by balanced acceptance sampling (Robertson et al. 2013) from "
                  "each stratum shrunk by the cluster's radius, so that every station lies in its stratum, and at "
                  "least twice the radius plus the spacing apart. Reserve clusters are the next points of the same "
                  "sequence.")
    else:
        text = tr("Balanced: single stations by balanced acceptance sampling (Robertson et al. 2013), each at least "
                  "the spacing from every other (simple sequential inhibition); reserves are the next accepted "
                  "points of the same sequence.")
    if spec.min_spacing > 0:
        text += " " + tr("MIN_SPACING = {d} m holds between all stations of the layout.").format(
            d=format_number(spec.min_spacing))
    return text


def stations_map(result, frame, tr=_identity, max_points=5000):
    """Strata filled by category, primary stations dark, reserves light."""
    bounds = np.array([s.geometry.bounds for s in frame.strata])
    pixel = max(bounds[:, 2].max() - bounds[:, 0].min(), bounds[:, 3].max() - bounds[:, 1].min(), 1.0) / 900.0
    geoms = []
    for s in frame.strata:
        quick = s.geometry.simplify(0.5 * pixel, preserve_topology=False)
        geoms.append(quick if not quick.is_empty else s.geometry)
    fills = tuple(category_colour(i) for i in range(len(geoms)))
    legend = tuple((tr("the frame") if s.key is None else tr("stratum {key}").format(key=s.key), category_colour(i))
                   for i, s in enumerate(frame.strata))
    layers = [MapLayer(tuple(geoms), fills=fills, fill=fills[0], stroke=MUTED, stroke_width=0.8, opacity=0.35,
                       legend=legend if len(geoms) > 1 else ())]
    primary = result.is_primary
    for mask, label, fill in ((primary, tr("primary stations"), INK), (~primary, tr("reserve stations"), "#ffffff")):
        idx = np.flatnonzero(mask)
        if len(idx) > max_points:
            idx = idx[:: int(math.ceil(len(idx) / max_points))]
        if len(idx):
            layers.append(MapLayer((), label=label, fill=fill, stroke=INK, point_radius=3.0, points=result.xy[idx]))
    return map_svg(layers)
