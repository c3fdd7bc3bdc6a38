"""Every report the algorithms write, rendered in headless Chromium (Debian ``chromium``).

How it is checked, and why this way:

* **Reports come from real runs.** A small invented chain runs through the host's
  Processing framework (demo reserve → frame → stratification → design comparison;
  invented strata → allocation → layout → simulated counts → estimate; line transects → simulated sightings →
  distance density). Every provider algorithm with a ``REPORT`` output must be in the chain.
* **No external request, two ways.**
  1. A static scan of the written HTML and of the DOM as Chromium parsed it (read from
     the measuring frames below): no script, link, iframe, object, embed or base element, and every
     ``src``/``href``/``xlink:href``/``srcset``/``action``/``poster``/``data`` attribute and
     every CSS ``url(...)`` or ``@import`` points inside the document (``#fragment`` or
     ``data:``).
  2. Chromium's own network log (``--log-net-log``) while it renders each report, with
     ``--host-resolver-rules="MAP * ~NOTFOUND"`` so that nothing can leave the machine even
     if a request were made. Chromium makes background requests of its own (updates,
     accounts); those carry the initiator "not an origin". A request from the page carries
     the page's initiator and a ``file://`` network isolation key; there must be none. A canary
     page with an external image proves that such a request is seen.
* **Nothing overflows its width at 1,024 px.** Nothing is injected into a report. A
  wrapper page (the test's own, with a measuring script) holds each report unchanged in an
  ``<iframe srcdoc>`` exactly 1,024 px wide, sandboxed without scripts; ``srcdoc`` frames
  share the wrapper's origin (``allow-same-origin``), so the script can read their layout. For every element it
  checks that the right edge lies within the frame's width, and that no element with clipped or scrolled
  overflow (such as the horizontal scroller around a wide table) is wider inside than its box. The document's
  ``scrollWidth`` must equal its ``clientWidth``. The result is written into the wrapper's DOM
  and read with ``--dump-dom``. A canary frame with a 1,200 px wide block proves the
  measurement sees an overflow.
* **Hostile strings.** A layer name and stratum values holding ``<script>``, an ``<img>``
  with an event handler, quotes and ``&`` go through a real run of every reporting
  algorithm; the written HTML holds them escaped, and in Chromium's DOM they created no
  element and no handler and read as the plain text given (a canary page without escaping
  proves the inspection sees the difference).
* **PNG at 1,024 px.** Each report is screenshotted at 1,024 px wide and its full
  measured height; the PNG must have that width and must not be blank.

Set ``PLOTWISE_REPORT_PNG`` to a folder to keep the PNGs.
"""
import html
import html.parser
import json
import math
import os
import re
import shutil
import subprocess
from pathlib import Path

import numpy as np
import pytest

CHROMIUM = shutil.which("chromium")
pytestmark = pytest.mark.skipif(
    CHROMIUM is None, reason="Debian's chromium is not installed (`make setup` installs it)"
)
WIDTH = 1024
MAX_HEIGHT = 16000
HOSTILE_NAME = """<script>alert("x")</script> & 'q'"""
HOSTILE_VALUE = """<img src=x onerror="alert(1)"> "s" & 'v'"""

STRATA_ROWS = [  # stratum, area_ha (nominal), cov_sd, polygon (EPSG:32736, invented)
    (1, 600.0, 12.0, "POLYGON((500000 9000000, 503000 9000000, 503000 9002000, 500000 9002000, 500000 9000000))"),
    (2, 200.0, 30.0, "POLYGON((503000 9000000, 505000 9000000, 505000 9001000, 503000 9001000, 503000 9000000))"),
    (3, 150.0, 45.0, "POLYGON((503000 9001000, 505000 9001000, 504000 9002500, 503000 9001000))"),
]


# -- Chromium ------------------------------------------------------------------------
def chromium(tmp_path, *arguments, net_log=None, timeout=90):
    """Run headless Chromium with a fresh profile; return its stdout."""
    profile = tmp_path / f"profile-{len(list(tmp_path.glob('profile-*')))}"
    command = [
        CHROMIUM, "--headless", "--no-sandbox", "--disable-gpu", "--disable-quic", "--no-first-run",
        "--disable-background-networking", "--disable-component-update", "--disable-sync",
        "--disable-extensions", "--hide-scrollbars", "--mute-audio", f"--user-data-dir={profile}",
        "--host-resolver-rules=MAP * ~NOTFOUND",
    ]
    if net_log is not None:
        command.append(f"--log-net-log={net_log}")
    completed = subprocess.run(command + list(arguments), capture_output=True, text=True, timeout=timeout)
    assert completed.returncode == 0, completed.stderr[-2000:]
    return completed.stdout


