/**
 * Map settings from typed choices — the command line's flags read
 * (src/cli/mapFlags.ts) or a house style's fields (src/batch/style.ts) —
 * checked together: shared by `umbracast map`, `umbracast sky` and the batch
 * workers, which load no command-line machinery. Errors name the library's
 * parameters (`bbox`, `size`, `zone`, `marks`…).
 */
import { InputError } from '../errors.ts';
import { civilClock } from '../ephemeris/civilTime.ts';
import type { LonLat } from '../ephemeris/earth.ts';
import type { PlaceLabel } from '../places/label.ts';
import { BORDER_STYLES, type BorderStyle } from '../sphere/world.ts';
import { PROJECTION_NAMES, type BoundingBox, type ProjectionName, type View } from '../figures/projection.ts';
import { THEME_NAMES, THEMES, type ThemeName } from '../figures/theme.ts';
import { MARK_CLOCKS, type MarkClock } from '../figures/markClock.ts';
import { AREA_NAMES_CHOICES, type AreaNamesChoice } from '../figures/areaNames.ts';
import type { MapStyle } from '../figures/map.ts';
import { MAP_INSETS, type MapInset } from '../figures/insetNames.ts';
import { BBOX_EXPECTED, checkNumber, checkPixelSize, isBoundingBox, isLonLat, LAT_LON_EXPECTED, type PixelSize } from './read.ts';
import { choosePlace } from './choose.ts';
import { chooseLanguage, LANGUAGES } from './language.ts';
import type { LunarWords } from '../words/lunar/text.ts';
import type { SolarWords } from '../words/solar/caution.ts';

/** A title longer than this would not fit any page we draw. */
export const MAX_TITLE_CHARS = 300;
/** More marks than this crowd any map. */
export const MAX_MARKS = 20;

/** The limits of the numbers a map takes, as the command line, a style and a library call read them. */
export const SPAN_LIMITS = { min: 2, max: 180, unit: 'degrees' };
export const DPI_LIMITS = { min: 36, max: 1200, unit: 'pixels per inch' };
export const WIDTH_MM_LIMITS = { min: 20, max: 2000, unit: 'millimetres' };
export const DEFAULT_SPAN_DEG = 60;
export const DEFAULT_WIDTH_MM = 180;

/** `title`, checked: some text, at most MAX_TITLE_CHARS characters. */
export function checkTitle(title: string | undefined, parameter = 'title'): string | undefined {
  if (title !== undefined && (title.trim() === '' || [...title].length > MAX_TITLE_CHARS)) throw new InputError(parameter, `some text, at most ${MAX_TITLE_CHARS} characters`, title);
  return title;
}

/** A value typed as one of a list, checked (a library caller in plain JavaScript may pass anything). */
function checkChoice<T extends string>(parameter: string, value: T, choices: readonly T[]): T {
  if (!choices.includes(value)) throw new InputError(parameter, `one of ${choices.join(', ')}`, value);
  return value;
}

export type SizePreset = 'card' | 'square' | 'print';
export const SIZE_PRESETS: readonly SizePreset[] = ['card', 'square', 'print'];
export const DEFAULT_SIZE: PixelSize = { widthPx: 2400, heightPx: 1350 };
/** The shadow diagram's (and the solar view at maximum's) page when none is asked for: `umbracast diagram` and the batch alike. */
export const DIAGRAM_SIZE: PixelSize = { widthPx: 1600, heightPx: 1000 };
const PRESET_SIZES: Record<'card' | 'square', PixelSize> = {
  card: { widthPx: 1200, heightPx: 675 },
  square: { widthPx: 1080, heightPx: 1080 },
};
/** Print pages are 0.62 as tall as wide: a world map with its title and legend. */
const PRINT_ASPECT = 0.62;

/** The page: a size in pixels or a preset (print: a width in millimetres), and the density to record. */
export interface PageChoice {
  readonly size?: PixelSize;
  readonly preset?: SizePreset;
  /** With the print preset; default DEFAULT_WIDTH_MM. */
  readonly widthMm?: number;
  /** Pixels per inch; default 300 for print, else 72. */
  readonly dpi?: number;
}

const sizeText = (size: PixelSize) => `${size.widthPx}x${size.heightPx}`;

export function pageSize(choice: PageChoice, defaultSize: PixelSize = DEFAULT_SIZE): { size: PixelSize; dpi: number } {
  const dpiOf = (fallback: number) => (choice.dpi === undefined ? fallback : checkNumber('dpi', choice.dpi, DPI_LIMITS));
  if (choice.size !== undefined && choice.preset !== undefined) throw new InputError('size', (name) => `either ${name('size')} or ${name('preset')}, not both`, sizeText(choice.size));
  if (choice.size !== undefined) return { size: checkPixelSize('size', choice.size, sizeText(choice.size)), dpi: dpiOf(72) };
  if (choice.preset === undefined) return { size: defaultSize, dpi: dpiOf(72) };
  const preset = checkChoice('preset', choice.preset, SIZE_PRESETS);
  if (preset !== 'print') return { size: PRESET_SIZES[preset], dpi: dpiOf(72) };
  const dpi = dpiOf(300);
  const widthMm = checkNumber('widthMm', choice.widthMm ?? DEFAULT_WIDTH_MM, WIDTH_MM_LIMITS);
  const widthPx = Math.round((widthMm / 25.4) * dpi);
  const size = { widthPx, heightPx: Math.round(widthPx * PRINT_ASPECT) };
  return { size: checkPixelSize('widthMm', size, `${widthMm} mm at ${dpi} dpi = ${size.widthPx}x${size.heightPx} px`), dpi };
}

