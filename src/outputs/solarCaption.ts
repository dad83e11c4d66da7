/**
 * A caption and alt text for one solar eclipse, written from its geometry:
 * the kind and greatest eclipse, which countries the total or annular path
 * crosses, which continents see the partial eclipse, what the largest
 * cities see, and the eye-safety caution (long form in the caption, short
 * in the alt text; scoped to the eclipse: only a total or hybrid eclipse
 * has anywhere to take viewers off).
 *
 * Countries crossed: the path is sampled across its width at half-minute
 * steps from U1 to U4 — at each instant the points between the axis and the
 * umbral (antumbral) outline north and south of it, which lie inside the
 * shadow then — and each sample is placed in a country of the 1:50m world
 * data with d3-geo's geoContains. Continents: an equal-area lattice of land
 * points (1°), each with the greatest obscuration seen with the Sun up.
 * Cities: the gazetteer's places of a million people or more, the
 * circumstances of those that see the eclipse computed in full.
 */
import { geoBounds, geoContains } from 'd3-geo';
import type { Geometry, Polygon } from 'geojson';
import { countries as countryTable, continents as continentNames } from 'countries-list';
import isoCountries from 'i18n-iso-countries/index.js'; // the codes only: no language's names
import { civilClock, type CivilClock } from '../ephemeris/civilTime.ts';
import type { LonLat } from '../ephemeris/earth.ts';
import { besselianAt } from '../eclipses/solar/besselian.ts';
import { outlinePointsAt, umbraRadius } from '../eclipses/solar/outline.ts';
import { surfacePoint } from '../eclipses/solar/surface.ts';
import type { SolarEclipse } from '../eclipses/solar/types.ts';
import { citiesOfPopulation, type CityRow } from '../places/geonames.ts';
import { timeZoneOfPlace } from '../places/timeZone.ts';
import { readCountries } from '../sphere/world.ts';
import { greatestObscurationSeen, solarLocalCircumstances } from '../local/solar.ts';
import { coordinatesText, countryName, fixedIn, listWords } from '../words/common.ts';
import { safetyScopeForEclipse, solarSafetyText, type SolarWords } from '../words/solar/caution.ts';
import { minutesAndSeconds, percentWords, SOLAR_TEXT_ENGLISH, solarTextWords, type SolarShareWord, type SolarTextWords } from '../words/solar/text.ts';

export interface SolarCaptionOptions {
  /** Zone of the caption's times (default UTC); cities' times are in their own zones. */
  readonly clock?: CivilClock;
  /** A sentence to add before the caution (a chosen place's summary). */
  readonly extra?: string;
  /** How many of the largest cities to name (default 4; 0 for none). */
  readonly cities?: number;
  /** The reader's solar words (settings/language.ts): the caption's text and its caution; English when not given. */
  readonly solar?: SolarWords;
}

/** A country the path crosses. */
export interface CrossedCountry {
  readonly name: string;
  /** ISO 3166-1 alpha-2, where known. */
  readonly code?: string;
  /** Samples of the path that fell in it: a rough measure of how much of the path is there. */
  readonly samples: number;
}

/** What one of the largest cities sees. */
export interface CitySight {
  readonly name: string;
  readonly country: string;
  readonly population: number;
  readonly latDeg: number;
  readonly lonDeg: number;
  readonly tz: string;
  readonly kind: 'total' | 'annular' | 'partial';
  /** Greatest obscuration seen with the Sun up. */
  readonly obscurationSeen: number;
  readonly centralSeconds?: number;
  /** C2 (central), else the instant of the most seen: maximum, or a sunrise or sunset inside the eclipse; UT days. */
  readonly atUtDays: number;
  readonly at: 'C2' | 'maximum' | 'sunrise' | 'sunset';
}

export interface SolarCaption {
  readonly text: string;
  readonly alt: string;
  readonly crossed: readonly CrossedCountry[];
  readonly partialContinents: readonly { name: string; share: number }[];
  readonly cities: readonly CitySight[];
}

/** Countries named by name at most; the rest are counted. */
const COUNTRIES_NAMED = 8;
/** A city of at least this many people counts among the largest. */
export const LARGE_CITY_POPULATION = 1_000_000;
/** Steps of the path sampling: half a minute in time, nine points across. */
const PATH_STEP_DAYS = 0.5 / 1440;
const ACROSS = 4;
/** Lattice step for the partial eclipse's continents, degrees of longitude (and the same in sine of latitude). */
const LATTICE_DEG = 1;
/** Continents with less than this share seeing the partial eclipse are not named. */
const CONTINENT_MIN_SHARE = 0.05;

