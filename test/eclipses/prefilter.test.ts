/**
 * The lunation prefilter (src/eclipses/common/lunations.ts) never drops an eclipse:
 * checked over the whole supported range, years 1000–3000, against
 * astronomy-engine's own eclipse search and against the old |sin F| ≤ 0.5 filter.
 */
import assert from 'node:assert/strict';
import { test } from 'node:test';
import { NextLunarEclipse, SearchLunarEclipse } from 'astronomy-engine';
import eclipseMeeus from 'astronomia/eclipse';
import { eclipseAtLunation } from '../../src/eclipses/lunar/catalogue.ts';
import { SUPPORTED_RANGE } from '../../src/eclipses/common/range.ts';
import { chauvenet, danjon } from '../../src/eclipses/lunar/conventions.ts';
import { largestPenumbralGamma, lunationIndexNear, mayHoldLunarEclipse, meanFullMoonTTDays, meeusLunarGamma } from '../../src/eclipses/common/lunations.ts';
import { fixedDeltaTModel } from '../../src/ephemeris/deltaT.ts';
import { utDaysFromDate } from '../../src/ephemeris/time.ts';

const DEG = Math.PI / 180;
const FIRST_K = lunationIndexNear(utDaysFromDate(SUPPORTED_RANGE.from) - 1) - 1;
const LAST_K = lunationIndexNear(utDaysFromDate(SUPPORTED_RANGE.to) + 1) + 1;
const lunations = Array.from({ length: LAST_K - FIRST_K + 1 }, (_, i) => FIRST_K + i);

/** The filter this one replaced: the mean argument of latitude within 30° of a node. */
function oldFilter(k: number): boolean {
  const kFull = k + 0.5;
  const T = kFull / 1236.85;
  const F = (160.7108 + 390.67050284 * kFull - 0.0016118 * T ** 2 - 0.00000227 * T ** 3 + 0.000000011 * T ** 4) * DEG;
  return Math.abs(Math.sin(F)) <= 0.5;
}

test('γ of the series is Meeus ch. 54 as astronomia implements it, to 1e-9 Earth radii, at every eclipse astronomia finds in 1000–3000', () => {
  let checked = 0;
  for (let k = FIRST_K; k <= LAST_K; k += 1) {
    // astronomia snaps a decimal year to the full moon k + 0.5 nearest it.
    const result = eclipseMeeus.lunar(2000 + (k + 0.5) / 12.3685);
    if (result.distance === undefined) continue;
    assert.ok(Math.abs(meeusLunarGamma(k) - result.distance) < 1e-9, `k = ${k}: ${meeusLunarGamma(k)} against ${result.distance}`);
    checked++;
  }
  assert.ok(checked > 4500, `${checked} eclipses compared`);
});

test('the penumbral limit is the largest the shadow can be: Danjon 1.5873, Chauvenet 1.6017 Earth radii (Danjon 1951; Chauvenet 1891; extremes from Meeus ch. 25 and 50)', () => {
  assert.ok(Math.abs(largestPenumbralGamma(danjon) - 1.5873) < 5e-5, `${largestPenumbralGamma(danjon)}`);
  assert.ok(Math.abs(largestPenumbralGamma(chauvenet) - 1.6017) < 5e-5, `${largestPenumbralGamma(chauvenet)}`);
});

test('every lunar eclipse astronomy-engine finds in years 1000–3000 (SearchLunarEclipse, NextLunarEclipse) lies at a lunation the prefilter keeps, for both conventions', () => {
  let found = 0;
  let eclipse = SearchLunarEclipse(SUPPORTED_RANGE.from);
  while (eclipse.peak.date < SUPPORTED_RANGE.to) {
    const k0 = lunationIndexNear(eclipse.peak.tt);
    const k = [k0 - 1, k0].reduce((a, b) => (Math.abs(meanFullMoonTTDays(a) - eclipse.peak.tt) <= Math.abs(meanFullMoonTTDays(b) - eclipse.peak.tt) ? a : b));
    assert.ok(Math.abs(meanFullMoonTTDays(k) - eclipse.peak.tt) < 1, `eclipse of ${eclipse.peak.date.toISOString()} not matched to a mean full moon`);
    assert.ok(mayHoldLunarEclipse(k, danjon) && mayHoldLunarEclipse(k, chauvenet), `the ${eclipse.kind} eclipse of ${eclipse.peak.date.toISOString()} (γ ${meeusLunarGamma(k).toFixed(4)}) would be dropped`);
    found++;
    eclipse = NextLunarEclipse(eclipse.peak);
  }
  assert.ok(found > 4800, `${found} eclipses`);
});

test('no eclipse the old filter (|sin F| ≤ 0.5) let through is lost over years 1000–3000, in either convention; fewer than 5 % of the samplings it leaves find nothing', () => {
  const deltaT = fixedDeltaTModel(0);
  let kept = 0;
  let withEclipse = 0;
  let dropped = 0;
  for (const k of lunations) {
    if (mayHoldLunarEclipse(k, danjon)) {
      kept++;
      if (eclipseAtLunation(k, danjon, deltaT)) withEclipse++;
    } else if (oldFilter(k)) {
      dropped++;
      assert.equal(eclipseAtLunation(k, danjon, deltaT), undefined, `k = ${k}: a Danjon eclipse is dropped`);
    }
    if (oldFilter(k) && !mayHoldLunarEclipse(k, chauvenet)) {
      assert.equal(eclipseAtLunation(k, chauvenet, deltaT), undefined, `k = ${k}: a Chauvenet eclipse is dropped`);
    }
  }
  assert.ok(dropped > 3000, `${dropped} samplings saved`);
  const wasted = (kept - withEclipse) / kept;
  assert.ok(wasted < 0.05, `${(100 * wasted).toFixed(1)} % of samplings find no eclipse (${kept} kept, ${withEclipse} eclipses)`);
});
