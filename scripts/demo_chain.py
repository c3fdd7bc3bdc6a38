"""The demo chain, run headless by `make demo`: every Plotwise step on the invented demo reserve.

Writes demo-output/: plotwise-demo.gpkg (every layer), one HTML report per step, the
rasters as GeoTIFF, plotwise-demo.qgz (the layers styled, with an A4 print layout) and
plotwise-demo-map.pdf (that layout exported). Each issue adds its step:
a step whose algorithm is not available yet says so and is skipped.
"""
import os
import shutil
from dataclasses import dataclass, field
from pathlib import Path

from headless_host import start_host, stop_host

REPO = Path(__file__).resolve().parents[1]
OUT = Path(os.environ.get("PLOTWISE_DEMO_OUT", REPO / "demo-output"))
SEED = 20261201
# square plots of 400 m × 400 m (16 ha): at the velmar's ~10 per km² a plot holds about 1.6 animals
PLOT_SIDE = 400.0
PLOT_HA = PLOT_SIDE**2 / 1e4
VELMAR_HOME_RANGE = 3.0  # km², the invented velmar's home range (for the camera-trap stations)
CAMERA_OCCASIONS = 8  # weekly occasions of the camera-trap season


@dataclass
class Demo:
    processing: object
    out: Path
    results: dict = field(default_factory=dict)  # step name -> algorithm results
    layers: list = field(default_factory=list)  # (name, uri, provider, style name)
    reports: list = field(default_factory=list)

    @property
    def gpkg(self):
        return self.out / "plotwise-demo.gpkg"

    def table(self, name):
        """A Processing destination that writes layer ``name`` into the demo GeoPackage."""
        return f"ogr:dbname='{self.gpkg}' table=\"{name}\" (geom)"

    def layer_uri(self, name):
        return f"{self.gpkg}|layername={name}"

    def report(self, name):
        path = self.out / f"{name}.html"
        self.reports.append(path)
        return str(path)

    def run(self, algorithm_id, parameters):
        from qgis.core import QgsProcessingFeedback

        class Feedback(QgsProcessingFeedback):
            def pushWarning(self, text):  # noqa: N802
                print(f"    warning: {text}")
                super().pushWarning(text)

        print(f"  {algorithm_id}")
        return self.processing.run(algorithm_id, parameters, feedback=Feedback())

    def available(self, algorithm_id):
        from qgis.core import QgsApplication

        if QgsApplication.processingRegistry().algorithmById(algorithm_id) is None:
            print(f"  {algorithm_id} is not available yet: step skipped")
            return False
        return True


# -- steps (each issue fills in its own) ---------------------------------------------
def step_reserve(demo):
    """The invented Hollin Ridge Reserve with its simulated velmar population."""
    results = demo.run("plotwise:demoreserve", {
        "SEED": SEED,
        "CELL_SIZE": 50.0,
        "OUTPUT_AREA": demo.table("reserve"),
        "OUTPUT_EXCLUDED": demo.table("excluded"),
        "OUTPUT_ELEVATION": str(demo.out / "elevation.tif"),
        "OUTPUT_GREENNESS": str(demo.out / "greenness.tif"),
        "OUTPUT_INTENSITY": str(demo.out / "velmar_per_km2.tif"),
        "OUTPUT_ANIMALS": demo.table("animals"),
        "REPORT": demo.report("01_demo_reserve"),
    })
    demo.results["reserve"] = results
    demo.layers += [
        ("Elevation (m)", str(demo.out / "elevation.tif"), "gdal", "terrain"),
        ("Greenness", str(demo.out / "greenness.tif"), "gdal", "greenness"),
        ("Expected velmar per km²", str(demo.out / "velmar_per_km2.tif"), "gdal", "intensity"),
        ("Reserve boundary", demo.layer_uri("reserve"), "ogr", "outline"),
        ("Excluded areas", demo.layer_uri("excluded"), "ogr", "hatched"),
        ("Simulated velmar", demo.layer_uri("animals"), "ogr", "dots"),
    ]
    print(f"    true total {results['TRUE_TOTAL']} velmar (expected {results['EXPECTED_TOTAL']:.0f})")


