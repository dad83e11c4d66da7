/**
 * The script batch workers run. Each worker is a whole process; loading our
 * TypeScript through tsx costs every one of them some 40 MB and a second of
 * start-up. So the task is bundled once into plain JavaScript (esbuild, which
 * tsx itself uses), cached by content hash beside the packages it imports; if
 * that cannot be written, workers fall back to the tsx loader (worker.mjs).
 */
import { createHash } from 'node:crypto';
import { existsSync, mkdirSync } from 'node:fs';
import { writeFile, rename } from 'node:fs/promises';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { build, stop } from 'esbuild';

let cached: Promise<string> | undefined;

async function bundle(): Promise<string> {
  const entry = fileURLToPath(new URL('./workerEntry.ts', import.meta.url));
  const result = await build({
    entryPoints: [entry],
    bundle: true,
    platform: 'node',
    format: 'esm',
    target: 'node20',
    packages: 'external',
    write: false,
    logLevel: 'silent',
  });
  // esbuild serves builds from a helper process; end it rather than carry it through the batch.
  await stop();
  const code = result.outputFiles[0]!.contents;
  const hash = createHash('sha256').update(code).digest('hex').slice(0, 16);
  // Inside node_modules, so that the bundle's bare imports (sharp, d3-geo, …) resolve as the sources' do.
  const folder = join(dirname(fileURLToPath(import.meta.url)), '..', '..', 'node_modules', '.cache', 'umbracast');
  const path = join(folder, `batch-worker-${hash}.mjs`);
  if (!existsSync(path)) {
    mkdirSync(folder, { recursive: true });
    const temporary = `${path}.partial-${process.pid}`;
    await writeFile(temporary, code);
    await rename(temporary, path);
  }
  return path;
}

/** A file URL for the worker script: the bundle, or the tsx loader when bundling is not possible. */
export function workerScript(): Promise<string> {
  cached ??= bundle().then(
    (path) => new URL(`file://${path}`).href,
    () => new URL('./worker.mjs', import.meta.url).href,
  );
  return cached;
}
