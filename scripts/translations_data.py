"""French and Spanish translations of Plotwise's user-facing strings, keyed by the English source.

``TRANSLATIONS[source] = (french, spanish)``. ``scripts/apply_translations.py`` writes them into
``i18n/plotwise_fr.ts`` and ``i18n/plotwise_es.ts`` (after ``scripts/update_translations.py``
has extracted the sources). Not packaged: the plugin ships the compiled ``.qm`` files only.

Conventions: HTML tags, ``{placeholders}`` (with their format specs), parameter NAMES in upper
case, field names (``stratum``, ``n_alloc``, ``area_m2``, ...), algorithm ids and the invented
names of the demo (Hollin Ridge Reserve, velmar, Tarnmere) stay as they are. Terms of the trade:
fr « strate », « base de sondage », « unité d'échantillonnage », « transect linéaire »,
« allocation de Neyman », « densité », « abondance », « intervalle de confiance »,
« coefficient de variation » ; es « estrato », « marco de muestreo », « unidad de muestreo »,
« transecto lineal », « asignación de Neyman », « densidad », « abundancia »,
« intervalo de confianza », « coeficiente de variación ».
"""

TRANSLATIONS = {}

# -- plugin, provider, shared algorithm strings, bridge, styles ------------------------------
TRANSLATIONS.update({
    "Plotwise cannot start because a library it needs is missing or too old: {problems} Install the host's "
    "standard packages (on Debian or Ubuntu: python3-numpy, python3-scipy, python3-shapely, python3-pyproj, "
    "python3-gdal) and restart QGIS. No Plotwise algorithm has been added.": (
        "Plotwise ne peut pas démarrer car une bibliothèque nécessaire est absente ou trop ancienne : {problems} "
        "Installez les paquets standard de l'hôte (sous Debian ou Ubuntu : python3-numpy, python3-scipy, "
        "python3-shapely, python3-pyproj, python3-gdal) et redémarrez QGIS. Aucun algorithme Plotwise n'a été ajouté.",
        "Plotwise no puede iniciarse porque falta una biblioteca necesaria o es demasiado antigua: {problems} "
        "Instale los paquetes estándar del anfitrión (en Debian o Ubuntu: python3-numpy, python3-scipy, "
        "python3-shapely, python3-pyproj, python3-gdal) y reinicie QGIS. No se ha añadido ningún algoritmo de Plotwise.",
    ),
    "{name} is missing ({error}).": ("{name} est absent ({error}).", "Falta {name} ({error})."),
    "{name} {version} is too old; version {wanted} or newer is needed.": (
        "{name} {version} est trop ancien ; il faut la version {wanted} ou plus récente.",
        "{name} {version} es demasiado antiguo; se necesita la versión {wanted} o posterior.",
    ),
    "Plotwise": ("Plotwise", "Plotwise"),
    "Plotwise survey design and estimation": (
        "Plotwise : conception d'inventaires et estimation",
        "Plotwise: diseño de muestreos y estimación",
    ),
    "The example model {path} could not be read.": (
        "Le modèle d'exemple {path} n'a pas pu être lu.",
        "No se pudo leer el modelo de ejemplo {path}.",
    ),
    "Example chains": ("Chaînes d'exemple", "Cadenas de ejemplo"),
    "Example chain: plan a survey (frame, strata, effort, layout)": (
        "Chaîne d'exemple : planifier un inventaire (base de sondage, strates, effort, disposition)",
        "Cadena de ejemplo: planificar un muestreo (marco, estratos, esfuerzo, disposición)",
    ),
    "Builds the sampling frame (study area minus exclusions and cells over the slope limit), draws k-means strata "
    "from the covariate rasters, allocates the units by Neyman allocation with the covariate standard deviation as "
    "a proxy, and lays out spatially balanced square plots with 3 reserve units per stratum. Open it in the modeler "
    "to change any step. Check every unit's access and safety before sending a team: the tool never makes a "
    "location safe. Follow your agency's field-safety rules and local law.": (
        "Construit la base de sondage (zone d'étude moins les exclusions et les cellules au-delà de la pente limite), "
        "forme des strates par k-moyennes à partir des rasters de covariables, répartit les unités par allocation de "
        "Neyman avec l'écart-type de la covariable comme substitut, et dispose des placettes carrées spatialement "
        "équilibrées avec 3 unités de réserve par strate. Ouvrez-la dans le modeleur pour modifier une étape. Vérifiez "
        "l'accès à chaque unité et sa sécurité avant d'y envoyer une équipe : l'outil ne rend jamais un emplacement "
        "sûr. Respectez les règles de sécurité sur le terrain de votre organisme et la législation locale.",
        "Construye el marco de muestreo (área de estudio menos las exclusiones y las celdas por encima de la pendiente "
        "límite), forma estratos por k-medias a partir de los rásteres de covariables, reparte las unidades por "
        "asignación de Neyman con la desviación estándar de la covariable como sustituto y dispone parcelas cuadradas "
        "espacialmente equilibradas con 3 unidades de reserva por estrato. Ábrala en el modelador para cambiar "
        "cualquier paso. Compruebe el acceso y la seguridad de cada unidad antes de enviar un equipo: la herramienta "
        "nunca hace que una ubicación sea segura. Siga las normas de seguridad en el terreno de su organismo y la "
        "legislación local.",
    ),
    "Example chain: estimate from simulated counts": (
        "Chaîne d'exemple : estimer à partir de comptages simulés",
        "Cadena de ejemplo: estimar a partir de conteos simulados",
    ),
    "For training: fills the units' count field from a simulated population, then estimates density and abundance "
    "per stratum and overall. With real fieldwork, run the estimate on the counted units instead.": (
        "Pour la formation : remplit le champ de comptage des unités à partir d'une population simulée, puis estime "
        "la densité et l'abondance par strate et au total. Avec un vrai travail de terrain, lancez plutôt "
        "l'estimation sur les unités comptées.",
        "Para formación: rellena el campo de conteo de las unidades a partir de una población simulada y luego "
        "estima la densidad y la abundancia por estrato y en total. Con trabajo de campo real, ejecute en su lugar "
        "la estimación sobre las unidades contadas.",
    ),
    # groups and shared parameters
    "Survey design": ("Conception de l'inventaire", "Diseño del muestreo"),
    "Estimation": ("Estimation", "Estimación"),
    "Demo and training": ("Démonstration et formation", "Demostración y formación"),
    "Cancelled by the user. No result was written.": (
        "Annulé par l'utilisateur. Aucun résultat n'a été écrit.",
        "Cancelado por el usuario. No se ha escrito ningún resultado.",
    ),
    "Random seed (0 draws one and records it)": (
        "Graine aléatoire (0 en tire une et l'enregistre)",
        "Semilla aleatoria (0 sortea una y la registra)",
    ),
    "Report (HTML)": ("Rapport (HTML)", "Informe (HTML)"),
    "HTML files (*.html)": ("Fichiers HTML (*.html)", "Archivos HTML (*.html)"),
    "Seed used: {seed}": ("Graine utilisée : {seed}", "Semilla usada: {seed}"),
    "Report written to {path}": ("Rapport écrit dans {path}", "Informe escrito en {path}"),
    # bridge
    "The density surface '{name}' cannot be read by GDAL ({error}). Save it as a GeoTIFF first.": (
        "La surface de densité « {name} » ne peut pas être lue par GDAL ({error}). Enregistrez-la d'abord en GeoTIFF.",
        "GDAL no puede leer la superficie de densidad «{name}» ({error}). Guárdela primero como GeoTIFF.",
    ),
    "The density surface '{name}' does not overlap the sampling frame. Check that both cover the same area.": (
        "La surface de densité « {name} » ne recouvre pas la base de sondage. Vérifiez que les deux couvrent la même zone.",
        "La superficie de densidad «{name}» no se superpone al marco de muestreo. Compruebe que ambos cubren la misma zona.",
    ),
    "The density surface '{name}' could not be warped to {crs} ({error}).": (
        "La surface de densité « {name} » n'a pas pu être reprojetée en {crs} ({error}).",
        "No se pudo reproyectar la superficie de densidad «{name}» a {crs} ({error}).",
    ),
    "Layer '{layer}' has no valid coordinate reference system. Set its CRS (Layer Properties → Source) and run again.": (
        "La couche « {layer} » n'a pas de système de coordonnées de référence valide. Définissez son SCR "
        "(Propriétés de la couche → Source) et relancez.",
        "La capa «{layer}» no tiene un sistema de referencia de coordenadas válido. Defina su SRC "
        "(Propiedades de la capa → Fuente) y vuelva a ejecutar.",
    ),
    "Layer '{layer}' is in geographic coordinates ({src}); computing in {dst} ({name}), the UTM zone of its centre.": (
        "La couche « {layer} » est en coordonnées géographiques ({src}) ; calcul en {dst} ({name}), la zone UTM de son centre.",
        "La capa «{layer}» está en coordenadas geográficas ({src}); se calcula en {dst} ({name}), la zona UTM de su centro.",
    ),
    "The input layer '{layer}' could not be opened.": (
        "La couche d'entrée « {layer} » n'a pas pu être ouverte.",
        "No se pudo abrir la capa de entrada «{layer}».",
    ),
    "Layer '{layer}' has no field named {names}. Choose an existing field.": (
        "La couche « {layer} » n'a pas de champ nommé {names}. Choisissez un champ existant.",
        "La capa «{layer}» no tiene ningún campo llamado {names}. Elija un campo existente.",
    ),
    "Layer '{layer}': invalid geometry repaired for feature id(s) {ids}.": (
        "Couche « {layer} » : géométrie invalide réparée pour le ou les identifiants d'entité {ids}.",
        "Capa «{layer}»: geometría no válida reparada para los identificadores de entidad {ids}.",
    ),
    "Layer '{layer}': empty or zero-area feature id(s) {ids} skipped.": (
        "Couche « {layer} » : entités vides ou de surface nulle ignorées (identifiants {ids}).",
        "Capa «{layer}»: entidades vacías o de área nula omitidas (identificadores {ids}).",
    ),
    " and {n} more": (" et {n} autres", " y {n} más"),
    "Could not create the raster file {path}. Check the folder exists and is writable.": (
        "Impossible de créer le fichier raster {path}. Vérifiez que le dossier existe et est accessible en écriture.",
        "No se pudo crear el archivo ráster {path}. Compruebe que la carpeta existe y admite escritura.",
    ),
    "GDAL has no GPX driver here; the GPX file cannot be written.": (
        "GDAL n'a pas de pilote GPX ici ; le fichier GPX ne peut pas être écrit.",
        "GDAL no tiene aquí controlador GPX; no se puede escribir el archivo GPX.",
    ),
    "Could not create the GPX file {path}. Check the folder exists and is writable.": (
        "Impossible de créer le fichier GPX {path}. Vérifiez que le dossier existe et est accessible en écriture.",
        "No se pudo crear el archivo GPX {path}. Compruebe que la carpeta existe y admite escritura.",
    ),
    # styles
    "primary unit": ("unité principale", "unidad principal"),
    "reserve unit": ("unité de réserve", "unidad de reserva"),
    "per {unit}": ("par {unit}", "por {unit}"),
    "Density (animals {per})": ("Densité (animaux {per})", "Densidad (animales {per})"),
    "no estimate (no surveyed unit)": (
        "pas d'estimation (aucune unité inventoriée)",
        "sin estimación (ninguna unidad muestreada)",
    ),
    "The layer {name} could not be styled ({error}); it keeps the default style.": (
        "La couche {name} n'a pas pu recevoir son style ({error}) ; elle garde le style par défaut.",
        "No se pudo aplicar el estilo a la capa {name} ({error}); conserva el estilo predeterminado.",
    ),
    # report
    "Inputs and parameters": ("Entrées et paramètres", "Entradas y parámetros"),
    "Item": ("Élément", "Elemento"),
    "Value": ("Valeur", "Valor"),
    "Written": ("Généré le", "Generado el"),
    "algorithm": ("algorithme", "algoritmo"),
    "Field safety": ("Sécurité sur le terrain", "Seguridad en el terreno"),
    "Check every unit's access and safety before sending a team. This tool chooses locations for statistical "
    "reasons only: it never makes a location safe to reach or to work in. Steep, remote or flooded terrain, "
    "wildlife, weather and private land can put people at risk. Follow your agency's field-safety rules and local "
    "law, and leave out or replace any unit that cannot be reached safely (record it as not surveyed).": (
        "Vérifiez l'accès à chaque unité et sa sécurité avant d'y envoyer une équipe. Cet outil choisit des "
        "emplacements pour des raisons uniquement statistiques : il ne rend jamais un emplacement sûr à atteindre ni "
        "sûr pour y travailler. Un terrain escarpé, isolé ou inondé, la faune, la météo et les terrains privés peuvent "
        "mettre des personnes en danger. Respectez les règles de sécurité sur le terrain de votre organisme et la "
        "législation locale, et écartez ou remplacez toute unité qui ne peut pas être atteinte en sécurité "
        "(notez-la comme non inventoriée).",
        "Compruebe el acceso y la seguridad de cada unidad antes de enviar un equipo. Esta herramienta elige "
        "ubicaciones solo por razones estadísticas: nunca hace que una ubicación sea segura para llegar a ella ni "
        "para trabajar en ella. El terreno escarpado, remoto o inundado, la fauna, el tiempo atmosférico y las tierras "
        "privadas pueden poner a las personas en riesgo. Siga las normas de seguridad en el terreno de su organismo y "
        "la legislación local, y excluya o sustituya cualquier unidad a la que no se pueda llegar con seguridad "
        "(regístrela como no muestreada).",
    ),
    "Warnings": ("Avertissements", "Advertencias"),
    "Method references": ("Références des méthodes", "Referencias de los métodos"),
})

# -- simulate counts -------------------------------------------------------------------------
TRANSLATIONS.update({
    "Simulate counts in sample units": (
        "Simuler des comptages dans les unités d'échantillonnage",
        "Simular conteos en las unidades de muestreo",
    ),
    "<p>Fills the <i>count</i> field of sample units with the number of simulated animals seen in each, for "
    "training, demonstrations and tests of the estimate. Real surveys type the counts in after fieldwork "
    "instead.</p><ul><li><b>Sample units</b>: polygons count the animals inside them. Points count within a "
    "circle of the unit's <i>area_m2</i>, lines within a strip of that area along the line.</li><li><b>Animal "
    "points</b>: one point per animal, for example the demo reserve's simulated animals.</li><li><b>Detection "
    "probability</b>: each animal in a unit is seen with this probability (binomial thinning). 1 means every "
    "animal is seen.</li><li><b>Count reserve units too</b>: off by default, so that units whose <i>role</i> is "
    "<i>reserve</i> keep an empty count (not surveyed), as in a survey where no primary unit needed replacing."
    "</li><li><b>Random seed</b>: 0 draws a seed and records it.</li></ul><p>The output is a copy "
    "of the units with <i>count</i> filled (added when missing) and <i>present</i>, the animals actually in the "
    "unit. The input is not changed.</p>": (
        "<p>Remplit le champ <i>count</i> des unités d'échantillonnage avec le nombre d'animaux simulés vus dans "
        "chacune, pour la formation, les démonstrations et les tests de l'estimation. Dans un vrai inventaire, les "
        "comptages sont saisis après le travail de terrain.</p><ul><li><b>Unités d'échantillonnage</b> : les "
        "polygones comptent les animaux qu'ils contiennent. Les points comptent dans un cercle de surface "
        "<i>area_m2</i> de l'unité, les lignes dans une bande de cette surface le long de la ligne.</li><li><b>Points "
        "des animaux</b> : un point par animal, par exemple les animaux simulés de la réserve de démonstration."
        "</li><li><b>Probabilité de détection</b> : chaque animal présent dans une unité est vu avec cette probabilité "
        "(amincissement binomial). 1 signifie que chaque animal est vu.</li><li><b>Compter aussi les unités de "
        "réserve</b> : désactivé par défaut, pour que les unités dont le <i>role</i> est <i>reserve</i> gardent un "
        "comptage vide (non inventoriées), comme dans un inventaire où aucune unité principale n'a dû être "
        "remplacée.</li><li><b>Graine aléatoire</b> : 0 en tire "
        "une et l'enregistre.</li></ul><p>La sortie est une copie des unités avec <i>count</i> rempli (ajouté s'il "
        "manque) et <i>present</i>, les animaux réellement présents dans l'unité. L'entrée n'est pas modifiée.</p>",
        "<p>Rellena el campo <i>count</i> de las unidades de muestreo con el número de animales simulados vistos en "
        "cada una, para formación, demostraciones y pruebas de la estimación. En un muestreo real los conteos se "
        "introducen después del trabajo de campo.</p><ul><li><b>Unidades de muestreo</b>: los polígonos cuentan los "
        "animales que contienen. Los puntos cuentan dentro de un círculo de área <i>area_m2</i> de la unidad, las "
        "líneas dentro de una franja de esa área a lo largo de la línea.</li><li><b>Puntos de animales</b>: un punto "
        "por animal, por ejemplo los animales simulados de la reserva de demostración.</li><li><b>Probabilidad de "
        "detección</b>: cada animal de una unidad se ve con esta probabilidad (aclarado binomial). 1 significa que "
        "se ve a todos los animales.</li><li><b>Contar también las unidades de reserva</b>: desactivado por "
        "defecto, para que las unidades cuyo <i>role</i> es <i>reserve</i> conserven un conteo vacío (no "
        "muestreadas), como en un muestreo en el que ninguna unidad principal tuvo que sustituirse.</li><li><b>"
        "Semilla aleatoria</b>: 0 sortea una y la registra.</li></ul><p>La "
        "salida es una copia de las unidades con <i>count</i> relleno (añadido si falta) y <i>present</i>, los "
        "animales realmente presentes en la unidad. La entrada no se modifica.</p>",
    ),
    "Sample units": ("Unités d'échantillonnage", "Unidades de muestreo"),
    "Animal points": ("Points des animaux", "Puntos de animales"),
    "Detection probability": ("Probabilité de détection", "Probabilidad de detección"),
    "Units with simulated counts": ("Unités avec comptages simulés", "Unidades con conteos simulados"),
    "Layer '{layer}': these features cannot be counted: {items}. Point and line units need a positive 'area_m2' "
    "field (the layout step writes it); polygons need a geometry.": (
        "Couche « {layer} » : ces entités ne peuvent pas être comptées : {items}. Les unités ponctuelles et "
        "linéaires ont besoin d'un champ « area_m2 » positif (l'étape de disposition l'écrit) ; les polygones ont "
        "besoin d'une géométrie.",
        "Capa «{layer}»: estas entidades no se pueden contar: {items}. Las unidades de punto y de línea necesitan un "
        "campo «area_m2» positivo (lo escribe el paso de disposición); los polígonos necesitan una geometría.",
    ),
    "{n} units counted: {seen} animals seen of {present} present (detection {p:g}); {r} reserve units left empty.": (
        "{n} unités comptées : {seen} animaux vus sur {present} présents (détection {p:g}) ; {r} unités de réserve "
        "laissées vides.",
        "{n} unidades contadas: {seen} animales vistos de {present} presentes (detección {p:g}); {r} unidades de "
        "reserva quedan vacías.",
    ),
    "Count reserve units too": ("Compter aussi les unités de réserve", "Contar también las unidades de reserva"),
})

