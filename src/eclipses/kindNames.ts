/** The kinds each body's eclipses come in: names only, light enough for declaring options. */
import { ECLIPSE_BODIES, type EclipseBody } from './common/record.ts';
import { ECLIPSE_KINDS, type EclipseKind } from './lunar/types.ts';
import { SOLAR_ECLIPSE_KINDS, type SolarEclipseKind } from './solar/types.ts';

type BodyChoice = EclipseBody | 'all';
export type EclipseKindName = EclipseKind | SolarEclipseKind;
/** The kinds each body's eclipses come in. */
export const KINDS_OF_BODY: { readonly [B in EclipseBody]: readonly EclipseKindName[] } = { lunar: ECLIPSE_KINDS, solar: SOLAR_ECLIPSE_KINDS };
/** The kinds a search may ask for: with `all` (or several bodies), a kind of any of them. */
export function kindsOfBodies(bodies: BodyChoice | readonly EclipseBody[]): EclipseKindName[] {
  const list = bodies === 'all' ? ECLIPSE_BODIES : typeof bodies === 'string' ? [bodies] : bodies;
  return [...new Set(list.flatMap((body) => KINDS_OF_BODY[body]))];
}
