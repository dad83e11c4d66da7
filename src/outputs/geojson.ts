/**
 * Visibility as GeoJSON (RFC 7946): per stage the region where the Moon is
 * up, and the derived zones — planar lon/lat polygons, cut at ±180° and wound
 * counter-clockwise, so that any GIS gets the right regions. The zones come
 * from both horizon circles at once (tiling.ts), so they tile the plane.
 */
import type { Feature, FeatureCollection, MultiPolygon } from 'geojson';
import { DATA_CALENDAR } from '../ephemeris/calendar.ts';
import { isoSeconds } from '../ephemeris/time.ts';
import { capTest, moonUpMargin, type CapTest } from '../visibility/lunar/moonUp.ts';
import type { Normal } from '../sphere/normal.ts';
import { placeGrid, sampleGrid, traceRegion, type PlaceGrid, type PlanarMultiPolygon } from '../sphere/regions.ts';
import { tileRegions } from '../sphere/tiling.ts';
import { fieldSpanOf, spanTests, zoneFromMargins, ZONE_ORDER, type Visibility } from '../visibility/lunar/visibility.ts';

export const VISIBILITY_SCHEMA = 'umbracast.visibility/1';
/** Grid step for tracing, degrees: edges land within GEOJSON_EDGE_TOLERANCE_DEG of the exact circles. */
export const GEOJSON_GRID_DEG = 0.5;
/** How far a traced edge may lie from the exact circle, degrees of arc (measured in test/visibility/tiling.test.ts). */
export const GEOJSON_EDGE_TOLERANCE_DEG = 0.002;

const round = (v: number) => Math.round(v * 1000) / 1000;
const rounded = (region: PlanarMultiPolygon): PlanarMultiPolygon =>
  region.map((polygon) => polygon.map((ring) => ring.map(([lon, lat]) => [round(lon!), round(lat!)])));

/**
 * Regions from the Moon-up caps at the start and end of a phase, tiling the
 * lon/lat rectangle exactly (tiling.ts): `label` picks each region's index
 * from whether the Moon is up at the start and at the end.
 */
function spanRegions(grid: PlaceGrid, tests: { start: CapTest; end: CapTest }, label: (start: boolean, end: boolean) => number, count: number): PlanarMultiPolygon[] {
  const start = sampleGrid(grid, (n) => moonUpMargin(tests.start, n));
  const end = sampleGrid(grid, (n) => moonUpMargin(tests.end, n));
  return tileRegions(grid, start, end, label, count);
}

export function visibilityGeoJson(visibility: Visibility): FeatureCollection<MultiPolygon> & { umbracast: Record<string, unknown> } {
  const grid = placeGrid(GEOJSON_GRID_DEG);
  const eclipse = visibility.eclipse;
  const region = (margin: (n: Normal) => number): MultiPolygon => ({
    type: 'MultiPolygon',
    coordinates: rounded(traceRegion(grid, sampleGrid(grid, margin))),
  });
  const features: Feature<MultiPolygon>[] = [];
  for (const stage of visibility.stages) {
    const test = capTest(stage.cap);
    features.push({
      type: 'Feature',
      properties: { layer: 'moon-up', contact: stage.name, time: isoSeconds(stage.cap.moment.utDays), subLunar: stage.cap.centre.map(round) },
      geometry: region((n) => moonUpMargin(test, n)),
    });
  }
  const zones = spanRegions(grid, spanTests(visibility, visibility.zoneSpan), (start, end) =>
    ZONE_ORDER.indexOf(zoneFromMargins({ start: start ? 1 : -1, end: end ? 1 : -1 })), ZONE_ORDER.length);
  ZONE_ORDER.forEach((name, k) => {
    features.push({
      type: 'Feature',
      properties: { layer: 'zone', zone: name, from: visibility.zoneSpan.start, to: visibility.zoneSpan.end },
      geometry: { type: 'MultiPolygon', coordinates: rounded(zones[k]!) },
    });
  });
  if (eclipse.kind === 'total') {
    // 0: up at U2 and U3 (all of totality), 1: up at one of them (part of it), the rest: neither.
    const [all, part] = spanRegions(grid, spanTests(visibility, fieldSpanOf(eclipse)), (start, end) => (start && end ? 0 : start || end ? 1 : -1), 2);
    features.push({ type: 'Feature', properties: { layer: 'zone', zone: 'totality-all', from: 'U2', to: 'U3' }, geometry: { type: 'MultiPolygon', coordinates: rounded(all!) } });
    features.push({ type: 'Feature', properties: { layer: 'zone', zone: 'totality-part', from: 'U2', to: 'U3' }, geometry: { type: 'MultiPolygon', coordinates: rounded(part!) } });
  }
  return {
    type: 'FeatureCollection',
    umbracast: {
      schema: VISIBILITY_SCHEMA,
      eclipse: eclipse.id,
      kind: eclipse.kind,
      convention: eclipse.convention,
      calendar: DATA_CALENDAR,
      deltaT: Math.round(eclipse.deltaT.seconds * 10) / 10,
      moonUp: 'upper limb on the sea-level apparent horizon (Meeus ch. 15), geodetic coordinates',
    },
    features,
  };
}