def step_frame(demo):
    """Sampling frame: reserve minus lake, inholding and steep slopes (issue 3)."""
    if not demo.available("plotwise:buildframe"):
        return
    if demo.results.get("reserve") is None:
        print("  plotwise:buildframe skipped: no demo reserve")
        return
    # slope in degrees from the host's own slope algorithm
    slope = str(demo.out / "slope_deg.tif")
    demo.run("native:slope", {"INPUT": str(demo.out / "elevation.tif"), "Z_FACTOR": 1.0, "OUTPUT": slope})
    results = demo.run("plotwise:buildframe", {
        "INPUT": demo.layer_uri("reserve"),
        "EXCLUDE": demo.layer_uri("excluded"),  # the lake and the private inholding
        "MASK": slope,
        "MASK_MAX": 30.0,  # terrain steeper than 30 degrees is left out
        "EDGE_BUFFER": 50.0,
        "OUTPUT": demo.table("frame"),
        "REPORT": demo.report("02_frame"),
    })
    demo.results["frame"] = results
    demo.layers += [
        ("Slope (degrees)", slope, "gdal", "terrain"),
        ("Sampling frame", demo.layer_uri("frame"), "ogr", "frame"),
    ]
    from qgis.core import QgsVectorLayer

    frame = next(QgsVectorLayer(demo.layer_uri("frame"), "frame", "ogr").getFeatures())
    print(f"    sampling frame {frame['area_ha']:.0f} ha (lake, inholding, slopes over 30° and a 50 m edge left out)")


def step_stratify(demo):
    """Four strata from greenness and elevation by k-means (issue 4)."""
    if not demo.available("plotwise:stratify"):
        return
    if demo.results.get("frame") is None:
        print("  plotwise:stratify skipped: no sampling frame")
        return
    results = demo.run("plotwise:stratify", {
        "FRAME": demo.layer_uri("frame"),
        "COVARIATES": [str(demo.out / "greenness.tif"), str(demo.out / "elevation.tif")],
        "METHOD": 3,  # k-means on both covariates, standardised
        "STRATA": 4,
        "MIN_AREA": 100.0,  # patches under 100 ha join a neighbour: strata a field team can work in
        "SEED": SEED,
        "OUTPUT_RASTER": str(demo.out / "strata.tif"),
        "OUTPUT": demo.table("strata"),
        "REPORT": demo.report("03_strata"),
    })
    demo.results["stratify"] = results
    demo.layers.append(("Strata", demo.layer_uri("strata"), "ogr", "strata"))
    from qgis.core import QgsVectorLayer

    strata = sorted(QgsVectorLayer(demo.layer_uri("strata"), "strata", "ogr").getFeatures(), key=lambda f: f["stratum"])
    print(f"    {results['N_STRATA']} strata, R² of greenness {results['R_SQUARED']:.2f}: "
          + "; ".join(f"{f['stratum']}: {f['area_ha']:.0f} ha" for f in strata))


def step_pilot(demo):
    """A small pilot survey whose estimate gives the SDs for allocation (issues 3, 6)."""
    if not (demo.available("plotwise:layout") and demo.available("plotwise:estimate")):
        return
    stratify = demo.results.get("stratify")
    if stratify is None:
        print("  pilot survey skipped: no strata yet")
        return
    print(f"  pilot survey: 32 simple-random {PLOT_HA:g} ha plots, simulated counts, estimate")
    layout = demo.run("plotwise:layout", {
        "FRAME": stratify["OUTPUT"], "STRATUM_FIELD": "stratum", "N_UNITS": 32,
        "DESIGN": 0, "SHAPE": 1, "SIZE": PLOT_SIDE, "BEARING": 0.0, "INSIDE": False,
        "MIN_SPACING": 0.0, "RESERVE": 0, "SEED": SEED + 10,
        "OUTPUT": demo.table("pilot_units"), "OUTPUT_GPX": str(demo.out / "pilot_units.gpx"),
        "REPORT": demo.report("04a_pilot_layout"),
    })
    counts = demo.run("plotwise:simulatecounts", {
        "UNITS": layout["OUTPUT"], "ANIMALS": demo.layer_uri("animals"), "DETECTION": 1.0,
        "SEED": SEED + 11, "OUTPUT": demo.table("pilot_counted"),
        "STRATA": stratify["OUTPUT"], "STRATA_ID_FIELD": "stratum",  # plus sampling: count inside the stratum
    })
    estimate = demo.run("plotwise:estimate", {
        "UNITS": counts["OUTPUT"], "COUNT_FIELD": "count", "STRATUM_FIELD": "stratum",
        "UNIT_AREA_FIELD": "area_m2", "STRATA": stratify["OUTPUT"], "STRATA_ID_FIELD": "stratum",
        "CONFIDENCE": 0.95, "CI_METHOD": 0, "AREA_UNIT": 1, "SEED": SEED + 12,
        "OUTPUT": demo.table("pilot_estimate"), "OUTPUT_TABLE": demo.table("pilot_estimate_table"),
        "REPORT": demo.report("04b_pilot_estimate"),
    })
    demo.results["pilot"] = {"layout": layout, "counts": counts, "estimate": estimate}
    print(f"    pilot: {estimate['ABUNDANCE']:,.0f} velmar (CV {estimate['CV']:.2f}); "
          "its per-stratum SDs feed the allocation")


