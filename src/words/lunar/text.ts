/**
 * Every word a reader sees in the lunar outputs other than the figures (those
 * are in figures.ts beside this file): the list table, the local timetable
 * and its notes, the calendar entries, the newsletter summary, the caption
 * and alt text, the batch's contact sheet. The catalogue (`LunarWords`) holds
 * the phrases and the small functions that fill them in; the functions below
 * it decide which phrases a given eclipse and place call for. Another
 * language is another catalogue of the same type.
 *
 * The lunar cautions are marked `TextFor<'lunar'>`: nothing here is imported
 * by the solar words, nor anything of theirs here (test/words/bodies.test.ts).
 */
import type { ShadowConventionName } from '../../eclipses/lunar/conventions.ts';
import type { EclipseKind } from '../../eclipses/lunar/types.ts';
import type { CivilClock } from '../../ephemeris/civilTime.ts';
import type { Moment } from '../../ephemeris/time.ts';
import { localView, phaseAt, type EclipsePhase, type LocalCircumstances, type LocalEvent, type LocalEventName, type LocalView, type SkyClass } from '../../local/lunar.ts';
import { ENGLISH, meantOnlyFor, type CommonWords, type TextFor } from '../common.ts';
import { LUNAR_DIAGRAM_ENGLISH, type LunarDiagramWords } from './diagram.ts';
import { LUNAR_FIGURES_ENGLISH, type LunarFigureWords } from './figures.ts';

/** The three stretches of a lunar eclipse a calendar can hold. */
export type LunarPhaseKey = 'penumbral' | 'partial' | 'total';
/** What a place sees of the eclipse: the zones of the map and the caption. */
export type SeenZone = 'sees-all' | 'sets-during' | 'rises-during';
/** How much of a continent lies in a zone, as the caption says it. */
export type ContinentShareWord = 'whole' | 'most' | 'parts';

