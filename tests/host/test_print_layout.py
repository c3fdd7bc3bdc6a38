"""The print layout (processing/print_layout.py, used by the demo chain): built on the demo reserve, exported
to PDF, checked as an image.

Outside references: poppler's ``pdfinfo`` (page count and size), ``pdftoppm`` (the page as a
PNG), ``pdftotext`` (the words on the page); ISO 216 for the A4 size (297 mm × 210 mm,
841.89 × 595.28 pt).
"""
import re
import shutil
import subprocess
import unicodedata
from pathlib import Path

import pytest

POPPLER = all(shutil.which(tool) for tool in ("pdfinfo", "pdftoppm", "pdftotext"))
pytestmark = pytest.mark.skipif(not POPPLER, reason="poppler-utils is not installed (`make setup` installs it)")
DPI = 50
TITLE = "Hollin Ridge Reserve (invented): print test"


@pytest.fixture(scope="module")
def exported(demo_reserve_outputs, tmp_path_factory):
    from qgis.core import QgsProject, QgsVectorLayer

    from plotwise.processing import print_layout, styles

    folder = tmp_path_factory.mktemp("print_layout")
    project = QgsProject()
    project.setTitle(TITLE)
    layers = []
    for name, key, style in (("Simulated velmar", "OUTPUT_ANIMALS", "animals"),
                             ("Excluded areas", "OUTPUT_EXCLUDED", "excluded"),
                             ("Reserve boundary", "OUTPUT_AREA", "outline")):
        layer = QgsVectorLayer(demo_reserve_outputs[key], name, "ogr")
        assert layer.isValid(), name
        assert styles.apply_style(layer, style)
        project.addMapLayer(layer)
        layers.append(layer)
    project.setCrs(layers[-1].crs())
    columns = [("kind", "Kind", None), ("name", "Name", None), ("area_ha", "Area (ha)", 1)]
    layout = print_layout.add_print_layout(project, TITLE, layers, layers[1], columns, note="test")
    pdf = print_layout.export_pdf(layout, folder / "map.pdf")
    project_path = folder / "map.qgz"
    assert project.write(str(project_path))
    subprocess.run(["pdftoppm", "-r", str(DPI), "-png", "-singlefile", str(pdf), str(folder / "page")], check=True,
                   timeout=60)
    del layout
    yield {"pdf": Path(pdf), "png": folder / "page.png", "project": project_path}
    # tear down in order (layouts, then layers): a standalone project can crash when left to the collector
    project.layoutManager().clear()
    project.removeAllMapLayers()


def test_one_a4_landscape_page(exported):
    info = subprocess.run(["pdfinfo", str(exported["pdf"])], capture_output=True, text=True, check=True).stdout
    assert re.search(r"^Pages:\s+1$", info, re.M)
    width, height = map(float, re.search(r"Page size:\s+([\d.]+) x ([\d.]+) pts", info).groups())
    assert width == pytest.approx(841.89, abs=1.0)  # ISO 216 A4, landscape
    assert height == pytest.approx(595.28, abs=1.0)


def test_page_image_has_the_expected_size_and_is_not_blank(exported):
    from qgis.PyQt.QtGui import QColor, QImage

    image = QImage(str(exported["png"]))
    assert not image.isNull()
    assert abs(image.width() - 297 / 25.4 * DPI) <= 1  # A4 at 50 dpi
    assert abs(image.height() - 210 / 25.4 * DPI) <= 1

    def px(mm):
        return int(mm / 25.4 * DPI)

    def region(x0, y0, x1, y1):
        """Colours of the pixels in a box given in millimetres on the page."""
        return [QColor(image.pixel(x, y)) for x in range(px(x0), px(x1)) for y in range(px(y0), px(y1))]

    def ink_share(pixels):
        return sum(1 for c in pixels if c.lightness() < 200) / len(pixels)

    page = region(0, 0, 297, 210)
    assert ink_share(page) > 0.02  # something is drawn
    assert len({c.rgb() for c in page}) > 50  # in many colours (map, symbols, text)
    map_box = region(12, 27, 208, 141)  # the map item (10–210 mm × 25–143 mm)
    assert ink_share(map_box) > 0.01
    # the excluded areas' hatching is drawn in our bark colour (within antialiasing)
    bark = QColor(styles_colour("EXCLUDED_COLOUR"))
    assert any(abs(c.red() - bark.red()) + abs(c.green() - bark.green()) + abs(c.blue() - bark.blue()) < 60
               and c.lightness() < 220 for c in map_box)
    assert ink_share(region(10, 147, 287, 175)) > 0.005  # the table
    assert ink_share(region(215, 25, 287, 80)) > 0.005  # the legend
    assert ink_share(region(10, 5, 200, 17)) > 0.02  # the title


def styles_colour(name):
    from plotwise.processing import styles

    return getattr(styles, name)


def test_pdf_holds_title_date_legend_scale_table_and_caution(exported):
    text = subprocess.run(["pdftotext", "-layout", str(exported["pdf"]), "-"], capture_output=True, text=True,
                          check=True).stdout
    words = " ".join(unicodedata.normalize("NFKC", text).split())  # NFKC: ligatures such as "ﬁ" to "fi"
    assert TITLE in words
    assert re.search(r"Printed \d{4}-\d{2}-\d{2}", words)  # the date, evaluated when printed
    for expected in ("Legend", "Reserve boundary", "Excluded areas", "km", "Kind", "Area (ha)", "Tarnmere",
                     "inholding", "field-safety"):
        assert expected in words, expected


