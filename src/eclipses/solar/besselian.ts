/**
 * Besselian elements (Explanatory Supplement to the Astronomical Almanac,
 * 3rd ed., ch. 11; Chauvenet, Manual of Spherical and Practical Astronomy,
 * vol. I; Meeus, Elements of Solar Eclipses 1951–2200).
 *
 * The fundamental plane passes through the Earth's centre perpendicular to
 * the shadow axis, the line through the Moon's and the Sun's centres. With
 * G = Sun − Moon (geocentric, true equator of date, Earth equatorial radii),
 * the axis points to right ascension a and declination d; x, y, z place the
 * Moon on the basis î = (−sin a, cos a, 0), ĵ = (−sin d cos a, −sin d sin a, cos d),
 * k̂ = Ĝ. f1 and f2 are the half-angles of the penumbral and umbral cones,
 * l1 and l2 their radii on the fundamental plane (l2 < 0: the umbra, a total
 * eclipse; l2 > 0: the antumbra, annular), μ = GAST − a the Greenwich hour
 * angle of the axis.
 *
 * Inputs: astronomy-engine's apparent Sun and geometric geocentric Moon
 * (ephemeris/bodies.ts), our ΔT, our GAST (ephemeris/earth.ts). Each element
 * is a Chebyshev fit over a window of hours; rates come from the series.
 */
import type { RotationMatrix } from 'astronomy-engine';
import { chebyshevNodes, evaluateChebyshev, fitChebyshev, type ChebyshevSeries } from '../common/chebyshev.ts';
import { ephemerisTime, moonPositionKm, sunPositionKm } from '../../ephemeris/bodies.ts';
import { greenwichApparentSiderealDeg } from '../../ephemeris/earth.ts';
import { equatorOfDateRotation, toEquatorOfDate } from '../../ephemeris/frames.ts';
import { momentFromTT } from '../../ephemeris/time.ts';
import type { Vec3 } from '../../ephemeris/vector.ts';
import { EARTH_EQUATORIAL_RADIUS_KM, K_PENUMBRA, K_UMBRA, SUN_RADIUS_EARTH_RADII } from './constants.ts';
import { chebyshevDerivative } from '../common/series.ts';

const DEG = Math.PI / 180;

/** The elements at one TT instant. Lengths in Earth equatorial radii, angles in radians, rates per day. */
export interface BesselianElements {
  readonly ttDays: number;
  readonly x: number;
  readonly y: number;
  readonly dRad: number;
  /** Greenwich hour angle of the shadow axis, radians, unwrapped (may exceed 2π). */
  readonly muRad: number;
  /** Radius of the penumbra on the fundamental plane. */
  readonly l1: number;
  /** Radius of the umbra (negative) or antumbra (positive) on the fundamental plane. */
  readonly l2: number;
  readonly tanF1: number;
  readonly tanF2: number;
  readonly xPerDay: number;
  readonly yPerDay: number;
  readonly dRadPerDay: number;
  readonly muRadPerDay: number;
  readonly l1PerDay: number;
  readonly l2PerDay: number;
}

/** The ΔT-free geometry at one instant: everything but μ, plus the axis's right ascension. */
interface AxisGeometry {
  readonly x: number;
  readonly y: number;
  readonly dRad: number;
  readonly aRad: number;
  readonly l1: number;
  readonly l2: number;
  readonly tanF1: number;
  readonly tanF2: number;
}

const ELEMENT_NAMES = ['x', 'y', 'dRad', 'muRad', 'l1', 'l2', 'tanF1', 'tanF2'] as const;
type ElementName = (typeof ELEMENT_NAMES)[number];

/**
 * The elements of one eclipse as plain data: a Chebyshev series per element
 * over [startTTDays, endTTDays], and the ΔT (seconds) that ties μ to UT.
 */
export interface BesselianFit {
  readonly startTTDays: number;
  readonly endTTDays: number;
  readonly deltaTSeconds: number;
  readonly series: Readonly<Record<ElementName, ChebyshevSeries>>;
  readonly rates: Readonly<Record<'x' | 'y' | 'dRad' | 'muRad' | 'l1' | 'l2', ChebyshevSeries>>;
}

