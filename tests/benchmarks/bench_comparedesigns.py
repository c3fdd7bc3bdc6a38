"""Speed and memory of plotwise:comparedesigns, the whole algorithm through the host, run on demand.

    .venv/bin/python tests/benchmarks/bench_comparedesigns.py [--shape 1] [--size 100] [--half-width 25]
                                                              [--replicates 1000] [--k 0] [--no-host]
                                                              [--folder DIR]

Issue 18, target 3: on a 10^7-cell density surface (3,163 x 3,163 cells of 10 m, 1,000 km²), the
five default designs (simple random, stratified proportional, stratified Neyman best case,
systematic grid, spatially balanced) x 1,000 simulated surveys of n = 50 units, in under 60 s and
2 GiB. The default units are the algorithm's own defaults: 100 m square plots, random bearings.

Inputs are invented (UTM 33N) and written once to ``--folder`` (default
/tmp/plotwise_bench_comparedesigns), then reused: a Float32 GeoTIFF of expected animals per km²
(a smooth gradient plus a dozen smooth bumps, 20-330 per km²), a frame with an irregular
2,000-vertex outline covering 80 % of the raster, and four strata (GeoPackages).

Printed: ``processing.run("plotwise:comparedesigns", ...)`` in a fresh process (wall clock and CPU
time; the time to each progress step: surface read, grid and set-up, the surveys, table and report),
the process's peak memory (ru_maxrss, QGIS itself included; the resident size after the host
started is printed beside it), and the load average of the shared machine.

Reference. The host has no algorithm that compares survey designs, so there is no like-for-like
reference. The nearest thing a user could assemble from the host's own tools is timed for one
replicate and scaled: per replicate one realised population raster (Poisson counts of the surface,
numpy + GDAL), and per design ``native:randompointsinpolygons`` (50 points in the frame),
``native:rectanglesovalsdiamonds`` (the square plots) and ``native:zonalstatisticsfb`` (the count
in each plot). That chain does less than one of our replicates (no stratified or systematic or
balanced layout, no plus sampling, no estimate or interval), so the ratio is a generous lower
bound on what the host would cost.
"""
import argparse
import json
import math
import os
import resource
import subprocess
import sys
import time
from pathlib import Path

HERE = Path(__file__).resolve()
REPO = HERE.parents[2]
GIB = 1024**3
CELLS, CELL = 3163, 10.0
X0, Y0 = 400000.0, 5200000.0
N_UNITS, TARGET_S, TARGET_BYTES = 50, 60.0, 2 * GIB
SIDE = CELLS * CELL


def _gdal():
    from osgeo import gdal, ogr, osr

    gdal.UseExceptions()
    return gdal, ogr, osr


def _srs():
    _, _, osr = _gdal()
    srs = osr.SpatialReference()
    srs.ImportFromEPSG(32633)
    return srs


def write_surface(path):
    """Expected animals per km²: a broad gradient plus twelve smooth bumps (invented)."""
    import numpy as np

    gdal, _, _ = _gdal()
    rng = np.random.default_rng(1)
    bumps = [(rng.uniform(0, SIDE), rng.uniform(0, SIDE), rng.uniform(800, 4000), rng.uniform(20, 120))
             for _ in range(12)]
    ds = gdal.GetDriverByName("GTiff").Create(path + ".part", CELLS, CELLS, 1, gdal.GDT_Float32,
                                              ["TILED=YES", "BLOCKXSIZE=512", "BLOCKYSIZE=512"])
    ds.SetGeoTransform((X0, CELL, 0, Y0, 0, -CELL))
    ds.SetProjection(_srs().ExportToWkt())
    band = ds.GetRasterBand(1)
    band.SetNoDataValue(-9999)
    x = (np.arange(CELLS) + 0.5) * CELL
    for y0 in range(0, CELLS, 512):
        y = SIDE - (np.arange(y0, min(CELLS, y0 + 512)) + 0.5) * CELL
        xx, yy = np.meshgrid(x, y)
        d = 20.0 + 160.0 * np.exp(-((xx - 0.6 * SIDE) ** 2 + (yy - 0.4 * SIDE) ** 2) / (2 * (0.25 * SIDE) ** 2))
        for cx, cy, r, h in bumps:
            d += h * np.exp(-((xx - cx) ** 2 + (yy - cy) ** 2) / (2 * r * r))
        band.WriteArray(d.astype(np.float32), 0, y0)
    band.FlushCache()
    ds = None
    os.replace(path + ".part", path)


