/**
 * The global grid every traced region stands on (sphere/regions.ts): its
 * shape, where each cell lies, and the unit normals it holds in one flat
 * array. The normals are checked against the standard conversion of
 * latitude φ and longitude λ to a unit vector, (cos φ cos λ, cos φ sin λ,
 * sin φ), written out here on its own (common practice); the shape against
 * the rule that both ends of each axis are included (180° W and 180° E,
 * 90° N and 90° S), which traceRegion relies on to cut at ±180°.
 */
import assert from 'node:assert/strict';
import { test } from 'node:test';
import { cellNormal, cellPlace, gridShape, placeGrid, sampleGrid } from '../../src/sphere/regions.ts';

const RAD = Math.PI / 180;

test('a grid includes both ends of each axis: 0.25° is 1441 columns by 721 rows, 0.5° 721 by 361', () => {
  assert.deepEqual(gridShape(0.25), { resolutionDeg: 0.25, columns: 1441, rows: 721 });
  assert.deepEqual(gridShape(0.5), { resolutionDeg: 0.5, columns: 721, rows: 361 });
});

test('cells run row by row from 180° W, 90° N to 180° E, 90° S', () => {
  const shape = gridShape(5);
  assert.deepEqual(cellPlace(shape, 0), [-180, 90]);
  assert.deepEqual(cellPlace(shape, shape.columns - 1), [180, 90]);
  assert.deepEqual(cellPlace(shape, shape.columns), [-180, 85]);
  assert.deepEqual(cellPlace(shape, shape.columns * shape.rows - 1), [180, -90]);
  assert.deepEqual(cellPlace(shape, 37 * shape.columns + 12), [-120, 90 - 37 * 5]);
});

test('the flat normals are the unit vectors of the cells, three numbers a cell, the same as cellNormal', () => {
  const grid = placeGrid(5);
  assert.equal(grid.normals.length, 3 * grid.columns * grid.rows);
  for (let k = 0; k < grid.columns * grid.rows; k++) {
    const [lon, lat] = cellPlace(grid, k);
    const expected = [Math.cos(lat * RAD) * Math.cos(lon * RAD), Math.cos(lat * RAD) * Math.sin(lon * RAD), Math.sin(lat * RAD)];
    const held = [grid.normals[3 * k]!, grid.normals[3 * k + 1]!, grid.normals[3 * k + 2]!];
    for (let c = 0; c < 3; c++) assert.ok(Math.abs(held[c]! - expected[c]!) < 1e-15, `cell ${k} (${lon}, ${lat}) component ${c}: ${held[c]} against ${expected[c]}`);
    assert.deepEqual(held, [...cellNormal(grid, k)], `cell ${k}`);
  }
});

test('sampleGrid hands each cell its own normal: z is the sine of the row\'s latitude', () => {
  const grid = placeGrid(10);
  const z = sampleGrid(grid, (n) => n[2]);
  assert.equal(z.length, grid.columns * grid.rows);
  for (let j = 0; j < grid.rows; j++) {
    for (let i = 0; i < grid.columns; i++) assert.ok(Math.abs(z[j * grid.columns + i]! - Math.sin((90 - 10 * j) * RAD)) < 1e-15, `row ${j} column ${i}`);
  }
  // A function of longitude tells the columns apart: y / x is tan λ away from the poles.
  const lonDeg = sampleGrid(grid, (n) => (Math.atan2(n[1], n[0]) * 180) / Math.PI);
  assert.ok(Math.abs(lonDeg[9 * grid.columns + 27]! - (-180 + 270)) < 1e-9);
});
