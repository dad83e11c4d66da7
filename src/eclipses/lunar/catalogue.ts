/**
 * The catalogue: every lunar eclipse in a UT range, with its geometry.
 *
 * For each lunation: Meeus's mean elements say whether an eclipse is possible;
 * astronomy-engine finds the full moon; one sampled shadow track (nine
 * ephemeris calls) then gives greatest eclipse, magnitudes and every contact.
 */
import { SearchMoonPhase } from 'astronomy-engine';
import { ephemerisTime } from '../../ephemeris/bodies.ts';
import { standardDeltaTModel, type DeltaTModel } from '../../ephemeris/deltaT.ts';
import { subBodyPoint, type LonLat } from '../../ephemeris/earth.ts';
import {
  decimalYearFromDays,
  isoSeconds,
  momentFromTT,
  utDaysFromDate,
  wholeSecondsBetween,
  type Moment,
} from '../../ephemeris/time.ts';
import { CONTACT_LIMITS, CONTACT_ORDER, findCrossingTT, findGreatestTT, type ContactName } from './contacts.ts';
import { shadowConvention, type ShadowConvention, type ShadowConventionName } from './conventions.ts';
import { lunationIndexNear, mayHoldLunarEclipse, meanFullMoonTTDays } from '../common/lunations.ts';
import { checkRange, eclipsesInRange, SUPPORTED_RANGE } from '../common/range.ts';
import { sarosAt } from '../common/saros.ts';
import { sampleShadowTrack, type ShadowTrack } from './track.ts';
import type { EclipseKind, LunarEclipse, PhaseDurations } from './types.ts';

export interface CatalogueOptions {
  /** Start of the range, inclusive (UT). */
  readonly from: Date;
  /** End of the range, exclusive (UT). */
  readonly to: Date;
  /** Shadow convention; default Danjon. */
  readonly convention?: ShadowConventionName;
  /** ΔT model; default the standard observed + forecast + long-term model. */
  readonly deltaT?: DeltaTModel;
}

const HOUR_DAYS = 1 / 24;
/** First window around the full moon; wide enough for the longest penumbral phase (≈ 6 h 20 min). */
const WINDOW_HALF_DAYS = 5 * HOUR_DAYS;

/** Every lunar eclipse whose greatest (UT) falls in [from, to), in time order. */
export function findLunarEclipses(options: CatalogueOptions): LunarEclipse[] {
  checkRange(options.from, options.to);
  const convention = shadowConvention(options.convention ?? 'danjon');
  const deltaTModel = options.deltaT ?? standardDeltaTModel();
  return eclipsesInRange(options.from, options.to, (k) => (mayHoldLunarEclipse(k, convention) ? eclipseAtLunation(k, convention, deltaTModel) : undefined), meanFullMoonTTDays);
}

/** The eclipse at full moon k + 0.5 (Meeus numbering), if there is one. */
export function eclipseAtLunation(k: number, convention: ShadowConvention, deltaTModel: DeltaTModel): LunarEclipse | undefined {
  const meanTT = meanFullMoonTTDays(k);
  const fullMoon = SearchMoonPhase(180, ephemerisTime(meanTT - 2), 4);
  if (!fullMoon) throw new Error(`no full moon found within 2 days of mean lunation ${k + 0.5}`);
  let track = sampleShadowTrack(fullMoon.tt - WINDOW_HALF_DAYS, fullMoon.tt + WINDOW_HALF_DAYS);
  let greatestTT = findGreatestTT(track);
  const limit = CONTACT_LIMITS.P1;
  if (limit(track.at(greatestTT), convention) >= 0) return undefined;
  if (limit(track.at(track.startTTDays), convention) <= 0 || limit(track.at(track.endTTDays), convention) <= 0) {
    // The penumbral phase reaches an edge of the window: centre a new one on greatest.
    track = sampleShadowTrack(greatestTT - WINDOW_HALF_DAYS, greatestTT + WINDOW_HALF_DAYS);
    greatestTT = findGreatestTT(track);
  }
  return describeEclipse(track, greatestTT, convention, deltaTModel);
}

