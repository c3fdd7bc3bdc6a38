"""Extract every translatable string into i18n/plotwise_<lang>.ts, keeping existing translations.

Run: .venv/bin/python scripts/update_translations.py [--check]

Recognised calls (contexts as the running code uses them):
- ``self.tr("text")`` inside class C: context C (``PlotwiseAlgorithm.tr`` uses the class name);
- ``self.tr("text", "Ctx")``: context Ctx;
- ``tr("text")`` where a function bound ``tr = self.tr`` (context of the enclosing class);
- ``QCoreApplication.translate("Ctx", "text")``, ``QT_TRANSLATE_NOOP("Ctx", "text")`` and
  ``translatable("Ctx", "text")`` (a marker for strings translated later, e.g. group names);
- ``tr("text")`` / ``_tr("text")`` in a module whose own ``def tr`` / ``def _tr`` calls
  ``QCoreApplication.translate("Ctx", ...)``;
- ``self._tr("text")`` / ``tr("text")`` in processing/report (context ``PlotwiseReport``), including
  module-level string constants passed by name;
- ``message("template", ...)`` in a module that imports ``message`` from ``engine/errors.py`` (the
  engine, ``raster_io``, ``raster_masking``): context ``PlotwiseEngine``, as the algorithms'
  ``translate_message`` uses it.

The parameter labels of the example chains (``processing/models/*.model3``) are extracted too,
in context ``ExampleChain`` (the provider translates them when it loads a chain).

The text may be a literal, a module-level string constant, ``"a" if c else "b"`` (both), a loop
variable over literal strings (``[self.tr(o) for o in ("A", "B")]``), or a
constant of an imported package module (``tr(engine.DESIGNS[i])``: every string of the tuple,
list or dict ``DESIGNS``; ``tr(demo_reserve.SPECIES_DESCRIPTION)``), followed through relative
imports. A call whose text cannot be resolved is listed on stderr as "unresolved": make it a literal.

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
ENGINE_CONTEXT = "PlotwiseEngine"
MODEL_CONTEXT = "ExampleChain"
MARKERS = ("translate", "QT_TRANSLATE_NOOP", "translatable")


# -- constants of a module, followed through relative imports ------------------------------
class ModuleIndex:
    """Module-level string constants (and containers of strings) of the package's modules."""

    def __init__(self):
        self._trees = {}

    def tree(self, path):
        if path not in self._trees:
            self._trees[path] = ast.parse(path.read_text(encoding="utf-8")) if path.exists() else None
        return self._trees[path]

    @staticmethod
    def _target(path, level, module):
        base = path.parent
        for _ in range(max(level - 1, 0)):
            base = base.parent
        parts = module.split(".") if module else []
        return base.joinpath(*parts)

    def module_path(self, path, level, module):
        """File of ``from <level dots><module> import ...`` seen from ``path`` (None if not ours)."""
        if level == 0:
            return None
        target = self._target(path, level, module)
        if target.with_suffix(".py").exists():
            return target.with_suffix(".py")
        if (target / "__init__.py").exists():
            return target / "__init__.py"
        return None

    def imported_modules(self, path):
        """Local names bound to package modules in ``path``: ``from ..engine import layout as engine``."""
        names = {}
        tree = self.tree(path)
        for node in tree.body if tree else ():
            if isinstance(node, ast.ImportFrom) and node.level:
                for alias in node.names:
                    target = self._target(path, node.level, node.module)
                    candidate = (target / alias.name).with_suffix(".py")
                    if candidate.exists():
                        names[alias.asname or alias.name] = candidate
        return names

    def strings(self, path, name, depth=0):
        """Strings of module constant ``name`` in ``path`` (one for a str, all for a container)."""
        tree = self.tree(path)
        if tree is None or depth > 5:
            return []
        for node in tree.body:
            if isinstance(node, ast.Assign) and any(isinstance(t, ast.Name) and t.id == name for t in node.targets):
                return _literal_strings(node.value)
        for node in tree.body:  # re-exported: from .unit_shapes import SHAPES
            if isinstance(node, ast.ImportFrom) and node.level:
                for alias in node.names:
                    if (alias.asname or alias.name) == name:
                        source = self.module_path(path, node.level, node.module)
                        if source is not None:
                            return self.strings(source, alias.name, depth + 1)
        return []


def _literal_strings(node):
    if isinstance(node, ast.Constant) and isinstance(node.value, str):
        return [node.value]
    if isinstance(node, (ast.Tuple, ast.List)):
        return [s for element in node.elts for s in _literal_strings(element)]
    if isinstance(node, ast.Dict):
        return [s for value in node.values for s in _literal_strings(value)]
    if isinstance(node, ast.Call) and getattr(node.func, "id", None) in MARKERS and len(node.args) >= 2:
        return _literal_strings(node.args[1])  # translatable("Ctx", "text")
    return []


