"""Density and abundance from detection distances on line and point transects.

For stratum *h* with K_h transects of total length L_h (or K_h points visited k_h times in
all), n_h detected groups within the truncation distance ``w``, the probability ``P_a`` of
detecting a group within ``w`` and the mean group size ``E(s)`` (Buckland et al. 2001, ch. 3;
equation numbers from memory)::

    lines:   D_h = n_h E(s) / (2 w L_h P_a)
    points:  D_h = n_h E(s) / (k_h π w² P_a)
    N_h = D_h A_h,   N = Σ N_h,   D = N / Σ A_h

Variance by the delta method (Buckland et al. 2001, eq. 3.68)::

    CV²(D_h) = CV²(n_h / L_h) + CV²(P_a) + CV²(E(s))

* the encounter-rate variance between the transects of a stratum is the design-based
  estimator R2 of Fewster et al. (2009, Biometrics 65:225–236)::

      var(n/L) = K / (L² (K − 1)) · Σ_k l_k² (n_k / l_k − n / L)²

  (for points, ``l_k`` is the number of visits to point *k*);
* the variance of ``P_a`` comes from the Hessian of the detection-function likelihood
  (:mod:`.detection_functions`);
* ``E(s)`` is the mean size of the detected groups, ``var = s²/n``, or, when larger groups
  are seen farther away, the size-bias regression of ``ln s`` on ``ĝ(x)``:
  ``E(s) = exp(â + b̂ + σ̂²/2)``, the expected size where detection is certain (Buckland et
  al. 2001, §3.5.4, from memory).

Degrees of freedom by Satterthwaite (Buckland et al. 2001, eq. 3.75): ``CV⁴(D) / [CV⁴(n/L)/(K−1)
+ CV⁴(P_a)/(n−q) + CV⁴(E(s))/(n−1)]``, and the log-normal interval ``[D/C, D·C]`` with
``C = exp(t_df √ln(1 + CV²))`` (Buckland et al. 2001, §3.6.1, eqs. 3.71–3.74). With one
detection function for all strata, ``P_a`` and ``E(s)`` are common factors: the overall CV adds
their squared CVs once to that of ``Σ A_h n_h / L_h``. Optionally, a bootstrap resamples the
transects within each stratum and refits the chosen detection function to each resample
(Buckland et al. 2001, §3.6.4; seeded).
Nothing here imports the host.
"""
from dataclasses import dataclass, field, replace
import math
import numbers

import numpy as np
from scipy import special, stats

from . import detection_functions as df
from .errors import QT_TRANSLATE_NOOP, Cancelled, InputError, message
from .estimation import satterthwaite_df, stratum_label
from .listing import listed_ids, natural_key

OVERALL = "all"
MIN_DETECTIONS = 20
ADVISED_DETECTIONS = 60  # common practice: Buckland et al. (2001) advise at least 60 to 80 detections
AUTO_TRUNCATION_SHARE = 0.05  # common practice: drop the farthest 5 % of the distances
SIZE_AUTO, SIZE_MEAN, SIZE_REGRESSION = "automatic", "mean", "regression"
SIZE_METHODS = (SIZE_AUTO, SIZE_MEAN, SIZE_REGRESSION)
SIZE_BIAS_ALPHA = 0.15  # common practice (from memory): the size-bias regression is used when p < 0.15


# --------------------------------------------------------------------------- inputs


@dataclass(frozen=True)
class SourceNames:
    """Layer and field names, for the messages."""

    units: str = "units"
    unit_field: str = "unit_id"
    observations: str = "observations"
    obs_unit_field: str = "unit_id"
    distance_field: str = "distance"
    size_field: str = ""


@dataclass(frozen=True)
class DistanceSurvey:
    """The checked survey: units with their effort, and the detections within ``truncation``.

    ``effort`` is in m of line (lines) or visits (points). ``detection_unit`` indexes the units.
    """

    survey: str
    unit_ids: np.ndarray = field(repr=False)
    unit_stratum: np.ndarray = field(repr=False)
    effort: np.ndarray = field(repr=False)
    strata: tuple
    stratum_areas: dict
    detection_unit: np.ndarray = field(repr=False)
    distances: np.ndarray = field(repr=False)
    sizes: np.ndarray = field(repr=False)
    truncation: float
    truncation_auto: bool
    n_recorded: int
    n_dropped: int
    cutpoints: object = None
    has_sizes: bool = False

    @property
    def n(self):
        return int(self.distances.size)


def truncation_distance(distances, share=AUTO_TRUNCATION_SHARE):
    """The distance beyond which the farthest ``share`` of the distances lie (common practice: 5 %)."""
    return float(np.quantile(np.asarray(distances, dtype=float), 1.0 - share))


