"""Density and abundance from counts in sample units: stratified ratio estimation.

For stratum *h* with surveyed units i = 1..n_h, counts ``y_hi`` and unit areas
``a_hi`` and stratum area ``A_h``:

* density ``D_h = Σ_i y_hi / Σ_i a_hi`` (the ratio estimator, Cochran 1977, ch. 6;
  with equal units it is the mean count divided by the unit area);
* its linearised variance (Cochran 1977, eq. 6.13)::

      v(D_h) = (1 − f_h) / (n_h ā_h²) · Σ_i (y_hi − D_h a_hi)² / (n_h − 1)

  with the finite-population correction ``f_h = Σ_i a_hi / A_h`` when asked for;
* abundance ``N_h = D_h A_h``, ``v(N_h) = A_h² v(D_h)``; overall ``N = Σ N_h``,
  ``v(N) = Σ v(N_h)`` (Cochran 1977, eq. 5.6) and ``D = N / Σ A_h``.

Detection probability p (from a separate study) divides the estimates and adds
its squared CV (delta method, Seber 1982, §1.3.3). Confidence intervals: Student t
with Satterthwaite's effective degrees of freedom (Cochran 1977, eq. 5.16),
log-normal (Burnham et al. 1987; Buckland et al. 2001, eq. 3.71), or a
rescaled stratified percentile bootstrap (Rao & Wu 1988; Efron & Tibshirani 1993;
Buckland et al. 2001), which carries the finite-population correction.

Equation numbers of Cochran (1977) are given from memory; the formulas are written out.
Nothing here imports the host.
"""
from dataclasses import dataclass, field, replace
import math

import numpy as np
from scipy import special
from shapely.ops import unary_union

from .errors import QT_TRANSLATE_NOOP, Cancelled, InputError, Message, message
from .geometry import OVERLAP_ERROR_SHARE, SLIVER_AREA, listed_overlaps, overlapping_pairs, worst_overlap_share
from .geometry_types import polygonal_part
from .variance import collapse_single_unit_strata, local_neighbourhood_variance

CI_T, CI_LOGNORMAL, CI_BOOTSTRAP = "t", "lognormal", "bootstrap"
CI_METHODS = (CI_T, CI_LOGNORMAL, CI_BOOTSTRAP)
VARIANCE_SRS, VARIANCE_LOCAL = "srs", "local"
VARIANCE_METHODS = (VARIANCE_SRS, VARIANCE_LOCAL)
MIN_BOOTSTRAP = 2000
OVERALL = "all"
MAX_LISTED_IDS = 50