def step_allocate(demo):
    """60 units over the strata by Neyman (issue 5)."""
    if not demo.available("plotwise:allocate"):
        return
    stratify = demo.results.get("stratify")
    if stratify is None:
        print("  plotwise:allocate skipped: no strata yet")
        return
    parameters = {
        "STRATA": stratify["OUTPUT"], "STRATUM_FIELD": "stratum", "AREA_FIELD": "area_ha",
        "METHOD": 2, "TOTAL": 60, "UNIT_AREA": PLOT_SIDE**2,
        # 5 at least: a pilot that saw nothing in a stratum must not leave it with 2 plots and a useless variance
        "MIN_PER_STRATUM": 5,
        "OUTPUT": demo.table("strata_allocated"), "REPORT": demo.report("05_allocation"),
    }
    # the pilot step's estimate results, stored as results["pilot"] or results["pilot"]["estimate"]
    pilot = demo.results.get("pilot") or {}
    pilot = pilot.get("estimate", pilot)
    results = None
    if pilot.get("OUTPUT") is not None:
        # SDs and means from the pilot survey's estimate (the polygon areas are used)
        try:
            results = demo.run("plotwise:allocate", {
                **parameters, "STRATA": pilot["OUTPUT"], "AREA_FIELD": None,
                "SD_FIELD": "sd_c", "MEAN_FIELD": "mean_c",
            })
        except Exception as error:  # noqa: BLE001 (a demo step falls back and says why)
            print(f"    the pilot SDs could not be used ({error}); the covariate SD proxy is used instead")
    if results is None:
        # no pilot yet: the covariate SD (cov_sd) of the stratification as a proxy
        results = demo.run("plotwise:allocate", parameters)
    demo.results["allocate"] = results
    demo.layers.append(("Strata with units allocated", demo.layer_uri("strata_allocated"), "ogr", "strata"))
    cv = results.get("EXPECTED_CV")
    print("    60 units by Neyman allocation" + (f", expected CV {cv:.3f}" if cv is not None else ""))


def step_layout(demo):
    """Spatially balanced layout with reserves, n from the allocation (issue 3)."""
    if not demo.available("plotwise:layout"):
        return
    allocate, stratify, frame = (demo.results.get(k) for k in ("allocate", "stratify", "frame"))
    if allocate is not None:  # n per stratum from the allocation step
        source = {"FRAME": allocate["OUTPUT"], "STRATUM_FIELD": "stratum", "N_FIELD": "n_alloc"}
        how = "n per stratum from the allocation"
    elif stratify is not None:  # no allocation yet: 60 units split by area
        source = {"FRAME": stratify["OUTPUT"], "STRATUM_FIELD": "stratum", "N_UNITS": 60}
        how = "60 units split over the strata by area"
    elif frame is not None:  # no strata yet: the whole frame is one stratum
        source = {"FRAME": frame["OUTPUT"], "N_UNITS": 60}
        how = "60 units over the whole frame (no strata yet)"
    else:
        print("  plotwise:layout skipped: no frame yet")
        return
    results = demo.run("plotwise:layout", {
        **source,
        "DESIGN": 2,  # spatially balanced (balanced acceptance sampling)
        "SHAPE": 1, "SIZE": PLOT_SIDE,  # square plots, the unit area the allocation assumed
        "BEARING": 0.0,  # sides north-south and east-west: easy to peg out with a compass
        # centres over the whole stratum: keeping plots wholly inside would leave the edge band of these
        # patchy strata unsampled and bias the estimate (plotwise:comparedesigns shows it on this reserve)
        "INSIDE": False, "MIN_SPACING": 600.0, "RESERVE": 3, "SEED": SEED + 3,
        "OUTPUT": demo.table("units"), "OUTPUT_GPX": str(demo.out / "units.gpx"),
        "REPORT": demo.report("06_layout"),
    })
    demo.results["layout"] = results
    demo.layers.append(("Sample units", demo.layer_uri("units"), "ogr", "units"))
    from qgis.core import QgsVectorLayer

    units = list(QgsVectorLayer(demo.layer_uri("units"), "units", "ogr").getFeatures())
    primary = sum(1 for f in units if f["role"] == "primary")
    print(f"    {primary} primary and {len(units) - primary} reserve {PLOT_HA:g} ha plots, spatially balanced ({how}); "
          f"waypoints in units.gpx")


