/**
 * The lunar figures' words: the naked-eye line belongs on lunar figures and
 * the solar eye-safety caution never does. A lunar eclipse is safe to watch
 * with the naked eye, while looking at the Sun needs a filter meeting
 * ISO 12312-2 (common practice, as the solar caution in src/words states).
 */
import assert from 'node:assert/strict';
import { test } from 'node:test';
import { civilClock } from '../../src/ephemeris/civilTime.ts';
import { boundaryLabel, mapLegendWords, mapTexts, skyCaption, skySmallPrint } from '../../src/words/lunar/figures.ts';
import { eclipseOn } from '../figures/support.ts';

const credits = { basemap: 'Basemap', font: 'Type' };

test('every lunar figure small print carries the naked-eye line and no solar caution', () => {
  for (const date of ['2026-03-03', '2026-08-28', '2027-02-20']) {
    const eclipse = eclipseOn(date);
    const texts = [
      mapTexts(eclipse, civilClock('UTC'), '69.2 s', 'umbracast test', credits).smallPrint,
      skySmallPrint(eclipse, 'UTC', 'umbracast test', { places: '', font: 'Type' }),
    ];
    for (const text of texts) {
      assert.match(text, /A lunar eclipse is safe to watch with the naked eye\./);
      assert.doesNotMatch(text, /12312|eclipse glasses|Never look/);
    }
  }
});

test('the legend names the phase that defines the zones: the umbral phase, or the whole of a penumbral eclipse', () => {
  const total = mapLegendWords(eclipseOn('2026-03-03'), 'totality', ['P1', 'U1', 'U2', 'U3', 'U4', 'P4'], false);
  assert.equal(total.zoneAll, 'Moon up for all of the umbral phase');
  assert.equal(total.field, 'minutes of totality with the Moon up');
  assert.match(total.codes, /U2\/U3 totality begins\/ends/);
  const penumbral = mapLegendWords(eclipseOn('2027-02-20'), 'penumbral', ['P1', 'P4'], true);
  assert.equal(penumbral.zoneAll, 'Moon up for all of the eclipse');
  assert.doesNotMatch(penumbral.codes, /U1|U2/);
  assert.equal(penumbral.town, 'marked town: the key phase in its own time');
});

test('line labels say which way the Moon crosses the horizon and at which stage', () => {
  // West of the sub-lunar point the Moon rises (the Earth turns places into view): common practice.
  assert.equal(boundaryLabel(true, 'U2', 'total', '11:05'), 'Moon rises as totality begins · 11:05');
  assert.equal(boundaryLabel(false, 'P1', 'penumbral', '03:12'), 'Moon sets as the eclipse begins · 03:12');
  assert.equal(boundaryLabel(false, 'P1', 'partial', '03:12'), 'Moon sets as the faint outer shadow begins · 03:12');
  assert.match(skyCaption('Title', 'Summary.', 'Kestrel Ridge'), /^Title\. Summary\.\n\nAlt text: .*Kestrel Ridge/);
});
