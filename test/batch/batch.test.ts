/** The batch atlas: completeness, integrity, resumption after SIGKILL, shards, style validation. */
import assert from 'node:assert/strict';
import { spawn } from 'node:child_process';
import { existsSync, mkdtempSync, readdirSync, readFileSync, statSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { test } from 'node:test';
import { XMLValidator } from 'fast-xml-parser';
import ICAL from 'ical.js';
import sharp from 'sharp';
import { main } from '../../src/cli/main.ts';
import { findLunarEclipses } from '../../src/eclipses/lunar/catalogue.ts';
import { sha256 } from '../../src/batch/written.ts';

const BIN = new URL('../../src/cli/bin.mjs', import.meta.url).pathname;

async function run(args: string[]) {
  let stdout = '';
  let stderr = '';
  const code = await main(args, { stdout: (t) => (stdout += t), stderr: (t) => (stderr += t), now: () => new Date('2026-01-10T00:00:00Z') });
  return { code, stdout, stderr };
}

function styleFile(dir: string, text: string, name = 'style.yaml'): string {
  const path = join(dir, name);
  writeFileSync(path, text);
  return path;
}

// These batches are of lunar eclipses (a style takes both kinds unless it says): test/batch/solarBatch.test.ts has both.
const SMALL_STYLE = 'preset: card\nformats: [png, svg]\nplaces: [Dakar]\nlocalFormats: [ics]\nnaming: "{id}-{kind}"\nbodies: [lunar]\n';

async function decodes(path: string): Promise<void> {
  const bytes = readFileSync(path);
  if (path.endsWith('.png')) await sharp(bytes).raw().toBuffer();
  else if (path.endsWith('.svg')) assert.equal(XMLValidator.validate(bytes.toString('utf8')), true, path);
  else if (path.endsWith('.ics')) ICAL.parse(bytes.toString('utf8'));
  else if (path.endsWith('.json')) JSON.parse(bytes.toString('utf8'));
  else assert.ok(bytes.length > 0, path);
}

function outputFiles(dir: string): string[] {
  const top = readdirSync(dir).filter((n) => !n.startsWith('.') && statSync(join(dir, n)).isFile());
  const thumbs = existsSync(join(dir, 'thumbs')) ? readdirSync(join(dir, 'thumbs')).map((n) => `thumbs/${n}`) : [];
  return [...top, ...thumbs].sort();
}

test('a three-year batch: every eclipse of the catalogue has its files, each decodes, the manifest\'s hashes match', async () => {
  const dir = mkdtempSync(join(tmpdir(), 'umbracast-batch-'));
  const out = join(dir, 'atlas');
  const style = styleFile(dir, SMALL_STYLE);
  const { code, stdout, stderr } = await run(['batch', '--from', '2026', '--to', '2028', '--style', style, '--out', out, '--jobs', '2']);
  assert.equal(code, 0, stdout);
  // Each progress line gives the eclipse's own time in its worker, from its start, not from when it was queued:
  // every one is shorter than the batch's whole time (common practice: a per-item figure measures the item).
  const progressSeconds = [...stderr.matchAll(/done \(\d+ files? in (\d+\.\d) s\)/g)].map((m) => Number(m[1]));
  assert.ok(progressSeconds.length > 0, stderr);
  const whole = Number(/ (\d+\.\d) s in all/.exec(stdout)?.[1]);
  assert.ok(progressSeconds.every((s) => s > 0 && s < whole), `${progressSeconds} against ${whole} s in all`);
  assert.match(stdout, /^umbracast batch: \d+ eclipses — .* s in all → /);
  const expected = findLunarEclipses({ from: new Date('2026-01-01T00:00:00Z'), to: new Date('2029-01-01T00:00:00Z') }).map((e) => `${e.id}-${e.kind}`);
  const manifest = JSON.parse(readFileSync(join(out, 'manifest.json'), 'utf8'));
  assert.equal(manifest.schema, 'umbracast.manifest/2');
  assert.match(manifest.tool, /^umbracast \d+\.\d+\.\d+$/);
  assert.match(manifest.styleHash, /^[0-9a-f]{16}$/);
  assert.deepEqual(manifest.eclipses.map((e: { id: string; kind: string }) => `${e.id}-${e.kind}`), expected);
  const listed = new Set<string>(['manifest.json', 'catalogue.csv', 'index.html']);
  for (const entry of manifest.eclipses) {
    const stem = `${entry.id}-${entry.kind}`;
    assert.deepEqual(entry.files.map((f: { path: string }) => f.path).sort(), [`${stem}-dakar-sky.png`, `${stem}-dakar-sky.txt`, `${stem}-dakar.ics`, `${stem}.png`, `${stem}.svg`, `${stem}.txt`, `thumbs/${stem}.png`].sort());
    for (const f of entry.files) {
      const bytes = readFileSync(join(out, f.path));
      assert.equal(bytes.length, f.bytes, f.path);
      assert.equal(sha256(bytes), f.sha256, f.path);
      await decodes(join(out, f.path));
      listed.add(f.path);
    }
    assert.equal(entry.record.id, entry.id);
  }
  assert.deepEqual(outputFiles(out), [...listed].sort(), 'the manifest describes exactly what is in the folder');
  const csv = readFileSync(join(out, 'catalogue.csv'), 'utf8').trim().split('\n');
  assert.equal(csv.length, expected.length + 1);
  const again = await run(['batch', '--from', '2026', '--to', '2028', '--style', style, '--out', out, '--jobs', '2']);
  assert.match(again.stdout, new RegExp(`— 0 rendered, ${expected.length} up to date, 0 failed`));
});

test('kill a batch midway (SIGKILL), rerun: it completes, no file is partial, nothing finished before is redone', async () => {
  const dir = mkdtempSync(join(tmpdir(), 'umbracast-kill-'));
  const out = join(dir, 'atlas');
  const style = styleFile(dir, 'preset: card\nformats: [png, svg]\nbodies: [lunar]\n');
  const child = spawn(process.execPath, [BIN, 'batch', '--from', '2026', '--to', '2029', '--style', style, '--out', out, '--jobs', '1'], { stdio: 'ignore' });
  const manifestPath = join(out, 'manifest.json');
  const deadline = Date.now() + 60_000;
  while (Date.now() < deadline) {
    if (existsSync(manifestPath)) {
      try {
        if (JSON.parse(readFileSync(manifestPath, 'utf8')).eclipses.length >= 2) break;
      } catch {
        // Mid-rename: read again.
      }
    }
    await new Promise((r) => setTimeout(r, 20));
  }
  child.kill('SIGKILL');
  await new Promise((r) => child.once('exit', r));
  const before = JSON.parse(readFileSync(manifestPath, 'utf8'));
  assert.ok(before.eclipses.length >= 2 && before.eclipses.length < 11, `finished before the kill: ${before.eclipses.length}`);
  for (const entry of before.eclipses) {
    for (const f of entry.files) assert.equal(sha256(readFileSync(join(out, f.path))), f.sha256, `${f.path} whole after the kill`);
  }
  const stamps = new Map<string, number>(before.eclipses.flatMap((e: { files: { path: string }[] }) => e.files.map((f) => [f.path, statSync(join(out, f.path)).mtimeMs] as [string, number])));
  const rerun = await run(['batch', '--from', '2026', '--to', '2029', '--style', style, '--out', out, '--jobs', '2']);
  assert.equal(rerun.code, 0, rerun.stderr);
  assert.match(rerun.stdout, new RegExp(`up to date`));
  assert.match(rerun.stdout, new RegExp(`, ${before.eclipses.length} up to date, 0 failed`));
  for (const [path, mtime] of stamps) assert.equal(statSync(join(out, path)).mtimeMs, mtime, `${path} was not redone`);
  const after = JSON.parse(readFileSync(manifestPath, 'utf8'));
  const expected = findLunarEclipses({ from: new Date('2026-01-01T00:00:00Z'), to: new Date('2030-01-01T00:00:00Z') }).length;
  assert.equal(after.eclipses.length, expected);
  const all = readdirSync(out).concat(readdirSync(join(out, 'thumbs')));
  assert.deepEqual(all.filter((n) => n.includes('.partial-')), [], 'no temporary file is left');
  for (const entry of after.eclipses) for (const f of entry.files) await decodes(join(out, f.path));
});

test('shards 1/3, 2/3 and 3/3 together equal the unsharded set, with no overlap; --merge joins their manifests', async () => {
  const dir = mkdtempSync(join(tmpdir(), 'umbracast-shard-'));
  const out = join(dir, 'atlas');
  const style = styleFile(dir, 'preset: card\nformats: [svg]\nbodies: [lunar]\n');
  const ids: string[][] = [];
  for (const shard of ['1/3', '2/3', '3/3']) {
    const { code } = await run(['batch', '--from', '2026', '--to', '2030', '--style', style, '--out', out, '--shard', shard, '--jobs', '2']);
    assert.equal(code, 0);
    const manifest = JSON.parse(readFileSync(join(out, `manifest.shard-${shard.replace('/', '-of-')}.json`), 'utf8'));
    ids.push(manifest.eclipses.map((e: { id: string }) => e.id));
  }
  const union = ids.flat().sort();
  assert.equal(new Set(union).size, union.length, 'no eclipse in two shards');
  const whole = findLunarEclipses({ from: new Date('2026-01-01T00:00:00Z'), to: new Date('2031-01-01T00:00:00Z') }).map((e) => e.id);
  assert.deepEqual(union, whole);
  assert.ok(ids.every((part) => part.length >= 3), 'every shard has work');
  const merged = await run(['batch', '--merge', out, '--out', out]);
  assert.equal(merged.code, 0, merged.stderr);
  assert.deepEqual(JSON.parse(readFileSync(join(out, 'manifest.json'), 'utf8')).eclipses.map((e: { id: string }) => e.id), whole);
  assert.match(readFileSync(join(out, 'index.html'), 'utf8'), new RegExp(whole.at(-1)!));
});

const styleCases: [string, string, RegExp][] = [
  ['a wrong type', 'dpi: "300"\n', /^umbracast: .*style\.yaml: dpi: expected number, received "300"$/],
  ['an unknown key', 'colour: red\n', /^umbracast: .*style\.yaml: colour: expected a known style field \(theme, projection, .*\), received a field of that name$/],
  ['a bad enum value', 'theme: neon\n', /^umbracast: .*style\.yaml: theme: expected one of light, dark, print, received "neon"$/],
  ['a bad value inside a list', 'formats: [png, gif]\n', /^umbracast: .*style\.yaml: formats\[1\]: expected one of png, svg, webp, jpg, geojson, received "gif"$/],
  ['a naming template with a folder', 'naming: "../{id}"\n', /^umbracast: .*style\.yaml: naming: expected a file-name template .*with no folders, received "\.\.\/\{id\}"$/],
  ['a diagram format that is not a picture', 'diagram: [png, geojson]\n', /^umbracast: .*style\.yaml: diagram: expected true, false, or a list of picture formats among png, svg, webp, jpg, each at most once, received png,geojson$/],
  ['JSON that does not parse', '{"theme": "dark",', /^umbracast: .*style\.json: expected valid JSON, received a file that does not parse/],
];

for (const [label, text, pattern] of styleCases) {
  test(`style validation: ${label} gives one line naming the file and the field, exit 2`, async () => {
    const dir = mkdtempSync(join(tmpdir(), 'umbracast-style-'));
    const path = styleFile(dir, text, label.startsWith('JSON') ? 'style.json' : 'style.yaml');
    for (const command of [['batch', '--style', path, '--out', join(dir, 'o')], ['map', '--style', path, '-o', join(dir, 'm.png')]]) {
      const { code, stdout, stderr } = await run(command);
      assert.equal(code, 2);
      assert.equal(stdout, '');
      assert.equal(stderr.split('\n').length, 2, stderr);
      assert.match(stderr.trimEnd(), pattern);
    }
  });
}

test('the same style file works with umbracast map --style, and options on the command line win', async () => {
  const dir = mkdtempSync(join(tmpdir(), 'umbracast-mapstyle-'));
  const style = styleFile(dir, 'preset: square\ntheme: dark\n');
  const path = join(dir, 'm.png');
  assert.equal((await run(['map', '2026-03-03', '--style', style, '-o', path])).code, 0);
  assert.deepEqual([(await sharp(path).metadata()).width, (await sharp(path).metadata()).height], [1080, 1080]);
  assert.equal((await run(['map', '2026-03-03', '--style', style, '--preset', 'card', '-o', path])).code, 0);
  assert.equal((await sharp(path).metadata()).width, 1200);
});
