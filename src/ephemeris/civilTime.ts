/**
 * Civil time in a named zone, through Intl (the IANA database): daylight
 * time applied, never a hand-written offset. Every time is read in the offset
 * in force at its own instant, and printed beside that offset's name when it
 * matters (`stamp`, `range`): a clock change inside an eclipse shows as
 * "02:15 NZDT–02:43 NZST". Printed times round to the minute (common
 * practice); data outputs keep seconds (`rfc3339`).
 */
import { InputError } from '../errors.ts';
import { dateWords, julianDateOfUtcDay, type CalendarDate } from './calendar.ts';
import { dayMark, timeRange } from './dayMark.ts';
import { narrowBracket } from './roots.ts';
import { dateFromDays } from './time.ts';

/**
 * The few words a clock prints besides numbers, in one language: the
 * words/ catalogues supply them (words/common.ts), English by default. Dates
 * go through Intl in `locale`; times stay on the 24-hour clock.
 */
export interface ClockWords {
  /** BCP 47 tag for Intl's month names. */
  readonly locale: string;
  /** The Julian date beside a date before the reform: " (Julian: 23 February 1100)". */
  readonly julianBeside: (julianDate: string) => string;
  /** A time on another day than the reference's: " +1 day", " −2 days" (`days` never 0). */
  readonly dayMark: (days: number) => string;
  /** "CET, UTC+01:00 until 03:00 CEST": an offset and the last minute it holds. */
  readonly until: (label: string, lastTime: string) => string;
  /** Joins the offsets of a span: ", then ". */
  readonly then: string;
}

export const CLOCK_ENGLISH: ClockWords = {
  locale: 'en-GB',
  julianBeside: (julianDate) => ` (Julian: ${julianDate})`,
  dayMark: (days) => ` ${days > 0 ? '+' : '−'}${Math.abs(days)} ${Math.abs(days) === 1 ? 'day' : 'days'}`,
  until: (label, lastTime) => `${label} until ${lastTime}`,
  then: ', then ',
};

const dateWordsByLocale = new Map<string, (date: CalendarDate) => string>();
/** A calendar date (of either calendar) written as `words`' language writes dates: "23 February 1100", "23 de febrero de 1100". */
export function dateWordsIn(words: ClockWords): (date: CalendarDate) => string {
  if (words === CLOCK_ENGLISH) return dateWords;
  let write = dateWordsByLocale.get(words.locale);
  if (!write) {
    const format = new Intl.DateTimeFormat(words.locale, { timeZone: 'UTC', day: 'numeric', month: 'long', year: 'numeric' });
    write = (date) => {
      const day = new Date(0);
      day.setUTCFullYear(date.year, date.month - 1, Math.floor(date.day));
      return format.format(day);
    };
    dateWordsByLocale.set(words.locale, write);
  }
  return write;
}

export interface CivilClock {
  /** IANA zone name, or "UTC". */
  readonly zone: string;
  /** The words it prints (dates, day marks), in one language. */
  readonly words: ClockWords;
  /** 24-hour clock time in the offset in force at that instant, rounded to the minute: "09:50". */
  time(utDays: number): string;
  /** Calendar date in the zone: "3 March 2026"; before 1582 October 15 with the Julian date: "1 March 1100 (Julian: 23 February 1100)". */
  date(utDays: number): string;
  /** ISO 8601 (proleptic Gregorian) date in the zone: "2026-03-03". */
  isoDate(utDays: number): string;
  /** Abbreviation and offset at that instant: "CET, UTC+01:00" (or "UTC"; before standard time "UTC+00:53:28"). */
  zoneLabel(utDays: number): string;
  /** Offset from UTC at that instant, as Intl gives it: "+01:00", or "+00:53:28" for local mean time. */
  offset(utDays: number): string;
  /** The same in seconds, east positive. */
  offsetSeconds(utDays: number): number;
  /** The short name printed after a time: "CET", "UTC+09:00", or "UTC". */
  abbreviation(utDays: number): string;
  /** The zone as the small print names it: "Europe/Berlin (CET, UTC+01:00)", or "UTC". */
  zoneDescription(utDays: number): string;
  /**
   * A time with its own zone: "23:15 NZDT". Given a reference instant (the one whose date a title
   * names), a time on another calendar day in this zone says so: "01:13 +1 day NZDT".
   */
  stamp(utDays: number, referenceUtDays?: number): string;
  /**
   * From one time to another, one zone named if both share it: "23:15–01:43 NZDT", else each its own:
   * "02:15 NZDT–02:43 NZST"; with a reference instant, day marks as `stamp` gives them: "21:12–01:13 +1 day NZDT".
   */
  range(fromUtDays: number, toUtDays: number, referenceUtDays?: number): string;
  /** The instants, between two others, where the offset changes (daylight time starting or ending). */
  offsetChanges(fromUtDays: number, toUtDays: number): OffsetChange[];
  /**
   * The zone over a span: as zoneDescription when one offset holds throughout, else each
   * offset and when it ends: "Pacific/Auckland (NZDT, UTC+13:00 until 03:00 NZDT, then NZST, UTC+12:00)".
   */
  zoneDescriptionBetween(fromUtDays: number, toUtDays: number): string;
  /**
   * RFC 3339 (§5.6) local date-time of an instant rounded to the second. RFC 3339 offsets are whole
   * minutes: a local-mean-time offset (+00:53:28) is rounded to the minute (+00:53) and the clock
   * time written in that offset, so the string denotes exactly the instant, as `isoSeconds` does.
   */
  rfc3339(utDays: number): string;
}

