"""The computation of Plotwise.

Pure numpy, scipy, shapely and pyproj. Nothing in this package imports the host
(``qgis``), so every function can be tested and reused without it.
"""

from .proj_data import ensure_proj_data_dir

ensure_proj_data_dir()  # before any module imports pyproj (see proj_data.py)
