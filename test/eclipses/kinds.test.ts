import assert from 'node:assert/strict';
import { test } from 'node:test';
import { SUPPORTED_RANGE } from '../../src/eclipses/common/range.ts';
import { eclipseById, eclipseNear, findEclipses, nextEclipse, type Eclipse } from '../../src/eclipses/kinds.ts';
import { findLunarEclipses } from '../../src/eclipses/lunar/catalogue.ts';
import { findSolarEclipses } from '../../src/eclipses/solar/catalogue.ts';
import { InputError } from '../../src/errors.ts';

const isInputError = (parameter: string, ...mentions: string[]) => (e: unknown) =>
  e instanceof InputError && e.parameter === parameter && mentions.every((m) => e.message.includes(m));

const year = (y: number) => ({ from: new Date(Date.UTC(y, 0, 1)), to: new Date(Date.UTC(y + 1, 0, 1)) });

test('no UTC date of years 1000–3000 holds two eclipses, of either or both kinds: ids are unique (whole range; about 6 s alone on one core)', () => {
  const all = findEclipses({ from: SUPPORTED_RANGE.from, to: SUPPORTED_RANGE.to, body: 'all' });
  const lunar = all.filter((e) => e.body === 'lunar').length;
  const solar = all.length - lunar;
  // Sanity of the sweep: 2 to 5 lunar and 2 to 5 solar eclipses a year (common practice), so roughly 2.4 of each a year over 2001 years.
  assert.ok(lunar > 2.2 * 2001 && lunar < 2.6 * 2001, `lunar ${lunar}`);
  assert.ok(solar > 2.2 * 2001 && solar < 2.6 * 2001, `solar ${solar}`);
  const ids = new Set(all.map((e) => e.id));
  assert.equal(ids.size, all.length, 'a date holds two eclipses');
  // Why it holds: two eclipses are at least half a lunation apart (new moon to full moon, 13.9–15.6 days; from memory),
  // and two of one kind at least one lunation. The least gap measured here: 13.90 days (1480-06-17 → 1480-07-01).
  let leastGapDays = Infinity;
  for (let i = 1; i < all.length; i++) {
    const gap = all[i]!.greatest.utDays - all[i - 1]!.greatest.utDays;
    assert.ok(gap > 0, `not in time order at ${all[i]!.id}`);
    if (all[i]!.body === all[i - 1]!.body) assert.ok(gap > 29, `two ${all[i]!.body} eclipses ${gap} days apart at ${all[i]!.id}`);
    leastGapDays = Math.min(leastGapDays, gap);
  }
  assert.ok(leastGapDays > 13.5, `least gap ${leastGapDays} days`);
});

test('findEclipses merges both kinds in time order and keeps to the body asked for (2024: from memory)', () => {
  const all = findEclipses({ ...year(2024) });
  assert.deepEqual(all.map((e) => [e.body, e.id, e.kind]), [
    ['lunar', '2024-03-25', 'penumbral'],
    ['solar', '2024-04-08', 'total'],
    ['lunar', '2024-09-18', 'partial'],
    ['solar', '2024-10-02', 'annular'],
  ]);
  // Each body alone is exactly its own catalogue (the per-kind modules behind the entry point).
  assert.deepEqual(findEclipses({ ...year(2024), body: 'lunar' }), findLunarEclipses(year(2024)));
  assert.deepEqual(findEclipses({ ...year(2024), body: 'solar' }), findSolarEclipses(year(2024)));
  const [first] = findEclipses({ ...year(2024), body: 'lunar', convention: 'chauvenet' });
  assert.ok(first?.body === 'lunar' && first.convention === 'chauvenet');
});

test('findEclipses checks the body and the range like the catalogues (common practice: errors name the parameter)', () => {
  assert.throws(() => findEclipses({ ...year(2024), body: 'moon' as never }), isInputError('body', 'lunar, solar, all', '"moon"'));
  assert.throws(() => findEclipses({ from: new Date('0999-06-01T00:00:00Z'), to: new Date('1000-06-01T00:00:00Z') }), isInputError('from'));
  assert.throws(() => findEclipses({ from: new Date('3000-06-01T00:00:00Z'), to: new Date('3001-06-01T00:00:00Z') }), isInputError('to'));
});

