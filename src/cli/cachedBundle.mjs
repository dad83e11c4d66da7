/**
 * `umbracast list` runs from one CommonJS file (dist/bundle/list.cjs) with
 * V8's code cache beside it (list.cjs.v8cache), both made by `npm run build`:
 * V8 then takes the compiled bytecode of the catalogue's functions from the
 * cache instead of parsing and compiling them on every start (Node 20 offers
 * a code cache to scripts run through node:vm, not to ES modules). The cache
 * holds compiled code only, never a computed result. A cache that the running
 * Node does not accept (another version, other V8 flags) is ignored: V8 then
 * compiles as usual, and the output is the same.
 */
import { existsSync, readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { dirname } from 'node:path';
import vm from 'node:vm';

export const CODE_CACHE_SUFFIX = '.v8cache';

/** A CommonJS file compiled as Node compiles one (the same wrapper), with its code cache when there is one. */
export function compileBundle(file, { useCache = true } = {}) {
  const source = readFileSync(file, 'utf8');
  const cacheFile = file + CODE_CACHE_SUFFIX;
  const cachedData = useCache && existsSync(cacheFile) ? readFileSync(cacheFile) : undefined;
  return new vm.Script(`(function (exports, require, module, __filename, __dirname) {${source}\n})`, { filename: file, cachedData });
}

/** Run a compiled bundle once, as Node runs a CommonJS module: its exports. */
export function runBundle(script, file) {
  const module = { exports: {} };
  script.runInThisContext()(module.exports, createRequire(file), module, file, dirname(file));
  return module.exports;
}
