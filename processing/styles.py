"""Layer styles in our own palette, shared by the output post-processors and the demo project.

Colours read well in print and for common colour-vision deficiencies (the qualitative
palette of :mod:`processing.report.style`).
"""
from qgis.core import (
    QgsCategorizedSymbolRenderer,
    QgsColorRampShader,
    QgsFillSymbol,
    QgsLineSymbol,
    QgsMarkerSymbol,
    QgsRasterShader,
    QgsRendererCategory,
    QgsSingleBandPseudoColorRenderer,
    QgsSingleSymbolRenderer,
    QgsStyle,
)
from qgis.PyQt.QtGui import QColor

from .report.style import CATEGORY_COLOURS, INK


def outline(layer, colour=INK, width=0.6, fill="transparent"):
    """A single outline symbol (frames, study areas)."""
    symbol = QgsFillSymbol.createSimple(
        {"color": fill, "outline_color": colour, "outline_width": str(width), "style": "no" if fill == "transparent" else "solid"}
    )
    layer.setRenderer(QgsSingleSymbolRenderer(symbol))
    layer.triggerRepaint()


def hatched(layer, colour="#a8875b"):
    """Diagonal hatching for excluded areas."""
    symbol = QgsFillSymbol.createSimple({"color": colour, "outline_color": colour, "style": "b_diagonal", "outline_width": "0.4"})
    layer.setRenderer(QgsSingleSymbolRenderer(symbol))
    layer.triggerRepaint()


def dots(layer, colour=CATEGORY_COLOURS[3], size=1.0):
    symbol = QgsMarkerSymbol.createSimple({"name": "circle", "color": colour, "size": str(size), "outline_style": "no"})
    layer.setRenderer(QgsSingleSymbolRenderer(symbol))
    layer.triggerRepaint()


def lines(layer, colour=INK, width=0.8):
    symbol = QgsLineSymbol.createSimple({"line_color": colour, "line_width": str(width)})
    layer.setRenderer(QgsSingleSymbolRenderer(symbol))
    layer.triggerRepaint()


def categorised(layer, field, opacity=0.75):
    """One colour per distinct value of ``field`` (strata), in our qualitative palette."""
    index = layer.fields().lookupField(field)
    values = sorted(layer.uniqueValues(index), key=lambda v: (str(type(v)), v)) if index >= 0 else []
    categories = []
    geometry = layer.geometryType()
    for i, value in enumerate(values):
        colour = CATEGORY_COLOURS[i % len(CATEGORY_COLOURS)]
        if geometry == 2:  # polygon
            symbol = QgsFillSymbol.createSimple({"color": colour, "outline_color": INK, "outline_width": "0.3"})
        elif geometry == 1:
            symbol = QgsLineSymbol.createSimple({"line_color": colour, "line_width": "0.8"})
        else:
            symbol = QgsMarkerSymbol.createSimple({"name": "circle", "color": colour, "size": "2.4", "outline_color": INK})
        symbol.setOpacity(opacity)
        categories.append(QgsRendererCategory(value, symbol, str(value)))
    layer.setRenderer(QgsCategorizedSymbolRenderer(field, categories))
    layer.triggerRepaint()


def pseudocolour(layer, ramp_name="Viridis", band=1):
    """A continuous colour ramp over the band's min–max."""
    provider = layer.dataProvider()
    stats = provider.bandStatistics(band)
    ramp = QgsStyle.defaultStyle().colorRamp(ramp_name)
    shader_function = QgsColorRampShader(stats.minimumValue, stats.maximumValue, ramp)
    shader_function.classifyColorRamp(8, band, layer.extent(), provider)
    shader = QgsRasterShader()
    shader.setRasterShaderFunction(shader_function)
    renderer = QgsSingleBandPseudoColorRenderer(provider, band, shader)
    layer.setRenderer(renderer)
    layer.triggerRepaint()


def colour(text):
    return QColor(text)
