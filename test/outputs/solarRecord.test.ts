/**
 * The solar catalogue record (issue 15's field list): every field present,
 * of the documented type and unit, and the figures of two well-known total
 * eclipses (recalled values, marked "from memory").
 */
import assert from 'node:assert/strict';
import { test } from 'node:test';
import { solarEclipseRecord } from '../../src/eclipses/solar/record.ts';
import { solarEclipseOn } from '../eclipses/solarSupport.ts';

const ISO_SECONDS = /^\d{4}-\d\d-\d\dT\d\d:\d\d:\d\dZ$/;

test('the record carries body, kind, greatest, greatestTT, deltaT, deltaTSource, gamma, magnitude, saros, greatestPoint [lon, lat], sunAltitude, pathWidthKm, durations.central, contacts and the k values (issue 15; k1, k2: common practice)', () => {
  const record = solarEclipseRecord(solarEclipseOn('2027-08-02'));
  assert.deepEqual(Object.keys(record), [
    'body', 'id', 'kind', 'central', 'greatest', 'greatestTT', 'deltaT', 'deltaTSource', 'gamma', 'magnitude', 'saros',
    'greatestPoint', 'sunAltitude', 'pathWidthKm', 'contacts', 'durations', 'moonRadius',
  ]);
  assert.equal(record.body, 'solar');
  assert.equal(record.kind, 'total');
  assert.match(record.greatest, ISO_SECONDS);
  assert.match(record.greatestTT, ISO_SECONDS);
  // TT − UT is ΔT, to the rounding of both instants to the second.
  assert.ok(Math.abs((Date.parse(record.greatestTT) - Date.parse(record.greatest)) / 1000 - record.deltaT) <= 1);
  assert.deepEqual(record.moonRadius, { penumbra: 0.2725076, umbra: 0.272281 });
  for (const contact of Object.values(record.contacts)) assert.match(contact!, ISO_SECONDS);
});

test('2027-08-02 (from memory): greatest about 10:07 TT near 25.5°N 33.2°E, totality about 6 min 23 s', () => {
  const record = solarEclipseRecord(solarEclipseOn('2027-08-02'));
  const greatestTT = Date.parse(record.greatestTT);
  assert.ok(Math.abs(greatestTT - Date.parse('2027-08-02T10:07:00Z')) <= 60_000, record.greatestTT);
  assert.ok(Math.abs(record.greatestPoint[0] - 33.2) < 0.2 && Math.abs(record.greatestPoint[1] - 25.5) < 0.2, String(record.greatestPoint));
  assert.ok(Math.abs(record.durations.central! - 383) <= 3, String(record.durations.central));
  assert.ok(record.sunAltitude > 80, 'the Sun nearly overhead at greatest (from memory: an eclipse near the subsolar point)');
});

test('2024-04-08 (from memory): greatest about 18:17 UT near 25.3°N 104.1°W, about 4 min 28 s and about 198 km wide', () => {
  const record = solarEclipseRecord(solarEclipseOn('2024-04-08'));
  assert.ok(Math.abs(Date.parse(record.greatest) - Date.parse('2024-04-08T18:17:00Z')) <= 60_000, record.greatest);
  assert.ok(Math.abs(record.greatestPoint[0] + 104.1) < 0.2 && Math.abs(record.greatestPoint[1] - 25.3) < 0.2, String(record.greatestPoint));
  assert.ok(Math.abs(record.durations.central! - 268) <= 3);
  assert.ok(Math.abs(record.pathWidthKm! - 198) <= 3);
});
