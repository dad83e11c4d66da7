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
import { decimalIn, ENGLISH, formatDuration, meantOnlyFor, type CommonWords, type TextFor } from '../common.ts';
import { timeRange } from '../../ephemeris/dayMark.ts';
import type { SkyClass } from '../../local/lunar.ts';

/** The stages of an eclipse a Moon-up line can be labelled with. */
type StageName = ContactName | 'greatest';

/** The figures' words, one catalogue per language. */
export interface LunarFigureWords {
  readonly common: CommonWords;
  /** Every lunar figure's last word on safety: meant for lunar eclipses only. */
  readonly nakedEye: TextFor<'lunar'>;
  /** "Total lunar eclipse", as a map's title starts. */
  readonly kindTitle: Readonly<Record<LunarEclipse['kind'], string>>;
  readonly map: {
    readonly title: (kindTitle: string, date: string) => string;
    readonly greatest: (stamp: string) => string;
    readonly penumbralMagnitude: (value: string) => string;
    readonly penumbralPhase: (duration: string, span: string) => string;
    readonly umbralMagnitude: (value: string) => string;
    readonly totality: (duration: string, span: string) => string;
    readonly inUmbra: (duration: string, span: string) => string;
    readonly timesIn: (zone: string) => string;
    readonly shadow: (convention: string, deltaT: string) => string;
    readonly moonUp: string;
    readonly credits: (basemap: string, font: string, generator: string) => string;
  };
  readonly legend: {
    /** What the zones are of: the whole eclipse (penumbral) or its umbral phase. */
    readonly zonesOf: { readonly penumbral: string; readonly umbral: string };
    readonly codesP: string;
    readonly codesU: string;
    readonly codesTotality: string;
    readonly zoneAll: (phase: string) => string;
    readonly zoneSets: (phase: string) => string;
    readonly zoneRises: (phase: string) => string;
    readonly zoneNone: string;
    readonly boundaryStrong: (phase: string) => string;
    readonly boundaryLight: string;
    readonly countedPhase: Readonly<Record<'totality' | 'umbral' | 'penumbral', string>>;
    readonly field: (countedPhase: string) => string;
    readonly centre: string;
    readonly townOwnClock: string;
    readonly town: string;
    readonly codes: (codes: string) => string;
  };
  /** A marked town's label: "Adelaide · greatest 17:29", "· rises 19:14", "· not seen". */
  readonly mark: { readonly greatest: string; readonly rises: string; readonly sets: string; readonly notSeen: string };
  /** What happens at a stage: "as totality begins"; P1/P4 differ for a penumbral eclipse. */
  readonly stage: Readonly<Record<StageName, string>> & { readonly P1Penumbral: string; readonly P4Penumbral: string };
  readonly boundaryLabel: (rising: boolean, stage: string, time: string) => string;
  readonly sky: {
    readonly classes: Readonly<Record<SkyClass, string>>;
    readonly phases: { readonly penumbral: string; readonly partial: string; readonly total: string };
    readonly horizon: string;
    /** "total", inside the title's sentence. */
    readonly kinds: Readonly<Record<LunarEclipse['kind'], string>>;
    readonly eventName: { readonly greatest: string; readonly moonrise: string; readonly moonset: string };
    readonly title: (kind: string, place: string, date: string) => string;
    readonly localTime: (zone: string) => string;
    readonly shadow: (convention: string, deltaTSeconds: number, source: string) => string;
    readonly credits: (places: string, font: string, generator: string) => string;
    readonly altText: (place: string) => string;
    readonly file: (title: string, summary: string, altText: string) => string;
  };
}

