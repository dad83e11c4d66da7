/**
 * `npm run bench`: speed figures measured in one run, printed as ratios
 * against a baseline measured in the same process, so that the machine's
 * speed cancels out. Targets are printed beside the figures; this script
 * reports, it does not fail.
 */
import { NextGlobalSolarEclipse, NextLunarEclipse, SearchGlobalSolarEclipse, SearchLunarEclipse } from 'astronomy-engine';
import { geoEqualEarth, geoPath } from 'd3-geo';
import { findLunarEclipses } from '../../src/eclipses/lunar/catalogue.ts';
import { SUPPORTED_RANGE } from '../../src/eclipses/common/range.ts';
import { findSolarEclipses } from '../../src/eclipses/solar/catalogue.ts';
import { solarEclipseRecord } from '../../src/eclipses/solar/record.ts';
import { standardDeltaTModel } from '../../src/ephemeris/deltaT.ts';
import { civilClock } from '../../src/ephemeris/civilTime.ts';
import { loadBasemap, type BasemapDetail } from '../../src/sphere/world.ts';
import { THEMES } from '../../src/figures/theme.ts';
import { catalogueDocument } from '../../src/outputs/catalogueRecord.ts';
import { renderMapFile, type MapRequest } from '../../src/outputs/mapFile.ts';
import sharp from 'sharp';
import { danjon } from '../../src/eclipses/lunar/conventions.ts';
import { lunationIndexNear, mayHoldLunarEclipse } from '../../src/eclipses/common/lunations.ts';
import { utDaysFromDate } from '../../src/ephemeris/time.ts';
import { BASEMAP_THINNING_PX } from '../../src/figures/map.ts';
import { thinnedProjection } from '../../src/figures/thin.ts';
import { rasterise } from '../../src/raster/raster.ts';
import { stage, visibilityOf } from '../../src/visibility/lunar/visibility.ts';

const ROUNDS = 5;
/** Maps take a fraction of a second: more rounds steady their median. */
const MAP_ROUNDS = 21;

function median(values: number[]): number {
  const sorted = [...values].sort((a, b) => a - b);
  return sorted[Math.floor(sorted.length / 2)]!;
}

async function time(fn: () => unknown): Promise<number> {
  const start = performance.now();
  await fn();
  return performance.now() - start;
}

/** Every round's time of each job, by name: wall clock, and CPU time of this process (all its threads). */
const roundTimes = new Map<Record<string, number>, { wall: Record<string, number[]>; cpu: Record<string, number[]> }>();

/** Run each job once to warm up, then alternate them `rounds` times so that drift hits all alike. */
async function alternate(jobs: Record<string, () => unknown>, rounds = ROUNDS): Promise<Record<string, number>> {
  for (const job of Object.values(jobs)) await job();
  const times: Record<string, number[]> = Object.fromEntries(Object.keys(jobs).map((k) => [k, []]));
  const cpu: Record<string, number[]> = Object.fromEntries(Object.keys(jobs).map((k) => [k, []]));
  for (let round = 0; round < rounds; round++) {
    for (const [name, job] of Object.entries(jobs)) {
      const before = process.cpuUsage();
      times[name]!.push(await time(job));
      const used = process.cpuUsage(before);
      cpu[name]!.push((used.user + used.system) / 1000);
    }
  }
  const medians = Object.fromEntries(Object.entries(times).map(([k, v]) => [k, median(v)]));
  roundTimes.set(medians, { wall: times, cpu });
  return medians;
}

/**
 * A ratio of two jobs' median wall times, with the spread (10th–90th
 * percentile) of the ratios round by round, and the ratio of their median CPU
 * times, which other work on a shared machine disturbs far less.
 */
