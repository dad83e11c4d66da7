/**
 * Second hardening pass, points 13 and 14: a refused range makes nothing
 * and the ceiling applies per shard; workers are capped by cores and by
 * memory, with a note.
 *
 * Sources: Node.js os.availableParallelism() and os.freemem() (the
 * machine's own figures, read independently here); proc(5) for counting a
 * process's children (/proc/PID/stat field 4, ppid); the per-worker figures
 * were measured (README "Limits": peak RSS of one worker).
 */
import assert from 'node:assert/strict';
import { existsSync, readdirSync, readFileSync } from 'node:fs';
import { availableParallelism } from 'node:os';
import { join } from 'node:path';
import { test } from 'node:test';
import { findLunarEclipses } from '../../src/eclipses/lunar/catalogue.ts';
import { planBatch, pictureLoad } from '../../src/batch/run.ts';
import { validateStyle } from '../../src/batch/style.ts';
import { workerCount, workerNeedBytes } from '../../src/batch/resources.ts';
import { InputError } from '../../src/errors.ts';
import { assertOneLine, batchSetup, run, TWO_ECLIPSES } from './support.ts';

const MB = 1024 * 1024;
const ALL_KINDS = ['penumbral', 'partial', 'total'] as const;

test('13. a refused range makes no folder; the limit applies per shard, so the advice it gives is accepted', async () => {
  const { dir, style, out } = batchSetup();
  // The lunar eclipses (a batch takes the solar ones too unless told).
  const outcome = await run(['batch', '--from', '1000', '--to', '1300', '--body', 'lunar', '--style', style, '--out', out]);
  // Independent count: the catalogue over the same years.
  const total = findLunarEclipses({ from: new Date('1000-01-01T00:00:00Z'), to: new Date('1301-01-01T00:00:00Z') }).length;
  assert.ok(total > 500 && total <= 1000, `${total} eclipses`);
  assertOneLine(outcome, new RegExp(`^umbracast: --to: expected at most 500 eclipses per batch or per shard \\(about two centuries\\); split the range, or use --shard I/N with N of at least 2, received ${total} eclipses from 1000-01-01$`));
  assert.deepEqual(readdirSync(dir), ['style.yaml'], 'nothing made');
  // The advice: --shard 1/2 and 2/2 each plan within the limit, and together cover the range.
  const range = { from: new Date('1000-01-01T00:00:00Z'), to: new Date('1301-01-01T00:00:00Z'), kinds: ALL_KINDS, style: validateStyle({ bodies: ['lunar'] }) };
  const halves = [1, 2].map((index) => planBatch({ ...range, shard: { index, count: 2 } }).mine.length);
  assert.ok(halves.every((n) => n <= 500));
  assert.equal(halves[0]! + halves[1]!, total);
  assert.throws(() => planBatch({ ...range, shard: { index: 1, count: 1 } }), (e: unknown) => e instanceof InputError && e.parameter === 'shard');
  assertOneLine(await run(['batch', '--from', '1000', '--to', '1300', '--shard', '1/1', '--style', style, '--out', out]), /^umbracast: --shard: expected at most 500 eclipses .* received shard 1\/1: \d+ of \d+ eclipses from 1000-01-01$/);
  assert.ok(!existsSync(out));
});

