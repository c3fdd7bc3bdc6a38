"""Layer styles in our own palette, shared by the output post-processors and the demo project.

Colours come from :mod:`processing.report.style` (the qualitative ``CATEGORY_COLOURS``
and the ink colour), so that a map in the project and the map in a report agree.
They read well in print and for common colour-vision deficiencies: categories differ
in lightness as well as hue, sequential ramps run from light to dark in one direction,
and primary and reserve units differ in shape and fill, not only in colour.

Two ways in:

* :func:`apply_style` styles a layer by a style name (``"strata"``, ``"units"``,
  ``"estimate"``, ``"frame"``, ...). The demo project uses it.
* :func:`style_on_completion` attaches a :class:`StylePostProcessor` to an output
  that the host will load when the algorithm finishes (the toolbox, batch runs,
  ``processing.runAndLoadResults``). Algorithms call it through
  ``PlotwiseAlgorithm.style_output(context, dest_id, style_name)``.
"""
from qgis.core import (
    QgsBasicNumericFormat,
    QgsCategorizedSymbolRenderer,
    QgsClassificationQuantile,
    QgsColorRampLegendNodeSettings,
    QgsColorRampShader,
    QgsFeatureRequest,
    QgsFillSymbol,
    QgsGradientColorRamp,
    QgsGradientStop,
    QgsGraduatedSymbolRenderer,
    QgsLineSymbol,
    QgsMarkerSymbol,
    QgsPalettedRasterRenderer,
    QgsPalLayerSettings,
    QgsProcessingLayerPostProcessorInterface,
    QgsRasterLayer,
    QgsRasterShader,
    QgsRendererCategory,
    QgsRuleBasedRenderer,
    QgsSingleBandPseudoColorRenderer,
    QgsSingleSymbolRenderer,
    QgsTextBufferSettings,
    QgsTextFormat,
    QgsVectorLayer,
    QgsVectorLayerSimpleLabeling,
)
from qgis.PyQt.QtCore import QCoreApplication
from qgis.PyQt.QtGui import QColor, QFont

from . import compat
from .engine.listing import natural_sorted
from .report.style import CATEGORY_COLOURS, INK

# -- palette (our own) -----------------------------------------------------------------
PRIMARY_COLOUR = CATEGORY_COLOURS[0]  # slate blue, filled
RESERVE_COLOUR = CATEGORY_COLOURS[1]  # amber, hollow
EXCLUDED_COLOUR = CATEGORY_COLOURS[6]  # bark, hatched
ANIMAL_COLOUR = CATEGORY_COLOURS[3]  # brick
NO_ESTIMATE_COLOUR = "#c9cfcd"

# Sequential ramps, light to dark (readable in grey-scale print and for colour-blind readers).
DENSITY_RAMP = ("#f5efd9", "#cfe0c3", "#8fc0b1", "#4b9296", "#2a6475", "#1f3a44")
ELEVATION_RAMP = ("#f6f3ec", "#d8cfc0", "#ab9d86", "#7a6b57", "#4b4036")
GREENNESS_RAMP = ("#f5efd9", "#d7e2b4", "#a3c68a", "#5c9e6e", "#2f6a44")

DENSITY_CLASSES = 5


# -- building blocks -------------------------------------------------------------------
def colour_ramp(colours):
    """A ``QgsGradientColorRamp`` through ``colours`` at even steps."""
    first, last = QColor(colours[0]), QColor(colours[-1])
    stops = [QgsGradientStop(i / (len(colours) - 1), QColor(c)) for i, c in enumerate(colours[1:-1], start=1)]
    return QgsGradientColorRamp(first, last, False, stops)


def _fill(colour, outline=INK, width=0.3, style="solid", outline_style="solid"):
    return QgsFillSymbol.createSimple({
        "color": colour, "style": style, "outline_color": outline, "outline_width": str(width),
        "outline_style": outline_style,
    })


def _marker(colour, shape="circle", size=2.4, outline=INK, outline_width=0.3):
    return QgsMarkerSymbol.createSimple({
        "name": shape, "color": colour, "size": str(size), "outline_color": outline,
        "outline_width": str(outline_width),
    })


