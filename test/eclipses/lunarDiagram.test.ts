/**
 * The shadow diagram's geometry: the Moon's centre against the shadow axis at greatest and at each
 * contact, checked against the catalogue's own definitions (gamma, the contact conditions of the
 * Explanatory Supplement, 3rd ed., ch. 11) and against astronomy-engine as an independent library
 * (its equatorial coordinates of date, and SearchLunarEclipse's peak and semi-durations).
 */
import assert from 'node:assert/strict';
import { test } from 'node:test';
import { Body, EquatorFromVector, GeoMoon, GeoVector, KM_PER_AU, Rotation_EQJ_EQD, RotateVector, SearchLunarEclipse, Vector } from 'astronomy-engine';
import { findLunarEclipses } from '../../src/eclipses/lunar/catalogue.ts';
import { poleOfDate, shadowDiagram, skyOffset, trackAround } from '../../src/eclipses/lunar/diagram.ts';
import type { LunarEclipse } from '../../src/eclipses/lunar/types.ts';
import { ephemerisTime } from '../../src/ephemeris/bodies.ts';
import { dateFromDays } from '../../src/ephemeris/time.ts';

const ARCSEC_RAD = Math.PI / 180 / 3600;
const distance = (o: { eastRad: number; northRad: number }) => Math.hypot(o.eastRad, o.northRad);

/** Every eclipse of 2020–2030 (penumbral, partial and total), and some at the ends of the supported years. */
const ECLIPSES: readonly LunarEclipse[] = [
  ...findLunarEclipses({ from: new Date('2020-01-01T00:00:00Z'), to: new Date('2031-01-01T00:00:00Z') }),
  ...findLunarEclipses({ from: new Date('1000-01-01T00:00:00Z'), to: new Date('1002-01-01T00:00:00Z') }),
  ...findLunarEclipses({ from: new Date('2998-06-01T00:00:00Z'), to: new Date('3000-01-01T00:00:00Z'), convention: 'chauvenet' }),
];
const DIAGRAMS = ECLIPSES.map((eclipse) => shadowDiagram(eclipse));

test('the set covers every kind and both conventions', () => {
  assert.deepEqual(new Set(ECLIPSES.map((e) => e.kind)), new Set(['penumbral', 'partial', 'total']));
  assert.deepEqual(new Set(ECLIPSES.map((e) => e.convention)), new Set(['danjon', 'chauvenet']));
});

test('at greatest the Moon lies |gamma| × the Moon\'s parallax from the axis (gamma as the catalogue defines it: m / π_M, Explanatory Supplement ch. 11)', () => {
  for (const d of DIAGRAMS) {
    const expected = Math.abs(d.eclipse.gamma) * d.moonParallaxRad;
    // The diagram samples its own ten-hour track; two tracks agree to well under 0.001″ (pinned in geometry.test.ts).
    assert.ok(Math.abs(distance(d.greatest.offset) - expected) < 0.002 * ARCSEC_RAD, `${d.eclipse.id}: ${distance(d.greatest.offset)} vs ${expected}`);
  }
});

test('north or south of the axis at greatest follows the sign of gamma (gamma + north, common practice)', () => {
  for (const d of DIAGRAMS) {
    if (Math.abs(d.eclipse.gamma) < 0.02) continue;
    assert.equal(Math.sign(d.greatest.offset.northRad), Math.sign(d.eclipse.gamma), d.eclipse.id);
  }
});

