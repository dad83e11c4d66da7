/**
 * The Earth's rotation: sidereal time and the point beneath a body.
 * Uses OUR UT (from the ΔT model in use), never astronomy-engine's global ΔT.
 */
import { e_tilt } from 'astronomy-engine';
import { toEquatorOfDate } from './frames.ts';
import { astroTimeOf, type Moment } from './time.ts';
import type { Vec3 } from './vector.ts';

/** A place on the Earth: longitude east-positive and latitude, degrees. */
export type LonLat = readonly [lonDeg: number, latDeg: number];

/** Wrap a longitude into [−180, 180). */
export function wrapLongitudeDeg(lonDeg: number): number {
  const wrapped = ((((lonDeg + 180) % 360) + 360) % 360) - 180;
  return wrapped;
}

/**
 * Greenwich apparent sidereal time, degrees in [0, 360): Earth rotation angle
 * (IERS Conventions 2010, eq. 5.15) from UT, plus the IAU 2006 precession
 * polynomial and the equation of the equinoxes from TT.
 */
export function greenwichApparentSiderealDeg(moment: Moment): number {
  const ut = moment.utDays;
  const eraTurns = 0.779057273264 + 0.00273781191135448 * ut + (ut % 1);
  const eraDeg = 360 * (((eraTurns % 1) + 1) % 1);
  const t = moment.ttDays / 36525;
  // e_tilt().ee is the equation of the equinoxes in seconds of time.
  const equationOfEquinoxesArcsec = 15 * e_tilt(astroTimeOf(moment)).ee;
  const precessionArcsec = 0.014506 + ((((-0.0000000368 * t - 0.000029956) * t - 0.00000044) * t + 1.3915817) * t + 4612.156534) * t;
  const gastDeg = eraDeg + (precessionArcsec + equationOfEquinoxesArcsec) / 3600;
  return ((gastDeg % 360) + 360) % 360;
}

/**
 * The point where a body stands at the zenith, seen from the Earth's centre:
 * latitude = its geocentric declination of date, longitude = RA − GAST
 * (Meeus, Astronomical Algorithms, ch. 12–13). `positionEQJ` is geocentric, any length unit, EQJ.
 */
export function subBodyPoint(positionEQJ: Vec3, moment: Moment): LonLat {
  const [x, y, z] = toEquatorOfDate(positionEQJ, astroTimeOf(moment));
  const raDeg = (Math.atan2(y, x) * 180) / Math.PI;
  const decDeg = (Math.atan2(z, Math.hypot(x, y)) * 180) / Math.PI;
  return [wrapLongitudeDeg(raDeg - greenwichApparentSiderealDeg(moment)), decDeg];
}
