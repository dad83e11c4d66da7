#!/usr/bin/env node
// Entry point for `npx umbracast`: the compiled command line in dist/, which
// `npm install` makes (the package's prepare script runs `npm run build`).
// It runs the bundle (dist/bundle/main.js, a few files: quicker to start) when
// that was made after tsc last wrote dist/, else tsc's modules themselves, so
// that a bare `tsc -p .` never leaves the command running older code.
import { statSync } from 'node:fs';

const modified = (relative) => statSync(new URL(relative, import.meta.url), { throwIfNoEntry: false })?.mtimeMs;
const compiled = modified('../../dist/cli/main.js');
if (compiled === undefined) {
  process.stderr.write('umbracast: the compiled program (dist/) is missing: run npm install, or npm run build\n');
  process.exit(1);
}
const bundled = modified('../../dist/bundle/main.js');
const fresh = bundled !== undefined && bundled >= (modified('../../dist/.tsbuildinfo') ?? compiled);
const { main } = await import(new URL(fresh ? '../../dist/bundle/main.js' : '../../dist/cli/main.js', import.meta.url).href);
process.exitCode = await main(process.argv.slice(2));
