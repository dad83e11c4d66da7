/**
 * Solar eclipses in the batch: the style's `bodies` (both by default), the
 * kinds checked per body, the manifest's `body`, and the eye-safety caution
 * (issue 15; ISO 12312-2) in every solar output of a batch — caption, GeoJSON,
 * every local format, the contact sheet's card — and in no lunar one; the
 * lunar naked-eye line in no solar one. A folder made before `bodies` (here:
 * lunar only) stays up to date: only the solar eclipses are added.
 */
import assert from 'node:assert/strict';
import sharp from 'sharp';
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { test } from 'node:test';
import { main } from '../../src/cli/main.ts';
import { planBatch, kindsOfBodies } from '../../src/batch/run.ts';
import { DEFAULT_STYLE, styleHash, validateStyle } from '../../src/batch/style.ts';
import { contactSheet } from '../../src/batch/contactSheet.ts';
import type { Manifest } from '../../src/batch/manifest.ts';

async function run(args: string[]) {
  let stdout = '';
  let stderr = '';
  const code = await main(args, { stdout: (t) => (stdout += t), stderr: (t) => (stderr += t), now: () => new Date('2026-01-10T00:00:00Z') });
  return { code, stdout, stderr };
}

const RANGE = { from: new Date('2026-02-15T00:00:00Z'), to: new Date('2026-03-05T00:00:00Z') };
const CAUTION = /ISO 12312-2/;
const NAKED_EYE = /naked eye/i;

test('the style takes both bodies unless it says; bodies are left out of the style hash (they choose eclipses, not how one is drawn)', () => {
  assert.deepEqual(DEFAULT_STYLE.bodies, ['lunar', 'solar']);
  assert.equal(styleHash({ ...DEFAULT_STYLE, bodies: ['lunar'] }), styleHash(DEFAULT_STYLE));
  assert.notEqual(styleHash({ ...DEFAULT_STYLE, theme: 'dark' }), styleHash(DEFAULT_STYLE));
  assert.throws(() => validateStyle({ bodies: ['lunar', 'lunar'] }), /bodies/);
  assert.throws(() => validateStyle({ bodies: ['planetary'] }), /bodies/);
  assert.throws(() => validateStyle({ bodies: [] }), /bodies/);
});

test('kinds per body: a kind names the eclipses of every body that has it; annular is solar only, penumbral lunar only (catalogue: 2026-02-17 annular, 2026-03-03 total lunar)', () => {
  const ids = (kinds: readonly string[] | undefined, bodies: ('lunar' | 'solar')[]) =>
    planBatch({ ...RANGE, ...(kinds ? { kinds: kinds as never } : {}), style: { ...DEFAULT_STYLE, bodies }, shard: null }).all.map((e) => `${e.id} ${e.body} ${e.kind}`);
  assert.deepEqual(ids(undefined, ['lunar', 'solar']), ['2026-02-17 solar annular', '2026-03-03 lunar total']);
  assert.deepEqual(ids(['annular'], ['lunar', 'solar']), ['2026-02-17 solar annular']);
  assert.deepEqual(ids(['total'], ['lunar', 'solar']), ['2026-03-03 lunar total']);
  assert.deepEqual(ids(undefined, ['solar']), ['2026-02-17 solar annular']);
  assert.deepEqual(kindsOfBodies(['solar']), ['total', 'annular', 'hybrid', 'partial']);
  assert.deepEqual(kindsOfBodies(['lunar', 'solar']), ['penumbral', 'partial', 'total', 'annular', 'hybrid']);
});

test('--kind is checked against --body: penumbral with solar is one error line naming --kind, exit 2, nothing written', async () => {
  const dir = mkdtempSync(join(tmpdir(), 'umbracast-solarbatch-kind-'));
  const { code, stderr } = await run(['batch', '--from', '2026-02-15', '--to', '2026-03-05', '--body', 'solar', '--kind', 'penumbral', '--out', join(dir, 'o')]);
  assert.equal(code, 2);
  assert.equal(stderr.trim().split('\n').length, 1);
  assert.match(stderr, /--kind: expected .*total, annular, hybrid, partial.*received "penumbral"/);
  const body = await run(['batch', '--from', '2026-02-15', '--to', '2026-03-05', '--body', 'planets', '--out', join(dir, 'o')]);
  assert.equal(body.code, 2);
  assert.match(body.stderr, /^umbracast: --body: expected lunar, solar, all, received "planets"\n$/);
});