# -- build frame -----------------------------------------------------------------------------
TRANSLATIONS.update({
    "Build sampling frame": ("Construire la base de sondage", "Construir el marco de muestreo"),
    "Builds the sampling frame: the part of the study area that the survey can speak for.\n\n"
    "Three rules are applied in this order, each one charged only with the area still in the frame when it is "
    "applied:\n"
    "1. Excluded polygons (water, private inholdings, ...) are removed.\n"
    "2. Cells of the mask raster (band 1) whose value lies outside [minimum, maximum], or is NoData, are removed. "
    "Either bound may be left empty. Cells of the study area that the raster does not cover count as NoData. A "
    "raster in another CRS is reprojected on the fly (nearest neighbour). Example: a slope raster in degrees with "
    "maximum 30.\n"
    "3. An inward strip of the given width (metres) along the study area's boundary is removed.\n\n"
    "The result is dissolved into one valid feature with fields frame_id and area_ha. The report gives the area "
    "kept, the area lost to each rule and a map.\n\n"
    "A study area in geographic coordinates is projected to the UTM zone of its centre; the output is in that CRS. "
    "Empty or zero-area features are skipped and invalid geometries repaired, each with a warning.\n\n"
    "Estimates from a survey on this frame apply to the frame only. Excluding steep terrain does not make the "
    "remaining terrain safe: check every unit's access and safety before fieldwork.": (
        "Construit la base de sondage : la partie de la zone d'étude sur laquelle l'inventaire peut se prononcer.\n\n"
        "Trois règles sont appliquées dans cet ordre, chacune n'étant comptée que pour la surface encore dans la base "
        "au moment où elle s'applique :\n"
        "1. Les polygones exclus (eau, enclaves privées, ...) sont retirés.\n"
        "2. Les cellules du raster de masque (bande 1) dont la valeur sort de [minimum, maximum], ou est NoData, sont "
        "retirées. Chaque borne peut rester vide. Les cellules de la zone d'étude que le raster ne couvre pas comptent "
        "comme NoData. Un raster dans un autre SCR est reprojeté à la volée (plus proche voisin). Exemple : un raster "
        "de pente en degrés avec un maximum de 30.\n"
        "3. Une bande intérieure de la largeur donnée (mètres) le long de la limite de la zone d'étude est retirée.\n\n"
        "Le résultat est fusionné en une seule entité valide avec les champs frame_id et area_ha. Le rapport donne la "
        "surface conservée, la surface perdue par chaque règle et une carte.\n\n"
        "Une zone d'étude en coordonnées géographiques est projetée dans la zone UTM de son centre ; la sortie est "
        "dans ce SCR. Les entités vides ou de surface nulle sont ignorées et les géométries invalides réparées, "
        "chaque fois avec un avertissement.\n\n"
        "Les estimations d'un inventaire sur cette base ne valent que pour la base. Exclure les terrains escarpés ne "
        "rend pas le terrain restant sûr : vérifiez l'accès à chaque unité et sa sécurité avant le travail de terrain.",
        "Construye el marco de muestreo: la parte del área de estudio sobre la que el muestreo puede pronunciarse.\n\n"
        "Se aplican tres reglas en este orden, y a cada una solo se le imputa el área que seguía en el marco cuando "
        "se aplica:\n"
        "1. Se quitan los polígonos excluidos (agua, enclaves privados, ...).\n"
        "2. Se quitan las celdas del ráster de máscara (banda 1) cuyo valor queda fuera de [mínimo, máximo] o es "
        "NoData. Cualquiera de los límites puede quedar vacío. Las celdas del área de estudio que el ráster no cubre "
        "cuentan como NoData. Un ráster en otro SRC se reproyecta al vuelo (vecino más próximo). Ejemplo: un ráster "
        "de pendiente en grados con máximo 30.\n"
        "3. Se quita una franja interior del ancho indicado (metros) a lo largo del límite del área de estudio.\n\n"
        "El resultado se disuelve en una sola entidad válida con los campos frame_id y area_ha. El informe da el área "
        "conservada, el área perdida por cada regla y un mapa.\n\n"
        "Un área de estudio en coordenadas geográficas se proyecta a la zona UTM de su centro; la salida está en ese "
        "SRC. Las entidades vacías o de área nula se omiten y las geometrías no válidas se reparan, cada vez con una "
        "advertencia.\n\n"
        "Las estimaciones de un muestreo sobre este marco valen solo para el marco. Excluir el terreno escarpado no "
        "hace seguro el terreno restante: compruebe el acceso y la seguridad de cada unidad antes del trabajo de campo.",
    ),
    "Study area": ("Zone d'étude", "Área de estudio"),
    "Areas to exclude (water, inholdings, ...)": (
        "Zones à exclure (eau, enclaves, ...)",
        "Zonas que excluir (agua, enclaves, ...)",
    ),
    "Mask raster (cells outside the range are excluded)": (
        "Raster de masque (les cellules hors de l'intervalle sont exclues)",
        "Ráster de máscara (se excluyen las celdas fuera del intervalo)",
    ),
    "Lowest accepted mask value (empty: no lower limit)": (
        "Valeur de masque minimale acceptée (vide : pas de limite inférieure)",
        "Valor mínimo aceptado de la máscara (vacío: sin límite inferior)",
    ),
    "Highest accepted mask value (empty: no upper limit)": (
        "Valeur de masque maximale acceptée (vide : pas de limite supérieure)",
        "Valor máximo aceptado de la máscara (vacío: sin límite superior)",
    ),
    "Inward edge buffer (m)": ("Zone tampon intérieure en bordure (m)", "Franja interior en el borde (m)"),
    "Sampling frame": ("Base de sondage", "Marco de muestreo"),
    "MASK_MIN or MASK_MAX is set but no mask raster (MASK) is given. Choose a raster or leave both limits empty.": (
        "MASK_MIN ou MASK_MAX est renseigné mais aucun raster de masque (MASK) n'est donné. Choisissez un raster ou "
        "laissez les deux limites vides.",
        "MASK_MIN o MASK_MAX tiene valor pero no se ha dado ningún ráster de máscara (MASK). Elija un ráster o deje "
        "vacíos ambos límites.",
    ),
    "The lowest accepted mask value (MASK_MIN = {lo}) is greater than the highest (MASK_MAX = {hi}). Swap them or "
    "leave one empty.": (
        "La valeur de masque minimale acceptée (MASK_MIN = {lo}) est supérieure à la maximale (MASK_MAX = {hi}). "
        "Inversez-les ou laissez-en une vide.",
        "El valor mínimo aceptado de la máscara (MASK_MIN = {lo}) es mayor que el máximo (MASK_MAX = {hi}). "
        "Intercámbielos o deje uno vacío.",
    ),
    "Layer '{layer}' (INPUT) has no polygon with a positive area. Choose the study-area polygon layer.": (
        "La couche « {layer} » (INPUT) n'a aucun polygone de surface positive. Choisissez la couche de polygones de "
        "la zone d'étude.",
        "La capa «{layer}» (INPUT) no tiene ningún polígono con área positiva. Elija la capa de polígonos del área "
        "de estudio.",
    ),
    "Mask raster '{layer}' is given without limits: only its NoData cells are excluded.": (
        "Le raster de masque « {layer} » est donné sans limites : seules ses cellules NoData sont exclues.",
        "El ráster de máscara «{layer}» se ha dado sin límites: solo se excluyen sus celdas NoData.",
    ),
    "Mask raster '{layer}' is not a file raster that GDAL can read. Save it as a GeoTIFF first.": (
        "Le raster de masque « {layer} » n'est pas un fichier raster lisible par GDAL. Enregistrez-le d'abord en GeoTIFF.",
        "El ráster de máscara «{layer}» no es un archivo ráster que GDAL pueda leer. Guárdelo primero como GeoTIFF.",
    ),
    "Reading mask raster '{layer}'…": (
        "Chargement du raster de masque « {layer} »…",
        "Leyendo el ráster de máscara «{layer}»…",
    ),
    "Mask raster reprojected to {crs} on the fly: {rows} × {cols} cells of {size} m.": (
        "Raster de masque reprojeté à la volée en {crs} : {rows} × {cols} cellules de {size} m.",
        "Ráster de máscara reproyectado al vuelo a {crs}: {rows} × {cols} celdas de {size} m.",
    ),
    "Mask raster '{layer}' does not cover {n} of the {total} cells over the study area's extent; those cells count "
    "as NoData and are excluded.": (
        "Le raster de masque « {layer} » ne couvre pas {n} des {total} cellules de l'emprise de la zone d'étude ; ces "
        "cellules comptent comme NoData et sont exclues.",
        "El ráster de máscara «{layer}» no cubre {n} de las {total} celdas de la extensión del área de estudio; esas "
        "celdas cuentan como NoData y se excluyen.",
    ),
    "Frame: {kept} ha of {total} ha ({pct} %).": (
        "Base de sondage : {kept} ha sur {total} ha ({pct} %).",
        "Marco: {kept} ha de {total} ha ({pct} %).",
    ),
    "study area (ha)": ("zone d'étude (ha)", "área de estudio (ha)"),
    "frame (ha)": ("base de sondage (ha)", "marco (ha)"),
    "kept": ("conservé", "conservado"),
    "Estimates from a survey on this frame apply to the frame ({ha} ha) only, not to the whole study area.": (
        "Les estimations d'un inventaire sur cette base ne valent que pour la base ({ha} ha), pas pour toute la zone "
        "d'étude.",
        "Las estimaciones de un muestreo sobre este marco valen solo para el marco ({ha} ha), no para toda el área "
        "de estudio.",
    ),
    "Area kept and area lost to each rule": (
        "Surface conservée et surface perdue par chaque règle",
        "Área conservada y área perdida por cada regla",
    ),
    "lost to the excluded polygons (EXCLUDE)": (
        "perdue par les polygones exclus (EXCLUDE)",
        "perdida por los polígonos excluidos (EXCLUDE)",
    ),
    "lost to the raster mask (MASK outside the accepted range, or NoData)": (
        "perdue par le masque raster (MASK hors de l'intervalle accepté, ou NoData)",
        "perdida por la máscara ráster (MASK fuera del intervalo aceptado, o NoData)",
    ),
    "lost to the inward edge buffer (EDGE_BUFFER)": (
        "perdue par la zone tampon intérieure (EDGE_BUFFER)",
        "perdida por la franja interior del borde (EDGE_BUFFER)",
    ),
    "study area": ("zone d'étude", "área de estudio"),
    "sampling frame (kept)": ("base de sondage (conservée)", "marco de muestreo (conservado)"),
    "% of study area": ("% de la zone d'étude", "% del área de estudio"),
    "Area (ha)": ("Surface (ha)", "Área (ha)"),
    "Rules are applied in the order shown; each is charged only with area that was still in the frame, so the "
    "frame and the areas lost add up to the study area.": (
        "Les règles sont appliquées dans l'ordre indiqué ; chacune n'est comptée que pour la surface encore dans la "
        "base, si bien que la base et les surfaces perdues totalisent la zone d'étude.",
        "Las reglas se aplican en el orden mostrado; a cada una solo se le imputa el área que seguía en el marco, de "
        "modo que el marco y las áreas perdidas suman el área de estudio.",
    ),
    "Mask raster": ("Raster de masque", "Ráster de máscara"),
    "cells tested over the study area's extent": (
        "cellules testées sur l'emprise de la zone d'étude",
        "celdas comprobadas en la extensión del área de estudio",
    ),
    "cell size (m)": ("taille de cellule (m)", "tamaño de celda (m)"),
    "cells below the lowest accepted value": (
        "cellules sous la valeur minimale acceptée",
        "celdas por debajo del valor mínimo aceptado",
    ),
    "cells above the highest accepted value": (
        "cellules au-dessus de la valeur maximale acceptée",
        "celdas por encima del valor máximo aceptado",
    ),
    "NoData cells (including cells outside the raster)": (
        "cellules NoData (y compris les cellules hors du raster)",
        "celdas NoData (incluidas las celdas fuera del ráster)",
    ),
    "no": ("non", "no"),
    "yes": ("oui", "sí"),
    "reprojected on the fly (nearest neighbour)": (
        "reprojeté à la volée (plus proche voisin)",
        "reproyectado al vuelo (vecino más próximo)",
    ),
    "Map": ("Carte", "Mapa"),
    "Frame (filled), with the areas lost to each rule": (
        "Base de sondage (remplie), avec les surfaces perdues par chaque règle",
        "Marco (relleno), con las áreas perdidas por cada regla",
    ),
    "(none)": ("(aucun)", "(ninguno)"),
    ", projected from {src} (UTM zone of the study area's centre)": (
        ", projeté depuis {src} (zone UTM du centre de la zone d'étude)",
        ", proyectado desde {src} (zona UTM del centro del área de estudio)",
    ),
    "Study area (INPUT)": ("Zone d'étude (INPUT)", "Área de estudio (INPUT)"),
    "Areas to exclude (EXCLUDE)": ("Zones à exclure (EXCLUDE)", "Zonas que excluir (EXCLUDE)"),
    "Mask raster (MASK)": ("Raster de masque (MASK)", "Ráster de máscara (MASK)"),
    "Lowest accepted mask value (MASK_MIN)": (
        "Valeur de masque minimale acceptée (MASK_MIN)",
        "Valor mínimo aceptado de la máscara (MASK_MIN)",
    ),
    "Highest accepted mask value (MASK_MAX)": (
        "Valeur de masque maximale acceptée (MASK_MAX)",
        "Valor máximo aceptado de la máscara (MASK_MAX)",
    ),
    "Inward edge buffer (EDGE_BUFFER, m)": (
        "Zone tampon intérieure (EDGE_BUFFER, m)",
        "Franja interior del borde (EDGE_BUFFER, m)",
    ),
    "CRS of the computation and the output": ("SCR du calcul et de la sortie", "SRC del cálculo y de la salida"),
    "sampling frame": ("base de sondage", "marco de muestreo"),
    "excluded polygons": ("polygones exclus", "polígonos excluidos"),
    "raster mask": ("masque raster", "máscara ráster"),
    "study area boundary": ("limite de la zone d'étude", "límite del área de estudio"),
})

# -- demo reserve ----------------------------------------------------------------------------
TRANSLATIONS.update({
    "Demo reserve with a simulated population": (
        "Réserve de démonstration avec une population simulée",
        "Reserva de demostración con una población simulada",
    ),
    "<p>Builds Hollin Ridge Reserve, an invented upland reserve for demonstrations, training and tests, and a "
    "simulated population of the velmar, an invented grazing antelope. Nothing in it describes a real place or "
    "species.</p><p>The reserve covers 250–350 km² in WGS 84 / UTM zone 36S, with an irregular boundary, a lake "
    "and a private inholding (both in the excluded-areas layer), an elevation raster (synthetic fractal terrain "
    "with a steep escarpment) and a greenness raster (a vegetation index from 0 to 1, correlated with elevation, "
    "plus noise).</p><p>The velmar live in groups: an inhomogeneous Thomas cluster process whose group centres "
    "are denser where greenness is high and elevation low. The true total is known, and the expected number of "
    "animals per km² is written as a raster, so that survey designs and estimates can be checked against the "
    "truth.</p><h3>Parameters</h3><ul><li><b>Random seed</b>: the same seed gives the same reserve and animals. 0 "
    "draws a seed and records it.</li><li><b>Raster cell size</b>: metres, 10 to 500 (default 50).</li></ul>"
    "<h3>Outputs</h3><ul><li>Reserve boundary (<i>name</i>, <i>area_ha</i>)</li><li>Excluded areas (<i>kind</i> "
    "lake or inholding, <i>name</i>, <i>area_ha</i>)</li><li>Elevation (m), greenness (0–1) and expected velmar "
    "per km² rasters</li><li>Animals (<i>animal_id</i>, <i>group_id</i>)</li><li>An HTML report</li></ul>"
    "<p>References: Thomas, M. (1949) A generalization of Poisson's binomial limit for use in ecology. Biometrika "
    "36:18–25. Diggle, P. J. (2013) Statistical Analysis of Spatial and Spatio-Temporal Point Patterns, 3rd ed., "
    "CRC Press.</p>": (
        "<p>Construit Hollin Ridge Reserve, une réserve d'altitude inventée pour les démonstrations, la formation et "
        "les tests, et une population simulée de velmar, une antilope brouteuse inventée. Rien ici ne décrit un lieu "
        "ou une espèce réels.</p><p>La réserve couvre 250–350 km² en WGS 84 / UTM zone 36S, avec une limite "
        "irrégulière, un lac et une enclave privée (tous deux dans la couche des zones exclues), un raster "
        "d'altitude (relief fractal synthétique avec un escarpement abrupt) et un raster de verdure (un indice de "
        "végétation de 0 à 1, corrélé à l'altitude, plus du bruit).</p><p>Les velmar vivent en groupes : un "
        "processus d'agrégats de Thomas inhomogène dont les centres de groupe sont plus denses là où la verdure est "
        "forte et l'altitude basse. Le vrai total est connu, et le nombre attendu d'animaux par km² est écrit dans "
        "un raster, afin de pouvoir confronter les plans d'inventaire et les estimations à la vérité.</p>"
        "<h3>Paramètres</h3><ul><li><b>Graine aléatoire</b> : la même graine donne la même réserve et les mêmes "
        "animaux. 0 en tire une et l'enregistre.</li><li><b>Taille de cellule raster</b> : en mètres, de 10 à 500 "
        "(50 par défaut).</li></ul><h3>Sorties</h3><ul><li>Limite de la réserve (<i>name</i>, <i>area_ha</i>)</li>"
        "<li>Zones exclues (<i>kind</i> lake ou inholding, <i>name</i>, <i>area_ha</i>)</li><li>Rasters d'altitude "
        "(m), de verdure (0–1) et de velmar attendus par km²</li><li>Animaux (<i>animal_id</i>, <i>group_id</i>)"
        "</li><li>Un rapport HTML</li></ul><p>Références : Thomas, M. (1949) A generalization of Poisson's binomial "
        "limit for use in ecology. Biometrika 36:18–25. Diggle, P. J. (2013) Statistical Analysis of Spatial and "
        "Spatio-Temporal Point Patterns, 3rd ed., CRC Press.</p>",
        "<p>Construye Hollin Ridge Reserve, una reserva de montaña inventada para demostraciones, formación y "
        "pruebas, y una población simulada de velmar, un antílope herbívoro inventado. Nada de ello describe un "
        "lugar o una especie reales.</p><p>La reserva abarca 250–350 km² en WGS 84 / UTM zona 36S, con un límite "
        "irregular, un lago y un enclave privado (ambos en la capa de zonas excluidas), un ráster de altitud (relieve "
        "fractal sintético con un escarpe abrupto) y un ráster de verdor (un índice de vegetación de 0 a 1, "
        "correlacionado con la altitud, más ruido).</p><p>Los velmar viven en grupos: un proceso de conglomerados de "
        "Thomas no homogéneo cuyos centros de grupo son más densos donde el verdor es alto y la altitud baja. El "
        "total verdadero se conoce, y el número esperado de animales por km² se escribe como ráster, para poder "
        "contrastar los diseños de muestreo y las estimaciones con la verdad.</p><h3>Parámetros</h3><ul><li><b>"
        "Semilla aleatoria</b>: la misma semilla da la misma reserva y los mismos animales. 0 sortea una y la "
        "registra.</li><li><b>Tamaño de celda del ráster</b>: metros, de 10 a 500 (50 por defecto).</li></ul>"
        "<h3>Salidas</h3><ul><li>Límite de la reserva (<i>name</i>, <i>area_ha</i>)</li><li>Zonas excluidas "
        "(<i>kind</i> lake o inholding, <i>name</i>, <i>area_ha</i>)</li><li>Rásteres de altitud (m), verdor (0–1) "
        "y velmar esperados por km²</li><li>Animales (<i>animal_id</i>, <i>group_id</i>)</li><li>Un informe HTML"
        "</li></ul><p>Referencias: Thomas, M. (1949) A generalization of Poisson's binomial limit for use in "
        "ecology. Biometrika 36:18–25. Diggle, P. J. (2013) Statistical Analysis of Spatial and Spatio-Temporal "
        "Point Patterns, 3rd ed., CRC Press.</p>",
    ),
    "Raster cell size (m)": ("Taille de cellule raster (m)", "Tamaño de celda del ráster (m)"),
    "Reserve boundary": ("Limite de la réserve", "Límite de la reserva"),
    "Excluded areas (lake, inholding)": ("Zones exclues (lac, enclave)", "Zonas excluidas (lago, enclave)"),
    "Elevation (m)": ("Altitude (m)", "Altitud (m)"),
    "Greenness (0–1)": ("Verdure (0–1)", "Verdor (0–1)"),
    "Expected animals per km²": ("Animaux attendus par km²", "Animales esperados por km²"),
    "Simulated animals": ("Animaux simulés", "Animales simulados"),
    "True number of animals": ("Nombre réel d'animaux", "Número verdadero de animales"),
    "Expected number of animals": ("Nombre attendu d'animaux", "Número esperado de animales"),
    "{name}: {area:,.1f} km², {n:,} velmar in {g:,} groups (expected {e:,.0f}).": (
        "{name} : {area:,.1f} km², {n:,} velmar en {g:,} groupes (attendus : {e:,.0f}).",
        "{name}: {area:,.1f} km², {n:,} velmar en {g:,} grupos (esperados: {e:,.0f}).",
    ),
    "Demo reserve: {name}": ("Réserve de démonstration : {name}", "Reserva de demostración: {name}"),
    "Invented data for demonstrations, training and tests. {name} and the velmar ({desc}) do not exist.": (
        "Données inventées pour les démonstrations, la formation et les tests. {name} et le velmar ({desc}) "
        "n'existent pas.",
        "Datos inventados para demostraciones, formación y pruebas. {name} y el velmar ({desc}) no existen.",
    ),
    "an invented grazing antelope that lives in loose groups": (
        "une antilope brouteuse inventée qui vit en groupes lâches",
        "un antílope herbívoro inventado que vive en grupos laxos",
    ),
    "reserve area": ("surface de la réserve", "superficie de la reserva"),
    "true number of velmar": ("nombre réel de velmar", "número verdadero de velmar"),
    "expected number": ("nombre attendu", "número esperado"),
    "groups": ("groupes", "grupos"),
    "Seed": ("Graine", "Semilla"),
    "CRS": ("SCR", "SRC"),
    "Mean group size (mu)": ("Taille moyenne des groupes (mu)", "Tamaño medio de los grupos (mu)"),
    "Group spread, SD of members around the centre (m)": (
        "Dispersion des groupes, écart-type des membres autour du centre (m)",
        "Dispersión de los grupos, desviación estándar de los miembros alrededor del centro (m)",
    ),
    "Areas": ("Zones", "Zonas"),
    "Area (km²)": ("Surface (km²)", "Área (km²)"),
    "Part": ("Partie", "Parte"),
    "Lake (excluded)": ("Lac (exclu)", "Lago (excluido)"),
    "Reserve": ("Réserve", "Reserva"),
    "Private inholding (excluded)": ("Enclave privée (exclue)", "Enclave privado (excluido)"),
    "Lake": ("Lac", "Lago"),
    "Private inholding": ("Enclave privée", "Enclave privado"),
    "Velmar (every third animal)": ("Velmar (un animal sur trois)", "Velmar (uno de cada tres animales)"),
    "Hollin Ridge Reserve, the excluded areas and the simulated animals.": (
        "Hollin Ridge Reserve, les zones exclues et les animaux simulés.",
        "Hollin Ridge Reserve, las zonas excluidas y los animales simulados.",
    ),
    "How the population was simulated": ("Comment la population a été simulée", "Cómo se simuló la población"),
    "Group centres form an inhomogeneous Poisson process on the habitat (the reserve without the lake); their "
    "intensity is proportional to exp(0.9 × standardised greenness − 0.6 × standardised elevation). Each group has "
    "a Poisson number of members (mean {mu:g}) spread around its centre with a normal displacement of {sigma:g} m; "
    "members that fall off the habitat are not part of the population. This is a Thomas cluster process. Its "
    "expected total and variance are computed from the intensity surface on the raster grid.": (
        "Les centres de groupe forment un processus de Poisson inhomogène sur l'habitat (la réserve sans le lac) ; "
        "leur intensité est proportionnelle à exp(0,9 × verdure standardisée − 0,6 × altitude standardisée). Chaque "
        "groupe a un nombre de membres suivant une loi de Poisson (moyenne {mu:g}), dispersés autour de son centre "
        "avec un déplacement normal de {sigma:g} m ; les membres qui tombent hors de l'habitat ne font pas partie de "
        "la population. C'est un processus d'agrégats de Thomas. Son total attendu et sa variance sont calculés à "
        "partir de la surface d'intensité sur la grille du raster.",
        "Los centros de grupo forman un proceso de Poisson no homogéneo sobre el hábitat (la reserva sin el lago); su "
        "intensidad es proporcional a exp(0,9 × verdor estandarizado − 0,6 × altitud estandarizada). Cada grupo "
        "tiene un número de miembros de Poisson (media {mu:g}) dispersos alrededor de su centro con un desplazamiento "
        "normal de {sigma:g} m; los miembros que caen fuera del hábitat no forman parte de la población. Es un "
        "proceso de conglomerados de Thomas. Su total esperado y su varianza se calculan a partir de la superficie de "
        "intensidad en la malla del ráster.",
    ),
})

