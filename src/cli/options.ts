/**
 * Option parsing shared by every command: one reading of dates, ranges,
 * lists and numbers, one error shape (InputError → one stderr line, exit 2).
 */
import { InputError } from '../errors.ts';
import { SUPPORTED_RANGE } from '../eclipse/catalogue.ts';

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
    : parsePeriod('--from', fromText).start;
  let to: Date;
  if (toText === undefined) {
    to = new Date(from);
    to.setUTCFullYear(from.getUTCFullYear() + DEFAULT_RANGE_YEARS);
    if (to > SUPPORTED_RANGE.to) to = SUPPORTED_RANGE.to;
  } else {
    const period = parsePeriod('--to', toText);
    to = period.precision === 'day' ? period.start : period.next;
  }
  if (to <= from) {
    throw new InputError('--to', `a date after --from (${from.toISOString().slice(0, 10)})`, toText ?? to.toISOString().slice(0, 10));
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
