/** `umbracast map [WHEN]`: one eclipse as a publication-ready visibility map. */
import { mkdirSync } from 'node:fs';
import { extname, resolve } from 'node:path';
import type { Command } from 'commander';
import { InputError } from '../../errors.ts';
import { BORDER_STYLES } from '../../sphere/world.ts';
import { PROJECTION_NAMES, type View } from '../../figures/projection.ts';
import { THEME_NAMES } from '../../figures/theme.ts';
import { MARK_CLOCKS } from '../../figures/markClock.ts';
import { AREA_NAMES_CHOICES } from '../../figures/areaNames.ts';
import { MAP_INSETS } from '../../figures/insetNames.ts';
import { checkOutputFolder, writeFileAtomic } from '../../outputs/files.ts';
import { EXTENSION_FORMATS, MAP_FORMATS, type MapFormat } from '../../outputs/formatNames.ts';
import type { CommandContext } from '../context.ts';
import { toolVersion } from '../version.ts';
import { parseChoice, parseWhen, WHEN_EXPECTED } from '../options.ts';
import { withBodyOptions, withEclipseOptions, withLanguageOption } from '../declare.ts';
import { bodyFromFlags, eclipseChoiceFromFlags, type BodyFlags, type Underlay } from '../readFlags.ts';
import { mapChoicesFromFlags, type MapFlags } from '../readMapFlags.ts';
import { chooseEclipse, placeNotices, type EclipseChoice } from '../../settings/choose.ts';
import { DEFAULT_SIZE, mapSettings, type MapChoices } from '../../settings/mapSettings.ts';


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
    .option('--projection <name>', `${PROJECTION_NAMES.join(', ')} (a globe looks at where most people see the Moon rise or set during the eclipse, unless --centre)`, 'equal-earth')
    .option('--bbox <W,S,E,N>', 'regional view of exactly this box, degrees; the map takes the box\'s shape, with paper beside or above it (implies --projection region)')
    .option('--centre <LAT,LON>', 'regional view around this point (with --span; implies --projection region), or with --projection globe the point the globe looks at')
    .option('--span <degrees>', 'width of a --centre view, edge to edge through the centre; the height follows the picture\'s shape', '60')
    .option('--tz <zone>', 'show times in this IANA time zone', 'UTC')
    .option('--borders <style>', `${BORDER_STYLES.join(' or ')}`, 'countries')
    .option('--title <text>', 'replace the generated title')
    .option('--theme <name>', `${THEME_NAMES.join(', ')}`, 'light');
  withSizeOptions(command, `${DEFAULT_SIZE.widthPx}x${DEFAULT_SIZE.heightPx}`);
  withBodyOptions(command, false);
  withEclipseOptions(command
    .option('-o, --output <file>', 'output file; its extension picks the format (default out/<id>-<kind>.png for the world map, the view added for others: out/<id>-<kind>-globe.png, out/<id>-<kind>-region-20w30n45e72n.png)')
    .option('--format <name>', `${MAP_FORMATS.join(', ')} (default: from --output, else png)`))
    .option('--mark <place>', 'mark a place with its time of the key phase (repeatable)', (value: string, previous: string[]) => [...previous, value], [] as string[])
    .option('--area-names <when>', `${AREA_NAMES_CHOICES.join(', ')}: continent and ocean names (auto: on world views, off on cards and regional views)`, 'auto')
    .option('--inset <figure>', `${MAP_INSETS.join(' or ')}: a small figure inside the map, where it hides least land (diagram: the Moon's path through the shadow)`)
    .option('--mark-clock <clock>', `${MARK_CLOCKS.join(' or ')}: marked places' times on the map's clock (--tz), or each in its own zone`, 'map')
    .option('--style <file>', 'a house style (JSON or YAML, as for batch); options given here win');
  withLanguageOption(command)
    .action(async (whenText: string | undefined, options: MapFlags & BodyFlags, self: Command) => {
      let style: StyleUnderlay | undefined;
      if (options.style !== undefined) {
        const [{ loadStyle }, { mapChoicesOf, eclipseChoiceOf }] = await Promise.all([import('../../batch/style.ts'), import('../../batch/styleSettings.ts')]);
        const loaded = loadStyle(options.style);
        // Options typed here win; the style gives the rest.
        const typed = (key: string) => {
          const source = self.getOptionValueSource(key);
          return source !== undefined && source !== 'default';
        };
        style = { map: { base: mapChoicesOf(loaded), typed }, eclipse: { base: eclipseChoiceOf(loaded), typed } };
      }
      // The path written, on stdout, so that scripts can pick it up.
      context.stdout(`${await runMap(whenText, options, context, style)}\n`);
    });
}

