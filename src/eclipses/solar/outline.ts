/**
 * Points of a shadow outline on the ground at one instant (Meeus, Elements
 * of Solar Eclipses, ch. 7; Explanatory Supplement, ch. 11): the places
 * where, at that instant, the shadow's edge of radius r passes nearest and
 * leaves again — the limits of the path, of the partial eclipse, of a
 * magnitude. Each lies at (ξ, η) = (x, y) − r (sin Q, cos Q) with
 * a sin Q + b cos Q = 0, a and b the shadow's motion relative to the point;
 * r, a and b depend on the point itself, so the three are iterated together.
 */
import type { LonLat } from '../../ephemeris/earth.ts';
import type { BesselianElements } from './besselian.ts';
import { narrowBracket } from '../../ephemeris/roots.ts';
import { discOverlapFraction } from './localCore.ts';
import { geocentricPlace, planeCoordinates, surfacePoint } from './surface.ts';

/** The radius of a shadow circle at a place's height ζ above the fundamental plane. */
export type OutlineRadius = (e: BesselianElements, zeta: number) => number;

/** L1′ = l1 − ζ tan f1: the penumbra. */
export const penumbraRadius: OutlineRadius = (e, zeta) => e.l1 - zeta * e.tanF1;
/** L2′ = l2 − ζ tan f2: negative for the umbra, positive for the antumbra. */
export const umbraRadiusSigned: OutlineRadius = (e, zeta) => e.l2 - zeta * e.tanF2;
/** |L2′|: the path limits. */
export const umbraRadius: OutlineRadius = (e, zeta) => Math.abs(umbraRadiusSigned(e, zeta));
/** The distance Δ from the axis at which the magnitude is M: L1′ − M (L1′ + L2′). */
export const magnitudeRadius = (magnitude: number): OutlineRadius => (e, zeta) => {
  const l1 = penumbraRadius(e, zeta);
  return l1 - magnitude * (l1 + umbraRadiusSigned(e, zeta));
};

/**
 * The distance Δ from the axis at which the obscuration is O, 0 < O < 1:
 * the overlap of the discs falls steadily as they part, so Δ is bisected
 * between 0 and L1′ (where the discs just touch).
 */
export const obscurationRadius = (obscuration: number): OutlineRadius => (e, zeta) => {
  const l1 = penumbraRadius(e, zeta);
  const l2 = umbraRadiusSigned(e, zeta);
  const sum = l1 + l2;
  const moon = (l1 - l2) / sum;
  let near = 0;
  let far = l1;
  for (let i = 0; i < 48; i++) {
    const mid = (near + far) / 2;
    if (discOverlapFraction(moon, (2 * mid) / sum) > obscuration) near = mid;
    else far = mid;
  }
  return (near + far) / 2;
};

export interface OutlinePoint {
  readonly lonLat: LonLat;
  readonly zeta: number;
}

/** The two outline points at one instant, north and south of the axis on the fundamental plane; either is absent when off the Earth. */
export interface OutlinePair {
  readonly north?: OutlinePoint;
  readonly south?: OutlinePoint;
}

/** ζ iterations for a point at a given Q: r depends on ζ only through tan f (≈ 0.0046), so three suffice. */
const ZETA_ITERATIONS = 3;
/** The root is sought within ±60° of the axis's own perpendicular, in 3° steps, then bisected. */
const SEARCH_HALF_WIDTH_RAD = (60 * Math.PI) / 180;
const SEARCH_STEP_RAD = (3 * Math.PI) / 180;
const ANGLE_TOLERANCE_RAD = 1e-10;

interface Candidate {
  readonly point: OutlinePoint;
  /** a sin Q + b cos Q: zero at an outline point. */
  readonly tangency: number;
  readonly etaOffset: number;
}

/** The point at angle Q on the shadow circle of its own radius, and how far its motion is from tangency there. */
function candidateAt(e: BesselianElements, radius: OutlineRadius, q: number): Candidate | undefined {
  const sinQ = Math.sin(q);
  const cosQ = Math.cos(q);
  let zeta = 0;
  let result: Candidate | undefined;
  for (let i = 0; i < ZETA_ITERATIONS; i++) {
    const r = radius(e, zeta);
    if (!(r >= 0)) return undefined;
    const surface = surfacePoint(e, e.x - r * sinQ, e.y - r * cosQ);
    if (!surface) return undefined;
    const plane = planeCoordinates(e, geocentricPlace(surface.lonLat));
    zeta = Math.max(0, plane.zeta);
    result = {
      point: { lonLat: surface.lonLat, zeta },
      tangency: (e.xPerDay - plane.xiPerDay) * sinQ + (e.yPerDay - plane.etaPerDay) * cosQ,
      etaOffset: -r * cosQ,
    };
  }
  return result;
}