export const LUNAR_FIGURES_ENGLISH: LunarFigureWords = {
  common: ENGLISH,
  nakedEye: meantOnlyFor('lunar', 'A lunar eclipse is safe to watch with the naked eye.'),
  kindTitle: { total: 'Total lunar eclipse', partial: 'Partial lunar eclipse', penumbral: 'Penumbral lunar eclipse' },
  map: {
    title: (kindTitle, date) => `${kindTitle} · ${date}`,
    greatest: (stamp) => `Greatest ${stamp}`,
    penumbralMagnitude: (value) => `penumbral magnitude ${value}`,
    penumbralPhase: (duration, span) => `penumbral phase ${duration} (${span})`,
    umbralMagnitude: (value) => `umbral magnitude ${value}`,
    totality: (duration, span) => `totality ${duration} (${span})`,
    inUmbra: (duration, span) => `in the umbra ${duration} (${span})`,
    timesIn: (zone) => `Times in ${zone}, 24-hour clock, rounded to the minute; "+1 day": the day after the date in the title.`,
    shadow: (convention, deltaT) => `Shadow: ${convention} convention; ΔT ${deltaT}.`,
    moonUp: 'Moon up: upper limb on a sea-level horizon with standard refraction.',
    credits: (basemap, font, generator) => `${basemap}. Type: ${font}. Made with ${generator}.`,
  },
  legend: {
    zonesOf: { penumbral: 'the eclipse', umbral: 'the umbral phase' },
    codesP: 'P1/P4 the Moon meets/leaves the outer shadow (penumbra)',
    codesU: 'U1/U4 the umbra',
    codesTotality: 'U2/U3 totality begins/ends',
    zoneAll: (phase) => `Moon up for all of ${phase}`,
    zoneSets: (phase) => `Moon sets during ${phase}`,
    zoneRises: (phase) => `Moon rises during ${phase}`,
    zoneNone: 'Moon below the horizon throughout',
    boundaryStrong: (phase) => `Moonrise/moonset as ${phase} begins and ends`,
    boundaryLight: 'at other stages',
    countedPhase: { totality: 'totality', umbral: 'the umbral phase', penumbral: 'the penumbral phase' },
    field: (phase) => `minutes of ${phase} with the Moon up`,
    centre: 'Moon overhead at greatest',
    townOwnClock: 'marked town: the key phase in its own time',
    town: 'marked town: the key phase',
    codes: (codes) => `small tags on the lines: ${codes}`,
  },
  mark: { greatest: 'greatest', rises: 'rises', sets: 'sets', notSeen: 'not seen' },
  stage: {
    P1: 'as the faint outer shadow begins',
    P1Penumbral: 'as the eclipse begins',
    U1: 'as the partial eclipse begins',
    U2: 'as totality begins',
    greatest: 'at mid-eclipse',
    U3: 'as totality ends',
    U4: 'as the partial eclipse ends',
    P4: 'as the faint outer shadow ends',
    P4Penumbral: 'as the eclipse ends',
  },
  boundaryLabel: (rising, stage, time) => `Moon ${rising ? 'rises' : 'sets'} ${stage} · ${time}`,
  sky: {
    classes: { day: 'daylight', civil: 'civil twilight', nautical: 'nautical twilight', astronomical: 'astronomical twilight', night: 'night' },
    phases: { penumbral: 'penumbral phase', partial: 'partial phase', total: 'totality' },
    horizon: 'horizon',
    kinds: { total: 'total', partial: 'partial', penumbral: 'penumbral' },
    eventName: { greatest: 'Greatest', moonrise: 'Moonrise', moonset: 'Moonset' },
    title: (kind, place, date) => `The ${kind} lunar eclipse from ${place} · ${date}`,
    localTime: (zone) =>
      `Local time: ${zone}, 24-hour clock. Altitude of the Moon's centre with standard refraction, above a sea-level horizon; letters under the path: where to look (compass point, e.g. ESE = east-southeast).`,
    shadow: (convention, deltaT, source) => `Shadow: ${convention} convention; ΔT ${deltaT.toFixed(1)} s (${source}).`,
    credits: (places, font, generator) => `${places} Type: ${font}. Made with ${generator}.`,
    altText: (place) =>
      `Chart of the Moon's height above the horizon through the night at ${place}, local time along the bottom, with the eclipse's phases marked on its path and the twilight behind.`,
    file: (title, summary, alt) => `${title}. ${summary}\n\nAlt text: ${alt}\n`,
  },
};

/** Every lunar figure's last word: what predictions can promise, and that the eclipse is safe to watch. */
const predictions = (words: LunarFigureWords) => `${words.common.predictions} ${words.nakedEye}`;

const conventionWord = (eclipse: LunarEclipse) => (eclipse.convention === 'danjon' ? 'Danjon' : 'Chauvenet');

/** The map's title, subtitle (greatest, magnitude, durations) and small print. `credits`: the basemap's and the type's. */
export function mapTexts(eclipse: LunarEclipse, clock: CivilClock, deltaTLabel: string, generator: string, credits: { basemap: string; font: string }, customTitle?: string, words: LunarFigureWords = LUNAR_FIGURES_ENGLISH) {
  const at = eclipse.greatest.utDays;
  const m = words.map;
  const title = customTitle ?? m.title(words.kindTitle[eclipse.kind], clock.date(at));
  const c = eclipse.contacts;
  // Greatest names the zone; ranges repeat it only when the clocks change during the eclipse, and then
  // each time carries the zone in force at its own instant.
  const clocksChange = clock.offsetChanges(c.P1!.utDays, c.P4!.utDays).length > 0;
  // A time on another day than the title's date says so ("01:13 +1 day").
  const range = (a: number, b: number) => (clocksChange ? clock.range(a, b, at) : timeRange(clock, a, b, at));
  const duration = (minutes: number) => formatDuration(minutes * 60, 'long', words.common);
  const parts = [m.greatest(clock.stamp(at))];
  // Figures rounded once, from the full value, as in the list and the caption.
  const figures = printedFigures(eclipse);
  const minus = (text: string) => text.replace('-', '−');
  const decimal = (text: string) => decimalIn(text, words.common);
  if (eclipse.kind === 'penumbral') {
    parts.push(m.penumbralMagnitude(minus(decimal(figures.penumbralMagnitude))));
    parts.push(m.penumbralPhase(duration(figures.minutes.penumbral), range(c.P1!.utDays, c.P4!.utDays)));
  } else {
    parts.push(m.umbralMagnitude(minus(decimal(figures.umbralMagnitude))));
    if (eclipse.kind === 'total') parts.push(m.totality(duration(figures.minutes.total!), range(c.U2!.utDays, c.U3!.utDays)));
    parts.push(m.inUmbra(duration(figures.minutes.partial!), range(c.U1!.utDays, c.U4!.utDays)));
  }
  const subtitle = parts.join(' · ');
  const smallPrint = [
    m.timesIn(clock.zoneDescriptionBetween(c.P1!.utDays, c.P4!.utDays)),
    m.shadow(conventionWord(eclipse), decimal(deltaTLabel)),
    m.moonUp,
    predictions(words),
    m.credits(credits.basemap, credits.font, generator),
  ].join(' ');
  return { title, subtitle, smallPrint };
}

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

