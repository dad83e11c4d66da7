/**
 * A solar map's shading: the greatest obscuration seen with the Sun up
 * (local/solar.ts `greatestObscurationSeen`), sampled over a lon/lat grid
 * for the map to fill in steps and contour. Two passes keep it quick: a grid twice as coarse first,
 * then the fine points only near a coarse point that sees the eclipse (the
 * partial region is thousands of kilometres across, so a coarse cell's
 * neighbours catch every edge); every other fine point sees nothing.
 */
import type { LonLat } from '../ephemeris/earth.ts';
import { greatestObscurationSeen } from '../local/solar.ts';
import type { SolarEclipse } from '../eclipses/solar/types.ts';
import { gridShape, traceRegion, type GridShape, type PlanarMultiPolygon } from '../sphere/regions.ts';

export interface ObscurationField {
  /** The grid (rows from 90° N, columns from 180° W, both ends included): traceRegion reads its shape. */
  readonly grid: GridShape;
  /** Greatest obscuration seen with the Sun up, 0…1, row by row. */
  readonly values: Float64Array;
}

/** Grid steps a field may take, degrees (each a whole multiple of the next finer, so the coarse pass lands on fine points). */
export const FIELD_STEPS_DEG: readonly number[] = [0.5, 1, 2];

/**
 * The field on a global grid of `stepDeg` (one of FIELD_STEPS_DEG); `wanted`
 * limits the fine pass to the places a view shows (the rest read 0).
 */
export function obscurationField(eclipse: SolarEclipse, stepDeg: number, wanted: (lonLat: LonLat) => boolean = () => true): ObscurationField {
  const grid = gridShape(stepDeg);
  const { columns, rows } = grid;
  const values = new Float64Array(columns * rows);
  const place = (i: number, j: number): LonLat => [-180 + i * stepDeg, 90 - j * stepDeg];
  // The coarse pass: every second point in each direction.
  const seen = new Uint8Array(columns * rows);
  for (let j = 0; j < rows; j += 2) {
    for (let i = 0; i < columns; i += 2) {
      const k = j * columns + i;
      const value = greatestObscurationSeen(eclipse, place(i, j));
      values[k] = value;
      if (value > 0) seen[k] = 1;
    }
  }
  // The fine pass: points within two fine steps of a coarse point that sees the eclipse (wrapping at ±180°).
  for (let j = 0; j < rows; j++) {
    for (let i = 0; i < columns; i++) {
      if (i % 2 === 0 && j % 2 === 0) continue;
      let near = false;
      for (let dj = -2; dj <= 2 && !near; dj++) {
        const jj = j + dj;
        if (jj < 0 || jj >= rows || jj % 2 !== 0) continue;
        for (let di = -2; di <= 2 && !near; di++) {
          const ii = ((i + di) % (columns - 1) + (columns - 1)) % (columns - 1);
          if (ii % 2 === 0 && seen[jj * columns + ii]) near = true;
        }
      }
      const p = place(i, j);
      if (near && wanted(p)) values[j * columns + i] = greatestObscurationSeen(eclipse, p);
    }
  }
  return { grid, values };
}

/** Where the field exceeds `level`, as planar lon/lat polygons (RFC 7946 winding: outer rings counter-clockwise). */
export function fieldRegion(field: ObscurationField, level: number): PlanarMultiPolygon {
  return traceRegion(field.grid, field.values, level);
}
