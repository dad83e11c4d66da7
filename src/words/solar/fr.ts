/**
 * Les éclipses de Soleil en français : la mise en garde pour les yeux, avec
 * tout le contenu de l’anglaise (safety.ts) — filtres ISO 12312-2 ou
 * projection ; jamais une phase partielle ou annulaire sans protection ; la
 * totalité, seulement dans la bande ; instruments munis d’un filtre à
 * l’avant ; enfants accompagnés ; autorités sanitaires locales — puis le
 * texte (horaire local, résumé, calendrier, légende, planche contact), les
 * mots de la carte et ceux du schéma du Soleil et de la Lune au maximum.
 * Typographie française, comme les éclipses de Lune (lunar/fr.ts) : espace
 * insécable avant « : », « ; », « % » et les unités. Terms as the trade
 * writes them in French: totalité, annularité, bande de totalité, bande de
 * centralité, phase centrale, obscuration, éléments de Bessel; C1…C4, ΔT
 * and saros unchanged.
 */
import { COMMON_FRENCH } from '../common/fr.ts';
import { decimalIn, listWords, type ContinentName } from '../common.ts';
import type { SolarWords } from './caution.ts';
import type { SolarDiagramWords } from './diagram.ts';
import type { SolarFigureWords } from './figures.ts';
import type { SolarKindWord, SolarTextWords } from './text.ts';

const NBSP = '\u00a0';
const plural = new Intl.PluralRules('fr');
const list = (items: readonly string[]) => listWords(items, COMMON_FRENCH);
const counted = (count: number, one: string, other: string) => `${count} ${plural.select(count) === 'one' ? one : other}`;

/** Adjectives after « éclipse » (feminine). */
const KIND_ADJECTIVE: Record<SolarKindWord, string> = { total: 'totale', annular: 'annulaire', hybrid: 'hybride', partial: 'partielle' };
/** The band where the central phase is seen: « bande de totalité », « bande d’annularité », and the trade's « bande de centralité » for a hybrid. */
const BAND: Record<'total' | 'annular' | 'hybrid', string> = {
  total: 'bande de totalité',
  annular: 'bande d’annularité',
  hybrid: 'bande de centralité (totale par endroits, annulaire ailleurs)',
};

/** « de la totalité », « de l’annularité », « de la phase centrale » (every central word is feminine). */
const ofThe = (word: string) => (/^[aeiouhéè]/i.test(word) ? `de l’${word}` : `de la ${word}`);

/** « à Oviedo », « au point de l’éclipse maximale », « au Caire », « aux Sables » : à contracted with a leading article. */
const atPlace = (place: string) => {
  const article = /^(le|les) (.*)$/i.exec(place);
  return article ? `${article[1]!.toLowerCase() === 'le' ? 'au' : 'aux'} ${article[2]}` : `à ${place}`;
};

const PARTIAL_PHASES = 'Phases partielles de l’éclipse de Soleil';

