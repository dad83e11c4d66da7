import assert from 'node:assert/strict';
import { test } from 'node:test';
import { findLunarEclipses } from '../../src/eclipses/lunar/catalogue.ts';
import { SUPPORTED_RANGE } from '../../src/eclipses/common/range.ts';
import { fixedDeltaTModel } from '../../src/ephemeris/deltaT.ts';
import { InputError } from '../../src/errors.ts';

test('the ends of the supported range, years 1000 and 3000, give eclipses with every field (common practice: test the edges)', () => {
  const first = findLunarEclipses({ from: SUPPORTED_RANGE.from, to: new Date('1001-01-01T00:00:00Z') });
  const last = findLunarEclipses({ from: new Date('3000-01-01T00:00:00Z'), to: SUPPORTED_RANGE.to });
  for (const list of [first, last]) {
    assert.ok(list.length >= 2 && list.length <= 5, `count ${list.length}`);
    for (const e of list) {
      assert.ok(e.contacts.P1 && e.contacts.P4 && e.subLunar.P1 && e.durations.penumbralSeconds > 0);
      assert.equal(e.deltaT.source, 'long-term');
    }
  }
  assert.ok(first[0]!.deltaT.seconds > 1500, 'ΔT near 1000 is about 1570 s (Espenak & Meeus 2006)');
});

test('outside years 1000–3000, or an empty range, is an InputError naming the bound', () => {
  assert.throws(() => findLunarEclipses({ from: new Date('0999-12-31T00:00:00Z'), to: new Date('1001-01-01T00:00:00Z') }),
    (e: unknown) => e instanceof InputError && e.parameter === 'from');
  assert.throws(() => findLunarEclipses({ from: new Date('2999-01-01T00:00:00Z'), to: new Date('3001-01-02T00:00:00Z') }),
    (e: unknown) => e instanceof InputError && e.parameter === 'to');
  assert.throws(() => findLunarEclipses({ from: new Date('2026-01-01T00:00:00Z'), to: new Date('2025-01-01T00:00:00Z') }),
    (e: unknown) => e instanceof InputError && e.parameter === 'to');
});

test('a user ΔT moves the UT instants by exactly the difference and leaves TT and magnitudes alone', () => {
  const range = { from: new Date('2025-03-13T00:00:00Z'), to: new Date('2025-03-16T00:00:00Z') };
  const [standard] = findLunarEclipses(range);
  const [custom] = findLunarEclipses({ ...range, deltaT: fixedDeltaTModel(100) });
  assert.ok(standard && custom);
  assert.equal(custom.deltaT.source, 'user');
  assert.ok(Math.abs(custom.greatest.ttDays - standard.greatest.ttDays) * 86_400 < 0.01);
  const shift = (standard.greatest.utDays - custom.greatest.utDays) * 86_400;
  assert.ok(Math.abs(shift - (100 - standard.deltaT.seconds)) < 0.01, `shift ${shift}`);
  assert.equal(custom.umbralMagnitude, standard.umbralMagnitude);
  // The Earth turns 15″ of arc per second of time: 31 s more ΔT puts the Moon ~0.13° further east.
  const eastward = custom.subLunar.greatest[0] - standard.subLunar.greatest[0];
  assert.ok(Math.abs(eastward - (shift * 360.9856) / 86_400) < 0.001, `eastward ${eastward}`);
});
