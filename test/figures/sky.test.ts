/**
 * The view-from-here figure as a reader meets it: labels clear of the
 * events' dots, the Moon's path visible on every sky, where to look along
 * it (checked against astronomy-engine's topocentric Moon), zone names in
 * words, its caption beside it, and a print style's width.
 */
import assert from 'node:assert/strict';
import { existsSync, mkdtempSync, readFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { test } from 'node:test';
import { Body, Equator, Horizon, MakeTime, Observer } from 'astronomy-engine';
import { main } from '../../src/cli/main.ts';
import { civilClock } from '../../src/ephemeris/civilTime.ts';
import { dateFromDays, momentFromUT } from '../../src/ephemeris/time.ts';
import { composeSkyScene } from '../../src/figures/sky.ts';
import { THEMES, THEME_NAMES } from '../../src/figures/theme.ts';
import { findPlace } from '../../src/places/gazetteer.ts';
import { altitudeTrack, localCircumstances } from '../../src/local/lunar.ts';
import { eclipseOn } from './support.ts';

const lightness = (hex: string) => {
  const linear = [1, 3, 5].map((i) => {
    const c = parseInt(hex.slice(i, i + 2), 16) / 255;
    return c <= 0.04045 ? c / 12.92 : ((c + 0.055) / 1.055) ** 2.4;
  });
  const y = 0.2126 * linear[0]! + 0.7152 * linear[1]! + 0.0722 * linear[2]!;
  return y > 216 / 24389 ? 116 * Math.cbrt(y) - 16 : (24389 / 27) * y;
};

function skyScene(date: string, placeName: string, zone: string) {
  const eclipse = eclipseOn(date);
  const place = { ...findPlace(placeName), tz: zone };
  const local = localCircumstances(eclipse, place);
  const p1 = eclipse.contacts.P1!;
  const p4 = eclipse.contacts.P4!;
  const track = altitudeTrack(place, momentFromUT(p1.utDays - 1 / 24, p1.deltaTSeconds), momentFromUT(p4.utDays + 1 / 24, p4.deltaTSeconds));
  return { place, scene: composeSkyScene({ eclipse, placeName: place.name, clock: civilClock(zone), events: local.events, track, summary: 'test', theme: THEMES.light, size: { widthPx: 1600, heightPx: 900 }, generator: 'umbracast test', credits: '' }) };
}

test('no label covers an event\'s dot — the moonset label included (places where the Moon sets near U4 or rises near U1)', () => {
  for (const [date, name, zone] of [['2026-03-03', 'Tokyo', 'Asia/Tokyo'], ['2026-03-03', 'Denver', 'America/Denver'], ['2026-08-28', 'Denver', 'America/Denver'], ['2026-08-28', 'Dakar', 'Africa/Dakar'], ['2025-03-14', 'Adelaide', 'Australia/Adelaide']] as const) {
    const { scene } = skyScene(date, name, zone);
    for (const plate of [...scene.labelPlates, ...scene.compassMarks.map((m) => m.plate)]) {
      for (const dot of scene.dots) {
        const apart = plate.right <= dot.left || dot.right <= plate.left || plate.bottom <= dot.top || dot.bottom <= plate.top;
        assert.ok(apart, `${date} ${name}: a label covers a dot`);
      }
    }
  }
});

test('the compass points along the path say where the Moon is (astronomy-engine Equator + Horizon azimuth, 16 points of 22.5°)', () => {
  const points = ['N', 'NNE', 'NE', 'ENE', 'E', 'ESE', 'SE', 'SSE', 'S', 'SSW', 'SW', 'WSW', 'W', 'WNW', 'NW', 'NNW'];
  const { scene, place } = skyScene('2026-03-03', 'Tokyo', 'Asia/Tokyo');
  assert.ok(scene.compassMarks.length >= 4);
  for (const mark of scene.compassMarks) {
    const observer = new Observer(place.latDeg, place.lonDeg, 0);
    const time = MakeTime(dateFromDays(mark.utDays));
    const eq = Equator(Body.Moon, time, observer, true, true);
    const azimuth = Horizon(time, observer, eq.ra, eq.dec).azimuth;
    const index = points.indexOf(mark.text);
    const off = Math.abs(((azimuth - index * 22.5 + 540) % 360) - 180);
    assert.ok(off <= 11.25 + 0.2, `${mark.text} at azimuth ${azimuth.toFixed(1)}°`);
  }
});

for (const name of THEME_NAMES) {
  test(`${name} theme: every phase of the Moon's path stands out on every sky — its colour or its casing differs by ≥ 25 in L* (CIE L*, IEC 61966-2-1)`, () => {
    const theme = THEMES[name];
    for (const [sky, skyHex] of Object.entries(theme.sky)) {
      for (const [phase, pathHex] of Object.entries(theme.track)) {
        const step = Math.max(Math.abs(lightness(pathHex) - lightness(skyHex)), Math.abs(lightness(theme.trackCasing) - lightness(skyHex)));
        assert.ok(step >= 25, `${phase} on ${sky}: ΔL* ${step.toFixed(1)}`);
        // The faint penumbral line against its own casing, so that it reads on night and twilight alike.
        if (phase === 'penumbral') assert.ok(Math.abs(lightness(pathHex) - lightness(theme.trackCasing)) >= 40, `${phase} against its casing`);
      }
    }
  });
}

test('zones with no English abbreviation print their common name from Intl (e.g. Asia/Tokyo → "Japan Standard Time", from memory), not a bare offset', () => {
  const at = eclipseOn('2026-03-03').greatest.utDays;
  assert.equal(civilClock('Asia/Tokyo').abbreviation(at), 'Japan Standard Time');
  assert.equal(civilClock('Asia/Kathmandu').abbreviation(at), 'Nepal Time');
  assert.equal(civilClock('Australia/Adelaide').abbreviation(at), 'ACDT');
  assert.equal(civilClock('UTC').abbreviation(at), 'UTC');
});

test('sky writes its caption beside it; a print house style makes its figures as wide as its maps', async () => {
  const dir = mkdtempSync(join(tmpdir(), 'umbracast-sky-caption-'));
  const png = join(dir, 'tokyo.png');
  const quiet = { stdout: () => {}, stderr: () => {}, now: () => new Date('2026-01-10T00:00:00Z') };
  assert.equal(await main(['sky', '2026-03-03', '--place', 'Tokyo', '--preset', 'card', '-o', png], quiet), 0);
  const caption = readFileSync(join(dir, 'tokyo.txt'), 'utf8');
  assert.match(caption, /^The total lunar eclipse from Tokyo · 3 March 2026\. From Tokyo /);
  assert.match(caption, /\n\nAlt text: Chart of the Moon's height/);

  const style = join(dir, 'print.yaml');
  const { writeFileSync } = await import('node:fs');
  writeFileSync(style, 'preset: print\nwidthMm: 90\ndpi: 200\nplaces: [Dakar]\nformats: [png]\nlocalFormats: []\n');
  const out = join(dir, 'atlas');
  assert.equal(await main(['batch', '--from', '2026-03', '--to', '2026-03', '--style', style, '--out', out, '--jobs', '1'], quiet), 0);
  const sharp = (await import('sharp')).default;
  const map = await sharp(join(out, '2026-03-03-total.png')).metadata();
  const sky = await sharp(join(out, '2026-03-03-total-dakar-sky.png')).metadata();
  assert.ok(existsSync(join(out, '2026-03-03-total-dakar-sky.png')));
  assert.match(readFileSync(join(out, '2026-03-03-total-dakar-sky.txt'), 'utf8'), /^The total lunar eclipse from Dakar /);
  assert.equal(sky.width, map.width, 'as wide as the map (90 mm at 200 dpi)');
  assert.equal(sky.density, 200);
});
