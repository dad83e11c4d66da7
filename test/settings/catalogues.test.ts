/**
 * Eclipses are found through one table keyed by body, not by a body's function called by name: each entry
 * finds the eclipses astronomy-engine's own searches find (SearchLunarEclipse, SearchGlobalSolarEclipse: an
 * independent library), `eclipseNear` and `nextEclipse` dispatch the same way, and the outputs render the
 * lunar body only until solar output arrives.
 */
import assert from 'node:assert/strict';
import { test } from 'node:test';
import { SearchGlobalSolarEclipse, SearchLunarEclipse } from 'astronomy-engine';
import { CATALOGUES, eclipseNear, findEclipses, nextEclipse, OUTPUT_BODY, RENDERED_BODIES } from '../../src/settings/catalogues.ts';
import { chooseEclipse } from '../../src/settings/choose.ts';

const choice = { convention: 'danjon' } as const;
const range = { from: new Date('2024-01-01T00:00:00Z'), to: new Date('2025-01-01T00:00:00Z') };
const day = (date: Date) => date.toISOString().slice(0, 10);

test('each body\'s entry finds what astronomy-engine\'s search finds first in 2024 (its own search, an independent check)', () => {
  const solar = findEclipses('solar', range, choice);
  const lunar = findEclipses('lunar', range, choice);
  assert.ok(solar.every((e) => e.body === 'solar') && lunar.every((e) => e.body === 'lunar'));
  assert.equal(solar[0]!.id, day(SearchGlobalSolarEclipse(range.from).peak.date));
  assert.equal(lunar[0]!.id, day(SearchLunarEclipse(range.from).peak.date));
  assert.equal(solar[0]!.kind, 'total');
});

test('nearest and next dispatch on the body (astronomy-engine\'s searches)', () => {
  const solarPeak = SearchGlobalSolarEclipse(range.from).peak.date;
  const lunarPeak = SearchLunarEclipse(range.from).peak.date;
  assert.equal(eclipseNear('solar', new Date(solarPeak.getTime() + 3 * 86_400_000), 7.5, choice)!.id, day(solarPeak));
  assert.equal(eclipseNear('lunar', new Date(solarPeak.getTime() + 3 * 86_400_000), 7.5, choice), undefined, 'no lunar eclipse within 7.5 days of that solar one');
  assert.equal(nextEclipse('lunar', range.from, choice)!.id, day(lunarPeak));
  assert.equal(chooseEclipse({ kind: 'next' }, choice, range.from, 'solar').id, day(solarPeak));
  // By default the body the outputs render.
  assert.equal(chooseEclipse({ kind: 'next' }, choice, range.from).body, OUTPUT_BODY);
});

test('the outputs render the lunar body only, for now; every body has a catalogue (common practice: dispatch, not a fork)', () => {
  assert.deepEqual(RENDERED_BODIES, ['lunar']);
  assert.equal(OUTPUT_BODY, 'lunar');
  assert.deepEqual(Object.keys(CATALOGUES).sort(), ['lunar', 'solar']);
});
