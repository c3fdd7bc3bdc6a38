"""The one place for differences between QGIS 3.22 and 4.x (Qt5 and Qt6).

Algorithms use these names instead of version-specific enums, so that the rest of
the code reads the same on every supported host.
"""
from qgis.core import Qgis, QgsField, QgsProcessing, QgsProcessingParameterDefinition, QgsWkbTypes

QGIS_VERSION_INT = Qgis.QGIS_VERSION_INT


def _first(*getters):
    for getter in getters:
        try:
            return getter()
        except AttributeError:
            continue
    raise AttributeError("no compatible enum found")


# Field types: QMetaType.Type from 3.38 on (and only that in 4.x), QVariant before.
try:
    from qgis.PyQt.QtCore import QMetaType

    _META = QMetaType.Type
    _HAS_METATYPE_FIELDS = QGIS_VERSION_INT >= 33800
except (ImportError, AttributeError):  # pragma: no cover
    _HAS_METATYPE_FIELDS = False

if _HAS_METATYPE_FIELDS:  # pragma: no cover (exercised on 3.38+)
    FIELD_TYPES = {
        "int": _META.Int,
        "int64": _META.LongLong,
        "double": _META.Double,
        "string": _META.QString,
    }
else:
    from qgis.PyQt.QtCore import QVariant

    FIELD_TYPES = {
        "int": QVariant.Int,
        "int64": QVariant.LongLong,
        "double": QVariant.Double,
        "string": QVariant.String,
    }


def make_field(name, kind, length=0, precision=0):
    """A ``QgsField`` of ``kind`` ('int', 'int64', 'double' or 'string')."""
    field = QgsField(name, FIELD_TYPES[kind])
    if length:
        field.setLength(length)
    if precision:
        field.setPrecision(precision)
    return field


def field_is_numeric(field):
    """True for integer and real fields, on every host version."""
    return field.isNumeric()


# Processing source types: Qgis.ProcessingSourceType from 3.36 on.
TYPE_VECTOR_POLYGON = _first(lambda: Qgis.ProcessingSourceType.VectorPolygon, lambda: QgsProcessing.TypeVectorPolygon)
TYPE_VECTOR_POINT = _first(lambda: Qgis.ProcessingSourceType.VectorPoint, lambda: QgsProcessing.TypeVectorPoint)
TYPE_VECTOR_ANY = _first(lambda: Qgis.ProcessingSourceType.VectorAnyGeometry,
                         lambda: QgsProcessing.TypeVectorAnyGeometry)
TYPE_VECTOR_LINE = _first(lambda: Qgis.ProcessingSourceType.VectorLine, lambda: QgsProcessing.TypeVectorLine)
TYPE_VECTOR = _first(lambda: Qgis.ProcessingSourceType.Vector, lambda: QgsProcessing.TypeVector)
TYPE_RASTER = _first(lambda: Qgis.ProcessingSourceType.Raster, lambda: QgsProcessing.TypeRaster)

# Parameter flags: Qgis.ProcessingParameterFlag from 3.36 on.
FLAG_ADVANCED = _first(
    lambda: Qgis.ProcessingParameterFlag.Advanced, lambda: QgsProcessingParameterDefinition.FlagAdvanced
)
FLAG_OPTIONAL = _first(
    lambda: Qgis.ProcessingParameterFlag.Optional, lambda: QgsProcessingParameterDefinition.FlagOptional
)

# Geometry types: Qgis.WkbType from 3.30 on.
WKB_POINT = _first(lambda: Qgis.WkbType.Point, lambda: QgsWkbTypes.Point)
WKB_LINESTRING = _first(lambda: Qgis.WkbType.LineString, lambda: QgsWkbTypes.LineString)
WKB_POLYGON = _first(lambda: Qgis.WkbType.Polygon, lambda: QgsWkbTypes.Polygon)
WKB_MULTIPOLYGON = _first(lambda: Qgis.WkbType.MultiPolygon, lambda: QgsWkbTypes.MultiPolygon)
WKB_NOGEOMETRY = _first(lambda: Qgis.WkbType.NoGeometry, lambda: QgsWkbTypes.NoGeometry)

