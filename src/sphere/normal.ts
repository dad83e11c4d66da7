/** The unit normal of the sphere (or, with geodetic latitude, of the ellipsoid) at a place. */
import type { LonLat } from '../ephemeris/earth.ts';

const DEG = Math.PI / 180;

export interface Normal {
  readonly x: number;
  readonly y: number;
  readonly z: number;
}

export function normalAt([lonDeg, latDeg]: LonLat): Normal {
  const cosLat = Math.cos(latDeg * DEG);
  return { x: cosLat * Math.cos(lonDeg * DEG), y: cosLat * Math.sin(lonDeg * DEG), z: Math.sin(latDeg * DEG) };
}
