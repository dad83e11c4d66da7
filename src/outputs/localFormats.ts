/**
 * Local circumstances as a table, markdown, csv, an iCalendar file (RFC 5545)
 * and the `umbracast.local/1` JSON contract.
 */
import { stringify } from 'csv-stringify/sync';
import { fixed } from '../eclipses/lunar/figures.ts';
import { DATA_CALENDAR, julianDateOfIsoDate } from '../ephemeris/calendar.ts';
import { civilClock, dateWordsIn, type CivilClock } from '../ephemeris/civilTime.ts';
import { isoMinutes, isoSeconds, momentFromUT, type Moment } from '../ephemeris/time.ts';
import type { LunarEclipse } from '../eclipses/lunar/types.ts';
import { localCircumstances, upIntervals, type LocalCircumstances, type LocalEvent, type LocalEventName } from '../local/lunar.ts';
import { coordinatesText, decimalIn } from '../words/common.ts';
import { LUNAR_ENGLISH, localSummary, type LunarPhaseKey, type LunarWords } from '../words/lunar/text.ts';

export const LOCAL_SCHEMA = 'umbracast.local/1';
export { LOCAL_FORMATS, type LocalFormat } from './formatNames.ts';

import type { PlaceLabel } from '../places/label.ts';
import { foldIcsLine, icsText } from './icalendar.ts';
export type { PlaceLabel } from '../places/label.ts';

export interface LocalReport {
  readonly local: LocalCircumstances;
  readonly place: PlaceLabel;
  readonly clock: CivilClock;
  readonly summary: string;
  /** The reader's language: every word of the formats, and the figures' drawn from it (default English). */
  readonly words?: LunarWords;
}

/** A report's language. */
export const wordsOf = (report: LocalReport): LunarWords => report.words ?? LUNAR_ENGLISH;

/**
 * Everything the local formats print, for one eclipse and one place in its clock, in `words`' language
 * (default English); the clock is made to print the same language.
 */
export function localReport(eclipse: LunarEclipse, chosen: { place: PlaceLabel; clock: CivilClock }, words: LunarWords = LUNAR_ENGLISH): LocalReport {
  const { place } = chosen;
  const clock = chosen.clock.words === words.common.clock ? chosen.clock : civilClock(chosen.clock.zone, 'zone', words.common.clock);
  const local = localCircumstances(eclipse, { latDeg: place.latDeg, lonDeg: place.lonDeg });
  return { local, place, clock, summary: localSummary(local, clock, place.name, words), words };
}

const round1 = (v: number) => Math.round(v * 10) / 10;
/** Altitudes in data outputs: to 0.01°. */
export const altitude2 = (v: number) => Math.round(v * 100) / 100;

/**
 * RFC 3339 local time to the second, denoting the same instant as `utc`: 2025-03-14T02:09:40-03:00.
 * Before standard time the local-mean-time offset is rounded to the minute (see `CivilClock.rfc3339`).
 */
export function localIso(clock: CivilClock, moment: Moment): string {
  return clock.rfc3339(moment.utDays);
}

export function localJson(report: LocalReport): string {
  const { local, place, clock, summary } = report;
  return `${JSON.stringify({
    schema: LOCAL_SCHEMA,
    eclipse: local.eclipse.id,
    kind: local.eclipse.kind,
    convention: local.eclipse.convention,
    calendar: DATA_CALENDAR,
    deltaT: round1(local.eclipse.deltaT.seconds),
    place: { name: place.name, lat: place.latDeg, lon: place.lonDeg, tz: place.tz },
    events: local.events.map((e) => ({
      event: e.event,
      utc: isoSeconds(e.moment.utDays),
      local: localIso(clock, e.moment),
      moonAltitude: altitude2(e.moonAltitudeDeg),
      moonAzimuth: round1(e.moonAzimuthDeg),
      moonUp: e.moonUp,
      sunAltitude: altitude2(e.sunAltitudeDeg),
      sky: e.sky,
    })),
    summary,
  }, null, 2)}\n`;
}

function rows(report: LocalReport): string[][] {
  const { clock } = report;
  const w = wordsOf(report).local;
  const decimal = (text: string) => decimalIn(text, wordsOf(report).common);
  return report.local.events.map((e: LocalEvent) => [
    w.eventLabel[e.event] ?? e.event,
    w.events[e.event],
    `${clock.isoDate(e.moment.utDays)} ${clock.stamp(e.moment.utDays)}`,
    isoMinutes(e.moment.utDays).slice(11, 16),
    // Rounded once, from the full value (an azimuth of 67.46° is 67°, not 67.5° and then 68°).
    `${decimal(fixed(e.moonAltitudeDeg, 1))}°`,
    `${Math.round(e.moonAzimuthDeg) % 360}°`,
    e.moonUp ? w.yes : w.no,
    `${decimal(fixed(e.sunAltitudeDeg, 1))}°`,
    w.sky[e.sky],
  ]);
}

/** The local column's zone: one label, or each label in turn when the clocks change during the eclipse. */
function headerFor(report: LocalReport): string[] {
  const { clock, local } = report;
  const first = local.events[0]!.moment.utDays;
  const changes = clock.offsetChanges(first, local.events[local.events.length - 1]!.moment.utDays);
  const zone = changes.length === 0 ? clock.zoneLabel(local.eclipse.greatest.utDays) : [clock.zoneLabel(first), ...changes.map((c) => c.after)].join(' → ');
  return [...wordsOf(report).local.header(zone)];
}

