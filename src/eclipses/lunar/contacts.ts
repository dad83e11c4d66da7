/**
 * Greatest eclipse and the contacts, solved on a shadow track (Explanatory Supplement to the
 * Astronomical Almanac, 3rd ed., ch. 11).
 * Each contact is its own root: nothing assumes symmetry about greatest.
 */
import { bisectSignChange } from '../../ephemeris/roots.ts';
import type { ShadowConvention } from './conventions.ts';
import type { ShadowState, ShadowTrack } from './track.ts';

export type ContactName = 'P1' | 'U1' | 'U2' | 'U3' | 'U4' | 'P4';
export const CONTACT_ORDER: readonly ContactName[] = ['P1', 'U1', 'U2', 'U3', 'U4', 'P4'];

/** Solve to a hundredth of a second; outputs round to the second. */
const TIME_TOLERANCE_DAYS = 1e-7;
const GOLDEN = (Math.sqrt(5) - 1) / 2;

/** The instant of minimum separation between Moon and shadow axis (golden-section search). */
export function findGreatestTT(track: ShadowTrack): number {
  let a = track.startTTDays;
  let b = track.endTTDays;
  let c = b - GOLDEN * (b - a);
  let d = a + GOLDEN * (b - a);
  let fc = track.at(c).separationRad;
  let fd = track.at(d).separationRad;
  while (b - a > TIME_TOLERANCE_DAYS) {
    if (fc < fd) {
      b = d;
      d = c;
      fd = fc;
      c = b - GOLDEN * (b - a);
      fc = track.at(c).separationRad;
    } else {
      a = c;
      c = d;
      fc = fd;
      d = a + GOLDEN * (b - a);
      fd = track.at(d).separationRad;
    }
  }
  return (a + b) / 2;
}

/** Which circle a contact touches: the Moon's limb on the edge of a shadow. */
export type ContactLimit = (state: ShadowState, convention: ShadowConvention) => number;

/** Positive outside the contact circle, negative inside. */
export const penumbralLimit: ContactLimit = (s, c) => s.separationRad - (c.radii(s).penumbraRad + s.moonSemiDiameterRad);
export const umbralOuterLimit: ContactLimit = (s, c) => s.separationRad - (c.radii(s).umbraRad + s.moonSemiDiameterRad);
export const umbralInnerLimit: ContactLimit = (s, c) => s.separationRad - (c.radii(s).umbraRad - s.moonSemiDiameterRad);

export const CONTACT_LIMITS: Readonly<Record<ContactName, ContactLimit>> = {
  P1: penumbralLimit,
  P4: penumbralLimit,
  U1: umbralOuterLimit,
  U4: umbralOuterLimit,
  U2: umbralInnerLimit,
  U3: umbralInnerLimit,
};

/** Bisection for the sign change of `limit` between two instants; undefined if there is none. */
export function findCrossingTT(
  track: ShadowTrack,
  convention: ShadowConvention,
  limit: ContactLimit,
  fromTTDays: number,
  toTTDays: number,
): number | undefined {
  const at = (ttDays: number) => limit(track.at(ttDays), convention);
  const fa = at(fromTTDays);
  const fb = at(toTTDays);
  if (Math.sign(fa) === Math.sign(fb)) return undefined;
  return bisectSignChange(at, fromTTDays, toTTDays, fa, TIME_TOLERANCE_DAYS);
}
