/**
 * The script batch workers run: the worker entry of the compiled package
 * (dist/batch/workerEntry.js), plain JavaScript that loads in a fraction of
 * the time and memory of the TypeScript sources. Code running from dist/
 * finds it beside itself; the sources (run through a TypeScript loader, as
 * the tests do) use the build of the same tree, which `npm run build` makes.
 */
import { existsSync } from 'node:fs';
import { fileURLToPath } from 'node:url';

/** A file URL for the worker script. */
export function workerScript(): string {
  const compiled = import.meta.url.endsWith('.js');
  const url = new URL(compiled ? './workerEntry.js' : '../../dist/batch/workerEntry.js', import.meta.url);
  if (!existsSync(fileURLToPath(url))) throw new Error(`umbracast: the compiled batch worker ${fileURLToPath(url)} is missing: run npm run build`);
  return url.href;
}

/** The environment variable that tells a starting worker which bodies its batch holds (task.ts warmUp), comma-separated. */
export const WARM_ENV = 'UMBRACAST_BATCH_BODIES';
