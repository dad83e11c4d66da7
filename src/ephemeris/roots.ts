/**
 * The instant a function of time changes sign, by bisection: the bracket
 * [lo, hi] is halved, keeping the half where the sign changes, until it is no
 * wider than the tolerance; its middle is returned. `fLo` is f(lo), whose
 * sign must differ from f(hi)'s (a zero counts as negative). Units are the
 * caller's (days of UT or TT here).
 */
export function bisectSignChange(f: (t: number) => number, lo: number, hi: number, fLo: number, tolerance: number): number {
  let a = lo;
  let b = hi;
  let fa = fLo;
  while (b - a > tolerance) {
    const mid = (a + b) / 2;
    const fm = f(mid);
    if (fm > 0 === fa > 0) {
      a = mid;
      fa = fm;
    } else {
      b = mid;
    }
  }
  return (a + b) / 2;
}