test('14. the worker count is min(requested, cores, available memory / per-worker need), at least one', () => {
  // --jobs 64 on 2 cores with 7 GB free and the default 2400×1350 PNG: the cores decide.
  const small = workerNeedBytes({ pixels: 2400 * 1350, rasterFormats: 1 });
  assert.deepEqual(workerCount({ requested: 64, cores: 2, availableBytes: 7e9, needBytes: small }), { workers: 2, limitedBy: 'cores' });
  // 12000×5333 in four formats needs about 1.1 GB a worker (measured peak 1056 MiB): 2.5 GB free holds two, on 16 cores.
  const large = workerNeedBytes({ pixels: 12000 * 5333, rasterFormats: 3 });
  assert.ok(large >= 1060 * MB && large <= 1200 * MB, `${large / MB} MB`);
  assert.deepEqual(workerCount({ requested: 16, cores: 16, availableBytes: 2.5 * 1024 ** 3, needBytes: large }), { workers: 2, limitedBy: 'memory' });
  assert.deepEqual(workerCount({ requested: 4, cores: 16, availableBytes: 100 * MB, needBytes: large }), { workers: 1, limitedBy: 'memory' });
  assert.deepEqual(workerCount({ requested: 2, cores: 16, availableBytes: 64e9, needBytes: large }), { workers: 2, limitedBy: undefined });
  // Every measured peak (README "Limits") lies under its estimate: a worker is never given less than it takes.
  const measured: [number, number, number][] = [[1200 * 675, 0, 132], [2400 * 1350, 1, 187], [6000 * 3000, 2, 384], [12000 * 5333, 0, 229], [12000 * 5333, 1, 729], [12000 * 5333, 2, 1060], [12000 * 5333, 3, 1056]];
  for (const [pixels, rasterFormats, peakMb] of measured) assert.ok(workerNeedBytes({ pixels, rasterFormats }) >= peakMb * MB, `${pixels} px, ${rasterFormats} raster formats`);
  // The same for a batch with solar eclipses (measured on 2030-06-01, README "Limits"); its thumbnail draws a PNG even for an SVG-only style.
  const solarMeasured: [number, number, number][] = [[2400 * 1350, 1, 337], [12000 * 5333, 1, 787], [12000 * 5333, 3, 1065]];
  for (const [pixels, rasterFormats, peakMb] of solarMeasured) assert.ok(workerNeedBytes({ pixels, rasterFormats, solar: true }) >= peakMb * MB, `solar, ${pixels} px, ${rasterFormats} raster formats`);
  // The style's largest picture: the map, or a view-from-here figure if that is larger.
  assert.deepEqual(pictureLoad(validateStyle({ size: '12000x5333', formats: ['png', 'webp', 'jpg', 'svg'], bodies: ['lunar'] })), { pixels: 12000 * 5333, rasterFormats: 3, solar: false });
  assert.deepEqual(pictureLoad(validateStyle({ preset: 'card', formats: ['svg'], places: ['Dakar'], bodies: ['lunar'] })), { pixels: 1600 * 900, rasterFormats: 0, solar: false });
  assert.deepEqual(pictureLoad(validateStyle({ size: '12000x5333', formats: ['svg'] })), { pixels: 12000 * 5333, rasterFormats: 1, solar: true });
  assert.deepEqual(pictureLoad(validateStyle({ size: '12000x5333', formats: ['geojson'], bodies: ['solar'] })), { pixels: 12000 * 5333, rasterFormats: 0, solar: true });
});

/** Node child processes of this process, from /proc (proc(5): field 4 of /proc/PID/stat is the parent's id; cmdline). */
function childCount(): number {
  let n = 0;
  for (const name of readdirSync('/proc')) {
    if (!/^\d+$/.test(name)) continue;
    try {
      const stat = readFileSync(`/proc/${name}/stat`, 'utf8');
      const node = readFileSync(`/proc/${name}/cmdline`, 'utf8').split('\0')[0] === process.execPath;
      if (node && Number(stat.slice(stat.lastIndexOf(')') + 2).split(' ')[1]) === process.pid) n++;
    } catch {
      // Gone meanwhile.
    }
  }
  return n;
}

test('14. --jobs 64 runs no more workers than cores, and says so in one note on stderr', { skip: !existsSync('/proc/self/stat') && 'needs /proc' }, async () => {
  const { style, out } = batchSetup('preset: card\nformats: [svg]\nsky: false\n');
  const cores = availableParallelism();
  let most = 0;
  let done = false;
  const watching = (async () => {
    while (!done) {
      most = Math.max(most, childCount());
      await new Promise((r) => setTimeout(r, 25));
    }
  })();
  const outcome = await run(['batch', '--from', '2026', '--to', '2030', '--style', style, '--out', out, '--jobs', '64']);
  done = true;
  await watching;
  assert.equal(outcome.code, 0, outcome.stderr);
  if (cores < 64) assert.match(outcome.stderr, new RegExp(`^umbracast batch: running ${cores} worker process(es)?, not 64 \\(${cores} cores?\\)$`, 'm'));
  assert.ok(most >= 1 && most <= cores, `${most} worker processes seen at once, ${cores} cores`);
  assert.equal(outcome.stderr.split('\n').filter((l) => l.includes('worker process')).length, 1, 'one note');
  // A run that asks for no more than the cores gets no note.
  const quiet = await run(['batch', ...TWO_ECLIPSES, '--style', style, '--out', out, '--jobs', '1', '--force']);
  assert.ok(!quiet.stderr.includes('worker process'));
});
