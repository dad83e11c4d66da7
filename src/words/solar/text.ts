/**
 * Reader text for solar eclipses other than the caution (caution.ts) and
 * the figures' own words: the local events and summary, and the caption and
 * alt text. Every function builds a sentence from computed facts; nothing
 * here knows a particular eclipse. The eye-safety caution is added by the
 * outputs, from caution.ts, never written here. Shaped for translation: one
 * catalogue per language (English below).
 */
import type { CivilClock } from '../../ephemeris/civilTime.ts';
import { LOW_SUN_DEG, NEAR_EDGE_KM } from '../../eclipses/solar/constants.ts';
import type { SolarLocalCircumstances, SolarLocalEventName, SolarLocalKind } from '../../local/solar.ts';
import { ENGLISH, listWords, wholeIn, type CommonWords } from '../common.ts';

export type SolarKindWord = 'total' | 'annular' | 'hybrid' | 'partial';
/** How much of a continent sees the partial eclipse. */
export type SolarShareWord = 'whole' | 'most' | 'parts';

export interface SolarTextWords {
  readonly common: CommonWords;
  readonly events: Readonly<Record<SolarLocalEventName, string>>;
  readonly central: { readonly total: string; readonly annular: string };
  readonly caption: {
    readonly title: (kind: SolarKindWord, date: string) => string;
    readonly greatest: (stamp: string, where: string, sunAltitudeDeg: number) => string;
    readonly centralFacts: (kind: 'total' | 'annular' | 'hybrid', duration: string | undefined, widthKm: number | undefined) => string;
    readonly nonCentral: (kind: 'total' | 'annular') => string;
    readonly partialOnly: (magnitude: string) => string;
    readonly pathCrosses: (kind: 'total' | 'annular' | 'hybrid', countries: readonly string[], more: number) => string;
    readonly pathOverSea: (kind: 'total' | 'annular' | 'hybrid') => string;
    readonly continent: (name: string, share: SolarShareWord) => string;
    readonly partialSeen: (where: string) => string;
    readonly citiesIntro: string;
    readonly cityCentral: (city: string, kind: 'total' | 'annular', duration: string, from: string) => string;
    readonly cityPartial: (city: string, percent: string, at: string, when: 'maximum' | 'sunrise' | 'sunset') => string;
    readonly altText: (kind: SolarKindWord, date: string, path: string | undefined, partial: string | undefined) => string;
    readonly file: (caption: string, alt: string) => string;
  };
  /** The contact sheet's words for a solar eclipse's card, and its title when solar eclipses are in the batch. */
  readonly sheet: {
    readonly title: (lunarToo: boolean, from: string, last: string) => string;
    readonly kind: Readonly<Record<SolarKindWord, string>>;
    readonly magnitude: (value: string) => string;
    readonly central: (kind: 'total' | 'annular' | 'hybrid', duration: string) => string;
    readonly width: (km: string) => string;
    readonly saros: (n: number) => string;
    readonly noMap: string;
    /** A solar card's thumbnail alt text; `kind` is one of `kind` above ("total solar"). */
    readonly thumbnailAlt: (kind: string, date: string) => string;
    /** A lunar card's kind on a sheet holding solar eclipses too: "total lunar" (`kind`: the lunar catalogue's "total"). */
    readonly lunarKind: (kind: string) => string;
  };
  /** The list table when it holds solar eclipses (with lunar ones or alone): the columns read across both kinds. */
  readonly list: {
    /** The twelve column heads: date, body, kind, greatest (UTC), magnitude, penumbral mag., gamma, in umbra, totality, central, path, saros. */
    readonly header: readonly [string, string, string, string, string, string, string, string, string, string, string, string];
    readonly body: { readonly lunar: string; readonly solar: string };
    readonly kind: Readonly<Record<SolarKindWord, string>>;
    readonly eclipses: (lunar: number, solar: number) => string;
    readonly solarEclipses: (count: number) => string;
    readonly magnitudeNote: string;
    readonly solarNote: (k1: string, k2: string) => string;
    /** The central phase in the table's compact form: "4m 28s" (`seconds` already two digits). */
    readonly central: (minutes: string, seconds: string) => string;
    readonly pathWidth: (km: string) => string;
  };
  /** A central phase's length: "4 min 28 s" (`seconds` already two digits), and under a minute "52 s". */
  readonly minutesSeconds: { readonly minutes: (minutes: string, seconds: string) => string; readonly seconds: (seconds: string) => string };
  /** A share of the Sun's disc as a whole percentage: "74 %". */
  readonly percent: (value: string) => string;
  /** The timetable's words for the central phase's edges: "totality begins"; `unseen` names a central phase the place does not see. */
  readonly centralEdge: { readonly edge: (central: string, edge: 'begins' | 'ends') => string; readonly unseen: string };
  /** The local table and markdown (the trade's contact names C1…C4 stay as they are). */
  readonly local: {
    readonly eventLabel: { readonly maximum: string; readonly sunrise: string; readonly sunset: string };
    /** The seven column heads: event, what happens, local time (`zone`), UTC, Sun altitude, Sun azimuth, Sun up. */
    readonly header: (zone: string) => readonly [string, string, string, string, string, string, string];
    readonly yes: string;
    readonly no: string;
    readonly title: (kind: SolarKindWord, id: string, place: string, coordinates: string, zone: string) => string;
    readonly seen: {
      readonly total: (magnitude: string) => string;
      readonly annular: (magnitude: string, obscuration: string) => string;
      readonly partial: (magnitude: string, obscuration: string) => string;
      /** Partial, the Sun below the horizon at maximum: the most seen while it is up. */
      readonly partialLow: (obscurationSeen: string) => string;
      readonly none: string;
    };
    readonly timeNote: (zoneDescription: string) => string;
    readonly modelNote: (k1: string, k2: string, deltaT: string, source: string, predictions: string) => string;
    /** The caution's heading: in capitals before the table and in calendar entries, as a bold label in markdown. */
    readonly safetyHeading: { readonly plain: string; readonly markdown: string };
  };
  /** The newsletter summary of what one place sees. */
  readonly summary: {
    readonly missed: (place: string, id: string) => string;
    readonly sunDown: (place: string, span: string) => string;
    readonly central: (place: string, kind: 'total' | 'annular', duration: string, from: string, to: string) => string;
    readonly partial: (place: string, percent: string) => string;
    /** The eclipse's span; `localDate` when the place's date differs from the eclipse's UTC date; the Sun's altitude at maximum. */
    readonly runs: (span: string, localDate: string | undefined, stamp: string, altitude: string, up: boolean) => string;
    readonly risesEclipsed: (stamp: string) => string;
    readonly setsEclipsed: (stamp: string) => string;
    readonly nearEdge: (km: string) => string;
    readonly lowSun: (degrees: string) => string;
  };
  /** The iCalendar entries of one place. */
  readonly calendar: {
    readonly partialTitle: string;
    readonly centralTitle: { readonly total: string; readonly annular: string };
    /** Said of a phase cut to the time the Sun is up: short in the entry's title, long in its description. */
    readonly cutShort: string;
    readonly cutLong: string;
    readonly description: (title: string, id: string, cut: string) => string;
    readonly notSeenTitle: (place: string) => string;
    readonly notSeenDescription: string;
  };
}