function ratio(medians: Record<string, number>, job: string, baseline: string): string {
  const { wall, cpu } = roundTimes.get(medians)!;
  const perRound = wall[job]!.map((t, i) => t / wall[baseline]![i]!).sort((a, b) => a - b);
  const at = (p: number) => perRound[Math.round((perRound.length - 1) * p)]!.toFixed(2);
  // Jobs that run in child processes use next to no CPU of this one: then there is no CPU ratio to give.
  const cpuRatio = median(cpu[baseline]!) >= 0.2 * medians[baseline]! ? `; CPU ${(median(cpu[job]!) / median(cpu[baseline]!)).toFixed(2)}` : '';
  return `${(medians[job]! / medians[baseline]!).toFixed(2)} (rounds ${at(0.1)}–${at(0.9)}${cpuRatio})`;
}

const line = (label: string, value: string) => console.log(`${label.padEnd(84)} ${value}`);
console.log(`umbracast bench (median of ${ROUNDS} rounds unless said; ratios of wall times, their rounds' 10th–90th percentile, and of CPU times; Node ${process.version})`);

// Catalogue against a bare astronomy-engine search over the same years.
const from = new Date('1900-01-01T00:00:00Z');
const to = new Date('2101-01-01T00:00:00Z');
let bareCount = 0;
let ourCount = 0;
const catalogue = await alternate({
  bare: () => {
    bareCount = 0;
    let eclipse = SearchLunarEclipse(from);
    while (eclipse.peak.date < to) {
      bareCount++;
      eclipse = NextLunarEclipse(eclipse.peak);
    }
  },
  ours: () => {
    const deltaT = standardDeltaTModel();
    const eclipses = findLunarEclipses({ from, to, deltaT });
    ourCount = catalogueDocument(eclipses, { convention: 'danjon', deltaTModel: deltaT.name, from, to }).eclipses.length;
  },
});
line('catalogue 1900–2100, all fields (eclipses)', `${catalogue.ours!.toFixed(0)} ms (${ourCount})`);
line('bare astronomy-engine lunar-eclipse search 1900–2100', `${catalogue.bare!.toFixed(0)} ms (${bareCount})`);
line('ratio catalogue / bare search (target ≤ 1.5)', ratio(catalogue, 'ours', 'bare'));
const wholeStart = performance.now();
const wholeCount = findLunarEclipses({ from: SUPPORTED_RANGE.from, to: SUPPORTED_RANGE.to }).length;
line(`whole supported range, ${SUPPORTED_RANGE.description} (eclipses)`, `${(performance.now() - wholeStart).toFixed(0)} ms (${wholeCount})`);
let sampledLunations = 0;
for (let k = lunationIndexNear(utDaysFromDate(SUPPORTED_RANGE.from) - 1) - 1; k <= lunationIndexNear(utDaysFromDate(SUPPORTED_RANGE.to) + 1) + 1; k++) {
  if (mayHoldLunarEclipse(k, danjon)) sampledLunations++;
}
line('lunations sampled over the whole range, and the share that find no eclipse', `${sampledLunations} (${((100 * (sampledLunations - wholeCount)) / sampledLunations).toFixed(1)} %)`);

// Solar catalogue against astronomy-engine's own global solar-eclipse search over the same years.
let bareSolarCount = 0;
let ourSolarCount = 0;
const solarCatalogue = await alternate({
  bare: () => {
    bareSolarCount = 0;
    let found = SearchGlobalSolarEclipse(from);
    while (found.peak.date < to) {
      bareSolarCount++;
      found = NextGlobalSolarEclipse(found.peak);
    }
  },
  ours: () => {
    ourSolarCount = findSolarEclipses({ from, to }).map(solarEclipseRecord).length;
  },
});
line('solar catalogue 1900–2100, all fields (eclipses)', `${solarCatalogue.ours!.toFixed(0)} ms (${ourSolarCount})`);
line('bare astronomy-engine global solar-eclipse search 1900–2100', `${solarCatalogue.bare!.toFixed(0)} ms (${bareSolarCount})`);
line('ratio solar catalogue / bare search (target ≤ 1.0)', (solarCatalogue.ours! / solarCatalogue.bare!).toFixed(2));

