"""Speed and memory of the stratification on a 10,000 x 10,000 float32 covariate (10^8 cells).

Run on demand: ``.venv/bin/python tests/benchmarks/bench_stratify.py [--size N] [--repeats R] [--no-host] [--keep]``.

* The covariate (a smooth invented elevation surface, UTM 33N, 10 m cells) and a
  frame polygon covering most of it are written to a folder in /tmp, deleted at the end.
* Each measurement runs in its own process, so that its peak memory (ru_maxrss) is its own.
* Targets: quantile into 5 strata clipped to the frame, peak memory under 1 GiB, wall time
  within 2x of a bare GDAL block read plus ``numpy.digitize`` over the same raster (the
  stratification proper: boundaries, assignment, stratum raster written). Polygonising is
  timed apart, and the whole job is compared with the host's own chain
  (``gdal:cliprasterbymasklayer`` + ``native:reclassifybytable`` + ``gdal:polygonize``,
  given our boundaries) as a printed ratio.
* Peak memory includes GDAL's block cache (GDAL_CACHEMAX, by default 5 % of the RAM), which
  the bare pass fills as much as ours.
* On a shared machine each side's fastest of alternated runs is kept (``--repeats``).
  The engine works on blocks in one thread beside the reader on two cores, two above
  (``PLOTWISE_WORKERS=0`` runs everything in the calling thread, as the bare pass does).
"""
import argparse
import json
import os
import resource
import shutil
import subprocess
import sys
import tempfile
import time
from pathlib import Path

HERE = Path(__file__).resolve()
sys.path.insert(0, str(HERE.parents[1]))
import conftest  # noqa: E402,F401  (registers the package as plotwise)
sys.path.insert(0, str(Path(__file__).resolve().parents[2] / "scripts"))
from headless_host import start_host  # noqa: E402

import numpy as np  # noqa: E402
from osgeo import gdal, ogr, osr  # noqa: E402

gdal.UseExceptions()
GIB = 1024**3
CELL = 10.0
X0, Y0 = 400000.0, 5200000.0


def make_inputs(folder, size):
    path = os.path.join(folder, "elevation.tif")
    srs = osr.SpatialReference()
    srs.ImportFromEPSG(32633)
    ds = gdal.GetDriverByName("GTiff").Create(path, size, size, 1, gdal.GDT_Float32,
                                              ["TILED=YES", "BLOCKXSIZE=512", "BLOCKYSIZE=512"])
    ds.SetGeoTransform((X0, CELL, 0, Y0, 0, -CELL))
    ds.SetProjection(srs.ExportToWkt())
    band = ds.GetRasterBand(1)
    band.SetNoDataValue(-9999)
    x = np.arange(size) * CELL
    rows = 512
    for y0 in range(0, size, rows):
        y = (np.arange(y0, min(size, y0 + rows)) * CELL)[:, None]
        z = (600 + 0.004 * x[None, :] + 250 * np.sin(x[None, :] / 9000.0) * np.cos(y / 12000.0)
             + 60 * np.sin((x[None, :] + 2 * y) / 2500.0))
        band.WriteArray(z.astype(np.float32), 0, y0)
    band.FlushCache()
    ds = None
    span = size * CELL
    frame = ogr.CreateGeometryFromWkt(
        "POLYGON((%f %f, %f %f, %f %f, %f %f, %f %f))" % (
            X0 + 0.03 * span, Y0 - 0.05 * span, X0 + 0.97 * span, Y0 - 0.02 * span,
            X0 + 0.95 * span, Y0 - 0.96 * span, X0 + 0.10 * span, Y0 - 0.90 * span,
            X0 + 0.03 * span, Y0 - 0.05 * span))
    frame_path = os.path.join(folder, "frame.gpkg")
    drv = ogr.GetDriverByName("GPKG")
    out = drv.CreateDataSource(frame_path)
    layer = out.CreateLayer("frame", srs, ogr.wkbPolygon)
    feat = ogr.Feature(layer.GetLayerDefn())
    feat.SetGeometry(frame)
    layer.CreateFeature(feat)
    out = None
    with open(os.path.join(folder, "frame.wkb"), "wb") as f:
        f.write(bytes(frame.ExportToWkb()))
    return path, frame_path


