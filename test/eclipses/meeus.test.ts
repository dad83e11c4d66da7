/**
 * An independent catalogue: astronomia (npm), Meeus, Astronomical Algorithms
 * 2nd ed., ch. 54 — coarse (minutes, ~0.01 in magnitude) but built from
 * quite different theory, so agreement over two centuries is meaningful.
 */
import assert from 'node:assert/strict';
import { test } from 'node:test';
import eclipse from 'astronomia/eclipse';
import { catalogue1900to2100, secondsBetween } from './support.ts';

const JD_J2000 = 2451545.0;

interface MeeusEclipse {
  kind: 'penumbral' | 'partial' | 'total';
  ttDays: number;
  /** Umbral magnitude for umbral eclipses; penumbral magnitude otherwise (as Meeus gives them). */
  magnitude: number;
}

function meeusCatalogue(fromYear: number, toYear: number): MeeusEclipse[] {
  const list: MeeusEclipse[] = [];
  const firstK = Math.floor((fromYear - 2000) * 12.3685) - 1;
  const lastK = Math.ceil((toYear + 1 - 2000) * 12.3685) + 1;
  for (let k = firstK; k <= lastK; k++) {
    const year = 2000 + (k + 0.5) / 12.3685;
    const result = eclipse.lunar(year);
    if (result.type === eclipse.TYPE.None) continue;
    const kind = result.type === eclipse.TYPE.Total ? 'total' : result.type === eclipse.TYPE.Umbral ? 'partial' : 'penumbral';
    const ttDays = result.jdeMax - JD_J2000;
    const calendarYear = new Date(Date.UTC(2000, 0, 1, 12) + ttDays * 86_400_000).getUTCFullYear();
    if (calendarYear < fromYear || calendarYear > toYear) continue;
    list.push({ kind, ttDays, magnitude: result.magnitude });
  }
  return list;
}

test('1900–2100: paired one-to-one with Meeus ch. 54 (astronomia); kind, greatest and umbral magnitude agree', () => {
  const ours = catalogue1900to2100('danjon');
  const meeus = meeusCatalogue(1900, 2100);
  const unmatchedMeeus = new Set(meeus);
  const unmatchedOurs = [];
  for (const e of ours) {
    const partner = meeus.find((m) => secondsBetween(m.ttDays, e.greatest.ttDays) < 86_400);
    if (!partner) {
      unmatchedOurs.push(e);
      continue;
    }
    unmatchedMeeus.delete(partner);
    const minutes = secondsBetween(partner.ttDays, e.greatest.ttDays) / 60;
    assert.ok(minutes <= 3, `${e.id}: greatest differs by ${minutes.toFixed(1)} min`);
    const nearThreshold = Math.abs(e.umbralMagnitude) < 0.01 || Math.abs(e.umbralMagnitude - 1) < 0.01;
    if (!nearThreshold) assert.equal(partner.kind, e.kind, `${e.id}: kind`);
    if (partner.kind !== 'penumbral' && e.kind !== 'penumbral') {
      assert.ok(Math.abs(partner.magnitude - e.umbralMagnitude) <= 0.02, `${e.id}: umbral ${e.umbralMagnitude} vs ${partner.magnitude}`);
    } else if (partner.kind === 'penumbral' && e.kind === 'penumbral') {
      assert.ok(Math.abs(partner.magnitude - e.penumbralMagnitude) <= 0.02, `${e.id}: penumbral ${e.penumbralMagnitude} vs ${partner.magnitude}`);
    }
  }
  // Only an eclipse within 0.01 of the penumbral threshold may lack a partner.
  for (const e of unmatchedOurs) assert.ok(e.penumbralMagnitude < 0.01, `${e.id} has no Meeus partner`);
  for (const m of unmatchedMeeus) assert.ok(m.kind === 'penumbral' && m.magnitude < 0.01, `Meeus eclipse at TT day ${m.ttDays} has no partner`);
  assert.ok(ours.length > 450 && ours.length < 470, `count ${ours.length}`);
});
