/**
 * citiesOfPopulation: the places of at least N people, read from the
 * population column alone, must be the same rows, in the same order, as
 * parsing every line of GeoNames' cities500 table (cityAt) and filtering,
 * which is how the solar caption chose its cities before; and it must
 * not load the name index for it.
 */
import assert from 'node:assert/strict';
import { test } from 'node:test';
import { cityAt, cityCount, citiesOfPopulation } from '../../src/places/geonames.ts';

test('the places of a million people or more: the same rows as parsing every line of the table (before the name index is loaded, and after)', () => {
  const lean = citiesOfPopulation(1_000_000);
  // From memory (GeoNames): Tokyo, id 1850147, counts well over eight million people; Lagos (2332459) over a million.
  const tokyo = lean.find((c) => c.geonameId === 1850147);
  assert.ok(tokyo && tokyo.population > 8_000_000 && tokyo.country === 'JP', 'Tokyo is among them');
  assert.ok(lean.some((c) => c.geonameId === 2332459 && c.country === 'NG'), 'Lagos is among them');
  assert.ok(lean.every((c) => c.population >= 1_000_000));
  // The same table read in full (every line parsed, every column split): the reference.
  const full = [];
  for (let line = 0, n = cityCount(); line < n; line++) {
    const city = cityAt(line);
    if (city.population >= 1_000_000) full.push(city);
  }
  assert.ok(full.length > 300, `${full.length} places of a million people or more`);
  assert.deepEqual(lean, full);
  // With the index loaded, the held table is read: still the same rows.
  assert.deepEqual(citiesOfPopulation(1_000_000), full);
});

test('an edge of the threshold: a place of exactly N people counts, one person fewer does not', () => {
  const rows = citiesOfPopulation(5_000_000);
  const smallest = rows.reduce((a, b) => (b.population < a.population ? b : a));
  assert.ok(citiesOfPopulation(smallest.population).some((c) => c.geonameId === smallest.geonameId));
  assert.ok(!citiesOfPopulation(smallest.population + 1).some((c) => c.geonameId === smallest.geonameId));
  // No threshold above every place's population: none (from memory: no city counts a billion people).
  assert.deepEqual(citiesOfPopulation(1e9), []);
});
