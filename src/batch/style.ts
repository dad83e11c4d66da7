/**
 * House style files (JSON or YAML): how a publication wants its maps. One
 * schema (zod) for `umbracast batch --style` and `umbracast map --style`; an
 * error names the file, the field and what was expected.
 */
import { createHash } from 'node:crypto';
import { extname } from 'node:path';
import { parseDocument } from 'yaml';
import { z } from 'zod';
import { InputError, describeReceived } from '../errors.ts';
import { ECLIPSE_BODIES } from '../eclipses/common/record.ts';
import { SHADOW_CONVENTIONS } from '../eclipses/lunar/conventions.ts';
import { isKnownTimeZone } from '../ephemeris/civilTime.ts';
import { BORDER_STYLES } from '../sphere/world.ts';
import { PROJECTION_NAMES } from '../figures/projection.ts';
import { THEME_NAMES } from '../figures/theme.ts';
import { MARK_CLOCKS } from '../figures/markClock.ts';
import { AREA_NAMES_CHOICES } from '../figures/areaNames.ts';
import { chooseLanguage, LANGUAGE_TAGS } from '../settings/language.ts';

const isOfferedLanguage = (tag: string) => {
  try {
    chooseLanguage(tag);
    return true;
  } catch {
    return false;
  }
};
import { LOCAL_FORMATS, MAP_FORMATS, SKY_FORMATS } from '../outputs/formatNames.ts';
import { MAX_FILE_NAME_BYTES, readRegularFile, ReadRefused } from '../outputs/files.ts';
import { DEFAULT_NAMING, longestStemBytes, MAP_SUFFIX_BYTES, NAMING_FIELDS } from './naming.ts';
import { printable } from './printable.ts';

/** Style files larger than this are refused: a style is a page of settings. */
export const MAX_STYLE_BYTES = 256 * 1024;

const enumOf = <T extends string>(values: readonly T[]) => z.enum(values as [T, ...T[]]);

/** A file-name stem: letters, digits, dot, dash, underscore and {placeholders}; no folders, no leading dot. */
const namingTemplate = z
  .string()
  .min(1)
  .max(120)
  .regex(/^[A-Za-z0-9{][A-Za-z0-9._{}-]*$/, 'a file-name template of letters, digits, . _ - and {id} {kind} {year} {saros}, with no folders')
  .refine((t) => !t.includes('..'), 'a template without ".."')
  .refine((t) => [...t.matchAll(/\{([^}]*)\}/g)].every((m) => (NAMING_FIELDS as readonly string[]).includes(m[1]!)), `placeholders among {${NAMING_FIELDS.join('}, {')}}`)
  .refine((t) => t.includes('{id}'), 'a template containing {id}, so that every eclipse gets its own files')
  .refine((t) => longestStemBytes(t) + MAP_SUFFIX_BYTES <= MAX_FILE_NAME_BYTES, `a template whose file names fit in ${MAX_FILE_NAME_BYTES} bytes once filled in ({id} is 10 characters, {kind} up to 9, {saros} up to 4; the longest extension is .geojson)`);

const styleObject = z
  .object({
    theme: enumOf(THEME_NAMES).default('light'),
    projection: enumOf(PROJECTION_NAMES).default('equal-earth'),
    bbox: z.tuple([z.number().min(-180).max(180), z.number().min(-90).max(90), z.number().min(-180).max(180), z.number().min(-90).max(90)]).optional(),
    centre: z.tuple([z.number().min(-90).max(90), z.number().min(-180).max(180)]).optional(),
    span: z.number().min(2).max(180).optional(),
    size: z.string().regex(/^\d{3,5}x\d{3,5}$/, 'WxH in pixels, e.g. 2400x1350').optional(),
    preset: z.enum(['card', 'square', 'print']).optional(),
    widthMm: z.number().min(20).max(2000).optional(),
    dpi: z.number().min(36).max(1200).optional(),
    tz: z.string().refine(isKnownTimeZone, 'an IANA time zone such as Australia/Adelaide, or UTC').default('UTC'),
    borders: enumOf(BORDER_STYLES).default('countries'),
    title: z.string().min(1).max(300).optional(),
    marks: z.array(z.string().min(1).max(200)).max(20).default([]),
    markClock: enumOf(MARK_CLOCKS).default('map'),
    areaNames: enumOf(AREA_NAMES_CHOICES).default('auto'),
    // The reader's language (BCP 47); absent, English, and the style's hash is as it was before languages were offered.
    lang: z.string().refine(isOfferedLanguage, `a BCP 47 language tag among ${LANGUAGE_TAGS.join(', ')} (a region may follow: es-MX), in a script the bundled type draws`).optional(),
    places: z.array(z.string().min(1).max(200)).max(20).default([]),
    formats: z.array(enumOf(MAP_FORMATS)).min(1).max(5).default(['png']),
    localFormats: z.array(enumOf(LOCAL_FORMATS)).max(5).default(['markdown', 'ics']),
    sky: z.boolean().default(true),
    // The figure beside the map, for every eclipse: the shadow diagram (lunar), the Sun and the Moon at maximum (solar).
    // true: in the maps' picture formats; a list: in those. Absent or false: none, and the style's hash is as it was before.
    diagram: z
      .union([z.boolean(), z.array(enumOf(SKY_FORMATS)).min(1, 'at least one format').max(SKY_FORMATS.length).refine((f) => new Set(f).size === f.length, 'each format at most once')], {
        error: `true, false, or a list of picture formats among ${SKY_FORMATS.join(', ')}, each at most once`,
      })
      .optional()
      .transform((d) => (d === false ? undefined : d)),
    naming: namingTemplate.default(DEFAULT_NAMING),
    // Which kinds of eclipse a batch takes: lunar, solar or both (the default).
    bodies: z.array(enumOf(ECLIPSE_BODIES)).min(1).max(ECLIPSE_BODIES.length).refine((b) => new Set(b).size === b.length, 'each of lunar, solar at most once').default([...ECLIPSE_BODIES]),
    // Lunar only: the shadow's enlargement (Danjon, Chauvenet); a solar eclipse has no such convention.
    convention: enumOf(SHADOW_CONVENTIONS).default('danjon'),
    deltaT: z.number().min(-86_400).max(86_400).optional(),
  })
  .strict();

