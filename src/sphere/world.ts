/**
 * The world from world-atlas (Natural Earth, public domain), at a detail
 * chosen from the output's scale: finer data only where a pixel can show it
 * (measured here: drawing cost grows steeply with detail).
 */
import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { geoArea } from 'd3-geo';
import type { FeatureCollection, MultiLineString, Geometry, Position } from 'geojson';
import { feature, mesh } from 'topojson-client';
import type { GeometryCollection, Topology } from 'topojson-specification';

export type BasemapDetail = '110m' | '50m' | '10m';
export type BorderStyle = 'countries' | 'land';
export const BORDER_STYLES: readonly BorderStyle[] = ['countries', 'land'];

export const BASEMAP_CREDIT = 'Basemap: Natural Earth via world-atlas (public domain)';

export interface Basemap {
  readonly detail: BasemapDetail;
  readonly land: FeatureCollection<Geometry> | Geometry;
  readonly borders: MultiLineString;
  /** Country outlines, built on first use (only captions need them). */
  countries(): FeatureCollection<Geometry, { name: string }>;
}

const require = createRequire(import.meta.url);
const cache = new Map<BasemapDetail, Basemap>();

/**
 * Natural Earth detail for a scale. 1:110m drops the small islands that
 * eclipse zones cross (much of the Pacific) and shows its corners by about
 * 4 px/° (a world map some 1500 px wide); 1:50m holds up to about 20 px/°;
 * beyond that, regional views take 1:10m.
 */
export function detailForScale(pixelsPerDegree: number): BasemapDetail {
  if (pixelsPerDegree <= 4) return '110m';
  if (pixelsPerDegree <= 20) return '50m';
  return '10m';
}

type WorldTopology = Topology<{ countries: GeometryCollection<{ name: string }>; land: GeometryCollection }>;

function readTopology(detail: BasemapDetail): [WorldTopology, GeometryCollection<{ name: string }>] {
  const topology = JSON.parse(readFileSync(require.resolve(`world-atlas/countries-${detail}.json`), 'utf8')) as WorldTopology;
  return [topology, topology.objects.countries];
}

/**
 * d3-geo reads a ring's winding on the sphere: a polygon that comes out
 * larger than a hemisphere is everything but its outline. No landmass is
 * that large, so such a polygon is a ring wound the wrong way in the data
 * (the 1:10m land has one, a speck in the Indian Ocean, which otherwise
 * floods every regional view with land): reverse its rings.
 */
function withLandWinding(land: FeatureCollection<Geometry>): FeatureCollection<Geometry> {
  const fix = (rings: Position[][]) => (geoArea({ type: 'Polygon', coordinates: rings }) > 2 * Math.PI ? rings.map((ring) => [...ring].reverse()) : rings);
  return {
    ...land,
    features: land.features.map((f) => {
      const g = f.geometry;
      if (g.type === 'Polygon') return { ...f, geometry: { ...g, coordinates: fix(g.coordinates) } };
      if (g.type === 'MultiPolygon') return { ...f, geometry: { ...g, coordinates: g.coordinates.map(fix) } };
      return f;
    }),
  };
}

/**
 * The country outlines of a detail, read afresh and kept by no one: for a
 * use that comes once in a while (a solar caption's countries crossed), so
 * that a long-running process does not hold 1:50m outlines (some 13 MB of
 * heap) between uses.
 */
export function readCountries(detail: BasemapDetail): FeatureCollection<Geometry, { name: string }> {
  return feature(...readTopology(detail)) as FeatureCollection<Geometry, { name: string }>;
}

/** World data is immutable: parse each detail once per process. */
export function loadBasemap(detail: BasemapDetail): Basemap {
  let basemap = cache.get(detail);
  if (!basemap) {
    const [topology] = readTopology(detail);
    let countries: FeatureCollection<Geometry, { name: string }> | undefined;
    basemap = {
      detail,
      land: withLandWinding(feature(topology, topology.objects.land)),
      borders: mesh(topology, topology.objects.countries, (a, b) => a !== b),
      // Read again when asked, rather than keep the whole topology alive for a caption.
      countries: () => (countries ??= readCountries(detail)),
    };
    cache.set(detail, basemap);
  }
  return basemap;
}
