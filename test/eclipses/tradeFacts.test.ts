/** Facts of the trade (common practice unless marked) that any correct catalogue obeys, 1900–2100. */
import assert from 'node:assert/strict';
import { test } from 'node:test';
import { Body, GeoVector, Ecliptic, SearchGlobalSolarEclipse, NextGlobalSolarEclipse } from 'astronomy-engine';
import { ephemerisTime } from '../../src/ephemeris/bodies.ts';
import { SYNODIC_MONTH_DAYS } from '../../src/eclipses/common/lunations.ts';
import { catalogue1900to2100 } from './support.ts';

const danjon = catalogue1900to2100('danjon');

test('greatest eclipse falls at full Moon: ecliptic longitudes differ by 180° within 0.2° (common practice: opposition; Meeus, Astronomical Algorithms, ch. 54)', () => {
  for (const e of danjon) {
    const time = ephemerisTime(e.greatest.ttDays);
    const moonLon = Ecliptic(GeoVector(Body.Moon, time, true)).elon;
    const sunLon = Ecliptic(GeoVector(Body.Sun, time, true)).elon;
    const elongation = Math.abs((((moonLon - sunLon) % 360) + 360) % 360 - 180);
    assert.ok(elongation < 0.2, `${e.id}: ${elongation.toFixed(3)}°`);
  }
});

test('a solar eclipse falls within 16 days of every lunar eclipse (common practice: half an eclipse season)', () => {
  const solar: number[] = [];
  let s = SearchGlobalSolarEclipse(new Date('1899-11-01T00:00:00Z'));
  while (s.peak.date < new Date('2101-03-01T00:00:00Z')) {
    solar.push(s.peak.tt);
    s = NextGlobalSolarEclipse(s.peak);
  }
  for (const e of danjon) {
    const nearest = Math.min(...solar.map((tt) => Math.abs(tt - e.greatest.ttDays)));
    assert.ok(nearest <= 16, `${e.id}: ${nearest.toFixed(1)} d`);
  }
});

test('successive lunar eclipses are 1, 5 or 6 synodic months apart (common practice; synodic month 29.530589 d, Meeus, Astronomical Algorithms, ch. 49)', () => {
  const seen = new Set<number>();
  for (let i = 1; i < danjon.length; i++) {
    const months = (danjon[i]!.greatest.ttDays - danjon[i - 1]!.greatest.ttDays) / SYNODIC_MONTH_DAYS;
    const whole = Math.round(months);
    assert.ok(Math.abs(months - whole) < 0.1, `${danjon[i]!.id}: ${months}`);
    assert.ok([1, 5, 6].includes(whole), `${danjon[i]!.id}: ${whole} months`);
    seen.add(whole);
  }
  assert.deepEqual([...seen].sort(), [1, 5, 6]);
});

test('2 to 5 lunar eclipses each calendar year, and 1900–2100 has years of 2, 3 and 4 only (common practice)', () => {
  const perYear = new Map<number, number>();
  for (const e of danjon) {
    const year = Number(e.id.slice(0, 4));
    perYear.set(year, (perYear.get(year) ?? 0) + 1);
  }
  for (let year = 1900; year <= 2100; year++) {
    const count = perYear.get(year) ?? 0;
    assert.ok(count >= 2 && count <= 4, `${year}: ${count}`);
  }
  assert.deepEqual([...new Set(perYear.values())].sort(), [2, 3, 4]);
});

test('eclipses 223 lunations apart share a saros number, similar magnitude, and greatest ~8 h later, 95°–132° further west (common practice: saros of 223 lunations, 6585.32 d)', () => {
  let pairs = 0;
  for (const e of danjon) {
    const later = danjon.find((o) => Math.abs(o.greatest.ttDays - e.greatest.ttDays - 223 * SYNODIC_MONTH_DAYS) < 2);
    if (!later) continue;
    pairs++;
    assert.equal(later.saros, e.saros, `${e.id} → ${later.id}`);
    assert.ok(Math.abs(later.penumbralMagnitude - e.penumbralMagnitude) < 0.2, `${e.id} → ${later.id}: magnitude`);
    const westward = (((e.subLunar.greatest[0] - later.subLunar.greatest[0]) % 360) + 360) % 360;
    assert.ok(westward > 95 && westward < 132, `${e.id} → ${later.id}: ${westward.toFixed(1)}° west`);
  }
  assert.ok(pairs > 380, `pairs ${pairs}`);
});

test('one inex (358 lunations) later is the next saros series (van den Bergh 1955, from memory)', () => {
  let pairs = 0;
  for (const e of danjon) {
    const later = danjon.find((o) => Math.abs(o.greatest.ttDays - e.greatest.ttDays - 358 * SYNODIC_MONTH_DAYS) < 2);
    if (!later) continue;
    pairs++;
    assert.equal(later.saros, e.saros + 1, `${e.id} → ${later.id}`);
  }
  assert.ok(pairs > 250);
});

test('six lunations on, the saros number grows by 5 (38 × 6 ≡ 5 mod 223; saros and inex, van den Bergh 1955, from memory)', () => {
  for (const e of danjon) {
    const later = danjon.find((o) => Math.abs(o.greatest.ttDays - e.greatest.ttDays - 6 * SYNODIC_MONTH_DAYS) < 2);
    if (later) assert.equal(later.saros, e.saros + 5, `${e.id} → ${later.id}`);
  }
});

test('Chauvenet magnitudes are larger than Danjon\'s for every eclipse; the pairing is the same apart from faint penumbrals (Explanatory Supplement to the Astronomical Almanac, 3rd ed., ch. 11)', () => {
  const chauvenet = catalogue1900to2100('chauvenet');
  const byId = new Map(chauvenet.map((e) => [e.id, e]));
  for (const d of danjon) {
    const c = byId.get(d.id);
    assert.ok(c, `${d.id} missing under Chauvenet`);
    assert.ok(c.umbralMagnitude > d.umbralMagnitude && c.penumbralMagnitude > d.penumbralMagnitude, d.id);
  }
  for (const c of chauvenet) if (!danjon.some((d) => d.id === c.id)) assert.ok(c.penumbralMagnitude < 0.05, c.id);
});

test('the sub-lunar point drifts west about 14.5° an hour (common practice: the Earth turns 15°/h, less the Moon\'s own motion)', () => {
  for (const e of danjon) {
    const p1 = e.contacts.P1!;
    const p4 = e.contacts.P4!;
    const hours = (p4.utDays - p1.utDays) * 24;
    const westward = (((e.subLunar.P1![0] - e.subLunar.P4![0]) % 360) + 360) % 360;
    const rate = westward / hours;
    assert.ok(rate > 14.2 && rate < 14.8, `${e.id}: ${rate.toFixed(2)}°/h`);
  }
});