def _units_iv(unit_ids, unit_strata, effort, stratum_areas, survey, names):
    """Unit labels, stratum labels and effort, checked."""
    ids = np.array([stratum_label(v) for v in unit_ids], dtype=object)
    if any(v is None for v in ids):
        raise InputError(message(QT_TRANSLATE_NOOP(
            "PlotwiseEngine",
            "Layer '{layer}': {n} units have no id in the field '{field}'. Give every unit its id."),
            layer=names.units, n=sum(v is None for v in ids), field=names.unit_field))
    labels, counts = np.unique(ids.astype(str), return_counts=True)
    if np.any(counts > 1):
        raise InputError(message(QT_TRANSLATE_NOOP(
            "PlotwiseEngine",
            "Layer '{layer}': the unit ids {ids} occur more than once in the field '{field}'. Each unit needs its own "
            "id."),
            layer=names.units, ids=listed_ids(labels[counts > 1]), field=names.unit_field),
            ids=list(labels[counts > 1]))
    effort = np.asarray(effort, dtype=float)
    bad = ~(np.isfinite(effort) & (effort > 0))
    if bad.any():
        if survey == df.LINE:
            raise InputError(message(QT_TRANSLATE_NOOP(
                "PlotwiseEngine",
                "Layer '{layer}': the transects {ids} have zero length. Delete them or draw their line."),
                layer=names.units, ids=listed_ids(ids[bad])), ids=list(ids[bad]))
        raise InputError(message(QT_TRANSLATE_NOOP(
            "PlotwiseEngine",
            "Layer '{layer}': the points {ids} have no visits. Give each surveyed point its number of visits (1 or "
            "more), or delete the points that were not surveyed."),
            layer=names.units, ids=listed_ids(ids[bad])), ids=list(ids[bad]))
    strata = np.array([stratum_label(v) for v in unit_strata], dtype=object)
    known = {str(k) for k in stratum_areas}
    outside = np.array([s is None or s not in known for s in strata])
    if outside.any():
        raise InputError(message(QT_TRANSLATE_NOOP(
            "PlotwiseEngine",
            "Layer '{layer}': the units {ids} have no stratum, or a stratum that the strata layer does not have "
            "({strata}). Give each unit the id of its stratum."),
            layer=names.units, ids=listed_ids(ids[outside]), strata=", ".join(sorted(known, key=natural_key))),
            ids=list(ids[outside]))
    order = tuple(sorted(known, key=natural_key))
    per_stratum = {h: int(np.sum(strata == h)) for h in order}
    empty = [h for h, k in per_stratum.items() if k == 0]
    if empty:
        raise InputError(message(QT_TRANSLATE_NOOP(
            "PlotwiseEngine",
            "The strata {strata} have no surveyed transect or point. Survey them, or leave them out of the strata "
            "layer (the estimate then speaks for the other strata only)."),
            strata=", ".join(empty)), ids=empty)
    single = [h for h, k in per_stratum.items() if k == 1]
    if single:
        raise InputError(message(QT_TRANSLATE_NOOP(
            "PlotwiseEngine",
            "The strata {strata} have one transect or point each; the encounter rate's variance needs at least 2 per "
            "stratum. Merge each with a neighbouring stratum in the strata layer and the units' stratum field."),
            strata=", ".join(single)), ids=single)
    return ids, strata, effort, order


def _numbers(values):
    """Floats from attribute values; NaN for anything that is not a number (None, text, booleans)."""
    return np.array([float(v) if isinstance(v, numbers.Real) and not isinstance(v, (bool, np.bool_)) else np.nan
                     for v in values], dtype=float)


def _observations_iv(obs_unit_ids, distances, sizes, obs_ids, ids, names):
    """Unit index, distance and group size of each observation, checked."""
    obs_ids = np.asarray(list(range(len(distances))) if obs_ids is None else obs_ids, dtype=object)
    position = {label: i for i, label in enumerate(ids)}
    keys = [stratum_label(v) for v in obs_unit_ids]
    unknown = sorted({str(k) for k in keys if k not in position}, key=natural_key)
    if unknown:
        raise InputError(message(QT_TRANSLATE_NOOP(
            "PlotwiseEngine",
            "Layer '{layer}': observations name units that the layer '{units}' does not have (field '{field}'): "
            "{ids}. Correct these unit ids, or add the units."),
            layer=names.observations, units=names.units, field=names.obs_unit_field, ids=listed_ids(unknown)),
            ids=unknown)
    x = _numbers(distances)
    missing = ~np.isfinite(x)
    if missing.any():
        raise InputError(message(QT_TRANSLATE_NOOP(
            "PlotwiseEngine",
            "Layer '{layer}': the observations {ids} have no distance in the field '{field}' (empty or not a number). "
            "Fill in the distances, or delete those observations."),
            layer=names.observations, ids=listed_ids(obs_ids[missing]), field=names.distance_field),
                         ids=list(obs_ids[missing]))
    if np.any(x < 0):
        raise InputError(message(QT_TRANSLATE_NOOP(
            "PlotwiseEngine",
            "Layer '{layer}': the observations {ids} have a negative distance in the field '{field}'. Distances are "
            "measured from the line or the point outwards and are 0 m or more; correct them."),
            layer=names.observations, ids=listed_ids(obs_ids[x < 0]), field=names.distance_field),
            ids=list(obs_ids[x < 0]))
    if sizes is None:
        s = np.ones(x.size)
    else:
        s = _numbers(sizes)
        bad = ~(np.isfinite(s) & (s > 0))
        if bad.any():
            raise InputError(message(QT_TRANSLATE_NOOP(
                "PlotwiseEngine",
                "Layer '{layer}': the observations {ids} have no group size above 0 in the field '{field}'. Fill in "
                "the number of animals seen in each group (1 for a single animal), or choose no group-size field."),
                layer=names.observations, ids=listed_ids(obs_ids[bad]), field=names.size_field), ids=list(obs_ids[bad]))
    return np.array([position[k] for k in keys], dtype=np.int64), x, s


