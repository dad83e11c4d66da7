/**
 * Bisection, the one implementation every stage uses: a bracket whose one
 * end lies inside a region (a predicate holds there) and the other outside
 * is halved, keeping one end on each side, until it is no wider than the
 * tolerance. Units are the caller's (days of UT or TT, radians).
 */
export interface Bracket {
  /** The end where the predicate holds. */
  readonly inside: number;
  /** The end where it does not. */
  readonly outside: number;
}

/**
 * Narrows [inside, outside] (either may be the larger) around the edge of
 * the region where `holds` is true; `holds(inside)` is taken as true and
 * `holds(outside)` as false without being asked.
 */
export function narrowBracket(inside: number, outside: number, holds: (t: number) => boolean, tolerance: number): Bracket {
  let a = inside;
  let b = outside;
  while (Math.abs(b - a) > tolerance) {
    const mid = (a + b) / 2;
    if (holds(mid)) a = mid;
    else b = mid;
  }
  return { inside: a, outside: b };
}

/**
 * The instant a function of time changes sign: the bracket [lo, hi] is
 * narrowed until it is no wider than the tolerance, and its middle is
 * returned. `fLo` is f(lo), whose sign must differ from f(hi)'s (a zero
 * counts as negative).
 */
export function bisectSignChange(f: (t: number) => number, lo: number, hi: number, fLo: number, tolerance: number): number {
  const loPositive = fLo > 0;
  const { inside, outside } = narrowBracket(lo, hi, (t) => f(t) > 0 === loPositive, tolerance);
  return (inside + outside) / 2;
}
