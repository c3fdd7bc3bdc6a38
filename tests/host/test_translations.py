"""Translations: the .ts files are complete, and the French and Spanish toolboxes show them.

The .ts files are the one home of the translations: a pylupdate5 round trip (``make update-translations``
on copies) must lose no finished translation and find no string without one. The plugin is loaded the way
the host loads it (``classFactory(iface).initProcessing()``) in a
fresh process whose host locale is set through QgsSettings (``locale/overrideFlag`` and
``locale/userLocale``, in a private settings folder). Expected texts come from outside the running
code: the committed ``i18n/plotwise_<lang>.ts`` files, and a few names written out below.
"""
import ast
import json
import os
import re
import shutil
import subprocess
import sys
import textwrap
import xml.etree.ElementTree as ET
from pathlib import Path

import pytest

REPO = Path(__file__).resolve().parents[2]
I18N = REPO / "i18n"
LANGUAGES = ("fr", "es")
PLACEHOLDER = re.compile(r"\{[^{}]*\}")

LOADER = textwrap.dedent(
    """
    import json, os, sys
    os.environ["QT_QPA_PLATFORM"] = "offscreen"
    sys.path.insert(0, "/usr/share/qgis/python/plugins")
    sys.path.insert(0, {tests!r})
    import conftest  # registers the clone as `plotwise`
    from qgis.core import QgsApplication, QgsProcessingParameterEnum, QgsSettings
    app = QgsApplication([], False)
    app.initQgis()
    settings = QgsSettings()
    settings.setValue("locale/overrideFlag", {override!r})
    settings.setValue("locale/userLocale", {locale!r})
    from processing.core.Processing import Processing
    Processing.initialize()
    import plotwise
    plugin = plotwise.classFactory(None)
    plugin.initProcessing()
    provider = QgsApplication.processingRegistry().providerById("plotwise")
    algorithms = []
    for alg in sorted(provider.algorithms(), key=lambda a: a.id()):
        parameters = []
        for p in alg.parameterDefinitions():
            options = list(p.options()) if isinstance(p, QgsProcessingParameterEnum) else []
            parameters.append({{"name": p.name(), "description": p.description(), "options": options}})
        algorithms.append({{
            "id": alg.id(), "model": alg.__class__.__name__ == "ExampleChain",
            "displayName": alg.displayName(), "group": alg.group(),
            "help": alg.shortHelpString(), "parameters": parameters,
            "outputs": [o.description() for o in alg.outputDefinitions()],
        }})
    layout = provider.algorithm("layout")  # a report as the algorithms build it (translate hook)
    from qgis.PyQt.QtCore import QCoreApplication
    report = layout.new_report(QCoreApplication.translate("PlotwiseReport", "Sample-unit layout"))
    report.field_safety()
    report.warnings(["w"])
    report.parameters({{report.translate("PlotwiseReport", "Seed (SEED)"): 1}})
    report.references(["r"])
    print("RESULT " + json.dumps({{"provider": provider.longName(), "algorithms": algorithms,
                                   "report": report.render()}}))
    sys.stdout.flush()
    os._exit(0)
    """
)


def _ensure_qm():
    """Compile the .qm files (``make translations``) when missing or older than their .ts."""
    stale = [
        ts for ts in (I18N / f"plotwise_{lang}.ts" for lang in LANGUAGES)
        if not ts.with_suffix(".qm").exists() or ts.with_suffix(".qm").stat().st_mtime < ts.stat().st_mtime
    ]
    if stale:
        run = subprocess.run(["make", "--no-print-directory", "translations"], cwd=REPO, capture_output=True,
                             text=True, timeout=120)
        assert run.returncode == 0, run.stdout + run.stderr
    for lang in LANGUAGES:
        assert (I18N / f"plotwise_{lang}.qm").exists(), f"make translations did not write plotwise_{lang}.qm"


