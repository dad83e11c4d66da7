/**
 * Geocentric positions from astronomy-engine, in km, J2000 mean equator (EQJ).
 * Positions depend on TT only.
 */
import { AstroTime, Body, GeoMoon, GeoVector, KM_PER_AU } from 'astronomy-engine';
import type { Vec3 } from './vector.ts';

/**
 * An astronomy-engine time for a TT instant. Its `ut` follows the engine's own
 * ΔT, which keeps the engine's internal light-time steps (AddDays) on the
 * right TT; nothing that depends on the Earth's rotation may use it.
 */
export function ephemerisTime(ttDays: number): AstroTime {
  return AstroTime.FromTerrestrialTime(ttDays);
}

/** Geometric geocentric Moon, km, EQJ. */
export function moonPositionKm(time: AstroTime): Vec3 {
  const v = GeoMoon(time);
  return [v.x * KM_PER_AU, v.y * KM_PER_AU, v.z * KM_PER_AU];
}

/** Apparent geocentric Sun (light time and aberration), km, EQJ. */
export function sunPositionKm(time: AstroTime): Vec3 {
  const v = GeoVector(Body.Sun, time, true);
  return [v.x * KM_PER_AU, v.y * KM_PER_AU, v.z * KM_PER_AU];
}
