/**
 * Captions and alt text, written from the geometry: which continents and
 * larger countries see all of the eclipse, only its start (the Moon sets
 * while it is on), only its end (the Moon rises while it is on).
 */
import isoCountries from 'i18n-iso-countries';
import { printedFigures } from '../eclipses/lunar/figures.ts';
import type { LunarEclipse } from '../eclipses/lunar/types.ts';
import { durationWords, type CivilClock } from '../ephemeris/civilTime.ts';
import { loadBasemap } from '../sphere/world.ts';
import { continentShares, countryShares, type ContinentShare, type CountryShare } from '../visibility/lunar/countries.ts';
import type { Visibility, ZoneName } from '../visibility/lunar/visibility.ts';

export interface Caption {
  readonly caption: string;
  readonly altText: string;
  readonly countries: readonly CountryShare[];
  /** The countries named, by the zone they are named under. */
  readonly named: ReadonlyMap<ZoneName, readonly CountryShare[]>;
}

const KIND_WORDS: Record<LunarEclipse['kind'], string> = { total: 'Total', partial: 'Partial', penumbral: 'Penumbral' };
/** Countries listed per zone at most. */
const COUNTRIES_PER_ZONE = 6;
/**
 * A country is named under a zone only when that zone holds more than this
 * share of its area: a clear majority, so that the area sampling (about 400
 * points per country at least) cannot tip a country split nearly in half.
 */
export const NAMED_SHARE = 0.55;
/** A continent is named without "most of" or "parts of" only when this share of it is in the zone (and none of its countries is named elsewhere). */
export const WHOLE_CONTINENT_SHARE = 0.99;

function listWords(items: readonly string[]): string {
  if (items.length <= 1) return items.join('');
  return `${items.slice(0, -1).join(', ')} and ${items[items.length - 1]}`;
}

/**
 * Country names as English prose writes them (common practice in news
 * style): short forms, and "the" where the name takes it.
 */
const READER_NAMES: Readonly<Record<string, string>> = {
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
};

export function countryName(c: CountryShare): string {
  if (c.code && READER_NAMES[c.code]) return READER_NAMES[c.code]!;
  return (c.code && isoCountries.getName(c.code, 'en')) || c.name;
}

/** Few readers live there: Antarctica is left out of captions. */
const UNPEOPLED = 'Antarctica';

/** The countries a caption names, by zone: those with a clear majority of their area there, largest first. */
export function namedCountries(countries: readonly CountryShare[]): Map<ZoneName, CountryShare[]> {
  const named = new Map<ZoneName, CountryShare[]>();
  for (const zone of ['sees-all', 'sets-during', 'rises-during'] as const) {
    named.set(zone, countries
      .filter((c) => c.code && c.continent && c.continent !== UNPEOPLED && c.shares[zone] > NAMED_SHARE)
      .sort((a, b) => b.area - a.area || a.name.localeCompare(b.name))
      .slice(0, COUNTRIES_PER_ZONE));
  }
  return named;
}

/**
 * Continents in a zone, qualified by the share there: plain when all of it
 * is (and no country of it is named under another zone), "most of" above
 * half, "parts of" from 15 % — or below that, when one of its countries is
 * named in the zone, so that no country is listed under a continent not its own.
 */
function continentWords(continents: readonly ContinentShare[], zone: ZoneName, namedElsewhere: ReadonlySet<string>, namedHere: ReadonlySet<string> = new Set()): string[] {
  return continents
    .filter((c) => c.name !== UNPEOPLED && (c.shares[zone] >= 0.15 || (c.shares[zone] > 0 && namedHere.has(c.name))))
    .sort((a, b) => b.shares[zone] - a.shares[zone] || a.name.localeCompare(b.name))
    .map((c) => (c.shares[zone] >= WHOLE_CONTINENT_SHARE && !namedElsewhere.has(c.name) ? c.name : c.shares[zone] > 0.5 ? `most of ${c.name}` : `parts of ${c.name}`));
}

export function eclipseCaption(eclipse: LunarEclipse, visibility: Visibility, clock: CivilClock, extra?: string): Caption {
  const countries = countryShares(visibility, loadBasemap('110m').countries().features);
  const continents = continentShares(countries);
  const at = eclipse.greatest.utDays;
  const c = eclipse.contacts;
  // Each time in the zone in force at its own instant (a clock change inside the eclipse reads true).
  const range = (a: number, b: number) => clock.range(a, b, at);
  const facts = [`${KIND_WORDS[eclipse.kind]} lunar eclipse of ${clock.date(at)}.`, `Greatest eclipse at ${clock.stamp(at)}`];
  // Figures rounded once, from the full value, as on the map and in the list.
  const figures = printedFigures(eclipse);
  if (eclipse.kind === 'penumbral') {
    facts[1] += `, penumbral magnitude ${figures.penumbralMagnitude}; the Moon is in the penumbra for ${durationWords(figures.minutes.penumbral * 60)} (${range(c.P1!.utDays, c.P4!.utDays)}), a subtle dimming.`;
  } else {
    facts[1] += `, umbral magnitude ${figures.umbralMagnitude}`;
    if (eclipse.kind === 'total') facts[1] += `; totality lasts ${durationWords(figures.minutes.total! * 60)} (${range(c.U2!.utDays, c.U3!.utDays)})`;
    facts[1] += `; the Moon is in the umbra for ${durationWords(figures.minutes.partial! * 60)} (${range(c.U1!.utDays, c.U4!.utDays)}).`;
  }
  const phrase: Record<Exclude<ZoneName, 'sees-none'>, string> = {
    'sees-all': 'All of it can be seen from',
    'sets-during': 'The Moon sets while it is on in',
    'rises-during': 'The Moon rises while it is on in',
  };
  const named = namedCountries(countries);
  /** Continents with a country named under some other zone than `zone`. */
  const namedOutside = (zone: ZoneName) => new Set([...named].filter(([z]) => z !== zone).flatMap(([, list]) => list.map((c) => c.continent!)));
  const sentences: string[] = [];
  const altParts: string[] = [];
  for (const z of ['sees-all', 'sets-during', 'rises-during'] as const) {
    const where = continentWords(continents, z, namedOutside(z), new Set(named.get(z)!.map((c) => c.continent!)));
    const names = named.get(z)!.map(countryName);
    if (where.length === 0 && names.length === 0) continue;
    const places = where.length > 0 ? listWords(where) : 'parts of the world';
    sentences.push(`${phrase[z]} ${places}${names.length > 0 ? `, including ${listWords(names)}` : ''}.`);
    altParts.push(`${z === 'sees-all' ? 'all of it from' : z === 'sets-during' ? 'the Moon sets during it in' : 'the Moon rises during it in'} ${where.length > 0 ? listWords(where) : listWords(names.slice(0, 3))}`);
  }
  const hidden = continentWords(continents, 'sees-none', namedOutside('sees-none')).filter((w) => !w.startsWith('parts of '));
  if (hidden.length > 0) sentences.push(`It cannot be seen from ${listWords(hidden)}.`);
  const caption = [...facts, ...sentences, ...(extra ? [extra] : []), 'Predictions: weather and the local horizon decide what is seen.'].join(' ');
  const altText = `World map of where the ${eclipse.kind} lunar eclipse of ${clock.date(at)} can be seen: ${altParts.join('; ')}${hidden.length > 0 ? `; not from ${listWords(hidden)}` : ''}.`;
  return { caption, altText, countries, named };
}

/** The caption file published beside a picture. */
export function captionText(caption: Caption): string {
  return `${caption.caption}\n\nAlt text: ${caption.altText}\n`;
}
