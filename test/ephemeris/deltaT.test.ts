import assert from 'node:assert/strict';
import { test } from 'node:test';
import { fixedDeltaTModel, FORECAST_JOIN_YEAR, standardDeltaTModel } from '../../src/ephemeris/deltaT.ts';

const model = standardDeltaTModel();

test('2025 uses the observed value, about 69.1 s (IERS Bulletin A: 32.184 s + 37 s − (UT1−UTC), from memory)', () => {
  const dt = model.at(2025.2);
  assert.equal(dt.source, 'observed');
  assert.ok(Math.abs(dt.seconds - 69.1) < 0.15, `got ${dt.seconds}`);
});

test('2017–2025 stays within 32.184 + 37 ∓ 0.9 s (IERS: TAI−UTC = 37 s since 2017; leap seconds keep |UT1−UTC| < 0.9 s)', () => {
  for (let year = 2017; year <= 2025.9; year += 0.25) {
    const { seconds } = model.at(year);
    assert.ok(seconds > 69.184 - 0.9 && seconds < 69.184 + 0.9, `${year}: ${seconds}`);
  }
});

test('2000.0 is 63.8 s (IERS/USNO yearly ΔT, from memory)', () => {
  assert.ok(Math.abs(model.at(2000).seconds - 63.83) < 0.05);
});

test('1000.0 follows Espenak & Meeus (2006), whose 500–1600 polynomial has 1574.2 s there', () => {
  const dt = model.at(1000);
  assert.equal(dt.source, 'long-term');
  assert.ok(Math.abs(dt.seconds - 1574.2) < 1e-9);
});

test('beyond the forecast the long-term parabola −20 + 32u² applies (Morrison & Stephenson; Espenak & Meeus)', () => {
  const dt = model.at(2500);
  assert.equal(dt.source, 'long-term');
  assert.ok(Math.abs(dt.seconds - (-20 + 32 * 6.8 ** 2)) < 1e-9);
});

test('no jump where the pieces join (common practice: ΔT is continuous)', () => {
  for (const year of [1600, 1700, 1800, 1860, 1900, 1920, 1941, 1955, 1961, 2026, FORECAST_JOIN_YEAR]) {
    const before = model.at(year - 1e-6).seconds;
    const after = model.at(year + 1e-6).seconds;
    assert.ok(Math.abs(after - before) < 0.6, `${year}: ${before} → ${after}`);
  }
});

test('the forecast starts at the last observation and grows, as the long-term trend does (common practice)', () => {
  assert.equal(model.at(2030).source, 'forecast');
  assert.ok(Math.abs(model.at(2026.001).seconds - model.at(2025.999).seconds) < 0.01);
  assert.ok(model.at(2100).seconds > model.at(2050).seconds);
  assert.ok(model.at(2050).seconds > 69 && model.at(2050).seconds < 120);
});

test('a user value replaces the model and says so', () => {
  const fixed = fixedDeltaTModel(70.5);
  assert.deepEqual(fixed.at(1500), { seconds: 70.5, source: 'user' });
  assert.match(fixed.name, /user/);
});
