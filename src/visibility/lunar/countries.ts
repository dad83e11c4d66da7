/**
 * Which countries and continents see what, by area. Each country is sampled
 * once on an equal-area lattice (columns even in longitude, rows even in sine
 * of latitude, so every cell covers the same area of the sphere — Lambert's
 * cylindrical equal-area projection), fine enough for at least
 * MIN_SAMPLES_PER_COUNTRY points inside it; a sample's share of the country is
 * its share of the area. The zones are then read at those points for each
 * eclipse. Continents sum their countries' areas; Russia is split at the
 * Urals (60° E), so that Siberia does not count as Europe.
 */
import { geoArea, geoCentroid } from 'd3-geo';
import type { Feature, Geometry, Position } from 'geojson';
import { countries as countryTable, continents as continentNames } from 'countries-list';
import isoCountries from 'i18n-iso-countries/index.js'; // the codes only: no language's names
import { moonUpMargin } from './moonUp.ts';
import { normalAt, type Normal } from '../../sphere/normal.ts';
import { spanTests, zoneFromMargins, ZONE_ORDER, type Visibility, type ZoneName } from './visibility.ts';

export type ZoneShares = Readonly<Record<ZoneName, number>>;

/** The part of a country on one continent. */
export interface CountryPart {
  readonly continent: string;
  /** Area, steradians. */
  readonly area: number;
  readonly shares: ZoneShares;
}

export interface CountryShare {
  readonly name: string;
  /** ISO 3166-1 alpha-2, where known. */
  readonly code?: string;
  /** The continent holding most of the country. */
  readonly continent?: string;
  /** Area, steradians (d3-geo geoArea). */
  readonly area: number;
  /** Share of the country's area in each zone. */
  readonly shares: ZoneShares;
  /** The zone holding all of the country, if one does (every sample in it). */
  readonly wholly?: ZoneName;
  /** The zone holding the largest share. */
  readonly mostly: ZoneName;
  /** Per continent (one part, or two for Russia). */
  readonly parts: readonly CountryPart[];
}

export interface ContinentShare {
  readonly name: string;
  /** Share of the continent's area in each zone. */
  readonly shares: ZoneShares;
}

/** At least this many equal-area samples fall inside every country. */
export const MIN_SAMPLES_PER_COUNTRY = 400;
const DEG = Math.PI / 180;
/** Lattice steps, degrees of longitude (and the same in radians of sine latitude), coarse to fine. */
const LATTICE_STEPS_DEG = [1, 0.5, 0.25, 0.125, 0.0625, 0.03125, 0.015625];

/** Continents from countries-list, with two corrections: Timor-Leste is in Asia (UN M49), Russia is split at the Urals. */
const CONTINENT_OVERRIDES: Readonly<Record<string, string>> = { TL: 'AS' };
/** Countries not in ISO 3166 that the basemap draws: their continent only (they are not named in captions). */
const UNCODED_CONTINENTS: Readonly<Record<string, string>> = { Kosovo: 'EU', 'N. Cyprus': 'AS', Somaliland: 'AF' };
const URALS_LON_DEG = 60;

function continentName(code: string): string {
  return (continentNames as Record<string, string>)[code]!;
}

function continentOf(code: string | undefined, name: string): string | undefined {
  const continentCode = code ? CONTINENT_OVERRIDES[code] ?? (countryTable as Record<string, { continent: string }>)[code]?.continent : UNCODED_CONTINENTS[name];
  return continentCode ? continentName(continentCode) : undefined;
}

/** A sample's continent: the country's, except Russia west of the Urals. */
function sampleContinent(code: string | undefined, continent: string | undefined, [lon]: Position): string | undefined {
  if (code === 'RU') return lon! < URALS_LON_DEG && lon! > 0 ? continentName('EU') : continentName('AS');
  return continent;
}

/**
 * A ring with its longitudes made continuous (no step over 180°): some
 * world-atlas rings cross the antimeridian uncut. A ring that goes once
 * round a pole (Antarctica) is closed along that pole.
 */
function unwrapRing(ring: readonly Position[], nearLon?: number): Position[] {
  const out: Position[] = [];
  let shift = 0;
  for (let k = 0; k < ring.length; k++) {
    const [lon, lat] = [ring[k]![0]!, ring[k]![1]!];
    if (k > 0) {
      const step = lon + shift - out[k - 1]![0]!;
      if (step > 180) shift -= 360;
      else if (step < -180) shift += 360;
    }
    out.push([lon + shift, lat]);
  }
  const turn = out[out.length - 1]![0]! - out[0]![0]!;
  if (Math.abs(turn) > 180) {
    const pole = out.reduce((sum, p) => sum + p[1]!, 0) > 0 ? 90 : -90;
    out.push([out[out.length - 1]![0]!, pole], [out[0]![0]!, pole], out[0]!);
  }
  // Holes go beside their outer ring.
  if (nearLon !== undefined) {
    const mean = out.reduce((sum, p) => sum + p[0]!, 0) / out.length;
    const offset = Math.round((nearLon - mean) / 360) * 360;
    if (offset !== 0) return out.map(([lon, lat]) => [lon! + offset, lat!]);
  }
  return out;
}