def page_requests(net_log):
    """URLs the page itself asked the network for (not Chromium's own background requests)."""
    with open(net_log, encoding="utf-8") as handle:
        text = handle.read()
    try:
        log = json.loads(text)
    except json.JSONDecodeError:  # a log cut short at exit lacks its closing brackets
        log = json.loads(text.rstrip().rstrip(",") + "]}")
    start_job = log["constants"]["logEventTypes"]["URL_REQUEST_START_JOB"]
    urls = []
    for event in log["events"]:
        params = event.get("params") or {}
        if event.get("type") != start_job or "url" not in params:
            continue
        from_page = params.get("initiator") != "not an origin" or "file://" in params.get("network_isolation_key", "")
        if from_page:
            urls.append(params["url"])
    return urls


MEASURE = """
function check(doc, width) {
  var problems = [], all = doc.querySelectorAll('*');
  for (var i = 0; i < all.length; i++) {
    var el = all[i], box = el.getBoundingClientRect(), name = el.tagName.toLowerCase() +
        (el.className && el.className.baseVal === undefined ? '.' + el.className : '');
    if (box.width > 0 && box.right > width + 1) problems.push(name + ' ends at ' + Math.round(box.right) + ' px');
    var overflow = getComputedStyle(el).overflowX;
    if (overflow !== 'visible' && el.clientWidth > 0 && el.scrollWidth > el.clientWidth + 1)
      problems.push(name + ' scrolls: ' + el.scrollWidth + ' px inside ' + el.clientWidth + ' px');
    if (problems.length > 12) break;
  }
  var root = doc.documentElement;
  return {clientWidth: root.clientWidth, scrollWidth: root.scrollWidth, height: root.scrollHeight, problems: problems,
          dom: root.outerHTML};
}
"""

# Elements a hostile string could have turned into, event-handler attributes, and the text as read.
INSPECT = """
function check(doc, strings) {
  var elements = doc.querySelectorAll('script,img,iframe,object,embed,link,b,svg script').length, handlers = 0;
  var all = doc.querySelectorAll('*');
  for (var i = 0; i < all.length; i++)
    for (var j = 0; j < all[i].attributes.length; j++)
      if (all[i].attributes[j].name.indexOf('on') === 0) handlers++;
  var text = doc.body.textContent.replace(/\\s+/g, ' ');
  return {elements: elements, handlers: handlers, found: strings.map(function (s) { return text.indexOf(s) >= 0; })};
}
"""


def run_in_frames(folder, documents, check_source, argument, stem):
    """``{name: check(document, argument)}``: each HTML text in ``documents`` in its own 1,024 px
    ``<iframe srcdoc>`` of one wrapper page, ``check`` (JavaScript) run on load, read with
    ``--dump-dom``; also returns the page's network requests. The frames are sandboxed without
    scripts (``allow-same-origin`` only, so the wrapper can read them): a script that escaped
    into a report could not run, or block Chromium with a dialog."""
    frames = "".join(
        f'<iframe id="{html.escape(name)}" sandbox="allow-same-origin" '
        f'srcdoc="{html.escape(text, quote=True)}"></iframe>'
        for name, text in documents.items()
    )
    runner = (
        "window.addEventListener('load', function () {"
        " var out = {}, frames = document.querySelectorAll('iframe');"
        " for (var i = 0; i < frames.length; i++) out[frames[i].id] = check(frames[i].contentDocument, ARGUMENT);"
        " document.getElementById('result').textContent = JSON.stringify(out); });"
    )
    argument_js = json.dumps(argument).replace("<", "\\u003c")
    wrapper = folder / f"{stem}.html"
    wrapper.write_text(
        '<!DOCTYPE html><html><head><meta charset="utf-8"><style>body{margin:0}'
        f"iframe{{display:block;border:0;width:{WIDTH}px;height:800px}}</style></head><body>"
        f'<pre id="result"></pre>{frames}<script>var ARGUMENT = {argument_js};{check_source}{runner}</script>'
        "</body></html>",
        encoding="utf-8",
    )
    net_log = folder / f"{stem}-net.json"
    dom = chromium(folder, f"--window-size={WIDTH + 80},900", "--virtual-time-budget=10000", "--dump-dom",
                   wrapper.as_uri(), net_log=net_log)
    found = re.search(r'<pre id="result">(.*?)</pre>', dom, re.S)
    assert found and found.group(1), "the checking script did not run"
    return json.loads(html.unescape(found.group(1))), page_requests(net_log)