const KIND_TITLE: Record<SolarKindWord, string> = { total: 'Total', annular: 'Annular', hybrid: 'Hybrid (total and annular)', partial: 'Partial' };
const KIND_TITLE_SHORT: Record<SolarKindWord, string> = { total: 'Total', annular: 'Annular', hybrid: 'Hybrid', partial: 'Partial' };
const PATH_NAME = { total: 'path of totality', annular: 'path of the annular eclipse', hybrid: 'central path (total in parts, annular in others)' } as const;

export const SOLAR_TEXT_ENGLISH: SolarTextWords = {
  common: ENGLISH,
  events: {
    C1: 'the Moon begins to cover the Sun',
    C2: 'central phase begins',
    maximum: 'maximum eclipse',
    C3: 'central phase ends',
    C4: 'the Moon leaves the Sun',
    sunrise: 'sunrise',
    sunset: 'sunset',
  },
  central: { total: 'totality', annular: 'annularity' },
  caption: {
    title: (kind, date) => `${KIND_TITLE[kind]} solar eclipse of ${date}.`,
    greatest: (stamp, where, alt) => `Greatest eclipse at ${stamp} near ${where}, ${Math.round(alt) <= 0 ? 'with the Sun on the horizon there' : `the Sun ${Math.round(alt)}° up there`}.`,
    centralFacts: (kind, duration, width) => {
      const what = kind === 'annular' ? 'the ring of sunlight lasts' : kind === 'total' ? 'totality lasts' : 'the central phase lasts';
      const parts = [duration ? `${what} ${duration}` : undefined, width !== undefined ? `the path is ${Math.round(width)} km wide` : undefined].filter((p) => p !== undefined);
      return parts.length > 0 ? `At that point ${listWords(parts)}.` : '';
    },
    nonCentral: (kind) => `The shadow's axis misses the Earth: the ${kind === 'total' ? 'umbra' : 'antumbra'} only grazes it near a pole.`,
    partialOnly: (magnitude) => `Only the Moon's penumbra reaches the Earth: a partial eclipse everywhere, at most magnitude ${magnitude}.`,
    pathCrosses: (kind, countries, more) =>
      `The ${PATH_NAME[kind]} crosses ${listWords(more > 0 ? [...countries, `${more} more ${more === 1 ? 'country' : 'countries'}`] : countries)}.`,
    pathOverSea: (kind) => `The ${PATH_NAME[kind]} crosses only open sea and no country's land.`,
    continent: (name, share) => (share === 'whole' ? name : share === 'most' ? `most of ${name}` : `parts of ${name}`),
    partialSeen: (where) => `A partial eclipse is seen from ${where}.`,
    citiesIntro: 'Among the largest cities:',
    cityCentral: (city, kind, duration, from) => `${city} sees ${kind === 'total' ? 'totality' : 'the ring'} for ${duration} from ${from}`,
    cityPartial: (city, percent, at, when) =>
      `${city} sees ${percent} of the Sun covered ${when === 'maximum' ? `at ${at}` : when === 'sunrise' ? `as the Sun rises at ${at}` : `as the Sun sets at ${at}`}`,
    altText: (kind, date, path, partial) => [`Map of the ${kind} solar eclipse of ${date}.`, path, partial].filter((p) => p).join(' '),
    file: (caption, alt) => `${caption}\n\nAlt text: ${alt}\n`,
  },
  sheet: {
    title: (lunarToo, from, last) => `${lunarToo ? 'Lunar and solar' : 'Solar'} eclipses ${from} to ${last}`,
    kind: { total: 'total solar', annular: 'annular solar', hybrid: 'hybrid solar', partial: 'partial solar' },
    magnitude: (value) => `magnitude ${value}`,
    central: (kind, duration) => `${kind === 'total' ? 'totality' : kind === 'annular' ? 'annularity' : 'central phase'} ${duration} at greatest`,
    width: (km) => `path ${km} km wide`,
    saros: (n) => `saros ${n}`,
    noMap: 'Caption and GeoJSON geometry; the style asks for no map picture.',
    thumbnailAlt: (kind, date) => `Map of the ${kind} eclipse of ${date}`,
    lunarKind: (kind) => `${kind} lunar`,
  },
  list: {
    header: ['Date', 'Body', 'Kind', 'Greatest (UTC)', 'Magnitude', 'Penumbral mag.', 'Gamma', 'In umbra', 'Totality', 'Central', 'Path', 'Saros'],
    body: { lunar: 'Moon', solar: 'Sun' },
    kind: { total: 'total', annular: 'annular', hybrid: 'hybrid', partial: 'partial' },
    eclipses: (lunar, solar) => `${lunar} lunar and ${solar} solar ${lunar + solar === 1 ? 'eclipse' : 'eclipses'}`,
    solarEclipses: (count) => `${count} solar ${count === 1 ? 'eclipse' : 'eclipses'}`,
    magnitudeNote: 'Magnitude: of the umbra for the Moon; of the Sun\'s diameter covered, at the greatest point, for the Sun.',
    solarNote: (k1, k2) =>
      `Sun: central = totality or annularity on the central line at greatest eclipse, path = its width there; Moon radius k1 = ${k1} (penumbra), k2 = ${k2} (umbra and antumbra).`,
    central: (minutes, seconds) => `${minutes}m ${seconds}s`,
    pathWidth: (km) => `${km} km`,
  },
  minutesSeconds: { minutes: (minutes, seconds) => `${minutes} min ${seconds} s`, seconds: (seconds) => `${seconds} s` },
  percent: (value) => `${value} %`,
  centralEdge: { edge: (central, edge) => `${central} ${edge}`, unseen: 'central phase (Sun below the horizon)' },
  local: {
    eventLabel: { maximum: 'Maximum', sunrise: 'Sunrise', sunset: 'Sunset' },
    header: (zone) => ['Event', 'What happens', `Local (${zone})`, 'UTC', 'Sun alt.', 'Sun az.', 'Sun up'],
    yes: 'yes',
    no: 'no',
    title: (kind, id, place, coordinates, zone) => `${KIND_TITLE_SHORT[kind]} solar eclipse ${id} from ${place} (${coordinates}; ${zone})`,
    seen: {
      total: (m) => `Seen here: total (magnitude ${m}).`,
      annular: (m, o) => `Seen here: annular (magnitude ${m}, ${o} of the Sun's disc covered).`,
      partial: (m, o) => `Seen here: partial (magnitude ${m}, ${o} of the Sun's disc covered at maximum).`,
      partialLow: (o) => `Seen here: partial, at most ${o} of the Sun's disc covered while the Sun is up (the maximum comes with the Sun below the horizon).`,
      none: 'Seen here: nothing.',
    },
    timeNote: (zone) =>
      `Local time: ${zone}. Times to the second. Sun altitude: its centre, with refraction (Saemundsson) from a true −1° up, geometric below; "up": upper limb above a sea-level horizon.`,
    modelNote: (k1, k2, deltaT, source, predictions) =>
      `Moon radius k1 = ${k1} (penumbra: C1, C4, magnitude), k2 = ${k2} (umbra and antumbra: C2, C3); smooth lunar limb, sea-level observer; ΔT ${deltaT} s (${source}). ${predictions}`,
    safetyHeading: { plain: 'EYE SAFETY', markdown: 'Eye safety' },
  },
  summary: {
    missed: (place, id) => `From ${place} the Moon's shadow misses: no eclipse of the Sun is seen on ${id}.`,
    sunDown: (place, span) => `From ${place} the Sun is below the horizon for the whole eclipse (${span}): nothing is seen.`,
    central: (place, kind, duration, from, to) =>
      `From ${place} ${kind === 'total' ? 'the Sun is totally eclipsed' : 'the Moon stands wholly inside the Sun\'s disc, leaving a bright ring,'} for ${duration}, ${from} to ${to}.`,
    partial: (place, percent) => `From ${place} the Sun is partly eclipsed: at most ${percent} of its disc covered.`,
    runs: (span, localDate, stamp, altitude, up) =>
      `The eclipse runs ${span}${localDate === undefined ? '' : ` on ${localDate}`}; maximum at ${stamp} with the Sun ${up ? altitude : altitude.replace(/^-/, '')}° ${up ? 'up' : 'below the horizon'}.`,
    risesEclipsed: (stamp) => `The Sun rises already eclipsed, at ${stamp}.`,
    setsEclipsed: (stamp) => `The Sun sets still eclipsed, at ${stamp}.`,
    nearEdge: (km) =>
      `This place lies within ${km} km of the path's edge: the Moon's uneven limb and the uncertainty of ΔT can move the edge by a kilometre or more, so the central phase may be shorter or missed.`,
    lowSun: (degrees) => `The Sun stands below ${degrees}° at best: a clear, low horizon in its direction is needed.`,
  },
  calendar: {
    partialTitle: 'Partial phases of the solar eclipse',
    centralTitle: { total: 'Totality', annular: 'Annularity' },
    cutShort: ' (Sun up)',
    cutLong: ' (the part with the Sun above the horizon)',
    description: (title, id, cut) => `${title} of ${id}${cut}; predictions, weather permitting.`,
    notSeenTitle: (place) => `Solar eclipse, not visible from ${place}`,
    notSeenDescription: 'This entry only marks the date; there is nothing to see from here.',
  },
};

