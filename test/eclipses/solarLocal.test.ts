/**
 * Local circumstances of solar eclipses against astronomy-engine's
 * SearchLocalSolarEclipse at places inside and outside paths, at sunrise
 * and sunset, near the poles and on both sides of the date line; and
 * internal properties of the Besselian geometry (Meeus, Elements of Solar
 * Eclipses; Explanatory Supplement, ch. 11).
 */
import assert from 'node:assert/strict';
import { after, before, test } from 'node:test';
import { DeltaT_EspenakMeeus, MakeTime, Observer as EngineObserver, SearchLocalSolarEclipse, SetDeltaTFunction } from 'astronomy-engine';
import { besselianAt } from '../../src/eclipses/solar/besselian.ts';
import { EARTH_EQUATORIAL_RADIUS_KM, K_PENUMBRA, SUN_RADIUS_EARTH_RADII } from '../../src/eclipses/solar/constants.ts';
import { localShadow, discOverlapFraction } from '../../src/eclipses/solar/localCore.ts';
import { greatestObscurationSeen, solarLocalCircumstances } from '../../src/local/solar.ts';
import { geocentricPlace } from '../../src/eclipses/solar/surface.ts';
import type { SolarEclipse } from '../../src/eclipses/solar/types.ts';
import { standardDeltaTModel } from '../../src/ephemeris/deltaT.ts';
import { decimalYearFromDays, isoSeconds } from '../../src/ephemeris/time.ts';
import { solarEclipseOn } from './solarSupport.ts';

const DAY_SECONDS = 86_400;

before(() => {
  // Test code only: astronomy-engine's global ΔT set to our model, so that its local times are comparable.
  const model = standardDeltaTModel();
  SetDeltaTFunction((ut: number) => model.at(decimalYearFromDays(ut)).seconds);
});
// Leave astronomy-engine as it was: its own default ΔT.
after(() => SetDeltaTFunction(DeltaT_EspenakMeeus));

/** astronomy-engine's radii (astronomy.js): Moon 1737.4 km for both shadows, Sun 695 700 km. */
const ENGINE_MOON = 1737.4 / EARTH_EQUATORIAL_RADIUS_KM;
const ENGINE_SUN = 695_700 / EARTH_EQUATORIAL_RADIUS_KM;

/**
 * The shadow radius at a place under astronomy-engine's radii, from our own
 * elements: |G| and z follow from l1 and tan f1, and
 * L = (z − ζ) tan f ± k / cos f with sin f = (k☉ ± k)/|G|.
 */
function engineRadius(eclipse: SolarEclipse, lonLat: readonly [number, number], ttDays: number, shadow: 'penumbra' | 'umbra'): number {
  const e = besselianAt(eclipse.elements, ttDays);
  const sinF1 = Math.sin(Math.atan(e.tanF1));
  const g = (SUN_RADIUS_EARTH_RADII + K_PENUMBRA) / sinF1;
  const z = e.l1 / e.tanF1 - K_PENUMBRA / sinF1;
  const zeta = localShadow(eclipse.elements, geocentricPlace(lonLat), ttDays).zeta;
  if (shadow === 'penumbra') {
    const f = Math.asin((ENGINE_SUN + ENGINE_MOON) / g);
    return (z - zeta) * Math.tan(f) + ENGINE_MOON / Math.cos(f);
  }
  const f = Math.asin((ENGINE_SUN - ENGINE_MOON) / g);
  return Math.abs((z - zeta) * Math.tan(f) - ENGINE_MOON / Math.cos(f));
}

/** Where astronomy-engine's contact should fall, from ours: Δ − L = δ one step of f′ later (δ = its radius − ours). */
function expectedEngineShiftSeconds(eclipse: SolarEclipse, lonLat: readonly [number, number], ttDays: number, shadow: 'penumbra' | 'umbra'): number {
  const place = geocentricPlace(lonLat);
  const radius = (tt: number) => {
    const s = localShadow(eclipse.elements, place, tt);
    return shadow === 'penumbra' ? s.penumbra : Math.abs(s.umbra);
  };
  const f = (tt: number) => localShadow(eclipse.elements, place, tt).distance - radius(tt);
  const h = 1 / DAY_SECONDS;
  const slopePerSecond = (f(ttDays + h) - f(ttDays - h)) / 2;
  return (engineRadius(eclipse, lonLat, ttDays, shadow) - radius(ttDays)) / slopePerSecond;
}

interface Case {
  readonly eclipse: string;
  readonly lonLat: readonly [number, number];
  readonly note: string;
}

