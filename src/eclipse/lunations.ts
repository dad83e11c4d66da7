/**
 * Mean lunations (Meeus, Astronomical Algorithms 2nd ed., ch. 49 and 54):
 * cheap arithmetic that tells which full moons can hold an eclipse at all,
 * before any ephemeris call is spent on them.
 */

/** Mean synodic month, days (Meeus ch. 49). */
export const SYNODIC_MONTH_DAYS = 29.530588861;

const DEG = Math.PI / 180;
const JD_J2000 = 2451545.0;

/** Lunation index k of Meeus ch. 49 nearest a TT day count (k integer = new moon). */
export function lunationIndexNear(ttDays: number): number {
  return Math.round((ttDays + JD_J2000 - 2451550.09766) / SYNODIC_MONTH_DAYS);
}

/** Mean full moon of lunation k (k integer; the full moon is k + 0.5), TT days since J2000. */
export function meanFullMoonTTDays(k: number): number {
  const kFull = k + 0.5;
  const T = kFull / 1236.85;
  const jde = 2451550.09766 + SYNODIC_MONTH_DAYS * kFull + 0.00015437 * T ** 2 - 0.00000015 * T ** 3 + 0.00000000073 * T ** 4;
  return jde - JD_J2000;
}

/** The Moon's mean argument of latitude F at mean full moon k + 0.5, radians. */
export function argumentOfLatitudeAtFullMoon(k: number): number {
  const kFull = k + 0.5;
  const T = kFull / 1236.85;
  return (160.7108 + 390.67050284 * kFull - 0.0016118 * T ** 2 - 0.00000227 * T ** 3 + 0.000000011 * T ** 4) * DEG;
}

/**
 * Meeus ch. 54 rejects a full moon when |sin F| > 0.36. We keep a wide margin
 * (0.5, i.e. within 30° of a node) so that no eclipse of either shadow
 * convention is ever pruned; the exact geometry decides the rest.
 */
export const PRUNE_SIN_F = 0.5;

export function mayHoldLunarEclipse(k: number): boolean {
  return Math.abs(Math.sin(argumentOfLatitudeAtFullMoon(k))) <= PRUNE_SIN_F;
}