def frame_polygon():
    """An irregular 2,000-vertex outline covering about 80 % of the raster (invented)."""
    import numpy as np

    t = np.linspace(0, 2 * math.pi, 2000, endpoint=False)
    radius = 0.5 * SIDE * (1 + 0.05 * np.sin(7 * t) + 0.03 * np.sin(23 * t) + 0.01 * np.sin(151 * t))
    radius = np.minimum(radius, 0.5 * SIDE / np.maximum(np.abs(np.cos(t)), np.abs(np.sin(t))) - 20)
    xs, ys = X0 + SIDE / 2 + radius * np.cos(t), Y0 - SIDE / 2 + radius * np.sin(t)
    return [(float(a), float(b)) for a, b in zip(xs, ys)]


def write_polygons(path, rings, keys=None):
    _, ogr, _ = _gdal()
    out = ogr.GetDriverByName("GPKG").CreateDataSource(path + ".part.gpkg")
    layer = out.CreateLayer("polygons", _srs(), ogr.wkbPolygon)
    if keys is not None:
        layer.CreateField(ogr.FieldDefn("stratum", ogr.OFTString))
    for i, ring in enumerate(rings):
        feature = ogr.Feature(layer.GetLayerDefn())
        text = ", ".join(f"{x} {y}" for x, y in ring + ring[:1])
        feature.SetGeometry(ogr.CreateGeometryFromWkt(f"POLYGON(({text}))"))
        if keys is not None:
            feature.SetField("stratum", keys[i])
        layer.CreateFeature(feature)
    out = None
    os.replace(path + ".part.gpkg", path)


def inputs(folder):
    surface = os.path.join(folder, "density_10m.tif")
    frame = os.path.join(folder, "frame.gpkg")
    strata = os.path.join(folder, "strata.gpkg")
    if not os.path.exists(surface):
        write_surface(surface)
    if not os.path.exists(frame):
        write_polygons(frame, [frame_polygon()])
    if not os.path.exists(strata):  # four zones: two bands of the gradient, the east split in two
        cx, cy = X0 + 0.45 * SIDE, Y0 - 0.55 * SIDE
        e, n = X0 + SIDE, Y0
        zones = [[(X0, Y0 - SIDE), (cx, Y0 - SIDE), (cx, cy), (X0, cy)], [(X0, cy), (cx, cy), (cx, n), (X0, n)],
                 [(cx, Y0 - SIDE), (e, Y0 - SIDE), (e, cy), (cx, cy)], [(cx, cy), (e, cy), (e, n), (cx, n)]]
        write_polygons(strata, zones, ["south-west", "north-west", "south-east", "north-east"])
    return surface, frame, strata


def peak():
    return resource.getrusage(resource.RUSAGE_SELF).ru_maxrss * 1024


def resident():
    with open("/proc/self/statm") as f:
        return int(f.read().split()[1]) * os.sysconf("SC_PAGE_SIZE")


def _host():
    sys.path.insert(0, str(REPO / "scripts"))
    from headless_host import start_host

    return start_host()


