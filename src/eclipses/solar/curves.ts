/**
 * The curves of a solar-eclipse map as plain lon/lat polylines
 * (Explanatory Supplement, ch. 11; Meeus, Elements of Solar Eclipses, ch. 7):
 * the central line with its times, the northern and southern limits of the
 * total/annular path and of the partial eclipse, curves of equal magnitude
 * and of equal obscuration,
 * and the curves where the eclipse begins or ends at sunrise or sunset.
 * Every point lies on the Earth's sunward half (ζ ≥ 0; on the ellipsoid,
 * strictly ζ1 ≥ 0 of the ρ1 reduction: the Sun on or above the geodetic
 * horizon); lines end on the Earth's outline where they leave it, and are
 * cut at ±180° with a point on each side of the cut.
 */
import type { LonLat } from '../../ephemeris/earth.ts';
import { narrowBracket } from '../../ephemeris/roots.ts';
import { momentFromTT, type Moment } from '../../ephemeris/time.ts';
import { besselianAt, type BesselianElements } from './besselian.ts';
import { magnitudeRadius, obscurationRadius, outlinePointsAt, penumbraRadius, umbraRadius, type OutlineRadius } from './outline.ts';
import { geocentricPlace, planeCoordinates, rho1, surfacePoint, surfacePointReduced } from './surface.ts';
import { centralSpanTT } from './global.ts';
import type { SolarEclipse } from './types.ts';

/** A polyline with the instant at each point (TT and UT). */
export interface TimedLine {
  readonly points: readonly LonLat[];
  readonly times: readonly Moment[];
}

export interface NorthSouth {
  readonly north: readonly (readonly LonLat[])[];
  readonly south: readonly (readonly LonLat[])[];
}

/** One minute between samples: points ~30 km apart along a path, smooth at any map scale a page shows. */
export const CURVE_STEP_DAYS = 1 / 1440;

interface Sample {
  readonly lonLat: LonLat;
  readonly ttDays: number;
}

/** Split a run of samples (undefined = off the Earth) into lines, cutting at ±180° with a point on each side of the cut. */
export function linesFromSamples(samples: readonly (Sample | undefined)[]): Sample[][] {
  const lines: Sample[][] = [];
  let current: Sample[] = [];
  const flush = () => {
    if (current.length >= 2) lines.push(current);
    current = [];
  };
  for (const s of samples) {
    if (!s) {
      flush();
      continue;
    }
    const previous = current[current.length - 1];
    if (previous && Math.abs(s.lonLat[0] - previous.lonLat[0]) > 180) {
      // Crossing the antimeridian: interpolate the latitude (and time) where it is crossed.
      const east = previous.lonLat[0] > 0;
      const toCut = (east ? 180 : -180) - previous.lonLat[0];
      const span = s.lonLat[0] + (east ? 360 : -360) - previous.lonLat[0];
      const f = span === 0 ? 0 : toCut / span;
      const lat = previous.lonLat[1] + f * (s.lonLat[1] - previous.lonLat[1]);
      const tt = previous.ttDays + f * (s.ttDays - previous.ttDays);
      current.push({ lonLat: [east ? 180 : -180, lat], ttDays: tt });
      flush();
      current.push({ lonLat: [east ? -180 : 180, lat], ttDays: tt });
    }
    current.push(s);
  }
  flush();
  return lines;
}

function instants(fromTT: number, toTT: number, stepDays: number): number[] {
  const count = Math.max(2, Math.ceil((toTT - fromTT) / stepDays));
  return Array.from({ length: count + 1 }, (_, i) => fromTT + ((toTT - fromTT) * i) / count);
}

/** Extra points towards a curve's end on the limb, where its ground speed grows without bound as ζ → 0. */
const LIMB_FRACTIONS = [1 / 2, 1 / 4, 1 / 8, 1 / 16, 1 / 64, 1 / 256, 1 / 1024];
const BOUNDARY_TOLERANCE_DAYS = 1e-8;

/**
 * Sample a curve that exists over parts of [fromTT, toTT]: every step, and
 * where it enters or leaves the Earth, the boundary instant by bisection plus
 * points crowding towards it, so that each line ends on the limb.
 */