def _truncation_iv(x, truncation, cutpoints):
    """``(w, automatic, cutpoints)``: the bands' last edge, the distance given, or the 95 % quantile."""
    if cutpoints is not None and len(cutpoints):
        edges = np.asarray(cutpoints, dtype=float)
        if edges.size < 3 or edges[0] != 0 or np.any(np.diff(edges) <= 0):
            raise InputError(message(QT_TRANSLATE_NOOP(
                "PlotwiseEngine",
                "The distance bands must start at 0 m and increase, with at least two bands (got {cutpoints})."),
                cutpoints=", ".join(f"{c:g}" for c in edges)))
        return float(edges[-1]), False, edges
    if truncation is not None and truncation > 0:
        return float(truncation), False, None
    if x.size == 0:
        raise InputError(message(QT_TRANSLATE_NOOP(
            "PlotwiseEngine",
            "There are no observations: a detection function needs at least {minimum} detections."),
            minimum=MIN_DETECTIONS))
    return truncation_distance(x), True, None


def distance_survey_iv(unit_ids, unit_strata, effort, stratum_areas, obs_unit_ids, distances, sizes=None, *,
                       survey=df.LINE, truncation=None, cutpoints=None, obs_ids=None, names=SourceNames()):
    """Check the units and observations, apply the right truncation; return ``(DistanceSurvey, warnings)``.

    Raises
    ------
    InputError
        Missing, duplicated or unknown unit ids; zero-length transects; negative or missing distances;
        group sizes not above 0; strata with fewer than 2 units; fewer than ``MIN_DETECTIONS``
        detections within the truncation distance (the message names the count).
    """
    if survey not in df.SURVEYS:
        raise InputError(message(QT_TRANSLATE_NOOP(
            "PlotwiseEngine",
            "The survey type must be 'line' or 'point' (got '{survey}')."),
            survey=survey))
    ids, strata, effort, order = _units_iv(unit_ids, unit_strata, effort, stratum_areas, survey, names)
    unit_index, x, s = _observations_iv(obs_unit_ids, distances, sizes, obs_ids, ids, names)
    w, automatic, edges = _truncation_iv(x, truncation, cutpoints)
    kept = x <= w
    n = int(kept.sum())
    if n < MIN_DETECTIONS:
        raise InputError(message(QT_TRANSLATE_NOOP(
            "PlotwiseEngine",
            "Only {n} detections lie within the truncation distance of {w:g} m; a detection function needs at least "
            "{minimum} (common practice: 60 to 80). Survey more transects or points, or raise the truncation "
            "distance."),
            n=n, w=w, minimum=MIN_DETECTIONS))
    warnings = []
    if n < ADVISED_DETECTIONS:
        warnings.append(message(QT_TRANSLATE_NOOP(
            "PlotwiseEngine",
            "Only {n} detections lie within the truncation distance: the detection function rests on few distances "
            "(common practice asks for 60 to 80), so its shape and the density are uncertain, and AIC may choose a "
            "model by chance."),
            n=n))
    surveyed = DistanceSurvey(
        survey=survey, unit_ids=ids, unit_stratum=strata, effort=effort, strata=order,
        stratum_areas={h: float(stratum_areas[h]) for h in order}, detection_unit=unit_index[kept],
        distances=x[kept], sizes=s[kept], truncation=w, truncation_auto=automatic, n_recorded=int(x.size),
        n_dropped=int(x.size - n), cutpoints=edges, has_sizes=sizes is not None)
    return surveyed, warnings


# --------------------------------------------------------------------------- components


