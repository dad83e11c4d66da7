/** Shared helpers: seeded places and astronomy-engine's full topocentric Moon (refraction on). */
import { Body, Equator, Horizon, Observer, SetDeltaTFunction } from 'astronomy-engine';
import { standardDeltaTModel } from '../../src/ephemeris/deltaT.ts';
import type { LonLat } from '../../src/ephemeris/earth.ts';
import { astroTimeOf, decimalYearFromDays, type Moment } from '../../src/ephemeris/time.ts';
import type { MoonUpCap } from '../../src/visibility/lunar/moonUp.ts';
import { MOON_RADIUS_EARTH_RADII } from '../../src/ephemeris/constants.ts';

/** astronomy-engine's internal time steps must share our ΔT for these checks. */
export function useOurDeltaTInAstronomyEngine(): void {
  const model = standardDeltaTModel();
  SetDeltaTFunction((ut: number) => model.at(decimalYearFromDays(ut)).seconds);
}

/** Mulberry32: a small seeded generator, so that every run tries the same places. */
export function seededRandom(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/** Places spread evenly over the sphere (uniform in sin latitude). */
export function randomPlaces(count: number, seed: number): LonLat[] {
  const random = seededRandom(seed);
  return Array.from({ length: count }, () => [random() * 360 - 180, (Math.asin(2 * random() - 1) * 180) / Math.PI] as LonLat);
}

/**
 * Is the Moon's upper limb above the sea-level horizon, by a full
 * topocentric computation: astronomy-engine Observer → Equator (of date,
 * with aberration) → Horizon with normal refraction.
 */
export function moonUpTopocentric(place: LonLat, moment: Moment): { up: boolean; altitudeDeg: number; limbAltitudeDeg: number } {
  const time = astroTimeOf(moment);
  const observer = new Observer(place[1], place[0], 0);
  const equ = Equator(Body.Moon, time, observer, true, true);
  const altitudeDeg = Horizon(time, observer, equ.ra, equ.dec, 'normal').altitude;
  const semiDiameterDeg = (Math.asin((MOON_RADIUS_EARTH_RADII * 6378.137) / (equ.dist * 1.495978707e8)) * 180) / Math.PI;
  return { up: altitudeDeg + semiDiameterDeg > 0, altitudeDeg, limbAltitudeDeg: altitudeDeg + semiDiameterDeg };
}

/** Angular distance from a place to a cap's edge, degrees. */
export function distanceToEdgeDeg(cap: MoonUpCap, [lon, lat]: LonLat): number {
  const d = Math.PI / 180;
  const [clon, clat] = cap.centre;
  const cos = Math.sin(lat * d) * Math.sin(clat * d) + Math.cos(lat * d) * Math.cos(clat * d) * Math.cos((lon - clon) * d);
  return Math.abs(Math.acos(Math.min(1, Math.max(-1, cos))) / d - cap.radiusDeg);
}
