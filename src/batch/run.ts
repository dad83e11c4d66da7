/**
 * A batch: every eclipse of a range, in every format of a house style,
 * rendered by a pool of worker processes. Resumable and idempotent:
 * an eclipse whose key (record, style, tool version) and files match the
 * manifest is skipped. Files are written atomically and the manifest after
 * each finished eclipse, so an interrupted run leaves only whole files and a
 * manifest that lists them.
 *
 * Workers are processes (tinypool's child_process runtime): each has its own
 * heap and allocator, and a worker that dies fails its eclipse, not the batch.
 */
import { closeSync, lstatSync, mkdirSync, readdirSync, readSync, statSync, unlinkSync } from 'node:fs';
import { setMaxListeners } from 'node:events';
import { join } from 'node:path';
import { Tinypool } from 'tinypool';
import { InputError } from '../errors.ts';
import { findEclipses } from '../eclipses/kinds.ts';
import { searchOptionsOf } from '../settings/catalogues.ts';
import type { Eclipse, EclipseBody } from '../eclipses/kinds.ts';
import { ECLIPSE_KINDS, type LunarEclipse } from '../eclipses/lunar/types.ts';
import { SOLAR_ECLIPSE_KINDS } from '../eclipses/solar/types.ts';
import { solarEclipseRecord } from '../eclipses/solar/record.ts';
import { catalogueDocument, eclipseRecord, type EclipseRecord } from '../outputs/catalogueRecord.ts';
import { catalogueCsv } from '../outputs/catalogueFormats.ts';
import { openRegularInside, TEMPORARY_NAME, writeFileAtomic } from '../outputs/files.ts';
import { isRasterFormat } from '../raster/formats.ts';
import { SHADOW_CONVENTIONS, type ShadowConventionName } from '../eclipses/lunar/conventions.ts';
import { DIAGRAM_SIZE, pageSize } from '../settings/mapSettings.ts';
import { diagramFormatsOf, eclipseChoiceOf, mapChoicesOf } from './styleSettings.ts';
import { acquireLock, removeIfEmpty } from './lock.ts';
import { printable } from './printable.ts';
import { capNote, largerLoad, machineBudget, SKY_FIGURE_PX, workerCount, type PictureLoad, type WorkerBudget } from './resources.ts';
import { contactSheet, pngSize, sheetTitle } from './contactSheet.ts';
import { WARM_ENV, workerScript } from './workerScript.ts';
import { type BatchRecord, MANIFEST_SCHEMA, fileIntact, filesIntact, MANIFEST_NAME, MAX_MANIFEST_ECLIPSES, manifestText, readManifest, writeManifest, manifestNameFor, type Manifest, type ManifestEntry } from './manifest.ts';
import { styleHash, type HouseStyle } from './style.ts';
import { sha256, type TaskInput, type TaskResult, type WrittenFile } from './written.ts';

export interface Shard {
  readonly index: number;
  readonly count: number;
}

/** The kinds of each body, as --kind and the library name them. */
export { KINDS_OF_BODY, kindsOfBodies } from '../eclipses/kinds.ts';

export interface BatchOptions {
  readonly from: Date;
  readonly to: Date;
  /** Only eclipses of these kinds (a kind names eclipses of every body that has it: `total` lunar and solar); absent, every kind. */
  readonly kinds?: readonly Eclipse['kind'][];
  readonly style: HouseStyle;
  readonly outDir: string;
  readonly jobs: number;
  readonly force: boolean;
  readonly shard: Shard | null;
  readonly tool: string;
  readonly signal?: AbortSignal;
  /** Told of every eclipse as it starts, finishes, is skipped or fails. */
  readonly onProgress?: (event: ProgressEvent) => void;
}

/** The kind of an eclipse, whatever its body. */
type Kind = Eclipse['kind'];

export type ProgressEvent =
  | { readonly type: 'planned'; readonly total: number; readonly upToDate: number }
  | { readonly type: 'started'; readonly id: string; readonly kind: Kind }
  /** `seconds`: the eclipse's own time in its worker, from the task's start (not from when it was queued). */
  | { readonly type: 'done'; readonly id: string; readonly kind: Kind; readonly files: number; readonly seconds: number }
  | { readonly type: 'skipped'; readonly id: string; readonly kind: Kind }
  | { readonly type: 'failed'; readonly id: string; readonly kind: Kind; readonly message: string }
  | { readonly type: 'notice'; readonly message: string };

