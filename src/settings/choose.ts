/**
 * What several commands and the batch choose the same way, from typed values:
 * the eclipse (when, convention, ΔT) and the place (a name or a position, and
 * its zone). Errors name the library's parameters (`when`, `deltaT`, `place`,
 * `at`, `zone`); the CLI shows its flags instead, a style its fields.
 */
import { InputError } from '../errors.ts';
import { eclipseNear, nextEclipse, type BodyChoice, type Eclipse } from '../eclipses/kinds.ts';
import { civilClock, type CivilClock } from '../ephemeris/civilTime.ts';
import { describePlace, resolvePlace, type PlaceMatch } from '../places/gazetteer.ts';
import type { PlaceLabel } from '../places/label.ts';
import { timeZoneAt, timeZoneOfPlace } from '../places/timeZone.ts';
import { isLonLat, LAT_LON_EXPECTED, WHEN_EXPECTED, type When } from './read.ts';
import { searchOptionsOf, type EclipseChoice, type EclipseOf } from './catalogues.ts';

export { DELTA_T_LIMITS } from './read.ts';
export { deltaTModelOf, type EclipseChoice } from './catalogues.ts';

/**
 * One eclipse of a body (lunar, solar or `all`), through src/eclipses/kinds.ts:
 * the next after `now`, or the one a date names: its own eclipse for an id
 * (the UTC date of greatest), else the one within a week; with `all`, a date
 * near both a lunar and a solar eclipse is an InputError naming both and
 * `body`. A command that renders one body only (sky, diagram) leaves `body`
 * out and gets a lunar eclipse.
 */
export function chooseEclipse<B extends BodyChoice = 'lunar'>(when: When, choice: EclipseChoice, now: Date, body: B = 'lunar' as B): EclipseOf[B] {
  const options = searchOptionsOf(choice, body);
  const found = when.kind === 'next' ? nextEclipse(now, options) : eclipseNear(when.date, 7.5, options);
  if (!found) throw new InputError('when', WHEN_EXPECTED, when.kind === 'next' ? 'next (none within a year)' : when.text);
  return found as EclipseOf[B];
}

/**
 * One eclipse of either body, or of the one asked for: the next after `now`,
 * or the one within a week of a date. A date within reach of both a lunar and
 * a solar eclipse (and on the date of neither) is an InputError naming both,
 * parameter `body`.
 */
export function chooseEclipseOfBody(when: When, choice: EclipseChoice, now: Date, body: BodyChoice): Eclipse {
  return chooseEclipse(when, choice, now, body);
}

/** A place by name, or a position [lon, lat] in degrees; `zone` (IANA) overrides the zone found there. */
export interface PlaceChoice {
  readonly place?: string;
  readonly at?: readonly [number, number];
  readonly zone?: string;
}

/** A place chosen: how outputs show it, its clock, and the line saying which place a name was taken for. */
export interface ChosenPlace {
  readonly place: PlaceLabel;
  readonly clock: CivilClock;
  readonly notice?: string;
}

/**
 * The line that says which place a name was taken for, when GeoNames spells
 * it otherwise (an exonym, a former name, accents dropped): for stderr, so that
 * data on stdout stays clean. Nothing when the name matched as written.
 * `shownAs` is how the caller names where the name came from (a flag, a style field).
 */
export function placeNotice(shownAs: string, match: PlaceMatch): string | undefined {
  if (match.matchedBy === 'exact') return undefined;
  return `umbracast: ${shownAs} ${JSON.stringify(match.query)} → ${describePlace(match.place)}`;
}

/** The notices for names resolved elsewhere (marks on a map), in order. */
export function placeNotices(shownAs: string, names: readonly string[], parameter = 'marks'): string[] {
  return names.flatMap((name) => placeNotice(shownAs, resolvePlace(name, parameter)) ?? []);
}

/** A position's label, e.g. "33.87°S 151.21°E". */
export function positionName([lonDeg, latDeg]: readonly [number, number]): string {
  return `${Math.abs(latDeg).toFixed(2)}°${latDeg >= 0 ? 'N' : 'S'} ${Math.abs(lonDeg).toFixed(2)}°${lonDeg >= 0 ? 'E' : 'W'}`;
}

/**
 * A place by name or position (one of them), and its time zone: `zone`, else
 * the zone at that point. `parameter` names where the name came from
 * (`place`, `marks`, a style file's field), for errors; `shownAs` names it in
 * the notice. Without either, undefined when the place is optional.
 */
export function choosePlace(choice: PlaceChoice, required: true, parameter?: string, shownAs?: string): ChosenPlace;
export function choosePlace(choice: PlaceChoice, required: boolean, parameter?: string, shownAs?: string): ChosenPlace | undefined;
export function choosePlace(choice: PlaceChoice, required: boolean, parameter = 'place', shownAs = parameter): ChosenPlace | undefined {
  if (choice.place !== undefined && choice.at !== undefined) throw new InputError('at', (name) => `either ${name('place')} or ${name('at')}, not both`, `${choice.at[1]},${choice.at[0]}`);
  let place: Omit<PlaceLabel, 'tz'>;
  let country: string | undefined;
  let notice: string | undefined;
  if (choice.place !== undefined) {
    const match = resolvePlace(choice.place, parameter);
    const found = match.place;
    place = { name: found.name, latDeg: found.latDeg, lonDeg: found.lonDeg };
    country = found.country;
    notice = placeNotice(shownAs, match);
  } else if (choice.at !== undefined) {
    if (!isLonLat(choice.at)) throw new InputError('at', LAT_LON_EXPECTED, `${choice.at[1]},${choice.at[0]}`);
    const [lonDeg, latDeg] = choice.at;
    place = { name: positionName(choice.at), latDeg, lonDeg };
  } else {
    if (required) throw new InputError('place', (name) => `a place: ${name('place')} NAME or ${name('at')} LAT,LON`, undefined);
    return undefined;
  }
  const tz = choice.zone !== undefined ? choice.zone.trim()
    : country !== undefined ? timeZoneOfPlace({ ...place, country }) : timeZoneAt(place.latDeg, place.lonDeg);
  const clock = civilClock(tz, 'zone');
  return { place: { ...place, tz: clock.zone }, clock, ...(notice !== undefined ? { notice } : {}) };
}