def encounter_rate_variance(counts, efforts):
    """Design-based variance of the encounter rate ``n / L`` between transects (estimator R2).

    ``var(n/L) = K / (L² (K − 1)) · Σ_k l_k² (n_k / l_k − n / L)²`` (Fewster et al. 2009,
    Biometrics 65:225–236, estimator R2; Buckland et al. 2001, eq. 3.78 for equal lines).

    Parameters
    ----------
    counts : array_like
        Detections ``n_k`` per transect (or point).
    efforts : array_like
        Length ``l_k`` of each transect (or the visits to each point).
    """
    n_k = np.asarray(counts, dtype=float)
    l_k = np.asarray(efforts, dtype=float)
    k = n_k.size
    if k < 2:
        return float("nan")
    length, n = l_k.sum(), n_k.sum()
    return float(k / (length ** 2 * (k - 1)) * np.sum(l_k ** 2 * (n_k / l_k - n / length) ** 2))


def lognormal_interval_t(estimate, cv, df_, confidence):
    """Log-normal interval ``[N/C, N·C]``, ``C = exp(t_df √ln(1 + CV²))`` (Buckland et al. 2001, §3.6.1).

    With infinite degrees of freedom the normal quantile is used. An estimate of 0 gives [0, 0].
    """
    if estimate == 0:
        return 0.0, 0.0
    if not (np.isfinite(cv) and np.isfinite(estimate)):
        return float("nan"), float("nan")
    level = 0.5 + confidence / 2.0
    q = special.stdtrit(df_, level) if np.isfinite(df_) and df_ > 0 else special.ndtri(level)
    c = math.exp(q * math.sqrt(math.log1p(cv * cv)))
    return float(estimate / c), float(estimate * c)


@dataclass(frozen=True)
class GroupSize:
    """Expected group size ``E(s)`` and how it was estimated.

    ``method`` is ``"none"`` (no group sizes: each detection is one animal), ``"mean"`` or
    ``"regression"`` (size-bias regression of ln s on ĝ(x)). ``slope``, ``slope_p`` belong to
    the regression, computed whenever the sizes vary.
    """

    method: str
    n: int
    mean: float
    expected: float
    se: float
    intercept: float = float("nan")
    slope: float = float("nan")
    slope_se: float = float("nan")
    slope_p: float = float("nan")

    @property
    def cv(self):
        return self.se / self.expected if self.expected > 0 else float("nan")


def group_size_estimate(sizes, detection_probabilities, method=SIZE_AUTO, alpha=SIZE_BIAS_ALPHA, has_sizes=True):
    """Expected group size, by the mean or by the size-bias regression.

    The regression ``ln s_i = a + b ĝ(x_i) + ε`` gives the expected size where detection is
    certain (ĝ = 1): ``E(s) = exp(â + b̂ + σ̂²/2)``, with ``var(E(s)) ≈ E(s)² var(â + b̂)``,
    ``var(â + b̂) = σ̂² (1/n + (1 − x̄)² / S_xx)`` (Buckland et al. 2001, §3.5.4, from memory).
    ``"automatic"`` uses it when larger groups are seen farther away (b̂ < 0) and the slope
    differs from 0 at level ``alpha`` (common practice 0.15); otherwise the mean, ``var = s²/n``.
    """
    s = np.asarray(sizes, dtype=float)
    g = np.asarray(detection_probabilities, dtype=float)
    n = s.size
    mean = float(s.mean())
    if not has_sizes:
        return GroupSize("none", n, 1.0, 1.0, 0.0)
    se_mean = float(s.std(ddof=1) / np.sqrt(n)) if n > 1 else float("nan")
    sxx = float(np.sum((g - g.mean()) ** 2))
    y = np.log(s)
    if n < 3 or sxx <= 0 or np.ptp(y) == 0:
        return GroupSize(SIZE_MEAN if method != "none" else "none", n, mean, mean, se_mean)
    slope = float(np.sum((g - g.mean()) * (y - y.mean())) / sxx)
    intercept = float(y.mean() - slope * g.mean())
    residual = float(np.sum((y - intercept - slope * g) ** 2) / (n - 2))
    slope_se = math.sqrt(residual / sxx)
    slope_p = float(2.0 * stats.t.sf(abs(slope) / slope_se, n - 2)) if slope_se > 0 else 0.0
    use = method == SIZE_REGRESSION or (method == SIZE_AUTO and slope < 0 and slope_p < alpha)
    if not use:
        return GroupSize(SIZE_MEAN, n, mean, mean, se_mean, intercept, slope, slope_se, slope_p)
    expected = math.exp(intercept + slope + residual / 2.0)
    var_line = residual * (1.0 / n + (1.0 - g.mean()) ** 2 / sxx)
    return GroupSize(SIZE_REGRESSION, n, mean, expected, expected * math.sqrt(var_line), intercept, slope, slope_se,
                     slope_p)


