/**
 * Between the fundamental plane and the Earth's surface (Meeus, Elements of
 * Solar Eclipses 1951–2200, ch. 3–5; Explanatory Supplement, ch. 11).
 *
 * The Earth is the WGS 84 ellipsoid and the observer at sea level. Going
 * from the plane to the ground uses the ρ1, d1 reduction: stretching the
 * Earth's polar axis by 1/√(1−e²) turns the ellipsoid into the unit sphere,
 * lines parallel to the shadow axis stay parallel (to a direction of
 * declination d1, tan d1 = tan d / √(1−e²)), ξ is unchanged and η becomes
 * η1 = η/ρ1 with ρ1 = √(1 − e² cos² d). So the Earth's outline on the plane
 * is the ellipse ξ² + (η/ρ1)² = 1, and a point inside it lies on the
 * sunward half of the ellipsoid at ζ1 = √(1 − ξ² − η1²).
 */
import type { LonLat } from '../../ephemeris/earth.ts';
import { wrapLongitudeDeg } from '../../ephemeris/earth.ts';
import type { BesselianElements } from './besselian.ts';
import { EARTH_ECCENTRICITY_SQUARED } from '../../ephemeris/constants.ts';

const DEG = Math.PI / 180;
const SQRT_1_E2 = Math.sqrt(1 - EARTH_ECCENTRICITY_SQUARED);

/** ρ sin φ′ and ρ cos φ′ of a sea-level place (Earth equatorial radii), from its geodetic latitude. */
export interface GeocentricPlace {
  readonly lonDeg: number;
  readonly latDeg: number;
  readonly rhoSinPhi: number;
  readonly rhoCosPhi: number;
}

export function geocentricPlace([lonDeg, latDeg]: LonLat): GeocentricPlace {
  const phi = latDeg * DEG;
  const c = 1 / Math.sqrt(1 - EARTH_ECCENTRICITY_SQUARED * Math.sin(phi) ** 2);
  return { lonDeg, latDeg, rhoSinPhi: (1 - EARTH_ECCENTRICITY_SQUARED) * c * Math.sin(phi), rhoCosPhi: c * Math.cos(phi) };
}

/** A place on the fundamental plane at one instant, with its rates per day. */
export interface PlaneCoordinates {
  readonly xi: number;
  readonly eta: number;
  readonly zeta: number;
  readonly xiPerDay: number;
  readonly etaPerDay: number;
}

/** ξ, η, ζ and ξ′, η′ of a place (Meeus, Elements, ch. 5): H = μ + λ, λ east-positive. */
export function planeCoordinates(e: BesselianElements, place: GeocentricPlace): PlaneCoordinates {
  const h = e.muRad + place.lonDeg * DEG;
  const sd = Math.sin(e.dRad);
  const cd = Math.cos(e.dRad);
  const sh = Math.sin(h);
  const ch = Math.cos(h);
  const xi = place.rhoCosPhi * sh;
  const eta = place.rhoSinPhi * cd - place.rhoCosPhi * ch * sd;
  const zeta = place.rhoSinPhi * sd + place.rhoCosPhi * ch * cd;
  return {
    xi,
    eta,
    zeta,
    xiPerDay: e.muRadPerDay * place.rhoCosPhi * ch,
    etaPerDay: e.muRadPerDay * xi * sd - zeta * e.dRadPerDay,
  };
}

/** ρ1 = √(1 − e² cos² d): the Earth's outline on the plane has semi-axes 1 (ξ) and ρ1 (η). */
export function rho1(dRad: number): number {
  return Math.sqrt(1 - EARTH_ECCENTRICITY_SQUARED * Math.cos(dRad) ** 2);
}

/** A point of the Earth's sunward surface, reached from the plane. */
export interface SurfacePoint {
  readonly lonLat: LonLat;
  /** ζ of the point: its height above the fundamental plane, Earth equatorial radii. */
  readonly zeta: number;
}

/**
 * The point of the ellipsoid's sunward half that lies on the line through
 * (ξ, η) parallel to the axis; undefined when that line misses the Earth.
 * `zeta1` may be forced to 0 for points of the outline (the limb).
 */
export function surfacePoint(e: BesselianElements, xi: number, eta: number): SurfacePoint | undefined {
  const r1 = rho1(e.dRad);
  const eta1 = eta / r1;
  const radicand = 1 - xi * xi - eta1 * eta1;
  if (radicand < 0) return undefined;
  return surfacePointReduced(e, xi, eta1, Math.sqrt(radicand));
}

/** The same from reduced coordinates (ξ, η1, ζ1) on the unit sphere. */
export function surfacePointReduced(e: BesselianElements, xi: number, eta1: number, zeta1: number): SurfacePoint {
  const sd = Math.sin(e.dRad);
  const cd = Math.cos(e.dRad);
  const r1 = rho1(e.dRad);
  const sd1 = sd / r1;
  const cd1 = (SQRT_1_E2 * cd) / r1;
  // On the unit sphere: the component along the pole, and towards the axis's meridian.
  const sinPhi1 = eta1 * cd1 + zeta1 * sd1;
  const towardsMeridian = -eta1 * sd1 + zeta1 * cd1;
  const hourAngle = Math.atan2(xi, towardsMeridian);
  const cosPhi1 = Math.hypot(xi, towardsMeridian);
  const latDeg = Math.atan2(sinPhi1, SQRT_1_E2 * cosPhi1) / DEG;
  const lonDeg = wrapLongitudeDeg((hourAngle - e.muRad) / DEG);
  // ζ in the true (unstretched) Earth: X along the axis's meridian, Z = √(1−e²) × the sphere's.
  const zeta = towardsMeridian * cd + SQRT_1_E2 * sinPhi1 * sd;
  return { lonLat: [lonDeg, latDeg], zeta };
}

/**
 * The point of the Earth's outline ξ² + (η/ρ1)² = 1 nearest (x, y), and the
 * signed distance to it: positive outside the outline, negative inside.
 * Newton's method on the ellipse's parameter, started from the direction of
 * (x, y/ρ1): the ellipse is nearly a circle, so three or four steps suffice.
 */
export function nearestOutlinePoint(x: number, y: number, r1: number): { xi: number; eta: number; signedDistance: number } {
  let theta = Math.atan2(y / r1, x);
  const k = 1 - r1 * r1;
  for (let i = 0; i < 8; i++) {
    const c = Math.cos(theta);
    const s = Math.sin(theta);
    // d/dθ of half the squared distance from (x, y) to (cos θ, ρ1 sin θ).
    const f = k * -s * c + x * s - y * r1 * c;
    const df = k * (s * s - c * c) + x * c + y * r1 * s;
    if (df === 0) break;
    const step = f / df;
    theta -= step;
    if (Math.abs(step) < 1e-13) break;
  }
  const xi = Math.cos(theta);
  const eta = r1 * Math.sin(theta);
  const distance = Math.hypot(x - xi, y - eta);
  const inside = x * x + (y / r1) ** 2 < 1;
  return { xi, eta, signedDistance: inside ? -distance : distance };
}