/** The text words of a solar catalogue (English when none is given). */
export function solarTextWords(solar?: { readonly text: SolarTextWords }): SolarTextWords {
  return solar === undefined ? SOLAR_TEXT_ENGLISH : solar.text;
}

/** "4 min 28 s", "52 s": central durations to the second. */
export function minutesAndSeconds(seconds: number, words: SolarTextWords = SOLAR_TEXT_ENGLISH): string {
  const whole = Math.round(seconds);
  const minutes = Math.floor(whole / 60);
  return minutes === 0 ? words.minutesSeconds.seconds(wholeIn(whole, words.common))
    : words.minutesSeconds.minutes(wholeIn(minutes, words.common), wholeIn(whole % 60, words.common, 2));
}

/** A fraction as a whole percentage: "74 %". */
export const percentWords = (fraction: number, words: SolarTextWords = SOLAR_TEXT_ENGLISH): string => words.percent(wholeIn(Math.round(fraction * 100), words.common));

/** A wall-clock time to the second with its own zone's name: "13:27:10 CDT". */
export function clockSeconds(clock: CivilClock, utDays: number): string {
  return `${clock.rfc3339(utDays).slice(11, 19)} ${clock.abbreviation(utDays)}`;
}

/** What one local event is, in words, given what the place sees. */
export function solarEventWords(kind: SolarLocalKind, event: SolarLocalEventName, words: SolarTextWords = SOLAR_TEXT_ENGLISH): string {
  if (event !== 'C2' && event !== 'C3') return words.events[event];
  // Where the place does not see the central phase with the Sun up, its edges are named as such.
  const central = kind === 'total' || kind === 'annular' ? words.central[kind] : words.centralEdge.unseen;
  return words.centralEdge.edge(central, event === 'C2' ? 'begins' : 'ends');
}

