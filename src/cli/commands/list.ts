/** `umbracast list`: the catalogue for a range, lunar and solar eclipses in time order, as a table, json or csv. */
import type { Command } from 'commander';
import { findEclipses } from '../../eclipses/kinds.ts';
import { searchOptionsOf } from '../../settings/catalogues.ts';
import { catalogueDocument } from '../../outputs/catalogueRecord.ts';
import { CATALOGUE_FORMATS, catalogueCsv, catalogueJson, catalogueTable } from '../../outputs/catalogueFormats.ts';
import { parseChoice, parseRange } from '../options.ts';
import type { CommandContext } from '../context.ts';
import { withBodyOptions, withEclipseOptions, withLanguageOption } from '../declare.ts';
import { chooseLanguage } from '../../settings/language.ts';
import { flagOf } from '../flags.ts';
import { bodyFromFlags, eclipseChoiceFromFlags, kindsFromFlags, type BodyFlags, type EclipseFlags } from '../readFlags.ts';

interface ListOptions extends BodyFlags, EclipseFlags {
  from?: string;
  to?: string;
  format: string;
  lang?: string;
}

export function registerList(program: Command, context: CommandContext): void {
  const command = program
    .command('list')
    .description('list the lunar and solar eclipses in a date range (default: from today, ten years)')
    .option('--from <date>', 'start: YYYY, YYYY-MM or YYYY-MM-DD (default today, UTC)')
    .option('--to <date>', 'end: a bare year or month is included whole; a full date is exclusive (default: ten years on)');
  withLanguageOption(withEclipseOptions(withBodyOptions(command).option('--format <format>', `output: ${CATALOGUE_FORMATS.join(', ')}`, 'table')))
    .action((options: ListOptions) => {
      const language = chooseLanguage(options.lang, flagOf('lang'));
      const range = parseRange(options.from, options.to, context.now());
      const body = bodyFromFlags(options);
      const kinds = kindsFromFlags(options, body);
      const format = parseChoice('--format', options.format, CATALOGUE_FORMATS);
      const choice = eclipseChoiceFromFlags(options);
      const search = searchOptionsOf(choice, body);
      const eclipses = findEclipses({ ...search, ...range }).filter((e) => kinds === undefined || kinds.includes(e.kind));
      const doc = catalogueDocument(eclipses, { convention: choice.convention, deltaTModel: search.deltaT!.name, ...range });
      context.stdout(format === 'table' ? catalogueTable(doc, body, language.lunar, language.solar) : format === 'json' ? catalogueJson(doc) : catalogueCsv(doc));
    });
}
