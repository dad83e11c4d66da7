/**
 * Continent and ocean names for world views: where each is written (a
 * point well inside it, chosen by hand; the Pacific has one on either side
 * of the date line, and a view takes whichever it shows nearer its middle).
 */
import type { LonLat } from '../ephemeris/earth.ts';

export interface AreaName {
  readonly name: string;
  readonly kind: 'continent' | 'ocean';
  readonly anchors: readonly LonLat[];
}

export const AREA_NAMES: readonly AreaName[] = [
  { name: 'AFRICA', kind: 'continent', anchors: [[20, 8]] },
  { name: 'EUROPE', kind: 'continent', anchors: [[22, 53]] },
  { name: 'ASIA', kind: 'continent', anchors: [[92, 50]] },
  { name: 'NORTH AMERICA', kind: 'continent', anchors: [[-102, 48]] },
  { name: 'SOUTH AMERICA', kind: 'continent', anchors: [[-60, -12]] },
  { name: 'AUSTRALIA', kind: 'continent', anchors: [[134, -24]] },
  { name: 'ANTARCTICA', kind: 'continent', anchors: [[40, -78], [-100, -80], [150, -78]] },
  { name: 'Pacific Ocean', kind: 'ocean', anchors: [[-140, 8], [170, 22], [-120, -30]] },
  { name: 'Atlantic Ocean', kind: 'ocean', anchors: [[-38, 28], [-20, -25]] },
  { name: 'Indian Ocean', kind: 'ocean', anchors: [[78, -22]] },
];

/** Names on the map: `auto` puts them on world views except small cards; `on`/`off` as asked. */
export type AreaNamesChoice = 'auto' | 'on' | 'off';
export const AREA_NAMES_CHOICES: readonly AreaNamesChoice[] = ['auto', 'on', 'off'];
