"""Density and abundance from counts in sample units: stratified ratio estimation.

For stratum *h* with surveyed units i = 1..n_h, counts ``y_hi`` and unit areas
``a_hi`` and stratum area ``A_h``:

* density ``D_h = Σ_i y_hi / Σ_i a_hi`` (the ratio estimator, Cochran 1977, ch. 6;
  with equal units it is the mean count divided by the unit area);
* its linearised variance (Cochran 1977, eq. 6.13)::

      v(D_h) = (1 − f_h) / (n_h ā_h²) · Σ_i (y_hi − D_h a_hi)² / (n_h − 1)

  with the finite-population correction ``f_h = Σ_i a_hi / A_h`` where it holds
  (units that cannot overlap: :func:`edge.fpc_holds`);
* abundance ``N_h = D_h A_h``, ``v(N_h) = A_h² v(D_h)``; overall ``N = Σ N_h``,
  ``v(N) = Σ v(N_h)`` (Cochran 1977, eq. 5.6) and ``D = N / Σ A_h``.

Under plus sampling (:mod:`.edge`) the units' centres were drawn over the
stratum grown by the units' reach, of area ``A⁺_h``: then ``N_h = A⁺_h Σy / Σa``
and ``D_h = N_h / A_h``.

Detection probability p (from a separate study) divides the estimates and adds
its squared CV (delta method, Seber 1982, §1.3.3); the degrees of freedom of the
two parts combine by Satterthwaite's rule (Buckland et al. 2001, eq. 3.75).
Confidence intervals: Student t with Satterthwaite's effective degrees of
freedom (Cochran 1977, eq. 5.16), log-normal with the same t quantile
(Buckland et al. 2001, §3.6.1), or a rescaled stratified percentile bootstrap
(Rao & Wu 1988; Efron & Tibshirani 1993). Where every count is 0 the interval
is the one-sided Poisson upper limit (Garwood 1936).

Equation numbers of Cochran (1977) are given from memory; the formulas are written out.
Nothing here imports the host.
"""
from dataclasses import dataclass, field, replace
import math

import numpy as np
from scipy import special
from shapely.ops import unary_union

from . import allocation, edge
from .errors import QT_TRANSLATE_NOOP, Cancelled, InputError, Message, message
from .geometry import OVERLAP_ERROR_SHARE, SLIVER_AREA, listed_overlaps, overlapping_pairs, worst_overlap_share
from .geometry_types import polygonal_part
from .listing import MAX_LISTED_IDS, listed_ids, natural_key
from .variance import collapse_single_unit_strata, local_neighbourhood_variance, single_unit_variance

CI_T, CI_LOGNORMAL, CI_BOOTSTRAP = "t", "lognormal", "bootstrap"
CI_METHODS = (CI_T, CI_LOGNORMAL, CI_BOOTSTRAP)
VARIANCE_SRS, VARIANCE_LOCAL, VARIANCE_LOCAL_SCALED = "srs", "local", "local_scaled"
VARIANCE_METHODS = (VARIANCE_SRS, VARIANCE_LOCAL, VARIANCE_LOCAL_SCALED)
LOCAL_METHODS = (VARIANCE_LOCAL, VARIANCE_LOCAL_SCALED)
MIN_BOOTSTRAP = 2000
OVERALL = "all"
RESERVE_ROLE = "reserve"
UNEVEN_INCLUSION = 1.01  # incl_p within a stratum differing by more than 1 % is worth a warning (our choice)
MIN_UNITS_FOR_PRESENCE_HINT = 5  # fewer 0/1 counts than this prove nothing (our choice)


@dataclass(frozen=True)
class StratumEstimate:
    """Estimate for one stratum, or for the whole frame (``stratum == "all"``).

    Areas are in the caller's area unit (e.g. km²); densities per that unit.
    ``area`` is the stratum's area (also with presence data). ``mean_c`` and
    ``sd_c`` are the mean and standard deviation of the counts per surveyed
    unit. ``cv`` is the coefficient of variation of the abundance (and density)
    estimate, detection included. ``df`` is the degrees of freedom of the
    interval. ``n_next`` is the number of units for the next survey (``None``
    without a target CV). ``upper_only``: every count was 0, and the interval
    is the one-sided Poisson upper limit (lower limit 0). ``expansion`` is the
    area the counts are expanded to (``A⁺_h`` under plus sampling, else ``A_h``).
    """

    stratum: str
    area: float
    n: int
    n_missing: int
    mean_c: float
    sd_c: float
    dens: float
    dens_se: float
    dens_lo: float
    dens_hi: float
    abund: float
    abund_se: float
    abund_lo: float
    abund_hi: float
    cv: float
    df: float
    n_next: object = None
    collapsed_with: tuple = ()
    upper_only: bool = False
    expansion: float = float("nan")
    local: bool = False


@dataclass(frozen=True)
class Estimate:
    """Result of :func:`estimate_density`.

    Attributes
    ----------
    strata : tuple of StratumEstimate
        One per stratum that entered the estimate, in natural order of the ids.
    overall : StratumEstimate
        The row ``all``.
    warnings : tuple of str
        Sentences for the log and the report.
    missing_ids : tuple
        Ids of units with no count (not surveyed: non-response).
    dropped_strata : tuple of str
        Strata left out because no unit in them was surveyed (the frame shrank).
    dropped_area : float
        Area of the dropped strata.
    overall_intervals : tuple of (str, float, float)
        The overall abundance's interval by each method computed: t and
        log-normal always, the bootstrap when it was run.
    bootstrap_totals : numpy.ndarray or None
        The bootstrap replicates of the overall abundance.
    fpc_strata, fpc_refused : tuple of str
        Strata where the finite-population correction was applied, and strata
        where it was asked for but refused (their units may overlap).
    fpc_assumed : bool
        The correction was applied to units that carry no design record: it
        assumes they do not overlap.
    edge : str
        The units' edge protocol (:data:`edge.PLUS`, :data:`edge.INSIDE`), or
        "" when the units carry no record.
    unused_reserves : int
        Reserve units without a count, skipped as unused.
    """

    strata: tuple
    overall: StratumEstimate
    confidence: float
    ci_method: str
    variance_method: str
    fpc: bool
    detection_p: float
    detection_se: float
    presence: bool
    target_cv: object
    n_bootstrap: int
    warnings: tuple = ()
    missing_ids: tuple = ()
    dropped_strata: tuple = ()
    dropped_area: float = 0.0
    overall_intervals: tuple = ()
    bootstrap_totals: object = field(default=None, repr=False, compare=False)
    detection_df: float = float("inf")
    fpc_strata: tuple = ()
    fpc_refused: tuple = ()
    fpc_assumed: bool = False
    edge: str = ""
    unused_reserves: int = 0

    def table(self):
        """All rows: the strata, then ``all``."""
        return self.strata + (self.overall,)


# --------------------------------------------------------------------------- formulas


def ratio_density(counts, areas):
    """Ratio estimator of density, ``Σ y / Σ a`` (Cochran 1977, eq. 6.1)."""
    return float(np.sum(counts) / np.sum(areas))


def satterthwaite_df(variances, dfs):
    """Satterthwaite's effective degrees of freedom of a sum of variance estimates.

    ``ν = (Σ_g v_g)² / Σ_g (v_g² / ν_g)`` (Satterthwaite 1946; Cochran 1977,
    eq. 5.16). Components with infinite ``ν_g`` add nothing to the denominator.

    Parameters
    ----------
    variances, dfs : array_like
        The variance components and their degrees of freedom.

    Returns
    -------
    float
        ``inf`` when every component has infinite df, ``nan`` when all are 0.
    """
    v = np.asarray(variances, dtype=float)
    d = np.asarray(dfs, dtype=float)
    total = v.sum()
    if not total > 0:
        return float("nan")
    finite = np.isfinite(d) & (d > 0)
    denominator = np.sum(v[finite] ** 2 / d[finite])
    if denominator <= 0:
        return float("inf")
    return float(total ** 2 / denominator)


def t_quantile(df, confidence):
    """Student's ``t_{(1+confidence)/2, df}``; the normal quantile for infinite df.

    ``scipy.special.stdtrit`` is ``scipy.stats.t.ppf`` without the per-call overhead.
    """
    level = 0.5 + confidence / 2.0
    return float(special.stdtrit(df, level)) if np.isfinite(df) else float(special.ndtri(level))


def t_interval(estimate, se, df, confidence):
    """``estimate ± t_{(1+confidence)/2, df} · se``, lower limit floored at 0.

    Counts cannot be negative, so a lower limit below 0 is reported as 0; this
    does not change the coverage.
    """
    if not np.isfinite(se):
        return float("nan"), float("nan")
    if se == 0:
        return float(estimate), float(estimate)
    q = t_quantile(df, confidence)
    return max(0.0, float(estimate - q * se)), float(estimate + q * se)


def lognormal_interval(estimate, cv, confidence, df=float("inf")):
    """Log-normal interval ``[N / C, N · C]`` with ``C = exp(t_df · √ln(1 + CV²))``.

    Buckland et al. (2001), §3.6.1: the quantile is Student's t with the
    estimate's degrees of freedom (Satterthwaite's, eq. 3.75 with detection),
    the normal quantile only for infinite df (Burnham et al. 1987). For an
    estimate of 0 the interval is [0, 0].
    """
    if estimate == 0:
        return 0.0, 0.0
    if not np.isfinite(cv) or np.isnan(df):
        return float("nan"), float("nan")
    c = math.exp(t_quantile(df, confidence) * math.sqrt(math.log1p(cv * cv)))
    return float(estimate / c), float(estimate * c)