def step_counts(demo):
    """Simulated counts in the layout's units (the fieldwork of the demo)."""
    layout = demo.results.get("layout")
    if layout is None:
        print("  plotwise:simulatecounts skipped: no layout yet")
        return
    strata = next((demo.results[k]["OUTPUT"] for k in ("allocate", "stratify", "frame") if demo.results.get(k)), None)
    demo.results["counts"] = demo.run("plotwise:simulatecounts", {
        "UNITS": layout["OUTPUT"],
        "ANIMALS": demo.layer_uri("animals"),
        "DETECTION": 1.0,
        "SEED": SEED + 1,
        "OUTPUT": demo.table("units_counted"),
        # plus sampling (the layout's default): each unit counts only the animals inside its own stratum
        **({"STRATA": strata, "STRATA_ID_FIELD": "stratum"} if strata is not None else {}),
    })
    demo.layers.append(("Units with counts", demo.layer_uri("units_counted"), "ogr", "units"))


def step_estimate(demo):
    """Density and abundance from the counts (issue 6)."""
    if not demo.available("plotwise:estimate"):
        return
    counts, stratify = demo.results.get("counts"), demo.results.get("stratify")
    if counts is None or stratify is None:
        print("  plotwise:estimate skipped: no counted units or no strata yet")
        return
    # the truth inside the frame (only a simulation knows it): the simulated animals inside the strata
    inside = demo.run("native:countpointsinpolygon", {
        "POLYGONS": stratify["OUTPUT"], "POINTS": demo.layer_uri("animals"), "FIELD": "true_n",
        "OUTPUT": "memory:",
    })["OUTPUT"]
    if isinstance(inside, str):
        from qgis.core import QgsProcessingContext, QgsProcessingUtils

        inside = QgsProcessingUtils.mapLayerFromString(inside, QgsProcessingContext())
    true_total = float(sum(f["true_n"] for f in inside.getFeatures()))
    results = demo.run("plotwise:estimate", {
        "UNITS": counts["OUTPUT"], "COUNT_FIELD": "count", "STRATUM_FIELD": "stratum",
        "UNIT_AREA_FIELD": "area_m2", "STRATA": stratify["OUTPUT"], "STRATA_ID_FIELD": "stratum",
        "CONFIDENCE": 0.95, "CI_METHOD": 0, "FPC": False, "DETECTION_P": 1.0, "DETECTION_SE": 0.0,
        "AREA_UNIT": 0, "TARGET_CV": 0.15, "SEED": SEED + 2,
        "VARIANCE_METHOD": 1,  # the layout is spatially balanced: local neighbourhood variance
        "TRUE_TOTAL": true_total,  # simulations and training only
        "OUTPUT": demo.table("strata_estimate"), "OUTPUT_TABLE": demo.table("estimate_table"),
        "REPORT": demo.report("07_estimate"),
    })
    demo.results["estimate"] = results
    demo.layers.append(("Density estimate by stratum", demo.layer_uri("strata_estimate"), "ogr", "estimate"))
    covered = results["ABUNDANCE_LO"] <= true_total <= results["ABUNDANCE_HI"]
    print(f"    estimated {results['ABUNDANCE']:,.0f} velmar (95% CI {results['ABUNDANCE_LO']:,.0f} to "
          f"{results['ABUNDANCE_HI']:,.0f}, CV {results['CV']:.3f}); true total in the frame {true_total:,.0f} "
          f"({'inside' if covered else 'outside'} the interval; only a simulation can show this)")


def step_compare(demo):
    """Designs compared by simulation on the true intensity surface (issue 8)."""
    if not demo.available("plotwise:comparedesigns"):
        return
    if demo.results.get("reserve") is None:
        print("  plotwise:comparedesigns skipped: no demo reserve (no intensity surface)")
        return
    frame, stratify = demo.results.get("frame"), demo.results.get("stratify")
    if frame is not None:
        source = {"FRAME": frame["OUTPUT"]}
        where = "the sampling frame"
    else:  # the frame step is absent: the reserve boundary stands in for the frame
        source = {"FRAME": demo.layer_uri("reserve")}
        where = "the reserve boundary (no frame step)"
    if stratify is not None:
        source.update({"STRATA": stratify["OUTPUT"], "STRATUM_FIELD": "stratum"})
    else:
        where += ", without strata (the stratified designs are left out)"
    results = demo.run("plotwise:comparedesigns", {
        **source,
        "SURFACE": str(demo.out / "velmar_per_km2.tif"),  # the true expected velmar per km² of the demo
        "DESIGNS": [0, 1, 2, 3, 4],
        "N_UNITS": 60,
        "SHAPE": 1, "SIZE": PLOT_SIDE, "BEARING": 0.0,  # the square plots of the layout step
        "REPLICATES": 400,
        "OVERDISPERSION": 1.0,  # velmar live in groups: counts far more variable than Poisson
        "N_RANGE": "30, 60, 120",
        "SEED": SEED + 4,
        "OUTPUT_TABLE": demo.table("design_comparison"),
        "REPORT": demo.report("08_design_comparison"),
    })
    demo.results["compare"] = results
    from qgis.core import QgsVectorLayer

    rows = sorted(QgsVectorLayer(demo.layer_uri("design_comparison"), "designs", "ogr").getFeatures(),
                  key=lambda f: f["rmse"])
    print(f"    five designs, 60 plots of {PLOT_HA:g} ha, 400 simulated surveys each over {where}; recommended: "
          f"{results['RECOMMENDED']}")
    for f in rows:
        print(f"      {f['design']:<24s} RMSE {f['rmse']:7.1f} ({f['rel_rmse']:.1%})  coverage {f['coverage']:.0%}")


