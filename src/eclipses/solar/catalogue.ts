/**
 * The solar catalogue: every solar eclipse in a UT range.
 *
 * For each lunation: Meeus's mean elements (Astronomical Algorithms, ch. 49
 * and 54) say whether the new moon lies near enough a node; astronomy-engine
 * finds the new moon; nine ephemeris samples then give the Besselian
 * elements over ten hours, and everything else follows from them.
 */
import { SearchMoonPhase } from 'astronomy-engine';
import { ephemerisTime } from '../../ephemeris/bodies.ts';
import { standardDeltaTModel, type DeltaTModel } from '../../ephemeris/deltaT.ts';
import { decimalYearFromDays } from '../../ephemeris/time.ts';
import { checkRange, eclipsesInRange, SUPPORTED_RANGE } from '../common/range.ts';
import { meanArgumentOfLatitude, meanFullMoonTTDays } from '../common/lunations.ts';
import { fitAxisOnly, fitBesselian, sampleAxis, type AxisSamples } from './besselian.ts';
import { describeSolarEclipse, greatestTT, penumbraAtWindowEdge, penumbraTouchesEarth } from './global.ts';
import type { SolarEclipse } from './types.ts';

export { SUPPORTED_RANGE };

export interface SolarCatalogueOptions {
  /** Start of the range, inclusive (UT). */
  readonly from: Date;
  /** End of the range, exclusive (UT). */
  readonly to: Date;
  /** ΔT model; default the standard observed + forecast + long-term model. */
  readonly deltaT?: DeltaTModel;
}

const HOUR_DAYS = 1 / 24;
/** Half the window of the elements: the longest P1 → P4 is under seven hours, and greatest lies within an hour of new moon. */
export const SOLAR_WINDOW_HALF_DAYS = 5 * HOUR_DAYS;

/** Mean new moon of lunation k (k integer: Meeus ch. 49 numbering), TT days since J2000. */
export const meanNewMoonTTDays = (k: number): number => meanFullMoonTTDays(k - 0.5);

/**
 * Meeus ch. 54 rejects a new moon when |sin F| > 0.36; the solar eclipses of
 * 1000–3000 found here reach 0.347 at most (measured for this project). We
 * keep a margin of about 3° beyond Meeus (0.40) and let the geometry decide;
 * it spares a quarter of the candidates that |sin F| ≤ 0.5 would keep.
 */
export const SOLAR_PRUNE_SIN_F = 0.4;

export function mayHoldSolarEclipse(k: number): boolean {
  return Math.abs(Math.sin(meanArgumentOfLatitude(k))) <= SOLAR_PRUNE_SIN_F;
}

/** Every solar eclipse whose greatest (UT) falls in [from, to), in time order. */
export function findSolarEclipses(options: SolarCatalogueOptions): SolarEclipse[] {
  checkRange(options.from, options.to);
  const deltaTModel = options.deltaT ?? standardDeltaTModel();
  return eclipsesInRange(options.from, options.to, (k) => (mayHoldSolarEclipse(k) ? solarEclipseAtLunation(k, deltaTModel) : undefined));
}

/** The solar eclipse at new moon k (Meeus numbering), if there is one. */
export function solarEclipseAtLunation(k: number, deltaTModel: DeltaTModel): SolarEclipse | undefined {
  const meanTT = meanNewMoonTTDays(k);
  const newMoon = SearchMoonPhase(0, ephemerisTime(meanTT - 2), 4);
  if (!newMoon) throw new Error(`no new moon found within 2 days of mean lunation ${k}`);
  return solarEclipseNearTT(newMoon.tt, deltaTModel);
}

/** The solar eclipse whose greatest lies within a few hours of a TT instant (a new moon), if there is one. */
export function solarEclipseNearTT(centreTTDays: number, deltaTModel: DeltaTModel): SolarEclipse | undefined {
  const window = (centre: number): AxisSamples => sampleAxis(centre - SOLAR_WINDOW_HALF_DAYS, centre + SOLAR_WINDOW_HALF_DAYS);
  const deltaTAt = (tt: number) => deltaTModel.at(decimalYearFromDays(tt));
  let axis = window(centreTTDays);
  let geometry = fitAxisOnly(axis);
  let greatest = greatestTT(geometry, centreTTDays);
  if (!penumbraTouchesEarth(geometry, greatest)) return undefined;
  if (penumbraAtWindowEdge(geometry)) {
    axis = window(greatest);
    geometry = fitAxisOnly(axis);
    greatest = greatestTT(geometry, greatest);
  }
  const deltaT = deltaTAt(greatest);
  const fit = fitBesselian(axis, deltaT.seconds);
  return describeSolarEclipse(fit, greatest, deltaT);
}
