"""Translations: the .ts files are complete, and the French and Spanish toolboxes show them.

The plugin is loaded the way the host loads it (``classFactory(iface).initProcessing()``) in a
fresh process whose host locale is set through QgsSettings (``locale/overrideFlag`` and
``locale/userLocale``, in a private settings folder). Expected texts come from outside the running
code: the committed ``i18n/plotwise_<lang>.ts`` files, and a few names written out below.
"""
import json
import os
import re
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
    report = layout.new_report(layout.tr("Sample-unit layout"))
    report.field_safety()
    report.warnings(["w"])
    report.parameters({{layout.tr("Seed (SEED)"): 1}})
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
    line = next((l for l in run.stdout.splitlines() if l.startswith("RESULT ")), None)
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
        if translation is not None and translation.text and translation.get("type") != "unfinished":
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


# -- (a) the .ts files are complete --------------------------------------------------------
def test_every_extracted_string_has_a_translation():
    run = subprocess.run([sys.executable, str(REPO / "scripts" / "update_translations.py"), "--check"],
                         cwd=REPO, capture_output=True, text=True, timeout=120)
    assert run.returncode == 0, "untranslated strings: run scripts/update_translations.py and translate\n" + run.stdout
    assert "unresolved" not in run.stderr, run.stderr  # every tr() argument is a literal the extractor sees


def test_extractor_sees_the_patterns_the_code_uses(tmp_path):
    """Contexts as ``PlotwiseAlgorithm.tr`` (class name), aliases, loops and conditionals are found;
    an f-string inside tr() is reported, since no translation could ever match it."""
    sys.path.insert(0, str(REPO / "scripts"))
    try:
        import update_translations as extractor
    finally:
        sys.path.remove(str(REPO / "scripts"))
    source = tmp_path / "sample.py"
    source.write_text(textwrap.dedent(
        """
        LABELS = ("Alpha", "Beta")
        HEADING = "Heading"

        class Sample:
            def name(self):
                return self.tr("Shown name")

            def options(self):
                return [self.tr(o) for o in ("One", "Two")] + [self.tr(x, "Shared") for x in LABELS]

            def report(self, flag, n):
                tr = self.tr
                bad = self.tr(f"{n} items")
                return tr("Yes" if flag else "No"), tr(HEADING), tr("Long " "joined"), bad
        """
    ))
    unresolved = []
    found = {(ctx, text) for ctx, text, _ in extractor.extract_file(source, unresolved)}
    assert found == {("Sample", "Shown name"), ("Sample", "One"), ("Sample", "Two"), ("Shared", "Alpha"),
                     ("Shared", "Beta"), ("Sample", "Yes"), ("Sample", "No"), ("Sample", "Heading"),
                     ("Sample", "Long joined")}
    assert [u[1] for u in unresolved] == [14]  # the f-string


# -- (d) placeholders survive translation --------------------------------------------------
@pytest.mark.parametrize("lang", LANGUAGES)
def test_placeholders_match_the_source(lang):
    root = ET.parse(I18N / f"plotwise_{lang}.ts").getroot()
    bad = []
    for context in root.iter("context"):
        for message in context.iter("message"):
            source, translation = message.findtext("source"), message.findtext("translation") or ""
            if sorted(PLACEHOLDER.findall(source)) != sorted(PLACEHOLDER.findall(translation)):
                bad.append((context.findtext("name"), source[:60], translation[:60]))
            kwargs = {name.split(":")[0].split("!")[0]: 0.5 for name in re.findall(r"\{([^{}]*)\}", source)}
            if kwargs and "" not in kwargs:
                translation.format(**kwargs)  # str.format must not break (numeric specs get a number)
    assert not bad, bad


@pytest.mark.parametrize("lang", LANGUAGES)
def test_html_tags_match_the_source(lang):
    root = ET.parse(I18N / f"plotwise_{lang}.ts").getroot()
    tag = re.compile(r"</?[a-z0-9]+>")
    bad = [(m.findtext("source")[:60]) for m in root.iter("message")
           if tag.findall(m.findtext("source")) != tag.findall(m.findtext("translation") or "")]
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
            if text_en not in translations:
                untranslated.append((alg_id, what, text_en[:70], "not in the .ts file"))
            elif text not in translations[text_en]:
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