def _line(colour, width=0.8, style="solid"):
    return QgsLineSymbol.createSimple({"line_color": colour, "line_width": str(width), "line_style": style})


def _unique(layer, field):
    index = layer.fields().lookupField(field)
    return natural_sorted(v for v in layer.uniqueValues(index) if str(v) != "NULL") if index >= 0 else []


def _labels_for(layer, field, label_field):
    """``{value: label}`` from the first feature of each value (strata carry a readable ``label``)."""
    if layer.fields().lookupField(label_field) < 0:
        return {}
    request = QgsFeatureRequest()
    request.setFlags(compat.REQUEST_NO_GEOMETRY)
    request.setSubsetOfAttributes([field, label_field], layer.fields())
    labels = {}
    for feature in layer.getFeatures(request):
        value, label = feature[field], feature[label_field]
        if value not in labels and label not in (None, "") and str(label) != "NULL":
            labels[value] = str(label)
    return labels


def _finish(layer, renderer):
    layer.setRenderer(renderer)
    layer.triggerRepaint()
    return layer


# -- single-symbol styles --------------------------------------------------------------
def outline(layer, colour=INK, width=0.6, fill="transparent"):
    """A single outline symbol (frames, study areas)."""
    if fill == "transparent":
        symbol = _fill("0,0,0,0", outline=colour, width=width, style="no")
    else:
        symbol = _fill(fill, outline=colour, width=width)
    return _finish(layer, QgsSingleSymbolRenderer(symbol))


def frame(layer):
    """The sampling frame: a firm ink outline over a pale wash, so the strata below still show."""
    symbol = _fill("31,58,68,20", outline=INK, width=0.9)
    return _finish(layer, QgsSingleSymbolRenderer(symbol))


def hatched(layer, colour=EXCLUDED_COLOUR):
    """Diagonal hatching for excluded areas."""
    symbol = _fill(colour, outline=colour, width=0.4, style="b_diagonal")
    return _finish(layer, QgsSingleSymbolRenderer(symbol))


def dots(layer, colour=ANIMAL_COLOUR, size=1.0):
    symbol = QgsMarkerSymbol.createSimple({"name": "circle", "color": colour, "size": str(size), "outline_style": "no"})
    return _finish(layer, QgsSingleSymbolRenderer(symbol))


def lines(layer, colour=INK, width=0.8):
    return _finish(layer, QgsSingleSymbolRenderer(_line(colour, width)))


# -- categorised styles ----------------------------------------------------------------
def _category_symbol(layer, colour, opacity=1.0):
    geometry = layer.geometryType()
    if geometry == compat.GEOMETRY_POLYGON:
        symbol = _fill(colour)
    elif geometry == compat.GEOMETRY_LINE:
        symbol = _line(colour)
    else:
        symbol = _marker(colour)
    symbol.setOpacity(opacity)
    return symbol


def categorised(layer, field, opacity=0.8, label_field=None):
    """One colour per distinct value of ``field``, in our qualitative palette (natural order).

    A layer without ``field`` gets the first palette colour as a single symbol.
    """
    if layer.fields().lookupField(field) < 0:
        return _finish(layer, QgsSingleSymbolRenderer(_category_symbol(layer, CATEGORY_COLOURS[0], opacity)))
    labels = _labels_for(layer, field, label_field) if label_field else {}
    categories = []
    for i, value in enumerate(_unique(layer, field)):
        symbol = _category_symbol(layer, CATEGORY_COLOURS[i % len(CATEGORY_COLOURS)], opacity)
        text = f"{value} – {labels[value]}" if value in labels and labels[value] != str(value) else str(value)
        categories.append(QgsRendererCategory(value, symbol, text))
    return _finish(layer, QgsCategorizedSymbolRenderer(field, categories))


def strata(layer, field="stratum"):
    """Strata categorised by ``field`` (``stratum``; legend text from ``label`` when the layer has it)."""
    return categorised(layer, field or "stratum", opacity=0.8, label_field="label")


