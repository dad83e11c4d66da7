/**
 * Numbers as the catalogues print them without Intl's number formatting: each
 * catalogue's decimal sign, and ASCII digits for whole numbers, are what
 * Intl.NumberFormat (CLDR, through Node's ICU) writes for its language; a
 * catalogue moved to another region writes numbers through Intl.
 */
import assert from 'node:assert/strict';
import { test } from 'node:test';
import { decimalIn, ENGLISH, fixedIn, formatDuration, wholeIn } from '../../src/words/common.ts';
import { chooseLanguage } from '../../src/settings/language.ts';
import { LANGUAGE_TAGS } from '../../src/settings/languageTags.ts';

const intlSign = (locale: string) => new Intl.NumberFormat(locale).formatToParts(1.5).find((p) => p.type === 'decimal')!.value;

test('each catalogue\'s decimal sign is the one Intl.NumberFormat writes for its locale (CLDR)', () => {
  for (const tag of LANGUAGE_TAGS) {
    const common = chooseLanguage(tag).common;
    assert.deepEqual(common.numerals, { digits: 'ascii', decimalSign: intlSign(common.locale) }, tag);
  }
  assert.deepEqual(ENGLISH.numerals, { digits: 'ascii', decimalSign: '.' });
  assert.equal(fixedIn(2.5, 1, chooseLanguage('de').common), '2,5', 'German writes a decimal comma (from memory)');
});

test('whole numbers as durations print them are Intl.NumberFormat\'s, ungrouped and to two digits, in every catalogue\'s locale', () => {
  for (const tag of LANGUAGE_TAGS) {
    const common = chooseLanguage(tag).common;
    const whole = new Intl.NumberFormat(common.locale, { useGrouping: false, maximumFractionDigits: 0 });
    const twoDigits = new Intl.NumberFormat(common.locale, { useGrouping: false, maximumFractionDigits: 0, minimumIntegerDigits: 2 });
    for (let minutes = 0; minutes <= 3000; minutes++) {
      const { hour, minute } = common.durationUnits.long;
      const expected = minutes < 60 ? `${whole.format(minutes)}${minute}` : `${whole.format(Math.floor(minutes / 60))}${hour} ${twoDigits.format(minutes % 60)}${minute}`;
      assert.equal(formatDuration(minutes * 60, 'long', common), expected, `${tag}: ${minutes} min`);
    }
  }
  assert.equal(formatDuration(3 * 3600 + 7 * 60, 'compact', ENGLISH), '3h 07m');
});

test('a catalogue moved to a region writes numbers as Intl does there: de-CH a decimal point (from memory), fr-CA a comma', () => {
  const swiss = chooseLanguage('de-CH').common;
  assert.deepEqual(swiss.numerals, { digits: 'intl' });
  assert.equal(intlSign('de-CH'), '.');
  assert.equal(decimalIn('Gamma 1.234, 69.2 s.', swiss), 'Gamma 1.234, 69.2 s.');
  assert.equal(decimalIn('Gamma 1.234, 69.2 s.', chooseLanguage('de').common), 'Gamma 1,234, 69,2 s.');
  const canadian = chooseLanguage('fr-CA').common;
  assert.equal(fixedIn(1.5, 2, canadian), `1${intlSign('fr-CA')}50`);
  assert.equal(fixedIn(1.5, 2, canadian), '1,50');
});

test('whole numbers (wholeIn) are Intl.NumberFormat\'s (signDisplay "negative", ECMA-402) in every catalogue\'s locale: halves rounded away from zero, negatives, two digits, no -0', () => {
  for (const tag of LANGUAGE_TAGS) {
    const common = chooseLanguage(tag).common;
    const whole = new Intl.NumberFormat(common.locale, { useGrouping: false, maximumFractionDigits: 0, signDisplay: 'negative' } as unknown as Intl.NumberFormatOptions);
    const twoDigits = new Intl.NumberFormat(common.locale, { useGrouping: false, maximumFractionDigits: 0, minimumIntegerDigits: 2, signDisplay: 'negative' } as unknown as Intl.NumberFormatOptions);
    for (let tenths = -4000; tenths <= 4000; tenths++) {
      const value = tenths / 10;
      assert.equal(wholeIn(value, common), whole.format(value + 0), `${tag}: ${value}`);
      assert.equal(wholeIn(value, common, 2), twoDigits.format(value + 0), `${tag}: ${value}, two digits`);
      // Through Intl itself (a region): the same text.
      assert.equal(wholeIn(value, { ...common, numerals: { digits: 'intl' } }), whole.format(value + 0), `${tag}: ${value}, Intl`);
    }
  }
  assert.equal(wholeIn(-0.4), '0');
  assert.equal(wholeIn(-2.5), '-3');
});
