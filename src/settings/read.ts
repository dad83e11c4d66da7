/**
 * Values as people write them (on a command line, in a style file, in a
 * library call with text): one reading of dates, ranges, lists, numbers,
 * sizes and positions, one error shape. Each reader takes the name of the
 * parameter it reads, for its InputError; the CLI names its flags through
 * its one table (src/cli/flags.ts).
 */
import { InputError } from '../errors.ts';
import { SUPPORTED_RANGE } from '../eclipses/common/range.ts';

const YEAR_MIN = SUPPORTED_RANGE.from.getUTCFullYear();
const YEAR_MAX = SUPPORTED_RANGE.to.getUTCFullYear() - 1;
const DATE_EXPECTED = `a date as YYYY, YYYY-MM or YYYY-MM-DD with the year in ${YEAR_MIN}–${YEAR_MAX}`;

/** A calendar period as typed: a year, a month or a day. */
interface Period {
  readonly start: Date;
  /** The first instant after the period. */
  readonly next: Date;
  readonly precision: 'year' | 'month' | 'day';
}

export function parsePeriod(option: string, text: string): Period {
  const match = /^(\d{4})(?:-(\d{2})(?:-(\d{2}))?)?$/.exec(text.trim());
  if (!match) throw new InputError(option, DATE_EXPECTED, text);
  const year = Number(match[1]);
  const month = match[2] === undefined ? undefined : Number(match[2]);
  const day = match[3] === undefined ? undefined : Number(match[3]);
  if (year < YEAR_MIN || year > YEAR_MAX) throw new InputError(option, DATE_EXPECTED, text);
  if (month !== undefined && (month < 1 || month > 12)) throw new InputError(option, DATE_EXPECTED, text);
  const utc = (y: number, m: number, d: number) => {
    const date = new Date(Date.UTC(2000, m, d));
    date.setUTCFullYear(y, m, d);
    return date;
  };
  if (month === undefined) return { start: utc(year, 0, 1), next: utc(year + 1, 0, 1), precision: 'year' };
  if (day === undefined) return { start: utc(year, month - 1, 1), next: utc(year, month, 1), precision: 'month' };
  const start = utc(year, month - 1, day);
  if (start.getUTCDate() !== day || start.getUTCMonth() !== month - 1) throw new InputError(option, DATE_EXPECTED, text);
  return { start, next: utc(year, month - 1, day + 1), precision: 'day' };
}

export interface DateRange {
  readonly from: Date;
  readonly to: Date;
}

export const DEFAULT_RANGE_YEARS = 10;

/**
 * --from/--to as every command reads them: a bare year or month in --to
 * includes that whole year or month; a full date in --to is exclusive.
 * Defaults: from today (UTC), for ten years.
 */
export function parseRange(fromText: string | undefined, toText: string | undefined, today: Date): DateRange {
  const from = fromText === undefined
    ? new Date(Date.UTC(today.getUTCFullYear(), today.getUTCMonth(), today.getUTCDate()))
    : parsePeriod('from', fromText).start;
  let to: Date;
  if (toText === undefined) {
    to = new Date(from);
    to.setUTCFullYear(from.getUTCFullYear() + DEFAULT_RANGE_YEARS);
    if (to > SUPPORTED_RANGE.to) to = SUPPORTED_RANGE.to;
  } else {
    const period = parsePeriod('to', toText);
    to = period.precision === 'day' ? period.start : period.next;
  }
  if (to <= from) {
    const fromDay = from.toISOString().slice(0, 10);
    throw new InputError('to', (name) => `a date after ${name('from')} (${fromDay})`, toText ?? to.toISOString().slice(0, 10));
  }
  return { from, to };
}

export function parseChoice<T extends string>(option: string, text: string, choices: readonly T[]): T {
  const value = text.trim().toLowerCase();
  if ((choices as readonly string[]).includes(value)) return value as T;
  throw new InputError(option, `one of ${choices.join(', ')}`, text);
}

export function parseChoiceList<T extends string>(option: string, text: string, choices: readonly T[]): T[] {
  const parts = text.split(',').map((p) => p.trim()).filter((p) => p.length > 0);
  if (parts.length === 0) throw new InputError(option, `a comma-separated list of ${choices.join(', ')}`, text);
  const chosen = parts.map((p) => {
    if (!(choices as readonly string[]).includes(p.toLowerCase())) {
      throw new InputError(option, `a comma-separated list of ${choices.join(', ')}`, text);
    }
    return p.toLowerCase() as T;
  });
  return [...new Set(chosen)];
}

export function parseNumber(option: string, text: string, limits: { min: number; max: number; unit: string }): number {
  const trimmed = text.trim();
  const value = /^[+-]?(\d+(\.\d*)?|\.\d+)([eE][+-]?\d+)?$/.test(trimmed) ? Number(trimmed) : Number.NaN;
  if (!Number.isFinite(value) || value < limits.min || value > limits.max) {
    throw new InputError(option, `a number of ${limits.unit} from ${limits.min} to ${limits.max}`, text);
  }
  return value;
}