/** Text of solar eclipses in French: local events, caption, alt text, contact sheet. */
const SOLAR_TEXT: SolarTextWords = {
  common: COMMON_FRENCH,
  events: {
    C1: 'la Lune commence à masquer le Soleil',
    C2: 'début de la phase centrale',
    maximum: 'maximum de l’éclipse',
    C3: 'fin de la phase centrale',
    C4: 'la Lune quitte le disque du Soleil',
    sunrise: 'lever du Soleil',
    sunset: 'coucher du Soleil',
  },
  central: { total: 'totalité', annular: 'annularité' },
  caption: {
    title: (kind, date) => (kind === 'hybrid' ? `Éclipse hybride de Soleil, totale et annulaire, du ${date}.` : `Éclipse ${KIND_ADJECTIVE[kind]} de Soleil du ${date}.`),
    greatest: (stamp, where, alt) =>
      `Maximum de l’éclipse à ${stamp} vers ${where}, où le Soleil est ${Math.round(alt) <= 0 ? 'alors à l’horizon' : `à ${Math.round(alt)}° au-dessus de l’horizon`}.`,
    centralFacts: (kind, duration, width) => {
      const what = kind === 'annular' ? 'l’anneau lumineux dure' : kind === 'total' ? 'la totalité dure' : 'la phase centrale dure';
      const parts = [duration ? `${what} ${duration}` : undefined, width !== undefined ? `la bande mesure ${Math.round(width)}${NBSP}km de large` : undefined].filter((p) => p !== undefined);
      return parts.length > 0 ? `En ce point, ${list(parts)}.` : '';
    },
    nonCentral: (kind) =>
      `L’axe de l’ombre de la Lune passe à côté de la Terre${NBSP}: ${kind === 'total' ? 'le cône d’ombre' : 'le prolongement du cône d’ombre (l’anti-ombre)'} ne fait que l’effleurer près d’un pôle.`,
    partialOnly: (magnitude) => `Seule la pénombre de la Lune atteint la Terre${NBSP}: l’éclipse est partielle partout, de magnitude ${decimalIn(magnitude, COMMON_FRENCH)} au plus.`,
    pathCrosses: (kind, countries, more) =>
      `Pays traversés par la ${BAND[kind]}${NBSP}: ${list(more > 0 ? [...countries, `${more} ${plural.select(more) === 'one' ? 'autre pays' : 'autres pays'}`] : countries)}.`,
    pathOverSea: (kind) => `La ${BAND[kind]} ne passe que sur la haute mer et ne touche la terre d’aucun pays.`,
    continent: (name, share) => {
      const named = COMMON_FRENCH.continents[name as ContinentName] ?? name;
      return share === 'whole' ? named : share === 'most' ? `la majeure partie de ${named}` : `une partie de ${named}`;
    },
    partialSeen: (where) => `L’éclipse partielle est visible depuis ${where}.`,
    citiesIntro: `Parmi les grandes villes${NBSP}:`,
    cityCentral: (city, kind, duration, from) => `${city} voit ${kind === 'total' ? 'la totalité' : 'l’anneau lumineux'} pendant ${duration}, à partir de ${from}`,
    cityPartial: (city, percent, at, when) =>
      `${city} voit ${percent} du disque solaire masqué ${when === 'maximum' ? `à ${at}` : when === 'sunrise' ? `au lever du Soleil, à ${at}` : `au coucher du Soleil, à ${at}`}`,
    altText: (kind, date, path, partial) => [`Carte de l’éclipse ${KIND_ADJECTIVE[kind]} de Soleil du ${date}.`, path, partial].filter((p) => p).join(' '),
    file: (caption, alt) => `${caption}\n\nTexte alternatif${NBSP}: ${alt}\n`,
  },
  sheet: {
    title: (lunarToo, from, last) => `Éclipses de ${lunarToo ? 'Lune et de Soleil' : 'Soleil'} du ${from} au ${last}`,
    kind: { total: 'éclipse totale de Soleil', annular: 'éclipse annulaire de Soleil', hybrid: 'éclipse hybride de Soleil', partial: 'éclipse partielle de Soleil' },
    magnitude: (value) => `magnitude ${decimalIn(value, COMMON_FRENCH)}`,
    central: (kind, duration) => `${kind === 'total' ? 'totalité' : kind === 'annular' ? 'annularité' : 'phase centrale'} ${duration} au maximum`,
    width: (km) => `bande de ${km}${NBSP}km de large`,
    saros: (n) => `saros ${n}`,
    noMap: `Légende et géométrie GeoJSON${NBSP}; le style ne demande pas d’image de la carte.`,
    thumbnailAlt: (kind, date) => `Carte de visibilité de l’${kind} du ${date}`,
    // The French lunar kind already names the Moon (« éclipse totale de Lune »).
    lunarKind: (kind) => kind,
  },
  list: {
    header: ['Date', 'Astre', 'Type', 'Maximum (UTC)', 'Magnitude', 'Mag. pénombrale', 'Gamma', 'Dans l’ombre', 'Totalité', 'Phase centrale', 'Bande', 'Saros'],
    body: { lunar: 'Lune', solar: 'Soleil' },
    kind: { total: 'totale', annular: 'annulaire', hybrid: 'hybride', partial: 'partielle' },
    eclipses: (lunar, solar) => `${counted(lunar, 'éclipse de Lune', 'éclipses de Lune')} et ${counted(solar, 'éclipse de Soleil', 'éclipses de Soleil')}`,
    solarEclipses: (count) => counted(count, 'éclipse de Soleil', 'éclipses de Soleil'),
    magnitudeNote: `Magnitude${NBSP}: pour la Lune, celle de l’ombre${NBSP}; pour le Soleil, la fraction de son diamètre couverte, au point de l’éclipse maximale.`,
    solarNote: (k1, k2) =>
      `Soleil${NBSP}: phase centrale = totalité ou annularité sur la ligne centrale au maximum de l’éclipse, bande = sa largeur en ce point${NBSP}; rayon de la Lune k1${NBSP}=${NBSP}${k1} (pénombre), k2${NBSP}=${NBSP}${k2} (ombre et anti-ombre).`,
    central: (minutes, seconds) => `${minutes}min ${seconds}s`,
    pathWidth: (km) => `${km}${NBSP}km`,
  },
  minutesSeconds: { minutes: (minutes, seconds) => `${minutes}${NBSP}min ${seconds}${NBSP}s`, seconds: (seconds) => `${seconds}${NBSP}s` },
  percent: (value) => `${value}${NBSP}%`,
  centralEdge: { edge: (central, edge) => `${edge === 'begins' ? 'début' : 'fin'} ${ofThe(central)}`, unseen: 'phase centrale (Soleil sous l’horizon)' },
  local: {
    eventLabel: { maximum: 'Maximum', sunrise: 'Lever', sunset: 'Coucher' },
    header: (zone) => ['Étape', 'Ce qui se passe', `Heure locale (${zone})`, 'UTC', 'Haut. Soleil', 'Az. Soleil', 'Soleil levé'],
    yes: 'oui',
    no: 'non',
    // The eclipse's kind, which the place may not see: the place comes after « circonstances locales ».
    title: (kind, id, place, coordinates, zone) => `Éclipse ${KIND_ADJECTIVE[kind]} de Soleil ${id}${NBSP}: circonstances locales pour ${place} (${coordinates}${NBSP}; ${zone})`,
    seen: {
      total: (m) => `Vue d’ici${NBSP}: totale (magnitude ${m}).`,
      annular: (m, o) => `Vue d’ici${NBSP}: annulaire (magnitude ${m}, ${o} du disque solaire couvert).`,
      partial: (m, o) => `Vue d’ici${NBSP}: partielle (magnitude ${m}, ${o} du disque solaire couvert au maximum).`,
      partialLow: (o) => `Vue d’ici${NBSP}: partielle, au plus ${o} du disque solaire couvert tant que le Soleil est levé (le maximum survient le Soleil sous l’horizon).`,
      none: `Vue d’ici${NBSP}: invisible.`,
    },
    timeNote: (zone) =>
      `Heure locale${NBSP}: ${zone}. Heures à la seconde. Hauteur du Soleil${NBSP}: celle de son centre, avec réfraction (Saemundsson) à partir de −1° vrai, géométrique en dessous${NBSP}; «${NBSP}levé${NBSP}»${NBSP}: bord supérieur au-dessus d’un horizon au niveau de la mer.`,
    modelNote: (k1, k2, deltaT, source, predictions) =>
      `Rayon de la Lune k1${NBSP}=${NBSP}${k1} (pénombre${NBSP}: C1, C4, magnitude), k2${NBSP}=${NBSP}${k2} (ombre et anti-ombre${NBSP}: C2, C3)${NBSP}; bord de la Lune lisse, observateur au niveau de la mer${NBSP}; ΔT ${deltaT}${NBSP}s (${source}). ${predictions}`,
    safetyHeading: { plain: 'SÉCURITÉ OCULAIRE', markdown: 'Sécurité oculaire' },
  },
  summary: {
    missed: (place, id) => `Depuis ${place}, l’ombre de la Lune passe à côté${NBSP}: aucune éclipse de Soleil n’est visible le ${id}.`,
    sunDown: (place, span) => `Depuis ${place}, le Soleil reste sous l’horizon pendant toute l’éclipse (${span})${NBSP}: rien n’est visible.`,
    central: (place, kind, duration, from, to) =>
      kind === 'total'
        ? `Depuis ${place}, le Soleil est totalement éclipsé pendant ${duration}, de ${from} à ${to}.`
        : `Depuis ${place}, la Lune s’inscrit tout entière dans le disque du Soleil et laisse un anneau lumineux pendant ${duration}, de ${from} à ${to}.`,
    partial: (place, percent) => `Depuis ${place}, le Soleil est partiellement éclipsé${NBSP}: au plus ${percent} de son disque est masqué.`,
    runs: (span, localDate, stamp, altitude, up) =>
      `Horaire de l’éclipse${NBSP}: ${span}${localDate === undefined ? '' : `, le ${localDate}`}${NBSP}; maximum à ${stamp}, ${up ? `Soleil à ${altitude}° de hauteur` : `Soleil sous l’horizon (${altitude}°)`}.`,
    risesEclipsed: (stamp) => `Le Soleil se lève déjà éclipsé, à ${stamp}.`,
    setsEclipsed: (stamp) => `Le Soleil se couche encore éclipsé, à ${stamp}.`,
    nearEdge: (km) =>
      `Ce lieu se trouve à moins de ${km}${NBSP}km du bord de la bande${NBSP}: le relief du bord de la Lune et l’incertitude sur ΔT peuvent déplacer cette limite d’un kilomètre ou plus, si bien que la phase centrale peut être plus courte, voire manquée.`,
    lowSun: (degrees) => `Le Soleil ne dépasse pas ${degrees}° de hauteur${NBSP}: il faut un horizon bas et dégagé dans sa direction.`,
  },
  calendar: {
    partialTitle: PARTIAL_PHASES,
    centralTitle: { total: 'Totalité', annular: 'Annularité' },
    cutShort: ' (Soleil levé)',
    cutLong: ' (la partie où le Soleil est au-dessus de l’horizon)',
    // « Phases partielles de l’éclipse de Soleil du … », « Totalité de l’éclipse du … ».
    description: (title, id, cut) => `${title}${title === PARTIAL_PHASES ? '' : ' de l’éclipse'} du ${id}${cut}${NBSP}; prévisions, si la météo le permet.`,
    notSeenTitle: (place) => `Éclipse de Soleil, invisible depuis ${place}`,
    notSeenDescription: `Cette entrée ne fait que marquer la date${NBSP}: il n’y a rien à voir d’ici.`,
  },
};