def percentile_interval(replicates, confidence):
    """Bootstrap percentile interval, the ``(1 ∓ confidence)/2`` quantiles of the replicates.

    Efron & Tibshirani (1993), ch. 13. As for :func:`t_interval`, a lower limit
    below 0 (replicates of one-unit strata may go below 0) is reported as 0.
    NaN when a replicate is NaN (a stratum without variance).
    """
    replicates = np.asarray(replicates, dtype=float)
    if not np.all(np.isfinite(replicates)):
        return float("nan"), float("nan")
    lo, hi = np.quantile(replicates, [0.5 - confidence / 2.0, 0.5 + confidence / 2.0])
    return max(0.0, float(lo)), float(hi)


def poisson_upper_limit(exposure, confidence):
    """One-sided upper confidence limit of a Poisson rate after a count of 0.

    A count of 0 in an exposure ``E`` (surveyed area per unit of expansion)
    bounds the rate by ``−ln(1 − confidence) / E``: the exact Poisson limit for
    x = 0 (Garwood 1936, Biometrika 28:437–442), about ``3 / E`` at 95 %.
    """
    return -math.log(1.0 - confidence) / exposure if exposure > 0 else float("nan")


def detection_corrected(estimate, variance, p, p_se):
    """Divide by the detection probability and add its squared CV (delta method).

    ``N' = N / p`` and ``CV²(N') = CV²(N) + CV²(p)`` (Seber 1982, §1.3.3), so
    ``v(N') = v(N) / p² + N'² (se_p / p)²``.

    Returns
    -------
    (float, float)
        The corrected estimate and its variance.
    """
    corrected = estimate / p
    return corrected, variance / p ** 2 + corrected ** 2 * (p_se / p) ** 2


def detection_df(cv_count, df_count, cv_p, df_p):
    """Degrees of freedom of a count estimate divided by an estimated p.

    ``ν = CV⁴ / (CV_n⁴ / ν_n + CV_p⁴ / ν_p)`` with ``CV² = CV_n² + CV_p²``
    (Buckland et al. 2001, eq. 3.75, Satterthwaite's rule); ``ν_p`` infinite
    (0 or inf given) when p is treated as known.
    """
    cv2 = cv_count ** 2 + cv_p ** 2
    terms = [(cv_count, df_count), (cv_p, df_p if df_p and df_p > 0 else float("inf"))]
    denominator = sum(c ** 4 / d for c, d in terms if c > 0 and np.isfinite(d) and d > 0)
    if any(c > 0 and not (d > 0) for c, d in terms):
        return float("nan")
    return float(cv2 ** 2 / denominator) if denominator > 0 else float("inf")


def neyman_sample_size(stratum_units, sd_units, target_variance, fpc=False):
    """Total sample size and its Neyman allocation for a target variance of the total.

    With ``M_h`` units in stratum *h* and standard deviation ``S_h`` per unit,
    Neyman allocation ``n_h = n M_h S_h / Σ M_k S_k`` (Neyman 1934) reaches the
    variance V of the estimated total with
    ``n = (Σ M_h S_h)² / (V + Σ M_h S_h²)`` (Cochran 1977, eq. 5.26; the second
    term of the denominator only with the finite-population correction).

    Returns
    -------
    (float, numpy.ndarray)
        The total n (not rounded) and the per-stratum n_h (not rounded).
    """
    m = np.asarray(stratum_units, dtype=float)
    s = np.asarray(sd_units, dtype=float)
    ms = m * s
    denominator = target_variance + (np.sum(m * s * s) if fpc else 0.0)
    n = np.sum(ms) ** 2 / denominator
    share = ms / np.sum(ms) if np.sum(ms) > 0 else np.full(m.size, 1.0 / m.size)
    return float(n), n * share


# --------------------------------------------------------------------------- input checks


def stratum_label(value):
    """The text form of a stratum id: ``3``, ``3.0`` and ``"3"`` are all ``"3"``."""
    if value is None:
        return None
    if isinstance(value, (bool, np.bool_)):
        return str(int(value))
    if isinstance(value, (int, np.integer)):
        return str(int(value))
    if isinstance(value, (float, np.floating)):
        if not np.isfinite(value):
            return None
        return str(int(value)) if float(value).is_integer() else repr(float(value))
    text = str(value).strip()
    return text if text else None


def stratum_labels(values):
    """Distinct :func:`stratum_label` values and, per unit, the index of its own.

    The labels are computed once per distinct value (ids repeat over thousands of
    units). Two distinct values may share a label (``3`` and ``3.0``).

    Returns
    -------
    (numpy.ndarray of object, numpy.ndarray of int)
    """
    values = np.asarray(values, dtype=object).ravel()
    _, first, inverse = np.unique(values.astype(str), return_index=True, return_inverse=True)
    labels = np.array([stratum_label(values[i]) for i in first] + [None], dtype=object)[:-1]
    return labels, inverse.ravel()


def read_counts(counts, unit_ids, count_name="count"):
    """Counts as floats: ``None``/NaN are missing (not surveyed); others must be numbers ≥ 0.

    Raises
    ------
    InputError
        For non-numeric, infinite or negative counts, naming the unit ids.
    """
    raw = np.asarray(counts)
    if raw.dtype.kind in "biuf":
        values = raw.astype(float).ravel()
        bad = np.zeros(values.size, dtype=bool)
    else:
        raw = raw.astype(object).ravel()
        empty = np.equal(raw, None)
        filled = np.where(empty, np.nan, raw)
        try:
            values = filled.astype(float)  # numbers and numeric text, in one vectorised pass
            bad = np.zeros(raw.size, dtype=bool)
        except (TypeError, ValueError):
            values = np.full(raw.size, np.nan)
            bad = np.zeros(raw.size, dtype=bool)
            for i in np.flatnonzero(~empty):  # only to find the offending values
                try:
                    values[i] = float(raw[i])
                except (TypeError, ValueError):
                    bad[i] = True
    if bad.any():
        ids = unit_ids[bad]
        raise InputError(
            message(QT_TRANSLATE_NOOP("PlotwiseEngine",
                "The {count_name} field holds values that are not numbers for units {ids}. "
                "Enter a whole count (0 when surveyed and none seen) or leave the field empty (NULL) "
                "for units that were not surveyed."), count_name=count_name, ids=listed_ids(ids)),
            ids=ids,
        )
    infinite = np.isinf(values)
    negative = values < 0
    if (infinite | negative).any():
        ids = unit_ids[infinite | negative]
        raise InputError(
            message(QT_TRANSLATE_NOOP("PlotwiseEngine",
                "The {count_name} field holds negative or infinite counts for units {ids}. "
                "Counts must be 0 or more; correct them, or leave the field empty (NULL) if the unit "
                "was not surveyed."), count_name=count_name, ids=listed_ids(ids)),
            ids=ids,
        )
    return values


def surveyed_areas(geometries, area_values=None, fixed_area=0.0, strip_width=0.0):
    """The surveyed area of each unit (m² in, m² out), by the first rule that applies.

    1. ``area_values`` (e.g. the layout's ``area_m2``) when above 0;
    2. the polygon's own area;
    3. for lines, ``strip_width × length`` (a strip transect of that full width)
       when ``strip_width`` is above 0;
    4. ``fixed_area`` when above 0 (point stations, or lines of equal length).

    Returns
    -------
    numpy.ndarray
        NaN where no rule applies.
    """
    n = len(geometries)
    areas = np.full(n, np.nan)
    if area_values is not None:
        raw = np.asarray(area_values, dtype=object).ravel()
        numeric = np.array([isinstance(v, (int, float, np.integer, np.floating)) and not isinstance(v, bool)
                            for v in raw], dtype=bool)
        values = np.where(numeric, raw, np.nan).astype(float)
        areas = np.where(values > 0, values, np.nan)
    kinds = np.array([g.geom_type if g is not None and not g.is_empty else "" for g in geometries], dtype=object)
    polygonal = np.isin(kinds, ["Polygon", "MultiPolygon"])
    linear = np.isin(kinds, ["LineString", "MultiLineString"])
    need = np.isnan(areas)
    for i in np.flatnonzero(need & polygonal):
        areas[i] = geometries[i].area
    if strip_width > 0:
        for i in np.flatnonzero(need & linear):
            areas[i] = strip_width * geometries[i].length
    if fixed_area > 0:
        areas = np.where(np.isnan(areas) | (areas <= 0), fixed_area, areas)
    areas[~(areas > 0)] = np.nan
    return areas


# --------------------------------------------------------------------------- the frame


@dataclass(frozen=True)
class StrataFrame:
    """The strata the estimate speaks for: one polygon and one area per stratum id.

    Attributes
    ----------
    geometries : dict
        Stratum label → its polygons dissolved into one (Multi)Polygon (CRS units).
    areas : dict
        Stratum label → area in the caller's area unit.
    overlaps : tuple of (str, str, float)
        Pairs of strata whose polygons overlap, with the area they share (area unit).
    overlap_area : float
        The area counted in more than one stratum, ``Σ A_h − A(∪ strata)`` (area unit).
    unlabelled_ids : tuple
        Feature ids of the polygons without a stratum id, which were left out.
    unlabelled_area : float
        The area that left the frame with them (the part no other stratum covers).
    warnings : tuple of Message
    """

    geometries: dict
    areas: dict
    overlaps: tuple = ()
    overlap_area: float = 0.0
    unlabelled_ids: tuple = ()
    unlabelled_area: float = 0.0
    warnings: tuple = ()