function bisect<T>(lo: number, hi: number, keepLo: (q: number) => { keep: boolean; value?: T }): { q: number; value?: T } {
  let value: T | undefined;
  const { inside } = narrowBracket(lo, hi, (q) => {
    const test = keepLo(q);
    if (test.keep) value = test.value ?? value;
    return test.keep;
  }, ANGLE_TOLERANCE_RAD);
  return { q: inside, ...(value !== undefined ? { value } : {}) };
}

/**
 * Well inside the Earth's disc the point is quickly had by iterating r, a and
 * b together from the axis's own motion (Meeus, Elements, ch. 7); accepted
 * only when it settles there (ζ > 0.2, away from the limb's distortion).
 */
function iteratedOutlinePoint(e: BesselianElements, radius: OutlineRadius, side: 1 | -1): Candidate | undefined {
  let zeta = 0;
  let a = e.xPerDay;
  let b = e.yPerDay;
  let previous: [number, number] | undefined;
  for (let i = 0; i < 12; i++) {
    const r = radius(e, zeta);
    if (!(r >= 0)) return undefined;
    const n = Math.hypot(a, b);
    const sinQ = (side * b) / n;
    const cosQ = (-side * a) / n;
    const xi = e.x - r * sinQ;
    const eta = e.y - r * cosQ;
    const surface = surfacePoint(e, xi, eta);
    if (!surface) return undefined;
    const plane = planeCoordinates(e, geocentricPlace(surface.lonLat));
    zeta = plane.zeta;
    a = e.xPerDay - plane.xiPerDay;
    b = e.yPerDay - plane.etaPerDay;
    if (previous && Math.abs(previous[0] - xi) + Math.abs(previous[1] - eta) < 1e-12) {
      return zeta > 0.2 ? { point: { lonLat: surface.lonLat, zeta }, tangency: 0, etaOffset: -r * cosQ } : undefined;
    }
    previous = [xi, eta];
  }
  return undefined;
}

/**
 * The outline point on one side: the root of a sin Q + b cos Q (a, b the
 * point's own motion) nearest the axis's perpendicular. Near the limb the
 * ground position changes without bound as ζ → 0, so a fixed-point iteration
 * stalls there; a scan in Q with bisection does not, and where the scan runs
 * off the Earth the limb itself brackets the root.
 */
function outlinePoint(e: BesselianElements, radius: OutlineRadius, side: 1 | -1): Candidate | undefined {
  const quick = iteratedOutlinePoint(e, radius, side);
  if (quick) return quick;
  const q0 = Math.atan2(side * e.yPerDay, -side * e.xPerDay);
  const steps = Math.round((2 * SEARCH_HALF_WIDTH_RAD) / SEARCH_STEP_RAD);
  const qs = Array.from({ length: steps + 1 }, (_, i) => q0 - SEARCH_HALF_WIDTH_RAD + i * SEARCH_STEP_RAD);
  const candidates = qs.map((q) => candidateAt(e, radius, q));
  let best: { candidate: Candidate; distance: number } | undefined;
  const consider = (lo: number, hi: number, sign: number) => {
    const root = bisect<Candidate>(lo, hi, (q) => {
      const c = candidateAt(e, radius, q);
      return c && Math.sign(c.tangency) === sign ? { keep: true, value: c } : { keep: false };
    });
    const candidate = root.value ?? candidateAt(e, radius, root.q);
    if (!candidate) return;
    const distance = Math.abs(root.q - q0);
    if (!best || distance < best.distance) best = { candidate, distance };
  };
  for (let i = 1; i < qs.length; i++) {
    const a = candidates[i - 1];
    const b = candidates[i];
    if (a && b) {
      if (Math.sign(a.tangency) !== Math.sign(b.tangency)) consider(qs[i - 1]!, qs[i]!, Math.sign(a.tangency));
    } else if (a || b) {
      // One end is off the Earth: find the limb between them, and test the sign there.
      const [onQ, offQ, on] = a ? [qs[i - 1]!, qs[i]!, a] : [qs[i]!, qs[i - 1]!, b!];
      const limb = bisect<Candidate>(onQ, offQ, (q) => {
        const c = candidateAt(e, radius, q);
        return c ? { keep: true, value: c } : { keep: false };
      });
      const atLimb = limb.value;
      if (atLimb && Math.sign(atLimb.tangency) !== Math.sign(on.tangency)) consider(onQ, limb.q, Math.sign(on.tangency));
    }
  }
  return best?.candidate;
}

export function outlinePointsAt(e: BesselianElements, radius: OutlineRadius): OutlinePair {
  // side +1 puts the point at η − y = r a/n: north of the axis while the shadow moves east (a > 0).
  const [northSide, southSide]: [1 | -1, 1 | -1] = e.xPerDay >= 0 ? [1, -1] : [-1, 1];
  const north = outlinePoint(e, radius, northSide);
  const south = outlinePoint(e, radius, southSide);
  return { ...(north ? { north: north.point } : {}), ...(south ? { south: south.point } : {}) };
}