def units(layer, label=True):
    """Sample units by ``role``: primary filled slate blue, reserve hollow amber; labelled with ``unit_id``."""
    geometry = layer.geometryType()
    if geometry == compat.GEOMETRY_POLYGON:
        primary = _fill(PRIMARY_COLOUR, outline="white", width=0.4)  # a white rim shows over dark strata
        reserve = _fill("0,0,0,0", outline=RESERVE_COLOUR, width=0.7, style="no", outline_style="dash")
    elif geometry == compat.GEOMETRY_LINE:
        primary = _line(PRIMARY_COLOUR, 1.0)
        reserve = _line(RESERVE_COLOUR, 0.8, style="dash")
    else:
        primary = _marker(PRIMARY_COLOUR, "circle", 2.6, outline="white", outline_width=0.4)
        reserve = _marker("255,255,255,255", "triangle", 2.6, outline=RESERVE_COLOUR, outline_width=0.6)
    if layer.fields().lookupField("role") < 0:  # units from elsewhere: all drawn as primary
        renderer = QgsSingleSymbolRenderer(primary)
    else:
        categories = [
            QgsRendererCategory("primary", primary, QCoreApplication.translate("PlotwiseStyles", "primary unit")),
            QgsRendererCategory("reserve", reserve, QCoreApplication.translate("PlotwiseStyles", "reserve unit")),
        ]
        others = [v for v in _unique(layer, "role") if v not in ("primary", "reserve")]
        for i, value in enumerate(others, start=4):
            symbol = _category_symbol(layer, CATEGORY_COLOURS[i % len(CATEGORY_COLOURS)])
            categories.append(QgsRendererCategory(value, symbol, str(value)))
        renderer = QgsCategorizedSymbolRenderer("role", categories)
    _finish(layer, renderer)
    if label and layer.fields().lookupField("unit_id") >= 0:
        label_features(layer, "unit_id")
    return layer


def label_features(layer, field, size=7.5):
    """Small ink labels with a white halo (readable over any fill and in grey-scale print)."""
    text = QgsTextFormat()
    font = QFont("DejaVu Sans")
    text.setFont(font)
    text.setSize(size)
    text.setColor(QColor(INK))
    halo = QgsTextBufferSettings()
    halo.setEnabled(True)
    halo.setSize(0.8)
    halo.setColor(QColor("white"))
    text.setBuffer(halo)
    settings = QgsPalLayerSettings()
    settings.fieldName = field
    settings.isExpression = False
    settings.setFormat(text)
    layer.setLabeling(QgsVectorLayerSimpleLabeling(settings))
    layer.setLabelsEnabled(True)
    layer.triggerRepaint()
    return layer


# -- graduated style of the estimate ---------------------------------------------------
def estimate(layer, area_unit="km²", field="dens", classes=DENSITY_CLASSES):
    """Strata graduated by density ``dens`` (light to dark), legend in animals per ``area_unit``.

    Classes are quantiles of the strata's densities (one class per stratum when there are
    few strata). Strata without an estimate (no surveyed unit) are drawn pale grey and
    labelled so, instead of vanishing from the map.
    """
    per = QCoreApplication.translate("PlotwiseStyles", "per {unit}").format(unit=area_unit)
    title = QCoreApplication.translate("PlotwiseStyles", "Density (animals {per})").format(per=per)
    layer.setTitle(title)
    index = layer.fields().lookupField(field)
    values = set()
    has_missing = False
    if index >= 0:
        for value in layer.uniqueValues(index):
            if isinstance(value, (int, float)) and not isinstance(value, bool) and value == value:
                values.add(float(value))
            else:
                has_missing = True
    if not values:
        symbol = _fill(NO_ESTIMATE_COLOUR, outline=INK, width=0.3, style="dense5")
        renderer = QgsSingleSymbolRenderer(symbol)
        return _finish(layer, renderer)
    renderer = QgsGraduatedSymbolRenderer(field)
    renderer.setSourceSymbol(_fill(DENSITY_RAMP[0], outline=INK, width=0.3))
    method = QgsClassificationQuantile()
    method.setLabelFormat("%1 – %2 " + per)
    method.setLabelPrecision(2)
    method.setLabelTrimTrailingZeroes(True)
    renderer.setClassificationMethod(method)
    renderer.setSourceColorRamp(colour_ramp(DENSITY_RAMP))
    renderer.updateClasses(layer, max(1, min(classes, len(values))))
    renderer.updateColorRamp(colour_ramp(DENSITY_RAMP))
    if has_missing:
        rules = QgsRuleBasedRenderer.convertFromRenderer(renderer, layer)
        root = rules.rootRule()
        other = QgsRuleBasedRenderer.Rule(_fill(NO_ESTIMATE_COLOUR, outline=INK, width=0.3, style="dense5"))
        other.setIsElse(True)
        other.setLabel(QCoreApplication.translate("PlotwiseStyles", "no estimate (no surveyed unit)"))
        root.appendChild(other)
        return _finish(layer, rules)
    return _finish(layer, renderer)