test('the ends of the range, years 1000 and 3000, hold eclipses of both kinds in time order (common practice: test the edges)', () => {
  for (const list of [findEclipses(year(1000)), findEclipses(year(3000))]) {
    assert.ok(list.some((e) => e.body === 'lunar') && list.some((e) => e.body === 'solar'));
    for (let i = 1; i < list.length; i++) assert.ok(list[i]!.greatest.utDays > list[i - 1]!.greatest.utDays);
  }
});

test('eclipseById resolves an id to its own eclipse, of either kind, or says what is wrong (ids: 2024 eclipses from memory)', () => {
  const solar = eclipseById('2024-04-08');
  assert.equal(solar.body, 'solar');
  assert.equal(solar.kind, 'total');
  const lunar: Eclipse = eclipseById('2024-03-25');
  assert.equal(lunar.body, 'lunar');
  assert.equal(eclipseById('2024-04-08', { body: 'solar' }).id, '2024-04-08');
  assert.throws(() => eclipseById('2024-04-08', { body: 'lunar' }), isInputError('id', 'no lunar eclipse on that date'));
  assert.throws(() => eclipseById('2024-04-09'), isInputError('id', 'no eclipse on that date'));
  for (const bad of ['2024-4-8', '2024-02-30', '0999-12-31', '3001-01-01', ' 2024-04-08', 'next']) {
    assert.throws(() => eclipseById(bad), isInputError('id', 'YYYY-MM-DD'), bad);
  }
  assert.throws(() => eclipseById('2024-04-08', { body: 'sun' as never }), isInputError('body'));
});

test('a date near both a lunar and a solar eclipse is an InputError naming both, unless a body is given (2025-09-07 lunar, 2025-09-21 solar: from memory)', () => {
  const between = new Date('2025-09-14T12:00:00Z');
  assert.throws(() => eclipseNear(between, 7.5), isInputError('body', 'the lunar eclipse of 2025-09-07', 'the solar eclipse of 2025-09-21'));
  assert.throws(() => eclipseNear(between, 7.5, { body: 'all' }), isInputError('body', '2025-09-14', '"all"'));
  assert.equal(eclipseNear(between, 7.5, { body: 'lunar' })?.id, '2025-09-07');
  assert.equal(eclipseNear(between, 7.5, { body: 'solar' })?.id, '2025-09-21');
  // Nearer one than the other, but both within reach: still both are named.
  assert.throws(() => eclipseNear(new Date('2025-09-10T00:00:00Z'), 12), isInputError('body', '2025-09-07', '2025-09-21'));
  // An exact id resolves to its own eclipse even with the other kind within reach.
  assert.equal(eclipseNear(new Date('2025-09-07T12:00:00Z'), 20)?.body, 'lunar');
  assert.equal(eclipseNear(new Date('2025-09-21T00:30:00Z'), 20)?.body, 'solar');
  // Only one kind within reach: that one.
  assert.equal(eclipseNear(new Date('2025-09-05T12:00:00Z'), 7.5)?.id, '2025-09-07');
  assert.equal(eclipseNear(new Date('2025-06-01T12:00:00Z'), 7.5), undefined);
  assert.throws(() => eclipseNear(new Date(Number.NaN), 7.5), isInputError('date'));
});

test('nextEclipse gives the first eclipse of the chosen kinds at or after an instant (2024 eclipses: from memory)', () => {
  const after = new Date('2024-01-01T00:00:00Z');
  assert.equal(nextEclipse(after)?.id, '2024-03-25');
  assert.equal(nextEclipse(after, { body: 'solar' })?.id, '2024-04-08');
  assert.equal(nextEclipse(new Date('2024-03-26T00:00:00Z'))?.id, '2024-04-08');
  assert.equal(nextEclipse(new Date('3000-12-31T23:00:00Z')), undefined);
});
