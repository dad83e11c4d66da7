/**
 * The diagram in the batch (issue 16, point 3): the house style's `diagram` field, the files it writes for
 * both kinds, their manifest role, and the resume rules every other file follows. Each batch diagram is
 * checked against the same figure written by `umbracast diagram` (an independent path through the
 * command line: same inputs, same bytes — common practice); the solar one carries the eye-safety caution
 * (ISO 12312-2) and the lunar one never does. A style without the field keeps its hash (and the hash list,
 * test/cli/outputHashes.test.ts, keeps its files).
 */
import assert from 'node:assert/strict';
import { existsSync, mkdtempSync, readFileSync, unlinkSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { test } from 'node:test';
import { XMLValidator } from 'fast-xml-parser';
import sharp from 'sharp';
import { main } from '../../src/cli/main.ts';
import { pictureLoad } from '../../src/batch/run.ts';
import { DEFAULT_STYLE, styleHash, validateStyle } from '../../src/batch/style.ts';
import { diagramFormatsOf } from '../../src/batch/styleSettings.ts';
import { MAX_FILES_PER_ECLIPSE, parseManifest, type Manifest } from '../../src/batch/manifest.ts';
import { workerNeedBytes } from '../../src/batch/resources.ts';
import { sha256 } from '../../src/batch/written.ts';
import { contactSheet } from '../../src/batch/contactSheet.ts';
import { findEclipses } from '../../src/eclipses/kinds.ts';
import { solarLocalCircumstances } from '../../src/local/solar.ts';

async function run(args: string[]) {
  let stdout = '';
  let stderr = '';
  const code = await main(args, { stdout: (t) => (stdout += t), stderr: (t) => (stderr += t), now: () => new Date('2026-01-10T00:00:00Z') });
  return { code, stdout, stderr };
}

const CAUTION = /ISO 12312-2/;
const NAKED_EYE = /naked eye/i;

/** What `umbracast diagram` writes for the same eclipse and page, as bytes. */
async function commandDiagram(dir: string, args: string[], name: string): Promise<Buffer> {
  const path = join(dir, name);
  const result = await run(['diagram', ...args, '-o', path]);
  assert.equal(result.code, 0, result.stderr);
  return readFileSync(path);
}

/** A one-worker batch of [from, to) with this style, in a fresh folder; the folder and the batch's output folder. */
async function batchWith(prefix: string, style: string, from: string, to: string): Promise<{ dir: string; out: string }> {
  const dir = mkdtempSync(join(tmpdir(), prefix));
  const out = join(dir, 'atlas');
  writeFileSync(join(dir, 'style.yaml'), style);
  const result = await run(['batch', '--from', from, '--to', to, '--style', join(dir, 'style.yaml'), '--out', out, '--jobs', '1']);
  assert.equal(result.code, 0, result.stderr);
  return { dir, out };
}

test('the style field: absent or false leaves the style hash as it was before the field (f5c2e5d177ee56ab, measured on c2d2449); true or a list changes it', () => {
  // The default style's hash before the field existed (main c2d2449): a batch made then stays up to date.
  assert.equal(styleHash(DEFAULT_STYLE), 'f5c2e5d177ee56ab');
  assert.equal(styleHash(validateStyle({ diagram: false })), 'f5c2e5d177ee56ab');
  assert.equal(validateStyle({ diagram: false }).diagram, undefined);
  const withDiagram = styleHash(validateStyle({ diagram: true }));
  assert.notEqual(withDiagram, styleHash(DEFAULT_STYLE));
  assert.notEqual(styleHash(validateStyle({ diagram: ['svg'] })), withDiagram);
  // true takes the maps' picture formats; GeoJSON-only maps leave PNG; a list is taken as it is.
  assert.deepEqual(diagramFormatsOf(validateStyle({ diagram: true, formats: ['png', 'svg', 'geojson'] })), ['png', 'svg']);
  assert.deepEqual(diagramFormatsOf(validateStyle({ diagram: true, formats: ['geojson'] })), ['png']);
  assert.deepEqual(diagramFormatsOf(validateStyle({ diagram: ['webp', 'jpg'] })), ['webp', 'jpg']);
  assert.deepEqual(diagramFormatsOf(DEFAULT_STYLE), []);
});

const badFields: [string, string, RegExp][] = [
  ['a word', 'diagram: yes\n', /^umbracast: .*style\.yaml: diagram: expected true, false, or a list of picture formats among png, svg, webp, jpg, each at most once, received "yes"$/],
  ['a format the diagram has not', 'diagram: [png, geojson]\n', /^umbracast: .*style\.yaml: diagram: expected true, false, or a list of picture formats among png, svg, webp, jpg/],
  ['a format twice', 'diagram: [svg, svg]\n', /^umbracast: .*style\.yaml: diagram: expected each format at most once/],
  ['an empty list', 'diagram: []\n', /^umbracast: .*style\.yaml: diagram: expected at least one format/],
];

for (const [label, text, pattern] of badFields) {
  test(`style diagram: ${label} is one line naming the file and the field, exit 2, nothing written`, async () => {
    const dir = mkdtempSync(join(tmpdir(), 'umbracast-diagramstyle-'));
    writeFileSync(join(dir, 'style.yaml'), text);
    const { code, stdout, stderr } = await run(['batch', '--from', '2026', '--to', '2026', '--style', join(dir, 'style.yaml'), '--out', join(dir, 'o')]);
    assert.equal(code, 2);
    assert.equal(stdout, '');
    assert.equal(stderr.split('\n').length, 2, stderr);
    assert.match(stderr.trimEnd(), pattern);
    assert.equal(existsSync(join(dir, 'o')), false);
  });
}

test('a naming template whose diagram files would not fit in 255 bytes is refused, naming the field (POSIX NAME_MAX, common practice)', async () => {
  const dir = mkdtempSync(join(tmpdir(), 'umbracast-diagramname-'));
  // 24 × {id} = 240 bytes filled in: maps (.geojson, 248) fit; "-diagram.webp" (253) does too; 25 × {id} would not fit the maps already.
  const fits = `${'{id}'.repeat(24)}`;
  const tooLong = `${fits}abcd`;
  writeFileSync(join(dir, 'a.yaml'), `naming: "${fits}"\ndiagram: [webp]\n`);
  writeFileSync(join(dir, 'b.yaml'), `naming: "${tooLong}"\ndiagram: [webp]\n`);
  const ok = await run(['batch', '--from', '2026-03-05', '--to', '2026-03-06', '--style', join(dir, 'a.yaml'), '--out', join(dir, 'a')]);
  assert.equal(ok.code, 0, ok.stderr);
  const refused = await run(['batch', '--from', '2026-03-05', '--to', '2026-03-06', '--style', join(dir, 'b.yaml'), '--out', join(dir, 'b')]);
  assert.equal(refused.code, 2);
  assert.match(refused.stderr, /^umbracast: .*b\.yaml: naming: expected a template whose diagram file names fit in 255 bytes/);
  // A place's diagram, "-dakar-diagram.webp", is longer than its sky figure, "-dakar-sky.png": 240 + 19 = 259 bytes.
  writeFileSync(join(dir, 'c.yaml'), `naming: "${fits}"\nplaces: [Dakar]\n`);
  writeFileSync(join(dir, 'd.yaml'), `naming: "${fits}"\nplaces: [Dakar]\ndiagram: [webp]\n`);
  assert.equal((await run(['batch', '--from', '2026-03-05', '--to', '2026-03-06', '--style', join(dir, 'c.yaml'), '--out', join(dir, 'c')])).code, 0);
  const place = await run(['batch', '--from', '2026-03-05', '--to', '2026-03-06', '--style', join(dir, 'd.yaml'), '--out', join(dir, 'd')]);
  assert.equal(place.code, 2);
  assert.match(place.stderr, /^umbracast: .*d\.yaml: places\[0\]: expected a place whose file names fit in 255 bytes with the naming template, received "Dakar" \(259 bytes\)\n$/);
});

test('a batch with the diagram: one per lunar eclipse, one per solar eclipse and place that sees it, each format, role and hashes in the manifest, bytes as `umbracast diagram` writes them; skip, removal and a changed field', async () => {
  const dir = mkdtempSync(join(tmpdir(), 'umbracast-diagrambatch-'));
  const out = join(dir, 'atlas');
  const style = join(dir, 'style.yaml');
  // Maps as GeoJSON only, so that the pictures drawn are the diagrams. Reykjavik sees the total solar eclipse of
  // 2026-08-12; Adelaide sees nothing of it (catalogue: astronomy-engine's local search, test/outputs/solar*.test.ts).
  const styleText = (diagram: string) => `preset: card\nformats: [geojson]\nplaces: [Reykjavik, Adelaide]\nlocalFormats: [json]\nsky: false\ndiagram: ${diagram}\n`;
  writeFileSync(style, styleText('[png, svg]'));
  const args = ['batch', '--from', '2026-08-01', '--to', '2026-08-31', '--style', style, '--out', out, '--jobs', '2'];
  const first = await run(args);
  assert.equal(first.code, 0, first.stderr);
  assert.match(first.stdout, /2 eclipses — 2 rendered, 0 up to date, 0 failed/);

  const manifest = JSON.parse(readFileSync(join(out, 'manifest.json'), 'utf8')) as Manifest;
  // An added role value: the manifest stays umbracast.manifest/2 (every /2 written before reads as it did).
  assert.equal(manifest.schema, 'umbracast.manifest/2');
  assert.deepEqual(manifest.eclipses.map((e) => `${e.id} ${e.body} ${e.kind}`), ['2026-08-12 solar total', '2026-08-28 lunar partial']);
  const [solar, lunar] = manifest.eclipses as [Manifest['eclipses'][number], Manifest['eclipses'][number]];
  const diagrams = (entry: typeof solar) => entry.files.filter((f) => f.path.includes('-diagram.')).map((f) => `${f.path} ${f.role}`).sort();
  assert.deepEqual(diagrams(lunar), ['2026-08-28-partial-diagram.png diagram', '2026-08-28-partial-diagram.svg diagram', '2026-08-28-partial-diagram.txt caption']);
  assert.deepEqual(diagrams(solar), ['2026-08-12-total-reykjavik-diagram.png diagram', '2026-08-12-total-reykjavik-diagram.svg diagram', '2026-08-12-total-reykjavik-diagram.txt caption']);
  for (const entry of manifest.eclipses) {
    for (const f of entry.files) {
      const bytes = readFileSync(join(out, f.path));
      assert.equal(bytes.length, f.bytes, f.path);
      assert.equal(sha256(bytes), f.sha256, f.path);
    }
  }
  // The card preset's page (1200×675), as for maps; the PNG decodes, the SVG is well-formed XML.
  const png = readFileSync(join(out, '2026-08-28-partial-diagram.png'));
  const meta = await sharp(png).metadata();
  assert.deepEqual([meta.width, meta.height], [1200, 675]);
  assert.equal(XMLValidator.validate(readFileSync(join(out, '2026-08-12-total-reykjavik-diagram.svg'), 'utf8')), true);

  // The same figures through the command line: identical bytes.
  assert.ok(readFileSync(join(out, '2026-08-28-partial-diagram.svg')).equals(await commandDiagram(dir, ['2026-08-28', '--preset', 'card'], 'l.svg')));
  assert.ok(png.equals(await commandDiagram(dir, ['2026-08-28', '--preset', 'card'], 'l.png')));
  const solarSvg = await commandDiagram(dir, ['2026-08-12', '--place', 'Reykjavik', '--preset', 'card'], 's.svg');
  assert.ok(readFileSync(join(out, '2026-08-12-total-reykjavik-diagram.svg')).equals(solarSvg));
  assert.equal(readFileSync(join(out, '2026-08-12-total-reykjavik-diagram.txt'), 'utf8'), readFileSync(join(dir, 's.txt'), 'utf8'));

  // The caution on the solar diagram (picture and caption), never on the lunar one; the naked-eye line the other way round.
  for (const name of ['2026-08-12-total-reykjavik-diagram.svg', '2026-08-12-total-reykjavik-diagram.txt']) {
    const text = readFileSync(join(out, name), 'utf8');
    assert.match(text, CAUTION, name);
    assert.doesNotMatch(text, NAKED_EYE, name);
  }
  assert.match(((await sharp(readFileSync(join(out, '2026-08-12-total-reykjavik-diagram.png'))).metadata()).xmp ?? Buffer.alloc(0)).toString('utf8'), CAUTION);
  for (const name of ['2026-08-28-partial-diagram.svg', '2026-08-28-partial-diagram.txt']) assert.doesNotMatch(readFileSync(join(out, name), 'utf8'), CAUTION, name);
  assert.doesNotMatch(((await sharp(png).metadata()).xmp ?? Buffer.alloc(0)).toString('utf8'), CAUTION);

  // The contact sheet links each diagram from its eclipse's card, named by its role.
  const html = readFileSync(join(out, 'index.html'), 'utf8');
  const card = (id: string) => new RegExp(`<article[^>]*id="${id}"[\\s\\S]*?</article>`).exec(html)![0];
  assert.match(card('2026-08-28'), /<a href="2026-08-28-partial-diagram\.svg">2026-08-28-partial-diagram\.svg<\/a> <span>diagram, \d+ KiB<\/span>/);
  assert.match(card('2026-08-12'), /<a href="2026-08-12-total-reykjavik-diagram\.png">/);

  // A second run skips both; a removed diagram is drawn again (its eclipse only), with the same bytes.
  const again = await run(args);
  assert.match(again.stdout, /2 eclipses — 0 rendered, 2 up to date, 0 failed/);
  const removed = solar.files.find((f) => f.path === '2026-08-12-total-reykjavik-diagram.png')!;
  unlinkSync(join(out, removed.path));
  const redo = await run(args);
  assert.match(redo.stdout, /2 eclipses — 1 rendered, 1 up to date, 0 failed/);
  assert.equal(sha256(readFileSync(join(out, removed.path))), removed.sha256);

  // A changed field changes the style's key: both eclipses are drawn again, the manifest lists the new formats only.
  writeFileSync(style, styleText('[svg]'));
  const changed = await run(args);
  assert.match(changed.stdout, /2 eclipses — 2 rendered, 0 up to date, 0 failed/);
  const after = JSON.parse(readFileSync(join(out, 'manifest.json'), 'utf8')) as Manifest;
  assert.notEqual(after.styleHash, manifest.styleHash);
  assert.deepEqual(after.eclipses.flatMap((e) => e.files.filter((f) => f.role === 'diagram').map((f) => f.path)).sort(), ['2026-08-12-total-reykjavik-diagram.svg', '2026-08-28-partial-diagram.svg']);
});

test('a batch in Spanish draws both diagrams in Spanish, byte for byte as `umbracast diagram --lang es` does (same inputs, same bytes: common practice)', async () => {
  const { dir, out } = await batchWith('umbracast-diagramlang-', 'lang: es\npreset: card\nformats: [geojson]\nplaces: [Reykjavik]\nlocalFormats: [json]\nsky: false\ndiagram: [svg]\n', '2026-08-01', '2026-08-31');
  assert.ok(readFileSync(join(out, '2026-08-28-partial-diagram.svg')).equals(await commandDiagram(dir, ['2026-08-28', '--preset', 'card', '--lang', 'es'], 'l.svg')));
  assert.ok(readFileSync(join(out, '2026-08-12-total-reykjavik-diagram.svg')).equals(await commandDiagram(dir, ['2026-08-12', '--place', 'Reykjavik', '--preset', 'card', '--lang', 'es'], 's.svg')));
  assert.equal(readFileSync(join(out, '2026-08-12-total-reykjavik-diagram.txt'), 'utf8'), readFileSync(join(dir, 's.txt'), 'utf8'));
  // Not the English figure: the English diagram of the same eclipse differs.
  assert.ok(!readFileSync(join(out, '2026-08-28-partial-diagram.svg')).equals(await commandDiagram(dir, ['2026-08-28', '--preset', 'card'], 'en.svg')));
});

test('a solar eclipse seen from none of the style\'s places: the view from the greatest point, as `umbracast diagram` draws it by default', async () => {
  // Reykjavik sees nothing of the annular eclipse of 2026-02-17 (its path crosses Antarctica; catalogue: astronomy-engine's local search).
  const { dir, out } = await batchWith('umbracast-diagramgreatest-', 'formats: [geojson]\nbodies: [solar]\nplaces: [Reykjavik]\nlocalFormats: [json]\ndiagram: true\n', '2026-02-15', '2026-02-20');
  const manifest = JSON.parse(readFileSync(join(out, 'manifest.json'), 'utf8')) as Manifest;
  assert.deepEqual(manifest.eclipses[0]!.files.filter((f) => f.path.includes('-diagram.')).map((f) => `${f.path} ${f.role}`), ['2026-02-17-annular-diagram.png diagram', '2026-02-17-annular-diagram.txt caption']);
  // GeoJSON-only maps: the diagram in PNG, on `umbracast diagram`'s own page (1600×1000), from the greatest point.
  assert.ok(readFileSync(join(out, '2026-02-17-annular-diagram.png')).equals(await commandDiagram(dir, ['2026-02-17'], 'g.png')));
  const caption = readFileSync(join(out, '2026-02-17-annular-diagram.txt'), 'utf8');
  assert.match(caption, /from the greatest point/);
  assert.match(caption, CAUTION);
  assert.equal(JSON.parse(readFileSync(join(out, '2026-02-17-annular-reykjavik.json'), 'utf8')).kind, 'none');
});

test('the fallback never fails: the greatest point sees every solar eclipse of 1000–1050 and 2950–3000 with the Sun up (a partial one\'s greatest point has the Sun on the horizon: Explanatory Supplement, the greatest eclipse point)', () => {
  // Measured over every solar eclipse of 1000–3000 (4779) when the field was added: none failed.
  for (const [from, to] of [['1000-01-01', '1051-01-01'], ['2950-01-01', '3000-12-31']] as const) {
    const eclipses = findEclipses({ from: new Date(`${from}T00:00:00Z`), to: new Date(`${to}T00:00:00Z`), body: 'solar' });
    assert.ok(eclipses.length > 100, `${from}: ${eclipses.length}`);
    for (const eclipse of eclipses) {
      if (eclipse.body !== 'solar') continue;
      const [lonDeg, latDeg] = eclipse.greatestPoint;
      assert.notEqual(solarLocalCircumstances(eclipse, { latDeg, lonDeg }).kind, 'none', `${eclipse.id} ${eclipse.kind}`);
    }
  }
});

test('the worker\'s memory need counts the diagram when it is the larger picture (README "Limits": 4 + 5 bytes a pixel for one raster drawing)', () => {
  // The default map (2400×1350 PNG) outweighs the diagram (1600×1000): the load is the map's, as before the field.
  assert.deepEqual(pictureLoad(validateStyle({ diagram: true })), pictureLoad(DEFAULT_STYLE));
  // GeoJSON-only maps draw no picture; the diagram's 1600×1000 PNG is then what a worker holds (with the solar captions' data: both kinds by default).
  assert.deepEqual(pictureLoad(validateStyle({ formats: ['geojson'], diagram: true })), { pixels: 1600 * 1000, rasterFormats: 1, solar: true });
  assert.equal(workerNeedBytes(pictureLoad(validateStyle({ formats: ['geojson'], diagram: true }))), 210 * 1024 * 1024 + 130 * 1024 * 1024 + 1600 * 1000 * 9);
  assert.equal(workerNeedBytes(pictureLoad(validateStyle({ formats: ['geojson'], diagram: true, bodies: ['lunar'] }))), 210 * 1024 * 1024 + 1600 * 1000 * 9);
  // Lunar SVG maps only (4 bytes a pixel) and a PNG diagram of the same page: the diagram's raster drawing needs more.
  assert.deepEqual(pictureLoad(validateStyle({ formats: ['svg'], preset: 'card', diagram: ['png'], bodies: ['lunar'] })), { pixels: 1200 * 675, rasterFormats: 1, solar: false });
  // With solar eclipses the map is drawn as a PNG for the thumbnail anyway: one raster drawing either way.
  assert.deepEqual(pictureLoad(validateStyle({ formats: ['svg'], preset: 'card', diagram: ['png'] })), { pixels: 1200 * 675, rasterFormats: 1, solar: true });
});

test('the manifest: the diagram role is read; a role it does not know is refused; an eclipse\'s most files (20 places, every format) fit the bound', () => {
  const entry = (files: { path: string; role: string }[]) => ({
    schema: 'umbracast.manifest/2', tool: 'umbracast 0.1.0', styleHash: '0123456789abcdef', style: {}, range: { from: '2026-01-01T00:00:00.000Z', to: '2027-01-01T00:00:00.000Z' }, shard: null,
    eclipses: [{
      id: '2026-02-17', body: 'solar', kind: 'annular', key: '0'.repeat(32), files: files.map((f) => ({ ...f, bytes: 1, sha256: '0'.repeat(64) })),
      record: {
        body: 'solar', id: '2026-02-17', kind: 'annular', central: true, greatest: '2026-02-17T12:12:06Z', greatestTT: '2026-02-17T12:13:15Z', deltaT: 69.1, deltaTSource: 'forecast',
        gamma: -0.9743, magnitude: 0.963, saros: 121, greatestPoint: [86.7, -64.7], sunAltitude: 12, contacts: {}, durations: { partial: 16_000 }, moonRadius: { penumbra: 0.2725076, umbra: 0.272281 },
      },
    }],
  });
  assert.equal(parseManifest(entry([{ path: 'a-diagram.png', role: 'diagram' }]), 'm').problem, undefined);
  assert.match(parseManifest(entry([{ path: 'a-diagram.png', role: 'figure' }]), 'm').problem ?? '', /role/);
  // Counted from what a task writes: 5 maps, caption, thumbnail, a diagram in 4 formats and its caption; per place 5 local
  // formats, a sky figure and its caption, a diagram in 4 formats and its caption.
  const most = 5 + 2 + 5 + 20 * (5 + 2 + 5);
  assert.equal(MAX_FILES_PER_ECLIPSE, most);
  const files = Array.from({ length: most }, (_, i) => ({ path: `f${i}.png`, role: 'diagram' }));
  assert.equal(parseManifest(entry(files), 'm').problem, undefined);
  assert.match(parseManifest(entry([...files, { path: 'one-more.png', role: 'map' }]), 'm').problem ?? '', /files/);
});

test('the contact sheet names the diagram role in the style\'s language (a manifest made by hand)', () => {
  const manifest = {
    schema: 'umbracast.manifest/2', tool: 'test', styleHash: '0123456789abcdef', style: { lang: 'de' }, range: { from: '2026-03-01T00:00:00.000Z', to: '2026-03-31T00:00:00.000Z' }, shard: null,
    eclipses: [{
      id: '2026-03-03', body: 'lunar', kind: 'total', key: '0'.repeat(32), files: [{ path: '2026-03-03-total-diagram.svg', role: 'diagram', bytes: 2048, sha256: '0'.repeat(64) }],
      record: {
        body: 'lunar', id: '2026-03-03', kind: 'total', greatest: '2026-03-03T11:33:45Z', greatestTT: '2026-03-03T11:34:54Z', deltaT: 69.1, deltaTSource: 'forecast', gamma: -0.3766,
        umbralMagnitude: 1.151, penumbralMagnitude: 2.184, saros: 133, contacts: {}, durations: { penumbral: 20_000, partial: 12_000, total: 3_500 }, subLunar: { greatest: [-169, 7] },
      },
    }],
  } as unknown as Manifest;
  assert.match(contactSheet(manifest, 'Mondfinsternisse'), /2026-03-03-total-diagram\.svg<\/a> <span>Schaubild, 2 KiB<\/span>/);
});
