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

/** A global grid's shape: rows from 90° N to 90° S, columns from 180° W to 180° E, both ends included; what tracing reads. */
export interface GridShape {
  readonly resolutionDeg: number;
  readonly columns: number;
  readonly rows: number;
}

/**
 * A global grid of places with their unit normals, three numbers a place
 * (x, y, z) in one flat array, row by row: a quarter of the memory of an
 * array per place (a 0.25° grid holds a million places).
 */
export interface PlaceGrid extends GridShape {
  readonly normals: Float64Array;
}

export function gridShape(resolutionDeg: number): GridShape {
  return { resolutionDeg, columns: Math.round(360 / resolutionDeg) + 1, rows: Math.round(180 / resolutionDeg) + 1 };
}

export function placeGrid(resolutionDeg: number): PlaceGrid {
  const shape = gridShape(resolutionDeg);
  const normals = new Float64Array(shape.columns * shape.rows * 3);
  for (let k = 0; k < shape.columns * shape.rows; k++) normals.set(cellNormal(shape, k), 3 * k);
  return { ...shape, normals };
}

/** The place of cell k (row by row). */
export function cellPlace({ columns, resolutionDeg }: GridShape, k: number): LonLat {
  const i = k % columns;
  return [-180 + i * resolutionDeg, 90 - ((k - i) / columns) * resolutionDeg];
}

/** The unit normal of cell k: the same numbers placeGrid holds. */
export const cellNormal = (shape: GridShape, k: number): Normal => normalAt(cellPlace(shape, k));

/** Evaluate a function of place over the grid. */
export function sampleGrid(grid: PlaceGrid, value: (n: Normal) => number): Float64Array {
  const { normals } = grid;
  const values = new Float64Array(normals.length / 3);
  for (let k = 0; k < values.length; k++) values[k] = value([normals[3 * k]!, normals[3 * k + 1]!, normals[3 * k + 2]!]);
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
export function traceRegion(grid: GridShape, values: ArrayLike<number>, threshold = 0): PlanarMultiPolygon {
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