const listOr = (items: string[]) => (items.length > 1 ? `${items.slice(0, -1).join(', ')} or ${items[items.length - 1]}` : items.join(''));

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
  const fromExtension = (Object.hasOwn(EXTENSION_FORMATS, extension) ? EXTENSION_FORMATS[extension] : undefined) as F | undefined;
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

/**
 * The default file name's view part, so that views of one eclipse do not overwrite each other:
 * "" for the default world map, "-globe", "-equirectangular", "-region-20w30n45e72n", "-region-33.9s151.2e-span70".
 */
export function viewStem(view: View): string {
  const deg = (value: number, positive: string, negative: string) => `${Number(Math.abs(value).toFixed(2))}${value < 0 ? negative : positive}`;
  if (view.projection === 'equal-earth') return '';
  if (view.projection === 'region') {
    if ('bbox' in view) {
      const [w, s, e, n] = view.bbox;
      return `-region-${deg(w, 'e', 'w')}${deg(s, 'n', 's')}${deg(e, 'e', 'w')}${deg(n, 'n', 's')}`;
    }
    return `-region-${deg(view.centre[1], 'n', 's')}${deg(view.centre[0], 'e', 'w')}-span${Number(view.spanDeg.toFixed(2))}`;
  }
  if (view.projection === 'globe' && view.centre) return `-globe-${deg(view.centre[1], 'n', 's')}${deg(view.centre[0], 'e', 'w')}`;
  return `-${view.projection}`;
}

/** A house style under the flags: the map's choices and the eclipse's. */
interface StyleUnderlay {
  readonly map: Underlay<MapChoices>;
  readonly eclipse: Underlay<EclipseChoice>;
}

/** Parse everything first, so that bad input never leaves a file behind; then render and write atomically. */
export async function runMap(whenText: string | undefined, options: MapFlags & BodyFlags, context: CommandContext, style?: StyleUnderlay): Promise<string> {
  const choices = mapChoicesFromFlags(options, style?.map);
  const settings = mapSettings(choices);
  const when = parseWhen(whenText);
  const eclipseChoice = eclipseChoiceFromFlags(options, style?.eclipse);
  // --body (default all): a date names the eclipse it falls on or near, of either kind (near both: an input error naming both).
  const eclipse = chooseEclipse(when, eclipseChoice, context.now(), bodyFromFlags(options));
  const solar = eclipse.body === 'solar';
  // A solar card shows the path by default: its file says so.
  const stem = `${eclipse.id}-${eclipse.kind}${solar && settings.style.fitPath ? '-path' : viewStem(settings.style.view)}`;
  const { path, format } = parseOutput(options, stem, MAP_FORMATS);
  for (const notice of placeNotices('--mark', choices.marks)) context.stderr(`${notice}\n`);
  // The drawing code (fonts, world data, sharp) loads when a map is drawn, not with the command line.
  const [{ renderMapFile }, { captionText }] = await Promise.all([import('../../outputs/mapFile.ts'), import('../../outputs/caption.ts')]);
  const generator = `umbracast ${toolVersion()}`;
  if (eclipse.body === 'solar') {
    const file = await renderMapFile({ eclipse, ...settings, format, generator });
    await writeFileAtomic(path, file.bytes);
    // Every picture gets its caption beside it, the long eye-safety caution in it.
    if (file.captionFile !== undefined) await writeFileAtomic(captionPathFor(path), file.captionFile);
    return path;
  }
  const file = await renderMapFile({ eclipse, ...settings, format, generator });
  await writeFileAtomic(path, file.bytes);
  // Every picture gets its caption beside it.
  if (file.caption) await writeFileAtomic(captionPathFor(path), captionText(file.caption, settings.words));
  return path;
}