# -- allocate --------------------------------------------------------------------------------
TRANSLATIONS.update({
    "Allocate effort to strata": ("Répartir l'effort entre les strates", "Asignar el esfuerzo a los estratos"),
    "Decides how many sample units each stratum gets, and shows beforehand the precision they buy.\n\n"
    "Methods: equal; proportional to stratum area; Neyman, n_h ∝ A_h·S_h (Neyman 1934; Cochran 1977, ch. 5); "
    "optimal with cost, n_h ∝ A_h·S_h/√c_h, under a budget C = c0 + Σ c_h·n_h (Cochran 1977, ch. 5).\n\n"
    "Target: a target CV (if above 0) finds the smallest total whose expected CV of the overall density meets it, "
    "with the finite-population correction; else a budget (if above 0, needs the cost field); else the total "
    "number of units.\n\n"
    "Bounds: at least the minimum per stratum (2 by default, so that each stratum variance can be estimated) and "
    "at most the units that fit (stratum area / unit area). A stratum that reaches a bound keeps it and the rest is "
    "shared among the others, until stable. Whole units are rounded by largest remainder, keeping the total.\n\n"
    "Area field: the stratum area in hectares (default area_ha, as written by the stratification); when it is "
    "empty or missing, the polygon area is used.\n"
    "SD field: the pilot standard deviation of counts per unit. Without it the covariate SD (cov_sd) is used as a "
    "proxy, which assumes that counts scale with the covariate; without either, the allocation is proportional.\n"
    "Mean field: the pilot mean count per unit, needed for CVs and for a target CV. Cost field: cost of surveying "
    "one unit in each stratum (for instance field days).\n\n"
    "Output: the strata with n_alloc (units) and exp_cv (expected CV of the stratum density), and a report "
    "comparing equal, proportional and Neyman allocation at the same total.": (
        "Décide combien d'unités d'échantillonnage reçoit chaque strate, et montre à l'avance la précision qu'elles "
        "apportent.\n\n"
        "Méthodes : égale ; proportionnelle à la surface de la strate ; Neyman, n_h ∝ A_h·S_h (Neyman 1934 ; "
        "Cochran 1977, ch. 5) ; optimale avec coût, n_h ∝ A_h·S_h/√c_h, sous un budget C = c0 + Σ c_h·n_h "
        "(Cochran 1977, ch. 5).\n\n"
        "Objectif : un CV cible (s'il est supérieur à 0) trouve le plus petit total dont le coefficient de variation "
        "attendu de la densité globale l'atteint, avec la correction pour population finie ; sinon un budget (s'il "
        "est supérieur à 0, il faut le champ de coût) ; sinon le nombre total d'unités.\n\n"
        "Bornes : au moins le minimum par strate (2 par défaut, pour que la variance de chaque strate puisse être "
        "estimée) et au plus les unités qui y tiennent (surface de la strate / surface d'une unité). Une strate qui "
        "atteint une borne la garde et le reste est partagé entre les autres, jusqu'à stabilité. Les unités entières "
        "sont arrondies par le plus fort reste, en conservant le total.\n\n"
        "Champ de surface : la surface de la strate en hectares (area_ha par défaut, tel qu'écrit par la "
        "stratification) ; s'il est vide ou absent, la surface du polygone est utilisée.\n"
        "Champ d'écart-type : l'écart-type pilote des comptages par unité. Sans lui, l'écart-type de la covariable "
        "(cov_sd) sert de substitut, ce qui suppose que les comptages suivent la covariable ; sans l'un ni l'autre, "
        "l'allocation est proportionnelle.\n"
        "Champ de moyenne : le comptage moyen pilote par unité, nécessaire aux CV et à un CV cible. Champ de coût : "
        "coût de l'inventaire d'une unité dans chaque strate (par exemple en jours de terrain).\n\n"
        "Sortie : les strates avec n_alloc (unités) et exp_cv (CV attendu de la densité de la strate), et un rapport "
        "comparant les allocations égale, proportionnelle et de Neyman pour le même total.",
        "Decide cuántas unidades de muestreo recibe cada estrato y muestra de antemano la precisión que aportan.\n\n"
        "Métodos: igual; proporcional al área del estrato; Neyman, n_h ∝ A_h·S_h (Neyman 1934; Cochran 1977, cap. "
        "5); óptima con coste, n_h ∝ A_h·S_h/√c_h, con un presupuesto C = c0 + Σ c_h·n_h (Cochran 1977, cap. 5).\n\n"
        "Objetivo: un CV objetivo (si es mayor que 0) busca el menor total cuyo coeficiente de variación esperado de "
        "la densidad global lo cumple, con la corrección por población finita; si no, un presupuesto (si es mayor "
        "que 0, necesita el campo de coste); si no, el número total de unidades.\n\n"
        "Límites: al menos el mínimo por estrato (2 por defecto, para que se pueda estimar la varianza de cada "
        "estrato) y como máximo las unidades que caben (área del estrato / área de la unidad). Un estrato que "
        "alcanza un límite lo conserva y el resto se reparte entre los demás, hasta que se estabiliza. Las unidades "
        "enteras se redondean por el mayor resto, conservando el total.\n\n"
        "Campo de área: el área del estrato en hectáreas (area_ha por defecto, como lo escribe la estratificación); "
        "si está vacío o falta, se usa el área del polígono.\n"
        "Campo de DE: la desviación estándar piloto de los conteos por unidad. Sin él se usa como sustituto la DE de "
        "la covariable (cov_sd), lo que supone que los conteos siguen a la covariable; sin ninguno de los dos, la "
        "asignación es proporcional.\n"
        "Campo de media: el conteo medio piloto por unidad, necesario para los CV y para un CV objetivo. Campo de "
        "coste: coste de muestrear una unidad en cada estrato (por ejemplo, jornadas de campo).\n\n"
        "Salida: los estratos con n_alloc (unidades) y exp_cv (CV esperado de la densidad del estrato), y un informe "
        "que compara la asignación igual, la proporcional y la de Neyman con el mismo total.",
    ),
    "Strata": ("Strates", "Estratos"),
    "Stratum identifier field": ("Champ d'identifiant de strate", "Campo identificador del estrato"),
    "Stratum area field (hectares; empty: polygon area)": (
        "Champ de surface de la strate (hectares ; vide : surface du polygone)",
        "Campo de área del estrato (hectáreas; vacío: área del polígono)",
    ),
    "Pilot SD of counts per unit": (
        "Écart-type pilote des comptages par unité",
        "Desviación estándar piloto de los conteos por unidad",
    ),
    "Pilot mean count per unit": ("Comptage moyen pilote par unité", "Conteo medio piloto por unidad"),
    "Cost per unit": ("Coût par unité", "Coste por unidad"),
    "Costs are field days": ("Les coûts sont des jours de terrain", "Los costes son jornadas de campo"),
    "Fixed cost of the survey (c0, in the cost unit)": (
        "Coût fixe de l'inventaire (c0, dans l'unité de coût)",
        "Coste fijo del muestreo (c0, en la unidad de coste)",
    ),
    "Allocation method": ("Méthode d'allocation", "Método de asignación"),
    "Equal": ("Égale", "Igual"),
    "Neyman": ("Neyman", "Neyman"),
    "Optimal with cost": ("Optimale avec coût", "Óptima con coste"),
    "Proportional to area": ("Proportionnelle à la surface", "Proporcional al área"),
    "Total number of units": ("Nombre total d'unités", "Número total de unidades"),
    "Budget (0: not used; needs the cost field)": (
        "Budget (0 : non utilisé ; nécessite le champ de coût)",
        "Presupuesto (0: no se usa; necesita el campo de coste)",
    ),
    "Target CV of the overall density (0: not used; e.g. 0.2)": (
        "CV cible de la densité globale (0 : non utilisé ; p. ex. 0.2)",
        "CV objetivo de la densidad global (0: no se usa; p. ej. 0.2)",
    ),
    "Area of one sample unit (m²)": (
        "Surface d'une unité d'échantillonnage (m²)",
        "Área de una unidad de muestreo (m²)",
    ),
    "Minimum units per stratum": ("Nombre minimal d'unités par strate", "Mínimo de unidades por estrato"),
    "Strata with allocation": ("Strates avec allocation", "Estratos con asignación"),
    "Expected CV of the overall density": (
        "CV attendu de la densité globale",
        "CV esperado de la densidad global",
    ),
    "The strata layer could not be opened.": (
        "La couche des strates n'a pas pu être ouverte.",
        "No se pudo abrir la capa de estratos.",
    ),
    "Layer '{layer}' has no field '{field}': the polygon areas are used.": (
        "La couche « {layer} » n'a pas de champ « {field} » : les surfaces des polygones sont utilisées.",
        "La capa «{layer}» no tiene el campo «{field}»: se usan las áreas de los polígonos.",
    ),
    "Layer '{layer}' has no strata with an area.": (
        "La couche « {layer} » n'a aucune strate ayant une surface.",
        "La capa «{layer}» no tiene ningún estrato con área.",
    ),
    "No pilot SD field: the covariate SD ('{field}') is used as a proxy. This assumes that counts scale with the "
    "covariate; replace it with the SD of a pilot survey when you have one. The expected SEs are then in covariate "
    "units, not counts.": (
        "Pas de champ d'écart-type pilote : l'écart-type de la covariable (« {field} ») sert de substitut. Cela "
        "suppose que les comptages suivent la covariable ; remplacez-le par l'écart-type d'un inventaire pilote dès "
        "que vous en avez un. Les erreurs types attendues sont alors dans les unités de la covariable, pas en "
        "comptages.",
        "No hay campo de DE piloto: se usa como sustituto la DE de la covariable («{field}»). Esto supone que los "
        "conteos siguen a la covariable; sustitúyala por la DE de un muestreo piloto cuando la tenga. Los errores "
        "estándar esperados quedan entonces en unidades de la covariable, no en conteos.",
    ),
    "The output layer could not be created.": (
        "La couche de sortie n'a pas pu être créée.",
        "No se pudo crear la capa de salida.",
    ),
    "{total} units allocated ({method}); expected CV of the overall density: {cv}.": (
        "{total} unités allouées ({method}) ; CV attendu de la densité globale : {cv}.",
        "{total} unidades asignadas ({method}); CV esperado de la densidad global: {cv}.",
    ),
    "Allocation of survey effort": ("Allocation de l'effort d'inventaire", "Asignación del esfuerzo de muestreo"),
    "equal": ("égale", "igual"),
    "proportional to area": ("proportionnelle à la surface", "proporcional al área"),
    "optimal with cost": ("optimale avec coût", "óptima con coste"),
    "cost units": ("unités de coût", "unidades de coste"),
    "field days": ("jours de terrain", "jornadas de campo"),
    "method": ("méthode", "método"),
    "units in total": ("unités au total", "unidades en total"),
    "expected CV of the overall density": ("CV attendu de la densité globale", "CV esperado de la densidad global"),
    "cost": ("coût", "coste"),
    "field days needed": ("jours de terrain nécessaires", "jornadas de campo necesarias"),
    "a budget": ("un budget", "un presupuesto"),
    "a target CV": ("un CV cible", "un CV objetivo"),
    "a total number of units": ("un nombre total d'unités", "un número total de unidades"),
    "Strata layer": ("Couche des strates", "Capa de estratos"),
    "Computation CRS": ("SCR de calcul", "SRC de cálculo"),
    "Method asked for": ("Méthode demandée", "Método solicitado"),
    "Method applied": ("Méthode appliquée", "Método aplicado"),
    "Target": ("Objectif", "Objetivo"),
    "Total asked for": ("Total demandé", "Total solicitado"),
    "Budget": ("Budget", "Presupuesto"),
    "Target CV": ("CV cible", "CV objetivo"),
    "Unit area (m²)": ("Surface d'une unité (m²)", "Área de la unidad (m²)"),
    " (covariate proxy)": (" (substitut par la covariable)", " (sustituto por la covariable)"),
    "SD field": ("Champ d'écart-type", "Campo de DE"),
    "Mean field": ("Champ de moyenne", "Campo de media"),
    "Cost field": ("Champ de coût", "Campo de coste"),
    "Fixed cost c0": ("Coût fixe c0", "Coste fijo c0"),
    "Units per stratum": ("Unités par strate", "Unidades por estrato"),
    "SE of mean count per unit": (
        "Erreur type du comptage moyen par unité",
        "Error estándar del conteo medio por unidad",
    ),
    "SE of mean per unit (covariate units)": (
        "Erreur type de la moyenne par unité (unités de la covariable)",
        "Error estándar de la media por unidad (unidades de la covariable)",
    ),
    "Lower bound": ("Borne inférieure", "Límite inferior"),
    "Share before rounding": ("Part avant arrondi", "Cuota antes del redondeo"),
    "Stratum": ("Strate", "Estrato"),
    "Units that fit": ("Unités qui y tiennent", "Unidades que caben"),
    "Sampling fraction": ("Fraction d'échantillonnage", "Fracción de muestreo"),
    "Units (n_alloc)": ("Unités (n_alloc)", "Unidades (n_alloc)"),
    "SE of density (per km²)": ("Erreur type de la densité (par km²)", "Error estándar de la densidad (por km²)"),
    "Expected CV (exp_cv)": ("CV attendu (exp_cv)", "CV esperado (exp_cv)"),
    "all strata": ("toutes les strates", "todos los estratos"),
    "units per stratum": ("unités par strate", "unidades por estrato"),
    "Units allocated to each stratum": ("Unités allouées à chaque strate", "Unidades asignadas a cada estrato"),
    "Expected precision uses the pilot figures as if they were the truth, with the finite-population correction "
    "(Cochran 1977, ch. 5). Real precision depends on the counts the survey finds.": (
        "La précision attendue utilise les chiffres pilotes comme s'ils étaient la vérité, avec la correction pour "
        "population finie (Cochran 1977, ch. 5). La précision réelle dépend des comptages que l'inventaire obtiendra.",
        "La precisión esperada usa las cifras piloto como si fueran la verdad, con la corrección por población finita "
        "(Cochran 1977, cap. 5). La precisión real depende de los conteos que obtenga el muestreo.",
    ),
    "{what}: c0 + Σ c_h·n_h = {c0:g} + {var:,.1f} = {total:,.1f} {unit}.": (
        "{what} : c0 + Σ c_h·n_h = {c0:g} + {var:,.1f} = {total:,.1f} {unit}.",
        "{what}: c0 + Σ c_h·n_h = {c0:g} + {var:,.1f} = {total:,.1f} {unit}.",
    ),
    "Cost of the design": ("Coût du plan", "Coste del diseño"),
    "Field days needed": ("Jours de terrain nécessaires", "Jornadas de campo necesarias"),
    "What the choice of method buys, at {n} units": (
        "Ce qu'apporte le choix de la méthode, pour {n} unités",
        "Lo que aporta la elección del método, con {n} unidades",
    ),
    "Method": ("Méthode", "Método"),
    "stratum {label}": ("strate {label}", "estrato {label}"),
    "Variance relative to the applied allocation": (
        "Variance relative à l'allocation appliquée",
        "Varianza relativa a la asignación aplicada",
    ),
    "Expected CV": ("CV attendu", "CV esperado"),
    "Without standard deviations the precision of the designs cannot be compared.": (
        "Sans écarts-types, la précision des plans ne peut pas être comparée.",
        "Sin desviaciones estándar no se puede comparar la precisión de los diseños.",
    ),
})

