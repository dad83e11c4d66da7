/** `umbracast sky [WHEN] --place NAME`: the view from one place — the Moon's path through the night, the phases, the twilight. */
import type { Command } from 'commander';
import { placeSlug } from '../../places/gazetteer.ts';
import { THEME_NAMES, THEMES } from '../../figures/theme.ts';
import { writeFileAtomic } from '../../outputs/files.ts';
import { SKY_FORMATS } from '../../outputs/formatNames.ts';
import { chooseEclipse, choosePlace } from '../../settings/choose.ts';
import { flagOf } from '../flags.ts';
import type { CommandContext } from '../context.ts';
import { withEclipseOptions, withLanguageOption, withPlaceOptions } from '../declare.ts';
import { chooseLanguage } from '../../settings/language.ts';
import { parseChoice, parseWhen, WHEN_EXPECTED } from '../options.ts';
import { eclipseChoiceFromFlags, type EclipseFlags } from '../readFlags.ts';
import { pageChoiceFromFlags, placeChoiceFromFlags, type PlaceFlags, type SizeFlags } from '../readMapFlags.ts';
import { toolVersion } from '../version.ts';
import { captionPathFor, parseOutput, withSizeOptions } from './map.ts';
import { checkTitle, pageSize } from '../../settings/mapSettings.ts';

interface SkyOptions extends SizeFlags, PlaceFlags, EclipseFlags {
  theme: string;
  title?: string;
  output?: string;
  format?: string;
  lang?: string;
}

export function registerSky(program: Command, context: CommandContext): void {
  const command = program
    .command('sky')
    .description('the view from one place: the Moon\'s altitude through the night, the eclipse phases, twilight')
    .argument('[when]', `${WHEN_EXPECTED} (default: next)`);
  withPlaceOptions(command)
    .option('--theme <name>', THEME_NAMES.join(', '), 'light')
    .option('--title <text>', 'replace the generated title');
  withSizeOptions(command, '1600x900');
  withLanguageOption(withEclipseOptions(command
    .option('-o, --output <file>', 'output file; .png, .svg, .webp or .jpg (default out/<id>-<kind>-sky-<place>.png)')
    .option('--format <name>', SKY_FORMATS.join(', '))))
    .action(async (whenText: string | undefined, options: SkyOptions) => {
      const theme = THEMES[parseChoice('--theme', options.theme, THEME_NAMES)];
      const { size, dpi } = pageSize(pageChoiceFromFlags(options), { widthPx: 1600, heightPx: 900 });
      checkTitle(options.title);
      const language = chooseLanguage(options.lang, flagOf('lang'));
      const chosen = choosePlace(placeChoiceFromFlags(options), true, 'place', flagOf('place'));
      const eclipse = chooseEclipse(parseWhen(whenText), eclipseChoiceFromFlags(options), context.now());
      const slug = placeSlug(chosen.place.name);
      const { path, format } = parseOutput(options, `${eclipse.id}-${eclipse.kind}-sky-${slug}`, SKY_FORMATS);
      if (chosen.notice) context.stderr(`${chosen.notice}\n`);
      // The drawing code loads when a figure is drawn, not with the command line.
      const [{ renderSkyFile }, { localReport }] = await Promise.all([import('../../outputs/skyFile.ts'), import('../../outputs/localFormats.ts')]);
      const file = await renderSkyFile({
        report: localReport(eclipse, chosen, language.lunar),
        theme,
        size,
        dpi,
        format,
        generator: `umbracast ${toolVersion()}`,
        ...(options.title !== undefined ? { title: options.title } : {}),
      });
      await writeFileAtomic(path, file.bytes);
      // Every picture gets its caption beside it.
      await writeFileAtomic(captionPathFor(path), file.caption);
      context.stdout(`${path}\n`);
    });
}
