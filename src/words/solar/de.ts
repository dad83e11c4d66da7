/**
 * Der Augenschutz-Hinweis für Sonnenfinsternisse auf Deutsch, mit dem ganzen
 * Inhalt des englischen (caution.ts): Filter nach ISO 12312-2 oder Projektion;
 * nie eine partielle oder ringförmige Phase ohne Schutz; die Totalität nur in
 * der Totalitätszone; Instrumente mit Frontfilter; Kinder nur mit
 * Erwachsenen; die örtlichen Gesundheitsbehörden.
 */
import { COMMON_GERMAN } from '../common/de.ts';
import { decimalIn, listWords } from '../common.ts';
import type { SolarWords } from './caution.ts';
import type { SolarKindWord, SolarTextWords } from './text.ts';

const list = (items: readonly string[]) => listWords(items, COMMON_GERMAN);
/** A number the code writes with a full stop ("1.042"), with the German decimal comma. */
const decimal = (text: string) => decimalIn(text, COMMON_GERMAN);

const KIND_TITLE: Record<SolarKindWord, string> = {
  total: 'Totale Sonnenfinsternis',
  annular: 'Ringförmige Sonnenfinsternis',
  hybrid: 'Hybride Sonnenfinsternis (teils total, teils ringförmig)',
  partial: 'Partielle Sonnenfinsternis',
};
/** The adjective in the genitive and dative feminine: „der totalen Sonnenfinsternis“. */
const KIND_OBLIQUE: Record<SolarKindWord, string> = { total: 'totalen', annular: 'ringförmigen', hybrid: 'hybriden', partial: 'partiellen' };
/** The central path, after „in der“ (dative feminine); „Totalitätszone“ as in the caution. */
const PATH_IN = {
  total: 'Totalitätszone',
  annular: 'Zone der Ringförmigkeit',
  hybrid: 'zentralen Zone (teils total, teils ringförmig)',
} as const;
/** The same path as subject (nominative). */
const PATH_SUBJECT = {
  total: 'Die Totalitätszone',
  annular: 'Die Zone der Ringförmigkeit',
  hybrid: 'Die zentrale Zone (teils total, teils ringförmig)',
} as const;
/** The central phase with its article. */
const CENTRAL_PHASE = { total: 'die Totalität', annular: 'die Ringphase', hybrid: 'die zentrale Phase' } as const;

const TEXT: SolarTextWords = {
  common: COMMON_GERMAN,
  events: {
    C1: 'Mond beginnt, die Sonne zu bedecken',
    C2: 'zentrale Phase beginnt',
    maximum: 'Maximum der Finsternis',
    C3: 'zentrale Phase endet',
    C4: 'Mond verlässt die Sonnenscheibe',
    sunrise: 'Sonnenaufgang',
    sunset: 'Sonnenuntergang',
  },
  central: { total: 'Totalität', annular: 'Ringphase' },
  caption: {
    title: (kind, date) => `${KIND_TITLE[kind]} vom ${date}.`,
    greatest: (stamp, where, alt) =>
      `Maximum der Finsternis um ${stamp} bei ${where}; ${Math.round(alt) <= 0 ? 'dort steht die Sonne am Horizont' : `dort steht die Sonne ${Math.round(alt)}° hoch`}.`,
    centralFacts: (kind, duration, width) => {
      const zone = kind === 'total' ? 'die Totalitätszone' : 'die Zone';
      const wide = width === undefined ? undefined : `${Math.round(width)} km breit`;
      if (duration && wide) return `Dort dauert ${CENTRAL_PHASE[kind]} ${duration}, und ${zone} ist ${wide}.`;
      if (duration) return `Dort dauert ${CENTRAL_PHASE[kind]} ${duration}.`;
      return wide ? `Dort ist ${zone} ${wide}.` : '';
    },
    nonCentral: (kind) => `Die Achse des Mondschattens verfehlt die Erde: Der ${kind === 'total' ? 'Kernschatten' : 'verlängerte Kernschatten (Antumbra)'} streift sie nur in Polnähe.`,
    partialOnly: (magnitude) => `Nur der Halbschatten des Mondes erreicht die Erde: Die Finsternis ist überall partiell, ihre Größe beträgt höchstens ${decimal(magnitude)}.`,
    pathCrosses: (kind, countries, more) =>
      `Länder in der ${PATH_IN[kind]}: ${list(more > 0 ? [...countries, more === 1 ? 'ein weiteres' : `${more} weitere`] : countries)}.`,
    pathOverSea: (kind) => `${PATH_SUBJECT[kind]} liegt ganz über offenem Meer und berührt kein Land.`,
    // Dative, after the „in“ of partialSeen: „in Afrika, großen Teilen von Europa und Teilen von Asien“.
    continent: (name, share) => (share === 'whole' ? name : share === 'most' ? `großen Teilen von ${name}` : `Teilen von ${name}`),
    partialSeen: (where) => `Eine partielle Finsternis ist in ${where} zu sehen.`,
    citiesIntro: 'Unter den größten Städten:',
    cityCentral: (city, kind, duration, from) => `${city} erlebt ab ${from} ${duration} lang die ${kind === 'total' ? 'Totalität' : 'Ringphase'}`,
    cityPartial: (city, percent, at, when) =>
      `${city} sieht ${when === 'maximum' ? `um ${at}` : when === 'sunrise' ? `bei Sonnenaufgang um ${at}` : `bei Sonnenuntergang um ${at}`} ${percent} der Sonne bedeckt`,
    altText: (kind, date, path, partial) => [`Karte der ${KIND_OBLIQUE[kind]} Sonnenfinsternis vom ${date}.`, path, partial].filter((p) => p).join(' '),
    file: (caption, alt) => `${caption}\n\nAlternativtext: ${alt}\n`,
  },
  sheet: {
    title: (lunarToo, from, last) => `${lunarToo ? 'Mond- und Sonnenfinsternisse' : 'Sonnenfinsternisse'} vom ${from} bis ${last}`,
    kind: { total: 'totale Sonnenfinsternis', annular: 'ringförmige Sonnenfinsternis', hybrid: 'hybride Sonnenfinsternis', partial: 'partielle Sonnenfinsternis' },
    magnitude: (value) => `Größe ${decimal(value)}`,
    central: (kind, duration) => `${kind === 'total' ? 'Totalität' : kind === 'annular' ? 'Ringphase' : 'zentrale Phase'} ${duration} im Maximum`,
    width: (km) => `Zonenbreite ${km} km`,
    saros: (n) => `Saros ${n}`,
    noMap: 'Bildunterschrift und GeoJSON-Geometrie; noch kein Kartenbild.',
  },
};

