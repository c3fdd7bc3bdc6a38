"""Where pyproj finds PROJ's data (``proj.db``).

pyproj looks for ``proj.db`` in ``PROJ_DATA``/``PROJ_LIB``, then under ``sys.prefix``. Inside a
virtual environment, and in some hosts' embedded Python, ``sys.prefix`` is not where the
distribution put PROJ, so pyproj warns "Valid PROJ data directory not found" at import. The
PROJ library it wraps still finds its own data through its compiled-in search path, so CRS
lookups, the UTM choice and geodesic areas are unaffected (``tests/engine/test_crs.py`` checks
that); the warning is noise that hides real ones. Pointing ``PROJ_DATA`` at the directory the
distribution installed, before pyproj is first imported, makes it go away.
"""
import os
import sys
from pathlib import Path


def proj_data_candidates():
    """Directories that may hold ``proj.db``, most specific first."""
    prefixes = dict.fromkeys([sys.prefix, sys.base_prefix, sys.exec_prefix, "/usr", "/usr/local"])
    return [Path(prefix, "share", "proj") for prefix in prefixes]


def ensure_proj_data_dir(environ=os.environ):
    """Set ``PROJ_DATA`` to the first candidate holding ``proj.db`` unless one is already set.

    Returns the directory in force, or None when none was found (pyproj then warns, as before).
    A value the user or the host has set is never overridden.
    """
    for key in ("PROJ_DATA", "PROJ_LIB"):
        for folder in filter(None, environ.get(key, "").split(os.pathsep)):
            if Path(folder, "proj.db").exists():
                return folder
    for folder in proj_data_candidates():
        if (folder / "proj.db").exists():
            environ["PROJ_DATA"] = str(folder)
            return str(folder)
    return None
