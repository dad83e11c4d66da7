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

export type SolarSafetyForm = 'short' | 'long';
export type SolarSafetyScope = 'totality' | 'no-totality' | 'whole-eclipse';

const VIEWERS = 'Look at the Sun only through eclipse glasses or handheld viewers that meet ISO 12312-2, or watch an image of it projected onto a card.';
const NEVER_UNPROTECTED = 'Never look at a partial or annular phase without protection, however much of the Sun is covered: even a thin sliver can injure the eye.';
const TOTALITY = 'Only in the path of totality, and only while the Moon hides the Sun completely, may viewers come off; put them back on at the first bright light.';
const NO_TOTALITY = 'Outside the path of totality, at no time is it safe to look without a filter.';
const OPTICS = 'Binoculars, telescopes and cameras need a proper solar filter fitted over the front of the instrument; never look through them with eclipse glasses alone.';
const CHILDREN = 'Children should watch only with an adult beside them.';
const AUTHORITIES = 'Follow the advice of your local health authorities.';

const SHORT_VIEWERS = 'Eye safety: watch only through ISO 12312-2 eclipse viewers or by projection; never look at a partial or annular phase unprotected, however much of the Sun is covered.';
const SHORT_TOTALITY = 'Viewers off only while totality hides the Sun completely, back on at the first bright light.';
const SHORT_NO_TOTALITY = 'Outside the path of totality, at no time is it safe to look without a filter.';
const SHORT_BOTH = 'In the path, viewers off only while totality hides the Sun completely, back on at the first bright light; outside it, at no time is it safe to look without a filter.';
const SHORT_REST = 'No binoculars, telescopes or cameras without a front solar filter. Supervise children; follow local health advice.';

/** The caution, short (for map headers, captions, one-line formats) or long (for pages, alt text, local reports). */
export function solarSafetyText(form: SolarSafetyForm, scope: SolarSafetyScope): string {
  if (form === 'short') {
    const middle = scope === 'totality' ? SHORT_TOTALITY : scope === 'no-totality' ? SHORT_NO_TOTALITY : SHORT_BOTH;
    return [SHORT_VIEWERS, middle, SHORT_REST].join(' ');
  }
  const middle = scope === 'totality' ? [TOTALITY] : scope === 'no-totality' ? [NO_TOTALITY] : [TOTALITY, NO_TOTALITY];
  return [VIEWERS, NEVER_UNPROTECTED, ...middle, OPTICS, CHILDREN, AUTHORITIES].join(' ');
}

/** Which scope fits a place: totality seen there or not. */
export function safetyScopeForPlace(seesTotality: boolean): SolarSafetyScope {
  return seesTotality ? 'totality' : 'no-totality';
}

/** Which scope fits a whole eclipse: only total and hybrid eclipses have anywhere to take viewers off. */
export function safetyScopeForEclipse(kind: 'total' | 'annular' | 'hybrid' | 'partial'): SolarSafetyScope {
  return kind === 'total' || kind === 'hybrid' ? 'whole-eclipse' : 'no-totality';
}
