"""Camera-trap and acoustic-recorder stations over a frame (optionally stratified).

Spacing from the species
------------------------
A home range of area ``HR`` is taken as the 95% region of a circular bivariate
normal distribution of the animal's positions. For that distribution the squared
distance from the centre over ``sigma**2`` is chi-square with 2 degrees of
freedom, so the 95% radius is ``r95 = sigma sqrt(-2 ln 0.05) = 2.448 sigma`` and

    sigma = sqrt(HR / pi) / 2.448.

Two spacing rules follow:

* spatial capture-recapture (SCR): stations about ``2 sigma`` apart, so that an
  animal meets several stations (Sollmann, Gardner & Belant 2012; Sun, Fuller &
  Royle 2014);
* independent occupancy sites: stations at least one home-range diameter
  ``2 sqrt(HR / pi)`` apart, so that one animal rarely uses two sites (common
  practice).

A SPACING given by the user replaces the rule.

Arrays
------
* **grid**: one square lattice over the frame, aligned with grid north, with a
  uniform random start (Cochran 1977, ch. 8). ``n_stations = 0`` takes every
  lattice point in the frame; otherwise the ``n`` lattice points of the frame
  nearest to a uniform random point of the frame (a compact block). Strata only
  label the stations. Reserves: for the whole-frame grid the lattice's cell
  centres in random order (they sit ``s / sqrt(2)`` from the nearest primary);
  for a block, the next-nearest lattice points in distance order.
* **clusters**: ``ceil(n_h / k)`` clusters of ``k`` stations per stratum; the
  stations of a cluster form the ``k`` points of a square lattice of spacing
  ``s`` nearest its centre; the centres are drawn by balanced acceptance
  sampling (Robertson et al. 2013) from the stratum shrunk by the cluster's
  radius (so every station lies in its stratum), at least ``2 R + s`` apart (so
  stations of neighbouring clusters are at least ``s`` apart). Reserves are
  whole clusters, the next ones of the same sequence.
* **balanced**: ``n_h`` single stations per stratum by balanced acceptance
  sampling, at least ``s`` apart (sequential inhibition, Diggle 2003, §5.8.2);
  reserves are the next accepted points.

Per-stratum numbers come from :func:`layout.proportional_counts` (at least two
per stratum). MIN_SPACING holds between all stations of the layout.
"""
from dataclasses import dataclass, replace
import math

import numpy as np
from shapely.geometry import MultiPoint
from shapely.ops import unary_union

from . import geometry as geo
from . import layout
from .crs import lonlat_transformer
from .errors import QT_TRANSLATE_NOOP, Cancelled, InputError, message

ARRAYS = ("grid", "clusters", "balanced")
GRID, CLUSTERS, BALANCED = range(3)
RULES = ("independent occupancy sites", "spatial capture-recapture")
RULE_OCCUPANCY, RULE_SCR = range(2)
PRIMARY, RESERVE = layout.PRIMARY, layout.RESERVE
#: sqrt(-2 ln 0.05): the 95% radius of a circular bivariate normal in units of sigma (chi-square, 2 df)
R95_IN_SIGMA = math.sqrt(-2.0 * math.log(0.05))
#: an array whose convex hull covers fewer home ranges than this cannot estimate density well (common practice)
FEW_HOME_RANGES = 3.0
_WAYPOINT_TEXT = {
    (False, PRIMARY): QT_TRANSLATE_NOOP("PlotwiseEngine", "station {station} (primary, stratum {stratum})"),
    (False, RESERVE): QT_TRANSLATE_NOOP("PlotwiseEngine", "station {station} (reserve, stratum {stratum})"),
    (True, PRIMARY): QT_TRANSLATE_NOOP("PlotwiseEngine",
                     "station {station} of cluster {cluster} (primary, stratum {stratum})"),
    (True, RESERVE): QT_TRANSLATE_NOOP("PlotwiseEngine",
                     "station {station} of cluster {cluster} (reserve, stratum {stratum})"),
}


# ----------------------------------------------------------------------------
# spacing
# ----------------------------------------------------------------------------
def home_range_sigma(home_range_km2):
    """``sigma = sqrt(HR / pi) / sqrt(-2 ln 0.05)`` in metres, for a home range of ``home_range_km2``."""
    return math.sqrt(home_range_km2 * 1e6 / math.pi) / R95_IN_SIGMA


