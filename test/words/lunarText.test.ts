/**
 * The lunar catalogue's small functions. Plural forms follow CLDR's English
 * rules through Intl.PluralRules (one: exactly 1; other: 0 and the rest);
 * compass words are the eight points at 45° (common practice); hemisphere
 * letters N/S/E/W after the absolute value (ISO 6709's human-readable form).
 */
import assert from 'node:assert/strict';
import { test } from 'node:test';
import { coordinatesText, countryName } from '../../src/words/common.ts';
import { compassWord, LUNAR_ENGLISH } from '../../src/words/lunar/text.ts';

test('counts agree with their noun (CLDR English plural rules)', () => {
  assert.equal(LUNAR_ENGLISH.table.eclipses(0), '0 lunar eclipses');
  assert.equal(LUNAR_ENGLISH.table.eclipses(1), '1 lunar eclipse');
  assert.equal(LUNAR_ENGLISH.table.eclipses(2), '2 lunar eclipses');
  assert.equal(LUNAR_ENGLISH.sheet.eclipses(1), '1 eclipse');
  assert.equal(LUNAR_ENGLISH.sheet.eclipses(21), '21 eclipses');
});

test('compass words: eight points, north again past 337.5°', () => {
  assert.equal(compassWord(0), 'north');
  assert.equal(compassWord(22.4), 'north');
  assert.equal(compassWord(22.5), 'northeast'); // Math.round(0.5) = 1
  assert.equal(compassWord(180), 'south');
  assert.equal(compassWord(292), 'west');
  assert.equal(compassWord(359.9), 'north');
});

test('coordinates: two decimals, the hemisphere letter after; the equator and prime meridian count as N and E', () => {
  assert.equal(coordinatesText(-35.2809, 149.13), '35.28°S, 149.13°E');
  assert.equal(coordinatesText(0, 0), '0.00°N, 0.00°E');
  assert.equal(coordinatesText(78.22, -180), '78.22°N, 180.00°W');
  assert.equal(coordinatesText(-90, 179.999), '90.00°S, 180.00°E');
});

test('country names: the prose form where English uses one, else ISO 3166 via i18n-iso-countries, else the basemap name', () => {
  assert.equal(countryName({ code: 'NL', name: 'Netherlands' }), 'the Netherlands');
  assert.equal(countryName({ code: 'NZ', name: 'N. Zealand' }), 'New Zealand'); // i18n-iso-countries, English
  assert.equal(countryName({ name: 'Somaliland' }), 'Somaliland');
});

test('the ΔT span: one value when all agree, else least–most, to 0.1 s', () => {
  assert.equal(LUNAR_ENGLISH.table.deltaTSpan([69.2, 69.2]), '69.2 s');
  assert.equal(LUNAR_ENGLISH.table.deltaTSpan([69.24, 73.06]), '69.2–73.1 s');
});