# --------------------------------------------------------------------------- detection


@dataclass(frozen=True)
class DetectionAnalysis:
    """The detection function and group size of one set of detections (a stratum, or ``all``)."""

    stratum: str
    selection: object
    group_size: GroupSize
    distances: np.ndarray = field(repr=False, compare=False)
    sizes: np.ndarray = field(repr=False, compare=False)

    @property
    def fit(self):
        return self.selection.best

    @property
    def n(self):
        return int(self.distances.size)


def _analyse_detections(label, distances, sizes, survey, settings, progress=None):
    data = df.distance_data_iv(distances, survey.truncation, survey.survey, survey.cutpoints)
    selection = df.select_detection_function(data, settings["keys"], settings["max_adjustments"], progress)
    g = df.detection_curve(selection.best, distances)
    size = group_size_estimate(sizes, g, settings["size_method"], has_sizes=survey.has_sizes)
    return DetectionAnalysis(label, selection, size, distances, sizes)


def detection_analyses(survey, settings, progress=None):
    """One analysis for all detections, or one per stratum (``settings["per_stratum"]``)."""
    if not settings["per_stratum"]:
        return (_analyse_detections(OVERALL, survey.distances, survey.sizes, survey, settings, progress),)
    stratum_of_detection = survey.unit_stratum[survey.detection_unit]
    few = [(h, int(np.sum(stratum_of_detection == h))) for h in survey.strata]
    lacking = [f"{h} ({n})" for h, n in few if n < MIN_DETECTIONS]
    if lacking:
        raise InputError(message(QT_TRANSLATE_NOOP(
            "PlotwiseEngine",
            "A detection function per stratum needs at least {minimum} detections in each stratum within the "
            "truncation distance; these strata have fewer: {strata}. Use one detection function for all strata."),
            minimum=MIN_DETECTIONS, strata=", ".join(lacking)))
    analyses = []
    for i, h in enumerate(survey.strata):
        inside = stratum_of_detection == h
        part = None if progress is None else (lambda f, i=i: progress((i + f) / len(survey.strata)))
        analyses.append(_analyse_detections(h, survey.distances[inside], survey.sizes[inside], survey, settings, part))
    return tuple(analyses)


def detection_warnings(analyses, per_stratum):
    """Warnings about the chosen models: few detections per stratum, poor fit, a bound, no variance."""
    warnings = []
    for a in analyses:
        fit, where = a.fit, ("" if a.stratum == OVERALL else a.stratum)
        if per_stratum and a.n < ADVISED_DETECTIONS:
            warnings.append(message(QT_TRANSLATE_NOOP(
                "PlotwiseEngine",
                "Stratum {stratum}: its detection function rests on {n} detections (common practice asks for 60 to 80 "
                "per function); consider one function for all strata."),
                stratum=where, n=a.n))
        if np.isfinite(fit.gof_p) and fit.gof_p < 0.05:
            where_text = ""
            if where:
                where_text = message(QT_TRANSLATE_NOOP("PlotwiseEngine", ", stratum {stratum}"), stratum=where)
            warnings.append(message(QT_TRANSLATE_NOOP(
                "PlotwiseEngine",
                "The chosen detection function ({model}{at}) fits the distances poorly (goodness-of-fit p = {p:.3f}). "
                "Look at the histogram for heaping at round distances or a spike at 0, and consider distance bands or "
                "another truncation."),
                model=fit.label, at=where_text, p=fit.gof_p))
        if fit.at_bound:
            warnings.append(message(QT_TRANSLATE_NOOP(
                "PlotwiseEngine",
                "The chosen detection function ({model}) has a parameter at the limit of its range, so its variance "
                "is unreliable; try another truncation or key."),
                model=fit.label))
        if not np.isfinite(fit.p_det_se):
            warnings.append(message(QT_TRANSLATE_NOOP(
                "PlotwiseEngine",
                "The variance of the detection function ({model}) could not be computed (the likelihood is flat at "
                "its maximum); its CV is missing from the interval."),
                model=fit.label))
    return warnings


# --------------------------------------------------------------------------- density


@dataclass(frozen=True)
class StratumDensity:
    """Estimate for one stratum, or for all strata (``stratum == "all"``).

    ``effort`` is km of line (lines) or point visits (points); ``encounter_rate`` detections per
    km or per visit. ``esw`` is the effective strip half-width (lines) or effective detection
    radius (points), m. Densities are per the caller's area unit; ``cv`` is the CV of the
    abundance (and the density). ``components`` holds ``(part, CV², df)`` for the encounter
    rate, the detection function and the group size.
    """

    stratum: str
    area: float
    n_units: int
    effort: float
    n_det: int
    encounter_rate: float
    encounter_rate_se: float
    p_det: float
    p_det_se: float
    esw: float
    mean_size: float
    mean_size_se: float
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
    components: tuple = ()


