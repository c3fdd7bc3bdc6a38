"""The shared style sheet of every report: our own palette, print- and colour-blind-friendly."""

# Palette (our own): deep teal ink, warm sand background accents, ochre for cautions.
INK = "#1f3a44"
ACCENT = "#2b6e74"
MUTED = "#5f6f73"
RULE = "#d7dedc"
CAUTION_BG = "#fff4dc"
CAUTION_EDGE = "#a66d2c"
WARN_BG = "#fdeceb"
WARN_EDGE = "#b4443b"

# Qualitative palette for strata and categories (distinguishable with common colour-vision deficiencies).
CATEGORY_COLOURS = (
    "#3b6e8f",  # slate blue
    "#e0a43a",  # amber
    "#5c9e6e",  # sage green
    "#c8553d",  # brick
    "#8e6bb0",  # heather
    "#4fb3bf",  # lagoon
    "#a8875b",  # bark
    "#d98fb0",  # rose
    "#7f8c3a",  # moss
    "#2f4858",  # night
)

STYLE_SHEET = f"""
*{{box-sizing:border-box}}
body{{margin:0;background:#f6f4ef;color:{INK};font:15px/1.5 "DejaVu Sans",Verdana,Arial,sans-serif}}
main{{max-width:980px;margin:0 auto;padding:16px 20px 40px;background:#fff;min-height:100vh}}
.report-head{{border-bottom:3px solid {ACCENT};margin-bottom:16px}}
.brand{{font-size:12px;letter-spacing:.18em;text-transform:uppercase;color:{ACCENT};font-weight:bold}}
h1{{font-size:24px;margin:2px 0 4px}}
h2{{font-size:18px;margin:26px 0 8px;border-bottom:1px solid {RULE};padding-bottom:3px}}
h3{{font-size:15px;margin:18px 0 6px}}
.meta{{color:{MUTED};font-size:12px;margin:0 0 10px}}
p{{margin:6px 0 10px;overflow-wrap:anywhere}}
.note{{background:#eef5f4;border-left:4px solid {ACCENT};padding:8px 10px}}
.caution{{display:block;background:{CAUTION_BG};border-left:5px solid {CAUTION_EDGE};padding:10px 12px;margin:12px 0}}
.warnings{{background:{WARN_BG};border-left:5px solid {WARN_EDGE};padding:2px 12px 6px;margin:12px 0}}
.warnings h2{{border:0;margin-top:8px}}
.table-wrap{{max-width:100%;overflow-x:auto;margin:6px 0 14px}}
table{{border-collapse:collapse;font-size:13px;min-width:40%}}
caption{{text-align:left;color:{MUTED};font-size:12px;padding:2px 0}}
th,td{{border-bottom:1px solid {RULE};padding:4px 9px;text-align:left;vertical-align:top;overflow-wrap:anywhere}}
th{{background:#edf2f1;font-weight:bold;overflow-wrap:normal}}
td.num{{text-align:right;font-variant-numeric:tabular-nums;white-space:nowrap}}
figure{{margin:10px 0 18px;max-width:100%}}
figure svg{{max-width:100%;height:auto;display:block;border:1px solid {RULE};background:#fff}}
figcaption{{color:{MUTED};font-size:12px;margin-top:4px}}
.figures{{display:flex;flex-wrap:wrap;gap:10px;margin:10px 0}}
.figure-box{{flex:1 1 160px;border:1px solid {RULE};border-top:4px solid {ACCENT};padding:8px 10px}}
.figure-value{{font-size:20px;font-weight:bold}}
.figure-label{{color:{MUTED};font-size:12px}}
.refs ol{{padding-left:22px;font-size:13px}}
@media print{{body{{background:#fff}}main{{max-width:none;padding:0}}.table-wrap{{overflow:visible}}}}
"""

# Sequential ramp for probabilities (occupancy), light to dark; shared by the report maps and the layer style.
PROBABILITY_RAMP = ("#f5efd9", "#d9e4bf", "#9cc7a4", "#4f9a8f", "#2a6475", "#1f3a44")
