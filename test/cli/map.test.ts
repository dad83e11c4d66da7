import assert from 'node:assert/strict';
import { existsSync, mkdtempSync, readdirSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { test } from 'node:test';
import sharp from 'sharp';
import { main } from '../../src/cli/main.ts';

async function run(args: string[]) {
  let stdout = '';
  let stderr = '';
  const code = await main(args, { stdout: (t) => (stdout += t), stderr: (t) => (stderr += t), now: () => new Date('2026-01-10T00:00:00Z') });
  return { code, stdout, stderr };
}

const dir = mkdtempSync(join(tmpdir(), 'umbracast-map-'));
const target = join(dir, 'map.png');

const badInputs: [string, string[], RegExp][] = [
  ['an unknown projection', ['--projection', 'mercator'], /^umbracast: --projection: expected one of equal-earth, equirectangular, globe, region, received "mercator"$/],
  ['region without a box', ['--projection', 'region'], /^umbracast: --projection: expected region together with --bbox/],
  ['an unknown theme', ['--theme', 'neon'], /^umbracast: --theme: expected one of light, dark, print, received "neon"$/],
  ['an unknown preset', ['--preset', 'poster'], /^umbracast: --preset: expected one of card, square, print, received "poster"$/],
  ['a malformed size', ['--size', '1200by675'], /^umbracast: --size: expected WxH in pixels, each side 320–12000 and at most 64 megapixels in all, received "1200by675"$/],
  ['a size beyond the ceiling', ['--size', '12000x9000'], /^umbracast: --size: expected WxH .* at most 64 megapixels in all, received "12000x9000"$/],
  ['a print too large', ['--preset', 'print', '--width-mm', '1500', '--dpi', '600'], /^umbracast: --width-mm: expected WxH .* received "1500 mm at 600 dpi = 35433x21968 px"$/],
  ['a malformed bounding box', ['--bbox', '10,60,30'], /^umbracast: --bbox: expected W,S,E,N in degrees.*received "10,60,30"$/],
  ['a box with south above north', ['--bbox', '-10,60,30,35'], /^umbracast: --bbox: expected W,S,E,N .*received "-10,60,30,35"$/],
  ['an unknown time zone', ['--tz', 'Europe/Atlantis'], /^umbracast: --tz: expected an IANA time zone such as Australia\/Adelaide or America\/Chicago, or UTC, received "Europe\/Atlantis"$/],
  ['an unknown border style', ['--borders', 'rivers'], /^umbracast: --borders: expected one of countries, land, received "rivers"$/],
  ['an output folder that does not exist', ['-o', join(dir, 'missing', 'map.png')], /^umbracast: --output: expected a file path in an existing folder, received ".*missing\/map\.png"$/],
  ['an output extension we do not write', ['-o', join(dir, 'map.gif')], /^umbracast: --output: expected a file name ending in \.png, \.svg, \.webp, \.jpg or \.geojson, received/],
  ['a format that contradicts the file name', ['-o', target, '--format', 'svg'], /^umbracast: --format: expected png to match --output/],
];

for (const [label, args, pattern] of badInputs) {
  test(`map, bad input: ${label} → exit 2, one line, nothing written`, async () => {
    const before = readdirSync(dir).sort();
    const { code, stdout, stderr } = await run(['map', '2026-03-03', ...(args.includes('-o') ? [] : ['-o', target]), ...args]);
    assert.equal(code, 2);
    assert.equal(stdout, '');
    assert.equal(stderr.split('\n').length, 2, JSON.stringify(stderr));
    assert.match(stderr.trimEnd(), pattern);
    assert.deepEqual(readdirSync(dir).sort(), before, 'no file, partial or whole, is left');
  });
}

test('map, bad input: a WHEN with no eclipse near it names WHEN', async () => {
  const { code, stderr } = await run(['map', '2026-06-01', '-o', target]);
  assert.equal(code, 2);
  assert.match(stderr, /^umbracast: WHEN: expected 'next', an eclipse id such as 2026-03-03, or a date \(YYYY-MM-DD\) within 7 days of an eclipse, received "2026-06-01"\n$/);
  const malformed = await run(['map', 'tomorrow', '-o', target]);
  assert.equal(malformed.code, 2);
  assert.match(malformed.stderr, /^umbracast: WHEN: expected .* received "tomorrow"\n$/);
});

test('map writes the file it names on stdout; a date in the eclipse week finds it; print preset sets size and density', async () => {
  const { code, stdout } = await run(['map', '2026-03-05', '--preset', 'print', '--width-mm', '100', '--dpi', '150', '-o', target]);
  assert.equal(code, 0);
  assert.equal(stdout.trim(), target);
  const meta = await sharp(target).metadata();
  assert.deepEqual([meta.width, meta.height, meta.density], [591, 366, 150]);
  assert.deepEqual(readdirSync(dir).filter((f) => f.includes('partial')), []);
});

test('map --format geojson writes an RFC 7946 FeatureCollection', async () => {
  const path = join(dir, 'zones.geojson');
  const { code } = await run(['map', 'next', '--body', 'lunar', '-o', path]);
  assert.equal(code, 0);
  assert.ok(existsSync(path));
  const collection = JSON.parse(await import('node:fs').then((fs) => fs.readFileSync(path, 'utf8')));
  assert.equal(collection.type, 'FeatureCollection');
  assert.equal(collection.umbracast.eclipse, '2026-03-03');
  const zones = collection.features.filter((f: { properties: { layer: string } }) => f.properties.layer === 'zone').map((f: { properties: { zone: string } }) => f.properties.zone);
  assert.deepEqual(zones, ['sees-all', 'sets-during', 'rises-during', 'sees-none', 'totality-all', 'totality-part']);
  const contacts = collection.features.filter((f: { properties: { layer: string } }) => f.properties.layer === 'moon-up').map((f: { properties: { contact: string } }) => f.properties.contact);
  assert.deepEqual(contacts, ['P1', 'U1', 'U2', 'greatest', 'U3', 'U4', 'P4']);
});

test('default file names keep views apart: the world map, the globe and each regional view get names of their own', async () => {
  const { viewStem } = await import('../../src/cli/commands/map.ts');
  const stems = [
    viewStem({ projection: 'equal-earth' }),
    viewStem({ projection: 'equirectangular' }),
    viewStem({ projection: 'globe' }),
    viewStem({ projection: 'globe', centre: [139.7, 35.7] }),
    viewStem({ projection: 'region', bbox: [-20, 30, 45, 72] }),
    viewStem({ projection: 'region', bbox: [-20, 30, 45, 70] }),
    viewStem({ projection: 'region', centre: [151.2, -33.9], spanDeg: 70 }),
    viewStem({ projection: 'region', centre: [151.2, -33.9], spanDeg: 60 }),
  ];
  assert.equal(stems[0], '');
  assert.equal(new Set(stems).size, stems.length, stems.join(' '));
  assert.equal(stems[4], '-region-20w30n45e72n');
  for (const s of stems) assert.match(s, /^[a-z0-9.-]*$/, 'a plain file-name part');
});
