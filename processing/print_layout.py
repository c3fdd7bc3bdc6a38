"""An A4 print layout of survey layers, saved in the project and exported to PDF (host side).

Used by the demo chain (``scripts/demo_chain.py``) and its tests: the map of the chosen layers, a legend,
a scale bar in kilometres, our north arrow, an attribute table, the title, the date of printing and the
field-safety caution.
"""
import base64

from qgis.core import (
    QgsCoordinateTransform,
    QgsLayoutExporter,
    QgsLayoutFrame,
    QgsLayoutItemAttributeTable,
    QgsLayoutItemLabel,
    QgsLayoutItemLegend,
    QgsLayoutItemMap,
    QgsLayoutItemPicture,
    QgsLayoutItemScaleBar,
    QgsLayoutPoint,
    QgsLayoutSize,
    QgsPrintLayout,
    QgsRasterLayer,
    QgsRectangle,
    QgsTextFormat,
)
from qgis.PyQt.QtGui import QColor, QFont

from . import compat

PRINT_LAYOUT_NAME = "Survey map (A4)"
NORTH_ARROW_SVG = (  # our own arrow, the one the report maps draw
    '<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 40 60" width="40" height="60">'
    '<text x="20" y="18" font-size="18" font-family="DejaVu Sans, sans-serif" font-weight="bold" '
    'fill="#1f3a44" text-anchor="middle">N</text>'
    '<path d="M20,22 L8,58 L20,48 L32,58 Z" fill="#1f3a44"/></svg>'
)
INK = "#1f3a44"
MUTED = "#5f6f73"
CAUTION = ("Check every unit's access and safety before sending a team; this map never makes a location "
           "safe. Follow your agency's field-safety rules and local law.")
MAP_WIDTH = 200  # mm, at 10 mm from the left and 25 mm from the top of the page


def estimate_table_columns(unit="km²", level="95 %"):
    """The columns of plotwise:estimate's table for :func:`add_attribute_table`: ``(field, heading, decimals)``."""
    return [
        ("stratum", "Stratum", None), ("area", f"Area ({unit})", 1), ("n", "Units", None),
        ("mean_c", "Mean count", 2), ("dens", f"Density per {unit}", 2), ("dens_lo", f"Lower {level}", 2),
        ("dens_hi", f"Upper {level}", 2), ("abund", "Abundance", 0), ("abund_lo", f"Lower {level}", 0),
        ("abund_hi", f"Upper {level}", 0), ("cv", "CV", 3), ("n_next", "Units next time", None),
    ]


def print_survey_map(project, map_layers, table_layer, table_columns, project_path, pdf_path, note=""):
    """The print layout of ``map_layers`` and ``table_layer`` added to ``project``, the project opened on that
    map (:func:`show_in_canvas`) and saved at ``project_path``, the layout exported to ``pdf_path``.

    Returns the PDF's path.
    """
    layout = add_print_layout(project, project.title(), map_layers, table_layer, table_columns, note=note)
    show_in_canvas(project, map_layers)
    project.write(str(project_path))
    return export_pdf(layout, pdf_path)


def add_print_layout(project, title, map_layers, table_layer=None, table_columns=None, note=""):
    """Add an A4 landscape print layout to ``project`` and return it.

    The layout holds the map of ``map_layers`` (top of the list drawn on top), a legend of
    those layers (a layer's title, when set, names its legend entry), a scale bar in
    kilometres, a north arrow, an attribute table of ``table_layer`` (``table_columns``:
    ``[(field, heading, decimals), ...]``; default: its first fields), the title, the
    date of printing (an expression, so it is the date the layout is printed) and ``note``.
    """
    manager = project.layoutManager()
    old = manager.layoutByName(PRINT_LAYOUT_NAME)
    if old is not None:
        manager.removeLayout(old)
    layout = QgsPrintLayout(project)
    layout.initializeDefaults()
    layout.setName(PRINT_LAYOUT_NAME)
    layout.pageCollection().page(0).setPageSize("A4", compat.PAGE_LANDSCAPE)  # 297 × 210 mm

    _label(layout, title, 10, 7, 277, 10, 18, bold=True)
    _label(layout, "Printed [% format_date(now(), 'yyyy-MM-dd') %]" + (f" · {note}" if note else ""),
           10, 17, 277, 6, 9, colour=MUTED)
    map_height = 118 if table_layer is not None else 178
    chart = _add_map(layout, project, map_layers, map_height)
    _add_north_arrow_and_scale_bar(layout, chart, map_height)
    _add_legend(layout, chart, map_layers, map_height)
    if table_layer is not None:
        top = 25 + map_height + 4
        add_attribute_table(layout, table_layer, table_columns, 10, top, 277, 205 - top - 8)
    _label(layout, CAUTION, 10, 199, 277, 6, 7.5, colour=MUTED)
    manager.addLayout(layout)
    return layout


