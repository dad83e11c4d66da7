/**
 * `npm run bench`: speed figures measured in one run, printed as ratios
 * against a baseline measured in the same process, so that the machine's
 * speed cancels out. Targets are printed beside the figures; this script
 * reports, it does not fail.
 */
import { NextLunarEclipse, SearchLunarEclipse } from 'astronomy-engine';
import { findLunarEclipses, SUPPORTED_RANGE } from '../../src/eclipse/catalogue.ts';
import { catalogueDocument } from '../../src/outputs/catalogueRecord.ts';
import { standardDeltaTModel } from '../../src/ephemeris/deltaT.ts';

const ROUNDS = 5;

function median(values: number[]): number {
  const sorted = [...values].sort((a, b) => a - b);
  return sorted[Math.floor(sorted.length / 2)]!;
}

function time(fn: () => unknown): number {
  const start = performance.now();
  fn();
  return performance.now() - start;
}

const from = new Date('1900-01-01T00:00:00Z');
const to = new Date('2101-01-01T00:00:00Z');

function bareSearch(): number {
  let count = 0;
  let eclipse = SearchLunarEclipse(from);
  while (eclipse.peak.date < to) {
    count++;
    eclipse = NextLunarEclipse(eclipse.peak);
  }
  return count;
}

function fullCatalogue(): number {
  const deltaT = standardDeltaTModel();
  const eclipses = findLunarEclipses({ from, to, deltaT });
  const doc = catalogueDocument(eclipses, { convention: 'danjon', deltaTModel: deltaT.name, from, to });
  return doc.eclipses.length;
}

// Warm both paths once, then alternate so that drift hits both alike.
const bareCount = bareSearch();
const ourCount = fullCatalogue();
const bareTimes: number[] = [];
const ourTimes: number[] = [];
for (let round = 0; round < ROUNDS; round++) {
  bareTimes.push(time(bareSearch));
  ourTimes.push(time(fullCatalogue));
}
const bareMs = median(bareTimes);
const ourMs = median(ourTimes);

const wholeMs = median([0, 1, 2].map(() => time(() => findLunarEclipses({ from: SUPPORTED_RANGE.from, to: SUPPORTED_RANGE.to }))));
const wholeCount = findLunarEclipses({ from: SUPPORTED_RANGE.from, to: SUPPORTED_RANGE.to }).length;

const line = (label: string, value: string) => console.log(`${label.padEnd(58)} ${value}`);
console.log(`umbracast bench (median of ${ROUNDS} rounds, Node ${process.version})`);
line('catalogue 1900–2100, all fields (eclipses)', `${ourMs.toFixed(0)} ms (${ourCount})`);
line('bare astronomy-engine lunar-eclipse search 1900–2100', `${bareMs.toFixed(0)} ms (${bareCount})`);
line('ratio catalogue / bare search (target ≤ 1.5)', (ourMs / bareMs).toFixed(2));
line(`whole supported range ${SUPPORTED_RANGE.description} (eclipses)`, `${wholeMs.toFixed(0)} ms (${wholeCount})`);
