/**
 * Lines of the continuous field, computed exactly. Where the Moon rises
 * during the counted phase, a place sees (end − moonrise) of it, so the line
 * "m minutes" is where the Moon rises at end − m: the rising half of the
 * Moon-up circle at that instant. Where it sets, the line is the setting half
 * of the circle at start + m. (Only very near the poles, where the Moon may
 * both rise and set within the phase, does the field differ from these lines;
 * the evaluator in visibility.ts handles every place.)
 */
import type { Position } from 'geojson';
import { momentFromUT, type Moment } from '../../ephemeris/time.ts';
import { angularDistanceDeg, circleRing, runWhere } from '../../sphere/circles.ts';
import { moonUpCap } from './moonUp.ts';
import type { Visibility } from './visibility.ts';

export interface FieldLine {
  readonly minutes: number;
  /** "rising": the Moon rises here at `moment`; "setting": it sets. */
  readonly side: 'rising' | 'setting';
  readonly moment: Moment;
  readonly line: Position[];
}

/** A step that gives at most six lines: 5, 10, 15, 20, 30 or 60 minutes. */
export function fieldStepMinutes(durationMinutes: number): number {
  return [5, 10, 15, 20, 30, 60].find((step) => durationMinutes / step <= 6) ?? 60;
}

const RING_STEP_DEG = 0.5;
const MOTION_STEP_DAYS = 1 / 1440;

function halfCircle(at: Moment, side: FieldLine['side']): Position[] {
  const cap = moonUpCap(at);
  const later = moonUpCap(momentFromUT(at.utDays + MOTION_STEP_DAYS, at.deltaTSeconds));
  // A point of the edge is rising when the moving cap is about to take it in.
  const rising = (p: Position) => angularDistanceDeg(later.centre, p) < angularDistanceDeg(cap.centre, p);
  return runWhere(circleRing(cap.centre, cap.radiusDeg, RING_STEP_DEG), side === 'rising' ? rising : (p) => !rising(p));
}

export function fieldLines(visibility: Visibility): FieldLine[] {
  const { eclipse, fieldSpan, fieldDurationMinutes } = visibility;
  const start = eclipse.contacts[fieldSpan.start]!;
  const end = eclipse.contacts[fieldSpan.end]!;
  const step = fieldStepMinutes(fieldDurationMinutes);
  const lines: FieldLine[] = [];
  for (let minutes = step; minutes < fieldDurationMinutes - step / 4; minutes += step) {
    const rise = momentFromUT(end.utDays - minutes / 1440, end.deltaTSeconds);
    const set = momentFromUT(start.utDays + minutes / 1440, start.deltaTSeconds);
    lines.push({ minutes, side: 'rising', moment: rise, line: halfCircle(rise, 'rising') });
    lines.push({ minutes, side: 'setting', moment: set, line: halfCircle(set, 'setting') });
  }
  return lines;
}