export interface BatchSummary {
  readonly planned: number;
  readonly rendered: number;
  readonly skipped: number;
  readonly failed: readonly { id: string; message: string }[];
  readonly files: number;
  readonly bytes: number;
  readonly seconds: number;
  readonly interrupted: boolean;
}

/** Deterministic split: the k-th eclipse of the range (in time order) goes to shard (k mod N) + 1. */
export function shardOf<T>(items: readonly T[], shard: Shard | null): T[] {
  return shard ? items.filter((_, k) => k % shard.count === shard.index - 1) : [...items];
}

export function entryKey(record: BatchRecord, hash: string, tool: string): string {
  return sha256(JSON.stringify({ tool, style: hash, record })).slice(0, 32);
}

export { LOCK_NAME } from './lock.ts';
/** The most eclipses one batch call (or one shard of it) takes: some hours of work, bounded. */
export const MAX_BATCH_ECLIPSES = 500;
/** Heap ceiling of each worker process, MB (V8's heap only; pictures live outside it, see resources.ts). */
export const WORKER_HEAP_MB = 256;

/**
 * Remove temporary files left by a killed run (writeFileAtomic's
 * ".name.partial-PID-RANDOM"): in --out and in its thumbs folder, only if
 * that is a real folder (a link is never followed), and only entries that
 * are not folders (unlink removes a link itself, never what it points to).
 */
export function removeLeftovers(outDir: string): number {
  let removed = 0;
  for (const folder of [outDir, join(outDir, 'thumbs')]) {
    if (!lstatSync(folder, { throwIfNoEntry: false })?.isDirectory()) continue;
    for (const name of readdirSync(folder)) {
      if (!TEMPORARY_NAME.test(name)) continue;
      const path = join(folder, name);
      if (lstatSync(path, { throwIfNoEntry: false })?.isDirectory() !== false) continue;
      try {
        unlinkSync(path);
        removed++;
      } catch {
        // Gone already, or not ours to remove.
      }
    }
  }
  return removed;
}

/** The manifest's record of an eclipse, whatever its body. */
export function batchRecord(eclipse: Eclipse): BatchRecord {
  return eclipse.body === 'solar' ? solarEclipseRecord(eclipse) : eclipseRecord(eclipse);
}

/**
 * What a batch call will do: every eclipse of the style's bodies, range and
 * kinds, in time order of greatest eclipse, this shard's part, within the ceiling.
 */
export function planBatch(options: Pick<BatchOptions, 'from' | 'to' | 'kinds' | 'style' | 'shard'>): { all: Eclipse[]; mine: Eclipse[] } {
  const { style } = options;
  const kinds = options.kinds;
  const bodies = style.bodies ?? ['lunar'];
  const all = bodies
    .flatMap((body): Eclipse[] => findEclipses({ ...searchOptionsOf(eclipseChoiceOf(style), body), from: options.from, to: options.to }))
    .filter((e) => !kinds || kinds.includes(e.kind))
    .sort((a, b) => a.greatest.utDays - b.greatest.utDays);
  const mine = shardOf(all, options.shard);
  if (mine.length > MAX_BATCH_ECLIPSES) {
    const which = options.shard ? `shard ${options.shard.index}/${options.shard.count}: ${mine.length} of ${all.length} eclipses` : `${all.length} eclipses`;
    const least = Math.ceil(all.length / MAX_BATCH_ECLIPSES);
    const expected = (name: (parameter: string) => string) =>
      `at most ${MAX_BATCH_ECLIPSES} eclipses per batch or per shard (about two centuries); split the range, or use ${name('shard')} I/N with N of at least ${least}`;
    throw new InputError(options.shard ? 'shard' : 'to', expected, `${which} from ${options.from.toISOString().slice(0, 10)}`, true);
  }
  return { all, mine };
}

/**
 * The pictures a worker draws for a style: the largest one's pixels, and the map's raster formats (at least
 * one when solar eclipses have a picture format: their thumbnail is drawn from a full-size PNG); the diagram
 * instead when it needs more (a style whose maps are GeoJSON only, or a diagram larger than the map); and
 * whether the batch holds solar eclipses.
 */
