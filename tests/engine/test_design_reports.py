"""The reports of demoreserve, buildframe, stratify and layout built without the host, from the results.

Each report must hold its sections, escape the user's strings (layer, field and covariate names, stratum
keys), carry the field-safety caution, and show numbers that can be known without the code: areas of
rectangles and grid cells (truth by construction), numpy's quantiles, the handbook inclusion probability.
The numbers' computation itself is checked against outside references by the engines' own tests.
"""
import html
import re

import numpy as np
from osgeo import gdal, gdal_array
from pyproj import CRS
from shapely import wkb
from shapely.geometry import box

from plotwise.processing.engine import frame as frame_engine
from plotwise.processing.engine import layout as layout_engine
from plotwise.processing.engine import stratification as strat
from plotwise.processing.engine.demo_reserve import build_demo_reserve
from plotwise.processing.engine.rng import make_rng
from plotwise.processing.gdal_io.covariate_stack import Covariate
from plotwise.processing.gdal_io.masking import mask_polygons
from plotwise.processing.gdal_io.stratify_pipeline import stratify_rasters
from plotwise.processing.report import Report
from plotwise.processing.report.buildframe import BuildFrameReportInputs, buildframe_report
from plotwise.processing.report.demoreserve import demoreserve_report
from plotwise.processing.report.layout import LayoutReportInputs, layout_report
from plotwise.processing.report.stratify import StratifyReportInputs, stratify_report

UTM33 = CRS.from_epsg(32633).to_wkt()
CAUTION = "Check every unit&#x27;s access and safety before sending a team"  # report/html.py, escaped
USER = "layer <b>&"  # a name that must be escaped


def _rows(page):
    """The cells of every table row of ``page``, as unescaped text."""
    rows = []
    for row in re.findall(r"<tr>(.*?)</tr>", page, re.S):
        rows.append([html.unescape(c) for c in re.findall(r"<t[dh][^>]*>(.*?)</t[dh]>", row, re.S)])
    return rows


def _row(page, first):
    return next(r for r in _rows(page) if r and r[0] == first)


def _table(page, first_heading):
    """The body rows of the table whose first column heading is ``first_heading``."""
    for table in re.findall(r"<table>(.*?)</table>", page, re.S):
        rows = _rows(table)
        if rows and rows[0][0] == first_heading:
            return rows[1:]
    raise AssertionError(f"no table headed {first_heading!r}")


def _write_tif(path, values, geotransform):
    """``values`` as a one-band GeoTIFF in UTM zone 33N."""
    grid = gdal_array.OpenArray(np.ascontiguousarray(values))
    grid.SetGeoTransform(geotransform)
    grid.SetProjection(UTM33)
    gdal.Translate(str(path), grid, format="GTiff")
    return str(path)


def _escaped_and_cautioned(page):
    assert html.escape(USER) in page and USER not in page  # escaped
    assert CAUTION in page  # the field-safety caution


def test_demoreserve_report_states_the_invented_scenario_and_its_truth():
    seeded = make_rng(5)
    reserve = build_demo_reserve(seeded.generator, seeded.seed, 500.0)
    page = demoreserve_report(Report("x"), reserve, 500.0, "EPSG:32736 (WGS 84 / UTM zone 36S)").render()
    assert "Demo reserve: Hollin Ridge Reserve" in page
    assert "Invented data for demonstrations" in page and "do not exist" in page
    for heading in ("Areas", "Map", "How the population was simulated", "Inputs and parameters"):
        assert f"<h2>{heading}</h2>" in page
    # the true number is the count of simulated animals (truth by construction)
    assert f"{len(reserve.animals_xy):,}" in page
    assert _row(page, "Seed")[1] == "5"
    assert CAUTION in page and "<svg" in page and "Thomas, M. (1949)" in page


def test_buildframe_report_charges_each_rule_with_its_area(tmp_path):
    # a 1 km square (100 ha); the excluded strip x < 200 m (20 ha); a 100 m mask raster over it whose
    # column x >= 800 m is above MASK_MAX (20 ha): 60 ha are kept (areas of rectangles, by construction)
    study = box(500000, 5000000, 501000, 5001000)
    exclusion = box(500000, 5000000, 500200, 5001000)
    values = np.zeros((10, 10), dtype=np.float32)
    values[:, 8:] = 50.0
    path = _write_tif(tmp_path / "slope.tif", values, (500000.0, 100.0, 0.0, 5001000.0, 0.0, -100.0))
    raster = mask_polygons(path, study.bounds, UTM33, None, 30.0)
    result = frame_engine.build_frame([study], [exclusion], raster.polygons, 0.0)
    inputs = BuildFrameReportInputs(study=USER, crs="EPSG:32633 (WGS 84 / UTM zone 33N)", study_union=study,
                                    exclude="excluded", mask="slope", mask_max=30.0, exclusions=(exclusion,),
                                    mask_polygons=tuple(raster.polygons), projected_from="EPSG:4326")
    page = buildframe_report(Report("x"), result, raster, inputs, ["a warning"]).render()
    _escaped_and_cautioned(page)
    assert "<h2>Area kept and area lost to each rule</h2>" in page and "<h3>Mask raster</h3>" in page
    assert _row(page, "study area")[1:] == ["100", "100"]
    assert _row(page, "lost to the excluded polygons (EXCLUDE)")[1:] == ["20", "20"]
    assert _row(page, "lost to the raster mask (MASK outside the accepted range, or NoData)")[1:] == ["20", "20"]
    assert _row(page, "sampling frame (kept)")[1:] == ["60", "60"]
    assert _row(page, "cells above the highest accepted value")[1] == "20"  # 2 columns of 10 cells
    assert "apply to the frame (60 ha) only" in page
    assert "projected from EPSG:4326 (UTM zone of the study area&#x27;s centre)" in page
    assert "a warning" in page and "(none)" not in _row(page, "Mask raster (MASK)")[1]


