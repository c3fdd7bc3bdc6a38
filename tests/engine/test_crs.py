"""UTM zone choice against pyproj's own CRS database (the reference)."""
import pytest
from pyproj.aoi import AreaOfInterest
from pyproj.database import query_utm_crs_info

from plotwise.processing.engine.crs import utm_epsg_for_lonlat


@pytest.mark.parametrize("lon, lat",
                         [(33.4, -23.1), (-71.2, -44.9), (8.05, 46.5), (151.0, -33.8), (-179.5, 0.5), (36.6, 1.0)])
def test_utm_zone_matches_pyproj_database(lon, lat):
    # pyproj.database.query_utm_crs_info lists the WGS 84 UTM zones whose area of use holds the point
    infos = query_utm_crs_info(datum_name="WGS 84", area_of_interest=AreaOfInterest(lon, lat, lon, lat))
    codes = {int(info.code) for info in infos}
    assert utm_epsg_for_lonlat(lon, lat) in codes


# -- where pyproj finds PROJ's data ------------------------------------------------------------
import json  # noqa: E402
import math  # noqa: E402
import os  # noqa: E402
import subprocess  # noqa: E402
import sys  # noqa: E402
from pathlib import Path  # noqa: E402

ENGINE = Path(__file__).resolve().parents[2] / "processing" / "engine"

# Runs in a fresh interpreter of this venv: optionally loads the engine package first (which sets
# PROJ_DATA), then imports pyproj with warnings recorded, and computes what Plotwise uses pyproj for.
PROBE = """
import importlib.util, json, os, sys, warnings
if sys.argv[1] == "engine":
    spec = importlib.util.spec_from_file_location("engine_probe", {init!r}, submodule_search_locations=[{folder!r}])
    module = importlib.util.module_from_spec(spec)
    sys.modules["engine_probe"] = module
    spec.loader.exec_module(module)
with warnings.catch_warnings(record=True) as caught:
    warnings.simplefilter("always")
    import pyproj
    east, north = pyproj.Transformer.from_crs(4326, 32736, always_xy=True).transform(33.0, -40.0)
    zone = pyproj.CRS.from_epsg(32736).name
    # the cell's parallels densified: a geodesic between two points of a parallel bows poleward
    lons = [33.0 + i / 2000 for i in range(2001)]
    area, _ = pyproj.Geod(ellps="WGS84").polygon_area_perimeter(lons + lons[::-1], [-40.0] * 2001 + [-41.0] * 2001)
print(json.dumps({{"warnings": [str(w.message) for w in caught], "east": east, "north": north, "zone": zone,
                  "area": abs(area)}}))
"""


def _probe(mode):
    env = {k: v for k, v in os.environ.items() if k not in ("PROJ_DATA", "PROJ_LIB")}
    code = PROBE.format(init=str(ENGINE / "__init__.py"), folder=str(ENGINE))
    done = subprocess.run([sys.executable, "-c", code, mode], capture_output=True, text=True, env=env, timeout=60)
    assert done.returncode == 0, done.stderr
    return json.loads(done.stdout.strip().splitlines()[-1])


def test_engine_silences_the_proj_data_warning_and_changes_no_result():
    bare, fixed = _probe("bare"), _probe("engine")
    assert not [w for w in fixed["warnings"] if "PROJ data" in w]  # the engine points pyproj at proj.db
    # With or without the data directory set, PROJ finds its database through its own search path:
    # the results Plotwise relies on are the same to the last bit.
    assert {k: v for k, v in bare.items() if k != "warnings"} == {k: v for k, v in fixed.items() if k != "warnings"}
    # ... and correct: the central meridian of UTM zone 36S (33° E) maps to the false easting
    # 500,000 m (UTM definition), and the 1° × 1° cell at 40°–41° S has the area of the
    # ellipsoidal quadrangle A = Δλ b²/2 [q(φ1) − q(φ2)],
    # q(φ) = sinφ / (1 − e² sin²φ) + ln((1 + e sinφ) / (1 − e sinφ)) / (2e)  (Snyder 1987, eq. 3-12)
    assert fixed["east"] == pytest.approx(500_000.0, abs=1e-6)
    assert fixed["zone"] == "WGS 84 / UTM zone 36S"
    a, f = 6378137.0, 1 / 298.257223563  # WGS 84
    e = (f * (2 - f)) ** 0.5
    b2 = (a * (1 - f)) ** 2

    def q(phi):
        s = math.sin(math.radians(phi))
        return s / (1 - e**2 * s**2) + math.log((1 + e * s) / (1 - e * s)) / (2 * e)

    quadrangle = math.radians(1.0) * b2 / 2 * abs(q(-40.0) - q(-41.0))
    assert fixed["area"] == pytest.approx(quadrangle, rel=1e-6)