# -- rasters ---------------------------------------------------------------------------
def pseudocolour(layer, colours=DENSITY_RAMP, band=1, classes=8, decimals=1, suffix=""):
    """A continuous colour ramp over the band's minimum to maximum; legend numbers with ``decimals``."""
    provider = layer.dataProvider()
    stats = provider.bandStatistics(band)
    ramp = colour_ramp(colours)
    function = QgsColorRampShader(stats.minimumValue, stats.maximumValue, ramp)
    function.classifyColorRamp(classes, band, layer.extent(), provider)
    legend = QgsColorRampLegendNodeSettings()
    number_format = QgsBasicNumericFormat()
    number_format.setNumberDecimalPlaces(decimals)
    number_format.setShowTrailingZeros(False)
    legend.setNumericFormat(number_format)
    legend.setSuffix(suffix)
    function.setLegendSettings(legend)
    shader = QgsRasterShader()
    shader.setRasterShaderFunction(function)
    renderer = QgsSingleBandPseudoColorRenderer(provider, band, shader)
    renderer.setClassificationMin(stats.minimumValue)
    renderer.setClassificationMax(stats.maximumValue)
    return _finish(layer, renderer)


def raster_classes(layer, band=1):
    """A class raster (strata) with one palette colour per class value."""
    provider = layer.dataProvider()
    data = QgsPalettedRasterRenderer.classDataFromRaster(provider, band)
    classes = [
        QgsPalettedRasterRenderer.Class(c.value, QColor(CATEGORY_COLOURS[i % len(CATEGORY_COLOURS)]), c.label)
        for i, c in enumerate(sorted(data, key=lambda c: c.value))
    ]
    return _finish(layer, QgsPalettedRasterRenderer(provider, band, classes))


# -- by name ---------------------------------------------------------------------------
STYLES = {
    # vector outputs
    "frame": frame,
    "outline": lambda layer: outline(layer, width=0.8),
    "hatched": hatched,
    "excluded": hatched,
    "dots": dots,
    "animals": dots,
    "strata": strata,
    "units": units,
    "estimate": estimate,
    # rasters
    "terrain": lambda layer: pseudocolour(layer, ELEVATION_RAMP, decimals=0),
    "elevation": lambda layer: pseudocolour(layer, ELEVATION_RAMP, decimals=0, suffix=" m"),
    "greenness": lambda layer: pseudocolour(layer, GREENNESS_RAMP, decimals=2),
    "intensity": lambda layer: pseudocolour(
        layer, DENSITY_RAMP, decimals=0,
        suffix=" " + QCoreApplication.translate("PlotwiseStyles", "per {unit}").format(unit="km²")),
    "strata_raster": raster_classes,
}

STYLE_PROPERTY = "plotwise/style"  # custom layer property: the name of the style applied (saved in projects)

_RASTER_STYLES = {"terrain", "elevation", "greenness", "intensity", "strata_raster"}


def apply_style(layer, style_name, **options):
    """Style ``layer`` with the named style; returns True when a style was applied.

    Options go to the style function (``area_unit`` for ``"estimate"``). A layer of the
    wrong kind for the style (a table without geometry, a vector for a raster style) is
    left as it is.
    """
    if style_name not in STYLES:
        raise KeyError(f"no Plotwise style called {style_name!r}; known: {', '.join(sorted(STYLES))}")
    if layer is None or not layer.isValid():
        return False
    if style_name in _RASTER_STYLES:
        if not isinstance(layer, QgsRasterLayer):
            return False
    elif not isinstance(layer, QgsVectorLayer) or not layer.isSpatial():
        return False
    STYLES[style_name](layer, **options)
    layer.setCustomProperty(STYLE_PROPERTY, style_name)
    return True