/** Nine nodes over ten hours reproduce the direct elements to better than 1e-9 Earth radii (6 mm) and 1e-9 rad (pinned in test/eclipses/solarElements.test.ts). */
export const BESSELIAN_NODE_COUNT = 9;

function ofDate(rotation: RotationMatrix, positionKm: Vec3, time: ReturnType<typeof ephemerisTime>): Vec3 {
  const [x, y, z] = toEquatorOfDate(positionKm, time, rotation);
  return [x / EARTH_EQUATORIAL_RADIUS_KM, y / EARTH_EQUATORIAL_RADIUS_KM, z / EARTH_EQUATORIAL_RADIUS_KM];
}

function axisGeometry(ttDays: number): AxisGeometry {
  const time = ephemerisTime(ttDays);
  const rotation = equatorOfDateRotation(time);
  const moon = ofDate(rotation, moonPositionKm(time), time);
  const sun = ofDate(rotation, sunPositionKm(time), time);
  const g: Vec3 = [sun[0] - moon[0], sun[1] - moon[1], sun[2] - moon[2]];
  const gLength = Math.hypot(g[0], g[1], g[2]);
  const aRad = Math.atan2(g[1], g[0]);
  const dRad = Math.asin(g[2] / gLength);
  const sa = Math.sin(aRad);
  const ca = Math.cos(aRad);
  const sd = Math.sin(dRad);
  const cd = Math.cos(dRad);
  const x = -sa * moon[0] + ca * moon[1];
  const y = -sd * ca * moon[0] - sd * sa * moon[1] + cd * moon[2];
  const z = cd * ca * moon[0] + cd * sa * moon[1] + sd * moon[2];
  const sinF1 = (SUN_RADIUS_EARTH_RADII + K_PENUMBRA) / gLength;
  const sinF2 = (SUN_RADIUS_EARTH_RADII - K_UMBRA) / gLength;
  const tanF1 = Math.tan(Math.asin(sinF1));
  const tanF2 = Math.tan(Math.asin(sinF2));
  return {
    x,
    y,
    dRad,
    aRad,
    l1: (z + K_PENUMBRA / sinF1) * tanF1,
    l2: (z - K_UMBRA / sinF2) * tanF2,
    tanF1,
    tanF2,
  };
}

/** μ = GAST(UT) − a, radians, in [0, 2π). */
function hourAngleRad(ttDays: number, aRad: number, deltaTSeconds: number): number {
  const mu = greenwichApparentSiderealDeg(momentFromTT(ttDays, deltaTSeconds)) * DEG - aRad;
  return ((mu % (2 * Math.PI)) + 2 * Math.PI) % (2 * Math.PI);
}

/** The elements straight from the ephemeris, no fit (for checks); rates are left at zero. */
export function besselianDirect(ttDays: number, deltaTSeconds: number): BesselianElements {
  const g = axisGeometry(ttDays);
  return {
    ttDays,
    x: g.x,
    y: g.y,
    dRad: g.dRad,
    muRad: hourAngleRad(ttDays, g.aRad, deltaTSeconds),
    l1: g.l1,
    l2: g.l2,
    tanF1: g.tanF1,
    tanF2: g.tanF2,
    xPerDay: 0,
    yPerDay: 0,
    dRadPerDay: 0,
    muRadPerDay: 0,
    l1PerDay: 0,
    l2PerDay: 0,
  };
}

/** The ΔT-free geometry sampled at the Chebyshev nodes of a window: the costly part, done once per eclipse. */
export interface AxisSamples {
  readonly startTTDays: number;
  readonly endTTDays: number;
  readonly nodes: readonly number[];
  readonly samples: readonly AxisGeometry[];
}

export function sampleAxis(startTTDays: number, endTTDays: number, nodeCount = BESSELIAN_NODE_COUNT): AxisSamples {
  const nodes = chebyshevNodes(startTTDays, endTTDays, nodeCount);
  return { startTTDays, endTTDays, nodes, samples: nodes.map(axisGeometry) };
}