def frame_strata(stratum_ids, geometries, feature_ids=None, *, m2_per_unit=1.0, unit="m²", layer="", field="",
                 drop_unlabelled=False):
    """The frame's strata from the strata polygons, checked for overlaps and missing ids.

    Polygons with the same id are one stratum (dissolved, so they may overlap
    each other). The estimate speaks for the land the strata cover, and
    ``N = Σ D_h A_h`` (Cochran 1977, ch. 5) holds only when the strata do not
    overlap: land in two strata would be counted twice. So:

    * two strata that share more than ``OVERLAP_ERROR_SHARE`` of the smaller
      one are an error; a smaller overlap (digitising noise) is a warning. The
      rule and the overlap test (:func:`geometry.overlapping_pairs`, overlaps
      of ``SLIVER_AREA`` m² or more) are the layout's, so that strata accepted
      for the layout are accepted here. Both name the pairs of strata, the area
      each pair shares and the area counted twice, ``Σ A_h − A(∪ strata)``;
    * a polygon whose id is empty (NULL) belongs to no stratum, so its land
      would leave the frame unseen. That is an error naming the feature ids,
      unless ``drop_unlabelled`` (the caller's choice to leave out strata with no
      surveyed unit: the frame then shrinks), or unless other strata cover it
      (less than ``SLIVER_AREA`` m² is left); then a warning.

    Parameters
    ----------
    stratum_ids : sequence
        Stratum id of each polygon (compared as text, see :func:`stratum_label`).
    geometries : sequence of Polygon or MultiPolygon
        In a projected CRS in metres.
    feature_ids : sequence, optional
        Ids named in messages (default 0..n−1).
    m2_per_unit : float
        Square metres per area unit of the result (1e4 for hectares, 1e6 for km²).
    unit : str
        The area unit's symbol, for messages.
    layer, field : str
        The strata layer and its id field, for messages.
    drop_unlabelled : bool

    Returns
    -------
    StrataFrame

    Raises
    ------
    InputError
        For overlapping strata or polygons without an id, as above.
    """
    geometries = list(geometries)
    feature_ids = list(range(len(geometries))) if feature_ids is None else list(feature_ids)
    parts, unlabelled, unlabelled_ids = {}, [], []
    for value, geometry, fid in zip(stratum_ids, geometries, feature_ids):
        if geometry is None or geometry.is_empty:
            continue
        label = stratum_label(value)
        if label is None:
            unlabelled.append(geometry)
            unlabelled_ids.append(fid)
        else:
            parts.setdefault(label, []).append(geometry)
    order = sorted(parts, key=natural_key)
    merged = {k: polygonal_part(parts[k][0] if len(parts[k]) == 1 else unary_union(parts[k])) for k in order}
    context = dict(layer=layer, field=field, m2_per_unit=m2_per_unit, unit=unit)
    lost_m2, warnings = _unlabelled_polygons(merged, unlabelled, unlabelled_ids, drop_unlabelled, **context)
    if not merged:
        raise InputError(
            message(QT_TRANSLATE_NOOP("PlotwiseEngine",
                "Layer '{layer}': no polygon has a stratum id in the field '{field}'. Fill in the stratum ids, "
                "or choose the field that holds them."), layer=layer, field=field),
            ids=unlabelled_ids,
        )
    overlaps, overlap_m2, overlap_warnings = _overlapping_strata(order, merged, **context)
    return StrataFrame(
        geometries=merged,
        areas={k: float(g.area) / m2_per_unit for k, g in merged.items()},
        overlaps=overlaps,
        overlap_area=overlap_m2 / m2_per_unit,
        unlabelled_ids=tuple(unlabelled_ids),
        unlabelled_area=lost_m2 / m2_per_unit,
        warnings=tuple(warnings + overlap_warnings),
    )


def _unlabelled_polygons(merged, unlabelled, unlabelled_ids, drop_unlabelled, *, layer, field, m2_per_unit, unit):
    """The area that polygons without a stratum id take from the frame: an error, or a warning (see above)."""
    if not unlabelled:
        return 0.0, []
    lost = unary_union(unlabelled)
    if merged:
        lost = lost.difference(unary_union(list(merged.values())))
    lost_m2 = float(lost.area)
    values = dict(layer=layer, field=field, ids=listed_ids(unlabelled_ids), area=lost_m2 / m2_per_unit, unit=unit)
    if lost_m2 >= SLIVER_AREA and not drop_unlabelled:
        raise InputError(
            message(QT_TRANSLATE_NOOP("PlotwiseEngine",
                "Layer '{layer}': the stratum id field '{field}' is empty (NULL) for feature id(s) {ids}. "
                "These polygons cover {area:.4g} {unit} that no stratum covers, so the estimate would "
                "silently speak for a smaller frame. Give each polygon the id of its stratum, delete the "
                "polygons that are not part of the frame, or choose to leave out strata with no surveyed "
                "unit (the frame then shrinks)."), **values),
            ids=unlabelled_ids,
        )
    return lost_m2, [message(
        QT_TRANSLATE_NOOP("PlotwiseEngine",
            "Layer '{layer}': the stratum id field '{field}' is empty (NULL) for feature id(s) {ids}. These "
            "polygons were left out, and the frame shrank by the {area:.4g} {unit} of them that no stratum covers. "
            "To keep them in the frame, give each polygon the id of its stratum."), **values)]


def _overlapping_strata(order, merged, *, layer, field, m2_per_unit, unit):
    """Pairs of overlapping strata, the area counted twice, and the warning (an error beyond a trace)."""
    shapes = [merged[k] for k in order]
    pairs = overlapping_pairs(shapes)
    if not pairs:
        return (), 0.0, []
    overlaps = tuple((order[i], order[j], shared / m2_per_unit) for i, j, shared in pairs)
    covered_m2 = float(unary_union(shapes).area)
    overlap_m2 = max(sum(float(g.area) for g in shapes) - covered_m2, 0.0)  # land in three strata counts twice over
    listed = listed_overlaps(order, pairs, m2_per_unit, unit, limit=MAX_LISTED_IDS)
    values = dict(layer=layer, pairs=listed, area=overlap_m2 / m2_per_unit, unit=unit,
                  percent=100.0 * overlap_m2 / covered_m2, covered=covered_m2 / m2_per_unit)
    if worst_overlap_share(shapes, pairs) > OVERLAP_ERROR_SHARE:
        raise InputError(
            message(QT_TRANSLATE_NOOP("PlotwiseEngine",
                "Layer '{layer}': the strata overlap: {pairs}. In all, {area:.4g} {unit} "
                "({percent:.3g} % of the {covered:.4g} {unit} the strata cover) would be counted in more "
                "than one stratum, which inflates the frame area and the abundance. Fix the strata polygons "
                "so that they do not overlap: each piece of land belongs to one stratum only (cut each "
                "overlap out of all strata but one, or redraw the shared edges)."), **values),
            ids=sorted({k for pair in overlaps for k in pair[:2]}, key=natural_key),
        )
    return overlaps, overlap_m2, [message(
        QT_TRANSLATE_NOOP("PlotwiseEngine",
            "Layer '{layer}': the strata overlap: {pairs}. In all, {area:.4g} {unit} ({percent:.3g} % of the "
            "{covered:.4g} {unit} the strata cover) is counted in more than one stratum, so the frame area and the "
            "abundance are slightly too large. Fix the strata polygons so that they do not overlap (snap the shared "
            "edges, or cut each overlap out of all strata but one)."), **values)]


# --------------------------------------------------------------------------- the estimator: checked input


@dataclass(frozen=True)
class EstimateSettings:
    """The choices of :func:`estimate_density`, checked."""

    confidence: float
    ci_method: str
    variance_method: str
    fpc: bool
    detection_p: float
    detection_se: float
    detection_df: float
    presence: bool
    target_cv: object
    n_bootstrap: int


@dataclass(frozen=True, eq=False)
class EstimateInput:
    """The input of :func:`estimate_density` after :func:`_estimate_iv`: the surveyed units that enter.

    Per unit: counts ``y``, areas ``a`` (area unit), stratum index ``code``
    (0..H−1) and positions ``xy`` (or None). Per stratum (in ``labels`` order):
    the stratum area ``area_h``, the area the counts expand to ``expansion_h``
    (``A⁺_h`` under plus sampling), whether the finite-population correction
    applies ``fpc_h``, and the units without a count ``missing_h``.
    """

    y: np.ndarray
    a: np.ndarray
    code: np.ndarray
    xy: object
    labels: tuple
    area_h: np.ndarray
    expansion_h: np.ndarray
    fpc_h: np.ndarray
    missing_h: np.ndarray
    settings: EstimateSettings
    neighbours: dict
    warnings: tuple
    missing_ids: tuple = ()
    dropped: tuple = ()
    dropped_area: float = 0.0
    fpc_refused: tuple = ()
    fpc_assumed: bool = False
    edge: str = ""
    unused_reserves: int = 0


