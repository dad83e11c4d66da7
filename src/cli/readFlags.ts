/**
 * The command line's flags read into the library's typed choices (the same
 * values a house style gives): text → numbers, boxes, positions, names. What
 * only text can get wrong is reported here, naming the flag; what any caller
 * can get wrong is checked by the library (src/settings/), naming its
 * parameter, which src/cli/flags.ts turns back into the flag.
 */
import { InputError } from '../errors.ts';
import { SHADOW_CONVENTIONS } from '../eclipses/lunar/conventions.ts';
import { BODY_CHOICES, kindsOfBodies, type BodyChoice, type EclipseKindName } from '../eclipses/kinds.ts';
import { PROJECTION_NAMES } from '../figures/projection.ts';
import { THEME_NAMES } from '../figures/theme.ts';
import { MARK_CLOCKS } from '../figures/markClock.ts';
import { AREA_NAMES_CHOICES } from '../figures/areaNames.ts';
import { MAP_INSETS } from '../figures/insetNames.ts';
import { BORDER_STYLES } from '../sphere/world.ts';
import type { EclipseChoice, PlaceChoice } from '../settings/choose.ts';
import { DPI_LIMITS, SIZE_PRESETS, SPAN_LIMITS, WIDTH_MM_LIMITS, type MapChoices, type PageChoice } from '../settings/mapSettings.ts';
import { DELTA_T_LIMITS, parseBoundingBox, parseChoice, parseLatLon, parseNumber, parseSize } from '../settings/read.ts';

export interface BodyFlags {
  body?: string;
  kind?: string;
}

/** --body: lunar, solar or all (the default). */
export function bodyFromFlags(flags: BodyFlags): BodyChoice {
  return flags.body === undefined ? 'all' : parseChoice('--body', flags.body, BODY_CHOICES);
}

/** The kinds --kind may name for a body: with `all`, a kind of either. */
export function kindsOfBody(body: BodyChoice): readonly EclipseKindName[] {
  return kindsOfBodies(body);
}

/**
 * --kind read against the body: the kinds chosen, or undefined for every kind.
 * A kind the body has not (annular for lunar, penumbral for solar) is one error
 * line naming --kind and the kinds allowed for that body.
 */
export function kindsFromFlags(flags: BodyFlags, body: BodyChoice = bodyFromFlags(flags)): readonly EclipseKindName[] | undefined {
  if (flags.kind === undefined) return undefined;
  const allowed = kindsOfBody(body);
  const parts = flags.kind.split(',').map((p) => p.trim().toLowerCase()).filter((p) => p.length > 0);
  const bad = parts.length === 0 || parts.some((p) => !(allowed as readonly string[]).includes(p));
  if (bad) throw new InputError('--kind', `a comma-separated list of the kinds of ${body === 'all' ? 'lunar or solar' : body} eclipses: ${allowed.join(', ')}`, flags.kind);
  return [...new Set(parts)] as EclipseKindName[];
}

export interface EclipseFlags {
  convention: string;
  deltaT?: string;
}

export interface PlaceFlags {
  place?: string;
  at?: string;
  tz?: string;
}

export interface SizeFlags {
  size?: string;
  preset?: string;
  widthMm?: string;
  dpi?: string;
}

export interface MapFlags extends SizeFlags, EclipseFlags {
  projection: string;
  bbox?: string;
  centre?: string;
  span?: string;
  tz: string;
  borders: string;
  title?: string;
  theme: string;
  output?: string;
  format?: string;
  mark: string[];
  markClock?: string;
  areaNames?: string;
  inset?: string;
  style?: string;
  lang?: string;
}

/**
 * With a house style, the flags the user typed win and the style fills in the rest: `typed(key)` says
 * whether a flag was typed (not a default). Without a style, every flag is read.
 */
export interface Underlay<T> {
  readonly base: T;
  readonly typed: (key: string) => boolean;
}

function reader<F extends object, T>(flags: F, underlay: Underlay<T> | undefined) {
  const text = flags as Record<string, unknown>;
  return <V>(key: keyof F & string, fromBase: (base: T) => V, read: (value: string) => V): V | undefined => {
    if (underlay && !underlay.typed(key)) return fromBase(underlay.base);
    const value = text[key];
    return value === undefined ? undefined : read(value as string);
  };
}

const given = <K extends string, V>(key: K, value: V | undefined): { [P in K]?: V } => (value === undefined ? {} : ({ [key]: value } as { [P in K]?: V }));

