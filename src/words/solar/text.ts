/**
 * Reader text for solar eclipses other than the caution (caution.ts) and
 * the figures' own words: the local events and summary, and the caption and
 * alt text. Every function builds a sentence from computed facts; nothing
 * here knows a particular eclipse. The eye-safety caution is added by the
 * outputs, from caution.ts, never written here. Shaped for translation: one
 * catalogue per language (English below).
 */
import type { SolarLocalEventName, SolarLocalKind } from '../../local/solar.ts';
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
    readonly altText: (title: string, path: string | undefined, partial: string | undefined) => string;
    readonly file: (caption: string, alt: string) => string;
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
    greatest: (stamp, where, alt) => `Greatest eclipse at ${stamp} near ${where}, the Sun ${Math.round(alt)}° up there.`,
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
    altText: (title, path, partial) => [`Map: ${title}`, path, partial].filter((p) => p).join(' '),
    file: (caption, alt) => `Caption:\n${caption}\n\nAlt text:\n${alt}\n`,
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

/** What one local event is, in words, given what the place sees. */
export function solarEventWords(kind: SolarLocalKind, event: SolarLocalEventName, words: SolarTextWords = SOLAR_TEXT_ENGLISH): string {
  if (event !== 'C2' && event !== 'C3') return words.events[event];
  const central = kind === 'total' || kind === 'annular' ? words.central[kind] : 'central phase (Sun below the horizon)';
  return `${central} ${event === 'C2' ? 'begins' : 'ends'}`;
}
