/**
 * The solar new-moon prefilter (mayHoldSolarEclipse, src/eclipses/solar/catalogue.ts)
 * never drops an eclipse: checked over the whole supported range, years 1000–3000,
 * against astronomy-engine's own global search and against the filter it replaced
 * (|sin F| ≤ 0.40); its series is Meeus ch. 54 as astronomia implements it. And
 * the catalogue skips new moons whose mean lies beyond MEAN_PHASE_REACH_DAYS
 * of the range (src/eclipses/common/range.ts): that reach holds with room.
 */
import assert from 'node:assert/strict';
import { test } from 'node:test';
import { NextGlobalSolarEclipse, SearchGlobalSolarEclipse } from 'astronomy-engine';
import eclipseMeeus from 'astronomia/eclipse';
import { findSolarEclipses, LARGEST_PENUMBRA_L1, LARGEST_SOLAR_GAMMA, mayHoldSolarEclipse, meanNewMoonTTDays, solarEclipseAtLunation } from '../../src/eclipses/solar/catalogue.ts';
import { MEAN_PHASE_REACH_DAYS, SUPPORTED_RANGE } from '../../src/eclipses/common/range.ts';
import { GAMMA_SERIES_MARGIN, lunationIndexNear, meanArgumentOfLatitude, meeusSolarGamma } from '../../src/eclipses/common/lunations.ts';
import { besselianAt } from '../../src/eclipses/solar/besselian.ts';
import { fixedDeltaTModel } from '../../src/ephemeris/deltaT.ts';
import { utDaysFromDate } from '../../src/ephemeris/time.ts';

const FIRST_K = lunationIndexNear(utDaysFromDate(SUPPORTED_RANGE.from) - 1) - 1;
const LAST_K = lunationIndexNear(utDaysFromDate(SUPPORTED_RANGE.to) + 1) + 1;
const newMoons = Array.from({ length: LAST_K - FIRST_K + 1 }, (_, i) => FIRST_K + i);

/** The filter this one replaced: the mean argument of latitude within about 23.6° of a node. */
const oldFilter = (k: number): boolean => Math.abs(Math.sin(meanArgumentOfLatitude(k))) <= 0.4;

/** astronomia's Meeus ch. 54 at new moon k: it snaps a decimal year to the new moon nearest it. */
const meeusAt = (k: number) => eclipseMeeus.solar(2000 + k / 12.3685);

test('γ of the series is Meeus ch. 54 as astronomia implements it, to 1e-9 Earth radii, at every solar eclipse astronomia finds in 1000–3000', () => {
  let checked = 0;
  for (const k of newMoons) {
    const result = meeusAt(k);
    if (result.distance === undefined) continue;
    assert.ok(Math.abs(meeusSolarGamma(k) - result.distance) < 1e-9, `k = ${k}: ${meeusSolarGamma(k)} against ${result.distance}`);
    checked++;
  }
  assert.ok(checked > 4500, `${checked} eclipses compared`);
});

test('the penumbra\'s largest radius on the fundamental plane, 0.5761 Earth radii, is at least Meeus ch. 54\'s largest p = u + 0.5461 (astronomia), by under 0.002', () => {
  assert.ok(Math.abs(LARGEST_PENUMBRA_L1 - 0.5761) < 5e-5, `${LARGEST_PENUMBRA_L1}`);
  assert.equal(LARGEST_SOLAR_GAMMA, 1 + LARGEST_PENUMBRA_L1);
  let largestP = 0;
  for (const k of newMoons) {
    const result = meeusAt(k);
    if (result.penumbral !== undefined) largestP = Math.max(largestP, result.penumbral);
  }
  assert.ok(largestP > 0.57 && largestP <= LARGEST_PENUMBRA_L1 && LARGEST_PENUMBRA_L1 - largestP < 0.002, `Meeus's largest p ${largestP}, ours ${LARGEST_PENUMBRA_L1}`);
});

