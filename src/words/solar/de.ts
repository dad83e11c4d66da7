/**
 * Sonnenfinsternisse auf Deutsch: der Augenschutz-Hinweis mit dem ganzen
 * Inhalt des englischen (safety.ts: Filter nach ISO 12312-2 oder Projektion;
 * nie eine partielle oder ringförmige Phase ohne Schutz; die Totalität nur in
 * der Totalitätszone; Instrumente mit Frontfilter; Kinder nur mit
 * Erwachsenen; die örtlichen Gesundheitsbehörden), dazu Ortstabelle,
 * Zusammenfassung, Kalender, Bildunterschrift, Kontaktbogen, Karte und
 * Diagramm. Reviewed wording, in the terms of the lunar German catalogue;
 * the trade's contact names (C1…C4), ΔT and Saros stay as astronomers write
 * them.
 */
import { COMMON_GERMAN } from '../common/de.ts';
import { decimalIn, listWords } from '../common.ts';
import type { SolarWords } from './caution.ts';
import type { SolarDiagramWords } from './diagram.ts';
import type { SolarFigureWords } from './figures.ts';
import type { SolarKindWord, SolarTextWords } from './text.ts';

const plural = new Intl.PluralRules('de');
const counted = (count: number, one: string, other: string) => `${count} ${plural.select(count) === 'one' ? one : other}`;
const list = (items: readonly string[]) => listWords(items, COMMON_GERMAN);
/** A number the code writes with a full stop ("1.042"), with the German decimal comma. */
const decimal = (text: string) => decimalIn(text, COMMON_GERMAN);

