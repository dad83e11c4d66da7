/**
 * ΔT = TT − UT, in seconds.
 *
 * The standard model joins four pieces (IERS Bulletin A; Espenak & Meeus,
 * Five Millennium Canon of Solar Eclipses, NASA TP-2006-214141):
 * - observed yearly values (data/delta-t-observed.json) where they exist;
 * - before them, the Espenak–Meeus (2006) polynomials, themselves fits to
 *   historical eclipse and occultation records ("historical");
 * - after them, a forecast that leaves the last observed value with its
 *   recent rate and bends smoothly into the long-term parabola by 2150
 *   (cubic Hermite: value and slope match at both ends, so no jump);
 * - beyond 2150, and before 1600, the long-term fits ("long-term").
 * A user may replace all of it with a fixed value ("user").
 */
import { readFileSync } from 'node:fs';

// Read beside the sources and the build alike: src/ and dist/ sit at the same depth under the package.
const observed = JSON.parse(readFileSync(new URL('../../data/delta-t-observed.json', import.meta.url), 'utf8')) as { values: unknown };

export type DeltaTSource = 'observed' | 'historical' | 'forecast' | 'long-term' | 'user';

/** ΔT at one instant: seconds, and which part of the model supplied it. */
export interface DeltaT {
  readonly seconds: number;
  readonly source: DeltaTSource;
}

/** A ΔT model: decimal year (UT) in, ΔT out. */
export interface DeltaTModel {
  readonly name: string;
  at(decimalYear: number): DeltaT;
}

interface ObservedTable {
  readonly years: readonly number[];
  readonly seconds: readonly number[];
}

function loadObservedTable(): ObservedTable {
  const values = observed.values as [number, number][];
  return {
    years: values.map(([year]) => year),
    seconds: values.map(([, seconds]) => seconds),
  };
}

/** Morrison & Stephenson long-term parabola, as used by Espenak & Meeus. */
function longTermParabola(year: number): number {
  const u = (year - 1820) / 100;
  return -20 + 32 * u * u;
}

function longTermParabolaRate(year: number): number {
  return (64 * (year - 1820)) / 10000;
}

/** Espenak & Meeus (2006) polynomials, "Polynomial expressions for Delta T", 1000–1955. */
function espenakMeeusHistorical(year: number): number {
  if (year < 1600) {
    const u = (year - 1000) / 100;
    return 1574.2 - 556.01 * u + 71.23472 * u ** 2 + 0.319781 * u ** 3 - 0.8503463 * u ** 4
      - 0.005050998 * u ** 5 + 0.0083572073 * u ** 6;
  }
  if (year < 1700) {
    const t = year - 1600;
    return 120 - 0.9808 * t - 0.01532 * t ** 2 + t ** 3 / 7129;
  }
  if (year < 1800) {
    const t = year - 1700;
    return 8.83 + 0.1603 * t - 0.0059285 * t ** 2 + 0.00013336 * t ** 3 - t ** 4 / 1174000;
  }
  if (year < 1860) {
    const t = year - 1800;
    return 13.72 - 0.332447 * t + 0.0068612 * t ** 2 + 0.0041116 * t ** 3 - 0.00037436 * t ** 4
      + 0.0000121272 * t ** 5 - 0.0000001699 * t ** 6 + 0.000000000875 * t ** 7;
  }
  if (year < 1900) {
    const t = year - 1860;
    return 7.62 + 0.5737 * t - 0.251754 * t ** 2 + 0.01680668 * t ** 3 - 0.0004473624 * t ** 4
      + t ** 5 / 233174;
  }
  if (year < 1920) {
    const t = year - 1900;
    return -2.79 + 1.494119 * t - 0.0598939 * t ** 2 + 0.0061966 * t ** 3 - 0.000197 * t ** 4;
  }
  if (year < 1941) {
    const t = year - 1920;
    return 21.2 + 0.84493 * t - 0.0761 * t ** 2 + 0.0020936 * t ** 3;
  }
  if (year < 1961) {
    const t = year - 1950;
    return 29.07 + 0.407 * t - t ** 2 / 233 + t ** 3 / 2547;
  }
  const t = year - 1975;
  return 45.45 + 1.067 * t - t ** 2 / 260 - t ** 3 / 718;
}

/** Year at which the forecast has fully joined the long-term parabola. */
export const FORECAST_JOIN_YEAR = 2150;
/** Years of observations whose mean rate starts the forecast. */
const RECENT_RATE_SPAN_YEARS = 5;

function hermite(year: number, y0: number, v0: number, r0: number, y1: number, v1: number, r1: number): number {
  const h = y1 - y0;
  const s = (year - y0) / h;
  const s2 = s * s;
  const s3 = s2 * s;
  return (2 * s3 - 3 * s2 + 1) * v0 + (s3 - 2 * s2 + s) * h * r0 + (-2 * s3 + 3 * s2) * v1 + (s3 - s2) * h * r1;
}

function interpolateTable(table: ObservedTable, year: number): number {
  const { years, seconds } = table;
  let i = 0;
  while (i < years.length - 2 && years[i + 1]! <= year) i++;
  const y0 = years[i]!;
  const y1 = years[i + 1]!;
  const f = (year - y0) / (y1 - y0);
  return seconds[i]! + f * (seconds[i + 1]! - seconds[i]!);
}

/** The standard model, built on the observed table in data/. */
export function standardDeltaTModel(): DeltaTModel {
  const table = loadObservedTable();
  const firstYear = table.years[0]!;
  const lastIndex = table.years.length - 1;
  const lastYear = table.years[lastIndex]!;
  const lastSeconds = table.seconds[lastIndex]!;
  const rateStart = interpolateTable(table, lastYear - RECENT_RATE_SPAN_YEARS);
  const recentRate = (lastSeconds - rateStart) / RECENT_RATE_SPAN_YEARS;
  const joinSeconds = longTermParabola(FORECAST_JOIN_YEAR);
  const joinRate = longTermParabolaRate(FORECAST_JOIN_YEAR);
  return {
    name: `observed ${firstYear}–${lastYear}, forecast to ${FORECAST_JOIN_YEAR}, Espenak–Meeus beyond`,
    at(decimalYear: number): DeltaT {
      if (decimalYear < 1600) return { seconds: espenakMeeusHistorical(decimalYear), source: 'long-term' };
      if (decimalYear < firstYear) return { seconds: espenakMeeusHistorical(decimalYear), source: 'historical' };
      if (decimalYear <= lastYear) return { seconds: interpolateTable(table, decimalYear), source: 'observed' };
      if (decimalYear < FORECAST_JOIN_YEAR) {
        return {
          seconds: hermite(decimalYear, lastYear, lastSeconds, recentRate, FORECAST_JOIN_YEAR, joinSeconds, joinRate),
          source: 'forecast',
        };
      }
      return { seconds: longTermParabola(decimalYear), source: 'long-term' };
    },
  };
}

/** A user-supplied constant ΔT. */
export function fixedDeltaTModel(seconds: number): DeltaTModel {
  return {
    name: `fixed ${seconds} s (user)`,
    at: () => ({ seconds, source: 'user' }),
  };
}