def _settings_iv(confidence, ci_method, variance_method, fpc, detection_p, detection_se, detection_df, presence,
                 target_cv, n_bootstrap):
    if not 0.0 < confidence < 1.0:
        raise InputError(message(QT_TRANSLATE_NOOP("PlotwiseEngine",
            "The confidence level must lie between 0 and 1 (got {confidence}); use e.g. 0.95."),
                                 confidence=confidence))
    if ci_method not in CI_METHODS:
        raise InputError(message(QT_TRANSLATE_NOOP("PlotwiseEngine",
            "Unknown interval method {method!r}; use one of {methods}."), method=ci_method,
                                 methods=", ".join(CI_METHODS)))
    if variance_method not in VARIANCE_METHODS:
        raise InputError(message(QT_TRANSLATE_NOOP("PlotwiseEngine",
            "Unknown variance method {method!r}; use one of {methods}."), method=variance_method,
                                 methods=", ".join(VARIANCE_METHODS)))
    if not (0.0 < detection_p <= 1.0):
        raise InputError(message(QT_TRANSLATE_NOOP("PlotwiseEngine",
            "The detection probability must lie in (0, 1] (got {p})."), p=detection_p))
    if detection_se is None or detection_se < 0:
        raise InputError(message(QT_TRANSLATE_NOOP("PlotwiseEngine",
            "The standard error of the detection probability must be 0 or more.")))
    df_p = float(detection_df) if detection_df is not None else 0.0
    if df_p < 0 or np.isnan(df_p):
        raise InputError(message(QT_TRANSLATE_NOOP("PlotwiseEngine",
            "The degrees of freedom of the detection estimate must be 0 (known p) or more.")))
    return EstimateSettings(
        confidence=float(confidence), ci_method=ci_method, variance_method=variance_method, fpc=bool(fpc),
        detection_p=float(detection_p), detection_se=float(detection_se), detection_df=df_p if df_p > 0 else math.inf,
        presence=bool(presence), target_cv=target_cv if target_cv is not None and target_cv > 0 else None,
        n_bootstrap=max(int(n_bootstrap), MIN_BOOTSTRAP))


def _units_iv(counts, unit_areas, strata, unit_ids, roles, layer):
    """Per-unit arrays; unused reserves (role reserve, no count) dropped quietly; missing counts listed."""
    strata_in = np.asarray(strata, dtype=object).ravel()
    n_all = strata_in.size
    ids = np.arange(n_all) if unit_ids is None else np.asarray(unit_ids, dtype=object).ravel()
    if ids.size != n_all:
        raise InputError(message(QT_TRANSLATE_NOOP("PlotwiseEngine", "unit_ids must have one id per unit.")))
    y = read_counts(counts, ids)
    a = np.asarray(unit_areas, dtype=float).ravel()
    if y.size != n_all or a.size != n_all:
        raise InputError(message(QT_TRANSLATE_NOOP("PlotwiseEngine",
            "counts, unit_areas and strata must have one value per unit.")))
    unused = np.zeros(n_all, dtype=bool)
    if roles is not None:
        role = np.array([str(r).strip().lower() if r is not None else "" for r in roles], dtype=object)
        unused = (role == RESERVE_ROLE) & np.isnan(y)
    missing = np.isnan(y) & ~unused
    warnings = []
    if missing.any():
        warnings.append(message(
            QT_TRANSLATE_NOOP("PlotwiseEngine",
                "{n} unit(s) have no count and are treated as not surveyed (non-response): {ids}."),
            n=int(missing.sum()), ids=listed_ids(ids[missing])))
    surveyed = ~np.isnan(y)
    if not surveyed.any():
        raise InputError(message(
            QT_TRANSLATE_NOOP("PlotwiseEngine",
                "No unit has a count, so nothing can be estimated. Enter the counts of the surveyed units "
                "(0 when none was seen) in the count field.")
        ))
    bad_units = surveyed & ~(np.isfinite(a) & (a > 0))
    if bad_units.any():
        raise InputError(
            message(QT_TRANSLATE_NOOP("PlotwiseEngine",
                "Layer '{layer}': units {ids} have no surveyed area. Point units need the unit area field "
                "(area_m2 above 0) or a fixed unit area (m²); line units the area field, a strip width or a "
                "fixed unit area; polygons use their own area."), layer=layer, ids=listed_ids(ids[bad_units])),
            ids=ids[bad_units],
        )
    return ids, y, a, strata_in, unused, warnings


def _frame_areas(stratum_areas):
    frame = {}
    for key, area in dict(stratum_areas).items():
        label = stratum_label(key)
        frame[label] = frame.get(label, 0.0) + float(area)
    bad_area = [k for k, v in frame.items() if not (np.isfinite(v) and v > 0)]
    if bad_area:
        raise InputError(
            message(QT_TRANSLATE_NOOP("PlotwiseEngine",
                "Strata {ids} have no area. Check the strata layer's geometries."), ids=listed_ids(bad_area)),
            ids=bad_area,
        )
    return frame


def _stratum_codes(strata_in, ids, frame, surveyed, missing, drop_empty):
    """Stratum index per unit (−1: not entering), the strata that enter, and the strata left out."""
    unique_labels, label_index = stratum_labels(strata_in)
    no_stratum = np.equal(unique_labels, None)[label_index]
    if no_stratum.any():
        raise InputError(
            message(QT_TRANSLATE_NOOP("PlotwiseEngine",
                "Units {ids} have no stratum (the stratum field is empty). Fill in their "
                "stratum, or leave the stratum field out to treat the frame as one stratum."),
                    ids=listed_ids(ids[no_stratum])),
            ids=ids[no_stratum],
        )
    unknown_labels = np.array([lab not in frame for lab in unique_labels], dtype=bool)
    unknown = unknown_labels[label_index]
    if unknown.any():
        names = sorted((str(lab) for lab in unique_labels[unknown_labels]), key=natural_key)
        raise InputError(
            message(QT_TRANSLATE_NOOP("PlotwiseEngine",
                "Units {ids} have stratum ids ({names}) that are not in the strata layer. "
                "Check the stratum field of the units and the id field of the strata layer."),
                    ids=listed_ids(ids[unknown]), names=listed_ids(names)),
            ids=ids[unknown],
        )
    all_labels = sorted(frame, key=natural_key)
    n_per, missing_per = {lab: 0 for lab in all_labels}, {lab: 0 for lab in all_labels}
    surveyed_per_label = np.bincount(label_index[surveyed], minlength=unique_labels.size)
    missing_per_label = np.bincount(label_index[missing], minlength=unique_labels.size)
    for lab, n_s, n_m in zip(unique_labels, surveyed_per_label, missing_per_label):  # distinct ids only
        n_per[lab] += int(n_s)
        missing_per[lab] += int(n_m)
    empty = [lab for lab in all_labels if n_per[lab] == 0]
    warnings = []
    if empty:
        if not drop_empty:
            raise InputError(
                message(QT_TRANSLATE_NOOP("PlotwiseEngine",
                    "No unit of strata {ids} was surveyed, so their abundance cannot be estimated. "
                    "Survey units there, or choose to leave these strata out (the estimate then covers a "
                    "smaller frame)."), ids=listed_ids(empty)),
                ids=empty,
            )
        warnings.append(message(
            QT_TRANSLATE_NOOP("PlotwiseEngine",
                "Strata {ids} had no surveyed unit and were left out: the frame shrank by "
                "{dropped_area:.6g} area units, and the estimate covers the remaining strata only."),
            ids=listed_ids(empty), dropped_area=float(sum(frame[lab] for lab in empty))))
    labels = tuple(lab for lab in all_labels if n_per[lab] > 0)
    code_of = {lab: h for h, lab in enumerate(labels)}
    code = np.array([code_of.get(lab, -1) for lab in unique_labels], dtype=int)[label_index]
    return code, labels, np.array([missing_per[lab] for lab in labels], dtype=int), tuple(empty), warnings


def _presence_iv(settings, y, ids):
    """Presence data must be 0 or 1; p is not applied to them. Without presence, a hint when every count is 0/1."""
    if not settings.presence:
        numeric = y[np.isfinite(y)]
        if numeric.size >= MIN_UNITS_FOR_PRESENCE_HINT and np.all((numeric == 0) | (numeric == 1)) and (
                numeric == 1).any():
            return settings, [message(
                QT_TRANSLATE_NOOP("PlotwiseEngine",
                    "Every count is 0 or 1. If the field records presence/absence, run again with the presence "
                    "option: the result is then the proportion of units occupied (naive occupancy)."))]
        return settings, []
    odd = np.isfinite(y) & (y != 0) & (y != 1)
    if odd.any():
        raise InputError(
            message(QT_TRANSLATE_NOOP("PlotwiseEngine",
                "Presence data must be 0 or 1; units {ids} hold other values. "
                "Use the counts without the presence option, or recode the field."), ids=listed_ids(ids[odd])),
            ids=ids[odd],
        )
    warnings = []
    if settings.detection_p < 1.0 or settings.detection_se > 0:
        warnings.append(message(
            QT_TRANSLATE_NOOP("PlotwiseEngine",
                "The detection probability was not applied to presence data: dividing a proportion of "
                "occupied units by p is not an occupancy correction, which needs repeat visits.")
        ))
    return replace(settings, detection_p=1.0, detection_se=0.0, detection_df=math.inf), warnings


