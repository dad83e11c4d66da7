/**
 * Every word a reader sees on the lunar figures — the map and the view-from-here
 * figure: titles, subtitles, legend entries, line labels, notices and small
 * print, and the sky figure's caption. Kept here, apart from the drawing, so
 * that it can be reviewed and translated, and so that the lunar naked-eye line
 * can never reach a solar figure (no solar module imports this one).
 * Durations go through words/common.ts's `formatDuration`, and the
 * predictions notice is the one every output carries (words/common.ts).
 */
import type { ContactName } from '../../eclipses/lunar/contacts.ts';
import { printedFigures } from '../../eclipses/lunar/figures.ts';
import type { LunarEclipse } from '../../eclipses/lunar/types.ts';
import type { CivilClock } from '../../ephemeris/civilTime.ts';
import { ENGLISH, formatDuration } from '../common.ts';
import { timeRange } from '../../ephemeris/dayMark.ts';
import type { SkyClass } from '../../local/lunar.ts';

/** Every lunar output's last word on safety: meant for lunar eclipses only. */
const PREDICTIONS = `${ENGLISH.predictions} A lunar eclipse is safe to watch with the naked eye.`;

const KIND_TITLE: Record<LunarEclipse['kind'], string> = {
  total: 'Total lunar eclipse',
  partial: 'Partial lunar eclipse',
  penumbral: 'Penumbral lunar eclipse',
};
const KIND_WORDS: Record<LunarEclipse['kind'], string> = { total: 'total', partial: 'partial', penumbral: 'penumbral' };

const conventionWord = (eclipse: LunarEclipse) => (eclipse.convention === 'danjon' ? 'Danjon' : 'Chauvenet');

/** The map's title, subtitle (greatest, magnitude, durations) and small print. `credits`: the basemap's and the type's. */
export function mapTexts(eclipse: LunarEclipse, clock: CivilClock, deltaTLabel: string, generator: string, credits: { basemap: string; font: string }, customTitle?: string) {
  const at = eclipse.greatest.utDays;
  const title = customTitle ?? `${KIND_TITLE[eclipse.kind]} · ${clock.date(at)}`;
  const c = eclipse.contacts;
  // Greatest names the zone; ranges repeat it only when the clocks change during the eclipse, and then
  // each time carries the zone in force at its own instant.
  const clocksChange = clock.offsetChanges(c.P1!.utDays, c.P4!.utDays).length > 0;
  // A time on another day than the title's date says so ("01:13 +1 day").
  const range = (a: number, b: number) => (clocksChange ? clock.range(a, b, at) : timeRange(clock, a, b, at));
  const parts = [`Greatest ${clock.stamp(at)}`];
  // Figures rounded once, from the full value, as in the list and the caption.
  const figures = printedFigures(eclipse);
  const minus = (text: string) => text.replace('-', '−');
  if (eclipse.kind === 'penumbral') {
    parts.push(`penumbral magnitude ${minus(figures.penumbralMagnitude)}`);
    parts.push(`penumbral phase ${formatDuration(figures.minutes.penumbral * 60)} (${range(c.P1!.utDays, c.P4!.utDays)})`);
  } else {
    parts.push(`umbral magnitude ${minus(figures.umbralMagnitude)}`);
    if (eclipse.kind === 'total') parts.push(`totality ${formatDuration(figures.minutes.total! * 60)} (${range(c.U2!.utDays, c.U3!.utDays)})`);
    parts.push(`in the umbra ${formatDuration(figures.minutes.partial! * 60)} (${range(c.U1!.utDays, c.U4!.utDays)})`);
  }
  const subtitle = parts.join(' · ');
  const timesIn = `Times in ${clock.zoneDescriptionBetween(c.P1!.utDays, c.P4!.utDays)}`;
  const smallPrint = [
    `${timesIn}, 24-hour clock, rounded to the minute; "+1 day": the day after the date in the title.`,
    `Shadow: ${conventionWord(eclipse)} convention; ΔT ${deltaTLabel}.`,
    'Moon up: upper limb on a sea-level horizon with standard refraction.',
    PREDICTIONS,
    `${credits.basemap}. Type: ${credits.font}. Made with ${generator}.`,
  ].join(' ');
  return { title, subtitle, smallPrint };
}

/** The phase the field's lines count, as the legend names it. */
const COUNTED_PHASE_WORDS: Record<'totality' | 'umbral' | 'penumbral', string> = {
  totality: 'totality',
  umbral: 'the umbral phase',
  penumbral: 'the penumbral phase',
};

/** The map legend's entries, by layer. */
export interface MapLegendWords {
  readonly zoneAll: string;
  readonly zoneSets: string;
  readonly zoneRises: string;
  readonly zoneNone: string;
  readonly boundaryStrong: string;
  readonly boundaryLight: string;
  readonly field: string;
  readonly centre: string;
  readonly town: string;
  readonly codes: string;
}

