/**
 * `umbracast map` for a solar eclipse: an id resolves to its own eclipse of
 * either kind (eclipses/kinds.ts); the picture gets its caption file with
 * the long caution, GeoJSON is the solar geometry, and a date near both a
 * lunar and a solar eclipse is an input error naming both (issue 15, "Outputs").
 */
import assert from 'node:assert/strict';
import { existsSync, mkdtempSync, readFileSync, readdirSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { test } from 'node:test';
import { main } from '../../src/cli/main.ts';
import { solarSafetyText } from '../../src/words/solar/caution.ts';

async function run(args: string[]) {
  let stdout = '';
  let stderr = '';
  const code = await main(args, { stdout: (t) => (stdout += t), stderr: (t) => (stderr += t), now: () => new Date('2026-01-10T00:00:00Z') });
  return { code, stdout, stderr };
}

const dir = mkdtempSync(join(tmpdir(), 'umbracast-solarmap-'));

test('map 2024-04-08 (a solar id) writes the solar map and its caption, the long caution in it', async () => {
  const target = join(dir, 'april.svg');
  const { code, stdout, stderr } = await run(['map', '2024-04-08', '--preset', 'card', '-o', target]);
  assert.equal(code, 0, stderr);
  assert.equal(stdout.trim(), target);
  const caption = readFileSync(join(dir, 'april.txt'), 'utf8');
  // The caution's long form for a total eclipse (issue 15, "Eye safety": captions carry it).
  assert.ok(caption.includes(solarSafetyText('long', 'whole-eclipse')));
  assert.ok(!/naked eye/i.test(caption));
  assert.match(readFileSync(target, 'utf8'), /<title id="map-title">Total solar eclipse · 8 April 2024<\/title>/);
});

test('map 2024-04-08 --format geojson writes the solar geometry with the caution', async () => {
  const target = join(dir, 'april.geojson');
  const { code, stderr } = await run(['map', '2024-04-08', '-o', target]);
  assert.equal(code, 0, stderr);
  const doc = JSON.parse(readFileSync(target, 'utf8'));
  assert.equal(doc.umbracast.body, 'solar');
  assert.equal(doc.umbracast.safety, solarSafetyText('long', 'whole-eclipse'));
});

test('a date near both a lunar and a solar eclipse, not the id of either, is an input error naming both', async () => {
  // From memory: a lunar eclipse on 2025-09-07 and a solar one on 2025-09-21, two weeks apart; 2025-09-14 lies within a week of both.
  const before = readdirSync(dir).sort();
  const { code, stdout, stderr } = await run(['map', '2025-09-14', '-o', join(dir, 'between.png')]);
  assert.equal(code, 2);
  assert.equal(stdout, '');
  assert.match(stderr, /^umbracast: .*lunar eclipse of 2025-09-07 and the solar eclipse of 2025-09-21/);
  assert.equal(stderr.trim().split('\n').length, 1);
  assert.deepEqual(readdirSync(dir).sort(), before, 'nothing written');
  assert.ok(!existsSync(join(dir, 'between.png')));
});