export const houseStyleSchema = styleObject
  .refine((s) => !(s.size && s.preset), { message: 'either size or preset, not both', path: ['size'] })
  .refine((s) => !(s.bbox && s.centre), { message: 'either bbox or centre, not both', path: ['bbox'] });

export type HouseStyle = z.infer<typeof houseStyleSchema>;

export const DEFAULT_STYLE: HouseStyle = houseStyleSchema.parse({});

/** Turn the first schema problem into our one-line error: file, field, expected, received. */
function styleError(file: string, issue: z.core.$ZodIssue, input: unknown): InputError {
  const path = issue.path.map((p) => (typeof p === 'number' ? `[${p}]` : `.${String(p)}`)).join('').replace(/^\./, '');
  let received: unknown = input;
  for (const key of issue.path) received = received && typeof received === 'object' ? (received as Record<PropertyKey, unknown>)[key as PropertyKey] : undefined;
  if (issue.code === 'unrecognized_keys') {
    const keys = (issue as unknown as { keys: string[] }).keys;
    const where = path ? `${path}.${keys[0]}` : keys[0]!;
    return new InputError(`${file}: ${where}`, `a known style field (${Object.keys(styleObject.shape).join(', ')})`, 'a field of that name', true);
  }
  const expected = issue.code === 'invalid_value' && 'values' in issue
    ? `one of ${(issue.values as unknown[]).join(', ')}`
    : issue.code === 'invalid_type' ? `${(issue as unknown as { expected: string }).expected}` : issue.message.replace(/^Invalid input: /, '');
  return new InputError(`${file}: ${path || '(top level)'}`, expected, received);
}

/** Validate parsed style data. */
export function validateStyle(data: unknown, file = 'style'): HouseStyle {
  const result = houseStyleSchema.safeParse(data ?? {});
  if (!result.success) throw styleError(file, result.error.issues[0]!, data);
  return result.data;
}

/** A style is a mapping of fields holding values or short lists: anything nested deeper is not a style. */
export const MAX_STYLE_DEPTH = 8;

/** How deeply a parsed value nests, counted without recursion (so no depth can overflow the stack). */
function nestingDepth(value: unknown, limit: number): number {
  let deepest = 0;
  const stack: [unknown, number][] = [[value, 1]];
  while (stack.length > 0) {
    const [item, depth] = stack.pop()!;
    if (item === null || typeof item !== 'object') continue;
    deepest = Math.max(deepest, depth);
    if (deepest > limit) return deepest;
    for (const child of Object.values(item)) stack.push([child, depth + 1]);
  }
  return deepest;
}

/**
 * How deeply brackets nest in style text ([ and { outside quoted strings
 * and comments), counted in one pass: checked before parsing, because a
 * parser that recurses per level can exhaust the stack, and V8 ends the
 * process outright if that happens while it compiles a regular expression.
 */
