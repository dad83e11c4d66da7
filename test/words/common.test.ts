/**
 * The one duration formatter and the one minute-rounder. Expected values are
 * worked by hand from the definition (60 s to the minute, 60 min to the hour;
 * half a minute rounds up, as Math.round does, ECMA-262 §21.3.2.28) and the
 * printed forms are those the outputs already carried ("3 h 27 min" on
 * figures and captions, "3h 38m" in the list table): common practice.
 */
import assert from 'node:assert/strict';
import { test } from 'node:test';
import { ENGLISH, formatDuration, listWords, roundToMinute } from '../../src/words/common.ts';

test('roundToMinute: whole minutes, half a minute rounds up, never a signed zero', () => {
  assert.equal(roundToMinute(0), 0);
  assert.equal(roundToMinute(29.9), 0);
  assert.equal(roundToMinute(30), 1); // ECMA-262 Math.round: x.5 rounds toward +∞
  assert.equal(roundToMinute(89.99), 1);
  assert.equal(roundToMinute(3 * 3600 + 37 * 60 + 31), 218);
  assert.ok(Object.is(roundToMinute(-1), 0), '-1 s rounds to +0, which prints as "0"');
});

test('formatDuration, long form: minutes alone below an hour, then hours and two-digit minutes', () => {
  assert.equal(formatDuration(58 * 60), '58 min');
  assert.equal(formatDuration(59 * 60 + 29), '59 min');
  assert.equal(formatDuration(59 * 60 + 30), '1 h 00 min'); // rounds up into the hour
  assert.equal(formatDuration(3 * 3600 + 7 * 60), '3 h 07 min');
  assert.equal(formatDuration(5 * 3600 + 27 * 60 + 10), '5 h 27 min');
  assert.equal(formatDuration(-1), '0 min');
});

test('formatDuration, compact form for tables', () => {
  assert.equal(formatDuration(0, 'compact'), '0m');
  assert.equal(formatDuration(45 * 60, 'compact'), '45m');
  assert.equal(formatDuration(3 * 3600 + 38 * 60, 'compact'), '3h 38m');
  assert.equal(formatDuration(12 * 3600 + 5 * 60, 'compact'), '12h 05m');
});

test('formatDuration writes digits through Intl: a catalogue with Arabic-Indic digits prints them (CLDR arab numbering system)', () => {
  const words = { ...ENGLISH, locale: 'ar-EG', numerals: { digits: 'intl' } } as const;
  assert.equal(formatDuration(3 * 3600 + 7 * 60, 'long', words), '٣ h ٠٧ min');
});

test('listWords: no serial comma', () => {
  assert.equal(listWords([]), '');
  assert.equal(listWords(['Africa']), 'Africa');
  assert.equal(listWords(['Africa', 'Asia']), 'Africa and Asia');
  assert.equal(listWords(['Africa', 'Asia', 'Oceania']), 'Africa, Asia and Oceania');
});
