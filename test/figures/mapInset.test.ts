/**
 * The shadow diagram as an inset on the lunar map (`inset: 'diagram'`, `map --inset diagram`): on the
 * page and inside the map's frame at every preset and view, never over the legend, the labels or the
 * marked places, and over no more land than any clear corner would hide (land from world-atlas, tested
 * with d3-geo's geoContains: an independent library). Without it, the map is unchanged (the hash list of
 * test/cli/outputHashes.test.ts pins that).
 */
import assert from 'node:assert/strict';
import { mkdtempSync, existsSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { test } from 'node:test';
import { geoContains, type GeoPermissibleObjects } from 'd3-geo';
import { main } from '../../src/cli/main.ts';
import { civilClock } from '../../src/ephemeris/civilTime.ts';
import { layoutFor, overlaps, type Box } from '../../src/figures/draw.ts';
import { composeScene, type Scene } from '../../src/figures/map.ts';
import type { View } from '../../src/figures/projection.ts';
import { THEMES } from '../../src/figures/theme.ts';
import { visibilityOf } from '../../src/visibility/lunar/visibility.ts';
import { loadBasemap } from '../../src/sphere/world.ts';
import { eclipseOn } from './support.ts';

const PRESETS = [
  { name: 'default', widthPx: 2400, heightPx: 1350 },
  { name: 'card', widthPx: 1200, heightPx: 675 },
  { name: 'square', widthPx: 1080, heightPx: 1080 },
  { name: 'print', widthPx: 2126, heightPx: 1318 },
];
const VIEWS: View[] = [{ projection: 'equal-earth' }, { projection: 'globe' }, { projection: 'region', bbox: [-20, 30, 45, 72] }];

/** The share of sample points of a box that fall on land on the map (off the map counts as no land). */
function landShare(scene: Scene, box: Box): number {
  const land = loadBasemap('110m').land as GeoPermissibleObjects;
  let hits = 0;
  for (let i = 0; i < 16; i++) {
    for (let j = 0; j < 16; j++) {
      const point: [number, number] = [box.left + ((i + 0.5) * (box.right - box.left)) / 16, box.top + ((j + 0.5) * (box.bottom - box.top)) / 16];
      const lonLat = scene.unproject(point);
      if (!lonLat || !Number.isFinite(lonLat[0]) || !Number.isFinite(lonLat[1])) continue;
      const back = scene.project(lonLat);
      if (!back || Math.hypot(back[0] - point[0], back[1] - point[1]) > 1) continue;
      if (geoContains(land, [lonLat[0], lonLat[1]])) hits++;
    }
  }
  return hits / 256;
}

test('every preset and view: the inset inside the map\'s frame, on the page, clear of the legend, the labels and the marks, hiding no more land than a clear corner (common practice: an inset goes over sea or paper)', () => {
  for (const date of ['2025-03-14']) {
    const eclipse = eclipseOn(date);
    const visibility = visibilityOf(eclipse);
    for (const view of VIEWS) {
      // The regional view at the default size only: the world views are where the labels crowd.
      for (const size of view.projection === 'region' ? PRESETS.slice(0, 1) : PRESETS) {
        const what = `${date} ${view.projection} ${size.name}`;
        const marks = [{ lonDeg: 138.6, latDeg: -34.93, label: 'Kestrel Ridge' }, { lonDeg: -58.4, latDeg: -34.6, label: 'Night Notes desk' }];
        const scene = composeScene({ eclipse, visibility, style: { theme: THEMES.light, view, borders: 'countries', clock: civilClock('UTC'), inset: 'diagram' }, size, generator: 'umbracast test', marks });
        const inset = scene.inset;
        assert.ok(inset, what);
        const f = scene.frame;
        assert.ok(inset.left >= f.x - 0.01 && inset.right <= f.x + f.width + 0.01 && inset.top >= f.y - 0.01 && inset.bottom <= f.y + f.height + 0.01, `${what}: inside the frame`);
        assert.ok(inset.left >= 0 && inset.top >= 0 && inset.right <= size.widthPx && inset.bottom <= size.heightPx, `${what}: on the page`);
        // The legend starts below the frame: an inset inside the frame cannot cover it; a generous size all the same.
        assert.ok(inset.right - inset.left >= f.width * 0.1, `${what}: big enough to read`);
        for (const plate of [...scene.labelPlates.zones, ...scene.labelPlates.marks]) assert.ok(!overlaps(plate, inset), `${what}: over a label`);
        for (const m of marks) {
          const p = scene.project([m.lonDeg, m.latDeg]);
          if (p) assert.ok(!(p[0] >= inset.left && p[0] <= inset.right && p[1] >= inset.top && p[1] <= inset.bottom), `${what}: over a marked place`);
        }
        // The corners of the frame, same size: any that is clear of the labels (and marks) hides at least as much land.
        const w = inset.right - inset.left;
        const h = inset.bottom - inset.top;
        // Corners as the placement tries them: 6 page units in from the frame, and clear of labels and marks by as much.
        const pad = 6 * layoutFor(size).unit;
        const corners: Box[] = [[f.x + pad, f.y + pad], [f.x + f.width - pad - w, f.y + pad], [f.x + pad, f.y + f.height - pad - h], [f.x + f.width - pad - w, f.y + f.height - pad - h]]
          .map(([left, top]) => ({ left: left!, top: top!, right: left! + w, bottom: top! + h }));
        const dots = marks.map((m) => scene.project([m.lonDeg, m.latDeg])).filter((p) => p !== null);
        const clearCorners = corners.filter((c) => {
          const around = { left: c.left - pad, top: c.top - pad, right: c.right + pad, bottom: c.bottom + pad };
          return !scene.labelPlates.zones.some((p) => overlaps(p, around)) && !dots.some(([x, y]) => x >= around.left && x <= around.right && y >= around.top && y <= around.bottom);
        });
        const mine = landShare(scene, inset);
        for (const corner of clearCorners) {
          assert.ok(mine <= landShare(scene, corner) + 0.05, `${what}: ${mine.toFixed(2)} of the inset on land, a clear corner ${landShare(scene, corner).toFixed(2)}`);
        }
      }
    }
  }
});

test('map --inset diagram writes the map; a bad value is one line naming --inset, exit 2, nothing written', async () => {
  const dir = mkdtempSync(join(tmpdir(), 'umbracast-inset-'));
  let stderr = '';
  const io = { stdout: () => {}, stderr: (t: string) => (stderr += t), now: () => new Date('2026-01-10T00:00:00Z') };
  assert.equal(await main(['map', '2026-03-03', '--inset', 'diagram', '--preset', 'card', '-o', join(dir, 'a.svg')], io), 0, stderr);
  assert.ok(existsSync(join(dir, 'a.svg')));
  stderr = '';
  assert.equal(await main(['map', '2026-03-03', '--inset', 'chart', '-o', join(dir, 'b.png')], io), 2);
  assert.equal(stderr.trim().split('\n').length, 1);
  assert.match(stderr, /--inset/);
  assert.ok(!existsSync(join(dir, 'b.png')));
});
