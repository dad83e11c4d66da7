/** The languages offered, by their BCP 47 primary subtag, English first: a list alone, so the command line can declare --lang without loading a catalogue. */
export const LANGUAGE_TAGS = ['en', 'es', 'fr', 'de', 'pt', 'it'] as const;
export type LanguageTag = (typeof LANGUAGE_TAGS)[number];
