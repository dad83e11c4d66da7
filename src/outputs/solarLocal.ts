/**
 * What one place sees of a solar eclipse, as a table, markdown, CSV
 * (RFC 4180), an iCalendar file (RFC 5545) and the `umbracast.local/1` JSON
 * contract for `body: 'solar'`. Every format carries the eye-safety caution
 * (src/words/solar/caution.ts, long form, scoped to whether the place sees
 * totality): the first line of the table and markdown, the first row of the
 * CSV, `safety` in JSON, every VEVENT's description. The lunar naked-eye
 * line is never written here. The summary and the event words come from
 * src/words/solar/text.ts.
 *
 * Times are in the place's zone through the same clock as the lunar side
 * (`civilClock`); the table and markdown print them to the second, since a
 * total or annular phase lasts minutes.
 */
import { stringify } from 'csv-stringify/sync';
import { DATA_CALENDAR } from '../ephemeris/calendar.ts';
import { civilClock, type CivilClock } from '../ephemeris/civilTime.ts';
import { isoSeconds, momentFromUT, type Moment } from '../ephemeris/time.ts';
import { K_PENUMBRA, K_UMBRA } from '../eclipses/solar/constants.ts';
import type { SolarEclipse } from '../eclipses/solar/types.ts';
import { solarLocalCircumstances, type SolarLocalCircumstances, type SolarLocalEvent, type SolarLocalEventName } from '../local/solar.ts';
import { coordinatesText, fixedIn } from '../words/common.ts';
import { SOLAR_ENGLISH, safetyScopeForPlace, solarSafetyText, type SolarSafetyScope, type SolarWords } from '../words/solar/caution.ts';
import { clockSeconds, percentWords as percent, solarEventWords, solarLocalSummary, solarTextWords, type SolarTextWords } from '../words/solar/text.ts';

/** The summary and the duration words live with the solar reader text; re-exported for the library's face. */
export { minutesAndSeconds, solarLocalSummary } from '../words/solar/text.ts';
import { foldIcsLine, icsText, icsTime } from './icalendar.ts';
import { altitude2, ICS_STAMP, LOCAL_SCHEMA, localIso, type PlaceLabel } from './localFormats.ts';

export interface SolarLocalReport {
  readonly local: SolarLocalCircumstances;
  readonly place: PlaceLabel;
  readonly clock: CivilClock;
  readonly summary: string;
  /** The eye-safety caution for this place: totality seen here or not. */
  readonly safetyScope: SolarSafetyScope;
  readonly safety: string;
  /** The reader's words: every format prints through them (JSON and CSV keep their English keys and codes). */
  readonly words: SolarTextWords;
}

/** Everything the solar local formats print, for one eclipse and one place in its clock. */
export function solarLocalReport(eclipse: SolarEclipse, chosen: { place: PlaceLabel; clock: CivilClock }, solar: SolarWords = SOLAR_ENGLISH): SolarLocalReport {
  const { place } = chosen;
  const words = solarTextWords(solar);
  const clock = chosen.clock.words === words.common.clock ? chosen.clock : civilClock(chosen.clock.zone, 'zone', words.common.clock);
  const local = solarLocalCircumstances(eclipse, { latDeg: place.latDeg, lonDeg: place.lonDeg });
  const safetyScope = safetyScopeForPlace(local.kind === 'total');
  return {
    local, place, clock, summary: solarLocalSummary(local, clock, place.name, words), safetyScope, safety: solarSafetyText('long', safetyScope, solar), words,
  };
}

// ---- data ---------------------------------------------------------------------------------------

const round = (value: number, places: number) => {
  const factor = 10 ** places;
  const r = Math.round(value * factor) / factor;
  return Object.is(r, -0) ? 0 : r;
};

/** Fixed decimals, rounded once from the full value; never "-0.0". */
const fixed = (value: number, places: number) => {
  const text = value.toFixed(places);
  return /^-0\.?0*$/.test(text) ? text.slice(1) : text;
};

