/**
 * The shadow diagram as a reader meets it: the circles and Moons where the geometry puts them,
 * east to the left and north up, labels apart and on the page, every theme and preset, the same
 * bytes each time, its caption beside it, and one clear line for bad input.
 */
import assert from 'node:assert/strict';
import { createHash } from 'node:crypto';
import { existsSync, mkdtempSync, readFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { test } from 'node:test';
import sharp from 'sharp';
import { main } from '../../src/cli/main.ts';
import { shadowDiagram } from '../../src/eclipses/lunar/diagram.ts';
import { civilClock } from '../../src/ephemeris/civilTime.ts';
import { composeDiagramScene } from '../../src/figures/diagram.ts';
import { overlaps } from '../../src/figures/draw.ts';
import { THEMES, THEME_NAMES } from '../../src/figures/theme.ts';
import { renderDiagramFile } from '../../src/outputs/diagramFile.ts';
import { eclipseOn } from './support.ts';

const sha256 = (bytes: Uint8Array | string) => createHash('sha256').update(bytes).digest('hex');

async function run(args: string[]) {
  let stdout = '';
  let stderr = '';
  const code = await main(args, { stdout: (t) => (stdout += t), stderr: (t) => (stderr += t), now: () => new Date('2026-01-10T00:00:00Z') });
  return { code, stdout, stderr };
}

const total = eclipseOn('2025-03-14');
const totalDiagram = shadowDiagram(total);
const scene = (size = { widthPx: 1600, heightPx: 1000 }, theme = THEMES.light, zone = 'UTC', diagram = totalDiagram) =>
  composeDiagramScene({ diagram, clock: civilClock(zone), theme, size, generator: 'umbracast test' });

/** Every circle drawn: centre and radius, page pixels. */
const circles = (svg: string) => [...svg.matchAll(/<circle cx="([-\d.]+)" cy="([-\d.]+)" r="([-\d.]+)"/g)].map((m) => ({ x: Number(m[1]), y: Number(m[2]), r: Number(m[3]) }));

test('the shadow\'s circles are drawn at the convention\'s radii and the Moon at greatest |gamma| × π_M from their centre (gamma as the catalogue defines it, Explanatory Supplement ch. 11)', () => {
  const s = scene();
  const drawn = circles(s.svg);
  const at = (r: number) => drawn.find((c) => Math.abs(c.x - s.centre.x) < 0.01 && Math.abs(c.y - s.centre.y) < 0.01 && Math.abs(c.r - r) < 0.01);
  assert.ok(at(totalDiagram.radii.penumbraRad * s.pxPerRad), 'penumbra');
  assert.ok(at(totalDiagram.radii.umbraRad * s.pxPerRad), 'umbra');
  const moonR = totalDiagram.greatest.moonSemiDiameterRad * s.pxPerRad;
  const expected = Math.abs(total.gamma) * totalDiagram.moonParallaxRad * s.pxPerRad;
  const greatest = drawn.find((c) => Math.abs(c.r - moonR) < 0.01 && Math.abs(Math.hypot(c.x - s.centre.x, c.y - s.centre.y) - expected) < 0.02);
  assert.ok(greatest, 'the Moon at greatest');
  // gamma > 0: north of the axis, so above the centre on a north-up page (common practice: gamma + north).
  assert.ok(total.gamma > 0 && greatest.y < s.centre.y);
});

test('east is to the left: the Moon, moving east against the shadow, enters on the right and leaves on the left (common practice: north up, east left, as the sky is seen)', () => {
  for (const date of ['2025-03-14', '2026-08-28', '2027-02-20']) {
    const d = shadowDiagram(eclipseOn(date));
    const s = scene(undefined, undefined, undefined, d);
    const path = /<path d="M([^"]+)" fill="none" stroke="#b8581c"/.exec(s.svg);
    assert.ok(path, date);
    const xs = path[1]!.split('L').map((point) => Number(point.split(',')[0]));
    assert.ok(xs[0]! > xs[xs.length - 1]!, `${date}: path starts at x ${xs[0]}, ends at ${xs[xs.length - 1]}`);
    // Leftward all along: the Moon overtakes the shadow eastward at every step.
    xs.slice(1).forEach((x, i) => assert.ok(x < xs[i]!, `${date} at ${i}`));
  }
});

test('every theme and preset: labels apart, on the page, the plot\'s words present (common practice: nothing overlapping, nothing cut)', () => {
  const sizes = [{ widthPx: 1200, heightPx: 675 }, { widthPx: 1080, heightPx: 1080 }, { widthPx: 2126, heightPx: 1318 }, { widthPx: 1600, heightPx: 1000 }];
  for (const date of ['2025-03-14', '2026-08-28', '2027-02-20', '2029-06-26']) {
    const d = shadowDiagram(eclipseOn(date));
    for (const name of THEME_NAMES) {
      for (const size of sizes) {
        const s = scene(size, THEMES[name], 'Australia/Adelaide', d);
        s.labelPlates.forEach((a, i) => {
          assert.ok(a.left >= 0 && a.top >= 0 && a.right <= size.widthPx && a.bottom <= size.heightPx, `${date} ${name} ${size.widthPx}: label off the page`);
          s.labelPlates.slice(i + 1).forEach((b) => assert.ok(!overlaps(a, b), `${date} ${name} ${size.widthPx}x${size.heightPx}: labels overlap`));
        });
        assert.equal(s.labelPlates.length, d.contacts.length + 1);
        // A lunar figure never carries the solar eye-safety caution (ISO 12312-2), and says it is safe to watch.
        assert.ok(!s.description.includes('12312') && s.description.includes('safe to watch with the naked eye'));
      }
    }
  }
});

