/**
 * Civil time in a named zone, through Intl (the IANA database): daylight
 * time applied, never a hand-written offset. Printed times round to the
 * minute (common practice); data outputs keep seconds elsewhere.
 */
import { InputError } from '../errors.ts';
import { dateFromDays } from './time.ts';

export interface CivilClock {
  /** IANA zone name, or "UTC". */
  readonly zone: string;
  /** 24-hour clock time, rounded to the minute: "09:50". */
  time(utDays: number): string;
  /** Calendar date in the zone: "3 March 2026". */
  date(utDays: number): string;
  /** ISO 8601 date in the zone: "2026-03-03". */
  isoDate(utDays: number): string;
  /** Abbreviation and offset at that instant: "CET, UTC+01:00" (or "UTC"). */
  zoneLabel(utDays: number): string;
  /** Offset from UTC at that instant: "+01:00". */
  offset(utDays: number): string;
  /** The short name printed after a time: "CET", "UTC+09:00", or "UTC". */
  abbreviation(utDays: number): string;
  /** The zone as the small print names it: "Europe/Berlin (CET, UTC+01:00)", or "UTC". */
  zoneDescription(utDays: number): string;
}

/** "58 min", "3 h 27 min": durations as printed on figures and in captions. */
export function durationWords(seconds: number): string {
  const minutes = Math.round(seconds / 60);
  if (minutes < 60) return `${minutes} min`;
  return `${Math.floor(minutes / 60)} h ${String(minutes % 60).padStart(2, '0')} min`;
}

const MINUTE_DAYS = 1 / 1440;
const roundToMinute = (utDays: number) => Math.round(utDays / MINUTE_DAYS) * MINUTE_DAYS;

export function isKnownTimeZone(zone: string): boolean {
  try {
    new Intl.DateTimeFormat('en-GB', { timeZone: zone });
    return true;
  } catch {
    return false;
  }
}

export function civilClock(zone = 'UTC', option = '--tz'): CivilClock {
  if (!isKnownTimeZone(zone)) throw new InputError(option, 'an IANA time zone such as Australia/Adelaide or America/Chicago, or UTC', zone);
  const timeFormat = new Intl.DateTimeFormat('en-GB', { timeZone: zone, hour: '2-digit', minute: '2-digit', hourCycle: 'h23' });
  const dateFormat = new Intl.DateTimeFormat('en-GB', { timeZone: zone, day: 'numeric', month: 'long', year: 'numeric' });
  const isoFormat = new Intl.DateTimeFormat('en-CA', { timeZone: zone, year: 'numeric', month: '2-digit', day: '2-digit' });
  // Each English names its own zones: British (CET, BST), American (CST), Australian (AEDT), Indian (IST), New Zealand (NZDT).
  const shortNames = ['en-GB', 'en-US', 'en-AU', 'en-IN', 'en-NZ'].map((locale) => new Intl.DateTimeFormat(locale, { timeZone: zone, timeZoneName: 'short' }));
  const offsetName = new Intl.DateTimeFormat('en-US', { timeZone: zone, timeZoneName: 'longOffset' });
  // Where no English has an abbreviation, the zone's common long name ("Japan Standard Time"), when Intl has one.
  const longName = new Intl.DateTimeFormat('en-US', { timeZone: zone, timeZoneName: 'long' });
  const part = (format: Intl.DateTimeFormat, utDays: number) =>
    format.formatToParts(dateFromDays(utDays)).find((p) => p.type === 'timeZoneName')?.value ?? '';
  const isUtc = zone.toUpperCase() === 'UTC' || zone === 'Etc/UTC';
  const offset = (utDays: number) => {
    const text = part(offsetName, utDays).replace('GMT', '');
    return text === '' ? '+00:00' : text;
  };
  return {
    zone: isUtc ? 'UTC' : zone,
    time: (utDays) => timeFormat.format(dateFromDays(roundToMinute(utDays))),
    date: (utDays) => dateFormat.format(dateFromDays(roundToMinute(utDays))),
    isoDate: (utDays) => isoFormat.format(dateFromDays(roundToMinute(utDays))),
    zoneLabel: (utDays) => {
      if (isUtc) return 'UTC';
      const utcOffset = `UTC${offset(utDays).replace("-", "\u2212")}`;
      const name = [...shortNames, longName].map((format) => part(format, utDays)).find((n) => !/^(GMT|UTC)/.test(n));
      return name ? `${name}, ${utcOffset}` : utcOffset;
    },
    offset,
    abbreviation(utDays) {
      return isUtc ? 'UTC' : this.zoneLabel(utDays).split(',')[0]!;
    },
    zoneDescription(utDays) {
      return isUtc ? 'UTC' : `${zone} (${this.zoneLabel(utDays)})`;
    },
  };
}