// A world map against rasterising the bare basemap: same projection, world data and size.
const [eclipse] = findLunarEclipses({ from: new Date('2026-03-03T00:00:00Z'), to: new Date('2026-03-04T00:00:00Z') });
const mapRequest = (widthPx: number, heightPx: number): MapRequest => ({
  eclipse: eclipse!,
  style: { theme: THEMES.light, view: { projection: 'equal-earth' }, borders: 'countries', clock: civilClock('UTC') },
  size: { widthPx, heightPx },
  dpi: 72,
  format: 'png',
  generator: 'umbracast bench',
});
const probe = await renderMapFile(mapRequest(2400, 1200));
const detail: BasemapDetail = probe.scene!.basemapDetail;
const centralMeridian = Math.round(stage(visibilityOf(eclipse!), 'greatest').cap.centre[0] / 5) * 5;
/** The bare basemap as the maps drew it before this bench's levers: every projected point, no thinning. */
function bareBasemapSvg(tolerancePx = 0): string {
  const basemap = loadBasemap(detail);
  const projection = geoEqualEarth().rotate([-centralMeridian, 0]).fitSize([2400, 1200], { type: 'Sphere' });
  const path = geoPath(tolerancePx > 0 ? thinnedProjection(projection, tolerancePx) : projection).digits(1);
  return `<svg xmlns="http://www.w3.org/2000/svg" width="2400" height="1200"><rect width="2400" height="1200" fill="#faf8f3"/>`
    + `<path d="${path({ type: 'Sphere' })}" fill="#eef0f2"/><path d="${path(basemap.land as never)}" fill="#ffffff" stroke="#5d6470"/>`
    + `<path d="${path(basemap.borders)}" fill="none" stroke="#999999"/></svg>`;
}
/** An SVG drawn and encoded as before: sharp's SVG loader (librsvg), RGBA PNG. */
const librsvgPng = (svg: string) => sharp(Buffer.from(svg), { density: 72, limitInputPixels: false }).withDensity(72).png({ compressionLevel: 6, adaptiveFiltering: false }).toBuffer();
const maps = await alternate({
  basemap: () => librsvgPng(bareBasemapSvg()),
  world: () => renderMapFile(mapRequest(2400, 1200)),
  card: () => renderMapFile(mapRequest(1200, 675)),
}, MAP_ROUNDS);
line(`world map 2400×1200 PNG, all layers (basemap ${detail}; median of ${MAP_ROUNDS})`, `${maps.world!.toFixed(0)} ms`);
line('bare basemap 2400×1200 PNG, same data, drawn as before (librsvg, every point)', `${maps.basemap!.toFixed(0)} ms`);
line('ratio map / bare basemap (target ≤ 1.0)', ratio(maps, 'world', 'basemap'));
line('social card 1200×675 PNG', `${maps.card!.toFixed(0)} ms`);

// A solar world map (every layer: the obscuration field, path, curves, labels) against the same bare basemap.
const SOLAR_MAP_ROUNDS = 7;
const [solarEclipse] = findSolarEclipses({ from: new Date('2024-04-08T00:00:00Z'), to: new Date('2024-04-09T00:00:00Z') });
const solarMaps = await alternate({
  basemap: () => librsvgPng(bareBasemapSvg()),
  solar: () => renderMapFile({ ...mapRequest(2400, 1200), eclipse: solarEclipse! }),
}, SOLAR_MAP_ROUNDS);
line(`solar world map 2400×1200 PNG, all layers (2024-04-08; median of ${SOLAR_MAP_ROUNDS})`, `${solarMaps.solar!.toFixed(0)} ms`);
line('ratio solar map / bare basemap (target ≤ 1.35)', ratio(solarMaps, 'solar', 'basemap'));