def measure_reports(folder, documents):
    """``{name: measurement}`` for each HTML text in ``documents`` rendered in a 1,024 px frame."""
    return run_in_frames(folder, documents, MEASURE, WIDTH, "measure")


# -- static scan ---------------------------------------------------------------------
class ExternalReferences(html.parser.HTMLParser):
    """Elements and attributes that could load something from outside the document."""

    FORBIDDEN_TAGS = {"script", "link", "iframe", "frame", "object", "embed", "base", "applet", "audio", "video",
                      "source"}
    URL_ATTRIBUTES = {"src", "href", "xlink:href", "srcset", "action", "formaction", "poster", "data", "background",
                      "manifest"}

    def __init__(self):
        super().__init__(convert_charrefs=True)
        self.problems, self.text, self._in_style = [], [], False

    @staticmethod
    def internal(value):
        value = (value or "").strip()
        return value.startswith("#") or value.startswith("data:")

    def css(self, text, where):
        for target in re.findall(r"url\(\s*['\"]?([^'\")]*)", text, re.I):
            if not self.internal(target):
                self.problems.append(f"{where}: url({target})")
        if re.search(r"@import", text, re.I):
            self.problems.append(f"{where}: @import")

    def handle_starttag(self, tag, attrs):
        if tag in self.FORBIDDEN_TAGS:
            self.problems.append(f"<{tag}>")
        for name, value in attrs:
            if name in self.URL_ATTRIBUTES and not self.internal(value):
                self.problems.append(f"<{tag} {name}={value!r}>")
            if name == "style":
                self.css(value or "", f"<{tag} style>")
            if name.startswith("on"):
                self.problems.append(f"<{tag} {name}> (event handler)")
        self._in_style = tag == "style"

    def handle_endtag(self, tag):
        self._in_style = False

    def handle_data(self, data):
        if self._in_style:
            self.css(data, "<style>")
        self.text.append(data)


def scan(markup):
    parser = ExternalReferences()
    parser.feed(markup)
    parser.close()
    return parser


# -- the chain -----------------------------------------------------------------------
def memory_layer(geometry, name, fields, rows, wkts, crs="EPSG:32736"):
    from qgis.core import QgsFeature, QgsGeometry, QgsVectorLayer

    from plotwise.processing import compat

    layer = QgsVectorLayer(f"{geometry}?crs={crs}", name, "memory")
    layer.dataProvider().addAttributes([compat.make_field(n, k) for n, k in fields])
    layer.updateFields()
    features = []
    for row, wkt in zip(rows, wkts):
        feature = QgsFeature(layer.fields())
        feature.setAttributes(list(row))
        feature.setGeometry(QgsGeometry.fromWkt(wkt))
        features.append(feature)
    layer.dataProvider().addFeatures(features)
    return layer


def strata_layer(name="strata", labels=None):
    kind = "string" if labels else "int"
    rows = [[labels[i] if labels else s, a, sd] for i, (s, a, sd, _) in enumerate(STRATA_ROWS)]
    return memory_layer("Polygon", name, [("stratum", kind), ("area_ha", "double"), ("cov_sd", "double")],
                        rows, [w for *_, w in STRATA_ROWS])


def animals_layer(seed=7, n=900):
    """Invented animals, denser in the east, drawn with numpy inside the strata's bounding box."""
    rng = np.random.default_rng(seed)
    x = 500000 + 5000 * rng.beta(2.0, 1.2, n)
    y = 9000000 + 2500 * rng.random(n)
    return memory_layer("Point", "animals", [("animal_id", "int")], [[i + 1] for i in range(n)],
                        [f"POINT({a} {b})" for a, b in zip(x, y)])


def output_layer(value):
    """An output of a run: a layer object, the id of a layer loaded into the project, or a source."""
    if not isinstance(value, str):
        return value
    from qgis.core import QgsProcessingContext, QgsProcessingUtils, QgsProject

    loaded = QgsProject.instance().mapLayer(value)
    return loaded if loaded is not None else QgsProcessingUtils.mapLayerFromString(value, QgsProcessingContext())


