/**
 * Local circumstances as a table, markdown, csv, an iCalendar file (RFC 5545)
 * and the `umbracast.local/1` JSON contract.
 */
import { stringify } from 'csv-stringify/sync';
import type { CivilClock } from '../ephemeris/civilTime.ts';
import { isoMinutes, isoSeconds, type Moment } from '../ephemeris/time.ts';
import type { LunarEclipse } from '../eclipse/types.ts';
import { localCircumstances, localSummary, type LocalCircumstances, type LocalEvent, type LocalEventName } from '../visibility/local.ts';

export const LOCAL_SCHEMA = 'umbracast.local/1';
export { LOCAL_FORMATS, type LocalFormat } from './formatNames.ts';

export interface PlaceLabel {
  readonly name: string;
  readonly latDeg: number;
  readonly lonDeg: number;
  readonly tz: string;
}

export interface LocalReport {
  readonly local: LocalCircumstances;
  readonly place: PlaceLabel;
  readonly clock: CivilClock;
  readonly summary: string;
}

/** Everything the local formats print, for one eclipse and one place in its clock. */
export function localReport(eclipse: LunarEclipse, chosen: { place: PlaceLabel; clock: CivilClock }): LocalReport {
  const { place, clock } = chosen;
  const local = localCircumstances(eclipse, { latDeg: place.latDeg, lonDeg: place.lonDeg });
  return { local, place, clock, summary: localSummary(local, clock, place.name) };
}

export const EVENT_WORDS: Record<LocalEventName, string> = {
  P1: 'Moon enters the penumbra',
  U1: 'partial eclipse begins',
  U2: 'totality begins',
  greatest: 'greatest eclipse',
  U3: 'totality ends',
  U4: 'partial eclipse ends',
  P4: 'Moon leaves the penumbra',
  moonrise: 'moonrise',
  moonset: 'moonset',
};

const round1 = (v: number) => Math.round(v * 10) / 10;

/** ISO 8601 local time with offset, to the second: 2025-03-14T02:09:40-03:00. */
export function localIso(clock: CivilClock, moment: Moment): string {
  const offset = clock.offset(moment.utDays);
  const sign = offset.startsWith('-') ? -1 : 1;
  const [h, m] = offset.slice(1).split(':').map(Number) as [number, number];
  const shifted = Math.round((moment.utDays * 86_400 + sign * (h * 3600 + m * 60)));
  return `${isoSeconds(shifted / 86_400).slice(0, 19)}${offset}`;
}

export function localJson(report: LocalReport): string {
  const { local, place, clock, summary } = report;
  return `${JSON.stringify({
    schema: LOCAL_SCHEMA,
    eclipse: local.eclipse.id,
    kind: local.eclipse.kind,
    convention: local.eclipse.convention,
    deltaT: round1(local.eclipse.deltaT.seconds),
    place: { name: place.name, lat: place.latDeg, lon: place.lonDeg, tz: place.tz },
    events: local.events.map((e) => ({
      event: e.event,
      utc: isoSeconds(e.moment.utDays),
      local: localIso(clock, e.moment),
      moonAltitude: round1(e.moonAltitudeDeg),
      moonAzimuth: round1(e.moonAzimuthDeg),
      moonUp: e.moonUp,
      sunAltitude: round1(e.sunAltitudeDeg),
      sky: e.sky,
    })),
    summary,
  }, null, 2)}\n`;
}

function rows(report: LocalReport): string[][] {
  const { clock } = report;
  return report.local.events.map((e: LocalEvent) => [
    e.event === 'greatest' ? 'Greatest' : e.event === 'moonrise' ? 'Moonrise' : e.event === 'moonset' ? 'Moonset' : e.event,
    EVENT_WORDS[e.event],
    `${clock.isoDate(e.moment.utDays)} ${clock.time(e.moment.utDays)}`,
    isoMinutes(e.moment.utDays).slice(11, 16),
    `${round1(e.moonAltitudeDeg).toFixed(1)}°`,
    `${round1(e.moonAzimuthDeg).toFixed(0)}°`,
    e.moonUp ? 'yes' : 'no',
    `${round1(e.sunAltitudeDeg).toFixed(1)}°`,
    e.sky,
  ]);
}

