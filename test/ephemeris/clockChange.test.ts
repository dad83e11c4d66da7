/**
 * A clock change inside an eclipse: every printed time is true, with the zone
 * in force at its own instant beside it. The eclipses are found by computation
 * (the catalogue scanned against Intl's offsets); what we print is checked
 * against each zone's law text, computed here:
 * - New Zealand Daylight Time Order 2007: daylight time from 2:00 NZST on the last Sunday of September
 *   to 3:00 NZDT on the first Sunday of April.
 * - South Australia, Daylight Saving Act 1971 as amended (in force since 2008): from 2:00 ACST on the
 *   first Sunday of October to 3:00 ACDT on the first Sunday of April — a zone half an hour off the hour.
 * - Lord Howe Island (New South Wales, Standard Time Act 1987; from memory): half an hour of daylight
 *   time, from 2:00 LHST on the first Sunday of October to 2:00 LHDT on the first Sunday of April.
 * - EU Directive 2000/84/EC, arts. 2–3: summer time from 01:00 UTC on the last Sunday of March to
 *   01:00 UTC on the last Sunday of October (Germany: CET + 1 h).
 * Abbreviations NZST/NZDT, ACST/ACDT, LHST/LHDT, CET/CEST: common practice.
 */
import assert from 'node:assert/strict';
import { test } from 'node:test';
import { findLunarEclipses } from '../../src/eclipses/lunar/catalogue.ts';
import { CONTACT_ORDER } from '../../src/eclipses/lunar/contacts.ts';
import type { LunarEclipse } from '../../src/eclipses/lunar/types.ts';
import { civilClock } from '../../src/ephemeris/civilTime.ts';
import { dateFromDays, utDaysFromDate } from '../../src/ephemeris/time.ts';
import { sceneTexts } from '../../src/figures/map.ts';
import { localHourTicks } from '../../src/figures/sky.ts';
import { THEMES } from '../../src/figures/theme.ts';
import { eclipseCaption } from '../../src/outputs/caption.ts';
import { localReport, localTable } from '../../src/outputs/localFormats.ts';
import { markLabel } from '../../src/outputs/mapFile.ts';
import { renderSkyFile } from '../../src/outputs/skyFile.ts';
import { findPlace } from '../../src/places/gazetteer.ts';
import { visibilityOf } from '../../src/visibility/lunar/visibility.ts';

const HOUR_MS = 3_600_000;
const sundays = (year: number, month: number) => {
  const days: number[] = [];
  for (let d = 1; d <= 31; d++) {
    const date = new Date(Date.UTC(year, month, d));
    if (date.getUTCMonth() === month && date.getUTCDay() === 0) days.push(d);
  }
  return days;
};
const lastSunday = (year: number, month: number) => sundays(year, month).at(-1)!;
const firstSunday = (year: number, month: number) => sundays(year, month)[0]!;

interface Rule {
  readonly zone: string;
  /** A gazetteer name, or a point for a place too small for the gazetteer. */
  readonly place: string | { name: string; latDeg: number; lonDeg: number };
  readonly standard: { minutes: number; name: string };
  readonly daylight: { minutes: number; name: string };
  /** Daylight time in force at this UTC instant, by the law text. */
  readonly isDaylight: (ms: number) => boolean;
}