def step_camera_season(demo):
    """A camera-trap season: stations spaced from the velmar's home range, detections, occupancy (issue 15)."""
    if not all(demo.available(a) for a in ("plotwise:stations", "plotwise:simulatedetections", "plotwise:occupancy")):
        return
    if demo.results.get("reserve") is None:
        print("  camera-trap season skipped: no demo reserve")
        return
    frame = demo.results.get("frame")
    stations = demo.run("plotwise:stations", {
        "FRAME": frame["OUTPUT"] if frame is not None else demo.layer_uri("reserve"),
        "N_STATIONS": 40, "ARRAY": 2,  # spatially balanced single stations
        "HOME_RANGE": VELMAR_HOME_RANGE, "SPACING": 0.0, "SPACING_RULE": 0,  # independent sites: one diameter apart
        "CLUSTER_SIZE": 4, "MIN_SPACING": 0.0, "RESERVE": 3, "SEED": SEED + 20, "SERVICE_HOURS": 1.5,
        "OUTPUT": demo.table("camera_stations"), "OUTPUT_GPX": str(demo.out / "camera_stations.gpx"),
        "REPORT": demo.report("09_camera_stations"),
    })
    # greenness at each station, a covariate of occupancy (the host's own raster sampling)
    sampled = demo.run("native:rastersampling", {
        "INPUT": stations["OUTPUT"], "RASTERCOPY": str(demo.out / "greenness.tif"), "COLUMN_PREFIX": "green_",
        "OUTPUT": "memory:",
    })["OUTPUT"]
    detections = demo.run("plotwise:simulatedetections", {
        "STATIONS": sampled, "ANIMALS": demo.layer_uri("animals"), "GROUP_FIELD": "group_id",
        "OCCASIONS": CAMERA_OCCASIONS, "P_MAX": 0.5, "SIGMA": 450.0, "NOT_SURVEYED": 0.05, "SEED": SEED + 21,
        "OUTPUT": demo.table("camera_detections"),
    })
    occupancy = demo.run("plotwise:occupancy", {
        "SITES": detections["OUTPUT"], "SITE_ID_FIELD": "station",
        "HISTORY_FIELDS": [f"det_{j:02d}" for j in range(1, CAMERA_OCCASIONS + 1)],
        "PSI_COVARIATES": ["green_1"], "P_COVARIATES": [], "MODELS": "psi:", "CONFIDENCE": 0.95, "TARGET_SE": 0.05,
        "GOF_REPLICATES": 200, "SEED": SEED + 22,
        "OUTPUT": demo.table("camera_occupancy"), "OUTPUT_TABLE": demo.table("camera_occupancy_table"),
        "REPORT": demo.report("10_occupancy"),
    })
    demo.results["camera"] = {"stations": stations, "detections": detections, "occupancy": occupancy}
    demo.layers += [
        ("Camera stations", demo.layer_uri("camera_stations"), "ogr", "stations"),
        ("Camera sites: occupancy given the detections", demo.layer_uri("camera_occupancy"), "ogr", "occupancy"),
    ]
    print(f"    {stations['N_PRIMARY']} camera stations {stations['SPACING_USED']:,.0f} m apart (one velmar home-range "
          f"diameter), {CAMERA_OCCASIONS} weekly occasions simulated; occupancy ψ = {occupancy['PSI']:.2f} "
          f"({occupancy['PSI_LO']:.2f} to {occupancy['PSI_HI']:.2f}), p = {occupancy['P']:.2f} per week, naive "
          f"{occupancy['NAIVE']:.2f}; {occupancy['OCCASIONS_NEEDED']:.0f} occasions give a cumulative detection "
          "of 0.95")


