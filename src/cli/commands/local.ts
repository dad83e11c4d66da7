/** `umbracast local [WHEN] --place NAME | --at LAT,LON`: what one town sees, in its own time. */
import type { Command } from 'commander';
import type { Eclipse } from '../../eclipses/kinds.ts';
import { LOCAL_FORMATS, localCsv, localIcs, localJson, localMarkdown, localReport, localTable } from '../../outputs/localFormats.ts';
import { solarLocalCsv, solarLocalIcs, solarLocalJson, solarLocalMarkdown, solarLocalReport, solarLocalTable } from '../../outputs/solarLocal.ts';
import { flagOf } from '../flags.ts';
import type { CommandContext } from '../context.ts';
import { chooseEclipse, choosePlace, type ChosenPlace } from '../../settings/choose.ts';
import { withBodyOptions, withEclipseOptions, withLanguageOption, withPlaceOptions } from '../declare.ts';
import { chooseLanguage, type Language } from '../../settings/language.ts';
import { parseChoice, parseWhen, WHEN_EXPECTED } from '../options.ts';
import { bodyFromFlags, eclipseChoiceFromFlags, type BodyFlags, type EclipseFlags } from '../readFlags.ts';
import { placeChoiceFromFlags, type PlaceFlags } from '../readMapFlags.ts';
import { toolVersion } from '../version.ts';

interface LocalOptions extends PlaceFlags, EclipseFlags, BodyFlags {
  format: string;
  lang?: string;
}

export function registerLocal(program: Command, context: CommandContext): void {
  const command = program
    .command('local')
    .description('local circumstances for one place: contacts in local time, the Moon or the Sun in its sky, a summary (solar: with the eye-safety caution)')
    .argument('[when]', `${WHEN_EXPECTED} (default: next)`);
  withLanguageOption(withEclipseOptions(withBodyOptions(withPlaceOptions(command), false).option('--format <name>', LOCAL_FORMATS.join(', '), 'table')))
    .action((whenText: string | undefined, options: LocalOptions) => {
      const format = parseChoice('--format', options.format, LOCAL_FORMATS);
      const language = chooseLanguage(options.lang, flagOf('lang'));
      const chosen = choosePlace(placeChoiceFromFlags(options), true, 'place', flagOf('place'));
      const body = bodyFromFlags(options);
      const eclipse = chooseEclipse(parseWhen(whenText), eclipseChoiceFromFlags(options), context.now(), body);
      if (chosen.notice) context.stderr(`${chosen.notice}\n`);
      context.stdout(renderLocal(eclipse, chosen, format, language));
    });
}

/** One place's report in a format, for an eclipse of either body: each body's own renderers, never the other's words. */
function renderLocal(eclipse: Eclipse, chosen: ChosenPlace, format: (typeof LOCAL_FORMATS)[number], language: Language): string {
  if (eclipse.body === 'solar') {
    const solar = solarLocalReport(eclipse, chosen, language.solar);
    switch (format) {
      case 'table': return solarLocalTable(solar);
      case 'markdown': return solarLocalMarkdown(solar);
      case 'csv': return solarLocalCsv(solar);
      case 'json': return solarLocalJson(solar);
      case 'ics': return solarLocalIcs(solar, `umbracast ${toolVersion()}`);
    }
  }
  const report = localReport(eclipse, chosen, language.lunar);
  switch (format) {
    case 'table': return localTable(report);
    case 'markdown': return localMarkdown(report);
    case 'csv': return localCsv(report);
    case 'json': return localJson(report);
    case 'ics': return localIcs(report, `umbracast ${toolVersion()}`);
  }
}
