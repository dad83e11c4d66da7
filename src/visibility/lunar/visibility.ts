/**
 * From one eclipse to its visibility: a Moon-up cap for greatest and each
 * contact, the zones readers care about, and a continuous field — minutes of
 * the counted phase with the Moon up — at any place (Meeus, Astronomical Algorithms, ch. 15).
 */
import type { ContactName } from '../../eclipses/lunar/contacts.ts';
import { CONTACT_ORDER } from '../../eclipses/lunar/contacts.ts';
import type { LunarEclipse } from '../../eclipses/lunar/types.ts';
import type { LonLat } from '../../ephemeris/earth.ts';
import { momentFromUT } from '../../ephemeris/time.ts';
import { capTest, moonUpCap, moonUpMargin, type CapTest, type MoonUpCap } from './moonUp.ts';
import { normalAt, type Normal } from '../../sphere/normal.ts';

export type StageName = ContactName | 'greatest';

export interface Stage {
  readonly name: StageName;
  readonly cap: MoonUpCap;
}

/** What readers ask first: is any of it seen, all of it, its start or its end? */
export type ZoneName = 'sees-all' | 'sets-during' | 'rises-during' | 'sees-none';
export const ZONE_ORDER: readonly ZoneName[] = ['sees-all', 'sets-during', 'rises-during', 'sees-none'];
/** For total eclipses: totality seen whole, or only its start or end. */
export type TotalityZoneName = 'totality-all' | 'totality-part';

/** The phase the continuous field counts: totality, the umbral phase, or (penumbral eclipses) the penumbral phase. */
export type CountedPhase = 'totality' | 'umbral' | 'penumbral';

export interface PhaseSpan {
  readonly phase: CountedPhase;
  readonly start: ContactName;
  readonly end: ContactName;
}

export interface Visibility {
  readonly eclipse: LunarEclipse;
  /** Stages in time order: the contacts that occur and greatest. */
  readonly stages: readonly Stage[];
  /** The phase whose start and end define the zones: umbral, or penumbral for penumbral eclipses. */
  readonly zoneSpan: PhaseSpan;
  /** The phase the field counts. */
  readonly fieldSpan: PhaseSpan;
  readonly fieldDurationMinutes: number;
}

/** Field samples at most this far apart: the Moon's altitude is nearly linear over such a step. */
const FIELD_STEP_MINUTES = 4;

export function zoneSpanOf(eclipse: LunarEclipse): PhaseSpan {
  return eclipse.kind === 'penumbral' ? { phase: 'penumbral', start: 'P1', end: 'P4' } : { phase: 'umbral', start: 'U1', end: 'U4' };
}

export function fieldSpanOf(eclipse: LunarEclipse): PhaseSpan {
  return eclipse.kind === 'total' ? { phase: 'totality', start: 'U2', end: 'U3' } : zoneSpanOf(eclipse);
}

export function visibilityOf(eclipse: LunarEclipse): Visibility {
  const stages: Stage[] = [];
  for (const name of CONTACT_ORDER) {
    const moment = eclipse.contacts[name];
    if (!moment) continue;
    if (name === 'U3' || (name === 'U4' && !eclipse.contacts.U3) || (name === 'P4' && !eclipse.contacts.U4)) {
      if (!stages.some((s) => s.name === 'greatest')) stages.push({ name: 'greatest', cap: moonUpCap(eclipse.greatest) });
    }
    stages.push({ name, cap: moonUpCap(moment) });
  }
  const fieldSpan = fieldSpanOf(eclipse);
  const durationDays = eclipse.contacts[fieldSpan.end]!.utDays - eclipse.contacts[fieldSpan.start]!.utDays;
  return { eclipse, stages, zoneSpan: zoneSpanOf(eclipse), fieldSpan, fieldDurationMinutes: durationDays * 1440 };
}

/** Caps through the field's phase, evenly spaced in time: what minutesUpAt integrates over. */
function fieldSamples(visibility: Visibility): CapTest[] {
  const start = visibility.eclipse.contacts[visibility.fieldSpan.start]!;
  const durationDays = visibility.fieldDurationMinutes / 1440;
  const steps = Math.max(8, Math.ceil(visibility.fieldDurationMinutes / FIELD_STEP_MINUTES));
  return Array.from({ length: steps + 1 }, (_, i) =>
    capTest(moonUpCap(momentFromUT(start.utDays + (durationDays * i) / steps, start.deltaTSeconds))),
  );
}

export function stage(visibility: Visibility, name: StageName): Stage {
  const found = visibility.stages.find((s) => s.name === name);
  if (!found) throw new Error(`the eclipse of ${visibility.eclipse.id} has no ${name}`);
  return found;
}

/** Margins (sin h − sin h0) at the start and end of a span: positive where the Moon is up. */
export interface SpanMargins {
  readonly start: number;
  readonly end: number;
}

export function spanTests(visibility: Visibility, span: PhaseSpan): { start: CapTest; end: CapTest } {
  return { start: capTest(stage(visibility, span.start).cap), end: capTest(stage(visibility, span.end).cap) };
}

export function zoneFromMargins(m: SpanMargins): ZoneName {
  if (m.start > 0) return m.end > 0 ? 'sees-all' : 'sets-during';
  return m.end > 0 ? 'rises-during' : 'sees-none';
}

/** A fast evaluator for one eclipse: zone, totality zone and field at any place. */
export interface VisibilityEvaluator {
  zoneAt(place: LonLat): ZoneName;
  zoneAtNormal(n: Normal): ZoneName;
  totalityZoneAt(place: LonLat): TotalityZoneName | undefined;
  minutesUpAt(place: LonLat): number;
  /** The same, from a precomputed normal (for grids). */
  minutesUpAtNormal(n: Normal): number;
}

export function visibilityEvaluator(visibility: Visibility): VisibilityEvaluator {
  const zone = spanTests(visibility, visibility.zoneSpan);
  const totality = visibility.eclipse.kind === 'total' ? spanTests(visibility, fieldSpanOf(visibility.eclipse)) : undefined;
  // Only the minutes-up field needs samples through the phase: take them on first use.
  let samples: CapTest[] | undefined;
  const minutesUpAtNormal = (n: Normal): number => {
    samples ??= fieldSamples(visibility);
    const stepMinutes = visibility.fieldDurationMinutes / (samples.length - 1);
    let minutes = 0;
    let previous = moonUpMargin(samples[0]!, n);
    for (let i = 1; i < samples.length; i++) {
      const current = moonUpMargin(samples[i]!, n);
      // The positive part of a straight line between two samples.
      if (previous > 0 && current > 0) minutes += stepMinutes;
      else if (previous > 0 || current > 0) minutes += (stepMinutes * Math.max(previous, current)) / Math.abs(current - previous);
      previous = current;
    }
    return minutes;
  };
  const zoneAtNormal = (n: Normal): ZoneName => zoneFromMargins({ start: moonUpMargin(zone.start, n), end: moonUpMargin(zone.end, n) });
  return {
    zoneAt: (place) => zoneAtNormal(normalAt(place)),
    zoneAtNormal,
    totalityZoneAt(place) {
      if (!totality) return undefined;
      const n = normalAt(place);
      const start = moonUpMargin(totality.start, n) > 0;
      const end = moonUpMargin(totality.end, n) > 0;
      return start && end ? 'totality-all' : start || end ? 'totality-part' : undefined;
    },
    minutesUpAt: (place) => minutesUpAtNormal(normalAt(place)),
    minutesUpAtNormal,
  };
}