export interface OffsetChange {
  /** The first instant of the new offset (to the second). */
  readonly utDays: number;
  readonly before: string;
  readonly after: string;
}

const SECOND_DAYS = 1 / 86_400;
/** Offsets change at most a few times a year: a scan every half hour finds each, bisection pins it to the second. */
const CHANGE_SCAN_DAYS = 1 / 48;

export function isKnownTimeZone(zone: string): boolean {
  try {
    new Intl.DateTimeFormat('en-GB', { timeZone: zone });
    return true;
  } catch {
    return false;
  }
}

/** The clock of an IANA zone, printing `words`' language; a zone it does not know is an InputError naming `parameter`. */
export function civilClock(zone = 'UTC', parameter = 'zone', words: ClockWords = CLOCK_ENGLISH): CivilClock {
  if (!isKnownTimeZone(zone)) throw new InputError(parameter, 'an IANA time zone such as Australia/Adelaide or America/Chicago, or UTC', zone);
  // The wall clock is computed here (instant + its own offset, then rounded to the minute) and formatted in UTC,
  // so that a time and the zone printed beside it always come from the same offset, seconds included.
  const timeFormat = new Intl.DateTimeFormat(words.locale, { timeZone: 'UTC', hour: '2-digit', minute: '2-digit', hourCycle: 'h23' });
  const dateFormat = new Intl.DateTimeFormat(words.locale, { timeZone: 'UTC', day: 'numeric', month: 'long', year: 'numeric' });
  /** A Julian-calendar date in the same words as the Gregorian ones. */
  const julianWords = dateWordsIn(words);
  // Each English names its own zones: British (CET, BST), American (CST), Australian (AEDT), Indian (IST), New Zealand (NZDT).
  const shortNames = ['en-GB', 'en-US', 'en-AU', 'en-IN', 'en-NZ'].map((locale) => new Intl.DateTimeFormat(locale, { timeZone: zone, timeZoneName: 'short' }));
  const offsetName = new Intl.DateTimeFormat('en-US', { timeZone: zone, timeZoneName: 'longOffset' });
  // Where no English has an abbreviation, the zone's common long name ("Japan Standard Time"), when Intl has one.
  // In another language, that language's own long name ("Ostafrikanische Zeit").
  const longName = new Intl.DateTimeFormat(words === CLOCK_ENGLISH ? 'en-US' : words.locale, { timeZone: zone, timeZoneName: 'long' });
  const part = (format: Intl.DateTimeFormat, utDays: number) =>
    format.formatToParts(dateFromDays(utDays)).find((p) => p.type === 'timeZoneName')?.value ?? '';
  const isUtc = zone.toUpperCase() === 'UTC' || zone === 'Etc/UTC';
  const offset = (utDays: number) => {
    const text = part(offsetName, utDays).replace('GMT', '');
    return text === '' ? '+00:00' : text;
  };
  const offsetSeconds = (utDays: number) => {
    const [, sign, h, m, sec] = /^([+-])(\d\d):(\d\d)(?::(\d\d))?$/.exec(offset(utDays)) ?? [];
    if (!sign) throw new Error(`unreadable offset ${offset(utDays)} in ${zone}`);
    return (sign === '-' ? -1 : 1) * (Number(h) * 3600 + Number(m) * 60 + Number(sec ?? 0));
  };
  /** The wall clock at an instant, in a given offset, rounded to the minute: a Date whose UTC fields are the local ones. */
  const wallMinute = (utDays: number, seconds = offsetSeconds(utDays)) =>
    new Date(Math.round((dateFromDays(utDays).getTime() + seconds * 1000) / 60_000) * 60_000);
  const zoneLabel = (utDays: number) => {
    if (isUtc) return 'UTC';
    const utcOffset = `UTC${offset(utDays).replace('-', '\u2212')}`;
    const name = [...shortNames, longName].map((format) => part(format, utDays)).find((n) => !/^(GMT|UTC)/.test(n));
    return name ? `${name}, ${utcOffset}` : utcOffset;
  };
  const abbreviation = (utDays: number) => (isUtc ? 'UTC' : zoneLabel(utDays).split(',')[0]!);
  const time = (utDays: number) => timeFormat.format(wallMinute(utDays));
  // Day marks need the finished clock (its dates in this zone): filled in below.
  let self: CivilClock;
  const marked = (utDays: number, referenceUtDays?: number) => (referenceUtDays === undefined ? time(utDays) : `${time(utDays)}${dayMark(self, utDays, referenceUtDays)}`);
  const stamp = (utDays: number, referenceUtDays?: number) => `${marked(utDays, referenceUtDays)} ${abbreviation(utDays)}`;
  const zoneDescription = (utDays: number) => (isUtc ? 'UTC' : `${zone} (${zoneLabel(utDays)})`);
  const offsetChanges = (fromUtDays: number, toUtDays: number): OffsetChange[] => {
    if (isUtc || !(toUtDays > fromUtDays)) return [];
    const changes: OffsetChange[] = [];
    const steps = Math.ceil((toUtDays - fromUtDays) / CHANGE_SCAN_DAYS);
    let a = fromUtDays;
    let offsetA = offsetSeconds(a);
    for (let k = 1; k <= steps; k++) {
      const b = fromUtDays + ((toUtDays - fromUtDays) * k) / steps;
      const offsetB = offsetSeconds(b);
      if (offsetB !== offsetA) {
        const before = offsetA;
        const { inside: lo, outside: hi } = narrowBracket(a, b, (t) => offsetSeconds(t) === before, SECOND_DAYS / 2);
        const at = Math.round(hi / SECOND_DAYS) * SECOND_DAYS;
        changes.push({ utDays: at, before: zoneLabel(lo), after: zoneLabel(at) });
      }
      a = b;
      offsetA = offsetB;
    }
    return changes;
  };
  self = {
    zone: isUtc ? 'UTC' : zone,
    words,
    time,
    date(utDays) {
      const wall = wallMinute(utDays);
      const julian = julianDateOfUtcDay(wall, julianWords);
      return julian ? `${dateFormat.format(wall)}${words.julianBeside(julian)}` : dateFormat.format(wall);
    },
    isoDate: (utDays) => wallMinute(utDays).toISOString().slice(0, 10),
    zoneLabel,
    offset,
    offsetSeconds,
    abbreviation,
    zoneDescription,
    stamp,
    range(fromUtDays, toUtDays, referenceUtDays) {
      if (zoneLabel(fromUtDays) !== zoneLabel(toUtDays)) return `${stamp(fromUtDays, referenceUtDays)}–${stamp(toUtDays, referenceUtDays)}`;
      const times = referenceUtDays === undefined ? `${time(fromUtDays)}–${time(toUtDays)}` : timeRange(self, fromUtDays, toUtDays, referenceUtDays);
      return `${times} ${abbreviation(toUtDays)}`;
    },
    offsetChanges,
    zoneDescriptionBetween(fromUtDays, toUtDays) {
      const changes = offsetChanges(fromUtDays, toUtDays);
      if (changes.length === 0) return zoneDescription(fromUtDays);
      const parts = changes.map((c) => {
        // The last minute of the old offset, on the old clock: "until 03:00 NZDT".
        const before = c.utDays - SECOND_DAYS;
        const oldClock = timeFormat.format(wallMinute(c.utDays, offsetSeconds(before)));
        return words.until(c.before, `${oldClock} ${abbreviation(before)}`);
      });
      return `${zone} (${parts.join(words.then)}${words.then}${changes[changes.length - 1]!.after})`;
    },
    rfc3339(utDays) {
      const instantMs = Math.round(dateFromDays(utDays).getTime() / 1000) * 1000;
      const seconds = offsetSeconds(utDays);
      const minutes = Math.sign(seconds) * Math.round(Math.abs(seconds) / 60);
      const local = new Date(instantMs + minutes * 60_000).toISOString().slice(0, 19);
      const sign = minutes < 0 ? '-' : '+';
      const hh = String(Math.floor(Math.abs(minutes) / 60)).padStart(2, '0');
      const mm = String(Math.abs(minutes) % 60).padStart(2, '0');
      return `${local}${sign}${hh}:${mm}`;
    },
  };
  return self;
}