const CASES: readonly Case[] = [
  { eclipse: '2024-04-08', lonLat: [-104.16, 25.29], note: 'greatest point' },
  { eclipse: '2024-04-08', lonLat: [-96.8, 32.8], note: 'in the path, north of the line' },
  { eclipse: '2024-04-08', lonLat: [-70.0, 45.5], note: 'in the path, far along' },
  { eclipse: '2024-04-08', lonLat: [-80.0, 40.0], note: 'outside the path, deep partial' },
  { eclipse: '2024-04-08', lonLat: [-120.0, 30.0], note: 'shallow partial' },
  { eclipse: '2024-04-08', lonLat: [-158.0, 21.3], note: 'eclipse soon after sunrise' },
  { eclipse: '2027-08-02', lonLat: [32.9, 24.1], note: 'in the path, Sun high' },
  { eclipse: '2027-08-02', lonLat: [-5.6, 36.0], note: 'in the path near its start' },
  { eclipse: '2027-08-02', lonLat: [44.0, 12.8], note: 'in the path, afternoon' },
  { eclipse: '2024-10-02', lonLat: [-70.0, -47.0], note: 'annular' },
  { eclipse: '2024-10-02', lonLat: [-109.4, -27.1], note: 'annular, mid-ocean island' },
  { eclipse: '2026-02-17', lonLat: [70.0, -68.0], note: 'annular, Antarctica' },
  { eclipse: '2023-04-20', lonLat: [114.1, -21.9], note: 'hybrid, total part' },
  { eclipse: '2023-04-20', lonLat: [125.5, -9.0], note: 'hybrid, partial' },
  { eclipse: '2025-09-21', lonLat: [174.8, -41.3], note: 'partial at sunrise, west of the date line' },
  { eclipse: '2025-09-21', lonLat: [-179.9, -17.0], note: 'partial, east of the date line' },
  { eclipse: '2025-03-29', lonLat: [18.9, 69.6], note: 'partial, north of the Arctic circle' },
  { eclipse: '2026-08-12', lonLat: [-21.9, 64.1], note: 'total, high latitude' },
];

const cache = new Map<string, SolarEclipse>();
const eclipseOf = (id: string) => {
  let e = cache.get(id);
  if (!e) cache.set(id, (e = solarEclipseOn(id)));
  return e;
};

function engineLocal(c: Case) {
  const start = MakeTime(new Date(Date.parse(`${c.eclipse}T00:00:00Z`) - 2 * DAY_SECONDS * 1000));
  return SearchLocalSolarEclipse(start, new EngineObserver(c.lonLat[1], c.lonLat[0], 0));
}

test('contacts, maximum and obscuration against astronomy-engine SearchLocalSolarEclipse at 18 places; differences pinned to its radii', (t) => {
  let worstResidual = 0;
  let worstRaw = 0;
  let worstObscuration = 0;
  for (const c of CASES) {
    const eclipse = eclipseOf(c.eclipse);
    const ours = solarLocalCircumstances(eclipse, { lonDeg: c.lonLat[0], latDeg: c.lonLat[1] });
    const engine = engineLocal(c);
    const label = `${c.eclipse} ${c.note}`;
    assert.ok(Math.abs(engine.peak.time.tt - eclipse.greatest.ttDays) < 0.3, `${label}: astronomy-engine found another eclipse`);
    const byName = (name: string) => ours.events.find((e) => e.event === name);
    const maximum = byName('maximum')!;
    assert.ok(Math.abs(engine.peak.time.tt - maximum.moment.ttDays) * DAY_SECONDS < 1.5, `${label}: maximum`);
    const pairs: [string, number | undefined, 'penumbra' | 'umbra'][] = [
      ['C1', engine.partial_begin.time.tt, 'penumbra'],
      ['C2', engine.total_begin?.time.tt, 'umbra'],
      ['C3', engine.total_end?.time.tt, 'umbra'],
      ['C4', engine.partial_end.time.tt, 'penumbra'],
    ];
    for (const [name, engineTT, shadow] of pairs) {
      const event = byName(name);
      assert.equal(event !== undefined, engineTT !== undefined, `${label}: ${name} occurs in both`);
      if (!event || engineTT === undefined) continue;
      const raw = (engineTT - event.moment.ttDays) * DAY_SECONDS;
      const expected = expectedEngineShiftSeconds(eclipse, c.lonLat, event.moment.ttDays, shadow);
      worstRaw = Math.max(worstRaw, Math.abs(raw));
      worstResidual = Math.max(worstResidual, Math.abs(raw - expected));
      // Its radii move C1/C4 and C2/C3 by up to a few seconds; with that accounted for, the two agree to a second.
      assert.ok(Math.abs(raw - expected) < 1, `${label}: ${name} differs by ${raw.toFixed(2)} s, expected ${expected.toFixed(2)} s`);
    }
    // Obscuration at maximum: astronomy-engine takes a Moon of 1736.0 km for it (and 1.0 exactly when total), ours k1 and k2 through L1′ and L2′.
    worstObscuration = Math.max(worstObscuration, Math.abs(engine.obscuration - ours.obscuration));
    assert.ok(Math.abs(engine.obscuration - ours.obscuration) < 0.002, `${label}: obscuration ${ours.obscuration} vs ${engine.obscuration}`);
    // Kind at maximum (geometric): astronomy-engine's total/annular/partial.
    const geometric = ours.events.some((e) => e.event === 'C2') ? (localShadow(eclipse.elements, geocentricPlace(c.lonLat), maximum.moment.ttDays).umbra < 0 ? 'total' : 'annular') : 'partial';
    assert.equal(engine.kind, geometric, `${label}: kind`);
    // The Sun's apparent altitude at C1 (both with refraction, different formulas): within 0.03° above 5°.
    const c1 = byName('C1')!;
    if (c1.sunAltitudeDeg > 5) assert.ok(Math.abs(c1.sunAltitudeDeg - engine.partial_begin.altitude) < 0.03, `${label}: altitude at C1 ${c1.sunAltitudeDeg} vs ${engine.partial_begin.altitude}`);
  }
  t.diagnostic(`raw contact differences up to ${worstRaw.toFixed(2)} s; after its radii are accounted for, up to ${worstResidual.toFixed(2)} s; obscuration up to ${worstObscuration.toFixed(4)}`);
});