export const SOLAR_GERMAN: SolarWords = {
  body: 'solar',
  common: COMMON_GERMAN,
  caution: {
    long: {
      viewers: 'Blicken Sie nur durch Finsternisbrillen oder Handsichtgeräte, die der Norm ISO 12312-2 entsprechen, in die Sonne, oder betrachten Sie ihr auf einen Karton projiziertes Bild.',
      neverUnprotected: 'Blicken Sie nie ohne Schutz auf eine partielle oder ringförmige Phase, ganz gleich, wie viel der Sonne bedeckt ist: Schon eine schmale Sichel kann das Auge verletzen.',
      totality: 'Nur in der Totalitätszone und nur solange der Mond die Sonne vollständig verdeckt, darf der Schutz abgenommen werden; setzen Sie ihn beim ersten hellen Licht sofort wieder auf.',
      noTotality: 'Außerhalb der Totalitätszone ist es zu keinem Zeitpunkt sicher, ohne Filter hinzusehen.',
      optics: 'Ferngläser, Teleskope und Kameras brauchen einen geeigneten Sonnenfilter vor der Öffnung des Instruments; schauen Sie nie allein mit einer Finsternisbrille hindurch.',
      children: 'Kinder sollten nur in Begleitung eines Erwachsenen beobachten.',
      authorities: 'Folgen Sie den Empfehlungen Ihrer örtlichen Gesundheitsbehörden.',
    },
    short: {
      viewers: 'Augenschutz: nur durch Finsternisbrillen nach ISO 12312-2 oder per Projektion beobachten; nie ohne Schutz auf eine partielle oder ringförmige Phase blicken, ganz gleich, wie viel der Sonne bedeckt ist.',
      totality: 'Schutz nur ab, solange die Totalität die Sonne vollständig verdeckt, beim ersten hellen Licht wieder auf.',
      noTotality: 'Außerhalb der Totalitätszone ist es zu keinem Zeitpunkt sicher, ohne Filter hinzusehen.',
      both: 'In der Totalitätszone Schutz nur ab, solange die Totalität die Sonne vollständig verdeckt, beim ersten hellen Licht wieder auf; außerhalb ist es zu keinem Zeitpunkt sicher, ohne Filter hinzusehen.',
      rest: 'Keine Ferngläser, Teleskope oder Kameras ohne Sonnenfilter vor dem Objektiv. Kinder beaufsichtigen; örtliche Gesundheitshinweise beachten.',
    },
  },
};
