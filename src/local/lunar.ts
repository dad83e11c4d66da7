/**
 * Local circumstances (twilight classes: common practice): for one place, each stage's instant,
 * the Moon's altitude and azimuth, whether it is up (by the same convention as
 * the map's zones), the Sun's altitude and the sky it makes; moonrise and
 * moonset inside the eclipse; and what of each phase the place sees (localView), which
 * words/lunar/text.ts tells in a summary.
 */
import { CONTACT_ORDER } from '../eclipses/lunar/contacts.ts';
import type { LunarEclipse } from '../eclipses/lunar/types.ts';
import { ephemerisTime, moonPositionKm, sunPositionKm } from '../ephemeris/bodies.ts';
import { momentFromUT, type Moment } from '../ephemeris/time.ts';
import { horizontal, type Observer } from '../ephemeris/topocentric.ts';
import { capTest, moonUpCap, moonUpMargin } from '../visibility/lunar/moonUp.ts';
import { normalAt } from '../sphere/normal.ts';
import type { StageName } from '../visibility/lunar/visibility.ts';
import { bisectSignChange } from '../ephemeris/roots.ts';

export type SkyClass = 'day' | 'civil' | 'nautical' | 'astronomical' | 'night';
export type LocalEventName = StageName | 'moonrise' | 'moonset';

export interface LocalEvent {
  readonly event: LocalEventName;
  readonly moment: Moment;
  /** Altitude of the Moon's centre, degrees: with refraction from a true −1° up, geometric below (topocentric.ts). */
  readonly moonAltitudeDeg: number;
  readonly moonAzimuthDeg: number;
  /** Upper limb above the sea-level horizon (Meeus ch. 15), as on the map; true at moonrise, false at moonset. */
  readonly moonUp: boolean;
  /** Geometric altitude of the Sun's centre, degrees. */
  readonly sunAltitudeDeg: number;
  readonly sky: SkyClass;
}

export interface LocalCircumstances {
  readonly eclipse: LunarEclipse;
  readonly observer: Observer;
  /** Every contact, greatest, and any moonrise/moonset between P1 and P4, in time order. */
  readonly events: readonly LocalEvent[];
}

/** Twilight by the Sun's geometric altitude (common practice): sunrise/sunset at −0.833°, then −6°, −12°, −18°. */
export function skyClass(sunAltitudeDeg: number): SkyClass {
  if (sunAltitudeDeg >= -0.833) return 'day';
  if (sunAltitudeDeg >= -6) return 'civil';
  if (sunAltitudeDeg >= -12) return 'nautical';
  if (sunAltitudeDeg >= -18) return 'astronomical';
  return 'night';
}

/** sin h − sin h0 for the Moon at a place and instant: positive when it is up. */
export function moonUpMarginAt(observer: Observer, moment: Moment): number {
  return moonUpMargin(capTest(moonUpCap(moment)), normalAt([observer.lonDeg, observer.latDeg]));
}

function eventAt(event: LocalEventName, moment: Moment, observer: Observer): LocalEvent {
  const time = ephemerisTime(moment.ttDays);
  const moon = horizontal(moonPositionKm(time), moment, observer);
  const sun = horizontal(sunPositionKm(time), moment, observer);
  // At moonrise the Moon has just come up; at moonset it has just gone.
  const moonUp = event === 'moonrise' ? true : event === 'moonset' ? false : moonUpMarginAt(observer, moment) > 0;
  return {
    event,
    moment,
    moonAltitudeDeg: moon.altitudeDeg,
    moonAzimuthDeg: moon.azimuthDeg,
    moonUp,
    sunAltitudeDeg: sun.geometricAltitudeDeg,
    sky: skyClass(sun.geometricAltitudeDeg),
  };
}

const SCAN_STEP_DAYS = 5 / 1440;
const ROOT_TOLERANCE_DAYS = 0.5 / 86_400;
const GOLDEN = (Math.sqrt(5) - 1) / 2;

/**
 * Moonrises and moonsets between two instants, every one of them: scan every
 * five minutes and bisect each change of sign to half a second; where the
 * scan shows a highest point below the horizon, or a lowest above it, find
 * that extreme (golden section), so that a Moon grazing the horizon between
 * two samples at high latitudes still gives its rise and its set.
 */
