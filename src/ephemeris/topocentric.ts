/**
 * A body's altitude and azimuth for an observer on the WGS 84 ellipsoid:
 * geocentric position (EQJ) → true equator of date → Earth-fixed (GAST from
 * our own UT) → minus the observer's position → local east/north/up.
 *
 * Refraction convention: Saemundsson's formula (Meeus, Astronomical
 * Algorithms, ch. 16, eq. 16.4) for true altitudes from −1° up, the range in
 * which JPL Horizons and astronomy-engine's 'normal' mode apply it unchanged.
 * Below −1° the body is under any sea-level horizon, no ray reaches the
 * observer and refraction is not defined: the altitude given is the geometric
 * one, as almanacs tabulate bodies below the horizon. The apparent altitude
 * therefore steps from about −0.35° to −1° there.
 */
import { greenwichApparentSiderealDeg } from './earth.ts';
import { toEquatorOfDate } from './frames.ts';
import { astroTimeOf, type Moment } from './time.ts';
import type { Vec3 } from './vector.ts';
import { EARTH_ECCENTRICITY_SQUARED, EARTH_EQUATORIAL_RADIUS_KM, EARTH_FLATTENING } from './constants.ts';

const DEG = Math.PI / 180;

export interface Observer {
  readonly latDeg: number;
  readonly lonDeg: number;
  readonly heightKm?: number;
}

export interface Horizontal {
  /** Altitude of the body's centre, degrees: apparent (with refraction) from a true −1° up, geometric below. */
  readonly altitudeDeg: number;
  /** Altitude without refraction, degrees. */
  readonly geometricAltitudeDeg: number;
  /** Azimuth from north through east, degrees in [0, 360). */
  readonly azimuthDeg: number;
  /** Observer to body, km. */
  readonly distanceKm: number;
}

/** The lowest true altitude at which refraction is applied, degrees. */
export const REFRACTION_FLOOR_DEG = -1;

/** Saemundsson (Meeus eq. 16.4): refraction in degrees for a true (airless) altitude in degrees; 0 where it is not defined (below −1°). */
export function refractionDeg(trueAltitudeDeg: number): number {
  if (trueAltitudeDeg > 90 || trueAltitudeDeg < REFRACTION_FLOOR_DEG) return 0;
  const h = trueAltitudeDeg;
  return 1.02 / Math.tan((h + 10.3 / (h + 5.11)) * DEG) / 60;
}

/** The observer's position in the Earth-fixed frame, km. */
export function observerPositionKm({ latDeg, lonDeg, heightKm = 0 }: Observer): Vec3 {
  const phi = latDeg * DEG;
  const lambda = lonDeg * DEG;
  const n = EARTH_EQUATORIAL_RADIUS_KM / Math.sqrt(1 - EARTH_ECCENTRICITY_SQUARED * Math.sin(phi) ** 2);
  return [
    (n + heightKm) * Math.cos(phi) * Math.cos(lambda),
    (n + heightKm) * Math.cos(phi) * Math.sin(lambda),
    (n * (1 - EARTH_ECCENTRICITY_SQUARED) + heightKm) * Math.sin(phi),
  ];
}

/** Geocentric EQJ position (km) → Earth-fixed (km), true equator and equinox of date turned by GAST. */
export function earthFixedKm(positionEQJ: Vec3, moment: Moment): Vec3 {
  const [x, y, z] = toEquatorOfDate(positionEQJ, astroTimeOf(moment));
  const theta = greenwichApparentSiderealDeg(moment) * DEG;
  const c = Math.cos(theta);
  const s = Math.sin(theta);
  return [c * x + s * y, -s * x + c * y, z];
}

export function horizontal(positionEQJKm: Vec3, moment: Moment, observer: Observer): Horizontal {
  const body = earthFixedKm(positionEQJKm, moment);
  const site = observerPositionKm(observer);
  const t: Vec3 = [body[0] - site[0], body[1] - site[1], body[2] - site[2]];
  const phi = observer.latDeg * DEG;
  const lambda = observer.lonDeg * DEG;
  const east = -Math.sin(lambda) * t[0] + Math.cos(lambda) * t[1];
  const north = -Math.sin(phi) * Math.cos(lambda) * t[0] - Math.sin(phi) * Math.sin(lambda) * t[1] + Math.cos(phi) * t[2];
  const up = Math.cos(phi) * Math.cos(lambda) * t[0] + Math.cos(phi) * Math.sin(lambda) * t[1] + Math.sin(phi) * t[2];
  const distanceKm = Math.hypot(east, north, up);
  const geometricAltitudeDeg = Math.asin(up / distanceKm) / DEG;
  const azimuthDeg = ((Math.atan2(east, north) / DEG) % 360 + 360) % 360;
  return { altitudeDeg: geometricAltitudeDeg + refractionDeg(geometricAltitudeDeg), geometricAltitudeDeg, azimuthDeg, distanceKm };
}
