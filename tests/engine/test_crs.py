"""UTM zone choice against pyproj's own CRS database (the reference)."""
import pytest
from pyproj.aoi import AreaOfInterest
from pyproj.database import query_utm_crs_info

from plotwise.processing.engine.crs import utm_epsg_for_lonlat


@pytest.mark.parametrize("lon, lat", [(33.4, -23.1), (-71.2, -44.9), (8.05, 46.5), (151.0, -33.8), (-179.5, 0.5), (36.6, 1.0)])
def test_utm_zone_matches_pyproj_database(lon, lat):
    # pyproj.database.query_utm_crs_info lists the WGS 84 UTM zones whose area of use holds the point
    infos = query_utm_crs_info(datum_name="WGS 84", area_of_interest=AreaOfInterest(lon, lat, lon, lat))
    codes = {int(info.code) for info in infos}
    assert utm_epsg_for_lonlat(lon, lat) in codes
