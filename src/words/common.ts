/**
 * Words shared by both kinds of eclipse: the one duration formatter, the one
 * rounding of a length of time to whole minutes, numbers as printed, and the
 * notice every output carries. Words that belong to one kind only live in
 * words/lunar/ or words/solar/, never here.
 *
 * Shaped for translation: each language supplies a `CommonWords` catalogue
 * (English below); the functions take the catalogue, defaulting to English.
 */
import { createRequire } from 'node:module';
import isoCountries from 'i18n-iso-countries/index.js';
import type { EclipseBody } from '../eclipses/common/record.ts';
import { CLOCK_ENGLISH, type ClockWords } from '../ephemeris/civilTime.ts';
import type { DeltaTSource } from '../ephemeris/deltaT.ts';

/** Shared words, one catalogue per language. */
export interface CommonWords {
  /** BCP 47 tag of the catalogue's language, for Intl. */
  readonly locale: string;
  /** How numbers are written (see `Numerals`). */
  readonly numerals: Numerals;
  /** Every output's last word on what a prediction can promise. */
  readonly predictions: string;
  /** Unit words for durations: "3 h 27 min" (long) and "3h 27m" (compact, for tables). */
  readonly durationUnits: {
    readonly long: { readonly hour: string; readonly minute: string };
    readonly compact: { readonly hour: string; readonly minute: string };
  };
  /** "A, B and C". */
  readonly and: string;
  /** The word for "and" before a given last item, where the language changes it (Spanish "y" → "e" before an i sound). */
  readonly andBefore?: (item: string) => string;
  /** A colon and a semicolon with the spaces the language sets around them (French: a no-break space before). */
  readonly punctuation: { readonly colon: string; readonly semicolon: string };
  /** Hemisphere letters after a latitude and a longitude: "35.28°S, 149.13°E". */
  readonly hemispheres: { readonly north: string; readonly south: string; readonly east: string; readonly west: string };
  /** Country names as prose writes them, by ISO 3166-1 alpha-2 code, where they differ from the language's plain list name. */
  readonly countryNames: Readonly<Record<string, string>>;
  /** Continents as captions name them, by countries-list's English name ("Africa", "North America"…). */
  readonly continents: Readonly<Record<ContinentName, string>>;
  /** Continent and ocean names written on world maps, by the map's English label ("AFRICA", "Pacific Ocean"…). */
  readonly mapAreas: Readonly<Record<MapAreaName, string>>;
  /** The data's credits as the small print gives them (the same as sphere/world.ts's and places/gazetteer.ts's in English). */
  readonly credits: { readonly basemap: string; readonly places: string };
  /** The ΔT model as the list's notes name it: the built-in one (observed, forecast, Espenak–Meeus) or a fixed value. */
  readonly deltaTModel: { readonly builtIn: (firstYear: string, lastYear: string, forecastTo: string) => string; readonly fixed: (seconds: string) => string };
  /** Where a ΔT comes from, as the small print says it ("observed", "forecast"…). */
  readonly deltaTSources: Readonly<Record<DeltaTSource, string>>;
  /** The clock's words: dates through Intl in this language, day marks, changes of offset. */
  readonly clock: ClockWords;
}

/**
 * How a catalogue writes numbers. `ascii`: ASCII digits and the decimal sign given, which must be
 * what CLDR gives for the catalogue's locale (test/words/numerals.test.ts checks every catalogue
 * against Intl.NumberFormat): printing a number then needs none of Intl's number formatting, whose
 * first use costs a command a good part of its start-up. `intl`: digits and decimal sign as
 * Intl.NumberFormat writes them for the locale (a language with digits of its own, or a catalogue
 * moved to another region's locale).
 */
export type Numerals = { readonly digits: 'ascii'; readonly decimalSign: string } | { readonly digits: 'intl' };

export type ContinentName = 'Africa' | 'Antarctica' | 'Asia' | 'Europe' | 'North America' | 'Oceania' | 'South America';
export type MapAreaName = 'AFRICA' | 'EUROPE' | 'ASIA' | 'NORTH AMERICA' | 'SOUTH AMERICA' | 'AUSTRALIA' | 'ANTARCTICA' | 'Pacific Ocean' | 'Atlantic Ocean' | 'Indian Ocean';