# -- post-processors -------------------------------------------------------------------
# The host holds post-processors by a C++ pointer only: without a Python reference the
# Python object (and its postProcessLayer) would be garbage-collected before the host
# calls it. Keep the latest one per output here.
_LIVE_POST_PROCESSORS = {}


class StylePostProcessor(QgsProcessingLayerPostProcessorInterface):
    """Styles an output layer once the host has loaded it into the project."""

    def __init__(self, style_name, options=None):
        super().__init__()
        if style_name not in STYLES:
            raise KeyError(f"no Plotwise style called {style_name!r}")
        self.style_name = style_name
        self.options = dict(options or {})

    def postProcessLayer(self, layer, context, feedback):  # noqa: N802 (host naming)
        try:
            apply_style(layer, self.style_name, **self.options)
        except Exception as error:  # noqa: BLE001 (a style problem must never fail the run)
            if feedback is not None:
                feedback.pushWarning(
                    QCoreApplication.translate(
                        "PlotwiseStyles",
                        "The layer {name} could not be styled ({error}); it keeps the default style.").format(
                        name=layer.name() if layer is not None else "?", error=error)
                )


def style_on_completion(context, dest_id, style_name, **options):
    """Style output ``dest_id`` when the host loads it on completion; returns the post-processor or None.

    Nothing happens when the output is not loaded (``processing.run``, ``qgis_process``,
    intermediate outputs of a model).
    """
    if not dest_id or context is None or not context.willLoadLayerOnCompletion(dest_id):
        return None
    processor = StylePostProcessor(style_name, options)
    _LIVE_POST_PROCESSORS[dest_id] = processor
    context.layerToLoadOnCompletionDetails(dest_id).setPostProcessor(processor)
    return processor


def colour(text):
    return QColor(text)


# -- stations and occupancy ------------------------------------------------------------
def stations(layer):
    """Stations by ``role`` as the units are (primary filled, reserve hollow), labelled with ``station``."""
    units(layer, label=False)
    if layer.fields().lookupField("station") >= 0:
        label_features(layer, "station")
    return layer


def occupancy(layer, field="psi_cond"):
    """Sites graduated by ``psi_cond`` in five equal classes from 0 to 1 (light to dark); sites left out grey."""
    from qgis.core import QgsRendererRange

    from .report.style import PROBABILITY_RAMP

    if layer.fields().lookupField(field) < 0:
        return _finish(layer, QgsSingleSymbolRenderer(_category_symbol(layer, PROBABILITY_RAMP[0])))
    ranges = []
    for i in range(5):
        lo, hi = i / 5.0, (i + 1) / 5.0
        colour = colour_ramp(PROBABILITY_RAMP).color((i + 0.5) / 5.0).name()
        ranges.append(QgsRendererRange(lo, hi, _category_symbol(layer, colour), f"{lo:.1f} – {hi:.1f}"))
    renderer = QgsGraduatedSymbolRenderer(field, ranges)
    rules = QgsRuleBasedRenderer.convertFromRenderer(renderer, layer)
    other = QgsRuleBasedRenderer.Rule(_category_symbol(layer, NO_ESTIMATE_COLOUR))
    other.setIsElse(True)
    other.setLabel(QCoreApplication.translate("PlotwiseStyles", "left out (no surveyed occasion)"))
    rules.rootRule().appendChild(other)
    layer.setTitle(QCoreApplication.translate("PlotwiseStyles", "Occupancy given the detections (psi_cond)"))
    return _finish(layer, rules)


STYLES["stations"] = stations
STYLES["occupancy"] = occupancy


# -- monitoring ------------------------------------------------------------------------
def panels(layer):
    """Units by revisit ``panel`` (one palette colour per panel; reserves without a panel), labelled
    with ``unit_id``."""
    categorised(layer, "panel", opacity=0.9)
    if layer.fields().lookupField("unit_id") >= 0:
        label_features(layer, "unit_id")
    return layer


STYLES["panels"] = panels
