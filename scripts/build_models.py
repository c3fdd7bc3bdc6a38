"""Write the example chains in processing/models/ (.model3) with the host's model API.

Their display names and help live in processing/provider.py (EXAMPLE_CHAINS), so that they are translated.
The labels of their parameters and outputs are marked here with QT_TRANSLATE_NOOP("ExampleChain", ...):
`make update-translations` reads this file, and the provider translates the labels when it loads a chain.

Run: .venv/bin/python scripts/build_models.py   (the provider offers the files in the toolbox)
"""
from pathlib import Path

from headless_host import start_host, stop_host

REPO = Path(__file__).resolve().parents[1]
MODELS = REPO / "processing" / "models"


def build():
    from qgis.core import (
        QgsProcessingModelAlgorithm as Model,
        QgsProcessingModelChildAlgorithm as Child,
        QgsProcessingModelChildParameterSource as Source,
        QgsProcessingModelOutput as Output,
        QgsProcessingModelParameter as ModelParameter,
        QgsProcessingParameterFeatureSource,
        QgsProcessingParameterMultipleLayers,
        QgsProcessingParameterNumber,
        QgsProcessingParameterRasterLayer,
    )
    from qgis.PyQt.QtCore import QT_TRANSLATE_NOOP, QPointF

    from plotwise.processing import compat

    def parameter(model, definition, x, y):
        model.addModelParameter(definition, ModelParameter(definition.name()))
        model.parameterComponent(definition.name()).setPosition(QPointF(x, y))

    def child(model, child_id, algorithm_id, description, sources, outputs, x, y):
        step = Child(algorithm_id)
        step.setChildId(child_id)
        step.setDescription(description)
        step.setPosition(QPointF(x, y))
        for name, source in sources.items():
            step.addParameterSources(name, [source])
        model_outputs = {}
        for output_name, (label, child_output) in outputs.items():
            out = Output(label, label)
            out.setChildId(child_id)
            out.setChildOutputName(child_output)
            out.setPosition(QPointF(x + 220, y + 40 * len(model_outputs)))
            model_outputs[label] = out
        step.setModelOutputs(model_outputs)
        model.addChildAlgorithm(step)
        return step

    static, param = Source.fromStaticValue, Source.fromModelParameter
    output, expr = Source.fromChildOutput, Source.fromExpression

    # 1. frame -> strata -> effort -> layout
    plan = Model("plan_survey", "Example chains", "examples")
    parameter(plan, QgsProcessingParameterFeatureSource("study_area", QT_TRANSLATE_NOOP("ExampleChain", "Study area"),
        [compat.TYPE_VECTOR_POLYGON]), 40, 40)
    parameter(plan, QgsProcessingParameterFeatureSource("exclusions",
        QT_TRANSLATE_NOOP("ExampleChain", "Excluded areas"), [compat.TYPE_VECTOR_POLYGON], optional=True), 40, 100)
    parameter(plan, QgsProcessingParameterRasterLayer("slope",
        QT_TRANSLATE_NOOP("ExampleChain", "Slope raster (degrees)"), optional=True), 40, 160)
    parameter(plan, QgsProcessingParameterNumber("max_slope",
        QT_TRANSLATE_NOOP("ExampleChain", "Steepest slope surveyed (degrees)"),
        compat.NUMBER_DOUBLE, 30.0, False, 0.0, 90.0), 40, 220)
    parameter(plan, QgsProcessingParameterMultipleLayers("covariates",
        QT_TRANSLATE_NOOP("ExampleChain", "Covariate rasters"), compat.TYPE_RASTER), 40, 280)
    parameter(plan, QgsProcessingParameterNumber("n_strata", QT_TRANSLATE_NOOP("ExampleChain", "Number of strata"),
        compat.NUMBER_INTEGER, 4, False, 2, 20), 40, 340)
    parameter(plan, QgsProcessingParameterNumber("total_units",
        QT_TRANSLATE_NOOP("ExampleChain", "Total number of units"), compat.NUMBER_INTEGER, 60, False, 2), 40, 400)
    parameter(plan, QgsProcessingParameterNumber("plot_side",
        QT_TRANSLATE_NOOP("ExampleChain", "Side of the square plots (m)"),
        compat.NUMBER_DOUBLE, 400.0, False, 1.0), 40, 460)
    parameter(plan, QgsProcessingParameterNumber("seed", QT_TRANSLATE_NOOP("ExampleChain", "Random seed (0 draws one)"),
        compat.NUMBER_INTEGER, 1, False, 0), 40, 520)
    child(plan, "frame", "plotwise:buildframe", "Sampling frame", {
        "INPUT": param("study_area"), "EXCLUDE": param("exclusions"), "MASK": param("slope"),
        "MASK_MAX": param("max_slope"), "EDGE_BUFFER": static(50.0),
    }, {"OUTPUT": (QT_TRANSLATE_NOOP("ExampleChain", "Sampling frame"), "OUTPUT")}, 320, 40)
    child(plan, "strata", "plotwise:stratify", "Strata", {
        "FRAME": output("frame", "OUTPUT"), "COVARIATES": param("covariates"), "METHOD": static(3),
        "STRATA": param("n_strata"), "MIN_AREA": static(5.0), "SEED": param("seed"),
    }, {"OUTPUT": (QT_TRANSLATE_NOOP("ExampleChain", "Strata"), "OUTPUT")}, 320, 180)
    child(plan, "effort", "plotwise:allocate", "Effort per stratum", {
        "STRATA": output("strata", "OUTPUT"), "STRATUM_FIELD": static("stratum"), "AREA_FIELD": static("area_ha"),
        "METHOD": static(2), "TOTAL": param("total_units"), "UNIT_AREA": expr("@plot_side * @plot_side"),
        "MIN_PER_STRATUM": static(2),
    }, {"OUTPUT": (QT_TRANSLATE_NOOP("ExampleChain", "Strata with units allocated"), "OUTPUT")}, 320, 320)
    child(plan, "units", "plotwise:layout", "Sample units", {
        "FRAME": output("effort", "OUTPUT"), "STRATUM_FIELD": static("stratum"), "N_FIELD": static("n_alloc"),
        "DESIGN": static(2), "SHAPE": static(1), "SIZE": param("plot_side"), "BEARING": static(0.0),
        "INSIDE": static(True), "MIN_SPACING": static(0.0), "RESERVE": static(3), "SEED": param("seed"),
    }, {"OUTPUT": (QT_TRANSLATE_NOOP("ExampleChain", "Sample units"), "OUTPUT"),
        "OUTPUT_GPX": (QT_TRANSLATE_NOOP("ExampleChain", "Waypoints (GPX)"), "OUTPUT_GPX"),
        "REPORT": (QT_TRANSLATE_NOOP("ExampleChain", "Layout report"), "REPORT")}, 320, 460)

    # 2. simulated counts -> estimate
    count = Model("estimate_simulated_counts", "Example chains", "examples")
    parameter(count, QgsProcessingParameterFeatureSource("units", QT_TRANSLATE_NOOP("ExampleChain", "Sample units"),
        [compat.TYPE_VECTOR_ANY]), 40, 40)
    parameter(count, QgsProcessingParameterFeatureSource("animals", QT_TRANSLATE_NOOP("ExampleChain", "Animal points"),
        [compat.TYPE_VECTOR_POINT]), 40, 100)
    parameter(count, QgsProcessingParameterFeatureSource("strata", QT_TRANSLATE_NOOP("ExampleChain", "Strata"),
        [compat.TYPE_VECTOR_POLYGON]), 40, 160)
    parameter(count, QgsProcessingParameterNumber("detection",
        QT_TRANSLATE_NOOP("ExampleChain", "Detection probability"),
        compat.NUMBER_DOUBLE, 1.0, False, 0.001, 1.0), 40, 220)
    parameter(count, QgsProcessingParameterNumber("seed",
        QT_TRANSLATE_NOOP("ExampleChain", "Random seed (0 draws one)"), compat.NUMBER_INTEGER, 1, False, 0), 40, 280)
    child(count, "counts", "plotwise:simulatecounts", "Simulated counts", {
        "UNITS": param("units"), "ANIMALS": param("animals"), "DETECTION": param("detection"), "SEED": param("seed"),
    }, {"OUTPUT": (QT_TRANSLATE_NOOP("ExampleChain", "Units with counts"), "OUTPUT")}, 320, 40)
    child(count, "estimate", "plotwise:estimate", "Density and abundance", {
        "UNITS": output("counts", "OUTPUT"), "COUNT_FIELD": static("count"), "STRATUM_FIELD": static("stratum"),
        "UNIT_AREA_FIELD": static("area_m2"), "STRATA": param("strata"), "STRATA_ID_FIELD": static("stratum"),
        "CONFIDENCE": static(0.95), "CI_METHOD": static(0), "DETECTION_P": param("detection"), "SEED": param("seed"),
    }, {"OUTPUT": (QT_TRANSLATE_NOOP("ExampleChain", "Estimate by stratum"), "OUTPUT"),
        "OUTPUT_TABLE": (QT_TRANSLATE_NOOP("ExampleChain", "Estimate table"), "OUTPUT_TABLE"),
        "REPORT": (QT_TRANSLATE_NOOP("ExampleChain", "Estimate report"), "REPORT")}, 320, 200)

    MODELS.mkdir(parents=True, exist_ok=True)
    for model in (plan, count):
        path = MODELS / f"{model.name()}.model3"
        assert model.toFile(str(path)), path
        print("written", path.relative_to(REPO))


if __name__ == "__main__":
    app, processing = start_host()
    build()
    stop_host()