export interface LunarWords {
  readonly body: 'lunar';
  readonly common: CommonWords;
  /** The map's and the sky figure's words (figures.ts), in the same language. */
  readonly figures: LunarFigureWords;
  /** The shadow diagram's words (diagram.ts), in the same language. */
  readonly diagram: LunarDiagramWords;
  /** "Total", as a title starts. */
  readonly kindTitle: Readonly<Record<EclipseKind, string>>;
  /** "total", inside a sentence or a table. */
  readonly kind: Readonly<Record<EclipseKind, string>>;
  /** The shadow-enlargement convention, by its author's name. */
  readonly convention: Readonly<Record<ShadowConventionName, string>>;
  /** The naked-eye line, as a calendar entry ends (the figures carry their own sentence of it). */
  readonly nakedEyeInCalendar: TextFor<'lunar'>;
  readonly table: {
    /** The kind in the list's column, short: "total". */
    readonly kind: Readonly<Record<EclipseKind, string>>;
    readonly catalogueHeader: readonly string[];
    /** A cell for a phase the eclipse does not have. */
    readonly absent: string;
    readonly julianBeside: (isoDate: string, julianDate: string) => string;
    readonly eclipses: (count: number) => string;
    readonly catalogueTitle: (counted: string, fromIsoDate: string, toIsoDateExclusive: string) => string;
    readonly catalogueTimes: (convention: string, julianNote: string) => string;
    readonly catalogueJulian: string;
    readonly deltaTSpan: (seconds: readonly [number, number]) => string;
    readonly deltaTNote: (span: string, sources: string, model: string) => string;
    readonly deltaTModelOnly: (model: string) => string;
  };
  readonly local: {
    /** "What happens" at each event of the timetable. */
    readonly events: Readonly<Record<LocalEventName, string>>;
    /** The timetable's first column: the trade's contact names (P1…U4) stay as they are. */
    readonly eventLabel: Readonly<Partial<Record<LocalEventName, string>>>;
    readonly header: (zone: string) => readonly string[];
    readonly yes: string;
    readonly no: string;
    readonly sky: Readonly<Record<SkyClass, string>>;
    readonly title: (kindTitle: string, id: string, julianDate: string | undefined, place: string, coordinates: string, zone: string) => string;
    readonly timeNote: (zoneDescription: string, julianNote: string) => string;
    readonly julianNote: string;
    readonly shadowNote: (convention: string, deltaTSeconds: number, deltaTSource: string, predictions: string) => string;
  };
  readonly calendar: {
    readonly phaseTitle: Readonly<Record<LunarPhaseKey, string>>;
    /** Said of a phase cut to the time the Moon is up. */
    readonly cutToMoonUp: string;
    readonly cutToMoonUpShort: string;
    readonly description: (phaseTitle: string, id: string, cut: string, summary: string, nakedEye: string) => string;
    readonly notSeenTitle: (place: string) => string;
    readonly notSeenDescription: (summary: string) => string;
  };
  readonly summary: {
    readonly compass: readonly string[];
    /** Where the Moon stands: "low in the east" (`direction`: a compass word). */
    readonly position: (altitudeDeg: number, direction: string) => string;
    readonly aboveHorizon: (degrees: number) => string;
    readonly phaseState: Readonly<Record<EclipsePhase, string>>;
    readonly contacts: Readonly<Partial<Record<LocalEventName, string>>>;
    readonly penumbralContacts: Readonly<Partial<Record<LocalEventName, string>>>;
    readonly from: (place: string) => string;
    readonly notSeen: string;
    readonly daylight: string;
    readonly rises: string;
    readonly risesAgain: string;
    readonly sets: string;
    readonly moves: (verb: string, time: string, direction: string | undefined, state: string) => string;
    readonly mainSpan: (penumbral: boolean, span: string, totality: string | undefined, where: string) => string;
    readonly greatestAt: (time: string, where: string) => string;
    readonly contactAt: (contact: string, time: string) => string;
    readonly inView: {
      readonly wholePenumbral: string;
      readonly whole: string;
      readonly partPenumbral: string;
      readonly allPartialAndTotality: string;
      readonly allPartial: string;
      readonly onlyPenumbral: string;
      readonly partPartial: string;
      readonly allTotalityPartPartial: string;
      readonly partTotality: string;
      readonly partPartialNoTotality: string;
    };
  };
  readonly caption: {
    readonly title: (kindTitle: string, date: string) => string;
    readonly penumbralFacts: (stamp: string, magnitude: string, duration: string, span: string) => string;
    readonly umbralFacts: (stamp: string, magnitude: string, totality: { duration: string; span: string } | undefined, duration: string, span: string) => string;
    readonly zone: Readonly<Record<SeenZone, string>>;
    readonly zoneInAltText: Readonly<Record<SeenZone, string>>;
    readonly continent: (name: string, share: ContinentShareWord) => string;
    readonly somewhere: string;
    readonly including: (names: string) => string;
    readonly hidden: (where: string) => string;
    readonly altText: (kind: string, date: string, parts: string, hidden: string | undefined) => string;
    readonly file: (caption: string, altText: string) => string;
  };
  readonly sheet: {
    readonly title: (fromIsoDate: string, lastIsoDate: string) => string;
    readonly roles: Readonly<Record<string, string>>;
    readonly fileNote: (role: string, kibibytes: string) => string;
    readonly greatestUtc: (hhmm: string) => string;
    readonly greatestLocal: (stamp: string) => string;
    readonly penumbralMagnitude: (value: string) => string;
    readonly umbralMagnitude: (value: string) => string;
    readonly totality: (duration: string) => string;
    readonly inUmbra: (duration: string) => string;
    readonly penumbralPhase: (duration: string) => string;
    readonly saros: (number: number) => string;
    readonly thumbnailAlt: (kind: string, date: string) => string;
    readonly eclipses: (count: number) => string;
    readonly header: (counted: string, zone: string, styleHash: string, tool: string) => string;
    readonly credits: string;
  };
}

const englishPlural = new Intl.PluralRules('en');
/** "1 lunar eclipse", "23 lunar eclipses" (CLDR plural categories through Intl.PluralRules). */
const countedEnglish = (count: number, one: string, other: string) => `${count} ${englishPlural.select(count) === 'one' ? one : other}`;

