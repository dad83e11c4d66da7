/**
 * `umbracast caption` for a solar eclipse (issue 15): the eclipse chosen by
 * --body or by its own date, the place's summary added, the caution in both
 * texts; a date near both kinds is one error line naming both (exit 2); a
 * bad --body is one error line (exit 2). Lunar captions are pinned by
 * test/cli/outputHashes.test.ts.
 */
import assert from 'node:assert/strict';
import { test } from 'node:test';
import { main } from '../../src/cli/main.ts';

async function run(args: string[]) {
  let stdout = '';
  let stderr = '';
  const code = await main(args, { stdout: (t) => (stdout += t), stderr: (t) => (stderr += t), now: () => new Date('2026-01-10T00:00:00Z') });
  return { code, stdout, stderr };
}

test('caption of the 2024-04-08 eclipse from the Kestrel Ridge field site (31.1°N 97.7°W, inside the path): the place\'s totality, then the caution', async () => {
  const { code, stdout, stderr } = await run(['caption', '2024-04-08', '--at', '31.1,-97.7', '--tz', 'America/Chicago']);
  assert.equal(code, 0, stderr);
  const [caption, alt] = stdout.split('\n\nAlt text: ');
  assert.match(caption!, /^Total solar eclipse of 8 April 2024\. Greatest eclipse at 13:1[78] CDT/);
  assert.match(caption!, /From 31\.10°N 97\.70°W the Sun is totally eclipsed for [34] min \d\d s/);
  assert.ok(caption!.indexOf('From 31.10°N') < caption!.indexOf('Look at the Sun only through'), 'the place before the caution');
  assert.match(caption!, /ISO 12312-2/);
  assert.match(alt!, /^Map of the total solar eclipse of 8 April 2024\. .*ISO 12312-2/);
  assert.doesNotMatch(stdout, /naked eye/i);
});

test('--body solar takes the solar eclipse near a date; without it, a date near both kinds is one line naming both, exit 2 (2025-09-14: lunar 09-07, solar 09-21)', async () => {
  const both = await run(['caption', '2025-09-14']);
  assert.equal(both.code, 2);
  assert.match(both.stderr, /^umbracast: [^\n]*lunar eclipse of 2025-09-07 and the solar eclipse of 2025-09-21[^\n]*\n$/);
  const solar = await run(['caption', '2025-09-14', '--body', 'solar']);
  assert.equal(solar.code, 0, solar.stderr);
  assert.match(solar.stdout, /^Partial solar eclipse of 21 September 2025\./);
  const bad = await run(['caption', '2025-09-14', '--body', 'sun']);
  assert.equal(bad.code, 2);
  assert.match(bad.stderr, /^umbracast: --body: expected one of lunar, solar, all, received "sun"\n$/);
});
