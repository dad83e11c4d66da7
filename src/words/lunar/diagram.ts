/**
 * Every word a reader sees on the lunar shadow diagram and its caption: title,
 * subtitle, the timetable, the legend, the compass and scale, the small print,
 * the map inset's heading. Kept apart from the drawing so that it can be
 * reviewed and translated; the lunar naked-eye line lives here and in
 * figures.ts only, so no solar figure can carry it (no solar module imports
 * this one).
 *
 * Shaped for translation: one `LunarDiagramWords` catalogue per language
 * (English below, LUNAR_DIAGRAM_ENGLISH), reached as `LunarWords.diagram`;
 * numbers are written through Intl in the catalogue's language.
 */
import type { ContactName } from '../../eclipses/lunar/contacts.ts';
import { printedFigures } from '../../eclipses/lunar/figures.ts';
import type { LunarEclipse } from '../../eclipses/lunar/types.ts';
import type { CivilClock } from '../../ephemeris/civilTime.ts';
import { timeOnDay } from '../../ephemeris/dayMark.ts';
import { decimalIn, ENGLISH, fixedIn, formatDuration, meantOnlyFor, type CommonWords, type TextFor } from '../common.ts';
import type { LunarWords } from './text.ts';

/** The moments the diagram draws the Moon at. */
export type DiagramMoment = ContactName | 'greatest';

/** The lunar diagram's words, one catalogue per language. */
export interface LunarDiagramWords {
  readonly common: CommonWords;
  /** What each moment means for the Moon, in the timetable. */
  readonly moments: Readonly<Record<DiagramMoment, string>>;
  /** The legend, in the order drawn. */
  readonly legend: { readonly penumbra: string; readonly umbra: string; readonly moonAtGreatest: string; readonly moonAtContact: string; readonly path: string };
  /** The compass arms' letters. */
  readonly compass: { readonly north: string; readonly east: string };
  /** The timetable's and the drawn Moon's word for greatest (the contacts keep the trade's names P1…U4). */
  readonly greatest: string;
  /** The scale bar's note: the Moon's size. */
  readonly moonAcross: (arcmin: string) => string;
  /** The timetable's heading: the zone's abbreviation, or (undefined) a note that each time carries its own. */
  readonly timesHeading: (zone: string | undefined) => string;
  /** "Total", as the title starts. */
  readonly kindTitle: Readonly<Record<LunarEclipse['kind'], string>>;
  readonly title: (kindTitle: string, date: string) => string;
  /** The title where the full one does not fit the page's width (a square page): the kind and the date alone. */
  readonly shortTitle: (kindTitle: string, date: string) => string;
  /** How deep the eclipse goes: the magnitude the subtitle quotes. */
  readonly depth: { readonly penumbral: (magnitude: string) => string; readonly umbral: (magnitude: string) => string };
  /** Its longest phase, as the subtitle quotes it. */
  readonly longest: { readonly totality: (duration: string) => string; readonly partial: (duration: string) => string; readonly penumbral: (duration: string) => string };
  readonly subtitle: (greatestTime: string, depth: string, longest: string, zone: string) => string;
  readonly smallPrint: {
    readonly frame: string;
    readonly orientation: string;
    /** `convention` is the convention's author (Danjon, Chauvenet). */
    readonly shadow: (convention: string, deltaT: string, source: string, gamma: string) => string;
    readonly credits: (font: string, generator: string) => string;
  };
  /** The diagram's last word on safety: for lunar eclipses only. */
  readonly nakedEye: TextFor<'lunar'>;
  readonly caption: {
    readonly wholly: (from: string, to: string) => string;
    readonly partly: (from: string, to: string) => string;
    readonly never: string;
    readonly summary: (p1: string, greatest: string, p4: string, inner: string) => string;
    /** `side`: where the Moon's path passes the shadow's centre. */
    readonly altText: (side: 'north' | 'south') => string;
    readonly file: (title: string, summary: string, altText: string) => string;
  };
  /** The map inset's heading. */
  readonly inset: { readonly heading: string };
}

export const LUNAR_DIAGRAM_ENGLISH: LunarDiagramWords = {
  common: ENGLISH,
  moments: {
    P1: 'touches the penumbra',
    U1: 'touches the umbra',
    U2: 'wholly inside the umbra',
    greatest: 'deepest in the shadow',
    U3: 'begins to leave the umbra',
    U4: 'clear of the umbra',
    P4: 'clear of the penumbra',
  },
  legend: {
    penumbra: 'penumbra: part of the Sun hidden',
    umbra: 'umbra: all of the Sun hidden',
    moonAtGreatest: 'the Moon at greatest',
    moonAtContact: 'the Moon at each contact',
    path: 'the Moon\'s path; the arrow: its motion',
  },
  compass: { north: 'N', east: 'E' },
  greatest: 'Greatest',
  moonAcross: (arcmin) => `the Moon is ${arcmin}′ across`,
  timesHeading: (zone) => `Times (${zone ?? 'each with its zone'})`,
  kindTitle: { total: 'Total', partial: 'Partial', penumbral: 'Penumbral' },
  title: (kindTitle, date) => `${kindTitle} lunar eclipse of ${date}: through the Earth's shadow`,
  shortTitle: (kindTitle, date) => `${kindTitle} lunar eclipse of ${date}`,
  depth: { penumbral: (m) => `penumbral magnitude ${m}`, umbral: (m) => `umbral magnitude ${m}` },
  longest: { totality: (d) => `totality ${d}`, partial: (d) => `partial phase ${d}`, penumbral: (d) => `penumbral phase ${d}` },
  subtitle: (time, depth, longest, zone) => `The Moon's path across the shadow, deepest at ${time} (${depth}, ${longest}). Times: ${zone}.`,
  smallPrint: {
    frame: 'Seen from the Earth\'s centre with the shadow held still: the line is the Moon\'s computed path relative to it.',
    orientation: 'North up, towards the celestial pole of date; east to the left, as the sky looks when you face it.',
    shadow: (convention, deltaT, source, gamma) => `Shadow: ${convention} convention, circles at greatest; ΔT ${deltaT} s (${source}); gamma ${gamma}.`,
    credits: (font, generator) => `Type: ${font}. Made with ${generator}.`,
  },
  nakedEye: meantOnlyFor('lunar', 'A lunar eclipse is safe to watch with the naked eye.'),
  caption: {
    wholly: (from, to) => ` It is wholly inside the umbra from ${from} to ${to}.`,
    partly: (from, to) => ` It is partly inside the umbra from ${from} to ${to}.`,
    never: ' It never reaches the umbra.',
    summary: (p1, greatest, p4, inner) => `The Moon enters the Earth's penumbra at ${p1}, is deepest in the shadow at ${greatest} and leaves it at ${p4}.${inner}`,
    altText: (side) =>
      `Diagram of two concentric circles, the Earth's lighter penumbra around its darker umbra, with the Moon's path crossing them from right to left, passing ${side} of the centre; the Moon is drawn where each phase begins and ends and at greatest, each labelled with its time. North is up, east to the left.`,
    file: (title, summary, altText) => `${title}. ${summary}\n\nAlt text: ${altText}\n`,
  },
  inset: { heading: 'Through the shadow · N up, E left' },
};

