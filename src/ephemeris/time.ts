/**
 * Instants on both time scales. Ephemerides run on TT; people read UT.
 * Every instant we hand around carries both, so no reader has to guess.
 */
import { AstroTime } from 'astronomy-engine';

const MS_PER_DAY = 86_400_000;
const J2000_MS = Date.UTC(2000, 0, 1, 12, 0, 0);

/** One instant: days since J2000.0 on UT and on TT, and the ΔT (s) joining them. */
export interface Moment {
  readonly utDays: number;
  readonly ttDays: number;
  readonly deltaTSeconds: number;
}

export function momentFromTT(ttDays: number, deltaTSeconds: number): Moment {
  return { ttDays, utDays: ttDays - deltaTSeconds / 86_400, deltaTSeconds };
}

export function momentFromUT(utDays: number, deltaTSeconds: number): Moment {
  return { utDays, ttDays: utDays + deltaTSeconds / 86_400, deltaTSeconds };
}

export function utDaysFromDate(date: Date): number {
  return (date.getTime() - J2000_MS) / MS_PER_DAY;
}

export function dateFromDays(days: number): Date {
  return new Date(J2000_MS + days * MS_PER_DAY);
}

/** Decimal Gregorian year of a UT day count (accurate to a day: enough for ΔT). */
export function decimalYearFromDays(days: number): number {
  return 2000 + (days + 0.5) / 365.2425;
}

/**
 * An astronomy-engine time with OUR ΔT. astronomy-engine fills `tt` from its
 * own global ΔT function; we overwrite it instead of touching that global,
 * so that two calls with different ΔT never disturb each other.
 */
export function astroTimeOf(moment: Moment): AstroTime {
  const time = new AstroTime(moment.utDays);
  time.tt = moment.ttDays;
  return time;
}

/** ISO 8601 UTC, rounded to the second: 2025-03-14T06:58:43Z. */
export function isoSeconds(days: number): string {
  const ms = Math.round((J2000_MS + days * MS_PER_DAY) / 1000) * 1000;
  return new Date(ms).toISOString().replace('.000Z', 'Z');
}

/** ISO 8601 UTC, rounded to the minute: 2025-03-14T06:59Z. */
export function isoMinutes(days: number): string {
  const ms = Math.round((J2000_MS + days * MS_PER_DAY) / 60_000) * 60_000;
  return new Date(ms).toISOString().slice(0, 16) + 'Z';
}

/** Seconds between two day counts, rounded to whole seconds at each end first. */
export function wholeSecondsBetween(startDays: number, endDays: number): number {
  const round = (days: number) => Math.round((J2000_MS + days * MS_PER_DAY) / 1000);
  return round(endDays) - round(startDays);
}
