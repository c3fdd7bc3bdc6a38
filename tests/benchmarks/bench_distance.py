"""Speed of the distance density: 500 transects with 5,000 detections (target: under 5 s).

Run on demand: ``.venv/bin/python tests/benchmarks/bench_distance.py``. Timed: the engine with every
key function and up to 3 cosine terms each (model selection, goodness of fit, variance, estimate),
and the whole algorithm through the host (reading the layers, the engine, the outputs and the report).
The reference: one hazard-rate fit by a plain scipy maximisation (Nelder-Mead, the normalising
integral by scipy.integrate.quad), as a user would write it, against our one hazard-rate fit.
"""
import sys
import time
from pathlib import Path

sys.path.insert(0, str(Path(__file__).resolve().parents[1]))
import conftest  # noqa: E402,F401  (registers the package as plotwise)
sys.path.insert(0, str(Path(__file__).resolve().parents[2] / "scripts"))
from headless_host import start_host  # noqa: E402
import numpy as np  # noqa: E402
from scipy import integrate, optimize  # noqa: E402

from plotwise.processing.engine import detection_functions as df  # noqa: E402
from plotwise.processing.engine import distance_density as dd  # noqa: E402

N_TRANSECTS, N_DETECTIONS, N_STRATA, TARGET_S = 500, 5000, 5, 5.0
LENGTH, SIGMA, SHAPE = 2000.0, 40.0, 3.0


def survey(seed=1):
    """500 transects of 2 km in 5 strata; 5,000 detections from a hazard-rate (σ = 40 m, b = 3), out to 200 m."""
    rng = np.random.default_rng(seed)
    x = rng.uniform(0.0, 200.0, 40 * N_DETECTIONS)
    x = x[rng.random(x.size) < -np.expm1(-(x / SIGMA) ** -SHAPE)][:N_DETECTIONS]
    units = rng.integers(0, N_TRANSECTS, x.size)
    strata = np.arange(N_TRANSECTS) % N_STRATA + 1
    sizes = rng.integers(1, 6, x.size).astype(float)
    return units, x, sizes, strata


def engine_time():
    units, x, sizes, strata = survey()
    t0 = time.perf_counter()
    result = dd.estimate_distance_density(np.arange(N_TRANSECTS), strata, np.full(N_TRANSECTS, LENGTH),
                                          {str(h): 100.0 for h in range(1, N_STRATA + 1)}, units, x, sizes)
    seconds = time.perf_counter() - t0
    fits = result.analyses[0].selection.fits
    print(f"engine, {len(fits)} models ({', '.join(f.label for f in fits)}), chosen "
          f"{result.analyses[0].fit.label}: {seconds:.3f} s ({seconds / TARGET_S:.2f} of the {TARGET_S:g} s target)")
    return seconds


def reference_ratio():
    units, x, _, _ = survey()
    w = float(np.quantile(x, 0.95))
    x = x[x <= w]
    t0 = time.perf_counter()
    df.fit_detection_function(df.distance_data_iv(x, w), df.DetectionModel(df.HAZARD_RATE))
    ours = time.perf_counter() - t0

    def negative(params):
        sigma, b = params
        if sigma <= 0 or b <= 0:
            return np.inf
        total = integrate.quad(lambda d: 1 - np.exp(-(d / sigma) ** -b), 1e-12, w, points=[sigma])[0]
        return -(np.sum(np.log(1 - np.exp(-(x / sigma) ** -b))) - x.size * np.log(total))

    t0 = time.perf_counter()
    optimize.minimize(negative, [np.median(x), 2.0], method="Nelder-Mead")
    reference = time.perf_counter() - t0
    print(f"one hazard-rate fit with variance and goodness of fit: ours {ours:.3f} s, plain scipy (fit only) "
          f"{reference:.3f} s, ratio {ours / reference:.2f}")


def host_time():
    from qgis.core import QgsFeature, QgsGeometry, QgsPointXY, QgsVectorLayer

    from plotwise.processing import compat

    app, processing = start_host()  # scripts/headless_host.py
    units, x, sizes, strata = survey()
    lines = QgsVectorLayer("LineString?crs=EPSG:32633", "transects", "memory")
    lines.dataProvider().addAttributes([compat.make_field("unit_id", "int"), compat.make_field("stratum", "int")])
    lines.updateFields()
    features = []
    for k in range(N_TRANSECTS):
        f = QgsFeature(lines.fields())
        x0, y0 = 500.0 + 3000.0 * (k % 25), 500.0 + 2500.0 * (k // 25)
        f.setGeometry(QgsGeometry.fromPolylineXY([QgsPointXY(x0, y0), QgsPointXY(x0, y0 + LENGTH)]))
        f.setAttributes([k, int(strata[k])])
        features.append(f)
    lines.dataProvider().addFeatures(features)
    observations = QgsVectorLayer("None", "observations", "memory")
    observations.dataProvider().addAttributes([compat.make_field("unit_id", "int"),
                                              compat.make_field("distance", "double"),
                                              compat.make_field("size", "double")])
    observations.updateFields()
    rows = []
    for u, d, s in zip(units.tolist(), x.tolist(), sizes.tolist()):
        f = QgsFeature(observations.fields())
        f.setAttributes([u, d, s])
        rows.append(f)
    observations.dataProvider().addFeatures(rows)
    strata_layer = QgsVectorLayer("Polygon?crs=EPSG:32633", "strata", "memory")
    strata_layer.dataProvider().addAttributes([compat.make_field("stratum", "int")])
    strata_layer.updateFields()
    polygons = []
    for h in range(1, N_STRATA + 1):
        f = QgsFeature(strata_layer.fields())
        f.setGeometry(QgsGeometry.fromWkt(f"POLYGON(({(h - 1) * 20000} 0, {h * 20000} 0, {h * 20000} 50000, "
                                          f"{(h - 1) * 20000} 50000, {(h - 1) * 20000} 0))"))
        f.setAttributes([h])
        polygons.append(f)
    strata_layer.dataProvider().addFeatures(polygons)
    t0 = time.perf_counter()
    processing.run("plotwise:distancedensity", {
        "UNITS": lines, "OBSERVATIONS": observations, "STRATA": strata_layer, "OUTPUT": "memory:",
        "OUTPUT_MODELS": "memory:", "REPORT": str(Path("/tmp") / "bench_distance.html")})
    seconds = time.perf_counter() - t0
    print(f"whole algorithm through the host (layers, engine, outputs, report): {seconds:.3f} s "
          f"({seconds / TARGET_S:.2f} of the target)")
    return seconds


if __name__ == "__main__":
    t = engine_time()
    reference_ratio()
    whole = host_time()
    assert whole < TARGET_S, f"distance density took {whole:.2f} s, target {TARGET_S} s"