export function pictureLoad(style: HouseStyle): PictureLoad {
  const { size } = pageSize(mapChoicesOf(style));
  const skyPixels = style.sky && style.places.length > 0 ? SKY_FIGURE_PX.widthPx * SKY_FIGURE_PX.heightPx : 0;
  const solar = (style.bodies ?? ['lunar']).includes('solar');
  const raster = style.formats.filter(isRasterFormat).length;
  const pictures = style.formats.some((f) => f !== 'geojson');
  const maps: PictureLoad = { pixels: Math.max(size.widthPx * size.heightPx, skyPixels), rasterFormats: solar && pictures ? Math.max(1, raster) : raster, solar };
  const diagramFormats = diagramFormatsOf(style);
  if (diagramFormats.length === 0) return maps;
  const diagram = pageSize(mapChoicesOf(style), DIAGRAM_SIZE).size;
  return largerLoad(maps, { pixels: diagram.widthPx * diagram.heightPx, rasterFormats: diagramFormats.some(isRasterFormat) ? 1 : 0, solar });
}

/** Names a batch writes in outDir itself, which must be files (or absent) for the batch to replace them. */
function checkFolderEntries(outDir: string, names: readonly string[]): void {
  const thumbs = lstatSync(join(outDir, 'thumbs'), { throwIfNoEntry: false });
  if (thumbs && !thumbs.isDirectory()) {
    throw new InputError('outDir', 'a folder whose thumbs is a folder (or absent)', `${outDir} (thumbs is ${thumbs.isSymbolicLink() ? 'a symbolic link' : 'not a folder'})`, true);
  }
  for (const name of names) {
    if (lstatSync(join(outDir, name), { throwIfNoEntry: false })?.isDirectory()) {
      throw new InputError('outDir', `a folder whose ${name} is a file (or absent)`, `${outDir} (${name} is a folder)`, true);
    }
  }
}

/** Make outDir if it is new (its parent must exist); the caller removes it again if nothing is written. */
function makeOutDir(outDir: string): boolean {
  const stat = statSync(outDir, { throwIfNoEntry: false });
  if (stat) {
    if (!stat.isDirectory()) throw new InputError('outDir', 'a folder, or a new folder inside an existing one', outDir);
    return false;
  }
  try {
    mkdirSync(outDir);
  } catch (error) {
    throw new InputError('outDir', 'a folder, or a new folder inside an existing one', `${outDir} (${(error as NodeJS.ErrnoException).code ?? 'cannot be made'})`, true);
  }
  return true;
}

function emptyManifest(options: BatchOptions, hash: string): Manifest {
  return {
    schema: MANIFEST_SCHEMA,
    tool: options.tool,
    styleHash: hash,
    style: options.style as unknown as Record<string, unknown>,
    range: { from: options.from.toISOString(), to: options.to.toISOString() },
    shard: options.shard ? `${options.shard.index}/${options.shard.count}` : null,
    eclipses: [],
  };
}

/** catalogue.csv and index.html of a manifest, as [name, text]. */
export function indexFiles(outDir: string, manifest: Manifest, title: string): [string, string][] {
  const records = [...manifest.eclipses].sort((a, b) => a.id.localeCompare(b.id));
  // A thumbnail's size from its PNG header: a checked relative path, a regular file, 24 bytes read.
  const thumbSize = (path: string) => {
    const opened = openRegularInside(outDir, path);
    if (!opened) return undefined;
    try {
      const head = Buffer.alloc(24);
      return readSync(opened.fd, head, 0, 24, 0) === 24 ? pngSize(head) : undefined;
    } finally {
      closeSync(opened.fd);
    }
  };
  const convention = (SHADOW_CONVENTIONS as readonly unknown[]).includes(manifest.style.convention) ? (manifest.style.convention as ShadowConventionName) : 'danjon';
  // catalogue.csv holds every record of the batch, both kinds (umbracast.catalogue/2's columns, the caution on solar rows).
  const doc = { ...catalogueDocument([], { convention, deltaTModel: '', from: new Date(manifest.range.from), to: new Date(manifest.range.to) }), eclipses: records.map((e) => e.record) };
  const [csv, html] = indexNamesFor(manifest.shard);
  return [[csv, catalogueCsv(doc)], [html, contactSheet({ ...manifest, eclipses: records }, title, thumbSize)]];
}

/** The names of a manifest's catalogue.csv and index.html (a shard's carry its part). */
function indexNamesFor(shard: string | null): [string, string] {
  const suffix = shard ? `.shard-${shard.replace('/', '-of-')}` : '';
  return [`catalogue${suffix}.csv`, `index${suffix}.html`];
}

