"""Check, without importing the host, that the libraries Plotwise needs are present.

The host ships them on every platform it supports; a broken or unusual install may
lack one. The plugin then says which and registers nothing.
"""
from dataclasses import dataclass
import importlib

# (import name, shown name, minimum version or None)
REQUIREMENTS = (
    ("numpy", "numpy", (1, 21)),
    ("scipy", "scipy", (1, 7)),
    ("shapely", "shapely", (1, 8)),
    ("pyproj", "pyproj", (3, 2)),
    ("osgeo.gdal", "GDAL (osgeo.gdal)", None),
)


def _version_tuple(text):
    parts = []
    for piece in str(text).split(".")[:2]:
        digits = "".join(ch for ch in piece if ch.isdigit())
        parts.append(int(digits) if digits else 0)
    return tuple(parts)


@dataclass(frozen=True)
class Problem:
    """A missing library (``version`` None) or one older than ``wanted``; ``error`` says why the import failed."""

    name: str
    error: str = ""
    version: str = None
    wanted: str = None

    @property
    def missing(self):
        return self.version is None


def missing_dependencies():
    """Return one :class:`Problem` per missing or too old library (empty when all is well)."""
    problems = []
    for module_name, shown, minimum in REQUIREMENTS:
        try:
            module = importlib.import_module(module_name)
        except Exception as error:  # ImportError, or a broken binary module
            problems.append(Problem(shown, error=f"{type(error).__name__}: {error}"))
            continue
        if minimum is not None:
            version = getattr(module, "__version__", "0")
            if _version_tuple(version) < minimum:
                problems.append(Problem(shown, version=str(version), wanted=".".join(str(v) for v in minimum)))
    return problems