INDEX = ModuleIndex()


def _relative(path):
    try:
        return path.relative_to(REPO)
    except ValueError:
        return path


def _module_tr_context(tree):
    """Context of a module-level ``def tr(text)`` / ``def _tr(text)`` wrapping ``translate``."""
    for node in tree.body:
        if isinstance(node, ast.FunctionDef) and node.name in ("tr", "_tr") and len(node.args.args) == 1:
            for call in ast.walk(node):
                if isinstance(call, ast.Call) and getattr(call.func, "attr", None) == "translate" and call.args:
                    value = call.args[0]
                    if isinstance(value, ast.Constant) and isinstance(value.value, str):
                        return value.value
    return None


def _module_context_wrappers(tree):
    """Module-level ``def _tr(context, text)`` wrapping ``translate(context, text)``: used like translate."""
    names = set()
    for node in tree.body:
        if isinstance(node, ast.FunctionDef) and len(node.args.args) == 2:
            first = node.args.args[0].arg
            for call in ast.walk(node):
                if (isinstance(call, ast.Call) and getattr(call.func, "attr", None) == "translate" and call.args
                        and isinstance(call.args[0], ast.Name) and call.args[0].id == first):
                    names.add(node.name)
    return names


def _self_tr_aliases(function):
    """Names bound to ``self.tr`` in a function body: ``tr = self.tr``."""
    aliases = set()
    for node in ast.walk(function):
        if (isinstance(node, ast.Assign) and isinstance(node.value, ast.Attribute) and node.value.attr == "tr"
                and isinstance(node.value.value, ast.Name) and node.value.value.id == "self"):
            aliases.update(t.id for t in node.targets if isinstance(t, ast.Name))
    return aliases


def extract_file(path, unresolved=None):
    """Yield (context, source, line) for one Python file; append unresolved calls to ``unresolved``."""
    tree = INDEX.tree(path)
    constants = {
        t.id: n.value.value
        for n in tree.body
        if isinstance(n, ast.Assign) and isinstance(n.value, ast.Constant) and isinstance(n.value.value, str)
        for t in n.targets
        if isinstance(t, ast.Name)
    }
    module_containers = {
        t.id: n.value
        for n in tree.body
        if isinstance(n, ast.Assign) and isinstance(n.value, (ast.Tuple, ast.List, ast.Dict))
        for t in n.targets
        if isinstance(t, ast.Name)
    }
    modules = INDEX.imported_modules(path)
    in_report = "report" in path.parts
    module_context = REPORT_CONTEXT if in_report else _module_tr_context(tree)
    engine_messages = any(  # from .errors import message / from .engine.errors import message
        isinstance(n, ast.ImportFrom) and (n.module or "").split(".")[-1] == "errors"
        and any(a.name == "message" and not a.asname for a in n.names)
        for n in tree.body
    )
    context_wrappers = _module_context_wrappers(tree)

    def texts(node):
        """The strings a text argument can take; None when it cannot be resolved."""
        if isinstance(node, ast.Constant) and isinstance(node.value, str):
            return [node.value]
        if isinstance(node, ast.Name):
            if node.id in constants:
                return [constants[node.id]]
            if node.id in module_containers:
                return _literal_strings(module_containers[node.id]) or None
            return loop_strings.get(node.id)
        if isinstance(node, (ast.Tuple, ast.List)):
            return _literal_strings(node) or None
        if isinstance(node, ast.BinOp) and isinstance(node.op, ast.Add):  # "a" + "b"
            left, right = texts(node.left), texts(node.right)
            return [x + y for x in left for y in right] if left and right and len(left) == len(right) == 1 else None
        if isinstance(node, ast.IfExp):
            body, orelse = texts(node.body), texts(node.orelse)
            return body + orelse if body is not None and orelse is not None else None
        if isinstance(node, ast.Subscript):
            return texts(node.value)
        if isinstance(node, ast.Attribute) and isinstance(node.value, ast.Name) and node.value.id in modules:
            return INDEX.strings(modules[node.value.id], node.attr) or None
        return None

    # loop variables over known strings: [self.tr(o) for o in ("A", "B")], for label in LABELS: tr(label)
    loop_strings = {}
    for node in ast.walk(tree):
        if isinstance(node, (ast.For, ast.comprehension)) and isinstance(node.target, ast.Name):
            values = texts(node.iter)
            if values:
                loop_strings.setdefault(node.target.id, []).extend(values)

    def context_of(node):
        if isinstance(node, ast.Constant) and isinstance(node.value, str):
            return node.value
        if isinstance(node, ast.Name) and node.id in constants:
            return constants[node.id]
        return None

    def emit(ctx, text_node, call):
        values = texts(text_node)
        if values is None:
            marked_elsewhere = isinstance(call.func, ast.Name) and call.func.id in context_wrappers
            if unresolved is not None and not marked_elsewhere:  # _tr(ctx, entry[0]): marked by translatable()
                unresolved.append((_relative(path), call.lineno, ast.unparse(call)[:100]))
            return
        for value in values:
            if value:
                yield ctx, value, call.lineno

    def visit(node, class_name, aliases):
        for child in ast.iter_child_nodes(node):
            name, child_aliases = class_name, aliases
            if isinstance(child, ast.ClassDef):
                name = child.name
            elif isinstance(child, (ast.FunctionDef, ast.AsyncFunctionDef)):
                child_aliases = aliases | _self_tr_aliases(child)
            if isinstance(child, ast.Call):
                yield from from_call(child, class_name, aliases)
            yield from visit(child, name, child_aliases)

    def from_call(call, class_name, aliases):
        func = call.func
        attr = func.attr if isinstance(func, ast.Attribute) else getattr(func, "id", None)
        args = call.args
        if engine_messages and attr == "message" and isinstance(func, ast.Name) and args:
            yield from emit(ENGINE_CONTEXT, args[0], call)
        elif (attr in MARKERS or isinstance(func, ast.Name) and attr in context_wrappers) and len(args) >= 2:
            ctx = context_of(args[0])
            if ctx:  # translate(context, text) with a variable context is a wrapper, not a message
                yield from emit(ctx, args[1], call)
        elif (attr in ("tr", "_tr") and isinstance(func, ast.Attribute) and isinstance(func.value, ast.Name)
              and func.value.id in modules):  # bridge.tr("..."): the context of that module's tr()
            ctx = _module_tr_context(INDEX.tree(modules[func.value.id]))
            if ctx and len(args) == 1:
                yield from emit(ctx, args[0], call)
            elif unresolved is not None:
                unresolved.append((_relative(path), call.lineno, ast.unparse(call)[:100]))
        elif attr == "tr" and isinstance(func, ast.Attribute) and args:
            if isinstance(func.value, ast.Name) and func.value.id in ("self", "cls") or class_name:
                ctx = context_of(args[1]) if len(args) > 1 else class_name
                if ctx:
                    yield from emit(ctx, args[0], call)
        elif isinstance(func, ast.Name) and attr in aliases and args and class_name:
            ctx = context_of(args[1]) if len(args) > 1 else class_name
            if ctx:
                yield from emit(ctx, args[0], call)
        elif attr in ("tr", "_tr") and isinstance(func, ast.Name) and args and module_context and len(args) == 1:
            yield from emit(module_context, args[0], call)
        elif attr == "_tr" and isinstance(func, ast.Attribute) and args and in_report:
            yield from emit(REPORT_CONTEXT, args[0], call)

    yield from visit(tree, None, frozenset())


