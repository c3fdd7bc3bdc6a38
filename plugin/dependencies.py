"""Check, without importing the host, that the libraries Plotwise needs are present.

The host ships them on every platform it supports; a broken or unusual install may
lack one. The plugin then says which and registers nothing.
"""
import importlib

# (import name, shown name, minimum version or None)
REQUIREMENTS = (
    ("numpy", "numpy", (1, 21)),
    ("scipy", "scipy", (1, 7)),
    ("shapely", "shapely", (1, 8)),
    ("pyproj", "pyproj", (3, 2)),
    ("osgeo.gdal", "GDAL Python bindings (osgeo.gdal)", None),
)


def _version_tuple(text):
    parts = []
    for piece in str(text).split(".")[:2]:
        digits = "".join(ch for ch in piece if ch.isdigit())
        parts.append(int(digits) if digits else 0)
    return tuple(parts)


def missing_dependencies():
    """Return a list of sentences, one per missing or too old library (empty when all is well)."""
    problems = []
    for module_name, shown, minimum in REQUIREMENTS:
        try:
            module = importlib.import_module(module_name)
        except Exception as error:  # ImportError, or a broken binary module
            problems.append(f"{shown} is missing ({type(error).__name__}: {error}).")
            continue
        if minimum is not None:
            version = getattr(module, "__version__", "0")
            if _version_tuple(version) < minimum:
                wanted = ".".join(str(v) for v in minimum)
                problems.append(f"{shown} {version} is too old; version {wanted} or newer is needed.")
    return problems
