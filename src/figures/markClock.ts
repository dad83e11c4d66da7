/** Marked towns' times: on the map's one clock (the default: one instant reads the same everywhere on the map), or each on its own. */
export type MarkClock = 'map' | 'town';
export const MARK_CLOCKS: readonly MarkClock[] = ['map', 'town'];
