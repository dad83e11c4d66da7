/** Catalogues shared by the eclipse tests, computed once per test file. */
import { findLunarEclipses } from '../../src/eclipses/lunar/catalogue.ts';
import type { LunarEclipse } from '../../src/eclipses/lunar/types.ts';

const cache = new Map<string, LunarEclipse[]>();

export function catalogue1900to2100(convention: 'danjon' | 'chauvenet' = 'danjon'): LunarEclipse[] {
  let list = cache.get(convention);
  if (!list) {
    list = findLunarEclipses({ from: new Date('1900-01-01T00:00:00Z'), to: new Date('2101-01-01T00:00:00Z'), convention });
    cache.set(convention, list);
  }
  return list;
}

export const DAY_SECONDS = 86_400;
export const secondsBetween = (aDays: number, bDays: number) => Math.abs(aDays - bDays) * DAY_SECONDS;
