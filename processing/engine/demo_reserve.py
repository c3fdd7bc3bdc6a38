"""The invented demo reserve: Hollin Ridge Reserve and its population of velmar.

Everything here is made up for demos, training and tests. The velmar is an invented
grazing antelope that lives in groups; Hollin Ridge Reserve is an invented upland
reserve with a lake, a private inholding and a steep escarpment. A given seed always
gives the same reserve, rasters and animals.

The population is an inhomogeneous Thomas cluster process (Thomas 1949; Diggle 2013,
*Statistical Analysis of Spatial and Spatio-Temporal Point Patterns*, §5.3 for the
moments): group centres form a Poisson process of intensity ``kappa(x)`` on the
habitat (the reserve without its lake), each group has Poisson(``mu``) members placed
independently around the centre with an isotropic normal displacement of standard
deviation ``sigma``, and members that land off the habitat are not part of the
population. With ``q(x)`` the chance that a member of a group centred at ``x`` lands
on the habitat, the total ``N`` has

    E[N]   = ∫ kappa(x) mu q(x) dx
    Var[N] = ∫ kappa(x) (mu q(x) + mu² q(x)²) dx

(the count of a group is Poisson(mu q), and groups are independent given the Poisson
parent process, so Var[N] = E[Σ_groups Var + mean²] by Campbell's theorem). Both are
computed on the raster grid.
"""
from dataclasses import dataclass

import numpy as np
from scipy import ndimage
from shapely import affinity
from shapely.geometry import Polygon, box

from .errors import QT_TRANSLATE_NOOP, Cancelled, InputError, message
from .geometry import contains_xy
from .geometry_types import polygonal_part

RESERVE_NAME = "Hollin Ridge Reserve"
SPECIES_NAME = "velmar"
SPECIES_DESCRIPTION = QT_TRANSLATE_NOOP("PlotwiseEngine", "an invented grazing antelope that lives in loose groups")
# WGS 84 / UTM zone 36S; the coordinates are invented and lie in open ocean, on no real land
CRS_EPSG = 32736
ORIGIN = (500_000.0, 5_570_000.0)  # open ocean (40° S, 33° E): the reserve is on no real land

MEAN_GROUP_SIZE = 7.0  # mu
GROUP_SPREAD_M = 140.0  # sigma
TARGET_ANIMALS = 3000.0  # the intensity is scaled so that ∫ kappa mu dx equals this


@dataclass(frozen=True)
class DemoReserve:
    """The reserve, its rasters (rows from north to south) and its animals."""

    seed: int
    crs_epsg: int
    boundary: Polygon
    lake: Polygon
    inholding: Polygon
    geotransform: tuple
    elevation: np.ndarray  # m
    greenness: np.ndarray  # vegetation index, 0..1
    intensity: np.ndarray  # expected animals per km² (the members' intensity), 0 off the habitat
    animals_xy: np.ndarray  # (n, 2) metres
    group_ids: np.ndarray  # (n,) group of each animal
    n_groups: int
    expected_total: float
    total_variance: float
    mean_group_size: float
    group_spread: float

    @property
    def true_total(self):
        return int(len(self.animals_xy))

    @property
    def habitat(self):
        return self.boundary.difference(self.lake)


def reserve_boundary(rng, area_km2):
    """An irregular, star-shaped boundary of exactly ``area_km2`` around ``ORIGIN``."""
    theta = np.linspace(0.0, 2.0 * np.pi, 720, endpoint=False)
    radius = np.ones_like(theta)
    for k in range(2, 40):
        amplitude = rng.uniform(0.02, 0.13) / k**0.6 if k < 9 else rng.uniform(0.0, 0.05) / k**0.7
        radius += amplitude * np.cos(k * theta + rng.uniform(0, 2 * np.pi))
    shape = Polygon(np.column_stack([np.cos(theta) * radius, np.sin(theta) * radius]))
    scale = np.sqrt(area_km2 * 1e6 / shape.area)
    shape = affinity.scale(shape, scale, scale * rng.uniform(0.75, 0.95), origin=(0, 0))
    shape = affinity.scale(shape, np.sqrt(area_km2 * 1e6 / shape.area), np.sqrt(area_km2 * 1e6 / shape.area),
                           origin=(0, 0))
    shape = affinity.rotate(shape, rng.uniform(0, 180), origin=(0, 0))
    return affinity.translate(shape, *ORIGIN)


def lake_polygon(rng, boundary):
    """A wobbly elliptical lake of 5–9 km² well inside the reserve."""
    cx, cy = boundary.centroid.coords[0]
    bounds = boundary.bounds
    half = 0.22 * min(bounds[2] - bounds[0], bounds[3] - bounds[1])
    for _ in range(100):
        x = cx + rng.uniform(-half, half)
        y = cy + rng.uniform(-half, half)
        theta = np.linspace(0, 2 * np.pi, 180, endpoint=False)
        r = 1.0 + 0.08 * np.cos(3 * theta + rng.uniform(0, 6.3)) + 0.05 * np.cos(5 * theta + rng.uniform(0, 6.3))
        area = rng.uniform(5.0, 9.0) * 1e6
        a = np.sqrt(area / (np.pi * 0.55))
        lake = Polygon(np.column_stack([x + a * r * np.cos(theta), y + 0.55 * a * r * np.sin(theta)]))
        lake = affinity.rotate(lake, rng.uniform(0, 180), origin=(x, y))
        if boundary.buffer(-1500).contains(lake):
            return lake
    raise InputError(message(QT_TRANSLATE_NOOP("PlotwiseEngine", "Could not place the demo lake; try another seed.")))


