/**
 * Every word a reader sees on a solar map: title, subtitle, the caution's
 * place in the header, legend entries, line labels, marks, small print, and
 * the caption and alt text written beside the picture. Kept here so they can
 * be reviewed and translated, and so that no lunar wording (above all the
 * naked-eye line) can reach a solar figure: this module imports nothing lunar.
 *
 * Shaped for translation: one `SolarFigureWords` catalogue per language
 * (English below, SOLAR_FIGURES_ENGLISH); the functions after it decide which
 * phrases an eclipse calls for and fill them with numbers written through
 * Intl in the catalogue's language (words/common.ts).
 */
import type { CivilClock } from '../../ephemeris/civilTime.ts';
import type { SolarEclipse, SolarEclipseKind } from '../../eclipses/solar/types.ts';
import type { SolarLocalKind } from '../../local/solar.ts';
import { coordinatesText, ENGLISH, fixedIn, meantOnlyFor, wholeIn, type CommonWords, type TextFor } from '../common.ts';
import type { SolarWords } from './caution.ts';
import { safetyScopeForEclipse, solarSafetyText } from './safety.ts';

/** The kinds of path a central eclipse draws. */
export type SolarCentralKind = Exclude<SolarEclipseKind, 'partial'>;

/** The solar map's words, one catalogue per language. */
export interface SolarFigureWords {
  readonly common: CommonWords;
  /** "Total solar eclipse", as a map's title starts. */
  readonly kindTitle: Readonly<Record<SolarEclipseKind, string>>;
  /** "total solar eclipse", inside a sentence of the caption and alt text. */
  readonly kindInSentence: Readonly<Record<SolarEclipseKind, string>>;
  /** What the central phase is called along a path of this kind: "totality". */
  readonly centralPhase: Readonly<Record<SolarCentralKind, string>>;
  /** A central phase's length: "4 min 28 s" (`seconds` already two digits), and under a minute "52 s". */
  readonly minutesSeconds: { readonly minutes: (minutes: string, seconds: string) => string; readonly seconds: (seconds: string) => string };
  /** A share of the Sun hidden: "63 %" (`percent`), and below one percent (`underOne`). */
  readonly percentText: { readonly percent: (value: string) => string; readonly underOne: string };
  readonly map: {
    readonly title: (kindTitle: string, date: string) => string;
    readonly greatest: (stamp: string, coordinates: string) => string;
    readonly magnitude: (value: string) => string;
    /** "totality 4 min 28 s on the central line". */
    readonly centralOnLine: (phase: string, duration: string) => string;
    readonly pathWidth: (km: string) => string;
    /** The subtitle's parts joined: " · " in English. */
    readonly separator: string;
    readonly timesIn: (zone: string) => string;
    readonly shading: string;
    /** The Moon's radii used: k1 for the partial phases, k2 for the path. */
    readonly moonRadii: (k1: string, k2: string) => string;
    readonly elements: (deltaT: string, source: string, moonRadii: string) => string;
    readonly credits: (basemap: string, font: string, generator: string) => string;
  };
  readonly legend: {
    /** The five shades, from least to most of the Sun hidden. */
    readonly ramp: readonly [string, string, string, string, string];
    readonly path: Readonly<Record<SolarCentralKind, string>>;
    /** The central line and its ticks' clock: `clock` is the zone's description ("UTC", "Central European Time"…). */
    readonly centralLine: (clock: string) => string;
    readonly pathLimits: string;
    readonly partialLimits: string;
    readonly riseSet: string;
    readonly greatest: string;
    readonly contours: string;
    readonly town: string;
  };
  /** The rise/set curves' label: "begins at sunrise". */
  readonly riseSet: (contact: 'C1' | 'C4', sun: 'sunrise' | 'sunset') => string;
  /** A marked place: "Tromsø · total 11:05, 2 min 14 s", "Cairo · 63 % at 10:07", "Lima · 12 % at sunset 18:02", "Perth · not seen". */
  readonly mark: {
    readonly notSeen: (name: string) => string;
    readonly central: (name: string, kind: 'total' | 'annular', time: string, duration: string | undefined) => string;
    readonly partial: (name: string, percent: string, time: string, at: 'sunrise' | 'sunset' | undefined) => string;
  };
  readonly caption: {
    /** " The dark band is the path of totality, with its central line and times." (a leading space). */
    readonly path: (kind: SolarCentralKind) => string;
    readonly facts: (kindInSentence: string, date: string, subtitle: string) => string;
    readonly shading: (path: string) => string;
    readonly altText: (kindInSentence: string, date: string, path: string) => string;
    readonly file: (caption: string, altText: string) => string;
  };
}

