/**
 * The solar local formats: JSON (umbracast.local/1, body solar), table,
 * markdown, CSV (RFC 4180) and iCalendar (RFC 5545). Times at a place against
 * astronomy-engine's SearchLocalSolarEclipse; local times as RFC 3339 in the
 * place's zone (IANA, through Intl); the eye-safety caution in every format,
 * in its long form and the scope the place calls for; the lunar naked-eye
 * line in none.
 */
import assert from 'node:assert/strict';
import { after, before, test } from 'node:test';
import ICAL from 'ical.js';
import { DeltaT_EspenakMeeus, MakeTime, Observer as EngineObserver, SearchLocalSolarEclipse, SetDeltaTFunction } from 'astronomy-engine';
import { civilClock } from '../../src/ephemeris/civilTime.ts';
import { standardDeltaTModel } from '../../src/ephemeris/deltaT.ts';
import { decimalYearFromDays } from '../../src/ephemeris/time.ts';
import type { PlaceLabel } from '../../src/outputs/localFormats.ts';
import {
  minutesAndSeconds,
  solarLocalCsv,
  solarLocalIcs,
  solarLocalJson,
  solarLocalMarkdown,
  solarLocalReport,
  solarLocalTable,
  type SolarLocalReport,
} from '../../src/outputs/solarLocal.ts';
import { solarSafetyText } from '../../src/words/solar/caution.ts';
import { solarEclipseOn } from '../eclipses/solarSupport.ts';

const DAY_SECONDS = 86_400;

before(() => {
  // Test code only: astronomy-engine's global ΔT set to our model, so that its times are comparable to ours.
  const model = standardDeltaTModel();
  SetDeltaTFunction((ut: number) => model.at(decimalYearFromDays(ut)).seconds);
});
after(() => SetDeltaTFunction(DeltaT_EspenakMeeus));

interface Case {
  readonly eclipse: string;
  readonly place: PlaceLabel;
  /** What the place sees, from astronomy-engine's kind and the Sun's altitude it gives. */
  readonly sees: 'total' | 'annular' | 'partial' | 'none';
}

const CASES: Case[] = [
  // The Kestrel Ridge club's outing for the 2024 eclipse: a field in central Texas, well inside the path.
  { eclipse: '2024-04-08', place: { name: 'Kestrel Ridge field site', latDeg: 31.1, lonDeg: -97.7, tz: 'America/Chicago' }, sees: 'total' },
  { eclipse: '2024-04-08', place: { name: 'Torreón', latDeg: 25.54, lonDeg: -103.41, tz: 'America/Monterrey' }, sees: 'total' },
  { eclipse: '2023-10-14', place: { name: 'Albuquerque', latDeg: 35.08, lonDeg: -106.65, tz: 'America/Denver' }, sees: 'annular' },
  { eclipse: '2023-04-20', place: { name: 'Exmouth', latDeg: -21.93, lonDeg: 114.13, tz: 'Australia/Perth' }, sees: 'total' },
  // Half-hour zone, outside the path.
  { eclipse: '2023-04-20', place: { name: 'Darwin', latDeg: -12.46, lonDeg: 130.84, tz: 'Australia/Darwin' }, sees: 'partial' },
  { eclipse: '2022-10-25', place: { name: 'Helsinki', latDeg: 60.17, lonDeg: 24.94, tz: 'Europe/Helsinki' }, sees: 'partial' },
  // The eclipse ends after sunset here: a sunset event inside it, the ICS cut to the Sun-up part.
  { eclipse: '2024-04-08', place: { name: 'Ponta Delgada', latDeg: 37.74, lonDeg: -25.67, tz: 'Atlantic/Azores' }, sees: 'partial' },
  // The shadow misses entirely.
  { eclipse: '2024-04-08', place: { name: 'Hobart', latDeg: -42.88, lonDeg: 147.33, tz: 'Australia/Hobart' }, sees: 'none' },
  // The Sun rises eclipsed here: C1 before sunrise.
  { eclipse: '2023-10-14', place: { name: 'Honolulu', latDeg: 21.31, lonDeg: -157.86, tz: 'Pacific/Honolulu' }, sees: 'partial' },
  // East of 180° yet west of the date line: the local date is the day after the eclipse's UTC date.
  { eclipse: '2012-11-13', place: { name: "Nuku'alofa", latDeg: -21.14, lonDeg: -175.2, tz: 'Pacific/Tongatapu' }, sees: 'partial' },
  // Near the South Pole's latitude, inside a short polar totality with a low Sun.
  { eclipse: '2021-12-04', place: { name: 'Union Glacier', latDeg: -79.77, lonDeg: -82.86, tz: 'America/Punta_Arenas' }, sees: 'total' },
];

