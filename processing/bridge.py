"""Host layers <-> engine types.

Reads features into shapely geometries, numpy arrays and plain attribute lists in the
computation CRS, and writes engine results back into host sinks and GeoTIFFs. The one
module where host objects and engine objects meet: algorithms call it, the engine never.
"""
from dataclasses import dataclass

import numpy as np
from osgeo import gdal, osr
from qgis.core import (
    NULL,
    QgsCoordinateReferenceSystem,
    QgsCoordinateTransform,
    QgsFeature,
    QgsFeatureRequest,
    QgsField,
    QgsFields,
    QgsGeometry,
    QgsProcessingException,
)
from qgis.PyQt.QtCore import QCoreApplication
from shapely import wkb as shapely_wkb

from . import compat
from .engine.crs import utm_epsg_for_lonlat
from .engine.geometry_types import polygonal_part
from .engine.listing import listed_ids as _listed_ids
from .translation import translated_message


# -- geometry conversion -----------------------------------------------------------
def to_shapely(geometry):
    """A shapely geometry from a ``QgsGeometry`` (None when empty)."""
    if geometry is None or geometry.isNull() or geometry.isEmpty():
        return None
    return shapely_wkb.loads(bytes(geometry.asWkb()))


def plain_value(value):
    """An attribute value as plain Python: NULL becomes None."""
    if value is None or value == NULL:
        return None
    if hasattr(value, "isNull") and value.isNull():
        return None
    return value


# -- CRS ---------------------------------------------------------------------------
def computation_crs(source_crs, extent, context, feedback, layer_name=""):
    """The projected CRS to compute in.

    A projected ``source_crs`` is kept. A geographic one is replaced by the WGS 84 UTM
    zone of the extent's centre, and the log says so. ``extent`` is in ``source_crs``.
    """
    if not source_crs.isValid():
        raise QgsProcessingException(
            QCoreApplication.translate(
                "PlotwiseBridge",
                "Layer '{layer}' has no valid coordinate reference system. Set its CRS (Layer Properties → Source) "
                "and run again.").format(layer=layer_name)
        )
    if not source_crs.isGeographic():
        return source_crs
    wgs84 = QgsCoordinateReferenceSystem("EPSG:4326")
    centre = extent.center()
    if source_crs != wgs84:
        centre = QgsCoordinateTransform(source_crs, wgs84, context.transformContext()).transform(centre)
    epsg = utm_epsg_for_lonlat(centre.x(), centre.y())
    crs = QgsCoordinateReferenceSystem(f"EPSG:{epsg}")
    feedback.pushInfo(
        QCoreApplication.translate(
            "PlotwiseBridge",
            "Layer '{layer}' is in geographic coordinates ({src}); computing in {dst} ({name}), the UTM zone of "
            "its centre.").format(
            layer=layer_name, src=source_crs.authid(), dst=crs.authid(), name=crs.description()
        )
    )
    return crs


def crs_label(crs):
    """The CRS as reports name it: "EPSG:32736 (WGS 84 / UTM zone 36S)"."""
    return f"{crs.authid()} ({crs.description()})"


def crs_wkt(crs):
    if hasattr(QgsCoordinateReferenceSystem, "WKT_PREFERRED"):
        return crs.toWkt(QgsCoordinateReferenceSystem.WKT_PREFERRED)
    return crs.toWkt()


# -- reading -----------------------------------------------------------------------
@dataclass(frozen=True)
class FeatureRecords:
    """Features of one layer in the computation CRS.

    ``geometries`` are shapely objects (None for empty ones); ``attributes`` maps a field
    name to a list of plain values, aligned with ``fids``. ``valid`` (when asked for) holds the
    host's GEOS validity of each geometry, aligned with ``fids``.
    """

    layer_name: str
    fids: np.ndarray
    geometries: tuple
    attributes: dict
    warnings: tuple
    valid: tuple = ()

    def __len__(self):
        return len(self.fids)


def require_fields(source, field_names, layer_name):
    """``source``'s fields, after checking that it has each of ``field_names`` (empty names skipped)."""
    fields = source.fields()
    missing = [name for name in field_names if name and fields.lookupField(name) < 0]
    if missing:
        raise QgsProcessingException(
            QCoreApplication.translate(
                "PlotwiseBridge", "Layer '{layer}' has no field named {names}. Choose an existing field.").format(
                layer=layer_name, names=", ".join(f"'{m}'" for m in missing)))
    return fields


