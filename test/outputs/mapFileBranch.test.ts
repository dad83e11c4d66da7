/**
 * GeoJSON is geometry alone: asking for it makes no scene and no caption,
 * and its bytes are the visibility's GeoJSON document (RFC 7946: a
 * FeatureCollection of Features whose geometries are MultiPolygons).
 */
import assert from 'node:assert/strict';
import { test } from 'node:test';
import { civilClock } from '../../src/ephemeris/civilTime.ts';
import { THEMES } from '../../src/figures/theme.ts';
import { visibilityGeoJson } from '../../src/outputs/geojson.ts';
import { renderMapFile, renderMapFiles } from '../../src/outputs/mapFile.ts';
import { visibilityOf } from '../../src/visibility/lunar/visibility.ts';
import { eclipseOn } from '../figures/support.ts';

const eclipse = eclipseOn('2026-08-28');
const request = {
  eclipse,
  style: { theme: THEMES.light, view: { projection: 'equal-earth' as const }, borders: 'countries' as const, clock: civilClock('UTC') },
  size: { widthPx: 800, heightPx: 450 },
  dpi: 72,
  generator: 'umbracast test',
};

test('a GeoJSON map file is the visibility document, with no scene and no caption made', async () => {
  const file = await renderMapFile({ ...request, format: 'geojson' });
  assert.equal(file.scene, undefined);
  assert.equal(file.caption, undefined);
  const text = Buffer.from(file.bytes).toString('utf8');
  assert.equal(text, `${JSON.stringify(visibilityGeoJson(visibilityOf(eclipse)))}\n`);
  const parsed = JSON.parse(text);
  assert.equal(parsed.type, 'FeatureCollection');
  assert.ok(parsed.features.every((f: { type: string; geometry: { type: string } }) => f.type === 'Feature' && f.geometry.type === 'MultiPolygon'));
});

test('several formats: the scene is made only when a picture or a thumbnail is asked for', async () => {
  const geoOnly = await renderMapFiles(request, ['geojson']);
  assert.equal(geoOnly.scene, undefined);
  assert.ok(geoOnly.caption.caption.length > 0, 'the caption is still written beside the files');
  const withSvg = await renderMapFiles(request, ['geojson', 'svg']);
  assert.ok(withSvg.scene);
  assert.deepEqual(withSvg.files.get('geojson'), geoOnly.files.get('geojson'), 'the same GeoJSON bytes either way');
  assert.equal(Buffer.from(withSvg.files.get('svg')!).toString('utf8'), `${withSvg.scene.svg}\n`);
});
