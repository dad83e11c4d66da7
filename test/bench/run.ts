/**
 * `npm run bench`: speed figures measured in one run, printed as ratios
 * against a baseline measured in the same process, so that the machine's
 * speed cancels out. Targets are printed beside the figures; this script
 * reports, it does not fail.
 */
import { NextLunarEclipse, SearchLunarEclipse } from 'astronomy-engine';
import { geoEqualEarth, geoPath } from 'd3-geo';
import { findLunarEclipses, SUPPORTED_RANGE } from '../../src/eclipse/catalogue.ts';
import { standardDeltaTModel } from '../../src/ephemeris/deltaT.ts';
import { civilClock } from '../../src/ephemeris/civilTime.ts';
import { loadBasemap, type BasemapDetail } from '../../src/map/basemap.ts';
import { THEMES } from '../../src/map/theme.ts';
import { catalogueDocument } from '../../src/outputs/catalogueRecord.ts';
import { renderMapFile, type MapRequest } from '../../src/outputs/mapFile.ts';
import { rasterise } from '../../src/raster/raster.ts';
import { stage, visibilityOf } from '../../src/visibility/visibility.ts';

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

/** Run each job once to warm up, then alternate them `rounds` times so that drift hits all alike. */
async function alternate(jobs: Record<string, () => unknown>, rounds = ROUNDS): Promise<Record<string, number>> {
  for (const job of Object.values(jobs)) await job();
  const times: Record<string, number[]> = Object.fromEntries(Object.keys(jobs).map((k) => [k, []]));
  for (let round = 0; round < rounds; round++) {
    for (const [name, job] of Object.entries(jobs)) times[name]!.push(await time(job));
  }
  return Object.fromEntries(Object.entries(times).map(([k, v]) => [k, median(v)]));
}

const line = (label: string, value: string) => console.log(`${label.padEnd(64)} ${value}`);
console.log(`umbracast bench (median of ${ROUNDS} rounds, Node ${process.version})`);

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
line('ratio catalogue / bare search (target ≤ 1.5)', (catalogue.ours! / catalogue.bare!).toFixed(2));
const wholeStart = performance.now();
const wholeCount = findLunarEclipses({ from: SUPPORTED_RANGE.from, to: SUPPORTED_RANGE.to }).length;
line(`whole supported range, ${SUPPORTED_RANGE.description} (eclipses)`, `${(performance.now() - wholeStart).toFixed(0)} ms (${wholeCount})`);

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
function bareBasemapSvg(): string {
  const basemap = loadBasemap(detail);
  const projection = geoEqualEarth().rotate([-centralMeridian, 0]).fitSize([2400, 1200], { type: 'Sphere' });
  const path = geoPath(projection).digits(1);
  return `<svg xmlns="http://www.w3.org/2000/svg" width="2400" height="1200"><rect width="2400" height="1200" fill="#faf8f3"/>`
    + `<path d="${path({ type: 'Sphere' })}" fill="#eef0f2"/><path d="${path(basemap.land as never)}" fill="#ffffff" stroke="#5d6470"/>`
    + `<path d="${path(basemap.borders)}" fill="none" stroke="#999999"/></svg>`;
}
const maps = await alternate({
  basemap: () => rasterise(bareBasemapSvg(), { format: 'png', dpi: 72 }),
  world: () => renderMapFile(mapRequest(2400, 1200)),
  card: () => renderMapFile(mapRequest(1200, 675)),
}, MAP_ROUNDS);
line(`world map 2400×1200 PNG, all layers (basemap ${detail}; median of ${MAP_ROUNDS})`, `${maps.world!.toFixed(0)} ms`);
line('bare basemap 2400×1200 PNG, same projection and data', `${maps.basemap!.toFixed(0)} ms`);
line('ratio map / bare basemap (target ≤ 1.3)', (maps.world! / maps.basemap!).toFixed(2));
line('social card 1200×675 PNG', `${maps.card!.toFixed(0)} ms`);

// A decade of maps (PNG 2400 px wide + SVG) with one worker and with two, each batch in its own process.
// Memory is the whole batch: the peak, over its process tree (main, workers, helpers), of the summed
// PSS (each shared page counted once, split among its sharers) and, for comparison, of the summed
// RSS (which counts the node binary and shared libraries again in every process); sampled from /proc.
const { spawn } = await import('node:child_process');
const { mkdtempSync, readdirSync, readFileSync } = await import('node:fs');
const { tmpdir } = await import('node:os');
const { join } = await import('node:path');
const child = new URL('./batchChild.ts', import.meta.url).pathname;

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

async function decade(jobs: number): Promise<{ seconds: number; eclipses: number; maps: number; peakMB: number; peakRssMB: number }> {
  const out = mkdtempSync(join(tmpdir(), `umbracast-bench-${jobs}-`));
  const proc = spawn(process.execPath, ['--import', 'tsx', child, out, String(jobs)], { stdio: ['ignore', 'pipe', 'inherit'] });
  let text = '';
  proc.stdout.on('data', (chunk) => (text += chunk));
  let peakMB = 0;
  let peakRssMB = 0;
  const timer = setInterval(() => {
    const { pss, rss } = treeMemoryMB(proc.pid!);
    peakMB = Math.max(peakMB, pss);
    peakRssMB = Math.max(peakRssMB, rss);
  }, 50);
  await new Promise((resolve) => proc.once('exit', resolve));
  clearInterval(timer);
  return { ...JSON.parse(text), peakMB, peakRssMB };
}
const one = await decade(1);
const two = await decade(2);
line(`batch 2026–2035, ${one.eclipses} eclipses, PNG 2400 px + SVG, --jobs 1`, `${one.seconds.toFixed(1)} s, peak ${one.peakMB.toFixed(0)} MB PSS (${one.peakRssMB.toFixed(0)} MB summed RSS)`);
line(`batch 2026–2035, ${two.eclipses} eclipses, PNG 2400 px + SVG, --jobs 2`, `${two.seconds.toFixed(1)} s, peak ${two.peakMB.toFixed(0)} MB PSS (${two.peakRssMB.toFixed(0)} MB summed RSS)`);
line('ratio jobs 2 / jobs 1 (target ≤ 0.6)', (two.seconds / one.seconds).toFixed(2));
line('peak memory of the whole batch, jobs 2, PSS (target ≤ 400 MB)', `${two.peakMB.toFixed(0)} MB`);
line('maps per second, jobs 2', (two.maps / two.seconds).toFixed(2));
