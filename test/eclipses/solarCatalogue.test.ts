/**
 * The solar catalogue 1900–2100 against two independent computations —
 * astronomy-engine's own global search and astronomia's Meeus ch. 54 series —
 * and against recalled values. The catalogue is computed once for the file.
 */
import assert from 'node:assert/strict';
import { after, before, test } from 'node:test';
import eclipseSeries from 'astronomia/eclipse';
import { DeltaT_EspenakMeeus, MakeTime, NextGlobalSolarEclipse, SearchGlobalSolarEclipse, SetDeltaTFunction, type GlobalSolarEclipseInfo } from 'astronomy-engine';
import { findSolarEclipses } from '../../src/eclipses/solar/catalogue.ts';
import { standardDeltaTModel } from '../../src/ephemeris/deltaT.ts';
import { decimalYearFromDays, isoSeconds } from '../../src/ephemeris/time.ts';
import { InputError } from '../../src/errors.ts';
import { solarCatalogue1900to2100, solarEclipseOn } from './solarSupport.ts';

const JD_J2000 = 2451545.0;
const DAY_SECONDS = 86_400;

// astronomy-engine keeps one global ΔT function; the library never sets it. Here, in test code only, it gets our
// model, so that its longitudes (which need UT) are comparable with ours.
before(() => {
  const model = standardDeltaTModel();
  SetDeltaTFunction((ut: number) => model.at(decimalYearFromDays(ut)).seconds);
});
// Leave astronomy-engine as it was: its own default ΔT.
after(() => SetDeltaTFunction(DeltaT_EspenakMeeus));

function engineCatalogue(): GlobalSolarEclipseInfo[] {
  const list: GlobalSolarEclipseInfo[] = [];
  let found = SearchGlobalSolarEclipse(MakeTime(new Date('1900-01-01T00:00:00Z')));
  while (found.peak.date < new Date('2101-01-01T00:00:00Z')) {
    list.push(found);
    found = NextGlobalSolarEclipse(found.peak);
  }
  return list;
}

test('1900–2100: one-to-one with astronomy-engine SearchGlobalSolarEclipse/NextGlobalSolarEclipse; greatest TT within 2 s; kind; greatest point within 0.01°', (t) => {
  const ours = solarCatalogue1900to2100();
  const engine = engineCatalogue();
  assert.equal(ours.length, engine.length);
  assert.equal(ours.length, 454);
  let worstSeconds = 0;
  let worstDeg = 0;
  for (let i = 0; i < ours.length; i++) {
    const o = ours[i]!;
    const e = engine[i]!;
    const seconds = Math.abs(e.peak.tt - o.greatest.ttDays) * DAY_SECONDS;
    worstSeconds = Math.max(worstSeconds, seconds);
    assert.ok(seconds < 2, `${o.id}: greatest differs by ${seconds.toFixed(2)} s`);
    // astronomy-engine has no hybrid kind: it names what the greatest point sees (its Moon radius is 1737.4 km,
    // ours 0.272281 Earth radii = 1736.6 km, and it adds a 14 m bias; no eclipse of 1900–2100 lies that close).
    // It calls non-central total and annular eclipses "partial": the axis misses the Earth.
    const expected = !o.central ? 'partial' : o.kind === 'hybrid' ? (o.magnitude >= 1 ? 'total' : 'annular') : o.kind;
    assert.equal(e.kind, expected, `${o.id}: ours ${o.kind}${o.central ? '' : ' (non-central)'}`);
    assert.equal(e.latitude !== undefined, o.central, `${o.id}: central`);
    if (e.latitude !== undefined && e.longitude !== undefined) {
      const dLon = Math.abs(((e.longitude - o.greatestPoint[0] + 540) % 360) - 180);
      assert.ok(Math.abs(e.latitude - o.greatestPoint[1]) < 0.01, `${o.id}: latitude ${o.greatestPoint[1]} vs ${e.latitude}`);
      assert.ok(dLon < 0.01, `${o.id}: longitude ${o.greatestPoint[0]} vs ${e.longitude}`);
      worstDeg = Math.max(worstDeg, dLon, Math.abs(e.latitude - o.greatestPoint[1]));
    }
  }
  t.diagnostic(`worst greatest TT ${worstSeconds.toFixed(2)} s; worst greatest point ${worstDeg.toFixed(4)}°`);
  const count = (kind: string, central: boolean) => ours.filter((o) => o.kind === kind && o.central === central).length;
  // Pinned: what this computation finds, in kinds astronomy-engine cannot tell apart.
  assert.deepEqual(
    { hybrid: count('hybrid', true), nonCentralTotal: count('total', false), nonCentralAnnular: count('annular', false) },
    { hybrid: 13, nonCentralTotal: 4, nonCentralAnnular: 4 },
  );
});

