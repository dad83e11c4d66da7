/**
 * The eye-safety caution that every solar-eclipse output carries, in one
 * place so it can be reviewed and translated, and so that no other caution
 * (above all the lunar one: a lunar eclipse may be watched with the naked
 * eye) can stand in for it. Its content follows the standard for direct
 * solar viewers, ISO 12312-2, and the advice health authorities give; the
 * wording is our own. Outputs defer to local health authorities.
 *
 * Scope: `totality` where totality can be seen (the place is in the path of
 * a total eclipse), `no-totality` where it cannot (outside the path, or any
 * partial or annular eclipse), `whole-eclipse` for maps and catalogues of a
 * total or hybrid eclipse, which serve readers on both sides of the limits.
 */
import { meantOnlyFor, type TextFor } from '../common.ts';

export type SolarSafetyForm = 'short' | 'long';
export type SolarSafetyScope = 'totality' | 'no-totality' | 'whole-eclipse';

/** The caution's sentences, one catalogue per language (`SolarWords.caution`, words/solar/caution.ts). */
export interface SolarCautionWords {
  /** Sentences of the long form, in the order printed; the scope picks totality, noTotality or both. */
  readonly long: {
    readonly viewers: string; readonly neverUnprotected: string; readonly totality: string; readonly noTotality: string;
    readonly optics: string; readonly children: string; readonly authorities: string;
  };
  /** The short form: viewers, then one of totality / noTotality / both, then the rest. */
  readonly short: { readonly viewers: string; readonly totality: string; readonly noTotality: string; readonly both: string; readonly rest: string };
}

export const SOLAR_CAUTION_ENGLISH: SolarCautionWords = {
  long: {
    viewers: 'Look at the Sun only through eclipse glasses or handheld viewers that meet ISO 12312-2, or watch an image of it projected onto a card.',
    neverUnprotected: 'Never look at a partial or annular phase without protection, however much of the Sun is covered: even a thin sliver can injure the eye.',
    totality: 'Only in the path of totality, and only while the Moon hides the Sun completely, may viewers come off; put them back on at the first bright light.',
    noTotality: 'Outside the path of totality, at no time is it safe to look without a filter.',
    optics: 'Binoculars, telescopes and cameras need a proper solar filter fitted over the front of the instrument; never look through them with eclipse glasses alone.',
    children: 'Children should watch only with an adult beside them.',
    authorities: 'Follow the advice of your local health authorities.',
  },
  short: {
    viewers: 'Eye safety: watch only through ISO 12312-2 eclipse viewers or by projection; never look at a partial or annular phase unprotected, however much of the Sun is covered.',
    totality: 'Viewers off only while totality hides the Sun completely, back on at the first bright light.',
    noTotality: 'Outside the path of totality, at no time is it safe to look without a filter.',
    both: 'In the path, viewers off only while totality hides the Sun completely, back on at the first bright light; outside it, at no time is it safe to look without a filter.',
    rest: 'No binoculars, telescopes or cameras without a front solar filter. Supervise children; follow local health advice.',
  },
};

/** The caution, short (for map headers, captions, one-line formats) or long (for pages, alt text, local reports). */
export function solarSafetyText(form: SolarSafetyForm, scope: SolarSafetyScope, words: { readonly caution: SolarCautionWords } = { caution: SOLAR_CAUTION_ENGLISH }): TextFor<'solar'> {
  if (form === 'short') {
    const short = words.caution.short;
    const middle = scope === 'totality' ? short.totality : scope === 'no-totality' ? short.noTotality : short.both;
    return meantOnlyFor('solar', [short.viewers, middle, short.rest].join(' '));
  }
  const long = words.caution.long;
  const middle = scope === 'totality' ? [long.totality] : scope === 'no-totality' ? [long.noTotality] : [long.totality, long.noTotality];
  return meantOnlyFor('solar', [long.viewers, long.neverUnprotected, ...middle, long.optics, long.children, long.authorities].join(' '));
}

/** Which scope fits a place: totality seen there or not. */
export function safetyScopeForPlace(seesTotality: boolean): SolarSafetyScope {
  return seesTotality ? 'totality' : 'no-totality';
}

/** Which scope fits a whole eclipse: only total and hybrid eclipses have anywhere to take viewers off. */
export function safetyScopeForEclipse(kind: 'total' | 'annular' | 'hybrid' | 'partial'): SolarSafetyScope {
  return kind === 'total' || kind === 'hybrid' ? 'whole-eclipse' : 'no-totality';
}
