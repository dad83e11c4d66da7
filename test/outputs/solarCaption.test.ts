/**
 * Solar captions and alt text: facts from the geometry against independent
 * checks. The countries the path crosses against d3-geo's geoContains on the
 * path polygons of our GeoJSON (traced on a grid from the local
 * circumstances, not from the outline sampling the caption uses) and on the
 * world-atlas (Natural Earth) countries; what the largest cities see against
 * astronomy-engine's SearchLocalSolarEclipse; the duration at greatest and
 * the path width against the recalled values (marked "from memory"); the
 * eye-safety caution in both texts, in the scope the eclipse calls for, and
 * the lunar naked-eye line in neither.
 */
import assert from 'node:assert/strict';
import { after, before, test } from 'node:test';
import { createRequire } from 'node:module';
import { readFileSync } from 'node:fs';
import { geoBounds, geoContains } from 'd3-geo';
import type { Feature, FeatureCollection, Geometry, MultiPolygon } from 'geojson';
import { feature } from 'topojson-client';
import isoCountries from 'i18n-iso-countries';
import { DeltaT_EspenakMeeus, MakeTime, Observer as EngineObserver, SearchLocalSolarEclipse, SetDeltaTFunction } from 'astronomy-engine';
import { standardDeltaTModel } from '../../src/ephemeris/deltaT.ts';
import { decimalYearFromDays } from '../../src/ephemeris/time.ts';
import { solarGeoJson } from '../../src/outputs/solarGeojson.ts';
import { pathSamples, solarCaption, solarCaptionText, type SolarCaption } from '../../src/outputs/solarCaption.ts';
import { safetyScopeForEclipse, solarSafetyText } from '../../src/words/solar/caution.ts';
import { minutesAndSeconds } from '../../src/words/solar/text.ts';
import { solarEclipseOn } from '../eclipses/solarSupport.ts';

const DAY_MS = 86_400_000;

before(() => {
  // Test code only: astronomy-engine's global ΔT set to our model, so that its times are comparable to ours.
  const model = standardDeltaTModel();
  SetDeltaTFunction((ut: number) => model.at(decimalYearFromDays(ut)).seconds);
});
after(() => SetDeltaTFunction(DeltaT_EspenakMeeus));

const captions = new Map<string, SolarCaption>();
function captionOf(id: string): SolarCaption {
  let c = captions.get(id);
  if (!c) captions.set(id, (c = solarCaption(solarEclipseOn(id))));
  return c;
}

/** Natural Earth 1:50m countries (world-atlas), read here directly. */
function worldCountries(): Feature<Geometry, { name: string }>[] {
  const require = createRequire(import.meta.url);
  const topology = JSON.parse(readFileSync(require.resolve('world-atlas/countries-50m.json'), 'utf8'));
  return (feature(topology, topology.objects.countries) as unknown as FeatureCollection<Geometry, { name: string }>).features;
}

/**
 * The path polygons of our GeoJSON, as one MultiPolygon for d3-geo: GeoJSON
 * winds outer rings counter-clockwise (RFC 7946 §3.1.6), d3-geo reads a
 * spherical polygon's inside as the clockwise side (d3-geo's documented
 * convention), so every ring is reversed here.
 */
function pathPolygon(id: string): MultiPolygon {
  const collection = solarGeoJson(solarEclipseOn(id), { obscurationLevels: [0.5] });
  const coordinates = collection.features
    .filter((f) => f.properties?.layer === 'path')
    .flatMap((f) => (f.geometry as MultiPolygon).coordinates)
    .map((polygon) => polygon.map((ring) => [...ring].reverse()));
  return { type: 'MultiPolygon', coordinates };
}

/**
 * Countries holding points of the path polygon: a 0.1° lattice over the
 * cells the path's own vertices pass through (and their neighbours), each
 * point inside the path by geoContains placed in a country by geoContains.
 */