def _toolbox(tmp_path_factory, locale, override=True):
    """What the toolbox shows with the host locale ``locale``: the plugin loaded in a fresh process."""
    _ensure_qm()  # before the plugin loads: the translator is installed in initProcessing()
    folder = tmp_path_factory.mktemp(f"locale_{locale}")
    script = folder / "toolbox.py"
    script.write_text(LOADER.format(tests=str(REPO / "tests"), locale=locale, override=override))
    # private QgsSettings: pytest-qgis points QGIS_CUSTOM_CONFIG_PATH at the shared test profile, which the
    # locale set here must not reach (later processes would start in that language)
    private = str(folder / "qgis")
    env = dict(os.environ, XDG_CONFIG_HOME=str(folder / "config"), HOME=str(folder),
               QGIS_CUSTOM_CONFIG_PATH=private, QGIS_OPTIONS_PATH=private)
    run = subprocess.run([sys.executable, str(script)], capture_output=True, text=True, timeout=180, env=env)
    assert run.returncode == 0, run.stderr
    line = next((text for text in run.stdout.splitlines() if text.startswith("RESULT ")), None)
    assert line, run.stdout + run.stderr
    return json.loads(line[len("RESULT "):])


@pytest.fixture(scope="module")
def english(tmp_path_factory):
    return _toolbox(tmp_path_factory, "en")


@pytest.fixture(scope="module")
def french(tmp_path_factory):
    return _toolbox(tmp_path_factory, "fr")


@pytest.fixture(scope="module")
def spanish(tmp_path_factory):
    return _toolbox(tmp_path_factory, "es")


def _translations(lang):
    """``{source: set of translations}`` from the committed .ts file (any context)."""
    found = {}
    root = ET.parse(I18N / f"plotwise_{lang}.ts").getroot()
    for message in root.iter("message"):
        translation = message.find("translation")
        if translation is not None and translation.text and translation.get("type") not in ("unfinished", "obsolete"):
            found.setdefault(message.findtext("source"), set()).add(translation.text)
    return found


def _by_id(toolbox):
    return {a["id"]: a for a in toolbox["algorithms"]}


def _shown_texts(alg):
    """Every translatable text an algorithm shows in the toolbox and its dialog."""
    texts = [("displayName", alg["displayName"]), ("group", alg["group"]), ("help", alg["help"])]
    for p in alg["parameters"]:  # example chains too: the provider translates their .model3 labels
        texts.append((p["name"], p["description"]))
        texts.extend((p["name"] + " option", o) for o in p["options"])
    texts.extend(("output", o) for o in alg["outputs"])
    return texts


# -- (a) the .ts files are complete: a pylupdate5 round trip loses nothing and finds nothing new -----
def _read_ts(path):
    """``{(context, source): (state, translation)}``; state is finished, unfinished or obsolete."""
    found = {}
    for context in ET.parse(path).getroot().iter("context"):
        for message in context.iter("message"):
            translation = message.find("translation")
            key = (context.findtext("name"), message.findtext("source"))
            found[key] = (translation.get("type") or "finished", translation.text or "")
    return found


def _update_translations(ts_files, sources=None):
    """``make update-translations`` (Debian's pylupdate5) on other .ts files, as developers run it."""
    command = ["make", "--no-print-directory", "-s", "update-translations", "TS_FILES=" + " ".join(map(str, ts_files))]
    if sources is not None:
        command.append("TS_SOURCES=" + " ".join(map(str, sources)))
    run = subprocess.run(command, cwd=REPO, capture_output=True, text=True, timeout=300)
    assert run.returncode == 0, run.stdout + run.stderr


@pytest.fixture(scope="module")
def round_trip(tmp_path_factory):
    """The committed .ts files, and the same files after pylupdate5 has read the current code."""
    folder = tmp_path_factory.mktemp("round_trip")
    copies = []
    for lang in LANGUAGES:
        copies.append(folder / f"plotwise_{lang}.ts")
        shutil.copy(I18N / f"plotwise_{lang}.ts", copies[-1])
    _update_translations(copies)
    return {lang: (_read_ts(I18N / f"plotwise_{lang}.ts"), _read_ts(folder / f"plotwise_{lang}.ts"))
            for lang in LANGUAGES}


def _listing(keys):
    return "\n".join(f"  [{ctx}] {source!r}" for ctx, source in sorted(keys))


