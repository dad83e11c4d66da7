/**
 * The reader's language: a BCP 47 tag (`lang`, the command line's --lang, a
 * house style's `lang` field) chosen among the languages whose catalogues
 * exist, each one file per language and kind (src/words/common/<tag>.ts,
 * words/lunar/<tag>.ts, words/solar/<tag>.ts). The tag's region, when given,
 * reaches Intl (es-MX writes dates as Mexico does); the words are the
 * language's. A language whose script the bundled type (IBM Plex Sans:
 * Latin, Greek, Cyrillic) cannot draw is refused with its own reason, never
 * drawn as boxes.
 */
import { InputError } from '../errors.ts';
import { ENGLISH, type CommonWords } from '../words/common.ts';
import { LUNAR_ENGLISH, type LunarWords } from '../words/lunar/text.ts';
import { SOLAR_ENGLISH, type SolarWords } from '../words/solar/caution.ts';
import { COMMON_SPANISH } from '../words/common/es.ts';
import { COMMON_FRENCH } from '../words/common/fr.ts';
import { COMMON_GERMAN } from '../words/common/de.ts';
import { COMMON_PORTUGUESE } from '../words/common/pt.ts';
import { COMMON_ITALIAN } from '../words/common/it.ts';
import { LUNAR_SPANISH } from '../words/lunar/es.ts';
import { LUNAR_FRENCH } from '../words/lunar/fr.ts';
import { LUNAR_GERMAN } from '../words/lunar/de.ts';
import { LUNAR_PORTUGUESE } from '../words/lunar/pt.ts';
import { LUNAR_ITALIAN } from '../words/lunar/it.ts';
import { SOLAR_SPANISH } from '../words/solar/es.ts';
import { SOLAR_FRENCH } from '../words/solar/fr.ts';
import { SOLAR_GERMAN } from '../words/solar/de.ts';
import { SOLAR_PORTUGUESE } from '../words/solar/pt.ts';
import { SOLAR_ITALIAN } from '../words/solar/it.ts';

import { LANGUAGE_TAGS, type LanguageTag } from './languageTags.ts';

export { LANGUAGE_TAGS, type LanguageTag } from './languageTags.ts';

/** One language's catalogues, of both kinds and the shared words. */
export interface Language {
  readonly tag: LanguageTag;
  readonly common: CommonWords;
  readonly lunar: LunarWords;
  readonly solar: SolarWords;
}

export const LANGUAGES: Readonly<Record<LanguageTag, Language>> = {
  en: { tag: 'en', common: ENGLISH, lunar: LUNAR_ENGLISH, solar: SOLAR_ENGLISH },
  es: { tag: 'es', common: COMMON_SPANISH, lunar: LUNAR_SPANISH, solar: SOLAR_SPANISH },
  fr: { tag: 'fr', common: COMMON_FRENCH, lunar: LUNAR_FRENCH, solar: SOLAR_FRENCH },
  de: { tag: 'de', common: COMMON_GERMAN, lunar: LUNAR_GERMAN, solar: SOLAR_GERMAN },
  pt: { tag: 'pt', common: COMMON_PORTUGUESE, lunar: LUNAR_PORTUGUESE, solar: SOLAR_PORTUGUESE },
  it: { tag: 'it', common: COMMON_ITALIAN, lunar: LUNAR_ITALIAN, solar: SOLAR_ITALIAN },
};

/** Scripts the bundled type draws (ISO 15924). */
const DRAWN_SCRIPTS = new Set(['Latn', 'Grek', 'Cyrl']);

const OFFERED = `a BCP 47 language tag among ${LANGUAGE_TAGS.join(', ')} (a region may follow: es-MX, pt-BR)`;

/**
 * The language of a BCP 47 tag, default English. An ill-formed tag, a
 * language not offered, or one written in a script the bundled type lacks is
 * an InputError naming `parameter`.
 */
export function chooseLanguage(tag: string | undefined, parameter = 'lang'): Language {
  if (tag === undefined) return LANGUAGES.en;
  let locale: Intl.Locale;
  try {
    locale = new Intl.Locale(tag.trim());
  } catch {
    throw new InputError(parameter, OFFERED, tag);
  }
  const script = locale.maximize().script;
  if (script !== undefined && !DRAWN_SCRIPTS.has(script)) {
    throw new InputError(parameter, `${OFFERED}; the bundled type (IBM Plex Sans) has no letters of the ${script} script`, tag);
  }
  const base = locale.language as LanguageTag;
  if (!(LANGUAGE_TAGS as readonly string[]).includes(base)) throw new InputError(parameter, OFFERED, tag);
  const language = LANGUAGES[base];
  // English stays en-GB's dates unless a region asks otherwise; another region of a language reaches Intl.
  if (locale.region === undefined || locale.baseName === language.common.locale || locale.baseName === language.common.clock.locale) return language;
  return withLocale(language, locale.baseName);
}

/** The same catalogues, with Intl writing dates and numbers as `locale` does. */
function withLocale(language: Language, locale: string): Language {
  const common: CommonWords = { ...language.common, locale, numerals: { digits: 'intl' }, clock: { ...language.common.clock, locale } };
  const { lunar, solar } = language;
  return {
    ...language,
    common,
    lunar: {
      ...lunar, common, figures: { ...lunar.figures, common },
      diagram: { ...lunar.diagram, common },
    },
    solar: {
      ...solar, common,
      text: { ...solar.text, common },
      figures: { ...solar.figures, common },
      diagram: { ...solar.diagram, common },
    },
  };
}