const RULES: Rule[] = [
  {
    zone: 'Pacific/Auckland',
    place: 'Auckland',
    standard: { minutes: 12 * 60, name: 'NZST' },
    daylight: { minutes: 13 * 60, name: 'NZDT' },
    isDaylight: (ms) => {
      const y = new Date(ms).getUTCFullYear();
      const ends = Date.UTC(y, 3, firstSunday(y, 3), 3) - 13 * HOUR_MS;
      const starts = Date.UTC(y, 8, lastSunday(y, 8), 2) - 12 * HOUR_MS;
      return ms < ends || ms >= starts;
    },
  },
  {
    zone: 'Australia/Adelaide',
    place: 'Adelaide',
    standard: { minutes: 9 * 60 + 30, name: 'ACST' },
    daylight: { minutes: 10 * 60 + 30, name: 'ACDT' },
    isDaylight: (ms) => {
      const y = new Date(ms).getUTCFullYear();
      const ends = Date.UTC(y, 3, firstSunday(y, 3), 3) - 10.5 * HOUR_MS;
      const starts = Date.UTC(y, 9, firstSunday(y, 9), 2) - 9.5 * HOUR_MS;
      return ms < ends || ms >= starts;
    },
  },
  {
    zone: 'Australia/Lord_Howe',
    place: { name: 'Lord Howe Island', latDeg: -31.55, lonDeg: 159.08 },
    standard: { minutes: 10 * 60 + 30, name: 'LHST' },
    daylight: { minutes: 11 * 60, name: 'LHDT' },
    isDaylight: (ms) => {
      const y = new Date(ms).getUTCFullYear();
      const ends = Date.UTC(y, 3, firstSunday(y, 3), 2) - 11 * HOUR_MS;
      const starts = Date.UTC(y, 9, firstSunday(y, 9), 2) - 10.5 * HOUR_MS;
      return ms < ends || ms >= starts;
    },
  },
  {
    zone: 'Europe/Berlin',
    place: 'Berlin',
    standard: { minutes: 60, name: 'CET' },
    daylight: { minutes: 120, name: 'CEST' },
    isDaylight: (ms) => {
      const y = new Date(ms).getUTCFullYear();
      return ms >= Date.UTC(y, 2, lastSunday(y, 2), 1) && ms < Date.UTC(y, 9, lastSunday(y, 9), 1);
    },
  },
];

/** The law's local time of an instant, rounded to the minute, with its zone: "23:15 NZDT". */
function lawStamp(rule: Rule, utDays: number, useDaylight = rule.isDaylight(dateFromDays(utDays).getTime())): string {
  const { minutes, name } = useDaylight ? rule.daylight : rule.standard;
  const local = new Date(Math.round((dateFromDays(utDays).getTime() + minutes * 60_000) / 60_000) * 60_000);
  return `${local.toISOString().slice(11, 16)} ${name}`;
}

const MARGIN_DAYS = 1 / 24;
const eclipses = findLunarEclipses({ from: new Date('2008-01-01T00:00:00Z'), to: new Date('2061-01-01T00:00:00Z') });
const intlOffset = (zone: string, utDays: number) =>
  new Intl.DateTimeFormat('en-US', { timeZone: zone, timeZoneName: 'longOffset' }).formatToParts(dateFromDays(utDays)).find((p) => p.type === 'timeZoneName')!.value;
/** Eclipses whose figure span (P1 − 1 h to P4 + 1 h) holds a clock change, by Intl. */
const changing = (zone: string) => eclipses.filter((e) => intlOffset(zone, e.contacts.P1!.utDays - MARGIN_DAYS) !== intlOffset(zone, e.contacts.P4!.utDays + MARGIN_DAYS));

/** Every "HH:MM ZONE" and "HH:MM–HH:MM ZONE" printed in a text, as (time, zone) pairs. */
function printedStamps(text: string): string[] {
  const stamps: string[] = [];
  // A day mark ("+1 day") may stand between a time and its zone; a range's dash may be spaced.
  for (const m of text.matchAll(/(\d\d:\d\d)(?: [+−]\d+ days?)?(?: ([A-Z]{3,4}))?(?:–| – )(\d\d:\d\d)(?: [+−]\d+ days?)? ([A-Z]{3,4})|(\d\d:\d\d)(?: [+−]\d+ days?)? ([A-Z]{3,4})\b/g)) {
    if (m[5]) stamps.push(`${m[5]} ${m[6]}`);
    else stamps.push(`${m[1]} ${m[2] ?? m[4]}`, `${m[3]} ${m[4]}`);
  }
  return stamps;
}

/** Bare clock times, not followed by a zone and not opening a range that ends in one (offsets, "UTC+13:00", are not times). */
function bareTimes(text: string): string[] {
  const mark = '(?: [+−]\\d+ days?)?';
  const pattern = new RegExp(`(?<!UTC[+−-])\\d\\d:\\d\\d(?!${mark} [A-Z]{3,4}\\b)(?!${mark}(?:–| – )\\d\\d:\\d\\d${mark} [A-Z]{3,4}\\b)(?!${mark} [A-Z]{3,4}(?:–| – ))`, 'g');
  return [...text.matchAll(pattern)].map((m) => m[0]);
}

test('the catalogue 2008–2060 holds clock changes inside eclipses for Auckland, Adelaide (a half-hour zone), Lord Howe (a half-hour change) and Berlin — among them New Zealand\'s of 2015-04-04 and a European one in 2050 (Intl)', () => {
  assert.ok(changing('Pacific/Auckland').some((e) => e.id === '2015-04-04'));
  assert.ok(changing('Australia/Adelaide').length > 0);
  assert.ok(changing('Australia/Lord_Howe').length > 0);
  assert.ok(changing('Europe/Berlin').some((e) => e.id.startsWith('2050-')));
});

