/**
 * Chebyshev interpolation on an interval: a few ephemeris samples in, a
 * cheap smooth function out. Over the ten hours of an eclipse the Moon's
 * path is smooth enough that nine samples reproduce it to well under a
 * milliarcsecond (pinned in test/eclipses/track.test.ts).
 */

export interface ChebyshevSeries {
  readonly startDays: number;
  readonly endDays: number;
  readonly coefficients: readonly number[];
}

/** The sample instants for `count` nodes over [startDays, endDays]. */
export function chebyshevNodes(startDays: number, endDays: number, count: number): number[] {
  const mid = (startDays + endDays) / 2;
  const half = (endDays - startDays) / 2;
  return Array.from({ length: count }, (_, k) => mid + half * Math.cos((Math.PI * (k + 0.5)) / count));
}

/** Fit from values taken at chebyshevNodes(startDays, endDays, values.length). */
export function fitChebyshev(startDays: number, endDays: number, values: readonly number[]): ChebyshevSeries {
  const n = values.length;
  const coefficients = Array.from({ length: n }, (_, j) => {
    let sum = 0;
    for (let k = 0; k < n; k++) sum += values[k]! * Math.cos((Math.PI * j * (k + 0.5)) / n);
    return (2 / n) * sum;
  });
  return { startDays, endDays, coefficients };
}

/** Clenshaw evaluation. */
export function evaluateChebyshev(series: ChebyshevSeries, days: number): number {
  const { startDays, endDays, coefficients } = series;
  const x = (2 * days - startDays - endDays) / (endDays - startDays);
  let b1 = 0;
  let b2 = 0;
  for (let j = coefficients.length - 1; j >= 1; j--) {
    const b0 = 2 * x * b1 - b2 + coefficients[j]!;
    b2 = b1;
    b1 = b0;
  }
  return x * b1 - b2 + coefficients[0]! / 2;
}