def _text_format(size, bold=False, colour=INK):
    text = QgsTextFormat()
    font = QFont("DejaVu Sans")
    font.setBold(bold)
    text.setFont(font)
    text.setSize(size)
    text.setColor(QColor(colour))
    return text


def _label(layout, text, x, y, w, h, size, bold=False, colour=INK):
    label = QgsLayoutItemLabel(layout)
    label.setText(text)
    if hasattr(label, "setTextFormat"):  # 3.24 and later
        label.setTextFormat(_text_format(size, bold, colour))
    else:  # 3.22
        font = QFont("DejaVu Sans")
        font.setPointSizeF(size)
        font.setBold(bold)
        label.setFont(font)
        label.setFontColor(QColor(colour))
    layout.addLayoutItem(label)
    label.attemptMove(QgsLayoutPoint(x, y))
    label.attemptResize(QgsLayoutSize(w, h))
    return label


def _layers_extent(project, map_layers):
    """The layers' joint extent in the project's CRS, 6 % larger."""
    crs = project.crs()
    boxes = []
    for layer in map_layers:
        box = layer.extent()
        if layer.crs() != crs:
            box = QgsCoordinateTransform(layer.crs(), crs, project).transformBoundingBox(box)
        if not box.isEmpty():
            boxes.append((box.xMinimum(), box.yMinimum(), box.xMaximum(), box.yMaximum()))
    extent = QgsRectangle(min(b[0] for b in boxes), min(b[1] for b in boxes), max(b[2] for b in boxes),
                          max(b[3] for b in boxes))
    extent.scale(1.06)
    return extent


def _add_map(layout, project, map_layers, map_height):
    """The map item: the layers, framed, centred on their extent at the item's aspect ratio."""
    extent = _layers_extent(project, map_layers)
    chart = QgsLayoutItemMap(layout)
    chart.setCrs(project.crs())
    chart.setLayers(list(map_layers))
    chart.setKeepLayerSet(True)
    chart.setFrameEnabled(True)
    chart.setFrameStrokeColor(QColor(INK))
    layout.addLayoutItem(chart)
    chart.attemptMove(QgsLayoutPoint(10, 25))
    chart.attemptResize(QgsLayoutSize(MAP_WIDTH, map_height))
    ratio = float(MAP_WIDTH) / map_height
    width, height = max(extent.width(), extent.height() * ratio), max(extent.height(), extent.width() / ratio)
    centre = extent.center()
    chart.setExtent(QgsRectangle(centre.x() - width / 2, centre.y() - height / 2, centre.x() + width / 2,
                                 centre.y() + height / 2))
    return chart


def _add_north_arrow_and_scale_bar(layout, chart, map_height):
    arrow = QgsLayoutItemPicture(layout)
    arrow.setPicturePath("base64:" + base64.b64encode(NORTH_ARROW_SVG.encode("utf-8")).decode("ascii"))
    layout.addLayoutItem(arrow)
    arrow.attemptMove(QgsLayoutPoint(196, 28))
    arrow.attemptResize(QgsLayoutSize(10, 15))
    bar = QgsLayoutItemScaleBar(layout)
    bar.setStyle("Single Box")
    bar.setLinkedMap(chart)
    bar.applyDefaultSize(compat.DISTANCE_KILOMETERS)
    bar.setUnitLabel("km")
    bar.setNumberOfSegmentsLeft(0)
    bar.setBackgroundEnabled(True)
    bar.setBackgroundColor(QColor(255, 255, 255, 220))
    layout.addLayoutItem(bar)
    bar.attemptMove(QgsLayoutPoint(13, 25 + map_height - 14))