def run_chain(folder, demo_reserve_outputs, strata=None, name=None, run=None):
    """Run every reporting algorithm on small inputs; return ``{algorithm id: report path}``.

    ``strata``: the strata layer for allocation, layout and estimate (default: three
    invented rectangles); ``name``: a name given to every input layer of the chain; ``run``:
    how to run an algorithm (default ``processing.run``).
    """
    import processing
    from qgis.core import QgsVectorLayer

    run = run or processing.run

    reports = {"plotwise:demoreserve": demo_reserve_outputs["REPORT"]}

    def report(name):
        return str(folder / f"{name}.html")

    study = QgsVectorLayer(demo_reserve_outputs["OUTPUT_AREA"], name or "study area", "ogr")
    excluded = QgsVectorLayer(demo_reserve_outputs["OUTPUT_EXCLUDED"], "excluded", "ogr")
    frame = run("plotwise:buildframe", {
        "INPUT": study, "EXCLUDE": excluded, "EDGE_BUFFER": 50.0, "OUTPUT": "memory:",
        "REPORT": report("buildframe"),
    })
    reports["plotwise:buildframe"] = frame["REPORT"]
    frame_layer = output_layer(frame["OUTPUT"])
    if name:
        frame_layer.setName(name)

    strata_from_rasters = run("plotwise:stratify", {
        "FRAME": frame_layer,
        "COVARIATES": [demo_reserve_outputs["OUTPUT_GREENNESS"], demo_reserve_outputs["OUTPUT_ELEVATION"]],
        "METHOD": 0, "STRATA": 3, "MIN_AREA": 0.0, "SEED": 5,
        "OUTPUT_RASTER": str(folder / "strata.tif"), "OUTPUT": "memory:", "REPORT": report("stratify"),
    })
    reports["plotwise:stratify"] = strata_from_rasters["REPORT"]

    compared = run("plotwise:comparedesigns", {
        "SURFACE": demo_reserve_outputs["OUTPUT_INTENSITY"], "FRAME": frame_layer,
        "STRATA": output_layer(strata_from_rasters["OUTPUT"]), "STRATUM_FIELD": "stratum",
        "DESIGNS": [0, 1, 2, 3, 4], "N_UNITS": 15, "SHAPE": 1, "SIZE": 200.0, "REPLICATES": 20,
        "N_RANGE": "10, 30", "SEED": 9, "OUTPUT_TABLE": "memory:", "REPORT": report("comparedesigns"),
    })
    reports["plotwise:comparedesigns"] = compared["REPORT"]

    allocated = run("plotwise:allocate", {
        "STRATA": strata or strata_layer(), "STRATUM_FIELD": "stratum", "AREA_FIELD": "area_ha",
        "METHOD": 2, "TOTAL": 24, "UNIT_AREA": 10000.0, "MIN_PER_STRATUM": 3,
        "OUTPUT": "memory:", "REPORT": report("allocate"),
    })
    reports["plotwise:allocate"] = allocated["REPORT"]

    layout = run("plotwise:layout", {
        "FRAME": output_layer(allocated["OUTPUT"]), "STRATUM_FIELD": "stratum", "N_FIELD": "n_alloc",
        "N_UNITS": 0, "DESIGN": 2, "SHAPE": 2, "SIZE": 56.5, "BEARING": -1.0, "INSIDE": True,
        "MIN_SPACING": 50.0, "RESERVE": 2, "SEED": 123, "OUTPUT": "memory:",
        "OUTPUT_GPX": str(folder / "units.gpx"), "REPORT": report("layout"),
    })
    reports["plotwise:layout"] = layout["REPORT"]

    counted = output_layer(run("plotwise:simulatecounts", {
        "UNITS": output_layer(layout["OUTPUT"]), "ANIMALS": animals_layer(), "DETECTION": 1.0, "SEED": 5,
        "OUTPUT": "memory:",
    })["OUTPUT"])
    if name:
        counted.setName(name)
    estimate = run("plotwise:estimate", {
        "UNITS": counted, "COUNT_FIELD": "count", "STRATUM_FIELD": "stratum", "UNIT_AREA_FIELD": "area_m2",
        "STRATA": output_layer(allocated["OUTPUT"]), "STRATA_ID_FIELD": "stratum", "AREA_UNIT": 1,
        "TARGET_CV": 0.2, "SEED": 3, "OUTPUT": "memory:", "OUTPUT_TABLE": "memory:",
        "REPORT": report("estimate"),
    })
    reports["plotwise:estimate"] = estimate["REPORT"]

    stations = run("plotwise:stations", {
        "FRAME": frame_layer, "N_STATIONS": 24, "ARRAY": 1, "HOME_RANGE": 2.0, "SPACING": 0.0, "SPACING_RULE": 1,
        "CLUSTER_SIZE": 4, "MIN_SPACING": 0.0, "RESERVE": 1, "SEED": 6, "SERVICE_HOURS": 1.5,
        "OUTPUT": "memory:", "OUTPUT_GPX": str(folder / "stations.gpx"), "REPORT": report("stations"),
    })
    reports["plotwise:stations"] = stations["REPORT"]
    detected = output_layer(run("plotwise:simulatedetections", {
        "STATIONS": output_layer(stations["OUTPUT"]),
        "ANIMALS": QgsVectorLayer(demo_reserve_outputs["OUTPUT_ANIMALS"], "animals", "ogr"), "OCCASIONS": 6,
        "P_MAX": 0.6, "SIGMA": 500.0, "NOT_SURVEYED": 0.1, "SEED": 7, "OUTPUT": "memory:",
    })["OUTPUT"])
    if name:
        detected.setName(name)
    occupancy = run("plotwise:occupancy", {
        "SITES": detected, "SITE_ID_FIELD": "station", "HISTORY_FIELDS": [f"det_{j:02d}" for j in range(1, 7)],
        "CONFIDENCE": 0.95, "TARGET_SE": 0.05, "GOF_REPLICATES": 20, "SEED": 8,
        "OUTPUT": "memory:", "OUTPUT_TABLE": "memory:", "REPORT": report("occupancy"),
    })
    reports["plotwise:occupancy"] = occupancy["REPORT"]

    transects = run("plotwise:layout", {
        "FRAME": output_layer(allocated["OUTPUT"]), "STRATUM_FIELD": "stratum", "N_UNITS": 24, "DESIGN": 0,
        "SHAPE": 3, "SIZE": 500.0, "BEARING": -1.0, "INSIDE": False, "SEED": 17, "OUTPUT": "memory:",
        "REPORT": report("layout_transects"),
    })
    sighted = run("plotwise:simulatecounts", {
        "UNITS": output_layer(transects["OUTPUT"]), "ANIMALS": animals_layer(), "SEED": 18,
        "DETECTION_FUNCTION": 1, "SIGMA": 50.0, "OUTPUT": "memory:", "OUTPUT_OBSERVATIONS": "memory:",
    })
    sighted_units = output_layer(sighted["OUTPUT"])
    if name:
        sighted_units.setName(name)
    distance = run("plotwise:distancedensity", {
        "UNITS": sighted_units, "OBSERVATIONS": output_layer(sighted["OUTPUT_OBSERVATIONS"]),
        "STRATA": output_layer(allocated["OUTPUT"]), "STRATA_ID_FIELD": "stratum", "AREA_UNIT": 1, "SEED": 4,
        "OUTPUT": "memory:", "OUTPUT_MODELS": "memory:", "REPORT": report("distancedensity"),
    })
    reports["plotwise:distancedensity"] = distance["REPORT"]

    panels = run("plotwise:panels", {
        "UNITS": output_layer(layout["OUTPUT"]), "PANEL_DESIGN": 2, "PANELS": 3, "CORE_SHARE": 0.3,
        "START_YEAR": 2030, "YEARS": 9, "UNIT_DAYS": 0.5, "SEED": 2, "OUTPUT": "memory:",
        "OUTPUT_SCHEDULE": "memory:", "REPORT": report("panels"),
    })
    reports["plotwise:panels"] = panels["REPORT"]
    power = run("plotwise:trendpower", {
        "N_UNITS": 30, "YEARS": 8, "PANEL_DESIGN": 2, "PANELS": 3, "CORE_SHARE": 0.3, "CHANGES": "-4, -8",
        "REPLICATES": 60, "SEED": 4, "OUTPUT_TABLE": "memory:", "REPORT": report("trendpower"),
    })
    reports["plotwise:trendpower"] = power["REPORT"]
    trend = run("plotwise:trend", {
        "INPUT": yearly_counts(counted, name or "unit counts"), "SOURCE": 0, "STRATUM_FIELD": "stratum",
        "OUTPUT_TABLE": "memory:", "REPORT": report("trend"),
    })
    reports["plotwise:trend"] = trend["REPORT"]
    return reports


