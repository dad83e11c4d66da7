/** `umbracast map [WHEN]`: one eclipse as a publication-ready visibility map. */
import { mkdirSync } from 'node:fs';
import { extname, resolve } from 'node:path';
import type { Command } from 'commander';
import { InputError } from '../../errors.ts';
import { civilClock } from '../../ephemeris/civilTime.ts';
import { BORDER_STYLES } from '../../map/basemap.ts';
import { PROJECTION_NAMES, type View } from '../../map/projection.ts';
import { THEME_NAMES, THEMES } from '../../map/theme.ts';
import { checkOutputFolder, writeFileAtomic } from '../../outputs/files.ts';
import { captionText, MAP_FORMATS, renderMapFile, type MapFormat } from '../../outputs/mapFile.ts';
import type { CommandContext } from '../context.ts';
import type { MapStyle } from '../../map/scene.ts';
import type { PlaceLabel } from '../../outputs/localFormats.ts';
import { loadStyle, type HouseStyle } from '../../batch/style.ts';
import { toolVersion } from '../version.ts';
import {
  checkPixelSize,
  parseBoundingBox,
  parseChoice,
  parseLatLon,
  parseNumber,
  parseSize,
  WHEN_EXPECTED,
  type PixelSize,
} from '../options.ts';
import { chooseEclipse, choosePlace, withEclipseOptions } from '../choose.ts';

export interface MapOptions {
  projection: string;
  bbox?: string;
  centre?: string;
  span?: string;
  tz: string;
  borders: string;
  title?: string;
  theme: string;
  size?: string;
  preset?: string;
  widthMm?: string;
  dpi?: string;
  output?: string;
  format?: string;
  convention: string;
  deltaT?: string;
  mark: string[];
  style?: string;
}

/** A title longer than this would not fit any page we draw. */
export const MAX_TITLE_CHARS = 300;

export type SizePreset = 'card' | 'square' | 'print';
export const SIZE_PRESETS: readonly SizePreset[] = ['card', 'square', 'print'];
export const DEFAULT_SIZE: PixelSize = { widthPx: 2400, heightPx: 1350 };
const PRESET_SIZES: Record<'card' | 'square', PixelSize> = {
  card: { widthPx: 1200, heightPx: 675 },
  square: { widthPx: 1080, heightPx: 1080 },
};
/** Print pages are 0.62 as tall as wide: a world map with its title and legend. */
const PRINT_ASPECT = 0.62;

/** --size, --preset, --width-mm and --dpi, as every picture command declares them. */
export function withSizeOptions(command: Command, defaultSize: string): Command {
  return command
    .option('--size <WxH>', `image size in pixels (default ${defaultSize})`)
    .option('--preset <name>', 'card (1200x675), square (1080x1080) or print (see --width-mm, --dpi)')
    .option('--width-mm <mm>', 'print width in millimetres (with --preset print)', '180')
    .option('--dpi <n>', 'pixels per inch to record in the file (default 300 for print, else 72)');
}

export function registerMap(program: Command, context: CommandContext): void {
  const command = program
    .command('map')
    .description('render one eclipse as a visibility map (PNG, SVG, WebP, JPEG or GeoJSON)')
    .argument('[when]', `${WHEN_EXPECTED} (default: next)`)
    .option('--projection <name>', `${PROJECTION_NAMES.join(', ')}`, 'equal-earth')
    .option('--bbox <W,S,E,N>', 'regional view of this box, degrees (implies --projection region)')
    .option('--centre <LAT,LON>', 'regional view around this point (with --span; implies --projection region)')
    .option('--span <degrees>', 'angular width of a --centre view', '60')
    .option('--tz <zone>', 'show times in this IANA time zone', 'UTC')
    .option('--borders <style>', `${BORDER_STYLES.join(' or ')}`, 'countries')
    .option('--title <text>', 'replace the generated title')
    .option('--theme <name>', `${THEME_NAMES.join(', ')}`, 'light');
  withSizeOptions(command, `${DEFAULT_SIZE.widthPx}x${DEFAULT_SIZE.heightPx}`);
  withEclipseOptions(command
    .option('-o, --output <file>', 'output file; its extension picks the format (default out/<id>-<kind>.png)')
    .option('--format <name>', `${MAP_FORMATS.join(', ')} (default: from --output, else png)`))
    .option('--mark <place>', 'mark a place with its local time of the key phase (repeatable)', (value: string, previous: string[]) => [...previous, value], [] as string[])
    .option('--style <file>', 'a house style (JSON or YAML, as for batch); options given here win')
    .action(async (whenText: string | undefined, options: MapOptions, self: Command) => {
      if (options.style !== undefined) {
        const fromStyle = optionsFromStyle(loadStyle(options.style)) as Record<string, unknown>;
        const given = options as unknown as Record<string, unknown>;
        for (const [key, value] of Object.entries(fromStyle)) {
          const source = self.getOptionValueSource(key);
          if (source === undefined || source === 'default') given[key] = value;
        }
      }
      // The path written, on stdout, so that scripts can pick it up.
      context.stdout(`${await runMap(whenText, options, context)}\n`);
    });
}

