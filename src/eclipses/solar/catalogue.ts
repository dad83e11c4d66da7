/**
 * The solar catalogue: every solar eclipse in a UT range.
 *
 * For each lunation: Meeus's γ (Astronomical Algorithms, ch. 49 and 54)
 * says whether the new moon can hold an eclipse at all; astronomy-engine
 * finds the new moon; nine ephemeris samples then give the Besselian
 * elements over ten hours, and everything else follows from them.
 */
import { SearchMoonPhase } from 'astronomy-engine';
import { ephemerisTime } from '../../ephemeris/bodies.ts';
import { standardDeltaTModel, type DeltaTModel } from '../../ephemeris/deltaT.ts';
import { decimalYearFromDays } from '../../ephemeris/time.ts';
import { checkRange, eclipsesInRange, SUPPORTED_RANGE } from '../common/range.ts';
import { DISTANCE_EXTREMES_KM, GAMMA_SERIES_MARGIN, meanFullMoonTTDays, meeusSolarGamma } from '../common/lunations.ts';
import { EARTH_EQUATORIAL_RADIUS_KM, K_PENUMBRA, SUN_RADIUS_EARTH_RADII } from './constants.ts';
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
 * The prefilter: a new moon can hold a solar eclipse only if Meeus's γ
 * (ch. 54) is below the largest the penumbra's reach can ever be, plus the
 * error of Meeus's series.
 *
 * The reach. There is an eclipse when the penumbra touches the Earth at
 * greatest, when the shadow axis passes nearest the Earth's centre
 * (global.ts, P1's condition): the axis lies within l1 of the Earth's
 * outline on the fundamental plane. That outline (the ellipse of ρ1 ≤ 1)
 * lies inside the unit circle, and on the sunlit side (ζ ≥ 0) the penumbra
 * is no wider than on the plane, so an eclipse needs |γ| < 1 + l1.
 * l1 = (z + k1/sin f1) tan f1 with sin f1 = (R☉ + k1)/|G| (besselian.ts,
 * after the Explanatory Supplement ch. 11) grows with the Moon's distance z
 * and as the Sun–Moon distance |G| shrinks: over years 1000–3000 z is at
 * most 406,800 km and |G| at least 0.9825 AU − 406,800 km (the extremes of
 * common/lunations.ts, Meeus ch. 25 and 50), which gives l1 ≤ 0.5761.
 *
 * The margin. Over every new moon of years 1000–3000 that holds an eclipse,
 * Meeus's γ differs from the γ of our Besselian elements by −0.0093 …
 * +0.0105 Earth radii (measured for this project; checked over the whole
 * range by test/eclipses/solarPrefilter.test.ts, so that no eclipse is
 * lost), under the lunar series' 0.0162: the same margin, 0.05, serves.
 *
 * Meeus's own test is |γ| > 1.5433 + u; |sin F| ≤ 0.40, which this
 * replaces, sampled 1.36 new moons per eclipse over 1000–3000, this 1.05.
 */
export const LARGEST_PENUMBRA_L1 = largestPenumbraRadius();

function largestPenumbraRadius(): number {
  const z = DISTANCE_EXTREMES_KM.moonFarthest / EARTH_EQUATORIAL_RADIUS_KM;
  const sunMoon = (DISTANCE_EXTREMES_KM.sunNearest - DISTANCE_EXTREMES_KM.moonFarthest) / EARTH_EQUATORIAL_RADIUS_KM;
  const sinF1 = (SUN_RADIUS_EARTH_RADII + K_PENUMBRA) / sunMoon;
  return (z + K_PENUMBRA / sinF1) * Math.tan(Math.asin(sinF1));
}

/** The largest |γ| (Earth radii) at which the penumbra can still touch the Earth, years 1000–3000. */
export const LARGEST_SOLAR_GAMMA = 1 + LARGEST_PENUMBRA_L1;

/** False only where no solar eclipse is possible at new moon k. */
export function mayHoldSolarEclipse(k: number): boolean {
  return Math.abs(meeusSolarGamma(k)) <= LARGEST_SOLAR_GAMMA + GAMMA_SERIES_MARGIN;
}

/** Every solar eclipse whose greatest (UT) falls in [from, to), in time order. */
export function findSolarEclipses(options: SolarCatalogueOptions): SolarEclipse[] {
  checkRange(options.from, options.to);
  const deltaTModel = options.deltaT ?? standardDeltaTModel();
  return eclipsesInRange(options.from, options.to, (k) => (mayHoldSolarEclipse(k) ? solarEclipseAtLunation(k, deltaTModel) : undefined), meanNewMoonTTDays);
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
