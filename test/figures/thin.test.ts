/** Thinning projected lines (src/figures/thin.ts): what is dropped, what is always kept, and what it does to the picture. */
import assert from 'node:assert/strict';
import { test } from 'node:test';
import { geoEqualEarth, geoIdentity, geoPath, geoStream, type GeoPermissibleObjects, type GeoStream } from 'd3-geo';
import type { Polygon } from 'geojson';
import pixelmatch from 'pixelmatch';
import sharp from 'sharp';
import { loadBasemap } from '../../src/sphere/world.ts';
import { BASEMAP_THINNING_PX } from '../../src/figures/map.ts';
import { thinnedProjection } from '../../src/figures/thin.ts';
import { rasterise } from '../../src/raster/raster.ts';

type Line = [number, number][];

/** The lines a stream receives, point by point. */
function recorded(wrapper: { stream(sink: GeoStream): GeoStream }, object: GeoPermissibleObjects): Line[] {
  const lines: Line[] = [];
  const sink: GeoStream = {
    point: (x, y) => lines.at(-1)!.push([x, y]),
    lineStart: () => lines.push([]),
    lineEnd: () => {},
    polygonStart: () => {},
    polygonEnd: () => {},
    sphere: () => {},
  };
  geoStream(object, wrapper.stream(sink));
  return lines;
}

const distance = (a: [number, number], b: [number, number]) => Math.hypot(a[0] - b[0], a[1] - b[1]);

test('radial-distance thinning (as the first pass of simplify-js, Agafonkin; from memory): points within the tolerance of the last kept are dropped, the ends always stay', () => {
  const identity = geoIdentity();
  // 0.1 px steps along x, then one far point: with 0.5 px, every fifth point stays, and the last (within 0.5 px of a kept one) too.
  const coordinates = Array.from({ length: 21 }, (_, i) => [i * 0.1, 0]);
  const [kept] = recorded(thinnedProjection(identity, 0.5), { type: 'LineString', coordinates });
  assert.deepEqual(kept!.map(([x]) => Math.round(x * 10) / 10), [0, 0.5, 1, 1.5, 2]);
  const [short] = recorded(thinnedProjection(identity, 0.5), { type: 'LineString', coordinates: [[0, 0], [0.1, 0.1], [0.2, 0]] });
  assert.deepEqual(short, [[0, 0], [0.2, 0]], 'a line shorter than the tolerance keeps its two ends');
  const ring: Polygon = { type: 'Polygon', coordinates: [[[0, 0], [0.2, 0], [10, 0], [10, 0.3], [10, 10], [0, 10], [0, 0.1], [0, 0]]] };
  const [thinRing] = recorded(thinnedProjection(identity, 0.5), ring);
  assert.deepEqual(thinRing, [[0, 0], [10, 0], [10, 10], [0, 10], [0, 0.1]], 'a ring keeps its first and last point, so it closes where it did');
});

test('on the 1:50m world at 2400 px, every dropped point lies within the tolerance of a kept one, and over a fifth of the points go', () => {
  const projection = geoEqualEarth().rotate([-170, 0]).fitSize([2400, 1200], { type: 'Sphere' });
  const basemap = loadBasemap('50m');
  let before = 0;
  let after = 0;
  for (const object of [basemap.land, basemap.borders]) {
    const all = recorded(projection, object as never);
    const thin = recorded(thinnedProjection(projection, BASEMAP_THINNING_PX), object as never);
    assert.equal(thin.length, all.length, 'no line or ring disappears');
    all.forEach((line, i) => {
      const kept = thin[i]!;
      assert.deepEqual(kept[0], line[0]);
      assert.deepEqual(kept.at(-1), line.at(-1));
      let k = 0;
      for (const point of line) {
        if (k + 1 < kept.length && point[0] === kept[k + 1]![0] && point[1] === kept[k + 1]![1]) k++;
        assert.ok(distance(point, kept[k]!) < BASEMAP_THINNING_PX, `point ${point} is ${distance(point, kept[k]!)} px from the last kept`);
      }
      before += line.length;
      after += kept.length;
    });
  }
  assert.ok(after < 0.8 * before, `${after} of ${before} points kept`);
});

test('thinning the bare basemap changes under 0.05 % of a 2400-px picture, scattered antialiasing (pixelmatch, threshold 0.1, as its authors recommend)', async () => {
  const projection = geoEqualEarth().rotate([-170, 0]).fitSize([2400, 1200], { type: 'Sphere' });
  const basemap = loadBasemap('50m');
  const picture = async (tolerancePx: number) => {
    const path = geoPath(tolerancePx > 0 ? thinnedProjection(projection, tolerancePx) : projection).digits(1);
    const svg = '<svg xmlns="http://www.w3.org/2000/svg" width="2400" height="1200"><rect width="2400" height="1200" fill="#dfe6ee"/>'
      + `<path d="${path(basemap.land as never)}" fill="#f4f1e8" stroke="#6b7280" stroke-width="1.2"/>`
      + `<path d="${path(basemap.borders)}" fill="none" stroke="#8a8f99" stroke-width="1.3"/></svg>`;
    return sharp(await rasterise(svg, { format: 'png', dpi: 72 })).ensureAlpha().raw().toBuffer();
  };
  const changed = pixelmatch(await picture(0), await picture(BASEMAP_THINNING_PX), undefined, 2400, 1200, { threshold: 0.1 });
  assert.ok(changed > 0 && changed < 0.0005 * 2400 * 1200, `${changed} pixels changed`);
});