function parseView(options: MapOptions): View {
  const projection = parseChoice('--projection', options.projection, PROJECTION_NAMES);
  if (options.bbox !== undefined && options.centre !== undefined) throw new InputError('--bbox', 'either --bbox or --centre, not both', options.bbox);
  if (options.bbox !== undefined) return { projection: 'region', bbox: parseBoundingBox(options.bbox) };
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

const listOr = (items: string[]) => (items.length > 1 ? `${items.slice(0, -1).join(', ')} or ${items[items.length - 1]}` : items.join(''));

const EXTENSION_FORMATS: Record<string, MapFormat> = {
  '.png': 'png', '.svg': 'svg', '.webp': 'webp', '.jpg': 'jpg', '.jpeg': 'jpg', '.geojson': 'geojson', '.json': 'geojson',
};

/**
 * Where a picture goes: --output (its extension picks the format; its folder
 * must exist), else out/<defaultStem>.<format> in the working folder.
 */
export function parseOutput<F extends MapFormat>(options: { output?: string; format?: string }, defaultStem: string, formats: readonly F[]): { path: string; format: F } {
  const format = options.format === undefined ? undefined : parseChoice('--format', options.format, formats);
  if (options.output === undefined) {
    const chosen = format ?? formats[0]!;
    const folder = resolve('out');
    mkdirSync(folder, { recursive: true });
    return { path: resolve(folder, `${defaultStem}.${chosen}`), format: chosen };
  }
  const extension = extname(options.output).toLowerCase();
  const fromExtension = EXTENSION_FORMATS[extension] as F | undefined;
  if (!fromExtension || !formats.includes(fromExtension)) {
    throw new InputError('--output', `a file name ending in ${listOr(formats.map((f) => `.${f}`))}`, options.output);
  }
  if (format && format !== fromExtension) throw new InputError('--format', `${fromExtension} to match --output ${options.output}`, options.format);
  const path = resolve(options.output);
  checkOutputFolder('--output', path);
  return { path, format: fromExtension };
}

/** out/2026-03-03-total.png → out/2026-03-03-total.txt */
export function captionPathFor(path: string): string {
  return path.slice(0, path.length - extname(path).length) + '.txt';
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
  const title = options.title;
  if (title !== undefined && (title.trim() === '' || [...title].length > MAX_TITLE_CHARS)) throw new InputError('--title', `some text, at most ${MAX_TITLE_CHARS} characters`, title);
  if (options.mark.length > 20) throw new InputError('--mark', 'at most 20 places', `${options.mark.length} places`);
  const marks = options.mark.map((name) => choosePlace({ place: name })!.place);
  return { style: { theme, view, borders, clock, ...(title !== undefined ? { title } : {}) }, size, dpi, marks };
}

/** A house style as map options, for whatever the command line leaves unset. */
export function optionsFromStyle(style: HouseStyle): Partial<MapOptions> {
  return {
    theme: style.theme,
    projection: style.bbox || style.centre ? 'region' : style.projection,
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
    convention: style.convention,
    ...(style.deltaT !== undefined ? { deltaT: String(style.deltaT) } : {}),
  };
}

/** Parse everything first, so that bad input never leaves a file behind; then render and write atomically. */
export async function runMap(whenText: string | undefined, options: MapOptions, context: CommandContext): Promise<string> {
  const settings = mapSettings(options);
  const eclipse = chooseEclipse(whenText, options, context.now());
  const { path, format } = parseOutput(options, `${eclipse.id}-${eclipse.kind}`, MAP_FORMATS);
  const file = await renderMapFile({ eclipse, ...settings, format, generator: `umbracast ${toolVersion()}` });
  await writeFileAtomic(path, file.bytes);
  // Every picture gets its caption beside it.
  if (file.caption) await writeFileAtomic(captionPathFor(path), captionText(file.caption));
  return path;
}
