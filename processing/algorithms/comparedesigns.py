"""plotwise:comparedesigns: survey designs compared by simulating surveys of a density surface."""

import numpy as np
from qgis.core import (
    QgsProcessingException,
    QgsProcessingParameterBoolean,
    QgsProcessingOutputString,
    QgsProcessingParameterEnum,
    QgsProcessingParameterFeatureSink,
    QgsProcessingParameterFeatureSource,
    QgsProcessingParameterField,
    QgsProcessingParameterNumber,
    QgsProcessingParameterRasterLayer,
    QgsProcessingParameterString,
)
from shapely.ops import unary_union

from ...plugin import compat
from .. import bridge, raster_io
from ..engine import design_comparison as engine
from ..engine import estimation
from ..engine.errors import InputError
from ..engine.unit_shapes import LINE
from ..report import svg
from .base import PlotwiseAlgorithm


M2_PER_KM2 = 1e6

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
)
LOCAL_REFERENCE = (
    "Stevens, D. L. & Olsen, A. R. (2003). Variance estimation for spatially balanced samples of "
    "environmental resources. Environmetrics 14, 593-610."
)

OUTPUT_FIELDS = [
    ("design", "string", 30), ("code", "int"), ("n_asked", "int"), ("mean_n", "double"), ("alloc", "string", 120),
    ("true_mean", "double"), ("est_mean", "double"), ("rel_bias", "double"), ("emp_se", "double"),
    ("rmse", "double"), ("rmse_mcse", "double"), ("rel_rmse", "double"), ("mean_cv", "double"),
    ("coverage", "double"), ("n_reps", "int"), ("n_failed", "int"), ("recommend", "int"),
]