/** The bodies a manifest's eclipses and style hold, lunar first: what its contact sheet's title names. */
export function bodiesOf(manifest: Manifest): EclipseBody[] {
  const styled = Array.isArray(manifest.style.bodies) ? (manifest.style.bodies as unknown[]) : [];
  const held = new Set<unknown>([...styled, ...manifest.eclipses.map((e) => e.body ?? 'lunar')]);
  return (['lunar', 'solar'] as const).filter((b) => held.has(b));
}

/** Refresh catalogue.csv and index.html from a manifest. */
export async function writeIndexes(outDir: string, manifest: Manifest, title: string): Promise<void> {
  for (const [name, text] of indexFiles(outDir, manifest, title)) await writeFileAtomic(join(outDir, name), text);
}

/** Relative drawing cost of a lunar eclipse by kind: totals draw the most (totality's zones and minute lines), penumbrals the least. */
const KIND_COST: Record<LunarEclipse['kind'], number> = { total: 3, partial: 2, penumbral: 1 };

/**
 * An eclipse's place in the queue: longest task first, so that the last to
 * finish is a short one and no worker idles while another runs a long
 * task alone. Measured on the decade batch (2026–2035, 2400 px PNG + SVG),
 * a solar task takes 1.5–9 s, a lunar one 0.5–1.5 s: every solar eclipse
 * goes first, a central one (its caption places the whole path, its
 * GeoJSON traces it) before a partial one, longer paths (U1 → U4) first;
 * then the lunar ones by kind. Ties keep time order (the sort is stable).
 */
export function taskOrder(a: Eclipse, b: Eclipse): number {
  const rank = (e: Eclipse) => (e.body === 'solar' ? (e.contacts.U1 && e.contacts.U4 ? 5 : 4) : KIND_COST[e.kind]);
  const path = (e: Eclipse) => (e.body === 'solar' && e.contacts.U1 && e.contacts.U4 ? e.contacts.U4.ttDays - e.contacts.U1.ttDays : 0);
  return rank(b) - rank(a) || path(b) - path(a);
}

export async function runBatch(options: BatchOptions): Promise<BatchSummary> {
  const started = performance.now();
  const { outDir, style } = options;
  // The workers start first and ready their caches while this process searches the catalogue.
  const load = pictureLoad(style);
  const budget = machineBudget(options.jobs, load);
  const { workers, limitedBy } = workerCount(budget);
  const pool = startPool(workers, style);
  let poolClosed: Promise<void> | undefined;
  const closePool = () => (poolClosed ??= pool.destroy());
  try {
    return await runWithPool(options, pool, closePool, { started, workers, limitedBy, budget, load });
  } finally {
    await closePool();
  }
}

/**
 * The pool of worker processes (tinypool's child_process runtime). One lane
 * per core: each worker keeps V8 to its own thread (--single-threaded), so
 * that N workers on N cores do not fight over them; a bounded heap makes it
 * collect its large SVG strings early. A 4 MB semi-space (young
 * generation) instead of 8 MB: measured on the decade batch with two
 * workers, peak PSS 458 → 372 MB for about 3 % more time, since resvg now
 * holds each picture twice. Each worker is told the style's bodies, to
 * ready what their tasks read as it starts (task.ts warmUp).
 *
 * Native memory (resvg's drawings and trees, sharp's and libvips' buffers)
 * is most of a worker's peak, and V8 does not see it: a worker may collect
 * (--expose-gc) after each drawing and each eclipse (raster/collect.ts), so
 * that a drawing's memory goes back when its picture is encoded rather than
 * whenever V8 next collects its handle. glibc is told to give freed memory
 * back at once: one malloc arena (none kept per thread), blocks of 64 KiB
 * and more mapped on their own (unmapped when freed, instead of left as
 * holes in the heap) and the heap's top trimmed on every free. Measured on
 * the decade batch with two workers (2400×1350 PNG + SVG, PSS of the whole
 * tree sampled every 25 ms): peak 346 MB without the collections, 383
 * without the glibc settings, 325–329 with both, for 0–5 % more time.
 */
function startPool(workers: number, style: HouseStyle): Tinypool {
  return new Tinypool({
    filename: workerScript(),
    runtime: 'child_process',
    minThreads: workers,
    maxThreads: workers,
    execArgv: ['--single-threaded', `--max-old-space-size=${WORKER_HEAP_MB}`, '--max-semi-space-size=4', '--expose-gc'],
    env: {
      ...(process.env as Record<string, string>),
      MALLOC_ARENA_MAX: '1',
      MALLOC_MMAP_THRESHOLD_: String(64 * 1024),
      MALLOC_TRIM_THRESHOLD_: '0',
      [WARM_ENV]: (style.bodies ?? ['lunar']).join(','),
    },
  });
}