export function solarLocalJson(report: SolarLocalReport): string {
  const { local, place, clock, summary } = report;
  const e = local.eclipse;
  return `${JSON.stringify({
    schema: LOCAL_SCHEMA,
    body: 'solar',
    eclipse: e.id,
    eclipseKind: e.kind,
    kind: local.kind,
    calendar: DATA_CALENDAR,
    deltaT: round(e.deltaT.seconds, 1),
    moonRadius: { penumbra: K_PENUMBRA, umbra: K_UMBRA },
    place: { name: place.name, lat: place.latDeg, lon: place.lonDeg, tz: place.tz },
    magnitude: round(local.magnitude, 4),
    obscuration: round(local.obscuration, 4),
    obscurationSeen: round(local.obscurationSeen, 4),
    ...(local.centralSeconds !== undefined ? { centralSeconds: Math.round(local.centralSeconds) } : {}),
    insidePath: local.insidePath,
    ...(local.centralLineKm !== undefined ? { centralLineKm: round(local.centralLineKm, 1) } : {}),
    ...(local.nearestLimitKm !== undefined ? { nearestLimitKm: round(local.nearestLimitKm, 1) } : {}),
    nearPathEdge: local.nearPathEdge,
    lowSun: local.lowSun,
    events: local.events.map((ev) => ({
      event: ev.event,
      utc: isoSeconds(ev.moment.utDays),
      local: localIso(clock, ev.moment),
      sunAltitude: altitude2(ev.sunAltitudeDeg),
      sunAzimuth: round(ev.sunAzimuthDeg, 1),
      sunUp: ev.sunUp,
    })),
    summary,
    safety: report.safety,
  }, null, 2)}\n`;
}

// ---- table and markdown ---------------------------------------------------------------------------

function zoneHeader(report: SolarLocalReport): string {
  const { clock, local } = report;
  const first = local.events[0]?.moment.utDays ?? local.eclipse.greatest.utDays;
  const last = local.events[local.events.length - 1]?.moment.utDays ?? first;
  const changes = clock.offsetChanges(first, last);
  return changes.length === 0 ? clock.zoneLabel(first) : [clock.zoneLabel(first), ...changes.map((c) => c.after)].join(' → ');
}

const HEADER_RIGHT = [false, false, false, false, true, true, false];

function header(report: SolarLocalReport): string[] {
  return [...report.words.local.header(zoneHeader(report))];
}

function rows(report: SolarLocalReport): string[][] {
  const { clock, local, words } = report;
  const label = words.local.eventLabel;
  return local.events.map((ev: SolarLocalEvent) => [
    ev.event === 'maximum' ? label.maximum : ev.event === 'sunrise' ? label.sunrise : ev.event === 'sunset' ? label.sunset : ev.event,
    solarEventWords(local.kind, ev.event, words),
    `${clock.rfc3339(ev.moment.utDays).slice(0, 10)} ${clockSeconds(clock, ev.moment.utDays)}`,
    isoSeconds(ev.moment.utDays).slice(11, 19),
    `${fixedIn(Number(fixed(ev.sunAltitudeDeg, 1)), 1, words.common)}°`,
    `${Math.round(ev.sunAzimuthDeg) % 360}°`,
    ev.sunUp ? words.local.yes : words.local.no,
  ]);
}

function titleOf(report: SolarLocalReport): string {
  const { local, place, words } = report;
  return words.local.title(local.eclipse.kind, local.eclipse.id, place.name, coordinatesText(place.latDeg, place.lonDeg, words.common), place.tz);
}

function seenWords(local: SolarLocalCircumstances, words: SolarTextWords): string {
  const m = fixedIn(Number(fixed(local.magnitude, 3)), 3, words.common);
  const o = percent(local.obscuration, words);
  const seen = words.local.seen;
  switch (local.kind) {
    case 'total': return seen.total(m);
    case 'annular': return seen.annular(m, o);
    // The Sun below the horizon at maximum: what is seen is the most covered while it is up, not the maximum's figures.
    case 'partial': return local.events.find((e) => e.event === 'maximum')?.sunUp === false ? seen.partialLow(percent(local.obscurationSeen, words)) : seen.partial(m, o);
    case 'none': return seen.none;
  }
}