def yearly_counts(units, name, years=8, seed=3):
    """Invented counts of the counted units over several years (a decline of 5% a year), a table named ``name``
    with the units' own stratum values."""
    rng = np.random.default_rng(seed)
    rows = []
    for feature in units.getFeatures():
        if feature["role"] != "primary":
            continue
        level = rng.normal(1.0, 0.6)
        for t in range(years):
            rows.append([feature["unit_id"], 2020 + t, int(rng.poisson(np.exp(level - 0.05 * t))),
                         str(feature["stratum"])])
    from qgis.core import QgsFeature, QgsVectorLayer

    from plotwise.processing import compat

    layer = QgsVectorLayer("None", name, "memory")
    layer.dataProvider().addAttributes([compat.make_field(n, k) for n, k in
                                        (("unit_id", "string"), ("year", "int"), ("count", "int"),
                                         ("stratum", "string"))])
    layer.updateFields()
    features = []
    for row in rows:
        feature = QgsFeature(layer.fields())
        feature.setAttributes(row)
        features.append(feature)
    layer.dataProvider().addFeatures(features)
    return layer


@pytest.fixture(scope="module")
def chain_reports(plotwise_provider, demo_reserve_outputs, tmp_path_factory):
    return run_chain(tmp_path_factory.mktemp("reports"), demo_reserve_outputs)


