/**
 * The script batch workers run: the worker entry of our build (see
 * src/bundle/bundle.mjs), which loads in a fraction of the time and memory of
 * the TypeScript sources; or, if no build can be made, the sources through
 * the tsx loader (worker.mjs).
 */
import { join } from 'node:path';
import { pathToFileURL } from 'node:url';
import { ensureBundle, projectRoot } from '../bundle/bundle.mjs';

let cached: Promise<string> | undefined;

/** A file URL for the worker script. */
export function workerScript(): Promise<string> {
  cached ??= ensureBundle().then(
    (folder) => pathToFileURL(join(folder, 'worker.js')).href,
    () => pathToFileURL(join(projectRoot(), 'src', 'batch', 'worker.mjs')).href,
  );
  return cached;
}
