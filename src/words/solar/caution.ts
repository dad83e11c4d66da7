/**
 * The solar words of one language (`SolarWords`): the eye-safety caution that
 * every solar-eclipse output carries (its sentences and the rule that puts
 * them together are in safety.ts, re-exported here), the reader text of the
 * local formats and captions (text.ts), the map's words (figures.ts) and the
 * solar diagram's (diagram.ts). One catalogue per language, in
 * words/solar/<tag>.ts; English below. Nothing here imports the lunar words,
 * so the lunar naked-eye line can never reach a solar output.
 *
 * The caution's content follows the standard for direct solar viewers,
 * ISO 12312-2, and the advice health authorities give; the wording is our
 * own. Outputs defer to local health authorities.
 */
import { ENGLISH, type CommonWords } from '../common.ts';
import { SOLAR_DIAGRAM_ENGLISH, type SolarDiagramWords } from './diagram.ts';
import { SOLAR_FIGURES_ENGLISH, type SolarFigureWords } from './figures.ts';
import { SOLAR_CAUTION_ENGLISH, type SolarCautionWords } from './safety.ts';
import { SOLAR_TEXT_ENGLISH, type SolarTextWords } from './text.ts';

export {
  safetyScopeForEclipse, safetyScopeForPlace, solarSafetyText, SOLAR_CAUTION_ENGLISH,
  type SolarCautionWords, type SolarSafetyForm, type SolarSafetyScope,
} from './safety.ts';

/** The solar words, one catalogue per language. */
export interface SolarWords {
  readonly body: 'solar';
  readonly common: CommonWords;
  readonly caution: SolarCautionWords;
  /** The local formats' words, the summary, the caption and alt text, the contact sheet's solar cards (text.ts). */
  readonly text: SolarTextWords;
  /** Every word of the solar map: legend, line labels, marks, small print, caption and alt text (figures.ts). */
  readonly figures: SolarFigureWords;
  /** The solar diagram's words: the Sun and the Moon from a place at maximum, and its caption (diagram.ts). */
  readonly diagram: SolarDiagramWords;
}

export const SOLAR_ENGLISH: SolarWords = {
  body: 'solar',
  common: ENGLISH,
  caution: SOLAR_CAUTION_ENGLISH,
  text: SOLAR_TEXT_ENGLISH,
  figures: SOLAR_FIGURES_ENGLISH,
  diagram: SOLAR_DIAGRAM_ENGLISH,
};
