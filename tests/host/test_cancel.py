"""Cancelling long runs (issue 7): a large layout and a large stratification stop within a second,
and leave no output behind that could pass for a finished result."""
import time

import numpy as np
import pytest
from osgeo import gdal, osr

from recording_feedback import RecordingFeedback

CRS = "EPSG:32736"


class CancelAt(RecordingFeedback):
    """Cancels once the reported progress reaches ``at`` percent; remembers when."""

    def __init__(self, at):
        super().__init__()
        self.at = at
        self.cancelled_at = None

    def setProgress(self, progress):  # noqa: N802 (host naming)
        super().setProgress(progress)
        if self.cancelled_at is None and progress >= self.at:
            self.cancelled_at = time.perf_counter()
            self.cancel()


def _square_layer(side):
    from qgis.core import QgsFeature, QgsGeometry, QgsVectorLayer

    layer = QgsVectorLayer(f"Polygon?crs={CRS}", "frame", "memory")
    feature = QgsFeature()
    feature.setGeometry(QgsGeometry.fromWkt(f"POLYGON((0 0, {side} 0, {side} {side}, 0 {side}, 0 0))"))
    layer.dataProvider().addFeatures([feature])
    return layer


def _run_and_time(run_alg, algorithm_id, parameters, feedback):
    from qgis.core import QgsProcessingException

    with pytest.raises(QgsProcessingException, match="[Cc]ancel"):
        run_alg(algorithm_id, parameters, feedback=feedback)
    stopped = time.perf_counter()
    assert feedback.cancelled_at is not None, "the run never reported the progress the test cancels at"
    return stopped - feedback.cancelled_at


@pytest.mark.parametrize("at", [35.0, 80.0])  # while drawing, and while writing the units
def test_large_layout_stops_within_a_second(run_alg, tmp_path, at):
    # 300,000 points with a minimum spacing: several seconds of work when left alone
    out = tmp_path / "units.gpkg"
    feedback = CancelAt(at=at)
    seconds = _run_and_time(run_alg, "plotwise:layout", {
        "FRAME": _square_layer(60_000), "N_UNITS": 300_000, "DESIGN": 0, "SHAPE": 0, "SIZE": 0.0,
        "MIN_SPACING": 20.0, "RESERVE": 0, "SEED": 1, "OUTPUT": str(out), "OUTPUT_GPX": str(tmp_path / "u.gpx"),
        "REPORT": str(tmp_path / "layout.html"),
    }, feedback)
    print(f"layout stopped {seconds:.3f} s after the cancel")
    assert seconds < 1.0
    assert not out.exists() and not (tmp_path / "layout.html").exists() and not (tmp_path / "u.gpx").exists()


def test_large_stratification_stops_within_a_second(run_alg, tmp_path):
    # a 6,000 x 6,000 covariate (36 million cells) cut into quantile strata
    path = str(tmp_path / "covariate.tif")
    size, cell = 6000, 10.0
    ds = gdal.GetDriverByName("GTiff").Create(path, size, size, 1, gdal.GDT_Float32, ["TILED=YES"])
    ds.SetGeoTransform((0.0, cell, 0.0, size * cell, 0.0, -cell))
    srs = osr.SpatialReference()
    srs.ImportFromEPSG(32736)
    ds.SetProjection(srs.ExportToWkt())
    rows = np.arange(size, dtype=np.float32)[:, None]
    for r0 in range(0, size, 500):
        block = rows[r0:r0 + 500] + np.arange(size, dtype=np.float32)[None, :] * 0.5
        ds.GetRasterBand(1).WriteArray(block, 0, r0)
    ds = None
    raster, polygons = tmp_path / "strata.tif", tmp_path / "strata.gpkg"
    feedback = CancelAt(at=20.0)
    seconds = _run_and_time(run_alg, "plotwise:stratify", {
        "FRAME": _square_layer(size * cell), "COVARIATES": [path], "METHOD": 0, "STRATA": 5, "MIN_AREA": 0.0,
        "OUTPUT_RASTER": str(raster), "OUTPUT": str(polygons), "REPORT": str(tmp_path / "strata.html"),
    }, feedback)
    print(f"stratification stopped {seconds:.3f} s after the cancel")
    assert seconds < 1.0
    assert not raster.exists() and not polygons.exists() and not (tmp_path / "strata.html").exists()
