/**
 * Property-based tests (fast-check) over every command's options: random
 * and hostile values. Every run ends with valid output (exit 0) or exit 2 and
 * one line naming the parameter; never a stack trace, never a hang.
 */
import assert from 'node:assert/strict';
import { mkdtempSync, readdirSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { test } from 'node:test';
import fc from 'fast-check';
import { assertContract, hostile, run, SETTINGS } from './support.ts';

const NAMES_OPTION = /^umbracast: (--[a-z-]+|WHEN|unknown option|unknown command|option|missing|too many|error|--output)/;
/** An option given one time in (absentWeight + 1), so that some runs are valid. */
const maybe = (arb: fc.Arbitrary<string>, absentWeight = 1) =>
  fc.oneof({ arbitrary: fc.constant(undefined), weight: absentWeight }, { arbitrary: arb, weight: 1 });
const flag = (name: string, value: string | undefined) => (value === undefined ? [] : [name, value]);

test('list: random and hostile options keep the contract', async () => {
  const year = fc.oneof(hostile, fc.integer({ min: 900, max: 3100 }).map(String), fc.date({ min: new Date('0990-01-01'), max: new Date('3010-01-01'), noInvalidDate: true }).map((d) => d.toISOString().slice(0, 10)));
  await fc.assert(
    fc.asyncProperty(maybe(year), maybe(year), maybe(fc.oneof(hostile, fc.constantFrom('total', 'partial,total', 'penumbral,', ',,'))), maybe(fc.oneof(hostile, fc.constantFrom('danjon', 'CHAUVENET'))), maybe(fc.oneof(hostile, fc.double({ noNaN: false }).map(String))), maybe(fc.oneof(hostile, fc.constantFrom('json', 'csv', 'table'))),
      async (from, to, kind, convention, deltaT, format) => {
        const args = ['list', ...flag('--from', from), ...flag('--to', to), ...flag('--kind', kind), ...flag('--convention', convention), ...flag('--delta-t', deltaT), ...flag('--format', format)];
        const outcome = await run(args);
        assertContract(outcome, args, NAMES_OPTION);
        assert.ok(outcome.ms < 15_000, `bounded time: ${outcome.ms} ms for ${args}`);
        if (outcome.code === 0 && format?.trim().toLowerCase() === 'json') JSON.parse(outcome.stdout);
      }),
    { ...SETTINGS, numRuns: 150 },
  );
});

test('map: random and hostile sizes, boxes, zones, titles and paths keep the contract and write only where asked', async () => {
  const dir = mkdtempSync(join(tmpdir(), 'umbracast-prop-map-'));
  const size = fc.oneof(hostile, fc.tuple(fc.integer({ min: -5, max: 30_000 }), fc.integer({ min: -5, max: 30_000 })).map(([w, h]) => `${w}x${h}`));
  const bbox = fc.oneof(hostile, fc.array(fc.oneof(fc.double({ min: -400, max: 400 }), fc.constant(Number.NaN)), { minLength: 3, maxLength: 5 }).map((a) => a.join(',')));
  const centre = fc.oneof(hostile, fc.tuple(fc.double({ min: -200, max: 200 }), fc.double({ min: -400, max: 400 })).map(([a, b]) => `${a},${b}`));
  const output = fc.oneof({ arbitrary: fc.constant('m.svg'), weight: 6 }, { arbitrary: fc.constantFrom('sub/m.svg', 'm.gif', 'm', '.svg', 'm.SVG', 'm.geojson'), weight: 2 }, { arbitrary: hostile, weight: 1 })
    .map((name) => (name.startsWith('/') ? name : join(dir, name)));
  let rendered = 0;
  await fc.assert(
    fc.asyncProperty(maybe(size, 4), maybe(bbox, 6), maybe(centre, 6), maybe(hostile, 6), maybe(fc.oneof(hostile, fc.constantFrom('Australia/Adelaide', 'UTC', 'Etc/GMT+5')), 4), maybe(fc.oneof(fc.constantFrom('globe', 'region', 'equirectangular'), hostile), 4), maybe(fc.oneof(hostile, fc.constantFrom('Kestrel Ridge <Night Notes> & "Moon"', 'Σελήνη')), 4), maybe(fc.oneof(fc.constantFrom('2026-03-03', 'next', '2026-03-06'), hostile), 3), output,
      async (s, b, c, span, tz, projection, title, when, out) => {
        const args = ['map', ...(when === undefined ? [] : [when]), ...flag('--size', s), ...flag('--bbox', b), ...flag('--centre', c), ...flag('--span', span), ...flag('--tz', tz), ...flag('--projection', projection), ...flag('--title', title), '-o', out, '--format', out.endsWith('.geojson') ? 'geojson' : 'svg'];
        const ours = (n: string) => /\.(svg|txt|geojson)$/i.test(n);
        const before = readdirSync(dir).filter((n) => !ours(n));
        const outcome = await run(args);
        assertContract(outcome, args, NAMES_OPTION);
        assert.ok(outcome.ms < 20_000, `bounded time: ${outcome.ms} ms`);
        const after = readdirSync(dir).filter((n) => !ours(n));
        assert.deepEqual(after, before, 'nothing but the asked-for file and its caption');
        assert.deepEqual(readdirSync(dir).filter((n) => n.includes('.partial-')), []);
        if (outcome.code === 0) rendered++;
      }),
    { ...SETTINGS, numRuns: 120 },
  );
  assert.ok(rendered >= 10, `valid inputs were tried too: ${rendered} maps`);
});

test('local, caption and sky: random and hostile places, points and zones keep the contract', async () => {
  const dir = mkdtempSync(join(tmpdir(), 'umbracast-prop-local-'));
  const place = fc.oneof(hostile, fc.constantFrom('Adelaide', 'Springfield', 'Springfield, US', 'Springfield, US-IL', 'adelaide', 'São Paulo, BR', 'Dakar, XX', ', SN', 'London, GB-ENG'));
  const at = fc.oneof(hostile, fc.tuple(fc.double({ min: -100, max: 100 }), fc.double({ min: -200, max: 200 })).map(([a, b]) => `${a},${b}`));
  const command = fc.constantFrom('local', 'caption', 'sky');
  await fc.assert(
    fc.asyncProperty(command, maybe(place), maybe(at), maybe(fc.oneof(hostile, fc.constantFrom('America/Chicago', 'utc'))), maybe(fc.oneof(hostile, fc.constantFrom('ics', 'json', 'markdown'))),
      async (name, p, a, tz, format) => {
        const extra = name === 'sky' ? ['-o', join(dir, 'sky.svg')] : name === 'local' ? flag('--format', format) : [];
        const args = [name, '2026-03-03', ...flag('--place', p), ...flag('--at', a), ...flag('--tz', tz), ...extra];
        const outcome = await run(args);
        assertContract(outcome, args, NAMES_OPTION);
        assert.ok(outcome.ms < 20_000, `bounded time: ${outcome.ms} ms`);
      }),
    { ...SETTINGS, numRuns: 120 },
  );
});

test('batch: random and hostile ranges, jobs, shards and folders keep the contract', async () => {
  const dir = mkdtempSync(join(tmpdir(), 'umbracast-prop-batch-'));
  writeFileSync(join(dir, 'style.yaml'), 'preset: card\nformats: [svg]\nsky: false\n');
  const day = fc.oneof({ arbitrary: fc.constantFrom('2026-03-01', '2026-03-05', '2026-08-20', '2026-09-01'), weight: 4 }, { arbitrary: hostile, weight: 1 });
  const jobs = fc.oneof({ arbitrary: fc.constantFrom('1', '2'), weight: 3 }, { arbitrary: fc.oneof(hostile, fc.constantFrom('0', '65', '1.5', '-2')), weight: 1 });
  const shard = fc.oneof({ arbitrary: fc.constant(undefined), weight: 3 }, { arbitrary: fc.oneof(fc.constantFrom('1/2', '2/2', '0/2', '3/2', '1/0', '1/ 2'), hostile), weight: 1 });
  const out = fc.oneof({ arbitrary: fc.constant('out'), weight: 4 }, { arbitrary: fc.oneof(fc.constantFrom('missing/deeper/out', 'style.yaml', ''), hostile), weight: 1 });
  let ran = 0;
  await fc.assert(
    fc.asyncProperty(day, day, jobs, shard, out, maybe(fc.oneof(hostile, fc.constantFrom('total', 'partial'))), async (from, to, j, s, o, kind) => {
      const args = ['batch', '--from', from, '--to', to, '--jobs', j, ...flag('--shard', s), ...flag('--kind', kind), '--style', join(dir, 'style.yaml'), '--out', join(dir, o)];
      const outcome = await run(args);
      assertContract(outcome, args, NAMES_OPTION);
      assert.ok(outcome.ms < 60_000, `bounded time: ${outcome.ms} ms`);
      if (outcome.code === 0) ran++;
    }),
    { ...SETTINGS, numRuns: 40 },
  );
  assert.ok(ran >= 3, `some batches ran: ${ran}`);
});
