/**
 * The contact sheet's words and sizes, read from the HTML and checked
 * against the files it shows: one date per eclipse — the one the map's title
 * prints (greatest eclipse's date in the style's zone, via Intl) — an
 * inclusive range in the heading, and each <img> sized as its thumbnail is
 * (HTML Living Standard: width and height attributes give the image's
 * dimensions; read back with sharp).
 */
import assert from 'node:assert/strict';
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { test } from 'node:test';
import sharp from 'sharp';
import { main } from '../../src/cli/main.ts';

test('contact sheet: card dates match the map titles (Asia/Tokyo, where the 2027-02-20 eclipse falls on the 21st), the range heading includes its last day, <img> sizes are the thumbnails\'', async () => {
  const dir = mkdtempSync(join(tmpdir(), 'umbracast-sheet-words-'));
  const out = join(dir, 'atlas');
  writeFileSync(join(dir, 'style.yaml'), 'preset: card\ntz: Asia/Tokyo\nformats: [png]\nsky: false\nbodies: [lunar]\n');
  let stderr = '';
  const code = await main(['batch', '--from', '2027-02', '--to', '2027-02', '--style', join(dir, 'style.yaml'), '--out', out, '--jobs', '1'], {
    stdout: () => undefined, stderr: (t) => (stderr += t), now: () => new Date('2026-01-10T00:00:00Z'),
  });
  assert.equal(code, 0, stderr);
  const html = readFileSync(join(out, 'index.html'), 'utf8');
  assert.match(html, /<h1>Lunar eclipses 2027-02-01 to 2027-02-28<\/h1>/);
  const caption = readFileSync(join(out, '2027-02-20-penumbral.txt'), 'utf8');
  const titleDate = /^Penumbral lunar eclipse of (\d+ \w+ \d{4})\./.exec(caption)![1]!;
  const intlDate = new Intl.DateTimeFormat('en-GB', { timeZone: 'Asia/Tokyo', day: 'numeric', month: 'long', year: 'numeric' }).format(new Date('2027-02-20T23:13:00Z'));
  assert.equal(titleDate, intlDate);
  const headings = [...html.matchAll(/<h2>([^<]*) <small>/g)].map((m) => m[1]);
  assert.deepEqual(headings, [titleDate]);
  assert.ok(!/2027-02-20/.test(html.replace(/href="[^"]*"|src="[^"]*"|id="[^"]*"|>[^<]*\.(png|txt)</g, '')), 'no second date for the eclipse in the card');
  const sized = [...html.matchAll(/<img src="([^"]+)"[^>]* width="(\d+)" height="(\d+)"/g)];
  assert.equal(sized.length, 1, 'the thumbnail has its size');
  for (const m of sized) {
    const meta = await sharp(join(out, decodeURIComponent(m[1]!))).metadata();
    assert.deepEqual([Number(m[2]), Number(m[3])], [meta.width, meta.height]);
  }
  assert.equal([...html.matchAll(/<img /g)].length, 1);
});
