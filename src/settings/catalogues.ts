/**
 * Eclipses found per body: the command line and the batch find eclipses
 * through this table, keyed by EclipseBody, never by calling one body's
 * catalogue by name. Each entry says whether the outputs (lists, maps, local
 * tables, batches) render its body yet: today the lunar one; solar output
 * arrives next, as an entry's flag and its renderers, not as a second path.
 */
import { ECLIPSE_BODIES, type EclipseBody } from '../eclipses/kinds.ts';
import { SUPPORTED_RANGE } from '../eclipses/common/range.ts';
import { findLunarEclipses } from '../eclipses/lunar/catalogue.ts';
import type { LunarEclipse } from '../eclipses/lunar/types.ts';
import { findSolarEclipses } from '../eclipses/solar/catalogue.ts';
import type { SolarEclipse } from '../eclipses/solar/types.ts';
import type { ShadowConventionName } from '../eclipses/lunar/conventions.ts';
import { fixedDeltaTModel, standardDeltaTModel, type DeltaTModel } from '../ephemeris/deltaT.ts';
import { utDaysFromDate } from '../ephemeris/time.ts';
import { checkNumber, DELTA_T_LIMITS } from './read.ts';

/** How eclipses are computed: ΔT (seconds) or the built-in model, and the shadow convention (a lunar setting). */
export interface EclipseChoice {
  readonly convention: ShadowConventionName;
  readonly deltaTSeconds?: number;
}

/** The ΔT model a choice asks for: a fixed value, else the built-in model. */
export function deltaTModelOf(choice: EclipseChoice): DeltaTModel {
  return choice.deltaTSeconds === undefined ? standardDeltaTModel() : fixedDeltaTModel(checkNumber('deltaT', choice.deltaTSeconds, DELTA_T_LIMITS));
}

/** The record each body's catalogue gives. */
export interface EclipseOf {
  readonly lunar: LunarEclipse;
  readonly solar: SolarEclipse;
}

/** A range of instants (UT): `from` inclusive, `to` exclusive. */
export interface Range {
  readonly from: Date;
  readonly to: Date;
}

interface BodyCatalogue<B extends EclipseBody> {
  /** Every eclipse of the range, in time order. */
  readonly find: (range: Range, choice: EclipseChoice) => EclipseOf[B][];
  /** Do the outputs render this body yet? */
  readonly rendered: boolean;
}

export const CATALOGUES: { readonly [B in EclipseBody]: BodyCatalogue<B> } = {
  lunar: { find: (range, choice) => findLunarEclipses({ ...range, convention: choice.convention, deltaT: deltaTModelOf(choice) }), rendered: true },
  // The convention is a lunar setting: a solar eclipse's shadow has no enlargement to choose.
  solar: { find: (range, choice) => findSolarEclipses({ ...range, deltaT: deltaTModelOf(choice) }), rendered: false },
};

/** The bodies the outputs render today. */
export const RENDERED_BODIES: readonly EclipseBody[] = ECLIPSE_BODIES.filter((body) => CATALOGUES[body].rendered);

/** The body whose eclipses the commands and the batch render (until solar output arrives, the lunar one). */
export const OUTPUT_BODY = 'lunar' satisfies (typeof RENDERED_BODIES)[number];

export function findEclipses<B extends EclipseBody>(body: B, range: Range, choice: EclipseChoice): EclipseOf[B][] {
  return CATALOGUES[body].find(range, choice);
}

const DAY_MS = 86_400_000;
const clamp = (ms: number) => new Date(Math.min(Math.max(ms, SUPPORTED_RANGE.from.getTime()), SUPPORTED_RANGE.to.getTime()));

/** The eclipse whose greatest (UT) lies nearest an instant, if one lies within `withinDays`. */
export function eclipseNear<B extends EclipseBody>(body: B, at: Date, withinDays: number, choice: EclipseChoice): EclipseOf[B] | undefined {
  const from = clamp(at.getTime() - withinDays * DAY_MS);
  const to = clamp(at.getTime() + withinDays * DAY_MS);
  if (to <= from) return undefined;
  const target = utDaysFromDate(at);
  return findEclipses(body, { from, to }, choice).sort((a, b) => Math.abs(a.greatest.utDays - target) - Math.abs(b.greatest.utDays - target))[0];
}

/** The first eclipse whose greatest (UT) falls at or after an instant (within 400 days: every body has one). */
export function nextEclipse<B extends EclipseBody>(body: B, after: Date, choice: EclipseChoice): EclipseOf[B] | undefined {
  const to = new Date(Math.min(after.getTime() + 400 * DAY_MS, SUPPORTED_RANGE.to.getTime()));
  if (to <= after) return undefined;
  return findEclipses(body, { from: after, to }, choice)[0];
}