function headerFor(report: LocalReport): string[] {
  const zone = report.clock.zoneLabel(report.local.eclipse.greatest.utDays);
  return ['Event', 'What happens', `Local (${zone})`, 'UTC', 'Moon alt.', 'Moon az.', 'Moon up', 'Sun alt.', 'Sky'];
}

function titleOf(report: LocalReport): string {
  const { local, place } = report;
  const lat = `${Math.abs(place.latDeg).toFixed(2)}°${place.latDeg >= 0 ? 'N' : 'S'}`;
  const lon = `${Math.abs(place.lonDeg).toFixed(2)}°${place.lonDeg >= 0 ? 'E' : 'W'}`;
  return `${local.eclipse.kind[0]!.toUpperCase()}${local.eclipse.kind.slice(1)} lunar eclipse ${local.eclipse.id} from ${place.name} (${lat}, ${lon}; ${place.tz})`;
}

function notes(report: LocalReport): string[] {
  const e = report.local.eclipse;
  return [
    `Times rounded to the minute. Moon altitude: its centre, with refraction; "up": upper limb above a sea-level horizon.`,
    `Shadow: ${e.convention === 'danjon' ? 'Danjon' : 'Chauvenet'} convention; ΔT ${e.deltaT.seconds.toFixed(1)} s (${e.deltaT.source}). Predictions: weather and the local horizon decide what is seen.`,
  ];
}

export function localTable(report: LocalReport): string {
  const header = headerFor(report);
  const body = rows(report);
  const widths = header.map((h, i) => Math.max(h.length, ...body.map((r) => r[i]!.length)));
  const right = [false, false, false, false, true, true, false, true, false];
  const line = (cells: string[]) => cells.map((c, i) => (right[i] ? c.padStart(widths[i]!) : c.padEnd(widths[i]!))).join('  ').trimEnd();
  return [titleOf(report), '', line(header), line(widths.map((w) => '─'.repeat(w))), ...body.map(line), '', report.summary, '', ...notes(report), ''].join('\n');
}

export function localMarkdown(report: LocalReport): string {
  const header = headerFor(report);
  const escape = (cell: string) => cell.replace(/\|/g, '\\|');
  return [
    `### ${escape(titleOf(report))}`,
    '',
    `| ${header.map(escape).join(' | ')} |`,
    `| ${header.map((_, i) => ([4, 5, 7].includes(i) ? '---:' : '---')).join(' | ')} |`,
    ...rows(report).map((r) => `| ${r.map(escape).join(' | ')} |`),
    '',
    escape(report.summary),
    '',
    ...notes(report).map((n) => `<small>${escape(n)}</small>  `),
    '',
  ].join('\n');
}

export function localCsv(report: LocalReport): string {
  const { clock } = report;
  return stringify(
    report.local.events.map((e) => [
      e.event, isoSeconds(e.moment.utDays), localIso(clock, e.moment), round1(e.moonAltitudeDeg), round1(e.moonAzimuthDeg), e.moonUp, round1(e.sunAltitudeDeg), e.sky,
    ]),
    { header: true, columns: ['event', 'utc', 'local', 'moonAltitude', 'moonAzimuth', 'moonUp', 'sunAltitude', 'sky'] },
  );
}

// ---- iCalendar (RFC 5545) ------------------------------------------------------------------

const icsTime = (moment: Moment) => isoSeconds(moment.utDays).replace(/[-:]/g, '');
/** RFC 5545 §3.3.11: escape backslash, semicolon, comma and newlines in TEXT. */
const icsText = (text: string) => text.replace(/\\/g, '\\\\').replace(/;/g, '\\;').replace(/,/g, '\\,').replace(/\r?\n/g, '\\n');

/** RFC 5545 §3.1: lines longer than 75 octets are folded (CRLF + space), never inside a UTF-8 sequence. */
function fold(line: string): string {
  const out: string[] = [];
  let current = '';
  let octets = 0;
  for (const char of line) {
    const size = Buffer.byteLength(char);
    if (octets + size > (out.length === 0 ? 75 : 74)) {
      out.push(current);
      current = '';
      octets = 0;
    }
    current += char;
    octets += size;
  }
  out.push(current);
  return out.join('\r\n ');
}

interface Phase {
  readonly key: 'penumbral' | 'partial' | 'total';
  readonly title: string;
  readonly start: LocalEventName;
  readonly end: LocalEventName;
}