test('inside the 2024-04-08 path (recalled, from memory: 4 min 28 s at greatest): C2/C3 to the second, duration ≈ 2|L2′|/n (Meeus, Elements)', () => {
  const eclipse = eclipseOf('2024-04-08');
  const [lon, lat] = eclipse.greatestPoint;
  const local = solarLocalCircumstances(eclipse, { lonDeg: lon, latDeg: lat });
  assert.equal(local.kind, 'total');
  assert.ok(local.insidePath);
  assert.ok(local.centralLineKm! < 0.1, `${local.centralLineKm} km from the line`);
  assert.ok(Math.abs(local.nearestLimitKm! - eclipse.pathWidthKm! / 2) < 1, `${local.nearestLimitKm} km to a limit`);
  assert.equal(Math.round(local.centralSeconds!), 268);
  const s = localShadow(eclipse.elements, geocentricPlace([lon, lat]), local.events.find((e) => e.event === 'maximum')!.moment.ttDays);
  const estimate = ((2 * Math.abs(s.umbra)) / Math.hypot(s.a, s.b)) * DAY_SECONDS;
  assert.ok(Math.abs(local.centralSeconds! - estimate) < 0.5, `${local.centralSeconds} s vs 2|L2′|/n = ${estimate} s`);
  assert.equal(local.obscuration, 1);
  assert.ok(!local.lowSun && !local.nearPathEdge);
  const c2 = local.events.find((e) => e.event === 'C2')!;
  assert.equal(isoSeconds(c2.moment.utDays).slice(11, 16), '18:15');
});

test('events are in time order; sunrise inside the eclipse is found and the Sun is up after it (Meeus ch. 15: upper limb on the horizon)', () => {
  const eclipse = eclipseOf('2025-09-21');
  const local = solarLocalCircumstances(eclipse, { lonDeg: 174.8, latDeg: -41.3 });
  const times = local.events.map((e) => e.moment.ttDays);
  assert.deepEqual(times, [...times].sort((a, b) => a - b));
  const rise = local.events.find((e) => e.event === 'sunrise');
  assert.ok(rise, 'sunrise during the eclipse');
  assert.ok(Math.abs(rise.sunAltitudeDeg - -0.27) < 0.1, `apparent altitude of the centre at sunrise ${rise.sunAltitudeDeg}`);
  assert.equal(local.events.find((e) => e.event === 'C1')!.sunUp, false);
  assert.equal(local.events.find((e) => e.event === 'C4')!.sunUp, true);
  assert.equal(local.kind, 'partial');
  assert.ok(local.lowSun, 'seen only with the Sun low');
  assert.ok(local.obscurationSeen > 0 && local.obscurationSeen <= local.obscuration + 1e-12);
});

test('places the eclipse misses see nothing (Meeus, Elements: Δ at maximum beyond L1′)', () => {
  const eclipse = eclipseOf('2024-04-08');
  const far = solarLocalCircumstances(eclipse, { lonDeg: 100, latDeg: -30 });
  assert.equal(far.kind, 'none');
  assert.equal(far.events.length, 0);
  assert.equal(far.magnitude, 0);
  assert.equal(greatestObscurationSeen(eclipse, [100, -30]), 0);
});