@pytest.mark.parametrize("lang", LANGUAGES)
def test_round_trip_loses_no_finished_translation(round_trip, lang):
    """Every finished translation of the .ts file still has its English (and context) in the code."""
    committed, refreshed = round_trip[lang]
    lost = [key for key, (state, text) in committed.items()
            if state == "finished" and (refreshed.get(key, ("gone",))[0] != "finished" or refreshed[key][1] != text)]
    assert not lost, (
        f"plotwise_{lang}.ts: these translated strings are no longer in the code (their English or context "
        f"changed). Run `make update-translations`, translate the new text in Qt Linguist and drop the "
        f"obsolete entries:\n" + _listing(lost))


@pytest.mark.parametrize("lang", LANGUAGES)
def test_every_string_of_the_code_has_a_finished_translation(round_trip, lang):
    """A string pylupdate5 finds in the code (new, or changed English) without a finished translation fails,
    listing each one: run `make update-translations` and translate them."""
    _, refreshed = round_trip[lang]
    missing = [key for key, (state, text) in refreshed.items()
               if state == "unfinished" or (state == "finished" and not text)]
    assert not missing, (
        f"plotwise_{lang}.ts: {len(missing)} string(s) of the code have no finished translation "
        f"(run `make update-translations`, then translate them in Qt Linguist):\n" + _listing(missing))


def _compiled(ts, context, source):
    """The translation lrelease (as `make translations` runs it) compiles for ``source``; "" when none."""
    from qgis.PyQt.QtCore import QTranslator

    qm = ts.with_suffix(".qm")
    run = subprocess.run(["lrelease", "-silent", "-nounfinished", str(ts), "-qm", str(qm)], capture_output=True,
                         text=True, timeout=60)
    assert run.returncode == 0, run.stderr
    translator = QTranslator()
    assert translator.load(str(qm))
    return translator.translate(context, source)


@pytest.mark.parametrize("new_text", ["Old text!", "A new sentence about something else"])
def test_a_changed_english_string_turns_unfinished(tmp_path, new_text):
    """The workflow's promise, checked on pylupdate5 and lrelease themselves: a changed string comes back
    unfinished (pre-filled with the old translation when the English is similar, else empty with the old entry
    kept as obsolete), so it is never compiled and the round-trip test lists it until a translator finishes it."""
    source = tmp_path / "sample.py"
    ts = tmp_path / "sample_fr.ts"
    source.write_text('class Sample:\n    def name(self):\n        return self.tr("Old text")\n')
    _update_translations([ts], [source])
    ts.write_text(ts.read_text(encoding="utf-8").replace(
        '<translation type="unfinished"></translation>', "<translation>Ancien texte</translation>"), encoding="utf-8")
    assert _read_ts(ts) == {("Sample", "Old text"): ("finished", "Ancien texte")}
    assert _compiled(ts, "Sample", "Old text") == "Ancien texte"  # the control: a finished entry is compiled
    source.write_text(source.read_text().replace("Old text", new_text))
    _update_translations([ts], [source])
    after = _read_ts(ts)
    assert after[("Sample", new_text)][0] == "unfinished"
    assert "Ancien texte" in {text for _, text in after.values()}  # kept for the translator to reuse
    assert set(after) <= {("Sample", new_text), ("Sample", "Old text")}
    assert after.get(("Sample", "Old text"), ("obsolete",))[0] == "obsolete"
    assert _compiled(ts, "Sample", new_text) == "" and _compiled(ts, "Sample", "Old text") == ""


