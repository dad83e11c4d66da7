/** Sizes of the Earth and the Sun, shared by every computation that needs them. */

/** WGS 84 equatorial radius, km (NIMA TR8350.2). */
export const EARTH_EQUATORIAL_RADIUS_KM = 6378.137;
/** WGS 84 flattening (NIMA TR8350.2). */
export const EARTH_FLATTENING = 1 / 298.257223563;
/** Square of the WGS 84 first eccentricity. */
export const EARTH_ECCENTRICITY_SQUARED = EARTH_FLATTENING * (2 - EARTH_FLATTENING);
/** Mean radius of the Earth, km, for distances on the sphere (IUGG mean radius R1, rounded). */
export const EARTH_MEAN_RADIUS_KM = 6371;
/** Moon radius / Earth equatorial radius, k (IAU 1982; common practice for the Moon's disc and the penumbra). */
export const MOON_RADIUS_EARTH_RADII = 0.2725076;
/** Solar radius, km, as used for the shadow cones (common practice). */
export const SUN_RADIUS_KM = 696_000;
