/**
 * findLunarEclipses skips, unsampled, every lunation whose mean full moon lies
 * more than MEAN_PHASE_REACH_DAYS outside the range asked for. The bound
 * must hold with room to spare: checked over the whole supported range
 * against astronomy-engine's own lunar-eclipse search (an independent
 * ephemeris and search), and at the edges of narrow ranges.
 */
import assert from 'node:assert/strict';
import { test } from 'node:test';
import { NextLunarEclipse, SearchLunarEclipse } from 'astronomy-engine';
import { findLunarEclipses } from '../../src/eclipses/lunar/catalogue.ts';
import { MEAN_PHASE_REACH_DAYS, SUPPORTED_RANGE } from '../../src/eclipses/common/range.ts';
import { lunationIndexNear, meanFullMoonTTDays } from '../../src/eclipses/common/lunations.ts';
import { utDaysFromDate } from '../../src/ephemeris/time.ts';

/** Days from an instant (UT days) to the nearest mean full moon (TT days), Meeus ch. 49. */
function toNearestMeanFullMoon(utDays: number): number {
  const k = lunationIndexNear(utDays);
  return Math.min(...[k - 2, k - 1, k, k + 1].map((j) => Math.abs(meanFullMoonTTDays(j) - utDays)));
}

test('every lunar eclipse astronomy-engine finds in years 1000–3000 peaks within half the reach of a mean full moon', () => {
  let eclipse = SearchLunarEclipse(SUPPORTED_RANGE.from);
  let count = 0;
  let farthest = 0;
  while (eclipse.peak.date < SUPPORTED_RANGE.to) {
    farthest = Math.max(farthest, toNearestMeanFullMoon(utDaysFromDate(eclipse.peak.date)));
    count++;
    eclipse = NextLunarEclipse(eclipse.peak);
  }
  assert.ok(count > 4800, `${count} eclipses`);
  // Meeus ch. 49: true and mean phases differ by up to about 0.6 d; ΔT and greatest-vs-opposition add under 0.1 d.
  assert.ok(farthest < 0.75, `farthest ${farthest.toFixed(3)} d`);
  assert.ok(farthest < MEAN_PHASE_REACH_DAYS / 2, 'the reach has a factor of two to spare');
});

test('a range of an hour around an eclipse finds it, also at the ends of the supported range', () => {
  for (const start of ['1000-01-01', '1500-06-01', '2026-01-01', '2500-06-01', '2999-01-01']) {
    let eclipse = SearchLunarEclipse(new Date(`${start}T00:00:00Z`));
    for (let i = 0; i < 6 && eclipse.peak.date < SUPPORTED_RANGE.to; i++, eclipse = NextLunarEclipse(eclipse.peak)) {
      const peak = eclipse.peak.date.getTime();
      // astronomy-engine and our catalogue agree on greatest eclipse to well under half an hour.
      const found = findLunarEclipses({ from: new Date(peak - 1_800_000), to: new Date(Math.min(peak + 1_800_000, SUPPORTED_RANGE.to.getTime())) });
      assert.equal(found.length, 1, `${eclipse.peak.date.toISOString()}`);
      assert.ok(Math.abs(found[0]!.greatest.utDays - utDaysFromDate(eclipse.peak.date)) < 1 / 48);
    }
  }
});

test('one year holds the same eclipses as the two years around it, cut at its ends (astronomy-engine agrees on the count)', () => {
  const year = (y: number) => new Date(Date.UTC(y, 0, 1));
  const wide = findLunarEclipses({ from: year(2025), to: year(2028) });
  const narrow = findLunarEclipses({ from: year(2026), to: year(2027) });
  assert.deepEqual(narrow, wide.filter((e) => e.greatest.utDays >= utDaysFromDate(year(2026)) && e.greatest.utDays < utDaysFromDate(year(2027))));
  let bare = 0;
  for (let e = SearchLunarEclipse(year(2026)); e.peak.date < year(2027); e = NextLunarEclipse(e.peak)) bare++;
  assert.equal(narrow.length, bare);
  assert.equal(narrow.length, 2, '2026-03-03 and 2026-08-28 (from memory)');
});