# -- measurements, each in a child process ----------------------------------------------
def measure_ours(surface, frame, strata, folder, shape, size, half_width, replicates, k):
    """plotwise:comparedesigns through the host's Processing framework; progress steps timed."""
    app, processing = _host()
    from qgis.core import QgsProcessingFeedback

    class StepTimes(QgsProcessingFeedback):
        def __init__(self):
            super().__init__()
            self.start, self.steps = time.perf_counter(), {}

        def setProgress(self, value):  # noqa: N802 (host naming)
            for mark in (3, 6, 95, 100):
                if value >= mark and mark not in self.steps:
                    self.steps[mark] = time.perf_counter() - self.start
            super().setProgress(value)

    after_start = resident()
    feedback = StepTimes()
    cpu = time.process_time()
    t = time.perf_counter()
    out = processing.run("plotwise:comparedesigns", {
        "SURFACE": surface, "FRAME": frame, "STRATA": strata, "STRATUM_FIELD": "stratum",
        "DESIGNS": [0, 1, 2, 3, 4], "N_UNITS": N_UNITS, "SHAPE": shape, "SIZE": size, "HALF_WIDTH": half_width,
        "REPLICATES": replicates, "OVERDISPERSION": k, "SEED": 2026,
        "OUTPUT_TABLE": os.path.join(folder, "comparison.gpkg"), "REPORT": os.path.join(folder, "comparison.html"),
    }, feedback=feedback)
    seconds, cpu = time.perf_counter() - t, time.process_time() - cpu
    from qgis.core import QgsVectorLayer

    table = QgsVectorLayer(out["OUTPUT_TABLE"], "table", "ogr")
    rows = [(f["design"], f["rel_bias"], f["rmse"], f["coverage"], f["mean_n"]) for f in table.getFeatures()]
    return {"seconds": seconds, "cpu": cpu, "peak": peak(), "after_start": after_start, "steps": feedback.steps,
            "rows": rows, "recommended": out["RECOMMENDED"]}


def measure_host(surface, frame, folder, replicates_timed):
    """One replicate's nearest equivalent with the host's tools (see the module docstring), timed."""
    import numpy as np

    app, processing = _host()
    gdal, _, _ = _gdal()
    ds = gdal.Open(surface)
    mu = ds.GetRasterBand(1).ReadAsArray().astype(float) * CELL * CELL / 1e6
    geotransform, projection = ds.GetGeoTransform(), ds.GetProjection()
    ds = None
    rng = np.random.default_rng(3)
    t = time.perf_counter()
    for r in range(replicates_timed):
        path = os.path.join(folder, f"host_population_{r}.tif")
        out = gdal.GetDriverByName("GTiff").Create(path, CELLS, CELLS, 1, gdal.GDT_Int16)
        out.SetGeoTransform(geotransform)
        out.SetProjection(projection)
        out.GetRasterBand(1).WriteArray(rng.poisson(mu))
        out = None
        for design in range(5):
            points = processing.run("native:randompointsinpolygons", {
                "INPUT": frame, "POINTS_NUMBER": N_UNITS, "MIN_DISTANCE": 0, "SEED": 10 * r + design + 1,
                "OUTPUT": "memory:"})["OUTPUT"]
            squares = processing.run("native:rectanglesovalsdiamonds", {
                "INPUT": points, "SHAPE": 0, "WIDTH": 100, "HEIGHT": 100, "ROTATION": 0, "SEGMENTS": 4,
                "OUTPUT": "memory:"})["OUTPUT"]
            processing.run("native:zonalstatisticsfb", {
                "INPUT": squares, "INPUT_RASTER": path, "RASTER_BAND": 1, "COLUMN_PREFIX": "c_", "STATISTICS": [1],
                "OUTPUT": "memory:"})
        os.remove(path)
    return {"seconds": (time.perf_counter() - t) / replicates_timed, "peak": peak()}


def child(args):
    kind, a = args.child, json.loads(args.args)
    out = {"ours": measure_ours, "host": measure_host}[kind](*a)
    print("RESULT " + json.dumps(out), flush=True)
    os._exit(0)  # PyQGIS may crash while tearing down a standalone application


def run_child(kind, *args):
    cmd = [sys.executable, str(HERE), "--child", kind, "--args", json.dumps(list(args))]
    proc = subprocess.run(cmd, capture_output=True, text=True)
    for line in proc.stdout.splitlines():
        if line.startswith("RESULT "):
            return json.loads(line[7:])
    sys.stderr.write(proc.stdout[-3000:] + proc.stderr[-3000:])
    return None


