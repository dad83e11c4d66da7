/**
 * The Moon's passage through the Earth's shadow over one window of hours:
 * sample the ephemeris at a few Chebyshev nodes, then answer any instant in
 * the window from the interpolants. All contact solving runs on this, so an
 * eclipse costs a fixed, small number of ephemeris calls.
 */
import { chebyshevNodes, evaluateChebyshev, fitChebyshev, type ChebyshevSeries } from '../common/chebyshev.ts';
import { ephemerisTime, moonPositionKm, sunPositionKm } from '../../ephemeris/bodies.ts';
import { angleBetween, dot, norm, scale, unit, type Vec3 } from '../../ephemeris/vector.ts';
import { EARTH_EQUATORIAL_RADIUS_KM, MOON_RADIUS_EARTH_RADII, SUN_RADIUS_KM } from '../../ephemeris/constants.ts';

/** Geometry of the Moon against the shadow at one TT instant. Angles in radians, seen from the Earth's centre. */
export interface ShadowState {
  readonly ttDays: number;
  /** m: the Moon's centre to the shadow axis. */
  readonly separationRad: number;
  /** +1 when the Moon's centre is north of the shadow axis (ecliptic north), −1 when south. */
  readonly northSign: 1 | -1;
  readonly moonParallaxRad: number;
  readonly moonSemiDiameterRad: number;
  readonly sunParallaxRad: number;
  readonly sunSemiDiameterRad: number;
  /** Geometric geocentric Moon, km, EQJ. */
  readonly moonPositionKm: Vec3;
  /** Apparent geocentric Sun, km, EQJ (the shadow axis points away from it). */
  readonly sunPositionKm: Vec3;
}

export interface ShadowTrack {
  readonly startTTDays: number;
  readonly endTTDays: number;
  at(ttDays: number): ShadowState;
}

/** Nine nodes over ten hours: see chebyshev.ts for the accuracy this gives. */
export const TRACK_NODE_COUNT = 9;

/** North ecliptic pole in EQJ (J2000 obliquity 23.4392911°). */
const OBLIQUITY_J2000_RAD = (23.4392911 * Math.PI) / 180;
const ECLIPTIC_NORTH: Vec3 = [0, -Math.sin(OBLIQUITY_J2000_RAD), Math.cos(OBLIQUITY_J2000_RAD)];

export function shadowStateFrom(ttDays: number, moonKm: Vec3, sunKm: Vec3): ShadowState {
  const moonDistanceKm = norm(moonKm);
  const sunDistanceKm = norm(sunKm);
  const axis = scale(unit(sunKm), -1);
  const moonDirection = unit(moonKm);
  const separationRad = angleBetween(moonDirection, axis);
  const northComponent = dot(moonDirection, ECLIPTIC_NORTH) - dot(axis, ECLIPTIC_NORTH);
  return {
    ttDays,
    separationRad,
    northSign: northComponent >= 0 ? 1 : -1,
    moonParallaxRad: Math.asin(EARTH_EQUATORIAL_RADIUS_KM / moonDistanceKm),
    moonSemiDiameterRad: Math.asin((MOON_RADIUS_EARTH_RADII * EARTH_EQUATORIAL_RADIUS_KM) / moonDistanceKm),
    sunParallaxRad: Math.asin(EARTH_EQUATORIAL_RADIUS_KM / sunDistanceKm),
    sunSemiDiameterRad: Math.asin(SUN_RADIUS_KM / sunDistanceKm),
    moonPositionKm: moonKm,
    sunPositionKm: sunKm,
  };
}

/** The exact state from the ephemeris, with no interpolation (for checks). */
export function shadowStateDirect(ttDays: number): ShadowState {
  const time = ephemerisTime(ttDays);
  return shadowStateFrom(ttDays, moonPositionKm(time), sunPositionKm(time));
}

export function sampleShadowTrack(startTTDays: number, endTTDays: number, nodeCount = TRACK_NODE_COUNT): ShadowTrack {
  const nodes = chebyshevNodes(startTTDays, endTTDays, nodeCount);
  const moonSamples: Vec3[] = [];
  const sunSamples: Vec3[] = [];
  for (const tt of nodes) {
    const time = ephemerisTime(tt);
    moonSamples.push(moonPositionKm(time));
    sunSamples.push(sunPositionKm(time));
  }
  const fitAxis = (samples: Vec3[], axis: 0 | 1 | 2): ChebyshevSeries =>
    fitChebyshev(startTTDays, endTTDays, samples.map((v) => v[axis]));
  const moonSeries = [fitAxis(moonSamples, 0), fitAxis(moonSamples, 1), fitAxis(moonSamples, 2)] as const;
  const sunSeries = [fitAxis(sunSamples, 0), fitAxis(sunSamples, 1), fitAxis(sunSamples, 2)] as const;
  const evaluate = (series: readonly [ChebyshevSeries, ChebyshevSeries, ChebyshevSeries], tt: number): Vec3 => [
    evaluateChebyshev(series[0], tt),
    evaluateChebyshev(series[1], tt),
    evaluateChebyshev(series[2], tt),
  ];
  return {
    startTTDays,
    endTTDays,
    at: (ttDays) => shadowStateFrom(ttDays, evaluate(moonSeries, ttDays), evaluate(sunSeries, ttDays)),
  };
}