const KIND_TITLE: Record<SolarKindWord, string> = {
  total: 'Totale Sonnenfinsternis',
  annular: 'Ringförmige Sonnenfinsternis',
  hybrid: 'Hybride Sonnenfinsternis (teils total, teils ringförmig)',
  partial: 'Partielle Sonnenfinsternis',
};
/** Kind titles without the hybrid's gloss: the local table's heading. */
const KIND_TITLE_SHORT: Record<SolarKindWord, string> = {
  total: 'Totale Sonnenfinsternis',
  annular: 'Ringförmige Sonnenfinsternis',
  hybrid: 'Hybride Sonnenfinsternis',
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
    continent: (english, share) => {
      const name = (COMMON_GERMAN.continents as Readonly<Record<string, string>>)[english] ?? english;
      return share === 'whole' ? name : share === 'most' ? `großen Teilen von ${name}` : `Teilen von ${name}`;
    },
    partialSeen: (where) => `Eine partielle Finsternis ist in ${where} zu sehen.`,
    citiesIntro: 'Unter den größten Städten:',
    cityCentral: (city, kind, duration, from) => `${city} erlebt die ${kind === 'total' ? 'Totalität' : 'Ringphase'} ${duration} lang, ab ${from}`,
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
    noMap: 'Bildunterschrift und GeoJSON-Geometrie; der Hausstil verlangt kein Kartenbild.',
    thumbnailAlt: (kind, date) => `Sichtbarkeitskarte: ${kind} vom ${date}`,
    // The German lunar kind already names the Moon („totale Mondfinsternis“).
    lunarKind: (kind) => kind,
  },
  list: {
    header: ['Datum', 'Gestirn', 'Art', 'Maximum (UTC)', 'Größe', 'Halbsch.-Gr.', 'Gamma', 'Im Kernschatten', 'Totalität', 'Zentral', 'Zone', 'Saros'],
    body: { lunar: 'Mond', solar: 'Sonne' },
    kind: { total: 'total', annular: 'ringförmig', hybrid: 'hybrid', partial: 'partiell' },
    eclipses: (lunar, solar) => `${counted(lunar, 'Mondfinsternis', 'Mondfinsternisse')} und ${counted(solar, 'Sonnenfinsternis', 'Sonnenfinsternisse')}`,
    solarEclipses: (count) => counted(count, 'Sonnenfinsternis', 'Sonnenfinsternisse'),
    magnitudeNote: 'Größe: beim Mond die des Kernschattens; bei der Sonne der bedeckte Anteil ihres Durchmessers, am Ort des Maximums.',
    solarNote: (k1, k2) =>
      `Sonne: Zentral = Dauer der Totalität oder Ringphase auf der Zentrallinie im Maximum, Zone = deren Breite dort; Mondradius k1 = ${k1} (Halbschatten), k2 = ${k2} (Kernschatten und Antumbra).`,
    central: (minutes, seconds) => `${minutes}min ${seconds}s`,
    pathWidth: (km) => `${km} km`,
  },
  // SI unit symbols (DIN 1301) for lengths to the second: no abbreviation point to clash with a sentence's full stop.
  minutesSeconds: { minutes: (minutes, seconds) => `${minutes} min ${seconds} s`, seconds: (seconds) => `${seconds} s` },
  percent: (value) => `${value} %`,
  centralEdge: { edge: (central, edge) => `${central} ${edge === 'begins' ? 'beginnt' : 'endet'}`, unseen: 'zentrale Phase (Sonne unter dem Horizont)' },
  local: {
    eventLabel: { maximum: 'Maximum', sunrise: 'Aufgang', sunset: 'Untergang' },
    header: (zone) => ['Ereignis', 'Was geschieht', `Ortszeit (${zone})`, 'UTC', 'Sonnenhöhe', 'Sonnenazimut', 'Sonne sichtbar'],
    yes: 'ja',
    no: 'nein',
    title: (kind, id, place, coordinates, zone) => `${KIND_TITLE_SHORT[kind]} ${id} von ${place} aus (${coordinates}; ${zone})`,
    seen: {
      total: (m) => `Hier zu sehen: total (Größe ${m}).`,
      annular: (m, o) => `Hier zu sehen: ringförmig (Größe ${m}, ${o} der Sonnenscheibe bedeckt).`,
      partial: (m, o) => `Hier zu sehen: partiell (Größe ${m}, im Maximum ${o} der Sonnenscheibe bedeckt).`,
      partialLow: (o) => `Hier zu sehen: partiell, solange die Sonne über dem Horizont steht, höchstens ${o} der Sonnenscheibe bedeckt (das Maximum fällt in die Zeit, in der die Sonne unter dem Horizont steht).`,
      none: 'Hier ist nichts zu sehen.',
    },
    timeNote: (zone) =>
      `Ortszeit: ${zone}. Zeiten auf die Sekunde. Sonnenhöhe: die ihrer Mitte, mit Refraktion (Saemundsson) ab einer wahren Höhe von −1°, darunter geometrisch; „sichtbar“: oberer Rand über einem Horizont auf Meereshöhe.`,
    modelNote: (k1, k2, deltaT, source, predictions) =>
      `Mondradius k1 = ${k1} (Halbschatten: C1, C4, Größe), k2 = ${k2} (Kernschatten und Antumbra: C2, C3); glatter Mondrand, Beobachter auf Meereshöhe; ΔT ${deltaT} s (${source}). ${predictions}`,
    safetyHeading: { plain: 'AUGENSCHUTZ', markdown: 'Augenschutz' },
  },
  summary: {
    missed: (place, id) => `In ${place} ist am ${id} keine Sonnenfinsternis zu sehen: Der Schatten des Mondes zieht vorbei.`,
    sunDown: (place, span) => `In ${place} steht die Sonne während der ganzen Finsternis (${span}) unter dem Horizont: Es ist nichts zu sehen.`,
    central: (place, kind, duration, from, to) =>
      kind === 'total'
        ? `In ${place} ist die Sonne von ${from} bis ${to} total verfinstert, ${duration} lang.`
        : `In ${place} steht der Mond von ${from} bis ${to} ganz vor der Sonnenscheibe, ${duration} lang: Ein heller Ring der Sonne bleibt sichtbar.`,
    partial: (place, percent) => `In ${place} ist die Sonne partiell verfinstert: Ihre Scheibe wird höchstens zu ${percent} bedeckt.`,
    // `altitude` below the horizon comes signed; „unter dem Horizont“ already says so.
    runs: (span, localDate, stamp, altitude, up) =>
      `Verlauf der Finsternis: ${span}${localDate === undefined ? '' : ` am ${localDate}`}; Maximum um ${stamp}, die Sonne steht dann ${up ? `${altitude}° hoch` : `${altitude.replace(/^[-−]/, '')}° unter dem Horizont`}.`,
    risesEclipsed: (stamp) => `Die Sonne geht um ${stamp} bereits verfinstert auf.`,
    setsEclipsed: (stamp) => `Die Sonne geht um ${stamp} noch verfinstert unter.`,
    nearEdge: (km) =>
      `Dieser Ort liegt weniger als ${km} km vom Rand der Zone entfernt: Der unebene Mondrand und die Unsicherheit von ΔT können den Rand um einen Kilometer oder mehr verschieben, sodass die zentrale Phase kürzer ausfallen oder ganz ausbleiben kann.`,
    lowSun: (degrees) => `Die Sonne steht selbst im besten Fall tiefer als ${degrees}°: Nötig ist freie Sicht bis zum Horizont in ihrer Richtung.`,
  },
  calendar: {
    partialTitle: 'Partielle Phasen der Sonnenfinsternis',
    centralTitle: { total: 'Totalität', annular: 'Ringphase' },
    cutShort: ' (Sonne sichtbar)',
    cutLong: ' (der Teil mit der Sonne über dem Horizont)',
    description: (title, id, cut) => `${title} am ${id}${cut}; Vorhersage, sofern das Wetter mitspielt.`,
    notSeenTitle: (place) => `Sonnenfinsternis, in ${place} nicht sichtbar`,
    notSeenDescription: 'Dieser Eintrag markiert nur das Datum; von hier aus ist nichts zu sehen.',
  },
};