def _combine(components):
    """``(CV, df)`` of a product from its ``(part, CV², df)`` components (Satterthwaite on CV²)."""
    cv2 = float(sum(c[1] for c in components))
    if not np.isfinite(cv2):
        return float("nan"), float("nan")
    return math.sqrt(cv2), satterthwaite_df([c[1] for c in components], [c[2] for c in components])


def _row(label, area, n_units, effort, n_det, er, er_se, fit, size, abund, components, confidence):
    cv, dof = _combine(components) if abund > 0 else (float("nan"), float("nan"))
    se = abund * cv if abund > 0 else 0.0
    lo, hi = lognormal_interval_t(abund, cv, dof, confidence)
    p_det = fit.p_det if fit is not None else float("nan")
    return StratumDensity(
        stratum=label, area=area, n_units=n_units, effort=effort, n_det=n_det, encounter_rate=er,
        encounter_rate_se=er_se, p_det=p_det, p_det_se=fit.p_det_se if fit is not None else float("nan"),
        esw=fit.esw if fit is not None else float("nan"),
        mean_size=size.expected if size is not None else float("nan"),
        mean_size_se=size.se if size is not None else float("nan"),
        dens=abund / area, dens_se=se / area, dens_lo=lo / area, dens_hi=hi / area, abund=abund, abund_se=se,
        abund_lo=lo, abund_hi=hi, cv=cv, df=dof, components=tuple(components))


def _per_unit_effort(survey):
    """Effort in the field's unit (km of line, or visits) and the detections per unit."""
    counts = np.bincount(survey.detection_unit, minlength=survey.unit_ids.size).astype(float)
    scale = 1000.0 if survey.survey == df.LINE else 1.0
    return counts, survey.effort / scale


def _detection_parts(fit, size):
    """``(part, CV², df)`` of the detection function (df n − q) and of the group size (df n − 1)."""
    parts = [("detection", fit.p_det_cv ** 2, max(fit.n - fit.n_par, 1))]
    if size.method != "none":
        parts.append(("group size", size.cv ** 2, max(size.n - 1, 1)))
    return parts


def density_rows(survey, analyses, confidence, m2_per_unit):
    """Per-stratum rows and the overall row (see the module docstring for the formulas)."""
    counts, effort = _per_unit_effort(survey)
    pooled = analyses[0] if len(analyses) == 1 and analyses[0].stratum == OVERALL else None
    by_stratum = {a.stratum: a for a in analyses}
    # animals per m² = encounter rate per m of line (or per visit) · E(s) / (c P_a), c = 2w or π w² (m, m²)
    covered = 2.0 * survey.truncation * 1000.0 if survey.survey == df.LINE else np.pi * survey.truncation ** 2
    rows, er_parts, numerator = [], [], 0.0
    for h in survey.strata:
        inside = survey.unit_stratum == h
        n_h, l_h, area = counts[inside].sum(), effort[inside].sum(), survey.stratum_areas[h]
        er = n_h / l_h
        er_var = encounter_rate_variance(counts[inside], effort[inside])
        a = pooled or by_stratum[h]
        abund = area * m2_per_unit * er * a.group_size.expected / (covered * a.fit.p_det)
        parts = [("encounter rate", er_var / er ** 2 if er > 0 else float("nan"), int(inside.sum()) - 1)]
        parts += _detection_parts(a.fit, a.group_size)
        rows.append(_row(h, area, int(inside.sum()), l_h, int(n_h), er, math.sqrt(er_var), a.fit, a.group_size, abund,
                         parts, confidence))
        er_parts.append((area ** 2 * er_var, int(inside.sum()) - 1))
        numerator += area * er
    total_area = sum(survey.stratum_areas.values())
    total = sum(r.abund for r in rows)
    if pooled is not None:
        parts = [("encounter rate", v / numerator ** 2, d) for v, d in er_parts] if numerator > 0 else []
        parts += _detection_parts(pooled.fit, pooled.group_size)
        fit, size = pooled.fit, pooled.group_size
    else:
        parts = [(name, (r.abund / total) ** 2 * c2, d) for r in rows if r.abund > 0 for name, c2, d in r.components]
        fit = size = None
    # the overall encounter rate is the area-weighted mean of the strata's, Σ A_h (n_h/L_h) / Σ A_h
    overall = _row(OVERALL, total_area, int(survey.unit_ids.size), float(effort.sum()), int(counts.sum()),
                   numerator / total_area, math.sqrt(sum(v for v, _ in er_parts)) / total_area, fit, size, total,
                   parts, confidence)
    return tuple(rows), overall


# --------------------------------------------------------------------------- bootstrap