interface MeeusSolar {
  ttDays: number;
  gamma: number;
  central: boolean;
  kind: 'partial' | 'annular' | 'hybrid' | 'total' | 'non-central';
}

/** astronomia's eclipse.solar (test/types/astronomia.d.ts declares only the lunar slice). */
interface SolarSeries {
  TYPE: { None: number; Partial: number; Annular: number; AnnularTotal: number; Total: number };
  solar(year: number): { type: number; central: boolean; jdeMax: number; distance: number };
}
const meeusSolar = eclipseSeries as unknown as SolarSeries;

function meeusCatalogue(fromYear: number, toYear: number): MeeusSolar[] {
  const list: MeeusSolar[] = [];
  const T = meeusSolar.TYPE;
  for (let k = Math.floor((fromYear - 2000) * 12.3685) - 1; k <= Math.ceil((toYear + 1 - 2000) * 12.3685) + 1; k++) {
    const result = meeusSolar.solar(2000 + k / 12.3685);
    if (result.type === T.None) continue;
    const ttDays = result.jdeMax - JD_J2000;
    const year = new Date(Date.UTC(2000, 0, 1, 12) + ttDays * 86_400_000).getUTCFullYear();
    if (year < fromYear || year > toYear) continue;
    const kind = !result.central
      ? result.type === T.Partial ? 'partial' : 'non-central'
      : result.type === T.Total ? 'total' : result.type === T.Annular ? 'annular' : 'hybrid';
    list.push({ ttDays, gamma: result.distance, central: result.central, kind });
  }
  return list;
}

test('1900–2100: paired with Meeus ch. 54 (astronomia eclipse.solar): greatest within 2 min, γ within 0.005', (t) => {
  const ours = solarCatalogue1900to2100();
  const meeus = meeusCatalogue(1900, 2100);
  const unmatchedMeeus = new Set(meeus);
  let worstMinutes = 0;
  let worstGamma = 0;
  for (const o of ours) {
    const m = meeus.find((c) => Math.abs(c.ttDays - o.greatest.ttDays) < 1);
    if (!m) {
      // Only a graze of the penumbra (magnitude under 0.01) may lack a partner.
      assert.ok(o.kind === 'partial' && o.magnitude < 0.01, `${o.id} (γ ${o.gamma.toFixed(4)}) has no Meeus partner`);
      t.diagnostic(`no Meeus partner: ${o.id}, magnitude ${o.magnitude.toFixed(4)}`);
      continue;
    }
    unmatchedMeeus.delete(m);
    const minutes = (Math.abs(m.ttDays - o.greatest.ttDays) * DAY_SECONDS) / 60;
    worstMinutes = Math.max(worstMinutes, minutes);
    worstGamma = Math.max(worstGamma, Math.abs(m.gamma - o.gamma));
    assert.ok(minutes <= 2, `${o.id}: greatest differs by ${minutes.toFixed(2)} min`);
    assert.ok(Math.abs(m.gamma - o.gamma) <= 0.005, `${o.id}: γ ${o.gamma.toFixed(4)} vs ${m.gamma.toFixed(4)}`);
    // Meeus's series decides centrality by |γ| < 0.9972 and cannot see the flattening's change with d.
    if (Math.abs(Math.abs(o.gamma) - 0.9972) > 0.003) assert.equal(m.central, o.central, `${o.id}: central`);
  }
  assert.equal(unmatchedMeeus.size, 0);
  t.diagnostic(`worst greatest ${worstMinutes.toFixed(2)} min; worst γ ${worstGamma.toFixed(4)}`);
  assert.ok(worstMinutes > 0.05, 'the two computations are not the same one');
});

test('recalled values (from memory): 2024-04-08 total, greatest ≈ 18:17 UT near 25.3°N 104.1°W, ≈ 4 min 28 s, ≈ 198 km wide', () => {
  const e = solarEclipseOn('2024-04-08');
  assert.equal(e.kind, 'total');
  assert.ok(e.central);
  assert.equal(isoSeconds(e.greatest.utDays).slice(11, 16), '18:17');
  assert.ok(Math.abs(e.greatestPoint[1] - 25.3) < 0.05 && Math.abs(e.greatestPoint[0] + 104.1) < 0.1, `${e.greatestPoint}`);
  assert.ok(Math.abs(e.durations.centralSeconds! - 268) < 1.5, `${e.durations.centralSeconds} s`);
  assert.ok(Math.abs(e.pathWidthKm! - 198) < 1.5, `${e.pathWidthKm} km`);
  assert.equal(e.saros, 139);
});

