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
import { closeSync, existsSync, mkdirSync, openSync, readdirSync, readFileSync, rmSync, unlinkSync, writeSync } from 'node:fs';
import { setMaxListeners } from 'node:events';
import { join } from 'node:path';
import { Tinypool } from 'tinypool';
import { InputError } from '../errors.ts';
import { findLunarEclipses } from '../eclipse/catalogue.ts';
import type { EclipseKind, LunarEclipse } from '../eclipse/types.ts';
import { fixedDeltaTModel, standardDeltaTModel } from '../ephemeris/deltaT.ts';
import { catalogueDocument, eclipseRecord, type EclipseRecord } from '../outputs/catalogueRecord.ts';
import { catalogueCsv } from '../outputs/catalogueFormats.ts';
import { writeFileAtomic } from '../outputs/files.ts';
import { contactSheet, pngSize, sheetTitle } from './contactSheet.ts';
import { workerScript } from './workerScript.ts';
import { filesIntact, readManifest, writeManifest, manifestNameFor, type Manifest, type ManifestEntry } from './manifest.ts';
import { styleHash, type HouseStyle } from './style.ts';
import { sha256, type TaskInput, type WrittenFile } from './written.ts';

export interface Shard {
  readonly index: number;
  readonly count: number;
}

export interface BatchOptions {
  readonly from: Date;
  readonly to: Date;
  readonly kinds: readonly EclipseKind[];
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

export type ProgressEvent =
  | { readonly type: 'planned'; readonly total: number; readonly upToDate: number }
  | { readonly type: 'started'; readonly id: string; readonly kind: string }
  /** `seconds`: since the batch began (eclipses run side by side, so there is no per-eclipse clock worth printing). */
  | { readonly type: 'done'; readonly id: string; readonly kind: string; readonly files: number; readonly seconds: number }
  | { readonly type: 'skipped'; readonly id: string; readonly kind: string }
  | { readonly type: 'failed'; readonly id: string; readonly kind: string; readonly message: string }
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

export function entryKey(record: EclipseRecord, hash: string, tool: string): string {
  return sha256(JSON.stringify({ tool, style: hash, record })).slice(0, 32);
}

export const LOCK_NAME = '.umbracast.lock';
/** The most eclipses one batch call takes: some hours of work, bounded. */
export const MAX_BATCH_ECLIPSES = 500;
/** Heap ceiling of each worker process, MB. */
export const WORKER_HEAP_MB = 256;

/** One batch per output folder: a lock file made with O_EXCL; a lock whose process is gone is taken over. */
export function acquireLock(outDir: string): () => void {
  const path = join(outDir, LOCK_NAME);
  for (let attempt = 0; attempt < 2; attempt++) {
    try {
      const fd = openSync(path, 'wx');
      writeSync(fd, `${process.pid}\n`);
      closeSync(fd);
      return () => {
        try {
          if (readFileSync(path, 'utf8').trim() === String(process.pid)) unlinkSync(path);
        } catch {
          // Already gone.
        }
      };
    } catch (error) {
      if ((error as NodeJS.ErrnoException).code !== 'EEXIST') throw error;
      const holder = Number.parseInt(readFileSync(path, 'utf8'), 10);
      let alive = false;
      try {
        if (Number.isInteger(holder) && holder > 0) {
          process.kill(holder, 0);
          alive = true;
        }
      } catch {
        alive = false;
      }
      if (alive && holder !== process.pid) {
        throw new InputError('--out', 'a folder no other batch is writing to', `${outDir} (batch with process ${holder} holds ${LOCK_NAME}; wait for it, or remove the lock if that process is gone)`, true);
      }
      unlinkSync(path);
    }
  }
  throw new InputError('--out', 'a folder whose lock can be taken', outDir);
}

/** Remove temporary files left by a killed run (writeFileAtomic's ".name.partial-PID"). */
export function removeLeftovers(outDir: string): number {
  let removed = 0;
  for (const folder of [outDir, join(outDir, 'thumbs')]) {
    if (!existsSync(folder)) continue;
    for (const name of readdirSync(folder)) {
      if (/^\..+\.partial-\d+$/.test(name)) {
        rmSync(join(folder, name), { force: true });
        removed++;
      }
    }
  }
  return removed;
}

function emptyManifest(options: BatchOptions, hash: string): Manifest {
  return {
    schema: 'umbracast.manifest/1',
    tool: options.tool,
    styleHash: hash,
    style: options.style as unknown as Record<string, unknown>,
    range: { from: options.from.toISOString(), to: options.to.toISOString() },
    shard: options.shard ? `${options.shard.index}/${options.shard.count}` : null,
    eclipses: [],
  };
}

/** Refresh catalogue.csv and index.html from a manifest. */
export async function writeIndexes(outDir: string, manifest: Manifest, title: string): Promise<void> {
  const records = [...manifest.eclipses].sort((a, b) => a.id.localeCompare(b.id));
  const doc = { ...catalogueDocument([], { convention: (manifest.style.convention as 'danjon' | 'chauvenet') ?? 'danjon', deltaTModel: '', from: new Date(manifest.range.from), to: new Date(manifest.range.to) }), eclipses: records.map((e) => e.record) };
  const suffix = manifest.shard ? `.shard-${manifest.shard.replace('/', '-of-')}` : '';
  await writeFileAtomic(join(outDir, `catalogue${suffix}.csv`), catalogueCsv(doc));
  const thumbSize = (path: string) => {
    try {
      return pngSize(readFileSync(join(outDir, path)).subarray(0, 24));
    } catch {
      return undefined;
    }
  };
  await writeFileAtomic(join(outDir, `index${suffix}.html`), contactSheet({ ...manifest, eclipses: records }, title, thumbSize));
}

export async function runBatch(options: BatchOptions): Promise<BatchSummary> {
  const started = performance.now();
  const { outDir, style } = options;
  mkdirSync(join(outDir, 'thumbs'), { recursive: true });
  const release = acquireLock(outDir);
  try {
    const leftovers = removeLeftovers(outDir);
    if (leftovers > 0) options.onProgress?.({ type: 'notice', message: `removed ${leftovers} temporary file(s) left by an interrupted run` });
    const hash = styleHash(style);
    const manifestPath = join(outDir, manifestNameFor(options.shard ? `${options.shard.index}/${options.shard.count}` : null));
    const { manifest: previous, problem } = readManifest(manifestPath);
    if (problem) options.onProgress?.({ type: 'notice', message: `${problem}; rebuilding it from this run` });
    const manifest = emptyManifest(options, hash);
    const known = new Map((previous?.eclipses ?? []).map((e) => [e.id, e]));

    const deltaT = style.deltaT === undefined ? standardDeltaTModel() : fixedDeltaTModel(style.deltaT);
    const all = findLunarEclipses({ from: options.from, to: options.to, convention: style.convention, deltaT }).filter((e) => options.kinds.includes(e.kind));
    if (all.length > MAX_BATCH_ECLIPSES) {
      throw new InputError('--to', `a range of at most ${MAX_BATCH_ECLIPSES} eclipses per batch (about two centuries); split it, or use --shard`, `${all.length} eclipses from ${options.from.toISOString().slice(0, 10)}`, true);
    }
    const mine = shardOf(all, options.shard);
    const todo: { eclipse: LunarEclipse; record: EclipseRecord; key: string }[] = [];
    let skipped = 0;
    for (const eclipse of mine) {
      const record = eclipseRecord(eclipse);
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
    if (todo.length > 0) {
      const workers = Math.min(options.jobs, todo.length);
      const pool = new Tinypool({
        filename: await workerScript(),
        runtime: 'child_process',
        minThreads: workers,
        maxThreads: workers,
        // One lane per core: each worker keeps V8 to its own thread (--single-threaded), so that N
        // workers on N cores do not fight over them; a bounded heap makes it collect its large SVG
        // strings early; one malloc arena keeps glibc from holding freed native memory per thread.
        execArgv: ['--single-threaded', `--max-old-space-size=${WORKER_HEAP_MB}`, '--max-semi-space-size=8'],
        env: { ...(process.env as Record<string, string>), MALLOC_ARENA_MAX: '1' },
      });
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
          todo.map(async ({ eclipse, record, key }) => {
            try {
              const input: TaskInput = { eclipse, style, outDir, generator: options.tool };
              const files = (await pool.run(input, { signal: abort.signal })) as WrittenFile[];
              if (interrupted) return;
              const entry: ManifestEntry = { id: eclipse.id, kind: eclipse.kind, key, record, files };
              manifest.eclipses = [...manifest.eclipses.filter((e) => e.id !== eclipse.id), entry];
              rendered++;
              await saveManifest();
              options.onProgress?.({ type: 'done', id: eclipse.id, kind: eclipse.kind, files: files.length, seconds: (performance.now() - started) / 1000 });
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
        await pool.destroy();
      }
    }
    if (interrupted) removeLeftovers(outDir);
    await saveManifest();
    await writeIndexes(outDir, manifest, sheetTitle(options.from.toISOString(), options.to.toISOString()));
    const files = manifest.eclipses.reduce((n, e) => n + e.files.length, 0);
    const bytes = manifest.eclipses.reduce((n, e) => n + e.files.reduce((m, f) => m + f.bytes, 0), 0);
    return { planned: mine.length, rendered, skipped, failed, files, bytes, seconds: (performance.now() - started) / 1000, interrupted };
  } finally {
    release();
  }
}

/** Combine shard manifests into one manifest.json (and its catalogue.csv and index.html). */
export async function mergeManifests(outDir: string, manifests: readonly Manifest[], tool: string): Promise<Manifest> {
  if (manifests.length === 0) throw new InputError('--merge', 'at least one shard manifest', 'none');
  const first = manifests[0]!;
  for (const m of manifests) {
    if (m.styleHash !== first.styleHash) throw new InputError('--merge', `manifests made with one style (${first.styleHash})`, `a manifest with style ${m.styleHash}`);
  }
  const byId = new Map<string, ManifestEntry>();
  for (const m of manifests) {
    for (const e of m.eclipses) {
      const seen = byId.get(e.id);
      if (seen && seen.key !== e.key) throw new InputError('--merge', 'shards that agree on every eclipse they share', `two different entries for ${e.id}`);
      byId.set(e.id, e);
    }
  }
  const from = manifests.map((m) => m.range.from).sort()[0]!;
  const to = manifests.map((m) => m.range.to).sort().at(-1)!;
  const merged: Manifest = { ...first, tool, shard: null, range: { from, to }, eclipses: [...byId.values()] };
  await writeManifest(outDir, merged);
  await writeIndexes(outDir, merged, sheetTitle(from, to));
  return merged;
}
