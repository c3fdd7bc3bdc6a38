"""Speed and memory of plotwise:stratify, the whole algorithm (polygons, layer and report written), run on demand.

    .venv/bin/python tests/benchmarks/bench_stratify.py [--case textured|speckled|all] [--size N] [--repeats R]
                                                        [--folder DIR] [--no-host] [--host-cap S]

Inputs are invented (UTM 33N, 10 m cells) and written once to ``--folder`` (default
/tmp/plotwise_bench_stratify), then reused: the 10^8-cell raster takes a few seconds to write
and 0.4 GB of disk. Each measurement runs in its own process, so that its peak memory
(ru_maxrss, which includes GDAL's block cache) is its own.

1. **textured** (issue 18): a smooth elevation surface plus fine noise (SD 1 m per cell,
   a DEM's vertical error), 10,000 x 10,000 cells, a frame polygon covering most of it;
   quantile, 5 strata, default MIN_AREA. Printed: our whole run through the host's
   Processing framework; a bare GDAL block read plus ``numpy.digitize`` over the same raster
   (the floor of any stratification); the host's own chain run through Processing in one
   process (``gdal:cliprasterbymasklayer``, ``native:reclassifybytable`` with our boundaries,
   ``gdal:polygonize``, ``native:dissolve`` by stratum), stopped after ``--host-cap`` seconds
   (600 by default; it runs for most of an hour here, so the ratio is then an upper bound); the
   ratios. Targets: at most 3x the bare pass, at most 0.5x the host chain, peak memory under 1 GiB.
2. **speckled** (issue 12): white noise, quantile, 5 strata, default MIN_AREA, on
   2,000 x 2,000 cells (target: under 60 s and 1 GiB, or a clear error naming MIN_AREA) and
   on 10,000 x 10,000 cells (target: no memory blow-up: a result or a clear error).

On a shared machine each side's fastest of alternated runs is kept (``--repeats``).
"""
import argparse
import json
import os
import resource
import signal
import subprocess
import sys
import time
from pathlib import Path

HERE = Path(__file__).resolve()
REPO = HERE.parents[2]
GIB = 1024**3
CELL = 10.0
X0, Y0 = 400000.0, 5200000.0
NOISE_SD = 1.0


def _gdal():
    from osgeo import gdal, ogr, osr

    gdal.UseExceptions()
    return gdal, ogr, osr


def write_raster(path, size, values_for_rows):
    gdal, _, osr = _gdal()
    srs = osr.SpatialReference()
    srs.ImportFromEPSG(32633)
    ds = gdal.GetDriverByName("GTiff").Create(path + ".part", size, size, 1, gdal.GDT_Float32,
                                              ["TILED=YES", "BLOCKXSIZE=512", "BLOCKYSIZE=512"])
    ds.SetGeoTransform((X0, CELL, 0, Y0, 0, -CELL))
    ds.SetProjection(srs.ExportToWkt())
    band = ds.GetRasterBand(1)
    band.SetNoDataValue(-9999)
    for y0 in range(0, size, 512):
        band.WriteArray(values_for_rows(y0, min(size, y0 + 512)), 0, y0)
    band.FlushCache()
    ds = None
    os.replace(path + ".part", path)


def textured(folder, size):
    """Smooth invented relief (600-1,000 m) plus white noise of SD 1 m: a DEM's fine texture."""
    import numpy as np

    path = os.path.join(folder, f"textured_{size}.tif")
    if not os.path.exists(path):
        x = np.arange(size) * CELL
        rng = np.random.default_rng(12)

        def rows(y0, y1):
            y = (np.arange(y0, y1) * CELL)[:, None]
            z = (600 + 0.004 * x[None, :] + 250 * np.sin(x[None, :] / 9000.0) * np.cos(y / 12000.0)
                 + 60 * np.sin((x[None, :] + 2 * y) / 2500.0))
            return (z + rng.normal(0, NOISE_SD, z.shape)).astype(np.float32)

        write_raster(path, size, rows)
    return path


def speckled(folder, size):
    """White noise in [0, 1): a covariate speckled at the scale of its cells."""
    import numpy as np

    path = os.path.join(folder, f"speckled_{size}.tif")
    if not os.path.exists(path):
        rng = np.random.default_rng(7)
        write_raster(path, size, lambda y0, y1: rng.random((y1 - y0, size), dtype=np.float32))
    return path