for (const rule of RULES) {
  test(`${rule.zone}: every time printed for an eclipse with a clock change is the law's time with the law's zone (table, summary, caption, map texts, mark, sky figure)`, async () => {
    const place = typeof rule.place === 'string' ? findPlace(rule.place) : rule.place;
    const clock = civilClock(rule.zone);
    const found = changing(rule.zone);
    assert.ok(found.length > 0);
    for (const eclipse of found) {
      const report = localReport(eclipse, { place: { name: place.name, latDeg: place.latDeg, lonDeg: place.lonDeg, tz: rule.zone }, clock });
      const instants = [...report.local.events.map((e) => e.moment.utDays), ...CONTACT_ORDER.flatMap((n) => (eclipse.contacts[n] ? [eclipse.contacts[n]!.utDays] : []))];
      const change = clock.offsetChanges(eclipse.contacts.P1!.utDays - MARGIN_DAYS, eclipse.contacts.P4!.utDays + MARGIN_DAYS);
      assert.equal(change.length, 1, eclipse.id);
      const changeMs = dateFromDays(change[0]!.utDays).getTime();
      // The change happens where the law puts it.
      assert.notEqual(rule.isDaylight(changeMs - 1000), rule.isDaylight(changeMs), `${eclipse.id}: change at ${new Date(changeMs).toISOString()}`);
      // True statements: each instant by the law; the change instant on either clock ("until 03:00 NZDT").
      const truths = new Set([...instants.map((u) => lawStamp(rule, u)), lawStamp(rule, change[0]!.utDays, true), lawStamp(rule, change[0]!.utDays, false)]);

      // The table: each row's local time is the law's, zone and all.
      const table = localTable(report);
      for (const e of report.local.events) assert.ok(table.includes(` ${lawStamp(rule, e.moment.utDays)} `), `${eclipse.id} ${e.event}: ${lawStamp(rule, e.moment.utDays)}\n${table}`);
      // The header names both zones when the change falls between the first and last rows, else the one in force.
      const rows = report.local.events;
      const inTable = change[0]!.utDays > rows[0]!.moment.utDays && change[0]!.utDays <= rows[rows.length - 1]!.moment.utDays;
      const zoneNames = `(${rule.daylight.name}|${rule.standard.name})`;
      assert.match(table, inTable ? new RegExp(`Local \\(${zoneNames}, UTC\\+\\d\\d:\\d\\d → ${zoneNames}, UTC`) : new RegExp(`Local \\(${lawStamp(rule, rows[0]!.moment.utDays).slice(6)}, UTC\\+\\d\\d:\\d\\d\\)`), eclipse.id);

      const caption = eclipseCaption(eclipse, visibilityOf(eclipse), clock).caption;
      assert.ok(caption.includes(`Greatest eclipse at ${lawStamp(rule, eclipse.greatest.utDays)}`), caption);
      const texts = sceneTexts(eclipse, clock, '0 s', 'test');
      const mark = markLabel(eclipse, { name: place.name, latDeg: place.latDeg, lonDeg: place.lonDeg, tz: rule.zone });
      const sky = await renderSkyFile({ report, theme: THEMES.light, size: { widthPx: 800, heightPx: 450 }, dpi: 72, format: 'svg', generator: 'test' });
      const changeInEclipse = change[0]!.utDays > eclipse.contacts.P1!.utDays && change[0]!.utDays <= eclipse.contacts.P4!.utDays;
      for (const [what, text] of [['summary', report.summary], ['caption', caption], ['subtitle', texts.subtitle], ['small print', texts.smallPrint], ['mark', mark], ['sky figure', sky.description]] as const) {
        const stamps = printedStamps(text);
        // The small print names the change only when it falls inside the eclipse; every other text prints times.
        if (what !== 'small print' || changeInEclipse) assert.ok(stamps.length > 0, `${eclipse.id} ${what}: ${text}`);
        for (const stamp of stamps) assert.ok(truths.has(stamp), `${eclipse.id} ${what}: "${stamp}" is not the law's time of any event in\n${text}`);
        // The map's subtitle names the zone once (at greatest) when no change falls between P1 and P4.
        if (what !== 'subtitle' || changeInEclipse) assert.deepEqual(bareTimes(text), [], `${eclipse.id} ${what}: a time without its zone in\n${text}`);
      }
      // A range across the change names both zones.
      assert.equal(clock.range(eclipse.contacts.P1!.utDays - MARGIN_DAYS, eclipse.contacts.P4!.utDays + MARGIN_DAYS),
        `${lawStamp(rule, eclipse.contacts.P1!.utDays - MARGIN_DAYS)}–${lawStamp(rule, eclipse.contacts.P4!.utDays + MARGIN_DAYS)}`);

      // The sky figure's axis: a tick at every whole hour of the law's clock, each labelled in its own zone.
      const from = eclipse.contacts.P1!.utDays - MARGIN_DAYS;
      const to = eclipse.contacts.P4!.utDays + MARGIN_DAYS;
      const expected: string[] = [];
      for (let ms = Math.ceil(dateFromDays(from).getTime() / 60_000) * 60_000; ms <= dateFromDays(to).getTime(); ms += 60_000) {
        const stamp = lawStamp(rule, utDaysFromDate(new Date(ms)));
        if (stamp.slice(3, 5) === '00') expected.push(`${new Date(ms).toISOString().slice(11, 16)}Z ${stamp}`);
      }
      const ticks = localHourTicks(clock, from, to).map((u) => `${dateFromDays(u).toISOString().slice(11, 16)}Z ${clock.time(u)} ${clock.abbreviation(u)}`);
      assert.deepEqual(ticks, expected, eclipse.id);
    }
  });
}

