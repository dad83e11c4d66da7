/** Both kinds of eclipse behind one record: what dispatches on `body` starts here. */
import type { LunarEclipse } from './lunar/types.ts';
import type { SolarEclipse } from './solar/types.ts';

export type { EclipseBody } from './common/record.ts';
export { ECLIPSE_BODIES } from './common/record.ts';
export type Eclipse = LunarEclipse | SolarEclipse;