def frame(folder, size, whole=False):
    """A quadrilateral covering most of the raster (or the whole raster), as a GeoPackage."""
    _, ogr, osr = _gdal()
    path = os.path.join(folder, f"frame_{size}{'_whole' if whole else ''}.gpkg")
    if os.path.exists(path):
        return path
    s = size * CELL
    corners = ([(0, 0), (1, 0), (1, 1), (0, 1)] if whole else
               [(0.03, 0.05), (0.97, 0.02), (0.95, 0.96), (0.10, 0.90)])
    ring = ", ".join(f"{X0 + a * s} {Y0 - b * s}" for a, b in corners + corners[:1])
    srs = osr.SpatialReference()
    srs.ImportFromEPSG(32633)
    out = ogr.GetDriverByName("GPKG").CreateDataSource(path)
    layer = out.CreateLayer("frame", srs, ogr.wkbPolygon)
    feat = ogr.Feature(layer.GetLayerDefn())
    feat.SetGeometry(ogr.CreateGeometryFromWkt(f"POLYGON(({ring}))"))
    layer.CreateFeature(feat)
    out = None
    return path


def peak():
    return resource.getrusage(resource.RUSAGE_SELF).ru_maxrss * 1024


# -- measurements, each in a child process ----------------------------------------------
def measure_bare(raster, bounds):
    """GDAL reads the raster block by block (its own 512 x 512 tiles) and numpy.digitize classifies each block."""
    import numpy as np

    gdal, _, _ = _gdal()
    ds = gdal.Open(raster)
    band = ds.GetRasterBand(1)
    bx, by = band.GetBlockSize()
    t = time.perf_counter()
    total = 0
    for y0 in range(0, band.YSize, by):
        for x0 in range(0, band.XSize, bx):
            a = band.ReadAsArray(x0, y0, min(bx, band.XSize - x0), min(by, band.YSize - y0))
            total += int(np.digitize(a, bounds)[0, 0])
    return {"seconds": time.perf_counter() - t, "peak": peak()}


def _host():
    sys.path.insert(0, str(REPO / "scripts"))
    from headless_host import start_host

    return start_host()


def measure_ours(raster, frame_path, out_folder):
    """plotwise:stratify through the host's Processing framework, with only the pinned parameters."""
    app, processing = _host()
    from qgis.core import QgsProcessingException, QgsVectorLayer

    t = time.perf_counter()
    try:
        out = processing.run("plotwise:stratify", {
            "FRAME": frame_path, "COVARIATES": [raster], "METHOD": 0, "STRATA": 5,
            "OUTPUT_RASTER": os.path.join(out_folder, "ours_strata.tif"),
            "OUTPUT": os.path.join(out_folder, "ours_strata.gpkg"),
            "REPORT": os.path.join(out_folder, "ours_report.html")})
    except QgsProcessingException as error:
        return {"seconds": time.perf_counter() - t, "peak": peak(), "error": str(error)}
    seconds = time.perf_counter() - t
    layer = QgsVectorLayer(out["OUTPUT"], "strata", "ogr")
    parts = sum(f.geometry().constGet().numGeometries() for f in layer.getFeatures())
    return {"seconds": seconds, "peak": peak(), "strata": out["N_STRATA"], "parts": parts}


def boundaries_of(raster, frame_path, out_folder):
    """Quantile boundaries for the references, from a 2,000 x 2,000 overview read (close to ours; exactness is ours)."""
    import numpy as np

    gdal, _, _ = _gdal()
    ds = gdal.Open(raster)
    band = ds.GetRasterBand(1)
    sample = band.ReadAsArray(0, 0, band.XSize, band.YSize, buf_xsize=2000, buf_ysize=2000).astype(float)
    return [float(b) for b in np.quantile(sample[sample != -9999], [0.2, 0.4, 0.6, 0.8])]