export function mapLegendWords(eclipse: LunarEclipse, countedPhase: 'totality' | 'umbral' | 'penumbral', contactCodes: readonly string[], townOnOwnClock: boolean, words: LunarFigureWords = LUNAR_FIGURES_ENGLISH): MapLegendWords {
  const l = words.legend;
  // The zones are those of the umbral phase (of the whole eclipse when it is penumbral): the legend says which.
  const phaseName = eclipse.kind === 'penumbral' ? l.zonesOf.penumbral : l.zonesOf.umbral;
  const codes = [
    contactCodes.includes('P1') ? l.codesP : '',
    contactCodes.includes('U1') ? l.codesU : '',
    contactCodes.includes('U2') ? l.codesTotality : '',
  ].filter(Boolean).join(', ');
  return {
    zoneAll: l.zoneAll(phaseName),
    zoneSets: l.zoneSets(phaseName),
    zoneRises: l.zoneRises(phaseName),
    zoneNone: l.zoneNone,
    boundaryStrong: l.boundaryStrong(phaseName),
    boundaryLight: l.boundaryLight,
    field: l.field(l.countedPhase[countedPhase]),
    centre: l.centre,
    town: townOnOwnClock ? l.townOwnClock : l.town,
    codes: l.codes(codes),
  };
}

/** A label on a Moon-up line: "Moon rises as totality begins · 11:05". */
export function boundaryLabel(rising: boolean, stageName: StageName, kind: LunarEclipse['kind'], time: string, words: LunarFigureWords = LUNAR_FIGURES_ENGLISH): string {
  const s = words.stage;
  const stage = kind === 'penumbral' && stageName === 'P1' ? s.P1Penumbral : kind === 'penumbral' && stageName === 'P4' ? s.P4Penumbral : s[stageName];
  return words.boundaryLabel(rising, stage, time);
}

/** A field line's label, in minutes however many: "40 min", "150 min". */
export const fieldLineLabel = (minutes: number, words: LunarFigureWords = LUNAR_FIGURES_ENGLISH) => `${minutes}${words.common.durationUnits.long.minute}`;

/** A sky figure's event label: "Greatest 23:12", "U2 22:41". */
export function skyEventLabel(event: StageName | 'moonrise' | 'moonset', time: string, words: LunarFigureWords = LUNAR_FIGURES_ENGLISH): string {
  const names = words.sky.eventName;
  const name = event === 'greatest' || event === 'moonrise' || event === 'moonset' ? names[event] : event;
  return `${name} ${time}`;
}

export function skyTitle(eclipse: LunarEclipse, placeName: string, clock: CivilClock, words: LunarFigureWords = LUNAR_FIGURES_ENGLISH): string {
  return words.sky.title(words.sky.kinds[eclipse.kind], placeName, clock.date(eclipse.greatest.utDays));
}

/** The sky figure's small print. `credits`: the gazetteer's (or ''), and the type's. */
export function skySmallPrint(eclipse: LunarEclipse, zoneName: string, generator: string, credits: { places: string; font: string }, words: LunarFigureWords = LUNAR_FIGURES_ENGLISH): string {
  const s = words.sky;
  return [
    s.localTime(zoneName),
    decimalIn(s.shadow(conventionWord(eclipse), eclipse.deltaT.seconds, words.common.deltaTSources[eclipse.deltaT.source]), words.common),
    predictions(words),
    s.credits(credits.places, credits.font, generator),
  ].join(' ');
}

/** The caption file published beside a sky figure: its title and summary, then alt text. */
export function skyCaption(title: string, summary: string, placeName: string, words: LunarFigureWords = LUNAR_FIGURES_ENGLISH): string {
  return words.sky.file(title, summary, words.sky.altText(placeName));
}
