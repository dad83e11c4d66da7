/**
 * Civil time at the edges: local mean time before standard time (offsets with
 * seconds), odd and half-hour zones, years 1000–3000. Sources: RFC 3339 §5.6
 * (the date-time grammar: time-numoffset is ±HH:MM), and Intl's own wall
 * clock (the IANA database through ICU), read field by field.
 */
import assert from 'node:assert/strict';
import { test } from 'node:test';
import { findLunarEclipses } from '../../src/eclipses/lunar/catalogue.ts';
import { civilClock } from '../../src/ephemeris/civilTime.ts';
import { isoSeconds, utDaysFromDate } from '../../src/ephemeris/time.ts';
import { localJson, localReport } from '../../src/outputs/localFormats.ts';

const ZONES = [
  'UTC', 'Europe/London', 'Europe/Berlin', 'Europe/Dublin', 'Europe/Moscow', 'Africa/Accra', 'Africa/Monrovia', 'Asia/Kolkata',
  'Asia/Kathmandu', 'Asia/Tehran', 'Australia/Adelaide', 'Australia/Lord_Howe', 'Australia/Eucla', 'Pacific/Auckland',
  'Pacific/Chatham', 'Pacific/Kiritimati', 'Pacific/Pago_Pago', 'Pacific/Marquesas', 'America/St_Johns', 'America/Chicago',
  'America/Caracas', 'Atlantic/Azores', 'Etc/GMT+12', 'Etc/GMT-14',
];

/** RFC 3339 §5.6: full-date "T" full-time, time-numoffset = ("+" / "-") time-hour ":" time-minute (no seconds). */
const RFC3339 = /^\d{4}-(0[1-9]|1[0-2])-(0[1-9]|[12]\d|3[01])T([01]\d|2[0-3]):[0-5]\d:[0-5]\d(Z|[+-]([01]\d|2[0-3]):[0-5]\d)$/;

/** The wall clock Intl shows at an instant, as milliseconds of a UTC Date with the same fields. */
function intlWallMs(zone: string, date: Date): number {
  const parts = Object.fromEntries(
    new Intl.DateTimeFormat('en-US', { timeZone: zone, year: 'numeric', month: 'numeric', day: 'numeric', hour: 'numeric', minute: 'numeric', second: 'numeric', hourCycle: 'h23', era: 'short' })
      .formatToParts(date).map((p) => [p.type, p.value]),
  );
  const wall = new Date(0);
  wall.setUTCFullYear(Number(parts.year), Number(parts.month) - 1, Number(parts.day));
  wall.setUTCHours(Number(parts.hour), Number(parts.minute), Number(parts.second), 0);
  return wall.getTime();
}

/** Instants spread over 1000–3000, at odd seconds (with fractions, or whole). */
function instants(whole = false): number[] {
  const out: number[] = [];
  for (let year = 1000; year <= 3000; year += 25) {
    for (const [month, day, seconds] of [[0, 3, 3_617.4], [3, 17, 47_903.6], [6, 29, 29.5], [9, 11, 86_370.2]] as const) {
      if (whole) {
        out.push(utDaysFromDate(new Date(Date.UTC(year, month, day) + Math.floor(seconds) * 1000)));
        continue;
      }
      out.push(utDaysFromDate(new Date(Date.UTC(year, month, day) + seconds * 1000)));
    }
  }
  // And a year 1000 edge within the day: one second before midnight UTC.
  out.push(utDaysFromDate(new Date(Date.UTC(1000, 0, 1) - 1000)));
  return out;
}

test('local values are RFC 3339 date-times (§5.6) and denote exactly the instant of utc, for many zones, years 1000–3000', () => {
  let withSeconds = 0;
  for (const zone of ZONES) {
    const clock = civilClock(zone);
    for (const ut of instants()) {
      const local = clock.rfc3339(ut);
      assert.match(local, RFC3339, `${zone} ${isoSeconds(ut)}: ${local}`);
      assert.equal(Date.parse(local), Date.parse(isoSeconds(ut)), `${zone} ${isoSeconds(ut)}: ${local}`);
      if (clock.offsetSeconds(ut) % 60 !== 0) withSeconds++;
      // The clock time written is the zone's own to within the 30 s the offset is rounded by.
      const writtenWallMs = Date.parse(`${local.slice(0, 19)}Z`);
      const trueWallMs = intlWallMs(zone, new Date(Date.parse(isoSeconds(ut))));
      assert.ok(Math.abs(writtenWallMs - trueWallMs) <= 30_000, `${zone} ${isoSeconds(ut)}: ${local} vs ${new Date(trueWallMs).toISOString()}`);
    }
  }
  assert.ok(withSeconds > 100, 'local mean time, with seconds in its offset, was exercised');
});