def _fpc_by_stratum(settings, labels, code, designs):
    """Where the finite-population correction applies: asked for, and the units cannot overlap.

    Returns the per-stratum switch, the strata where it was refused (some unit
    records a design whose units may overlap, :func:`edge.fpc_holds`), whether
    it was applied to units without a record (an assumption), and warnings.
    """
    n_strata = len(labels)
    if not settings.fpc:
        return np.zeros(n_strata, dtype=bool), (), False, []
    if designs is None:
        return np.ones(n_strata, dtype=bool), (), True, []
    holds = np.array([edge.fpc_holds(d) for d in designs], dtype=object)
    refused_h = np.zeros(n_strata, dtype=bool)
    recorded_h = np.zeros(n_strata, dtype=bool)
    np.logical_or.at(refused_h, code, holds == False)  # noqa: E712 (an object array of True/False/None)
    np.logical_or.at(recorded_h, code, holds != None)  # noqa: E711
    refused = tuple(lab for lab, r in zip(labels, refused_h) if r)
    warnings = []
    if refused:
        records = sorted({str(d) for d, h in zip(designs, holds) if h is False})
        warnings.append(message(
            QT_TRANSLATE_NOOP("PlotwiseEngine",
                "The finite-population correction was not applied in strata {ids}: their units come from a design "
                "whose units may overlap ({records}: simple random centres, or a grid denser than the units). Their "
                "possible positions form a continuous population, which has no such correction (Cordy 1993); "
                "applying it would make the interval too narrow. A layout with MIN_SPACING of at least the unit's "
                "width, a systematic grid or a spatially balanced layout keeps the units apart."),
            ids=listed_ids(refused), records=", ".join(records)))
    assumed = bool(np.any(~refused_h & ~recorded_h))
    return ~refused_h, refused, assumed, warnings


def _expansion_by_stratum(labels, frame, expansion_areas):
    """``A⁺_h`` for each stratum (its own area where none is given); an error where it is below ``A_h``."""
    given = {stratum_label(k): float(v) for k, v in dict(expansion_areas or {}).items()}
    out = np.array([given.get(lab, frame[lab]) for lab in labels], dtype=float)
    area = np.array([frame[lab] for lab in labels])
    small = [lab for lab, e, a in zip(labels, out, area) if not e >= a * (1 - 1e-9)]
    if small:
        raise InputError(message(QT_TRANSLATE_NOOP("PlotwiseEngine",
            "The expansion area of strata {ids} is smaller than the stratum: the plus region "
            "holds the stratum. Check the units' edge record."), ids=listed_ids(small)), ids=small)
    return out


def _inclusion_warnings(incl_p, labels, code):
    """A warning when inclusion probabilities differ within a stratum (the estimator assumes equal ones)."""
    if incl_p is None:
        return []
    incl = np.array([v if isinstance(v, (int, float, np.integer, np.floating)) and not isinstance(v, bool)
                     else np.nan for v in incl_p], dtype=float)
    uneven = []
    for h, label in enumerate(labels):  # a loop over strata (tens)
        values = incl[(code == h) & np.isfinite(incl)]
        if values.size > 1 and values.max() > UNEVEN_INCLUSION * values.min():
            uneven.append(label)
    if not uneven:
        return []
    return [message(QT_TRANSLATE_NOOP("PlotwiseEngine",
        "In strata {ids} the units' inclusion probabilities (incl_p) differ. This estimator assumes "
        "equal chances within a stratum; check the design the units came from."), ids=listed_ids(uneven))]


def _positions_iv(settings, coords, n_all, keep, ids):
    if settings.variance_method not in LOCAL_METHODS:
        return None
    if coords is None:
        raise InputError(message(QT_TRANSLATE_NOOP("PlotwiseEngine",
            "The local neighbourhood variance needs the positions of the units.")))
    xy = np.asarray(coords, dtype=float).reshape(n_all, 2)[keep]
    unplaced = ~np.isfinite(xy).all(axis=1)
    if unplaced.any():
        raise InputError(
            message(QT_TRANSLATE_NOOP("PlotwiseEngine",
                "Units {ids} have no position, so the local neighbourhood variance "
                "cannot use them. Give their locations, or use the simple random sampling formula."),
                    ids=listed_ids(ids[keep][unplaced])),
            ids=ids[keep][unplaced],
        )
    return xy


def _neighbour_codes(neighbours, labels):
    """Stratum id → partner (or candidates) as stratum indices of the strata that enter."""
    code_of = {lab: h for h, lab in enumerate(labels)}
    out = {}
    for k, v in dict(neighbours or {}).items():
        if stratum_label(k) not in code_of:
            continue
        if isinstance(v, (list, tuple, set, np.ndarray)):
            out[code_of[stratum_label(k)]] = [code_of[stratum_label(c)] for c in v if stratum_label(c) in code_of]
        elif stratum_label(v) in code_of:
            out[code_of[stratum_label(k)]] = code_of[stratum_label(v)]
    return out


def _estimate_iv(counts, unit_areas, strata, stratum_areas, *, unit_ids, settings, coords, drop_empty_strata,
                 neighbours, roles, designs, edges, incl_p, expansion_areas, layer):
    """Check everything and return the :class:`EstimateInput` of the units that enter."""
    ids, y_all, a_all, strata_in, unused, warnings = _units_iv(counts, unit_areas, strata, unit_ids, roles, layer)
    frame = _frame_areas(stratum_areas)
    missing = np.isnan(y_all) & ~unused
    surveyed = ~np.isnan(y_all)
    code_all, labels, missing_h, empty, drop_warnings = _stratum_codes(
        strata_in[~unused], ids[~unused], frame, surveyed[~unused], missing[~unused], drop_empty_strata)
    full_code = np.full(y_all.size, -1)
    full_code[~unused] = code_all
    keep = surveyed & (full_code >= 0)
    settings, presence_warnings = _presence_iv(settings, y_all[keep], ids[keep])
    code = full_code[keep]
    fpc_h, refused, assumed, fpc_warnings = _fpc_by_stratum(
        settings, labels, code, None if designs is None else np.asarray(designs, dtype=object).ravel()[keep])
    protocols = [] if edges is None else sorted({str(e) for e in np.asarray(edges, dtype=object).ravel()[keep] if e})
    return EstimateInput(
        y=y_all[keep], a=a_all[keep], code=code, xy=_positions_iv(settings, coords, y_all.size, keep, ids),
        labels=labels, area_h=np.array([frame[lab] for lab in labels]),
        expansion_h=_expansion_by_stratum(labels, frame, expansion_areas), fpc_h=fpc_h, missing_h=missing_h,
        settings=settings, neighbours=_neighbour_codes(neighbours, labels),
        warnings=tuple(warnings + drop_warnings + presence_warnings + fpc_warnings
                       + _inclusion_warnings(None if incl_p is None else np.asarray(incl_p, dtype=object)[keep],
                                             labels, code)),
        missing_ids=tuple(ids[missing].tolist()), dropped=empty,
        dropped_area=float(sum(frame[lab] for lab in empty)), fpc_refused=refused, fpc_assumed=assumed and settings.fpc,
        edge="/".join(protocols), unused_reserves=int(unused.sum()))


# --------------------------------------------------------------------------- the estimator: computation


@dataclass(frozen=True, eq=False)
class StratumSums:
    """Per stratum: units ``n``, sums of counts and areas, the ratio ``Σy/Σa``, the size counts expand to.

    ``size`` is ``A⁺_h`` (``A_h`` without plus sampling), or with presence data
    the number of units the stratum holds, ``A⁺_h / ā_h``; ``resid`` are the
    per-unit ratio residuals ``y − (Σy/Σa) a`` and ``s2`` their variance.
    """

    n: np.ndarray
    sum_y: np.ndarray
    sum_a: np.ndarray
    mean_a: np.ndarray
    ratio: np.ndarray
    mean_c: np.ndarray
    sd_c: np.ndarray
    size: np.ndarray
    resid: np.ndarray
    s2: np.ndarray
    one_minus_f: np.ndarray


def stratum_sums(inp):
    """:class:`StratumSums` of the checked input (two passes: exact residuals)."""
    n_strata, code, y = len(inp.labels), inp.code, inp.y
    n_h = np.bincount(code, minlength=n_strata)
    sum_y = np.bincount(code, y, minlength=n_strata)
    mean_a = np.bincount(code, inp.a, minlength=n_strata) / n_h
    size = inp.expansion_h.copy()
    a = inp.a
    if inp.settings.presence:  # a proportion of units: every unit weighs 1, and the stratum holds A / ā units
        size = size / mean_a
        a = np.ones_like(a)
        mean_a = np.ones(n_strata)
    sum_a = np.bincount(code, a, minlength=n_strata)
    ratio = sum_y / sum_a
    mean_c = sum_y / n_h
    sd_c = np.sqrt(np.bincount(code, (y - mean_c[code]) ** 2, minlength=n_strata) / np.maximum(n_h - 1, 1))
    sd_c[n_h < 2] = np.nan
    fraction = sum_a / size
    if np.any(inp.fpc_h & (fraction > 1 + 1e-9)):
        over = [inp.labels[h] for h in np.flatnonzero(inp.fpc_h & (fraction > 1 + 1e-9))]
        raise InputError(
            message(QT_TRANSLATE_NOOP("PlotwiseEngine",
                "In strata {ids} the surveyed area exceeds the stratum area. Check the unit areas "
                "and the area unit, or switch off the finite-population correction."), ids=listed_ids(over)),
            ids=over,
        )
    resid = y - ratio[code] * a
    s2 = np.where(n_h > 1, np.bincount(code, resid ** 2, minlength=n_strata) / np.maximum(n_h - 1, 1), np.nan)
    one_minus_f = np.where(inp.fpc_h, np.clip(1.0 - fraction, 0.0, None), 1.0)
    return StratumSums(n_h, sum_y, sum_a, mean_a, ratio, mean_c, sd_c, size, resid, s2, one_minus_f)


