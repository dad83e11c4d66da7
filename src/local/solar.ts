/**
 * What one place sees of a solar eclipse (Meeus, Elements of Solar Eclipses,
 * ch. 5–6): C1, C2, maximum, C3, C4 from the Besselian elements; magnitude
 * and obscuration at maximum; sunrise and sunset inside the eclipse; the
 * Sun's altitude (refraction as on the lunar side: Saemundsson, Meeus
 * eq. 16.4) and azimuth at each event; the distance to the central line and
 * to the nearest path limit, with the warnings a reader needs.
 */
import { InputError } from '../errors.ts';
import { ephemerisTime, sunPositionKm } from '../ephemeris/bodies.ts';
import { SUN_RADIUS_KM } from '../ephemeris/constants.ts';
import type { LonLat } from '../ephemeris/earth.ts';
import { momentFromTT, type Moment } from '../ephemeris/time.ts';
import { horizontal, type Observer } from '../ephemeris/topocentric.ts';
import { besselianAt } from '../eclipses/solar/besselian.ts';
import { LOW_SUN_DEG, NEAR_EDGE_KM, SUNRISE_ALTITUDE_DEG } from '../eclipses/solar/constants.ts';
import { chordKm } from '../eclipses/solar/global.ts';
import {
  localContactTT,
  localMaximumTT,
  localShadow,
  magnitudeOf,
  obscurationOf,
  penumbralContact,
  umbralContact,
  type LocalShadow,
} from '../eclipses/solar/localCore.ts';
import { outlinePointsAt, umbraRadius } from '../eclipses/solar/outline.ts';
import { geocentricPlace, surfacePoint, type GeocentricPlace } from '../eclipses/solar/surface.ts';
import type { SolarEclipse } from '../eclipses/solar/types.ts';
import { bisectSignChange } from '../ephemeris/roots.ts';

export type SolarLocalEventName = 'C1' | 'C2' | 'maximum' | 'C3' | 'C4' | 'sunrise' | 'sunset';
/** What a place sees, with the Sun up: the central phase (total or annular), only the partial phases, or nothing. */
export type SolarLocalKind = 'total' | 'annular' | 'partial' | 'none';

export interface SolarLocalEvent {
  readonly event: SolarLocalEventName;
  readonly moment: Moment;
  /** Apparent altitude of the Sun's centre, with refraction, degrees. */
  readonly sunAltitudeDeg: number;
  /** Azimuth from north through east, degrees. */
  readonly sunAzimuthDeg: number;
  /** The Sun's upper limb above the sea-level horizon (Meeus ch. 15); true at sunrise, false at sunset. */
  readonly sunUp: boolean;
}

export interface SolarLocalCircumstances {
  readonly eclipse: SolarEclipse;
  readonly observer: Observer;
  readonly kind: SolarLocalKind;
  /** Magnitude and obscuration at maximum, whether or not the Sun is up then; 0 when the eclipse misses the place. */
  readonly magnitude: number;
  readonly obscuration: number;
  /** The greatest obscuration seen with the Sun up (0 if none is). */
  readonly obscurationSeen: number;
  /** Contacts, maximum, and any sunrise or sunset between C1 and C4, in time order. */
  readonly events: readonly SolarLocalEvent[];
  /** C2 → C3, seconds, when the place is inside the path. */
  readonly centralSeconds?: number;
  /** Whether the place lies inside the total or annular path. */
  readonly insidePath: boolean;
  /** Distance to the central line and to the nearer path limit at the place's maximum, km (when they lie on the Earth). */
  readonly centralLineKm?: number;
  readonly nearestLimitKm?: number;
  /** Within NEAR_EDGE_KM of a path limit: the smooth-limb model and ΔT uncertainty may move the edge across the place. */
  readonly nearPathEdge: boolean;
  /** The eclipse is seen, but at its best the Sun stands below LOW_SUN_DEG. */
  readonly lowSun: boolean;
}

const DEG = Math.PI / 180;
const DAY_SECONDS = 86_400;

/**
 * The Sun's geometric altitude from the Besselian elements alone: the
 * geodetic normal against the axis direction (within 15″ of the Sun's
 * direction, the Moon's offset from the axis over the Sun's distance) — fast
 * enough for fields over the whole Earth.
 */
