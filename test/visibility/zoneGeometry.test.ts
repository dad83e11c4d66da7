/**
 * The zones are computed once (visibility/lunar/zones.ts) in two forms: the
 * spherical polygons a map paints, and the planar regions GeoJSON writes.
 * Both must put every place in the same zone as the evaluator's rule
 * (zoneFromMargins). The spherical polygons are checked with d3-geo's own
 * point-in-spherical-polygon test, geoContains (an independent library's
 * implementation, not ours); the planar regions with regionContains. Places
 * within 0.5° of either horizon circle are left out: the map's rings are
 * drawn every 0.25° of bearing and the GeoJSON grid is 0.5°.
 */
import assert from 'node:assert/strict';
import { test } from 'node:test';
import { geoContains } from 'd3-geo';
import { findLunarEclipses } from '../../src/eclipses/lunar/catalogue.ts';
import type { LunarEclipse } from '../../src/eclipses/lunar/types.ts';
import { angularDistanceDeg } from '../../src/sphere/circles.ts';
import { placeGrid, regionContains } from '../../src/sphere/regions.ts';
import { stage, visibilityEvaluator, visibilityOf, ZONE_ORDER, type ZoneName } from '../../src/visibility/lunar/visibility.ts';
import { PAINTED_ZONES, totalityRegions, visibilityZonePolygons, zoneRegions } from '../../src/visibility/lunar/zones.ts';
import { randomPlaces } from './support.ts';

const one = (date: string): LunarEclipse => {
  const [e] = findLunarEclipses({ from: new Date(`${date}T00:00:00Z`), to: new Date(`${date}T23:59:59Z`) });
  assert.ok(e, date);
  return e;
};
// A total, a partial and a penumbral eclipse (the kinds as the catalogue gives them, checked below).
const CASES = [one('2026-03-03'), one('2026-08-28'), one('2027-02-20')];
const EDGE_MARGIN_DEG = 0.5;

test('the cases are one of each kind', () => {
  assert.deepEqual(CASES.map((e) => e.kind), ['total', 'partial', 'penumbral']);
});

for (const eclipse of CASES) {
  test(`${eclipse.id} ${eclipse.kind}: map polygons (d3-geo geoContains), GeoJSON regions and the evaluator agree`, () => {
    const visibility = visibilityOf(eclipse);
    const zoneAt = visibilityEvaluator(visibility).zoneAt;
    const polygons = visibilityZonePolygons(visibility);
    const regions = zoneRegions(visibility, placeGrid(0.5));
    const caps = [stage(visibility, visibility.zoneSpan.start).cap, stage(visibility, visibility.zoneSpan.end).cap];
    const seen = new Set<ZoneName>();
    let checked = 0;
    for (const place of randomPlaces(1500, 19510101)) {
      if (caps.some((cap) => Math.abs(angularDistanceDeg(cap.centre, place) - cap.radiusDeg) < EDGE_MARGIN_DEG)) continue;
      checked++;
      const expected = zoneAt(place);
      seen.add(expected);
      // On the map: in exactly one painted polygon, or in none (the background) for places that see nothing.
      const painted = PAINTED_ZONES.filter((z) => geoContains(polygons[z], [place[0], place[1]]));
      assert.deepEqual(painted, expected === 'sees-none' ? [] : [expected], `map at ${place}`);
      // In GeoJSON: in exactly one of the four regions.
      const inRegions = ZONE_ORDER.filter((z) => regionContains(regions[z], place));
      assert.deepEqual(inRegions, [expected], `GeoJSON at ${place}`);
    }
    assert.ok(checked > 1300, `${checked} places checked`);
    assert.equal(seen.size, 4, `every zone met: ${[...seen].join(', ')}`);
  });
}

test('totality regions exist for a total eclipse only, and lie where totality is seen in part or whole', () => {
  const grid = placeGrid(0.5);
  const [total, partial] = CASES;
  assert.equal(totalityRegions(visibilityOf(partial!), grid), undefined);
  const visibility = visibilityOf(total!);
  const regions = totalityRegions(visibility, grid)!;
  const totalityZoneAt = visibilityEvaluator(visibility).totalityZoneAt;
  const caps = [stage(visibility, 'U2').cap, stage(visibility, 'U3').cap];
  for (const place of randomPlaces(600, 20260303)) {
    if (caps.some((cap) => Math.abs(angularDistanceDeg(cap.centre, place) - cap.radiusDeg) < EDGE_MARGIN_DEG)) continue;
    const expected = totalityZoneAt(place);
    assert.equal(regionContains(regions.all, place), expected === 'totality-all', `all at ${place}`);
    assert.equal(regionContains(regions.part, place), expected === 'totality-part', `part at ${place}`);
  }
});