export const LUNAR_ENGLISH: LunarWords = {
  body: 'lunar',
  common: ENGLISH,
  figures: LUNAR_FIGURES_ENGLISH,
  diagram: LUNAR_DIAGRAM_ENGLISH,
  kindTitle: { total: 'Total', partial: 'Partial', penumbral: 'Penumbral' },
  kind: { total: 'total', partial: 'partial', penumbral: 'penumbral' },
  convention: { danjon: 'Danjon', chauvenet: 'Chauvenet' },
  nakedEyeInCalendar: meantOnlyFor('lunar', 'Safe to watch with the naked eye; predictions, weather permitting.'),
  table: {
    kind: { total: 'total', partial: 'partial', penumbral: 'penumbral' },
    catalogueHeader: ['Date', 'Kind', 'Greatest (UTC)', 'Umbral mag.', 'Penumbral mag.', 'Gamma', 'In umbra', 'Totality', 'Saros'],
    absent: '–',
    julianBeside: (isoDate, julianDate) => `${isoDate} (Julian: ${julianDate})`,
    eclipses: (count) => countedEnglish(count, 'lunar eclipse', 'lunar eclipses'),
    catalogueTitle: (counted, from, to) => `${counted} from ${from} up to (not including) ${to}`,
    catalogueTimes: (convention, julianNote) => `Times UTC, rounded to the minute. Shadow: ${convention} convention.${julianNote}`,
    catalogueJulian: ' Dates: proleptic Gregorian calendar; before 1582 October 15 the Julian date follows.',
    deltaTSpan: ([least, most]) => (least === most ? `${least.toFixed(1)} s` : `${least.toFixed(1)}–${most.toFixed(1)} s`),
    deltaTNote: (span, sources, model) => `ΔT ${span} (${sources}; model: ${model}).`,
    deltaTModelOnly: (model) => `ΔT model: ${model}.`,
  },
  local: {
    events: {
      P1: 'Moon enters the penumbra',
      U1: 'partial eclipse begins',
      U2: 'totality begins',
      greatest: 'greatest eclipse',
      U3: 'totality ends',
      U4: 'partial eclipse ends',
      P4: 'Moon leaves the penumbra',
      moonrise: 'moonrise',
      moonset: 'moonset',
    },
    eventLabel: { greatest: 'Greatest', moonrise: 'Moonrise', moonset: 'Moonset' },
    header: (zone) => ['Event', 'What happens', `Local (${zone})`, 'UTC', 'Moon alt.', 'Moon az.', 'Moon up', 'Sun alt.', 'Sky'],
    yes: 'yes',
    no: 'no',
    sky: { day: 'day', civil: 'civil', nautical: 'nautical', astronomical: 'astronomical', night: 'night' },
    title: (kindTitle, id, julianDate, place, coordinates, zone) =>
      `${kindTitle} lunar eclipse ${id}${julianDate ? ` (Julian: ${julianDate})` : ''} from ${place} (${coordinates}; ${zone})`,
    timeNote: (zone, julianNote) =>
      `Local time: ${zone}. Times rounded to the minute. Moon altitude: its centre, with refraction from a true −1° up, geometric below; "up": upper limb above a sea-level horizon.${julianNote}`,
    julianNote: ' Dates: proleptic Gregorian calendar (the Julian date is given beside the eclipse\'s date).',
    shadowNote: (convention, deltaT, source, predictions) => `Shadow: ${convention} convention; ΔT ${deltaT.toFixed(1)} s (${source}). ${predictions}`,
  },
  calendar: {
    phaseTitle: { penumbral: 'Penumbral lunar eclipse', partial: 'Partial phases of the lunar eclipse', total: 'Totality' },
    cutToMoonUp: ' (the part with the Moon above the horizon)',
    cutToMoonUpShort: ' (Moon up)',
    description: (title, id, cut, summary, nakedEye) => `${title} of ${id}${cut}. ${summary} ${nakedEye}`,
    notSeenTitle: (place) => `Lunar eclipse, not visible from ${place}`,
    notSeenDescription: (summary) => `${summary} This entry only marks the date; there is nothing to see from here.`,
  },
  summary: {
    compass: ['north', 'northeast', 'east', 'southeast', 'south', 'southwest', 'west', 'northwest'],
    position: (altitudeDeg, direction) => `${altitudeDeg < 15 ? 'low in the' : altitudeDeg < 45 ? 'in the' : 'high in the'} ${direction}`,
    aboveHorizon: (degrees) => `${degrees}° above the horizon`,
    phaseState: {
      before: 'before the eclipse begins',
      penumbral: 'in the faint penumbral phase',
      partial: 'partly eclipsed',
      total: 'totally eclipsed',
      after: 'after the eclipse is over',
    },
    contacts: { U1: 'the partial phase begins', U2: 'totality begins', U3: 'totality ends', U4: 'the partial phase ends' },
    penumbralContacts: { P1: 'the penumbral phase begins', P4: 'the penumbral phase ends' },
    from: (place) => `From ${place}`,
    notSeen: 'the eclipse cannot be seen: the Moon is below the horizon from start to finish.',
    daylight: ' Part of it falls in daylight, when the Moon is hard to see.',
    rises: 'rises',
    risesAgain: 'rises again',
    sets: 'sets',
    moves: (verb, time, direction, state) => `the Moon ${verb} at ${time}${direction === undefined ? '' : ` in the ${direction}`}, ${state}`,
    mainSpan: (penumbral, span, totality, where) =>
      `${penumbral ? 'penumbral phase' : 'partial phases'} ${span}${totality === undefined ? '' : `, totality ${totality}`}, the Moon ${where} at greatest`,
    greatestAt: (time, where) => `greatest eclipse at ${time}, the Moon ${where}`,
    contactAt: (contact, time) => `${contact} at ${time}`,
    inView: {
      wholePenumbral: 'the whole penumbral eclipse is in view',
      whole: 'the whole eclipse is in view',
      partPenumbral: 'part of the penumbral eclipse is in view',
      allPartialAndTotality: 'all of the partial phases and totality are in view',
      allPartial: 'all of the partial phase is in view',
      onlyPenumbral: 'only the faint penumbral phase is seen',
      partPartial: 'part of the partial phase is in view',
      allTotalityPartPartial: 'all of totality is in view, and part of the partial phases',
      partTotality: 'part of totality is in view',
      partPartialNoTotality: 'part of the partial phase is in view, but not totality',
    },
  },
  caption: {
    title: (kindTitle, date) => `${kindTitle} lunar eclipse of ${date}.`,
    penumbralFacts: (stamp, magnitude, duration, span) =>
      `Greatest eclipse at ${stamp}, penumbral magnitude ${magnitude}; the Moon is in the penumbra for ${duration} (${span}), a subtle dimming.`,
    umbralFacts: (stamp, magnitude, totality, duration, span) =>
      `Greatest eclipse at ${stamp}, umbral magnitude ${magnitude}${totality ? `; totality lasts ${totality.duration} (${totality.span})` : ''}; the Moon is in the umbra for ${duration} (${span}).`,
    zone: {
      'sees-all': 'All of it can be seen from',
      'sets-during': 'The Moon sets while it is on in',
      'rises-during': 'The Moon rises while it is on in',
    },
    zoneInAltText: {
      'sees-all': 'all of it from',
      'sets-during': 'the Moon sets during it in',
      'rises-during': 'the Moon rises during it in',
    },
    continent: (name, share) => (share === 'whole' ? name : share === 'most' ? `most of ${name}` : `parts of ${name}`),
    somewhere: 'parts of the world',
    including: (names) => `, including ${names}`,
    hidden: (where) => `It cannot be seen from ${where}.`,
    altText: (kind, date, parts, hidden) => `World map of where the ${kind} lunar eclipse of ${date} can be seen: ${parts}${hidden === undefined ? '' : `; not from ${hidden}`}.`,
    file: (caption, altText) => `${caption}\n\nAlt text: ${altText}\n`,
  },
  sheet: {
    title: (from, last) => `Lunar eclipses ${from} to ${last}`,
    roles: { map: 'map', caption: 'caption', thumbnail: 'thumbnail', local: 'local table', sky: 'view from here', diagram: 'diagram' },
    fileNote: (role, kib) => `${role}, ${kib} KiB`,
    greatestUtc: (hhmm) => `Greatest ${hhmm} UTC`,
    greatestLocal: (stamp) => `Greatest ${stamp}`,
    penumbralMagnitude: (value) => `penumbral magnitude ${value}`,
    umbralMagnitude: (value) => `umbral magnitude ${value}`,
    totality: (duration) => `totality ${duration}`,
    inUmbra: (duration) => `in the umbra ${duration}`,
    penumbralPhase: (duration) => `penumbral phase ${duration}`,
    saros: (n) => `saros ${n}`,
    thumbnailAlt: (kind, date) => `Visibility map of the ${kind} lunar eclipse of ${date}`,
    eclipses: (count) => countedEnglish(count, 'eclipse', 'eclipses'),
    header: (counted, zone, styleHash, tool) => `${counted} · dates and times in ${zone} · style ${styleHash} · ${tool}`,
    credits: 'Basemap: Natural Earth via world-atlas (public domain). Places: GeoNames (CC BY 4.0). See manifest.json and catalogue.csv.',
  },
};

