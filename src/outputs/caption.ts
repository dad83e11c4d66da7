/**
 * Captions and alt text, written from the geometry: which continents and
 * larger countries see all of the eclipse, only its start (the Moon sets
 * while it is on), only its end (the Moon rises while it is on).
 */
import isoCountries from 'i18n-iso-countries';
import type { LunarEclipse } from '../eclipse/types.ts';
import { durationWords, type CivilClock } from '../ephemeris/civilTime.ts';
import { timeRange } from '../ephemeris/dayMark.ts';
import { loadBasemap } from '../map/basemap.ts';
import { continentShares, countryShares, type ContinentShare, type CountryShare } from '../visibility/countries.ts';
import type { Visibility, ZoneName } from '../visibility/visibility.ts';

export interface Caption {
  readonly caption: string;
  readonly altText: string;
  readonly countries: readonly CountryShare[];
}

const KIND_WORDS: Record<LunarEclipse['kind'], string> = { total: 'Total', partial: 'Partial', penumbral: 'Penumbral' };
/** Countries listed per zone at most. */
const COUNTRIES_PER_ZONE = 6;

function listWords(items: readonly string[]): string {
  if (items.length <= 1) return items.join('');
  return `${items.slice(0, -1).join(', ')} and ${items[items.length - 1]}`;
}

function countryName(c: CountryShare): string {
  return (c.code && isoCountries.getName(c.code, 'en', { select: 'alias' })) || c.name;
}

/** Few readers live there: Antarctica is left out of captions. */
const UNPEOPLED = 'Antarctica';

function continentWords(continents: readonly ContinentShare[], zone: ZoneName): string[] {
  return continents
    .filter((c) => c.name !== UNPEOPLED && c.shares[zone] >= 0.15)
    .sort((a, b) => b.shares[zone] - a.shares[zone])
    .map((c) => (c.shares[zone] >= 0.85 ? c.name : c.shares[zone] >= 0.4 ? `much of ${c.name}` : `parts of ${c.name}`));
}

function largestIn(countries: readonly CountryShare[], zone: ZoneName): string[] {
  return countries
    .filter((c) => c.continent !== UNPEOPLED && c.name !== UNPEOPLED && c.shares[zone] >= 0.5)
    .sort((a, b) => b.area - a.area)
    .slice(0, COUNTRIES_PER_ZONE)
    .map(countryName);
}

export function eclipseCaption(eclipse: LunarEclipse, visibility: Visibility, clock: CivilClock, extra?: string): Caption {
  const countries = countryShares(visibility, loadBasemap('110m').countries().features);
  const continents = continentShares(countries);
  const at = eclipse.greatest.utDays;
  const zone = clock.abbreviation(at);
  const c = eclipse.contacts;
  const range = (a: number, b: number) => `${timeRange(clock, a, b, at)} ${zone}`;
  const facts = [`${KIND_WORDS[eclipse.kind]} lunar eclipse of ${clock.date(at)}.`, `Greatest eclipse at ${clock.time(at)} ${zone}`];
  if (eclipse.kind === 'penumbral') {
    facts[1] += `, penumbral magnitude ${eclipse.penumbralMagnitude.toFixed(3)}; the Moon is in the penumbra for ${durationWords(eclipse.durations.penumbralSeconds)} (${range(c.P1!.utDays, c.P4!.utDays)}), a subtle dimming.`;
  } else {
    facts[1] += `, umbral magnitude ${eclipse.umbralMagnitude.toFixed(3)}`;
    if (eclipse.kind === 'total') facts[1] += `; totality lasts ${durationWords(eclipse.durations.totalSeconds!)} (${range(c.U2!.utDays, c.U3!.utDays)})`;
    facts[1] += `; the Moon is in the umbra for ${durationWords(eclipse.durations.partialSeconds!)} (${range(c.U1!.utDays, c.U4!.utDays)}).`;
  }
  const phrase: Record<Exclude<ZoneName, 'sees-none'>, string> = {
    'sees-all': 'All of it can be seen from',
    'sets-during': 'The Moon sets while it is on in',
    'rises-during': 'The Moon rises while it is on in',
  };
  const sentences: string[] = [];
  const altParts: string[] = [];
  for (const z of ['sees-all', 'sets-during', 'rises-during'] as const) {
    const where = continentWords(continents, z);
    const named = largestIn(countries, z);
    if (where.length === 0 && named.length === 0) continue;
    const places = where.length > 0 ? listWords(where) : 'parts of the world';
    sentences.push(`${phrase[z]} ${places}${named.length > 0 ? `, including ${listWords(named)}` : ''}.`);
    altParts.push(`${z === 'sees-all' ? 'all of it from' : z === 'sets-during' ? 'the Moon sets during it in' : 'the Moon rises during it in'} ${where.length > 0 ? listWords(where) : listWords(named.slice(0, 3))}`);
  }
  const hidden = continentWords(continents, 'sees-none').filter((w) => !w.includes(' of '));
  if (hidden.length > 0) sentences.push(`It cannot be seen from ${listWords(hidden)}.`);
  const caption = [...facts, ...sentences, ...(extra ? [extra] : []), 'Predictions: weather and the local horizon decide what is seen.'].join(' ');
  const altText = `World map of where the ${eclipse.kind} lunar eclipse of ${clock.date(at)} can be seen: ${altParts.join('; ')}${hidden.length > 0 ? `; not from ${listWords(hidden)}` : ''}.`;
  return { caption, altText, countries };
}

/** The caption file published beside a picture. */
export function captionText(caption: Caption): string {
  return `${caption.caption}\n\nAlt text: ${caption.altText}\n`;
}
