/**
 * A fixed set of outputs, pinned by their SHA-256: catalogue, local tables in
 * every format, maps (SVG and PNG) in every theme and view, GeoJSON, the sky
 * figure, the diagram of both kinds, captions and a batch's manifest. A change to the code that is meant
 * to leave what readers get alone (a reshaping, a speed-up) must leave every
 * hash alone (common practice: same inputs, same bytes). A deliberate change
 * rewrites the list with `npm run golden` — look at what changed first.
 */
import assert from 'node:assert/strict';
import { createHash } from 'node:crypto';
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { test } from 'node:test';
import { main } from '../../src/cli/main.ts';

const UPDATE = process.env.UMBRACAST_UPDATE_GOLDEN === '1';
const LIST = new URL('../golden/output-hashes.json', import.meta.url);
const sha256 = (bytes: Uint8Array | string) => createHash('sha256').update(bytes).digest('hex');

async function run(args: string[]): Promise<string> {
  let stdout = '';
  let stderr = '';
  const code = await main(args, { stdout: (t) => (stdout += t), stderr: (t) => (stderr += t), now: () => new Date('2026-01-10T00:00:00Z') });
  assert.equal(code, 0, `${args.join(' ')}: ${stderr}`);
  return stdout;
}

/** Each output's name and the command that makes it (stdout, or the file named by -o). */
const PRINTED: [string, string[]][] = [
  ['list table 2025-2030', ['list', '--from', '2025', '--to', '2030']],
  ['list json 2025-2030', ['list', '--from', '2025', '--to', '2030', '--format', 'json']],
  ['list csv 1000-1010 chauvenet', ['list', '--from', '1000', '--to', '1010', '--format', 'csv', '--convention', 'chauvenet']],
  ['list json 2990-3000', ['list', '--from', '2990', '--to', '3000', '--format', 'json']],
  ...(['table', 'markdown', 'csv', 'json', 'ics'] as const).flatMap((format): [string, string[]][] => [
    [`local ${format} Adelaide 2025-03-14`, ['local', '2025-03-14', '--place', 'Adelaide', '--format', format]],
    [`local ${format} Toronto 2026-03-03`, ['local', '2026-03-03', '--place', 'Toronto', '--format', format]],
    [`local ${format} 78N 15E 2029-06-26`, ['local', '2029-06-26', '--at', '78.22,15.65', '--format', format]],
  ]),
  ['caption 2026-08-28 Denver', ['caption', '2026-08-28', '--tz', 'America/Denver', '--place', 'Denver']],
  ['caption 2028-12-31', ['caption', '2028-12-31']],
];

const FILES: [string, string[]][] = [
  ...(['light', 'dark', 'print'] as const).map((theme): [string, string[]] => [`map ${theme} 2026-03-03.svg`, ['map', '2026-03-03', '--theme', theme, '--size', '1200x675']]),
  ['map card 2026-03-03.png', ['map', '2026-03-03', '--preset', 'card']],
  ['map globe 2025-09-07.svg', ['map', '2025-09-07', '--projection', 'globe', '--size', '900x900']],
  ['map region 2026-08-28.svg', ['map', '2026-08-28', '--bbox', '-20,30,45,72', '--borders', 'land', '--size', '1200x900']],
  ['map centre 2028-12-31 marks.svg', ['map', '2028-12-31', '--centre', '-33.9,151.2', '--span', '70', '--mark', 'Adelaide', '--mark', 'Tokyo', '--tz', 'Australia/Adelaide', '--size', '1200x675']],
  ['map equirectangular 2027-02-20.svg', ['map', '2027-02-20', '--projection', 'equirectangular', '--size', '1200x600']],
  ['zones 2026-03-03.geojson', ['map', '2026-03-03']],
  ['zones 2027-02-20.geojson', ['map', '2027-02-20']],
  ['sky Adelaide 2025-03-14.svg', ['sky', '2025-03-14', '--place', 'Adelaide']],
  ['sky 78N 2029-06-26.png', ['sky', '2029-06-26', '--at', '78.22,15.65', '--preset', 'card']],
  // The figure beside the map, both kinds (the batch's `diagram` writes these same bytes: test/batch/diagramBatch.test.ts).
  ['diagram 2026-03-03.svg', ['diagram', '2026-03-03']],
  ['diagram dark card 2026-08-28.png', ['diagram', '2026-08-28', '--theme', 'dark', '--preset', 'card']],
  ['diagram solar Reykjavik 2026-08-12.svg', ['diagram', '2026-08-12', '--place', 'Reykjavik']],
];

test('a fixed set of lunar outputs keeps its bytes (hash list in test/golden/output-hashes.json)', async () => {
  const dir = mkdtempSync(join(tmpdir(), 'umbracast-hashes-'));
  const hashes: Record<string, string> = {};
  for (const [name, args] of PRINTED) hashes[name] = sha256(await run(args));
  for (const [name, args] of FILES) {
    const path = join(dir, name.replace(/ /g, '_'));
    await run([...args, '-o', path]);
    hashes[name] = sha256(readFileSync(path));
  }
  // The lunar eclipses of the year: a batch now takes solar eclipses too by default (style `bodies`), whose files are
  // not lunar outputs; with both, the lunar files and catalogue.csv keep these same bytes (checked when bodies arrived).
  await run(['batch', '--from', '2026', '--to', '2026', '--body', 'lunar', '--out', join(dir, 'atlas'), '--jobs', '1']);
  const manifest = JSON.parse(readFileSync(join(dir, 'atlas', 'manifest.json'), 'utf8')) as { eclipses: { id: string; files: { path: string; sha256: string }[] }[] };
  for (const eclipse of manifest.eclipses) for (const file of eclipse.files) hashes[`batch ${file.path}`] = file.sha256;
  hashes['batch catalogue.csv'] = sha256(readFileSync(join(dir, 'atlas', 'catalogue.csv')));
  if (UPDATE) writeFileSync(LIST, `${JSON.stringify(hashes, null, 2)}\n`);
  const expected = JSON.parse(readFileSync(LIST, 'utf8')) as Record<string, string>;
  const changed = Object.keys({ ...expected, ...hashes }).filter((name) => expected[name] !== hashes[name]);
  assert.deepEqual(changed, [], `outputs whose bytes changed: ${changed.join('; ')}`);
});