def measure_host(raster, frame_path, out_folder, bounds):
    """The host's own chain in one process: clip by mask, reclassify by table, polygonize, dissolve."""
    app, processing = _host()
    edges = [-1e30] + list(bounds) + [1e30]
    table = []
    for h in range(len(edges) - 1):
        table += [edges[h], edges[h + 1], h + 1]
    times = {}
    t = time.perf_counter()
    processing.run("gdal:cliprasterbymasklayer", {
        "INPUT": raster, "MASK": frame_path, "NODATA": -9999, "CROP_TO_CUTLINE": True,
        "OUTPUT": os.path.join(out_folder, "host_clip.tif")})
    times["clip"] = time.perf_counter() - t
    print(f"STEP clip {times['clip']:.2f}", flush=True)
    t1 = time.perf_counter()
    processing.run("native:reclassifybytable", {
        "INPUT_RASTER": os.path.join(out_folder, "host_clip.tif"), "RASTER_BAND": 1, "TABLE": table,
        "RANGE_BOUNDARIES": 1,  # min <= value < max, as ours
        "NO_DATA": 0, "DATA_TYPE": 0, "OUTPUT": os.path.join(out_folder, "host_classes.tif")})
    times["reclassify"] = time.perf_counter() - t1
    print(f"STEP reclassify {times['reclassify']:.2f}", flush=True)
    t2 = time.perf_counter()
    processing.run("gdal:polygonize", {
        "INPUT": os.path.join(out_folder, "host_classes.tif"), "BAND": 1, "FIELD": "stratum",
        "OUTPUT": os.path.join(out_folder, "host_patches.gpkg")})
    times["polygonize"] = time.perf_counter() - t2
    print(f"STEP polygonize {times['polygonize']:.2f}", flush=True)
    t3 = time.perf_counter()
    processing.run("native:dissolve", {
        "INPUT": os.path.join(out_folder, "host_patches.gpkg"), "FIELD": ["stratum"],
        "OUTPUT": os.path.join(out_folder, "host_strata.gpkg")})
    times["dissolve"] = time.perf_counter() - t3
    print(f"STEP dissolve {times['dissolve']:.2f}", flush=True)
    times["seconds"] = time.perf_counter() - t
    times["peak"] = peak()
    return times


def child(args):
    kind, a = args.child, json.loads(args.args)
    out = {"bare": measure_bare, "ours": measure_ours, "host": measure_host}[kind](*a)
    print("RESULT " + json.dumps(out), flush=True)
    os._exit(0)  # PyQGIS may crash while tearing down a standalone application


def run_child(kind, *args, env=None):
    cmd = [sys.executable, str(HERE), "--child", kind, "--args", json.dumps(list(args))]
    proc = subprocess.run(cmd, capture_output=True, text=True, env=None if env is None else {**os.environ, **env})
    for line in proc.stdout.splitlines():
        if line.startswith("RESULT "):
            return json.loads(line[7:])
    sys.stderr.write(proc.stdout[-3000:] + proc.stderr[-3000:])
    return None


def run_capped(kind, cap, *args):
    """``run_child`` with a time limit: ``(result, finished steps, stopped)``; the child is stopped after
    ``cap`` seconds (the steps it printed before then are kept)."""
    import threading

    cmd = [sys.executable, str(HERE), "--child", kind, "--args", json.dumps(list(args))]
    # its own session, so that stopping it also stops the tools it started (gdal_polygonize.py)
    proc = subprocess.Popen(cmd, stdout=subprocess.PIPE, stderr=subprocess.DEVNULL, text=True,
                            start_new_session=True)
    steps, result = {}, []

    def read():
        for line in proc.stdout:
            if line.startswith("STEP "):
                _, name, seconds = line.split()
                steps[name] = float(seconds)
            elif line.startswith("RESULT "):
                result.append(json.loads(line[7:]))

    reader = threading.Thread(target=read, daemon=True)
    reader.start()
    try:
        proc.wait(timeout=cap)
        stopped = False
    except subprocess.TimeoutExpired:
        os.killpg(proc.pid, signal.SIGKILL)
        proc.wait()
        stopped = True
    reader.join(timeout=10)
    return (result[0] if result else None), steps, stopped


def fastest(runs):
    ok = [r for r in runs if r]
    return min(ok, key=lambda r: r["seconds"]) if ok else None


