/**
 * Regions as planar longitude/latitude polygons, traced from a smooth
 * function on a global grid (marching squares, d3-contour). What comes out
 * is what a GIS reading plain lon/lat expects (RFC 7946): cut at ±180°,
 * closed along the poles, outer rings counter-clockwise, holes clockwise.
 */
import { contours } from 'd3-contour';
import type { Position } from 'geojson';
import type { LonLat } from '../ephemeris/earth.ts';
import { normalAt, type Normal } from './normal.ts';

/** GeoJSON MultiPolygon coordinates. */
export type PlanarMultiPolygon = Position[][][];

/** A global grid of places: rows from 90° N to 90° S, columns from 180° W to 180° E, both ends included. */
export interface PlaceGrid {
  readonly resolutionDeg: number;
  readonly columns: number;
  readonly rows: number;
  readonly normals: readonly Normal[];
}

export function placeGrid(resolutionDeg: number): PlaceGrid {
  const columns = Math.round(360 / resolutionDeg) + 1;
  const rows = Math.round(180 / resolutionDeg) + 1;
  const normals: Normal[] = new Array(columns * rows);
  for (let j = 0; j < rows; j++) {
    for (let i = 0; i < columns; i++) normals[j * columns + i] = normalAt(gridPlace(i, j, resolutionDeg));
  }
  return { resolutionDeg, columns, rows, normals };
}

function gridPlace(i: number, j: number, resolutionDeg: number): LonLat {
  return [-180 + i * resolutionDeg, 90 - j * resolutionDeg];
}

/** Evaluate a function of place over the grid. */
export function sampleGrid(grid: PlaceGrid, value: (n: Normal) => number): Float64Array {
  const values = new Float64Array(grid.normals.length);
  for (let k = 0; k < values.length; k++) values[k] = value(grid.normals[k]!);
  return values;
}

/** Signed planar area (positive for counter-clockwise). */
export function ringArea(ring: readonly Position[]): number {
  let area = 0;
  for (let k = 0, n = ring.length; k < n - 1; k++) area += ring[k]![0]! * ring[k + 1]![1]! - ring[k + 1]![0]! * ring[k]![1]!;
  return area / 2;
}

const round6 = (v: number) => Math.round(v * 1e6) / 1e6;

/**
 * The region where `values` exceed `threshold`, as planar lon/lat polygons.
 * d3-contour places value (i, j) at (i + ½, j + ½); we undo that offset.
 */
export function traceRegion(grid: PlaceGrid, values: ArrayLike<number>, threshold = 0): PlanarMultiPolygon {
  const [contour] = contours().size([grid.columns, grid.rows]).thresholds([threshold])(values as number[]);
  const res = grid.resolutionDeg;
  const toLonLat = ([x, y]: Position): Position => [
    round6(Math.min(180, Math.max(-180, -180 + (x! - 0.5) * res))),
    round6(Math.min(90, Math.max(-90, 90 - (y! - 0.5) * res))),
  ];
  const polygons: PlanarMultiPolygon = [];
  for (const polygon of contour?.coordinates ?? []) {
    const rings = polygon.map((ring) => dropRepeats(ring.map(toLonLat))).filter((ring) => ring.length >= 4);
    if (rings.length === 0) continue;
    const [outer, ...holes] = rings;
    polygons.push([orient(outer!, true), ...holes.map((h) => orient(h, false))]);
  }
  return polygons;
}

function dropRepeats(ring: Position[]): Position[] {
  const out: Position[] = [];
  for (const p of ring) {
    const last = out[out.length - 1];
    if (!last || last[0] !== p[0] || last[1] !== p[1]) out.push(p);
  }
  return out;
}

function orient(ring: Position[], counterClockwise: boolean): Position[] {
  return ringArea(ring) > 0 === counterClockwise ? ring : [...ring].reverse();
}

/** Planar point-in-region (even–odd over all rings). */
export function regionContains(region: PlanarMultiPolygon, [x, y]: LonLat): boolean {
  let inside = false;
  for (const polygon of region) {
    for (const ring of polygon) {
      for (let k = 0, n = ring.length, l = n - 1; k < n; l = k++) {
        const [xk, yk] = ring[k] as [number, number];
        const [xl, yl] = ring[l] as [number, number];
        if (yk > y !== yl > y && x < ((xl - xk) * (y - yk)) / (yl - yk) + xk) inside = !inside;
      }
    }
  }
  return inside;
}