class CompareDesigns(PlotwiseAlgorithm):
    ALGORITHM_NAME = "comparedesigns"
    GROUP_ID = "design"

    SURFACE = "SURFACE"
    FRAME = "FRAME"
    STRATA = "STRATA"
    STRATUM_FIELD = "STRATUM_FIELD"
    DESIGNS = "DESIGNS"
    N_UNITS = "N_UNITS"
    SHAPE = "SHAPE"
    SIZE = "SIZE"
    HALF_WIDTH = "HALF_WIDTH"
    BEARING = "BEARING"
    INSIDE = "INSIDE"
    REPLICATES = "REPLICATES"
    OVERDISPERSION = "OVERDISPERSION"
    VARIANCE_METHOD = "VARIANCE_METHOD"
    N_RANGE = "N_RANGE"
    OUTPUT_TABLE = "OUTPUT_TABLE"
    RECOMMENDED = "RECOMMENDED"

    def displayName(self):  # noqa: N802 (host naming)
        return self.tr("Compare survey designs by simulation")

    def design_name(self, design):
        """The name of design ``design`` (an index of ``engine.DESIGNS``) in the user's language."""
        return self.engine_term(engine.DESIGNS[design])

    def shortHelpString(self):  # noqa: N802 (host naming)
        return self.tr(
            "Before fieldwork: which design, and how many units, give a usable estimate on this area? The "
            "algorithm simulates many surveys of a plausible density surface and reports how each design "
            "did.\n\n"
            "Surface: a raster of expected animals per km² (from a habitat model, an expert map or an earlier "
            "survey), warped to the frame's CRS when needed. Frame: the sampling frame. Strata (optional, with "
            "the stratum field, default 'stratum'): needed by the two stratified designs.\n\n"
            "Each replicate realises a population: Poisson counts in every surface cell, or with an "
            "overdispersion k above 0 negative binomial counts (gamma-Poisson, variance μ + μ²/k per cell). "
            "Every chosen design is then laid out with the layout engine, its units count the animals in the "
            "cells they cover (the part inside the frame or their stratum), and the abundance is estimated "
            "with the estimation engine (ratio estimator, t interval with Satterthwaite df; Cochran 1977). "
            "All designs survey the same populations, so their differences are not blurred.\n\n"
            "Designs: simple random; stratified with proportional allocation; stratified with Neyman "
            "allocation, n_h ∝ A_h·S_h with S_h the SD of a unit's count implied by the surface (Neyman "
            "1934); systematic grid with a random start (its n varies); spatially balanced (balanced "
            "acceptance sampling, Robertson et al. 2013).\n\n"
            "Units: point station (size = counting radius), square plot (side), circular plot (radius), line "
            "transect (length, counting a strip of the given half-width on each side). Bearing in degrees "
            "clockwise from grid north, −1 random. Keep units inside: centres are drawn from each stratum "
            "shrunk by the unit's radius, as the layout's option does. Otherwise a unit reaching over the "
            "edge of its stratum or of the frame counts only the part inside, and its area is that part.\n\n"
            "Output table, one row per design: rel_bias (relative bias against each population's true total), "
            "emp_se (SD of the errors), rmse (root mean square error) and rmse_mcse (its Monte Carlo SE), "
            "rel_rmse (rmse / mean true total), mean_cv (mean estimated CV), coverage (share of 95 % "
            "intervals holding the truth), mean_n (mean units surveyed), alloc (units per stratum), "
            "recommend (1 for the recommended design: the lowest RMSE among designs whose intervals cover "
            "at least 90 %).\n\n"
            "Range of units (optional), e.g. '20, 40, 80' or '20:100:20': the comparison is repeated at each n "
            "and the report draws RMSE against n, showing where more effort stops paying.\n\n"
            "The simulation assumes the surface is right and every animal in a unit is counted. Results are "
            "only as good as the surface. Check every unit's access and safety before fieldwork: the tool "
            "never makes a location safe."
        )

    def initAlgorithm(self, config=None):  # noqa: N802 (host naming)
        self.addParameter(QgsProcessingParameterRasterLayer(self.SURFACE, self.tr("Density surface (expected animals per km²)")))
        self.addParameter(
            QgsProcessingParameterFeatureSource(self.FRAME, self.tr("Sampling frame"), [compat.TYPE_VECTOR_POLYGON])
        )
        self.addParameter(
            QgsProcessingParameterFeatureSource(
                self.STRATA, self.tr("Strata (for the stratified designs)"), [compat.TYPE_VECTOR_POLYGON], optional=True
            )
        )
        self.addParameter(
            QgsProcessingParameterField(
                self.STRATUM_FIELD, self.tr("Stratum field"), "stratum", self.STRATA, compat.FIELD_ANY, optional=True
            )
        )
        self.addParameter(
            QgsProcessingParameterEnum(
                self.DESIGNS, self.tr("Designs to compare"),
                [self.tr("Simple random"), self.tr("Stratified, proportional allocation"),
                 self.tr("Stratified, Neyman allocation"), self.tr("Systematic grid"), self.tr("Spatially balanced")],
                allowMultiple=True, defaultValue=[0, 1, 2, 3, 4],
            )
        )
        self.addParameter(
            QgsProcessingParameterNumber(
                self.N_UNITS, self.tr("Number of units"), type=compat.NUMBER_INTEGER, defaultValue=30, minValue=2
            )
        )
        self.addParameter(
            QgsProcessingParameterEnum(
                self.SHAPE, self.tr("Unit shape"),
                [self.tr("Point station"), self.tr("Square plot"), self.tr("Circular plot"), self.tr("Line transect")],
                defaultValue=1,
            )
        )
        self.addParameter(
            QgsProcessingParameterNumber(
                self.SIZE, self.tr("Unit size (m): counting radius, side, radius or transect length"),
                type=compat.NUMBER_DOUBLE, defaultValue=100.0, minValue=0.0,
            )
        )
        self.addParameter(
            QgsProcessingParameterNumber(
                self.HALF_WIDTH, self.tr("Half-width of a transect's counting strip (m)"),
                type=compat.NUMBER_DOUBLE, defaultValue=25.0, minValue=0.0,
            )
        )
        self.addParameter(
            QgsProcessingParameterNumber(
                self.BEARING, self.tr("Bearing of units and grid (degrees from grid north; −1 random)"),
                type=compat.NUMBER_DOUBLE, defaultValue=0.0, minValue=-1.0, maxValue=359.999,
            )
        )
        self.addParameter(
            QgsProcessingParameterBoolean(
                self.INSIDE, self.tr("Keep units wholly inside their stratum (as the layout's option)"),
                defaultValue=False,
            )
        )
        self.addParameter(
            QgsProcessingParameterNumber(
                self.REPLICATES, self.tr("Simulated surveys per design"), type=compat.NUMBER_INTEGER,
                defaultValue=500, minValue=10, maxValue=100000,
            )
        )
        self.addParameter(
            QgsProcessingParameterNumber(
                self.OVERDISPERSION, self.tr("Overdispersion k of the negative binomial (0: Poisson counts)"),
                type=compat.NUMBER_DOUBLE, defaultValue=0.0, minValue=0.0,
            )
        )
        self.addParameter(
            QgsProcessingParameterEnum(
                self.VARIANCE_METHOD, self.tr("Variance estimator for the grid and balanced designs"),
                [self.tr("Simple random sampling formula"), self.tr("Local neighbourhood (Stevens & Olsen 2003)")],
                defaultValue=0,
            )
        )
        self.addParameter(
            QgsProcessingParameterString(
                self.N_RANGE, self.tr("Range of units for RMSE against n (e.g. 20, 40, 80 or 20:100:20; empty: none)"),
                defaultValue="", optional=True,
            )
        )
        self.add_seed_parameter()
        self.addParameter(
            QgsProcessingParameterFeatureSink(self.OUTPUT_TABLE, self.tr("Design comparison"), compat.TYPE_VECTOR)
        )
        self.add_report_parameter()
        self.addOutput(QgsProcessingOutputString(self.RECOMMENDED, self.tr("Recommended design")))

    # ------------------------------------------------------------------------------
    def processAlgorithm(self, parameters, context, feedback):  # noqa: N802 (host naming)
        surface = self.parameterAsRasterLayer(parameters, self.SURFACE, context)
        if surface is None or not surface.isValid():
            raise QgsProcessingException(self.tr("The density surface could not be opened."))
        frame_source = self.parameterAsSource(parameters, self.FRAME, context)
        if frame_source is None:
            raise QgsProcessingException(self.tr("The sampling frame could not be opened."))
        frame_name = frame_source.sourceName()
        crs = bridge.computation_crs(frame_source.sourceCrs(), frame_source.sourceExtent(), context, feedback, frame_name)
        frame_records = bridge.read_features(frame_source, crs, context, feedback, layer_name=frame_name)
        if len(frame_records) == 0:
            raise QgsProcessingException(
                self.tr("Layer '{layer}' has no polygon with an area.").format(layer=frame_name))
        frame = unary_union([g for g in frame_records.geometries if g is not None])
        warnings = list(frame_records.warnings)

        strata_source = self.parameterAsSource(parameters, self.STRATA, context)
        strata = keys = strata_ids = None
        strata_name = stratum_field = None
        if strata_source is not None:
            strata_name = strata_source.sourceName()
            chosen = (getattr(self, "parameterAsStrings", None) or self.parameterAsFields)(
                parameters, self.STRATUM_FIELD, context)
            stratum_field = chosen[0] if chosen else None
            if stratum_field and strata_source.fields().lookupField(stratum_field) < 0:
                raise QgsProcessingException(
                    self.tr("Layer '{layer}' has no field '{field}'. Choose the field that holds the stratum ids.").format(
                        layer=strata_name, field=stratum_field))
            records = bridge.read_features(strata_source, crs, context, feedback,
                                           [stratum_field] if stratum_field else [], layer_name=strata_name)
            warnings.extend(records.warnings)
            strata = list(records.geometries)
            strata_ids = [int(f) for f in records.fids]
            keys = list(records.attributes[stratum_field]) if stratum_field else list(strata_ids)
            nulls = [int(f) for f, k in zip(records.fids, keys) if k is None]
            if nulls:
                raise QgsProcessingException(
                    self.tr("Layer '{layer}': field '{field}' is empty (NULL) for feature id(s) {ids}. Give every "
                            "stratum a value.").format(layer=strata_name, field=stratum_field, ids=bridge.id_list(nulls)))
            if not strata:
                strata = keys = strata_ids = None

        already_pushed = len(warnings)  # bridge.read_features pushes its own warnings
        designs = sorted(set(self.parameterAsEnums(parameters, self.DESIGNS, context))) or list(range(5))
        if strata is None:
            dropped = [d for d in designs if d in engine.STRATIFIED_DESIGNS]
            if dropped:
                warnings.append(self.tr("No strata were given: the stratified designs are left out ({names}).").format(
                    names=", ".join(self.design_name(d) for d in dropped)))
                designs = [d for d in designs if d not in engine.STRATIFIED_DESIGNS]
            if not designs:
                raise QgsProcessingException(
                    self.tr("The stratified designs need strata: give the strata layer, or choose another design."))

        shape = self.parameterAsEnum(parameters, self.SHAPE, context)
        size = self.parameterAsDouble(parameters, self.SIZE, context)
        half_width = self.parameterAsDouble(parameters, self.HALF_WIDTH, context)
        bearing = self.parameterAsDouble(parameters, self.BEARING, context)
        if bearing < 0:
            bearing = -1.0
        inside = self.parameterAsBool(parameters, self.INSIDE, context)
        n_units = self.parameterAsInt(parameters, self.N_UNITS, context)
        replicates = self.parameterAsInt(parameters, self.REPLICATES, context)
        k = self.parameterAsDouble(parameters, self.OVERDISPERSION, context)
        variance_method = (estimation.VARIANCE_SRS, estimation.VARIANCE_LOCAL)[
            self.parameterAsEnum(parameters, self.VARIANCE_METHOD, context)]
        seeded = self.seeded_generator(parameters, context, feedback)
        rng = seeded.generator

        feedback.pushInfo(self.tr("Reading the density surface…"))
        with self.engine_errors():
            density, geotransform, warped = raster_io.read_surface_window(
                surface.source(), surface.name(), bridge.crs_wkt(surface.crs()), bridge.crs_wkt(crs), crs.authid(),
                frame.bounds)
        if warped:
            warnings.append(self.tr("The density surface was warped to {crs} (bilinear) to match the frame.").format(
                crs=crs.authid()))
        feedback.setProgress(3)

        with self.engine_errors():
            n_range = engine.parse_unit_range(self.parameterAsString(parameters, self.N_RANGE, context))
            grid = engine.population_grid(density, geotransform, frame, strata, keys,
                                           progress=self.progress_callback(feedback, 3, 6))
            region = engine.counting_region(shape, size, half_width)
            frame_parts = [(g, int(f)) for g, f in zip(frame_records.geometries, frame_records.fids) if g is not None]
            setup = engine.prepare_comparison(grid, frame, region, shape, size, rng, strata, keys, bearing, k,
                                              inside=inside, strata_ids=strata_ids,
                                              frame_parts=[g for g, _ in frame_parts],
                                              frame_ids=[f for _, f in frame_parts])
            warnings.extend(self.translate_message(w) for w in setup.warnings)
            main_end = 70.0 if [m for m in n_range if m != n_units] else 95.0
            comparison = engine.compare_designs(
                setup, designs, n_units, replicates, rng, variance_method=variance_method,
                progress=self.progress_callback(feedback, 6, main_end))
            warnings.extend(self.translate_message(w) for w in comparison.warnings)
            curve = []
            n_range = tuple(m for m in n_range if m != n_units)  # the main comparison stands for N_UNITS
            for i, m in enumerate(n_range):
                start = main_end + (95.0 - main_end) * i / len(n_range)
                stop = main_end + (95.0 - main_end) * (i + 1) / len(n_range)
                feedback.pushInfo(self.tr("Simulating {n} units…").format(n=m))
                try:
                    curve.append(engine.compare_designs(
                        setup, designs, m, replicates, rng, variance_method=variance_method,
                        progress=self.progress_callback(feedback, start, stop)))
                except InputError as error:  # e.g. fewer units than two per stratum: that n is left out
                    warnings.append(self.tr("{n} units were left out of the range: {why}").format(
                        n=m, why=self.translate_message(error.detail or error.message)))
        self.push_warnings(feedback, warnings[already_pushed:])

        fields = bridge.make_fields(OUTPUT_FIELDS)
        sink, dest_id = self.parameterAsSink(parameters, self.OUTPUT_TABLE, context, fields, compat.WKB_NOGEOMETRY, crs)
        if sink is None:
            raise QgsProcessingException(self.tr("The output table could not be created."))
        rows = [performance_row(p, comparison.recommended) for p in comparison.performance]
        if not bridge.write_features(sink, fields, [None] * len(rows), rows, feedback, (95.0, 97.0)):
            raise self.cancelled_error()

        recommended = engine.DESIGNS[comparison.recommended] if comparison.recommended is not None else ""
        settings = {
            "surface": surface.name(), "frame": frame_name, "strata": strata_name, "stratum_field": stratum_field,
            "crs": crs.authid(), "shape": shape, "size": size, "half_width": half_width, "bearing": bearing,
            "inside": inside,
            "n_units": n_units, "replicates": replicates, "k": k, "variance_method": variance_method,
            "seed": seeded.seed, "n_range": n_range,
        }
        report = self._report(comparison, curve, setup, settings, warnings)
        report_path = self.write_report(report, parameters, context, feedback)
        if recommended:
            best = comparison.by_design(comparison.recommended)
            feedback.pushInfo(self.tr("Recommended design: {name} (RMSE {rmse:.1f} animals, {rel:.1%} of the total; "
                                      "coverage {cov:.0%}).").format(name=self.design_name(best.design), rmse=best.rmse,
                                                                      rel=best.rel_rmse, cov=best.coverage))
        feedback.setProgress(100)
        return {self.OUTPUT_TABLE: dest_id, self.REPORT: report_path, self.RECOMMENDED: recommended}

    # ------------------------------------------------------------------------------
    def _report(self, comparison, curve, setup, settings, warnings):
        report = self.new_report(self.tr("Survey designs compared by simulation"))
        grid = setup.grid
        best = comparison.by_design(comparison.recommended) if comparison.recommended is not None else None
        figures = []
        if best is not None:
            figures += [
                (self.tr("recommended design"), self.design_name(best.design)),
                (self.tr("its RMSE (animals)"), f"{best.rmse:,.1f}"),
                (self.tr("its RMSE relative to the total"), f"{best.rel_rmse:.1%}"),
                (self.tr("its 95 % interval coverage"), f"{best.coverage:.0%}"),
            ]
        figures.append((self.tr("expected animals in the frame"), f"{grid.expected_total:,.0f}"))
        report.key_figures(figures)
        shapes = [self.tr("point station"), self.tr("square plot"), self.tr("circular plot"), self.tr("line transect")]
        size_labels = [self.tr("counting radius"), self.tr("side"), self.tr("radius"), self.tr("length")]
        shape = settings["shape"]
        unit_text = f"{shapes[shape]}, {size_labels[shape]} {settings['size']:g} m"
        if shape == LINE:
            unit_text += self.tr(", strip half-width {w:g} m").format(w=settings["half_width"])
        params = {
            self.tr("Density surface"): settings["surface"],
            self.tr("Sampling frame"): settings["frame"],
            self.tr("Strata"): settings["strata"] or self.tr("none"),
            self.tr("Stratum field"): settings["stratum_field"] or ("–" if not settings["strata"] else self.tr("feature id")),
            self.tr("Computation CRS"): settings["crs"],
            self.tr("Surface cell"): f"{grid.cell_width:g} × {grid.cell_height:g} m",
            self.tr("Sub-cells per cell side (for counting)"): setup.factor,
            self.tr("Unit"): unit_text,
            self.tr("Counted area per unit (m²)"): round(setup.region.area, 1),
            self.tr("Bearing"): self.tr("random") if settings["bearing"] < 0 else f"{settings['bearing']:g}°",
            self.tr("Units wholly inside their stratum"): self.tr("yes") if settings["inside"] else self.tr("no"),
            self.tr("Number of units"): settings["n_units"],
            self.tr("Simulated surveys per design"): settings["replicates"],
            self.tr("Counts per cell"): (self.tr("negative binomial, k = {k:g}").format(k=settings["k"]) if settings["k"] > 0
                                    else self.tr("Poisson")),
            self.tr("Variance estimator (grid, balanced)"): (self.tr("local neighbourhood") if settings["variance_method"] == "local"
                                                        else self.tr("simple random sampling formula")),
            self.tr("Confidence level"): "95 %",
            self.tr("Seed"): settings["seed"],
        }
        report.parameters(params)
        report.warnings(warnings)

        report.section(self.tr("How the designs did at {n} units").format(n=comparison.n_units))
        header = [self.tr("Design"), self.tr("Mean units surveyed"), self.tr("Relative bias"), self.tr("Empirical SE (animals)"),
                  self.tr("RMSE (animals)"), self.tr("± Monte Carlo SE"), self.tr("RMSE / total"), self.tr("Mean estimated CV"),
                  self.tr("95 % interval coverage"), self.tr("Surveys without an estimate")]
        rows = []
        for p in comparison.performance:
            name = self.design_name(p.design) + (" ★" if p.design == comparison.recommended else "")
            rows.append([name, p.mean_n, _pct(p.rel_bias), p.emp_se, p.rmse, p.rmse_mc_se, _pct(p.rel_rmse),
                         p.mean_cv, _pct(p.coverage, 0), p.failed])
        report.table(header, rows)
        tested = [p for p in comparison.performance if np.isfinite(engine.bias_standard_error(p))]
        noises = [engine.bias_noise(p, len(tested)) for p in tested]  # the threshold of the bias warning
        noises = [v for v in noises if np.isfinite(v)]
        if noises:
            noise = max(noises)
            report.paragraph(self.tr(
                "Each figure is itself an estimate from {reps} simulated surveys: relative biases within about "
                "±{noise:.1%} cannot be told from zero, and RMSEs closer than two Monte Carlo SEs are a tie. "
                "More surveys per design narrow both.").format(reps=settings["replicates"], noise=noise))
        names = [self.design_name(p.design) for p in comparison.performance]
        highlight = next((i for i, p in enumerate(comparison.performance) if p.design == comparison.recommended), None)
        report.figure(
            svg.bar_chart_svg(names, [p.rmse for p in comparison.performance], self.tr("RMSE of the abundance (animals)"),
                              highlight=highlight),
            self.tr("Root mean square error of the abundance estimate, by design (lower is better)"),
        )
        report.section(self.tr("Recommendation"))
        if best is None:
            report.paragraph(self.tr("No design gave estimates: see the warnings."))
        else:
            text = self.tr(
                "{name} gave the lowest root mean square error ({rmse:,.1f} animals, {rel:.1%} of the mean true "
                "total of {total:,.0f}) among the designs whose 95 % intervals held the truth at least 90 % of the "
                "time."
            ).format(name=self.design_name(best.design), rmse=best.rmse, rel=best.rel_rmse, total=best.mean_true)
            if comparison.near_best:
                text += " " + self.tr(
                    "{others} did about as well: the differences lie within the Monte Carlo error of the simulation. "
                    "Among these, choose the one that is easiest to carry out in the field."
                ).format(others=", ".join(self.design_name(d) for d in comparison.near_best))
            report.paragraph(text)
            poor = [self.design_name(p.design) for p in comparison.performance if np.isfinite(p.coverage) and p.coverage < engine.ACCEPTABLE_COVERAGE]
            if poor:
                report.paragraph(self.tr(
                    "The intervals of {names} held the truth less than 90 % of the time: their stated precision would "
                    "mislead.").format(names=", ".join(poor)))
            if best.design == engine.SYSTEMATIC_GRID or any(
                    p.design == engine.SYSTEMATIC_GRID for p in comparison.performance):
                report.note(self.tr(
                    "The systematic grid's number of units varies from survey to survey (mean shown). With the simple "
                    "random sampling formula its interval is usually conservative on smooth surfaces."))

        if setup.strata is not None:
            self._strata_section(report, comparison, setup)
        if curve:
            self._curve_section(report, comparison, curve)

        report.section(self.tr("How the simulation works"))
        report.paragraph(self.tr(
            "Each simulated survey draws a population on the surface: Poisson counts in every surface cell, or "
            "negative binomial counts (gamma-Poisson) when k is above 0. All designs survey the same populations. "
            "Every design is laid out with the layout engine, each unit counts the animals of the cells whose "
            "centres it covers (only the part inside the frame, or inside its own stratum for the stratified "
            "designs), and the abundance is estimated with the estimation engine: the ratio estimator with its "
            "t interval (Satterthwaite degrees of freedom). Each estimate is judged against the true total of its "
            "own population."
        ))
        report.note(self.tr(
            "Assumptions: the surface is the truth, every animal in a unit is counted (no detection error), animals "
            "do not move during the survey, and every unit can be reached. Real surveys meet none of these exactly; "
            "use the comparison to rank designs and to size the effort, not as a promise of precision."
        ))
        report.references(REFERENCES)
        if settings["variance_method"] == "local":
            report.references([LOCAL_REFERENCE])
        report.field_safety()
        return report

    def _strata_section(self, report, comparison, setup):
        report.section(self.tr("Strata"))
        grid = setup.grid
        allocations = {plan.design: plan.allocation for plan in comparison.plans}
        header = [self.tr("Stratum"), self.tr("Area (km²)"), self.tr("Mean expected count per unit"), self.tr("S_h (count SD per unit)")]
        if engine.STRATIFIED_PROPORTIONAL in allocations:
            header.append(self.tr("Units, proportional"))
        if engine.STRATIFIED_NEYMAN in allocations:
            header.append(self.tr("Units, Neyman"))
        rows = []
        for i, st in enumerate(setup.strata.strata):
            row = [str(st.key), float(grid.stratum_areas_km2[setup.stratum_codes[i]]), float(setup.stratum_mean[i]),
                   float(setup.stratum_sd[i])]
            for design in (engine.STRATIFIED_PROPORTIONAL, engine.STRATIFIED_NEYMAN):
                if design in allocations:
                    row.append(int(allocations[design][i]))
            rows.append(row)
        report.table(header, rows)
        report.paragraph(self.tr(
            "S_h is the standard deviation of one unit's count in the stratum implied by the surface: the spread of "
            "the expected counts over {draws} random unit positions plus the Poisson (and negative binomial) "
            "variation about them. Neyman allocation gives each stratum units in proportion to A_h·S_h (Neyman "
            "1934; Cochran 1977, §5.5), with at least 2 per stratum.").format(draws=engine.SD_DRAWS))

    def _curve_section(self, report, comparison, curve):
        report.section(self.tr("RMSE against the number of units"))
        points = sorted([comparison] + [c for c in curve if c.n_units != comparison.n_units], key=lambda c: c.n_units)
        ns = [c.n_units for c in points]
        series = []
        for p in comparison.performance:
            series.append((self.design_name(p.design), [c.by_design(p.design).rmse for c in points]))
        report.figure(
            svg.line_chart_svg(ns, series, self.tr("number of units"), self.tr("RMSE (animals)")),
            self.tr("RMSE of the abundance estimate against the number of units"),
        )
        header = [self.tr("Units")] + [self.design_name(p.design) for p in comparison.performance]
        rows = [[c.n_units] + [c.by_design(p.design).rmse for p in comparison.performance] for c in points]
        report.table(header, rows, caption=self.tr("RMSE (animals)"))
        best = comparison.recommended if comparison.recommended is not None else comparison.performance[0].design
        values = [c.by_design(best).rmse for c in points]
        if len(points) >= 2 and all(np.isfinite(values)):
            gains = []
            for (a, va), (b, vb) in zip(zip(ns, values), zip(ns[1:], values[1:])):
                gains.append(self.tr("{a} → {b} units: RMSE {change:+.0%}").format(a=a, b=b, change=vb / va - 1 if va > 0 else 0))
            report.paragraph(self.tr("For {name}: ").format(name=self.design_name(best)) + "; ".join(gains) + ".")
        report.note(self.tr(
            "The RMSE of a design falls roughly as 1/√n: doubling the units lowers it by about 30 %. Where the curve "
            "flattens, more units buy little; spend the effort on better counts (detection) or a better surface "
            "instead."))


def _pct(value, digits=1):
    if value is None or not np.isfinite(value):
        return None
    return f"{value:.{digits}%}"


def performance_row(p, recommended):
    """One output row (aligned with OUTPUT_FIELDS)."""
    def num(v):
        return float(v) if v is not None and np.isfinite(v) else None

    return [
        p.name, int(p.design), int(p.n_asked), num(p.mean_n), "/".join(str(int(n)) for n in p.allocation),
        num(p.mean_true), num(p.mean_estimate), num(p.rel_bias), num(p.emp_se), num(p.rmse), num(p.rmse_mc_se),
        num(p.rel_rmse), num(p.mean_cv), num(p.coverage), int(p.replicates), int(p.failed),
        int(p.design == recommended),
    ]
