"""Write the French and Spanish translations of scripts/translations_data.py into i18n/*.ts.

Run after scripts/update_translations.py (which extracts the sources):

    .venv/bin/python scripts/update_translations.py
    .venv/bin/python scripts/apply_translations.py

Every message whose English source is a key of ``TRANSLATIONS`` (or whose ``(context, source)``
is, which takes precedence: the same English word may need another gender) gets its translation (and loses
``type="unfinished"``); sources without one are listed and left unfinished. A translation whose
``{placeholders}`` differ from the source's is refused, so ``str.format`` can never break.
"""
import re
import sys
import xml.etree.ElementTree as ET
from pathlib import Path

sys.path.insert(0, str(Path(__file__).resolve().parent))
from translations_data import TRANSLATIONS  # noqa: E402

REPO = Path(__file__).resolve().parents[1]
LANGUAGE_INDEX = {"fr": 0, "es": 1}
PLACEHOLDER = re.compile(r"\{[^{}]*\}")


def placeholders(text):
    return sorted(PLACEHOLDER.findall(text))


def apply(short):
    path = REPO / "i18n" / f"plotwise_{short}.ts"
    tree = ET.parse(path)
    missing, refused, done = [], [], 0
    for context in tree.getroot().iter("context"):
        ctx = context.findtext("name")
        for message in context.iter("message"):
            source = message.findtext("source")
            translation = message.find("translation")
            entry = TRANSLATIONS.get((ctx, source), TRANSLATIONS.get(source))
            if entry is None:
                missing.append((ctx, source))
                continue
            text = entry[LANGUAGE_INDEX[short]]
            if placeholders(text) != placeholders(source):
                refused.append((ctx, source, text))
                continue
            translation.text = text
            translation.attrib.pop("type", None)
            done += 1
    ET.indent(tree.getroot())
    body = ET.tostring(tree.getroot(), encoding="unicode")
    path.write_text('<?xml version="1.0" encoding="utf-8"?>\n<!DOCTYPE TS>\n' + body + "\n", encoding="utf-8")
    print(f"{path.name}: {done} translated, {len(missing)} missing, {len(refused)} refused (placeholders)")
    for ctx, source in missing:
        print(f"  missing [{ctx}] {source!r}")
    for ctx, source, text in refused:
        print(f"  refused [{ctx}] {source!r} -> {text!r}")
    return not missing and not refused


def main():
    results = [apply(short) for short in LANGUAGE_INDEX]
    return 0 if all(results) else 1


if __name__ == "__main__":
    sys.exit(main())
