/**
 * The curves of a solar-eclipse map, checked by what defines them
 * (Explanatory Supplement, ch. 11; Meeus, Elements of Solar Eclipses, ch. 7):
 * on a path limit the Moon just covers the Sun (magnitude 1) or sits just
 * inside it (annular: magnitude = the ratio of the discs); on a partial limit
 * the discs just touch (magnitude 0); on a curve of magnitude M, M; on the
 * central line the place is on the axis; on a rise/set curve the contact
 * falls with the Sun on the horizon.
 */
import assert from 'node:assert/strict';
import { test } from 'node:test';
import type { LonLat } from '../../src/ephemeris/earth.ts';
import {
  centralLine,
  equalMagnitudeCurves,
  equalObscurationCurves,
  partialLimits,
  pathLimits,
  riseSetCurves,
} from '../../src/eclipses/solar/curves.ts';
import { localContactTT, localMaximumTT, localShadow, magnitudeOf, obscurationOf, penumbralContact } from '../../src/eclipses/solar/localCore.ts';
import { greatestObscurationSeen, sunAltitudeFromElementsDeg } from '../../src/local/solar.ts';
import { geocentricPlace } from '../../src/eclipses/solar/surface.ts';
import type { SolarEclipse } from '../../src/eclipses/solar/types.ts';
import { solarEclipseOn } from './solarSupport.ts';

const total = solarEclipseOn('2024-04-08');
const annular = solarEclipseOn('2024-10-02');
const partial = solarEclipseOn('2025-03-29');
/** The properties hold at any step: three minutes keeps the file light. */
const STEP = 3 / 1440;

function maximumAt(eclipse: SolarEclipse, lonLat: LonLat) {
  const place = geocentricPlace(lonLat);
  return localShadow(eclipse.elements, place, localMaximumTT(eclipse.elements, place, eclipse.greatest.ttDays));
}

/** Every `every`-th point of some lines, leaving out the points interpolated on the ±180° cut. */
function pointsOf(lines: readonly (readonly LonLat[])[], every = 7): LonLat[] {
  return lines.flatMap((line) => line.filter((p, i) => i % every === Math.floor(every / 2) && Math.abs(p[0]) !== 180));
}

function assertNoJumps(lines: readonly (readonly LonLat[])[]) {
  for (const line of lines) {
    for (let i = 1; i < line.length; i++) {
      assert.ok(Math.abs(line[i]![0] - line[i - 1]![0]) <= 180, 'a line jumps across the map instead of being cut at ±180°');
      assert.ok(Number.isFinite(line[i]![0]) && Number.isFinite(line[i]![1]));
    }
  }
}

test('2024-04-08 (total): magnitude 1 at every sampled point of both path limits (Explanatory Supplement ch. 11: the limits are where the umbra grazes)', () => {
  const limits = pathLimits(total, STEP);
  assert.ok(limits.north.length > 0 && limits.south.length > 0);
  const points = pointsOf([...limits.north, ...limits.south], 3);
  assert.ok(points.length > 40, `${points.length} points`);
  for (const p of points) {
    const s = maximumAt(total, p);
    if (s.zeta < 0.05) continue;
    assert.ok(Math.abs(magnitudeOf(s) - 1) < 1e-5, `magnitude ${magnitudeOf(s)} at ${p}`);
  }
});

test('2024-10-02 (annular): on the limits the Moon sits just inside the Sun — magnitude equals the ratio of the discs (Meeus, Elements: internal contact)', () => {
  const limits = pathLimits(annular, STEP);
  for (const p of pointsOf([...limits.north, ...limits.south])) {
    const s = maximumAt(annular, p);
    if (s.zeta < 0.05) continue;
    const ratio = (s.penumbra - s.umbra) / (s.penumbra + s.umbra);
    assert.ok(Math.abs(magnitudeOf(s) - ratio) < 1e-5, `magnitude ${magnitudeOf(s)} vs ratio ${ratio}`);
  }
});

test('magnitude 0 on the partial limits, and M on the curves of magnitude M (0.25, 0.5, 0.75) (Meeus, Elements, ch. 7)', () => {
  for (const eclipse of [total, partial]) {
    const limits = partialLimits(eclipse, STEP);
    const points = pointsOf([...limits.north, ...limits.south]);
    assert.ok(points.length > 10, eclipse.id);
    for (const p of points) {
      const s = maximumAt(eclipse, p);
      if (s.zeta < 0.05) continue;
      assert.ok(Math.abs(magnitudeOf(s)) < 1e-5, `${eclipse.id}: magnitude ${magnitudeOf(s)} at ${p}`);
    }
  }
  for (const m of [0.25, 0.5, 0.75]) {
    const curves = equalMagnitudeCurves(total, m, STEP);
    for (const p of pointsOf([...curves.north, ...curves.south])) {
      const s = maximumAt(total, p);
      if (s.zeta < 0.05) continue;
      assert.ok(Math.abs(magnitudeOf(s) - m) < 1e-5, `magnitude ${magnitudeOf(s)} on the ${m} curve`);
    }
  }
});

test('obscuration O on the curves of obscuration O (0.1, 0.5, 0.9): the overlap of the two discs at each point\'s maximum (Meeus, Elements: obscuration)', () => {
  for (const o of [0.1, 0.5, 0.9]) {
    const curves = equalObscurationCurves(total, o, STEP);
    const points = pointsOf([...curves.north, ...curves.south]);
    assert.ok(points.length > 10);
    for (const p of points) {
      const s = maximumAt(total, p);
      if (s.zeta < 0.05) continue;
      assert.ok(Math.abs(obscurationOf(s) - o) < 1e-5, `obscuration ${obscurationOf(s)} on the ${o} curve`);
    }
  }
});