def home_range_diameter(home_range_km2):
    """Diameter ``2 sqrt(HR / pi)`` (m) of a circle of the home range's area."""
    return 2.0 * math.sqrt(home_range_km2 * 1e6 / math.pi)


def rule_spacing(home_range_km2, rule):
    """Spacing (m) by the rule: ``2 sigma`` (SCR) or one home-range diameter (occupancy)."""
    if rule == RULE_SCR:
        return 2.0 * home_range_sigma(home_range_km2)
    return home_range_diameter(home_range_km2)


@dataclass(frozen=True)
class StationSpec:
    """The checked parameters of a station layout (:func:`_stations_iv`)."""

    array: int
    n_stations: int
    home_range: float  # km², 0 when not given
    spacing: float  # m, the spacing used
    from_home_range: bool
    rule: int
    cluster_size: int
    min_spacing: float
    reserve: int

    @property
    def sigma(self):
        return home_range_sigma(self.home_range) if self.home_range > 0 else math.nan


def _stations_iv(array=GRID, n_stations=30, home_range=0.0, spacing=0.0, rule=RULE_OCCUPANCY, cluster_size=4,
                 min_spacing=0.0, reserve=0):
    """Validate the parameters and return :class:`StationSpec` (the ``_iv`` step)."""
    if array not in (GRID, CLUSTERS, BALANCED):
        raise InputError(message(QT_TRANSLATE_NOOP("PlotwiseEngine",
                                 "ARRAY must be 0 (grid), 1 (clusters) or 2 (balanced).")))
    if rule not in (RULE_OCCUPANCY, RULE_SCR):
        raise InputError(message(QT_TRANSLATE_NOOP("PlotwiseEngine",
                                 "The spacing rule must be 0 (independent occupancy sites) or 1 (spatial "
                                 "capture-recapture).")))
    for name, value in (("N_STATIONS", n_stations), ("RESERVE", reserve), ("CLUSTER_SIZE", cluster_size)):
        if value < 0 or int(value) != value:
            raise InputError(message(QT_TRANSLATE_NOOP("PlotwiseEngine",
                                     "{name} must be 0 or a positive whole number; it is {value}."), name=name,
                                     value=value))
    if not (home_range >= 0 and spacing >= 0 and min_spacing >= 0):
        raise InputError(message(QT_TRANSLATE_NOOP("PlotwiseEngine",
                                 "HOME_RANGE, SPACING and MIN_SPACING must be 0 or more.")))
    if spacing <= 0 and home_range <= 0:
        raise InputError(message(QT_TRANSLATE_NOOP("PlotwiseEngine",
                                 "Give the species' home range (HOME_RANGE, km²) or a station spacing (SPACING, "
                                 "m): the spacing is taken from one of them.")))
    if array != GRID and n_stations < 1:
        raise InputError(message(QT_TRANSLATE_NOOP("PlotwiseEngine",
                                 "N_STATIONS must be at least 1 for clusters and balanced stations (0 means "
                                 "'fill the frame' for the grid only).")))
    if array == CLUSTERS and cluster_size < 2:
        raise InputError(message(QT_TRANSLATE_NOOP("PlotwiseEngine",
                                 "CLUSTER_SIZE must be at least 2 stations per cluster.")))
    used = float(spacing) if spacing > 0 else rule_spacing(home_range, rule)
    if min_spacing > used:
        raise InputError(message(QT_TRANSLATE_NOOP("PlotwiseEngine",
                                 "MIN_SPACING ({min_spacing:g} m) is larger than the station spacing ({spacing:.0f} "
                                 "m): stations of the array would break it. Lower MIN_SPACING or raise SPACING."),
                                 min_spacing=min_spacing, spacing=used))
    return StationSpec(int(array), int(n_stations), float(home_range), used, spacing <= 0, int(rule),
                       int(cluster_size), float(min_spacing), int(reserve))


def cluster_pattern(size, spacing):
    """Offsets (size, 2) of the ``size`` points of a square lattice of ``spacing`` nearest a cluster's centre.

    The lattice is a ``m x m`` block (``m = ceil(sqrt(size))``) centred on the
    cluster centre; ties in distance go row by row from the south-west.
    """
    m = int(math.ceil(math.sqrt(size)))
    idx = np.arange(m) - (m - 1) / 2.0
    yy, xx = np.meshgrid(idx, idx, indexing="ij")
    pts = np.column_stack([xx.ravel(), yy.ravel()]) * spacing
    order = np.lexsort((pts[:, 0], pts[:, 1], np.round(np.hypot(pts[:, 0], pts[:, 1]), 9)))
    return pts[order[:size]]