export const SOLAR_FIGURES_ENGLISH: SolarFigureWords = {
  common: ENGLISH,
  kindTitle: { total: 'Total solar eclipse', annular: 'Annular solar eclipse', hybrid: 'Hybrid solar eclipse', partial: 'Partial solar eclipse' },
  kindInSentence: { total: 'total solar eclipse', annular: 'annular solar eclipse', hybrid: 'hybrid solar eclipse', partial: 'partial solar eclipse' },
  centralPhase: { total: 'totality', annular: 'annularity', hybrid: 'central phase' },
  minutesSeconds: { minutes: (minutes, seconds) => `${minutes} min ${seconds} s`, seconds: (seconds) => `${seconds} s` },
  percentText: { percent: (value) => `${value} %`, underOne: 'under 1 %' },
  map: {
    title: (kindTitle, date) => `${kindTitle} · ${date}`,
    greatest: (stamp, coordinates) => `Greatest ${stamp} at ${coordinates}`,
    magnitude: (value) => `magnitude ${value}`,
    centralOnLine: (phase, duration) => `${phase} ${duration} on the central line`,
    pathWidth: (km) => `path ${km} km wide`,
    separator: ' · ',
    timesIn: (zone) => `Times in ${zone}, 24-hour clock; "+1 day": the day after the date in the title.`,
    shading: 'Shading: the most of the Sun\'s disc hidden while the Sun is up (upper limb on a sea-level horizon with standard refraction).',
    moonRadii: (k1, k2) => `Moon radius k1 = ${k1} (partial phases), k2 = ${k2} (path)`,
    elements: (deltaT, source, moonRadii) =>
      `Besselian elements from astronomy-engine; ΔT ${deltaT} s (${source}); ${moonRadii}; smooth lunar limb: path edges may move by a kilometre or more.`,
    credits: (basemap, font, generator) => `${basemap}. Type: ${font}. Made with ${generator}.`,
  },
  legend: {
    ramp: ['Sun under 20 % hidden', '20–40 %', '40–60 %', '60–80 %', 'over 80 % (Sun up)'],
    path: { total: 'Path of totality', annular: 'Path of annularity', hybrid: 'Path (total or annular)' },
    centralLine: (clock) => `Central line, times in ${clock}`,
    pathLimits: 'Path limits',
    partialLimits: 'Limits of the partial eclipse',
    riseSet: 'Eclipse under way at sunrise or sunset',
    greatest: 'Greatest eclipse',
    contours: 'Equal share of the Sun hidden',
    town: 'Marked place',
  },
  riseSet: (contact, sun) => `${contact === 'C1' ? 'begins' : 'ends'} at ${sun}`,
  mark: {
    notSeen: (name) => `${name} · not seen`,
    central: (name, kind, time, duration) => `${name} · ${kind} ${time}${duration !== undefined ? `, ${duration}` : ''}`,
    partial: (name, percent, time, at) => `${name} · ${percent} at ${at ? `${at} ` : ''}${time}`,
  },
  caption: {
    path: (kind) => ` The dark band is the path of ${kind === 'hybrid' ? 'the central eclipse (total in places, annular in others)' : kind === 'total' ? 'totality' : 'annularity'}, with its central line and times.`,
    facts: (kind, date, subtitle) => `The ${kind} of ${date}. ${subtitle}.`,
    shading: (path) => `Shading shows how much of the Sun is hidden at best with the Sun up.${path}`,
    altText: (kind, date, path) => `Map of the ${kind} of ${date}: shading, darker where more of the Sun is hidden, marks where the partial eclipse is seen.${path}`,
    file: (caption, altText) => `${caption}\n\nAlt text: ${altText}\n`,
  },
};

/** The figure words of a solar catalogue (English when none is given). */
function figureWords(solar: SolarWords | undefined): SolarFigureWords {
  return solar === undefined ? SOLAR_FIGURES_ENGLISH : solar.figures;
}

/** "4 min 28 s", "52 s": a central phase's length, to the second. */
export function minutesSeconds(seconds: number, words: SolarFigureWords = SOLAR_FIGURES_ENGLISH): string {
  const whole = Math.round(seconds);
  const minutes = Math.floor(whole / 60);
  const rest = whole % 60;
  return minutes === 0 ? words.minutesSeconds.seconds(wholeIn(rest, words.common))
    : words.minutesSeconds.minutes(wholeIn(minutes, words.common), wholeIn(rest, words.common, 2));
}

/** A share of the Sun hidden, as a whole percentage ("63 %"); under 1 % printed as "under 1 %". */
export function percentText(share: number, words: SolarFigureWords = SOLAR_FIGURES_ENGLISH): string {
  const p = Math.round(share * 100);
  return p < 1 ? words.percentText.underOne : words.percentText.percent(wholeIn(p, words.common));
}

/** The caution every solar map carries in its header band (short) and beside it (long). */
export function mapCaution(eclipse: SolarEclipse, form: 'short' | 'long', solar?: SolarWords): TextFor<'solar'> {
  return solarSafetyText(form, safetyScopeForEclipse(eclipse.kind), solar);
}