// The levers one by one, each against what it replaced, on the same input.
const svgOf = async (widthPx: number, heightPx: number) => Buffer.from((await renderMapFile({ ...mapRequest(widthPx, heightPx), format: 'svg' })).bytes).toString('utf8');
const pictures = { world: await svgOf(2400, 1200), card: await svgOf(1200, 675), print: await svgOf(2126, 1318) };
const drawing = await alternate({
  worldLibrsvg: () => librsvgPng(pictures.world),
  worldResvg: () => rasterise(pictures.world, { format: 'png', dpi: 72 }),
  cardLibrsvg: () => librsvgPng(pictures.card),
  cardResvg: () => rasterise(pictures.card, { format: 'png', dpi: 72 }),
  printLibrsvg: () => librsvgPng(pictures.print),
  printResvg: () => rasterise(pictures.print, { format: 'png', dpi: 72 }),
}, MAP_ROUNDS);
for (const [name, label] of [['world', 'world map 2400×1200'], ['card', 'card 1200×675'], ['print', 'print preset 2126×1318']] as const) {
  line(`SVG → PNG, ${label}: resvg / librsvg`, `${drawing[`${name}Resvg`]!.toFixed(0)} / ${drawing[`${name}Librsvg`]!.toFixed(0)} ms = ${ratio(drawing, `${name}Resvg`, `${name}Librsvg`)}`);
}
const thinning = await alternate({
  all: () => bareBasemapSvg(),
  thinned: () => bareBasemapSvg(BASEMAP_THINNING_PX),
}, MAP_ROUNDS);
line(`bare basemap as SVG text, thinned to ${BASEMAP_THINNING_PX} px / every point (bytes ${(bareBasemapSvg(BASEMAP_THINNING_PX).length / bareBasemapSvg().length).toFixed(2)}×)`, ratio(thinning, 'thinned', 'all'));
const thinSvg = bareBasemapSvg(BASEMAP_THINNING_PX);
const fullSvg = bareBasemapSvg();
const thinDrawing = await alternate({ all: () => rasterise(fullSvg, { format: 'png', dpi: 72 }), thinned: () => rasterise(thinSvg, { format: 'png', dpi: 72 }) }, MAP_ROUNDS);
line(`bare basemap drawn with resvg to PNG, thinned to ${BASEMAP_THINNING_PX} px / every point`, ratio(thinDrawing, 'thinned', 'all'));
const pixels = await sharp(await rasterise(pictures.world, { format: 'png', dpi: 72 })).ensureAlpha().raw().toBuffer();
const raw = { raw: { width: 2400, height: 1200, channels: 4 as const } };
const rgbPng = await sharp(pixels, raw).removeAlpha().png({ compressionLevel: 6, adaptiveFiltering: false }).toBuffer();
const rgbaPng = await sharp(pixels, raw).png({ compressionLevel: 6, adaptiveFiltering: false }).toBuffer();
const encoding = await alternate({
  rgba: () => sharp(pixels, raw).png({ compressionLevel: 6, adaptiveFiltering: false }).toBuffer(),
  rgb: () => sharp(pixels, raw).removeAlpha().png({ compressionLevel: 6, adaptiveFiltering: false }).toBuffer(),
}, MAP_ROUNDS);
line(`PNG encoding of the world map, RGB / RGBA (bytes ${(rgbPng.length / rgbaPng.length).toFixed(2)}×)`, ratio(encoding, 'rgb', 'rgba'));

