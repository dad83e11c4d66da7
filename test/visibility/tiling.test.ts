/**
 * The GeoJSON zones tile the plane: read as planar lon/lat, their union is
 * the whole 360° × 180° rectangle and the sum of their areas equals the
 * union's (no gaps, no overlaps) — checked with polygon-clipping, an
 * independent planar boolean library. And at the crossings of the start and
 * end horizon circles, where a shallow angle used to leave slivers, points
 * fall in the zone the exact circles give (beyond the stated edge tolerance)
 * and the one astronomy-engine's topocentric Moon gives (beyond 0.3°).
 */
import assert from 'node:assert/strict';
import { test } from 'node:test';
import type { Position } from 'geojson';
import polygonClipping, { type MultiPolygon as ClipMultiPolygon } from 'polygon-clipping';
import { findLunarEclipses } from '../../src/eclipses/lunar/catalogue.ts';
import type { LonLat } from '../../src/ephemeris/earth.ts';
import { GEOJSON_EDGE_TOLERANCE_DEG, visibilityGeoJson } from '../../src/outputs/geojson.ts';
import { circleRing } from '../../src/sphere/circles.ts';
import { capTest, moonUpMargin } from '../../src/visibility/lunar/moonUp.ts';
import { normalAt } from '../../src/sphere/normal.ts';
import { regionContains, ringArea, type PlanarMultiPolygon } from '../../src/sphere/regions.ts';
import { stage, visibilityEvaluator, visibilityOf, zoneFromMargins, ZONE_ORDER } from '../../src/visibility/lunar/visibility.ts';
import { distanceToEdgeDeg, moonUpTopocentric, seededRandom, useOurDeltaTInAstronomyEngine } from './support.ts';

useOurDeltaTInAstronomyEngine();

const one = (date: string) => {
  const [e] = findLunarEclipses({ from: new Date(`${date}T00:00:00Z`), to: new Date(`${date}T23:59:59Z`) });
  assert.ok(e, date);
  return e;
};
// Total, partial, penumbral; two near the solstices, the Moon far south or north, whose zones hold a pole.
const CASES = ['2026-03-03', '2026-08-28', '2027-02-20', '2029-06-26', '2028-12-31'].map(one);
const WHOLE_PLANE = 360 * 180;
const planarArea = (region: PlanarMultiPolygon | ClipMultiPolygon) =>
  (region as Position[][][]).reduce((sum, polygon) => sum + polygon.reduce((s, ring) => s + ringArea(ring), 0), 0);

test('the cases include a zone holding a pole, and all three kinds', () => {
  assert.deepEqual([...new Set(CASES.map((e) => e.kind))].sort(), ['partial', 'penumbral', 'total']);
  const polar = CASES.some((e) => {
    const v = visibilityOf(e);
    const evaluator = visibilityEvaluator(v);
    return evaluator.zoneAt([0, 90]) === 'sees-all' || evaluator.zoneAt([0, -90]) === 'sees-all';
  });
  assert.ok(polar);
});

