/** `umbracast local [WHEN] --place NAME | --at LAT,LON`: what one town sees, in its own time. */
import type { Command } from 'commander';
import type { LunarEclipse } from '../../eclipses/lunar/types.ts';
import { LOCAL_FORMATS, localCsv, localIcs, localJson, localMarkdown, localReport, localTable } from '../../outputs/localFormats.ts';
import { flagOf } from '../flags.ts';
import type { CommandContext } from '../context.ts';
import { chooseEclipse, choosePlace, type ChosenPlace } from '../../settings/choose.ts';
import { withEclipseOptions, withLanguageOption, withPlaceOptions } from '../declare.ts';
import { chooseLanguage, type Language } from '../../settings/language.ts';
import { parseChoice, parseWhen, WHEN_EXPECTED } from '../options.ts';
import { eclipseChoiceFromFlags, placeChoiceFromFlags, type EclipseFlags, type PlaceFlags } from '../readFlags.ts';
import { toolVersion } from '../version.ts';

interface LocalOptions extends PlaceFlags, EclipseFlags {
  format: string;
  lang?: string;
}

export function registerLocal(program: Command, context: CommandContext): void {
  const command = program
    .command('local')
    .description('local circumstances for one place: contacts in local time, Moon altitude and azimuth, the sky, a summary')
    .argument('[when]', `${WHEN_EXPECTED} (default: next)`);
  withLanguageOption(withEclipseOptions(withPlaceOptions(command).option('--format <name>', LOCAL_FORMATS.join(', '), 'table')))
    .action((whenText: string | undefined, options: LocalOptions) => {
      const format = parseChoice('--format', options.format, LOCAL_FORMATS);
      const language = chooseLanguage(options.lang, flagOf('lang'));
      const chosen = choosePlace(placeChoiceFromFlags(options), true, 'place', flagOf('place'));
      const eclipse = chooseEclipse(parseWhen(whenText), eclipseChoiceFromFlags(options), context.now());
      if (chosen.notice) context.stderr(`${chosen.notice}\n`);
      context.stdout(renderLocal(eclipse, chosen, format, language));
    });
}

function renderLocal(eclipse: LunarEclipse, chosen: ChosenPlace, format: (typeof LOCAL_FORMATS)[number], language: Language): string {
  const report = localReport(eclipse, chosen, language.lunar);
  switch (format) {
    case 'table': return localTable(report);
    case 'markdown': return localMarkdown(report);
    case 'csv': return localCsv(report);
    case 'json': return localJson(report);
    case 'ics': return localIcs(report, `umbracast ${toolVersion()}`);
  }
}
