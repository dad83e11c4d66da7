/**
 * The figures we print about an eclipse, each rounded once, from the full
 * value: magnitudes to 0.001, gamma to 0.0001, the time of greatest and the
 * phases' lengths to the minute. Every human-readable output (list table,
 * map, caption, contact sheet) takes them from here, so one eclipse reads the
 * same everywhere; rounding a value already rounded for the data outputs
 * (1.15047 → 1.1505 → 1.151) would not.
 */
import { isoMinutes } from '../../ephemeris/time.ts';
import type { ContactName } from './contacts.ts';
import type { LunarEclipse } from './types.ts';

export interface PrintedFigures {
  /** Greatest eclipse, UTC, to the minute: "2025-03-14 06:59". */
  readonly greatestUtc: string;
  /** "1.150" (ASCII minus if negative). */
  readonly umbralMagnitude: string;
  readonly penumbralMagnitude: string;
  /** "0.3485". */
  readonly gamma: string;
  /** Whole minutes from contact to contact: P1→P4, U1→U4, U2→U3. */
  readonly minutes: { readonly penumbral: number; readonly partial?: number; readonly total?: number };
}

/** Decimal places printed for each figure. */
export const PRINTED_PLACES = { magnitude: 3, gamma: 4 } as const;

/** toFixed rounds the exact binary value once (ECMA-262 Number.prototype.toFixed); "-0.000" reads as "0.000". */
export function fixed(value: number, places: number): string {
  const text = value.toFixed(places);
  return /^-0\.?0*$/.test(text) ? text.slice(1) : text;
}

export function printedFigures(eclipse: LunarEclipse): PrintedFigures {
  const c = eclipse.contacts;
  const minutes = (a: ContactName, b: ContactName) => {
    const start = c[a];
    const end = c[b];
    return start && end ? Math.round((end.utDays - start.utDays) * 1440) : undefined;
  };
  const partial = minutes('U1', 'U4');
  const total = minutes('U2', 'U3');
  return {
    greatestUtc: isoMinutes(eclipse.greatest.utDays).slice(0, 16).replace('T', ' '),
    umbralMagnitude: fixed(eclipse.umbralMagnitude, PRINTED_PLACES.magnitude),
    penumbralMagnitude: fixed(eclipse.penumbralMagnitude, PRINTED_PLACES.magnitude),
    gamma: fixed(eclipse.gamma, PRINTED_PLACES.gamma),
    minutes: {
      penumbral: minutes('P1', 'P4')!,
      ...(partial !== undefined ? { partial } : {}),
      ...(total !== undefined ? { total } : {}),
    },
  };
}