def inholding_polygon(rng, boundary):
    """A private block of land of about 4–7 km² cut into the reserve's edge."""
    theta = rng.uniform(0, 2 * np.pi)
    cx, cy = boundary.centroid.coords[0]
    far = 1e5
    ray = Polygon([(cx, cy), (cx + far * np.cos(theta - 1e-4), cy + far * np.sin(theta - 1e-4)),
                   (cx + far * np.cos(theta + 1e-4), cy + far * np.sin(theta + 1e-4))])
    edge = boundary.exterior.intersection(ray)
    ex, ey = edge.centroid.coords[0]
    side = np.sqrt(rng.uniform(8.0, 12.0) * 1e6)
    block = box(ex - side / 2, ey - side / 2, ex + side / 2, ey + side / 2)
    block = affinity.rotate(block, np.degrees(theta), origin=(ex, ey))
    return polygonal_part(block.intersection(boundary))


def fractal_surface(rng, x, y, beta=3.2, terms=160, shortest=300.0, longest=30_000.0):
    """A random-phase Fourier series with power spectrum ∝ f^-beta (a fractal surface).

    Evaluated at coordinates, so it does not depend on the raster's cell size.
    Returns values with unit standard deviation over the given points.
    """
    frequency = np.exp(rng.uniform(np.log(1.0 / longest), np.log(1.0 / shortest), terms))
    direction = rng.uniform(0, np.pi, terms)
    phase = rng.uniform(0, 2 * np.pi, terms)
    # log-uniform frequencies carry density ∝ 1/f, so amplitude² ∝ f^(2-beta) gives spectrum f^-beta in 2-D
    amplitude = frequency ** ((2.0 - beta) / 2.0)
    u, v = frequency * np.cos(direction), frequency * np.sin(direction)
    z = np.zeros(np.broadcast(x, y).shape)
    for k in range(terms):
        z += amplitude[k] * np.cos(2 * np.pi * (u[k] * x + v[k] * y) + phase[k])
    return (z - z.mean()) / z.std()


def escarpment(rng, x, y, boundary, height=420.0, width=110.0):
    """A steep step of ``height`` m across the reserve (maximum slope ≈ height / (4 width))."""
    cx, cy = boundary.centroid.coords[0]
    angle = rng.uniform(0, np.pi)
    offset = rng.uniform(-0.15, 0.15) * np.sqrt(boundary.area)
    distance = (x - cx) * np.cos(angle) + (y - cy) * np.sin(angle) - offset
    distance = distance + 600.0 * np.sin((-(x - cx) * np.sin(angle) + (y - cy) * np.cos(angle)) / 2500.0)
    return height / (1.0 + np.exp(-distance / width))


def habitat_fraction(boundary_mask, sigma_cells):
    """q(x): the share of a normal kernel of ``sigma_cells`` centred on each cell that falls on habitat."""
    return ndimage.gaussian_filter(boundary_mask.astype(float), sigma_cells, mode="constant", cval=0.0, truncate=4.0)


def _check(progress, fraction):
    if progress is not None and progress(fraction):
        raise Cancelled()


def cell_centres(geotransform, shape):
    x0, dx, _, y0, _, dy = geotransform
    rows, cols = shape
    xs = x0 + dx * (np.arange(cols) + 0.5)
    ys = y0 + dy * (np.arange(rows) + 0.5)
    return np.meshgrid(xs, ys)


def reserve_grid(boundary, cell_size, margin=1500.0):
    """The rasters' grid: ``margin`` m around the reserve, snapped to ``cell_size``; ``(geotransform, x, y)``
    with the cell centres' coordinates."""
    minx, miny, maxx, maxy = boundary.bounds
    minx, miny = np.floor((minx - margin) / cell_size) * cell_size, np.floor((miny - margin) / cell_size) * cell_size
    maxx, maxy = np.ceil((maxx + margin) / cell_size) * cell_size, np.ceil((maxy + margin) / cell_size) * cell_size
    cols, rows = int(round((maxx - minx) / cell_size)), int(round((maxy - miny) / cell_size))
    geotransform = (minx, cell_size, 0.0, maxy, 0.0, -cell_size)
    xx, yy = cell_centres(geotransform, (rows, cols))
    return geotransform, xx, yy


