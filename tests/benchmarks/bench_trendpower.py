"""Speed of plotwise:trendpower: 1,000 replicates x 100 units x 15 years x 3 changes (target: under 30 s).

Run on demand: ``.venv/bin/python tests/benchmarks/bench_trendpower.py``. The whole algorithm runs through
the host's Processing framework (every-year and split-panel designs), with its curves against years and
against units. The reference is the same fits done one by one with statsmodels' Poisson GLM with unit dummies
(test-only; timed on a few replicates of the planned programme and scaled to the number of fits the
algorithm makes), the straightforward way to simulate power.
"""
import sys
import time
from pathlib import Path

sys.path.insert(0, str(Path(__file__).resolve().parents[1]))
import conftest  # noqa: E402,F401  (registers the package as plotwise)
sys.path.insert(0, str(Path(__file__).resolve().parents[2] / "scripts"))
from headless_host import start_host  # noqa: E402
import numpy as np  # noqa: E402

REPLICATES, UNITS, YEARS, CHANGES, TARGET_S = 1000, 100, 15, "-2, -4, -6", 30.0


def run_algorithm(processing, design):
    t0 = time.perf_counter()
    processing.run("plotwise:trendpower", {
        "N_UNITS": UNITS, "YEARS": YEARS, "PANEL_DESIGN": design, "PANELS": 3, "CORE_SHARE": 0.3,
        "CHANGES": CHANGES, "MEAN_COUNT": 5.0, "SD_UNIT": 1.0, "SD_UNIT_YEAR": 0.3, "SD_YEAR": 0.1,
        "DETECTION": 1.0, "ALPHA": 0.05, "TWO_SIDED": True, "REPLICATES": REPLICATES, "SEED": 1,
        "OUTPUT_TABLE": "memory:"})
    return time.perf_counter() - t0


def fits_made(design):
    from plotwise.processing.engine import panels as pe
    from plotwise.processing.engine import trend_power as tp

    plan = tp.plan_from_spec(pe.panel_spec_iv(design, 3, 0.3, 2025, YEARS))
    configs = set((k, UNITS) for k in tp.year_grid(plan, UNITS)) | {(YEARS, m) for m in tp.unit_grid(plan, UNITS)}
    return len(configs) * REPLICATES * len(CHANGES.split(","))


def statsmodels_seconds_per_fit(samples=8):
    import statsmodels.api as sm

    rng = np.random.default_rng(2)
    unit = np.repeat(np.arange(UNITS), YEARS)
    year = np.tile(np.arange(YEARS), UNITS)
    X = np.column_stack([np.eye(UNITS)[unit], year - year.mean()])
    t0 = time.perf_counter()
    for _ in range(samples):
        mu = 5 * np.exp(rng.normal(0, 1, UNITS)[unit] - 0.04 * year + rng.normal(0, 0.3, len(unit)))
        y = rng.poisson(mu)
        sm.GLM(y, X, family=sm.families.Poisson()).fit(scale="X2")
    return (time.perf_counter() - t0) / samples


if __name__ == "__main__":
    app, processing = start_host()
    per_fit = statsmodels_seconds_per_fit()
    worst = 0.0
    for design, name in ((0, "every year"), (2, "split panels")):
        ours = run_algorithm(processing, design)
        reference = per_fit * fits_made(design)
        worst = max(worst, ours)
        print(f"{name:<14s} ours {ours:6.2f} s ({ours / TARGET_S:.2f} of the 30 s target); statsmodels one fit at a "
              f"time, {fits_made(design):,} fits: {reference:7.1f} s (scaled from {per_fit * 1000:.1f} ms a fit); "
              f"ours / reference = {ours / reference:.4f}")
    assert worst < TARGET_S, f"trendpower took {worst:.1f} s, target {TARGET_S} s"