function countriesInPath(path: MultiPolygon, countries: readonly Feature<Geometry, { name: string }>[]): Map<string, number> {
  const cells = new Set<string>();
  for (const polygon of path.coordinates) {
    for (const [lon, lat] of polygon[0]!) {
      for (let dx = -1; dx <= 1; dx++) for (let dy = -1; dy <= 1; dy++) cells.add(`${Math.floor(lon!) + dx},${Math.floor(lat!) + dy}`);
    }
  }
  const bounds = countries.map((c) => geoBounds(c));
  const found = new Map<string, number>();
  for (const cell of cells) {
    const [x, y] = cell.split(',').map(Number) as [number, number];
    for (let i = 0; i < 10; i++) {
      for (let j = 0; j < 10; j++) {
        const point: [number, number] = [x + (i + 0.5) / 10, y + (j + 0.5) / 10];
        if (point[0] > 180 || point[1] > 90 || !geoContains(path, point)) continue;
        const k = countries.findIndex((c, n) => {
          const [[w, s], [e, north]] = bounds[n]!;
          const inBox = point[1] >= s && point[1] <= north && (w <= e ? point[0] >= w && point[0] <= e : point[0] >= w || point[0] <= e);
          return inBox && geoContains(c, point);
        });
        if (k < 0) continue;
        const numeric = countries[k]!.id === undefined ? undefined : String(countries[k]!.id).padStart(3, '0');
        const code = (numeric && isoCountries.numericToAlpha2(numeric)) || countries[k]!.properties.name;
        found.set(code, (found.get(code) ?? 0) + 1);
      }
    }
  }
  return found;
}

for (const id of ['2024-04-08', '2027-08-02']) {
  test(`${id}: the countries the path crosses against d3-geo geoContains on the GeoJSON path and the Natural Earth countries`, () => {
    const caption = captionOf(id);
    const claimed = new Set(caption.crossed.map((c) => c.code ?? c.name));
    const path = pathPolygon(id);
    // The caption's own samples lie in the traced path: of each eleven across the shadow two are the outline points on
    // the limits themselves, about half of which fall just outside a traced edge (it cuts corners by up to a 0.25° cell).
    const samples = pathSamples(solarEclipseOn(id));
    const inside = samples.filter((p) => geoContains(path, [p[0], p[1]])).length;
    assert.ok(inside / samples.length > 0.85, `${inside} of ${samples.length} samples inside the traced path`);
    const found = countriesInPath(path, worldCountries());
    // Every country holding a clear part of the traced path (at least five 0.1° lattice points, ~50 km²) is named.
    for (const [code, count] of found) if (count >= 5) assert.ok(claimed.has(code), `${code}: ${count} lattice points in the path, not in the caption (${[...claimed].join(', ')})`);
    // Every country the caption names by many samples holds lattice points of the traced path.
    for (const c of caption.crossed) if (c.samples >= 20) assert.ok((found.get(c.code ?? c.name) ?? 0) > 0, `${c.name}: ${c.samples} samples, no lattice point of the path`);
  });
}

test('2024-04-08: the path crosses Mexico, the United States and Canada, in that order of the path (from memory) — the caption names all three', () => {
  const caption = captionOf('2024-04-08');
  assert.deepEqual(caption.crossed.map((c) => c.code).sort(), ['CA', 'MX', 'US']);
  assert.match(caption.text, /The path of totality crosses (the United States|Mexico|Canada)(, | and )/);
  assert.match(caption.alt, /the United States/);
});

test('the duration and width at greatest in the caption: those of the record, and the recalled 4 min 28 s, 198 km for 2024-04-08 (from memory)', () => {
  const eclipse = solarEclipseOn('2024-04-08');
  const caption = captionOf('2024-04-08');
  assert.ok(caption.text.includes(`totality lasts ${minutesAndSeconds(eclipse.durations.centralSeconds!)}`));
  assert.ok(caption.text.includes(`the path is ${Math.round(eclipse.pathWidthKm!)} km wide`));
  assert.match(caption.text, /totality lasts 4 min 2[6-9] s/);
  assert.match(caption.text, /the path is (19[5-9]|20[0-1]) km wide/);
  assert.match(caption.text, /^Total solar eclipse of 8 April 2024\. Greatest eclipse at 18:1[78] UTC near 25\.[23]\d°N, 104\.[01]\d°W/);
});