const FIGURES: SolarFigureWords = {
  common: COMMON_GERMAN,
  kindTitle: { total: 'Totale Sonnenfinsternis', annular: 'Ringförmige Sonnenfinsternis', hybrid: 'Hybride Sonnenfinsternis', partial: 'Partielle Sonnenfinsternis' },
  kindInSentence: { total: 'totale Sonnenfinsternis', annular: 'ringförmige Sonnenfinsternis', hybrid: 'hybride Sonnenfinsternis', partial: 'partielle Sonnenfinsternis' },
  centralPhase: { total: 'Totalität', annular: 'Ringphase', hybrid: 'zentrale Phase' },
  minutesSeconds: { minutes: (minutes, seconds) => `${minutes} min ${seconds} s`, seconds: (seconds) => `${seconds} s` },
  percentText: { percent: (value) => `${value} %`, underOne: 'unter 1 %' },
  map: {
    title: (kindTitle, date) => `${kindTitle} · ${date}`,
    greatest: (stamp, coordinates) => `Maximum ${stamp} bei ${coordinates}`,
    magnitude: (value) => `Größe ${value}`,
    centralOnLine: (phase, duration) => `${phase} ${duration} auf der Zentrallinie`,
    pathWidth: (km) => `Zonenbreite ${km} km`,
    separator: ' · ',
    timesIn: (zone) => `Zeiten: ${zone}, 24-Stunden-Uhr; „+1 Tag“: der Tag nach dem Datum im Titel.`,
    shading: 'Schattierung: der größte verdeckte Anteil der Sonnenscheibe, solange die Sonne über dem Horizont steht (oberer Rand über einem Horizont auf Meereshöhe, mit Standardrefraktion).',
    moonRadii: (k1, k2) => `Mondradius k1 = ${k1} (partielle Phasen), k2 = ${k2} (Zone)`,
    elements: (deltaT, source, moonRadii) =>
      `Besselsche Elemente aus astronomy-engine; ΔT ${deltaT} s (${source}); ${moonRadii}; glatter Mondrand angenommen: Die Zonengrenzen können sich um einen Kilometer oder mehr verschieben.`,
    credits: (basemap, font, generator) => `${basemap}. Schrift: ${font}. Erstellt mit ${generator}.`,
  },
  legend: {
    ramp: ['Sonne unter 20 % verdeckt', '20–40 %', '40–60 %', '60–80 %', 'über 80 % (Sonne am Himmel)'],
    path: { total: 'Totalitätszone', annular: 'Zone der Ringförmigkeit', hybrid: 'Zone (total oder ringförmig)' },
    centralLine: (clock) => `Zentrallinie mit Zeiten (${clock})`,
    pathLimits: 'Grenzen der Zone',
    partialLimits: 'Grenzen der partiellen Finsternis',
    riseSet: 'Finsternis bei Sonnenauf- oder -untergang im Gange',
    greatest: 'Maximum der Finsternis',
    contours: 'Linien gleicher Bedeckung',
    town: 'Markierter Ort',
  },
  riseSet: (contact, sun) => `${contact === 'C1' ? 'beginnt' : 'endet'} bei ${sun === 'sunrise' ? 'Sonnenaufgang' : 'Sonnenuntergang'}`,
  mark: {
    notSeen: (name) => `${name} · nicht sichtbar`,
    central: (name, kind, time, duration) => `${name} · ${kind === 'total' ? 'total' : 'ringförmig'} ${time}${duration !== undefined ? `, ${duration}` : ''}`,
    partial: (name, percent, time, at) => `${name} · ${percent} ${at === undefined ? 'um' : at === 'sunrise' ? 'bei Sonnenaufgang' : 'bei Sonnenuntergang'} ${time}`,
  },
  caption: {
    path: (kind) => ` Das dunkle Band ist die ${kind === 'total' ? 'Totalitätszone' : kind === 'annular' ? 'Zone der Ringförmigkeit' : 'Zone der zentralen Finsternis (teils total, teils ringförmig)'} mit ihrer Zentrallinie und den Zeiten.`,
    facts: (kind, date, subtitle) => `Die ${kind} vom ${date}. ${subtitle}.`,
    shading: (path) => `Die Schattierung zeigt, wie viel der Sonne höchstens verdeckt ist, solange sie über dem Horizont steht.${path}`,
    altText: (kind, date, path) => `Karte: ${kind} vom ${date}. Eine Schattierung, umso dunkler, je mehr der Sonne verdeckt ist, zeigt, wo die Finsternis partiell zu sehen ist.${path}`,
    file: (caption, altText) => `${caption}\n\nAlternativtext: ${altText}\n`,
  },
};