def read_features(source, target_crs, context, feedback, field_names=(), layer_name="", repair=True, drop_empty=True,
                  check_validity=False):
    """Read ``source`` (a ``QgsProcessingFeatureSource``) into :class:`FeatureRecords`.

    Geometries are transformed to ``target_crs``. Invalid polygons are repaired (with a
    warning naming the feature ids); empty or zero-area polygons are dropped (with a
    warning) when ``drop_empty``. With ``check_validity`` (and no ``repair``) the host's own
    check, ``QgsGeometry.isGeosValid`` (the one its feature requests run, and which it keeps with
    the layer's geometry once done), is recorded per feature in ``valid``, so that the engine
    repairs only what it flags.
    """
    if source is None:
        raise QgsProcessingException(
            QCoreApplication.translate("PlotwiseBridge", "The input layer '{layer}' could not be opened.").format(
                layer=layer_name))
    layer_name = layer_name or source.sourceName()
    # the host would drop or refuse invalid features before we can repair them and say so
    source.setInvalidGeometryCheck(compat.GEOMETRY_NO_CHECK)
    require_fields(source, field_names, layer_name)
    request = QgsFeatureRequest()
    request.setDestinationCrs(target_crs, context.transformContext())
    fids, geometries, valid = [], [], []
    values = {name: [] for name in field_names if name}
    repaired, dropped = [], []
    total = source.featureCount() or 1
    for i, feature in enumerate(source.getFeatures(request)):
        if feedback.isCanceled():
            break
        geometry = feature.geometry()
        shape = to_shapely(geometry)
        if shape is not None and repair and not shape.is_valid:
            shape = to_shapely(geometry.makeValid())
            repaired.append(feature.id())
        is_areal = shape is not None and shape.geom_type in ("Polygon", "MultiPolygon", "GeometryCollection")
        if drop_empty and (shape is None or shape.is_empty or (is_areal and shape.area <= 0)):
            dropped.append(feature.id())
            continue
        # a collection's validity says nothing of its polygonal part: only (multi)polygons are checked
        host_valid = (check_validity and shape is not None and shape.geom_type in ("Polygon", "MultiPolygon")
                      and geometry.isGeosValid())
        if shape is not None and shape.geom_type == "GeometryCollection":
            shape = polygonal_part(shape)
        fids.append(feature.id())
        geometries.append(shape)
        if check_validity:
            valid.append(bool(host_valid))
        for name in values:
            values[name].append(plain_value(feature[name]))
        if i % 500 == 0:
            feedback.setProgress(min(100.0 * i / total, 100.0))
    warnings = []
    if repaired:
        warnings.append(
            QCoreApplication.translate(
                "PlotwiseBridge", "Layer '{layer}': invalid geometry repaired for feature id(s) {ids}.").format(
                layer=layer_name, ids=listed_ids(repaired))
        )
    if dropped:
        warnings.append(
            QCoreApplication.translate(
                "PlotwiseBridge", "Layer '{layer}': empty or zero-area feature id(s) {ids} skipped.").format(
                layer=layer_name, ids=listed_ids(dropped))
        )
    for warning in warnings:
        feedback.pushWarning(warning)
    return FeatureRecords(layer_name, np.asarray(fids, dtype=np.int64), tuple(geometries), values, tuple(warnings),
                          tuple(valid))


def point_coordinates(records):
    """An (n, 2) array of x, y from point records (multi-points give their first point)."""
    xy = np.empty((len(records), 2))
    for i, g in enumerate(records.geometries):
        if g.geom_type == "MultiPoint":
            g = g.geoms[0]
        xy[i] = g.x, g.y
    return xy


def listed_ids(ids):
    """Feature ids for a host message: the engine's one listing (``engine.listing``), in the user's language."""
    return translated_message(_listed_ids(ids))


# -- writing -----------------------------------------------------------------------
def stratum_field_like(source, stratum_field):
    """The output field ``stratum``: of the type of ``source``'s field ``stratum_field``, or an integer
    field when there is none (one stratum)."""
    if not stratum_field:
        return compat.make_field("stratum", "int")
    stratum = QgsField(source.fields().field(stratum_field))
    stratum.setName("stratum")
    return stratum


def make_fields(spec):
    """``QgsFields`` from ``[(name, kind), ...]`` or ``[(name, kind, length, precision), ...]``."""
    fields = QgsFields()
    for item in spec:
        fields.append(compat.make_field(*item))
    return fields


def write_features(sink, fields, geometries, rows, feedback=None, progress_range=(0.0, 100.0)):
    """Add one feature per (shapely geometry or None, row) to ``sink`` through :func:`write_rows`.

    ``rows`` are sequences aligned with ``fields`` (the sink's fields); values are made sink-ready
    with :func:`sink_value`.
    """
    wkb = [None if g is None else shapely_wkb.dumps(g) for g in geometries]
    return write_rows(sink, wkb, [[_sink_value(v) for v in row] for row in rows], feedback, progress_range)