function describeEclipse(track: ShadowTrack, greatestTT: number, convention: ShadowConvention, deltaTModel: DeltaTModel): LunarEclipse {
  const state = track.at(greatestTT);
  const radii = convention.radii(state);
  const twiceMoonSD = 2 * state.moonSemiDiameterRad;
  const umbralMagnitude = (radii.umbraRad + state.moonSemiDiameterRad - state.separationRad) / twiceMoonSD;
  const penumbralMagnitude = (radii.penumbraRad + state.moonSemiDiameterRad - state.separationRad) / twiceMoonSD;
  const kind: EclipseKind = umbralMagnitude >= 1 ? 'total' : umbralMagnitude > 0 ? 'partial' : 'penumbral';

  const deltaT = deltaTModel.at(decimalYearFromDays(greatestTT));
  const moment = (tt: number): Moment => momentFromTT(tt, deltaT.seconds);
  const greatest = moment(greatestTT);

  const contactTT: Partial<Record<ContactName, number>> = {};
  for (const name of CONTACT_ORDER) {
    if ((name === 'U1' || name === 'U4') && kind === 'penumbral') continue;
    if ((name === 'U2' || name === 'U3') && kind !== 'total') continue;
    const before = name === 'P1' || name === 'U1' || name === 'U2';
    const [from, to] = before ? [track.startTTDays, greatestTT] : [greatestTT, track.endTTDays];
    const tt = findCrossingTT(track, convention, CONTACT_LIMITS[name], from, to);
    if (tt === undefined) throw new Error(`contact ${name} of the eclipse near ${isoSeconds(greatest.utDays)} lies outside its window`);
    contactTT[name] = tt;
  }

  const contacts: Partial<Record<ContactName, Moment>> = {};
  const subLunar: { greatest: LonLat } & Partial<Record<ContactName, LonLat>> = {
    greatest: subBodyPoint(state.moonPositionKm, greatest),
  };
  for (const name of CONTACT_ORDER) {
    const tt = contactTT[name];
    if (tt === undefined) continue;
    contacts[name] = moment(tt);
    subLunar[name] = subBodyPoint(track.at(tt).moonPositionKm, contacts[name]);
  }

  const span = (a: ContactName, b: ContactName): number | undefined => {
    const start = contacts[a];
    const end = contacts[b];
    return start && end ? wholeSecondsBetween(start.utDays, end.utDays) : undefined;
  };
  const partialSeconds = span('U1', 'U4');
  const totalSeconds = span('U2', 'U3');
  const durations: PhaseDurations = {
    penumbralSeconds: span('P1', 'P4')!,
    ...(partialSeconds !== undefined ? { partialSeconds } : {}),
    ...(totalSeconds !== undefined ? { totalSeconds } : {}),
  };

  return {
    body: 'lunar',
    id: isoSeconds(greatest.utDays).slice(0, 10),
    kind,
    convention: convention.name,
    greatest,
    deltaT,
    gamma: (state.northSign * state.separationRad) / state.moonParallaxRad,
    umbralMagnitude,
    penumbralMagnitude,
    saros: sarosAt(greatestTT),
    contacts,
    durations,
    subLunar,
  };
}


/** The eclipse whose greatest (UT) lies nearest an instant, if one lies within `withinDays`. */
export function eclipseNear(at: Date, withinDays: number, options: Omit<CatalogueOptions, 'from' | 'to'> = {}): LunarEclipse | undefined {
  const clamp = (ms: number) => new Date(Math.min(Math.max(ms, SUPPORTED_RANGE.from.getTime()), SUPPORTED_RANGE.to.getTime()));
  const from = clamp(at.getTime() - withinDays * 86_400_000);
  const to = clamp(at.getTime() + withinDays * 86_400_000);
  if (to <= from) return undefined;
  const target = utDaysFromDate(at);
  const found = findLunarEclipses({ ...options, from, to });
  return found.sort((a, b) => Math.abs(a.greatest.utDays - target) - Math.abs(b.greatest.utDays - target))[0];
}

/** The first eclipse whose greatest (UT) falls at or after an instant. */
export function nextEclipse(after: Date, options: Omit<CatalogueOptions, 'from' | 'to'> = {}): LunarEclipse | undefined {
  const to = new Date(Math.min(after.getTime() + 400 * 86_400_000, SUPPORTED_RANGE.to.getTime()));
  if (to <= after) return undefined;
  return findLunarEclipses({ ...options, from: after, to })[0];
}
