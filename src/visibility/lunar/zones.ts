/**
 * The zones one phase makes on the Earth, from the body-up caps at its start
 * and end, computed here once for every output: as spherical polygons for a
 * map (painted through any projection) and as planar lon/lat regions that
 * tile the plane for GeoJSON. Which zone a place is in follows one rule,
 * `zoneFromMargins`: up at the start and at the end, at one of them, or at
 * neither.
 */
import type { LineString, Polygon, Position } from 'geojson';
import { circleRing, runWhere, angularDistanceDeg } from '../../sphere/circles.ts';
import { sampleGrid, traceRegion, type PlaceGrid, type PlanarMultiPolygon } from '../../sphere/regions.ts';
import { tileRegions } from '../../sphere/tiling.ts';
import { capTest, moonUpMargin, type CapTest } from './moonUp.ts';
import { fieldSpanOf, spanTests, stage, zoneFromMargins, ZONE_ORDER, type Stage, type Visibility, type ZoneName } from './visibility.ts';

/** The zones that are painted over the background of the zone where nothing is seen. */
export type PaintedZone = Exclude<ZoneName, 'sees-none'>;
export const PAINTED_ZONES: readonly PaintedZone[] = ['rises-during', 'sets-during', 'sees-all'];

/**
 * The zones a start cap S and an end cap E make, as disjoint spherical
 * polygons built from arcs of the two circles, each ring clockwise around
 * what it encloses (d3-geo's rule): both caps (seen throughout), S only (set
 * during the phase), E only (risen during it). Painting them once each over
 * the nothing-seen background costs less than stacking caps or clipping.
 */
export function zonePolygons(start: Stage, end: Stage): Record<PaintedZone, Polygon> {
  const inside = (s: Stage) => (p: Position) => angularDistanceDeg(s.cap.centre, p) < s.cap.radiusDeg;
  // circleRing runs clockwise around its centre.
  const ringOf = (s: Stage) => circleRing(s.cap.centre, s.cap.radiusDeg, 0.25);
  const sRing = ringOf(start);
  const eRing = ringOf(end);
  const sInE = runWhere(sRing, inside(end));
  const eInS = runWhere(eRing, inside(start));
  const sOutE = runWhere(sRing, (p) => !inside(end)(p));
  const eOutS = runWhere(eRing, (p) => !inside(start)(p));
  const polygon = (ring: Position[]): Polygon => (ring.length < 3 ? { type: 'Polygon', coordinates: [] } : { type: 'Polygon', coordinates: [[...ring, ring[0]!]] });
  // The arcs that bound each zone are named by the same rule as zoneFromMargins: inside S is "up at the start".
  const byZone: Record<PaintedZone, Polygon> = {
    'sees-all': polygon([...sInE, ...eInS]),
    'sets-during': polygon([...sOutE, ...[...eInS].reverse()]),
    'rises-during': polygon([...eOutS, ...[...sInE].reverse()]),
  };
  return byZone;
}

/** A stage's horizon circle (the edge of its cap) as a line, a point every half degree of bearing. */
export function capOutline(s: Stage): LineString {
  return { type: 'LineString', coordinates: circleRing(s.cap.centre, s.cap.radiusDeg, 0.5) };
}

/** The spherical zone polygons of the phase that defines a visibility's zones. */
export function visibilityZonePolygons(visibility: Visibility): Record<PaintedZone, Polygon> {
  return zonePolygons(stage(visibility, visibility.zoneSpan.start), stage(visibility, visibility.zoneSpan.end));
}

/**
 * Regions from the caps at the start and end of a phase, tiling the lon/lat
 * rectangle exactly (tiling.ts): `label` picks each region's index from
 * whether the body is up at the start and at the end.
 */
function spanRegions(grid: PlaceGrid, tests: { start: CapTest; end: CapTest }, label: (start: boolean, end: boolean) => number, count: number): PlanarMultiPolygon[] {
  const start = sampleGrid(grid, (n) => moonUpMargin(tests.start, n));
  const end = sampleGrid(grid, (n) => moonUpMargin(tests.end, n));
  return tileRegions(grid, start, end, label, count);
}

/** The four zones as planar lon/lat regions on a grid of places; together they tile the plane. */
export function zoneRegions(visibility: Visibility, grid: PlaceGrid): Record<ZoneName, PlanarMultiPolygon> {
  const regions = spanRegions(grid, spanTests(visibility, visibility.zoneSpan), (start, end) =>
    ZONE_ORDER.indexOf(zoneFromMargins({ start: start ? 1 : -1, end: end ? 1 : -1 })), ZONE_ORDER.length);
  return Object.fromEntries(ZONE_ORDER.map((name, k) => [name, regions[k]!])) as Record<ZoneName, PlanarMultiPolygon>;
}

/** For a total eclipse: where all of totality is seen (up at U2 and U3), and where part of it (up at one of them). */
export function totalityRegions(visibility: Visibility, grid: PlaceGrid): { readonly all: PlanarMultiPolygon; readonly part: PlanarMultiPolygon } | undefined {
  if (visibility.eclipse.kind !== 'total') return undefined;
  const [all, part] = spanRegions(grid, spanTests(visibility, fieldSpanOf(visibility.eclipse)), (start, end) => (start && end ? 0 : start || end ? 1 : -1), 2);
  return { all: all!, part: part! };
}

/** Per stage, where the body is up, as a planar lon/lat region traced on a grid of places. */
export function stageRegions(visibility: Visibility, grid: PlaceGrid): { readonly stage: Stage; readonly region: PlanarMultiPolygon }[] {
  return visibility.stages.map((s) => {
    const test = capTest(s.cap);
    return { stage: s, region: traceRegion(grid, sampleGrid(grid, (n) => moonUpMargin(test, n))) };
  });
}
