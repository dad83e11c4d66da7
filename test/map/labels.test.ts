/**
 * What the map's lines and marks say to a reader, checked against an
 * independent computation: whether the Moon rises or sets at a labelled
 * place comes from astronomy-engine's topocentric Moon (Equator + Horizon),
 * not from our caps.
 */
import assert from 'node:assert/strict';
import { test } from 'node:test';
import { Body, Equator, Horizon, MakeTime, Observer } from 'astronomy-engine';
import { dateFromDays } from '../../src/ephemeris/time.ts';
import { render } from './support.ts';

const moonAltitude = (lonDeg: number, latDeg: number, utDays: number) => {
  const observer = new Observer(latDeg, lonDeg, 0);
  const time = MakeTime(dateFromDays(utDays));
  const eq = Equator(Body.Moon, time, observer, true, true);
  return Horizon(time, observer, eq.ra, eq.dec).altitude;
};

test('curve labels speak in words with the time, the code only a tag, and say rises where the Moon climbs and sets where it sinks (astronomy-engine, Equator/Horizon)', async () => {
  for (const date of ['2026-03-03', '2026-08-28', '2027-02-20']) {
    const { scene } = await render({ date, format: 'svg' });
    const labels = scene!.curveLabels;
    assert.ok(labels.length >= 6, `${date}: ${labels.length} labels`);
    for (const label of labels) {
      assert.match(label.words, /^Moon (rises|sets) (as|at) [a-z -]+ · \d\d:\d\d( [+−]\d days?)?$/, label.words);
      assert.ok(/^([PU][1-4])?$/.test(label.tag), label.tag);
      assert.ok(!/\b[PU][1-4]\b/.test(label.words), `no bare code in the words: ${label.words}`);
      const [lon, lat] = label.at;
      const climb = moonAltitude(lon, lat, label.utDays + 5 / 1440) - moonAltitude(lon, lat, label.utDays - 5 / 1440);
      assert.equal(label.words.startsWith('Moon rises'), climb > 0, `${date} ${label.words} at ${lon.toFixed(1)}, ${lat.toFixed(1)}: altitude changes by ${climb.toFixed(2)}° over 10 min`);
    }
  }
});

test('the codes are explained once, in the legend, not in the small print (common practice: one key per figure)', async () => {
  const { scene } = await render({ date: '2026-03-03', format: 'svg' });
  assert.ok(!/U1\/U4/.test(scene!.smallPrint));
  assert.ok(scene!.curveLabels.some((l) => l.tag === 'U2' && l.words.includes('as totality begins')));
});