def peak():
    return resource.getrusage(resource.RUSAGE_SELF).ru_maxrss * 1024


# -- measurements, each in a child process ----------------------------------------------
def measure_bare(folder, bounds):
    """GDAL reads the raster block by block (its own 512 x 512 tiles) and numpy.digitize classifies each block."""
    ds = gdal.Open(os.path.join(folder, "elevation.tif"))
    band = ds.GetRasterBand(1)
    bx, by = band.GetBlockSize()
    t = time.perf_counter()
    total = 0
    for y0 in range(0, band.YSize, by):
        for x0 in range(0, band.XSize, bx):
            a = band.ReadAsArray(x0, y0, min(bx, band.XSize - x0), min(by, band.YSize - y0))
            total += int(np.digitize(a, bounds)[0, 0])
    return {"seconds": time.perf_counter() - t, "peak": peak()}


def measure_ours(folder):
    from plotwise.processing.gdal_io import stratify_pipeline
    from plotwise.processing.gdal_io.covariate_stack import Covariate
    from plotwise.processing.engine import stratification as s

    wkt = gdal.Open(os.path.join(folder, "elevation.tif")).GetProjection()
    frame = open(os.path.join(folder, "frame.wkb"), "rb").read()
    times = {}
    real_polygonise = stratify_pipeline.polygonise_strata

    def timed_polygonise(*args, **kwargs):
        t0 = time.perf_counter()
        try:
            return real_polygonise(*args, **kwargs)
        finally:
            times["polygonise"] = time.perf_counter() - t0

    stratify_pipeline.polygonise_strata = timed_polygonise
    t = time.perf_counter()
    r = stratify_pipeline.stratify_rasters([Covariate(os.path.join(folder, "elevation.tif"), "elevation")], [frame], wkt,
                             s.QUANTILE, 5, os.path.join(folder, "strata.tif"))
    total = time.perf_counter() - t
    return {"seconds": total - times["polygonise"], "polygonise": times["polygonise"], "total": total,
            "peak": peak(), "boundaries": [float(b) for b in r.result.boundaries],
            "areas_ha": [float(a) for a in r.area_ha]}


def measure_host(folder, bounds):
    os.environ.setdefault("QT_QPA_PLATFORM", "offscreen")
    app, processing = start_host()  # scripts/headless_host.py
    edges = [-1e30] + list(bounds) + [1e30]
    table = []
    for h in range(len(edges) - 1):
        table += [edges[h], edges[h + 1], h + 1]
    times = {}
    t = time.perf_counter()
    processing.run("gdal:cliprasterbymasklayer", {
        "INPUT": os.path.join(folder, "elevation.tif"), "MASK": os.path.join(folder, "frame.gpkg"),
        "NODATA": -9999, "CROP_TO_CUTLINE": True, "OUTPUT": os.path.join(folder, "host_clip.tif")})
    times["clip"] = time.perf_counter() - t
    t1 = time.perf_counter()
    processing.run("native:reclassifybytable", {
        "INPUT_RASTER": os.path.join(folder, "host_clip.tif"), "RASTER_BAND": 1, "TABLE": table,
        "RANGE_BOUNDARIES": 1,  # min <= value < max, as ours
        "NO_DATA": 0, "DATA_TYPE": 0, "OUTPUT": os.path.join(folder, "host_classes.tif")})
    times["reclassify"] = time.perf_counter() - t1
    t2 = time.perf_counter()
    processing.run("gdal:polygonize", {
        "INPUT": os.path.join(folder, "host_classes.tif"), "BAND": 1, "FIELD": "stratum",
        "OUTPUT": os.path.join(folder, "host_strata.gpkg")})
    times["polygonize"] = time.perf_counter() - t2
    times["total"] = time.perf_counter() - t
    times["peak"] = peak()
    return times


def child(kind, folder, bounds):
    if kind == "bare":
        out = measure_bare(folder, bounds)
    elif kind == "ours":
        out = measure_ours(folder)
    else:
        out = measure_host(folder, bounds)
    print("RESULT " + json.dumps(out))