@dataclass(frozen=True)
class StratumEstimate:
    """Estimate for one stratum, or for the whole frame (``stratum == "all"``).

    Areas are in the caller's area unit (e.g. km²); densities per that unit.
    ``mean_c`` and ``sd_c`` are the mean and standard deviation of the counts
    per surveyed unit. ``cv`` is the coefficient of variation of the abundance
    (and density) estimate, detection included. ``df`` is the degrees of
    freedom used by the t interval. ``n_next`` is the number of units for the
    next survey (``None`` without a target CV).
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


def t_interval(estimate, se, df, confidence):
    """``estimate ± t_{(1+confidence)/2, df} · se``, lower limit floored at 0.

    Counts cannot be negative, so a lower limit below 0 is reported as 0; this
    does not change the coverage.
    """
    if not np.isfinite(se):
        return float("nan"), float("nan")
    if se == 0:
        return float(estimate), float(estimate)
    # Student t quantile (scipy.special.stdtrit is stats.t.ppf without the per-call overhead)
    q = special.stdtrit(df, 0.5 + confidence / 2.0) if np.isfinite(df) else special.ndtri(0.5 + confidence / 2.0)
    return max(0.0, float(estimate - q * se)), float(estimate + q * se)


def lognormal_interval(estimate, cv, confidence):
    """Log-normal interval ``[N / C, N · C]`` with ``C = exp(z √ln(1 + CV²))``.

    Burnham et al. (1987), Buckland et al. (2001), eq. 3.71 with the normal
    quantile z. For an estimate of 0 the interval is [0, 0].
    """
    if estimate == 0:
        return 0.0, 0.0
    if not np.isfinite(cv):
        return float("nan"), float("nan")
    z = special.ndtri(0.5 + confidence / 2.0)
    c = math.exp(z * math.sqrt(math.log1p(cv * cv)))
    return float(estimate / c), float(estimate * c)


def percentile_interval(replicates, confidence):
    """Bootstrap percentile interval, the ``(1 ∓ confidence)/2`` quantiles of the replicates.

    Efron & Tibshirani (1993), ch. 13. As for :func:`t_interval`, a lower limit
    below 0 (replicates of collapsed strata may go below 0) is reported as 0.
    NaN when a replicate is NaN (a stratum without variance).
    """
    replicates = np.asarray(replicates, dtype=float)
    if not np.all(np.isfinite(replicates)):
        return float("nan"), float("nan")
    lo, hi = np.quantile(replicates, [0.5 - confidence / 2.0, 0.5 + confidence / 2.0])
    return max(0.0, float(lo)), float(hi)


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


def natural_key(label):
    """Sort key putting numeric ids in numeric order, then text ids."""
    try:
        return (0, float(label), label)
    except ValueError:
        return (1, 0.0, label)


def _id_list(ids):
    ids = list(ids)
    shown = ", ".join(str(i) for i in ids[:MAX_LISTED_IDS])
    if len(ids) > MAX_LISTED_IDS:
        return message(QT_TRANSLATE_NOOP("PlotwiseEngine", "{shown} … ({n} in all)"), shown=shown, n=len(ids))
    return shown


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
                "for units that were not surveyed."), count_name=count_name, ids=_id_list(ids)),
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
                "was not surveyed."), count_name=count_name, ids=_id_list(ids)),
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
    areas_m2 = {k: float(g.area) for k, g in merged.items()}
    warnings = []

    lost_m2 = 0.0
    if unlabelled:
        lost = unary_union(unlabelled)
        if merged:
            lost = lost.difference(unary_union(list(merged.values())))
        lost_m2 = float(lost.area)
        values = dict(layer=layer, field=field, ids=_id_list(unlabelled_ids), area=lost_m2 / m2_per_unit, unit=unit)
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
        warnings.append(message(QT_TRANSLATE_NOOP("PlotwiseEngine",
            "Layer '{layer}': the stratum id field '{field}' is empty (NULL) for feature id(s) {ids}. These "
            "polygons were left out, and the frame shrank by the {area:.4g} {unit} of them that no stratum covers. "
            "To keep them in the frame, give each polygon the id of its stratum."), **values))
    if not merged:
        raise InputError(
            message(QT_TRANSLATE_NOOP("PlotwiseEngine",
                "Layer '{layer}': no polygon has a stratum id in the field '{field}'. Fill in the stratum ids, "
                "or choose the field that holds them."), layer=layer, field=field),
            ids=unlabelled_ids,
        )

    overlaps, overlap_m2 = (), 0.0
    shapes = [merged[k] for k in order]
    pairs = overlapping_pairs(shapes)
    if pairs:
        overlaps = tuple((order[i], order[j], shared / m2_per_unit) for i, j, shared in pairs)
        covered_m2 = float(unary_union(shapes).area)
        overlap_m2 = max(sum(areas_m2.values()) - covered_m2, 0.0)  # land in three strata counts twice over
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
        warnings.append(message(QT_TRANSLATE_NOOP("PlotwiseEngine",
            "Layer '{layer}': the strata overlap: {pairs}. In all, {area:.4g} {unit} ({percent:.3g} % of the "
            "{covered:.4g} {unit} the strata cover) is counted in more than one stratum, so the frame area and the "
            "abundance are slightly too large. Fix the strata polygons so that they do not overlap (snap the shared "
            "edges, or cut each overlap out of all strata but one)."), **values))
    return StrataFrame(
        geometries=merged,
        areas={k: a / m2_per_unit for k, a in areas_m2.items()},
        overlaps=overlaps,
        overlap_area=overlap_m2 / m2_per_unit,
        unlabelled_ids=tuple(unlabelled_ids),
        unlabelled_area=lost_m2 / m2_per_unit,
        warnings=tuple(warnings),
    )


# --------------------------------------------------------------------------- the estimator


def estimate_density(
    counts,
    unit_areas,
    strata,
    stratum_areas,
    *,
    unit_ids=None,
    confidence=0.95,
    ci_method=CI_T,
    fpc=False,
    detection_p=1.0,
    detection_se=0.0,
    target_cv=None,
    variance_method=VARIANCE_SRS,
    coords=None,
    presence=False,
    drop_empty_strata=False,
    neighbours=None,
    rng=None,
    n_bootstrap=MIN_BOOTSTRAP,
    progress=None,
):
    """Stratified density and abundance with standard errors and intervals.

    Parameters
    ----------
    counts : array_like, shape (n,)
        Count per unit; ``None`` or NaN means not surveyed (left out, listed in a
        warning). With ``presence`` the values are 0/1 detections.
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
        Apply the finite-population correction ``1 − Σa_h / A_h``.
    detection_p, detection_se : float
        Detection probability in (0, 1] and its standard error (from a separate
        study).
    target_cv : float, optional
        Target CV of the overall abundance for the next survey; fills ``n_next``.
    variance_method : {"srs", "local"}
        ``"local"``: the local neighbourhood estimator of Stevens & Olsen (2003)
        for systematic or spatially balanced layouts; needs ``coords``.
    coords : array_like, shape (n, 2), optional
        Unit positions in a projected CRS.
    presence : bool
        The values are 0/1 detections: density becomes the proportion of units
        with a detection (naive occupancy) and abundance the number of occupied
        units in the frame (``A_h / ā_h`` units per stratum).
    drop_empty_strata : bool
        Leave out strata with no surveyed unit (the frame shrinks) instead of
        raising an error.
    neighbours : mapping, optional
        Stratum id → the stratum id to collapse a one-unit stratum with, or →
        a list of candidate ids (e.g. the strata touching it), of which the one
        with the closer density is taken. Default: the strata before and after
        it in id order.
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
    if target_cv is not None and not target_cv > 0:
        target_cv = None
    warnings = []

    strata_in = np.asarray(strata, dtype=object).ravel()
    n_all = strata_in.size
    ids = np.arange(n_all) if unit_ids is None else np.asarray(unit_ids, dtype=object).ravel()
    if ids.size != n_all:
        raise InputError(message(QT_TRANSLATE_NOOP("PlotwiseEngine", "unit_ids must have one id per unit.")))
    y_all = read_counts(counts, ids)
    a_all = np.asarray(unit_areas, dtype=float).ravel()
    if y_all.size != n_all or a_all.size != n_all:
        raise InputError(message(QT_TRANSLATE_NOOP("PlotwiseEngine",
            "counts, unit_areas and strata must have one value per unit.")))
    unique_labels, label_index = stratum_labels(strata_in)
    frame = {}
    for key, area in dict(stratum_areas).items():
        label = stratum_label(key)
        frame[label] = frame.get(label, 0.0) + float(area)
    bad_area = [k for k, v in frame.items() if not (np.isfinite(v) and v > 0)]
    if bad_area:
        raise InputError(
            message(QT_TRANSLATE_NOOP("PlotwiseEngine",
                "Strata {ids} have no area. Check the strata layer's geometries."), ids=_id_list(bad_area)),
            ids=bad_area,
        )

    # units that belong to no stratum of the frame
    no_stratum = np.equal(unique_labels, None)[label_index]
    if no_stratum.any():
        raise InputError(
            message(QT_TRANSLATE_NOOP("PlotwiseEngine",
                "Units {ids} have no stratum (the stratum field is empty). Fill in their "
                "stratum, or leave the stratum field out to treat the frame as one stratum."),
                    ids=_id_list(ids[no_stratum])),
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
                    ids=_id_list(ids[unknown]), names=_id_list(names)),
            ids=ids[unknown],
        )

    missing = np.isnan(y_all)
    if missing.any():
        warnings.append(message(QT_TRANSLATE_NOOP("PlotwiseEngine",
            "{n} unit(s) have no count and are treated as not surveyed (non-response): {ids}."),
            n=int(missing.sum()), ids=_id_list(ids[missing])))
    surveyed = ~missing
    if not surveyed.any():
        raise InputError(message(QT_TRANSLATE_NOOP("PlotwiseEngine",
            "No unit has a count, so nothing can be estimated. Enter the counts of the surveyed units "
            "(0 when none was seen) in the count field.")
        ))
    bad_units = surveyed & ~(np.isfinite(a_all) & (a_all > 0))
    if bad_units.any():
        raise InputError(
            message(QT_TRANSLATE_NOOP("PlotwiseEngine",
                "Units {ids} have no positive surveyed area. Give a unit area field with "
                "values above 0, or a fixed unit area for points and lines."), ids=_id_list(ids[bad_units])),
            ids=ids[bad_units],
        )

    if presence:
        values = y_all[surveyed]
        if np.any((values != 0) & (values != 1)):
            odd = ids[surveyed][(values != 0) & (values != 1)]
            raise InputError(
                message(QT_TRANSLATE_NOOP("PlotwiseEngine",
                    "Presence data must be 0 or 1; units {ids} hold other values. "
                    "Use the counts without the presence option, or recode the field."), ids=_id_list(odd)),
                ids=odd,
            )
        if detection_p < 1.0 or detection_se > 0:
            warnings.append(message(QT_TRANSLATE_NOOP("PlotwiseEngine",
                "The detection probability was not applied to presence data: dividing a proportion of "
                "occupied units by p is not an occupancy correction, which needs repeat visits.")
            ))
        detection_p, detection_se = 1.0, 0.0

    all_labels = sorted(frame, key=natural_key)
    n_per = {lab: 0 for lab in all_labels}
    missing_per = {lab: 0 for lab in all_labels}
    surveyed_per_label = np.bincount(label_index[surveyed], minlength=unique_labels.size)
    missing_per_label = np.bincount(label_index[missing], minlength=unique_labels.size)
    for lab, n_s, n_m in zip(unique_labels, surveyed_per_label, missing_per_label):  # distinct ids only
        n_per[lab] += int(n_s)
        missing_per[lab] += int(n_m)
    empty = [lab for lab in all_labels if n_per[lab] == 0]
    dropped_area = 0.0
    if empty:
        if not drop_empty_strata:
            raise InputError(
                message(QT_TRANSLATE_NOOP("PlotwiseEngine",
                    "No unit of strata {ids} was surveyed, so their abundance cannot be estimated. "
                    "Survey units there, or choose to leave these strata out (the estimate then covers a "
                    "smaller frame)."), ids=_id_list(empty)),
                ids=empty,
            )
        dropped_area = float(sum(frame[lab] for lab in empty))
        warnings.append(message(QT_TRANSLATE_NOOP("PlotwiseEngine",
            "Strata {ids} had no surveyed unit and were left out: the frame shrank by "
            "{dropped_area:.6g} area units, and the estimate covers the remaining strata only."),
            ids=_id_list(empty), dropped_area=dropped_area))
    labels = [lab for lab in all_labels if n_per[lab] > 0]
    n_strata = len(labels)
    code_of = {lab: h for h, lab in enumerate(labels)}

    code_all = np.array([code_of.get(lab, -1) for lab in unique_labels], dtype=int)[label_index]
    keep = surveyed & (code_all >= 0)
    code = code_all[keep]
    y = y_all[keep]
    a = a_all[keep]
    xy = None
    if variance_method == VARIANCE_LOCAL:
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
                        ids=_id_list(ids[keep][unplaced])),
                ids=ids[keep][unplaced],
            )

    area_h = np.array([frame[lab] for lab in labels])
    n_h = np.bincount(code, minlength=n_strata)
    sum_y = np.bincount(code, y, minlength=n_strata)
    sum_a = np.bincount(code, a, minlength=n_strata)
    mean_a = sum_a / n_h
    if presence:
        # proportion of units: every unit weighs 1, and the stratum holds A_h / ā_h units
        area_h = area_h / mean_a
        a = np.ones_like(a)
        sum_a = n_h.astype(float)
        mean_a = np.ones(n_strata)
    dens_h = sum_y / sum_a
    mean_c = sum_y / n_h
    sd_c = np.sqrt(np.bincount(code, (y - mean_c[code]) ** 2, minlength=n_strata) / np.maximum(n_h - 1, 1))
    sd_c[n_h < 2] = np.nan
    sampled_fraction = sum_a / area_h
    if fpc and np.any(sampled_fraction > 1 + 1e-9):
        over = [labels[h] for h in np.flatnonzero(sampled_fraction > 1 + 1e-9)]
        raise InputError(
            message(QT_TRANSLATE_NOOP("PlotwiseEngine",
                "In strata {ids} the surveyed area exceeds the stratum area. Check the unit areas "
                "and the area unit, or switch off the finite-population correction."), ids=_id_list(over)),
            ids=over,
        )
    fpc_h = 1.0 - sampled_fraction if fpc else np.ones(n_strata)
    fpc_h = np.clip(fpc_h, 0.0, None)

    # residual variance per stratum (two-pass: exact)
    resid = y - dens_h[code] * a
    ss_h = np.bincount(code, resid ** 2, minlength=n_strata)
    s2_h = np.where(n_h > 1, ss_h / np.maximum(n_h - 1, 1), np.nan)
    df_h = (n_h - 1).astype(float)

    # one-unit strata: collapsed strata (Cochran 1977, §5A.12)
    collapsed = [()] * n_strata
    group = np.arange(n_strata)
    singles = np.flatnonzero(n_h == 1)
    if singles.size and n_strata >= 2:
        neighbour_codes = None
        if neighbours:
            neighbour_codes = {}
            for k, v in dict(neighbours).items():
                if stratum_label(k) not in code_of:
                    continue
                if isinstance(v, (list, tuple, set, np.ndarray)):
                    neighbour_codes[code_of[stratum_label(k)]] = [
                        code_of[stratum_label(c)] for c in v if stratum_label(c) in code_of
                    ]
                elif stratum_label(v) in code_of:
                    neighbour_codes[code_of[stratum_label(k)]] = code_of[stratum_label(v)]
        groups = collapse_single_unit_strata(n_h, dens_h, neighbours=neighbour_codes)
        group = groups.group
        collapsed = list(groups.collapsed_with)
        for g in np.unique(group[singles]):
            members = np.flatnonzero(group == g)
            in_group = np.isin(code, members)
            ratio = sum_y[members].sum() / sum_a[members].sum()
            pooled = np.sum((y[in_group] - ratio * a[in_group]) ** 2) / (n_h[members].sum() - 1)
            s2_h[members] = pooled
            df_h[members] = n_h[members].sum() - 1
        pairs = tuple(
            (f"s{i}", message(QT_TRANSLATE_NOOP("PlotwiseEngine",
                "{label} (one unit) collapsed with {others}"), label=labels[h],
                              others=", ".join(labels[j] for j in collapsed[h])))
            for i, h in enumerate(singles)
        )
        groups = Message("; ".join("{%s}" % name for name, _ in pairs), pairs)  # a list: no words of its own
        warnings.append(message(QT_TRANSLATE_NOOP("PlotwiseEngine",
            "Strata {groups}: their variance comes from the collapsed-strata estimator (Cochran 1977, §5A.12), "
            "which counts differences between the collapsed strata as variance and so tends to be "
            "too large."), groups=groups))
    elif singles.size:
        warnings.append(message(QT_TRANSLATE_NOOP("PlotwiseEngine",
            "The only stratum has one surveyed unit: no variance, standard error or interval can be "
            "estimated. Survey at least two units.")
        ))

    var_dens_h = fpc_h * s2_h / (n_h * mean_a ** 2)
    if variance_method == VARIANCE_LOCAL:
        local_used = []
        for h in range(n_strata):  # a loop over strata (tens)
            if n_h[h] < 3 or collapsed[h]:
                continue
            inside = code == h
            var_dens_h[h] = fpc_h[h] * local_neighbourhood_variance(resid[inside] / sum_a[h], xy[inside])
            local_used.append(labels[h])
        if len(local_used) < n_strata:
            rest = [lab for lab in labels if lab not in local_used]
            warnings.append(message(QT_TRANSLATE_NOOP("PlotwiseEngine",
                "Strata {ids} have fewer than 3 units or were collapsed: their variance uses "
                "the simple random sampling formula."), ids=_id_list(rest)))
    if progress is not None and progress(0.2):
        raise Cancelled()

    abund_h = dens_h * area_h
    var_abund_h = area_h ** 2 * var_dens_h
    total_area = float(area_h.sum())
    n_total = float(abund_h.sum())
    var_total = float(np.nansum(var_abund_h)) if np.all(np.isfinite(var_abund_h)) else float("nan")
    # Satterthwaite over variance groups: collapsed strata count as one component
    n_groups = int(group.max()) + 1 if n_strata else 0
    var_group = np.bincount(group, var_abund_h, minlength=n_groups)
    df_group = np.zeros(n_groups)
    df_group[group] = df_h
    df_count_total = satterthwaite_df(var_group, df_group) if np.isfinite(var_total) else float("nan")

    p, p_se = float(detection_p), float(detection_se)
    cv_p = p_se / p

    def with_detection(est, var, df_count):
        corrected, var_corrected = detection_corrected(est, var, p, p_se)
        cv = math.sqrt(var_corrected) / corrected if corrected > 0 else float("nan")
        if cv_p > 0 and corrected > 0 and var > 0:
            cv_count = math.sqrt(var) / est
            # Buckland et al. (2001), eq. 3.75: the detection component has infinite df here
            df = cv ** 4 / (cv_count ** 4 / df_count) if df_count > 0 else float("nan")
        else:
            df = df_count
        return corrected, var_corrected, cv, df

    rows = []
    boot = None
    if ci_method == CI_BOOTSTRAP:
        if rng is None:
            raise InputError(message(QT_TRANSLATE_NOOP("PlotwiseEngine",
                "The bootstrap needs a random generator (rng).")))
        boot = stratified_bootstrap(
            y, a, code, n_strata, group, area_h, p, p_se, rng,
            n_bootstrap=max(int(n_bootstrap), MIN_BOOTSTRAP), progress=progress, fpc_h=fpc_h,
        )
    alpha = 1.0 - confidence
    for h in range(n_strata):
        est, var, cv, df = with_detection(abund_h[h], var_abund_h[h], df_h[h])
        rows.append(
            _row(labels[h], area_h[h], n_h[h], missing_per[labels[h]], mean_c[h], sd_c[h], est, var, cv, df,
                 ci_method, confidence, None if boot is None else boot[1][:, h], alpha,
                 tuple(labels[j] for j in collapsed[h]))
        )
    est, var, cv, df = with_detection(n_total, var_total, df_count_total)
    se_total = math.sqrt(var) if np.isfinite(var) else float("nan")
    intervals = [(CI_T,) + t_interval(est, se_total, df, confidence),
                 (CI_LOGNORMAL,) + lognormal_interval(est, cv, confidence)]
    if boot is not None:
        intervals.append((CI_BOOTSTRAP,) + percentile_interval(boot[0], confidence))
    overall_sd = float(np.std(y, ddof=1)) if y.size > 1 else float("nan")
    overall = _row(OVERALL, total_area, int(n_h.sum()), int(missing.sum()), float(y.mean()) if y.size else float("nan"),
                   overall_sd, est, var, cv, df, ci_method, confidence, None if boot is None else boot[0], alpha, ())

    if target_cv is not None:
        rows, overall, note = _plan_next_survey(
            rows, overall, area_h, mean_a, s2_h, n_total, target_cv, cv_p, fpc
        )
        if note:
            warnings.append(note)
    if progress is not None and progress(1.0):
        raise Cancelled()
    if n_total == 0:
        warnings.append(message(QT_TRANSLATE_NOOP("PlotwiseEngine",
            "No animal was counted in any surveyed unit: the estimate is 0 and its CV undefined.")))
    elif np.any((sum_y == 0) & (n_h > 1)):
        zero = [labels[h] for h in np.flatnonzero((sum_y == 0) & (n_h > 1))]
        warnings.append(message(QT_TRANSLATE_NOOP("PlotwiseEngine",
            "In strata {ids} every surveyed unit counted 0: their standard error is 0, which "
            "understates the uncertainty (the species may be present but rare there)."), ids=_id_list(zero)))
    return Estimate(
        strata=tuple(rows),
        overall=overall,
        confidence=confidence,
        ci_method=ci_method,
        variance_method=variance_method,
        fpc=bool(fpc),
        detection_p=p,
        detection_se=p_se,
        presence=bool(presence),
        target_cv=target_cv,
        n_bootstrap=0 if boot is None else int(boot[0].size),
        overall_intervals=tuple(intervals),
        bootstrap_totals=None if boot is None else boot[0],
        warnings=tuple(warnings),
        missing_ids=tuple(ids[missing].tolist()),
        dropped_strata=tuple(empty),
        dropped_area=dropped_area,
    )