export function mapLegendWords(eclipse: LunarEclipse, countedPhase: 'totality' | 'umbral' | 'penumbral', contactCodes: readonly string[], townOnOwnClock: boolean): MapLegendWords {
  // The zones are those of the umbral phase (of the whole eclipse when it is penumbral): the legend says which.
  const phaseName = eclipse.kind === 'penumbral' ? 'the eclipse' : 'the umbral phase';
  const codes = [
    contactCodes.includes('P1') ? 'P1/P4 the Moon meets/leaves the outer shadow (penumbra)' : '',
    contactCodes.includes('U1') ? 'U1/U4 the umbra' : '',
    contactCodes.includes('U2') ? 'U2/U3 totality begins/ends' : '',
  ].filter(Boolean).join(', ');
  return {
    zoneAll: `Moon up for all of ${phaseName}`,
    zoneSets: `Moon sets during ${phaseName}`,
    zoneRises: `Moon rises during ${phaseName}`,
    zoneNone: 'Moon below the horizon throughout',
    boundaryStrong: `Moonrise/moonset as ${phaseName} begins and ends`,
    boundaryLight: 'at other stages',
    field: `minutes of ${COUNTED_PHASE_WORDS[countedPhase]} with the Moon up`,
    centre: 'Moon overhead at greatest',
    town: townOnOwnClock ? 'marked town: the key phase in its own time' : 'marked town: the key phase',
    codes: `small tags on the lines: ${codes}`,
  };
}

/** What happens at a stage, in a reader's words: "as totality begins". */
function stageWords(stageName: ContactName | 'greatest', kind: LunarEclipse['kind']): string {
  switch (stageName) {
    case 'P1': return kind === 'penumbral' ? 'as the eclipse begins' : 'as the faint outer shadow begins';
    case 'U1': return 'as the partial eclipse begins';
    case 'U2': return 'as totality begins';
    case 'greatest': return 'at mid-eclipse';
    case 'U3': return 'as totality ends';
    case 'U4': return 'as the partial eclipse ends';
    case 'P4': return kind === 'penumbral' ? 'as the eclipse ends' : 'as the faint outer shadow ends';
  }
}

/** A label on a Moon-up line: "Moon rises as totality begins · 11:05". */
export function boundaryLabel(rising: boolean, stageName: ContactName | 'greatest', kind: LunarEclipse['kind'], time: string): string {
  return `Moon ${rising ? 'rises' : 'sets'} ${stageWords(stageName, kind)} · ${time}`;
}

/** A field line's label: "40 min". */
export const fieldLineLabel = (minutes: number) => `${minutes} min`;

/** The sky's brightness classes as the sky figure's legend names them. */
export const SKY_WORDS: Record<SkyClass, string> = {
  day: 'daylight',
  civil: 'civil twilight',
  nautical: 'nautical twilight',
  astronomical: 'astronomical twilight',
  night: 'night',
};

/** The Moon's path by phase, as the sky figure's legend names it. */
export const SKY_PHASE_WORDS = { penumbral: 'penumbral phase', partial: 'partial phase', total: 'totality' } as const;

/** The sky figure's words beside the plot: the horizon line, the events on the path. */
export const SKY_HORIZON = 'horizon';
export function skyEventLabel(event: ContactName | 'greatest' | 'moonrise' | 'moonset', time: string): string {
  const name = event === 'greatest' ? 'Greatest' : event === 'moonrise' ? 'Moonrise' : event === 'moonset' ? 'Moonset' : event;
  return `${name} ${time}`;
}

export function skyTitle(eclipse: LunarEclipse, placeName: string, clock: CivilClock): string {
  return `The ${KIND_WORDS[eclipse.kind]} lunar eclipse from ${placeName} · ${clock.date(eclipse.greatest.utDays)}`;
}

/** The sky figure's small print. `credits`: the gazetteer's (or ''), and the type's. */
export function skySmallPrint(eclipse: LunarEclipse, zoneName: string, generator: string, credits: { places: string; font: string }): string {
  return [
    `Local time: ${zoneName}, 24-hour clock. Altitude of the Moon's centre with standard refraction, above a sea-level horizon; letters under the path: where to look (compass point, e.g. ESE = east-southeast).`,
    `Shadow: ${conventionWord(eclipse)} convention; ΔT ${eclipse.deltaT.seconds.toFixed(1)} s (${eclipse.deltaT.source}).`,
    PREDICTIONS,
    `${credits.places} Type: ${credits.font}. Made with ${generator}.`,
  ].join(' ');
}

/** The caption file published beside a sky figure: its title and summary, then alt text. */
export function skyCaption(title: string, summary: string, placeName: string): string {
  const alt = `Chart of the Moon's height above the horizon through the night at ${placeName}, local time along the bottom, with the eclipse's phases marked on its path and the twilight behind.`;
  return `${title}. ${summary}\n\nAlt text: ${alt}\n`;
}