# -- stratify --------------------------------------------------------------------------------
TRANSLATIONS.update({
    "Quantile (equal areas on the first covariate)": (
        "Quantiles (surfaces égales sur la première covariable)",
        "Cuantiles (áreas iguales sobre la primera covariable)",
    ),
    "Equal interval (on the first covariate)": (
        "Intervalles égaux (sur la première covariable)",
        "Intervalos iguales (sobre la primera covariable)",
    ),
    "Cumulative root frequency (Dalenius–Hodges, first covariate)": (
        "Racine cumulée des fréquences (Dalenius–Hodges, première covariable)",
        "Raíz acumulada de las frecuencias (Dalenius–Hodges, primera covariable)",
    ),
    "k-means (all covariates, standardised)": (
        "k-moyennes (toutes les covariables, standardisées)",
        "k-medias (todas las covariables, estandarizadas)",
    ),
    "Raster classes (each class of the first covariate)": (
        "Classes raster (chaque classe de la première covariable)",
        "Clases del ráster (cada clase de la primera covariable)",
    ),
    "Stratify from raster covariates": (
        "Stratifier à partir de covariables raster",
        "Estratificar a partir de covariables ráster",
    ),
    "<p>Draws strata (zones of similar expected density) from raster covariates such as elevation, a vegetation "
    "index or a land-cover map. Only cells whose centre lies inside the sampling frame count. A cell with NoData "
    "in any covariate is left out and its area reported.</p><p>The covariates are put on the grid of the first "
    "one, in the frame's CRS (a geographic frame is projected to the UTM zone of its centre). Rasters in another "
    "CRS or on another grid are warped on the fly (bilinear; nearest neighbour for raster classes). Rasters are "
    "read block by block, so memory stays bounded whatever their size.</p><h3>Methods</h3><ul><li><b>Quantile</b>: "
    "strata of equal area along the first covariate. The boundaries are the exact sample quantiles of the frame's "
    "cells (Hyndman &amp; Fan 1996, definition 7).</li><li><b>Equal interval</b>: the first covariate's range cut "
    "into equal widths.</li><li><b>Cumulative root frequency</b>: the Dalenius &amp; Hodges (1959) rule on a "
    "100-class histogram of the first covariate (Cochran 1977, ch. 5A).</li><li><b>k-means</b>: all covariates "
    "standardised to mean 0 and SD 1, k-means++ seeds (Arthur &amp; Vassilvitskii 2007) and Lloyd iterations on a "
    "random sample of 100,000 cells drawn with the seed; then every cell goes to its nearest centre.</li><li><b>"
    "Raster classes</b>: each value of the first covariate (a categorical raster, at most 50 classes) is one "
    "stratum; the number of strata is ignored.</li></ul><p>Strata are numbered 1..k by increasing mean of the "
    "first covariate. Patches (4-connected) smaller than the minimum patch area (ha) join a neighbouring stratum "
    "before the strata are turned into polygons: specks through GDAL's sieve, then each small patch, smallest first, "
    "the neighbour that brings it to the minimum area. A patch that touches no other stratum stays, with a "
    "warning.</p><h3>Outputs</h3><ul><li>Stratum raster: "
    "the stratum of each cell (0 = none).</li><li>Strata: one multipolygon per stratum with <i>stratum</i>, "
    "<i>label</i>, <i>area_ha</i> (cells × cell area), <i>cov_mean</i> and <i>cov_sd</i> of the first covariate, "
    "and <i>cov2_mean</i>, <i>cov2_sd</i>, … for the others (SD over the stratum's cells).</li><li>Report: "
    "boundaries, areas, covariate statistics per stratum, the share of each covariate's variance the strata "
    "explain (R²), a histogram with the boundaries and a map.</li></ul><p>The random seed is used by k-means only "
    "(0 draws one and records it).</p><p>Strata are a statistical device: before fieldwork, check every unit's "
    "access and safety.</p>": (
        "<p>Forme des strates (zones de densité attendue semblable) à partir de covariables raster telles que "
        "l'altitude, un indice de végétation ou une carte d'occupation du sol. Seules comptent les cellules dont le "
        "centre est dans la base de sondage. Une cellule NoData dans une covariable est écartée et sa surface "
        "signalée.</p><p>Les covariables sont mises sur la grille de la première, dans le SCR de la base de sondage "
        "(une base en coordonnées géographiques est projetée dans la zone UTM de son centre). Les rasters dans un "
        "autre SCR ou sur une autre grille sont rééchantillonnés à la volée (bilinéaire ; plus proche voisin pour les "
        "classes raster). Les rasters sont lus bloc par bloc, si bien que la mémoire reste bornée quelle que soit "
        "leur taille.</p><h3>Méthodes</h3><ul><li><b>Quantiles</b> : strates de surface égale le long de la première "
        "covariable. Les limites sont les quantiles empiriques exacts des cellules de la base (Hyndman &amp; Fan "
        "1996, définition 7).</li><li><b>Intervalles égaux</b> : l'étendue de la première covariable découpée en "
        "largeurs égales.</li><li><b>Racine cumulée des fréquences</b> : la règle de Dalenius &amp; Hodges (1959) "
        "sur un histogramme à 100 classes de la première covariable (Cochran 1977, ch. 5A).</li><li><b>k-moyennes"
        "</b> : toutes les covariables standardisées à moyenne 0 et écart-type 1, graines k-means++ (Arthur &amp; "
        "Vassilvitskii 2007) et itérations de Lloyd sur un échantillon aléatoire de 100 000 cellules tiré avec la "
        "graine ; puis chaque cellule va au centre le plus proche.</li><li><b>Classes raster</b> : chaque valeur de "
        "la première covariable (un raster catégoriel, 50 classes au plus) forme une strate ; le nombre de strates "
        "est ignoré.</li></ul><p>Les strates sont numérotées de 1 à k par moyenne croissante de la première "
        "covariable. Les taches (4-connexité) plus petites que la surface minimale (ha) rejoignent une strate voisine "
        "avant que les strates ne soient converties en polygones : les grains par le tamis de GDAL, puis chaque petite "
        "tache, de la plus petite à la plus grande, rejoint la voisine qui l'amène à la surface minimale. "
        "Une tache qui ne touche aucune autre strate reste, avec un avertissement.</p><h3>Sorties</h3><ul><li>"
        "Raster des strates : la strate de chaque cellule (0 = aucune).</li><li>Strates : un multipolygone par "
        "strate avec <i>stratum</i>, <i>label</i>, <i>area_ha</i> (cellules × surface d'une cellule), "
        "<i>cov_mean</i> et <i>cov_sd</i> de la première covariable, et <i>cov2_mean</i>, <i>cov2_sd</i>, … pour "
        "les autres (écart-type sur les cellules de la strate).</li><li>Rapport : limites, surfaces, statistiques des "
        "covariables par strate, part de la variance de chaque covariable expliquée par les strates (R²), un "
        "histogramme avec les limites et une carte.</li></ul><p>La graine aléatoire ne sert qu'aux k-moyennes (0 en "
        "tire une et l'enregistre).</p><p>Les strates sont un outil statistique : avant le travail de terrain, "
        "vérifiez l'accès à chaque unité et sa sécurité.</p>",
        "<p>Forma estratos (zonas de densidad esperada similar) a partir de covariables ráster como la altitud, un "
        "índice de vegetación o un mapa de cobertura del suelo. Solo cuentan las celdas cuyo centro está dentro del "
        "marco de muestreo. Una celda con NoData en alguna covariable se deja fuera y se informa de su área.</p><p>"
        "Las covariables se llevan a la malla de la primera, en el SRC del marco (un marco en coordenadas "
        "geográficas se proyecta a la zona UTM de su centro). Los rásteres en otro SRC o en otra malla se remuestrean "
        "al vuelo (bilineal; vecino más próximo para las clases del ráster). Los rásteres se leen bloque a bloque, "
        "de modo que la memoria queda acotada sea cual sea su tamaño.</p><h3>Métodos</h3><ul><li><b>Cuantiles</b>: "
        "estratos de igual área a lo largo de la primera covariable. Los límites son los cuantiles muestrales exactos "
        "de las celdas del marco (Hyndman &amp; Fan 1996, definición 7).</li><li><b>Intervalos iguales</b>: el rango "
        "de la primera covariable dividido en anchos iguales.</li><li><b>Raíz acumulada de las frecuencias</b>: la "
        "regla de Dalenius &amp; Hodges (1959) sobre un histograma de 100 clases de la primera covariable (Cochran "
        "1977, cap. 5A).</li><li><b>k-medias</b>: todas las covariables estandarizadas a media 0 y DE 1, semillas "
        "k-means++ (Arthur &amp; Vassilvitskii 2007) e iteraciones de Lloyd sobre una muestra aleatoria de 100.000 "
        "celdas sorteada con la semilla; después cada celda va al centro más próximo.</li><li><b>Clases del ráster"
        "</b>: cada valor de la primera covariable (un ráster categórico, como máximo 50 clases) es un estrato; el "
        "número de estratos se ignora.</li></ul><p>Los estratos se numeran de 1 a k por media creciente de la "
        "primera covariable. Las manchas (conectividad 4) menores que el área mínima (ha) se unen a un estrato vecino "
        "antes de convertir los estratos en polígonos: los granos mediante la criba de GDAL y luego cada mancha "
        "pequeña, de la menor a la mayor, al vecino que la lleva al área mínima. Una mancha que no toca ningún "
        "otro estrato se queda, con una advertencia.</p><h3>Salidas</h3><ul><li>Ráster de "
        "estratos: el estrato de cada celda (0 = ninguno).</li><li>Estratos: un multipolígono por estrato con "
        "<i>stratum</i>, <i>label</i>, <i>area_ha</i> (celdas × área de la celda), <i>cov_mean</i> y <i>cov_sd</i> "
        "de la primera covariable, y <i>cov2_mean</i>, <i>cov2_sd</i>, … para las demás (DE sobre las celdas del "
        "estrato).</li><li>Informe: límites, áreas, estadísticas de las covariables por estrato, la parte de la "
        "varianza de cada covariable que explican los estratos (R²), un histograma con los límites y un mapa.</li>"
        "</ul><p>La semilla aleatoria solo la usa k-medias (0 sortea una y la registra).</p><p>Los estratos son un "
        "recurso estadístico: antes del trabajo de campo, compruebe el acceso y la seguridad de cada unidad.</p>",
    ),
    "Raster covariates (band 1 of each; the first one sets the grid)": (
        "Covariables raster (bande 1 de chacune ; la première fixe la grille)",
        "Covariables ráster (banda 1 de cada una; la primera fija la malla)",
    ),
    "Number of strata (ignored for raster classes)": (
        "Nombre de strates (ignoré pour les classes raster)",
        "Número de estratos (se ignora con clases del ráster)",
    ),
    "Minimum patch area (ha); smaller patches join a neighbour": (
        "Surface minimale d'une tache (ha) ; les taches plus petites rejoignent une voisine",
        "Área mínima de mancha (ha); las manchas menores se unen a una vecina",
    ),
    "Stratum raster": ("Raster des strates", "Ráster de estratos"),
    "Number of strata formed": ("Nombre de strates formées", "Número de estratos formados"),
    "Share of the first covariate's variance explained by the strata (R²)": (
        "Part de la variance de la première covariable expliquée par les strates (R²)",
        "Parte de la varianza de la primera covariable explicada por los estratos (R²)",
    ),
    "Give at least one raster in COVARIATES.": (
        "Donnez au moins un raster dans COVARIATES.",
        "Indique al menos un ráster en COVARIATES.",
    ),
    "COVARIATES holds {n} rasters; use at most {m}.": (
        "COVARIATES contient {n} rasters ; utilisez-en au plus {m}.",
        "COVARIATES contiene {n} rásteres; use como máximo {m}.",
    ),
    "COVARIATES: '{name}' is not a raster layer.": (
        "COVARIATES : « {name} » n'est pas une couche raster.",
        "COVARIATES: «{name}» no es una capa ráster.",
    ),
    "Covariate '{name}' is not a file raster that GDAL can read. Save it as a GeoTIFF first.": (
        "La covariable « {name} » n'est pas un fichier raster lisible par GDAL. Enregistrez-la d'abord en GeoTIFF.",
        "La covariable «{name}» no es un archivo ráster que GDAL pueda leer. Guárdela primero como GeoTIFF.",
    ),
    "Layer '{layer}' (FRAME) has no polygon with a positive area. Choose the sampling-frame layer.": (
        "La couche « {layer} » (FRAME) n'a aucun polygone de surface positive. Choisissez la couche de la base de "
        "sondage.",
        "La capa «{layer}» (FRAME) no tiene ningún polígono con área positiva. Elija la capa del marco de muestreo.",
    ),
    "Warped onto the grid of '{first}' in {crs}: {names}.": (
        "Rééchantillonnées sur la grille de « {first} » en {crs} : {names}.",
        "Remuestreadas sobre la malla de «{first}» en {crs}: {names}.",
    ),
    "{k} strata on {ha} ha; R² of '{name}': {r2}.": (
        "{k} strates sur {ha} ha ; R² de « {name} » : {r2}.",
        "{k} estratos en {ha} ha; R² de «{name}»: {r2}.",
    ),
    "Strata from raster covariates": ("Strates à partir de covariables raster", "Estratos a partir de covariables ráster"),
    "strata": ("strates", "estratos"),
    "area stratified (ha)": ("surface stratifiée (ha)", "área estratificada (ha)"),
    "frame covered": ("part de la base couverte", "parte del marco cubierta"),
    "R² of {name}": ("R² de {name}", "R² de {name}"),
    "The strata cover the frame's cells that have a value in every covariate ({ha} ha). A survey allocated on "
    "these strata speaks for that area only.": (
        "Les strates couvrent les cellules de la base de sondage qui ont une valeur dans chaque covariable ({ha} ha). "
        "Un inventaire alloué sur ces strates ne vaut que pour cette surface.",
        "Los estratos cubren las celdas del marco que tienen valor en todas las covariables ({ha} ha). Un muestreo "
        "asignado sobre estos estratos solo vale para esa área.",
    ),
    "% of area": ("% de la surface", "% del área"),
    "Cells": ("Cellules", "Celdas"),
    "Label": ("Libellé", "Etiqueta"),
    "{name} SD": ("écart-type de {name}", "DE de {name}"),
    "{name} mean": ("moyenne de {name}", "media de {name}"),
    "Patches smaller than {ha} ha ({cells} cells) were merged into their largest neighbour (GDAL sieve, "
    "4-connected) before polygonising; areas and statistics are those after merging, so a stratum may hold a few "
    "cells that the rule alone would have put in a neighbouring stratum.": (
        "Les taches de moins de {ha} ha ({cells} cellules) ont été fusionnées avec leur plus grande voisine (tamis "
        "GDAL, 4-connexité) avant la vectorisation ; surfaces et statistiques sont celles d'après la fusion, si bien "
        "qu'une strate peut contenir quelques cellules que la règle seule aurait mises dans une strate voisine.",
        "Las manchas menores de {ha} ha ({cells} celdas) se fusionaron con su vecina mayor (criba de GDAL, "
        "conectividad 4) antes de vectorizar; las áreas y estadísticas son las posteriores a la fusión, por lo que un "
        "estrato puede contener algunas celdas que la regla por sí sola habría puesto en un estrato vecino.",
    ),
    # -- stratify: patches below MIN_AREA (QA) --
    "Patches smaller than {ha} ha ({cells} cells) were merged before polygonising (4-connected): specks of fewer "
    "than {specks} cells into their largest neighbour (GDAL sieve), then {n} more patches, smallest first, each "
    "into the neighbouring stratum that made the smallest patch of at least {ha} ha (or, failing that, the largest "
    "patch), so that a mosaic of small patches is not swallowed by one growing patch. Areas and statistics are "
    "those after merging, so a stratum may hold cells that the rule alone would have put in another stratum.": (
        "Les taches de moins de {ha} ha ({cells} cellules) ont été fusionnées avant la vectorisation (4-connexité) : "
        "les taches minuscules (moins de {specks} cellules) avec leur plus grande voisine (tamis GDAL), puis {n} "
        "autres taches, de la plus petite à la plus grande, chacune avec la strate voisine qui formait la plus "
        "petite tache d'au moins {ha} ha (ou, à défaut, la plus grande), afin qu'une mosaïque de petites taches ne "
        "soit pas absorbée par une seule tache qui grandit. Surfaces et statistiques sont celles d'après la fusion, "
        "si bien qu'une strate peut contenir des cellules que la règle seule aurait mises dans une autre strate.",
        "Las manchas menores de {ha} ha ({cells} celdas) se fusionaron antes de vectorizar (conectividad 4): las "
        "manchas diminutas (menos de {specks} celdas) con su vecina mayor (criba de GDAL), y después otras {n} "
        "manchas, de la menor a la mayor, cada una con el estrato vecino que formaba la mancha más pequeña de al "
        "menos {ha} ha (o, en su defecto, la mayor), para que un mosaico de manchas pequeñas no quede absorbido por "
        "una sola mancha que crece. Las áreas y estadísticas son las posteriores a la fusión, por lo que un estrato "
        "puede contener celdas que la regla por sí sola habría puesto en otro estrato.",
    ),
    "{n} patch(es) covering {area} ha touch no other stratum (islands of the frame, or patches ringed by NoData) "
    "and stay smaller than {ha} ha.": (
        "{n} tache(s) couvrant {area} ha ne touchent aucune autre strate (îlots de la base de sondage, ou taches "
        "entourées de NoData) et restent plus petites que {ha} ha.",
        "{n} mancha(s) que cubren {area} ha no tocan ningún otro estrato (islas del marco de muestreo, o manchas "
        "rodeadas de NoData) y siguen siendo menores de {ha} ha.",
    ),
    "Every patch of the strata now covers at least {ha} ha.": (
        "Chaque tache des strates couvre désormais au moins {ha} ha.",
        "Cada mancha de los estratos cubre ahora al menos {ha} ha.",
    ),
    "Method: {name}": ("Méthode : {name}", "Método: {name}"),
    "Stratum h holds the cells with b(h−1) ≤ {name} < b(h). Boundaries on {name}:": (
        "La strate h contient les cellules telles que b(h−1) ≤ {name} < b(h). Limites sur {name} :",
        "El estrato h contiene las celdas con b(h−1) ≤ {name} < b(h). Límites sobre {name}:",
    ),
    "Boundary": ("Limite", "Límite"),
    "Exact sample quantiles at h/k of the frame's cells (Hyndman & Fan 1996, definition 7), found in two passes: "
    "a 64,000-class histogram locates each quantile, then the cells of that class are sorted.": (
        "Quantiles empiriques exacts à h/k des cellules de la base (Hyndman & Fan 1996, définition 7), trouvés en "
        "deux passes : un histogramme à 64 000 classes situe chaque quantile, puis les cellules de cette classe sont "
        "triées.",
        "Cuantiles muestrales exactos en h/k de las celdas del marco (Hyndman & Fan 1996, definición 7), hallados en "
        "dos pasadas: un histograma de 64.000 clases localiza cada cuantil y luego se ordenan las celdas de esa clase.",
    ),
    "Dalenius & Hodges (1959): on a {n}-class histogram of {name}, the boundaries are the class tops where the "
    "cumulative √f is nearest to h/k of its total.": (
        "Dalenius & Hodges (1959) : sur un histogramme de {name} à {n} classes, les limites sont les bornes "
        "supérieures des classes où le cumul de √f est le plus proche de h/k de son total.",
        "Dalenius & Hodges (1959): sobre un histograma de {name} de {n} clases, los límites son los extremos "
        "superiores de las clases donde la suma acumulada de √f está más cerca de h/k de su total.",
    ),
    "Covariates standardised with their mean and SD over the frame; k-means++ seeds and Lloyd iterations on a "
    "random sample of {m} cells (seed {seed}); {it} iterations. Then every cell went to its nearest centre.": (
        "Covariables standardisées avec leur moyenne et leur écart-type sur la base ; graines k-means++ et "
        "itérations de Lloyd sur un échantillon aléatoire de {m} cellules (graine {seed}) ; {it} itérations. Puis "
        "chaque cellule est allée au centre le plus proche.",
        "Covariables estandarizadas con su media y su DE sobre el marco; semillas k-means++ e iteraciones de Lloyd "
        "sobre una muestra aleatoria de {m} celdas (semilla {seed}); {it} iteraciones. Después cada celda fue al "
        "centro más próximo.",
    ),
    "Each class of '{name}' is one stratum ({k} classes).": (
        "Chaque classe de « {name} » forme une strate ({k} classes).",
        "Cada clase de «{name}» es un estrato ({k} clases).",
    ),
    "Share of covariate variance explained by the strata (R²)": (
        "Part de la variance des covariables expliquée par les strates (R²)",
        "Parte de la varianza de las covariables explicada por los estratos (R²)",
    ),
    "Covariate": ("Covariable", "Covariable"),
    "Mean": ("Moyenne", "Media"),
    "R²": ("R²", "R²"),
    "SD": ("Écart-type", "DE"),
    "R² = 1 − Σ N_h S_h² / (N S²): the between-strata share of the covariate's variance over the cells. For a "
    "quantity that follows the covariate exactly, proportional allocation over these strata would lower the "
    "variance of the estimated mean by this share compared with simple random sampling (Cochran 1977, ch. 5, "
    "large-population approximation). The gain for animal density is smaller the less closely density follows the "
    "covariate.": (
        "R² = 1 − Σ N_h S_h² / (N S²) : la part inter-strates de la variance de la covariable sur les cellules. Pour "
        "une grandeur qui suit exactement la covariable, une allocation proportionnelle sur ces strates réduirait la "
        "variance de la moyenne estimée de cette part par rapport à un échantillonnage aléatoire simple (Cochran "
        "1977, ch. 5, approximation pour grande population). Le gain pour la densité animale est d'autant plus "
        "faible que la densité suit moins étroitement la covariable.",
        "R² = 1 − Σ N_h S_h² / (N S²): la parte entre estratos de la varianza de la covariable sobre las celdas. Para "
        "una magnitud que sigue exactamente a la covariable, la asignación proporcional sobre estos estratos "
        "reduciría la varianza de la media estimada en esta parte respecto al muestreo aleatorio simple (Cochran "
        "1977, cap. 5, aproximación para poblaciones grandes). La ganancia para la densidad animal es menor cuanto "
        "menos sigue la densidad a la covariable.",
    ),
    "Histogram of {name}": ("Histogramme de {name}", "Histograma de {name}"),
    "stratum {h}": ("strate {h}", "estrato {h}"),
    "cells": ("cellules", "celdas"),
    "Frame cells by {name}, coloured by stratum; dashed lines: stratum boundaries.": (
        "Cellules de la base selon {name}, colorées par strate ; tirets : limites des strates.",
        "Celdas del marco según {name}, coloreadas por estrato; líneas discontinuas: límites de los estratos.",
    ),
    "Frame cells by {name}, coloured by stratum (k-means strata may overlap on one covariate).": (
        "Cellules de la base selon {name}, colorées par strate (les strates des k-moyennes peuvent se chevaucher sur "
        "une covariable).",
        "Celdas del marco según {name}, coloreadas por estrato (los estratos de k-medias pueden solaparse en una "
        "covariable).",
    ),
    "Strata within the sampling frame": ("Strates dans la base de sondage", "Estratos dentro del marco de muestreo"),
    "Coverage": ("Couverture", "Cobertura"),
    "frame area (ha)": ("surface de la base (ha)", "área del marco (ha)"),
    "frame area outside the first covariate's extent (ha)": (
        "surface de la base hors de l'emprise de la première covariable (ha)",
        "área del marco fuera de la extensión de la primera covariable (ha)",
    ),
    "frame cells with NoData in a covariate (ha)": (
        "cellules de la base NoData dans une covariable (ha)",
        "celdas del marco con NoData en alguna covariable (ha)",
    ),
    "share of the frame covered": ("part de la base couverte", "parte del marco cubierta"),
    "cells stratified": ("cellules stratifiées", "celdas estratificadas"),
    "grid": ("grille", "malla"),
    "covariates warped on the fly": ("covariables rééchantillonnées à la volée", "covariables remuestreadas al vuelo"),
    "none": ("aucune", "ninguno"),
    ", projected from {src} (UTM zone of the frame's centre)": (
        ", projeté depuis {src} (zone UTM du centre de la base de sondage)",
        ", proyectado desde {src} (zona UTM del centro del marco)",
    ),
    "Sampling frame (FRAME)": ("Base de sondage (FRAME)", "Marco de muestreo (FRAME)"),
    "Covariates (COVARIATES)": ("Covariables (COVARIATES)", "Covariables (COVARIATES)"),
    "Method (METHOD)": ("Méthode (METHOD)", "Método (METHOD)"),
    "Number of strata (STRATA)": ("Nombre de strates (STRATA)", "Número de estratos (STRATA)"),
    "ignored": ("ignoré", "ignorado"),
    "Minimum patch area (MIN_AREA, ha)": ("Surface minimale d'une tache (MIN_AREA, ha)", "Área mínima de mancha (MIN_AREA, ha)"),
    "CRS of the computation and the outputs": ("SCR du calcul et des sorties", "SRC del cálculo y de las salidas"),
    "Seed (SEED)": ("Graine (SEED)", "Semilla (SEED)"),
})

