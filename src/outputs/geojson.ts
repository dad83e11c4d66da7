/**
 * Visibility as GeoJSON (RFC 7946): per stage the region where the Moon is
 * up, and the derived zones — planar lon/lat polygons, cut at ±180° and wound
 * counter-clockwise, so that any GIS gets the right regions. The zones come
 * from both horizon circles at once (visibility/lunar/zones.ts), so they tile the plane.
 */
import type { Feature, FeatureCollection, MultiPolygon } from 'geojson';
import { DATA_CALENDAR } from '../ephemeris/calendar.ts';
import { isoSeconds } from '../ephemeris/time.ts';
import { placeGrid, type PlanarMultiPolygon } from '../sphere/regions.ts';
import { ZONE_ORDER, type Visibility } from '../visibility/lunar/visibility.ts';
import { stageRegions, totalityRegions, zoneRegions } from '../visibility/lunar/zones.ts';

export const VISIBILITY_SCHEMA = 'umbracast.visibility/1';
/** Grid step for tracing, degrees: edges land within GEOJSON_EDGE_TOLERANCE_DEG of the exact circles. */
export const GEOJSON_GRID_DEG = 0.5;
/** How far a traced edge may lie from the exact circle, degrees of arc (measured in test/visibility/tiling.test.ts). */
export const GEOJSON_EDGE_TOLERANCE_DEG = 0.002;

const round = (v: number) => Math.round(v * 1000) / 1000;
const rounded = (region: PlanarMultiPolygon): PlanarMultiPolygon =>
  region.map((polygon) => polygon.map((ring) => ring.map(([lon, lat]) => [round(lon!), round(lat!)])));

export function visibilityGeoJson(visibility: Visibility): FeatureCollection<MultiPolygon> & { umbracast: Record<string, unknown> } {
  const grid = placeGrid(GEOJSON_GRID_DEG);
  const eclipse = visibility.eclipse;
  const features: Feature<MultiPolygon>[] = [];
  for (const { stage, region } of stageRegions(visibility, grid)) {
    features.push({
      type: 'Feature',
      properties: { layer: 'moon-up', contact: stage.name, time: isoSeconds(stage.cap.moment.utDays), subLunar: stage.cap.centre.map(round) },
      geometry: { type: 'MultiPolygon', coordinates: rounded(region) },
    });
  }
  const zones = zoneRegions(visibility, grid);
  for (const name of ZONE_ORDER) {
    features.push({
      type: 'Feature',
      properties: { layer: 'zone', zone: name, from: visibility.zoneSpan.start, to: visibility.zoneSpan.end },
      geometry: { type: 'MultiPolygon', coordinates: rounded(zones[name]) },
    });
  }
  const totality = totalityRegions(visibility, grid);
  if (totality) {
    features.push({ type: 'Feature', properties: { layer: 'zone', zone: 'totality-all', from: 'U2', to: 'U3' }, geometry: { type: 'MultiPolygon', coordinates: rounded(totality.all) } });
    features.push({ type: 'Feature', properties: { layer: 'zone', zone: 'totality-part', from: 'U2', to: 'U3' }, geometry: { type: 'MultiPolygon', coordinates: rounded(totality.part) } });
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