/** Fit the elements over the sampled window, μ with the given ΔT. */
export function fitBesselian(axis: AxisSamples, deltaTSeconds: number): BesselianFit {
  const { nodes, samples } = axis;
  // μ grows by about 2π a day: unwrap it in node order (nodes run from late to early).
  const muRaw = samples.map((s, i) => hourAngleRad(nodes[i]!, s.aRad, deltaTSeconds));
  const muUnwrapped: number[] = [];
  for (let i = 0; i < muRaw.length; i++) {
    if (i === 0) {
      muUnwrapped.push(muRaw[0]!);
      continue;
    }
    let value = muRaw[i]!;
    const previous = muUnwrapped[i - 1]!;
    while (value - previous > Math.PI) value -= 2 * Math.PI;
    while (value - previous < -Math.PI) value += 2 * Math.PI;
    muUnwrapped.push(value);
  }
  return fitWithHourAngle(axis, deltaTSeconds, muUnwrapped);
}

/**
 * The ΔT-free elements only, with μ left at zero: enough to find greatest
 * eclipse and to decide whether there is an eclipse at all (x, y, d, l1, l2
 * do not depend on the Earth's rotation), without the nine sidereal times.
 * Nothing that places the shadow on the ground may use it.
 */
export function fitAxisOnly(axis: AxisSamples): BesselianFit {
  return fitWithHourAngle(axis, Number.NaN, axis.nodes.map(() => 0));
}

function fitWithHourAngle(axis: AxisSamples, deltaTSeconds: number, muRad: readonly number[]): BesselianFit {
  const { startTTDays, endTTDays, samples } = axis;
  const fit = (values: readonly number[]) => fitChebyshev(startTTDays, endTTDays, values);
  const series: Record<ElementName, ChebyshevSeries> = {
    x: fit(samples.map((s) => s.x)),
    y: fit(samples.map((s) => s.y)),
    dRad: fit(samples.map((s) => s.dRad)),
    muRad: fit(muRad),
    l1: fit(samples.map((s) => s.l1)),
    l2: fit(samples.map((s) => s.l2)),
    tanF1: fit(samples.map((s) => s.tanF1)),
    tanF2: fit(samples.map((s) => s.tanF2)),
  };
  return {
    startTTDays,
    endTTDays,
    deltaTSeconds,
    series,
    rates: {
      x: chebyshevDerivative(series.x),
      y: chebyshevDerivative(series.y),
      dRad: chebyshevDerivative(series.dRad),
      muRad: chebyshevDerivative(series.muRad),
      l1: chebyshevDerivative(series.l1),
      l2: chebyshevDerivative(series.l2),
    },
  };
}

/** The elements and their rates at a TT instant inside the fit's window. */
export function besselianAt(fit: BesselianFit, ttDays: number): BesselianElements {
  const { series, rates } = fit;
  return {
    ttDays,
    x: evaluateChebyshev(series.x, ttDays),
    y: evaluateChebyshev(series.y, ttDays),
    dRad: evaluateChebyshev(series.dRad, ttDays),
    muRad: evaluateChebyshev(series.muRad, ttDays),
    l1: evaluateChebyshev(series.l1, ttDays),
    l2: evaluateChebyshev(series.l2, ttDays),
    tanF1: evaluateChebyshev(series.tanF1, ttDays),
    tanF2: evaluateChebyshev(series.tanF2, ttDays),
    xPerDay: evaluateChebyshev(rates.x, ttDays),
    yPerDay: evaluateChebyshev(rates.y, ttDays),
    dRadPerDay: evaluateChebyshev(rates.dRad, ttDays),
    muRadPerDay: evaluateChebyshev(rates.muRad, ttDays),
    l1PerDay: evaluateChebyshev(rates.l1, ttDays),
    l2PerDay: evaluateChebyshev(rates.l2, ttDays),
  };
}