interface PoolPlan {
  readonly started: number;
  readonly workers: number;
  readonly limitedBy: 'cores' | 'memory' | undefined;
  readonly budget: WorkerBudget;
  readonly load: PictureLoad;
}

async function runWithPool(options: BatchOptions, pool: Tinypool, closePool: () => Promise<void>, plan: PoolPlan): Promise<BatchSummary> {
  const { started } = plan;
  const { outDir, style } = options;
  // Everything that can be refused is checked before anything is made.
  const { mine } = planBatch(options);
  const shardName = options.shard ? `${options.shard.index}/${options.shard.count}` : null;
  const manifestName = manifestNameFor(shardName);
  const made = makeOutDir(outDir);
  let release: () => void;
  try {
    release = acquireLock(outDir);
  } catch (error) {
    if (made) removeIfEmpty(outDir);
    throw error;
  }
  try {
    checkFolderEntries(outDir, [manifestName, ...indexNamesFor(shardName)]);
    mkdirSync(join(outDir, 'thumbs'), { recursive: true });
    const leftovers = removeLeftovers(outDir);
    if (leftovers > 0) options.onProgress?.({ type: 'notice', message: `removed ${leftovers} temporary file(s) left by an interrupted run` });
    const hash = styleHash(style);
    const manifestPath = join(outDir, manifestName);
    const { manifest: previous, problem } = readManifest(manifestPath);
    if (problem) options.onProgress?.({ type: 'notice', message: `${problem}; rebuilding it from this run` });
    const manifest = emptyManifest(options, hash);
    const known = new Map((previous?.eclipses ?? []).map((e) => [e.id, e]));

    const todo: { eclipse: Eclipse; record: BatchRecord; key: string }[] = [];
    let skipped = 0;
    for (const eclipse of mine) {
      const record = batchRecord(eclipse);
      const key = entryKey(record, hash, options.tool);
      const old = known.get(eclipse.id);
      if (!options.force && old && old.key === key && filesIntact(outDir, old)) {
        manifest.eclipses.push(old);
        skipped++;
        options.onProgress?.({ type: 'skipped', id: eclipse.id, kind: eclipse.kind });
      } else {
        todo.push({ eclipse, record, key });
      }
    }
    // Entries outside this run's range stay listed while their files are intact: the manifest describes the folder.
    const inRun = new Set(mine.map((e) => e.id));
    for (const old of previous?.eclipses ?? []) if (!inRun.has(old.id) && filesIntact(outDir, old)) manifest.eclipses.push(old);
    options.onProgress?.({ type: 'planned', total: mine.length, upToDate: skipped });

    let writing = Promise.resolve();
    const saveManifest = () => (writing = writing.then(() => writeManifest(outDir, manifest)));
    const failed: { id: string; message: string }[] = [];
    let rendered = 0;
    let interrupted = false;
    if (todo.length === 0) await closePool();
    if (todo.length > 0) {
      const { budget, workers, limitedBy, load } = plan;
      if (limitedBy) options.onProgress?.({ type: 'notice', message: capNote(budget, workers, limitedBy, load) });
      const abort = new AbortController();
      // Every task listens to the one signal: as many listeners as eclipses, by design.
      setMaxListeners(Number.POSITIVE_INFINITY, abort.signal);
      const onAbort = () => {
        interrupted = true;
        abort.abort();
      };
      options.signal?.addEventListener('abort', onAbort, { once: true });
      try {
        await Promise.all(
          [...todo].sort((a, b) => taskOrder(a.eclipse, b.eclipse)).map(async ({ eclipse, record, key }) => {
            try {
              const input: TaskInput = { eclipse, style, outDir, generator: options.tool };
              const { files, seconds } = (await pool.run(input, { signal: abort.signal })) as TaskResult;
              if (interrupted) return;
              const entry = { id: eclipse.id, body: eclipse.body, kind: eclipse.kind, key, record, files } as ManifestEntry;
              manifest.eclipses = [...manifest.eclipses.filter((e) => e.id !== eclipse.id), entry];
              rendered++;
              await saveManifest();
              options.onProgress?.({ type: 'done', id: eclipse.id, kind: eclipse.kind, files: files.length, seconds });
            } catch (error) {
              if (interrupted) return;
              // Errors from a worker process arrive as plain objects: take their message.
              const text = error instanceof Error ? error.message : typeof error === 'object' && error !== null && 'message' in error ? String((error as { message: unknown }).message) : String(error);
              const message = text.split('\n')[0]!;
              failed.push({ id: eclipse.id, message });
              options.onProgress?.({ type: 'failed', id: eclipse.id, kind: eclipse.kind, message });
            }
          }),
        );
      } finally {
        options.signal?.removeEventListener('abort', onAbort);
        await closePool();
      }
    }
    if (interrupted) removeLeftovers(outDir);
    await saveManifest();
    await writeIndexes(outDir, manifest, sheetTitle(options.from.toISOString(), options.to.toISOString(), bodiesOf(manifest), manifest.style));
    const files = manifest.eclipses.reduce((n, e) => n + e.files.length, 0);
    const bytes = manifest.eclipses.reduce((n, e) => n + e.files.reduce((m, f) => m + f.bytes, 0), 0);
    return { planned: mine.length, rendered, skipped, failed, files, bytes, seconds: (performance.now() - started) / 1000, interrupted };
  } finally {
    release();
  }
}