const PHASES: readonly Phase[] = [
  { key: 'penumbral', title: 'Penumbral lunar eclipse', start: 'P1', end: 'P4' },
  { key: 'partial', title: 'Partial phases of the lunar eclipse', start: 'U1', end: 'U4' },
  { key: 'total', title: 'Totality', start: 'U2', end: 'U3' },
];

/**
 * DTSTAMP (RFC 5545 §3.8.7.2) is when the calendar was made. To keep files
 * byte-stable we write one fixed stamp, 2000-01-01 00:00 UTC, for every file:
 * never the eclipse's time, never in the future. Documented in the README.
 */
export const ICS_STAMP = '20000101T000000Z';

/**
 * One event per phase that can be seen from the place, cut to the time the
 * Moon is up; for an eclipse not seen at all, one informative event over the
 * whole eclipse that says so (a calendar needs at least one component, RFC 5545 §3.6).
 */
export function localIcs(report: LocalReport, generator: string): string {
  const { local, place } = report;
  const events = local.events;
  const find = (name: LocalEventName) => events.find((e) => e.event === name);
  const rise = find('moonrise');
  const set = find('moonset');
  const lines = ['BEGIN:VCALENDAR', 'VERSION:2.0', `PRODID:-//umbracast//${generator}//EN`, 'CALSCALE:GREGORIAN', 'METHOD:PUBLISH'];
  for (const phase of PHASES) {
    const start = find(phase.start);
    const end = find(phase.end);
    if (!start || !end) continue;
    // The part of the phase with the Moon up: from the later of its start and moonrise, to the earlier of its end and moonset.
    let from = start.moonUp ? start.moment : rise && rise.moment.utDays > start.moment.utDays && rise.moment.utDays < end.moment.utDays ? rise.moment : undefined;
    let to = end.moonUp ? end.moment : set && set.moment.utDays > start.moment.utDays && set.moment.utDays < end.moment.utDays ? set.moment : undefined;
    if (!from || !to) {
      const inside = events.some((e) => e.moonUp && e.moment.utDays > start.moment.utDays && e.moment.utDays < end.moment.utDays);
      if (!inside) continue;
      from ??= start.moment;
      to ??= end.moment;
    }
    const uid = `${local.eclipse.id}-${phase.key}-${place.latDeg.toFixed(4)}_${place.lonDeg.toFixed(4)}@umbracast`;
    const cut = from !== start.moment || to !== end.moment ? ' (the part with the Moon above the horizon)' : '';
    lines.push(
      'BEGIN:VEVENT',
      `UID:${uid}`,
      `DTSTAMP:${ICS_STAMP}`,
      `DTSTART:${icsTime(from)}`,
      `DTEND:${icsTime(to)}`,
      `SUMMARY:${icsText(`${phase.title}${cut ? ' (Moon up)' : ''}`)}`,
      `LOCATION:${icsText(place.name)}`,
      `GEO:${place.latDeg.toFixed(5)};${place.lonDeg.toFixed(5)}`,
      `DESCRIPTION:${icsText(`${phase.title} of ${local.eclipse.id}${cut}. ${report.summary} Safe to watch with the naked eye; predictions, weather permitting.`)}`,
      'TRANSP:TRANSPARENT',
      'END:VEVENT',
    );
  }
  if (!lines.includes('BEGIN:VEVENT')) {
    const p1 = find('P1')!;
    const p4 = find('P4')!;
    lines.push(
      'BEGIN:VEVENT',
      `UID:${local.eclipse.id}-not-seen-${place.latDeg.toFixed(4)}_${place.lonDeg.toFixed(4)}@umbracast`,
      `DTSTAMP:${ICS_STAMP}`,
      `DTSTART:${icsTime(p1.moment)}`,
      `DTEND:${icsTime(p4.moment)}`,
      `SUMMARY:${icsText(`Lunar eclipse, not visible from ${place.name}`)}`,
      `LOCATION:${icsText(place.name)}`,
      `GEO:${place.latDeg.toFixed(5)};${place.lonDeg.toFixed(5)}`,
      `DESCRIPTION:${icsText(`${report.summary} This entry only marks the date; there is nothing to see from here.`)}`,
      'TRANSP:TRANSPARENT',
      'END:VEVENT',
    );
  }
  lines.push('END:VCALENDAR');
  return `${lines.map(fold).join('\r\n')}\r\n`;
}
