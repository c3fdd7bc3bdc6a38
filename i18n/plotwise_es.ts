<?xml version="1.0" encoding="utf-8"?>
<!DOCTYPE TS>
<TS version="2.1" language="es_ES">
<context>
    <name>Allocate</name>
    <message>
        <location filename="../processing/algorithms/allocate.py" line="65"/>
        <source>Allocate effort to strata</source>
        <translation>Asignar el esfuerzo a los estratos</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/allocate.py" line="104"/>
        <source>Strata</source>
        <translation>Estratos</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/allocate.py" line="107"/>
        <source>Stratum identifier field</source>
        <translation>Campo identificador del estrato</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/allocate.py" line="113"/>
        <source>Stratum area field (hectares; empty: polygon area)</source>
        <translation>Campo de área del estrato (hectáreas; vacío: área del polígono)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/allocate.py" line="119"/>
        <source>Pilot SD of counts per unit</source>
        <translation>Desviación estándar piloto de los conteos por unidad</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/allocate.py" line="119"/>
        <source>Pilot mean count per unit</source>
        <translation>Conteo medio piloto por unidad</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/allocate.py" line="119"/>
        <source>Cost per unit</source>
        <translation>Coste por unidad</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/allocate.py" line="127"/>
        <source>Costs are field days</source>
        <translation>Los costes son jornadas de campo</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/allocate.py" line="130"/>
        <source>Fixed cost of the survey (c0, in the cost unit)</source>
        <translation>Coste fijo del muestreo (c0, en la unidad de coste)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/allocate.py" line="139"/>
        <source>Allocation method</source>
        <translation>Método de asignación</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/allocate.py" line="139"/>
        <source>Equal</source>
        <translation>Igual</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/allocate.py" line="139"/>
        <source>Proportional to area</source>
        <translation>Proporcional al área</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/allocate.py" line="321"/>
        <source>Neyman</source>
        <translation>Neyman</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/allocate.py" line="139"/>
        <source>Optimal with cost</source>
        <translation>Óptima con coste</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/allocate.py" line="147"/>
        <source>Total number of units</source>
        <translation>Número total de unidades</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/allocate.py" line="152"/>
        <source>Budget (0: not used; needs the cost field)</source>
        <translation>Presupuesto (0: no se usa; necesita el campo de coste)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/allocate.py" line="158"/>
        <source>Target CV of the overall density (0: not used; e.g. 0.2)</source>
        <translation>CV objetivo de la densidad global (0: no se usa; p. ej. 0.2)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/allocate.py" line="164"/>
        <source>Area of one sample unit (m²)</source>
        <translation>Área de una unidad de muestreo (m²)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/allocate.py" line="170"/>
        <source>Minimum units per stratum</source>
        <translation>Mínimo de unidades por estrato</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/allocate.py" line="98"/>
        <source>Strata with allocation</source>
        <translation>Estratos con asignación</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/allocate.py" line="100"/>
        <source>Expected CV of the overall density</source>
        <translation>CV esperado de la densidad global</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/allocate.py" line="189"/>
        <source>The strata layer could not be opened.</source>
        <translation>No se pudo abrir la capa de estratos.</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/allocate.py" line="195"/>
        <source>Layer &apos;{layer}&apos; has no strata with an area.</source>
        <translation>La capa «{layer}» no tiene ningún estrato con área.</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/allocate.py" line="273"/>
        <source>field &apos;{name}&apos; of layer &apos;{layer}&apos;</source>
        <translation>campo «{name}» de la capa «{layer}»</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/allocate.py" line="256"/>
        <source>No pilot SD field: the covariate SD (&apos;{field}&apos;) is used as a proxy. This assumes that counts scale with the covariate; replace it with the SD of a pilot survey when you have one. The expected SEs are then in covariate units, not counts.</source>
        <translation>No hay campo de DE piloto: se usa como sustituto la DE de la covariable («{field}»). Esto supone que los conteos siguen a la covariable; sustitúyala por la DE de un muestreo piloto cuando la tenga. Los errores estándar esperados quedan entonces en unidades de la covariable, no en conteos.</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/allocate.py" line="276"/>
        <source>polygon area</source>
        <translation>área del polígono</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/allocate.py" line="276"/>
        <source>pilot SD</source>
        <translation>desviación estándar piloto</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/allocate.py" line="276"/>
        <source>pilot mean</source>
        <translation>media piloto</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/allocate.py" line="276"/>
        <source>cost</source>
        <translation>coste</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/allocate.py" line="311"/>
        <source>The output layer could not be created.</source>
        <translation>No se pudo crear la capa de salida.</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/allocate.py" line="219"/>
        <source>{total} units allocated ({method}); expected CV of the overall density: {cv}.</source>
        <translation>{total} unidades asignadas ({method}); CV esperado de la densidad global: {cv}.</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/allocate.py" line="320"/>
        <source>equal</source>
        <translation>igual</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/allocate.py" line="320"/>
        <source>proportional to area</source>
        <translation>proporcional al área</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/allocate.py" line="321"/>
        <source>optimal with cost</source>
        <translation>óptima con coste</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/allocate.py" line="68"/>
        <source>Decides how many sample units each stratum gets, and shows beforehand the precision they buy.

Methods: equal; proportional to stratum area; Neyman, n_h ∝ A_h·S_h (Neyman 1934; Cochran 1977, ch. 5); optimal with cost, n_h ∝ A_h·S_h/√c_h, under a budget C = c0 + Σ c_h·n_h (Cochran 1977, ch. 5).

Target: a target CV (if above 0) finds the smallest total whose expected CV of the overall density meets it; else a budget (if above 0, needs the cost field); else the total number of units.

Bounds: at least the minimum per stratum (2 by default, so that each stratum variance can be estimated) and at most the units that fit (stratum area / unit area). A stratum that reaches a bound keeps it and the rest is shared among the others, until stable. Whole units are rounded by largest remainder, keeping the total.

Area field: the stratum area in hectares (default area_ha, as written by the stratification); when it is empty or missing, the polygon area is used.
SD field: the pilot standard deviation of counts per unit. Without it the covariate SD (cov_sd) is used as a proxy, which assumes that counts scale with the covariate; without either, the allocation is proportional.
Mean field: the pilot mean count per unit, needed for CVs and for a target CV. Cost field: cost of surveying one unit in each stratum (for instance field days).

Layout to come: the finite-population correction 1 − n·a/A is used only when the units will not overlap (systematic grid, spatially balanced, or simple random with a minimum spacing of at least the unit's width); simple random centres without one may overlap, a continuous population with no such correction (Cordy 1993). plotwise:estimate applies the same rule.

Output: the strata with n_alloc (units) and exp_cv (expected CV of the stratum density), and a report comparing equal, proportional and Neyman allocation at the same total.</source>
        <translation>Decide cuántas unidades de muestreo recibe cada estrato y muestra de antemano la precisión que aportan.

Métodos: igual; proporcional al área del estrato; Neyman, n_h ∝ A_h·S_h (Neyman 1934; Cochran 1977, cap. 5); óptima con coste, n_h ∝ A_h·S_h/√c_h, con un presupuesto C = c0 + Σ c_h·n_h (Cochran 1977, cap. 5).

Objetivo: un CV objetivo (si es mayor que 0) busca el menor total cuyo coeficiente de variación esperado de la densidad global lo cumple; si no, un presupuesto (si es mayor que 0, necesita el campo de coste); si no, el número total de unidades.

Límites: al menos el mínimo por estrato (2 por defecto, para que se pueda estimar la varianza de cada estrato) y como máximo las unidades que caben (área del estrato / área de la unidad). Un estrato que alcanza un límite lo conserva y el resto se reparte entre los demás, hasta que se estabiliza. Las unidades enteras se redondean por el mayor resto, conservando el total.

Campo de área: el área del estrato en hectáreas (area_ha por defecto, como lo escribe la estratificación); si está vacío o falta, se usa el área del polígono.
Campo de DE: la desviación estándar piloto de los conteos por unidad. Sin él se usa como sustituto la DE de la covariable (cov_sd), lo que supone que los conteos siguen a la covariable; sin ninguno de los dos, la asignación es proporcional.
Campo de media: el conteo medio piloto por unidad, necesario para los CV y para un CV objetivo. Campo de coste: coste de muestrear una unidad en cada estrato (por ejemplo, jornadas de campo).

Disposición prevista: la corrección por población finita 1 − n·a/A solo se usa cuando las unidades no se solaparán (cuadrícula sistemática, espacialmente equilibrada, o aleatoria simple con una separación mínima de al menos el ancho de la unidad); los centros aleatorios simples sin ella pueden solaparse, una población continua que no tiene tal corrección (Cordy 1993). plotwise:estimate aplica la misma regla.

Salida: los estratos con n_alloc (unidades) y exp_cv (CV esperado de la densidad del estrato), y un informe que compara la asignación igual, la proporcional y la de Neyman con el mismo total.</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/allocate.py" line="176"/>
        <source>Layout to come (decides the finite-population correction)</source>
        <translation>Disposición prevista (decide la corrección por población finita)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/allocate.py" line="176"/>
        <source>Simple random (units may overlap: no correction)</source>
        <translation>Aleatorio simple (las unidades pueden solaparse: sin corrección)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/allocate.py" line="176"/>
        <source>Simple random with a minimum spacing of at least the unit&apos;s width</source>
        <translation>Aleatorio simple con una separación mínima de al menos el ancho de la unidad</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/allocate.py" line="176"/>
        <source>Systematic grid</source>
        <translation>Cuadrícula sistemática</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/allocate.py" line="176"/>
        <source>Spatially balanced</source>
        <translation>Espacialmente equilibrado</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/allocate.py" line="236"/>
        <source>Layer &apos;{layer}&apos; has no area field: the polygon areas are used.</source>
        <translation>La capa «{layer}» no tiene campo de área: se usan las áreas de los polígonos.</translation>
    </message>
</context>
<context>
    <name>BuildFrame</name>
    <message>
        <location filename="../processing/algorithms/buildframe.py" line="35"/>
        <source>Build sampling frame</source>
        <translation>Construir el marco de muestreo</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/buildframe.py" line="38"/>
        <source>Builds the sampling frame: the part of the study area that the survey can speak for.

Three rules are applied in this order, each one charged only with the area still in the frame when it is applied:
1. Excluded polygons (water, private inholdings, ...) are removed.
2. Cells of the mask raster (band 1) whose value lies outside [minimum, maximum], or is NoData, are removed. Either bound may be left empty. Cells of the study area that the raster does not cover count as NoData. A raster in another CRS is reprojected on the fly (nearest neighbour). Example: a slope raster in degrees with maximum 30.
3. An inward strip of the given width (metres) along the study area&apos;s boundary is removed.

The result is dissolved into one valid feature with fields frame_id and area_ha. The report gives the area kept, the area lost to each rule and a map.

A study area in geographic coordinates is projected to the UTM zone of its centre; the output is in that CRS. Empty or zero-area features are skipped and invalid geometries repaired, each with a warning.

Estimates from a survey on this frame apply to the frame only. Excluding steep terrain does not make the remaining terrain safe: check every unit&apos;s access and safety before fieldwork.</source>
        <translation>Construye el marco de muestreo: la parte del área de estudio sobre la que el muestreo puede pronunciarse.

Se aplican tres reglas en este orden, y a cada una solo se le imputa el área que seguía en el marco cuando se aplica:
1. Se quitan los polígonos excluidos (agua, enclaves privados, ...).
2. Se quitan las celdas del ráster de máscara (banda 1) cuyo valor queda fuera de [mínimo, máximo] o es NoData. Cualquiera de los límites puede quedar vacío. Las celdas del área de estudio que el ráster no cubre cuentan como NoData. Un ráster en otro SRC se reproyecta al vuelo (vecino más próximo). Ejemplo: un ráster de pendiente en grados con máximo 30.
3. Se quita una franja interior del ancho indicado (metros) a lo largo del límite del área de estudio.

El resultado se disuelve en una sola entidad válida con los campos frame_id y area_ha. El informe da el área conservada, el área perdida por cada regla y un mapa.

Un área de estudio en coordenadas geográficas se proyecta a la zona UTM de su centro; la salida está en ese SRC. Las entidades vacías o de área nula se omiten y las geometrías no válidas se reparan, cada vez con una advertencia.

Las estimaciones de un muestreo sobre este marco valen solo para el marco. Excluir el terreno escarpado no hace seguro el terreno restante: compruebe el acceso y la seguridad de cada unidad antes del trabajo de campo.</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/buildframe.py" line="59"/>
        <source>Study area</source>
        <translation>Área de estudio</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/buildframe.py" line="64"/>
        <source>Areas to exclude (water, inholdings, ...)</source>
        <translation>Zonas que excluir (agua, enclaves, ...)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/buildframe.py" line="72"/>
        <source>Mask raster (cells outside the range are excluded)</source>
        <translation>Ráster de máscara (se excluyen las celdas fuera del intervalo)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/buildframe.py" line="77"/>
        <source>Lowest accepted mask value (empty: no lower limit)</source>
        <translation>Valor mínimo aceptado de la máscara (vacío: sin límite inferior)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/buildframe.py" line="85"/>
        <source>Highest accepted mask value (empty: no upper limit)</source>
        <translation>Valor máximo aceptado de la máscara (vacío: sin límite superior)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/buildframe.py" line="93"/>
        <source>Inward edge buffer (m)</source>
        <translation>Franja interior en el borde (m)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/buildframe.py" line="102"/>
        <source>Sampling frame</source>
        <translation>Marco de muestreo</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/buildframe.py" line="125"/>
        <source>Layer &apos;{layer}&apos;: invalid geometry repaired for feature id(s) {ids}.</source>
        <translation>Capa «{layer}»: geometría no válida reparada para los identificadores de entidad {ids}.</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/buildframe.py" line="131"/>
        <source>Layer &apos;{layer}&apos;: empty or zero-area feature id(s) {ids} skipped.</source>
        <translation>Capa «{layer}»: entidades vacías o de área nula omitidas (identificadores {ids}).</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/buildframe.py" line="187"/>
        <source>MASK_MIN or MASK_MAX is set but no mask raster (MASK) is given. Choose a raster or leave both limits empty.</source>
        <translation>MASK_MIN o MASK_MAX tiene valor pero no se ha dado ningún ráster de máscara (MASK). Elija un ráster o deje vacíos ambos límites.</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/buildframe.py" line="192"/>
        <source>The lowest accepted mask value (MASK_MIN = {lo}) is greater than the highest (MASK_MAX = {hi}). Swap them or leave one empty.</source>
        <translation>El valor mínimo aceptado de la máscara (MASK_MIN = {lo}) es mayor que el máximo (MASK_MAX = {hi}). Intercámbielos o deje uno vacío.</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/buildframe.py" line="202"/>
        <source>Layer &apos;{layer}&apos; (INPUT) has no polygon with a positive area. Choose the study-area polygon layer.</source>
        <translation>La capa «{layer}» (INPUT) no tiene ningún polígono con área positiva. Elija la capa de polígonos del área de estudio.</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/buildframe.py" line="219"/>
        <source>Mask raster &apos;{layer}&apos; is given without limits: only its NoData cells are excluded.</source>
        <translation>El ráster de máscara «{layer}» se ha dado sin límites: solo se excluyen sus celdas NoData.</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/buildframe.py" line="226"/>
        <source>Mask raster &apos;{layer}&apos; is not a file raster that GDAL can read. Save it as a GeoTIFF first.</source>
        <translation>El ráster de máscara «{layer}» no es un archivo ráster que GDAL pueda leer. Guárdelo primero como GeoTIFF.</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/buildframe.py" line="230"/>
        <source>Reading mask raster '{layer}'…</source>
        <translation>Leyendo el ráster de máscara «{layer}»…</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/buildframe.py" line="242"/>
        <source>Mask raster reprojected to {crs} on the fly: {rows} × {cols} cells of {size} m.</source>
        <translation>Ráster de máscara reproyectado al vuelo a {crs}: {rows} × {cols} celdas de {size} m.</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/buildframe.py" line="249"/>
        <source>Mask raster &apos;{layer}&apos; does not cover {n} of the {total} cells over the study area&apos;s extent; those cells count as NoData and are excluded.</source>
        <translation>El ráster de máscara «{layer}» no cubre {n} de las {total} celdas de la extensión del área de estudio; esas celdas cuentan como NoData y se excluyen.</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/buildframe.py" line="270"/>
        <source>Frame: {kept} ha of {total} ha ({pct} %).</source>
        <translation>Marco: {kept} ha de {total} ha ({pct} %).</translation>
    </message>
</context>
<context>
    <name>CompareDesigns</name>
    <message>
        <location filename="../processing/algorithms/comparedesigns.py" line="63"/>
        <source>Compare survey designs by simulation</source>
        <translation>Comparar diseños de muestreo por simulación</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/comparedesigns.py" line="124"/>
        <source>Density surface (expected animals per km²)</source>
        <translation>Superficie de densidad (animales esperados por km²)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/comparedesigns.py" line="126"/>
        <source>Sampling frame</source>
        <translation>Marco de muestreo</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/comparedesigns.py" line="129"/>
        <source>Strata (for the stratified designs)</source>
        <translation>Estratos (para los diseños estratificados)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/comparedesigns.py" line="134"/>
        <source>Stratum field</source>
        <translation>Campo de estrato</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/comparedesigns.py" line="139"/>
        <source>Designs to compare</source>
        <translation>Diseños que comparar</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/comparedesigns.py" line="139"/>
        <source>Simple random</source>
        <translation>Aleatorio simple</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/comparedesigns.py" line="139"/>
        <source>Stratified, proportional allocation</source>
        <translation>Estratificado, asignación proporcional</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/comparedesigns.py" line="139"/>
        <source>Systematic grid</source>
        <translation>Cuadrícula sistemática</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/comparedesigns.py" line="139"/>
        <source>Spatially balanced</source>
        <translation>Espacialmente equilibrado</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/comparedesigns.py" line="151"/>
        <source>Number of units</source>
        <translation>Número de unidades</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/comparedesigns.py" line="156"/>
        <source>Unit shape</source>
        <translation>Forma de la unidad</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/comparedesigns.py" line="156"/>
        <source>Point station</source>
        <translation>Estación puntual</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/comparedesigns.py" line="156"/>
        <source>Square plot</source>
        <translation>Parcela cuadrada</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/comparedesigns.py" line="156"/>
        <source>Circular plot</source>
        <translation>Parcela circular</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/comparedesigns.py" line="156"/>
        <source>Line transect</source>
        <translation>Transecto lineal</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/comparedesigns.py" line="163"/>
        <source>Unit size (m): counting radius, side, radius or transect length</source>
        <translation>Tamaño de la unidad (m): radio de conteo, lado, radio o longitud del transecto</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/comparedesigns.py" line="169"/>
        <source>Half-width of a transect&apos;s counting strip (m)</source>
        <translation>Semianchura de la franja de conteo de un transecto (m)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/comparedesigns.py" line="175"/>
        <source>Bearing of units and grid (degrees from grid north; −1 random)</source>
        <translation>Rumbo de las unidades y de la cuadrícula (grados desde el norte de la cuadrícula; −1 aleatorio)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/comparedesigns.py" line="181"/>
        <source>Keep units wholly inside their stratum (as the layout&apos;s option)</source>
        <translation>Mantener las unidades por completo dentro de su estrato (como la opción de la disposición)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/comparedesigns.py" line="190"/>
        <source>Simulated surveys per design</source>
        <translation>Muestreos simulados por diseño</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/comparedesigns.py" line="196"/>
        <source>Overdispersion k of the negative binomial (0: Poisson counts)</source>
        <translation>Sobredispersión k de la binomial negativa (0: conteos de Poisson)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/comparedesigns.py" line="202"/>
        <source>Variance estimator for the grid and balanced designs</source>
        <translation>Estimador de la varianza para los diseños en cuadrícula y equilibrados</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/comparedesigns.py" line="202"/>
        <source>Simple random sampling formula</source>
        <translation>Fórmula del muestreo aleatorio simple</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/comparedesigns.py" line="202"/>
        <source>Local neighbourhood (Stevens &amp; Olsen 2003)</source>
        <translation>Vecindario local (Stevens &amp; Olsen 2003)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/comparedesigns.py" line="210"/>
        <source>Range of units for RMSE against n (e.g. 20, 40, 80 or 20:100:20; empty: none)</source>
        <translation>Rango de unidades para la RECM frente a n (p. ej. 20, 40, 80 o 20:100:20; vacío: ninguno)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/comparedesigns.py" line="116"/>
        <source>Design comparison</source>
        <translation>Comparación de diseños</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/comparedesigns.py" line="120"/>
        <source>Recommended design</source>
        <translation>Diseño recomendado</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/comparedesigns.py" line="226"/>
        <source>The density surface could not be opened.</source>
        <translation>No se pudo abrir la superficie de densidad.</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/comparedesigns.py" line="274"/>
        <source>The sampling frame could not be opened.</source>
        <translation>No se pudo abrir el marco de muestreo.</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/comparedesigns.py" line="280"/>
        <source>Layer &apos;{layer}&apos; has no polygon with an area.</source>
        <translation>La capa «{layer}» no tiene ningún polígono con área.</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/comparedesigns.py" line="298"/>
        <source>Layer &apos;{layer}&apos;: field &apos;{field}&apos; is empty (NULL) for feature id(s) {ids}. Give every stratum a value.</source>
        <translation>Capa «{layer}»: el campo «{field}» está vacío (NULL) en las entidades {ids}. Dé un valor a cada estrato.</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/comparedesigns.py" line="313"/>
        <source>No strata were given: the stratified designs are left out ({names}).</source>
        <translation>No se dieron estratos: se dejan fuera los diseños estratificados ({names}).</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/comparedesigns.py" line="317"/>
        <source>The stratified designs need strata: give the strata layer, or choose another design.</source>
        <translation>Los diseños estratificados necesitan estratos: indique la capa de estratos o elija otro diseño.</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/comparedesigns.py" line="235"/>
        <source>Reading the density surface…</source>
        <translation>Leyendo la superficie de densidad…</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/comparedesigns.py" line="241"/>
        <source>The density surface was warped to {crs} (bilinear) to match the frame.</source>
        <translation>La superficie de densidad se reproyectó a {crs} (bilineal) para ajustarse al marco.</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/comparedesigns.py" line="359"/>
        <source>Simulating {n} units…</source>
        <translation>Simulando {n} unidades…</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/comparedesigns.py" line="365"/>
        <source>{n} units were left out of the range: {why}</source>
        <translation>{n} unidades quedaron fuera del rango: {why}</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/comparedesigns.py" line="374"/>
        <source>The output table could not be created.</source>
        <translation>No se pudo crear la tabla de salida.</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/comparedesigns.py" line="264"/>
        <source>Recommended design: {name} (RMSE {rmse:.1f} animals, {rel:.1%} of the total; coverage {cov:.0%}).</source>
        <translation>Diseño recomendado: {name} (RECM {rmse:.1f} animales, {rel:.1%} del total; cobertura {cov:.0%}).</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/comparedesigns.py" line="70"/>
        <source>Before fieldwork: which design, and how many units, give a usable estimate on this area? The algorithm simulates many surveys of a plausible density surface and reports how each design did.

Surface: a raster of expected animals per km² (from a habitat model, an expert map or an earlier survey), warped to the frame's CRS when needed. Frame: the sampling frame. Strata (optional, with the stratum field, default 'stratum'): needed by the two stratified designs.

Each replicate realises a population: Poisson counts in every surface cell, or with an overdispersion k above 0 negative binomial counts (gamma-Poisson, variance μ + μ²/k per cell). Every chosen design is then laid out with the layout engine, its units count the animals in the cells they cover (the part inside the frame or their stratum), and the abundance is estimated with the estimation engine (ratio estimator, t interval with Satterthwaite df; Cochran 1977). All designs survey the same populations, so their differences are not blurred.

Designs: simple random; stratified with proportional allocation; stratified with Neyman allocation, n_h ∝ A_h·S_h with S_h the SD of a unit's count implied by the surface (Neyman 1934): the best case, since no survey knows the true S_h; systematic grid with a random start (its n varies); spatially balanced (balanced acceptance sampling, Robertson et al. 2013); stratified Neyman from a pilot: in every simulated survey S_h is estimated from a pilot of the given number of simple random units per stratum (of an independent realisation, a pilot season), as a real survey would estimate it.

Units: point station (size = counting radius), square plot (side), circular plot (radius), line transect (length, counting a strip of the given half-width on each side). Bearing in degrees clockwise from grid north, −1 random (the default: a grid aligned with straight edges puts whole rows in the edge band at once). Edges follow the layout's protocol: by default plus sampling, with centres over each stratum (or the frame) grown by the unit's reach, each unit counting only the cells of its own stratum with its nominal area, and the estimate expanding to the grown area (Gregoire &amp; Valentine 2008, ch. 10); with keep units inside, centres from each stratum shrunk by the unit's radius, as the layout's option does.

Output table, one row per design: rel_bias (relative bias against each population's true total), emp_se (SD of the errors), rmse (root mean square error) and rmse_mcse (its Monte Carlo SE), rel_rmse (rmse / mean true total), mean_cv (mean estimated CV), coverage (share of 95 % intervals holding the truth), mean_n (mean units surveyed), alloc (units per stratum), recommend (1 for the recommended design: the lowest RMSE among designs whose intervals cover at least 90 %).

Range of units (optional), e.g. '20, 40, 80' or '20:100:20': the comparison is repeated at each n and the report draws RMSE against n, showing where more effort stops paying.

The simulation assumes the surface is right and every animal in a unit is counted. Results are only as good as the surface. Check every unit's access and safety before fieldwork: the tool never makes a location safe.</source>
        <translation>Antes del trabajo de campo: ¿qué diseño, y cuántas unidades, dan una estimación útil en esta zona? El algoritmo simula muchos muestreos de una superficie de densidad plausible e informa de cómo le fue a cada diseño.

Superficie: un ráster de animales esperados por km² (de un modelo de hábitat, un mapa de expertos o un muestreo anterior), reproyectado al SRC del marco cuando hace falta. Marco: el marco de muestreo. Estratos (opcionales, con el campo de estrato, 'stratum' por defecto): necesarios para los dos diseños estratificados.

Cada réplica genera una población: conteos de Poisson en cada celda de la superficie o, con una sobredispersión k mayor que 0, conteos binomiales negativos (gamma-Poisson, varianza μ + μ²/k por celda). Luego cada diseño elegido se dispone con el motor de disposición, sus unidades cuentan los animales de las celdas que cubren (la parte dentro del marco o de su estrato) y la abundancia se estima con el motor de estimación (estimador de razón, intervalo t con gl de Satterthwaite; Cochran 1977). Todos los diseños muestrean las mismas poblaciones, de modo que sus diferencias no se difuminan.

Diseños: aleatorio simple; estratificado con asignación proporcional; estratificado con asignación de Neyman, n_h ∝ A_h·S_h con S_h la DE del conteo de una unidad implicada por la superficie (Neyman 1934): el mejor caso, ya que ningún muestreo conoce la S_h verdadera; cuadrícula sistemática con inicio aleatorio (su n varía); espacialmente equilibrado (muestreo por aceptación equilibrada, Robertson et al. 2013); Neyman estratificado a partir de un piloto: en cada muestreo simulado, S_h se estima a partir de un piloto con el número indicado de unidades aleatorias simples por estrato (de una realización independiente, una temporada piloto), como lo estimaría un muestreo real.

Unidades: estación puntual (tamaño = radio de conteo), parcela cuadrada (lado), parcela circular (radio), transecto lineal (longitud, contando una franja de la semianchura indicada a cada lado). Rumbo en grados en sentido horario desde el norte de la cuadrícula, −1 aleatorio (el valor por defecto: una cuadrícula alineada con bordes rectos pone de una vez filas enteras en la franja del borde). Los bordes siguen el protocolo de la disposición: por defecto el muestreo «plus», con centros sobre cada estrato (o el marco) ampliado en el alcance de la unidad, cada unidad contando solo las celdas de su propio estrato con su área nominal, y la estimación extendiéndose al área ampliada (Gregoire &amp; Valentine 2008, cap. 10); con las unidades mantenidas dentro, centros sorteados en cada estrato reducido en el radio de la unidad, como hace la opción de la disposición.

Tabla de salida, una fila por diseño: rel_bias (sesgo relativo frente al total verdadero de cada población), emp_se (DE de los errores), rmse (raíz del error cuadrático medio) y rmse_mcse (su error estándar de Monte Carlo), rel_rmse (rmse / total verdadero medio), mean_cv (CV estimado medio), coverage (proporción de intervalos al 95 % que contienen la verdad), mean_n (media de unidades muestreadas), alloc (unidades por estrato), recommend (1 para el diseño recomendado: la menor RECM entre los diseños cuyos intervalos cubren al menos el 90 %).

Rango de unidades (opcional), p. ej. '20, 40, 80' o '20:100:20': la comparación se repite con cada n y el informe dibuja la RECM frente a n, mostrando dónde más esfuerzo deja de compensar.

La simulación supone que la superficie es correcta y que se cuenta cada animal de una unidad. Los resultados valen lo que vale la superficie. Compruebe el acceso y la seguridad de cada unidad antes del trabajo de campo: la herramienta nunca hace que una ubicación sea segura.</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/comparedesigns.py" line="139"/>
        <source>Stratified, Neyman allocation with the true S_h (best case)</source>
        <translation>Estratificado, asignación de Neyman con la S_h verdadera (mejor caso)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/comparedesigns.py" line="139"/>
        <source>Stratified, Neyman allocation from a pilot survey</source>
        <translation>Estratificado, asignación de Neyman a partir de un muestreo piloto</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/comparedesigns.py" line="202"/>
        <source>Local neighbourhood, scaled to the simple formula (our variant)</source>
        <translation>Vecindario local, escalado a la fórmula simple (nuestra variante)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/comparedesigns.py" line="216"/>
        <source>Pilot units per stratum for the pilot-based Neyman design</source>
        <translation>Unidades piloto por estrato para el diseño de Neyman basado en un piloto</translation>
    </message>
</context>
<context>
    <name>DemoReserve</name>
    <message>
        <location filename="../processing/algorithms/demoreserve.py" line="33"/>
        <source>Demo reserve with a simulated population</source>
        <translation>Reserva de demostración con una población simulada</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/demoreserve.py" line="36"/>
        <source>&lt;p&gt;Builds Hollin Ridge Reserve, an invented upland reserve for demonstrations, training and tests, and a simulated population of the velmar, an invented grazing antelope. Nothing in it describes a real place or species.&lt;/p&gt;&lt;p&gt;The reserve covers 250–350 km² in WGS 84 / UTM zone 36S, with an irregular boundary, a lake and a private inholding (both in the excluded-areas layer), an elevation raster (synthetic fractal terrain with a steep escarpment) and a greenness raster (a vegetation index from 0 to 1, correlated with elevation, plus noise).&lt;/p&gt;&lt;p&gt;The velmar live in groups: an inhomogeneous Thomas cluster process whose group centres are denser where greenness is high and elevation low. The true total is known, and the expected number of animals per km² is written as a raster, so that survey designs and estimates can be checked against the truth.&lt;/p&gt;&lt;h3&gt;Parameters&lt;/h3&gt;&lt;ul&gt;&lt;li&gt;&lt;b&gt;Random seed&lt;/b&gt;: the same seed gives the same reserve and animals. 0 draws a seed and records it.&lt;/li&gt;&lt;li&gt;&lt;b&gt;Raster cell size&lt;/b&gt;: metres, 10 to 500 (default 50).&lt;/li&gt;&lt;/ul&gt;&lt;h3&gt;Outputs&lt;/h3&gt;&lt;ul&gt;&lt;li&gt;Reserve boundary (&lt;i&gt;name&lt;/i&gt;, &lt;i&gt;area_ha&lt;/i&gt;)&lt;/li&gt;&lt;li&gt;Excluded areas (&lt;i&gt;kind&lt;/i&gt; lake or inholding, &lt;i&gt;name&lt;/i&gt;, &lt;i&gt;area_ha&lt;/i&gt;)&lt;/li&gt;&lt;li&gt;Elevation (m), greenness (0–1) and expected velmar per km² rasters&lt;/li&gt;&lt;li&gt;Animals (&lt;i&gt;animal_id&lt;/i&gt;, &lt;i&gt;group_id&lt;/i&gt;)&lt;/li&gt;&lt;li&gt;An HTML report&lt;/li&gt;&lt;/ul&gt;&lt;p&gt;References: Thomas, M. (1949) A generalization of Poisson's binomial limit for use in ecology. Biometrika 36:18–25. Diggle, P. J. (2013) Statistical Analysis of Spatial and Spatio-Temporal Point Patterns, 3rd ed., CRC Press.&lt;/p&gt;</source>
        <translation>&lt;p&gt;Construye Hollin Ridge Reserve, una reserva de montaña inventada para demostraciones, formación y pruebas, y una población simulada de velmar, un antílope herbívoro inventado. Nada de ello describe un lugar o una especie reales.&lt;/p&gt;&lt;p&gt;La reserva abarca 250–350 km² en WGS 84 / UTM zona 36S, con un límite irregular, un lago y un enclave privado (ambos en la capa de zonas excluidas), un ráster de altitud (relieve fractal sintético con un escarpe abrupto) y un ráster de verdor (un índice de vegetación de 0 a 1, correlacionado con la altitud, más ruido).&lt;/p&gt;&lt;p&gt;Los velmar viven en grupos: un proceso de conglomerados de Thomas no homogéneo cuyos centros de grupo son más densos donde el verdor es alto y la altitud baja. El total verdadero se conoce, y el número esperado de animales por km² se escribe como ráster, para poder contrastar los diseños de muestreo y las estimaciones con la verdad.&lt;/p&gt;&lt;h3&gt;Parámetros&lt;/h3&gt;&lt;ul&gt;&lt;li&gt;&lt;b&gt;Semilla aleatoria&lt;/b&gt;: la misma semilla da la misma reserva y los mismos animales. 0 sortea una y la registra.&lt;/li&gt;&lt;li&gt;&lt;b&gt;Tamaño de celda del ráster&lt;/b&gt;: metros, de 10 a 500 (50 por defecto).&lt;/li&gt;&lt;/ul&gt;&lt;h3&gt;Salidas&lt;/h3&gt;&lt;ul&gt;&lt;li&gt;Límite de la reserva (&lt;i&gt;name&lt;/i&gt;, &lt;i&gt;area_ha&lt;/i&gt;)&lt;/li&gt;&lt;li&gt;Zonas excluidas (&lt;i&gt;kind&lt;/i&gt; lake o inholding, &lt;i&gt;name&lt;/i&gt;, &lt;i&gt;area_ha&lt;/i&gt;)&lt;/li&gt;&lt;li&gt;Rásteres de altitud (m), verdor (0–1) y velmar esperados por km²&lt;/li&gt;&lt;li&gt;Animales (&lt;i&gt;animal_id&lt;/i&gt;, &lt;i&gt;group_id&lt;/i&gt;)&lt;/li&gt;&lt;li&gt;Un informe HTML&lt;/li&gt;&lt;/ul&gt;&lt;p&gt;Referencias: Thomas, M. (1949) A generalization of Poisson's binomial limit for use in ecology. Biometrika 36:18–25. Diggle, P. J. (2013) Statistical Analysis of Spatial and Spatio-Temporal Point Patterns, 3rd ed., CRC Press.&lt;/p&gt;</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/demoreserve.py" line="63"/>
        <source>Raster cell size (m)</source>
        <translation>Tamaño de celda del ráster (m)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/demoreserve.py" line="69"/>
        <source>Reserve boundary</source>
        <translation>Límite de la reserva</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/demoreserve.py" line="71"/>
        <source>Excluded areas (lake, inholding)</source>
        <translation>Zonas excluidas (lago, enclave)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/demoreserve.py" line="74"/>
        <source>Elevation (m)</source>
        <translation>Altitud (m)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/demoreserve.py" line="75"/>
        <source>Greenness (0–1)</source>
        <translation>Verdor (0–1)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/demoreserve.py" line="76"/>
        <source>Expected animals per km²</source>
        <translation>Animales esperados por km²</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/demoreserve.py" line="78"/>
        <source>Simulated animals</source>
        <translation>Animales simulados</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/demoreserve.py" line="81"/>
        <source>True number of animals</source>
        <translation>Número verdadero de animales</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/demoreserve.py" line="82"/>
        <source>Expected number of animals</source>
        <translation>Número esperado de animales</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/demoreserve.py" line="132"/>
        <source>{name}: {area:,.1f} km², {n:,} velmar in {g:,} groups (expected {e:,.0f}).</source>
        <translation>{name}: {area:,.1f} km², {n:,} velmar en {g:,} grupos (esperados: {e:,.0f}).</translation>
    </message>
</context>
<context>
    <name>DistanceDensity</name>
    <message>
        <location filename="../processing/algorithms/distancedensity.py" line="86"/>
        <source>Density from detection distances (line and point transects)</source>
        <translation>Densidad a partir de las distancias de detección (transectos lineales y puntuales)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/distancedensity.py" line="89"/>
        <source>Estimates density and abundance per stratum and for the frame from the distances at which animals (or groups) were seen from line transects or point stations. A detection function fitted to the distances gives the probability of seeing an animal, so the estimate needs no detection probability typed in by hand (Buckland et al. 2001).

Transects or points: the units from the layout (line transects or point stations), with their id field (unit_id) and stratum field (stratum). Line length comes from the geometry; a visits field gives the visits to each point (empty or 0: not surveyed). Every surveyed unit counts, also those with no detection. Units whose role is 'reserve' are left out unless an observation names them; set the role of a surveyed reserve that saw nothing to 'primary'.

Observations: a table or point layer with one row per detection: the unit id, the distance in m (perpendicular to the line for line transects, from the point for point transects) and, optionally, the group size (empty field: each detection is one animal). A negative or missing distance, a group size not above 0, or a unit id the units layer does not have stops the run, naming the observations.

Survey type: line or point transects. Truncation distance (m): detections farther away are left out; 0 drops the farthest 5 % (common practice). Distance bands (m, optional, e.g. 0, 10, 25, 50, 100): for surveys that record bands; the fit then uses the counts per band, and the last edge is the truncation distance.

Key functions: half-normal, hazard-rate and uniform; each is fitted alone, then with cosine terms added one at a time while AIC improves (at most the number given), under the constraint that detection never rises with distance. The model with the smallest AIC is used; the models table lists every model tried with its AIC, the difference to the best, the detection probability, the effective strip half-width (lines) or effective detection radius (points) and goodness-of-fit p-values (χ² on distance bands; Cramér–von Mises on exact distances).

Group size: the mean size of the detected groups, or the size-bias regression of ln(size) on the detection probability when larger groups are seen farther away (automatic: when the slope is negative at p &lt; 0.15, common practice).

One detection function per stratum (option): each stratum then needs at least 20 detections (60 to 80 advised, common practice); otherwise one function serves all strata.

Density: D = n·E(s) / (2wL·P) for lines and n·E(s) / (kπw²·P) for points. Variance by the delta method: the encounter rate's variance between transects within each stratum (estimator R2 of Fewster et al. 2009), the detection function's from its likelihood, the group size's from the sizes; Satterthwaite's degrees of freedom and a log-normal interval with t (Buckland et al. 2001). Bootstrap resamples (0: none) resample transects or points within strata and refit the chosen model, seeded; the outputs then carry the bootstrap's percentile interval.

Strata: polygons with an id field matching the units' stratum field; their areas define the frame (as in the estimate algorithm). Every stratum needs at least two surveyed units. At least 20 detections within the truncation distance are needed (an error names the count), 60 are advised (a warning).

Confidence level of the intervals; area unit of the results (km² or hectares); random seed, used by the bootstrap only (0 draws one and records it); most cosine terms per key function (0: the keys alone).

Outputs: the strata with stratum, area, n_units (transects or points), effort (km of line, or point visits), n_det (detections within the truncation distance), p_det (detection probability within it), esw (effective strip half-width for lines, effective detection radius for points, m), dens, abund with their SE, limits and CV, and df; a models table (model, n_par, aic, delta_aic, p_det, esw, gof_p, chosen, then stratum, n_det, chisq_p, cvm_p); an HTML report (histogram of the distances with the fitted function, models, estimates, map, assumptions); and the overall numbers for models.

References: Buckland, S. T. et al. (2001) Introduction to Distance Sampling, Oxford University Press. Fewster, R. M. et al. (2009) Biometrics 65:225–236.

Field safety: distance sampling sends observers along lines and to points. Check every unit's access and safety before sending a team: the tool never makes a location safe. Follow your agency's field-safety rules and local law.</source>
        <translation>Estima la densidad y la abundancia por estrato y para el marco a partir de las distancias a las que se vieron los animales (o los grupos) desde transectos lineales o estaciones puntuales. Una función de detección ajustada a las distancias da la probabilidad de ver un animal, así que la estimación no necesita ninguna probabilidad de detección introducida a mano (Buckland et al. 2001).

Transectos o puntos: las unidades de la disposición (transectos lineales o estaciones puntuales), con su campo identificador (unit_id) y su campo de estrato (stratum). La longitud de las líneas procede de la geometría; un campo de visitas da las visitas a cada punto (vacío o 0: no muestreado). Cuenta cada unidad muestreada, también las que no tienen ninguna detección. Las unidades cuyo role es 'reserve' se dejan fuera salvo que una observación las nombre; asigne el role 'primary' a una reserva muestreada que no vio nada.

Observaciones: una tabla o capa de puntos con una fila por detección: el identificador de la unidad, la distancia en m (perpendicular a la línea en los transectos lineales, desde el punto en los puntuales) y, opcionalmente, el tamaño de grupo (campo vacío: cada detección es un animal). Una distancia negativa o ausente, un tamaño de grupo no mayor que 0 o un identificador de unidad que la capa de unidades no tiene detienen la ejecución, nombrando las observaciones.

Tipo de muestreo: transectos lineales o puntuales. Distancia de truncamiento (m): las detecciones más lejanas se dejan fuera; 0 descarta el 5 % más lejano (práctica habitual). Intervalos de distancia (m, opcional, p. ej. 0, 10, 25, 50, 100): para muestreos que registran intervalos; el ajuste usa entonces los conteos por intervalo, y el último límite es la distancia de truncamiento.

Funciones clave: seminormal, tasa de riesgo (hazard-rate) y uniforme; cada una se ajusta sola y luego con términos coseno añadidos de uno en uno mientras mejora el AIC (como máximo el número indicado), con la restricción de que la detección nunca crezca con la distancia. Se usa el modelo con el menor AIC; la tabla de modelos lista cada modelo probado con su AIC, la diferencia con el mejor, la probabilidad de detección, la semianchura efectiva de franja (líneas) o el radio efectivo de detección (puntos) y los valores p de la prueba de bondad de ajuste (χ² sobre intervalos de distancia; Cramér–von Mises sobre distancias exactas).

Tamaño de grupo: el tamaño medio de los grupos detectados, o la regresión del sesgo de tamaño de ln(tamaño) sobre la probabilidad de detección cuando los grupos grandes se ven más lejos (automático: cuando la pendiente es negativa con p &lt; 0.15, práctica habitual).

Una función de detección por estrato (opción): cada estrato necesita entonces al menos 20 detecciones (se aconsejan de 60 a 80, práctica habitual); si no, una sola función sirve para todos los estratos.

Densidad: D = n·E(s) / (2wL·P) para líneas y n·E(s) / (kπw²·P) para puntos. Varianza por el método delta: la de la tasa de encuentro entre transectos dentro de cada estrato (estimador R2 de Fewster et al. 2009), la de la función de detección a partir de su verosimilitud y la del tamaño de grupo a partir de los tamaños; grados de libertad de Satterthwaite e intervalo log-normal con t (Buckland et al. 2001). Los remuestreos bootstrap (0: ninguno) remuestrean transectos o puntos dentro de los estratos y reajustan el modelo elegido, con semilla; las salidas llevan entonces el intervalo de percentiles del bootstrap.

Estratos: polígonos con un campo identificador que corresponde al campo de estrato de las unidades; sus áreas definen el marco (como en el algoritmo de estimación). Cada estrato necesita al menos dos unidades muestreadas. Se necesitan al menos 20 detecciones dentro de la distancia de truncamiento (un error indica el número) y se aconsejan 60 (una advertencia).

Nivel de confianza de los intervalos; unidad de área de los resultados (km² o hectáreas); semilla aleatoria, que solo usa el bootstrap (0 sortea una y la registra); número máximo de términos coseno por función clave (0: las funciones clave solas).

Salidas: los estratos con stratum, area, n_units (transectos o puntos), effort (km de línea, o visitas a los puntos), n_det (detecciones dentro de la distancia de truncamiento), p_det (probabilidad de detección dentro de ella), esw (semianchura efectiva de franja para líneas, radio efectivo de detección para puntos, m), dens, abund con su error estándar, sus límites y su CV, y df; una tabla de modelos (model, n_par, aic, delta_aic, p_det, esw, gof_p, chosen, y luego stratum, n_det, chisq_p, cvm_p); un informe HTML (histograma de las distancias con la función ajustada, modelos, estimaciones, mapa, supuestos); y los valores globales para los modelos.

Referencias: Buckland, S. T. et al. (2001) Introduction to Distance Sampling, Oxford University Press. Fewster, R. M. et al. (2009) Biometrics 65:225–236.

Seguridad en el terreno: el muestreo de distancias envía observadores a lo largo de líneas y a puntos. Compruebe el acceso y la seguridad de cada unidad antes de enviar un equipo: la herramienta nunca hace que una ubicación sea segura. Siga las normas de seguridad en el terreno de su organismo y la legislación local.</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/distancedensity.py" line="148"/>
        <source>Transects or points surveyed</source>
        <translation>Transectos o puntos muestreados</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/distancedensity.py" line="150"/>
        <source>Unit id field</source>
        <translation>Campo identificador de unidad</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/distancedensity.py" line="152"/>
        <source>Stratum field of the units</source>
        <translation>Campo de estrato de las unidades</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/distancedensity.py" line="155"/>
        <source>Observations (one row per detection)</source>
        <translation>Observaciones (una fila por detección)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/distancedensity.py" line="157"/>
        <source>Unit id field of the observations</source>
        <translation>Campo identificador de unidad de las observaciones</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/distancedensity.py" line="160"/>
        <source>Distance field (m)</source>
        <translation>Campo de distancia (m)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/distancedensity.py" line="163"/>
        <source>Group size field (empty: each detection is one animal)</source>
        <translation>Campo de tamaño de grupo (vacío: cada detección es un animal)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/distancedensity.py" line="166"/>
        <source>Survey type</source>
        <translation>Tipo de muestreo</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/distancedensity.py" line="166"/>
        <source>Line transects</source>
        <translation>Transectos lineales</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/distancedensity.py" line="166"/>
        <source>Point transects</source>
        <translation>Transectos puntuales</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/distancedensity.py" line="169"/>
        <source>Truncation distance (m; 0: drop the farthest 5 %)</source>
        <translation>Distancia de truncamiento (m; 0: descartar el 5 % más lejano)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/distancedensity.py" line="172"/>
        <source>Key functions to try</source>
        <translation>Funciones clave que probar</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/distancedensity.py" line="172"/>
        <source>Half-normal</source>
        <translation>Seminormal</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/distancedensity.py" line="172"/>
        <source>Hazard-rate</source>
        <translation>Tasa de riesgo (hazard-rate)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/distancedensity.py" line="172"/>
        <source>Uniform with cosine terms</source>
        <translation>Uniforme con términos coseno</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/distancedensity.py" line="176"/>
        <source>Strata (the frame)</source>
        <translation>Estratos (el marco)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/distancedensity.py" line="178"/>
        <source>Stratum id field of the strata</source>
        <translation>Campo identificador de los estratos</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/distancedensity.py" line="181"/>
        <source>Confidence level</source>
        <translation>Nivel de confianza</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/distancedensity.py" line="184"/>
        <source>Area unit of the results</source>
        <translation>Unidad de área de los resultados</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/distancedensity.py" line="184"/>
        <source>km²</source>
        <translation>km²</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/distancedensity.py" line="184"/>
        <source>hectares</source>
        <translation>hectáreas</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/distancedensity.py" line="189"/>
        <source>Strata with distance estimates</source>
        <translation>Estratos con las estimaciones por distancias</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/distancedensity.py" line="191"/>
        <source>Detection function models</source>
        <translation>Modelos de función de detección</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/distancedensity.py" line="194"/>
        <source>Overall density</source>
        <translation>Densidad global</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/distancedensity.py" line="194"/>
        <source>Overall abundance</source>
        <translation>Abundancia global</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/distancedensity.py" line="194"/>
        <source>Lower confidence limit of the abundance</source>
        <translation>Límite inferior de confianza de la abundancia</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/distancedensity.py" line="194"/>
        <source>Upper confidence limit of the abundance</source>
        <translation>Límite superior de confianza de la abundancia</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/distancedensity.py" line="194"/>
        <source>CV of the overall estimate</source>
        <translation>CV de la estimación global</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/distancedensity.py" line="194"/>
        <source>Detection probability within the truncation distance</source>
        <translation>Probabilidad de detección dentro de la distancia de truncamiento</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/distancedensity.py" line="194"/>
        <source>Effective strip half-width or detection radius (m)</source>
        <translation>Semianchura efectiva de franja o radio efectivo de detección (m)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/distancedensity.py" line="205"/>
        <source>Visits field of the points (empty: one visit each)</source>
        <translation>Campo de visitas de los puntos (vacío: una visita cada uno)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/distancedensity.py" line="208"/>
        <source>Distance bands (m, from 0, comma-separated; empty: exact distances)</source>
        <translation>Intervalos de distancia (m, desde 0, separados por comas; vacío: distancias exactas)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/distancedensity.py" line="211"/>
        <source>Most cosine terms per key function</source>
        <translation>Número máximo de términos coseno por función clave</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/distancedensity.py" line="214"/>
        <source>Group size</source>
        <translation>Tamaño de grupo</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/distancedensity.py" line="214"/>
        <source>Automatic: mean, or size-bias regression when larger groups are seen farther</source>
        <translation>Automático: media, o regresión del sesgo de tamaño si los grupos grandes se ven más lejos</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/distancedensity.py" line="214"/>
        <source>Mean of the detected groups</source>
        <translation>Media de los grupos detectados</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/distancedensity.py" line="214"/>
        <source>Size-bias regression</source>
        <translation>Regresión del sesgo de tamaño</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/distancedensity.py" line="218"/>
        <source>One detection function per stratum</source>
        <translation>Una función de detección por estrato</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/distancedensity.py" line="220"/>
        <source>Bootstrap resamples over transects (0: none)</source>
        <translation>Remuestreos bootstrap sobre los transectos (0: ninguno)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/distancedensity.py" line="232"/>
        <source>The distance bands &apos;{text}&apos; are not numbers. Write the band edges in m, from 0, separated by commas, e.g. 0, 10, 25, 50, 100.</source>
        <translation>Los intervalos de distancia «{text}» no son números. Escriba los límites de los intervalos en m, desde 0, separados por comas, p. ej. 0, 10, 25, 50, 100.</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/distancedensity.py" line="242"/>
        <source>Layer &apos;{layer}&apos; has no features.</source>
        <translation>La capa «{layer}» no tiene entidades.</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/distancedensity.py" line="246"/>
        <source>Layer &apos;{layer}&apos; holds {kinds} geometries, but the survey type is {survey}. Choose the survey type that matches the units (line transects need lines, point transects points).</source>
        <translation>La capa «{layer}» contiene geometrías {kinds}, pero el tipo de muestreo es: {survey}. Elija el tipo de muestreo que corresponde a las unidades (los transectos lineales necesitan líneas; los puntuales, puntos).</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/distancedensity.py" line="246"/>
        <source>line transects</source>
        <translation>transectos lineales</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/distancedensity.py" line="246"/>
        <source>point transects</source>
        <translation>transectos puntuales</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/distancedensity.py" line="259"/>
        <source>{n} reserve unit(s) without observations were left out (not surveyed).</source>
        <translation>Se dejaron fuera {n} unidad(es) de reserva sin observaciones (no muestreada(s)).</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/distancedensity.py" line="280"/>
        <source>Layer &apos;{layer}&apos;: the points {ids} have a number of visits in the field &apos;{field}&apos; that is not a whole number of 0 or more. Correct them.</source>
        <translation>Capa «{layer}»: los puntos {ids} tienen en el campo «{field}» un número de visitas que no es un número entero de 0 o más. Corríjalos.</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/distancedensity.py" line="286"/>
        <source>Layer &apos;{layer}&apos;: observations name the points {ids}, whose visits field &apos;{field}&apos; is empty or 0. Give them their number of visits, or correct the observations&apos; unit ids.</source>
        <translation>Capa «{layer}»: hay observaciones que nombran los puntos {ids}, cuyo campo de visitas «{field}» está vacío o es 0. Indique su número de visitas o corrija los identificadores de unidad de las observaciones.</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/distancedensity.py" line="292"/>
        <source>{n} point(s) with no visits were left out (not surveyed).</source>
        <translation>Se dejaron fuera {n} punto(s) sin visitas (no muestreado(s)).</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/distancedensity.py" line="301"/>
        <source>Layer &apos;{layer}&apos; has no stratum id field matching the units&apos; field &apos;{field}&apos;. Choose the strata layer&apos;s id field, or give a frame layer of one polygon to treat the frame as one stratum.</source>
        <translation>La capa «{layer}» no tiene un campo identificador de estrato que corresponda al campo «{field}» de las unidades. Elija el campo identificador de la capa de estratos, o indique una capa de marco de un solo polígono para tratar el marco como un solo estrato.</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/distancedensity.py" line="305"/>
        <source>Layer &apos;{layer}&apos; is one polygon without a stratum id field: the frame is treated as one stratum.</source>
        <translation>La capa «{layer}» es un solo polígono sin campo identificador de estrato: el marco se trata como un solo estrato.</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/distancedensity.py" line="313"/>
        <source>Layer &apos;{layer}&apos; has no polygons with an area.</source>
        <translation>La capa «{layer}» no tiene polígonos con área.</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/distancedensity.py" line="431"/>
        <source>Detection function{where}: {model}, P = {p:.3f}, effective width {esw:.1f} m, {n} detections.</source>
        <translation>Función de detección{where}: {model}, P = {p:.3f}, ancho efectivo {esw:.1f} m, {n} detecciones.</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/distancedensity.py" line="435"/>
        <source>Overall abundance {n:,.1f} ({lo:,.1f} to {hi:,.1f}), CV {cv:.3f}.</source>
        <translation>Abundancia global {n:,.1f} ({lo:,.1f} a {hi:,.1f}), CV {cv:.3f}.</translation>
    </message>
</context>
<context>
    <name>Estimate</name>
    <message>
        <location filename="../processing/algorithms/estimate.py" line="74"/>
        <source>Estimate density and abundance</source>
        <translation>Estimar la densidad y la abundancia</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/estimate.py" line="139"/>
        <source>Sample units with counts</source>
        <translation>Unidades de muestreo con conteos</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/estimate.py" line="141"/>
        <source>Count field</source>
        <translation>Campo de conteo</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/estimate.py" line="143"/>
        <source>Stratum field of the units</source>
        <translation>Campo de estrato de las unidades</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/estimate.py" line="146"/>
        <source>Unit area field (m²)</source>
        <translation>Campo de área de la unidad (m²)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/estimate.py" line="149"/>
        <source>Fixed unit area for points and lines (m²; 0: not used)</source>
        <translation>Área fija de la unidad para puntos y líneas (m²; 0: no se usa)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/estimate.py" line="152"/>
        <source>Strip width of line transects (m, full width; 0: not used)</source>
        <translation>Ancho de franja de los transectos lineales (m, ancho total; 0: no se usa)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/estimate.py" line="155"/>
        <source>Strata (the frame)</source>
        <translation>Estratos (el marco)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/estimate.py" line="157"/>
        <source>Stratum id field of the strata</source>
        <translation>Campo identificador de los estratos</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/estimate.py" line="160"/>
        <source>Confidence level</source>
        <translation>Nivel de confianza</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/estimate.py" line="163"/>
        <source>Confidence interval</source>
        <translation>Intervalo de confianza</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/estimate.py" line="163"/>
        <source>t with Satterthwaite degrees of freedom</source>
        <translation>t con los grados de libertad de Satterthwaite</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/estimate.py" line="163"/>
        <source>Log-normal</source>
        <translation>Log-normal</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/estimate.py" line="163"/>
        <source>Stratified bootstrap (2,000 resamples)</source>
        <translation>Bootstrap estratificado (2.000 remuestreos)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/estimate.py" line="167"/>
        <source>Finite-population correction</source>
        <translation>Corrección por población finita</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/estimate.py" line="169"/>
        <source>Detection probability p (from a separate study; 1: all seen)</source>
        <translation>Probabilidad de detección p (de un estudio aparte; 1: todos vistos)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/estimate.py" line="172"/>
        <source>Standard error of p</source>
        <translation>Error estándar de p</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/estimate.py" line="175"/>
        <source>Area unit of the results</source>
        <translation>Unidad de área de los resultados</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/estimate.py" line="175"/>
        <source>km²</source>
        <translation>km²</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/estimate.py" line="175"/>
        <source>hectares</source>
        <translation>hectáreas</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/estimate.py" line="178"/>
        <source>Target CV for the next survey (0: not used; e.g. 0.15)</source>
        <translation>CV objetivo para el próximo muestreo (0: no se usa; p. ej. 0.15)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/estimate.py" line="187"/>
        <source>Variance estimator</source>
        <translation>Estimador de la varianza</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/estimate.py" line="187"/>
        <source>Simple random sampling formula</source>
        <translation>Fórmula del muestreo aleatorio simple</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/estimate.py" line="187"/>
        <source>Local neighbourhood (systematic or spatially balanced layouts)</source>
        <translation>Vecindario local (disposiciones sistemáticas o espacialmente equilibradas)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/estimate.py" line="192"/>
        <source>The count field holds presence (1) / absence (0)</source>
        <translation>El campo de conteo contiene presencia (1) / ausencia (0)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/estimate.py" line="194"/>
        <source>Leave out strata with no surveyed unit (the frame shrinks)</source>
        <translation>Dejar fuera los estratos sin unidades muestreadas (el marco se reduce)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/estimate.py" line="197"/>
        <source>True total of a simulated population (simulations and training only; 0: none)</source>
        <translation>Total verdadero de una población simulada (solo simulaciones y formación; 0: ninguno)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/estimate.py" line="202"/>
        <source>Strata with estimates</source>
        <translation>Estratos con estimaciones</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/estimate.py" line="204"/>
        <source>Estimate table</source>
        <translation>Tabla de estimaciones</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/estimate.py" line="207"/>
        <source>Overall density</source>
        <translation>Densidad global</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/estimate.py" line="207"/>
        <source>SE of the overall density</source>
        <translation>Error estándar de la densidad global</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/estimate.py" line="207"/>
        <source>Overall abundance</source>
        <translation>Abundancia global</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/estimate.py" line="207"/>
        <source>Lower confidence limit of the abundance</source>
        <translation>Límite inferior de confianza de la abundancia</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/estimate.py" line="207"/>
        <source>Upper confidence limit of the abundance</source>
        <translation>Límite superior de confianza de la abundancia</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/estimate.py" line="207"/>
        <source>CV of the overall estimate</source>
        <translation>CV de la estimación global</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/estimate.py" line="277"/>
        <source>Layer &apos;{layer}&apos; has no stratum id field matching the units&apos; field &apos;{field}&apos;. Choose the strata layer&apos;s id field (plotwise:stratify writes &apos;stratum&apos;), or give a frame layer of one polygon to treat the frame as one stratum.</source>
        <translation>La capa «{layer}» no tiene un campo identificador de estrato que corresponda al campo «{field}» de las unidades. Elija el campo identificador de la capa de estratos (plotwise:stratify escribe 'stratum') o dé una capa de marco de un solo polígono para tratar el marco como un solo estrato.</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/estimate.py" line="282"/>
        <source>Layer &apos;{layer}&apos; is one polygon without a stratum id field: the frame is treated as one stratum, and the units&apos; field &apos;{field}&apos; is not used. If the units were allocated to strata unequally, give the strata instead: an unstratified mean is then biased.</source>
        <translation>La capa «{layer}» es un solo polígono sin campo identificador de estrato: el marco se trata como un solo estrato y no se usa el campo «{field}» de las unidades. Si las unidades se asignaron a los estratos de forma desigual, dé en su lugar los estratos: una media no estratificada está entonces sesgada.</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/estimate.py" line="311"/>
        <source>Layer &apos;{layer}&apos; has no features.</source>
        <translation>La capa «{layer}» no tiene entidades.</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/estimate.py" line="317"/>
        <source>Layer &apos;{layer}&apos; has no polygons with an area.</source>
        <translation>La capa «{layer}» no tiene polígonos con área.</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/estimate.py" line="240"/>
        <source>{n} unused reserve unit(s) without a count were skipped.</source>
        <translation>Se omitieron {n} unidad(es) de reserva no usada(s) sin conteo.</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/estimate.py" line="252"/>
        <source>Overall abundance {n:,.1f} ({lo:,.1f} to {hi:,.1f}), CV {cv:.3f}.</source>
        <translation>Abundancia global {n:,.1f} ({lo:,.1f} a {hi:,.1f}), CV {cv:.3f}.</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/estimate.py" line="77"/>
        <source>Estimates density and abundance per stratum and for the whole frame from the counts in the sample units, with standard error, CV and confidence interval, and the sample size the next survey needs.

Estimator: D_h = Σy / Σa per stratum (the ratio estimator; with equal units, the mean count divided by the unit area), with its linearised variance (Cochran 1977, ch. 5 and 6); abundance N_h = D_h·A_h; overall N = Σ N_h and D = N / Σ A_h, with the variances added.

Finite-population correction: 1 − Σa/A_h, only for units that cannot overlap (a finite population of units drawn without replacement, Cochran 1977, §2.4). Units from plotwise:layout record their design (field design): the correction is refused, with a warning, in strata laid out by simple random centres without a minimum spacing of at least the unit's width (their units may overlap: a continuous population, Cordy 1993). For units without that record it is your choice, and the report states the assumption that they do not overlap.

Edges: units laid out by plus sampling (field edge = plus, the layout's default) count only inside their stratum, and the counts expand to the stratum grown by the unit's reach (field reach_m), N_h = A⁺_h·Σy/Σa (Gregoire &amp; Valentine 2008, ch. 10), which removes the bias at the edges.

Counts: a NULL count means the unit was not surveyed: it is left out and listed as non-response. Reserve units (role = reserve) without a count are unused reserves and are skipped quietly; reserves that were surveyed count like any other unit. 0 means surveyed, none seen. Negative or non-numeric counts stop the run, naming the units.

Unit area (m²): the unit area field (default area_m2, as the layout writes it) when it is above 0, else the polygon's area, else for lines the strip width × the line's length, else the fixed unit area for points and lines.

Strata: polygons with an id field matching the units' stratum field; their areas define the frame. When the units have no stratum field, or the strata layer is a single polygon without an id field, all units form one stratum over the frame. A stratum with one surveyed unit is paired with a partner fixed before the counts are seen (the stratum sharing the longest edge on the map, else the next in id order) and takes its variance from the collapsed-strata pairs formula (Cochran 1977, §5A.12; Hansen, Hurwitz &amp; Madow 1953 for unequal sizes), with 1 degree of freedom and a warning; the partner keeps its own variance. A stratum with none is an error, unless you choose to leave it out: then the frame shrinks, and the report says so. Strata must not overlap (an overlap of more than 0.1 % of the smaller stratum is an error, a smaller one a warning), and every strata polygon needs its id: a polygon without one is an error, unless strata with no surveyed unit may be left out.

Intervals: t with Satterthwaite's degrees of freedom (Satterthwaite 1946; Cochran 1977); log-normal, N/C to N·C with C = exp(t_df·√ln(1+CV²)), t with the same degrees of freedom (Buckland et al. 2001, §3.6.1; the normal quantile only for infinite df, Burnham et al. 1987); or a rescaled stratified percentile bootstrap of 2,000 resamples (seeded; Rao &amp; Wu 1988), which carries the finite-population correction. Where every count is 0 the interval is one-sided, from 0 to the Poisson upper limit −ln(1 − level)·A/Σa (Garwood 1936; about 3·A/Σa at 95 %), divided by p.

Variance: the simple random sampling formula, or the local neighbourhood estimator (Stevens &amp; Olsen 2003) for systematic grids and spatially balanced layouts, where the simple formula overstates the variance, with the degrees of freedom of its quadratic form (Box 1954); or our variant of it, scaled by n / Σ(1 − Σw²) so that it agrees with the simple formula where there is no spatial pattern (the published sum falls short by about a quarter there).

Detection: with a detection probability p below 1, estimates are divided by p and the squared CVs add (delta method, Seber 1982). p and its SE must come from a separate study; its degrees of freedom (0: p counts as known) enter the interval's by Satterthwaite's rule (Buckland et al. 2001, eq. 3.75). An SE above p/2 gives a warning.

Presence data: with the presence option a 0/1 field gives the stratified proportion of units where the species was detected (naive occupancy, not corrected for detection), and abund is the number of occupied units in the frame.

Target CV (above 0): n_next is the number of units each stratum needs next time for that CV of the overall abundance, by Neyman allocation on the standard deviations the variance estimator implies (Neyman 1934; Cochran 1977, eq. 5.26), at least 2 and at most the units a stratum holds.

True total: for simulations and training only. The report then shows it beside the estimate; in a real survey the true total is never known.

Outputs: the strata polygons with the estimate fields (for a choropleth), a table with one row per stratum and a row 'all', an HTML report, and the overall numbers for models.</source>
        <translation>Estima la densidad y la abundancia por estrato y para todo el marco de muestreo a partir de los conteos en las unidades de muestreo, con error estándar, coeficiente de variación (CV) e intervalo de confianza, y el tamaño de muestra que necesita el próximo muestreo.

Estimador: D_h = Σy / Σa por estrato (el estimador de razón; con unidades iguales, el conteo medio dividido por el área de la unidad), con su varianza linealizada (Cochran 1977, cap. 5 y 6); abundancia N_h = D_h·A_h; en total N = Σ N_h y D = N / Σ A_h, sumando las varianzas.

Corrección por población finita: 1 − Σa/A_h, solo para unidades que no pueden solaparse (una población finita de unidades sorteadas sin reposición, Cochran 1977, §2.4). Las unidades de plotwise:layout registran su diseño (campo design): la corrección se rechaza, con una advertencia, en los estratos dispuestos por centros aleatorios simples sin una separación mínima de al menos el ancho de la unidad (sus unidades pueden solaparse: una población continua, Cordy 1993). Para unidades sin ese registro es decisión suya, y el informe indica el supuesto de que no se solapan.

Bordes: las unidades dispuestas por muestreo «plus» (campo edge = plus, la opción por defecto de la disposición) solo cuentan dentro de su estrato, y los conteos se extienden al estrato ampliado en el alcance de la unidad (campo reach_m), N_h = A⁺_h·Σy/Σa (Gregoire &amp; Valentine 2008, cap. 10), lo que elimina el sesgo en los bordes.

Conteos: un conteo NULL significa que la unidad no se muestreó: se deja fuera y se lista como no respuesta. Las unidades de reserva (role = reserve) sin conteo son reservas no usadas y se omiten sin aviso; las reservas que se muestrearon cuentan como cualquier otra unidad. 0 significa muestreada, ningún animal visto. Los conteos negativos o no numéricos detienen la ejecución, nombrando las unidades.

Área de la unidad (m²): el campo de área de la unidad (area_m2 por defecto, como lo escribe la disposición) si es mayor que 0; si no, el área del polígono; si no, para líneas, el ancho de franja × la longitud de la línea; si no, el área fija de la unidad para puntos y líneas.

Estratos: polígonos con un campo identificador que corresponde al campo de estrato de las unidades; sus áreas definen el marco. Cuando las unidades no tienen campo de estrato, o la capa de estratos es un solo polígono sin campo identificador, todas las unidades forman un solo estrato sobre el marco. Un estrato con una sola unidad muestreada se empareja con una pareja fijada antes de ver los conteos (el estrato que comparte el límite más largo en el mapa o, si no, el siguiente en el orden de identificadores) y toma su varianza de la fórmula de pares de estratos agrupados (Cochran 1977, §5A.12; Hansen, Hurwitz &amp; Madow 1953 para tamaños desiguales), con 1 grado de libertad y una advertencia; la pareja conserva su propia varianza. Un estrato sin ninguna es un error, salvo que decida dejarlo fuera: entonces el marco se reduce y el informe lo indica. Los estratos no deben solaparse (un solapamiento de más del 0,1 % del estrato menor es un error, uno menor una advertencia), y cada polígono de estrato necesita su identificador: un polígono sin él es un error, salvo que se puedan dejar fuera los estratos sin unidades muestreadas.

Intervalos: t con los grados de libertad de Satterthwaite (Satterthwaite 1946; Cochran 1977); log-normal, de N/C a N·C con C = exp(t_df·√ln(1+CV²)), t con los mismos grados de libertad (Buckland et al. 2001, §3.6.1; el cuantil normal solo para gl infinitos, Burnham et al. 1987); o un bootstrap estratificado de percentiles reescalado con 2.000 remuestreos (con semilla; Rao &amp; Wu 1988), que incluye la corrección por población finita. Donde todos los conteos son 0 el intervalo es unilateral, de 0 al límite superior de Poisson −ln(1 − nivel)·A/Σa (Garwood 1936; unas 3·A/Σa al 95 %), dividido por p.

Varianza: la fórmula del muestreo aleatorio simple, o el estimador de vecindario local (Stevens &amp; Olsen 2003) para cuadrículas sistemáticas y disposiciones espacialmente equilibradas, donde la fórmula simple sobrestima la varianza, con los grados de libertad de su forma cuadrática (Box 1954); o nuestra variante de él, escalada por n / Σ(1 − Σw²) para que coincida con la fórmula simple donde no hay estructura espacial (la suma publicada se queda allí corta en alrededor de un cuarto).

Detección: con una probabilidad de detección p menor que 1, las estimaciones se dividen por p y los CV al cuadrado se suman (método delta, Seber 1982). p y su error estándar deben proceder de un estudio aparte; sus grados de libertad (0: p se considera conocida) entran en los del intervalo por la regla de Satterthwaite (Buckland et al. 2001, ec. 3.75). Un error estándar mayor que p/2 da una advertencia.

Datos de presencia: con la opción de presencia, un campo 0/1 da la proporción estratificada de unidades donde se detectó la especie (ocupación ingenua, sin corregir por la detección), y abund es el número de unidades ocupadas en el marco.

CV objetivo (mayor que 0): n_next es el número de unidades que cada estrato necesita la próxima vez para ese CV de la abundancia global, por asignación de Neyman sobre las desviaciones estándar que implica el estimador de la varianza (Neyman 1934; Cochran 1977, ec. 5.26), al menos 2 y como máximo las unidades que contiene un estrato.

Total verdadero: solo para simulaciones y formación. El informe lo muestra entonces junto a la estimación; en un muestreo real el total verdadero nunca se conoce.

Salidas: los polígonos de los estratos con los campos de la estimación (para un mapa de coropletas), una tabla con una fila por estrato y una fila 'all', un informe HTML y los valores globales para los modelos.</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/estimate.py" line="182"/>
        <source>Degrees of freedom of the detection estimate (0: p known)</source>
        <translation>Grados de libertad de la estimación de la detección (0: p conocida)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/estimate.py" line="187"/>
        <source>Local neighbourhood, scaled to the simple formula (our variant)</source>
        <translation>Vecindario local, escalado a la fórmula simple (nuestra variante)</translation>
    </message>
</context>
<context>
    <name>ExampleChain</name>
    <message>
        <location filename="../scripts/build_models.py" line="114"/>
        <source>Units with counts</source>
        <translation>Unidades con conteos</translation>
    </message>
    <message>
        <location filename="../scripts/build_models.py" line="117"/>
        <source>Estimate by stratum</source>
        <translation>Estimación por estrato</translation>
    </message>
    <message>
        <location filename="../scripts/build_models.py" line="117"/>
        <source>Estimate report</source>
        <translation>Informe de la estimación</translation>
    </message>
    <message>
        <location filename="../scripts/build_models.py" line="117"/>
        <source>Estimate table</source>
        <translation>Tabla de estimaciones</translation>
    </message>
    <message>
        <location filename="../scripts/build_models.py" line="105"/>
        <source>Animal points</source>
        <translation>Puntos de animales</translation>
    </message>
    <message>
        <location filename="../scripts/build_models.py" line="109"/>
        <source>Detection probability</source>
        <translation>Probabilidad de detección</translation>
    </message>
    <message>
        <location filename="../scripts/build_models.py" line="112"/>
        <source>Random seed (0 draws one)</source>
        <translation>Semilla aleatoria (0 sortea una)</translation>
    </message>
    <message>
        <location filename="../scripts/build_models.py" line="107"/>
        <source>Strata</source>
        <translation>Estratos</translation>
    </message>
    <message>
        <location filename="../scripts/build_models.py" line="103"/>
        <source>Sample units</source>
        <translation>Unidades de muestreo</translation>
    </message>
    <message>
        <location filename="../scripts/build_models.py" line="88"/>
        <source>Strata with units allocated</source>
        <translation>Estratos con unidades asignadas</translation>
    </message>
    <message>
        <location filename="../scripts/build_models.py" line="80"/>
        <source>Sampling frame</source>
        <translation>Marco de muestreo</translation>
    </message>
    <message>
        <location filename="../scripts/build_models.py" line="93"/>
        <source>Layout report</source>
        <translation>Informe de la disposición</translation>
    </message>
    <message>
        <location filename="../scripts/build_models.py" line="93"/>
        <source>Waypoints (GPX)</source>
        <translation>Puntos de paso (GPX)</translation>
    </message>
    <message>
        <location filename="../scripts/build_models.py" line="69"/>
        <source>Covariate rasters</source>
        <translation>Rásteres de covariables</translation>
    </message>
    <message>
        <location filename="../scripts/build_models.py" line="62"/>
        <source>Excluded areas</source>
        <translation>Zonas excluidas</translation>
    </message>
    <message>
        <location filename="../scripts/build_models.py" line="66"/>
        <source>Steepest slope surveyed (degrees)</source>
        <translation>Pendiente máxima muestreada (grados)</translation>
    </message>
    <message>
        <location filename="../scripts/build_models.py" line="71"/>
        <source>Number of strata</source>
        <translation>Número de estratos</translation>
    </message>
    <message>
        <location filename="../scripts/build_models.py" line="75"/>
        <source>Side of the square plots (m)</source>
        <translation>Lado de las parcelas cuadradas (m)</translation>
    </message>
    <message>
        <location filename="../scripts/build_models.py" line="64"/>
        <source>Slope raster (degrees)</source>
        <translation>Ráster de pendiente (grados)</translation>
    </message>
    <message>
        <location filename="../scripts/build_models.py" line="60"/>
        <source>Study area</source>
        <translation>Área de estudio</translation>
    </message>
    <message>
        <location filename="../scripts/build_models.py" line="73"/>
        <source>Total number of units</source>
        <translation>Número total de unidades</translation>
    </message>
    <message>
        <location filename="../processing/provider.py" line="51"/>
        <source>Example chain: plan a survey (frame, strata, effort, layout)</source>
        <translation>Cadena de ejemplo: planificar un muestreo (marco, estratos, esfuerzo, disposición)</translation>
    </message>
    <message>
        <location filename="../processing/provider.py" line="51"/>
        <source>Builds the sampling frame (study area minus exclusions and cells over the slope limit), draws k-means strata from the covariate rasters, allocates the units by Neyman allocation with the covariate standard deviation as a proxy, and lays out spatially balanced square plots with 3 reserve units per stratum. Open it in the modeler to change any step. Check every unit&apos;s access and safety before sending a team: the tool never makes a location safe. Follow your agency&apos;s field-safety rules and local law.</source>
        <translation>Construye el marco de muestreo (área de estudio menos las exclusiones y las celdas por encima de la pendiente límite), forma estratos por k-medias a partir de los rásteres de covariables, reparte las unidades por asignación de Neyman con la desviación estándar de la covariable como sustituto y dispone parcelas cuadradas espacialmente equilibradas con 3 unidades de reserva por estrato. Ábrala en el modelador para cambiar cualquier paso. Compruebe el acceso y la seguridad de cada unidad antes de enviar un equipo: la herramienta nunca hace que una ubicación sea segura. Siga las normas de seguridad en el terreno de su organismo y la legislación local.</translation>
    </message>
    <message>
        <location filename="../processing/provider.py" line="61"/>
        <source>Example chain: estimate from simulated counts</source>
        <translation>Cadena de ejemplo: estimar a partir de conteos simulados</translation>
    </message>
    <message>
        <location filename="../processing/provider.py" line="61"/>
        <source>For training: fills the units&apos; count field from a simulated population, then estimates density and abundance per stratum and overall. With real fieldwork, run the estimate on the counted units instead.</source>
        <translation>Para formación: rellena el campo de conteo de las unidades a partir de una población simulada y luego estima la densidad y la abundancia por estrato y en total. Con trabajo de campo real, ejecute en su lugar la estimación sobre las unidades contadas.</translation>
    </message>
    <message>
        <location filename="../processing/provider.py" line="90"/>
        <source>Example chains</source>
        <translation>Cadenas de ejemplo</translation>
    </message>
</context>
<context>
    <name>LayoutUnits</name>
    <message>
        <location filename="../processing/algorithms/layout.py" line="41"/>
        <source>Lay out sample units</source>
        <translation>Disponer las unidades de muestreo</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/layout.py" line="88"/>
        <source>Sampling frame or strata</source>
        <translation>Marco de muestreo o estratos</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/layout.py" line="92"/>
        <source>Stratum field (empty: the frame is one stratum)</source>
        <translation>Campo de estrato (vacío: el marco es un solo estrato)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/layout.py" line="98"/>
        <source>Units per stratum field (e.g. n_alloc; empty: split the total by area)</source>
        <translation>Campo de unidades por estrato (p. ej. n_alloc; vacío: total repartido según el área)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/layout.py" line="104"/>
        <source>Total number of units (when no units field is given)</source>
        <translation>Número total de unidades (si no se da un campo de unidades)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/layout.py" line="110"/>
        <source>Design</source>
        <translation>Diseño</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/layout.py" line="110"/>
        <source>Simple random</source>
        <translation>Aleatorio simple</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/layout.py" line="110"/>
        <source>Systematic grid</source>
        <translation>Cuadrícula sistemática</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/layout.py" line="110"/>
        <source>Spatially balanced</source>
        <translation>Espacialmente equilibrado</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/layout.py" line="116"/>
        <source>Unit shape</source>
        <translation>Forma de la unidad</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/layout.py" line="116"/>
        <source>Point station</source>
        <translation>Estación puntual</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/layout.py" line="116"/>
        <source>Square plot</source>
        <translation>Parcela cuadrada</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/layout.py" line="116"/>
        <source>Circular plot</source>
        <translation>Parcela circular</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/layout.py" line="116"/>
        <source>Line transect</source>
        <translation>Transecto lineal</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/layout.py" line="123"/>
        <source>Unit size (m): square side, circle radius, transect length, point counting radius</source>
        <translation>Tamaño de la unidad (m): lado del cuadrado, radio del círculo, longitud del transecto, radio de conteo del punto</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/layout.py" line="129"/>
        <source>Bearing (degrees from grid north; -1: random)</source>
        <translation>Rumbo (grados desde el norte de la cuadrícula; -1: aleatorio)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/layout.py" line="140"/>
        <source>Minimum spacing between unit centres (m; 0: none)</source>
        <translation>Separación mínima entre los centros de las unidades (m; 0: ninguna)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/layout.py" line="146"/>
        <source>Reserve units per stratum</source>
        <translation>Unidades de reserva por estrato</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/layout.py" line="153"/>
        <source>Sample units</source>
        <translation>Unidades de muestreo</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/layout.py" line="154"/>
        <source>Waypoints for GPS (GPX)</source>
        <translation>Puntos de paso para GPS (GPX)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/layout.py" line="154"/>
        <source>GPX files (*.gpx)</source>
        <translation>Archivos GPX (*.gpx)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/layout.py" line="218"/>
        <source>Stratum field &apos;{field}&apos; of layer &apos;{layer}&apos;</source>
        <translation>Campo de estrato «{field}» de la capa «{layer}»</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/layout.py" line="218"/>
        <source>Units field &apos;{field}&apos; of layer &apos;{layer}&apos;</source>
        <translation>Campo de unidades «{field}» de la capa «{layer}»</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/layout.py" line="235"/>
        <source>Layer &apos;{layer}&apos;: {text}</source>
        <translation>Capa «{layer}»: {text}</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/layout.py" line="239"/>
        <source>No unit could be placed in layer &apos;{layer}&apos;. Ask for more units or use another design.</source>
        <translation>No se pudo colocar ninguna unidad en la capa «{layer}». Pida más unidades o use otro diseño.</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/layout.py" line="266"/>
        <source>{n} waypoints written to {path}</source>
        <translation>{n} puntos de paso escritos en {path}</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/layout.py" line="192"/>
        <source>{stratum}: {n} primary and {r} reserve units</source>
        <translation>{stratum}: {n} unidades principales y {r} de reserva</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/layout.py" line="270"/>
        <source>the frame</source>
        <translation>el marco</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/layout.py" line="270"/>
        <source>stratum {key}</source>
        <translation>estrato {key}</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/layout.py" line="44"/>
        <source>Draws the sample units of a survey over a sampling frame, stratum by stratum (one stratum per value of the stratum field; without it the frame is one stratum).

Units per stratum: the units field (for example n_alloc from the allocation step; the same whole number on every feature of a stratum), else the total split in proportion to area with at least 2 per stratum.

Designs:
• Simple random: independent points, uniform over the stratum (triangles chosen by area, then a point within; Turk 1990).
• Systematic grid: a square grid of spacing √(A/n) with a random start; with bearing −1 the grid also gets a random rotation, otherwise it is turned to the bearing. The realised number of units varies around n and is reported.
• Spatially balanced: balanced acceptance sampling on a Halton sequence (Robertson et al. 2013). Every leading part of the draw order is itself spread evenly, so reserves are the next points of the same sequence. The start is a uniform random point of the stratum, which keeps inclusion equal for any sample size.

Shapes: point station (size: optional counting radius, m), square plot (size: side, m), circular plot (size: radius, m), line transect (size: length, m; centred on the drawn point). Bearing in degrees clockwise from grid north, or −1 for a random bearing per unit.
Edges: by default plus sampling (Gregoire &amp; Valentine 2008, ch. 10): centres are drawn over the stratum grown by the unit's reach R (its circumscribing radius), and a unit near or beyond the edge is surveyed only inside its own stratum (count only the animals inside the stratum; a centre may lie outside it, even outside the frame: never enter ground that was excluded as unsafe, survey the part inside from within). Every animal then has the same chance of being counted, and plotwise:estimate expands the counts to the grown area. Keep units inside instead draws centres from the stratum shrunk by R, so every unit lies wholly inside its stratum but the edge band is never reached (biased where animals near the edge differ). The effective area (grown or shrunk) is reported and used for the inclusion probabilities.
Minimum spacing (m) between the centres of all units, primaries and reserves, over the whole layout.
Reserves: extra units per stratum, role = reserve, in draw order. Replacement rule: a primary unit that cannot be surveyed is replaced by the next unused reserve of the same stratum.

Output fields: unit_id, stratum, role, draw_ord, area_m2, incl_p (n·a/A; for transects and points without a radius the inclusion density n/A per m²), weight = 1/incl_p, lon/lat (WGS 84), an empty count field for the field teams, and the design record for the estimate: design (random, random_sep, grid, grid_ovl or balanced: whether the units can overlap, which decides the finite-population correction), edge (plus or inside) and reach_m (R, m). The GPX file holds one waypoint per unit (a start and an end waypoint per transect), named by unit_id.

Strata must not overlap: an overlap of more than 0.1 % of the smaller stratum is an error, a smaller one a warning. Features under 1 m² (slivers) are skipped, with a warning.

A frame in geographic coordinates is projected to the UTM zone of its centre. Check every unit's access and safety before fieldwork: the tool never makes a location safe.</source>
        <translation>Sortea las unidades de muestreo de un muestreo sobre un marco de muestreo, estrato por estrato (un estrato por valor del campo de estrato; sin él, el marco es un solo estrato).

Unidades por estrato: el campo de unidades (por ejemplo n_alloc del paso de asignación; el mismo número entero en cada entidad de un estrato); si no, el total repartido en proporción al área con al menos 2 por estrato.

Diseños:
• Aleatorio simple: puntos independientes, uniformes en el estrato (triángulos elegidos según su área y luego un punto dentro; Turk 1990).
• Cuadrícula sistemática: una cuadrícula cuadrada de espaciado √(A/n) con un inicio aleatorio; con rumbo −1 la cuadrícula recibe además una rotación aleatoria; si no, se orienta según el rumbo. El número de unidades obtenido varía en torno a n y se indica.
• Espacialmente equilibrado: muestreo por aceptación equilibrada sobre una secuencia de Halton (Robertson et al. 2013). Cada tramo inicial del orden de sorteo está a su vez repartido de modo uniforme, de modo que las reservas son los puntos siguientes de la misma secuencia. El inicio es un punto aleatorio uniforme del estrato, lo que mantiene la inclusión igual para cualquier tamaño de muestra.

Formas: estación puntual (tamaño: radio de conteo opcional, m), parcela cuadrada (tamaño: lado, m), parcela circular (tamaño: radio, m), transecto lineal (tamaño: longitud, m; centrado en el punto sorteado). Rumbo en grados en sentido horario desde el norte de la cuadrícula, o −1 para un rumbo aleatorio por unidad.
Bordes: por defecto muestreo «plus» (Gregoire &amp; Valentine 2008, cap. 10): los centros se sortean sobre el estrato ampliado en el alcance R de la unidad (su radio circunscrito), y una unidad cercana al borde o más allá de él solo se muestrea dentro de su propio estrato (cuente solo los animales dentro del estrato; un centro puede quedar fuera de él, incluso fuera del marco: no entre nunca en terreno excluido por peligroso, muestree la parte interior desde dentro). Cada animal tiene entonces la misma probabilidad de ser contado, y plotwise:estimate extiende los conteos al área ampliada. Mantener las unidades dentro sortea en cambio los centros en el estrato reducido en R, de modo que cada unidad queda por completo dentro de su estrato pero nunca se llega a la franja del borde (sesgo donde los animales cercanos al borde difieren). El área efectiva (ampliada o reducida) se indica y se usa para las probabilidades de inclusión.
Separación mínima (m) entre los centros de todas las unidades, principales y de reserva, en toda la disposición.
Reservas: unidades adicionales por estrato, role = reserve, en orden de sorteo. Regla de sustitución: una unidad principal que no se puede muestrear se sustituye por la siguiente reserva no usada del mismo estrato.

Campos de salida: unit_id, stratum, role, draw_ord, area_m2, incl_p (n·a/A; para transectos y puntos sin radio, la densidad de inclusión n/A por m²), weight = 1/incl_p, lon/lat (WGS 84), un campo count vacío para los equipos de campo y el registro del diseño para la estimación: design (random, random_sep, grid, grid_ovl o balanced: si las unidades pueden solaparse, lo que decide la corrección por población finita), edge (plus o inside) y reach_m (R, m). El archivo GPX contiene un punto de paso por unidad (uno de inicio y otro de fin por transecto), con el nombre de unit_id.

Los estratos no deben solaparse: un solapamiento de más del 0,1 % del estrato menor es un error, uno menor una advertencia. Las entidades de menos de 1 m² (astillas) se omiten, con una advertencia.

Un marco en coordenadas geográficas se proyecta a la zona UTM de su centro. Compruebe el acceso y la seguridad de cada unidad antes del trabajo de campo: la herramienta nunca hace que una ubicación sea segura.</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/layout.py" line="135"/>
        <source>Keep every unit wholly inside its stratum (off: plus sampling)</source>
        <translation>Mantener cada unidad por completo dentro de su estrato (desactivado: muestreo «plus»)</translation>
    </message>
</context>
<context>
    <name>Occupancy</name>
    <message>
        <location filename="../processing/algorithms/occupancy.py" line="57"/>
        <source>Estimate occupancy from repeat visits</source>
        <translation>Estimar la ocupación a partir de visitas repetidas</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/occupancy.py" line="60"/>
        <source>Estimates the share of sites the species occupies (ψ), corrected for the surveys on which it was there but not detected (p), from detection histories: single-season occupancy model (MacKenzie et al. 2002).

Sites: a layer or a table with one row per site (station) and one history field per occasion, holding 1 (detected), 0 (not detected) or NULL (not surveyed that occasion). Any other value stops the run, naming the field and the sites. Sites with no surveyed occasion are left out and listed. Site id field: the ids used in messages (default: the feature ids); they must be unique.

Covariates: numeric site fields for ψ and for p; effort fields (one per history field, in the same order, e.g. camera-days per occasion) add an occasion-level effort to p. logit ψ and logit p are linear in their covariates. A NULL covariate at a surveyed site is an error.

Models compared (optional): one model per line, or models separated by ;; such as &quot;psi: elevation  p: effort&quot; (terms separated by commas or +; a missing part is constant; the word effort means the effort fields). The chosen model, the constant model and these are compared by AIC; the outputs come from the chosen model (the covariates above).

Maximum likelihood with scipy; standard errors from the observed information, intervals on the logit scale at the confidence level. A model that does not converge gives no number, and a parameter at the boundary (ψ = 1, p = 1, a covariate that separates the sites) is reported as such, without SE.

Design advice: the occasions needed for a cumulative detection of 0.95, and the sites needed for the target SE of ψ, from the asymptotic variance of MacKenzie &amp; Royle (2005).
Goodness of fit (replicates above 0): parametric bootstrap of the χ² of the detection-history frequencies (MacKenzie &amp; Bailey 2004), with ĉ; seeded.

Outputs: the sites with psi (fitted ψ), psi_cond (probability of occupancy given the site's history; 1 where detected) and naive (1 where detected at least once); a parameters table (param, estimate, se, lo, hi); optionally the model table; an HTML report; and the numbers PSI, PSI_SE, PSI_LO, PSI_HI, P, P_SE, NAIVE, OCCASIONS_NEEDED, SITES_NEEDED, C_HAT, GOF_P.

More fieldwork follows from the design advice: check every site's access and safety before sending a team; the tool never makes a location safe. Follow your agency's field-safety rules and local law.</source>
        <translation>Estima la proporción de sitios que ocupa la especie (ψ), corregida por las visitas en las que estaba presente pero no se detectó (p), a partir de historiales de detección: modelo de ocupación de una temporada (MacKenzie et al. 2002).

Sitios: una capa o una tabla con una fila por sitio (estación) y un campo del historial por ocasión, que contiene 1 (detectada), 0 (no detectada) o NULL (no muestreado en esa ocasión). Cualquier otro valor detiene la ejecución, nombrando el campo y los sitios. Los sitios sin ninguna ocasión muestreada se dejan fuera y se listan. Campo identificador de los sitios: los identificadores usados en los mensajes (por defecto: los identificadores de entidad); deben ser únicos.

Covariables: campos numéricos de sitio para ψ y para p; los campos de esfuerzo (uno por campo del historial, en el mismo orden, p. ej. días-cámara por ocasión) añaden a p un esfuerzo propio de cada ocasión. logit ψ y logit p son lineales en sus covariables. Una covariable NULL en un sitio muestreado es un error.

Modelos comparados (opcional): un modelo por línea, o modelos separados por ;; como «psi: elevation  p: effort» (términos separados por comas o por +; una parte que falta es constante; la palabra effort designa los campos de esfuerzo). El modelo elegido, el modelo constante y estos se comparan por AIC; las salidas proceden del modelo elegido (las covariables de arriba).

Máxima verosimilitud con scipy; errores estándar a partir de la información observada, intervalos en la escala logit al nivel de confianza indicado. Un modelo que no converge no da ningún número, y un parámetro en el límite (ψ = 1, p = 1, una covariable que separa los sitios) se indica como tal, sin error estándar.

Recomendaciones de diseño: las ocasiones necesarias para una detección acumulada de 0,95, y los sitios necesarios para el error estándar objetivo de ψ, según la varianza asintótica de MacKenzie &amp; Royle (2005).
Bondad de ajuste (réplicas por encima de 0): bootstrap paramétrico del χ² de las frecuencias de los historiales de detección (MacKenzie &amp; Bailey 2004), con ĉ; con semilla.

Salidas: los sitios con psi (ψ ajustado), psi_cond (probabilidad de ocupación dado el historial del sitio; 1 donde se detectó) y naive (1 donde se detectó al menos una vez); una tabla de parámetros (param, estimate, se, lo, hi); opcionalmente la tabla de modelos; un informe HTML; y los valores PSI, PSI_SE, PSI_LO, PSI_HI, P, P_SE, NAIVE, OCCASIONS_NEEDED, SITES_NEEDED, C_HAT, GOF_P.

Las recomendaciones de diseño implican más trabajo de campo: compruebe el acceso y la seguridad de cada sitio antes de enviar un equipo; la herramienta nunca hace que una ubicación sea segura. Siga las normas de seguridad en el terreno de su organismo y la legislación local.</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/occupancy.py" line="90"/>
        <source>Sites with detection histories</source>
        <translation>Sitios con historiales de detección</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/occupancy.py" line="92"/>
        <source>Site id field (empty: feature ids)</source>
        <translation>Campo identificador de los sitios (vacío: identificadores de entidad)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/occupancy.py" line="95"/>
        <source>History fields, one per occasion, in order</source>
        <translation>Campos del historial, uno por ocasión, en orden</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/occupancy.py" line="98"/>
        <source>Site covariates of occupancy ψ</source>
        <translation>Covariables de sitio de la ocupación ψ</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/occupancy.py" line="98"/>
        <source>Site covariates of detection p</source>
        <translation>Covariables de sitio de la detección p</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/occupancy.py" line="98"/>
        <source>Effort fields, one per history field (optional)</source>
        <translation>Campos de esfuerzo, uno por campo del historial (opcional)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/occupancy.py" line="103"/>
        <source>Models to compare by AIC (one per line, e.g. psi: elevation  p: effort)</source>
        <translation>Modelos que comparar por AIC (uno por línea, p. ej. psi: elevation  p: effort)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/occupancy.py" line="106"/>
        <source>Confidence level</source>
        <translation>Nivel de confianza</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/occupancy.py" line="109"/>
        <source>Target SE of ψ for the design advice (0: none)</source>
        <translation>Error estándar objetivo de ψ para las recomendaciones de diseño (0: ninguno)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/occupancy.py" line="112"/>
        <source>Goodness-of-fit bootstrap replicates (0: no test)</source>
        <translation>Réplicas bootstrap de la prueba de bondad de ajuste (0: sin prueba)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/occupancy.py" line="116"/>
        <source>Sites with occupancy</source>
        <translation>Sitios con ocupación</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/occupancy.py" line="117"/>
        <source>Occupancy parameters</source>
        <translation>Parámetros de ocupación</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/occupancy.py" line="119"/>
        <source>Model comparison</source>
        <translation>Comparación de modelos</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/occupancy.py" line="123"/>
        <source>Occupancy ψ</source>
        <translation>Ocupación ψ</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/occupancy.py" line="123"/>
        <source>SE of ψ</source>
        <translation>Error estándar de ψ</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/occupancy.py" line="123"/>
        <source>Lower limit of ψ</source>
        <translation>Límite inferior de ψ</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/occupancy.py" line="123"/>
        <source>Upper limit of ψ</source>
        <translation>Límite superior de ψ</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/occupancy.py" line="123"/>
        <source>Detection p per survey</source>
        <translation>Detección p por visita</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/occupancy.py" line="123"/>
        <source>SE of p</source>
        <translation>Error estándar de p</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/occupancy.py" line="123"/>
        <source>Naive occupancy</source>
        <translation>Ocupación ingenua</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/occupancy.py" line="123"/>
        <source>Occasions for a cumulative detection of 0.95</source>
        <translation>Ocasiones para una detección acumulada de 0.95</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/occupancy.py" line="123"/>
        <source>Sites needed for the target SE of ψ</source>
        <translation>Sitios necesarios para el error estándar objetivo de ψ</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/occupancy.py" line="123"/>
        <source>c-hat of the goodness of fit</source>
        <translation>c-hat de la prueba de bondad de ajuste</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/occupancy.py" line="123"/>
        <source>p-value of the goodness of fit</source>
        <translation>Valor p de la prueba de bondad de ajuste</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/occupancy.py" line="155"/>
        <source>Layer &apos;{layer}&apos; has no features.</source>
        <translation>La capa «{layer}» no tiene entidades.</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/occupancy.py" line="175"/>
        <source>(a table: no map)</source>
        <translation>(una tabla: sin mapa)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/occupancy.py" line="185"/>
        <source>ψ = {psi:.3f} (SE {se}), p = {p:.3f}, naive occupancy {naive:.3f}, {n} sites.</source>
        <translation>ψ = {psi:.3f} (EE {se}), p = {p:.3f}, ocupación ingenua {naive:.3f}, {n} sitios.</translation>
    </message>
</context>
<context>
    <name>Panels</name>
    <message>
        <location filename="../processing/algorithms/panels.py" line="40"/>
        <source>Revisit panels for monitoring</source>
        <translation>Paneles de revisita para el seguimiento</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/panels.py" line="43"/>
        <source>Assigns the units of a layout to revisit panels for a monitoring programme over several years, and writes the schedule: which units are surveyed in which year.

Sample units: the layout's units (any geometry). Units whose role is reserve get no panel; a reserve that replaces a primary unit takes over the primary's panel and years.
Panel design: every year (one panel, panel 0, visited every year); rotating panels (PANELS panels, panel p visited in the years start + (p − 1), start + (p − 1) + K, ..., so each unit once every K years); split panels (a core, panel 0, visited every year, plus K rotating panels).
Rotating panels (K): 2 or more, at most the number of years. Share of units in the core: split panels only, between 0 and 1.
First year and years: the programme's calendar; at most 50 years.
Draw-order field (default draw_ord, as the layout writes it): panels follow the draw order within each stratum, in consecutive blocks: the core first, then panel 1, panel 2, ... In a spatially balanced layout every run of consecutive units of the draw order is spread over the stratum (Robertson et al. 2013), so every panel is. Without the field, the order of the features is used, with a warning.
Stratum field (default stratum): panels are cut within each stratum, so each panel holds every stratum's share.
Field days per unit visit (0: none): adds field days to the schedule.
Random seed: only for the check of the panels' spread (the panels themselves follow the draw order).

The layout's design: plotwise:layout records it in the units' design field. A simple random layout (random, random_sep) gives panels that are random parts of it, a systematic grid (grid, grid_ovl) bands, because its draw order runs row by row: both are warned about. Without the field, the check below decides.
The check: the spread of each panel is measured by the Voronoi measure of Stevens &amp; Olsen (2004) over a fine grid on the convex hull of the units, and compared with random rearrangements of the panels within each stratum. When the panels are not more evenly spread than chance (and not clearly more even than random panels either: a spread measure at least 90% of theirs), a warning says so: the layout was probably simple random (each panel is then a random part of it) or a systematic grid (whose draw order runs row by row, so panels are bands). With few units the check can miss a real balance.

Outputs: the units with panel (0 core or every-year panel, 1..K rotating, empty for reserves) and years (the years the unit is visited, comma-separated); the schedule table (year, panel, n_units, days); an HTML report with the schedule as a chart.

References: Urquhart &amp; Kincaid (1999); McDonald (2003); Robertson et al. (2013); Stevens &amp; Olsen (2004).

Field safety: check every unit's access and safety before sending a team, each year again: the tool never makes a location safe. Follow your agency's field-safety rules and local law.</source>
        <translation>Asigna las unidades de una disposición a paneles de revisita para un programa de seguimiento de varios años, y escribe el calendario: qué unidades se muestrean en qué año.

Unidades de muestreo: las unidades de la disposición (cualquier geometría). Las unidades cuyo rol es reserve no reciben panel; una reserva que sustituye a una unidad principal hereda el panel y los años de esta.
Diseño de paneles: cada año (un solo panel, el panel 0, visitado cada año); paneles rotativos (PANELS paneles; el panel p se visita en los años inicio + (p − 1), inicio + (p − 1) + K, ..., de modo que cada unidad se visita una vez cada K años); paneles divididos (un núcleo, el panel 0, visitado cada año, más K paneles rotativos).
Paneles rotativos (K): 2 o más, como máximo el número de años. Proporción de unidades en el núcleo: solo paneles divididos, entre 0 y 1.
Primer año y años: el calendario del programa; como máximo 50 años.
Campo de orden de sorteo (draw_ord por defecto, como lo escribe la disposición): los paneles siguen el orden de sorteo dentro de cada estrato, en bloques consecutivos: primero el núcleo, luego el panel 1, el panel 2, ... En una disposición espacialmente equilibrada, cada tramo de unidades consecutivas del orden de sorteo está repartido por el estrato (Robertson et al. 2013), así que cada panel también lo está. Sin el campo se usa el orden de las entidades, con una advertencia.
Campo de estrato (stratum por defecto): los paneles se forman dentro de cada estrato, de modo que cada panel contiene la parte de cada estrato.
Jornadas de campo por visita a una unidad (0: ninguna): añade las jornadas de campo al calendario.
Semilla aleatoria: solo para la comprobación del reparto de los paneles (los paneles en sí siguen el orden de sorteo).

El diseño de la disposición: plotwise:layout lo registra en el campo design de las unidades. Una disposición aleatoria simple (random, random_sep) da paneles que son partes aleatorias de ella, y una cuadrícula sistemática (grid, grid_ovl) da bandas, porque su orden de sorteo avanza fila por fila: en ambos casos se emite una advertencia. Sin el campo, decide la comprobación que sigue.
La comprobación: el reparto de cada panel se mide con la medida de Voronoi de Stevens &amp; Olsen (2004) sobre una malla fina en la envolvente convexa de las unidades, y se compara con reordenaciones aleatorias de los paneles dentro de cada estrato. Cuando los paneles no están repartidos de modo más uniforme que al azar (ni claramente más uniforme que paneles aleatorios: una medida de reparto de al menos el 90 % de la de estos), una advertencia lo indica: la disposición probablemente era aleatoria simple (cada panel es entonces una parte aleatoria de ella) o una cuadrícula sistemática (cuyo orden de sorteo avanza fila por fila, de modo que los paneles son bandas). Con pocas unidades, la comprobación puede no detectar un equilibrio real.

Salidas: las unidades con panel (0 para el núcleo o el panel de cada año, 1..K para los paneles rotativos, vacío para las reservas) y years (los años en que se visita la unidad, separados por comas); la tabla del calendario (year, panel, n_units, days); un informe HTML con el calendario en forma de gráfico.

Referencias: Urquhart &amp; Kincaid (1999); McDonald (2003); Robertson et al. (2013); Stevens &amp; Olsen (2004).

Seguridad en el terreno: compruebe el acceso y la seguridad de cada unidad antes de enviar un equipo, y de nuevo cada año: la herramienta nunca hace que una ubicación sea segura. Siga las normas de seguridad en el terreno de su organismo y la legislación local.</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/panels.py" line="83"/>
        <source>Sample units (a layout)</source>
        <translation>Unidades de muestreo (una disposición)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/panels.py" line="85"/>
        <source>Panel design</source>
        <translation>Diseño de paneles</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/panels.py" line="85"/>
        <source>Every unit every year</source>
        <translation>Todas las unidades cada año</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/panels.py" line="85"/>
        <source>Rotating panels</source>
        <translation>Paneles rotativos</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/panels.py" line="85"/>
        <source>Split panels (core + rotating)</source>
        <translation>Paneles divididos (núcleo + rotativos)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/panels.py" line="89"/>
        <source>Rotating panels (K: each unit once every K years)</source>
        <translation>Paneles rotativos (K: cada unidad una vez cada K años)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/panels.py" line="92"/>
        <source>Share of units in the core (split panels)</source>
        <translation>Proporción de unidades en el núcleo (paneles divididos)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/panels.py" line="95"/>
        <source>First year</source>
        <translation>Primer año</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/panels.py" line="98"/>
        <source>Years of the programme</source>
        <translation>Años del programa</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/panels.py" line="101"/>
        <source>Draw-order field</source>
        <translation>Campo de orden de sorteo</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/panels.py" line="104"/>
        <source>Stratum field</source>
        <translation>Campo de estrato</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/panels.py" line="106"/>
        <source>Field days per unit visit (0: none)</source>
        <translation>Jornadas de campo por visita a una unidad (0: ninguna)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/panels.py" line="110"/>
        <source>Units with panels</source>
        <translation>Unidades con paneles</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/panels.py" line="111"/>
        <source>Schedule</source>
        <translation>Calendario</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/panels.py" line="137"/>
        <source>Layer &apos;{layer}&apos;: features {ids} have no geometry. Every unit needs its location: remove them or give them a geometry.</source>
        <translation>Capa «{layer}»: las entidades {ids} no tienen geometría. Cada unidad necesita su ubicación: elimínelas o deles una geometría.</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/panels.py" line="158"/>
        <source>Revisit panels</source>
        <translation>Paneles de revisita</translation>
    </message>
</context>
<context>
    <name>PlotwiseAlgorithm</name>
    <message>
        <location filename="../processing/algorithms/base.py" line="26"/>
        <source>Survey design</source>
        <translation>Diseño del muestreo</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/base.py" line="27"/>
        <source>Estimation</source>
        <translation>Estimación</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/base.py" line="28"/>
        <source>Demo and training</source>
        <translation>Demostración y formación</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/base.py" line="70"/>
        <source>Random seed (0 draws one and records it)</source>
        <translation>Semilla aleatoria (0 sortea una y la registra)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/base.py" line="82"/>
        <source>Report (HTML)</source>
        <translation>Informe (HTML)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/base.py" line="82"/>
        <source>HTML files (*.html)</source>
        <translation>Archivos HTML (*.html)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/base.py" line="97"/>
        <source>Seed used: {seed}</source>
        <translation>Semilla usada: {seed}</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/base.py" line="123"/>
        <source>Cancelled by the user. No result was written.</source>
        <translation>Cancelado por el usuario. No se ha escrito ningún resultado.</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/base.py" line="212"/>
        <source>Report written to {path}</source>
        <translation>Informe escrito en {path}</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/base.py" line="155"/>
        <source>Layer &apos;{layer}&apos; has no field {fields} ({param}). Its fields are: {available}. Choose one of them.</source>
        <translation>La capa «{layer}» no tiene el campo {fields} ({param}). Sus campos son: {available}. Elija uno de ellos.</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/base.py" line="163"/>
        <source>Choose a field of layer &apos;{layer}&apos; for {param}. Its fields are: {available}.</source>
        <translation>Elija un campo de la capa «{layer}» para {param}. Sus campos son: {available}.</translation>
    </message>
</context>
<context>
    <name>PlotwiseBridge</name>
    <message>
        <location filename="../processing/bridge.py" line="57"/>
        <source>Layer '{layer}' has no valid coordinate reference system. Set its CRS (Layer Properties → Source) and run again.</source>
        <translation>La capa «{layer}» no tiene un sistema de referencia de coordenadas válido. Defina su SRC (Propiedades de la capa → Fuente) y vuelva a ejecutar.</translation>
    </message>
    <message>
        <location filename="../processing/bridge.py" line="71"/>
        <source>Layer &apos;{layer}&apos; is in geographic coordinates ({src}); computing in {dst} ({name}), the UTM zone of its centre.</source>
        <translation>La capa «{layer}» está en coordenadas geográficas ({src}); se calcula en {dst} ({name}), la zona UTM de su centro.</translation>
    </message>
    <message>
        <location filename="../processing/bridge.py" line="138"/>
        <source>The input layer &apos;{layer}&apos; could not be opened.</source>
        <translation>No se pudo abrir la capa de entrada «{layer}».</translation>
    </message>
    <message>
        <location filename="../processing/bridge.py" line="119"/>
        <source>Layer &apos;{layer}&apos; has no field named {names}. Choose an existing field.</source>
        <translation>La capa «{layer}» no tiene ningún campo llamado {names}. Elija un campo existente.</translation>
    </message>
    <message>
        <location filename="../processing/bridge.py" line="178"/>
        <source>Layer &apos;{layer}&apos;: invalid geometry repaired for feature id(s) {ids}.</source>
        <translation>Capa «{layer}»: geometría no válida reparada para los identificadores de entidad {ids}.</translation>
    </message>
    <message>
        <location filename="../processing/bridge.py" line="184"/>
        <source>Layer &apos;{layer}&apos;: empty or zero-area feature id(s) {ids} skipped.</source>
        <translation>Capa «{layer}»: entidades vacías o de área nula omitidas (identificadores {ids}).</translation>
    </message>
    <message>
        <location filename="../processing/bridge.py" line="364"/>
        <source>Could not create the raster file {path}. Check the folder exists and is writable.</source>
        <translation>No se pudo crear el archivo ráster {path}. Compruebe que la carpeta existe y admite escritura.</translation>
    </message>
    <message>
        <location filename="../processing/bridge.py" line="393"/>
        <source>GDAL has no GPX driver here; the GPX file cannot be written.</source>
        <translation>GDAL no tiene aquí controlador GPX; no se puede escribir el archivo GPX.</translation>
    </message>
    <message>
        <location filename="../processing/bridge.py" line="399"/>
        <source>Could not create the GPX file {path}. Check the folder exists and is writable.</source>
        <translation>No se pudo crear el archivo GPX {path}. Compruebe que la carpeta existe y admite escritura.</translation>
    </message>
</context>
<context>
    <name>PlotwiseEngine</name>
    <message>
        <location filename="../processing/engine/allocation.py" line="50"/>
        <source>stratum area</source>
        <translation>área del estrato</translation>
    </message>
    <message>
        <location filename="../processing/engine/allocation.py" line="51"/>
        <source>pilot standard deviation</source>
        <translation>desviación estándar piloto</translation>
    </message>
    <message>
        <location filename="../processing/engine/allocation.py" line="52"/>
        <source>pilot mean count</source>
        <translation>conteo medio piloto</translation>
    </message>
    <message>
        <location filename="../processing/engine/allocation.py" line="53"/>
        <source>cost per unit</source>
        <translation>coste por unidad</translation>
    </message>
    <message>
        <location filename="../processing/engine/allocation.py" line="433"/>
        <source>Stratum field &apos;{field}&apos; of layer &apos;{layer}&apos; is empty (NULL) for feature(s) {ids}. Give every stratum an id, or remove those features from the layer.</source>
        <translation>El campo de estrato «{field}» de la capa «{layer}» está vacío (NULL) para las entidades {ids}. Dé un identificador a cada estrato, o quite esas entidades de la capa.</translation>
    </message>
    <message>
        <location filename="../processing/engine/allocation.py" line="451"/>
        <source>Features {ids} of layer &apos;{layer}&apos; carry the same stratum id {value} in field &apos;{field}&apos;, so each would get its own allocation. Dissolve the strata by &apos;{field}&apos; first (the host&apos;s Dissolve tool; then recompute the area field, or leave AREA_FIELD empty to use the polygon areas), or give each feature its own id.</source>
        <translation>Las entidades {ids} de la capa «{layer}» llevan el mismo identificador de estrato {value} en el campo «{field}», así que cada una recibiría su propia asignación. Disuelva primero los estratos por «{field}» (herramienta Disolver del anfitrión; después recalcule el campo de área, o deje AREA_FIELD vacío para usar el área de los polígonos), o dé a cada entidad su propio identificador.</translation>
    </message>
    <message>
        <location filename="../processing/engine/allocation.py" line="459"/>
        <source>Several stratum ids in field &apos;{field}&apos; of layer &apos;{layer}&apos; are carried by more than one feature: {value} (features {ids}) and {more} other id(s) ({others}), so each of those features would get its own allocation. Dissolve the strata by &apos;{field}&apos; first (the host&apos;s Dissolve tool; then recompute the area field, or leave AREA_FIELD empty to use the polygon areas), or give each feature its own id.</source>
        <translation>Varios identificadores de estrato del campo «{field}» de la capa «{layer}» los llevan varias entidades: {value} (entidades {ids}) y {more} identificador(es) más ({others}), así que cada una de esas entidades recibiría su propia asignación. Disuelva primero los estratos por «{field}» (herramienta Disolver del anfitrión; después recalcule el campo de área, o deje AREA_FIELD vacío para usar el área de los polígonos), o dé a cada entidad su propio identificador.</translation>
    </message>
    <message>
        <location filename="../processing/engine/allocation.py" line="480"/>
        <source>The {name} is NULL or negative for stratum feature(s) {shown}. Fill in a non-negative value for every stratum, or remove those strata from the layer.</source>
        <translation>Valor NULL o negativo ({name}) para las entidades de estrato {shown}. Introduzca un valor no negativo para cada estrato, o quite esos estratos de la capa.</translation>
    </message>
    <message>
        <location filename="../processing/engine/allocation.py" line="485"/>
        <source>The {name} is NULL, negative or zero for stratum feature(s) {shown}. Fill in a positive value for every stratum, or remove those strata from the layer.</source>
        <translation>Valor NULL, negativo o cero ({name}) para las entidades de estrato {shown}. Introduzca un valor positivo para cada estrato, o quite esos estratos de la capa.</translation>
    </message>
    <message>
        <location filename="../processing/engine/allocation.py" line="530"/>
        <source>Unknown allocation method {method!r}; use one of: {methods}.</source>
        <translation>Método de asignación desconocido {method!r}; use uno de: {methods}.</translation>
    </message>
    <message>
        <location filename="../processing/engine/allocation.py" line="535"/>
        <source>The strata layer has no features. Run the stratification first.</source>
        <translation>La capa de estratos no tiene entidades. Ejecute primero la estratificación.</translation>
    </message>
    <message>
        <location filename="../processing/engine/allocation.py" line="541"/>
        <source>The unit area must be a positive number.</source>
        <translation>El área de la unidad debe ser un número positivo.</translation>
    </message>
    <message>
        <location filename="../processing/engine/allocation.py" line="544"/>
        <source>The minimum per stratum must be at least 1 (2 lets each stratum variance be estimated).</source>
        <translation>El mínimo por estrato debe ser al menos 1 (2 permite estimar la varianza de cada estrato).</translation>
    </message>
    <message>
        <location filename="../processing/engine/allocation.py" line="555"/>
        <source>The cost method needs a cost per unit for every stratum: choose the cost field.</source>
        <translation>El método por coste necesita un coste por unidad para cada estrato: elija el campo de coste.</translation>
    </message>
    <message>
        <location filename="../processing/engine/allocation.py" line="555"/>
        <source>The budget needs a cost per unit for every stratum: choose the cost field.</source>
        <translation>El presupuesto necesita un coste por unidad para cada estrato: elija el campo de coste.</translation>
    </message>
    <message>
        <location filename="../processing/engine/allocation.py" line="564"/>
        <source>The fixed cost must be zero or positive.</source>
        <translation>El coste fijo debe ser cero o positivo.</translation>
    </message>
    <message>
        <location filename="../processing/engine/allocation.py" line="602"/>
        <source>No pilot standard deviations: the allocation assumes equal SDs in all strata (proportional to area).</source>
        <translation>Sin desviaciones estándar piloto: la asignación supone desviaciones iguales en todos los estratos (proporcional al área).</translation>
    </message>
    <message>
        <location filename="../processing/engine/allocation.py" line="606"/>
        <source>No pilot standard deviations: the allocation assumes equal SDs in all strata (area / square root of cost).</source>
        <translation>Sin desviaciones estándar piloto: la asignación supone desviaciones iguales en todos los estratos (área / raíz cuadrada del coste).</translation>
    </message>
    <message>
        <location filename="../processing/engine/allocation.py" line="610"/>
        <source>All pilot standard deviations are zero: proportional allocation is used instead.</source>
        <translation>Todas las desviaciones estándar piloto son cero: se usa en su lugar la asignación proporcional.</translation>
    </message>
    <message>
        <location filename="../processing/engine/allocation.py" line="615"/>
        <source>The {name} is zero for stratum feature(s) {shown}: they get only the minimum of {minimum} unit(s). A pilot with no variation is rarely the truth; check it.</source>
        <translation>Valor cero ({name}) para las entidades de estrato {shown}: reciben solo el mínimo de {minimum} unidad(es). Un piloto sin variación rara vez refleja la realidad; compruébelo.</translation>
    </message>
    <message>
        <location filename="../processing/engine/allocation.py" line="578"/>
        <source>Stratum feature(s) {shown} are smaller than one sample unit of {unit_area:g}. Merge them with a neighbour or use a smaller unit area.</source>
        <translation>Las entidades de estrato {shown} son más pequeñas que una unidad de muestreo de {unit_area:g}. Fusiónelas con una vecina o use un área de unidad menor.</translation>
    </message>
    <message>
        <location filename="../processing/engine/allocation.py" line="588"/>
        <source>Stratum feature(s) {shown} hold fewer than {minimum} units: they get all the units that fit.</source>
        <translation>Las entidades de estrato {shown} contienen menos de {minimum} unidades: reciben todas las unidades que caben.</translation>
    </message>
    <message>
        <location filename="../processing/engine/allocation.py" line="567"/>
        <source>A target CV is set: the budget is not used.</source>
        <translation>Hay un CV objetivo: no se usa el presupuesto.</translation>
    </message>
    <message>
        <location filename="../processing/engine/allocation.py" line="628"/>
        <source>The budget {budget:g} is below the minimum of {minimum:g} (fixed cost {fixed_cost:g} plus {per_stratum} unit(s) in every stratum at its cost). Raise the budget or lower the minimum per stratum.</source>
        <translation>El presupuesto {budget:g} es inferior al mínimo de {minimum:g} (coste fijo {fixed_cost:g} más {per_stratum} unidad(es) en cada estrato a su coste). Aumente el presupuesto o baje el mínimo por estrato.</translation>
    </message>
    <message>
        <location filename="../processing/engine/allocation.py" line="637"/>
        <source>The budget exceeds the cost of every unit that fits ({maximum:g}): all units are taken.</source>
        <translation>El presupuesto supera el coste de todas las unidades que caben ({maximum:g}): se toman todas.</translation>
    </message>
    <message>
        <location filename="../processing/engine/allocation.py" line="648"/>
        <source>Give a total number of units, a budget (with costs) or a target CV.</source>
        <translation>Indique un número total de unidades, un presupuesto (con costes) o un CV objetivo.</translation>
    </message>
    <message>
        <location filename="../processing/engine/allocation.py" line="652"/>
        <source>The total of {total} units is below the minimum of {minimum} ({per_stratum} per stratum over {n_strata} strata). Raise the total or lower the minimum.</source>
        <translation>El total de {total} unidades es inferior al mínimo de {minimum} ({per_stratum} por estrato en {n_strata} estratos). Aumente el total o baje el mínimo.</translation>
    </message>
    <message>
        <location filename="../processing/engine/allocation.py" line="658"/>
        <source>The total of {total} units exceeds the {fit} units of {unit_area:g} that fit in the strata. Lower the total or use smaller units.</source>
        <translation>El total de {total} unidades supera las {fit} unidades de {unit_area:g} que caben en los estratos. Baje el total o use unidades más pequeñas.</translation>
    </message>
    <message>
        <location filename="../processing/engine/allocation.py" line="671"/>
        <source>Stratum feature(s) {shown} get one unit only: their variance cannot be estimated.</source>
        <translation>Las entidades de estrato {shown} reciben una sola unidad: su varianza no puede estimarse.</translation>
    </message>
    <message>
        <location filename="../processing/engine/allocation.py" line="677"/>
        <source>Stratum feature(s) {shown} are sampled completely (every unit that fits).</source>
        <translation>Las entidades de estrato {shown} se muestrean por completo (todas las unidades que caben).</translation>
    </message>
    <message>
        <location filename="../processing/engine/allocation.py" line="682"/>
        <source>The {name} is zero in stratum feature(s) {shown}: their CV is undefined.</source>
        <translation>Valor cero ({name}) en las entidades de estrato {shown}: su CV no está definido.</translation>
    </message>
    <message>
        <location filename="../processing/engine/allocation.py" line="782"/>
        <source>A target CV needs both the pilot standard deviation and the pilot mean count per unit: choose the SD field and the mean field.</source>
        <translation>Un CV objetivo necesita la desviación estándar piloto y el conteo medio piloto por unidad: elija el campo de DE y el campo de media.</translation>
    </message>
    <message>
        <location filename="../processing/engine/allocation.py" line="788"/>
        <source>The {name} is zero in every stratum: no CV can be computed.</source>
        <translation>Valor cero ({name}) en todos los estratos: no puede calcularse ningún CV.</translation>
    </message>
    <message>
        <location filename="../processing/engine/allocation.py" line="799"/>
        <source>The target CV of {target_cv:.3g} cannot be reached: even all {fit} units that fit give an expected CV of {cv:.3g}. Accept a CV of at least {cv:.3g}, or use smaller units.</source>
        <translation>El CV objetivo de {target_cv:.3g} no puede alcanzarse: incluso las {fit} unidades que caben dan un CV esperado de {cv:.3g}. Acepte un CV de al menos {cv:.3g}, o use unidades más pequeñas.</translation>
    </message>
    <message>
        <location filename="../processing/engine/counting.py" line="42"/>
        <source>needs a positive area_m2</source>
        <translation>necesita un area_m2 positivo</translation>
    </message>
    <message>
        <location filename="../processing/engine/counting.py" line="49"/>
        <source>has a line of zero length</source>
        <translation>tiene una línea de longitud cero</translation>
    </message>
    <message>
        <location filename="../processing/engine/counting.py" line="51"/>
        <source>has an unsupported geometry type ({kind})</source>
        <translation>tiene un tipo de geometría no admitido ({kind})</translation>
    </message>
    <message>
        <location filename="../processing/engine/counting.py" line="107"/>
        <source>The detection probability must be in (0, 1] (got {detection:g}).</source>
        <translation>La probabilidad de detección debe estar en (0, 1] (se recibió {detection:g}).</translation>
    </message>
    <message>
        <location filename="../processing/engine/demo_reserve.py" line="109"/>
        <source>Could not place the demo lake; try another seed.</source>
        <translation>No se pudo colocar el lago de demostración; pruebe otra semilla.</translation>
    </message>
    <message>
        <location filename="../processing/engine/demo_reserve.py" line="235"/>
        <source>The cell size must be between 10 and 500 m (got {cell_size:g} m).</source>
        <translation>El tamaño de celda debe estar entre 10 y 500 m (se recibió {cell_size:g} m).</translation>
    </message>
    <message>
        <location filename="../processing/engine/design_comparison.py" line="229"/>
        <source>The density surface must be a single raster band.</source>
        <translation>La superficie de densidad debe ser una sola banda ráster.</translation>
    </message>
    <message>
        <location filename="../processing/engine/design_comparison.py" line="233"/>
        <source>The density surface must be a north-up raster (no rotation); warp it first.</source>
        <translation>La superficie de densidad debe ser un ráster orientado al norte (sin rotación); reproyéctela primero.</translation>
    </message>
    <message>
        <location filename="../processing/engine/design_comparison.py" line="242"/>
        <source>The density surface does not overlap the frame. Check that both cover the same area (and their coordinate reference systems).</source>
        <translation>La superficie de densidad no se superpone al marco de muestreo. Compruebe que ambos cubren la misma zona (y sus sistemas de referencia de coordenadas).</translation>
    </message>
    <message>
        <location filename="../processing/engine/design_comparison.py" line="267"/>
        <source>A stratum has no stratum value (NULL). Give every stratum a value.</source>
        <translation>Un estrato no tiene valor de estrato (NULL). Dé un valor a cada estrato.</translation>
    </message>
    <message>
        <location filename="../processing/engine/design_comparison.py" line="299"/>
        <source>{overlap} surface cell(s) lie in more than one stratum; each was given to the first of them. Strata should not overlap.</source>
        <translation>{overlap} celda(s) de la superficie están en más de un estrato; cada una se asignó al primero. Los estratos no deberían superponerse.</translation>
    </message>
    <message>
        <location filename="../processing/engine/design_comparison.py" line="311"/>
        <source>No cell centre of the density surface lies in the frame: the surface cells are too coarse for the frame, or the two do not overlap.</source>
        <translation>Ningún centro de celda de la superficie de densidad cae en el marco de muestreo: las celdas son demasiado gruesas para él, o ambos no se superponen.</translation>
    </message>
    <message>
        <location filename="../processing/engine/design_comparison.py" line="318"/>
        <source>The density surface has {n} negative cell(s) in the frame. Expected animals per km² must be 0 or more: correct the surface (for instance clip it at 0).</source>
        <translation>La superficie de densidad tiene {n} celda(s) negativa(s) en el marco de muestreo. Los animales esperados por km² deben ser 0 o más: corrija la superficie (por ejemplo, recórtela en 0).</translation>
    </message>
    <message>
        <location filename="../processing/engine/design_comparison.py" line="325"/>
        <source>{n} cell(s) of the frame ({share:.1%}) have no value on the density surface and are left out of the population: the comparison speaks for the rest of the frame.</source>
        <translation>{n} celda(s) del marco de muestreo ({share:.1%}) no tienen valor en la superficie de densidad y quedan fuera de la población: la comparación vale para el resto del marco.</translation>
    </message>
    <message>
        <location filename="../processing/engine/design_comparison.py" line="333"/>
        <source>The density surface has no value in the frame.</source>
        <translation>La superficie de densidad no tiene ningún valor en el marco de muestreo.</translation>
    </message>
    <message>
        <location filename="../processing/engine/design_comparison.py" line="339"/>
        <source>Strata {ids} hold no cell centre of the density surface inside the frame. Remove them, merge them with a neighbour, or use a finer surface.</source>
        <translation>Los estratos {ids} no contienen ningún centro de celda de la superficie de densidad dentro del marco de muestreo. Quítelos, fusiónelos con un vecino, o use una superficie más fina.</translation>
    </message>
    <message>
        <location filename="../processing/engine/layout.py" line="209"/>
        <source>SHAPE must be 0 (point), 1 (square), 2 (circle) or 3 (line transect).</source>
        <translation>SHAPE debe ser 0 (punto), 1 (cuadrado), 2 (círculo) o 3 (transecto lineal).</translation>
    </message>
    <message>
        <location filename="../processing/engine/design_comparison.py" line="102"/>
        <source>SIZE must be more than 0 m: it is the counting radius of a point station.</source>
        <translation>SIZE debe ser mayor que 0 m: es el radio de conteo de una estación puntual.</translation>
    </message>
    <message>
        <location filename="../processing/engine/design_comparison.py" line="105"/>
        <source>SIZE must be more than 0 m: it is the square unit&apos;s size.</source>
        <translation>SIZE debe ser mayor que 0 m: es el tamaño de la unidad cuadrada.</translation>
    </message>
    <message>
        <location filename="../processing/engine/design_comparison.py" line="106"/>
        <source>SIZE must be more than 0 m: it is the circle unit&apos;s size.</source>
        <translation>SIZE debe ser mayor que 0 m: es el tamaño de la unidad circular.</translation>
    </message>
    <message>
        <location filename="../processing/engine/design_comparison.py" line="107"/>
        <source>SIZE must be more than 0 m: it is the line unit&apos;s size.</source>
        <translation>SIZE debe ser mayor que 0 m: es el tamaño de la unidad lineal.</translation>
    </message>
    <message>
        <location filename="../processing/engine/design_comparison.py" line="414"/>
        <source>A line transect needs the half-width of its counting strip (more than 0 m): animals are counted up to that distance on either side of the line.</source>
        <translation>Un transecto lineal necesita la semianchura de su franja de conteo (más de 0 m): los animales se cuentan hasta esa distancia a cada lado de la línea.</translation>
    </message>
    <message>
        <location filename="../processing/engine/design_comparison.py" line="932"/>
        <source>The overdispersion k must be 0 (Poisson counts) or more.</source>
        <translation>La sobredispersión k debe ser 0 (conteos de Poisson) o más.</translation>
    </message>
    <message>
        <location filename="../processing/engine/design_comparison.py" line="953"/>
        <source>The strata cover {share:.1%} of the frame: every design is compared on the part the strata cover.</source>
        <translation>Los estratos cubren el {share:.1%} del marco de muestreo: cada diseño se compara en la parte que cubren.</translation>
    </message>
    <message>
        <location filename="../processing/engine/design_comparison.py" line="963"/>
        <source>A stratum of the layout has no cells on the surface grid.</source>
        <translation>Un estrato de la disposición no tiene celdas en la cuadrícula de la superficie.</translation>
    </message>
    <message>
        <location filename="../processing/engine/design_comparison.py" line="1046"/>
        <source>Unknown design {design}; use 0 to {last}.</source>
        <translation>Diseño desconocido {design}; use de 0 a {last}.</translation>
    </message>
    <message>
        <location filename="../processing/engine/design_comparison.py" line="1050"/>
        <source>N_UNITS must be at least {minimum}.</source>
        <translation>N_UNITS debe ser al menos {minimum}.</translation>
    </message>
    <message>
        <location filename="../processing/engine/design_comparison.py" line="1060"/>
        <source>The {design} design needs strata: give the STRATA layer.</source>
        <translation>El diseño «{design}» necesita estratos: indique la capa STRATA.</translation>
    </message>
    <message>
        <location filename="../processing/engine/layout.py" line="76"/>
        <source>simple random</source>
        <translation>aleatorio simple</translation>
    </message>
    <message>
        <location filename="../processing/engine/design_comparison.py" line="90"/>
        <source>stratified proportional</source>
        <translation>estratificado proporcional</translation>
    </message>
    <message>
        <location filename="../processing/engine/layout.py" line="76"/>
        <source>systematic grid</source>
        <translation>cuadrícula sistemática</translation>
    </message>
    <message>
        <location filename="../processing/engine/layout.py" line="76"/>
        <source>spatially balanced</source>
        <translation>espacialmente equilibrado</translation>
    </message>
    <message>
        <location filename="../processing/engine/design_comparison.py" line="1170"/>
        <source>REPLICATES must be at least 2.</source>
        <translation>REPLICATES debe ser al menos 2.</translation>
    </message>
    <message>
        <location filename="../processing/engine/design_comparison.py" line="1197"/>
        <source>Each simulated survey would count about {millions:.0f} million surface cells ({units} units of {unit_area:,.0f} m² on {cell_width:g} m cells), too many to simulate. Resample the surface to coarser cells, or compare fewer designs or units.</source>
        <translation>Cada muestreo simulado contaría unos {millions:.0f} millones de celdas de la superficie ({units} unidades de {unit_area:,.0f} m² en celdas de {cell_width:g} m), demasiadas para simular. Remuestree la superficie a celdas más gruesas, o compare menos diseños o unidades.</translation>
    </message>
    <message>
        <location filename="../processing/engine/design_comparison.py" line="1479"/>
        <source>{design}: {warning}</source>
        <translation>{design}: {warning}</translation>
    </message>
    <message>
        <location filename="../processing/engine/design_comparison.py" line="1482"/>
        <source>{design} at {n_units} units: {failed} of {replicates} simulated surveys gave no estimate (a stratum without a counted unit, or no unit in the frame); they are left out of its figures.</source>
        <translation>{design} con {n_units} unidades: {failed} de los {replicates} muestreos simulados no dieron estimación (un estrato sin unidad contada, o ninguna unidad en el marco de muestreo); se excluyen de sus cifras.</translation>
    </message>
    <message>
        <location filename="../processing/engine/design_comparison.py" line="1522"/>
        <source>The range of units &apos;{text}&apos; cannot be read. Give whole numbers separated by commas (e.g. 20, 40, 80) or start:stop:step (e.g. 20:100:20).</source>
        <translation>El rango de unidades «{text}» no puede leerse. Indique números enteros separados por comas (p. ej. 20, 40, 80) o inicio:fin:paso (p. ej. 20:100:20).</translation>
    </message>
    <message>
        <location filename="../processing/engine/design_comparison.py" line="1529"/>
        <source>In the range of units &apos;{text}&apos;, &apos;{part}&apos; starts above where it stops (start {start}, stop {stop}), so it holds no number of units. Write start:stop:step with the start at or below the stop (e.g. {stop}:{start}:{step}).</source>
        <translation>En el rango de unidades «{text}», «{part}» empieza por encima de donde termina (inicio {start}, fin {stop}), así que no contiene ningún número de unidades. Escriba inicio:fin:paso con el inicio menor o igual que el fin (p. ej. {stop}:{start}:{step}).</translation>
    </message>
    <message>
        <location filename="../processing/engine/design_comparison.py" line="1535"/>
        <source>Every number of units in the range must be at least {minimum}.</source>
        <translation>Cada número de unidades del rango debe ser al menos {minimum}.</translation>
    </message>
    <message>
        <location filename="../processing/engine/design_comparison.py" line="1539"/>
        <source>The range of units holds more than 20 values; give at most 20.</source>
        <translation>El rango de unidades tiene más de 20 valores; indique como máximo 20.</translation>
    </message>
    <message>
        <location filename="../processing/engine/listing.py" line="19"/>
        <source>{shown} … ({n} in all)</source>
        <translation>{shown} … ({n} en total)</translation>
    </message>
    <message>
        <location filename="../processing/engine/estimation.py" line="378"/>
        <source>The {count_name} field holds values that are not numbers for units {ids}. Enter a whole count (0 when surveyed and none seen) or leave the field empty (NULL) for units that were not surveyed.</source>
        <translation>El campo {count_name} contiene valores que no son números para las unidades {ids}. Introduzca un conteo entero (0 si se muestreó y no se vio ninguno) o deje el campo vacío (NULL) para las unidades no muestreadas.</translation>
    </message>
    <message>
        <location filename="../processing/engine/estimation.py" line="389"/>
        <source>The {count_name} field holds negative or infinite counts for units {ids}. Counts must be 0 or more; correct them, or leave the field empty (NULL) if the unit was not surveyed.</source>
        <translation>El campo {count_name} contiene conteos negativos o infinitos para las unidades {ids}. Los conteos deben ser 0 o más; corríjalos, o deje el campo vacío (NULL) si la unidad no se muestreó.</translation>
    </message>
    <message>
        <location filename="../processing/engine/estimation.py" line="562"/>
        <source>Layer &apos;{layer}&apos;: the stratum id field &apos;{field}&apos; is empty (NULL) for feature id(s) {ids}. These polygons cover {area:.4g} {unit} that no stratum covers, so the estimate would silently speak for a smaller frame. Give each polygon the id of its stratum, delete the polygons that are not part of the frame, or choose to leave out strata with no surveyed unit (the frame then shrinks).</source>
        <translation>Capa «{layer}»: el campo de identificador de estrato «{field}» está vacío (NULL) para los identificadores de entidad {ids}. Estos polígonos cubren {area:.4g} {unit} que ningún estrato cubre, así que la estimación hablaría sin avisar de un marco de muestreo más pequeño. Dé a cada polígono el identificador de su estrato, elimine los polígonos que no forman parte del marco, o elija dejar fuera los estratos sin unidades muestreadas (el marco se reduce entonces).</translation>
    </message>
    <message>
        <location filename="../processing/engine/estimation.py" line="571"/>
        <source>Layer &apos;{layer}&apos;: the stratum id field &apos;{field}&apos; is empty (NULL) for feature id(s) {ids}. These polygons were left out, and the frame shrank by the {area:.4g} {unit} of them that no stratum covers. To keep them in the frame, give each polygon the id of its stratum.</source>
        <translation>Capa «{layer}»: el campo de identificador de estrato «{field}» está vacío (NULL) para los identificadores de entidad {ids}. Estos polígonos se dejaron fuera, y el marco de muestreo se redujo en la parte que ningún estrato cubre: {area:.4g} {unit}. Para mantenerlos en el marco, dé a cada polígono el identificador de su estrato.</translation>
    </message>
    <message>
        <location filename="../processing/engine/estimation.py" line="534"/>
        <source>Layer &apos;{layer}&apos;: no polygon has a stratum id in the field &apos;{field}&apos;. Fill in the stratum ids, or choose the field that holds them.</source>
        <translation>Capa «{layer}»: ningún polígono tiene identificador de estrato en el campo «{field}». Rellene los identificadores de estrato, o elija el campo que los contiene.</translation>
    </message>
    <message>
        <location filename="../processing/engine/estimation.py" line="591"/>
        <source>Layer &apos;{layer}&apos;: the strata overlap: {pairs}. In all, {area:.4g} {unit} ({percent:.3g} % of the {covered:.4g} {unit} the strata cover) would be counted in more than one stratum, which inflates the frame area and the abundance. Fix the strata polygons so that they do not overlap: each piece of land belongs to one stratum only (cut each overlap out of all strata but one, or redraw the shared edges).</source>
        <translation>Capa «{layer}»: los estratos se solapan: {pairs}. En total, {area:.4g} {unit} ({percent:.3g} % de la superficie cubierta por los estratos, {covered:.4g} {unit}) se contarían en más de un estrato, lo que infla el área del marco de muestreo y la abundancia. Corrija los polígonos de los estratos para que no se solapen: cada trozo de terreno pertenece a un solo estrato (recorte cada solape de todos los estratos salvo uno, o vuelva a trazar los bordes comunes).</translation>
    </message>
    <message>
        <location filename="../processing/engine/estimation.py" line="600"/>
        <source>Layer &apos;{layer}&apos;: the strata overlap: {pairs}. In all, {area:.4g} {unit} ({percent:.3g} % of the {covered:.4g} {unit} the strata cover) is counted in more than one stratum, so the frame area and the abundance are slightly too large. Fix the strata polygons so that they do not overlap (snap the shared edges, or cut each overlap out of all strata but one).</source>
        <translation>Capa «{layer}»: los estratos se solapan: {pairs}. En total, {area:.4g} {unit} ({percent:.3g} % de la superficie cubierta por los estratos, {covered:.4g} {unit}) se cuentan en más de un estrato, por lo que el área del marco de muestreo y la abundancia son algo mayores de lo debido. Corrija los polígonos de los estratos para que no se solapen (ajuste los bordes comunes con el autoensamblado, o recorte cada solape de todos los estratos salvo uno).</translation>
    </message>
    <message>
        <location filename="../processing/engine/estimation.py" line="662"/>
        <source>The confidence level must lie between 0 and 1 (got {confidence}); use e.g. 0.95.</source>
        <translation>El nivel de confianza debe estar entre 0 y 1 (se recibió {confidence}); use p. ej. 0.95.</translation>
    </message>
    <message>
        <location filename="../processing/engine/estimation.py" line="666"/>
        <source>Unknown interval method {method!r}; use one of {methods}.</source>
        <translation>Método de intervalo desconocido {method!r}; use uno de {methods}.</translation>
    </message>
    <message>
        <location filename="../processing/engine/estimation.py" line="670"/>
        <source>Unknown variance method {method!r}; use one of {methods}.</source>
        <translation>Método de varianza desconocido {method!r}; use uno de {methods}.</translation>
    </message>
    <message>
        <location filename="../processing/engine/estimation.py" line="674"/>
        <source>The detection probability must lie in (0, 1] (got {p}).</source>
        <translation>La probabilidad de detección debe estar en (0, 1] (se recibió {p}).</translation>
    </message>
    <message>
        <location filename="../processing/engine/estimation.py" line="677"/>
        <source>The standard error of the detection probability must be 0 or more.</source>
        <translation>El error estándar de la probabilidad de detección debe ser 0 o más.</translation>
    </message>
    <message>
        <location filename="../processing/engine/estimation.py" line="696"/>
        <source>unit_ids must have one id per unit.</source>
        <translation>unit_ids debe tener un identificador por unidad.</translation>
    </message>
    <message>
        <location filename="../processing/engine/estimation.py" line="700"/>
        <source>counts, unit_areas and strata must have one value per unit.</source>
        <translation>counts, unit_areas y strata deben tener un valor por unidad.</translation>
    </message>
    <message>
        <location filename="../processing/engine/estimation.py" line="739"/>
        <source>Strata {ids} have no area. Check the strata layer&apos;s geometries.</source>
        <translation>Los estratos {ids} no tienen área. Compruebe las geometrías de la capa de estratos.</translation>
    </message>
    <message>
        <location filename="../processing/engine/estimation.py" line="752"/>
        <source>Units {ids} have no stratum (the stratum field is empty). Fill in their stratum, or leave the stratum field out to treat the frame as one stratum.</source>
        <translation>Las unidades {ids} no tienen estrato (el campo de estrato está vacío). Rellene su estrato, u omita el campo de estrato para tratar el marco de muestreo como un solo estrato.</translation>
    </message>
    <message>
        <location filename="../processing/engine/estimation.py" line="763"/>
        <source>Units {ids} have stratum ids ({names}) that are not in the strata layer. Check the stratum field of the units and the id field of the strata layer.</source>
        <translation>Las unidades {ids} tienen identificadores de estrato ({names}) que no están en la capa de estratos. Compruebe el campo de estrato de las unidades y el campo identificador de la capa de estratos.</translation>
    </message>
    <message>
        <location filename="../processing/engine/estimation.py" line="709"/>
        <source>{n} unit(s) have no count and are treated as not surveyed (non-response): {ids}.</source>
        <translation>{n} unidad(es) no tienen conteo y se tratan como no muestreadas (no respuesta): {ids}.</translation>
    </message>
    <message>
        <location filename="../processing/engine/estimation.py" line="715"/>
        <source>No unit has a count, so nothing can be estimated. Enter the counts of the surveyed units (0 when none was seen) in the count field.</source>
        <translation>Ninguna unidad tiene conteo, así que no puede estimarse nada. Introduzca los conteos de las unidades muestreadas (0 si no se vio ninguno) en el campo de conteo.</translation>
    </message>
    <message>
        <location filename="../processing/engine/estimation.py" line="812"/>
        <source>Presence data must be 0 or 1; units {ids} hold other values. Use the counts without the presence option, or recode the field.</source>
        <translation>Los datos de presencia deben ser 0 o 1; las unidades {ids} contienen otros valores. Use los conteos sin la opción de presencia, o recodifique el campo.</translation>
    </message>
    <message>
        <location filename="../processing/engine/estimation.py" line="820"/>
        <source>The detection probability was not applied to presence data: dividing a proportion of occupied units by p is not an occupancy correction, which needs repeat visits.</source>
        <translation>La probabilidad de detección no se aplicó a los datos de presencia: dividir una proporción de unidades ocupadas por p no es una corrección de ocupación, que requiere visitas repetidas.</translation>
    </message>
    <message>
        <location filename="../processing/engine/estimation.py" line="781"/>
        <source>No unit of strata {ids} was surveyed, so their abundance cannot be estimated. Survey units there, or choose to leave these strata out (the estimate then covers a smaller frame).</source>
        <translation>Ninguna unidad de los estratos {ids} se muestreó, así que su abundancia no puede estimarse. Muestree unidades allí, o elija dejar fuera esos estratos (la estimación cubre entonces un marco de muestreo menor).</translation>
    </message>
    <message>
        <location filename="../processing/engine/estimation.py" line="788"/>
        <source>Strata {ids} had no surveyed unit and were left out: the frame shrank by {dropped_area:.6g} area units, and the estimate covers the remaining strata only.</source>
        <translation>Los estratos {ids} no tenían ninguna unidad muestreada y se dejaron fuera: el marco de muestreo se redujo en {dropped_area:.6g} unidades de área, y la estimación cubre solo los estratos restantes.</translation>
    </message>
    <message>
        <location filename="../processing/engine/estimation.py" line="896"/>
        <source>The local neighbourhood variance needs the positions of the units.</source>
        <translation>La varianza de vecindad local necesita las posiciones de las unidades.</translation>
    </message>
    <message>
        <location filename="../processing/engine/estimation.py" line="901"/>
        <source>Units {ids} have no position, so the local neighbourhood variance cannot use them. Give their locations, or use the simple random sampling formula.</source>
        <translation>Las unidades {ids} no tienen posición, así que la varianza de vecindad local no puede usarlas. Indique sus ubicaciones, o use la fórmula del muestreo aleatorio simple.</translation>
    </message>
    <message>
        <location filename="../processing/engine/estimation.py" line="1000"/>
        <source>In strata {ids} the surveyed area exceeds the stratum area. Check the unit areas and the area unit, or switch off the finite-population correction.</source>
        <translation>En los estratos {ids} el área muestreada supera el área del estrato. Compruebe las áreas de las unidades y la unidad de área, o desactive la corrección por población finita.</translation>
    </message>
    <message>
        <location filename="../processing/engine/estimation.py" line="1074"/>
        <source>The only stratum has one surveyed unit: no variance, standard error or interval can be estimated. Survey at least two units.</source>
        <translation>El único estrato tiene una sola unidad muestreada: no puede estimarse ninguna varianza, error estándar ni intervalo. Muestree al menos dos unidades.</translation>
    </message>
    <message>
        <location filename="../processing/engine/estimation.py" line="1420"/>
        <source>The bootstrap needs a random generator (rng).</source>
        <translation>El bootstrap necesita un generador aleatorio (rng).</translation>
    </message>
    <message>
        <location filename="../processing/engine/estimation.py" line="1203"/>
        <source>The target CV {target_cv:.3g} cannot be reached by more units: the detection probability&apos;s own CV is {cv_p:.3g}. Improve the detection study first.</source>
        <translation>El CV objetivo {target_cv:.3g} no puede alcanzarse con más unidades: el CV propio de la probabilidad de detección es {cv_p:.3g}. Mejore primero el estudio de detección.</translation>
    </message>
    <message>
        <location filename="../processing/engine/estimation.py" line="1215"/>
        <source>No variation was observed, so the next survey&apos;s sample sizes are set to the minimum of 2 per stratum.</source>
        <translation>No se observó variación, así que los tamaños de muestra del próximo muestreo se fijan en el mínimo de 2 por estrato.</translation>
    </message>
    <message>
        <location filename="../processing/engine/frame.py" line="257"/>
        <source>EDGE_BUFFER is {edge_buffer} m; it must be zero or a positive distance in metres.</source>
        <translation>EDGE_BUFFER es {edge_buffer} m; debe ser cero o una distancia positiva en metros.</translation>
    </message>
    <message>
        <location filename="../processing/engine/frame.py" line="264"/>
        <source>The study area (INPUT) has no polygon with a positive area. Check that the layer holds polygons and is in a projected CRS in metres.</source>
        <translation>El área de estudio (INPUT) no tiene ningún polígono con área positiva. Compruebe que la capa contiene polígonos y está en un SRC proyectado en metros.</translation>
    </message>
    <message>
        <location filename="../processing/engine/frame.py" line="298"/>
        <source>Nothing is left of the study area (INPUT) after removing the excluded polygons (EXCLUDE): they cover all {hectares:.4g} ha. Check that EXCLUDE holds only the areas to leave out.</source>
        <translation>No queda nada del área de estudio (INPUT) tras quitar los polígonos excluidos (EXCLUDE): cubren las {hectares:.4g} ha. Compruebe que EXCLUDE contiene solo las zonas que hay que dejar fuera.</translation>
    </message>
    <message>
        <location filename="../processing/engine/frame.py" line="304"/>
        <source>Nothing is left of the frame after the raster mask (MASK): every cell over the remaining {hectares:.4g} ha is outside [MASK_MIN, MASK_MAX] or NoData. Widen the range, check the raster&apos;s units, or check that the raster covers the study area.</source>
        <translation>No queda nada del marco de muestreo tras la máscara ráster (MASK): cada celda de las {hectares:.4g} ha restantes está fuera de [MASK_MIN, MASK_MAX] o es NoData. Amplíe el rango, compruebe las unidades del ráster, o compruebe que el ráster cubre el área de estudio.</translation>
    </message>
    <message>
        <location filename="../processing/engine/frame.py" line="311"/>
        <source>Nothing is left of the frame after the inward edge buffer (EDGE_BUFFER = {edge_buffer:g} m): the remaining {hectares:.4g} ha all lie within that distance of the study area&apos;s boundary (study area extent {width:.0f} m x {height:.0f} m). Use a smaller EDGE_BUFFER.</source>
        <translation>No queda nada del marco de muestreo tras el búfer interior (EDGE_BUFFER = {edge_buffer:g} m): las {hectares:.4g} ha restantes están todas a menos de esa distancia del límite del área de estudio (extensión del área de estudio {width:.0f} m x {height:.0f} m). Use un EDGE_BUFFER menor.</translation>
    </message>
    <message>
        <location filename="../processing/engine/geometry.py" line="221"/>
        <source>{first} and {second} ({area:.4g} {unit})</source>
        <translation>{first} y {second} ({area:.4g} {unit})</translation>
    </message>
    <message>
        <location filename="../processing/engine/halton.py" line="210"/>
        <source>No point of an area of {area:.3g} m² could be drawn: it is too thin to hold a sample unit. Check the frame for slivers.</source>
        <translation>No se pudo sortear ningún punto en un área de {area:.3g} m²: es demasiado delgada para contener una unidad de muestreo. Busque astillas en el marco.</translation>
    </message>
    <message>
        <location filename="../processing/engine/layout.py" line="206"/>
        <source>DESIGN must be 0 (simple random), 1 (systematic grid) or 2 (spatially balanced).</source>
        <translation>DESIGN debe ser 0 (aleatorio simple), 1 (cuadrícula sistemática) o 2 (espacialmente equilibrado).</translation>
    </message>
    <message>
        <location filename="../processing/engine/layout.py" line="86"/>
        <source>SIZE must be more than 0 m for a point unit; it is {size}.</source>
        <translation>SIZE debe ser mayor que 0 m para una unidad puntual; es {size}.</translation>
    </message>
    <message>
        <location filename="../processing/engine/layout.py" line="87"/>
        <source>SIZE must be more than 0 m for a square unit; it is {size}.</source>
        <translation>SIZE debe ser mayor que 0 m para una unidad cuadrada; es {size}.</translation>
    </message>
    <message>
        <location filename="../processing/engine/layout.py" line="88"/>
        <source>SIZE must be more than 0 m for a circle unit; it is {size}.</source>
        <translation>SIZE debe ser mayor que 0 m para una unidad circular; es {size}.</translation>
    </message>
    <message>
        <location filename="../processing/engine/layout.py" line="89"/>
        <source>SIZE must be more than 0 m for a line unit; it is {size}.</source>
        <translation>SIZE debe ser mayor que 0 m para una unidad lineal; es {size}.</translation>
    </message>
    <message>
        <location filename="../processing/engine/layout.py" line="214"/>
        <source>BEARING must be -1 (random) or between 0 and 360 degrees; it is {bearing}.</source>
        <translation>BEARING debe ser -1 (aleatorio) o estar entre 0 y 360 grados; es {bearing}.</translation>
    </message>
    <message>
        <location filename="../processing/engine/layout.py" line="218"/>
        <source>MIN_SPACING must be 0 or more metres.</source>
        <translation>MIN_SPACING debe ser 0 metros o más.</translation>
    </message>
    <message>
        <location filename="../processing/engine/layout.py" line="220"/>
        <source>RESERVE must be 0 or a positive whole number.</source>
        <translation>RESERVE debe ser 0 o un número entero positivo.</translation>
    </message>
    <message>
        <location filename="../processing/engine/layout.py" line="410"/>
        <source>{field} is empty (NULL) or not a number for feature(s) {ids}. Give every stratum a whole number of units, or leave N_FIELD unset to use N_UNITS.</source>
        <translation>{field} está vacío (NULL) o no es un número para las entidades {ids}. Dé a cada estrato un número entero de unidades, o deje N_FIELD sin definir para usar N_UNITS.</translation>
    </message>
    <message>
        <location filename="../processing/engine/layout.py" line="417"/>
        <source>{field} is negative for feature(s) {ids}. Use 0 or a positive whole number.</source>
        <translation>{field} es negativo para las entidades {ids}. Use 0 o un número entero positivo.</translation>
    </message>
    <message>
        <location filename="../processing/engine/layout.py" line="424"/>
        <source>{field} is not a whole number for feature(s) {ids}. Round the allocation to whole units first.</source>
        <translation>{field} no es un número entero para las entidades {ids}. Redondee primero la asignación a unidades enteras.</translation>
    </message>
    <message>
        <location filename="../processing/engine/layout.py" line="476"/>
        <source>Give N_FIELD (units per stratum) or N_UNITS (a total of at least 1).</source>
        <translation>Indique N_FIELD (unidades por estrato) o N_UNITS (un total de al menos 1).</translation>
    </message>
    <message>
        <location filename="../processing/engine/layout.py" line="524"/>
        <source>Invalid geometry was repaired for feature(s) {ids}; check their outlines.</source>
        <translation>Se reparó una geometría no válida en las entidades {ids}; compruebe sus contornos.</translation>
    </message>
    <message>
        <location filename="../processing/engine/layout.py" line="528"/>
        <source>Empty or zero-area feature(s) {ids} were skipped.</source>
        <translation>Se omitieron las entidades vacías o de área nula {ids}.</translation>
    </message>
    <message>
        <location filename="../processing/engine/layout.py" line="531"/>
        <source>Feature(s) {ids} have less than {area:g} m² of area (slivers, e.g. left over by an overlay or a reprojection) and were skipped.</source>
        <translation>Las entidades {ids} tienen menos de {area:g} m² de área (astillas, dejadas por ejemplo por una superposición o una reproyección) y se han omitido.</translation>
    </message>
    <message>
        <location filename="../processing/engine/layout.py" line="536"/>
        <source>The frame has no polygon of {area:g} m² or more: every feature is empty, has zero area or is a sliver.</source>
        <translation>El marco de muestreo no tiene ningún polígono de {area:g} m² o más: cada entidad está vacía, tiene área nula o es una astilla.</translation>
    </message>
    <message>
        <location filename="../processing/engine/layout.py" line="567"/>
        <source>{field} is empty (NULL) for feature {fid}. Give it a stratum value.</source>
        <translation>{field} está vacío (NULL) para la entidad {fid}. Dele un valor de estrato.</translation>
    </message>
    <message>
        <location filename="../processing/engine/layout.py" line="621"/>
        <source>The features of the frame (no stratum field) carry different {n_field} values ({values}) (features {ids}). {n_field} is the number of units of the whole stratum: give its features the same value or choose a stratum field so that each feature is a stratum.</source>
        <translation>Las entidades del marco de muestreo (sin campo de estrato) tienen valores de {n_field} distintos ({values}) (entidades {ids}). {n_field} es el número de unidades de todo el estrato: dé el mismo valor a sus entidades o elija un campo de estrato para que cada entidad sea un estrato.</translation>
    </message>
    <message>
        <location filename="../processing/engine/layout.py" line="621"/>
        <source>The features of stratum {key} carry different {n_field} values ({values}) (features {ids}). {n_field} is the number of units of the whole stratum: give its features the same value.</source>
        <translation>Las entidades del estrato {key} tienen valores de {n_field} distintos ({values}) (entidades {ids}). {n_field} es el número de unidades de todo el estrato: dé el mismo valor a sus entidades.</translation>
    </message>
    <message>
        <location filename="../processing/engine/layout.py" line="606"/>
        <source>N_UNITS = {n_units} is fewer than {minimum} per stratum for {n_strata} strata; every stratum gets {minimum} ({total} units).</source>
        <translation>N_UNITS = {n_units} es menos de {minimum} por estrato para {n_strata} estratos; cada estrato recibe {minimum} ({total} unidades).</translation>
    </message>
    <message>
        <location filename="../processing/engine/layout.py" line="92"/>
        <source>The frame is too small for a point unit of SIZE {size:g} m wholly inside it: no point lies {radius:.1f} m or more from its edge (features {ids}). Use a smaller SIZE, untick INSIDE, or merge the stratum with a neighbour.</source>
        <translation>El marco de muestreo es demasiado pequeño para una unidad puntual de SIZE {size:g} m totalmente dentro: ningún punto está a {radius:.1f} m o más de su borde (entidades {ids}). Use un SIZE menor, desmarque INSIDE, o fusione el estrato con un vecino.</translation>
    </message>
    <message>
        <location filename="../processing/engine/layout.py" line="97"/>
        <source>The frame is too small for a square unit of SIZE {size:g} m wholly inside it: no point lies {radius:.1f} m or more from its edge (features {ids}). Use a smaller SIZE, untick INSIDE, or merge the stratum with a neighbour.</source>
        <translation>El marco de muestreo es demasiado pequeño para una unidad cuadrada de SIZE {size:g} m totalmente dentro: ningún punto está a {radius:.1f} m o más de su borde (entidades {ids}). Use un SIZE menor, desmarque INSIDE, o fusione el estrato con un vecino.</translation>
    </message>
    <message>
        <location filename="../processing/engine/layout.py" line="102"/>
        <source>The frame is too small for a circle unit of SIZE {size:g} m wholly inside it: no point lies {radius:.1f} m or more from its edge (features {ids}). Use a smaller SIZE, untick INSIDE, or merge the stratum with a neighbour.</source>
        <translation>El marco de muestreo es demasiado pequeño para una unidad circular de SIZE {size:g} m totalmente dentro: ningún punto está a {radius:.1f} m o más de su borde (entidades {ids}). Use un SIZE menor, desmarque INSIDE, o fusione el estrato con un vecino.</translation>
    </message>
    <message>
        <location filename="../processing/engine/layout.py" line="107"/>
        <source>The frame is too small for a line unit of SIZE {size:g} m wholly inside it: no point lies {radius:.1f} m or more from its edge (features {ids}). Use a smaller SIZE, untick INSIDE, or merge the stratum with a neighbour.</source>
        <translation>El marco de muestreo es demasiado pequeño para una unidad lineal de SIZE {size:g} m totalmente dentro: ningún punto está a {radius:.1f} m o más de su borde (entidades {ids}). Use un SIZE menor, desmarque INSIDE, o fusione el estrato con un vecino.</translation>
    </message>
    <message>
        <location filename="../processing/engine/layout.py" line="112"/>
        <source>Stratum {key} is too small for a point unit of SIZE {size:g} m wholly inside it: no point lies {radius:.1f} m or more from its edge (features {ids}). Use a smaller SIZE, untick INSIDE, or merge the stratum with a neighbour.</source>
        <translation>El estrato {key} es demasiado pequeño para una unidad puntual de SIZE {size:g} m totalmente dentro: ningún punto está a {radius:.1f} m o más de su borde (entidades {ids}). Use un SIZE menor, desmarque INSIDE, o fusione el estrato con un vecino.</translation>
    </message>
    <message>
        <location filename="../processing/engine/layout.py" line="117"/>
        <source>Stratum {key} is too small for a square unit of SIZE {size:g} m wholly inside it: no point lies {radius:.1f} m or more from its edge (features {ids}). Use a smaller SIZE, untick INSIDE, or merge the stratum with a neighbour.</source>
        <translation>El estrato {key} es demasiado pequeño para una unidad cuadrada de SIZE {size:g} m totalmente dentro: ningún punto está a {radius:.1f} m o más de su borde (entidades {ids}). Use un SIZE menor, desmarque INSIDE, o fusione el estrato con un vecino.</translation>
    </message>
    <message>
        <location filename="../processing/engine/layout.py" line="122"/>
        <source>Stratum {key} is too small for a circle unit of SIZE {size:g} m wholly inside it: no point lies {radius:.1f} m or more from its edge (features {ids}). Use a smaller SIZE, untick INSIDE, or merge the stratum with a neighbour.</source>
        <translation>El estrato {key} es demasiado pequeño para una unidad circular de SIZE {size:g} m totalmente dentro: ningún punto está a {radius:.1f} m o más de su borde (entidades {ids}). Use un SIZE menor, desmarque INSIDE, o fusione el estrato con un vecino.</translation>
    </message>
    <message>
        <location filename="../processing/engine/layout.py" line="127"/>
        <source>Stratum {key} is too small for a line unit of SIZE {size:g} m wholly inside it: no point lies {radius:.1f} m or more from its edge (features {ids}). Use a smaller SIZE, untick INSIDE, or merge the stratum with a neighbour.</source>
        <translation>El estrato {key} es demasiado pequeño para una unidad lineal de SIZE {size:g} m totalmente dentro: ningún punto está a {radius:.1f} m o más de su borde (entidades {ids}). Use un SIZE menor, desmarque INSIDE, o fusione el estrato con un vecino.</translation>
    </message>
    <message>
        <location filename="../processing/engine/layout.py" line="668"/>
        <source>Keeping units inside leaves {share:.0%} of the frame (the band within {radius:g} m of its edge) where no unit centre can fall; the estimate carries the inner part&apos;s density over that band. If density differs near edges, turn INSIDE off or use smaller units.</source>
        <translation>Mantener las unidades dentro deja {share:.0%} del marco de muestreo (la franja a menos de {radius:g} m de su borde) donde no puede caer ningún centro de unidad; la estimación extiende la densidad de la parte interior a esa franja. Si la densidad cambia cerca de los bordes, desactive INSIDE o use unidades más pequeñas.</translation>
    </message>
    <message>
        <location filename="../processing/engine/layout.py" line="668"/>
        <source>Keeping units inside leaves {share:.0%} of stratum {key} (the band within {radius:g} m of its edge) where no unit centre can fall; the estimate carries the inner part&apos;s density over that band. If density differs near edges, turn INSIDE off or use smaller units.</source>
        <translation>Mantener las unidades dentro deja {share:.0%} del estrato {key} (la franja a menos de {radius:g} m de su borde) donde no puede caer ningún centro de unidad; la estimación extiende la densidad de la parte interior a esa franja. Si la densidad cambia cerca de los bordes, desactive INSIDE o use unidades más pequeñas.</translation>
    </message>
    <message>
        <location filename="../processing/engine/layout.py" line="679"/>
        <source>The frame gets no units; the estimate cannot speak for it.</source>
        <translation>El marco de muestreo no recibe unidades; la estimación no puede representarlo.</translation>
    </message>
    <message>
        <location filename="../processing/engine/layout.py" line="679"/>
        <source>Stratum {key} gets no units; the estimate cannot speak for it.</source>
        <translation>El estrato {key} no recibe unidades; la estimación no puede representarlo.</translation>
    </message>
    <message>
        <location filename="../processing/engine/layout.py" line="684"/>
        <source>The frame gets one unit only; its variance cannot be estimated.</source>
        <translation>El marco de muestreo recibe una sola unidad; su varianza no puede estimarse.</translation>
    </message>
    <message>
        <location filename="../processing/engine/layout.py" line="684"/>
        <source>Stratum {key} gets one unit only; its variance cannot be estimated.</source>
        <translation>El estrato {key} recibe una sola unidad; su varianza no puede estimarse.</translation>
    </message>
    <message>
        <location filename="../processing/engine/layout.py" line="772"/>
        <source>Strata overlap ({pairs}): a location belongs to one stratum only, and units in a shared area would be drawn in both strata and weighted twice. Make the strata polygons disjoint (for example with the host&apos;s Difference or Union tools) and run again.</source>
        <translation>Hay estratos que se solapan ({pairs}): un lugar pertenece a un solo estrato, y las unidades de una zona común se sortearían en ambos estratos y se ponderarían dos veces. Haga disjuntos los polígonos de los estratos (por ejemplo con las herramientas Diferencia o Unión del anfitrión) y vuelva a ejecutar.</translation>
    </message>
    <message>
        <location filename="../processing/engine/layout.py" line="776"/>
        <source>Strata overlap slightly ({pairs}); units there belong to both. Make the strata polygons disjoint if this is more than digitising noise.</source>
        <translation>Hay estratos que se solapan ligeramente ({pairs}); las unidades allí pertenecen a ambos. Haga disjuntos los polígonos de los estratos si es más que ruido de digitalización.</translation>
    </message>
    <message>
        <location filename="../processing/engine/layout.py" line="862"/>
        <source>MIN_SPACING = {spacing:g} m cannot be met in the frame: {wanted} units were asked for (primaries and reserves), the draw placed {placed}, and at most about {fit} units fit at that spacing (a hexagonal lattice, the densest arrangement; random layouts fill up well before that). Ask for fewer units or reserves, or lower MIN_SPACING.</source>
        <translation>MIN_SPACING = {spacing:g} m no puede cumplirse en el marco de muestreo: se pidieron {wanted} unidades (principales y de reserva), el sorteo colocó {placed}, y caben como mucho unas {fit} unidades con esa separación (una red hexagonal, la disposición más densa; las disposiciones aleatorias se llenan mucho antes). Pida menos unidades o reservas, o baje MIN_SPACING.</translation>
    </message>
    <message>
        <location filename="../processing/engine/layout.py" line="862"/>
        <source>MIN_SPACING = {spacing:g} m cannot be met in stratum {key}: {wanted} units were asked for (primaries and reserves), the draw placed {placed}, and at most about {fit} units fit at that spacing (a hexagonal lattice, the densest arrangement; random layouts fill up well before that). Ask for fewer units or reserves, or lower MIN_SPACING.</source>
        <translation>MIN_SPACING = {spacing:g} m no puede cumplirse en el estrato {key}: se pidieron {wanted} unidades (principales y de reserva), el sorteo colocó {placed}, y caben como mucho unas {fit} unidades con esa separación (una red hexagonal, la disposición más densa; las disposiciones aleatorias se llenan mucho antes). Pida menos unidades o reservas, o baje MIN_SPACING.</translation>
    </message>
    <message>
        <location filename="../processing/engine/layout.py" line="964"/>
        <source>A systematic grid of spacing {spacing:.3g} m over an area of {area:,.1f} m² that spreads over {width:,.0f} m x {height:,.0f} m would need {count:,} candidate points. The area is a thin sliver or far too small for the number of units: check the frame for slivers, ask for fewer units, or use another design.</source>
        <translation>Una cuadrícula sistemática de espaciado {spacing:.3g} m sobre un área de {area:,.1f} m² extendida sobre {width:,.0f} m x {height:,.0f} m necesitaría {count:,} puntos candidatos. El área es una astilla o demasiado pequeña para el número de unidades: busque astillas en el marco, pida menos unidades o use otro diseño.</translation>
    </message>
    <message>
        <location filename="../processing/engine/layout.py" line="1010"/>
        <source>The grid spacing for {n} units in the frame would be {spacing:.1f} m, below MIN_SPACING = {min_spacing:g} m. A square grid at {min_spacing:g} m holds about {fit} units there: ask for at most that many, or lower MIN_SPACING.</source>
        <translation>La separación de la cuadrícula para {n} unidades en el marco de muestreo sería de {spacing:.1f} m, por debajo de MIN_SPACING = {min_spacing:g} m. Una cuadrícula cuadrada a {min_spacing:g} m contiene allí unas {fit} unidades: pida como mucho esas, o baje MIN_SPACING.</translation>
    </message>
    <message>
        <location filename="../processing/engine/layout.py" line="1010"/>
        <source>The grid spacing for {n} units in stratum {key} would be {spacing:.1f} m, below MIN_SPACING = {min_spacing:g} m. A square grid at {min_spacing:g} m holds about {fit} units there: ask for at most that many, or lower MIN_SPACING.</source>
        <translation>La separación de la cuadrícula para {n} unidades en el estrato {key} sería de {spacing:.1f} m, por debajo de MIN_SPACING = {min_spacing:g} m. Una cuadrícula cuadrada a {min_spacing:g} m contiene allí unas {fit} unidades: pida como mucho esas, o baje MIN_SPACING.</translation>
    </message>
    <message>
        <location filename="../processing/engine/layout.py" line="1029"/>
        <source>{n} grid unit(s) of the frame were dropped: closer than MIN_SPACING to units of a neighbouring stratum.</source>
        <translation>Se quitaron {n} unidad(es) de cuadrícula del marco de muestreo: más cerca que MIN_SPACING de unidades de un estrato vecino.</translation>
    </message>
    <message>
        <location filename="../processing/engine/layout.py" line="1029"/>
        <source>{n} grid unit(s) of stratum {key} were dropped: closer than MIN_SPACING to units of a neighbouring stratum.</source>
        <translation>Se quitaron {n} unidad(es) de cuadrícula del estrato {key}: más cerca que MIN_SPACING de unidades de un estrato vecino.</translation>
    </message>
    <message>
        <location filename="../processing/engine/layout.py" line="1041"/>
        <source>No grid point fell in the frame (spacing {spacing:.1f} m); it gets no units. Use the simple random or spatially balanced design for small or thin strata.</source>
        <translation>Ningún punto de la cuadrícula cayó en el marco de muestreo (separación {spacing:.1f} m); no recibe unidades. Use el diseño aleatorio simple o espacialmente equilibrado para estratos pequeños o estrechos.</translation>
    </message>
    <message>
        <location filename="../processing/engine/layout.py" line="1041"/>
        <source>No grid point fell in stratum {key} (spacing {spacing:.1f} m); it gets no units. Use the simple random or spatially balanced design for small or thin strata.</source>
        <translation>Ningún punto de la cuadrícula cayó en el estrato {key} (separación {spacing:.1f} m); no recibe unidades. Use el diseño aleatorio simple o espacialmente equilibrado para estratos pequeños o estrechos.</translation>
    </message>
    <message>
        <location filename="../processing/engine/layout.py" line="1050"/>
        <source>The frame has only {n} of {r} reserve units.</source>
        <translation>El marco de muestreo tiene solo {n} de las {r} unidades de reserva.</translation>
    </message>
    <message>
        <location filename="../processing/engine/layout.py" line="1050"/>
        <source>Stratum {key} has only {n} of {r} reserve units.</source>
        <translation>El estrato {key} tiene solo {n} de las {r} unidades de reserva.</translation>
    </message>
    <message>
        <location filename="../processing/engine/layout.py" line="147"/>
        <source>start of transect {unit} (primary, stratum {stratum}, bearing {bearing:.0f} deg)</source>
        <translation>inicio del transecto {unit} (principal, estrato {stratum}, rumbo {bearing:.0f} grados)</translation>
    </message>
    <message>
        <location filename="../processing/engine/layout.py" line="150"/>
        <source>start of transect {unit} (reserve, stratum {stratum}, bearing {bearing:.0f} deg)</source>
        <translation>inicio del transecto {unit} (de reserva, estrato {stratum}, rumbo {bearing:.0f} grados)</translation>
    </message>
    <message>
        <location filename="../processing/engine/layout.py" line="153"/>
        <source>end of transect {unit} (primary, stratum {stratum}, bearing {bearing:.0f} deg)</source>
        <translation>fin del transecto {unit} (principal, estrato {stratum}, rumbo {bearing:.0f} grados)</translation>
    </message>
    <message>
        <location filename="../processing/engine/layout.py" line="156"/>
        <source>end of transect {unit} (reserve, stratum {stratum}, bearing {bearing:.0f} deg)</source>
        <translation>fin del transecto {unit} (de reserva, estrato {stratum}, rumbo {bearing:.0f} grados)</translation>
    </message>
    <message>
        <location filename="../processing/engine/layout.py" line="139"/>
        <source>point unit {unit} (primary, stratum {stratum})</source>
        <translation>unidad puntual {unit} (principal, estrato {stratum})</translation>
    </message>
    <message>
        <location filename="../processing/engine/layout.py" line="140"/>
        <source>point unit {unit} (reserve, stratum {stratum})</source>
        <translation>unidad puntual {unit} (de reserva, estrato {stratum})</translation>
    </message>
    <message>
        <location filename="../processing/engine/layout.py" line="141"/>
        <source>square unit {unit} (primary, stratum {stratum})</source>
        <translation>unidad cuadrada {unit} (principal, estrato {stratum})</translation>
    </message>
    <message>
        <location filename="../processing/engine/layout.py" line="142"/>
        <source>square unit {unit} (reserve, stratum {stratum})</source>
        <translation>unidad cuadrada {unit} (de reserva, estrato {stratum})</translation>
    </message>
    <message>
        <location filename="../processing/engine/layout.py" line="143"/>
        <source>circle unit {unit} (primary, stratum {stratum})</source>
        <translation>unidad circular {unit} (principal, estrato {stratum})</translation>
    </message>
    <message>
        <location filename="../processing/engine/layout.py" line="144"/>
        <source>circle unit {unit} (reserve, stratum {stratum})</source>
        <translation>unidad circular {unit} (de reserva, estrato {stratum})</translation>
    </message>
    <message>
        <location filename="../processing/engine/stratification.py" line="539"/>
        <source>No cell of the frame has a value in every covariate.</source>
        <translation>Ninguna celda del marco de muestreo tiene valor en todas las covariables.</translation>
    </message>
    <message>
        <location filename="../processing/engine/stratification.py" line="766"/>
        <source>The covariates take fewer distinct value combinations than strata asked for.</source>
        <translation>Las covariables toman menos combinaciones de valores distintas que estratos pedidos.</translation>
    </message>
    <message>
        <location filename="../processing/engine/stratification.py" line="1027"/>
        <source>The frame holds no raster cell.</source>
        <translation>El marco de muestreo no contiene ninguna celda ráster.</translation>
    </message>
    <message>
        <location filename="../processing/engine/stratification.py" line="1580"/>
        <source>Covariate &apos;{name}&apos; is constant ({value:g}) over the frame: it cannot define strata. Use another covariate, or check the frame and the raster.</source>
        <translation>La covariable «{name}» es constante ({value:g}) en el marco de muestreo: no puede definir estratos. Use otra covariable, o compruebe el marco y el ráster.</translation>
    </message>
    <message>
        <location filename="../processing/engine/stratification.py" line="1598"/>
        <source>Unknown METHOD {method!r}: use 0 (quantile) to 4 (raster classes).</source>
        <translation>METHOD desconocido {method!r}: use de 0 (cuantiles) a 4 (clases del ráster).</translation>
    </message>
    <message>
        <location filename="../processing/engine/stratification.py" line="1602"/>
        <source>Ask for at least 2 strata (STRATA).</source>
        <translation>Pida al menos 2 estratos (STRATA).</translation>
    </message>
    <message>
        <location filename="../processing/engine/stratification.py" line="1609"/>
        <source>No cell of the frame has a value in every covariate ({names}). Check that the rasters cover the frame and that their NoData value is right.</source>
        <translation>Ninguna celda del marco de muestreo tiene valor en todas las covariables ({names}). Compruebe que los rásteres cubren el marco y que su valor NoData es correcto.</translation>
    </message>
    <message>
        <location filename="../processing/engine/stratification.py" line="1662"/>
        <source>Covariate &apos;{name}&apos; takes only {n_distinct} distinct values over the frame, fewer than the {k} strata asked for. Lower STRATA to {n_distinct} or fewer.</source>
        <translation>La covariable «{name}» toma solo {n_distinct} valores distintos en el marco de muestreo, menos que los {k} estratos pedidos. Baje STRATA a {n_distinct} o menos.</translation>
    </message>
    <message>
        <location filename="../processing/engine/stratification.py" line="1677"/>
        <source>Some boundaries coincide (many cells share the same value of &apos;{name}&apos;); {formed} strata are formed instead of {k}.</source>
        <translation>Algunos límites coinciden (muchas celdas comparten el mismo valor de «{name}»); se forman {formed} estratos en lugar de {k}.</translation>
    </message>
    <message>
        <location filename="../processing/engine/stratification.py" line="1693"/>
        <source>The covariates take only {n_distinct} distinct value combinations over the frame, fewer than the {k} strata asked for. Lower STRATA to {n_distinct} or fewer.</source>
        <translation>Las covariables toman solo {n_distinct} combinaciones de valores distintas en el marco de muestreo, menos que los {k} estratos pedidos. Baje STRATA a {n_distinct} o menos.</translation>
    </message>
    <message>
        <location filename="../processing/engine/stratification.py" line="1698"/>
        <source>The covariates take only {n_distinct} distinct value combinations in a sample of {sample_n} cells, fewer than the {k} strata asked for. Lower STRATA to {n_distinct} or fewer.</source>
        <translation>Las covariables toman solo {n_distinct} combinaciones de valores distintas en una muestra de {sample_n} celdas, menos que los {k} estratos pedidos. Baje STRATA a {n_distinct} o menos.</translation>
    </message>
    <message>
        <location filename="../processing/engine/stratification.py" line="1712"/>
        <source>Covariate &apos;{name}&apos; has more than {max_classes} classes (at least {n_distinct} distinct values over the frame): reclassify it into {max_classes} classes or fewer first (for example with the host&apos;s reclassify by table tool), or choose another METHOD.</source>
        <translation>La covariable «{name}» tiene más de {max_classes} clases (al menos {n_distinct} valores distintos en el marco de muestreo): reclasifíquela primero en {max_classes} clases o menos (por ejemplo con la herramienta de reclasificación por tabla del anfitrión), o elija otro METHOD.</translation>
    </message>
    <message>
        <location filename="../processing/engine/stratification.py" line="1769"/>
        <source>{dropped} of the {k} strata hold no cell and were dropped.</source>
        <translation>{dropped} de los {k} estratos no contienen ninguna celda y se quitaron.</translation>
    </message>
    <message>
        <location filename="../processing/engine/stratification.py" line="1888"/>
        <source>{name} class {value}</source>
        <translation>{name}: clase {value}</translation>
    </message>
    <message>
        <location filename="../processing/engine/stratification.py" line="1891"/>
        <source>mean {values}</source>
        <translation>media {values}</translation>
    </message>
    <message>
        <location filename="../processing/gdal_io/covariate_stack.py" line="50"/>
        <source>Covariate &apos;{name}&apos; cannot be read ({error}). Check the file.</source>
        <translation>La covariable «{name}» no puede leerse ({error}). Compruebe el archivo.</translation>
    </message>
    <message>
        <location filename="../processing/gdal_io/covariate_stack.py" line="54"/>
        <source>Covariate &apos;{name}&apos; has no band {band}.</source>
        <translation>La covariable «{name}» no tiene banda {band}.</translation>
    </message>
    <message>
        <location filename="../processing/gdal_io/covariate_stack.py" line="134"/>
        <source>Give at least one raster in COVARIATES.</source>
        <translation>Indique al menos un ráster en COVARIATES.</translation>
    </message>
    <message>
        <location filename="../processing/gdal_io/covariate_stack.py" line="166"/>
        <source>The frame has no polygon.</source>
        <translation>El marco de muestreo no tiene ningún polígono.</translation>
    </message>
    <message>
        <location filename="../processing/gdal_io/covariate_stack.py" line="211"/>
        <source>The frame does not overlap covariate &apos;{name}&apos; ({path}). Use a raster that covers the frame, or check both layers&apos; CRS.</source>
        <translation>El marco de muestreo no se superpone a la covariable «{name}» ({path}). Use un ráster que cubra el marco, o compruebe el SRC de ambas capas.</translation>
    </message>
    <message>
        <location filename="../processing/gdal_io/stratum_raster.py" line="21"/>
        <source>Cannot write the stratum raster &apos;{path}&apos;.</source>
        <translation>No se puede escribir el ráster de estratos «{path}».</translation>
    </message>
    <message>
        <location filename="../processing/gdal_io/stratify_pipeline.py" line="130"/>
        <source>With MIN_AREA {min_area:g} ha, merging the patches below it left a single stratum, so there is nothing to stratify. Lower MIN_AREA.</source>
        <translation>Con MIN_AREA = {min_area:g} ha, la fusión de las manchas más pequeñas dejó un solo estrato: no queda nada que estratificar. Reduzca MIN_AREA.</translation>
    </message>
    <message>
        <location filename="../processing/gdal_io/stratify_pipeline.py" line="138"/>
        <source>{merged} strata consisted only of patches below MIN_AREA and were merged away.</source>
        <translation>{merged} estratos constaban solo de manchas por debajo de MIN_AREA y se fusionaron con sus vecinos.</translation>
    </message>
    <message>
        <location filename="../processing/gdal_io/stratify_pipeline.py" line="146"/>
        <source>Merging the patches below MIN_AREA moved cells between strata: the share of the variance of &apos;{name}&apos; that the strata explain fell from {before:.2f} to {after:.2f}. A smaller MIN_AREA keeps the strata closer to the covariates.</source>
        <translation>La fusión de las manchas por debajo de MIN_AREA pasó celdas de un estrato a otro: la parte de la varianza de «{name}» que explican los estratos bajó de {before:.2f} a {after:.2f}. Un MIN_AREA menor mantiene los estratos más cerca de las covariables.</translation>
    </message>
    <message>
        <location filename="../processing/gdal_io/stratify_pipeline.py" line="152"/>
        <source>{n} patch(es) covering {ha:,.2f} ha stay below MIN_AREA ({min_area:g} ha): they touch no other stratum (islands of the frame, or patches ringed by NoData). Remove such islands from the frame, fill the NoData in the covariates, or lower MIN_AREA.</source>
        <translation>{n} mancha(s) que cubren {ha:,.2f} ha quedan por debajo de MIN_AREA ({min_area:g} ha): no tocan ningún otro estrato (islas del marco de muestreo, o manchas rodeadas de NoData). Quite esas islas del marco de muestreo, rellene los NoData de las covariables, o reduzca MIN_AREA.</translation>
    </message>
    <message>
        <location filename="../processing/gdal_io/stratify_pipeline.py" line="180"/>
        <source>The covariates cover {percent:.1f}% of the frame: {outside_ha:,.2f} ha lie outside the rasters and {nodata_ha:,.2f} ha have NoData in at least one covariate; the strata speak for the covered part only.</source>
        <translation>Las covariables cubren el {percent:.1f}% del marco de muestreo: {outside_ha:,.2f} ha quedan fuera de los rásteres y {nodata_ha:,.2f} ha son NoData en al menos una covariable; los estratos valen solo para la parte cubierta.</translation>
    </message>
    <message>
        <location filename="../processing/gdal_io/surface.py" line="25"/>
        <source>The density surface &apos;{name}&apos; cannot be read by GDAL ({error}). Save it as a GeoTIFF first.</source>
        <translation>GDAL no puede leer la superficie de densidad «{name}» ({error}). Guárdela primero como GeoTIFF.</translation>
    </message>
    <message>
        <location filename="../processing/gdal_io/surface.py" line="37"/>
        <source>The density surface &apos;{name}&apos; does not overlap the sampling frame. Check that both cover the same area.</source>
        <translation>La superficie de densidad «{name}» no se superpone al marco de muestreo. Compruebe que ambos cubren la misma zona.</translation>
    </message>
    <message>
        <location filename="../processing/gdal_io/surface.py" line="46"/>
        <source>The density surface &apos;{name}&apos; could not be warped to {crs} ({error}).</source>
        <translation>No se pudo reproyectar la superficie de densidad «{name}» a {crs} ({error}).</translation>
    </message>
    <message>
        <location filename="../processing/gdal_io/masking.py" line="102"/>
        <source>The mask raster (MASK) &apos;{source}&apos; cannot be opened by GDAL.</source>
        <translation>GDAL no puede abrir el ráster de máscara (MASK) «{source}».</translation>
    </message>
    <message>
        <location filename="../processing/gdal_io/masking.py" line="130"/>
        <source>The mask raster (MASK) would need {rows} x {cols} cells over the study area; that is more than {max_cells:,}. Resample the raster to coarser cells first.</source>
        <translation>El ráster de máscara (MASK) necesitaría {rows} x {cols} celdas sobre el área de estudio, más de {max_cells:,}. Remuestree primero el ráster a celdas más gruesas.</translation>
    </message>
    <message>
        <location filename="../processing/gdal_io/masking.py" line="170"/>
        <source>The mask raster (MASK) cannot be reprojected to the computation CRS.</source>
        <translation>El ráster de máscara (MASK) no puede reproyectarse al SRC de cálculo.</translation>
    </message>
    <message>
        <location filename="../processing/gdal_io/masking.py" line="201"/>
        <source>GDAL could not turn the masked raster cells into polygons.</source>
        <translation>GDAL no pudo convertir las celdas enmascaradas del ráster en polígonos.</translation>
    </message>
    <message>
        <location filename="../processing/gdal_io/masking.py" line="242"/>
        <source>MASK_MIN ({mask_min:g}) is greater than MASK_MAX ({mask_max:g}); no cell could be kept. Swap the two values or leave one of them empty.</source>
        <translation>MASK_MIN ({mask_min:g}) es mayor que MASK_MAX ({mask_max:g}); no podría conservarse ninguna celda. Intercambie los dos valores o deje uno de ellos vacío.</translation>
    </message>
    <message>
        <location filename="../processing/gdal_io/masking.py" line="248"/>
        <source>The mask raster (MASK) has no band {band}; it has {count}.</source>
        <translation>El ráster de máscara (MASK) no tiene banda {band}; tiene {count}.</translation>
    </message>
    <message>
        <location filename="../processing/engine/demo_reserve.py" line="37"/>
        <source>an invented grazing antelope that lives in loose groups</source>
        <translation>un antílope herbívoro inventado que vive en grupos laxos</translation>
    </message>
    <message>
        <location filename="../processing/engine/unit_shapes.py" line="20"/>
        <source>point</source>
        <translation>punto</translation>
    </message>
    <message>
        <location filename="../processing/engine/unit_shapes.py" line="20"/>
        <source>square</source>
        <translation>cuadrado</translation>
    </message>
    <message>
        <location filename="../processing/engine/unit_shapes.py" line="20"/>
        <source>circle</source>
        <translation>círculo</translation>
    </message>
    <message>
        <location filename="../processing/engine/unit_shapes.py" line="20"/>
        <source>line</source>
        <translation>línea</translation>
    </message>
    <message>
        <location filename="../processing/engine/detections.py" line="52"/>
        <source>OCCASIONS must be a whole number of at least 1.</source>
        <translation>OCCASIONS debe ser un número entero de al menos 1.</translation>
    </message>
    <message>
        <location filename="../processing/engine/detections.py" line="55"/>
        <source>The detection probability at a group must be in (0, 1]; it is {p:g}.</source>
        <translation>La probabilidad de detección en la posición de un grupo debe estar en (0, 1]; es {p:g}.</translation>
    </message>
    <message>
        <location filename="../processing/engine/detections.py" line="58"/>
        <source>The detection scale SIGMA must be more than 0 m.</source>
        <translation>La escala de detección SIGMA debe ser mayor que 0 m.</translation>
    </message>
    <message>
        <location filename="../processing/engine/detections.py" line="61"/>
        <source>The share of occasions not surveyed must be at least 0 and below 1.</source>
        <translation>La proporción de ocasiones no muestreadas debe ser al menos 0 y menor que 1.</translation>
    </message>
    <message>
        <location filename="../processing/engine/detections.py" line="65"/>
        <source>The animal layer holds no animal: there is nothing to detect.</source>
        <translation>La capa de animales no contiene ningún animal: no hay nada que detectar.</translation>
    </message>
    <message>
        <location filename="../processing/engine/occupancy.py" line="159"/>
        <source>Layer {layer}: occupancy needs at least 2 occasions (history fields); {n} given. With one visit per site, detection and occupancy cannot be told apart.</source>
        <translation>Capa {layer}: la ocupación necesita al menos 2 ocasiones (campos del historial); {n} indicada(s). Con una sola visita por sitio, la detección y la ocupación no pueden distinguirse.</translation>
    </message>
    <message>
        <location filename="../processing/engine/occupancy.py" line="169"/>
        <source>Layer {layer}, history field {field}: sites {ids} hold a value other than 1 (detected), 0 (not detected) or NULL (not surveyed). Correct these values and run again.</source>
        <translation>Capa {layer}, campo del historial {field}: los sitios {ids} contienen un valor distinto de 1 (detectada), 0 (no detectada) o NULL (no muestreado). Corrija estos valores y vuelva a ejecutar.</translation>
    </message>
    <message>
        <location filename="../processing/engine/occupancy.py" line="177"/>
        <source>Layer {layer}: no site was surveyed on any occasion (every history value is NULL).</source>
        <translation>Capa {layer}: ningún sitio se muestreó en ninguna ocasión (todos los valores del historial son NULL).</translation>
    </message>
    <message>
        <location filename="../processing/engine/occupancy.py" line="181"/>
        <source>Layer {layer}: the species was not detected at any site, so occupancy and detection cannot be estimated (every history is 0).</source>
        <translation>Capa {layer}: la especie no se detectó en ningún sitio, así que la ocupación y la detección no pueden estimarse (todos los historiales son 0).</translation>
    </message>
    <message>
        <location filename="../processing/engine/occupancy.py" line="190"/>
        <source>Layer {layer}: {n} sites have an empty (NULL) site id. Give every site an id, or leave SITE_ID_FIELD empty to use the feature ids.</source>
        <translation>Capa {layer}: {n} sitios tienen un identificador de sitio vacío (NULL). Dé un identificador a cada sitio, o deje SITE_ID_FIELD vacío para usar los identificadores de entidad.</translation>
    </message>
    <message>
        <location filename="../processing/engine/occupancy.py" line="200"/>
        <source>Layer {layer}: site ids {ids} occur more than once. Each site needs one row holding all its occasions; merge the rows or correct the ids.</source>
        <translation>Capa {layer}: los identificadores de sitio {ids} aparecen más de una vez. Cada sitio necesita una sola fila con todas sus ocasiones; combine las filas o corrija los identificadores.</translation>
    </message>
    <message>
        <location filename="../processing/engine/occupancy.py" line="228"/>
        <source>Model line {line!r}: write the occupancy terms after psi: and the detection terms after p:, for example psi: elevation p: effort.</source>
        <translation>Línea de modelo {line!r}: escriba los términos de ocupación después de psi: y los de detección después de p:, por ejemplo psi: elevation p: effort.</translation>
    </message>
    <message>
        <location filename="../processing/engine/occupancy.py" line="247"/>
        <source>Model line {line!r}: effort varies by occasion and acts on detection only; move it after p:.</source>
        <translation>Línea de modelo {line!r}: effort varía según la ocasión y solo actúa sobre la detección; colóquelo después de p:.</translation>
    </message>
    <message>
        <location filename="../processing/engine/occupancy.py" line="254"/>
        <source>Model line {line!r}: {name} is not a numeric field of the sites layer (give EFFORT_FIELDS to use effort). Use the field names as they are in the layer.</source>
        <translation>Línea de modelo {line!r}: {name} no es un campo numérico de la capa de sitios (indique EFFORT_FIELDS para usar effort). Use los nombres de los campos tal como están en la capa.</translation>
    </message>
    <message>
        <location filename="../processing/engine/occupancy.py" line="254"/>
        <source>Model line {line!r}: {name} is not a numeric field of the sites layer. Use the field names as they are in the layer.</source>
        <translation>Línea de modelo {line!r}: {name} no es un campo numérico de la capa de sitios. Use los nombres de los campos tal como están en la capa.</translation>
    </message>
    <message>
        <location filename="../processing/engine/occupancy.py" line="290"/>
        <source>CONFIDENCE must be at least 0.5 and below 1; it is {value}.</source>
        <translation>CONFIDENCE debe ser al menos 0.5 y menor que 1; es {value}.</translation>
    </message>
    <message>
        <location filename="../processing/engine/occupancy.py" line="293"/>
        <source>TARGET_SE must be 0 (no advice) or more; it is {value}.</source>
        <translation>TARGET_SE debe ser 0 (sin recomendaciones) o más; es {value}.</translation>
    </message>
    <message>
        <location filename="../processing/engine/occupancy.py" line="296"/>
        <source>The number of goodness-of-fit replicates must be 0 or a positive whole number.</source>
        <translation>El número de réplicas de la prueba de bondad de ajuste debe ser 0 o un número entero positivo.</translation>
    </message>
    <message>
        <location filename="../processing/engine/occupancy.py" line="309"/>
        <source>A model uses effort but no EFFORT_FIELDS were given.</source>
        <translation>Un modelo usa effort pero no se indicó ningún EFFORT_FIELDS.</translation>
    </message>
    <message>
        <location filename="../processing/engine/occupancy.py" line="326"/>
        <source>Layer {layer} has no covariate field {field}.</source>
        <translation>La capa {layer} no tiene el campo de covariable {field}.</translation>
    </message>
    <message>
        <location filename="../processing/engine/occupancy.py" line="332"/>
        <source>Layer {layer}, covariate field {field}: surveyed sites {ids} have no number (NULL or text). Fill in the values, leave these sites out, or drop the covariate.</source>
        <translation>Capa {layer}, campo de covariable {field}: los sitios muestreados {ids} no tienen un número (NULL o texto). Rellene los valores, deje fuera esos sitios o quite la covariable.</translation>
    </message>
    <message>
        <location filename="../processing/engine/occupancy.py" line="338"/>
        <source>Layer {layer}, covariate field {field}: every surveyed site has the same value ({value:g}), so its effect cannot be estimated. Drop it from the model.</source>
        <translation>Capa {layer}, campo de covariable {field}: todos los sitios muestreados tienen el mismo valor ({value:g}), así que su efecto no puede estimarse. Quítela del modelo.</translation>
    </message>
    <message>
        <location filename="../processing/engine/occupancy.py" line="347"/>
        <source>Give one effort field per history field, in the same order: {k} history fields and {e} effort fields.</source>
        <translation>Indique un campo de esfuerzo por campo del historial, en el mismo orden: {k} campos del historial y {e} campos de esfuerzo.</translation>
    </message>
    <message>
        <location filename="../processing/engine/occupancy.py" line="362"/>
        <source>Layer {layer}, effort fields {fields}: surveyed sites {ids} have no effort, or a negative one, on an occasion they were surveyed. Give every survey its effort.</source>
        <translation>Capa {layer}, campos de esfuerzo {fields}: los sitios muestreados {ids} no tienen esfuerzo, o lo tienen negativo, en una ocasión en la que se muestrearon. Dé a cada visita su esfuerzo.</translation>
    </message>
    <message>
        <location filename="../processing/engine/occupancy.py" line="368"/>
        <source>Layer {layer}: the effort is the same on every survey, so its effect cannot be estimated. Leave EFFORT_FIELDS empty.</source>
        <translation>Capa {layer}: el esfuerzo es el mismo en todas las visitas, así que su efecto no puede estimarse. Deje EFFORT_FIELDS vacío.</translation>
    </message>
    <message>
        <location filename="../processing/engine/occupancy.py" line="733"/>
        <source>The search for the maximum stopped after {n} iterations without converging.</source>
        <translation>La búsqueda del máximo se detuvo tras {n} iteraciones sin converger.</translation>
    </message>
    <message>
        <location filename="../processing/engine/occupancy.py" line="745"/>
        <source>The observed information is not positive definite at the maximum: the parameters cannot all be estimated from these data (collinear covariates, or too few detections).</source>
        <translation>La información observada no es definida positiva en el máximo: no todos los parámetros pueden estimarse con estos datos (covariables colineales o muy pocas detecciones).</translation>
    </message>
    <message>
        <location filename="../processing/engine/occupancy.py" line="1031"/>
        <source>The occupancy model ({model}) could not be fitted: {why} No estimate is given. Try fewer covariates, more sites or more occasions.</source>
        <translation>No se pudo ajustar el modelo de ocupación ({model}): {why} No se da ninguna estimación. Pruebe con menos covariables, más sitios o más ocasiones.</translation>
    </message>
    <message>
        <location filename="../processing/engine/occupancy.py" line="1036"/>
        <source>The model {model} could not be fitted and is left out of the comparison: {why}</source>
        <translation>No se pudo ajustar el modelo {model} y queda fuera de la comparación: {why}</translation>
    </message>
    <message>
        <location filename="../processing/engine/occupancy.py" line="1040"/>
        <source>Sites {ids} have no surveyed occasion (every history value NULL) and were left out of the analysis.</source>
        <translation>Los sitios {ids} no tienen ninguna ocasión muestreada (todos los valores del historial NULL) y se dejaron fuera del análisis.</translation>
    </message>
    <message>
        <location filename="../processing/engine/occupancy.py" line="1048"/>
        <source>The goodness-of-fit test was skipped: with {k} occasions there are too many possible detection histories to enumerate.</source>
        <translation>Se omitió la prueba de bondad de ajuste: con {k} ocasiones hay demasiados historiales de detección posibles para enumerarlos.</translation>
    </message>
    <message>
        <location filename="../processing/engine/occupancy.py" line="1052"/>
        <source>The goodness-of-fit test was skipped: the model has parameters at the boundary.</source>
        <translation>Se omitió la prueba de bondad de ajuste: el modelo tiene parámetros en el límite.</translation>
    </message>
    <message>
        <location filename="../processing/engine/occupancy.py" line="1066"/>
        <source>psi is at the boundary of its range (estimate {psi:.4f}): the data are consistent with every site being occupied. Its standard error and interval cannot be computed from the information; the other estimates are conditional on it.</source>
        <translation>psi está en el límite de su rango (estimación {psi:.4f}): los datos son compatibles con que todos los sitios estén ocupados. Su error estándar y su intervalo no pueden calcularse a partir de la información; las demás estimaciones están condicionadas a ese valor.</translation>
    </message>
    <message>
        <location filename="../processing/engine/occupancy.py" line="1066"/>
        <source>psi is at the boundary of its range (estimate {psi:.4f}): the data are consistent with no site being occupied. Its standard error and interval cannot be computed from the information; the other estimates are conditional on it.</source>
        <translation>psi está en el límite de su rango (estimación {psi:.4f}): los datos son compatibles con que ningún sitio esté ocupado. Su error estándar y su intervalo no pueden calcularse a partir de la información; las demás estimaciones están condicionadas a ese valor.</translation>
    </message>
    <message>
        <location filename="../processing/engine/occupancy.py" line="1076"/>
        <source>p is at the boundary of its range (estimate {p:.4f}): every survey of a site with a detection detected the species. Its standard error cannot be computed; psi is then the naive occupancy.</source>
        <translation>p está en el límite de su rango (estimación {p:.4f}): todas las visitas a un sitio con alguna detección detectaron la especie. Su error estándar no puede calcularse; psi es entonces la ocupación ingenua.</translation>
    </message>
    <message>
        <location filename="../processing/engine/occupancy.py" line="1081"/>
        <source>Parameter {name} is at the boundary (a logit beyond {limit:g}): a covariate separates the sites, or a probability is 0 or 1. Its standard error cannot be computed; simplify the model.</source>
        <translation>El parámetro {name} está en el límite (un logit más allá de {limit:g}): una covariable separa los sitios, o una probabilidad es 0 o 1. Su error estándar no puede calcularse; simplifique el modelo.</translation>
    </message>
    <message>
        <location filename="../processing/engine/occupancy.py" line="1091"/>
        <source>{n} bootstrap data sets could not be fitted and were left out of the goodness-of-fit test.</source>
        <translation>No se pudieron ajustar {n} conjuntos de datos bootstrap y se dejaron fuera de la prueba de bondad de ajuste.</translation>
    </message>
    <message>
        <location filename="../processing/engine/occupancy.py" line="1095"/>
        <source>The goodness-of-fit test rejects the model (p = {p:.3f}, c-hat = {c:.2f}): the histories vary more than the model allows. Standard errors may be too small; multiply their squares by c-hat, or add covariates.</source>
        <translation>La prueba de bondad de ajuste rechaza el modelo (p = {p:.3f}, c-hat = {c:.2f}): los historiales varían más de lo que el modelo permite. Los errores estándar pueden ser demasiado pequeños; multiplique sus cuadrados por c-hat, o añada covariables.</translation>
    </message>
    <message>
        <location filename="../processing/engine/stations.py" line="68"/>
        <source>station {station} (primary, stratum {stratum})</source>
        <translation>estación {station} (principal, estrato {stratum})</translation>
    </message>
    <message>
        <location filename="../processing/engine/stations.py" line="69"/>
        <source>station {station} (reserve, stratum {stratum})</source>
        <translation>estación {station} (de reserva, estrato {stratum})</translation>
    </message>
    <message>
        <location filename="../processing/engine/stations.py" line="70"/>
        <source>station {station} of cluster {cluster} (primary, stratum {stratum})</source>
        <translation>estación {station} del conglomerado {cluster} (principal, estrato {stratum})</translation>
    </message>
    <message>
        <location filename="../processing/engine/stations.py" line="72"/>
        <source>station {station} of cluster {cluster} (reserve, stratum {stratum})</source>
        <translation>estación {station} del conglomerado {cluster} (de reserva, estrato {stratum})</translation>
    </message>
    <message>
        <location filename="../processing/engine/stations.py" line="120"/>
        <source>ARRAY must be 0 (grid), 1 (clusters) or 2 (balanced).</source>
        <translation>ARRAY debe ser 0 (cuadrícula), 1 (conglomerados) o 2 (equilibrado).</translation>
    </message>
    <message>
        <location filename="../processing/engine/stations.py" line="123"/>
        <source>The spacing rule must be 0 (independent occupancy sites) or 1 (spatial capture-recapture).</source>
        <translation>La regla de separación debe ser 0 (sitios de ocupación independientes) o 1 (captura-recaptura espacial).</translation>
    </message>
    <message>
        <location filename="../processing/engine/stations.py" line="128"/>
        <source>{name} must be 0 or a positive whole number; it is {value}.</source>
        <translation>{name} debe ser 0 o un número entero positivo; es {value}.</translation>
    </message>
    <message>
        <location filename="../processing/engine/stations.py" line="132"/>
        <source>HOME_RANGE, SPACING and MIN_SPACING must be 0 or more.</source>
        <translation>HOME_RANGE, SPACING y MIN_SPACING deben ser 0 o más.</translation>
    </message>
    <message>
        <location filename="../processing/engine/stations.py" line="135"/>
        <source>Give the species' home range (HOME_RANGE, km²) or a station spacing (SPACING, m): the spacing is taken from one of them.</source>
        <translation>Indique el ámbito hogareño de la especie (HOME_RANGE, km²) o una separación entre estaciones (SPACING, m): la separación se obtiene de uno de los dos.</translation>
    </message>
    <message>
        <location filename="../processing/engine/stations.py" line="139"/>
        <source>N_STATIONS must be at least 1 for clusters and balanced stations (0 means &apos;fill the frame&apos; for the grid only).</source>
        <translation>N_STATIONS debe ser al menos 1 para los conglomerados y las estaciones equilibradas (0 significa «llenar el marco» solo para la cuadrícula).</translation>
    </message>
    <message>
        <location filename="../processing/engine/stations.py" line="143"/>
        <source>CLUSTER_SIZE must be at least 2 stations per cluster.</source>
        <translation>CLUSTER_SIZE debe ser al menos 2 estaciones por conglomerado.</translation>
    </message>
    <message>
        <location filename="../processing/engine/stations.py" line="147"/>
        <source>MIN_SPACING ({min_spacing:g} m) is larger than the station spacing ({spacing:.0f} m): stations of the array would break it. Lower MIN_SPACING or raise SPACING.</source>
        <translation>MIN_SPACING ({min_spacing:g} m) es mayor que la separación entre estaciones ({spacing:.0f} m): las estaciones del dispositivo no la cumplirían. Baje MIN_SPACING o aumente SPACING.</translation>
    </message>
    <message>
        <location filename="../processing/engine/stations.py" line="239"/>
        <source>N_STATIONS = {n} is fewer than {minimum} per stratum for {h} strata; every stratum gets {minimum} ({total} stations).</source>
        <translation>N_STATIONS = {n} es menos de {minimum} por estrato para {h} estratos; cada estrato recibe {minimum} ({total} estaciones).</translation>
    </message>
    <message>
        <location filename="../processing/engine/stations.py" line="271"/>
        <source>Only {fit} grid stations at {spacing:.0f} m fit in the frame; {n} were asked for. Ask for fewer stations (0 takes every grid point), or lower the spacing.</source>
        <translation>Solo caben {fit} estaciones de cuadrícula a {spacing:.0f} m en el marco; se pidieron {n}. Pida menos estaciones (0 toma todos los puntos de la cuadrícula) o reduzca la separación.</translation>
    </message>
    <message>
        <location filename="../processing/engine/stations.py" line="312"/>
        <source>A cluster of {k} stations {spacing:.0f} m apart (radius {radius:.0f} m) does not fit wholly in stratum {key}. Use smaller clusters, a smaller spacing, or the balanced array.</source>
        <translation>Un conglomerado de {k} estaciones separadas {spacing:.0f} m (radio {radius:.0f} m) no cabe por completo en el estrato {key}. Use conglomerados más pequeños, una separación menor o el dispositivo equilibrado.</translation>
    </message>
    <message>
        <location filename="../processing/engine/stations.py" line="312"/>
        <source>A cluster of {k} stations {spacing:.0f} m apart (radius {radius:.0f} m) does not fit wholly in the frame. Use smaller clusters, a smaller spacing, or the balanced array.</source>
        <translation>Un conglomerado de {k} estaciones separadas {spacing:.0f} m (radio {radius:.0f} m) no cabe por completo en el marco. Use conglomerados más pequeños, una separación menor o el dispositivo equilibrado.</translation>
    </message>
    <message>
        <location filename="../processing/engine/stations.py" line="331"/>
        <source>{wanted} stations (primaries and reserves) at least {distance:.0f} m apart do not fit in stratum {key}: at most about {fit} fit there (a hexagonal lattice; random layouts fill up well before that). Ask for fewer, or lower the spacing.</source>
        <translation>{wanted} estaciones (principales y de reserva) separadas al menos {distance:.0f} m no caben en el estrato {key}: caben como mucho unas {fit} (una red hexagonal; las disposiciones aleatorias se llenan mucho antes). Pida menos o reduzca la separación.</translation>
    </message>
    <message>
        <location filename="../processing/engine/stations.py" line="335"/>
        <source>{wanted} stations (primaries and reserves) at least {distance:.0f} m apart do not fit in the frame: at most about {fit} fit there (a hexagonal lattice; random layouts fill up well before that). Ask for fewer, or lower the spacing.</source>
        <translation>{wanted} estaciones (principales y de reserva) separadas al menos {distance:.0f} m no caben en el marco: caben como mucho unas {fit} (una red hexagonal; las disposiciones aleatorias se llenan mucho antes). Pida menos o reduzca la separación.</translation>
    </message>
    <message>
        <location filename="../processing/engine/stations.py" line="339"/>
        <source>{wanted} clusters (primaries and reserves) with centres at least {distance:.0f} m apart do not fit in stratum {key}: at most about {fit} fit there (a hexagonal lattice; random layouts fill up well before that). Ask for fewer stations, smaller clusters, or a smaller spacing.</source>
        <translation>{wanted} conglomerados (principales y de reserva) con centros separados al menos {distance:.0f} m no caben en el estrato {key}: caben como mucho unos {fit} (una red hexagonal; las disposiciones aleatorias se llenan mucho antes). Pida menos estaciones, conglomerados más pequeños o una separación menor.</translation>
    </message>
    <message>
        <location filename="../processing/engine/stations.py" line="344"/>
        <source>{wanted} clusters (primaries and reserves) with centres at least {distance:.0f} m apart do not fit in the frame: at most about {fit} fit there (a hexagonal lattice; random layouts fill up well before that). Ask for fewer stations, smaller clusters, or a smaller spacing.</source>
        <translation>{wanted} conglomerados (principales y de reserva) con centros separados al menos {distance:.0f} m no caben en el marco: caben como mucho unos {fit} (una red hexagonal; las disposiciones aleatorias se llenan mucho antes). Pida menos estaciones, conglomerados más pequeños o una separación menor.</translation>
    </message>
    <message>
        <location filename="../processing/engine/stations.py" line="417"/>
        <source>The array's primary stations cover {n:.1f} home ranges (convex hull {area:.2f} km² against a home range of {hr:g} km²): an array smaller than about {few:g} home ranges cannot estimate density (spatial capture-recapture). Spread the stations wider.</source>
        <translation>Las estaciones principales del dispositivo cubren {n:.1f} ámbitos hogareños (envolvente convexa de {area:.2f} km² frente a un ámbito hogareño de {hr:g} km²): un dispositivo menor que unos {few:g} ámbitos hogareños no permite estimar la densidad (captura-recaptura espacial). Separe más las estaciones.</translation>
    </message>
    <message>
        <location filename="../processing/engine/stations.py" line="443"/>
        <source>The frame gets no station.</source>
        <translation>El marco no recibe ninguna estación.</translation>
    </message>
    <message>
        <location filename="../processing/engine/stations.py" line="443"/>
        <source>Stratum {key} gets no station.</source>
        <translation>El estrato {key} no recibe ninguna estación.</translation>
    </message>
    <message>
        <location filename="../processing/engine/stations.py" line="448"/>
        <source>No station could be placed in the frame at a spacing of {spacing:.0f} m. Lower the spacing or check the frame.</source>
        <translation>No se pudo colocar ninguna estación en el marco con una separación de {spacing:.0f} m. Reduzca la separación o compruebe el marco.</translation>
    </message>
    <message>
        <location filename="../processing/engine/stations.py" line="508"/>
        <source>The working day must be longer than 0 hours.</source>
        <translation>La jornada de trabajo debe durar más de 0 horas.</translation>
    </message>
    <message>
        <location filename="../processing/engine/design_comparison.py" line="90"/>
        <source>stratified Neyman (best case)</source>
        <translation>estratificado Neyman (mejor caso)</translation>
    </message>
    <message>
        <location filename="../processing/engine/design_comparison.py" line="90"/>
        <source>stratified Neyman (pilot)</source>
        <translation>estratificado Neyman (piloto)</translation>
    </message>
    <message>
        <location filename="../processing/engine/design_comparison.py" line="935"/>
        <source>The pilot needs at least 2 units per stratum.</source>
        <translation>El piloto necesita al menos 2 unidades por estrato.</translation>
    </message>
    <message>
        <location filename="../processing/engine/design_comparison.py" line="1445"/>
        <source>{design} at {n_units} units: relative bias {bias:+.1%}, beyond the simulation's noise (±{noise:.1%} with {replicates} simulated surveys; tested at the {level:.0%} level across {tests} design(s)). A likely cause: units kept inside never reach the edge of the frame or of their stratum, so the edge band weighs less in the estimate; where its density differs from the interior, the estimate is biased. Plus sampling (INSIDE off) removes this bias.</source>
        <translation>{design} con {n_units} unidades: sesgo relativo {bias:+.1%}, por encima del ruido de la simulación (±{noise:.1%} con {replicates} muestreos simulados; prueba al nivel del {level:.0%} sobre el conjunto de {tests} diseño(s)). Causa probable: las unidades mantenidas dentro nunca llegan al borde del marco de muestreo ni de su estrato, así que la franja del borde pesa menos en la estimación; donde su densidad difiere del interior, la estimación está sesgada. El muestreo «plus» (INSIDE desactivado) elimina este sesgo.</translation>
    </message>
    <message>
        <location filename="../processing/engine/design_comparison.py" line="1445"/>
        <source>{design} at {n_units} units: relative bias {bias:+.1%}, beyond the simulation's noise (±{noise:.1%} with {replicates} simulated surveys; tested at the {level:.0%} level across {tests} design(s)). Plus sampling is unbiased, so the likely cause is the ratio estimator with very few animals per unit, or a systematic grid whose realised number of units varies with the surface; more units reduce it.</source>
        <translation>{design} con {n_units} unidades: sesgo relativo {bias:+.1%}, por encima del ruido de la simulación (±{noise:.1%} con {replicates} muestreos simulados; prueba al nivel del {level:.0%} sobre el conjunto de {tests} diseño(s)). El muestreo «plus» es insesgado, así que la causa probable es el estimador de razón con muy pocos animales por unidad, o una cuadrícula sistemática cuyo número realizado de unidades varía con la superficie; más unidades lo reducen.</translation>
    </message>
    <message>
        <location filename="../processing/engine/distance_density.py" line="246"/>
        <source>The survey type must be &apos;line&apos; or &apos;point&apos; (got &apos;{survey}&apos;).</source>
        <translation>El tipo de muestreo debe ser 'line' o 'point' (se recibió '{survey}').</translation>
    </message>
    <message>
        <location filename="../processing/engine/detection_functions.py" line="116"/>
        <source>The truncation distance must be above 0 m (got {w:g} m).</source>
        <translation>La distancia de truncamiento debe ser mayor que 0 m (se recibió {w:g} m).</translation>
    </message>
    <message>
        <location filename="../processing/engine/detection_functions.py" line="121"/>
        <source>{count} distances are missing or not numbers. Fill them in or leave those detections out.</source>
        <translation>Faltan {count} distancias o no son números. Rellénelas o deje fuera esas detecciones.</translation>
    </message>
    <message>
        <location filename="../processing/engine/detection_functions.py" line="126"/>
        <source>{count} distances are negative. Distances are measured from the line or the point outwards and are 0 m or more; correct them.</source>
        <translation>{count} distancias son negativas. Las distancias se miden desde la línea o el punto hacia fuera y son de 0 m o más; corríjalas.</translation>
    </message>
    <message>
        <location filename="../processing/engine/detection_functions.py" line="132"/>
        <source>{count} distances lie beyond the truncation distance of {w:g} m. Leave them out first (right truncation) or raise the truncation distance.</source>
        <translation>{count} distancias quedan más allá de la distancia de truncamiento de {w:g} m. Déjelas fuera primero (truncamiento por la derecha) o aumente la distancia de truncamiento.</translation>
    </message>
    <message>
        <location filename="../processing/engine/detection_functions.py" line="138"/>
        <source>A detection function needs at least 2 distances (got {n}).</source>
        <translation>Una función de detección necesita al menos 2 distancias (se recibieron {n}).</translation>
    </message>
    <message>
        <location filename="../processing/engine/detection_functions.py" line="146"/>
        <source>The distance bands must start at 0 m, increase, and end at the truncation distance {w:g} m, with at least two bands (got {cutpoints}).</source>
        <translation>Los intervalos de distancia deben empezar en 0 m, crecer y terminar en la distancia de truncamiento {w:g} m, con al menos dos intervalos (se recibió {cutpoints}).</translation>
    </message>
    <message>
        <location filename="../processing/engine/detection_functions.py" line="745"/>
        <source>Without a truncation distance only the half-normal key alone can be fitted; give a truncation distance for {model}.</source>
        <translation>Sin distancia de truncamiento solo puede ajustarse la función clave seminormal sola; indique una distancia de truncamiento para {model}.</translation>
    </message>
    <message>
        <location filename="../processing/engine/detection_functions.py" line="752"/>
        <source>The model {model} has {q} parameters, more than the {free} the distances can support. Use fewer cosine terms or more distance bands.</source>
        <translation>El modelo {model} tiene {q} parámetros, más que los {free} que admiten las distancias. Use menos términos coseno o más intervalos de distancia.</translation>
    </message>
    <message>
        <location filename="../processing/engine/detection_functions.py" line="820"/>
        <source>Choose at least one key function among half-normal, hazard-rate and uniform.</source>
        <translation>Elija al menos una función clave entre seminormal, tasa de riesgo (hazard-rate) y uniforme.</translation>
    </message>
    <message>
        <location filename="../processing/engine/detection_functions.py" line="846"/>
        <source>No detection function could be fitted to these {n} distances. Check the distances and the truncation distance.</source>
        <translation>No se pudo ajustar ninguna función de detección a estas {n} distancias. Compruebe las distancias y la distancia de truncamiento.</translation>
    </message>
    <message>
        <location filename="../processing/engine/distance_density.py" line="111"/>
        <source>Layer &apos;{layer}&apos;: {n} units have no id in the field &apos;{field}&apos;. Give every unit its id.</source>
        <translation>Capa «{layer}»: {n} unidades no tienen identificador en el campo «{field}». Dé a cada unidad su identificador.</translation>
    </message>
    <message>
        <location filename="../processing/engine/distance_density.py" line="117"/>
        <source>Layer &apos;{layer}&apos;: the unit ids {ids} occur more than once in the field &apos;{field}&apos;. Each unit needs its own id.</source>
        <translation>Capa «{layer}»: los identificadores de unidad {ids} aparecen más de una vez en el campo «{field}». Cada unidad necesita su propio identificador.</translation>
    </message>
    <message>
        <location filename="../processing/engine/distance_density.py" line="127"/>
        <source>Layer &apos;{layer}&apos;: the transects {ids} have zero length. Delete them or draw their line.</source>
        <translation>Capa «{layer}»: los transectos {ids} tienen longitud cero. Elimínelos o dibuje su línea.</translation>
    </message>
    <message>
        <location filename="../processing/engine/distance_density.py" line="131"/>
        <source>Layer &apos;{layer}&apos;: the points {ids} have no visits. Give each surveyed point its number of visits (1 or more), or delete the points that were not surveyed.</source>
        <translation>Capa «{layer}»: los puntos {ids} no tienen visitas. Indique para cada punto muestreado su número de visitas (1 o más), o elimine los puntos que no se muestrearon.</translation>
    </message>
    <message>
        <location filename="../processing/engine/distance_density.py" line="140"/>
        <source>Layer &apos;{layer}&apos;: the units {ids} have no stratum, or a stratum that the strata layer does not have ({strata}). Give each unit the id of its stratum.</source>
        <translation>Capa «{layer}»: las unidades {ids} no tienen estrato, o tienen un estrato que la capa de estratos no tiene ({strata}). Dé a cada unidad el identificador de su estrato.</translation>
    </message>
    <message>
        <location filename="../processing/engine/distance_density.py" line="150"/>
        <source>The strata {strata} have no surveyed transect or point. Survey them, or leave them out of the strata layer (the estimate then speaks for the other strata only).</source>
        <translation>Los estratos {strata} no tienen ningún transecto ni punto muestreado. Muestréelos, o quítelos de la capa de estratos (la estimación solo se refiere entonces a los demás estratos).</translation>
    </message>
    <message>
        <location filename="../processing/engine/distance_density.py" line="157"/>
        <source>The strata {strata} have one transect or point each; the encounter rate&apos;s variance needs at least 2 per stratum. Merge each with a neighbouring stratum in the strata layer and the units&apos; stratum field.</source>
        <translation>Los estratos {strata} tienen un solo transecto o punto cada uno; la varianza de la tasa de encuentro necesita al menos 2 por estrato. Fusione cada uno con un estrato vecino en la capa de estratos y en el campo de estrato de las unidades.</translation>
    </message>
    <message>
        <location filename="../processing/engine/distance_density.py" line="178"/>
        <source>Layer &apos;{layer}&apos;: observations name units that the layer &apos;{units}&apos; does not have (field &apos;{field}&apos;): {ids}. Correct these unit ids, or add the units.</source>
        <translation>Capa «{layer}»: hay observaciones que nombran unidades que la capa «{units}» no tiene (campo «{field}»): {ids}. Corrija esos identificadores de unidad o añada las unidades.</translation>
    </message>
    <message>
        <location filename="../processing/engine/distance_density.py" line="187"/>
        <source>Layer &apos;{layer}&apos;: the observations {ids} have no distance in the field &apos;{field}&apos; (empty or not a number). Fill in the distances, or delete those observations.</source>
        <translation>Capa «{layer}»: las observaciones {ids} no tienen distancia en el campo «{field}» (vacío o no es un número). Rellene las distancias o elimine esas observaciones.</translation>
    </message>
    <message>
        <location filename="../processing/engine/distance_density.py" line="194"/>
        <source>Layer &apos;{layer}&apos;: the observations {ids} have a negative distance in the field &apos;{field}&apos;. Distances are measured from the line or the point outwards and are 0 m or more; correct them.</source>
        <translation>Capa «{layer}»: las observaciones {ids} tienen una distancia negativa en el campo «{field}». Las distancias se miden desde la línea o el punto hacia fuera y son de 0 m o más; corríjalas.</translation>
    </message>
    <message>
        <location filename="../processing/engine/distance_density.py" line="206"/>
        <source>Layer &apos;{layer}&apos;: the observations {ids} have no group size above 0 in the field &apos;{field}&apos;. Fill in the number of animals seen in each group (1 for a single animal), or choose no group-size field.</source>
        <translation>Capa «{layer}»: las observaciones {ids} no tienen un tamaño de grupo mayor que 0 en el campo «{field}». Rellene el número de animales vistos en cada grupo (1 para un animal solo) o no elija ningún campo de tamaño de grupo.</translation>
    </message>
    <message>
        <location filename="../processing/engine/distance_density.py" line="219"/>
        <source>The distance bands must start at 0 m and increase, with at least two bands (got {cutpoints}).</source>
        <translation>Los intervalos de distancia deben empezar en 0 m y crecer, con al menos dos intervalos (se recibió {cutpoints}).</translation>
    </message>
    <message>
        <location filename="../processing/engine/distance_density.py" line="227"/>
        <source>There are no observations: a detection function needs at least {minimum} detections.</source>
        <translation>No hay observaciones: una función de detección necesita al menos {minimum} detecciones.</translation>
    </message>
    <message>
        <location filename="../processing/engine/distance_density.py" line="256"/>
        <source>Only {n} detections lie within the truncation distance of {w:g} m; a detection function needs at least {minimum} (common practice: 60 to 80). Survey more transects or points, or raise the truncation distance.</source>
        <translation>Solo {n} detecciones quedan dentro de la distancia de truncamiento de {w:g} m; una función de detección necesita al menos {minimum} (práctica habitual: de 60 a 80). Muestree más transectos o puntos, o aumente la distancia de truncamiento.</translation>
    </message>
    <message>
        <location filename="../processing/engine/distance_density.py" line="264"/>
        <source>Only {n} detections lie within the truncation distance: the detection function rests on few distances (common practice asks for 60 to 80), so its shape and the density are uncertain, and AIC may choose a model by chance.</source>
        <translation>Solo {n} detecciones quedan dentro de la distancia de truncamiento: la función de detección se basa en pocas distancias (la práctica habitual pide de 60 a 80), así que su forma y la densidad son inciertas, y el AIC puede elegir un modelo por azar.</translation>
    </message>
    <message>
        <location filename="../processing/engine/distance_density.py" line="414"/>
        <source>A detection function per stratum needs at least {minimum} detections in each stratum within the truncation distance; these strata have fewer: {strata}. Use one detection function for all strata.</source>
        <translation>Una función de detección por estrato necesita al menos {minimum} detecciones en cada estrato dentro de la distancia de truncamiento; estos estratos tienen menos: {strata}. Use una sola función de detección para todos los estratos.</translation>
    </message>
    <message>
        <location filename="../processing/engine/distance_density.py" line="433"/>
        <source>Stratum {stratum}: its detection function rests on {n} detections (common practice asks for 60 to 80 per function); consider one function for all strata.</source>
        <translation>Estrato {stratum}: su función de detección se basa en {n} detecciones (la práctica habitual pide de 60 a 80 por función); considere una sola función para todos los estratos.</translation>
    </message>
    <message>
        <location filename="../processing/engine/distance_density.py" line="442"/>
        <source>The chosen detection function ({model}{at}) fits the distances poorly (goodness-of-fit p = {p:.3f}). Look at the histogram for heaping at round distances or a spike at 0, and consider distance bands or another truncation.</source>
        <translation>La función de detección elegida ({model}{at}) se ajusta mal a las distancias (prueba de bondad de ajuste p = {p:.3f}). Busque en el histograma acumulaciones en distancias redondas o un pico en 0, y considere intervalos de distancia u otro truncamiento.</translation>
    </message>
    <message>
        <location filename="../processing/engine/distance_density.py" line="449"/>
        <source>The chosen detection function ({model}) has a parameter at the limit of its range, so its variance is unreliable; try another truncation or key.</source>
        <translation>La función de detección elegida ({model}) tiene un parámetro en el límite de su rango, así que su varianza no es fiable; pruebe otro truncamiento u otra función clave.</translation>
    </message>
    <message>
        <location filename="../processing/engine/distance_density.py" line="455"/>
        <source>The variance of the detection function ({model}) could not be computed (the likelihood is flat at its maximum); its CV is missing from the interval.</source>
        <translation>No se pudo calcular la varianza de la función de detección ({model}) (la verosimilitud es plana en su máximo); su CV falta en el intervalo.</translation>
    </message>
    <message>
        <location filename="../processing/engine/distance_density.py" line="660"/>
        <source>The bootstrap failed: {failed} of {n} resamples could not be fitted. Run without the bootstrap.</source>
        <translation>El bootstrap falló: no se pudieron ajustar {failed} de los {n} remuestreos. Ejecute sin el bootstrap.</translation>
    </message>
    <message>
        <location filename="../processing/engine/distance_density.py" line="748"/>
        <source>Unknown group-size method &apos;{method}&apos;.</source>
        <translation>Método de tamaño de grupo desconocido '{method}'.</translation>
    </message>
    <message>
        <location filename="../processing/engine/distance_density.py" line="753"/>
        <source>The confidence level must be between 0.5 and 1 (got {level:g}).</source>
        <translation>El nivel de confianza debe estar entre 0.5 y 1 (se recibió {level:g}).</translation>
    </message>
    <message>
        <location filename="../processing/engine/distance_density.py" line="770"/>
        <source>The bootstrap needs a random generator (a seed).</source>
        <translation>El bootstrap necesita un generador aleatorio (una semilla).</translation>
    </message>
    <message>
        <location filename="../processing/engine/distance_density.py" line="778"/>
        <source>{failed} of {n} bootstrap resamples could not be fitted and were left out; the bootstrap interval may be too narrow.</source>
        <translation>No se pudieron ajustar {failed} de los {n} remuestreos bootstrap y se dejaron fuera; el intervalo bootstrap puede ser demasiado estrecho.</translation>
    </message>
    <message>
        <location filename="../processing/engine/estimation.py" line="681"/>
        <source>The degrees of freedom of the detection estimate must be 0 (known p) or more.</source>
        <translation>Los grados de libertad de la estimación de la detección deben ser 0 (p conocida) o más.</translation>
    </message>
    <message>
        <location filename="../processing/engine/estimation.py" line="722"/>
        <source>Layer '{layer}': units {ids} have no surveyed area. Point units need the unit area field (area_m2 above 0) or a fixed unit area (m²); line units the area field, a strip width or a fixed unit area; polygons use their own area.</source>
        <translation>Capa «{layer}»: las unidades {ids} no tienen área muestreada. Las unidades de punto necesitan el campo de área de la unidad (area_m2 mayor que 0) o un área fija de la unidad (m²); las de línea, el campo de área, un ancho de franja o un área fija; los polígonos usan su propia área.</translation>
    </message>
    <message>
        <location filename="../processing/engine/estimation.py" line="805"/>
        <source>Every count is 0 or 1. If the field records presence/absence, run again with the presence option: the result is then the proportion of units occupied (naive occupancy).</source>
        <translation>Todos los conteos son 0 o 1. Si el campo registra presencia/ausencia, vuelva a ejecutar con la opción de presencia: el resultado es entonces la proporción de unidades ocupadas (ocupación ingenua).</translation>
    </message>
    <message>
        <location filename="../processing/engine/estimation.py" line="849"/>
        <source>The finite-population correction was not applied in strata {ids}: their units come from a design whose units may overlap ({records}: simple random centres, or a grid denser than the units). Their possible positions form a continuous population, which has no such correction (Cordy 1993); applying it would make the interval too narrow. A layout with MIN_SPACING of at least the unit&apos;s width, a systematic grid or a spatially balanced layout keeps the units apart.</source>
        <translation>La corrección por población finita no se aplicó en los estratos {ids}: sus unidades proceden de un diseño cuyas unidades pueden solaparse ({records}: centros aleatorios simples, o una cuadrícula más densa que las unidades). Sus posiciones posibles forman una población continua, que no tiene tal corrección (Cordy 1993); aplicarla haría el intervalo demasiado estrecho. Una disposición con MIN_SPACING de al menos el ancho de la unidad, una cuadrícula sistemática o una disposición espacialmente equilibrada mantiene separadas las unidades.</translation>
    </message>
    <message>
        <location filename="../processing/engine/estimation.py" line="868"/>
        <source>The expansion area of strata {ids} is smaller than the stratum: the plus region holds the stratum. Check the units&apos; edge record.</source>
        <translation>El área de expansión de los estratos {ids} es menor que el estrato: la región «plus» contiene el estrato. Compruebe el registro del borde (edge) de las unidades.</translation>
    </message>
    <message>
        <location filename="../processing/engine/estimation.py" line="887"/>
        <source>In strata {ids} the units&apos; inclusion probabilities (incl_p) differ. This estimator assumes equal chances within a stratum; check the design the units came from.</source>
        <translation>En los estratos {ids} las probabilidades de inclusión de las unidades (incl_p) difieren. Este estimador supone probabilidades iguales dentro de un estrato; compruebe el diseño del que proceden las unidades.</translation>
    </message>
    <message>
        <location filename="../processing/engine/estimation.py" line="1048"/>
        <source>Strata {ids} have fewer than 3 units: their variance uses the simple random sampling formula.</source>
        <translation>Los estratos {ids} tienen menos de 3 unidades: su varianza usa la fórmula del muestreo aleatorio simple.</translation>
    </message>
    <message>
        <location filename="../processing/engine/estimation.py" line="1062"/>
        <source>{label} (one unit) with {other}</source>
        <translation>{label} (una unidad) con {other}</translation>
    </message>
    <message>
        <location filename="../processing/engine/estimation.py" line="1067"/>
        <source>Strata {groups}: a stratum with one surveyed unit takes its variance from the collapsed-strata pairs formula with its partner (Cochran 1977, §5A.12; Hansen, Hurwitz &amp; Madow weights for unequal sizes), which counts the difference between the two strata as variance and so tends to be too large; the partner keeps its own variance.</source>
        <translation>Estratos {groups}: un estrato con una sola unidad muestreada toma su varianza de la fórmula de pares de estratos agrupados con su pareja (Cochran 1977, §5A.12; pesos de Hansen, Hurwitz &amp; Madow para tamaños desiguales), que cuenta la diferencia entre los dos estratos como varianza y por eso tiende a ser demasiado grande; la pareja conserva su propia varianza.</translation>
    </message>
    <message>
        <location filename="../processing/engine/estimation.py" line="1227"/>
        <source>Even every possible unit in every stratum ({n:,}) would miss the target CV {target_cv:.3g}: n_next is every unit.</source>
        <translation>Incluso todas las unidades posibles de cada estrato ({n:,}) quedarían lejos del CV objetivo {target_cv:.3g}: n_next son todas las unidades.</translation>
    </message>
    <message>
        <location filename="../processing/engine/estimation.py" line="1432"/>
        <source>The standard error of the detection probability ({se:.3g}) is more than half of p ({p:.3g}): the detection study is too small to correct the counts reliably, and the delta method behind the interval is poor at such a CV. Enlarge the detection study.</source>
        <translation>El error estándar de la probabilidad de detección ({se:.3g}) supera la mitad de p ({p:.3g}): el estudio de detección es demasiado pequeño para corregir los conteos de forma fiable, y el método delta en que se basa el intervalo es pobre con ese CV. Amplíe el estudio de detección.</translation>
    </message>
    <message>
        <location filename="../processing/engine/estimation.py" line="1444"/>
        <source>No animal was counted in any surveyed unit: the estimate is 0, and the interval is the one-sided upper limit {hi:.4g} at {level:.0%} (exact Poisson limit for a count of 0, assuming one density over the frame).</source>
        <translation>No se contó ningún animal en las unidades muestreadas: la estimación es 0, y el intervalo es el límite superior unilateral {hi:.4g} al {level:.0%} (límite de Poisson exacto para un conteo de 0, suponiendo una sola densidad en el marco).</translation>
    </message>
    <message>
        <location filename="../processing/engine/estimation.py" line="1452"/>
        <source>In strata {ids} every surveyed unit counted 0: their interval is the one-sided upper limit of a count of 0 (exact Poisson limit), and their standard error of 0 understates the overall uncertainty (the species may be present but rare there).</source>
        <translation>En los estratos {ids} todas las unidades muestreadas contaron 0: su intervalo es el límite superior unilateral de un conteo de 0 (límite de Poisson exacto), y su error estándar de 0 subestima la incertidumbre global (la especie puede estar presente pero ser rara allí).</translation>
    </message>
    <message>
        <location filename="../processing/engine/estimation.py" line="1496"/>
        <source>In strata {ids} the units record different reaches (reach_m): the largest is used for the plus region.</source>
        <translation>En los estratos {ids} las unidades registran alcances distintos (reach_m): se usa el mayor para la región «plus».</translation>
    </message>
    <message>
        <location filename="../processing/engine/simulated_distances.py" line="91"/>
        <source>The detection function must be 1 (half-normal) or 2 (hazard-rate).</source>
        <translation>La función de detección debe ser 1 (seminormal) o 2 (tasa de riesgo, hazard-rate).</translation>
    </message>
    <message>
        <location filename="../processing/engine/simulated_distances.py" line="95"/>
        <source>The scale σ must be above 0 m and the hazard-rate shape above 0 (got σ = {sigma:g} m, shape {shape:g}).</source>
        <translation>La escala σ debe ser mayor que 0 m y la forma de la tasa de riesgo mayor que 0 (se recibió σ = {sigma:g} m, forma {shape:g}).</translation>
    </message>
    <message>
        <location filename="../processing/engine/simulated_distances.py" line="100"/>
        <source>The detection probability on the line must be in (0, 1] (got {g0:g}).</source>
        <translation>La probabilidad de detección sobre la línea debe estar en (0, 1] (se recibió {g0:g}).</translation>
    </message>
    <message>
        <location filename="../processing/engine/simulated_distances.py" line="109"/>
        <source>Units {ids} are neither points nor lines of some length; simulated distances need line transects or point stations.</source>
        <translation>Las unidades {ids} no son ni puntos ni líneas de cierta longitud; las distancias simuladas necesitan transectos lineales o estaciones puntuales.</translation>
    </message>
    <message>
        <location filename="../processing/engine/distance_density.py" line="441"/>
        <source>, stratum {stratum}</source>
        <translation>, estrato {stratum}</translation>
    </message>
    <message>
        <location filename="../processing/engine/panels.py" line="38"/>
        <source>every year</source>
        <translation>cada año</translation>
    </message>
    <message>
        <location filename="../processing/engine/panels.py" line="38"/>
        <source>rotating panels</source>
        <translation>paneles rotativos</translation>
    </message>
    <message>
        <location filename="../processing/engine/panels.py" line="38"/>
        <source>split panels</source>
        <translation>paneles divididos</translation>
    </message>
    <message>
        <location filename="../processing/engine/panels.py" line="105"/>
        <source>PANEL_DESIGN must be 0 (every year), 1 (rotating) or 2 (split); got {design}.</source>
        <translation>PANEL_DESIGN debe ser 0 (cada año), 1 (rotativos) o 2 (divididos); se recibió {design}.</translation>
    </message>
    <message>
        <location filename="../processing/engine/panels.py" line="110"/>
        <source>YEARS must be between 1 and {most}; got {years}.</source>
        <translation>YEARS debe estar entre 1 y {most}; se recibió {years}.</translation>
    </message>
    <message>
        <location filename="../processing/engine/panels.py" line="117"/>
        <source>Rotating and split designs need at least 2 rotating panels (PANELS = {panels}); with one panel every unit is visited every year: choose the every-year design.</source>
        <translation>Los diseños de paneles rotativos y divididos necesitan al menos 2 paneles rotativos (PANELS = {panels}); con un solo panel, cada unidad se visita cada año: elija el diseño «cada año».</translation>
    </message>
    <message>
        <location filename="../processing/engine/panels.py" line="123"/>
        <source>With {panels} panels over {years} years, panels {first} to {panels} would never be visited: use at most {years} panels or more years.</source>
        <translation>Con {panels} paneles en {years} años, los paneles {first} a {panels} nunca se visitarían: use como máximo {years} paneles o más años.</translation>
    </message>
    <message>
        <location filename="../processing/engine/panels.py" line="130"/>
        <source>CORE_SHARE must lie between 0 and 1 for split panels (the share of units visited every year); got {share:g}.</source>
        <translation>CORE_SHARE debe estar entre 0 y 1 para los paneles divididos (la proporción de unidades visitadas cada año); se recibió {share:g}.</translation>
    </message>
    <message>
        <location filename="../processing/engine/panels.py" line="231"/>
        <source>The units layer has no primary unit to assign to panels.</source>
        <translation>La capa de unidades no tiene ninguna unidad principal que asignar a paneles.</translation>
    </message>
    <message>
        <location filename="../processing/engine/panels.py" line="240"/>
        <source>Units {ids} have no draw order (draw_ord is empty). Panels follow the draw order of the layout: fill it or choose another draw-order field.</source>
        <translation>Las unidades {ids} no tienen orden de sorteo (draw_ord está vacío). Los paneles siguen el orden de sorteo de la disposición: rellénelo o elija otro campo de orden de sorteo.</translation>
    </message>
    <message>
        <location filename="../processing/engine/panels.py" line="252"/>
        <source>Units {ids} share their draw order with another primary unit of the same stratum. Each stratum&apos;s draw order must run 1, 2, 3, ... without repeats: use the layout&apos;s draw_ord field.</source>
        <translation>Las unidades {ids} comparten su orden de sorteo con otra unidad principal del mismo estrato. El orden de sorteo de cada estrato debe ir 1, 2, 3, ... sin repeticiones: use el campo draw_ord de la disposición.</translation>
    </message>
    <message>
        <location filename="../processing/engine/panels.py" line="297"/>
        <source>Stratum {key} has {n} primary units, too few for {k} panels: panels {empty} get none of its units in that stratum.</source>
        <translation>El estrato {key} tiene {n} unidades principales, demasiado pocas para {k} paneles: los paneles {empty} no reciben ninguna unidad en ese estrato.</translation>
    </message>
    <message>
        <location filename="../processing/engine/panels.py" line="306"/>
        <source>The units have no draw-order field: panels follow the order of the features in the layer. Panels are evenly spread only when that order is the draw order of a spatially balanced layout.</source>
        <translation>Las unidades no tienen campo de orden de sorteo: los paneles siguen el orden de las entidades en la capa. Los paneles solo quedan repartidos de modo uniforme si ese orden es el orden de sorteo de una disposición espacialmente equilibrada.</translation>
    </message>
    <message>
        <location filename="../processing/engine/panels.py" line="500"/>
        <source>The layout was simple random (its units&apos; design field says so): each panel is a random part of it, not an evenly spread sample of the frame. Use a spatially balanced layout for evenly spread panels.</source>
        <translation>La disposición era aleatoria simple (lo indica el campo design de sus unidades): cada panel es una parte aleatoria de ella, no una muestra repartida de modo uniforme por el marco. Use una disposición espacialmente equilibrada para obtener paneles repartidos de modo uniforme.</translation>
    </message>
    <message>
        <location filename="../processing/engine/panels.py" line="505"/>
        <source>The layout was a systematic grid (its units&apos; design field says so): its draw order runs row by row, so consecutive blocks of it are bands across the frame. Use a spatially balanced layout for evenly spread panels.</source>
        <translation>La disposición era una cuadrícula sistemática (lo indica el campo design de sus unidades): su orden de sorteo avanza fila por fila, de modo que sus bloques consecutivos son bandas que atraviesan el marco. Use una disposición espacialmente equilibrada para obtener paneles repartidos de modo uniforme.</translation>
    </message>
    <message>
        <location filename="../processing/engine/panels.py" line="511"/>
        <source>The panels are not more evenly spread than random parts of the layout (p = {p:.2f}). The layout was probably simple random or a systematic grid: each panel then covers the frame unevenly. Use a spatially balanced layout for evenly spread panels.</source>
        <translation>Los paneles no están repartidos de modo más uniforme que partes aleatorias de la disposición (p = {p:.2f}). La disposición probablemente era aleatoria simple o una cuadrícula sistemática: cada panel cubre entonces el marco de forma desigual. Use una disposición espacialmente equilibrada para obtener paneles repartidos de modo uniforme.</translation>
    </message>
    <message>
        <location filename="../processing/engine/trend.py" line="150"/>
        <source>Records {ids} have no unit id or no whole-number year. Fill both in, or remove the records.</source>
        <translation>Los registros {ids} no tienen identificador de unidad o no tienen un año en número entero. Rellene ambos o elimine los registros.</translation>
    </message>
    <message>
        <location filename="../processing/engine/trend.py" line="155"/>
        <source>Records {ids} have a negative or non-numeric count. Counts are 0 or more; leave the count empty (NULL) when the unit was not surveyed.</source>
        <translation>Los registros {ids} tienen un conteo negativo o no numérico. Los conteos son 0 o más; deje el conteo vacío (NULL) cuando la unidad no se muestreó.</translation>
    </message>
    <message>
        <location filename="../processing/engine/trend.py" line="160"/>
        <source>Records {ids} have no unit area (or one not above 0). Give every surveyed record its area, or leave the unit-area field empty.</source>
        <translation>Los registros {ids} no tienen área de la unidad (o tienen una que no es mayor que 0). Indique el área de cada registro muestreado, o deje vacío el campo de área de la unidad.</translation>
    </message>
    <message>
        <location filename="../processing/engine/trend.py" line="174"/>
        <source>A trend needs counts from at least {k} different years; the records hold {found}.</source>
        <translation>Una tendencia necesita conteos de al menos {k} años distintos; los registros contienen {found}.</translation>
    </message>
    <message>
        <location filename="../processing/engine/trend.py" line="188"/>
        <source>Units were counted twice in one year (unit, year and record ids): {items}. Keep one record per unit and year (add the counts of repeated visits first).</source>
        <translation>Hay unidades contadas dos veces en un mismo año (unidad, año e identificadores de registro): {items}. Conserve un registro por unidad y año (sume antes los conteos de las visitas repetidas).</translation>
    </message>
    <message>
        <location filename="../processing/engine/trend.py" line="208"/>
        <source>Units {ids} lie in more than one stratum across their records. A unit keeps its stratum over the years: correct the stratum field.</source>
        <translation>Las unidades {ids} figuran en más de un estrato según sus registros. Una unidad conserva su estrato a lo largo de los años: corrija el campo de estrato.</translation>
    </message>
    <message>
        <location filename="../processing/engine/trend.py" line="576"/>
        <source>CONFIDENCE must lie between 0.5 and 1 (for example 0.95); got {c:g}.</source>
        <translation>CONFIDENCE debe estar entre 0.5 y 1 (por ejemplo 0.95); se recibió {c:g}.</translation>
    </message>
    <message>
        <location filename="../processing/engine/trend.py" line="683"/>
        <source>Every count is 0: no trend can be estimated from records without animals.</source>
        <translation>Todos los conteos son 0: no se puede estimar ninguna tendencia a partir de registros sin animales.</translation>
    </message>
    <message>
        <location filename="../processing/engine/trend.py" line="688"/>
        <source>The trend cannot be estimated: no unit with animals was counted in two different years. A trend needs units revisited over the years.</source>
        <translation>No se puede estimar la tendencia: ninguna unidad con animales se contó en dos años distintos. Una tendencia necesita unidades revisitadas a lo largo de los años.</translation>
    </message>
    <message>
        <location filename="../processing/engine/trend.py" line="693"/>
        <source>The trend did not converge (the counts may lie all in the first or all in the last years). Check the year and count fields.</source>
        <translation>El ajuste de la tendencia no convergió (puede que los conteos estén todos en los primeros o todos en los últimos años). Compruebe los campos de año y de conteo.</translation>
    </message>
    <message>
        <location filename="../processing/engine/trend.py" line="720"/>
        <source>This revisit design leaves no degrees of freedom for year-to-year variation (the panels do not link enough years): the interval allows only for variation between units, and is too narrow if whole years differ. Add a core of units visited every year.</source>
        <translation>Este diseño de revisita no deja grados de libertad para la variación entre años (los paneles no enlazan suficientes años): el intervalo solo tiene en cuenta la variación entre unidades y es demasiado estrecho si difieren años enteros. Añada un núcleo de unidades visitadas cada año.</translation>
    </message>
    <message>
        <location filename="../processing/engine/trend.py" line="789"/>
        <source>Records {ids} have no whole-number year.</source>
        <translation>Los registros {ids} no tienen un año en número entero.</translation>
    </message>
    <message>
        <location filename="../processing/engine/trend.py" line="792"/>
        <source>Records {ids} have no estimate above 0. A log-linear trend needs estimates above 0: leave out years without an estimate, or use the unit counts instead.</source>
        <translation>Los registros {ids} no tienen una estimación mayor que 0. Una tendencia log-lineal necesita estimaciones mayores que 0: deje fuera los años sin estimación o use en su lugar los conteos por unidad.</translation>
    </message>
    <message>
        <location filename="../processing/engine/trend.py" line="796"/>
        <source>Records {ids} have no standard error above 0. Every yearly estimate needs its standard error (the estimate step writes it).</source>
        <translation>Los registros {ids} no tienen un error estándar mayor que 0. Cada estimación anual necesita su error estándar (el paso de estimación lo escribe).</translation>
    </message>
    <message>
        <location filename="../processing/engine/trend.py" line="804"/>
        <source>Years {years} have more than one estimate. Keep one estimate per year (for the estimate step&apos;s table: its rows &apos;all&apos;, or one stratum).</source>
        <translation>Los años {years} tienen más de una estimación. Conserve una estimación por año (para la tabla del paso de estimación: sus filas 'all', o un solo estrato).</translation>
    </message>
    <message>
        <location filename="../processing/engine/trend.py" line="810"/>
        <source>A trend needs estimates from at least {k} different years; the records hold {n}.</source>
        <translation>Una tendencia necesita estimaciones de al menos {k} años distintos; los registros contienen {n}.</translation>
    </message>
    <message>
        <location filename="../processing/engine/trend.py" line="862"/>
        <source>Only {k} years: the year-to-year variation and the trend are both poorly known, and the interval is wide.</source>
        <translation>Solo {k} años: tanto la variación entre años como la tendencia se conocen mal, y el intervalo es amplio.</translation>
    </message>
    <message>
        <location filename="../processing/engine/trend_power.py" line="82"/>
        <source>The panels layer holds no unit with visit years (field years).</source>
        <translation>La capa de paneles no contiene ninguna unidad con años de visita (campo years).</translation>
    </message>
    <message>
        <location filename="../processing/engine/trend_power.py" line="120"/>
        <source>CHANGES must be a list of annual changes in % per year, separated by commas (for example -3, -5); got &apos;{text}&apos;.</source>
        <translation>CHANGES debe ser una lista de cambios anuales en % por año, separados por comas (por ejemplo -3, -5); se recibió «{text}».</translation>
    </message>
    <message>
        <location filename="../processing/engine/trend_power.py" line="126"/>
        <source>CHANGES is empty: give at least one annual change in % (for example -3).</source>
        <translation>CHANGES está vacío: indique al menos un cambio anual en % (por ejemplo -3).</translation>
    </message>
    <message>
        <location filename="../processing/engine/trend_power.py" line="130"/>
        <source>Annual changes must be above -100 % per year; got {values}.</source>
        <translation>Los cambios anuales deben ser mayores que -100 % por año; se recibió {values}.</translation>
    </message>
    <message>
        <location filename="../processing/engine/trend_power.py" line="142"/>
        <source>N_UNITS = {n} is fewer than the {k} panels of the design: every panel needs a unit.</source>
        <translation>N_UNITS = {n} es menor que los {k} paneles del diseño: cada panel necesita una unidad.</translation>
    </message>
    <message>
        <location filename="../processing/engine/trend_power.py" line="147"/>
        <source>A trend needs at least {k} years; YEARS = {years}.</source>
        <translation>Una tendencia necesita al menos {k} años; YEARS = {years}.</translation>
    </message>
    <message>
        <location filename="../processing/engine/trend_power.py" line="152"/>
        <source>REPLICATES must lie between 10 and {most}; got {r}.</source>
        <translation>REPLICATES debe estar entre 10 y {most}; se recibió {r}.</translation>
    </message>
    <message>
        <location filename="../processing/engine/trend_power.py" line="157"/>
        <source>MEAN_COUNT must be above 0 (animals per unit in the first year).</source>
        <translation>MEAN_COUNT debe ser mayor que 0 (animales por unidad en el primer año).</translation>
    </message>
    <message>
        <location filename="../processing/engine/trend_power.py" line="161"/>
        <source>The standard deviations SD_UNIT, SD_UNIT_YEAR and SD_YEAR cannot be negative.</source>
        <translation>Las desviaciones estándar SD_UNIT, SD_UNIT_YEAR y SD_YEAR no pueden ser negativas.</translation>
    </message>
    <message>
        <location filename="../processing/engine/trend_power.py" line="165"/>
        <source>DETECTION must lie in (0, 1]; got {p:g}.</source>
        <translation>DETECTION debe estar en (0, 1]; se recibió {p:g}.</translation>
    </message>
    <message>
        <location filename="../processing/engine/trend_power.py" line="170"/>
        <source>ALPHA must lie between 0 and 0.5 (for example 0.05 or 0.1); got {a:g}.</source>
        <translation>ALPHA debe estar entre 0 y 0.5 (por ejemplo 0.05 o 0.1); se recibió {a:g}.</translation>
    </message>
    <message>
        <location filename="../processing/engine/trend_power.py" line="191"/>
        <source>The pilot table has no stratum with 2 or more units and a mean and SD of the counts (fields n, mean_c, sd_c of the estimate step).</source>
        <translation>La tabla piloto no tiene ningún estrato con 2 o más unidades y una media y una DE de los conteos (campos n, mean_c, sd_c del paso de estimación).</translation>
    </message>
    <message>
        <location filename="../processing/engine/trend_power.py" line="199"/>
        <source>The pilot counted no animal: its mean count is 0, so no power can be computed.</source>
        <translation>El piloto no contó ningún animal: su conteo medio es 0, así que no se puede calcular ninguna potencia.</translation>
    </message>
    <message>
        <location filename="../processing/engine/trend_power.py" line="228"/>
        <source>This revisit design never links enough years to test a trend (each panel must be visited in several years, or a core visited every year): use fewer panels, a core, or more years.</source>
        <translation>Este diseño de revisita nunca enlaza suficientes años para contrastar una tendencia (cada panel debe visitarse en varios años, o un núcleo cada año): use menos paneles, un núcleo o más años.</translation>
    </message>
    <message>
        <location filename="../processing/engine/trend_power.py" line="391"/>
        <source>In up to {n} of {r} simulated programmes the trend could not be estimated (too few animals counted in revisited units); they count as not detected. Raise MEAN_COUNT or the number of units if that is unrealistic.</source>
        <translation>En hasta {n} de los {r} programas simulados no se pudo estimar la tendencia (demasiado pocos animales contados en las unidades revisitadas); cuentan como no detectados. Aumente MEAN_COUNT o el número de unidades si eso no es realista.</translation>
    </message>
    <message>
        <location filename="../processing/gdal_io/patches.py" line="218"/>
        <source>The strata form {n:,} patches (4-connected groups of cells of one stratum), more than the {limit:,} that can be turned into polygons: the covariate is speckled at the scale of its cells. Set MIN_AREA to {suggested:g} ha or more (it is {min_area:g} ha): patches below it join a neighbouring stratum, which leaves at most {limit:,} patches on the {area:,.0f} ha stratified. Smoothing the covariate first also helps.</source>
        <translation>Los estratos forman {n:,} manchas (grupos con conectividad 4 de celdas de un mismo estrato), más que las {limit:,} que se pueden convertir en polígonos: la covariable está moteada a la escala de sus celdas. Fije MIN_AREA en {suggested:g} ha o más (ahora es {min_area:g} ha): las manchas menores se unen a un estrato vecino, lo que deja como máximo {limit:,} manchas en las {area:,.0f} ha estratificadas. También ayuda suavizar antes la covariable.</translation>
    </message>
    <message>
        <location filename="../processing/gdal_io/patches.py" line="231"/>
        <source>The strata form {n:,} patches (4-connected groups of cells of one stratum), more than the {limit:,} that can be merged below MIN_AREA in bounded memory: the covariate is speckled at the scale of its cells. Smooth or coarsen it first (for example, resample it with the average to cells of about {cell:g} m, so that one cell covers MIN_AREA), then run the stratification again.</source>
        <translation>Los estratos forman {n:,} manchas (grupos con conectividad 4 de celdas de un mismo estrato), más que las {limit:,} que la fusión de las manchas por debajo de MIN_AREA puede tratar con memoria acotada: la covariable está moteada a la escala de sus celdas. Suavícela o aumente antes su tamaño de celda (por ejemplo, remuestréela con la media a celdas de unos {cell:g} m, de modo que una celda cubra MIN_AREA) y vuelva a ejecutar la estratificación.</translation>
    </message>
    <message>
        <location filename="../processing/gdal_io/stratify_pipeline.py" line="120"/>
        <source>The strata formed too many small patches to merge one by one: patches below {cells:,} cells were first merged into their largest neighbour (the rule of GDAL&apos;s sieve filter), which can join a mosaic of small patches into one stratum. Smoothing the covariate before stratifying keeps the strata closer to its pattern.</source>
        <translation>Los estratos formaban demasiadas manchas pequeñas para fusionarlas una a una: las manchas de menos de {cells:,} celdas se fusionaron primero con su vecina mayor (la regla del filtro de criba de GDAL), lo que puede unir un mosaico de manchas pequeñas en un solo estrato. Suavizar la covariable antes de estratificar mantiene los estratos más cerca de su patrón.</translation>
    </message>
</context>
<context>
    <name>PlotwisePlugin</name>
    <message>
        <location filename="../plugin/plugin.py" line="49"/>
        <source>{name} is missing ({error}).</source>
        <translation>Falta {name} ({error}).</translation>
    </message>
    <message>
        <location filename="../plugin/plugin.py" line="51"/>
        <source>{name} {version} is too old; version {wanted} or newer is needed.</source>
        <translation>{name} {version} es demasiado antiguo; se necesita la versión {wanted} o posterior.</translation>
    </message>
    <message>
        <location filename="../plugin/plugin.py" line="56"/>
        <source>Plotwise cannot start because a library it needs is missing or too old: {problems} Install the host&apos;s standard packages (on Debian or Ubuntu: python3-numpy, python3-scipy, python3-shapely, python3-pyproj, python3-gdal) and restart QGIS. No Plotwise algorithm has been added.</source>
        <translation>Plotwise no puede iniciarse porque falta una biblioteca necesaria o es demasiado antigua: {problems} Instale los paquetes estándar del anfitrión (en Debian o Ubuntu: python3-numpy, python3-scipy, python3-shapely, python3-pyproj, python3-gdal) y reinicie QGIS. No se ha añadido ningún algoritmo de Plotwise.</translation>
    </message>
</context>
<context>
    <name>PlotwiseProvider</name>
    <message>
        <location filename="../processing/provider.py" line="104"/>
        <source>Plotwise</source>
        <translation>Plotwise</translation>
    </message>
    <message>
        <location filename="../processing/provider.py" line="107"/>
        <source>Plotwise survey design and estimation</source>
        <translation>Plotwise: diseño de muestreos y estimación</translation>
    </message>
    <message>
        <location filename="../processing/provider.py" line="127"/>
        <source>The example model {path} could not be read.</source>
        <translation>No se pudo leer el modelo de ejemplo {path}.</translation>
    </message>
</context>
<context>
    <name>PlotwiseReport</name>
    <message>
        <location filename="../processing/report/layout.py" line="152"/>
        <source>yes</source>
        <translation>sí</translation>
    </message>
    <message>
        <location filename="../processing/report/layout.py" line="152"/>
        <source>no</source>
        <translation>no</translation>
    </message>
    <message>
        <location filename="../processing/report/html.py" line="149"/>
        <source>Inputs and parameters</source>
        <translation>Entradas y parámetros</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="226"/>
        <source>Item</source>
        <translation>Elemento</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="226"/>
        <source>Value</source>
        <translation>Valor</translation>
    </message>
    <message>
        <location filename="../processing/report/html.py" line="179"/>
        <source>Written</source>
        <translation>Generado el</translation>
    </message>
    <message>
        <location filename="../processing/report/html.py" line="181"/>
        <source>algorithm</source>
        <translation>algoritmo</translation>
    </message>
    <message>
        <location filename="../processing/report/html.py" line="184"/>
        <source>Field safety</source>
        <translation>Seguridad en el terreno</translation>
    </message>
    <message>
        <location filename="../processing/report/html.py" line="32"/>
        <source>Check every unit&apos;s access and safety before sending a team. This tool chooses locations for statistical reasons only: it never makes a location safe to reach or to work in. Steep, remote or flooded terrain, wildlife, weather and private land can put people at risk. Follow your agency&apos;s field-safety rules and local law, and leave out or replace any unit that cannot be reached safely (record it as not surveyed).</source>
        <translation>Compruebe el acceso y la seguridad de cada unidad antes de enviar un equipo. Esta herramienta elige ubicaciones solo por razones estadísticas: nunca hace que una ubicación sea segura para llegar a ella ni para trabajar en ella. El terreno escarpado, remoto o inundado, la fauna, el tiempo atmosférico y las tierras privadas pueden poner a las personas en riesgo. Siga las normas de seguridad en el terreno de su organismo y la legislación local, y excluya o sustituya cualquier unidad a la que no se pueda llegar con seguridad (regístrela como no muestreada).</translation>
    </message>
    <message>
        <location filename="../processing/report/html.py" line="189"/>
        <source>Warnings</source>
        <translation>Advertencias</translation>
    </message>
    <message>
        <location filename="../processing/report/html.py" line="194"/>
        <source>Method references</source>
        <translation>Referencias de los métodos</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="33"/>
        <source>converged</source>
        <translation>convergido</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="34"/>
        <source>at the boundary</source>
        <translation>en el límite</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="35"/>
        <source>not fitted</source>
        <translation>no ajustado</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="77"/>
        <source>Occupancy from repeat visits</source>
        <translation>Ocupación a partir de visitas repetidas</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="80"/>
        <source>occupancy ψ (share of sites used)</source>
        <translation>ocupación ψ (proporción de sitios usados)</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="80"/>
        <source>{level} interval of ψ</source>
        <translation>intervalo al {level} de ψ</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="80"/>
        <source>detection p per survey</source>
        <translation>detección p por visita</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="80"/>
        <source>naive occupancy (detected at least once)</source>
        <translation>ocupación ingenua (especie detectada al menos una vez)</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="80"/>
        <source>sites used</source>
        <translation>sitios usados</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="89"/>
        <source>Model: {model}. ψ is the mean fitted occupancy probability of the sites used; with covariates it varies by site (field psi).</source>
        <translation>Modelo: {model}. ψ es la media de las probabilidades de ocupación ajustadas de los sitios usados; con covariables varía según el sitio (campo psi).</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="101"/>
        <source>Map of psi_cond</source>
        <translation>Mapa de psi_cond</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="102"/>
        <source>Sites shaded by psi_cond, the probability that the site is occupied given its detection history (1 where the species was detected)</source>
        <translation>Sitios sombreados según psi_cond, la probabilidad de que el sitio esté ocupado dado su historial de detección (1 donde se detectó la especie)</translation>
    </message>
    <message>
        <location filename="../processing/report/trendpower.py" line="153"/>
        <source>Method</source>
        <translation>Método</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="107"/>
        <source>Single-season occupancy model (MacKenzie et al. 2002): a site is occupied with probability ψ and, when occupied, each survey detects the species with probability p; logit ψ and logit p are linear in the covariates. Maximum likelihood with scipy (BFGS, then Newton steps); standard errors from the observed information (Louis 1982), intervals on the logit scale. Covariates are centred and scaled for the fit; the table gives their coefficients in the covariates' own units. Occasions not surveyed (NULL) are left out of a site's likelihood.</source>
        <translation>Modelo de ocupación de una temporada (MacKenzie et al. 2002): un sitio está ocupado con probabilidad ψ y, si lo está, cada visita detecta la especie con probabilidad p; logit ψ y logit p son lineales en las covariables. Máxima verosimilitud con scipy (BFGS y luego pasos de Newton); errores estándar a partir de la información observada (Louis 1982), intervalos en la escala logit. Las covariables se centran y escalan para el ajuste; la tabla da sus coeficientes en las unidades propias de las covariables. Las ocasiones no muestreadas (NULL) se excluyen de la verosimilitud de un sitio.</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="121"/>
        <source>(none)</source>
        <translation>(ninguno)</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="123"/>
        <source>Sites (SITES)</source>
        <translation>Sitios (SITES)</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="124"/>
        <source>Site id field (SITE_ID_FIELD)</source>
        <translation>Campo identificador de los sitios (SITE_ID_FIELD)</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="125"/>
        <source>(none: feature ids)</source>
        <translation>(ninguno: identificadores de entidad)</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="126"/>
        <source>History fields (HISTORY_FIELDS)</source>
        <translation>Campos del historial (HISTORY_FIELDS)</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="127"/>
        <source>Covariates of ψ (PSI_COVARIATES)</source>
        <translation>Covariables de ψ (PSI_COVARIATES)</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="128"/>
        <source>Covariates of p (P_COVARIATES)</source>
        <translation>Covariables de p (P_COVARIATES)</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="130"/>
        <source>Effort fields (EFFORT_FIELDS)</source>
        <translation>Campos de esfuerzo (EFFORT_FIELDS)</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="131"/>
        <source>Models compared (MODELS)</source>
        <translation>Modelos comparados (MODELS)</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="132"/>
        <source>(the constant model only)</source>
        <translation>(solo el modelo constante)</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="133"/>
        <source>Confidence level (CONFIDENCE)</source>
        <translation>Nivel de confianza (CONFIDENCE)</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="134"/>
        <source>Target SE of ψ (TARGET_SE)</source>
        <translation>Error estándar objetivo de ψ (TARGET_SE)</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="136"/>
        <source>Goodness-of-fit replicates (GOF_REPLICATES)</source>
        <translation>Réplicas de la prueba de bondad de ajuste (GOF_REPLICATES)</translation>
    </message>
    <message>
        <location filename="../processing/report/stratify.py" line="263"/>
        <source>Seed (SEED)</source>
        <translation>Semilla (SEED)</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="139"/>
        <source>not used (no bootstrap)</source>
        <translation>no se usa (sin bootstrap)</translation>
    </message>
    <message>
        <location filename="../processing/report/panels.py" line="117"/>
        <source>CRS</source>
        <translation>SRC</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="152"/>
        <source>Detection histories</source>
        <translation>Historiales de detección</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="153"/>
        <source>sites in the layer</source>
        <translation>sitios en la capa</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="153"/>
        <source>sites used (at least one surveyed occasion)</source>
        <translation>sitios usados (al menos una ocasión muestreada)</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="153"/>
        <source>sites left out (no surveyed occasion)</source>
        <translation>sitios dejados fuera (ninguna ocasión muestreada)</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="153"/>
        <source>occasions</source>
        <translation>ocasiones</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="153"/>
        <source>surveys (site-occasions surveyed)</source>
        <translation>visitas (pares sitio-ocasión muestreados)</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="153"/>
        <source>site-occasions not surveyed (NULL)</source>
        <translation>pares sitio-ocasión no muestreados (NULL)</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="153"/>
        <source>sites with a detection</source>
        <translation>sitios con alguna detección</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="153"/>
        <source>detections</source>
        <translation>detecciones</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="163"/>
        <source>{n} detections</source>
        <translation>{n} detecciones</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="165"/>
        <source>sites</source>
        <translation>sitios</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="165"/>
        <source>Sites by their number of detections</source>
        <translation>Sitios según su número de detecciones</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="167"/>
        <source>History (1 detected, 0 not, - not surveyed)</source>
        <translation>Historial (1 detectada, 0 no, - no muestreado)</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="167"/>
        <source>Sites</source>
        <translation>Sitios</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="167"/>
        <source>The most frequent detection histories</source>
        <translation>Los historiales de detección más frecuentes</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="174"/>
        <source>Estimates</source>
        <translation>Estimaciones</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="178"/>
        <source>Parameter</source>
        <translation>Parámetro</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="178"/>
        <source>Estimate</source>
        <translation>Estimación</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="178"/>
        <source>SE</source>
        <translation>EE</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="178"/>
        <source>Lower ({level})</source>
        <translation>Inferior ({level})</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="178"/>
        <source>Upper ({level})</source>
        <translation>Superior ({level})</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="182"/>
        <source>Rows logit_psi:… and logit_p:… are coefficients on the logit scale (const: the logit at covariates 0; a slope per unit of its covariate). Rows psi and p are the mean fitted probabilities, with delta-method SEs and intervals on the logit scale.</source>
        <translation>Las filas logit_psi:… y logit_p:… son coeficientes en la escala logit (const: el logit con las covariables en 0; una pendiente por unidad de su covariable). Las filas psi y p son las probabilidades ajustadas medias, con errores estándar por el método delta e intervalos en la escala logit.</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="188"/>
        <source>Parameters at the boundary of their range: {names}. They get no SE or interval; the other estimates are conditional on them.</source>
        <translation>Parámetros en el límite de su rango: {names}. No tienen error estándar ni intervalo; las demás estimaciones están condicionadas a ellos.</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="195"/>
        <source>Model comparison</source>
        <translation>Comparación de modelos</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="200"/>
        <source>Model</source>
        <translation>Modelo</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="200"/>
        <source>Parameters</source>
        <translation>Parámetros</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="200"/>
        <source>log L</source>
        <translation>log L</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="200"/>
        <source>AIC</source>
        <translation>AIC</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="200"/>
        <source>AICc</source>
        <translation>AICc</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="200"/>
        <source>ΔAIC</source>
        <translation>ΔAIC</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="200"/>
        <source>AIC weight</source>
        <translation>Peso AIC</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="200"/>
        <source>ψ</source>
        <translation>ψ</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="200"/>
        <source>p</source>
        <translation>p</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="200"/>
        <source>Fit</source>
        <translation>Ajuste</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="209"/>
        <source>The model with the lowest AIC is {model}, {d} AIC units below the model reported above. Consider running again with its covariates.</source>
        <translation>El modelo con el AIC más bajo es {model}, {d} unidades de AIC por debajo del modelo presentado arriba. Considere volver a ejecutar con sus covariables.</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="218"/>
        <source>Cumulative detection</source>
        <translation>Detección acumulada</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="221"/>
        <source>1 − (1 − p)^K</source>
        <translation>1 − (1 − p)^K</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="223"/>
        <source>lower limit</source>
        <translation>límite inferior</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="224"/>
        <source>upper limit</source>
        <translation>límite superior</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="226"/>
        <source>occasions K</source>
        <translation>ocasiones K</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="226"/>
        <source>cumulative detection</source>
        <translation>detección acumulada</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="228"/>
        <source>Chance of at least one detection at an occupied site after K surveys, at the mean p</source>
        <translation>Probabilidad de al menos una detección en un sitio ocupado tras K visitas, con la p media</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="234"/>
        <source>Design advice</source>
        <translation>Recomendaciones de diseño</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="235"/>
        <source>With p = {p} per survey, {k} occasions give a cumulative detection of {c}; {k95} occasions are needed for 0.95.</source>
        <translation>Con p = {p} por visita, {k} ocasiones dan una detección acumulada de {c}; se necesitan {k95} ocasiones para 0.95.</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="241"/>
        <source>For an SE of ψ of {se} with {k} occasions per site, about {s} sites are needed (asymptotic variance of MacKenzie &amp; Royle 2005 at ψ = {psi} and p = {p}: s·Var(ψ̂) = {v}). The fewest surveys (sites × occasions) for that SE come with {kb} occasions per site and about {sb} sites.</source>
        <translation>Para un error estándar de ψ de {se} con {k} ocasiones por sitio, se necesitan unos {s} sitios (varianza asintótica de MacKenzie &amp; Royle 2005 con ψ = {psi} y p = {p}: s·Var(ψ̂) = {v}). El menor número de visitas (sitios × ocasiones) para ese error estándar se logra con {kb} ocasiones por sitio y unos {sb} sitios.</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="250"/>
        <source>With covariates the advice uses the mean ψ and p of the model (the constant-model formula): a guide, not an exact figure.</source>
        <translation>Con covariables, las recomendaciones usan la ψ y la p medias del modelo (la fórmula del modelo constante): una orientación, no una cifra exacta.</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="257"/>
        <source>Goodness of fit</source>
        <translation>Bondad de ajuste</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="258"/>
        <source>Pearson's χ² of the detection-history frequencies against the model's expected frequencies (sites grouped by their surveyed occasions): {x}. Parametric bootstrap (MacKenzie &amp; Bailey 2004) of {b} data sets simulated from the fitted model: mean χ² {m}, p = {p}; ĉ = {c}.</source>
        <translation>χ² de Pearson de las frecuencias de los historiales de detección frente a las frecuencias esperadas del modelo (sitios agrupados según sus ocasiones muestreadas): {x}. Bootstrap paramétrico (MacKenzie &amp; Bailey 2004) de {b} conjuntos de datos simulados a partir del modelo ajustado: χ² medio {m}, p = {p}; ĉ = {c}.</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="265"/>
        <source>ĉ near 1: the model fits; above 1: the histories vary more than the model allows (multiply the variances by ĉ); well below 1 is usually harmless.</source>
        <translation>ĉ cercano a 1: el modelo se ajusta; por encima de 1: los historiales varían más de lo que el modelo permite (multiplique las varianzas por ĉ); muy por debajo de 1 suele ser inofensivo.</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="282"/>
        <source>{lo} to {hi}</source>
        <translation>{lo} a {hi}</translation>
    </message>
    <message>
        <location filename="../processing/report/stratify.py" line="232"/>
        <source>grid</source>
        <translation>cuadrícula</translation>
    </message>
    <message>
        <location filename="../processing/report/stations.py" line="29"/>
        <source>clusters</source>
        <translation>conglomerados</translation>
    </message>
    <message>
        <location filename="../processing/report/stations.py" line="29"/>
        <source>balanced</source>
        <translation>equilibrado</translation>
    </message>
    <message>
        <location filename="../processing/report/stations.py" line="34"/>
        <source>independent occupancy sites (one home-range diameter apart)</source>
        <translation>sitios de ocupación independientes (separados un diámetro de ámbito hogareño)</translation>
    </message>
    <message>
        <location filename="../processing/report/stations.py" line="34"/>
        <source>spatial capture-recapture (2σ apart)</source>
        <translation>captura-recaptura espacial (separación de 2σ)</translation>
    </message>
    <message>
        <location filename="../processing/report/stations.py" line="66"/>
        <source>Camera-trap and recorder stations</source>
        <translation>Estaciones de cámaras trampa y grabadoras</translation>
    </message>
    <message>
        <location filename="../processing/report/stations.py" line="241"/>
        <source>primary stations</source>
        <translation>estaciones principales</translation>
    </message>
    <message>
        <location filename="../processing/report/stations.py" line="241"/>
        <source>reserve stations</source>
        <translation>estaciones de reserva</translation>
    </message>
    <message>
        <location filename="../processing/report/stations.py" line="70"/>
        <source>spacing used (m)</source>
        <translation>separación usada (m)</translation>
    </message>
    <message>
        <location filename="../processing/report/stations.py" line="70"/>
        <source>array</source>
        <translation>dispositivo</translation>
    </message>
    <message>
        <location filename="../processing/report/stations.py" line="81"/>
        <source>Replacing stations in the field</source>
        <translation>Sustituir estaciones en el terreno</translation>
    </message>
    <message>
        <location filename="../processing/report/stations.py" line="82"/>
        <source>A primary station that cannot be set (no safe access, no permission, flooded, ...) is replaced by the next unused reserve station of its stratum, in draw order (draw_ord); for clusters, a whole cluster by the next reserve cluster. Record the primary as not set and why; never move a station to a more convenient place.</source>
        <translation>Una estación principal que no se puede instalar (sin acceso seguro, sin permiso, inundada, ...) se sustituye por la siguiente estación de reserva no usada de su estrato, en orden de sorteo (draw_ord); en los conglomerados, un conglomerado entero se sustituye por el siguiente conglomerado de reserva. Registre la principal como no instalada y el motivo; nunca traslade una estación a un lugar más cómodo.</translation>
    </message>
    <message>
        <location filename="../processing/report/stratify.py" line="63"/>
        <source>Map</source>
        <translation>Mapa</translation>
    </message>
    <message>
        <location filename="../processing/report/stations.py" line="88"/>
        <source>Strata (filled), primary stations (dark) and reserve stations (light)</source>
        <translation>Estratos (rellenos), estaciones principales (oscuras) y estaciones de reserva (claras)</translation>
    </message>
    <message>
        <location filename="../processing/report/stations.py" line="98"/>
        <source>(not given)</source>
        <translation>(no indicado)</translation>
    </message>
    <message>
        <location filename="../processing/report/stations.py" line="100"/>
        <source>Frame (FRAME)</source>
        <translation>Marco (FRAME)</translation>
    </message>
    <message>
        <location filename="../processing/report/stations.py" line="101"/>
        <source>Stratum field (STRATUM_FIELD)</source>
        <translation>Campo de estrato (STRATUM_FIELD)</translation>
    </message>
    <message>
        <location filename="../processing/report/stations.py" line="102"/>
        <source>(none: one stratum)</source>
        <translation>(ninguno: un solo estrato)</translation>
    </message>
    <message>
        <location filename="../processing/report/stations.py" line="103"/>
        <source>Stations (N_STATIONS)</source>
        <translation>Estaciones (N_STATIONS)</translation>
    </message>
    <message>
        <location filename="../processing/report/stations.py" line="104"/>
        <source>0: every grid point</source>
        <translation>0: todos los puntos de la cuadrícula</translation>
    </message>
    <message>
        <location filename="../processing/report/stations.py" line="105"/>
        <source>Array (ARRAY)</source>
        <translation>Dispositivo (ARRAY)</translation>
    </message>
    <message>
        <location filename="../processing/report/stations.py" line="107"/>
        <source>Home range (HOME_RANGE, km²)</source>
        <translation>Ámbito hogareño (HOME_RANGE, km²)</translation>
    </message>
    <message>
        <location filename="../processing/report/stations.py" line="109"/>
        <source>Spacing (SPACING, m)</source>
        <translation>Separación (SPACING, m)</translation>
    </message>
    <message>
        <location filename="../processing/report/stations.py" line="110"/>
        <source>from the home range</source>
        <translation>a partir del ámbito hogareño</translation>
    </message>
    <message>
        <location filename="../processing/report/stations.py" line="111"/>
        <source>Spacing rule (SPACING_RULE)</source>
        <translation>Regla de separación (SPACING_RULE)</translation>
    </message>
    <message>
        <location filename="../processing/report/stations.py" line="113"/>
        <source>Stations per cluster (CLUSTER_SIZE)</source>
        <translation>Estaciones por conglomerado (CLUSTER_SIZE)</translation>
    </message>
    <message>
        <location filename="../processing/report/stations.py" line="114"/>
        <source>(not used)</source>
        <translation>(no se usa)</translation>
    </message>
    <message>
        <location filename="../processing/report/stations.py" line="115"/>
        <source>Minimum spacing (MIN_SPACING, m)</source>
        <translation>Separación mínima (MIN_SPACING, m)</translation>
    </message>
    <message>
        <location filename="../processing/report/stations.py" line="116"/>
        <source>Reserves per stratum (RESERVE)</source>
        <translation>Reservas por estrato (RESERVE)</translation>
    </message>
    <message>
        <location filename="../processing/report/stations.py" line="117"/>
        <source>Service time per station (SERVICE_HOURS, hours)</source>
        <translation>Tiempo de revisión por estación (SERVICE_HOURS, horas)</translation>
    </message>
    <message>
        <location filename="../processing/report/stations.py" line="119"/>
        <source>Working day (WORKDAY_HOURS, hours)</source>
        <translation>Jornada de trabajo (WORKDAY_HOURS, horas)</translation>
    </message>
    <message>
        <location filename="../processing/report/stations.py" line="121"/>
        <source>CRS of the computation and the output</source>
        <translation>SRC del cálculo y de la salida</translation>
    </message>
    <message>
        <location filename="../processing/report/stations.py" line="126"/>
        <source>Spacing</source>
        <translation>Separación</translation>
    </message>
    <message>
        <location filename="../processing/report/stations.py" line="129"/>
        <source>Home range {hr} km², taken as the 95% range of a circular bivariate normal distribution of the animal's positions: σ = √(HR/π) / 2.448 = {sigma} m (2.448 = √(−2 ln 0.05)); home-range diameter {diameter} m.</source>
        <translation>Ámbito hogareño de {hr} km², tomado como el área del 95 % de una distribución normal bivariada circular de las posiciones del animal: σ = √(HR/π) / 2.448 = {sigma} m (2.448 = √(−2 ln 0.05)); diámetro del ámbito hogareño {diameter} m.</translation>
    </message>
    <message>
        <location filename="../processing/report/stations.py" line="136"/>
        <source>Rule used: spatial capture-recapture, stations about 2σ = {s} m apart, so that an animal meets several stations (Sollmann et al. 2012; Sun et al. 2014).</source>
        <translation>Regla aplicada: captura-recaptura espacial, estaciones separadas unos 2σ = {s} m, para que un animal encuentre varias estaciones (Sollmann et al. 2012; Sun et al. 2014).</translation>
    </message>
    <message>
        <location filename="../processing/report/stations.py" line="141"/>
        <source>Rule used: independent occupancy sites, stations at least one home-range diameter = {s} m apart, so that one animal rarely uses two sites (common practice).</source>
        <translation>Regla aplicada: sitios de ocupación independientes, estaciones separadas al menos un diámetro de ámbito hogareño = {s} m, para que un mismo animal rara vez use dos sitios (práctica habitual).</translation>
    </message>
    <message>
        <location filename="../processing/report/stations.py" line="146"/>
        <source>Spacing given by the user: {s} m (no rule applied).</source>
        <translation>Separación indicada por el usuario: {s} m (no se aplica ninguna regla).</translation>
    </message>
    <message>
        <location filename="../processing/report/stations.py" line="149"/>
        <source>For comparison: 2σ = {scr} m (spatial capture-recapture); one home-range diameter = {occ} m (independent occupancy sites).</source>
        <translation>Para comparar: 2σ = {scr} m (captura-recaptura espacial); un diámetro de ámbito hogareño = {occ} m (sitios de ocupación independientes).</translation>
    </message>
    <message>
        <location filename="../processing/report/stations.py" line="158"/>
        <source>Array extent</source>
        <translation>Extensión del dispositivo</translation>
    </message>
    <message>
        <location filename="../processing/report/stations.py" line="159"/>
        <source>The primary stations span {span} km (largest distance between two of them); their convex hull covers {area} km².</source>
        <translation>Las estaciones principales abarcan {span} km (la mayor distancia entre dos de ellas); su envolvente convexa cubre {area} km².</translation>
    </message>
    <message>
        <location filename="../processing/report/stations.py" line="164"/>
        <source>That is {n} home ranges of {hr} km², and {d} home-range diameters across.</source>
        <translation>Eso equivale a {n} ámbitos hogareños de {hr} km² y a {d} diámetros de ámbito hogareño de un extremo a otro.</translation>
    </message>
    <message>
        <location filename="../processing/report/stations.py" line="169"/>
        <source>An array smaller than a few home ranges cannot estimate density by spatial capture-recapture: too few animals have their range inside it, and movement cannot be separated from density. Spread the stations wider or add stations.</source>
        <translation>Un dispositivo menor que unos pocos ámbitos hogareños no permite estimar la densidad por captura-recaptura espacial: muy pocos animales tienen su ámbito dentro de él, y el movimiento no puede separarse de la densidad. Separe más las estaciones o añada estaciones.</translation>
    </message>
    <message>
        <location filename="../processing/report/stations.py" line="177"/>
        <source>Field effort</source>
        <translation>Esfuerzo de campo</translation>
    </message>
    <message>
        <location filename="../processing/report/stations.py" line="178"/>
        <source>With {h} hours per station visit (travel included) and a working day of {day} hours, one team services {n} stations per team-day; one round of every primary station takes {days} team-days.</source>
        <translation>Con {h} horas por visita a una estación (desplazamiento incluido) y una jornada de trabajo de {day} horas, un equipo revisa {n} estaciones por jornada de equipo; una ronda por todas las estaciones principales requiere {days} jornadas de equipo.</translation>
    </message>
    <message>
        <location filename="../processing/report/stations.py" line="186"/>
        <source>A cluster of {k} stations takes {c} hours: one team can service a cluster in a day.</source>
        <translation>Un conglomerado de {k} estaciones requiere {c} horas: un equipo puede revisar un conglomerado en un día.</translation>
    </message>
    <message>
        <location filename="../processing/report/stations.py" line="189"/>
        <source>A cluster of {k} stations takes {c} hours: more than one team-day; use smaller clusters or two teams.</source>
        <translation>Un conglomerado de {k} estaciones requiere {c} horas: más de una jornada de equipo; use conglomerados más pequeños o dos equipos.</translation>
    </message>
    <message>
        <location filename="../processing/report/stations.py" line="196"/>
        <source>Stations per stratum</source>
        <translation>Estaciones por estrato</translation>
    </message>
    <message>
        <location filename="../processing/report/stations.py" line="198"/>
        <source>frame</source>
        <translation>marco</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="38"/>
        <source>Stratum</source>
        <translation>Estrato</translation>
    </message>
    <message>
        <location filename="../processing/report/stratify.py" line="95"/>
        <source>Area (ha)</source>
        <translation>Área (ha)</translation>
    </message>
    <message>
        <location filename="../processing/report/stations.py" line="201"/>
        <source>Stations asked</source>
        <translation>Estaciones pedidas</translation>
    </message>
    <message>
        <location filename="../processing/report/stations.py" line="201"/>
        <source>Primary</source>
        <translation>Principales</translation>
    </message>
    <message>
        <location filename="../processing/report/stations.py" line="201"/>
        <source>Reserve</source>
        <translation>Reservas</translation>
    </message>
    <message>
        <location filename="../processing/report/stations.py" line="201"/>
        <source>Clusters</source>
        <translation>Conglomerados</translation>
    </message>
    <message>
        <location filename="../processing/report/stations.py" line="210"/>
        <source>Grid: one square lattice over the frame, aligned with grid north, with a uniform random start. With N_STATIONS = 0 every lattice point in the frame is a station (reserves: the lattice's cell centres in random order, which sit s/√2 from the nearest primaries); otherwise the N lattice points nearest a uniform random point of the frame form a compact block (reserves: the next nearest lattice points).</source>
        <translation>Cuadrícula: una sola red cuadrada sobre el marco, alineada con el norte de la cuadrícula, con un inicio aleatorio uniforme. Con N_STATIONS = 0, cada punto de la red dentro del marco es una estación (reservas: los centros de las celdas de la red en orden aleatorio, situados a s/√2 de las principales más cercanas); si no, los N puntos de la red más cercanos a un punto aleatorio uniforme del marco forman un bloque compacto (reservas: los siguientes puntos de la red más cercanos).</translation>
    </message>
    <message>
        <location filename="../processing/report/stations.py" line="217"/>
        <source>Clusters: the stations of a cluster are the k points of a square lattice of the spacing nearest its centre; the centres are drawn by balanced acceptance sampling (Robertson et al. 2013) from each stratum shrunk by the cluster&apos;s radius, so that every station lies in its stratum, and at least twice the radius plus the spacing apart. Reserve clusters are the next points of the same sequence.</source>
        <translation>Conglomerados: las estaciones de un conglomerado son los k puntos de una red cuadrada con la separación indicada más cercanos a su centro; los centros se sortean por muestreo por aceptación equilibrada (Robertson et al. 2013) en cada estrato reducido en el radio del conglomerado, para que cada estación quede dentro de su estrato, y separados al menos el doble del radio más la separación. Los conglomerados de reserva son los puntos siguientes de la misma secuencia.</translation>
    </message>
    <message>
        <location filename="../processing/report/stations.py" line="224"/>
        <source>Balanced: single stations by balanced acceptance sampling (Robertson et al. 2013), each at least the spacing from every other (simple sequential inhibition); reserves are the next accepted points of the same sequence.</source>
        <translation>Equilibrado: estaciones individuales por muestreo por aceptación equilibrada (Robertson et al. 2013), cada una al menos a la separación indicada de todas las demás (inhibición secuencial simple); las reservas son los siguientes puntos aceptados de la misma secuencia.</translation>
    </message>
    <message>
        <location filename="../processing/report/stations.py" line="230"/>
        <source>MIN_SPACING = {d} m holds between all stations of the layout.</source>
        <translation>MIN_SPACING = {d} m se cumple entre todas las estaciones de la disposición.</translation>
    </message>
    <message>
        <location filename="../processing/report/svg.py" line="200"/>
        <source>the frame</source>
        <translation>el marco</translation>
    </message>
    <message>
        <location filename="../processing/report/svg.py" line="201"/>
        <source>stratum {key}</source>
        <translation>estrato {key}</translation>
    </message>
    <message>
        <location filename="../processing/report/allocate.py" line="40"/>
        <source>equal</source>
        <translation>igual</translation>
    </message>
    <message>
        <location filename="../processing/report/allocate.py" line="41"/>
        <source>proportional to area</source>
        <translation>proporcional al área</translation>
    </message>
    <message>
        <location filename="../processing/report/allocate.py" line="42"/>
        <source>Neyman</source>
        <translation>Neyman</translation>
    </message>
    <message>
        <location filename="../processing/report/allocate.py" line="43"/>
        <source>optimal with cost</source>
        <translation>óptima con coste</translation>
    </message>
    <message>
        <location filename="../processing/report/allocate.py" line="49"/>
        <source>Allocation of survey effort</source>
        <translation>Asignación del esfuerzo de muestreo</translation>
    </message>
    <message>
        <location filename="../processing/report/allocate.py" line="71"/>
        <source>field days</source>
        <translation>jornadas de campo</translation>
    </message>
    <message>
        <location filename="../processing/report/allocate.py" line="72"/>
        <source>cost units</source>
        <translation>unidades de coste</translation>
    </message>
    <message>
        <location filename="../processing/report/allocate.py" line="84"/>
        <source>units in total</source>
        <translation>unidades en total</translation>
    </message>
    <message>
        <location filename="../processing/report/allocate.py" line="85"/>
        <source>method</source>
        <translation>método</translation>
    </message>
    <message>
        <location filename="../processing/report/allocate.py" line="88"/>
        <source>expected CV of the overall density</source>
        <translation>CV esperado de la densidad global</translation>
    </message>
    <message>
        <location filename="../processing/report/allocate.py" line="90"/>
        <source>field days needed</source>
        <translation>jornadas de campo necesarias</translation>
    </message>
    <message>
        <location filename="../processing/report/allocate.py" line="90"/>
        <source>cost</source>
        <translation>coste</translation>
    </message>
    <message>
        <location filename="../processing/report/allocate.py" line="105"/>
        <source>a total number of units</source>
        <translation>un número total de unidades</translation>
    </message>
    <message>
        <location filename="../processing/report/allocate.py" line="106"/>
        <source>a budget</source>
        <translation>un presupuesto</translation>
    </message>
    <message>
        <location filename="../processing/report/allocate.py" line="107"/>
        <source>a target CV</source>
        <translation>un CV objetivo</translation>
    </message>
    <message>
        <location filename="../processing/report/allocate.py" line="114"/>
        <source>Strata layer</source>
        <translation>Capa de estratos</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="205"/>
        <source>Computation CRS</source>
        <translation>SRC de cálculo</translation>
    </message>
    <message>
        <location filename="../processing/report/allocate.py" line="114"/>
        <source>Method asked for</source>
        <translation>Método solicitado</translation>
    </message>
    <message>
        <location filename="../processing/report/allocate.py" line="114"/>
        <source>Method applied</source>
        <translation>Método aplicado</translation>
    </message>
    <message>
        <location filename="../processing/report/allocate.py" line="114"/>
        <source>Target</source>
        <translation>Objetivo</translation>
    </message>
    <message>
        <location filename="../processing/report/allocate.py" line="114"/>
        <source>Total asked for</source>
        <translation>Total solicitado</translation>
    </message>
    <message>
        <location filename="../processing/report/allocate.py" line="114"/>
        <source>Budget</source>
        <translation>Presupuesto</translation>
    </message>
    <message>
        <location filename="../processing/report/allocate.py" line="114"/>
        <source>Target CV</source>
        <translation>CV objetivo</translation>
    </message>
    <message>
        <location filename="../processing/report/allocate.py" line="114"/>
        <source>Unit area (m²)</source>
        <translation>Área de la unidad (m²)</translation>
    </message>
    <message>
        <location filename="../processing/report/allocate.py" line="114"/>
        <source>Minimum units per stratum</source>
        <translation>Mínimo de unidades por estrato</translation>
    </message>
    <message>
        <location filename="../processing/report/allocate.py" line="114"/>
        <source>SD field</source>
        <translation>Campo de DE</translation>
    </message>
    <message>
        <location filename="../processing/report/allocate.py" line="111"/>
        <source> (covariate proxy)</source>
        <translation> (sustituto por la covariable)</translation>
    </message>
    <message>
        <location filename="../processing/report/allocate.py" line="114"/>
        <source>Mean field</source>
        <translation>Campo de media</translation>
    </message>
    <message>
        <location filename="../processing/report/allocate.py" line="114"/>
        <source>Cost field</source>
        <translation>Campo de coste</translation>
    </message>
    <message>
        <location filename="../processing/report/allocate.py" line="114"/>
        <source>Fixed cost c0</source>
        <translation>Coste fijo c0</translation>
    </message>
    <message>
        <location filename="../processing/report/allocate.py" line="114"/>
        <source>Layout to come</source>
        <translation>Disposición prevista</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="210"/>
        <source>Finite-population correction</source>
        <translation>Corrección por población finita</translation>
    </message>
    <message>
        <location filename="../processing/report/layout.py" line="93"/>
        <source>Units per stratum</source>
        <translation>Unidades por estrato</translation>
    </message>
    <message>
        <location filename="../processing/report/allocate.py" line="77"/>
        <source>SE of mean per unit (covariate units)</source>
        <translation>Error estándar de la media por unidad (unidades de la covariable)</translation>
    </message>
    <message>
        <location filename="../processing/report/allocate.py" line="78"/>
        <source>SE of mean count per unit</source>
        <translation>Error estándar del conteo medio por unidad</translation>
    </message>
    <message>
        <location filename="../processing/report/allocate.py" line="147"/>
        <source>Units that fit</source>
        <translation>Unidades que caben</translation>
    </message>
    <message>
        <location filename="../processing/report/allocate.py" line="148"/>
        <source>Lower bound</source>
        <translation>Límite inferior</translation>
    </message>
    <message>
        <location filename="../processing/report/allocate.py" line="149"/>
        <source>Share before rounding</source>
        <translation>Cuota antes del redondeo</translation>
    </message>
    <message>
        <location filename="../processing/report/allocate.py" line="150"/>
        <source>Units (n_alloc)</source>
        <translation>Unidades (n_alloc)</translation>
    </message>
    <message>
        <location filename="../processing/report/allocate.py" line="151"/>
        <source>Sampling fraction</source>
        <translation>Fracción de muestreo</translation>
    </message>
    <message>
        <location filename="../processing/report/allocate.py" line="156"/>
        <source>SE of density (per km²)</source>
        <translation>Error estándar de la densidad (por km²)</translation>
    </message>
    <message>
        <location filename="../processing/report/allocate.py" line="158"/>
        <source>Expected CV (exp_cv)</source>
        <translation>CV esperado (exp_cv)</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="385"/>
        <source>all strata</source>
        <translation>todos los estratos</translation>
    </message>
    <message>
        <location filename="../processing/report/allocate.py" line="54"/>
        <source>units per stratum</source>
        <translation>unidades por estrato</translation>
    </message>
    <message>
        <location filename="../processing/report/allocate.py" line="54"/>
        <source>Units allocated to each stratum</source>
        <translation>Unidades asignadas a cada estrato</translation>
    </message>
    <message>
        <location filename="../processing/report/allocate.py" line="213"/>
        <source>{what}: c0 + Σ c_h·n_h = {c0:g} + {var:,.1f} = {total:,.1f} {unit}.</source>
        <translation>{what}: c0 + Σ c_h·n_h = {c0:g} + {var:,.1f} = {total:,.1f} {unit}.</translation>
    </message>
    <message>
        <location filename="../processing/report/allocate.py" line="213"/>
        <source>Field days needed</source>
        <translation>Jornadas de campo necesarias</translation>
    </message>
    <message>
        <location filename="../processing/report/allocate.py" line="213"/>
        <source>Cost of the design</source>
        <translation>Coste del diseño</translation>
    </message>
    <message>
        <location filename="../processing/report/allocate.py" line="231"/>
        <source>What the choice of method buys, at {n} units</source>
        <translation>Lo que aporta la elección del método, con {n} unidades</translation>
    </message>
    <message>
        <location filename="../processing/report/allocate.py" line="235"/>
        <source>stratum {label}</source>
        <translation>estrato {label}</translation>
    </message>
    <message>
        <location filename="../processing/report/allocate.py" line="239"/>
        <source>Variance relative to the applied allocation</source>
        <translation>Varianza relativa a la asignación aplicada</translation>
    </message>
    <message>
        <location filename="../processing/report/allocate.py" line="241"/>
        <source>Expected CV</source>
        <translation>CV esperado</translation>
    </message>
    <message>
        <location filename="../processing/report/allocate.py" line="252"/>
        <source>Without standard deviations the precision of the designs cannot be compared.</source>
        <translation>Sin desviaciones estándar no se puede comparar la precisión de los diseños.</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="43"/>
        <source>Survey designs compared by simulation</source>
        <translation>Diseños de muestreo comparados por simulación</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="66"/>
        <source>recommended design</source>
        <translation>diseño recomendado</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="67"/>
        <source>its RMSE (animals)</source>
        <translation>su RECM (animales)</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="68"/>
        <source>its RMSE relative to the total</source>
        <translation>su RECM relativa al total</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="69"/>
        <source>its 95 % interval coverage</source>
        <translation>cobertura de sus intervalos al 95 %</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="71"/>
        <source>expected animals in the frame</source>
        <translation>animales esperados en el marco</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="78"/>
        <source>point station</source>
        <translation>estación puntual</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="79"/>
        <source>square plot</source>
        <translation>parcela cuadrada</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="80"/>
        <source>circular plot</source>
        <translation>parcela circular</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="81"/>
        <source>line transect</source>
        <translation>transecto lineal</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="84"/>
        <source>counting radius</source>
        <translation>radio de conteo</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="85"/>
        <source>side</source>
        <translation>lado</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="86"/>
        <source>radius</source>
        <translation>radio</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="87"/>
        <source>length</source>
        <translation>longitud</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="92"/>
        <source>, strip half-width {w:g} m</source>
        <translation>, semianchura de franja {w:g} m</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="94"/>
        <source>Density surface</source>
        <translation>Superficie de densidad</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="95"/>
        <source>Sampling frame</source>
        <translation>Marco de muestreo</translation>
    </message>
    <message>
        <location filename="../processing/report/stratify.py" line="93"/>
        <source>Strata</source>
        <translation>Estratos</translation>
    </message>
    <message>
        <location filename="../processing/report/stratify.py" line="232"/>
        <source>none</source>
        <translation>ninguno</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="157"/>
        <source>Stratum field</source>
        <translation>Campo de estrato</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="98"/>
        <source>feature id</source>
        <translation>identificador de entidad</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="100"/>
        <source>Surface cell</source>
        <translation>Celda de la superficie</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="101"/>
        <source>Sub-cells per cell side (for counting)</source>
        <translation>Subceldas por lado de celda (para el conteo)</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="102"/>
        <source>Unit</source>
        <translation>Unidad</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="103"/>
        <source>Counted area per unit (m²)</source>
        <translation>Área contada por unidad (m²)</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="104"/>
        <source>Bearing</source>
        <translation>Rumbo</translation>
    </message>
    <message>
        <location filename="../processing/report/layout.py" line="150"/>
        <source>random</source>
        <translation>aleatorio</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="107"/>
        <source>Units wholly inside their stratum</source>
        <translation>Unidades por completo dentro de su estrato</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="112"/>
        <source>Number of units</source>
        <translation>Número de unidades</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="113"/>
        <source>Simulated surveys per design</source>
        <translation>Muestreos simulados por diseño</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="114"/>
        <source>Counts per cell</source>
        <translation>Conteos por celda</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="114"/>
        <source>negative binomial, k = {k:g}</source>
        <translation>binomial negativa, k = {k:g}</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="114"/>
        <source>Poisson</source>
        <translation>Poisson</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="119"/>
        <source>Variance estimator (grid, balanced)</source>
        <translation>Estimador de la varianza (cuadrícula, equilibrado)</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="119"/>
        <source>local neighbourhood</source>
        <translation>vecindario local</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="165"/>
        <source>simple random sampling formula</source>
        <translation>fórmula del muestreo aleatorio simple</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="158"/>
        <source>Confidence level</source>
        <translation>Nivel de confianza</translation>
    </message>
    <message>
        <location filename="../processing/report/trendpower.py" line="110"/>
        <source>Seed</source>
        <translation>Semilla</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="132"/>
        <source>How the designs did at {n} units</source>
        <translation>Resultados de los diseños con {n} unidades</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="134"/>
        <source>Design</source>
        <translation>Diseño</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="135"/>
        <source>Mean units surveyed</source>
        <translation>Media de unidades muestreadas</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="136"/>
        <source>Relative bias</source>
        <translation>Sesgo relativo</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="137"/>
        <source>Empirical SE (animals)</source>
        <translation>Error estándar empírico (animales)</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="329"/>
        <source>RMSE (animals)</source>
        <translation>RECM (animales)</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="139"/>
        <source>± Monte Carlo SE</source>
        <translation>± error estándar de Monte Carlo</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="140"/>
        <source>RMSE / total</source>
        <translation>RECM / total</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="141"/>
        <source>Mean estimated CV</source>
        <translation>CV estimado medio</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="142"/>
        <source>95 % interval coverage</source>
        <translation>Cobertura de los intervalos al 95 %</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="143"/>
        <source>Surveys without an estimate</source>
        <translation>Muestreos sin estimación</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="178"/>
        <source>RMSE of the abundance (animals)</source>
        <translation>RECM de la abundancia (animales)</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="178"/>
        <source>Root mean square error of the abundance estimate, by design (lower is better)</source>
        <translation>Raíz del error cuadrático medio de la estimación de la abundancia, por diseño (menor es mejor)</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="191"/>
        <source>Recommendation</source>
        <translation>Recomendación</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="193"/>
        <source>No design gave estimates: see the warnings.</source>
        <translation>Ningún diseño dio estimaciones: vea las advertencias.</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="235"/>
        <source>How the simulation works</source>
        <translation>Cómo funciona la simulación</translation>
    </message>
    <message>
        <location filename="../processing/report/demoreserve.py" line="43"/>
        <source>Area (km²)</source>
        <translation>Área (km²)</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="276"/>
        <source>Mean expected count per unit</source>
        <translation>Conteo esperado medio por unidad</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="277"/>
        <source>S_h (count SD per unit)</source>
        <translation>S_h (DE del conteo por unidad)</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="280"/>
        <source>Units, proportional</source>
        <translation>Unidades, proporcional</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="282"/>
        <source>Units, Neyman (best case)</source>
        <translation>Unidades, Neyman (mejor caso)</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="284"/>
        <source>Units, Neyman from a pilot (mean)</source>
        <translation>Unidades, Neyman a partir de un piloto (media)</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="310"/>
        <source>RMSE against the number of units</source>
        <translation>RECM frente al número de unidades</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="316"/>
        <source>number of units</source>
        <translation>número de unidades</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="316"/>
        <source>RMSE of the abundance estimate against the number of units</source>
        <translation>RECM de la estimación de la abundancia frente al número de unidades</translation>
    </message>
    <message>
        <location filename="../processing/report/trendpower.py" line="24"/>
        <source>Units</source>
        <translation>Unidades</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="336"/>
        <source>{a} → {b} units: RMSE {change:+.0%}</source>
        <translation>{a} → {b} unidades: RECM {change:+.0%}</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="341"/>
        <source>For {name}: </source>
        <translation>Para {name}: </translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="118"/>
        <source>{level} interval</source>
        <translation>intervalo al {level}</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="383"/>
        <source>animals per {unit}</source>
        <translation>animales por {unit}</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="378"/>
        <source>transects</source>
        <translation>transectos</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="378"/>
        <source>points</source>
        <translation>puntos</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="120"/>
        <source>estimated animals in the frame</source>
        <translation>animales estimados en el marco</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="188"/>
        <source>CV</source>
        <translation>CV</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="124"/>
        <source>detections used</source>
        <translation>detecciones usadas</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="128"/>
        <source>detection probability within the truncation distance</source>
        <translation>probabilidad de detección dentro de la distancia de truncamiento</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="129"/>
        <source>effective strip half-width (m)</source>
        <translation>semianchura efectiva de franja (m)</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="129"/>
        <source>effective detection radius (m)</source>
        <translation>radio efectivo de detección (m)</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="138"/>
        <source>the last band edge</source>
        <translation>el último límite de los intervalos</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="140"/>
        <source>automatic: the farthest 5 % of the distances left out</source>
        <translation>automático: se deja fuera el 5 % más lejano de las distancias</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="148"/>
        <source>{layer} (id field {field})</source>
        <translation>{layer} (campo identificador {field})</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="150"/>
        <source>{layer} (unit field {unit}, distance field {distance})</source>
        <translation>{layer} (campo de unidad {unit}, campo de distancia {distance})</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="152"/>
        <source>line transects</source>
        <translation>transectos lineales</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="152"/>
        <source>point transects</source>
        <translation>transectos puntuales</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="154"/>
        <source>none: exact distances</source>
        <translation>ninguno: distancias exactas</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="156"/>
        <source>one per stratum</source>
        <translation>una por estrato</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="156"/>
        <source>one for all strata</source>
        <translation>una para todos los estratos</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="159"/>
        <source>mean, or size-bias regression when larger groups are seen farther</source>
        <translation>media, o regresión del sesgo de tamaño si los grupos grandes se ven más lejos</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="161"/>
        <source>mean of the detected groups</source>
        <translation>media de los grupos detectados</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="162"/>
        <source>size-bias regression</source>
        <translation>regresión del sesgo de tamaño</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="167"/>
        <source>Transects or points</source>
        <translation>Transectos o puntos</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="167"/>
        <source>Survey type</source>
        <translation>Tipo de muestreo</translation>
    </message>
    <message>
        <location filename="../processing/report/panels.py" line="103"/>
        <source>none: one stratum</source>
        <translation>ninguno: un solo estrato</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="167"/>
        <source>Visits field</source>
        <translation>Campo de visitas</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="167"/>
        <source>Observations</source>
        <translation>Observaciones</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="167"/>
        <source>Group size field</source>
        <translation>Campo de tamaño de grupo</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="167"/>
        <source>none: each detection is one animal</source>
        <translation>ninguno: cada detección es un animal</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="204"/>
        <source>Strata (frame)</source>
        <translation>Estratos (marco)</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="167"/>
        <source>Truncation distance</source>
        <translation>Distancia de truncamiento</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="167"/>
        <source>Distance bands (m)</source>
        <translation>Intervalos de distancia (m)</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="167"/>
        <source>Key functions tried</source>
        <translation>Funciones clave probadas</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="167"/>
        <source>Most cosine terms per key</source>
        <translation>Número máximo de términos coseno por función clave</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="206"/>
        <source>Detection function</source>
        <translation>Función de detección</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="167"/>
        <source>Group size</source>
        <translation>Tamaño de grupo</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="206"/>
        <source>Area unit</source>
        <translation>Unidad de área</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="220"/>
        <source>Bootstrap resamples</source>
        <translation>Remuestreos bootstrap</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="194"/>
        <source>perpendicular distance from the line (m)</source>
        <translation>distancia perpendicular a la línea (m)</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="194"/>
        <source>Distances seen from the lines, with the fitted detection function scaled to the detections (its height at 0 is where every animal is seen)</source>
        <translation>Distancias observadas desde las líneas, con la función de detección ajustada escalada a las detecciones (su altura en 0 corresponde a ver todos los animales)</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="197"/>
        <source>distance from the point (m)</source>
        <translation>distancia al punto (m)</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="197"/>
        <source>Distances seen from the points, with the fitted probability density of the distances: it rises from 0 because there is more ground farther from a point, then falls as detection drops</source>
        <translation>Distancias observadas desde los puntos, con la densidad de probabilidad ajustada de las distancias: crece desde 0 porque hay más terreno lejos de un punto, y luego decrece a medida que baja la detección</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="207"/>
        <source>{n} of the {recorded} recorded detections lie within the truncation distance of {w:.1f} m and were used; {dropped} farther ones were left out.</source>
        <translation>{n} de las {recorded} detecciones registradas quedan dentro de la distancia de truncamiento de {w:.1f} m y se usaron; se dejaron fuera {dropped} más lejanas.</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="218"/>
        <source>detections per metre of distance</source>
        <translation>detecciones por metro de distancia</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="218"/>
        <source>fitted: {model}</source>
        <translation>ajustado: {model}</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="250"/>
        <source>Stratum {stratum}.</source>
        <translation>Estrato {stratum}.</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="237"/>
        <source>Effective half-width (m)</source>
        <translation>Semianchura efectiva (m)</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="237"/>
        <source>Effective radius (m)</source>
        <translation>Radio efectivo (m)</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="240"/>
        <source>AIC above the best</source>
        <translation>AIC por encima del mejor</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="241"/>
        <source>Detection probability within w</source>
        <translation>Probabilidad de detección dentro de w</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="242"/>
        <source>Fit, χ² p</source>
        <translation>Ajuste, p de χ²</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="243"/>
        <source>Fit, Cramér–von Mises p</source>
        <translation>Ajuste, p de Cramér–von Mises</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="244"/>
        <source>Chosen</source>
        <translation>Elegido</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="245"/>
        <source>Every model tried, in the order fitted ({n} detections). The smallest AIC is chosen; a fit p below 0.05 means the model misses the shape of the distances.</source>
        <translation>Cada modelo probado, en el orden de ajuste ({n} detecciones). Se elige el menor AIC; un p de ajuste inferior a 0.05 significa que el modelo no reproduce la forma de las distancias.</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="259"/>
        <source>Group size: {n} groups seen, mean size {mean:.3g}.</source>
        <translation>Tamaño de grupo: {n} grupos vistos, tamaño medio {mean:.3g}.</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="262"/>
        <source>The regression of ln(size) on the detection probability has slope {b:.3g} (p = {p:.3f}).</source>
        <translation>La regresión de ln(tamaño) sobre la probabilidad de detección tiene pendiente {b:.3g} (p = {p:.3f}).</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="266"/>
        <source>Larger groups are seen farther away, so the expected size where every group is seen, {e:.3g} (SE {se:.3g}), is used instead of the mean.</source>
        <translation>Los grupos grandes se ven más lejos, así que se usa en lugar de la media el tamaño esperado donde se ven todos los grupos, {e:.3g} (EE {se:.3g}).</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="270"/>
        <source>The mean is used (SE {se:.3g}).</source>
        <translation>Se usa la media (EE {se:.3g}).</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="284"/>
        <source>distance (m)</source>
        <translation>distancia (m)</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="284"/>
        <source>probability of detection</source>
        <translation>probabilidad de detección</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="286"/>
        <source>The best model of each key function: the probability of seeing an animal at each distance (1 on the line or at the point, by assumption)</source>
        <translation>El mejor modelo de cada función clave: la probabilidad de ver un animal a cada distancia (1 sobre la línea o en el punto, por hipótesis)</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="292"/>
        <source>Transects</source>
        <translation>Transectos</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="292"/>
        <source>Points</source>
        <translation>Puntos</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="293"/>
        <source>Line length (km)</source>
        <translation>Longitud de línea (km)</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="293"/>
        <source>Visits</source>
        <translation>Visitas</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="295"/>
        <source>Detections per km</source>
        <translation>Detecciones por km</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="295"/>
        <source>Detections per visit</source>
        <translation>Detecciones por visita</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="236"/>
        <source>Area ({unit})</source>
        <translation>Área ({unit})</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="299"/>
        <source>Detections</source>
        <translation>Detecciones</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="300"/>
        <source>Animals per {unit}</source>
        <translation>Animales por {unit}</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="38"/>
        <source>Lower limit</source>
        <translation>Límite inferior</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="38"/>
        <source>Upper limit</source>
        <translation>Límite superior</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="246"/>
        <source>df</source>
        <translation>gl</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="314"/>
        <source>bootstrap percentile limits</source>
        <translation>límites de percentiles bootstrap</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="314"/>
        <source>log-normal limits with t</source>
        <translation>límites log-normales con t</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="316"/>
        <source>Density by stratum, {method} at {level}.</source>
        <translation>Densidad por estrato, {method} al {level}.</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="320"/>
        <source>Animals</source>
        <translation>Animales</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="320"/>
        <source>Abundance in the frame, limits at {level}.</source>
        <translation>Abundancia en el marco, límites al {level}.</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="328"/>
        <source>For comparison: the abundance&apos;s delta-method interval (log-normal with t).</source>
        <translation>Para comparar: el intervalo de la abundancia por el método delta (log-normal con t).</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="342"/>
        <source>Share from the encounter rate</source>
        <translation>Parte de la tasa de encuentro</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="343"/>
        <source>Share from the detection function</source>
        <translation>Parte de la función de detección</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="344"/>
        <source>Share from group size</source>
        <translation>Parte del tamaño de grupo</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="345"/>
        <source>Where the uncertainty comes from: each part's share of CV² (delta method). A large encounter-rate share calls for more transects; a large detection share for more detections.</source>
        <translation>De dónde procede la incertidumbre: la parte de cada componente en el CV² (método delta). Una parte grande de la tasa de encuentro pide más transectos; una parte grande de la detección, más detecciones.</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="351"/>
        <source>Density and abundance</source>
        <translation>Densidad y abundancia</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="359"/>
        <source>Density by stratum with {level} intervals</source>
        <translation>Densidad por estrato con intervalos al {level}</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="372"/>
        <source>lowest: {value:.3g}</source>
        <translation>mínimo: {value:.3g}</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="373"/>
        <source>highest: {value:.3g}</source>
        <translation>máximo: {value:.3g}</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="384"/>
        <source>Strata shaded by density (animals per {unit}), with the surveyed {what}</source>
        <translation>Estratos sombreados según la densidad (animales por {unit}), con los {what} muestreados</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="391"/>
        <source>Each detection function is a key (half-normal, hazard-rate or uniform) with up to the chosen number of cosine terms, fitted to the distances by maximum likelihood; terms are added one at a time while AIC falls, under the constraint that detection never rises with distance, and the model with the smallest AIC is used (Buckland et al. 2001).</source>
        <translation>Cada función de detección es una función clave (seminormal, tasa de riesgo o uniforme) con hasta el número elegido de términos coseno, ajustada a las distancias por máxima verosimilitud; los términos se añaden de uno en uno mientras el AIC baja, con la restricción de que la detección nunca crezca con la distancia, y se usa el modelo con el menor AIC (Buckland et al. 2001).</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="398"/>
        <source>Density in a stratum is D = n·E(s) / (2·w·L·P), with n the groups seen within the truncation distance w, L the line length, P the probability of seeing a group within w and E(s) the expected group size (Buckland et al. 2001).</source>
        <translation>La densidad en un estrato es D = n·E(s) / (2·w·L·P), con n los grupos vistos dentro de la distancia de truncamiento w, L la longitud de línea, P la probabilidad de ver un grupo dentro de w y E(s) el tamaño de grupo esperado (Buckland et al. 2001).</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="404"/>
        <source>Density in a stratum is D = n·E(s) / (k·π·w²·P), with n the groups seen within the truncation distance w, k the number of point visits, P the probability of seeing a group within w and E(s) the expected group size (Buckland et al. 2001).</source>
        <translation>La densidad en un estrato es D = n·E(s) / (k·π·w²·P), con n los grupos vistos dentro de la distancia de truncamiento w, k el número de visitas a los puntos, P la probabilidad de ver un grupo dentro de w y E(s) el tamaño de grupo esperado (Buckland et al. 2001).</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="409"/>
        <source>The squared CV of the density is the sum of those of the encounter rate, of P and of E(s) (delta method). The encounter rate's variance comes from the differences between transects within each stratum (estimator R2 of Fewster et al. 2009), that of P from the curvature of the likelihood, that of E(s) from the spread of group sizes. Intervals are log-normal, D/C to D·C with C = exp(t·√ln(1 + CV²)), t with Satterthwaite's degrees of freedom (Buckland et al. 2001). With one detection function for all strata, its uncertainty is shared by every stratum and counted once in the overall estimate.</source>
        <translation>El CV al cuadrado de la densidad es la suma de los de la tasa de encuentro, de P y de E(s) (método delta). La varianza de la tasa de encuentro procede de las diferencias entre transectos dentro de cada estrato (estimador R2 de Fewster et al. 2009), la de P de la curvatura de la verosimilitud y la de E(s) de la dispersión de los tamaños de grupo. Los intervalos son log-normales, de D/C a D·C con C = exp(t·√ln(1 + CV²)), t con los grados de libertad de Satterthwaite (Buckland et al. 2001). Con una sola función de detección para todos los estratos, su incertidumbre la comparten todos los estratos y se cuenta una sola vez en la estimación global.</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="418"/>
        <source>The intervals reported are bootstrap percentile intervals: {b} resamples drawn from the recorded seed, each taking as many transects or points per stratum as were surveyed, with replacement, refitting the chosen detection function and group size to their detections (AIC is not rerun). {f} resamples could not be fitted.</source>
        <translation>Los intervalos presentados son intervalos bootstrap de percentiles: {b} remuestreos tomados con la semilla registrada, cada uno con tantos transectos o puntos por estrato como se muestrearon, con reposición, reajustando a sus detecciones la función de detección elegida y el tamaño de grupo (el AIC no se repite). No se pudieron ajustar {f} remuestreos.</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="427"/>
        <source>Assumptions and cautions</source>
        <translation>Supuestos y precauciones</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="428"/>
        <source>The estimate is only as good as three things that happened in the field:</source>
        <translation>La estimación solo es tan buena como tres cosas que ocurrieron en el campo:</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="431"/>
        <source>Animals on the line are always seen. Any missed there makes the estimate too low by the same share, and no interval shows it.</source>
        <translation>Los animales sobre la línea se ven siempre. Cualquiera que no se vea allí hace la estimación demasiado baja en la misma proporción, y ningún intervalo lo muestra.</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="435"/>
        <source>Animals at the point are always seen. Any missed there makes the estimate too low by the same share, and no interval shows it.</source>
        <translation>Los animales en el punto se ven siempre. Cualquiera que no se vea allí hace la estimación demasiado baja en la misma proporción, y ningún intervalo lo muestra.</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="438"/>
        <source>Distances are measured accurately, with a rangefinder and compass where possible. Rounding to round numbers, or guessing, distorts the detection function; distance bands are then safer.</source>
        <translation>Las distancias se miden con precisión, con telémetro y brújula cuando sea posible. Redondear a números redondos, o estimar a ojo, deforma la función de detección; los intervalos de distancia son entonces más seguros.</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="441"/>
        <source>Animals do not move before they are detected: animals fleeing from the observer look like a detection function that falls too early, and animals drawn to the observer like one that falls too late.</source>
        <translation>Los animales no se mueven antes de ser detectados: los animales que huyen del observador parecen una función de detección que cae demasiado pronto, y los atraídos por el observador, una que cae demasiado tarde.</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="445"/>
        <source>The transects or points were placed at random (or on a randomly placed grid) with respect to the animals, and each stratum&apos;s estimate covers its polygons only: tracks and roads are not random lines.</source>
        <translation>Los transectos o los puntos se colocaron al azar (o sobre una cuadrícula colocada al azar) respecto a los animales, y la estimación de cada estrato solo cubre sus polígonos: las pistas y los caminos no son líneas aleatorias.</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="467"/>
        <source>Density from detection distances</source>
        <translation>Densidad a partir de las distancias de detección</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="88"/>
        <source>Naive occupancy from presence data</source>
        <translation>Ocupación ingenua a partir de datos de presencia</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="88"/>
        <source>Density and abundance estimate</source>
        <translation>Estimación de la densidad y la abundancia</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="107"/>
        <source>proportion of units occupied (naive)</source>
        <translation>proporción de unidades ocupadas (ingenua)</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="107"/>
        <source>occupied units</source>
        <translation>unidades ocupadas</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="110"/>
        <source>density per {unit}</source>
        <translation>densidad por {unit}</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="110"/>
        <source>animals</source>
        <translation>animales</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="119"/>
        <source>0 – {hi} (one-sided)</source>
        <translation>0 – {hi} (unilateral)</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="125"/>
        <source>estimated {what} in the frame</source>
        <translation>estimación de {what} en el marco</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="129"/>
        <source>units surveyed</source>
        <translation>unidades muestreadas</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="132"/>
        <source>true total of the simulated population</source>
        <translation>total verdadero de la población simulada</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="138"/>
        <source>covers</source>
        <translation>contiene</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="138"/>
        <source>misses</source>
        <translation>no contiene</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="160"/>
        <source>t with Satterthwaite degrees of freedom</source>
        <translation>t con los grados de libertad de Satterthwaite</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="161"/>
        <source>log-normal (with t)</source>
        <translation>log-normal (con t)</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="162"/>
        <source>stratified percentile bootstrap</source>
        <translation>bootstrap estratificado de percentiles</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="166"/>
        <source>local neighbourhood (Stevens &amp; Olsen 2003)</source>
        <translation>vecindario local (Stevens &amp; Olsen 2003)</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="167"/>
        <source>local neighbourhood, scaled to the simple formula (our variant)</source>
        <translation>vecindario local, escalado a la fórmula simple (nuestra variante)</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="177"/>
        <source>plus sampling (units count only inside their stratum)</source>
        <translation>muestreo «plus» (las unidades solo cuentan dentro de su estrato)</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="178"/>
        <source>units kept wholly inside their stratum</source>
        <translation>unidades mantenidas por completo dentro de su estrato</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="179"/>
        <source>no record: whole units</source>
        <translation>sin registro: unidades enteras</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="181"/>
        <source>field {field} (m²)</source>
        <translation>campo {field} (m²)</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="181"/>
        <source>polygon area</source>
        <translation>área del polígono</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="187"/>
        <source>strip width</source>
        <translation>ancho de franja</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="189"/>
        <source>fixed</source>
        <translation>fija</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="191"/>
        <source>asked for; applied in strata {yes}, refused in {no} (units may overlap)</source>
        <translation>solicitada; aplicada en los estratos {yes}, rechazada en {no} (las unidades pueden solaparse)</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="198"/>
        <source>Sample units</source>
        <translation>Unidades de muestreo</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="148"/>
        <source>Count field</source>
        <translation>Campo de conteo</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="200"/>
        <source> (presence/absence)</source>
        <translation> (presencia/ausencia)</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="203"/>
        <source>Unit area</source>
        <translation>Área de la unidad</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="331"/>
        <source>Interval</source>
        <translation>Intervalo</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="209"/>
        <source>Variance estimator</source>
        <translation>Estimador de la varianza</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="211"/>
        <source>Edge protocol of the units</source>
        <translation>Protocolo de borde de las unidades</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="212"/>
        <source>Detection probability p</source>
        <translation>Probabilidad de detección p</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="215"/>
        <source>Target CV for the next survey</source>
        <translation>CV objetivo para el próximo muestreo</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="223"/>
        <source>not used (no random draws without the bootstrap)</source>
        <translation>no se usa (sin sorteos aleatorios sin el bootstrap)</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="233"/>
        <source>Estimates by stratum</source>
        <translation>Estimaciones por estrato</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="237"/>
        <source>Units (n)</source>
        <translation>Unidades (n)</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="238"/>
        <source>Not surveyed</source>
        <translation>No muestreadas</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="239"/>
        <source>Mean count</source>
        <translation>Conteo medio</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="240"/>
        <source>SD of counts</source>
        <translation>DE de los conteos</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="280"/>
        <source>Occupied units</source>
        <translation>Unidades ocupadas</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="280"/>
        <source>Abundance</source>
        <translation>Abundancia</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="258"/>
        <source>Units next time (n_next)</source>
        <translation>Unidades la próxima vez (n_next)</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="273"/>
        <source>{what}, limits at {level}.</source>
        <translation>{what}, límites al {level}.</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="280"/>
        <source>{what} in the frame, limits at {level}.</source>
        <translation>{what} en el marco, límites al {level}.</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="315"/>
        <source>Non-response: {n} unit(s) were not surveyed (no count) and were left out: {ids}.</source>
        <translation>No respuesta: {n} unidad(es) no se muestrearon (sin conteo) y se dejaron fuera: {ids}.</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="321"/>
        <source>{n} unused reserve unit(s) without a count were skipped.</source>
        <translation>Se omitieron {n} unidad(es) de reserva no usada(s) sin conteo.</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="330"/>
        <source>The overall interval by method</source>
        <translation>El intervalo global según el método</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="331"/>
        <source>Used in the outputs</source>
        <translation>Usado en las salidas</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="362"/>
        <source>overall abundance in a resample</source>
        <translation>abundancia global en un remuestreo</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="362"/>
        <source>resamples</source>
        <translation>remuestreos</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="362"/>
        <source>{level} percentile limits</source>
        <translation>límites de percentiles al {level}</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="362"/>
        <source>The {n:,} bootstrap resamples of the overall abundance</source>
        <translation>Los {n:,} remuestreos bootstrap de la abundancia global</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="384"/>
        <source>true density (simulation)</source>
        <translation>densidad verdadera (simulación)</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="394"/>
        <source>{what} by stratum with {level} confidence intervals</source>
        <translation>{what} por estrato con intervalos de confianza al {level}</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="409"/>
        <source>lowest</source>
        <translation>mínimo</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="409"/>
        <source>highest</source>
        <translation>máximo</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="420"/>
        <source>surveyed units</source>
        <translation>unidades muestreadas</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="430"/>
        <source>not surveyed</source>
        <translation>no muestreadas</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="439"/>
        <source>Strata shaded by {what}, with the units</source>
        <translation>Estratos sombreados según {what}, con las unidades</translation>
    </message>
    <message>
        <location filename="../processing/report/trendpower.py" line="177"/>
        <source>Cautions</source>
        <translation>Precauciones</translation>
    </message>
    <message>
        <location filename="../processing/report/allocate.py" line="196"/>
        <source>Expected precision uses the pilot figures as if they were the truth, with the finite-population correction 1 − n_h·a/A_h, since the layout named draws units that do not overlap (Cochran 1977, ch. 5). Real precision depends on the counts the survey finds.</source>
        <translation>La precisión esperada usa las cifras piloto como si fueran la verdad, con la corrección por población finita 1 − n_h·a/A_h, ya que la disposición indicada sortea unidades que no se solapan (Cochran 1977, cap. 5). La precisión real depende de los conteos que obtenga el muestreo.</translation>
    </message>
    <message>
        <location filename="../processing/report/allocate.py" line="196"/>
        <source>Expected precision uses the pilot figures as if they were the truth, without a finite-population correction: a simple random layout&apos;s units may overlap, so their possible positions are a continuous population (Cordy 1993). Real precision depends on the counts the survey finds.</source>
        <translation>La precisión esperada usa las cifras piloto como si fueran la verdad, sin corrección por población finita: las unidades de una disposición aleatoria simple pueden solaparse, así que sus posiciones posibles forman una población continua (Cordy 1993). La precisión real depende de los conteos que obtenga el muestreo.</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="168"/>
        <source>Each figure is itself an estimate from {reps} simulated surveys: relative biases within about ±{noise:.1%} cannot be told from zero, and RMSEs closer than two Monte Carlo SEs are a tie. More surveys per design narrow both.</source>
        <translation>Cada cifra es a su vez una estimación a partir de {reps} muestreos simulados: sesgos relativos de en torno a ±{noise:.1%} no se distinguen de cero, y RECM más próximas que dos errores estándar de Monte Carlo son un empate. Más muestreos por diseño estrechan ambos.</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="195"/>
        <source>{name} gave the lowest root mean square error ({rmse:,.1f} animals, {rel:.1%} of the mean true total of {total:,.0f}) among the designs whose 95 % intervals held the truth at least 90 % of the time.</source>
        <translation>{name} dio la menor raíz del error cuadrático medio ({rmse:,.1f} animales, {rel:.1%} del total verdadero medio de {total:,.0f}) entre los diseños cuyos intervalos al 95 % contuvieron la verdad al menos el 90 % de las veces.</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="202"/>
        <source>{others} did about as well: the differences lie within the Monte Carlo error of the simulation. Among these, choose the one that is easiest to carry out in the field.</source>
        <translation>{others} lo hicieron casi igual de bien: las diferencias quedan dentro del error de Monte Carlo de la simulación. Entre ellos, elija el más fácil de llevar a cabo en el terreno.</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="214"/>
        <source>The intervals of {names} held the truth less than 90 % of the time: their stated precision would mislead.</source>
        <translation>Los intervalos de {names} contuvieron la verdad menos del 90 % de las veces: su precisión declarada induciría a error.</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="224"/>
        <source>The systematic grid&apos;s number of units varies from survey to survey (mean shown). With the simple random sampling formula its interval is usually conservative on smooth surfaces.</source>
        <translation>El número de unidades de la cuadrícula sistemática varía de un muestreo a otro (se muestra la media). Con la fórmula del muestreo aleatorio simple su intervalo suele ser conservador en superficies suaves.</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="236"/>
        <source>Each simulated survey draws a population on the surface: Poisson counts in every surface cell, or negative binomial counts (gamma-Poisson) when k is above 0. All designs survey the same populations. Every design is laid out with the layout engine and follows the real chain&apos;s edge protocol: by default plus sampling, with centres over each stratum (or the frame) grown by the unit&apos;s reach (and half a surface cell), each unit counting the animals of the cells of its own stratum whose centres it covers, with its nominal area, and the estimation engine expanding the counts to the grown area (Gregoire &amp; Valentine 2008, ch. 10); the abundance is the ratio estimator with its t interval (Satterthwaite degrees of freedom). Each estimate is judged against the true total of its own population.</source>
        <translation>Cada muestreo simulado genera una población sobre la superficie: conteos de Poisson en cada celda, o conteos binomiales negativos (gamma-Poisson) cuando k es mayor que 0. Todos los diseños muestrean las mismas poblaciones. Cada diseño se dispone con el motor de disposición y sigue el protocolo de borde de la cadena real: por defecto el muestreo «plus», con centros sobre cada estrato (o el marco) ampliado en el alcance de la unidad (y media celda de la superficie), cada unidad contando los animales de las celdas de su propio estrato cuyos centros cubre, con su área nominal, y el motor de estimación extendiendo los conteos al área ampliada (Gregoire &amp; Valentine 2008, cap. 10); la abundancia es el estimador de razón con su intervalo t (grados de libertad de Satterthwaite). Cada estimación se juzga frente al total verdadero de su propia población.</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="250"/>
        <source>The stratified Neyman design with the true S_h is the best case: it allocates with the standard deviations the surface implies, which no survey knows. The pilot-based Neyman design estimates S_h in every simulated survey from a pilot of {pilot} simple random units per stratum (an independent realisation: a pilot season), as a survey would; its pilot units are not counted in its n.</source>
        <translation>El diseño estratificado de Neyman con la S_h verdadera es el mejor caso: asigna con las desviaciones estándar que implica la superficie, que ningún muestreo conoce. El diseño de Neyman basado en un piloto estima S_h en cada muestreo simulado a partir de un piloto de {pilot} unidades aleatorias simples por estrato (una realización independiente: una temporada piloto), como lo haría un muestreo; sus unidades piloto no se cuentan en su n.</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="259"/>
        <source>Assumptions: the surface is the truth, every animal in a unit is counted (no detection error), animals do not move during the survey, and every unit can be reached. Real surveys meet none of these exactly; use the comparison to rank designs and to size the effort, not as a promise of precision.</source>
        <translation>Supuestos: la superficie es la verdad, se cuenta cada animal de una unidad (sin error de detección), los animales no se mueven durante el muestreo y se puede llegar a cada unidad. Ningún muestreo real cumple exactamente ninguno de ellos; use la comparación para ordenar los diseños y dimensionar el esfuerzo, no como una promesa de precisión.</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="298"/>
        <source>S_h is the standard deviation of one unit's count in the stratum implied by the surface: the spread of the expected counts over {draws} random unit positions plus the Poisson (and negative binomial) variation about them. Neyman allocation gives each stratum units in proportion to A_h·S_h (Neyman 1934; Cochran 1977, §5.5), with at least 2 per stratum.</source>
        <translation>S_h es la desviación estándar del conteo de una unidad en el estrato implicada por la superficie: la dispersión de los conteos esperados sobre {draws} posiciones aleatorias de unidades más la variación de Poisson (y binomial negativa) en torno a ellos. La asignación de Neyman da a cada estrato unidades en proporción a A_h·S_h (Neyman 1934; Cochran 1977, §5.5), con al menos 2 por estrato.</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="346"/>
        <source>The RMSE of a design falls roughly as 1/√n: doubling the units lowers it by about 30 %. Where the curve flattens, more units buy little; spend the effort on better counts (detection) or a better surface instead.</source>
        <translation>La RECM de un diseño disminuye aproximadamente como 1/√n: duplicar las unidades la reduce en torno a un 30 %. Donde la curva se aplana, más unidades aportan poco; dedique mejor el esfuerzo a mejores conteos (detección) o a una mejor superficie.</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="138"/>
        <source>Simulation only: the true total ({truth:,.0f}) is known here because the population was simulated. The estimate is {est:,.0f} ({error:+.1%} from the truth), and the {level} interval {verdict} the truth. Only a simulation can show this; a real survey never knows its true total, and one survey&apos;s interval may miss it by chance (about {miss:.0%} of surveys should).</source>
        <translation>Solo simulación: el total verdadero ({truth:,.0f}) se conoce aquí porque la población se simuló. La estimación es {est:,.0f} ({error:+.1%} respecto a la verdad), y el intervalo al {level} {verdict} la verdad. Solo una simulación puede mostrarlo; un muestreo real nunca conoce su total verdadero, y el intervalo de un muestreo puede no contenerlo por azar (debería ocurrir en torno al {miss:.0%} de los muestreos).</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="297"/>
        <source>† Every count was 0: the estimate is 0 and the interval runs from 0 to the one-sided upper limit −ln(1 − {level}) · A / Σa of a Poisson count of 0 (Garwood 1936; about 3 · A / Σa at 95 %), divided by p with detection. For the frame it assumes one density over the strata.</source>
        <translation>† Todos los conteos fueron 0: la estimación es 0 y el intervalo va de 0 al límite superior unilateral −ln(1 − {level}) · A / Σa de un conteo de Poisson de 0 (Garwood 1936; unas 3 · A / Σa al 95 %), dividido por p con detección. Para el marco supone una sola densidad en los estratos.</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="306"/>
        <source>The frame shrank: strata {strata} had no surveyed unit and were left out ({area:,.3g} {unit}). The estimate covers the remaining strata only.</source>
        <translation>El marco se redujo: los estratos {strata} no tenían unidades muestreadas y se dejaron fuera ({area:,.3g} {unit}). La estimación solo cubre los estratos restantes.</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="350"/>
        <source>The t interval is symmetric about the estimate; the log-normal interval is skewed to the right like the sampling distribution of a count-based estimate, and suits small samples of clumped animals better. Choose the method before looking at the results.</source>
        <translation>El intervalo t es simétrico respecto a la estimación; el intervalo log-normal es asimétrico hacia la derecha, como la distribución muestral de una estimación basada en conteos, y se adapta mejor a muestras pequeñas de animales agregados. Elija el método antes de mirar los resultados.</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="448"/>
        <source>Each stratum&apos;s value is the proportion of its surveyed units where the species was detected; the frame&apos;s value weights the strata by the number of units they hold (area / unit area). This is naive occupancy: it is not corrected for detection, so it understates true occupancy whenever the species can be present and missed. Detection-corrected occupancy needs repeat visits to the same units (occupancy models).</source>
        <translation>El valor de cada estrato es la proporción de sus unidades muestreadas donde se detectó la especie; el valor del marco pondera los estratos por el número de unidades que contienen (área / área de la unidad). Es la ocupación ingenua: no está corregida por la detección, por lo que subestima la ocupación real siempre que la especie pueda estar presente y pasar inadvertida. La ocupación corregida por la detección requiere visitas repetidas a las mismas unidades (modelos de ocupación).</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="459"/>
        <source>Density in each stratum is the total count divided by the total surveyed area, D_h = Σy/Σa (the ratio estimator, Cochran 1977, ch. 6), with the linearised variance v(D_h) = (1 − f_h)/(n_h ā_h²) · Σ(y − D_h a)²/(n_h − 1), where f_h = Σa/A_h when the finite-population correction applies and 0 otherwise. Abundance is N_h = D_h A_h; the frame's abundance is the sum over strata, its variance the sum of the strata variances, and its density N / Σ A_h (Cochran 1977, ch. 5).</source>
        <translation>La densidad de cada estrato es el conteo total dividido por el área total muestreada, D_h = Σy/Σa (el estimador de razón, Cochran 1977, cap. 6), con la varianza linealizada v(D_h) = (1 − f_h)/(n_h ā_h²) · Σ(y − D_h a)²/(n_h − 1), donde f_h = Σa/A_h cuando se aplica la corrección por población finita y 0 en otro caso. La abundancia es N_h = D_h A_h; la abundancia del marco es la suma sobre los estratos, su varianza la suma de las varianzas de los estratos y su densidad N / Σ A_h (Cochran 1977, cap. 5).</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="471"/>
        <source>Edges: the units were laid out by plus sampling (Gregoire &amp; Valentine 2008, ch. 10): their centres were drawn over each stratum grown by the unit's reach, and each unit counts only the animals inside its own stratum. Every animal then has the same chance of being counted, and the counts expand to the grown area A⁺_h: N_h = A⁺_h Σy/Σa (column of the expansion areas in the output).</source>
        <translation>Bordes: las unidades se dispusieron por muestreo «plus» (Gregoire &amp; Valentine 2008, cap. 10): sus centros se sortearon sobre cada estrato ampliado en el alcance de la unidad, y cada unidad solo cuenta los animales dentro de su propio estrato. Cada animal tiene entonces la misma probabilidad de ser contado, y los conteos se extienden al área ampliada A⁺_h: N_h = A⁺_h Σy/Σa (columna de las áreas de expansión en la salida).</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="481"/>
        <source>Edges: the units were kept wholly inside their strata, so no unit reaches the band within a unit&apos;s reach of the edge; the estimate carries the inner density over that band. Where the animals near the edge differ (a shore, a forest edge), it is biased; plus sampling (INSIDE off) is not.</source>
        <translation>Bordes: las unidades se mantuvieron por completo dentro de sus estratos, así que ninguna unidad alcanza la franja situada a menos de un alcance de unidad del borde; la estimación traslada la densidad interior a esa franja. Donde los animales cercanos al borde difieren (una orilla, el borde de un bosque), está sesgada; el muestreo «plus» (INSIDE desactivado) no lo está.</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="494"/>
        <source>Detection: estimates are divided by p = {p:g}, and the squared CVs of the count estimate and of p (SE {se:g}, CV {cv:.3f}) add (delta method, Seber 1982). The degrees of freedom of the two parts combine by Satterthwaite's rule, df = CV⁴ / (CV_n⁴/df_n + CV_p⁴/df_p) (Buckland et al. 2001, eq. 3.75), with df_p = {df} for p.</source>
        <translation>Detección: las estimaciones se dividen por p = {p:g}, y los CV al cuadrado de la estimación de los conteos y de p (EE {se:g}, CV {cv:.3f}) se suman (método delta, Seber 1982). Los grados de libertad de ambas partes se combinan por la regla de Satterthwaite, df = CV⁴ / (CV_n⁴/df_n + CV_p⁴/df_p) (Buckland et al. 2001, ec. 3.75), con df_p = {df} para p.</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="506"/>
        <source>Next survey: n_next is the number of units each stratum needs for a CV of {cv:g} of the overall abundance, by Neyman allocation n_h ∝ M_h S_h on the standard deviations the variance estimator implies now (Neyman 1934; Cochran 1977, eq. 5.26), at least 2 and at most the units a stratum holds. The observed SDs are themselves uncertain, especially from few units.</source>
        <translation>Próximo muestreo: n_next es el número de unidades que cada estrato necesita para un CV de {cv:g} de la abundancia global, por asignación de Neyman n_h ∝ M_h S_h sobre las desviaciones estándar que implica ahora el estimador de la varianza (Neyman 1934; Cochran 1977, ec. 5.26), al menos 2 y como máximo las unidades que contiene un estrato. Las DE observadas son a su vez inciertas, sobre todo con pocas unidades.</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="518"/>
        <source>Intervals use Student's t with Satterthwaite's effective degrees of freedom, ν = (Σ v_h)² / Σ (v_h² / ν_h) (Satterthwaite 1946; Cochran 1977, ch. 5). Lower limits below 0 are shown as 0.</source>
        <translation>Los intervalos usan la t de Student con los grados de libertad efectivos de Satterthwaite, ν = (Σ v_h)² / Σ (v_h² / ν_h) (Satterthwaite 1946; Cochran 1977, cap. 5). Los límites inferiores por debajo de 0 se muestran como 0.</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="518"/>
        <source>Intervals are log-normal: N/C to N·C with C = exp(t_df · √ln(1 + CV²)), t with the estimate's Satterthwaite degrees of freedom (Buckland et al. 2001, §3.6.1; the normal quantile only for infinite df, Burnham et al. 1987). They are asymmetric and never go below 0.</source>
        <translation>Los intervalos son log-normales: de N/C a N·C con C = exp(t_df · √ln(1 + CV²)), t con los grados de libertad de Satterthwaite de la estimación (Buckland et al. 2001, §3.6.1; el cuantil normal solo para gl infinitos, Burnham et al. 1987). Son asimétricos y nunca bajan de 0.</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="518"/>
        <source>Intervals are rescaled stratified percentile bootstrap intervals, from {b:,} resamples drawn from the recorded seed: in each stratum n − 1 units are drawn with replacement and their density is moved towards the stratum's estimate by the factor √(1 − f), so that the resamples vary as much as the stratified variance says, with the finite-population correction where it applies (Rao &amp; Wu 1988; Efron &amp; Tibshirani 1993).</source>
        <translation>Los intervalos son intervalos bootstrap estratificados de percentiles reescalados, a partir de {b:,} remuestreos tomados con la semilla registrada: en cada estrato se toman n − 1 unidades con reposición y su densidad se acerca a la estimación del estrato por el factor √(1 − f), de modo que los remuestreos varían tanto como indica la varianza estratificada, con la corrección por población finita donde se aplica (Rao &amp; Wu 1988; Efron &amp; Tibshirani 1993).</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="548"/>
        <source>Variances use the local neighbourhood estimator of Stevens &amp; Olsen (2003): each unit and its three nearest units in the stratum form a neighbourhood with weights that sum to 1 over each neighbourhood and over each unit, and v = Σ_i Σ_j w_ij (z_j − z̄_i)². Its degrees of freedom are those of a quadratic form, (tr Q)² / tr Q² (Box 1954), and the bootstrap spreads its resamples to the same variance. For a simple random layout use the simple formula.</source>
        <translation>Las varianzas usan el estimador de vecindario local de Stevens &amp; Olsen (2003): cada unidad y sus tres unidades más próximas en el estrato forman un vecindario, con pesos que suman 1 en cada vecindario y en cada unidad, y v = Σ_i Σ_j w_ij (z_j − z̄_i)². Sus grados de libertad son los de una forma cuadrática, (tr Q)² / tr Q² (Box 1954), y el bootstrap dispersa sus remuestreos hasta la misma varianza. Para una disposición aleatoria simple use la fórmula simple.</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="559"/>
        <source>Our variant: the double sum is multiplied by n / Σ_i (1 − Σ_j w_ij²), so that it agrees on average with the simple formula where the population has no spatial pattern; the published sum falls about a quarter short there. This scaling is ours, not Stevens &amp; Olsen's.</source>
        <translation>Nuestra variante: la doble suma se multiplica por n / Σ_i (1 − Σ_j w_ij²), para que coincida en promedio con la fórmula simple donde la población no tiene estructura espacial; la suma publicada se queda allí corta en alrededor de un cuarto. Este escalado es nuestro, no de Stevens &amp; Olsen.</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="568"/>
        <source>Strata with one surveyed unit were paired with a partner fixed before the counts were seen (the stratum sharing the longest edge on the map, or else the next stratum in id order). Two one-unit strata share the pairs formula v = 4 (A_2 Ŷ_1 − A_1 Ŷ_2)² / (A_1 + A_2)² (Cochran 1977, §5A.12, with the weights of Hansen, Hurwitz &amp; Madow 1953); a one-unit stratum paired with a stratum of several units takes (D̂_1 − D̂_2)² − v(D̂_2), at least the variance one unit has with the partner's spread, while the partner keeps its own variance. Differences between the paired strata count as variance, so these standard errors tend to be too large; each such stratum has 1 degree of freedom.</source>
        <translation>Los estratos con una sola unidad muestreada se emparejaron con una pareja fijada antes de ver los conteos (el estrato que comparte el límite más largo en el mapa o, si no, el siguiente estrato en el orden de identificadores). Dos estratos de una sola unidad comparten la fórmula de pares v = 4 (A_2 Ŷ_1 − A_1 Ŷ_2)² / (A_1 + A_2)² (Cochran 1977, §5A.12, con los pesos de Hansen, Hurwitz &amp; Madow 1953); un estrato de una sola unidad emparejado con un estrato de varias unidades toma (D̂_1 − D̂_2)² − v(D̂_2), como mínimo la varianza que tiene una unidad con la dispersión de la pareja, mientras que la pareja conserva su propia varianza. Las diferencias entre los estratos emparejados cuentan como varianza, por lo que estos errores estándar tienden a ser demasiado grandes; cada uno de esos estratos tiene 1 grado de libertad.</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="585"/>
        <source>The finite-population correction was refused in strata {ids}: their units come from a simple random layout whose units may overlap, a continuous population of possible units, which has no such correction (Cordy 1993).</source>
        <translation>La corrección por población finita se rechazó en los estratos {ids}: sus unidades proceden de una disposición aleatoria simple cuyas unidades pueden solaparse, una población continua de unidades posibles, que no tiene tal corrección (Cordy 1993).</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="594"/>
        <source>The finite-population correction assumes that the units do not overlap and were drawn without replacement from the units that tile each stratum. The units carry no design record (they did not come from plotwise:layout), so this could not be checked: if they may overlap, switch the correction off.</source>
        <translation>La corrección por población finita supone que las unidades no se solapan y se sortearon sin reposición entre las unidades que teselan cada estrato. Las unidades no llevan registro de diseño (no proceden de plotwise:layout), así que esto no pudo comprobarse: si pueden solaparse, desactive la corrección.</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="607"/>
        <source>The inference covers the sampling frame only: the strata polygons given here. It says nothing about land outside them (excluded areas, inaccessible ground, neighbouring land).</source>
        <translation>La inferencia solo cubre el marco de muestreo: los polígonos de estratos dados aquí. No dice nada del terreno fuera de ellos (zonas excluidas, terreno inaccesible, tierras vecinas).</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="615"/>
        <source>Presence data: a non-detection is not an absence. Naive occupancy needs repeat visits before it can be corrected for detection.</source>
        <translation>Datos de presencia: una no detección no es una ausencia. La ocupación ingenua necesita visitas repetidas para poder corregirse por la detección.</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="623"/>
        <source>Detection: p must come from a separate study (double observers, marked animals, distance sampling) of the same species, season, habitat and observers. If the detection in this survey differs, the estimate is biased by the same factor, and no interval here shows it.</source>
        <translation>Detección: p debe proceder de un estudio aparte (doble observador, animales marcados, muestreo de distancias) de la misma especie, estación, hábitat y observadores. Si la detección en este muestreo difiere, la estimación está sesgada en el mismo factor, y ningún intervalo de aquí lo muestra.</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="632"/>
        <source>Detection: with p = 1 the estimate assumes every animal in a surveyed unit was counted. Animals missed make it too low, and the interval does not show that bias.</source>
        <translation>Detección: con p = 1 la estimación supone que se contó cada animal de una unidad muestreada. Los animales no vistos la hacen demasiado baja, y el intervalo no muestra ese sesgo.</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="639"/>
        <source>The design the units came from: the formulas assume the units were placed at random within each stratum with equal chances (simple random, systematic grid or spatially balanced layout), that unsurveyed units are missing by chance, and that reserve units replaced primaries in draw order. Units chosen for convenience (near roads or camps) or skipped because of what was expected there bias the estimate in ways no standard error shows.</source>
        <translation>El diseño del que proceden las unidades: las fórmulas suponen que las unidades se colocaron al azar dentro de cada estrato con probabilidades iguales (disposición aleatoria simple, en cuadrícula sistemática o espacialmente equilibrada), que las unidades no muestreadas faltan por azar y que las unidades de reserva sustituyeron a las principales en orden de sorteo. Las unidades elegidas por comodidad (cerca de caminos o campamentos) u omitidas por lo que se esperaba encontrar en ellas sesgan la estimación de formas que ningún error estándar muestra.</translation>
    </message>
    <message>
        <location filename="../processing/report/panels.py" line="25"/>
        <source>every year</source>
        <translation>cada año</translation>
    </message>
    <message>
        <location filename="../processing/report/panels.py" line="25"/>
        <source>rotating panels</source>
        <translation>paneles rotativos</translation>
    </message>
    <message>
        <location filename="../processing/report/panels.py" line="25"/>
        <source>split panels</source>
        <translation>paneles divididos</translation>
    </message>
    <message>
        <location filename="../processing/report/panels.py" line="41"/>
        <source>Panel</source>
        <translation>Panel</translation>
    </message>
    <message>
        <location filename="../processing/report/panels.py" line="30"/>
        <source>Visited in</source>
        <translation>Años de visita</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="29"/>
        <source>Year</source>
        <translation>Año</translation>
    </message>
    <message>
        <location filename="../processing/report/panels.py" line="35"/>
        <source>Panels visited</source>
        <translation>Paneles visitados</translation>
    </message>
    <message>
        <location filename="../processing/report/panels.py" line="35"/>
        <source>Field days</source>
        <translation>Jornadas de campo</translation>
    </message>
    <message>
        <location filename="../processing/report/panels.py" line="41"/>
        <source>Spread measure</source>
        <translation>Medida de reparto</translation>
    </message>
    <message>
        <location filename="../processing/report/panels.py" line="41"/>
        <source>Random panels of the same make-up</source>
        <translation>Paneles aleatorios de la misma composición</translation>
    </message>
    <message>
        <location filename="../processing/report/panels.py" line="70"/>
        <source>every year (all units)</source>
        <translation>cada año (todas las unidades)</translation>
    </message>
    <message>
        <location filename="../processing/report/panels.py" line="72"/>
        <source>core (every year)</source>
        <translation>núcleo (cada año)</translation>
    </message>
    <message>
        <location filename="../processing/report/panels.py" line="73"/>
        <source>panel {p}</source>
        <translation>panel {p}</translation>
    </message>
    <message>
        <location filename="../processing/report/panels.py" line="83"/>
        <source>design</source>
        <translation>diseño</translation>
    </message>
    <message>
        <location filename="../processing/report/panels.py" line="83"/>
        <source>units in panels</source>
        <translation>unidades en los paneles</translation>
    </message>
    <message>
        <location filename="../processing/report/panels.py" line="128"/>
        <source>units per year</source>
        <translation>unidades por año</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="118"/>
        <source>years</source>
        <translation>años</translation>
    </message>
    <message>
        <location filename="../processing/report/panels.py" line="102"/>
        <source>none: the order of the features</source>
        <translation>ninguno: el orden de las entidades</translation>
    </message>
    <message>
        <location filename="../processing/report/panels.py" line="105"/>
        <source>Units layer</source>
        <translation>Capa de unidades</translation>
    </message>
    <message>
        <location filename="../processing/report/panels.py" line="106"/>
        <source>Panel design (PANEL_DESIGN)</source>
        <translation>Diseño de paneles (PANEL_DESIGN)</translation>
    </message>
    <message>
        <location filename="../processing/report/panels.py" line="107"/>
        <source>Rotating panels (PANELS)</source>
        <translation>Paneles rotativos (PANELS)</translation>
    </message>
    <message>
        <location filename="../processing/report/panels.py" line="108"/>
        <source>Share of units in the core (CORE_SHARE)</source>
        <translation>Proporción de unidades en el núcleo (CORE_SHARE)</translation>
    </message>
    <message>
        <location filename="../processing/report/panels.py" line="110"/>
        <source>First year (START_YEAR)</source>
        <translation>Primer año (START_YEAR)</translation>
    </message>
    <message>
        <location filename="../processing/report/trendpower.py" line="95"/>
        <source>Years (YEARS)</source>
        <translation>Años (YEARS)</translation>
    </message>
    <message>
        <location filename="../processing/report/panels.py" line="112"/>
        <source>Draw-order field</source>
        <translation>Campo de orden de sorteo</translation>
    </message>
    <message>
        <location filename="../processing/report/panels.py" line="114"/>
        <source>Field days per unit visit</source>
        <translation>Jornadas de campo por visita a una unidad</translation>
    </message>
    <message>
        <location filename="../processing/report/panels.py" line="115"/>
        <source>Reserve units (no panel)</source>
        <translation>Unidades de reserva (sin panel)</translation>
    </message>
    <message>
        <location filename="../processing/report/panels.py" line="116"/>
        <source>Seed (balance check only)</source>
        <translation>Semilla (solo para la comprobación del equilibrio)</translation>
    </message>
    <message>
        <location filename="../processing/report/panels.py" line="127"/>
        <source>Schedule</source>
        <translation>Calendario</translation>
    </message>
    <message>
        <location filename="../processing/report/panels.py" line="130"/>
        <source>Years in which each panel is visited, with its number of units; the last row adds them up.</source>
        <translation>Años en que se visita cada panel, con su número de unidades; la última fila los suma.</translation>
    </message>
    <message>
        <location filename="../processing/report/panels.py" line="143"/>
        <source>Units of each stratum in each panel.</source>
        <translation>Unidades de cada estrato en cada panel.</translation>
    </message>
    <message>
        <location filename="../processing/report/panels.py" line="148"/>
        <source>Spread of the panels</source>
        <translation>Reparto espacial de los paneles</translation>
    </message>
    <message>
        <location filename="../processing/report/panels.py" line="150"/>
        <source>The layout records a spatially balanced design (the units&apos; design field).</source>
        <translation>La disposición registra un diseño espacialmente equilibrado (campo design de las unidades).</translation>
    </message>
    <message>
        <location filename="../processing/report/panels.py" line="153"/>
        <source>The layout records a simple random design (the units&apos; design field): each panel is a random part of it, not an evenly spread sample of the frame.</source>
        <translation>La disposición registra un diseño aleatorio simple (campo design de las unidades): cada panel es una parte aleatoria de ella, no una muestra repartida de modo uniforme por el marco.</translation>
    </message>
    <message>
        <location filename="../processing/report/panels.py" line="158"/>
        <source>The layout records a systematic grid (the units&apos; design field): its draw order runs row by row, so the panels are bands across the frame.</source>
        <translation>La disposición registra una cuadrícula sistemática (campo design de las unidades): su orden de sorteo avanza fila por fila, de modo que los paneles son bandas que atraviesan el marco.</translation>
    </message>
    <message>
        <location filename="../processing/report/panels.py" line="163"/>
        <source>The units carry no design record (the design field of plotwise:layout): the check below tells whether the panels are evenly spread.</source>
        <translation>Las unidades no llevan registro del diseño (el campo design de plotwise:layout): la comprobación de abajo indica si los paneles están repartidos de modo uniforme.</translation>
    </message>
    <message>
        <location filename="../processing/report/panels.py" line="168"/>
        <source>No panel could be checked: the units need at least 3 positions not on one line, and a panel at least 2 units.</source>
        <translation>No se pudo comprobar ningún panel: las unidades necesitan al menos 3 posiciones no alineadas, y un panel al menos 2 unidades.</translation>
    </message>
    <message>
        <location filename="../processing/report/panels.py" line="174"/>
        <source>Spread measure of Stevens &amp; Olsen (2004) over the whole layout: 0 for a perfectly even spread, larger for clumps and gaps. The random panels take the same number of units from each stratum (median over the rearrangements of the check).</source>
        <translation>Medida de reparto de Stevens &amp; Olsen (2004) sobre toda la disposición: 0 para un reparto perfectamente uniforme, mayor cuando hay agrupaciones y huecos. Los paneles aleatorios toman el mismo número de unidades de cada estrato (mediana sobre las reordenaciones de la comprobación).</translation>
    </message>
    <message>
        <location filename="../processing/report/panels.py" line="180"/>
        <source>The panels are more evenly spread than random parts of the layout (their spread measure is {r:.0%} of that of random panels), though with this few units the check cannot confirm it (p = {p:.3f} from {b} random rearrangements).</source>
        <translation>Los paneles están repartidos de modo más uniforme que partes aleatorias de la disposición (su medida de reparto es el {r:.0%} de la de los paneles aleatorios), aunque con tan pocas unidades la comprobación no puede confirmarlo (p = {p:.3f} con {b} reordenaciones aleatorias).</translation>
    </message>
    <message>
        <location filename="../processing/report/panels.py" line="186"/>
        <source>The panels are more evenly spread than random parts of the layout (p = {p:.3f} from {b} random rearrangements): as expected when the layout is spatially balanced and the panels follow its draw order.</source>
        <translation>Los paneles están repartidos de modo más uniforme que partes aleatorias de la disposición (p = {p:.3f} con {b} reordenaciones aleatorias): lo esperado cuando la disposición es espacialmente equilibrada y los paneles siguen su orden de sorteo.</translation>
    </message>
    <message>
        <location filename="../processing/report/panels.py" line="192"/>
        <source>The panels are not shown to be more evenly spread than random parts of the layout (p = {p:.3f} from {b} random rearrangements). If the layout was simple random, each panel is just a random part of it; if it was a systematic grid, whose draw order runs row by row, the panels are bands. For evenly spread panels, lay out the units with the spatially balanced design. With few units the check may also miss a real balance.</source>
        <translation>No se demuestra que los paneles estén repartidos de modo más uniforme que partes aleatorias de la disposición (p = {p:.3f} con {b} reordenaciones aleatorias). Si la disposición era aleatoria simple, cada panel es solo una parte aleatoria de ella; si era una cuadrícula sistemática, cuyo orden de sorteo avanza fila por fila, los paneles son bandas. Para obtener paneles repartidos de modo uniforme, disponga las unidades con el diseño espacialmente equilibrado. Con pocas unidades, la comprobación también puede no detectar un equilibrio real.</translation>
    </message>
    <message>
        <location filename="../processing/report/panels.py" line="203"/>
        <source>Within each stratum the primary units are taken in draw order and cut into consecutive blocks: the core (split panels) first, then panel 1, panel 2 and so on, as evenly as possible. Rotating panel p is visited in the years start + (p − 1) + m·K, so that each of its units is revisited every K years and about 1/K of the rotating units are surveyed each year; the core, and the single panel of the every-year design, are visited every year (Urquhart &amp; Kincaid 1999; McDonald 2003).</source>
        <translation>Dentro de cada estrato, las unidades principales se toman en orden de sorteo y se cortan en bloques consecutivos: primero el núcleo (paneles divididos), luego el panel 1, el panel 2 y así sucesivamente, lo más iguales posible. El panel rotativo p se visita en los años inicio + (p − 1) + m·K, de modo que cada una de sus unidades se revisita cada K años y cerca de 1/K de las unidades de los paneles rotativos se muestrea cada año; el núcleo, y el panel único del diseño «cada año», se visitan cada año (Urquhart &amp; Kincaid 1999; McDonald 2003).</translation>
    </message>
    <message>
        <location filename="../processing/report/panels.py" line="210"/>
        <source>In a spatially balanced layout every run of consecutive units of the draw order is itself spread over the stratum (Robertson et al. 2013), so each panel covers the whole stratum. The check compares the Voronoi spread measure of the panels (Stevens &amp; Olsen 2004), computed over a fine grid on the convex hull of the units, with random rearrangements of the panels within each stratum.</source>
        <translation>En una disposición espacialmente equilibrada, cada tramo de unidades consecutivas del orden de sorteo está a su vez repartido por el estrato (Robertson et al. 2013), de modo que cada panel cubre todo el estrato. La comprobación compara la medida de reparto de Voronoi de los paneles (Stevens &amp; Olsen 2004), calculada sobre una malla fina en la envolvente convexa de las unidades, con reordenaciones aleatorias de los paneles dentro de cada estrato.</translation>
    </message>
    <message>
        <location filename="../processing/report/panels.py" line="216"/>
        <source>Reserve units get no panel. A reserve that replaces a primary unit takes over the primary&apos;s panel and years; record the replacement.</source>
        <translation>Las unidades de reserva no reciben panel. Una reserva que sustituye a una unidad principal hereda el panel y los años de esta; registre la sustitución.</translation>
    </message>
    <message>
        <location filename="../processing/report/panels.py" line="220"/>
        <source>Revisiting the same units every year gives the most precise trend for the effort; rotating panels cover more ground over a cycle but link the years only through the units they share. The split design keeps a core for the year-to-year links. Compare the options with the power analysis (plotwise:trendpower) before committing to a schedule.</source>
        <translation>Revisitar las mismas unidades cada año da la tendencia más precisa para el esfuerzo invertido; los paneles rotativos cubren más terreno a lo largo de un ciclo, pero enlazan los años solo mediante las unidades que comparten. El diseño de paneles divididos conserva un núcleo para enlazar unos años con otros. Compare las opciones con el análisis de potencia (plotwise:trendpower) antes de comprometerse con un calendario.</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="29"/>
        <source>Index</source>
        <translation>Índice</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="29"/>
        <source>Trend</source>
        <translation>Tendencia</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="29"/>
        <source>Trend, lower</source>
        <translation>Tendencia, límite inferior</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="29"/>
        <source>Trend, upper</source>
        <translation>Tendencia, límite superior</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="38"/>
        <source>Change per year (%)</source>
        <translation>Cambio anual (%)</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="38"/>
        <source>p-value</source>
        <translation>Valor p</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="46"/>
        <source>Units in the records</source>
        <translation>Unidades en los registros</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="46"/>
        <source>Units in the fit (some animals counted)</source>
        <translation>Unidades en el ajuste (algún animal contado)</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="46"/>
        <source>Records used</source>
        <translation>Registros usados</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="46"/>
        <source>Records without a count (not surveyed)</source>
        <translation>Registros sin conteo (no muestreados)</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="46"/>
        <source>Scale between units (Pearson)</source>
        <translation>Factor de escala entre unidades (Pearson)</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="46"/>
        <source>Standard error of the log change allowing only for variation between units</source>
        <translation>Error estándar del cambio logarítmico teniendo en cuenta solo la variación entre unidades</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="46"/>
        <source>Year-to-year SD, log scale (method of moments)</source>
        <translation>DE entre años, escala logarítmica (método de los momentos)</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="46"/>
        <source>Scale between units within years (Pearson)</source>
        <translation>Factor de escala entre unidades dentro de cada año (Pearson)</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="46"/>
        <source>Deviance drop from the trend to one effect per year</source>
        <translation>Descenso de la devianza de la tendencia a un efecto por año</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="46"/>
        <source>Degrees of freedom between years</source>
        <translation>Grados de libertad entre años</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="223"/>
        <source>Standard error of the log change used</source>
        <translation>Error estándar usado del cambio logarítmico</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="46"/>
        <source>Linked sets of units and years</source>
        <translation>Conjuntos enlazados de unidades y años</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="94"/>
        <source>The change per year could not be estimated.</source>
        <translation>No se pudo estimar el cambio anual.</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="97"/>
        <source>no change (0.0% per year)</source>
        <translation>ningún cambio (0.0% por año)</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="99"/>
        <source>a decline of {c} per year</source>
        <translation>un descenso del {c} por año</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="101"/>
        <source>an increase of {c} per year</source>
        <translation>un aumento del {c} por año</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="104"/>
        <source>{level} interval {a} to {b}</source>
        <translation>intervalo al {level} de {a} a {b}</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="107"/>
        <source>{level} interval from a decline of {a} to an increase of {b}</source>
        <translation>intervalo al {level} desde un descenso del {a} hasta un aumento del {b}</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="118"/>
        <source>change per year</source>
        <translation>cambio anual</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="118"/>
        <source>p-value (no trend)</source>
        <translation>valor p (sin tendencia)</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="126"/>
        <source>Over {first}–{last} the trend is {words}.</source>
        <translation>Tendencia en el periodo {first}–{last}: {words}.</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="143"/>
        <source>Input</source>
        <translation>Entrada</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="152"/>
        <source>Source (SOURCE)</source>
        <translation>Fuente (SOURCE)</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="145"/>
        <source>unit counts</source>
        <translation>conteos por unidad</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="147"/>
        <source>Unit id field</source>
        <translation>Campo identificador de unidad</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="149"/>
        <source>Unit area field</source>
        <translation>Campo de área de la unidad</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="149"/>
        <source>none: equal effort</source>
        <translation>ninguno: esfuerzo igual</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="152"/>
        <source>yearly estimates</source>
        <translation>estimaciones anuales</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="154"/>
        <source>Estimate field</source>
        <translation>Campo de estimación</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="155"/>
        <source>Standard error field</source>
        <translation>Campo de error estándar</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="156"/>
        <source>Year field</source>
        <translation>Campo de año</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="159"/>
        <source>not used (no random draws)</source>
        <translation>no se usa (sin sorteos aleatorios)</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="166"/>
        <source>Yearly index and trend</source>
        <translation>Índice anual y tendencia</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="168"/>
        <source>mean count per unit</source>
        <translation>conteo medio por unidad</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="169"/>
        <source>Index: the expected mean count per unit in each year, at the mean survey effort.</source>
        <translation>Índice: el conteo medio esperado por unidad en cada año, con el esfuerzo de muestreo medio.</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="172"/>
        <source>estimate</source>
        <translation>estimación</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="173"/>
        <source>Index: the yearly estimate; its interval shows the sampling error only.</source>
        <translation>Índice: la estimación anual; su intervalo solo muestra el error de muestreo.</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="175"/>
        <source>year</source>
        <translation>año</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="175"/>
        <source>yearly index</source>
        <translation>índice anual</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="175"/>
        <source>trend</source>
        <translation>tendencia</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="180"/>
        <source>Yearly index with {level} intervals (points and bars) and the fitted trend with its {level} band.</source>
        <translation>Índice anual con intervalos al {level} (puntos y barras) y tendencia ajustada con su banda al {level}.</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="216"/>
        <source>The fit</source>
        <translation>El ajuste</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="202"/>
        <source>Units that counted no animal in any visit carry no information on the trend and were left out of the fit: {ids}.</source>
        <translation>Las unidades en las que no se contó ningún animal en ninguna visita no aportan información sobre la tendencia y se dejaron fuera del ajuste: {ids}.</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="207"/>
        <source>Trend by stratum</source>
        <translation>Tendencia por estrato</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="209"/>
        <source>Each stratum&apos;s units fitted on their own; strata with too few units or years show no value.</source>
        <translation>Las unidades de cada estrato se ajustan por separado; los estratos con demasiado pocas unidades o años no muestran ningún valor.</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="218"/>
        <source>Year-to-year process SD (log scale)</source>
        <translation>DE del proceso entre años (escala logarítmica)</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="219"/>
        <source>Weighted residual sum of squares without process variance</source>
        <translation>Suma ponderada de cuadrados de los residuos sin varianza del proceso</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="220"/>
        <source>Residual mean square that scales the variance</source>
        <translation>Cuadrado medio residual que escala la varianza</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="221"/>
        <source>Standard error of the log change with sampling error only</source>
        <translation>Error estándar del cambio logarítmico solo con el error de muestreo</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="224"/>
        <source>Degrees of freedom</source>
        <translation>Grados de libertad</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="234"/>
        <source>The counts follow a log-linear Poisson model with one effect per unit and a common change per year, log E[y] = log(effort) + unit effect + β·year (McCullagh &amp; Nelder 1989). Given β the unit effects have a closed form, so β is fitted by Newton's method on the profile likelihood. The change per year is exp(β) − 1.</source>
        <translation>Los conteos siguen un modelo de Poisson log-lineal con un efecto por unidad y un cambio anual común, log E[y] = log(esfuerzo) + efecto de la unidad + β·año (McCullagh &amp; Nelder 1989). Dado β, los efectos de las unidades tienen forma cerrada, por lo que β se ajusta por el método de Newton sobre la verosimilitud perfilada. El cambio anual es exp(β) − 1.</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="240"/>
        <source>Overdispersion (quasi-likelihood): counts of one year share that year's conditions. The model with one effect per year (fitted by iterative proportional fitting; Bishop, Fienberg &amp; Holland 1975) is compared with the trend model: the deviance drop per degree of freedom scales the variance of β (McCullagh &amp; Nelder 1989), in proportion to how strongly the slope depends on single years, and β is tested with Student's t on the degrees of freedom between years. So years that differ as a whole widen the interval. The year-to-year SD is estimated from the same drop by the method of moments (DerSimonian &amp; Laird 1986, here for a log-linear model). The standard error allowing only for variation between units (the Pearson-scaled GLM) is shown for comparison. The index of each year is the year model's expected mean count per unit, with delta-method intervals from the Pearson scale within years.</source>
        <translation>Sobredispersión (cuasi-verosimilitud): los conteos de un mismo año comparten las condiciones de ese año. El modelo con un efecto por año (ajustado por ajuste proporcional iterativo; Bishop, Fienberg &amp; Holland 1975) se compara con el modelo de tendencia: el descenso de la devianza por grado de libertad escala la varianza de β (McCullagh &amp; Nelder 1989), en proporción a lo mucho que la pendiente depende de años concretos, y β se contrasta con la t de Student con los grados de libertad entre años. Así, los años que difieren en su conjunto ensanchan el intervalo. La DE entre años se estima a partir del mismo descenso por el método de los momentos (DerSimonian &amp; Laird 1986, aquí para un modelo log-lineal). El error estándar que solo tiene en cuenta la variación entre unidades (el GLM escalado por Pearson) se muestra para comparar. El índice de cada año es el conteo medio esperado por unidad del modelo por año, con intervalos por el método delta a partir del factor de escala de Pearson dentro de los años.</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="253"/>
        <source>The log yearly estimates are regressed on year by weighted least squares. Each year's variance is its sampling variance ln(1 + CV²) plus the year-to-year process variance τ², estimated by the method of moments (DerSimonian &amp; Laird 1986; Thompson &amp; Sharp 1999), so that a noisy year counts less and real ups and downs between years widen the interval. The variance of the slope is scaled by the weighted residual mean square and tested with t on k − 2 degrees of freedom (Hartung &amp; Knapp 2001).</source>
        <translation>Los logaritmos de las estimaciones anuales se regresan sobre el año por mínimos cuadrados ponderados. La varianza de cada año es su varianza de muestreo ln(1 + CV²) más la varianza del proceso entre años τ², estimada por el método de los momentos (DerSimonian &amp; Laird 1986; Thompson &amp; Sharp 1999), de modo que un año ruidoso cuenta menos y las subidas y bajadas reales entre años ensanchan el intervalo. La varianza de la pendiente se escala por el cuadrado medio residual ponderado y se contrasta con t con k − 2 grados de libertad (Hartung &amp; Knapp 2001).</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="264"/>
        <source>A trend in counts is a trend in the population only if detection did not change: new observers, another season or time of day, denser vegetation or a different method change the counts without any change in the animals. Keep the field protocol the same, or measure detection each year.</source>
        <translation>Una tendencia en los conteos solo es una tendencia de la población si la detección no cambió: observadores nuevos, otra época del año u hora del día, una vegetación más densa o un método distinto cambian los conteos sin que cambien los animales. Mantenga el mismo protocolo de campo, o mida la detección cada año.</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="269"/>
        <source>The trend is the average change over these years, on a log scale. It is not a forecast, and it says nothing about units or land outside the programme&apos;s frame.</source>
        <translation>La tendencia es el cambio medio a lo largo de estos años, en escala logarítmica. No es una previsión, y no dice nada de unidades ni terrenos fuera del marco del programa.</translation>
    </message>
    <message>
        <location filename="../processing/report/trendpower.py" line="24"/>
        <source>Years</source>
        <translation>Años</translation>
    </message>
    <message>
        <location filename="../processing/report/trendpower.py" line="24"/>
        <source>Change (% per year)</source>
        <translation>Cambio (% por año)</translation>
    </message>
    <message>
        <location filename="../processing/report/trendpower.py" line="24"/>
        <source>Power</source>
        <translation>Potencia</translation>
    </message>
    <message>
        <location filename="../processing/report/trendpower.py" line="24"/>
        <source>Monte Carlo SE</source>
        <translation>EE de Monte Carlo</translation>
    </message>
    <message>
        <location filename="../processing/report/trendpower.py" line="24"/>
        <source>Fits that failed</source>
        <translation>Ajustes fallidos</translation>
    </message>
    <message>
        <location filename="../processing/report/trendpower.py" line="46"/>
        <source>{c:+g}% per year</source>
        <translation>{c:+g}% por año</translation>
    </message>
    <message>
        <location filename="../processing/report/trendpower.py" line="55"/>
        <source>power for {c} after {t} years</source>
        <translation>potencia para {c} tras {t} años</translation>
    </message>
    <message>
        <location filename="../processing/report/trendpower.py" line="60"/>
        <source>years for 80% power ({c})</source>
        <translation>años para una potencia del 80% ({c})</translation>
    </message>
    <message>
        <location filename="../processing/report/trendpower.py" line="60"/>
        <source>more than {t}</source>
        <translation>más de {t}</translation>
    </message>
    <message>
        <location filename="../processing/report/trendpower.py" line="67"/>
        <source>A change of {c} is detected with 80% power after {t} years of this programme.</source>
        <translation>Un cambio de {c} se detecta con una potencia del 80% tras {t} años de este programa.</translation>
    </message>
    <message>
        <location filename="../processing/report/trendpower.py" line="72"/>
        <source>A change of {c} is not detected with 80% power within {t} years of this programme.</source>
        <translation>Un cambio de {c} no se detecta con una potencia del 80% en {t} años de este programa.</translation>
    </message>
    <message>
        <location filename="../processing/report/trendpower.py" line="89"/>
        <source>{design} (from {layer})</source>
        <translation>{design} (a partir de {layer})</translation>
    </message>
    <message>
        <location filename="../processing/report/trendpower.py" line="91"/>
        <source>two-sided</source>
        <translation>bilateral</translation>
    </message>
    <message>
        <location filename="../processing/report/trendpower.py" line="92"/>
        <source>one-sided, in the direction of the change</source>
        <translation>unilateral, en el sentido del cambio</translation>
    </message>
    <message>
        <location filename="../processing/report/trendpower.py" line="94"/>
        <source>Units (N_UNITS)</source>
        <translation>Unidades (N_UNITS)</translation>
    </message>
    <message>
        <location filename="../processing/report/trendpower.py" line="96"/>
        <source>Panel design</source>
        <translation>Diseño de paneles</translation>
    </message>
    <message>
        <location filename="../processing/report/trendpower.py" line="97"/>
        <source>Changes to detect (% per year)</source>
        <translation>Cambios que detectar (% por año)</translation>
    </message>
    <message>
        <location filename="../processing/report/trendpower.py" line="99"/>
        <source>Mean animals per unit in the first year (MEAN_COUNT)</source>
        <translation>Media de animales por unidad en el primer año (MEAN_COUNT)</translation>
    </message>
    <message>
        <location filename="../processing/report/trendpower.py" line="101"/>
        <source>SD between units, log scale (SD_UNIT)</source>
        <translation>DE entre unidades, escala logarítmica (SD_UNIT)</translation>
    </message>
    <message>
        <location filename="../processing/report/trendpower.py" line="102"/>
        <source>SD unit × year, log scale (SD_UNIT_YEAR)</source>
        <translation>DE unidad × año, escala logarítmica (SD_UNIT_YEAR)</translation>
    </message>
    <message>
        <location filename="../processing/report/trendpower.py" line="103"/>
        <source>SD year to year, log scale (SD_YEAR)</source>
        <translation>DE entre años, escala logarítmica (SD_YEAR)</translation>
    </message>
    <message>
        <location filename="../processing/report/trendpower.py" line="104"/>
        <source>Mean count and SD between units from</source>
        <translation>Conteo medio y DE entre unidades tomados de</translation>
    </message>
    <message>
        <location filename="../processing/report/trendpower.py" line="105"/>
        <source>the parameters</source>
        <translation>los parámetros</translation>
    </message>
    <message>
        <location filename="../processing/report/trendpower.py" line="106"/>
        <source>Detection probability (DETECTION)</source>
        <translation>Probabilidad de detección (DETECTION)</translation>
    </message>
    <message>
        <location filename="../processing/report/trendpower.py" line="107"/>
        <source>Significance level (ALPHA)</source>
        <translation>Nivel de significación (ALPHA)</translation>
    </message>
    <message>
        <location filename="../processing/report/trendpower.py" line="108"/>
        <source>Test</source>
        <translation>Prueba</translation>
    </message>
    <message>
        <location filename="../processing/report/trendpower.py" line="109"/>
        <source>Replicates (REPLICATES)</source>
        <translation>Réplicas (REPLICATES)</translation>
    </message>
    <message>
        <location filename="../processing/report/trendpower.py" line="111"/>
        <source>Largest Monte Carlo standard error of a power</source>
        <translation>Mayor error estándar de Monte Carlo de una potencia</translation>
    </message>
    <message>
        <location filename="../processing/report/trendpower.py" line="127"/>
        <source>80%</source>
        <translation>80%</translation>
    </message>
    <message>
        <location filename="../processing/report/trendpower.py" line="128"/>
        <source>power</source>
        <translation>potencia</translation>
    </message>
    <message>
        <location filename="../processing/report/trendpower.py" line="129"/>
        <source>Power against years</source>
        <translation>Potencia frente a los años</translation>
    </message>
    <message>
        <location filename="../processing/report/trendpower.py" line="130"/>
        <source>years of the programme</source>
        <translation>años del programa</translation>
    </message>
    <message>
        <location filename="../processing/report/trendpower.py" line="132"/>
        <source>Power with {n} units against the number of years; bars: ±2 Monte Carlo SE.</source>
        <translation>Potencia con {n} unidades frente al número de años; barras: ±2 EE de Monte Carlo.</translation>
    </message>
    <message>
        <location filename="../processing/report/trendpower.py" line="136"/>
        <source>Power against units</source>
        <translation>Potencia frente a las unidades</translation>
    </message>
    <message>
        <location filename="../processing/report/trendpower.py" line="137"/>
        <source>units</source>
        <translation>unidades</translation>
    </message>
    <message>
        <location filename="../processing/report/trendpower.py" line="139"/>
        <source>Power after {t} years against the number of units; bars: ±2 Monte Carlo SE.</source>
        <translation>Potencia tras {t} años frente al número de unidades; barras: ±2 EE de Monte Carlo.</translation>
    </message>
    <message>
        <location filename="../processing/report/trendpower.py" line="154"/>
        <source>Each of the {r:,} replicates simulates the counts of every unit in every year it is visited: count ~ Poisson(p·λ), log λ = log(mean) + β·t + unit effect + year effect + unit × year effect, with normal effects of the SDs given (on the log scale) and β = ln(1 + change/100). The replicate's trend is estimated with the same log-linear Poisson model with unit effects and quasi-likelihood scale between years as plotwise:trend, and the change counts as detected when its t test rejects at level {a:g}. Power is the share of replicates with a detection; its Monte Carlo SE is √(P(1 − P)/R) (Gerrodette 1987 for the setting).</source>
        <translation>Cada una de las {r:,} réplicas simula los conteos de cada unidad en cada año en que se visita: conteo ~ Poisson(p·λ), log λ = log(media) + β·t + efecto de la unidad + efecto del año + efecto unidad × año, con efectos normales de las DE indicadas (en escala logarítmica) y β = ln(1 + cambio/100). La tendencia de la réplica se estima con el mismo modelo de Poisson log-lineal con efectos de unidad y factor de escala de cuasi-verosimilitud entre años que plotwise:trend, y el cambio cuenta como detectado cuando su prueba t rechaza la ausencia de tendencia al nivel {a:g}. La potencia es la proporción de réplicas con detección; su EE de Monte Carlo es √(P(1 − P)/R) (Gerrodette 1987 para el planteamiento).</translation>
    </message>
    <message>
        <location filename="../processing/report/trendpower.py" line="163"/>
        <source>Shorter programmes are the first years of the same simulated programmes; programmes with other numbers of units are the first units of larger simulated programmes, assigned to panels anew. Power for a programme of fewer years is shown only from the first length that leaves a degree of freedom for year-to-year variation.</source>
        <translation>Los programas más cortos son los primeros años de los mismos programas simulados; los programas con otros números de unidades son las primeras unidades de programas simulados mayores, asignadas de nuevo a paneles. La potencia de un programa de menos años solo se muestra a partir de la primera duración que deja un grado de libertad para la variación entre años.</translation>
    </message>
    <message>
        <location filename="../processing/report/trendpower.py" line="169"/>
        <source>A one-season pilot gives the mean count and the spread between units (the estimate step's mean_c and sd_c): with a Poisson–log-normal count, SD_UNIT² = ln(1 + (s² − m)/m²) − SD_UNIT_YEAR². The unit × year and year-to-year SDs need several years of counts.</source>
        <translation>Un piloto de una temporada da el conteo medio y la dispersión entre unidades (mean_c y sd_c del paso de estimación): con un conteo Poisson–log-normal, SD_UNIT² = ln(1 + (s² − m)/m²) − SD_UNIT_YEAR². Las DE unidad × año y entre años necesitan varios años de conteos.</translation>
    </message>
    <message>
        <location filename="../processing/report/trendpower.py" line="178"/>
        <source>Power depends on the variance components assumed: the spread between units, the unit × year noise and above all the year-to-year variation shared by all units. Larger values than those entered give less power. The defaults are illustrative, not measured: use values from a pilot or from earlier years of the programme, and try a range.</source>
        <translation>La potencia depende de los componentes de la varianza supuestos: la dispersión entre unidades, el ruido unidad × año y, sobre todo, la variación entre años común a todas las unidades. Valores mayores que los introducidos dan menos potencia. Los valores por defecto son ilustrativos, no medidos: use valores de un piloto o de años anteriores del programa, y pruebe un intervalo de valores.</translation>
    </message>
    <message>
        <location filename="../processing/report/trendpower.py" line="184"/>
        <source>The simulation assumes a steady change in % per year, constant detection, and that every planned visit happens. Missed visits, a change in detection or a trend that is not steady reduce the power.</source>
        <translation>La simulación supone un cambio regular en % por año, una detección constante y que se realiza cada visita prevista. Las visitas perdidas, un cambio en la detección o una tendencia irregular reducen la potencia.</translation>
    </message>
    <message>
        <location filename="../processing/report/buildframe.py" line="41"/>
        <source>study area (ha)</source>
        <translation>área de estudio (ha)</translation>
    </message>
    <message>
        <location filename="../processing/report/buildframe.py" line="41"/>
        <source>frame (ha)</source>
        <translation>marco (ha)</translation>
    </message>
    <message>
        <location filename="../processing/report/buildframe.py" line="41"/>
        <source>kept</source>
        <translation>conservado</translation>
    </message>
    <message>
        <location filename="../processing/report/buildframe.py" line="46"/>
        <source>Estimates from a survey on this frame apply to the frame ({ha} ha) only, not to the whole study area.</source>
        <translation>Las estimaciones de un muestreo sobre este marco valen solo para el marco ({ha} ha), no para toda el área de estudio.</translation>
    </message>
    <message>
        <location filename="../processing/report/buildframe.py" line="54"/>
        <source>Frame (filled), with the areas lost to each rule</source>
        <translation>Marco (relleno), con las áreas perdidas por cada regla</translation>
    </message>
    <message>
        <location filename="../processing/report/buildframe.py" line="61"/>
        <source>Area kept and area lost to each rule</source>
        <translation>Área conservada y área perdida por cada regla</translation>
    </message>
    <message>
        <location filename="../processing/report/buildframe.py" line="63"/>
        <source>lost to the excluded polygons (EXCLUDE)</source>
        <translation>perdida por los polígonos excluidos (EXCLUDE)</translation>
    </message>
    <message>
        <location filename="../processing/report/buildframe.py" line="64"/>
        <source>lost to the raster mask (MASK outside the accepted range, or NoData)</source>
        <translation>perdida por la máscara ráster (MASK fuera del intervalo aceptado, o NoData)</translation>
    </message>
    <message>
        <location filename="../processing/report/buildframe.py" line="66"/>
        <source>lost to the inward edge buffer (EDGE_BUFFER)</source>
        <translation>perdida por la franja interior del borde (EDGE_BUFFER)</translation>
    </message>
    <message>
        <location filename="../processing/report/buildframe.py" line="68"/>
        <source>study area</source>
        <translation>área de estudio</translation>
    </message>
    <message>
        <location filename="../processing/report/buildframe.py" line="71"/>
        <source>sampling frame (kept)</source>
        <translation>marco de muestreo (conservado)</translation>
    </message>
    <message>
        <location filename="../processing/report/buildframe.py" line="73"/>
        <source>% of study area</source>
        <translation>% del área de estudio</translation>
    </message>
    <message>
        <location filename="../processing/report/buildframe.py" line="75"/>
        <source>Rules are applied in the order shown; each is charged only with area that was still in the frame, so the frame and the areas lost add up to the study area.</source>
        <translation>Las reglas se aplican en el orden mostrado; a cada una solo se le imputa el área que seguía en el marco, de modo que el marco y las áreas perdidas suman el área de estudio.</translation>
    </message>
    <message>
        <location filename="../processing/report/buildframe.py" line="82"/>
        <source>Mask raster</source>
        <translation>Ráster de máscara</translation>
    </message>
    <message>
        <location filename="../processing/report/buildframe.py" line="84"/>
        <source>cells tested over the study area&apos;s extent</source>
        <translation>celdas comprobadas en la extensión del área de estudio</translation>
    </message>
    <message>
        <location filename="../processing/report/stratify.py" line="232"/>
        <source>cell size (m)</source>
        <translation>tamaño de celda (m)</translation>
    </message>
    <message>
        <location filename="../processing/report/buildframe.py" line="84"/>
        <source>cells below the lowest accepted value</source>
        <translation>celdas por debajo del valor mínimo aceptado</translation>
    </message>
    <message>
        <location filename="../processing/report/buildframe.py" line="84"/>
        <source>cells above the highest accepted value</source>
        <translation>celdas por encima del valor máximo aceptado</translation>
    </message>
    <message>
        <location filename="../processing/report/buildframe.py" line="84"/>
        <source>NoData cells (including cells outside the raster)</source>
        <translation>celdas NoData (incluidas las celdas fuera del ráster)</translation>
    </message>
    <message>
        <location filename="../processing/report/buildframe.py" line="84"/>
        <source>reprojected on the fly (nearest neighbour)</source>
        <translation>reproyectado al vuelo (vecino más próximo)</translation>
    </message>
    <message>
        <location filename="../processing/report/buildframe.py" line="101"/>
        <source>, projected from {src} (UTM zone of the study area&apos;s centre)</source>
        <translation>, proyectado desde {src} (zona UTM del centro del área de estudio)</translation>
    </message>
    <message>
        <location filename="../processing/report/buildframe.py" line="104"/>
        <source>Study area (INPUT)</source>
        <translation>Área de estudio (INPUT)</translation>
    </message>
    <message>
        <location filename="../processing/report/buildframe.py" line="104"/>
        <source>Areas to exclude (EXCLUDE)</source>
        <translation>Zonas que excluir (EXCLUDE)</translation>
    </message>
    <message>
        <location filename="../processing/report/buildframe.py" line="104"/>
        <source>Mask raster (MASK)</source>
        <translation>Ráster de máscara (MASK)</translation>
    </message>
    <message>
        <location filename="../processing/report/buildframe.py" line="104"/>
        <source>Lowest accepted mask value (MASK_MIN)</source>
        <translation>Valor mínimo aceptado de la máscara (MASK_MIN)</translation>
    </message>
    <message>
        <location filename="../processing/report/buildframe.py" line="104"/>
        <source>Highest accepted mask value (MASK_MAX)</source>
        <translation>Valor máximo aceptado de la máscara (MASK_MAX)</translation>
    </message>
    <message>
        <location filename="../processing/report/buildframe.py" line="104"/>
        <source>Inward edge buffer (EDGE_BUFFER, m)</source>
        <translation>Franja interior del borde (EDGE_BUFFER, m)</translation>
    </message>
    <message>
        <location filename="../processing/report/buildframe.py" line="147"/>
        <source>sampling frame</source>
        <translation>marco de muestreo</translation>
    </message>
    <message>
        <location filename="../processing/report/buildframe.py" line="151"/>
        <source>excluded polygons</source>
        <translation>polígonos excluidos</translation>
    </message>
    <message>
        <location filename="../processing/report/buildframe.py" line="155"/>
        <source>raster mask</source>
        <translation>máscara ráster</translation>
    </message>
    <message>
        <location filename="../processing/report/buildframe.py" line="157"/>
        <source>study area boundary</source>
        <translation>límite del área de estudio</translation>
    </message>
    <message>
        <location filename="../processing/report/demoreserve.py" line="22"/>
        <source>Demo reserve: {name}</source>
        <translation>Reserva de demostración: {name}</translation>
    </message>
    <message>
        <location filename="../processing/report/demoreserve.py" line="23"/>
        <source>Invented data for demonstrations, training and tests. {name} and the velmar ({desc}) do not exist.</source>
        <translation>Datos inventados para demostraciones, formación y pruebas. {name} y el velmar ({desc}) no existen.</translation>
    </message>
    <message>
        <location filename="../processing/report/demoreserve.py" line="28"/>
        <source>reserve area</source>
        <translation>superficie de la reserva</translation>
    </message>
    <message>
        <location filename="../processing/report/demoreserve.py" line="28"/>
        <source>true number of velmar</source>
        <translation>número verdadero de velmar</translation>
    </message>
    <message>
        <location filename="../processing/report/demoreserve.py" line="28"/>
        <source>expected number</source>
        <translation>número esperado</translation>
    </message>
    <message>
        <location filename="../processing/report/demoreserve.py" line="28"/>
        <source>groups</source>
        <translation>grupos</translation>
    </message>
    <message>
        <location filename="../processing/report/demoreserve.py" line="35"/>
        <source>Raster cell size (m)</source>
        <translation>Tamaño de celda del ráster (m)</translation>
    </message>
    <message>
        <location filename="../processing/report/demoreserve.py" line="35"/>
        <source>Mean group size (mu)</source>
        <translation>Tamaño medio de los grupos (mu)</translation>
    </message>
    <message>
        <location filename="../processing/report/demoreserve.py" line="35"/>
        <source>Group spread, SD of members around the centre (m)</source>
        <translation>Dispersión de los grupos, desviación estándar de los miembros alrededor del centro (m)</translation>
    </message>
    <message>
        <location filename="../processing/report/demoreserve.py" line="42"/>
        <source>Areas</source>
        <translation>Zonas</translation>
    </message>
    <message>
        <location filename="../processing/report/demoreserve.py" line="43"/>
        <source>Part</source>
        <translation>Parte</translation>
    </message>
    <message>
        <location filename="../processing/report/demoreserve.py" line="43"/>
        <source>Lake (excluded)</source>
        <translation>Lago (excluido)</translation>
    </message>
    <message>
        <location filename="../processing/report/demoreserve.py" line="43"/>
        <source>Private inholding (excluded)</source>
        <translation>Enclave privado (excluido)</translation>
    </message>
    <message>
        <location filename="../processing/report/demoreserve.py" line="50"/>
        <source>Hollin Ridge Reserve, the excluded areas and the simulated animals.</source>
        <translation>Hollin Ridge Reserve, las zonas excluidas y los animales simulados.</translation>
    </message>
    <message>
        <location filename="../processing/report/demoreserve.py" line="52"/>
        <source>How the population was simulated</source>
        <translation>Cómo se simuló la población</translation>
    </message>
    <message>
        <location filename="../processing/report/demoreserve.py" line="53"/>
        <source>Group centres form an inhomogeneous Poisson process on the habitat (the reserve without the lake); their intensity is proportional to exp(0.9 × standardised greenness − 0.6 × standardised elevation). Each group has a Poisson number of members (mean {mu:g}) spread around its centre with a normal displacement of {sigma:g} m; members that fall off the habitat are not part of the population. This is a Thomas cluster process. Its expected total and variance are computed from the intensity surface on the raster grid.</source>
        <translation>Los centros de grupo forman un proceso de Poisson no homogéneo sobre el hábitat (la reserva sin el lago); su intensidad es proporcional a exp(0,9 × verdor estandarizado − 0,6 × altitud estandarizada). Cada grupo tiene un número de miembros de Poisson (media {mu:g}) dispersos alrededor de su centro con un desplazamiento normal de {sigma:g} m; los miembros que caen fuera del hábitat no forman parte de la población. Es un proceso de conglomerados de Thomas. Su total esperado y su varianza se calculan a partir de la superficie de intensidad en la malla del ráster.</translation>
    </message>
    <message>
        <location filename="../processing/report/demoreserve.py" line="70"/>
        <source>Lake</source>
        <translation>Lago</translation>
    </message>
    <message>
        <location filename="../processing/report/demoreserve.py" line="70"/>
        <source>Private inholding</source>
        <translation>Enclave privado</translation>
    </message>
    <message>
        <location filename="../processing/report/demoreserve.py" line="70"/>
        <source>Velmar (every third animal)</source>
        <translation>Velmar (uno de cada tres animales)</translation>
    </message>
    <message>
        <location filename="../processing/report/html.py" line="76"/>
        <source>, projected from {src} (UTM zone of the frame&apos;s centre)</source>
        <translation>, proyectado desde {src} (zona UTM del centro del marco)</translation>
    </message>
    <message>
        <location filename="../processing/report/layout.py" line="62"/>
        <source>Sample-unit layout</source>
        <translation>Disposición de las unidades de muestreo</translation>
    </message>
    <message>
        <location filename="../processing/report/layout.py" line="212"/>
        <source>primary units</source>
        <translation>unidades principales</translation>
    </message>
    <message>
        <location filename="../processing/report/layout.py" line="212"/>
        <source>reserve units</source>
        <translation>unidades de reserva</translation>
    </message>
    <message>
        <location filename="../processing/report/stratify.py" line="76"/>
        <source>strata</source>
        <translation>estratos</translation>
    </message>
    <message>
        <location filename="../processing/report/layout.py" line="72"/>
        <source>Replacing units in the field</source>
        <translation>Sustituir unidades en el terreno</translation>
    </message>
    <message>
        <location filename="../processing/report/layout.py" line="73"/>
        <source>A primary unit that cannot be surveyed (no safe access, no permission, flooded, ...) is replaced by the next unused reserve unit of the same stratum, in draw order (draw_ord). Record the primary as not surveyed and why; never move a unit to a more convenient place, and never take a reserve of another stratum. Reserves carry the same incl_p and weight as the primaries they replace.</source>
        <translation>Una unidad principal que no se puede muestrear (sin acceso seguro, sin permiso, inundada, ...) se sustituye por la siguiente unidad de reserva no usada del mismo estrato, en orden de sorteo (draw_ord). Registre la principal como no muestreada y el motivo; nunca traslade una unidad a un lugar más cómodo ni tome una reserva de otro estrato. Las reservas llevan los mismos incl_p y weight que las principales a las que sustituyen.</translation>
    </message>
    <message>
        <location filename="../processing/report/layout.py" line="82"/>
        <source>Strata (filled), primary units (dark) and reserve units (light)</source>
        <translation>Estratos (rellenos), unidades principales (oscuras) y unidades de reserva (claras)</translation>
    </message>
    <message>
        <location filename="../processing/report/layout.py" line="95"/>
        <source>Effective area (ha)</source>
        <translation>Área efectiva (ha)</translation>
    </message>
    <message>
        <location filename="../processing/report/layout.py" line="96"/>
        <source>Units asked</source>
        <translation>Unidades pedidas</translation>
    </message>
    <message>
        <location filename="../processing/report/layout.py" line="97"/>
        <source>incl_p</source>
        <translation>incl_p</translation>
    </message>
    <message>
        <location filename="../processing/report/layout.py" line="98"/>
        <source>weight</source>
        <translation>weight</translation>
    </message>
    <message>
        <location filename="../processing/report/layout.py" line="100"/>
        <source>Grid spacing (m)</source>
        <translation>Espaciado de la cuadrícula (m)</translation>
    </message>
    <message>
        <location filename="../processing/report/layout.py" line="101"/>
        <source>Grid rotation (°)</source>
        <translation>Rotación de la cuadrícula (°)</translation>
    </message>
    <message>
        <location filename="../processing/report/layout.py" line="116"/>
        <source>incl_p is the inclusion density n/A per m² (the units have no area of their own); weight = A/n is the area in m² each unit stands for (Cordy 1993).</source>
        <translation>incl_p es la densidad de inclusión n/A por m² (las unidades no tienen área propia); weight = A/n es el área en m² que representa cada unidad (Cordy 1993).</translation>
    </message>
    <message>
        <location filename="../processing/report/layout.py" line="121"/>
        <source>incl_p = n × unit area / stratum area is each unit's first-order inclusion probability; weight = 1/incl_p.</source>
        <translation>incl_p = n × área de la unidad / área del estrato es la probabilidad de inclusión de primer orden de cada unidad; weight = 1/incl_p.</translation>
    </message>
    <message>
        <location filename="../processing/report/layout.py" line="126"/>
        <source>Plus sampling: centres were drawn over each stratum grown by {r} m (the unit&apos;s reach), so units near the edge reach over it, and some centres lie outside their stratum. Survey only the part of each unit inside its own stratum and count only the animals there (the map shows the strata); a unit that reaches nothing of its stratum counts 0. Never cross into excluded or unsafe ground to reach a centre: survey the part inside the stratum from within it. The effective area is the grown area, and plotwise:estimate expands the counts to it (Gregoire &amp; Valentine 2008, ch. 10).</source>
        <translation>Muestreo «plus»: los centros se sortearon sobre cada estrato ampliado en {r} m (el alcance de la unidad), así que las unidades cercanas al borde lo sobrepasan, y algunos centros quedan fuera de su estrato. Muestree solo la parte de cada unidad dentro de su propio estrato y cuente solo los animales que haya allí (el mapa muestra los estratos); una unidad que no alcanza nada de su estrato cuenta 0. No entre nunca en terreno excluido o peligroso para llegar a un centro: muestree la parte dentro del estrato desde su interior. El área efectiva es el área ampliada, y plotwise:estimate extiende los conteos a ella (Gregoire &amp; Valentine 2008, cap. 10).</translation>
    </message>
    <message>
        <location filename="../processing/report/layout.py" line="136"/>
        <source>Units are kept wholly inside their stratum: centres were drawn from the stratum shrunk by {r} m (the unit&apos;s circumscribing radius). The effective area is that shrunk area and the inclusion probabilities use it; the edge strip is covered less often, which the report of the estimate should mention.</source>
        <translation>Las unidades se mantienen por completo dentro de su estrato: los centros se sortearon en el estrato reducido en {r} m (el radio circunscrito de la unidad). El área efectiva es esa área reducida y las probabilidades de inclusión la usan; la franja del borde se cubre con menos frecuencia, lo que el informe de la estimación debería mencionar.</translation>
    </message>
    <message>
        <location filename="../processing/report/layout.py" line="143"/>
        <source>The grid spacing is √(A/n) for the asked n; with a random start the realised number of units varies around n (column Primary) while the inclusion density stays n/A everywhere.</source>
        <translation>El espaciado de la cuadrícula es √(A/n) para el n pedido; con un inicio aleatorio, el número de unidades obtenido varía en torno a n (columna Principales) mientras la densidad de inclusión sigue siendo n/A en todas partes.</translation>
    </message>
    <message>
        <location filename="../processing/report/layout.py" line="153"/>
        <source>Units per stratum field (N_FIELD)</source>
        <translation>Campo de unidades por estrato (N_FIELD)</translation>
    </message>
    <message>
        <location filename="../processing/report/layout.py" line="153"/>
        <source>Total units (N_UNITS)</source>
        <translation>Total de unidades (N_UNITS)</translation>
    </message>
    <message>
        <location filename="../processing/report/layout.py" line="153"/>
        <source>Design (DESIGN)</source>
        <translation>Diseño (DESIGN)</translation>
    </message>
    <message>
        <location filename="../processing/report/layout.py" line="153"/>
        <source>Unit shape (SHAPE)</source>
        <translation>Forma de la unidad (SHAPE)</translation>
    </message>
    <message>
        <location filename="../processing/report/layout.py" line="153"/>
        <source>Unit size (SIZE, m)</source>
        <translation>Tamaño de la unidad (SIZE, m)</translation>
    </message>
    <message>
        <location filename="../processing/report/layout.py" line="153"/>
        <source>Bearing (BEARING, degrees)</source>
        <translation>Rumbo (BEARING, grados)</translation>
    </message>
    <message>
        <location filename="../processing/report/layout.py" line="153"/>
        <source>Keep inside (INSIDE)</source>
        <translation>Mantener dentro (INSIDE)</translation>
    </message>
    <message>
        <location filename="../processing/report/layout.py" line="178"/>
        <source>Simple random: every centre is an independent uniform point of its stratum (a triangle chosen with probability proportional to its area, then a uniform point in it).</source>
        <translation>Aleatorio simple: cada centro es un punto uniforme independiente de su estrato (un triángulo elegido con probabilidad proporcional a su área y luego un punto uniforme dentro de él).</translation>
    </message>
    <message>
        <location filename="../processing/report/layout.py" line="183"/>
        <source>Systematic grid: a square grid with a uniform random start in one grid cell and a rotation, per stratum; reserves are the centres of the grid cells, in random order.</source>
        <translation>Cuadrícula sistemática: una cuadrícula cuadrada con un inicio aleatorio uniforme en una celda y una rotación, por estrato; las reservas son los centros de las celdas de la cuadrícula, en orden aleatorio.</translation>
    </message>
    <message>
        <location filename="../processing/report/layout.py" line="188"/>
        <source>Spatially balanced: balanced acceptance sampling (Robertson et al. 2013). A Halton sequence in bases 2 and 3 is laid over the stratum&apos;s bounding box and its points inside the stratum are kept in order. The random start is a uniform random point of the stratum, so that every location has the same chance for any sample size; reserves are the next points of the same sequence.</source>
        <translation>Espacialmente equilibrado: muestreo por aceptación equilibrada (Robertson et al. 2013). Una secuencia de Halton en bases 2 y 3 se coloca sobre el rectángulo envolvente del estrato y sus puntos dentro del estrato se conservan en orden. El inicio aleatorio es un punto aleatorio uniforme del estrato, para que cada ubicación tenga la misma probabilidad con cualquier tamaño de muestra; las reservas son los puntos siguientes de la misma secuencia.</translation>
    </message>
    <message>
        <location filename="../processing/report/layout.py" line="196"/>
        <source>A candidate closer than {d} m to an accepted unit is passed over (simple sequential inhibition), which lowers the chance of locations next to units slightly.</source>
        <translation>Un candidato a menos de {d} m de una unidad aceptada se descarta (inhibición secuencial simple), lo que reduce ligeramente la probabilidad de las ubicaciones cercanas a las unidades.</translation>
    </message>
    <message>
        <location filename="../processing/report/stratify.py" line="54"/>
        <source>Strata from raster covariates</source>
        <translation>Estratos a partir de covariables ráster</translation>
    </message>
    <message>
        <location filename="../processing/report/stratify.py" line="65"/>
        <source>Strata within the sampling frame</source>
        <translation>Estratos dentro del marco de muestreo</translation>
    </message>
    <message>
        <location filename="../processing/report/stratify.py" line="232"/>
        <source>area stratified (ha)</source>
        <translation>área estratificada (ha)</translation>
    </message>
    <message>
        <location filename="../processing/report/stratify.py" line="76"/>
        <source>frame covered</source>
        <translation>parte del marco cubierta</translation>
    </message>
    <message>
        <location filename="../processing/report/stratify.py" line="76"/>
        <source>R² of {name}</source>
        <translation>R² de {name}</translation>
    </message>
    <message>
        <location filename="../processing/report/stratify.py" line="83"/>
        <source>The strata cover the frame&apos;s cells that have a value in every covariate ({ha} ha). A survey allocated on these strata speaks for that area only.</source>
        <translation>Los estratos cubren las celdas del marco que tienen valor en todas las covariables ({ha} ha). Un muestreo asignado sobre estos estratos solo vale para esa área.</translation>
    </message>
    <message>
        <location filename="../processing/report/stratify.py" line="94"/>
        <source>Label</source>
        <translation>Etiqueta</translation>
    </message>
    <message>
        <location filename="../processing/report/stratify.py" line="95"/>
        <source>% of area</source>
        <translation>% del área</translation>
    </message>
    <message>
        <location filename="../processing/report/stratify.py" line="96"/>
        <source>Cells</source>
        <translation>Celdas</translation>
    </message>
    <message>
        <location filename="../processing/report/stratify.py" line="99"/>
        <source>{name} mean</source>
        <translation>media de {name}</translation>
    </message>
    <message>
        <location filename="../processing/report/stratify.py" line="100"/>
        <source>{name} SD</source>
        <translation>DE de {name}</translation>
    </message>
    <message>
        <location filename="../processing/report/stratify.py" line="116"/>
        <source>Patches smaller than {ha} ha ({cells} cells) were merged into their largest neighbour (GDAL sieve, 4-connected) before polygonising; areas and statistics are those after merging, so a stratum may hold a few cells that the rule alone would have put in a neighbouring stratum.</source>
        <translation>Las manchas menores de {ha} ha ({cells} celdas) se fusionaron con su vecina mayor (criba de GDAL, conectividad 4) antes de vectorizar; las áreas y estadísticas son las posteriores a la fusión, por lo que un estrato puede contener algunas celdas que la regla por sí sola habría puesto en un estrato vecino.</translation>
    </message>
    <message>
        <location filename="../processing/report/stratify.py" line="123"/>
        <source>Patches smaller than {ha} ha ({cells} cells) were merged before polygonising (4-connected): specks of fewer than {specks} cells into their largest neighbour (GDAL sieve), then {n} more patches, smallest first, each into the neighbouring stratum that made the smallest patch of at least {ha} ha (or, failing that, the largest patch), so that a mosaic of small patches is not swallowed by one growing patch. Areas and statistics are those after merging, so a stratum may hold cells that the rule alone would have put in another stratum.</source>
        <translation>Las manchas menores de {ha} ha ({cells} celdas) se fusionaron antes de vectorizar (conectividad 4): las manchas diminutas (menos de {specks} celdas) con su vecina mayor (criba de GDAL), y después otras {n} manchas, de la menor a la mayor, cada una con el estrato vecino que formaba la mancha más pequeña de al menos {ha} ha (o, en su defecto, la mayor), para que un mosaico de manchas pequeñas no quede absorbido por una sola mancha que crece. Las áreas y estadísticas son las posteriores a la fusión, por lo que un estrato puede contener celdas que la regla por sí sola habría puesto en otro estrato.</translation>
    </message>
    <message>
        <location filename="../processing/report/stratify.py" line="134"/>
        <source>{n} patch(es) covering {area} ha touch no other stratum (islands of the frame, or patches ringed by NoData) and stay smaller than {ha} ha.</source>
        <translation>{n} mancha(s) que cubren {area} ha no tocan ningún otro estrato (islas del marco de muestreo, o manchas rodeadas de NoData) y siguen siendo menores de {ha} ha.</translation>
    </message>
    <message>
        <location filename="../processing/report/stratify.py" line="141"/>
        <source>Every patch of the strata now covers at least {ha} ha.</source>
        <translation>Cada mancha de los estratos cubre ahora al menos {ha} ha.</translation>
    </message>
    <message>
        <location filename="../processing/report/stratify.py" line="149"/>
        <source>Method: {name}</source>
        <translation>Método: {name}</translation>
    </message>
    <message>
        <location filename="../processing/report/stratify.py" line="154"/>
        <source>Covariates standardised with their mean and SD over the frame; k-means++ seeds and Lloyd iterations on a random sample of {m} cells (seed {seed}); {it} iterations. Then every cell went to its nearest centre.</source>
        <translation>Covariables estandarizadas con su media y su DE sobre el marco; semillas k-means++ e iteraciones de Lloyd sobre una muestra aleatoria de {m} celdas (semilla {seed}); {it} iteraciones. Después cada celda fue al centro más próximo.</translation>
    </message>
    <message>
        <location filename="../processing/report/stratify.py" line="162"/>
        <source>Each class of &apos;{name}&apos; is one stratum ({k} classes).</source>
        <translation>Cada clase de «{name}» es un estrato ({k} clases).</translation>
    </message>
    <message>
        <location filename="../processing/report/stratify.py" line="170"/>
        <source>Stratum h holds the cells with b(h−1) ≤ {name} &lt; b(h). Boundaries on {name}:</source>
        <translation>El estrato h contiene las celdas con b(h−1) ≤ {name} &lt; b(h). Límites sobre {name}:</translation>
    </message>
    <message>
        <location filename="../processing/report/stratify.py" line="173"/>
        <source>Boundary</source>
        <translation>Límite</translation>
    </message>
    <message>
        <location filename="../processing/report/stratify.py" line="176"/>
        <source>Exact sample quantiles at h/k of the frame&apos;s cells (Hyndman &amp; Fan 1996, definition 7), found in two passes: a 64,000-class histogram locates each quantile, then the cells of that class are sorted.</source>
        <translation>Cuantiles muestrales exactos en h/k de las celdas del marco (Hyndman &amp; Fan 1996, definición 7), hallados en dos pasadas: un histograma de 64.000 clases localiza cada cuantil y luego se ordenan las celdas de esa clase.</translation>
    </message>
    <message>
        <location filename="../processing/report/stratify.py" line="182"/>
        <source>Dalenius &amp; Hodges (1959): on a {n}-class histogram of {name}, the boundaries are the class tops where the cumulative √f is nearest to h/k of its total.</source>
        <translation>Dalenius &amp; Hodges (1959): sobre un histograma de {name} de {n} clases, los límites son los extremos superiores de las clases donde la suma acumulada de √f está más cerca de h/k de su total.</translation>
    </message>
    <message>
        <location filename="../processing/report/stratify.py" line="191"/>
        <source>Share of covariate variance explained by the strata (R²)</source>
        <translation>Parte de la varianza de las covariables explicada por los estratos (R²)</translation>
    </message>
    <message>
        <location filename="../processing/report/stratify.py" line="192"/>
        <source>Covariate</source>
        <translation>Covariable</translation>
    </message>
    <message>
        <location filename="../processing/report/stratify.py" line="192"/>
        <source>Mean</source>
        <translation>Media</translation>
    </message>
    <message>
        <location filename="../processing/report/stratify.py" line="192"/>
        <source>SD</source>
        <translation>DE</translation>
    </message>
    <message>
        <location filename="../processing/report/stratify.py" line="192"/>
        <source>R²</source>
        <translation>R²</translation>
    </message>
    <message>
        <location filename="../processing/report/stratify.py" line="196"/>
        <source>R² = 1 − Σ N_h S_h² / (N S²): the between-strata share of the covariate's variance over the cells. For a quantity that follows the covariate exactly, proportional allocation over these strata would lower the variance of the estimated mean by this share compared with simple random sampling (Cochran 1977, ch. 5, large-population approximation). The gain for animal density is smaller the less closely density follows the covariate.</source>
        <translation>R² = 1 − Σ N_h S_h² / (N S²): la parte entre estratos de la varianza de la covariable sobre las celdas. Para una magnitud que sigue exactamente a la covariable, la asignación proporcional sobre estos estratos reduciría la varianza de la media estimada en esta parte respecto al muestreo aleatorio simple (Cochran 1977, cap. 5, aproximación para poblaciones grandes). La ganancia para la densidad animal es menor cuanto menos sigue la densidad a la covariable.</translation>
    </message>
    <message>
        <location filename="../processing/report/stratify.py" line="210"/>
        <source>Histogram of {name}</source>
        <translation>Histograma de {name}</translation>
    </message>
    <message>
        <location filename="../processing/report/stratify.py" line="216"/>
        <source>stratum {h}</source>
        <translation>estrato {h}</translation>
    </message>
    <message>
        <location filename="../processing/report/stratify.py" line="216"/>
        <source>cells</source>
        <translation>celdas</translation>
    </message>
    <message>
        <location filename="../processing/report/stratify.py" line="221"/>
        <source>Frame cells by {name}, coloured by stratum; dashed lines: stratum boundaries.</source>
        <translation>Celdas del marco según {name}, coloreadas por estrato; líneas discontinuas: límites de los estratos.</translation>
    </message>
    <message>
        <location filename="../processing/report/stratify.py" line="224"/>
        <source>Frame cells by {name}, coloured by stratum (k-means strata may overlap on one covariate).</source>
        <translation>Celdas del marco según {name}, coloreadas por estrato (los estratos de k-medias pueden solaparse en una covariable).</translation>
    </message>
    <message>
        <location filename="../processing/report/stratify.py" line="231"/>
        <source>Coverage</source>
        <translation>Cobertura</translation>
    </message>
    <message>
        <location filename="../processing/report/stratify.py" line="232"/>
        <source>frame area (ha)</source>
        <translation>área del marco (ha)</translation>
    </message>
    <message>
        <location filename="../processing/report/stratify.py" line="232"/>
        <source>frame area outside the first covariate&apos;s extent (ha)</source>
        <translation>área del marco fuera de la extensión de la primera covariable (ha)</translation>
    </message>
    <message>
        <location filename="../processing/report/stratify.py" line="232"/>
        <source>frame cells with NoData in a covariate (ha)</source>
        <translation>celdas del marco con NoData en alguna covariable (ha)</translation>
    </message>
    <message>
        <location filename="../processing/report/stratify.py" line="232"/>
        <source>share of the frame covered</source>
        <translation>parte del marco cubierta</translation>
    </message>
    <message>
        <location filename="../processing/report/stratify.py" line="232"/>
        <source>cells stratified</source>
        <translation>celdas estratificadas</translation>
    </message>
    <message>
        <location filename="../processing/report/stratify.py" line="232"/>
        <source>covariates warped on the fly</source>
        <translation>covariables remuestreadas al vuelo</translation>
    </message>
    <message>
        <location filename="../processing/report/stratify.py" line="251"/>
        <source>ignored</source>
        <translation>ignorado</translation>
    </message>
    <message>
        <location filename="../processing/report/stratify.py" line="254"/>
        <source>Sampling frame (FRAME)</source>
        <translation>Marco de muestreo (FRAME)</translation>
    </message>
    <message>
        <location filename="../processing/report/stratify.py" line="255"/>
        <source>Covariates (COVARIATES)</source>
        <translation>Covariables (COVARIATES)</translation>
    </message>
    <message>
        <location filename="../processing/report/stratify.py" line="256"/>
        <source>Method (METHOD)</source>
        <translation>Método (METHOD)</translation>
    </message>
    <message>
        <location filename="../processing/report/stratify.py" line="257"/>
        <source>Number of strata (STRATA)</source>
        <translation>Número de estratos (STRATA)</translation>
    </message>
    <message>
        <location filename="../processing/report/stratify.py" line="258"/>
        <source>Minimum patch area (MIN_AREA, ha)</source>
        <translation>Área mínima de mancha (MIN_AREA, ha)</translation>
    </message>
    <message>
        <location filename="../processing/report/stratify.py" line="259"/>
        <source>CRS of the computation and the outputs</source>
        <translation>SRC del cálculo y de las salidas</translation>
    </message>
</context>
<context>
    <name>PlotwiseStyles</name>
    <message>
        <location filename="../processing/styles.py" line="200"/>
        <source>primary unit</source>
        <translation>unidad principal</translation>
    </message>
    <message>
        <location filename="../processing/styles.py" line="201"/>
        <source>reserve unit</source>
        <translation>unidad de reserva</translation>
    </message>
    <message>
        <location filename="../processing/styles.py" line="331"/>
        <source>per {unit}</source>
        <translation>por {unit}</translation>
    </message>
    <message>
        <location filename="../processing/styles.py" line="245"/>
        <source>Density (animals {per})</source>
        <translation>Densidad (animales {per})</translation>
    </message>
    <message>
        <location filename="../processing/styles.py" line="275"/>
        <source>no estimate (no surveyed unit)</source>
        <translation>sin estimación (ninguna unidad muestreada)</translation>
    </message>
    <message>
        <location filename="../processing/styles.py" line="385"/>
        <source>The layer {name} could not be styled ({error}); it keeps the default style.</source>
        <translation>No se pudo aplicar el estilo a la capa {name} ({error}); conserva el estilo predeterminado.</translation>
    </message>
    <message>
        <location filename="../processing/styles.py" line="437"/>
        <source>left out (no surveyed occasion)</source>
        <translation>dejado fuera (ninguna ocasión muestreada)</translation>
    </message>
    <message>
        <location filename="../processing/styles.py" line="439"/>
        <source>Occupancy given the detections (psi_cond)</source>
        <translation>Ocupación dadas las detecciones (psi_cond)</translation>
    </message>
</context>
<context>
    <name>SimulateCounts</name>
    <message>
        <location filename="../processing/algorithms/simulatecounts.py" line="42"/>
        <source>Simulate counts in sample units</source>
        <translation>Simular conteos en las unidades de muestreo</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/simulatecounts.py" line="88"/>
        <source>Sample units</source>
        <translation>Unidades de muestreo</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/simulatecounts.py" line="90"/>
        <source>Animal points</source>
        <translation>Puntos de animales</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/simulatecounts.py" line="92"/>
        <source>Detection probability</source>
        <translation>Probabilidad de detección</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/simulatecounts.py" line="98"/>
        <source>Count reserve units too</source>
        <translation>Contar también las unidades de reserva</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/simulatecounts.py" line="108"/>
        <source>Units with simulated counts</source>
        <translation>Unidades con conteos simulados</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/simulatecounts.py" line="205"/>
        <source>has no geometry</source>
        <translation>no tiene geometría</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/simulatecounts.py" line="210"/>
        <source>Layer &apos;{layer}&apos;: these features cannot be counted: {items}. Point and line units need a positive &apos;area_m2&apos; field (the layout step writes it); polygons need a geometry.</source>
        <translation>Capa «{layer}»: estas entidades no se pueden contar: {items}. Las unidades de punto y de línea necesitan un campo «area_m2» positivo (lo escribe el paso de disposición); los polígonos necesitan una geometría.</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/simulatecounts.py" line="184"/>
        <source>{n} units counted: {seen} animals seen of {present} present (detection {p:g}); {r} reserve units left empty.</source>
        <translation>{n} unidades contadas: {seen} animales vistos de {present} presentes (detección {p:g}); {r} unidades de reserva quedan vacías.</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/simulatecounts.py" line="45"/>
        <source>&lt;p&gt;Fills the &lt;i&gt;count&lt;/i&gt; field of sample units with the number of simulated animals seen in each, for training, demonstrations and tests of the estimate. Real surveys type the counts in after fieldwork instead.&lt;/p&gt;&lt;ul&gt;&lt;li&gt;&lt;b&gt;Sample units&lt;/b&gt;: polygons count the animals inside them. Points count within a circle of the unit&apos;s &lt;i&gt;area_m2&lt;/i&gt;, lines within a strip of that area along the line.&lt;/li&gt;&lt;li&gt;&lt;b&gt;Animal points&lt;/b&gt;: one point per animal, for example the demo reserve&apos;s simulated animals.&lt;/li&gt;&lt;li&gt;&lt;b&gt;Detection probability&lt;/b&gt;: each animal in a unit is seen with this probability (binomial thinning). 1 means every animal is seen.&lt;/li&gt;&lt;li&gt;&lt;b&gt;Count reserve units too&lt;/b&gt;: off by default, so that units whose &lt;i&gt;role&lt;/i&gt; is &lt;i&gt;reserve&lt;/i&gt; keep an empty count (not surveyed), as in a survey where no primary unit needed replacing.&lt;/li&gt;&lt;li&gt;&lt;b&gt;Strata&lt;/b&gt; (optional, with their id field): each unit counts only the animals inside its own stratum (matched by the units&apos; &lt;i&gt;stratum&lt;/i&gt; field; without an id field, inside the strata), the rule of plus sampling, the layout&apos;s default at the edges (Gregoire &amp;amp; Valentine 2008, ch. 10). Give the strata the units were laid out on.&lt;/li&gt;&lt;li&gt;&lt;b&gt;Random seed&lt;/b&gt;: 0 draws a seed and records it.&lt;/li&gt;&lt;/ul&gt;&lt;p&gt;The output is a copy of the units with &lt;i&gt;count&lt;/i&gt; filled (added when missing) and &lt;i&gt;present&lt;/i&gt;, the animals actually in the unit. The input is not changed.&lt;/p&gt;</source>
        <translation>&lt;p&gt;Rellena el campo &lt;i&gt;count&lt;/i&gt; de las unidades de muestreo con el número de animales simulados vistos en cada una, para formación, demostraciones y pruebas de la estimación. En un muestreo real los conteos se introducen después del trabajo de campo.&lt;/p&gt;&lt;ul&gt;&lt;li&gt;&lt;b&gt;Unidades de muestreo&lt;/b&gt;: los polígonos cuentan los animales que contienen. Los puntos cuentan dentro de un círculo de área &lt;i&gt;area_m2&lt;/i&gt; de la unidad, las líneas dentro de una franja de esa área a lo largo de la línea.&lt;/li&gt;&lt;li&gt;&lt;b&gt;Puntos de animales&lt;/b&gt;: un punto por animal, por ejemplo los animales simulados de la reserva de demostración.&lt;/li&gt;&lt;li&gt;&lt;b&gt;Probabilidad de detección&lt;/b&gt;: cada animal de una unidad se ve con esta probabilidad (aclarado binomial). 1 significa que se ve a todos los animales.&lt;/li&gt;&lt;li&gt;&lt;b&gt;Contar también las unidades de reserva&lt;/b&gt;: desactivado por defecto, para que las unidades cuyo &lt;i&gt;role&lt;/i&gt; es &lt;i&gt;reserve&lt;/i&gt; conserven un conteo vacío (no muestreadas), como en un muestreo en el que ninguna unidad principal tuvo que sustituirse.&lt;/li&gt;&lt;li&gt;&lt;b&gt;Estratos&lt;/b&gt; (opcional, con su campo identificador): cada unidad solo cuenta los animales dentro de su propio estrato (reconocido por el campo &lt;i&gt;stratum&lt;/i&gt; de las unidades; sin campo identificador, dentro de los estratos), la regla del muestreo «plus», el protocolo por defecto de la disposición en los bordes (Gregoire &amp;amp; Valentine 2008, cap. 10). Indique los estratos sobre los que se dispusieron las unidades.&lt;/li&gt;&lt;li&gt;&lt;b&gt;Semilla aleatoria&lt;/b&gt;: 0 sortea una y la registra.&lt;/li&gt;&lt;/ul&gt;&lt;p&gt;La salida es una copia de las unidades con &lt;i&gt;count&lt;/i&gt; relleno (añadido si falta) y &lt;i&gt;present&lt;/i&gt;, los animales realmente presentes en la unidad. La entrada no se modifica.&lt;/p&gt;</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/simulatecounts.py" line="64"/>
        <source>&lt;p&gt;Distances (for the distance density algorithm):&lt;/p&gt;&lt;ul&gt;&lt;li&gt;&lt;b&gt;Detection function&lt;/b&gt;: none (the detection probability above, the same at every distance), or half-normal g(x) = exp(−x²/2σ²) or hazard-rate g(x) = 1 − exp(−(x/σ)^−b) (Buckland et al. 2001), for line transects and point stations. Each animal within the maximum distance of a unit is then seen with probability p·g(x), x its perpendicular distance to the line or its distance to the point, p the detection probability above (1: animals on the line are always seen, as distance sampling assumes).&lt;/li&gt;&lt;li&gt;&lt;b&gt;Scale σ (m)&lt;/b&gt; and &lt;b&gt;hazard-rate shape b&lt;/b&gt; of the detection function.&lt;/li&gt;&lt;li&gt;&lt;b&gt;Maximum distance (m)&lt;/b&gt;: animals farther than this from the line or point are not counted; 0 takes the distance where g falls to 1 %.&lt;/li&gt;&lt;li&gt;&lt;b&gt;Group size field&lt;/b&gt; of the animal points (optional): each point is then a group of that many animals; otherwise each point is one animal.&lt;/li&gt;&lt;li&gt;&lt;b&gt;Observations&lt;/b&gt; (optional, with a detection function): one point per sighting at the animal's position, with &lt;i&gt;unit_id&lt;/i&gt;, &lt;i&gt;distance&lt;/i&gt; (m) and &lt;i&gt;size&lt;/i&gt;, ready for the distance density algorithm.&lt;/li&gt;&lt;/ul&gt;&lt;p&gt;With a detection function, &lt;i&gt;present&lt;/i&gt; counts the animals within the maximum distance, and the strata are not used: a line or point sees the animals within the maximum distance on both sides of a stratum edge, as observers do.&lt;/p&gt;&lt;p&gt;Reference: Buckland, S. T. et al. (2001) Introduction to Distance Sampling. Oxford University Press.&lt;/p&gt;</source>
        <translation>&lt;p&gt;Distancias (para el algoritmo de densidad a partir de distancias):&lt;/p&gt;&lt;ul&gt;&lt;li&gt;&lt;b&gt;Función de detección&lt;/b&gt;: ninguna (la probabilidad de detección indicada arriba, la misma a cualquier distancia), o seminormal g(x) = exp(−x²/2σ²) o tasa de riesgo (hazard-rate) g(x) = 1 − exp(−(x/σ)^−b) (Buckland et al. 2001), para transectos lineales y estaciones puntuales. Cada animal a menos de la distancia máxima de una unidad se ve entonces con probabilidad p·g(x), con x su distancia perpendicular a la línea o su distancia al punto y p la probabilidad de detección indicada arriba (1: los animales sobre la línea se ven siempre, como supone el muestreo de distancias).&lt;/li&gt;&lt;li&gt;&lt;b&gt;Escala σ (m)&lt;/b&gt; y &lt;b&gt;forma b de la tasa de riesgo&lt;/b&gt; de la función de detección.&lt;/li&gt;&lt;li&gt;&lt;b&gt;Distancia máxima (m)&lt;/b&gt;: los animales más alejados de la línea o del punto no se cuentan; 0 toma la distancia donde g cae al 1 %.&lt;/li&gt;&lt;li&gt;&lt;b&gt;Campo de tamaño de grupo&lt;/b&gt; de los puntos de animales (opcional): cada punto es entonces un grupo de ese número de animales; si no, cada punto es un animal.&lt;/li&gt;&lt;li&gt;&lt;b&gt;Observaciones&lt;/b&gt; (opcional, con una función de detección): un punto por avistamiento en la posición del animal, con &lt;i&gt;unit_id&lt;/i&gt;, &lt;i&gt;distance&lt;/i&gt; (m) y &lt;i&gt;size&lt;/i&gt;, listo para el algoritmo de densidad a partir de distancias.&lt;/li&gt;&lt;/ul&gt;&lt;p&gt;Con una función de detección, &lt;i&gt;present&lt;/i&gt; cuenta los animales a menos de la distancia máxima, y los estratos no se usan: una línea o un punto ve los animales a menos de la distancia máxima a ambos lados de un límite de estrato, como hacen los observadores.&lt;/p&gt;&lt;p&gt;Referencia: Buckland, S. T. et al. (2001) Introduction to Distance Sampling. Oxford University Press.&lt;/p&gt;</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/simulatecounts.py" line="102"/>
        <source>Strata: count only inside each unit&apos;s stratum (plus sampling)</source>
        <translation>Estratos: contar solo dentro del estrato de cada unidad (muestreo «plus»)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/simulatecounts.py" line="105"/>
        <source>Stratum id field of the strata</source>
        <translation>Campo identificador de los estratos</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/simulatecounts.py" line="109"/>
        <source>Detection function (line transects and point stations)</source>
        <translation>Función de detección (transectos lineales y estaciones puntuales)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/simulatecounts.py" line="109"/>
        <source>None: the same detection probability at every distance</source>
        <translation>Ninguna: la misma probabilidad de detección a cualquier distancia</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/simulatecounts.py" line="109"/>
        <source>Half-normal</source>
        <translation>Seminormal</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/simulatecounts.py" line="109"/>
        <source>Hazard-rate</source>
        <translation>Tasa de riesgo (hazard-rate)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/simulatecounts.py" line="113"/>
        <source>Scale σ of the detection function (m)</source>
        <translation>Escala σ de la función de detección (m)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/simulatecounts.py" line="116"/>
        <source>Shape b of the hazard-rate</source>
        <translation>Forma b de la tasa de riesgo (hazard-rate)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/simulatecounts.py" line="119"/>
        <source>Maximum distance from the line or point (m; 0: where g falls to 1 %)</source>
        <translation>Distancia máxima a la línea o al punto (m; 0: donde g cae al 1 %)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/simulatecounts.py" line="122"/>
        <source>Group size field of the animal points</source>
        <translation>Campo de tamaño de grupo de los puntos de animales</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/simulatecounts.py" line="125"/>
        <source>Observations with distances</source>
        <translation>Observaciones con las distancias</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/simulatecounts.py" line="251"/>
        <source>Layer &apos;{layer}&apos;: the animal points {ids} have no group size above 0 in the field &apos;{field}&apos;. Fill it in, or choose no group size field.</source>
        <translation>Capa «{layer}»: los puntos de animales {ids} no tienen un tamaño de grupo mayor que 0 en el campo «{field}». Rellénelo o no elija ningún campo de tamaño de grupo.</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/simulatecounts.py" line="264"/>
        <source>Animals within {w:.1f} m of the lines or points are counted.</source>
        <translation>Se cuentan los animales a menos de {w:.1f} m de las líneas o de los puntos.</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/simulatecounts.py" line="287"/>
        <source>No detection function was chosen, so there are no distances: the observations layer is empty.</source>
        <translation>No se eligió ninguna función de detección, así que no hay distancias: la capa de observaciones está vacía.</translation>
    </message>
</context>
<context>
    <name>SimulateDetections</name>
    <message>
        <location filename="../processing/algorithms/simulatedetections.py" line="38"/>
        <source>Simulate detections at stations</source>
        <translation>Simular detecciones en las estaciones</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/simulatedetections.py" line="41"/>
        <source>&lt;p&gt;Fills detection histories of camera-trap or recorder stations from a simulated population, for training, demonstrations and tests of the occupancy analysis. Real surveys type the detections in after fieldwork instead.&lt;/p&gt;&lt;ul&gt;&lt;li&gt;&lt;b&gt;Stations&lt;/b&gt;: points (for example from the stations step).&lt;/li&gt;&lt;li&gt;&lt;b&gt;Animal points&lt;/b&gt; and their &lt;b&gt;group field&lt;/b&gt; (default group_id, as the demo reserve writes it): a group sits at the mean position of its members; without a group field each animal is a group.&lt;/li&gt;&lt;li&gt;&lt;b&gt;Occasions&lt;/b&gt;: the number of survey occasions (days, weeks).&lt;/li&gt;&lt;li&gt;&lt;b&gt;Detection at a group&lt;/b&gt; and &lt;b&gt;σ (m)&lt;/b&gt;: on each occasion a station detects the species with probability p = p_max·exp(−d²/(2σ²)), d the distance to the nearest group, independently between occasions.&lt;/li&gt;&lt;li&gt;&lt;b&gt;Share not surveyed&lt;/b&gt;: the share of station-occasions left empty (NULL), as a camera that failed.&lt;/li&gt;&lt;li&gt;&lt;b&gt;Random seed&lt;/b&gt;: 0 draws a seed and records it.&lt;/li&gt;&lt;/ul&gt;&lt;p&gt;The output is a copy of the stations with det_01, det_02, … (1 detected, 0 not, NULL not surveyed), dist_grp (m to the nearest group) and p_true (the per-occasion detection probability). The input is not changed.&lt;/p&gt;</source>
        <translation>&lt;p&gt;Rellena los historiales de detección de estaciones de cámaras trampa o grabadoras a partir de una población simulada, para formación, demostraciones y pruebas del análisis de ocupación. En un muestreo real las detecciones se introducen después del trabajo de campo.&lt;/p&gt;&lt;ul&gt;&lt;li&gt;&lt;b&gt;Estaciones&lt;/b&gt;: puntos (por ejemplo, del paso de estaciones).&lt;/li&gt;&lt;li&gt;&lt;b&gt;Puntos de animales&lt;/b&gt; y su &lt;b&gt;campo de grupo&lt;/b&gt; (group_id por defecto, como lo escribe la reserva de demostración): un grupo se sitúa en la posición media de sus miembros; sin campo de grupo, cada animal es un grupo.&lt;/li&gt;&lt;li&gt;&lt;b&gt;Ocasiones&lt;/b&gt;: el número de ocasiones de muestreo (días, semanas).&lt;/li&gt;&lt;li&gt;&lt;b&gt;Detección en la posición de un grupo&lt;/b&gt; y &lt;b&gt;σ (m)&lt;/b&gt;: en cada ocasión, una estación detecta la especie con probabilidad p = p_max·exp(−d²/(2σ²)), siendo d la distancia al grupo más cercano, de forma independiente entre ocasiones.&lt;/li&gt;&lt;li&gt;&lt;b&gt;Proporción no muestreada&lt;/b&gt;: la proporción de pares estación-ocasión que quedan vacíos (NULL), como una cámara trampa que falló.&lt;/li&gt;&lt;li&gt;&lt;b&gt;Semilla aleatoria&lt;/b&gt;: 0 sortea una y la registra.&lt;/li&gt;&lt;/ul&gt;&lt;p&gt;La salida es una copia de las estaciones con det_01, det_02, … (1 detectada, 0 no, NULL no muestreada), dist_grp (m hasta el grupo más cercano) y p_true (la probabilidad de detección por ocasión). La entrada no se modifica.&lt;/p&gt;</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/simulatedetections.py" line="60"/>
        <source>Stations</source>
        <translation>Estaciones</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/simulatedetections.py" line="62"/>
        <source>Animal points</source>
        <translation>Puntos de animales</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/simulatedetections.py" line="64"/>
        <source>Group field of the animals (empty: each animal is a group)</source>
        <translation>Campo de grupo de los animales (vacío: cada animal es un grupo)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/simulatedetections.py" line="67"/>
        <source>Occasions</source>
        <translation>Ocasiones</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/simulatedetections.py" line="70"/>
        <source>Detection probability per occasion at a group</source>
        <translation>Probabilidad de detección por ocasión en la posición de un grupo</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/simulatedetections.py" line="73"/>
        <source>σ of the decline with distance (m)</source>
        <translation>σ del descenso con la distancia (m)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/simulatedetections.py" line="76"/>
        <source>Share of occasions not surveyed</source>
        <translation>Proporción de ocasiones no muestreadas</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/simulatedetections.py" line="80"/>
        <source>Stations with detection histories</source>
        <translation>Estaciones con historiales de detección</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/simulatedetections.py" line="108"/>
        <source>{n} stations, {k} occasions: the species was detected at {d} stations ({g} animal groups).</source>
        <translation>{n} estaciones, {k} ocasiones: la especie se detectó en {d} estaciones ({g} grupos de animales).</translation>
    </message>
</context>
<context>
    <name>Stations</name>
    <message>
        <location filename="../processing/algorithms/stations.py" line="47"/>
        <source>Lay out camera-trap or recorder stations</source>
        <translation>Disponer estaciones de cámaras trampa o grabadoras</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/stations.py" line="50"/>
        <source>Places camera-trap or acoustic-recorder stations over a sampling frame (optionally by stratum), spaced from the species' home range, with reserve stations and GPS waypoints.

Spacing: from the home range (km²), taken as the 95% range of a circular bivariate normal distribution of the animal's positions, σ = √(HR/π) / 2.448. Rule 0, independent occupancy sites: stations at least one home-range diameter 2√(HR/π) apart (common practice). Rule 1, spatial capture-recapture: stations about 2σ apart (Sollmann et al. 2012; Sun et al. 2014). A spacing (m) above 0 replaces the rule.

Arrays:
• Grid: one square lattice at the spacing over the frame, north-aligned, with a random start. Number of stations 0 takes every lattice point in the frame; a number above 0 takes that many lattice points nearest a random point of the frame (a compact block). Strata only label the stations.
• Clusters: groups of CLUSTER_SIZE stations at the spacing (a small square lattice around a centre), the centres spatially balanced (Robertson et al. 2013) and far enough apart that neighbouring clusters keep the spacing; every station lies inside its stratum. Reserves are whole clusters.
• Balanced: single spatially balanced stations, each at least the spacing from every other.
The number of stations is split over the strata by area, at least 2 each (clusters: the stations of a stratum rounded up to whole clusters).

Minimum spacing (m) holds between all stations. Reserves: per stratum, in draw order (draw_ord); a station that cannot be set is replaced by the next unused reserve of its stratum.
Service time (hours per station visit, travel included; 0: not given) and the working day give the stations one team services per day, and the team-days for one round.

Output fields: station, stratum, cluster, role (primary or reserve), draw_ord, lon/lat (WGS 84). The GPX file holds one waypoint per station, named by its id. The report compares the array's extent with the home range: an array smaller than a few home ranges cannot estimate density.

Check every station's access and safety before fieldwork: the tool never makes a location safe. Follow your agency's field-safety rules and local law.</source>
        <translation>Coloca estaciones de cámaras trampa o grabadoras acústicas sobre un marco de muestreo (opcionalmente por estrato), separadas según el ámbito hogareño de la especie, con estaciones de reserva y puntos de paso GPS.

Separación: a partir del ámbito hogareño (km²), tomado como el área del 95 % de una distribución normal bivariada circular de las posiciones del animal, σ = √(HR/π) / 2,448. Regla 0, sitios de ocupación independientes: estaciones separadas al menos un diámetro de ámbito hogareño 2√(HR/π) (práctica habitual). Regla 1, captura-recaptura espacial: estaciones separadas unos 2σ (Sollmann et al. 2012; Sun et al. 2014). Una separación (m) mayor que 0 sustituye a la regla.

Dispositivos:
• Cuadrícula: una sola red cuadrada con la separación indicada sobre el marco, orientada al norte, con un inicio aleatorio. Un número de estaciones de 0 toma todos los puntos de la red dentro del marco; un número mayor que 0 toma ese número de puntos de la red, los más cercanos a un punto aleatorio del marco (un bloque compacto). Los estratos solo etiquetan las estaciones.
• Conglomerados: grupos de CLUSTER_SIZE estaciones con la separación indicada (una pequeña red cuadrada alrededor de un centro), con los centros espacialmente equilibrados (Robertson et al. 2013) y lo bastante alejados para que los conglomerados vecinos mantengan la separación; cada estación queda dentro de su estrato. Las reservas son conglomerados enteros.
• Equilibrado: estaciones individuales espacialmente equilibradas, cada una al menos a la separación indicada de todas las demás.
El número de estaciones se reparte entre los estratos según el área, al menos 2 por estrato (conglomerados: las estaciones de un estrato se redondean al alza a conglomerados enteros).

La separación mínima (m) se cumple entre todas las estaciones. Reservas: por estrato, en orden de sorteo (draw_ord); una estación que no se puede instalar se sustituye por la siguiente reserva no usada de su estrato.
El tiempo de revisión (horas por visita a una estación, desplazamiento incluido; 0: no indicado) y la jornada de trabajo dan las estaciones que un equipo revisa por día y las jornadas de equipo de una ronda.

Campos de salida: station, stratum, cluster, role (primary o reserve), draw_ord, lon/lat (WGS 84). El archivo GPX contiene un punto de paso por estación, con el nombre de su identificador. El informe compara la extensión del dispositivo con el ámbito hogareño: un dispositivo menor que unos pocos ámbitos hogareños no permite estimar la densidad.

Compruebe el acceso y la seguridad de cada estación antes del trabajo de campo: la herramienta nunca hace que una ubicación sea segura. Siga las normas de seguridad en el terreno de su organismo y la legislación local.</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/stations.py" line="79"/>
        <source>Sampling frame or strata</source>
        <translation>Marco de muestreo o estratos</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/stations.py" line="81"/>
        <source>Stratum field (empty: the frame is one stratum)</source>
        <translation>Campo de estrato (vacío: el marco es un solo estrato)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/stations.py" line="84"/>
        <source>Number of stations (grid: 0 takes every grid point)</source>
        <translation>Número de estaciones (cuadrícula: 0 toma todos los puntos de la cuadrícula)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/stations.py" line="87"/>
        <source>Array</source>
        <translation>Dispositivo</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/stations.py" line="87"/>
        <source>Grid</source>
        <translation>Cuadrícula</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/stations.py" line="87"/>
        <source>Clusters</source>
        <translation>Conglomerados</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/stations.py" line="87"/>
        <source>Balanced single stations</source>
        <translation>Estaciones individuales equilibradas</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/stations.py" line="90"/>
        <source>Home range of the species (km²; 0: not given)</source>
        <translation>Ámbito hogareño de la especie (km²; 0: no indicado)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/stations.py" line="93"/>
        <source>Station spacing (m; 0: from the home range)</source>
        <translation>Separación entre estaciones (m; 0: a partir del ámbito hogareño)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/stations.py" line="96"/>
        <source>Spacing rule (when the spacing comes from the home range)</source>
        <translation>Regla de separación (cuando la separación procede del ámbito hogareño)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/stations.py" line="96"/>
        <source>Independent occupancy sites: one home-range diameter</source>
        <translation>Sitios de ocupación independientes: un diámetro de ámbito hogareño</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/stations.py" line="96"/>
        <source>Spatial capture-recapture: 2σ</source>
        <translation>Captura-recaptura espacial: 2σ</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/stations.py" line="100"/>
        <source>Stations per cluster</source>
        <translation>Estaciones por conglomerado</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/stations.py" line="103"/>
        <source>Minimum spacing between stations (m; 0: none)</source>
        <translation>Separación mínima entre estaciones (m; 0: ninguna)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/stations.py" line="106"/>
        <source>Reserve stations per stratum (clusters: reserve clusters)</source>
        <translation>Estaciones de reserva por estrato (conglomerados: conglomerados de reserva)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/stations.py" line="110"/>
        <source>Service time per station visit (hours, travel included; 0: not given)</source>
        <translation>Tiempo de revisión por visita a una estación (horas, desplazamiento incluido; 0: no indicado)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/stations.py" line="110"/>
        <source>Working day of a field team (hours)</source>
        <translation>Jornada de trabajo de un equipo de campo (horas)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/stations.py" line="118"/>
        <source>Stations</source>
        <translation>Estaciones</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/stations.py" line="119"/>
        <source>Waypoints for GPS (GPX)</source>
        <translation>Puntos de paso para GPS (GPX)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/stations.py" line="119"/>
        <source>GPX files (*.gpx)</source>
        <translation>Archivos GPX (*.gpx)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/stations.py" line="123"/>
        <source>Station spacing used (m)</source>
        <translation>Separación entre estaciones usada (m)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/stations.py" line="123"/>
        <source>σ of the home range (m)</source>
        <translation>σ del ámbito hogareño (m)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/stations.py" line="123"/>
        <source>Number of primary stations</source>
        <translation>Número de estaciones principales</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/stations.py" line="161"/>
        <source>Layer &apos;{layer}&apos;: {text}</source>
        <translation>Capa «{layer}»: {text}</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/stations.py" line="175"/>
        <source>{n} waypoints written to {path}</source>
        <translation>{n} puntos de paso escritos en {path}</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/stations.py" line="176"/>
        <source>{n} primary and {r} reserve stations, {s:.0f} m apart.</source>
        <translation>{n} estaciones principales y {r} de reserva, separadas {s:.0f} m.</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/stations.py" line="194"/>
        <source>, projected from {src} (UTM zone of the frame&apos;s centre)</source>
        <translation>, proyectado desde {src} (zona UTM del centro del marco)</translation>
    </message>
</context>
<context>
    <name>Stratify</name>
    <message>
        <location filename="../processing/algorithms/stratify.py" line="55"/>
        <source>Quantile (equal areas on the first covariate)</source>
        <translation>Cuantiles (áreas iguales sobre la primera covariable)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/stratify.py" line="56"/>
        <source>Equal interval (on the first covariate)</source>
        <translation>Intervalos iguales (sobre la primera covariable)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/stratify.py" line="57"/>
        <source>Cumulative root frequency (Dalenius–Hodges, first covariate)</source>
        <translation>Raíz acumulada de las frecuencias (Dalenius–Hodges, primera covariable)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/stratify.py" line="58"/>
        <source>k-means (all covariates, standardised)</source>
        <translation>k-medias (todas las covariables, estandarizadas)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/stratify.py" line="59"/>
        <source>Raster classes (each class of the first covariate)</source>
        <translation>Clases del ráster (cada clase de la primera covariable)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/stratify.py" line="63"/>
        <source>Stratify from raster covariates</source>
        <translation>Estratificar a partir de covariables ráster</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/stratify.py" line="66"/>
        <source>&lt;p&gt;Draws strata (zones of similar expected density) from raster covariates such as elevation, a vegetation index or a land-cover map. Only cells whose centre lies inside the sampling frame count. A cell with NoData in any covariate is left out and its area reported.&lt;/p&gt;&lt;p&gt;The covariates are put on the grid of the first one, in the frame's CRS (a geographic frame is projected to the UTM zone of its centre). Rasters in another CRS or on another grid are warped on the fly (bilinear; nearest neighbour for raster classes). Rasters are read block by block, so memory stays bounded whatever their size.&lt;/p&gt;&lt;h3&gt;Methods&lt;/h3&gt;&lt;ul&gt;&lt;li&gt;&lt;b&gt;Quantile&lt;/b&gt;: strata of equal area along the first covariate. The boundaries are the exact sample quantiles of the frame's cells (Hyndman &amp;amp; Fan 1996, definition 7).&lt;/li&gt;&lt;li&gt;&lt;b&gt;Equal interval&lt;/b&gt;: the first covariate's range cut into equal widths.&lt;/li&gt;&lt;li&gt;&lt;b&gt;Cumulative root frequency&lt;/b&gt;: the Dalenius &amp;amp; Hodges (1959) rule on a 100-class histogram of the first covariate (Cochran 1977, ch. 5A).&lt;/li&gt;&lt;li&gt;&lt;b&gt;k-means&lt;/b&gt;: all covariates standardised to mean 0 and SD 1, k-means++ seeds (Arthur &amp;amp; Vassilvitskii 2007) and Lloyd iterations on a random sample of 100,000 cells drawn with the seed; then every cell goes to its nearest centre.&lt;/li&gt;&lt;li&gt;&lt;b&gt;Raster classes&lt;/b&gt;: each value of the first covariate (a categorical raster, at most 50 classes) is one stratum; the number of strata is ignored.&lt;/li&gt;&lt;/ul&gt;&lt;p&gt;Strata are numbered 1..k by increasing mean of the first covariate. Patches (4-connected) smaller than the minimum patch area (ha) join a neighbouring stratum before the strata are turned into polygons: specks through GDAL's sieve, then each small patch, smallest first, the neighbour that brings it to the minimum area. A patch that touches no other stratum stays, with a warning.&lt;/p&gt;&lt;h3&gt;Outputs&lt;/h3&gt;&lt;ul&gt;&lt;li&gt;Stratum raster: the stratum of each cell (0 = none).&lt;/li&gt;&lt;li&gt;Strata: one multipolygon per stratum with &lt;i&gt;stratum&lt;/i&gt;, &lt;i&gt;label&lt;/i&gt;, &lt;i&gt;area_ha&lt;/i&gt; (cells × cell area), &lt;i&gt;cov_mean&lt;/i&gt; and &lt;i&gt;cov_sd&lt;/i&gt; of the first covariate, and &lt;i&gt;cov2_mean&lt;/i&gt;, &lt;i&gt;cov2_sd&lt;/i&gt;, … for the others (SD over the stratum's cells).&lt;/li&gt;&lt;li&gt;Report: boundaries, areas, covariate statistics per stratum, the share of each covariate's variance the strata explain (R²), a histogram with the boundaries and a map.&lt;/li&gt;&lt;/ul&gt;&lt;p&gt;The random seed is used by k-means only (0 draws one and records it).&lt;/p&gt;&lt;p&gt;Strata are a statistical device: before fieldwork, check every unit's access and safety.&lt;/p&gt;</source>
        <translation>&lt;p&gt;Forma estratos (zonas de densidad esperada similar) a partir de covariables ráster como la altitud, un índice de vegetación o un mapa de cobertura del suelo. Solo cuentan las celdas cuyo centro está dentro del marco de muestreo. Una celda con NoData en alguna covariable se deja fuera y se informa de su área.&lt;/p&gt;&lt;p&gt;Las covariables se llevan a la malla de la primera, en el SRC del marco (un marco en coordenadas geográficas se proyecta a la zona UTM de su centro). Los rásteres en otro SRC o en otra malla se remuestrean al vuelo (bilineal; vecino más próximo para las clases del ráster). Los rásteres se leen bloque a bloque, de modo que la memoria queda acotada sea cual sea su tamaño.&lt;/p&gt;&lt;h3&gt;Métodos&lt;/h3&gt;&lt;ul&gt;&lt;li&gt;&lt;b&gt;Cuantiles&lt;/b&gt;: estratos de igual área a lo largo de la primera covariable. Los límites son los cuantiles muestrales exactos de las celdas del marco (Hyndman &amp;amp; Fan 1996, definición 7).&lt;/li&gt;&lt;li&gt;&lt;b&gt;Intervalos iguales&lt;/b&gt;: el rango de la primera covariable dividido en anchos iguales.&lt;/li&gt;&lt;li&gt;&lt;b&gt;Raíz acumulada de las frecuencias&lt;/b&gt;: la regla de Dalenius &amp;amp; Hodges (1959) sobre un histograma de 100 clases de la primera covariable (Cochran 1977, cap. 5A).&lt;/li&gt;&lt;li&gt;&lt;b&gt;k-medias&lt;/b&gt;: todas las covariables estandarizadas a media 0 y DE 1, semillas k-means++ (Arthur &amp;amp; Vassilvitskii 2007) e iteraciones de Lloyd sobre una muestra aleatoria de 100.000 celdas sorteada con la semilla; después cada celda va al centro más próximo.&lt;/li&gt;&lt;li&gt;&lt;b&gt;Clases del ráster&lt;/b&gt;: cada valor de la primera covariable (un ráster categórico, como máximo 50 clases) es un estrato; el número de estratos se ignora.&lt;/li&gt;&lt;/ul&gt;&lt;p&gt;Los estratos se numeran de 1 a k por media creciente de la primera covariable. Las manchas (conectividad 4) menores que el área mínima (ha) se unen a un estrato vecino antes de convertir los estratos en polígonos: los granos mediante la criba de GDAL y luego cada mancha pequeña, de la menor a la mayor, al vecino que la lleva al área mínima. Una mancha que no toca ningún otro estrato se queda, con una advertencia.&lt;/p&gt;&lt;h3&gt;Salidas&lt;/h3&gt;&lt;ul&gt;&lt;li&gt;Ráster de estratos: el estrato de cada celda (0 = ninguno).&lt;/li&gt;&lt;li&gt;Estratos: un multipolígono por estrato con &lt;i&gt;stratum&lt;/i&gt;, &lt;i&gt;label&lt;/i&gt;, &lt;i&gt;area_ha&lt;/i&gt; (celdas × área de la celda), &lt;i&gt;cov_mean&lt;/i&gt; y &lt;i&gt;cov_sd&lt;/i&gt; de la primera covariable, y &lt;i&gt;cov2_mean&lt;/i&gt;, &lt;i&gt;cov2_sd&lt;/i&gt;, … para las demás (DE sobre las celdas del estrato).&lt;/li&gt;&lt;li&gt;Informe: límites, áreas, estadísticas de las covariables por estrato, la parte de la varianza de cada covariable que explican los estratos (R²), un histograma con los límites y un mapa.&lt;/li&gt;&lt;/ul&gt;&lt;p&gt;La semilla aleatoria solo la usa k-medias (0 sortea una y la registra).&lt;/p&gt;&lt;p&gt;Los estratos son un recurso estadístico: antes del trabajo de campo, compruebe el acceso y la seguridad de cada unidad.&lt;/p&gt;</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/stratify.py" line="115"/>
        <source>Sampling frame</source>
        <translation>Marco de muestreo</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/stratify.py" line="117"/>
        <source>Raster covariates (band 1 of each; the first one sets the grid)</source>
        <translation>Covariables ráster (banda 1 de cada una; la primera fija la malla)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/stratify.py" line="120"/>
        <source>Method</source>
        <translation>Método</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/stratify.py" line="122"/>
        <source>Number of strata (ignored for raster classes)</source>
        <translation>Número de estratos (se ignora con clases del ráster)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/stratify.py" line="125"/>
        <source>Minimum patch area (ha); smaller patches join a neighbour</source>
        <translation>Área mínima de mancha (ha); las manchas menores se unen a una vecina</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/stratify.py" line="129"/>
        <source>Stratum raster</source>
        <translation>Ráster de estratos</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/stratify.py" line="130"/>
        <source>Strata</source>
        <translation>Estratos</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/stratify.py" line="133"/>
        <source>Number of strata formed</source>
        <translation>Número de estratos formados</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/stratify.py" line="134"/>
        <source>Share of the first covariate's variance explained by the strata (R²)</source>
        <translation>Parte de la varianza de la primera covariable explicada por los estratos (R²)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/stratify.py" line="141"/>
        <source>Give at least one raster in COVARIATES.</source>
        <translation>Indique al menos un ráster en COVARIATES.</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/stratify.py" line="143"/>
        <source>COVARIATES holds {n} rasters; use at most {m}.</source>
        <translation>COVARIATES contiene {n} rásteres; use como máximo {m}.</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/stratify.py" line="148"/>
        <source>COVARIATES: &apos;{name}&apos; is not a raster layer.</source>
        <translation>COVARIATES: «{name}» no es una capa ráster.</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/stratify.py" line="151"/>
        <source>Covariate &apos;{name}&apos; is not a file raster that GDAL can read. Save it as a GeoTIFF first.</source>
        <translation>La covariable «{name}» no es un archivo ráster que GDAL pueda leer. Guárdela primero como GeoTIFF.</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/stratify.py" line="222"/>
        <source>Layer &apos;{layer}&apos; (FRAME) has no polygon with a positive area. Choose the sampling-frame layer.</source>
        <translation>La capa «{layer}» (FRAME) no tiene ningún polígono con área positiva. Elija la capa del marco de muestreo.</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/stratify.py" line="187"/>
        <source>Warped onto the grid of &apos;{first}&apos; in {crs}: {names}.</source>
        <translation>Remuestreadas sobre la malla de «{first}» en {crs}: {names}.</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/stratify.py" line="196"/>
        <source>{k} strata on {ha} ha; R² of '{name}': {r2}.</source>
        <translation>{k} estratos en {ha} ha; R² de «{name}»: {r2}.</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/stratify.py" line="98"/>
        <source>&lt;h3&gt;Minimum patch area&lt;/h3&gt;&lt;p&gt;The default of {default:g} ha is chosen for field teams: a patch smaller than a few sample units is not a stratum. Four 20 m × 20 m plots 50 m apart need about 1 ha; a zone smaller than that cannot hold the units a stratum needs for its own variance, and on the map it is noise of the covariate, not a zone to survey. Raise it for larger units (transects, camera stations); 0 keeps every cell's stratum.&lt;/p&gt;&lt;p&gt;A speckled covariate (a 10 m vegetation index, a noisy classification) can form millions of patches. The patches are counted before they are merged and before they are turned into polygons: strata with more than {max_patches:,} patches stop the run with an error that gives their number and a MIN_AREA that brings them under the limit, and a covariate too speckled to merge in bounded memory (more than {max_sieve:,} patches) stops it with advice to smooth or coarsen the covariate first. When the patches left after merging the specks are too many to merge one by one, patches below MIN_AREA first join their largest neighbour (the rule of GDAL's sieve filter), with a warning.&lt;/p&gt;</source>
        <translation>&lt;h3&gt;Área mínima de mancha&lt;/h3&gt;&lt;p&gt;El valor por defecto de {default:g} ha está pensado para los equipos de campo: una mancha menor que unas pocas unidades de muestreo no es un estrato. Cuatro parcelas de 20 m × 20 m separadas 50 m necesitan alrededor de 1 ha; una zona menor no puede contener las unidades que un estrato necesita para su propia varianza, y en el mapa es ruido de la covariable, no una zona que muestrear. Auméntelo para unidades mayores (transectos, estaciones de cámaras trampa); 0 conserva el estrato de cada celda.&lt;/p&gt;&lt;p&gt;Una covariable moteada (un índice de vegetación a 10 m, una clasificación ruidosa) puede formar millones de manchas. Las manchas se cuentan antes de fusionarlas y antes de convertirlas en polígonos: los estratos con más de {max_patches:,} manchas detienen la ejecución con un error que indica su número y un MIN_AREA que las deja por debajo del límite, y una covariable demasiado moteada para fusionarla con memoria acotada (más de {max_sieve:,} manchas) la detiene con el consejo de suavizar la covariable o aumentar antes su tamaño de celda. Cuando las manchas que quedan tras fusionar las manchas diminutas son demasiadas para fusionarlas una a una, las manchas por debajo de MIN_AREA se unen primero a su vecina mayor (la regla del filtro de criba de GDAL), con una advertencia.&lt;/p&gt;</translation>
    </message>
</context>
<context>
    <name>Trend</name>
    <message>
        <location filename="../processing/algorithms/trend.py" line="128"/>
        <source>Trend over years</source>
        <translation>Tendencia a lo largo de los años</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/trend.py" line="43"/>
        <source>Estimates the change per year of a monitored population, with its confidence interval and p-value, and a yearly index.

Input: a layer or table with one record per unit and year (unit counts), or one record per year (yearly estimates).
Source 0, unit counts: unit id, year and count fields; optionally a stratum field (a trend per stratum is added to the report) and a unit-area field (the area or length surveyed in that record: counts are compared per unit of effort). A NULL count means not surveyed. Units need not be surveyed every year (revisit panels). The model is log-linear Poisson with one effect per unit, log E[count] = log(area) + unit effect + β·year (McCullagh &amp; Nelder 1989), fitted by Newton's method with the unit effects in closed form. Overdispersion by quasi-likelihood: the interval uses the deviance drop between a model with one effect per year and the trend model, per degree of freedom, so that years that differ as a whole (weather, observers) widen it, with Student's t. Units that never counted an animal are left out of the fit (they carry no information on the trend).
Source 1, yearly estimates: year, estimate and standard-error fields (for example the abund and abund_se of the estimate step, one season per record; with a stratum field, the rows 'all' are used). Weighted log-linear regression in which each year's variance is its sampling variance ln(1 + CV²) plus the year-to-year process variance, estimated by the method of moments (DerSimonian &amp; Laird 1986; Thompson &amp; Sharp 1999); the slope's variance is scaled by the residual mean square, with t on k − 2 degrees of freedom (Hartung &amp; Knapp 2001).
Confidence level: of the intervals (default 0.95).

Outputs: the yearly index table (year, index with index_lo and index_hi, and the fitted trend with trend_lo and trend_hi); the numbers CHANGE, CHANGE_LO, CHANGE_HI (% per year) and P_VALUE (two-sided, no trend); an HTML report with the index and the trend, the change per year in words, and the cautions.

At least 3 years are needed; a unit counted twice in a year, negative counts or estimates not above 0 stop the run, naming the records.

A trend in counts is a trend in the population only if detection did not change over the years.

References: McCullagh &amp; Nelder (1989); Bishop, Fienberg &amp; Holland (1975); DerSimonian &amp; Laird (1986); Thompson &amp; Sharp (1999); Hartung &amp; Knapp (2001); Urquhart &amp; Kincaid (1999).</source>
        <translation>Estima el cambio anual de una población en seguimiento, con su intervalo de confianza y su valor p, y un índice anual.

Entrada: una capa o tabla con un registro por unidad y año (conteos por unidad), o un registro por año (estimaciones anuales).
Fuente 0, conteos por unidad: campos de identificador de unidad, año y conteo; opcionalmente un campo de estrato (se añade al informe una tendencia por estrato) y un campo de área de la unidad (el área o la longitud muestreada en ese registro: los conteos se comparan por unidad de esfuerzo). Un conteo NULL significa no muestreado. No hace falta muestrear las unidades cada año (paneles de revisita). El modelo es de Poisson log-lineal con un efecto por unidad, log E[conteo] = log(área) + efecto de la unidad + β·año (McCullagh &amp; Nelder 1989), ajustado por el método de Newton con los efectos de las unidades en forma cerrada. Sobredispersión por cuasi-verosimilitud: el intervalo usa el descenso de la devianza entre un modelo con un efecto por año y el modelo de tendencia, por grado de libertad, de modo que los años que difieren en su conjunto (meteorología, observadores) lo ensanchan, con la t de Student. Las unidades que nunca contaron un animal se dejan fuera del ajuste (no aportan información sobre la tendencia).
Fuente 1, estimaciones anuales: campos de año, estimación y error estándar (por ejemplo abund y abund_se del paso de estimación, una temporada por registro; con un campo de estrato se usan las filas 'all'). Regresión log-lineal ponderada en la que la varianza de cada año es su varianza de muestreo ln(1 + CV²) más la varianza del proceso entre años, estimada por el método de los momentos (DerSimonian &amp; Laird 1986; Thompson &amp; Sharp 1999); la varianza de la pendiente se escala por el cuadrado medio residual, con t con k − 2 grados de libertad (Hartung &amp; Knapp 2001).
Nivel de confianza: el de los intervalos (0.95 por defecto).

Salidas: la tabla del índice anual (year, index con index_lo e index_hi, y la tendencia ajustada con trend_lo y trend_hi); los valores CHANGE, CHANGE_LO, CHANGE_HI (% por año) y P_VALUE (bilateral, sin tendencia); un informe HTML con el índice y la tendencia, el cambio anual expresado en palabras y las precauciones.

Se necesitan al menos 3 años; una unidad contada dos veces en un año, conteos negativos o estimaciones no mayores que 0 detienen la ejecución, nombrando los registros.

Una tendencia en los conteos solo es una tendencia de la población si la detección no cambió a lo largo de los años.

Referencias: McCullagh &amp; Nelder (1989); Bishop, Fienberg &amp; Holland (1975); DerSimonian &amp; Laird (1986); Thompson &amp; Sharp (1999); Hartung &amp; Knapp (2001); Urquhart &amp; Kincaid (1999).</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/trend.py" line="76"/>
        <source>Counts or yearly estimates (layer or table)</source>
        <translation>Conteos o estimaciones anuales (capa o tabla)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/trend.py" line="78"/>
        <source>What the input holds</source>
        <translation>Contenido de la entrada</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/trend.py" line="78"/>
        <source>Unit counts</source>
        <translation>Conteos por unidad</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/trend.py" line="78"/>
        <source>Yearly estimates</source>
        <translation>Estimaciones anuales</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/trend.py" line="81"/>
        <source>Unit id field (unit counts)</source>
        <translation>Campo identificador de unidad (conteos por unidad)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/trend.py" line="81"/>
        <source>Year field</source>
        <translation>Campo de año</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/trend.py" line="81"/>
        <source>Count field (unit counts)</source>
        <translation>Campo de conteo (conteos por unidad)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/trend.py" line="81"/>
        <source>Estimate field (yearly estimates)</source>
        <translation>Campo de estimación (estimaciones anuales)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/trend.py" line="81"/>
        <source>Standard-error field (yearly estimates)</source>
        <translation>Campo de error estándar (estimaciones anuales)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/trend.py" line="81"/>
        <source>Stratum field (optional)</source>
        <translation>Campo de estrato (opcional)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/trend.py" line="81"/>
        <source>Unit-area field: area surveyed per record (optional)</source>
        <translation>Campo de área de la unidad: área muestreada por registro (opcional)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/trend.py" line="93"/>
        <source>Confidence level</source>
        <translation>Nivel de confianza</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/trend.py" line="96"/>
        <source>Yearly index</source>
        <translation>Índice anual</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/trend.py" line="99"/>
        <source>Change per year (%)</source>
        <translation>Cambio anual (%)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/trend.py" line="99"/>
        <source>Lower limit of the change per year (%)</source>
        <translation>Límite inferior del cambio anual (%)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/trend.py" line="99"/>
        <source>Upper limit of the change per year (%)</source>
        <translation>Límite superior del cambio anual (%)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/trend.py" line="99"/>
        <source>p-value of the trend (two-sided)</source>
        <translation>Valor p de la tendencia (bilateral)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/trend.py" line="130"/>
        <source>Change per year: {c:+.2f}% ({lo:+.2f}% to {hi:+.2f}%), p = {p:.3g}.</source>
        <translation>Cambio anual: {c:+.2f}% ({lo:+.2f}% a {hi:+.2f}%), p = {p:.3g}.</translation>
    </message>
</context>
<context>
    <name>TrendPower</name>
    <message>
        <location filename="../processing/algorithms/trendpower.py" line="191"/>
        <source>Power to detect a trend</source>
        <translation>Potencia para detectar una tendencia</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/trendpower.py" line="46"/>
        <source>Estimates, by simulation, how likely a monitoring programme is to detect a given change per year: the power, by number of years and number of units, and the years needed for 80% power.

Units per year and panels: N_UNITS units over YEARS years, in the panel design of plotwise:panels (0 every unit every year; 1 rotating: PANELS panels, each unit once every PANELS years; 2 split: a core of CORE_SHARE of the units every year plus rotating panels). Or give a panels layer (the output of plotwise:panels): its units and their visit years replace N_UNITS, YEARS and the design.
Changes to detect: annual changes in % per year, several separated by commas (e.g. -3, -5).
Mean count: the mean number of animals per unit in the first year (before detection).
Variance components, as standard deviations on the log scale: between units (SD_UNIT, lasting differences between units), unit × year (SD_UNIT_YEAR, a unit's ups and downs) and year to year (SD_YEAR, shared by all units: weather, observers, conditions). The defaults (1.0, 0.3, 0.1) are illustrative only: use your own values. A pilot table (the estimate step's output table, fields n, mean_c and sd_c) can give the mean count and SD_UNIT: they are then taken from it by matching a Poisson–log-normal count. The other two need several years of counts.
Detection probability: each animal is counted with this probability (constant over the years).
Significance level and test: the level of the t test on the trend; two-sided, or one-sided in the direction of the change. 0.1 is often used in monitoring (common practice).
Replicates: simulated programmes per change (1,000 give a Monte Carlo SE of at most 0.016). Random seed: 0 draws one and records it.

Each replicate simulates Poisson counts for every unit and visit, estimates the trend with the same model as plotwise:trend (log-linear Poisson with unit effects, quasi-likelihood scale between years) and records whether the change was detected (Gerrodette 1987 for the setting).

Outputs: a table of power with its Monte Carlo SE by years, n_units and change; an HTML report with the power curves against years and against units and the years needed for 80% power. Power depends on the variance components assumed.

References: Gerrodette (1987); Urquhart &amp; Kincaid (1999); McDonald (2003); McCullagh &amp; Nelder (1989).

A monitoring programme sends teams out every year: check every unit's access and safety before each season; the tool never makes a location safe. Follow your agency's field-safety rules and local law.</source>
        <translation>Estima, por simulación, la probabilidad de que un programa de seguimiento detecte un cambio anual dado: la potencia, según el número de años y el número de unidades, y los años necesarios para una potencia del 80 %.

Unidades por año y paneles: N_UNITS unidades durante YEARS años, en el diseño de paneles de plotwise:panels (0 todas las unidades cada año; 1 rotativos: PANELS paneles, cada unidad una vez cada PANELS años; 2 divididos: un núcleo con la proporción CORE_SHARE de las unidades cada año más paneles rotativos). O indique una capa de paneles (la salida de plotwise:panels): sus unidades y sus años de visita sustituyen a N_UNITS, YEARS y el diseño.
Cambios que detectar: cambios anuales en % por año, varios separados por comas (p. ej. -3, -5).
Conteo medio: el número medio de animales por unidad en el primer año (antes de la detección).
Componentes de la varianza, como desviaciones estándar en escala logarítmica: entre unidades (SD_UNIT, diferencias duraderas entre unidades), unidad × año (SD_UNIT_YEAR, las subidas y bajadas de una unidad) y entre años (SD_YEAR, común a todas las unidades: meteorología, observadores, condiciones). Los valores por defecto (1.0, 0.3, 0.1) son solo ilustrativos: use sus propios valores. Una tabla piloto (la tabla de salida del paso de estimación, campos n, mean_c y sd_c) puede dar el conteo medio y SD_UNIT: se toman entonces de ella ajustando un conteo Poisson–log-normal. Los otros dos necesitan varios años de conteos.
Probabilidad de detección: cada animal se cuenta con esta probabilidad (constante a lo largo de los años).
Nivel de significación y prueba: el nivel de la prueba t sobre la tendencia; bilateral, o unilateral en el sentido del cambio. En seguimiento se usa a menudo 0.1 (práctica habitual).
Réplicas: programas simulados por cambio (1000 dan un EE de Monte Carlo de como máximo 0.016). Semilla aleatoria: 0 sortea una y la registra.

Cada réplica simula conteos de Poisson para cada unidad y visita, estima la tendencia con el mismo modelo que plotwise:trend (Poisson log-lineal con efectos de unidad, factor de escala de cuasi-verosimilitud entre años) y registra si se detectó el cambio (Gerrodette 1987 para el planteamiento).

Salidas: una tabla de la potencia con su EE de Monte Carlo por years, n_units y change; un informe HTML con las curvas de potencia frente a los años y frente a las unidades, y los años necesarios para una potencia del 80 %. La potencia depende de los componentes de la varianza supuestos.

Referencias: Gerrodette (1987); Urquhart &amp; Kincaid (1999); McDonald (2003); McCullagh &amp; Nelder (1989).

Un programa de seguimiento envía equipos al campo cada año: compruebe el acceso y la seguridad de cada unidad antes de cada temporada; la herramienta nunca hace que una ubicación sea segura. Siga las normas de seguridad en el terreno de su organismo y la legislación local.</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/trendpower.py" line="79"/>
        <source>Units (N_UNITS)</source>
        <translation>Unidades (N_UNITS)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/trendpower.py" line="81"/>
        <source>Years of the programme</source>
        <translation>Años del programa</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/trendpower.py" line="84"/>
        <source>Panel design</source>
        <translation>Diseño de paneles</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/trendpower.py" line="84"/>
        <source>Every unit every year</source>
        <translation>Todas las unidades cada año</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/trendpower.py" line="84"/>
        <source>Rotating panels</source>
        <translation>Paneles rotativos</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/trendpower.py" line="84"/>
        <source>Split panels (core + rotating)</source>
        <translation>Paneles divididos (núcleo + rotativos)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/trendpower.py" line="88"/>
        <source>Rotating panels (K)</source>
        <translation>Paneles rotativos (K)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/trendpower.py" line="91"/>
        <source>Share of units in the core (split panels)</source>
        <translation>Proporción de unidades en el núcleo (paneles divididos)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/trendpower.py" line="94"/>
        <source>Panels layer (output of plotwise:panels; replaces the design)</source>
        <translation>Capa de paneles (salida de plotwise:panels; sustituye al diseño)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/trendpower.py" line="97"/>
        <source>Changes to detect (% per year, comma-separated)</source>
        <translation>Cambios que detectar (% por año, separados por comas)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/trendpower.py" line="99"/>
        <source>Mean animals per unit in the first year</source>
        <translation>Media de animales por unidad en el primer año</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/trendpower.py" line="99"/>
        <source>SD between units (log scale)</source>
        <translation>DE entre unidades (escala logarítmica)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/trendpower.py" line="99"/>
        <source>SD unit × year (log scale)</source>
        <translation>DE unidad × año (escala logarítmica)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/trendpower.py" line="99"/>
        <source>SD year to year (log scale)</source>
        <translation>DE entre años (escala logarítmica)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/trendpower.py" line="107"/>
        <source>Pilot estimate table (gives the mean count and SD between units; optional)</source>
        <translation>Tabla de estimación piloto (da el conteo medio y la DE entre unidades; opcional)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/trendpower.py" line="110"/>
        <source>Detection probability</source>
        <translation>Probabilidad de detección</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/trendpower.py" line="113"/>
        <source>Significance level</source>
        <translation>Nivel de significación</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/trendpower.py" line="115"/>
        <source>Two-sided test</source>
        <translation>Prueba bilateral</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/trendpower.py" line="116"/>
        <source>Replicates</source>
        <translation>Réplicas</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/trendpower.py" line="120"/>
        <source>Power table</source>
        <translation>Tabla de potencia</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/trendpower.py" line="128"/>
        <source>every unit every year</source>
        <translation>todas las unidades cada año</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/trendpower.py" line="128"/>
        <source>rotating panels</source>
        <translation>paneles rotativos</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/trendpower.py" line="128"/>
        <source>split panels</source>
        <translation>paneles divididos</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/trendpower.py" line="138"/>
        <source>(K = {k})</source>
        <translation>(K = {k})</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/trendpower.py" line="144"/>
        <source>{k} panels from the layer</source>
        <translation>{k} paneles tomados de la capa</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/trendpower.py" line="187"/>
        <source>Change {c:+g}% per year: 80% power after {t} years.</source>
        <translation>Cambio de {c:+g}% por año: potencia del 80% tras {t} años.</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/trendpower.py" line="187"/>
        <source>Change {c:+g}% per year: 80% power not reached within {t} years.</source>
        <translation>Cambio de {c:+g}% por año: potencia del 80% no alcanzada en {t} años.</translation>
    </message>
</context>
</TS>