def _row(label, area, n, n_missing, mean_c, sd_c, abund, var, cv, df, ci_method, confidence, replicates, alpha,
         collapsed):
    se = math.sqrt(var) if np.isfinite(var) else float("nan")
    if ci_method == CI_T:
        lo, hi = t_interval(abund, se, df, confidence)
    elif ci_method == CI_LOGNORMAL:
        lo, hi = lognormal_interval(abund, cv, confidence)
    else:
        lo, hi = percentile_interval(replicates, confidence)
    return StratumEstimate(
        stratum=label, area=float(area), n=int(n), n_missing=int(n_missing), mean_c=float(mean_c),
        sd_c=float(sd_c), dens=float(abund / area), dens_se=se / area, dens_lo=lo / area, dens_hi=hi / area,
        abund=float(abund), abund_se=se, abund_lo=lo, abund_hi=hi, cv=float(cv), df=float(df),
        collapsed_with=collapsed,
    )


def _plan_next_survey(rows, overall, area_h, mean_a, s2_h, n_total, target_cv, cv_p, fpc):
    """Fill ``n_next`` by Neyman allocation on the observed residual SDs."""
    note = ""
    if cv_p >= target_cv:
        note = message(QT_TRANSLATE_NOOP("PlotwiseEngine",
            "The target CV {target_cv:.3g} cannot be reached by more units: the detection probability's own "
            "CV is {cv_p:.3g}. Improve the detection study first."), target_cv=target_cv, cv_p=cv_p)
        return rows, overall, note
    cv_count = math.sqrt(target_cv ** 2 - cv_p ** 2)
    units_h = area_h / mean_a
    sd_h = np.sqrt(np.nan_to_num(s2_h, nan=0.0))
    if n_total <= 0 or not np.any(sd_h > 0):
        n_h = np.full(len(rows), 2.0)
        note = message(QT_TRANSLATE_NOOP("PlotwiseEngine",
            "No variation was observed, so the next survey's sample sizes are set to the minimum of 2 per stratum."))
    else:
        _, n_h = neyman_sample_size(units_h, sd_h, (cv_count * n_total) ** 2, fpc=fpc)
    n_next = np.maximum(np.ceil(n_h - 1e-9), 2).astype(int)
    rows = [replace(r, n_next=int(k)) for r, k in zip(rows, n_next)]
    return rows, replace(overall, n_next=int(n_next.sum())), note