def step_distance(demo):
    """A line-transect survey of the velmar, analysed from the sighting distances (issue 14)."""
    if not (demo.available("plotwise:layout") and demo.available("plotwise:distancedensity")):
        return
    stratify = demo.results.get("stratify")
    if stratify is None or demo.results.get("reserve") is None:
        print("  line-transect survey skipped: no strata yet")
        return
    print("  line-transect survey: 80 random 2 km transects, sightings with distances (half-normal, σ = 60 m)")
    lines = demo.run("plotwise:layout", {
        "FRAME": stratify["OUTPUT"], "STRATUM_FIELD": "stratum", "N_UNITS": 80, "DESIGN": 0, "SHAPE": 3,
        # centres over the whole stratum (a transect may run a little past its edge): keeping whole 2 km lines
        # inside these patchy strata would leave their edges unsampled
        "SIZE": 2000.0, "BEARING": -1.0, "INSIDE": False, "MIN_SPACING": 0.0, "RESERVE": 0, "SEED": SEED + 20,
        "OUTPUT": demo.table("transects"), "OUTPUT_GPX": str(demo.out / "transects.gpx"),
        "REPORT": demo.report("11a_transects"),
    })
    sighted = demo.run("plotwise:simulatecounts", {
        "UNITS": lines["OUTPUT"], "ANIMALS": demo.layer_uri("animals"), "DETECTION": 1.0, "SEED": SEED + 21,
        "DETECTION_FUNCTION": 1, "SIGMA": 60.0,  # half-normal: half the velmar 60 m from the line are seen
        "OUTPUT": demo.table("transects_counted"), "OUTPUT_OBSERVATIONS": demo.table("velmar_sightings"),
    })
    results = demo.run("plotwise:distancedensity", {
        "UNITS": sighted["OUTPUT"], "UNIT_ID_FIELD": "unit_id", "STRATUM_FIELD": "stratum",
        "OBSERVATIONS": sighted["OUTPUT_OBSERVATIONS"], "OBS_UNIT_FIELD": "unit_id", "DISTANCE_FIELD": "distance",
        "SIZE_FIELD": "size", "SURVEY_TYPE": 0, "TRUNCATION": 0.0, "KEYS": [0, 1, 2],
        "STRATA": stratify["OUTPUT"], "STRATA_ID_FIELD": "stratum", "CONFIDENCE": 0.95, "AREA_UNIT": 0,
        "SEED": SEED + 22, "OUTPUT": demo.table("distance_estimate"), "OUTPUT_MODELS": demo.table("distance_models"),
        "REPORT": demo.report("11b_distance_density"),
    })
    demo.results["distance"] = results
    demo.layers += [
        ("Line transects", demo.layer_uri("transects_counted"), "ogr", "units"),
        ("Velmar sightings", demo.layer_uri("velmar_sightings"), "ogr", "dots"),
        ("Density from distances", demo.layer_uri("distance_estimate"), "ogr", "estimate"),
    ]
    inside = demo.run("native:countpointsinpolygon", {
        "POLYGONS": stratify["OUTPUT"], "POINTS": demo.layer_uri("animals"), "FIELD": "true_n", "OUTPUT": "memory:",
    })["OUTPUT"]
    if isinstance(inside, str):
        from qgis.core import QgsProcessingContext, QgsProcessingUtils

        inside = QgsProcessingUtils.mapLayerFromString(inside, QgsProcessingContext())
    true_total = float(sum(f["true_n"] for f in inside.getFeatures()))
    covered = results["ABUNDANCE_LO"] <= true_total <= results["ABUNDANCE_HI"]
    print(f"    detection probability {results['P_DETECT']:.2f} within the truncation distance, effective strip "
          f"half-width {results['ESW']:.0f} m; estimated {results['ABUNDANCE']:,.0f} velmar (95% CI "
          f"{results['ABUNDANCE_LO']:,.0f} to {results['ABUNDANCE_HI']:,.0f}, CV {results['CV']:.3f}); true total "
          f"{true_total:,.0f} ({'inside' if covered else 'outside'} the interval)")


STEPS = [step_reserve, step_frame, step_stratify, step_pilot, step_allocate, step_layout, step_counts, step_estimate,
         step_compare]
STEPS.append(step_camera_season)
STEPS.append(step_distance)


MONITORING_YEARS = 10
VELMAR_CHANGE = -4.0  # % per year: the known decline of the demo's ten simulated years