# -- (a') strings are marked the way pylupdate5 reads them ------------------------------------
# What Debian's pylupdate5 does with each way of marking a string, checked on the tool itself: the contexts
# the code looks up at run time must be the ones it writes.
PATTERNS = textwrap.dedent(
    """
    class Sample:
        def name(self):
            return self.tr("Shown name")

        def report(self, report):
            tr = self.tr
            return tr("Through an alias"), tr("Alias again"), report.translate("PlotwiseReport", "Report word")

        def shared(self):
            return QCoreApplication.translate("Shared", "Fixed context"), self.tr("After a translate call")

        def comment(self):
            return self.tr("Second argument", "Shared")

    GROUPS = {"a": QT_TRANSLATE_NOOP("Groups", "Marked constant")}
    ERROR = message(QT_TRANSLATE_NOOP("PlotwiseEngine", "Engine {what} template"), what="error")
    UNMARKED = message("Engine template without marker {x}", x=1)
    VARIABLE_CONTEXT = QCoreApplication.translate(CONTEXT, "Variable context")
    ESCAPED = QCoreApplication.translate("Shared", "Square metres (m\\u00b2)")
    TRAILING = QCoreApplication.translate("Shared", "A comma after the text",)
    """
)


def test_how_pylupdate5_reads_each_way_of_marking_a_string(tmp_path):
    source = tmp_path / "patterns.py"
    source.write_text(PATTERNS)
    ts = tmp_path / "patterns.ts"
    _update_translations([ts], [source])
    root = ET.parse(ts).getroot()
    found = {(c.findtext("name"), m.findtext("source"), m.findtext("comment"))
             for c in root.iter("context") for m in c.iter("message")}
    assert found == {
        ("Sample", "Shown name", None),  # self.tr: the class it is written in
        ("Sample", "Through an alias", None),  # an alias: the first call after it happens to get the class,
        ("@default", "Alias again", None),  # the next ones not
        ("PlotwiseReport", "Report word", None),  # any translate("Context", "text") call
        ("Shared", "Fixed context", None),
        ("QCoreApplication.self", "After a translate call", None),  # a self.tr() right after X.translate()
        ("Sample", "Second argument", "Shared"),  # a second argument of tr() is a comment, not a context
        ("Groups", "Marked constant", None),
        ("PlotwiseEngine", "Engine {what} template", None),
        ("Shared", "Square metres (mu00b2)", None),  # \\u escapes are not decoded: write the character
    }  # the unmarked engine template, the variable context and the call with a trailing comma are not extracted


def _code_contexts():
    """The contexts the code looks up: its class names (self.tr) and the literal contexts of its markers."""
    contexts = set()
    for path in [p for folder in ("plugin", "processing") for p in (REPO / folder).rglob("*.py")] + [
            REPO / "scripts" / "build_models.py"]:
        for node in ast.walk(ast.parse(path.read_text(encoding="utf-8"))):
            if isinstance(node, ast.ClassDef):
                contexts.add(node.name)
            elif isinstance(node, ast.Call) and len(node.args) >= 2 and isinstance(node.args[0], ast.Constant):
                name = node.func.attr if isinstance(node.func, ast.Attribute) else getattr(node.func, "id", None)
                if name in ("translate", "QT_TRANSLATE_NOOP"):
                    contexts.add(node.args[0].value)
    return contexts


def test_round_trip_files_every_string_under_a_context_the_code_looks_up(round_trip):
    """pylupdate5 misfiles some calls (an alias of self.tr, a self.tr() right after X.translate() in the
    same function, x.tr()): such a context exists nowhere in the code, and the string would stay English."""
    known = _code_contexts()
    _, refreshed = round_trip[LANGUAGES[0]]
    misfiled = [key for key in refreshed if key[0] not in known]
    assert not misfiled, (
        "pylupdate5 files these strings under a context that no class or marker of the code has. Write "
        "self.tr(\"…\") in the algorithm's class (no alias, not right after a QCoreApplication.translate() or "
        "report.translate() call in the same function: call self.tr first or split the function):\n"
        + _listing(misfiled))


FIX_TR = "write self.tr(\"…\") in the algorithm's class, or QCoreApplication.translate(\"Context\", \"…\")"
FIX_ENGINE = "an engine template is written message(QT_TRANSLATE_NOOP(\"PlotwiseEngine\", \"…\"), name=value)"


def _literal(node):
    return isinstance(node, ast.Constant) and isinstance(node.value, str)


