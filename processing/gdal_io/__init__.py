"""GDAL raster and vector work without the host (never imports ``qgis``).

* ``grids``: north-up grids, CRS comparison, window reads, GDAL progress callbacks.
* ``covariate_stack``: covariates on one grid, cut to the frame, served block by block.
* ``stratum_raster``: the stratum raster written block by block and renumbered in place.
* ``patches``: patches of the stratum raster counted, specks sieved, small patches merged.
* ``polygonising``: the strata as polygons.
* ``stratify_pipeline``: the whole stratification chained with the engine.
* ``surface``: a density surface read over a window.
* ``masking``: raster cells outside an accepted range, as polygons (the frame's mask).
"""
