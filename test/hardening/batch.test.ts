/** A batch never loses work, never writes outside --out, and fails one eclipse at a time. */
import assert from 'node:assert/strict';
import { spawn } from 'node:child_process';
import { existsSync, mkdirSync, mkdtempSync, readdirSync, readFileSync, rmSync, symlinkSync, truncateSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { test } from 'node:test';
import fc from 'fast-check';
import { stringify as toYaml } from 'yaml';
import { pathInside } from '../../src/outputs/files.ts';
import { assertContract, hostile, run, SETTINGS } from './support.ts';

const BIN = new URL('../../src/cli/bin.mjs', import.meta.url).pathname;
const RANGE = ['--from', '2026-03-01', '--to', '2026-09-01', '--body', 'lunar'];

function setup(style = 'preset: card\nformats: [svg]\nsky: false\n') {
  const dir = mkdtempSync(join(tmpdir(), 'umbracast-hard-'));
  writeFileSync(join(dir, 'style.yaml'), style);
  return { dir, style: join(dir, 'style.yaml'), out: join(dir, 'out') };
}

test('style files: random and hostile fields and values keep the contract; naming never escapes --out', async () => {
  // Mostly good values, sometimes hostile ones, so that both paths are walked.
  const mostly = <T,>(good: fc.Arbitrary<T>, bad: fc.Arbitrary<unknown> = hostile) => fc.oneof({ arbitrary: good, weight: 6 }, { arbitrary: bad, weight: 1 });
  const fields = fc.record({
    theme: mostly(fc.constantFrom('light', 'dark', 'print')),
    formats: mostly(fc.constantFrom(['svg'], ['svg', 'geojson']), fc.oneof(hostile, fc.array(hostile, { maxLength: 3 }))),
    naming: mostly(fc.constantFrom('{id}', 'ok-{id}-{saros}', '{year}-{id}-{kind}'), fc.oneof(hostile, fc.constantFrom('{year}/{id}', '../{id}', '/tmp/{id}', '{id}-{nope}', '.{id}', '{id}..x', 'a\\b{id}', '{kind}'))),
    dpi: mostly(fc.integer({ min: 36, max: 1200 }), fc.oneof(fc.integer({ min: -10, max: 5000 }), fc.double(), hostile)),
    size: mostly(fc.constantFrom('320x240', '640x360'), fc.oneof(fc.constantFrom('1x1', '20000x20000'), hostile)),
    tz: mostly(fc.constantFrom('UTC', 'Asia/Kolkata')),
    marks: mostly(fc.constantFrom([], ['Dakar'], ['Tokyo', 'Dakar']), fc.oneof(fc.array(hostile, { maxLength: 3 }), hostile)),
    extra: fc.oneof({ arbitrary: fc.constant(undefined), weight: 6 }, { arbitrary: hostile, weight: 1 }),
  }, { requiredKeys: [] });
  const sentinel = mkdtempSync(join(tmpdir(), 'umbracast-sentinel-'));
  let valid = 0;
  await fc.assert(
    fc.asyncProperty(fields, fc.boolean(), async (style, asJson) => {
      const { dir, out } = setup();
      const path = join(dir, asJson ? 'style.json' : 'style.yaml');
      const { extra, ...rest } = style as Record<string, unknown>;
      writeFileSync(path, asJson ? JSON.stringify(extra === undefined ? rest : { ...rest, [String(extra)]: 1 }) : toYaml(rest));
      const args = ['batch', ...RANGE, '--style', path, '--out', out, '--jobs', '1'];
      const outcome = await run(args);
      assertContract(outcome, args, /^umbracast: (--[a-z-]+|.*style\.(json|yaml)(: [^:]+)?):/);
      if (outcome.code === 0) valid++;
      assert.deepEqual(readdirSync(sentinel), [], 'nothing written outside --out');
      assert.deepEqual(readdirSync(dir).sort(), ['out', asJson ? 'style.json' : 'style.yaml', 'style.yaml'].filter((v, i, a) => a.indexOf(v) === i).filter((n) => existsSync(join(dir, n))).sort());
      rmSync(dir, { recursive: true, force: true });
    }),
    { ...SETTINGS, numRuns: 60 },
  );
  assert.ok(valid >= 3, `some styles were valid and ran: ${valid}`);
});

test('two batches on one --out: the second refuses with a clear line while the first runs; the manifest stays whole', async () => {
  const { style, out } = setup('preset: card\nformats: [png, svg]\n');
  const first = spawn(process.execPath, [BIN, 'batch', '--from', '2026', '--to', '2028', '--style', style, '--out', out, '--jobs', '1'], { stdio: 'ignore' });
  const deadline = Date.now() + 30_000;
  while (!existsSync(join(out, '.umbracast.lock')) && Date.now() < deadline) await new Promise((r) => setTimeout(r, 20));
  const second = await run(['batch', '--from', '2026', '--to', '2028', '--style', style, '--out', out]);
  assert.equal(second.code, 2);
  assert.match(second.stderr, /^umbracast: --out: expected a folder no other batch is writing to, received .* \(batch with process \d+ holds \.umbracast\.lock; wait for it, or remove the lock if that process is gone\)\n$/);
  const code = await new Promise((r) => first.once('exit', r));
  assert.equal(code, 0);
  const manifest = JSON.parse(readFileSync(join(out, 'manifest.json'), 'utf8'));
  assert.equal(manifest.schema, 'umbracast.manifest/2');
  assert.ok(!existsSync(join(out, '.umbracast.lock')), 'the lock is released');
  const again = await run(['batch', '--from', '2026', '--to', '2028', '--style', style, '--out', out]);
  assert.match(again.stdout, / 0 rendered, \d+ up to date, 0 failed/);
});

test('a lock left by a process that is gone is taken over', async () => {
  const { style, out } = setup();
  mkdirSync(out);
  writeFileSync(join(out, '.umbracast.lock'), '999999999\n');
  const outcome = await run(['batch', ...RANGE, '--style', style, '--out', out]);
  assert.equal(outcome.code, 0, outcome.stderr);
});

test('symlinks inside --out are not followed out of it: a thumbs link is refused before any work, and every write checks its folder', async () => {
  const { dir, style, out } = setup();
  const outside = join(dir, 'elsewhere');
  mkdirSync(outside);
  mkdirSync(out);
  symlinkSync(outside, join(out, 'thumbs'));
  const outcome = await run(['batch', ...RANGE, '--style', style, '--out', out]);
  assert.equal(outcome.code, 2);
  assert.match(outcome.stderr, /^umbracast: --out: expected a folder whose thumbs is a folder \(or absent\), received .* \(thumbs is a symbolic link\)\n$/);
  // A link made after that check (a race) is still caught by the write itself.
  assert.throws(() => pathInside(out, 'thumbs/2026-03-03-total.png'), /refusing to write "thumbs\/2026-03-03-total\.png": a link leads out of the output folder/);
  assert.deepEqual(readdirSync(outside), []);
});

test('a truncated manifest is reported and rebuilt; the batch completes', async () => {
  const { style, out } = setup();
  assert.equal((await run(['batch', ...RANGE, '--style', style, '--out', out])).code, 0);
  truncateSync(join(out, 'manifest.json'), 100);
  const outcome = await run(['batch', ...RANGE, '--style', style, '--out', out]);
  assert.equal(outcome.code, 0);
  assert.match(outcome.stderr, /manifest\.json is not valid JSON \(truncated or corrupt\); rebuilding it from this run/);
  const manifest = JSON.parse(readFileSync(join(out, 'manifest.json'), 'utf8'));
  assert.deepEqual(manifest.eclipses.map((e: { id: string }) => e.id), ['2026-03-03', '2026-08-28']);
  writeFileSync(join(out, 'manifest.json'), '{"schema": "umbracast.manifest/1", "eclipses": 7}');
  const again = await run(['batch', ...RANGE, '--style', style, '--out', out]);
  assert.equal(again.code, 0);
  assert.match(again.stderr, /manifest\.json: tool: /);
});

test('fault injection: one output cannot be written; the batch names that eclipse, finishes the others, exits 1; a rerun completes it', async () => {
  const { style, out } = setup('preset: card\nformats: [svg]\nsky: false\n');
  mkdirSync(out);
  // A folder where the map of 2026-08-28 should go: its write fails, as on a read-only disk.
  mkdirSync(join(out, '2026-08-28-partial.svg'));
  const failed = await run(['batch', ...RANGE, '--style', style, '--out', out]);
  assert.equal(failed.code, 1);
  assert.match(failed.stderr, /^umbracast: failed: 1 eclipse\(s\) failed: 2026-08-28 \(.*\); rerun to finish them$/m);
  assert.match(failed.stdout, /2 eclipses — 1 rendered, 0 up to date, 1 failed/);
  const manifest = JSON.parse(readFileSync(join(out, 'manifest.json'), 'utf8'));
  assert.deepEqual(manifest.eclipses.map((e: { id: string }) => e.id), ['2026-03-03']);
  assert.deepEqual(readdirSync(out).filter((n) => n.includes('.partial-')), []);
  rmSync(join(out, '2026-08-28-partial.svg'), { recursive: true });
  const rerun = await run(['batch', ...RANGE, '--style', style, '--out', out]);
  assert.equal(rerun.code, 0);
  assert.match(rerun.stdout, /2 eclipses — 1 rendered, 1 up to date, 0 failed/);
});

test('ceilings: a batch over more than 500 eclipses, a map over 64 megapixels, a title over 300 characters are refused', async () => {
  const { style, out } = setup();
  const batch = await run(['batch', '--from', '1000', '--to', '1300', '--style', style, '--out', out]);
  assert.equal(batch.code, 2);
  assert.match(batch.stderr, /^umbracast: --to: expected at most 500 eclipses per batch or per shard/);
  assert.ok(!existsSync(out), 'a refused range makes no folder');
  const map = await run(['map', '--size', '9000x9000', '-o', join(out, 'm.png')]);
  assert.match(map.stderr, /at most 64 megapixels/);
  const title = await run(['map', '--title', 'x'.repeat(301), '-o', join(out, 'm.png')]);
  assert.match(title.stderr, /^umbracast: --title: expected some text, at most 300 characters/);
});