export function sampleCurve(pointAt: (ttDays: number) => LonLat | undefined, fromTT: number, toTT: number, stepDays: number): (Sample | undefined)[] {
  const at = (tt: number): Sample | undefined => {
    const lonLat = pointAt(tt);
    return lonLat ? { lonLat, ttDays: tt } : undefined;
  };
  const times = instants(fromTT, toTT, stepDays);
  const regular = times.map(at);
  const out: (Sample | undefined)[] = [];
  for (let i = 0; i < regular.length; i++) {
    const here = regular[i];
    const previous = regular[i - 1];
    if (i > 0 && (previous === undefined) !== (here === undefined)) {
      // One of the two is on the Earth: bisect between it and the other for the instant the curve meets the limb.
      const inside = (previous ?? here)!;
      let edge: Sample = inside;
      const { inside: onTT } = narrowBracket(inside.ttDays, previous ? times[i]! : times[i - 1]!, (t) => {
        const s = at(t);
        if (s) edge = s;
        return s !== undefined;
      }, BOUNDARY_TOLERANCE_DAYS);
      const crowd = LIMB_FRACTIONS.map((f) => at(onTT + (inside.ttDays - onTT) * f)).filter((s): s is Sample => s !== undefined);
      if (previous) out.push(...crowd.reverse(), edge, undefined);
      else out.push(undefined, edge, ...crowd, here);
      continue;
    }
    out.push(here);
  }
  return out;
}

/** The central line, from where the axis first meets the Earth to where it leaves, with times. Empty for non-central eclipses. */
export function centralLine(eclipse: SolarEclipse, stepDays = CURVE_STEP_DAYS): TimedLine[] {
  const fit = eclipse.elements;
  const span = centralSpanTT(fit, eclipse.greatest.ttDays);
  if (!span) return [];
  const samples = instants(span[0], span[1], stepDays).map((tt, i, all): Sample | undefined => {
    const e = besselianAt(fit, tt);
    // The ends lie on the limb: take the outline point so that rounding cannot drop them.
    const point = i === 0 || i === all.length - 1 ? limbPoint(e) : surfacePoint(e, e.x, e.y);
    return point ? { lonLat: point.lonLat, ttDays: tt } : undefined;
  });
  return linesFromSamples(samples).map((line) => ({
    points: line.map((s) => s.lonLat),
    times: line.map((s) => momentFromTT(s.ttDays, fit.deltaTSeconds)),
  }));
}

function limbPoint(e: BesselianElements) {
  const r1 = rho1(e.dRad);
  const norm = Math.hypot(e.x, e.y / r1);
  return surfacePointReduced(e, e.x / norm, e.y / r1 / norm, 0);
}

function outlineCurves(eclipse: SolarEclipse, radius: OutlineRadius, fromTT: number, toTT: number, stepDays: number): NorthSouth {
  const fit = eclipse.elements;
  const side = (which: 'north' | 'south') => (tt: number) => outlinePointsAt(besselianAt(fit, tt), radius)[which]?.lonLat;
  const lonLats = (lines: Sample[][]) => lines.map((line) => line.map((s) => s.lonLat));
  return {
    north: lonLats(linesFromSamples(sampleCurve(side('north'), fromTT, toTT, stepDays))),
    south: lonLats(linesFromSamples(sampleCurve(side('south'), fromTT, toTT, stepDays))),
  };
}

/** Northern and southern limits of the total or annular path (|L2′|); empty for partial eclipses. */
export function pathLimits(eclipse: SolarEclipse, stepDays = CURVE_STEP_DAYS): NorthSouth {
  const { U1, U4 } = eclipse.contacts;
  if (!U1 || !U4) return { north: [], south: [] };
  return outlineCurves(eclipse, umbraRadius, U1.ttDays, U4.ttDays, stepDays);
}

/** Northern and southern limits of the partial eclipse (L1′): beyond them the Moon misses the Sun. */
export function partialLimits(eclipse: SolarEclipse, stepDays = CURVE_STEP_DAYS): NorthSouth {
  return outlineCurves(eclipse, penumbraRadius, eclipse.contacts.P1!.ttDays, eclipse.contacts.P4!.ttDays, stepDays);
}

/** The curves where the greatest magnitude (Sun up or not) equals `magnitude`, 0 < magnitude < 1. */
export function equalMagnitudeCurves(eclipse: SolarEclipse, magnitude: number, stepDays = CURVE_STEP_DAYS): NorthSouth {
  return outlineCurves(eclipse, magnitudeRadius(magnitude), eclipse.contacts.P1!.ttDays, eclipse.contacts.P4!.ttDays, stepDays);
}

