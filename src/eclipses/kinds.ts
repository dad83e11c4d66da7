/**
 * Both kinds of eclipse behind one record: what dispatches on `body` starts
 * here. The command line and the batch find, name and choose eclipses through
 * these entry points and reach the per-kind catalogues only behind them.
 */
import { InputError } from '../errors.ts';
import type { DeltaTModel } from '../ephemeris/deltaT.ts';
import { utDaysFromDate } from '../ephemeris/time.ts';
import { ECLIPSE_BODIES, type EclipseBody } from './common/record.ts';
import { checkRange, SUPPORTED_RANGE } from './common/range.ts';
import { findLunarEclipses } from './lunar/catalogue.ts';
import type { ShadowConventionName } from './lunar/conventions.ts';
import type { LunarEclipse } from './lunar/types.ts';
import { findSolarEclipses } from './solar/catalogue.ts';
import type { SolarEclipse } from './solar/types.ts';

export type { EclipseBody } from './common/record.ts';
export { ECLIPSE_BODIES } from './common/record.ts';
export type Eclipse = LunarEclipse | SolarEclipse;

/** Which kinds a search covers: one body, or both. */
export type BodyChoice = EclipseBody | 'all';
export const BODY_CHOICES: readonly BodyChoice[] = [...ECLIPSE_BODIES, 'all'];

export { KINDS_OF_BODY, kindsOfBodies, type EclipseKindName } from './kindNames.ts';

/** How eclipses are computed and which kinds are wanted; shared by every entry point here. */
export interface EclipseSearchOptions {
  /** Which kinds: `lunar`, `solar` or `all` (the default). */
  readonly body?: BodyChoice;
  /** ΔT model; default the standard observed + forecast + long-term model. */
  readonly deltaT?: DeltaTModel;
  /** Shadow convention of the lunar eclipses; default Danjon. */
  readonly convention?: ShadowConventionName;
}

export interface EclipseRangeOptions extends EclipseSearchOptions {
  /** Start of the range, inclusive (UT). */
  readonly from: Date;
  /** End of the range, exclusive (UT). */
  readonly to: Date;
}

const DAY_MS = 86_400_000;
/** How far `nextEclipse` looks: every 400 days hold at least two eclipses of each kind (eclipse seasons are 173 days apart). */
const NEXT_WITHIN_DAYS = 400;

function checkBody(body: unknown): BodyChoice {
  if (body === undefined) return 'all';
  if (typeof body === 'string' && (BODY_CHOICES as readonly string[]).includes(body)) return body as BodyChoice;
  throw new InputError('body', BODY_CHOICES.join(', '), body);
}

const wants = (choice: BodyChoice, body: EclipseBody): boolean => choice === 'all' || choice === body;

/**
 * Every eclipse of the chosen kinds whose greatest (UT) falls in [from, to),
 * in time order of greatest eclipse (a lunar one first should two ever share
 * an instant, which no two in the supported years do).
 */
export function findEclipses(options: EclipseRangeOptions): Eclipse[] {
  const body = checkBody(options.body);
  checkRange(options.from, options.to);
  const { from, to, deltaT, convention } = options;
  const lunar: Eclipse[] = wants(body, 'lunar') ? findLunarEclipses({ from, to, ...(deltaT ? { deltaT } : {}), ...(convention ? { convention } : {}) }) : [];
  const solar: Eclipse[] = wants(body, 'solar') ? findSolarEclipses({ from, to, ...(deltaT ? { deltaT } : {}) }) : [];
  return inTimeOrder(lunar, solar);
}

/** Two lists, each in time order, merged into one. */
function inTimeOrder(lunar: readonly Eclipse[], solar: readonly Eclipse[]): Eclipse[] {
  const merged: Eclipse[] = [];
  let i = 0;
  let j = 0;
  while (i < lunar.length || j < solar.length) {
    const l = lunar[i];
    const s = solar[j];
    if (l && (!s || l.greatest.utDays <= s.greatest.utDays)) {
      merged.push(l);
      i++;
    } else {
      merged.push(s!);
      j++;
    }
  }
  return merged;
}

const ID_PATTERN = /^(\d{4})-(\d{2})-(\d{2})$/;
const ID_EXPECTED = `an eclipse id: the UTC date of greatest eclipse, YYYY-MM-DD, within ${SUPPORTED_RANGE.description}`;