# ----------------------------------------------------------------------------
# results
# ----------------------------------------------------------------------------
@dataclass(frozen=True)
class StratumStations:
    """What was placed in one stratum."""

    key: object
    label: str
    area: float
    n_requested: int
    n_primary: int
    n_reserve: int
    n_clusters: int


@dataclass(frozen=True)
class ArrayExtent:
    """The primary stations' extent against the home range."""

    hull_area: float  # m², convex hull of the primary stations
    span: float  # m, largest distance between two primary stations
    home_ranges: float  # hull area / home-range area (NaN without a home range)
    diameters: float  # span / home-range diameter


@dataclass(frozen=True, eq=False)
class StationLayout:
    """Stations in draw order, stratum by stratum (per-station arrays of equal length)."""

    station: tuple
    stratum: tuple
    cluster: tuple  # cluster id per station (None outside the cluster array)
    role: tuple
    draw_ord: np.ndarray
    xy: np.ndarray
    lon: np.ndarray
    lat: np.ndarray
    spec: StationSpec
    strata: tuple
    extent: ArrayExtent
    grid_offset: tuple  # the grid's random start (m), NaN outside the grid array
    warnings: tuple = ()
    frame: object = None  # the layout.PreparedFrame the stations were placed in

    def __len__(self):
        return len(self.station)

    @property
    def is_primary(self):
        return np.array([r == PRIMARY for r in self.role], dtype=bool)


# ----------------------------------------------------------------------------
# the arrays
# ----------------------------------------------------------------------------
def prepare_frame(geometries, feature_ids, strata, spec):
    """Repair, merge and size the strata (:func:`layout.prepare_strata`) and set ``n_h`` for stations.

    ``n_h`` is N_STATIONS split by area with at least two per stratum
    (:func:`layout.proportional_counts`); for the grid (one array over the strata) it is 0.
    """
    keys = {k for k in strata} if strata is not None else {None}
    planned = max(spec.n_stations, layout.MIN_PER_STRATUM * max(len(keys), 1))
    frame = layout.prepare_strata(geometries, feature_ids, strata, None, planned,
                                  layout.LayoutSpec(design=layout.SPATIALLY_BALANCED))
    warnings = list(frame.warnings)
    if spec.n_stations > 0 and spec.array != GRID:  # the grid's block is one array over the strata
        counts = layout.proportional_counts([s.area for s in frame.strata], spec.n_stations)
        if spec.n_stations < layout.MIN_PER_STRATUM * len(frame.strata):
            warnings.append(message(QT_TRANSLATE_NOOP("PlotwiseEngine",
                                    "N_STATIONS = {n} is fewer than {minimum} per stratum for {h} strata; every "
                                    "stratum gets {minimum} ({total} stations)."), n=spec.n_stations,
                                    minimum=layout.MIN_PER_STRATUM, h=len(frame.strata), total=int(counts.sum())))
    else:
        counts = np.zeros(len(frame.strata), dtype=int)
    strata_out = tuple(replace(s, n=int(c)) for s, c in zip(frame.strata, counts))
    return replace(frame, strata=strata_out, warnings=tuple(warnings))


def _stratum_of(frame, points):
    """Index of the stratum holding each point (-1 outside every stratum)."""
    out = np.full(len(points), -1)
    for h, st in enumerate(frame.strata):
        inside = geo.contains_xy(st.geometry, points[:, 0], points[:, 1]) & (out < 0)
        out[inside] = h
    return out