def textured_case(folder, size, repeats, host, host_cap=600.0):
    t = time.perf_counter()
    raster, frame_path = textured(folder, size), frame(folder, size)
    print(f"== textured covariate: {size:,} x {size:,} cells, smooth relief + noise SD {NOISE_SD:g} m "
          f"(inputs ready in {time.perf_counter() - t:.1f} s, {folder})")
    bounds = boundaries_of(raster, frame_path, folder)
    run_child("bare", raster, bounds)  # warms the page cache
    runs_ours, runs_bare = [], []
    for _ in range(repeats):
        runs_bare.append(run_child("bare", raster, bounds))
        runs_ours.append(run_child("ours", raster, frame_path, folder))
    bare, ours = fastest(runs_bare), fastest(runs_ours)
    if ours is None or "error" in ours:
        raise SystemExit(f"our run failed: {ours}")
    print("runs (s): bare " + ", ".join(f"{r['seconds']:.2f}" for r in runs_bare if r)
          + "; plotwise " + ", ".join(f"{r['seconds']:.2f}" for r in runs_ours if r))
    print(f"bare GDAL block read + numpy.digitize: {bare['seconds']:7.2f} s, peak {bare['peak'] / GIB:.2f} GiB")
    print(f"plotwise:stratify (quantile, 5 strata, default MIN_AREA, polygons, layer and report): "
          f"{ours['seconds']:7.2f} s, peak {ours['peak'] / GIB:.2f} GiB, {ours['strata']} strata in "
          f"{ours['parts']:,} polygons")
    ratio = ours["seconds"] / bare["seconds"]
    print(f"  ratio to the bare pass: {ratio:.2f} (target <= 3.00) {'OK' if ratio <= 3 else 'OVER'}")
    print(f"  peak memory: {ours['peak'] / GIB:.2f} GiB (target < 1 GiB) {'OK' if ours['peak'] < GIB else 'OVER'}")
    if host:
        host_case(raster, frame_path, folder, bounds, ours["seconds"], host_cap)


def host_case(raster, frame_path, folder, bounds, ours_seconds, cap):
    """The host's chain, stopped after ``cap`` seconds: by then the ratio's bound is known."""
    ref, steps, stopped = run_capped("host", cap, raster, frame_path, folder, bounds)
    done = " + ".join(f"{name} {seconds:.2f} s" for name, seconds in steps.items())
    if stopped:
        print(f"host chain: {done or 'no step finished'}; stopped after {cap:.0f} s, still running "
              f"(--host-cap sets the limit)")
        r = ours_seconds / cap
        print(f"  ratio plotwise / host chain: < {r:.3f} (target <= 0.50) {'OK' if r <= 0.5 else 'OVER'}")
        return
    if ref is None:
        print("host chain: not available")
        return
    print(f"host chain: {done} = {ref['seconds']:.2f} s, peak {ref['peak'] / GIB:.2f} GiB")
    r = ours_seconds / ref["seconds"]
    print(f"  ratio plotwise / host chain: {r:.2f} (target <= 0.50) {'OK' if r <= 0.5 else 'OVER'}")


def speckled_case(folder, sizes):
    for size in sizes:
        raster, frame_path = speckled(folder, size), frame(folder, size, whole=True)
        r = run_child("ours", raster, frame_path, folder)
        if r is None:
            print(f"== speckled {size:,} x {size:,}: the run died (memory?)")
            continue
        what = (f"error: {r['error']}" if "error" in r else f"{r['strata']} strata in {r['parts']:,} polygons")
        limit = 60 if size <= 2000 else None
        ok = r["peak"] < GIB and (limit is None or r["seconds"] < limit)
        print(f"== speckled {size:,} x {size:,} (white noise, quantile, 5 strata, default MIN_AREA): "
              f"{r['seconds']:.1f} s, peak {r['peak'] / GIB:.2f} GiB {'OK' if ok else 'OVER'}\n  {what}")


def main():
    ap = argparse.ArgumentParser()
    ap.add_argument("--case", default="all", choices=["textured", "speckled", "all"])
    ap.add_argument("--size", type=int, default=10_000)
    ap.add_argument("--repeats", type=int, default=2)
    ap.add_argument("--folder", default="/tmp/plotwise_bench_stratify")
    ap.add_argument("--no-host", action="store_true")
    ap.add_argument("--host-cap", type=float, default=600.0,
                    help="seconds after which the host chain is stopped (the ratio is then an upper bound)")
    ap.add_argument("--child")
    ap.add_argument("--args", default="[]")
    args = ap.parse_args()
    if args.child:
        child(args)
        return
    os.makedirs(args.folder, exist_ok=True)
    if args.case in ("speckled", "all"):
        speckled_case(args.folder, [2000, args.size])
    if args.case in ("textured", "all"):
        textured_case(args.folder, args.size, args.repeats, not args.no_host, args.host_cap)


if __name__ == "__main__":
    main()
