/** `umbracast diagram [WHEN]`: the Moon's path through the Earth's shadow, with the contact times. */
import type { Command } from 'commander';
import { THEME_NAMES, THEMES } from '../../figures/theme.ts';
import { writeFileAtomic } from '../../outputs/files.ts';
import { SKY_FORMATS } from '../../outputs/formatNames.ts';
import { chooseEclipse, choosePlace } from '../../settings/choose.ts';
import { checkTitle, pageSize } from '../../settings/mapSettings.ts';
import { flagOf } from '../flags.ts';
import { withEclipseOptions, withPlaceOptions } from '../declare.ts';
import { eclipseChoiceFromFlags, pageChoiceFromFlags, placeChoiceFromFlags, type EclipseFlags, type PlaceFlags, type SizeFlags } from '../readFlags.ts';
import { civilClock } from '../../ephemeris/civilTime.ts';
import type { CommandContext } from '../context.ts';
import { parseChoice, parseWhen, WHEN_EXPECTED } from '../options.ts';
import { toolVersion } from '../version.ts';
import { captionPathFor, parseOutput, withSizeOptions } from './map.ts';

interface DiagramOptions extends SizeFlags, PlaceFlags, EclipseFlags {
  theme: string;
  title?: string;
  output?: string;
  format?: string;
}

const DEFAULT_SIZE = { widthPx: 1600, heightPx: 1000 };

export function registerDiagram(program: Command, context: CommandContext): void {
  const command = program
    .command('diagram')
    .description('the Moon\'s path through the Earth\'s shadow: the Moon at each contact and at greatest, with times (PNG, SVG, WebP or JPEG)')
    .argument('[when]', `${WHEN_EXPECTED} (default: next)`);
  withPlaceOptions(command)
    .option('--theme <name>', THEME_NAMES.join(', '), 'light')
    .option('--title <text>', 'replace the generated title');
  withSizeOptions(command, `${DEFAULT_SIZE.widthPx}x${DEFAULT_SIZE.heightPx}`);
  withEclipseOptions(command
    .option('-o, --output <file>', 'output file; .png, .svg, .webp or .jpg (default out/<id>-<kind>-diagram.png); its caption is written beside it (.txt)')
    .option('--format <name>', SKY_FORMATS.join(', ')))
    .action(async (whenText: string | undefined, options: DiagramOptions) => {
      const theme = THEMES[parseChoice('--theme', options.theme, THEME_NAMES)];
      const { size, dpi } = pageSize(pageChoiceFromFlags(options), DEFAULT_SIZE);
      checkTitle(options.title);
      // Times in UTC unless a zone is given, or a place whose zone is taken.
      const chosen = choosePlace(placeChoiceFromFlags(options), false, 'place', flagOf('place'));
      const clock = chosen?.clock ?? civilClock(options.tz === undefined ? 'UTC' : options.tz.trim());
      const eclipse = chooseEclipse(parseWhen(whenText), eclipseChoiceFromFlags(options), context.now());
      const { path, format } = parseOutput(options, `${eclipse.id}-${eclipse.kind}-diagram`, SKY_FORMATS);
      if (chosen?.notice) context.stderr(`${chosen.notice}\n`);
      // The drawing code loads when a figure is drawn, not with the command line.
      const { renderDiagramFile } = await import('../../outputs/diagramFile.ts');
      const file = await renderDiagramFile({
        eclipse,
        clock,
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