# -- lay out units ---------------------------------------------------------------------------
TRANSLATIONS.update({
    "Lay out sample units": ("Disposer les unités d'échantillonnage", "Disponer las unidades de muestreo"),
    "Draws the sample units of a survey over a sampling frame, stratum by stratum (one stratum per value of the "
    "stratum field; without it the frame is one stratum).\n\n"
    "Units per stratum: the units field (for example n_alloc from the allocation step; the same whole number on "
    "every feature of a stratum), else the total split in proportion to area with at least 2 per stratum.\n\n"
    "Designs:\n"
    "• Simple random: independent points, uniform over the stratum (triangles chosen by area, then a point within; "
    "Turk 1990).\n"
    "• Systematic grid: a square grid of spacing √(A/n) with a random start; with bearing −1 the grid also gets a "
    "random rotation, otherwise it is turned to the bearing. The realised number of units varies around n and is "
    "reported.\n"
    "• Spatially balanced: balanced acceptance sampling on a Halton sequence (Robertson et al. 2013). Every "
    "leading part of the draw order is itself spread evenly, so reserves are the next points of the same sequence. "
    "The start is a uniform random point of the stratum, which keeps inclusion equal for any sample size.\n\n"
    "Shapes: point station (size: optional counting radius, m), square plot (size: side, m), circular plot (size: "
    "radius, m), line transect (size: length, m; centred on the drawn point). Bearing in degrees clockwise from "
    "grid north, or −1 for a random bearing per unit.\n"
    "Keep units inside: centres are drawn from the stratum shrunk by the unit's circumscribing radius, so every "
    "unit lies wholly inside its stratum; the shrunk (effective) area is reported and used for the inclusion "
    "probabilities.\n"
    "Minimum spacing (m) between the centres of all units, primaries and reserves, over the whole layout.\n"
    "Reserves: extra units per stratum, role = reserve, in draw order. Replacement rule: a primary unit that cannot "
    "be surveyed is replaced by the next unused reserve of the same stratum.\n\n"
    "Output fields: unit_id, stratum, role, draw_ord, area_m2, incl_p (n·a/A; for transects and points without a "
    "radius the inclusion density n/A per m²), weight = 1/incl_p, lon/lat (WGS 84), and an empty count field for "
    "the field teams. The GPX file holds one waypoint per unit (a start and an end waypoint per transect), named by "
    "unit_id.\n\n"
    "Strata must not overlap: an overlap of more than 0.1 % of the smaller stratum is an error, a smaller one a "
    "warning. Features under 1 m² (slivers) are skipped, with a warning.\n\n"
    "A frame in geographic coordinates is projected to the UTM zone of its centre. Check every unit's access and "
    "safety before fieldwork: the tool never makes a location safe.": (
        "Tire les unités d'échantillonnage d'un inventaire sur une base de sondage, strate par strate (une strate "
        "par valeur du champ de strate ; sans lui, la base forme une seule strate).\n\n"
        "Unités par strate : le champ d'unités (par exemple n_alloc de l'étape d'allocation ; le même nombre entier "
        "sur chaque entité d'une strate), sinon le total réparti proportionnellement à la surface avec au moins 2 "
        "par strate.\n\n"
        "Plans :\n"
        "• Aléatoire simple : points indépendants, uniformes sur la strate (triangles choisis selon leur surface, "
        "puis un point à l'intérieur ; Turk 1990).\n"
        "• Grille systématique : une grille carrée de pas √(A/n) avec un départ aléatoire ; avec un azimut de −1 la "
        "grille reçoit aussi une rotation aléatoire, sinon elle est orientée selon l'azimut. Le nombre d'unités "
        "obtenu varie autour de n et il est indiqué.\n"
        "• Spatialement équilibré : échantillonnage par acceptation équilibrée sur une suite de Halton (Robertson et "
        "al. 2013). Chaque début de l'ordre de tirage est lui-même réparti uniformément, si bien que les réserves "
        "sont les points suivants de la même suite. Le départ est un point aléatoire uniforme de la strate, ce qui "
        "garde l'inclusion égale pour toute taille d'échantillon.\n\n"
        "Formes : station ponctuelle (taille : rayon de comptage facultatif, m), placette carrée (taille : côté, m), "
        "placette circulaire (taille : rayon, m), transect linéaire (taille : longueur, m ; centré sur le point "
        "tiré). Azimut en degrés dans le sens horaire depuis le nord de la grille, ou −1 pour un azimut aléatoire "
        "par unité.\n"
        "Garder les unités à l'intérieur : les centres sont tirés dans la strate réduite du rayon circonscrit de "
        "l'unité, si bien que chaque unité est entièrement dans sa strate ; la surface réduite (effective) est "
        "indiquée et utilisée pour les probabilités d'inclusion.\n"
        "Espacement minimal (m) entre les centres de toutes les unités, principales et de réserve, sur toute la "
        "disposition.\n"
        "Réserves : unités supplémentaires par strate, role = reserve, dans l'ordre de tirage. Règle de "
        "remplacement : une unité principale qui ne peut pas être inventoriée est remplacée par la réserve suivante "
        "non utilisée de la même strate.\n\n"
        "Champs de sortie : unit_id, stratum, role, draw_ord, area_m2, incl_p (n·a/A ; pour les transects et les "
        "points sans rayon, la densité d'inclusion n/A par m²), weight = 1/incl_p, lon/lat (WGS 84), et un champ "
        "count vide pour les équipes de terrain. Le fichier GPX contient un point de passage par unité (un point de "
        "début et un de fin par transect), nommé par unit_id.\n\n"
        "Les strates ne doivent pas se chevaucher : un chevauchement de plus de 0,1 % de la plus petite strate est une "
        "erreur, un plus petit un avertissement. Les entités de moins de 1 m² (liserés) sont écartées, avec un "
        "avertissement.\n\n"
        "Une base de sondage en coordonnées géographiques est projetée dans la zone UTM de son centre. Vérifiez "
        "l'accès à chaque unité et sa sécurité avant le travail de terrain : l'outil ne rend jamais un emplacement sûr.",
        "Sortea las unidades de muestreo de un muestreo sobre un marco de muestreo, estrato por estrato (un estrato "
        "por valor del campo de estrato; sin él, el marco es un solo estrato).\n\n"
        "Unidades por estrato: el campo de unidades (por ejemplo n_alloc del paso de asignación; el mismo número "
        "entero en cada entidad de un estrato); si no, el total repartido en proporción al área con al menos 2 por "
        "estrato.\n\n"
        "Diseños:\n"
        "• Aleatorio simple: puntos independientes, uniformes en el estrato (triángulos elegidos según su área y "
        "luego un punto dentro; Turk 1990).\n"
        "• Cuadrícula sistemática: una cuadrícula cuadrada de espaciado √(A/n) con un inicio aleatorio; con rumbo −1 "
        "la cuadrícula recibe además una rotación aleatoria; si no, se orienta según el rumbo. El número de unidades "
        "obtenido varía en torno a n y se indica.\n"
        "• Espacialmente equilibrado: muestreo por aceptación equilibrada sobre una secuencia de Halton (Robertson "
        "et al. 2013). Cada tramo inicial del orden de sorteo está a su vez repartido de modo uniforme, de modo que "
        "las reservas son los puntos siguientes de la misma secuencia. El inicio es un punto aleatorio uniforme del "
        "estrato, lo que mantiene la inclusión igual para cualquier tamaño de muestra.\n\n"
        "Formas: estación puntual (tamaño: radio de conteo opcional, m), parcela cuadrada (tamaño: lado, m), parcela "
        "circular (tamaño: radio, m), transecto lineal (tamaño: longitud, m; centrado en el punto sorteado). Rumbo "
        "en grados en sentido horario desde el norte de la cuadrícula, o −1 para un rumbo aleatorio por unidad.\n"
        "Mantener las unidades dentro: los centros se sortean en el estrato reducido en el radio circunscrito de la "
        "unidad, de modo que cada unidad queda por completo dentro de su estrato; el área reducida (efectiva) se "
        "indica y se usa para las probabilidades de inclusión.\n"
        "Separación mínima (m) entre los centros de todas las unidades, principales y de reserva, en toda la "
        "disposición.\n"
        "Reservas: unidades adicionales por estrato, role = reserve, en orden de sorteo. Regla de sustitución: una "
        "unidad principal que no se puede muestrear se sustituye por la siguiente reserva no usada del mismo "
        "estrato.\n\n"
        "Campos de salida: unit_id, stratum, role, draw_ord, area_m2, incl_p (n·a/A; para transectos y puntos sin "
        "radio, la densidad de inclusión n/A por m²), weight = 1/incl_p, lon/lat (WGS 84) y un campo count vacío "
        "para los equipos de campo. El archivo GPX contiene un punto de paso por unidad (uno de inicio y otro de fin "
        "por transecto), con el nombre de unit_id.\n\n"
        "Los estratos no deben solaparse: un solapamiento de más del 0,1 % del estrato menor es un error, uno menor "
        "una advertencia. Las entidades de menos de 1 m² (astillas) se omiten, con una advertencia.\n\n"
        "Un marco en coordenadas geográficas se proyecta a la zona UTM de su centro. Compruebe el acceso y la "
        "seguridad de cada unidad antes del trabajo de campo: la herramienta nunca hace que una ubicación sea segura.",
    ),
    "Sampling frame or strata": ("Base de sondage ou strates", "Marco de muestreo o estratos"),
    "Stratum field (empty: the frame is one stratum)": (
        "Champ de strate (vide : la base forme une seule strate)",
        "Campo de estrato (vacío: el marco es un solo estrato)",
    ),
    "Units per stratum field (e.g. n_alloc; empty: split the total by area)": (
        "Champ d'unités par strate (p. ex. n_alloc ; vide : total réparti selon la surface)",
        "Campo de unidades por estrato (p. ej. n_alloc; vacío: total repartido según el área)",
    ),
    "Total number of units (when no units field is given)": (
        "Nombre total d'unités (sans champ d'unités)",
        "Número total de unidades (si no se da un campo de unidades)",
    ),
    "Unit size (m): square side, circle radius, transect length, point counting radius": (
        "Taille de l'unité (m) : côté du carré, rayon du cercle, longueur du transect, rayon de comptage du point",
        "Tamaño de la unidad (m): lado del cuadrado, radio del círculo, longitud del transecto, radio de conteo del punto",
    ),
    "Bearing (degrees from grid north; -1: random)": (
        "Azimut (degrés depuis le nord de la grille ; -1 : aléatoire)",
        "Rumbo (grados desde el norte de la cuadrícula; -1: aleatorio)",
    ),
    "Keep every unit wholly inside its stratum": (
        "Garder chaque unité entièrement dans sa strate",
        "Mantener cada unidad por completo dentro de su estrato",
    ),
    "Minimum spacing between unit centres (m; 0: none)": (
        "Espacement minimal entre les centres des unités (m ; 0 : aucun)",
        "Separación mínima entre los centros de las unidades (m; 0: ninguna)",
    ),
    "Reserve units per stratum": ("Unités de réserve par strate", "Unidades de reserva por estrato"),
    "GPX files (*.gpx)": ("Fichiers GPX (*.gpx)", "Archivos GPX (*.gpx)"),
    "Waypoints for GPS (GPX)": ("Points de passage pour GPS (GPX)", "Puntos de paso para GPS (GPX)"),
    "Layer '{layer}' has no field '{field}' ({param}). Choose an existing field.": (
        "La couche « {layer} » n'a pas de champ « {field} » ({param}). Choisissez un champ existant.",
        "La capa «{layer}» no tiene el campo «{field}» ({param}). Elija un campo existente.",
    ),
    "Give a units-per-stratum field (N_FIELD) or a total number of units (N_UNITS) of at least 1.": (
        "Donnez un champ d'unités par strate (N_FIELD) ou un nombre total d'unités (N_UNITS) d'au moins 1.",
        "Indique un campo de unidades por estrato (N_FIELD) o un número total de unidades (N_UNITS) de al menos 1.",
    ),
    "Stratum field '{field}' of layer '{layer}'": (
        "Champ de strate « {field} » de la couche « {layer} »",
        "Campo de estrato «{field}» de la capa «{layer}»",
    ),
    "Units field '{field}' of layer '{layer}'": (
        "Champ d'unités « {field} » de la couche « {layer} »",
        "Campo de unidades «{field}» de la capa «{layer}»",
    ),
    "Layer '{layer}': {text}": ("Couche « {layer} » : {text}", "Capa «{layer}»: {text}"),
    "No unit could be placed in layer '{layer}'. Ask for more units or use another design.": (
        "Aucune unité n'a pu être placée dans la couche « {layer} ». Demandez plus d'unités ou utilisez un autre plan.",
        "No se pudo colocar ninguna unidad en la capa «{layer}». Pida más unidades o use otro diseño.",
    ),
    "{n} waypoints written to {path}": ("{n} points de passage écrits dans {path}", "{n} puntos de paso escritos en {path}"),
    "{stratum}: {n} primary and {r} reserve units": (
        "{stratum} : {n} unités principales et {r} de réserve",
        "{stratum}: {n} unidades principales y {r} de reserva",
    ),
    "stratum {key}": ("strate {key}", "estrato {key}"),
    "the frame": ("la base de sondage", "el marco"),
    "Sample-unit layout": ("Disposition des unités d'échantillonnage", "Disposición de las unidades de muestreo"),
    "primary units": ("unités principales", "unidades principales"),
    "reserve units": ("unités de réserve", "unidades de reserva"),
    "design": ("plan", "diseño"),
    "simple random": ("aléatoire simple", "aleatorio simple"),
    "spatially balanced": ("spatialement équilibré", "espacialmente equilibrado"),
    "systematic grid": ("grille systématique", "cuadrícula sistemática"),
    "Replacing units in the field": ("Remplacer des unités sur le terrain", "Sustituir unidades en el terreno"),
    "A primary unit that cannot be surveyed (no safe access, no permission, flooded, ...) is replaced by the next "
    "unused reserve unit of the same stratum, in draw order (draw_ord). Record the primary as not surveyed and "
    "why; never move a unit to a more convenient place, and never take a reserve of another stratum. Reserves "
    "carry the same incl_p and weight as the primaries they replace.": (
        "Une unité principale qui ne peut pas être inventoriée (pas d'accès sûr, pas d'autorisation, inondée, ...) "
        "est remplacée par l'unité de réserve suivante non utilisée de la même strate, dans l'ordre de tirage "
        "(draw_ord). Notez l'unité principale comme non inventoriée et pourquoi ; ne déplacez jamais une unité vers "
        "un endroit plus commode, et ne prenez jamais une réserve d'une autre strate. Les réserves portent les mêmes "
        "incl_p et weight que les unités principales qu'elles remplacent.",
        "Una unidad principal que no se puede muestrear (sin acceso seguro, sin permiso, inundada, ...) se sustituye "
        "por la siguiente unidad de reserva no usada del mismo estrato, en orden de sorteo (draw_ord). Registre la "
        "principal como no muestreada y el motivo; nunca traslade una unidad a un lugar más cómodo ni tome una "
        "reserva de otro estrato. Las reservas llevan los mismos incl_p y weight que las principales a las que "
        "sustituyen.",
    ),
    "Effective area (ha)": ("Surface effective (ha)", "Área efectiva (ha)"),
    "Primary": ("Principales", "Principales"),
    "Units asked": ("Unités demandées", "Unidades pedidas"),
    "incl_p": ("incl_p", "incl_p"),
    "weight": ("weight", "weight"),
    "Grid rotation (°)": ("Rotation de la grille (°)", "Rotación de la cuadrícula (°)"),
    "Grid spacing (m)": ("Pas de la grille (m)", "Espaciado de la cuadrícula (m)"),
    "frame": ("base de sondage", "marco"),
    "incl_p is the inclusion density n/A per m² (the units have no area of their own); weight = A/n is the area in "
    "m² each unit stands for (Cordy 1993).": (
        "incl_p est la densité d'inclusion n/A par m² (les unités n'ont pas de surface propre) ; weight = A/n est la "
        "surface en m² que représente chaque unité (Cordy 1993).",
        "incl_p es la densidad de inclusión n/A por m² (las unidades no tienen área propia); weight = A/n es el área "
        "en m² que representa cada unidad (Cordy 1993).",
    ),
    "incl_p = n × unit area / stratum area is each unit's first-order inclusion probability; weight = 1/incl_p.": (
        "incl_p = n × surface d'une unité / surface de la strate est la probabilité d'inclusion d'ordre un de chaque "
        "unité ; weight = 1/incl_p.",
        "incl_p = n × área de la unidad / área del estrato es la probabilidad de inclusión de primer orden de cada "
        "unidad; weight = 1/incl_p.",
    ),
    "Units are kept wholly inside their stratum: centres were drawn from the stratum shrunk by {r} m (the unit's "
    "circumscribing radius). The effective area is that shrunk area and the inclusion probabilities use it; the "
    "edge strip is covered less often, which the report of the estimate should mention.": (
        "Les unités sont gardées entièrement dans leur strate : les centres ont été tirés dans la strate réduite de "
        "{r} m (le rayon circonscrit de l'unité). La surface effective est cette surface réduite et les "
        "probabilités d'inclusion l'utilisent ; la bande de bordure est moins souvent couverte, ce que le rapport de "
        "l'estimation devrait mentionner.",
        "Las unidades se mantienen por completo dentro de su estrato: los centros se sortearon en el estrato reducido "
        "en {r} m (el radio circunscrito de la unidad). El área efectiva es esa área reducida y las probabilidades de "
        "inclusión la usan; la franja del borde se cubre con menos frecuencia, lo que el informe de la estimación "
        "debería mencionar.",
    ),
    "The grid spacing is √(A/n) for the asked n; with a random start the realised number of units varies around n "
    "(column Primary) while the inclusion density stays n/A everywhere.": (
        "Le pas de la grille est √(A/n) pour le n demandé ; avec un départ aléatoire, le nombre d'unités obtenu varie "
        "autour de n (colonne Principales) tandis que la densité d'inclusion reste n/A partout.",
        "El espaciado de la cuadrícula es √(A/n) para el n pedido; con un inicio aleatorio, el número de unidades "
        "obtenido varía en torno a n (columna Principales) mientras la densidad de inclusión sigue siendo n/A en "
        "todas partes.",
    ),
    "Strata (filled), primary units (dark) and reserve units (light)": (
        "Strates (remplies), unités principales (foncées) et unités de réserve (claires)",
        "Estratos (rellenos), unidades principales (oscuras) y unidades de reserva (claras)",
    ),
    "Frame (FRAME)": ("Base de sondage (FRAME)", "Marco (FRAME)"),
    "(none: one stratum)": ("(aucun : une seule strate)", "(ninguno: un solo estrato)"),
    "Stratum field (STRATUM_FIELD)": ("Champ de strate (STRATUM_FIELD)", "Campo de estrato (STRATUM_FIELD)"),
    "Units per stratum field (N_FIELD)": ("Champ d'unités par strate (N_FIELD)", "Campo de unidades por estrato (N_FIELD)"),
    "(not used)": ("(non utilisé)", "(no se usa)"),
    "Total units (N_UNITS)": ("Total d'unités (N_UNITS)", "Total de unidades (N_UNITS)"),
    "Design (DESIGN)": ("Plan (DESIGN)", "Diseño (DESIGN)"),
    "Unit shape (SHAPE)": ("Forme de l'unité (SHAPE)", "Forma de la unidad (SHAPE)"),
    "circle": ("cercle", "círculo"),
    "line": ("ligne", "línea"),
    "point": ("point", "punto"),
    "square": ("carré", "cuadrado"),
    "Unit size (SIZE, m)": ("Taille de l'unité (SIZE, m)", "Tamaño de la unidad (SIZE, m)"),
    "Bearing (BEARING, degrees)": ("Azimut (BEARING, degrés)", "Rumbo (BEARING, grados)"),
    "Keep inside (INSIDE)": ("Garder à l'intérieur (INSIDE)", "Mantener dentro (INSIDE)"),
    "Minimum spacing (MIN_SPACING, m)": ("Espacement minimal (MIN_SPACING, m)", "Separación mínima (MIN_SPACING, m)"),
    "Reserves per stratum (RESERVE)": ("Réserves par strate (RESERVE)", "Reservas por estrato (RESERVE)"),
    "Simple random: every centre is an independent uniform point of its stratum (a triangle chosen with "
    "probability proportional to its area, then a uniform point in it).": (
        "Aléatoire simple : chaque centre est un point uniforme indépendant de sa strate (un triangle choisi avec une "
        "probabilité proportionnelle à sa surface, puis un point uniforme dans celui-ci).",
        "Aleatorio simple: cada centro es un punto uniforme independiente de su estrato (un triángulo elegido con "
        "probabilidad proporcional a su área y luego un punto uniforme dentro de él).",
    ),
    "Systematic grid: a square grid with a uniform random start in one grid cell and a rotation, per stratum; "
    "reserves are the centres of the grid cells, in random order.": (
        "Grille systématique : une grille carrée avec un départ aléatoire uniforme dans une maille et une rotation, "
        "par strate ; les réserves sont les centres des mailles, dans un ordre aléatoire.",
        "Cuadrícula sistemática: una cuadrícula cuadrada con un inicio aleatorio uniforme en una celda y una "
        "rotación, por estrato; las reservas son los centros de las celdas de la cuadrícula, en orden aleatorio.",
    ),
    "Spatially balanced: balanced acceptance sampling (Robertson et al. 2013). A Halton sequence in bases 2 and 3 "
    "is laid over the stratum's bounding box and its points inside the stratum are kept in order. The random start "
    "is a uniform random point of the stratum, so that every location has the same chance for any sample size; "
    "reserves are the next points of the same sequence.": (
        "Spatialement équilibré : échantillonnage par acceptation équilibrée (Robertson et al. 2013). Une suite de "
        "Halton en bases 2 et 3 est posée sur le rectangle englobant de la strate et ses points situés dans la "
        "strate sont gardés dans l'ordre. Le départ aléatoire est un point aléatoire uniforme de la strate, pour que "
        "chaque emplacement ait la même chance quelle que soit la taille d'échantillon ; les réserves sont les points "
        "suivants de la même suite.",
        "Espacialmente equilibrado: muestreo por aceptación equilibrada (Robertson et al. 2013). Una secuencia de "
        "Halton en bases 2 y 3 se coloca sobre el rectángulo envolvente del estrato y sus puntos dentro del estrato "
        "se conservan en orden. El inicio aleatorio es un punto aleatorio uniforme del estrato, para que cada "
        "ubicación tenga la misma probabilidad con cualquier tamaño de muestra; las reservas son los puntos "
        "siguientes de la misma secuencia.",
    ),
    "A candidate closer than {d} m to an accepted unit is passed over (simple sequential inhibition), which lowers "
    "the chance of locations next to units slightly.": (
        "Un candidat à moins de {d} m d'une unité acceptée est écarté (inhibition séquentielle simple), ce qui "
        "diminue légèrement la chance des emplacements voisins des unités.",
        "Un candidato a menos de {d} m de una unidad aceptada se descarta (inhibición secuencial simple), lo que "
        "reduce ligeramente la probabilidad de las ubicaciones cercanas a las unidades.",
    ),
})