def _add_legend(layout, chart, map_layers, map_height):
    """A legend of the map's layers only, each named by its title when it has one."""
    legend = QgsLayoutItemLegend(layout)
    legend.setTitle("Legend")
    legend.setLinkedMap(chart)
    legend.setAutoUpdateModel(False)
    root = legend.model().rootGroup()
    root.removeAllChildren()
    for layer in map_layers:
        node = root.addLayer(layer)
        if layer.title():
            node.setUseLayerName(False)
            node.setName(layer.title())
    legend.setStyleFont(compat.LEGEND_TITLE, _text_format(11, bold=True).font())
    legend.setSymbolWidth(6)
    legend.setSymbolHeight(4)
    legend.setWrapString("¶")
    layout.addLayoutItem(legend)
    legend.attemptMove(QgsLayoutPoint(215, 25))
    legend.attemptResize(QgsLayoutSize(72, map_height))
    legend.setResizeToContents(False)
    legend.adjustBoxSize()


def add_attribute_table(layout, layer, columns, x, y, width, height):
    """An attribute table of ``layer`` in one frame; ``columns``: ``[(field, heading, decimals), ...]``.

    Each column is an expression field added to ``layer`` (``print_<field>``, saved with the
    project): the value with ``decimals`` places and thousands separators, or a dash when it
    is missing, under ``heading`` as its alias. The columns are chosen with
    ``setDisplayedFields``: on QGIS 3.22, ``setColumns`` with fewer columns than the layer
    has fields corrupts the heap when the layout is rendered.
    """
    fields = layer.fields()
    if not columns:
        columns = [
            (f.name(), f.name(), 2 if f.isNumeric() and f.typeName().lower().startswith(("real", "double")) else None)
            for f in list(fields)[:10] if f.name() != "fid"
        ]
    shown = []
    for name, heading, decimals in columns:
        if fields.lookupField(name) < 0:
            continue
        value = f'format_number("{name}", {decimals})' if decimals is not None else f'to_string("{name}")'
        display = f"print_{name}"
        existing = layer.fields().lookupField(display)
        if existing >= 0:
            layer.removeExpressionField(existing)
        layer.addExpressionField(f"coalesce({value}, '–')", compat.make_field(display, "string"))
        layer.setFieldAlias(layer.fields().lookupField(display), heading)
        shown.append(display)
    table = QgsLayoutItemAttributeTable.create(layout)
    table.setVectorLayer(layer)
    table.setDisplayedFields(shown)
    table.setMaximumNumberOfFeatures(20)
    table.setHeaderTextFormat(_text_format(7.5, bold=True))
    table.setContentTextFormat(_text_format(7.5))
    table.setGridColor(QColor("#d7dedc"))
    layout.addMultiFrame(table)
    frame = QgsLayoutFrame(layout, table)
    frame.attemptMove(QgsLayoutPoint(x, y))
    frame.attemptResize(QgsLayoutSize(width, height))
    table.addFrame(frame)
    return table


def export_pdf(layout, path):
    """Export ``layout`` to a PDF at ``path``; raise RuntimeError when the host cannot."""
    settings = QgsLayoutExporter.PdfExportSettings()
    settings.dpi = 200
    settings.textRenderFormat = compat.TEXT_ALWAYS_TEXT  # real text: the PDF can be searched and read aloud
    result = QgsLayoutExporter(layout).exportToPdf(str(path), settings)
    if result != compat.EXPORT_SUCCESS:
        raise RuntimeError(f"the print layout could not be exported to {path} (code {result})")
    return path


def show_in_canvas(project, map_layers):
    """The project opens on the print map: ``map_layers`` shown in their order (first on top),
    every other layer kept below them (points, lines, polygons, rasters) and switched off."""
    def rank(layer):
        if isinstance(layer, QgsRasterLayer):
            return 9
        return {0: 1, 1: 2, 2: 3}.get(int(layer.geometryType()), 4)

    others = sorted((layer for layer in project.mapLayers().values() if layer not in map_layers), key=rank)
    root = project.layerTreeRoot()
    root.setHasCustomLayerOrder(True)
    root.setCustomLayerOrder(list(map_layers) + others)
    for layer in project.mapLayers().values():
        node = root.findLayer(layer.id())
        if node is not None:
            node.setItemVisibilityChecked(layer in map_layers)