def test_stratify_report_shows_numpy_quantiles_and_the_cell_areas(tmp_path):
    # 30 m cells; the frame covers exactly 40 x 50 cells: 2,000 cells of 0.09 ha = 180 ha (by construction)
    geotransform = (500000.0, 30.0, 0.0, 5000000.0, 0.0, -30.0)
    rows, cols = np.mgrid[0:60, 0:80]
    elevation = (900.0 + 3.0 * cols + 0.5 * rows + 7.0 * np.sin(rows * cols / 50.0)).astype(np.float32)
    path = _write_tif(tmp_path / "elevation.tif", elevation, geotransform)
    frame = box(500000 + 10 * 30, 5000000 - 60 * 30, 500000 + 50 * 30, 5000000 - 10 * 30)
    result = stratify_rasters([Covariate(path, "elevation <i>")], [frame.wkb], UTM33, strat.QUANTILE, 4,
                              str(tmp_path / "strata.tif"))
    shapes = [wkb.loads(bytes(blob)) for blob in result.polygons]
    inputs = StratifyReportInputs(frame=USER, covariates=("elevation <i>",), method=strat.QUANTILE, n_strata=4,
                                  min_area_ha=0.0, crs="EPSG:32633 (WGS 84 / UTM zone 33N)",
                                  labels=tuple(str(label) for label in result.labels), frame_polygons=(frame,))
    page = stratify_report(Report("x"), result, shapes, inputs, []).render()
    _escaped_and_cautioned(page)
    assert "elevation &lt;i&gt;" in page and "elevation <i>" not in page
    for heading in ("Strata", "Method: quantile", "Coverage", "Map", "Inputs and parameters"):
        assert f"<h2>{heading}</h2>" in page
    assert _row(page, "area stratified (ha)")[1] == "180"
    assert _row(page, "cells stratified")[1] == "2,000"
    # the boundaries are numpy's quantiles (Hyndman & Fan definition 7) of the frame's cells
    cells = elevation[10:60, 10:50].astype(float)
    expected = np.quantile(cells, [0.25, 0.5, 0.75])
    shown = [float(value.replace(",", "")) for _, value in _table(page, "Boundary")]
    np.testing.assert_allclose(shown, expected, atol=0.05)
    areas = [float(row[2]) for row in _table(page, "Stratum")]
    assert abs(sum(areas) - 180.0) <= 0.2 and all(abs(a - 45.0) <= 0.5 for a in areas)  # quarters of 180 ha


def test_layout_report_gives_the_inclusion_probability_of_the_shrunk_strata():
    # two 1 km squares; 20 m square plots kept inside: centres drawn from each square shrunk by the plot's
    # circumscribing radius R = 20/√2 m, so A_eff = (1000 − 2R)² and incl_p = n·a/A_eff (Cochran 1977, ch. 5)
    squares = [box(0, 0, 1000, 1000), box(1000, 0, 2000, 1000)]
    spec = layout_engine.LayoutSpec(design=layout_engine.SIMPLE_RANDOM, shape=layout_engine.SQUARE, size=20.0,
                                    inside=True, reserve=2)
    frame = layout_engine.prepare_strata(squares, strata=["A<b>", "B"], n_values=[6, 8], spec=spec)
    result = layout_engine.draw_layout(frame, spec, make_rng(3).generator, crs="EPSG:32633")
    inputs = LayoutReportInputs(frame=USER, seed=3, crs="EPSG:32633 (WGS 84 / UTM zone 33N)",
                                stratum_field="zone", n_field="n_alloc")
    page = layout_report(Report("x"), result, frame, inputs, []).render()
    _escaped_and_cautioned(page)
    assert "A&lt;b&gt;" in page and "A<b>" not in page
    for heading in ("Replacing units in the field", "Units per stratum", "Map", "Method"):
        assert f"<h2>{heading}</h2>" in page
    effective = (1000 - 2 * 20 / np.sqrt(2)) ** 2
    for key, n in (("A<b>", 6), ("B", 8)):
        row = _row(page, key)
        assert float(row[2]) == round(effective / 1e4, 1)  # effective area (ha), 3 significant digits
        assert row[3:6] == [str(n), str(n), "2"]  # asked, primary, reserve
        assert float(row[6]) == float(f"{n * 400 / effective:.3g}")  # incl_p = n·a/A_eff
    assert "kept wholly inside their stratum" in page
    assert _row(page, "Total units (N_UNITS)")[1] == "(not used)"
