/**
 * Line breaking in the figures' small print: a line breaks at ordinary white
 * space and never at a no-break space (Unicode UAX #14: U+00A0, U+2007 and
 * U+202F are class GL, "glue"), so French "mot ;" and "23 %" stay whole.
 */
import assert from 'node:assert/strict';
import { test } from 'node:test';
import { measureText, wrapText } from '../../src/figures/typography.ts';

const STYLE = { sizePx: 20, weight: 'regular' } as const;

test('wrapText never breaks at a no-break space and keeps it in the line (UAX #14, class GL)', () => {
  const text = 'Heures en temps universel\u00a0; ombre de la Terre\u00a0: 63\u202f% du Soleil caché à 21\u00a0h\u00a005';
  for (let width = 40; width <= 800; width += 20) {
    const lines = wrapText(text, STYLE, width);
    for (const line of lines) {
      assert.ok(!/^[;:%]/.test(line), `width ${width}: a line starts with a sign that must stay with its word: ${JSON.stringify(line)}`);
    }
    // Nothing lost: the lines joined at the breaks give the text back, no-break spaces included.
    assert.equal(lines.join(' '), text, `width ${width}`);
  }
});

test('wrapText breaks at ordinary spaces to the width when a word fits (greedy, common practice)', () => {
  const lines = wrapText('one two three four five six seven eight nine ten', STYLE, 120);
  assert.ok(lines.length > 1);
  for (const line of lines) if (line.includes(' ')) assert.ok(measureText(line, STYLE) <= 120, line);
});
