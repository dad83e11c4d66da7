/**
 * Solar eclipses behind `list` and `local`, every format: the eye-safety caution (ISO 12312-2; its text from
 * src/words/solar/caution.ts) is in every solar output and the lunar naked-eye line in none; --body and --kind;
 * a date near both kinds; ids. Eclipses are checked against astronomy-engine's own searches
 * (SearchGlobalSolarEclipse, SearchLunarEclipse: an independent library) and a few values from memory.
 */
import assert from 'node:assert/strict';
import { test } from 'node:test';
import { NextGlobalSolarEclipse, SearchGlobalSolarEclipse, SearchLunarEclipse, NextLunarEclipse } from 'astronomy-engine';
import { main } from '../../src/cli/main.ts';
import { solarSafetyText } from '../../src/words/solar/caution.ts';
import { LUNAR_ENGLISH } from '../../src/words/lunar/text.ts';

async function run(args: string[], today = new Date('2026-01-10T00:00:00Z')) {
  let stdout = '';
  let stderr = '';
  const code = await main(args, { stdout: (t) => (stdout += t), stderr: (t) => (stderr += t), now: () => today });
  return { code, stdout, stderr };
}

const ISO_FILTER = /ISO 12312-2/;
const NAKED_EYE = /naked eye|naked-eye/i;
const noNakedEye = (text: string, what: string) => {
  assert.doesNotMatch(text, NAKED_EYE, `${what}: the lunar naked-eye line`);
  assert.ok(!text.includes(LUNAR_ENGLISH.nakedEyeInCalendar), what);
};
const day = (date: Date) => date.toISOString().slice(0, 10);

test('list, all bodies: both kinds in time order, as astronomy-engine\'s searches find them in 2024–2025', async () => {
  const { code, stdout } = await run(['list', '--from', '2024', '--to', '2025', '--format', 'json']);
  assert.equal(code, 0);
  const doc = JSON.parse(stdout);
  const expected: { id: string; body: string; at: number }[] = [];
  const end = new Date('2026-01-01T00:00:00Z');
  for (let e = SearchGlobalSolarEclipse(new Date('2024-01-01T00:00:00Z')); e.peak.date < end; e = NextGlobalSolarEclipse(e.peak)) expected.push({ id: day(e.peak.date), body: 'solar', at: e.peak.date.getTime() });
  for (let e = SearchLunarEclipse(new Date('2024-01-01T00:00:00Z')); e.peak.date < end; e = NextLunarEclipse(e.peak)) expected.push({ id: day(e.peak.date), body: 'lunar', at: e.peak.date.getTime() });
  expected.sort((a, b) => a.at - b.at);
  assert.deepEqual(doc.eclipses.map((e: { id: string; body: string }) => `${e.body} ${e.id}`), expected.map((e) => `${e.body} ${e.id}`));
});

test('catalogue/2 solar record: the fields of issue 15, checked against astronomy-engine and values from memory (2024-04-08)', async () => {
  const doc = JSON.parse((await run(['list', '--from', '2024-04-01', '--to', '2024-04-30', '--format', 'json'])).stdout);
  assert.equal(doc.schema, 'umbracast.catalogue/2');
  const [e] = doc.eclipses;
  assert.equal(doc.eclipses.length, 1);
  assert.deepEqual(Object.keys(e), ['body', 'id', 'kind', 'central', 'greatest', 'greatestTT', 'deltaT', 'deltaTSource', 'gamma', 'magnitude', 'saros', 'greatestPoint', 'sunAltitude', 'pathWidthKm', 'contacts', 'durations', 'moonRadius']);
  const ae = SearchGlobalSolarEclipse(new Date('2024-04-01T00:00:00Z'));
  assert.equal(e.kind, ae.kind); // astronomy-engine: total
  assert.ok(Math.abs(Date.parse(e.greatest) - ae.peak.date.getTime()) < 60_000, 'greatest within a minute of astronomy-engine');
  assert.ok(Math.abs(e.greatestPoint[1] - ae.latitude!) < 0.2 && Math.abs(e.greatestPoint[0] - ae.longitude!) < 0.2, 'greatest point near astronomy-engine\'s');
  // From memory: greatest about 18:17 UT near 25.3°N 104.1°W, about 4 min 28 s and about 198 km wide; saros 139.
  assert.match(e.greatest, /^2024-04-08T18:1[78]:/);
  assert.ok(Math.abs(e.durations.central - 268) <= 3, `central ${e.durations.central} s`);
  assert.ok(Math.abs(e.pathWidthKm - 198) <= 3, `width ${e.pathWidthKm} km`);
  assert.equal(e.saros, 139);
  assert.deepEqual(e.moonRadius, { penumbra: 0.2725076, umbra: 0.272281 }); // common practice: k1, k2
  assert.deepEqual(Object.keys(e.contacts), ['P1', 'U1', 'U2', 'U3', 'U4', 'P4']);
  // The caution: the document's `safety`, the long form for a total eclipse (viewers off in totality only).
  assert.equal(doc.safety, solarSafetyText('long', 'whole-eclipse'));
  assert.match(doc.safety, ISO_FILTER);
  noNakedEye(JSON.stringify(doc), 'list json');
});

