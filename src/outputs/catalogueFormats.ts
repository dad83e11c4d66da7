/** The catalogue as json, csv (both keep seconds) and a table for people (minutes, UTC labelled). */
import { stringify } from 'csv-stringify/sync';
import { CONTACT_ORDER } from '../eclipses/lunar/contacts.ts';
import { julianDateOfIsoDate } from '../ephemeris/calendar.ts';
import type { CatalogueDocument, EclipseRecord } from './catalogueRecord.ts';
import { counted } from './counted.ts';

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

/** "3h 38m" from seconds, rounded to the minute. */
export function hoursMinutes(seconds: number): string {
  const minutes = Math.round(seconds / 60);
  const h = Math.floor(minutes / 60);
  const m = minutes % 60;
  return h > 0 ? `${h}h ${String(m).padStart(2, '0')}m` : `${m}m`;
}

export function catalogueTable(doc: CatalogueDocument): string {
  const header = ['Date', 'Kind', 'Greatest (UTC)', 'Umbral mag.', 'Penumbral mag.', 'Gamma', 'In umbra', 'Totality', 'Saros'];
  // Every figure as printed elsewhere: rounded once, from the full value (record.printed).
  const rows = doc.eclipses.map((e: EclipseRecord) => [
    julianDateOfIsoDate(e.id) ? `${e.id} (Julian: ${julianDateOfIsoDate(e.id)})` : e.id,
    e.kind,
    e.printed.greatestUtc,
    e.printed.umbralMagnitude,
    e.printed.penumbralMagnitude,
    e.printed.gamma,
    e.printed.minutes.partial !== undefined ? hoursMinutes(e.printed.minutes.partial * 60) : '–',
    e.printed.minutes.total !== undefined ? hoursMinutes(e.printed.minutes.total * 60) : '–',
    String(e.saros),
  ]);
  const numeric = [false, false, false, true, true, true, true, true, true];
  const widths = header.map((h, i) => Math.max(h.length, ...rows.map((r) => r[i]!.length)));
  const line = (cells: string[]) =>
    cells.map((c, i) => (numeric[i] ? c.padStart(widths[i]!) : c.padEnd(widths[i]!))).join('  ').trimEnd();
  const sources = [...new Set(doc.eclipses.map((e) => e.deltaTSource))].join(', ');
  const deltaTs = doc.eclipses.map((e) => e.deltaT);
  const deltaTSpan = deltaTs.length === 0 ? '' : Math.min(...deltaTs) === Math.max(...deltaTs)
    ? `${deltaTs[0]!.toFixed(1)} s`
    : `${Math.min(...deltaTs).toFixed(1)}–${Math.max(...deltaTs).toFixed(1)} s`;
  const title = `${counted(doc.eclipses.length, 'lunar eclipse')} from ${doc.range.from.slice(0, 10)} up to (not including) ${doc.range.to.slice(0, 10)}`;
  const julian = doc.eclipses.some((e) => julianDateOfIsoDate(e.id)) ? ' Dates: proleptic Gregorian calendar; before 1582 October 15 the Julian date follows.' : '';
  const notes = [
    `Times UTC, rounded to the minute. Shadow: ${doc.convention === 'danjon' ? 'Danjon' : 'Chauvenet'} convention.${julian}`,
    doc.eclipses.length > 0 ? `ΔT ${deltaTSpan} (${sources}; model: ${doc.deltaTModel}).` : `ΔT model: ${doc.deltaTModel}.`,
  ];
  if (rows.length === 0) return `${title}\n${notes.join('\n')}\n`;
  return [title, '', line(header), line(widths.map((w) => '─'.repeat(w))), ...rows.map(line), '', ...notes, ''].join('\n');
}
