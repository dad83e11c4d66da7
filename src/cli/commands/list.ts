/** `umbracast list`: the catalogue for a range, as a table, json or csv. */
import type { Command } from 'commander';
import { SHADOW_CONVENTIONS } from '../../eclipses/lunar/conventions.ts';
import { ECLIPSE_KINDS } from '../../eclipses/lunar/types.ts';
import { deltaTModelOf, findEclipses, OUTPUT_BODY } from '../../settings/catalogues.ts';
import { catalogueDocument } from '../../outputs/catalogueRecord.ts';
import { CATALOGUE_FORMATS, catalogueCsv, catalogueJson, catalogueTable } from '../../outputs/catalogueFormats.ts';
import { parseChoice, parseChoiceList, parseNumber, parseRange } from '../options.ts';
import type { CommandContext } from '../context.ts';
import { DELTA_T_LIMITS, withEclipseOptions, withLanguageOption } from '../declare.ts';
import { chooseLanguage } from '../../settings/language.ts';
import { flagOf } from '../flags.ts';

interface ListOptions {
  from?: string;
  to?: string;
  kind?: string;
  convention: string;
  deltaT?: string;
  format: string;
  lang?: string;
}


export function registerList(program: Command, context: CommandContext): void {
  const command = program
    .command('list')
    .description('list the lunar eclipses in a date range (default: from today, ten years)')
    .option('--from <date>', 'start: YYYY, YYYY-MM or YYYY-MM-DD (default today, UTC)')
    .option('--to <date>', 'end: a bare year or month is included whole; a full date is exclusive (default: ten years on)')
    .option('--kind <kinds>', `only these kinds, comma-separated: ${ECLIPSE_KINDS.join(',')}`)
    .option('--format <format>', `output: ${CATALOGUE_FORMATS.join(', ')}`, 'table');
  withLanguageOption(withEclipseOptions(command))
    .action((options: ListOptions) => {
      const language = chooseLanguage(options.lang, flagOf('lang'));
      const range = parseRange(options.from, options.to, context.now());
      const kinds = options.kind === undefined ? ECLIPSE_KINDS : parseChoiceList('--kind', options.kind, ECLIPSE_KINDS);
      const convention = parseChoice('--convention', options.convention, SHADOW_CONVENTIONS);
      const format = parseChoice('--format', options.format, CATALOGUE_FORMATS);
      const choice = { convention, ...(options.deltaT === undefined ? {} : { deltaTSeconds: parseNumber('--delta-t', options.deltaT, DELTA_T_LIMITS) }) };
      const deltaT = deltaTModelOf(choice);
      const eclipses = findEclipses(OUTPUT_BODY, range, choice).filter((e) => kinds.includes(e.kind));
      const doc = catalogueDocument(eclipses, { convention, deltaTModel: deltaT.name, ...range });
      // The table speaks the reader's language; json and csv are data, in the one schema.
      const render = { table: (d: typeof doc) => catalogueTable(d, language.lunar), json: catalogueJson, csv: catalogueCsv }[format];
      context.stdout(render(doc));
    });
}