/** The most manifests one merge reads: a shard each, for every shard count a batch allows. */
export const MAX_MERGE_MANIFESTS = 9999;

/**
 * Combine shard manifests into one manifest.json (and its catalogue.csv and
 * index.html), in --out, under its lock. Every manifest has been read and
 * checked field by field (readManifest); here the shards must share one
 * style, agree on every eclipse they share, list no file twice, and every
 * file they list must be in --out as listed (size and SHA-256). All three
 * files are made in memory first: a refused merge writes nothing.
 */
export async function mergeManifests(outDir: string, manifests: readonly Manifest[], tool: string): Promise<Manifest> {
  if (manifests.length === 0) throw new InputError('manifests', 'at least one shard manifest', 'none');
  if (manifests.length > MAX_MERGE_MANIFESTS) throw new InputError('manifests', `at most ${MAX_MERGE_MANIFESTS} manifests`, `${manifests.length}`, true);
  if (!statSync(outDir, { throwIfNoEntry: false })?.isDirectory()) throw new InputError('outDir', 'the folder that holds the shards\' files', outDir);
  const release = acquireLock(outDir);
  try {
    removeLeftovers(outDir);
    const first = manifests[0]!;
    for (const m of manifests) {
      if (m.styleHash !== first.styleHash) throw new InputError('manifests', `manifests made with one style (${first.styleHash})`, `a manifest with style ${m.styleHash}`, true);
    }
    const byId = new Map<string, ManifestEntry>();
    const owner = new Map<string, string>();
    for (const m of manifests) {
      for (const e of m.eclipses) {
        const seen = byId.get(e.id);
        if (seen && seen.key !== e.key) throw new InputError('manifests', 'shards that agree on every eclipse they share', `two different entries for ${e.id}`, true);
        if (seen) continue;
        for (const f of e.files) {
          const other = owner.get(f.path);
          if (other !== undefined) throw new InputError('manifests', 'shards whose eclipses each have files of their own', `${e.id} and ${other} both list ${f.path}`, true);
          owner.set(f.path, e.id);
        }
        byId.set(e.id, e);
      }
    }
    if (byId.size > MAX_MANIFEST_ECLIPSES) throw new InputError('manifests', `at most ${MAX_MANIFEST_ECLIPSES} eclipses in all`, `${byId.size}`, true);
    for (const e of byId.values()) {
      const broken = e.files.find((f) => !fileIntact(outDir, f));
      if (broken) throw new InputError('manifests', (name) => `shards whose files are in ${name('outDir')} as their manifests list them (size and SHA-256)`, `${e.id}: ${printable(broken.path)} missing or changed`, true);
    }
    const from = manifests.map((m) => m.range.from).sort()[0]!;
    const to = manifests.map((m) => m.range.to).sort().at(-1)!;
    const merged: Manifest = { ...first, tool, shard: null, range: { from, to }, eclipses: [...byId.values()] };
    const files: [string, string][] = [[MANIFEST_NAME, manifestText(merged)], ...indexFiles(outDir, merged, sheetTitle(from, to, bodiesOf(merged), merged.style))];
    checkFolderEntries(outDir, files.map(([name]) => name));
    for (const [name, text] of files) await writeFileAtomic(join(outDir, name), text);
    return merged;
  } finally {
    release();
  }
}