def _text_problem(node, text):
    """Why pylupdate5 cannot extract the text argument ``node`` as it stands (None when it can)."""
    if isinstance(node, (ast.JoinedStr, ast.IfExp, ast.BinOp)) or (
            isinstance(node, ast.Call) and isinstance(node.func, ast.Attribute) and _literal(node.func.value)):
        return "the text must be one string literal (choose outside the call, .format() the placeholders after it)"
    segment = (ast.get_source_segment(text, node) or "") if _literal(node) else ""
    if any(escape in segment for escape in ("\\u", "\\U", "\\N{")) or segment[:1] in ("r", "R"):
        return "pylupdate5 decodes no \\u or \\N escapes and no raw strings: write the character itself"
    return None


def _tr_problem(call, class_name, base_classes):
    func, args = call.func, call.args
    if isinstance(func, ast.Name):
        return "a bare tr() lands in the context @default: " + FIX_TR
    if not (isinstance(func.value, ast.Name) and func.value.id == "self"):
        return "x.tr() is filed under the context 'x': " + FIX_TR
    if len(args) != 1 or call.keywords:
        return ("self.tr() takes the text alone (pylupdate5 reads a second argument as a comment): use "
                "QCoreApplication.translate(\"Context\", \"…\") for another context")
    if class_name in base_classes:
        return (f"self.tr() in {class_name}, which other classes extend, is looked up under the subclass's name: "
                f"use QCoreApplication.translate(\"{class_name}\", \"…\")")
    if not _literal(args[0]) and not isinstance(args[0], (ast.JoinedStr, ast.IfExp, ast.BinOp)):
        return "self.tr() of a variable is never extracted: call it on the literal"
    return None


def _message_problem(call):
    first = call.args[0]
    for branch in [first.body, first.orelse] if isinstance(first, ast.IfExp) else [first]:
        if _literal(branch) or isinstance(branch, ast.JoinedStr):
            return FIX_ENGINE
        if (isinstance(branch, ast.Call) and getattr(branch.func, "id", None) == "QT_TRANSLATE_NOOP"
                and branch.args and _literal(branch.args[0]) and branch.args[0].value != "PlotwiseEngine"):
            return "engine templates are looked up in the context PlotwiseEngine: " + FIX_ENGINE
    return None


def _call_problems(call, class_name, base_classes, text):
    func, args = call.func, call.args
    name = func.attr if isinstance(func, ast.Attribute) else getattr(func, "id", None)
    if name in ("tr", "translate", "QT_TRANSLATE_NOOP") and re.search(r",\s*\)$", ast.get_source_segment(text, call)):
        yield "pylupdate5 skips a call with a comma after its last argument: drop the comma"
    if name == "_tr":
        yield "pylupdate5 reads no _tr(): " + FIX_TR
    elif name == "tr":
        yield _tr_problem(call, class_name, base_classes)
        if isinstance(func, ast.Attribute) and args:
            yield _text_problem(args[0], text)
    elif name in ("translate", "QT_TRANSLATE_NOOP") and len(args) >= 2:
        if _literal(args[0]):
            yield _text_problem(args[1], text)
        elif _literal(args[1]):
            yield "the context must be a string literal, or pylupdate5 skips the call"
    elif name == "message" and isinstance(func, ast.Name) and args:
        yield _message_problem(call)


def _marking_problems(path, root=REPO):
    """Calls that pylupdate5 would miss or file under another context than the code looks up."""
    text = path.read_text(encoding="utf-8")
    tree = ast.parse(text)
    base_classes = {b.id for n in ast.walk(tree) if isinstance(n, ast.ClassDef) for b in n.bases
                    if isinstance(b, ast.Name)}
    problems = []

    def visit(node, class_name):
        for child in ast.iter_child_nodes(node):
            if isinstance(child, ast.Call):
                problems.extend((child, why) for why in _call_problems(child, class_name, base_classes, text) if why)
            visit(child, child.name if isinstance(child, ast.ClassDef) else class_name)

    visit(tree, None)
    return [f"{path.relative_to(root)}:{call.lineno}: {why}\n      {ast.get_source_segment(text, call)[:100]}"
            for call, why in problems]