#: WKB headers: byte order (1 = little endian), geometry type, then counts (ISO/OGC simple features)
_WKB_LAYOUT = {
    "point": (1, ()),
    "line": (2, ("points",)),
    "polygon": (3, ("rings", "points")),
}


def wkb_geometries(coordinates, kind):
    """One WKB geometry per row of a uniform coordinate array, packed in one numpy pass.

    ``kind`` "point" takes an (n, 2) array; "line" an (n, m, 2) array of m-point lines;
    "polygon" an (n, m, 2) array of closed rings (one ring per polygon). Returns a list of
    ``bytes``, one per row: cheaper for the host than building its geometries vertex by vertex.
    """
    xy = np.asarray(coordinates, dtype=float)
    code, counts = _WKB_LAYOUT[kind]
    shape = xy.shape[1:]
    dtype = np.dtype([("order", "u1"), ("type", "<u4")] + [(c, "<u4") for c in counts] + [("xy", "<f8", shape)])
    packed = np.empty(len(xy), dtype)
    packed["order"], packed["type"] = 1, code
    if "rings" in counts:
        packed["rings"] = 1
    if "points" in counts:
        packed["points"] = shape[0]
    packed["xy"] = xy
    raw, size = packed.tobytes(), dtype.itemsize
    return [raw[i:i + size] for i in range(0, len(raw), size)]


def write_rows(sink, geometries_wkb, rows, feedback=None, progress_range=(0.0, 100.0), chunk=2000):
    """Add one feature per (WKB geometry, row) to ``sink``, in chunks; False when cancelled.

    ``rows`` hold plain Python values aligned with the sink's fields (NULL already in place):
    see :func:`sink_value`. A geometry of None writes a feature without geometry.

    One chunk's worth of ``QgsFeature`` objects and one ``QgsGeometry`` are made and refilled for
    every chunk: a sink keeps copies of what it is given (the host's features share their data
    and copy it when changed), and making a host object is most of the cost of a feature.
    """
    total = max(len(rows), 1)
    start, end = progress_range
    pool = [QgsFeature() for _ in range(min(chunk, len(rows)))]
    geometry = QgsGeometry()
    set_geometry, set_attributes, from_wkb = QgsFeature.setGeometry, QgsFeature.setAttributes, QgsGeometry.fromWkb
    for first in range(0, len(rows), chunk):
        if feedback is not None and feedback.isCanceled():
            return False
        block = rows[first:first + chunk]
        features = pool[:len(block)]
        for feature, wkb, row in zip(features, geometries_wkb[first:first + chunk], block):
            if wkb is None:
                feature.clearGeometry()
            else:
                from_wkb(geometry, wkb)
                set_geometry(feature, geometry)
            set_attributes(feature, row)
        sink.addFeatures(features, compat.FAST_INSERT)
        if feedback is not None:
            feedback.setProgress(start + (end - start) * min(first + chunk, total) / total)
    return True


def write_columns(sink, geometries_wkb, columns, feedback=None, progress_range=(0.0, 100.0), chunk=2000):
    """Like :func:`write_rows`, from one sequence of sink-ready values per field (``columns``).

    A layout's units share most of their values (stratum, role, inclusion probability, design
    record): columns that hold one value throughout are set once per refilled feature, and only
    the others per feature, which costs the host a fraction of a whole row. With more varying
    columns than constant ones the rows are written as they are.
    """
    n = len(geometries_wkb)
    if n == 0 or any(len(c) != n for c in columns):
        return write_rows(sink, geometries_wkb, [list(r) for r in zip(*columns)], feedback, progress_range, chunk)
    varying = [j for j, c in enumerate(columns) if c.count(c[0]) != n]
    if 2 * len(varying) > len(columns):
        return write_rows(sink, geometries_wkb, [list(r) for r in zip(*columns)], feedback, progress_range, chunk)
    first_row = [c[0] for c in columns]
    start, end = progress_range
    pool = []
    for _ in range(min(chunk, n)):
        feature = QgsFeature()
        feature.setAttributes(first_row)
        pool.append(feature)
    geometry = QgsGeometry()
    set_geometry, set_attribute, from_wkb = QgsFeature.setGeometry, QgsFeature.setAttribute, QgsGeometry.fromWkb
    for first in range(0, n, chunk):
        if feedback is not None and feedback.isCanceled():
            return False
        block = geometries_wkb[first:first + chunk]
        features = pool[:len(block)]
        values = zip(*[columns[j][first:first + chunk] for j in varying]) if varying else [()] * len(block)
        for feature, wkb, row in zip(features, block, values):
            if wkb is None:
                feature.clearGeometry()
            else:
                from_wkb(geometry, wkb)
                set_geometry(feature, geometry)
            for j, value in zip(varying, row):
                set_attribute(feature, j, value)
        sink.addFeatures(features, compat.FAST_INSERT)
        if feedback is not None:
            feedback.setProgress(start + (end - start) * min(first + chunk, n) / n)
    return True