test('every solar eclipse astronomy-engine finds in years 1000–3000 (SearchGlobalSolarEclipse, NextGlobalSolarEclipse) lies at a new moon the prefilter keeps, its peak within half the reach of that mean new moon', () => {
  let found = 0;
  let farthest = 0;
  let eclipse = SearchGlobalSolarEclipse(SUPPORTED_RANGE.from);
  while (eclipse.peak.date < SUPPORTED_RANGE.to) {
    const k0 = lunationIndexNear(eclipse.peak.tt);
    const k = [k0 - 1, k0, k0 + 1].reduce((a, b) => (Math.abs(meanNewMoonTTDays(a) - eclipse.peak.tt) <= Math.abs(meanNewMoonTTDays(b) - eclipse.peak.tt) ? a : b));
    farthest = Math.max(farthest, Math.abs(meanNewMoonTTDays(k) - utDaysFromDate(eclipse.peak.date)));
    assert.ok(mayHoldSolarEclipse(k), `the ${eclipse.kind} eclipse of ${eclipse.peak.date.toISOString()} (γ ${meeusSolarGamma(k).toFixed(4)}) would be dropped`);
    found++;
    eclipse = NextGlobalSolarEclipse(eclipse.peak);
  }
  assert.ok(found > 4700, `${found} eclipses`);
  // Meeus ch. 49: true and mean phases differ by up to about 0.6 d; ΔT and greatest-vs-conjunction add under 0.1 d.
  assert.ok(farthest < 0.75, `farthest ${farthest.toFixed(3)} d`);
  assert.ok(farthest < MEAN_PHASE_REACH_DAYS / 2, 'the reach has a factor of two to spare');
});

test('one year holds the same solar eclipses as the three years around it, cut at its ends; a range of an hour around an eclipse finds it, also at the ends of the supported range', () => {
  const year = (y: number) => new Date(Date.UTC(y, 0, 1));
  const wide = findSolarEclipses({ from: year(2025), to: year(2028) });
  const narrow = findSolarEclipses({ from: year(2026), to: year(2027) });
  assert.deepEqual(narrow, wide.filter((e) => e.greatest.utDays >= utDaysFromDate(year(2026)) && e.greatest.utDays < utDaysFromDate(year(2027))));
  assert.deepEqual(narrow.map((e) => [e.id, e.kind]), [['2026-02-17', 'annular'], ['2026-08-12', 'total']], 'from memory');
  for (const start of ['1000-01-01', '2026-12-01', '2999-06-01']) {
    let eclipse = SearchGlobalSolarEclipse(new Date(`${start}T00:00:00Z`));
    for (let i = 0; i < 3 && eclipse.peak.date < SUPPORTED_RANGE.to; i++, eclipse = NextGlobalSolarEclipse(eclipse.peak)) {
      const peak = eclipse.peak.date.getTime();
      // astronomy-engine and our catalogue agree on greatest eclipse to well under half an hour.
      const found = findSolarEclipses({ from: new Date(peak - 1_800_000), to: new Date(Math.min(peak + 1_800_000, SUPPORTED_RANGE.to.getTime())) });
      assert.equal(found.length, 1, `${eclipse.peak.date.toISOString()}`);
    }
  }
});

test('no eclipse the old filter (|sin F| ≤ 0.40) let through is lost over years 1000–3000; the series stays within a third of the margin of our γ; under 10 % of the samplings left find nothing', () => {
  const deltaT = fixedDeltaTModel(0);
  let kept = 0;
  let withEclipse = 0;
  let dropped = 0;
  let largestError = 0;
  let largestL1 = 0;
  for (const k of newMoons) {
    if (mayHoldSolarEclipse(k)) {
      kept++;
      const eclipse = solarEclipseAtLunation(k, deltaT);
      if (!eclipse) continue;
      withEclipse++;
      largestError = Math.max(largestError, Math.abs(meeusSolarGamma(k) - eclipse.gamma));
      largestL1 = Math.max(largestL1, besselianAt(eclipse.elements, eclipse.greatest.ttDays).l1);
    } else if (oldFilter(k)) {
      dropped++;
      assert.equal(solarEclipseAtLunation(k, deltaT), undefined, `k = ${k}: an eclipse is dropped (γ ${meeusSolarGamma(k).toFixed(4)})`);
    }
  }
  assert.ok(!newMoons.some((k) => mayHoldSolarEclipse(k) && !oldFilter(k)), 'the new filter keeps nothing the old one dropped');
  assert.ok(dropped > 1200, `${dropped} samplings saved`);
  assert.ok(largestError < GAMMA_SERIES_MARGIN / 3, `Meeus's γ within ${largestError.toFixed(4)} of ours`);
  assert.ok(largestL1 < LARGEST_PENUMBRA_L1, `l1 at greatest reaches ${largestL1.toFixed(4)}`);
  const wasted = (kept - withEclipse) / kept;
  assert.ok(wasted < 0.1, `${(100 * wasted).toFixed(1)} % of samplings find no eclipse (${kept} kept, ${withEclipse} eclipses)`);
});
