/**
 * The catalogue contract, `umbracast.catalogue/2`: what `list --format json`
 * prints and what later commands and users' scripts read. Times are ISO 8601
 * UTC with seconds (proleptic Gregorian calendar, stated in `calendar`),
 * durations whole seconds, angles degrees; contacts and durations that do not
 * occur are left out. Every record carries `body`: a lunar record is the
 * record of /1 with `body: 'lunar'` (its `printed` gives each figure as
 * people read it, rounded once from the full value), a solar record the one
 * of src/eclipses/solar/record.ts. A document holding a solar eclipse carries
 * the eye-safety caution in `safety`; no lunar wording sits beside it.
 */
import type { ContactName } from '../eclipses/lunar/contacts.ts';
import { CONTACT_ORDER } from '../eclipses/lunar/contacts.ts';
import type { ShadowConventionName } from '../eclipses/lunar/conventions.ts';
import type { EclipseKind, LunarEclipse } from '../eclipses/lunar/types.ts';
import type { Eclipse } from '../eclipses/kinds.ts';
import { solarEclipseRecord, type SolarEclipseRecord } from '../eclipses/solar/record.ts';
import { safetyScopeForEclipse, solarSafetyText } from '../words/solar/caution.ts';
import type { DeltaTSource } from '../ephemeris/deltaT.ts';
import { printedFigures, type PrintedFigures } from '../eclipses/lunar/figures.ts';
import { DATA_CALENDAR } from '../ephemeris/calendar.ts';
import { isoSeconds } from '../ephemeris/time.ts';

export const CATALOGUE_SCHEMA = 'umbracast.catalogue/2';

export interface EclipseRecord {
  body: 'lunar';
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

export type { SolarEclipseRecord };
/** A record of either body; `body` tells which. */
export type CatalogueRecord = EclipseRecord | SolarEclipseRecord;

export interface CatalogueDocument {
  schema: typeof CATALOGUE_SCHEMA;
  /** The eye-safety caution (long form), present when the document holds a solar eclipse. */
  safety?: string;
  /** The shadow convention of the lunar records. */
  convention: ShadowConventionName;
  /** The calendar of every date in the document. */
  calendar: typeof DATA_CALENDAR;
  deltaTModel: string;
  range: { from: string; to: string };
  eclipses: CatalogueRecord[];
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
    body: 'lunar',
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

/** The record of an eclipse of either body. */
export function catalogueRecord(eclipse: Eclipse): CatalogueRecord {
  return eclipse.body === 'lunar' ? eclipseRecord(eclipse) : solarEclipseRecord(eclipse);
}

/**
 * The caution a catalogue carries, if it holds a solar eclipse: the long form,
 * scoped to its eclipses (a total or hybrid one among them: viewers come off
 * in totality only; else: at no time without a filter).
 */
export function catalogueSafety(eclipses: readonly (Eclipse | CatalogueRecord)[], form: 'short' | 'long' = 'long'): string | undefined {
  const solar = eclipses.flatMap((e) => (e.body === 'solar' ? [e] : []));
  if (solar.length === 0) return undefined;
  const totality = solar.some((e) => safetyScopeForEclipse(e.kind) === 'whole-eclipse');
  return solarSafetyText(form, totality ? 'whole-eclipse' : 'no-totality');
}

export function catalogueDocument(
  eclipses: readonly Eclipse[],
  context: { convention: ShadowConventionName; deltaTModel: string; from: Date; to: Date },
): CatalogueDocument {
  const safety = catalogueSafety(eclipses);
  return {
    schema: CATALOGUE_SCHEMA,
    ...(safety !== undefined ? { safety } : {}),
    convention: context.convention,
    calendar: DATA_CALENDAR,
    deltaTModel: context.deltaTModel,
    range: { from: context.from.toISOString().replace('.000Z', 'Z'), to: context.to.toISOString().replace('.000Z', 'Z') },
    eclipses: eclipses.map(catalogueRecord),
  };
}
