/**
 * The derivative of a Chebyshev series, as a series (Numerical Recipes,
 * §5.9, chder): rates of the Besselian elements come from the same fit as
 * their values, so the two always agree.
 */
import type { ChebyshevSeries } from './chebyshev.ts';

export function chebyshevDerivative(series: ChebyshevSeries): ChebyshevSeries {
  const c = series.coefficients;
  const n = c.length;
  const d = new Array<number>(n).fill(0);
  if (n >= 2) {
    d[n - 2] = 2 * (n - 1) * c[n - 1]!;
    for (let j = n - 3; j >= 0; j--) d[j] = d[j + 2]! + 2 * (j + 1) * c[j + 1]!;
  }
  const scale = 2 / (series.endDays - series.startDays);
  return { startDays: series.startDays, endDays: series.endDays, coefficients: d.map((v) => v * scale) };
}
