/**
 * Every word a reader sees on the solar diagram — the Sun and the Moon as one
 * place sees them at maximum — and its caption. The eye-safety caution comes
 * from caution.ts, short in the header band and long in the small print and
 * the caption; nothing here imports the lunar words, so the lunar naked-eye
 * line can never reach this figure.
 */
import type { SolarEclipse } from '../../eclipses/solar/types.ts';
import type { CivilClock } from '../../ephemeris/civilTime.ts';
import type { SolarLocalEventName, SolarLocalKind } from '../../local/solar.ts';
import { ENGLISH } from '../common.ts';
import { safetyScopeForPlace, solarSafetyText } from './caution.ts';

const KIND_WORDS: Record<SolarEclipse['kind'], string> = { total: 'total', annular: 'annular', hybrid: 'hybrid', partial: 'partial' };

/** What each moment of the place's eclipse means, in our words. */
export const SOLAR_MOMENT_WORDS: Readonly<Record<SolarLocalEventName, string>> = {
  C1: 'the Moon first touches the Sun',
  C2: 'the central phase begins',
  maximum: 'most of the Sun covered',
  C3: 'the central phase ends',
  C4: 'the Moon leaves the Sun',
  sunrise: 'sunrise',
  sunset: 'sunset',
};

export const SOLAR_DIAGRAM_WORDS = {
  sun: 'the Sun\'s disc',
  moonOverSun: 'the Moon in front of the Sun',
  moonOutline: 'the Moon\'s outline (unseen against the sky)',
  north: 'N',
  east: 'E',
  maximum: 'Maximum',
  sunAcross: (arcmin: string) => `the Sun is ${arcmin}′ across`,
  timesHeading: (zone: string | undefined) => `Times (${zone ?? 'each with its zone'})`,
  /** A row's Sun altitude: "Sun 12°"; below the horizon: "Sun down". */
  sunAltitude: (altitudeDeg: number) => (altitudeDeg < -0.5 ? 'Sun down' : `Sun ${Math.round(altitudeDeg)}°`),
} as const;

/** How the figure names the default place: the greatest point, with its position. */
export const solarGreatestPointName = (position: string) => `the greatest point (${position})`;

export const solarMomentLabel = (event: SolarLocalEventName) => (event === 'maximum' ? SOLAR_DIAGRAM_WORDS.maximum : event === 'sunrise' ? 'Sunrise' : event === 'sunset' ? 'Sunset' : event);

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

const percent = (fraction: number) => `${(fraction * 100).toFixed(1)} %`;

/** Title, subtitle (with the short caution: the header band carries it) and small print (the long caution). */
export function solarDiagramTexts(facts: SolarDiagramFacts, zoneName: string, generator: string, font: string, customTitle?: string) {
  const { eclipse, clock } = facts;
  // What the place sees leads the title, the date first (a long place name is what a narrow page cuts);
  // the eclipse's own kind follows in the subtitle when it differs.
  const title = customTitle ?? `${clock.date(facts.maximumUtDays)}: ${KIND_WORDS[facts.localKind]} solar eclipse from ${facts.placeName}`;
  const elsewhere = facts.localKind === eclipse.kind ? '' : ` The eclipse is ${KIND_WORDS[eclipse.kind]} elsewhere.`;
  const scope = safetyScopeForPlace(facts.localKind === 'total');
  const below = facts.sunAltitudeDeg < -0.5 ? ' (the Sun is below the horizon then)' : `, the Sun ${Math.round(facts.sunAltitudeDeg)}° high`;
  const subtitle = `At maximum, ${clock.stamp(facts.maximumUtDays)}${below}: magnitude ${facts.magnitude.toFixed(3)}, obscuration ${percent(facts.obscuration)} of the Sun's disc.${elsewhere} `
    + solarSafetyText('short', scope);
  const smallPrint = [
    `The Sun and the Moon from ${facts.placeName} at maximum, drawn to scale: north up, towards the celestial pole of date; east to the left, as the sky looks when you face it.`,
    'Magnitude: the fraction of the Sun\'s diameter covered; obscuration: the fraction of its disc.',
    `Times in ${zoneName}, 24-hour clock. ΔT ${eclipse.deltaT.seconds.toFixed(1)} s (${eclipse.deltaT.source}).`,
    solarSafetyText('long', scope),
    ENGLISH.predictions,
    `Type: ${font}. Made with ${generator}.`,
  ].join(' ');
  return { title, subtitle, smallPrint };
}

/** The caption file: title, what the figure shows, the caution (long form), then alt text. */
export function solarDiagramCaption(title: string, facts: SolarDiagramFacts): string {
  const { clock } = facts;
  const at = `${clock.time(facts.maximumUtDays)} ${clock.abbreviation(facts.maximumUtDays)}`;
  const summary = `At ${at} the Moon covers ${percent(facts.obscuration)} of the Sun's disc as seen from ${facts.placeName} (magnitude ${facts.magnitude.toFixed(3)}).`;
  const alt = `Diagram of the Sun's disc with the Moon's dark disc in front of it, drawn to scale as seen from ${facts.placeName} at maximum, the Moon's centre at position angle ${Math.round(facts.positionAngleDeg)}° from north through east; north is up, east to the left, and the times of the eclipse are listed beside it.`;
  return `${title}. ${summary}\n\n${solarSafetyText('long', safetyScopeForPlace(facts.localKind === 'total'))}\n\nAlt text: ${alt}\n`;
}
