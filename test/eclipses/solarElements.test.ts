/**
 * Besselian elements (Explanatory Supplement, ch. 11; Meeus, Elements of
 * Solar Eclipses): the Chebyshev fit against the direct ephemeris, the rates
 * from the series against finite differences, and the elements' own
 * relations.
 */
import assert from 'node:assert/strict';
import { test } from 'node:test';
import { fitChebyshev, chebyshevNodes } from '../../src/eclipses/common/chebyshev.ts';
import { besselianAt, besselianDirect, fitBesselian, sampleAxis } from '../../src/eclipses/solar/besselian.ts';
import { K_PENUMBRA, K_UMBRA, SUN_RADIUS_EARTH_RADII } from '../../src/eclipses/solar/constants.ts';
import { describeSolarEclipse } from '../../src/eclipses/solar/global.ts';
import { chebyshevDerivative } from '../../src/eclipses/common/series.ts';
import { evaluateChebyshev } from '../../src/eclipses/common/chebyshev.ts';
import { solarEclipseOn } from './solarSupport.ts';

test('the derivative series of a fitted sine is its cosine (calculus; Numerical Recipes §5.9)', () => {
  const nodes = chebyshevNodes(0, 2, 16);
  const series = fitChebyshev(0, 2, nodes.map((t) => Math.sin(3 * t)));
  const derivative = chebyshevDerivative(series);
  for (const t of [0.05, 0.7, 1.3, 1.95]) {
    assert.ok(Math.abs(evaluateChebyshev(derivative, t) - 3 * Math.cos(3 * t)) < 1e-8, `t = ${t}`);
  }
});

test('2024-04-08: the nine-node fit reproduces the direct elements over the whole window (Explanatory Supplement ch. 11 definitions)', () => {
  const eclipse = solarEclipseOn('2024-04-08');
  const fit = eclipse.elements;
  let worstLength = 0;
  let worstAngle = 0;
  for (let i = 0; i <= 40; i++) {
    const tt = fit.startTTDays + ((fit.endTTDays - fit.startTTDays) * i) / 40;
    const a = besselianAt(fit, tt);
    const b = besselianDirect(tt, fit.deltaTSeconds);
    for (const key of ['x', 'y', 'l1', 'l2'] as const) worstLength = Math.max(worstLength, Math.abs(a[key] - b[key]));
    const dMu = Math.abs(((a.muRad - b.muRad + Math.PI) % (2 * Math.PI) + 2 * Math.PI) % (2 * Math.PI) - Math.PI);
    worstAngle = Math.max(worstAngle, Math.abs(a.dRad - b.dRad), dMu);
  }
  // 1e-9 Earth radii is 6 mm; 1e-9 rad is 0.0002″.
  assert.ok(worstLength < 1e-9, `lengths off by ${worstLength}`);
  assert.ok(worstAngle < 1e-9, `angles off by ${worstAngle}`);
});

test('2024-04-08: rates from the series match central differences of the direct elements (numerical differentiation: common practice)', () => {
  const fit = solarEclipseOn('2024-04-08').elements;
  const tt = (fit.startTTDays + fit.endTTDays) / 2 + 0.03;
  const h = 1 / 1440;
  const before = besselianDirect(tt - h, fit.deltaTSeconds);
  const after = besselianDirect(tt + h, fit.deltaTSeconds);
  const e = besselianAt(fit, tt);
  const rate = (key: 'x' | 'y' | 'dRad' | 'l1' | 'l2') => (after[key] - before[key]) / (2 * h);
  assert.ok(Math.abs(e.xPerDay - rate('x')) < 1e-6, 'x′');
  assert.ok(Math.abs(e.yPerDay - rate('y')) < 1e-6, 'y′');
  assert.ok(Math.abs(e.dRadPerDay - rate('dRad')) < 1e-8, 'd′');
  assert.ok(Math.abs(e.l1PerDay - rate('l1')) < 1e-7, 'l1′');
  assert.ok(Math.abs(e.l2PerDay - rate('l2')) < 1e-7, 'l2′');
  // μ′: the Earth's rotation less the axis's own motion in right ascension, ≈ 15°/h (Meeus, Elements: 0.2618 rad/h).
  assert.ok(Math.abs(e.muRadPerDay / 24 - 0.2618) < 0.0005, `μ′ = ${e.muRadPerDay / 24} rad/h`);
});

test('cone relations (Explanatory Supplement ch. 11): sin f1 / sin f2 fixed by the radii; tan f1 > tan f2; l2 < 0 for a total eclipse', () => {
  const e = besselianAt(solarEclipseOn('2024-04-08').elements, solarEclipseOn('2024-04-08').greatest.ttDays);
  // sin f1 = (k☉ + k1)/|G| and sin f2 = (k☉ − k2)/|G| share |G|: their ratio is fixed by the radii alone.
  const ratio = Math.sin(Math.atan(e.tanF1)) / Math.sin(Math.atan(e.tanF2));
  assert.ok(Math.abs(ratio - (SUN_RADIUS_EARTH_RADII + K_PENUMBRA) / (SUN_RADIUS_EARTH_RADII - K_UMBRA)) < 1e-12);
  assert.ok(e.tanF1 > e.tanF2);
  assert.ok(e.l2 < 0 && e.l1 > 0.5 && e.l1 < 0.6, `l1 ${e.l1}, l2 ${e.l2}`);
  // f1 ≈ 0.2666°, f2 ≈ 0.2653° near perigee-ish distances (Meeus, Elements: tan f ≈ 0.0046).
  assert.ok(Math.abs(e.tanF1 - 0.00466) < 0.00003 && Math.abs(e.tanF2 - 0.00464) < 0.00003, `${e.tanF1} ${e.tanF2}`);
});

test('only μ depends on ΔT: one second more of ΔT moves the path 1/240° of longitude east (Explanatory Supplement ch. 11)', () => {
  const eclipse = solarEclipseOn('2027-08-02');
  const fit = eclipse.elements;
  const axis = sampleAxis(fit.startTTDays, fit.endTTDays);
  const shifted = fitBesselian(axis, fit.deltaTSeconds + 1);
  const tt = eclipse.greatest.ttDays;
  const a = besselianAt(fit, tt);
  const b = besselianAt(shifted, tt);
  assert.equal(a.x, b.x);
  assert.equal(a.y, b.y);
  // At the same TT the Earth has turned 1 s of UT (× 1.00273791, the sidereal rate) less, so the shadow falls further east.
  const muShiftDeg = ((a.muRad - b.muRad) * 180) / Math.PI;
  assert.ok(Math.abs(muShiftDeg - 1.00273791 / 240) < 1e-7, `μ shift ${muShiftDeg}°`);
  const moved = describeSolarEclipse(shifted, tt, { seconds: eclipse.deltaT.seconds + 1, source: 'user' });
  assert.ok(Math.abs(moved.greatestPoint[0] - eclipse.greatestPoint[0] - 1.00273791 / 240) < 1e-6, 'greatest point longitude');
  assert.ok(Math.abs(eclipse.greatestPoint[1] - moved.greatestPoint[1]) < 1e-9, 'greatest point latitude');
});
