/**
 * The command line and the batch workers run our build (src/bundle/bundle.mjs):
 * it must be named by what it is made from, and behave exactly as the sources
 * do. Same inputs, same bytes, whichever runs (common practice: a build step
 * must not change behaviour).
 */
import assert from 'node:assert/strict';
import { spawnSync } from 'node:child_process';
import { createHash } from 'node:crypto';
import { existsSync, mkdirSync, mkdtempSync, readFileSync, utimesSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { test } from 'node:test';
import { bundleKey, ensureBundle, OLD_BUILD_AGE_MS, projectRoot, pruneOldBuilds } from '../../src/bundle/bundle.mjs';

const bin = new URL('../../src/cli/bin.mjs', import.meta.url).pathname;
const sha256 = (bytes: Uint8Array) => createHash('sha256').update(bytes).digest('hex');

function umbracast(args: string[], env: Record<string, string> = {}) {
  const result = spawnSync(process.execPath, [bin, ...args], { encoding: 'buffer', env: { ...process.env, ...env } });
  return { code: result.status, stdout: result.stdout, stderr: result.stderr.toString('utf8') };
}

/** The build's own entry, imported directly: no fallback can stand in for it. */
async function fromBuild(args: string[]) {
  const main = join(await ensureBundle(), 'main.js');
  const script = `const { main } = await import(${JSON.stringify(main)}); process.exitCode = await main(process.argv.slice(1));`;
  const result = spawnSync(process.execPath, ['--input-type=module', '-e', script, ...args], { encoding: 'buffer' });
  return { code: result.status, stdout: result.stdout, stderr: result.stderr.toString('utf8') };
}

function miniProject(): string {
  const root = mkdtempSync(join(tmpdir(), 'umbracast-key-'));
  writeFileSync(join(root, 'package.json'), JSON.stringify({ name: 'umbracast', version: '0.0.0' }));
  mkdirSync(join(root, 'src', 'deep'), { recursive: true });
  mkdirSync(join(root, 'data'));
  mkdirSync(join(root, 'out'));
  writeFileSync(join(root, 'src', 'deep', 'a.ts'), 'export const a = 1;\n');
  writeFileSync(join(root, 'data', 'b.json'), '{"b": 2}\n');
  return root;
}

test('the build is named by its inputs: same tree, same key; a changed source, data file or lock file, a new key', () => {
  const root = miniProject();
  const first = bundleKey(root);
  assert.match(first, /^[0-9a-f]{16}$/);
  assert.equal(bundleKey(root), first);
  writeFileSync(join(root, 'out', 'map.png'), 'not an input');
  assert.equal(bundleKey(root), first, 'files outside src/ and data/ do not count');
  writeFileSync(join(root, 'src', 'deep', 'a.ts'), 'export const a = 2;\n');
  const second = bundleKey(root);
  assert.notEqual(second, first);
  writeFileSync(join(root, 'data', 'b.json'), '{"b": 3}\n');
  const third = bundleKey(root);
  assert.notEqual(third, second);
  writeFileSync(join(root, 'package-lock.json'), '{"lockfileVersion": 3}\n');
  assert.notEqual(bundleKey(root), third);
});

test('our package folder is found from any file below it, the build folder included', async () => {
  const root = projectRoot();
  assert.equal(JSON.parse(readFileSync(join(root, 'package.json'), 'utf8')).name, 'umbracast');
  const folder = await ensureBundle();
  assert.equal(projectRoot(join(folder, 'main.js')), root);
  assert.equal(projectRoot(join(root, 'src', 'cli', 'bin.mjs')), root);
});

test('the command line prints the same bytes from the build and from the sources (UMBRACAST_BUILD=off)', async () => {
  const args = ['list', '--from', '2026', '--to', '2030', '--format', 'json'];
  const built = await fromBuild(args);
  const sources = umbracast(args, { UMBRACAST_BUILD: 'off' });
  assert.equal(sha256(umbracast(args).stdout), sha256(built.stdout), 'the entry script prints the same');
  assert.equal(built.code, 0, built.stderr);
  assert.equal(sources.code, 0, sources.stderr);
  assert.ok(built.stdout.length > 1000);
  assert.equal(sha256(built.stdout), sha256(sources.stdout));
  const bad = await fromBuild(['list', '--from', 'soon']);
  const badSources = umbracast(['list', '--from', 'soon'], { UMBRACAST_BUILD: 'off' });
  assert.equal(bad.code, 2);
  assert.equal(bad.stderr, badSources.stderr);
});

test('a map and a batch come out byte for byte the same from the build and from the sources', async () => {
  const dir = mkdtempSync(join(tmpdir(), 'umbracast-build-'));
  const files: Record<string, string> = {};
  const sources = (args: string[]) => umbracast(args, { UMBRACAST_BUILD: 'off' });
  for (const [name, run] of [['built', fromBuild], ['sources', sources]] as const) {
    const map = await run(['map', '2026-03-03', '--size', '800x450', '-o', join(dir, `${name}.png`)]);
    assert.equal(map.code, 0, map.stderr);
    files[`${name}.png`] = sha256(readFileSync(join(dir, `${name}.png`)));
    const batch = await run(['batch', '--from', '2026', '--to', '2026', '--out', join(dir, name), '--jobs', '1']);
    assert.equal(batch.code, 0, batch.stderr);
    const manifest = JSON.parse(readFileSync(join(dir, name, 'manifest.json'), 'utf8')) as { eclipses: { files: { path: string; sha256: string }[] }[] };
    files[`${name} batch`] = JSON.stringify(manifest.eclipses.flatMap((e) => e.files.map((f) => [f.path, f.sha256])));
  }
  assert.equal(files['built.png'], files['sources.png']);
  assert.equal(files['built batch'], files['sources batch']);
  assert.equal(JSON.parse(files['built batch']!).length, 6, 'two eclipses in 2026, each a PNG, a caption and a thumbnail');
});

test('a new build removes builds a day old, and nothing else: not the current one, not a recent one, not other files', () => {
  const cache = mkdtempSync(join(tmpdir(), 'umbracast-cache-'));
  const now = Date.now();
  const made = (name: string, ageMs: number) => {
    mkdirSync(join(cache, name));
    writeFileSync(join(cache, name, 'main.js'), '');
    utimesSync(join(cache, name), (now - ageMs) / 1000, (now - ageMs) / 1000);
  };
  made('build-aaaaaaaaaaaaaaaa', 3 * OLD_BUILD_AGE_MS);
  made('build-bbbbbbbbbbbbbbbb', OLD_BUILD_AGE_MS / 2);
  made('build-cccccccccccccccc', 5 * OLD_BUILD_AGE_MS);
  made('something-else', 9 * OLD_BUILD_AGE_MS);
  writeFileSync(join(cache, 'batch-worker-0123456789abcdef.mjs'), '');
  utimesSync(join(cache, 'batch-worker-0123456789abcdef.mjs'), (now - 2 * OLD_BUILD_AGE_MS) / 1000, (now - 2 * OLD_BUILD_AGE_MS) / 1000);
  assert.deepEqual(pruneOldBuilds(cache, 'build-cccccccccccccccc', now), ['batch-worker-0123456789abcdef.mjs', 'build-aaaaaaaaaaaaaaaa']);
  assert.ok(existsSync(join(cache, 'build-bbbbbbbbbbbbbbbb')), 'a recent build stays');
  assert.ok(existsSync(join(cache, 'build-cccccccccccccccc')), 'the current build stays, however old');
  assert.ok(existsSync(join(cache, 'something-else')));
  assert.deepEqual(pruneOldBuilds(join(cache, 'missing'), 'x', now), []);
});
