/**
 * La mise en garde pour les yeux lors des éclipses de Soleil, en français, avec
 * tout le contenu de l’anglaise (caution.ts) : filtres ISO 12312-2 ou
 * projection ; jamais une phase partielle ou annulaire sans protection ; la
 * totalité, seulement dans la bande ; instruments munis d’un filtre à l’avant ;
 * enfants accompagnés ; autorités sanitaires locales.
 */
import { COMMON_FRENCH } from '../common/fr.ts';
import { decimalIn, listWords, type ContinentName } from '../common.ts';
import type { SolarWords } from './caution.ts';
import type { SolarKindWord, SolarTextWords } from './text.ts';

const NBSP = '\u00a0';
const plural = new Intl.PluralRules('fr');
const list = (items: readonly string[]) => listWords(items, COMMON_FRENCH);

/** Adjectives after « éclipse » (feminine). */
const KIND_ADJECTIVE: Record<SolarKindWord, string> = { total: 'totale', annular: 'annulaire', hybrid: 'hybride', partial: 'partielle' };
/** The band where the central phase is seen: « bande de totalité », « bande d’annularité », and the trade's « bande de centralité » for a hybrid. */
const BAND: Record<'total' | 'annular' | 'hybrid', string> = {
  total: 'bande de totalité',
  annular: 'bande d’annularité',
  hybrid: 'bande de centralité (totale par endroits, annulaire ailleurs)',
};

/** Text of solar eclipses in French: local events, caption, alt text, contact sheet. */
export const SOLAR_TEXT_FRENCH: SolarTextWords = {
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
    noMap: `Légende et géométrie GeoJSON${NBSP}; pas encore d’image de la carte.`,
  },
};

export const SOLAR_FRENCH: SolarWords = {
  body: 'solar',
  common: COMMON_FRENCH,
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
