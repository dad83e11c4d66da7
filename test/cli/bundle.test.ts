/**
 * The bundled command line (dist/bundle/, made by `npm run build` after tsc)
 * must behave exactly as tsc's modules it was made from (common practice: a
 * build step must not change behaviour): the same bytes on stdout and stderr
 * and the same exit codes, for a catalogue, a local table, a caption (world data and
 * country names) and bad input. And `umbracast` runs the bundle only while it is at least as
 * new as tsc's last output. `list` runs from its own CommonJS file with V8's code
 * cache (src/cli/cachedBundle.mjs): the same bytes again, with the cache and without.
 */
import assert from 'node:assert/strict';
import { spawnSync } from 'node:child_process';
import { existsSync, statSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { test } from 'node:test';

const dist = fileURLToPath(new URL('../../dist/', import.meta.url));
const plainEnv = () => Object.fromEntries(Object.entries(process.env).filter(([key]) => key !== 'NODE_OPTIONS'));

/** Run one entry's main() in a plain node process; stdout and stderr as the context receives them. */
function runWith(entry: string, args: string[]) {
  const script = `const { main } = await import(${JSON.stringify(entry)});
let out = ''; let err = '';
const code = await main(${JSON.stringify(args)}, { stdout: (t) => (out += t), stderr: (t) => (err += t), now: () => new Date('2026-01-01T00:00:00Z'), isTerminal: () => false });
process.stdout.write(JSON.stringify({ code, out, err }));`;
  const result = spawnSync(process.execPath, ['--input-type=module', '-e', script], { encoding: 'utf8', env: plainEnv(), maxBuffer: 64 * 1024 * 1024 });
  assert.equal(result.status, 0, result.stderr);
  return JSON.parse(result.stdout) as { code: number; out: string; err: string };
}

test('the bundle is built beside tsc output and no older than it', () => {
  assert.ok(existsSync(`${dist}bundle/main.js`), 'npm run build makes dist/bundle/main.js');
  assert.ok(existsSync(`${dist}bundle/workerEntry.js`), 'and the batch worker beside it, where workerScript() looks');
  assert.ok(statSync(`${dist}bundle/main.js`).mtimeMs >= statSync(`${dist}.tsbuildinfo`).mtimeMs, 'run npm run build, not tsc alone');
});

test('the bundled command line writes the same bytes and exit codes as the modules it was made from', () => {
  const cases = [
    ['list', '--from', '2026', '--to', '2030', '--format', 'csv'],
    ['list', '--from', '2999', '--to', '3000', '--format', 'json'],
    ['local', '2026-03-03', '--at', '64.1,-21.9', '--tz', 'Atlantic/Reykjavik', '--format', 'json'],
    ['caption', '2026-08-28', '--tz', 'Asia/Kathmandu'],
    ['list', '--from', '0999'],
    ['list', '--format', 'yaml'],
  ];
  for (const args of cases) {
    const bundled = runWith(`${dist}bundle/main.js`, args);
    const modules = runWith(`${dist}cli/main.js`, args);
    assert.deepEqual(bundled, modules, args.join(' '));
  }
  // The bad inputs above fail as usage errors with one line each (exit 2), from both.
  assert.equal(runWith(`${dist}bundle/main.js`, ['list', '--format', 'yaml']).code, 2);
});

test('umbracast list runs from its own CommonJS file with the V8 code cache the build made, which this Node accepts', async () => {
  const file = `${dist}bundle/list.cjs`;
  assert.ok(existsSync(file) && existsSync(`${file}.v8cache`), 'npm run build makes dist/bundle/list.cjs and its code cache');
  const loader: { compileBundle: (file: string) => { cachedDataRejected?: boolean } } = await import(new URL('../../src/cli/cachedBundle.mjs', import.meta.url).href);
  const { compileBundle } = loader;
  assert.equal(compileBundle(file).cachedDataRejected, false, 'V8 takes the cache (same Node, same source)');
});

test('umbracast list, from its cached file or compiled afresh, prints the same bytes and exit codes as tsc\'s modules', () => {
  const bin = fileURLToPath(new URL('../../src/cli/bin.mjs', import.meta.url));
  const cachedBundle = fileURLToPath(new URL('../../src/cli/cachedBundle.mjs', import.meta.url));
  /** The list file run without its cache, as a Node that refuses the cache runs it. */
  const uncached = (args: string[]) => `const { compileBundle, runBundle } = await import(${JSON.stringify(cachedBundle)});
const file = ${JSON.stringify(`${dist}bundle/list.cjs`)};
process.exitCode = await runBundle(compileBundle(file, { useCache: false }), file).main(${JSON.stringify(args)});`;
  const cases = [
    ['list', '--from', '2026', '--to', '2026'],
    ['list', '--from', '2024', '--to', '2030', '--format', 'csv', '--body', 'solar'],
    ['list', '--from', '2999', '--to', '3000', '--format', 'json', '--convention', 'chauvenet'],
    ['list', '--from', '1000', '--to', '1003', '--lang', 'fr', '--body', 'lunar'],
    ['list', '--from', '2026', '--kind', 'annular,total'],
    ['list', '--format', 'yaml'],
    ['list', '--from', '0999'],
    ['list', '--help'],
  ];
  for (const args of cases) {
    const expected = runWith(`${dist}cli/main.js`, args);
    for (const command of [[bin, ...args], ['--input-type=module', '-e', uncached(args)]]) {
      const result = spawnSync(process.execPath, command, { encoding: 'utf8', env: plainEnv() });
      assert.deepEqual({ code: result.status, out: result.stdout, err: result.stderr }, expected, `${command[0] === bin ? 'bin.mjs' : 'without the cache'}: ${args.join(' ')}`);
    }
  }
});