function titleOf(report: LocalReport): string {
  const { local, place } = report;
  const words = wordsOf(report);
  const e = local.eclipse;
  return words.local.title(words.kindTitle[e.kind], e.id, julianDateOfIsoDate(e.id, dateWordsIn(report.clock.words)), place.name, coordinatesText(place.latDeg, place.lonDeg, words.common), place.tz);
}

function notes(report: LocalReport): string[] {
  const e = report.local.eclipse;
  const events = report.local.events;
  const zone = report.clock.zoneDescriptionBetween(events[0]!.moment.utDays, events[events.length - 1]!.moment.utDays);
  const words = wordsOf(report);
  const w = words.local;
  return [
    w.timeNote(zone, julianDateOfIsoDate(e.id) ? w.julianNote : ''),
    decimalIn(w.shadowNote(words.convention[e.convention], e.deltaT.seconds, words.common.deltaTSources[e.deltaT.source], words.common.predictions), words.common),
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
      e.event, isoSeconds(e.moment.utDays), localIso(clock, e.moment), round1(e.moonAltitudeDeg), round1(e.moonAzimuthDeg), e.moonUp, round1(e.sunAltitudeDeg), e.sky, DATA_CALENDAR,
    ]),
    { header: true, columns: ['event', 'utc', 'local', 'moonAltitude', 'moonAzimuth', 'moonUp', 'sunAltitude', 'sky', 'calendar'] },
  );
}

// ---- iCalendar (RFC 5545) ------------------------------------------------------------------

const icsTime = (moment: Moment) => isoSeconds(moment.utDays).replace(/[-:]/g, '');

interface Phase {
  readonly key: LunarPhaseKey;
  readonly start: LocalEventName;
  readonly end: LocalEventName;
}

const PHASES: readonly Phase[] = [
  { key: 'penumbral', start: 'P1', end: 'P4' },
  { key: 'partial', start: 'U1', end: 'U4' },
  { key: 'total', start: 'U2', end: 'U3' },
];

/**
 * DTSTAMP (RFC 5545 §3.8.7.2) is when the calendar was made. To keep files
 * byte-stable we write one fixed stamp, 2000-01-01 00:00 UTC, for every file:
 * never the eclipse's time, never in the future. Documented in the README.
 */
export const ICS_STAMP = '20000101T000000Z';

/**
 * One event per phase and stretch of it that can be seen from the place, cut
 * to the time the Moon is up; for an eclipse not seen at all, one informative event over the
 * whole eclipse that says so (a calendar needs at least one component, RFC 5545 §3.6).
 */
export function localIcs(report: LocalReport, generator: string): string {
  const { local, place } = report;
  const events = local.events;
  const find = (name: LocalEventName) => events.find((e) => e.event === name);
  const intervals = upIntervals(local);
  const w = wordsOf(report).calendar;
  const lines = ['BEGIN:VCALENDAR', 'VERSION:2.0', `PRODID:-//umbracast//${generator}//EN`, 'CALSCALE:GREGORIAN', 'METHOD:PUBLISH'];
  for (const phase of PHASES) {
    const title = w.phaseTitle[phase.key];
    const start = find(phase.start);
    const end = find(phase.end);
    if (!start || !end) continue;
    // Each stretch of the phase with the Moon up (it may set and rise again inside a phase at high latitudes).
    const stretches = intervals
      .map((i) => [Math.max(i.fromUtDays, start.moment.utDays), Math.min(i.toUtDays, end.moment.utDays)] as const)
      .filter(([a, b]) => b > a);
    stretches.forEach(([a, b], k) => {
      const from = a === start.moment.utDays ? start.moment : momentFromUT(a, start.moment.deltaTSeconds);
      const to = b === end.moment.utDays ? end.moment : momentFromUT(b, end.moment.deltaTSeconds);
      const uid = `${local.eclipse.id}-${phase.key}${k > 0 ? `-${k + 1}` : ''}-${place.latDeg.toFixed(4)}_${place.lonDeg.toFixed(4)}@umbracast`;
      const cut = from !== start.moment || to !== end.moment ? w.cutToMoonUp : '';
      lines.push(
        'BEGIN:VEVENT',
        `UID:${uid}`,
        `DTSTAMP:${ICS_STAMP}`,
        `DTSTART:${icsTime(from)}`,
        `DTEND:${icsTime(to)}`,
        `SUMMARY:${icsText(`${title}${cut ? w.cutToMoonUpShort : ''}`)}`,
        `LOCATION:${icsText(place.name)}`,
        `GEO:${place.latDeg.toFixed(5)};${place.lonDeg.toFixed(5)}`,
        `DESCRIPTION:${icsText(w.description(title, local.eclipse.id, cut, report.summary, wordsOf(report).nakedEyeInCalendar))}`,
        'TRANSP:TRANSPARENT',
        'END:VEVENT',
      );
    });
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
      `SUMMARY:${icsText(w.notSeenTitle(place.name))}`,
      `LOCATION:${icsText(place.name)}`,
      `GEO:${place.latDeg.toFixed(5)};${place.lonDeg.toFixed(5)}`,
      `DESCRIPTION:${icsText(w.notSeenDescription(report.summary))}`,
      'TRANSP:TRANSPARENT',
      'END:VEVENT',
    );
  }
  lines.push('END:VCALENDAR');
  return `${lines.map(foldIcsLine).join('\r\n')}\r\n`;
}
