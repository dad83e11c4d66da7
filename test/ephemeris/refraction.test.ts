/**
 * Refraction only where it is defined: Saemundsson's formula (Meeus,
 * Astronomical Algorithms, eq. 16.4) from a true altitude of −1° up, the
 * geometric altitude below. Checked against astronomia's saemundsson (Meeus
 * ch. 16), astronomy-engine's Refraction and its topocentric Horizon.
 */
import assert from 'node:assert/strict';
import { test } from 'node:test';
import { Body, Equator, Horizon, Observer as AEObserver, Refraction } from 'astronomy-engine';
import refraction from 'astronomia/refraction';
import { ephemerisTime, moonPositionKm, sunPositionKm } from '../../src/ephemeris/bodies.ts';
import { astroTimeOf, momentFromUT } from '../../src/ephemeris/time.ts';
import { horizontal, refractionDeg, REFRACTION_FLOOR_DEG } from '../../src/ephemeris/topocentric.ts';
import { localJson, type LocalReport } from '../../src/outputs/localFormats.ts';
import { civilClock } from '../../src/ephemeris/civilTime.ts';
import { findLunarEclipses } from '../../src/eclipses/lunar/catalogue.ts';
import { localCircumstances } from '../../src/local/lunar.ts';
import { localSummary } from '../../src/words/lunar/text.ts';
import { useOurDeltaTInAstronomyEngine } from '../visibility/support.ts';

useOurDeltaTInAstronomyEngine();
const DEG = Math.PI / 180;

test('from a true −1° up, refraction is Saemundsson\'s: astronomia (Meeus eq. 16.4) and astronomy-engine\'s normal mode agree to 0.1″', () => {
  for (let h = REFRACTION_FLOOR_DEG; h <= 90; h += 0.25) {
    const ours = refractionDeg(h);
    assert.ok(Math.abs(ours - refraction.saemundsson(h * DEG) / DEG) * 3600 < 0.1, `${h}°: astronomia`);
    assert.ok(Math.abs(ours - Refraction('normal', h)) * 3600 < 0.1, `${h}°: astronomy-engine`);
  }
  // At the apparent horizon (h + R = 0) Saemundsson meets Bennett's formula for an apparent altitude of 0 (Meeus eq. 16.3, astronomia) within 0.2′.
  let lo = -1;
  let hi = 0;
  for (let i = 0; i < 60; i++) {
    const mid = (lo + hi) / 2;
    if (mid + refractionDeg(mid) > 0) hi = mid;
    else lo = mid;
  }
  assert.ok(Math.abs(refractionDeg(lo) - refraction.bennett(0) / DEG) * 60 < 0.2, `${refractionDeg(lo) * 60}′ at the horizon`);
  assert.ok(Math.abs(refractionDeg(-1) - Refraction('jplhor', -1)) < 1e-12);
});

test('below a true −1° no refraction is applied: the geometric altitude, never a constant 0.65°', () => {
  for (const h of [-1.0001, -1.5, -2, -5, -30, -89.9]) assert.equal(refractionDeg(h), 0, `${h}°`);
});

test('the Moon and Sun through a day from five places: above −1° within 0.02° of astronomy-engine\'s Horizon (normal refraction), below it within 0.02° of Horizon without refraction', () => {
  const places: [number, number][] = [[0, 0], [51.5, -0.13], [-33.9, 151.2], [69.6, 18.9], [-77.8, 166.7]];
  let above = 0;
  let below = 0;
  for (const [lat, lon] of places) {
    for (let k = 0; k < 96; k++) {
      const moment = momentFromUT(9500 + k / 96, 69);
      const time = ephemerisTime(moment.ttDays);
      const ae = astroTimeOf(moment);
      const observer = new AEObserver(lat, lon, 0);
      for (const [body, position] of [[Body.Moon, moonPositionKm(time)], [Body.Sun, sunPositionKm(time)]] as const) {
        const ours = horizontal(position, moment, { latDeg: lat, lonDeg: lon });
        const equ = Equator(body, ae, observer, true, true);
        const geometric = Horizon(ae, observer, equ.ra, equ.dec).altitude;
        if (Math.abs(geometric - REFRACTION_FLOOR_DEG) < 0.05) continue;
        const expected = geometric >= REFRACTION_FLOOR_DEG ? Horizon(ae, observer, equ.ra, equ.dec, 'normal').altitude : geometric;
        assert.ok(Math.abs(ours.altitudeDeg - expected) < 0.02, `${body} at ${lat},${lon} step ${k}: ${ours.altitudeDeg} vs ${expected}`);
        if (geometric < REFRACTION_FLOOR_DEG) {
          assert.equal(ours.altitudeDeg, ours.geometricAltitudeDeg);
          below++;
        } else above++;
      }
    }
  }
  assert.ok(above > 200 && below > 200, `${above} above, ${below} below`);
});

test('umbracast.local/1 gives altitudes to 0.01°, the same values as the computation rounded once', () => {
  const [eclipse] = findLunarEclipses({ from: new Date('2026-03-03T00:00:00Z'), to: new Date('2026-03-03T23:59:59Z') });
  const place = { name: 'Kestrel Ridge', latDeg: 43.7, lonDeg: -79.4, tz: 'UTC' };
  const clock = civilClock('UTC');
  const local = localCircumstances(eclipse!, place);
  const report: LocalReport = { local, place, clock, summary: localSummary(local, clock, place.name) };
  const json = JSON.parse(localJson(report)) as { events: { moonAltitude: number; sunAltitude: number }[] };
  json.events.forEach((e, i) => {
    // common practice: one rounding, from the full value
    assert.equal(e.moonAltitude, Math.round(local.events[i]!.moonAltitudeDeg * 100) / 100);
    assert.equal(e.sunAltitude, Math.round(local.events[i]!.sunAltitudeDeg * 100) / 100);
  });
  assert.ok(json.events.some((e) => Math.round(e.moonAltitude * 10) !== e.moonAltitude * 10), 'some altitude carries a second decimal');
});
