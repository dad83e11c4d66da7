/**
 * Where a globe should look: at the edge of the Moon-up region where the
 * most people live — the zone where the Moon sets during the eclipse, or the
 * one where it rises, whichever holds more of the gazetteer's people — at
 * that zone's population-weighted centre.
 */
import type { LonLat } from '../../ephemeris/earth.ts';
import { populousPlaces } from '../../places/gazetteer.ts';
import { stage, visibilityEvaluator, type Visibility } from './visibility.ts';

/** Towns of this size and more carry nearly all of the weight and keep the sum quick. */
const MIN_POPULATION = 100_000;

export function storyCentre(visibility: Visibility): LonLat {
  const zoneAt = visibilityEvaluator(visibility).zoneAt;
  const sums = { 'sets-during': { people: 0, x: 0, y: 0, z: 0 }, 'rises-during': { people: 0, x: 0, y: 0, z: 0 } };
  const rad = Math.PI / 180;
  for (const place of populousPlaces(MIN_POPULATION)) {
    const zone = zoneAt([place.lonDeg, place.latDeg]);
    if (zone !== 'sets-during' && zone !== 'rises-during') continue;
    const sum = sums[zone];
    const [lon, lat] = [place.lonDeg * rad, place.latDeg * rad];
    sum.people += place.population;
    sum.x += place.population * Math.cos(lat) * Math.cos(lon);
    sum.y += place.population * Math.cos(lat) * Math.sin(lon);
    sum.z += place.population * Math.sin(lat);
  }
  const best = sums['sets-during'].people >= sums['rises-during'].people ? sums['sets-during'] : sums['rises-during'];
  if (best.people === 0) return stage(visibility, 'greatest').cap.centre;
  // The mean direction of the zone's people, as a point on the sphere.
  return [Math.atan2(best.y, best.x) / rad, Math.atan2(best.z, Math.hypot(best.x, best.y)) / rad];
}
