"""The shared report builder: escaping and cell formatting (the HTML standard's escaping as the reference)."""
import html

from plotwise.processing.report import Report


def test_cells_are_escaped_and_booleans_read_as_words():
    report = Report("<b>t</b>", translate=lambda context, s: {"yes": "oui", "no": "non"}.get(s, s))
    report.table(["a & b", "flag"], [["<script>x</script>", True], ["'q'", False]])
    page = report.render()
    assert "<script>x</script>" not in page and html.escape("<script>x</script>") in page  # Python's html.escape
    assert "<td>oui</td>" in page and "<td>non</td>" in page and "True" not in page
    assert html.escape("<b>t</b>") in page