test('list, every format: the caution wherever a solar eclipse is listed (table: first line; csv: on each solar row), never the naked-eye line', async () => {
  const table = (await run(['list', '--from', '2026', '--to', '2026'])).stdout;
  assert.equal(table.split('\n')[0], solarSafetyText('short', 'whole-eclipse')); // 2026-08-12 is total (astronomy-engine agrees below)
  assert.equal(SearchGlobalSolarEclipse(new Date('2026-08-01T00:00:00Z')).kind, 'total');
  assert.match(table, /2026-08-12  Sun +total/);
  assert.match(table, /k1 = 0\.2725076 .* k2 = 0\.272281/);
  noNakedEye(table, 'list table');
  const csv = (await run(['list', '--from', '2026', '--to', '2026', '--format', 'csv'])).stdout;
  const lines = csv.trimEnd().split('\n');
  assert.equal(lines[0]!.split(',')[0], 'body');
  const solarRows = lines.filter((l) => l.startsWith('solar,'));
  const lunarRows = lines.filter((l) => l.startsWith('lunar,'));
  assert.equal(solarRows.length, 2); // 2026-02-17 annular, 2026-08-12 total
  assert.ok(solarRows.every((row) => ISO_FILTER.test(row)));
  assert.ok(lunarRows.length === 2 && lunarRows.every((row) => !ISO_FILTER.test(row)), 'a caution meant for the Sun stays off lunar rows');
  noNakedEye(csv, 'list csv');
  // An annular and a partial eclipse only: nowhere is it safe to look without a filter.
  const annular = (await run(['list', '--from', '2026-02', '--to', '2026-02', '--body', 'solar'])).stdout;
  assert.equal(annular.split('\n')[0], solarSafetyText('short', 'no-totality'));
  assert.match(annular, /at no time is it safe to look without a filter/);
});

test('list --body lunar: no solar record and no solar caution; --body solar: no lunar record', async () => {
  for (const format of ['table', 'json', 'csv']) {
    const { stdout } = await run(['list', '--from', '2026', '--to', '2026', '--body', 'lunar', '--format', format]);
    assert.doesNotMatch(stdout, ISO_FILTER, `lunar ${format}`);
    assert.doesNotMatch(stdout, /solar|annular/, `lunar ${format}`);
  }
  const solar = JSON.parse((await run(['list', '--from', '2026', '--to', '2026', '--body', 'solar', '--format', 'json'])).stdout);
  assert.deepEqual(solar.eclipses.map((e: { id: string }) => e.id), ['2026-02-17', '2026-08-12']);
  const table = (await run(['list', '--from', '2026', '--to', '2026', '--body', 'solar'])).stdout;
  assert.match(table, /^2 solar eclipses from 2026-01-01/m);
  assert.doesNotMatch(table, /Moon {2}/);
});

test('--kind against the body: annular with all keeps the annular solar eclipses only', async () => {
  const doc = JSON.parse((await run(['list', '--from', '2024', '--to', '2028', '--kind', 'annular', '--format', 'json'])).stdout);
  // From memory: annular eclipses of 2024-10-02, 2026-02-17, 2027-02-06, 2028-01-26.
  assert.deepEqual(doc.eclipses.map((e: { id: string }) => e.id), ['2024-10-02', '2026-02-17', '2027-02-06', '2028-01-26']);
  const total = JSON.parse((await run(['list', '--from', '2026', '--to', '2026', '--kind', 'total', '--format', 'json'])).stdout);
  assert.deepEqual(total.eclipses.map((e: { id: string; body: string }) => `${e.body} ${e.id}`), ['lunar 2026-03-03', 'solar 2026-08-12']);
});

const inPath = ['local', '2024-04-08', '--place', 'Dallas'];
const outsidePath = ['local', '2024-04-08', '--place', 'Denver'];