/** The curves where the obscuration at maximum (Sun up or not) equals `obscuration`, 0 < obscuration < 1. */
export function equalObscurationCurves(eclipse: SolarEclipse, obscuration: number, stepDays = CURVE_STEP_DAYS): NorthSouth {
  return outlineCurves(eclipse, obscurationRadius(obscuration), eclipse.contacts.P1!.ttDays, eclipse.contacts.P4!.ttDays, stepDays);
}

/** Which rise/set curve a point belongs to: the eclipse begins (C1) or ends (C4) as the Sun rises or sets there. */
export interface RiseSetLine {
  readonly contact: 'C1' | 'C4';
  readonly sun: 'sunrise' | 'sunset';
  readonly points: readonly LonLat[];
}

/**
 * The two points of the Earth's limb (ζ = 0) on the penumbra's edge at one
 * instant: the outline ellipse (cos θ, ρ1 sin θ) at distance l1 from (x, y).
 * Started from the circle-circle intersection of the ρ1-reduced plane, then
 * Newton on θ.
 */
function limbCrossings(e: BesselianElements): number[] {
  const r1 = rho1(e.dRad);
  const y1 = e.y / r1;
  const m = Math.hypot(e.x, y1);
  const cosOffset = (1 + m * m - e.l1 * e.l1) / (2 * m);
  if (Math.abs(cosOffset) >= 1) return [];
  const centre = Math.atan2(y1, e.x);
  const offset = Math.acos(cosOffset);
  return [centre - offset, centre + offset].map((theta) => {
    for (let i = 0; i < 6; i++) {
      const c = Math.cos(theta);
      const s = Math.sin(theta);
      const dx = c - e.x;
      const dy = r1 * s - e.y;
      const g = dx * dx + dy * dy - e.l1 * e.l1;
      const dg = 2 * (-dx * s + dy * r1 * c);
      if (dg === 0) break;
      theta -= g / dg;
    }
    return theta;
  });
}

/** Curves where the eclipse begins or ends at sunrise or sunset, split wherever the kind of point changes. */
export function riseSetCurves(eclipse: SolarEclipse, stepDays = CURVE_STEP_DAYS): RiseSetLine[] {
  const fit = eclipse.elements;
  const branchPoint = (b: 0 | 1) => (tt: number): LonLat | undefined => {
    const e = besselianAt(fit, tt);
    const theta = limbCrossings(e)[b];
    return theta === undefined ? undefined : surfacePointReduced(e, Math.cos(theta), Math.sin(theta), 0).lonLat;
  };
  const labelOf = (s: Sample): { contact: 'C1' | 'C4'; sun: 'sunrise' | 'sunset' } => {
    const e = besselianAt(fit, s.ttDays);
    const plane = planeCoordinates(e, geocentricPlace(s.lonLat));
    // ζ′ = −μ′ξ cos d + η d′: the Sun rises where ζ grows.
    const zetaRate = -e.muRadPerDay * plane.xi * Math.cos(e.dRad) + plane.eta * e.dRadPerDay;
    // The eclipse begins (C1) where the shadow is closing on the place: Δ shrinking.
    const u = e.x - plane.xi;
    const v = e.y - plane.eta;
    const closing = u * (e.xPerDay - plane.xiPerDay) + v * (e.yPerDay - plane.etaPerDay) < 0;
    return { contact: closing ? 'C1' : 'C4', sun: zetaRate > 0 ? 'sunrise' : 'sunset' };
  };
  const { P1, P4 } = eclipse.contacts;
  const result: RiseSetLine[] = [];
  for (const b of [0, 1] as const) {
    for (const line of linesFromSamples(sampleCurve(branchPoint(b), P1!.ttDays, P4!.ttDays, stepDays))) {
      let run: Sample[] = [];
      let label = labelOf(line[0]!);
      const flush = () => {
        if (run.length >= 2) result.push({ ...label, points: run.map((s) => s.lonLat) });
      };
      for (const s of line) {
        const here = labelOf(s);
        if (here.contact !== label.contact || here.sun !== label.sun) {
          run.push(s);
          flush();
          run = [];
          label = here;
        }
        run.push(s);
      }
      flush();
    }
  }
  return result;
}