def terrain_and_greenness(rng, xx, yy, boundary, progress=None):
    """Elevation (m: fractal terrain and an escarpment) and greenness (0–1, falling with relief, plus texture)."""
    terrain = fractal_surface(rng, xx, yy)
    elevation = 1180.0 + 190.0 * terrain + escarpment(rng, xx, yy, boundary)
    _check(progress, 0.4)
    texture = fractal_surface(rng, xx, yy, beta=2.4, shortest=150.0, longest=6000.0)
    relief = (elevation - elevation.min()) / np.ptp(elevation)
    greenness = np.clip(0.78 - 0.5 * relief + 0.07 * texture, 0.02, 0.98)
    return elevation, greenness


def group_centre_intensity(greenness, elevation, habitat, cell_area, mu):
    """kappa(x), groups per m²: proportional to exp(0.9 z_greenness − 0.6 z_elevation) on the habitat,
    scaled so that the expected number of animals before edge losses is TARGET_ANIMALS."""
    z_green = (greenness - greenness[habitat].mean()) / greenness[habitat].std()
    z_elev = (elevation - elevation[habitat].mean()) / elevation[habitat].std()
    log_relative = 0.9 * z_green - 0.6 * z_elev
    relative = np.where(habitat, np.exp(log_relative), 0.0)
    return relative * (TARGET_ANIMALS / mu) / (relative.sum() * cell_area)


def thomas_animals(rng, xx, yy, group_expectation, cell_size, mu, sigma):
    """One realisation of the Thomas process: Poisson groups per cell (uniform within the cell), a Poisson
    number of members (mean ``mu``) per group, normal displacements (SD ``sigma`` m) around the centre.

    Returns ``(x, y, group index, number of groups)`` of every member, before the habitat is applied.
    """
    groups_per_cell = rng.poisson(group_expectation.ravel())
    cell_index = np.repeat(np.arange(groups_per_cell.size), groups_per_cell)
    gx = xx.ravel()[cell_index] + rng.uniform(-0.5, 0.5, cell_index.size) * cell_size
    gy = yy.ravel()[cell_index] + rng.uniform(-0.5, 0.5, cell_index.size) * cell_size
    members = rng.poisson(mu, cell_index.size)
    group_of = np.repeat(np.arange(cell_index.size), members)
    ax = gx[group_of] + rng.normal(0.0, sigma, group_of.size)
    ay = gy[group_of] + rng.normal(0.0, sigma, group_of.size)
    return ax, ay, group_of, int(cell_index.size)


def build_demo_reserve(rng, seed, cell_size=50.0, progress=None):
    """Build the whole scenario from one generator.

    Parameters
    ----------
    rng : numpy.random.Generator
    seed : int
        Recorded in the result (the caller made ``rng`` from it).
    cell_size : float
        Raster cell size in metres (10 to 500).
    """
    if not 10.0 <= cell_size <= 500.0:
        raise InputError(message(QT_TRANSLATE_NOOP("PlotwiseEngine",
            "The cell size must be between 10 and 500 m (got {cell_size:g} m)."), cell_size=cell_size))
    area_km2 = rng.uniform(250.0, 350.0)
    boundary = reserve_boundary(rng, area_km2)
    lake = lake_polygon(rng, boundary)
    inholding = inholding_polygon(rng, boundary)
    geotransform, xx, yy = reserve_grid(boundary, cell_size)
    _check(progress, 0.1)
    elevation, greenness = terrain_and_greenness(rng, xx, yy, boundary, progress)

    inside = contains_xy(boundary, xx.ravel(), yy.ravel()).reshape(xx.shape)
    in_lake = contains_xy(lake, xx.ravel(), yy.ravel()).reshape(xx.shape)
    habitat = inside & ~in_lake
    cell_area = cell_size * cell_size
    mu, sigma = MEAN_GROUP_SIZE, GROUP_SPREAD_M
    kappa = group_centre_intensity(greenness, elevation, habitat, cell_area, mu)

    # moments of the Thomas process: members off the habitat are lost (q, the kernel's share on habitat)
    q = habitat_fraction(habitat, sigma / cell_size)
    group_expectation = kappa * cell_area  # expected groups per cell
    expected_total = float(np.sum(group_expectation * mu * q))
    total_variance = float(np.sum(group_expectation * (mu * q + (mu * q) ** 2)))
    intensity = ndimage.gaussian_filter(kappa * mu, sigma / cell_size, mode="constant", truncate=4.0) * habitat * 1e6

    ax, ay, group_of, n_groups = thomas_animals(rng, xx, yy, group_expectation, cell_size, mu, sigma)
    keep = contains_xy(boundary, ax, ay) & ~contains_xy(lake, ax, ay)
    _check(progress, 0.9)

    return DemoReserve(
        seed=int(seed),
        crs_epsg=CRS_EPSG,
        boundary=boundary,
        lake=lake,
        inholding=inholding,
        geotransform=geotransform,
        elevation=elevation.astype(np.float32),
        greenness=greenness.astype(np.float32),
        intensity=intensity.astype(np.float32),
        animals_xy=np.column_stack([ax[keep], ay[keep]]),
        group_ids=group_of[keep] + 1,
        n_groups=n_groups,
        expected_total=expected_total,
        total_variance=total_variance,
        mean_group_size=mu,
        group_spread=sigma,
    )