@dataclass(frozen=True)
class BootstrapResult:
    """Bootstrap over transects: abundance replicates per stratum and overall (last column)."""

    replicates: int
    failed: int
    abundance: np.ndarray = field(repr=False, compare=False)

    def interval(self, column, confidence):
        values = self.abundance[:, column]
        lo, hi = np.quantile(values, [0.5 - confidence / 2.0, 0.5 + confidence / 2.0])
        return float(lo), float(hi)

    def se(self, column):
        return float(np.std(self.abundance[:, column], ddof=1))


def _resample_units(survey, rng):
    """Units drawn with replacement within each stratum, as many as the stratum has."""
    chosen = []
    for h in survey.strata:
        members = np.flatnonzero(survey.unit_stratum == h)
        chosen.append(members[rng.integers(0, members.size, members.size)])
    return np.concatenate(chosen)


def _replicate_abundance(survey, analyses, units, by_unit, settings, m2_per_unit):
    """Abundance per stratum (and overall) of one resample of the units; None when a fit fails."""
    order, starts, counts = by_unit
    lengths = counts[units]
    offsets = np.repeat(starts[units] - np.cumsum(lengths) + lengths, lengths) + np.arange(lengths.sum())
    detections = order[offsets]  # the detections of the drawn units, repeated as the units are
    stratum_of = survey.unit_stratum[survey.detection_unit[detections]]
    covered = 2.0 * survey.truncation if survey.survey == df.LINE else np.pi * survey.truncation ** 2
    factor = {}
    for a in analyses:
        picked = detections if a.stratum == OVERALL else detections[stratum_of == a.stratum]
        if picked.size < MIN_DETECTIONS:
            return None
        x, s = survey.distances[picked], survey.sizes[picked]
        try:
            data = df.distance_data_iv(x, survey.truncation, survey.survey, survey.cutpoints)
            fit = df.fit_detection_function(data, a.fit.model, start=a.fit.theta, variance=False, goodness=False)
        except InputError:
            return None
        if not fit.converged or not fit.p_det > 0:
            return None
        method = SIZE_REGRESSION if a.group_size.method == SIZE_REGRESSION else SIZE_MEAN
        size = group_size_estimate(s, df.detection_curve(fit, x), method, has_sizes=survey.has_sizes)
        factor[a.stratum] = size.expected / (covered * fit.p_det)
    out = []
    for h in survey.strata:
        inside = survey.unit_stratum[units] == h
        er = lengths[inside].sum() / survey.effort[units][inside].sum()
        out.append(survey.stratum_areas[h] * m2_per_unit * er * factor.get(h, factor.get(OVERALL)))
    return out + [sum(out)]


def bootstrap_over_transects(survey, analyses, settings, m2_per_unit, rng, n_bootstrap, progress=None):
    """Resample transects (or points) within strata and refit the chosen detection functions.

    Each replicate draws K_h units with replacement in every stratum, keeps all their detections,
    refits the chosen model (its key and cosine terms; AIC is not rerun) and recomputes group size
    and abundance (Buckland et al. 2001, §3.6.4, from memory). Replicates whose fit fails are
    counted and left out.
    """
    order = np.argsort(survey.detection_unit, kind="stable")
    counts = np.bincount(survey.detection_unit, minlength=survey.unit_ids.size)
    starts = np.concatenate([[0], np.cumsum(counts)[:-1]])
    replicates, failed = [], 0
    for b in range(int(n_bootstrap)):
        units = _resample_units(survey, rng)
        value = _replicate_abundance(survey, analyses, units, (order, starts, counts), settings, m2_per_unit)
        if value is None:
            failed += 1
        else:
            replicates.append(value)
        if progress is not None and b % 10 == 0 and progress(b / n_bootstrap):
            raise Cancelled()
    if len(replicates) < 2:
        raise InputError(message(QT_TRANSLATE_NOOP(
            "PlotwiseEngine",
            "The bootstrap failed: {failed} of {n} resamples could not be fitted. Run without the bootstrap."),
            failed=failed, n=int(n_bootstrap)))
    return BootstrapResult(len(replicates), failed, np.asarray(replicates, dtype=float))


def _with_bootstrap(row, column, boot, confidence):
    """``row`` with the bootstrap's SE and percentile interval (df not used)."""
    se = boot.se(column)
    lo, hi = boot.interval(column, confidence)
    area = row.area
    return replace(row, abund_se=se, abund_lo=lo, abund_hi=hi, dens_se=se / area, dens_lo=lo / area,
                   dens_hi=hi / area, cv=se / row.abund if row.abund > 0 else float("nan"), df=float("nan"))


# --------------------------------------------------------------------------- the estimate


