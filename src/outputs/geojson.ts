/**
 * Visibility as GeoJSON (RFC 7946): per stage the region where the Moon is
 * up, and the derived zones — planar lon/lat polygons, cut at ±180° and wound
 * counter-clockwise, so that any GIS gets the right regions.
 */
import type { Feature, FeatureCollection, MultiPolygon } from 'geojson';
import { DATA_CALENDAR } from '../ephemeris/calendar.ts';
import { isoSeconds } from '../ephemeris/time.ts';
import { capTest, moonUpMargin, type Normal } from '../visibility/moonUp.ts';
import { placeGrid, sampleGrid, traceRegion, type PlanarMultiPolygon } from '../visibility/regions.ts';
import { fieldSpanOf, spanTests, ZONE_ORDER, type Visibility, type ZoneName } from '../visibility/visibility.ts';

export const VISIBILITY_SCHEMA = 'umbracast.visibility/1';
/** Grid step for tracing, degrees: edges land within ~0.01° of the exact circles. */
export const GEOJSON_GRID_DEG = 0.5;

const round = (v: number) => Math.round(v * 1000) / 1000;
const rounded = (region: PlanarMultiPolygon): PlanarMultiPolygon =>
  region.map((polygon) => polygon.map((ring) => ring.map(([lon, lat]) => [round(lon!), round(lat!)])));

export function zoneMargin(zone: ZoneName, start: number, end: number): number {
  switch (zone) {
    case 'sees-all': return Math.min(start, end);
    case 'sets-during': return Math.min(start, -end);
    case 'rises-during': return Math.min(-start, end);
    case 'sees-none': return Math.min(-start, -end);
  }
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
  const zone = spanTests(visibility, visibility.zoneSpan);
  for (const name of ZONE_ORDER) {
    features.push({
      type: 'Feature',
      properties: { layer: 'zone', zone: name, from: visibility.zoneSpan.start, to: visibility.zoneSpan.end },
      geometry: region((n) => zoneMargin(name, moonUpMargin(zone.start, n), moonUpMargin(zone.end, n))),
    });
  }
  if (eclipse.kind === 'total') {
    const totality = spanTests(visibility, fieldSpanOf(eclipse));
    const all = (n: Normal) => Math.min(moonUpMargin(totality.start, n), moonUpMargin(totality.end, n));
    const part = (n: Normal) => {
      const s = moonUpMargin(totality.start, n);
      const e = moonUpMargin(totality.end, n);
      return Math.max(Math.min(s, -e), Math.min(-s, e));
    };
    features.push({ type: 'Feature', properties: { layer: 'zone', zone: 'totality-all', from: 'U2', to: 'U3' }, geometry: region(all) });
    features.push({ type: 'Feature', properties: { layer: 'zone', zone: 'totality-part', from: 'U2', to: 'U3' }, geometry: region(part) });
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