@dataclass(frozen=True, eq=False)
class CountVariances:
    """Variance of each stratum's ratio ``Σy/Σa`` and how the strata combine.

    ``var`` per stratum (the finite-population correction included); ``df`` and
    ``component`` give each stratum's Satterthwaite component (the two strata of
    a pair of one-unit strata share one, with 1 df); ``local`` marks strata
    whose variance is the local neighbourhood estimator; ``srs_var`` is the
    simple random sampling formula's value, for the bootstrap's scale.
    """

    var: np.ndarray
    srs_var: np.ndarray
    df: np.ndarray
    component: np.ndarray
    local: np.ndarray
    groups: object
    warnings: tuple


def count_variances(inp, sums):
    """The variance of every stratum's ratio, one-unit strata and local neighbourhoods included."""
    n_h, n_strata = sums.n, len(inp.labels)
    srs_var = sums.one_minus_f * sums.s2 / (n_h * sums.mean_a ** 2)
    var, df = srs_var.copy(), (n_h - 1).astype(float)
    local = np.zeros(n_strata, dtype=bool)
    warnings = []
    if inp.settings.variance_method in LOCAL_METHODS:
        scaled = inp.settings.variance_method == VARIANCE_LOCAL_SCALED
        for h in np.flatnonzero(n_h >= 3):  # a loop over strata (tens)
            inside = inp.code == h
            result = local_neighbourhood_variance(sums.resid[inside] / sums.sum_a[h], inp.xy[inside])
            value = result.scaled if scaled else result.variance
            var[h], df[h], local[h] = sums.one_minus_f[h] * value, result.df, True
        if not local.all():
            rest = [lab for lab, used in zip(inp.labels, local) if not used]
            warnings.append(message(
                QT_TRANSLATE_NOOP("PlotwiseEngine",
                    "Strata {ids} have fewer than 3 units: their variance uses the simple random sampling formula."),
                ids=listed_ids(rest)))
    groups = collapse_single_unit_strata(n_h, neighbours=inp.neighbours)
    component = groups.group.copy() if n_strata else np.zeros(0, dtype=int)
    singles = np.flatnonzero(n_h == 1)
    if singles.size and n_strata >= 2:
        var = single_unit_variance(sums.ratio, var, sums.s2, sums.mean_a, sums.size, groups) * np.where(
            n_h == 1, sums.one_minus_f, 1.0)
        df[singles] = 1.0
        partner = groups.partner
        mutual = (partner >= 0) & (partner[np.maximum(partner, 0)] == np.arange(n_strata))
        component = np.where(mutual, np.minimum(np.arange(n_strata), np.maximum(partner, 0)), np.arange(n_strata))
        pairs = tuple(
            (f"s{i}", message(QT_TRANSLATE_NOOP("PlotwiseEngine", "{label} (one unit) with {other}"),
                              label=inp.labels[h], other=inp.labels[partner[h]]))
            for i, h in enumerate(singles))
        listed = Message("; ".join("{%s}" % name for name, _ in pairs), pairs)  # a list: no words of its own
        warnings.append(message(
            QT_TRANSLATE_NOOP("PlotwiseEngine",
                "Strata {groups}: a stratum with one surveyed unit takes its variance from the collapsed-strata "
                "pairs formula with its partner (Cochran 1977, §5A.12; Hansen, Hurwitz & Madow weights for unequal "
                "sizes), which counts the difference between the two strata as variance and so tends to be too "
                "large; the partner keeps its own variance."), groups=listed))
    elif singles.size:
        warnings.append(message(
            QT_TRANSLATE_NOOP("PlotwiseEngine",
                "The only stratum has one surveyed unit: no variance, standard error or interval can be "
                "estimated. Survey at least two units.")
        ))
    _, component = np.unique(component, return_inverse=True)
    return CountVariances(var, srs_var, df, component, local, groups, tuple(warnings))


def _with_detection(settings, estimate, variance, df_count):
    """Divide by p, add its CV (Seber 1982) and combine the degrees of freedom (Buckland et al. 2001, eq. 3.75)."""
    p, p_se = settings.detection_p, settings.detection_se
    corrected, var_corrected = detection_corrected(estimate, variance, p, p_se)
    if not np.isfinite(var_corrected):
        return corrected, var_corrected, float("nan"), float("nan")
    cv = math.sqrt(var_corrected) / corrected if corrected > 0 else float("nan")
    if p_se > 0 and corrected > 0:
        cv_count = math.sqrt(variance) / estimate if estimate > 0 else 0.0
        return corrected, var_corrected, cv, detection_df(cv_count, df_count, p_se / p, settings.detection_df)
    return corrected, var_corrected, cv, df_count


def _zero_count_limit(settings, exposure, n_units):
    """Upper limit of the abundance after counts of 0 only (before the division by p).

    Counts: ``−ln(1 − confidence) / E`` with the exposure ``E`` (Garwood 1936);
    presence data: the exact binomial limit ``1 − (1 − confidence)^(1/n)`` of a
    proportion after 0 detections in n units (Clopper & Pearson 1934), times the
    units the stratum holds (``exposure`` is then ``1 / units``).
    """
    if settings.presence:
        return (1.0 - (1.0 - settings.confidence) ** (1.0 / n_units)) / exposure
    return poisson_upper_limit(exposure, settings.confidence)


def _interval(settings, abund, se, cv, df, replicates):
    if settings.ci_method == CI_T:
        return t_interval(abund, se, df, settings.confidence)
    if settings.ci_method == CI_LOGNORMAL:
        return lognormal_interval(abund, cv, settings.confidence, df)
    return percentile_interval(replicates, settings.confidence)


def _row(settings, label, area, n, n_missing, mean_c, sd_c, count_total, count_var, df_count, replicates, *,
         zero_limit=None, expansion=float("nan"), collapsed=(), local=False, per=None):
    """One :class:`StratumEstimate` from the count estimate, its variance and df (detection applied here).

    Density is abundance per ``area``, or per ``per`` when given (presence data: per unit the stratum holds).
    """
    abund, var, cv, df = _with_detection(settings, count_total, count_var, df_count)
    se = math.sqrt(var) if np.isfinite(var) else float("nan")
    if zero_limit is not None:  # every count 0: one-sided, from 0 to the Poisson (binomial) limit
        lo, hi, cv, df = 0.0, zero_limit / settings.detection_p, float("nan"), float("nan")
    else:
        lo, hi = _interval(settings, abund, se, cv, df, replicates)
    per = float(area if per is None else per)
    return StratumEstimate(
        stratum=label, area=float(area), n=int(n), n_missing=int(n_missing), mean_c=float(mean_c),
        sd_c=float(sd_c), dens=float(abund / per), dens_se=se / per, dens_lo=lo / per, dens_hi=hi / per,
        abund=float(abund), abund_se=se, abund_lo=lo, abund_hi=hi, cv=float(cv), df=float(df),
        collapsed_with=collapsed, upper_only=zero_limit is not None, expansion=float(expansion), local=bool(local),
    )


def _stratum_rows(inp, sums, var, boot):
    rows = []
    for h, label in enumerate(inp.labels):
        zero = None
        if sums.sum_y[h] == 0:
            exposure = 1.0 / sums.size[h] if inp.settings.presence else sums.sum_a[h] / sums.size[h]
            zero = _zero_count_limit(inp.settings, exposure, sums.n[h])
        rows.append(_row(
            inp.settings, label, inp.area_h[h], sums.n[h], inp.missing_h[h], sums.mean_c[h], sums.sd_c[h],
            sums.ratio[h] * sums.size[h], sums.size[h] ** 2 * var.var[h], var.df[h],
            None if boot is None else boot[1][:, h], zero_limit=zero, expansion=inp.expansion_h[h],
            collapsed=tuple(inp.labels[j] for j in var.groups.collapsed_with[h]),
            local=var.local[h], per=sums.size[h] if inp.settings.presence else None))
    return rows


def _overall_row(inp, sums, var, boot):
    """The row ``all``: totals over strata, Satterthwaite's df over the variance components."""
    var_abund = sums.size ** 2 * var.var
    total = float(np.sum(sums.ratio * sums.size))
    var_total = float(var_abund.sum()) if np.all(np.isfinite(var_abund)) else float("nan")
    n_components = int(var.component.max()) + 1 if var.component.size else 0
    comp_var = np.bincount(var.component, var_abund, minlength=n_components)
    comp_df = np.zeros(n_components)
    comp_df[var.component] = var.df
    df = satterthwaite_df(comp_var, comp_df) if np.isfinite(var_total) else float("nan")
    zero = None
    if total == 0:  # one density over the frame: exposure Σ_h Σa_h A_h / size_h (Σa / A without plus sampling)
        exposure = np.sum(sums.sum_a * inp.area_h / sums.size) / np.sum(inp.area_h)
        if inp.settings.presence:
            exposure = 1.0 / np.sum(sums.size)  # 1 / the units the frame holds
        zero = _zero_count_limit(inp.settings, exposure, int(sums.n.sum()))
    y = inp.y
    return _row(inp.settings, OVERALL, float(inp.area_h.sum()), int(sums.n.sum()), int(inp.missing_h.sum()),
                float(y.mean()) if y.size else float("nan"), float(np.std(y, ddof=1)) if y.size > 1 else float("nan"),
                total, var_total, df, None if boot is None else boot[0], zero_limit=zero,
                expansion=float(inp.expansion_h.sum()), per=float(sums.size.sum()) if inp.settings.presence else None)


