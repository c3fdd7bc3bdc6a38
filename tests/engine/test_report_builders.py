"""The reports of estimate, allocate and comparedesigns built without the host, from the engines' results.

Checks that each report states what the issue requires it to say (one-sided Poisson limits, collapsed strata,
the finite-population assumption, the best-case label) and that user strings are escaped; the numbers come
from the engines, whose own tests check them against outside references.
"""
import numpy as np
from shapely.geometry import Point, box

from plotwise.processing.engine import allocation, design_comparison as dc, estimation
from plotwise.processing.engine.rng import make_rng
from plotwise.processing.report import Report
from plotwise.processing.report.allocate import AllocateReportInputs, allocate_report
from plotwise.processing.report.comparedesigns import comparedesigns_report
from plotwise.processing.report.estimate import EstimateReportInputs, estimate_report


def _inputs(**extra):
    values = dict(units="units <b>", strata="strata", count_field="count", stratum_field="stratum", area_field=None,
                  unit_area_m2=0.0, strip_width=0.0, area_unit="km²", crs="EPSG:32633", seed=None, true_total=None,
                  frame_geometries={"1": box(0, 0, 10, 10), "2": box(10, 0, 20, 10)},
                  surveyed_points=(Point(1, 1),), ramp=("#ffffff", "#000000"))
    values.update(extra)
    return EstimateReportInputs(**values)


def test_estimate_report_states_zero_limits_collapsed_strata_and_the_fpc_assumption():
    result = estimation.estimate_density([0.0, 0.0, 0.0], np.ones(3), [1, 1, 2], {1: 50.0, 2: 30.0}, fpc=True,
                                         ci_method="lognormal")
    html = estimate_report(Report("x"), result, _inputs(), list(result.warnings)).render()
    assert "one-sided upper limit" in html and "Garwood 1936" in html
    assert "were paired with a partner fixed before the counts were seen" in html
    assert "assumes that the units do not overlap" in html
    assert "t_df" in html and "units &lt;b&gt;" in html and "units <b>" not in html  # escaped
    assert "Check every unit" in html  # the field-safety caution


def test_allocate_report_says_whether_the_correction_applies():
    result = allocation.allocate([10.0, 20.0], 1.0, "neyman", total=8, sds=[1.0, 2.0], means=[1.0, 2.0],
                                 layout_design="random")
    inputs = AllocateReportInputs("strata", "EPSG:32633", 10000.0, "sd", False, "mean", None, False,
                                  dict(total=8, budget=0, target_cv=0, fixed_cost=0, min_per_stratum=2), "random")
    html = allocate_report(Report("x"), result, [1, 2], inputs, []).render()
    assert "without a finite-population correction" in html and "Cordy" in html


def test_comparedesigns_report_labels_the_oracle_neyman_as_the_best_case():
    x = (np.arange(20) + 0.5) * 100.0
    values = np.tile(20 + x / 50, (20, 1))
    strata = [box(0, 0, 1000, 2000), box(1000, 0, 2000, 2000)]
    frame = box(0, 0, 2000, 2000)
    grid = dc.population_grid(values, (0.0, 100.0, 0.0, 2000.0, 0.0, -100.0), frame, strata, [1, 2])
    rng = make_rng(1).generator
    region = dc.counting_region(1, 100.0)
    setup = dc.prepare_comparison(grid, frame, region, 1, 100.0, rng, strata, [1, 2], pilot_units=3)
    comparison = dc.compare_designs(setup, [dc.STRATIFIED_NEYMAN, dc.STRATIFIED_NEYMAN_PILOT], 10, 10, rng)
    settings = dict(surface="s", frame="f", strata="st", stratum_field="stratum", crs="EPSG:32633", shape=1,
                    size=100.0, half_width=0.0, bearing=-1.0, inside=False, n_units=10, replicates=10, k=0.0,
                    variance_method="srs", seed=1, n_range=(), pilot_units=3)
    html = comparedesigns_report(Report("x"), comparison, [], setup, settings, []).render()
    assert "best case" in html and "pilot of 3 simple random units per stratum" in html
    assert "plus sampling" in html