def stratified_bootstrap(y, a, code, n_strata, group, area_h, p, p_se, rng, n_bootstrap=MIN_BOOTSTRAP,
                         progress=None, chunk_draws=4_000_000, fpc_h=None):
    """Rescaled stratified bootstrap of the abundance (Rao & Wu 1988), collapsed strata included.

    A stratum of its own (n_h ≥ 2, not collapsed) draws ``m_h = n_h - 1`` of its
    units with replacement, computes their density ``D*_h = Σy*/Σa*`` and
    rescales it about the stratum's estimate: ``D~_h = D_h + λ_h (D*_h - D_h)``
    with ``λ_h = sqrt(m_h (1 - f_h) / (n_h - 1)) = sqrt(1 - f_h)`` (f_h the
    sampled fraction when the finite-population correction is asked for, else
    0). The replicates' variance is then ``(1 - f_h) s_h² / (n_h ā_h²)``, the
    textbook variance of the ratio estimator with its finite-population
    correction (Cochran 1977, ch. 6 and §2.6), where the plain bootstrap of
    n_h draws falls short by the factor (n_h - 1)/n_h
    (Rao & Wu 1988, JASA 83:231-241, §2.2; Efron & Tibshirani 1993, ch. 13).

    A stratum collapsed into a group G for its variance (it, or a partner, has
    one unit: Cochran 1977, §5A.12) resamples the residuals of the group's
    pooled ratio ``R_G = Σ_G y / Σ_G a``, ``e_j = y_j - R_G a_j`` (which sum to
    0), and adds them to its own estimate::

        D~_h = D_h + λ_G · Σ_{k=1..n_h} e*_k / Σ_h a,   λ_G = sqrt((1 - f_h) n_G / (n_G - 1))

    with n_h draws from the n_G units of the group. The replicates are centred
    on ``D_h`` (the mean of the e_j is 0) and their variance is
    ``(1 - f_h) s_G² / (n_h ā_h²)`` with ``s_G² = Σ_G e_j² / (n_G - 1)``: the
    pooled collapsed-strata variance that the t interval uses, with the same
    rescaling as above (λ² corrects the residuals' divisor n_G to n_G - 1). A
    one-unit stratum that could not be collapsed (it is the only stratum) has
    no variance: its replicates are NaN.

    ``N = Σ A_h D~_h``; with detection, each resample divides by a p drawn
    from the beta distribution with mean p and standard deviation se_p.
    Percentile intervals (Efron & Tibshirani 1993, ch. 13; Buckland et al.
    2001, §3.7.5).

    Parameters
    ----------
    group : numpy.ndarray of int
        Variance group of each stratum (strata sharing a number were collapsed).
    fpc_h : numpy.ndarray, optional
        ``1 - f_h`` per stratum (default: ones, no correction).

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
    group = np.asarray(group)
    strata_in_group = np.bincount(group)[group]
    for h in range(n_strata):  # a loop over strata; the resamples are vectorised
        own = order[starts[h]:ends[h]]
        n = own.size
        f_scale = max(float(fpc_h[h]), 0.0)
        estimate = y[own].sum() / a[own].sum()
        collapsed = strata_in_group[h] > 1
        if collapsed:  # residuals of the group's pooled ratio, added to the stratum's own estimate
            pool = np.flatnonzero(group[code] == group[h])
            residuals = y[pool] - (y[pool].sum() / a[pool].sum()) * a[pool]
            residuals -= residuals.mean()  # 0 up to rounding
            draws = n
            scale = math.sqrt(f_scale * pool.size / (pool.size - 1)) / a[own].sum()
        elif n >= 2:  # Rao & Wu (1988): n - 1 draws, rescaled about the stratum's estimate
            pool = own
            y_pool, a_pool = y[pool], a[pool]
            draws, scale = n - 1, math.sqrt(f_scale)
            equal_units = bool(np.all(a_pool == a_pool[0]))  # then Σa = m·a in every resample
        else:  # the only stratum, with one unit: no variance, no interval
            per_stratum[:, h] = np.nan
            continue
        rows_per_chunk = max(1, chunk_draws // max(draws, 1))
        for b0 in range(0, n_bootstrap, rows_per_chunk):
            b1 = min(n_bootstrap, b0 + rows_per_chunk)
            pick = rng.integers(0, pool.size, size=(b1 - b0, draws),
                                dtype=np.int32 if pool.size < 2**31 else np.int64)
            if collapsed:
                per_stratum[b0:b1, h] = estimate + scale * residuals[pick].sum(axis=1)
            else:
                surveyed = draws * a_pool[0] if equal_units else a_pool[pick].sum(axis=1)
                per_stratum[b0:b1, h] = estimate + scale * (y_pool[pick].sum(axis=1) / surveyed - estimate)
        if progress is not None and progress(0.2 + 0.7 * (h + 1) / n_strata):
            raise Cancelled()
    per_stratum *= area_h
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
