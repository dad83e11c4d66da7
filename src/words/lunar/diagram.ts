/**
 * Every word a reader sees on the lunar shadow diagram and its caption: title,
 * subtitle, the timetable, the legend, the compass and scale, the small print.
 * Kept apart from the drawing so that it can be reviewed and translated; the
 * lunar naked-eye line lives here and in figures.ts only, so no solar figure
 * can carry it (no solar module imports this one).
 */
import type { ContactName } from '../../eclipses/lunar/contacts.ts';
import { printedFigures } from '../../eclipses/lunar/figures.ts';
import type { LunarEclipse } from '../../eclipses/lunar/types.ts';
import type { CivilClock } from '../../ephemeris/civilTime.ts';
import { timeOnDay } from '../../ephemeris/dayMark.ts';
import { ENGLISH, formatDuration, meantOnlyFor, type TextFor } from '../common.ts';

const KIND_TITLE: Record<LunarEclipse['kind'], string> = { total: 'Total', partial: 'Partial', penumbral: 'Penumbral' };

/** What each moment means for the Moon, in our words. */
export const MOMENT_WORDS: Readonly<Record<ContactName | 'greatest', string>> = {
  P1: 'touches the penumbra',
  U1: 'touches the umbra',
  U2: 'wholly inside the umbra',
  greatest: 'deepest in the shadow',
  U3: 'begins to leave the umbra',
  U4: 'clear of the umbra',
  P4: 'clear of the penumbra',
};

/** The diagram's fixed words: legend, compass letters, scale, timetable heading. */
export const DIAGRAM_WORDS = {
  penumbra: 'penumbra: part of the Sun hidden',
  umbra: 'umbra: all of the Sun hidden',
  moonAtGreatest: 'the Moon at greatest',
  moonAtContact: 'the Moon at each contact',
  path: 'the Moon\'s path; the arrow: its motion',
  north: 'N',
  east: 'E',
  greatest: 'Greatest',
  /** The scale bar's note: the Moon's size. */
  moonAcross: (arcmin: string) => `the Moon is ${arcmin}′ across`,
  /** The timetable's heading: the zone's abbreviation, or a note that each time carries its own. */
  timesHeading: (zone: string | undefined) => `Times (${zone ?? 'each with its zone'})`,
} as const;

/** A label beside a drawn Moon: "U2 03:26" or "Greatest 06:58". */
export const momentLabel = (name: ContactName | 'greatest', time: string) => `${name === 'greatest' ? DIAGRAM_WORDS.greatest : name} ${time}`;

/** The lunar diagram's last word on safety: for lunar eclipses only. */
const NAKED_EYE: TextFor<'lunar'> = meantOnlyFor('lunar', 'A lunar eclipse is safe to watch with the naked eye.');

/** Title, subtitle and small print. `timeText` prints an instant as the figure does; `zoneName` names the clock. */
export function diagramTexts(eclipse: LunarEclipse, clock: CivilClock, timeText: (utDays: number) => string, zoneName: string, generator: string, font: string, customTitle?: string) {
  const figures = printedFigures(eclipse);
  const title = customTitle ?? `${KIND_TITLE[eclipse.kind]} lunar eclipse of ${clock.date(eclipse.greatest.utDays)}: through the Earth's shadow`;
  const depth = eclipse.kind === 'penumbral' ? `penumbral magnitude ${figures.penumbralMagnitude}` : `umbral magnitude ${figures.umbralMagnitude}`;
  const longest = eclipse.durations.totalSeconds !== undefined ? `totality ${formatDuration(eclipse.durations.totalSeconds)}`
    : eclipse.durations.partialSeconds !== undefined ? `partial phase ${formatDuration(eclipse.durations.partialSeconds)}`
      : `penumbral phase ${formatDuration(eclipse.durations.penumbralSeconds)}`;
  const subtitle = `The Moon's path across the shadow, deepest at ${timeText(eclipse.greatest.utDays)} (${depth}, ${longest}). Times: ${zoneName}.`;
  const smallPrint = [
    'Seen from the Earth\'s centre with the shadow held still: the line is the Moon\'s computed path relative to it.',
    'North up, towards the celestial pole of date; east to the left, as the sky looks when you face it.',
    `Shadow: ${eclipse.convention === 'danjon' ? 'Danjon' : 'Chauvenet'} convention, circles at greatest; ΔT ${eclipse.deltaT.seconds.toFixed(1)} s (${eclipse.deltaT.source}); gamma ${figures.gamma}.`,
    `${ENGLISH.predictions} ${NAKED_EYE}`,
    `Type: ${font}. Made with ${generator}.`,
  ].join(' ');
  return { title, subtitle, smallPrint };
}

/** The caption file: title, what the figure shows in one sentence, then alt text. */
export function diagramCaption(title: string, eclipse: LunarEclipse, clock: CivilClock): string {
  const ref = eclipse.greatest.utDays;
  const at = (utDays: number) => `${timeOnDay(clock, utDays, ref)} ${clock.abbreviation(utDays)}`;
  const inner = eclipse.contacts.U2 && eclipse.contacts.U3 ? ` It is wholly inside the umbra from ${at(eclipse.contacts.U2.utDays)} to ${at(eclipse.contacts.U3.utDays)}.`
    : eclipse.contacts.U1 && eclipse.contacts.U4 ? ` It is partly inside the umbra from ${at(eclipse.contacts.U1.utDays)} to ${at(eclipse.contacts.U4.utDays)}.` : ' It never reaches the umbra.';
  const summary = `The Moon enters the Earth's penumbra at ${at(eclipse.contacts.P1!.utDays)}, is deepest in the shadow at ${at(ref)} and leaves it at ${at(eclipse.contacts.P4!.utDays)}.${inner}`;
  const side = eclipse.gamma >= 0 ? 'north' : 'south';
  const alt = `Diagram of two concentric circles, the Earth's lighter penumbra around its darker umbra, with the Moon's path crossing them from right to left, passing ${side} of the centre; the Moon is drawn where each phase begins and ends and at greatest, each labelled with its time. North is up, east to the left.`;
  return `${title}. ${summary}\n\nAlt text: ${alt}\n`;
}

/** The inset on the map: its heading and the greatest-eclipse label. */
export const INSET_WORDS = {
  heading: 'Through the shadow · N up, E left',
} as const;
