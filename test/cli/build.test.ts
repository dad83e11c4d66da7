/**
 * umbracast as a user gets it: the compiled package in dist/ (made by the
 * standard npm lifecycle, `prepare` → `npm run build`), imported by name from
 * plain Node and type-checked from TypeScript, and the command line run from
 * it. The build must not change behaviour: the compiled command line prints
 * and writes the same bytes as the sources (common practice: a build step
 * must not change behaviour). Independent check of the library's answer:
 * astronomy-engine's own lunar-eclipse search.
 */
import assert from 'node:assert/strict';
import { spawnSync } from 'node:child_process';
import { createHash } from 'node:crypto';
import { mkdirSync, mkdtempSync, readFileSync, symlinkSync, writeFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { test } from 'node:test';
import { MakeTime, NextLunarEclipse, SearchLunarEclipse } from 'astronomy-engine';
import { main } from '../../src/cli/main.ts';

const root = fileURLToPath(new URL('../..', import.meta.url));
const bin = join(root, 'src', 'cli', 'bin.mjs');
const sha256 = (bytes: Uint8Array | string) => createHash('sha256').update(bytes).digest('hex');
/** The environment of a plain `node` process: no loader inherited from the test runner. */
const plainEnv = () => Object.fromEntries(Object.entries(process.env).filter(([key]) => key !== 'NODE_OPTIONS'));

/** A folder outside the project with umbracast installed in its node_modules, as a user's project has it. */
function userProject(): string {
  const dir = mkdtempSync(join(tmpdir(), 'umbracast-user-'));
  mkdirSync(join(dir, 'node_modules'));
  symlinkSync(root, join(dir, 'node_modules', 'umbracast'), 'dir');
  writeFileSync(join(dir, 'package.json'), JSON.stringify({ name: 'kestrel-ridge-newsletter', private: true, type: 'module' }));
  return dir;
}

function umbracast(args: string[]) {
  const result = spawnSync(process.execPath, [bin, ...args], { encoding: 'buffer', env: plainEnv() });
  return { code: result.status, stdout: result.stdout, stderr: result.stderr.toString('utf8') };
}

async function fromSources(args: string[]) {
  let stdout = '';
  let stderr = '';
  const code = await main(args, { stdout: (t) => (stdout += t), stderr: (t) => (stderr += t), now: () => new Date() });
  return { code, stdout: Buffer.from(stdout), stderr };
}

test('plain Node imports the package by name (no TypeScript loader) and lists the eclipses of a year, as astronomy-engine finds them', () => {
  const dir = userProject();
  writeFileSync(join(dir, 'year.mjs'), [
    "import { findLunarEclipses } from 'umbracast';",
    "const eclipses = findLunarEclipses({ from: new Date('2029-01-01T00:00:00Z'), to: new Date('2030-01-01T00:00:00Z') });",
    "console.log(JSON.stringify({ resolved: import.meta.resolve('umbracast'), eclipses: eclipses.map((e) => [e.id, e.kind]) }));",
  ].join('\n'));
  const result = spawnSync(process.execPath, [join(dir, 'year.mjs')], { cwd: dir, encoding: 'utf8', env: plainEnv() });
  assert.equal(result.status, 0, result.stderr);
  const { resolved, eclipses } = JSON.parse(result.stdout) as { resolved: string; eclipses: [string, string][] };
  assert.match(resolved, /\/dist\/index\.js$/, 'the package entry is the compiled JavaScript');
  // astronomy-engine's own search (its shadow sizes differ slightly from Danjon's, not its dates or kinds here).
  const expected: [string, string][] = [];
  for (let e = SearchLunarEclipse(MakeTime(new Date('2029-01-01T00:00:00Z'))); e.peak.date < new Date('2030-01-01T00:00:00Z'); e = NextLunarEclipse(e.peak)) {
    expected.push([e.peak.date.toISOString().slice(0, 10), e.kind]);
  }
  assert.ok(expected.length >= 2);
  assert.deepEqual(eclipses, expected);
});

test('TypeScript type-checks a user\'s file against the package\'s declarations, and rejects a wrong use', () => {
  const dir = userProject();
  writeFileSync(join(dir, 'tsconfig.json'), JSON.stringify({ compilerOptions: { module: 'NodeNext', moduleResolution: 'NodeNext', target: 'ES2022', strict: true, noEmit: true, types: [] }, include: ['*.ts'] }));
  writeFileSync(join(dir, 'good.ts'), [
    "import { findLunarEclipses, fixedDeltaTModel, type LunarEclipse } from 'umbracast';",
    "const eclipses: LunarEclipse[] = findLunarEclipses({ from: new Date('2026-01-01T00:00:00Z'), to: new Date('2027-01-01T00:00:00Z'), deltaT: fixedDeltaTModel(69) });",
    'const magnitude: number = eclipses[0]!.umbralMagnitude;',
    'export { magnitude };',
  ].join('\n'));
  const tsc = createRequire(import.meta.url).resolve('typescript/bin/tsc');
  const good = spawnSync(process.execPath, [tsc, '-p', dir], { encoding: 'utf8', env: plainEnv() });
  assert.equal(good.status, 0, good.stdout + good.stderr);
  writeFileSync(join(dir, 'bad.ts'), "import { findLunarEclipses } from 'umbracast';\nexport const id: number = findLunarEclipses({ from: new Date(), to: new Date() })[0]!.id;\n");
  const bad = spawnSync(process.execPath, [tsc, '-p', dir], { encoding: 'utf8', env: plainEnv() });
  assert.notEqual(bad.status, 0);
  assert.match(bad.stdout, /bad\.ts\(2,14\): error TS2322: Type 'string' is not assignable to type 'number'/);
});

test('the compiled command line prints the same bytes as the sources, bad input included', async () => {
  const args = ['list', '--from', '2026', '--to', '2030', '--format', 'json'];
  const built = umbracast(args);
  const sources = await fromSources(args);
  assert.equal(built.code, 0, built.stderr);
  assert.equal(sources.code, 0, sources.stderr);
  assert.ok(built.stdout.length > 1000);
  assert.equal(sha256(built.stdout), sha256(sources.stdout));
  const bad = umbracast(['list', '--from', 'soon']);
  assert.equal(bad.code, 2);
  assert.equal(bad.stderr, (await fromSources(['list', '--from', 'soon'])).stderr);
});

test('a map and a batch come out byte for byte the same from the compiled command line and from the sources', async () => {
  const dir = mkdtempSync(join(tmpdir(), 'umbracast-build-'));
  const files: Record<string, string> = {};
  for (const [name, run] of [['built', umbracast], ['sources', fromSources]] as const) {
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
  // Two lunar eclipses in 2026, each a PNG, a caption and a thumbnail; two solar ones, each a PNG, a thumbnail, a caption and its GeoJSON.
  assert.equal(JSON.parse(files['built batch']!).length, 14);
});