@pytest.fixture(scope="module")
def rendered(chain_reports, tmp_path_factory):
    """One Chromium run measures every report (and two canaries); one run per report takes its PNG."""
    folder = tmp_path_factory.mktemp("chromium")
    documents = {alg.split(":")[1]: Path(path).read_text(encoding="utf-8") for alg, path in chain_reports.items()}
    documents["canary-wide"] = ('<!DOCTYPE html><html><body style="margin:0"><div style="width:1200px">wide</div>'
                                '</body></html>')
    measured, requests = measure_reports(folder, documents)
    keep = os.environ.get("PLOTWISE_REPORT_PNG")
    png_folder = Path(keep) if keep else folder
    png_folder.mkdir(parents=True, exist_ok=True)
    pngs, logs = {}, {}
    for alg, path in chain_reports.items():
        name = alg.split(":")[1]
        height = min(MAX_HEIGHT, max(600, int(math.ceil(measured[name]["height"]))))
        png, net_log = png_folder / f"{name}.png", folder / f"{name}-net.json"
        chromium(folder, f"--window-size={WIDTH},{height}", f"--screenshot={png}", Path(path).as_uri(), net_log=net_log)
        pngs[alg], logs[alg] = png, page_requests(net_log)
    return {"measured": measured, "requests": requests, "pngs": pngs, "screenshot_requests": logs}


# -- tests ---------------------------------------------------------------------------
def test_every_reporting_algorithm_is_rendered(plotwise_provider, chain_reports):
    with_report = {a.id() for a in plotwise_provider.algorithms() if a.parameterDefinition("REPORT") is not None}
    missing = with_report - set(chain_reports)
    assert not missing, f"add these algorithms to run_chain() in this test: {sorted(missing)}"
    for path in chain_reports.values():
        assert path and Path(path).is_file()


def test_reports_reference_nothing_outside_the_document(chain_reports):
    for alg, path in chain_reports.items():
        markup = Path(path).read_text(encoding="utf-8")
        assert scan(markup).problems == [], alg


def test_the_dom_as_chromium_parsed_it_references_nothing_outside(rendered, chain_reports):
    for alg in chain_reports:
        dom = rendered["measured"][alg.split(":")[1]]["dom"]
        assert "<main" in dom, alg
        assert scan(dom).problems == [], alg


def test_the_static_scan_sees_external_references():
    canary = ('<html><head><link rel="stylesheet" href="https://cdn.example/x.css"><style>'
              'body{background:url(http://example.org/a.png)}</style></head><body><img src="x.png">'
              '<a href="#ok">fine</a><svg><use xlink:href="http://example.org/s.svg#a"/></svg></body></html>')
    problems = " ".join(scan(canary).problems)
    for seen in ("<link>", "cdn.example", "url(http://example.org/a.png)", "src='x.png'", "s.svg#a"):
        assert seen in problems
    assert "#ok" not in problems