def _overall_intervals(settings, overall, boot):
    """The overall abundance's interval by every method computed (t, log-normal, and the bootstrap when run)."""
    if overall.upper_only:
        methods = (CI_T, CI_LOGNORMAL) + ((CI_BOOTSTRAP,) if boot is not None else ())
        return tuple((m, 0.0, overall.abund_hi) for m in methods)
    intervals = [(CI_T,) + t_interval(overall.abund, overall.abund_se, overall.df, settings.confidence),
                 (CI_LOGNORMAL,) + lognormal_interval(overall.abund, overall.cv, settings.confidence, overall.df)]
    if boot is not None:
        intervals.append((CI_BOOTSTRAP,) + percentile_interval(boot[0], settings.confidence))
    return tuple(intervals)


def _plan_next_survey(inp, sums, var, rows, overall):
    """Fill ``n_next``: the allocation engine's Neyman allocation for the target CV of the overall abundance.

    Each stratum holds ``M_h = size_h / ā_h`` possible units (the most it can
    get) and has the standard deviation per unit that its variance implies,
    ``S_h = ā_h √(n_h v_h / (1 − f_h))`` (the simple random sampling
    formula, the local neighbourhood estimator or the one-unit rule, whichever
    gave ``v_h``); the smallest total whose allocation reaches the CV is found
    by :func:`allocation.allocate` (Neyman 1934; Cochran 1977, eq. 5.26, with
    at least 2 units per stratum).
    """
    settings, note = inp.settings, ""
    cv_p = settings.detection_se / settings.detection_p
    if cv_p >= settings.target_cv:
        note = message(
            QT_TRANSLATE_NOOP("PlotwiseEngine",
                "The target CV {target_cv:.3g} cannot be reached by more units: the detection probability's own "
                "CV is {cv_p:.3g}. Improve the detection study first."), target_cv=settings.target_cv, cv_p=cv_p)
        return rows, overall, note
    units = sums.size / sums.mean_a
    with np.errstate(invalid="ignore", divide="ignore"):
        sd = np.nan_to_num(sums.mean_a * np.sqrt(sums.n * var.var / sums.one_minus_f), nan=0.0)
    means = sums.ratio * sums.size / units
    capacity = np.floor(units + 1e-9).astype(int)
    if not (np.sum(means) > 0 and np.any(sd > 0)):
        n_next = np.minimum(np.full(len(rows), 2), np.maximum(capacity, 1))
        note = message(
            QT_TRANSLATE_NOOP("PlotwiseEngine",
                "No variation was observed, so the next survey's sample sizes are set to the minimum of 2 "
                "per stratum."))
    else:
        try:
            target = math.sqrt(settings.target_cv ** 2 - cv_p ** 2)
            planned = allocation.allocate(units, 1.0, "neyman", target_cv=target, sds=sd, means=means,
                                          ids=list(inp.labels), fpc=bool(inp.fpc_h.any()))
            n_next = planned.n
        except InputError:  # even every possible unit misses the target
            n_next = capacity
            note = message(QT_TRANSLATE_NOOP("PlotwiseEngine",
                "Even every possible unit in every stratum ({n:,}) would miss the target CV "
                "{target_cv:.3g}: n_next is every unit."), n=int(capacity.sum()),
                           target_cv=settings.target_cv)
    rows = [replace(r, n_next=int(k)) for r, k in zip(rows, n_next)]
    return rows, replace(overall, n_next=int(np.sum(n_next))), note


def stratified_bootstrap(y, a, code, n_strata, size_h, p, p_se, rng, n_bootstrap=MIN_BOOTSTRAP, progress=None,
                         chunk_draws=4_000_000, fpc_h=None, scale_h=None, single_sd=None):
    """Rescaled stratified bootstrap of the abundance (Rao & Wu 1988), one-unit strata included.

    A stratum of n_h ≥ 2 units draws ``m_h = n_h − 1`` of them with
    replacement, computes their ratio ``R*_h = Σy*/Σa*`` and rescales it about
    the stratum's estimate: ``R~_h = R_h + λ_h (R*_h − R_h)`` with
    ``λ_h = c_h √(m_h (1 − f_h) / (n_h − 1)) = c_h √(1 − f_h)``, f_h the sampled
    fraction where the finite-population correction applies. With ``c_h = 1``
    the replicates' variance is ``(1 − f_h) s_h² / (n_h ā_h²)``, the textbook
    variance of the ratio estimator (Cochran 1977, ch. 6 and §2.6), where the
    plain bootstrap of n_h draws falls short by (n_h − 1)/n_h (Rao & Wu 1988,
    JASA 83:231–241, §2.2; Efron & Tibshirani 1993, ch. 13). ``c_h`` (``scale_h``)
    rescales the spread to another variance estimator of the same stratum (the
    local neighbourhood one: ``c_h = √(v_local / v_srs)``), so that the bootstrap
    and the t interval use one variance.

    A stratum with one unit has nothing to resample: its replicates are
    ``R_h + single_sd_h · ε``, ``ε`` standard normal, with the variance the
    collapsed-strata rule gave it (NaN for a lone one-unit stratum: no interval).

    ``N = Σ size_h R~_h``; with detection, each replicate divides by a p drawn
    from the beta distribution with mean p and standard deviation se_p.
    Percentile intervals (Efron & Tibshirani 1993, ch. 13; Buckland et al.
    2001, §3.7.5).

    Returns
    -------
    (numpy.ndarray, numpy.ndarray)
        Replicates of the total, shape (B,), and per stratum, shape (B, H).
    """
    per_stratum = np.empty((n_bootstrap, n_strata))
    order = np.argsort(code, kind="stable")
    starts = np.searchsorted(code[order], np.arange(n_strata))
    ends = np.searchsorted(code[order], np.arange(n_strata), side="right")
    fpc_h = np.ones(n_strata) if fpc_h is None else np.asarray(fpc_h, float)
    scale_h = np.ones(n_strata) if scale_h is None else np.asarray(scale_h, float)
    for h in range(n_strata):  # a loop over strata; the resamples are vectorised
        own = order[starts[h]:ends[h]]
        estimate = y[own].sum() / a[own].sum()
        if own.size < 2:
            sd = np.nan if single_sd is None else float(single_sd[h])
            per_stratum[:, h] = estimate + sd * rng.standard_normal(n_bootstrap) if np.isfinite(sd) else np.nan
        else:
            per_stratum[:, h] = _rescaled_resamples(y[own], a[own], estimate, scale_h[h] * math.sqrt(
                max(float(fpc_h[h]), 0.0)), n_bootstrap, rng, chunk_draws)
        if progress is not None and progress(0.2 + 0.7 * (h + 1) / n_strata):
            raise Cancelled()
    per_stratum *= size_h
    if p_se > 0:
        common = p * (1 - p) / p_se ** 2 - 1
        if common > 0 and p < 1:
            p_b = rng.beta(p * common, (1 - p) * common, size=n_bootstrap)
        else:
            p_b = np.clip(rng.normal(p, p_se, size=n_bootstrap), 1e-6, 1.0)
        per_stratum /= p_b[:, None]
    else:
        per_stratum /= p
    return per_stratum.sum(axis=1), per_stratum


