/**
 * Calendar dates and the Julian Day (Meeus, Astronomical Algorithms, 2nd ed.,
 * ch. 7), in the Julian or the Gregorian calendar. Our ids, ISO dates and data
 * outputs use the proleptic Gregorian calendar throughout; before the
 * Gregorian reform (1582 October 15) readers' sources use the Julian one, so
 * human-readable outputs give that date too.
 */

export type CalendarName = 'julian' | 'gregorian';

/** What every data output says about its dates. */
export const DATA_CALENDAR = 'proleptic Gregorian';

export interface CalendarDate {
  readonly year: number;
  readonly month: number;
  /** Day of the month, with a fraction of a day from 0h. */
  readonly day: number;
}

/** JD of 1582 October 15, 0h: the first day of the Gregorian calendar. */
export const GREGORIAN_REFORM_JD = 2299160.5;

/** JD of 1970 January 1, 0h UTC: JavaScript's epoch. */
const UNIX_EPOCH_JD = 2440587.5;

/** Meeus (7.1): the Julian Day of a date in either calendar; B = 0 in the Julian calendar. */
export function julianDayFromCalendar(date: CalendarDate, calendar: CalendarName): number {
  let { year: y, month: m } = date;
  if (m <= 2) {
    y -= 1;
    m += 12;
  }
  const a = Math.floor(y / 100);
  const b = calendar === 'gregorian' ? 2 - a + Math.floor(a / 4) : 0;
  return Math.floor(365.25 * (y + 4716)) + Math.floor(30.6001 * (m + 1)) + date.day + b - 1524.5;
}

/** Meeus ch. 7 ("Calculation of the calendar date from the JD"): A = Z in the Julian calendar. Valid for JD ≥ 0. */
export function calendarFromJulianDay(jd: number, calendar: CalendarName): CalendarDate {
  const z = Math.floor(jd + 0.5);
  const f = jd + 0.5 - z;
  let a = z;
  if (calendar === 'gregorian') {
    const alpha = Math.floor((z - 1867216.25) / 36524.25);
    a = z + 1 + alpha - Math.floor(alpha / 4);
  }
  const b = a + 1524;
  const c = Math.floor((b - 122.1) / 365.25);
  const d = Math.floor(365.25 * c);
  const e = Math.floor((b - d) / 30.6001);
  const day = b - d - Math.floor(30.6001 * e) + f;
  const month = e < 14 ? e - 1 : e - 13;
  const year = month > 2 ? c - 4716 : c - 4715;
  return { year, month, day };
}

const MONTHS = ['January', 'February', 'March', 'April', 'May', 'June', 'July', 'August', 'September', 'October', 'November', 'December'];

/** "23 February 1100". */
export function dateWords(date: CalendarDate): string {
  return `${Math.floor(date.day)} ${MONTHS[date.month - 1]} ${date.year}`;
}

/**
 * The Julian-calendar date of a (proleptic Gregorian) calendar day, when that
 * day falls before the reform: "23 February 1100"; undefined from 1582
 * October 15 on.
 */
export function julianDateBeforeReform(gregorian: { year: number; month: number; day: number }, words: (date: CalendarDate) => string = dateWords): string | undefined {
  const jd = julianDayFromCalendar({ ...gregorian, day: gregorian.day + 0.5 }, 'gregorian');
  if (jd >= GREGORIAN_REFORM_JD) return undefined;
  return words(calendarFromJulianDay(jd, 'julian'));
}

/** The same for an ISO 8601 date ("1100-03-01", as in an eclipse's id). */
export function julianDateOfIsoDate(iso: string, words: (date: CalendarDate) => string = dateWords): string | undefined {
  const [year, month, day] = iso.slice(0, 10).split('-').map(Number) as [number, number, number];
  return julianDateBeforeReform({ year, month, day }, words);
}

/** The same, for a Date whose UTC fields are the day wanted; `words` writes the Julian date (default: English). */
export function julianDateOfUtcDay(date: Date, words: (date: CalendarDate) => string = dateWords): string | undefined {
  return julianDateBeforeReform({ year: date.getUTCFullYear(), month: date.getUTCMonth() + 1, day: date.getUTCDate() }, words);
}

/** JD of an instant (UTC), from JavaScript's epoch. */
export function julianDayOfDate(date: Date): number {
  return UNIX_EPOCH_JD + date.getTime() / 86_400_000;
}