def test_no_request_leaves_the_page(rendered):
    assert rendered["requests"] == []
    for alg, urls in rendered["screenshot_requests"].items():
        assert urls == [], alg


def test_the_network_log_sees_a_page_request(tmp_path):
    page = tmp_path / "canary.html"
    page.write_text('<!DOCTYPE html><html><body><img src="http://plotwise-canary.invalid/x.png"></body></html>')
    net_log = tmp_path / "canary-net.json"
    chromium(tmp_path, "--dump-dom", page.as_uri(), net_log=net_log)
    assert any("plotwise-canary.invalid" in url for url in page_requests(net_log))


def test_nothing_overflows_at_1024_px(rendered, chain_reports):
    measured = rendered["measured"]
    assert measured["canary-wide"]["problems"], "the measurement must see a 1,200 px block"
    assert measured["canary-wide"]["scrollWidth"] > WIDTH
    for alg in chain_reports:
        m = measured[alg.split(":")[1]]
        assert m["clientWidth"] == WIDTH, alg
        assert m["scrollWidth"] <= WIDTH, (alg, m)
        assert m["problems"] == [], (alg, m["problems"])


def test_png_at_1024_px_is_not_blank(rendered):
    from qgis.PyQt.QtGui import QImage

    for alg, png in rendered["pngs"].items():
        image = QImage(str(png))
        assert not image.isNull(), alg
        assert image.width() == WIDTH, alg
        assert image.height() >= 600, alg
        # sample a grid of pixels: a rendered report has text, rules and figures in many colours
        colours = {image.pixel(x, y) for x in range(0, image.width(), 16) for y in range(0, image.height(), 16)}
        assert len(colours) > 20, alg


def test_hostile_names_and_values_come_out_escaped(plotwise_provider, demo_reserve_outputs, tmp_path):
    labels = [HOSTILE_VALUE, "two & three", "<b>4</b>"]
    reports = run_chain(tmp_path, demo_reserve_outputs, strata=strata_layer(HOSTILE_NAME, labels), name=HOSTILE_NAME)
    escaped_name = html.escape(HOSTILE_NAME, quote=True)
    escaped_value = html.escape(HOSTILE_VALUE, quote=True)
    expected = {  # where each hostile string must appear (as text)
        "plotwise:buildframe": [HOSTILE_NAME],
        "plotwise:stratify": [HOSTILE_NAME],
        "plotwise:comparedesigns": [HOSTILE_NAME],
        "plotwise:allocate": [HOSTILE_NAME, HOSTILE_VALUE],
        "plotwise:layout": [HOSTILE_VALUE],
        "plotwise:estimate": [HOSTILE_NAME, HOSTILE_VALUE],
        "plotwise:stations": [HOSTILE_NAME],
        "plotwise:occupancy": [HOSTILE_NAME],
        "plotwise:distancedensity": [HOSTILE_NAME, HOSTILE_VALUE],
        "plotwise:panels": [HOSTILE_VALUE],
        "plotwise:trend": [HOSTILE_NAME, HOSTILE_VALUE],
    }
    documents = {}
    for alg, strings in expected.items():
        markup = Path(reports[alg]).read_text(encoding="utf-8")
        documents[alg.split(":")[1]] = markup
        assert "<script" not in markup and "<img" not in markup and "<b>4</b>" not in markup, alg
        for raw in strings:
            assert raw not in markup, alg
        assert (escaped_name in markup) == (HOSTILE_NAME in strings), alg
        assert (escaped_value in markup) == (HOSTILE_VALUE in strings), alg
    # as Chromium parses them: no element or handler came out of the strings, which read as plain text
    raw = [" ".join(HOSTILE_NAME.split()), " ".join(HOSTILE_VALUE.split())]
    documents["canary-unescaped"] = f"<!DOCTYPE html><html><body><p>{HOSTILE_NAME} {HOSTILE_VALUE}</p></body></html>"
    inspected, _ = run_in_frames(tmp_path, documents, INSPECT, raw, "inspect")
    canary = inspected["canary-unescaped"]
    assert canary["elements"] >= 2 and canary["handlers"] >= 1  # the inspection sees what escaping prevents
    for alg, strings in expected.items():
        result = inspected[alg.split(":")[1]]
        assert result["elements"] == 0 and result["handlers"] == 0, (alg, result)
        assert result["found"] == [HOSTILE_NAME in strings, HOSTILE_VALUE in strings], (alg, result)
