/**
 * The library's errors name the library's parameters (`zone`, `place`, `marks`, `size`, `outDir`,
 * `manifests`…), never a command-line flag; the command line prints the same error with its flags, through
 * its one table (src/cli/flags.ts), exactly as its lines read before the settings layer. Sources: the
 * IANA time zone database through Intl (no zone "Africa/Dakkar"), GeoNames cities500 (no place
 * "Atlantis City"), and the command line's own help, which declares every flag the table names.
 */
import assert from 'node:assert/strict';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { test } from 'node:test';
import { InputError } from '../../src/errors.ts';
import { civilClock } from '../../src/ephemeris/civilTime.ts';
import { findPlace } from '../../src/places/gazetteer.ts';
import { choosePlace } from '../../src/settings/choose.ts';
import { DEFAULT_MAP_CHOICES, mapSettings, viewOf } from '../../src/settings/mapSettings.ts';
import { DEFAULT_STYLE } from '../../src/batch/style.ts';
import { mergeManifests, runBatch } from '../../src/batch/run.ts';
import { FLAGS, flagOf } from '../../src/cli/flags.ts';
import { main } from '../../src/cli/main.ts';

async function run(args: string[]) {
  let stdout = '';
  let stderr = '';
  const code = await main(args, { stdout: (t) => (stdout += t), stderr: (t) => (stderr += t), now: () => new Date('2026-01-10T00:00:00Z') });
  return { code, stdout, stderr };
}

/** The library's error: its parameter and message, with no flag anywhere in it. */
async function libraryError(call: () => unknown): Promise<InputError> {
  try {
    await call();
  } catch (error) {
    assert.ok(error instanceof InputError, String(error));
    assert.doesNotMatch(error.message, /--|WHEN/, 'a library error names no flag');
    return error;
  }
  assert.fail('no error');
}

const twentyOne = Array.from({ length: 21 }, () => 'Dakar');

const cases: { label: string; call: () => unknown; parameter: string; library: RegExp; args: string[]; line: RegExp }[] = [
  {
    label: 'an unknown time zone (IANA via Intl)',
    call: () => civilClock('Africa/Dakkar'),
    parameter: 'zone',
    library: /^zone: expected an IANA time zone .* received "Africa\/Dakkar"$/,
    args: ['local', '--place', 'Dakar', '--tz', 'Africa/Dakkar'],
    line: /^umbracast: --tz: expected an IANA time zone .* received "Africa\/Dakkar"$/,
  },
  {
    label: 'an unknown place (GeoNames), whose alternative is a position',
    call: () => findPlace('Atlantis City'),
    parameter: 'place',
    library: /^place: expected a place name from the GeoNames gazetteer, e\.g\. "Adelaide" or "Springfield, US-IL", or use at LAT,LON \(did you mean: .*\?\), received "Atlantis City"$/,
    args: ['local', '--place', 'Atlantis City'],
    line: /^umbracast: --place: expected a place name from the GeoNames gazetteer, e\.g\. "Adelaide" or "Springfield, US-IL", or use --at LAT,LON \(did you mean: .*\?\), received "Atlantis City"$/,
  },
  {
    label: 'no place at all',
    call: () => choosePlace({}, true),
    parameter: 'place',
    library: /^place: expected a place: place NAME or at LAT,LON, received nothing$/,
    args: ['local'],
    line: /^umbracast: --place: expected a place: --place NAME or --at LAT,LON, received nothing$/,
  },
  {
    label: 'too many marks',
    call: () => mapSettings({ ...DEFAULT_MAP_CHOICES, marks: twentyOne }),
    parameter: 'marks',
    library: /^marks: expected at most 20 places, received "21 places"$/,
    args: ['map', ...twentyOne.flatMap((name) => ['--mark', name])],
    line: /^umbracast: --mark: expected at most 20 places, received "21 places"$/,
  },
  {
    label: 'a picture too small',
    call: () => mapSettings({ ...DEFAULT_MAP_CHOICES, size: { widthPx: 100, heightPx: 100 } }),
    parameter: 'size',
    library: /^size: expected WxH in pixels, each side 320–12000 and at most 64 megapixels in all, received "100x100"$/,
    args: ['map', '--size', '100x100'],
    line: /^umbracast: --size: expected WxH in pixels, each side 320–12000 and at most 64 megapixels in all, received "100x100"$/,
  },
  {
    label: 'a region with nothing to frame',
    call: () => viewOf({ projection: 'region' }),
    parameter: 'projection',
    library: /^projection: expected region together with bbox W,S,E,N or centre LAT,LON, received "region alone"$/,
    args: ['map', '--projection', 'region'],
    line: /^umbracast: --projection: expected region together with --bbox W,S,E,N or --centre LAT,LON, received "region alone"$/,
  },
  {
    label: 'a merge of no manifests',
    call: () => mergeManifests(mkdtempSync(join(tmpdir(), 'umbracast-names-')), [], 'umbracast test'),
    parameter: 'manifests',
    library: /^manifests: expected at least one shard manifest, received "none"$/,
    args: ['batch', '--out', mkdtempSync(join(tmpdir(), 'umbracast-names-')), '--merge', mkdtempSync(join(tmpdir(), 'umbracast-names-'))],
    line: /^umbracast: --merge: expected at least one shard manifest, received "none"$/,
  },
];

for (const c of cases) {
  test(`library errors name the library's parameter, the command line its flag: ${c.label}`, async () => {
    const error = await libraryError(c.call);
    assert.equal(error.parameter, c.parameter);
    assert.match(error.message, c.library);
    const { code, stdout, stderr } = await run(c.args);
    assert.equal(code, 2);
    assert.equal(stdout, '');
    assert.match(stderr, /^[^\n]*\n$/, 'one line');
    assert.match(stderr.trimEnd(), c.line);
  });
}

test('runBatch names outDir, the command line --out (an output folder whose thumbs is a file)', async () => {
  const outDir = mkdtempSync(join(tmpdir(), 'umbracast-names-'));
  writeFileSync(join(outDir, 'thumbs'), 'not a folder');
  const range = { from: new Date('2026-01-01T00:00:00Z'), to: new Date('2026-06-01T00:00:00Z') };
  const error = await libraryError(() => runBatch({ ...range, kinds: ['total', 'partial', 'penumbral'], style: DEFAULT_STYLE, outDir, jobs: 1, force: false, shard: null, tool: 'umbracast test' }));
  assert.equal(error.parameter, 'outDir');
  const { code, stderr } = await run(['batch', '--from', '2026-01', '--to', '2026-05', '--out', outDir]);
  assert.equal(code, 2);
  assert.match(stderr, /^umbracast: --out: expected a folder whose thumbs is a folder \(or absent\), received .*thumbs is not a folder\)\n$/);
});

test('every flag the table names is one the command line declares (its help); unknown names pass unchanged', async () => {
  let help = '';
  for (const command of ['list', 'map', 'local', 'sky', 'diagram', 'caption', 'batch']) help += (await run([command, '--help'])).stdout;
  for (const [parameter, flag] of Object.entries(FLAGS)) {
    if (flag === 'WHEN') continue; // the argument, not an option: named "[when]" in help
    assert.ok(new RegExp(`(^|[\\s,])${flag}[\\s<]`).test(help), `${parameter} → ${flag} is declared`);
  }
  assert.equal(flagOf('style.yaml: marks[0]'), 'style.yaml: marks[0]');
  assert.equal(flagOf('--out'), '--out');
});
