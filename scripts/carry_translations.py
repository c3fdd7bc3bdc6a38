"""Fill each unfinished entry of .ts files from a finished or obsolete entry with the same English.

    python3 scripts/carry_translations.py i18n/plotwise_fr.ts i18n/plotwise_es.ts
    make update-translations PYLUPDATE_FLAGS=-noobsolete   # rewrites the files in pylupdate5's layout

For strings that moved to another context with their English unchanged (a report moved out of its
algorithm, for instance): their translation is the same. Review the result in Qt Linguist; a same
English in another context can, rarely, want another translation.
"""
import sys
import xml.etree.ElementTree as ET


def carry(path):
    tree = ET.parse(path)
    known = {}
    for message in tree.getroot().iter("message"):
        translation = message.find("translation")
        if translation is not None and translation.text and translation.get("type") in (None, "obsolete", "vanished"):
            known.setdefault(message.findtext("source"), translation.text)
    filled = left = 0
    for message in tree.getroot().iter("message"):
        translation = message.find("translation")
        if translation is None or translation.get("type") != "unfinished":
            continue
        source = message.findtext("source")
        if source in known:
            translation.text = known[source]
            del translation.attrib["type"]
            filled += 1
        else:
            left += 1
    tree.write(path, encoding="utf-8", xml_declaration=True)
    print(f"{path}: {filled} filled, {left} still unfinished")


if __name__ == "__main__":
    for name in sys.argv[1:]:
        carry(name)
