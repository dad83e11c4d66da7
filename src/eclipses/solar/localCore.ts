/**
 * Local circumstances on the fundamental plane (Meeus, Elements of Solar
 * Eclipses 1951–2200, ch. 5–6; Chauvenet, Manual, vol. I, §§ 307–320):
 * a place's distance Δ from the shadow axis, its maximum, and the contacts
 * C1…C4 where Δ equals the radius of the penumbra (L1′) or of the umbra or
 * antumbra (|L2′|), each by Meeus's iteration on the elements' rates.
 */
import { besselianAt, type BesselianFit } from './besselian.ts';
import { planeCoordinates, type GeocentricPlace } from './surface.ts';

/** The place against the shadow at one TT instant (Earth equatorial radii; rates per day). */
export interface LocalShadow {
  readonly ttDays: number;
  /** u = x − ξ, v = y − η: the axis as seen from the place, on the plane. */
  readonly u: number;
  readonly v: number;
  /** a = x′ − ξ′, b = y′ − η′. */
  readonly a: number;
  readonly b: number;
  readonly zeta: number;
  /** L1′: the penumbra's radius at the place's height. */
  readonly penumbra: number;
  /** L2′: the umbra's (negative) or antumbra's (positive) radius at the place's height. */
  readonly umbra: number;
  /** Δ = √(u² + v²). */
  readonly distance: number;
}

export function localShadow(fit: BesselianFit, place: GeocentricPlace, ttDays: number): LocalShadow {
  const e = besselianAt(fit, ttDays);
  const p = planeCoordinates(e, place);
  const u = e.x - p.xi;
  const v = e.y - p.eta;
  return {
    ttDays,
    u,
    v,
    a: e.xPerDay - p.xiPerDay,
    b: e.yPerDay - p.etaPerDay,
    zeta: p.zeta,
    penumbra: e.l1 - p.zeta * e.tanF1,
    umbra: e.l2 - p.zeta * e.tanF2,
    distance: Math.hypot(u, v),
  };
}

/** Converged when a step is below 1e-9 day (0.1 ms). */
const STEP_TOLERANCE_DAYS = 1e-9;
const MAX_ITERATIONS = 40;

const clampToFit = (fit: BesselianFit, tt: number) => Math.min(fit.endTTDays, Math.max(fit.startTTDays, tt));

/** The instant of least Δ: τ = −(ua + vb)/n², iterated. */
export function localMaximumTT(fit: BesselianFit, place: GeocentricPlace, startTTDays: number): number {
  let tt = startTTDays;
  for (let i = 0; i < MAX_ITERATIONS; i++) {
    const s = localShadow(fit, place, tt);
    const step = -(s.u * s.a + s.v * s.b) / (s.a * s.a + s.b * s.b);
    const next = clampToFit(fit, tt + step);
    if (Math.abs(next - tt) < STEP_TOLERANCE_DAYS) return next;
    tt = next;
  }
  return tt;
}

/** Which radius a contact touches: C1/C4 the penumbra, C2/C3 the umbra or antumbra. */
export type ContactRadius = (s: LocalShadow) => number;
export const penumbralContact: ContactRadius = (s) => s.penumbra;
export const umbralContact: ContactRadius = (s) => Math.abs(s.umbra);

/**
 * The contact before (`sign` −1) or after (+1) the maximum where Δ = L:
 * sin ψ = (av − ub)/(nL), τ = −(ua + vb)/n² ± (L/n) cos ψ, iterated.
 * Undefined when Δ stays below or above L.
 */
export function localContactTT(
  fit: BesselianFit,
  place: GeocentricPlace,
  maximumTTDays: number,
  radius: ContactRadius,
  sign: -1 | 1,
): number | undefined {
  const atMaximum = localShadow(fit, place, maximumTTDays);
  if (atMaximum.distance >= radius(atMaximum)) return undefined;
  const n0 = Math.hypot(atMaximum.a, atMaximum.b);
  let tt = clampToFit(fit, maximumTTDays + (sign * radius(atMaximum)) / n0);
  for (let i = 0; i < MAX_ITERATIONS; i++) {
    const s = localShadow(fit, place, tt);
    const n = Math.hypot(s.a, s.b);
    const l = radius(s);
    const sinPsi = Math.max(-1, Math.min(1, (s.a * s.v - s.u * s.b) / (n * l)));
    const step = -(s.u * s.a + s.v * s.b) / (n * n) + (sign * l * Math.sqrt(1 - sinPsi * sinPsi)) / n;
    const next = clampToFit(fit, tt + step);
    if (Math.abs(next - tt) < STEP_TOLERANCE_DAYS) return next;
    tt = next;
  }
  return tt;
}

/** Magnitude: the fraction of the Sun's diameter covered, (L1′ − Δ)/(L1′ + L2′). */
export function magnitudeOf(s: LocalShadow): number {
  return (s.penumbra - s.distance) / (s.penumbra + s.umbra);
}

/**
 * Obscuration: the fraction of the Sun's disc covered — the overlap of a
 * disc of radius 1 (the Sun) and one of radius A = (L1′ − L2′)/(L1′ + L2′)
 * (the Moon) whose centres are c = 2Δ/(L1′ + L2′) apart.
 */
export function obscurationOf(s: LocalShadow): number {
  const sum = s.penumbra + s.umbra;
  return discOverlapFraction((s.penumbra - s.umbra) / sum, (2 * s.distance) / sum);
}

/** Area common to a unit disc and a disc of radius r at centre distance c, over π. */
export function discOverlapFraction(r: number, c: number): number {
  if (c >= 1 + r) return 0;
  if (c <= Math.abs(1 - r)) return Math.min(1, r * r);
  const alpha = Math.acos(Math.max(-1, Math.min(1, (c * c + 1 - r * r) / (2 * c))));
  const beta = Math.acos(Math.max(-1, Math.min(1, (c * c + r * r - 1) / (2 * c * r))));
  const area = alpha + r * r * beta - 0.5 * Math.sqrt(Math.max(0, (-c + 1 + r) * (c + 1 - r) * (c - 1 + r) * (c + 1 + r)));
  return area / Math.PI;
}