def main():
    ap = argparse.ArgumentParser()
    ap.add_argument("--shape", type=int, default=1, help="0 point, 1 square (default), 2 circle, 3 line")
    ap.add_argument("--size", type=float, default=100.0)
    ap.add_argument("--half-width", type=float, default=25.0)
    ap.add_argument("--replicates", type=int, default=1000)
    ap.add_argument("--k", type=float, default=0.0, help="overdispersion (0: Poisson counts, the default)")
    ap.add_argument("--folder", default="/tmp/plotwise_bench_comparedesigns")
    ap.add_argument("--no-host", action="store_true")
    ap.add_argument("--child")
    ap.add_argument("--args", default="[]")
    args = ap.parse_args()
    if args.child:
        child(args)
        return
    os.makedirs(args.folder, exist_ok=True)
    t = time.perf_counter()
    surface, frame, strata = inputs(args.folder)
    print(f"== plotwise:comparedesigns on {CELLS:,} x {CELLS:,} = {CELLS * CELLS:,} cells of {CELL:g} m "
          f"({SIDE * SIDE / 1e6:,.0f} km²); inputs ready in {time.perf_counter() - t:.1f} s ({args.folder})")
    print(f"   5 designs x {args.replicates:,} simulated surveys, n = {N_UNITS}, shape {args.shape}, size "
          f"{args.size:g} m" + (f", half-width {args.half_width:g} m" if args.shape == 3 else "")
          + f", k = {args.k:g}; load average before: {os.getloadavg()[0]:.2f}")
    ours = run_child("ours", surface, frame, strata, args.folder, args.shape, args.size, args.half_width,
                     args.replicates, args.k)
    if ours is None:
        raise SystemExit("our run failed")
    steps = ours["steps"]
    s = {int(key): v for key, v in steps.items()}
    print(f"plotwise:comparedesigns (whole algorithm): {ours['seconds']:.2f} s wall, {ours['cpu']:.2f} s CPU; "
          f"peak memory {ours['peak'] / GIB:.2f} GiB (the host alone: {ours['after_start'] / GIB:.2f} GiB); "
          f"load average after: {os.getloadavg()[0]:.2f}")
    if all(m in s for m in (3, 6, 95, 100)):
        print(f"  surface read {s[3]:.2f} s, grid and set-up {s[6] - s[3]:.2f} s, surveys {s[95] - s[6]:.2f} s "
              f"({(s[95] - s[6]) / args.replicates * 1e3:.1f} ms per replicate of 5 designs), table and report "
              f"{ours['seconds'] - s[95]:.2f} s")
    for design, bias, rmse, coverage, mean_n in ours["rows"]:
        print(f"  {design:<32s} rel. bias {bias:+.3f}  RMSE {rmse:9.1f}  coverage {coverage:.3f}  mean n {mean_n:.1f}")
    ok = ours["seconds"] < TARGET_S and ours["peak"] < TARGET_BYTES
    print(f"  target: under {TARGET_S:.0f} s and {TARGET_BYTES / GIB:.0f} GiB -> {'OK' if ok else 'OVER'}")
    if args.no_host or args.shape != 1:
        print("reference: none run (the host has no design comparison; --no-host or a shape other than squares)")
        return
    ref = run_child("host", surface, frame, args.folder, 1)
    if ref is None:
        print("reference: the host's chain failed")
        return
    scaled = ref["seconds"] * args.replicates
    print(f"reference (no host equivalent; the nearest host chain, see the docstring): one replicate "
          f"{ref['seconds']:.2f} s (population raster + 5 x randompointsinpolygons, rectanglesovalsdiamonds, "
          f"zonalstatisticsfb), x {args.replicates:,} = {scaled / 3600:.1f} h; ratio plotwise / host chain "
          f"{ours['seconds'] / scaled:.4f}")


if __name__ == "__main__":
    main()
