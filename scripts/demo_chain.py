"""The demo chain, run headless by `make demo`: every Plotwise step on the invented demo reserve.

Writes demo-output/: plotwise-demo.gpkg (every layer), one HTML report per step, the
rasters as GeoTIFF, and plotwise-demo.qgz (the layers styled). Each issue adds its step:
a step whose algorithm is not available yet says so and is skipped.
"""
import os
import shutil
import sys
from dataclasses import dataclass, field
from pathlib import Path

REPO = Path(__file__).resolve().parents[1]
OUT = Path(os.environ.get("PLOTWISE_DEMO_OUT", REPO / "demo-output"))
SEED = 20261201


def start_host():
    os.environ.setdefault("QT_QPA_PLATFORM", "offscreen")
    sys.path[:] = [p for p in sys.path if p not in ("", ".") and Path(p).resolve() != REPO]
    sys.path.insert(0, "/usr/share/qgis/python/plugins")
    sys.path.insert(0, str(REPO / "tests"))
    import conftest  # noqa: F401  (registers the clone as the package `plotwise`)
    from qgis.core import QgsApplication

    app = QgsApplication([], False)
    app.initQgis()
    import processing
    from processing.core.Processing import Processing

    Processing.initialize()
    from plotwise.processing.provider import PlotwiseProvider

    provider = PlotwiseProvider()
    if not QgsApplication.processingRegistry().addProvider(provider):
        raise SystemExit("The Plotwise provider could not be registered.")
    app.plotwise_provider = provider  # keep a reference for the whole run
    return app, processing


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
        ("Sampling frame", demo.layer_uri("frame"), "ogr", "outline"),
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
        "MIN_AREA": 5.0,  # patches under 5 ha join a neighbour
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
        "METHOD": 2, "TOTAL": 60, "UNIT_AREA": 10000.0, "MIN_PER_STRATUM": 2,
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
        "SHAPE": 1, "SIZE": 100.0,  # 1 ha square plots, the unit area the allocation assumed
        "BEARING": 0.0,  # sides north-south and east-west: easy to peg out with a compass
        "INSIDE": True, "MIN_SPACING": 250.0, "RESERVE": 3, "SEED": SEED + 3,
        "OUTPUT": demo.table("units"), "OUTPUT_GPX": str(demo.out / "units.gpx"),
        "REPORT": demo.report("06_layout"),
    })
    demo.results["layout"] = results
    demo.layers.append(("Sample units", demo.layer_uri("units"), "ogr", "units"))
    from qgis.core import QgsVectorLayer

    units = list(QgsVectorLayer(demo.layer_uri("units"), "units", "ogr").getFeatures())
    primary = sum(1 for f in units if f["role"] == "primary")
    print(f"    {primary} primary and {len(units) - primary} reserve 1 ha plots, spatially balanced ({how}); "
          f"waypoints in units.gpx")


def step_counts(demo):
    """Simulated counts in the layout's units (the fieldwork of the demo)."""
    layout = demo.results.get("layout")
    if layout is None:
        print("  plotwise:simulatecounts skipped: no layout yet")
        return
    demo.results["counts"] = demo.run("plotwise:simulatecounts", {
        "UNITS": layout["OUTPUT"],
        "ANIMALS": demo.layer_uri("animals"),
        "DETECTION": 1.0,
        "SEED": SEED + 1,
        "OUTPUT": demo.table("units_counted"),
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
    demo.layers.append(("Density estimate by stratum", demo.layer_uri("strata_estimate"), "ogr", "strata"))
    covered = results["ABUNDANCE_LO"] <= true_total <= results["ABUNDANCE_HI"]
    print(f"    estimated {results['ABUNDANCE']:,.0f} velmar (95% CI {results['ABUNDANCE_LO']:,.0f} to "
          f"{results['ABUNDANCE_HI']:,.0f}, CV {results['CV']:.3f}); true total in the frame {true_total:,.0f} "
          f"({'inside' if covered else 'outside'} the interval; only a simulation can show this)")


def step_compare(demo):
    """Designs compared by simulation on the true intensity surface (issue 8)."""
    if not demo.available("plotwise:comparedesigns"):
        return


STEPS = [step_reserve, step_frame, step_stratify, step_pilot, step_allocate, step_layout, step_counts, step_estimate, step_compare]


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
    if style == "terrain":
        styles.pseudocolour(layer, "Greys")
    elif style == "greenness":
        styles.pseudocolour(layer, "Greens")
    elif style == "intensity":
        styles.pseudocolour(layer, "Viridis")
    elif style == "outline":
        styles.outline(layer, width=0.8)
    elif style == "hatched":
        styles.hatched(layer)
    elif style == "dots":
        styles.dots(layer)
    elif style == "strata":
        styles.categorised(layer, "stratum")
    elif style == "units":
        styles.categorised(layer, "role", opacity=1.0)


def copy_rasters_into_geopackage(demo):
    """The rasters also go into the GeoPackage, so that it holds every layer."""
    from osgeo import gdal

    for name, uri, provider, _ in demo.layers:
        if provider != "gdal" or not uri.endswith(".tif"):
            continue
        table = Path(uri).stem
        gdal.Translate(str(demo.gpkg), uri, format="GPKG",
                       creationOptions=[f"RASTER_TABLE={table}", "APPEND_SUBDATASET=YES", "TILE_FORMAT=TIFF"])


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
    print("\nWritten to", OUT)
    print("  GeoPackage:", demo.gpkg)
    print("  Project:   ", project)
    for report in demo.reports:
        print("  Report:    ", report)
    print("\nCaution: the demo reserve is invented. Before real fieldwork, check every unit's access and "
          "safety; the tool never makes a location safe. Follow your agency's field-safety rules and local law.")
    app.exitQgis()


if __name__ == "__main__":
    main()
