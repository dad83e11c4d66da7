/**
 * Saros numbers from lunation counts (saros and inex: van den Bergh 1955, from memory). One saros is 223
 * lunations (same number), one inex 358 (number + 1). Since
 * 38 × 358 ≡ 1 (mod 223), an eclipse L lunations after the anchor is
 * 38·L (mod 223) inexes away; of that residue class we take the inex count
 * nearest the one its date implies (L / 358), which picks the one active
 * series among the 223 candidates — active series span far fewer numbers.
 */
import { SYNODIC_MONTH_DAYS } from './lunations.ts';

/** The total lunar eclipse of 2025-03-14 is in lunar saros 123 (from memory); its greatest ≈ 2025-03-14T07:00 TT. */
export const SAROS_ANCHOR = { ttDays: 9203.29, saros: 123 } as const;

export const SAROS_LUNATIONS = 223;
export const INEX_LUNATIONS = 358;
/** The inverse of 358 modulo 223. */
const INEX_INVERSE = 38;

/** An eclipse of known saros: the numbering of every other eclipse of its body follows from it. */
export interface SarosAnchor {
  readonly ttDays: number;
  readonly saros: number;
}

export function lunationsFromAnchor(ttDays: number, anchor: SarosAnchor = SAROS_ANCHOR): number {
  return Math.round((ttDays - anchor.ttDays) / SYNODIC_MONTH_DAYS);
}

export function sarosOfLunation(lunations: number, anchor: SarosAnchor = SAROS_ANCHOR): number {
  const residue = (((INEX_INVERSE * lunations) % SAROS_LUNATIONS) + SAROS_LUNATIONS) % SAROS_LUNATIONS;
  const expectedInex = lunations / INEX_LUNATIONS;
  const inex = residue + SAROS_LUNATIONS * Math.round((expectedInex - residue) / SAROS_LUNATIONS);
  return anchor.saros + inex;
}

export function sarosAt(ttDays: number, anchor: SarosAnchor = SAROS_ANCHOR): number {
  return sarosOfLunation(lunationsFromAnchor(ttDays, anchor), anchor);
}