export function moonRisesAndSets(observer: Observer, from: Moment, to: Moment): { event: 'moonrise' | 'moonset'; moment: Moment }[] {
  const at = (ut: number) => momentFromUT(ut, from.deltaTSeconds);
  const margin = (ut: number) => moonUpMarginAt(observer, at(ut));
  const steps = Math.max(2, Math.ceil((to.utDays - from.utDays) / SCAN_STEP_DAYS));
  const times = Array.from({ length: steps + 1 }, (_, k) => from.utDays + ((to.utDays - from.utDays) * k) / steps);
  const values = times.map(margin);
  const bisect = (lo: number, hi: number, flo: number): number => bisectSignChange(margin, lo, hi, flo, ROOT_TOLERANCE_DAYS);
  /** The extreme of the margin in [lo, hi]: its time and value (sign +1 for a highest point, −1 for a lowest). */
  const extreme = (lo: number, hi: number, sign: number): [number, number] => {
    let a = hi - GOLDEN * (hi - lo);
    let b = lo + GOLDEN * (hi - lo);
    let fa = sign * margin(a);
    let fb = sign * margin(b);
    while (hi - lo > ROOT_TOLERANCE_DAYS) {
      if (fa > fb) {
        hi = b;
        b = a;
        fb = fa;
        a = hi - GOLDEN * (hi - lo);
        fa = sign * margin(a);
      } else {
        lo = a;
        a = b;
        fa = fb;
        b = lo + GOLDEN * (hi - lo);
        fb = sign * margin(b);
      }
    }
    const t = (lo + hi) / 2;
    return [t, margin(t)];
  };
  const crossings: number[] = [];
  for (let k = 1; k <= steps; k++) {
    if (values[k - 1]! > 0 !== values[k]! > 0) crossings.push(bisect(times[k - 1]!, times[k]!, values[k - 1]!));
    // A turn that stays on one side at the samples may still cross between them.
    if (k < steps) {
      const [p, q, r] = [values[k - 1]!, values[k]!, values[k + 1]!];
      const sign = q >= p && q >= r ? 1 : q <= p && q <= r ? -1 : 0;
      if (sign !== 0 && p > 0 === q > 0 && q > 0 === r > 0) {
        const [tm, fm] = extreme(times[k - 1]!, times[k + 1]!, sign);
        if (fm > 0 !== q > 0) {
          crossings.push(bisect(times[k - 1]!, tm, p), bisect(tm, times[k + 1]!, fm));
        }
      }
    }
  }
  const initiallyUp = values[0]! > 0;
  return [...new Set(crossings)].sort((a, b) => a - b).map((ut, k) => ({
    event: (k % 2 === 0) === initiallyUp ? 'moonset' : 'moonrise',
    moment: at(ut),
  }));
}

/** A stretch of time with the Moon up (by the map's convention), UT days. */
export interface UpInterval {
  readonly fromUtDays: number;
  readonly toUtDays: number;
}

/** When the Moon is up between P1 and P4: from the flag at P1 and every rise and set after it. */
export function upIntervals(local: LocalCircumstances): UpInterval[] {
  const { events, eclipse } = local;
  const p1 = eclipse.contacts.P1!.utDays;
  const p4 = eclipse.contacts.P4!.utDays;
  const intervals: UpInterval[] = [];
  let openedAt = events.find((e) => e.event === 'P1')!.moonUp ? p1 : undefined;
  for (const e of events) {
    if (e.event === 'moonrise') openedAt = e.moment.utDays;
    else if (e.event === 'moonset' && openedAt !== undefined) {
      intervals.push({ fromUtDays: openedAt, toUtDays: e.moment.utDays });
      openedAt = undefined;
    }
  }
  if (openedAt !== undefined) intervals.push({ fromUtDays: openedAt, toUtDays: p4 });
  return intervals;
}

/** Minutes of [from, to] with the Moon up. */
export function upMinutesWithin(intervals: readonly UpInterval[], fromUtDays: number, toUtDays: number): number {
  return intervals.reduce((sum, i) => sum + Math.max(0, Math.min(toUtDays, i.toUtDays) - Math.max(fromUtDays, i.fromUtDays)) * 1440, 0);
}

export function localCircumstances(eclipse: LunarEclipse, observer: Observer): LocalCircumstances {
  const stages: { event: LocalEventName; moment: Moment }[] = [];
  for (const name of CONTACT_ORDER) {
    const moment = eclipse.contacts[name];
    if (moment) stages.push({ event: name, moment });
  }
  stages.push({ event: 'greatest', moment: eclipse.greatest });
  stages.push(...moonRisesAndSets(observer, eclipse.contacts.P1!, eclipse.contacts.P4!));
  stages.sort((a, b) => a.moment.utDays - b.moment.utDays);
  return { eclipse, observer, events: stages.map((s) => eventAt(s.event, s.moment, observer)) };
}

/** The Moon's and Sun's altitudes through a span, every `stepMinutes`: the curve of the "view from here" figure. */
export interface AltitudeSample {
  readonly moment: Moment;
  readonly moonAltitudeDeg: number;
  /** From north through east. */
  readonly moonAzimuthDeg: number;
  readonly sunAltitudeDeg: number;
}

