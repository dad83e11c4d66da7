/**
 * One golden image per theme, compared with pixelmatch (threshold 0.1, as its
 * authors recommend) and a small allowance for rasteriser differences.
 * Update deliberately, and look at the new images first: `npm run golden`.
 */
import assert from 'node:assert/strict';
import { existsSync, readFileSync, writeFileSync } from 'node:fs';
import { test } from 'node:test';
import pixelmatch from 'pixelmatch';
import sharp from 'sharp';
import { THEME_NAMES } from '../../src/figures/theme.ts';
import { render } from './support.ts';

const UPDATE = process.env.UMBRACAST_UPDATE_GOLDEN === '1';
/** Share of pixels allowed to differ. */
const ALLOWED_SHARE = 0.002;

const decode = async (png: Uint8Array) => {
  const { data, info } = await sharp(png).ensureAlpha().raw().toBuffer({ resolveWithObject: true });
  return { data, width: info.width, height: info.height };
};

for (const theme of THEME_NAMES) {
  test(`golden image: ${theme} theme, total eclipse of 2026-03-03 at 800x450`, async () => {
    const goldenPath = new URL(`../golden/map-${theme}.png`, import.meta.url);
    const file = await render({ theme, width: 800, height: 450 });
    if (UPDATE) writeFileSync(goldenPath, file.bytes);
    assert.ok(existsSync(goldenPath), `missing ${goldenPath.pathname}: run npm run golden`);
    const actual = await decode(file.bytes);
    const expected = await decode(readFileSync(goldenPath));
    assert.deepEqual([actual.width, actual.height], [expected.width, expected.height]);
    const differing = pixelmatch(actual.data, expected.data, undefined, actual.width, actual.height, { threshold: 0.1 });
    assert.ok(differing <= ALLOWED_SHARE * actual.width * actual.height, `${differing} pixels differ`);
  });
}