test('each contact sits on its circle: P1/P4 on the penumbra + the Moon\'s radius, U1/U4 on the umbra + the radius, U2/U3 on the umbra − the radius (Explanatory Supplement ch. 11)', () => {
  let checked = 0;
  for (const d of DIAGRAMS) {
    const expectedNames = d.eclipse.kind === 'total' ? ['P1', 'U1', 'U2', 'U3', 'U4', 'P4'] : d.eclipse.kind === 'partial' ? ['P1', 'U1', 'U4', 'P4'] : ['P1', 'P4'];
    assert.deepEqual(d.contacts.map((c) => c.name), expectedNames, d.eclipse.id);
    for (const c of d.contacts) {
      const circle = c.name === 'P1' || c.name === 'P4' ? c.radii.penumbraRad + c.moonSemiDiameterRad
        : c.name === 'U1' || c.name === 'U4' ? c.radii.umbraRad + c.moonSemiDiameterRad
          : c.radii.umbraRad - c.moonSemiDiameterRad;
      // Contacts are solved to 1e-7 day (0.009 s); the Moon moves about 0.55″ a second against the shadow.
      assert.ok(Math.abs(distance(c.offset) - circle) < 0.02 * ARCSEC_RAD, `${d.eclipse.id} ${c.name}: ${(distance(c.offset) - circle) / ARCSEC_RAD}″`);
      checked++;
    }
  }
  assert.ok(checked > 40);
});

test('the Moon moves east against the shadow (to the left, as seen in the sky): east offset grows along the path (common practice: the Moon overtakes the shadow eastward)', () => {
  for (const d of DIAGRAMS) {
    for (let i = 1; i < d.path.length; i++) assert.ok(d.path[i]!.eastRad > d.path[i - 1]!.eastRad, `${d.eclipse.id} at ${i}`);
    // The path begins before P1 and ends after P4: outside the penumbra's contact circle.
    const outer = d.radii.penumbraRad + d.greatest.moonSemiDiameterRad;
    assert.ok(distance(d.path[0]!) > outer && distance(d.path[d.path.length - 1]!) > outer, d.eclipse.id);
  }
});

/** astronomy-engine's right ascension and declination of date (geocentric), radians. */
function equatorOfDate(vectorAu: Vector, ttDays: number): { ra: number; dec: number } {
  const rotated = RotateVector(Rotation_EQJ_EQD(ephemerisTime(ttDays)), vectorAu);
  const eq = EquatorFromVector(rotated);
  return { ra: (eq.ra * Math.PI) / 12, dec: (eq.dec * Math.PI) / 180 };
}

test('the sky offsets agree with astronomy-engine\'s equatorial coordinates of date: east = Δα cos δ, north = Δδ, within 2″ (astronomy-engine EquatorFromVector, Rotation_EQJ_EQD)', () => {
  for (const d of DIAGRAMS.filter((x) => x.eclipse.id.startsWith('202'))) {
    for (const c of [...d.contacts, d.greatest]) {
      const time = ephemerisTime(c.moment.ttDays);
      const moon = equatorOfDate(GeoMoon(time), c.moment.ttDays);
      const sun = GeoVector(Body.Sun, time, true);
      const axis = equatorOfDate(new Vector(-sun.x, -sun.y, -sun.z, time), c.moment.ttDays);
      let dRa = moon.ra - axis.ra;
      dRa = Math.atan2(Math.sin(dRa), Math.cos(dRa));
      // Tangent-plane (gnomonic) offsets: exact to second order, well within the tolerance at 1.6°.
      const cosC = Math.sin(axis.dec) * Math.sin(moon.dec) + Math.cos(axis.dec) * Math.cos(moon.dec) * Math.cos(dRa);
      const xi = (Math.cos(moon.dec) * Math.sin(dRa)) / cosC;
      const eta = (Math.cos(axis.dec) * Math.sin(moon.dec) - Math.sin(axis.dec) * Math.cos(moon.dec) * Math.cos(dRa)) / cosC;
      // Scale the tangent-plane offsets to the true angle, as the diagram draws them.
      const angle = Math.atan(Math.hypot(xi, eta));
      const k = angle / Math.hypot(xi, eta);
      assert.ok(Math.abs(c.offset.eastRad - k * xi) < 2 * ARCSEC_RAD, `${d.eclipse.id}: east ${(c.offset.eastRad - k * xi) / ARCSEC_RAD}″`);
      assert.ok(Math.abs(c.offset.northRad - k * eta) < 2 * ARCSEC_RAD, `${d.eclipse.id}: north ${(c.offset.northRad - k * eta) / ARCSEC_RAD}″`);
    }
  }
});