# -- compare designs -------------------------------------------------------------------------
TRANSLATIONS.update({
    "Compare survey designs by simulation": (
        "Comparer des plans d'inventaire par simulation",
        "Comparar diseños de muestreo por simulación",
    ),
    "Before fieldwork: which design, and how many units, give a usable estimate on this area? The algorithm "
    "simulates many surveys of a plausible density surface and reports how each design did.\n\n"
    "Surface: a raster of expected animals per km² (from a habitat model, an expert map or an earlier survey), "
    "warped to the frame's CRS when needed. Frame: the sampling frame. Strata (optional, with the stratum field, "
    "default 'stratum'): needed by the two stratified designs.\n\n"
    "Each replicate realises a population: Poisson counts in every surface cell, or with an overdispersion k above "
    "0 negative binomial counts (gamma-Poisson, variance μ + μ²/k per cell). Every chosen design is then laid out "
    "with the layout engine, its units count the animals in the cells they cover (the part inside the frame or "
    "their stratum), and the abundance is estimated with the estimation engine (ratio estimator, t interval with "
    "Satterthwaite df; Cochran 1977). All designs survey the same populations, so their differences are not "
    "blurred.\n\n"
    "Designs: simple random; stratified with proportional allocation; stratified with Neyman allocation, n_h ∝ "
    "A_h·S_h with S_h the SD of a unit's count implied by the surface (Neyman 1934); systematic grid with a random "
    "start (its n varies); spatially balanced (balanced acceptance sampling, Robertson et al. 2013).\n\n"
    "Units: point station (size = counting radius), square plot (side), circular plot (radius), line transect "
    "(length, counting a strip of the given half-width on each side). Bearing in degrees clockwise from grid "
    "north, −1 random. Keep units inside: centres are drawn from each stratum shrunk by the unit's radius, as the "
    "layout's option does. Otherwise a unit reaching over the edge of its stratum or of the frame counts only the "
    "part inside, and its area is that part.\n\n"
    "Output table, one row per design: rel_bias (relative bias against each population's true total), emp_se (SD "
    "of the errors), rmse (root mean square error) and rmse_mcse (its Monte Carlo SE), rel_rmse (rmse / mean true "
    "total), mean_cv (mean estimated CV), coverage (share of 95 % intervals holding the truth), mean_n (mean units "
    "surveyed), alloc (units per stratum), recommend (1 for the recommended design: the lowest RMSE among designs "
    "whose intervals cover at least 90 %).\n\n"
    "Range of units (optional), e.g. '20, 40, 80' or '20:100:20': the comparison is repeated at each n and the "
    "report draws RMSE against n, showing where more effort stops paying.\n\n"
    "The simulation assumes the surface is right and every animal in a unit is counted. Results are only as good "
    "as the surface. Check every unit's access and safety before fieldwork: the tool never makes a location safe.": (
        "Avant le terrain : quel plan, et combien d'unités, donnent une estimation utilisable sur cette zone ? "
        "L'algorithme simule de nombreux inventaires d'une surface de densité plausible et indique comment chaque "
        "plan s'en est sorti.\n\n"
        "Surface : un raster d'animaux attendus par km² (issu d'un modèle d'habitat, d'une carte d'expert ou d'un "
        "inventaire antérieur), reprojeté dans le SCR de la base si nécessaire. Base : la base de sondage. Strates "
        "(facultatives, avec le champ de strate, 'stratum' par défaut) : nécessaires aux deux plans stratifiés.\n\n"
        "Chaque réplique réalise une population : comptages de Poisson dans chaque cellule de la surface ou, avec une "
        "surdispersion k supérieure à 0, comptages binomiaux négatifs (gamma-Poisson, variance μ + μ²/k par "
        "cellule). Chaque plan choisi est ensuite disposé avec le moteur de disposition, ses unités comptent les "
        "animaux des cellules qu'elles couvrent (la partie dans la base ou dans leur strate), et l'abondance est "
        "estimée avec le moteur d'estimation (estimateur par le ratio, intervalle t avec ddl de Satterthwaite ; "
        "Cochran 1977). Tous les plans inventorient les mêmes populations, si bien que leurs différences ne sont pas "
        "brouillées.\n\n"
        "Plans : aléatoire simple ; stratifié avec allocation proportionnelle ; stratifié avec allocation de Neyman, "
        "n_h ∝ A_h·S_h où S_h est l'écart-type du comptage d'une unité impliqué par la surface (Neyman 1934) ; "
        "grille systématique avec départ aléatoire (son n varie) ; spatialement équilibré (échantillonnage par "
        "acceptation équilibrée, Robertson et al. 2013).\n\n"
        "Unités : station ponctuelle (taille = rayon de comptage), placette carrée (côté), placette circulaire "
        "(rayon), transect linéaire (longueur, comptage sur une bande de la demi-largeur donnée de chaque côté). "
        "Azimut en degrés dans le sens horaire depuis le nord de la grille, −1 aléatoire. Garder les unités à "
        "l'intérieur : les centres sont tirés dans chaque strate réduite du rayon de l'unité, comme le fait l'option "
        "de la disposition. Sinon, une unité qui déborde de sa strate ou de la base ne compte que la partie "
        "intérieure, et sa surface est cette partie.\n\n"
        "Table de sortie, une ligne par plan : rel_bias (biais relatif par rapport au vrai total de chaque "
        "population), emp_se (écart-type des erreurs), rmse (racine de l'erreur quadratique moyenne) et rmse_mcse "
        "(son erreur type de Monte-Carlo), rel_rmse (rmse / vrai total moyen), mean_cv (CV estimé moyen), coverage "
        "(part des intervalles à 95 % contenant la vérité), mean_n (nombre moyen d'unités inventoriées), alloc "
        "(unités par strate), recommend (1 pour le plan recommandé : la plus faible REQM parmi les plans dont les "
        "intervalles couvrent au moins 90 %).\n\n"
        "Gamme d'unités (facultative), p. ex. '20, 40, 80' ou '20:100:20' : la comparaison est répétée pour chaque n "
        "et le rapport trace la REQM en fonction de n, montrant où davantage d'effort cesse de payer.\n\n"
        "La simulation suppose que la surface est juste et que chaque animal d'une unité est compté. Les résultats "
        "ne valent que ce que vaut la surface. Vérifiez l'accès à chaque unité et sa sécurité avant le travail de "
        "terrain : l'outil ne rend jamais un emplacement sûr.",
        "Antes del trabajo de campo: ¿qué diseño, y cuántas unidades, dan una estimación útil en esta zona? El "
        "algoritmo simula muchos muestreos de una superficie de densidad plausible e informa de cómo le fue a cada "
        "diseño.\n\n"
        "Superficie: un ráster de animales esperados por km² (de un modelo de hábitat, un mapa de expertos o un "
        "muestreo anterior), reproyectado al SRC del marco cuando hace falta. Marco: el marco de muestreo. Estratos "
        "(opcionales, con el campo de estrato, 'stratum' por defecto): necesarios para los dos diseños "
        "estratificados.\n\n"
        "Cada réplica genera una población: conteos de Poisson en cada celda de la superficie o, con una "
        "sobredispersión k mayor que 0, conteos binomiales negativos (gamma-Poisson, varianza μ + μ²/k por celda). "
        "Luego cada diseño elegido se dispone con el motor de disposición, sus unidades cuentan los animales de las "
        "celdas que cubren (la parte dentro del marco o de su estrato) y la abundancia se estima con el motor de "
        "estimación (estimador de razón, intervalo t con gl de Satterthwaite; Cochran 1977). Todos los diseños "
        "muestrean las mismas poblaciones, de modo que sus diferencias no se difuminan.\n\n"
        "Diseños: aleatorio simple; estratificado con asignación proporcional; estratificado con asignación de "
        "Neyman, n_h ∝ A_h·S_h con S_h la DE del conteo de una unidad implicada por la superficie (Neyman 1934); "
        "cuadrícula sistemática con inicio aleatorio (su n varía); espacialmente equilibrado (muestreo por "
        "aceptación equilibrada, Robertson et al. 2013).\n\n"
        "Unidades: estación puntual (tamaño = radio de conteo), parcela cuadrada (lado), parcela circular (radio), "
        "transecto lineal (longitud, contando una franja de la semianchura indicada a cada lado). Rumbo en grados "
        "en sentido horario desde el norte de la cuadrícula, −1 aleatorio. Mantener las unidades dentro: los centros "
        "se sortean en cada estrato reducido en el radio de la unidad, como hace la opción de la disposición. Si no, "
        "una unidad que sobresale del borde de su estrato o del marco solo cuenta la parte interior, y su área es "
        "esa parte.\n\n"
        "Tabla de salida, una fila por diseño: rel_bias (sesgo relativo frente al total verdadero de cada "
        "población), emp_se (DE de los errores), rmse (raíz del error cuadrático medio) y rmse_mcse (su error "
        "estándar de Monte Carlo), rel_rmse (rmse / total verdadero medio), mean_cv (CV estimado medio), coverage "
        "(proporción de intervalos al 95 % que contienen la verdad), mean_n (media de unidades muestreadas), alloc "
        "(unidades por estrato), recommend (1 para el diseño recomendado: la menor RECM entre los diseños cuyos "
        "intervalos cubren al menos el 90 %).\n\n"
        "Rango de unidades (opcional), p. ej. '20, 40, 80' o '20:100:20': la comparación se repite con cada n y el "
        "informe dibuja la RECM frente a n, mostrando dónde más esfuerzo deja de compensar.\n\n"
        "La simulación supone que la superficie es correcta y que se cuenta cada animal de una unidad. Los "
        "resultados valen lo que vale la superficie. Compruebe el acceso y la seguridad de cada unidad antes del "
        "trabajo de campo: la herramienta nunca hace que una ubicación sea segura.",
    ),
    "Density surface (expected animals per km²)": (
        "Surface de densité (animaux attendus par km²)",
        "Superficie de densidad (animales esperados por km²)",
    ),
    "Strata (for the stratified designs)": ("Strates (pour les plans stratifiés)", "Estratos (para los diseños estratificados)"),
    "Stratum field": ("Champ de strate", "Campo de estrato"),
    "Designs to compare": ("Plans à comparer", "Diseños que comparar"),
    "Simple random": ("Aléatoire simple", "Aleatorio simple"),
    "stratified proportional": ("stratifié proportionnel", "estratificado proporcional"),
    "stratified Neyman": ("stratifié Neyman", "estratificado Neyman"),
    "Stratified, proportional allocation": ("Stratifié, allocation proportionnelle", "Estratificado, asignación proporcional"),
    "Spatially balanced": ("Spatialement équilibré", "Espacialmente equilibrado"),
    "Stratified, Neyman allocation": ("Stratifié, allocation de Neyman", "Estratificado, asignación de Neyman"),
    "Systematic grid": ("Grille systématique", "Cuadrícula sistemática"),
    "Number of units": ("Nombre d'unités", "Número de unidades"),
    "Unit shape": ("Forme de l'unité", "Forma de la unidad"),
    "Circular plot": ("Placette circulaire", "Parcela circular"),
    "Line transect": ("Transect linéaire", "Transecto lineal"),
    "Point station": ("Station ponctuelle", "Estación puntual"),
    "Square plot": ("Placette carrée", "Parcela cuadrada"),
    "Unit size (m): counting radius, side, radius or transect length": (
        "Taille de l'unité (m) : rayon de comptage, côté, rayon ou longueur du transect",
        "Tamaño de la unidad (m): radio de conteo, lado, radio o longitud del transecto",
    ),
    "Half-width of a transect's counting strip (m)": (
        "Demi-largeur de la bande de comptage d'un transect (m)",
        "Semianchura de la franja de conteo de un transecto (m)",
    ),
    "Bearing of units and grid (degrees from grid north; −1 random)": (
        "Azimut des unités et de la grille (degrés depuis le nord de la grille ; −1 aléatoire)",
        "Rumbo de las unidades y de la cuadrícula (grados desde el norte de la cuadrícula; −1 aleatorio)",
    ),
    "Keep units wholly inside their stratum (as the layout's option)": (
        "Garder les unités entièrement dans leur strate (comme l'option de la disposition)",
        "Mantener las unidades por completo dentro de su estrato (como la opción de la disposición)",
    ),
    "Units wholly inside their stratum": (
        "Unités entièrement dans leur strate",
        "Unidades por completo dentro de su estrato",
    ),
    "Each figure is itself an estimate from {reps} simulated surveys: relative biases within about ±{noise:.1%} "
    "cannot be told from zero, and RMSEs closer than two Monte Carlo SEs are a tie. More surveys per design narrow "
    "both.": (
        "Chaque chiffre est lui-même une estimation tirée de {reps} inventaires simulés : des biais relatifs "
        "d'environ ±{noise:.1%} ne se distinguent pas de zéro, et des REQM plus proches que deux erreurs types de "
        "Monte-Carlo sont à égalité. Davantage d'inventaires par plan resserrent les deux.",
        "Cada cifra es a su vez una estimación a partir de {reps} muestreos simulados: sesgos relativos de en torno "
        "a ±{noise:.1%} no se distinguen de cero, y RECM más próximas que dos errores estándar de Monte Carlo son un "
        "empate. Más muestreos por diseño estrechan ambos.",
    ),
    "Simulated surveys per design": ("Inventaires simulés par plan", "Muestreos simulados por diseño"),
    "Overdispersion k of the negative binomial (0: Poisson counts)": (
        "Surdispersion k de la binomiale négative (0 : comptages de Poisson)",
        "Sobredispersión k de la binomial negativa (0: conteos de Poisson)",
    ),
    "Variance estimator for the grid and balanced designs": (
        "Estimateur de variance pour les plans en grille et équilibrés",
        "Estimador de la varianza para los diseños en cuadrícula y equilibrados",
    ),
    "Local neighbourhood (Stevens & Olsen 2003)": (
        "Voisinage local (Stevens & Olsen 2003)",
        "Vecindario local (Stevens & Olsen 2003)",
    ),
    "Simple random sampling formula": (
        "Formule de l'échantillonnage aléatoire simple",
        "Fórmula del muestreo aleatorio simple",
    ),
    "Range of units for RMSE against n (e.g. 20, 40, 80 or 20:100:20; empty: none)": (
        "Gamme d'unités pour la REQM en fonction de n (p. ex. 20, 40, 80 ou 20:100:20 ; vide : aucune)",
        "Rango de unidades para la RECM frente a n (p. ej. 20, 40, 80 o 20:100:20; vacío: ninguno)",
    ),
    "Design comparison": ("Comparaison des plans", "Comparación de diseños"),
    "Recommended design": ("Plan recommandé", "Diseño recomendado"),
    "The density surface could not be opened.": (
        "La surface de densité n'a pas pu être ouverte.",
        "No se pudo abrir la superficie de densidad.",
    ),
    "The sampling frame could not be opened.": (
        "La base de sondage n'a pas pu être ouverte.",
        "No se pudo abrir el marco de muestreo.",
    ),
    "Layer '{layer}' has no polygon with an area.": (
        "La couche « {layer} » n'a aucun polygone ayant une surface.",
        "La capa «{layer}» no tiene ningún polígono con área.",
    ),
    "Layer '{layer}' has no field '{field}'. Choose the field that holds the stratum ids.": (
        "La couche « {layer} » n'a pas de champ « {field} ». Choisissez le champ qui contient les identifiants de "
        "strate.",
        "La capa «{layer}» no tiene el campo «{field}». Elija el campo que contiene los identificadores de estrato.",
    ),
    "Layer '{layer}': field '{field}' is empty (NULL) for feature id(s) {ids}. Give every stratum a value.": (
        "Couche « {layer} » : le champ « {field} » est vide (NULL) pour les entités {ids}. Donnez une valeur à chaque "
        "strate.",
        "Capa «{layer}»: el campo «{field}» está vacío (NULL) en las entidades {ids}. Dé un valor a cada estrato.",
    ),
    "No strata were given: the stratified designs are left out ({names}).": (
        "Aucune strate n'a été donnée : les plans stratifiés sont écartés ({names}).",
        "No se dieron estratos: se dejan fuera los diseños estratificados ({names}).",
    ),
    "The stratified designs need strata: give the strata layer, or choose another design.": (
        "Les plans stratifiés ont besoin de strates : donnez la couche des strates, ou choisissez un autre plan.",
        "Los diseños estratificados necesitan estratos: indique la capa de estratos o elija otro diseño.",
    ),
    "Reading the density surface…": ("Chargement de la surface de densité…", "Leyendo la superficie de densidad…"),
    "The density surface was warped to {crs} (bilinear) to match the frame.": (
        "La surface de densité a été reprojetée en {crs} (bilinéaire) pour correspondre à la base de sondage.",
        "La superficie de densidad se reproyectó a {crs} (bilineal) para ajustarse al marco.",
    ),
    "Simulating {n} units…": ("Simulation avec {n} unités…", "Simulando {n} unidades…"),
    "{n} units were left out of the range: {why}": (
        "{n} unités ont été retirées de la gamme : {why}",
        "{n} unidades quedaron fuera del rango: {why}",
    ),
    "The output table could not be created.": (
        "La table de sortie n'a pas pu être créée.",
        "No se pudo crear la tabla de salida.",
    ),
    "Recommended design: {name} (RMSE {rmse:.1f} animals, {rel:.1%} of the total; coverage {cov:.0%}).": (
        "Plan recommandé : {name} (REQM {rmse:.1f} animaux, {rel:.1%} du total ; couverture {cov:.0%}).",
        "Diseño recomendado: {name} (RECM {rmse:.1f} animales, {rel:.1%} del total; cobertura {cov:.0%}).",
    ),
    "Survey designs compared by simulation": (
        "Plans d'inventaire comparés par simulation",
        "Diseños de muestreo comparados por simulación",
    ),
    "recommended design": ("plan recommandé", "diseño recomendado"),
    "its RMSE (animals)": ("sa REQM (animaux)", "su RECM (animales)"),
    "its RMSE relative to the total": ("sa REQM relative au total", "su RECM relativa al total"),
    "its 95 % interval coverage": ("couverture de ses intervalles à 95 %", "cobertura de sus intervalos al 95 %"),
    "expected animals in the frame": ("animaux attendus dans la base de sondage", "animales esperados en el marco"),
    "circular plot": ("placette circulaire", "parcela circular"),
    "line transect": ("transect linéaire", "transecto lineal"),
    "point station": ("station ponctuelle", "estación puntual"),
    "square plot": ("placette carrée", "parcela cuadrada"),
    "counting radius": ("rayon de comptage", "radio de conteo"),
    "length": ("longueur", "longitud"),
    "radius": ("rayon", "radio"),
    "side": ("côté", "lado"),
    ", strip half-width {w:g} m": (", demi-largeur de bande {w:g} m", ", semianchura de franja {w:g} m"),
    "Density surface": ("Surface de densité", "Superficie de densidad"),
    "feature id": ("identifiant d'entité", "identificador de entidad"),
    "Surface cell": ("Cellule de la surface", "Celda de la superficie"),
    "Sub-cells per cell side (for counting)": (
        "Sous-cellules par côté de cellule (pour le comptage)",
        "Subceldas por lado de celda (para el conteo)",
    ),
    "Unit": ("Unité", "Unidad"),
    "Counted area per unit (m²)": ("Surface comptée par unité (m²)", "Área contada por unidad (m²)"),
    "Bearing": ("Azimut", "Rumbo"),
    "random": ("aléatoire", "aleatorio"),
    "Counts per cell": ("Comptages par cellule", "Conteos por celda"),
    "negative binomial, k = {k:g}": ("binomiale négative, k = {k:g}", "binomial negativa, k = {k:g}"),
    "Poisson": ("Poisson", "Poisson"),
    "Variance estimator (grid, balanced)": (
        "Estimateur de variance (grille, équilibré)",
        "Estimador de la varianza (cuadrícula, equilibrado)",
    ),
    "local neighbourhood": ("voisinage local", "vecindario local"),
    "simple random sampling formula": (
        "formule de l'échantillonnage aléatoire simple",
        "fórmula del muestreo aleatorio simple",
    ),
    "Confidence level": ("Niveau de confiance", "Nivel de confianza"),
    "How the designs did at {n} units": (
        "Résultats des plans pour {n} unités",
        "Resultados de los diseños con {n} unidades",
    ),
    "Design": ("Plan", "Diseño"),
    "Empirical SE (animals)": ("Erreur type empirique (animaux)", "Error estándar empírico (animales)"),
    "Mean units surveyed": ("Unités inventoriées en moyenne", "Media de unidades muestreadas"),
    "Relative bias": ("Biais relatif", "Sesgo relativo"),
    "Mean estimated CV": ("CV estimé moyen", "CV estimado medio"),
    "RMSE (animals)": ("REQM (animaux)", "RECM (animales)"),
    "RMSE / total": ("REQM / total", "RECM / total"),
    "± Monte Carlo SE": ("± erreur type de Monte-Carlo", "± error estándar de Monte Carlo"),
    "95 % interval coverage": ("Couverture des intervalles à 95 %", "Cobertura de los intervalos al 95 %"),
    "Surveys without an estimate": ("Inventaires sans estimation", "Muestreos sin estimación"),
    "RMSE of the abundance (animals)": ("REQM de l'abondance (animaux)", "RECM de la abundancia (animales)"),
    "Root mean square error of the abundance estimate, by design (lower is better)": (
        "Racine de l'erreur quadratique moyenne de l'estimation de l'abondance, par plan (plus bas est meilleur)",
        "Raíz del error cuadrático medio de la estimación de la abundancia, por diseño (menor es mejor)",
    ),
    "Recommendation": ("Recommandation", "Recomendación"),
    "No design gave estimates: see the warnings.": (
        "Aucun plan n'a donné d'estimation : voir les avertissements.",
        "Ningún diseño dio estimaciones: vea las advertencias.",
    ),
    "{name} gave the lowest root mean square error ({rmse:,.1f} animals, {rel:.1%} of the mean true total of "
    "{total:,.0f}) among the designs whose 95 % intervals held the truth at least 90 % of the time.": (
        "{name} a donné la plus faible racine de l'erreur quadratique moyenne ({rmse:,.1f} animaux, {rel:.1%} du "
        "vrai total moyen de {total:,.0f}) parmi les plans dont les intervalles à 95 % ont contenu la vérité au moins "
        "90 % du temps.",
        "{name} dio la menor raíz del error cuadrático medio ({rmse:,.1f} animales, {rel:.1%} del total verdadero "
        "medio de {total:,.0f}) entre los diseños cuyos intervalos al 95 % contuvieron la verdad al menos el 90 % de "
        "las veces.",
    ),
    "{others} did about as well: the differences lie within the Monte Carlo error of the simulation. Among these, "
    "choose the one that is easiest to carry out in the field.": (
        "{others} ont fait à peu près aussi bien : les différences restent dans l'erreur de Monte-Carlo de la "
        "simulation. Parmi eux, choisissez celui qui est le plus facile à mettre en œuvre sur le terrain.",
        "{others} lo hicieron casi igual de bien: las diferencias quedan dentro del error de Monte Carlo de la "
        "simulación. Entre ellos, elija el más fácil de llevar a cabo en el terreno.",
    ),
    "The intervals of {names} held the truth less than 90 % of the time: their stated precision would mislead.": (
        "Les intervalles de {names} ont contenu la vérité moins de 90 % du temps : leur précision affichée serait "
        "trompeuse.",
        "Los intervalos de {names} contuvieron la verdad menos del 90 % de las veces: su precisión declarada "
        "induciría a error.",
    ),
    "The systematic grid's number of units varies from survey to survey (mean shown). With the simple random "
    "sampling formula its interval is usually conservative on smooth surfaces.": (
        "Le nombre d'unités de la grille systématique varie d'un inventaire à l'autre (moyenne indiquée). Avec la "
        "formule de l'échantillonnage aléatoire simple, son intervalle est en général conservateur sur des surfaces "
        "lisses.",
        "El número de unidades de la cuadrícula sistemática varía de un muestreo a otro (se muestra la media). Con "
        "la fórmula del muestreo aleatorio simple su intervalo suele ser conservador en superficies suaves.",
    ),
    "How the simulation works": ("Fonctionnement de la simulation", "Cómo funciona la simulación"),
    "Each simulated survey draws a population on the surface: Poisson counts in every surface cell, or negative "
    "binomial counts (gamma-Poisson) when k is above 0. All designs survey the same populations. Every design is "
    "laid out with the layout engine, each unit counts the animals of the cells whose centres it covers (only the "
    "part inside the frame, or inside its own stratum for the stratified designs), and the abundance is estimated "
    "with the estimation engine: the ratio estimator with its t interval (Satterthwaite degrees of freedom). Each "
    "estimate is judged against the true total of its own population.": (
        "Chaque inventaire simulé tire une population sur la surface : comptages de Poisson dans chaque cellule, ou "
        "comptages binomiaux négatifs (gamma-Poisson) quand k est supérieur à 0. Tous les plans inventorient les "
        "mêmes populations. Chaque plan est disposé avec le moteur de disposition, chaque unité compte les animaux "
        "des cellules dont elle couvre le centre (seulement la partie dans la base, ou dans sa propre strate pour "
        "les plans stratifiés), et l'abondance est estimée avec le moteur d'estimation : l'estimateur par le ratio "
        "avec son intervalle t (degrés de liberté de Satterthwaite). Chaque estimation est jugée par rapport au vrai "
        "total de sa propre population.",
        "Cada muestreo simulado genera una población sobre la superficie: conteos de Poisson en cada celda, o conteos "
        "binomiales negativos (gamma-Poisson) cuando k es mayor que 0. Todos los diseños muestrean las mismas "
        "poblaciones. Cada diseño se dispone con el motor de disposición, cada unidad cuenta los animales de las "
        "celdas cuyos centros cubre (solo la parte dentro del marco, o dentro de su propio estrato en los diseños "
        "estratificados), y la abundancia se estima con el motor de estimación: el estimador de razón con su "
        "intervalo t (grados de libertad de Satterthwaite). Cada estimación se juzga frente al total verdadero de su "
        "propia población.",
    ),
    "Assumptions: the surface is the truth, every animal in a unit is counted (no detection error), animals do not "
    "move during the survey, and every unit can be reached. Real surveys meet none of these exactly; use the "
    "comparison to rank designs and to size the effort, not as a promise of precision.": (
        "Hypothèses : la surface est la vérité, chaque animal d'une unité est compté (pas d'erreur de détection), "
        "les animaux ne se déplacent pas pendant l'inventaire et chaque unité peut être atteinte. Aucun vrai "
        "inventaire ne les remplit exactement ; utilisez la comparaison pour classer les plans et dimensionner "
        "l'effort, pas comme une promesse de précision.",
        "Supuestos: la superficie es la verdad, se cuenta cada animal de una unidad (sin error de detección), los "
        "animales no se mueven durante el muestreo y se puede llegar a cada unidad. Ningún muestreo real cumple "
        "exactamente ninguno de ellos; use la comparación para ordenar los diseños y dimensionar el esfuerzo, no "
        "como una promesa de precisión.",
    ),
    "Mean expected count per unit": ("Comptage attendu moyen par unité", "Conteo esperado medio por unidad"),
    "S_h (count SD per unit)": ("S_h (écart-type du comptage par unité)", "S_h (DE del conteo por unidad)"),
    "Units, proportional": ("Unités, proportionnelle", "Unidades, proporcional"),
    "Units, Neyman": ("Unités, Neyman", "Unidades, Neyman"),
    "S_h is the standard deviation of one unit's count in the stratum implied by the surface: the spread of the "
    "expected counts over {draws} random unit positions plus the Poisson (and negative binomial) variation about "
    "them. Neyman allocation gives each stratum units in proportion to A_h·S_h (Neyman 1934; Cochran 1977, §5.5), "
    "with at least 2 per stratum.": (
        "S_h est l'écart-type du comptage d'une unité dans la strate impliqué par la surface : la dispersion des "
        "comptages attendus sur {draws} positions aléatoires d'unités plus la variation de Poisson (et binomiale "
        "négative) autour d'eux. L'allocation de Neyman donne à chaque strate des unités proportionnellement à "
        "A_h·S_h (Neyman 1934 ; Cochran 1977, §5.5), avec au moins 2 par strate.",
        "S_h es la desviación estándar del conteo de una unidad en el estrato implicada por la superficie: la "
        "dispersión de los conteos esperados sobre {draws} posiciones aleatorias de unidades más la variación de "
        "Poisson (y binomial negativa) en torno a ellos. La asignación de Neyman da a cada estrato unidades en "
        "proporción a A_h·S_h (Neyman 1934; Cochran 1977, §5.5), con al menos 2 por estrato.",
    ),
    "RMSE against the number of units": ("REQM en fonction du nombre d'unités", "RECM frente al número de unidades"),
    "number of units": ("nombre d'unités", "número de unidades"),
    "RMSE of the abundance estimate against the number of units": (
        "REQM de l'estimation de l'abondance en fonction du nombre d'unités",
        "RECM de la estimación de la abundancia frente al número de unidades",
    ),
    "Units": ("Unités", "Unidades"),
    "{a} → {b} units: RMSE {change:+.0%}": ("{a} → {b} unités : REQM {change:+.0%}", "{a} → {b} unidades: RECM {change:+.0%}"),
    "For {name}: ": ("Pour {name} : ", "Para {name}: "),
    "The RMSE of a design falls roughly as 1/√n: doubling the units lowers it by about 30 %. Where the curve "
    "flattens, more units buy little; spend the effort on better counts (detection) or a better surface instead.": (
        "La REQM d'un plan décroît à peu près comme 1/√n : doubler les unités la réduit d'environ 30 %. Là où la "
        "courbe s'aplatit, davantage d'unités apportent peu ; consacrez plutôt l'effort à de meilleurs comptages "
        "(détection) ou à une meilleure surface.",
        "La RECM de un diseño disminuye aproximadamente como 1/√n: duplicar las unidades la reduce en torno a un "
        "30 %. Donde la curva se aplana, más unidades aportan poco; dedique mejor el esfuerzo a mejores conteos "
        "(detección) o a una mejor superficie.",
    ),
})

# -- the same English word, another meaning or gender in one context --------------------------
TRANSLATIONS.update({
    ("LayoutUnits", "Reserve"): ("Réserves", "Reservas"),
    ("Stratify", "none"): ("aucune", "ninguna"),
    ("CompareDesigns", "none"): ("aucune", "ninguno"),
})