/** What the place sees, in two or three sentences, from the circumstances alone. */
export function solarLocalSummary(local: SolarLocalCircumstances, clock: CivilClock, placeName: string, words: SolarTextWords = SOLAR_TEXT_ENGLISH): string {
  const w = words.summary;
  const common = words.common;
  const find = (name: SolarLocalEventName) => local.events.find((e) => e.event === name);
  const c1 = find('C1');
  const c4 = find('C4');
  if (!c1 || !c4) return w.missed(placeName, local.eclipse.id);
  if (local.kind === 'none') return w.sunDown(placeName, clock.range(c1.moment.utDays, c4.moment.utDays));
  const sentences: string[] = [];
  const c2 = find('C2');
  const c3 = find('C3');
  const maximum = find('maximum')!;
  if ((local.kind === 'total' || local.kind === 'annular') && c2 && c3 && local.centralSeconds !== undefined) {
    sentences.push(w.central(placeName, local.kind, minutesAndSeconds(local.centralSeconds, words), clockSeconds(clock, c2.moment.utDays), clockSeconds(clock, c3.moment.utDays)));
  } else {
    sentences.push(w.partial(placeName, percentWords(local.obscurationSeen, words)));
  }
  // The local date is named where it is not the eclipse's UTC date (across the date line, or late in the UTC day).
  const localDate = clock.isoDate(c1.moment.utDays) === local.eclipse.id ? undefined : clock.date(c1.moment.utDays);
  sentences.push(w.runs(clock.range(c1.moment.utDays, c4.moment.utDays, c1.moment.utDays), localDate, clock.stamp(maximum.moment.utDays),
    wholeIn(Math.round(maximum.sunAltitudeDeg), common), maximum.sunUp));
  const rise = find('sunrise');
  const set = find('sunset');
  if (rise) sentences.push(w.risesEclipsed(clock.stamp(rise.moment.utDays)));
  if (set) sentences.push(w.setsEclipsed(clock.stamp(set.moment.utDays)));
  if (local.nearPathEdge) sentences.push(w.nearEdge(wholeIn(NEAR_EDGE_KM, common)));
  if (local.lowSun) sentences.push(w.lowSun(wholeIn(LOW_SUN_DEG, common)));
  return sentences.join(' ');
}