/** Title, subtitle and small print of a solar map. */
export function solarMapTexts(
  eclipse: SolarEclipse, clock: CivilClock, generator: string, credits: { basemap: string; font: string; moonRadii: readonly [number, number] },
  customTitle?: string, solar?: SolarWords,
) {
  const w = figureWords(solar);
  const common = w.common;
  const at = eclipse.greatest.utDays;
  const title = customTitle ?? w.map.title(w.kindTitle[eclipse.kind], clock.date(at));
  const [lon, lat] = eclipse.greatestPoint;
  const parts = [w.map.greatest(clock.stamp(at), coordinatesText(lat, lon, common)), w.map.magnitude(fixedIn(eclipse.magnitude, 3, common))];
  if (eclipse.kind !== 'partial' && eclipse.central) {
    if (eclipse.durations.centralSeconds !== undefined) parts.push(w.map.centralOnLine(w.centralPhase[eclipse.kind], minutesSeconds(eclipse.durations.centralSeconds, w)));
    if (eclipse.pathWidthKm !== undefined) parts.push(w.map.pathWidth(wholeIn(Math.round(eclipse.pathWidthKm), common)));
  }
  const subtitle = parts.join(w.map.separator);
  const c = eclipse.contacts;
  const moonRadii = w.map.moonRadii(decimalText(credits.moonRadii[0], common), decimalText(credits.moonRadii[1], common));
  const smallPrint = [
    w.map.timesIn(clock.zoneDescriptionBetween(c.P1!.utDays, c.P4!.utDays)),
    w.map.shading,
    w.map.elements(fixedIn(eclipse.deltaT.seconds, 1, common), common.deltaTSources[eclipse.deltaT.source], moonRadii),
    common.predictions,
    w.map.credits(credits.basemap, credits.font, generator),
  ].join(' ');
  return { title, subtitle, smallPrint };
}

/** A constant as JavaScript prints it ("0.2725076"), in the language's decimal sign. */
const decimalText = (value: number, common: CommonWords) => fixedIn(value, Math.max(0, (String(value).split('.')[1] ?? '').length), common);

/** Legend words, in the order drawn; `clockLabel` names the central line's clock ("UTC"). */
export function solarLegendWords(eclipse: SolarEclipse, clockLabel: string, solar?: SolarWords) {
  const w = figureWords(solar).legend;
  const central = eclipse.kind === 'partial' || !eclipse.central ? undefined : eclipse.kind;
  return {
    ramp: w.ramp,
    path: central ? w.path[central] : undefined,
    centralLine: central ? w.centralLine(clockLabel) : undefined,
    pathLimits: central ? w.pathLimits : undefined,
    partialLimits: w.partialLimits,
    riseSet: w.riseSet,
    greatest: w.greatest,
    contours: w.contours,
    town: w.town,
  };
}

/** A contour's label: "40 %". */
export const contourLabel = (obscuration: number, solar?: SolarWords) => {
  const w = figureWords(solar);
  return w.percentText.percent(wholeIn(Math.round(obscuration * 100), w.common));
};

/** The rise/set curves' label words. */
export function riseSetLabel(contact: 'C1' | 'C4', sun: 'sunrise' | 'sunset', solar?: SolarWords): string {
  return figureWords(solar).riseSet(contact, sun);
}

/** A marked place: "Tromsø · total 11:05, 2 min 14 s", "Cairo · 63 % at 10:07", "Lima · 12 % at sunset 18:02", "Perth · not seen". */
export function solarMarkWords(
  name: string, seen: { kind: SolarLocalKind; share: number; time?: string; at?: 'sunrise' | 'sunset'; centralSeconds?: number }, solar?: SolarWords,
): string {
  const w = figureWords(solar);
  if (seen.kind === 'none' || seen.time === undefined) return w.mark.notSeen(name);
  if (seen.kind === 'total' || seen.kind === 'annular') {
    return w.mark.central(name, seen.kind, seen.time, seen.centralSeconds !== undefined ? minutesSeconds(seen.centralSeconds, w) : undefined);
  }
  return w.mark.partial(name, percentText(seen.share, w), seen.time, seen.at);
}

/** The caption and alt text published beside a solar map, each carrying the caution. */
export function solarMapCaptionWords(
  eclipse: SolarEclipse, clock: CivilClock, subtitle: string, solar?: SolarWords,
): { caption: TextFor<'solar'>; altText: TextFor<'solar'> } {
  const w = figureWords(solar);
  const at = eclipse.greatest.utDays;
  const kind = w.kindInSentence[eclipse.kind];
  const path = eclipse.kind === 'partial' || !eclipse.central ? '' : w.caption.path(eclipse.kind);
  const caption = [w.caption.facts(kind, clock.date(at), subtitle), w.caption.shading(path), mapCaution(eclipse, 'long', solar), w.common.predictions].join(' ');
  const altText = [w.caption.altText(kind, clock.date(at), path), mapCaution(eclipse, 'short', solar)].join(' ');
  return { caption: meantOnlyFor('solar', caption), altText: meantOnlyFor('solar', altText) };
}

/** The caption file beside a solar picture. */
export function solarCaptionFile(caption: string, altText: string, solar?: SolarWords): string {
  return figureWords(solar).caption.file(caption, altText);
}