type Bounds = [[number, number], [number, number]];

interface CountryShape {
  readonly name: string;
  readonly code?: string;
  readonly continent?: string;
  /**
   * The country's polygons, each with its own bounds: a point is in the
   * country when one polygon holds it (as geoContains reads a MultiPolygon),
   * and only the polygons whose bounds hold the point are tested (a
   * country's overseas parts or its islands across ±180° stretch the
   * bounds of the whole).
   */
  readonly parts: readonly { readonly polygon: Polygon; readonly bounds: Bounds }[];
}

/** A country's geometry as its polygons. */
function polygonsOf(geometry: Geometry | null): Polygon[] {
  if (geometry?.type === 'Polygon') return [geometry];
  if (geometry?.type === 'MultiPolygon') return geometry.coordinates.map((coordinates) => ({ type: 'Polygon', coordinates }));
  return [];
}

/**
 * The countries of a detail with their polygons' bounds, built on each call
 * and kept by no one: the 1:50m outlines are read for each central
 * eclipse's caption (a few tens of milliseconds) rather than held for the
 * life of a batch worker, and the 1:110m ones serve the land lattice, built once.
 */
function countryShapes(detail: '110m' | '50m'): CountryShape[] {
  return readCountries(detail).features.map((feature) => {
    const numeric = feature.id === undefined ? undefined : String(feature.id).padStart(3, '0');
    const code = numeric ? isoCountries.numericToAlpha2(numeric) : undefined;
    const continentCode = code ? (countryTable as Record<string, { continent: string }>)[code]?.continent : undefined;
    const continent = continentCode ? (continentNames as Record<string, string>)[continentCode] : undefined;
    const parts = polygonsOf(feature.geometry).map((polygon) => ({ polygon, bounds: geoBounds(polygon) }));
    return { name: feature.properties.name, ...(code ? { code } : {}), ...(continent ? { continent } : {}), parts };
  });
}

const inBounds = ([[west, south], [east, north]]: Bounds, [lon, lat]: LonLat) =>
  lat >= south && lat <= north && (west <= east ? lon >= west && lon <= east : lon >= west || lon <= east);

/** The country holding a point, if any. */
function countryAt(shapes: readonly CountryShape[], point: LonLat): CountryShape | undefined {
  return shapes.find((s) => s.parts.some((part) => inBounds(part.bounds, point) && geoContains(part.polygon, [point[0], point[1]])));
}

/** Points between two nearby places, ends excluded, in `steps` equal parts (longitude unwrapped across ±180°). */
function between([lon0, lat0]: LonLat, [lon1, lat1]: LonLat, steps: number): LonLat[] {
  let dLon = lon1 - lon0;
  if (dLon > 180) dLon -= 360;
  if (dLon < -180) dLon += 360;
  const out: LonLat[] = [];
  for (let k = 1; k < steps; k++) {
    let lon = lon0 + (dLon * k) / steps;
    if (lon > 180) lon -= 360;
    if (lon < -180) lon += 360;
    out.push([lon, lat0 + ((lat1 - lat0) * k) / steps]);
  }
  return out;
}

/** Points inside the total or annular path: across the shadow at each instant from U1 to U4. */
export function pathSamples(eclipse: SolarEclipse): LonLat[] {
  const u1 = eclipse.contacts.U1;
  const u4 = eclipse.contacts.U4;
  if (eclipse.kind === 'partial' || !u1 || !u4) return [];
  const fit = eclipse.elements;
  const samples: LonLat[] = [];
  const steps = Math.max(2, Math.ceil((u4.ttDays - u1.ttDays) / PATH_STEP_DAYS));
  for (let k = 0; k <= steps; k++) {
    const e = besselianAt(fit, u1.ttDays + ((u4.ttDays - u1.ttDays) * k) / steps);
    const axis = surfacePoint(e, e.x, e.y)?.lonLat;
    const { north, south } = outlinePointsAt(e, umbraRadius);
    if (axis) {
      samples.push(axis);
      for (const edge of [north, south]) if (edge) samples.push(...between(axis, edge.lonLat, ACROSS));
    } else if (north && south) {
      samples.push(north.lonLat, south.lonLat);
    }
    for (const edge of [north, south]) if (edge) samples.push(edge.lonLat);
  }
  return samples;
}

