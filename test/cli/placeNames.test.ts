/**
 * Which place a name was taken for, said on stderr, and errors naming the
 * option or style field the name came from. Source: GeoNames cities500 (the
 * names and populations) and common practice (a tool reports on stderr so
 * that data on stdout stays clean).
 */
import assert from 'node:assert/strict';
import { test } from 'node:test';
import { DEFAULT_STYLE } from '../../src/batch/style.ts';
import { placeNotices } from '../../src/settings/choose.ts';
import { checkStyleSettings } from '../../src/cli/commands/batch.ts';
import { main } from '../../src/cli/main.ts';
import { InputError } from '../../src/errors.ts';

async function run(args: string[]) {
  let stdout = '';
  let stderr = '';
  const code = await main(args, { stdout: (t) => (stdout += t), stderr: (t) => (stderr += t), now: () => new Date('2026-01-10T00:00:00Z') });
  return { code, stdout, stderr };
}

test('a name not matched as written: one line on stderr says which place was taken; stdout holds only the data', async () => {
  const { code, stdout, stderr } = await run(['local', '2026-03-03', '--place', 'Cologne', '--format', 'csv']);
  assert.equal(code, 0);
  assert.match(stderr, /^umbracast: --place "Cologne" → Köln, DE \(pop\. [\d,]+\)\n$/);
  assert.ok(!stdout.includes('umbracast:'));
  assert.ok(!stdout.includes('Cologne'));
});

test('a name matched as written says nothing more', async () => {
  const { code, stderr } = await run(['local', '2026-03-03', '--place', 'Toronto', '--format', 'csv']);
  assert.equal(code, 0);
  assert.equal(stderr, '');
});

test('map marks: notices name --mark, one per name not matched as written, in order', () => {
  const lines = placeNotices('--mark', ['Calcutta', 'Adelaide', 'Den Haag']);
  assert.equal(lines.length, 2);
  assert.match(lines[0]!, /^umbracast: --mark "Calcutta" → Kolkata, IN \(pop\. [\d,]+\)$/);
  assert.match(lines[1]!, /^umbracast: --mark "Den Haag" → The Hague, NL \(pop\. [\d,]+\)$/);
});

test('a style file: errors name the field and its index (marks[2], places[0]); notices name them too', () => {
  const check = (marks: string[], places: string[]) => checkStyleSettings({ ...DEFAULT_STYLE, marks, places }, 'style.yaml');
  assert.throws(() => check(['Adelaide', 'Toronto', 'Atlantis City'], []), (e: unknown) => e instanceof InputError && e.parameter === 'style.yaml: marks[2]' && /received "Atlantis City"$/.test(e.message));
  assert.throws(() => check([], ['Springfield']), (e: unknown) => e instanceof InputError && e.parameter === 'style.yaml: places[0]' && /ambiguous/.test(e.message));
  assert.deepEqual(check(['Adelaide'], ['Bombay']).map((l) => l.replace(/\(pop\. [\d,]+\)/, '(pop. N)')), ['umbracast: style.yaml: places[0] "Bombay" → Mumbai, IN (pop. N)']);
});
