"""Self-contained HTML reports (tables and inline SVG). Never imports the host."""
from .html import FIELD_SAFETY_CAUTION, Report, escape, format_number  # noqa: F401
from .svg import MapLayer, bar_chart_svg, category_colour, histogram_svg, interval_chart_svg, line_chart_svg, map_svg  # noqa: F401
