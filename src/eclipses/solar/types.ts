/** Solar eclipses as plain data: what the catalogue, the local circumstances and the curves hand on. */
import type { EclipseCore } from '../common/record.ts';
import type { LonLat } from '../../ephemeris/earth.ts';
import type { BesselianFit } from './besselian.ts';

/** Kind of the eclipse as a whole. Non-central total and annular eclipses are `total`/`annular` with `central: false`. */
export type SolarEclipseKind = 'total' | 'annular' | 'hybrid' | 'partial';
export const SOLAR_ECLIPSE_KINDS: readonly SolarEclipseKind[] = ['total', 'annular', 'hybrid', 'partial'];

/**
 * Global contacts (Explanatory Supplement, ch. 11): P1/P4 the penumbra's
 * first and last touch of the Earth; U1/U4 the umbra's (or antumbra's)
 * first and last touch; U2/U3 the first and last instant it lies wholly on
 * the Earth.
 */
export type SolarContactName = 'P1' | 'U1' | 'U2' | 'U3' | 'U4' | 'P4';
export const SOLAR_CONTACT_ORDER: readonly SolarContactName[] = ['P1', 'U1', 'U2', 'U3', 'U4', 'P4'];

/** The Moon radii (in Earth equatorial radii) an eclipse was computed with. */
export interface MoonRadii {
  /** k1: penumbra (partial limits, C1/C4, magnitudes). */
  readonly penumbra: number;
  /** k2: umbra and antumbra. */
  readonly umbra: number;
}

export interface SolarDurations {
  /** P1 → P4 on the whole Earth, seconds. */
  readonly partialSeconds: number;
  /** Totality or annularity on the central line at greatest eclipse, seconds; central eclipses only. */
  readonly centralSeconds?: number;
}

/** One solar eclipse, as computed under one ΔT model. */
export interface SolarEclipse extends EclipseCore<'solar', SolarEclipseKind, SolarContactName> {
  /** Whether the shadow axis meets the Earth. */
  readonly central: boolean;
  /** Magnitude at the greatest point at greatest eclipse (the fraction of the Sun's diameter covered). */
  readonly magnitude: number;
  /** Where the axis meets the Earth at greatest; for non-central eclipses, the point of the Earth's limb nearest the axis. */
  readonly greatestPoint: LonLat;
  /** The Sun's geometric altitude at the greatest point, degrees (no refraction). */
  readonly sunAltitudeDeg: number;
  /** Width of the total/annular path at greatest, km (central eclipses, when both limits lie on the Earth). */
  readonly pathWidthKm?: number;
  readonly durations: SolarDurations;
  readonly moonRadii: MoonRadii;
  /** The Besselian elements the eclipse was computed from: local circumstances and curves start here. */
  readonly elements: BesselianFit;
}
