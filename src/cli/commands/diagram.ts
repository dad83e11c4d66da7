/**
 * `umbracast diagram [WHEN]`: for a lunar eclipse, the Moon's path through the Earth's shadow with the
 * contact times; for a solar one, the Sun and the Moon as a place (default: the greatest point) sees them
 * at maximum. The eclipse is either kind, or the one `--body` names.
 */
import type { Command } from 'commander';
import { THEME_NAMES, THEMES } from '../../figures/theme.ts';
import { writeFileAtomic } from '../../outputs/files.ts';
import { SKY_FORMATS } from '../../outputs/formatNames.ts';
import { chooseEclipseOfBody, choosePlace } from '../../settings/choose.ts';
import { solarGreatestPointName } from '../../words/solar/diagram.ts';
import { checkTitle, DIAGRAM_SIZE, pageSize } from '../../settings/mapSettings.ts';
import { flagOf } from '../flags.ts';
import { withEclipseOptions, withLanguageOption, withPlaceOptions } from '../declare.ts';
import { chooseLanguage } from '../../settings/language.ts';
import { eclipseChoiceFromFlags, type EclipseFlags } from '../readFlags.ts';
import { pageChoiceFromFlags, placeChoiceFromFlags, type PlaceFlags, type SizeFlags } from '../readMapFlags.ts';
import { civilClock } from '../../ephemeris/civilTime.ts';
import type { CommandContext } from '../context.ts';
import { parseChoice, parseWhen, WHEN_EXPECTED } from '../options.ts';
import { toolVersion } from '../version.ts';
import { captionPathFor, parseOutput, withSizeOptions } from './map.ts';

interface DiagramOptions extends SizeFlags, PlaceFlags, EclipseFlags {
  body?: string;
  theme: string;
  title?: string;
  output?: string;
  format?: string;
  lang?: string;
}

const DEFAULT_SIZE = DIAGRAM_SIZE;
const DIAGRAM_BODIES = ['lunar', 'solar'] as const;

export function registerDiagram(program: Command, context: CommandContext): void {
  const command = program
    .command('diagram')
    .description('a lunar eclipse: the Moon\'s path through the Earth\'s shadow, the Moon at each contact and at greatest, with times; a solar eclipse: the Sun and the Moon as a place sees them at maximum (PNG, SVG, WebP or JPEG)')
    .argument('[when]', `${WHEN_EXPECTED} (default: next)`);
  withPlaceOptions(command)
    .option('--body <kind>', `${DIAGRAM_BODIES.join(' or ')} (default: whichever eclipse WHEN finds)`)
    .option('--theme <name>', THEME_NAMES.join(', '), 'light')
    .option('--title <text>', 'replace the generated title');
  withSizeOptions(command, `${DEFAULT_SIZE.widthPx}x${DEFAULT_SIZE.heightPx}`);
  withLanguageOption(withEclipseOptions(command
    .option('-o, --output <file>', 'output file; .png, .svg, .webp or .jpg (default out/<id>-<kind>-diagram.png); its caption is written beside it (.txt)')
    .option('--format <name>', SKY_FORMATS.join(', '))))
    .action(async (whenText: string | undefined, options: DiagramOptions) => {
      const theme = THEMES[parseChoice('--theme', options.theme, THEME_NAMES)];
      const { size, dpi } = pageSize(pageChoiceFromFlags(options), DEFAULT_SIZE);
      checkTitle(options.title);
      const body = options.body === undefined ? 'all' : parseChoice('--body', options.body, DIAGRAM_BODIES);
      const eclipse = chooseEclipseOfBody(parseWhen(whenText), eclipseChoiceFromFlags(options), context.now(), body);
      const language = chooseLanguage(options.lang, flagOf('lang'));
      const clockWords = language.common.clock;
      const placeChoice = placeChoiceFromFlags(options);
      const generator = `umbracast ${toolVersion()}`;
      const titleOption = options.title !== undefined ? { title: options.title } : {};
      let file: { bytes: Uint8Array; caption: string };
      let path: string;
      if (eclipse.body === 'solar') {
        // The place the Sun and the Moon are seen from: the one given, else the greatest point, in its own zone's time.
        const [lonDeg, latDeg] = eclipse.greatestPoint;
        const given = placeChoice.place !== undefined || placeChoice.at !== undefined;
        const chosen = choosePlace(given ? placeChoice : { ...placeChoice, at: [lonDeg, latDeg] }, true, 'place', flagOf('place'));
        const output = parseOutput(options, `${eclipse.id}-${eclipse.kind}-solar-diagram`, SKY_FORMATS);
        path = output.path;
        if (chosen.notice) context.stderr(`${chosen.notice}\n`);
        const { renderSolarDiagramFile } = await import('../../outputs/solarDiagramFile.ts');
        const placeName = given ? chosen.place.name : solarGreatestPointName(chosen.place.name, language.solar);
        file = await renderSolarDiagramFile({
          eclipse,
          place: { name: placeName, latDeg: chosen.place.latDeg, lonDeg: chosen.place.lonDeg, parameter: placeChoice.at !== undefined ? 'at' : 'place' },
          clock: civilClock(chosen.clock.zone, 'zone', clockWords), theme, size, dpi, format: output.format, generator, ...titleOption, solar: language.solar,
        });
      } else {
        // Times in UTC unless a zone is given, or a place whose zone is taken.
        const chosen = choosePlace(placeChoice, false, 'place', flagOf('place'));
        const clock = civilClock(chosen?.clock.zone ?? (options.tz === undefined ? 'UTC' : options.tz.trim()), 'zone', clockWords);
        const output = parseOutput(options, `${eclipse.id}-${eclipse.kind}-diagram`, SKY_FORMATS);
        path = output.path;
        if (chosen?.notice) context.stderr(`${chosen.notice}\n`);
        // The drawing code loads when a figure is drawn, not with the command line.
        const { renderDiagramFile } = await import('../../outputs/diagramFile.ts');
        file = await renderDiagramFile({ eclipse, clock, theme, size, dpi, format: output.format, generator, ...titleOption, lunar: language.lunar });
      }
      await writeFileAtomic(path, file.bytes);
      // Every picture gets its caption beside it.
      await writeFileAtomic(captionPathFor(path), file.caption);
      context.stdout(`${path}\n`);
    });
}