test('near the edge of the path: within 5 km of a limit the warning is on, and magnitude there is 1 (Explanatory Supplement ch. 11)', async () => {
  const eclipse = eclipseOf('2024-04-08');
  const { pathLimits } = await import('../../src/eclipses/solar/curves.ts');
  const limits = pathLimits(eclipse);
  const line = limits.north.reduce((a, b) => (b.length > a.length ? b : a));
  const point = line[Math.floor(line.length / 2)]!;
  const local = solarLocalCircumstances(eclipse, { lonDeg: point[0], latDeg: point[1] });
  assert.ok(local.nearPathEdge);
  assert.ok(local.nearestLimitKm! < 1, `${local.nearestLimitKm} km`);
  assert.ok(Math.abs(local.magnitude - 1) < 2e-5, `magnitude ${local.magnitude}`);
});

test('obscuration of two discs (geometry): none apart, the Moon\'s area inside, all when covered, half for equal discs at 0.8079 apart', () => {
  assert.equal(discOverlapFraction(1, 2.1), 0);
  assert.ok(Math.abs(discOverlapFraction(0.9, 0.05) - 0.81) < 1e-12);
  assert.equal(discOverlapFraction(1.05, 0.01), 1);
  // Equal unit discs overlap by half their area when c solves 2 acos(c/2) − (c/2)√(4 − c²) = π/2: c ≈ 0.80794.
  assert.ok(Math.abs(discOverlapFraction(1, 0.80794) - 0.5) < 1e-4);
});


test('edges: the North Pole and a point beside it agree (2025-03-29, Sun 3.8° up all through); the South Pole in polar night sees nothing; 180° and −180° are one meridian (geometry; Meeus ch. 15 for the Sun up)', () => {
  const eclipse = eclipseOf('2025-03-29');
  const pole = solarLocalCircumstances(eclipse, { lonDeg: 0, latDeg: 90 });
  const beside = solarLocalCircumstances(eclipse, { lonDeg: 123, latDeg: 89.99 });
  assert.equal(pole.kind, 'partial');
  assert.ok(Math.abs(pole.magnitude - beside.magnitude) < 0.001);
  for (const e of pole.events) assert.ok(e.sunUp && Math.abs(e.sunAltitudeDeg - 3.8) < 0.2, `${e.event} ${e.sunAltitudeDeg}`);
  assert.equal(solarLocalCircumstances(eclipse, { lonDeg: 0, latDeg: -90 }).kind, 'none');
  const east = solarLocalCircumstances(eclipse, { lonDeg: 180, latDeg: 60 });
  const west = solarLocalCircumstances(eclipse, { lonDeg: -180, latDeg: 60 });
  assert.deepEqual(east.events.map((e) => e.moment.ttDays), west.events.map((e) => e.moment.ttDays));
  // Night there: the shadow passes (magnitude > 0 geometrically), nothing is seen.
  assert.equal(east.kind, 'none');
  assert.ok(east.magnitude > 0.4 && east.obscurationSeen === 0);
});

test('edges: years 1000 and 3000 — every eclipse computes its central duration at the greatest point (ΔT ≈ 26 min and 74 min)', async () => {
  const { findSolarEclipses } = await import('../../src/eclipses/solar/catalogue.ts');
  for (const year of [1000, 3000]) {
    const list = findSolarEclipses({ from: new Date(Date.UTC(year, 0, 1)), to: new Date(Date.UTC(year + 1, 0, 1)) });
    for (const e of list.filter((x) => x.central)) {
      const local = solarLocalCircumstances(e, { lonDeg: e.greatestPoint[0], latDeg: e.greatestPoint[1] });
      assert.ok(local.kind === 'total' || local.kind === 'annular', `${e.id}: ${local.kind}`);
      assert.ok(Math.abs(local.centralSeconds! - e.durations.centralSeconds!) < 0.5, `${e.id}`);
    }
  }
});

test('bad places throw InputError naming the parameter (sharp-style errors: parameter, expected, received)', async () => {
  const { InputError } = await import('../../src/errors.ts');
  const eclipse = eclipseOf('2024-04-08');
  for (const [lonDeg, latDeg] of [[0, 91], [181, 0], [Number.NaN, 10]] as const) {
    assert.throws(() => solarLocalCircumstances(eclipse, { lonDeg, latDeg }), (err) => err instanceof InputError && err.parameter === 'observer' && err.message.includes(String(latDeg)));
  }
});
