/**
 * The contact sheet opened in a real headless Chromium through playwright-core:
 * every thumbnail loads, every link resolves to a file, no console errors —
 * from the folder, offline. The browser is the one shipped inside the
 * @sparticuz/chromium registry package (decompressed on first use), or a
 * system Chromium when the machine has one.
 */
import assert from 'node:assert/strict';
import { existsSync, mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { dirname, join } from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';
import { test } from 'node:test';
import packagedChromium from '@sparticuz/chromium';
import { chromium } from 'playwright-core';
import { main } from '../../src/cli/main.ts';

const SYSTEM_CHROMIUM = '/usr/bin/chromium';
// Flags for a closed network and a root user; no flag that relaxes web security,
// so the page is held to the rules a reader's browser applies to local files.
const ARGS = ['--no-sandbox', '--no-zygote', '--disable-gpu', '--disable-quic', '--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync'];

async function chromiumPath(): Promise<string> {
  return existsSync(SYSTEM_CHROMIUM) ? SYSTEM_CHROMIUM : packagedChromium.executablePath();
}

test('the contact sheet: thumbnails load, links resolve, no console errors (headless Chromium)', async () => {
  const dir = mkdtempSync(join(tmpdir(), 'umbracast-sheet-'));
  const out = join(dir, 'atlas with space');
  writeFileSync(join(dir, 'style.yaml'), 'preset: card\nformats: [png, geojson]\nplaces: ["São Paulo"]\nlocalFormats: [markdown]\nsky: false\n');
  let stderr = '';
  const code = await main(['batch', '--from', '2026', '--to', '2026', '--style', join(dir, 'style.yaml'), '--out', out, '--jobs', '2'], {
    stdout: () => undefined, stderr: (t) => (stderr += t), now: () => new Date('2026-01-10T00:00:00Z'),
  });
  assert.equal(code, 0, stderr);
  const browser = await chromium.launch({ executablePath: await chromiumPath(), args: ARGS });
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
    // 2026: two lunar and two solar eclipses, each card with its thumbnail.
    assert.equal(images.length, 4);
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