# -- estimate --------------------------------------------------------------------------------
TRANSLATIONS.update({
    "Estimate density and abundance": ("Estimer la densité et l'abondance", "Estimar la densidad y la abundancia"),
    "Estimates density and abundance per stratum and for the whole frame from the counts in the sample units, "
    "with standard error, CV and confidence interval, and the sample size the next survey needs.\n\n"
    "Estimator: D_h = Σy / Σa per stratum (the ratio estimator; with equal units, the mean count divided by the "
    "unit area), with its linearised variance (Cochran 1977, ch. 5 and 6); abundance N_h = D_h·A_h; overall N = Σ "
    "N_h and D = N / Σ A_h, with the variances added. The finite-population correction 1 − Σa/A_h is applied when "
    "asked for.\n\n"
    "Counts: a NULL count means the unit was not surveyed: it is left out and listed as non-response. Reserve "
    "units (role = reserve) without a count are unused reserves and are skipped quietly; reserves that were "
    "surveyed count like any other unit. 0 means surveyed, none seen. Negative or non-numeric counts stop the run, "
    "naming the units.\n\n"
    "Unit area (m²): the unit area field (default area_m2, as the layout writes it) when it is above 0, else the "
    "polygon's area, else for lines the strip width × the line's length, else the fixed unit area for points and "
    "lines.\n\n"
    "Strata: polygons with an id field matching the units' stratum field; their areas define the frame. When the "
    "units have no stratum field, or the strata layer is a single polygon without an id field, all units form one "
    "stratum over the frame. A stratum with one surveyed unit is collapsed with a neighbour for its variance "
    "(Cochran 1977, §5A.12), with a warning. A stratum with none is an error, unless you choose to leave it out: "
    "then the frame shrinks, and the report says so. Strata must not overlap (an overlap of more than 0.1 % of the "
    "smaller stratum is an error, a smaller one a warning), and every strata polygon needs its id: a polygon without "
    "one is an error, unless strata with no surveyed unit may be left out.\n\n"
    "Intervals: t with Satterthwaite's degrees of freedom (Satterthwaite 1946; Cochran 1977); log-normal, N/C to "
    "N·C with C = exp(z√ln(1+CV²)) (Burnham et al. 1987; Buckland et al. 2001); or a rescaled stratified percentile "
    "bootstrap of 2,000 resamples (seeded; Rao & Wu 1988), which carries the finite-population correction.\n\n"
    "Variance: the simple random sampling formula, or the local neighbourhood estimator (Stevens & Olsen 2003) for "
    "systematic grids and spatially balanced layouts, where the simple formula overstates the variance.\n\n"
    "Detection: with a detection probability p below 1, estimates are divided by p and the squared CVs add (delta "
    "method, Seber 1982). p and its SE must come from a separate study.\n\n"
    "Presence data: with the presence option a 0/1 field gives the stratified proportion of units where the "
    "species was detected (naive occupancy, not corrected for detection), and abund is the number of occupied "
    "units in the frame.\n\n"
    "Target CV (above 0): n_next is the number of units each stratum needs next time for that CV of the overall "
    "abundance, by Neyman allocation on the observed standard deviations (Neyman 1934; Cochran 1977, eq. 5.26).\n\n"
    "True total: for simulations and training only. The report then shows it beside the estimate; in a real "
    "survey the true total is never known.\n\n"
    "Outputs: the strata polygons with the estimate fields (for a choropleth), a table with one row per stratum "
    "and a row 'all', an HTML report, and the overall numbers for models.": (
        "Estime la densité et l'abondance par strate et pour toute la base de sondage à partir des comptages dans "
        "les unités d'échantillonnage, avec erreur type, coefficient de variation (CV) et intervalle de confiance, "
        "ainsi que la taille d'échantillon nécessaire au prochain inventaire.\n\n"
        "Estimateur : D_h = Σy / Σa par strate (l'estimateur par le ratio ; avec des unités égales, le comptage "
        "moyen divisé par la surface d'une unité), avec sa variance linéarisée (Cochran 1977, ch. 5 et 6) ; "
        "abondance N_h = D_h·A_h ; au total N = Σ N_h et D = N / Σ A_h, les variances s'additionnant. La correction "
        "pour population finie 1 − Σa/A_h est appliquée sur demande.\n\n"
        "Comptages : un comptage NULL signifie que l'unité n'a pas été inventoriée : elle est écartée et listée "
        "comme non-réponse. Les unités de réserve (role = reserve) sans comptage sont des réserves non utilisées et "
        "sont ignorées sans avertissement ; les réserves inventoriées comptent comme toute autre unité. 0 signifie "
        "inventoriée, aucun animal vu. Des comptages négatifs ou non numériques arrêtent le traitement, en nommant "
        "les unités.\n\n"
        "Surface d'une unité (m²) : le champ de surface d'unité (area_m2 par défaut, tel que l'écrit la disposition) "
        "s'il est supérieur à 0, sinon la surface du polygone, sinon pour les lignes la largeur de bande × la "
        "longueur de la ligne, sinon la surface d'unité fixe pour les points et les lignes.\n\n"
        "Strates : des polygones avec un champ d'identifiant correspondant au champ de strate des unités ; leurs "
        "surfaces définissent la base de sondage. Quand les unités n'ont pas de champ de strate, ou que la couche "
        "des strates est un seul polygone sans champ d'identifiant, toutes les unités forment une seule strate sur "
        "la base. Une strate avec une seule unité inventoriée est regroupée avec une voisine pour sa variance "
        "(Cochran 1977, §5A.12), avec un avertissement. Une strate sans unité inventoriée est une erreur, sauf si "
        "vous choisissez de l'écarter : la base se réduit alors, et le rapport le dit. Les strates ne doivent pas se "
        "chevaucher (un chevauchement de plus de 0,1 % de la plus petite strate est une erreur, un plus petit un "
        "avertissement), et chaque polygone de strate doit porter son identifiant : un polygone sans identifiant est "
        "une erreur, sauf si les strates sans unité inventoriée peuvent être écartées.\n\n"
        "Intervalles : t avec les degrés de liberté de Satterthwaite (Satterthwaite 1946 ; Cochran 1977) ; "
        "log-normal, de N/C à N·C avec C = exp(z√ln(1+CV²)) (Burnham et al. 1987 ; Buckland et al. 2001) ; ou un "
        "bootstrap stratifié des percentiles, remis à l'échelle, sur 2 000 rééchantillonnages (avec graine ; Rao & "
        "Wu 1988), qui tient compte de la correction pour population finie.\n\n"
        "Variance : la formule de l'échantillonnage aléatoire simple, ou l'estimateur de voisinage local (Stevens & "
        "Olsen 2003) pour les grilles systématiques et les dispositions spatialement équilibrées, où la formule "
        "simple surestime la variance.\n\n"
        "Détection : avec une probabilité de détection p inférieure à 1, les estimations sont divisées par p et les "
        "CV au carré s'additionnent (méthode delta, Seber 1982). p et son erreur type doivent provenir d'une étude "
        "distincte.\n\n"
        "Données de présence : avec l'option présence, un champ 0/1 donne la proportion stratifiée d'unités où "
        "l'espèce a été détectée (occupation naïve, non corrigée de la détection), et abund est le nombre d'unités "
        "occupées dans la base.\n\n"
        "CV cible (supérieur à 0) : n_next est le nombre d'unités dont chaque strate aura besoin la prochaine fois "
        "pour ce CV de l'abondance globale, par allocation de Neyman sur les écarts-types observés (Neyman 1934 ; "
        "Cochran 1977, éq. 5.26).\n\n"
        "Vrai total : pour les simulations et la formation uniquement. Le rapport l'affiche alors à côté de "
        "l'estimation ; dans un vrai inventaire, le vrai total n'est jamais connu.\n\n"
        "Sorties : les polygones des strates avec les champs d'estimation (pour une carte choroplèthe), une table "
        "avec une ligne par strate et une ligne 'all', un rapport HTML, et les valeurs globales pour les modèles.",
        "Estima la densidad y la abundancia por estrato y para todo el marco de muestreo a partir de los conteos en "
        "las unidades de muestreo, con error estándar, coeficiente de variación (CV) e intervalo de confianza, y el "
        "tamaño de muestra que necesita el próximo muestreo.\n\n"
        "Estimador: D_h = Σy / Σa por estrato (el estimador de razón; con unidades iguales, el conteo medio dividido "
        "por el área de la unidad), con su varianza linealizada (Cochran 1977, cap. 5 y 6); abundancia N_h = "
        "D_h·A_h; en total N = Σ N_h y D = N / Σ A_h, sumando las varianzas. La corrección por población finita "
        "1 − Σa/A_h se aplica cuando se pide.\n\n"
        "Conteos: un conteo NULL significa que la unidad no se muestreó: se deja fuera y se lista como no respuesta. "
        "Las unidades de reserva (role = reserve) sin conteo son reservas no usadas y se omiten sin aviso; las "
        "reservas que se muestrearon cuentan como cualquier otra unidad. 0 significa muestreada, ningún animal "
        "visto. Los conteos negativos o no numéricos detienen la ejecución, nombrando las unidades.\n\n"
        "Área de la unidad (m²): el campo de área de la unidad (area_m2 por defecto, como lo escribe la disposición) "
        "si es mayor que 0; si no, el área del polígono; si no, para líneas, el ancho de franja × la longitud de la "
        "línea; si no, el área fija de la unidad para puntos y líneas.\n\n"
        "Estratos: polígonos con un campo identificador que corresponde al campo de estrato de las unidades; sus "
        "áreas definen el marco. Cuando las unidades no tienen campo de estrato, o la capa de estratos es un solo "
        "polígono sin campo identificador, todas las unidades forman un solo estrato sobre el marco. Un estrato con "
        "una sola unidad muestreada se agrupa con un vecino para su varianza (Cochran 1977, §5A.12), con una "
        "advertencia. Un estrato sin ninguna es un error, salvo que decida dejarlo fuera: entonces el marco se "
        "reduce y el informe lo indica. Los estratos no deben solaparse (un solapamiento de más del 0,1 % del estrato "
        "menor es un error, uno menor una advertencia), y cada polígono de estrato necesita su identificador: un "
        "polígono sin él es un error, salvo que se puedan dejar fuera los estratos sin unidades muestreadas.\n\n"
        "Intervalos: t con los grados de libertad de Satterthwaite (Satterthwaite 1946; Cochran 1977); log-normal, "
        "de N/C a N·C con C = exp(z√ln(1+CV²)) (Burnham et al. 1987; Buckland et al. 2001); o un bootstrap "
        "estratificado de percentiles reescalado con 2.000 remuestreos (con semilla; Rao & Wu 1988), que incluye la "
        "corrección por población finita.\n\n"
        "Varianza: la fórmula del muestreo aleatorio simple, o el estimador de vecindario local (Stevens & Olsen "
        "2003) para cuadrículas sistemáticas y disposiciones espacialmente equilibradas, donde la fórmula simple "
        "sobrestima la varianza.\n\n"
        "Detección: con una probabilidad de detección p menor que 1, las estimaciones se dividen por p y los CV al "
        "cuadrado se suman (método delta, Seber 1982). p y su error estándar deben proceder de un estudio aparte.\n\n"
        "Datos de presencia: con la opción de presencia, un campo 0/1 da la proporción estratificada de unidades "
        "donde se detectó la especie (ocupación ingenua, sin corregir por la detección), y abund es el número de "
        "unidades ocupadas en el marco.\n\n"
        "CV objetivo (mayor que 0): n_next es el número de unidades que cada estrato necesita la próxima vez para "
        "ese CV de la abundancia global, por asignación de Neyman sobre las desviaciones estándar observadas "
        "(Neyman 1934; Cochran 1977, ec. 5.26).\n\n"
        "Total verdadero: solo para simulaciones y formación. El informe lo muestra entonces junto a la estimación; "
        "en un muestreo real el total verdadero nunca se conoce.\n\n"
        "Salidas: los polígonos de los estratos con los campos de la estimación (para un mapa de coropletas), una "
        "tabla con una fila por estrato y una fila 'all', un informe HTML y los valores globales para los modelos.",
    ),
    "Sample units with counts": ("Unités d'échantillonnage avec comptages", "Unidades de muestreo con conteos"),
    "Count field": ("Champ de comptage", "Campo de conteo"),
    "Stratum field of the units": ("Champ de strate des unités", "Campo de estrato de las unidades"),
    "Unit area field (m²)": ("Champ de surface d'unité (m²)", "Campo de área de la unidad (m²)"),
    "Fixed unit area for points and lines (m²; 0: not used)": (
        "Surface d'unité fixe pour les points et les lignes (m² ; 0 : non utilisée)",
        "Área fija de la unidad para puntos y líneas (m²; 0: no se usa)",
    ),
    "Strip width of line transects (m, full width; 0: not used)": (
        "Largeur de bande des transects linéaires (m, largeur totale ; 0 : non utilisée)",
        "Ancho de franja de los transectos lineales (m, ancho total; 0: no se usa)",
    ),
    "Strata (the frame)": ("Strates (la base de sondage)", "Estratos (el marco)"),
    "Stratum id field of the strata": ("Champ d'identifiant des strates", "Campo identificador de los estratos"),
    "Confidence interval": ("Intervalle de confiance", "Intervalo de confianza"),
    "Log-normal": ("Log-normal", "Log-normal"),
    "t with Satterthwaite degrees of freedom": (
        "t avec les degrés de liberté de Satterthwaite",
        "t con los grados de libertad de Satterthwaite",
    ),
    "Stratified bootstrap (2,000 resamples)": (
        "Bootstrap stratifié (2 000 rééchantillonnages)",
        "Bootstrap estratificado (2.000 remuestreos)",
    ),
    "Finite-population correction": ("Correction pour population finie", "Corrección por población finita"),
    "Detection probability p (from a separate study; 1: all seen)": (
        "Probabilité de détection p (d'une étude distincte ; 1 : tous vus)",
        "Probabilidad de detección p (de un estudio aparte; 1: todos vistos)",
    ),
    "Standard error of p": ("Erreur type de p", "Error estándar de p"),
    "Area unit of the results": ("Unité de surface des résultats", "Unidad de área de los resultados"),
    "hectares": ("hectares", "hectáreas"),
    "km²": ("km²", "km²"),
    "Target CV for the next survey (0: not used; e.g. 0.15)": (
        "CV cible pour le prochain inventaire (0 : non utilisé ; p. ex. 0.15)",
        "CV objetivo para el próximo muestreo (0: no se usa; p. ej. 0.15)",
    ),
    "Variance estimator": ("Estimateur de variance", "Estimador de la varianza"),
    "Local neighbourhood (systematic or spatially balanced layouts)": (
        "Voisinage local (dispositions systématiques ou spatialement équilibrées)",
        "Vecindario local (disposiciones sistemáticas o espacialmente equilibradas)",
    ),
    "The count field holds presence (1) / absence (0)": (
        "Le champ de comptage contient présence (1) / absence (0)",
        "El campo de conteo contiene presencia (1) / ausencia (0)",
    ),
    "Leave out strata with no surveyed unit (the frame shrinks)": (
        "Écarter les strates sans unité inventoriée (la base se réduit)",
        "Dejar fuera los estratos sin unidades muestreadas (el marco se reduce)",
    ),
    "True total of a simulated population (simulations and training only; 0: none)": (
        "Vrai total d'une population simulée (simulations et formation uniquement ; 0 : aucun)",
        "Total verdadero de una población simulada (solo simulaciones y formación; 0: ninguno)",
    ),
    "Strata with estimates": ("Strates avec estimations", "Estratos con estimaciones"),
    "Estimate table": ("Table des estimations", "Tabla de estimaciones"),
    "Overall density": ("Densité globale", "Densidad global"),
    "SE of the overall density": ("Erreur type de la densité globale", "Error estándar de la densidad global"),
    "Overall abundance": ("Abondance globale", "Abundancia global"),
    "Lower confidence limit of the abundance": (
        "Limite inférieure de confiance de l'abondance",
        "Límite inferior de confianza de la abundancia",
    ),
    "Upper confidence limit of the abundance": (
        "Limite supérieure de confiance de l'abondance",
        "Límite superior de confianza de la abundancia",
    ),
    "CV of the overall estimate": ("CV de l'estimation globale", "CV de la estimación global"),
    "Layer '{layer}' has no count field '{field}'. Choose the field that holds the counts.": (
        "La couche « {layer} » n'a pas de champ de comptage « {field} ». Choisissez le champ qui contient les "
        "comptages.",
        "La capa «{layer}» no tiene el campo de conteo «{field}». Elija el campo que contiene los conteos.",
    ),
    "Layer '{layer}' has no stratum id field matching the units' field '{field}'. Choose the strata layer's id "
    "field (plotwise:stratify writes 'stratum'), or give a frame layer of one polygon to treat the frame as one "
    "stratum.": (
        "La couche « {layer} » n'a pas de champ d'identifiant de strate correspondant au champ « {field} » des "
        "unités. Choisissez le champ d'identifiant de la couche des strates (plotwise:stratify écrit 'stratum'), ou "
        "donnez une couche de base de sondage d'un seul polygone pour traiter la base comme une seule strate.",
        "La capa «{layer}» no tiene un campo identificador de estrato que corresponda al campo «{field}» de las "
        "unidades. Elija el campo identificador de la capa de estratos (plotwise:stratify escribe 'stratum') o dé "
        "una capa de marco de un solo polígono para tratar el marco como un solo estrato.",
    ),
    "Layer '{layer}' is one polygon without a stratum id field: the frame is treated as one stratum, and the "
    "units' field '{field}' is not used. If the units were allocated to strata unequally, give the strata instead: "
    "an unstratified mean is then biased.": (
        "La couche « {layer} » est un seul polygone sans champ d'identifiant de strate : la base est traitée comme "
        "une seule strate, et le champ « {field} » des unités n'est pas utilisé. Si les unités ont été allouées aux "
        "strates de façon inégale, donnez plutôt les strates : une moyenne non stratifiée est alors biaisée.",
        "La capa «{layer}» es un solo polígono sin campo identificador de estrato: el marco se trata como un solo "
        "estrato y no se usa el campo «{field}» de las unidades. Si las unidades se asignaron a los estratos de forma "
        "desigual, dé en su lugar los estratos: una media no estratificada está entonces sesgada.",
    ),
    "Layer '{layer}' has no features.": ("La couche « {layer} » n'a aucune entité.", "La capa «{layer}» no tiene entidades."),
    "Layer '{layer}' has no polygons with an area.": (
        "La couche « {layer} » n'a aucun polygone ayant une surface.",
        "La capa «{layer}» no tiene polígonos con área.",
    ),
    "{n} unused reserve unit(s) without a count were skipped.": (
        "{n} unité(s) de réserve non utilisée(s) sans comptage ont été ignorée(s).",
        "Se omitieron {n} unidad(es) de reserva no usada(s) sin conteo.",
    ),
    "Layer '{layer}': units {ids} have no geometry, so the local neighbourhood variance cannot use them. Give them "
    "their location, or use the simple random sampling formula.": (
        "Couche « {layer} » : les unités {ids} n'ont pas de géométrie, la variance de voisinage local ne peut donc "
        "pas les utiliser. Donnez-leur leur position, ou utilisez la formule de l'échantillonnage aléatoire simple.",
        "Capa «{layer}»: las unidades {ids} no tienen geometría, así que la varianza de vecindario local no puede "
        "usarlas. Deles su ubicación o use la fórmula del muestreo aleatorio simple.",
    ),
    "Every count is 0 or 1. If the field records presence/absence, run again with the presence option: the result "
    "is then the proportion of units occupied (naive occupancy).": (
        "Tous les comptages valent 0 ou 1. Si le champ enregistre présence/absence, relancez avec l'option "
        "présence : le résultat est alors la proportion d'unités occupées (occupation naïve).",
        "Todos los conteos son 0 o 1. Si el campo registra presencia/ausencia, vuelva a ejecutar con la opción de "
        "presencia: el resultado es entonces la proporción de unidades ocupadas (ocupación ingenua).",
    ),
    "Overall abundance {n:,.1f} ({lo:,.1f} to {hi:,.1f}), CV {cv:.3f}.": (
        "Abondance globale {n:,.1f} ({lo:,.1f} à {hi:,.1f}), CV {cv:.3f}.",
        "Abundancia global {n:,.1f} ({lo:,.1f} a {hi:,.1f}), CV {cv:.3f}.",
    ),
    "Layer '{layer}': units {ids} have no surveyed area. Point units need the unit area field (area_m2 above 0) or "
    "a fixed unit area (m²); line units the area field, a strip width or a fixed unit area; polygons use their own "
    "area.": (
        "Couche « {layer} » : les unités {ids} n'ont pas de surface inventoriée. Les unités ponctuelles ont besoin du "
        "champ de surface d'unité (area_m2 supérieur à 0) ou d'une surface d'unité fixe (m²) ; les unités linéaires "
        "du champ de surface, d'une largeur de bande ou d'une surface d'unité fixe ; les polygones utilisent leur "
        "propre surface.",
        "Capa «{layer}»: las unidades {ids} no tienen área muestreada. Las unidades de punto necesitan el campo de "
        "área de la unidad (area_m2 mayor que 0) o un área fija de la unidad (m²); las de línea, el campo de área, "
        "un ancho de franja o un área fija; los polígonos usan su propia área.",
    ),
    "In strata {strata} the units' inclusion probabilities (incl_p) differ. This estimator assumes equal chances "
    "within a stratum; check the design the units came from.": (
        "Dans les strates {strata}, les probabilités d'inclusion des unités (incl_p) diffèrent. Cet estimateur "
        "suppose des chances égales dans une strate ; vérifiez le plan dont viennent les unités.",
        "En los estratos {strata} las probabilidades de inclusión de las unidades (incl_p) difieren. Este estimador "
        "supone probabilidades iguales dentro de un estrato; compruebe el diseño del que proceden las unidades.",
    ),
    "animals": ("animaux", "animales"),
    "occupied units": ("unités occupées", "unidades ocupadas"),
    "Density and abundance estimate": ("Estimation de la densité et de l'abondance", "Estimación de la densidad y la abundancia"),
    "Naive occupancy from presence data": (
        "Occupation naïve à partir de données de présence",
        "Ocupación ingenua a partir de datos de presencia",
    ),
    "density per {unit}": ("densité par {unit}", "densidad por {unit}"),
    "proportion of units occupied (naive)": ("proportion d'unités occupées (naïve)", "proporción de unidades ocupadas (ingenua)"),
    "estimated {what} in the frame": ("estimation des {what} dans la base de sondage", "estimación de {what} en el marco"),
    "{level} interval": ("intervalle à {level}", "intervalo al {level}"),
    "CV": ("CV", "CV"),
    "units surveyed": ("unités inventoriées", "unidades muestreadas"),
    "true total of the simulated population": ("vrai total de la population simulée", "total verdadero de la población simulada"),
    "Simulation only: the true total ({truth:,.0f}) is known here because the population was simulated. The "
    "estimate is {est:,.0f} ({error:+.1%} from the truth), and the {level} interval {verdict} the truth. Only a "
    "simulation can show this; a real survey never knows its true total, and one survey's interval may miss it by "
    "chance (about {miss:.0%} of surveys should).": (
        "Simulation uniquement : le vrai total ({truth:,.0f}) est connu ici parce que la population a été simulée. "
        "L'estimation est de {est:,.0f} ({error:+.1%} par rapport à la vérité), et l'intervalle à {level} {verdict} "
        "la vérité. Seule une simulation peut le montrer ; un vrai inventaire ne connaît jamais son vrai total, et "
        "l'intervalle d'un inventaire peut le manquer par hasard (ce devrait être le cas d'environ {miss:.0%} des "
        "inventaires).",
        "Solo simulación: el total verdadero ({truth:,.0f}) se conoce aquí porque la población se simuló. La "
        "estimación es {est:,.0f} ({error:+.1%} respecto a la verdad), y el intervalo al {level} {verdict} la "
        "verdad. Solo una simulación puede mostrarlo; un muestreo real nunca conoce su total verdadero, y el "
        "intervalo de un muestreo puede no contenerlo por azar (debería ocurrir en torno al {miss:.0%} de los "
        "muestreos).",
    ),
    "covers": ("contient", "contiene"),
    "misses": ("ne contient pas", "no contiene"),
    "log-normal": ("log-normal", "log-normal"),
    "stratified percentile bootstrap": ("bootstrap stratifié des percentiles", "bootstrap estratificado de percentiles"),
    "local neighbourhood (Stevens & Olsen 2003)": ("voisinage local (Stevens & Olsen 2003)", "vecindario local (Stevens & Olsen 2003)"),
    " (presence/absence)": (" (présence/absence)", " (presencia/ausencia)"),
    "none: one stratum": ("aucun : une seule strate", "ninguno: un solo estrato"),
    "Unit area": ("Surface d'une unité", "Área de la unidad"),
    "field {field} (m²)": ("champ {field} (m²)", "campo {field} (m²)"),
    "polygon area": ("surface du polygone", "área del polígono"),
    "strip width": ("largeur de bande", "ancho de franja"),
    "fixed": ("fixe", "fija"),
    "Strata (frame)": ("Strates (base de sondage)", "Estratos (marco)"),
    "Area unit": ("Unité de surface", "Unidad de área"),
    "Interval": ("Intervalle", "Intervalo"),
    "Detection probability p": ("Probabilité de détection p", "Probabilidad de detección p"),
    "Target CV for the next survey": ("CV cible pour le prochain inventaire", "CV objetivo para el próximo muestreo"),
    "Bootstrap resamples": ("Rééchantillonnages bootstrap", "Remuestreos bootstrap"),
    "not used (no random draws without the bootstrap)": (
        "non utilisée (pas de tirage aléatoire sans le bootstrap)",
        "no se usa (sin sorteos aleatorios sin el bootstrap)",
    ),
    "Estimates by stratum": ("Estimations par strate", "Estimaciones por estrato"),
    "Area ({unit})": ("Surface ({unit})", "Área ({unit})"),
    "Not surveyed": ("Non inventoriées", "No muestreadas"),
    "Units (n)": ("Unités (n)", "Unidades (n)"),
    "Mean count": ("Comptage moyen", "Conteo medio"),
    "SD of counts": ("Écart-type des comptages", "DE de los conteos"),
    "SE": ("Erreur type", "EE"),
    "Lower limit": ("Limite inférieure", "Límite inferior"),
    "Upper limit": ("Limite supérieure", "Límite superior"),
    "df": ("ddl", "gl"),
    "Abundance": ("Abondance", "Abundancia"),
    "Occupied units": ("Unités occupées", "Unidades ocupadas"),
    "Units next time (n_next)": ("Unités la prochaine fois (n_next)", "Unidades la próxima vez (n_next)"),
    "{what}, limits at {level}.": ("{what}, limites à {level}.", "{what}, límites al {level}."),
    "{what} in the frame, limits at {level}.": (
        "{what} dans la base de sondage, limites à {level}.",
        "{what} en el marco, límites al {level}.",
    ),
    "The frame shrank: strata {strata} had no surveyed unit and were left out ({area:,.3g} {unit}). The estimate "
    "covers the remaining strata only.": (
        "La base de sondage s'est réduite : les strates {strata} n'avaient aucune unité inventoriée et ont été "
        "écartées ({area:,.3g} {unit}). L'estimation ne couvre que les strates restantes.",
        "El marco se redujo: los estratos {strata} no tenían unidades muestreadas y se dejaron fuera "
        "({area:,.3g} {unit}). La estimación solo cubre los estratos restantes.",
    ),
    "Non-response: {n} unit(s) were not surveyed (no count) and were left out: {ids}.": (
        "Non-réponse : {n} unité(s) n'ont pas été inventoriée(s) (pas de comptage) et ont été écartée(s) : {ids}.",
        "No respuesta: {n} unidad(es) no se muestrearon (sin conteo) y se dejaron fuera: {ids}.",
    ),
    "The overall interval by method": ("L'intervalle global selon la méthode", "El intervalo global según el método"),
    "Used in the outputs": ("Utilisé dans les sorties", "Usado en las salidas"),
    "The t interval is symmetric about the estimate; the log-normal interval is skewed to the right like the "
    "sampling distribution of a count-based estimate, and suits small samples of clumped animals better. Choose the "
    "method before looking at the results.": (
        "L'intervalle t est symétrique autour de l'estimation ; l'intervalle log-normal est asymétrique vers la "
        "droite comme la distribution d'échantillonnage d'une estimation fondée sur des comptages, et convient mieux "
        "aux petits échantillons d'animaux agrégés. Choisissez la méthode avant de regarder les résultats.",
        "El intervalo t es simétrico respecto a la estimación; el intervalo log-normal es asimétrico hacia la "
        "derecha, como la distribución muestral de una estimación basada en conteos, y se adapta mejor a muestras "
        "pequeñas de animales agregados. Elija el método antes de mirar los resultados.",
    ),
    "overall abundance in a resample": ("abondance globale dans un rééchantillonnage", "abundancia global en un remuestreo"),
    "resamples": ("rééchantillonnages", "remuestreos"),
    "{level} percentile limits": ("limites des percentiles à {level}", "límites de percentiles al {level}"),
    "The {n:,} bootstrap resamples of the overall abundance": (
        "Les {n:,} rééchantillonnages bootstrap de l'abondance globale",
        "Los {n:,} remuestreos bootstrap de la abundancia global",
    ),
    "true density (simulation)": ("vraie densité (simulation)", "densidad verdadera (simulación)"),
    "{what} by stratum with {level} confidence intervals": (
        "{what} par strate avec intervalles de confiance à {level}",
        "{what} por estrato con intervalos de confianza al {level}",
    ),
    "lowest": ("minimum", "mínimo"),
    "highest": ("maximum", "máximo"),
    "surveyed units": ("unités inventoriées", "unidades muestreadas"),
    "not surveyed": ("non inventoriées", "no muestreadas"),
    "Strata shaded by {what}, with the units": ("Strates ombrées selon {what}, avec les unités", "Estratos sombreados según {what}, con las unidades"),
    "Each stratum's value is the proportion of its surveyed units where the species was detected; the frame's "
    "value weights the strata by the number of units they hold (area / unit area). This is naive occupancy: it is "
    "not corrected for detection, so it understates true occupancy whenever the species can be present and missed. "
    "Detection-corrected occupancy needs repeat visits to the same units (occupancy models).": (
        "La valeur de chaque strate est la proportion de ses unités inventoriées où l'espèce a été détectée ; la "
        "valeur de la base pondère les strates par le nombre d'unités qu'elles contiennent (surface / surface d'une "
        "unité). C'est l'occupation naïve : elle n'est pas corrigée de la détection, et sous-estime donc "
        "l'occupation réelle dès que l'espèce peut être présente sans être vue. Une occupation corrigée de la "
        "détection exige des visites répétées des mêmes unités (modèles d'occupation).",
        "El valor de cada estrato es la proporción de sus unidades muestreadas donde se detectó la especie; el valor "
        "del marco pondera los estratos por el número de unidades que contienen (área / área de la unidad). Es la "
        "ocupación ingenua: no está corregida por la detección, por lo que subestima la ocupación real siempre que "
        "la especie pueda estar presente y pasar inadvertida. La ocupación corregida por la detección requiere "
        "visitas repetidas a las mismas unidades (modelos de ocupación).",
    ),
    "Density in each stratum is the total count divided by the total surveyed area, D_h = Σy/Σa (the ratio "
    "estimator, Cochran 1977, ch. 6), with the linearised variance v(D_h) = (1 − f_h)/(n_h ā_h²) · Σ(y − D_h a)²/"
    "(n_h − 1), where f_h = Σa/A_h when the finite-population correction is applied and 0 otherwise. Abundance is "
    "N_h = D_h A_h; the frame's abundance is the sum over strata, its variance the sum of the strata variances, "
    "and its density N / Σ A_h (Cochran 1977, ch. 5).": (
        "La densité de chaque strate est le comptage total divisé par la surface totale inventoriée, D_h = Σy/Σa "
        "(l'estimateur par le ratio, Cochran 1977, ch. 6), avec la variance linéarisée v(D_h) = (1 − f_h)/(n_h "
        "ā_h²) · Σ(y − D_h a)²/(n_h − 1), où f_h = Σa/A_h quand la correction pour population finie est appliquée "
        "et 0 sinon. L'abondance est N_h = D_h A_h ; l'abondance de la base est la somme sur les strates, sa "
        "variance la somme des variances des strates, et sa densité N / Σ A_h (Cochran 1977, ch. 5).",
        "La densidad de cada estrato es el conteo total dividido por el área total muestreada, D_h = Σy/Σa (el "
        "estimador de razón, Cochran 1977, cap. 6), con la varianza linealizada v(D_h) = (1 − f_h)/(n_h ā_h²) · "
        "Σ(y − D_h a)²/(n_h − 1), donde f_h = Σa/A_h cuando se aplica la corrección por población finita y 0 en "
        "otro caso. La abundancia es N_h = D_h A_h; la abundancia del marco es la suma sobre los estratos, su "
        "varianza la suma de las varianzas de los estratos y su densidad N / Σ A_h (Cochran 1977, cap. 5).",
    ),
    "Intervals use Student's t with Satterthwaite's effective degrees of freedom, ν = (Σ v_h)² / Σ (v_h² / (n_h − "
    "1)) (Satterthwaite 1946; Cochran 1977, ch. 5). Lower limits below 0 are shown as 0.": (
        "Les intervalles utilisent le t de Student avec les degrés de liberté effectifs de Satterthwaite, ν = "
        "(Σ v_h)² / Σ (v_h² / (n_h − 1)) (Satterthwaite 1946 ; Cochran 1977, ch. 5). Les limites inférieures "
        "sous 0 sont affichées comme 0.",
        "Los intervalos usan la t de Student con los grados de libertad efectivos de Satterthwaite, ν = (Σ v_h)² / "
        "Σ (v_h² / (n_h − 1)) (Satterthwaite 1946; Cochran 1977, cap. 5). Los límites inferiores por debajo de 0 "
        "se muestran como 0.",
    ),
    "Intervals are log-normal: N/C to N·C with C = exp(z·√ln(1 + CV²)) (Burnham et al. 1987; Buckland et al. "
    "2001). They are asymmetric and never go below 0.": (
        "Les intervalles sont log-normaux : de N/C à N·C avec C = exp(z·√ln(1 + CV²)) (Burnham et al. 1987 ; "
        "Buckland et al. 2001). Ils sont asymétriques et ne descendent jamais sous 0.",
        "Los intervalos son log-normales: de N/C a N·C con C = exp(z·√ln(1 + CV²)) (Burnham et al. 1987; Buckland "
        "et al. 2001). Son asimétricos y nunca bajan de 0.",
    ),
    "Intervals are rescaled stratified percentile bootstrap intervals, from {b:,} resamples drawn from the recorded "
    "seed: in each stratum n − 1 units are drawn with replacement and their density is moved towards the stratum's "
    "estimate by the factor √(1 − f), so that the resamples vary as much as the stratified variance says, with the "
    "finite-population correction when it is asked for (Rao & Wu 1988; Efron & Tibshirani 1993).": (
        "Les intervalles sont des intervalles bootstrap stratifiés des percentiles, remis à l'échelle, issus de {b:,} "
        "rééchantillonnages tirés à partir de la graine enregistrée : dans chaque strate, n − 1 unités sont tirées "
        "avec remise et leur densité est rapprochée de l'estimation de la strate par le facteur √(1 − f), de sorte "
        "que les rééchantillonnages varient autant que l'indique la variance stratifiée, avec la correction pour "
        "population finie quand elle est demandée (Rao & Wu 1988 ; Efron & Tibshirani 1993).",
        "Los intervalos son intervalos bootstrap estratificados de percentiles reescalados, a partir de {b:,} "
        "remuestreos tomados con la semilla registrada: en cada estrato se toman n − 1 unidades con reposición y su "
        "densidad se acerca a la estimación del estrato por el factor √(1 − f), de modo que los remuestreos varían "
        "tanto como indica la varianza estratificada, con la corrección por población finita cuando se pide "
        "(Rao & Wu 1988; Efron & Tibshirani 1993).",
    ),
    "Variances use the local neighbourhood estimator of Stevens & Olsen (2003): each unit and its three nearest "
    "units in the stratum form a neighbourhood, and only differences within neighbourhoods count as variance. For "
    "systematic and spatially balanced layouts the simple random sampling formula overstates the variance; this "
    "estimator does not, as long as the layout really was systematic or spatially balanced; for a simple random "
    "layout use the simple formula. The sum of the local variances is scaled once so that it agrees on average "
    "with the simple formula when the population has no spatial pattern (our choice).": (
        "Les variances utilisent l'estimateur de voisinage local de Stevens & Olsen (2003) : chaque unité et ses "
        "trois plus proches voisines dans la strate forment un voisinage, et seules les différences à l'intérieur "
        "des voisinages comptent comme variance. Pour les dispositions systématiques et spatialement équilibrées, "
        "la formule de l'échantillonnage aléatoire simple surestime la variance ; cet estimateur non, pourvu que la "
        "disposition ait réellement été systématique ou spatialement équilibrée ; pour une disposition aléatoire "
        "simple, utilisez la formule simple. La somme des variances locales est mise à l'échelle une fois pour "
        "concorder en moyenne avec la formule simple quand la population n'a pas de structure spatiale (notre choix).",
        "Las varianzas usan el estimador de vecindario local de Stevens & Olsen (2003): cada unidad y sus tres "
        "unidades más próximas en el estrato forman un vecindario, y solo las diferencias dentro de los vecindarios "
        "cuentan como varianza. Para disposiciones sistemáticas y espacialmente equilibradas, la fórmula del "
        "muestreo aleatorio simple sobrestima la varianza; este estimador no, siempre que la disposición fuera "
        "realmente sistemática o espacialmente equilibrada; para una disposición aleatoria simple use la fórmula "
        "simple. La suma de las varianzas locales se escala una vez para que coincida en promedio con la fórmula "
        "simple cuando la población no tiene estructura espacial (decisión nuestra).",
    ),
    "Strata with one surveyed unit were collapsed with a neighbour (of the strata touching it on the map, or else "
    "the strata next to it in id order, the one with the closer density): the members of a collapsed group share "
    "the group's pooled residual variance (Cochran 1977, §5A.12). Differences between the collapsed strata then "
    "count as variance, so their standard errors tend to be too large.": (
        "Les strates avec une seule unité inventoriée ont été regroupées avec une voisine (parmi les strates qui la "
        "touchent sur la carte, ou à défaut les strates voisines dans l'ordre des identifiants, celle dont la "
        "densité est la plus proche) : les membres d'un groupe partagent la variance résiduelle commune du groupe "
        "(Cochran 1977, §5A.12). Les différences entre strates regroupées comptent alors comme variance, si bien "
        "que leurs erreurs types tendent à être trop grandes.",
        "Los estratos con una sola unidad muestreada se agruparon con un vecino (entre los estratos que lo tocan en "
        "el mapa o, si no, los estratos contiguos en el orden de identificadores, el de densidad más próxima): los "
        "miembros de un grupo comparten la varianza residual combinada del grupo (Cochran 1977, §5A.12). Las "
        "diferencias entre los estratos agrupados cuentan entonces como varianza, por lo que sus errores estándar "
        "tienden a ser demasiado grandes.",
    ),
    "Detection: estimates are divided by p = {p:g}, and the squared CVs of the count estimate and of p (SE {se:g}, "
    "CV {cv:.3f}) add (delta method, Seber 1982). The t interval's degrees of freedom combine the two parts "
    "(Buckland et al. 2001), p's part counting as known with infinite degrees of freedom.": (
        "Détection : les estimations sont divisées par p = {p:g}, et les CV au carré de l'estimation des comptages "
        "et de p (erreur type {se:g}, CV {cv:.3f}) s'additionnent (méthode delta, Seber 1982). Les degrés de "
        "liberté de l'intervalle t combinent les deux parts (Buckland et al. 2001), celle de p étant comptée comme "
        "connue avec des degrés de liberté infinis.",
        "Detección: las estimaciones se dividen por p = {p:g}, y los CV al cuadrado de la estimación de los conteos "
        "y de p (EE {se:g}, CV {cv:.3f}) se suman (método delta, Seber 1982). Los grados de libertad del intervalo "
        "t combinan ambas partes (Buckland et al. 2001), contando la de p como conocida con grados de libertad "
        "infinitos.",
    ),
    "Next survey: n_next is the number of units each stratum needs for a CV of {cv:g} of the overall abundance, by "
    "Neyman allocation n_h ∝ M_h S_h on the standard deviations observed now (Neyman 1934; Cochran 1977, eq. "
    "5.26), at least 2 per stratum. The observed SDs are themselves uncertain, especially from few units.": (
        "Prochain inventaire : n_next est le nombre d'unités dont chaque strate a besoin pour un CV de {cv:g} de "
        "l'abondance globale, par allocation de Neyman n_h ∝ M_h S_h sur les écarts-types observés maintenant "
        "(Neyman 1934 ; Cochran 1977, éq. 5.26), au moins 2 par strate. Les écarts-types observés sont eux-mêmes "
        "incertains, surtout avec peu d'unités.",
        "Próximo muestreo: n_next es el número de unidades que cada estrato necesita para un CV de {cv:g} de la "
        "abundancia global, por asignación de Neyman n_h ∝ M_h S_h sobre las desviaciones estándar observadas ahora "
        "(Neyman 1934; Cochran 1977, ec. 5.26), al menos 2 por estrato. Las DE observadas son a su vez inciertas, "
        "sobre todo con pocas unidades.",
    ),
    "Cautions": ("Mises en garde", "Precauciones"),
    "The inference covers the sampling frame only: the strata polygons given here. It says nothing about land "
    "outside them (excluded areas, inaccessible ground, neighbouring land).": (
        "L'inférence ne couvre que la base de sondage : les polygones de strates donnés ici. Elle ne dit rien des "
        "terrains en dehors (zones exclues, terrains inaccessibles, terres voisines).",
        "La inferencia solo cubre el marco de muestreo: los polígonos de estratos dados aquí. No dice nada del "
        "terreno fuera de ellos (zonas excluidas, terreno inaccesible, tierras vecinas).",
    ),
    "Presence data: a non-detection is not an absence. Naive occupancy needs repeat visits before it can be "
    "corrected for detection.": (
        "Données de présence : une non-détection n'est pas une absence. L'occupation naïve exige des visites "
        "répétées pour pouvoir être corrigée de la détection.",
        "Datos de presencia: una no detección no es una ausencia. La ocupación ingenua necesita visitas repetidas "
        "para poder corregirse por la detección.",
    ),
    "Detection: p must come from a separate study (double observers, marked animals, distance sampling) of the "
    "same species, season, habitat and observers. If the detection in this survey differs, the estimate is biased "
    "by the same factor, and no interval here shows it.": (
        "Détection : p doit provenir d'une étude distincte (double observateur, animaux marqués, échantillonnage "
        "par distance) de la même espèce, à la même saison, dans le même habitat et avec les mêmes observateurs. Si "
        "la détection de cet inventaire diffère, l'estimation est biaisée du même facteur, et aucun intervalle ici "
        "ne le montre.",
        "Detección: p debe proceder de un estudio aparte (doble observador, animales marcados, muestreo de "
        "distancias) de la misma especie, estación, hábitat y observadores. Si la detección en este muestreo "
        "difiere, la estimación está sesgada en el mismo factor, y ningún intervalo de aquí lo muestra.",
    ),
    "Detection: with p = 1 the estimate assumes every animal in a surveyed unit was counted. Animals missed make "
    "it too low, and the interval does not show that bias.": (
        "Détection : avec p = 1, l'estimation suppose que chaque animal d'une unité inventoriée a été compté. Les "
        "animaux manqués la rendent trop basse, et l'intervalle ne montre pas ce biais.",
        "Detección: con p = 1 la estimación supone que se contó cada animal de una unidad muestreada. Los animales "
        "no vistos la hacen demasiado baja, y el intervalo no muestra ese sesgo.",
    ),
    "The design the units came from: the formulas assume the units were placed at random within each stratum with "
    "equal chances (simple random, systematic grid or spatially balanced layout), that unsurveyed units are missing "
    "by chance, and that reserve units replaced primaries in draw order. Units chosen for convenience (near roads "
    "or camps) or skipped because of what was expected there bias the estimate in ways no standard error shows.": (
        "Le plan dont viennent les unités : les formules supposent que les unités ont été placées au hasard dans "
        "chaque strate avec des chances égales (disposition aléatoire simple, en grille systématique ou "
        "spatialement équilibrée), que les unités non inventoriées manquent par hasard, et que les unités de "
        "réserve ont remplacé les principales dans l'ordre de tirage. Des unités choisies par commodité (près des "
        "routes ou des camps) ou sautées à cause de ce qu'on s'attendait à y trouver biaisent l'estimation d'une "
        "façon qu'aucune erreur type ne montre.",
        "El diseño del que proceden las unidades: las fórmulas suponen que las unidades se colocaron al azar dentro "
        "de cada estrato con probabilidades iguales (disposición aleatoria simple, en cuadrícula sistemática o "
        "espacialmente equilibrada), que las unidades no muestreadas faltan por azar y que las unidades de reserva "
        "sustituyeron a las principales en orden de sorteo. Las unidades elegidas por comodidad (cerca de caminos o "
        "campamentos) u omitidas por lo que se esperaba encontrar en ellas sesgan la estimación de formas que ningún "
        "error estándar muestra.",
    ),
})