def test_layout_travels_in_the_project(exported):
    from qgis.core import QgsProject

    from plotwise.processing.print_layout import PRINT_LAYOUT_NAME

    project = QgsProject()
    assert project.read(str(exported["project"]))
    try:
        check_read_back(project, project.layoutManager().layoutByName(PRINT_LAYOUT_NAME))
    finally:
        project.layoutManager().clear()
        project.removeAllMapLayers()


def check_read_back(project, layout):
    from qgis.core import (
        QgsLayoutItemAttributeTable,
        QgsLayoutItemLegend,
        QgsLayoutItemMap,
        QgsLayoutItemPicture,
        QgsLayoutItemScaleBar,
    )

    assert layout is not None
    kinds = [type(item) for item in layout.items()]
    for kind in (QgsLayoutItemMap, QgsLayoutItemLegend, QgsLayoutItemScaleBar, QgsLayoutItemPicture):
        assert kind in kinds, kind.__name__
    tables = [m for m in layout.multiFrames() if isinstance(m, QgsLayoutItemAttributeTable)]
    assert len(tables) == 1 and tables[0].vectorLayer().name() == "Excluded areas"
    headings = [c.heading() for c in tables[0].columns()]
    assert headings == ["Kind", "Name", "Area (ha)"]
    # the styles travel too
    layers = {layer.name(): layer for layer in project.mapLayers().values()}
    symbol = layers["Excluded areas"].renderer().symbol().symbolLayer(0).properties()
    assert symbol["style"] == "b_diagonal"


def test_survey_map_with_the_estimate_table(demo_reserve_outputs, tmp_path):
    """The demo's print step (print_survey_map) on the reserve layers and a small estimate table."""
    from osgeo import ogr
    from qgis.core import QgsProject, QgsVectorLayer

    from plotwise.processing import print_layout, styles

    # an estimate table with the pinned fields (invented numbers), as plotwise:estimate writes it
    gpkg = tmp_path / "demo.gpkg"
    source = ogr.GetDriverByName("GPKG").CreateDataSource(str(gpkg))
    table = source.CreateLayer("estimate_table", geom_type=ogr.wkbNone)
    names = ["stratum", "area", "n", "mean_c", "sd_c", "dens", "dens_se", "dens_lo", "dens_hi", "abund", "abund_se",
             "abund_lo", "abund_hi", "cv", "df", "n_next"]
    for name in names:
        table.CreateField(ogr.FieldDefn(name, ogr.OFTString if name == "stratum" else ogr.OFTReal))
    for row in (["1", 40.0, 10, 1.2, 0.9, 7.5, 1.1, 5.2, 9.8, 300.0, 44.0, 208.0, 392.0, 0.147, 9.0, 12],
                ["all", 40.0, 10, 1.2, 0.9, 7.5, 1.1, 5.2, 9.8, 300.0, 44.0, 208.0, 392.0, 0.147, 9.0, None]):
        feature = ogr.Feature(table.GetLayerDefn())
        for name, value in zip(names, row):
            if value is not None:
                feature.SetField(name, value)
        table.CreateFeature(feature)
    source = None

    project = QgsProject.instance()
    project.clear()
    project.setTitle(TITLE)
    try:
        layers = {}
        for name, key, style in (("Reserve boundary", "OUTPUT_AREA", "outline"),
                                 ("Excluded areas", "OUTPUT_EXCLUDED", "excluded"),
                                 ("Simulated velmar", "OUTPUT_ANIMALS", "animals")):
            layers[name] = QgsVectorLayer(demo_reserve_outputs[key], name, "ogr")
            styles.apply_style(layers[name], style)
            project.addMapLayer(layers[name])
        project.setCrs(layers["Reserve boundary"].crs())
        estimates = QgsVectorLayer(f"{gpkg}|layername=estimate_table", "Estimate table", "ogr")
        assert estimates.isValid()
        project.addMapLayer(estimates)
        pdf = print_layout.print_survey_map(
            project, [layers["Excluded areas"], layers["Reserve boundary"]], estimates,
            print_layout.estimate_table_columns("km²"), tmp_path / "demo.qgz", tmp_path / "demo.pdf", note="test")
        text = subprocess.run(["pdftotext", "-layout", str(pdf), "-"], capture_output=True, text=True,
                              check=True).stdout
        words = " ".join(unicodedata.normalize("NFKC", text).split())
        # NFKC also turns "km²" into "km2"
        for expected in ("Density per km2", "Units next time", "all", "7.50", "208", "392", "0.147",
                         "Reserve boundary"):
            assert expected in words, expected
        assert "NULL" not in words  # a missing value prints as a dash
        root = project.layerTreeRoot()
        shown = {node.name(): node.isVisible() for node in root.findLayers()}
        assert shown["Reserve boundary"] and shown["Excluded areas"] and not shown["Simulated velmar"]
        assert root.customLayerOrder()[0].name() == "Excluded areas"  # print layers first, on top
        assert (tmp_path / "demo.qgz").is_file()
    finally:
        project.layoutManager().clear()
        project.clear()