GEOMETRY_POLYGON = _first(lambda: Qgis.GeometryType.Polygon, lambda: QgsWkbTypes.PolygonGeometry)
GEOMETRY_POINT = _first(lambda: Qgis.GeometryType.Point, lambda: QgsWkbTypes.PointGeometry)
GEOMETRY_LINE = _first(lambda: Qgis.GeometryType.Line, lambda: QgsWkbTypes.LineGeometry)

# Number parameter types.
from qgis.core import QgsProcessingParameterNumber  # noqa: E402

NUMBER_INTEGER = _first(
    lambda: Qgis.ProcessingNumberParameterType.Integer, lambda: QgsProcessingParameterNumber.Integer
)
NUMBER_DOUBLE = _first(
    lambda: Qgis.ProcessingNumberParameterType.Double, lambda: QgsProcessingParameterNumber.Double
)

# Message levels.
LEVEL_INFO = _first(lambda: Qgis.MessageLevel.Info, lambda: Qgis.Info)
LEVEL_WARNING = _first(lambda: Qgis.MessageLevel.Warning, lambda: Qgis.Warning)
LEVEL_CRITICAL = _first(lambda: Qgis.MessageLevel.Critical, lambda: Qgis.Critical)

# Invalid-geometry handling of feature sources: Qgis.InvalidGeometryCheck from 3.36 on.
# Our algorithms repair invalid polygons themselves (with a warning), so the host's filter is off.
from qgis.core import QgsFeatureRequest  # noqa: E402

GEOMETRY_NO_CHECK = _first(lambda: Qgis.InvalidGeometryCheck.NoCheck, lambda: QgsFeatureRequest.GeometryNoCheck)
# Feature request without geometry: Qgis.FeatureRequestFlag from 3.36 on.
REQUEST_NO_GEOMETRY = _first(lambda: Qgis.FeatureRequestFlag.NoGeometry, lambda: QgsFeatureRequest.NoGeometry)

# Sink flags (fully scoped: works on 3.22 and 4.x).
from qgis.core import QgsFeatureSink  # noqa: E402

FAST_INSERT = QgsFeatureSink.Flag.FastInsert

# Field parameter types.
from qgis.core import QgsProcessingParameterField  # noqa: E402

FIELD_NUMERIC = _first(
    lambda: Qgis.ProcessingFieldParameterDataType.Numeric, lambda: QgsProcessingParameterField.Numeric
)
FIELD_ANY = _first(lambda: Qgis.ProcessingFieldParameterDataType.Any, lambda: QgsProcessingParameterField.Any)


# Print layouts (processing/print_layout.py): page orientation, units, legend style, PDF export.
from qgis.core import (  # noqa: E402
    QgsLayoutExporter,
    QgsLayoutItemPage,
    QgsLegendStyle,
    QgsRenderContext,
    QgsUnitTypes,
)

PAGE_LANDSCAPE = _first(lambda: QgsLayoutItemPage.Orientation.Landscape, lambda: QgsLayoutItemPage.Landscape)
DISTANCE_KILOMETERS = _first(lambda: Qgis.DistanceUnit.Kilometers, lambda: QgsUnitTypes.DistanceKilometers)
LEGEND_TITLE = _first(lambda: QgsLegendStyle.Style.Title, lambda: QgsLegendStyle.Title)
TEXT_ALWAYS_TEXT = _first(lambda: Qgis.TextRenderFormat.AlwaysText, lambda: QgsRenderContext.TextFormatAlwaysText)
EXPORT_SUCCESS = _first(lambda: QgsLayoutExporter.ExportResult.Success, lambda: QgsLayoutExporter.Success)

def parameter_as_fields(algorithm, parameters, name, context):
    """The field names a field parameter holds: ``parameterAsStrings`` on newer hosts, ``parameterAsFields``
    (deprecated there) on 3.22."""
    read = getattr(algorithm, "parameterAsStrings", None) or algorithm.parameterAsFields
    return [field for field in (read(parameters, name, context) or []) if field]