function notes(report: SolarLocalReport): string[] {
  const { clock, local, words } = report;
  const common = words.common;
  const first = local.events[0]?.moment.utDays ?? local.eclipse.greatest.utDays;
  const last = local.events[local.events.length - 1]?.moment.utDays ?? first;
  const deltaT = local.eclipse.deltaT;
  return [
    words.local.timeNote(clock.zoneDescriptionBetween(first, last)),
    words.local.modelNote(decimalConstant(K_PENUMBRA, words), decimalConstant(K_UMBRA, words), fixedIn(deltaT.seconds, 1, common), common.deltaTSources[deltaT.source], common.predictions),
  ];
}

/** A constant as JavaScript prints it ("0.2725076"), in the language's decimal sign. */
const decimalConstant = (value: number, words: SolarTextWords) => fixedIn(value, (String(value).split('.')[1] ?? '').length, words.common);

/** Plain text: the caution first, then the title, the events, what is seen, the summary and the notes. */
export function solarLocalTable(report: SolarLocalReport): string {
  const head = header(report);
  const body = rows(report);
  const widths = head.map((h, i) => Math.max(h.length, ...body.map((r) => r[i]!.length)));
  const line = (cells: string[]) => cells.map((c, i) => (HEADER_RIGHT[i] ? c.padStart(widths[i]!) : c.padEnd(widths[i]!))).join('  ').trimEnd();
  const table = body.length > 0 ? [line(head), line(widths.map((w) => '─'.repeat(w))), ...body.map(line), ''] : [];
  return [`${report.words.local.safetyHeading.plain}: ${report.safety}`, '', titleOf(report), '', ...table, seenWords(report.local, report.words), report.summary, '', ...notes(report), ''].join('\n');
}

export function solarLocalMarkdown(report: SolarLocalReport): string {
  const head = header(report);
  const escape = (cell: string) => cell.replace(/\|/g, '\\|');
  const table = report.local.events.length > 0
    ? [
        `| ${head.map(escape).join(' | ')} |`,
        `| ${head.map((_, i) => (HEADER_RIGHT[i] ? '---:' : '---')).join(' | ')} |`,
        ...rows(report).map((r) => `| ${r.map(escape).join(' | ')} |`),
        '',
      ]
    : [];
  return [
    `> **${report.words.local.safetyHeading.markdown}:** ${escape(report.safety)}`,
    '',
    `### ${escape(titleOf(report))}`,
    '',
    ...table,
    escape(`${seenWords(report.local, report.words)} ${report.summary}`),
    '',
    ...notes(report).map((n) => `<small>${escape(n)}</small>  `),
    '',
  ].join('\n');
}

// ---- CSV (RFC 4180) -------------------------------------------------------------------------------

export const SOLAR_CSV_COLUMNS = ['event', 'utc', 'local', 'sunAltitude', 'sunAzimuth', 'sunUp', 'calendar', 'note'] as const;

/** One row per event, after a first row whose event is `safety` and whose note is the caution. */
export function solarLocalCsv(report: SolarLocalReport): string {
  const { clock } = report;
  return stringify(
    [
      ['safety', '', '', '', '', '', '', report.safety],
      ...report.local.events.map((ev) => [
        ev.event, isoSeconds(ev.moment.utDays), localIso(clock, ev.moment), altitude2(ev.sunAltitudeDeg), round(ev.sunAzimuthDeg, 1), ev.sunUp, DATA_CALENDAR, '',
      ]),
    ],
    { header: true, columns: [...SOLAR_CSV_COLUMNS] },
  );
}

// ---- iCalendar (RFC 5545) ---------------------------------------------------------------------------

