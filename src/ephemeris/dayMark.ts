/**
 * A time printed on a figure whose title names one date: when the time falls
 * on another calendar day in the printed zone, it says so ("01:13 +1 day").
 */
import type { CivilClock } from './civilTime.ts';

const MINUTE_DAYS = 1 / 1440;

/** Whole calendar days from the reference instant's date to the instant's date, in the clock's zone (minutes rounded as printed). */
export function calendarDaysApart(clock: CivilClock, utDays: number, referenceUtDays: number): number {
  const dayNumber = (t: number) => Date.parse(`${clock.isoDate(Math.round(t / MINUTE_DAYS) * MINUTE_DAYS)}T00:00:00Z`) / 86_400_000;
  return Math.round(dayNumber(utDays) - dayNumber(referenceUtDays));
}

/** "" on the reference date, else " +1 day", " −1 day", " +2 days". */
export function dayMark(clock: CivilClock, utDays: number, referenceUtDays: number): string {
  const days = calendarDaysApart(clock, utDays, referenceUtDays);
  return days === 0 ? '' : clock.words.dayMark(days);
}

/** A time with its day mark: "01:13 +1 day". */
export function timeOnDay(clock: CivilClock, utDays: number, referenceUtDays: number): string {
  return `${clock.time(utDays)}${dayMark(clock, utDays, referenceUtDays)}`;
}

/**
 * A range of times, each marked when it falls on another day than the
 * reference's: "21:12–01:13 +1 day"; "23:40 −1 day – 01:20" (spaced when the
 * first time carries a mark, so the dash is not read as part of it).
 */
export function timeRange(clock: CivilClock, fromUtDays: number, toUtDays: number, referenceUtDays = fromUtDays): string {
  const first = timeOnDay(clock, fromUtDays, referenceUtDays);
  const last = timeOnDay(clock, toUtDays, referenceUtDays);
  return first.includes(' ') ? `${first} – ${last}` : `${first}–${last}`;
}
