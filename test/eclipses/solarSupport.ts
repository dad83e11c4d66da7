/** The solar catalogue 1900–2100, computed once per test file that asks for it. */
import { findSolarEclipses } from '../../src/eclipses/solar/catalogue.ts';
import type { SolarEclipse } from '../../src/eclipses/solar/types.ts';

let cached: SolarEclipse[] | undefined;

export function solarCatalogue1900to2100(): SolarEclipse[] {
  cached ??= findSolarEclipses({ from: new Date('1900-01-01T00:00:00Z'), to: new Date('2101-01-01T00:00:00Z') });
  return cached;
}

/** One eclipse by its id (UTC date of greatest), computed on its own. */
export function solarEclipseOn(id: string): SolarEclipse {
  const day = new Date(`${id}T00:00:00Z`);
  const found = findSolarEclipses({ from: day, to: new Date(day.getTime() + 86_400_000) });
  if (found.length !== 1) throw new Error(`expected one solar eclipse on ${id}, found ${found.length}`);
  return found[0]!;
}