export function sunAltitudeFromElementsDeg(fit: SolarEclipse['elements'], [lonDeg, latDeg]: LonLat, ttDays: number): number {
  const e = besselianAt(fit, ttDays);
  const phi = latDeg * DEG;
  const h = e.muRad + lonDeg * DEG;
  return Math.asin(Math.sin(phi) * Math.sin(e.dRad) + Math.cos(phi) * Math.cos(h) * Math.cos(e.dRad)) / DEG;
}

interface Phases {
  readonly place: GeocentricPlace;
  readonly maximum: LocalShadow;
  readonly c1?: number;
  readonly c2?: number;
  readonly c3?: number;
  readonly c4?: number;
}

function phasesAt(eclipse: SolarEclipse, lonLat: LonLat, central = true): Phases {
  const fit = eclipse.elements;
  const place = geocentricPlace(lonLat);
  const maximumTT = localMaximumTT(fit, place, eclipse.greatest.ttDays);
  const maximum = localShadow(fit, place, maximumTT);
  if (maximum.distance >= maximum.penumbra) return { place, maximum };
  const c1 = localContactTT(fit, place, maximumTT, penumbralContact, -1);
  const c4 = localContactTT(fit, place, maximumTT, penumbralContact, 1);
  if (!central) return { place, maximum, c1, c4 };
  const c2 = localContactTT(fit, place, maximumTT, umbralContact, -1);
  const c3 = localContactTT(fit, place, maximumTT, umbralContact, 1);
  return { place, maximum, c1, c4, ...(c2 !== undefined && c3 !== undefined ? { c2, c3 } : {}) };
}

const SCAN_STEP_DAYS = 10 / 1440;
const ROOT_TOLERANCE_DAYS = 0.01 / DAY_SECONDS;

/** Sunrises and sunsets between two TT instants, from a margin function (positive when the Sun is up). */
function risesAndSets(margin: (tt: number) => number, fromTT: number, toTT: number): { event: 'sunrise' | 'sunset'; ttDays: number }[] {
  const found: { event: 'sunrise' | 'sunset'; ttDays: number }[] = [];
  const steps = Math.max(1, Math.ceil((toTT - fromTT) / SCAN_STEP_DAYS));
  let a = fromTT;
  let fa = margin(a);
  for (let k = 1; k <= steps; k++) {
    const b = fromTT + ((toTT - fromTT) * k) / steps;
    const fb = margin(b);
    if (fa > 0 !== fb > 0) {
      found.push({ event: fb > 0 ? 'sunrise' : 'sunset', ttDays: bisectSignChange(margin, a, b, fa, ROOT_TOLERANCE_DAYS) });
    }
    a = b;
    fa = fb;
  }
  return found;
}

/**
 * The greatest obscuration a place sees with the Sun up (its upper limb
 * above the sea-level horizon, geometric altitude ≥ −0°50′): a field for
 * maps to contour and for GeoJSON. Obscuration rises monotonically from C1
 * to maximum and falls to C4, so with the Sun down at maximum the best seen
 * is at sunset or sunrise inside the eclipse.
 */
export function greatestObscurationSeen(eclipse: SolarEclipse, lonLat: LonLat): number {
  const fit = eclipse.elements;
  const phases = phasesAt(eclipse, lonLat, false);
  if (phases.c1 === undefined || phases.c4 === undefined) return 0;
  const margin = (tt: number) => sunAltitudeFromElementsDeg(fit, lonLat, tt) - SUNRISE_ALTITUDE_DEG;
  const maximumTT = phases.maximum.ttDays;
  if (margin(maximumTT) > 0) return obscurationOf(phases.maximum);
  const candidates = [
    ...risesAndSets(margin, phases.c1, maximumTT).map((r) => r.ttDays),
    ...risesAndSets(margin, maximumTT, phases.c4).map((r) => r.ttDays),
  ];
  let best = 0;
  for (const tt of candidates) best = Math.max(best, obscurationOf(localShadow(fit, phases.place, tt)));
  return best;
}