test('recalled values (from memory): 2027-08-02 total, greatest ≈ 10:07 TT near 25.5°N 33.2°E, ≈ 6 min 23 s', () => {
  const e = solarEclipseOn('2027-08-02');
  assert.equal(e.kind, 'total');
  assert.equal(isoSeconds(e.greatest.ttDays).slice(11, 16), '10:07');
  assert.ok(Math.abs(e.greatestPoint[1] - 25.5) < 0.05 && Math.abs(e.greatestPoint[0] - 33.2) < 0.1, `${e.greatestPoint}`);
  assert.ok(Math.abs(e.durations.centralSeconds! - 383) < 1.5, `${e.durations.centralSeconds} s`);
});

test('saros (from memory): 2017-08-21 is 145, 1999-08-11 is 145, 2026-08-12 is 126, 2023-04-20 (hybrid) is 129; one saros on, the same number', () => {
  const ours = solarCatalogue1900to2100();
  const byId = new Map(ours.map((e) => [e.id, e]));
  assert.equal(byId.get('2017-08-21')!.saros, 145);
  assert.equal(byId.get('1999-08-11')!.saros, 145);
  assert.equal(byId.get('2026-08-12')!.saros, 126);
  assert.equal(byId.get('2023-04-20')!.saros, 129);
  assert.equal(byId.get('2023-04-20')!.kind, 'hybrid');
  // Eclipses 6585.32 d apart (223 lunations) share their number; within a series the path shifts ~120° west.
  for (const e of ours) {
    const next = ours.find((n) => Math.abs(n.greatest.ttDays - e.greatest.ttDays - 6585.32) < 1);
    if (next) assert.equal(next.saros, e.saros, `${e.id} → ${next.id}`);
  }
});

test('ids: no UTC date holds two solar eclipses; the lunar and solar ids of 1900–2100 never coincide either (common practice: id = UTC date of greatest)', async () => {
  const ours = solarCatalogue1900to2100();
  assert.equal(new Set(ours.map((e) => e.id)).size, ours.length);
  const { catalogue1900to2100 } = await import('./support.ts');
  const lunar = new Set(catalogue1900to2100().map((e) => e.id));
  for (const e of ours) assert.ok(!lunar.has(e.id), `${e.id} is also a lunar eclipse id`);
});

test('range and record edges: years 1000 and 3000 compute; bad ranges throw InputError naming the parameter', () => {
  const early = findSolarEclipses({ from: new Date(Date.UTC(1000, 0, 1)), to: new Date(Date.UTC(1001, 0, 1)) });
  const late = findSolarEclipses({ from: new Date(Date.UTC(3000, 0, 1)), to: new Date(Date.UTC(3001, 0, 1)) });
  assert.ok(early.length >= 2 && early.length <= 5, `1000: ${early.length}`);
  assert.ok(late.length >= 2 && late.length <= 5, `3000: ${late.length}`);
  for (const e of [...early, ...late]) {
    assert.ok(e.durations.partialSeconds > 3600 && e.durations.partialSeconds < 7 * 3600, `${e.id} P1→P4`);
    assert.equal(e.body, 'solar');
  }
  assert.throws(() => findSolarEclipses({ from: new Date(Date.UTC(999, 0, 1)), to: new Date(Date.UTC(1001, 0, 1)) }), (err) => err instanceof InputError && err.parameter === 'from');
  assert.throws(() => findSolarEclipses({ from: new Date(Date.UTC(2000, 0, 1)), to: new Date(Date.UTC(1999, 0, 1)) }), (err) => err instanceof InputError && err.parameter === 'to');
});

test('records: the lunar conventions plus body "solar" and the Moon radii (k1 = 0.2725076, k2 = 0.272281: common practice); same inputs, same bytes', async () => {
  const { solarEclipseRecord } = await import('../../src/eclipses/solar/record.ts');
  const record = solarEclipseRecord(solarEclipseOn('2024-04-08'));
  assert.equal(record.body, 'solar');
  assert.equal(record.id, '2024-04-08');
  assert.equal(record.kind, 'total');
  assert.match(record.greatest, /^2024-04-08T18:17:\d\dZ$/);
  assert.deepEqual(record.moonRadius, { penumbra: 0.2725076, umbra: 0.272281 });
  assert.deepEqual(Object.keys(record.contacts), ['P1', 'U1', 'U2', 'U3', 'U4', 'P4']);
  assert.equal(record.durations.central, 268);
  assert.equal(record.pathWidthKm, 197.7);
  assert.equal(JSON.stringify(record), JSON.stringify(solarEclipseRecord(solarEclipseOn('2024-04-08'))));
  const partial = solarEclipseRecord(solarEclipseOn('2025-03-29'));
  assert.equal(partial.kind, 'partial');
  assert.equal(partial.central, false);
  assert.equal(partial.durations.central, undefined);
  assert.equal(partial.pathWidthKm, undefined);
  assert.deepEqual(Object.keys(partial.contacts), ['P1', 'P4']);
  assert.ok(Math.abs(partial.sunAltitude) < 0.5, 'a non-central greatest point lies on the limb');
});
