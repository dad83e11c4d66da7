/**
 * Settings find eclipses through src/eclipses/kinds.ts only: the typed choice maps onto its options, and
 * `chooseEclipse` resolves a body's eclipse as astronomy-engine's own searches find it (SearchLunarEclipse,
 * SearchGlobalSolarEclipse: an independent library).
 */
import assert from 'node:assert/strict';
import { test } from 'node:test';
import { SearchGlobalSolarEclipse, SearchLunarEclipse } from 'astronomy-engine';
import * as settings from '../../src/settings/catalogues.ts';
import { chooseEclipse } from '../../src/settings/choose.ts';
import { InputError } from '../../src/errors.ts';

const choice = { convention: 'danjon' } as const;
const from = new Date('2024-01-01T00:00:00Z');
const day = (date: Date) => date.toISOString().slice(0, 10);

test('settings keep no second catalogue: only the mapping onto kinds.ts (common practice: one dispatch)', () => {
  assert.deepEqual(Object.keys(settings).sort(), ['deltaTModelOf', 'ofBody', 'searchOptionsOf']);
  const options = settings.searchOptionsOf({ convention: 'chauvenet', deltaTSeconds: 70 }, 'solar');
  assert.equal(options.body, 'solar');
  assert.equal(options.convention, 'chauvenet');
  assert.equal(options.deltaT!.at(2024.5).seconds, 70); // a fixed ΔT is that value at every instant
});

test('next and near resolve per body as astronomy-engine\'s searches find them', () => {
  const solarPeak = SearchGlobalSolarEclipse(from).peak.date;
  const lunarPeak = SearchLunarEclipse(from).peak.date;
  assert.equal(chooseEclipse({ kind: 'next' }, choice, from, 'solar').id, day(solarPeak));
  assert.equal(chooseEclipse({ kind: 'next' }, choice, from, 'lunar').id, day(lunarPeak));
  // 2024-03-25 (lunar) comes before 2024-04-08 (solar): with `all`, the lunar one is next.
  assert.equal(chooseEclipse({ kind: 'next' }, choice, from, 'all').id, day(lunarPeak));
  const threeDaysAfter = new Date(solarPeak.getTime() + 3 * 86_400_000);
  assert.equal(chooseEclipse({ kind: 'date', date: threeDaysAfter, text: day(threeDaysAfter) }, choice, from, 'solar').id, day(solarPeak));
  assert.throws(() => chooseEclipse({ kind: 'date', date: threeDaysAfter, text: day(threeDaysAfter) }, choice, from, 'lunar'), InputError);
});
