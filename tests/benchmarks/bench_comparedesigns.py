"""Speed of the design comparison: 5 designs × 1,000 replicates, n = 50, on a 10⁶-cell surface (target: under 60 s).

Run on demand: ``.venv/bin/python tests/benchmarks/bench_comparedesigns.py``.
The surface is 1,000 × 1,000 cells of 20 m (400 km²) with a smooth random
density; the frame an irregular 2,000-vertex polygon, cut into 4 strata; the
units 100 m square plots. When the host is importable, the same work done "the
host's way" (per replicate and design: a realised count raster written with
GDAL, ``native:randompointsinpolygons``, ``native:rectanglesovalsdiamonds`` and
``native:zonalstatisticsfb``) is timed on a few replicates and extrapolated, and
the ratio is printed.
"""
import math
import sys
import tempfile
import time
from pathlib import Path

sys.path.insert(0, str(Path(__file__).resolve().parents[1]))
import conftest  # noqa: E402,F401  (registers the package as plotwise)
sys.path.insert(0, str(Path(__file__).resolve().parents[2] / "scripts"))
from headless_host import start_host  # noqa: E402
import numpy as np  # noqa: E402
from shapely.geometry import Polygon, box  # noqa: E402

from plotwise.processing.engine import design_comparison as dc  # noqa: E402
from plotwise.processing.engine.rng import make_rng  # noqa: E402

CELLS, CELL, N_UNITS, REPLICATES, TARGET_S = 1000, 20.0, 50, 1000, 60.0
SIDE = CELLS * CELL


def scenario(seed=1):
    rng = np.random.default_rng(seed)
    x = (np.arange(CELLS) + 0.5) * CELL
    xx, yy = np.meshgrid(x, SIDE - x)
    density = 20.0 + 160.0 * np.exp(-((xx - 0.6 * SIDE) ** 2 + (yy - 0.4 * SIDE) ** 2) / (2 * (0.25 * SIDE) ** 2))
    for _ in range(12):  # smooth bumps
        cx, cy, r, h = rng.uniform(0, SIDE), rng.uniform(0, SIDE), rng.uniform(500, 3000), rng.uniform(20, 120)
        density += h * np.exp(-((xx - cx) ** 2 + (yy - cy) ** 2) / (2 * r * r))
    t = np.linspace(0, 2 * math.pi, 2000, endpoint=False)
    radius = 0.45 * SIDE * (1 + 0.08 * np.sin(7 * t) + 0.04 * np.sin(23 * t))
    frame = Polygon(np.c_[SIDE / 2 + radius * np.cos(t), SIDE / 2 + radius * np.sin(t)]).buffer(0)
    strata = [box(0, 0, SIDE / 2, SIDE / 2), box(SIDE / 2, 0, SIDE, SIDE / 2),
              box(0, SIDE / 2, SIDE / 2, SIDE), box(SIDE / 2, SIDE / 2, SIDE, SIDE)]
    return density, (0.0, CELL, 0.0, SIDE, 0.0, -CELL), frame, strata


def engine_run():
    density, gt, frame, strata = scenario()
    rng = make_rng(2026).generator
    t0 = time.perf_counter()
    grid = dc.population_grid(density, gt, frame, strata, [1, 2, 3, 4])
    region = dc.counting_region(1, 100.0)
    setup = dc.prepare_comparison(grid, frame, region, 1, 100.0, rng, strata, [1, 2, 3, 4])
    t1 = time.perf_counter()
    comparison = dc.compare_designs(setup, range(5), N_UNITS, REPLICATES, rng)
    t2 = time.perf_counter()
    print(f"surface {grid.mu.size:,} cells ({int((grid.code >= 0).sum()):,} in the frame), "
          f"{grid.expected_total:,.0f} animals expected")
    print(f"set-up (cells in frame and strata, S_h):        {t1 - t0:7.2f} s")
    print(f"5 designs × {REPLICATES} replicates, n = {N_UNITS}:        {t2 - t1:7.2f} s")
    total = t2 - t0
    print(f"total                                           {total:7.2f} s   "
          f"({total / TARGET_S:.2f} of the 60 s target)")
    for p in comparison.performance:
        print(f"  {p.name:<24s} rel. bias {p.rel_bias:+.3f}  RMSE {p.rmse:8.1f}  coverage {p.coverage:.3f}")
    return total, density, gt, frame


def host_way(density, gt, frame, replicates=3):
    """Seconds per replicate and design with host algorithms (None without the host)."""
    try:
        from qgis.core import QgsFeature, QgsGeometry, QgsVectorLayer
    except ImportError:
        return None
    from osgeo import gdal, osr

    app, processing = start_host()  # scripts/headless_host.py
    layer = QgsVectorLayer("Polygon?crs=EPSG:32633", "frame", "memory")
    feature = QgsFeature()
    feature.setGeometry(QgsGeometry.fromWkt(frame.wkt))
    layer.dataProvider().addFeatures([feature])
    mu = density * CELL * CELL / 1e6
    rng = np.random.default_rng(3)
    folder = Path(tempfile.mkdtemp())
    t0 = time.perf_counter()
    for r in range(replicates):
        path = str(folder / f"pop{r}.tif")
        ds = gdal.GetDriverByName("GTiff").Create(path, CELLS, CELLS, 1, gdal.GDT_Int16)
        ds.SetGeoTransform(gt)
        srs = osr.SpatialReference()
        srs.ImportFromEPSG(32633)
        ds.SetProjection(srs.ExportToWkt())
        ds.GetRasterBand(1).WriteArray(rng.poisson(mu))
        ds = None
        points = processing.run("native:randompointsinpolygons", {
            "INPUT": layer, "POINTS_NUMBER": N_UNITS, "MIN_DISTANCE": 0, "SEED": r + 1, "OUTPUT": "memory:"})["OUTPUT"]
        squares = processing.run("native:rectanglesovalsdiamonds", {
            "INPUT": points, "SHAPE": 0, "WIDTH": 100, "HEIGHT": 100, "ROTATION": 0, "SEGMENTS": 4,
            "OUTPUT": "memory:"})["OUTPUT"]
        processing.run("native:zonalstatisticsfb", {
            "INPUT": squares, "INPUT_RASTER": path, "RASTER_BAND": 1, "COLUMN_PREFIX": "c_", "STATISTICS": [1],
            "OUTPUT": "memory:"})
    seconds = (time.perf_counter() - t0) / replicates
    return seconds


def main():
    total, density, gt, frame = engine_run()
    per = host_way(density, gt, frame)
    if per is not None:
        extrapolated = per * 5 * REPLICATES
        print(f"host algorithms, one design and replicate:       {per:7.2f} s  → about {extrapolated / 3600:.1f} h for "
              f"5 × {REPLICATES}, a population raster per replicate and design; "
              f"ratio host / engine ≈ {extrapolated / total:,.0f})")


if __name__ == "__main__":
    main()