/** Every word of the solar map in French. */
const SOLAR_FIGURES: SolarFigureWords = {
  common: COMMON_FRENCH,
  kindTitle: { total: 'Éclipse totale de Soleil', annular: 'Éclipse annulaire de Soleil', hybrid: 'Éclipse hybride de Soleil', partial: 'Éclipse partielle de Soleil' },
  kindInSentence: { total: 'éclipse totale de Soleil', annular: 'éclipse annulaire de Soleil', hybrid: 'éclipse hybride de Soleil', partial: 'éclipse partielle de Soleil' },
  centralPhase: { total: 'totalité', annular: 'annularité', hybrid: 'phase centrale' },
  minutesSeconds: { minutes: (minutes, seconds) => `${minutes}${NBSP}min ${seconds}${NBSP}s`, seconds: (seconds) => `${seconds}${NBSP}s` },
  percentText: { percent: (value) => `${value}${NBSP}%`, underOne: `moins de 1${NBSP}%` },
  map: {
    title: (kindTitle, date) => `${kindTitle} · ${date}`,
    greatest: (stamp, coordinates) => `Maximum ${stamp} par ${coordinates}`,
    magnitude: (value) => `magnitude ${value}`,
    centralOnLine: (phase, duration) => `${phase} ${duration} sur la ligne centrale`,
    pathWidth: (km) => `bande de ${km}${NBSP}km de large`,
    separator: ' · ',
    timesIn: (zone) => `Heures en ${zone}, sur 24${NBSP}h${NBSP}; «${NBSP}+1${NBSP}j${NBSP}»${NBSP}: le lendemain de la date du titre.`,
    shading: `Teinte${NBSP}: la plus grande part du disque solaire masquée pendant que le Soleil est levé (bord supérieur au-dessus d’un horizon au niveau de la mer, réfraction standard).`,
    moonRadii: (k1, k2) => `rayon de la Lune k1${NBSP}=${NBSP}${k1} (phases partielles), k2${NBSP}=${NBSP}${k2} (bande)`,
    elements: (deltaT, source, moonRadii) =>
      `Éléments de Bessel calculés avec astronomy-engine${NBSP}; ΔT ${deltaT}${NBSP}s (${source})${NBSP}; ${moonRadii}${NBSP}; bord de la Lune supposé lisse${NBSP}: les limites de la bande peuvent se déplacer d’un kilomètre ou plus.`,
    credits: (basemap, font, generator) => `${basemap}. Caractères${NBSP}: ${font}. Réalisé avec ${generator}.`,
  },
  legend: {
    ramp: [`Soleil masqué à moins de 20${NBSP}%`, `20–40${NBSP}%`, `40–60${NBSP}%`, `60–80${NBSP}%`, `plus de 80${NBSP}% (Soleil levé)`],
    path: { total: 'Bande de totalité', annular: 'Bande d’annularité', hybrid: 'Bande centrale (totale ou annulaire)' },
    centralLine: (clock) => `Ligne centrale, heures en ${clock}`,
    pathLimits: 'Limites de la bande',
    partialLimits: 'Limites de l’éclipse partielle',
    riseSet: 'Éclipse en cours au lever ou au coucher du Soleil',
    greatest: 'Maximum de l’éclipse',
    contours: 'Courbes d’égale obscuration',
    town: 'Lieu marqué',
  },
  riseSet: (contact, sun) => `${contact === 'C1' ? 'début' : 'fin'} au ${sun === 'sunrise' ? 'lever' : 'coucher'} du Soleil`,
  mark: {
    notSeen: (name) => `${name} · invisible`,
    central: (name, kind, time, duration) => `${name} · ${kind === 'total' ? 'totalité' : 'annularité'} ${time}${duration !== undefined ? `, ${duration}` : ''}`,
    partial: (name, percent, time, at) => `${name} · ${percent} ${at === undefined ? 'à' : at === 'sunrise' ? 'au lever,' : 'au coucher,'} ${time}`,
  },
  caption: {
    path: (kind) => ` La bande foncée marque la zone ${kind === 'hybrid' ? 'de l’éclipse centrale (totale par endroits, annulaire ailleurs)' : kind === 'total' ? 'de totalité' : 'd’annularité'}, avec sa ligne centrale et ses heures.`,
    facts: (kind, date, subtitle) => `L’${kind} du ${date}. ${subtitle}.`,
    shading: (path) => `La teinte indique la plus grande part du Soleil masquée, Soleil levé.${path}`,
    altText: (kind, date, path) => `Carte de l’${kind} du ${date}${NBSP}: une teinte, plus foncée là où le Soleil est davantage masqué, indique d’où l’éclipse partielle est visible.${path}`,
    file: (caption, altText) => `${caption}\n\nTexte alternatif${NBSP}: ${altText}\n`,
  },
};