def grid_array(frame, spec, rng):
    """The grid array: ``[(stratum index, points (n, 2), roles)]`` per stratum and the random start.

    One lattice of spacing ``s`` over the union of the strata (see the module
    docstring for blocks and reserves).
    """
    union = frame.strata[0].geometry if len(frame.strata) == 1 else \
        geo.repair_polygonal(unary_union([st.geometry for st in frame.strata])).geometry
    grid = layout.systematic_grid(union, spec.spacing, rng, bearing=0.0)
    offset = tuple(o * spec.spacing for o in grid.offset)
    prim, res = grid.primaries, grid.reserves
    if spec.n_stations > 0:
        if len(prim) < spec.n_stations:
            raise InputError(message(QT_TRANSLATE_NOOP("PlotwiseEngine",
                                     "Only {fit} grid stations at {spacing:.0f} m fit in the frame; {n} were asked "
                                     "for. Ask for fewer stations (0 takes every grid point), or lower the spacing."),
                                     fit=len(prim), spacing=spec.spacing, n=spec.n_stations))
        centre = geo.uniform_points(geo.triangle_cover(union), union, 1, rng)[0]
        order = np.argsort(np.hypot(*(prim - centre).T), kind="stable")
        prim, res = prim[order[:spec.n_stations]], prim[order[spec.n_stations:]]
    where_p, where_r = _stratum_of(frame, prim), _stratum_of(frame, res)
    guard = layout.SpacingGuard(spec.min_spacing) if spec.min_spacing > 0 else None
    parts = []
    for h in range(len(frame.strata)):
        p_h, r_h = prim[where_p == h], res[where_r == h]
        if guard is not None:
            p_h = p_h[guard.take(p_h)]
            r_h = r_h[guard.take(r_h, spec.reserve)]
        r_h = r_h[:spec.reserve] if len(p_h) else r_h[:0]
        parts.append((h, np.concatenate([p_h, r_h]), [PRIMARY] * len(p_h) + [RESERVE] * len(r_h), None))
    return parts, offset


def balanced_array(frame, spec, rng, guard):
    """Balanced single stations at least ``max(s, MIN_SPACING)`` apart, per stratum."""
    parts = []
    for h, st in enumerate(frame.strata):
        wanted = st.n + spec.reserve if st.n > 0 else 0
        points = _balanced_points(st, wanted, rng, guard, guard.d, "stations")
        parts.append((h, points, [PRIMARY] * st.n + [RESERVE] * (len(points) - st.n), None))
    return parts


def cluster_array(frame, spec, rng):
    """Clusters of ``k`` stations around balanced centres, per stratum; reserves are whole clusters."""
    pattern = cluster_pattern(spec.cluster_size, spec.spacing)
    radius = float(np.hypot(*pattern.T).max())
    centre_guard = layout.SpacingGuard(2.0 * radius + spec.spacing)
    parts = []
    for h, st in enumerate(frame.strata):
        n_clusters = int(math.ceil(st.n / spec.cluster_size)) if st.n > 0 else 0
        wanted = n_clusters + spec.reserve if n_clusters else 0
        region = geo.inward_buffer(st.geometry, radius) if wanted else st.geometry
        if wanted and region.is_empty:
            raise InputError(message(
                QT_TRANSLATE_NOOP("PlotwiseEngine",
                "A cluster of {k} stations {spacing:.0f} m apart (radius {radius:.0f} m) does not fit wholly in "
                "stratum {key}. Use smaller clusters, a smaller spacing, or the balanced array.") if st.key is not None
                else QT_TRANSLATE_NOOP("PlotwiseEngine",
                     "A cluster of {k} stations {spacing:.0f} m apart (radius {radius:.0f} m) does not fit wholly in "
                "the frame. Use smaller clusters, a smaller spacing, or the balanced array."),
                k=spec.cluster_size, spacing=spec.spacing, radius=radius, key=st.key))
        shrunk = replace(st, region=region, cover=geo.triangle_cover(region) if wanted else st.cover,
                         effective_area=float(region.area))
        centres = _balanced_points(shrunk, wanted, rng, centre_guard, centre_guard.d, "clusters")
        points = (centres[:, None, :] + pattern[None]).reshape(-1, 2)  # centres 2R + s apart over all strata
        roles = [PRIMARY if j < n_clusters else RESERVE for j in range(len(centres)) for _ in pattern]
        cluster_no = [j + 1 for j in range(len(centres)) for _ in pattern]
        parts.append((h, points, roles, cluster_no))
    return parts