@dataclass(frozen=True)
class DistanceDensityResult:
    """Result of :func:`estimate_distance_density`.

    Attributes
    ----------
    strata, overall : StratumDensity
        The rows reported (with the bootstrap's SE and interval when it was run).
    delta_rows : tuple of StratumDensity
        The strata and overall rows by the delta method and the log-normal interval (always).
    analyses : tuple of DetectionAnalysis
        One for all strata (``stratum == "all"``), or one per stratum.
    survey : DistanceSurvey
        The checked inputs (truncation, dropped detections, effort).
    bootstrap : BootstrapResult or None
    warnings : tuple of Message
    """

    strata: tuple
    overall: StratumDensity
    delta_rows: tuple
    analyses: tuple
    survey: DistanceSurvey
    confidence: float
    per_stratum: bool
    size_method: str
    bootstrap: object = None
    warnings: tuple = ()

    def table(self):
        return self.strata + (self.overall,)


def estimate_distance_density(unit_ids, unit_strata, effort, stratum_areas, obs_unit_ids, distances, sizes=None, *,
                              survey=df.LINE, truncation=None, cutpoints=None, keys=df.KEYS,
                              max_adjustments=df.MAX_ADJUSTMENTS, per_stratum=False, size_method=SIZE_AUTO,
                              confidence=0.95, m2_per_unit=1e6, n_bootstrap=0, rng=None, obs_ids=None,
                              names=SourceNames(), progress=None):
    """Density and abundance per stratum and overall from detection distances.

    Parameters
    ----------
    unit_ids, unit_strata : sequence
        Id and stratum id of every surveyed transect or point (including those with no detection).
    effort : array_like
        Length in m of each transect (lines), or the visits to each point (points).
    stratum_areas : mapping
        Stratum id → area in the caller's area unit (``m2_per_unit`` m² each).
    obs_unit_ids, distances, sizes : sequence
        The unit, the distance in m and the group size (None: each detection is one animal) of
        every detection.
    truncation : float, optional
        Right-truncation distance in m; None or 0 drops the farthest 5 % (common practice).
    cutpoints : sequence, optional
        Distance bands (grouped distances), from 0 to the truncation distance.
    keys, max_adjustments : the models tried (see :func:`detection_functions.select_detection_function`).
    per_stratum : bool
        One detection function per stratum instead of one for all.
    size_method : {"automatic", "mean", "regression"}
    n_bootstrap : int
        Bootstrap resamples over transects (0: none); needs ``rng``.
    progress : callable, optional
        ``progress(fraction) -> cancelled``.

    Returns
    -------
    DistanceDensityResult
    """
    if size_method not in SIZE_METHODS:
        raise InputError(message(QT_TRANSLATE_NOOP(
            "PlotwiseEngine",
            "Unknown group-size method '{method}'."),
            method=size_method))
    if not 0.5 <= confidence < 1.0:
        raise InputError(message(QT_TRANSLATE_NOOP(
            "PlotwiseEngine",
            "The confidence level must be between 0.5 and 1 (got {level:g})."),
            level=confidence))
    checked, warnings = distance_survey_iv(unit_ids, unit_strata, effort, stratum_areas, obs_unit_ids, distances,
                                           sizes, survey=survey, truncation=truncation, cutpoints=cutpoints,
                                           obs_ids=obs_ids, names=names)
    settings = dict(keys=tuple(keys), max_adjustments=int(max_adjustments), per_stratum=bool(per_stratum),
                    size_method=size_method)
    fitting = None if progress is None else (lambda f: progress(0.7 * f if n_bootstrap else 0.95 * f))
    analyses = detection_analyses(checked, settings, fitting)
    warnings += detection_warnings(analyses, per_stratum)
    strata, overall = density_rows(checked, analyses, confidence, m2_per_unit)
    delta_rows = strata + (overall,)
    boot = None
    if n_bootstrap:
        if rng is None:
            raise InputError(message(QT_TRANSLATE_NOOP(
                "PlotwiseEngine",
                "The bootstrap needs a random generator (a seed).")))
        part = None if progress is None else (lambda f: progress(0.7 + 0.3 * f))
        boot = bootstrap_over_transects(checked, analyses, settings, m2_per_unit, rng, n_bootstrap, part)
        strata = tuple(_with_bootstrap(r, i, boot, confidence) for i, r in enumerate(strata))
        overall = _with_bootstrap(overall, len(strata), boot, confidence)
        if boot.failed:
            warnings.append(message(QT_TRANSLATE_NOOP(
                "PlotwiseEngine",
                "{failed} of {n} bootstrap resamples could not be fitted and were left out; the bootstrap interval "
                "may be too narrow."),
                failed=boot.failed, n=int(n_bootstrap)))
    return DistanceDensityResult(strata, overall, delta_rows, analyses, checked, float(confidence),
                                 bool(per_stratum), size_method, boot, tuple(warnings))