// ---- the newsletter summary of one place -----------------------------------------------------

/** Within this latitude of a pole (about 100 m) compass words lose their meaning. */
const POLE_LATITUDE_DEG = 89.999;

/** The eight-point compass word for an azimuth (from north through east). */
export function compassWord(azimuthDeg: number, words: LunarWords = LUNAR_ENGLISH): string {
  return words.summary.compass[Math.round(azimuthDeg / 45) % 8]!;
}

/** What is in view, in a few words, from the coverage of each phase. */
function inViewWords(kind: EclipseKind, view: LocalView, words: LunarWords): string {
  const w = words.summary.inView;
  if (view.whole === 'all') return kind === 'penumbral' ? w.wholePenumbral : w.whole;
  if (kind === 'penumbral') return w.partPenumbral;
  if (view.main === 'all') return kind === 'total' ? w.allPartialAndTotality : w.allPartial;
  if (view.main === 'none') return w.onlyPenumbral;
  if (kind === 'partial') return w.partPartial;
  if (view.totality === 'all') return w.allTotalityPartPartial;
  if (view.totality === 'part') return w.partTotality;
  return w.partPartialNoTotality;
}

/**
 * One or two sentences for a newsletter: what readers at this place will
 * see, in their time. What is said to be in view comes from the intervals
 * the Moon is actually up (localView), and every rise and set between P1
 * and P4 is told, in time order.
 */
