/**
 * Which countries and continents see what: each country's outline and
 * centroid tested against the zones. A zone edge is a circle of about 90°,
 * so it cannot pass through a country without crossing its outline: a
 * country whose outline points all lie in one zone lies wholly in it.
 */
import { geoArea, geoCentroid } from 'd3-geo';
import type { Feature, Geometry, Position } from 'geojson';
import { countries as countryTable, continents as continentNames } from 'countries-list';
import isoCountries from 'i18n-iso-countries';
import { normalAt, type Normal } from './moonUp.ts';
import type { Visibility, VisibilityEvaluator, ZoneName } from './visibility.ts';
import { visibilityEvaluator, ZONE_ORDER } from './visibility.ts';

export interface CountryShare {
  readonly name: string;
  /** ISO 3166-1 alpha-2, where known. */
  readonly code?: string;
  readonly continent?: string;
  /** Area, steradians. */
  readonly area: number;
  /** Share of the outline's sample points in each zone. */
  readonly shares: Readonly<Record<ZoneName, number>>;
  /** The zone holding every sample point, if one does. */
  readonly wholly?: ZoneName;
  /** The zone holding most sample points. */
  readonly mostly: ZoneName;
}

export interface ContinentShare {
  readonly name: string;
  /** Area-weighted share of the continent's countries in each zone. */
  readonly shares: Readonly<Record<ZoneName, number>>;
}

function samplePoints(geometry: Geometry): Position[] {
  const points: Position[] = [];
  const addRing = (ring: Position[]) => {
    const step = Math.max(1, Math.floor(ring.length / 80));
    for (let i = 0; i < ring.length; i += step) points.push(ring[i]!);
  };
  if (geometry.type === 'Polygon') geometry.coordinates.forEach(addRing);
  else if (geometry.type === 'MultiPolygon') geometry.coordinates.forEach((p) => p.forEach(addRing));
  return points;
}

/** What each country's outline gives, computed once per feature: world data is immutable. */
interface CountryGeometry {
  readonly normals: readonly Normal[];
  readonly area: number;
}
const geometryCache = new WeakMap<Feature, CountryGeometry>();

function countryGeometry(feature: Feature<Geometry>): CountryGeometry {
  let cached = geometryCache.get(feature);
  if (!cached) {
    const points = [...samplePoints(feature.geometry), geoCentroid(feature)];
    cached = { normals: points.map((p) => normalAt([p[0]!, p[1]!])), area: geoArea(feature) };
    geometryCache.set(feature, cached);
  }
  return cached;
}

export function countryShares(visibility: Visibility, countries: readonly Feature<Geometry, { name: string }>[], evaluator: VisibilityEvaluator = visibilityEvaluator(visibility)): CountryShare[] {
  return countries.map((feature) => {
    const { normals, area } = countryGeometry(feature);
    const counts = Object.fromEntries(ZONE_ORDER.map((z) => [z, 0])) as Record<ZoneName, number>;
    for (const n of normals) counts[evaluator.zoneAtNormal(n)]++;
    const shares = Object.fromEntries(ZONE_ORDER.map((z) => [z, counts[z] / normals.length])) as Record<ZoneName, number>;
    const numeric = feature.id === undefined ? undefined : String(feature.id).padStart(3, '0');
    const code = numeric ? isoCountries.numericToAlpha2(numeric) : undefined;
    const continentCode = code ? (countryTable as Record<string, { continent: string }>)[code]?.continent : undefined;
    const continent = continentCode ? (continentNames as Record<string, string>)[continentCode] : undefined;
    const mostly = ZONE_ORDER.reduce((best, z) => (shares[z] > shares[best] ? z : best), ZONE_ORDER[0]!);
    const wholly = ZONE_ORDER.find((z) => shares[z] === 1);
    return {
      name: feature.properties.name,
      ...(code ? { code } : {}),
      ...(continent ? { continent } : {}),
      area,
      shares,
      ...(wholly ? { wholly } : {}),
      mostly,
    };
  });
}

export function continentShares(countries: readonly CountryShare[]): ContinentShare[] {
  const byContinent = new Map<string, CountryShare[]>();
  for (const c of countries) {
    if (!c.continent) continue;
    byContinent.set(c.continent, [...(byContinent.get(c.continent) ?? []), c]);
  }
  return [...byContinent].sort(([a], [b]) => a.localeCompare(b)).map(([name, members]) => {
    const total = members.reduce((sum, c) => sum + c.area, 0);
    const shares = Object.fromEntries(ZONE_ORDER.map((z) => [z, members.reduce((sum, c) => sum + c.area * c.shares[z], 0) / total])) as Record<ZoneName, number>;
    return { name, shares };
  });
}