// astronomy-engine's own shadow (astronomy.js CalcShadow, EarthShadow): Earth 6371 + 88 km, Sun 695 700 km, Moon 1737.4 km.
const AE_EARTH_KM = 6371 + 88;
const AE_SUN_KM = 695_700;
const AE_MOON_KM = 1737.4;

/** The distance (km) of our diagram's Moon from the axis, and astronomy-engine's umbra and penumbra radii at the Moon, at a TT instant. */
function againstEngine(eclipse: LunarEclipse, ttDays: number) {
  const track = trackAround(eclipse);
  const state = track.at(ttDays);
  const offset = skyOffset(state, poleOfDate(eclipse.greatest.ttDays));
  const moonKm = Math.hypot(...state.moonPositionKm);
  const time = ephemerisTime(ttDays);
  const sun = GeoVector(Body.Sun, time, true);
  const moon = GeoMoon(time);
  const u = -(sun.x * moon.x + sun.y * moon.y + sun.z * moon.z) / (sun.x ** 2 + sun.y ** 2 + sun.z ** 2);
  return {
    ourKm: moonKm * Math.sin(distance(offset)),
    umbraKm: AE_SUN_KM - (1 + u) * (AE_SUN_KM - AE_EARTH_KM),
    penumbraKm: -AE_SUN_KM + (1 + u) * (AE_SUN_KM + AE_EARTH_KM),
    moonAu: Math.hypot(moon.x, moon.y, moon.z) * KM_PER_AU,
  };
}

function crossing(f: (tt: number) => number, a: number, b: number): number {
  let fa = f(a);
  for (let i = 0; i < 60; i++) {
    const m = (a + b) / 2;
    const fm = f(m);
    if (Math.sign(fm) === Math.sign(fa)) {
      a = m;
      fa = fm;
    } else {
      b = m;
    }
  }
  return (a + b) / 2;
}

test('against astronomy-engine SearchLunarEclipse: its peak within 5 s of our greatest, and our path crosses its shadow limits with its semi-durations within 3 s (2025-03-14 total, 2026-08-28 partial, 2027-02-20 penumbral)', () => {
  for (const id of ['2025-03-14', '2026-08-28', '2027-02-20']) {
    const eclipse = ECLIPSES.find((e) => e.id === id)!;
    assert.ok(eclipse, id);
    const info = SearchLunarEclipse(dateFromDays(eclipse.greatest.utDays - 3));
    assert.ok(Math.abs(info.peak.tt - eclipse.greatest.ttDays) * 86_400 < 5, `${id}: peak ${(info.peak.tt - eclipse.greatest.ttDays) * 86_400} s`);
    const g = eclipse.greatest.ttDays;
    const semi = (limit: (x: ReturnType<typeof againstEngine>) => number, guessMinutes: number) => {
      const f = (tt: number) => { const x = againstEngine(eclipse, tt); return x.ourKm - limit(x); };
      const before = crossing(f, g - (guessMinutes + 30) / 1440, g);
      const after = crossing(f, g, g + (guessMinutes + 30) / 1440);
      return ((after - before) / 2) * 1440;
    };
    const penum = semi((x) => x.penumbraKm + AE_MOON_KM, info.sd_penum);
    assert.ok(Math.abs(penum - info.sd_penum) * 60 < 3, `${id} penumbral: ${penum} vs ${info.sd_penum} min`);
    if (info.sd_partial > 0) {
      const partial = semi((x) => x.umbraKm + AE_MOON_KM, info.sd_partial);
      assert.ok(Math.abs(partial - info.sd_partial) * 60 < 3, `${id} partial: ${partial} vs ${info.sd_partial} min`);
    }
    if (info.sd_total > 0) {
      const total = semi((x) => x.umbraKm - AE_MOON_KM, info.sd_total);
      assert.ok(Math.abs(total - info.sd_total) * 60 < 3, `${id} total: ${total} vs ${info.sd_total} min`);
    }
    assert.equal(info.sd_total > 0, eclipse.kind === 'total', id);
  }
});
