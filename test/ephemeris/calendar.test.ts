/**
 * Julian and Gregorian calendar dates from the Julian Day (Meeus, Astronomical
 * Algorithms, 2nd ed., ch. 7): Meeus's worked examples, and astronomia's own
 * implementation of the same chapter as an independent computation; then the
 * Julian date beside every human-readable date before 1582 October 15, and
 * the calendar named in every data output.
 */
import assert from 'node:assert/strict';
import { test } from 'node:test';
import julian from 'astronomia/julian';
import { contactSheet } from '../../src/batch/contactSheet.ts';
import { MANIFEST_SCHEMA } from '../../src/batch/manifest.ts';
import { findLunarEclipses } from '../../src/eclipses/lunar/catalogue.ts';
import type { LunarEclipse } from '../../src/eclipses/lunar/types.ts';
import { calendarFromJulianDay, GREGORIAN_REFORM_JD, julianDateBeforeReform, julianDateOfIsoDate, julianDayFromCalendar } from '../../src/ephemeris/calendar.ts';
import { civilClock } from '../../src/ephemeris/civilTime.ts';
import { sceneTexts } from '../../src/figures/map.ts';
import { THEMES } from '../../src/figures/theme.ts';
import { eclipseCaption } from '../../src/outputs/caption.ts';
import { catalogueCsv, catalogueJson, catalogueTable } from '../../src/outputs/catalogueFormats.ts';
import { catalogueDocument, eclipseRecord } from '../../src/outputs/catalogueRecord.ts';
import { visibilityGeoJson } from '../../src/outputs/geojson.ts';
import { localCsv, localJson, localMarkdown, localReport, localTable } from '../../src/outputs/localFormats.ts';
import { renderSkyFile } from '../../src/outputs/skyFile.ts';
import { visibilityOf } from '../../src/visibility/lunar/visibility.ts';

const near = (a: number, b: number, tolerance = 1e-6) => Math.abs(a - b) <= tolerance;
const sameDate = (got: { year: number; month: number; day: number }, want: { year: number; month: number; day: number }, what: string) => {
  assert.equal(got.year, want.year, what);
  assert.equal(got.month, want.month, what);
  assert.ok(near(got.day, want.day), `${what}: day ${got.day} vs ${want.day}`);
};

test('Meeus ch. 7 worked examples: 1957 Oct 4.81 = JD 2436116.31 (Ex. 7.a), 333 Jan 27.5 Julian = JD 1842713.0 (Ex. 7.b), JD 1507900.13 = −584 May 28.63 (Ex. 7.c)', () => {
  assert.ok(near(julianDayFromCalendar({ year: 1957, month: 10, day: 4.81 }, 'gregorian'), 2436116.31));
  assert.ok(near(julianDayFromCalendar({ year: 333, month: 1, day: 27.5 }, 'julian'), 1842713.0));
  sameDate(calendarFromJulianDay(2436116.31, 'gregorian'), { year: 1957, month: 10, day: 4.81 }, '7.c 1957');
  sameDate(calendarFromJulianDay(1842713.0, 'julian'), { year: 333, month: 1, day: 27.5 }, '333');
  sameDate(calendarFromJulianDay(1507900.13, 'julian'), { year: -584, month: 5, day: 28.63 }, '−584');
  // 837 April 10.3 (Julian) = JD 2026871.8 (Meeus ch. 7; from memory, checked by astronomia below).
  assert.ok(near(julianDayFromCalendar({ year: 837, month: 4, day: 10.3 }, 'julian'), 2026871.8));
  assert.ok(near(julian.CalendarJulianToJD(837, 4, 10.3), 2026871.8));
  sameDate(calendarFromJulianDay(2026871.8, 'julian'), { year: 837, month: 4, day: 10.3 }, '837');
});

test('the reform: JD 2299160.5 is 1582 October 15 Gregorian and October 5 Julian; the day before the reform is 4 October Julian (Meeus ch. 7; astronomia)', () => {
  sameDate(calendarFromJulianDay(GREGORIAN_REFORM_JD, 'gregorian'), { year: 1582, month: 10, day: 15 }, 'Gregorian');
  sameDate(calendarFromJulianDay(GREGORIAN_REFORM_JD, 'julian'), { year: 1582, month: 10, day: 5 }, 'Julian');
  assert.equal(julianDateBeforeReform({ year: 1582, month: 10, day: 14 }), '4 October 1582');
  assert.equal(julianDateBeforeReform({ year: 1582, month: 10, day: 15 }), undefined);
  // Seven days apart after the Julian 29 February 1100, five at the start of 1000 (both as astronomia computes them).
  assert.equal(julianDateOfIsoDate('1100-03-01'), '23 February 1100');
  assert.equal(julianDateOfIsoDate('1100-03-01'), astronomiaJulian('1100-03-01'));
  assert.equal(julianDateOfIsoDate('1000-01-01'), '27 December 999');
  assert.equal(julianDateOfIsoDate('1000-01-01'), astronomiaJulian('1000-01-01'));
});

