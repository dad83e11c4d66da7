/**
 * The contact sheet opened in headless Chromium (Debian's chromium through
 * playwright-core; .ci/run installs it when missing): every thumbnail loads,
 * every link resolves to a file, no console errors — from the folder, offline.
 */
import assert from 'node:assert/strict';
import { existsSync, mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { dirname, join } from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';
import { test } from 'node:test';
import { chromium } from 'playwright-core';
import { main } from '../../src/cli/main.ts';

const CHROMIUM = '/usr/bin/chromium';
// Flags for this machine's closed network and a root user (see the environment notes).
const ARGS = ['--headless', '--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync'];

test('the contact sheet: thumbnails load, links resolve, no console errors (headless Chromium)', async () => {
  assert.ok(existsSync(CHROMIUM), `${CHROMIUM} is missing: apt-get install chromium (.ci/run does this)`);
  const dir = mkdtempSync(join(tmpdir(), 'umbracast-sheet-'));
  const out = join(dir, 'atlas with space');
  writeFileSync(join(dir, 'style.yaml'), 'preset: card\nformats: [png, geojson]\nplaces: ["São Paulo"]\nlocalFormats: [markdown]\nsky: false\n');
  let stderr = '';
  const code = await main(['batch', '--from', '2026', '--to', '2026', '--style', join(dir, 'style.yaml'), '--out', out, '--jobs', '2'], {
    stdout: () => undefined, stderr: (t) => (stderr += t), now: () => new Date('2026-01-10T00:00:00Z'),
  });
  assert.equal(code, 0, stderr);
  const browser = await chromium.launch({ executablePath: CHROMIUM, args: ARGS });
  try {
    const page = await browser.newPage();
    const problems: string[] = [];
    page.on('console', (message) => {
      if (message.type() === 'error') problems.push(message.text());
    });
    page.on('pageerror', (error) => problems.push(error.message));
    page.on('requestfailed', (request) => problems.push(`failed: ${request.url()}`));
    await page.goto(pathToFileURL(join(out, 'index.html')).href, { waitUntil: 'load' });
    const images = await page.$$eval('img', (nodes) => nodes.map((img) => ({ src: (img as HTMLImageElement).src, ok: (img as HTMLImageElement).complete && (img as HTMLImageElement).naturalWidth > 0 })));
    assert.equal(images.length, 2);
    for (const img of images) assert.ok(img.ok, `thumbnail did not load: ${img.src}`);
    const links = await page.$$eval('a', (nodes) => nodes.map((a) => (a as HTMLAnchorElement).href));
    assert.ok(links.length >= 2 * 4, `links: ${links.length}`);
    for (const link of links) {
      assert.ok(link.startsWith('file://'), `offline link: ${link}`);
      assert.ok(existsSync(fileURLToPath(link)), `link resolves: ${link}`);
      assert.ok(dirname(fileURLToPath(link)).startsWith(out), `link stays in the folder: ${link}`);
    }
    assert.deepEqual(problems, []);
  } finally {
    await browser.close();
  }
});
