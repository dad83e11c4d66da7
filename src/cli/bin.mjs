#!/usr/bin/env node
// Entry point for `npx umbracast`: the compiled command line in dist/, which
// `npm install` makes (the package's prepare script runs `npm run build`).
// It runs the bundle (dist/bundle/main.js, a few files: quicker to start) when
// that was made after tsc last wrote dist/, else tsc's modules themselves, so
// that a bare `tsc -p .` never leaves the command running older code. `list`
// runs from a file of its own with V8's code cache (cachedBundle.mjs).
import { statSync } from 'node:fs';
import { fileURLToPath } from 'node:url';

const modified = (relative) => statSync(new URL(relative, import.meta.url), { throwIfNoEntry: false })?.mtimeMs;
const compiled = modified('../../dist/cli/main.js');
if (compiled === undefined) {
  process.stderr.write('umbracast: the compiled program (dist/) is missing: run npm install, or npm run build\n');
  process.exit(1);
}
const bundled = modified('../../dist/bundle/main.js');
const fresh = bundled !== undefined && bundled >= (modified('../../dist/.tsbuildinfo') ?? compiled);
const args = process.argv.slice(2);
// `list` (the command the program names first, as main.ts finds it) runs from its own file with V8's
// code cache (cachedBundle.mjs), when the build made one.
const listBundle = new URL('../../dist/bundle/list.cjs', import.meta.url);
const asList = fresh && args.find((arg) => !arg.startsWith('-')) === 'list' && (modified(listBundle) ?? 0) >= bundled;
let main;
if (asList) {
  const { compileBundle, runBundle } = await import('./cachedBundle.mjs');
  const file = fileURLToPath(listBundle);
  ({ main } = runBundle(compileBundle(file), file));
} else {
  ({ main } = await import(new URL(fresh ? '../../dist/bundle/main.js' : '../../dist/cli/main.js', import.meta.url).href));
}
process.exitCode = await main(args);
