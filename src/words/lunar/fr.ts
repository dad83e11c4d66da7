/**
 * Les éclipses de Lune en français : le tableau, l’horaire local, le
 * calendrier, le résumé, la légende et le texte alternatif, la planche
 * contact, les mots des figures et ceux du schéma de l’ombre. Typographie française (espace insécable
 * avant « : » et « ; », guillemets « »). Reviewed wording; the trade's contact
 * names (P1…U4), Danjon, Chauvenet, ΔT and saros stay as astronomers write them.
 */
import { COMMON_FRENCH } from '../common/fr.ts';
import { meantOnlyFor } from '../common.ts';
import type { LunarDiagramWords } from './diagram.ts';
import type { LunarFigureWords } from './figures.ts';
import type { LunarWords } from './text.ts';

const NBSP = '\u00a0';
const plural = new Intl.PluralRules('fr');
const counted = (count: number, one: string, other: string) => `${count} ${plural.select(count) === 'one' ? one : other}`;

const FIGURES: LunarFigureWords = {
  common: COMMON_FRENCH,
  nakedEye: meantOnlyFor('lunar', 'Une éclipse de Lune s’observe sans danger à l’œil nu.'),
  kindTitle: { total: 'Éclipse totale de Lune', partial: 'Éclipse partielle de Lune', penumbral: 'Éclipse de Lune par la pénombre' },
  map: {
    title: (kindTitle, date) => `${kindTitle} · ${date}`,
    greatest: (stamp) => `Maximum ${stamp}`,
    penumbralMagnitude: (value) => `magnitude pénombrale ${value}`,
    penumbralPhase: (duration, span) => `phase de pénombre ${duration} (${span})`,
    umbralMagnitude: (value) => `magnitude ombrale ${value}`,
    totality: (duration, span) => `totalité ${duration} (${span})`,
    inUmbra: (duration, span) => `dans l’ombre ${duration} (${span})`,
    timesIn: (zone) => `Heures en ${zone}, sur 24${NBSP}h, arrondies à la minute${NBSP}; «${NBSP}+1${NBSP}j${NBSP}»${NBSP}: le lendemain de la date du titre.`,
    shadow: (convention, deltaT) => `Ombre${NBSP}: convention de ${convention}${NBSP}; ΔT ${deltaT}.`,
    moonUp: `Lune levée${NBSP}: bord supérieur au-dessus d’un horizon au niveau de la mer, réfraction standard.`,
    credits: (basemap, font, generator) => `${basemap}. Caractères${NBSP}: ${font}. Réalisé avec ${generator}.`,
  },
  legend: {
    zonesOf: { penumbral: 'l’éclipse', umbral: 'la phase ombrale' },
    codesP: 'P1/P4 la Lune entre dans l’ombre extérieure (pénombre) / en sort',
    codesU: 'U1/U4 l’ombre',
    codesTotality: 'U2/U3 début/fin de la totalité',
    zoneAll: (phase) => `Lune levée pendant toute ${phase}`,
    zoneSets: (phase) => `La Lune se couche pendant ${phase}`,
    zoneRises: (phase) => `La Lune se lève pendant ${phase}`,
    zoneNone: 'Lune sous l’horizon du début à la fin',
    boundaryStrong: (phase) => `Lever/coucher de la Lune au début et à la fin de ${phase}`,
    boundaryLight: 'aux autres étapes',
    countedPhase: { totality: 'totalité', umbral: 'phase ombrale', penumbral: 'phase de pénombre' },
    field: (phase) => `minutes de ${phase} avec la Lune levée`,
    centre: 'Lune au zénith au maximum',
    townOwnClock: `ville marquée${NBSP}: la phase clé à son heure locale`,
    town: `ville marquée${NBSP}: la phase clé`,
    codes: (codes) => `petites étiquettes sur les lignes${NBSP}: ${codes}`,
  },
  mark: { greatest: 'maximum', rises: 'lever', sets: 'coucher', notSeen: 'invisible' },
  stage: {
    P1: 'au début de la faible ombre extérieure',
    P1Penumbral: 'au début de l’éclipse',
    U1: 'au début de l’éclipse partielle',
    U2: 'au début de la totalité',
    greatest: 'au maximum',
    U3: 'à la fin de la totalité',
    U4: 'à la fin de l’éclipse partielle',
    P4: 'à la fin de la faible ombre extérieure',
    P4Penumbral: 'à la fin de l’éclipse',
  },
  boundaryLabel: (rising, stage, time) => `La Lune ${rising ? 'se lève' : 'se couche'} ${stage} · ${time}`,
  sky: {
    classes: { day: 'jour', civil: 'crépuscule civil', nautical: 'crépuscule nautique', astronomical: 'crépuscule astronomique', night: 'nuit' },
    phases: { penumbral: 'phase de pénombre', partial: 'phase partielle', total: 'totalité' },
    horizon: 'horizon',
    kinds: { total: 'éclipse totale de Lune', partial: 'éclipse partielle de Lune', penumbral: 'éclipse de Lune par la pénombre' },
    eventName: { greatest: 'Maximum', moonrise: 'Lever de la Lune', moonset: 'Coucher de la Lune' },
    title: (kind, place, date) => `L’${kind} vue de ${place} · ${date}`,
    localTime: (zone) =>
      `Heure locale${NBSP}: ${zone}, sur 24${NBSP}h. Hauteur du centre de la Lune avec la réfraction standard, au-dessus d’un horizon au niveau de la mer${NBSP}; lettres sous la trajectoire${NBSP}: où regarder (point cardinal, par ex. ESE = est-sud-est).`,
    shadow: (convention, deltaT, source) => `Ombre${NBSP}: convention de ${convention}${NBSP}; ΔT ${deltaT.toFixed(1)}${NBSP}s (${source}).`,
    credits: (places, font, generator) => `${places} Caractères${NBSP}: ${font}. Réalisé avec ${generator}.`,
    altText: (place) =>
      `Graphique de la hauteur de la Lune au-dessus de l’horizon au fil de la nuit à ${place}, heure locale en abscisse, avec les phases de l’éclipse marquées sur sa trajectoire et le crépuscule en fond.`,
    file: (title, summary, alt) => `${title}. ${summary}\n\nTexte alternatif${NBSP}: ${alt}\n`,
  },
};