/** Everything a place sees of one solar eclipse. */
export function solarLocalCircumstances(eclipse: SolarEclipse, observer: Observer): SolarLocalCircumstances {
  const { latDeg, lonDeg } = observer;
  if (!(Math.abs(latDeg) <= 90) || !(Math.abs(lonDeg) <= 180)) {
    throw new InputError('observer', 'latitude −90…90° and longitude −180…180°', `${latDeg}, ${lonDeg}`, true);
  }
  const fit = eclipse.elements;
  const lonLat: LonLat = [observer.lonDeg, observer.latDeg];
  const phases = phasesAt(eclipse, lonLat);
  const moment = (tt: number) => momentFromTT(tt, fit.deltaTSeconds);
  const seaLevel: Observer = { lonDeg: observer.lonDeg, latDeg: observer.latDeg };
  const sunAt = (tt: number) => horizontal(sunPositionKm(ephemerisTime(tt)), moment(tt), seaLevel);
  const eventAt = (event: SolarLocalEventName, tt: number): SolarLocalEvent => {
    const sun = sunAt(tt);
    return {
      event,
      moment: moment(tt),
      sunAltitudeDeg: sun.altitudeDeg,
      sunAzimuthDeg: sun.azimuthDeg,
      sunUp: event === 'sunrise' ? true : event === 'sunset' ? false : sun.geometricAltitudeDeg >= SUNRISE_ALTITUDE_DEG,
    };
  };
  const maximum = phases.maximum;
  const nothing: SolarLocalCircumstances = {
    eclipse,
    observer,
    kind: 'none',
    magnitude: 0,
    obscuration: 0,
    obscurationSeen: 0,
    events: [],
    insidePath: false,
    nearPathEdge: false,
    lowSun: false,
  };
  if (phases.c1 === undefined || phases.c4 === undefined) return { ...nothing, ...pathDistances(eclipse, lonLat, maximum) };

  const events: SolarLocalEvent[] = [eventAt('C1', phases.c1)];
  if (phases.c2 !== undefined) events.push(eventAt('C2', phases.c2));
  events.push(eventAt('maximum', maximum.ttDays));
  if (phases.c3 !== undefined) events.push(eventAt('C3', phases.c3));
  events.push(eventAt('C4', phases.c4));
  const margin = (tt: number) => sunAt(tt).geometricAltitudeDeg - SUNRISE_ALTITUDE_DEG;
  for (const r of risesAndSets(margin, phases.c1, phases.c4)) events.push(eventAt(r.event, r.ttDays));
  events.sort((a, b) => a.moment.ttDays - b.moment.ttDays);

  // What is seen: a phase is seen if the Sun is up at any instant of it (at an event in it, or at a rise or set inside).
  const seenBetween = (from: number, to: number) =>
    events.some((e) => e.moment.ttDays >= from - 1e-9 && e.moment.ttDays <= to + 1e-9 && (e.sunUp || e.event === 'sunset'));
  const centralSeen = phases.c2 !== undefined && phases.c3 !== undefined && seenBetween(phases.c2, phases.c3);
  const partialSeen = seenBetween(phases.c1, phases.c4);
  const kind: SolarLocalKind = centralSeen ? (maximum.umbra < 0 ? 'total' : 'annular') : partialSeen ? 'partial' : 'none';

  const obscurationSeen = greatestObscurationSeen(eclipse, lonLat);
  const bestSeen = events
    .filter((e) => e.sunUp || e.event === 'sunset')
    .map((e) => ({ e, o: obscurationOf(localShadow(fit, phases.place, e.moment.ttDays)) }))
    .sort((a, b) => b.o - a.o)[0];
  const distances = pathDistances(eclipse, lonLat, maximum);
  return {
    eclipse,
    observer,
    kind,
    magnitude: magnitudeOf(maximum),
    obscuration: obscurationOf(maximum),
    obscurationSeen,
    events,
    ...(phases.c2 !== undefined && phases.c3 !== undefined ? { centralSeconds: (phases.c3 - phases.c2) * DAY_SECONDS } : {}),
    ...distances,
    lowSun: kind !== 'none' && bestSeen !== undefined && bestSeen.e.sunAltitudeDeg < LOW_SUN_DEG,
  };
}