test('same inputs, same bytes: the SVG is pinned by its hash, and a PNG drawn twice is identical (common practice: deterministic output)', async () => {
  const s = scene({ widthPx: 1200, heightPx: 675 });
  // Pinned when the figure was first drawn and looked at; a change to the figure changes it deliberately.
  assert.equal(sha256(s.svg), PINNED_SVG_SHA256);
  const request = { eclipse: total, clock: civilClock('UTC'), theme: THEMES.dark, size: { widthPx: 1200, heightPx: 675 }, dpi: 72, format: 'png' as const, generator: 'umbracast test' };
  const [a, b] = [await renderDiagramFile(request), await renderDiagramFile(request)];
  assert.equal(sha256(a.bytes), sha256(b.bytes));
  const meta = await sharp(a.bytes).metadata();
  assert.equal(meta.width, 1200);
  assert.equal(meta.height, 675);
});
const PINNED_SVG_SHA256 = '46ed2295614d924ab66566ec2a1bf31daeffddbf8a764014b1e90689a61c39c7';

test('times in a zone: --tz prints the zone\'s clock and names it, and a time after midnight carries its day (IANA tz database through Intl)', async () => {
  const s = scene(undefined, undefined, 'America/Denver', shadowDiagram(eclipseOn('2026-08-28')));
  assert.match(s.description, /Times: America\/Denver \(MDT, UTC−06:00\)/);
  const dir = mkdtempSync(join(tmpdir(), 'umbracast-diagram-'));
  const out = join(dir, 'd.svg');
  const result = await run(['diagram', '2026-08-28', '--tz', 'America/Denver', '-o', out]);
  assert.equal(result.code, 0, result.stderr);
  const caption = readFileSync(join(dir, 'd.txt'), 'utf8');
  // Greatest 04:13 UTC on 28 August is 22:13 MDT on the 27th; P4 falls after local midnight.
  assert.match(caption, /27 August 2026/);
  assert.match(caption, /deepest in the shadow at 22:13 MDT/);
  assert.match(caption, /leaves it at 01:02 \+1 day MDT/);
});

test('the command writes every format with its caption beside it, at every preset', async () => {
  const dir = mkdtempSync(join(tmpdir(), 'umbracast-diagram-'));
  for (const [file, extra] of [['a.png', ['--preset', 'card']], ['b.webp', ['--preset', 'square', '--theme', 'dark']], ['c.jpg', ['--preset', 'print', '--width-mm', '90', '--theme', 'print']], ['d.svg', []]] as const) {
    const path = join(dir, file);
    const result = await run(['diagram', '2026-03-03', '-o', path, ...extra]);
    assert.equal(result.code, 0, result.stderr);
    assert.equal(result.stdout.trim(), path);
    assert.ok(existsSync(path) && existsSync(path.replace(/\.\w+$/, '.txt')), file);
  }
  const meta = await sharp(join(dir, 'c.jpg')).metadata();
  assert.equal(meta.width, Math.round((90 / 25.4) * 300));
});

test('bad input: one line on stderr naming the option, exit 2, nothing written', async () => {
  const dir = mkdtempSync(join(tmpdir(), 'umbracast-diagram-'));
  for (const [args, option] of [
    [['--theme', 'neon'], '--theme'],
    [['-o', join(dir, 'x.gif')], '--output'],
    [['--tz', 'Mars/Olympus'], '--tz'],
    [['--place', 'Adelaide', '--at', '1,2'], '--at'],
    [['--preset', 'poster'], '--preset'],
  ] as const) {
    const result = await run(['diagram', '2026-03-03', ...args]);
    assert.equal(result.code, 2, args.join(' '));
    assert.equal(result.stderr.trim().split('\n').length, 1);
    assert.ok(result.stderr.includes(option), result.stderr);
  }
  const noEclipse = await run(['diagram', '2026-05-01', '-o', join(dir, 'y.png')]);
  assert.equal(noEclipse.code, 2);
  assert.match(noEclipse.stderr, /WHEN/);
  assert.ok(!existsSync(join(dir, 'y.png')));
});

test('a clock change inside the eclipse: every time carries its own zone, the repeated hour told apart (UK summer time ends on the last Sunday of October at 01:00 UTC, as Directive 2000/84/EC sets it; IANA tz through Intl)', async () => {
  const eclipse = eclipseOn('2050-10-30');
  const clock = civilClock('Europe/London');
  const s = scene(undefined, undefined, 'Europe/London', shadowDiagram(eclipse));
  assert.match(s.description, /BST, UTC\+01:00 until 02:00 BST, then/);
  const file = await renderDiagramFile({ eclipse, clock, theme: THEMES.light, size: { widthPx: 1600, heightPx: 1000 }, dpi: 72, format: 'svg', generator: 'umbracast test' });
  // P1 at 00:44 UTC reads 01:44 BST; U1 at 01:44 UTC reads 01:44 on the winter clock, an hour later.
  assert.match(file.caption, /enters the Earth's penumbra at 01:44 BST/);
  assert.ok(eclipse.contacts.P1!.utDays < Date.UTC(2050, 9, 30, 1) / 86_400_000 - 10_957.5);
  assert.ok(eclipse.contacts.U1!.utDays > Date.UTC(2050, 9, 30, 1) / 86_400_000 - 10_957.5);
  assert.equal(clock.time(eclipse.contacts.P1!.utDays), clock.time(eclipse.contacts.U1!.utDays));
  assert.notEqual(clock.abbreviation(eclipse.contacts.P1!.utDays), clock.abbreviation(eclipse.contacts.U1!.utDays));
});
