/**
 * The catalogue as json, csv (both keep seconds) and a table for people
 * (minutes, UTC labelled). A catalogue holding a solar eclipse carries the
 * eye-safety caution in every format: `safety` in JSON, a `safety` column on
 * each solar row of the CSV, the first line of the table. A lunar-only
 * catalogue keeps the lunar table and columns.
 */
import { stringify } from 'csv-stringify/sync';
import { CONTACT_ORDER } from '../eclipses/lunar/contacts.ts';
import { fixed, PRINTED_PLACES } from '../eclipses/lunar/figures.ts';
import { julianDateOfIsoDate } from '../ephemeris/calendar.ts';
import type { CatalogueDocument, CatalogueRecord, EclipseRecord, SolarEclipseRecord } from './catalogueRecord.ts';
import { decimalIn, deltaTModelIn, formatDuration, wholeIn } from '../words/common.ts';
import { LUNAR_ENGLISH, type LunarWords } from '../words/lunar/text.ts';
import { safetyScopeForEclipse, solarSafetyText, type SolarWords } from '../words/solar/caution.ts';
import { SOLAR_TEXT_ENGLISH, solarTextWords } from '../words/solar/text.ts';
import { dateWordsIn } from '../ephemeris/civilTime.ts';

export type CatalogueFormat = 'table' | 'json' | 'csv';
export const CATALOGUE_FORMATS: readonly CatalogueFormat[] = ['table', 'json', 'csv'];

export function catalogueJson(doc: CatalogueDocument): string {
  return `${JSON.stringify(doc, null, 2)}\n`;
}

const isSolar = (e: CatalogueRecord): e is SolarEclipseRecord => e.body === 'solar';

/** Lunar and solar contacts share their names (P1, U1…U4, P4): one column each. */
const CSV_COLUMNS = [
  'body', 'id', 'kind', 'greatest', 'greatestTT', 'deltaT', 'deltaTSource', 'gamma', 'umbralMagnitude', 'penumbralMagnitude', 'magnitude', 'saros',
  ...CONTACT_ORDER,
  'penumbralSeconds', 'partialSeconds', 'totalSeconds', 'centralSeconds',
  'subLunarLon', 'subLunarLat', 'greatestPointLon', 'greatestPointLat', 'sunAltitude', 'pathWidthKm', 'moonRadiusPenumbra', 'moonRadiusUmbra',
  'calendar', 'safety',
] as const;

/** The caution on a solar row: short form, scoped to that eclipse. */
const rowSafety = (e: SolarEclipseRecord): string => solarSafetyText('short', safetyScopeForEclipse(e.kind));

export function catalogueCsv(doc: CatalogueDocument): string {
  const rows = doc.eclipses.map((e) => {
    if (isSolar(e)) {
      return [
        e.body, e.id, e.kind, e.greatest, e.greatestTT, e.deltaT, e.deltaTSource, e.gamma, '', '', e.magnitude, e.saros,
        ...CONTACT_ORDER.map((name) => e.contacts[name] ?? ''),
        '', e.durations.partial, '', e.durations.central ?? '',
        '', '', e.greatestPoint[0], e.greatestPoint[1], e.sunAltitude, e.pathWidthKm ?? '', e.moonRadius.penumbra, e.moonRadius.umbra,
        doc.calendar, rowSafety(e),
      ];
    }
    return [
      e.body, e.id, e.kind, e.greatest, e.greatestTT, e.deltaT, e.deltaTSource, e.gamma, e.umbralMagnitude, e.penumbralMagnitude, '', e.saros,
      ...CONTACT_ORDER.map((name) => e.contacts[name] ?? ''),
      e.durations.penumbral, e.durations.partial ?? '', e.durations.total ?? '', '',
      e.subLunar.greatest[0], e.subLunar.greatest[1], '', '', '', '', '', '',
      doc.calendar, '',
    ];
  });
  return stringify(rows, { header: true, columns: [...CSV_COLUMNS] });
}

/**
 * `bodies`: which kinds were searched (lunar, solar or all), for the heading's count when none was found;
 * `words`: the reader's lunar words (default English); `solar`: the reader's solar words, for a table holding
 * solar eclipses, whose columns then read across both kinds (words/solar/text.ts, `list`).
 */