test('local, solar, every format: the caution first in table and markdown, a row in csv, `safety` in json, in every ICS description; never the naked-eye line', async () => {
  for (const [args, scope] of [[inPath, 'totality'], [outsidePath, 'no-totality']] as const) {
    const caution = solarSafetyText('long', scope);
    const table = (await run([...args, '--format', 'table'])).stdout;
    assert.ok(table.split('\n')[0]!.includes(caution), `table, ${scope}`);
    const markdown = (await run([...args, '--format', 'markdown'])).stdout;
    assert.ok(markdown.split('\n')[0]!.includes(caution), `markdown, ${scope}`);
    const csv = (await run([...args, '--format', 'csv'])).stdout;
    assert.ok(csv.split('\n')[1]!.startsWith('safety,') && csv.includes(caution), `csv, ${scope}`);
    const json = JSON.parse((await run([...args, '--format', 'json'])).stdout);
    assert.equal(json.body, 'solar');
    assert.equal(json.safety, caution);
    const ics = (await run([...args, '--format', 'ics'])).stdout.replace(/\r?\n /g, '');
    const descriptions = ics.split(/\r?\n/).filter((l) => l.startsWith('DESCRIPTION:'));
    assert.ok(descriptions.length > 0);
    // RFC 5545 §3.3.11: commas and semicolons escaped in TEXT.
    assert.ok(descriptions.every((d) => d.includes(caution.replace(/,/g, '\\,').replace(/;/g, '\\;'))), `ics, ${scope}`);
    for (const [name, text] of [['table', table], ['markdown', markdown], ['csv', csv], ['json', JSON.stringify(json)], ['ics', ics]] as const) noNakedEye(text, `local ${name} ${scope}`);
  }
  // Outside the path (Denver sees a partial eclipse): "at no time is it safe to look without a filter".
  assert.match((await run([...outsidePath, '--format', 'json'])).stdout, /at no time is it safe to look without a filter/);
  assert.equal(JSON.parse((await run([...inPath, '--format', 'json'])).stdout).kind, 'total'); // from memory: Dallas saw totality
});

test('ids resolve to their own eclipse; a date near both kinds names both unless --body is given', async () => {
  // 2025-09-07 (lunar) and 2025-09-21 (solar): astronomy-engine's searches.
  assert.equal(day(SearchLunarEclipse(new Date('2025-09-01T00:00:00Z')).peak.date), '2025-09-07');
  assert.equal(day(SearchGlobalSolarEclipse(new Date('2025-09-01T00:00:00Z')).peak.date), '2025-09-21');
  assert.equal(JSON.parse((await run(['local', '2025-09-21', '--at', '-45,170', '--format', 'json'])).stdout).body, 'solar');
  const lunar = JSON.parse((await run(['local', '2025-09-07', '--at', '-45,170', '--format', 'json'])).stdout);
  assert.equal(lunar.eclipse, '2025-09-07');
  assert.equal(lunar.convention, 'danjon'); // a lunar report (umbracast.local/1 lunar: a shadow convention, no body field)
  const ambiguous = await run(['local', '2025-09-14', '--at', '-45,170']);
  assert.equal(ambiguous.code, 2);
  assert.equal(ambiguous.stdout, '');
  assert.equal(ambiguous.stderr.split('\n').length, 2);
  assert.match(ambiguous.stderr, /^umbracast: --body: expected lunar or solar: 2025-09-14 is near the lunar eclipse of 2025-09-07 and the solar eclipse of 2025-09-21/);
  assert.equal(JSON.parse((await run(['local', '2025-09-14', '--at', '-45,170', '--body', 'solar', '--format', 'json'])).stdout).eclipse, '2025-09-21');
  assert.equal(JSON.parse((await run(['local', '2025-09-14', '--at', '-45,170', '--body', 'lunar', '--format', 'json'])).stdout).eclipse, '2025-09-07');
  // "next" takes the body too: from 2026-01-10 the next solar eclipse is astronomy-engine's next one.
  const nextSolar = day(SearchGlobalSolarEclipse(new Date('2026-01-10T00:00:00Z')).peak.date);
  assert.equal(JSON.parse((await run(['local', 'next', '--at', '-45,170', '--body', 'solar', '--format', 'json'])).stdout).eclipse, nextSolar);
});

test('bad --body and a date with no eclipse of that body: one line on stderr, exit 2', async () => {
  for (const [args, pattern] of [
    [['local', '2024-04-08', '--place', 'Dallas', '--body', 'moon'], /^umbracast: --body: expected one of lunar, solar, all, received "moon"$/],
    [['local', '2024-04-08', '--place', 'Dallas', '--body', 'lunar'], /^umbracast: WHEN: expected .*received "2024-04-08"$/],
    [['list', '--body', 'solar', '--kind', 'total,penumbral'], /^umbracast: --kind: expected .*solar eclipses: total, annular, hybrid, partial, received "total,penumbral"$/],
    // The batch reads --body and --kind as every command does, before anything is written.
    [['batch', '--from', '2026', '--to', '2026', '--body', 'sun', '--out', '/nonexistent-parent/out'], /^umbracast: --out: /],
    [['batch', '--from', '2026', '--to', '2026', '--body', 'lunar', '--kind', 'hybrid'], /^umbracast: --kind: expected .*lunar eclipses: penumbral, partial, total, received "hybrid"$/],
  ] as const) {
    const { code, stdout, stderr } = await run([...args]);
    assert.equal(code, 2, args.join(' '));
    assert.equal(stdout, '');
    assert.equal(stderr.split('\n').length, 2);
    assert.match(stderr.trimEnd(), pattern);
  }
});

test('same inputs, same bytes (determinism): solar list and local', async () => {
  for (const args of [['list', '--from', '2024', '--to', '2024', '--format', 'csv'], [...inPath, '--format', 'ics']]) {
    assert.equal((await run(args)).stdout, (await run(args)).stdout);
  }
});