/** The solar diagram in French: the Sun and the Moon from one place at maximum. */
const SOLAR_DIAGRAM: SolarDiagramWords = {
  common: COMMON_FRENCH,
  moments: {
    C1: 'la Lune touche le disque',
    C2: 'la phase centrale commence',
    maximum: 'couverture maximale',
    C3: 'la phase centrale s’achève',
    C4: 'la Lune quitte le disque',
    sunrise: 'lever du Soleil',
    sunset: 'coucher du Soleil',
  },
  momentLabel: { maximum: 'Maximum', sunrise: 'Lever', sunset: 'Coucher' },
  legend: {
    sun: 'le disque du Soleil',
    moonOverSun: 'la Lune devant le Soleil',
    moonOutline: 'le contour de la Lune (invisible dans le ciel)',
  },
  compass: { north: 'N', east: 'E' },
  sunAcross: (arcmin) => `diamètre du Soleil${NBSP}: ${arcmin}′`,
  timesHeading: (zone) => `Heures (${zone ?? 'chacune avec son fuseau'})`,
  sunAltitude: { up: (degrees) => `Soleil à ${degrees}°`, down: 'Soleil couché' },
  kind: { total: 'totale', annular: 'annulaire', hybrid: 'hybride', partial: 'partielle' },
  title: (date, kind, place) => `${date}${NBSP}: éclipse ${kind} de Soleil ${atPlace(place)}`,
  percent: (value) => `${value}${NBSP}%`,
  atMaximum: (stamp, sunAltitude, magnitude, obscuration) =>
    `Au maximum, ${stamp}${sunAltitude === undefined ? ' (le Soleil est alors sous l’horizon)' : `, Soleil à ${sunAltitude}° de hauteur`}${NBSP}: magnitude ${magnitude}, obscuration ${obscuration} du disque solaire.`,
  elsewhere: (kind) => `Ailleurs, l’éclipse est ${kind}.`,
  smallPrint: {
    drawn: (place) => `Le Soleil et la Lune vus depuis ${place} au moment du maximum, à l’échelle${NBSP}: nord en haut, vers le pôle céleste de la date${NBSP}; est à gauche, comme le ciel apparaît quand on lui fait face.`,
    terms: `Magnitude${NBSP}: fraction du diamètre du Soleil couverte${NBSP}; obscuration${NBSP}: fraction de son disque.`,
    times: (zone, deltaT, source) => `Heures en ${zone}, sur 24${NBSP}h. ΔT ${deltaT}${NBSP}s (${source}).`,
    credits: (font, generator) => `Caractères${NBSP}: ${font}. Réalisé avec ${generator}.`,
  },
  greatestPoint: (position) => `le point de l’éclipse maximale (${position})`,
  caption: {
    summary: (time, obscuration, place, magnitude) => `À ${time}, vue depuis ${place}, la Lune couvre ${obscuration} du disque solaire (magnitude ${magnitude}).`,
    altText: (place, positionAngle) =>
      `Schéma à l’échelle du disque du Soleil avec, devant lui, le disque sombre de la Lune, vus depuis ${place} au moment du maximum${NBSP}; le centre de la Lune est à l’angle de position ${positionAngle}°, compté du nord vers l’est${NBSP}; nord en haut, est à gauche${NBSP}; les heures de l’éclipse sont données à côté.`,
    file: (title, summary, caution, altText) => `${title}. ${summary}\n\n${caution}\n\nTexte alternatif${NBSP}: ${altText}\n`,
  },
};