export function altitudeTrack(observer: Observer, from: Moment, to: Moment, stepMinutes = 2): AltitudeSample[] {
  const steps = Math.max(2, Math.ceil(((to.utDays - from.utDays) * 1440) / stepMinutes));
  return Array.from({ length: steps + 1 }, (_, i) => {
    const moment = momentFromUT(from.utDays + ((to.utDays - from.utDays) * i) / steps, from.deltaTSeconds);
    const time = ephemerisTime(moment.ttDays);
    const moon = horizontal(moonPositionKm(time), moment, observer);
    return {
      moment,
      moonAltitudeDeg: moon.altitudeDeg,
      moonAzimuthDeg: moon.azimuthDeg,
      sunAltitudeDeg: horizontal(sunPositionKm(time), moment, observer).geometricAltitudeDeg,
    };
  });
}

// ---- what a place sees (words/lunar/text.ts turns it into sentences) -------------------------

/** The 16 points in their short forms, "ESE" for east-southeast (common practice on charts and forecasts). */
const COMPASS_16 = ['N', 'NNE', 'NE', 'ENE', 'E', 'ESE', 'SE', 'SSE', 'S', 'SSW', 'SW', 'WSW', 'W', 'WNW', 'NW', 'NNW'];
export const compassPoint = (azimuthDeg: number) => COMPASS_16[Math.round((((azimuthDeg % 360) + 360) % 360) / 22.5) % 16]!;

export type EclipsePhase = 'before' | 'penumbral' | 'partial' | 'total' | 'after';

/** What is happening at an instant: which phase is on. */
export function phaseAt(eclipse: LunarEclipse, utDays: number): EclipsePhase {
  const c = eclipse.contacts;
  if (utDays < c.P1!.utDays) return 'before';
  if (utDays > c.P4!.utDays) return 'after';
  if (c.U2 && c.U3 && utDays >= c.U2.utDays && utDays <= c.U3.utDays) return 'total';
  if (c.U1 && c.U4 && utDays >= c.U1.utDays && utDays <= c.U4.utDays) return 'partial';
  return 'penumbral';
}

export type Coverage = 'all' | 'part' | 'none';

/** One phase between two contacts, and how much of it the Moon is up for. */
export interface PhaseStretch {
  readonly phase: 'penumbral' | 'partial' | 'total';
  readonly fromUtDays: number;
  readonly toUtDays: number;
  readonly upMinutes: number;
  readonly seen: Coverage;
}

/** What a place sees, derived from when the Moon is actually up: the intervals, and each phase's share of them. */
export interface LocalView {
  readonly intervals: readonly UpInterval[];
  /** P1→P4 in time order: penumbral, partial, total, partial, penumbral (those the eclipse has). */
  readonly stretches: readonly PhaseStretch[];
  /** Of the whole eclipse, P1–P4. */
  readonly whole: Coverage;
  /** Of the umbral phase U1–U4 (umbral eclipses), or of P1–P4 (penumbral ones). */
  readonly main: Coverage;
  /** Of totality U2–U3 (total eclipses only). */
  readonly totality?: Coverage;
}

/** Up for all of a span, none of it, or part: to a hundredth of a second. */
const coverage = (upMinutes: number, minutes: number): Coverage => (upMinutes <= 1e-4 ? 'none' : upMinutes >= minutes - 1e-4 ? 'all' : 'part');

export function localView(local: LocalCircumstances): LocalView {
  const { eclipse } = local;
  const c = eclipse.contacts;
  const intervals = upIntervals(local);
  const cuts: [EclipsePhase & ('penumbral' | 'partial' | 'total'), Moment][] = [['penumbral', c.P1!]];
  if (c.U1) cuts.push(['partial', c.U1]);
  if (c.U2) cuts.push(['total', c.U2]);
  if (c.U3) cuts.push(['partial', c.U3]);
  if (c.U4) cuts.push(['penumbral', c.U4]);
  const stretches = cuts.map(([phase, from], k) => {
    const to = k + 1 < cuts.length ? cuts[k + 1]![1] : c.P4!;
    const upMinutes = upMinutesWithin(intervals, from.utDays, to.utDays);
    return { phase, fromUtDays: from.utDays, toUtDays: to.utDays, upMinutes, seen: coverage(upMinutes, (to.utDays - from.utDays) * 1440) };
  });
  const over = (from: Moment, to: Moment) => coverage(upMinutesWithin(intervals, from.utDays, to.utDays), (to.utDays - from.utDays) * 1440);
  return {
    intervals,
    stretches,
    whole: over(c.P1!, c.P4!),
    main: eclipse.kind === 'penumbral' ? over(c.P1!, c.P4!) : over(c.U1!, c.U4!),
    ...(eclipse.kind === 'total' ? { totality: over(c.U2!, c.U3!) } : {}),
  };
}
