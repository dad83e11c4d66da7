import type { DeltaT } from '../../ephemeris/deltaT.ts';
import type { LonLat } from '../../ephemeris/earth.ts';
import type { Moment } from '../../ephemeris/time.ts';
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
export interface LunarEclipse {
  /** UTC date of greatest eclipse, YYYY-MM-DD. */
  readonly id: string;
  readonly kind: EclipseKind;
  readonly convention: ShadowConventionName;
  readonly greatest: Moment;
  /** ΔT used for every UT instant of this eclipse (its value at greatest). */
  readonly deltaT: DeltaT;
  /** Minimum separation over the Moon's equatorial horizontal parallax; + when the Moon passes north of the axis. */
  readonly gamma: number;
  readonly umbralMagnitude: number;
  readonly penumbralMagnitude: number;
  readonly saros: number;
  /** The contacts that occur. */
  readonly contacts: Readonly<Partial<Record<ContactName, Moment>>>;
  readonly durations: PhaseDurations;
  /** Where the Moon is at the zenith at greatest and at each contact that occurs. */
  readonly subLunar: Readonly<{ greatest: LonLat } & Partial<Record<ContactName, LonLat>>>;
}