/** The UTC day an id names, or an InputError. */
function dayOfId(id: unknown): Date {
  const match = typeof id === 'string' ? ID_PATTERN.exec(id) : null;
  if (!match) throw new InputError('id', ID_EXPECTED, id);
  const [year, month, day] = [Number(match[1]), Number(match[2]), Number(match[3])];
  // Years 0–99 would be read as 1900–1999 by Date.UTC, but they lie outside the supported range and fail below either way.
  const start = new Date(Date.UTC(year, month - 1, day));
  const real = start.getUTCFullYear() === year && start.getUTCMonth() === month - 1 && start.getUTCDate() === day;
  if (!real || start < SUPPORTED_RANGE.from || start >= SUPPORTED_RANGE.to) throw new InputError('id', ID_EXPECTED, id);
  return start;
}

/** "the lunar eclipse of 2025-09-07 and the solar eclipse of 2025-09-21" */
function describeBoth(eclipses: readonly Eclipse[]): string {
  return eclipses.map((e) => `the ${e.body} eclipse of ${e.id}`).join(' and ');
}

/**
 * The eclipse an id names (the UTC date of its greatest eclipse). With no
 * body (or `all`) either kind is found; no UTC date of the supported years
 * holds two eclipses (test/eclipses/kinds.test.ts proves it), so an id is
 * never ambiguous. Throws InputError when the id is malformed or the date
 * holds no eclipse of the chosen kinds.
 */
export function eclipseById(id: string, options: EclipseSearchOptions = {}): Eclipse {
  const body = checkBody(options.body);
  const start = dayOfId(id);
  const end = new Date(Math.min(start.getTime() + DAY_MS, SUPPORTED_RANGE.to.getTime()));
  const found = findEclipses({ ...options, body, from: start, to: end });
  if (found.length === 0) {
    const what = body === 'all' ? 'an eclipse' : `a ${body} eclipse`;
    throw new InputError('id', `the UTC date of greatest of ${what} (YYYY-MM-DD)`, `${JSON.stringify(id)} (no ${body === 'all' ? '' : `${body} `}eclipse on that date)`, true);
  }
  if (found.length > 1) {
    throw new InputError('body', `lunar or solar, to choose between ${describeBoth(found)}`, options.body);
  }
  return found[0]!;
}

/**
 * The eclipse nearest an instant within `withinDays`, if there is one. An
 * instant on the UTC date of an eclipse's greatest (its id) resolves to that
 * eclipse. Otherwise, with no body (or `all`), an instant within reach of
 * both a lunar and a solar eclipse is an InputError naming both: the caller
 * must say which body it means.
 */
export function eclipseNear(at: Date, withinDays: number, options: EclipseSearchOptions = {}): Eclipse | undefined {
  const body = checkBody(options.body);
  if (!Number.isFinite(at.getTime())) throw new InputError('date', `an instant within ${SUPPORTED_RANGE.description}`, 'an invalid date', true);
  const clamp = (ms: number) => new Date(Math.min(Math.max(ms, SUPPORTED_RANGE.from.getTime()), SUPPORTED_RANGE.to.getTime()));
  const from = clamp(at.getTime() - withinDays * DAY_MS);
  const to = clamp(at.getTime() + withinDays * DAY_MS);
  if (to <= from) return undefined;
  const found = findEclipses({ ...options, body, from, to });
  const day = at.toISOString().slice(0, 10);
  const exact = found.find((e) => e.id === day);
  if (exact) return exact;
  const target = utDaysFromDate(at);
  const distance = (e: Eclipse) => Math.abs(e.greatest.utDays - target);
  const nearestOf = (b: EclipseBody) => found.filter((e) => e.body === b).sort((x, y) => distance(x) - distance(y))[0];
  const nearest = ECLIPSE_BODIES.flatMap((b) => nearestOf(b) ?? []);
  if (nearest.length > 1) {
    throw new InputError('body', `lunar or solar: ${day} is near ${describeBoth(nearest)}`, options.body);
  }
  return nearest[0];
}

/** The first eclipse of the chosen kinds whose greatest (UT) falls at or after an instant. */
export function nextEclipse(after: Date, options: EclipseSearchOptions = {}): Eclipse | undefined {
  const to = new Date(Math.min(after.getTime() + NEXT_WITHIN_DAYS * DAY_MS, SUPPORTED_RANGE.to.getTime()));
  if (to <= after) return undefined;
  return findEclipses({ ...options, from: after, to })[0];
}