export const SOLAR_FRENCH: SolarWords = {
  body: 'solar',
  common: COMMON_FRENCH,
  text: SOLAR_TEXT,
  figures: SOLAR_FIGURES,
  diagram: SOLAR_DIAGRAM,
  caution: {
    long: {
      viewers: 'Ne regardez le Soleil qu’à travers des lunettes d’éclipse ou des visionneuses conformes à la norme ISO 12312-2, ou observez son image projetée sur un carton.',
      neverUnprotected: `Ne regardez jamais une phase partielle ou annulaire sans protection, quelle que soit la part du Soleil cachée${NBSP}: même un mince croissant peut blesser l’œil.`,
      totality: `Seulement dans la bande de totalité, et seulement pendant que la Lune cache entièrement le Soleil, on peut ôter ses lunettes${NBSP}; remettez-les dès le retour de la première lumière vive.`,
      noTotality: 'Hors de la bande de totalité, il n’est à aucun moment sans danger de regarder sans filtre.',
      optics: `Jumelles, télescopes et appareils photo doivent être munis d’un filtre solaire adapté, fixé à l’avant de l’instrument${NBSP}; ne regardez jamais à travers eux avec de simples lunettes d’éclipse.`,
      children: 'Les enfants ne doivent observer qu’accompagnés d’un adulte.',
      authorities: 'Suivez les conseils des autorités sanitaires locales.',
    },
    short: {
      viewers: `Protégez vos yeux${NBSP}: observez uniquement avec des lunettes d’éclipse ISO 12312-2 ou par projection${NBSP}; ne regardez jamais une phase partielle ou annulaire sans protection, quelle que soit la part du Soleil cachée.`,
      totality: 'Lunettes ôtées seulement pendant que la totalité cache entièrement le Soleil, remises dès la première lumière vive.',
      noTotality: 'Hors de la bande de totalité, il n’est à aucun moment sans danger de regarder sans filtre.',
      both: `Dans la bande, lunettes ôtées seulement pendant que la totalité cache entièrement le Soleil, remises dès la première lumière vive${NBSP}; hors de la bande, il n’est à aucun moment sans danger de regarder sans filtre.`,
      rest: `Pas de jumelles, de télescope ni d’appareil photo sans filtre solaire à l’avant. Enfants accompagnés${NBSP}; suivez les conseils sanitaires locaux.`,
    },
  },
};