def test_strings_are_marked_the_way_pylupdate5_reads_them():
    sources = sorted(p for folder in ("plugin", "processing") for p in (REPO / folder).rglob("*.py"))
    problems = [problem for path in sources + [REPO / "scripts" / "build_models.py"]
                for problem in _marking_problems(path)]
    assert not problems, "strings that pylupdate5 would miss or file under another context:\n" + "\n".join(problems)


def test_the_checker_flags_the_patterns_pylupdate5_misreads(tmp_path):
    sample = tmp_path / "sample.py"
    sample.write_text(PATTERNS + textwrap.dedent(
        """
        class Base:
            def shared(self):
                return self.tr("Looked up under the subclass")

        class Child(Base):
            def name(self, n):
                return self.tr(f"{n} units"), self.tr(LABEL), message(QT_TRANSLATE_NOOP("Other", "x"))
        """))
    lines = sorted(int(problem.split(":")[1]) for problem in _marking_problems(sample, root=tmp_path))
    # the alias (twice), the second argument, the unmarked template, the variable context, the escape, the
    # trailing comma, self.tr in a base class, then an f-string, a variable and an engine template in another context
    assert lines == [8, 8, 14, 18, 19, 20, 21, 25, 29, 29, 29], lines


def test_example_chain_labels_are_translated():
    """Each parameter label of the .model3 files has a French and a Spanish translation in ExampleChain
    (the labels are marked in scripts/build_models.py, which writes the files)."""
    labels = set()
    for path in (REPO / "processing" / "models").glob("*.model3"):
        for option in ET.parse(path).getroot().iter("Option"):
            if option.get("name") == "parameterDefinitions":
                labels.update(field.get("value") for parameter in option.findall("Option")
                              for field in parameter.findall("Option") if field.get("name") == "description")
    assert len(labels) > 10
    for lang in LANGUAGES:
        translated = {source for (ctx, source), (state, text) in _read_ts(I18N / f"plotwise_{lang}.ts").items()
                      if ctx == "ExampleChain" and state == "finished" and text}
        assert labels <= translated, (lang, sorted(labels - translated))


# -- (d) placeholders and HTML tags survive translation -----------------------------------------
def _finished(lang):
    """(context, source, translation) of the finished messages of the .ts file: what lrelease compiles."""
    return [(ctx, source, text) for (ctx, source), (state, text) in _read_ts(I18N / f"plotwise_{lang}.ts").items()
            if state == "finished"]


@pytest.mark.parametrize("lang", LANGUAGES)
def test_placeholders_match_the_source(lang):
    bad = []
    for ctx, source, translation in _finished(lang):
        if sorted(PLACEHOLDER.findall(source)) != sorted(PLACEHOLDER.findall(translation)):
            bad.append((ctx, source[:60], translation[:60]))
        kwargs = {name.split(":")[0].split("!")[0]: 0.5 for name in re.findall(r"\{([^{}]*)\}", source)}
        if kwargs and "" not in kwargs:
            translation.format(**kwargs)  # str.format must not break (numeric specs get a number)
    assert len(_finished(lang)) > 800  # the check ran on the whole file
    assert not bad, bad


@pytest.mark.parametrize("lang", LANGUAGES)
def test_html_tags_match_the_source(lang):
    tag = re.compile(r"</?[a-z0-9]+>")
    bad = [(ctx, source[:60]) for ctx, source, translation in _finished(lang)
           if tag.findall(source) != tag.findall(translation)]
    assert not bad, bad


# -- (b) the French toolbox ----------------------------------------------------------------
# written out here from the French glossary (a check independent of the .ts files)
FRENCH_NAMES = {
    "plotwise:allocate": "Répartir l'effort entre les strates",
    "plotwise:buildframe": "Construire la base de sondage",
    "plotwise:estimate": "Estimer la densité et l'abondance",
    "plotwise:layout": "Disposer les unités d'échantillonnage",
    "plotwise:stratify": "Stratifier à partir de covariables raster",
}
FRENCH_GROUPS = {"Survey design": "Conception de l'inventaire", "Estimation": "Estimation",
                 "Demo and training": "Démonstration et formation"}