export function localSummary(local: LocalCircumstances, clock: CivilClock, placeName: string, words: LunarWords = LUNAR_ENGLISH): string {
  const { eclipse, events } = local;
  const s = words.summary;
  const c = eclipse.contacts;
  // Every time carries the zone in force at its own instant, so a clock change inside the eclipse reads true.
  // A time on another day, in this zone, than the first time the summary gives says so ("01:13 +1 day NZDT").
  let reference: number | undefined;
  const t = (m: Moment) => clock.stamp(m.utDays, (reference ??= m.utDays));
  const range = (a: Moment, b: Moment) => clock.range(a.utDays, b.utDays, (reference ??= a.utDays));
  // At a pole every direction is south (or north): give the height only.
  const atPole = Math.abs(local.observer.latDeg) >= POLE_LATITUDE_DEG;
  const where = (e: LocalEvent) =>
    atPole ? s.aboveHorizon(Math.max(0, Math.round(e.moonAltitudeDeg))) : s.position(e.moonAltitudeDeg, compassWord(e.moonAzimuthDeg, words));
  const view = localView(local);
  const penumbral = eclipse.kind === 'penumbral';
  const daylight = events.some((e) => e.moonUp && e.sky === 'day' && e.event !== 'moonrise' && e.event !== 'moonset') ? s.daylight : '';
  const from = s.from(placeName);
  const { colon, semicolon } = words.common.punctuation;
  if (view.whole === 'none') return `${from} ${s.notSeen}`;

  const greatest = events.find((e) => e.event === 'greatest')!;
  const crossings = events.filter((e) => e.event === 'moonrise' || e.event === 'moonset');
  // At a rise or set the Moon is on the horizon: say only where.
  const setBefore = (e: LocalEvent) => crossings.some((x) => x.event === 'moonset' && x.moment.utDays < e.moment.utDays);
  const moves = (e: LocalEvent, time: string) =>
    s.moves(
      e.event === 'moonrise' ? (setBefore(e) ? s.risesAgain : s.rises) : s.sets,
      time,
      atPole ? undefined : compassWord(e.moonAzimuthDeg, words),
      s.phaseState[phaseAt(eclipse, e.moment.utDays)],
    );
  // The whole main phase in view: its span in one stretch, as almanacs give it, with any rise before it and set after it, in order.
  if (view.main === 'all') {
    const [startName, endName] = penumbral ? (['P1', 'P4'] as const) : (['U1', 'U4'] as const);
    const totality = eclipse.kind === 'total' ? range(c.U2!, c.U3!) : undefined;
    const before = crossings.filter((e) => e.moment.utDays < c[startName]!.utDays);
    const after = crossings.filter((e) => e.moment.utDays > c[endName]!.utDays);
    const clauses = before.map((e) => moves(e, t(e.moment)));
    const span = range(c[startName]!, c[endName]!);
    clauses.push(s.mainSpan(penumbral, span, totality, where(greatest)));
    clauses.push(...after.map((e) => moves(e, t(e.moment))));
    return `${from} ${inViewWords(eclipse.kind, view, words)}${colon}${clauses.join(semicolon)}.${daylight}`;
  }
  // Otherwise tell it in order: the contacts seen, greatest if seen, and every rise and set.
  const contactWords = penumbral ? s.penumbralContacts : s.contacts;
  const clauses: string[] = [];
  for (const e of events) {
    if (e.event === 'moonrise' || e.event === 'moonset') {
      clauses.push(moves(e, t(e.moment)));
    } else if (e.moonUp && e.event === 'greatest') {
      clauses.push(s.greatestAt(t(e.moment), where(e)));
    } else if (e.moonUp && contactWords[e.event]) {
      clauses.push(s.contactAt(contactWords[e.event]!, t(e.moment)));
    }
  }
  return `${from} ${inViewWords(eclipse.kind, view, words)}${colon}${clauses.join(semicolon)}.${daylight}`;
}