test('before standard time Intl gives local mean time with seconds (−00:01:15 in London, +00:53:28 in Berlin), and local rounds it to the minute (Intl; RFC 3339 §5.6)', () => {
  const ut = utDaysFromDate(new Date('1100-03-01T21:00:00Z'));
  assert.equal(civilClock('Europe/London').offset(ut), '-00:01:15');
  assert.equal(civilClock('Europe/London').rfc3339(ut), '1100-03-01T20:59:00-00:01');
  assert.equal(civilClock('Europe/Berlin').offset(ut), '+00:53:28');
  assert.equal(civilClock('Europe/Berlin').rfc3339(ut), '1100-03-01T21:53:00+00:53');
});

test('printed times are the zone\'s wall clock rounded to the minute, also with local mean time\'s seconds (Intl, field by field)', () => {
  for (const zone of ZONES) {
    const clock = civilClock(zone);
    for (const ut of instants(true)) {
      const wall = new Date(Math.round(intlWallMs(zone, new Date(Date.parse(isoSeconds(ut)))) / 60_000) * 60_000);
      assert.equal(clock.time(ut), wall.toISOString().slice(11, 16), `${zone} ${isoSeconds(ut)}`);
      assert.equal(clock.isoDate(ut), wall.toISOString().slice(0, 10), `${zone} ${isoSeconds(ut)}`);
    }
  }
});

test('odd offsets keep their minutes: Chatham +12:45/+13:45, Kathmandu +05:45, Eucla +08:45, Lord Howe\'s 30-minute daylight time (Intl)', () => {
  const january = utDaysFromDate(new Date('2026-01-15T12:00:00Z'));
  const july = utDaysFromDate(new Date('2026-07-15T12:00:00Z'));
  const cases: [string, number, string, string][] = [
    ['Pacific/Chatham', january, '2026-01-16T01:45:00+13:45', '01:45'],
    ['Pacific/Chatham', july, '2026-07-16T00:45:00+12:45', '00:45'],
    ['Asia/Kathmandu', july, '2026-07-15T17:45:00+05:45', '17:45'],
    ['Australia/Eucla', july, '2026-07-15T20:45:00+08:45', '20:45'],
    ['Australia/Lord_Howe', january, '2026-01-15T23:00:00+11:00', '23:00'],
    ['Australia/Lord_Howe', july, '2026-07-15T22:30:00+10:30', '22:30'],
  ];
  for (const [zone, ut, rfc, time] of cases) {
    const clock = civilClock(zone);
    assert.equal(clock.rfc3339(ut), rfc, zone);
    assert.equal(clock.time(ut), time, zone);
    assert.equal(Date.parse(rfc), Date.parse(isoSeconds(ut)));
  }
});

test('local --format json for an eclipse of the year 1100 in Berlin: every local value RFC 3339 and equal to utc as an instant; the calendar is stated (RFC 3339 §5.6)', () => {
  const [eclipse] = findLunarEclipses({ from: new Date('1100-01-01T00:00:00Z'), to: new Date('1100-12-31T00:00:00Z') });
  assert.ok(eclipse);
  const doc = JSON.parse(localJson(localReport(eclipse, { place: { name: 'Berlin', latDeg: 52.52, lonDeg: 13.41, tz: 'Europe/Berlin' }, clock: civilClock('Europe/Berlin') })));
  assert.equal(doc.calendar, 'proleptic Gregorian');
  for (const e of doc.events) {
    assert.match(e.local, RFC3339);
    assert.match(e.local, /\+00:53$/);
    assert.equal(Date.parse(e.local), Date.parse(e.utc));
  }
});
