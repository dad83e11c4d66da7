/**
 * Where the Moon is up (Meeus, Astronomical Algorithms, ch. 15): the almanac convention of Meeus,
 * Astronomical Algorithms ch. 15 — the upper limb on the sea-level apparent
 * horizon, i.e. a geocentric altitude h0 = 0.7275 π_M − 34′.
 *
 * On the ellipsoid: the Moon's geocentric altitude at a place is measured
 * from the place's geodetic horizon, sin h = n̂ · û, where n̂ is the geodetic
 * normal (from geodetic latitude and longitude) and û the Moon's direction
 * in the Earth-fixed frame. Both are unit vectors of a sphere parameterised
 * by (lon, lat), so "Moon up" is exactly a circular cap of radius 90° − h0 in
 * geodetic coordinates, centred on the sub-lunar point.
 */
import { ephemerisTime, moonPositionKm } from '../../ephemeris/bodies.ts';
import { subBodyPoint, type LonLat } from '../../ephemeris/earth.ts';
import type { Moment } from '../../ephemeris/time.ts';
import { norm } from '../../ephemeris/vector.ts';
import { normalAt, type Normal } from '../../sphere/normal.ts';
import { EARTH_EQUATORIAL_RADIUS_KM } from '../../ephemeris/constants.ts';

const DEG = Math.PI / 180;
/** Standard refraction at the horizon, degrees (Meeus ch. 15). */
export const HORIZON_REFRACTION_DEG = 34 / 60;

/** The region where the Moon is up at one instant. */
export interface MoonUpCap {
  readonly moment: Moment;
  /** Sub-lunar point, geodetic lon/lat degrees. */
  readonly centre: LonLat;
  /** Angular radius of the cap, degrees (90° − h0). */
  readonly radiusDeg: number;
  /** h0: the Moon's geocentric altitude at rise and set, degrees. */
  readonly horizonAltitudeDeg: number;
}

/** h0 = 0.7275 π_M − 34′ (Meeus ch. 15), degrees. */
export function moonHorizonAltitudeDeg(moonParallaxDeg: number): number {
  return 0.7275 * moonParallaxDeg - HORIZON_REFRACTION_DEG;
}

export function moonUpCap(moment: Moment): MoonUpCap {
  const moonKm = moonPositionKm(ephemerisTime(moment.ttDays));
  const parallaxDeg = Math.asin(EARTH_EQUATORIAL_RADIUS_KM / norm(moonKm)) / DEG;
  const horizonAltitudeDeg = moonHorizonAltitudeDeg(parallaxDeg);
  return { moment, centre: subBodyPoint(moonKm, moment), radiusDeg: 90 - horizonAltitudeDeg, horizonAltitudeDeg };
}

/** A cap prepared for fast evaluation: the Moon's Earth-fixed direction and sin h0. */
export interface CapTest {
  readonly x: number;
  readonly y: number;
  readonly z: number;
  readonly sinHorizon: number;
}

export function capTest(cap: MoonUpCap): CapTest {
  const [lon, lat] = cap.centre;
  const cosLat = Math.cos(lat * DEG);
  return {
    x: cosLat * Math.cos(lon * DEG),
    y: cosLat * Math.sin(lon * DEG),
    z: Math.sin(lat * DEG),
    sinHorizon: Math.sin(cap.horizonAltitudeDeg * DEG),
  };
}

/** A place's geodetic normal, as a unit vector. */

/**
 * sin h − sin h0 at a place: positive where the Moon is up. A smooth
 * function of position, which is what the region tracing needs.
 */
export function moonUpMargin(test: CapTest, n: Normal): number {
  return n[0] * test.x + n[1] * test.y + n[2] * test.z - test.sinHorizon;
}