for (const id of ['2024-04-08', '2023-10-14', '2027-08-02']) {
  test(`${id}: what the largest cities see against astronomy-engine SearchLocalSolarEclipse (kind; central start within 6 s; obscuration within 0.002 when the Sun is up at peak)`, () => {
    const caption = captionOf(id);
    assert.ok(caption.cities.length > 0, 'some large city sees the eclipse');
    for (const city of caption.cities) {
      assert.ok(city.population >= 1_000_000, `${city.name}: among the largest (gazetteer population)`);
      const engine = SearchLocalSolarEclipse(MakeTime(new Date(Date.parse(`${id}T00:00:00Z`) - 2 * DAY_MS)), new EngineObserver(city.latDeg, city.lonDeg, 0));
      assert.equal(engine.peak.time.date.toISOString().slice(0, 10) === id || Math.abs(engine.peak.time.date.getTime() - Date.parse(`${id}T12:00:00Z`)) < DAY_MS, true, `${city.name}: the same eclipse`);
      if (city.kind === 'total' || city.kind === 'annular') {
        assert.equal(engine.kind, city.kind, `${city.name}: kind`);
        const c2 = engine.total_begin;
        assert.ok(c2, `${city.name}: astronomy-engine has a central phase`);
        // Near a limit the contacts move fast with the Moon's radius (astronomy-engine's 1737.4 km against our k2): 6 s for
        // a central phase of a minute or more, 30 s for a shorter one (a city grazing the edge).
        const seconds = Math.abs(c2!.time.date.getTime() / DAY_MS - (city.atUtDays + 10_957.5)) * 86_400;
        assert.ok(seconds < (city.centralSeconds! >= 60 ? 6 : 30), `${city.name}: C2 differs by ${seconds.toFixed(1)} s (central phase ${city.centralSeconds!.toFixed(0)} s)`);
      } else if (engine.peak.altitude > 0.5) {
        assert.ok(Math.abs(engine.obscuration - city.obscurationSeen) < 0.002, `${city.name}: obscuration ${city.obscurationSeen} against ${engine.obscuration}`);
      }
    }
    // Each city's sentence is in the caption, with its percentage or its duration.
    for (const city of caption.cities) {
      const figure = city.centralSeconds !== undefined ? minutesAndSeconds(city.centralSeconds) : `${Math.round(city.obscurationSeen * 100)} %`;
      assert.ok(caption.text.includes(`${city.name} (`) && caption.text.includes(figure), `${city.name} with ${figure}`);
    }
  });
}

test('the caution: long form ending the caption, short form in the alt text, scoped to the eclipse; the lunar naked-eye line in neither (issue 15; ISO 12312-2)', () => {
  for (const id of ['2024-04-08', '2023-10-14', '2027-08-02']) {
    const eclipse = solarEclipseOn(id);
    const caption = captionOf(id);
    const scope = safetyScopeForEclipse(eclipse.kind);
    assert.ok(caption.text.endsWith(solarSafetyText('long', scope)), `${id}: long caution last`);
    assert.ok(caption.alt.endsWith(solarSafetyText('short', scope)), `${id}: short caution last`);
    for (const text of [caption.text, caption.alt, solarCaptionText(caption)]) {
      assert.match(text, /ISO 12312-2/);
      assert.doesNotMatch(text, /naked eye/i);
    }
  }
  // An annular eclipse has no totality: no viewers-off advice at all.
  assert.doesNotMatch(captionOf('2023-10-14').text, /may viewers come off/);
  assert.match(captionOf('2024-04-08').text, /may viewers come off/);
});

test('a partial eclipse: no path, the penumbra alone (2025-03-29, partial, from memory)', () => {
  const eclipse = solarEclipseOn('2025-03-29');
  assert.equal(eclipse.kind, 'partial');
  const caption = solarCaption(eclipse, { cities: 2 });
  assert.deepEqual(caption.crossed, []);
  assert.match(caption.text, /^Partial solar eclipse of 29 March 2025\./);
  assert.match(caption.text, /Only the Moon's penumbra reaches the Earth/);
  assert.doesNotMatch(caption.text, /The path of [a-z ]+ crosses/);
  assert.match(caption.text, /near 61\.\d\d°N, 77\.\d\d°W, with the Sun on the horizon there/);
  assert.ok(caption.partialContinents.some((c) => c.name === 'Europe'), 'seen from Europe');
  assert.ok(caption.cities.length <= 2 && caption.cities.every((c) => c.kind === 'partial'));
});

test('same eclipse, same bytes (deterministic output)', () => {
  const a = solarCaptionText(captionOf('2024-04-08'));
  captions.clear();
  assert.equal(solarCaptionText(captionOf('2024-04-08')), a);
});
