"""Speed of the estimation engine: 100,000 units in 50 strata (target: under 2 s).

Run on demand: ``.venv/bin/python tests/benchmarks/bench_estimate.py``. The ratio
printed is against the host's own aggregate-statistics algorithm doing only the
per-stratum mean and standard deviation of the same counts in memory, when the
host is importable.
"""
import sys
import time
from pathlib import Path

sys.path.insert(0, str(Path(__file__).resolve().parents[1]))
import conftest  # noqa: E402,F401  (registers the package as plotwise)
sys.path.insert(0, str(Path(__file__).resolve().parents[2] / "scripts"))
from headless_host import start_host  # noqa: E402
import numpy as np  # noqa: E402

from plotwise.processing.engine.estimation import estimate_density  # noqa: E402
from plotwise.processing.engine.rng import make_rng  # noqa: E402

N_UNITS, N_STRATA, TARGET_S = 100_000, 50, 2.0


def data(seed=1):
    rng = np.random.default_rng(seed)
    strata = rng.integers(1, N_STRATA + 1, N_UNITS)
    counts = rng.poisson(rng.gamma(1.0, 3.0, N_UNITS)).astype(float)
    areas = np.full(N_UNITS, 0.01)
    coords = rng.random((N_UNITS, 2)) * 50_000
    frame = {h: 500.0 for h in range(1, N_STRATA + 1)}
    return counts, areas, strata, frame, coords


def timed(label, **kwargs):
    counts, areas, strata, frame, coords = data()
    t0 = time.perf_counter()
    estimate_density(counts, areas, strata, frame, coords=coords, **kwargs)
    seconds = time.perf_counter() - t0
    print(f"{label:<40s} {seconds:7.3f} s   ({seconds / TARGET_S:.2f} of the 2 s target)")
    return seconds


def host_baseline():
    try:
        from qgis.core import QgsFeature, QgsVectorLayer

        from plotwise.processing import compat
    except ImportError:
        return None
    app, processing = start_host()  # scripts/headless_host.py
    counts, _, strata, _, _ = data()
    layer = QgsVectorLayer("None", "units", "memory")
    layer.dataProvider().addAttributes([compat.make_field("stratum", "int"), compat.make_field("count", "double")])
    layer.updateFields()
    features = []
    for s, c in zip(strata.tolist(), counts.tolist()):
        f = QgsFeature(layer.fields())
        f.setAttributes([s, c])
        features.append(f)
    layer.dataProvider().addFeatures(features)
    t0 = time.perf_counter()
    processing.run("qgis:statisticsbycategories",
                   {"INPUT": layer, "VALUES_FIELD_NAME": "count", "CATEGORIES_FIELD_NAME": ["stratum"],
                    "OUTPUT": "memory:"})
    return time.perf_counter() - t0


if __name__ == "__main__":
    t = timed("t interval, SRS variance")
    timed("log-normal, FPC, target CV", ci_method="lognormal", fpc=True, target_cv=0.1)
    timed("t interval, local neighbourhood variance", variance_method="local")
    timed("bootstrap, 2000 resamples", ci_method="bootstrap", rng=make_rng(1).generator)
    base = host_baseline()
    if base is not None:
        print(f"host qgis:statisticsbycategories (means and SDs only): {base:.3f} s; "
              f"engine / host = {t / base:.2f}")
    assert t < TARGET_S, f"estimation took {t:.2f} s, target {TARGET_S} s"