test('every day from year 1000 to 3000, both ways and in both calendars, agrees with astronomia (julian.cjs) and with ECMA-262\'s proleptic Gregorian Date', () => {
  const from = julian.CalendarGregorianToJD(1000, 1, 1);
  const to = julian.CalendarGregorianToJD(3000, 12, 31);
  let checked = 0;
  for (let jd = from; jd <= to; jd += 7.25) {
    for (const calendar of ['julian', 'gregorian'] as const) {
      const ours = calendarFromJulianDay(jd, calendar);
      const theirs = calendar === 'julian' ? julian.JDToCalendarJulian(jd) : julian.JDToCalendarGregorian(jd);
      sameDate(ours, theirs, `JD ${jd} ${calendar}`);
      assert.ok(near(julianDayFromCalendar(ours, calendar), jd), `JD ${jd} ${calendar} round trip`);
    }
    const date = new Date((jd - 2440587.5) * 86_400_000);
    const gregorian = calendarFromJulianDay(jd, 'gregorian');
    assert.deepEqual([gregorian.year, gregorian.month, Math.floor(gregorian.day)], [date.getUTCFullYear(), date.getUTCMonth() + 1, date.getUTCDate()]);
    checked++;
  }
  assert.ok(checked > 100_000);
});

const [old] = findLunarEclipses({ from: new Date('1100-01-01T00:00:00Z'), to: new Date('1101-01-01T00:00:00Z') }) as [LunarEclipse];
const [modern] = findLunarEclipses({ from: new Date('2025-03-01T00:00:00Z'), to: new Date('2025-04-01T00:00:00Z') }) as [LunarEclipse];

/** The Julian date of a proleptic Gregorian day, by astronomia: "23 February 1100". */
function astronomiaJulian(iso: string): string {
  const [y, m, d] = iso.split('-').map(Number) as [number, number, number];
  const c = julian.JDToCalendarJulian(julian.CalendarGregorianToJD(y, m, d + 0.5));
  const months = ['January', 'February', 'March', 'April', 'May', 'June', 'July', 'August', 'September', 'October', 'November', 'December'];
  return `${Math.floor(c.day)} ${months[c.month - 1]} ${c.year}`;
}

async function humanOutputs(eclipse: LunarEclipse, zone: string): Promise<Record<string, string>> {
  const clock = civilClock(zone);
  const place = { name: 'Kestrel Ridge', latDeg: 52.52, lonDeg: 13.41, tz: zone };
  const report = localReport(eclipse, { place, clock });
  const doc = catalogueDocument([eclipse], { convention: 'danjon', deltaTModel: 'test', from: new Date(`${eclipse.id.slice(0, 4)}-01-01T00:00:00Z`), to: new Date(`${Number(eclipse.id.slice(0, 4)) + 1}-01-01T00:00:00Z`) });
  const sky = await renderSkyFile({ report, theme: THEMES.light, size: { widthPx: 800, heightPx: 450 }, dpi: 72, format: 'svg', generator: 'test' });
  const manifest = {
    schema: MANIFEST_SCHEMA, tool: 'test', styleHash: 'x', style: {}, range: doc.range, shard: null,
    eclipses: [{ id: eclipse.id, kind: eclipse.kind, key: 'k', record: eclipseRecord(eclipse), files: [] }],
  } as Parameters<typeof contactSheet>[0];
  return {
    'list table': catalogueTable(doc),
    caption: eclipseCaption(eclipse, visibilityOf(eclipse), clock).caption,
    'map title': sceneTexts(eclipse, clock, '0 s', 'test').title,
    'local table': localTable(report),
    'local markdown': localMarkdown(report),
    'sky figure title': /<title id="sky-title">([^<]*)<\/title>/.exec(sky.svg)![1]!,
    'contact sheet': contactSheet(manifest, 'Night Notes'),
  };
}

test('before 1582 October 15 every human-readable output gives the Julian date beside the date, marked as such (Meeus ch. 7 via astronomia)', async () => {
  assert.ok(old.id < '1582-10-15');
  const utcJulian = astronomiaJulian(old.id);
  for (const zone of ['UTC', 'Europe/Berlin']) {
    const clock = civilClock(zone);
    const localJulian = astronomiaJulian(clock.isoDate(old.greatest.utDays));
    for (const [what, text] of Object.entries(await humanOutputs(old, zone))) {
      const expected = ['list table', 'contact sheet', 'local table', 'local markdown'].includes(what) ? utcJulian : localJulian;
      assert.ok(text.includes(`(Julian: ${expected})`), `${zone} ${what}: no "(Julian: ${expected})" in\n${text}`);
    }
  }
});

test('from 1582 October 15 on, no Julian date is printed', async () => {
  for (const [what, text] of Object.entries(await humanOutputs(modern, 'UTC'))) assert.ok(!text.includes('Julian'), what);
});

test('data outputs name their calendar: catalogue JSON and CSV, GeoJSON, local JSON and CSV ("proleptic Gregorian")', () => {
  const doc = catalogueDocument([old], { convention: 'danjon', deltaTModel: 'test', from: new Date('1100-01-01T00:00:00Z'), to: new Date('1101-01-01T00:00:00Z') });
  assert.equal(JSON.parse(catalogueJson(doc)).calendar, 'proleptic Gregorian');
  const csv = catalogueCsv(doc).trimEnd().split('\n');
  // catalogue/2: the calendar, then the (solar) caution, empty on a lunar row.
  assert.ok(csv[0]!.endsWith(',calendar,safety'));
  assert.ok(csv[1]!.endsWith(',proleptic Gregorian,'));
  assert.equal(visibilityGeoJson(visibilityOf(old)).umbracast.calendar, 'proleptic Gregorian');
  const report = localReport(old, { place: { name: 'Kestrel Ridge', latDeg: 52.52, lonDeg: 13.41, tz: 'UTC' }, clock: civilClock('UTC') });
  assert.equal(JSON.parse(localJson(report)).calendar, 'proleptic Gregorian');
  assert.ok(localCsv(report).split('\n')[1]!.endsWith(',proleptic Gregorian'));
});
