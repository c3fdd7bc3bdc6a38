"""Extract every translatable string into i18n/plotwise_<lang>.ts, keeping existing translations.

Run: .venv/bin/python scripts/update_translations.py [--check]

Recognised calls (contexts as the running code uses them):
- ``self.tr("text")`` inside class C: context C (``PlotwiseAlgorithm.tr`` uses the class name);
- ``self.tr("text", "Ctx")``: context Ctx;
- ``QCoreApplication.translate("Ctx", "text")``, ``QT_TRANSLATE_NOOP("Ctx", "text")`` and
  ``translatable("Ctx", "text")`` (a marker for strings translated later, e.g. group names);
- ``tr("text")`` in a module whose own ``def tr`` calls ``QCoreApplication.translate("Ctx", ...)``;
- ``self._tr("text")`` / ``tr("text")`` in processing/report (context ``PlotwiseReport``), including
  module-level string constants passed by name.

With ``--check`` nothing is written; the exit status is 1 when a string lacks a translation.
Debian's pylupdate5 treats a second argument of ``tr()`` as a comment, not a context, so this
small extractor is used instead; lrelease (``make translations``) compiles the result.
"""
import ast
import sys
import xml.etree.ElementTree as ET
from pathlib import Path

REPO = Path(__file__).resolve().parents[1]
LANGUAGES = {"fr": "fr_FR", "es": "es_ES"}
SOURCES = ["plugin", "processing"]
REPORT_CONTEXT = "PlotwiseReport"


def _const(node, constants):
    if isinstance(node, ast.Constant) and isinstance(node.value, str):
        return node.value
    if isinstance(node, ast.Name) and node.id in constants:
        return constants[node.id]
    return None


def _module_tr_context(tree):
    for node in tree.body:
        if isinstance(node, ast.FunctionDef) and node.name == "tr":
            for call in ast.walk(node):
                if isinstance(call, ast.Call) and getattr(call.func, "attr", None) == "translate" and call.args:
                    value = _const(call.args[0], {})
                    if value:
                        return value
    return None


def extract_file(path):
    """Yield (context, source, line) for one Python file."""
    tree = ast.parse(path.read_text(encoding="utf-8"))
    constants = {
        t.id: n.value.value
        for n in tree.body
        if isinstance(n, ast.Assign) and isinstance(n.value, ast.Constant) and isinstance(n.value.value, str)
        for t in n.targets
        if isinstance(t, ast.Name)
    }
    in_report = "report" in path.parts
    module_context = REPORT_CONTEXT if in_report else _module_tr_context(tree)

    def visit(node, class_name):
        for child in ast.iter_child_nodes(node):
            name = child.name if isinstance(child, ast.ClassDef) else class_name
            if isinstance(child, ast.Call):
                yield from from_call(child, class_name)
            yield from visit(child, name)

    def from_call(call, class_name):
        func = call.func
        attr = func.attr if isinstance(func, ast.Attribute) else getattr(func, "id", None)
        args = call.args
        if attr in ("translate", "QT_TRANSLATE_NOOP", "translatable") and len(args) >= 2:
            ctx, text = _const(args[0], constants), _const(args[1], constants)
            if ctx and text:
                yield ctx, text, call.lineno
        elif attr == "tr" and isinstance(func, ast.Attribute) and args:
            text = _const(args[0], constants)
            ctx = _const(args[1], constants) if len(args) > 1 else class_name
            if text and ctx:
                yield ctx, text, call.lineno
        elif attr in ("tr", "_tr") and isinstance(func, ast.Name) and args and module_context:
            text = _const(args[0], constants)
            if text:
                yield module_context, text, call.lineno
        elif attr == "_tr" and isinstance(func, ast.Attribute) and args and in_report:
            text = _const(args[0], constants)
            if text:
                yield REPORT_CONTEXT, text, call.lineno

    yield from visit(tree, None)


def extract():
    messages = {}
    for folder in SOURCES:
        for path in sorted((REPO / folder).rglob("*.py")):
            if "engine" in path.relative_to(REPO).parts:
                continue
            for ctx, text, line in extract_file(path):
                messages.setdefault((ctx, text), []).append((path.relative_to(REPO), line))
    return messages


def read_ts(path):
    if not path.exists():
        return {}
    root = ET.parse(path).getroot()
    found = {}
    for context in root.iter("context"):
        ctx = context.findtext("name")
        for message in context.iter("message"):
            translation = message.find("translation")
            text = translation.text if translation is not None else None
            if text and translation.get("type") not in ("unfinished", "obsolete"):
                found[(ctx, message.findtext("source"))] = text
    return found


def write_ts(path, language, messages, existing):
    root = ET.Element("TS", version="2.1", language=language)
    by_context = {}
    for (ctx, text), places in messages.items():
        by_context.setdefault(ctx, []).append((text, places))
    for ctx in sorted(by_context):
        context = ET.SubElement(root, "context")
        ET.SubElement(context, "name").text = ctx
        for text, places in sorted(by_context[ctx], key=lambda item: (str(item[1][0][0]), item[1][0][1])):
            message = ET.SubElement(context, "message")
            for file, line in places:
                ET.SubElement(message, "location", filename=f"../{file}", line=str(line))
            ET.SubElement(message, "source").text = text
            translation = ET.SubElement(message, "translation")
            if (ctx, text) in existing:
                translation.text = existing[(ctx, text)]
            else:
                translation.set("type", "unfinished")
    ET.indent(root)
    body = ET.tostring(root, encoding="unicode")
    path.write_text('<?xml version="1.0" encoding="utf-8"?>\n<!DOCTYPE TS>\n' + body + "\n", encoding="utf-8")


def main(argv):
    check = "--check" in argv
    messages = extract()
    missing_total = 0
    for short, language in LANGUAGES.items():
        path = REPO / "i18n" / f"plotwise_{short}.ts"
        existing = read_ts(path)
        missing = [key for key in messages if key not in existing]
        missing_total += len(missing)
        print(f"{path.name}: {len(messages)} strings, {len(messages) - len(missing)} translated, {len(missing)} missing")
        if not check:
            write_ts(path, language, messages, existing)
    return 1 if check and missing_total else 0


if __name__ == "__main__":
    sys.exit(main(sys.argv[1:]))