/** The stretches of a phase with the Sun up: from its start if the Sun is up then, else from a sunrise; to a sunset or its end. */
function sunUpStretches(local: SolarLocalCircumstances, start: SolarLocalEvent, end: SolarLocalEvent): [number, number][] {
  const fromUt = start.moment.utDays;
  const toUt = end.moment.utDays;
  const stretches: [number, number][] = [];
  let openedAt = start.sunUp ? fromUt : undefined;
  for (const ev of local.events) {
    const t = ev.moment.utDays;
    if (t <= fromUt || t >= toUt) continue;
    if (ev.event === 'sunrise' && openedAt === undefined) openedAt = t;
    if (ev.event === 'sunset' && openedAt !== undefined) {
      if (t > openedAt) stretches.push([openedAt, t]);
      openedAt = undefined;
    }
  }
  if (openedAt !== undefined && toUt > openedAt) stretches.push([openedAt, toUt]);
  return stretches;
}

/**
 * One event per phase and stretch of it seen with the Sun up (the partial
 * eclipse C1–C4, the central phase C2–C3); for an eclipse not seen at all,
 * one informative event that says so (a calendar needs a component, RFC 5545
 * §3.6). Every description ends with the caution.
 */
export function solarLocalIcs(report: SolarLocalReport, generator: string): string {
  const { local, place, words } = report;
  const cal = words.calendar;
  const find = (name: SolarLocalEventName) => local.events.find((e) => e.event === name);
  const where = `${place.latDeg.toFixed(4)}_${place.lonDeg.toFixed(4)}`;
  const lines = ['BEGIN:VCALENDAR', 'VERSION:2.0', `PRODID:-//umbracast//${generator}//EN`, 'CALSCALE:GREGORIAN', 'METHOD:PUBLISH'];
  const vevent = (uid: string, from: Moment, to: Moment, summary: string, description: string) =>
    lines.push(
      'BEGIN:VEVENT',
      `UID:${uid}@umbracast`,
      `DTSTAMP:${ICS_STAMP}`,
      `DTSTART:${icsTime(from)}`,
      `DTEND:${icsTime(to)}`,
      `SUMMARY:${icsText(summary)}`,
      `LOCATION:${icsText(place.name)}`,
      `GEO:${place.latDeg.toFixed(5)};${place.lonDeg.toFixed(5)}`,
      `DESCRIPTION:${icsText(`${description} ${report.summary} ${words.local.safetyHeading.plain}: ${report.safety}`)}`,
      'TRANSP:TRANSPARENT',
      'END:VEVENT',
    );
  // The UID keys stay as they were (data, not words); the titles are the reader's.
  const central = local.kind === 'total' || local.kind === 'annular' ? local.kind : undefined;
  const phases = [
    { key: 'partial', title: cal.partialTitle, start: find('C1'), end: find('C4') },
    ...(central ? [{ key: central === 'total' ? 'totality' : 'annularity', title: cal.centralTitle[central], start: find('C2'), end: find('C3') }] : []),
  ];
  for (const phase of phases) {
    if (!phase.start || !phase.end) continue;
    const { start, end } = phase;
    sunUpStretches(local, start, end).forEach(([a, b], k) => {
      const from = a === start.moment.utDays ? start.moment : momentFromUT(a, start.moment.deltaTSeconds);
      const to = b === end.moment.utDays ? end.moment : momentFromUT(b, end.moment.deltaTSeconds);
      const cut = from !== start.moment || to !== end.moment;
      vevent(
        `${local.eclipse.id}-solar-${phase.key}${k > 0 ? `-${k + 1}` : ''}-${where}`,
        from,
        to,
        `${phase.title}${cut ? cal.cutShort : ''}`,
        cal.description(phase.title, local.eclipse.id, cut ? cal.cutLong : ''),
      );
    });
  }
  if (!lines.includes('BEGIN:VEVENT')) {
    const c1 = find('C1')?.moment ?? local.eclipse.contacts.P1!;
    const c4 = find('C4')?.moment ?? local.eclipse.contacts.P4!;
    vevent(`${local.eclipse.id}-solar-not-seen-${where}`, c1, c4, cal.notSeenTitle(place.name), cal.notSeenDescription);
  }
  lines.push('END:VCALENDAR');
  return `${lines.map(foldIcsLine).join('\r\n')}\r\n`;
}