def step_monitoring(demo):
    """Ten simulated years of the velmar with a known decline, in split panels: panels, power, trend (issue 16)."""
    if not all(demo.available(a) for a in ("plotwise:panels", "plotwise:trendpower", "plotwise:trend")):
        return
    layout = demo.results.get("layout")
    if layout is None:
        print("  monitoring skipped: no layout yet")
        return
    first = 2026
    panels = demo.run("plotwise:panels", {
        "UNITS": layout["OUTPUT"], "PANEL_DESIGN": 2, "PANELS": 3, "CORE_SHARE": 0.3,  # a core + 3 rotating panels
        "START_YEAR": first, "YEARS": MONITORING_YEARS, "UNIT_DAYS": 0.5, "SEED": SEED + 40,
        "OUTPUT": demo.table("panels"), "OUTPUT_SCHEDULE": demo.table("panel_schedule"),
        "REPORT": demo.report("12_panels"),
    })
    demo.layers.append(("Revisit panels", demo.layer_uri("panels"), "ogr", "panels"))
    pilot = (demo.results.get("estimate") or {}).get("OUTPUT_TABLE")
    power = demo.run("plotwise:trendpower", {
        "PANEL_LAYER": demo.layer_uri("panels"), "CHANGES": "-2, -4, -6",
        "SD_UNIT_YEAR": 0.3, "SD_YEAR": 0.1,  # illustrative: a single season cannot measure these
        **({"PILOT": pilot} if pilot else {"MEAN_COUNT": 1.5, "SD_UNIT": 1.0}),
        "DETECTION": 0.9, "ALPHA": 0.05, "TWO_SIDED": True, "REPLICATES": 1000, "SEED": SEED + 41,
        "OUTPUT_TABLE": demo.table("trend_power"), "REPORT": demo.report("13_trend_power"),
    })
    counts = simulate_monitoring_years(demo, first)
    trend = demo.run("plotwise:trend", {
        "INPUT": counts, "SOURCE": 0, "UNIT_ID_FIELD": "unit_id", "YEAR_FIELD": "year", "COUNT_FIELD": "count",
        "STRATUM_FIELD": "stratum", "CONFIDENCE": 0.95,
        "OUTPUT_TABLE": demo.table("velmar_index"), "REPORT": demo.report("14_trend"),
    })
    demo.results["monitoring"] = {"panels": panels, "power": power, "trend": trend}
    print(f"    split panels over {first}-{first + MONITORING_YEARS - 1}; simulated decline {VELMAR_CHANGE:g}% per "
          f"year; estimated {trend['CHANGE']:+.1f}% per year (95% CI {trend['CHANGE_LO']:+.1f}% to "
          f"{trend['CHANGE_HI']:+.1f}%)")


def simulate_monitoring_years(demo, first):
    """The velmar counts of the panels' units over the years: each year the simulated animals are thinned to
    (1 + change)^t of their number (nested: an animal gone stays gone, seeded), the units visited that year
    are counted with plotwise:simulatecounts at a constant detection of 0.9, and the counts are gathered in
    one table (unit_id, year, count, stratum) in the demo GeoPackage."""
    import numpy as np
    from qgis.core import QgsFeature, QgsVectorLayer

    from plotwise.processing import compat

    animals = QgsVectorLayer(demo.layer_uri("animals"), "animals", "ogr")
    keep_score = np.random.default_rng(SEED + 42).random(animals.featureCount())
    ids = [f.id() for f in animals.getFeatures()]
    table = QgsVectorLayer("None", "velmar counts", "memory")
    table.dataProvider().addAttributes([compat.make_field(n, k) for n, k in (
        ("unit_id", "string"), ("year", "int"), ("count", "int"), ("stratum", "string"))])
    table.updateFields()
    for t in range(MONITORING_YEARS):
        year = first + t
        alive = [i for i, u in zip(ids, keep_score) if u < (1 + VELMAR_CHANGE / 100) ** t]
        animals.selectByIds(alive)
        survivors = demo.processing.run("native:saveselectedfeatures", {"INPUT": animals, "OUTPUT": "memory:"})
        visited = demo.processing.run("native:extractbyexpression", {
            "INPUT": demo.layer_uri("panels"), "EXPRESSION": f"array_contains(string_to_array(\"years\"), '{year}')",
            "OUTPUT": "memory:"})["OUTPUT"]
        counted = demo.processing.run("plotwise:simulatecounts", {
            "UNITS": visited, "ANIMALS": survivors["OUTPUT"], "DETECTION": 0.9, "SEED": SEED + 50 + t,
            "OUTPUT": "memory:"})["OUTPUT"]
        rows = []
        for unit in counted.getFeatures():
            row = QgsFeature(table.fields())
            row.setAttributes([unit["unit_id"], year, unit["count"], str(unit["stratum"])])
            rows.append(row)
        table.dataProvider().addFeatures(rows)
    animals.removeSelection()
    demo.processing.run("native:retainfields", {"INPUT": table, "FIELDS": ["unit_id", "year", "count", "stratum"],
                                                 "OUTPUT": demo.table("velmar_counts")})
    print(f"  {MONITORING_YEARS} simulated years counted ({first}-{first + MONITORING_YEARS - 1})")
    return demo.layer_uri("velmar_counts")


