<?xml version="1.0" encoding="utf-8"?>
<!DOCTYPE TS>
<TS version="2.1" language="fr_FR">
<context>
    <name>Allocate</name>
    <message>
        <location filename="../processing/algorithms/allocate.py" line="65"/>
        <source>Allocate effort to strata</source>
        <translation>Répartir l'effort entre les strates</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/allocate.py" line="104"/>
        <source>Strata</source>
        <translation>Strates</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/allocate.py" line="107"/>
        <source>Stratum identifier field</source>
        <translation>Champ d'identifiant de strate</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/allocate.py" line="113"/>
        <source>Stratum area field (hectares; empty: polygon area)</source>
        <translation>Champ de surface de la strate (hectares ; vide : surface du polygone)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/allocate.py" line="119"/>
        <source>Pilot SD of counts per unit</source>
        <translation>Écart-type pilote des comptages par unité</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/allocate.py" line="119"/>
        <source>Pilot mean count per unit</source>
        <translation>Comptage moyen pilote par unité</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/allocate.py" line="119"/>
        <source>Cost per unit</source>
        <translation>Coût par unité</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/allocate.py" line="127"/>
        <source>Costs are field days</source>
        <translation>Les coûts sont des jours de terrain</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/allocate.py" line="130"/>
        <source>Fixed cost of the survey (c0, in the cost unit)</source>
        <translation>Coût fixe de l'inventaire (c0, dans l'unité de coût)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/allocate.py" line="139"/>
        <source>Allocation method</source>
        <translation>Méthode d'allocation</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/allocate.py" line="139"/>
        <source>Equal</source>
        <translation>Égale</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/allocate.py" line="139"/>
        <source>Proportional to area</source>
        <translation>Proportionnelle à la surface</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/allocate.py" line="321"/>
        <source>Neyman</source>
        <translation>Neyman</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/allocate.py" line="139"/>
        <source>Optimal with cost</source>
        <translation>Optimale avec coût</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/allocate.py" line="147"/>
        <source>Total number of units</source>
        <translation>Nombre total d'unités</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/allocate.py" line="152"/>
        <source>Budget (0: not used; needs the cost field)</source>
        <translation>Budget (0 : non utilisé ; nécessite le champ de coût)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/allocate.py" line="158"/>
        <source>Target CV of the overall density (0: not used; e.g. 0.2)</source>
        <translation>CV cible de la densité globale (0 : non utilisé ; p. ex. 0.2)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/allocate.py" line="164"/>
        <source>Area of one sample unit (m²)</source>
        <translation>Surface d'une unité d'échantillonnage (m²)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/allocate.py" line="170"/>
        <source>Minimum units per stratum</source>
        <translation>Nombre minimal d'unités par strate</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/allocate.py" line="98"/>
        <source>Strata with allocation</source>
        <translation>Strates avec allocation</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/allocate.py" line="100"/>
        <source>Expected CV of the overall density</source>
        <translation>CV attendu de la densité globale</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/allocate.py" line="189"/>
        <source>The strata layer could not be opened.</source>
        <translation>La couche des strates n'a pas pu être ouverte.</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/allocate.py" line="195"/>
        <source>Layer &apos;{layer}&apos; has no strata with an area.</source>
        <translation>La couche « {layer} » n'a aucune strate ayant une surface.</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/allocate.py" line="273"/>
        <source>field &apos;{name}&apos; of layer &apos;{layer}&apos;</source>
        <translation>champ « {name} » de la couche « {layer} »</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/allocate.py" line="256"/>
        <source>No pilot SD field: the covariate SD (&apos;{field}&apos;) is used as a proxy. This assumes that counts scale with the covariate; replace it with the SD of a pilot survey when you have one. The expected SEs are then in covariate units, not counts.</source>
        <translation>Pas de champ d'écart-type pilote : l'écart-type de la covariable (« {field} ») sert de substitut. Cela suppose que les comptages suivent la covariable ; remplacez-le par l'écart-type d'un inventaire pilote dès que vous en avez un. Les erreurs types attendues sont alors dans les unités de la covariable, pas en comptages.</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/allocate.py" line="276"/>
        <source>polygon area</source>
        <translation>surface du polygone</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/allocate.py" line="276"/>
        <source>pilot SD</source>
        <translation>écart-type pilote</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/allocate.py" line="276"/>
        <source>pilot mean</source>
        <translation>moyenne pilote</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/allocate.py" line="276"/>
        <source>cost</source>
        <translation>coût</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/allocate.py" line="311"/>
        <source>The output layer could not be created.</source>
        <translation>La couche de sortie n'a pas pu être créée.</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/allocate.py" line="219"/>
        <source>{total} units allocated ({method}); expected CV of the overall density: {cv}.</source>
        <translation>{total} unités allouées ({method}) ; CV attendu de la densité globale : {cv}.</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/allocate.py" line="320"/>
        <source>equal</source>
        <translation>égale</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/allocate.py" line="320"/>
        <source>proportional to area</source>
        <translation>proportionnelle à la surface</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/allocate.py" line="321"/>
        <source>optimal with cost</source>
        <translation>optimale avec coût</translation>
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
        <translation>Décide combien d'unités d'échantillonnage reçoit chaque strate, et montre à l'avance la précision qu'elles apportent.

Méthodes : égale ; proportionnelle à la surface de la strate ; Neyman, n_h ∝ A_h·S_h (Neyman 1934 ; Cochran 1977, ch. 5) ; optimale avec coût, n_h ∝ A_h·S_h/√c_h, sous un budget C = c0 + Σ c_h·n_h (Cochran 1977, ch. 5).

Objectif : un CV cible (s'il est supérieur à 0) trouve le plus petit total dont le coefficient de variation attendu de la densité globale l'atteint ; sinon un budget (s'il est supérieur à 0, il faut le champ de coût) ; sinon le nombre total d'unités.

Bornes : au moins le minimum par strate (2 par défaut, pour que la variance de chaque strate puisse être estimée) et au plus les unités qui y tiennent (surface de la strate / surface d'une unité). Une strate qui atteint une borne la garde et le reste est partagé entre les autres, jusqu'à stabilité. Les unités entières sont arrondies par le plus fort reste, en conservant le total.

Champ de surface : la surface de la strate en hectares (area_ha par défaut, tel qu'écrit par la stratification) ; s'il est vide ou absent, la surface du polygone est utilisée.
Champ d'écart-type : l'écart-type pilote des comptages par unité. Sans lui, l'écart-type de la covariable (cov_sd) sert de substitut, ce qui suppose que les comptages suivent la covariable ; sans l'un ni l'autre, l'allocation est proportionnelle.
Champ de moyenne : le comptage moyen pilote par unité, nécessaire aux CV et à un CV cible. Champ de coût : coût de l'inventaire d'une unité dans chaque strate (par exemple en jours de terrain).

Disposition prévue : la correction pour population finie 1 − n·a/A n'est utilisée que si les unités ne se chevaucheront pas (grille systématique, spatialement équilibrée, ou aléatoire simple avec un espacement minimal d'au moins la largeur de l'unité) ; des centres aléatoires simples sans espacement minimal peuvent se chevaucher, une population continue qui n'a pas de telle correction (Cordy 1993). plotwise:estimate applique la même règle.

Sortie : les strates avec n_alloc (unités) et exp_cv (CV attendu de la densité de la strate), et un rapport comparant les allocations égale, proportionnelle et de Neyman pour le même total.</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/allocate.py" line="176"/>
        <source>Layout to come (decides the finite-population correction)</source>
        <translation>Disposition prévue (décide de la correction pour population finie)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/allocate.py" line="176"/>
        <source>Simple random (units may overlap: no correction)</source>
        <translation>Aléatoire simple (les unités peuvent se chevaucher : pas de correction)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/allocate.py" line="176"/>
        <source>Simple random with a minimum spacing of at least the unit&apos;s width</source>
        <translation>Aléatoire simple avec un espacement minimal d'au moins la largeur de l'unité</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/allocate.py" line="176"/>
        <source>Systematic grid</source>
        <translation>Grille systématique</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/allocate.py" line="176"/>
        <source>Spatially balanced</source>
        <translation>Spatialement équilibré</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/allocate.py" line="236"/>
        <source>Layer &apos;{layer}&apos; has no area field: the polygon areas are used.</source>
        <translation>La couche « {layer} » n'a pas de champ de surface : les surfaces des polygones sont utilisées.</translation>
    </message>
</context>
<context>
    <name>BuildFrame</name>
    <message>
        <location filename="../processing/algorithms/buildframe.py" line="35"/>
        <source>Build sampling frame</source>
        <translation>Construire la base de sondage</translation>
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
        <translation>Construit la base de sondage : la partie de la zone d'étude sur laquelle l'inventaire peut se prononcer.

Trois règles sont appliquées dans cet ordre, chacune n'étant comptée que pour la surface encore dans la base au moment où elle s'applique :
1. Les polygones exclus (eau, enclaves privées, ...) sont retirés.
2. Les cellules du raster de masque (bande 1) dont la valeur sort de [minimum, maximum], ou est NoData, sont retirées. Chaque borne peut rester vide. Les cellules de la zone d'étude que le raster ne couvre pas comptent comme NoData. Un raster dans un autre SCR est reprojeté à la volée (plus proche voisin). Exemple : un raster de pente en degrés avec un maximum de 30.
3. Une bande intérieure de la largeur donnée (mètres) le long de la limite de la zone d'étude est retirée.

Le résultat est fusionné en une seule entité valide avec les champs frame_id et area_ha. Le rapport donne la surface conservée, la surface perdue par chaque règle et une carte.

Une zone d'étude en coordonnées géographiques est projetée dans la zone UTM de son centre ; la sortie est dans ce SCR. Les entités vides ou de surface nulle sont ignorées et les géométries invalides réparées, chaque fois avec un avertissement.

Les estimations d'un inventaire sur cette base ne valent que pour la base. Exclure les terrains escarpés ne rend pas le terrain restant sûr : vérifiez l'accès à chaque unité et sa sécurité avant le travail de terrain.</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/buildframe.py" line="59"/>
        <source>Study area</source>
        <translation>Zone d'étude</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/buildframe.py" line="64"/>
        <source>Areas to exclude (water, inholdings, ...)</source>
        <translation>Zones à exclure (eau, enclaves, ...)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/buildframe.py" line="72"/>
        <source>Mask raster (cells outside the range are excluded)</source>
        <translation>Raster de masque (les cellules hors de l'intervalle sont exclues)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/buildframe.py" line="77"/>
        <source>Lowest accepted mask value (empty: no lower limit)</source>
        <translation>Valeur de masque minimale acceptée (vide : pas de limite inférieure)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/buildframe.py" line="85"/>
        <source>Highest accepted mask value (empty: no upper limit)</source>
        <translation>Valeur de masque maximale acceptée (vide : pas de limite supérieure)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/buildframe.py" line="93"/>
        <source>Inward edge buffer (m)</source>
        <translation>Zone tampon intérieure en bordure (m)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/buildframe.py" line="102"/>
        <source>Sampling frame</source>
        <translation>Base de sondage</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/buildframe.py" line="125"/>
        <source>Layer &apos;{layer}&apos;: invalid geometry repaired for feature id(s) {ids}.</source>
        <translation>Couche « {layer} » : géométrie invalide réparée pour le ou les identifiants d'entité {ids}.</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/buildframe.py" line="131"/>
        <source>Layer &apos;{layer}&apos;: empty or zero-area feature id(s) {ids} skipped.</source>
        <translation>Couche « {layer} » : entités vides ou de surface nulle ignorées (identifiants {ids}).</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/buildframe.py" line="187"/>
        <source>MASK_MIN or MASK_MAX is set but no mask raster (MASK) is given. Choose a raster or leave both limits empty.</source>
        <translation>MASK_MIN ou MASK_MAX est renseigné mais aucun raster de masque (MASK) n'est donné. Choisissez un raster ou laissez les deux limites vides.</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/buildframe.py" line="192"/>
        <source>The lowest accepted mask value (MASK_MIN = {lo}) is greater than the highest (MASK_MAX = {hi}). Swap them or leave one empty.</source>
        <translation>La valeur de masque minimale acceptée (MASK_MIN = {lo}) est supérieure à la maximale (MASK_MAX = {hi}). Inversez-les ou laissez-en une vide.</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/buildframe.py" line="202"/>
        <source>Layer &apos;{layer}&apos; (INPUT) has no polygon with a positive area. Choose the study-area polygon layer.</source>
        <translation>La couche « {layer} » (INPUT) n'a aucun polygone de surface positive. Choisissez la couche de polygones de la zone d'étude.</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/buildframe.py" line="219"/>
        <source>Mask raster &apos;{layer}&apos; is given without limits: only its NoData cells are excluded.</source>
        <translation>Le raster de masque « {layer} » est donné sans limites : seules ses cellules NoData sont exclues.</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/buildframe.py" line="226"/>
        <source>Mask raster &apos;{layer}&apos; is not a file raster that GDAL can read. Save it as a GeoTIFF first.</source>
        <translation>Le raster de masque « {layer} » n'est pas un fichier raster lisible par GDAL. Enregistrez-le d'abord en GeoTIFF.</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/buildframe.py" line="230"/>
        <source>Reading mask raster '{layer}'…</source>
        <translation>Chargement du raster de masque « {layer} »…</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/buildframe.py" line="242"/>
        <source>Mask raster reprojected to {crs} on the fly: {rows} × {cols} cells of {size} m.</source>
        <translation>Raster de masque reprojeté à la volée en {crs} : {rows} × {cols} cellules de {size} m.</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/buildframe.py" line="249"/>
        <source>Mask raster &apos;{layer}&apos; does not cover {n} of the {total} cells over the study area&apos;s extent; those cells count as NoData and are excluded.</source>
        <translation>Le raster de masque « {layer} » ne couvre pas {n} des {total} cellules de l'emprise de la zone d'étude ; ces cellules comptent comme NoData et sont exclues.</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/buildframe.py" line="270"/>
        <source>Frame: {kept} ha of {total} ha ({pct} %).</source>
        <translation>Base de sondage : {kept} ha sur {total} ha ({pct} %).</translation>
    </message>
</context>
<context>
    <name>CompareDesigns</name>
    <message>
        <location filename="../processing/algorithms/comparedesigns.py" line="63"/>
        <source>Compare survey designs by simulation</source>
        <translation>Comparer des plans d'inventaire par simulation</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/comparedesigns.py" line="124"/>
        <source>Density surface (expected animals per km²)</source>
        <translation>Surface de densité (animaux attendus par km²)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/comparedesigns.py" line="126"/>
        <source>Sampling frame</source>
        <translation>Base de sondage</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/comparedesigns.py" line="129"/>
        <source>Strata (for the stratified designs)</source>
        <translation>Strates (pour les plans stratifiés)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/comparedesigns.py" line="134"/>
        <source>Stratum field</source>
        <translation>Champ de strate</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/comparedesigns.py" line="139"/>
        <source>Designs to compare</source>
        <translation>Plans à comparer</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/comparedesigns.py" line="139"/>
        <source>Simple random</source>
        <translation>Aléatoire simple</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/comparedesigns.py" line="139"/>
        <source>Stratified, proportional allocation</source>
        <translation>Stratifié, allocation proportionnelle</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/comparedesigns.py" line="139"/>
        <source>Systematic grid</source>
        <translation>Grille systématique</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/comparedesigns.py" line="139"/>
        <source>Spatially balanced</source>
        <translation>Spatialement équilibré</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/comparedesigns.py" line="151"/>
        <source>Number of units</source>
        <translation>Nombre d'unités</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/comparedesigns.py" line="156"/>
        <source>Unit shape</source>
        <translation>Forme de l'unité</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/comparedesigns.py" line="156"/>
        <source>Point station</source>
        <translation>Station ponctuelle</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/comparedesigns.py" line="156"/>
        <source>Square plot</source>
        <translation>Placette carrée</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/comparedesigns.py" line="156"/>
        <source>Circular plot</source>
        <translation>Placette circulaire</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/comparedesigns.py" line="156"/>
        <source>Line transect</source>
        <translation>Transect linéaire</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/comparedesigns.py" line="163"/>
        <source>Unit size (m): counting radius, side, radius or transect length</source>
        <translation>Taille de l'unité (m) : rayon de comptage, côté, rayon ou longueur du transect</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/comparedesigns.py" line="169"/>
        <source>Half-width of a transect&apos;s counting strip (m)</source>
        <translation>Demi-largeur de la bande de comptage d'un transect (m)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/comparedesigns.py" line="175"/>
        <source>Bearing of units and grid (degrees from grid north; −1 random)</source>
        <translation>Azimut des unités et de la grille (degrés depuis le nord de la grille ; −1 aléatoire)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/comparedesigns.py" line="181"/>
        <source>Keep units wholly inside their stratum (as the layout&apos;s option)</source>
        <translation>Garder les unités entièrement dans leur strate (comme l'option de la disposition)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/comparedesigns.py" line="190"/>
        <source>Simulated surveys per design</source>
        <translation>Inventaires simulés par plan</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/comparedesigns.py" line="196"/>
        <source>Overdispersion k of the negative binomial (0: Poisson counts)</source>
        <translation>Surdispersion k de la binomiale négative (0 : comptages de Poisson)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/comparedesigns.py" line="202"/>
        <source>Variance estimator for the grid and balanced designs</source>
        <translation>Estimateur de variance pour les plans en grille et équilibrés</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/comparedesigns.py" line="202"/>
        <source>Simple random sampling formula</source>
        <translation>Formule de l'échantillonnage aléatoire simple</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/comparedesigns.py" line="202"/>
        <source>Local neighbourhood (Stevens &amp; Olsen 2003)</source>
        <translation>Voisinage local (Stevens &amp; Olsen 2003)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/comparedesigns.py" line="210"/>
        <source>Range of units for RMSE against n (e.g. 20, 40, 80 or 20:100:20; empty: none)</source>
        <translation>Gamme d'unités pour la REQM en fonction de n (p. ex. 20, 40, 80 ou 20:100:20 ; vide : aucune)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/comparedesigns.py" line="116"/>
        <source>Design comparison</source>
        <translation>Comparaison des plans</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/comparedesigns.py" line="120"/>
        <source>Recommended design</source>
        <translation>Plan recommandé</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/comparedesigns.py" line="226"/>
        <source>The density surface could not be opened.</source>
        <translation>La surface de densité n'a pas pu être ouverte.</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/comparedesigns.py" line="274"/>
        <source>The sampling frame could not be opened.</source>
        <translation>La base de sondage n'a pas pu être ouverte.</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/comparedesigns.py" line="280"/>
        <source>Layer &apos;{layer}&apos; has no polygon with an area.</source>
        <translation>La couche « {layer} » n'a aucun polygone ayant une surface.</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/comparedesigns.py" line="298"/>
        <source>Layer &apos;{layer}&apos;: field &apos;{field}&apos; is empty (NULL) for feature id(s) {ids}. Give every stratum a value.</source>
        <translation>Couche « {layer} » : le champ « {field} » est vide (NULL) pour les entités {ids}. Donnez une valeur à chaque strate.</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/comparedesigns.py" line="313"/>
        <source>No strata were given: the stratified designs are left out ({names}).</source>
        <translation>Aucune strate n'a été donnée : les plans stratifiés sont écartés ({names}).</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/comparedesigns.py" line="317"/>
        <source>The stratified designs need strata: give the strata layer, or choose another design.</source>
        <translation>Les plans stratifiés ont besoin de strates : donnez la couche des strates, ou choisissez un autre plan.</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/comparedesigns.py" line="235"/>
        <source>Reading the density surface…</source>
        <translation>Chargement de la surface de densité…</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/comparedesigns.py" line="241"/>
        <source>The density surface was warped to {crs} (bilinear) to match the frame.</source>
        <translation>La surface de densité a été reprojetée en {crs} (bilinéaire) pour correspondre à la base de sondage.</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/comparedesigns.py" line="359"/>
        <source>Simulating {n} units…</source>
        <translation>Simulation avec {n} unités…</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/comparedesigns.py" line="365"/>
        <source>{n} units were left out of the range: {why}</source>
        <translation>{n} unités ont été retirées de la gamme : {why}</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/comparedesigns.py" line="374"/>
        <source>The output table could not be created.</source>
        <translation>La table de sortie n'a pas pu être créée.</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/comparedesigns.py" line="264"/>
        <source>Recommended design: {name} (RMSE {rmse:.1f} animals, {rel:.1%} of the total; coverage {cov:.0%}).</source>
        <translation>Plan recommandé : {name} (REQM {rmse:.1f} animaux, {rel:.1%} du total ; couverture {cov:.0%}).</translation>
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
        <translation>Avant le terrain : quel plan, et combien d'unités, donnent une estimation utilisable sur cette zone ? L'algorithme simule de nombreux inventaires d'une surface de densité plausible et indique comment chaque plan s'en est sorti.

Surface : un raster d'animaux attendus par km² (issu d'un modèle d'habitat, d'une carte d'expert ou d'un inventaire antérieur), reprojeté dans le SCR de la base si nécessaire. Base : la base de sondage. Strates (facultatives, avec le champ de strate, 'stratum' par défaut) : nécessaires aux deux plans stratifiés.

Chaque réplique réalise une population : comptages de Poisson dans chaque cellule de la surface ou, avec une surdispersion k supérieure à 0, comptages binomiaux négatifs (gamma-Poisson, variance μ + μ²/k par cellule). Chaque plan choisi est ensuite disposé avec le moteur de disposition, ses unités comptent les animaux des cellules qu'elles couvrent (la partie dans la base ou dans leur strate), et l'abondance est estimée avec le moteur d'estimation (estimateur par le ratio, intervalle t avec ddl de Satterthwaite ; Cochran 1977). Tous les plans inventorient les mêmes populations, si bien que leurs différences ne sont pas brouillées.

Plans : aléatoire simple ; stratifié avec allocation proportionnelle ; stratifié avec allocation de Neyman, n_h ∝ A_h·S_h où S_h est l'écart-type du comptage d'une unité impliqué par la surface (Neyman 1934) : le meilleur cas, puisque aucun inventaire ne connaît le vrai S_h ; grille systématique avec départ aléatoire (son n varie) ; spatialement équilibré (échantillonnage par acceptation équilibrée, Robertson et al. 2013) ; Neyman stratifié d'après un pilote : dans chaque inventaire simulé, S_h est estimé à partir d'un pilote du nombre indiqué d'unités aléatoires simples par strate (d'une réalisation indépendante, une saison pilote), comme l'estimerait un vrai inventaire.

Unités : station ponctuelle (taille = rayon de comptage), placette carrée (côté), placette circulaire (rayon), transect linéaire (longueur, comptage sur une bande de la demi-largeur donnée de chaque côté). Azimut en degrés dans le sens horaire depuis le nord de la grille, −1 aléatoire (la valeur par défaut : une grille alignée sur des bords rectilignes place d'un coup des rangées entières dans la bande de bordure). Les bords suivent le protocole de la disposition : par défaut l'échantillonnage « plus », avec des centres sur chaque strate (ou la base) agrandie de la portée de l'unité, chaque unité ne comptant que les cellules de sa propre strate avec sa surface nominale, et l'estimation étant étendue à la surface agrandie (Gregoire &amp; Valentine 2008, ch. 10) ; avec les unités gardées à l'intérieur, des centres tirés dans chaque strate réduite du rayon de l'unité, comme le fait l'option de la disposition.

Table de sortie, une ligne par plan : rel_bias (biais relatif par rapport au vrai total de chaque population), emp_se (écart-type des erreurs), rmse (racine de l'erreur quadratique moyenne) et rmse_mcse (son erreur type de Monte-Carlo), rel_rmse (rmse / vrai total moyen), mean_cv (CV estimé moyen), coverage (part des intervalles à 95 % contenant la vérité), mean_n (nombre moyen d'unités inventoriées), alloc (unités par strate), recommend (1 pour le plan recommandé : la plus faible REQM parmi les plans dont les intervalles couvrent au moins 90 %).

Gamme d'unités (facultative), p. ex. '20, 40, 80' ou '20:100:20' : la comparaison est répétée pour chaque n et le rapport trace la REQM en fonction de n, montrant où davantage d'effort cesse de payer.

La simulation suppose que la surface est juste et que chaque animal d'une unité est compté. Les résultats ne valent que ce que vaut la surface. Vérifiez l'accès à chaque unité et sa sécurité avant le travail de terrain : l'outil ne rend jamais un emplacement sûr.</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/comparedesigns.py" line="139"/>
        <source>Stratified, Neyman allocation with the true S_h (best case)</source>
        <translation>Stratifié, allocation de Neyman avec le vrai S_h (meilleur cas)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/comparedesigns.py" line="139"/>
        <source>Stratified, Neyman allocation from a pilot survey</source>
        <translation>Stratifié, allocation de Neyman d'après un inventaire pilote</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/comparedesigns.py" line="202"/>
        <source>Local neighbourhood, scaled to the simple formula (our variant)</source>
        <translation>Voisinage local, mis à l'échelle de la formule simple (notre variante)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/comparedesigns.py" line="216"/>
        <source>Pilot units per stratum for the pilot-based Neyman design</source>
        <translation>Unités pilotes par strate pour le plan de Neyman fondé sur un pilote</translation>
    </message>
</context>
<context>
    <name>DemoReserve</name>
    <message>
        <location filename="../processing/algorithms/demoreserve.py" line="33"/>
        <source>Demo reserve with a simulated population</source>
        <translation>Réserve de démonstration avec une population simulée</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/demoreserve.py" line="36"/>
        <source>&lt;p&gt;Builds Hollin Ridge Reserve, an invented upland reserve for demonstrations, training and tests, and a simulated population of the velmar, an invented grazing antelope. Nothing in it describes a real place or species.&lt;/p&gt;&lt;p&gt;The reserve covers 250–350 km² in WGS 84 / UTM zone 36S, with an irregular boundary, a lake and a private inholding (both in the excluded-areas layer), an elevation raster (synthetic fractal terrain with a steep escarpment) and a greenness raster (a vegetation index from 0 to 1, correlated with elevation, plus noise).&lt;/p&gt;&lt;p&gt;The velmar live in groups: an inhomogeneous Thomas cluster process whose group centres are denser where greenness is high and elevation low. The true total is known, and the expected number of animals per km² is written as a raster, so that survey designs and estimates can be checked against the truth.&lt;/p&gt;&lt;h3&gt;Parameters&lt;/h3&gt;&lt;ul&gt;&lt;li&gt;&lt;b&gt;Random seed&lt;/b&gt;: the same seed gives the same reserve and animals. 0 draws a seed and records it.&lt;/li&gt;&lt;li&gt;&lt;b&gt;Raster cell size&lt;/b&gt;: metres, 10 to 500 (default 50).&lt;/li&gt;&lt;/ul&gt;&lt;h3&gt;Outputs&lt;/h3&gt;&lt;ul&gt;&lt;li&gt;Reserve boundary (&lt;i&gt;name&lt;/i&gt;, &lt;i&gt;area_ha&lt;/i&gt;)&lt;/li&gt;&lt;li&gt;Excluded areas (&lt;i&gt;kind&lt;/i&gt; lake or inholding, &lt;i&gt;name&lt;/i&gt;, &lt;i&gt;area_ha&lt;/i&gt;)&lt;/li&gt;&lt;li&gt;Elevation (m), greenness (0–1) and expected velmar per km² rasters&lt;/li&gt;&lt;li&gt;Animals (&lt;i&gt;animal_id&lt;/i&gt;, &lt;i&gt;group_id&lt;/i&gt;)&lt;/li&gt;&lt;li&gt;An HTML report&lt;/li&gt;&lt;/ul&gt;&lt;p&gt;References: Thomas, M. (1949) A generalization of Poisson's binomial limit for use in ecology. Biometrika 36:18–25. Diggle, P. J. (2013) Statistical Analysis of Spatial and Spatio-Temporal Point Patterns, 3rd ed., CRC Press.&lt;/p&gt;</source>
        <translation>&lt;p&gt;Construit Hollin Ridge Reserve, une réserve d'altitude inventée pour les démonstrations, la formation et les tests, et une population simulée de velmar, une antilope brouteuse inventée. Rien ici ne décrit un lieu ou une espèce réels.&lt;/p&gt;&lt;p&gt;La réserve couvre 250–350 km² en WGS 84 / UTM zone 36S, avec une limite irrégulière, un lac et une enclave privée (tous deux dans la couche des zones exclues), un raster d'altitude (relief fractal synthétique avec un escarpement abrupt) et un raster de verdure (un indice de végétation de 0 à 1, corrélé à l'altitude, plus du bruit).&lt;/p&gt;&lt;p&gt;Les velmar vivent en groupes : un processus d'agrégats de Thomas inhomogène dont les centres de groupe sont plus denses là où la verdure est forte et l'altitude basse. Le vrai total est connu, et le nombre attendu d'animaux par km² est écrit dans un raster, afin de pouvoir confronter les plans d'inventaire et les estimations à la vérité.&lt;/p&gt;&lt;h3&gt;Paramètres&lt;/h3&gt;&lt;ul&gt;&lt;li&gt;&lt;b&gt;Graine aléatoire&lt;/b&gt; : la même graine donne la même réserve et les mêmes animaux. 0 en tire une et l'enregistre.&lt;/li&gt;&lt;li&gt;&lt;b&gt;Taille de cellule raster&lt;/b&gt; : en mètres, de 10 à 500 (50 par défaut).&lt;/li&gt;&lt;/ul&gt;&lt;h3&gt;Sorties&lt;/h3&gt;&lt;ul&gt;&lt;li&gt;Limite de la réserve (&lt;i&gt;name&lt;/i&gt;, &lt;i&gt;area_ha&lt;/i&gt;)&lt;/li&gt;&lt;li&gt;Zones exclues (&lt;i&gt;kind&lt;/i&gt; lake ou inholding, &lt;i&gt;name&lt;/i&gt;, &lt;i&gt;area_ha&lt;/i&gt;)&lt;/li&gt;&lt;li&gt;Rasters d'altitude (m), de verdure (0–1) et de velmar attendus par km²&lt;/li&gt;&lt;li&gt;Animaux (&lt;i&gt;animal_id&lt;/i&gt;, &lt;i&gt;group_id&lt;/i&gt;)&lt;/li&gt;&lt;li&gt;Un rapport HTML&lt;/li&gt;&lt;/ul&gt;&lt;p&gt;Références : Thomas, M. (1949) A generalization of Poisson's binomial limit for use in ecology. Biometrika 36:18–25. Diggle, P. J. (2013) Statistical Analysis of Spatial and Spatio-Temporal Point Patterns, 3rd ed., CRC Press.&lt;/p&gt;</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/demoreserve.py" line="63"/>
        <source>Raster cell size (m)</source>
        <translation>Taille de cellule raster (m)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/demoreserve.py" line="69"/>
        <source>Reserve boundary</source>
        <translation>Limite de la réserve</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/demoreserve.py" line="71"/>
        <source>Excluded areas (lake, inholding)</source>
        <translation>Zones exclues (lac, enclave)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/demoreserve.py" line="74"/>
        <source>Elevation (m)</source>
        <translation>Altitude (m)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/demoreserve.py" line="75"/>
        <source>Greenness (0–1)</source>
        <translation>Verdure (0–1)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/demoreserve.py" line="76"/>
        <source>Expected animals per km²</source>
        <translation>Animaux attendus par km²</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/demoreserve.py" line="78"/>
        <source>Simulated animals</source>
        <translation>Animaux simulés</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/demoreserve.py" line="81"/>
        <source>True number of animals</source>
        <translation>Nombre réel d'animaux</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/demoreserve.py" line="82"/>
        <source>Expected number of animals</source>
        <translation>Nombre attendu d'animaux</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/demoreserve.py" line="132"/>
        <source>{name}: {area:,.1f} km², {n:,} velmar in {g:,} groups (expected {e:,.0f}).</source>
        <translation>{name} : {area:,.1f} km², {n:,} velmar en {g:,} groupes (attendus : {e:,.0f}).</translation>
    </message>
</context>
<context>
    <name>DistanceDensity</name>
    <message>
        <location filename="../processing/algorithms/distancedensity.py" line="86"/>
        <source>Density from detection distances (line and point transects)</source>
        <translation>Densité à partir des distances de détection (transects linéaires et ponctuels)</translation>
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
        <translation>Estime la densité et l'abondance par strate et pour la base de sondage à partir des distances auxquelles les animaux (ou les groupes) ont été vus depuis des transects linéaires ou des stations ponctuelles. Une fonction de détection ajustée aux distances donne la probabilité de voir un animal, si bien que l'estimation n'a besoin d'aucune probabilité de détection saisie à la main (Buckland et al. 2001).

Transects ou points : les unités de la disposition (transects linéaires ou stations ponctuelles), avec leur champ d'identifiant (unit_id) et leur champ de strate (stratum). La longueur des lignes vient de la géométrie ; un champ des visites donne les visites de chaque point (vide ou 0 : non inventorié). Chaque unité inventoriée compte, même celles sans détection. Les unités dont le role est 'reserve' sont écartées sauf si une observation les nomme ; donnez le role 'primary' à une réserve inventoriée qui n'a rien vu.

Observations : une table ou une couche de points avec une ligne par détection : l'identifiant de l'unité, la distance en m (perpendiculaire à la ligne pour les transects linéaires, depuis le point pour les transects ponctuels) et, facultativement, la taille du groupe (champ vide : chaque détection est un animal). Une distance négative ou manquante, une taille de groupe non supérieure à 0, ou un identifiant d'unité absent de la couche des unités arrête le traitement, en nommant les observations.

Type d'inventaire : transects linéaires ou ponctuels. Distance de troncature (m) : les détections plus éloignées sont écartées ; 0 écarte les 5 % les plus éloignées (pratique courante). Classes de distance (m, facultatif, p. ex. 0, 10, 25, 50, 100) : pour les inventaires qui notent des classes ; l'ajustement utilise alors les effectifs par classe, et la dernière borne est la distance de troncature.

Fonctions clés : demi-normale, taux de risque (hazard-rate) et uniforme ; chacune est ajustée seule, puis avec des termes en cosinus ajoutés un à un tant que l'AIC s'améliore (au plus le nombre indiqué), sous la contrainte que la détection ne croisse jamais avec la distance. Le modèle de plus petit AIC est utilisé ; la table des modèles liste chaque modèle essayé avec son AIC, l'écart au meilleur, la probabilité de détection, la demi-largeur effective de bande (lignes) ou le rayon effectif de détection (points) et les valeurs p du test d'adéquation (χ² sur des classes de distance ; Cramér–von Mises sur les distances exactes).

Taille des groupes : la taille moyenne des groupes détectés, ou la régression du biais de taille de ln(taille) sur la probabilité de détection quand les grands groupes sont vus plus loin (automatique : quand la pente est négative à p &lt; 0.15, pratique courante).

Une fonction de détection par strate (option) : chaque strate demande alors au moins 20 détections (60 à 80 conseillées, pratique courante) ; sinon une seule fonction sert pour toutes les strates.

Densité : D = n·E(s) / (2wL·P) pour les lignes et n·E(s) / (kπw²·P) pour les points. Variance par la méthode delta : celle du taux de rencontre entre transects dans chaque strate (estimateur R2 de Fewster et al. 2009), celle de la fonction de détection d'après sa vraisemblance, celle de la taille des groupes d'après les tailles ; degrés de liberté de Satterthwaite et intervalle log-normal avec t (Buckland et al. 2001). Les rééchantillonnages bootstrap (0 : aucun) rééchantillonnent les transects ou les points dans les strates et réajustent le modèle choisi, avec graine ; les sorties portent alors l'intervalle des percentiles du bootstrap.

Strates : des polygones avec un champ d'identifiant correspondant au champ de strate des unités ; leurs surfaces définissent la base de sondage (comme dans l'algorithme d'estimation). Chaque strate demande au moins deux unités inventoriées. Il faut au moins 20 détections en deçà de la distance de troncature (une erreur indique leur nombre), 60 sont conseillées (un avertissement).

Niveau de confiance des intervalles ; unité de surface des résultats (km² ou hectares) ; graine aléatoire, utilisée par le bootstrap seulement (0 en tire une et l'enregistre) ; nombre maximal de termes en cosinus par fonction clé (0 : les fonctions clés seules).

Sorties : les strates avec stratum, area, n_units (transects ou points), effort (km de ligne, ou visites de points), n_det (détections en deçà de la distance de troncature), p_det (probabilité de détection en deçà de celle-ci), esw (demi-largeur effective de bande pour les lignes, rayon effectif de détection pour les points, m), dens, abund avec leur erreur type, leurs limites et leur CV, et df ; une table des modèles (model, n_par, aic, delta_aic, p_det, esw, gof_p, chosen, puis stratum, n_det, chisq_p, cvm_p) ; un rapport HTML (histogramme des distances avec la fonction ajustée, modèles, estimations, carte, hypothèses) ; et les valeurs globales pour les modèles.

Références : Buckland, S. T. et al. (2001) Introduction to Distance Sampling, Oxford University Press. Fewster, R. M. et al. (2009) Biometrics 65:225–236.

Sécurité sur le terrain : l'échantillonnage par distance envoie des observateurs le long de lignes et vers des points. Vérifiez l'accès à chaque unité et sa sécurité avant d'y envoyer une équipe : l'outil ne rend jamais un emplacement sûr. Respectez les règles de sécurité sur le terrain de votre organisme et la législation locale.</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/distancedensity.py" line="148"/>
        <source>Transects or points surveyed</source>
        <translation>Transects ou points inventoriés</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/distancedensity.py" line="150"/>
        <source>Unit id field</source>
        <translation>Champ d'identifiant d'unité</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/distancedensity.py" line="152"/>
        <source>Stratum field of the units</source>
        <translation>Champ de strate des unités</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/distancedensity.py" line="155"/>
        <source>Observations (one row per detection)</source>
        <translation>Observations (une ligne par détection)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/distancedensity.py" line="157"/>
        <source>Unit id field of the observations</source>
        <translation>Champ d'identifiant d'unité des observations</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/distancedensity.py" line="160"/>
        <source>Distance field (m)</source>
        <translation>Champ de distance (m)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/distancedensity.py" line="163"/>
        <source>Group size field (empty: each detection is one animal)</source>
        <translation>Champ de taille des groupes (vide : chaque détection est un animal)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/distancedensity.py" line="166"/>
        <source>Survey type</source>
        <translation>Type d'inventaire</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/distancedensity.py" line="166"/>
        <source>Line transects</source>
        <translation>Transects linéaires</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/distancedensity.py" line="166"/>
        <source>Point transects</source>
        <translation>Transects ponctuels</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/distancedensity.py" line="169"/>
        <source>Truncation distance (m; 0: drop the farthest 5 %)</source>
        <translation>Distance de troncature (m ; 0 : écarter les 5 % les plus éloignées)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/distancedensity.py" line="172"/>
        <source>Key functions to try</source>
        <translation>Fonctions clés à essayer</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/distancedensity.py" line="172"/>
        <source>Half-normal</source>
        <translation>Demi-normale</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/distancedensity.py" line="172"/>
        <source>Hazard-rate</source>
        <translation>Taux de risque (hazard-rate)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/distancedensity.py" line="172"/>
        <source>Uniform with cosine terms</source>
        <translation>Uniforme avec termes en cosinus</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/distancedensity.py" line="176"/>
        <source>Strata (the frame)</source>
        <translation>Strates (la base de sondage)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/distancedensity.py" line="178"/>
        <source>Stratum id field of the strata</source>
        <translation>Champ d'identifiant des strates</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/distancedensity.py" line="181"/>
        <source>Confidence level</source>
        <translation>Niveau de confiance</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/distancedensity.py" line="184"/>
        <source>Area unit of the results</source>
        <translation>Unité de surface des résultats</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/distancedensity.py" line="184"/>
        <source>km²</source>
        <translation>km²</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/distancedensity.py" line="184"/>
        <source>hectares</source>
        <translation>hectares</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/distancedensity.py" line="189"/>
        <source>Strata with distance estimates</source>
        <translation>Strates avec les estimations par distance</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/distancedensity.py" line="191"/>
        <source>Detection function models</source>
        <translation>Modèles de fonction de détection</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/distancedensity.py" line="194"/>
        <source>Overall density</source>
        <translation>Densité globale</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/distancedensity.py" line="194"/>
        <source>Overall abundance</source>
        <translation>Abondance globale</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/distancedensity.py" line="194"/>
        <source>Lower confidence limit of the abundance</source>
        <translation>Limite inférieure de confiance de l'abondance</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/distancedensity.py" line="194"/>
        <source>Upper confidence limit of the abundance</source>
        <translation>Limite supérieure de confiance de l'abondance</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/distancedensity.py" line="194"/>
        <source>CV of the overall estimate</source>
        <translation>CV de l'estimation globale</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/distancedensity.py" line="194"/>
        <source>Detection probability within the truncation distance</source>
        <translation>Probabilité de détection en deçà de la distance de troncature</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/distancedensity.py" line="194"/>
        <source>Effective strip half-width or detection radius (m)</source>
        <translation>Demi-largeur effective de bande ou rayon effectif de détection (m)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/distancedensity.py" line="205"/>
        <source>Visits field of the points (empty: one visit each)</source>
        <translation>Champ des visites des points (vide : une visite chacun)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/distancedensity.py" line="208"/>
        <source>Distance bands (m, from 0, comma-separated; empty: exact distances)</source>
        <translation>Classes de distance (m, depuis 0, séparées par des virgules ; vide : distances exactes)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/distancedensity.py" line="211"/>
        <source>Most cosine terms per key function</source>
        <translation>Nombre maximal de termes en cosinus par fonction clé</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/distancedensity.py" line="214"/>
        <source>Group size</source>
        <translation>Taille des groupes</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/distancedensity.py" line="214"/>
        <source>Automatic: mean, or size-bias regression when larger groups are seen farther</source>
        <translation>Automatique : moyenne, ou régression du biais de taille si les grands groupes sont vus plus loin</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/distancedensity.py" line="214"/>
        <source>Mean of the detected groups</source>
        <translation>Moyenne des groupes détectés</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/distancedensity.py" line="214"/>
        <source>Size-bias regression</source>
        <translation>Régression du biais de taille</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/distancedensity.py" line="218"/>
        <source>One detection function per stratum</source>
        <translation>Une fonction de détection par strate</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/distancedensity.py" line="220"/>
        <source>Bootstrap resamples over transects (0: none)</source>
        <translation>Rééchantillonnages bootstrap sur les transects (0 : aucun)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/distancedensity.py" line="232"/>
        <source>The distance bands &apos;{text}&apos; are not numbers. Write the band edges in m, from 0, separated by commas, e.g. 0, 10, 25, 50, 100.</source>
        <translation>Les classes de distance « {text} » ne sont pas des nombres. Écrivez les bornes des classes en m, depuis 0, séparées par des virgules, p. ex. 0, 10, 25, 50, 100.</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/distancedensity.py" line="242"/>
        <source>Layer &apos;{layer}&apos; has no features.</source>
        <translation>La couche « {layer} » n'a aucune entité.</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/distancedensity.py" line="246"/>
        <source>Layer &apos;{layer}&apos; holds {kinds} geometries, but the survey type is {survey}. Choose the survey type that matches the units (line transects need lines, point transects points).</source>
        <translation>La couche « {layer} » contient des géométries {kinds}, mais le type d'inventaire est : {survey}. Choisissez le type d'inventaire qui correspond aux unités (les transects linéaires demandent des lignes, les transects ponctuels des points).</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/distancedensity.py" line="246"/>
        <source>line transects</source>
        <translation>transects linéaires</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/distancedensity.py" line="246"/>
        <source>point transects</source>
        <translation>transects ponctuels</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/distancedensity.py" line="259"/>
        <source>{n} reserve unit(s) without observations were left out (not surveyed).</source>
        <translation>{n} unité(s) de réserve sans observation ont été écartée(s) (non inventoriée(s)).</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/distancedensity.py" line="280"/>
        <source>Layer &apos;{layer}&apos;: the points {ids} have a number of visits in the field &apos;{field}&apos; that is not a whole number of 0 or more. Correct them.</source>
        <translation>Couche « {layer} » : les points {ids} ont dans le champ « {field} » un nombre de visites qui n'est pas un nombre entier supérieur ou égal à 0. Corrigez-les.</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/distancedensity.py" line="286"/>
        <source>Layer &apos;{layer}&apos;: observations name the points {ids}, whose visits field &apos;{field}&apos; is empty or 0. Give them their number of visits, or correct the observations&apos; unit ids.</source>
        <translation>Couche « {layer} » : des observations nomment les points {ids}, dont le champ des visites « {field} » est vide ou vaut 0. Donnez-leur leur nombre de visites, ou corrigez les identifiants d'unité des observations.</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/distancedensity.py" line="292"/>
        <source>{n} point(s) with no visits were left out (not surveyed).</source>
        <translation>{n} point(s) sans visite ont été écarté(s) (non inventorié(s)).</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/distancedensity.py" line="301"/>
        <source>Layer &apos;{layer}&apos; has no stratum id field matching the units&apos; field &apos;{field}&apos;. Choose the strata layer&apos;s id field, or give a frame layer of one polygon to treat the frame as one stratum.</source>
        <translation>La couche « {layer} » n'a pas de champ d'identifiant de strate correspondant au champ « {field} » des unités. Choisissez le champ d'identifiant de la couche des strates, ou donnez une couche de base de sondage d'un seul polygone pour traiter la base comme une seule strate.</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/distancedensity.py" line="305"/>
        <source>Layer &apos;{layer}&apos; is one polygon without a stratum id field: the frame is treated as one stratum.</source>
        <translation>La couche « {layer} » est un seul polygone sans champ d'identifiant de strate : la base de sondage est traitée comme une seule strate.</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/distancedensity.py" line="313"/>
        <source>Layer &apos;{layer}&apos; has no polygons with an area.</source>
        <translation>La couche « {layer} » n'a aucun polygone ayant une surface.</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/distancedensity.py" line="431"/>
        <source>Detection function{where}: {model}, P = {p:.3f}, effective width {esw:.1f} m, {n} detections.</source>
        <translation>Fonction de détection{where} : {model}, P = {p:.3f}, largeur effective {esw:.1f} m, {n} détections.</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/distancedensity.py" line="435"/>
        <source>Overall abundance {n:,.1f} ({lo:,.1f} to {hi:,.1f}), CV {cv:.3f}.</source>
        <translation>Abondance globale {n:,.1f} ({lo:,.1f} à {hi:,.1f}), CV {cv:.3f}.</translation>
    </message>
</context>
<context>
    <name>Estimate</name>
    <message>
        <location filename="../processing/algorithms/estimate.py" line="74"/>
        <source>Estimate density and abundance</source>
        <translation>Estimer la densité et l'abondance</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/estimate.py" line="139"/>
        <source>Sample units with counts</source>
        <translation>Unités d'échantillonnage avec comptages</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/estimate.py" line="141"/>
        <source>Count field</source>
        <translation>Champ de comptage</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/estimate.py" line="143"/>
        <source>Stratum field of the units</source>
        <translation>Champ de strate des unités</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/estimate.py" line="146"/>
        <source>Unit area field (m²)</source>
        <translation>Champ de surface d'unité (m²)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/estimate.py" line="149"/>
        <source>Fixed unit area for points and lines (m²; 0: not used)</source>
        <translation>Surface d'unité fixe pour les points et les lignes (m² ; 0 : non utilisée)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/estimate.py" line="152"/>
        <source>Strip width of line transects (m, full width; 0: not used)</source>
        <translation>Largeur de bande des transects linéaires (m, largeur totale ; 0 : non utilisée)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/estimate.py" line="155"/>
        <source>Strata (the frame)</source>
        <translation>Strates (la base de sondage)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/estimate.py" line="157"/>
        <source>Stratum id field of the strata</source>
        <translation>Champ d'identifiant des strates</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/estimate.py" line="160"/>
        <source>Confidence level</source>
        <translation>Niveau de confiance</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/estimate.py" line="163"/>
        <source>Confidence interval</source>
        <translation>Intervalle de confiance</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/estimate.py" line="163"/>
        <source>t with Satterthwaite degrees of freedom</source>
        <translation>t avec les degrés de liberté de Satterthwaite</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/estimate.py" line="163"/>
        <source>Log-normal</source>
        <translation>Log-normal</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/estimate.py" line="163"/>
        <source>Stratified bootstrap (2,000 resamples)</source>
        <translation>Bootstrap stratifié (2 000 rééchantillonnages)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/estimate.py" line="167"/>
        <source>Finite-population correction</source>
        <translation>Correction pour population finie</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/estimate.py" line="169"/>
        <source>Detection probability p (from a separate study; 1: all seen)</source>
        <translation>Probabilité de détection p (d'une étude distincte ; 1 : tous vus)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/estimate.py" line="172"/>
        <source>Standard error of p</source>
        <translation>Erreur type de p</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/estimate.py" line="175"/>
        <source>Area unit of the results</source>
        <translation>Unité de surface des résultats</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/estimate.py" line="175"/>
        <source>km²</source>
        <translation>km²</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/estimate.py" line="175"/>
        <source>hectares</source>
        <translation>hectares</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/estimate.py" line="178"/>
        <source>Target CV for the next survey (0: not used; e.g. 0.15)</source>
        <translation>CV cible pour le prochain inventaire (0 : non utilisé ; p. ex. 0.15)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/estimate.py" line="187"/>
        <source>Variance estimator</source>
        <translation>Estimateur de variance</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/estimate.py" line="187"/>
        <source>Simple random sampling formula</source>
        <translation>Formule de l'échantillonnage aléatoire simple</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/estimate.py" line="187"/>
        <source>Local neighbourhood (systematic or spatially balanced layouts)</source>
        <translation>Voisinage local (dispositions systématiques ou spatialement équilibrées)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/estimate.py" line="192"/>
        <source>The count field holds presence (1) / absence (0)</source>
        <translation>Le champ de comptage contient présence (1) / absence (0)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/estimate.py" line="194"/>
        <source>Leave out strata with no surveyed unit (the frame shrinks)</source>
        <translation>Écarter les strates sans unité inventoriée (la base se réduit)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/estimate.py" line="197"/>
        <source>True total of a simulated population (simulations and training only; 0: none)</source>
        <translation>Vrai total d'une population simulée (simulations et formation uniquement ; 0 : aucun)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/estimate.py" line="202"/>
        <source>Strata with estimates</source>
        <translation>Strates avec estimations</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/estimate.py" line="204"/>
        <source>Estimate table</source>
        <translation>Table des estimations</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/estimate.py" line="207"/>
        <source>Overall density</source>
        <translation>Densité globale</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/estimate.py" line="207"/>
        <source>SE of the overall density</source>
        <translation>Erreur type de la densité globale</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/estimate.py" line="207"/>
        <source>Overall abundance</source>
        <translation>Abondance globale</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/estimate.py" line="207"/>
        <source>Lower confidence limit of the abundance</source>
        <translation>Limite inférieure de confiance de l'abondance</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/estimate.py" line="207"/>
        <source>Upper confidence limit of the abundance</source>
        <translation>Limite supérieure de confiance de l'abondance</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/estimate.py" line="207"/>
        <source>CV of the overall estimate</source>
        <translation>CV de l'estimation globale</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/estimate.py" line="277"/>
        <source>Layer &apos;{layer}&apos; has no stratum id field matching the units&apos; field &apos;{field}&apos;. Choose the strata layer&apos;s id field (plotwise:stratify writes &apos;stratum&apos;), or give a frame layer of one polygon to treat the frame as one stratum.</source>
        <translation>La couche « {layer} » n'a pas de champ d'identifiant de strate correspondant au champ « {field} » des unités. Choisissez le champ d'identifiant de la couche des strates (plotwise:stratify écrit 'stratum'), ou donnez une couche de base de sondage d'un seul polygone pour traiter la base comme une seule strate.</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/estimate.py" line="282"/>
        <source>Layer &apos;{layer}&apos; is one polygon without a stratum id field: the frame is treated as one stratum, and the units&apos; field &apos;{field}&apos; is not used. If the units were allocated to strata unequally, give the strata instead: an unstratified mean is then biased.</source>
        <translation>La couche « {layer} » est un seul polygone sans champ d'identifiant de strate : la base est traitée comme une seule strate, et le champ « {field} » des unités n'est pas utilisé. Si les unités ont été allouées aux strates de façon inégale, donnez plutôt les strates : une moyenne non stratifiée est alors biaisée.</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/estimate.py" line="311"/>
        <source>Layer &apos;{layer}&apos; has no features.</source>
        <translation>La couche « {layer} » n'a aucune entité.</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/estimate.py" line="317"/>
        <source>Layer &apos;{layer}&apos; has no polygons with an area.</source>
        <translation>La couche « {layer} » n'a aucun polygone ayant une surface.</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/estimate.py" line="240"/>
        <source>{n} unused reserve unit(s) without a count were skipped.</source>
        <translation>{n} unité(s) de réserve non utilisée(s) sans comptage ont été ignorée(s).</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/estimate.py" line="252"/>
        <source>Overall abundance {n:,.1f} ({lo:,.1f} to {hi:,.1f}), CV {cv:.3f}.</source>
        <translation>Abondance globale {n:,.1f} ({lo:,.1f} à {hi:,.1f}), CV {cv:.3f}.</translation>
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
        <translation>Estime la densité et l'abondance par strate et pour toute la base de sondage à partir des comptages dans les unités d'échantillonnage, avec erreur type, coefficient de variation (CV) et intervalle de confiance, ainsi que la taille d'échantillon nécessaire au prochain inventaire.

Estimateur : D_h = Σy / Σa par strate (l'estimateur par le ratio ; avec des unités égales, le comptage moyen divisé par la surface d'une unité), avec sa variance linéarisée (Cochran 1977, ch. 5 et 6) ; abondance N_h = D_h·A_h ; au total N = Σ N_h et D = N / Σ A_h, les variances s'additionnant.

Correction pour population finie : 1 − Σa/A_h, seulement pour des unités qui ne peuvent pas se chevaucher (une population finie d'unités tirées sans remise, Cochran 1977, §2.4). Les unités issues de plotwise:layout enregistrent leur plan (champ design) : la correction est refusée, avec un avertissement, dans les strates disposées par centres aléatoires simples sans espacement minimal d'au moins la largeur de l'unité (leurs unités peuvent se chevaucher : une population continue, Cordy 1993). Pour des unités sans cet enregistrement, c'est votre choix, et le rapport énonce l'hypothèse qu'elles ne se chevauchent pas.

Bords : les unités disposées par échantillonnage « plus » (champ edge = plus, le choix par défaut de la disposition) ne comptent que dans leur strate, et les comptages sont étendus à la strate agrandie de la portée de l'unité (champ reach_m), N_h = A⁺_h·Σy/Σa (Gregoire &amp; Valentine 2008, ch. 10), ce qui supprime le biais aux bords.

Comptages : un comptage NULL signifie que l'unité n'a pas été inventoriée : elle est écartée et listée comme non-réponse. Les unités de réserve (role = reserve) sans comptage sont des réserves non utilisées et sont ignorées sans avertissement ; les réserves inventoriées comptent comme toute autre unité. 0 signifie inventoriée, aucun animal vu. Des comptages négatifs ou non numériques arrêtent le traitement, en nommant les unités.

Surface d'une unité (m²) : le champ de surface d'unité (area_m2 par défaut, tel que l'écrit la disposition) s'il est supérieur à 0, sinon la surface du polygone, sinon pour les lignes la largeur de bande × la longueur de la ligne, sinon la surface d'unité fixe pour les points et les lignes.

Strates : des polygones avec un champ d'identifiant correspondant au champ de strate des unités ; leurs surfaces définissent la base de sondage. Quand les unités n'ont pas de champ de strate, ou que la couche des strates est un seul polygone sans champ d'identifiant, toutes les unités forment une seule strate sur la base. Une strate avec une seule unité inventoriée est associée à une partenaire fixée avant que les comptages ne soient vus (la strate qui partage la plus longue limite sur la carte, sinon la suivante dans l'ordre des identifiants) et tire sa variance de la formule des paires de strates regroupées (Cochran 1977, §5A.12 ; Hansen, Hurwitz &amp; Madow 1953 pour des tailles inégales), avec 1 degré de liberté et un avertissement ; la partenaire garde sa propre variance. Une strate sans unité inventoriée est une erreur, sauf si vous choisissez de l'écarter : la base se réduit alors, et le rapport le dit. Les strates ne doivent pas se chevaucher (un chevauchement de plus de 0,1 % de la plus petite strate est une erreur, un plus petit un avertissement), et chaque polygone de strate doit porter son identifiant : un polygone sans identifiant est une erreur, sauf si les strates sans unité inventoriée peuvent être écartées.

Intervalles : t avec les degrés de liberté de Satterthwaite (Satterthwaite 1946 ; Cochran 1977) ; log-normal, de N/C à N·C avec C = exp(t_df·√ln(1+CV²)), t avec les mêmes degrés de liberté (Buckland et al. 2001, §3.6.1 ; le quantile normal seulement pour des ddl infinis, Burnham et al. 1987) ; ou un bootstrap stratifié des percentiles, remis à l'échelle, sur 2 000 rééchantillonnages (avec graine ; Rao &amp; Wu 1988), qui tient compte de la correction pour population finie. Là où tous les comptages valent 0, l'intervalle est unilatéral, de 0 à la limite supérieure de Poisson −ln(1 − niveau)·A/Σa (Garwood 1936 ; environ 3·A/Σa à 95 %), divisée par p.

Variance : la formule de l'échantillonnage aléatoire simple, ou l'estimateur de voisinage local (Stevens &amp; Olsen 2003) pour les grilles systématiques et les dispositions spatialement équilibrées, où la formule simple surestime la variance, avec les degrés de liberté de sa forme quadratique (Box 1954) ; ou notre variante de cet estimateur, mise à l'échelle par n / Σ(1 − Σw²) pour qu'elle concorde avec la formule simple là où il n'y a pas de structure spatiale (la somme publiée y est inférieure d'environ un quart).

Détection : avec une probabilité de détection p inférieure à 1, les estimations sont divisées par p et les CV au carré s'additionnent (méthode delta, Seber 1982). p et son erreur type doivent provenir d'une étude distincte ; ses degrés de liberté (0 : p est considéré comme connu) entrent dans ceux de l'intervalle selon la règle de Satterthwaite (Buckland et al. 2001, éq. 3.75). Une erreur type supérieure à p/2 donne un avertissement.

Données de présence : avec l'option présence, un champ 0/1 donne la proportion stratifiée d'unités où l'espèce a été détectée (occupation naïve, non corrigée de la détection), et abund est le nombre d'unités occupées dans la base.

CV cible (supérieur à 0) : n_next est le nombre d'unités dont chaque strate aura besoin la prochaine fois pour ce CV de l'abondance globale, par allocation de Neyman sur les écarts-types qu'implique l'estimateur de variance (Neyman 1934 ; Cochran 1977, éq. 5.26), au moins 2 et au plus les unités que contient une strate.

Vrai total : pour les simulations et la formation uniquement. Le rapport l'affiche alors à côté de l'estimation ; dans un vrai inventaire, le vrai total n'est jamais connu.

Sorties : les polygones des strates avec les champs d'estimation (pour une carte choroplèthe), une table avec une ligne par strate et une ligne 'all', un rapport HTML, et les valeurs globales pour les modèles.</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/estimate.py" line="182"/>
        <source>Degrees of freedom of the detection estimate (0: p known)</source>
        <translation>Degrés de liberté de l'estimation de la détection (0 : p connu)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/estimate.py" line="187"/>
        <source>Local neighbourhood, scaled to the simple formula (our variant)</source>
        <translation>Voisinage local, mis à l'échelle de la formule simple (notre variante)</translation>
    </message>
</context>
<context>
    <name>ExampleChain</name>
    <message>
        <location filename="../scripts/build_models.py" line="114"/>
        <source>Units with counts</source>
        <translation>Unités avec comptages</translation>
    </message>
    <message>
        <location filename="../scripts/build_models.py" line="117"/>
        <source>Estimate by stratum</source>
        <translation>Estimation par strate</translation>
    </message>
    <message>
        <location filename="../scripts/build_models.py" line="117"/>
        <source>Estimate report</source>
        <translation>Rapport d'estimation</translation>
    </message>
    <message>
        <location filename="../scripts/build_models.py" line="117"/>
        <source>Estimate table</source>
        <translation>Table des estimations</translation>
    </message>
    <message>
        <location filename="../scripts/build_models.py" line="105"/>
        <source>Animal points</source>
        <translation>Points des animaux</translation>
    </message>
    <message>
        <location filename="../scripts/build_models.py" line="109"/>
        <source>Detection probability</source>
        <translation>Probabilité de détection</translation>
    </message>
    <message>
        <location filename="../scripts/build_models.py" line="112"/>
        <source>Random seed (0 draws one)</source>
        <translation>Graine aléatoire (0 en tire une)</translation>
    </message>
    <message>
        <location filename="../scripts/build_models.py" line="107"/>
        <source>Strata</source>
        <translation>Strates</translation>
    </message>
    <message>
        <location filename="../scripts/build_models.py" line="103"/>
        <source>Sample units</source>
        <translation>Unités d'échantillonnage</translation>
    </message>
    <message>
        <location filename="../scripts/build_models.py" line="88"/>
        <source>Strata with units allocated</source>
        <translation>Strates avec unités allouées</translation>
    </message>
    <message>
        <location filename="../scripts/build_models.py" line="80"/>
        <source>Sampling frame</source>
        <translation>Base de sondage</translation>
    </message>
    <message>
        <location filename="../scripts/build_models.py" line="93"/>
        <source>Layout report</source>
        <translation>Rapport de disposition</translation>
    </message>
    <message>
        <location filename="../scripts/build_models.py" line="93"/>
        <source>Waypoints (GPX)</source>
        <translation>Points de passage (GPX)</translation>
    </message>
    <message>
        <location filename="../scripts/build_models.py" line="69"/>
        <source>Covariate rasters</source>
        <translation>Rasters de covariables</translation>
    </message>
    <message>
        <location filename="../scripts/build_models.py" line="62"/>
        <source>Excluded areas</source>
        <translation>Zones exclues</translation>
    </message>
    <message>
        <location filename="../scripts/build_models.py" line="66"/>
        <source>Steepest slope surveyed (degrees)</source>
        <translation>Pente maximale inventoriée (degrés)</translation>
    </message>
    <message>
        <location filename="../scripts/build_models.py" line="71"/>
        <source>Number of strata</source>
        <translation>Nombre de strates</translation>
    </message>
    <message>
        <location filename="../scripts/build_models.py" line="75"/>
        <source>Side of the square plots (m)</source>
        <translation>Côté des placettes carrées (m)</translation>
    </message>
    <message>
        <location filename="../scripts/build_models.py" line="64"/>
        <source>Slope raster (degrees)</source>
        <translation>Raster de pente (degrés)</translation>
    </message>
    <message>
        <location filename="../scripts/build_models.py" line="60"/>
        <source>Study area</source>
        <translation>Zone d'étude</translation>
    </message>
    <message>
        <location filename="../scripts/build_models.py" line="73"/>
        <source>Total number of units</source>
        <translation>Nombre total d'unités</translation>
    </message>
    <message>
        <location filename="../processing/provider.py" line="51"/>
        <source>Example chain: plan a survey (frame, strata, effort, layout)</source>
        <translation>Chaîne d'exemple : planifier un inventaire (base de sondage, strates, effort, disposition)</translation>
    </message>
    <message>
        <location filename="../processing/provider.py" line="51"/>
        <source>Builds the sampling frame (study area minus exclusions and cells over the slope limit), draws k-means strata from the covariate rasters, allocates the units by Neyman allocation with the covariate standard deviation as a proxy, and lays out spatially balanced square plots with 3 reserve units per stratum. Open it in the modeler to change any step. Check every unit&apos;s access and safety before sending a team: the tool never makes a location safe. Follow your agency&apos;s field-safety rules and local law.</source>
        <translation>Construit la base de sondage (zone d'étude moins les exclusions et les cellules au-delà de la pente limite), forme des strates par k-moyennes à partir des rasters de covariables, répartit les unités par allocation de Neyman avec l'écart-type de la covariable comme substitut, et dispose des placettes carrées spatialement équilibrées avec 3 unités de réserve par strate. Ouvrez-la dans le modeleur pour modifier une étape. Vérifiez l'accès à chaque unité et sa sécurité avant d'y envoyer une équipe : l'outil ne rend jamais un emplacement sûr. Respectez les règles de sécurité sur le terrain de votre organisme et la législation locale.</translation>
    </message>
    <message>
        <location filename="../processing/provider.py" line="61"/>
        <source>Example chain: estimate from simulated counts</source>
        <translation>Chaîne d'exemple : estimer à partir de comptages simulés</translation>
    </message>
    <message>
        <location filename="../processing/provider.py" line="61"/>
        <source>For training: fills the units&apos; count field from a simulated population, then estimates density and abundance per stratum and overall. With real fieldwork, run the estimate on the counted units instead.</source>
        <translation>Pour la formation : remplit le champ de comptage des unités à partir d'une population simulée, puis estime la densité et l'abondance par strate et au total. Avec un vrai travail de terrain, lancez plutôt l'estimation sur les unités comptées.</translation>
    </message>
    <message>
        <location filename="../processing/provider.py" line="90"/>
        <source>Example chains</source>
        <translation>Chaînes d'exemple</translation>
    </message>
</context>
<context>
    <name>LayoutUnits</name>
    <message>
        <location filename="../processing/algorithms/layout.py" line="41"/>
        <source>Lay out sample units</source>
        <translation>Disposer les unités d'échantillonnage</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/layout.py" line="88"/>
        <source>Sampling frame or strata</source>
        <translation>Base de sondage ou strates</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/layout.py" line="92"/>
        <source>Stratum field (empty: the frame is one stratum)</source>
        <translation>Champ de strate (vide : la base forme une seule strate)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/layout.py" line="98"/>
        <source>Units per stratum field (e.g. n_alloc; empty: split the total by area)</source>
        <translation>Champ d'unités par strate (p. ex. n_alloc ; vide : total réparti selon la surface)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/layout.py" line="104"/>
        <source>Total number of units (when no units field is given)</source>
        <translation>Nombre total d'unités (sans champ d'unités)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/layout.py" line="110"/>
        <source>Design</source>
        <translation>Plan</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/layout.py" line="110"/>
        <source>Simple random</source>
        <translation>Aléatoire simple</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/layout.py" line="110"/>
        <source>Systematic grid</source>
        <translation>Grille systématique</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/layout.py" line="110"/>
        <source>Spatially balanced</source>
        <translation>Spatialement équilibré</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/layout.py" line="116"/>
        <source>Unit shape</source>
        <translation>Forme de l'unité</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/layout.py" line="116"/>
        <source>Point station</source>
        <translation>Station ponctuelle</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/layout.py" line="116"/>
        <source>Square plot</source>
        <translation>Placette carrée</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/layout.py" line="116"/>
        <source>Circular plot</source>
        <translation>Placette circulaire</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/layout.py" line="116"/>
        <source>Line transect</source>
        <translation>Transect linéaire</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/layout.py" line="123"/>
        <source>Unit size (m): square side, circle radius, transect length, point counting radius</source>
        <translation>Taille de l'unité (m) : côté du carré, rayon du cercle, longueur du transect, rayon de comptage du point</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/layout.py" line="129"/>
        <source>Bearing (degrees from grid north; -1: random)</source>
        <translation>Azimut (degrés depuis le nord de la grille ; -1 : aléatoire)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/layout.py" line="140"/>
        <source>Minimum spacing between unit centres (m; 0: none)</source>
        <translation>Espacement minimal entre les centres des unités (m ; 0 : aucun)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/layout.py" line="146"/>
        <source>Reserve units per stratum</source>
        <translation>Unités de réserve par strate</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/layout.py" line="153"/>
        <source>Sample units</source>
        <translation>Unités d'échantillonnage</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/layout.py" line="154"/>
        <source>Waypoints for GPS (GPX)</source>
        <translation>Points de passage pour GPS (GPX)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/layout.py" line="154"/>
        <source>GPX files (*.gpx)</source>
        <translation>Fichiers GPX (*.gpx)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/layout.py" line="218"/>
        <source>Stratum field &apos;{field}&apos; of layer &apos;{layer}&apos;</source>
        <translation>Champ de strate « {field} » de la couche « {layer} »</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/layout.py" line="218"/>
        <source>Units field &apos;{field}&apos; of layer &apos;{layer}&apos;</source>
        <translation>Champ d'unités « {field} » de la couche « {layer} »</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/layout.py" line="235"/>
        <source>Layer &apos;{layer}&apos;: {text}</source>
        <translation>Couche « {layer} » : {text}</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/layout.py" line="239"/>
        <source>No unit could be placed in layer &apos;{layer}&apos;. Ask for more units or use another design.</source>
        <translation>Aucune unité n'a pu être placée dans la couche « {layer} ». Demandez plus d'unités ou utilisez un autre plan.</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/layout.py" line="266"/>
        <source>{n} waypoints written to {path}</source>
        <translation>{n} points de passage écrits dans {path}</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/layout.py" line="192"/>
        <source>{stratum}: {n} primary and {r} reserve units</source>
        <translation>{stratum} : {n} unités principales et {r} de réserve</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/layout.py" line="270"/>
        <source>the frame</source>
        <translation>la base de sondage</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/layout.py" line="270"/>
        <source>stratum {key}</source>
        <translation>strate {key}</translation>
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
        <translation>Tire les unités d'échantillonnage d'un inventaire sur une base de sondage, strate par strate (une strate par valeur du champ de strate ; sans lui, la base forme une seule strate).

Unités par strate : le champ d'unités (par exemple n_alloc de l'étape d'allocation ; le même nombre entier sur chaque entité d'une strate), sinon le total réparti proportionnellement à la surface avec au moins 2 par strate.

Plans :
• Aléatoire simple : points indépendants, uniformes sur la strate (triangles choisis selon leur surface, puis un point à l'intérieur ; Turk 1990).
• Grille systématique : une grille carrée de pas √(A/n) avec un départ aléatoire ; avec un azimut de −1 la grille reçoit aussi une rotation aléatoire, sinon elle est orientée selon l'azimut. Le nombre d'unités obtenu varie autour de n et il est indiqué.
• Spatialement équilibré : échantillonnage par acceptation équilibrée sur une suite de Halton (Robertson et al. 2013). Chaque début de l'ordre de tirage est lui-même réparti uniformément, si bien que les réserves sont les points suivants de la même suite. Le départ est un point aléatoire uniforme de la strate, ce qui garde l'inclusion égale pour toute taille d'échantillon.

Formes : station ponctuelle (taille : rayon de comptage facultatif, m), placette carrée (taille : côté, m), placette circulaire (taille : rayon, m), transect linéaire (taille : longueur, m ; centré sur le point tiré). Azimut en degrés dans le sens horaire depuis le nord de la grille, ou −1 pour un azimut aléatoire par unité.
Bords : par défaut échantillonnage « plus » (Gregoire &amp; Valentine 2008, ch. 10) : les centres sont tirés sur la strate agrandie de la portée R de l'unité (son rayon circonscrit), et une unité proche du bord ou au-delà n'est inventoriée qu'à l'intérieur de sa propre strate (ne comptez que les animaux situés dans la strate ; un centre peut se trouver hors de celle-ci, voire hors de la base de sondage : ne pénétrez jamais dans un terrain exclu parce que dangereux, inventoriez la partie intérieure depuis l'intérieur). Chaque animal a alors la même chance d'être compté, et plotwise:estimate étend les comptages à la surface agrandie. Garder les unités à l'intérieur tire plutôt les centres dans la strate réduite de R, si bien que chaque unité est entièrement dans sa strate mais que la bande de bordure n'est jamais atteinte (biais là où les animaux proches du bord diffèrent). La surface effective (agrandie ou réduite) est indiquée et utilisée pour les probabilités d'inclusion.
Espacement minimal (m) entre les centres de toutes les unités, principales et de réserve, sur toute la disposition.
Réserves : unités supplémentaires par strate, role = reserve, dans l'ordre de tirage. Règle de remplacement : une unité principale qui ne peut pas être inventoriée est remplacée par la réserve suivante non utilisée de la même strate.

Champs de sortie : unit_id, stratum, role, draw_ord, area_m2, incl_p (n·a/A ; pour les transects et les points sans rayon, la densité d'inclusion n/A par m²), weight = 1/incl_p, lon/lat (WGS 84), un champ count vide pour les équipes de terrain, et l'enregistrement du plan pour l'estimation : design (random, random_sep, grid, grid_ovl ou balanced : si les unités peuvent se chevaucher, ce qui décide de la correction pour population finie), edge (plus ou inside) et reach_m (R, m). Le fichier GPX contient un point de passage par unité (un point de début et un de fin par transect), nommé par unit_id.

Les strates ne doivent pas se chevaucher : un chevauchement de plus de 0,1 % de la plus petite strate est une erreur, un plus petit un avertissement. Les entités de moins de 1 m² (liserés) sont écartées, avec un avertissement.

Une base de sondage en coordonnées géographiques est projetée dans la zone UTM de son centre. Vérifiez l'accès à chaque unité et sa sécurité avant le travail de terrain : l'outil ne rend jamais un emplacement sûr.</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/layout.py" line="135"/>
        <source>Keep every unit wholly inside its stratum (off: plus sampling)</source>
        <translation>Garder chaque unité entièrement dans sa strate (désactivé : échantillonnage « plus »)</translation>
    </message>
</context>
<context>
    <name>Occupancy</name>
    <message>
        <location filename="../processing/algorithms/occupancy.py" line="57"/>
        <source>Estimate occupancy from repeat visits</source>
        <translation>Estimer l'occupation à partir de visites répétées</translation>
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
        <translation>Estime la part des sites que l'espèce occupe (ψ), corrigée des visites où elle était présente sans être détectée (p), à partir d'historiques de détection : modèle d'occupation à une saison (MacKenzie et al. 2002).

Sites : une couche ou une table avec une ligne par site (station) et un champ d'historique par occasion, contenant 1 (détectée), 0 (non détectée) ou NULL (non échantillonné à cette occasion). Toute autre valeur arrête le traitement, en nommant le champ et les sites. Les sites sans aucune occasion échantillonnée sont écartés et listés. Champ d'identifiant des sites : les identifiants utilisés dans les messages (par défaut : les identifiants d'entité) ; ils doivent être uniques.

Covariables : des champs numériques de site pour ψ et pour p ; les champs d'effort (un par champ d'historique, dans le même ordre, p. ex. jours-caméra par occasion) ajoutent à p un effort propre à chaque occasion. logit ψ et logit p sont linéaires en leurs covariables. Une covariable NULL sur un site échantillonné est une erreur.

Modèles comparés (facultatif) : un modèle par ligne, ou des modèles séparés par ;; comme « psi: elevation  p: effort » (termes séparés par des virgules ou par + ; une partie absente est constante ; le mot effort désigne les champs d'effort). Le modèle choisi, le modèle constant et ceux-ci sont comparés par l'AIC ; les sorties viennent du modèle choisi (les covariables ci-dessus).

Maximum de vraisemblance avec scipy ; erreurs types tirées de l'information observée, intervalles sur l'échelle logit au niveau de confiance choisi. Un modèle qui ne converge pas ne donne aucun nombre, et un paramètre à la borne (ψ = 1, p = 1, une covariable qui sépare les sites) est signalé comme tel, sans erreur type.

Conseils pour le plan d'échantillonnage : les occasions nécessaires pour une détection cumulée de 0,95, et les sites nécessaires pour l'erreur type cible de ψ, d'après la variance asymptotique de MacKenzie &amp; Royle (2005).
Qualité de l'ajustement (réplicats au-dessus de 0) : bootstrap paramétrique du χ² des fréquences des historiques de détection (MacKenzie &amp; Bailey 2004), avec ĉ ; avec graine.

Sorties : les sites avec psi (ψ ajusté), psi_cond (probabilité d'occupation sachant l'historique du site ; 1 là où l'espèce a été détectée) et naive (1 là où elle a été détectée au moins une fois) ; une table des paramètres (param, estimate, se, lo, hi) ; en option la table des modèles ; un rapport HTML ; et les valeurs PSI, PSI_SE, PSI_LO, PSI_HI, P, P_SE, NAIVE, OCCASIONS_NEEDED, SITES_NEEDED, C_HAT, GOF_P.

Les conseils pour le plan d'échantillonnage entraînent davantage de travail de terrain : vérifiez l'accès à chaque site et sa sécurité avant d'y envoyer une équipe ; l'outil ne rend jamais un emplacement sûr. Respectez les règles de sécurité sur le terrain de votre organisme et la législation locale.</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/occupancy.py" line="90"/>
        <source>Sites with detection histories</source>
        <translation>Sites avec historiques de détection</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/occupancy.py" line="92"/>
        <source>Site id field (empty: feature ids)</source>
        <translation>Champ d'identifiant des sites (vide : identifiants d'entité)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/occupancy.py" line="95"/>
        <source>History fields, one per occasion, in order</source>
        <translation>Champs d'historique, un par occasion, dans l'ordre</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/occupancy.py" line="98"/>
        <source>Site covariates of occupancy ψ</source>
        <translation>Covariables de site de l'occupation ψ</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/occupancy.py" line="98"/>
        <source>Site covariates of detection p</source>
        <translation>Covariables de site de la détection p</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/occupancy.py" line="98"/>
        <source>Effort fields, one per history field (optional)</source>
        <translation>Champs d'effort, un par champ d'historique (facultatif)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/occupancy.py" line="103"/>
        <source>Models to compare by AIC (one per line, e.g. psi: elevation  p: effort)</source>
        <translation>Modèles à comparer par l'AIC (un par ligne, p. ex. psi: elevation  p: effort)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/occupancy.py" line="106"/>
        <source>Confidence level</source>
        <translation>Niveau de confiance</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/occupancy.py" line="109"/>
        <source>Target SE of ψ for the design advice (0: none)</source>
        <translation>Erreur type cible de ψ pour les conseils sur le plan d'échantillonnage (0 : aucune)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/occupancy.py" line="112"/>
        <source>Goodness-of-fit bootstrap replicates (0: no test)</source>
        <translation>Réplicats bootstrap du test d'adéquation (0 : pas de test)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/occupancy.py" line="116"/>
        <source>Sites with occupancy</source>
        <translation>Sites avec occupation</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/occupancy.py" line="117"/>
        <source>Occupancy parameters</source>
        <translation>Paramètres d'occupation</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/occupancy.py" line="119"/>
        <source>Model comparison</source>
        <translation>Comparaison des modèles</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/occupancy.py" line="123"/>
        <source>Occupancy ψ</source>
        <translation>Occupation ψ</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/occupancy.py" line="123"/>
        <source>SE of ψ</source>
        <translation>Erreur type de ψ</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/occupancy.py" line="123"/>
        <source>Lower limit of ψ</source>
        <translation>Limite inférieure de ψ</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/occupancy.py" line="123"/>
        <source>Upper limit of ψ</source>
        <translation>Limite supérieure de ψ</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/occupancy.py" line="123"/>
        <source>Detection p per survey</source>
        <translation>Détection p par visite</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/occupancy.py" line="123"/>
        <source>SE of p</source>
        <translation>Erreur type de p</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/occupancy.py" line="123"/>
        <source>Naive occupancy</source>
        <translation>Occupation naïve</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/occupancy.py" line="123"/>
        <source>Occasions for a cumulative detection of 0.95</source>
        <translation>Occasions pour une détection cumulée de 0.95</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/occupancy.py" line="123"/>
        <source>Sites needed for the target SE of ψ</source>
        <translation>Sites nécessaires pour l'erreur type cible de ψ</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/occupancy.py" line="123"/>
        <source>c-hat of the goodness of fit</source>
        <translation>c-hat du test d'adéquation</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/occupancy.py" line="123"/>
        <source>p-value of the goodness of fit</source>
        <translation>Valeur p du test d'adéquation</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/occupancy.py" line="155"/>
        <source>Layer &apos;{layer}&apos; has no features.</source>
        <translation>La couche « {layer} » n'a aucune entité.</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/occupancy.py" line="175"/>
        <source>(a table: no map)</source>
        <translation>(une table : pas de carte)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/occupancy.py" line="185"/>
        <source>ψ = {psi:.3f} (SE {se}), p = {p:.3f}, naive occupancy {naive:.3f}, {n} sites.</source>
        <translation>ψ = {psi:.3f} (erreur type {se}), p = {p:.3f}, occupation naïve {naive:.3f}, {n} sites.</translation>
    </message>
</context>
<context>
    <name>Panels</name>
    <message>
        <location filename="../processing/algorithms/panels.py" line="40"/>
        <source>Revisit panels for monitoring</source>
        <translation>Panels de revisite pour le suivi</translation>
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
        <translation>Affecte les unités d'une disposition à des panels de revisite pour un programme de suivi sur plusieurs années, et écrit le calendrier : quelles unités sont inventoriées quelle année.

Unités d'échantillonnage : les unités de la disposition (toute géométrie). Les unités dont le rôle est reserve ne reçoivent aucun panel ; une réserve qui remplace une unité principale reprend le panel et les années de celle-ci.
Plan de panels : chaque année (un seul panel, le panel 0, visité chaque année) ; panels rotatifs (PANELS panels, le panel p étant visité les années début + (p − 1), début + (p − 1) + K, ..., donc chaque unité est visitée une fois tous les K ans) ; panels partagés (un noyau, le panel 0, visité chaque année, plus K panels rotatifs).
Panels rotatifs (K) : 2 ou plus, au plus le nombre d'années. Part des unités dans le noyau : panels partagés seulement, entre 0 et 1.
Première année et années : le calendrier du programme ; au plus 50 ans.
Champ d'ordre de tirage (draw_ord par défaut, tel que l'écrit la disposition) : les panels suivent l'ordre de tirage au sein de chaque strate, en blocs consécutifs : le noyau d'abord, puis le panel 1, le panel 2, ... Dans une disposition spatialement équilibrée, toute suite d'unités consécutives de l'ordre de tirage est répartie sur la strate (Robertson et al. 2013), donc chaque panel l'est aussi. Sans ce champ, l'ordre des entités est utilisé, avec un avertissement.
Champ de strate (stratum par défaut) : les panels sont découpés au sein de chaque strate, si bien que chaque panel contient la part de chaque strate.
Jours de terrain par visite d'unité (0 : aucun) : ajoute les jours de terrain au calendrier.
Graine aléatoire : seulement pour le contrôle de la répartition des panels (les panels eux-mêmes suivent l'ordre de tirage).

Le plan de la disposition : plotwise:layout l'enregistre dans le champ design des unités. Une disposition aléatoire simple (random, random_sep) donne des panels qui en sont des parties aléatoires, une grille systématique (grid, grid_ovl) des bandes, parce que son ordre de tirage va ligne par ligne : les deux font l'objet d'un avertissement. Sans ce champ, c'est le contrôle ci-dessous qui décide.
Le contrôle : la répartition de chaque panel est évaluée par la mesure de Voronoï de Stevens &amp; Olsen (2004) sur une grille fine couvrant l'enveloppe convexe des unités, et comparée à des réarrangements aléatoires des panels au sein de chaque strate. Quand les panels ne sont pas répartis plus uniformément que le hasard (ni nettement plus uniformément que des panels aléatoires : une mesure de répartition d'au moins 90 % de la leur), un avertissement le signale : la disposition était probablement aléatoire simple (chaque panel en est alors une partie aléatoire) ou une grille systématique (dont l'ordre de tirage va ligne par ligne, si bien que les panels sont des bandes). Avec peu d'unités, le contrôle peut manquer un équilibre réel.

Sorties : les unités avec panel (0 pour le noyau ou le panel de chaque année, 1..K pour les panels rotatifs, vide pour les réserves) et years (les années où l'unité est visitée, séparées par des virgules) ; la table du calendrier (year, panel, n_units, days) ; un rapport HTML avec le calendrier sous forme de graphique.

Références : Urquhart &amp; Kincaid (1999) ; McDonald (2003) ; Robertson et al. (2013) ; Stevens &amp; Olsen (2004).

Sécurité sur le terrain : vérifiez l'accès à chaque unité et sa sécurité avant d'y envoyer une équipe, et de nouveau chaque année : l'outil ne rend jamais un emplacement sûr. Respectez les règles de sécurité sur le terrain de votre organisme et la législation locale.</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/panels.py" line="83"/>
        <source>Sample units (a layout)</source>
        <translation>Unités d'échantillonnage (une disposition)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/panels.py" line="85"/>
        <source>Panel design</source>
        <translation>Plan de panels</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/panels.py" line="85"/>
        <source>Every unit every year</source>
        <translation>Toutes les unités chaque année</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/panels.py" line="85"/>
        <source>Rotating panels</source>
        <translation>Panels rotatifs</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/panels.py" line="85"/>
        <source>Split panels (core + rotating)</source>
        <translation>Panels partagés (noyau + rotatifs)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/panels.py" line="89"/>
        <source>Rotating panels (K: each unit once every K years)</source>
        <translation>Panels rotatifs (K : chaque unité une fois tous les K ans)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/panels.py" line="92"/>
        <source>Share of units in the core (split panels)</source>
        <translation>Part des unités dans le noyau (panels partagés)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/panels.py" line="95"/>
        <source>First year</source>
        <translation>Première année</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/panels.py" line="98"/>
        <source>Years of the programme</source>
        <translation>Années du programme</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/panels.py" line="101"/>
        <source>Draw-order field</source>
        <translation>Champ d'ordre de tirage</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/panels.py" line="104"/>
        <source>Stratum field</source>
        <translation>Champ de strate</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/panels.py" line="106"/>
        <source>Field days per unit visit (0: none)</source>
        <translation>Jours de terrain par visite d'unité (0 : aucun)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/panels.py" line="110"/>
        <source>Units with panels</source>
        <translation>Unités avec panels</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/panels.py" line="111"/>
        <source>Schedule</source>
        <translation>Calendrier</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/panels.py" line="137"/>
        <source>Layer &apos;{layer}&apos;: features {ids} have no geometry. Every unit needs its location: remove them or give them a geometry.</source>
        <translation>Couche « {layer} » : les entités {ids} n'ont pas de géométrie. Chaque unité a besoin de sa position : supprimez-les ou donnez-leur une géométrie.</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/panels.py" line="158"/>
        <source>Revisit panels</source>
        <translation>Panels de revisite</translation>
    </message>
</context>
<context>
    <name>PlotwiseAlgorithm</name>
    <message>
        <location filename="../processing/algorithms/base.py" line="26"/>
        <source>Survey design</source>
        <translation>Conception de l'inventaire</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/base.py" line="27"/>
        <source>Estimation</source>
        <translation>Estimation</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/base.py" line="28"/>
        <source>Demo and training</source>
        <translation>Démonstration et formation</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/base.py" line="70"/>
        <source>Random seed (0 draws one and records it)</source>
        <translation>Graine aléatoire (0 en tire une et l'enregistre)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/base.py" line="82"/>
        <source>Report (HTML)</source>
        <translation>Rapport (HTML)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/base.py" line="82"/>
        <source>HTML files (*.html)</source>
        <translation>Fichiers HTML (*.html)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/base.py" line="97"/>
        <source>Seed used: {seed}</source>
        <translation>Graine utilisée : {seed}</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/base.py" line="123"/>
        <source>Cancelled by the user. No result was written.</source>
        <translation>Annulé par l'utilisateur. Aucun résultat n'a été écrit.</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/base.py" line="212"/>
        <source>Report written to {path}</source>
        <translation>Rapport écrit dans {path}</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/base.py" line="155"/>
        <source>Layer &apos;{layer}&apos; has no field {fields} ({param}). Its fields are: {available}. Choose one of them.</source>
        <translation>La couche « {layer} » n'a pas de champ {fields} ({param}). Ses champs sont : {available}. Choisissez-en un.</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/base.py" line="163"/>
        <source>Choose a field of layer &apos;{layer}&apos; for {param}. Its fields are: {available}.</source>
        <translation>Choisissez un champ de la couche « {layer} » pour {param}. Ses champs sont : {available}.</translation>
    </message>
</context>
<context>
    <name>PlotwiseBridge</name>
    <message>
        <location filename="../processing/bridge.py" line="57"/>
        <source>Layer '{layer}' has no valid coordinate reference system. Set its CRS (Layer Properties → Source) and run again.</source>
        <translation>La couche « {layer} » n'a pas de système de coordonnées de référence valide. Définissez son SCR (Propriétés de la couche → Source) et relancez.</translation>
    </message>
    <message>
        <location filename="../processing/bridge.py" line="71"/>
        <source>Layer &apos;{layer}&apos; is in geographic coordinates ({src}); computing in {dst} ({name}), the UTM zone of its centre.</source>
        <translation>La couche « {layer} » est en coordonnées géographiques ({src}) ; calcul en {dst} ({name}), la zone UTM de son centre.</translation>
    </message>
    <message>
        <location filename="../processing/bridge.py" line="138"/>
        <source>The input layer &apos;{layer}&apos; could not be opened.</source>
        <translation>La couche d'entrée « {layer} » n'a pas pu être ouverte.</translation>
    </message>
    <message>
        <location filename="../processing/bridge.py" line="119"/>
        <source>Layer &apos;{layer}&apos; has no field named {names}. Choose an existing field.</source>
        <translation>La couche « {layer} » n'a pas de champ nommé {names}. Choisissez un champ existant.</translation>
    </message>
    <message>
        <location filename="../processing/bridge.py" line="178"/>
        <source>Layer &apos;{layer}&apos;: invalid geometry repaired for feature id(s) {ids}.</source>
        <translation>Couche « {layer} » : géométrie invalide réparée pour le ou les identifiants d'entité {ids}.</translation>
    </message>
    <message>
        <location filename="../processing/bridge.py" line="184"/>
        <source>Layer &apos;{layer}&apos;: empty or zero-area feature id(s) {ids} skipped.</source>
        <translation>Couche « {layer} » : entités vides ou de surface nulle ignorées (identifiants {ids}).</translation>
    </message>
    <message>
        <location filename="../processing/bridge.py" line="364"/>
        <source>Could not create the raster file {path}. Check the folder exists and is writable.</source>
        <translation>Impossible de créer le fichier raster {path}. Vérifiez que le dossier existe et est accessible en écriture.</translation>
    </message>
    <message>
        <location filename="../processing/bridge.py" line="393"/>
        <source>GDAL has no GPX driver here; the GPX file cannot be written.</source>
        <translation>GDAL n'a pas de pilote GPX ici ; le fichier GPX ne peut pas être écrit.</translation>
    </message>
    <message>
        <location filename="../processing/bridge.py" line="399"/>
        <source>Could not create the GPX file {path}. Check the folder exists and is writable.</source>
        <translation>Impossible de créer le fichier GPX {path}. Vérifiez que le dossier existe et est accessible en écriture.</translation>
    </message>
</context>
<context>
    <name>PlotwiseEngine</name>
    <message>
        <location filename="../processing/engine/allocation.py" line="50"/>
        <source>stratum area</source>
        <translation>surface de la strate</translation>
    </message>
    <message>
        <location filename="../processing/engine/allocation.py" line="51"/>
        <source>pilot standard deviation</source>
        <translation>écart-type pilote</translation>
    </message>
    <message>
        <location filename="../processing/engine/allocation.py" line="52"/>
        <source>pilot mean count</source>
        <translation>comptage moyen pilote</translation>
    </message>
    <message>
        <location filename="../processing/engine/allocation.py" line="53"/>
        <source>cost per unit</source>
        <translation>coût par unité</translation>
    </message>
    <message>
        <location filename="../processing/engine/allocation.py" line="433"/>
        <source>Stratum field &apos;{field}&apos; of layer &apos;{layer}&apos; is empty (NULL) for feature(s) {ids}. Give every stratum an id, or remove those features from the layer.</source>
        <translation>Le champ de strate « {field} » de la couche « {layer} » est vide (NULL) pour la ou les entités {ids}. Donnez un identifiant à chaque strate, ou retirez ces entités de la couche.</translation>
    </message>
    <message>
        <location filename="../processing/engine/allocation.py" line="451"/>
        <source>Features {ids} of layer &apos;{layer}&apos; carry the same stratum id {value} in field &apos;{field}&apos;, so each would get its own allocation. Dissolve the strata by &apos;{field}&apos; first (the host&apos;s Dissolve tool; then recompute the area field, or leave AREA_FIELD empty to use the polygon areas), or give each feature its own id.</source>
        <translation>Les entités {ids} de la couche « {layer} » portent le même identifiant de strate {value} dans le champ « {field} » : chacune recevrait sa propre allocation. Regroupez d'abord les strates par « {field} » (outil Regrouper de l'hôte ; recalculez ensuite le champ de surface, ou laissez AREA_FIELD vide pour utiliser la surface des polygones), ou donnez à chaque entité son propre identifiant.</translation>
    </message>
    <message>
        <location filename="../processing/engine/allocation.py" line="459"/>
        <source>Several stratum ids in field &apos;{field}&apos; of layer &apos;{layer}&apos; are carried by more than one feature: {value} (features {ids}) and {more} other id(s) ({others}), so each of those features would get its own allocation. Dissolve the strata by &apos;{field}&apos; first (the host&apos;s Dissolve tool; then recompute the area field, or leave AREA_FIELD empty to use the polygon areas), or give each feature its own id.</source>
        <translation>Plusieurs identifiants de strate du champ « {field} » de la couche « {layer} » sont portés par plus d'une entité : {value} (entités {ids}) et {more} autre(s) identifiant(s) ({others}) ; chacune de ces entités recevrait sa propre allocation. Regroupez d'abord les strates par « {field} » (outil Regrouper de l'hôte ; recalculez ensuite le champ de surface, ou laissez AREA_FIELD vide pour utiliser la surface des polygones), ou donnez à chaque entité son propre identifiant.</translation>
    </message>
    <message>
        <location filename="../processing/engine/allocation.py" line="480"/>
        <source>The {name} is NULL or negative for stratum feature(s) {shown}. Fill in a non-negative value for every stratum, or remove those strata from the layer.</source>
        <translation>Valeur NULL ou négative ({name}) pour la ou les entités de strate {shown}. Saisissez une valeur positive ou nulle pour chaque strate, ou retirez ces strates de la couche.</translation>
    </message>
    <message>
        <location filename="../processing/engine/allocation.py" line="485"/>
        <source>The {name} is NULL, negative or zero for stratum feature(s) {shown}. Fill in a positive value for every stratum, or remove those strata from the layer.</source>
        <translation>Valeur NULL, négative ou nulle ({name}) pour la ou les entités de strate {shown}. Saisissez une valeur strictement positive pour chaque strate, ou retirez ces strates de la couche.</translation>
    </message>
    <message>
        <location filename="../processing/engine/allocation.py" line="530"/>
        <source>Unknown allocation method {method!r}; use one of: {methods}.</source>
        <translation>Méthode d'allocation inconnue {method!r} ; utilisez l'une de : {methods}.</translation>
    </message>
    <message>
        <location filename="../processing/engine/allocation.py" line="535"/>
        <source>The strata layer has no features. Run the stratification first.</source>
        <translation>La couche des strates n'a aucune entité. Lancez d'abord la stratification.</translation>
    </message>
    <message>
        <location filename="../processing/engine/allocation.py" line="541"/>
        <source>The unit area must be a positive number.</source>
        <translation>La surface d'une unité doit être un nombre positif.</translation>
    </message>
    <message>
        <location filename="../processing/engine/allocation.py" line="544"/>
        <source>The minimum per stratum must be at least 1 (2 lets each stratum variance be estimated).</source>
        <translation>Le minimum par strate doit être d'au moins 1 (2 permet d'estimer la variance de chaque strate).</translation>
    </message>
    <message>
        <location filename="../processing/engine/allocation.py" line="555"/>
        <source>The cost method needs a cost per unit for every stratum: choose the cost field.</source>
        <translation>La méthode par coût a besoin d'un coût par unité pour chaque strate : choisissez le champ de coût.</translation>
    </message>
    <message>
        <location filename="../processing/engine/allocation.py" line="555"/>
        <source>The budget needs a cost per unit for every stratum: choose the cost field.</source>
        <translation>Le budget a besoin d'un coût par unité pour chaque strate : choisissez le champ de coût.</translation>
    </message>
    <message>
        <location filename="../processing/engine/allocation.py" line="564"/>
        <source>The fixed cost must be zero or positive.</source>
        <translation>Le coût fixe doit être nul ou positif.</translation>
    </message>
    <message>
        <location filename="../processing/engine/allocation.py" line="602"/>
        <source>No pilot standard deviations: the allocation assumes equal SDs in all strata (proportional to area).</source>
        <translation>Pas d'écarts-types pilotes : l'allocation suppose des écarts-types égaux dans toutes les strates (proportionnelle à la surface).</translation>
    </message>
    <message>
        <location filename="../processing/engine/allocation.py" line="606"/>
        <source>No pilot standard deviations: the allocation assumes equal SDs in all strata (area / square root of cost).</source>
        <translation>Pas d'écarts-types pilotes : l'allocation suppose des écarts-types égaux dans toutes les strates (surface / racine carrée du coût).</translation>
    </message>
    <message>
        <location filename="../processing/engine/allocation.py" line="610"/>
        <source>All pilot standard deviations are zero: proportional allocation is used instead.</source>
        <translation>Tous les écarts-types pilotes sont nuls : l'allocation proportionnelle est utilisée à la place.</translation>
    </message>
    <message>
        <location filename="../processing/engine/allocation.py" line="615"/>
        <source>The {name} is zero for stratum feature(s) {shown}: they get only the minimum of {minimum} unit(s). A pilot with no variation is rarely the truth; check it.</source>
        <translation>Valeur nulle ({name}) pour la ou les entités de strate {shown} : elles ne reçoivent que le minimum de {minimum} unité(s). Un pilote sans variation reflète rarement la réalité ; vérifiez-le.</translation>
    </message>
    <message>
        <location filename="../processing/engine/allocation.py" line="578"/>
        <source>Stratum feature(s) {shown} are smaller than one sample unit of {unit_area:g}. Merge them with a neighbour or use a smaller unit area.</source>
        <translation>La ou les entités de strate {shown} sont plus petites qu'une unité d'échantillonnage de {unit_area:g}. Fusionnez-les avec une voisine ou utilisez une surface d'unité plus petite.</translation>
    </message>
    <message>
        <location filename="../processing/engine/allocation.py" line="588"/>
        <source>Stratum feature(s) {shown} hold fewer than {minimum} units: they get all the units that fit.</source>
        <translation>La ou les entités de strate {shown} contiennent moins de {minimum} unités : elles reçoivent toutes les unités qui y tiennent.</translation>
    </message>
    <message>
        <location filename="../processing/engine/allocation.py" line="567"/>
        <source>A target CV is set: the budget is not used.</source>
        <translation>Un CV cible est fixé : le budget n'est pas utilisé.</translation>
    </message>
    <message>
        <location filename="../processing/engine/allocation.py" line="628"/>
        <source>The budget {budget:g} is below the minimum of {minimum:g} (fixed cost {fixed_cost:g} plus {per_stratum} unit(s) in every stratum at its cost). Raise the budget or lower the minimum per stratum.</source>
        <translation>Le budget {budget:g} est inférieur au minimum de {minimum:g} (coût fixe {fixed_cost:g} plus {per_stratum} unité(s) dans chaque strate à son coût). Augmentez le budget ou baissez le minimum par strate.</translation>
    </message>
    <message>
        <location filename="../processing/engine/allocation.py" line="637"/>
        <source>The budget exceeds the cost of every unit that fits ({maximum:g}): all units are taken.</source>
        <translation>Le budget dépasse le coût de toutes les unités qui tiennent ({maximum:g}) : toutes les unités sont prises.</translation>
    </message>
    <message>
        <location filename="../processing/engine/allocation.py" line="648"/>
        <source>Give a total number of units, a budget (with costs) or a target CV.</source>
        <translation>Indiquez un nombre total d'unités, un budget (avec des coûts) ou un CV cible.</translation>
    </message>
    <message>
        <location filename="../processing/engine/allocation.py" line="652"/>
        <source>The total of {total} units is below the minimum of {minimum} ({per_stratum} per stratum over {n_strata} strata). Raise the total or lower the minimum.</source>
        <translation>Le total de {total} unités est inférieur au minimum de {minimum} ({per_stratum} par strate sur {n_strata} strates). Augmentez le total ou baissez le minimum.</translation>
    </message>
    <message>
        <location filename="../processing/engine/allocation.py" line="658"/>
        <source>The total of {total} units exceeds the {fit} units of {unit_area:g} that fit in the strata. Lower the total or use smaller units.</source>
        <translation>Le total de {total} unités dépasse les {fit} unités de {unit_area:g} qui tiennent dans les strates. Baissez le total ou utilisez des unités plus petites.</translation>
    </message>
    <message>
        <location filename="../processing/engine/allocation.py" line="671"/>
        <source>Stratum feature(s) {shown} get one unit only: their variance cannot be estimated.</source>
        <translation>La ou les entités de strate {shown} ne reçoivent qu'une unité : leur variance ne peut pas être estimée.</translation>
    </message>
    <message>
        <location filename="../processing/engine/allocation.py" line="677"/>
        <source>Stratum feature(s) {shown} are sampled completely (every unit that fits).</source>
        <translation>La ou les entités de strate {shown} sont échantillonnées entièrement (toutes les unités qui y tiennent).</translation>
    </message>
    <message>
        <location filename="../processing/engine/allocation.py" line="682"/>
        <source>The {name} is zero in stratum feature(s) {shown}: their CV is undefined.</source>
        <translation>Valeur nulle ({name}) dans la ou les entités de strate {shown} : leur CV n'est pas défini.</translation>
    </message>
    <message>
        <location filename="../processing/engine/allocation.py" line="782"/>
        <source>A target CV needs both the pilot standard deviation and the pilot mean count per unit: choose the SD field and the mean field.</source>
        <translation>Un CV cible a besoin de l'écart-type pilote et du comptage moyen pilote par unité : choisissez le champ d'écart-type et le champ de moyenne.</translation>
    </message>
    <message>
        <location filename="../processing/engine/allocation.py" line="788"/>
        <source>The {name} is zero in every stratum: no CV can be computed.</source>
        <translation>Valeur nulle ({name}) dans toutes les strates : aucun CV ne peut être calculé.</translation>
    </message>
    <message>
        <location filename="../processing/engine/allocation.py" line="799"/>
        <source>The target CV of {target_cv:.3g} cannot be reached: even all {fit} units that fit give an expected CV of {cv:.3g}. Accept a CV of at least {cv:.3g}, or use smaller units.</source>
        <translation>Le CV cible de {target_cv:.3g} ne peut pas être atteint : même les {fit} unités qui tiennent donnent un CV attendu de {cv:.3g}. Acceptez un CV d'au moins {cv:.3g}, ou utilisez des unités plus petites.</translation>
    </message>
    <message>
        <location filename="../processing/engine/counting.py" line="42"/>
        <source>needs a positive area_m2</source>
        <translation>a besoin d'un area_m2 positif</translation>
    </message>
    <message>
        <location filename="../processing/engine/counting.py" line="49"/>
        <source>has a line of zero length</source>
        <translation>a une ligne de longueur nulle</translation>
    </message>
    <message>
        <location filename="../processing/engine/counting.py" line="51"/>
        <source>has an unsupported geometry type ({kind})</source>
        <translation>a un type de géométrie non pris en charge ({kind})</translation>
    </message>
    <message>
        <location filename="../processing/engine/counting.py" line="107"/>
        <source>The detection probability must be in (0, 1] (got {detection:g}).</source>
        <translation>La probabilité de détection doit être dans ]0, 1] (reçu {detection:g}).</translation>
    </message>
    <message>
        <location filename="../processing/engine/demo_reserve.py" line="109"/>
        <source>Could not place the demo lake; try another seed.</source>
        <translation>Impossible de placer le lac de démonstration ; essayez une autre graine.</translation>
    </message>
    <message>
        <location filename="../processing/engine/demo_reserve.py" line="235"/>
        <source>The cell size must be between 10 and 500 m (got {cell_size:g} m).</source>
        <translation>La taille de cellule doit être comprise entre 10 et 500 m (reçu {cell_size:g} m).</translation>
    </message>
    <message>
        <location filename="../processing/engine/design_comparison.py" line="229"/>
        <source>The density surface must be a single raster band.</source>
        <translation>La surface de densité doit être une seule bande raster.</translation>
    </message>
    <message>
        <location filename="../processing/engine/design_comparison.py" line="233"/>
        <source>The density surface must be a north-up raster (no rotation); warp it first.</source>
        <translation>La surface de densité doit être un raster orienté nord en haut (sans rotation) ; reprojetez-la d'abord.</translation>
    </message>
    <message>
        <location filename="../processing/engine/design_comparison.py" line="242"/>
        <source>The density surface does not overlap the frame. Check that both cover the same area (and their coordinate reference systems).</source>
        <translation>La surface de densité ne recouvre pas la base de sondage. Vérifiez que les deux couvrent la même zone (et leurs systèmes de coordonnées de référence).</translation>
    </message>
    <message>
        <location filename="../processing/engine/design_comparison.py" line="267"/>
        <source>A stratum has no stratum value (NULL). Give every stratum a value.</source>
        <translation>Une strate n'a pas de valeur de strate (NULL). Donnez une valeur à chaque strate.</translation>
    </message>
    <message>
        <location filename="../processing/engine/design_comparison.py" line="299"/>
        <source>{overlap} surface cell(s) lie in more than one stratum; each was given to the first of them. Strata should not overlap.</source>
        <translation>{overlap} cellule(s) de la surface se trouvent dans plus d'une strate ; chacune a été attribuée à la première. Les strates ne devraient pas se chevaucher.</translation>
    </message>
    <message>
        <location filename="../processing/engine/design_comparison.py" line="311"/>
        <source>No cell centre of the density surface lies in the frame: the surface cells are too coarse for the frame, or the two do not overlap.</source>
        <translation>Aucun centre de cellule de la surface de densité ne se trouve dans la base de sondage : les cellules sont trop grossières pour elle, ou les deux ne se recouvrent pas.</translation>
    </message>
    <message>
        <location filename="../processing/engine/design_comparison.py" line="318"/>
        <source>The density surface has {n} negative cell(s) in the frame. Expected animals per km² must be 0 or more: correct the surface (for instance clip it at 0).</source>
        <translation>La surface de densité a {n} cellule(s) négative(s) dans la base de sondage. Le nombre attendu d'animaux par km² doit être de 0 ou plus : corrigez la surface (par exemple en la bornant à 0).</translation>
    </message>
    <message>
        <location filename="../processing/engine/design_comparison.py" line="325"/>
        <source>{n} cell(s) of the frame ({share:.1%}) have no value on the density surface and are left out of the population: the comparison speaks for the rest of the frame.</source>
        <translation>{n} cellule(s) de la base de sondage ({share:.1%}) n'ont pas de valeur sur la surface de densité et sont exclues de la population : la comparaison vaut pour le reste de la base de sondage.</translation>
    </message>
    <message>
        <location filename="../processing/engine/design_comparison.py" line="333"/>
        <source>The density surface has no value in the frame.</source>
        <translation>La surface de densité n'a aucune valeur dans la base de sondage.</translation>
    </message>
    <message>
        <location filename="../processing/engine/design_comparison.py" line="339"/>
        <source>Strata {ids} hold no cell centre of the density surface inside the frame. Remove them, merge them with a neighbour, or use a finer surface.</source>
        <translation>Les strates {ids} ne contiennent aucun centre de cellule de la surface de densité dans la base de sondage. Retirez-les, fusionnez-les avec une voisine, ou utilisez une surface plus fine.</translation>
    </message>
    <message>
        <location filename="../processing/engine/layout.py" line="209"/>
        <source>SHAPE must be 0 (point), 1 (square), 2 (circle) or 3 (line transect).</source>
        <translation>SHAPE doit valoir 0 (point), 1 (carré), 2 (cercle) ou 3 (transect linéaire).</translation>
    </message>
    <message>
        <location filename="../processing/engine/design_comparison.py" line="102"/>
        <source>SIZE must be more than 0 m: it is the counting radius of a point station.</source>
        <translation>SIZE doit dépasser 0 m : c'est le rayon de comptage d'une station ponctuelle.</translation>
    </message>
    <message>
        <location filename="../processing/engine/design_comparison.py" line="105"/>
        <source>SIZE must be more than 0 m: it is the square unit&apos;s size.</source>
        <translation>SIZE doit dépasser 0 m : c'est la taille de l'unité carrée.</translation>
    </message>
    <message>
        <location filename="../processing/engine/design_comparison.py" line="106"/>
        <source>SIZE must be more than 0 m: it is the circle unit&apos;s size.</source>
        <translation>SIZE doit dépasser 0 m : c'est la taille de l'unité circulaire.</translation>
    </message>
    <message>
        <location filename="../processing/engine/design_comparison.py" line="107"/>
        <source>SIZE must be more than 0 m: it is the line unit&apos;s size.</source>
        <translation>SIZE doit dépasser 0 m : c'est la taille de l'unité linéaire.</translation>
    </message>
    <message>
        <location filename="../processing/engine/design_comparison.py" line="414"/>
        <source>A line transect needs the half-width of its counting strip (more than 0 m): animals are counted up to that distance on either side of the line.</source>
        <translation>Un transect linéaire a besoin de la demi-largeur de sa bande de comptage (plus de 0 m) : les animaux sont comptés jusqu'à cette distance de part et d'autre de la ligne.</translation>
    </message>
    <message>
        <location filename="../processing/engine/design_comparison.py" line="932"/>
        <source>The overdispersion k must be 0 (Poisson counts) or more.</source>
        <translation>La surdispersion k doit valoir 0 (comptages de Poisson) ou plus.</translation>
    </message>
    <message>
        <location filename="../processing/engine/design_comparison.py" line="953"/>
        <source>The strata cover {share:.1%} of the frame: every design is compared on the part the strata cover.</source>
        <translation>Les strates couvrent {share:.1%} de la base de sondage : chaque plan est comparé sur la partie qu'elles couvrent.</translation>
    </message>
    <message>
        <location filename="../processing/engine/design_comparison.py" line="963"/>
        <source>A stratum of the layout has no cells on the surface grid.</source>
        <translation>Une strate de la disposition n'a aucune cellule sur la grille de la surface.</translation>
    </message>
    <message>
        <location filename="../processing/engine/design_comparison.py" line="1046"/>
        <source>Unknown design {design}; use 0 to {last}.</source>
        <translation>Plan inconnu {design} ; utilisez 0 à {last}.</translation>
    </message>
    <message>
        <location filename="../processing/engine/design_comparison.py" line="1050"/>
        <source>N_UNITS must be at least {minimum}.</source>
        <translation>N_UNITS doit valoir au moins {minimum}.</translation>
    </message>
    <message>
        <location filename="../processing/engine/design_comparison.py" line="1060"/>
        <source>The {design} design needs strata: give the STRATA layer.</source>
        <translation>Le plan « {design} » a besoin de strates : indiquez la couche STRATA.</translation>
    </message>
    <message>
        <location filename="../processing/engine/layout.py" line="76"/>
        <source>simple random</source>
        <translation>aléatoire simple</translation>
    </message>
    <message>
        <location filename="../processing/engine/design_comparison.py" line="90"/>
        <source>stratified proportional</source>
        <translation>stratifié proportionnel</translation>
    </message>
    <message>
        <location filename="../processing/engine/layout.py" line="76"/>
        <source>systematic grid</source>
        <translation>grille systématique</translation>
    </message>
    <message>
        <location filename="../processing/engine/layout.py" line="76"/>
        <source>spatially balanced</source>
        <translation>spatialement équilibré</translation>
    </message>
    <message>
        <location filename="../processing/engine/design_comparison.py" line="1170"/>
        <source>REPLICATES must be at least 2.</source>
        <translation>REPLICATES doit valoir au moins 2.</translation>
    </message>
    <message>
        <location filename="../processing/engine/design_comparison.py" line="1197"/>
        <source>Each simulated survey would count about {millions:.0f} million surface cells ({units} units of {unit_area:,.0f} m² on {cell_width:g} m cells), too many to simulate. Resample the surface to coarser cells, or compare fewer designs or units.</source>
        <translation>Chaque inventaire simulé compterait environ {millions:.0f} millions de cellules de la surface ({units} unités de {unit_area:,.0f} m² sur des cellules de {cell_width:g} m), trop pour être simulé. Rééchantillonnez la surface en cellules plus grossières, ou comparez moins de plans ou d'unités.</translation>
    </message>
    <message>
        <location filename="../processing/engine/design_comparison.py" line="1479"/>
        <source>{design}: {warning}</source>
        <translation>{design} : {warning}</translation>
    </message>
    <message>
        <location filename="../processing/engine/design_comparison.py" line="1482"/>
        <source>{design} at {n_units} units: {failed} of {replicates} simulated surveys gave no estimate (a stratum without a counted unit, or no unit in the frame); they are left out of its figures.</source>
        <translation>{design} avec {n_units} unités : {failed} des {replicates} inventaires simulés n'ont donné aucune estimation (une strate sans unité comptée, ou aucune unité dans la base de sondage) ; ils sont exclus de ses chiffres.</translation>
    </message>
    <message>
        <location filename="../processing/engine/design_comparison.py" line="1522"/>
        <source>The range of units &apos;{text}&apos; cannot be read. Give whole numbers separated by commas (e.g. 20, 40, 80) or start:stop:step (e.g. 20:100:20).</source>
        <translation>La plage d'unités « {text} » ne peut pas être lue. Donnez des nombres entiers séparés par des virgules (p. ex. 20, 40, 80) ou début:fin:pas (p. ex. 20:100:20).</translation>
    </message>
    <message>
        <location filename="../processing/engine/design_comparison.py" line="1529"/>
        <source>In the range of units &apos;{text}&apos;, &apos;{part}&apos; starts above where it stops (start {start}, stop {stop}), so it holds no number of units. Write start:stop:step with the start at or below the stop (e.g. {stop}:{start}:{step}).</source>
        <translation>Dans la plage d'unités « {text} », « {part} » commence au-dessus de sa fin (début {start}, fin {stop}) et ne contient donc aucun nombre d'unités. Écrivez début:fin:pas avec un début inférieur ou égal à la fin (p. ex. {stop}:{start}:{step}).</translation>
    </message>
    <message>
        <location filename="../processing/engine/design_comparison.py" line="1535"/>
        <source>Every number of units in the range must be at least {minimum}.</source>
        <translation>Chaque nombre d'unités de la plage doit valoir au moins {minimum}.</translation>
    </message>
    <message>
        <location filename="../processing/engine/design_comparison.py" line="1539"/>
        <source>The range of units holds more than 20 values; give at most 20.</source>
        <translation>La plage d'unités contient plus de 20 valeurs ; donnez-en au plus 20.</translation>
    </message>
    <message>
        <location filename="../processing/engine/listing.py" line="19"/>
        <source>{shown} … ({n} in all)</source>
        <translation>{shown} … ({n} en tout)</translation>
    </message>
    <message>
        <location filename="../processing/engine/estimation.py" line="378"/>
        <source>The {count_name} field holds values that are not numbers for units {ids}. Enter a whole count (0 when surveyed and none seen) or leave the field empty (NULL) for units that were not surveyed.</source>
        <translation>Le champ {count_name} contient des valeurs qui ne sont pas des nombres pour les unités {ids}. Saisissez un comptage entier (0 si l'unité a été inventoriée sans rien voir) ou laissez le champ vide (NULL) pour les unités non inventoriées.</translation>
    </message>
    <message>
        <location filename="../processing/engine/estimation.py" line="389"/>
        <source>The {count_name} field holds negative or infinite counts for units {ids}. Counts must be 0 or more; correct them, or leave the field empty (NULL) if the unit was not surveyed.</source>
        <translation>Le champ {count_name} contient des comptages négatifs ou infinis pour les unités {ids}. Les comptages doivent valoir 0 ou plus ; corrigez-les, ou laissez le champ vide (NULL) si l'unité n'a pas été inventoriée.</translation>
    </message>
    <message>
        <location filename="../processing/engine/estimation.py" line="562"/>
        <source>Layer &apos;{layer}&apos;: the stratum id field &apos;{field}&apos; is empty (NULL) for feature id(s) {ids}. These polygons cover {area:.4g} {unit} that no stratum covers, so the estimate would silently speak for a smaller frame. Give each polygon the id of its stratum, delete the polygons that are not part of the frame, or choose to leave out strata with no surveyed unit (the frame then shrinks).</source>
        <translation>Couche « {layer} » : le champ d'identifiant de strate « {field} » est vide (NULL) pour le ou les identifiants d'entité {ids}. Ces polygones couvrent {area:.4g} {unit} qu'aucune strate ne couvre, si bien que l'estimation porterait sans le dire sur une base de sondage plus petite. Donnez à chaque polygone l'identifiant de sa strate, supprimez les polygones qui ne font pas partie de la base de sondage, ou choisissez d'écarter les strates sans unité inventoriée (la base de sondage se réduit alors).</translation>
    </message>
    <message>
        <location filename="../processing/engine/estimation.py" line="571"/>
        <source>Layer &apos;{layer}&apos;: the stratum id field &apos;{field}&apos; is empty (NULL) for feature id(s) {ids}. These polygons were left out, and the frame shrank by the {area:.4g} {unit} of them that no stratum covers. To keep them in the frame, give each polygon the id of its stratum.</source>
        <translation>Couche « {layer} » : le champ d'identifiant de strate « {field} » est vide (NULL) pour le ou les identifiants d'entité {ids}. Ces polygones ont été écartés, et la base de sondage a diminué des {area:.4g} {unit} qu'aucune strate ne couvre. Pour les garder dans la base de sondage, donnez à chaque polygone l'identifiant de sa strate.</translation>
    </message>
    <message>
        <location filename="../processing/engine/estimation.py" line="534"/>
        <source>Layer &apos;{layer}&apos;: no polygon has a stratum id in the field &apos;{field}&apos;. Fill in the stratum ids, or choose the field that holds them.</source>
        <translation>Couche « {layer} » : aucun polygone n'a d'identifiant de strate dans le champ « {field} ». Renseignez les identifiants de strate, ou choisissez le champ qui les contient.</translation>
    </message>
    <message>
        <location filename="../processing/engine/estimation.py" line="591"/>
        <source>Layer &apos;{layer}&apos;: the strata overlap: {pairs}. In all, {area:.4g} {unit} ({percent:.3g} % of the {covered:.4g} {unit} the strata cover) would be counted in more than one stratum, which inflates the frame area and the abundance. Fix the strata polygons so that they do not overlap: each piece of land belongs to one stratum only (cut each overlap out of all strata but one, or redraw the shared edges).</source>
        <translation>Couche « {layer} » : les strates se chevauchent : {pairs}. Au total, {area:.4g} {unit} ({percent:.3g} % de la surface couverte par les strates, {covered:.4g} {unit}) seraient comptés dans plus d'une strate, ce qui gonfle la surface de la base de sondage et l'abondance. Corrigez les polygones des strates pour qu'ils ne se chevauchent pas : chaque parcelle de terrain appartient à une seule strate (découpez chaque chevauchement de toutes les strates sauf une, ou redessinez les limites communes).</translation>
    </message>
    <message>
        <location filename="../processing/engine/estimation.py" line="600"/>
        <source>Layer &apos;{layer}&apos;: the strata overlap: {pairs}. In all, {area:.4g} {unit} ({percent:.3g} % of the {covered:.4g} {unit} the strata cover) is counted in more than one stratum, so the frame area and the abundance are slightly too large. Fix the strata polygons so that they do not overlap (snap the shared edges, or cut each overlap out of all strata but one).</source>
        <translation>Couche « {layer} » : les strates se chevauchent : {pairs}. Au total, {area:.4g} {unit} ({percent:.3g} % de la surface couverte par les strates, {covered:.4g} {unit}) sont comptés dans plus d'une strate, si bien que la surface de la base de sondage et l'abondance sont légèrement trop grandes. Corrigez les polygones des strates pour qu'ils ne se chevauchent pas (alignez les limites communes par accrochage, ou découpez chaque chevauchement de toutes les strates sauf une).</translation>
    </message>
    <message>
        <location filename="../processing/engine/estimation.py" line="662"/>
        <source>The confidence level must lie between 0 and 1 (got {confidence}); use e.g. 0.95.</source>
        <translation>Le niveau de confiance doit être compris entre 0 et 1 (reçu {confidence}) ; utilisez p. ex. 0.95.</translation>
    </message>
    <message>
        <location filename="../processing/engine/estimation.py" line="666"/>
        <source>Unknown interval method {method!r}; use one of {methods}.</source>
        <translation>Méthode d'intervalle inconnue {method!r} ; utilisez l'une de {methods}.</translation>
    </message>
    <message>
        <location filename="../processing/engine/estimation.py" line="670"/>
        <source>Unknown variance method {method!r}; use one of {methods}.</source>
        <translation>Méthode de variance inconnue {method!r} ; utilisez l'une de {methods}.</translation>
    </message>
    <message>
        <location filename="../processing/engine/estimation.py" line="674"/>
        <source>The detection probability must lie in (0, 1] (got {p}).</source>
        <translation>La probabilité de détection doit être dans ]0, 1] (reçu {p}).</translation>
    </message>
    <message>
        <location filename="../processing/engine/estimation.py" line="677"/>
        <source>The standard error of the detection probability must be 0 or more.</source>
        <translation>L'erreur type de la probabilité de détection doit valoir 0 ou plus.</translation>
    </message>
    <message>
        <location filename="../processing/engine/estimation.py" line="696"/>
        <source>unit_ids must have one id per unit.</source>
        <translation>unit_ids doit avoir un identifiant par unité.</translation>
    </message>
    <message>
        <location filename="../processing/engine/estimation.py" line="700"/>
        <source>counts, unit_areas and strata must have one value per unit.</source>
        <translation>counts, unit_areas et strata doivent avoir une valeur par unité.</translation>
    </message>
    <message>
        <location filename="../processing/engine/estimation.py" line="739"/>
        <source>Strata {ids} have no area. Check the strata layer&apos;s geometries.</source>
        <translation>Les strates {ids} n'ont pas de surface. Vérifiez les géométries de la couche des strates.</translation>
    </message>
    <message>
        <location filename="../processing/engine/estimation.py" line="752"/>
        <source>Units {ids} have no stratum (the stratum field is empty). Fill in their stratum, or leave the stratum field out to treat the frame as one stratum.</source>
        <translation>Les unités {ids} n'ont pas de strate (le champ de strate est vide). Renseignez leur strate, ou omettez le champ de strate pour traiter la base de sondage comme une seule strate.</translation>
    </message>
    <message>
        <location filename="../processing/engine/estimation.py" line="763"/>
        <source>Units {ids} have stratum ids ({names}) that are not in the strata layer. Check the stratum field of the units and the id field of the strata layer.</source>
        <translation>Les unités {ids} ont des identifiants de strate ({names}) absents de la couche des strates. Vérifiez le champ de strate des unités et le champ d'identifiant de la couche des strates.</translation>
    </message>
    <message>
        <location filename="../processing/engine/estimation.py" line="709"/>
        <source>{n} unit(s) have no count and are treated as not surveyed (non-response): {ids}.</source>
        <translation>{n} unité(s) n'ont pas de comptage et sont traitées comme non inventoriées (non-réponse) : {ids}.</translation>
    </message>
    <message>
        <location filename="../processing/engine/estimation.py" line="715"/>
        <source>No unit has a count, so nothing can be estimated. Enter the counts of the surveyed units (0 when none was seen) in the count field.</source>
        <translation>Aucune unité n'a de comptage : rien ne peut être estimé. Saisissez les comptages des unités inventoriées (0 si rien n'a été vu) dans le champ de comptage.</translation>
    </message>
    <message>
        <location filename="../processing/engine/estimation.py" line="812"/>
        <source>Presence data must be 0 or 1; units {ids} hold other values. Use the counts without the presence option, or recode the field.</source>
        <translation>Les données de présence doivent valoir 0 ou 1 ; les unités {ids} contiennent d'autres valeurs. Utilisez les comptages sans l'option de présence, ou recodez le champ.</translation>
    </message>
    <message>
        <location filename="../processing/engine/estimation.py" line="820"/>
        <source>The detection probability was not applied to presence data: dividing a proportion of occupied units by p is not an occupancy correction, which needs repeat visits.</source>
        <translation>La probabilité de détection n'a pas été appliquée aux données de présence : diviser une proportion d'unités occupées par p n'est pas une correction d'occupation, qui demande des visites répétées.</translation>
    </message>
    <message>
        <location filename="../processing/engine/estimation.py" line="781"/>
        <source>No unit of strata {ids} was surveyed, so their abundance cannot be estimated. Survey units there, or choose to leave these strata out (the estimate then covers a smaller frame).</source>
        <translation>Aucune unité des strates {ids} n'a été inventoriée : leur abondance ne peut pas être estimée. Inventoriez-y des unités, ou choisissez d'exclure ces strates (l'estimation couvre alors une base de sondage plus petite).</translation>
    </message>
    <message>
        <location filename="../processing/engine/estimation.py" line="788"/>
        <source>Strata {ids} had no surveyed unit and were left out: the frame shrank by {dropped_area:.6g} area units, and the estimate covers the remaining strata only.</source>
        <translation>Les strates {ids} n'avaient aucune unité inventoriée et ont été exclues : la base de sondage a diminué de {dropped_area:.6g} unités de surface, et l'estimation ne couvre que les strates restantes.</translation>
    </message>
    <message>
        <location filename="../processing/engine/estimation.py" line="896"/>
        <source>The local neighbourhood variance needs the positions of the units.</source>
        <translation>La variance de voisinage local a besoin des positions des unités.</translation>
    </message>
    <message>
        <location filename="../processing/engine/estimation.py" line="901"/>
        <source>Units {ids} have no position, so the local neighbourhood variance cannot use them. Give their locations, or use the simple random sampling formula.</source>
        <translation>Les unités {ids} n'ont pas de position : la variance de voisinage local ne peut pas les utiliser. Donnez leurs emplacements, ou utilisez la formule de l'échantillonnage aléatoire simple.</translation>
    </message>
    <message>
        <location filename="../processing/engine/estimation.py" line="1000"/>
        <source>In strata {ids} the surveyed area exceeds the stratum area. Check the unit areas and the area unit, or switch off the finite-population correction.</source>
        <translation>Dans les strates {ids}, la surface inventoriée dépasse la surface de la strate. Vérifiez les surfaces des unités et l'unité de surface, ou désactivez la correction de population finie.</translation>
    </message>
    <message>
        <location filename="../processing/engine/estimation.py" line="1074"/>
        <source>The only stratum has one surveyed unit: no variance, standard error or interval can be estimated. Survey at least two units.</source>
        <translation>La seule strate n'a qu'une unité inventoriée : aucune variance, erreur type ou intervalle ne peut être estimé. Inventoriez au moins deux unités.</translation>
    </message>
    <message>
        <location filename="../processing/engine/estimation.py" line="1420"/>
        <source>The bootstrap needs a random generator (rng).</source>
        <translation>Le bootstrap a besoin d'un générateur aléatoire (rng).</translation>
    </message>
    <message>
        <location filename="../processing/engine/estimation.py" line="1203"/>
        <source>The target CV {target_cv:.3g} cannot be reached by more units: the detection probability&apos;s own CV is {cv_p:.3g}. Improve the detection study first.</source>
        <translation>Le CV cible {target_cv:.3g} ne peut pas être atteint avec plus d'unités : le CV propre de la probabilité de détection est de {cv_p:.3g}. Améliorez d'abord l'étude de détection.</translation>
    </message>
    <message>
        <location filename="../processing/engine/estimation.py" line="1215"/>
        <source>No variation was observed, so the next survey&apos;s sample sizes are set to the minimum of 2 per stratum.</source>
        <translation>Aucune variation n'a été observée : les tailles d'échantillon du prochain inventaire sont fixées au minimum de 2 par strate.</translation>
    </message>
    <message>
        <location filename="../processing/engine/frame.py" line="257"/>
        <source>EDGE_BUFFER is {edge_buffer} m; it must be zero or a positive distance in metres.</source>
        <translation>EDGE_BUFFER vaut {edge_buffer} m ; il doit être nul ou une distance positive en mètres.</translation>
    </message>
    <message>
        <location filename="../processing/engine/frame.py" line="264"/>
        <source>The study area (INPUT) has no polygon with a positive area. Check that the layer holds polygons and is in a projected CRS in metres.</source>
        <translation>La zone d'étude (INPUT) n'a aucun polygone de surface positive. Vérifiez que la couche contient des polygones et qu'elle est dans un SCR projeté en mètres.</translation>
    </message>
    <message>
        <location filename="../processing/engine/frame.py" line="298"/>
        <source>Nothing is left of the study area (INPUT) after removing the excluded polygons (EXCLUDE): they cover all {hectares:.4g} ha. Check that EXCLUDE holds only the areas to leave out.</source>
        <translation>Il ne reste rien de la zone d'étude (INPUT) après retrait des polygones exclus (EXCLUDE) : ils en couvrent la totalité, {hectares:.4g} ha. Vérifiez qu'EXCLUDE ne contient que les zones à écarter.</translation>
    </message>
    <message>
        <location filename="../processing/engine/frame.py" line="304"/>
        <source>Nothing is left of the frame after the raster mask (MASK): every cell over the remaining {hectares:.4g} ha is outside [MASK_MIN, MASK_MAX] or NoData. Widen the range, check the raster&apos;s units, or check that the raster covers the study area.</source>
        <translation>Il ne reste rien de la base de sondage après le masque raster (MASK) : chaque cellule des {hectares:.4g} ha restants est hors de [MASK_MIN, MASK_MAX] ou NoData. Élargissez l'intervalle, vérifiez les unités du raster, ou vérifiez que le raster couvre la zone d'étude.</translation>
    </message>
    <message>
        <location filename="../processing/engine/frame.py" line="311"/>
        <source>Nothing is left of the frame after the inward edge buffer (EDGE_BUFFER = {edge_buffer:g} m): the remaining {hectares:.4g} ha all lie within that distance of the study area&apos;s boundary (study area extent {width:.0f} m x {height:.0f} m). Use a smaller EDGE_BUFFER.</source>
        <translation>Il ne reste rien de la base de sondage après la zone tampon intérieure (EDGE_BUFFER = {edge_buffer:g} m) : les {hectares:.4g} ha restants se trouvent tous à moins de cette distance de la limite de la zone d'étude (emprise de la zone d'étude {width:.0f} m x {height:.0f} m). Utilisez un EDGE_BUFFER plus petit.</translation>
    </message>
    <message>
        <location filename="../processing/engine/geometry.py" line="221"/>
        <source>{first} and {second} ({area:.4g} {unit})</source>
        <translation>{first} et {second} ({area:.4g} {unit})</translation>
    </message>
    <message>
        <location filename="../processing/engine/halton.py" line="210"/>
        <source>No point of an area of {area:.3g} m² could be drawn: it is too thin to hold a sample unit. Check the frame for slivers.</source>
        <translation>Aucun point n'a pu être tiré dans une surface de {area:.3g} m² : elle est trop mince pour accueillir une unité d'échantillonnage. Cherchez les liserés dans la base de sondage.</translation>
    </message>
    <message>
        <location filename="../processing/engine/layout.py" line="206"/>
        <source>DESIGN must be 0 (simple random), 1 (systematic grid) or 2 (spatially balanced).</source>
        <translation>DESIGN doit valoir 0 (aléatoire simple), 1 (grille systématique) ou 2 (spatialement équilibré).</translation>
    </message>
    <message>
        <location filename="../processing/engine/layout.py" line="86"/>
        <source>SIZE must be more than 0 m for a point unit; it is {size}.</source>
        <translation>SIZE doit dépasser 0 m pour une unité ponctuelle ; il vaut {size}.</translation>
    </message>
    <message>
        <location filename="../processing/engine/layout.py" line="87"/>
        <source>SIZE must be more than 0 m for a square unit; it is {size}.</source>
        <translation>SIZE doit dépasser 0 m pour une unité carrée ; il vaut {size}.</translation>
    </message>
    <message>
        <location filename="../processing/engine/layout.py" line="88"/>
        <source>SIZE must be more than 0 m for a circle unit; it is {size}.</source>
        <translation>SIZE doit dépasser 0 m pour une unité circulaire ; il vaut {size}.</translation>
    </message>
    <message>
        <location filename="../processing/engine/layout.py" line="89"/>
        <source>SIZE must be more than 0 m for a line unit; it is {size}.</source>
        <translation>SIZE doit dépasser 0 m pour une unité linéaire ; il vaut {size}.</translation>
    </message>
    <message>
        <location filename="../processing/engine/layout.py" line="214"/>
        <source>BEARING must be -1 (random) or between 0 and 360 degrees; it is {bearing}.</source>
        <translation>BEARING doit valoir -1 (aléatoire) ou être compris entre 0 et 360 degrés ; il vaut {bearing}.</translation>
    </message>
    <message>
        <location filename="../processing/engine/layout.py" line="218"/>
        <source>MIN_SPACING must be 0 or more metres.</source>
        <translation>MIN_SPACING doit valoir 0 mètre ou plus.</translation>
    </message>
    <message>
        <location filename="../processing/engine/layout.py" line="220"/>
        <source>RESERVE must be 0 or a positive whole number.</source>
        <translation>RESERVE doit valoir 0 ou un nombre entier positif.</translation>
    </message>
    <message>
        <location filename="../processing/engine/layout.py" line="410"/>
        <source>{field} is empty (NULL) or not a number for feature(s) {ids}. Give every stratum a whole number of units, or leave N_FIELD unset to use N_UNITS.</source>
        <translation>{field} est vide (NULL) ou n'est pas un nombre pour la ou les entités {ids}. Donnez à chaque strate un nombre entier d'unités, ou laissez N_FIELD vide pour utiliser N_UNITS.</translation>
    </message>
    <message>
        <location filename="../processing/engine/layout.py" line="417"/>
        <source>{field} is negative for feature(s) {ids}. Use 0 or a positive whole number.</source>
        <translation>{field} est négatif pour la ou les entités {ids}. Utilisez 0 ou un nombre entier positif.</translation>
    </message>
    <message>
        <location filename="../processing/engine/layout.py" line="424"/>
        <source>{field} is not a whole number for feature(s) {ids}. Round the allocation to whole units first.</source>
        <translation>{field} n'est pas un nombre entier pour la ou les entités {ids}. Arrondissez d'abord l'allocation à des unités entières.</translation>
    </message>
    <message>
        <location filename="../processing/engine/layout.py" line="476"/>
        <source>Give N_FIELD (units per stratum) or N_UNITS (a total of at least 1).</source>
        <translation>Indiquez N_FIELD (unités par strate) ou N_UNITS (un total d'au moins 1).</translation>
    </message>
    <message>
        <location filename="../processing/engine/layout.py" line="524"/>
        <source>Invalid geometry was repaired for feature(s) {ids}; check their outlines.</source>
        <translation>Une géométrie invalide a été réparée pour la ou les entités {ids} ; vérifiez leurs contours.</translation>
    </message>
    <message>
        <location filename="../processing/engine/layout.py" line="528"/>
        <source>Empty or zero-area feature(s) {ids} were skipped.</source>
        <translation>Les entités vides ou de surface nulle {ids} ont été ignorées.</translation>
    </message>
    <message>
        <location filename="../processing/engine/layout.py" line="531"/>
        <source>Feature(s) {ids} have less than {area:g} m² of area (slivers, e.g. left over by an overlay or a reprojection) and were skipped.</source>
        <translation>Les entités {ids} ont moins de {area:g} m² de surface (des liserés, laissés par exemple par une superposition ou une reprojection) et ont été écartées.</translation>
    </message>
    <message>
        <location filename="../processing/engine/layout.py" line="536"/>
        <source>The frame has no polygon of {area:g} m² or more: every feature is empty, has zero area or is a sliver.</source>
        <translation>La base de sondage n'a aucun polygone de {area:g} m² ou plus : chaque entité est vide, de surface nulle ou n'est qu'un liseré.</translation>
    </message>
    <message>
        <location filename="../processing/engine/layout.py" line="567"/>
        <source>{field} is empty (NULL) for feature {fid}. Give it a stratum value.</source>
        <translation>{field} est vide (NULL) pour l'entité {fid}. Donnez-lui une valeur de strate.</translation>
    </message>
    <message>
        <location filename="../processing/engine/layout.py" line="621"/>
        <source>The features of the frame (no stratum field) carry different {n_field} values ({values}) (features {ids}). {n_field} is the number of units of the whole stratum: give its features the same value or choose a stratum field so that each feature is a stratum.</source>
        <translation>Les entités de la base de sondage (sans champ de strate) portent des valeurs de {n_field} différentes ({values}) (entités {ids}). {n_field} est le nombre d'unités de toute la strate : donnez la même valeur à ses entités ou choisissez un champ de strate pour que chaque entité soit une strate.</translation>
    </message>
    <message>
        <location filename="../processing/engine/layout.py" line="621"/>
        <source>The features of stratum {key} carry different {n_field} values ({values}) (features {ids}). {n_field} is the number of units of the whole stratum: give its features the same value.</source>
        <translation>Les entités de la strate {key} portent des valeurs de {n_field} différentes ({values}) (entités {ids}). {n_field} est le nombre d'unités de toute la strate : donnez la même valeur à ses entités.</translation>
    </message>
    <message>
        <location filename="../processing/engine/layout.py" line="606"/>
        <source>N_UNITS = {n_units} is fewer than {minimum} per stratum for {n_strata} strata; every stratum gets {minimum} ({total} units).</source>
        <translation>N_UNITS = {n_units} fait moins de {minimum} par strate pour {n_strata} strates ; chaque strate en reçoit {minimum} ({total} unités).</translation>
    </message>
    <message>
        <location filename="../processing/engine/layout.py" line="92"/>
        <source>The frame is too small for a point unit of SIZE {size:g} m wholly inside it: no point lies {radius:.1f} m or more from its edge (features {ids}). Use a smaller SIZE, untick INSIDE, or merge the stratum with a neighbour.</source>
        <translation>La base de sondage est trop petite pour une unité ponctuelle de SIZE {size:g} m entièrement à l'intérieur : aucun point n'est à {radius:.1f} m ou plus de son bord (entités {ids}). Utilisez un SIZE plus petit, décochez INSIDE, ou fusionnez la strate avec une voisine.</translation>
    </message>
    <message>
        <location filename="../processing/engine/layout.py" line="97"/>
        <source>The frame is too small for a square unit of SIZE {size:g} m wholly inside it: no point lies {radius:.1f} m or more from its edge (features {ids}). Use a smaller SIZE, untick INSIDE, or merge the stratum with a neighbour.</source>
        <translation>La base de sondage est trop petite pour une unité carrée de SIZE {size:g} m entièrement à l'intérieur : aucun point n'est à {radius:.1f} m ou plus de son bord (entités {ids}). Utilisez un SIZE plus petit, décochez INSIDE, ou fusionnez la strate avec une voisine.</translation>
    </message>
    <message>
        <location filename="../processing/engine/layout.py" line="102"/>
        <source>The frame is too small for a circle unit of SIZE {size:g} m wholly inside it: no point lies {radius:.1f} m or more from its edge (features {ids}). Use a smaller SIZE, untick INSIDE, or merge the stratum with a neighbour.</source>
        <translation>La base de sondage est trop petite pour une unité circulaire de SIZE {size:g} m entièrement à l'intérieur : aucun point n'est à {radius:.1f} m ou plus de son bord (entités {ids}). Utilisez un SIZE plus petit, décochez INSIDE, ou fusionnez la strate avec une voisine.</translation>
    </message>
    <message>
        <location filename="../processing/engine/layout.py" line="107"/>
        <source>The frame is too small for a line unit of SIZE {size:g} m wholly inside it: no point lies {radius:.1f} m or more from its edge (features {ids}). Use a smaller SIZE, untick INSIDE, or merge the stratum with a neighbour.</source>
        <translation>La base de sondage est trop petite pour une unité linéaire de SIZE {size:g} m entièrement à l'intérieur : aucun point n'est à {radius:.1f} m ou plus de son bord (entités {ids}). Utilisez un SIZE plus petit, décochez INSIDE, ou fusionnez la strate avec une voisine.</translation>
    </message>
    <message>
        <location filename="../processing/engine/layout.py" line="112"/>
        <source>Stratum {key} is too small for a point unit of SIZE {size:g} m wholly inside it: no point lies {radius:.1f} m or more from its edge (features {ids}). Use a smaller SIZE, untick INSIDE, or merge the stratum with a neighbour.</source>
        <translation>La strate {key} est trop petite pour une unité ponctuelle de SIZE {size:g} m entièrement à l'intérieur : aucun point n'est à {radius:.1f} m ou plus de son bord (entités {ids}). Utilisez un SIZE plus petit, décochez INSIDE, ou fusionnez la strate avec une voisine.</translation>
    </message>
    <message>
        <location filename="../processing/engine/layout.py" line="117"/>
        <source>Stratum {key} is too small for a square unit of SIZE {size:g} m wholly inside it: no point lies {radius:.1f} m or more from its edge (features {ids}). Use a smaller SIZE, untick INSIDE, or merge the stratum with a neighbour.</source>
        <translation>La strate {key} est trop petite pour une unité carrée de SIZE {size:g} m entièrement à l'intérieur : aucun point n'est à {radius:.1f} m ou plus de son bord (entités {ids}). Utilisez un SIZE plus petit, décochez INSIDE, ou fusionnez la strate avec une voisine.</translation>
    </message>
    <message>
        <location filename="../processing/engine/layout.py" line="122"/>
        <source>Stratum {key} is too small for a circle unit of SIZE {size:g} m wholly inside it: no point lies {radius:.1f} m or more from its edge (features {ids}). Use a smaller SIZE, untick INSIDE, or merge the stratum with a neighbour.</source>
        <translation>La strate {key} est trop petite pour une unité circulaire de SIZE {size:g} m entièrement à l'intérieur : aucun point n'est à {radius:.1f} m ou plus de son bord (entités {ids}). Utilisez un SIZE plus petit, décochez INSIDE, ou fusionnez la strate avec une voisine.</translation>
    </message>
    <message>
        <location filename="../processing/engine/layout.py" line="127"/>
        <source>Stratum {key} is too small for a line unit of SIZE {size:g} m wholly inside it: no point lies {radius:.1f} m or more from its edge (features {ids}). Use a smaller SIZE, untick INSIDE, or merge the stratum with a neighbour.</source>
        <translation>La strate {key} est trop petite pour une unité linéaire de SIZE {size:g} m entièrement à l'intérieur : aucun point n'est à {radius:.1f} m ou plus de son bord (entités {ids}). Utilisez un SIZE plus petit, décochez INSIDE, ou fusionnez la strate avec une voisine.</translation>
    </message>
    <message>
        <location filename="../processing/engine/layout.py" line="668"/>
        <source>Keeping units inside leaves {share:.0%} of the frame (the band within {radius:g} m of its edge) where no unit centre can fall; the estimate carries the inner part&apos;s density over that band. If density differs near edges, turn INSIDE off or use smaller units.</source>
        <translation>Garder les unités à l'intérieur laisse {share:.0%} de la base de sondage (la bande à moins de {radius:g} m de son bord) où aucun centre d'unité ne peut tomber ; l'estimation étend la densité de la partie intérieure à cette bande. Si la densité diffère près des bords, désactivez INSIDE ou utilisez des unités plus petites.</translation>
    </message>
    <message>
        <location filename="../processing/engine/layout.py" line="668"/>
        <source>Keeping units inside leaves {share:.0%} of stratum {key} (the band within {radius:g} m of its edge) where no unit centre can fall; the estimate carries the inner part&apos;s density over that band. If density differs near edges, turn INSIDE off or use smaller units.</source>
        <translation>Garder les unités à l'intérieur laisse {share:.0%} de la strate {key} (la bande à moins de {radius:g} m de son bord) où aucun centre d'unité ne peut tomber ; l'estimation étend la densité de la partie intérieure à cette bande. Si la densité diffère près des bords, désactivez INSIDE ou utilisez des unités plus petites.</translation>
    </message>
    <message>
        <location filename="../processing/engine/layout.py" line="679"/>
        <source>The frame gets no units; the estimate cannot speak for it.</source>
        <translation>La base de sondage ne reçoit aucune unité ; l'estimation ne peut pas la représenter.</translation>
    </message>
    <message>
        <location filename="../processing/engine/layout.py" line="679"/>
        <source>Stratum {key} gets no units; the estimate cannot speak for it.</source>
        <translation>La strate {key} ne reçoit aucune unité ; l'estimation ne peut pas la représenter.</translation>
    </message>
    <message>
        <location filename="../processing/engine/layout.py" line="684"/>
        <source>The frame gets one unit only; its variance cannot be estimated.</source>
        <translation>La base de sondage ne reçoit qu'une unité ; sa variance ne peut pas être estimée.</translation>
    </message>
    <message>
        <location filename="../processing/engine/layout.py" line="684"/>
        <source>Stratum {key} gets one unit only; its variance cannot be estimated.</source>
        <translation>La strate {key} ne reçoit qu'une unité ; sa variance ne peut pas être estimée.</translation>
    </message>
    <message>
        <location filename="../processing/engine/layout.py" line="772"/>
        <source>Strata overlap ({pairs}): a location belongs to one stratum only, and units in a shared area would be drawn in both strata and weighted twice. Make the strata polygons disjoint (for example with the host&apos;s Difference or Union tools) and run again.</source>
        <translation>Des strates se chevauchent ({pairs}) : un lieu n'appartient qu'à une strate, et les unités d'une zone commune seraient tirées dans les deux strates et pondérées deux fois. Rendez les polygones des strates disjoints (par exemple avec les outils Différence ou Union de l'hôte) et relancez.</translation>
    </message>
    <message>
        <location filename="../processing/engine/layout.py" line="776"/>
        <source>Strata overlap slightly ({pairs}); units there belong to both. Make the strata polygons disjoint if this is more than digitising noise.</source>
        <translation>Des strates se chevauchent légèrement ({pairs}) ; les unités qui s'y trouvent appartiennent aux deux. Rendez les polygones des strates disjoints si ce n'est pas qu'une imprécision de numérisation.</translation>
    </message>
    <message>
        <location filename="../processing/engine/layout.py" line="862"/>
        <source>MIN_SPACING = {spacing:g} m cannot be met in the frame: {wanted} units were asked for (primaries and reserves), the draw placed {placed}, and at most about {fit} units fit at that spacing (a hexagonal lattice, the densest arrangement; random layouts fill up well before that). Ask for fewer units or reserves, or lower MIN_SPACING.</source>
        <translation>MIN_SPACING = {spacing:g} m ne peut pas être respecté dans la base de sondage : {wanted} unités étaient demandées (principales et de réserve), le tirage en a placé {placed}, et au plus environ {fit} unités tiennent à cet espacement (un réseau hexagonal, l'arrangement le plus dense ; les dispositions aléatoires se remplissent bien avant). Demandez moins d'unités ou de réserves, ou baissez MIN_SPACING.</translation>
    </message>
    <message>
        <location filename="../processing/engine/layout.py" line="862"/>
        <source>MIN_SPACING = {spacing:g} m cannot be met in stratum {key}: {wanted} units were asked for (primaries and reserves), the draw placed {placed}, and at most about {fit} units fit at that spacing (a hexagonal lattice, the densest arrangement; random layouts fill up well before that). Ask for fewer units or reserves, or lower MIN_SPACING.</source>
        <translation>MIN_SPACING = {spacing:g} m ne peut pas être respecté dans la strate {key} : {wanted} unités étaient demandées (principales et de réserve), le tirage en a placé {placed}, et au plus environ {fit} unités tiennent à cet espacement (un réseau hexagonal, l'arrangement le plus dense ; les dispositions aléatoires se remplissent bien avant). Demandez moins d'unités ou de réserves, ou baissez MIN_SPACING.</translation>
    </message>
    <message>
        <location filename="../processing/engine/layout.py" line="964"/>
        <source>A systematic grid of spacing {spacing:.3g} m over an area of {area:,.1f} m² that spreads over {width:,.0f} m x {height:,.0f} m would need {count:,} candidate points. The area is a thin sliver or far too small for the number of units: check the frame for slivers, ask for fewer units, or use another design.</source>
        <translation>Une grille systématique de pas {spacing:.3g} m sur une surface de {area:,.1f} m² étalée sur {width:,.0f} m x {height:,.0f} m demanderait {count:,} points candidats. La surface est un liseré ou bien trop petite pour le nombre d'unités : cherchez les liserés dans la base de sondage, demandez moins d'unités ou choisissez un autre plan.</translation>
    </message>
    <message>
        <location filename="../processing/engine/layout.py" line="1010"/>
        <source>The grid spacing for {n} units in the frame would be {spacing:.1f} m, below MIN_SPACING = {min_spacing:g} m. A square grid at {min_spacing:g} m holds about {fit} units there: ask for at most that many, or lower MIN_SPACING.</source>
        <translation>L'espacement de grille pour {n} unités dans la base de sondage serait de {spacing:.1f} m, sous MIN_SPACING = {min_spacing:g} m. Une grille carrée à {min_spacing:g} m y contient environ {fit} unités : demandez-en au plus autant, ou baissez MIN_SPACING.</translation>
    </message>
    <message>
        <location filename="../processing/engine/layout.py" line="1010"/>
        <source>The grid spacing for {n} units in stratum {key} would be {spacing:.1f} m, below MIN_SPACING = {min_spacing:g} m. A square grid at {min_spacing:g} m holds about {fit} units there: ask for at most that many, or lower MIN_SPACING.</source>
        <translation>L'espacement de grille pour {n} unités dans la strate {key} serait de {spacing:.1f} m, sous MIN_SPACING = {min_spacing:g} m. Une grille carrée à {min_spacing:g} m y contient environ {fit} unités : demandez-en au plus autant, ou baissez MIN_SPACING.</translation>
    </message>
    <message>
        <location filename="../processing/engine/layout.py" line="1029"/>
        <source>{n} grid unit(s) of the frame were dropped: closer than MIN_SPACING to units of a neighbouring stratum.</source>
        <translation>{n} unité(s) de grille de la base de sondage ont été retirées : plus proches que MIN_SPACING d'unités d'une strate voisine.</translation>
    </message>
    <message>
        <location filename="../processing/engine/layout.py" line="1029"/>
        <source>{n} grid unit(s) of stratum {key} were dropped: closer than MIN_SPACING to units of a neighbouring stratum.</source>
        <translation>{n} unité(s) de grille de la strate {key} ont été retirées : plus proches que MIN_SPACING d'unités d'une strate voisine.</translation>
    </message>
    <message>
        <location filename="../processing/engine/layout.py" line="1041"/>
        <source>No grid point fell in the frame (spacing {spacing:.1f} m); it gets no units. Use the simple random or spatially balanced design for small or thin strata.</source>
        <translation>Aucun point de grille n'est tombé dans la base de sondage (espacement {spacing:.1f} m) ; elle ne reçoit aucune unité. Utilisez le plan aléatoire simple ou spatialement équilibré pour les strates petites ou étroites.</translation>
    </message>
    <message>
        <location filename="../processing/engine/layout.py" line="1041"/>
        <source>No grid point fell in stratum {key} (spacing {spacing:.1f} m); it gets no units. Use the simple random or spatially balanced design for small or thin strata.</source>
        <translation>Aucun point de grille n'est tombé dans la strate {key} (espacement {spacing:.1f} m) ; elle ne reçoit aucune unité. Utilisez le plan aléatoire simple ou spatialement équilibré pour les strates petites ou étroites.</translation>
    </message>
    <message>
        <location filename="../processing/engine/layout.py" line="1050"/>
        <source>The frame has only {n} of {r} reserve units.</source>
        <translation>La base de sondage n'a que {n} des {r} unités de réserve.</translation>
    </message>
    <message>
        <location filename="../processing/engine/layout.py" line="1050"/>
        <source>Stratum {key} has only {n} of {r} reserve units.</source>
        <translation>La strate {key} n'a que {n} des {r} unités de réserve.</translation>
    </message>
    <message>
        <location filename="../processing/engine/layout.py" line="147"/>
        <source>start of transect {unit} (primary, stratum {stratum}, bearing {bearing:.0f} deg)</source>
        <translation>début du transect {unit} (principal, strate {stratum}, azimut {bearing:.0f} deg)</translation>
    </message>
    <message>
        <location filename="../processing/engine/layout.py" line="150"/>
        <source>start of transect {unit} (reserve, stratum {stratum}, bearing {bearing:.0f} deg)</source>
        <translation>début du transect {unit} (de réserve, strate {stratum}, azimut {bearing:.0f} deg)</translation>
    </message>
    <message>
        <location filename="../processing/engine/layout.py" line="153"/>
        <source>end of transect {unit} (primary, stratum {stratum}, bearing {bearing:.0f} deg)</source>
        <translation>fin du transect {unit} (principal, strate {stratum}, azimut {bearing:.0f} deg)</translation>
    </message>
    <message>
        <location filename="../processing/engine/layout.py" line="156"/>
        <source>end of transect {unit} (reserve, stratum {stratum}, bearing {bearing:.0f} deg)</source>
        <translation>fin du transect {unit} (de réserve, strate {stratum}, azimut {bearing:.0f} deg)</translation>
    </message>
    <message>
        <location filename="../processing/engine/layout.py" line="139"/>
        <source>point unit {unit} (primary, stratum {stratum})</source>
        <translation>unité ponctuelle {unit} (principale, strate {stratum})</translation>
    </message>
    <message>
        <location filename="../processing/engine/layout.py" line="140"/>
        <source>point unit {unit} (reserve, stratum {stratum})</source>
        <translation>unité ponctuelle {unit} (de réserve, strate {stratum})</translation>
    </message>
    <message>
        <location filename="../processing/engine/layout.py" line="141"/>
        <source>square unit {unit} (primary, stratum {stratum})</source>
        <translation>unité carrée {unit} (principale, strate {stratum})</translation>
    </message>
    <message>
        <location filename="../processing/engine/layout.py" line="142"/>
        <source>square unit {unit} (reserve, stratum {stratum})</source>
        <translation>unité carrée {unit} (de réserve, strate {stratum})</translation>
    </message>
    <message>
        <location filename="../processing/engine/layout.py" line="143"/>
        <source>circle unit {unit} (primary, stratum {stratum})</source>
        <translation>unité circulaire {unit} (principale, strate {stratum})</translation>
    </message>
    <message>
        <location filename="../processing/engine/layout.py" line="144"/>
        <source>circle unit {unit} (reserve, stratum {stratum})</source>
        <translation>unité circulaire {unit} (de réserve, strate {stratum})</translation>
    </message>
    <message>
        <location filename="../processing/engine/stratification.py" line="539"/>
        <source>No cell of the frame has a value in every covariate.</source>
        <translation>Aucune cellule de la base de sondage n'a de valeur dans toutes les covariables.</translation>
    </message>
    <message>
        <location filename="../processing/engine/stratification.py" line="766"/>
        <source>The covariates take fewer distinct value combinations than strata asked for.</source>
        <translation>Les covariables prennent moins de combinaisons de valeurs distinctes que de strates demandées.</translation>
    </message>
    <message>
        <location filename="../processing/engine/stratification.py" line="1027"/>
        <source>The frame holds no raster cell.</source>
        <translation>La base de sondage ne contient aucune cellule raster.</translation>
    </message>
    <message>
        <location filename="../processing/engine/stratification.py" line="1580"/>
        <source>Covariate &apos;{name}&apos; is constant ({value:g}) over the frame: it cannot define strata. Use another covariate, or check the frame and the raster.</source>
        <translation>La covariable « {name} » est constante ({value:g}) sur la base de sondage : elle ne peut pas définir de strates. Utilisez une autre covariable, ou vérifiez la base de sondage et le raster.</translation>
    </message>
    <message>
        <location filename="../processing/engine/stratification.py" line="1598"/>
        <source>Unknown METHOD {method!r}: use 0 (quantile) to 4 (raster classes).</source>
        <translation>METHOD inconnu {method!r} : utilisez 0 (quantiles) à 4 (classes du raster).</translation>
    </message>
    <message>
        <location filename="../processing/engine/stratification.py" line="1602"/>
        <source>Ask for at least 2 strata (STRATA).</source>
        <translation>Demandez au moins 2 strates (STRATA).</translation>
    </message>
    <message>
        <location filename="../processing/engine/stratification.py" line="1609"/>
        <source>No cell of the frame has a value in every covariate ({names}). Check that the rasters cover the frame and that their NoData value is right.</source>
        <translation>Aucune cellule de la base de sondage n'a de valeur dans toutes les covariables ({names}). Vérifiez que les rasters couvrent la base de sondage et que leur valeur NoData est juste.</translation>
    </message>
    <message>
        <location filename="../processing/engine/stratification.py" line="1662"/>
        <source>Covariate &apos;{name}&apos; takes only {n_distinct} distinct values over the frame, fewer than the {k} strata asked for. Lower STRATA to {n_distinct} or fewer.</source>
        <translation>La covariable « {name} » ne prend que {n_distinct} valeurs distinctes sur la base de sondage, moins que les {k} strates demandées. Ramenez STRATA à {n_distinct} ou moins.</translation>
    </message>
    <message>
        <location filename="../processing/engine/stratification.py" line="1677"/>
        <source>Some boundaries coincide (many cells share the same value of &apos;{name}&apos;); {formed} strata are formed instead of {k}.</source>
        <translation>Certaines limites coïncident (beaucoup de cellules partagent la même valeur de « {name} ») ; {formed} strates sont formées au lieu de {k}.</translation>
    </message>
    <message>
        <location filename="../processing/engine/stratification.py" line="1693"/>
        <source>The covariates take only {n_distinct} distinct value combinations over the frame, fewer than the {k} strata asked for. Lower STRATA to {n_distinct} or fewer.</source>
        <translation>Les covariables ne prennent que {n_distinct} combinaisons de valeurs distinctes sur la base de sondage, moins que les {k} strates demandées. Ramenez STRATA à {n_distinct} ou moins.</translation>
    </message>
    <message>
        <location filename="../processing/engine/stratification.py" line="1698"/>
        <source>The covariates take only {n_distinct} distinct value combinations in a sample of {sample_n} cells, fewer than the {k} strata asked for. Lower STRATA to {n_distinct} or fewer.</source>
        <translation>Les covariables ne prennent que {n_distinct} combinaisons de valeurs distinctes dans un échantillon de {sample_n} cellules, moins que les {k} strates demandées. Ramenez STRATA à {n_distinct} ou moins.</translation>
    </message>
    <message>
        <location filename="../processing/engine/stratification.py" line="1712"/>
        <source>Covariate &apos;{name}&apos; has more than {max_classes} classes (at least {n_distinct} distinct values over the frame): reclassify it into {max_classes} classes or fewer first (for example with the host&apos;s reclassify by table tool), or choose another METHOD.</source>
        <translation>La covariable « {name} » a plus de {max_classes} classes (au moins {n_distinct} valeurs distinctes sur la base de sondage) : reclassez-la d'abord en {max_classes} classes ou moins (par exemple avec l'outil de reclassement par table de l'hôte), ou choisissez une autre METHOD.</translation>
    </message>
    <message>
        <location filename="../processing/engine/stratification.py" line="1769"/>
        <source>{dropped} of the {k} strata hold no cell and were dropped.</source>
        <translation>{dropped} des {k} strates ne contiennent aucune cellule et ont été retirées.</translation>
    </message>
    <message>
        <location filename="../processing/engine/stratification.py" line="1888"/>
        <source>{name} class {value}</source>
        <translation>{name} : classe {value}</translation>
    </message>
    <message>
        <location filename="../processing/engine/stratification.py" line="1891"/>
        <source>mean {values}</source>
        <translation>moyenne {values}</translation>
    </message>
    <message>
        <location filename="../processing/gdal_io/covariate_stack.py" line="50"/>
        <source>Covariate &apos;{name}&apos; cannot be read ({error}). Check the file.</source>
        <translation>La covariable « {name} » ne peut pas être lue ({error}). Vérifiez le fichier.</translation>
    </message>
    <message>
        <location filename="../processing/gdal_io/covariate_stack.py" line="54"/>
        <source>Covariate &apos;{name}&apos; has no band {band}.</source>
        <translation>La covariable « {name} » n'a pas de bande {band}.</translation>
    </message>
    <message>
        <location filename="../processing/gdal_io/covariate_stack.py" line="134"/>
        <source>Give at least one raster in COVARIATES.</source>
        <translation>Donnez au moins un raster dans COVARIATES.</translation>
    </message>
    <message>
        <location filename="../processing/gdal_io/covariate_stack.py" line="166"/>
        <source>The frame has no polygon.</source>
        <translation>La base de sondage n'a aucun polygone.</translation>
    </message>
    <message>
        <location filename="../processing/gdal_io/covariate_stack.py" line="211"/>
        <source>The frame does not overlap covariate &apos;{name}&apos; ({path}). Use a raster that covers the frame, or check both layers&apos; CRS.</source>
        <translation>La base de sondage ne recouvre pas la covariable « {name} » ({path}). Utilisez un raster qui couvre la base de sondage, ou vérifiez le SCR des deux couches.</translation>
    </message>
    <message>
        <location filename="../processing/gdal_io/stratum_raster.py" line="21"/>
        <source>Cannot write the stratum raster &apos;{path}&apos;.</source>
        <translation>Impossible d'écrire le raster des strates « {path} ».</translation>
    </message>
    <message>
        <location filename="../processing/gdal_io/stratify_pipeline.py" line="130"/>
        <source>With MIN_AREA {min_area:g} ha, merging the patches below it left a single stratum, so there is nothing to stratify. Lower MIN_AREA.</source>
        <translation>Avec MIN_AREA = {min_area:g} ha, la fusion des taches plus petites n'a laissé qu'une seule strate : il n'y a plus rien à stratifier. Réduisez MIN_AREA.</translation>
    </message>
    <message>
        <location filename="../processing/gdal_io/stratify_pipeline.py" line="138"/>
        <source>{merged} strata consisted only of patches below MIN_AREA and were merged away.</source>
        <translation>{merged} strates n'étaient faites que de taches sous MIN_AREA et ont été fusionnées avec leurs voisines.</translation>
    </message>
    <message>
        <location filename="../processing/gdal_io/stratify_pipeline.py" line="146"/>
        <source>Merging the patches below MIN_AREA moved cells between strata: the share of the variance of &apos;{name}&apos; that the strata explain fell from {before:.2f} to {after:.2f}. A smaller MIN_AREA keeps the strata closer to the covariates.</source>
        <translation>La fusion des taches sous MIN_AREA a fait passer des cellules d'une strate à l'autre : la part de la variance de « {name} » expliquée par les strates est tombée de {before:.2f} à {after:.2f}. Un MIN_AREA plus petit garde les strates plus proches des covariables.</translation>
    </message>
    <message>
        <location filename="../processing/gdal_io/stratify_pipeline.py" line="152"/>
        <source>{n} patch(es) covering {ha:,.2f} ha stay below MIN_AREA ({min_area:g} ha): they touch no other stratum (islands of the frame, or patches ringed by NoData). Remove such islands from the frame, fill the NoData in the covariates, or lower MIN_AREA.</source>
        <translation>{n} tache(s) couvrant {ha:,.2f} ha restent sous MIN_AREA ({min_area:g} ha) : elles ne touchent aucune autre strate (îlots de la base de sondage, ou taches entourées de NoData). Retirez ces îlots de la base de sondage, comblez les NoData des covariables, ou réduisez MIN_AREA.</translation>
    </message>
    <message>
        <location filename="../processing/gdal_io/stratify_pipeline.py" line="180"/>
        <source>The covariates cover {percent:.1f}% of the frame: {outside_ha:,.2f} ha lie outside the rasters and {nodata_ha:,.2f} ha have NoData in at least one covariate; the strata speak for the covered part only.</source>
        <translation>Les covariables couvrent {percent:.1f}% de la base de sondage : {outside_ha:,.2f} ha sont hors des rasters et {nodata_ha:,.2f} ha sont NoData dans au moins une covariable ; les strates ne valent que pour la partie couverte.</translation>
    </message>
    <message>
        <location filename="../processing/gdal_io/surface.py" line="25"/>
        <source>The density surface &apos;{name}&apos; cannot be read by GDAL ({error}). Save it as a GeoTIFF first.</source>
        <translation>La surface de densité « {name} » ne peut pas être lue par GDAL ({error}). Enregistrez-la d'abord en GeoTIFF.</translation>
    </message>
    <message>
        <location filename="../processing/gdal_io/surface.py" line="37"/>
        <source>The density surface &apos;{name}&apos; does not overlap the sampling frame. Check that both cover the same area.</source>
        <translation>La surface de densité « {name} » ne recouvre pas la base de sondage. Vérifiez que les deux couvrent la même zone.</translation>
    </message>
    <message>
        <location filename="../processing/gdal_io/surface.py" line="46"/>
        <source>The density surface &apos;{name}&apos; could not be warped to {crs} ({error}).</source>
        <translation>La surface de densité « {name} » n'a pas pu être reprojetée en {crs} ({error}).</translation>
    </message>
    <message>
        <location filename="../processing/gdal_io/masking.py" line="102"/>
        <source>The mask raster (MASK) &apos;{source}&apos; cannot be opened by GDAL.</source>
        <translation>Le raster de masque (MASK) « {source} » ne peut pas être ouvert par GDAL.</translation>
    </message>
    <message>
        <location filename="../processing/gdal_io/masking.py" line="130"/>
        <source>The mask raster (MASK) would need {rows} x {cols} cells over the study area; that is more than {max_cells:,}. Resample the raster to coarser cells first.</source>
        <translation>Le raster de masque (MASK) demanderait {rows} x {cols} cellules sur la zone d'étude, soit plus de {max_cells:,}. Rééchantillonnez d'abord le raster en cellules plus grossières.</translation>
    </message>
    <message>
        <location filename="../processing/gdal_io/masking.py" line="170"/>
        <source>The mask raster (MASK) cannot be reprojected to the computation CRS.</source>
        <translation>Le raster de masque (MASK) ne peut pas être reprojeté dans le SCR de calcul.</translation>
    </message>
    <message>
        <location filename="../processing/gdal_io/masking.py" line="201"/>
        <source>GDAL could not turn the masked raster cells into polygons.</source>
        <translation>GDAL n'a pas pu transformer les cellules masquées du raster en polygones.</translation>
    </message>
    <message>
        <location filename="../processing/gdal_io/masking.py" line="242"/>
        <source>MASK_MIN ({mask_min:g}) is greater than MASK_MAX ({mask_max:g}); no cell could be kept. Swap the two values or leave one of them empty.</source>
        <translation>MASK_MIN ({mask_min:g}) est supérieur à MASK_MAX ({mask_max:g}) ; aucune cellule ne pourrait être gardée. Inversez les deux valeurs ou laissez l'une d'elles vide.</translation>
    </message>
    <message>
        <location filename="../processing/gdal_io/masking.py" line="248"/>
        <source>The mask raster (MASK) has no band {band}; it has {count}.</source>
        <translation>Le raster de masque (MASK) n'a pas de bande {band} ; il en a {count}.</translation>
    </message>
    <message>
        <location filename="../processing/engine/demo_reserve.py" line="37"/>
        <source>an invented grazing antelope that lives in loose groups</source>
        <translation>une antilope brouteuse inventée qui vit en groupes lâches</translation>
    </message>
    <message>
        <location filename="../processing/engine/unit_shapes.py" line="20"/>
        <source>point</source>
        <translation>point</translation>
    </message>
    <message>
        <location filename="../processing/engine/unit_shapes.py" line="20"/>
        <source>square</source>
        <translation>carré</translation>
    </message>
    <message>
        <location filename="../processing/engine/unit_shapes.py" line="20"/>
        <source>circle</source>
        <translation>cercle</translation>
    </message>
    <message>
        <location filename="../processing/engine/unit_shapes.py" line="20"/>
        <source>line</source>
        <translation>ligne</translation>
    </message>
    <message>
        <location filename="../processing/engine/detections.py" line="52"/>
        <source>OCCASIONS must be a whole number of at least 1.</source>
        <translation>OCCASIONS doit être un nombre entier supérieur ou égal à 1.</translation>
    </message>
    <message>
        <location filename="../processing/engine/detections.py" line="55"/>
        <source>The detection probability at a group must be in (0, 1]; it is {p:g}.</source>
        <translation>La probabilité de détection à l'emplacement d'un groupe doit être dans ]0, 1] ; elle vaut {p:g}.</translation>
    </message>
    <message>
        <location filename="../processing/engine/detections.py" line="58"/>
        <source>The detection scale SIGMA must be more than 0 m.</source>
        <translation>L'échelle de détection SIGMA doit dépasser 0 m.</translation>
    </message>
    <message>
        <location filename="../processing/engine/detections.py" line="61"/>
        <source>The share of occasions not surveyed must be at least 0 and below 1.</source>
        <translation>La part des occasions non échantillonnées doit être d'au moins 0 et inférieure à 1.</translation>
    </message>
    <message>
        <location filename="../processing/engine/detections.py" line="65"/>
        <source>The animal layer holds no animal: there is nothing to detect.</source>
        <translation>La couche des animaux ne contient aucun animal : il n'y a rien à détecter.</translation>
    </message>
    <message>
        <location filename="../processing/engine/occupancy.py" line="159"/>
        <source>Layer {layer}: occupancy needs at least 2 occasions (history fields); {n} given. With one visit per site, detection and occupancy cannot be told apart.</source>
        <translation>Couche {layer} : l'occupation demande au moins 2 occasions (champs d'historique) ; {n} indiquée(s). Avec une seule visite par site, la détection et l'occupation ne peuvent pas être distinguées.</translation>
    </message>
    <message>
        <location filename="../processing/engine/occupancy.py" line="169"/>
        <source>Layer {layer}, history field {field}: sites {ids} hold a value other than 1 (detected), 0 (not detected) or NULL (not surveyed). Correct these values and run again.</source>
        <translation>Couche {layer}, champ d'historique {field} : les sites {ids} contiennent une valeur autre que 1 (détectée), 0 (non détectée) ou NULL (non échantillonné). Corrigez ces valeurs et relancez.</translation>
    </message>
    <message>
        <location filename="../processing/engine/occupancy.py" line="177"/>
        <source>Layer {layer}: no site was surveyed on any occasion (every history value is NULL).</source>
        <translation>Couche {layer} : aucun site n'a été échantillonné à aucune occasion (toutes les valeurs d'historique sont NULL).</translation>
    </message>
    <message>
        <location filename="../processing/engine/occupancy.py" line="181"/>
        <source>Layer {layer}: the species was not detected at any site, so occupancy and detection cannot be estimated (every history is 0).</source>
        <translation>Couche {layer} : l'espèce n'a été détectée sur aucun site, l'occupation et la détection ne peuvent donc pas être estimées (tous les historiques valent 0).</translation>
    </message>
    <message>
        <location filename="../processing/engine/occupancy.py" line="190"/>
        <source>Layer {layer}: {n} sites have an empty (NULL) site id. Give every site an id, or leave SITE_ID_FIELD empty to use the feature ids.</source>
        <translation>Couche {layer} : {n} sites ont un identifiant de site vide (NULL). Donnez un identifiant à chaque site, ou laissez SITE_ID_FIELD vide pour utiliser les identifiants d'entité.</translation>
    </message>
    <message>
        <location filename="../processing/engine/occupancy.py" line="200"/>
        <source>Layer {layer}: site ids {ids} occur more than once. Each site needs one row holding all its occasions; merge the rows or correct the ids.</source>
        <translation>Couche {layer} : les identifiants de site {ids} apparaissent plus d'une fois. Chaque site demande une seule ligne contenant toutes ses occasions ; fusionnez les lignes ou corrigez les identifiants.</translation>
    </message>
    <message>
        <location filename="../processing/engine/occupancy.py" line="228"/>
        <source>Model line {line!r}: write the occupancy terms after psi: and the detection terms after p:, for example psi: elevation p: effort.</source>
        <translation>Ligne de modèle {line!r} : écrivez les termes d'occupation après psi: et les termes de détection après p:, par exemple psi: elevation p: effort.</translation>
    </message>
    <message>
        <location filename="../processing/engine/occupancy.py" line="247"/>
        <source>Model line {line!r}: effort varies by occasion and acts on detection only; move it after p:.</source>
        <translation>Ligne de modèle {line!r} : effort varie selon l'occasion et n'agit que sur la détection ; placez-le après p:.</translation>
    </message>
    <message>
        <location filename="../processing/engine/occupancy.py" line="254"/>
        <source>Model line {line!r}: {name} is not a numeric field of the sites layer (give EFFORT_FIELDS to use effort). Use the field names as they are in the layer.</source>
        <translation>Ligne de modèle {line!r} : {name} n'est pas un champ numérique de la couche des sites (indiquez EFFORT_FIELDS pour utiliser effort). Utilisez les noms de champs tels qu'ils figurent dans la couche.</translation>
    </message>
    <message>
        <location filename="../processing/engine/occupancy.py" line="254"/>
        <source>Model line {line!r}: {name} is not a numeric field of the sites layer. Use the field names as they are in the layer.</source>
        <translation>Ligne de modèle {line!r} : {name} n'est pas un champ numérique de la couche des sites. Utilisez les noms de champs tels qu'ils figurent dans la couche.</translation>
    </message>
    <message>
        <location filename="../processing/engine/occupancy.py" line="290"/>
        <source>CONFIDENCE must be at least 0.5 and below 1; it is {value}.</source>
        <translation>CONFIDENCE doit valoir au moins 0.5 et moins de 1 ; il vaut {value}.</translation>
    </message>
    <message>
        <location filename="../processing/engine/occupancy.py" line="293"/>
        <source>TARGET_SE must be 0 (no advice) or more; it is {value}.</source>
        <translation>TARGET_SE doit valoir 0 (pas de conseil) ou plus ; il vaut {value}.</translation>
    </message>
    <message>
        <location filename="../processing/engine/occupancy.py" line="296"/>
        <source>The number of goodness-of-fit replicates must be 0 or a positive whole number.</source>
        <translation>Le nombre de réplicats du test d'adéquation doit valoir 0 ou un nombre entier positif.</translation>
    </message>
    <message>
        <location filename="../processing/engine/occupancy.py" line="309"/>
        <source>A model uses effort but no EFFORT_FIELDS were given.</source>
        <translation>Un modèle utilise effort mais aucun champ EFFORT_FIELDS n'a été indiqué.</translation>
    </message>
    <message>
        <location filename="../processing/engine/occupancy.py" line="326"/>
        <source>Layer {layer} has no covariate field {field}.</source>
        <translation>La couche {layer} n'a pas de champ de covariable {field}.</translation>
    </message>
    <message>
        <location filename="../processing/engine/occupancy.py" line="332"/>
        <source>Layer {layer}, covariate field {field}: surveyed sites {ids} have no number (NULL or text). Fill in the values, leave these sites out, or drop the covariate.</source>
        <translation>Couche {layer}, champ de covariable {field} : les sites échantillonnés {ids} n'ont pas de nombre (NULL ou texte). Renseignez les valeurs, écartez ces sites, ou retirez la covariable.</translation>
    </message>
    <message>
        <location filename="../processing/engine/occupancy.py" line="338"/>
        <source>Layer {layer}, covariate field {field}: every surveyed site has the same value ({value:g}), so its effect cannot be estimated. Drop it from the model.</source>
        <translation>Couche {layer}, champ de covariable {field} : tous les sites échantillonnés ont la même valeur ({value:g}), son effet ne peut donc pas être estimé. Retirez-la du modèle.</translation>
    </message>
    <message>
        <location filename="../processing/engine/occupancy.py" line="347"/>
        <source>Give one effort field per history field, in the same order: {k} history fields and {e} effort fields.</source>
        <translation>Indiquez un champ d'effort par champ d'historique, dans le même ordre : {k} champs d'historique et {e} champs d'effort.</translation>
    </message>
    <message>
        <location filename="../processing/engine/occupancy.py" line="362"/>
        <source>Layer {layer}, effort fields {fields}: surveyed sites {ids} have no effort, or a negative one, on an occasion they were surveyed. Give every survey its effort.</source>
        <translation>Couche {layer}, champs d'effort {fields} : les sites échantillonnés {ids} n'ont pas d'effort, ou un effort négatif, à une occasion où ils ont été échantillonnés. Donnez son effort à chaque visite.</translation>
    </message>
    <message>
        <location filename="../processing/engine/occupancy.py" line="368"/>
        <source>Layer {layer}: the effort is the same on every survey, so its effect cannot be estimated. Leave EFFORT_FIELDS empty.</source>
        <translation>Couche {layer} : l'effort est le même à chaque visite, son effet ne peut donc pas être estimé. Laissez EFFORT_FIELDS vide.</translation>
    </message>
    <message>
        <location filename="../processing/engine/occupancy.py" line="733"/>
        <source>The search for the maximum stopped after {n} iterations without converging.</source>
        <translation>La recherche du maximum s'est arrêtée après {n} itérations sans converger.</translation>
    </message>
    <message>
        <location filename="../processing/engine/occupancy.py" line="745"/>
        <source>The observed information is not positive definite at the maximum: the parameters cannot all be estimated from these data (collinear covariates, or too few detections).</source>
        <translation>L'information observée n'est pas définie positive au maximum : les paramètres ne peuvent pas tous être estimés à partir de ces données (covariables colinéaires, ou trop peu de détections).</translation>
    </message>
    <message>
        <location filename="../processing/engine/occupancy.py" line="1031"/>
        <source>The occupancy model ({model}) could not be fitted: {why} No estimate is given. Try fewer covariates, more sites or more occasions.</source>
        <translation>Le modèle d'occupation ({model}) n'a pas pu être ajusté : {why} Aucune estimation n'est donnée. Essayez moins de covariables, plus de sites ou plus d'occasions.</translation>
    </message>
    <message>
        <location filename="../processing/engine/occupancy.py" line="1036"/>
        <source>The model {model} could not be fitted and is left out of the comparison: {why}</source>
        <translation>Le modèle {model} n'a pas pu être ajusté et est exclu de la comparaison : {why}</translation>
    </message>
    <message>
        <location filename="../processing/engine/occupancy.py" line="1040"/>
        <source>Sites {ids} have no surveyed occasion (every history value NULL) and were left out of the analysis.</source>
        <translation>Les sites {ids} n'ont aucune occasion échantillonnée (toutes les valeurs d'historique NULL) et ont été écartés de l'analyse.</translation>
    </message>
    <message>
        <location filename="../processing/engine/occupancy.py" line="1048"/>
        <source>The goodness-of-fit test was skipped: with {k} occasions there are too many possible detection histories to enumerate.</source>
        <translation>Le test d'adéquation n'a pas été fait : avec {k} occasions, il y a trop d'historiques de détection possibles à énumérer.</translation>
    </message>
    <message>
        <location filename="../processing/engine/occupancy.py" line="1052"/>
        <source>The goodness-of-fit test was skipped: the model has parameters at the boundary.</source>
        <translation>Le test d'adéquation n'a pas été fait : le modèle a des paramètres à la borne.</translation>
    </message>
    <message>
        <location filename="../processing/engine/occupancy.py" line="1066"/>
        <source>psi is at the boundary of its range (estimate {psi:.4f}): the data are consistent with every site being occupied. Its standard error and interval cannot be computed from the information; the other estimates are conditional on it.</source>
        <translation>psi est à la borne de son domaine (estimation {psi:.4f}) : les données sont compatibles avec l'occupation de tous les sites. Son erreur type et son intervalle ne peuvent pas être calculés à partir de l'information ; les autres estimations sont conditionnelles à cette valeur.</translation>
    </message>
    <message>
        <location filename="../processing/engine/occupancy.py" line="1066"/>
        <source>psi is at the boundary of its range (estimate {psi:.4f}): the data are consistent with no site being occupied. Its standard error and interval cannot be computed from the information; the other estimates are conditional on it.</source>
        <translation>psi est à la borne de son domaine (estimation {psi:.4f}) : les données sont compatibles avec le fait qu'aucun site ne soit occupé. Son erreur type et son intervalle ne peuvent pas être calculés à partir de l'information ; les autres estimations sont conditionnelles à cette valeur.</translation>
    </message>
    <message>
        <location filename="../processing/engine/occupancy.py" line="1076"/>
        <source>p is at the boundary of its range (estimate {p:.4f}): every survey of a site with a detection detected the species. Its standard error cannot be computed; psi is then the naive occupancy.</source>
        <translation>p est à la borne de son domaine (estimation {p:.4f}) : chaque visite d'un site avec une détection a détecté l'espèce. Son erreur type ne peut pas être calculée ; psi est alors l'occupation naïve.</translation>
    </message>
    <message>
        <location filename="../processing/engine/occupancy.py" line="1081"/>
        <source>Parameter {name} is at the boundary (a logit beyond {limit:g}): a covariate separates the sites, or a probability is 0 or 1. Its standard error cannot be computed; simplify the model.</source>
        <translation>Le paramètre {name} est à la borne (un logit au-delà de {limit:g}) : une covariable sépare les sites, ou une probabilité vaut 0 ou 1. Son erreur type ne peut pas être calculée ; simplifiez le modèle.</translation>
    </message>
    <message>
        <location filename="../processing/engine/occupancy.py" line="1091"/>
        <source>{n} bootstrap data sets could not be fitted and were left out of the goodness-of-fit test.</source>
        <translation>{n} jeux de données bootstrap n'ont pas pu être ajustés et ont été exclus du test d'adéquation.</translation>
    </message>
    <message>
        <location filename="../processing/engine/occupancy.py" line="1095"/>
        <source>The goodness-of-fit test rejects the model (p = {p:.3f}, c-hat = {c:.2f}): the histories vary more than the model allows. Standard errors may be too small; multiply their squares by c-hat, or add covariates.</source>
        <translation>Le test d'adéquation rejette le modèle (p = {p:.3f}, c-hat = {c:.2f}) : les historiques varient plus que le modèle ne le permet. Les erreurs types sont peut-être trop petites ; multipliez leurs carrés par c-hat, ou ajoutez des covariables.</translation>
    </message>
    <message>
        <location filename="../processing/engine/stations.py" line="68"/>
        <source>station {station} (primary, stratum {stratum})</source>
        <translation>station {station} (principale, strate {stratum})</translation>
    </message>
    <message>
        <location filename="../processing/engine/stations.py" line="69"/>
        <source>station {station} (reserve, stratum {stratum})</source>
        <translation>station {station} (de réserve, strate {stratum})</translation>
    </message>
    <message>
        <location filename="../processing/engine/stations.py" line="70"/>
        <source>station {station} of cluster {cluster} (primary, stratum {stratum})</source>
        <translation>station {station} de la grappe {cluster} (principale, strate {stratum})</translation>
    </message>
    <message>
        <location filename="../processing/engine/stations.py" line="72"/>
        <source>station {station} of cluster {cluster} (reserve, stratum {stratum})</source>
        <translation>station {station} de la grappe {cluster} (de réserve, strate {stratum})</translation>
    </message>
    <message>
        <location filename="../processing/engine/stations.py" line="120"/>
        <source>ARRAY must be 0 (grid), 1 (clusters) or 2 (balanced).</source>
        <translation>ARRAY doit valoir 0 (grille), 1 (grappes) ou 2 (équilibré).</translation>
    </message>
    <message>
        <location filename="../processing/engine/stations.py" line="123"/>
        <source>The spacing rule must be 0 (independent occupancy sites) or 1 (spatial capture-recapture).</source>
        <translation>La règle d'espacement doit valoir 0 (sites d'occupation indépendants) ou 1 (capture-recapture spatiale).</translation>
    </message>
    <message>
        <location filename="../processing/engine/stations.py" line="128"/>
        <source>{name} must be 0 or a positive whole number; it is {value}.</source>
        <translation>{name} doit valoir 0 ou un nombre entier positif ; il vaut {value}.</translation>
    </message>
    <message>
        <location filename="../processing/engine/stations.py" line="132"/>
        <source>HOME_RANGE, SPACING and MIN_SPACING must be 0 or more.</source>
        <translation>HOME_RANGE, SPACING et MIN_SPACING doivent valoir 0 ou plus.</translation>
    </message>
    <message>
        <location filename="../processing/engine/stations.py" line="135"/>
        <source>Give the species' home range (HOME_RANGE, km²) or a station spacing (SPACING, m): the spacing is taken from one of them.</source>
        <translation>Indiquez le domaine vital de l'espèce (HOME_RANGE, km²) ou un espacement des stations (SPACING, m) : l'espacement est tiré de l'un des deux.</translation>
    </message>
    <message>
        <location filename="../processing/engine/stations.py" line="139"/>
        <source>N_STATIONS must be at least 1 for clusters and balanced stations (0 means &apos;fill the frame&apos; for the grid only).</source>
        <translation>N_STATIONS doit valoir au moins 1 pour les grappes et les stations équilibrées (0 signifie « remplir la base de sondage » pour la grille seulement).</translation>
    </message>
    <message>
        <location filename="../processing/engine/stations.py" line="143"/>
        <source>CLUSTER_SIZE must be at least 2 stations per cluster.</source>
        <translation>CLUSTER_SIZE doit valoir au moins 2 stations par grappe.</translation>
    </message>
    <message>
        <location filename="../processing/engine/stations.py" line="147"/>
        <source>MIN_SPACING ({min_spacing:g} m) is larger than the station spacing ({spacing:.0f} m): stations of the array would break it. Lower MIN_SPACING or raise SPACING.</source>
        <translation>MIN_SPACING ({min_spacing:g} m) dépasse l'espacement des stations ({spacing:.0f} m) : les stations du dispositif ne le respecteraient pas. Baissez MIN_SPACING ou augmentez SPACING.</translation>
    </message>
    <message>
        <location filename="../processing/engine/stations.py" line="239"/>
        <source>N_STATIONS = {n} is fewer than {minimum} per stratum for {h} strata; every stratum gets {minimum} ({total} stations).</source>
        <translation>N_STATIONS = {n} fait moins de {minimum} par strate pour {h} strates ; chaque strate en reçoit {minimum} ({total} stations).</translation>
    </message>
    <message>
        <location filename="../processing/engine/stations.py" line="271"/>
        <source>Only {fit} grid stations at {spacing:.0f} m fit in the frame; {n} were asked for. Ask for fewer stations (0 takes every grid point), or lower the spacing.</source>
        <translation>Seules {fit} stations de grille à {spacing:.0f} m tiennent dans la base de sondage ; {n} étaient demandées. Demandez moins de stations (0 prend chaque point de la grille), ou réduisez l'espacement.</translation>
    </message>
    <message>
        <location filename="../processing/engine/stations.py" line="312"/>
        <source>A cluster of {k} stations {spacing:.0f} m apart (radius {radius:.0f} m) does not fit wholly in stratum {key}. Use smaller clusters, a smaller spacing, or the balanced array.</source>
        <translation>Une grappe de {k} stations espacées de {spacing:.0f} m (rayon {radius:.0f} m) ne tient pas entièrement dans la strate {key}. Utilisez des grappes plus petites, un espacement plus petit, ou le dispositif équilibré.</translation>
    </message>
    <message>
        <location filename="../processing/engine/stations.py" line="312"/>
        <source>A cluster of {k} stations {spacing:.0f} m apart (radius {radius:.0f} m) does not fit wholly in the frame. Use smaller clusters, a smaller spacing, or the balanced array.</source>
        <translation>Une grappe de {k} stations espacées de {spacing:.0f} m (rayon {radius:.0f} m) ne tient pas entièrement dans la base de sondage. Utilisez des grappes plus petites, un espacement plus petit, ou le dispositif équilibré.</translation>
    </message>
    <message>
        <location filename="../processing/engine/stations.py" line="331"/>
        <source>{wanted} stations (primaries and reserves) at least {distance:.0f} m apart do not fit in stratum {key}: at most about {fit} fit there (a hexagonal lattice; random layouts fill up well before that). Ask for fewer, or lower the spacing.</source>
        <translation>{wanted} stations (principales et de réserve) espacées d'au moins {distance:.0f} m ne tiennent pas dans la strate {key} : au plus environ {fit} y tiennent (un réseau hexagonal ; les dispositions aléatoires se remplissent bien avant). Demandez-en moins, ou réduisez l'espacement.</translation>
    </message>
    <message>
        <location filename="../processing/engine/stations.py" line="335"/>
        <source>{wanted} stations (primaries and reserves) at least {distance:.0f} m apart do not fit in the frame: at most about {fit} fit there (a hexagonal lattice; random layouts fill up well before that). Ask for fewer, or lower the spacing.</source>
        <translation>{wanted} stations (principales et de réserve) espacées d'au moins {distance:.0f} m ne tiennent pas dans la base de sondage : au plus environ {fit} y tiennent (un réseau hexagonal ; les dispositions aléatoires se remplissent bien avant). Demandez-en moins, ou réduisez l'espacement.</translation>
    </message>
    <message>
        <location filename="../processing/engine/stations.py" line="339"/>
        <source>{wanted} clusters (primaries and reserves) with centres at least {distance:.0f} m apart do not fit in stratum {key}: at most about {fit} fit there (a hexagonal lattice; random layouts fill up well before that). Ask for fewer stations, smaller clusters, or a smaller spacing.</source>
        <translation>{wanted} grappes (principales et de réserve) dont les centres sont espacés d'au moins {distance:.0f} m ne tiennent pas dans la strate {key} : au plus environ {fit} y tiennent (un réseau hexagonal ; les dispositions aléatoires se remplissent bien avant). Demandez moins de stations, des grappes plus petites, ou un espacement plus petit.</translation>
    </message>
    <message>
        <location filename="../processing/engine/stations.py" line="344"/>
        <source>{wanted} clusters (primaries and reserves) with centres at least {distance:.0f} m apart do not fit in the frame: at most about {fit} fit there (a hexagonal lattice; random layouts fill up well before that). Ask for fewer stations, smaller clusters, or a smaller spacing.</source>
        <translation>{wanted} grappes (principales et de réserve) dont les centres sont espacés d'au moins {distance:.0f} m ne tiennent pas dans la base de sondage : au plus environ {fit} y tiennent (un réseau hexagonal ; les dispositions aléatoires se remplissent bien avant). Demandez moins de stations, des grappes plus petites, ou un espacement plus petit.</translation>
    </message>
    <message>
        <location filename="../processing/engine/stations.py" line="417"/>
        <source>The array's primary stations cover {n:.1f} home ranges (convex hull {area:.2f} km² against a home range of {hr:g} km²): an array smaller than about {few:g} home ranges cannot estimate density (spatial capture-recapture). Spread the stations wider.</source>
        <translation>Les stations principales du dispositif couvrent {n:.1f} domaines vitaux (enveloppe convexe de {area:.2f} km² pour un domaine vital de {hr:g} km²) : un dispositif plus petit qu'environ {few:g} domaines vitaux ne permet pas d'estimer la densité (capture-recapture spatiale). Écartez davantage les stations.</translation>
    </message>
    <message>
        <location filename="../processing/engine/stations.py" line="443"/>
        <source>The frame gets no station.</source>
        <translation>La base de sondage ne reçoit aucune station.</translation>
    </message>
    <message>
        <location filename="../processing/engine/stations.py" line="443"/>
        <source>Stratum {key} gets no station.</source>
        <translation>La strate {key} ne reçoit aucune station.</translation>
    </message>
    <message>
        <location filename="../processing/engine/stations.py" line="448"/>
        <source>No station could be placed in the frame at a spacing of {spacing:.0f} m. Lower the spacing or check the frame.</source>
        <translation>Aucune station n'a pu être placée dans la base de sondage avec un espacement de {spacing:.0f} m. Réduisez l'espacement ou vérifiez la base de sondage.</translation>
    </message>
    <message>
        <location filename="../processing/engine/stations.py" line="508"/>
        <source>The working day must be longer than 0 hours.</source>
        <translation>La journée de travail doit durer plus de 0 heure.</translation>
    </message>
    <message>
        <location filename="../processing/engine/design_comparison.py" line="90"/>
        <source>stratified Neyman (best case)</source>
        <translation>stratifié Neyman (meilleur cas)</translation>
    </message>
    <message>
        <location filename="../processing/engine/design_comparison.py" line="90"/>
        <source>stratified Neyman (pilot)</source>
        <translation>stratifié Neyman (pilote)</translation>
    </message>
    <message>
        <location filename="../processing/engine/design_comparison.py" line="935"/>
        <source>The pilot needs at least 2 units per stratum.</source>
        <translation>Le pilote demande au moins 2 unités par strate.</translation>
    </message>
    <message>
        <location filename="../processing/engine/design_comparison.py" line="1445"/>
        <source>{design} at {n_units} units: relative bias {bias:+.1%}, beyond the simulation's noise (±{noise:.1%} with {replicates} simulated surveys; tested at the {level:.0%} level across {tests} design(s)). A likely cause: units kept inside never reach the edge of the frame or of their stratum, so the edge band weighs less in the estimate; where its density differs from the interior, the estimate is biased. Plus sampling (INSIDE off) removes this bias.</source>
        <translation>{design} avec {n_units} unités : biais relatif {bias:+.1%}, au-delà du bruit de la simulation (±{noise:.1%} avec {replicates} inventaires simulés ; test au seuil de {level:.0%} sur l'ensemble des {tests} plan(s)). Cause probable : les unités gardées à l'intérieur n'atteignent jamais le bord de la base de sondage ou de leur strate, si bien que la bande de bordure pèse moins dans l'estimation ; là où sa densité diffère de l'intérieur, l'estimation est biaisée. L'échantillonnage « plus » (INSIDE désactivé) supprime ce biais.</translation>
    </message>
    <message>
        <location filename="../processing/engine/design_comparison.py" line="1445"/>
        <source>{design} at {n_units} units: relative bias {bias:+.1%}, beyond the simulation's noise (±{noise:.1%} with {replicates} simulated surveys; tested at the {level:.0%} level across {tests} design(s)). Plus sampling is unbiased, so the likely cause is the ratio estimator with very few animals per unit, or a systematic grid whose realised number of units varies with the surface; more units reduce it.</source>
        <translation>{design} avec {n_units} unités : biais relatif {bias:+.1%}, au-delà du bruit de la simulation (±{noise:.1%} avec {replicates} inventaires simulés ; test au seuil de {level:.0%} sur l'ensemble des {tests} plan(s)). L'échantillonnage « plus » est sans biais : la cause probable est donc l'estimateur par le ratio avec très peu d'animaux par unité, ou une grille systématique dont le nombre réalisé d'unités varie avec la surface ; davantage d'unités le réduisent.</translation>
    </message>
    <message>
        <location filename="../processing/engine/distance_density.py" line="246"/>
        <source>The survey type must be &apos;line&apos; or &apos;point&apos; (got &apos;{survey}&apos;).</source>
        <translation>Le type d'inventaire doit être 'line' ou 'point' (reçu '{survey}').</translation>
    </message>
    <message>
        <location filename="../processing/engine/detection_functions.py" line="116"/>
        <source>The truncation distance must be above 0 m (got {w:g} m).</source>
        <translation>La distance de troncature doit dépasser 0 m (reçu {w:g} m).</translation>
    </message>
    <message>
        <location filename="../processing/engine/detection_functions.py" line="121"/>
        <source>{count} distances are missing or not numbers. Fill them in or leave those detections out.</source>
        <translation>{count} distances sont manquantes ou ne sont pas des nombres. Renseignez-les ou écartez ces détections.</translation>
    </message>
    <message>
        <location filename="../processing/engine/detection_functions.py" line="126"/>
        <source>{count} distances are negative. Distances are measured from the line or the point outwards and are 0 m or more; correct them.</source>
        <translation>{count} distances sont négatives. Les distances se mesurent depuis la ligne ou le point vers l'extérieur et valent 0 m ou plus ; corrigez-les.</translation>
    </message>
    <message>
        <location filename="../processing/engine/detection_functions.py" line="132"/>
        <source>{count} distances lie beyond the truncation distance of {w:g} m. Leave them out first (right truncation) or raise the truncation distance.</source>
        <translation>{count} distances se trouvent au-delà de la distance de troncature de {w:g} m. Écartez-les d'abord (troncature à droite) ou augmentez la distance de troncature.</translation>
    </message>
    <message>
        <location filename="../processing/engine/detection_functions.py" line="138"/>
        <source>A detection function needs at least 2 distances (got {n}).</source>
        <translation>Une fonction de détection demande au moins 2 distances (reçu {n}).</translation>
    </message>
    <message>
        <location filename="../processing/engine/detection_functions.py" line="146"/>
        <source>The distance bands must start at 0 m, increase, and end at the truncation distance {w:g} m, with at least two bands (got {cutpoints}).</source>
        <translation>Les classes de distance doivent commencer à 0 m, croître et finir à la distance de troncature {w:g} m, avec au moins deux classes (reçu {cutpoints}).</translation>
    </message>
    <message>
        <location filename="../processing/engine/detection_functions.py" line="745"/>
        <source>Without a truncation distance only the half-normal key alone can be fitted; give a truncation distance for {model}.</source>
        <translation>Sans distance de troncature, seule la fonction clé demi-normale sans terme d'ajustement peut être ajustée ; donnez une distance de troncature pour {model}.</translation>
    </message>
    <message>
        <location filename="../processing/engine/detection_functions.py" line="752"/>
        <source>The model {model} has {q} parameters, more than the {free} the distances can support. Use fewer cosine terms or more distance bands.</source>
        <translation>Le modèle {model} a {q} paramètres, plus que les {free} que les distances permettent. Utilisez moins de termes en cosinus ou davantage de classes de distance.</translation>
    </message>
    <message>
        <location filename="../processing/engine/detection_functions.py" line="820"/>
        <source>Choose at least one key function among half-normal, hazard-rate and uniform.</source>
        <translation>Choisissez au moins une fonction clé parmi demi-normale, taux de risque (hazard-rate) et uniforme.</translation>
    </message>
    <message>
        <location filename="../processing/engine/detection_functions.py" line="846"/>
        <source>No detection function could be fitted to these {n} distances. Check the distances and the truncation distance.</source>
        <translation>Aucune fonction de détection n'a pu être ajustée à ces {n} distances. Vérifiez les distances et la distance de troncature.</translation>
    </message>
    <message>
        <location filename="../processing/engine/distance_density.py" line="111"/>
        <source>Layer &apos;{layer}&apos;: {n} units have no id in the field &apos;{field}&apos;. Give every unit its id.</source>
        <translation>Couche « {layer} » : {n} unités n'ont pas d'identifiant dans le champ « {field} ». Donnez à chaque unité son identifiant.</translation>
    </message>
    <message>
        <location filename="../processing/engine/distance_density.py" line="117"/>
        <source>Layer &apos;{layer}&apos;: the unit ids {ids} occur more than once in the field &apos;{field}&apos;. Each unit needs its own id.</source>
        <translation>Couche « {layer} » : les identifiants d'unité {ids} apparaissent plus d'une fois dans le champ « {field} ». Chaque unité demande son propre identifiant.</translation>
    </message>
    <message>
        <location filename="../processing/engine/distance_density.py" line="127"/>
        <source>Layer &apos;{layer}&apos;: the transects {ids} have zero length. Delete them or draw their line.</source>
        <translation>Couche « {layer} » : les transects {ids} ont une longueur nulle. Supprimez-les ou tracez leur ligne.</translation>
    </message>
    <message>
        <location filename="../processing/engine/distance_density.py" line="131"/>
        <source>Layer &apos;{layer}&apos;: the points {ids} have no visits. Give each surveyed point its number of visits (1 or more), or delete the points that were not surveyed.</source>
        <translation>Couche « {layer} » : les points {ids} n'ont aucune visite. Donnez à chaque point inventorié son nombre de visites (1 ou plus), ou supprimez les points qui n'ont pas été inventoriés.</translation>
    </message>
    <message>
        <location filename="../processing/engine/distance_density.py" line="140"/>
        <source>Layer &apos;{layer}&apos;: the units {ids} have no stratum, or a stratum that the strata layer does not have ({strata}). Give each unit the id of its stratum.</source>
        <translation>Couche « {layer} » : les unités {ids} n'ont pas de strate, ou une strate que la couche des strates n'a pas ({strata}). Donnez à chaque unité l'identifiant de sa strate.</translation>
    </message>
    <message>
        <location filename="../processing/engine/distance_density.py" line="150"/>
        <source>The strata {strata} have no surveyed transect or point. Survey them, or leave them out of the strata layer (the estimate then speaks for the other strata only).</source>
        <translation>Les strates {strata} n'ont aucun transect ni point inventorié. Inventoriez-les, ou retirez-les de la couche des strates (l'estimation ne porte alors que sur les autres strates).</translation>
    </message>
    <message>
        <location filename="../processing/engine/distance_density.py" line="157"/>
        <source>The strata {strata} have one transect or point each; the encounter rate&apos;s variance needs at least 2 per stratum. Merge each with a neighbouring stratum in the strata layer and the units&apos; stratum field.</source>
        <translation>Les strates {strata} n'ont qu'un transect ou un point chacune ; la variance du taux de rencontre en demande au moins 2 par strate. Fusionnez chacune avec une strate voisine dans la couche des strates et dans le champ de strate des unités.</translation>
    </message>
    <message>
        <location filename="../processing/engine/distance_density.py" line="178"/>
        <source>Layer &apos;{layer}&apos;: observations name units that the layer &apos;{units}&apos; does not have (field &apos;{field}&apos;): {ids}. Correct these unit ids, or add the units.</source>
        <translation>Couche « {layer} » : des observations nomment des unités que la couche « {units} » n'a pas (champ « {field} ») : {ids}. Corrigez ces identifiants d'unité, ou ajoutez les unités.</translation>
    </message>
    <message>
        <location filename="../processing/engine/distance_density.py" line="187"/>
        <source>Layer &apos;{layer}&apos;: the observations {ids} have no distance in the field &apos;{field}&apos; (empty or not a number). Fill in the distances, or delete those observations.</source>
        <translation>Couche « {layer} » : les observations {ids} n'ont pas de distance dans le champ « {field} » (vide ou qui n'est pas un nombre). Renseignez les distances, ou supprimez ces observations.</translation>
    </message>
    <message>
        <location filename="../processing/engine/distance_density.py" line="194"/>
        <source>Layer &apos;{layer}&apos;: the observations {ids} have a negative distance in the field &apos;{field}&apos;. Distances are measured from the line or the point outwards and are 0 m or more; correct them.</source>
        <translation>Couche « {layer} » : les observations {ids} ont une distance négative dans le champ « {field} ». Les distances se mesurent depuis la ligne ou le point vers l'extérieur et valent 0 m ou plus ; corrigez-les.</translation>
    </message>
    <message>
        <location filename="../processing/engine/distance_density.py" line="206"/>
        <source>Layer &apos;{layer}&apos;: the observations {ids} have no group size above 0 in the field &apos;{field}&apos;. Fill in the number of animals seen in each group (1 for a single animal), or choose no group-size field.</source>
        <translation>Couche « {layer} » : les observations {ids} n'ont pas de taille de groupe supérieure à 0 dans le champ « {field} ». Renseignez le nombre d'animaux vus dans chaque groupe (1 pour un animal seul), ou ne choisissez pas de champ de taille des groupes.</translation>
    </message>
    <message>
        <location filename="../processing/engine/distance_density.py" line="219"/>
        <source>The distance bands must start at 0 m and increase, with at least two bands (got {cutpoints}).</source>
        <translation>Les classes de distance doivent commencer à 0 m et croître, avec au moins deux classes (reçu {cutpoints}).</translation>
    </message>
    <message>
        <location filename="../processing/engine/distance_density.py" line="227"/>
        <source>There are no observations: a detection function needs at least {minimum} detections.</source>
        <translation>Il n'y a aucune observation : une fonction de détection demande au moins {minimum} détections.</translation>
    </message>
    <message>
        <location filename="../processing/engine/distance_density.py" line="256"/>
        <source>Only {n} detections lie within the truncation distance of {w:g} m; a detection function needs at least {minimum} (common practice: 60 to 80). Survey more transects or points, or raise the truncation distance.</source>
        <translation>Seules {n} détections se trouvent en deçà de la distance de troncature de {w:g} m ; une fonction de détection en demande au moins {minimum} (pratique courante : 60 à 80). Inventoriez davantage de transects ou de points, ou augmentez la distance de troncature.</translation>
    </message>
    <message>
        <location filename="../processing/engine/distance_density.py" line="264"/>
        <source>Only {n} detections lie within the truncation distance: the detection function rests on few distances (common practice asks for 60 to 80), so its shape and the density are uncertain, and AIC may choose a model by chance.</source>
        <translation>Seules {n} détections se trouvent en deçà de la distance de troncature : la fonction de détection repose sur peu de distances (la pratique courante en demande 60 à 80), si bien que sa forme et la densité sont incertaines, et l'AIC peut choisir un modèle par hasard.</translation>
    </message>
    <message>
        <location filename="../processing/engine/distance_density.py" line="414"/>
        <source>A detection function per stratum needs at least {minimum} detections in each stratum within the truncation distance; these strata have fewer: {strata}. Use one detection function for all strata.</source>
        <translation>Une fonction de détection par strate demande au moins {minimum} détections dans chaque strate en deçà de la distance de troncature ; ces strates en ont moins : {strata}. Utilisez une seule fonction de détection pour toutes les strates.</translation>
    </message>
    <message>
        <location filename="../processing/engine/distance_density.py" line="433"/>
        <source>Stratum {stratum}: its detection function rests on {n} detections (common practice asks for 60 to 80 per function); consider one function for all strata.</source>
        <translation>Strate {stratum} : sa fonction de détection repose sur {n} détections (la pratique courante en demande 60 à 80 par fonction) ; envisagez une seule fonction pour toutes les strates.</translation>
    </message>
    <message>
        <location filename="../processing/engine/distance_density.py" line="442"/>
        <source>The chosen detection function ({model}{at}) fits the distances poorly (goodness-of-fit p = {p:.3f}). Look at the histogram for heaping at round distances or a spike at 0, and consider distance bands or another truncation.</source>
        <translation>La fonction de détection choisie ({model}{at}) s'ajuste mal aux distances (test d'adéquation p = {p:.3f}). Cherchez dans l'histogramme une accumulation sur des distances rondes ou un pic à 0, et envisagez des classes de distance ou une autre troncature.</translation>
    </message>
    <message>
        <location filename="../processing/engine/distance_density.py" line="449"/>
        <source>The chosen detection function ({model}) has a parameter at the limit of its range, so its variance is unreliable; try another truncation or key.</source>
        <translation>La fonction de détection choisie ({model}) a un paramètre à la limite de son domaine, si bien que sa variance n'est pas fiable ; essayez une autre troncature ou une autre fonction clé.</translation>
    </message>
    <message>
        <location filename="../processing/engine/distance_density.py" line="455"/>
        <source>The variance of the detection function ({model}) could not be computed (the likelihood is flat at its maximum); its CV is missing from the interval.</source>
        <translation>La variance de la fonction de détection ({model}) n'a pas pu être calculée (la vraisemblance est plate à son maximum) ; son CV manque dans l'intervalle.</translation>
    </message>
    <message>
        <location filename="../processing/engine/distance_density.py" line="660"/>
        <source>The bootstrap failed: {failed} of {n} resamples could not be fitted. Run without the bootstrap.</source>
        <translation>Le bootstrap a échoué : {failed} des {n} rééchantillonnages n'ont pas pu être ajustés. Relancez sans le bootstrap.</translation>
    </message>
    <message>
        <location filename="../processing/engine/distance_density.py" line="748"/>
        <source>Unknown group-size method &apos;{method}&apos;.</source>
        <translation>Méthode de taille des groupes inconnue '{method}'.</translation>
    </message>
    <message>
        <location filename="../processing/engine/distance_density.py" line="753"/>
        <source>The confidence level must be between 0.5 and 1 (got {level:g}).</source>
        <translation>Le niveau de confiance doit être compris entre 0.5 et 1 (reçu {level:g}).</translation>
    </message>
    <message>
        <location filename="../processing/engine/distance_density.py" line="770"/>
        <source>The bootstrap needs a random generator (a seed).</source>
        <translation>Le bootstrap a besoin d'un générateur aléatoire (une graine).</translation>
    </message>
    <message>
        <location filename="../processing/engine/distance_density.py" line="778"/>
        <source>{failed} of {n} bootstrap resamples could not be fitted and were left out; the bootstrap interval may be too narrow.</source>
        <translation>{failed} des {n} rééchantillonnages bootstrap n'ont pas pu être ajustés et ont été écartés ; l'intervalle bootstrap est peut-être trop étroit.</translation>
    </message>
    <message>
        <location filename="../processing/engine/estimation.py" line="681"/>
        <source>The degrees of freedom of the detection estimate must be 0 (known p) or more.</source>
        <translation>Les degrés de liberté de l'estimation de la détection doivent valoir 0 (p connu) ou plus.</translation>
    </message>
    <message>
        <location filename="../processing/engine/estimation.py" line="722"/>
        <source>Layer '{layer}': units {ids} have no surveyed area. Point units need the unit area field (area_m2 above 0) or a fixed unit area (m²); line units the area field, a strip width or a fixed unit area; polygons use their own area.</source>
        <translation>Couche « {layer} » : les unités {ids} n'ont pas de surface inventoriée. Les unités ponctuelles ont besoin du champ de surface d'unité (area_m2 supérieur à 0) ou d'une surface d'unité fixe (m²) ; les unités linéaires du champ de surface, d'une largeur de bande ou d'une surface d'unité fixe ; les polygones utilisent leur propre surface.</translation>
    </message>
    <message>
        <location filename="../processing/engine/estimation.py" line="805"/>
        <source>Every count is 0 or 1. If the field records presence/absence, run again with the presence option: the result is then the proportion of units occupied (naive occupancy).</source>
        <translation>Tous les comptages valent 0 ou 1. Si le champ enregistre présence/absence, relancez avec l'option présence : le résultat est alors la proportion d'unités occupées (occupation naïve).</translation>
    </message>
    <message>
        <location filename="../processing/engine/estimation.py" line="849"/>
        <source>The finite-population correction was not applied in strata {ids}: their units come from a design whose units may overlap ({records}: simple random centres, or a grid denser than the units). Their possible positions form a continuous population, which has no such correction (Cordy 1993); applying it would make the interval too narrow. A layout with MIN_SPACING of at least the unit&apos;s width, a systematic grid or a spatially balanced layout keeps the units apart.</source>
        <translation>La correction pour population finie n'a pas été appliquée dans les strates {ids} : leurs unités viennent d'un plan dont les unités peuvent se chevaucher ({records} : centres aléatoires simples, ou grille plus dense que les unités). Leurs positions possibles forment une population continue, qui n'a pas de telle correction (Cordy 1993) ; l'appliquer rendrait l'intervalle trop étroit. Une disposition avec un MIN_SPACING d'au moins la largeur de l'unité, une grille systématique ou une disposition spatialement équilibrée tient les unités séparées.</translation>
    </message>
    <message>
        <location filename="../processing/engine/estimation.py" line="868"/>
        <source>The expansion area of strata {ids} is smaller than the stratum: the plus region holds the stratum. Check the units&apos; edge record.</source>
        <translation>La surface d'extension des strates {ids} est plus petite que la strate : la région « plus » contient la strate. Vérifiez l'enregistrement du bord (edge) des unités.</translation>
    </message>
    <message>
        <location filename="../processing/engine/estimation.py" line="887"/>
        <source>In strata {ids} the units&apos; inclusion probabilities (incl_p) differ. This estimator assumes equal chances within a stratum; check the design the units came from.</source>
        <translation>Dans les strates {ids}, les probabilités d'inclusion des unités (incl_p) diffèrent. Cet estimateur suppose des chances égales dans une strate ; vérifiez le plan dont viennent les unités.</translation>
    </message>
    <message>
        <location filename="../processing/engine/estimation.py" line="1048"/>
        <source>Strata {ids} have fewer than 3 units: their variance uses the simple random sampling formula.</source>
        <translation>Les strates {ids} ont moins de 3 unités : leur variance utilise la formule de l'échantillonnage aléatoire simple.</translation>
    </message>
    <message>
        <location filename="../processing/engine/estimation.py" line="1062"/>
        <source>{label} (one unit) with {other}</source>
        <translation>{label} (une unité) avec {other}</translation>
    </message>
    <message>
        <location filename="../processing/engine/estimation.py" line="1067"/>
        <source>Strata {groups}: a stratum with one surveyed unit takes its variance from the collapsed-strata pairs formula with its partner (Cochran 1977, §5A.12; Hansen, Hurwitz &amp; Madow weights for unequal sizes), which counts the difference between the two strata as variance and so tends to be too large; the partner keeps its own variance.</source>
        <translation>Strates {groups} : une strate avec une seule unité inventoriée tire sa variance de la formule des paires de strates regroupées avec sa partenaire (Cochran 1977, §5A.12 ; poids de Hansen, Hurwitz &amp; Madow pour des tailles inégales), qui compte la différence entre les deux strates comme de la variance et tend donc à être trop grande ; la partenaire garde sa propre variance.</translation>
    </message>
    <message>
        <location filename="../processing/engine/estimation.py" line="1227"/>
        <source>Even every possible unit in every stratum ({n:,}) would miss the target CV {target_cv:.3g}: n_next is every unit.</source>
        <translation>Même toutes les unités possibles de chaque strate ({n:,}) manqueraient le CV cible {target_cv:.3g} : n_next vaut toutes les unités.</translation>
    </message>
    <message>
        <location filename="../processing/engine/estimation.py" line="1432"/>
        <source>The standard error of the detection probability ({se:.3g}) is more than half of p ({p:.3g}): the detection study is too small to correct the counts reliably, and the delta method behind the interval is poor at such a CV. Enlarge the detection study.</source>
        <translation>L'erreur type de la probabilité de détection ({se:.3g}) dépasse la moitié de p ({p:.3g}) : l'étude de détection est trop petite pour corriger les comptages de façon fiable, et la méthode delta sur laquelle repose l'intervalle est médiocre pour un tel CV. Agrandissez l'étude de détection.</translation>
    </message>
    <message>
        <location filename="../processing/engine/estimation.py" line="1444"/>
        <source>No animal was counted in any surveyed unit: the estimate is 0, and the interval is the one-sided upper limit {hi:.4g} at {level:.0%} (exact Poisson limit for a count of 0, assuming one density over the frame).</source>
        <translation>Aucun animal n'a été compté dans les unités inventoriées : l'estimation vaut 0, et l'intervalle est la limite supérieure unilatérale {hi:.4g} à {level:.0%} (limite de Poisson exacte pour un comptage de 0, en supposant une seule densité sur la base de sondage).</translation>
    </message>
    <message>
        <location filename="../processing/engine/estimation.py" line="1452"/>
        <source>In strata {ids} every surveyed unit counted 0: their interval is the one-sided upper limit of a count of 0 (exact Poisson limit), and their standard error of 0 understates the overall uncertainty (the species may be present but rare there).</source>
        <translation>Dans les strates {ids}, toutes les unités inventoriées ont compté 0 : leur intervalle est la limite supérieure unilatérale d'un comptage de 0 (limite de Poisson exacte), et leur erreur type de 0 sous-estime l'incertitude globale (l'espèce peut y être présente mais rare).</translation>
    </message>
    <message>
        <location filename="../processing/engine/estimation.py" line="1496"/>
        <source>In strata {ids} the units record different reaches (reach_m): the largest is used for the plus region.</source>
        <translation>Dans les strates {ids}, les unités enregistrent des portées différentes (reach_m) : la plus grande est utilisée pour la région « plus ».</translation>
    </message>
    <message>
        <location filename="../processing/engine/simulated_distances.py" line="91"/>
        <source>The detection function must be 1 (half-normal) or 2 (hazard-rate).</source>
        <translation>La fonction de détection doit valoir 1 (demi-normale) ou 2 (taux de risque, hazard-rate).</translation>
    </message>
    <message>
        <location filename="../processing/engine/simulated_distances.py" line="95"/>
        <source>The scale σ must be above 0 m and the hazard-rate shape above 0 (got σ = {sigma:g} m, shape {shape:g}).</source>
        <translation>L'échelle σ doit dépasser 0 m et la forme du taux de risque doit dépasser 0 (reçu σ = {sigma:g} m, forme {shape:g}).</translation>
    </message>
    <message>
        <location filename="../processing/engine/simulated_distances.py" line="100"/>
        <source>The detection probability on the line must be in (0, 1] (got {g0:g}).</source>
        <translation>La probabilité de détection sur la ligne doit être dans (0, 1] (reçu {g0:g}).</translation>
    </message>
    <message>
        <location filename="../processing/engine/simulated_distances.py" line="109"/>
        <source>Units {ids} are neither points nor lines of some length; simulated distances need line transects or point stations.</source>
        <translation>Les unités {ids} ne sont ni des points ni des lignes d'une certaine longueur ; les distances simulées demandent des transects linéaires ou des stations ponctuelles.</translation>
    </message>
    <message>
        <location filename="../processing/engine/distance_density.py" line="441"/>
        <source>, stratum {stratum}</source>
        <translation>, strate {stratum}</translation>
    </message>
    <message>
        <location filename="../processing/engine/panels.py" line="38"/>
        <source>every year</source>
        <translation>chaque année</translation>
    </message>
    <message>
        <location filename="../processing/engine/panels.py" line="38"/>
        <source>rotating panels</source>
        <translation>panels rotatifs</translation>
    </message>
    <message>
        <location filename="../processing/engine/panels.py" line="38"/>
        <source>split panels</source>
        <translation>panels partagés</translation>
    </message>
    <message>
        <location filename="../processing/engine/panels.py" line="105"/>
        <source>PANEL_DESIGN must be 0 (every year), 1 (rotating) or 2 (split); got {design}.</source>
        <translation>PANEL_DESIGN doit valoir 0 (chaque année), 1 (rotatifs) ou 2 (partagés) ; reçu {design}.</translation>
    </message>
    <message>
        <location filename="../processing/engine/panels.py" line="110"/>
        <source>YEARS must be between 1 and {most}; got {years}.</source>
        <translation>YEARS doit être compris entre 1 et {most} ; reçu {years}.</translation>
    </message>
    <message>
        <location filename="../processing/engine/panels.py" line="117"/>
        <source>Rotating and split designs need at least 2 rotating panels (PANELS = {panels}); with one panel every unit is visited every year: choose the every-year design.</source>
        <translation>Les plans à panels rotatifs et partagés exigent au moins 2 panels rotatifs (PANELS = {panels}) ; avec un seul panel, chaque unité est visitée chaque année : choisissez le plan « chaque année ».</translation>
    </message>
    <message>
        <location filename="../processing/engine/panels.py" line="123"/>
        <source>With {panels} panels over {years} years, panels {first} to {panels} would never be visited: use at most {years} panels or more years.</source>
        <translation>Avec {panels} panels sur {years} ans, les panels {first} à {panels} ne seraient jamais visités : utilisez au plus {years} panels ou davantage d'années.</translation>
    </message>
    <message>
        <location filename="../processing/engine/panels.py" line="130"/>
        <source>CORE_SHARE must lie between 0 and 1 for split panels (the share of units visited every year); got {share:g}.</source>
        <translation>CORE_SHARE doit être compris entre 0 et 1 pour les panels partagés (la part des unités visitées chaque année) ; reçu {share:g}.</translation>
    </message>
    <message>
        <location filename="../processing/engine/panels.py" line="231"/>
        <source>The units layer has no primary unit to assign to panels.</source>
        <translation>La couche des unités n'a aucune unité principale à affecter à des panels.</translation>
    </message>
    <message>
        <location filename="../processing/engine/panels.py" line="240"/>
        <source>Units {ids} have no draw order (draw_ord is empty). Panels follow the draw order of the layout: fill it or choose another draw-order field.</source>
        <translation>Les unités {ids} n'ont pas d'ordre de tirage (draw_ord est vide). Les panels suivent l'ordre de tirage de la disposition : remplissez-le ou choisissez un autre champ d'ordre de tirage.</translation>
    </message>
    <message>
        <location filename="../processing/engine/panels.py" line="252"/>
        <source>Units {ids} share their draw order with another primary unit of the same stratum. Each stratum&apos;s draw order must run 1, 2, 3, ... without repeats: use the layout&apos;s draw_ord field.</source>
        <translation>Les unités {ids} partagent leur ordre de tirage avec une autre unité principale de la même strate. L'ordre de tirage de chaque strate doit aller 1, 2, 3, ... sans répétition : utilisez le champ draw_ord de la disposition.</translation>
    </message>
    <message>
        <location filename="../processing/engine/panels.py" line="297"/>
        <source>Stratum {key} has {n} primary units, too few for {k} panels: panels {empty} get none of its units in that stratum.</source>
        <translation>La strate {key} a {n} unités principales, trop peu pour {k} panels : les panels {empty} n'y reçoivent aucune unité.</translation>
    </message>
    <message>
        <location filename="../processing/engine/panels.py" line="306"/>
        <source>The units have no draw-order field: panels follow the order of the features in the layer. Panels are evenly spread only when that order is the draw order of a spatially balanced layout.</source>
        <translation>Les unités n'ont pas de champ d'ordre de tirage : les panels suivent l'ordre des entités dans la couche. Les panels ne sont uniformément répartis que si cet ordre est l'ordre de tirage d'une disposition spatialement équilibrée.</translation>
    </message>
    <message>
        <location filename="../processing/engine/panels.py" line="500"/>
        <source>The layout was simple random (its units&apos; design field says so): each panel is a random part of it, not an evenly spread sample of the frame. Use a spatially balanced layout for evenly spread panels.</source>
        <translation>La disposition était aléatoire simple (le champ design de ses unités l'indique) : chaque panel en est une partie aléatoire, non un échantillon uniformément réparti de la base de sondage. Utilisez une disposition spatialement équilibrée pour obtenir des panels uniformément répartis.</translation>
    </message>
    <message>
        <location filename="../processing/engine/panels.py" line="505"/>
        <source>The layout was a systematic grid (its units&apos; design field says so): its draw order runs row by row, so consecutive blocks of it are bands across the frame. Use a spatially balanced layout for evenly spread panels.</source>
        <translation>La disposition était une grille systématique (le champ design de ses unités l'indique) : son ordre de tirage va ligne par ligne, si bien que ses blocs consécutifs sont des bandes à travers la base de sondage. Utilisez une disposition spatialement équilibrée pour obtenir des panels uniformément répartis.</translation>
    </message>
    <message>
        <location filename="../processing/engine/panels.py" line="511"/>
        <source>The panels are not more evenly spread than random parts of the layout (p = {p:.2f}). The layout was probably simple random or a systematic grid: each panel then covers the frame unevenly. Use a spatially balanced layout for evenly spread panels.</source>
        <translation>Les panels ne sont pas répartis plus uniformément que des parties aléatoires de la disposition (p = {p:.2f}). La disposition était probablement aléatoire simple ou une grille systématique : chaque panel couvre alors la base de sondage de façon inégale. Utilisez une disposition spatialement équilibrée pour obtenir des panels uniformément répartis.</translation>
    </message>
    <message>
        <location filename="../processing/engine/trend.py" line="150"/>
        <source>Records {ids} have no unit id or no whole-number year. Fill both in, or remove the records.</source>
        <translation>Les enregistrements {ids} n'ont pas d'identifiant d'unité ou pas d'année sous forme de nombre entier. Renseignez les deux, ou supprimez ces enregistrements.</translation>
    </message>
    <message>
        <location filename="../processing/engine/trend.py" line="155"/>
        <source>Records {ids} have a negative or non-numeric count. Counts are 0 or more; leave the count empty (NULL) when the unit was not surveyed.</source>
        <translation>Les enregistrements {ids} ont un comptage négatif ou non numérique. Les comptages valent 0 ou plus ; laissez le comptage vide (NULL) quand l'unité n'a pas été inventoriée.</translation>
    </message>
    <message>
        <location filename="../processing/engine/trend.py" line="160"/>
        <source>Records {ids} have no unit area (or one not above 0). Give every surveyed record its area, or leave the unit-area field empty.</source>
        <translation>Les enregistrements {ids} n'ont pas de surface d'unité (ou une surface qui n'est pas supérieure à 0). Donnez sa surface à chaque enregistrement inventorié, ou laissez vide le champ de surface d'unité.</translation>
    </message>
    <message>
        <location filename="../processing/engine/trend.py" line="174"/>
        <source>A trend needs counts from at least {k} different years; the records hold {found}.</source>
        <translation>Une tendance exige des comptages d'au moins {k} années différentes ; les enregistrements en contiennent {found}.</translation>
    </message>
    <message>
        <location filename="../processing/engine/trend.py" line="188"/>
        <source>Units were counted twice in one year (unit, year and record ids): {items}. Keep one record per unit and year (add the counts of repeated visits first).</source>
        <translation>Des unités ont été comptées deux fois la même année (unité, année et identifiants d'enregistrement) : {items}. Gardez un seul enregistrement par unité et par année (additionnez d'abord les comptages des visites répétées).</translation>
    </message>
    <message>
        <location filename="../processing/engine/trend.py" line="208"/>
        <source>Units {ids} lie in more than one stratum across their records. A unit keeps its stratum over the years: correct the stratum field.</source>
        <translation>Les unités {ids} se trouvent dans plus d'une strate selon leurs enregistrements. Une unité garde sa strate au fil des années : corrigez le champ de strate.</translation>
    </message>
    <message>
        <location filename="../processing/engine/trend.py" line="576"/>
        <source>CONFIDENCE must lie between 0.5 and 1 (for example 0.95); got {c:g}.</source>
        <translation>CONFIDENCE doit être compris entre 0.5 et 1 (par exemple 0.95) ; reçu {c:g}.</translation>
    </message>
    <message>
        <location filename="../processing/engine/trend.py" line="683"/>
        <source>Every count is 0: no trend can be estimated from records without animals.</source>
        <translation>Tous les comptages valent 0 : aucune tendance ne peut être estimée à partir d'enregistrements sans animaux.</translation>
    </message>
    <message>
        <location filename="../processing/engine/trend.py" line="688"/>
        <source>The trend cannot be estimated: no unit with animals was counted in two different years. A trend needs units revisited over the years.</source>
        <translation>La tendance ne peut pas être estimée : aucune unité avec des animaux n'a été comptée deux années différentes. Une tendance exige des unités revisitées au fil des années.</translation>
    </message>
    <message>
        <location filename="../processing/engine/trend.py" line="693"/>
        <source>The trend did not converge (the counts may lie all in the first or all in the last years). Check the year and count fields.</source>
        <translation>L'ajustement de la tendance n'a pas convergé (les comptages se trouvent peut-être tous dans les premières ou tous dans les dernières années). Vérifiez les champs d'année et de comptage.</translation>
    </message>
    <message>
        <location filename="../processing/engine/trend.py" line="720"/>
        <source>This revisit design leaves no degrees of freedom for year-to-year variation (the panels do not link enough years): the interval allows only for variation between units, and is too narrow if whole years differ. Add a core of units visited every year.</source>
        <translation>Ce plan de revisite ne laisse aucun degré de liberté pour la variation d'une année à l'autre (les panels ne relient pas assez d'années) : l'intervalle ne tient compte que de la variation entre unités, et il est trop étroit si des années entières diffèrent. Ajoutez un noyau d'unités visitées chaque année.</translation>
    </message>
    <message>
        <location filename="../processing/engine/trend.py" line="789"/>
        <source>Records {ids} have no whole-number year.</source>
        <translation>Les enregistrements {ids} n'ont pas d'année sous forme de nombre entier.</translation>
    </message>
    <message>
        <location filename="../processing/engine/trend.py" line="792"/>
        <source>Records {ids} have no estimate above 0. A log-linear trend needs estimates above 0: leave out years without an estimate, or use the unit counts instead.</source>
        <translation>Les enregistrements {ids} n'ont pas d'estimation supérieure à 0. Une tendance log-linéaire exige des estimations supérieures à 0 : écartez les années sans estimation, ou utilisez plutôt les comptages par unité.</translation>
    </message>
    <message>
        <location filename="../processing/engine/trend.py" line="796"/>
        <source>Records {ids} have no standard error above 0. Every yearly estimate needs its standard error (the estimate step writes it).</source>
        <translation>Les enregistrements {ids} n'ont pas d'erreur type supérieure à 0. Chaque estimation annuelle a besoin de son erreur type (l'étape d'estimation l'écrit).</translation>
    </message>
    <message>
        <location filename="../processing/engine/trend.py" line="804"/>
        <source>Years {years} have more than one estimate. Keep one estimate per year (for the estimate step&apos;s table: its rows &apos;all&apos;, or one stratum).</source>
        <translation>Les années {years} ont plus d'une estimation. Gardez une seule estimation par année (pour la table de l'étape d'estimation : ses lignes 'all', ou une seule strate).</translation>
    </message>
    <message>
        <location filename="../processing/engine/trend.py" line="810"/>
        <source>A trend needs estimates from at least {k} different years; the records hold {n}.</source>
        <translation>Une tendance exige des estimations d'au moins {k} années différentes ; les enregistrements en contiennent {n}.</translation>
    </message>
    <message>
        <location filename="../processing/engine/trend.py" line="862"/>
        <source>Only {k} years: the year-to-year variation and the trend are both poorly known, and the interval is wide.</source>
        <translation>Seulement {k} années : la variation d'une année à l'autre et la tendance sont toutes deux mal connues, et l'intervalle est large.</translation>
    </message>
    <message>
        <location filename="../processing/engine/trend_power.py" line="82"/>
        <source>The panels layer holds no unit with visit years (field years).</source>
        <translation>La couche des panels ne contient aucune unité avec des années de visite (champ years).</translation>
    </message>
    <message>
        <location filename="../processing/engine/trend_power.py" line="120"/>
        <source>CHANGES must be a list of annual changes in % per year, separated by commas (for example -3, -5); got &apos;{text}&apos;.</source>
        <translation>CHANGES doit être une liste de variations annuelles en % par an, séparées par des virgules (par exemple -3, -5) ; reçu « {text} ».</translation>
    </message>
    <message>
        <location filename="../processing/engine/trend_power.py" line="126"/>
        <source>CHANGES is empty: give at least one annual change in % (for example -3).</source>
        <translation>CHANGES est vide : donnez au moins une variation annuelle en % (par exemple -3).</translation>
    </message>
    <message>
        <location filename="../processing/engine/trend_power.py" line="130"/>
        <source>Annual changes must be above -100 % per year; got {values}.</source>
        <translation>Les variations annuelles doivent être supérieures à -100 % par an ; reçu {values}.</translation>
    </message>
    <message>
        <location filename="../processing/engine/trend_power.py" line="142"/>
        <source>N_UNITS = {n} is fewer than the {k} panels of the design: every panel needs a unit.</source>
        <translation>N_UNITS = {n} est inférieur aux {k} panels du plan : chaque panel a besoin d'une unité.</translation>
    </message>
    <message>
        <location filename="../processing/engine/trend_power.py" line="147"/>
        <source>A trend needs at least {k} years; YEARS = {years}.</source>
        <translation>Une tendance exige au moins {k} années ; YEARS = {years}.</translation>
    </message>
    <message>
        <location filename="../processing/engine/trend_power.py" line="152"/>
        <source>REPLICATES must lie between 10 and {most}; got {r}.</source>
        <translation>REPLICATES doit être compris entre 10 et {most} ; reçu {r}.</translation>
    </message>
    <message>
        <location filename="../processing/engine/trend_power.py" line="157"/>
        <source>MEAN_COUNT must be above 0 (animals per unit in the first year).</source>
        <translation>MEAN_COUNT doit être supérieur à 0 (animaux par unité la première année).</translation>
    </message>
    <message>
        <location filename="../processing/engine/trend_power.py" line="161"/>
        <source>The standard deviations SD_UNIT, SD_UNIT_YEAR and SD_YEAR cannot be negative.</source>
        <translation>Les écarts-types SD_UNIT, SD_UNIT_YEAR et SD_YEAR ne peuvent pas être négatifs.</translation>
    </message>
    <message>
        <location filename="../processing/engine/trend_power.py" line="165"/>
        <source>DETECTION must lie in (0, 1]; got {p:g}.</source>
        <translation>DETECTION doit appartenir à (0, 1] ; reçu {p:g}.</translation>
    </message>
    <message>
        <location filename="../processing/engine/trend_power.py" line="170"/>
        <source>ALPHA must lie between 0 and 0.5 (for example 0.05 or 0.1); got {a:g}.</source>
        <translation>ALPHA doit être compris entre 0 et 0.5 (par exemple 0.05 ou 0.1) ; reçu {a:g}.</translation>
    </message>
    <message>
        <location filename="../processing/engine/trend_power.py" line="191"/>
        <source>The pilot table has no stratum with 2 or more units and a mean and SD of the counts (fields n, mean_c, sd_c of the estimate step).</source>
        <translation>La table pilote n'a aucune strate avec 2 unités ou plus et une moyenne et un écart-type des comptages (champs n, mean_c, sd_c de l'étape d'estimation).</translation>
    </message>
    <message>
        <location filename="../processing/engine/trend_power.py" line="199"/>
        <source>The pilot counted no animal: its mean count is 0, so no power can be computed.</source>
        <translation>Le pilote n'a compté aucun animal : son comptage moyen vaut 0, si bien qu'aucune puissance ne peut être calculée.</translation>
    </message>
    <message>
        <location filename="../processing/engine/trend_power.py" line="228"/>
        <source>This revisit design never links enough years to test a trend (each panel must be visited in several years, or a core visited every year): use fewer panels, a core, or more years.</source>
        <translation>Ce plan de revisite ne relie jamais assez d'années pour tester une tendance (chaque panel doit être visité plusieurs années, ou un noyau chaque année) : utilisez moins de panels, un noyau ou davantage d'années.</translation>
    </message>
    <message>
        <location filename="../processing/engine/trend_power.py" line="391"/>
        <source>In up to {n} of {r} simulated programmes the trend could not be estimated (too few animals counted in revisited units); they count as not detected. Raise MEAN_COUNT or the number of units if that is unrealistic.</source>
        <translation>Dans au plus {n} des {r} programmes simulés, la tendance n'a pas pu être estimée (trop peu d'animaux comptés dans les unités revisitées) ; ils comptent comme non détectés. Augmentez MEAN_COUNT ou le nombre d'unités si c'est irréaliste.</translation>
    </message>
    <message>
        <location filename="../processing/gdal_io/patches.py" line="218"/>
        <source>The strata form {n:,} patches (4-connected groups of cells of one stratum), more than the {limit:,} that can be turned into polygons: the covariate is speckled at the scale of its cells. Set MIN_AREA to {suggested:g} ha or more (it is {min_area:g} ha): patches below it join a neighbouring stratum, which leaves at most {limit:,} patches on the {area:,.0f} ha stratified. Smoothing the covariate first also helps.</source>
        <translation>Les strates forment {n:,} taches (groupes 4-connexes de cellules d'une même strate), plus que les {limit:,} qui peuvent être converties en polygones : la covariable est mouchetée à l'échelle de ses cellules. Fixez MIN_AREA à {suggested:g} ha ou plus (il vaut {min_area:g} ha) : les taches plus petites rejoignent une strate voisine, ce qui laisse au plus {limit:,} taches sur les {area:,.0f} ha stratifiés. Lisser d'abord la covariable aide aussi.</translation>
    </message>
    <message>
        <location filename="../processing/gdal_io/patches.py" line="231"/>
        <source>The strata form {n:,} patches (4-connected groups of cells of one stratum), more than the {limit:,} that can be merged below MIN_AREA in bounded memory: the covariate is speckled at the scale of its cells. Smooth or coarsen it first (for example, resample it with the average to cells of about {cell:g} m, so that one cell covers MIN_AREA), then run the stratification again.</source>
        <translation>Les strates forment {n:,} taches (groupes 4-connexes de cellules d'une même strate), plus que les {limit:,} que la fusion des taches sous MIN_AREA peut traiter en mémoire bornée : la covariable est mouchetée à l'échelle de ses cellules. Lissez-la ou agrandissez ses cellules d'abord (par exemple, rééchantillonnez-la par la moyenne en cellules d'environ {cell:g} m, pour qu'une cellule couvre MIN_AREA), puis relancez la stratification.</translation>
    </message>
    <message>
        <location filename="../processing/gdal_io/stratify_pipeline.py" line="120"/>
        <source>The strata formed too many small patches to merge one by one: patches below {cells:,} cells were first merged into their largest neighbour (the rule of GDAL&apos;s sieve filter), which can join a mosaic of small patches into one stratum. Smoothing the covariate before stratifying keeps the strata closer to its pattern.</source>
        <translation>Les strates formaient trop de petites taches pour les fusionner une à une : les taches de moins de {cells:,} cellules ont d'abord été fusionnées avec leur plus grande voisine (la règle du filtre tamis de GDAL), ce qui peut réunir une mosaïque de petites taches en une seule strate. Lisser la covariable avant de stratifier garde les strates plus proches de sa structure.</translation>
    </message>
</context>
<context>
    <name>PlotwisePlugin</name>
    <message>
        <location filename="../plugin/plugin.py" line="49"/>
        <source>{name} is missing ({error}).</source>
        <translation>{name} est absent ({error}).</translation>
    </message>
    <message>
        <location filename="../plugin/plugin.py" line="51"/>
        <source>{name} {version} is too old; version {wanted} or newer is needed.</source>
        <translation>{name} {version} est trop ancien ; il faut la version {wanted} ou plus récente.</translation>
    </message>
    <message>
        <location filename="../plugin/plugin.py" line="56"/>
        <source>Plotwise cannot start because a library it needs is missing or too old: {problems} Install the host&apos;s standard packages (on Debian or Ubuntu: python3-numpy, python3-scipy, python3-shapely, python3-pyproj, python3-gdal) and restart QGIS. No Plotwise algorithm has been added.</source>
        <translation>Plotwise ne peut pas démarrer car une bibliothèque nécessaire est absente ou trop ancienne : {problems} Installez les paquets standard de l'hôte (sous Debian ou Ubuntu : python3-numpy, python3-scipy, python3-shapely, python3-pyproj, python3-gdal) et redémarrez QGIS. Aucun algorithme Plotwise n'a été ajouté.</translation>
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
        <translation>Plotwise : conception d'inventaires et estimation</translation>
    </message>
    <message>
        <location filename="../processing/provider.py" line="127"/>
        <source>The example model {path} could not be read.</source>
        <translation>Le modèle d'exemple {path} n'a pas pu être lu.</translation>
    </message>
</context>
<context>
    <name>PlotwiseReport</name>
    <message>
        <location filename="../processing/report/layout.py" line="152"/>
        <source>yes</source>
        <translation>oui</translation>
    </message>
    <message>
        <location filename="../processing/report/layout.py" line="152"/>
        <source>no</source>
        <translation>non</translation>
    </message>
    <message>
        <location filename="../processing/report/html.py" line="149"/>
        <source>Inputs and parameters</source>
        <translation>Entrées et paramètres</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="226"/>
        <source>Item</source>
        <translation>Élément</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="226"/>
        <source>Value</source>
        <translation>Valeur</translation>
    </message>
    <message>
        <location filename="../processing/report/html.py" line="179"/>
        <source>Written</source>
        <translation>Généré le</translation>
    </message>
    <message>
        <location filename="../processing/report/html.py" line="181"/>
        <source>algorithm</source>
        <translation>algorithme</translation>
    </message>
    <message>
        <location filename="../processing/report/html.py" line="184"/>
        <source>Field safety</source>
        <translation>Sécurité sur le terrain</translation>
    </message>
    <message>
        <location filename="../processing/report/html.py" line="32"/>
        <source>Check every unit&apos;s access and safety before sending a team. This tool chooses locations for statistical reasons only: it never makes a location safe to reach or to work in. Steep, remote or flooded terrain, wildlife, weather and private land can put people at risk. Follow your agency&apos;s field-safety rules and local law, and leave out or replace any unit that cannot be reached safely (record it as not surveyed).</source>
        <translation>Vérifiez l'accès à chaque unité et sa sécurité avant d'y envoyer une équipe. Cet outil choisit des emplacements pour des raisons uniquement statistiques : il ne rend jamais un emplacement sûr à atteindre ni sûr pour y travailler. Un terrain escarpé, isolé ou inondé, la faune, la météo et les terrains privés peuvent mettre des personnes en danger. Respectez les règles de sécurité sur le terrain de votre organisme et la législation locale, et écartez ou remplacez toute unité qui ne peut pas être atteinte en sécurité (notez-la comme non inventoriée).</translation>
    </message>
    <message>
        <location filename="../processing/report/html.py" line="189"/>
        <source>Warnings</source>
        <translation>Avertissements</translation>
    </message>
    <message>
        <location filename="../processing/report/html.py" line="194"/>
        <source>Method references</source>
        <translation>Références des méthodes</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="33"/>
        <source>converged</source>
        <translation>convergé</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="34"/>
        <source>at the boundary</source>
        <translation>à la borne</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="35"/>
        <source>not fitted</source>
        <translation>non ajusté</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="77"/>
        <source>Occupancy from repeat visits</source>
        <translation>Occupation à partir de visites répétées</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="80"/>
        <source>occupancy ψ (share of sites used)</source>
        <translation>occupation ψ (part des sites utilisés)</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="80"/>
        <source>{level} interval of ψ</source>
        <translation>intervalle à {level} de ψ</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="80"/>
        <source>detection p per survey</source>
        <translation>détection p par visite</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="80"/>
        <source>naive occupancy (detected at least once)</source>
        <translation>occupation naïve (espèce détectée au moins une fois)</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="80"/>
        <source>sites used</source>
        <translation>sites utilisés</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="89"/>
        <source>Model: {model}. ψ is the mean fitted occupancy probability of the sites used; with covariates it varies by site (field psi).</source>
        <translation>Modèle : {model}. ψ est la moyenne des probabilités d'occupation ajustées des sites utilisés ; avec des covariables, elle varie selon le site (champ psi).</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="101"/>
        <source>Map of psi_cond</source>
        <translation>Carte de psi_cond</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="102"/>
        <source>Sites shaded by psi_cond, the probability that the site is occupied given its detection history (1 where the species was detected)</source>
        <translation>Sites ombrés selon psi_cond, la probabilité que le site soit occupé sachant son historique de détection (1 là où l'espèce a été détectée)</translation>
    </message>
    <message>
        <location filename="../processing/report/trendpower.py" line="153"/>
        <source>Method</source>
        <translation>Méthode</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="107"/>
        <source>Single-season occupancy model (MacKenzie et al. 2002): a site is occupied with probability ψ and, when occupied, each survey detects the species with probability p; logit ψ and logit p are linear in the covariates. Maximum likelihood with scipy (BFGS, then Newton steps); standard errors from the observed information (Louis 1982), intervals on the logit scale. Covariates are centred and scaled for the fit; the table gives their coefficients in the covariates' own units. Occasions not surveyed (NULL) are left out of a site's likelihood.</source>
        <translation>Modèle d'occupation à une saison (MacKenzie et al. 2002) : un site est occupé avec la probabilité ψ et, s'il est occupé, chaque visite détecte l'espèce avec la probabilité p ; logit ψ et logit p sont linéaires en les covariables. Maximum de vraisemblance avec scipy (BFGS, puis pas de Newton) ; erreurs types tirées de l'information observée (Louis 1982), intervalles sur l'échelle logit. Les covariables sont centrées et réduites pour l'ajustement ; la table donne leurs coefficients dans les unités propres des covariables. Les occasions non échantillonnées (NULL) sont exclues de la vraisemblance d'un site.</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="121"/>
        <source>(none)</source>
        <translation>(aucun)</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="123"/>
        <source>Sites (SITES)</source>
        <translation>Sites (SITES)</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="124"/>
        <source>Site id field (SITE_ID_FIELD)</source>
        <translation>Champ d'identifiant des sites (SITE_ID_FIELD)</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="125"/>
        <source>(none: feature ids)</source>
        <translation>(aucun : identifiants d'entité)</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="126"/>
        <source>History fields (HISTORY_FIELDS)</source>
        <translation>Champs d'historique (HISTORY_FIELDS)</translation>
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
        <translation>Champs d'effort (EFFORT_FIELDS)</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="131"/>
        <source>Models compared (MODELS)</source>
        <translation>Modèles comparés (MODELS)</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="132"/>
        <source>(the constant model only)</source>
        <translation>(le modèle constant seulement)</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="133"/>
        <source>Confidence level (CONFIDENCE)</source>
        <translation>Niveau de confiance (CONFIDENCE)</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="134"/>
        <source>Target SE of ψ (TARGET_SE)</source>
        <translation>Erreur type cible de ψ (TARGET_SE)</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="136"/>
        <source>Goodness-of-fit replicates (GOF_REPLICATES)</source>
        <translation>Réplicats du test d'adéquation (GOF_REPLICATES)</translation>
    </message>
    <message>
        <location filename="../processing/report/stratify.py" line="263"/>
        <source>Seed (SEED)</source>
        <translation>Graine (SEED)</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="139"/>
        <source>not used (no bootstrap)</source>
        <translation>non utilisée (pas de bootstrap)</translation>
    </message>
    <message>
        <location filename="../processing/report/panels.py" line="117"/>
        <source>CRS</source>
        <translation>SCR</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="152"/>
        <source>Detection histories</source>
        <translation>Historiques de détection</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="153"/>
        <source>sites in the layer</source>
        <translation>sites dans la couche</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="153"/>
        <source>sites used (at least one surveyed occasion)</source>
        <translation>sites utilisés (au moins une occasion échantillonnée)</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="153"/>
        <source>sites left out (no surveyed occasion)</source>
        <translation>sites écartés (aucune occasion échantillonnée)</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="153"/>
        <source>occasions</source>
        <translation>occasions</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="153"/>
        <source>surveys (site-occasions surveyed)</source>
        <translation>visites (couples site-occasion échantillonnés)</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="153"/>
        <source>site-occasions not surveyed (NULL)</source>
        <translation>couples site-occasion non échantillonnés (NULL)</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="153"/>
        <source>sites with a detection</source>
        <translation>sites avec au moins une détection</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="153"/>
        <source>detections</source>
        <translation>détections</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="163"/>
        <source>{n} detections</source>
        <translation>{n} détections</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="165"/>
        <source>sites</source>
        <translation>sites</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="165"/>
        <source>Sites by their number of detections</source>
        <translation>Sites selon leur nombre de détections</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="167"/>
        <source>History (1 detected, 0 not, - not surveyed)</source>
        <translation>Historique (1 détectée, 0 non, - non échantillonné)</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="167"/>
        <source>Sites</source>
        <translation>Sites</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="167"/>
        <source>The most frequent detection histories</source>
        <translation>Les historiques de détection les plus fréquents</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="174"/>
        <source>Estimates</source>
        <translation>Estimations</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="178"/>
        <source>Parameter</source>
        <translation>Paramètre</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="178"/>
        <source>Estimate</source>
        <translation>Estimation</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="178"/>
        <source>SE</source>
        <translation>Erreur type</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="178"/>
        <source>Lower ({level})</source>
        <translation>Inférieure ({level})</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="178"/>
        <source>Upper ({level})</source>
        <translation>Supérieure ({level})</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="182"/>
        <source>Rows logit_psi:… and logit_p:… are coefficients on the logit scale (const: the logit at covariates 0; a slope per unit of its covariate). Rows psi and p are the mean fitted probabilities, with delta-method SEs and intervals on the logit scale.</source>
        <translation>Les lignes logit_psi:… et logit_p:… sont des coefficients sur l'échelle logit (const : le logit quand les covariables valent 0 ; une pente par unité de sa covariable). Les lignes psi et p sont les probabilités ajustées moyennes, avec des erreurs types par la méthode delta et des intervalles sur l'échelle logit.</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="188"/>
        <source>Parameters at the boundary of their range: {names}. They get no SE or interval; the other estimates are conditional on them.</source>
        <translation>Paramètres à la borne de leur domaine : {names}. Ils n'ont ni erreur type ni intervalle ; les autres estimations sont conditionnelles à leur valeur.</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="195"/>
        <source>Model comparison</source>
        <translation>Comparaison des modèles</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="200"/>
        <source>Model</source>
        <translation>Modèle</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="200"/>
        <source>Parameters</source>
        <translation>Paramètres</translation>
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
        <translation>Poids AIC</translation>
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
        <translation>Ajustement</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="209"/>
        <source>The model with the lowest AIC is {model}, {d} AIC units below the model reported above. Consider running again with its covariates.</source>
        <translation>Le modèle de plus faible AIC est {model}, {d} unités d'AIC sous le modèle présenté plus haut. Envisagez de relancer avec ses covariables.</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="218"/>
        <source>Cumulative detection</source>
        <translation>Détection cumulée</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="221"/>
        <source>1 − (1 − p)^K</source>
        <translation>1 − (1 − p)^K</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="223"/>
        <source>lower limit</source>
        <translation>limite inférieure</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="224"/>
        <source>upper limit</source>
        <translation>limite supérieure</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="226"/>
        <source>occasions K</source>
        <translation>occasions K</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="226"/>
        <source>cumulative detection</source>
        <translation>détection cumulée</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="228"/>
        <source>Chance of at least one detection at an occupied site after K surveys, at the mean p</source>
        <translation>Probabilité d'au moins une détection sur un site occupé après K visites, au p moyen</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="234"/>
        <source>Design advice</source>
        <translation>Conseils pour le plan d'échantillonnage</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="235"/>
        <source>With p = {p} per survey, {k} occasions give a cumulative detection of {c}; {k95} occasions are needed for 0.95.</source>
        <translation>Avec p = {p} par visite, {k} occasions donnent une détection cumulée de {c} ; il faut {k95} occasions pour 0.95.</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="241"/>
        <source>For an SE of ψ of {se} with {k} occasions per site, about {s} sites are needed (asymptotic variance of MacKenzie &amp; Royle 2005 at ψ = {psi} and p = {p}: s·Var(ψ̂) = {v}). The fewest surveys (sites × occasions) for that SE come with {kb} occasions per site and about {sb} sites.</source>
        <translation>Pour une erreur type de ψ de {se} avec {k} occasions par site, il faut environ {s} sites (variance asymptotique de MacKenzie &amp; Royle 2005 à ψ = {psi} et p = {p} : s·Var(ψ̂) = {v}). Le plus petit nombre de visites (sites × occasions) pour cette erreur type s'obtient avec {kb} occasions par site et environ {sb} sites.</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="250"/>
        <source>With covariates the advice uses the mean ψ and p of the model (the constant-model formula): a guide, not an exact figure.</source>
        <translation>Avec des covariables, les conseils utilisent les ψ et p moyens du modèle (la formule du modèle constant) : un repère, pas un chiffre exact.</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="257"/>
        <source>Goodness of fit</source>
        <translation>Qualité de l'ajustement</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="258"/>
        <source>Pearson's χ² of the detection-history frequencies against the model's expected frequencies (sites grouped by their surveyed occasions): {x}. Parametric bootstrap (MacKenzie &amp; Bailey 2004) of {b} data sets simulated from the fitted model: mean χ² {m}, p = {p}; ĉ = {c}.</source>
        <translation>χ² de Pearson des fréquences des historiques de détection par rapport aux fréquences attendues du modèle (sites groupés selon leurs occasions échantillonnées) : {x}. Bootstrap paramétrique (MacKenzie &amp; Bailey 2004) de {b} jeux de données simulés à partir du modèle ajusté : χ² moyen {m}, p = {p} ; ĉ = {c}.</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="265"/>
        <source>ĉ near 1: the model fits; above 1: the histories vary more than the model allows (multiply the variances by ĉ); well below 1 is usually harmless.</source>
        <translation>ĉ proche de 1 : le modèle s'ajuste ; au-dessus de 1 : les historiques varient plus que le modèle ne le permet (multipliez les variances par ĉ) ; nettement sous 1, c'est en général sans conséquence.</translation>
    </message>
    <message>
        <location filename="../processing/report/occupancy.py" line="282"/>
        <source>{lo} to {hi}</source>
        <translation>{lo} à {hi}</translation>
    </message>
    <message>
        <location filename="../processing/report/stratify.py" line="232"/>
        <source>grid</source>
        <translation>grille</translation>
    </message>
    <message>
        <location filename="../processing/report/stations.py" line="29"/>
        <source>clusters</source>
        <translation>grappes</translation>
    </message>
    <message>
        <location filename="../processing/report/stations.py" line="29"/>
        <source>balanced</source>
        <translation>équilibré</translation>
    </message>
    <message>
        <location filename="../processing/report/stations.py" line="34"/>
        <source>independent occupancy sites (one home-range diameter apart)</source>
        <translation>sites d'occupation indépendants (espacés d'un diamètre de domaine vital)</translation>
    </message>
    <message>
        <location filename="../processing/report/stations.py" line="34"/>
        <source>spatial capture-recapture (2σ apart)</source>
        <translation>capture-recapture spatiale (espacement de 2σ)</translation>
    </message>
    <message>
        <location filename="../processing/report/stations.py" line="66"/>
        <source>Camera-trap and recorder stations</source>
        <translation>Stations de pièges photographiques et d'enregistreurs</translation>
    </message>
    <message>
        <location filename="../processing/report/stations.py" line="241"/>
        <source>primary stations</source>
        <translation>stations principales</translation>
    </message>
    <message>
        <location filename="../processing/report/stations.py" line="241"/>
        <source>reserve stations</source>
        <translation>stations de réserve</translation>
    </message>
    <message>
        <location filename="../processing/report/stations.py" line="70"/>
        <source>spacing used (m)</source>
        <translation>espacement utilisé (m)</translation>
    </message>
    <message>
        <location filename="../processing/report/stations.py" line="70"/>
        <source>array</source>
        <translation>dispositif</translation>
    </message>
    <message>
        <location filename="../processing/report/stations.py" line="81"/>
        <source>Replacing stations in the field</source>
        <translation>Remplacer des stations sur le terrain</translation>
    </message>
    <message>
        <location filename="../processing/report/stations.py" line="82"/>
        <source>A primary station that cannot be set (no safe access, no permission, flooded, ...) is replaced by the next unused reserve station of its stratum, in draw order (draw_ord); for clusters, a whole cluster by the next reserve cluster. Record the primary as not set and why; never move a station to a more convenient place.</source>
        <translation>Une station principale qui ne peut pas être installée (pas d'accès sûr, pas d'autorisation, inondée, ...) est remplacée par la station de réserve suivante non utilisée de sa strate, dans l'ordre de tirage (draw_ord) ; pour les grappes, une grappe entière est remplacée par la grappe de réserve suivante. Notez la station principale comme non installée et pourquoi ; ne déplacez jamais une station vers un endroit plus commode.</translation>
    </message>
    <message>
        <location filename="../processing/report/stratify.py" line="63"/>
        <source>Map</source>
        <translation>Carte</translation>
    </message>
    <message>
        <location filename="../processing/report/stations.py" line="88"/>
        <source>Strata (filled), primary stations (dark) and reserve stations (light)</source>
        <translation>Strates (remplies), stations principales (foncées) et stations de réserve (claires)</translation>
    </message>
    <message>
        <location filename="../processing/report/stations.py" line="98"/>
        <source>(not given)</source>
        <translation>(non indiqué)</translation>
    </message>
    <message>
        <location filename="../processing/report/stations.py" line="100"/>
        <source>Frame (FRAME)</source>
        <translation>Base de sondage (FRAME)</translation>
    </message>
    <message>
        <location filename="../processing/report/stations.py" line="101"/>
        <source>Stratum field (STRATUM_FIELD)</source>
        <translation>Champ de strate (STRATUM_FIELD)</translation>
    </message>
    <message>
        <location filename="../processing/report/stations.py" line="102"/>
        <source>(none: one stratum)</source>
        <translation>(aucun : une seule strate)</translation>
    </message>
    <message>
        <location filename="../processing/report/stations.py" line="103"/>
        <source>Stations (N_STATIONS)</source>
        <translation>Stations (N_STATIONS)</translation>
    </message>
    <message>
        <location filename="../processing/report/stations.py" line="104"/>
        <source>0: every grid point</source>
        <translation>0 : chaque point de la grille</translation>
    </message>
    <message>
        <location filename="../processing/report/stations.py" line="105"/>
        <source>Array (ARRAY)</source>
        <translation>Dispositif (ARRAY)</translation>
    </message>
    <message>
        <location filename="../processing/report/stations.py" line="107"/>
        <source>Home range (HOME_RANGE, km²)</source>
        <translation>Domaine vital (HOME_RANGE, km²)</translation>
    </message>
    <message>
        <location filename="../processing/report/stations.py" line="109"/>
        <source>Spacing (SPACING, m)</source>
        <translation>Espacement (SPACING, m)</translation>
    </message>
    <message>
        <location filename="../processing/report/stations.py" line="110"/>
        <source>from the home range</source>
        <translation>d'après le domaine vital</translation>
    </message>
    <message>
        <location filename="../processing/report/stations.py" line="111"/>
        <source>Spacing rule (SPACING_RULE)</source>
        <translation>Règle d'espacement (SPACING_RULE)</translation>
    </message>
    <message>
        <location filename="../processing/report/stations.py" line="113"/>
        <source>Stations per cluster (CLUSTER_SIZE)</source>
        <translation>Stations par grappe (CLUSTER_SIZE)</translation>
    </message>
    <message>
        <location filename="../processing/report/stations.py" line="114"/>
        <source>(not used)</source>
        <translation>(non utilisé)</translation>
    </message>
    <message>
        <location filename="../processing/report/stations.py" line="115"/>
        <source>Minimum spacing (MIN_SPACING, m)</source>
        <translation>Espacement minimal (MIN_SPACING, m)</translation>
    </message>
    <message>
        <location filename="../processing/report/stations.py" line="116"/>
        <source>Reserves per stratum (RESERVE)</source>
        <translation>Réserves par strate (RESERVE)</translation>
    </message>
    <message>
        <location filename="../processing/report/stations.py" line="117"/>
        <source>Service time per station (SERVICE_HOURS, hours)</source>
        <translation>Durée d'intervention par station (SERVICE_HOURS, heures)</translation>
    </message>
    <message>
        <location filename="../processing/report/stations.py" line="119"/>
        <source>Working day (WORKDAY_HOURS, hours)</source>
        <translation>Journée de travail (WORKDAY_HOURS, heures)</translation>
    </message>
    <message>
        <location filename="../processing/report/stations.py" line="121"/>
        <source>CRS of the computation and the output</source>
        <translation>SCR du calcul et de la sortie</translation>
    </message>
    <message>
        <location filename="../processing/report/stations.py" line="126"/>
        <source>Spacing</source>
        <translation>Espacement</translation>
    </message>
    <message>
        <location filename="../processing/report/stations.py" line="129"/>
        <source>Home range {hr} km², taken as the 95% range of a circular bivariate normal distribution of the animal's positions: σ = √(HR/π) / 2.448 = {sigma} m (2.448 = √(−2 ln 0.05)); home-range diameter {diameter} m.</source>
        <translation>Domaine vital de {hr} km², pris comme le domaine à 95 % d'une loi normale bivariée circulaire des positions de l'animal : σ = √(HR/π) / 2.448 = {sigma} m (2.448 = √(−2 ln 0.05)) ; diamètre du domaine vital {diameter} m.</translation>
    </message>
    <message>
        <location filename="../processing/report/stations.py" line="136"/>
        <source>Rule used: spatial capture-recapture, stations about 2σ = {s} m apart, so that an animal meets several stations (Sollmann et al. 2012; Sun et al. 2014).</source>
        <translation>Règle appliquée : capture-recapture spatiale, stations espacées d'environ 2σ = {s} m, pour qu'un animal rencontre plusieurs stations (Sollmann et al. 2012 ; Sun et al. 2014).</translation>
    </message>
    <message>
        <location filename="../processing/report/stations.py" line="141"/>
        <source>Rule used: independent occupancy sites, stations at least one home-range diameter = {s} m apart, so that one animal rarely uses two sites (common practice).</source>
        <translation>Règle appliquée : sites d'occupation indépendants, stations espacées d'au moins un diamètre de domaine vital = {s} m, pour qu'un même animal utilise rarement deux sites (pratique courante).</translation>
    </message>
    <message>
        <location filename="../processing/report/stations.py" line="146"/>
        <source>Spacing given by the user: {s} m (no rule applied).</source>
        <translation>Espacement donné par l'utilisateur : {s} m (aucune règle appliquée).</translation>
    </message>
    <message>
        <location filename="../processing/report/stations.py" line="149"/>
        <source>For comparison: 2σ = {scr} m (spatial capture-recapture); one home-range diameter = {occ} m (independent occupancy sites).</source>
        <translation>Pour comparaison : 2σ = {scr} m (capture-recapture spatiale) ; un diamètre de domaine vital = {occ} m (sites d'occupation indépendants).</translation>
    </message>
    <message>
        <location filename="../processing/report/stations.py" line="158"/>
        <source>Array extent</source>
        <translation>Étendue du dispositif</translation>
    </message>
    <message>
        <location filename="../processing/report/stations.py" line="159"/>
        <source>The primary stations span {span} km (largest distance between two of them); their convex hull covers {area} km².</source>
        <translation>Les stations principales s'étendent sur {span} km (plus grande distance entre deux d'entre elles) ; leur enveloppe convexe couvre {area} km².</translation>
    </message>
    <message>
        <location filename="../processing/report/stations.py" line="164"/>
        <source>That is {n} home ranges of {hr} km², and {d} home-range diameters across.</source>
        <translation>Cela fait {n} domaines vitaux de {hr} km², et {d} diamètres de domaine vital d'un bord à l'autre.</translation>
    </message>
    <message>
        <location filename="../processing/report/stations.py" line="169"/>
        <source>An array smaller than a few home ranges cannot estimate density by spatial capture-recapture: too few animals have their range inside it, and movement cannot be separated from density. Spread the stations wider or add stations.</source>
        <translation>Un dispositif plus petit que quelques domaines vitaux ne permet pas d'estimer la densité par capture-recapture spatiale : trop peu d'animaux ont leur domaine à l'intérieur, et le déplacement ne peut pas être distingué de la densité. Écartez davantage les stations ou ajoutez-en.</translation>
    </message>
    <message>
        <location filename="../processing/report/stations.py" line="177"/>
        <source>Field effort</source>
        <translation>Effort de terrain</translation>
    </message>
    <message>
        <location filename="../processing/report/stations.py" line="178"/>
        <source>With {h} hours per station visit (travel included) and a working day of {day} hours, one team services {n} stations per team-day; one round of every primary station takes {days} team-days.</source>
        <translation>Avec {h} heures par visite de station (déplacement compris) et une journée de travail de {day} heures, une équipe relève {n} stations par jour-équipe ; une tournée de toutes les stations principales demande {days} jours-équipe.</translation>
    </message>
    <message>
        <location filename="../processing/report/stations.py" line="186"/>
        <source>A cluster of {k} stations takes {c} hours: one team can service a cluster in a day.</source>
        <translation>Une grappe de {k} stations demande {c} heures : une équipe peut relever une grappe dans la journée.</translation>
    </message>
    <message>
        <location filename="../processing/report/stations.py" line="189"/>
        <source>A cluster of {k} stations takes {c} hours: more than one team-day; use smaller clusters or two teams.</source>
        <translation>Une grappe de {k} stations demande {c} heures : plus d'un jour-équipe ; utilisez des grappes plus petites ou deux équipes.</translation>
    </message>
    <message>
        <location filename="../processing/report/stations.py" line="196"/>
        <source>Stations per stratum</source>
        <translation>Stations par strate</translation>
    </message>
    <message>
        <location filename="../processing/report/stations.py" line="198"/>
        <source>frame</source>
        <translation>base de sondage</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="38"/>
        <source>Stratum</source>
        <translation>Strate</translation>
    </message>
    <message>
        <location filename="../processing/report/stratify.py" line="95"/>
        <source>Area (ha)</source>
        <translation>Surface (ha)</translation>
    </message>
    <message>
        <location filename="../processing/report/stations.py" line="201"/>
        <source>Stations asked</source>
        <translation>Stations demandées</translation>
    </message>
    <message>
        <location filename="../processing/report/stations.py" line="201"/>
        <source>Primary</source>
        <translation>Principales</translation>
    </message>
    <message>
        <location filename="../processing/report/stations.py" line="201"/>
        <source>Reserve</source>
        <translation>Réserves</translation>
    </message>
    <message>
        <location filename="../processing/report/stations.py" line="201"/>
        <source>Clusters</source>
        <translation>Grappes</translation>
    </message>
    <message>
        <location filename="../processing/report/stations.py" line="210"/>
        <source>Grid: one square lattice over the frame, aligned with grid north, with a uniform random start. With N_STATIONS = 0 every lattice point in the frame is a station (reserves: the lattice's cell centres in random order, which sit s/√2 from the nearest primaries); otherwise the N lattice points nearest a uniform random point of the frame form a compact block (reserves: the next nearest lattice points).</source>
        <translation>Grille : un seul réseau carré sur la base de sondage, aligné sur le nord de la grille, avec un départ aléatoire uniforme. Avec N_STATIONS = 0, chaque point du réseau dans la base de sondage est une station (réserves : les centres des mailles du réseau dans un ordre aléatoire, situés à s/√2 des stations principales les plus proches) ; sinon, les N points du réseau les plus proches d'un point aléatoire uniforme de la base de sondage forment un bloc compact (réserves : les points du réseau suivants par ordre de proximité).</translation>
    </message>
    <message>
        <location filename="../processing/report/stations.py" line="217"/>
        <source>Clusters: the stations of a cluster are the k points of a square lattice of the spacing nearest its centre; the centres are drawn by balanced acceptance sampling (Robertson et al. 2013) from each stratum shrunk by the cluster&apos;s radius, so that every station lies in its stratum, and at least twice the radius plus the spacing apart. Reserve clusters are the next points of the same sequence.</source>
        <translation>Grappes : les stations d'une grappe sont les k points d'un réseau carré au pas de l'espacement les plus proches de son centre ; les centres sont tirés par échantillonnage par acceptation équilibrée (Robertson et al. 2013) dans chaque strate réduite du rayon de la grappe, pour que chaque station soit dans sa strate, et espacés d'au moins deux fois le rayon plus l'espacement. Les grappes de réserve sont les points suivants de la même suite.</translation>
    </message>
    <message>
        <location filename="../processing/report/stations.py" line="224"/>
        <source>Balanced: single stations by balanced acceptance sampling (Robertson et al. 2013), each at least the spacing from every other (simple sequential inhibition); reserves are the next accepted points of the same sequence.</source>
        <translation>Équilibré : stations isolées tirées par échantillonnage par acceptation équilibrée (Robertson et al. 2013), chacune au moins à l'espacement de toutes les autres (inhibition séquentielle simple) ; les réserves sont les points acceptés suivants de la même suite.</translation>
    </message>
    <message>
        <location filename="../processing/report/stations.py" line="230"/>
        <source>MIN_SPACING = {d} m holds between all stations of the layout.</source>
        <translation>MIN_SPACING = {d} m est respecté entre toutes les stations de la disposition.</translation>
    </message>
    <message>
        <location filename="../processing/report/svg.py" line="200"/>
        <source>the frame</source>
        <translation>la base de sondage</translation>
    </message>
    <message>
        <location filename="../processing/report/svg.py" line="201"/>
        <source>stratum {key}</source>
        <translation>strate {key}</translation>
    </message>
    <message>
        <location filename="../processing/report/allocate.py" line="40"/>
        <source>equal</source>
        <translation>égale</translation>
    </message>
    <message>
        <location filename="../processing/report/allocate.py" line="41"/>
        <source>proportional to area</source>
        <translation>proportionnelle à la surface</translation>
    </message>
    <message>
        <location filename="../processing/report/allocate.py" line="42"/>
        <source>Neyman</source>
        <translation>Neyman</translation>
    </message>
    <message>
        <location filename="../processing/report/allocate.py" line="43"/>
        <source>optimal with cost</source>
        <translation>optimale avec coût</translation>
    </message>
    <message>
        <location filename="../processing/report/allocate.py" line="49"/>
        <source>Allocation of survey effort</source>
        <translation>Allocation de l'effort d'inventaire</translation>
    </message>
    <message>
        <location filename="../processing/report/allocate.py" line="71"/>
        <source>field days</source>
        <translation>jours de terrain</translation>
    </message>
    <message>
        <location filename="../processing/report/allocate.py" line="72"/>
        <source>cost units</source>
        <translation>unités de coût</translation>
    </message>
    <message>
        <location filename="../processing/report/allocate.py" line="84"/>
        <source>units in total</source>
        <translation>unités au total</translation>
    </message>
    <message>
        <location filename="../processing/report/allocate.py" line="85"/>
        <source>method</source>
        <translation>méthode</translation>
    </message>
    <message>
        <location filename="../processing/report/allocate.py" line="88"/>
        <source>expected CV of the overall density</source>
        <translation>CV attendu de la densité globale</translation>
    </message>
    <message>
        <location filename="../processing/report/allocate.py" line="90"/>
        <source>field days needed</source>
        <translation>jours de terrain nécessaires</translation>
    </message>
    <message>
        <location filename="../processing/report/allocate.py" line="90"/>
        <source>cost</source>
        <translation>coût</translation>
    </message>
    <message>
        <location filename="../processing/report/allocate.py" line="105"/>
        <source>a total number of units</source>
        <translation>un nombre total d'unités</translation>
    </message>
    <message>
        <location filename="../processing/report/allocate.py" line="106"/>
        <source>a budget</source>
        <translation>un budget</translation>
    </message>
    <message>
        <location filename="../processing/report/allocate.py" line="107"/>
        <source>a target CV</source>
        <translation>un CV cible</translation>
    </message>
    <message>
        <location filename="../processing/report/allocate.py" line="114"/>
        <source>Strata layer</source>
        <translation>Couche des strates</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="205"/>
        <source>Computation CRS</source>
        <translation>SCR de calcul</translation>
    </message>
    <message>
        <location filename="../processing/report/allocate.py" line="114"/>
        <source>Method asked for</source>
        <translation>Méthode demandée</translation>
    </message>
    <message>
        <location filename="../processing/report/allocate.py" line="114"/>
        <source>Method applied</source>
        <translation>Méthode appliquée</translation>
    </message>
    <message>
        <location filename="../processing/report/allocate.py" line="114"/>
        <source>Target</source>
        <translation>Objectif</translation>
    </message>
    <message>
        <location filename="../processing/report/allocate.py" line="114"/>
        <source>Total asked for</source>
        <translation>Total demandé</translation>
    </message>
    <message>
        <location filename="../processing/report/allocate.py" line="114"/>
        <source>Budget</source>
        <translation>Budget</translation>
    </message>
    <message>
        <location filename="../processing/report/allocate.py" line="114"/>
        <source>Target CV</source>
        <translation>CV cible</translation>
    </message>
    <message>
        <location filename="../processing/report/allocate.py" line="114"/>
        <source>Unit area (m²)</source>
        <translation>Surface d'une unité (m²)</translation>
    </message>
    <message>
        <location filename="../processing/report/allocate.py" line="114"/>
        <source>Minimum units per stratum</source>
        <translation>Nombre minimal d'unités par strate</translation>
    </message>
    <message>
        <location filename="../processing/report/allocate.py" line="114"/>
        <source>SD field</source>
        <translation>Champ d'écart-type</translation>
    </message>
    <message>
        <location filename="../processing/report/allocate.py" line="111"/>
        <source> (covariate proxy)</source>
        <translation> (substitut par la covariable)</translation>
    </message>
    <message>
        <location filename="../processing/report/allocate.py" line="114"/>
        <source>Mean field</source>
        <translation>Champ de moyenne</translation>
    </message>
    <message>
        <location filename="../processing/report/allocate.py" line="114"/>
        <source>Cost field</source>
        <translation>Champ de coût</translation>
    </message>
    <message>
        <location filename="../processing/report/allocate.py" line="114"/>
        <source>Fixed cost c0</source>
        <translation>Coût fixe c0</translation>
    </message>
    <message>
        <location filename="../processing/report/allocate.py" line="114"/>
        <source>Layout to come</source>
        <translation>Disposition prévue</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="210"/>
        <source>Finite-population correction</source>
        <translation>Correction pour population finie</translation>
    </message>
    <message>
        <location filename="../processing/report/layout.py" line="93"/>
        <source>Units per stratum</source>
        <translation>Unités par strate</translation>
    </message>
    <message>
        <location filename="../processing/report/allocate.py" line="77"/>
        <source>SE of mean per unit (covariate units)</source>
        <translation>Erreur type de la moyenne par unité (unités de la covariable)</translation>
    </message>
    <message>
        <location filename="../processing/report/allocate.py" line="78"/>
        <source>SE of mean count per unit</source>
        <translation>Erreur type du comptage moyen par unité</translation>
    </message>
    <message>
        <location filename="../processing/report/allocate.py" line="147"/>
        <source>Units that fit</source>
        <translation>Unités qui y tiennent</translation>
    </message>
    <message>
        <location filename="../processing/report/allocate.py" line="148"/>
        <source>Lower bound</source>
        <translation>Borne inférieure</translation>
    </message>
    <message>
        <location filename="../processing/report/allocate.py" line="149"/>
        <source>Share before rounding</source>
        <translation>Part avant arrondi</translation>
    </message>
    <message>
        <location filename="../processing/report/allocate.py" line="150"/>
        <source>Units (n_alloc)</source>
        <translation>Unités (n_alloc)</translation>
    </message>
    <message>
        <location filename="../processing/report/allocate.py" line="151"/>
        <source>Sampling fraction</source>
        <translation>Fraction d'échantillonnage</translation>
    </message>
    <message>
        <location filename="../processing/report/allocate.py" line="156"/>
        <source>SE of density (per km²)</source>
        <translation>Erreur type de la densité (par km²)</translation>
    </message>
    <message>
        <location filename="../processing/report/allocate.py" line="158"/>
        <source>Expected CV (exp_cv)</source>
        <translation>CV attendu (exp_cv)</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="385"/>
        <source>all strata</source>
        <translation>toutes les strates</translation>
    </message>
    <message>
        <location filename="../processing/report/allocate.py" line="54"/>
        <source>units per stratum</source>
        <translation>unités par strate</translation>
    </message>
    <message>
        <location filename="../processing/report/allocate.py" line="54"/>
        <source>Units allocated to each stratum</source>
        <translation>Unités allouées à chaque strate</translation>
    </message>
    <message>
        <location filename="../processing/report/allocate.py" line="213"/>
        <source>{what}: c0 + Σ c_h·n_h = {c0:g} + {var:,.1f} = {total:,.1f} {unit}.</source>
        <translation>{what} : c0 + Σ c_h·n_h = {c0:g} + {var:,.1f} = {total:,.1f} {unit}.</translation>
    </message>
    <message>
        <location filename="../processing/report/allocate.py" line="213"/>
        <source>Field days needed</source>
        <translation>Jours de terrain nécessaires</translation>
    </message>
    <message>
        <location filename="../processing/report/allocate.py" line="213"/>
        <source>Cost of the design</source>
        <translation>Coût du plan</translation>
    </message>
    <message>
        <location filename="../processing/report/allocate.py" line="231"/>
        <source>What the choice of method buys, at {n} units</source>
        <translation>Ce qu'apporte le choix de la méthode, pour {n} unités</translation>
    </message>
    <message>
        <location filename="../processing/report/allocate.py" line="235"/>
        <source>stratum {label}</source>
        <translation>strate {label}</translation>
    </message>
    <message>
        <location filename="../processing/report/allocate.py" line="239"/>
        <source>Variance relative to the applied allocation</source>
        <translation>Variance relative à l'allocation appliquée</translation>
    </message>
    <message>
        <location filename="../processing/report/allocate.py" line="241"/>
        <source>Expected CV</source>
        <translation>CV attendu</translation>
    </message>
    <message>
        <location filename="../processing/report/allocate.py" line="252"/>
        <source>Without standard deviations the precision of the designs cannot be compared.</source>
        <translation>Sans écarts-types, la précision des plans ne peut pas être comparée.</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="43"/>
        <source>Survey designs compared by simulation</source>
        <translation>Plans d'inventaire comparés par simulation</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="66"/>
        <source>recommended design</source>
        <translation>plan recommandé</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="67"/>
        <source>its RMSE (animals)</source>
        <translation>sa REQM (animaux)</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="68"/>
        <source>its RMSE relative to the total</source>
        <translation>sa REQM relative au total</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="69"/>
        <source>its 95 % interval coverage</source>
        <translation>couverture de ses intervalles à 95 %</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="71"/>
        <source>expected animals in the frame</source>
        <translation>animaux attendus dans la base de sondage</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="78"/>
        <source>point station</source>
        <translation>station ponctuelle</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="79"/>
        <source>square plot</source>
        <translation>placette carrée</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="80"/>
        <source>circular plot</source>
        <translation>placette circulaire</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="81"/>
        <source>line transect</source>
        <translation>transect linéaire</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="84"/>
        <source>counting radius</source>
        <translation>rayon de comptage</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="85"/>
        <source>side</source>
        <translation>côté</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="86"/>
        <source>radius</source>
        <translation>rayon</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="87"/>
        <source>length</source>
        <translation>longueur</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="92"/>
        <source>, strip half-width {w:g} m</source>
        <translation>, demi-largeur de bande {w:g} m</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="94"/>
        <source>Density surface</source>
        <translation>Surface de densité</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="95"/>
        <source>Sampling frame</source>
        <translation>Base de sondage</translation>
    </message>
    <message>
        <location filename="../processing/report/stratify.py" line="93"/>
        <source>Strata</source>
        <translation>Strates</translation>
    </message>
    <message>
        <location filename="../processing/report/stratify.py" line="232"/>
        <source>none</source>
        <translation>néant</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="157"/>
        <source>Stratum field</source>
        <translation>Champ de strate</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="98"/>
        <source>feature id</source>
        <translation>identifiant d'entité</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="100"/>
        <source>Surface cell</source>
        <translation>Cellule de la surface</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="101"/>
        <source>Sub-cells per cell side (for counting)</source>
        <translation>Sous-cellules par côté de cellule (pour le comptage)</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="102"/>
        <source>Unit</source>
        <translation>Unité</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="103"/>
        <source>Counted area per unit (m²)</source>
        <translation>Surface comptée par unité (m²)</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="104"/>
        <source>Bearing</source>
        <translation>Azimut</translation>
    </message>
    <message>
        <location filename="../processing/report/layout.py" line="150"/>
        <source>random</source>
        <translation>aléatoire</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="107"/>
        <source>Units wholly inside their stratum</source>
        <translation>Unités entièrement dans leur strate</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="112"/>
        <source>Number of units</source>
        <translation>Nombre d'unités</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="113"/>
        <source>Simulated surveys per design</source>
        <translation>Inventaires simulés par plan</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="114"/>
        <source>Counts per cell</source>
        <translation>Comptages par cellule</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="114"/>
        <source>negative binomial, k = {k:g}</source>
        <translation>binomiale négative, k = {k:g}</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="114"/>
        <source>Poisson</source>
        <translation>Poisson</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="119"/>
        <source>Variance estimator (grid, balanced)</source>
        <translation>Estimateur de variance (grille, équilibré)</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="119"/>
        <source>local neighbourhood</source>
        <translation>voisinage local</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="165"/>
        <source>simple random sampling formula</source>
        <translation>formule de l'échantillonnage aléatoire simple</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="158"/>
        <source>Confidence level</source>
        <translation>Niveau de confiance</translation>
    </message>
    <message>
        <location filename="../processing/report/trendpower.py" line="110"/>
        <source>Seed</source>
        <translation>Graine</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="132"/>
        <source>How the designs did at {n} units</source>
        <translation>Résultats des plans pour {n} unités</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="134"/>
        <source>Design</source>
        <translation>Plan</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="135"/>
        <source>Mean units surveyed</source>
        <translation>Unités inventoriées en moyenne</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="136"/>
        <source>Relative bias</source>
        <translation>Biais relatif</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="137"/>
        <source>Empirical SE (animals)</source>
        <translation>Erreur type empirique (animaux)</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="329"/>
        <source>RMSE (animals)</source>
        <translation>REQM (animaux)</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="139"/>
        <source>± Monte Carlo SE</source>
        <translation>± erreur type de Monte-Carlo</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="140"/>
        <source>RMSE / total</source>
        <translation>REQM / total</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="141"/>
        <source>Mean estimated CV</source>
        <translation>CV estimé moyen</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="142"/>
        <source>95 % interval coverage</source>
        <translation>Couverture des intervalles à 95 %</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="143"/>
        <source>Surveys without an estimate</source>
        <translation>Inventaires sans estimation</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="178"/>
        <source>RMSE of the abundance (animals)</source>
        <translation>REQM de l'abondance (animaux)</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="178"/>
        <source>Root mean square error of the abundance estimate, by design (lower is better)</source>
        <translation>Racine de l'erreur quadratique moyenne de l'estimation de l'abondance, par plan (plus bas est meilleur)</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="191"/>
        <source>Recommendation</source>
        <translation>Recommandation</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="193"/>
        <source>No design gave estimates: see the warnings.</source>
        <translation>Aucun plan n'a donné d'estimation : voir les avertissements.</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="235"/>
        <source>How the simulation works</source>
        <translation>Fonctionnement de la simulation</translation>
    </message>
    <message>
        <location filename="../processing/report/demoreserve.py" line="43"/>
        <source>Area (km²)</source>
        <translation>Surface (km²)</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="276"/>
        <source>Mean expected count per unit</source>
        <translation>Comptage attendu moyen par unité</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="277"/>
        <source>S_h (count SD per unit)</source>
        <translation>S_h (écart-type du comptage par unité)</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="280"/>
        <source>Units, proportional</source>
        <translation>Unités, proportionnelle</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="282"/>
        <source>Units, Neyman (best case)</source>
        <translation>Unités, Neyman (meilleur cas)</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="284"/>
        <source>Units, Neyman from a pilot (mean)</source>
        <translation>Unités, Neyman d'après un pilote (moyenne)</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="310"/>
        <source>RMSE against the number of units</source>
        <translation>REQM en fonction du nombre d'unités</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="316"/>
        <source>number of units</source>
        <translation>nombre d'unités</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="316"/>
        <source>RMSE of the abundance estimate against the number of units</source>
        <translation>REQM de l'estimation de l'abondance en fonction du nombre d'unités</translation>
    </message>
    <message>
        <location filename="../processing/report/trendpower.py" line="24"/>
        <source>Units</source>
        <translation>Unités</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="336"/>
        <source>{a} → {b} units: RMSE {change:+.0%}</source>
        <translation>{a} → {b} unités : REQM {change:+.0%}</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="341"/>
        <source>For {name}: </source>
        <translation>Pour {name} : </translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="118"/>
        <source>{level} interval</source>
        <translation>intervalle à {level}</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="383"/>
        <source>animals per {unit}</source>
        <translation>animaux par {unit}</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="378"/>
        <source>transects</source>
        <translation>transects</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="378"/>
        <source>points</source>
        <translation>points</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="120"/>
        <source>estimated animals in the frame</source>
        <translation>animaux estimés dans la base de sondage</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="188"/>
        <source>CV</source>
        <translation>CV</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="124"/>
        <source>detections used</source>
        <translation>détections utilisées</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="128"/>
        <source>detection probability within the truncation distance</source>
        <translation>probabilité de détection en deçà de la distance de troncature</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="129"/>
        <source>effective strip half-width (m)</source>
        <translation>demi-largeur effective de bande (m)</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="129"/>
        <source>effective detection radius (m)</source>
        <translation>rayon effectif de détection (m)</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="138"/>
        <source>the last band edge</source>
        <translation>la dernière borne des classes</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="140"/>
        <source>automatic: the farthest 5 % of the distances left out</source>
        <translation>automatique : les 5 % des distances les plus éloignées sont écartés</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="148"/>
        <source>{layer} (id field {field})</source>
        <translation>{layer} (champ d'identifiant {field})</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="150"/>
        <source>{layer} (unit field {unit}, distance field {distance})</source>
        <translation>{layer} (champ d'unité {unit}, champ de distance {distance})</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="152"/>
        <source>line transects</source>
        <translation>transects linéaires</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="152"/>
        <source>point transects</source>
        <translation>transects ponctuels</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="154"/>
        <source>none: exact distances</source>
        <translation>aucune : distances exactes</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="156"/>
        <source>one per stratum</source>
        <translation>une par strate</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="156"/>
        <source>one for all strata</source>
        <translation>une pour toutes les strates</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="159"/>
        <source>mean, or size-bias regression when larger groups are seen farther</source>
        <translation>moyenne, ou régression du biais de taille si les grands groupes sont vus plus loin</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="161"/>
        <source>mean of the detected groups</source>
        <translation>moyenne des groupes détectés</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="162"/>
        <source>size-bias regression</source>
        <translation>régression du biais de taille</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="167"/>
        <source>Transects or points</source>
        <translation>Transects ou points</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="167"/>
        <source>Survey type</source>
        <translation>Type d'inventaire</translation>
    </message>
    <message>
        <location filename="../processing/report/panels.py" line="103"/>
        <source>none: one stratum</source>
        <translation>aucun : une seule strate</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="167"/>
        <source>Visits field</source>
        <translation>Champ des visites</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="167"/>
        <source>Observations</source>
        <translation>Observations</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="167"/>
        <source>Group size field</source>
        <translation>Champ de taille des groupes</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="167"/>
        <source>none: each detection is one animal</source>
        <translation>aucun : chaque détection est un animal</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="204"/>
        <source>Strata (frame)</source>
        <translation>Strates (base de sondage)</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="167"/>
        <source>Truncation distance</source>
        <translation>Distance de troncature</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="167"/>
        <source>Distance bands (m)</source>
        <translation>Classes de distance (m)</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="167"/>
        <source>Key functions tried</source>
        <translation>Fonctions clés essayées</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="167"/>
        <source>Most cosine terms per key</source>
        <translation>Nombre maximal de termes en cosinus par fonction clé</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="206"/>
        <source>Detection function</source>
        <translation>Fonction de détection</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="167"/>
        <source>Group size</source>
        <translation>Taille des groupes</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="206"/>
        <source>Area unit</source>
        <translation>Unité de surface</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="220"/>
        <source>Bootstrap resamples</source>
        <translation>Rééchantillonnages bootstrap</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="194"/>
        <source>perpendicular distance from the line (m)</source>
        <translation>distance perpendiculaire à la ligne (m)</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="194"/>
        <source>Distances seen from the lines, with the fitted detection function scaled to the detections (its height at 0 is where every animal is seen)</source>
        <translation>Distances observées depuis les lignes, avec la fonction de détection ajustée mise à l'échelle des détections (sa hauteur en 0 correspond à la détection de tous les animaux)</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="197"/>
        <source>distance from the point (m)</source>
        <translation>distance au point (m)</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="197"/>
        <source>Distances seen from the points, with the fitted probability density of the distances: it rises from 0 because there is more ground farther from a point, then falls as detection drops</source>
        <translation>Distances observées depuis les points, avec la densité de probabilité ajustée des distances : elle croît depuis 0 parce qu'il y a plus de terrain loin d'un point, puis décroît quand la détection baisse</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="207"/>
        <source>{n} of the {recorded} recorded detections lie within the truncation distance of {w:.1f} m and were used; {dropped} farther ones were left out.</source>
        <translation>{n} des {recorded} détections enregistrées se trouvent en deçà de la distance de troncature de {w:.1f} m et ont été utilisées ; {dropped} plus éloignées ont été écartées.</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="218"/>
        <source>detections per metre of distance</source>
        <translation>détections par mètre de distance</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="218"/>
        <source>fitted: {model}</source>
        <translation>ajusté : {model}</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="250"/>
        <source>Stratum {stratum}.</source>
        <translation>Strate {stratum}.</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="237"/>
        <source>Effective half-width (m)</source>
        <translation>Demi-largeur effective (m)</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="237"/>
        <source>Effective radius (m)</source>
        <translation>Rayon effectif (m)</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="240"/>
        <source>AIC above the best</source>
        <translation>AIC au-dessus du meilleur</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="241"/>
        <source>Detection probability within w</source>
        <translation>Probabilité de détection en deçà de w</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="242"/>
        <source>Fit, χ² p</source>
        <translation>Adéquation, p du χ²</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="243"/>
        <source>Fit, Cramér–von Mises p</source>
        <translation>Adéquation, p de Cramér–von Mises</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="244"/>
        <source>Chosen</source>
        <translation>Choisi</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="245"/>
        <source>Every model tried, in the order fitted ({n} detections). The smallest AIC is chosen; a fit p below 0.05 means the model misses the shape of the distances.</source>
        <translation>Chaque modèle essayé, dans l'ordre d'ajustement ({n} détections). Le plus petit AIC est choisi ; un p d'adéquation inférieur à 0.05 signifie que le modèle ne rend pas la forme des distances.</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="259"/>
        <source>Group size: {n} groups seen, mean size {mean:.3g}.</source>
        <translation>Taille des groupes : {n} groupes vus, taille moyenne {mean:.3g}.</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="262"/>
        <source>The regression of ln(size) on the detection probability has slope {b:.3g} (p = {p:.3f}).</source>
        <translation>La régression de ln(taille) sur la probabilité de détection a une pente de {b:.3g} (p = {p:.3f}).</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="266"/>
        <source>Larger groups are seen farther away, so the expected size where every group is seen, {e:.3g} (SE {se:.3g}), is used instead of the mean.</source>
        <translation>Les grands groupes sont vus plus loin : la taille attendue là où tous les groupes sont vus, {e:.3g} (erreur type {se:.3g}), est donc utilisée à la place de la moyenne.</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="270"/>
        <source>The mean is used (SE {se:.3g}).</source>
        <translation>La moyenne est utilisée (erreur type {se:.3g}).</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="284"/>
        <source>distance (m)</source>
        <translation>distance (m)</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="284"/>
        <source>probability of detection</source>
        <translation>probabilité de détection</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="286"/>
        <source>The best model of each key function: the probability of seeing an animal at each distance (1 on the line or at the point, by assumption)</source>
        <translation>Le meilleur modèle de chaque fonction clé : la probabilité de voir un animal à chaque distance (1 sur la ligne ou au point, par hypothèse)</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="292"/>
        <source>Transects</source>
        <translation>Transects</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="292"/>
        <source>Points</source>
        <translation>Points</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="293"/>
        <source>Line length (km)</source>
        <translation>Longueur de ligne (km)</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="293"/>
        <source>Visits</source>
        <translation>Visites</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="295"/>
        <source>Detections per km</source>
        <translation>Détections par km</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="295"/>
        <source>Detections per visit</source>
        <translation>Détections par visite</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="236"/>
        <source>Area ({unit})</source>
        <translation>Surface ({unit})</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="299"/>
        <source>Detections</source>
        <translation>Détections</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="300"/>
        <source>Animals per {unit}</source>
        <translation>Animaux par {unit}</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="38"/>
        <source>Lower limit</source>
        <translation>Limite inférieure</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="38"/>
        <source>Upper limit</source>
        <translation>Limite supérieure</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="246"/>
        <source>df</source>
        <translation>ddl</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="314"/>
        <source>bootstrap percentile limits</source>
        <translation>limites des percentiles bootstrap</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="314"/>
        <source>log-normal limits with t</source>
        <translation>limites log-normales avec t</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="316"/>
        <source>Density by stratum, {method} at {level}.</source>
        <translation>Densité par strate, {method} à {level}.</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="320"/>
        <source>Animals</source>
        <translation>Animaux</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="320"/>
        <source>Abundance in the frame, limits at {level}.</source>
        <translation>Abondance dans la base de sondage, limites à {level}.</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="328"/>
        <source>For comparison: the abundance&apos;s delta-method interval (log-normal with t).</source>
        <translation>Pour comparaison : l'intervalle de l'abondance par la méthode delta (log-normal avec t).</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="342"/>
        <source>Share from the encounter rate</source>
        <translation>Part du taux de rencontre</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="343"/>
        <source>Share from the detection function</source>
        <translation>Part de la fonction de détection</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="344"/>
        <source>Share from group size</source>
        <translation>Part de la taille des groupes</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="345"/>
        <source>Where the uncertainty comes from: each part's share of CV² (delta method). A large encounter-rate share calls for more transects; a large detection share for more detections.</source>
        <translation>D'où vient l'incertitude : la part de chaque composante dans le CV² (méthode delta). Une grande part du taux de rencontre appelle davantage de transects ; une grande part de la détection, davantage de détections.</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="351"/>
        <source>Density and abundance</source>
        <translation>Densité et abondance</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="359"/>
        <source>Density by stratum with {level} intervals</source>
        <translation>Densité par strate avec intervalles à {level}</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="372"/>
        <source>lowest: {value:.3g}</source>
        <translation>minimum : {value:.3g}</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="373"/>
        <source>highest: {value:.3g}</source>
        <translation>maximum : {value:.3g}</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="384"/>
        <source>Strata shaded by density (animals per {unit}), with the surveyed {what}</source>
        <translation>Strates ombrées selon la densité (animaux par {unit}), avec les {what} inventoriés</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="391"/>
        <source>Each detection function is a key (half-normal, hazard-rate or uniform) with up to the chosen number of cosine terms, fitted to the distances by maximum likelihood; terms are added one at a time while AIC falls, under the constraint that detection never rises with distance, and the model with the smallest AIC is used (Buckland et al. 2001).</source>
        <translation>Chaque fonction de détection est une fonction clé (demi-normale, taux de risque ou uniforme) avec au plus le nombre choisi de termes en cosinus, ajustée aux distances par maximum de vraisemblance ; les termes sont ajoutés un à un tant que l'AIC baisse, sous la contrainte que la détection ne croisse jamais avec la distance, et le modèle de plus petit AIC est utilisé (Buckland et al. 2001).</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="398"/>
        <source>Density in a stratum is D = n·E(s) / (2·w·L·P), with n the groups seen within the truncation distance w, L the line length, P the probability of seeing a group within w and E(s) the expected group size (Buckland et al. 2001).</source>
        <translation>La densité d'une strate est D = n·E(s) / (2·w·L·P), où n est le nombre de groupes vus en deçà de la distance de troncature w, L la longueur de ligne, P la probabilité de voir un groupe en deçà de w et E(s) la taille attendue des groupes (Buckland et al. 2001).</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="404"/>
        <source>Density in a stratum is D = n·E(s) / (k·π·w²·P), with n the groups seen within the truncation distance w, k the number of point visits, P the probability of seeing a group within w and E(s) the expected group size (Buckland et al. 2001).</source>
        <translation>La densité d'une strate est D = n·E(s) / (k·π·w²·P), où n est le nombre de groupes vus en deçà de la distance de troncature w, k le nombre de visites de points, P la probabilité de voir un groupe en deçà de w et E(s) la taille attendue des groupes (Buckland et al. 2001).</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="409"/>
        <source>The squared CV of the density is the sum of those of the encounter rate, of P and of E(s) (delta method). The encounter rate's variance comes from the differences between transects within each stratum (estimator R2 of Fewster et al. 2009), that of P from the curvature of the likelihood, that of E(s) from the spread of group sizes. Intervals are log-normal, D/C to D·C with C = exp(t·√ln(1 + CV²)), t with Satterthwaite's degrees of freedom (Buckland et al. 2001). With one detection function for all strata, its uncertainty is shared by every stratum and counted once in the overall estimate.</source>
        <translation>Le CV au carré de la densité est la somme de ceux du taux de rencontre, de P et de E(s) (méthode delta). La variance du taux de rencontre vient des différences entre transects dans chaque strate (estimateur R2 de Fewster et al. 2009), celle de P de la courbure de la vraisemblance, celle de E(s) de la dispersion des tailles des groupes. Les intervalles sont log-normaux, de D/C à D·C avec C = exp(t·√ln(1 + CV²)), t avec les degrés de liberté de Satterthwaite (Buckland et al. 2001). Avec une seule fonction de détection pour toutes les strates, son incertitude est partagée par chaque strate et comptée une seule fois dans l'estimation globale.</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="418"/>
        <source>The intervals reported are bootstrap percentile intervals: {b} resamples drawn from the recorded seed, each taking as many transects or points per stratum as were surveyed, with replacement, refitting the chosen detection function and group size to their detections (AIC is not rerun). {f} resamples could not be fitted.</source>
        <translation>Les intervalles indiqués sont des intervalles bootstrap des percentiles : {b} rééchantillonnages tirés à partir de la graine enregistrée, chacun prenant avec remise autant de transects ou de points par strate qu'il en a été inventorié, et réajustant à leurs détections la fonction de détection choisie et la taille des groupes (l'AIC n'est pas refait). {f} rééchantillonnages n'ont pas pu être ajustés.</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="427"/>
        <source>Assumptions and cautions</source>
        <translation>Hypothèses et mises en garde</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="428"/>
        <source>The estimate is only as good as three things that happened in the field:</source>
        <translation>L'estimation ne vaut que ce que valent trois choses qui se sont passées sur le terrain :</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="431"/>
        <source>Animals on the line are always seen. Any missed there makes the estimate too low by the same share, and no interval shows it.</source>
        <translation>Les animaux sur la ligne sont toujours vus. Chaque animal manqué sur la ligne rend l'estimation trop basse de la même proportion, et aucun intervalle ne le montre.</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="435"/>
        <source>Animals at the point are always seen. Any missed there makes the estimate too low by the same share, and no interval shows it.</source>
        <translation>Les animaux au point sont toujours vus. Chaque animal manqué au point rend l'estimation trop basse de la même proportion, et aucun intervalle ne le montre.</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="438"/>
        <source>Distances are measured accurately, with a rangefinder and compass where possible. Rounding to round numbers, or guessing, distorts the detection function; distance bands are then safer.</source>
        <translation>Les distances sont mesurées avec précision, au télémètre et à la boussole si possible. Arrondir à des nombres ronds, ou estimer à vue, déforme la fonction de détection ; des classes de distance sont alors plus sûres.</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="441"/>
        <source>Animals do not move before they are detected: animals fleeing from the observer look like a detection function that falls too early, and animals drawn to the observer like one that falls too late.</source>
        <translation>Les animaux ne se déplacent pas avant d'être détectés : des animaux qui fuient l'observateur ressemblent à une fonction de détection qui chute trop tôt, et des animaux attirés par l'observateur à une fonction qui chute trop tard.</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="445"/>
        <source>The transects or points were placed at random (or on a randomly placed grid) with respect to the animals, and each stratum&apos;s estimate covers its polygons only: tracks and roads are not random lines.</source>
        <translation>Les transects ou les points ont été placés au hasard (ou sur une grille placée au hasard) par rapport aux animaux, et l'estimation de chaque strate ne couvre que ses polygones : les pistes et les routes ne sont pas des lignes aléatoires.</translation>
    </message>
    <message>
        <location filename="../processing/report/distancedensity.py" line="467"/>
        <source>Density from detection distances</source>
        <translation>Densité à partir des distances de détection</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="88"/>
        <source>Naive occupancy from presence data</source>
        <translation>Occupation naïve à partir de données de présence</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="88"/>
        <source>Density and abundance estimate</source>
        <translation>Estimation de la densité et de l'abondance</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="107"/>
        <source>proportion of units occupied (naive)</source>
        <translation>proportion d'unités occupées (naïve)</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="107"/>
        <source>occupied units</source>
        <translation>unités occupées</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="110"/>
        <source>density per {unit}</source>
        <translation>densité par {unit}</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="110"/>
        <source>animals</source>
        <translation>animaux</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="119"/>
        <source>0 – {hi} (one-sided)</source>
        <translation>0 – {hi} (unilatéral)</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="125"/>
        <source>estimated {what} in the frame</source>
        <translation>estimation des {what} dans la base de sondage</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="129"/>
        <source>units surveyed</source>
        <translation>unités inventoriées</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="132"/>
        <source>true total of the simulated population</source>
        <translation>vrai total de la population simulée</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="138"/>
        <source>covers</source>
        <translation>contient</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="138"/>
        <source>misses</source>
        <translation>ne contient pas</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="160"/>
        <source>t with Satterthwaite degrees of freedom</source>
        <translation>t avec les degrés de liberté de Satterthwaite</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="161"/>
        <source>log-normal (with t)</source>
        <translation>log-normal (avec t)</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="162"/>
        <source>stratified percentile bootstrap</source>
        <translation>bootstrap stratifié des percentiles</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="166"/>
        <source>local neighbourhood (Stevens &amp; Olsen 2003)</source>
        <translation>voisinage local (Stevens &amp; Olsen 2003)</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="167"/>
        <source>local neighbourhood, scaled to the simple formula (our variant)</source>
        <translation>voisinage local, mis à l'échelle de la formule simple (notre variante)</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="177"/>
        <source>plus sampling (units count only inside their stratum)</source>
        <translation>échantillonnage « plus » (les unités ne comptent que dans leur strate)</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="178"/>
        <source>units kept wholly inside their stratum</source>
        <translation>unités gardées entièrement dans leur strate</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="179"/>
        <source>no record: whole units</source>
        <translation>pas d'enregistrement : unités entières</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="181"/>
        <source>field {field} (m²)</source>
        <translation>champ {field} (m²)</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="181"/>
        <source>polygon area</source>
        <translation>surface du polygone</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="187"/>
        <source>strip width</source>
        <translation>largeur de bande</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="189"/>
        <source>fixed</source>
        <translation>fixe</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="191"/>
        <source>asked for; applied in strata {yes}, refused in {no} (units may overlap)</source>
        <translation>demandée ; appliquée dans les strates {yes}, refusée dans {no} (les unités peuvent se chevaucher)</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="198"/>
        <source>Sample units</source>
        <translation>Unités d'échantillonnage</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="148"/>
        <source>Count field</source>
        <translation>Champ de comptage</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="200"/>
        <source> (presence/absence)</source>
        <translation> (présence/absence)</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="203"/>
        <source>Unit area</source>
        <translation>Surface d'une unité</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="331"/>
        <source>Interval</source>
        <translation>Intervalle</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="209"/>
        <source>Variance estimator</source>
        <translation>Estimateur de variance</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="211"/>
        <source>Edge protocol of the units</source>
        <translation>Protocole de bord des unités</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="212"/>
        <source>Detection probability p</source>
        <translation>Probabilité de détection p</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="215"/>
        <source>Target CV for the next survey</source>
        <translation>CV cible pour le prochain inventaire</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="223"/>
        <source>not used (no random draws without the bootstrap)</source>
        <translation>non utilisée (pas de tirage aléatoire sans le bootstrap)</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="233"/>
        <source>Estimates by stratum</source>
        <translation>Estimations par strate</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="237"/>
        <source>Units (n)</source>
        <translation>Unités (n)</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="238"/>
        <source>Not surveyed</source>
        <translation>Non inventoriées</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="239"/>
        <source>Mean count</source>
        <translation>Comptage moyen</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="240"/>
        <source>SD of counts</source>
        <translation>Écart-type des comptages</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="280"/>
        <source>Occupied units</source>
        <translation>Unités occupées</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="280"/>
        <source>Abundance</source>
        <translation>Abondance</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="258"/>
        <source>Units next time (n_next)</source>
        <translation>Unités la prochaine fois (n_next)</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="273"/>
        <source>{what}, limits at {level}.</source>
        <translation>{what}, limites à {level}.</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="280"/>
        <source>{what} in the frame, limits at {level}.</source>
        <translation>{what} dans la base de sondage, limites à {level}.</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="315"/>
        <source>Non-response: {n} unit(s) were not surveyed (no count) and were left out: {ids}.</source>
        <translation>Non-réponse : {n} unité(s) n'ont pas été inventoriée(s) (pas de comptage) et ont été écartée(s) : {ids}.</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="321"/>
        <source>{n} unused reserve unit(s) without a count were skipped.</source>
        <translation>{n} unité(s) de réserve non utilisée(s) sans comptage ont été ignorée(s).</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="330"/>
        <source>The overall interval by method</source>
        <translation>L'intervalle global selon la méthode</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="331"/>
        <source>Used in the outputs</source>
        <translation>Utilisé dans les sorties</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="362"/>
        <source>overall abundance in a resample</source>
        <translation>abondance globale dans un rééchantillonnage</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="362"/>
        <source>resamples</source>
        <translation>rééchantillonnages</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="362"/>
        <source>{level} percentile limits</source>
        <translation>limites des percentiles à {level}</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="362"/>
        <source>The {n:,} bootstrap resamples of the overall abundance</source>
        <translation>Les {n:,} rééchantillonnages bootstrap de l'abondance globale</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="384"/>
        <source>true density (simulation)</source>
        <translation>vraie densité (simulation)</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="394"/>
        <source>{what} by stratum with {level} confidence intervals</source>
        <translation>{what} par strate avec intervalles de confiance à {level}</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="409"/>
        <source>lowest</source>
        <translation>minimum</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="409"/>
        <source>highest</source>
        <translation>maximum</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="420"/>
        <source>surveyed units</source>
        <translation>unités inventoriées</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="430"/>
        <source>not surveyed</source>
        <translation>non inventoriées</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="439"/>
        <source>Strata shaded by {what}, with the units</source>
        <translation>Strates ombrées selon {what}, avec les unités</translation>
    </message>
    <message>
        <location filename="../processing/report/trendpower.py" line="177"/>
        <source>Cautions</source>
        <translation>Mises en garde</translation>
    </message>
    <message>
        <location filename="../processing/report/allocate.py" line="196"/>
        <source>Expected precision uses the pilot figures as if they were the truth, with the finite-population correction 1 − n_h·a/A_h, since the layout named draws units that do not overlap (Cochran 1977, ch. 5). Real precision depends on the counts the survey finds.</source>
        <translation>La précision attendue utilise les chiffres pilotes comme s'ils étaient la vérité, avec la correction pour population finie 1 − n_h·a/A_h, puisque la disposition indiquée tire des unités qui ne se chevauchent pas (Cochran 1977, ch. 5). La précision réelle dépend des comptages que l'inventaire obtiendra.</translation>
    </message>
    <message>
        <location filename="../processing/report/allocate.py" line="196"/>
        <source>Expected precision uses the pilot figures as if they were the truth, without a finite-population correction: a simple random layout&apos;s units may overlap, so their possible positions are a continuous population (Cordy 1993). Real precision depends on the counts the survey finds.</source>
        <translation>La précision attendue utilise les chiffres pilotes comme s'ils étaient la vérité, sans correction pour population finie : les unités d'une disposition aléatoire simple peuvent se chevaucher, si bien que leurs positions possibles forment une population continue (Cordy 1993). La précision réelle dépend des comptages que l'inventaire obtiendra.</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="168"/>
        <source>Each figure is itself an estimate from {reps} simulated surveys: relative biases within about ±{noise:.1%} cannot be told from zero, and RMSEs closer than two Monte Carlo SEs are a tie. More surveys per design narrow both.</source>
        <translation>Chaque chiffre est lui-même une estimation tirée de {reps} inventaires simulés : des biais relatifs d'environ ±{noise:.1%} ne se distinguent pas de zéro, et des REQM plus proches que deux erreurs types de Monte-Carlo sont à égalité. Davantage d'inventaires par plan resserrent les deux.</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="195"/>
        <source>{name} gave the lowest root mean square error ({rmse:,.1f} animals, {rel:.1%} of the mean true total of {total:,.0f}) among the designs whose 95 % intervals held the truth at least 90 % of the time.</source>
        <translation>{name} a donné la plus faible racine de l'erreur quadratique moyenne ({rmse:,.1f} animaux, {rel:.1%} du vrai total moyen de {total:,.0f}) parmi les plans dont les intervalles à 95 % ont contenu la vérité au moins 90 % du temps.</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="202"/>
        <source>{others} did about as well: the differences lie within the Monte Carlo error of the simulation. Among these, choose the one that is easiest to carry out in the field.</source>
        <translation>{others} ont fait à peu près aussi bien : les différences restent dans l'erreur de Monte-Carlo de la simulation. Parmi eux, choisissez celui qui est le plus facile à mettre en œuvre sur le terrain.</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="214"/>
        <source>The intervals of {names} held the truth less than 90 % of the time: their stated precision would mislead.</source>
        <translation>Les intervalles de {names} ont contenu la vérité moins de 90 % du temps : leur précision affichée serait trompeuse.</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="224"/>
        <source>The systematic grid&apos;s number of units varies from survey to survey (mean shown). With the simple random sampling formula its interval is usually conservative on smooth surfaces.</source>
        <translation>Le nombre d'unités de la grille systématique varie d'un inventaire à l'autre (moyenne indiquée). Avec la formule de l'échantillonnage aléatoire simple, son intervalle est en général conservateur sur des surfaces lisses.</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="236"/>
        <source>Each simulated survey draws a population on the surface: Poisson counts in every surface cell, or negative binomial counts (gamma-Poisson) when k is above 0. All designs survey the same populations. Every design is laid out with the layout engine and follows the real chain&apos;s edge protocol: by default plus sampling, with centres over each stratum (or the frame) grown by the unit&apos;s reach (and half a surface cell), each unit counting the animals of the cells of its own stratum whose centres it covers, with its nominal area, and the estimation engine expanding the counts to the grown area (Gregoire &amp; Valentine 2008, ch. 10); the abundance is the ratio estimator with its t interval (Satterthwaite degrees of freedom). Each estimate is judged against the true total of its own population.</source>
        <translation>Chaque inventaire simulé tire une population sur la surface : comptages de Poisson dans chaque cellule, ou comptages binomiaux négatifs (gamma-Poisson) quand k est supérieur à 0. Tous les plans inventorient les mêmes populations. Chaque plan est disposé avec le moteur de disposition et suit le protocole de bord de la chaîne réelle : par défaut l'échantillonnage « plus », avec des centres sur chaque strate (ou la base) agrandie de la portée de l'unité (et d'une demi-cellule de la surface), chaque unité comptant les animaux des cellules de sa propre strate dont elle couvre le centre, avec sa surface nominale, et le moteur d'estimation étendant les comptages à la surface agrandie (Gregoire &amp; Valentine 2008, ch. 10) ; l'abondance est l'estimateur par le ratio avec son intervalle t (degrés de liberté de Satterthwaite). Chaque estimation est jugée par rapport au vrai total de sa propre population.</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="250"/>
        <source>The stratified Neyman design with the true S_h is the best case: it allocates with the standard deviations the surface implies, which no survey knows. The pilot-based Neyman design estimates S_h in every simulated survey from a pilot of {pilot} simple random units per stratum (an independent realisation: a pilot season), as a survey would; its pilot units are not counted in its n.</source>
        <translation>Le plan stratifié de Neyman avec le vrai S_h est le meilleur cas : il répartit selon les écarts-types qu'implique la surface, qu'aucun inventaire ne connaît. Le plan de Neyman fondé sur un pilote estime S_h dans chaque inventaire simulé à partir d'un pilote de {pilot} unités aléatoires simples par strate (une réalisation indépendante : une saison pilote), comme le ferait un inventaire ; ses unités pilotes ne sont pas comptées dans son n.</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="259"/>
        <source>Assumptions: the surface is the truth, every animal in a unit is counted (no detection error), animals do not move during the survey, and every unit can be reached. Real surveys meet none of these exactly; use the comparison to rank designs and to size the effort, not as a promise of precision.</source>
        <translation>Hypothèses : la surface est la vérité, chaque animal d'une unité est compté (pas d'erreur de détection), les animaux ne se déplacent pas pendant l'inventaire et chaque unité peut être atteinte. Aucun vrai inventaire ne les remplit exactement ; utilisez la comparaison pour classer les plans et dimensionner l'effort, pas comme une promesse de précision.</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="298"/>
        <source>S_h is the standard deviation of one unit's count in the stratum implied by the surface: the spread of the expected counts over {draws} random unit positions plus the Poisson (and negative binomial) variation about them. Neyman allocation gives each stratum units in proportion to A_h·S_h (Neyman 1934; Cochran 1977, §5.5), with at least 2 per stratum.</source>
        <translation>S_h est l'écart-type du comptage d'une unité dans la strate impliqué par la surface : la dispersion des comptages attendus sur {draws} positions aléatoires d'unités plus la variation de Poisson (et binomiale négative) autour d'eux. L'allocation de Neyman donne à chaque strate des unités proportionnellement à A_h·S_h (Neyman 1934 ; Cochran 1977, §5.5), avec au moins 2 par strate.</translation>
    </message>
    <message>
        <location filename="../processing/report/comparedesigns.py" line="346"/>
        <source>The RMSE of a design falls roughly as 1/√n: doubling the units lowers it by about 30 %. Where the curve flattens, more units buy little; spend the effort on better counts (detection) or a better surface instead.</source>
        <translation>La REQM d'un plan décroît à peu près comme 1/√n : doubler les unités la réduit d'environ 30 %. Là où la courbe s'aplatit, davantage d'unités apportent peu ; consacrez plutôt l'effort à de meilleurs comptages (détection) ou à une meilleure surface.</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="138"/>
        <source>Simulation only: the true total ({truth:,.0f}) is known here because the population was simulated. The estimate is {est:,.0f} ({error:+.1%} from the truth), and the {level} interval {verdict} the truth. Only a simulation can show this; a real survey never knows its true total, and one survey&apos;s interval may miss it by chance (about {miss:.0%} of surveys should).</source>
        <translation>Simulation uniquement : le vrai total ({truth:,.0f}) est connu ici parce que la population a été simulée. L'estimation est de {est:,.0f} ({error:+.1%} par rapport à la vérité), et l'intervalle à {level} {verdict} la vérité. Seule une simulation peut le montrer ; un vrai inventaire ne connaît jamais son vrai total, et l'intervalle d'un inventaire peut le manquer par hasard (ce devrait être le cas d'environ {miss:.0%} des inventaires).</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="297"/>
        <source>† Every count was 0: the estimate is 0 and the interval runs from 0 to the one-sided upper limit −ln(1 − {level}) · A / Σa of a Poisson count of 0 (Garwood 1936; about 3 · A / Σa at 95 %), divided by p with detection. For the frame it assumes one density over the strata.</source>
        <translation>† Tous les comptages valaient 0 : l'estimation vaut 0 et l'intervalle va de 0 à la limite supérieure unilatérale −ln(1 − {level}) · A / Σa d'un comptage de Poisson de 0 (Garwood 1936 ; environ 3 · A / Σa à 95 %), divisée par p avec la détection. Pour la base de sondage, elle suppose une seule densité sur les strates.</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="306"/>
        <source>The frame shrank: strata {strata} had no surveyed unit and were left out ({area:,.3g} {unit}). The estimate covers the remaining strata only.</source>
        <translation>La base de sondage s'est réduite : les strates {strata} n'avaient aucune unité inventoriée et ont été écartées ({area:,.3g} {unit}). L'estimation ne couvre que les strates restantes.</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="350"/>
        <source>The t interval is symmetric about the estimate; the log-normal interval is skewed to the right like the sampling distribution of a count-based estimate, and suits small samples of clumped animals better. Choose the method before looking at the results.</source>
        <translation>L'intervalle t est symétrique autour de l'estimation ; l'intervalle log-normal est asymétrique vers la droite comme la distribution d'échantillonnage d'une estimation fondée sur des comptages, et convient mieux aux petits échantillons d'animaux agrégés. Choisissez la méthode avant de regarder les résultats.</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="448"/>
        <source>Each stratum&apos;s value is the proportion of its surveyed units where the species was detected; the frame&apos;s value weights the strata by the number of units they hold (area / unit area). This is naive occupancy: it is not corrected for detection, so it understates true occupancy whenever the species can be present and missed. Detection-corrected occupancy needs repeat visits to the same units (occupancy models).</source>
        <translation>La valeur de chaque strate est la proportion de ses unités inventoriées où l'espèce a été détectée ; la valeur de la base pondère les strates par le nombre d'unités qu'elles contiennent (surface / surface d'une unité). C'est l'occupation naïve : elle n'est pas corrigée de la détection, et sous-estime donc l'occupation réelle dès que l'espèce peut être présente sans être vue. Une occupation corrigée de la détection exige des visites répétées des mêmes unités (modèles d'occupation).</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="459"/>
        <source>Density in each stratum is the total count divided by the total surveyed area, D_h = Σy/Σa (the ratio estimator, Cochran 1977, ch. 6), with the linearised variance v(D_h) = (1 − f_h)/(n_h ā_h²) · Σ(y − D_h a)²/(n_h − 1), where f_h = Σa/A_h when the finite-population correction applies and 0 otherwise. Abundance is N_h = D_h A_h; the frame's abundance is the sum over strata, its variance the sum of the strata variances, and its density N / Σ A_h (Cochran 1977, ch. 5).</source>
        <translation>La densité de chaque strate est le comptage total divisé par la surface totale inventoriée, D_h = Σy/Σa (l'estimateur par le ratio, Cochran 1977, ch. 6), avec la variance linéarisée v(D_h) = (1 − f_h)/(n_h ā_h²) · Σ(y − D_h a)²/(n_h − 1), où f_h = Σa/A_h quand la correction pour population finie s'applique et 0 sinon. L'abondance est N_h = D_h A_h ; l'abondance de la base est la somme sur les strates, sa variance la somme des variances des strates, et sa densité N / Σ A_h (Cochran 1977, ch. 5).</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="471"/>
        <source>Edges: the units were laid out by plus sampling (Gregoire &amp; Valentine 2008, ch. 10): their centres were drawn over each stratum grown by the unit's reach, and each unit counts only the animals inside its own stratum. Every animal then has the same chance of being counted, and the counts expand to the grown area A⁺_h: N_h = A⁺_h Σy/Σa (column of the expansion areas in the output).</source>
        <translation>Bords : les unités ont été disposées par échantillonnage « plus » (Gregoire &amp; Valentine 2008, ch. 10) : leurs centres ont été tirés sur chaque strate agrandie de la portée de l'unité, et chaque unité ne compte que les animaux situés dans sa propre strate. Chaque animal a alors la même chance d'être compté, et les comptages sont étendus à la surface agrandie A⁺_h : N_h = A⁺_h Σy/Σa (colonne des surfaces d'extension dans la sortie).</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="481"/>
        <source>Edges: the units were kept wholly inside their strata, so no unit reaches the band within a unit&apos;s reach of the edge; the estimate carries the inner density over that band. Where the animals near the edge differ (a shore, a forest edge), it is biased; plus sampling (INSIDE off) is not.</source>
        <translation>Bords : les unités ont été gardées entièrement dans leurs strates, si bien qu'aucune unité n'atteint la bande située à moins d'une portée d'unité du bord ; l'estimation reporte la densité intérieure sur cette bande. Là où les animaux proches du bord diffèrent (une rive, une lisière de forêt), elle est biaisée ; l'échantillonnage « plus » (INSIDE désactivé) ne l'est pas.</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="494"/>
        <source>Detection: estimates are divided by p = {p:g}, and the squared CVs of the count estimate and of p (SE {se:g}, CV {cv:.3f}) add (delta method, Seber 1982). The degrees of freedom of the two parts combine by Satterthwaite's rule, df = CV⁴ / (CV_n⁴/df_n + CV_p⁴/df_p) (Buckland et al. 2001, eq. 3.75), with df_p = {df} for p.</source>
        <translation>Détection : les estimations sont divisées par p = {p:g}, et les CV au carré de l'estimation des comptages et de p (erreur type {se:g}, CV {cv:.3f}) s'additionnent (méthode delta, Seber 1982). Les degrés de liberté des deux parts se combinent selon la règle de Satterthwaite, df = CV⁴ / (CV_n⁴/df_n + CV_p⁴/df_p) (Buckland et al. 2001, éq. 3.75), avec df_p = {df} pour p.</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="506"/>
        <source>Next survey: n_next is the number of units each stratum needs for a CV of {cv:g} of the overall abundance, by Neyman allocation n_h ∝ M_h S_h on the standard deviations the variance estimator implies now (Neyman 1934; Cochran 1977, eq. 5.26), at least 2 and at most the units a stratum holds. The observed SDs are themselves uncertain, especially from few units.</source>
        <translation>Prochain inventaire : n_next est le nombre d'unités dont chaque strate a besoin pour un CV de {cv:g} de l'abondance globale, par allocation de Neyman n_h ∝ M_h S_h sur les écarts-types qu'implique maintenant l'estimateur de variance (Neyman 1934 ; Cochran 1977, éq. 5.26), au moins 2 et au plus les unités que contient une strate. Les écarts-types observés sont eux-mêmes incertains, surtout avec peu d'unités.</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="518"/>
        <source>Intervals use Student's t with Satterthwaite's effective degrees of freedom, ν = (Σ v_h)² / Σ (v_h² / ν_h) (Satterthwaite 1946; Cochran 1977, ch. 5). Lower limits below 0 are shown as 0.</source>
        <translation>Les intervalles utilisent le t de Student avec les degrés de liberté effectifs de Satterthwaite, ν = (Σ v_h)² / Σ (v_h² / ν_h) (Satterthwaite 1946 ; Cochran 1977, ch. 5). Les limites inférieures sous 0 sont affichées comme 0.</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="518"/>
        <source>Intervals are log-normal: N/C to N·C with C = exp(t_df · √ln(1 + CV²)), t with the estimate's Satterthwaite degrees of freedom (Buckland et al. 2001, §3.6.1; the normal quantile only for infinite df, Burnham et al. 1987). They are asymmetric and never go below 0.</source>
        <translation>Les intervalles sont log-normaux : de N/C à N·C avec C = exp(t_df · √ln(1 + CV²)), t avec les degrés de liberté de Satterthwaite de l'estimation (Buckland et al. 2001, §3.6.1 ; le quantile normal seulement pour des ddl infinis, Burnham et al. 1987). Ils sont asymétriques et ne descendent jamais sous 0.</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="518"/>
        <source>Intervals are rescaled stratified percentile bootstrap intervals, from {b:,} resamples drawn from the recorded seed: in each stratum n − 1 units are drawn with replacement and their density is moved towards the stratum's estimate by the factor √(1 − f), so that the resamples vary as much as the stratified variance says, with the finite-population correction where it applies (Rao &amp; Wu 1988; Efron &amp; Tibshirani 1993).</source>
        <translation>Les intervalles sont des intervalles bootstrap stratifiés des percentiles, remis à l'échelle, issus de {b:,} rééchantillonnages tirés à partir de la graine enregistrée : dans chaque strate, n − 1 unités sont tirées avec remise et leur densité est rapprochée de l'estimation de la strate par le facteur √(1 − f), de sorte que les rééchantillonnages varient autant que l'indique la variance stratifiée, avec la correction pour population finie là où elle s'applique (Rao &amp; Wu 1988 ; Efron &amp; Tibshirani 1993).</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="548"/>
        <source>Variances use the local neighbourhood estimator of Stevens &amp; Olsen (2003): each unit and its three nearest units in the stratum form a neighbourhood with weights that sum to 1 over each neighbourhood and over each unit, and v = Σ_i Σ_j w_ij (z_j − z̄_i)². Its degrees of freedom are those of a quadratic form, (tr Q)² / tr Q² (Box 1954), and the bootstrap spreads its resamples to the same variance. For a simple random layout use the simple formula.</source>
        <translation>Les variances utilisent l'estimateur de voisinage local de Stevens &amp; Olsen (2003) : chaque unité et ses trois plus proches voisines dans la strate forment un voisinage, avec des poids dont la somme vaut 1 sur chaque voisinage et sur chaque unité, et v = Σ_i Σ_j w_ij (z_j − z̄_i)². Ses degrés de liberté sont ceux d'une forme quadratique, (tr Q)² / tr Q² (Box 1954), et le bootstrap disperse ses rééchantillonnages jusqu'à la même variance. Pour une disposition aléatoire simple, utilisez la formule simple.</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="559"/>
        <source>Our variant: the double sum is multiplied by n / Σ_i (1 − Σ_j w_ij²), so that it agrees on average with the simple formula where the population has no spatial pattern; the published sum falls about a quarter short there. This scaling is ours, not Stevens &amp; Olsen's.</source>
        <translation>Notre variante : la double somme est multipliée par n / Σ_i (1 − Σ_j w_ij²), pour qu'elle concorde en moyenne avec la formule simple là où la population n'a pas de structure spatiale ; la somme publiée y est inférieure d'environ un quart. Cette mise à l'échelle est la nôtre, pas celle de Stevens &amp; Olsen.</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="568"/>
        <source>Strata with one surveyed unit were paired with a partner fixed before the counts were seen (the stratum sharing the longest edge on the map, or else the next stratum in id order). Two one-unit strata share the pairs formula v = 4 (A_2 Ŷ_1 − A_1 Ŷ_2)² / (A_1 + A_2)² (Cochran 1977, §5A.12, with the weights of Hansen, Hurwitz &amp; Madow 1953); a one-unit stratum paired with a stratum of several units takes (D̂_1 − D̂_2)² − v(D̂_2), at least the variance one unit has with the partner's spread, while the partner keeps its own variance. Differences between the paired strata count as variance, so these standard errors tend to be too large; each such stratum has 1 degree of freedom.</source>
        <translation>Les strates avec une seule unité inventoriée ont été associées à une partenaire fixée avant que les comptages ne soient vus (la strate qui partage la plus longue limite sur la carte, ou à défaut la strate suivante dans l'ordre des identifiants). Deux strates d'une seule unité partagent la formule des paires v = 4 (A_2 Ŷ_1 − A_1 Ŷ_2)² / (A_1 + A_2)² (Cochran 1977, §5A.12, avec les poids de Hansen, Hurwitz &amp; Madow 1953) ; une strate d'une seule unité associée à une strate de plusieurs unités prend (D̂_1 − D̂_2)² − v(D̂_2), au moins la variance qu'a une unité avec la dispersion de la partenaire, tandis que la partenaire garde sa propre variance. Les différences entre strates associées comptent comme variance, si bien que ces erreurs types tendent à être trop grandes ; chacune de ces strates a 1 degré de liberté.</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="585"/>
        <source>The finite-population correction was refused in strata {ids}: their units come from a simple random layout whose units may overlap, a continuous population of possible units, which has no such correction (Cordy 1993).</source>
        <translation>La correction pour population finie a été refusée dans les strates {ids} : leurs unités viennent d'une disposition aléatoire simple dont les unités peuvent se chevaucher, une population continue d'unités possibles, qui n'a pas de telle correction (Cordy 1993).</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="594"/>
        <source>The finite-population correction assumes that the units do not overlap and were drawn without replacement from the units that tile each stratum. The units carry no design record (they did not come from plotwise:layout), so this could not be checked: if they may overlap, switch the correction off.</source>
        <translation>La correction pour population finie suppose que les unités ne se chevauchent pas et ont été tirées sans remise parmi les unités qui pavent chaque strate. Les unités ne portent aucun enregistrement de plan (elles ne viennent pas de plotwise:layout), si bien que cela n'a pas pu être vérifié : si elles peuvent se chevaucher, désactivez la correction.</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="607"/>
        <source>The inference covers the sampling frame only: the strata polygons given here. It says nothing about land outside them (excluded areas, inaccessible ground, neighbouring land).</source>
        <translation>L'inférence ne couvre que la base de sondage : les polygones de strates donnés ici. Elle ne dit rien des terrains en dehors (zones exclues, terrains inaccessibles, terres voisines).</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="615"/>
        <source>Presence data: a non-detection is not an absence. Naive occupancy needs repeat visits before it can be corrected for detection.</source>
        <translation>Données de présence : une non-détection n'est pas une absence. L'occupation naïve exige des visites répétées pour pouvoir être corrigée de la détection.</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="623"/>
        <source>Detection: p must come from a separate study (double observers, marked animals, distance sampling) of the same species, season, habitat and observers. If the detection in this survey differs, the estimate is biased by the same factor, and no interval here shows it.</source>
        <translation>Détection : p doit provenir d'une étude distincte (double observateur, animaux marqués, échantillonnage par distance) de la même espèce, à la même saison, dans le même habitat et avec les mêmes observateurs. Si la détection de cet inventaire diffère, l'estimation est biaisée du même facteur, et aucun intervalle ici ne le montre.</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="632"/>
        <source>Detection: with p = 1 the estimate assumes every animal in a surveyed unit was counted. Animals missed make it too low, and the interval does not show that bias.</source>
        <translation>Détection : avec p = 1, l'estimation suppose que chaque animal d'une unité inventoriée a été compté. Les animaux manqués la rendent trop basse, et l'intervalle ne montre pas ce biais.</translation>
    </message>
    <message>
        <location filename="../processing/report/estimate.py" line="639"/>
        <source>The design the units came from: the formulas assume the units were placed at random within each stratum with equal chances (simple random, systematic grid or spatially balanced layout), that unsurveyed units are missing by chance, and that reserve units replaced primaries in draw order. Units chosen for convenience (near roads or camps) or skipped because of what was expected there bias the estimate in ways no standard error shows.</source>
        <translation>Le plan dont viennent les unités : les formules supposent que les unités ont été placées au hasard dans chaque strate avec des chances égales (disposition aléatoire simple, en grille systématique ou spatialement équilibrée), que les unités non inventoriées manquent par hasard, et que les unités de réserve ont remplacé les principales dans l'ordre de tirage. Des unités choisies par commodité (près des routes ou des camps) ou sautées à cause de ce qu'on s'attendait à y trouver biaisent l'estimation d'une façon qu'aucune erreur type ne montre.</translation>
    </message>
    <message>
        <location filename="../processing/report/panels.py" line="25"/>
        <source>every year</source>
        <translation>chaque année</translation>
    </message>
    <message>
        <location filename="../processing/report/panels.py" line="25"/>
        <source>rotating panels</source>
        <translation>panels rotatifs</translation>
    </message>
    <message>
        <location filename="../processing/report/panels.py" line="25"/>
        <source>split panels</source>
        <translation>panels partagés</translation>
    </message>
    <message>
        <location filename="../processing/report/panels.py" line="41"/>
        <source>Panel</source>
        <translation>Panel</translation>
    </message>
    <message>
        <location filename="../processing/report/panels.py" line="30"/>
        <source>Visited in</source>
        <translation>Années de visite</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="29"/>
        <source>Year</source>
        <translation>Année</translation>
    </message>
    <message>
        <location filename="../processing/report/panels.py" line="35"/>
        <source>Panels visited</source>
        <translation>Panels visités</translation>
    </message>
    <message>
        <location filename="../processing/report/panels.py" line="35"/>
        <source>Field days</source>
        <translation>Jours de terrain</translation>
    </message>
    <message>
        <location filename="../processing/report/panels.py" line="41"/>
        <source>Spread measure</source>
        <translation>Mesure de répartition</translation>
    </message>
    <message>
        <location filename="../processing/report/panels.py" line="41"/>
        <source>Random panels of the same make-up</source>
        <translation>Panels aléatoires de même composition</translation>
    </message>
    <message>
        <location filename="../processing/report/panels.py" line="70"/>
        <source>every year (all units)</source>
        <translation>chaque année (toutes les unités)</translation>
    </message>
    <message>
        <location filename="../processing/report/panels.py" line="72"/>
        <source>core (every year)</source>
        <translation>noyau (chaque année)</translation>
    </message>
    <message>
        <location filename="../processing/report/panels.py" line="73"/>
        <source>panel {p}</source>
        <translation>panel {p}</translation>
    </message>
    <message>
        <location filename="../processing/report/panels.py" line="83"/>
        <source>design</source>
        <translation>plan</translation>
    </message>
    <message>
        <location filename="../processing/report/panels.py" line="83"/>
        <source>units in panels</source>
        <translation>unités dans les panels</translation>
    </message>
    <message>
        <location filename="../processing/report/panels.py" line="128"/>
        <source>units per year</source>
        <translation>unités par an</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="118"/>
        <source>years</source>
        <translation>années</translation>
    </message>
    <message>
        <location filename="../processing/report/panels.py" line="102"/>
        <source>none: the order of the features</source>
        <translation>aucun : l'ordre des entités</translation>
    </message>
    <message>
        <location filename="../processing/report/panels.py" line="105"/>
        <source>Units layer</source>
        <translation>Couche des unités</translation>
    </message>
    <message>
        <location filename="../processing/report/panels.py" line="106"/>
        <source>Panel design (PANEL_DESIGN)</source>
        <translation>Plan de panels (PANEL_DESIGN)</translation>
    </message>
    <message>
        <location filename="../processing/report/panels.py" line="107"/>
        <source>Rotating panels (PANELS)</source>
        <translation>Panels rotatifs (PANELS)</translation>
    </message>
    <message>
        <location filename="../processing/report/panels.py" line="108"/>
        <source>Share of units in the core (CORE_SHARE)</source>
        <translation>Part des unités dans le noyau (CORE_SHARE)</translation>
    </message>
    <message>
        <location filename="../processing/report/panels.py" line="110"/>
        <source>First year (START_YEAR)</source>
        <translation>Première année (START_YEAR)</translation>
    </message>
    <message>
        <location filename="../processing/report/trendpower.py" line="95"/>
        <source>Years (YEARS)</source>
        <translation>Années (YEARS)</translation>
    </message>
    <message>
        <location filename="../processing/report/panels.py" line="112"/>
        <source>Draw-order field</source>
        <translation>Champ d'ordre de tirage</translation>
    </message>
    <message>
        <location filename="../processing/report/panels.py" line="114"/>
        <source>Field days per unit visit</source>
        <translation>Jours de terrain par visite d'unité</translation>
    </message>
    <message>
        <location filename="../processing/report/panels.py" line="115"/>
        <source>Reserve units (no panel)</source>
        <translation>Unités de réserve (sans panel)</translation>
    </message>
    <message>
        <location filename="../processing/report/panels.py" line="116"/>
        <source>Seed (balance check only)</source>
        <translation>Graine (contrôle de l'équilibre seulement)</translation>
    </message>
    <message>
        <location filename="../processing/report/panels.py" line="127"/>
        <source>Schedule</source>
        <translation>Calendrier</translation>
    </message>
    <message>
        <location filename="../processing/report/panels.py" line="130"/>
        <source>Years in which each panel is visited, with its number of units; the last row adds them up.</source>
        <translation>Années de visite de chaque panel, avec son nombre d'unités ; la dernière ligne en fait la somme.</translation>
    </message>
    <message>
        <location filename="../processing/report/panels.py" line="143"/>
        <source>Units of each stratum in each panel.</source>
        <translation>Unités de chaque strate dans chaque panel.</translation>
    </message>
    <message>
        <location filename="../processing/report/panels.py" line="148"/>
        <source>Spread of the panels</source>
        <translation>Répartition des panels</translation>
    </message>
    <message>
        <location filename="../processing/report/panels.py" line="150"/>
        <source>The layout records a spatially balanced design (the units&apos; design field).</source>
        <translation>La disposition enregistre un plan spatialement équilibré (champ design des unités).</translation>
    </message>
    <message>
        <location filename="../processing/report/panels.py" line="153"/>
        <source>The layout records a simple random design (the units&apos; design field): each panel is a random part of it, not an evenly spread sample of the frame.</source>
        <translation>La disposition enregistre un plan aléatoire simple (champ design des unités) : chaque panel en est une partie aléatoire, non un échantillon uniformément réparti de la base de sondage.</translation>
    </message>
    <message>
        <location filename="../processing/report/panels.py" line="158"/>
        <source>The layout records a systematic grid (the units&apos; design field): its draw order runs row by row, so the panels are bands across the frame.</source>
        <translation>La disposition enregistre une grille systématique (champ design des unités) : son ordre de tirage va ligne par ligne, si bien que les panels sont des bandes à travers la base de sondage.</translation>
    </message>
    <message>
        <location filename="../processing/report/panels.py" line="163"/>
        <source>The units carry no design record (the design field of plotwise:layout): the check below tells whether the panels are evenly spread.</source>
        <translation>Les unités ne portent aucun enregistrement du plan (le champ design de plotwise:layout) : le contrôle ci-dessous indique si les panels sont uniformément répartis.</translation>
    </message>
    <message>
        <location filename="../processing/report/panels.py" line="168"/>
        <source>No panel could be checked: the units need at least 3 positions not on one line, and a panel at least 2 units.</source>
        <translation>Aucun panel n'a pu être contrôlé : il faut aux unités au moins 3 positions non alignées, et à un panel au moins 2 unités.</translation>
    </message>
    <message>
        <location filename="../processing/report/panels.py" line="174"/>
        <source>Spread measure of Stevens &amp; Olsen (2004) over the whole layout: 0 for a perfectly even spread, larger for clumps and gaps. The random panels take the same number of units from each stratum (median over the rearrangements of the check).</source>
        <translation>Mesure de répartition de Stevens &amp; Olsen (2004) sur l'ensemble de la disposition : 0 pour une répartition parfaitement uniforme, plus grande en cas d'agrégats et de lacunes. Les panels aléatoires prennent le même nombre d'unités dans chaque strate (médiane sur les réarrangements du contrôle).</translation>
    </message>
    <message>
        <location filename="../processing/report/panels.py" line="180"/>
        <source>The panels are more evenly spread than random parts of the layout (their spread measure is {r:.0%} of that of random panels), though with this few units the check cannot confirm it (p = {p:.3f} from {b} random rearrangements).</source>
        <translation>Les panels sont répartis plus uniformément que des parties aléatoires de la disposition (leur mesure de répartition vaut {r:.0%} de celle des panels aléatoires), mais avec si peu d'unités le contrôle ne peut pas le confirmer (p = {p:.3f} sur {b} réarrangements aléatoires).</translation>
    </message>
    <message>
        <location filename="../processing/report/panels.py" line="186"/>
        <source>The panels are more evenly spread than random parts of the layout (p = {p:.3f} from {b} random rearrangements): as expected when the layout is spatially balanced and the panels follow its draw order.</source>
        <translation>Les panels sont répartis plus uniformément que des parties aléatoires de la disposition (p = {p:.3f} sur {b} réarrangements aléatoires) : c'est ce qu'on attend quand la disposition est spatialement équilibrée et que les panels suivent son ordre de tirage.</translation>
    </message>
    <message>
        <location filename="../processing/report/panels.py" line="192"/>
        <source>The panels are not shown to be more evenly spread than random parts of the layout (p = {p:.3f} from {b} random rearrangements). If the layout was simple random, each panel is just a random part of it; if it was a systematic grid, whose draw order runs row by row, the panels are bands. For evenly spread panels, lay out the units with the spatially balanced design. With few units the check may also miss a real balance.</source>
        <translation>Rien ne montre que les panels soient répartis plus uniformément que des parties aléatoires de la disposition (p = {p:.3f} sur {b} réarrangements aléatoires). Si la disposition était aléatoire simple, chaque panel n'en est qu'une partie aléatoire ; si c'était une grille systématique, dont l'ordre de tirage va ligne par ligne, les panels sont des bandes. Pour des panels uniformément répartis, disposez les unités avec le plan spatialement équilibré. Avec peu d'unités, le contrôle peut aussi manquer un équilibre réel.</translation>
    </message>
    <message>
        <location filename="../processing/report/panels.py" line="203"/>
        <source>Within each stratum the primary units are taken in draw order and cut into consecutive blocks: the core (split panels) first, then panel 1, panel 2 and so on, as evenly as possible. Rotating panel p is visited in the years start + (p − 1) + m·K, so that each of its units is revisited every K years and about 1/K of the rotating units are surveyed each year; the core, and the single panel of the every-year design, are visited every year (Urquhart &amp; Kincaid 1999; McDonald 2003).</source>
        <translation>Au sein de chaque strate, les unités principales sont prises dans l'ordre de tirage et découpées en blocs consécutifs : le noyau (panels partagés) d'abord, puis le panel 1, le panel 2 et ainsi de suite, aussi égaux que possible. Le panel rotatif p est visité les années début + (p − 1) + m·K, si bien que chacune de ses unités est revisitée tous les K ans et qu'environ 1/K des unités des panels rotatifs sont inventoriées chaque année ; le noyau, et le panel unique du plan « chaque année », sont visités chaque année (Urquhart &amp; Kincaid 1999 ; McDonald 2003).</translation>
    </message>
    <message>
        <location filename="../processing/report/panels.py" line="210"/>
        <source>In a spatially balanced layout every run of consecutive units of the draw order is itself spread over the stratum (Robertson et al. 2013), so each panel covers the whole stratum. The check compares the Voronoi spread measure of the panels (Stevens &amp; Olsen 2004), computed over a fine grid on the convex hull of the units, with random rearrangements of the panels within each stratum.</source>
        <translation>Dans une disposition spatialement équilibrée, toute suite d'unités consécutives de l'ordre de tirage est elle-même répartie sur la strate (Robertson et al. 2013), si bien que chaque panel couvre toute la strate. Le contrôle compare la mesure de répartition de Voronoï des panels (Stevens &amp; Olsen 2004), calculée sur une grille fine couvrant l'enveloppe convexe des unités, à des réarrangements aléatoires des panels au sein de chaque strate.</translation>
    </message>
    <message>
        <location filename="../processing/report/panels.py" line="216"/>
        <source>Reserve units get no panel. A reserve that replaces a primary unit takes over the primary&apos;s panel and years; record the replacement.</source>
        <translation>Les unités de réserve ne reçoivent aucun panel. Une réserve qui remplace une unité principale reprend le panel et les années de celle-ci ; notez le remplacement.</translation>
    </message>
    <message>
        <location filename="../processing/report/panels.py" line="220"/>
        <source>Revisiting the same units every year gives the most precise trend for the effort; rotating panels cover more ground over a cycle but link the years only through the units they share. The split design keeps a core for the year-to-year links. Compare the options with the power analysis (plotwise:trendpower) before committing to a schedule.</source>
        <translation>Revisiter les mêmes unités chaque année donne la tendance la plus précise pour l'effort consenti ; les panels rotatifs couvrent davantage de terrain sur un cycle mais ne relient les années que par les unités qu'ils ont en commun. Le plan à panels partagés garde un noyau pour relier les années entre elles. Comparez les options avec l'analyse de puissance (plotwise:trendpower) avant de vous engager sur un calendrier.</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="29"/>
        <source>Index</source>
        <translation>Indice</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="29"/>
        <source>Trend</source>
        <translation>Tendance</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="29"/>
        <source>Trend, lower</source>
        <translation>Tendance, limite inférieure</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="29"/>
        <source>Trend, upper</source>
        <translation>Tendance, limite supérieure</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="38"/>
        <source>Change per year (%)</source>
        <translation>Variation annuelle (%)</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="38"/>
        <source>p-value</source>
        <translation>Valeur p</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="46"/>
        <source>Units in the records</source>
        <translation>Unités dans les enregistrements</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="46"/>
        <source>Units in the fit (some animals counted)</source>
        <translation>Unités dans l'ajustement (au moins un animal compté)</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="46"/>
        <source>Records used</source>
        <translation>Enregistrements utilisés</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="46"/>
        <source>Records without a count (not surveyed)</source>
        <translation>Enregistrements sans comptage (non inventoriés)</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="46"/>
        <source>Scale between units (Pearson)</source>
        <translation>Facteur d'échelle entre unités (Pearson)</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="46"/>
        <source>Standard error of the log change allowing only for variation between units</source>
        <translation>Erreur type de la variation logarithmique ne tenant compte que de la variation entre unités</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="46"/>
        <source>Year-to-year SD, log scale (method of moments)</source>
        <translation>Écart-type d'une année à l'autre, échelle logarithmique (méthode des moments)</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="46"/>
        <source>Scale between units within years (Pearson)</source>
        <translation>Facteur d'échelle entre unités au sein des années (Pearson)</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="46"/>
        <source>Deviance drop from the trend to one effect per year</source>
        <translation>Baisse de déviance de la tendance à un effet par année</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="46"/>
        <source>Degrees of freedom between years</source>
        <translation>Degrés de liberté entre années</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="223"/>
        <source>Standard error of the log change used</source>
        <translation>Erreur type retenue de la variation logarithmique</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="46"/>
        <source>Linked sets of units and years</source>
        <translation>Ensembles liés d'unités et d'années</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="94"/>
        <source>The change per year could not be estimated.</source>
        <translation>La variation annuelle n'a pas pu être estimée.</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="97"/>
        <source>no change (0.0% per year)</source>
        <translation>aucune variation (0.0% par an)</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="99"/>
        <source>a decline of {c} per year</source>
        <translation>une baisse de {c} par an</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="101"/>
        <source>an increase of {c} per year</source>
        <translation>une hausse de {c} par an</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="104"/>
        <source>{level} interval {a} to {b}</source>
        <translation>intervalle à {level} de {a} à {b}</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="107"/>
        <source>{level} interval from a decline of {a} to an increase of {b}</source>
        <translation>intervalle à {level} d'une baisse de {a} à une hausse de {b}</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="118"/>
        <source>change per year</source>
        <translation>variation annuelle</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="118"/>
        <source>p-value (no trend)</source>
        <translation>valeur p (absence de tendance)</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="126"/>
        <source>Over {first}–{last} the trend is {words}.</source>
        <translation>Tendance sur la période {first}–{last} : {words}.</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="143"/>
        <source>Input</source>
        <translation>Entrée</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="152"/>
        <source>Source (SOURCE)</source>
        <translation>Source (SOURCE)</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="145"/>
        <source>unit counts</source>
        <translation>comptages par unité</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="147"/>
        <source>Unit id field</source>
        <translation>Champ d'identifiant d'unité</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="149"/>
        <source>Unit area field</source>
        <translation>Champ de surface d'unité</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="149"/>
        <source>none: equal effort</source>
        <translation>aucun : effort égal</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="152"/>
        <source>yearly estimates</source>
        <translation>estimations annuelles</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="154"/>
        <source>Estimate field</source>
        <translation>Champ d'estimation</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="155"/>
        <source>Standard error field</source>
        <translation>Champ d'erreur type</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="156"/>
        <source>Year field</source>
        <translation>Champ d'année</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="159"/>
        <source>not used (no random draws)</source>
        <translation>non utilisée (aucun tirage aléatoire)</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="166"/>
        <source>Yearly index and trend</source>
        <translation>Indice annuel et tendance</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="168"/>
        <source>mean count per unit</source>
        <translation>comptage moyen par unité</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="169"/>
        <source>Index: the expected mean count per unit in each year, at the mean survey effort.</source>
        <translation>Indice : le comptage moyen attendu par unité pour chaque année, à l'effort d'inventaire moyen.</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="172"/>
        <source>estimate</source>
        <translation>estimation</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="173"/>
        <source>Index: the yearly estimate; its interval shows the sampling error only.</source>
        <translation>Indice : l'estimation annuelle ; son intervalle ne montre que l'erreur d'échantillonnage.</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="175"/>
        <source>year</source>
        <translation>année</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="175"/>
        <source>yearly index</source>
        <translation>indice annuel</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="175"/>
        <source>trend</source>
        <translation>tendance</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="180"/>
        <source>Yearly index with {level} intervals (points and bars) and the fitted trend with its {level} band.</source>
        <translation>Indice annuel avec intervalles à {level} (points et barres) et tendance ajustée avec sa bande à {level}.</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="216"/>
        <source>The fit</source>
        <translation>L'ajustement</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="202"/>
        <source>Units that counted no animal in any visit carry no information on the trend and were left out of the fit: {ids}.</source>
        <translation>Les unités où aucun animal n'a été compté lors d'aucune visite n'apportent aucune information sur la tendance et ont été écartées de l'ajustement : {ids}.</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="207"/>
        <source>Trend by stratum</source>
        <translation>Tendance par strate</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="209"/>
        <source>Each stratum&apos;s units fitted on their own; strata with too few units or years show no value.</source>
        <translation>Les unités de chaque strate sont ajustées séparément ; les strates avec trop peu d'unités ou d'années n'affichent aucune valeur.</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="218"/>
        <source>Year-to-year process SD (log scale)</source>
        <translation>Écart-type de processus d'une année à l'autre (échelle logarithmique)</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="219"/>
        <source>Weighted residual sum of squares without process variance</source>
        <translation>Somme pondérée des carrés des résidus sans variance de processus</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="220"/>
        <source>Residual mean square that scales the variance</source>
        <translation>Carré moyen résiduel qui met la variance à l'échelle</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="221"/>
        <source>Standard error of the log change with sampling error only</source>
        <translation>Erreur type de la variation logarithmique avec la seule erreur d'échantillonnage</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="224"/>
        <source>Degrees of freedom</source>
        <translation>Degrés de liberté</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="234"/>
        <source>The counts follow a log-linear Poisson model with one effect per unit and a common change per year, log E[y] = log(effort) + unit effect + β·year (McCullagh &amp; Nelder 1989). Given β the unit effects have a closed form, so β is fitted by Newton's method on the profile likelihood. The change per year is exp(β) − 1.</source>
        <translation>Les comptages suivent un modèle de Poisson log-linéaire avec un effet par unité et une variation annuelle commune, log E[y] = log(effort) + effet de l'unité + β·année (McCullagh &amp; Nelder 1989). À β donné, les effets des unités ont une forme explicite, si bien que β est ajusté par la méthode de Newton sur la vraisemblance profilée. La variation annuelle vaut exp(β) − 1.</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="240"/>
        <source>Overdispersion (quasi-likelihood): counts of one year share that year's conditions. The model with one effect per year (fitted by iterative proportional fitting; Bishop, Fienberg &amp; Holland 1975) is compared with the trend model: the deviance drop per degree of freedom scales the variance of β (McCullagh &amp; Nelder 1989), in proportion to how strongly the slope depends on single years, and β is tested with Student's t on the degrees of freedom between years. So years that differ as a whole widen the interval. The year-to-year SD is estimated from the same drop by the method of moments (DerSimonian &amp; Laird 1986, here for a log-linear model). The standard error allowing only for variation between units (the Pearson-scaled GLM) is shown for comparison. The index of each year is the year model's expected mean count per unit, with delta-method intervals from the Pearson scale within years.</source>
        <translation>Surdispersion (quasi-vraisemblance) : les comptages d'une même année partagent les conditions de cette année. Le modèle avec un effet par année (estimé par ajustement proportionnel itératif ; Bishop, Fienberg &amp; Holland 1975) est comparé au modèle de tendance : la baisse de déviance par degré de liberté met à l'échelle la variance de β (McCullagh &amp; Nelder 1989), en proportion de la force avec laquelle la pente dépend d'années isolées, et β est testé par le t de Student sur les degrés de liberté entre années. Ainsi, des années qui diffèrent dans leur ensemble élargissent l'intervalle. L'écart-type d'une année à l'autre est estimé à partir de la même baisse par la méthode des moments (DerSimonian &amp; Laird 1986, ici pour un modèle log-linéaire). L'erreur type qui ne tient compte que de la variation entre unités (le GLM mis à l'échelle de Pearson) est donnée pour comparaison. L'indice de chaque année est le comptage moyen attendu par unité du modèle par année, avec des intervalles par la méthode delta tirés du facteur d'échelle de Pearson au sein des années.</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="253"/>
        <source>The log yearly estimates are regressed on year by weighted least squares. Each year's variance is its sampling variance ln(1 + CV²) plus the year-to-year process variance τ², estimated by the method of moments (DerSimonian &amp; Laird 1986; Thompson &amp; Sharp 1999), so that a noisy year counts less and real ups and downs between years widen the interval. The variance of the slope is scaled by the weighted residual mean square and tested with t on k − 2 degrees of freedom (Hartung &amp; Knapp 2001).</source>
        <translation>Les logarithmes des estimations annuelles sont régressés sur l'année par moindres carrés pondérés. La variance de chaque année est sa variance d'échantillonnage ln(1 + CV²) plus la variance de processus d'une année à l'autre τ², estimée par la méthode des moments (DerSimonian &amp; Laird 1986 ; Thompson &amp; Sharp 1999), si bien qu'une année bruitée pèse moins et que de vraies hausses et baisses entre années élargissent l'intervalle. La variance de la pente est mise à l'échelle par le carré moyen résiduel pondéré et testée par t sur k − 2 degrés de liberté (Hartung &amp; Knapp 2001).</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="264"/>
        <source>A trend in counts is a trend in the population only if detection did not change: new observers, another season or time of day, denser vegetation or a different method change the counts without any change in the animals. Keep the field protocol the same, or measure detection each year.</source>
        <translation>Une tendance des comptages n'est une tendance de la population que si la détection n'a pas changé : de nouveaux observateurs, une autre saison ou heure de la journée, une végétation plus dense ou une méthode différente changent les comptages sans aucun changement chez les animaux. Gardez le même protocole de terrain, ou mesurez la détection chaque année.</translation>
    </message>
    <message>
        <location filename="../processing/report/trend.py" line="269"/>
        <source>The trend is the average change over these years, on a log scale. It is not a forecast, and it says nothing about units or land outside the programme&apos;s frame.</source>
        <translation>La tendance est la variation moyenne sur ces années, sur une échelle logarithmique. Ce n'est pas une prévision, et elle ne dit rien des unités ou des terrains hors de la base de sondage du programme.</translation>
    </message>
    <message>
        <location filename="../processing/report/trendpower.py" line="24"/>
        <source>Years</source>
        <translation>Années</translation>
    </message>
    <message>
        <location filename="../processing/report/trendpower.py" line="24"/>
        <source>Change (% per year)</source>
        <translation>Variation (% par an)</translation>
    </message>
    <message>
        <location filename="../processing/report/trendpower.py" line="24"/>
        <source>Power</source>
        <translation>Puissance</translation>
    </message>
    <message>
        <location filename="../processing/report/trendpower.py" line="24"/>
        <source>Monte Carlo SE</source>
        <translation>Erreur type de Monte-Carlo</translation>
    </message>
    <message>
        <location filename="../processing/report/trendpower.py" line="24"/>
        <source>Fits that failed</source>
        <translation>Ajustements échoués</translation>
    </message>
    <message>
        <location filename="../processing/report/trendpower.py" line="46"/>
        <source>{c:+g}% per year</source>
        <translation>{c:+g}% par an</translation>
    </message>
    <message>
        <location filename="../processing/report/trendpower.py" line="55"/>
        <source>power for {c} after {t} years</source>
        <translation>puissance pour {c} après {t} ans</translation>
    </message>
    <message>
        <location filename="../processing/report/trendpower.py" line="60"/>
        <source>years for 80% power ({c})</source>
        <translation>années pour une puissance de 80% ({c})</translation>
    </message>
    <message>
        <location filename="../processing/report/trendpower.py" line="60"/>
        <source>more than {t}</source>
        <translation>plus de {t}</translation>
    </message>
    <message>
        <location filename="../processing/report/trendpower.py" line="67"/>
        <source>A change of {c} is detected with 80% power after {t} years of this programme.</source>
        <translation>Une variation de {c} est détectée avec une puissance de 80% après {t} ans de ce programme.</translation>
    </message>
    <message>
        <location filename="../processing/report/trendpower.py" line="72"/>
        <source>A change of {c} is not detected with 80% power within {t} years of this programme.</source>
        <translation>Une variation de {c} n'est pas détectée avec une puissance de 80% en {t} ans de ce programme.</translation>
    </message>
    <message>
        <location filename="../processing/report/trendpower.py" line="89"/>
        <source>{design} (from {layer})</source>
        <translation>{design} (d'après {layer})</translation>
    </message>
    <message>
        <location filename="../processing/report/trendpower.py" line="91"/>
        <source>two-sided</source>
        <translation>bilatéral</translation>
    </message>
    <message>
        <location filename="../processing/report/trendpower.py" line="92"/>
        <source>one-sided, in the direction of the change</source>
        <translation>unilatéral, dans le sens de la variation</translation>
    </message>
    <message>
        <location filename="../processing/report/trendpower.py" line="94"/>
        <source>Units (N_UNITS)</source>
        <translation>Unités (N_UNITS)</translation>
    </message>
    <message>
        <location filename="../processing/report/trendpower.py" line="96"/>
        <source>Panel design</source>
        <translation>Plan de panels</translation>
    </message>
    <message>
        <location filename="../processing/report/trendpower.py" line="97"/>
        <source>Changes to detect (% per year)</source>
        <translation>Variations à détecter (% par an)</translation>
    </message>
    <message>
        <location filename="../processing/report/trendpower.py" line="99"/>
        <source>Mean animals per unit in the first year (MEAN_COUNT)</source>
        <translation>Nombre moyen d'animaux par unité la première année (MEAN_COUNT)</translation>
    </message>
    <message>
        <location filename="../processing/report/trendpower.py" line="101"/>
        <source>SD between units, log scale (SD_UNIT)</source>
        <translation>Écart-type entre unités, échelle logarithmique (SD_UNIT)</translation>
    </message>
    <message>
        <location filename="../processing/report/trendpower.py" line="102"/>
        <source>SD unit × year, log scale (SD_UNIT_YEAR)</source>
        <translation>Écart-type unité × année, échelle logarithmique (SD_UNIT_YEAR)</translation>
    </message>
    <message>
        <location filename="../processing/report/trendpower.py" line="103"/>
        <source>SD year to year, log scale (SD_YEAR)</source>
        <translation>Écart-type d'une année à l'autre, échelle logarithmique (SD_YEAR)</translation>
    </message>
    <message>
        <location filename="../processing/report/trendpower.py" line="104"/>
        <source>Mean count and SD between units from</source>
        <translation>Comptage moyen et écart-type entre unités tirés de</translation>
    </message>
    <message>
        <location filename="../processing/report/trendpower.py" line="105"/>
        <source>the parameters</source>
        <translation>les paramètres</translation>
    </message>
    <message>
        <location filename="../processing/report/trendpower.py" line="106"/>
        <source>Detection probability (DETECTION)</source>
        <translation>Probabilité de détection (DETECTION)</translation>
    </message>
    <message>
        <location filename="../processing/report/trendpower.py" line="107"/>
        <source>Significance level (ALPHA)</source>
        <translation>Seuil de signification (ALPHA)</translation>
    </message>
    <message>
        <location filename="../processing/report/trendpower.py" line="108"/>
        <source>Test</source>
        <translation>Test</translation>
    </message>
    <message>
        <location filename="../processing/report/trendpower.py" line="109"/>
        <source>Replicates (REPLICATES)</source>
        <translation>Réplicats (REPLICATES)</translation>
    </message>
    <message>
        <location filename="../processing/report/trendpower.py" line="111"/>
        <source>Largest Monte Carlo standard error of a power</source>
        <translation>Plus grande erreur type de Monte-Carlo d'une puissance</translation>
    </message>
    <message>
        <location filename="../processing/report/trendpower.py" line="127"/>
        <source>80%</source>
        <translation>80%</translation>
    </message>
    <message>
        <location filename="../processing/report/trendpower.py" line="128"/>
        <source>power</source>
        <translation>puissance</translation>
    </message>
    <message>
        <location filename="../processing/report/trendpower.py" line="129"/>
        <source>Power against years</source>
        <translation>Puissance en fonction des années</translation>
    </message>
    <message>
        <location filename="../processing/report/trendpower.py" line="130"/>
        <source>years of the programme</source>
        <translation>années du programme</translation>
    </message>
    <message>
        <location filename="../processing/report/trendpower.py" line="132"/>
        <source>Power with {n} units against the number of years; bars: ±2 Monte Carlo SE.</source>
        <translation>Puissance avec {n} unités en fonction du nombre d'années ; barres : ±2 erreurs types de Monte-Carlo.</translation>
    </message>
    <message>
        <location filename="../processing/report/trendpower.py" line="136"/>
        <source>Power against units</source>
        <translation>Puissance en fonction des unités</translation>
    </message>
    <message>
        <location filename="../processing/report/trendpower.py" line="137"/>
        <source>units</source>
        <translation>unités</translation>
    </message>
    <message>
        <location filename="../processing/report/trendpower.py" line="139"/>
        <source>Power after {t} years against the number of units; bars: ±2 Monte Carlo SE.</source>
        <translation>Puissance après {t} ans en fonction du nombre d'unités ; barres : ±2 erreurs types de Monte-Carlo.</translation>
    </message>
    <message>
        <location filename="../processing/report/trendpower.py" line="154"/>
        <source>Each of the {r:,} replicates simulates the counts of every unit in every year it is visited: count ~ Poisson(p·λ), log λ = log(mean) + β·t + unit effect + year effect + unit × year effect, with normal effects of the SDs given (on the log scale) and β = ln(1 + change/100). The replicate's trend is estimated with the same log-linear Poisson model with unit effects and quasi-likelihood scale between years as plotwise:trend, and the change counts as detected when its t test rejects at level {a:g}. Power is the share of replicates with a detection; its Monte Carlo SE is √(P(1 − P)/R) (Gerrodette 1987 for the setting).</source>
        <translation>Chacun des {r:,} réplicats simule les comptages de chaque unité pour chaque année où elle est visitée : comptage ~ Poisson(p·λ), log λ = log(moyenne) + β·t + effet de l'unité + effet de l'année + effet unité × année, avec des effets normaux d'écarts-types donnés (sur l'échelle logarithmique) et β = ln(1 + variation/100). La tendance du réplicat est estimée avec le même modèle de Poisson log-linéaire à effets d'unité et facteur d'échelle de quasi-vraisemblance entre années que plotwise:trend, et la variation compte comme détectée quand son test t rejette l'absence de tendance au seuil {a:g}. La puissance est la part des réplicats avec une détection ; son erreur type de Monte-Carlo vaut √(P(1 − P)/R) (Gerrodette 1987 pour le cadre).</translation>
    </message>
    <message>
        <location filename="../processing/report/trendpower.py" line="163"/>
        <source>Shorter programmes are the first years of the same simulated programmes; programmes with other numbers of units are the first units of larger simulated programmes, assigned to panels anew. Power for a programme of fewer years is shown only from the first length that leaves a degree of freedom for year-to-year variation.</source>
        <translation>Les programmes plus courts sont les premières années des mêmes programmes simulés ; les programmes avec d'autres nombres d'unités sont les premières unités de programmes simulés plus grands, réaffectées à des panels. La puissance d'un programme de moins d'années n'est indiquée qu'à partir de la première durée qui laisse un degré de liberté pour la variation d'une année à l'autre.</translation>
    </message>
    <message>
        <location filename="../processing/report/trendpower.py" line="169"/>
        <source>A one-season pilot gives the mean count and the spread between units (the estimate step's mean_c and sd_c): with a Poisson–log-normal count, SD_UNIT² = ln(1 + (s² − m)/m²) − SD_UNIT_YEAR². The unit × year and year-to-year SDs need several years of counts.</source>
        <translation>Un pilote d'une saison donne le comptage moyen et la dispersion entre unités (mean_c et sd_c de l'étape d'estimation) : avec un comptage Poisson–log-normal, SD_UNIT² = ln(1 + (s² − m)/m²) − SD_UNIT_YEAR². Les écarts-types unité × année et d'une année à l'autre exigent plusieurs années de comptages.</translation>
    </message>
    <message>
        <location filename="../processing/report/trendpower.py" line="178"/>
        <source>Power depends on the variance components assumed: the spread between units, the unit × year noise and above all the year-to-year variation shared by all units. Larger values than those entered give less power. The defaults are illustrative, not measured: use values from a pilot or from earlier years of the programme, and try a range.</source>
        <translation>La puissance dépend des composantes de la variance supposées : la dispersion entre unités, le bruit unité × année et surtout la variation d'une année à l'autre commune à toutes les unités. Des valeurs plus grandes que celles saisies donnent moins de puissance. Les valeurs par défaut sont illustratives, non mesurées : utilisez des valeurs tirées d'un pilote ou des années précédentes du programme, et essayez une gamme de valeurs.</translation>
    </message>
    <message>
        <location filename="../processing/report/trendpower.py" line="184"/>
        <source>The simulation assumes a steady change in % per year, constant detection, and that every planned visit happens. Missed visits, a change in detection or a trend that is not steady reduce the power.</source>
        <translation>La simulation suppose une variation régulière en % par an, une détection constante et que chaque visite prévue a lieu. Des visites manquées, un changement de la détection ou une tendance irrégulière réduisent la puissance.</translation>
    </message>
    <message>
        <location filename="../processing/report/buildframe.py" line="41"/>
        <source>study area (ha)</source>
        <translation>zone d'étude (ha)</translation>
    </message>
    <message>
        <location filename="../processing/report/buildframe.py" line="41"/>
        <source>frame (ha)</source>
        <translation>base de sondage (ha)</translation>
    </message>
    <message>
        <location filename="../processing/report/buildframe.py" line="41"/>
        <source>kept</source>
        <translation>conservé</translation>
    </message>
    <message>
        <location filename="../processing/report/buildframe.py" line="46"/>
        <source>Estimates from a survey on this frame apply to the frame ({ha} ha) only, not to the whole study area.</source>
        <translation>Les estimations d'un inventaire sur cette base ne valent que pour la base ({ha} ha), pas pour toute la zone d'étude.</translation>
    </message>
    <message>
        <location filename="../processing/report/buildframe.py" line="54"/>
        <source>Frame (filled), with the areas lost to each rule</source>
        <translation>Base de sondage (remplie), avec les surfaces perdues par chaque règle</translation>
    </message>
    <message>
        <location filename="../processing/report/buildframe.py" line="61"/>
        <source>Area kept and area lost to each rule</source>
        <translation>Surface conservée et surface perdue par chaque règle</translation>
    </message>
    <message>
        <location filename="../processing/report/buildframe.py" line="63"/>
        <source>lost to the excluded polygons (EXCLUDE)</source>
        <translation>perdue par les polygones exclus (EXCLUDE)</translation>
    </message>
    <message>
        <location filename="../processing/report/buildframe.py" line="64"/>
        <source>lost to the raster mask (MASK outside the accepted range, or NoData)</source>
        <translation>perdue par le masque raster (MASK hors de l'intervalle accepté, ou NoData)</translation>
    </message>
    <message>
        <location filename="../processing/report/buildframe.py" line="66"/>
        <source>lost to the inward edge buffer (EDGE_BUFFER)</source>
        <translation>perdue par la zone tampon intérieure (EDGE_BUFFER)</translation>
    </message>
    <message>
        <location filename="../processing/report/buildframe.py" line="68"/>
        <source>study area</source>
        <translation>zone d'étude</translation>
    </message>
    <message>
        <location filename="../processing/report/buildframe.py" line="71"/>
        <source>sampling frame (kept)</source>
        <translation>base de sondage (conservée)</translation>
    </message>
    <message>
        <location filename="../processing/report/buildframe.py" line="73"/>
        <source>% of study area</source>
        <translation>% de la zone d'étude</translation>
    </message>
    <message>
        <location filename="../processing/report/buildframe.py" line="75"/>
        <source>Rules are applied in the order shown; each is charged only with area that was still in the frame, so the frame and the areas lost add up to the study area.</source>
        <translation>Les règles sont appliquées dans l'ordre indiqué ; chacune n'est comptée que pour la surface encore dans la base, si bien que la base et les surfaces perdues totalisent la zone d'étude.</translation>
    </message>
    <message>
        <location filename="../processing/report/buildframe.py" line="82"/>
        <source>Mask raster</source>
        <translation>Raster de masque</translation>
    </message>
    <message>
        <location filename="../processing/report/buildframe.py" line="84"/>
        <source>cells tested over the study area&apos;s extent</source>
        <translation>cellules testées sur l'emprise de la zone d'étude</translation>
    </message>
    <message>
        <location filename="../processing/report/stratify.py" line="232"/>
        <source>cell size (m)</source>
        <translation>taille de cellule (m)</translation>
    </message>
    <message>
        <location filename="../processing/report/buildframe.py" line="84"/>
        <source>cells below the lowest accepted value</source>
        <translation>cellules sous la valeur minimale acceptée</translation>
    </message>
    <message>
        <location filename="../processing/report/buildframe.py" line="84"/>
        <source>cells above the highest accepted value</source>
        <translation>cellules au-dessus de la valeur maximale acceptée</translation>
    </message>
    <message>
        <location filename="../processing/report/buildframe.py" line="84"/>
        <source>NoData cells (including cells outside the raster)</source>
        <translation>cellules NoData (y compris les cellules hors du raster)</translation>
    </message>
    <message>
        <location filename="../processing/report/buildframe.py" line="84"/>
        <source>reprojected on the fly (nearest neighbour)</source>
        <translation>reprojeté à la volée (plus proche voisin)</translation>
    </message>
    <message>
        <location filename="../processing/report/buildframe.py" line="101"/>
        <source>, projected from {src} (UTM zone of the study area&apos;s centre)</source>
        <translation>, projeté depuis {src} (zone UTM du centre de la zone d'étude)</translation>
    </message>
    <message>
        <location filename="../processing/report/buildframe.py" line="104"/>
        <source>Study area (INPUT)</source>
        <translation>Zone d'étude (INPUT)</translation>
    </message>
    <message>
        <location filename="../processing/report/buildframe.py" line="104"/>
        <source>Areas to exclude (EXCLUDE)</source>
        <translation>Zones à exclure (EXCLUDE)</translation>
    </message>
    <message>
        <location filename="../processing/report/buildframe.py" line="104"/>
        <source>Mask raster (MASK)</source>
        <translation>Raster de masque (MASK)</translation>
    </message>
    <message>
        <location filename="../processing/report/buildframe.py" line="104"/>
        <source>Lowest accepted mask value (MASK_MIN)</source>
        <translation>Valeur de masque minimale acceptée (MASK_MIN)</translation>
    </message>
    <message>
        <location filename="../processing/report/buildframe.py" line="104"/>
        <source>Highest accepted mask value (MASK_MAX)</source>
        <translation>Valeur de masque maximale acceptée (MASK_MAX)</translation>
    </message>
    <message>
        <location filename="../processing/report/buildframe.py" line="104"/>
        <source>Inward edge buffer (EDGE_BUFFER, m)</source>
        <translation>Zone tampon intérieure (EDGE_BUFFER, m)</translation>
    </message>
    <message>
        <location filename="../processing/report/buildframe.py" line="147"/>
        <source>sampling frame</source>
        <translation>base de sondage</translation>
    </message>
    <message>
        <location filename="../processing/report/buildframe.py" line="151"/>
        <source>excluded polygons</source>
        <translation>polygones exclus</translation>
    </message>
    <message>
        <location filename="../processing/report/buildframe.py" line="155"/>
        <source>raster mask</source>
        <translation>masque raster</translation>
    </message>
    <message>
        <location filename="../processing/report/buildframe.py" line="157"/>
        <source>study area boundary</source>
        <translation>limite de la zone d'étude</translation>
    </message>
    <message>
        <location filename="../processing/report/demoreserve.py" line="22"/>
        <source>Demo reserve: {name}</source>
        <translation>Réserve de démonstration : {name}</translation>
    </message>
    <message>
        <location filename="../processing/report/demoreserve.py" line="23"/>
        <source>Invented data for demonstrations, training and tests. {name} and the velmar ({desc}) do not exist.</source>
        <translation>Données inventées pour les démonstrations, la formation et les tests. {name} et le velmar ({desc}) n'existent pas.</translation>
    </message>
    <message>
        <location filename="../processing/report/demoreserve.py" line="28"/>
        <source>reserve area</source>
        <translation>surface de la réserve</translation>
    </message>
    <message>
        <location filename="../processing/report/demoreserve.py" line="28"/>
        <source>true number of velmar</source>
        <translation>nombre réel de velmar</translation>
    </message>
    <message>
        <location filename="../processing/report/demoreserve.py" line="28"/>
        <source>expected number</source>
        <translation>nombre attendu</translation>
    </message>
    <message>
        <location filename="../processing/report/demoreserve.py" line="28"/>
        <source>groups</source>
        <translation>groupes</translation>
    </message>
    <message>
        <location filename="../processing/report/demoreserve.py" line="35"/>
        <source>Raster cell size (m)</source>
        <translation>Taille de cellule raster (m)</translation>
    </message>
    <message>
        <location filename="../processing/report/demoreserve.py" line="35"/>
        <source>Mean group size (mu)</source>
        <translation>Taille moyenne des groupes (mu)</translation>
    </message>
    <message>
        <location filename="../processing/report/demoreserve.py" line="35"/>
        <source>Group spread, SD of members around the centre (m)</source>
        <translation>Dispersion des groupes, écart-type des membres autour du centre (m)</translation>
    </message>
    <message>
        <location filename="../processing/report/demoreserve.py" line="42"/>
        <source>Areas</source>
        <translation>Zones</translation>
    </message>
    <message>
        <location filename="../processing/report/demoreserve.py" line="43"/>
        <source>Part</source>
        <translation>Partie</translation>
    </message>
    <message>
        <location filename="../processing/report/demoreserve.py" line="43"/>
        <source>Lake (excluded)</source>
        <translation>Lac (exclu)</translation>
    </message>
    <message>
        <location filename="../processing/report/demoreserve.py" line="43"/>
        <source>Private inholding (excluded)</source>
        <translation>Enclave privée (exclue)</translation>
    </message>
    <message>
        <location filename="../processing/report/demoreserve.py" line="50"/>
        <source>Hollin Ridge Reserve, the excluded areas and the simulated animals.</source>
        <translation>Hollin Ridge Reserve, les zones exclues et les animaux simulés.</translation>
    </message>
    <message>
        <location filename="../processing/report/demoreserve.py" line="52"/>
        <source>How the population was simulated</source>
        <translation>Comment la population a été simulée</translation>
    </message>
    <message>
        <location filename="../processing/report/demoreserve.py" line="53"/>
        <source>Group centres form an inhomogeneous Poisson process on the habitat (the reserve without the lake); their intensity is proportional to exp(0.9 × standardised greenness − 0.6 × standardised elevation). Each group has a Poisson number of members (mean {mu:g}) spread around its centre with a normal displacement of {sigma:g} m; members that fall off the habitat are not part of the population. This is a Thomas cluster process. Its expected total and variance are computed from the intensity surface on the raster grid.</source>
        <translation>Les centres de groupe forment un processus de Poisson inhomogène sur l'habitat (la réserve sans le lac) ; leur intensité est proportionnelle à exp(0,9 × verdure standardisée − 0,6 × altitude standardisée). Chaque groupe a un nombre de membres suivant une loi de Poisson (moyenne {mu:g}), dispersés autour de son centre avec un déplacement normal de {sigma:g} m ; les membres qui tombent hors de l'habitat ne font pas partie de la population. C'est un processus d'agrégats de Thomas. Son total attendu et sa variance sont calculés à partir de la surface d'intensité sur la grille du raster.</translation>
    </message>
    <message>
        <location filename="../processing/report/demoreserve.py" line="70"/>
        <source>Lake</source>
        <translation>Lac</translation>
    </message>
    <message>
        <location filename="../processing/report/demoreserve.py" line="70"/>
        <source>Private inholding</source>
        <translation>Enclave privée</translation>
    </message>
    <message>
        <location filename="../processing/report/demoreserve.py" line="70"/>
        <source>Velmar (every third animal)</source>
        <translation>Velmar (un animal sur trois)</translation>
    </message>
    <message>
        <location filename="../processing/report/html.py" line="76"/>
        <source>, projected from {src} (UTM zone of the frame&apos;s centre)</source>
        <translation>, projeté depuis {src} (zone UTM du centre de la base de sondage)</translation>
    </message>
    <message>
        <location filename="../processing/report/layout.py" line="62"/>
        <source>Sample-unit layout</source>
        <translation>Disposition des unités d'échantillonnage</translation>
    </message>
    <message>
        <location filename="../processing/report/layout.py" line="212"/>
        <source>primary units</source>
        <translation>unités principales</translation>
    </message>
    <message>
        <location filename="../processing/report/layout.py" line="212"/>
        <source>reserve units</source>
        <translation>unités de réserve</translation>
    </message>
    <message>
        <location filename="../processing/report/stratify.py" line="76"/>
        <source>strata</source>
        <translation>strates</translation>
    </message>
    <message>
        <location filename="../processing/report/layout.py" line="72"/>
        <source>Replacing units in the field</source>
        <translation>Remplacer des unités sur le terrain</translation>
    </message>
    <message>
        <location filename="../processing/report/layout.py" line="73"/>
        <source>A primary unit that cannot be surveyed (no safe access, no permission, flooded, ...) is replaced by the next unused reserve unit of the same stratum, in draw order (draw_ord). Record the primary as not surveyed and why; never move a unit to a more convenient place, and never take a reserve of another stratum. Reserves carry the same incl_p and weight as the primaries they replace.</source>
        <translation>Une unité principale qui ne peut pas être inventoriée (pas d'accès sûr, pas d'autorisation, inondée, ...) est remplacée par l'unité de réserve suivante non utilisée de la même strate, dans l'ordre de tirage (draw_ord). Notez l'unité principale comme non inventoriée et pourquoi ; ne déplacez jamais une unité vers un endroit plus commode, et ne prenez jamais une réserve d'une autre strate. Les réserves portent les mêmes incl_p et weight que les unités principales qu'elles remplacent.</translation>
    </message>
    <message>
        <location filename="../processing/report/layout.py" line="82"/>
        <source>Strata (filled), primary units (dark) and reserve units (light)</source>
        <translation>Strates (remplies), unités principales (foncées) et unités de réserve (claires)</translation>
    </message>
    <message>
        <location filename="../processing/report/layout.py" line="95"/>
        <source>Effective area (ha)</source>
        <translation>Surface effective (ha)</translation>
    </message>
    <message>
        <location filename="../processing/report/layout.py" line="96"/>
        <source>Units asked</source>
        <translation>Unités demandées</translation>
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
        <translation>Pas de la grille (m)</translation>
    </message>
    <message>
        <location filename="../processing/report/layout.py" line="101"/>
        <source>Grid rotation (°)</source>
        <translation>Rotation de la grille (°)</translation>
    </message>
    <message>
        <location filename="../processing/report/layout.py" line="116"/>
        <source>incl_p is the inclusion density n/A per m² (the units have no area of their own); weight = A/n is the area in m² each unit stands for (Cordy 1993).</source>
        <translation>incl_p est la densité d'inclusion n/A par m² (les unités n'ont pas de surface propre) ; weight = A/n est la surface en m² que représente chaque unité (Cordy 1993).</translation>
    </message>
    <message>
        <location filename="../processing/report/layout.py" line="121"/>
        <source>incl_p = n × unit area / stratum area is each unit's first-order inclusion probability; weight = 1/incl_p.</source>
        <translation>incl_p = n × surface d'une unité / surface de la strate est la probabilité d'inclusion d'ordre un de chaque unité ; weight = 1/incl_p.</translation>
    </message>
    <message>
        <location filename="../processing/report/layout.py" line="126"/>
        <source>Plus sampling: centres were drawn over each stratum grown by {r} m (the unit&apos;s reach), so units near the edge reach over it, and some centres lie outside their stratum. Survey only the part of each unit inside its own stratum and count only the animals there (the map shows the strata); a unit that reaches nothing of its stratum counts 0. Never cross into excluded or unsafe ground to reach a centre: survey the part inside the stratum from within it. The effective area is the grown area, and plotwise:estimate expands the counts to it (Gregoire &amp; Valentine 2008, ch. 10).</source>
        <translation>Échantillonnage « plus » : les centres ont été tirés sur chaque strate agrandie de {r} m (la portée de l'unité), si bien que les unités proches du bord le dépassent, et certains centres sont hors de leur strate. N'inventoriez que la partie de chaque unité située dans sa propre strate et ne comptez que les animaux qui s'y trouvent (la carte montre les strates) ; une unité qui n'atteint aucune partie de sa strate compte 0. Ne pénétrez jamais dans un terrain exclu ou dangereux pour atteindre un centre : inventoriez la partie située dans la strate depuis l'intérieur de celle-ci. La surface effective est la surface agrandie, et plotwise:estimate y étend les comptages (Gregoire &amp; Valentine 2008, ch. 10).</translation>
    </message>
    <message>
        <location filename="../processing/report/layout.py" line="136"/>
        <source>Units are kept wholly inside their stratum: centres were drawn from the stratum shrunk by {r} m (the unit&apos;s circumscribing radius). The effective area is that shrunk area and the inclusion probabilities use it; the edge strip is covered less often, which the report of the estimate should mention.</source>
        <translation>Les unités sont gardées entièrement dans leur strate : les centres ont été tirés dans la strate réduite de {r} m (le rayon circonscrit de l'unité). La surface effective est cette surface réduite et les probabilités d'inclusion l'utilisent ; la bande de bordure est moins souvent couverte, ce que le rapport de l'estimation devrait mentionner.</translation>
    </message>
    <message>
        <location filename="../processing/report/layout.py" line="143"/>
        <source>The grid spacing is √(A/n) for the asked n; with a random start the realised number of units varies around n (column Primary) while the inclusion density stays n/A everywhere.</source>
        <translation>Le pas de la grille est √(A/n) pour le n demandé ; avec un départ aléatoire, le nombre d'unités obtenu varie autour de n (colonne Principales) tandis que la densité d'inclusion reste n/A partout.</translation>
    </message>
    <message>
        <location filename="../processing/report/layout.py" line="153"/>
        <source>Units per stratum field (N_FIELD)</source>
        <translation>Champ d'unités par strate (N_FIELD)</translation>
    </message>
    <message>
        <location filename="../processing/report/layout.py" line="153"/>
        <source>Total units (N_UNITS)</source>
        <translation>Total d'unités (N_UNITS)</translation>
    </message>
    <message>
        <location filename="../processing/report/layout.py" line="153"/>
        <source>Design (DESIGN)</source>
        <translation>Plan (DESIGN)</translation>
    </message>
    <message>
        <location filename="../processing/report/layout.py" line="153"/>
        <source>Unit shape (SHAPE)</source>
        <translation>Forme de l'unité (SHAPE)</translation>
    </message>
    <message>
        <location filename="../processing/report/layout.py" line="153"/>
        <source>Unit size (SIZE, m)</source>
        <translation>Taille de l'unité (SIZE, m)</translation>
    </message>
    <message>
        <location filename="../processing/report/layout.py" line="153"/>
        <source>Bearing (BEARING, degrees)</source>
        <translation>Azimut (BEARING, degrés)</translation>
    </message>
    <message>
        <location filename="../processing/report/layout.py" line="153"/>
        <source>Keep inside (INSIDE)</source>
        <translation>Garder à l'intérieur (INSIDE)</translation>
    </message>
    <message>
        <location filename="../processing/report/layout.py" line="178"/>
        <source>Simple random: every centre is an independent uniform point of its stratum (a triangle chosen with probability proportional to its area, then a uniform point in it).</source>
        <translation>Aléatoire simple : chaque centre est un point uniforme indépendant de sa strate (un triangle choisi avec une probabilité proportionnelle à sa surface, puis un point uniforme dans celui-ci).</translation>
    </message>
    <message>
        <location filename="../processing/report/layout.py" line="183"/>
        <source>Systematic grid: a square grid with a uniform random start in one grid cell and a rotation, per stratum; reserves are the centres of the grid cells, in random order.</source>
        <translation>Grille systématique : une grille carrée avec un départ aléatoire uniforme dans une maille et une rotation, par strate ; les réserves sont les centres des mailles, dans un ordre aléatoire.</translation>
    </message>
    <message>
        <location filename="../processing/report/layout.py" line="188"/>
        <source>Spatially balanced: balanced acceptance sampling (Robertson et al. 2013). A Halton sequence in bases 2 and 3 is laid over the stratum&apos;s bounding box and its points inside the stratum are kept in order. The random start is a uniform random point of the stratum, so that every location has the same chance for any sample size; reserves are the next points of the same sequence.</source>
        <translation>Spatialement équilibré : échantillonnage par acceptation équilibrée (Robertson et al. 2013). Une suite de Halton en bases 2 et 3 est posée sur le rectangle englobant de la strate et ses points situés dans la strate sont gardés dans l'ordre. Le départ aléatoire est un point aléatoire uniforme de la strate, pour que chaque emplacement ait la même chance quelle que soit la taille d'échantillon ; les réserves sont les points suivants de la même suite.</translation>
    </message>
    <message>
        <location filename="../processing/report/layout.py" line="196"/>
        <source>A candidate closer than {d} m to an accepted unit is passed over (simple sequential inhibition), which lowers the chance of locations next to units slightly.</source>
        <translation>Un candidat à moins de {d} m d'une unité acceptée est écarté (inhibition séquentielle simple), ce qui diminue légèrement la chance des emplacements voisins des unités.</translation>
    </message>
    <message>
        <location filename="../processing/report/stratify.py" line="54"/>
        <source>Strata from raster covariates</source>
        <translation>Strates à partir de covariables raster</translation>
    </message>
    <message>
        <location filename="../processing/report/stratify.py" line="65"/>
        <source>Strata within the sampling frame</source>
        <translation>Strates dans la base de sondage</translation>
    </message>
    <message>
        <location filename="../processing/report/stratify.py" line="232"/>
        <source>area stratified (ha)</source>
        <translation>surface stratifiée (ha)</translation>
    </message>
    <message>
        <location filename="../processing/report/stratify.py" line="76"/>
        <source>frame covered</source>
        <translation>part de la base couverte</translation>
    </message>
    <message>
        <location filename="../processing/report/stratify.py" line="76"/>
        <source>R² of {name}</source>
        <translation>R² de {name}</translation>
    </message>
    <message>
        <location filename="../processing/report/stratify.py" line="83"/>
        <source>The strata cover the frame&apos;s cells that have a value in every covariate ({ha} ha). A survey allocated on these strata speaks for that area only.</source>
        <translation>Les strates couvrent les cellules de la base de sondage qui ont une valeur dans chaque covariable ({ha} ha). Un inventaire alloué sur ces strates ne vaut que pour cette surface.</translation>
    </message>
    <message>
        <location filename="../processing/report/stratify.py" line="94"/>
        <source>Label</source>
        <translation>Libellé</translation>
    </message>
    <message>
        <location filename="../processing/report/stratify.py" line="95"/>
        <source>% of area</source>
        <translation>% de la surface</translation>
    </message>
    <message>
        <location filename="../processing/report/stratify.py" line="96"/>
        <source>Cells</source>
        <translation>Cellules</translation>
    </message>
    <message>
        <location filename="../processing/report/stratify.py" line="99"/>
        <source>{name} mean</source>
        <translation>moyenne de {name}</translation>
    </message>
    <message>
        <location filename="../processing/report/stratify.py" line="100"/>
        <source>{name} SD</source>
        <translation>écart-type de {name}</translation>
    </message>
    <message>
        <location filename="../processing/report/stratify.py" line="116"/>
        <source>Patches smaller than {ha} ha ({cells} cells) were merged into their largest neighbour (GDAL sieve, 4-connected) before polygonising; areas and statistics are those after merging, so a stratum may hold a few cells that the rule alone would have put in a neighbouring stratum.</source>
        <translation>Les taches de moins de {ha} ha ({cells} cellules) ont été fusionnées avec leur plus grande voisine (tamis GDAL, 4-connexité) avant la vectorisation ; surfaces et statistiques sont celles d'après la fusion, si bien qu'une strate peut contenir quelques cellules que la règle seule aurait mises dans une strate voisine.</translation>
    </message>
    <message>
        <location filename="../processing/report/stratify.py" line="123"/>
        <source>Patches smaller than {ha} ha ({cells} cells) were merged before polygonising (4-connected): specks of fewer than {specks} cells into their largest neighbour (GDAL sieve), then {n} more patches, smallest first, each into the neighbouring stratum that made the smallest patch of at least {ha} ha (or, failing that, the largest patch), so that a mosaic of small patches is not swallowed by one growing patch. Areas and statistics are those after merging, so a stratum may hold cells that the rule alone would have put in another stratum.</source>
        <translation>Les taches de moins de {ha} ha ({cells} cellules) ont été fusionnées avant la vectorisation (4-connexité) : les taches minuscules (moins de {specks} cellules) avec leur plus grande voisine (tamis GDAL), puis {n} autres taches, de la plus petite à la plus grande, chacune avec la strate voisine qui formait la plus petite tache d'au moins {ha} ha (ou, à défaut, la plus grande), afin qu'une mosaïque de petites taches ne soit pas absorbée par une seule tache qui grandit. Surfaces et statistiques sont celles d'après la fusion, si bien qu'une strate peut contenir des cellules que la règle seule aurait mises dans une autre strate.</translation>
    </message>
    <message>
        <location filename="../processing/report/stratify.py" line="134"/>
        <source>{n} patch(es) covering {area} ha touch no other stratum (islands of the frame, or patches ringed by NoData) and stay smaller than {ha} ha.</source>
        <translation>{n} tache(s) couvrant {area} ha ne touchent aucune autre strate (îlots de la base de sondage, ou taches entourées de NoData) et restent plus petites que {ha} ha.</translation>
    </message>
    <message>
        <location filename="../processing/report/stratify.py" line="141"/>
        <source>Every patch of the strata now covers at least {ha} ha.</source>
        <translation>Chaque tache des strates couvre désormais au moins {ha} ha.</translation>
    </message>
    <message>
        <location filename="../processing/report/stratify.py" line="149"/>
        <source>Method: {name}</source>
        <translation>Méthode : {name}</translation>
    </message>
    <message>
        <location filename="../processing/report/stratify.py" line="154"/>
        <source>Covariates standardised with their mean and SD over the frame; k-means++ seeds and Lloyd iterations on a random sample of {m} cells (seed {seed}); {it} iterations. Then every cell went to its nearest centre.</source>
        <translation>Covariables standardisées avec leur moyenne et leur écart-type sur la base ; graines k-means++ et itérations de Lloyd sur un échantillon aléatoire de {m} cellules (graine {seed}) ; {it} itérations. Puis chaque cellule est allée au centre le plus proche.</translation>
    </message>
    <message>
        <location filename="../processing/report/stratify.py" line="162"/>
        <source>Each class of &apos;{name}&apos; is one stratum ({k} classes).</source>
        <translation>Chaque classe de « {name} » forme une strate ({k} classes).</translation>
    </message>
    <message>
        <location filename="../processing/report/stratify.py" line="170"/>
        <source>Stratum h holds the cells with b(h−1) ≤ {name} &lt; b(h). Boundaries on {name}:</source>
        <translation>La strate h contient les cellules telles que b(h−1) ≤ {name} &lt; b(h). Limites sur {name} :</translation>
    </message>
    <message>
        <location filename="../processing/report/stratify.py" line="173"/>
        <source>Boundary</source>
        <translation>Limite</translation>
    </message>
    <message>
        <location filename="../processing/report/stratify.py" line="176"/>
        <source>Exact sample quantiles at h/k of the frame&apos;s cells (Hyndman &amp; Fan 1996, definition 7), found in two passes: a 64,000-class histogram locates each quantile, then the cells of that class are sorted.</source>
        <translation>Quantiles empiriques exacts à h/k des cellules de la base (Hyndman &amp; Fan 1996, définition 7), trouvés en deux passes : un histogramme à 64 000 classes situe chaque quantile, puis les cellules de cette classe sont triées.</translation>
    </message>
    <message>
        <location filename="../processing/report/stratify.py" line="182"/>
        <source>Dalenius &amp; Hodges (1959): on a {n}-class histogram of {name}, the boundaries are the class tops where the cumulative √f is nearest to h/k of its total.</source>
        <translation>Dalenius &amp; Hodges (1959) : sur un histogramme de {name} à {n} classes, les limites sont les bornes supérieures des classes où le cumul de √f est le plus proche de h/k de son total.</translation>
    </message>
    <message>
        <location filename="../processing/report/stratify.py" line="191"/>
        <source>Share of covariate variance explained by the strata (R²)</source>
        <translation>Part de la variance des covariables expliquée par les strates (R²)</translation>
    </message>
    <message>
        <location filename="../processing/report/stratify.py" line="192"/>
        <source>Covariate</source>
        <translation>Covariable</translation>
    </message>
    <message>
        <location filename="../processing/report/stratify.py" line="192"/>
        <source>Mean</source>
        <translation>Moyenne</translation>
    </message>
    <message>
        <location filename="../processing/report/stratify.py" line="192"/>
        <source>SD</source>
        <translation>Écart-type</translation>
    </message>
    <message>
        <location filename="../processing/report/stratify.py" line="192"/>
        <source>R²</source>
        <translation>R²</translation>
    </message>
    <message>
        <location filename="../processing/report/stratify.py" line="196"/>
        <source>R² = 1 − Σ N_h S_h² / (N S²): the between-strata share of the covariate's variance over the cells. For a quantity that follows the covariate exactly, proportional allocation over these strata would lower the variance of the estimated mean by this share compared with simple random sampling (Cochran 1977, ch. 5, large-population approximation). The gain for animal density is smaller the less closely density follows the covariate.</source>
        <translation>R² = 1 − Σ N_h S_h² / (N S²) : la part inter-strates de la variance de la covariable sur les cellules. Pour une grandeur qui suit exactement la covariable, une allocation proportionnelle sur ces strates réduirait la variance de la moyenne estimée de cette part par rapport à un échantillonnage aléatoire simple (Cochran 1977, ch. 5, approximation pour grande population). Le gain pour la densité animale est d'autant plus faible que la densité suit moins étroitement la covariable.</translation>
    </message>
    <message>
        <location filename="../processing/report/stratify.py" line="210"/>
        <source>Histogram of {name}</source>
        <translation>Histogramme de {name}</translation>
    </message>
    <message>
        <location filename="../processing/report/stratify.py" line="216"/>
        <source>stratum {h}</source>
        <translation>strate {h}</translation>
    </message>
    <message>
        <location filename="../processing/report/stratify.py" line="216"/>
        <source>cells</source>
        <translation>cellules</translation>
    </message>
    <message>
        <location filename="../processing/report/stratify.py" line="221"/>
        <source>Frame cells by {name}, coloured by stratum; dashed lines: stratum boundaries.</source>
        <translation>Cellules de la base selon {name}, colorées par strate ; tirets : limites des strates.</translation>
    </message>
    <message>
        <location filename="../processing/report/stratify.py" line="224"/>
        <source>Frame cells by {name}, coloured by stratum (k-means strata may overlap on one covariate).</source>
        <translation>Cellules de la base selon {name}, colorées par strate (les strates des k-moyennes peuvent se chevaucher sur une covariable).</translation>
    </message>
    <message>
        <location filename="../processing/report/stratify.py" line="231"/>
        <source>Coverage</source>
        <translation>Couverture</translation>
    </message>
    <message>
        <location filename="../processing/report/stratify.py" line="232"/>
        <source>frame area (ha)</source>
        <translation>surface de la base (ha)</translation>
    </message>
    <message>
        <location filename="../processing/report/stratify.py" line="232"/>
        <source>frame area outside the first covariate&apos;s extent (ha)</source>
        <translation>surface de la base hors de l'emprise de la première covariable (ha)</translation>
    </message>
    <message>
        <location filename="../processing/report/stratify.py" line="232"/>
        <source>frame cells with NoData in a covariate (ha)</source>
        <translation>cellules de la base NoData dans une covariable (ha)</translation>
    </message>
    <message>
        <location filename="../processing/report/stratify.py" line="232"/>
        <source>share of the frame covered</source>
        <translation>part de la base couverte</translation>
    </message>
    <message>
        <location filename="../processing/report/stratify.py" line="232"/>
        <source>cells stratified</source>
        <translation>cellules stratifiées</translation>
    </message>
    <message>
        <location filename="../processing/report/stratify.py" line="232"/>
        <source>covariates warped on the fly</source>
        <translation>covariables rééchantillonnées à la volée</translation>
    </message>
    <message>
        <location filename="../processing/report/stratify.py" line="251"/>
        <source>ignored</source>
        <translation>ignoré</translation>
    </message>
    <message>
        <location filename="../processing/report/stratify.py" line="254"/>
        <source>Sampling frame (FRAME)</source>
        <translation>Base de sondage (FRAME)</translation>
    </message>
    <message>
        <location filename="../processing/report/stratify.py" line="255"/>
        <source>Covariates (COVARIATES)</source>
        <translation>Covariables (COVARIATES)</translation>
    </message>
    <message>
        <location filename="../processing/report/stratify.py" line="256"/>
        <source>Method (METHOD)</source>
        <translation>Méthode (METHOD)</translation>
    </message>
    <message>
        <location filename="../processing/report/stratify.py" line="257"/>
        <source>Number of strata (STRATA)</source>
        <translation>Nombre de strates (STRATA)</translation>
    </message>
    <message>
        <location filename="../processing/report/stratify.py" line="258"/>
        <source>Minimum patch area (MIN_AREA, ha)</source>
        <translation>Surface minimale d'une tache (MIN_AREA, ha)</translation>
    </message>
    <message>
        <location filename="../processing/report/stratify.py" line="259"/>
        <source>CRS of the computation and the outputs</source>
        <translation>SCR du calcul et des sorties</translation>
    </message>
</context>
<context>
    <name>PlotwiseStyles</name>
    <message>
        <location filename="../processing/styles.py" line="200"/>
        <source>primary unit</source>
        <translation>unité principale</translation>
    </message>
    <message>
        <location filename="../processing/styles.py" line="201"/>
        <source>reserve unit</source>
        <translation>unité de réserve</translation>
    </message>
    <message>
        <location filename="../processing/styles.py" line="331"/>
        <source>per {unit}</source>
        <translation>par {unit}</translation>
    </message>
    <message>
        <location filename="../processing/styles.py" line="245"/>
        <source>Density (animals {per})</source>
        <translation>Densité (animaux {per})</translation>
    </message>
    <message>
        <location filename="../processing/styles.py" line="275"/>
        <source>no estimate (no surveyed unit)</source>
        <translation>pas d'estimation (aucune unité inventoriée)</translation>
    </message>
    <message>
        <location filename="../processing/styles.py" line="385"/>
        <source>The layer {name} could not be styled ({error}); it keeps the default style.</source>
        <translation>La couche {name} n'a pas pu recevoir son style ({error}) ; elle garde le style par défaut.</translation>
    </message>
    <message>
        <location filename="../processing/styles.py" line="437"/>
        <source>left out (no surveyed occasion)</source>
        <translation>écarté (aucune occasion échantillonnée)</translation>
    </message>
    <message>
        <location filename="../processing/styles.py" line="439"/>
        <source>Occupancy given the detections (psi_cond)</source>
        <translation>Occupation sachant les détections (psi_cond)</translation>
    </message>
</context>
<context>
    <name>SimulateCounts</name>
    <message>
        <location filename="../processing/algorithms/simulatecounts.py" line="42"/>
        <source>Simulate counts in sample units</source>
        <translation>Simuler des comptages dans les unités d'échantillonnage</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/simulatecounts.py" line="88"/>
        <source>Sample units</source>
        <translation>Unités d'échantillonnage</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/simulatecounts.py" line="90"/>
        <source>Animal points</source>
        <translation>Points des animaux</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/simulatecounts.py" line="92"/>
        <source>Detection probability</source>
        <translation>Probabilité de détection</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/simulatecounts.py" line="98"/>
        <source>Count reserve units too</source>
        <translation>Compter aussi les unités de réserve</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/simulatecounts.py" line="108"/>
        <source>Units with simulated counts</source>
        <translation>Unités avec comptages simulés</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/simulatecounts.py" line="205"/>
        <source>has no geometry</source>
        <translation>n'a pas de géométrie</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/simulatecounts.py" line="210"/>
        <source>Layer &apos;{layer}&apos;: these features cannot be counted: {items}. Point and line units need a positive &apos;area_m2&apos; field (the layout step writes it); polygons need a geometry.</source>
        <translation>Couche « {layer} » : ces entités ne peuvent pas être comptées : {items}. Les unités ponctuelles et linéaires ont besoin d'un champ « area_m2 » positif (l'étape de disposition l'écrit) ; les polygones ont besoin d'une géométrie.</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/simulatecounts.py" line="184"/>
        <source>{n} units counted: {seen} animals seen of {present} present (detection {p:g}); {r} reserve units left empty.</source>
        <translation>{n} unités comptées : {seen} animaux vus sur {present} présents (détection {p:g}) ; {r} unités de réserve laissées vides.</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/simulatecounts.py" line="45"/>
        <source>&lt;p&gt;Fills the &lt;i&gt;count&lt;/i&gt; field of sample units with the number of simulated animals seen in each, for training, demonstrations and tests of the estimate. Real surveys type the counts in after fieldwork instead.&lt;/p&gt;&lt;ul&gt;&lt;li&gt;&lt;b&gt;Sample units&lt;/b&gt;: polygons count the animals inside them. Points count within a circle of the unit&apos;s &lt;i&gt;area_m2&lt;/i&gt;, lines within a strip of that area along the line.&lt;/li&gt;&lt;li&gt;&lt;b&gt;Animal points&lt;/b&gt;: one point per animal, for example the demo reserve&apos;s simulated animals.&lt;/li&gt;&lt;li&gt;&lt;b&gt;Detection probability&lt;/b&gt;: each animal in a unit is seen with this probability (binomial thinning). 1 means every animal is seen.&lt;/li&gt;&lt;li&gt;&lt;b&gt;Count reserve units too&lt;/b&gt;: off by default, so that units whose &lt;i&gt;role&lt;/i&gt; is &lt;i&gt;reserve&lt;/i&gt; keep an empty count (not surveyed), as in a survey where no primary unit needed replacing.&lt;/li&gt;&lt;li&gt;&lt;b&gt;Strata&lt;/b&gt; (optional, with their id field): each unit counts only the animals inside its own stratum (matched by the units&apos; &lt;i&gt;stratum&lt;/i&gt; field; without an id field, inside the strata), the rule of plus sampling, the layout&apos;s default at the edges (Gregoire &amp;amp; Valentine 2008, ch. 10). Give the strata the units were laid out on.&lt;/li&gt;&lt;li&gt;&lt;b&gt;Random seed&lt;/b&gt;: 0 draws a seed and records it.&lt;/li&gt;&lt;/ul&gt;&lt;p&gt;The output is a copy of the units with &lt;i&gt;count&lt;/i&gt; filled (added when missing) and &lt;i&gt;present&lt;/i&gt;, the animals actually in the unit. The input is not changed.&lt;/p&gt;</source>
        <translation>&lt;p&gt;Remplit le champ &lt;i&gt;count&lt;/i&gt; des unités d'échantillonnage avec le nombre d'animaux simulés vus dans chacune, pour la formation, les démonstrations et les tests de l'estimation. Dans un vrai inventaire, les comptages sont saisis après le travail de terrain.&lt;/p&gt;&lt;ul&gt;&lt;li&gt;&lt;b&gt;Unités d'échantillonnage&lt;/b&gt; : les polygones comptent les animaux qu'ils contiennent. Les points comptent dans un cercle de surface &lt;i&gt;area_m2&lt;/i&gt; de l'unité, les lignes dans une bande de cette surface le long de la ligne.&lt;/li&gt;&lt;li&gt;&lt;b&gt;Points des animaux&lt;/b&gt; : un point par animal, par exemple les animaux simulés de la réserve de démonstration.&lt;/li&gt;&lt;li&gt;&lt;b&gt;Probabilité de détection&lt;/b&gt; : chaque animal présent dans une unité est vu avec cette probabilité (amincissement binomial). 1 signifie que chaque animal est vu.&lt;/li&gt;&lt;li&gt;&lt;b&gt;Compter aussi les unités de réserve&lt;/b&gt; : désactivé par défaut, pour que les unités dont le &lt;i&gt;role&lt;/i&gt; est &lt;i&gt;reserve&lt;/i&gt; gardent un comptage vide (non inventoriées), comme dans un inventaire où aucune unité principale n'a dû être remplacée.&lt;/li&gt;&lt;li&gt;&lt;b&gt;Strates&lt;/b&gt; (facultatif, avec leur champ d'identifiant) : chaque unité ne compte que les animaux situés dans sa propre strate (reconnue par le champ &lt;i&gt;stratum&lt;/i&gt; des unités ; sans champ d'identifiant, dans les strates), la règle de l'échantillonnage « plus », le protocole par défaut de la disposition aux bords (Gregoire &amp;amp; Valentine 2008, ch. 10). Donnez les strates sur lesquelles les unités ont été disposées.&lt;/li&gt;&lt;li&gt;&lt;b&gt;Graine aléatoire&lt;/b&gt; : 0 en tire une et l'enregistre.&lt;/li&gt;&lt;/ul&gt;&lt;p&gt;La sortie est une copie des unités avec &lt;i&gt;count&lt;/i&gt; rempli (ajouté s'il manque) et &lt;i&gt;present&lt;/i&gt;, les animaux réellement présents dans l'unité. L'entrée n'est pas modifiée.&lt;/p&gt;</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/simulatecounts.py" line="64"/>
        <source>&lt;p&gt;Distances (for the distance density algorithm):&lt;/p&gt;&lt;ul&gt;&lt;li&gt;&lt;b&gt;Detection function&lt;/b&gt;: none (the detection probability above, the same at every distance), or half-normal g(x) = exp(−x²/2σ²) or hazard-rate g(x) = 1 − exp(−(x/σ)^−b) (Buckland et al. 2001), for line transects and point stations. Each animal within the maximum distance of a unit is then seen with probability p·g(x), x its perpendicular distance to the line or its distance to the point, p the detection probability above (1: animals on the line are always seen, as distance sampling assumes).&lt;/li&gt;&lt;li&gt;&lt;b&gt;Scale σ (m)&lt;/b&gt; and &lt;b&gt;hazard-rate shape b&lt;/b&gt; of the detection function.&lt;/li&gt;&lt;li&gt;&lt;b&gt;Maximum distance (m)&lt;/b&gt;: animals farther than this from the line or point are not counted; 0 takes the distance where g falls to 1 %.&lt;/li&gt;&lt;li&gt;&lt;b&gt;Group size field&lt;/b&gt; of the animal points (optional): each point is then a group of that many animals; otherwise each point is one animal.&lt;/li&gt;&lt;li&gt;&lt;b&gt;Observations&lt;/b&gt; (optional, with a detection function): one point per sighting at the animal's position, with &lt;i&gt;unit_id&lt;/i&gt;, &lt;i&gt;distance&lt;/i&gt; (m) and &lt;i&gt;size&lt;/i&gt;, ready for the distance density algorithm.&lt;/li&gt;&lt;/ul&gt;&lt;p&gt;With a detection function, &lt;i&gt;present&lt;/i&gt; counts the animals within the maximum distance, and the strata are not used: a line or point sees the animals within the maximum distance on both sides of a stratum edge, as observers do.&lt;/p&gt;&lt;p&gt;Reference: Buckland, S. T. et al. (2001) Introduction to Distance Sampling. Oxford University Press.&lt;/p&gt;</source>
        <translation>&lt;p&gt;Distances (pour l'algorithme de densité à partir des distances) :&lt;/p&gt;&lt;ul&gt;&lt;li&gt;&lt;b&gt;Fonction de détection&lt;/b&gt; : aucune (la probabilité de détection ci-dessus, la même à toute distance), ou demi-normale g(x) = exp(−x²/2σ²) ou taux de risque (hazard-rate) g(x) = 1 − exp(−(x/σ)^−b) (Buckland et al. 2001), pour les transects linéaires et les stations ponctuelles. Chaque animal situé à moins de la distance maximale d'une unité est alors vu avec la probabilité p·g(x), x étant sa distance perpendiculaire à la ligne ou sa distance au point, et p la probabilité de détection ci-dessus (1 : les animaux sur la ligne sont toujours vus, comme le suppose l'échantillonnage par distance).&lt;/li&gt;&lt;li&gt;&lt;b&gt;Échelle σ (m)&lt;/b&gt; et &lt;b&gt;forme b du taux de risque&lt;/b&gt; de la fonction de détection.&lt;/li&gt;&lt;li&gt;&lt;b&gt;Distance maximale (m)&lt;/b&gt; : les animaux plus éloignés de la ligne ou du point ne sont pas comptés ; 0 prend la distance où g tombe à 1 %.&lt;/li&gt;&lt;li&gt;&lt;b&gt;Champ de taille des groupes&lt;/b&gt; des points des animaux (facultatif) : chaque point est alors un groupe d'autant d'animaux ; sinon chaque point est un animal.&lt;/li&gt;&lt;li&gt;&lt;b&gt;Observations&lt;/b&gt; (facultatif, avec une fonction de détection) : un point par observation à la position de l'animal, avec &lt;i&gt;unit_id&lt;/i&gt;, &lt;i&gt;distance&lt;/i&gt; (m) et &lt;i&gt;size&lt;/i&gt;, prêt pour l'algorithme de densité à partir des distances.&lt;/li&gt;&lt;/ul&gt;&lt;p&gt;Avec une fonction de détection, &lt;i&gt;present&lt;/i&gt; compte les animaux situés à moins de la distance maximale, et les strates ne sont pas utilisées : une ligne ou un point voit les animaux à moins de la distance maximale des deux côtés d'une limite de strate, comme les observateurs.&lt;/p&gt;&lt;p&gt;Référence : Buckland, S. T. et al. (2001) Introduction to Distance Sampling. Oxford University Press.&lt;/p&gt;</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/simulatecounts.py" line="102"/>
        <source>Strata: count only inside each unit&apos;s stratum (plus sampling)</source>
        <translation>Strates : ne compter que dans la strate de chaque unité (échantillonnage « plus »)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/simulatecounts.py" line="105"/>
        <source>Stratum id field of the strata</source>
        <translation>Champ d'identifiant des strates</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/simulatecounts.py" line="109"/>
        <source>Detection function (line transects and point stations)</source>
        <translation>Fonction de détection (transects linéaires et stations ponctuelles)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/simulatecounts.py" line="109"/>
        <source>None: the same detection probability at every distance</source>
        <translation>Aucune : la même probabilité de détection à toute distance</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/simulatecounts.py" line="109"/>
        <source>Half-normal</source>
        <translation>Demi-normale</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/simulatecounts.py" line="109"/>
        <source>Hazard-rate</source>
        <translation>Taux de risque (hazard-rate)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/simulatecounts.py" line="113"/>
        <source>Scale σ of the detection function (m)</source>
        <translation>Échelle σ de la fonction de détection (m)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/simulatecounts.py" line="116"/>
        <source>Shape b of the hazard-rate</source>
        <translation>Forme b du taux de risque (hazard-rate)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/simulatecounts.py" line="119"/>
        <source>Maximum distance from the line or point (m; 0: where g falls to 1 %)</source>
        <translation>Distance maximale de la ligne ou du point (m ; 0 : là où g tombe à 1 %)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/simulatecounts.py" line="122"/>
        <source>Group size field of the animal points</source>
        <translation>Champ de taille des groupes des points des animaux</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/simulatecounts.py" line="125"/>
        <source>Observations with distances</source>
        <translation>Observations avec les distances</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/simulatecounts.py" line="251"/>
        <source>Layer &apos;{layer}&apos;: the animal points {ids} have no group size above 0 in the field &apos;{field}&apos;. Fill it in, or choose no group size field.</source>
        <translation>Couche « {layer} » : les points des animaux {ids} n'ont pas de taille de groupe supérieure à 0 dans le champ « {field} ». Renseignez-la, ou ne choisissez pas de champ de taille des groupes.</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/simulatecounts.py" line="264"/>
        <source>Animals within {w:.1f} m of the lines or points are counted.</source>
        <translation>Les animaux à moins de {w:.1f} m des lignes ou des points sont comptés.</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/simulatecounts.py" line="287"/>
        <source>No detection function was chosen, so there are no distances: the observations layer is empty.</source>
        <translation>Aucune fonction de détection n'a été choisie, il n'y a donc pas de distances : la couche des observations est vide.</translation>
    </message>
</context>
<context>
    <name>SimulateDetections</name>
    <message>
        <location filename="../processing/algorithms/simulatedetections.py" line="38"/>
        <source>Simulate detections at stations</source>
        <translation>Simuler des détections aux stations</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/simulatedetections.py" line="41"/>
        <source>&lt;p&gt;Fills detection histories of camera-trap or recorder stations from a simulated population, for training, demonstrations and tests of the occupancy analysis. Real surveys type the detections in after fieldwork instead.&lt;/p&gt;&lt;ul&gt;&lt;li&gt;&lt;b&gt;Stations&lt;/b&gt;: points (for example from the stations step).&lt;/li&gt;&lt;li&gt;&lt;b&gt;Animal points&lt;/b&gt; and their &lt;b&gt;group field&lt;/b&gt; (default group_id, as the demo reserve writes it): a group sits at the mean position of its members; without a group field each animal is a group.&lt;/li&gt;&lt;li&gt;&lt;b&gt;Occasions&lt;/b&gt;: the number of survey occasions (days, weeks).&lt;/li&gt;&lt;li&gt;&lt;b&gt;Detection at a group&lt;/b&gt; and &lt;b&gt;σ (m)&lt;/b&gt;: on each occasion a station detects the species with probability p = p_max·exp(−d²/(2σ²)), d the distance to the nearest group, independently between occasions.&lt;/li&gt;&lt;li&gt;&lt;b&gt;Share not surveyed&lt;/b&gt;: the share of station-occasions left empty (NULL), as a camera that failed.&lt;/li&gt;&lt;li&gt;&lt;b&gt;Random seed&lt;/b&gt;: 0 draws a seed and records it.&lt;/li&gt;&lt;/ul&gt;&lt;p&gt;The output is a copy of the stations with det_01, det_02, … (1 detected, 0 not, NULL not surveyed), dist_grp (m to the nearest group) and p_true (the per-occasion detection probability). The input is not changed.&lt;/p&gt;</source>
        <translation>&lt;p&gt;Remplit les historiques de détection de stations de pièges photographiques ou d'enregistreurs à partir d'une population simulée, pour la formation, les démonstrations et les tests de l'analyse d'occupation. Dans un vrai inventaire, les détections sont saisies après le travail de terrain.&lt;/p&gt;&lt;ul&gt;&lt;li&gt;&lt;b&gt;Stations&lt;/b&gt; : des points (par exemple issus de l'étape des stations).&lt;/li&gt;&lt;li&gt;&lt;b&gt;Points des animaux&lt;/b&gt; et leur &lt;b&gt;champ de groupe&lt;/b&gt; (group_id par défaut, tel que l'écrit la réserve de démonstration) : un groupe se trouve à la position moyenne de ses membres ; sans champ de groupe, chaque animal est un groupe.&lt;/li&gt;&lt;li&gt;&lt;b&gt;Occasions&lt;/b&gt; : le nombre d'occasions d'échantillonnage (jours, semaines).&lt;/li&gt;&lt;li&gt;&lt;b&gt;Détection à l'emplacement d'un groupe&lt;/b&gt; et &lt;b&gt;σ (m)&lt;/b&gt; : à chaque occasion, une station détecte l'espèce avec la probabilité p = p_max·exp(−d²/(2σ²)), d étant la distance au groupe le plus proche, indépendamment d'une occasion à l'autre.&lt;/li&gt;&lt;li&gt;&lt;b&gt;Part non échantillonnée&lt;/b&gt; : la part des couples station-occasion laissés vides (NULL), comme un piège photographique tombé en panne.&lt;/li&gt;&lt;li&gt;&lt;b&gt;Graine aléatoire&lt;/b&gt; : 0 en tire une et l'enregistre.&lt;/li&gt;&lt;/ul&gt;&lt;p&gt;La sortie est une copie des stations avec det_01, det_02, … (1 détectée, 0 non, NULL non échantillonnée), dist_grp (m jusqu'au groupe le plus proche) et p_true (la probabilité de détection par occasion). L'entrée n'est pas modifiée.&lt;/p&gt;</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/simulatedetections.py" line="60"/>
        <source>Stations</source>
        <translation>Couche des stations</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/simulatedetections.py" line="62"/>
        <source>Animal points</source>
        <translation>Points des animaux</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/simulatedetections.py" line="64"/>
        <source>Group field of the animals (empty: each animal is a group)</source>
        <translation>Champ de groupe des animaux (vide : chaque animal est un groupe)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/simulatedetections.py" line="67"/>
        <source>Occasions</source>
        <translation>Occasions</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/simulatedetections.py" line="70"/>
        <source>Detection probability per occasion at a group</source>
        <translation>Probabilité de détection par occasion à l'emplacement d'un groupe</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/simulatedetections.py" line="73"/>
        <source>σ of the decline with distance (m)</source>
        <translation>σ de la décroissance avec la distance (m)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/simulatedetections.py" line="76"/>
        <source>Share of occasions not surveyed</source>
        <translation>Part des occasions non échantillonnées</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/simulatedetections.py" line="80"/>
        <source>Stations with detection histories</source>
        <translation>Stations avec historiques de détection</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/simulatedetections.py" line="108"/>
        <source>{n} stations, {k} occasions: the species was detected at {d} stations ({g} animal groups).</source>
        <translation>{n} stations, {k} occasions : l'espèce a été détectée à {d} stations ({g} groupes d'animaux).</translation>
    </message>
</context>
<context>
    <name>Stations</name>
    <message>
        <location filename="../processing/algorithms/stations.py" line="47"/>
        <source>Lay out camera-trap or recorder stations</source>
        <translation>Disposer des stations de pièges photographiques ou d'enregistreurs</translation>
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
        <translation>Place des stations de pièges photographiques ou d'enregistreurs acoustiques sur une base de sondage (éventuellement par strate), espacées d'après le domaine vital de l'espèce, avec des stations de réserve et des points de passage GPS.

Espacement : d'après le domaine vital (km²), pris comme le domaine à 95 % d'une loi normale bivariée circulaire des positions de l'animal, σ = √(HR/π) / 2,448. Règle 0, sites d'occupation indépendants : stations espacées d'au moins un diamètre de domaine vital 2√(HR/π) (pratique courante). Règle 1, capture-recapture spatiale : stations espacées d'environ 2σ (Sollmann et al. 2012 ; Sun et al. 2014). Un espacement (m) supérieur à 0 remplace la règle.

Dispositifs :
• Grille : un seul réseau carré au pas de l'espacement sur la base de sondage, orienté au nord, avec un départ aléatoire. Un nombre de stations de 0 prend chaque point du réseau dans la base ; un nombre supérieur à 0 prend autant de points du réseau, les plus proches d'un point aléatoire de la base (un bloc compact). Les strates ne font qu'étiqueter les stations.
• Grappes : des groupes de CLUSTER_SIZE stations à l'espacement (un petit réseau carré autour d'un centre), les centres étant spatialement équilibrés (Robertson et al. 2013) et assez éloignés pour que les grappes voisines respectent l'espacement ; chaque station est à l'intérieur de sa strate. Les réserves sont des grappes entières.
• Équilibré : des stations isolées spatialement équilibrées, chacune au moins à l'espacement de toutes les autres.
Le nombre de stations est réparti entre les strates selon la surface, au moins 2 chacune (grappes : les stations d'une strate arrondies au nombre supérieur de grappes entières).

L'espacement minimal (m) est respecté entre toutes les stations. Réserves : par strate, dans l'ordre de tirage (draw_ord) ; une station qui ne peut pas être installée est remplacée par la réserve suivante non utilisée de sa strate.
La durée d'intervention (heures par visite de station, déplacement compris ; 0 : non indiquée) et la journée de travail donnent le nombre de stations qu'une équipe relève par jour, et les jours-équipe d'une tournée.

Champs de sortie : station, stratum, cluster, role (primary ou reserve), draw_ord, lon/lat (WGS 84). Le fichier GPX contient un point de passage par station, nommé par son identifiant. Le rapport compare l'étendue du dispositif au domaine vital : un dispositif plus petit que quelques domaines vitaux ne permet pas d'estimer la densité.

Vérifiez l'accès à chaque station et sa sécurité avant le travail de terrain : l'outil ne rend jamais un emplacement sûr. Respectez les règles de sécurité sur le terrain de votre organisme et la législation locale.</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/stations.py" line="79"/>
        <source>Sampling frame or strata</source>
        <translation>Base de sondage ou strates</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/stations.py" line="81"/>
        <source>Stratum field (empty: the frame is one stratum)</source>
        <translation>Champ de strate (vide : la base forme une seule strate)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/stations.py" line="84"/>
        <source>Number of stations (grid: 0 takes every grid point)</source>
        <translation>Nombre de stations (grille : 0 prend chaque point de la grille)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/stations.py" line="87"/>
        <source>Array</source>
        <translation>Dispositif</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/stations.py" line="87"/>
        <source>Grid</source>
        <translation>Grille</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/stations.py" line="87"/>
        <source>Clusters</source>
        <translation>Grappes</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/stations.py" line="87"/>
        <source>Balanced single stations</source>
        <translation>Stations isolées équilibrées</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/stations.py" line="90"/>
        <source>Home range of the species (km²; 0: not given)</source>
        <translation>Domaine vital de l'espèce (km² ; 0 : non indiqué)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/stations.py" line="93"/>
        <source>Station spacing (m; 0: from the home range)</source>
        <translation>Espacement des stations (m ; 0 : d'après le domaine vital)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/stations.py" line="96"/>
        <source>Spacing rule (when the spacing comes from the home range)</source>
        <translation>Règle d'espacement (quand l'espacement vient du domaine vital)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/stations.py" line="96"/>
        <source>Independent occupancy sites: one home-range diameter</source>
        <translation>Sites d'occupation indépendants : un diamètre de domaine vital</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/stations.py" line="96"/>
        <source>Spatial capture-recapture: 2σ</source>
        <translation>Capture-recapture spatiale : 2σ</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/stations.py" line="100"/>
        <source>Stations per cluster</source>
        <translation>Stations par grappe</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/stations.py" line="103"/>
        <source>Minimum spacing between stations (m; 0: none)</source>
        <translation>Espacement minimal entre les stations (m ; 0 : aucun)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/stations.py" line="106"/>
        <source>Reserve stations per stratum (clusters: reserve clusters)</source>
        <translation>Stations de réserve par strate (grappes : grappes de réserve)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/stations.py" line="110"/>
        <source>Service time per station visit (hours, travel included; 0: not given)</source>
        <translation>Durée d'intervention par visite de station (heures, déplacement compris ; 0 : non indiquée)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/stations.py" line="110"/>
        <source>Working day of a field team (hours)</source>
        <translation>Journée de travail d'une équipe de terrain (heures)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/stations.py" line="118"/>
        <source>Stations</source>
        <translation>Stations</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/stations.py" line="119"/>
        <source>Waypoints for GPS (GPX)</source>
        <translation>Points de passage pour GPS (GPX)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/stations.py" line="119"/>
        <source>GPX files (*.gpx)</source>
        <translation>Fichiers GPX (*.gpx)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/stations.py" line="123"/>
        <source>Station spacing used (m)</source>
        <translation>Espacement des stations utilisé (m)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/stations.py" line="123"/>
        <source>σ of the home range (m)</source>
        <translation>σ du domaine vital (m)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/stations.py" line="123"/>
        <source>Number of primary stations</source>
        <translation>Nombre de stations principales</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/stations.py" line="161"/>
        <source>Layer &apos;{layer}&apos;: {text}</source>
        <translation>Couche « {layer} » : {text}</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/stations.py" line="175"/>
        <source>{n} waypoints written to {path}</source>
        <translation>{n} points de passage écrits dans {path}</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/stations.py" line="176"/>
        <source>{n} primary and {r} reserve stations, {s:.0f} m apart.</source>
        <translation>{n} stations principales et {r} de réserve, espacées de {s:.0f} m.</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/stations.py" line="194"/>
        <source>, projected from {src} (UTM zone of the frame&apos;s centre)</source>
        <translation>, projeté depuis {src} (zone UTM du centre de la base de sondage)</translation>
    </message>
</context>
<context>
    <name>Stratify</name>
    <message>
        <location filename="../processing/algorithms/stratify.py" line="55"/>
        <source>Quantile (equal areas on the first covariate)</source>
        <translation>Quantiles (surfaces égales sur la première covariable)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/stratify.py" line="56"/>
        <source>Equal interval (on the first covariate)</source>
        <translation>Intervalles égaux (sur la première covariable)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/stratify.py" line="57"/>
        <source>Cumulative root frequency (Dalenius–Hodges, first covariate)</source>
        <translation>Racine cumulée des fréquences (Dalenius–Hodges, première covariable)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/stratify.py" line="58"/>
        <source>k-means (all covariates, standardised)</source>
        <translation>k-moyennes (toutes les covariables, standardisées)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/stratify.py" line="59"/>
        <source>Raster classes (each class of the first covariate)</source>
        <translation>Classes raster (chaque classe de la première covariable)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/stratify.py" line="63"/>
        <source>Stratify from raster covariates</source>
        <translation>Stratifier à partir de covariables raster</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/stratify.py" line="66"/>
        <source>&lt;p&gt;Draws strata (zones of similar expected density) from raster covariates such as elevation, a vegetation index or a land-cover map. Only cells whose centre lies inside the sampling frame count. A cell with NoData in any covariate is left out and its area reported.&lt;/p&gt;&lt;p&gt;The covariates are put on the grid of the first one, in the frame's CRS (a geographic frame is projected to the UTM zone of its centre). Rasters in another CRS or on another grid are warped on the fly (bilinear; nearest neighbour for raster classes). Rasters are read block by block, so memory stays bounded whatever their size.&lt;/p&gt;&lt;h3&gt;Methods&lt;/h3&gt;&lt;ul&gt;&lt;li&gt;&lt;b&gt;Quantile&lt;/b&gt;: strata of equal area along the first covariate. The boundaries are the exact sample quantiles of the frame's cells (Hyndman &amp;amp; Fan 1996, definition 7).&lt;/li&gt;&lt;li&gt;&lt;b&gt;Equal interval&lt;/b&gt;: the first covariate's range cut into equal widths.&lt;/li&gt;&lt;li&gt;&lt;b&gt;Cumulative root frequency&lt;/b&gt;: the Dalenius &amp;amp; Hodges (1959) rule on a 100-class histogram of the first covariate (Cochran 1977, ch. 5A).&lt;/li&gt;&lt;li&gt;&lt;b&gt;k-means&lt;/b&gt;: all covariates standardised to mean 0 and SD 1, k-means++ seeds (Arthur &amp;amp; Vassilvitskii 2007) and Lloyd iterations on a random sample of 100,000 cells drawn with the seed; then every cell goes to its nearest centre.&lt;/li&gt;&lt;li&gt;&lt;b&gt;Raster classes&lt;/b&gt;: each value of the first covariate (a categorical raster, at most 50 classes) is one stratum; the number of strata is ignored.&lt;/li&gt;&lt;/ul&gt;&lt;p&gt;Strata are numbered 1..k by increasing mean of the first covariate. Patches (4-connected) smaller than the minimum patch area (ha) join a neighbouring stratum before the strata are turned into polygons: specks through GDAL's sieve, then each small patch, smallest first, the neighbour that brings it to the minimum area. A patch that touches no other stratum stays, with a warning.&lt;/p&gt;&lt;h3&gt;Outputs&lt;/h3&gt;&lt;ul&gt;&lt;li&gt;Stratum raster: the stratum of each cell (0 = none).&lt;/li&gt;&lt;li&gt;Strata: one multipolygon per stratum with &lt;i&gt;stratum&lt;/i&gt;, &lt;i&gt;label&lt;/i&gt;, &lt;i&gt;area_ha&lt;/i&gt; (cells × cell area), &lt;i&gt;cov_mean&lt;/i&gt; and &lt;i&gt;cov_sd&lt;/i&gt; of the first covariate, and &lt;i&gt;cov2_mean&lt;/i&gt;, &lt;i&gt;cov2_sd&lt;/i&gt;, … for the others (SD over the stratum's cells).&lt;/li&gt;&lt;li&gt;Report: boundaries, areas, covariate statistics per stratum, the share of each covariate's variance the strata explain (R²), a histogram with the boundaries and a map.&lt;/li&gt;&lt;/ul&gt;&lt;p&gt;The random seed is used by k-means only (0 draws one and records it).&lt;/p&gt;&lt;p&gt;Strata are a statistical device: before fieldwork, check every unit's access and safety.&lt;/p&gt;</source>
        <translation>&lt;p&gt;Forme des strates (zones de densité attendue semblable) à partir de covariables raster telles que l'altitude, un indice de végétation ou une carte d'occupation du sol. Seules comptent les cellules dont le centre est dans la base de sondage. Une cellule NoData dans une covariable est écartée et sa surface signalée.&lt;/p&gt;&lt;p&gt;Les covariables sont mises sur la grille de la première, dans le SCR de la base de sondage (une base en coordonnées géographiques est projetée dans la zone UTM de son centre). Les rasters dans un autre SCR ou sur une autre grille sont rééchantillonnés à la volée (bilinéaire ; plus proche voisin pour les classes raster). Les rasters sont lus bloc par bloc, si bien que la mémoire reste bornée quelle que soit leur taille.&lt;/p&gt;&lt;h3&gt;Méthodes&lt;/h3&gt;&lt;ul&gt;&lt;li&gt;&lt;b&gt;Quantiles&lt;/b&gt; : strates de surface égale le long de la première covariable. Les limites sont les quantiles empiriques exacts des cellules de la base (Hyndman &amp;amp; Fan 1996, définition 7).&lt;/li&gt;&lt;li&gt;&lt;b&gt;Intervalles égaux&lt;/b&gt; : l'étendue de la première covariable découpée en largeurs égales.&lt;/li&gt;&lt;li&gt;&lt;b&gt;Racine cumulée des fréquences&lt;/b&gt; : la règle de Dalenius &amp;amp; Hodges (1959) sur un histogramme à 100 classes de la première covariable (Cochran 1977, ch. 5A).&lt;/li&gt;&lt;li&gt;&lt;b&gt;k-moyennes&lt;/b&gt; : toutes les covariables standardisées à moyenne 0 et écart-type 1, graines k-means++ (Arthur &amp;amp; Vassilvitskii 2007) et itérations de Lloyd sur un échantillon aléatoire de 100 000 cellules tiré avec la graine ; puis chaque cellule va au centre le plus proche.&lt;/li&gt;&lt;li&gt;&lt;b&gt;Classes raster&lt;/b&gt; : chaque valeur de la première covariable (un raster catégoriel, 50 classes au plus) forme une strate ; le nombre de strates est ignoré.&lt;/li&gt;&lt;/ul&gt;&lt;p&gt;Les strates sont numérotées de 1 à k par moyenne croissante de la première covariable. Les taches (4-connexité) plus petites que la surface minimale (ha) rejoignent une strate voisine avant que les strates ne soient converties en polygones : les grains par le tamis de GDAL, puis chaque petite tache, de la plus petite à la plus grande, rejoint la voisine qui l'amène à la surface minimale. Une tache qui ne touche aucune autre strate reste, avec un avertissement.&lt;/p&gt;&lt;h3&gt;Sorties&lt;/h3&gt;&lt;ul&gt;&lt;li&gt;Raster des strates : la strate de chaque cellule (0 = aucune).&lt;/li&gt;&lt;li&gt;Strates : un multipolygone par strate avec &lt;i&gt;stratum&lt;/i&gt;, &lt;i&gt;label&lt;/i&gt;, &lt;i&gt;area_ha&lt;/i&gt; (cellules × surface d'une cellule), &lt;i&gt;cov_mean&lt;/i&gt; et &lt;i&gt;cov_sd&lt;/i&gt; de la première covariable, et &lt;i&gt;cov2_mean&lt;/i&gt;, &lt;i&gt;cov2_sd&lt;/i&gt;, … pour les autres (écart-type sur les cellules de la strate).&lt;/li&gt;&lt;li&gt;Rapport : limites, surfaces, statistiques des covariables par strate, part de la variance de chaque covariable expliquée par les strates (R²), un histogramme avec les limites et une carte.&lt;/li&gt;&lt;/ul&gt;&lt;p&gt;La graine aléatoire ne sert qu'aux k-moyennes (0 en tire une et l'enregistre).&lt;/p&gt;&lt;p&gt;Les strates sont un outil statistique : avant le travail de terrain, vérifiez l'accès à chaque unité et sa sécurité.&lt;/p&gt;</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/stratify.py" line="115"/>
        <source>Sampling frame</source>
        <translation>Base de sondage</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/stratify.py" line="117"/>
        <source>Raster covariates (band 1 of each; the first one sets the grid)</source>
        <translation>Covariables raster (bande 1 de chacune ; la première fixe la grille)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/stratify.py" line="120"/>
        <source>Method</source>
        <translation>Méthode</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/stratify.py" line="122"/>
        <source>Number of strata (ignored for raster classes)</source>
        <translation>Nombre de strates (ignoré pour les classes raster)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/stratify.py" line="125"/>
        <source>Minimum patch area (ha); smaller patches join a neighbour</source>
        <translation>Surface minimale d'une tache (ha) ; les taches plus petites rejoignent une voisine</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/stratify.py" line="129"/>
        <source>Stratum raster</source>
        <translation>Raster des strates</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/stratify.py" line="130"/>
        <source>Strata</source>
        <translation>Strates</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/stratify.py" line="133"/>
        <source>Number of strata formed</source>
        <translation>Nombre de strates formées</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/stratify.py" line="134"/>
        <source>Share of the first covariate's variance explained by the strata (R²)</source>
        <translation>Part de la variance de la première covariable expliquée par les strates (R²)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/stratify.py" line="141"/>
        <source>Give at least one raster in COVARIATES.</source>
        <translation>Donnez au moins un raster dans COVARIATES.</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/stratify.py" line="143"/>
        <source>COVARIATES holds {n} rasters; use at most {m}.</source>
        <translation>COVARIATES contient {n} rasters ; utilisez-en au plus {m}.</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/stratify.py" line="148"/>
        <source>COVARIATES: &apos;{name}&apos; is not a raster layer.</source>
        <translation>COVARIATES : « {name} » n'est pas une couche raster.</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/stratify.py" line="151"/>
        <source>Covariate &apos;{name}&apos; is not a file raster that GDAL can read. Save it as a GeoTIFF first.</source>
        <translation>La covariable « {name} » n'est pas un fichier raster lisible par GDAL. Enregistrez-la d'abord en GeoTIFF.</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/stratify.py" line="222"/>
        <source>Layer &apos;{layer}&apos; (FRAME) has no polygon with a positive area. Choose the sampling-frame layer.</source>
        <translation>La couche « {layer} » (FRAME) n'a aucun polygone de surface positive. Choisissez la couche de la base de sondage.</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/stratify.py" line="187"/>
        <source>Warped onto the grid of &apos;{first}&apos; in {crs}: {names}.</source>
        <translation>Rééchantillonnées sur la grille de « {first} » en {crs} : {names}.</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/stratify.py" line="196"/>
        <source>{k} strata on {ha} ha; R² of '{name}': {r2}.</source>
        <translation>{k} strates sur {ha} ha ; R² de « {name} » : {r2}.</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/stratify.py" line="98"/>
        <source>&lt;h3&gt;Minimum patch area&lt;/h3&gt;&lt;p&gt;The default of {default:g} ha is chosen for field teams: a patch smaller than a few sample units is not a stratum. Four 20 m × 20 m plots 50 m apart need about 1 ha; a zone smaller than that cannot hold the units a stratum needs for its own variance, and on the map it is noise of the covariate, not a zone to survey. Raise it for larger units (transects, camera stations); 0 keeps every cell's stratum.&lt;/p&gt;&lt;p&gt;A speckled covariate (a 10 m vegetation index, a noisy classification) can form millions of patches. The patches are counted before they are merged and before they are turned into polygons: strata with more than {max_patches:,} patches stop the run with an error that gives their number and a MIN_AREA that brings them under the limit, and a covariate too speckled to merge in bounded memory (more than {max_sieve:,} patches) stops it with advice to smooth or coarsen the covariate first. When the patches left after merging the specks are too many to merge one by one, patches below MIN_AREA first join their largest neighbour (the rule of GDAL's sieve filter), with a warning.&lt;/p&gt;</source>
        <translation>&lt;h3&gt;Surface minimale d'une tache&lt;/h3&gt;&lt;p&gt;La valeur par défaut de {default:g} ha est choisie pour les équipes de terrain : une tache plus petite que quelques unités d'échantillonnage n'est pas une strate. Quatre placettes de 20 m × 20 m espacées de 50 m demandent environ 1 ha ; une zone plus petite ne peut pas contenir les unités dont une strate a besoin pour sa propre variance, et sur la carte c'est du bruit de la covariable, pas une zone à inventorier. Augmentez-la pour des unités plus grandes (transects, stations de pièges photographiques) ; 0 garde la strate de chaque cellule.&lt;/p&gt;&lt;p&gt;Une covariable mouchetée (un indice de végétation à 10 m, une classification bruitée) peut former des millions de taches. Les taches sont comptées avant d'être fusionnées et avant d'être converties en polygones : des strates de plus de {max_patches:,} taches arrêtent le traitement avec une erreur qui donne leur nombre et un MIN_AREA qui les ramène sous la limite, et une covariable trop mouchetée pour être fusionnée en mémoire bornée (plus de {max_sieve:,} taches) l'arrête avec le conseil de lisser la covariable ou d'agrandir ses cellules d'abord. Quand les taches restant après la fusion des taches minuscules sont trop nombreuses pour être fusionnées une à une, les taches sous MIN_AREA rejoignent d'abord leur plus grande voisine (la règle du filtre tamis de GDAL), avec un avertissement.&lt;/p&gt;</translation>
    </message>
</context>
<context>
    <name>Trend</name>
    <message>
        <location filename="../processing/algorithms/trend.py" line="128"/>
        <source>Trend over years</source>
        <translation>Tendance au fil des années</translation>
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
        <translation>Estime la variation annuelle d'une population suivie, avec son intervalle de confiance et sa valeur p, ainsi qu'un indice annuel.

Entrée : une couche ou une table avec un enregistrement par unité et par année (comptages par unité), ou un enregistrement par année (estimations annuelles).
Source 0, comptages par unité : champs d'identifiant d'unité, d'année et de comptage ; en option un champ de strate (une tendance par strate est ajoutée au rapport) et un champ de surface d'unité (la surface ou la longueur inventoriée dans cet enregistrement : les comptages sont comparés par unité d'effort). Un comptage NULL signifie non inventorié. Les unités n'ont pas besoin d'être inventoriées chaque année (panels de revisite). Le modèle est un modèle de Poisson log-linéaire avec un effet par unité, log E[comptage] = log(surface) + effet de l'unité + β·année (McCullagh &amp; Nelder 1989), ajusté par la méthode de Newton avec les effets des unités sous forme explicite. Surdispersion par quasi-vraisemblance : l'intervalle utilise la baisse de déviance entre un modèle à un effet par année et le modèle de tendance, par degré de liberté, si bien que des années qui diffèrent dans leur ensemble (météo, observateurs) l'élargissent, avec le t de Student. Les unités qui n'ont jamais compté d'animal sont écartées de l'ajustement (elles n'apportent aucune information sur la tendance).
Source 1, estimations annuelles : champs d'année, d'estimation et d'erreur type (par exemple abund et abund_se de l'étape d'estimation, une saison par enregistrement ; avec un champ de strate, les lignes 'all' sont utilisées). Régression log-linéaire pondérée dans laquelle la variance de chaque année est sa variance d'échantillonnage ln(1 + CV²) plus la variance de processus d'une année à l'autre, estimée par la méthode des moments (DerSimonian &amp; Laird 1986 ; Thompson &amp; Sharp 1999) ; la variance de la pente est mise à l'échelle par le carré moyen résiduel, avec t sur k − 2 degrés de liberté (Hartung &amp; Knapp 2001).
Niveau de confiance : celui des intervalles (0.95 par défaut).

Sorties : la table de l'indice annuel (year, index avec index_lo et index_hi, et la tendance ajustée avec trend_lo et trend_hi) ; les valeurs CHANGE, CHANGE_LO, CHANGE_HI (% par an) et P_VALUE (bilatérale, absence de tendance) ; un rapport HTML avec l'indice et la tendance, la variation annuelle en toutes lettres et les mises en garde.

Il faut au moins 3 années ; une unité comptée deux fois la même année, des comptages négatifs ou des estimations non supérieures à 0 arrêtent le traitement, en nommant les enregistrements.

Une tendance des comptages n'est une tendance de la population que si la détection n'a pas changé au fil des années.

Références : McCullagh &amp; Nelder (1989) ; Bishop, Fienberg &amp; Holland (1975) ; DerSimonian &amp; Laird (1986) ; Thompson &amp; Sharp (1999) ; Hartung &amp; Knapp (2001) ; Urquhart &amp; Kincaid (1999).</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/trend.py" line="76"/>
        <source>Counts or yearly estimates (layer or table)</source>
        <translation>Comptages ou estimations annuelles (couche ou table)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/trend.py" line="78"/>
        <source>What the input holds</source>
        <translation>Contenu de l'entrée</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/trend.py" line="78"/>
        <source>Unit counts</source>
        <translation>Comptages par unité</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/trend.py" line="78"/>
        <source>Yearly estimates</source>
        <translation>Estimations annuelles</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/trend.py" line="81"/>
        <source>Unit id field (unit counts)</source>
        <translation>Champ d'identifiant d'unité (comptages par unité)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/trend.py" line="81"/>
        <source>Year field</source>
        <translation>Champ d'année</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/trend.py" line="81"/>
        <source>Count field (unit counts)</source>
        <translation>Champ de comptage (comptages par unité)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/trend.py" line="81"/>
        <source>Estimate field (yearly estimates)</source>
        <translation>Champ d'estimation (estimations annuelles)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/trend.py" line="81"/>
        <source>Standard-error field (yearly estimates)</source>
        <translation>Champ d'erreur type (estimations annuelles)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/trend.py" line="81"/>
        <source>Stratum field (optional)</source>
        <translation>Champ de strate (facultatif)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/trend.py" line="81"/>
        <source>Unit-area field: area surveyed per record (optional)</source>
        <translation>Champ de surface d'unité : surface inventoriée par enregistrement (facultatif)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/trend.py" line="93"/>
        <source>Confidence level</source>
        <translation>Niveau de confiance</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/trend.py" line="96"/>
        <source>Yearly index</source>
        <translation>Indice annuel</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/trend.py" line="99"/>
        <source>Change per year (%)</source>
        <translation>Variation annuelle (%)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/trend.py" line="99"/>
        <source>Lower limit of the change per year (%)</source>
        <translation>Limite inférieure de la variation annuelle (%)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/trend.py" line="99"/>
        <source>Upper limit of the change per year (%)</source>
        <translation>Limite supérieure de la variation annuelle (%)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/trend.py" line="99"/>
        <source>p-value of the trend (two-sided)</source>
        <translation>Valeur p de la tendance (bilatérale)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/trend.py" line="130"/>
        <source>Change per year: {c:+.2f}% ({lo:+.2f}% to {hi:+.2f}%), p = {p:.3g}.</source>
        <translation>Variation annuelle : {c:+.2f}% ({lo:+.2f}% à {hi:+.2f}%), p = {p:.3g}.</translation>
    </message>
</context>
<context>
    <name>TrendPower</name>
    <message>
        <location filename="../processing/algorithms/trendpower.py" line="191"/>
        <source>Power to detect a trend</source>
        <translation>Puissance pour détecter une tendance</translation>
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
        <translation>Estime, par simulation, la probabilité qu'un programme de suivi détecte une variation annuelle donnée : la puissance, selon le nombre d'années et le nombre d'unités, et les années nécessaires pour une puissance de 80 %.

Unités par an et panels : N_UNITS unités sur YEARS années, dans le plan de panels de plotwise:panels (0 toutes les unités chaque année ; 1 rotatifs : PANELS panels, chaque unité une fois tous les PANELS ans ; 2 partagés : un noyau de CORE_SHARE des unités chaque année plus des panels rotatifs). Ou donnez une couche de panels (la sortie de plotwise:panels) : ses unités et leurs années de visite remplacent N_UNITS, YEARS et le plan.
Variations à détecter : variations annuelles en % par an, plusieurs séparées par des virgules (p. ex. -3, -5).
Comptage moyen : le nombre moyen d'animaux par unité la première année (avant détection).
Composantes de la variance, sous forme d'écarts-types sur l'échelle logarithmique : entre unités (SD_UNIT, différences durables entre unités), unité × année (SD_UNIT_YEAR, les hauts et les bas d'une unité) et d'une année à l'autre (SD_YEAR, communs à toutes les unités : météo, observateurs, conditions). Les valeurs par défaut (1.0, 0.3, 0.1) ne sont qu'illustratives : utilisez vos propres valeurs. Une table pilote (la table de sortie de l'étape d'estimation, champs n, mean_c et sd_c) peut donner le comptage moyen et SD_UNIT : ils en sont alors tirés en ajustant un comptage Poisson–log-normal. Les deux autres exigent plusieurs années de comptages.
Probabilité de détection : chaque animal est compté avec cette probabilité (constante au fil des années).
Seuil de signification et test : le seuil du test t sur la tendance ; bilatéral, ou unilatéral dans le sens de la variation. 0.1 est souvent utilisé en suivi (pratique courante).
Réplicats : programmes simulés par variation (1 000 donnent une erreur type de Monte-Carlo d'au plus 0.016). Graine aléatoire : 0 en tire une et l'enregistre.

Chaque réplicat simule des comptages de Poisson pour chaque unité et chaque visite, estime la tendance avec le même modèle que plotwise:trend (Poisson log-linéaire avec effets d'unité, facteur d'échelle de quasi-vraisemblance entre années) et enregistre si la variation a été détectée (Gerrodette 1987 pour le cadre).

Sorties : une table de la puissance avec son erreur type de Monte-Carlo selon years, n_units et change ; un rapport HTML avec les courbes de puissance en fonction des années et des unités, et les années nécessaires pour une puissance de 80 %. La puissance dépend des composantes de la variance supposées.

Références : Gerrodette (1987) ; Urquhart &amp; Kincaid (1999) ; McDonald (2003) ; McCullagh &amp; Nelder (1989).

Un programme de suivi envoie des équipes sur le terrain chaque année : vérifiez l'accès à chaque unité et sa sécurité avant chaque saison ; l'outil ne rend jamais un emplacement sûr. Respectez les règles de sécurité sur le terrain de votre organisme et la législation locale.</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/trendpower.py" line="79"/>
        <source>Units (N_UNITS)</source>
        <translation>Unités (N_UNITS)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/trendpower.py" line="81"/>
        <source>Years of the programme</source>
        <translation>Années du programme</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/trendpower.py" line="84"/>
        <source>Panel design</source>
        <translation>Plan de panels</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/trendpower.py" line="84"/>
        <source>Every unit every year</source>
        <translation>Toutes les unités chaque année</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/trendpower.py" line="84"/>
        <source>Rotating panels</source>
        <translation>Panels rotatifs</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/trendpower.py" line="84"/>
        <source>Split panels (core + rotating)</source>
        <translation>Panels partagés (noyau + rotatifs)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/trendpower.py" line="88"/>
        <source>Rotating panels (K)</source>
        <translation>Panels rotatifs (K)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/trendpower.py" line="91"/>
        <source>Share of units in the core (split panels)</source>
        <translation>Part des unités dans le noyau (panels partagés)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/trendpower.py" line="94"/>
        <source>Panels layer (output of plotwise:panels; replaces the design)</source>
        <translation>Couche des panels (sortie de plotwise:panels ; remplace le plan)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/trendpower.py" line="97"/>
        <source>Changes to detect (% per year, comma-separated)</source>
        <translation>Variations à détecter (% par an, séparées par des virgules)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/trendpower.py" line="99"/>
        <source>Mean animals per unit in the first year</source>
        <translation>Nombre moyen d'animaux par unité la première année</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/trendpower.py" line="99"/>
        <source>SD between units (log scale)</source>
        <translation>Écart-type entre unités (échelle logarithmique)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/trendpower.py" line="99"/>
        <source>SD unit × year (log scale)</source>
        <translation>Écart-type unité × année (échelle logarithmique)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/trendpower.py" line="99"/>
        <source>SD year to year (log scale)</source>
        <translation>Écart-type d'une année à l'autre (échelle logarithmique)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/trendpower.py" line="107"/>
        <source>Pilot estimate table (gives the mean count and SD between units; optional)</source>
        <translation>Table d'estimation pilote (donne le comptage moyen et l'écart-type entre unités ; facultative)</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/trendpower.py" line="110"/>
        <source>Detection probability</source>
        <translation>Probabilité de détection</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/trendpower.py" line="113"/>
        <source>Significance level</source>
        <translation>Seuil de signification</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/trendpower.py" line="115"/>
        <source>Two-sided test</source>
        <translation>Test bilatéral</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/trendpower.py" line="116"/>
        <source>Replicates</source>
        <translation>Réplicats</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/trendpower.py" line="120"/>
        <source>Power table</source>
        <translation>Table de puissance</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/trendpower.py" line="128"/>
        <source>every unit every year</source>
        <translation>toutes les unités chaque année</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/trendpower.py" line="128"/>
        <source>rotating panels</source>
        <translation>panels rotatifs</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/trendpower.py" line="128"/>
        <source>split panels</source>
        <translation>panels partagés</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/trendpower.py" line="138"/>
        <source>(K = {k})</source>
        <translation>(K = {k})</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/trendpower.py" line="144"/>
        <source>{k} panels from the layer</source>
        <translation>{k} panels tirés de la couche</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/trendpower.py" line="187"/>
        <source>Change {c:+g}% per year: 80% power after {t} years.</source>
        <translation>Variation de {c:+g}% par an : puissance de 80% après {t} ans.</translation>
    </message>
    <message>
        <location filename="../processing/algorithms/trendpower.py" line="187"/>
        <source>Change {c:+g}% per year: 80% power not reached within {t} years.</source>
        <translation>Variation de {c:+g}% par an : puissance de 80% non atteinte en {t} ans.</translation>
    </message>
</context>
</TS>