def test_french_algorithm_names_groups_and_labels(english, french):
    en, fr = _by_id(english), _by_id(french)
    assert sorted(en) == sorted(fr)
    assert french["provider"] == "Plotwise : conception d'inventaires et estimation"
    for alg_id, name in FRENCH_NAMES.items():
        assert fr[alg_id]["displayName"] == name
    assert fr["plotwise:estimate"]["parameters"][0]["name"] == en["plotwise:estimate"]["parameters"][0]["name"]
    labels = {p["name"]: p["description"] for p in fr["plotwise:layout"]["parameters"]}
    assert labels["FRAME"] == "Base de sondage ou strates"
    assert labels["SEED"] == "Graine aléatoire (0 en tire une et l'enregistre)"
    shapes = next(p for p in fr["plotwise:layout"]["parameters"] if p["name"] == "SHAPE")["options"]
    assert "Transect linéaire" in shapes
    for alg_id in en:
        assert fr[alg_id]["displayName"] != en[alg_id]["displayName"], alg_id
        assert fr[alg_id]["group"] == FRENCH_GROUPS.get(en[alg_id]["group"], fr[alg_id]["group"])
        assert fr[alg_id]["group"] != en[alg_id]["group"] or en[alg_id]["group"] == "Estimation", alg_id
        assert fr[alg_id]["help"] != en[alg_id]["help"], alg_id
        if not en[alg_id]["model"]:  # the first parameter label of every Plotwise algorithm
            assert fr[alg_id]["parameters"][0]["description"] != en[alg_id]["parameters"][0]["description"], alg_id


def _placeholder_name(placeholder):
    return placeholder[1:-1].split(":")[0].split("!")[0]


def _filled_pieces(text_en, source, translations):
    """``(end, translated piece)`` for a piece ``source`` whose placeholders were filled by ``.format()`` after
    ``tr()`` (``self.tr(a) + self.tr(b).format(n=...)``): the piece matched at the start of ``text_en``, each
    placeholder a non-empty run of text (the same for a repeated name), and those values put into each of its
    translations. Only a piece that starts with text, not with a placeholder, can be anchored."""
    parts = PLACEHOLDER.split(source)
    if not parts[0] or not text_en.startswith(parts[0]):
        return
    names = [_placeholder_name(p) for p in PLACEHOLDER.findall(source)]
    pattern = "(.+?)".join(re.escape(part) for part in parts)
    for match in {re.fullmatch(pattern, text_en, re.S), re.match(pattern, text_en, re.S) if parts[-1] else None}:
        values = {}
        if match is None or any(values.setdefault(n, v) != v for n, v in zip(names, match.groups())):
            continue
        for translation in translations[source]:
            yield match.end(), PLACEHOLDER.sub(lambda m: values.get(_placeholder_name(m.group()), m.group()),
                                               translation)


def _translated_forms(text_en, translations):
    """The translations of ``text_en``: of the string itself, or of the strings it is joined from (a help built
    as ``self.tr(a) + self.tr(b)``, a piece possibly filled by ``.format()``), each piece a source of the .ts
    file. Empty when some part has none."""
    if text_en in translations:
        return set(translations[text_en])
    forms = set()
    for source in translations:
        if source and len(source) < len(text_en) and text_en.startswith(source):
            rest = _translated_forms(text_en[len(source):], translations)
            forms |= {head + tail for head in translations[source] for tail in rest}
        elif source and PLACEHOLDER.search(source):
            for end, head in _filled_pieces(text_en, source, translations):
                rest = {""} if end == len(text_en) else _translated_forms(text_en[end:], translations)
                forms |= {head + tail for tail in rest}
    return forms


@pytest.mark.parametrize("lang", LANGUAGES)
def test_no_english_left_in_the_toolbox(english, french, spanish, lang):
    """Every text shown in English is shown as its translation from the .ts file."""
    shown = _by_id({"fr": french, "es": spanish}[lang])
    translations = _translations(lang)
    untranslated = []
    for alg_id, alg in _by_id(english).items():
        for (what, text_en), (_, text) in zip(_shown_texts(alg), _shown_texts(shown[alg_id])):
            if not text_en:
                continue
            forms = _translated_forms(text_en, translations)
            if not forms:
                untranslated.append((alg_id, what, text_en[:70], "not in the .ts file"))
            elif text not in forms:
                untranslated.append((alg_id, what, text_en[:70], text[:70]))
    assert not untranslated, untranslated