/** The countries the path crosses, most samples first (then by name). */
export function countriesCrossed(eclipse: SolarEclipse): CrossedCountry[] {
  const shapes = countryShapes('50m');
  const counts = new Map<CountryShape, number>();
  for (const point of pathSamples(eclipse)) {
    const shape = countryAt(shapes, point);
    if (shape) counts.set(shape, (counts.get(shape) ?? 0) + 1);
  }
  return [...counts]
    .map(([shape, samples]) => ({ name: shape.name, ...(shape.code ? { code: shape.code } : {}), samples }))
    .sort((a, b) => b.samples - a.samples || a.name.localeCompare(b.name));
}

/** Land lattice points of equal area with their continent (Russia split at the Urals), built once. */
let landLattice: { point: LonLat; continent: string }[] | undefined;
function landPoints(): { point: LonLat; continent: string }[] {
  if (landLattice) return landLattice;
  const shapes = countryShapes('110m');
  const points: { point: LonLat; continent: string }[] = [];
  const rows = Math.round(2 / ((LATTICE_DEG * Math.PI) / 180));
  for (let r = 0; r < rows; r++) {
    const lat = (Math.asin(-1 + (2 * (r + 0.5)) / rows) * 180) / Math.PI;
    for (let lon = -180 + LATTICE_DEG / 2; lon < 180; lon += LATTICE_DEG) {
      const shape = countryAt(shapes, [lon, lat]);
      if (!shape?.continent || shape.continent === 'Antarctica') continue;
      const continent = shape.code === 'RU' ? (lon > 0 && lon < 60 ? 'Europe' : 'Asia') : shape.continent;
      points.push({ point: [lon, lat], continent });
    }
  }
  return (landLattice = points);
}

/** The share of each continent's land (Antarctica aside) that sees some of the eclipse with the Sun up, largest first. */
export function partialContinents(eclipse: SolarEclipse): { name: string; share: number }[] {
  const totals = new Map<string, number>();
  const seen = new Map<string, number>();
  for (const { point, continent } of landPoints()) {
    totals.set(continent, (totals.get(continent) ?? 0) + 1);
    if (greatestObscurationSeen(eclipse, point) > 0) seen.set(continent, (seen.get(continent) ?? 0) + 1);
  }
  return [...seen]
    .map(([name, count]) => ({ name, share: count / totals.get(name)! }))
    .filter((c) => c.share >= CONTINENT_MIN_SHARE)
    .sort((a, b) => b.share - a.share || a.name.localeCompare(b.name));
}

let largeCities: CityRow[] | undefined;
/** The gazetteer's places of LARGE_CITY_POPULATION people or more, most populous first, read once. */
function largestCities(): CityRow[] {
  if (largeCities) return largeCities;
  // The population column alone is read: the gazetteer's name index is not loaded for this.
  const found = citiesOfPopulation(LARGE_CITY_POPULATION);
  return (largeCities = found.sort((a, b) => b.population - a.population || a.geonameId - b.geonameId));
}

/** A city is named for what its readers can notice: at least 1 % of the Sun covered with the Sun up (a sliver under that prints as "0 %" or "under 1 %"). */
const CITY_LEAST_OBSCURATION = 0.01;

/**
 * What the largest cities see: those in the path first (most populous
 * first), then those that see a partial eclipse of at least 1 %, up to `count` in all, at
 * most half of them from one country so that one country does not fill the list.
 */
export function citySights(eclipse: SolarEclipse, count: number): CitySight[] {
  if (count <= 0) return [];
  const sights: CitySight[] = [];
  for (const city of largestCities()) {
    if (greatestObscurationSeen(eclipse, [city.lonDeg, city.latDeg]) < CITY_LEAST_OBSCURATION) continue;
    const local = solarLocalCircumstances(eclipse, { latDeg: city.latDeg, lonDeg: city.lonDeg });
    if (local.kind === 'none') continue;
    const central = local.kind === 'total' || local.kind === 'annular';
    const at = local.events.find((e) => e.event === (central ? 'C2' : 'maximum'))!;
    const best = central || at.sunUp ? at : local.events.find((e) => e.event === 'sunrise' || e.event === 'sunset') ?? at;
    sights.push({
      name: city.name,
      country: city.country,
      population: city.population,
      latDeg: city.latDeg,
      lonDeg: city.lonDeg,
      tz: timeZoneOfPlace({ latDeg: city.latDeg, lonDeg: city.lonDeg, country: city.country }),
      kind: local.kind,
      obscurationSeen: local.obscurationSeen,
      ...(central && local.centralSeconds !== undefined ? { centralSeconds: local.centralSeconds } : {}),
      atUtDays: best.moment.utDays,
      at: best.event === 'sunrise' || best.event === 'sunset' || best.event === 'C2' ? best.event : 'maximum',
    });
  }
  const central = sights.filter((s) => s.kind !== 'partial');
  const partial = sights.filter((s) => s.kind === 'partial');
  const perCountry = Math.max(1, Math.floor(count / 2));
  const chosen: CitySight[] = [];
  const used = new Map<string, number>();
  for (const s of [...central, ...partial]) {
    if (chosen.length >= count) break;
    if ((used.get(s.country) ?? 0) >= perCountry) continue;
    used.set(s.country, (used.get(s.country) ?? 0) + 1);
    chosen.push(s);
  }
  return chosen;
}

