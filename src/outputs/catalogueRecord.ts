/**
 * The catalogue contract, `umbracast.catalogue/1`: what `list --format json`
 * prints and what later commands and users' scripts read. Times are ISO 8601
 * UTC with seconds (proleptic Gregorian calendar, stated in `calendar`),
 * durations whole seconds, angles degrees; contacts and durations that do not
 * occur are left out. `printed` gives each figure as people read it, rounded
 * once from the full value, so that scripts typeset what the maps show.
 */
import type { ContactName } from '../eclipses/lunar/contacts.ts';
import { CONTACT_ORDER } from '../eclipses/lunar/contacts.ts';
import type { ShadowConventionName } from '../eclipses/lunar/conventions.ts';
import type { EclipseKind, LunarEclipse } from '../eclipses/lunar/types.ts';
import type { DeltaTSource } from '../ephemeris/deltaT.ts';
import { printedFigures, type PrintedFigures } from '../eclipses/lunar/figures.ts';
import { DATA_CALENDAR } from '../ephemeris/calendar.ts';
import { isoSeconds } from '../ephemeris/time.ts';

export const CATALOGUE_SCHEMA = 'umbracast.catalogue/1';

export interface EclipseRecord {
  id: string;
  kind: EclipseKind;
  greatest: string;
  greatestTT: string;
  deltaT: number;
  deltaTSource: DeltaTSource;
  gamma: number;
  umbralMagnitude: number;
  penumbralMagnitude: number;
  saros: number;
  contacts: Partial<Record<ContactName, string>>;
  durations: { penumbral: number; partial?: number; total?: number };
  subLunar: { greatest: [number, number] } & Partial<Record<ContactName, [number, number]>>;
  /** The figures as umbracast prints them (tables, maps, captions), each rounded once from the full value. */
  printed: PrintedFigures;
}

export interface CatalogueDocument {
  schema: typeof CATALOGUE_SCHEMA;
  convention: ShadowConventionName;
  /** The calendar of every date in the document. */
  calendar: typeof DATA_CALENDAR;
  deltaTModel: string;
  range: { from: string; to: string };
  eclipses: EclipseRecord[];
}

const round = (value: number, places: number): number => {
  const factor = 10 ** places;
  const rounded = Math.round(value * factor) / factor;
  return Object.is(rounded, -0) ? 0 : rounded;
};

const point = ([lon, lat]: readonly [number, number]): [number, number] => [round(lon, 3), round(lat, 3)];

export function eclipseRecord(eclipse: LunarEclipse): EclipseRecord {
  const contacts: Partial<Record<ContactName, string>> = {};
  const subLunar: EclipseRecord['subLunar'] = { greatest: point(eclipse.subLunar.greatest) };
  for (const name of CONTACT_ORDER) {
    const moment = eclipse.contacts[name];
    const where = eclipse.subLunar[name];
    if (moment) contacts[name] = isoSeconds(moment.utDays);
    if (where) subLunar[name] = point(where);
  }
  const { penumbralSeconds, partialSeconds, totalSeconds } = eclipse.durations;
  return {
    id: eclipse.id,
    kind: eclipse.kind,
    greatest: isoSeconds(eclipse.greatest.utDays),
    greatestTT: isoSeconds(eclipse.greatest.ttDays),
    deltaT: round(eclipse.deltaT.seconds, 1),
    deltaTSource: eclipse.deltaT.source,
    gamma: round(eclipse.gamma, 4),
    umbralMagnitude: round(eclipse.umbralMagnitude, 4),
    penumbralMagnitude: round(eclipse.penumbralMagnitude, 4),
    saros: eclipse.saros,
    contacts,
    durations: {
      penumbral: penumbralSeconds,
      ...(partialSeconds !== undefined ? { partial: partialSeconds } : {}),
      ...(totalSeconds !== undefined ? { total: totalSeconds } : {}),
    },
    subLunar,
    printed: printedFigures(eclipse),
  };
}

export function catalogueDocument(
  eclipses: readonly LunarEclipse[],
  context: { convention: ShadowConventionName; deltaTModel: string; from: Date; to: Date },
): CatalogueDocument {
  return {
    schema: CATALOGUE_SCHEMA,
    convention: context.convention,
    calendar: DATA_CALENDAR,
    deltaTModel: context.deltaTModel,
    range: { from: context.from.toISOString().replace('.000Z', 'Z'), to: context.to.toISOString().replace('.000Z', 'Z') },
    eclipses: eclipses.map(eclipseRecord),
  };
}