/** Where the map looks: a projection, or a box, or a centre (a region with its span, or the point a globe faces). */
export interface ViewChoice {
  readonly projection: ProjectionName;
  /** [west, south, east, north], degrees: a regional view of exactly this box. */
  readonly bbox?: BoundingBox;
  /** [lon, lat], degrees. */
  readonly centre?: LonLat;
  /** Width of a centred regional view, degrees; default DEFAULT_SPAN_DEG. */
  readonly spanDeg?: number;
}

export function viewOf(choice: ViewChoice): View {
  const projection = checkChoice('projection', choice.projection, PROJECTION_NAMES);
  if (choice.bbox !== undefined && choice.centre !== undefined) throw new InputError('bbox', (name) => `either ${name('bbox')} or ${name('centre')}, not both`, choice.bbox.join(','));
  if (choice.bbox !== undefined) {
    if (!isBoundingBox(choice.bbox)) throw new InputError('bbox', BBOX_EXPECTED, choice.bbox.join(','));
    return { projection: 'region', bbox: choice.bbox };
  }
  if (choice.centre !== undefined && !isLonLat(choice.centre)) throw new InputError('centre', LAT_LON_EXPECTED, `${choice.centre[1]},${choice.centre[0]}`);
  if (choice.centre !== undefined && projection === 'globe') return { projection, centre: choice.centre };
  if (choice.centre !== undefined) return { projection: 'region', centre: choice.centre, spanDeg: checkNumber('spanDeg', choice.spanDeg ?? DEFAULT_SPAN_DEG, SPAN_LIMITS) };
  if (projection === 'region') throw new InputError('projection', (name) => `region together with ${name('bbox')} W,S,E,N or ${name('centre')} LAT,LON`, 'region alone');
  return { projection };
}

/** Everything a map is asked for besides the eclipse. */
export interface MapChoices extends ViewChoice, PageChoice {
  readonly theme: ThemeName;
  readonly borders: BorderStyle;
  /** IANA zone of the map's times. */
  readonly zone: string;
  /** Replaces the generated title. */
  readonly title?: string;
  /** Places to mark, by name (at most MAX_MARKS). */
  readonly marks: readonly string[];
  readonly markClock: MarkClock;
  readonly areaNames: AreaNamesChoice;
  /** BCP 47 tag of the reader's language (default English). */
  readonly lang?: string;
  /** A small figure inside the map; default none. */
  readonly inset?: MapInset;
}

/** The defaults of what a map is asked for (the command line's and the house style's). */
export const DEFAULT_MAP_CHOICES: MapChoices = {
  projection: 'equal-earth', theme: 'light', borders: 'countries', zone: 'UTC', marks: [], markClock: 'map', areaNames: 'auto',
};

/** Everything a map needs besides the eclipse, checked (shared by map and batch). */
export interface MapSettings {
  readonly style: MapStyle;
  readonly size: PixelSize;
  readonly dpi: number;
  readonly marks: readonly PlaceLabel[];
  /** The caption's and mark labels' words, in the reader's language (the map's own are style.words). */
  readonly words: LunarWords;
  /** A solar map's words, all of them, in the reader's language. */
  readonly solar: SolarWords;
}

export function mapSettings(choices: MapChoices): MapSettings {
  const view = viewOf(choices);
  const { size, dpi } = pageSize(choices);
  const theme = THEMES[checkChoice('theme', choices.theme, THEME_NAMES)];
  const borders = checkChoice('borders', choices.borders, BORDER_STYLES);
  const language = chooseLanguage(choices.lang);
  const clock = civilClock(choices.zone.trim(), 'zone', language.common.clock);
  const title = checkTitle(choices.title);
  if (choices.marks.length > MAX_MARKS) throw new InputError('marks', `at most ${MAX_MARKS} places`, `${choices.marks.length} places`);
  const marks = choices.marks.map((name) => choosePlace({ place: name }, true, 'marks').place);
  const markClock = checkChoice('markClock', choices.markClock, MARK_CLOCKS);
  // Continent and ocean names: on world views, not on small social cards (nor regional views), unless asked.
  const namesChoice = checkChoice('areaNames', choices.areaNames, AREA_NAMES_CHOICES);
  const areaNames = namesChoice === 'auto' ? view.projection !== 'region' && choices.preset !== 'card' : namesChoice === 'on';
  // A card of a solar eclipse shows its path unless another view is asked for (a lunar map has no path and ignores this).
  const fitPath = choices.preset === 'card' && choices.projection === 'equal-earth' && choices.bbox === undefined && choices.centre === undefined;
  const inset = choices.inset === undefined ? 'none' : checkChoice('inset', choices.inset, MAP_INSETS);
  // English maps carry no words in their style, as before languages were offered.
  const english = language.tag === 'en' && language.lunar === LANGUAGES.en.lunar;
  const words = english ? {} : { words: language.lunar.figures, ...(inset !== 'none' && language.lunar.diagram ? { diagramWords: language.lunar.diagram } : {}) };
  return {
    style: { theme, view, borders, clock, markClock, areaNames, ...(title !== undefined ? { title } : {}), ...(fitPath ? { fitPath } : {}), ...(inset !== 'none' ? { inset } : {}), ...words },
    size, dpi, marks, words: language.lunar, solar: language.solar,
  };
}
