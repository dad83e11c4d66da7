/**
 * The total or annular path as spherical polygons for a map to fill: at
 * each instant from U1 to U4 the northern and southern limit points
 * (outline of |L2′| on the Earth, Explanatory Supplement ch. 11), joined
 * into a ring: the northern limit forwards, the southern back. Where one
 * limit is off the Earth (the path's ends, as the shadow comes on or leaves
 * at sunrise or sunset) the central line's point stands in for it, so the
 * ring closes through the path's end rather than along the limb: at those
 * ends the fill cuts a corner of up to half the path's width, while the
 * limit lines drawn over it stay exact.
 */
import type { Polygon, Position } from 'geojson';
import { geoArea } from 'd3-geo';
import type { LonLat } from '../../ephemeris/earth.ts';
import { besselianAt } from '../../eclipses/solar/besselian.ts';
import { CURVE_STEP_DAYS } from '../../eclipses/solar/curves.ts';
import { outlinePointsAt, umbraRadius } from '../../eclipses/solar/outline.ts';
import { surfacePoint } from '../../eclipses/solar/surface.ts';
import type { SolarEclipse } from '../../eclipses/solar/types.ts';

/** Rings of the path (spherical, as d3-geo reads them: the interior on the right, so each covers less than a hemisphere). */
export function pathPolygons(eclipse: SolarEclipse, stepDays = CURVE_STEP_DAYS / 2): Polygon[] {
  const { U1, U4 } = eclipse.contacts;
  if (!U1 || !U4 || !eclipse.central) return [];
  const count = Math.max(2, Math.ceil((U4.ttDays - U1.ttDays) / stepDays));
  const runs: { north: LonLat[]; south: LonLat[] }[] = [];
  let run: { north: LonLat[]; south: LonLat[] } | undefined;
  for (let n = 0; n <= count; n++) {
    const e = besselianAt(eclipse.elements, U1.ttDays + ((U4.ttDays - U1.ttDays) * n) / count);
    const limits = outlinePointsAt(e, umbraRadius);
    const centre = surfacePoint(e, e.x, e.y)?.lonLat;
    const north = limits.north?.lonLat ?? centre;
    const south = limits.south?.lonLat ?? centre;
    if (!north || !south) {
      run = undefined;
      continue;
    }
    if (!run) runs.push((run = { north: [], south: [] }));
    run.north.push(north);
    run.south.push(south);
  }
  return runs.filter((r) => r.north.length >= 2).map((r) => {
    const ring: Position[] = [...r.north, ...[...r.south].reverse(), r.north[0]!].map(([lon, lat]) => [lon, lat]);
    const polygon: Polygon = { type: 'Polygon', coordinates: [ring] };
    return geoArea(polygon) > 2 * Math.PI ? { type: 'Polygon', coordinates: [[...ring].reverse()] } : polygon;
  });
}