const DIAGRAM_KIND_TITLE = { total: 'Éclipse totale de Lune', partial: 'Éclipse partielle de Lune', penumbral: 'Éclipse de Lune par la pénombre' } as const;

/** The shadow diagram in French: the Moon's path through the Earth's shadow. */
const DIAGRAM: LunarDiagramWords = {
  common: COMMON_FRENCH,
  moments: {
    P1: 'touche la pénombre',
    U1: 'touche l’ombre',
    U2: 'entièrement dans l’ombre',
    greatest: 'au plus près du centre de l’ombre',
    U3: 'commence à sortir de l’ombre',
    U4: 'sortie de l’ombre',
    P4: 'sortie de la pénombre',
  },
  legend: {
    penumbra: `pénombre${NBSP}: Soleil en partie caché`,
    umbra: `ombre${NBSP}: Soleil entièrement caché`,
    moonAtGreatest: 'la Lune au maximum',
    moonAtContact: 'la Lune à chaque contact',
    path: `trajet de la Lune${NBSP}; la flèche${NBSP}: son sens de déplacement`,
  },
  compass: { north: 'N', east: 'E' },
  greatest: 'Maximum',
  moonAcross: (arcmin) => `diamètre de la Lune${NBSP}: ${arcmin}′`,
  timesHeading: (zone) => `Heures (${zone ?? 'chacune avec son fuseau'})`,
  kindTitle: DIAGRAM_KIND_TITLE,
  // « ombre » is the umbra throughout: an eclipse by the penumbra is said to cross the penumbra only.
  title: (kindTitle, date) => `${kindTitle} du ${date}${NBSP}: la Lune dans ${kindTitle === DIAGRAM_KIND_TITLE.penumbral ? 'la pénombre' : 'l’ombre'} de la Terre`,
  shortTitle: (kindTitle, date) => `${kindTitle} du ${date}`,
  depth: { penumbral: (m) => `magnitude pénombrale ${m}`, umbral: (m) => `magnitude ombrale ${m}` },
  longest: { totality: (d) => `totalité ${d}`, partial: (d) => `phase partielle ${d}`, penumbral: (d) => `phase de pénombre ${d}` },
  subtitle: (time, depth, longest, zone) => `Le trajet de la Lune, au plus près du centre de l’ombre à ${time} (${depth}, ${longest}). Heures${NBSP}: ${zone}.`,
  smallPrint: {
    frame: `Vu depuis le centre de la Terre, l’ombre et la pénombre tenues fixes${NBSP}: la ligne est le trajet calculé de la Lune par rapport à elles.`,
    orientation: `Nord en haut, vers le pôle céleste de la date${NBSP}; est à gauche, comme le ciel apparaît quand on lui fait face.`,
    shadow: (convention, deltaT, source, gamma) => `Ombre${NBSP}: convention de ${convention}, cercles au maximum${NBSP}; ΔT ${deltaT}${NBSP}s (${source})${NBSP}; gamma ${gamma}.`,
    credits: (font, generator) => `Caractères${NBSP}: ${font}. Réalisé avec ${generator}.`,
  },
  nakedEye: FIGURES.nakedEye,
  caption: {
    wholly: (from, to) => ` Elle est entièrement dans l’ombre de ${from} à ${to}.`,
    partly: (from, to) => ` Elle est en partie dans l’ombre de ${from} à ${to}.`,
    never: ' Elle n’atteint jamais l’ombre.',
    summary: (p1, greatest, p4, inner) => `La Lune entre dans la pénombre de la Terre à ${p1}, passe au plus près du centre de l’ombre à ${greatest} et quitte la pénombre à ${p4}.${inner}`,
    altText: (side) =>
      `Schéma de deux cercles concentriques, la pénombre de la Terre, plus claire, autour de son ombre, plus sombre, traversés de droite à gauche par le trajet de la Lune, qui passe au ${side === 'north' ? 'nord' : 'sud'} du centre${NBSP}; la Lune est dessinée au début et à la fin de chaque phase et au maximum, chaque fois avec son heure. Nord en haut, est à gauche.`,
    file: (title, summary, altText) => `${title}. ${summary}\n\nTexte alternatif${NBSP}: ${altText}\n`,
  },
  inset: { heading: 'Trajet de la Lune · N en haut, E à gauche' },
};

