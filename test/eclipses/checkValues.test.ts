/**
 * Check values for individual eclipses. Sources are named per case: catalogue
 * values (Danjon) recalled from memory, once rounded and once in full —
 * "from memory" means recalled, not looked up; tolerances follow the issue
 * (contacts 30 s, magnitudes 0.002).
 */
import assert from 'node:assert/strict';
import { test } from 'node:test';
import { findLunarEclipses } from '../../src/eclipses/lunar/catalogue.ts';
import type { ContactName } from '../../src/eclipses/lunar/contacts.ts';
import { utDaysFromDate } from '../../src/ephemeris/time.ts';
import { secondsBetween } from './support.ts';

interface CheckValue {
  source: string;
  /** Contacts given to the minute only, magnitudes to three decimals. */
  rounded?: boolean;
  date: string;
  kind: 'total' | 'partial' | 'penumbral';
  greatest: string;
  umbralMagnitude: number;
  penumbralMagnitude?: number;
  gamma?: number;
  saros?: number;
  contacts?: Partial<Record<ContactName, string>>;
  totalMinutes?: number;
}

const CHECKS: CheckValue[] = [
  {
    source: 'rounded catalogue values (Danjon), from memory', rounded: true,
    date: '2025-03-14', kind: 'total', greatest: '06:58:45', umbralMagnitude: 1.178, penumbralMagnitude: 2.26,
    contacts: { U2: '06:26:00', U3: '07:31:00' }, totalMinutes: 65, saros: 123,
  },
  {
    source: 'catalogue values, from memory',
    date: '2025-03-14', kind: 'total', greatest: '06:58:43', umbralMagnitude: 1.1784, penumbralMagnitude: 2.2595, gamma: 0.3485,
    contacts: { U1: '05:09:40', U2: '06:26:06', U3: '07:31:26', U4: '08:47:52' },
  },
  {
    source: 'catalogue values, from memory',
    date: '2022-11-08', kind: 'total', greatest: '10:59:11', umbralMagnitude: 1.3589, gamma: 0.257, saros: 136,
    contacts: { U1: '09:09:12', U2: '10:16:39', U3: '11:41:36', U4: '12:49:03' },
  },
  {
    source: 'catalogue values, from memory',
    date: '2018-07-27', kind: 'total', greatest: '20:21:44', umbralMagnitude: 1.6087, gamma: 0.1168, saros: 129,
    contacts: { U2: '19:30:15', U3: '21:13:12' },
  },
  {
    source: 'catalogue values, from memory',
    date: '2019-01-21', kind: 'total', greatest: '05:12:14', umbralMagnitude: 1.1953, gamma: 0.3684, saros: 134,
    contacts: { U2: '04:41:17', U3: '05:43:16' },
  },
  {
    source: 'catalogue values, from memory',
    date: '2021-05-26', kind: 'total', greatest: '11:18:43', umbralMagnitude: 1.0095, gamma: 0.4774, saros: 121, totalMinutes: 15,
  },
  {
    source: 'catalogue values, from memory',
    date: '2025-09-07', kind: 'total', greatest: '18:11:48', umbralMagnitude: 1.3619, gamma: -0.2752, saros: 128, totalMinutes: 82,
  },
  {
    source: 'catalogue values, from memory',
    date: '2026-03-03', kind: 'total', umbralMagnitude: 1.1507, greatest: '11:33:40', gamma: -0.3765, saros: 133, totalMinutes: 58,
  },
  {
    source: 'catalogue values, from memory',
    date: '2026-08-28', kind: 'partial', umbralMagnitude: 0.9298, greatest: '04:12:50', gamma: 0.4964, saros: 138,
  },
  {
    source: 'catalogue values, from memory',
    date: '2000-01-21', kind: 'total', umbralMagnitude: 1.3246, greatest: '04:43:34', saros: 124,
  },
];

const at = (date: string, time: string) => utDaysFromDate(new Date(`${date}T${time}Z`));

for (const check of CHECKS) {
  test(`${check.date} ${check.kind} (${check.source})`, () => {
    const found = findLunarEclipses({ from: new Date(`${check.date}T00:00:00Z`), to: new Date(`${check.date}T23:59:59Z`) });
    assert.equal(found.length, 1);
    const eclipse = found[0]!;
    assert.equal(eclipse.kind, check.kind);
    const greatestError = secondsBetween(eclipse.greatest.utDays, at(check.date, check.greatest));
    assert.ok(greatestError <= 30, `greatest off by ${greatestError.toFixed(0)} s`);
    const magTolerance = check.rounded ? 0.0006 : 0.002;
    assert.ok(Math.abs(eclipse.umbralMagnitude - check.umbralMagnitude) <= magTolerance, `umbral ${eclipse.umbralMagnitude}`);
    if (check.penumbralMagnitude !== undefined) {
      assert.ok(Math.abs(eclipse.penumbralMagnitude - check.penumbralMagnitude) <= magTolerance, `penumbral ${eclipse.penumbralMagnitude}`);
    }
    if (check.gamma !== undefined) assert.ok(Math.abs(eclipse.gamma - check.gamma) <= 0.001, `gamma ${eclipse.gamma}`);
    if (check.saros !== undefined) assert.equal(eclipse.saros, check.saros);
    for (const [name, time] of Object.entries(check.contacts ?? {}) as [ContactName, string][]) {
      const contact = eclipse.contacts[name];
      assert.ok(contact, `${name} missing`);
      // Contacts given to the minute only: allow the minute's rounding on top.
      const tolerance = check.rounded ? 60 : 30;
      const error = secondsBetween(contact.utDays, at(check.date, time));
      assert.ok(error <= tolerance, `${name} off by ${error.toFixed(0)} s`);
    }
    if (check.totalMinutes !== undefined) {
      assert.ok(Math.abs(eclipse.durations.totalSeconds! / 60 - check.totalMinutes) < 1, `totality ${eclipse.durations.totalSeconds} s`);
    }
  });
}

test('Chauvenet gives the same instants of greatest and larger magnitudes, about +0.005 (Chauvenet 1891 enlarges by 1/50, Danjon 1951 by 1/100 of the parallax: Explanatory Supplement to the Astronomical Almanac, 3rd ed., ch. 11)', () => {
  const range = { from: new Date('2025-03-14T00:00:00Z'), to: new Date('2025-03-15T00:00:00Z') };
  const [d] = findLunarEclipses({ ...range, convention: 'danjon' });
  const [c] = findLunarEclipses({ ...range, convention: 'chauvenet' });
  assert.ok(d && c);
  assert.ok(secondsBetween(d.greatest.utDays, c.greatest.utDays) < 1);
  const difference = c.umbralMagnitude - d.umbralMagnitude;
  assert.ok(difference > 0.003 && difference < 0.007, `difference ${difference}`);
  assert.ok(c.durations.totalSeconds! > d.durations.totalSeconds!);
  assert.ok(c.durations.penumbralSeconds > d.durations.penumbralSeconds);
});