def run_child(kind, folder, bounds=(), env=None):
    cmd = [sys.executable, str(HERE), "--child", kind, "--folder", folder, "--bounds", json.dumps(list(bounds))]
    proc = subprocess.run(cmd, capture_output=True, text=True, env=None if env is None else {**os.environ, **env})
    for line in proc.stdout.splitlines():
        if line.startswith("RESULT "):
            return json.loads(line[7:])
    sys.stderr.write(proc.stdout + proc.stderr)
    return None


def main():
    ap = argparse.ArgumentParser()
    ap.add_argument("--size", type=int, default=10_000)
    ap.add_argument("--keep", action="store_true")
    ap.add_argument("--no-host", action="store_true")
    ap.add_argument("--repeats", type=int, default=3)
    ap.add_argument("--child")
    ap.add_argument("--folder")
    ap.add_argument("--bounds", default="[]")
    args = ap.parse_args()
    if args.child:
        child(args.child, args.folder, json.loads(args.bounds))
        return
    folder = tempfile.mkdtemp(prefix="plotwise_bench_", dir="/tmp")
    try:
        t = time.perf_counter()
        make_inputs(folder, args.size)
        print(f"covariate {args.size:,} x {args.size:,} float32 written in {time.perf_counter() - t:.1f} s ({folder})")
        ours = run_child("ours", folder)  # first run warms the page cache
        if ours is None:
            raise SystemExit("our run failed")
        # the machine may be shared: alternate the two measurements and keep each one's fastest run
        runs_ours, runs_bare = [], []
        for _ in range(args.repeats):
            runs_bare.append(run_child("bare", folder, ours["boundaries"]))
            runs_ours.append(run_child("ours", folder))
        bare = min((r for r in runs_bare if r), key=lambda r: r["seconds"])
        ours = min((r for r in runs_ours if r), key=lambda r: r["seconds"])
        print("runs (s): bare " + ", ".join(f"{r['seconds']:.2f}" for r in runs_bare if r)
              + "; plotwise " + ", ".join(f"{r['seconds']:.2f}" for r in runs_ours if r))
        print(f"bare GDAL block read + numpy.digitize: {bare['seconds']:7.2f} s, peak {bare['peak'] / GIB:.2f} GiB")
        print(f"plotwise quantile, 5 strata, clipped: {ours['seconds']:7.2f} s  (+ polygonise {ours['polygonise']:.2f} s"
              f" = {ours['total']:.2f} s), peak {ours['peak'] / GIB:.2f} GiB")
        ratio = ours["seconds"] / bare["seconds"]
        print(f"  ratio to the bare pass: {ratio:.2f} (target <= 2.00) {'OK' if ratio <= 2 else 'OVER'}")
        serial = run_child("ours", folder, env={"PLOTWISE_WORKERS": "0"})
        if serial is not None:
            print(f"  all in the calling thread (PLOTWISE_WORKERS=0): {serial['seconds']:.2f} s, ratio "
                  f"{serial['seconds'] / bare['seconds']:.2f}")
        print(f"  peak memory: {ours['peak'] / GIB:.2f} GiB (target < 1 GiB) {'OK' if ours['peak'] < GIB else 'OVER'}")
        print("  boundaries:", ", ".join(f"{b:.2f}" for b in ours["boundaries"]))
        print("  areas (ha):", ", ".join(f"{a:,.0f}" for a in ours["areas_ha"]))
        if not args.no_host:
            host = run_child("host", folder, ours["boundaries"])
            if host is None:
                print("host chain: not available")
            else:
                print(f"host chain: clip {host['clip']:.2f} s + reclassifybytable {host['reclassify']:.2f} s + "
                      f"polygonize {host['polygonize']:.2f} s = {host['total']:.2f} s, peak {host['peak'] / GIB:.2f} GiB")
                print(f"  ratio plotwise whole job / host chain: {ours['total'] / host['total']:.2f}")
    finally:
        if args.keep:
            print("kept", folder)
        else:
            shutil.rmtree(folder, ignore_errors=True)


if __name__ == "__main__":
    main()