/** The conventions' authors, where no lunar catalogue is given (English). */
const CONVENTION_ENGLISH = { danjon: 'Danjon', chauvenet: 'Chauvenet' } as const;

/** The diagram words of a lunar catalogue (English when none is given). */
export function lunarDiagramWords(lunar?: LunarWords): LunarDiagramWords {
  return lunar === undefined ? LUNAR_DIAGRAM_ENGLISH : lunar.diagram;
}

/** A label beside a drawn Moon: "U2 03:26" or "Greatest 06:58". */
export const momentLabel = (name: DiagramMoment, time: string, lunar?: LunarWords) => `${name === 'greatest' ? lunarDiagramWords(lunar).greatest : name} ${time}`;

/** The scale bar's note, the Moon's size to 0.1′ in the language's decimal sign. */
export function moonAcrossWords(arcmin: number, lunar?: LunarWords): string {
  const w = lunarDiagramWords(lunar);
  return w.moonAcross(fixedIn(arcmin, 1, w.common));
}

/**
 * Title, subtitle and small print. `timeText` prints an instant as the figure does; `zoneName` names the clock;
 * `fits` tells whether a title fits the page's width (else the short title is used).
 */
export function diagramTexts(
  eclipse: LunarEclipse, clock: CivilClock, timeText: (utDays: number) => string, zoneName: string, generator: string, font: string,
  customTitle?: string, lunar?: LunarWords, fits: (title: string) => boolean = () => true,
) {
  const w = lunarDiagramWords(lunar);
  const common = w.common;
  const figures = printedFigures(eclipse);
  const full = w.title(w.kindTitle[eclipse.kind], clock.date(eclipse.greatest.utDays));
  const title = customTitle ?? (fits(full) ? full : w.shortTitle(w.kindTitle[eclipse.kind], clock.date(eclipse.greatest.utDays)));
  const depth = eclipse.kind === 'penumbral' ? w.depth.penumbral(decimalIn(figures.penumbralMagnitude, common)) : w.depth.umbral(decimalIn(figures.umbralMagnitude, common));
  const duration = (seconds: number) => formatDuration(seconds, 'long', common);
  const longest = eclipse.durations.totalSeconds !== undefined ? w.longest.totality(duration(eclipse.durations.totalSeconds))
    : eclipse.durations.partialSeconds !== undefined ? w.longest.partial(duration(eclipse.durations.partialSeconds))
      : w.longest.penumbral(duration(eclipse.durations.penumbralSeconds));
  const subtitle = w.subtitle(timeText(eclipse.greatest.utDays), depth, longest, zoneName);
  const convention = (lunar?.convention ?? CONVENTION_ENGLISH)[eclipse.convention];
  const smallPrint = [
    w.smallPrint.frame,
    w.smallPrint.orientation,
    w.smallPrint.shadow(convention, fixedIn(eclipse.deltaT.seconds, 1, common), common.deltaTSources[eclipse.deltaT.source], decimalIn(figures.gamma, common)),
    `${common.predictions} ${w.nakedEye}`,
    w.smallPrint.credits(font, generator),
  ].join(' ');
  return { title, subtitle, smallPrint };
}

/** The caption file: title, what the figure shows in one sentence, then alt text. */
export function diagramCaption(title: string, eclipse: LunarEclipse, clock: CivilClock, lunar?: LunarWords): string {
  const w = lunarDiagramWords(lunar);
  const ref = eclipse.greatest.utDays;
  const at = (utDays: number) => `${timeOnDay(clock, utDays, ref)} ${clock.abbreviation(utDays)}`;
  const c = eclipse.contacts;
  const inner = c.U2 && c.U3 ? w.caption.wholly(at(c.U2.utDays), at(c.U3.utDays)) : c.U1 && c.U4 ? w.caption.partly(at(c.U1.utDays), at(c.U4.utDays)) : w.caption.never;
  const summary = w.caption.summary(at(c.P1!.utDays), at(ref), at(c.P4!.utDays), inner);
  return w.caption.file(title, summary, w.caption.altText(eclipse.gamma >= 0 ? 'north' : 'south'));
}