def _sink_value(value):
    if value is None:
        return NULL
    if isinstance(value, (np.integer,)):
        return int(value)
    if isinstance(value, (np.floating,)):
        v = float(value)
        return NULL if v != v else v
    if isinstance(value, float) and value != value:
        return NULL
    return value


def write_geotiff(path, array, geotransform, crs, nodata=None, data_type=gdal.GDT_Float32):
    """Write a 2-D array as a tiled, compressed GeoTIFF in ``crs`` (a ``QgsCoordinateReferenceSystem``)."""
    rows, cols = array.shape
    driver = gdal.GetDriverByName("GTiff")
    dataset = driver.Create(path, cols, rows, 1, data_type, options=["TILED=YES", "COMPRESS=DEFLATE"])
    if dataset is None:
        raise QgsProcessingException(QCoreApplication.translate(
            "PlotwiseBridge",
            "Could not create the raster file {path}. Check the folder exists and is writable.").format(path=path))
    dataset.SetGeoTransform(tuple(float(v) for v in geotransform))
    srs = osr.SpatialReference()
    srs.ImportFromWkt(crs.toWkt())
    dataset.SetProjection(srs.ExportToWkt())
    band = dataset.GetRasterBand(1)
    if nodata is not None:
        band.SetNoDataValue(float(nodata))
    band.WriteArray(array)
    band.FlushCache()
    dataset = None
    return path


sink_value = _sink_value  # public name: a plain or numpy value as a sink attribute (NaN and None -> NULL)


def write_gpx_waypoints(path, names, lon, lat, descriptions=None, kinds=None):
    """Write WGS 84 waypoints to a GPX 1.1 file through GDAL's GPX driver (the standard schema).

    ``names`` become the waypoint names (``<name>``), ``descriptions`` the ``<desc>`` and ``kinds``
    the ``<type>`` elements. Returns ``path``.
    """
    from osgeo import ogr

    driver = ogr.GetDriverByName("GPX")
    if driver is None:
        raise QgsProcessingException(QCoreApplication.translate(
            "PlotwiseBridge", "GDAL has no GPX driver here; the GPX file cannot be written."))
    if gdal.VSIStatL(path) is not None:
        gdal.Unlink(path)  # the GPX driver does not overwrite
    dataset = driver.CreateDataSource(path)
    if dataset is None:
        raise QgsProcessingException(QCoreApplication.translate(
            "PlotwiseBridge", "Could not create the GPX file {path}. Check the folder exists and is writable.").format(
            path=path))
    srs = osr.SpatialReference()
    srs.ImportFromEPSG(4326)
    srs.SetAxisMappingStrategy(osr.OAMS_TRADITIONAL_GIS_ORDER)
    layer = dataset.CreateLayer("waypoints", srs, ogr.wkbPoint)
    definition = layer.GetLayerDefn()
    for i, (name, x, y) in enumerate(zip(names, lon, lat)):
        feature = ogr.Feature(definition)
        feature.SetField("name", str(name))
        if descriptions is not None:
            feature.SetField("desc", str(descriptions[i]))
        if kinds is not None:
            feature.SetField("type", str(kinds[i]))
        point = ogr.Geometry(ogr.wkbPoint)
        point.AddPoint_2D(float(x), float(y))
        feature.SetGeometry(point)
        layer.CreateFeature(feature)
    dataset = None
    return path


def read_attributes(source, field_names, layer_name=""):
    """The values of ``field_names`` of every feature of ``source`` (a table or a layer), without
    geometry: ``(feature ids, {field: [plain values]})``. Missing fields are an error naming them."""
    layer_name = layer_name or source.sourceName()
    fields = require_fields(source, field_names, layer_name)
    request = QgsFeatureRequest()
    request.setFlags(compat.REQUEST_NO_GEOMETRY)
    request.setSubsetOfAttributes([fields.lookupField(name) for name in field_names if name])
    fids, values = [], {name: [] for name in field_names if name}
    for feature in source.getFeatures(request):
        fids.append(feature.id())
        for name in values:
            values[name].append(plain_value(feature[name]))
    return fids, values