def _rescaled_resamples(y_pool, a_pool, estimate, scale, n_bootstrap, rng, chunk_draws):
    """``R + scale (R* − R)`` for n − 1 draws with replacement, in chunks of at most ``chunk_draws`` draws."""
    draws = y_pool.size - 1
    out = np.empty(n_bootstrap)
    equal_units = bool(np.all(a_pool == a_pool[0]))  # then Σa = m·a in every resample
    rows_per_chunk = max(1, chunk_draws // max(draws, 1))
    for b0 in range(0, n_bootstrap, rows_per_chunk):
        b1 = min(n_bootstrap, b0 + rows_per_chunk)
        pick = rng.integers(0, y_pool.size, size=(b1 - b0, draws), dtype=np.int32 if y_pool.size < 2**31 else np.int64)
        surveyed = draws * a_pool[0] if equal_units else a_pool[pick].sum(axis=1)
        out[b0:b1] = estimate + scale * (y_pool[pick].sum(axis=1) / surveyed - estimate)
    return out


def estimate_density(counts, unit_areas, strata, stratum_areas, *, unit_ids=None, confidence=0.95, ci_method=CI_T,
                     fpc=False, detection_p=1.0, detection_se=0.0, detection_df=0.0, target_cv=None,
                     variance_method=VARIANCE_SRS, coords=None, presence=False, drop_empty_strata=False,
                     neighbours=None, roles=None, designs=None, edges=None, incl_p=None, expansion_areas=None,
                     layer="units", rng=None, n_bootstrap=MIN_BOOTSTRAP, progress=None):
    """Stratified density and abundance with standard errors and intervals.

    Parameters
    ----------
    counts : array_like, shape (n,)
        Count per unit; ``None`` or NaN means not surveyed (left out, listed in a
        warning), or with ``roles`` "reserve" an unused reserve (skipped).
        With ``presence`` the values are 0/1 detections.
    unit_areas : array_like, shape (n,)
        Surveyed area of each unit, in the area unit of the result (e.g. km²).
    strata : array_like, shape (n,)
        Stratum id of each unit (numbers or text; compared as text).
    stratum_areas : mapping
        Stratum id → stratum area (same unit). Every stratum of the frame.
    unit_ids : array_like, optional
        Ids used in messages (default 0..n−1).
    confidence : float
        Confidence level in (0, 1).
    ci_method : {"t", "lognormal", "bootstrap"}
    fpc : bool
        Apply the finite-population correction ``1 − Σa_h / A_h`` where it holds
        (see ``designs``).
    detection_p, detection_se : float
        Detection probability in (0, 1] and its standard error (from a separate study).
    detection_df : float
        Degrees of freedom of the detection estimate (0: p counts as known).
    target_cv : float, optional
        Target CV of the overall abundance for the next survey; fills ``n_next``.
    variance_method : {"srs", "local", "local_scaled"}
        ``"local"``: the local neighbourhood estimator of Stevens & Olsen (2003)
        for systematic or spatially balanced layouts; needs ``coords``.
        ``"local_scaled"``: our variant of it, scaled to agree with the simple
        formula where there is no spatial pattern (:class:`variance.LocalVariance`).
    coords : array_like, shape (n, 2), optional
        Unit positions in a projected CRS.
    presence : bool
        The values are 0/1 detections: density becomes the proportion of units
        with a detection (naive occupancy) and abundance the number of occupied
        units in the frame (``A_h / ā_h`` units per stratum).
    drop_empty_strata : bool
        Leave out strata with no surveyed unit (the frame shrinks) instead of raising an error.
    neighbours : mapping, optional
        Stratum id → the partner of a one-unit stratum, or → candidate ids in
        order of preference (the strata touching it on the map, longest shared
        edge first). Default: the next stratum in id order.
    roles, designs, edges, incl_p : array_like, optional
        Per unit: the layout's ``role``, ``design`` record (the correction is
        refused in strata whose units may overlap, :func:`edge.fpc_holds`),
        ``edge`` protocol and ``incl_p`` (a warning when uneven in a stratum).
    expansion_areas : mapping, optional
        Stratum id → ``A⁺_h`` (same unit) under plus sampling (:func:`edge.expansion_areas`).
    layer : str
        The units layer, named in messages.
    rng : numpy.random.Generator, optional
        Needed for the bootstrap.
    n_bootstrap : int
        Bootstrap resamples (at least 2000).
    progress : callable, optional
        ``progress(fraction) -> bool``; True means cancel.

    Returns
    -------
    Estimate
    """
    settings = _settings_iv(confidence, ci_method, variance_method, fpc, detection_p, detection_se, detection_df,
                            presence, target_cv, n_bootstrap)
    inp = _estimate_iv(counts, unit_areas, strata, stratum_areas, unit_ids=unit_ids, settings=settings,
                       coords=coords, drop_empty_strata=drop_empty_strata, neighbours=neighbours, roles=roles,
                       designs=designs, edges=edges, incl_p=incl_p, expansion_areas=expansion_areas, layer=layer)
    return _stratified_estimate(inp, rng, progress)


def _stratified_estimate(inp, rng, progress):
    """The steps of :func:`estimate_density` on checked input: stratum sums, count variances, the bootstrap
    when asked for, the stratum and overall rows, the next survey's sample size, the warnings."""
    sums = stratum_sums(inp)
    var = count_variances(inp, sums)
    if progress is not None and progress(0.2):
        raise Cancelled()
    boot = _bootstrap(inp, sums, var, rng, progress) if inp.settings.ci_method == CI_BOOTSTRAP else None
    rows = _stratum_rows(inp, sums, var, boot)
    overall = _overall_row(inp, sums, var, boot)
    warnings = list(inp.warnings) + list(var.warnings) + _detection_warnings(inp.settings)
    if inp.settings.target_cv is not None:
        rows, overall, note = _plan_next_survey(inp, sums, var, rows, overall)
        if note:
            warnings.append(note)
    if progress is not None and progress(1.0):
        raise Cancelled()
    warnings += _zero_warnings(inp, sums, overall)
    return Estimate(
        strata=tuple(rows), overall=overall, confidence=inp.settings.confidence, ci_method=inp.settings.ci_method,
        variance_method=inp.settings.variance_method, fpc=bool(inp.fpc_h.any()), detection_p=inp.settings.detection_p,
        detection_se=inp.settings.detection_se, presence=inp.settings.presence, target_cv=inp.settings.target_cv,
        n_bootstrap=0 if boot is None else int(boot[0].size), overall_intervals=_overall_intervals(
            inp.settings, overall, boot), bootstrap_totals=None if boot is None else boot[0], warnings=tuple(warnings),
        missing_ids=inp.missing_ids, dropped_strata=inp.dropped, dropped_area=inp.dropped_area,
        detection_df=inp.settings.detection_df, fpc_strata=tuple(lab for lab, f in zip(inp.labels, inp.fpc_h) if f),
        fpc_refused=inp.fpc_refused, fpc_assumed=inp.fpc_assumed, edge=inp.edge, unused_reserves=inp.unused_reserves,
    )


def _bootstrap(inp, sums, var, rng, progress):
    """:func:`stratified_bootstrap` with the spread of the variance each stratum uses."""
    if rng is None:
        raise InputError(message(QT_TRANSLATE_NOOP("PlotwiseEngine", "The bootstrap needs a random generator (rng).")))
    with np.errstate(invalid="ignore", divide="ignore"):
        scale = np.where(var.local & (var.srs_var > 0), np.sqrt(var.var / var.srs_var), 1.0)
    single_sd = np.where(sums.n == 1, np.sqrt(var.var), np.nan)
    return stratified_bootstrap(inp.y, np.ones_like(inp.a) if inp.settings.presence else inp.a, inp.code,
                                len(inp.labels), sums.size, inp.settings.detection_p, inp.settings.detection_se, rng,
                                n_bootstrap=inp.settings.n_bootstrap, progress=progress,
                                fpc_h=sums.one_minus_f, scale_h=scale, single_sd=single_sd)


def _detection_warnings(settings):
    if settings.detection_se > settings.detection_p / 2.0:
        return [message(
            QT_TRANSLATE_NOOP("PlotwiseEngine",
                "The standard error of the detection probability ({se:.3g}) is more than half of p ({p:.3g}): the "
                "detection study is too small to correct the counts reliably, and the delta method behind the "
                "interval is poor at such a CV. Enlarge the detection study."), se=settings.detection_se,
            p=settings.detection_p)]
    return []


def _zero_warnings(inp, sums, overall):
    level = inp.settings.confidence
    if overall.upper_only:
        return [message(
            QT_TRANSLATE_NOOP("PlotwiseEngine",
                "No animal was counted in any surveyed unit: the estimate is 0, and the interval is the one-sided "
                "upper limit {hi:.4g} at {level:.0%} (exact Poisson limit for a count of 0, assuming one density over "
                "the frame)."), hi=overall.abund_hi, level=level)]
    zero = [inp.labels[h] for h in np.flatnonzero(sums.sum_y == 0)]
    if not zero:
        return []
    return [message(
        QT_TRANSLATE_NOOP("PlotwiseEngine",
            "In strata {ids} every surveyed unit counted 0: their interval is the one-sided upper limit of a count of "
            "0 (exact Poisson limit), and their standard error of 0 understates the overall uncertainty (the species "
            "may be present but rare there)."), ids=listed_ids(zero))]


def plus_expansion(frame_geometries, unit_strata, edges, reaches, m2_per_unit=1.0):
    """The plus regions' areas ``A⁺_h`` (area unit) of the strata whose units record plus sampling.

    Parameters
    ----------
    frame_geometries : mapping
        Stratum label → polygon (metres), as :func:`frame_strata` returns them.
    unit_strata, edges, reaches : sequence
        Per unit: stratum id, the layout's ``edge`` record and ``reach_m`` (the
        unit's reach ``R``, m).

    Returns
    -------
    (dict or None, list of Message)
        Label → ``A⁺_h`` for the strata of plus-sampled units (None when there
        are none), and warnings for strata whose units record different reaches.
    """
    if edges is None or reaches is None:
        return None, []
    reach_of, mixed = {}, []
    for stratum, record, reach in zip(unit_strata, edges, reaches):
        if str(record or "").strip().lower() != edge.PLUS:
            continue
        try:
            r = float(reach)
        except (TypeError, ValueError):
            continue
        label = stratum_label(stratum)
        if label in reach_of and abs(reach_of[label] - r) > 1e-6 * max(r, 1.0):
            mixed.append(label)
        reach_of[label] = max(r, reach_of.get(label, 0.0))
    reach_of = {k: v for k, v in reach_of.items() if k in frame_geometries and v > 0}
    if not reach_of:
        return None, []
    areas = edge.expansion_areas({k: frame_geometries[k] for k in reach_of}, reach_of)
    warnings = []
    if mixed:
        warnings.append(message(QT_TRANSLATE_NOOP("PlotwiseEngine",
            "In strata {ids} the units record different reaches (reach_m): the largest is used "
            "for the plus region."), ids=listed_ids(sorted(set(mixed), key=natural_key))))
    return {k: v / m2_per_unit for k, v in areas.items()}, warnings