test('a batch of both bodies: the caution in every solar output and on its card, in no lunar one; an older lunar folder gains only the solar eclipse', async () => {
  const dir = mkdtempSync(join(tmpdir(), 'umbracast-solarbatch-'));
  const out = join(dir, 'atlas');
  writeFileSync(join(dir, 'style.yaml'), 'preset: card\nformats: [png]\nplaces: [Windhoek]\nlocalFormats: [table, markdown, csv, json, ics]\nsky: false\n');
  const args = ['batch', '--from', '2026-02-15', '--to', '2026-03-05', '--style', join(dir, 'style.yaml'), '--out', out, '--jobs', '2'];
  // First as a batch made before solar eclipses: the lunar one alone.
  const first = await run([...args, '--body', 'lunar']);
  assert.equal(first.code, 0, first.stderr);
  assert.match(first.stdout, /1 eclipse — 1 rendered/);
  // Then with the style's default bodies: the lunar eclipse is up to date, the solar one is added.
  const second = await run(args);
  assert.equal(second.code, 0, second.stderr);
  assert.match(second.stdout, /2 eclipses — 1 rendered, 1 up to date/);

  const manifest = JSON.parse(readFileSync(join(out, 'manifest.json'), 'utf8')) as Manifest;
  assert.equal(manifest.schema, 'umbracast.manifest/2');
  assert.deepEqual(manifest.eclipses.map((e) => [e.id, e.body, e.kind]), [['2026-02-17', 'solar', 'annular'], ['2026-03-03', 'lunar', 'total']]);
  const solar = manifest.eclipses[0]!;
  const lunar = manifest.eclipses[1]!;
  assert.equal(solar.body === 'solar' && solar.record.body, 'solar');
  // A solar task writes its map and thumbnail, its caption, its GeoJSON and the places' local tables.
  assert.deepEqual(solar.files.map((f) => f.path).sort(), [
    '2026-02-17-annular-windhoek.csv', '2026-02-17-annular-windhoek.ics', '2026-02-17-annular-windhoek.json', '2026-02-17-annular-windhoek.md',
    '2026-02-17-annular-windhoek.txt', '2026-02-17-annular.geojson', '2026-02-17-annular.png', '2026-02-17-annular.txt',
    'thumbs/2026-02-17-annular.png',
  ]);
  // The map's XMP description carries the caution too (the header band's is checked on the SVG in test/figures).
  assert.match(((await sharp(readFileSync(join(out, '2026-02-17-annular.png'))).metadata()).xmp ?? Buffer.alloc(0)).toString('utf8'), /ISO 12312-2/);
  for (const file of solar.files.filter((f) => !f.path.endsWith('.png'))) {
    const text = readFileSync(join(out, file.path), 'utf8');
    assert.match(text, CAUTION, `${file.path}: the caution`);
    assert.doesNotMatch(text, NAKED_EYE, `${file.path}: no naked-eye line`);
  }
  // The GeoJSON carries it on the collection, the local JSON in `safety`, the ICS in every event's description.
  assert.match(JSON.parse(readFileSync(join(out, '2026-02-17-annular.geojson'), 'utf8')).umbracast.safety, CAUTION);
  assert.match(JSON.parse(readFileSync(join(out, '2026-02-17-annular-windhoek.json'), 'utf8')).safety, CAUTION);
  const ics = readFileSync(join(out, '2026-02-17-annular-windhoek.ics'), 'utf8').replace(/\r\n[ \t]/g, '');
  for (const event of ics.split('BEGIN:VEVENT').slice(1)) assert.match(event, /DESCRIPTION:.*ISO 12312-2/);
  for (const file of lunar.files.filter((f) => !f.path.endsWith('.png'))) {
    assert.doesNotMatch(readFileSync(join(out, file.path), 'utf8'), CAUTION, `${file.path}: a lunar output without the solar caution`);
  }

  const html = readFileSync(join(out, 'index.html'), 'utf8');
  assert.match(html, /<h1>Lunar and solar eclipses 2026-02-15 to 2026-03-04<\/h1>/);
  const card = () => /<article[^>]*id="([^"]+)"[\s\S]*?<\/article>/g;
  const cards = new Map([...html.matchAll(card())].map((m) => [m[1]!, m[0]]));
  assert.match(cards.get('2026-02-17')!, /<p class="caution"><strong>Eye safety: [^<]*ISO 12312-2/);
  assert.doesNotMatch(cards.get('2026-02-17')!, NAKED_EYE);
  assert.doesNotMatch(cards.get('2026-03-03')!, CAUTION);
  // Each thumbnail's alt text names its eclipse once (common practice: alt text reads as a plain sentence).
  assert.match(cards.get('2026-03-03')!, /alt="Visibility map of the total lunar eclipse of /);
  assert.match(cards.get('2026-02-17')!, /alt="Map of the annular solar eclipse of /);
  assert.doesNotMatch(html, /\b(lunar lunar|solar solar)\b/);
  // catalogue.csv (umbracast.catalogue/2's columns: body, then id) holds both eclipses, the caution on the solar row only.
  const rows = readFileSync(join(out, 'catalogue.csv'), 'utf8').trim().split('\n').slice(1);
  assert.deepEqual(rows.map((l) => l.split(',').slice(0, 2).join(',')), ['solar,2026-02-17', 'lunar,2026-03-03']);
  assert.match(rows[0]!, /ISO 12312-2/);
  assert.doesNotMatch(rows[1]!, CAUTION);
});

test('the contact sheet of a total solar eclipse: the caution with totality\'s scope; a /1 manifest entry without body reads as lunar', () => {
  const manifest = {
    schema: 'umbracast.manifest/2', tool: 'test', styleHash: '0123456789abcdef', style: {}, range: { from: '2024-04-01T00:00:00.000Z', to: '2024-05-01T00:00:00.000Z' }, shard: null,
    eclipses: [{
      id: '2024-04-08', body: 'solar', kind: 'total', key: '0'.repeat(32), files: [],
      record: {
        body: 'solar', id: '2024-04-08', kind: 'total', central: true, greatest: '2024-04-08T18:17:16Z', greatestTT: '2024-04-08T18:18:25Z', deltaT: 69.2, deltaTSource: 'observed',
        gamma: 0.3431, magnitude: 1.0566, saros: 139, greatestPoint: [-104.14, 25.29], sunAltitude: 69.8, pathWidthKm: 197.5, contacts: {}, durations: { partial: 19_000, central: 268 },
        moonRadius: { penumbra: 0.2725076, umbra: 0.272281 },
      },
    }],
  } as unknown as Manifest;
  const html = contactSheet(manifest, 'Solar eclipses 2024-04-01 to 2024-04-30');
  assert.match(html, /totality 4 min 28 s at greatest · path 198 km wide · saros 139/);
  assert.match(html, /viewers off only while totality hides the Sun completely/);
  assert.doesNotMatch(html, NAKED_EYE);
});
