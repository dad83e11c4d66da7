import assert from 'node:assert/strict';
import { spawnSync } from 'node:child_process';
import { test } from 'node:test';
import { main } from '../../src/cli/main.ts';

async function run(args: string[], today = new Date('2026-12-01T10:00:00Z')) {
  let stdout = '';
  let stderr = '';
  const code = await main(args, { stdout: (t) => (stdout += t), stderr: (t) => (stderr += t), now: () => today });
  return { code, stdout, stderr };
}

const badInputs: [string, string[], RegExp][] = [
  ['a malformed date', ['list', '--from', '2026-13-01'], /^umbracast: --from: expected a date as YYYY, YYYY-MM or YYYY-MM-DD .* received "2026-13-01"$/],
  ['an impossible day', ['list', '--to', '2026-02-30'], /^umbracast: --to: expected a date .* received "2026-02-30"$/],
  ['--from after --to', ['list', '--from', '2030', '--to', '2029'], /^umbracast: --to: expected a date after --from \(2030-01-01\), received "2029"$/],
  ['a year out of range', ['list', '--from', '0999'], /^umbracast: --from: expected .* year in 1000–3000, received "0999"$/],
  ['a year past the range', ['list', '--to', '3001'], /^umbracast: --to: expected .* year in 1000–3000, received "3001"$/],
  ['a solar kind for the lunar body', ['list', '--body', 'lunar', '--kind', 'total,annular'], /^umbracast: --kind: expected a comma-separated list of the kinds of lunar eclipses: penumbral, partial, total, received "total,annular"$/],
  ['a lunar kind for the solar body', ['list', '--body', 'solar', '--kind', 'penumbral'], /^umbracast: --kind: expected a comma-separated list of the kinds of solar eclipses: total, annular, hybrid, partial, received "penumbral"$/],
  ['a kind of neither body', ['list', '--kind', 'umbral'], /^umbracast: --kind: expected a comma-separated list of the kinds of lunar or solar eclipses: penumbral, partial, total, annular, hybrid, received "umbral"$/],
  ['an unknown body', ['list', '--body', 'sun'], /^umbracast: --body: expected one of lunar, solar, all, received "sun"$/],
  ['an unknown format', ['list', '--format', 'xml'], /^umbracast: --format: expected one of table, json, csv, received "xml"$/],
  ['a non-numeric ΔT', ['list', '--delta-t', '69s'], /^umbracast: --delta-t: expected a number of seconds from -86400 to 86400, received "69s"$/],
  ['an unknown convention', ['list', '--convention', 'plain'], /^umbracast: --convention: expected one of danjon, chauvenet, received "plain"$/],
  ['an unknown option', ['list', '--colour'], /^umbracast: unknown option '--colour'$/],
  ['an unknown command', ['lsit'], /^umbracast: unknown command 'lsit'/],
];

for (const [label, args, pattern] of badInputs) {
  test(`bad input: ${label} → exit 2, one line on stderr, nothing on stdout`, async () => {
    const { code, stdout, stderr } = await run(args);
    assert.equal(code, 2);
    assert.equal(stdout, '');
    assert.equal(stderr.split('\n').length, 2, `one line: ${JSON.stringify(stderr)}`);
    assert.match(stderr.trimEnd(), pattern);
  });
}

test('a bare year range covers whole years: --from 2026 --to 2035 is 2026-01-01 to 2035-12-31', async () => {
  const { code, stdout } = await run(['list', '--from', '2026', '--to', '2035', '--format', 'json', '--body', 'lunar']);
  assert.equal(code, 0);
  const doc = JSON.parse(stdout);
  assert.deepEqual(doc.range, { from: '2026-01-01T00:00:00Z', to: '2036-01-01T00:00:00Z' });
  assert.equal(doc.eclipses[0].id, '2026-03-03');
  assert.ok(doc.eclipses.at(-1).id.startsWith('2035-'));
});

test('a full date in --to is exclusive: --to 2025-03-14 leaves out the eclipse of that day; 2025-03-15 keeps it', async () => {
  const without = JSON.parse((await run(['list', '--from', '2025-01-01', '--to', '2025-03-14', '--format', 'json', '--body', 'lunar'])).stdout);
  const withIt = JSON.parse((await run(['list', '--from', '2025-01-01', '--to', '2025-03-15', '--format', 'json', '--body', 'lunar'])).stdout);
  assert.equal(without.eclipses.length, 0);
  assert.deepEqual(withIt.eclipses.map((e: { id: string }) => e.id), ['2025-03-14']);
});

test('the default range is today (UTC) for ten years', async () => {
  const doc = JSON.parse((await run(['list', '--format', 'json'], new Date('2026-12-01T23:30:00Z'))).stdout);
  assert.deepEqual(doc.range, { from: '2026-12-01T00:00:00Z', to: '2036-12-01T00:00:00Z' });
});

