/**
 * What every eclipse record carries, whatever its body: the command line, the batch and the outputs
 * dispatch on `body`, and reach the per-kind fields only behind it.
 */
import type { DeltaT } from '../../ephemeris/deltaT.ts';
import type { Moment } from '../../ephemeris/time.ts';

export type EclipseBody = 'lunar' | 'solar';
export const ECLIPSE_BODIES: readonly EclipseBody[] = ['lunar', 'solar'];

export interface EclipseCore<Body extends EclipseBody, Kind extends string, Contact extends string> {
  readonly body: Body;
  /** UTC date of greatest eclipse, YYYY-MM-DD: no date holds two eclipses in the supported years. */
  readonly id: string;
  readonly kind: Kind;
  readonly greatest: Moment;
  /** ΔT used for every UT instant of this eclipse (its value at greatest). */
  readonly deltaT: DeltaT;
  /** Least distance of the Moon (lunar) or of the shadow axis (solar) from the axis or the Earth's centre; + north. */
  readonly gamma: number;
  readonly saros: number;
  /** The contacts that occur. */
  readonly contacts: Readonly<Partial<Record<Contact, Moment>>>;
}
