"""Choice of the computation CRS.

All computation happens in a projected CRS in metres. A geographic input is
projected to the UTM zone of its centroid (WGS 84 / UTM, EPSG 326xx north and
327xx south).
"""
import pyproj


def utm_epsg_for_lonlat(lon, lat):
    """EPSG code of the WGS 84 UTM zone that contains (``lon``, ``lat``).

    The zone number is ``floor((lon + 180) / 6) + 1`` (standard UTM zoning,
    without the Norway and Svalbard exceptions).
    """
    lon = ((float(lon) + 180.0) % 360.0) - 180.0
    zone = min(int((lon + 180.0) // 6.0) + 1, 60)
    return (32600 if lat >= 0 else 32700) + zone


def is_geographic(crs_wkt_or_code):
    """True when the CRS is geographic (degrees), per pyproj."""
    return pyproj.CRS.from_user_input(crs_wkt_or_code).is_geographic


def lonlat_transformer(source_crs):
    """A pyproj transformer from ``source_crs`` to WGS 84 longitude/latitude."""
    return pyproj.Transformer.from_crs(
        pyproj.CRS.from_user_input(source_crs), pyproj.CRS.from_epsg(4326), always_xy=True
    )
