/**
 * A lunar calendar entry's description starts with the phase's title and
 * the eclipse's id (`calendar.description`). The title of the partial and
 * penumbral phases already names the eclipse ("Phases partielles de
 * l’éclipse de Lune"), so the words that join it to the id must not name it
 * again ("… de l’éclipse de Lune de l’éclipse 2026-03-03"): a heading says
 * its noun once (common practice). Checked for every language and phase.
 */
import assert from 'node:assert/strict';
import { test } from 'node:test';
import { LANGUAGES, LANGUAGE_TAGS } from '../../src/settings/language.ts';

/** Each language's word for an eclipse, as its catalogue writes it. */
const ECLIPSE_WORD: Record<string, RegExp> = {
  en: /eclipse/giu,
  es: /eclipse/giu,
  fr: /éclipse/giu,
  de: /finsternis/giu,
  pt: /eclipse/giu,
  it: /eclissi/giu,
};

test('every language has its eclipse word here (a new language is checked the day it is added)', () => {
  assert.deepEqual([...LANGUAGE_TAGS].sort(), Object.keys(ECLIPSE_WORD).sort());
});

for (const tag of LANGUAGE_TAGS) {
  test(`${tag}: a calendar description names the eclipse at most once before its id, for every phase`, () => {
    const { calendar } = LANGUAGES[tag].lunar;
    for (const [phase, title] of Object.entries(calendar.phaseTitle)) {
      const text = calendar.description(title, '2026-03-03', '', 'SUMMARY', 'NAKED');
      const head = text.slice(0, text.indexOf('2026-03-03'));
      assert.ok(head.length > 0, `${phase}: the id follows the title (${JSON.stringify(text)})`);
      const named = head.match(ECLIPSE_WORD[tag]!) ?? [];
      assert.ok(named.length <= 1, `${tag} ${phase}: ${JSON.stringify(head)} names the eclipse ${named.length} times`);
    }
  });
}
