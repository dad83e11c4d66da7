/** What several commands choose the same way: the eclipse (WHEN, convention, ΔT) and the place (--place, --at, --tz). */
import { InputError } from '../errors.ts';
import { eclipseNear, nextEclipse } from '../eclipses/lunar/catalogue.ts';
import { SHADOW_CONVENTIONS } from '../eclipses/lunar/conventions.ts';
import type { LunarEclipse } from '../eclipses/lunar/types.ts';
import { civilClock, type CivilClock } from '../ephemeris/civilTime.ts';
import { fixedDeltaTModel, standardDeltaTModel } from '../ephemeris/deltaT.ts';
import { describePlace, resolvePlace, type PlaceMatch } from '../places/gazetteer.ts';
import { timeZoneAt, timeZoneOfPlace } from '../places/timeZone.ts';
import type { PlaceLabel } from '../outputs/localFormats.ts';
import { DELTA_T_LIMITS } from '../cli/declare.ts';
import { parseChoice, parseLatLon, parseNumber, parseWhen, WHEN_EXPECTED } from '../cli/options.ts';

export { DELTA_T_LIMITS, withEclipseOptions, withPlaceOptions } from '../cli/declare.ts';

export interface EclipseChoice {
  convention: string;
  deltaT?: string;
}

export function chooseEclipse(whenText: string | undefined, options: EclipseChoice, now: Date): LunarEclipse {
  const when = parseWhen(whenText);
  const convention = parseChoice('--convention', options.convention, SHADOW_CONVENTIONS);
  const deltaT = options.deltaT === undefined ? standardDeltaTModel() : fixedDeltaTModel(parseNumber('--delta-t', options.deltaT, DELTA_T_LIMITS));
  const found = when.kind === 'next' ? nextEclipse(now, { convention, deltaT }) : eclipseNear(when.date, 7.5, { convention, deltaT });
  if (!found) throw new InputError('WHEN', WHEN_EXPECTED, when.kind === 'next' ? 'next (none within a year)' : when.text);
  return found;
}

export interface PlaceChoice {
  place?: string;
  at?: string;
  tz?: string;
}

/**
 * The line that says which place a name was taken for, when GeoNames spells
 * it otherwise (an exonym, a former name, accents dropped): for stderr, so that
 * data on stdout stays clean. Nothing when the name matched as written.
 */
export function placeNotice(option: string, match: PlaceMatch): string | undefined {
  if (match.matchedBy === 'exact') return undefined;
  return `umbracast: ${option} ${JSON.stringify(match.query)} → ${describePlace(match.place)}`;
}

/** The notices for names resolved elsewhere (marks on a map), in order. */
export function placeNotices(option: string, names: readonly string[]): string[] {
  return names.flatMap((name) => placeNotice(option, resolvePlace(name, option)) ?? []);
}

/**
 * --place NAME or --at LAT,LON (one of them), and the time zone: --tz, else
 * the zone at that point. `placeOption` names where the name came from
 * (--place, --mark, a style file's field), for errors and the notice.
 */
export function choosePlace(options: PlaceChoice, required = true, placeOption = '--place'): { place: PlaceLabel; clock: CivilClock; notice?: string } | undefined {
  if (options.place !== undefined && options.at !== undefined) throw new InputError('--at', 'either --place or --at, not both', options.at);
  let place: Omit<PlaceLabel, 'tz'>;
  let country: string | undefined;
  let notice: string | undefined;
  if (options.place !== undefined) {
    const match = resolvePlace(options.place, placeOption);
    const found = match.place;
    place = { name: found.name, latDeg: found.latDeg, lonDeg: found.lonDeg };
    country = found.country;
    notice = placeNotice(placeOption, match);
  } else if (options.at !== undefined) {
    const [lonDeg, latDeg] = parseLatLon('--at', options.at);
    place = { name: `${Math.abs(latDeg).toFixed(2)}°${latDeg >= 0 ? 'N' : 'S'} ${Math.abs(lonDeg).toFixed(2)}°${lonDeg >= 0 ? 'E' : 'W'}`, latDeg, lonDeg };
  } else {
    if (required) throw new InputError('--place', 'a place: --place NAME or --at LAT,LON', undefined);
    return undefined;
  }
  const tz = options.tz !== undefined ? options.tz.trim()
    : country !== undefined ? timeZoneOfPlace({ ...place, country }) : timeZoneAt(place.latDeg, place.lonDeg);
  const clock = civilClock(tz, '--tz');
  return { place: { ...place, tz: clock.zone }, clock, ...(notice !== undefined ? { notice } : {}) };
}