export const LUNAR_FRENCH: LunarWords = {
  body: 'lunar',
  common: COMMON_FRENCH,
  figures: FIGURES,
  diagram: DIAGRAM,
  kindTitle: { total: 'Éclipse totale de Lune', partial: 'Éclipse partielle de Lune', penumbral: 'Éclipse de Lune par la pénombre' },
  kind: { total: 'éclipse totale de Lune', partial: 'éclipse partielle de Lune', penumbral: 'éclipse de Lune par la pénombre' },
  convention: { danjon: 'Danjon', chauvenet: 'Chauvenet' },
  nakedEyeInCalendar: meantOnlyFor('lunar', 'S’observe sans danger à l’œil nu. Prévisions, si la météo le permet.'),
  table: {
    kind: { total: 'totale', partial: 'partielle', penumbral: 'pénombrale' },
    catalogueHeader: ['Date', 'Type', 'Maximum (UTC)', 'Mag. ombrale', 'Mag. pénombrale', 'Gamma', 'Dans l’ombre', 'Totalité', 'Saros'],
    absent: '–',
    julianBeside: (isoDate, julianDate) => `${isoDate} (julien${NBSP}: ${julianDate})`,
    eclipses: (count) => counted(count, 'éclipse de Lune', 'éclipses de Lune'),
    catalogueTitle: (counted, from, to) => `${counted} du ${from} au ${to} (exclu)`,
    catalogueTimes: (convention, julianNote) => `Heures UTC, arrondies à la minute. Ombre${NBSP}: convention de ${convention}.${julianNote}`,
    catalogueJulian: ` Dates${NBSP}: calendrier grégorien proleptique${NBSP}; avant le 15 octobre 1582, la date julienne suit.`,
    deltaTSpan: ([least, most]) => (least === most ? `${least.toFixed(1)}${NBSP}s` : `${least.toFixed(1)}–${most.toFixed(1)}${NBSP}s`),
    deltaTNote: (span, sources, model) => `ΔT ${span} (${sources}${NBSP}; modèle${NBSP}: ${model}).`,
    deltaTModelOnly: (model) => `Modèle de ΔT${NBSP}: ${model}.`,
  },
  local: {
    events: {
      P1: 'la Lune entre dans la pénombre',
      U1: 'début de l’éclipse partielle',
      U2: 'début de la totalité',
      greatest: 'maximum de l’éclipse',
      U3: 'fin de la totalité',
      U4: 'fin de l’éclipse partielle',
      P4: 'la Lune quitte la pénombre',
      moonrise: 'lever de la Lune',
      moonset: 'coucher de la Lune',
    },
    eventLabel: { greatest: 'Maximum', moonrise: 'Lever', moonset: 'Coucher' },
    header: (zone) => ['Étape', 'Ce qui se passe', `Heure locale (${zone})`, 'UTC', 'Haut. Lune', 'Az. Lune', 'Lune levée', 'Haut. Soleil', 'Ciel'],
    yes: 'oui',
    no: 'non',
    sky: { day: 'jour', civil: 'civil', nautical: 'nautique', astronomical: 'astronomique', night: 'nuit' },
    title: (kindTitle, id, julianDate, place, coordinates, zone) =>
      `${kindTitle} ${id}${julianDate ? ` (julien${NBSP}: ${julianDate})` : ''} vue de ${place} (${coordinates}${NBSP}; ${zone})`,
    timeNote: (zone, julianNote) =>
      `Heure locale${NBSP}: ${zone}. Heures arrondies à la minute. Hauteur de la Lune${NBSP}: celle de son centre, avec réfraction à partir de −1° vrai, géométrique en dessous${NBSP}; «${NBSP}levée${NBSP}»${NBSP}: bord supérieur au-dessus d’un horizon au niveau de la mer.${julianNote}`,
    julianNote: ` Dates${NBSP}: calendrier grégorien proleptique (la date julienne figure à côté de celle de l’éclipse).`,
    shadowNote: (convention, deltaT, source, predictions) => `Ombre${NBSP}: convention de ${convention}${NBSP}; ΔT ${deltaT.toFixed(1)}${NBSP}s (${source}). ${predictions}`,
  },
  calendar: {
    phaseTitle: { penumbral: 'Éclipse de Lune par la pénombre', partial: 'Phases partielles de l’éclipse de Lune', total: 'Totalité' },
    cutToMoonUp: ' (la partie où la Lune est au-dessus de l’horizon)',
    cutToMoonUpShort: ' (Lune levée)',
    description: (title, id, cut, summary, nakedEye) => `${title} du ${id}${cut}. ${summary} ${nakedEye}`,
    notSeenTitle: (place) => `Éclipse de Lune, invisible depuis ${place}`,
    notSeenDescription: (summary) => `${summary} Cette entrée ne fait que marquer la date${NBSP}: il n’y a rien à voir d’ici.`,
  },
  summary: {
    compass: ['au nord', 'au nord-est', 'à l’est', 'au sud-est', 'au sud', 'au sud-ouest', 'à l’ouest', 'au nord-ouest'],
    position: (altitudeDeg, direction) => (altitudeDeg < 15 ? `basse ${direction}` : altitudeDeg < 45 ? direction : `haute ${direction}`),
    aboveHorizon: (degrees) => `à ${degrees}° au-dessus de l’horizon`,
    phaseState: {
      before: 'avant le début de l’éclipse',
      penumbral: 'dans la faible phase de pénombre',
      partial: 'en partie éclipsée',
      total: 'totalement éclipsée',
      after: 'une fois l’éclipse terminée',
    },
    contacts: { U1: 'début de la phase partielle', U2: 'début de la totalité', U3: 'fin de la totalité', U4: 'fin de la phase partielle' },
    penumbralContacts: { P1: 'début de la phase de pénombre', P4: 'fin de la phase de pénombre' },
    from: (place) => `Depuis ${place},`,
    notSeen: `l’éclipse est invisible${NBSP}: la Lune reste sous l’horizon du début à la fin.`,
    daylight: ' Une partie a lieu de jour, quand la Lune est difficile à voir.',
    rises: 'se lève',
    risesAgain: 'se lève de nouveau',
    sets: 'se couche',
    moves: (verb, time, direction, state) => `la Lune ${verb} à ${time}${direction === undefined ? '' : ` ${direction}`}, ${state}`,
    mainSpan: (penumbral, span, totality, where) =>
      `${penumbral ? 'phase de pénombre' : 'phases partielles'} ${span}${totality === undefined ? '' : `, totalité ${totality}`}, la Lune ${where} au maximum`,
    greatestAt: (time, where) => `maximum de l’éclipse à ${time}, la Lune ${where}`,
    contactAt: (contact, time) => `${contact} à ${time}`,
    inView: {
      wholePenumbral: 'toute l’éclipse par la pénombre est visible',
      whole: 'toute l’éclipse est visible',
      partPenumbral: 'une partie de l’éclipse par la pénombre est visible',
      allPartialAndTotality: 'toutes les phases partielles et la totalité sont visibles',
      allPartial: 'toute la phase partielle est visible',
      onlyPenumbral: 'seule la faible phase de pénombre est visible',
      partPartial: 'une partie de la phase partielle est visible',
      allTotalityPartPartial: 'toute la totalité est visible, et une partie des phases partielles',
      partTotality: 'une partie de la totalité est visible',
      partPartialNoTotality: 'une partie de la phase partielle est visible, mais pas la totalité',
    },
  },
  caption: {
    title: (kindTitle, date) => `${kindTitle} du ${date}.`,
    penumbralFacts: (stamp, magnitude, duration, span) =>
      `Maximum de l’éclipse à ${stamp}, magnitude pénombrale ${magnitude}${NBSP}; la Lune reste ${duration} dans la pénombre (${span}), un léger assombrissement.`,
    umbralFacts: (stamp, magnitude, totality, duration, span) =>
      `Maximum de l’éclipse à ${stamp}, magnitude ombrale ${magnitude}${totality ? `${NBSP}; la totalité dure ${totality.duration} (${totality.span})` : ''}${NBSP}; la Lune reste ${duration} dans l’ombre (${span}).`,
    zone: {
      'sees-all': 'Visible du début à la fin depuis',
      'sets-during': 'Coucher de la Lune en cours d’éclipse depuis',
      'rises-during': 'Lever de la Lune en cours d’éclipse depuis',
    },
    zoneInAltText: {
      'sees-all': 'du début à la fin depuis',
      'sets-during': 'coucher de la Lune en cours d’éclipse depuis',
      'rises-during': 'lever de la Lune en cours d’éclipse depuis',
    },
    continent: (name, share) => (share === 'whole' ? name : share === 'most' ? `la majeure partie de ${name}` : `une partie de ${name}`),
    somewhere: 'certaines régions du monde',
    including: (names) => ` (notamment ${names})`,
    hidden: (where) => `Elle est invisible depuis ${where}.`,
    altText: (kind, date, parts, hidden) => `Carte du monde indiquant d’où l’on peut voir l’${kind} du ${date}${NBSP}: ${parts}${hidden === undefined ? '' : `${NBSP}; pas depuis ${hidden}`}.`,
    file: (caption, altText) => `${caption}\n\nTexte alternatif${NBSP}: ${altText}\n`,
  },
  sheet: {
    title: (from, last) => `Éclipses de Lune du ${from} au ${last}`,
    roles: { map: 'carte', caption: 'légende', thumbnail: 'vignette', local: 'tableau local', sky: 'vue d’ici', diagram: 'schéma' },
    fileNote: (role, kib) => `${role}, ${kib}${NBSP}Kio`,
    greatestUtc: (hhmm) => `Maximum ${hhmm} UTC`,
    greatestLocal: (stamp) => `Maximum ${stamp}`,
    penumbralMagnitude: (value) => `magnitude pénombrale ${value}`,
    umbralMagnitude: (value) => `magnitude ombrale ${value}`,
    totality: (duration) => `totalité ${duration}`,
    inUmbra: (duration) => `dans l’ombre ${duration}`,
    penumbralPhase: (duration) => `phase de pénombre ${duration}`,
    saros: (n) => `saros ${n}`,
    thumbnailAlt: (kind, date) => `Carte de visibilité de l’${kind} du ${date}`,
    eclipses: (count) => counted(count, 'éclipse', 'éclipses'),
    header: (counted, zone, styleHash, tool) => `${counted} · dates et heures en ${zone} · style ${styleHash} · ${tool}`,
    credits: `Fond de carte${NBSP}: Natural Earth via world-atlas (domaine public). Lieux${NBSP}: GeoNames (CC BY 4.0). Voir manifest.json et catalogue.csv.`,
  },
};
