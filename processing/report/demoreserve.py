"""The report of plotwise:demoreserve, built from :class:`engine.demo_reserve.DemoReserve` (named fields;
never imports the host)."""

from shapely.geometry import MultiPoint

from ..engine import demo_reserve
from .style import CATEGORY_COLOURS
from .svg import MapLayer, map_svg

REFERENCES = (
    "Thomas, M. (1949) A generalization of Poisson's binomial limit for use in ecology. Biometrika 36:18–25.",
    "Diggle, P. J. (2013) Statistical Analysis of Spatial and Spatio-Temporal Point Patterns. 3rd ed. CRC Press.",
)


def demoreserve_report(report, reserve, cell_size, crs):
    """Fill ``report`` with the invented reserve and its simulated population; returns it.

    ``cell_size`` is the rasters' cell size (m), ``crs`` names the reserve's CRS
    (``"EPSG:32736 (WGS 84 / UTM zone 36S)"``).
    """
    report.title = report.translate("PlotwiseReport", "Demo reserve: {name}").format(name=demo_reserve.RESERVE_NAME)
    report.note(report.translate(
        "PlotwiseReport",
        "Invented data for demonstrations, training and tests. {name} and the velmar ({desc}) do not exist."
    ).format(name=demo_reserve.RESERVE_NAME,
             desc=report.translate("PlotwiseEngine", demo_reserve.SPECIES_DESCRIPTION)))
    report.key_figures([
        (report.translate("PlotwiseReport", "reserve area"), f"{reserve.boundary.area / 1e6:,.1f} km²"),
        (report.translate("PlotwiseReport", "true number of velmar"), f"{reserve.true_total:,}"),
        (report.translate("PlotwiseReport", "expected number"),
         f"{reserve.expected_total:,.0f} ± {reserve.total_variance ** 0.5:,.0f} (1 SD)"),
        (report.translate("PlotwiseReport", "groups"), f"{reserve.n_groups:,}"),
    ])
    report.parameters({
        report.translate("PlotwiseReport", "Seed"): reserve.seed,
        report.translate("PlotwiseReport", "Raster cell size (m)"): cell_size,
        report.translate("PlotwiseReport", "CRS"): crs,
        report.translate("PlotwiseReport", "Mean group size (mu)"): reserve.mean_group_size,
        report.translate("PlotwiseReport", "Group spread, SD of members around the centre (m)"): reserve.group_spread,
    })
    report.section(report.translate("PlotwiseReport", "Areas"))
    report.table(
        [report.translate("PlotwiseReport", "Part"), report.translate("PlotwiseReport", "Area (km²)")],
        [[report.translate("PlotwiseReport", "Reserve"), reserve.boundary.area / 1e6],
         [report.translate("PlotwiseReport", "Lake (excluded)"), reserve.lake.area / 1e6],
         [report.translate("PlotwiseReport", "Private inholding (excluded)"), reserve.inholding.area / 1e6]],
    )
    report.section(report.translate("PlotwiseReport", "Map"))
    report.figure(reserve_map(report, reserve), report.translate(
        "PlotwiseReport", "Hollin Ridge Reserve, the excluded areas and the simulated animals."))
    report.section(report.translate("PlotwiseReport", "How the population was simulated"))
    report.paragraph(report.translate(
        "PlotwiseReport",
        "Group centres form an inhomogeneous Poisson process on the habitat (the reserve without the lake); "
        "their intensity is proportional to exp(0.9 × standardised greenness − 0.6 × standardised elevation). "
        "Each group has a Poisson number of members (mean {mu:g}) spread around its centre with a normal "
        "displacement of {sigma:g} m; members that fall off the habitat are not part of the population. "
        "This is a Thomas cluster process. Its expected total and variance are computed from the intensity "
        "surface on the raster grid."
    ).format(mu=reserve.mean_group_size, sigma=reserve.group_spread))
    report.references(REFERENCES)
    report.field_safety()
    return report


def reserve_map(report, reserve):
    """The reserve, its lake and inholding, and every third simulated animal."""
    animals = (MultiPoint([tuple(p) for p in reserve.animals_xy[::3]]),) if reserve.true_total else ()
    return map_svg([
        MapLayer((reserve.boundary,), label=report.translate("PlotwiseReport", "Reserve"), fill="#eef3e8",
                 stroke="#1f3a44", stroke_width=1.5),
        MapLayer((reserve.lake,), label=report.translate("PlotwiseReport", "Lake"), fill="#9cc3d9", stroke="#3b6e8f"),
        MapLayer((reserve.inholding,), label=report.translate("PlotwiseReport", "Private inholding"), fill="#e6d3b3",
                 stroke="#a8875b"),
        MapLayer(animals, label=report.translate("PlotwiseReport", "Velmar (every third animal)"),
                 fill=CATEGORY_COLOURS[3], stroke=CATEGORY_COLOURS[3], point_radius=1.2),
    ])