@pytest.mark.parametrize("lang", LANGUAGES)
def test_report_headings_and_caution_in_the_host_language(english, french, spanish, lang):
    from plotwise.processing.report import FIELD_SAFETY_CAUTION
    from plotwise.processing.report.html import escape

    html = {"fr": french, "es": spanish}[lang]["report"]
    translations = _translations(lang)
    for source in ("Sample-unit layout", "Field safety", FIELD_SAFETY_CAUTION, "Warnings", "Method references",
                   "Inputs and parameters", "Item", "Value", "Seed (SEED)"):
        assert escape(source) in english["report"], source
        (translated,) = translations[source]
        assert escape(translated) in html, (lang, source)
        assert escape(source) not in html, (lang, source)
    assert f'<html lang="{lang}">' in html and '<html lang="en">' in english["report"]  # the page's own language


def test_field_safety_caution_is_translated():
    from plotwise.processing.report import FIELD_SAFETY_CAUTION

    for lang, words in (("fr", ("sécurité", "sûr")), ("es", ("seguridad", "segura"))):
        (translation,) = _translations(lang)[FIELD_SAFETY_CAUTION]
        assert all(w in translation for w in words), lang


# -- (c) the Spanish toolbox ---------------------------------------------------------------
SPANISH_NAMES = {
    "plotwise:allocate": "Asignar el esfuerzo a los estratos",
    "plotwise:buildframe": "Construir el marco de muestreo",
    "plotwise:estimate": "Estimar la densidad y la abundancia",
    "plotwise:layout": "Disponer las unidades de muestreo",
}


def test_spanish_algorithm_names(english, spanish):
    en, es = _by_id(english), _by_id(spanish)
    assert sorted(en) == sorted(es)
    for alg_id, name in SPANISH_NAMES.items():
        assert es[alg_id]["displayName"] == name
    for alg_id in en:
        assert es[alg_id]["displayName"] != en[alg_id]["displayName"], alg_id


def test_english_host_keeps_english(english):
    names = {a["id"]: a["displayName"] for a in english["algorithms"]}
    assert names["plotwise:estimate"] == "Estimate density and abundance"
    assert english["provider"] == "Plotwise survey design and estimation"


def test_carry_translations_fills_a_moved_string_only(tmp_path):
    """scripts/carry_translations.py: an unfinished entry takes the translation of an obsolete entry with the
    same English (a string that changed context); one whose English changed stays unfinished."""
    import importlib.util

    spec = importlib.util.spec_from_file_location("carry_translations", REPO / "scripts" / "carry_translations.py")
    carry = importlib.util.module_from_spec(spec)
    spec.loader.exec_module(carry)
    ts = tmp_path / "x.ts"
    ts.write_text(
        '<?xml version="1.0" encoding="utf-8"?>\n<!DOCTYPE TS>\n<TS version="2.1" language="fr_FR">\n'
        "<context><name>Old</name>"
        "<message><source>Strata</source><translation type=\"obsolete\">Strates</translation></message>"
        "<message><source>Units</source><translation type=\"obsolete\">Unités</translation></message></context>"
        "<context><name>PlotwiseReport</name>"
        "<message><source>Strata</source><translation type=\"unfinished\"></translation></message>"
        "<message><source>Units.</source><translation type=\"unfinished\"></translation></message></context>"
        "</TS>\n", encoding="utf-8")
    carry.carry(str(ts))
    report = next(c for c in ET.parse(ts).getroot().iter("context") if c.findtext("name") == "PlotwiseReport")
    entries = {m.findtext("source"): m.find("translation") for m in report.iter("message")}
    assert entries["Strata"].text == "Strates" and entries["Strata"].get("type") is None
    assert entries["Units."].get("type") == "unfinished" and not entries["Units."].text
