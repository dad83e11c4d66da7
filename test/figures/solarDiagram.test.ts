/**
 * The solar diagram: the Sun and the Moon as one place sees them at maximum. The drawn discs are
 * checked against the computed obscuration and magnitude and against astronomy-engine (an independent
 * ephemeris library: its own local eclipse search and topocentric positions); the caution is on it and
 * the lunar naked-eye line never is; bad places give one clear line.
 */
import assert from 'node:assert/strict';
import { existsSync, mkdtempSync, readFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { after, before, test } from 'node:test';
import { Body, DeltaT_EspenakMeeus, Equator, MakeTime, Observer as EngineObserver, SearchLocalSolarEclipse, SetDeltaTFunction } from 'astronomy-engine';
import { main } from '../../src/cli/main.ts';
import { standardDeltaTModel } from '../../src/ephemeris/deltaT.ts';
import { civilClock } from '../../src/ephemeris/civilTime.ts';
import { decimalYearFromDays } from '../../src/ephemeris/time.ts';
import { composeSolarDiagramScene } from '../../src/figures/solar/diagram.ts';
import { THEMES, THEME_NAMES } from '../../src/figures/theme.ts';
import { solarDiscsAtMaximum, solarLocalCircumstances } from '../../src/local/solar.ts';
import { renderSolarDiagramFile } from '../../src/outputs/solarDiagramFile.ts';
import { solarEclipseOn } from '../eclipses/solarSupport.ts';

const DAY_MS = 86_400_000;
const DEG = Math.PI / 180;

before(() => {
  // Test code only: astronomy-engine's global ΔT set to our model, so that its instants match ours.
  const model = standardDeltaTModel();
  SetDeltaTFunction((ut: number) => model.at(decimalYearFromDays(ut)).seconds);
});
after(() => SetDeltaTFunction(DeltaT_EspenakMeeus));

async function run(args: string[]) {
  let stdout = '';
  let stderr = '';
  const code = await main(args, { stdout: (t) => (stdout += t), stderr: (t) => (stderr += t), now: () => new Date('2026-01-10T00:00:00Z') });
  return { code, stdout, stderr };
}

/** Places that see a partial, an annular and a deep partial phase with the Sun up (positions chosen by us). */
const CASES = [
  { id: '2026-08-12', name: 'Kestrel Ridge (test)', latDeg: 52.52, lonDeg: 13.4, zone: 'Europe/Berlin' },
  { id: '2024-10-02', name: 'Rapa Nui (test)', latDeg: -27.1, lonDeg: -109.4, zone: 'Pacific/Easter' },
  { id: '2027-08-02', name: 'Night Notes office (test)', latDeg: 51.5, lonDeg: -0.13, zone: 'Europe/London' },
  { id: '2024-04-08', name: 'Front Range (test)', latDeg: 39.74, lonDeg: -104.99, zone: 'America/Denver' },
] as const;

function sceneFor(c: (typeof CASES)[number], theme = THEMES.light, size = { widthPx: 1600, heightPx: 1000 }) {
  const eclipse = solarEclipseOn(c.id);
  const observer = { latDeg: c.latDeg, lonDeg: c.lonDeg };
  const discs = solarDiscsAtMaximum(eclipse, observer);
  const scene = composeSolarDiagramScene({
    local: solarLocalCircumstances(eclipse, observer), discs, placeName: c.name, clock: civilClock(c.zone), theme, size, generator: 'umbracast test',
  });
  return { eclipse, discs, scene };
}

/** Every circle drawn in the SVG: centre and radius, page pixels. */
const circles = (svg: string) => [...svg.matchAll(/<circle cx="([-\d.]+)" cy="([-\d.]+)" r="([-\d.]+)"/g)].map((m) => ({ x: Number(m[1]), y: Number(m[2]), r: Number(m[3]) }));

/** The share of disc a's area that disc b covers, counted on a fine grid over a (no formula shared with the code). */
function coveredShare(a: { x: number; y: number; r: number }, b: { x: number; y: number; r: number }): number {
  const step = a.r / 400;
  let inA = 0;
  let inBoth = 0;
  for (let x = a.x - a.r; x <= a.x + a.r; x += step) {
    for (let y = a.y - a.r; y <= a.y + a.r; y += step) {
      if ((x - a.x) ** 2 + (y - a.y) ** 2 > a.r * a.r) continue;
      inA++;
      if ((x - b.x) ** 2 + (y - b.y) ** 2 <= b.r * b.r) inBoth++;
    }
  }
  return inBoth / inA;
}

test('the drawn overlap over the drawn Sun is the computed obscuration, and astronomy-engine\'s (SearchLocalSolarEclipse, an independent library)', () => {
  for (const c of CASES) {
    const { discs, scene } = sceneFor(c);
    const drawn = circles(scene.svg);
    // The SVG's first two discs of the figure's radii are the Sun and the Moon as drawn.
    const sun = drawn.find((d) => Math.abs(d.r - scene.sun.r) < 0.01 && Math.abs(d.x - scene.sun.x) < 0.01)!;
    const moon = drawn.find((d) => Math.abs(d.r - scene.moon.r) < 0.01 && Math.abs(d.x - scene.moon.x) < 0.01)!;
    assert.ok(sun && moon, c.id);
    const share = coveredShare(sun, moon);
    assert.ok(Math.abs(share - discs.obscuration) < 0.003, `${c.id}: drawn ${share.toFixed(4)} vs computed ${discs.obscuration.toFixed(4)}`);
    const engine = SearchLocalSolarEclipse(MakeTime(new Date(Date.parse(`${c.id}T00:00:00Z`) - 2 * DAY_MS)), new EngineObserver(c.latDeg, c.lonDeg, 0));
    assert.ok(Math.abs(engine.peak.time.date.getTime() / DAY_MS - (discs.maximum.utDays + 10_957.5)) < 60 / 86_400, `${c.id}: same maximum within a minute`);
    assert.ok(Math.abs(share - engine.obscuration) < 0.004, `${c.id}: drawn ${share.toFixed(4)} vs astronomy-engine ${engine.obscuration.toFixed(4)}`);
  }
});

test('centre distance against magnitude: the fraction of the Sun\'s diameter covered, (R☉ + R☾ − d)/(2R☉) (Meeus, Astronomical Algorithms ch. 54\'s definition)', () => {
  for (const c of CASES) {
    const { discs, scene } = sceneFor(c);
    const d = Math.hypot(scene.moon.x - scene.sun.x, scene.moon.y - scene.sun.y);
    const drawnMagnitude = (scene.sun.r + scene.moon.r - d) / (2 * scene.sun.r);
    assert.ok(Math.abs(drawnMagnitude - discs.magnitude) < 1e-6, `${c.id}: ${drawnMagnitude} vs ${discs.magnitude}`);
    // The figure prints the same magnitude and obscuration it draws.
    assert.ok(scene.description.includes(`magnitude ${discs.magnitude.toFixed(3)}`), c.id);
    assert.ok(scene.description.includes(`obscuration ${(discs.obscuration * 100).toFixed(1)} %`), c.id);
  }
});

test('the Moon stands where astronomy-engine\'s topocentric Sun and Moon put it: position angle from north through east, east to the left, and the discs\' sizes (an independent library)', () => {
  for (const c of CASES) {
    const { discs, scene } = sceneFor(c);
    const time = MakeTime(new Date((discs.maximum.utDays + 10_957.5) * DAY_MS));
    const observer = new EngineObserver(c.latDeg, c.lonDeg, 0);
    const sun = Equator(Body.Sun, time, observer, true, true);
    const moon = Equator(Body.Moon, time, observer, true, true);
    const [as, ds, am, dm] = [sun.ra * 15 * DEG, sun.dec * DEG, moon.ra * 15 * DEG, moon.dec * DEG];
    // Position angle of the Moon from the Sun (Meeus, Astronomical Algorithms ch. 48's formula for a bright limb, same form).
    const pa = Math.atan2(Math.cos(dm) * Math.sin(am - as), Math.sin(dm) * Math.cos(ds) - Math.cos(dm) * Math.sin(ds) * Math.cos(am - as));
    const drawnPa = Math.atan2(-(scene.moon.x - scene.sun.x), -(scene.moon.y - scene.sun.y));
    const diff = Math.abs(((drawnPa - pa + 3 * Math.PI) % (2 * Math.PI)) - Math.PI) / DEG;
    assert.ok(diff < 1, `${c.id}: drawn ${(drawnPa / DEG).toFixed(1)}°, astronomy-engine ${(pa / DEG).toFixed(1)}°`);
    // The Moon's disc against the Sun's: their topocentric semi-diameters (radii 1737.4 km and 696 000 km, from memory).
    const ratio = (1737.4 / (moon.dist * 149_597_870.7)) / (696_000 / (sun.dist * 149_597_870.7));
    assert.ok(Math.abs(scene.moon.r / scene.sun.r - ratio) < 0.003, `${c.id}: ${scene.moon.r / scene.sun.r} vs ${ratio}`);
  }
});

test('every theme and preset: the caution in the header band and small print, never the lunar naked-eye line, the discs on the body (ISO 12312-2; common practice)', () => {
  const sizes = [{ widthPx: 1200, heightPx: 675 }, { widthPx: 1080, heightPx: 1080 }, { widthPx: 2126, heightPx: 1318 }, { widthPx: 1600, heightPx: 1000 }];
  for (const name of THEME_NAMES) {
    for (const size of sizes) {
      const { scene } = sceneFor(CASES[0], THEMES[name], size);
      assert.match(scene.description, /Eye safety: watch only through ISO 12312-2/);
      assert.match(scene.description, /Follow the advice of your local health authorities/);
      assert.ok(!/naked eye/i.test(scene.svg + scene.description));
      for (const disc of [scene.sun, scene.moon]) {
        assert.ok(disc.x - disc.r >= scene.body.left && disc.x + disc.r <= scene.body.right && disc.y - disc.r >= scene.body.top && disc.y + disc.r <= scene.body.bottom, `${name} ${size.widthPx}x${size.heightPx}`);
      }
    }
  }
});

test('every theme: the Moon\'s disc is drawn in a colour other than the paper\'s, so that at totality it is seen against the page (common practice: a figure shows what it names)', () => {
  for (const name of THEME_NAMES) {
    const { scene } = sceneFor(CASES[0], THEMES[name]);
    const r = scene.moon.r.toFixed(2).replace(/\.?0+$/, '');
    const moon = new RegExp(`<circle cx="[-\\d.]+" cy="[-\\d.]+" r="${r}[\\d]*" fill="(#[0-9a-f]{6})"`, 'i').exec(scene.svg);
    assert.ok(moon, `${name}: the Moon's disc`);
    assert.notEqual(moon[1]!.toLowerCase(), THEMES[name].paper.toLowerCase(), name);
  }
});

test('the command: default place the greatest point, a named place, the caption with the caution; bad input one line, exit 2, nothing written', async () => {
  const dir = mkdtempSync(join(tmpdir(), 'umbracast-solar-diagram-'));
  const first = await run(['diagram', '2026-08-12', '-o', join(dir, 'a.png')]);
  assert.equal(first.code, 0, first.stderr);
  const caption = readFileSync(join(dir, 'a.txt'), 'utf8');
  assert.match(caption, /from the greatest point \(65\.\d\d°N 25\.\d\d°W\)/);
  assert.match(caption, /ISO 12312-2/);
  assert.ok(!/naked eye/i.test(caption));
  const svg = await run(['diagram', '2026-08-12', '--at', '52.52,13.40', '--theme', 'dark', '--preset', 'square', '-o', join(dir, 'b.svg')]);
  assert.equal(svg.code, 0, svg.stderr);
  assert.ok(existsSync(join(dir, 'b.svg')) && existsSync(join(dir, 'b.txt')));
  for (const [args, flag] of [
    [['2026-08-12', '--place', 'Sydney'], '--place'],
    [['2026-08-12', '--at', '-33.87,151.21'], '--at'],
    [['2026-08-12', '--body', 'comet'], '--body'],
    [['2026-03-03', '--body', 'solar'], 'WHEN'],
  ] as const) {
    const out = join(dir, 'bad.png');
    const result = await run(['diagram', ...args, '-o', out]);
    assert.equal(result.code, 2, args.join(' '));
    assert.equal(result.stderr.trim().split('\n').length, 1, result.stderr);
    assert.ok(result.stderr.includes(flag), result.stderr);
    assert.ok(!existsSync(out));
  }
});
