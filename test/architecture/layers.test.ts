/**
 * The folder order of DEVELOPERS.md ("How the folders fit together"), enforced: a module imports only from
 * its own stage or stages above it in the pipeline, never from a later one; and what belongs to one kind
 * of eclipse (a `lunar` or `solar` folder or file) never imports the other kind. Source: the project's own
 * contributor guide (common practice: a layering rule is kept by a test, not by review alone).
 */
import { test } from 'node:test';
import assert from 'node:assert/strict';
import { readdirSync, readFileSync, statSync } from 'node:fs';
import { dirname, join, normalize, relative, sep } from 'node:path';
import { fileURLToPath } from 'node:url';

const SRC = fileURLToPath(new URL('../../src/', import.meta.url));

/** The pipeline, first stage first; `errors.ts` is shared by all, `index.ts` (the library's face) may show any. */
export const STAGES = [
  'ephemeris', 'eclipses', 'places', 'sphere', 'visibility', 'local', 'words',
  'figures', 'raster', 'settings', 'outputs', 'batch', 'cli',
] as const;

function sourceFiles(folder: string): string[] {
  return readdirSync(folder).flatMap((name) => {
    const path = join(folder, name);
    if (statSync(path).isDirectory()) return sourceFiles(path);
    return /\.(ts|mjs)$/.test(name) ? [path] : [];
  });
}

/** Every relative module a file loads, static or dynamic. */
function importsOf(file: string): string[] {
  const text = readFileSync(file, 'utf8');
  const found = [...text.matchAll(/(?:from|import)\s*\(?\s*['"](\.{1,2}\/[^'"]+)['"]/g)].map((m) => m[1]!);
  return found.map((spec) => relative(SRC, normalize(join(dirname(file), spec))));
}

function stageOf(path: string): number {
  const top = path.split(sep)[0]!;
  if (top === 'errors.ts') return -1;
  if (top === 'index.ts') return STAGES.length;
  const at = STAGES.indexOf(top as (typeof STAGES)[number]);
  assert.notEqual(at, -1, `src/${path} lies in no stage of the pipeline: add its folder to STAGES and to DEVELOPERS.md`);
  return at;
}

const kindOf = (path: string): 'lunar' | 'solar' | undefined =>
  path.split(sep).map((part) => part.replace(/\.(ts|mjs)$/, '')).find((part): part is 'lunar' | 'solar' => part === 'lunar' || part === 'solar');

const files = sourceFiles(SRC).map((file) => ({ file, path: relative(SRC, file) }));

test('every module imports only from its own stage or earlier ones (DEVELOPERS.md folder order)', () => {
  const wrong: string[] = [];
  for (const { file, path } of files) {
    const from = stageOf(path);
    for (const target of importsOf(file)) {
      if (target.startsWith('..')) continue; // dist/ or package.json read from outside src/
      if (stageOf(target) > from) wrong.push(`src/${path} → src/${target}`);
    }
  }
  assert.deepEqual(wrong, []);
});

test('one kind of eclipse never imports the other kind', () => {
  const wrong: string[] = [];
  for (const { file, path } of files) {
    const kind = kindOf(path);
    if (!kind) continue;
    for (const target of importsOf(file)) {
      const other = kindOf(target);
      if (other && other !== kind) wrong.push(`src/${path} → src/${target}`);
    }
  }
  assert.deepEqual(wrong, []);
});

test('the rule can fail: a later stage is caught, and so is the other kind', () => {
  assert.ok(stageOf(join('batch', 'task.ts')) > stageOf(join('settings', 'mapSettings.ts')));
  assert.ok(stageOf(join('settings', 'x.ts')) < stageOf(join('cli', 'main.ts')));
  assert.equal(kindOf(join('local', 'solar.ts')), 'solar');
  assert.equal(kindOf(join('eclipses', 'lunar', 'track.ts')), 'lunar');
  assert.equal(kindOf(join('eclipses', 'common', 'lunations.ts')), undefined);
});