STEPS.append(step_monitoring)


# -- project -------------------------------------------------------------------------
def write_project(demo):
    from qgis.core import QgsProject, QgsRasterLayer, QgsVectorLayer

    from plotwise.processing import styles

    project = QgsProject.instance()
    project.clear()
    project.setTitle("Plotwise demo: Hollin Ridge Reserve (invented)")
    for name, uri, provider, style in demo.layers:
        layer = QgsRasterLayer(uri, name, provider) if provider == "gdal" else QgsVectorLayer(uri, name, provider)
        if not layer.isValid():
            print(f"  warning: layer {name} could not be loaded from {uri}")
            continue
        apply_style(styles, layer, style)
        project.addMapLayer(layer)
    if project.mapLayers():
        project.setCrs(next(iter(project.mapLayers().values())).crs())
    path = demo.out / "plotwise-demo.qgz"
    project.write(str(path))
    return path


def apply_style(styles, layer, style):
    """The same named styles as the algorithms' outputs get when they load (processing/styles.py)."""
    try:
        styles.apply_style(layer, style)
    except KeyError as error:
        print(f"  warning: layer {layer.name()} keeps the default style ({error})")


def copy_rasters_into_geopackage(demo):
    """The rasters also go into the GeoPackage, so that it holds every layer."""
    from osgeo import gdal

    for name, uri, provider, _ in demo.layers:
        if provider != "gdal" or not uri.endswith(".tif"):
            continue
        table = Path(uri).stem
        gdal.Translate(str(demo.gpkg), uri, format="GPKG",
                       creationOptions=[f"RASTER_TABLE={table}", "APPEND_SUBDATASET=YES", "TILE_FORMAT=TIFF"])


# -- print layout (issue 7) -----------------------------------------------------------
def write_print_layout(demo, project_path):
    """The demo's A4 print layout (processing/print_layout.py), saved in the project and exported to PDF."""
    from qgis.core import QgsProject, QgsVectorLayer

    from plotwise.processing import print_layout

    project = QgsProject.instance()
    by_name = {layer.name(): layer for layer in project.mapLayers().values()}

    def first(*names):
        return next((by_name[n] for n in names if n in by_name), None)

    map_layers = [layer for layer in (
        first("Units with counts", "Sample units"), first("Sampling frame"),
        first("Density estimate by stratum", "Strata with units allocated", "Strata"),
        first("Excluded areas"), first("Reserve boundary"),
    ) if layer is not None]
    if not map_layers:
        print("  print layout skipped: no map layer")
        return None
    table = QgsVectorLayer(demo.layer_uri("estimate_table"), "Estimate table", "ogr")
    columns = None
    if table.isValid():
        project.addMapLayer(table)
        columns = print_layout.estimate_table_columns("km²")  # step_estimate asks for AREA_UNIT 0 (km²) at 95 %
    else:
        table = first("Strata with units allocated", "Strata", "Units with counts", "Sample units")
    return print_layout.print_survey_map(project, map_layers, table, columns, project_path,
                                         demo.out / "plotwise-demo-map.pdf",
                                         note="invented demo data, not a real reserve")


def main():
    if OUT.exists():
        shutil.rmtree(OUT)
    OUT.mkdir(parents=True)
    app, processing = start_host()
    demo = Demo(processing, OUT)
    print("Plotwise demo chain (invented scenario: Hollin Ridge Reserve)")
    for step in STEPS:
        step(demo)
    copy_rasters_into_geopackage(demo)
    project = write_project(demo)
    pdf = write_print_layout(demo, project)
    print("\nWritten to", OUT)
    print("  GeoPackage:", demo.gpkg)
    print("  Project:   ", project)
    if pdf:
        print("  Print map: ", pdf)
    for report in demo.reports:
        print("  Report:    ", report)
    print("\nCaution: the demo reserve is invented. Before real fieldwork, check every unit's access and "
          "safety; the tool never makes a location safe. Follow your agency's field-safety rules and local law.")
    stop_host()


if __name__ == "__main__":
    main()
