"""French and Spanish translations of the engine's error and warning messages.

``ENGINE_TRANSLATIONS[(context, source)]`` or ``ENGINE_TRANSLATIONS[source]`` = ``(french, spanish)``,
in the shape of ``scripts/translations_data.py`` (which merges this table into ``TRANSLATIONS``, so
``scripts/apply_translations.py`` writes both). The sources are the ``message("...")`` templates of
``processing/engine/``, ``processing/raster_io.py`` and ``processing/raster_masking.py`` (context
``PlotwiseEngine``: the algorithms translate them through ``translate_message``), plus the few host
strings that name fields inside those messages.

Placeholders (with their format specs and ``!r``) stay exactly as in the source. Parameter NAMES
in upper case, field names and GDAL terms (NoData) stay as they are. Terms: fr « strate », « base de
sondage », « unité d'échantillonnage », « entité », « écart-type », « comptage », « inventorié » ;
es « estrato », « marco de muestreo », « unidad de muestreo », « entidad », « desviación estándar »,
« conteo », « muestreado ». A noun phrase passed in as ``{name}`` (e.g. « champ « sd » de la couche
« strates » ») is put in parentheses or after a colon, so no article has to agree with it.
"""

E = "PlotwiseEngine"

ENGINE_TRANSLATIONS = {
    # -- stratify, allocate, comparedesigns (QA) --------------------------------------------------
    (E, "Stratum field '{field}' of layer '{layer}' is empty (NULL) for feature(s) {ids}. Give every stratum an "
        "id, or remove those features from the layer."): (
        "Le champ de strate « {field} » de la couche « {layer} » est vide (NULL) pour la ou les entités {ids}. "
        "Donnez un identifiant à chaque strate, ou retirez ces entités de la couche.",
        "El campo de estrato «{field}» de la capa «{layer}» está vacío (NULL) para las entidades {ids}. Dé un "
        "identificador a cada estrato, o quite esas entidades de la capa.",
    ),
    (E, "Features {ids} of layer '{layer}' carry the same stratum id {value} in field '{field}', so each would get "
        "its own allocation. Dissolve the strata by '{field}' first (the host's Dissolve tool; then recompute the "
        "area field, or leave AREA_FIELD empty to use the polygon areas), or give each feature its own id."): (
        "Les entités {ids} de la couche « {layer} » portent le même identifiant de strate {value} dans le champ "
        "« {field} » : chacune recevrait sa propre allocation. Regroupez d'abord les strates par « {field} » (outil "
        "Regrouper de l'hôte ; recalculez ensuite le champ de surface, ou laissez AREA_FIELD vide pour utiliser la "
        "surface des polygones), ou donnez à chaque entité son propre identifiant.",
        "Las entidades {ids} de la capa «{layer}» llevan el mismo identificador de estrato {value} en el campo "
        "«{field}», así que cada una recibiría su propia asignación. Disuelva primero los estratos por «{field}» "
        "(herramienta Disolver del anfitrión; después recalcule el campo de área, o deje AREA_FIELD vacío para usar "
        "el área de los polígonos), o dé a cada entidad su propio identificador.",
    ),
    (E, "Several stratum ids in field '{field}' of layer '{layer}' are carried by more than one feature: {value} "
        "(features {ids}) and {more} other id(s) ({others}), so each of those features would get its own "
        "allocation. Dissolve the strata by '{field}' first (the host's Dissolve tool; then recompute the area "
        "field, or leave AREA_FIELD empty to use the polygon areas), or give each feature its own id."): (
        "Plusieurs identifiants de strate du champ « {field} » de la couche « {layer} » sont portés par plus d'une "
        "entité : {value} (entités {ids}) et {more} autre(s) identifiant(s) ({others}) ; chacune de ces entités "
        "recevrait sa propre allocation. Regroupez d'abord les strates par « {field} » (outil Regrouper de l'hôte ; "
        "recalculez ensuite le champ de surface, ou laissez AREA_FIELD vide pour utiliser la surface des "
        "polygones), ou donnez à chaque entité son propre identifiant.",
        "Varios identificadores de estrato del campo «{field}» de la capa «{layer}» los llevan varias entidades: "
        "{value} (entidades {ids}) y {more} identificador(es) más ({others}), así que cada una de esas entidades "
        "recibiría su propia asignación. Disuelva primero los estratos por «{field}» (herramienta Disolver del "
        "anfitrión; después recalcule el campo de área, o deje AREA_FIELD vacío para usar el área de los "
        "polígonos), o dé a cada entidad su propio identificador.",
    ),
    (E, "In the range of units '{text}', '{part}' starts above where it stops (start {start}, stop {stop}), so it "
        "holds no number of units. Write start:stop:step with the start at or below the stop (e.g. "
        "{stop}:{start}:{step})."): (
        "Dans la plage d'unités « {text} », « {part} » commence au-dessus de sa fin (début {start}, fin {stop}) et "
        "ne contient donc aucun nombre d'unités. Écrivez début:fin:pas avec un début inférieur ou égal à la fin "
        "(p. ex. {stop}:{start}:{step}).",
        "En el rango de unidades «{text}», «{part}» empieza por encima de donde termina (inicio {start}, fin "
        "{stop}), así que no contiene ningún número de unidades. Escriba inicio:fin:paso con el inicio menor o "
        "igual que el fin (p. ej. {stop}:{start}:{step}).",
    ),
    (E, "{design} at {n_units} units: relative bias {bias:+.1%}, beyond the simulation's noise (±{noise:.1%} with "
        "{replicates} simulated surveys; tested at the {level:.0%} level across {tests} design(s)). A likely "
        "cause: units near the edge of their stratum count only the part inside it (or, kept inside, never reach "
        "the edge), so edge areas weigh less in the estimate; where their density differs from the interior, the "
        "estimate is biased. Smaller units, or fewer and more compact strata, reduce it."): (
        "{design} avec {n_units} unités : biais relatif {bias:+.1%}, au-delà du bruit de la simulation "
        "(±{noise:.1%} avec {replicates} inventaires simulés ; test au seuil de {level:.0%} sur l'ensemble des "
        "{tests} plan(s)). Cause probable : les unités proches du bord de leur strate ne comptent que la partie "
        "intérieure (ou, gardées à l'intérieur, n'atteignent jamais le bord), si bien que les zones de bord pèsent "
        "moins dans l'estimation ; là où leur densité diffère de l'intérieur, l'estimation est biaisée. Des unités "
        "plus petites, ou des strates moins nombreuses et plus compactes, le réduisent.",
        "{design} con {n_units} unidades: sesgo relativo {bias:+.1%}, por encima del ruido de la simulación "
        "(±{noise:.1%} con {replicates} muestreos simulados; prueba al nivel del {level:.0%} sobre el conjunto de "
        "{tests} diseño(s)). Causa probable: las unidades cercanas al borde de su estrato cuentan solo la parte "
        "interior (o, mantenidas dentro, nunca llegan al borde), así que las zonas de borde pesan menos en la "
        "estimación; donde su densidad difiere del interior, la estimación está sesgada. Unidades más pequeñas, o "
        "estratos menos numerosos y más compactos, lo reducen.",
    ),
    (E, "{design} at {n_units} units: relative bias {bias:+.1%}, beyond the simulation's noise (±{noise:.1%} with "
        "{replicates} simulated surveys; tested at the {level:.0%} level across {tests} design(s)). A likely "
        "cause: units near the edge of the frame count only the part inside it (or, kept inside, never reach the "
        "edge), so edge areas weigh less in the estimate; where their density differs from the interior, the "
        "estimate is biased. Smaller units reduce it."): (
        "{design} avec {n_units} unités : biais relatif {bias:+.1%}, au-delà du bruit de la simulation "
        "(±{noise:.1%} avec {replicates} inventaires simulés ; test au seuil de {level:.0%} sur l'ensemble des "
        "{tests} plan(s)). Cause probable : les unités proches du bord de la base de sondage ne comptent que la "
        "partie intérieure (ou, gardées à l'intérieur, n'atteignent jamais le bord), si bien que les zones de bord "
        "pèsent moins dans l'estimation ; là où leur densité diffère de l'intérieur, l'estimation est biaisée. Des "
        "unités plus petites le réduisent.",
        "{design} con {n_units} unidades: sesgo relativo {bias:+.1%}, por encima del ruido de la simulación "
        "(±{noise:.1%} con {replicates} muestreos simulados; prueba al nivel del {level:.0%} sobre el conjunto de "
        "{tests} diseño(s)). Causa probable: las unidades cercanas al borde del marco de muestreo cuentan solo la "
        "parte interior (o, mantenidas dentro, nunca llegan al borde), así que las zonas de borde pesan menos en la "
        "estimación; donde su densidad difiere del interior, la estimación está sesgada. Unidades más pequeñas lo "
        "reducen.",
    ),
    (E, "With MIN_AREA {min_area:g} ha, merging the patches below it left a single stratum, so there is nothing "
        "to stratify. Lower MIN_AREA."): (
        "Avec MIN_AREA = {min_area:g} ha, la fusion des taches plus petites n'a laissé qu'une seule strate : il "
        "n'y a plus rien à stratifier. Réduisez MIN_AREA.",
        "Con MIN_AREA = {min_area:g} ha, la fusión de las manchas más pequeñas dejó un solo estrato: no queda nada "
        "que estratificar. Reduzca MIN_AREA.",
    ),
    (E, "Merging the patches below MIN_AREA moved cells between strata: the share of the variance of '{name}' "
        "that the strata explain fell from {before:.2f} to {after:.2f}. A smaller MIN_AREA keeps the strata closer "
        "to the covariates."): (
        "La fusion des taches sous MIN_AREA a fait passer des cellules d'une strate à l'autre : la part de la "
        "variance de « {name} » expliquée par les strates est tombée de {before:.2f} à {after:.2f}. Un MIN_AREA "
        "plus petit garde les strates plus proches des covariables.",
        "La fusión de las manchas por debajo de MIN_AREA pasó celdas de un estrato a otro: la parte de la varianza "
        "de «{name}» que explican los estratos bajó de {before:.2f} a {after:.2f}. Un MIN_AREA menor mantiene los "
        "estratos más cerca de las covariables.",
    ),
    (E, "{n} patch(es) covering {ha:,.2f} ha stay below MIN_AREA ({min_area:g} ha): they touch no other stratum "
        "(islands of the frame, or patches ringed by NoData). Remove such islands from the frame, fill the NoData "
        "in the covariates, or lower MIN_AREA."): (
        "{n} tache(s) couvrant {ha:,.2f} ha restent sous MIN_AREA ({min_area:g} ha) : elles ne touchent aucune "
        "autre strate (îlots de la base de sondage, ou taches entourées de NoData). Retirez ces îlots de la base "
        "de sondage, comblez les NoData des covariables, ou réduisez MIN_AREA.",
        "{n} mancha(s) que cubren {ha:,.2f} ha quedan por debajo de MIN_AREA ({min_area:g} ha): no tocan ningún "
        "otro estrato (islas del marco de muestreo, o manchas rodeadas de NoData). Quite esas islas del marco de "
        "muestreo, rellene los NoData de las covariables, o reduzca MIN_AREA.",
    ),

    # -- host strings that fill engine messages (allocate, simulatecounts) -------------------------
    "field '{name}' of layer '{layer}'": (
        "champ « {name} » de la couche « {layer} »",
        "campo «{name}» de la capa «{layer}»",
    ),
    "pilot SD": ("écart-type pilote", "desviación estándar piloto"),
    "pilot mean": ("moyenne pilote", "media piloto"),
    "has no geometry": ("n'a pas de géométrie", "no tiene geometría"),

    # -- lists of ids --------------------------------------------------------------------------
    (E, "{shown} and {more} more"): ("{shown} et {more} autres", "{shown} y {more} más"),
    (E, "{shown} … ({n} in all)"): ("{shown} … ({n} en tout)", "{shown} … ({n} en total)"),

    # -- allocation ----------------------------------------------------------------------------
    (E, "stratum area"): ("surface de la strate", "área del estrato"),
    (E, "pilot standard deviation"): ("écart-type pilote", "desviación estándar piloto"),
    (E, "pilot mean count"): ("comptage moyen pilote", "conteo medio piloto"),
    (E, "cost per unit"): ("coût par unité", "coste por unidad"),
    (E, "The {name} is NULL or negative for stratum feature(s) {shown}. Fill in a non-negative value for every "
        "stratum, or remove those strata from the layer."): (
        "Valeur NULL ou négative ({name}) pour la ou les entités de strate {shown}. Saisissez une valeur positive "
        "ou nulle pour chaque strate, ou retirez ces strates de la couche.",
        "Valor NULL o negativo ({name}) para las entidades de estrato {shown}. Introduzca un valor no negativo "
        "para cada estrato, o quite esos estratos de la capa.",
    ),
    (E, "The {name} is NULL, negative or zero for stratum feature(s) {shown}. Fill in a positive value for every "
        "stratum, or remove those strata from the layer."): (
        "Valeur NULL, négative ou nulle ({name}) pour la ou les entités de strate {shown}. Saisissez une valeur "
        "strictement positive pour chaque strate, ou retirez ces strates de la couche.",
        "Valor NULL, negativo o cero ({name}) para las entidades de estrato {shown}. Introduzca un valor positivo "
        "para cada estrato, o quite esos estratos de la capa.",
    ),
    (E, "Unknown allocation method {method!r}; use one of: {methods}."): (
        "Méthode d'allocation inconnue {method!r} ; utilisez l'une de : {methods}.",
        "Método de asignación desconocido {method!r}; use uno de: {methods}.",
    ),
    (E, "The strata layer has no features. Run the stratification first."): (
        "La couche des strates n'a aucune entité. Lancez d'abord la stratification.",
        "La capa de estratos no tiene entidades. Ejecute primero la estratificación.",
    ),
    (E, "The unit area must be a positive number."): (
        "La surface d'une unité doit être un nombre positif.",
        "El área de la unidad debe ser un número positivo.",
    ),
    (E, "The minimum per stratum must be at least 1 (2 lets each stratum variance be estimated)."): (
        "Le minimum par strate doit être d'au moins 1 (2 permet d'estimer la variance de chaque strate).",
        "El mínimo por estrato debe ser al menos 1 (2 permite estimar la varianza de cada estrato).",
    ),
    (E, "The cost method needs a cost per unit for every stratum: choose the cost field."): (
        "La méthode par coût a besoin d'un coût par unité pour chaque strate : choisissez le champ de coût.",
        "El método por coste necesita un coste por unidad para cada estrato: elija el campo de coste.",
    ),
    (E, "The budget needs a cost per unit for every stratum: choose the cost field."): (
        "Le budget a besoin d'un coût par unité pour chaque strate : choisissez le champ de coût.",
        "El presupuesto necesita un coste por unidad para cada estrato: elija el campo de coste.",
    ),
    (E, "The fixed cost must be zero or positive."): (
        "Le coût fixe doit être nul ou positif.",
        "El coste fijo debe ser cero o positivo.",
    ),
    (E, "No pilot standard deviations: the allocation assumes equal SDs in all strata (proportional to area)."): (
        "Pas d'écarts-types pilotes : l'allocation suppose des écarts-types égaux dans toutes les strates "
        "(proportionnelle à la surface).",
        "Sin desviaciones estándar piloto: la asignación supone desviaciones iguales en todos los estratos "
        "(proporcional al área).",
    ),
    (E, "No pilot standard deviations: the allocation assumes equal SDs in all strata "
        "(area / square root of cost)."): (
        "Pas d'écarts-types pilotes : l'allocation suppose des écarts-types égaux dans toutes les strates "
        "(surface / racine carrée du coût).",
        "Sin desviaciones estándar piloto: la asignación supone desviaciones iguales en todos los estratos "
        "(área / raíz cuadrada del coste).",
    ),
    (E, "All pilot standard deviations are zero: proportional allocation is used instead."): (
        "Tous les écarts-types pilotes sont nuls : l'allocation proportionnelle est utilisée à la place.",
        "Todas las desviaciones estándar piloto son cero: se usa en su lugar la asignación proporcional.",
    ),
    (E, "The {name} is zero for stratum feature(s) {shown}: they get only the minimum of {minimum} unit(s). "
        "A pilot with no variation is rarely the truth; check it."): (
        "Valeur nulle ({name}) pour la ou les entités de strate {shown} : elles ne reçoivent que le minimum de "
        "{minimum} unité(s). Un pilote sans variation reflète rarement la réalité ; vérifiez-le.",
        "Valor cero ({name}) para las entidades de estrato {shown}: reciben solo el mínimo de {minimum} "
        "unidad(es). Un piloto sin variación rara vez refleja la realidad; compruébelo.",
    ),
    (E, "Stratum feature(s) {shown} are smaller than one sample unit of {unit_area:g}. Merge them with a neighbour "
        "or use a smaller unit area."): (
        "La ou les entités de strate {shown} sont plus petites qu'une unité d'échantillonnage de {unit_area:g}. "
        "Fusionnez-les avec une voisine ou utilisez une surface d'unité plus petite.",
        "Las entidades de estrato {shown} son más pequeñas que una unidad de muestreo de {unit_area:g}. "
        "Fusiónelas con una vecina o use un área de unidad menor.",
    ),
    (E, "Stratum feature(s) {shown} hold fewer than {minimum} units: they get all the units that fit."): (
        "La ou les entités de strate {shown} contiennent moins de {minimum} unités : elles reçoivent toutes les "
        "unités qui y tiennent.",
        "Las entidades de estrato {shown} contienen menos de {minimum} unidades: reciben todas las unidades que "
        "caben.",
    ),
    (E, "A target CV is set: the budget is not used."): (
        "Un CV cible est fixé : le budget n'est pas utilisé.",
        "Hay un CV objetivo: no se usa el presupuesto.",
    ),
    (E, "The budget {budget:g} is below the minimum of {minimum:g} (fixed cost {fixed_cost:g} plus {per_stratum} "
        "unit(s) in every stratum at its cost). Raise the budget or lower the minimum per stratum."): (
        "Le budget {budget:g} est inférieur au minimum de {minimum:g} (coût fixe {fixed_cost:g} plus {per_stratum} "
        "unité(s) dans chaque strate à son coût). Augmentez le budget ou baissez le minimum par strate.",
        "El presupuesto {budget:g} es inferior al mínimo de {minimum:g} (coste fijo {fixed_cost:g} más "
        "{per_stratum} unidad(es) en cada estrato a su coste). Aumente el presupuesto o baje el mínimo por "
        "estrato.",
    ),
    (E, "The budget exceeds the cost of every unit that fits ({maximum:g}): all units are taken."): (
        "Le budget dépasse le coût de toutes les unités qui tiennent ({maximum:g}) : toutes les unités sont prises.",
        "El presupuesto supera el coste de todas las unidades que caben ({maximum:g}): se toman todas.",
    ),
    (E, "Give a total number of units, a budget (with costs) or a target CV."): (
        "Indiquez un nombre total d'unités, un budget (avec des coûts) ou un CV cible.",
        "Indique un número total de unidades, un presupuesto (con costes) o un CV objetivo.",
    ),
    (E, "The total of {total} units is below the minimum of {minimum} ({per_stratum} per stratum over {n_strata} "
        "strata). Raise the total or lower the minimum."): (
        "Le total de {total} unités est inférieur au minimum de {minimum} ({per_stratum} par strate sur "
        "{n_strata} strates). Augmentez le total ou baissez le minimum.",
        "El total de {total} unidades es inferior al mínimo de {minimum} ({per_stratum} por estrato en "
        "{n_strata} estratos). Aumente el total o baje el mínimo.",
    ),
    (E, "The total of {total} units exceeds the {fit} units of {unit_area:g} that fit in the strata. Lower the "
        "total or use smaller units."): (
        "Le total de {total} unités dépasse les {fit} unités de {unit_area:g} qui tiennent dans les strates. "
        "Baissez le total ou utilisez des unités plus petites.",
        "El total de {total} unidades supera las {fit} unidades de {unit_area:g} que caben en los estratos. "
        "Baje el total o use unidades más pequeñas.",
    ),
    (E, "Stratum feature(s) {shown} get one unit only: their variance cannot be estimated."): (
        "La ou les entités de strate {shown} ne reçoivent qu'une unité : leur variance ne peut pas être estimée.",
        "Las entidades de estrato {shown} reciben una sola unidad: su varianza no puede estimarse.",
    ),
    (E, "Stratum feature(s) {shown} are sampled completely (every unit that fits)."): (
        "La ou les entités de strate {shown} sont échantillonnées entièrement (toutes les unités qui y tiennent).",
        "Las entidades de estrato {shown} se muestrean por completo (todas las unidades que caben).",
    ),
    (E, "The {name} is zero in stratum feature(s) {shown}: their CV is undefined."): (
        "Valeur nulle ({name}) dans la ou les entités de strate {shown} : leur CV n'est pas défini.",
        "Valor cero ({name}) en las entidades de estrato {shown}: su CV no está definido.",
    ),
    (E, "A target CV needs both the pilot standard deviation and the pilot mean count per unit: choose the SD "
        "field and the mean field."): (
        "Un CV cible a besoin de l'écart-type pilote et du comptage moyen pilote par unité : choisissez le champ "
        "d'écart-type et le champ de moyenne.",
        "Un CV objetivo necesita la desviación estándar piloto y el conteo medio piloto por unidad: elija el "
        "campo de DE y el campo de media.",
    ),
    (E, "The {name} is zero in every stratum: no CV can be computed."): (
        "Valeur nulle ({name}) dans toutes les strates : aucun CV ne peut être calculé.",
        "Valor cero ({name}) en todos los estratos: no puede calcularse ningún CV.",
    ),
    (E, "The target CV of {target_cv:.3g} cannot be reached: even all {fit} units that fit give an expected CV of "
        "{cv:.3g}. Accept a CV of at least {cv:.3g}, or use smaller units."): (
        "Le CV cible de {target_cv:.3g} ne peut pas être atteint : même les {fit} unités qui tiennent donnent un "
        "CV attendu de {cv:.3g}. Acceptez un CV d'au moins {cv:.3g}, ou utilisez des unités plus petites.",
        "El CV objetivo de {target_cv:.3g} no puede alcanzarse: incluso las {fit} unidades que caben dan un CV "
        "esperado de {cv:.3g}. Acepte un CV de al menos {cv:.3g}, o use unidades más pequeñas.",
    ),

    # -- simulated counts, demo reserve ----------------------------------------------------------
    (E, "needs a positive area_m2"): ("a besoin d'un area_m2 positif", "necesita un area_m2 positivo"),
    (E, "has a line of zero length"): ("a une ligne de longueur nulle", "tiene una línea de longitud cero"),
    (E, "has an unsupported geometry type ({kind})"): (
        "a un type de géométrie non pris en charge ({kind})",
        "tiene un tipo de geometría no admitido ({kind})",
    ),
    (E, "The detection probability must be in (0, 1] (got {detection:g})."): (
        "La probabilité de détection doit être dans ]0, 1] (reçu {detection:g}).",
        "La probabilidad de detección debe estar en (0, 1] (se recibió {detection:g}).",
    ),
    (E, "Could not place the demo lake; try another seed."): (
        "Impossible de placer le lac de démonstration ; essayez une autre graine.",
        "No se pudo colocar el lago de demostración; pruebe otra semilla.",
    ),
    (E, "The cell size must be between 10 and 500 m (got {cell_size:g} m)."): (
        "La taille de cellule doit être comprise entre 10 et 500 m (reçu {cell_size:g} m).",
        "El tamaño de celda debe estar entre 10 y 500 m (se recibió {cell_size:g} m).",
    ),

    # -- design comparison ---------------------------------------------------------------------
    (E, "The density surface must be a single raster band."): (
        "La surface de densité doit être une seule bande raster.",
        "La superficie de densidad debe ser una sola banda ráster.",
    ),
    (E, "The density surface must be a north-up raster (no rotation); warp it first."): (
        "La surface de densité doit être un raster orienté nord en haut (sans rotation) ; reprojetez-la d'abord.",
        "La superficie de densidad debe ser un ráster orientado al norte (sin rotación); reproyéctela primero.",
    ),
    (E, "The density surface does not overlap the frame. Check that both cover the same area (and their "
        "coordinate reference systems)."): (
        "La surface de densité ne recouvre pas la base de sondage. Vérifiez que les deux couvrent la même zone "
        "(et leurs systèmes de coordonnées de référence).",
        "La superficie de densidad no se superpone al marco de muestreo. Compruebe que ambos cubren la misma zona "
        "(y sus sistemas de referencia de coordenadas).",
    ),
    (E, "A stratum has no stratum value (NULL). Give every stratum a value."): (
        "Une strate n'a pas de valeur de strate (NULL). Donnez une valeur à chaque strate.",
        "Un estrato no tiene valor de estrato (NULL). Dé un valor a cada estrato.",
    ),
    (E, "{overlap} surface cell(s) lie in more than one stratum; each was given to the first of them. Strata "
        "should not overlap."): (
        "{overlap} cellule(s) de la surface se trouvent dans plus d'une strate ; chacune a été attribuée à la "
        "première. Les strates ne devraient pas se chevaucher.",
        "{overlap} celda(s) de la superficie están en más de un estrato; cada una se asignó al primero. Los "
        "estratos no deberían superponerse.",
    ),
    (E, "No cell centre of the density surface lies in the frame: the surface cells are too coarse for the frame, "
        "or the two do not overlap."): (
        "Aucun centre de cellule de la surface de densité ne se trouve dans la base de sondage : les cellules sont "
        "trop grossières pour elle, ou les deux ne se recouvrent pas.",
        "Ningún centro de celda de la superficie de densidad cae en el marco de muestreo: las celdas son demasiado "
        "gruesas para él, o ambos no se superponen.",
    ),
    (E, "The density surface has {n} negative cell(s) in the frame. Expected animals per km² must be 0 or more: "
        "correct the surface (for instance clip it at 0)."): (
        "La surface de densité a {n} cellule(s) négative(s) dans la base de sondage. Le nombre attendu d'animaux "
        "par km² doit être de 0 ou plus : corrigez la surface (par exemple en la bornant à 0).",
        "La superficie de densidad tiene {n} celda(s) negativa(s) en el marco de muestreo. Los animales esperados "
        "por km² deben ser 0 o más: corrija la superficie (por ejemplo, recórtela en 0).",
    ),
    (E, "{n} cell(s) of the frame ({share:.1%}) have no value on the density surface and are left out of the "
        "population: the comparison speaks for the rest of the frame."): (
        "{n} cellule(s) de la base de sondage ({share:.1%}) n'ont pas de valeur sur la surface de densité et sont "
        "exclues de la population : la comparaison vaut pour le reste de la base de sondage.",
        "{n} celda(s) del marco de muestreo ({share:.1%}) no tienen valor en la superficie de densidad y quedan "
        "fuera de la población: la comparación vale para el resto del marco.",
    ),
    (E, "The density surface has no value in the frame."): (
        "La surface de densité n'a aucune valeur dans la base de sondage.",
        "La superficie de densidad no tiene ningún valor en el marco de muestreo.",
    ),
    (E, "Strata {ids} hold no cell centre of the density surface inside the frame. Remove them, merge them with "
        "a neighbour, or use a finer surface."): (
        "Les strates {ids} ne contiennent aucun centre de cellule de la surface de densité dans la base de "
        "sondage. Retirez-les, fusionnez-les avec une voisine, ou utilisez une surface plus fine.",
        "Los estratos {ids} no contienen ningún centro de celda de la superficie de densidad dentro del marco de "
        "muestreo. Quítelos, fusiónelos con un vecino, o use una superficie más fina.",
    ),
    (E, "SHAPE must be 0 (point), 1 (square), 2 (circle) or 3 (line transect)."): (
        "SHAPE doit valoir 0 (point), 1 (carré), 2 (cercle) ou 3 (transect linéaire).",
        "SHAPE debe ser 0 (punto), 1 (cuadrado), 2 (círculo) o 3 (transecto lineal).",
    ),
    (E, "SIZE must be more than 0 m: it is the counting radius of a point station."): (
        "SIZE doit dépasser 0 m : c'est le rayon de comptage d'une station ponctuelle.",
        "SIZE debe ser mayor que 0 m: es el radio de conteo de una estación puntual.",
    ),
    (E, "SIZE must be more than 0 m: it is the square unit's size."): (
        "SIZE doit dépasser 0 m : c'est la taille de l'unité carrée.",
        "SIZE debe ser mayor que 0 m: es el tamaño de la unidad cuadrada.",
    ),
    (E, "SIZE must be more than 0 m: it is the circle unit's size."): (
        "SIZE doit dépasser 0 m : c'est la taille de l'unité circulaire.",
        "SIZE debe ser mayor que 0 m: es el tamaño de la unidad circular.",
    ),
    (E, "SIZE must be more than 0 m: it is the line unit's size."): (
        "SIZE doit dépasser 0 m : c'est la taille de l'unité linéaire.",
        "SIZE debe ser mayor que 0 m: es el tamaño de la unidad lineal.",
    ),
    (E, "A line transect needs the half-width of its counting strip (more than 0 m): animals are counted up to "
        "that distance on either side of the line."): (
        "Un transect linéaire a besoin de la demi-largeur de sa bande de comptage (plus de 0 m) : les animaux sont "
        "comptés jusqu'à cette distance de part et d'autre de la ligne.",
        "Un transecto lineal necesita la semianchura de su franja de conteo (más de 0 m): los animales se cuentan "
        "hasta esa distancia a cada lado de la línea.",
    ),
    (E, "The overdispersion k must be 0 (Poisson counts) or more."): (
        "La surdispersion k doit valoir 0 (comptages de Poisson) ou plus.",
        "La sobredispersión k debe ser 0 (conteos de Poisson) o más.",
    ),
    (E, "The strata cover {share:.1%} of the frame: every design is compared on the part the strata cover."): (
        "Les strates couvrent {share:.1%} de la base de sondage : chaque plan est comparé sur la partie qu'elles "
        "couvrent.",
        "Los estratos cubren el {share:.1%} del marco de muestreo: cada diseño se compara en la parte que cubren.",
    ),
    (E, "A stratum of the layout has no cells on the surface grid."): (
        "Une strate de la disposition n'a aucune cellule sur la grille de la surface.",
        "Un estrato de la disposición no tiene celdas en la cuadrícula de la superficie.",
    ),
    (E, "Unknown design {design}; use 0 to {last}."): (
        "Plan inconnu {design} ; utilisez 0 à {last}.",
        "Diseño desconocido {design}; use de 0 a {last}.",
    ),
    (E, "N_UNITS must be at least {minimum}."): (
        "N_UNITS doit valoir au moins {minimum}.",
        "N_UNITS debe ser al menos {minimum}.",
    ),
    (E, "The {design} design needs strata: give the STRATA layer."): (
        "Le plan « {design} » a besoin de strates : indiquez la couche STRATA.",
        "El diseño «{design}» necesita estratos: indique la capa STRATA.",
    ),
    (E, "REPLICATES must be at least 2."): (
        "REPLICATES doit valoir au moins 2.",
        "REPLICATES debe ser al menos 2.",
    ),
    (E, "Each simulated survey would count about {millions:.0f} million surface cells ({units} units of "
        "{unit_area:,.0f} m² on {cell_width:g} m cells), too many to simulate. Resample the surface to coarser "
        "cells, or compare fewer designs or units."): (
        "Chaque inventaire simulé compterait environ {millions:.0f} millions de cellules de la surface ({units} "
        "unités de {unit_area:,.0f} m² sur des cellules de {cell_width:g} m), trop pour être simulé. Rééchantillonnez "
        "la surface en cellules plus grossières, ou comparez moins de plans ou d'unités.",
        "Cada muestreo simulado contaría unos {millions:.0f} millones de celdas de la superficie ({units} unidades "
        "de {unit_area:,.0f} m² en celdas de {cell_width:g} m), demasiadas para simular. Remuestree la superficie a "
        "celdas más gruesas, o compare menos diseños o unidades.",
    ),
    (E, "{design}: {warning}"): ("{design} : {warning}", "{design}: {warning}"),
    (E, "{design} at {n_units} units: {failed} of {replicates} simulated surveys gave no estimate (a stratum "
        "without a counted unit, or no unit in the frame); they are left out of its figures."): (
        "{design} avec {n_units} unités : {failed} des {replicates} inventaires simulés n'ont donné aucune "
        "estimation (une strate sans unité comptée, ou aucune unité dans la base de sondage) ; ils sont exclus de "
        "ses chiffres.",
        "{design} con {n_units} unidades: {failed} de los {replicates} muestreos simulados no dieron estimación "
        "(un estrato sin unidad contada, o ninguna unidad en el marco de muestreo); se excluyen de sus cifras.",
    ),
    (E, "The range of units '{text}' cannot be read. Give whole numbers separated by commas (e.g. 20, 40, 80) or "
        "start:stop:step (e.g. 20:100:20)."): (
        "La plage d'unités « {text} » ne peut pas être lue. Donnez des nombres entiers séparés par des virgules "
        "(p. ex. 20, 40, 80) ou début:fin:pas (p. ex. 20:100:20).",
        "El rango de unidades «{text}» no puede leerse. Indique números enteros separados por comas "
        "(p. ej. 20, 40, 80) o inicio:fin:paso (p. ej. 20:100:20).",
    ),
    (E, "Every number of units in the range must be at least {minimum}."): (
        "Chaque nombre d'unités de la plage doit valoir au moins {minimum}.",
        "Cada número de unidades del rango debe ser al menos {minimum}.",
    ),
    (E, "The range of units holds more than 20 values; give at most 20."): (
        "La plage d'unités contient plus de 20 valeurs ; donnez-en au plus 20.",
        "El rango de unidades tiene más de 20 valores; indique como máximo 20.",
    ),

    # -- estimation ----------------------------------------------------------------------------
    (E, "The {count_name} field holds values that are not numbers for units {ids}. Enter a whole count (0 when "
        "surveyed and none seen) or leave the field empty (NULL) for units that were not surveyed."): (
        "Le champ {count_name} contient des valeurs qui ne sont pas des nombres pour les unités {ids}. Saisissez un "
        "comptage entier (0 si l'unité a été inventoriée sans rien voir) ou laissez le champ vide (NULL) pour les "
        "unités non inventoriées.",
        "El campo {count_name} contiene valores que no son números para las unidades {ids}. Introduzca un conteo "
        "entero (0 si se muestreó y no se vio ninguno) o deje el campo vacío (NULL) para las unidades no "
        "muestreadas.",
    ),
    (E, "The {count_name} field holds negative or infinite counts for units {ids}. Counts must be 0 or more; "
        "correct them, or leave the field empty (NULL) if the unit was not surveyed."): (
        "Le champ {count_name} contient des comptages négatifs ou infinis pour les unités {ids}. Les comptages "
        "doivent valoir 0 ou plus ; corrigez-les, ou laissez le champ vide (NULL) si l'unité n'a pas été "
        "inventoriée.",
        "El campo {count_name} contiene conteos negativos o infinitos para las unidades {ids}. Los conteos deben "
        "ser 0 o más; corríjalos, o deje el campo vacío (NULL) si la unidad no se muestreó.",
    ),
    (E, "The confidence level must lie between 0 and 1 (got {confidence}); use e.g. 0.95."): (
        "Le niveau de confiance doit être compris entre 0 et 1 (reçu {confidence}) ; utilisez p. ex. 0.95.",
        "El nivel de confianza debe estar entre 0 y 1 (se recibió {confidence}); use p. ej. 0.95.",
    ),
    (E, "Unknown interval method {method!r}; use one of {methods}."): (
        "Méthode d'intervalle inconnue {method!r} ; utilisez l'une de {methods}.",
        "Método de intervalo desconocido {method!r}; use uno de {methods}.",
    ),
    (E, "Unknown variance method {method!r}; use one of {methods}."): (
        "Méthode de variance inconnue {method!r} ; utilisez l'une de {methods}.",
        "Método de varianza desconocido {method!r}; use uno de {methods}.",
    ),
    (E, "The detection probability must lie in (0, 1] (got {p})."): (
        "La probabilité de détection doit être dans ]0, 1] (reçu {p}).",
        "La probabilidad de detección debe estar en (0, 1] (se recibió {p}).",
    ),
    (E, "The standard error of the detection probability must be 0 or more."): (
        "L'erreur type de la probabilité de détection doit valoir 0 ou plus.",
        "El error estándar de la probabilidad de detección debe ser 0 o más.",
    ),
    (E, "unit_ids must have one id per unit."): (
        "unit_ids doit avoir un identifiant par unité.",
        "unit_ids debe tener un identificador por unidad.",
    ),
    (E, "counts, unit_areas and strata must have one value per unit."): (
        "counts, unit_areas et strata doivent avoir une valeur par unité.",
        "counts, unit_areas y strata deben tener un valor por unidad.",
    ),
    (E, "Strata {ids} have no area. Check the strata layer's geometries."): (
        "Les strates {ids} n'ont pas de surface. Vérifiez les géométries de la couche des strates.",
        "Los estratos {ids} no tienen área. Compruebe las geometrías de la capa de estratos.",
    ),
    (E, "Units {ids} have no stratum (the stratum field is empty). Fill in their stratum, or leave the stratum "
        "field out to treat the frame as one stratum."): (
        "Les unités {ids} n'ont pas de strate (le champ de strate est vide). Renseignez leur strate, ou omettez le "
        "champ de strate pour traiter la base de sondage comme une seule strate.",
        "Las unidades {ids} no tienen estrato (el campo de estrato está vacío). Rellene su estrato, u omita el "
        "campo de estrato para tratar el marco de muestreo como un solo estrato.",
    ),
    (E, "Units {ids} have stratum ids ({names}) that are not in the strata layer. Check the stratum field of the "
        "units and the id field of the strata layer."): (
        "Les unités {ids} ont des identifiants de strate ({names}) absents de la couche des strates. Vérifiez le "
        "champ de strate des unités et le champ d'identifiant de la couche des strates.",
        "Las unidades {ids} tienen identificadores de estrato ({names}) que no están en la capa de estratos. "
        "Compruebe el campo de estrato de las unidades y el campo identificador de la capa de estratos.",
    ),
    (E, "{n} unit(s) have no count and are treated as not surveyed (non-response): {ids}."): (
        "{n} unité(s) n'ont pas de comptage et sont traitées comme non inventoriées (non-réponse) : {ids}.",
        "{n} unidad(es) no tienen conteo y se tratan como no muestreadas (no respuesta): {ids}.",
    ),
    (E, "No unit has a count, so nothing can be estimated. Enter the counts of the surveyed units (0 when none "
        "was seen) in the count field."): (
        "Aucune unité n'a de comptage : rien ne peut être estimé. Saisissez les comptages des unités inventoriées "
        "(0 si rien n'a été vu) dans le champ de comptage.",
        "Ninguna unidad tiene conteo, así que no puede estimarse nada. Introduzca los conteos de las unidades "
        "muestreadas (0 si no se vio ninguno) en el campo de conteo.",
    ),
    (E, "Units {ids} have no positive surveyed area. Give a unit area field with values above 0, or a fixed unit "
        "area for points and lines."): (
        "Les unités {ids} n'ont pas de surface inventoriée positive. Donnez un champ de surface d'unité avec des "
        "valeurs supérieures à 0, ou une surface d'unité fixe pour les points et les lignes.",
        "Las unidades {ids} no tienen un área muestreada positiva. Indique un campo de área de unidad con valores "
        "mayores que 0, o un área de unidad fija para puntos y líneas.",
    ),
    (E, "Presence data must be 0 or 1; units {ids} hold other values. Use the counts without the presence option, "
        "or recode the field."): (
        "Les données de présence doivent valoir 0 ou 1 ; les unités {ids} contiennent d'autres valeurs. Utilisez "
        "les comptages sans l'option de présence, ou recodez le champ.",
        "Los datos de presencia deben ser 0 o 1; las unidades {ids} contienen otros valores. Use los conteos sin "
        "la opción de presencia, o recodifique el campo.",
    ),
    (E, "The detection probability was not applied to presence data: dividing a proportion of occupied units by p "
        "is not an occupancy correction, which needs repeat visits."): (
        "La probabilité de détection n'a pas été appliquée aux données de présence : diviser une proportion "
        "d'unités occupées par p n'est pas une correction d'occupation, qui demande des visites répétées.",
        "La probabilidad de detección no se aplicó a los datos de presencia: dividir una proporción de unidades "
        "ocupadas por p no es una corrección de ocupación, que requiere visitas repetidas.",
    ),
    (E, "No unit of strata {ids} was surveyed, so their abundance cannot be estimated. Survey units there, or "
        "choose to leave these strata out (the estimate then covers a smaller frame)."): (
        "Aucune unité des strates {ids} n'a été inventoriée : leur abondance ne peut pas être estimée. Inventoriez-y "
        "des unités, ou choisissez d'exclure ces strates (l'estimation couvre alors une base de sondage plus "
        "petite).",
        "Ninguna unidad de los estratos {ids} se muestreó, así que su abundancia no puede estimarse. Muestree "
        "unidades allí, o elija dejar fuera esos estratos (la estimación cubre entonces un marco de muestreo "
        "menor).",
    ),
    (E, "Strata {ids} had no surveyed unit and were left out: the frame shrank by {dropped_area:.6g} area units, "
        "and the estimate covers the remaining strata only."): (
        "Les strates {ids} n'avaient aucune unité inventoriée et ont été exclues : la base de sondage a diminué de "
        "{dropped_area:.6g} unités de surface, et l'estimation ne couvre que les strates restantes.",
        "Los estratos {ids} no tenían ninguna unidad muestreada y se dejaron fuera: el marco de muestreo se redujo "
        "en {dropped_area:.6g} unidades de área, y la estimación cubre solo los estratos restantes.",
    ),
    (E, "The local neighbourhood variance needs the positions of the units."): (
        "La variance de voisinage local a besoin des positions des unités.",
        "La varianza de vecindad local necesita las posiciones de las unidades.",
    ),
    (E, "Units {ids} have no position, so the local neighbourhood variance cannot use them. Give their locations, "
        "or use the simple random sampling formula."): (
        "Les unités {ids} n'ont pas de position : la variance de voisinage local ne peut pas les utiliser. Donnez "
        "leurs emplacements, ou utilisez la formule de l'échantillonnage aléatoire simple.",
        "Las unidades {ids} no tienen posición, así que la varianza de vecindad local no puede usarlas. Indique "
        "sus ubicaciones, o use la fórmula del muestreo aleatorio simple.",
    ),
    (E, "In strata {ids} the surveyed area exceeds the stratum area. Check the unit areas and the area unit, or "
        "switch off the finite-population correction."): (
        "Dans les strates {ids}, la surface inventoriée dépasse la surface de la strate. Vérifiez les surfaces des "
        "unités et l'unité de surface, ou désactivez la correction de population finie.",
        "En los estratos {ids} el área muestreada supera el área del estrato. Compruebe las áreas de las unidades "
        "y la unidad de área, o desactive la corrección por población finita.",
    ),
    (E, "{label} (one unit) collapsed with {others}"): (
        "{label} (une unité) regroupée avec {others}",
        "{label} (una unidad) agrupado con {others}",
    ),
    (E, "Strata {groups}: their variance comes from the collapsed-strata estimator (Cochran 1977, §5A.12), which "
        "counts differences between the collapsed strata as variance and so tends to be too large."): (
        "Strates {groups} : leur variance vient de l'estimateur des strates regroupées (Cochran 1977, §5A.12), qui "
        "compte les différences entre strates regroupées comme de la variance et tend donc à être trop grande.",
        "Estratos {groups}: su varianza procede del estimador de estratos agrupados (Cochran 1977, §5A.12), que "
        "cuenta las diferencias entre los estratos agrupados como varianza y por eso tiende a ser demasiado grande.",
    ),
    (E, "The only stratum has one surveyed unit: no variance, standard error or interval can be estimated. Survey "
        "at least two units."): (
        "La seule strate n'a qu'une unité inventoriée : aucune variance, erreur type ou intervalle ne peut être "
        "estimé. Inventoriez au moins deux unités.",
        "El único estrato tiene una sola unidad muestreada: no puede estimarse ninguna varianza, error estándar ni "
        "intervalo. Muestree al menos dos unidades.",
    ),
    (E, "Strata {ids} have fewer than 3 units or were collapsed: their variance uses the simple random sampling "
        "formula."): (
        "Les strates {ids} ont moins de 3 unités ou ont été regroupées : leur variance utilise la formule de "
        "l'échantillonnage aléatoire simple.",
        "Los estratos {ids} tienen menos de 3 unidades o se agruparon: su varianza usa la fórmula del muestreo "
        "aleatorio simple.",
    ),
    (E, "The bootstrap needs a random generator (rng)."): (
        "Le bootstrap a besoin d'un générateur aléatoire (rng).",
        "El bootstrap necesita un generador aleatorio (rng).",
    ),
    (E, "No animal was counted in any surveyed unit: the estimate is 0 and its CV undefined."): (
        "Aucun animal n'a été compté dans les unités inventoriées : l'estimation vaut 0 et son CV n'est pas défini.",
        "No se contó ningún animal en las unidades muestreadas: la estimación es 0 y su CV no está definido.",
    ),
    (E, "In strata {ids} every surveyed unit counted 0: their standard error is 0, which understates the "
        "uncertainty (the species may be present but rare there)."): (
        "Dans les strates {ids}, toutes les unités inventoriées ont compté 0 : leur erreur type vaut 0, ce qui "
        "sous-estime l'incertitude (l'espèce peut y être présente mais rare).",
        "En los estratos {ids} todas las unidades muestreadas contaron 0: su error estándar es 0, lo que subestima "
        "la incertidumbre (la especie puede estar presente pero ser rara allí).",
    ),
    (E, "The target CV {target_cv:.3g} cannot be reached by more units: the detection probability's own CV is "
        "{cv_p:.3g}. Improve the detection study first."): (
        "Le CV cible {target_cv:.3g} ne peut pas être atteint avec plus d'unités : le CV propre de la probabilité "
        "de détection est de {cv_p:.3g}. Améliorez d'abord l'étude de détection.",
        "El CV objetivo {target_cv:.3g} no puede alcanzarse con más unidades: el CV propio de la probabilidad de "
        "detección es {cv_p:.3g}. Mejore primero el estudio de detección.",
    ),
    (E, "No variation was observed, so the next survey's sample sizes are set to the minimum of 2 per stratum."): (
        "Aucune variation n'a été observée : les tailles d'échantillon du prochain inventaire sont fixées au "
        "minimum de 2 par strate.",
        "No se observó variación, así que los tamaños de muestra del próximo muestreo se fijan en el mínimo de 2 "
        "por estrato.",
    ),

    # -- sampling frame ------------------------------------------------------------------------
    (E, "EDGE_BUFFER is {edge_buffer} m; it must be zero or a positive distance in metres."): (
        "EDGE_BUFFER vaut {edge_buffer} m ; il doit être nul ou une distance positive en mètres.",
        "EDGE_BUFFER es {edge_buffer} m; debe ser cero o una distancia positiva en metros.",
    ),
    (E, "The study area (INPUT) has no polygon with a positive area. Check that the layer holds polygons and is in "
        "a projected CRS in metres."): (
        "La zone d'étude (INPUT) n'a aucun polygone de surface positive. Vérifiez que la couche contient des "
        "polygones et qu'elle est dans un SCR projeté en mètres.",
        "El área de estudio (INPUT) no tiene ningún polígono con área positiva. Compruebe que la capa contiene "
        "polígonos y está en un SRC proyectado en metros.",
    ),
    (E, "Nothing is left of the study area (INPUT) after removing the excluded polygons (EXCLUDE): they cover all "
        "{hectares:.4g} ha. Check that EXCLUDE holds only the areas to leave out."): (
        "Il ne reste rien de la zone d'étude (INPUT) après retrait des polygones exclus (EXCLUDE) : ils en couvrent "
        "la totalité, {hectares:.4g} ha. Vérifiez qu'EXCLUDE ne contient que les zones à écarter.",
        "No queda nada del área de estudio (INPUT) tras quitar los polígonos excluidos (EXCLUDE): cubren las "
        "{hectares:.4g} ha. Compruebe que EXCLUDE contiene solo las zonas que hay que dejar fuera.",
    ),
    (E, "Nothing is left of the frame after the raster mask (MASK): every cell over the remaining {hectares:.4g} "
        "ha is outside [MASK_MIN, MASK_MAX] or NoData. Widen the range, check the raster's units, or check that "
        "the raster covers the study area."): (
        "Il ne reste rien de la base de sondage après le masque raster (MASK) : chaque cellule des {hectares:.4g} "
        "ha restants est hors de [MASK_MIN, MASK_MAX] ou NoData. Élargissez l'intervalle, vérifiez les unités du "
        "raster, ou vérifiez que le raster couvre la zone d'étude.",
        "No queda nada del marco de muestreo tras la máscara ráster (MASK): cada celda de las {hectares:.4g} ha "
        "restantes está fuera de [MASK_MIN, MASK_MAX] o es NoData. Amplíe el rango, compruebe las unidades del "
        "ráster, o compruebe que el ráster cubre el área de estudio.",
    ),
    (E, "Nothing is left of the frame after the inward edge buffer (EDGE_BUFFER = {edge_buffer:g} m): the "
        "remaining {hectares:.4g} ha all lie within that distance of the study area's boundary (study area extent "
        "{width:.0f} m x {height:.0f} m). Use a smaller EDGE_BUFFER."): (
        "Il ne reste rien de la base de sondage après la zone tampon intérieure (EDGE_BUFFER = {edge_buffer:g} m) : "
        "les {hectares:.4g} ha restants se trouvent tous à moins de cette distance de la limite de la zone d'étude "
        "(emprise de la zone d'étude {width:.0f} m x {height:.0f} m). Utilisez un EDGE_BUFFER plus petit.",
        "No queda nada del marco de muestreo tras el búfer interior (EDGE_BUFFER = {edge_buffer:g} m): las "
        "{hectares:.4g} ha restantes están todas a menos de esa distancia del límite del área de estudio "
        "(extensión del área de estudio {width:.0f} m x {height:.0f} m). Use un EDGE_BUFFER menor.",
    ),

    # -- stratum labels (the label field) -------------------------------------------------------
    (E, "{name} class {value}"): ("{name} : classe {value}", "{name}: clase {value}"),
    (E, "mean {values}"): ("moyenne {values}", "media {values}"),

    # -- estimate: overlap, NULL ids (QA) --
    (E, "Layer '{layer}': the stratum id field '{field}' is empty (NULL) for feature id(s) {ids}. These polygons "
        "cover {area:.4g} {unit} that no stratum covers, so the estimate would silently speak for a smaller frame. "
        "Give each polygon the id of its stratum, delete the polygons that are not part of the frame, or choose to "
        "leave out strata with no surveyed unit (the frame then shrinks)."): (
        "Couche « {layer} » : le champ d'identifiant de strate « {field} » est vide (NULL) pour le ou les "
        "identifiants d'entité {ids}. Ces polygones couvrent {area:.4g} {unit} qu'aucune strate ne couvre, si bien "
        "que l'estimation porterait sans le dire sur une base de sondage plus petite. Donnez à chaque polygone "
        "l'identifiant de sa strate, supprimez les polygones qui ne font pas partie de la base de sondage, ou "
        "choisissez d'écarter les strates sans unité inventoriée (la base de sondage se réduit alors).",
        "Capa «{layer}»: el campo de identificador de estrato «{field}» está vacío (NULL) para los identificadores "
        "de entidad {ids}. Estos polígonos cubren {area:.4g} {unit} que ningún estrato cubre, así que la estimación "
        "hablaría sin avisar de un marco de muestreo más pequeño. Dé a cada polígono el identificador de su "
        "estrato, elimine los polígonos que no forman parte del marco, o elija dejar fuera los estratos sin "
        "unidades muestreadas (el marco se reduce entonces).",
    ),
    (E, "Layer '{layer}': the stratum id field '{field}' is empty (NULL) for feature id(s) {ids}. These polygons "
        "were left out, and the frame shrank by the {area:.4g} {unit} of them that no stratum covers. To keep them "
        "in the frame, give each polygon the id of its stratum."): (
        "Couche « {layer} » : le champ d'identifiant de strate « {field} » est vide (NULL) pour le ou les "
        "identifiants d'entité {ids}. Ces polygones ont été écartés, et la base de sondage a diminué des "
        "{area:.4g} {unit} qu'aucune strate ne couvre. Pour les garder dans la base de sondage, donnez à "
        "chaque polygone l'identifiant de sa strate.",
        "Capa «{layer}»: el campo de identificador de estrato «{field}» está vacío (NULL) para los identificadores "
        "de entidad {ids}. Estos polígonos se dejaron fuera, y el marco de muestreo se redujo en la parte que "
        "ningún estrato cubre: {area:.4g} {unit}. Para mantenerlos en el marco, dé a cada polígono el "
        "identificador de su estrato.",
    ),
    (E, "Layer '{layer}': no polygon has a stratum id in the field '{field}'. Fill in the stratum ids, or choose "
        "the field that holds them."): (
        "Couche « {layer} » : aucun polygone n'a d'identifiant de strate dans le champ « {field} ». Renseignez les "
        "identifiants de strate, ou choisissez le champ qui les contient.",
        "Capa «{layer}»: ningún polígono tiene identificador de estrato en el campo «{field}». Rellene los "
        "identificadores de estrato, o elija el campo que los contiene.",
    ),
    (E, "{first} and {second} ({area:.4g} {unit})"): (
        "{first} et {second} ({area:.4g} {unit})",
        "{first} y {second} ({area:.4g} {unit})",
    ),
    (E, "Layer '{layer}': the strata overlap: {pairs}. In all, {area:.4g} {unit} ({percent:.3g} % of the "
        "{covered:.4g} {unit} the strata cover) would be counted in more than one stratum, which inflates the frame "
        "area and the abundance. Fix the strata polygons so that they do not overlap: each piece of land belongs to "
        "one stratum only (cut each overlap out of all strata but one, or redraw the shared edges)."): (
        "Couche « {layer} » : les strates se chevauchent : {pairs}. Au total, {area:.4g} {unit} ({percent:.3g} % "
        "de la surface couverte par les strates, {covered:.4g} {unit}) seraient comptés dans plus d'une strate, ce "
        "qui gonfle la surface de la base de sondage et l'abondance. Corrigez les polygones des strates pour qu'ils "
        "ne se chevauchent pas : chaque parcelle de terrain appartient à une seule strate (découpez chaque "
        "chevauchement de toutes les strates sauf une, ou redessinez les limites communes).",
        "Capa «{layer}»: los estratos se solapan: {pairs}. En total, {area:.4g} {unit} ({percent:.3g} % de la "
        "superficie cubierta por los estratos, {covered:.4g} {unit}) se contarían en más de un estrato, lo que "
        "infla el área del marco de muestreo y la abundancia. Corrija los polígonos de los estratos para que no se "
        "solapen: cada trozo de terreno pertenece a un solo estrato (recorte cada solape de todos los estratos "
        "salvo uno, o vuelva a trazar los bordes comunes).",
    ),
    (E, "Layer '{layer}': the strata overlap: {pairs}. In all, {area:.4g} {unit} ({percent:.3g} % of the "
        "{covered:.4g} {unit} the strata cover) is counted in more than one stratum, so the frame area and the "
        "abundance are slightly too large. Fix the strata polygons so that they do not overlap (snap the shared "
        "edges, or cut each overlap out of all strata but one)."): (
        "Couche « {layer} » : les strates se chevauchent : {pairs}. Au total, {area:.4g} {unit} ({percent:.3g} % "
        "de la surface couverte par les strates, {covered:.4g} {unit}) sont comptés dans plus d'une strate, si bien "
        "que la surface de la base de sondage et l'abondance sont légèrement trop grandes. Corrigez les polygones "
        "des strates pour qu'ils ne se chevauchent pas (alignez les limites communes par accrochage, ou découpez "
        "chaque chevauchement de toutes les strates sauf une).",
        "Capa «{layer}»: los estratos se solapan: {pairs}. En total, {area:.4g} {unit} ({percent:.3g} % de la "
        "superficie cubierta por los estratos, {covered:.4g} {unit}) se cuentan en más de un estrato, por lo que "
        "el área del marco de muestreo y la abundancia son algo mayores de lo debido. Corrija los polígonos de los "
        "estratos para que no se solapen (ajuste los bordes comunes con el autoensamblado, o recorte cada solape "
        "de todos los estratos salvo uno).",
    ),

    # -- layout --------------------------------------------------------------------------------
    (E, "point unit {unit} (primary, stratum {stratum})"): (
        "unité ponctuelle {unit} (principale, strate {stratum})",
        "unidad puntual {unit} (principal, estrato {stratum})",
    ),
    (E, "point unit {unit} (reserve, stratum {stratum})"): (
        "unité ponctuelle {unit} (de réserve, strate {stratum})",
        "unidad puntual {unit} (de reserva, estrato {stratum})",
    ),
    (E, "square unit {unit} (primary, stratum {stratum})"): (
        "unité carrée {unit} (principale, strate {stratum})",
        "unidad cuadrada {unit} (principal, estrato {stratum})",
    ),
    (E, "square unit {unit} (reserve, stratum {stratum})"): (
        "unité carrée {unit} (de réserve, strate {stratum})",
        "unidad cuadrada {unit} (de reserva, estrato {stratum})",
    ),
    (E, "circle unit {unit} (primary, stratum {stratum})"): (
        "unité circulaire {unit} (principale, strate {stratum})",
        "unidad circular {unit} (principal, estrato {stratum})",
    ),
    (E, "circle unit {unit} (reserve, stratum {stratum})"): (
        "unité circulaire {unit} (de réserve, strate {stratum})",
        "unidad circular {unit} (de reserva, estrato {stratum})",
    ),
    (E, "start of transect {unit} (primary, stratum {stratum}, bearing {bearing:.0f} deg)"): (
        "début du transect {unit} (principal, strate {stratum}, azimut {bearing:.0f} deg)",
        "inicio del transecto {unit} (principal, estrato {stratum}, rumbo {bearing:.0f} grados)",
    ),
    (E, "start of transect {unit} (reserve, stratum {stratum}, bearing {bearing:.0f} deg)"): (
        "début du transect {unit} (de réserve, strate {stratum}, azimut {bearing:.0f} deg)",
        "inicio del transecto {unit} (de reserva, estrato {stratum}, rumbo {bearing:.0f} grados)",
    ),
    (E, "end of transect {unit} (primary, stratum {stratum}, bearing {bearing:.0f} deg)"): (
        "fin du transect {unit} (principal, strate {stratum}, azimut {bearing:.0f} deg)",
        "fin del transecto {unit} (principal, estrato {stratum}, rumbo {bearing:.0f} grados)",
    ),
    (E, "end of transect {unit} (reserve, stratum {stratum}, bearing {bearing:.0f} deg)"): (
        "fin du transect {unit} (de réserve, strate {stratum}, azimut {bearing:.0f} deg)",
        "fin del transecto {unit} (de reserva, estrato {stratum}, rumbo {bearing:.0f} grados)",
    ),
    (E, "DESIGN must be 0 (simple random), 1 (systematic grid) or 2 (spatially balanced)."): (
        "DESIGN doit valoir 0 (aléatoire simple), 1 (grille systématique) ou 2 (spatialement équilibré).",
        "DESIGN debe ser 0 (aleatorio simple), 1 (cuadrícula sistemática) o 2 (espacialmente equilibrado).",
    ),
    (E, "SIZE must be more than 0 m for a point unit; it is {size}."): (
        "SIZE doit dépasser 0 m pour une unité ponctuelle ; il vaut {size}.",
        "SIZE debe ser mayor que 0 m para una unidad puntual; es {size}.",
    ),
    (E, "SIZE must be more than 0 m for a square unit; it is {size}."): (
        "SIZE doit dépasser 0 m pour une unité carrée ; il vaut {size}.",
        "SIZE debe ser mayor que 0 m para una unidad cuadrada; es {size}.",
    ),
    (E, "SIZE must be more than 0 m for a circle unit; it is {size}."): (
        "SIZE doit dépasser 0 m pour une unité circulaire ; il vaut {size}.",
        "SIZE debe ser mayor que 0 m para una unidad circular; es {size}.",
    ),
    (E, "SIZE must be more than 0 m for a line unit; it is {size}."): (
        "SIZE doit dépasser 0 m pour une unité linéaire ; il vaut {size}.",
        "SIZE debe ser mayor que 0 m para una unidad lineal; es {size}.",
    ),
    (E, "BEARING must be -1 (random) or between 0 and 360 degrees; it is {bearing}."): (
        "BEARING doit valoir -1 (aléatoire) ou être compris entre 0 et 360 degrés ; il vaut {bearing}.",
        "BEARING debe ser -1 (aleatorio) o estar entre 0 y 360 grados; es {bearing}.",
    ),
    (E, "MIN_SPACING must be 0 or more metres."): (
        "MIN_SPACING doit valoir 0 mètre ou plus.",
        "MIN_SPACING debe ser 0 metros o más.",
    ),
    (E, "RESERVE must be 0 or a positive whole number."): (
        "RESERVE doit valoir 0 ou un nombre entier positif.",
        "RESERVE debe ser 0 o un número entero positivo.",
    ),
    (E, "{field} is empty (NULL) or not a number for feature(s) {ids}. Give every stratum a whole number of units, "
        "or leave N_FIELD unset to use N_UNITS."): (
        "{field} est vide (NULL) ou n'est pas un nombre pour la ou les entités {ids}. Donnez à chaque strate un "
        "nombre entier d'unités, ou laissez N_FIELD vide pour utiliser N_UNITS.",
        "{field} está vacío (NULL) o no es un número para las entidades {ids}. Dé a cada estrato un número entero "
        "de unidades, o deje N_FIELD sin definir para usar N_UNITS.",
    ),
    (E, "{field} is negative for feature(s) {ids}. Use 0 or a positive whole number."): (
        "{field} est négatif pour la ou les entités {ids}. Utilisez 0 ou un nombre entier positif.",
        "{field} es negativo para las entidades {ids}. Use 0 o un número entero positivo.",
    ),
    (E, "{field} is not a whole number for feature(s) {ids}. Round the allocation to whole units first."): (
        "{field} n'est pas un nombre entier pour la ou les entités {ids}. Arrondissez d'abord l'allocation à des "
        "unités entières.",
        "{field} no es un número entero para las entidades {ids}. Redondee primero la asignación a unidades "
        "enteras.",
    ),
    (E, "Give N_FIELD (units per stratum) or N_UNITS (a total of at least 1)."): (
        "Indiquez N_FIELD (unités par strate) ou N_UNITS (un total d'au moins 1).",
        "Indique N_FIELD (unidades por estrato) o N_UNITS (un total de al menos 1).",
    ),
    (E, "Invalid geometry was repaired for feature(s) {ids}; check their outlines."): (
        "Une géométrie invalide a été réparée pour la ou les entités {ids} ; vérifiez leurs contours.",
        "Se reparó una geometría no válida en las entidades {ids}; compruebe sus contornos.",
    ),
    (E, "Empty or zero-area feature(s) {ids} were skipped."): (
        "Les entités vides ou de surface nulle {ids} ont été ignorées.",
        "Se omitieron las entidades vacías o de área nula {ids}.",
    ),
    (E, "The frame has no polygon of {area:g} m² or more: every feature is empty, has zero area or is a sliver."): (
        "La base de sondage n'a aucun polygone de {area:g} m² ou plus : chaque entité est vide, de surface nulle ou "
        "n'est qu'un liseré.",
        "El marco de muestreo no tiene ningún polígono de {area:g} m² o más: cada entidad está vacía, tiene área nula "
        "o es una astilla.",
    ),
    (E, "Feature(s) {ids} have less than {area:g} m² of area (slivers, e.g. left over by an overlay or a "
        "reprojection) and were skipped."): (
        "Les entités {ids} ont moins de {area:g} m² de surface (des liserés, laissés par exemple par une superposition "
        "ou une reprojection) et ont été écartées.",
        "Las entidades {ids} tienen menos de {area:g} m² de área (astillas, dejadas por ejemplo por una superposición "
        "o una reproyección) y se han omitido.",
    ),
    (E, "Strata overlap ({pairs}): a location belongs to one stratum only, and units in a shared area would be drawn "
        "in both strata and weighted twice. Make the strata polygons disjoint (for example with the host's Difference "
        "or Union tools) and run again."): (
        "Des strates se chevauchent ({pairs}) : un lieu n'appartient qu'à une strate, et les unités d'une zone commune "
        "seraient tirées dans les deux strates et pondérées deux fois. Rendez les polygones des strates disjoints (par "
        "exemple avec les outils Différence ou Union de l'hôte) et relancez.",
        "Hay estratos que se solapan ({pairs}): un lugar pertenece a un solo estrato, y las unidades de una zona común "
        "se sortearían en ambos estratos y se ponderarían dos veces. Haga disjuntos los polígonos de los estratos (por "
        "ejemplo con las herramientas Diferencia o Unión del anfitrión) y vuelva a ejecutar.",
    ),
    (E, "Strata overlap slightly ({pairs}); units there belong to both. Make the strata polygons disjoint if this is "
        "more than digitising noise."): (
        "Des strates se chevauchent légèrement ({pairs}) ; les unités qui s'y trouvent appartiennent aux deux. Rendez "
        "les polygones des strates disjoints si ce n'est pas qu'une imprécision de numérisation.",
        "Hay estratos que se solapan ligeramente ({pairs}); las unidades allí pertenecen a ambos. Haga disjuntos los "
        "polígonos de los estratos si es más que ruido de digitalización.",
    ),
    (E, "A systematic grid of spacing {spacing:.3g} m over an area of {area:,.1f} m² that spreads over {width:,.0f} m "
        "x {height:,.0f} m would need {count:,} candidate points. The area is a thin sliver or far too small for the "
        "number of units: check the frame for slivers, ask for fewer units, or use another design."): (
        "Une grille systématique de pas {spacing:.3g} m sur une surface de {area:,.1f} m² étalée sur {width:,.0f} m "
        "x {height:,.0f} m demanderait {count:,} points candidats. La surface est un liseré ou bien trop petite pour "
        "le nombre d'unités : cherchez les liserés dans la base de sondage, demandez moins d'unités ou choisissez un "
        "autre plan.",
        "Una cuadrícula sistemática de espaciado {spacing:.3g} m sobre un área de {area:,.1f} m² extendida sobre "
        "{width:,.0f} m x {height:,.0f} m necesitaría {count:,} puntos candidatos. El área es una astilla o demasiado "
        "pequeña para el número de unidades: busque astillas en el marco, pida menos unidades o use otro diseño.",
    ),
    (E, "No point of an area of {area:.3g} m² could be drawn: it is too thin to hold a sample unit. Check the frame "
        "for slivers."): (
        "Aucun point n'a pu être tiré dans une surface de {area:.3g} m² : elle est trop mince pour accueillir une "
        "unité d'échantillonnage. Cherchez les liserés dans la base de sondage.",
        "No se pudo sortear ningún punto en un área de {area:.3g} m²: es demasiado delgada para contener una unidad "
        "de muestreo. Busque astillas en el marco.",
    ),
    (E, "{field} is empty (NULL) for feature {fid}. Give it a stratum value."): (
        "{field} est vide (NULL) pour l'entité {fid}. Donnez-lui une valeur de strate.",
        "{field} está vacío (NULL) para la entidad {fid}. Dele un valor de estrato.",
    ),
    (E, "The features of the frame (no stratum field) carry different {n_field} values ({values}) (features "
        "{ids}). {n_field} is the number of units of the whole stratum: give its features the same value or choose "
        "a stratum field so that each feature is a stratum."): (
        "Les entités de la base de sondage (sans champ de strate) portent des valeurs de {n_field} différentes "
        "({values}) (entités {ids}). {n_field} est le nombre d'unités de toute la strate : donnez la même valeur à "
        "ses entités ou choisissez un champ de strate pour que chaque entité soit une strate.",
        "Las entidades del marco de muestreo (sin campo de estrato) tienen valores de {n_field} distintos "
        "({values}) (entidades {ids}). {n_field} es el número de unidades de todo el estrato: dé el mismo valor a "
        "sus entidades o elija un campo de estrato para que cada entidad sea un estrato.",
    ),
    (E, "The features of stratum {key} carry different {n_field} values ({values}) (features {ids}). {n_field} is "
        "the number of units of the whole stratum: give its features the same value."): (
        "Les entités de la strate {key} portent des valeurs de {n_field} différentes ({values}) (entités {ids}). "
        "{n_field} est le nombre d'unités de toute la strate : donnez la même valeur à ses entités.",
        "Las entidades del estrato {key} tienen valores de {n_field} distintos ({values}) (entidades {ids}). "
        "{n_field} es el número de unidades de todo el estrato: dé el mismo valor a sus entidades.",
    ),
    (E, "N_UNITS = {n_units} is fewer than {minimum} per stratum for {n_strata} strata; every stratum gets "
        "{minimum} ({total} units)."): (
        "N_UNITS = {n_units} fait moins de {minimum} par strate pour {n_strata} strates ; chaque strate en reçoit "
        "{minimum} ({total} unités).",
        "N_UNITS = {n_units} es menos de {minimum} por estrato para {n_strata} estratos; cada estrato recibe "
        "{minimum} ({total} unidades).",
    ),
    (E, "The frame is too small for a point unit of SIZE {size:g} m wholly inside it: no point lies {radius:.1f} m "
        "or more from its edge (features {ids}). Use a smaller SIZE, untick INSIDE, or merge the stratum with a "
        "neighbour."): (
        "La base de sondage est trop petite pour une unité ponctuelle de SIZE {size:g} m entièrement à "
        "l'intérieur : aucun point n'est à {radius:.1f} m ou plus de son bord (entités {ids}). Utilisez un SIZE "
        "plus petit, décochez INSIDE, ou fusionnez la strate avec une voisine.",
        "El marco de muestreo es demasiado pequeño para una unidad puntual de SIZE {size:g} m totalmente dentro: "
        "ningún punto está a {radius:.1f} m o más de su borde (entidades {ids}). Use un SIZE menor, desmarque "
        "INSIDE, o fusione el estrato con un vecino.",
    ),
    (E, "The frame is too small for a square unit of SIZE {size:g} m wholly inside it: no point lies {radius:.1f} "
        "m or more from its edge (features {ids}). Use a smaller SIZE, untick INSIDE, or merge the stratum with a "
        "neighbour."): (
        "La base de sondage est trop petite pour une unité carrée de SIZE {size:g} m entièrement à l'intérieur : "
        "aucun point n'est à {radius:.1f} m ou plus de son bord (entités {ids}). Utilisez un SIZE plus petit, "
        "décochez INSIDE, ou fusionnez la strate avec une voisine.",
        "El marco de muestreo es demasiado pequeño para una unidad cuadrada de SIZE {size:g} m totalmente dentro: "
        "ningún punto está a {radius:.1f} m o más de su borde (entidades {ids}). Use un SIZE menor, desmarque "
        "INSIDE, o fusione el estrato con un vecino.",
    ),
    (E, "The frame is too small for a circle unit of SIZE {size:g} m wholly inside it: no point lies {radius:.1f} "
        "m or more from its edge (features {ids}). Use a smaller SIZE, untick INSIDE, or merge the stratum with a "
        "neighbour."): (
        "La base de sondage est trop petite pour une unité circulaire de SIZE {size:g} m entièrement à "
        "l'intérieur : aucun point n'est à {radius:.1f} m ou plus de son bord (entités {ids}). Utilisez un SIZE "
        "plus petit, décochez INSIDE, ou fusionnez la strate avec une voisine.",
        "El marco de muestreo es demasiado pequeño para una unidad circular de SIZE {size:g} m totalmente dentro: "
        "ningún punto está a {radius:.1f} m o más de su borde (entidades {ids}). Use un SIZE menor, desmarque "
        "INSIDE, o fusione el estrato con un vecino.",
    ),
    (E, "The frame is too small for a line unit of SIZE {size:g} m wholly inside it: no point lies {radius:.1f} m "
        "or more from its edge (features {ids}). Use a smaller SIZE, untick INSIDE, or merge the stratum with a "
        "neighbour."): (
        "La base de sondage est trop petite pour une unité linéaire de SIZE {size:g} m entièrement à l'intérieur : "
        "aucun point n'est à {radius:.1f} m ou plus de son bord (entités {ids}). Utilisez un SIZE plus petit, "
        "décochez INSIDE, ou fusionnez la strate avec une voisine.",
        "El marco de muestreo es demasiado pequeño para una unidad lineal de SIZE {size:g} m totalmente dentro: "
        "ningún punto está a {radius:.1f} m o más de su borde (entidades {ids}). Use un SIZE menor, desmarque "
        "INSIDE, o fusione el estrato con un vecino.",
    ),
    (E, "Stratum {key} is too small for a point unit of SIZE {size:g} m wholly inside it: no point lies "
        "{radius:.1f} m or more from its edge (features {ids}). Use a smaller SIZE, untick INSIDE, or merge the "
        "stratum with a neighbour."): (
        "La strate {key} est trop petite pour une unité ponctuelle de SIZE {size:g} m entièrement à l'intérieur : "
        "aucun point n'est à {radius:.1f} m ou plus de son bord (entités {ids}). Utilisez un SIZE plus petit, "
        "décochez INSIDE, ou fusionnez la strate avec une voisine.",
        "El estrato {key} es demasiado pequeño para una unidad puntual de SIZE {size:g} m totalmente dentro: "
        "ningún punto está a {radius:.1f} m o más de su borde (entidades {ids}). Use un SIZE menor, desmarque "
        "INSIDE, o fusione el estrato con un vecino.",
    ),
    (E, "Stratum {key} is too small for a square unit of SIZE {size:g} m wholly inside it: no point lies "
        "{radius:.1f} m or more from its edge (features {ids}). Use a smaller SIZE, untick INSIDE, or merge the "
        "stratum with a neighbour."): (
        "La strate {key} est trop petite pour une unité carrée de SIZE {size:g} m entièrement à l'intérieur : "
        "aucun point n'est à {radius:.1f} m ou plus de son bord (entités {ids}). Utilisez un SIZE plus petit, "
        "décochez INSIDE, ou fusionnez la strate avec une voisine.",
        "El estrato {key} es demasiado pequeño para una unidad cuadrada de SIZE {size:g} m totalmente dentro: "
        "ningún punto está a {radius:.1f} m o más de su borde (entidades {ids}). Use un SIZE menor, desmarque "
        "INSIDE, o fusione el estrato con un vecino.",
    ),
    (E, "Stratum {key} is too small for a circle unit of SIZE {size:g} m wholly inside it: no point lies "
        "{radius:.1f} m or more from its edge (features {ids}). Use a smaller SIZE, untick INSIDE, or merge the "
        "stratum with a neighbour."): (
        "La strate {key} est trop petite pour une unité circulaire de SIZE {size:g} m entièrement à l'intérieur : "
        "aucun point n'est à {radius:.1f} m ou plus de son bord (entités {ids}). Utilisez un SIZE plus petit, "
        "décochez INSIDE, ou fusionnez la strate avec une voisine.",
        "El estrato {key} es demasiado pequeño para una unidad circular de SIZE {size:g} m totalmente dentro: "
        "ningún punto está a {radius:.1f} m o más de su borde (entidades {ids}). Use un SIZE menor, desmarque "
        "INSIDE, o fusione el estrato con un vecino.",
    ),
    (E, "Stratum {key} is too small for a line unit of SIZE {size:g} m wholly inside it: no point lies "
        "{radius:.1f} m or more from its edge (features {ids}). Use a smaller SIZE, untick INSIDE, or merge the "
        "stratum with a neighbour."): (
        "La strate {key} est trop petite pour une unité linéaire de SIZE {size:g} m entièrement à l'intérieur : "
        "aucun point n'est à {radius:.1f} m ou plus de son bord (entités {ids}). Utilisez un SIZE plus petit, "
        "décochez INSIDE, ou fusionnez la strate avec une voisine.",
        "El estrato {key} es demasiado pequeño para una unidad lineal de SIZE {size:g} m totalmente dentro: "
        "ningún punto está a {radius:.1f} m o más de su borde (entidades {ids}). Use un SIZE menor, desmarque "
        "INSIDE, o fusione el estrato con un vecino.",
    ),
    (E, "The frame gets no units; the estimate cannot speak for it."): (
        "La base de sondage ne reçoit aucune unité ; l'estimation ne peut pas la représenter.",
        "El marco de muestreo no recibe unidades; la estimación no puede representarlo.",
    ),
    (E, "Stratum {key} gets no units; the estimate cannot speak for it."): (
        "La strate {key} ne reçoit aucune unité ; l'estimation ne peut pas la représenter.",
        "El estrato {key} no recibe unidades; la estimación no puede representarlo.",
    ),
    (E, "The frame gets one unit only; its variance cannot be estimated."): (
        "La base de sondage ne reçoit qu'une unité ; sa variance ne peut pas être estimée.",
        "El marco de muestreo recibe una sola unidad; su varianza no puede estimarse.",
    ),
    (E, "Keeping units inside leaves {share:.0%} of the frame (the band within {radius:g} m of its edge) "
        "where no unit centre can fall; the estimate carries the inner part's density over that band. "
        "If density differs near edges, turn INSIDE off or use smaller units."): (
        "Garder les unités à l'intérieur laisse {share:.0%} de la base de sondage (la bande à moins de "
        "{radius:g} m de son bord) où aucun centre d'unité ne peut tomber ; l'estimation étend la densité "
        "de la partie intérieure à cette bande. Si la densité diffère près des bords, désactivez INSIDE "
        "ou utilisez des unités plus petites.",
        "Mantener las unidades dentro deja {share:.0%} del marco de muestreo (la franja a menos de "
        "{radius:g} m de su borde) donde no puede caer ningún centro de unidad; la estimación extiende la "
        "densidad de la parte interior a esa franja. Si la densidad cambia cerca de los bordes, desactive "
        "INSIDE o use unidades más pequeñas.",
    ),
    (E, "Keeping units inside leaves {share:.0%} of stratum {key} (the band within {radius:g} m of its "
        "edge) where no unit centre can fall; the estimate carries the inner part's density over that "
        "band. If density differs near edges, turn INSIDE off or use smaller units."): (
        "Garder les unités à l'intérieur laisse {share:.0%} de la strate {key} (la bande à moins de "
        "{radius:g} m de son bord) où aucun centre d'unité ne peut tomber ; l'estimation étend la densité "
        "de la partie intérieure à cette bande. Si la densité diffère près des bords, désactivez INSIDE "
        "ou utilisez des unités plus petites.",
        "Mantener las unidades dentro deja {share:.0%} del estrato {key} (la franja a menos de "
        "{radius:g} m de su borde) donde no puede caer ningún centro de unidad; la estimación extiende la "
        "densidad de la parte interior a esa franja. Si la densidad cambia cerca de los bordes, desactive "
        "INSIDE o use unidades más pequeñas.",
    ),
    (E, "Stratum {key} gets one unit only; its variance cannot be estimated."): (
        "La strate {key} ne reçoit qu'une unité ; sa variance ne peut pas être estimée.",
        "El estrato {key} recibe una sola unidad; su varianza no puede estimarse.",
    ),
    (E, "MIN_SPACING = {spacing:g} m cannot be met in the frame: {wanted} units were asked for (primaries and "
        "reserves), the draw placed {placed}, and at most about {fit} units fit at that spacing (a hexagonal "
        "lattice, the densest arrangement; random layouts fill up well before that). Ask for fewer units or "
        "reserves, or lower MIN_SPACING."): (
        "MIN_SPACING = {spacing:g} m ne peut pas être respecté dans la base de sondage : {wanted} unités étaient "
        "demandées (principales et de réserve), le tirage en a placé {placed}, et au plus environ {fit} unités "
        "tiennent à cet espacement (un réseau hexagonal, l'arrangement le plus dense ; les dispositions aléatoires "
        "se remplissent bien avant). Demandez moins d'unités ou de réserves, ou baissez MIN_SPACING.",
        "MIN_SPACING = {spacing:g} m no puede cumplirse en el marco de muestreo: se pidieron {wanted} unidades "
        "(principales y de reserva), el sorteo colocó {placed}, y caben como mucho unas {fit} unidades con esa "
        "separación (una red hexagonal, la disposición más densa; las disposiciones aleatorias se llenan mucho "
        "antes). Pida menos unidades o reservas, o baje MIN_SPACING.",
    ),
    (E, "MIN_SPACING = {spacing:g} m cannot be met in stratum {key}: {wanted} units were asked for (primaries and "
        "reserves), the draw placed {placed}, and at most about {fit} units fit at that spacing (a hexagonal "
        "lattice, the densest arrangement; random layouts fill up well before that). Ask for fewer units or "
        "reserves, or lower MIN_SPACING."): (
        "MIN_SPACING = {spacing:g} m ne peut pas être respecté dans la strate {key} : {wanted} unités étaient "
        "demandées (principales et de réserve), le tirage en a placé {placed}, et au plus environ {fit} unités "
        "tiennent à cet espacement (un réseau hexagonal, l'arrangement le plus dense ; les dispositions aléatoires "
        "se remplissent bien avant). Demandez moins d'unités ou de réserves, ou baissez MIN_SPACING.",
        "MIN_SPACING = {spacing:g} m no puede cumplirse en el estrato {key}: se pidieron {wanted} unidades "
        "(principales y de reserva), el sorteo colocó {placed}, y caben como mucho unas {fit} unidades con esa "
        "separación (una red hexagonal, la disposición más densa; las disposiciones aleatorias se llenan mucho "
        "antes). Pida menos unidades o reservas, o baje MIN_SPACING.",
    ),
    (E, "The grid spacing for {n} units in the frame would be {spacing:.1f} m, below MIN_SPACING = "
        "{min_spacing:g} m. A square grid at {min_spacing:g} m holds about {fit} units there: ask for at most that "
        "many, or lower MIN_SPACING."): (
        "L'espacement de grille pour {n} unités dans la base de sondage serait de {spacing:.1f} m, sous "
        "MIN_SPACING = {min_spacing:g} m. Une grille carrée à {min_spacing:g} m y contient environ {fit} unités : "
        "demandez-en au plus autant, ou baissez MIN_SPACING.",
        "La separación de la cuadrícula para {n} unidades en el marco de muestreo sería de {spacing:.1f} m, por "
        "debajo de MIN_SPACING = {min_spacing:g} m. Una cuadrícula cuadrada a {min_spacing:g} m contiene allí unas "
        "{fit} unidades: pida como mucho esas, o baje MIN_SPACING.",
    ),
    (E, "The grid spacing for {n} units in stratum {key} would be {spacing:.1f} m, below MIN_SPACING = "
        "{min_spacing:g} m. A square grid at {min_spacing:g} m holds about {fit} units there: ask for at most that "
        "many, or lower MIN_SPACING."): (
        "L'espacement de grille pour {n} unités dans la strate {key} serait de {spacing:.1f} m, sous MIN_SPACING "
        "= {min_spacing:g} m. Une grille carrée à {min_spacing:g} m y contient environ {fit} unités : demandez-en "
        "au plus autant, ou baissez MIN_SPACING.",
        "La separación de la cuadrícula para {n} unidades en el estrato {key} sería de {spacing:.1f} m, por debajo "
        "de MIN_SPACING = {min_spacing:g} m. Una cuadrícula cuadrada a {min_spacing:g} m contiene allí unas {fit} "
        "unidades: pida como mucho esas, o baje MIN_SPACING.",
    ),
    (E, "{n} grid unit(s) of the frame were dropped: closer than MIN_SPACING to units of a neighbouring stratum."): (
        "{n} unité(s) de grille de la base de sondage ont été retirées : plus proches que MIN_SPACING d'unités "
        "d'une strate voisine.",
        "Se quitaron {n} unidad(es) de cuadrícula del marco de muestreo: más cerca que MIN_SPACING de unidades de "
        "un estrato vecino.",
    ),
    (E, "{n} grid unit(s) of stratum {key} were dropped: closer than MIN_SPACING to units of a neighbouring "
        "stratum."): (
        "{n} unité(s) de grille de la strate {key} ont été retirées : plus proches que MIN_SPACING d'unités d'une "
        "strate voisine.",
        "Se quitaron {n} unidad(es) de cuadrícula del estrato {key}: más cerca que MIN_SPACING de unidades de un "
        "estrato vecino.",
    ),
    (E, "No grid point fell in the frame (spacing {spacing:.1f} m); it gets no units. Use the simple random or "
        "spatially balanced design for small or thin strata."): (
        "Aucun point de grille n'est tombé dans la base de sondage (espacement {spacing:.1f} m) ; elle ne reçoit "
        "aucune unité. Utilisez le plan aléatoire simple ou spatialement équilibré pour les strates petites ou "
        "étroites.",
        "Ningún punto de la cuadrícula cayó en el marco de muestreo (separación {spacing:.1f} m); no recibe "
        "unidades. Use el diseño aleatorio simple o espacialmente equilibrado para estratos pequeños o estrechos.",
    ),
    (E, "No grid point fell in stratum {key} (spacing {spacing:.1f} m); it gets no units. Use the simple random "
        "or spatially balanced design for small or thin strata."): (
        "Aucun point de grille n'est tombé dans la strate {key} (espacement {spacing:.1f} m) ; elle ne reçoit "
        "aucune unité. Utilisez le plan aléatoire simple ou spatialement équilibré pour les strates petites ou "
        "étroites.",
        "Ningún punto de la cuadrícula cayó en el estrato {key} (separación {spacing:.1f} m); no recibe unidades. "
        "Use el diseño aleatorio simple o espacialmente equilibrado para estratos pequeños o estrechos.",
    ),
    (E, "The frame has only {n} of {r} reserve units."): (
        "La base de sondage n'a que {n} des {r} unités de réserve.",
        "El marco de muestreo tiene solo {n} de las {r} unidades de reserva.",
    ),
    (E, "Stratum {key} has only {n} of {r} reserve units."): (
        "La strate {key} n'a que {n} des {r} unités de réserve.",
        "El estrato {key} tiene solo {n} de las {r} unidades de reserva.",
    ),

    # -- stratification and raster reading -------------------------------------------------------
    (E, "No cell of the frame has a value in every covariate."): (
        "Aucune cellule de la base de sondage n'a de valeur dans toutes les covariables.",
        "Ninguna celda del marco de muestreo tiene valor en todas las covariables.",
    ),
    (E, "The covariates take fewer distinct value combinations than strata asked for."): (
        "Les covariables prennent moins de combinaisons de valeurs distinctes que de strates demandées.",
        "Las covariables toman menos combinaciones de valores distintas que estratos pedidos.",
    ),
    (E, "The frame holds no raster cell."): (
        "La base de sondage ne contient aucune cellule raster.",
        "El marco de muestreo no contiene ninguna celda ráster.",
    ),
    (E, "Covariate '{name}' is constant ({value:g}) over the frame: it cannot define strata. Use another "
        "covariate, or check the frame and the raster."): (
        "La covariable « {name} » est constante ({value:g}) sur la base de sondage : elle ne peut pas définir de "
        "strates. Utilisez une autre covariable, ou vérifiez la base de sondage et le raster.",
        "La covariable «{name}» es constante ({value:g}) en el marco de muestreo: no puede definir estratos. Use "
        "otra covariable, o compruebe el marco y el ráster.",
    ),
    (E, "Unknown METHOD {method!r}: use 0 (quantile) to 4 (raster classes)."): (
        "METHOD inconnu {method!r} : utilisez 0 (quantiles) à 4 (classes du raster).",
        "METHOD desconocido {method!r}: use de 0 (cuantiles) a 4 (clases del ráster).",
    ),
    (E, "Ask for at least 2 strata (STRATA)."): (
        "Demandez au moins 2 strates (STRATA).",
        "Pida al menos 2 estratos (STRATA).",
    ),
    (E, "No cell of the frame has a value in every covariate ({names}). Check that the rasters cover the frame and "
        "that their NoData value is right."): (
        "Aucune cellule de la base de sondage n'a de valeur dans toutes les covariables ({names}). Vérifiez que les "
        "rasters couvrent la base de sondage et que leur valeur NoData est juste.",
        "Ninguna celda del marco de muestreo tiene valor en todas las covariables ({names}). Compruebe que los "
        "rásteres cubren el marco y que su valor NoData es correcto.",
    ),
    (E, "Covariate '{name}' takes only {n_distinct} distinct values over the frame, fewer than the {k} strata "
        "asked for. Lower STRATA to {n_distinct} or fewer."): (
        "La covariable « {name} » ne prend que {n_distinct} valeurs distinctes sur la base de sondage, moins que "
        "les {k} strates demandées. Ramenez STRATA à {n_distinct} ou moins.",
        "La covariable «{name}» toma solo {n_distinct} valores distintos en el marco de muestreo, menos que los "
        "{k} estratos pedidos. Baje STRATA a {n_distinct} o menos.",
    ),
    (E, "Some boundaries coincide (many cells share the same value of '{name}'); {formed} strata are formed "
        "instead of {k}."): (
        "Certaines limites coïncident (beaucoup de cellules partagent la même valeur de « {name} ») ; {formed} "
        "strates sont formées au lieu de {k}.",
        "Algunos límites coinciden (muchas celdas comparten el mismo valor de «{name}»); se forman {formed} "
        "estratos en lugar de {k}.",
    ),
    (E, "The covariates take only {n_distinct} distinct value combinations over the frame, fewer than the {k} "
        "strata asked for. Lower STRATA to {n_distinct} or fewer."): (
        "Les covariables ne prennent que {n_distinct} combinaisons de valeurs distinctes sur la base de sondage, "
        "moins que les {k} strates demandées. Ramenez STRATA à {n_distinct} ou moins.",
        "Las covariables toman solo {n_distinct} combinaciones de valores distintas en el marco de muestreo, "
        "menos que los {k} estratos pedidos. Baje STRATA a {n_distinct} o menos.",
    ),
    (E, "The covariates take only {n_distinct} distinct value combinations in a sample of {sample_n} cells, "
        "fewer than the {k} strata asked for. Lower STRATA to {n_distinct} or fewer."): (
        "Les covariables ne prennent que {n_distinct} combinaisons de valeurs distinctes dans un échantillon de "
        "{sample_n} cellules, moins que les {k} strates demandées. Ramenez STRATA à {n_distinct} ou moins.",
        "Las covariables toman solo {n_distinct} combinaciones de valores distintas en una muestra de "
        "{sample_n} celdas, menos que los {k} estratos pedidos. Baje STRATA a {n_distinct} o menos.",
    ),
    (E, "Covariate '{name}' has more than {max_classes} classes (at least {n_distinct} distinct values over "
        "the frame): reclassify it into {max_classes} classes or fewer first (for example with the host's "
        "reclassify by table tool), or choose another METHOD."): (
        "La covariable « {name} » a plus de {max_classes} classes (au moins {n_distinct} valeurs distinctes "
        "sur la base de sondage) : reclassez-la d'abord en {max_classes} classes ou moins (par exemple avec "
        "l'outil de reclassement par table de l'hôte), ou choisissez une autre METHOD.",
        "La covariable «{name}» tiene más de {max_classes} clases (al menos {n_distinct} valores distintos en "
        "el marco de muestreo): reclasifíquela primero en {max_classes} clases o menos (por ejemplo con la "
        "herramienta de reclasificación por tabla del anfitrión), o elija otro METHOD.",
    ),
    (E, "{dropped} of the {k} strata hold no cell and were dropped."): (
        "{dropped} des {k} strates ne contiennent aucune cellule et ont été retirées.",
        "{dropped} de los {k} estratos no contienen ninguna celda y se quitaron.",
    ),
    (E, "Covariate '{name}' cannot be read ({error}). Check the file."): (
        "La covariable « {name} » ne peut pas être lue ({error}). Vérifiez le fichier.",
        "La covariable «{name}» no puede leerse ({error}). Compruebe el archivo.",
    ),
    (E, "Covariate '{name}' has no band {band}."): (
        "La covariable « {name} » n'a pas de bande {band}.",
        "La covariable «{name}» no tiene banda {band}.",
    ),
    (E, "The frame has no polygon."): (
        "La base de sondage n'a aucun polygone.",
        "El marco de muestreo no tiene ningún polígono.",
    ),
    (E, "The frame does not overlap covariate '{name}' ({path}). Use a raster that covers the frame, or check both "
        "layers' CRS."): (
        "La base de sondage ne recouvre pas la covariable « {name} » ({path}). Utilisez un raster qui couvre la "
        "base de sondage, ou vérifiez le SCR des deux couches.",
        "El marco de muestreo no se superpone a la covariable «{name}» ({path}). Use un ráster que cubra el marco, "
        "o compruebe el SRC de ambas capas.",
    ),
    (E, "Cannot write the stratum raster '{path}'."): (
        "Impossible d'écrire le raster des strates « {path} ».",
        "No se puede escribir el ráster de estratos «{path}».",
    ),
    (E, "{merged} strata consisted only of patches below MIN_AREA and were merged away."): (
        "{merged} strates n'étaient faites que de taches sous MIN_AREA et ont été fusionnées avec leurs voisines.",
        "{merged} estratos constaban solo de manchas por debajo de MIN_AREA y se fusionaron con sus vecinos.",
    ),
    (E, "The covariates cover {percent:.1f}% of the frame: {outside_ha:,.2f} ha lie outside the rasters and "
        "{nodata_ha:,.2f} ha have NoData in at least one covariate; the strata speak for the covered part only."): (
        "Les covariables couvrent {percent:.1f}% de la base de sondage : {outside_ha:,.2f} ha sont hors des rasters "
        "et {nodata_ha:,.2f} ha sont NoData dans au moins une covariable ; les strates ne valent que pour la partie "
        "couverte.",
        "Las covariables cubren el {percent:.1f}% del marco de muestreo: {outside_ha:,.2f} ha quedan fuera de los "
        "rásteres y {nodata_ha:,.2f} ha son NoData en al menos una covariable; los estratos valen solo para la "
        "parte cubierta.",
    ),
    (E, "The mask raster (MASK) '{source}' cannot be opened by GDAL."): (
        "Le raster de masque (MASK) « {source} » ne peut pas être ouvert par GDAL.",
        "GDAL no puede abrir el ráster de máscara (MASK) «{source}».",
    ),
    (E, "The mask raster (MASK) would need {rows} x {cols} cells over the study area; that is more than "
        "{max_cells:,}. Resample the raster to coarser cells first."): (
        "Le raster de masque (MASK) demanderait {rows} x {cols} cellules sur la zone d'étude, soit plus de "
        "{max_cells:,}. Rééchantillonnez d'abord le raster en cellules plus grossières.",
        "El ráster de máscara (MASK) necesitaría {rows} x {cols} celdas sobre el área de estudio, más de "
        "{max_cells:,}. Remuestree primero el ráster a celdas más gruesas.",
    ),
    (E, "The mask raster (MASK) cannot be reprojected to the computation CRS."): (
        "Le raster de masque (MASK) ne peut pas être reprojeté dans le SCR de calcul.",
        "El ráster de máscara (MASK) no puede reproyectarse al SRC de cálculo.",
    ),
    (E, "GDAL could not turn the masked raster cells into polygons."): (
        "GDAL n'a pas pu transformer les cellules masquées du raster en polygones.",
        "GDAL no pudo convertir las celdas enmascaradas del ráster en polígonos.",
    ),
    (E, "MASK_MIN ({mask_min:g}) is greater than MASK_MAX ({mask_max:g}); no cell could be kept. Swap the two "
        "values or leave one of them empty."): (
        "MASK_MIN ({mask_min:g}) est supérieur à MASK_MAX ({mask_max:g}) ; aucune cellule ne pourrait être gardée. "
        "Inversez les deux valeurs ou laissez l'une d'elles vide.",
        "MASK_MIN ({mask_min:g}) es mayor que MASK_MAX ({mask_max:g}); no podría conservarse ninguna celda. "
        "Intercambie los dos valores o deje uno de ellos vacío.",
    ),
    (E, "The mask raster (MASK) has no band {band}; it has {count}."): (
        "Le raster de masque (MASK) n'a pas de bande {band} ; il en a {count}.",
        "El ráster de máscara (MASK) no tiene banda {band}; tiene {count}.",
    ),
}
