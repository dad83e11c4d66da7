import type { EclipseCore } from '../common/record.ts';
import type { LonLat } from '../../ephemeris/earth.ts';
import type { ContactName } from './contacts.ts';
import type { ShadowConventionName } from './conventions.ts';

export type EclipseKind = 'penumbral' | 'partial' | 'total';
export const ECLIPSE_KINDS: readonly EclipseKind[] = ['penumbral', 'partial', 'total'];

export interface PhaseDurations {
  /** P1 → P4, seconds. */
  readonly penumbralSeconds: number;
  /** U1 → U4, seconds; absent for penumbral eclipses. */
  readonly partialSeconds?: number;
  /** U2 → U3, seconds; absent unless total. */
  readonly totalSeconds?: number;
}

/** One lunar eclipse, as computed under one shadow convention and one ΔT model. */
export interface LunarEclipse extends EclipseCore<'lunar', EclipseKind, ContactName> {
  readonly convention: ShadowConventionName;
  readonly umbralMagnitude: number;
  readonly penumbralMagnitude: number;
  readonly durations: PhaseDurations;
  /** Where the Moon is at the zenith at greatest and at each contact that occurs. */
  readonly subLunar: Readonly<{ greatest: LonLat } & Partial<Record<ContactName, LonLat>>>;
}