export const ENGLISH: CommonWords = {
  locale: 'en',
  numerals: { digits: 'ascii', decimalSign: '.' },
  predictions: 'Predictions: weather and the local horizon decide what is seen.',
  durationUnits: {
    long: { hour: ' h', minute: ' min' },
    compact: { hour: 'h', minute: 'm' },
  },
  and: 'and',
  punctuation: { colon: ': ', semicolon: '; ' },
  hemispheres: { north: 'N', south: 'S', east: 'E', west: 'W' },
  // English prose (common practice in news style): short forms, and "the" where the name takes it.
  countryNames: {
    US: 'the United States',
    GB: 'the United Kingdom',
    NL: 'the Netherlands',
    PH: 'the Philippines',
    BS: 'the Bahamas',
    GM: 'the Gambia',
    CF: 'the Central African Republic',
    DO: 'the Dominican Republic',
    AE: 'the United Arab Emirates',
    SB: 'the Solomon Islands',
    FK: 'the Falkland Islands',
    CD: 'DR Congo',
    CG: 'Congo',
    KR: 'South Korea',
    KP: 'North Korea',
    LA: 'Laos',
    SY: 'Syria',
    MD: 'Moldova',
    BN: 'Brunei',
    RU: 'Russia',
    IR: 'Iran',
    VE: 'Venezuela',
    BO: 'Bolivia',
    TZ: 'Tanzania',
    VN: 'Vietnam',
    TW: 'Taiwan',
    MK: 'North Macedonia',
    CZ: 'Czechia',
    CI: "Côte d'Ivoire",
    CN: 'China',
    PS: 'Palestine',
    TR: 'Turkey',
  },
  continents: {
    Africa: 'Africa', Antarctica: 'Antarctica', Asia: 'Asia', Europe: 'Europe', 'North America': 'North America', Oceania: 'Oceania', 'South America': 'South America',
  },
  mapAreas: {
    AFRICA: 'AFRICA', EUROPE: 'EUROPE', ASIA: 'ASIA', 'NORTH AMERICA': 'NORTH AMERICA', 'SOUTH AMERICA': 'SOUTH AMERICA', AUSTRALIA: 'AUSTRALIA', ANTARCTICA: 'ANTARCTICA',
    'Pacific Ocean': 'Pacific Ocean', 'Atlantic Ocean': 'Atlantic Ocean', 'Indian Ocean': 'Indian Ocean',
  },
  credits: { basemap: 'Basemap: Natural Earth via world-atlas (public domain)', places: 'Places: GeoNames (CC BY 4.0)' },
  deltaTModel: {
    builtIn: (first, last, forecastTo) => `observed ${first}–${last}, forecast to ${forecastTo}, Espenak–Meeus beyond`,
    fixed: (seconds) => `fixed ${seconds} s (user)`,
  },
  deltaTSources: { observed: 'observed', forecast: 'forecast', historical: 'historical', 'long-term': 'long-term', user: 'user' },
  clock: CLOCK_ENGLISH,
};

/**
 * Whole minutes in a length of time given in seconds, rounded to the nearest
 * minute (half a minute rounds up): the one rounding every printed duration
 * goes through, so one eclipse's phases read the same in every output.
 */
export function roundToMinute(seconds: number): number {
  // `+ 0` turns the -0 of a few negative milliseconds into 0, which prints without a sign.
  return Math.round(seconds / 60) + 0;
}

/** How a duration is written: `long` on figures, in captions and summaries ("3 h 27 min", "58 min"); `compact` in tables ("3h 27m", "58m"). */
export type DurationForm = 'long' | 'compact';

/**
 * A length of time, given in seconds, as printed: rounded to the minute
 * (roundToMinute), hours and two-digit minutes from one hour up.
 * long: "58 min", "3 h 07 min"; compact: "58m", "3h 07m".
 */
export function formatDuration(seconds: number, form: DurationForm = 'long', words: CommonWords = ENGLISH): string {
  const minutes = roundToMinute(seconds);
  const unit = words.durationUnits[form];
  if (words.numerals.digits === 'ascii') {
    if (minutes < 60) return `${minutes}${unit.minute}`;
    return `${Math.floor(minutes / 60)}${unit.hour} ${String(minutes % 60).padStart(2, '0')}${unit.minute}`;
  }
  const [whole, twoDigits] = integerFormats(words.locale);
  if (minutes < 60) return `${whole.format(minutes)}${unit.minute}`;
  return `${whole.format(Math.floor(minutes / 60))}${unit.hour} ${twoDigits.format(minutes % 60)}${unit.minute}`;
}

const integerFormatsByLocale = new Map<string, readonly [Intl.NumberFormat, Intl.NumberFormat]>();
/** Whole numbers, and whole numbers to two digits ("07"), in a language's digits; made once per language. */
function integerFormats(locale: string): readonly [Intl.NumberFormat, Intl.NumberFormat] {
  let formats = integerFormatsByLocale.get(locale);
  if (!formats) {
    formats = [
      new Intl.NumberFormat(locale, { useGrouping: false, maximumFractionDigits: 0 }),
      new Intl.NumberFormat(locale, { useGrouping: false, maximumFractionDigits: 0, minimumIntegerDigits: 2 }),
    ];
    integerFormatsByLocale.set(locale, formats);
  }
  return formats;
}

