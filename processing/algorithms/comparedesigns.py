"""plotwise:comparedesigns: survey designs compared by simulating surveys of a density surface."""
from dataclasses import dataclass

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

from .. import compat
from .. import bridge
from ..gdal_io import surface as surface_io
from ..engine import design_comparison as engine
from ..engine import estimation
from ..engine.errors import InputError
from ..report import comparedesigns as report_comparedesigns
from .base import PlotwiseAlgorithm


M2_PER_KM2 = 1e6

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
    PILOT_UNITS = "PILOT_UNITS"
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
            "1934): the best case, since no survey knows the true S_h; systematic grid with a random start (its "
            "n varies); spatially balanced (balanced acceptance sampling, Robertson et al. 2013); stratified "
            "Neyman from a pilot: in every simulated survey S_h is estimated from a pilot of the given number "
            "of simple random units per stratum (of an independent realisation, a pilot season), as a real "
            "survey would estimate it.\n\n"
            "Units: point station (size = counting radius), square plot (side), circular plot (radius), line "
            "transect (length, counting a strip of the given half-width on each side). Bearing in degrees "
            "clockwise from grid north, −1 random (the default: a grid aligned with straight edges puts whole rows "
            "in the edge band at once). Edges follow the layout's protocol: by default plus sampling, with "
            "centres over each stratum (or the frame) grown by the unit's reach, each unit counting only the "
            "cells of its own stratum with its nominal area, and the estimate expanding to the grown area "
            "(Gregoire & Valentine 2008, ch. 10); with keep units inside, centres from each stratum shrunk by "
            "the unit's radius, as the layout's option does.\n\n"
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
        self._add_input_parameters()
        self._add_unit_parameters()
        self._add_simulation_parameters()
        self.add_seed_parameter()
        self.addParameter(
            QgsProcessingParameterFeatureSink(self.OUTPUT_TABLE, self.tr("Design comparison"), compat.TYPE_VECTOR)
        )
        self.add_report_parameter()
        self.addOutput(QgsProcessingOutputString(self.RECOMMENDED, self.tr("Recommended design")))

    def _add_input_parameters(self):
        """The density surface, the frame, the strata and the designs to compare."""
        self.addParameter(QgsProcessingParameterRasterLayer(
            self.SURFACE, self.tr("Density surface (expected animals per km²)")))
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
                 self.tr("Stratified, Neyman allocation with the true S_h (best case)"), self.tr("Systematic grid"),
                 self.tr("Spatially balanced"), self.tr("Stratified, Neyman allocation from a pilot survey")],
                allowMultiple=True, defaultValue=[0, 1, 2, 3, 4],
            )
        )

    def _add_unit_parameters(self):
        """How many units, of which shape, size and bearing, and the edge rule."""
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
                type=compat.NUMBER_DOUBLE, defaultValue=-1.0, minValue=-1.0, maxValue=359.999,
            )
        )
        self.addParameter(
            QgsProcessingParameterBoolean(
                self.INSIDE, self.tr("Keep units wholly inside their stratum (as the layout's option)"),
                defaultValue=False,
            )
        )

    def _add_simulation_parameters(self):
        """Replicates, count distribution, variance estimator, range of n and the pilot's size."""
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
                [self.tr("Simple random sampling formula"), self.tr("Local neighbourhood (Stevens & Olsen 2003)"),
                 self.tr("Local neighbourhood, scaled to the simple formula (our variant)")],
                defaultValue=0,
            )
        )
        self.addParameter(
            QgsProcessingParameterString(
                self.N_RANGE, self.tr("Range of units for RMSE against n (e.g. 20, 40, 80 or 20:100:20; empty: none)"),
                defaultValue="", optional=True,
            )
        )
        pilot = QgsProcessingParameterNumber(
            self.PILOT_UNITS, self.tr("Pilot units per stratum for the pilot-based Neyman design"),
            type=compat.NUMBER_INTEGER, defaultValue=engine.DEFAULT_PILOT_UNITS, minValue=2, maxValue=1000)
        pilot.setFlags(pilot.flags() | compat.FLAG_ADVANCED)
        self.addParameter(pilot)

    # ------------------------------------------------------------------------------
    def processAlgorithm(self, parameters, context, feedback):  # noqa: N802 (host naming)
        surface = self.parameterAsRasterLayer(parameters, self.SURFACE, context)
        if surface is None or not surface.isValid():
            raise QgsProcessingException(self.tr("The density surface could not be opened."))
        frame_name, crs, frame_records, warnings = self._read_frame(parameters, context, feedback)
        frame = unary_union([g for g in frame_records.geometries if g is not None])
        strata = self._read_strata(parameters, context, feedback, crs, warnings)
        already_pushed = len(warnings)  # bridge.read_features pushes its own warnings
        designs = self._designs(parameters, context, strata.geometries is not None, warnings)
        run = self._run_settings(parameters, context)
        seeded = self.seeded_generator(parameters, context, feedback)

        feedback.pushInfo(self.tr("Reading the density surface…"))
        with self.engine_errors():
            density, geotransform, warped = surface_io.read_surface_window(
                surface.source(), surface.name(), bridge.crs_wkt(surface.crs()), bridge.crs_wkt(crs), crs.authid(),
                frame.bounds)
        if warped:
            warnings.append(self.tr("The density surface was warped to {crs} (bilinear) to match the frame.").format(
                crs=crs.authid()))
        feedback.setProgress(3)
        with self.engine_errors():
            n_range = engine.parse_unit_range(self.parameterAsString(parameters, self.N_RANGE, context))
            grid = engine.population_grid(density, geotransform, frame, strata.geometries, strata.keys,
                                           progress=self.progress_callback(feedback, 3, 6))
            setup = self._prepare(grid, frame, frame_records, strata, run, seeded.generator)
            warnings.extend(self.translate_message(w) for w in setup.warnings)
            n_range = tuple(m for m in n_range if m != run["n_units"])  # the main comparison stands for N_UNITS
            comparison, curve = self._simulate(setup, designs, run, n_range, seeded.generator, feedback, warnings)
        self.push_warnings(feedback, warnings[already_pushed:])
        dest_id = self._write_table(parameters, context, feedback, comparison, crs)

        settings = {"surface": surface.name(), "frame": frame_name, "strata": strata.name,
                    "stratum_field": strata.field, "crs": crs.authid(), **run, "seed": seeded.seed,
                    "n_range": n_range}
        report = report_comparedesigns.comparedesigns_report(self.new_report(""), comparison, curve, setup, settings,
                                                             warnings)
        report_path = self.write_report(report, parameters, context, feedback)
        recommended = engine.DESIGNS[comparison.recommended] if comparison.recommended is not None else ""
        if recommended:
            best = comparison.by_design(comparison.recommended)
            feedback.pushInfo(self.tr("Recommended design: {name} (RMSE {rmse:.1f} animals, {rel:.1%} of the total; "
                                      "coverage {cov:.0%}).").format(name=self.design_name(best.design), rmse=best.rmse,
                                                                      rel=best.rel_rmse, cov=best.coverage))
        feedback.setProgress(100)
        return {self.OUTPUT_TABLE: dest_id, self.REPORT: report_path, self.RECOMMENDED: recommended}

    def _read_frame(self, parameters, context, feedback):
        """The frame layer's name, the computation CRS, its features there and their warnings."""
        frame_source = self.parameterAsSource(parameters, self.FRAME, context)
        if frame_source is None:
            raise QgsProcessingException(self.tr("The sampling frame could not be opened."))
        frame_name = frame_source.sourceName()
        crs = bridge.computation_crs(frame_source.sourceCrs(), frame_source.sourceExtent(), context, feedback,
                                     frame_name)
        frame_records = bridge.read_features(frame_source, crs, context, feedback, layer_name=frame_name)
        if len(frame_records) == 0:
            raise QgsProcessingException(
                self.tr("Layer '{layer}' has no polygon with an area.").format(layer=frame_name))
        return frame_name, crs, frame_records, list(frame_records.warnings)

    def _read_strata(self, parameters, context, feedback, crs, warnings):
        """The strata given (geometries, keys and feature ids all None when there are none)."""
        strata_source = self.parameterAsSource(parameters, self.STRATA, context)
        if strata_source is None:
            return _Strata()
        strata_name = strata_source.sourceName()
        stratum_field = self.field_name(parameters, self.STRATUM_FIELD, context, strata_source, strata_name)
        records = bridge.read_features(strata_source, crs, context, feedback,
                                       [stratum_field] if stratum_field else [], layer_name=strata_name)
        warnings.extend(records.warnings)
        strata_ids = [int(f) for f in records.fids]
        keys = list(records.attributes[stratum_field]) if stratum_field else list(strata_ids)
        nulls = [int(f) for f, k in zip(records.fids, keys) if k is None]
        if nulls:
            raise QgsProcessingException(
                self.tr("Layer '{layer}': field '{field}' is empty (NULL) for feature id(s) {ids}. Give every "
                        "stratum a value.").format(layer=strata_name, field=stratum_field,
                                                   ids=bridge.listed_ids(nulls)))
        if not records.geometries:
            return _Strata(strata_name, stratum_field)
        return _Strata(strata_name, stratum_field, list(records.geometries), keys, strata_ids)

    def _designs(self, parameters, context, with_strata, warnings):
        """The designs to compare; without strata the stratified ones are left out, with a warning."""
        designs = sorted(set(self.parameterAsEnums(parameters, self.DESIGNS, context))) or list(range(5))
        if with_strata:
            return designs
        dropped = [d for d in designs if d in engine.STRATIFIED_DESIGNS]
        if dropped:
            warnings.append(self.tr("No strata were given: the stratified designs are left out ({names}).").format(
                names=", ".join(self.design_name(d) for d in dropped)))
            designs = [d for d in designs if d not in engine.STRATIFIED_DESIGNS]
        if not designs:
            raise QgsProcessingException(
                self.tr("The stratified designs need strata: give the strata layer, or choose another design."))
        return designs

    def _run_settings(self, parameters, context):
        """The units and the simulation, as the report's settings name them."""
        bearing = self.parameterAsDouble(parameters, self.BEARING, context)
        return {
            "shape": self.parameterAsEnum(parameters, self.SHAPE, context),
            "size": self.parameterAsDouble(parameters, self.SIZE, context),
            "half_width": self.parameterAsDouble(parameters, self.HALF_WIDTH, context),
            "bearing": -1.0 if bearing < 0 else bearing,
            "inside": self.parameterAsBool(parameters, self.INSIDE, context),
            "n_units": self.parameterAsInt(parameters, self.N_UNITS, context),
            "replicates": self.parameterAsInt(parameters, self.REPLICATES, context),
            "k": self.parameterAsDouble(parameters, self.OVERDISPERSION, context),
            "variance_method": estimation.VARIANCE_METHODS[
                self.parameterAsEnum(parameters, self.VARIANCE_METHOD, context)],
            "pilot_units": self.parameterAsInt(parameters, self.PILOT_UNITS, context),
        }

    @staticmethod
    def _prepare(grid, frame, frame_records, strata, run, rng):
        """The engine's comparison setup: counting region, strata on the grid, frame parts and their ids."""
        region = engine.counting_region(run["shape"], run["size"], run["half_width"])
        frame_parts = [(g, int(f)) for g, f in zip(frame_records.geometries, frame_records.fids) if g is not None]
        return engine.prepare_comparison(grid, frame, region, run["shape"], run["size"], rng, strata.geometries,
                                         strata.keys, run["bearing"], run["k"], inside=run["inside"],
                                         strata_ids=strata.ids, frame_parts=[g for g, _ in frame_parts],
                                         frame_ids=[f for _, f in frame_parts], pilot_units=run["pilot_units"])

    def _simulate(self, setup, designs, run, n_range, rng, feedback, warnings):
        """The comparison at N_UNITS, then at each other n of the range (the RMSE curve)."""
        main_end = 70.0 if n_range else 95.0
        comparison = engine.compare_designs(
            setup, designs, run["n_units"], run["replicates"], rng, variance_method=run["variance_method"],
            progress=self.progress_callback(feedback, 6, main_end))
        warnings.extend(self.translate_message(w) for w in comparison.warnings)
        curve = []
        for i, m in enumerate(n_range):
            start = main_end + (95.0 - main_end) * i / len(n_range)
            stop = main_end + (95.0 - main_end) * (i + 1) / len(n_range)
            feedback.pushInfo(self.tr("Simulating {n} units…").format(n=m))
            try:
                curve.append(engine.compare_designs(
                    setup, designs, m, run["replicates"], rng, variance_method=run["variance_method"],
                    progress=self.progress_callback(feedback, start, stop)))
            except InputError as error:  # e.g. fewer units than two per stratum: that n is left out
                warnings.append(self.tr("{n} units were left out of the range: {why}").format(
                    n=m, why=self.translate_message(error.detail or error.message)))
        return comparison, curve

    def _write_table(self, parameters, context, feedback, comparison, crs):
        """One row per design (OUTPUT_FIELDS); returns the sink's id."""
        fields = bridge.make_fields(OUTPUT_FIELDS)
        sink, dest_id = self.parameterAsSink(parameters, self.OUTPUT_TABLE, context, fields, compat.WKB_NOGEOMETRY, crs)
        if sink is None:
            raise QgsProcessingException(self.tr("The output table could not be created."))
        rows = [performance_row(p, comparison.recommended) for p in comparison.performance]
        if not bridge.write_features(sink, fields, [None] * len(rows), rows, feedback, (95.0, 97.0)):
            raise self.cancelled_error()
        return dest_id


@dataclass(frozen=True)
class _Strata:
    """The strata layer's name and field, and its geometries, keys and feature ids (None without strata)."""

    name: object = None
    field: object = None
    geometries: object = None
    keys: object = None
    ids: object = None


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