export function catalogueTable(doc: CatalogueDocument, bodies: 'lunar' | 'solar' | 'all' = 'lunar', words: LunarWords = LUNAR_ENGLISH, solarWords?: SolarWords): string {
  const w = words.table;
  const common = words.common;
  const decimal = (text: string) => decimalIn(text, words.common);
  const julianOf = (id: string) => julianDateOfIsoDate(id, dateWordsIn(words.common.clock));
  const solar = doc.eclipses.filter(isSolar);
  const both = solar.length > 0;
  // A table holding a solar eclipse takes the solar words' layout; one without, only the count of a search that took in solar eclipses.
  const BOTH = solarTextWords(solarWords).list;
  const header = both ? BOTH.header : w.catalogueHeader;
  const numeric = both ? [false, false, false, false, true, true, true, true, true, true, true, true] : [false, false, false, true, true, true, true, true, true];
  const minutes = (value: number | undefined) => (value !== undefined ? formatDuration(value * 60, 'compact', words.common) : w.absent);
  const date = (id: string) => (julianOf(id) ? w.julianBeside(id, julianOf(id)!) : id);
  // Every lunar figure as printed elsewhere: rounded once, from the full value (record.printed).
  const lunarRow = (e: EclipseRecord): string[] => {
    const figures = [decimal(e.printed.umbralMagnitude), decimal(e.printed.penumbralMagnitude), decimal(e.printed.gamma), minutes(e.printed.minutes.partial), minutes(e.printed.minutes.total)];
    return both
      ? [date(e.id), BOTH.body.lunar, w.kind[e.kind], e.printed.greatestUtc, ...figures, w.absent, w.absent, String(e.saros)]
      : [date(e.id), w.kind[e.kind], e.printed.greatestUtc, ...figures, String(e.saros)];
  };
  const solarRow = (e: SolarEclipseRecord): string[] => [
    date(e.id), BOTH.body.solar, BOTH.kind[e.kind], isoMinute(e.greatest),
    decimal(fixed(e.magnitude, PRINTED_PLACES.magnitude)), w.absent, decimal(fixed(e.gamma, PRINTED_PLACES.gamma)), w.absent, w.absent,
    e.durations.central !== undefined ? BOTH.central(wholeIn(Math.floor(e.durations.central / 60), common), wholeIn(e.durations.central % 60, common, 2)) : w.absent,
    e.pathWidthKm !== undefined ? BOTH.pathWidth(wholeIn(Math.round(e.pathWidthKm), common)) : w.absent,
    String(e.saros),
  ];
  const rows = doc.eclipses.map((e) => (isSolar(e) ? solarRow(e) : lunarRow(e)));
  const widths = header.map((h, i) => Math.max(h.length, ...rows.map((r) => r[i]!.length)));
  const line = (cells: readonly string[]) =>
    cells.map((c, i) => (numeric[i] ? c.padStart(widths[i]!) : c.padEnd(widths[i]!))).join('  ').trimEnd();
  const sources = [...new Set(doc.eclipses.map((e) => e.deltaTSource))].map((s) => (words.common.deltaTSources as Readonly<Record<string, string>>)[s] ?? s).join(', ');
  const deltaTs = doc.eclipses.map((e) => e.deltaT);
  const counted = bodies === 'solar' ? BOTH.solarEclipses(solar.length)
    : bodies === 'all' ? BOTH.eclipses(doc.eclipses.length - solar.length, solar.length) : w.eclipses(doc.eclipses.length);
  const title = w.catalogueTitle(counted, doc.range.from.slice(0, 10), doc.range.to.slice(0, 10));
  const julian = doc.eclipses.some((e) => julianDateOfIsoDate(e.id)) ? w.catalogueJulian : '';
  const radii = solar[0]?.moonRadius;
  const notes = [
    w.catalogueTimes(words.convention[doc.convention], julian),
    deltaTs.length > 0 ? w.deltaTNote(decimal(w.deltaTSpan([Math.min(...deltaTs), Math.max(...deltaTs)])), sources, deltaTModelIn(doc.deltaTModel, words.common)) : w.deltaTModelOnly(deltaTModelIn(doc.deltaTModel, words.common)),
    ...(both ? [BOTH.magnitudeNote, BOTH.solarNote(decimal(String(radii!.penumbra)), decimal(String(radii!.umbra)))] : []),
  ];
  // The caution first, whenever a solar eclipse is listed.
  const caution = both ? [catalogueCaution(solar, solarWords), ''] : [];
  if (rows.length === 0) return `${title}\n${notes.join('\n')}\n`;
  return [...caution, title, '', line(header), line(widths.map((w) => '─'.repeat(w))), ...rows.map(line), '', ...notes, ''].join('\n');
}

/** The short caution for the solar records of a table: totality somewhere among them or not. */
function catalogueCaution(solar: readonly SolarEclipseRecord[], words?: SolarWords): string {
  return solarSafetyText('short', solar.some((e) => safetyScopeForEclipse(e.kind) === 'whole-eclipse') ? 'whole-eclipse' : 'no-totality', words);
}

/** "2024-04-08 18:17" from an ISO instant with seconds, rounded to the minute as the lunar rows are. */
function isoMinute(iso: string): string {
  const ms = Date.parse(iso);
  const rounded = new Date(Math.round(ms / 60_000) * 60_000).toISOString();
  return `${rounded.slice(0, 10)} ${rounded.slice(11, 16)}`;
}
