/**
 * Mean lunations (Meeus, Astronomical Algorithms 2nd ed., ch. 49 and 54):
 * cheap arithmetic that tells which full moons can hold an eclipse at all,
 * before any ephemeris call is spent on them.
 */
import type { ShadowConvention } from '../lunar/conventions.ts';
import { EARTH_EQUATORIAL_RADIUS_KM, MOON_RADIUS_EARTH_RADII, SUN_RADIUS_KM } from '../../ephemeris/constants.ts';

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

const T_PER_LUNATION = 1 / 1236.85;

/** The Moon's mean argument of latitude F at mean phase k (Meeus ch. 49 numbering: whole k new moon, k + 0.5 full moon), radians. */
export function meanArgumentOfLatitude(kPhase: number): number {
  const T = kPhase * T_PER_LUNATION;
  return (160.7108 + 390.67050284 * kPhase - 0.0016118 * T ** 2 - 0.00000227 * T ** 3 + 0.000000011 * T ** 4) * DEG;
}

/**
 * γ of Meeus ch. 54 at full moon k + 0.5: the least distance of the Moon's
 * centre from the shadow axis, in equatorial Earth radii, signed (+ north),
 * from the mean elements and the periodic terms of eq. 54.1's companions
 * (P, Q, W). Arithmetic only: a few sines per lunation.
 */
export function meeusLunarGamma(k: number): number {
  return meeusGamma(k + 0.5);
}

/**
 * γ of Meeus ch. 54 at new moon k: the least distance of the shadow axis
 * from the Earth's centre, in equatorial Earth radii, signed (+ north). The
 * same series as the lunar γ, at the new moon (Meeus writes one expression
 * for both kinds).
 */
export function meeusSolarGamma(k: number): number {
  return meeusGamma(k);
}

/** Meeus ch. 54's γ at mean phase kPhase (whole: new moon; k + 0.5: full moon). */
function meeusGamma(kPhase: number): number {
  const T = kPhase * T_PER_LUNATION;
  const E = 1 - 0.002516 * T - 0.0000074 * T ** 2;
  const M = (2.5534 + 29.1053567 * kPhase - 0.0000014 * T ** 2 - 0.00000011 * T ** 3) * DEG;
  const Mm = (201.5643 + 385.81693528 * kPhase + 0.0107582 * T ** 2 + 0.00001238 * T ** 3 - 0.000000058 * T ** 4) * DEG;
  const F = meanArgumentOfLatitude(kPhase);
  const node = (124.7746 - 1.56375588 * kPhase + 0.0020672 * T ** 2 + 0.00000215 * T ** 3) * DEG;
  const F1 = F - 0.02665 * DEG * Math.sin(node);
  const P = 0.207 * E * Math.sin(M) + 0.0024 * E * Math.sin(2 * M) - 0.0392 * Math.sin(Mm) + 0.0116 * Math.sin(2 * Mm)
    - 0.0073 * E * Math.sin(Mm + M) + 0.0067 * E * Math.sin(Mm - M) + 0.0118 * Math.sin(2 * F1);
  const Q = 5.2207 - 0.0048 * E * Math.cos(M) + 0.002 * E * Math.cos(2 * M) - 0.3299 * Math.cos(Mm)
    - 0.006 * E * Math.cos(Mm + M) + 0.0041 * E * Math.cos(Mm - M);
  const W = Math.abs(Math.cos(F1));
  return (P * Math.cos(F1) + Q * Math.sin(F1)) * (1 - 0.0048 * W);
}

/**
 * The prefilter: a full moon can hold an eclipse only if |γ| is below the
 * largest the penumbral limit can ever be, plus the error of Meeus's series.
 *
 * The limit. The Moon touches the penumbra while its centre is within
 * ρ + s_M of the axis; in Earth radii (divide by π_M, as γ is) that is
 * ρ/π_M + s_M/π_M. Both our conventions make ρ = a·π_M + b·(π_S + s_S)
 * (Danjon a = 1.01, b = 1; Chauvenet a = 1.02 × 0.99834, b = 1.02), so
 * ρ/π_M = a + b·(π_S + s_S)/π_M is largest when the Moon is farthest
 * (smallest π_M) and the Sun nearest (largest π_S, s_S); and
 * s_M/π_M = asin(k·x)/asin(x) with x = R⊕/d and k = 0.2725076 is below k
 * for every x. The extremes over years 1000–3000, each rounded outward:
 * - the Moon at most 406,800 km away (apogees reach about 406,700 km:
 *   Meeus ch. 50), so π_M ≥ asin(6378.137/406800) = 53.90′;
 * - the Sun at least 0.9825 AU away (perihelion 0.9833 AU now; the
 *   eccentricity 0.016709 − 0.000042 T, Meeus ch. 25, gives 0.9829 AU in
 *   year 1000), so s_S ≤ 696,000 km at that distance = 16.28′ and
 *   π_S ≤ 8.794″/0.9825 = 8.95″.
 * This gives 1.5873 (Danjon) and 1.6017 (Chauvenet) Earth radii.
 *
 * The margin. Meeus's γ is a truncated series in mean elements; over every
 * lunation of years 1000–3000 it differs from the γ of the sampled
 * ephemeris at greatest by at most 0.0162 Earth radii (−0.0086 … +0.0162,
 * measured; test/eclipses/prefilter.test.ts checks the whole range, so
 * that no eclipse is lost). The margin is three times that: 0.05.
 *
 * Meeus's own test, |sin F| > 0.36 → no eclipse, rests on the same series
 * with its own shadow (1.5573 + u); ours lets 1.04 lunations through per
 * eclipse (Danjon, 1000–3000) where |sin F| ≤ 0.5 let 1.70 through.
 */
export const GAMMA_SERIES_MARGIN = 0.05;

/**
 * The Moon's greatest and the Sun's least distance from the Earth over years
 * 1000–3000, rounded outward (derived above): the extremes of both kinds'
 * shadows.
 */
export const DISTANCE_EXTREMES_KM = {
  moonFarthest: 406_800,
  sunNearest: 0.9825 * 149_597_870.7,
} as const;

const LIMIT_EXTREMES = {
  moonParallaxRad: Math.asin(EARTH_EQUATORIAL_RADIUS_KM / DISTANCE_EXTREMES_KM.moonFarthest),
  sunParallaxRad: ((8.794 / 0.9825) / 3600) * DEG,
  sunSemiDiameterRad: Math.asin(SUN_RADIUS_KM / DISTANCE_EXTREMES_KM.sunNearest),
} as const;

/** The largest |γ| (Earth radii) at which a convention's penumbra can still touch the Moon, years 1000–3000. */
export function largestPenumbralGamma(convention: ShadowConvention): number {
  return convention.radii(LIMIT_EXTREMES).penumbraRad / LIMIT_EXTREMES.moonParallaxRad + MOON_RADIUS_EARTH_RADII;
}

/** False only where no eclipse of the convention is possible at full moon k + 0.5. */
export function mayHoldLunarEclipse(k: number, convention: ShadowConvention): boolean {
  return Math.abs(meeusLunarGamma(k)) <= largestPenumbralGamma(convention) + GAMMA_SERIES_MARGIN;
}
