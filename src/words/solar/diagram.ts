/**
 * Every word a reader sees on the solar diagram — the Sun and the Moon as one
 * place sees them at maximum — and its caption. The eye-safety caution comes
 * from safety.ts, short in the header band and long in the small print and
 * the caption; nothing here imports the lunar words, so the lunar naked-eye
 * line can never reach this figure.
 *
 * Shaped for translation: one `SolarDiagramWords` catalogue per language
 * (English below, SOLAR_DIAGRAM_ENGLISH); numbers are written through Intl in
 * the catalogue's language (words/common.ts).
 */
import type { SolarEclipse } from '../../eclipses/solar/types.ts';
import type { CivilClock } from '../../ephemeris/civilTime.ts';
import type { SolarLocalEventName, SolarLocalKind } from '../../local/solar.ts';
import { ENGLISH, fixedIn, wholeIn, type CommonWords } from '../common.ts';
import type { SolarWords } from './caution.ts';
import { safetyScopeForPlace, solarSafetyText } from './safety.ts';

/** The solar diagram's words, one catalogue per language. */
export interface SolarDiagramWords {
  readonly common: CommonWords;
  /** What each moment of the place's eclipse means, in the timetable. */
  readonly moments: Readonly<Record<SolarLocalEventName, string>>;
  /** The timetable's first column where it is not a contact's name (C1…C4 stay as the trade writes them). */
  readonly momentLabel: { readonly maximum: string; readonly sunrise: string; readonly sunset: string };
  readonly legend: { readonly sun: string; readonly moonOverSun: string; readonly moonOutline: string };
  /** The compass arms' letters. */
  readonly compass: { readonly north: string; readonly east: string };
  /** The scale bar's note: the Sun's size. */
  readonly sunAcross: (arcmin: string) => string;
  /** The timetable's heading: the zone's abbreviation, or (undefined) a note that each time carries its own. */
  readonly timesHeading: (zone: string | undefined) => string;
  /** A timetable row's Sun altitude: "Sun 12°"; below the horizon: "Sun down". */
  readonly sunAltitude: { readonly up: (degrees: string) => string; readonly down: string };
  /** "total", inside the title's and the subtitle's sentences. */
  readonly kind: Readonly<Record<SolarEclipse['kind'], string>>;
  readonly title: (date: string, kind: string, place: string) => string;
  /** A share of the Sun's disc, to 0.1 %: "63.4 %". */
  readonly percent: (value: string) => string;
  /** The subtitle's first sentence; `sunAltitude` is undefined when the Sun is below the horizon at maximum. */
  readonly atMaximum: (stamp: string, sunAltitude: string | undefined, magnitude: string, obscuration: string) => string;
  /** Said when the eclipse's own kind differs from what the place sees. */
  readonly elsewhere: (kind: string) => string;
  readonly smallPrint: {
    readonly drawn: (place: string) => string;
    readonly terms: string;
    readonly times: (zone: string, deltaT: string, source: string) => string;
    readonly credits: (font: string, generator: string) => string;
  };
  /** How the figure names the default place: the greatest point, with its position. */
  readonly greatestPoint: (position: string) => string;
  readonly caption: {
    readonly summary: (time: string, obscuration: string, place: string, magnitude: string) => string;
    readonly altText: (place: string, positionAngle: string) => string;
    readonly file: (title: string, summary: string, caution: string, altText: string) => string;
  };
}

export const SOLAR_DIAGRAM_ENGLISH: SolarDiagramWords = {
  common: ENGLISH,
  moments: {
    C1: 'the Moon first touches the Sun',
    C2: 'the central phase begins',
    maximum: 'the Sun at its most covered',
    C3: 'the central phase ends',
    C4: 'the Moon leaves the Sun',
    sunrise: 'sunrise',
    sunset: 'sunset',
  },
  momentLabel: { maximum: 'Maximum', sunrise: 'Sunrise', sunset: 'Sunset' },
  legend: {
    sun: 'the Sun\'s disc',
    moonOverSun: 'the Moon in front of the Sun',
    moonOutline: 'the Moon\'s outline (unseen against the sky)',
  },
  compass: { north: 'N', east: 'E' },
  sunAcross: (arcmin) => `the Sun is ${arcmin}′ across`,
  timesHeading: (zone) => `Times (${zone ?? 'each with its zone'})`,
  sunAltitude: { up: (degrees) => `Sun ${degrees}°`, down: 'Sun down' },
  kind: { total: 'total', annular: 'annular', hybrid: 'hybrid', partial: 'partial' },
  // What the place sees leads the title, the date first (a long place name is what a narrow page cuts).
  title: (date, kind, place) => `${date}: ${kind} solar eclipse from ${place}`,
  percent: (value) => `${value} %`,
  atMaximum: (stamp, sunAltitude, magnitude, obscuration) =>
    `At maximum, ${stamp}${sunAltitude === undefined ? ' (the Sun is below the horizon then)' : `, the Sun ${sunAltitude}° high`}: magnitude ${magnitude}, obscuration ${obscuration} of the Sun's disc.`,
  elsewhere: (kind) => `The eclipse is ${kind} elsewhere.`,
  smallPrint: {
    drawn: (place) => `The Sun and the Moon from ${place} at maximum, drawn to scale: north up, towards the celestial pole of date; east to the left, as the sky looks when you face it.`,
    terms: 'Magnitude: the fraction of the Sun\'s diameter covered; obscuration: the fraction of its disc.',
    times: (zone, deltaT, source) => `Times in ${zone}, 24-hour clock. ΔT ${deltaT} s (${source}).`,
    credits: (font, generator) => `Type: ${font}. Made with ${generator}.`,
  },
  greatestPoint: (position) => `the greatest point (${position})`,
  caption: {
    summary: (time, obscuration, place, magnitude) => `At ${time} the Moon covers ${obscuration} of the Sun's disc as seen from ${place} (magnitude ${magnitude}).`,
    altText: (place, positionAngle) =>
      `Diagram of the Sun's disc with the Moon's dark disc in front of it, drawn to scale as seen from ${place} at maximum, the Moon's centre at position angle ${positionAngle}° from north through east; north is up, east to the left, and the times of the eclipse are listed beside it.`,
    file: (title, summary, caution, altText) => `${title}. ${summary}\n\n${caution}\n\nAlt text: ${altText}\n`,
  },
};