# -- estimate: the bootstrap of collapsed strata (QA) ---------------------------------------------
TRANSLATIONS.update({
    "In the bootstrap, a collapsed stratum draws as many residuals as it has units from the pooled units of its "
    "group (each unit's count minus the group's density times the unit's area), adds them to its own estimate and "
    "rescales them, so that its resamples are centred on its own estimate and vary as much as the collapsed-strata "
    "variance says.": (
        "Dans le bootstrap, une strate regroupée tire autant de résidus qu'elle a d'unités parmi les unités mises "
        "en commun de son groupe (le comptage de chaque unité moins la densité du groupe multipliée par la surface "
        "de l'unité), les ajoute à sa propre estimation et les remet à l'échelle, de sorte que ses "
        "rééchantillonnages sont centrés sur sa propre estimation et varient autant que l'indique la variance des "
        "strates regroupées.",
        "En el bootstrap, un estrato agrupado toma tantos residuos como unidades tiene entre las unidades combinadas "
        "de su grupo (el conteo de cada unidad menos la densidad del grupo por el área de la unidad), los suma a su "
        "propia estimación y los reescala, de modo que sus remuestreos están centrados en su propia estimación y "
        "varían tanto como indica la varianza de estratos agrupados.",
    ),
})

# -- parameter labels of the example chains (processing/models/*.model3) ------------------------
TRANSLATIONS.update({
    "Units with counts": ("Unités avec comptages", "Unidades con conteos"),
    "Estimate by stratum": ("Estimation par strate", "Estimación por estrato"),
    "Estimate report": ("Rapport d'estimation", "Informe de la estimación"),
    "Random seed (0 draws one)": ("Graine aléatoire (0 en tire une)", "Semilla aleatoria (0 sortea una)"),
    "Strata with units allocated": ("Strates avec unités allouées", "Estratos con unidades asignadas"),
    "Layout report": ("Rapport de disposition", "Informe de la disposición"),
    "Waypoints (GPX)": ("Points de passage (GPX)", "Puntos de paso (GPX)"),
    "Covariate rasters": ("Rasters de covariables", "Rásteres de covariables"),
    "Excluded areas": ("Zones exclues", "Zonas excluidas"),
    "Steepest slope surveyed (degrees)": ("Pente maximale inventoriée (degrés)", "Pendiente máxima muestreada (grados)"),
    "Number of strata": ("Nombre de strates", "Número de estratos"),
    "Side of the square plots (m)": ("Côté des placettes carrées (m)", "Lado de las parcelas cuadradas (m)"),
    "Slope raster (degrees)": ("Raster de pente (degrés)", "Ráster de pendiente (grados)"),
})

# -- engine error and warning messages (context PlotwiseEngine): kept in their own file ---------
from translations_engine import ENGINE_TRANSLATIONS  # noqa: E402  (scripts/ is on sys.path here)

TRANSLATIONS.update(ENGINE_TRANSLATIONS)