test('json follows umbracast.catalogue/2: seconds kept, absent contacts and durations left out, every record with its body', async () => {
  const doc = JSON.parse((await run(['list', '--from', '2026', '--to', '2027', '--format', 'json', '--body', 'lunar'])).stdout);
  assert.equal(doc.schema, 'umbracast.catalogue/2');
  assert.ok(doc.eclipses.every((e: { body: string }) => e.body === 'lunar'));
  assert.equal(doc.safety, undefined, 'no solar eclipse, no solar caution');
  assert.equal(doc.convention, 'danjon');
  const total = doc.eclipses.find((e: { id: string }) => e.id === '2026-03-03');
  assert.deepEqual(Object.keys(total.contacts), ['P1', 'U1', 'U2', 'U3', 'U4', 'P4']);
  assert.match(total.greatest, /^2026-03-03T11:33:\d\dZ$/);
  assert.match(total.greatestTT, /^2026-03-03T11:3\d:\d\dZ$/);
  assert.equal(typeof total.deltaT, 'number');
  assert.deepEqual(Object.keys(total.durations), ['penumbral', 'partial', 'total']);
  assert.equal(total.subLunar.greatest.length, 2);
  const partial = doc.eclipses.find((e: { id: string }) => e.id === '2026-08-28');
  assert.deepEqual(Object.keys(partial.contacts), ['P1', 'U1', 'U4', 'P4']);
  assert.equal(partial.durations.total, undefined);
  const penumbral = doc.eclipses.find((e: { kind: string }) => e.kind === 'penumbral');
  assert.deepEqual(Object.keys(penumbral.contacts), ['P1', 'P4']);
  assert.deepEqual(Object.keys(penumbral.durations), ['penumbral']);
});

test('--kind filters, --convention and --delta-t show in the output', async () => {
  const doc = JSON.parse((await run(['list', '--from', '2026', '--to', '2030', '--body', 'lunar', '--kind', 'total', '--convention', 'chauvenet', '--delta-t', '70', '--format', 'json'])).stdout);
  assert.ok(doc.eclipses.length > 0);
  assert.ok(doc.eclipses.every((e: { kind: string; deltaT: number; deltaTSource: string }) => e.kind === 'total' && e.deltaT === 70 && e.deltaTSource === 'user'));
  assert.equal(doc.convention, 'chauvenet');
});

test('csv keeps seconds and has one row per eclipse under a header', async () => {
  const { stdout } = await run(['list', '--from', '2025', '--to', '2025', '--format', 'csv', '--body', 'lunar']);
  const lines = stdout.trimEnd().split('\n');
  assert.equal(lines[0]!.split(',').slice(0, 5).join(','), 'body,id,kind,greatest,greatestTT');
  assert.equal(lines.length, 3);
  assert.match(lines[1]!, /^lunar,2025-03-14,total,2025-03-14T06:58:\d\dZ,/);
});

test('the table is for people: minutes, UTC labelled, convention and ΔT stated', async () => {
  const { stdout } = await run(['list', '--from', '2025', '--to', '2025', '--body', 'lunar']);
  assert.match(stdout, /Greatest \(UTC\)/);
  assert.match(stdout, /2025-03-14 06:59 /);
  assert.doesNotMatch(stdout, /06:58:\d\d/);
  assert.match(stdout, /Danjon/);
  assert.match(stdout, /ΔT 69\.1 s/);
});

test('same inputs, same bytes (determinism)', async () => {
  const a = await run(['list', '--from', '2040', '--to', '2042', '--format', 'json']);
  const b = await run(['list', '--from', '2040', '--to', '2042', '--format', 'json']);
  assert.equal(a.stdout, b.stdout);
});

test('the installed command: npx umbracast --version and --help exit 0; a usage error exits 2 with no stack trace', () => {
  const cwd = new URL('../..', import.meta.url);
  const version = spawnSync('npx', ['--no-install', 'umbracast', '--version'], { cwd, encoding: 'utf8' });
  assert.equal(version.status, 0);
  assert.match(version.stdout, /^\d+\.\d+\.\d+\n$/);
  const help = spawnSync('npx', ['--no-install', 'umbracast', 'list', '--help'], { cwd, encoding: 'utf8' });
  assert.equal(help.status, 0);
  assert.match(help.stdout, /--convention <name>/);
  const bad = spawnSync('npx', ['--no-install', 'umbracast', 'list', '--from', 'soon'], { cwd, encoding: 'utf8' });
  assert.equal(bad.status, 2);
  assert.equal(bad.stdout, '');
  assert.equal(bad.stderr.trimEnd().split('\n').length, 1);
});

test('the table\'s heading agrees in number: "1 lunar eclipse", "2 lunar eclipses", "0 lunar eclipses" (English agreement, common practice; counts from astronomy-engine\'s SearchLunarEclipse)', async () => {
  const { SearchLunarEclipse, NextLunarEclipse } = await import('astronomy-engine');
  const countIn = (from: string, to: string) => {
    let n = 0;
    for (let e = SearchLunarEclipse(new Date(from)); e.peak.date < new Date(to); e = NextLunarEclipse(e.peak)) n++;
    return n;
  };
  for (const [from, to, words] of [['2027-02-01', '2027-03-01', '1 lunar eclipse from'], ['2026-01', '2026-09', '2 lunar eclipses from'], ['2026-04-01', '2026-05-01', '0 lunar eclipses from']] as const) {
    const toDate = to.length === 7 ? `${to}-01` : to;
    assert.equal(Number(words[0]), countIn(`${from.length === 7 ? `${from}-01` : from}T00:00:00Z`, to.length === 7 ? new Date(Date.UTC(Number(to.slice(0, 4)), Number(to.slice(5)), 1)).toISOString() : `${toDate}T00:00:00Z`), `premise for ${from}`);
    const { code, stdout } = await run(['list', '--from', from, '--to', to, '--body', 'lunar']);
    assert.equal(code, 0);
    assert.ok(stdout.startsWith(words), stdout.split('\n')[0]);
  }
});
