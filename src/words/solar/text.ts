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
import { ENGLISH, listWords, type CommonWords } from '../common.ts';

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
  };
}

const KIND_TITLE: Record<SolarKindWord, string> = { total: 'Total', annular: 'Annular', hybrid: 'Hybrid (total and annular)', partial: 'Partial' };
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
    noMap: 'Caption and GeoJSON geometry; no map picture yet.',
  },
};

/** "4 min 28 s", "52 s": central durations to the second. */
export function minutesAndSeconds(seconds: number): string {
  const whole = Math.round(seconds);
  const minutes = Math.floor(whole / 60);
  return minutes === 0 ? `${whole} s` : `${minutes} min ${String(whole % 60).padStart(2, '0')} s`;
}

/** A fraction as a whole percentage: "74 %". */
export const percentWords = (fraction: number): string => `${Math.round(fraction * 100)} %`;

/** A wall-clock time to the second with its own zone's name: "13:27:10 CDT". */
export function clockSeconds(clock: CivilClock, utDays: number): string {
  return `${clock.rfc3339(utDays).slice(11, 19)} ${clock.abbreviation(utDays)}`;
}

/** What one local event is, in words, given what the place sees. */
export function solarEventWords(kind: SolarLocalKind, event: SolarLocalEventName, words: SolarTextWords = SOLAR_TEXT_ENGLISH): string {
  if (event !== 'C2' && event !== 'C3') return words.events[event];
  const central = kind === 'total' || kind === 'annular' ? words.central[kind] : 'central phase (Sun below the horizon)';
  return `${central} ${event === 'C2' ? 'begins' : 'ends'}`;
}

/** What the place sees, in two or three sentences, from the circumstances alone. */
export function solarLocalSummary(local: SolarLocalCircumstances, clock: CivilClock, placeName: string): string {
  const find = (name: SolarLocalEventName) => local.events.find((e) => e.event === name);
  const c1 = find('C1');
  const c4 = find('C4');
  if (!c1 || !c4) return `From ${placeName} the Moon's shadow misses: no eclipse of the Sun is seen on ${local.eclipse.id}.`;
  if (local.kind === 'none') {
    return `From ${placeName} the Sun is below the horizon for the whole eclipse (${clock.range(c1.moment.utDays, c4.moment.utDays)}): nothing is seen.`;
  }
  const sentences: string[] = [];
  const c2 = find('C2');
  const c3 = find('C3');
  const maximum = find('maximum')!;
  if ((local.kind === 'total' || local.kind === 'annular') && c2 && c3 && local.centralSeconds !== undefined) {
    const what = local.kind === 'total' ? 'the Sun is totally eclipsed' : 'the Moon stands wholly inside the Sun\'s disc, leaving a bright ring,';
    sentences.push(`From ${placeName} ${what} for ${minutesAndSeconds(local.centralSeconds)}, ${clockSeconds(clock, c2.moment.utDays)} to ${clockSeconds(clock, c3.moment.utDays)}.`);
  } else {
    sentences.push(`From ${placeName} the Sun is partly eclipsed: at most ${percentWords(local.obscurationSeen)} of its disc covered.`);
  }
  // The local date is named where it is not the eclipse's UTC date (across the date line, or late in the UTC day).
  const localDate = clock.isoDate(c1.moment.utDays) === local.eclipse.id ? '' : ` on ${clock.date(c1.moment.utDays)}`;
  sentences.push(`The eclipse runs ${clock.range(c1.moment.utDays, c4.moment.utDays, c1.moment.utDays)}${localDate}; maximum at ${clock.stamp(maximum.moment.utDays)} with the Sun ${Math.round(maximum.sunAltitudeDeg)}° ${maximum.sunUp ? 'up' : 'below the horizon'}.`);
  const rise = find('sunrise');
  const set = find('sunset');
  if (rise) sentences.push(`The Sun rises already eclipsed, at ${clock.stamp(rise.moment.utDays)}.`);
  if (set) sentences.push(`The Sun sets still eclipsed, at ${clock.stamp(set.moment.utDays)}.`);
  if (local.nearPathEdge) {
    sentences.push(`This place lies within ${NEAR_EDGE_KM} km of the path's edge: the Moon's uneven limb and the uncertainty of ΔT can move the edge by a kilometre or more, so the central phase may be shorter or missed.`);
  }
  if (local.lowSun) sentences.push(`The Sun stands below ${LOW_SUN_DEG}° at best: a clear, low horizon in its direction is needed.`);
  return sentences.join(' ');
}
