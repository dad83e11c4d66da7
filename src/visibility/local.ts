/**
 * Local circumstances (twilight classes: common practice): for one place, each stage's instant,
 * the Moon's altitude and azimuth, whether it is up (by the same convention as
 * the map's zones), the Sun's altitude and the sky it makes; moonrise and
 * moonset inside the eclipse; and a plain-words summary.
 */
import { CONTACT_ORDER } from '../eclipse/contacts.ts';
import type { LunarEclipse } from '../eclipse/types.ts';
import { ephemerisTime, moonPositionKm, sunPositionKm } from '../ephemeris/bodies.ts';
import type { CivilClock } from '../ephemeris/civilTime.ts';
import { timeRange } from '../ephemeris/dayMark.ts';
import { momentFromUT, type Moment } from '../ephemeris/time.ts';
import { horizontal, type Observer } from '../ephemeris/topocentric.ts';
import { capTest, moonUpCap, moonUpMargin, normalAt } from './moonUp.ts';
import type { StageName } from './visibility.ts';

export type SkyClass = 'day' | 'civil' | 'nautical' | 'astronomical' | 'night';
export type LocalEventName = StageName | 'moonrise' | 'moonset';

export interface LocalEvent {
  readonly event: LocalEventName;
  readonly moment: Moment;
  /** Apparent altitude of the Moon's centre, with refraction, degrees. */
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

const SCAN_STEP_DAYS = 10 / 1440;
const ROOT_TOLERANCE_DAYS = 0.5 / 86_400;

/** Moonrises and moonsets between two instants: scan every ten minutes, then bisect to half a second. */
export function moonRisesAndSets(observer: Observer, from: Moment, to: Moment): { event: 'moonrise' | 'moonset'; moment: Moment }[] {
  const found: { event: 'moonrise' | 'moonset'; moment: Moment }[] = [];
  const at = (ut: number) => momentFromUT(ut, from.deltaTSeconds);
  const margin = (ut: number) => moonUpMarginAt(observer, at(ut));
  const steps = Math.max(1, Math.ceil((to.utDays - from.utDays) / SCAN_STEP_DAYS));
  let a = from.utDays;
  let fa = margin(a);
  for (let k = 1; k <= steps; k++) {
    const b = from.utDays + ((to.utDays - from.utDays) * k) / steps;
    const fb = margin(b);
    if (fa > 0 !== fb > 0) {
      let lo = a;
      let hi = b;
      let flo = fa;
      while (hi - lo > ROOT_TOLERANCE_DAYS) {
        const mid = (lo + hi) / 2;
        const fm = margin(mid);
        if (fm > 0 === flo > 0) {
          lo = mid;
          flo = fm;
        } else {
          hi = mid;
        }
      }
      found.push({ event: fb > 0 ? 'moonrise' : 'moonset', moment: at((lo + hi) / 2) });
    }
    a = b;
    fa = fb;
  }
  return found;
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

// ---- plain words -------------------------------------------------------------------------

const COMPASS = ['north', 'northeast', 'east', 'southeast', 'south', 'southwest', 'west', 'northwest'];
export const compassWord = (azimuthDeg: number) => COMPASS[Math.round(azimuthDeg / 45) % 8]!;
/** The 16 points in their short forms, "ESE" for east-southeast (common practice on charts and forecasts). */
const COMPASS_16 = ['N', 'NNE', 'NE', 'ENE', 'E', 'ESE', 'SE', 'SSE', 'S', 'SSW', 'SW', 'WSW', 'W', 'WNW', 'NW', 'NNW'];
export const compassPoint = (azimuthDeg: number) => COMPASS_16[Math.round((((azimuthDeg % 360) + 360) % 360) / 22.5) % 16]!;
const heightWord = (altitudeDeg: number) => (altitudeDeg < 15 ? 'low in the' : altitudeDeg < 45 ? 'in the' : 'high in the');

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

const PHASE_STATE: Record<ReturnType<typeof phaseAt>, string> = {
  before: 'before the eclipse begins',
  penumbral: 'in the faint penumbral phase',
  partial: 'already partly eclipsed',
  total: 'totally eclipsed',
  after: 'after the eclipse is over',
};

/** One or two sentences for a newsletter: what readers at this place will see, in their time. */
export function localSummary(local: LocalCircumstances, clock: CivilClock, placeName: string): string {
  const { eclipse, events } = local;
  const c = eclipse.contacts;
  const t = (m: Moment) => clock.time(m.utDays);
  const zone = clock.abbreviation(eclipse.greatest.utDays);
  const byName = (name: LocalEventName) => events.find((e) => e.event === name);
  const up = (name: StageName) => byName(name)?.moonUp ?? false;
  const where = (e: LocalEvent) => `${heightWord(e.moonAltitudeDeg)} ${compassWord(e.moonAzimuthDeg)}`;
  const rise = byName('moonrise');
  const set = byName('moonset');
  const penumbral = eclipse.kind === 'penumbral';
  const [startName, endName] = penumbral ? (['P1', 'P4'] as const) : (['U1', 'U4'] as const);
  const start = byName(startName)!;
  const end = byName(endName)!;
  const greatest = byName('greatest')!;
  const daylight = events.some((e) => e.moonUp && e.sky === 'day' && e.event !== 'moonrise' && e.event !== 'moonset')
    ? ' Part of it falls in daylight, when the Moon is hard to see.'
    : '';
  const from = `From ${placeName}`;

  if (start.moonUp && end.moonUp) {
    const what = penumbral ? 'the whole penumbral eclipse is in view' : 'the whole eclipse is in view';
    const totality = eclipse.kind === 'total' ? `, totality ${timeRange(clock, c.U2!.utDays, c.U3!.utDays, start.moment.utDays)}` : '';
    const extra = [rise, set].filter((e): e is LocalEvent => Boolean(e))
      .map((e) => `; the Moon ${e.event === 'moonrise' ? 'rises' : 'sets'} at ${t(e.moment)}, ${PHASE_STATE[phaseAt(eclipse, e.moment.utDays)]}`).join('');
    return `${from} ${what}: ${penumbral ? 'penumbral phase' : 'partial phases'} ${timeRange(clock, start.moment.utDays, end.moment.utDays)} ${zone}${totality}, the Moon ${where(greatest)} at greatest${extra}.${daylight}`;
  }
  if (start.moonUp && set) {
    const totality = eclipse.kind === 'total' && up('U2') ? ` and totality at ${t(c.U2!)}` : '';
    const lastUp = [...events].reverse().find((e) => e.moonUp && e.event !== 'moonset') ?? start;
    return `${from} the eclipse begins at ${t(start.moment)} ${zone}${totality}, but the Moon sets at ${t(set.moment)}, ${PHASE_STATE[phaseAt(eclipse, set.moment.utDays)]}, ${where(lastUp)}.${daylight}`;
  }
  if (end.moonUp && rise) {
    const totality = eclipse.kind === 'total' && up('U3') ? `; totality ends at ${t(c.U3!)}` : '';
    return `${from} the Moon rises at ${t(rise.moment)} ${zone}, ${PHASE_STATE[phaseAt(eclipse, rise.moment.utDays)]}${totality}; the eclipse ends at ${t(end.moment)}, the Moon ${where(end)}.${daylight}`;
  }
  if (rise || set || events.some((e) => e.moonUp)) {
    const moves = [rise, set].filter((e): e is LocalEvent => Boolean(e)).map((e) => `the Moon ${e.event === 'moonrise' ? 'rises' : 'sets'} at ${t(e.moment)} ${zone}`).join(' and ');
    return `${from} only the faint penumbral phase is seen${moves ? `: ${moves}` : ''}.${daylight}`;
  }
  return `${from} the eclipse cannot be seen: the Moon is below the horizon from start to finish.`;
}