/**
 * Build what every solar caption reads and a process keeps: the
 * continents' land lattice and the list of the largest cities (the 1:50m
 * country outlines are read per caption, see countryShapes). A batch worker
 * does this as it starts, while the batch searches its catalogue, rather
 * than in its first eclipse.
 */
export function prepareSolarCaptions(): void {
  landPoints();
  largestCities();
}

function shareWord(share: number): SolarShareWord {
  return share >= 0.99 ? 'whole' : share > 0.5 ? 'most' : 'parts';
}

/** The caption and alt text of one solar eclipse. */
export function solarCaption(eclipse: SolarEclipse, options: SolarCaptionOptions = {}): SolarCaption {
  const words = solarTextWords(options.solar);
  const w = words.caption;
  const clock = options.clock ?? civilClock('UTC', 'zone', words.common.clock);
  const list = (items: readonly string[]) => listWords(items, words.common);
  const at = eclipse.greatest.utDays;
  const title = w.title(eclipse.kind, clock.date(at));
  const [lon, lat] = eclipse.greatestPoint;
  const facts: string[] = [title, w.greatest(clock.stamp(at), coordinatesText(lat, lon, words.common), eclipse.sunAltitudeDeg)];

  let pathSentence: string | undefined;
  const crossed = eclipse.kind === 'partial' ? [] : countriesCrossed(eclipse);
  if (eclipse.kind === 'partial') {
    facts.push(w.partialOnly(fixedIn(eclipse.magnitude, 3, words.common)));
  } else if (!eclipse.central && eclipse.kind !== 'hybrid') {
    facts.push(w.nonCentral(eclipse.kind));
  } else {
    const duration = eclipse.durations.centralSeconds !== undefined ? minutesAndSeconds(eclipse.durations.centralSeconds, words) : undefined;
    const central = w.centralFacts(eclipse.kind, duration, eclipse.pathWidthKm);
    if (central) facts.push(central);
  }
  if (eclipse.kind !== 'partial') {
    const named = crossed.slice(0, COUNTRIES_NAMED).map((c) => countryName(c, words.common));
    pathSentence = named.length > 0 ? w.pathCrosses(eclipse.kind, named, crossed.length - named.length) : w.pathOverSea(eclipse.kind);
    facts.push(pathSentence);
  }

  const continents = partialContinents(eclipse);
  const partialSentence = continents.length > 0 ? w.partialSeen(list(continents.map((c) => w.continent(c.name, shareWord(c.share))))) : undefined;
  if (partialSentence) facts.push(partialSentence);

  const cities = citySights(eclipse, options.cities ?? 4);
  if (cities.length > 0) {
    const said = cities.map((c) => {
      const local = civilClock(c.tz, 'zone', words.common.clock);
      const name = `${c.name} (${countryName({ code: c.country, name: c.country }, words.common)})`;
      if ((c.kind === 'total' || c.kind === 'annular') && c.centralSeconds !== undefined) {
        return w.cityCentral(name, c.kind, minutesAndSeconds(c.centralSeconds, words), local.stamp(c.atUtDays));
      }
      return w.cityPartial(name, percentWords(c.obscurationSeen, words), local.stamp(c.atUtDays), c.at === 'sunrise' || c.at === 'sunset' ? c.at : 'maximum');
    });
    facts.push(`${w.citiesIntro} ${said.join('; ')}.`);
  }
  const scope = safetyScopeForEclipse(eclipse.kind);
  const text = [...facts, ...(options.extra ? [options.extra] : []), words.common.predictions, solarSafetyText('long', scope, options.solar)].join(' ');
  const alt = [w.altText(eclipse.kind, clock.date(at), pathSentence, partialSentence), solarSafetyText('short', scope, options.solar)].join(' ');
  return { text, alt, crossed, partialContinents: continents, cities };
}

/** The caption file published beside a picture. */
export function solarCaptionText(caption: SolarCaption, words: SolarTextWords = SOLAR_TEXT_ENGLISH): string {
  return words.caption.file(caption.text, caption.alt);
}