# -- the wrappers themselves pass variables on: they are not messages ------------------------
def _is_wrapper(path, line):
    tree = INDEX.tree(path)
    for node in ast.walk(tree):
        if (isinstance(node, ast.FunctionDef) and node.name in ("tr", "_tr", "translate_message")
                and node.lineno <= line <= node.end_lineno):
            return True
        if isinstance(node, ast.Lambda) and node.lineno <= line <= node.end_lineno:
            return True
    return False


def extract_model(path):
    """Yield ("ExampleChain", label, line) for the parameter labels of a .model3 file.

    ``processing.provider.ExampleChain`` shows them through ``translate("ExampleChain", label)``.
    """
    text = path.read_text(encoding="utf-8")
    root = ET.fromstring(text)
    for option in root.iter("Option"):
        if option.get("name") != "parameterDefinitions":
            continue
        for parameter in option.findall("Option"):
            for field in parameter.findall("Option"):
                label = field.get("value")
                if field.get("name") == "description" and label:
                    line = text[: max(text.find(f'value="{label}"'), 0)].count("\n") + 1
                    yield MODEL_CONTEXT, label, line


def extract(unresolved=None):
    messages = {}
    found = []
    for path in sorted((REPO / "processing" / "models").glob("*.model3")):
        for ctx, text, line in extract_model(path):
            messages.setdefault((ctx, text), []).append((path.relative_to(REPO), line))
    for folder in SOURCES:
        for path in sorted((REPO / folder).rglob("*.py")):
            for ctx, text, line in extract_file(path, found):
                messages.setdefault((ctx, text), []).append((path.relative_to(REPO), line))
    if unresolved is not None:
        unresolved.extend(item for item in found if not _is_wrapper(REPO / item[0], item[1]))
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
    unresolved = []
    messages = extract(unresolved)
    for file, line, code in unresolved:
        print(f"unresolved (make the text a literal inside tr()): {file}:{line}: {code}", file=sys.stderr)
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
