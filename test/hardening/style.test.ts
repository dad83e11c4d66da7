/**
 * Second hardening pass, style files: places with one slug, deep nesting,
 * terminal escapes, unknown YAML tags, names too long to write.
 *
 * Sources: YAML 1.2.2 §10.3 (core schema; an unresolved tag is an error
 * for a reader of that schema); ECMA-48 (C0/C1 controls, ESC sequences) and
 * Unicode UAX #9 (bidi controls such as U+202E); MITRE CWE-150 (improper
 * neutralisation of escape sequences) and CWE-674 (uncontrolled
 * recursion); POSIX limits.h NAME_MAX (255 bytes on ext4).
 */
import assert from 'node:assert/strict';
import { mkdirSync, readdirSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { test } from 'node:test';
import { findPlace } from '../../src/places/gazetteer.ts';
import { assertOneLine, batchSetup, run, TWO_ECLIPSES } from './support.ts';

test('6. two places with one slug get file names of their own (country and region), the manifest lists each once, and a rerun settles', async () => {
  const { style, out } = batchSetup('preset: card\nformats: [svg]\nsky: false\nlocalFormats: [json]\nplaces: ["Springfield, US-IL", "Springfield, US-MA", "Dakar"]\n');
  // The gazetteer (GeoNames) has both: same name, one country, two states.
  assert.deepEqual([findPlace('Springfield, US-IL').admin, findPlace('Springfield, US-MA').admin], ['IL', 'MA']);
  const first = await run(['batch', ...TWO_ECLIPSES, '--style', style, '--out', out]);
  assert.equal(first.code, 0, first.stderr);
  const names = readdirSync(out).filter((n) => n.startsWith('2026-03-03') && n.endsWith('.json')).sort();
  assert.deepEqual(names, ['2026-03-03-total-dakar.json', '2026-03-03-total-springfield-us-il.json', '2026-03-03-total-springfield-us-ma.json']);
  // Each local table is of its own town: their coordinates differ as the gazetteer's do.
  const [il, ma] = [names[1]!, names[2]!].map((n) => JSON.parse(readFileSync(join(out, n), "utf8")) as { place: { lat: number; lon: number } });
  assert.notEqual(il!.place.lon, ma!.place.lon);
  const manifest = JSON.parse(readFileSync(join(out, 'manifest.json'), 'utf8')) as { eclipses: { files: { path: string }[] }[] };
  const paths = manifest.eclipses.flatMap((e) => e.files.map((f) => f.path));
  assert.equal(new Set(paths).size, paths.length);
  const again = await run(['batch', ...TWO_ECLIPSES, '--style', style, '--out', out]);
  assert.match(again.stdout, /2 eclipses — 0 rendered, 2 up to date, 0 failed/);
});

test('6. the same place listed twice (in other spellings) is one line, exit 2, before anything is made', async () => {
  const { style, out } = batchSetup('preset: card\nformats: [svg]\nplaces: [Dakar, "Adelaide", "dakar, SN"]\n');
  assertOneLine(await run(['batch', ...TWO_ECLIPSES, '--style', style, '--out', out]), /^umbracast: .*style\.yaml: places\[2\]: expected places that are each listed once, received "dakar, SN" \(the same place as places\[0\]\)$/);
  assert.deepEqual(readdirSync(join(out, '..')).sort(), ['style.yaml']);
});

test('9. deeply nested JSON and YAML styles are one line, exit 2, not a stack overflow', async () => {
  const { dir, out } = batchSetup();
  const depth = 60_000; // 120 kB: within the size limit, far beyond any stack
  const files: [string, string][] = [
    ['deep.json', `{"marks": ${'['.repeat(depth)}${']'.repeat(depth)}}`],
    ['deep-object.json', `${'{"a":'.repeat(20_000)}1${'}'.repeat(20_000)}`],
    ['deep.yaml', `marks: ${'['.repeat(depth)}${']'.repeat(depth)}\n`],
    ['nine.yaml', `marks: [[[[[[[[[x]]]]]]]]]\n`],
  ];
  for (const [name, text] of files) {
    writeFileSync(join(dir, name), text);
    for (const command of [['batch', '--style', join(dir, name), '--out', out], ['map', '--style', join(dir, name), '-o', join(dir, 'm.svg')]]) {
      const outcome = await run(command);
      assertOneLine(outcome, new RegExp(`^umbracast: .*${name.replace('.', '\\.')}: expected a style nested at most 8 levels deep, received a file nested deeper$`));
    }
  }
});

test('10. terminal escapes, newlines and bidi controls in style keys, values and file names are shown escaped, on one line', async () => {
  const { dir, out } = batchSetup();
  const folder = join(dir, 'a\u001b[2J\nb');
  mkdirSync(folder);
  const file = join(folder, 'style\u202e\u0007.yaml');
  writeFileSync(file, '"\\e]0;owned\\a\\e[31mcolour\\nx\\u202e": red\n');
  for (const command of [['batch', '--style', file, '--out', out], ['map', '--style', file, '-o', join(dir, 'm.svg')]]) {
    const outcome = await run(command);
    assertOneLine(outcome, /^umbracast: .*a\\u001b\[2J\\nb\/style\\u202e\\u0007\.yaml: \\u001b\]0;owned\\u0007\\u001b\[31mcolour\\nx\\u202e: expected a known style field/);
  }
  // A value and the --out path too.
  writeFileSync(join(dir, 'v.yaml'), 'theme: "neon\\e[5m\\n"\n');
  assertOneLine(await run(['batch', '--style', join(dir, 'v.yaml'), '--out', out]), /theme: expected one of light, dark, print, received "neon\\u001b\[5m\\n"$/);
  assertOneLine(await run(['batch', '--out', join(dir, 'no\u001bsuch', 'x\ny')]), /^umbracast: --out: expected a folder, or a new folder inside an existing one, received ".*no\\u001bsuch\/x\\ny"$/);
});

test('11. unknown YAML tags are a style error on one line: no warnings on stderr', async () => {
  const { dir, out } = batchSetup();
  const cases: [string, RegExp][] = [
    ['theme: !fancy light\n', /Unresolved tag: !fancy/],
    ['formats: !!set {png}\n', /Unresolved tag: tag:yaml.org,2002:set/],
    ['title: !!timestamp 2026-03-03\n', /Unresolved tag: tag:yaml.org,2002:timestamp/],
    ['title: !!binary aGVsbG8=\n', /Unresolved tag: tag:yaml.org,2002:binary/],
    ['%TAG !k! tag:kestrel,2026:\n---\ntheme: !k!x light\n', /Unresolved tag: tag:kestrel,2026:x/],
  ];
  for (const [text, reason] of cases) {
    writeFileSync(join(dir, 'tag.yaml'), text);
    const outcome = await run(['batch', '--style', join(dir, 'tag.yaml'), '--out', out, ...TWO_ECLIPSES]);
    assertOneLine(outcome, /^umbracast: .*tag\.yaml: expected valid YAML, received a file that does not parse \(/);
    assert.match(outcome.stderr, reason, text);
  }
});

test('12. a naming template whose names cannot be written (over 255 bytes) is refused at validation, naming the field', async () => {
  const { dir, out } = batchSetup();
  // 25 × {id} = 250 bytes of stem; with ".geojson" 258 > 255.
  writeFileSync(join(dir, 'long.yaml'), `naming: "${'{id}'.repeat(25)}"\n`);
  assertOneLine(await run(['batch', '--style', join(dir, 'long.yaml'), '--out', out]), /^umbracast: .*long\.yaml: naming: expected a template whose file names fit in 255 bytes once filled in/);
  // 24 × {id} + "xx" = 242 bytes: the maps fit (250), but a place's figure "-dakar-sky.png" does not (256).
  writeFileSync(join(dir, 'place.yaml'), `naming: "${'{id}'.repeat(24)}xx"\nplaces: [Dakar]\n`);
  assertOneLine(await run(['batch', '--style', join(dir, 'place.yaml'), '--out', out]), /^umbracast: .*place\.yaml: places\[0\]: expected a place whose file names fit in 255 bytes with the naming template, received "Dakar" \(256 bytes\)$/);
  // The longest template that fits renders, every file name within NAME_MAX.
  writeFileSync(join(dir, 'fits.yaml'), `naming: "${'{id}'.repeat(24)}{year}"\npreset: card\nformats: [geojson]\nsky: false\n`);
  const fits = await run(['batch', '--style', join(dir, 'fits.yaml'), '--out', out, ...TWO_ECLIPSES]);
  assert.equal(fits.code, 0, fits.stderr);
  const names = readdirSync(out);
  assert.ok(names.some((n) => Buffer.byteLength(n) === 252), 'a 244-byte stem + ".geojson"');
  assert.ok(names.every((n) => Buffer.byteLength(n) <= 255));
});