// Start-up: `umbracast list` for one year, the whole process, against a bare Node that only loads
// astronomy-engine (the least any such command must do), alternated, wall time of each process.
{
  const { spawnSync } = await import('node:child_process');
  const bin = new URL('../../src/cli/bin.mjs', import.meta.url).pathname;
  const env = Object.fromEntries(Object.entries(process.env).filter(([key]) => key !== 'NODE_OPTIONS'));
  const run = (args: string[]) => () => {
    const result = spawnSync(process.execPath, args, { env, stdio: ['ignore', 'ignore', 'ignore'] });
    if (result.status !== 0) throw new Error(`${args.join(' ')} exited ${result.status}`);
  };
  // The same command run from tsc's modules instead of the bundle (dist/bundle/) that bin.mjs runs.
  const modules = new URL('../../dist/cli/main.js', import.meta.url).href;
  const fromModules = `const { main } = await import(${JSON.stringify(modules)}); process.exitCode = await main(['list', '--from', '2026', '--to', '2026']);`;
  const startUp = await alternate({
    list: run([bin, 'list', '--from', '2026', '--to', '2026']),
    modules: run(['--input-type=module', '-e', fromModules]),
    bare: run(['-e', "require('astronomy-engine')"]),
  }, 15);
  line('umbracast list, one year, whole process (median of 15)', `${startUp.list!.toFixed(0)} ms`);
  line('bare node loading astronomy-engine, whole process', `${startUp.bare!.toFixed(0)} ms`);
  line('ratio list / bare (target ≤ 1.5)', ratio(startUp, 'list', 'bare'));
  line('umbracast list from the bundle / from tsc\'s modules', ratio(startUp, 'list', 'modules'));
}

// A decade of maps (PNG 2400 px wide + SVG) made by the command a user runs, `umbracast batch`, each
// run in its own process tree. Time is the wall time of the whole command (start-up included), with
// --jobs 1 and --jobs 2 in turn, nothing else running: reading a process's memory from /proc walks its
// page tables, which on two cores would steal time from the timed workers. Memory comes from one more
// --jobs 2 run, sampled every 25 ms: the peak, over its process tree (CLI, workers, helpers), of the
// summed PSS (each shared page counted once, split among its sharers) and, to set beside it, of the
// summed RSS (which counts the node binary and shared libraries again in every process).
const { spawn } = await import('node:child_process');
const { mkdtempSync, readdirSync, readFileSync, rmSync, writeFileSync } = await import('node:fs');
const { tmpdir } = await import('node:os');
const { join } = await import('node:path');
const cli = new URL('../../src/cli/bin.mjs', import.meta.url).pathname;
// The command runs the compiled package in dist/ (`npm run bench` builds it first).
const benchStyle = join(mkdtempSync(join(tmpdir(), 'umbracast-bench-style-')), 'bench.json');
writeFileSync(benchStyle, JSON.stringify({ size: '2400x1350', formats: ['png', 'svg'] }));

function treeMemoryMB(root: number): { pss: number; rss: number } {
  const parents = new Map<number, number>();
  for (const name of readdirSync('/proc')) {
    if (!/^\d+$/.test(name)) continue;
    try {
      parents.set(Number(name), Number(/^PPid:\s+(\d+)/m.exec(readFileSync(`/proc/${name}/status`, 'utf8'))?.[1]));
    } catch {
      // The process ended while we looked.
    }
  }
  const inTree = (pid: number): boolean => pid === root || (parents.has(pid) && pid > 1 && inTree(parents.get(pid)!));
  let pss = 0;
  let rss = 0;
  for (const pid of parents.keys()) {
    if (!inTree(pid)) continue;
    try {
      const rollup = readFileSync(`/proc/${pid}/smaps_rollup`, 'utf8');
      pss += Number(/^Pss:\s+(\d+)/m.exec(rollup)?.[1] ?? 0);
      rss += Number(/^Rss:\s+(\d+)/m.exec(rollup)?.[1] ?? 0);
    } catch {
      // Gone.
    }
  }
  return { pss: pss / 1024, rss: rss / 1024 };
}

/**
 * CPU seconds (user + system) of this process's waited-for children, from
 * /proc/self/stat (cutime, cstime; clock ticks of 1/100 s): a finished batch
 * adds its whole tree, since the CLI has waited for its workers.
 */
function childCpuSeconds(): number {
  const fields = readFileSync('/proc/self/stat', 'utf8').replace(/^.*\) /s, '').split(' ');
  // After "pid (comm) ", the state is field 3: cutime and cstime are fields 16 and 17.
  return (Number(fields[16 - 3]) + Number(fields[17 - 3])) / 100;
}

