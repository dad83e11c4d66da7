/** The supported years, and the lunations of a range: shared by every kind of eclipse. */
import { InputError } from '../../errors.ts';
import { utDaysFromDate, type Moment } from '../../ephemeris/time.ts';
import { lunationIndexNear } from './lunations.ts';

/** First and last supported instants (UT): years 1000 through 3000. */
export const SUPPORTED_RANGE = {
  from: new Date(Date.UTC(1000, 0, 1)),
  to: new Date(Date.UTC(3001, 0, 1)),
  description: 'years 1000 to 3000',
} as const;

export function checkRange(from: Date, to: Date): void {
  const describe = (d: Date) => (Number.isFinite(d.getTime()) ? d.toISOString() : 'an invalid date');
  if (!Number.isFinite(from.getTime()) || from < SUPPORTED_RANGE.from || from >= SUPPORTED_RANGE.to) {
    throw new InputError('from', `an instant within ${SUPPORTED_RANGE.description}`, describe(from));
  }
  if (!Number.isFinite(to.getTime()) || to <= SUPPORTED_RANGE.from || to > SUPPORTED_RANGE.to) {
    throw new InputError('to', `an instant within ${SUPPORTED_RANGE.description}`, describe(to));
  }
  if (to <= from) {
    throw new InputError('to', `a time after from (${from.toISOString()})`, describe(to));
  }
}

/**
 * How far greatest eclipse (UT) can lie from its lunation's mean full or new
 * moon (TT), days, with room to spare: the true phase lies within about 0.6 d
 * of the mean one (Meeus ch. 49: the periodic terms' amplitudes sum to about
 * 0.6 d), greatest eclipse within an hour or two of the full or new moon, and
 * TT − UT is under two hours over years 1000–3000. Tested over the whole
 * range for both kinds (test/eclipses/lunationReach.test.ts, solarPrefilter.test.ts).
 */
export const MEAN_PHASE_REACH_DAYS = 2;

/**
 * The eclipses of a kind whose greatest (UT) falls in [from, to), in time order: `atLunation`
 * gives the eclipse of lunation k (Meeus numbering), if there is one; `meanPhaseTTDays` the mean
 * full or new moon (TT) of lunation k for that kind. Lunations whose mean phase lies farther than
 * MEAN_PHASE_REACH_DAYS outside the range cannot put their greatest inside it: they are skipped
 * unsampled. The caller has checked the range.
 */
export function eclipsesInRange<E extends { readonly greatest: Moment }>(from: Date, to: Date, atLunation: (k: number) => E | undefined, meanPhaseTTDays: (k: number) => number): E[] {
  const fromUT = utDaysFromDate(from);
  const toUT = utDaysFromDate(to);
  // TT runs ahead of UT by ΔT (under an hour here); a day of margin covers it.
  const firstK = lunationIndexNear(fromUT - 1) - 1;
  const lastK = lunationIndexNear(toUT + 1) + 1;
  const eclipses: E[] = [];
  for (let k = firstK; k <= lastK; k++) {
    const mean = meanPhaseTTDays(k);
    if (mean < fromUT - MEAN_PHASE_REACH_DAYS || mean > toUT + MEAN_PHASE_REACH_DAYS) continue;
    const eclipse = atLunation(k);
    if (eclipse && eclipse.greatest.utDays >= fromUT && eclipse.greatest.utDays < toUT) eclipses.push(eclipse);
  }
  return eclipses;
}
