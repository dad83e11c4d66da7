/**
 * How the settings reach the eclipses: the typed EclipseChoice (shadow
 * convention, ΔT) mapped onto the options of src/eclipses/kinds.ts, the one
 * implementation that finds, names and chooses eclipses of either body. The
 * command line and the batch find eclipses only through kinds.ts.
 */
import type { BodyChoice, EclipseBody, EclipseSearchOptions } from '../eclipses/kinds.ts';
import type { ShadowConventionName } from '../eclipses/lunar/conventions.ts';
import type { LunarEclipse } from '../eclipses/lunar/types.ts';
import type { SolarEclipse } from '../eclipses/solar/types.ts';
import { fixedDeltaTModel, standardDeltaTModel, type DeltaTModel } from '../ephemeris/deltaT.ts';
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

/** The record each body gives; `all`, either. */
export interface EclipseOf {
  readonly lunar: LunarEclipse;
  readonly solar: SolarEclipse;
  readonly all: LunarEclipse | SolarEclipse;
}

/** A choice and a body as the options of kinds.ts (the convention counts for lunar eclipses only). */
export function searchOptionsOf(choice: EclipseChoice, body: BodyChoice): EclipseSearchOptions & { readonly body: BodyChoice } {
  return { body, convention: choice.convention, deltaT: deltaTModelOf(choice) };
}

/** Narrow a list found with a body to that body's records (kinds.ts returns the union). */
export const ofBody = <B extends BodyChoice>(_body: B, eclipses: readonly (LunarEclipse | SolarEclipse)[]): EclipseOf[B][] => eclipses as EclipseOf[B][];

export type { BodyChoice, EclipseBody };