test('the New Zealand eclipse of 2015-04-04: clocks go back at 03:00 NZDT (14:00 UTC), between U4 and P4 (NZ Daylight Time Order 2007)', () => {
  const [eclipse] = findLunarEclipses({ from: new Date('2015-04-04T00:00:00Z'), to: new Date('2015-04-05T00:00:00Z') }) as [LunarEclipse];
  const clock = civilClock('Pacific/Auckland');
  const [change] = clock.offsetChanges(eclipse.contacts.P1!.utDays, eclipse.contacts.P4!.utDays);
  assert.equal(dateFromDays(change!.utDays).toISOString(), '2015-04-04T14:00:00.000Z');
  assert.equal(clock.zoneDescriptionBetween(eclipse.contacts.P1!.utDays, eclipse.contacts.P4!.utDays),
    'Pacific/Auckland (NZDT, UTC+13:00 until 03:00 NZDT, then NZST, UTC+12:00)');
  assert.equal(clock.range(eclipse.contacts.U1!.utDays, eclipse.contacts.P4!.utDays), `${clock.time(eclipse.contacts.U1!.utDays)} NZDT–${clock.time(eclipse.contacts.P4!.utDays)} NZST`);
  assert.match(clock.range(eclipse.contacts.U2!.utDays, eclipse.contacts.U3!.utDays), /^\d\d:\d\d–\d\d:\d\d NZDT$/);
});

test('clocks going forward: the skipped hour has no tick, a range across it names both zones (EU Directive 2000/84/EC: 01:00 UTC, last Sunday of March)', () => {
  const berlin = RULES.find((r) => r.zone === 'Europe/Berlin')!;
  const clock = civilClock('Europe/Berlin');
  const changeMs = Date.UTC(2026, 2, lastSunday(2026, 2), 1);
  const from = utDaysFromDate(new Date(changeMs - 2.5 * HOUR_MS));
  const to = utDaysFromDate(new Date(changeMs + 3.5 * HOUR_MS));
  const [change] = clock.offsetChanges(from, to);
  assert.equal(dateFromDays(change!.utDays).getTime(), changeMs);
  assert.equal(clock.range(from, to), `${lawStamp(berlin, from)}–${lawStamp(berlin, to)}`);
  assert.equal(clock.range(from, to), '23:30 CET–06:30 CEST');
  assert.equal(clock.zoneDescriptionBetween(from, to), 'Europe/Berlin (CET, UTC+01:00 until 02:00 CET, then CEST, UTC+02:00)');
  const ticks = localHourTicks(clock, from, to).map((u) => clock.stamp(u));
  assert.deepEqual(ticks, ['00:00 CET', '01:00 CET', '03:00 CEST', '04:00 CEST', '05:00 CEST', '06:00 CEST']);
  for (const u of localHourTicks(clock, from, to)) assert.equal(clock.stamp(u), lawStamp(berlin, u));
});
