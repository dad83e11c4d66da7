/**
 * The flags of places, pages and maps read into the library's typed choices
 * (the same values a house style gives), beside readFlags.ts, which reads what
 * every command shares: only the commands that place or draw load this file.
 */
import { InputError } from '../errors.ts';
import { PROJECTION_NAMES } from '../figures/projection.ts';
import { THEME_NAMES } from '../figures/theme.ts';
import { MARK_CLOCKS } from '../figures/markClock.ts';
import { AREA_NAMES_CHOICES } from '../figures/areaNames.ts';
import { MAP_INSETS } from '../figures/insetNames.ts';
import { BORDER_STYLES } from '../sphere/world.ts';
import type { PlaceChoice } from '../settings/choose.ts';
import { DPI_LIMITS, SIZE_PRESETS, SPAN_LIMITS, WIDTH_MM_LIMITS, type MapChoices, type PageChoice } from '../settings/mapSettings.ts';
import { parseBoundingBox, parseChoice, parseLatLon, parseNumber, parseSize } from '../settings/read.ts';
import { given, reader, type EclipseFlags, type Underlay } from './readFlags.ts';

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
