/**
 * Every word a reader sees on a solar map: title, subtitle, the caution's
 * place in the header, legend entries, line labels, marks, small print, and
 * the caption and alt text written beside the picture. Kept here so they can
 * be reviewed and translated, and so that no lunar wording (above all the
 * naked-eye line) can reach a solar figure: this module imports nothing lunar.
 */
import type { CivilClock } from '../../ephemeris/civilTime.ts';
import type { SolarEclipse, SolarEclipseKind } from '../../eclipses/solar/types.ts';
import type { SolarLocalKind } from '../../local/solar.ts';
import { coordinatesText, ENGLISH, meantOnlyFor, type TextFor } from '../common.ts';
import { safetyScopeForEclipse, solarSafetyText } from './caution.ts';

const KIND_TITLE: Record<SolarEclipseKind, string> = {
  total: 'Total solar eclipse',
  annular: 'Annular solar eclipse',
  hybrid: 'Hybrid solar eclipse',
  partial: 'Partial solar eclipse',
};

/** What the central phase is called along a path of this kind. */
const CENTRAL_PHASE: Record<Exclude<SolarEclipseKind, 'partial'>, string> = { total: 'totality', annular: 'annularity', hybrid: 'central phase' };

/** "4 min 28 s", "52 s": a central phase's length, to the second. */
export function minutesSeconds(seconds: number): string {
  const whole = Math.round(seconds);
  const minutes = Math.floor(whole / 60);
  const rest = whole % 60;
  return minutes === 0 ? `${rest} s` : `${minutes} min ${String(rest).padStart(2, '0')} s`;
}

/** A share of the Sun hidden, as a whole percentage ("63 %"); under 1 % printed as "under 1 %". */
export function percentText(share: number): string {
  const p = Math.round(share * 100);
  return p < 1 ? 'under 1 %' : `${p} %`;
}

/** The caution every solar map carries in its header band (short) and beside it (long). */
export function mapCaution(eclipse: SolarEclipse, form: 'short' | 'long'): TextFor<'solar'> {
  return solarSafetyText(form, safetyScopeForEclipse(eclipse.kind));
}

/** Title, subtitle and small print of a solar map. */
export function solarMapTexts(eclipse: SolarEclipse, clock: CivilClock, generator: string, credits: { basemap: string; font: string; moonRadii: string }, customTitle?: string) {
  const at = eclipse.greatest.utDays;
  const title = customTitle ?? `${KIND_TITLE[eclipse.kind]} · ${clock.date(at)}`;
  const [lon, lat] = eclipse.greatestPoint;
  const parts = [`Greatest ${clock.stamp(at)} at ${coordinatesText(lat, lon)}`, `magnitude ${eclipse.magnitude.toFixed(3)}`];
  if (eclipse.kind !== 'partial' && eclipse.central) {
    if (eclipse.durations.centralSeconds !== undefined) parts.push(`${CENTRAL_PHASE[eclipse.kind]} ${minutesSeconds(eclipse.durations.centralSeconds)} on the central line`);
    if (eclipse.pathWidthKm !== undefined) parts.push(`path ${Math.round(eclipse.pathWidthKm)} km wide`);
  }
  const subtitle = parts.join(' · ');
  const c = eclipse.contacts;
  const smallPrint = [
    `Times in ${clock.zoneDescriptionBetween(c.P1!.utDays, c.P4!.utDays)}, 24-hour clock; "+1 day": the day after the date in the title.`,
    'Shading: the most of the Sun\'s disc hidden while the Sun is up (upper limb on a sea-level horizon with standard refraction).',
    `Besselian elements from astronomy-engine; ΔT ${eclipse.deltaT.seconds.toFixed(1)} s (${eclipse.deltaT.source}); ${credits.moonRadii}; smooth lunar limb: path edges may move by a kilometre or more.`,
    ENGLISH.predictions,
    `${credits.basemap}. Type: ${credits.font}. Made with ${generator}.`,
  ].join(' ');
  return { title, subtitle, smallPrint };
}

/** Legend words, in the order drawn. */
export function solarLegendWords(eclipse: SolarEclipse, clockLabel: string) {
  const central = eclipse.kind === 'partial' || !eclipse.central ? undefined : eclipse.kind;
  return {
    ramp: ['Sun under 20 % hidden', '20–40 %', '40–60 %', '60–80 %', 'over 80 % (Sun up)'] as const,
    path: central === 'total' ? 'Path of totality' : central === 'annular' ? 'Path of annularity' : central === 'hybrid' ? 'Path (total or annular)' : undefined,
    centralLine: central ? `Central line, times ${clockLabel}` : undefined,
    pathLimits: central ? 'Path limits' : undefined,
    partialLimits: 'Limits of the partial eclipse',
    riseSet: 'Eclipse under way at sunrise or sunset',
    greatest: 'Greatest eclipse',
    contours: 'Equal share of the Sun hidden',
    town: 'Marked place',
  };
}

/** A contour's label: "40 %". */
export const contourLabel = (obscuration: number) => `${Math.round(obscuration * 100)} %`;

/** The rise/set curves' label words. */
export function riseSetLabel(contact: 'C1' | 'C4', sun: 'sunrise' | 'sunset'): string {
  return `${contact === 'C1' ? 'begins' : 'ends'} at ${sun}`;
}

/** A marked place: "Tromsø · total 11:05, 2 min 14 s", "Cairo · 63 % at 10:07", "Lima · 12 % at sunset 18:02", "Perth · not seen". */
export function solarMarkWords(name: string, seen: { kind: SolarLocalKind; share: number; time?: string; at?: 'sunrise' | 'sunset'; centralSeconds?: number }): string {
  if (seen.kind === 'none' || seen.time === undefined) return `${name} · not seen`;
  if (seen.kind === 'total' || seen.kind === 'annular') {
    return `${name} · ${seen.kind} ${seen.time}${seen.centralSeconds !== undefined ? `, ${minutesSeconds(seen.centralSeconds)}` : ''}`;
  }
  return `${name} · ${percentText(seen.share)} at ${seen.at ? `${seen.at} ` : ''}${seen.time}`;
}

/** The caption and alt text published beside a solar map, each carrying the caution. */
export function solarMapCaptionWords(eclipse: SolarEclipse, clock: CivilClock, subtitle: string): { caption: TextFor<'solar'>; altText: TextFor<'solar'> } {
  const at = eclipse.greatest.utDays;
  const kind = KIND_TITLE[eclipse.kind].toLowerCase();
  const path = eclipse.kind === 'partial' || !eclipse.central ? ''
    : ` The dark band is the path of ${eclipse.kind === 'hybrid' ? 'the central eclipse (total in places, annular in others)' : CENTRAL_PHASE[eclipse.kind]}, with its central line and times.`;
  const facts = `The ${kind} of ${clock.date(at)}. ${subtitle}.`;
  const caption = [facts, `Shading shows how much of the Sun is hidden at best with the Sun up.${path}`, mapCaution(eclipse, 'long'), ENGLISH.predictions].join(' ');
  const altText = [`Map of the ${kind} of ${clock.date(at)}: shading, darker where more of the Sun is hidden, marks where the partial eclipse is seen.${path}`, mapCaution(eclipse, 'short')].join(' ');
  return { caption: meantOnlyFor('solar', caption), altText: meantOnlyFor('solar', altText) };
}

/** The caption file beside a solar picture. */
export function solarCaptionFile(caption: string, altText: string): string {
  return `${caption}\n\nAlt text: ${altText}\n`;
}