/** Distances to the central line and the nearer path limit at the place's maximum. */
function pathDistances(eclipse: SolarEclipse, lonLat: LonLat, maximum: LocalShadow): {
  insidePath: boolean;
  nearPathEdge: boolean;
  centralLineKm?: number;
  nearestLimitKm?: number;
} {
  const insidePath = maximum.distance < Math.abs(maximum.umbra);
  if (eclipse.kind === 'partial') return { insidePath, nearPathEdge: false };
  const e = besselianAt(eclipse.elements, maximum.ttDays);
  const axisPoint = surfacePoint(e, e.x, e.y);
  const limits = outlinePointsAt(e, umbraRadius);
  const limitDistances = [limits.north, limits.south].filter((p) => p !== undefined).map((p) => chordKm(lonLat, p.lonLat));
  const nearestLimitKm = limitDistances.length > 0 ? Math.min(...limitDistances) : undefined;
  return {
    insidePath,
    nearPathEdge: nearestLimitKm !== undefined && nearestLimitKm < NEAR_EDGE_KM,
    ...(axisPoint ? { centralLineKm: chordKm(lonLat, axisPoint.lonLat) } : {}),
    ...(nearestLimitKm !== undefined ? { nearestLimitKm } : {}),
  };
}

/**
 * The Sun and the Moon as a place sees them at its maximum: the two discs to
 * scale and where the Moon's centre lies from the Sun's. On the fundamental
 * plane at the place's height the penumbral and umbral radii L1′, L2′ make the
 * Sun's disc (L1′ + L2′)/2 and the Moon's (L1′ − L2′)/2, their centres
 * Δ = √(u² + v²) apart (Meeus, Elements of Solar Eclipses, ch. 5; the same
 * model as `magnitudeOf` and `obscurationOf`). Seen from the place, the Moon
 * stands off the Sun by (u, v): u toward the east, v toward the north pole of
 * date, so its position angle from the Sun's centre, north through east, is
 * atan2(u, v).
 */
export interface SolarDiscs {
  readonly maximum: Moment;
  /** The Sun's apparent semi-diameter, radians (its radius over its distance). */
  readonly sunSemiDiameterRad: number;
  /** The Moon's semi-diameter in Sun radii: (L1′ − L2′)/(L1′ + L2′). */
  readonly moonRadiusSunRadii: number;
  /** Centre to centre, in Sun radii: 2Δ/(L1′ + L2′). */
  readonly separationSunRadii: number;
  /** Position angle of the Moon's centre from the Sun's, degrees from north through east, 0…360. */
  readonly positionAngleDeg: number;
  readonly magnitude: number;
  readonly obscuration: number;
  /** The Sun's apparent altitude and azimuth at maximum, degrees. */
  readonly sunAltitudeDeg: number;
  readonly sunAzimuthDeg: number;
}

export function solarDiscsAtMaximum(eclipse: SolarEclipse, observer: Observer): SolarDiscs {
  const { latDeg, lonDeg } = observer;
  if (!(Math.abs(latDeg) <= 90) || !(Math.abs(lonDeg) <= 180)) {
    throw new InputError('observer', 'latitude −90…90° and longitude −180…180°', `${latDeg}, ${lonDeg}`, true);
  }
  const fit = eclipse.elements;
  const place = geocentricPlace([lonDeg, latDeg]);
  const s = localShadow(fit, place, localMaximumTT(fit, place, eclipse.greatest.ttDays));
  const sum = s.penumbra + s.umbra;
  const time = ephemerisTime(s.ttDays);
  const sunKm = sunPositionKm(time);
  const moment = momentFromTT(s.ttDays, fit.deltaTSeconds);
  const sun = horizontal(sunKm, moment, { lonDeg, latDeg });
  const angle = Math.atan2(s.u, s.v) / DEG;
  return {
    maximum: moment,
    sunSemiDiameterRad: Math.asin(SUN_RADIUS_KM / Math.hypot(...sunKm)),
    moonRadiusSunRadii: (s.penumbra - s.umbra) / sum,
    separationSunRadii: (2 * s.distance) / sum,
    positionAngleDeg: angle < 0 ? angle + 360 : angle,
    magnitude: magnitudeOf(s),
    obscuration: obscurationOf(s),
    sunAltitudeDeg: sun.altitudeDeg,
    sunAzimuthDeg: sun.azimuthDeg,
  };
}
