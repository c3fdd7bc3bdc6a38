"""Plotwise processing: provider, algorithms, engine, reports."""
from . import engine  # noqa: F401  (tells pyproj where PROJ's data lie before anything imports it)