const reports = new Map<Case, SolarLocalReport>();
function reportOf(c: Case): SolarLocalReport {
  let r = reports.get(c);
  if (!r) {
    r = solarLocalReport(solarEclipseOn(c.eclipse), { place: c.place, clock: civilClock(c.place.tz) });
    reports.set(c, r);
  }
  return r;
}

/** A minimal RFC 4180 reader: quoted fields, doubled quotes, CRLF or LF records. */
function readCsv(text: string): string[][] {
  const records: string[][] = [];
  let field = '';
  let record: string[] = [];
  let quoted = false;
  for (let i = 0; i < text.length; i++) {
    const ch = text[i]!;
    if (quoted) {
      if (ch === '"' && text[i + 1] === '"') {
        field += '"';
        i++;
      } else if (ch === '"') quoted = false;
      else field += ch;
    } else if (ch === '"') quoted = true;
    else if (ch === ',') {
      record.push(field);
      field = '';
    } else if (ch === '\n' || ch === '\r') {
      if (ch === '\r' && text[i + 1] === '\n') i++;
      record.push(field);
      records.push(record);
      record = [];
      field = '';
    } else field += ch;
  }
  if (field !== '' || record.length > 0) records.push([...record, field]);
  return records;
}

test('what each place sees, and C1, C2, maximum, C3, C4 in the JSON, against astronomy-engine SearchLocalSolarEclipse (its Moon radius 1737.4 km against our k1/k2: contacts within 6 s, maximum within 2 s)', () => {
  for (const c of CASES) {
    const report = reportOf(c);
    const json = JSON.parse(solarLocalJson(report));
    assert.equal(json.schema, 'umbracast.local/1');
    assert.equal(json.body, 'solar');
    assert.equal(json.kind, c.sees, `${c.place.name}: kind`);
    if (c.sees === 'none') {
      assert.deepEqual(json.events, []);
      assert.equal(json.magnitude, 0);
      continue;
    }
    const engine = SearchLocalSolarEclipse(MakeTime(new Date(Date.parse(`${c.eclipse}T00:00:00Z`) - 2 * DAY_SECONDS * 1000)), new EngineObserver(c.place.latDeg, c.place.lonDeg, 0));
    assert.equal(engine.kind, c.sees, `${c.place.name}: astronomy-engine's kind`);
    assert.ok(Math.abs(Date.parse(json.events.find((e: { event: string }) => e.event === 'maximum').utc) - engine.peak.time.date.getTime()) < 2000, `${c.place.name}: maximum`);
    const pairs: [string, Date | undefined, number][] = [
      ['C1', engine.partial_begin.time.date, 6],
      ['C2', engine.total_begin?.time.date, 6],
      ['C3', engine.total_end?.time.date, 6],
      ['C4', engine.partial_end.time.date, 6],
    ];
    for (const [name, date, seconds] of pairs) {
      const ours = json.events.find((e: { event: string }) => e.event === name);
      assert.equal(ours !== undefined, date !== undefined, `${c.place.name}: ${name} present in both or neither`);
      if (ours && date) assert.ok(Math.abs(Date.parse(ours.utc) - date.getTime()) <= seconds * 1000, `${c.place.name}: ${name} ${ours.utc} against ${date.toISOString()}`);
    }
    // Obscuration at maximum within 0.002 of astronomy-engine's (the check).
    assert.ok(Math.abs(json.obscuration - engine.obscuration) < 0.002, `${c.place.name}: obscuration ${json.obscuration} against ${engine.obscuration}`);
  }
});

test('local times are RFC 3339 (§5.6) in the place\'s IANA zone and denote the same instant as utc; half-hour zones keep their half hour', () => {
  for (const c of CASES) {
    const json = JSON.parse(solarLocalJson(reportOf(c)));
    for (const e of json.events) {
      assert.match(e.local, /^\d{4}-\d\d-\d\dT\d\d:\d\d:\d\d[+-]\d\d:\d\d$/);
      assert.equal(Date.parse(e.local), Date.parse(e.utc), `${c.place.name} ${e.event}`);
      // The offset is the one Intl gives for the zone at that instant (IANA tz database).
      const offset = new Intl.DateTimeFormat('en-US', { timeZone: c.place.tz, timeZoneName: 'longOffset' })
        .formatToParts(new Date(e.utc)).find((p) => p.type === 'timeZoneName')!.value.replace('GMT', '') || '+00:00';
      assert.equal(e.local.slice(19), offset, `${c.place.name} ${e.event}`);
    }
  }
  const darwin = JSON.parse(solarLocalJson(reportOf(CASES[4]!)));
  assert.ok(darwin.events.every((e: { local: string }) => e.local.endsWith('+09:30')), 'Australia/Darwin is UTC+09:30 (IANA tz database)');
  const tonga = JSON.parse(solarLocalJson(reportOf(CASES[9]!)));
  assert.ok(tonga.events.every((e: { local: string }) => e.local.startsWith('2012-11-14T') && e.local.endsWith('+13:00')), 'Pacific/Tongatapu is UTC+13:00 (IANA tz database): the next day');
  assert.match(tonga.summary, /on 14 November 2012/);
});