/** "next", an eclipse id (its UTC date of greatest) or any date in the eclipse's week. */
export type When = { readonly kind: 'next' } | { readonly kind: 'date'; readonly date: Date; readonly text: string };

export const WHEN_EXPECTED = "'next', an eclipse id such as 2026-03-03, or a date (YYYY-MM-DD) within 7 days of an eclipse";

export function parseWhen(text: string | undefined): When {
  if (text === undefined || text.trim().toLowerCase() === 'next') return { kind: 'next' };
  const trimmed = text.trim();
  if (!/^\d{4}-\d{2}-\d{2}$/.test(trimmed)) throw new InputError('when', WHEN_EXPECTED, text);
  const day = parsePeriod('when', trimmed);
  // Noon of the given day: an eclipse on that UTC date is always the nearest.
  return { kind: 'date', date: new Date(day.start.getTime() + 43_200_000), text: trimmed };
}

export interface PixelSize {
  readonly widthPx: number;
  readonly heightPx: number;
}

/** The largest image we render: 12 000 px a side and 64 megapixels (about 730 MiB in a batch worker drawing one PNG: README "Limits"). */
export const MAX_SIDE_PX = 12_000;
export const MAX_PIXELS = 64_000_000;
export const MIN_SIDE_PX = 320;
const SIZE_EXPECTED = `WxH in pixels, each side ${MIN_SIDE_PX}–${MAX_SIDE_PX} and at most ${MAX_PIXELS / 1e6} megapixels in all`;

export function checkPixelSize(option: string, size: PixelSize, received: string): PixelSize {
  const { widthPx, heightPx } = size;
  const sideOk = (v: number) => Number.isInteger(v) && v >= MIN_SIDE_PX && v <= MAX_SIDE_PX;
  if (!sideOk(widthPx) || !sideOk(heightPx) || widthPx * heightPx > MAX_PIXELS) throw new InputError(option, SIZE_EXPECTED, received);
  return size;
}

export function parseSize(text: string, parameter = 'size'): PixelSize {
  const match = /^\s*(\d{1,6})\s*[x×]\s*(\d{1,6})\s*$/i.exec(text);
  if (!match) throw new InputError(parameter, SIZE_EXPECTED, text);
  return checkPixelSize(parameter, { widthPx: Number(match[1]), heightPx: Number(match[2]) }, text);
}

function parseNumberList(option: string, text: string, count: number, expected: string): number[] {
  const parts = text.split(',').map((p) => p.trim());
  const numbers = parts.map((p) => (/^[+-]?(\d+(\.\d*)?|\.\d+)$/.test(p) ? Number(p) : Number.NaN));
  if (parts.length !== count || numbers.some((n) => !Number.isFinite(n))) throw new InputError(option, expected, text);
  return numbers;
}

export const BBOX_EXPECTED = 'W,S,E,N in degrees: longitudes −180…180, latitudes −90…90, south below north';

/** A box [west, south, east, north] in degrees, checked: a longitude span that is not empty, south below north. */
export function isBoundingBox([west, south, east, north]: readonly [number, number, number, number]): boolean {
  const lonOk = (v: number) => v >= -180 && v <= 180;
  const latOk = (v: number) => v >= -90 && v <= 90;
  return lonOk(west) && lonOk(east) && latOk(south) && latOk(north) && south < north && west !== east;
}

export function parseBoundingBox(text: string, parameter = 'bbox'): [number, number, number, number] {
  const box = parseNumberList(parameter, text, 4, BBOX_EXPECTED) as [number, number, number, number];
  if (!isBoundingBox(box)) throw new InputError(parameter, BBOX_EXPECTED, text);
  return box;
}

export const LAT_LON_EXPECTED = 'LAT,LON in degrees, latitude −90…90, longitude −180…180 (east positive)';

/** [lon, lat] in degrees, on the globe. */
export const isLonLat = ([lon, lat]: readonly [number, number]): boolean => lat >= -90 && lat <= 90 && lon >= -180 && lon <= 180;

/** LAT,LON (the order people write), returned as [lon, lat]. */
export function parseLatLon(option: string, text: string): [number, number] {
  const [lat, lon] = parseNumberList(option, text, 2, LAT_LON_EXPECTED) as [number, number];
  if (!isLonLat([lon, lat])) throw new InputError(option, LAT_LON_EXPECTED, text);
  return [lon, lat];
}

/** ΔT beyond ±1 day makes no sense in years 1000–3000. */
export const DELTA_T_LIMITS = { min: -86_400, max: 86_400, unit: 'seconds' };

/** A number given as a number (a library call, a style file), checked against the limits a text would be. */
export function checkNumber(parameter: string, value: number, limits: { min: number; max: number; unit: string }): number {
  if (!Number.isFinite(value) || value < limits.min || value > limits.max) {
    throw new InputError(parameter, `a number of ${limits.unit} from ${limits.min} to ${limits.max}`, value);
  }
  return value;
}
