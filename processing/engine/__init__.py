"""The computation of Plotwise.

Pure numpy, scipy, shapely and pyproj. Nothing in this package imports the host
(``qgis``), so every function can be tested and reused without it.
"""
