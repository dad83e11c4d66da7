/** The unit normal of the sphere (or, with geodetic latitude, of the ellipsoid) at a place. */
import type { LonLat } from '../ephemeris/earth.ts';
import type { Vec3 } from '../ephemeris/vector.ts';

const DEG = Math.PI / 180;

/** A unit normal: the ephemeris's own 3-vector (Earth-fixed, x towards 0° E on the equator, z north), under a name that says what it holds. */
export type Normal = Vec3;

export function normalAt([lonDeg, latDeg]: LonLat): Normal {
  const cosLat = Math.cos(latDeg * DEG);
  return [cosLat * Math.cos(lonDeg * DEG), cosLat * Math.sin(lonDeg * DEG), Math.sin(latDeg * DEG)];
}