_TOO_MANY = {  # (what, whole frame?)
    ("stations", False): QT_TRANSLATE_NOOP("PlotwiseEngine",
                         "{wanted} stations (primaries and reserves) at least {distance:.0f} m apart do not fit in "
                         "stratum {key}: at most about {fit} fit there (a hexagonal lattice; random layouts fill up "
                         "well before that). Ask for fewer, or lower the spacing."),
    ("stations", True): QT_TRANSLATE_NOOP("PlotwiseEngine",
                        "{wanted} stations (primaries and reserves) at least {distance:.0f} m apart do not fit in the "
                        "frame: at most about {fit} fit there (a hexagonal lattice; random layouts fill up well "
                        "before that). Ask for fewer, or lower the spacing."),
    ("clusters", False): QT_TRANSLATE_NOOP("PlotwiseEngine",
                         "{wanted} clusters (primaries and reserves) with centres at least {distance:.0f} m apart do "
                         "not fit in stratum {key}: at most about {fit} fit there (a hexagonal lattice; random "
                         "layouts fill up well before that). Ask for fewer stations, smaller clusters, or a smaller "
                         "spacing."),
    ("clusters", True): QT_TRANSLATE_NOOP("PlotwiseEngine",
                        "{wanted} clusters (primaries and reserves) with centres at least {distance:.0f} m apart do "
                        "not fit in the frame: at most about {fit} fit there (a hexagonal lattice; random layouts "
                        "fill up well before that). Ask for fewer stations, smaller clusters, or a smaller spacing."),
}


def _balanced_points(stratum, wanted, rng, guard, distance, what):
    if wanted <= 0:
        return np.zeros((0, 2))
    fit = layout.hexagonal_capacity(stratum.region, distance)
    too_many = message(_TOO_MANY[what, stratum.key is None], wanted=wanted, distance=distance, key=stratum.key,
                       fit=fit)
    if fit < wanted:
        raise InputError(too_many)
    points = layout.balanced_centres(stratum, wanted, rng, guard)
    if len(points) < wanted:
        raise InputError(too_many)
    return points


def array_extent(points, home_range_km2):
    """Convex-hull area and largest span of ``points``, against the home range's area and diameter."""
    if len(points) >= 3:
        hull = MultiPoint([tuple(p) for p in points]).convex_hull
        area = float(hull.area)
    else:
        area = 0.0
    span = 0.0
    if len(points) >= 2:
        from scipy.spatial import distance

        span = float(distance.pdist(points).max()) if len(points) <= 4000 else float(
            np.hypot(*(points.max(axis=0) - points.min(axis=0))))
    if home_range_km2 > 0:
        return ArrayExtent(area, span, area / (home_range_km2 * 1e6), span / home_range_diameter(home_range_km2))
    return ArrayExtent(area, span, math.nan, math.nan)


def station_layout(frame, spec, rng, crs=None, progress=None):
    """Place the stations of every stratum (see the module docstring).

    Parameters
    ----------
    frame : layout.PreparedFrame
        From :func:`prepare_frame`.
    spec : StationSpec
    rng : numpy.random.Generator
        The run's only generator.
    crs : str, optional
        Computation CRS, for ``lon``/``lat`` in WGS 84.
    progress : callable, optional
        ``progress(fraction) -> bool``; True cancels.

    Returns
    -------
    StationLayout
    """
    if progress is not None and progress(0.0):
        raise Cancelled("Cancelled while placing the stations.")
    warnings = list(frame.warnings)
    offset = (math.nan, math.nan)
    if spec.array == GRID:
        parts, offset = grid_array(frame, spec, rng)
    elif spec.array == CLUSTERS:
        parts = cluster_array(frame, spec, rng)
    else:
        parts = balanced_array(frame, spec, rng, layout.SpacingGuard(max(spec.min_spacing, spec.spacing)))
    if progress is not None and progress(0.8):
        raise Cancelled("Cancelled while placing the stations.")
    result = replace(_assemble(frame, spec, parts, crs, offset, warnings), frame=frame)
    if spec.home_range > 0 and np.isfinite(result.extent.home_ranges) and \
            result.extent.home_ranges < FEW_HOME_RANGES:
        warnings.append(message(QT_TRANSLATE_NOOP("PlotwiseEngine",
                                "The array's primary stations cover {n:.1f} home ranges (convex hull {area:.2f} km² "
                                "against a home range of {hr:g} km²): an array smaller than about {few:g} home ranges "
                                "cannot estimate density (spatial capture-recapture). Spread the stations wider."),
                                n=result.extent.home_ranges, area=result.extent.hull_area / 1e6,
                                hr=spec.home_range, few=FEW_HOME_RANGES))
        result = replace(result, warnings=tuple(warnings))
    return result