/** The diagram's kind words stand after „ist“ (uninflected); the title puts them before a noun. */
const ATTRIBUTIVE: Readonly<Record<string, string>> = { total: 'totale', ringförmig: 'ringförmige', hybrid: 'hybride', partiell: 'partielle' };

const DIAGRAM: SolarDiagramWords = {
  common: COMMON_GERMAN,
  moments: {
    C1: 'der Mond berührt die Sonne',
    C2: 'die zentrale Phase beginnt',
    maximum: 'größte Bedeckung der Sonne',
    C3: 'die zentrale Phase endet',
    C4: 'der Mond verlässt die Sonne',
    sunrise: 'Sonnenaufgang',
    sunset: 'Sonnenuntergang',
  },
  momentLabel: { maximum: 'Maximum', sunrise: 'Aufgang', sunset: 'Untergang' },
  legend: {
    sun: 'die Sonnenscheibe',
    moonOverSun: 'der Mond vor der Sonne',
    moonOutline: 'Umriss des Mondes (vor dem Himmel unsichtbar)',
  },
  compass: { north: 'N', east: 'O' },
  sunAcross: (arcmin) => `Sonnendurchmesser ${arcmin}′`,
  timesHeading: (zone) => `Zeiten (${zone ?? 'jeweils mit eigener Zone'})`,
  sunAltitude: { up: (degrees) => `Sonne ${degrees}°`, down: 'Sonne unter Horizont' },
  kind: { total: 'total', annular: 'ringförmig', hybrid: 'hybrid', partial: 'partiell' },
  // „in Palermo“, not „von Palermo aus“: a narrow page cuts the title's end, which must then be the place, not „aus“.
  title: (date, kind, place) => `${date}: ${ATTRIBUTIVE[kind] ?? kind} Sonnenfinsternis in ${place}`,
  percent: (value) => `${value} %`,
  atMaximum: (stamp, sunAltitude, magnitude, obscuration) =>
    `Im Maximum um ${stamp}${sunAltitude === undefined ? ' (die Sonne steht dann unter dem Horizont)' : `, Sonne ${sunAltitude}° hoch`}: Größe ${magnitude}, Bedeckungsgrad ${obscuration}.`,
  elsewhere: (kind) => `Anderswo ist die Finsternis ${kind}.`,
  smallPrint: {
    drawn: (place) => `Sonne und Mond von ${place} aus im Maximum, maßstabsgetreu: Norden oben, zum Himmelspol des Datums; Osten links, wie der Himmel dem Betrachter erscheint.`,
    terms: 'Größe: der bedeckte Anteil des Sonnendurchmessers; Bedeckungsgrad: der bedeckte Anteil der Sonnenscheibe.',
    times: (zone, deltaT, source) => `Zeiten: ${zone}, 24-Stunden-Uhr. ΔT ${deltaT} s (${source}).`,
    credits: (font, generator) => `Schrift: ${font}. Erstellt mit ${generator}.`,
  },
  // The name stands after „von … aus“: the coordinates lead, so no article has to be declined.
  greatestPoint: (position) => `${position} (Ort des Maximums)`,
  caption: {
    summary: (time, obscuration, place, magnitude) => `Um ${time} bedeckt der Mond, von ${place} aus gesehen, ${obscuration} der Sonnenscheibe (Größe ${magnitude}).`,
    altText: (place, positionAngle) =>
      `Diagramm der Sonnenscheibe mit der dunklen Mondscheibe davor, maßstabsgetreu und so, wie man sie von ${place} aus im Maximum sieht; der Mittelpunkt des Mondes steht im Positionswinkel ${positionAngle}° (von Norden über Osten gezählt). Norden ist oben, Osten links; daneben stehen die Zeiten der Finsternis.`,
    file: (title, summary, caution, altText) => `${title}. ${summary}\n\n${caution}\n\nAlternativtext: ${altText}\n`,
  },
};

export const SOLAR_GERMAN: SolarWords = {
  body: 'solar',
  common: COMMON_GERMAN,
  text: TEXT,
  figures: FIGURES,
  diagram: DIAGRAM,
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
