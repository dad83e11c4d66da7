/**
 * Global circumstances of a solar eclipse from its Besselian elements
 * (Explanatory Supplement to the Astronomical Almanac, 3rd ed., ch. 11;
 * Meeus, Elements of Solar Eclipses 1951–2200, ch. 4 and 8).
 *
 * Greatest eclipse is the instant the shadow axis passes nearest the
 * Earth's centre; gamma that least distance, signed by y. The eclipse is
 * central when the axis then meets the ellipsoid. Global contacts compare
 * the signed distance s from the axis to the Earth's outline on the
 * fundamental plane with the shadow radii there (ζ = 0): P1/P4 at s = l1,
 * U1/U4 at s = |l2|, U2/U3 at s = −|l2|.
 */
import { ephemerisTime, sunPositionKm } from '../../ephemeris/bodies.ts';
import type { DeltaT } from '../../ephemeris/deltaT.ts';
import type { LonLat } from '../../ephemeris/earth.ts';
import { isoSeconds, momentFromTT, type Moment } from '../../ephemeris/time.ts';
import { horizontal, observerPositionKm } from '../../ephemeris/topocentric.ts';
import { sarosAt, type SarosAnchor } from '../common/saros.ts';
import { besselianAt, type BesselianElements, type BesselianFit } from './besselian.ts';
import { K_PENUMBRA, K_UMBRA } from './constants.ts';
import { localContactTT, localMaximumTT, localShadow, magnitudeOf, umbralContact } from './localCore.ts';
import { outlinePointsAt, umbraRadius } from './outline.ts';
import { geocentricPlace, nearestOutlinePoint, rho1, surfacePoint, surfacePointReduced } from './surface.ts';
import type { SolarContactName, SolarEclipse, SolarEclipseKind } from './types.ts';
import { bisectSignChange } from '../../ephemeris/roots.ts';

/**
 * The solar saros numbering is anchored on the total eclipse of 2024-04-08,
 * saros 139 (from memory); greatest ≈ 2024-04-08T18:18 TT. Every other
 * number follows by the saros and inex arithmetic of saros.ts.
 */
export const SOLAR_SAROS_ANCHOR: SarosAnchor = { ttDays: 8864.2625, saros: 139 };

const TIME_TOLERANCE_DAYS = 1e-8;
const DAY_SECONDS = 86_400;

/** The instant of least x² + y² near a guess: Newton on x x′ + y y′ = 0. */
export function greatestTT(fit: BesselianFit, guessTTDays: number): number {
  let tt = guessTTDays;
  for (let i = 0; i < 30; i++) {
    const e = besselianAt(fit, tt);
    const step = -(e.x * e.xPerDay + e.y * e.yPerDay) / (e.xPerDay ** 2 + e.yPerDay ** 2);
    const next = Math.min(fit.endTTDays, Math.max(fit.startTTDays, tt + step));
    if (Math.abs(next - tt) < TIME_TOLERANCE_DAYS) return next;
    tt = next;
  }
  return tt;
}

/** Signed distance from the axis to the Earth's outline on the plane: + outside, − inside. */
export function axisToOutline(e: BesselianElements): number {
  return nearestOutlinePoint(e.x, e.y, rho1(e.dRad)).signedDistance;
}

/** x² + (y/ρ1)² − 1: negative while the axis meets the Earth. */
export function axisOffEarth(e: BesselianElements): number {
  return e.x * e.x + (e.y / rho1(e.dRad)) ** 2 - 1;
}

/** Bisection for a sign change of f between two instants; undefined if the ends agree. */
export function crossingTT(fit: BesselianFit, f: (e: BesselianElements) => number, fromTT: number, toTT: number): number | undefined {
  const at = (tt: number) => f(besselianAt(fit, tt));
  const fa = at(fromTT);
  if (fa > 0 === at(toTT) > 0) return undefined;
  return bisectSignChange(at, fromTT, toTT, fa, TIME_TOLERANCE_DAYS);
}

/** Contact conditions: positive outside, negative inside. */
const CONTACT_CONDITIONS: Record<SolarContactName, (e: BesselianElements) => number> = {
  P1: (e) => axisToOutline(e) - e.l1,
  P4: (e) => axisToOutline(e) - e.l1,
  U1: (e) => axisToOutline(e) - Math.abs(e.l2),
  U4: (e) => axisToOutline(e) - Math.abs(e.l2),
  U2: (e) => axisToOutline(e) + Math.abs(e.l2),
  U3: (e) => axisToOutline(e) + Math.abs(e.l2),
};
const BEFORE_GREATEST: ReadonlySet<SolarContactName> = new Set(['P1', 'U1', 'U2']);

/** Whether the penumbra reaches the Earth at greatest: is there an eclipse at all. */
export function penumbraTouchesEarth(fit: BesselianFit, ttDays: number): boolean {
  return CONTACT_CONDITIONS.P1(besselianAt(fit, ttDays)) < 0;
}

/** Whether the penumbra is on the Earth at either end of the window (then the window must move). */
export function penumbraAtWindowEdge(fit: BesselianFit): boolean {
  return penumbraTouchesEarth(fit, fit.startTTDays) || penumbraTouchesEarth(fit, fit.endTTDays);
}