test('the central line: on the axis at its own times, in time order, from limb to limb; none for a partial eclipse (Explanatory Supplement ch. 11)', () => {
  const lines = centralLine(total);
  assert.equal(lines.length, 1);
  const line = lines[0]!;
  for (let i = 1; i < line.times.length; i++) assert.ok(line.times[i]!.ttDays > line.times[i - 1]!.ttDays);
  for (let i = 0; i < line.points.length; i += 10) {
    const s = localShadow(total.elements, geocentricPlace(line.points[i]!), line.times[i]!.ttDays);
    assert.ok(s.distance < 1e-6, `off the axis by ${s.distance}`);
  }
  const ends = [0, line.points.length - 1].map((i) => sunAltitudeFromElementsDeg(total.elements, line.points[i]!, line.times[i]!.ttDays));
  for (const altitude of ends) assert.ok(Math.abs(altitude) < 0.02, `central line ends with the Sun at ${altitude}°, not on the horizon`);
  assert.deepEqual(centralLine(partial), []);
  assert.deepEqual(pathLimits(partial), { north: [], south: [] });
});

test('rise/set curves: the eclipse begins or ends there with the Sun on the horizon, of the kind the curve is labelled (Explanatory Supplement ch. 11; ζ′ and Δ′ from Meeus, Elements)', () => {
  const curves = riseSetCurves(total);
  const kinds = new Set(curves.map((c) => `${c.contact} ${c.sun}`));
  assert.deepEqual([...kinds].sort(), ['C1 sunrise', 'C1 sunset', 'C4 sunrise', 'C4 sunset']);
  for (const curve of curves) {
    for (const p of curve.points.filter((_, i) => i % 9 === 4)) {
      const place = geocentricPlace(p);
      const max = localMaximumTT(total.elements, place, total.greatest.ttDays);
      const tt = localContactTT(total.elements, place, max, penumbralContact, curve.contact === 'C1' ? -1 : 1);
      assert.ok(tt !== undefined);
      // Where C1 and C4 nearly meet (a graze, at the partial limits) which of them falls at sunrise is ill-posed: skip.
      const other = localContactTT(total.elements, place, max, penumbralContact, curve.contact === 'C1' ? 1 : -1)!;
      if (Math.abs(other - tt) < 10 / 1440) continue;
      // The Sun on the geodetic horizon: the ellipsoid's outline seen along the axis (within 15″ of the Sun's direction).
      const altitude = sunAltitudeFromElementsDeg(total.elements, p, tt);
      assert.ok(Math.abs(altitude) < 0.02, `${curve.contact} at ${curve.sun}: Sun at ${altitude.toFixed(3)}° at ${p}`);
      const later = sunAltitudeFromElementsDeg(total.elements, p, tt + 0.01);
      assert.equal(later > altitude, curve.sun === 'sunrise', `${curve.contact} at ${curve.sun} at ${p}`);
    }
  }
});

test('the ±180° cut: lines that cross the date line end on it, and no line jumps across the map (RFC 7946 §3.1.9: antimeridian cutting)', () => {
  const crossing = solarEclipseOn('2025-09-21');
  const all = [
    ...riseSetCurves(crossing).map((c) => c.points),
    ...partialLimits(crossing, STEP).north,
    ...partialLimits(crossing, STEP).south,
    ...equalMagnitudeCurves(crossing, 0.5, STEP).north,
    ...equalMagnitudeCurves(crossing, 0.5, STEP).south,
    ...riseSetCurves(total).map((c) => c.points),
    ...partialLimits(total, STEP).north,
  ];
  assertNoJumps(all);
  const onCut = all.flatMap((line) => [line[0]!, line[line.length - 1]!]).filter((p) => Math.abs(p[0]) === 180);
  assert.ok(onCut.length >= 2, 'some line ends on the cut');
});

test('polar paths: 2021-12-04 (total, over Antarctica) has a central line and limits at high southern latitudes, all finite (from memory: its path crossed Antarctica)', () => {
  const polar = solarEclipseOn('2021-12-04');
  assert.equal(polar.kind, 'total');
  const line = centralLine(polar);
  assert.ok(line.length >= 1);
  for (const l of line) for (const p of l.points) assert.ok(p[1] < -50 && Number.isFinite(p[0]), `${p}`);
  const limits = pathLimits(polar);
  assertNoJumps([...limits.north, ...limits.south, ...line.map((l) => l.points)]);
  assert.ok(limits.north.length > 0 && limits.south.length > 0);
});

test('the obscuration field: 1 on the path, 0 on the partial limits and beyond, between them in between; with the Sun down it is what sunrise or sunset shows (Meeus, Elements; Meeus ch. 15 for sunrise)', () => {
  assert.equal(greatestObscurationSeen(total, total.greatestPoint), 1);
  const limit = pointsOf(partialLimits(total, STEP).south).find((p) => maximumAt(total, p).zeta > 0.3)!;
  assert.ok(greatestObscurationSeen(total, limit) < 1e-4);
  const between = greatestObscurationSeen(total, [-80, 40]);
  assert.ok(between > 0.9 && between < 1, `${between}`);
  assert.equal(greatestObscurationSeen(total, [100, -30]), 0);
});