test('a sunset inside the eclipse: an event with sunUp false after it, the calendar cut to the Sun-up part (astronomy-engine: the Sun below the horizon at C4)', () => {
  const c = CASES[6]!;
  const json = JSON.parse(solarLocalJson(reportOf(c)));
  const names = json.events.map((e: { event: string }) => e.event);
  assert.ok(names.includes('sunset'), names.join(' '));
  const engine = SearchLocalSolarEclipse(MakeTime(new Date(Date.parse(`${c.eclipse}T00:00:00Z`) - 2 * DAY_SECONDS * 1000)), new EngineObserver(c.place.latDeg, c.place.lonDeg, 0));
  assert.ok(engine.partial_end.altitude < 0, 'astronomy-engine: the Sun is down at C4');
  const c4 = json.events.find((e: { event: string }) => e.event === 'C4');
  assert.equal(c4.sunUp, false);
  const sunset = json.events.find((e: { event: string }) => e.event === 'sunset');
  const calendar = ICAL.Component.fromString(solarLocalIcs(reportOf(c), 'test'));
  const [partial] = calendar.getAllSubcomponents('vevent');
  assert.equal(partial!.getFirstPropertyValue('dtend')!.toString().slice(0, 19), sunset.utc.slice(0, 19));
  assert.match(String(partial!.getFirstPropertyValue('summary')), /\(Sun up\)/);
});

test('a sunrise inside the eclipse: C1 with the Sun down, the calendar starting at sunrise (astronomy-engine: the Sun below the horizon at C1)', () => {
  const c = CASES[8]!;
  const json = JSON.parse(solarLocalJson(reportOf(c)));
  const engine = SearchLocalSolarEclipse(MakeTime(new Date(Date.parse(`${c.eclipse}T00:00:00Z`) - 2 * DAY_SECONDS * 1000)), new EngineObserver(c.place.latDeg, c.place.lonDeg, 0));
  assert.ok(engine.partial_begin.altitude < 0 && engine.partial_end.altitude > 0, 'astronomy-engine: the Sun rises during the eclipse');
  assert.equal(json.events[0].event, 'C1');
  assert.equal(json.events[0].sunUp, false);
  const sunrise = json.events.find((e: { event: string }) => e.event === 'sunrise');
  assert.ok(sunrise && sunrise.sunUp === true);
  const [partial] = ICAL.Component.fromString(solarLocalIcs(reportOf(c), 'test')).getAllSubcomponents('vevent');
  assert.equal(partial!.getFirstPropertyValue('dtstart')!.toString().slice(0, 19), sunrise.utc.slice(0, 19));
  assert.match(json.summary, /rises already eclipsed/);
});

test('table, markdown, CSV and JSON agree on the events, to the second (common practice: C2/C3 to the second)', () => {
  const report = reportOf(CASES[0]!);
  const json = JSON.parse(solarLocalJson(report));
  const table = solarLocalTable(report);
  const markdown = solarLocalMarkdown(report);
  const csv = readCsv(solarLocalCsv(report));
  assert.deepEqual(csv[0], ['event', 'utc', 'local', 'sunAltitude', 'sunAzimuth', 'sunUp', 'calendar', 'note']);
  for (const e of json.events) {
    const hms = e.utc.slice(11, 19);
    assert.ok(table.includes(hms), `table: ${e.event} ${hms}`);
    assert.ok(markdown.includes(hms), `markdown: ${e.event} ${hms}`);
    assert.ok(table.includes(e.local.slice(11, 19)), `table: local ${e.event}`);
    assert.ok(csv.some((r) => r[0] === e.event && r[1] === e.utc && r[2] === e.local), `csv: ${e.event}`);
  }
  assert.match(json.summary, new RegExp(`totally eclipsed for ${minutesAndSeconds(json.centralSeconds)}`));
  assert.equal(minutesAndSeconds(268), '4 min 28 s');
  assert.equal(minutesAndSeconds(52.4), '52 s');
});