/** Start and end (TT) of the central line: when the axis meets the Earth. */
export function centralSpanTT(fit: BesselianFit, greatestTTDays: number): [number, number] | undefined {
  if (axisOffEarth(besselianAt(fit, greatestTTDays)) >= 0) return undefined;
  const start = crossingTT(fit, axisOffEarth, fit.startTTDays, greatestTTDays);
  const end = crossingTT(fit, axisOffEarth, greatestTTDays, fit.endTTDays);
  if (start === undefined || end === undefined) throw new Error(`central line of the eclipse at TT day ${greatestTTDays.toFixed(3)} runs beyond its window`);
  return [start, end];
}

/** Samples along the central line to tell total, annular and hybrid apart. */
const KIND_SAMPLES = 64;

function centralKind(fit: BesselianFit, span: [number, number], greatestTTDays: number): 'total' | 'annular' | 'hybrid' {
  let total = false;
  let annular = false;
  // The ends, where the axis grazes the limb (ζ = 0, L2′ = l2); greatest, where ζ and so the umbra are largest; between.
  const instants = [...Array.from({ length: KIND_SAMPLES + 1 }, (_, i) => span[0] + ((span[1] - span[0]) * i) / KIND_SAMPLES), greatestTTDays];
  for (const [i, tt] of instants.entries()) {
    const e = besselianAt(fit, tt);
    const zeta = i === 0 || i === KIND_SAMPLES ? 0 : (surfacePoint(e, e.x, e.y)?.zeta ?? 0);
    if (e.l2 - zeta * e.tanF2 < 0) total = true;
    else annular = true;
  }
  return total && annular ? 'hybrid' : total ? 'total' : 'annular';
}

/** Chord between two sea-level places, km (within a few metres of the geodesic at path widths). */
export function chordKm(a: LonLat, b: LonLat): number {
  const p = observerPositionKm({ lonDeg: a[0], latDeg: a[1] });
  const q = observerPositionKm({ lonDeg: b[0], latDeg: b[1] });
  return Math.hypot(p[0] - q[0], p[1] - q[1], p[2] - q[2]);
}

/** Everything global about the eclipse whose elements and greatest instant are given. */
export function describeSolarEclipse(fit: BesselianFit, greatestTTDays: number, deltaT: DeltaT): SolarEclipse {
  const moment = (tt: number): Moment => momentFromTT(tt, deltaT.seconds);
  const greatest = moment(greatestTTDays);
  const e = besselianAt(fit, greatestTTDays);
  const r1 = rho1(e.dRad);
  const span = centralSpanTT(fit, greatestTTDays);
  const central = span !== undefined;
  const outline = nearestOutlinePoint(e.x, e.y, r1);
  const umbraOnEarth = outline.signedDistance < Math.abs(e.l2);
  const kind: SolarEclipseKind = span ? centralKind(fit, span, greatestTTDays) : umbraOnEarth ? (e.l2 < 0 ? 'total' : 'annular') : 'partial';

  const greatestSurface = central
    ? surfacePoint(e, e.x, e.y)!
    : surfacePointReduced(e, outline.xi, outline.eta / r1, 0);
  const greatestPoint = greatestSurface.lonLat;
  const place = geocentricPlace(greatestPoint);
  const magnitude = magnitudeOf(localShadow(fit, place, greatestTTDays));
  const sunAltitudeDeg = horizontal(sunPositionKm(ephemerisTime(greatestTTDays)), greatest, {
    lonDeg: greatestPoint[0],
    latDeg: greatestPoint[1],
  }).geometricAltitudeDeg;

  const contacts: Partial<Record<SolarContactName, Moment>> = {};
  for (const name of ['P1', 'U1', 'U2', 'U3', 'U4', 'P4'] as const) {
    const condition = CONTACT_CONDITIONS[name];
    if (condition(e) >= 0) continue;
    const [from, to] = BEFORE_GREATEST.has(name) ? [fit.startTTDays, greatestTTDays] : [greatestTTDays, fit.endTTDays];
    const tt = crossingTT(fit, condition, from, to);
    if (tt === undefined) throw new Error(`contact ${name} of the solar eclipse near ${isoSeconds(greatest.utDays)} lies outside its window`);
    contacts[name] = moment(tt);
  }

  let pathWidthKm: number | undefined;
  let centralSeconds: number | undefined;
  if (central) {
    const limits = outlinePointsAt(e, umbraRadius);
    if (limits.north && limits.south) pathWidthKm = chordKm(limits.north.lonLat, limits.south.lonLat);
    const maximum = localMaximumTT(fit, place, greatestTTDays);
    const c2 = localContactTT(fit, place, maximum, umbralContact, -1);
    const c3 = localContactTT(fit, place, maximum, umbralContact, 1);
    if (c2 !== undefined && c3 !== undefined) centralSeconds = (c3 - c2) * DAY_SECONDS;
  }
  const partialSeconds = (contacts.P4!.ttDays - contacts.P1!.ttDays) * DAY_SECONDS;

  return {
    body: 'solar',
    id: isoSeconds(greatest.utDays).slice(0, 10),
    kind,
    central,
    greatest,
    deltaT,
    gamma: Math.sign(e.y || 1) * Math.hypot(e.x, e.y),
    magnitude,
    saros: sarosAt(greatestTTDays, SOLAR_SAROS_ANCHOR),
    greatestPoint,
    sunAltitudeDeg,
    ...(pathWidthKm !== undefined ? { pathWidthKm } : {}),
    durations: { partialSeconds, ...(centralSeconds !== undefined ? { centralSeconds } : {}) },
    contacts,
    moonRadii: { penumbra: K_PENUMBRA, umbra: K_UMBRA },
    elements: fit,
  };
}

