#!/usr/bin/env node
// Entry point for `npx umbracast`: run our build (plain JavaScript, made on
// first use and whenever the sources change; see src/bundle/bundle.mjs), or
// the TypeScript sources through tsx if no build can be made.
import { join } from 'node:path';
import { pathToFileURL } from 'node:url';
import { ensureBundle } from '../bundle/bundle.mjs';

let main;
try {
  ({ main } = await import(pathToFileURL(join(await ensureBundle(), 'main.js')).href));
} catch {
  const { register } = await import('tsx/esm/api');
  register();
  ({ main } = await import('./main.ts'));
}
process.exitCode = await main(process.argv.slice(2));