/** A whole number in the language's digits ("7"; to two digits with `minimumDigits` 2: "07"), through Intl. */
export function wholeIn(value: number, words: CommonWords = ENGLISH, minimumDigits: 1 | 2 = 1): string {
  // Halves away from zero, as Intl rounds; `+ 0`: a small negative rounded to zero prints as 0, never -0.
  const rounded = Math.sign(value) * Math.round(Math.abs(value)) + 0;
  if (words.numerals.digits === 'ascii') {
    const digits = String(Math.abs(rounded)).padStart(minimumDigits, '0');
    return rounded < 0 ? `-${digits}` : digits;
  }
  const [whole, twoDigits] = integerFormats(words.locale);
  return (minimumDigits === 2 ? twoDigits : whole).format(rounded);
}

/**
 * Decimal numbers inside a text written with a full stop ("1.234", "69.2 s")
 * in the language's decimal sign, as Intl.NumberFormat writes it ("1,234" in
 * Spanish): only a point between two digits changes, never a full stop.
 */
export function decimalIn(text: string, words: CommonWords = ENGLISH): string {
  const sign = words.numerals.digits === 'ascii' ? words.numerals.decimalSign : decimalSign(words.locale);
  return sign === '.' ? text : text.replace(/(\d)\.(\d)/g, `$1${sign}$2`);
}

/** A number to a fixed count of decimals, in the language's decimal sign. */
export function fixedIn(value: number, digits: number, words: CommonWords = ENGLISH): string {
  return decimalIn(value.toFixed(digits), words);
}

const decimalSigns = new Map<string, string>();
function decimalSign(locale: string): string {
  let sign = decimalSigns.get(locale);
  if (sign === undefined) {
    sign = new Intl.NumberFormat(locale).formatToParts(1.5).find((p) => p.type === 'decimal')?.value ?? '.';
    decimalSigns.set(locale, sign);
  }
  return sign;
}

/**
 * A ΔT model's name (ephemeris/deltaT.ts writes it in English, and the
 * catalogue JSON keeps it so) in the language's words; a name of another
 * shape is printed as it stands.
 */
export function deltaTModelIn(name: string, words: CommonWords = ENGLISH): string {
  const builtIn = /^observed (\d+)–(\d+), forecast to (\d+), Espenak–Meeus beyond$/.exec(name);
  if (builtIn) return words.deltaTModel.builtIn(builtIn[1]!, builtIn[2]!, builtIn[3]!);
  const fixed = /^fixed (\S+) s \(user\)$/.exec(name);
  return fixed ? words.deltaTModel.fixed(decimalIn(fixed[1]!, words)) : name;
}

/** "A", "A and B", "A, B and C" (no serial comma: the house style). */
export function listWords(items: readonly string[], words: CommonWords = ENGLISH): string {
  if (items.length <= 1) return items.join('');
  const last = items[items.length - 1]!;
  return `${items.slice(0, -1).join(', ')} ${words.andBefore?.(last) ?? words.and} ${last}`;
}

declare const meantFor: unique symbol;
/**
 * A text meant for one kind of eclipse only — above all a caution. Each
 * kind's catalogue marks its own (lunarText, solarText); an output that takes
 * a `TextFor<'solar'>` will not compile with a lunar one, nor the reverse.
 * At run time it is a plain string.
 */
export type TextFor<B extends EclipseBody> = string & { readonly [meantFor]: B };

/** Marks a text as meant for one kind; only the words/ catalogues call it. */
export function meantOnlyFor<B extends EclipseBody>(_body: B, text: string): TextFor<B> {
  return text as TextFor<B>;
}

/** A place's latitude and longitude to 0.01°, hemisphere letters after: "35.28°S, 149.13°E". */
export function coordinatesText(latDeg: number, lonDeg: number, words: CommonWords = ENGLISH): string {
  const h = words.hemispheres;
  return `${fixedIn(Math.abs(latDeg), 2, words)}°${latDeg >= 0 ? h.north : h.south}, ${fixedIn(Math.abs(lonDeg), 2, words)}°${lonDeg >= 0 ? h.east : h.west}`;
}

/**
 * A country as prose names it: the catalogue's own form where it has one,
 * else the ISO 3166 name from i18n-iso-countries in the catalogue's language,
 * else the basemap's name.
 */
export function countryName(country: { readonly code?: string | undefined; readonly name: string }, words: CommonWords = ENGLISH): string {
  if (country.code && words.countryNames[country.code]) return words.countryNames[country.code]!;
  return (country.code && isoCountryName(country.code, words.locale)) || country.name;
}

// The package's main entry registers all of its languages on load (about 1 MB of JSON, a good part
// of a command's start-up); its core registers none. A language is registered the first time a
// country's name is asked in it, so a command that names no country loads none.
const requireLocale = createRequire(import.meta.url);
const localesTried = new Set<string>();

function isoCountryName(code: string, locale: string): string | undefined {
  const language = locale.toLowerCase();
  if (!localesTried.has(language)) {
    localesTried.add(language);
    if (isoCountries.getSupportedLanguages().includes(language)) {
      isoCountries.registerLocale(requireLocale(`i18n-iso-countries/langs/${language}.json`) as isoCountries.LocaleData);
    }
  }
  return isoCountries.getName(code, language);
}
