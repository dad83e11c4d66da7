/** The contract every run must keep, whatever it is given (issue "Hardening"). */
import assert from 'node:assert/strict';
import { lstatSync, mkdtempSync, readdirSync, readFileSync, readlinkSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import fc from 'fast-check';
import { main } from '../../src/cli/main.ts';

export interface Outcome {
  code: number;
  stdout: string;
  stderr: string;
  ms: number;
}

export async function run(args: string[]): Promise<Outcome> {
  let stdout = '';
  let stderr = '';
  const t0 = performance.now();
  const code = await main(args, { stdout: (t) => (stdout += t), stderr: (t) => (stderr += t), now: () => new Date('2026-01-10T00:00:00Z') });
  return { code, stdout, stderr, ms: performance.now() - t0 };
}

/** Valid output and exit 0, or exit 2 with one line naming a parameter; never a stack trace, never exit 1. */
export function assertContract(outcome: Outcome, args: string[], parameters: RegExp): void {
  const context = JSON.stringify(args).slice(0, 300);
  assert.ok(!/\n\s+at .+:\d+:\d+/.test(outcome.stderr), `stack trace for ${context}: ${outcome.stderr}`);
  if (outcome.code === 0) {
    assert.ok(outcome.stdout.length > 0, `exit 0 but no output for ${context}`);
    return;
  }
  assert.equal(outcome.code, 2, `exit ${outcome.code} for ${context}: ${outcome.stderr}`);
  assert.equal(outcome.stdout, '', `stdout on a usage error for ${context}`);
  const lines = outcome.stderr.split('\n');
  assert.equal(lines.length, 2, `one line for ${context}: ${JSON.stringify(outcome.stderr)}`);
  assert.match(lines[0]!, parameters, `names a parameter for ${context}`);
  assert.ok(lines[0]!.length < 1200, `a readable line for ${context}`);
}

/** Values that break naive parsers. */
export const hostile = fc.oneof(
  fc.constantFrom('', ' ', '-', '--', '0', '-0', '-1', 'NaN', 'Infinity', '-Infinity', '1e309', '9'.repeat(400), '0x10', '1_000',
    '2026-02-30', '0000', '99999', '3001', '0999', '2026-13', '2026-00-10', '２０２６', '２', '\u0000', '\u202e2026', '../../etc/passwd',
    '/etc/passwd', 'C:\\\\x', '%s%n', '${HOME}', '<svg onload=x>', '"', "'", '\\', '\n2026', 'Σελήνη', '🌕', 'a'.repeat(5000)),
  fc.string({ maxLength: 40 }),
  fc.string({ unit: 'grapheme', maxLength: 20 }),
  fc.integer({ min: -1e9, max: 1e9 }).map(String),
  fc.double().map(String),
);

/** fast-check settings: a fixed seed, so every run tries the same inputs. */
export const SETTINGS = { seed: 20261201, endOnFailure: true } as const;

/** Counts kept for the closing note. */
export const tried = { inputs: 0 };

/** A small batch setup: a style (card maps, SVG only, no figures) and an output folder to be. */
export function batchSetup(style = 'preset: card\nformats: [svg]\nsky: false\n', prefix = 'umbracast-hard2-'): { dir: string; style: string; out: string } {
  const dir = mkdtempSync(join(tmpdir(), prefix));
  writeFileSync(join(dir, 'style.yaml'), style);
  return { dir, style: join(dir, 'style.yaml'), out: join(dir, 'out') };
}

/** Two eclipses: 2026-03-03 (total) and 2026-08-28 (partial). */
/** Two lunar eclipses (the range holds a solar one too, which a batch takes unless told: --body lunar). */
export const TWO_ECLIPSES = ['--from', '2026-03-01', '--to', '2026-09-01', '--body', 'lunar'];

/** Every file under a folder (not following links) with its bytes: to show that a refused run changed nothing. */
export function snapshot(dir: string): Record<string, string> {
  const out: Record<string, string> = {};
  const walk = (folder: string, prefix: string) => {
    for (const name of readdirSync(folder).sort()) {
      const path = join(folder, name);
      const stat = lstatSync(path);
      if (stat.isDirectory()) walk(path, `${prefix}${name}/`);
      else out[`${prefix}${name}`] = stat.isFile() ? readFileSync(path, 'base64') : stat.isSymbolicLink() ? `link → ${readlinkSync(path)}` : 'special';
    }
  };
  walk(dir, '');
  return out;
}

/** Exit 2 and one line on stderr, matching `pattern`; nothing on stdout; no raw control character. */
export function assertOneLine(outcome: Outcome, pattern: RegExp): void {
  assert.equal(outcome.code, 2, outcome.stderr);
  assert.equal(outcome.stdout, '');
  assert.equal(outcome.stderr.split('\n').length, 2, JSON.stringify(outcome.stderr));
  assert.ok(!/[\u0000-\u0009\u000b-\u001f\u007f-\u009f\u202a-\u202e\u2066-\u2069]/.test(outcome.stderr), `no raw control characters: ${JSON.stringify(outcome.stderr)}`);
  assert.match(outcome.stderr.trimEnd(), pattern);
}