interface DecadeRun {
  seconds: number;
  /** User + system CPU of the whole process tree. */
  cpuSeconds: number;
  eclipses: number;
  maps: number;
  peakPssMB: number;
  peakRssMB: number;
}

async function decade(jobs: number, sampleMemory: boolean): Promise<DecadeRun> {
  const out = mkdtempSync(join(tmpdir(), `umbracast-bench-${jobs}-`));
  const args = [cli, 'batch', '--from', '2026', '--to', '2035', '--style', benchStyle, '--out', out, '--jobs', String(jobs), '--force'];
  const started = performance.now();
  const cpuBefore = childCpuSeconds();
  const proc = spawn(process.execPath, args, { stdio: ['ignore', 'ignore', 'pipe'] });
  let errors = '';
  proc.stderr.on('data', (chunk) => (errors += chunk));
  let peakPssMB = 0;
  let peakRssMB = 0;
  const timer = sampleMemory
    ? setInterval(() => {
        const { pss, rss } = treeMemoryMB(proc.pid!);
        peakPssMB = Math.max(peakPssMB, pss);
        peakRssMB = Math.max(peakRssMB, rss);
      }, 25)
    : undefined;
  const code = await new Promise<number | null>((resolve) => proc.once('exit', resolve));
  const seconds = (performance.now() - started) / 1000;
  const cpuSeconds = childCpuSeconds() - cpuBefore;
  clearInterval(timer);
  if (code !== 0) throw new Error(`umbracast batch --jobs ${jobs} exited with ${code}: ${errors.trim().split('\n').at(-1)}`);
  const manifest = JSON.parse(readFileSync(join(out, 'manifest.json'), 'utf8')) as { eclipses: { files: { role: string }[] }[] };
  const maps = manifest.eclipses.reduce((n, e) => n + e.files.filter((f) => f.role === 'map').length, 0);
  rmSync(out, { recursive: true, force: true });
  return { seconds, cpuSeconds, eclipses: manifest.eclipses.length, maps, peakPssMB, peakRssMB };
}
// Batches take seconds and the machine's speed drifts: alternate the two, three times each, and take medians.
const BATCH_ROUNDS = 3;
const runs: Record<1 | 2, DecadeRun[]> = { 1: [], 2: [] };
for (let round = 0; round < BATCH_ROUNDS; round++) for (const jobs of [1, 2] as const) runs[jobs].push(await decade(jobs, false));
const middle = (list: DecadeRun[]) => [...list].sort((a, b) => a.seconds - b.seconds)[Math.floor(list.length / 2)]!;
const one = middle(runs[1]);
const two = middle(runs[2]);
const sampled = await decade(2, true);
line(`umbracast batch 2026–2035, ${one.eclipses} eclipses, PNG 2400 px + SVG, --jobs 1 (median of ${BATCH_ROUNDS})`, `${one.seconds.toFixed(1)} s`);
line(`umbracast batch 2026–2035, ${two.eclipses} eclipses, PNG 2400 px + SVG, --jobs 2 (median of ${BATCH_ROUNDS})`, `${two.seconds.toFixed(1)} s`);
line('ratio jobs 2 / jobs 1 (target ≤ 0.55)', (two.seconds / one.seconds).toFixed(2));
// Above 1.0, jobs 1 already keeps more than one core busy (libraries' own threads, the CLI beside its worker).
line('CPU (user + system, whole tree) / wall time, jobs 1 and jobs 2', `${(one.cpuSeconds / one.seconds).toFixed(2)} (${one.cpuSeconds.toFixed(1)} s CPU) and ${(two.cpuSeconds / two.seconds).toFixed(2)} (${two.cpuSeconds.toFixed(1)} s CPU)`);
line('peak memory of the whole batch, jobs 2, PSS (target ≤ 350 MB)', `${sampled.peakPssMB.toFixed(0)} MB (${sampled.peakRssMB.toFixed(0)} MB summed RSS)`);
line('maps per second, jobs 2', (two.maps / two.seconds).toFixed(2));
