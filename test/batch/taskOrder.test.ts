/**
 * The order a batch hands its eclipses to the workers: longest task first
 * (the "longest processing time first" rule of list scheduling, common
 * practice), so that the last task to finish is a short one. Solar tasks
 * (maps with the obscuration field, a caption that places the whole path,
 * GeoJSON) take longest, central ones longest of all, the longer the path
 * (U1 → U4) the longer; then lunar totals, partials, penumbrals.
 */
import assert from 'node:assert/strict';
import { test } from 'node:test';
import { NextGlobalSolarEclipse, SearchGlobalSolarEclipse } from 'astronomy-engine';
import { planBatch, taskOrder } from '../../src/batch/run.ts';
import { DEFAULT_STYLE } from '../../src/batch/style.ts';
import type { Eclipse } from '../../src/eclipses/kinds.ts';

const { all } = planBatch({ from: new Date('2026-01-01T00:00:00Z'), to: new Date('2036-01-01T00:00:00Z'), style: DEFAULT_STYLE, shard: null });
const ordered = [...all].sort(taskOrder);
const central = (e: Eclipse) => e.body === 'solar' && e.contacts.U1 !== undefined && e.contacts.U4 !== undefined;
const pathDays = (e: Eclipse) => (e.body === 'solar' && e.contacts.U1 && e.contacts.U4 ? e.contacts.U4.ttDays - e.contacts.U1.ttDays : 0);

test('a decade of both bodies (2026–2035): every solar eclipse before every lunar one, central before partial, the longest path first', () => {
  const bodies = ordered.map((e) => e.body);
  const firstLunar = bodies.indexOf('lunar');
  assert.ok(firstLunar > 0 && bodies.slice(firstLunar).every((b) => b === 'lunar'), 'solar first, then lunar');
  const solar = ordered.slice(0, firstLunar);
  const firstPartial = solar.findIndex((e) => !central(e));
  assert.ok(firstPartial > 0 && solar.slice(firstPartial).every((e) => !central(e)), 'central solar eclipses before the rest');
  const paths = solar.slice(0, firstPartial).map(pathDays);
  assert.deepEqual(paths, [...paths].sort((a, b) => b - a), 'longer paths first');
  // As many solar eclipses as astronomy-engine's own global search finds in the decade, and its partial ones among the last.
  const engine: { id: string; kind: string }[] = [];
  for (let e = SearchGlobalSolarEclipse(new Date('2026-01-01T00:00:00Z')); e.peak.date < new Date('2036-01-01T00:00:00Z'); e = NextGlobalSolarEclipse(e.peak)) {
    engine.push({ id: e.peak.date.toISOString().slice(0, 10), kind: e.kind });
  }
  assert.equal(solar.length, engine.length);
  const partialIds = new Set(solar.slice(firstPartial).map((e) => e.id));
  for (const e of engine.filter((x) => x.kind === 'partial')) assert.ok(partialIds.has(e.id), `${e.id} (partial) among the last`);
});

test('the lunar ones by kind: totals, then partials, then penumbrals, each in time order (the sort keeps it)', () => {
  const lunar = ordered.filter((e) => e.body === 'lunar');
  const rank = { total: 0, partial: 1, penumbral: 2 } as Record<string, number>;
  for (let i = 1; i < lunar.length; i++) {
    const [a, b] = [lunar[i - 1]!, lunar[i]!];
    assert.ok(rank[a.kind]! < rank[b.kind]! || (a.kind === b.kind && a.greatest.utDays < b.greatest.utDays), `${a.id} ${a.kind} before ${b.id} ${b.kind}`);
  }
  assert.equal(lunar.at(-1)!.kind, 'penumbral');
});
