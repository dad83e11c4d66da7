/**
 * Map settings from options (the command line's or a house style's), parsed
 * and checked: shared by `umbracast map`, `umbracast sky` and the batch
 * workers, which load no command-line machinery.
 */
import { InputError } from '../errors.ts';
import { civilClock } from '../ephemeris/civilTime.ts';
import { BORDER_STYLES } from '../sphere/world.ts';
import { PROJECTION_NAMES, type View } from '../figures/projection.ts';
import { THEME_NAMES, THEMES } from '../figures/theme.ts';
import { MARK_CLOCKS } from '../figures/markClock.ts';
import { AREA_NAMES_CHOICES } from '../figures/areaNames.ts';
import type { MapStyle } from '../figures/map.ts';
import type { PlaceLabel } from '../outputs/localFormats.ts';
import type { HouseStyle } from '../batch/style.ts';
import { checkPixelSize, parseBoundingBox, parseChoice, parseLatLon, parseNumber, parseSize, type PixelSize } from '../cli/options.ts';
import { choosePlace, type EclipseChoice } from './choose.ts';

export interface MapOptions extends SizeOptions, EclipseChoice {
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
  style?: string;
}

/** A title longer than this would not fit any page we draw. */
export const MAX_TITLE_CHARS = 300;

/** --title, checked: some text, at most MAX_TITLE_CHARS characters. */
export function checkTitle(title: string | undefined): string | undefined {
  if (title !== undefined && (title.trim() === '' || [...title].length > MAX_TITLE_CHARS)) throw new InputError('--title', `some text, at most ${MAX_TITLE_CHARS} characters`, title);
  return title;
}

export type SizePreset = 'card' | 'square' | 'print';
export const SIZE_PRESETS: readonly SizePreset[] = ['card', 'square', 'print'];
export const DEFAULT_SIZE: PixelSize = { widthPx: 2400, heightPx: 1350 };
const PRESET_SIZES: Record<'card' | 'square', PixelSize> = {
  card: { widthPx: 1200, heightPx: 675 },
  square: { widthPx: 1080, heightPx: 1080 },
};
/** Print pages are 0.62 as tall as wide: a world map with its title and legend. */
const PRINT_ASPECT = 0.62;

function parseView(options: MapOptions): View {
  const projection = parseChoice('--projection', options.projection, PROJECTION_NAMES);
  if (options.bbox !== undefined && options.centre !== undefined) throw new InputError('--bbox', 'either --bbox or --centre, not both', options.bbox);
  if (options.bbox !== undefined) return { projection: 'region', bbox: parseBoundingBox(options.bbox) };
  if (options.centre !== undefined && projection === 'globe') return { projection, centre: parseLatLon('--centre', options.centre) };
  if (options.centre !== undefined) {
    return { projection: 'region', centre: parseLatLon('--centre', options.centre), spanDeg: parseNumber('--span', options.span ?? '60', { min: 2, max: 180, unit: 'degrees' }) };
  }
  if (projection === 'region') throw new InputError('--projection', 'region together with --bbox W,S,E,N or --centre LAT,LON', 'region alone');
  return { projection };
}

export interface SizeOptions {
  size?: string;
  preset?: string;
  widthMm?: string;
  dpi?: string;
}

export function parseSizeAndDpi(options: SizeOptions, defaultSize: PixelSize = DEFAULT_SIZE): { size: PixelSize; dpi: number } {
  const dpiOf = (fallback: number) => (options.dpi === undefined ? fallback : parseNumber('--dpi', options.dpi, { min: 36, max: 1200, unit: 'pixels per inch' }));
  if (options.size !== undefined && options.preset !== undefined) throw new InputError('--size', 'either --size or --preset, not both', options.size);
  if (options.size !== undefined) return { size: parseSize(options.size), dpi: dpiOf(72) };
  if (options.preset === undefined) return { size: defaultSize, dpi: dpiOf(72) };
  const preset = parseChoice('--preset', options.preset, SIZE_PRESETS);
  if (preset !== 'print') return { size: PRESET_SIZES[preset], dpi: dpiOf(72) };
  const dpi = dpiOf(300);
  const widthMm = parseNumber('--width-mm', options.widthMm ?? '180', { min: 20, max: 2000, unit: 'millimetres' });
  const widthPx = Math.round((widthMm / 25.4) * dpi);
  const size = { widthPx, heightPx: Math.round(widthPx * PRINT_ASPECT) };
  return { size: checkPixelSize('--width-mm', size, `${widthMm} mm at ${dpi} dpi = ${size.widthPx}x${size.heightPx} px`), dpi };
}

/** Everything a map needs besides the eclipse, parsed and checked (shared by map and batch). */
export interface MapSettings {
  readonly style: MapStyle;
  readonly size: PixelSize;
  readonly dpi: number;
  readonly marks: readonly PlaceLabel[];
}

export function mapSettings(options: MapOptions): MapSettings {
  const view = parseView(options);
  const { size, dpi } = parseSizeAndDpi(options);
  const theme = THEMES[parseChoice('--theme', options.theme, THEME_NAMES)];
  const borders = parseChoice('--borders', options.borders, BORDER_STYLES);
  const clock = civilClock(options.tz.trim(), '--tz');
  const title = checkTitle(options.title);
  if (options.mark.length > 20) throw new InputError('--mark', 'at most 20 places', `${options.mark.length} places`);
  const marks = options.mark.map((name) => choosePlace({ place: name }, true, '--mark')!.place);
  const markClock = parseChoice('--mark-clock', options.markClock ?? 'map', MARK_CLOCKS);
  // Continent and ocean names: on world views, not on small social cards (nor regional views), unless asked.
  const namesChoice = parseChoice('--area-names', options.areaNames ?? 'auto', AREA_NAMES_CHOICES);
  const areaNames = namesChoice === 'auto' ? view.projection !== 'region' && options.preset !== 'card' : namesChoice === 'on';
  return { style: { theme, view, borders, clock, markClock, areaNames, ...(title !== undefined ? { title } : {}) }, size, dpi, marks };
}

/** A house style as map options, for whatever the command line leaves unset. */
export function optionsFromStyle(style: HouseStyle): Partial<MapOptions> {
  return {
    theme: style.theme,
    projection: style.bbox || (style.centre && style.projection !== 'globe') ? 'region' : style.projection,
    ...(style.bbox ? { bbox: style.bbox.join(',') } : {}),
    ...(style.centre ? { centre: style.centre.join(','), span: String(style.span ?? 60) } : {}),
    ...(style.size ? { size: style.size } : {}),
    ...(style.preset ? { preset: style.preset } : {}),
    ...(style.widthMm !== undefined ? { widthMm: String(style.widthMm) } : {}),
    ...(style.dpi !== undefined ? { dpi: String(style.dpi) } : {}),
    tz: style.tz,
    borders: style.borders,
    ...(style.title !== undefined ? { title: style.title } : {}),
    mark: style.marks,
    markClock: style.markClock,
    areaNames: style.areaNames,
    convention: style.convention,
    ...(style.deltaT !== undefined ? { deltaT: String(style.deltaT) } : {}),
  };
}
