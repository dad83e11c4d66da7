import assert from 'node:assert/strict';
import { existsSync, mkdtempSync, readdirSync, readFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { test } from 'node:test';
import { XMLValidator } from 'fast-xml-parser';
import sharp from 'sharp';
import { main } from '../../src/cli/main.ts';

async function run(args: string[]) {
  let stdout = '';
  let stderr = '';
  const code = await main(args, { stdout: (t) => (stdout += t), stderr: (t) => (stderr += t), now: () => new Date('2026-01-10T00:00:00Z') });
  return { code, stdout, stderr };
}

const badInputs: [string, string[], RegExp][] = [
  ['an unknown place, with suggestions', ['local', '--place', 'Dakr'], /^umbracast: --place: expected a place name from the GeoNames gazetteer.*\(did you mean: Dakar, SN \(pop\. [\d,]+\);.*\?\), received "Dakr"$/],
  ['an ambiguous place, with its candidates', ['local', '--place', 'Springfield'], /^umbracast: --place: expected one place, but the name is ambiguous: add a country or region code \(Springfield, US-MO .*Springfield, US-IL .*\), received "Springfield"$/],
  ['a latitude out of range', ['local', '--at', '95,10'], /^umbracast: --at: expected LAT,LON in degrees, latitude −90…90, longitude −180…180 \(east positive\), received "95,10"$/],
  ['a longitude out of range', ['local', '--at', '10,200'], /^umbracast: --at: expected LAT,LON .* received "10,200"$/],
  ['a malformed point', ['local', '--at', 'north'], /^umbracast: --at: expected LAT,LON .* received "north"$/],
  ['an unknown time zone', ['local', '--place', 'Dakar', '--tz', 'Africa/Dakkar'], /^umbracast: --tz: expected an IANA time zone .* received "Africa\/Dakkar"$/],
  ['no place at all', ['local'], /^umbracast: --place: expected a place: --place NAME or --at LAT,LON, received nothing$/],
  ['both --place and --at', ['local', '--place', 'Dakar', '--at', '1,2'], /^umbracast: --at: expected either --place or --at, not both, received "1,2"$/],
  ['an unknown format', ['local', '--place', 'Dakar', '--format', 'pdf'], /^umbracast: --format: expected one of table, markdown, csv, ics, json, received "pdf"$/],
  ['sky without a place', ['sky'], /^umbracast: --place: expected a place/],
  ['a map mark that is no place', ['map', '--mark', 'Atlantis City'], /^umbracast: --mark: expected a place name/],
];

for (const [label, args, pattern] of badInputs) {
  test(`bad input: ${label} → exit 2, one line`, async () => {
    const { code, stdout, stderr } = await run(args);
    assert.equal(code, 2);
    assert.equal(stdout, '');
    assert.equal(stderr.split('\n').length, 2, JSON.stringify(stderr));
    assert.match(stderr.trimEnd(), pattern);
  });
}

test('an eclipse not seen from the place is not an error: it says so plainly and exits 0', async () => {
  const { code, stdout } = await run(['local', '2026-03-03', '--place', 'Cairo']);
  assert.equal(code, 0);
  assert.match(stdout, /From Cairo the eclipse cannot be seen: the Moon is below the horizon from start to finish\./);
});

test('local --format json follows umbracast.local/1', async () => {
  const { code, stdout } = await run(['local', '2026-03-03', '--place', 'Toronto', '--format', 'json']);
  assert.equal(code, 0);
  const doc = JSON.parse(stdout);
  assert.equal(doc.schema, 'umbracast.local/1');
  assert.equal(doc.eclipse, '2026-03-03');
  assert.deepEqual(Object.keys(doc.place), ['name', 'lat', 'lon', 'tz']);
  assert.equal(doc.place.tz, 'America/Toronto');
  assert.deepEqual(doc.events.map((e: { event: string }) => e.event), ['P1', 'U1', 'U2', 'greatest', 'moonset', 'U3', 'U4', 'P4']);
  const u1 = doc.events[1];
  assert.match(u1.utc, /^2026-03-03T09:50:\d\dZ$/);
  assert.match(u1.local, /^2026-03-03T04:50:\d\d-05:00$/);
  assert.equal(u1.moonUp, true);
  assert.ok(['day', 'civil', 'nautical', 'astronomical', 'night'].includes(u1.sky));
  assert.match(doc.summary, /Moon sets at 06:53/);
});

test('local table and markdown name the zone and the summary; csv has one row per event', async () => {
  const table = (await run(['local', '2025-03-14', '--place', 'Las Palmas de Gran Canaria'])).stdout;
  assert.match(table, /Local \(WET, UTC\+00:00\)/);
  assert.match(table, /Moonset/);
  const markdown = (await run(['local', '2025-03-14', '--place', 'Las Palmas de Gran Canaria', '--format', 'markdown'])).stdout;
  assert.match(markdown, /^### Total lunar eclipse 2025-03-14 from Las Palmas de Gran Canaria/);
  assert.match(markdown, /\| Event \| What happens \|/);
  const csv = (await run(['local', '2025-03-14', '--place', 'Las Palmas de Gran Canaria', '--format', 'csv'])).stdout.trimEnd().split('\n');
  assert.equal(csv[0], 'event,utc,local,moonAltitude,moonAzimuth,moonUp,sunAltitude,sky,calendar');
  assert.match(csv[1]!, /,proleptic Gregorian$/);
  assert.equal(csv.length, 1 + 8);
});

test('sky writes the view-from-here figure: PNG of the asked size, SVG that parses, same bytes twice', async () => {
  const dir = mkdtempSync(join(tmpdir(), 'umbracast-sky-'));
  const png = join(dir, 'sky.png');
  assert.equal((await run(['sky', '2025-03-14', '--place', 'Dakar', '--preset', 'card', '-o', png])).code, 0);
  const meta = await sharp(png).metadata();
  assert.deepEqual([meta.width, meta.height], [1200, 675]);
  const first = readFileSync(png);
  await run(['sky', '2025-03-14', '--place', 'Dakar', '--preset', 'card', '-o', png]);
  assert.ok(first.equals(readFileSync(png)));
  const svg = join(dir, 'sky.svg');
  assert.equal((await run(['sky', '2025-03-14', '--at', '28.10,-15.41', '--theme', 'print', '-o', svg])).code, 0);
  assert.equal(XMLValidator.validate(readFileSync(svg, 'utf8')), true);
  assert.deepEqual(readdirSync(dir).filter((f) => f.includes('partial')), []);
});

test('every map gets its caption beside it (.txt) and in its PNG metadata; marks carry local times', async () => {
  const dir = mkdtempSync(join(tmpdir(), 'umbracast-caption-'));
  const png = join(dir, 'map.png');
  const { code } = await run(['map', '2026-03-03', '--preset', 'card', '--mark', 'Denver', '--mark', 'Tokyo', '-o', png]);
  assert.equal(code, 0);
  assert.ok(existsSync(join(dir, 'map.txt')));
  const caption = readFileSync(join(dir, 'map.txt'), 'utf8');
  assert.match(caption, /^Total lunar eclipse of 3 March 2026\./);
  assert.match(caption, /\n\nAlt text: World map of where/);
  const xmp = (await sharp(png).metadata()).xmp!.toString('utf8');
  assert.match(xmp, /It cannot be seen from Africa and Europe/);
  const { markLabel } = await import('../../src/outputs/mapFile.ts');
  const { eclipseOn } = await import('../figures/support.ts');
  assert.equal(markLabel(eclipseOn('2026-03-03'), { name: 'Denver', latDeg: 39.739, lonDeg: -104.985, tz: 'America/Denver' }), 'Denver · greatest 04:34 MST');
  assert.equal(markLabel(eclipseOn('2026-03-03'), { name: 'Cairo', latDeg: 30.06, lonDeg: 31.25, tz: 'Africa/Cairo' }), 'Cairo · not seen');
});
