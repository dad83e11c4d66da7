/**
 * The constants of the solar-eclipse geometry, named once and stated in
 * every output that depends on them.
 */
import { EARTH_EQUATORIAL_RADIUS_KM, MOON_RADIUS_EARTH_RADII, SUN_RADIUS_KM } from '../../ephemeris/constants.ts';

export { EARTH_EQUATORIAL_RADIUS_KM, SUN_RADIUS_KM };

/**
 * Moon radius / Earth equatorial radius for the penumbra: partial-eclipse
 * limits, C1/C4, magnitudes (IAU value; common practice).
 */
export const K_PENUMBRA = MOON_RADIUS_EARTH_RADII;
/**
 * Moon radius / Earth equatorial radius for every umbral and antumbral
 * quantity, total and annular alike (common practice: a mean radius that
 * allows for the valleys of the lunar limb through which the last sunlight
 * shines).
 */
export const K_UMBRA = 0.272281;

/** Sun radius in Earth equatorial radii. */
export const SUN_RADIUS_EARTH_RADII = SUN_RADIUS_KM / EARTH_EQUATORIAL_RADIUS_KM;

/** Sunrise and sunset: the Sun's centre at geometric altitude −0°50′ (upper limb on the refracted horizon; Meeus, Astronomical Algorithms, ch. 15). */
export const SUNRISE_ALTITUDE_DEG = -50 / 60;

/**
 * A place this close to a path limit gets the "near the edge" warning. The
 * smooth-limb model and a few seconds of ΔT uncertainty each move a limit by
 * a kilometre or more (1 s of ΔT is 1/240° of longitude, ≈ 0.46 km·cos φ);
 * five kilometres covers both with room (our own margin).
 */
export const NEAR_EDGE_KM = 5;

/** Below this apparent altitude the Sun is "low": hills, buildings and haze may hide it (our own margin, common practice). */
export const LOW_SUN_DEG = 10;
