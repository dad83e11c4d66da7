/**
 * Which country holds a point of a solar eclipse's path: the caption tests
 * only the polygons whose own bounds hold the point. The counts must be
 * those of d3-geo's geoContains on each whole Natural Earth 1:50m country
 * (world-atlas, read here with topojson-client), first country of the data
 * that holds the point, as the caption counted before: for paths across
 * Russia's long mainland, across the Pacific near ±180°, and in the south.
 */
import assert from 'node:assert/strict';
import { test } from 'node:test';
import { createRequire } from 'node:module';
import { readFileSync } from 'node:fs';
import { geoBounds, geoContains } from 'd3-geo';
import type { Feature, FeatureCollection, Geometry } from 'geojson';
import { feature } from 'topojson-client';
import { countriesCrossed, pathSamples } from '../../src/outputs/solarCaption.ts';
import { solarEclipseOn } from '../eclipses/solarSupport.ts';

const require = createRequire(import.meta.url);
const topology = JSON.parse(readFileSync(require.resolve('world-atlas/countries-50m.json'), 'utf8'));
const countries = (feature(topology, topology.objects.countries) as unknown as FeatureCollection<Geometry, { name: string }>).features;
const withBounds = countries.map((f: Feature<Geometry, { name: string }>) => ({ f, b: geoBounds(f) }));

/** Samples per country name: whole features, d3-geo's geoContains, the first country of the data that holds the point. */
function reference(points: readonly (readonly [number, number])[]): Map<string, number> {
  const counts = new Map<string, number>();
  for (const p of points) {
    const hit = withBounds.find(({ f, b: [[w, s], [e, n]] }) => p[1] >= s && p[1] <= n && (w <= e ? p[0] >= w && p[0] <= e : p[0] >= w || p[0] <= e) && geoContains(f, [p[0], p[1]]));
    if (hit) counts.set(hit.f.properties.name, (counts.get(hit.f.properties.name) ?? 0) + 1);
  }
  return counts;
}

for (const [id, where] of [
  ['2030-06-01', 'annular across north Africa, Russia and Japan (from memory)'],
  ['2035-09-02', 'total across China, Korea and Japan into the Pacific (from memory)'],
  ['2028-07-22', 'total across Australia and New Zealand (from memory)'],
] as const) {
  test(`${id}, ${where}: the countries crossed and their samples, as geoContains counts them on whole countries`, () => {
    const eclipse = solarEclipseOn(id);
    const expected = reference(pathSamples(eclipse));
    const crossed = countriesCrossed(eclipse);
    assert.ok(crossed.length >= 2, `${crossed.length} countries`);
    assert.deepEqual(new Map(crossed.map((c) => [c.name, c.samples])), expected);
  });
}
