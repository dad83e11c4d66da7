/** The catalogue as json, csv (both keep seconds) and a table for people (minutes, UTC labelled). */
import { stringify } from 'csv-stringify/sync';
import { CONTACT_ORDER } from '../eclipses/lunar/contacts.ts';
import { julianDateOfIsoDate } from '../ephemeris/calendar.ts';
import type { CatalogueDocument, EclipseRecord } from './catalogueRecord.ts';
import { decimalIn, deltaTModelIn, formatDuration } from '../words/common.ts';
import { LUNAR_ENGLISH, type LunarWords } from '../words/lunar/text.ts';
import { dateWordsIn } from '../ephemeris/civilTime.ts';

export type CatalogueFormat = 'table' | 'json' | 'csv';
export const CATALOGUE_FORMATS: readonly CatalogueFormat[] = ['table', 'json', 'csv'];

export function catalogueJson(doc: CatalogueDocument): string {
  return `${JSON.stringify(doc, null, 2)}\n`;
}

const CSV_COLUMNS = [
  'id', 'kind', 'greatest', 'greatestTT', 'deltaT', 'deltaTSource', 'gamma', 'umbralMagnitude', 'penumbralMagnitude', 'saros',
  ...CONTACT_ORDER,
  'penumbralSeconds', 'partialSeconds', 'totalSeconds',
  'subLunarLon', 'subLunarLat', 'calendar',
] as const;

export function catalogueCsv(doc: CatalogueDocument): string {
  const rows = doc.eclipses.map((e) => [
    e.id, e.kind, e.greatest, e.greatestTT, e.deltaT, e.deltaTSource, e.gamma, e.umbralMagnitude, e.penumbralMagnitude, e.saros,
    ...CONTACT_ORDER.map((name) => e.contacts[name] ?? ''),
    e.durations.penumbral, e.durations.partial ?? '', e.durations.total ?? '',
    e.subLunar.greatest[0], e.subLunar.greatest[1], doc.calendar,
  ]);
  return stringify(rows, { header: true, columns: [...CSV_COLUMNS] });
}

/** The table in `words`' language (default English): dates and figures as Intl writes them there. */
export function catalogueTable(doc: CatalogueDocument, words: LunarWords = LUNAR_ENGLISH): string {
  const w = words.table;
  const decimal = (text: string) => decimalIn(text, words.common);
  const julianOf = (id: string) => julianDateOfIsoDate(id, dateWordsIn(words.common.clock));
  const header = w.catalogueHeader;
  const minutes = (value: number | undefined) => (value !== undefined ? formatDuration(value * 60, 'compact', words.common) : w.absent);
  // Every figure as printed elsewhere: rounded once, from the full value (record.printed).
  const rows = doc.eclipses.map((e: EclipseRecord) => [
    julianOf(e.id) ? w.julianBeside(e.id, julianOf(e.id)!) : e.id,
    w.kind[e.kind],
    e.printed.greatestUtc,
    decimal(e.printed.umbralMagnitude),
    decimal(e.printed.penumbralMagnitude),
    decimal(e.printed.gamma),
    minutes(e.printed.minutes.partial),
    minutes(e.printed.minutes.total),
    String(e.saros),
  ]);
  const numeric = [false, false, false, true, true, true, true, true, true];
  const widths = header.map((h, i) => Math.max(h.length, ...rows.map((r) => r[i]!.length)));
  const line = (cells: readonly string[]) =>
    cells.map((c, i) => (numeric[i] ? c.padStart(widths[i]!) : c.padEnd(widths[i]!))).join('  ').trimEnd();
  const sources = [...new Set(doc.eclipses.map((e) => e.deltaTSource))].map((s) => (words.common.deltaTSources as Readonly<Record<string, string>>)[s] ?? s).join(', ');
  const deltaTs = doc.eclipses.map((e) => e.deltaT);
  const title = w.catalogueTitle(w.eclipses(doc.eclipses.length), doc.range.from.slice(0, 10), doc.range.to.slice(0, 10));
  const julian = doc.eclipses.some((e) => julianDateOfIsoDate(e.id)) ? w.catalogueJulian : '';
  const notes = [
    w.catalogueTimes(words.convention[doc.convention], julian),
    deltaTs.length > 0 ? w.deltaTNote(decimal(w.deltaTSpan([Math.min(...deltaTs), Math.max(...deltaTs)])), sources, deltaTModelIn(doc.deltaTModel, words.common)) : w.deltaTModelOnly(deltaTModelIn(doc.deltaTModel, words.common)),
  ];
  if (rows.length === 0) return `${title}\n${notes.join('\n')}\n`;
  return [title, '', line(header), line(widths.map((w) => '─'.repeat(w))), ...rows.map(line), '', ...notes, ''].join('\n');
}