export function bracketDepth(text: string): number {
  let depth = 0;
  let deepest = 0;
  let quote: string | undefined;
  for (let i = 0; i < text.length; i++) {
    const c = text[i]!;
    if (quote) {
      if (c === '\\' && quote === '"') i++;
      else if (c === quote) quote = undefined;
    } else if (c === '"' || c === "'") {
      quote = c;
    } else if (c === '#' && (i === 0 || /\s/.test(text[i - 1]!))) {
      while (i < text.length && text[i] !== '\n') i++;
    } else if (c === '[' || c === '{') {
      deepest = Math.max(deepest, ++depth);
    } else if (c === ']' || c === '}') {
      depth = Math.max(0, depth - 1);
    }
  }
  return deepest;
}

/** Parse style text; every refusal is one InputError naming the file. */
function parseStyleText(text: string, isJson: boolean, file: string): unknown {
  const kind = isJson ? 'JSON' : 'YAML';
  const tooDeep = () => new InputError(file, `a style nested at most ${MAX_STYLE_DEPTH} levels deep`, 'a file nested deeper', true);
  // Brackets in plain YAML text ("title: Moon [low]") count too, so the text check leaves room; the parsed value is checked exactly.
  if (bracketDepth(text) > 4 * MAX_STYLE_DEPTH) throw tooDeep();
  try {
    if (isJson) return JSON.parse(text);
    // YAML 1.2 core schema only: an unknown tag (!x, !!binary, !!set…) is an error here, not a warning on stderr.
    const document = parseDocument(text, { logLevel: 'silent', schema: 'core', resolveKnownTags: false, prettyErrors: false });
    const problem = document.errors[0] ?? document.warnings[0];
    if (problem) {
      if (/call stack/i.test(problem.message)) throw tooDeep();
      throw new InputError(file, 'valid YAML', `a file that does not parse (${describeReceived(problem.message.split('\n')[0]).slice(1, -1)})`, true);
    }
    return document.toJS({ maxAliasCount: 100 });
  } catch (error) {
    if (error instanceof InputError) throw error;
    if (error instanceof RangeError) throw tooDeep();
    const reason = error instanceof Error ? error.message.split('\n')[0] : String(error);
    throw new InputError(file, `valid ${kind}`, `a file that does not parse (${describeReceived(reason).slice(1, -1)})`, true);
  }
}

/**
 * Read a style file: .json, .yaml or .yml. It must be a regular file (a
 * link to one is followed; a device, FIFO or folder is refused without
 * reading it) of at most MAX_STYLE_BYTES; at most that much is ever read.
 * Every error is one line, with what came from the file shown escaped.
 */
export function loadStyle(path: string): HouseStyle {
  try {
    return loadStyleUnescaped(path);
  } catch (error) {
    if (error instanceof InputError) throw new InputError(printable(error.parameter), printable(error.expected), printable(error.received), true);
    throw error;
  }
}

function loadStyleUnescaped(path: string): HouseStyle {
  const extension = extname(path).toLowerCase();
  if (!['.json', '.yaml', '.yml'].includes(extension)) throw new InputError('style', 'a .json, .yaml or .yml file', path);
  let bytes: Buffer;
  try {
    bytes = readRegularFile(path, MAX_STYLE_BYTES);
  } catch (error) {
    if (!(error instanceof ReadRefused)) throw error;
    if (error.reason === 'too large') throw new InputError('style', `a style file of at most ${MAX_STYLE_BYTES / 1024} KiB`, path);
    if (error.reason === 'not a regular file') throw new InputError('style', 'a regular style file', `${describeReceived(path)} (${error.detail.slice(path.length + 1)})`, true);
    throw new InputError('style', 'a readable style file', path);
  }
  const data = parseStyleText(bytes.toString('utf8'), extension === '.json', path);
  if (nestingDepth(data, MAX_STYLE_DEPTH) > MAX_STYLE_DEPTH) throw new InputError(path, `a style nested at most ${MAX_STYLE_DEPTH} levels deep`, 'a file nested deeper', true);
  if (data !== null && data !== undefined && (typeof data !== 'object' || Array.isArray(data))) {
    throw new InputError(`${path}: (top level)`, 'a mapping of style fields', JSON.stringify(data));
  }
  return validateStyle(data, path);
}

/**
 * Fields that choose which eclipses a batch takes, not how any of them is
 * drawn: left out of the hash, which keys each eclipse's files (so a batch
 * made before `bodies` existed stays up to date, and gains the solar eclipses).
 */
const SELECTION_FIELDS: readonly string[] = ['bodies'];

/** A stable hash of a style's effective settings (key order does not matter; the selection fields aside). */
export function styleHash(style: HouseStyle): string {
  const sorted = JSON.stringify(style, Object.keys(style).filter((key) => !SELECTION_FIELDS.includes(key)).sort());
  return createHash('sha256').update(sorted).digest('hex').slice(0, 16);
}

