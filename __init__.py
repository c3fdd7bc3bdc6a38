"""Plotwise: survey design and estimation for protected areas, as a QGIS processing provider."""


def classFactory(iface):  # noqa: N802 (host naming)
    """Entry point called by the host when the plugin is loaded."""
    from .plugin.plugin import PlotwisePlugin

    return PlotwisePlugin(iface)
