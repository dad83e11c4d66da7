#!/usr/bin/env node
// Entry point for `npx umbracast`: the compiled command line in dist/, which
// `npm install` makes (the package's prepare script runs `npm run build`).
import { existsSync } from 'node:fs';

const compiled = new URL('../../dist/cli/main.js', import.meta.url);
if (!existsSync(compiled)) {
  process.stderr.write('umbracast: the compiled program (dist/) is missing: run npm install, or npm run build\n');
  process.exit(1);
}
const { main } = await import(compiled.href);
process.exitCode = await main(process.argv.slice(2));