function unwrapPolygon(polygon: readonly Position[][]): Position[][] {
  const outer = unwrapRing(polygon[0] ?? []);
  const mean = outer.reduce((sum, p) => sum + p[0]!, 0) / Math.max(1, outer.length);
  return [outer, ...polygon.slice(1).map((hole) => unwrapRing(hole, mean))];
}

/** Planar point-in-polygon, even–odd over every ring. */
function containsPlanar(polygons: readonly Position[][][], x: number, y: number): boolean {
  let inside = false;
  for (const polygon of polygons) {
    for (const ring of polygon) {
      for (let k = 0, n = ring.length, l = n - 1; k < n; l = k++) {
        const xk = ring[k]![0]!;
        const yk = ring[k]![1]!;
        const xl = ring[l]![0]!;
        const yl = ring[l]![1]!;
        if (yk > y !== yl > y && x < ((xl - xk) * (y - yk)) / (yl - yk) + xk) inside = !inside;
      }
    }
  }
  return inside;
}

function polygonsOf(geometry: Geometry): Position[][][] {
  if (geometry.type === 'Polygon') return [geometry.coordinates];
  if (geometry.type === 'MultiPolygon') return geometry.coordinates;
  return [];
}

/** Equal-area samples inside a country (cell centres of the finest lattice needed) and each one's area, or its centroid if none. */
function equalAreaSamples(feature: Feature<Geometry>, area: number): { points: Position[]; cellArea: number } {
  const polygons = polygonsOf(feature.geometry).map(unwrapPolygon);
  // Each polygon is sampled within its own bounds (a country's parts do not overlap, so no point is counted twice).
  const bounds = polygons.map((polygon) => {
    let [minLon, minLat, maxLon, maxLat] = [180, 90, -180, -90];
    for (const [lon, lat] of polygon[0] ?? []) {
      minLon = Math.min(minLon, lon!);
      maxLon = Math.max(maxLon, lon!);
      minLat = Math.min(minLat, lat!);
      maxLat = Math.max(maxLat, lat!);
    }
    return { polygon, minLon, minLat, maxLon, maxLat };
  });
  let found: Position[] = [];
  let cellArea = 0;
  for (const stepDeg of LATTICE_STEPS_DEG) {
    cellArea = (stepDeg * DEG) ** 2;
    if (area / cellArea < MIN_SAMPLES_PER_COUNTRY && stepDeg !== LATTICE_STEPS_DEG[LATTICE_STEPS_DEG.length - 1]) continue;
    const sineStep = stepDeg * DEG;
    found = [];
    for (const { polygon, minLon, minLat, maxLon, maxLat } of bounds) {
      const firstColumn = Math.floor((minLon + 180) / stepDeg);
      const lastColumn = Math.ceil((maxLon + 180) / stepDeg);
      const firstRow = Math.floor((Math.sin(minLat * DEG) + 1) / sineStep);
      const lastRow = Math.ceil((Math.sin(maxLat * DEG) + 1) / sineStep);
      for (let j = firstRow; j <= lastRow; j++) {
        const sine = -1 + (j + 0.5) * sineStep;
        if (sine >= 1) break;
        const lat = Math.asin(sine) / DEG;
        for (let i = firstColumn; i <= lastColumn; i++) {
          // The lattice repeats every 360° (360 / step is whole), so an unwrapped polygon meets the same points.
          const lon = -180 + (i + 0.5) * stepDeg;
          if (containsPlanar([polygon], lon, lat)) found.push([((lon + 540) % 360) - 180, lat]);
        }
      }
    }
    if (found.length >= MIN_SAMPLES_PER_COUNTRY) break;
  }
  return found.length > 0 ? { points: found, cellArea } : { points: [geoCentroid(feature)], cellArea: area };
}

/** What each country's outline gives, computed once per feature: world data is immutable. */
interface CountryGeometry {
  readonly area: number;
  readonly code?: string;
  readonly continent?: string;
  /**
   * Samples: their normals, x, y, z a sample in one flat array (every
   * country's together run to some hundred thousand: a third of the memory
   * of an array per sample), and for each the index of its continent in
   * `continents` (−1: none).
   */
  readonly normals: Float64Array;
  readonly continentIndex: Int8Array;
  readonly continents: readonly string[];
  /** Samples × the area of a lattice cell, steradians: close to `area` when the sampling is right. */
  readonly sampledArea: number;
}
const geometryCache = new WeakMap<Feature, CountryGeometry>();

/** Lon/lat points as unit normals, three numbers a point. */
function flatNormals(points: readonly Position[]): Float64Array {
  const out = new Float64Array(points.length * 3);
  points.forEach((p, k) => out.set(normalAt([p[0]!, p[1]!]), 3 * k));
  return out;
}