for (const eclipse of CASES) {
  const visibility = visibilityOf(eclipse);
  const collection = visibilityGeoJson(visibility);
  const zoneRegion = (name: string) => collection.features.find((f) => f.properties!.layer === 'zone' && f.properties!.zone === name)!.geometry.coordinates;
  const zones = ZONE_ORDER.map(zoneRegion);

  test(`${eclipse.id} ${eclipse.kind}: the four zones tile the lon/lat plane (polygon-clipping: union = 360 × 180 = sum of areas)`, () => {
    const [first, ...rest] = zones as ClipMultiPolygon[];
    const union = polygonClipping.union(first!, ...rest);
    const sum = zones.reduce((s, z) => s + planarArea(z), 0);
    assert.ok(Math.abs(planarArea(union) - WHOLE_PLANE) < 1e-6, `union ${planarArea(union)}`);
    assert.ok(Math.abs(sum - planarArea(union)) < 1e-6, `sum ${sum}, union ${planarArea(union)}`);
    for (let i = 0; i < zones.length; i++) {
      assert.ok(planarArea(zones[i]!) > 100, `${ZONE_ORDER[i]} is not empty`);
      for (let j = i + 1; j < zones.length; j++) {
        const overlap = planarArea(polygonClipping.intersection(zones[i] as ClipMultiPolygon, zones[j] as ClipMultiPolygon));
        assert.ok(overlap < 1e-6, `${ZONE_ORDER[i]} ∩ ${ZONE_ORDER[j]} = ${overlap}`);
      }
    }
    // Each zone is a valid region: rebuilt by polygon-clipping it keeps its area (a ring crossing itself or a misplaced hole would not).
    for (const feature of collection.features.filter((f) => f.properties!.layer === 'zone')) {
      const region = feature.geometry.coordinates as ClipMultiPolygon;
      assert.ok(Math.abs(planarArea(polygonClipping.union(region)) - planarArea(region)) < 1e-6, `${feature.properties!.zone} is a valid region`);
    }
    if (eclipse.kind === 'total') {
      const all = zoneRegion('totality-all') as ClipMultiPolygon;
      const part = zoneRegion('totality-part') as ClipMultiPolygon;
      assert.ok(planarArea(polygonClipping.intersection(all, part)) < 1e-6);
      // Together they are the region up at U2 or U3, the union of those two moon-up layers.
      const layer = (name: string) => collection.features.find((f) => f.properties!.layer === 'moon-up' && f.properties!.contact === name)!.geometry.coordinates as ClipMultiPolygon;
      const either = planarArea(polygonClipping.union(layer('U2'), layer('U3')));
      assert.ok(Math.abs(planarArea(all) + planarArea(part) - either) < 0.2, `${planarArea(all) + planarArea(part)} vs ${either}`);
    }
  });

  test(`${eclipse.id} ${eclipse.kind}: every zone edge lies within ${GEOJSON_EDGE_TOLERANCE_DEG}° of the exact start or end circle`, () => {
    const start = stage(visibility, visibility.zoneSpan.start).cap;
    const end = stage(visibility, visibility.zoneSpan.end).cap;
    let worst = 0;
    for (const zone of zones) {
      for (const polygon of zone) {
        for (const [lon, lat] of polygon.flat()) {
          if (Math.abs(lon!) === 180 || Math.abs(lat!) === 90) continue;
          worst = Math.max(worst, Math.min(distanceToEdgeDeg(start, [lon!, lat!]), distanceToEdgeDeg(end, [lon!, lat!])));
        }
      }
    }
    assert.ok(worst <= GEOJSON_EDGE_TOLERANCE_DEG, `worst ${worst.toFixed(4)}°`);
    if (eclipse.kind === 'total') {
      const u2 = stage(visibility, 'U2').cap;
      const u3 = stage(visibility, 'U3').cap;
      for (const name of ['totality-all', 'totality-part']) {
        for (const [lon, lat] of zoneRegion(name).flat(2)) {
          if (Math.abs(lon!) === 180 || Math.abs(lat!) === 90) continue;
          const d = Math.min(distanceToEdgeDeg(u2, [lon!, lat!]), distanceToEdgeDeg(u3, [lon!, lat!]));
          assert.ok(d <= GEOJSON_EDGE_TOLERANCE_DEG, `${name} at ${lon},${lat}: ${d.toFixed(4)}°`);
        }
      }
    }
  });

  test(`${eclipse.id} ${eclipse.kind}: near the crossings of the start and end circles, every point falls in exactly one zone, the right one`, () => {
    const start = stage(visibility, visibility.zoneSpan.start).cap;
    const end = stage(visibility, visibility.zoneSpan.end).cap;
    const endTest = capTest(end);
    // The crossings: where the end margin changes sign along the start circle, traced every 0.01°.
    const ring = circleRing(start.centre, start.radiusDeg, 0.01);
    const crossings: LonLat[] = [];
    const at = (k: number): LonLat => [ring[k]![0]!, ring[k]![1]!];
    for (let k = 1; k < ring.length; k++) {
      const a = moonUpMargin(endTest, normalAt(at(k - 1)));
      const b = moonUpMargin(endTest, normalAt(at(k)));
      if (a > 0 !== b > 0) crossings.push(at(k));
    }
    assert.equal(crossings.length, 2, 'two horizon circles cross twice');
    const evaluator = visibilityEvaluator(visibility);
    const random = seededRandom(12);
    let exact = 0;
    let topocentric = 0;
    for (const [lon, lat] of crossings) {
      for (let k = 0; k < 1500; k++) {
        // Within 3° of the crossing, in the plane, kept on the map.
        const place: LonLat = [Math.max(-179.999, Math.min(179.999, lon + (random() * 2 - 1) * 3)), Math.max(-89.999, Math.min(89.999, lat + (random() * 2 - 1) * 3))];
        const containing = ZONE_ORDER.filter((_, z) => regionContains(zones[z]!, place));
        assert.equal(containing.length, 1, `${place} lies in ${containing.join(', ') || 'no zone'}`);
        const dStart = distanceToEdgeDeg(start, place);
        const dEnd = distanceToEdgeDeg(end, place);
        if (Math.min(dStart, dEnd) > GEOJSON_EDGE_TOLERANCE_DEG) {
          assert.equal(containing[0], evaluator.zoneAt(place), `${place}`);
          exact++;
        }
        if (Math.min(dStart, dEnd) > 0.3) {
          const expected = zoneFromMargins({ start: moonUpTopocentric(place, start.moment).up ? 1 : -1, end: moonUpTopocentric(place, end.moment).up ? 1 : -1 });
          assert.equal(containing[0], expected, `${place} (astronomy-engine)`);
          topocentric++;
        }
      }
    }
    assert.ok(exact > 2500 && topocentric > 500, `${exact} exact, ${topocentric} topocentric`);
  });
}