/** The diagram words of a solar catalogue (English when none is given). */
export function solarDiagramWords(solar?: SolarWords): SolarDiagramWords {
  return solar === undefined ? SOLAR_DIAGRAM_ENGLISH : solar.diagram;
}

/** How the figure names the default place: the greatest point, with its position. */
export const solarGreatestPointName = (position: string, solar?: SolarWords) => solarDiagramWords(solar).greatestPoint(position);

/** A timetable row's first cell: the contact's name, or the catalogue's word for maximum, sunrise, sunset. */
export function solarMomentLabel(event: SolarLocalEventName, solar?: SolarWords): string {
  const w = solarDiagramWords(solar).momentLabel;
  return event === 'maximum' ? w.maximum : event === 'sunrise' ? w.sunrise : event === 'sunset' ? w.sunset : event;
}

/** A row's Sun altitude: "Sun 12°"; below the horizon (centre under −0.5°): "Sun down". */
export function solarSunAltitudeWords(altitudeDeg: number, solar?: SolarWords): string {
  const w = solarDiagramWords(solar);
  return altitudeDeg < -0.5 ? w.sunAltitude.down : w.sunAltitude.up(wholeIn(Math.round(altitudeDeg), w.common));
}

export interface SolarDiagramFacts {
  readonly eclipse: SolarEclipse;
  readonly placeName: string;
  readonly clock: CivilClock;
  /** What the place sees with the Sun up. */
  readonly localKind: Exclude<SolarLocalKind, 'none'>;
  readonly maximumUtDays: number;
  readonly magnitude: number;
  readonly obscuration: number;
  readonly sunAltitudeDeg: number;
  readonly positionAngleDeg: number;
}

const percent = (fraction: number, w: SolarDiagramWords) => w.percent(fixedIn(fraction * 100, 1, w.common));

/** Title, subtitle (with the short caution: the header band carries it) and small print (the long caution). */
export function solarDiagramTexts(facts: SolarDiagramFacts, zoneName: string, generator: string, font: string, customTitle?: string, solar?: SolarWords) {
  const w = solarDiagramWords(solar);
  const { eclipse, clock } = facts;
  const title = customTitle ?? w.title(clock.date(facts.maximumUtDays), w.kind[facts.localKind], facts.placeName);
  const scope = safetyScopeForPlace(facts.localKind === 'total');
  const sunAltitude = facts.sunAltitudeDeg < -0.5 ? undefined : wholeIn(Math.round(facts.sunAltitudeDeg), w.common);
  const subtitle = [
    w.atMaximum(clock.stamp(facts.maximumUtDays), sunAltitude, fixedIn(facts.magnitude, 3, w.common), percent(facts.obscuration, w)),
    ...(facts.localKind === eclipse.kind ? [] : [w.elsewhere(w.kind[eclipse.kind])]),
    solarSafetyText('short', scope, solar),
  ].join(' ');
  const smallPrint = [
    w.smallPrint.drawn(facts.placeName),
    w.smallPrint.terms,
    w.smallPrint.times(zoneName, fixedIn(eclipse.deltaT.seconds, 1, w.common), w.common.deltaTSources[eclipse.deltaT.source]),
    solarSafetyText('long', scope, solar),
    w.common.predictions,
    w.smallPrint.credits(font, generator),
  ].join(' ');
  return { title, subtitle, smallPrint };
}

/** The caption file: title, what the figure shows, the caution (long form), then alt text. */
export function solarDiagramCaption(title: string, facts: SolarDiagramFacts, solar?: SolarWords): string {
  const w = solarDiagramWords(solar);
  const { clock } = facts;
  const at = `${clock.time(facts.maximumUtDays)} ${clock.abbreviation(facts.maximumUtDays)}`;
  const summary = w.caption.summary(at, percent(facts.obscuration, w), facts.placeName, fixedIn(facts.magnitude, 3, w.common));
  const alt = w.caption.altText(facts.placeName, wholeIn(Math.round(facts.positionAngleDeg), w.common));
  return w.caption.file(title, summary, solarSafetyText('long', safetyScopeForPlace(facts.localKind === 'total'), solar), alt);
}