function countryGeometry(feature: Feature<Geometry, { name: string }>): CountryGeometry {
  let cached = geometryCache.get(feature);
  if (!cached) {
    const area = geoArea(feature);
    const numeric = feature.id === undefined ? undefined : String(feature.id).padStart(3, '0');
    const code = numeric ? isoCountries.numericToAlpha2(numeric) : undefined;
    const continent = continentOf(code, feature.properties.name);
    const { points, cellArea } = equalAreaSamples(feature, area);
    const continents: string[] = [];
    const continentIndex = Int8Array.from(points, (p) => {
      const name = sampleContinent(code, continent, p);
      if (!name) return -1;
      if (!continents.includes(name)) continents.push(name);
      return continents.indexOf(name);
    });
    cached = { area, ...(code ? { code } : {}), ...(continent ? { continent } : {}), normals: flatNormals(points), continentIndex, continents, sampledArea: points.length * cellArea };
    geometryCache.set(feature, cached);
  }
  return cached;
}

/** How a country is sampled: the number of samples, their total area and the country's own (steradians). */
export function countrySampling(feature: Feature<Geometry, { name: string }>): { samples: number; sampledArea: number; area: number } {
  const { normals, sampledArea, area } = countryGeometry(feature);
  return { samples: normals.length / 3, sampledArea, area };
}

const zeroShares = (): Record<ZoneName, number> => Object.fromEntries(ZONE_ORDER.map((z) => [z, 0])) as Record<ZoneName, number>;
const largest = (shares: ZoneShares): ZoneName => ZONE_ORDER.reduce((best, z) => (shares[z] > shares[best] ? z : best), ZONE_ORDER[0]!);

export function countryShares(visibility: Visibility, countries: readonly Feature<Geometry, { name: string }>[]): CountryShare[] {
  // The zone from the Moon-up margins at the start and end of the phase, as the evaluator gives it, by table: this loop sees every sample.
  const { start, end } = spanTests(visibility, visibility.zoneSpan);
  const zoneIndex = [0, 1, 2, 3].map((k) => ZONE_ORDER.indexOf(zoneFromMargins({ start: k & 2 ? 1 : -1, end: k & 1 ? 1 : -1 })));
  return countries.map((feature) => {
    const { area, code, continent, normals, continentIndex, continents } = countryGeometry(feature);
    // counts[c * zones + z]: samples of continent c (the last row: all) in zone z.
    const zones = ZONE_ORDER.length;
    const counts = new Float64Array((continents.length + 1) * zones);
    const all = continents.length * zones;
    const samples = normals.length / 3;
    for (let k = 0; k < samples; k++) {
      const n: Normal = [normals[3 * k]!, normals[3 * k + 1]!, normals[3 * k + 2]!];
      const z = zoneIndex[(moonUpMargin(start, n) > 0 ? 2 : 0) + (moonUpMargin(end, n) > 0 ? 1 : 0)]!;
      counts[all + z]!++;
      if (continentIndex[k]! >= 0) counts[continentIndex[k]! * zones + z]!++;
    }
    const sharesOf = (row: number, total: number) => Object.fromEntries(ZONE_ORDER.map((z, i) => [z, counts[row * zones + i]! / total])) as Record<ZoneName, number>;
    const shares = sharesOf(continents.length, samples);
    const parts = continents.map((name, c) => {
      let total = 0;
      for (let i = 0; i < zones; i++) total += counts[c * zones + i]!;
      return { continent: name, area: (area * total) / samples, shares: sharesOf(c, total) };
    }).sort((a, b) => a.continent.localeCompare(b.continent));
    const main = parts.reduce<CountryPart | undefined>((best, p) => (!best || p.area > best.area ? p : best), undefined);
    const wholly = ZONE_ORDER.find((z) => shares[z] === 1);
    return {
      name: feature.properties.name,
      ...(code ? { code } : {}),
      ...(main ? { continent: main.continent } : continent ? { continent } : {}),
      area,
      shares,
      ...(wholly ? { wholly } : {}),
      mostly: largest(shares),
      parts,
    };
  });
}

export function continentShares(countries: readonly CountryShare[]): ContinentShare[] {
  const byContinent = new Map<string, CountryPart[]>();
  for (const c of countries) for (const part of c.parts) byContinent.set(part.continent, [...(byContinent.get(part.continent) ?? []), part]);
  return [...byContinent].sort(([a], [b]) => a.localeCompare(b)).map(([name, parts]) => {
    const total = parts.reduce((sum, p) => sum + p.area, 0);
    const shares = Object.fromEntries(ZONE_ORDER.map((z) => [z, parts.reduce((sum, p) => sum + p.area * p.shares[z], 0) / total])) as Record<ZoneName, number>;
    return { name, shares };
  });
}
