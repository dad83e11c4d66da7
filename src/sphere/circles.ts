/** Small circles on the sphere, in geodetic lon/lat degrees. */
import type { Position } from 'geojson';
import { geoDistance } from 'd3-geo';
import type { LonLat } from '../ephemeris/earth.ts';

const DEG = Math.PI / 180;

/** Angular distance between two places, degrees (d3-geo's geoDistance: the haversine, stable at every distance). */
export function angularDistanceDeg(a: LonLat | Position, b: LonLat | Position): number {
  return geoDistance([a[0]!, a[1]!], [b[0]!, b[1]!]) / DEG;
}

/**
 * A closed ring of points at `radiusDeg` from `centre`, every `stepDeg` of bearing from north, clockwise seen from outside.
 *
 * Why not d3-geo's geoCircle: its vertices sit at angles offset by the radius itself (circleStream starts at
 * t0 = radius + 2π, in a frame rotated onto the centre), not at whole bearing steps from north, and its last point
 * only nearly repeats the first. Drawing the Moon-up lines and the field's half-circles from it moved their vertices
 * and changed the bytes of every lunar map (tried: 8 maps and 4 batch images of the hash list,
 * test/cli/outputHashes.test.ts). So we keep this ring; projection.ts still uses geoCircle for regional outlines.
 */
export function circleRing([lon, lat]: LonLat, radiusDeg: number, stepDeg: number): Position[] {
  const count = Math.ceil(360 / stepDeg);
  const r = radiusDeg * DEG;
  const phi = lat * DEG;
  const ring: Position[] = [];
  for (let k = 0; k <= count; k++) {
    const bearing = ((k % count) * 2 * Math.PI) / count;
    const lat2 = Math.asin(Math.sin(phi) * Math.cos(r) + Math.cos(phi) * Math.sin(r) * Math.cos(bearing));
    const lon2 = lon * DEG + Math.atan2(Math.sin(bearing) * Math.sin(r) * Math.cos(phi), Math.cos(r) - Math.sin(phi) * Math.sin(lat2));
    const lonDeg = ((((lon2 / DEG + 180) % 360) + 360) % 360) - 180;
    ring.push([lonDeg, lat2 / DEG]);
  }
  return ring;
}

/**
 * The stretch of a closed ring where a predicate holds, in ring order,
 * starting where it begins to hold (assumes one such stretch, as for the
 * part of one circle inside another).
 */
export function runWhere(ring: readonly Position[], holds: (p: Position) => boolean): Position[] {
  const points = ring.slice(0, -1);
  const flags = points.map(holds);
  if (flags.every(Boolean)) return [...points, points[0]!];
  const start = flags.findIndex((f, i) => f && !flags[(i - 1 + flags.length) % flags.length]);
  if (start < 0) return [];
  const run: Position[] = [];
  for (let k = 0; k < points.length && flags[(start + k) % points.length]; k++) run.push(points[(start + k) % points.length]!);
  return run;
}