def _assemble(frame, spec, parts, crs, offset, warnings):
    stations, strata_keys, clusters, roles, orders, xys, summaries = [], [], [], [], [], [], []
    for h, points, role, cluster_no in parts:
        st = frame.strata[h]
        m = len(points)
        width = max(3, len(str(m)))
        stations += [f"{st.label}-{j:0{width}d}" for j in range(1, m + 1)]
        strata_keys += [st.key] * m
        clusters += [None] * m if cluster_no is None else [f"{st.label}-C{c:02d}" for c in cluster_no]
        roles += role
        orders.append(np.arange(1, m + 1))
        xys.append(np.asarray(points, dtype=float).reshape(-1, 2))
        n_primary = role.count(PRIMARY)
        n_clusters = len(set(cluster_no)) if cluster_no else 0
        summaries.append(StratumStations(st.key, st.label, st.area, st.n, n_primary, m - n_primary, n_clusters))
        if m == 0:
            warnings.append(message(QT_TRANSLATE_NOOP("PlotwiseEngine",
                                    "The frame gets no station.") if st.key is None else
                                    QT_TRANSLATE_NOOP("PlotwiseEngine", "Stratum {key} gets no station."), key=st.key))
    xy = np.concatenate(xys) if xys else np.zeros((0, 2))
    if len(xy) == 0:
        raise InputError(message(QT_TRANSLATE_NOOP("PlotwiseEngine",
                                 "No station could be placed in the frame at a spacing of {spacing:.0f} m. Lower "
                                 "the spacing or check the frame."), spacing=spec.spacing))
    if crs is not None:
        lon, lat = (np.asarray(v, float) for v in lonlat_transformer(crs).transform(xy[:, 0], xy[:, 1]))
    else:
        lon = lat = np.full(len(xy), np.nan)
    primary = np.array([r == PRIMARY for r in roles])
    return StationLayout(tuple(stations), tuple(strata_keys), tuple(clusters), tuple(roles),
                         np.concatenate(orders).astype(int), xy, lon, lat, spec, tuple(summaries),
                         array_extent(xy[primary], spec.home_range), offset, tuple(warnings))


def place_stations(geometries, feature_ids=None, strata=None, rng=None, crs=None, progress=None, **settings):
    """Check the settings (:func:`_stations_iv`), prepare the frame (:func:`prepare_frame`) and place the
    stations (:func:`station_layout`).

    Parameters
    ----------
    geometries : sequence of shapely polygons (projected, metres)
    feature_ids, strata : sequences aligned with ``geometries`` (strata: None for one stratum)
    rng : numpy.random.Generator
    settings : array, n_stations, home_range, spacing, rule, cluster_size, min_spacing, reserve

    Returns
    -------
    StationLayout
    """
    spec = _stations_iv(**settings)
    ids = list(feature_ids) if feature_ids is not None else list(range(len(geometries)))
    frame = prepare_frame(geometries, ids, strata, spec)
    return station_layout(frame, spec, rng, crs=crs, progress=progress)


def station_waypoints(stations, crs):
    """One GPS waypoint per station (:class:`layout.Waypoints`), named by the station id."""
    lon, lat = (np.asarray(v, float) for v in lonlat_transformer(crs).transform(stations.xy[:, 0],
                                                                                stations.xy[:, 1]))
    desc = tuple(
        message(_WAYPOINT_TEXT[c is not None, r], station=s, cluster=c, stratum=1 if k is None else k)
        for s, c, r, k in zip(stations.station, stations.cluster, stations.role, stations.stratum))
    return layout.Waypoints(tuple(stations.station), lon, lat, desc)


@dataclass(frozen=True)
class ServicePlan:
    """Stations a team can service in a day, and the team-days for one round of the primaries."""

    service_hours: float
    workday_hours: float
    per_team_day: int
    team_days: int
    cluster_hours: float  # hours for one cluster (NaN outside the cluster array)


def service_plan(n_primary, service_hours, workday_hours=8.0, cluster_size=0):
    """``floor(workday / service time)`` stations per team-day, ``ceil(n / that)`` team-days."""
    if not service_hours > 0:
        return None
    if not workday_hours > 0:
        raise InputError(message(QT_TRANSLATE_NOOP("PlotwiseEngine", "The working day must be longer than 0 hours.")))
    per_day = int(math.floor(workday_hours / service_hours + 1e-9))
    days = int(math.ceil(n_primary / per_day)) if per_day > 0 else 0
    cluster = cluster_size * service_hours if cluster_size else math.nan
    return ServicePlan(float(service_hours), float(workday_hours), per_day, days, cluster)
