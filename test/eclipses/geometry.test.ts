/**
 * The interpolated shadow track, the contacts and the sub-lunar point,
 * checked against direct ephemeris evaluation and against astronomy-engine's
 * full topocentric computation (Observer / Equator / Horizon).
 */
import assert from 'node:assert/strict';
import { test } from 'node:test';
import { Body, Equator, Horizon, Observer, SetDeltaTFunction } from 'astronomy-engine';
import { findLunarEclipses } from '../../src/eclipses/lunar/catalogue.ts';
import { CONTACT_LIMITS, CONTACT_ORDER } from '../../src/eclipses/lunar/contacts.ts';
import { danjon } from '../../src/eclipses/lunar/conventions.ts';
import { sampleShadowTrack, shadowStateDirect } from '../../src/eclipses/lunar/track.ts';
import { standardDeltaTModel } from '../../src/ephemeris/deltaT.ts';
import { astroTimeOf, decimalYearFromDays, type Moment } from '../../src/ephemeris/time.ts';
import type { LonLat } from '../../src/ephemeris/earth.ts';

const ARCSEC = Math.PI / (180 * 3600);
const eclipses = findLunarEclipses({ from: new Date('2018-01-01T00:00:00Z'), to: new Date('2030-01-01T00:00:00Z') });

test('nine-node track reproduces the direct ephemeris to 0.001″ over its ten hours (common practice: check an interpolant against its source)', () => {
  for (const e of eclipses.slice(0, 8)) {
    const centre = e.greatest.ttDays;
    const track = sampleShadowTrack(centre - 5 / 24, centre + 5 / 24);
    for (let i = 0; i <= 40; i++) {
      const tt = centre - 5 / 24 + (i / 40) * (10 / 24);
      const error = Math.abs(track.at(tt).separationRad - shadowStateDirect(tt).separationRad) / ARCSEC;
      assert.ok(error < 0.001, `${e.id} +${i}: ${error}″`);
    }
  }
});

test('each contact is a root of its own limit in the direct ephemeris, and the contacts are solved, not mirrored (contact definitions: Explanatory Supplement to the Astronomical Almanac, 3rd ed., ch. 11)', () => {
  let asymmetric = 0;
  for (const e of eclipses) {
    for (const name of CONTACT_ORDER) {
      const moment = e.contacts[name];
      if (!moment) continue;
      const residualArcsec = CONTACT_LIMITS[name](shadowStateDirect(moment.ttDays), danjon) / ARCSEC;
      // The Moon moves about 0.5″ per second against the shadow: 0.05″ is a tenth of a second.
      assert.ok(Math.abs(residualArcsec) < 0.05, `${e.id} ${name}: ${residualArcsec}″`);
    }
    const before = e.greatest.utDays - e.contacts.P1!.utDays;
    const after = e.contacts.P4!.utDays - e.greatest.utDays;
    if (Math.abs(before - after) * 86_400 > 2) asymmetric++;
  }
  assert.ok(asymmetric > 0, 'real eclipses are not exactly symmetric about greatest');
});

test('every contact that exists is reported, in order, and only those (kinds by umbral magnitude: Explanatory Supplement, 3rd ed., ch. 11)', () => {
  for (const e of eclipses) {
    const names = CONTACT_ORDER.filter((n) => e.contacts[n]);
    const expected = e.kind === 'total' ? CONTACT_ORDER : e.kind === 'partial' ? ['P1', 'U1', 'U4', 'P4'] : ['P1', 'P4'];
    assert.deepEqual(names, expected, e.id);
    const times = names.map((n) => e.contacts[n]!.utDays);
    assert.deepEqual([...times].sort((a, b) => a - b), times, `${e.id}: contacts in order`);
    assert.ok(times[0]! < e.greatest.utDays && e.greatest.utDays < times.at(-1)!);
  }
});

function topocentricMoonAltitude(point: LonLat, moment: Moment): number {
  const time = astroTimeOf(moment);
  const observer = new Observer(point[1], point[0], 0);
  const equ = Equator(Body.Moon, time, observer, true, true);
  return Horizon(time, observer, equ.ra, equ.dec, 'normal').altitude;
}

test('the Moon stands above 89° at the sub-lunar point and below −89° at its antipode (astronomy-engine topocentric Horizon, refraction on)', () => {
  // astronomy-engine's internal time steps must share our ΔT for this check.
  const model = standardDeltaTModel();
  SetDeltaTFunction((ut: number) => model.at(decimalYearFromDays(ut)).seconds);
  for (const e of eclipses) {
    const instants: [string, Moment, LonLat][] = [['greatest', e.greatest, e.subLunar.greatest]];
    for (const name of CONTACT_ORDER) if (e.contacts[name]) instants.push([name, e.contacts[name]!, e.subLunar[name]!]);
    for (const [label, moment, point] of instants) {
      const altitude = topocentricMoonAltitude(point, moment);
      assert.ok(altitude > 89, `${e.id} ${label}: ${altitude}`);
      const antipode: LonLat = [point[0] >= 0 ? point[0] - 180 : point[0] + 180, -point[1]];
      assert.ok(topocentricMoonAltitude(antipode, moment) < -89, `${e.id} ${label} antipode`);
    }
  }
});