test('every local format carries the caution, long form, scoped to the place (totality seen or not); never the lunar naked-eye line (the issue\'s eye-safety section; RFC 4180, RFC 5545 §3.1 and §3.3.11)', async () => {
  // The lunar line as the lunar side prints it: the pattern below must find it there, or the test proves nothing.
  const { localIcs, localReport } = await import('../../src/outputs/localFormats.ts');
  const { findLunarEclipses } = await import('../../src/eclipses/lunar/catalogue.ts');
  const [lunar] = findLunarEclipses({ from: new Date('2025-03-13T00:00:00Z'), to: new Date('2025-03-15T00:00:00Z') });
  const lunarIcs = localIcs(localReport(lunar!, { place: CASES[0]!.place, clock: civilClock('America/Chicago') }), 'test');
  const LUNAR_LINE = /naked[- ]eye|safe to watch/i;
  assert.match(lunarIcs.replace(/\r\n /g, ''), LUNAR_LINE);

  for (const c of CASES) {
    const report = reportOf(c);
    const scope = c.sees === 'total' ? 'totality' : 'no-totality';
    const caution = solarSafetyText('long', scope);
    assert.equal(report.safety, caution, c.place.name);

    const json = solarLocalJson(report);
    assert.equal(JSON.parse(json).safety, caution, `${c.place.name}: JSON safety`);

    const table = solarLocalTable(report);
    assert.equal(table.split('\n')[0], `EYE SAFETY: ${caution}`, `${c.place.name}: table first line`);

    const markdown = solarLocalMarkdown(report);
    assert.equal(markdown.split('\n')[0], `> **Eye safety:** ${caution}`, `${c.place.name}: markdown first line`);

    const csvText = solarLocalCsv(report);
    const csv = readCsv(csvText);
    assert.deepEqual(csv[1], ['safety', '', '', '', '', '', '', caution], `${c.place.name}: CSV safety row`);
    assert.ok(csv.every((r) => r.length === csv[0]!.length), 'RFC 4180: every record has the same number of fields');

    const icsText = solarLocalIcs(report, 'test');
    for (const line of icsText.split('\r\n')) assert.ok(Buffer.byteLength(line) <= 75, `RFC 5545 §3.1: ${line}`);
    const vevents = ICAL.Component.fromString(icsText).getAllSubcomponents('vevent');
    assert.ok(vevents.length >= 1);
    for (const v of vevents) assert.ok(String(v.getFirstPropertyValue('description')).endsWith(`EYE SAFETY: ${caution}`), `${c.place.name}: ICS description`);

    for (const [format, text] of [['json', json], ['table', table], ['markdown', markdown], ['csv', csvText], ['ics', icsText.replace(/\r\n /g, '')]]) {
      assert.doesNotMatch(text!, LUNAR_LINE, `${c.place.name}: ${format}`);
      if (scope === 'no-totality') {
        assert.match(text!, /at no time is it safe to look without a filter/, `${c.place.name}: ${format}: the outside-the-path sentence`);
        assert.doesNotMatch(text!, /may viewers come off/, `${c.place.name}: ${format}: no permission to take viewers off`);
      }
    }
  }
});

test('same inputs, same bytes', () => {
  const c = CASES[2]!;
  const again = solarLocalReport(solarEclipseOn(c.eclipse), { place: c.place, clock: civilClock(c.place.tz) });
  const first = reportOf(c);
  for (const render of [solarLocalJson, solarLocalTable, solarLocalMarkdown, solarLocalCsv, (r: SolarLocalReport) => solarLocalIcs(r, 'x')]) {
    assert.equal(render(again), render(first));
  }
});

test('the Sun below the horizon at maximum: "seen here" gives the most covered while the Sun is up, not the maximum\'s figures (astronomy-engine: the Sun\'s altitude at peak)', () => {
  // Palermo, 2026-08-12: the Sun sets eclipsed, well before the (central) maximum there.
  const place: PlaceLabel = { name: 'Palermo', latDeg: 38.12, lonDeg: 13.36, tz: 'Europe/Rome' };
  const eclipse = solarEclipseOn('2026-08-12');
  const engine = SearchLocalSolarEclipse(MakeTime(new Date('2026-08-12T00:00:00Z')), new EngineObserver(place.latDeg, place.lonDeg, 0));
  assert.ok(engine.peak.altitude < -3, `astronomy-engine puts the Sun at ${engine.peak.altitude}° at peak`);
  const report = solarLocalReport(eclipse, { place, clock: civilClock(place.tz) });
  assert.equal(report.local.kind, 'partial');
  assert.ok(report.local.obscuration > 0.99 && report.local.obscurationSeen < 0.6, `${report.local.obscuration} / ${report.local.obscurationSeen}`);
  const seen = solarLocalTable(report).split('\n').find((line) => line.startsWith('Seen here'))!;
  assert.equal(seen, `Seen here: partial, at most ${Math.round(report.local.obscurationSeen * 100)} % of the Sun's disc covered while the Sun is up (the maximum comes with the Sun below the horizon).`);
  // The summary names the altitude without a sign before "below".
  assert.match(report.summary, /with the Sun \d+° below the horizon/);
});