export function eclipseChoiceFromFlags(flags: EclipseFlags, underlay?: Underlay<EclipseChoice>): EclipseChoice {
  const take = reader(flags, underlay);
  const convention = take('convention', (b) => b.convention, (t) => parseChoice('--convention', t, SHADOW_CONVENTIONS))!;
  const deltaTSeconds = take('deltaT', (b) => b.deltaTSeconds, (t) => parseNumber('--delta-t', t, DELTA_T_LIMITS));
  return { convention, ...given('deltaTSeconds', deltaTSeconds) };
}

export function placeChoiceFromFlags(flags: PlaceFlags): PlaceChoice {
  if (flags.place !== undefined && flags.at !== undefined) throw new InputError('--at', 'either --place or --at, not both', flags.at);
  return {
    ...given('place', flags.place),
    ...given('at', flags.at === undefined ? undefined : parseLatLon('--at', flags.at)),
    ...given('zone', flags.tz),
  };
}

export function pageChoiceFromFlags(flags: SizeFlags, underlay?: Underlay<PageChoice>): PageChoice {
  const take = reader(flags, underlay);
  const sizeTyped = underlay === undefined || underlay.typed('size');
  const presetTyped = underlay === undefined || underlay.typed('preset');
  if (sizeTyped && presetTyped && flags.size !== undefined && flags.preset !== undefined) throw new InputError('--size', 'either --size or --preset, not both', flags.size);
  const size = take('size', (b) => b.size, (t) => parseSize(t, '--size'));
  const preset = take('preset', (b) => b.preset, (t) => parseChoice('--preset', t, SIZE_PRESETS));
  const dpi = take('dpi', (b) => b.dpi, (t) => parseNumber('--dpi', t, DPI_LIMITS));
  // The width counts for print pages only: elsewhere it is not read at all.
  const widthMm = preset === 'print' ? take('widthMm', (b) => b.widthMm, (t) => parseNumber('--width-mm', t, WIDTH_MM_LIMITS)) : undefined;
  return { ...given('size', size), ...given('preset', preset), ...given('dpi', dpi), ...given('widthMm', widthMm) };
}

export function mapChoicesFromFlags(flags: MapFlags, underlay?: Underlay<MapChoices>): MapChoices {
  const take = reader(flags, underlay);
  const projection = take('projection', (b) => b.projection, (t) => parseChoice('--projection', t, PROJECTION_NAMES))!;
  const bboxTyped = underlay === undefined || underlay.typed('bbox');
  const centreTyped = underlay === undefined || underlay.typed('centre');
  if (bboxTyped && centreTyped && flags.bbox !== undefined && flags.centre !== undefined) throw new InputError('--bbox', 'either --bbox or --centre, not both', flags.bbox);
  const bbox = take('bbox', (b) => b.bbox, (t) => parseBoundingBox(t, '--bbox'));
  const centre = take('centre', (b) => b.centre, (t) => parseLatLon('--centre', t));
  // The span counts for a centred region only: elsewhere it is not read at all.
  const spanDeg = bbox === undefined && centre !== undefined && projection !== 'globe'
    ? take('span', (b) => b.spanDeg, (t) => parseNumber('--span', t, SPAN_LIMITS)) : undefined;
  const page = pageChoiceFromFlags(flags, underlay);
  return {
    projection,
    ...given('bbox', bbox),
    ...given('centre', centre),
    ...given('spanDeg', spanDeg),
    ...page,
    theme: take('theme', (b) => b.theme, (t) => parseChoice('--theme', t, THEME_NAMES))!,
    borders: take('borders', (b) => b.borders, (t) => parseChoice('--borders', t, BORDER_STYLES))!,
    zone: take('tz', (b) => b.zone, (t) => t)!,
    ...given('title', take('title', (b) => b.title, (t) => t)),
    marks: underlay && !underlay.typed('mark') ? underlay.base.marks : flags.mark,
    markClock: take('markClock', (b) => b.markClock, (t) => parseChoice('--mark-clock', t, MARK_CLOCKS)) ?? 'map',
    areaNames: take('areaNames', (b) => b.areaNames, (t) => parseChoice('--area-names', t, AREA_NAMES_CHOICES)) ?? 'auto',
    ...given('lang', take('lang', (b) => b.lang, (t) => t)),
    ...given('inset', take('inset', (b) => b.inset, (t) => parseChoice('--inset', t, MAP_INSETS))),
  };
}
