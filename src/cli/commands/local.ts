/** `umbracast local [WHEN] --place NAME | --at LAT,LON`: what one town sees, in its own time. */
import type { Command } from 'commander';
import { SHADOW_CONVENTIONS } from '../../eclipse/conventions.ts';
import { localCircumstances, localSummary } from '../../visibility/local.ts';
import { LOCAL_FORMATS, localCsv, localIcs, localJson, localMarkdown, localTable, type LocalReport } from '../../outputs/localFormats.ts';
import type { CommandContext } from '../context.ts';
import { chooseEclipse, choosePlace } from '../choose.ts';
import { parseChoice, WHEN_EXPECTED } from '../options.ts';
import { toolVersion } from '../version.ts';

interface LocalOptions {
  place?: string;
  at?: string;
  tz?: string;
  format: string;
  convention: string;
  deltaT?: string;
}

export function registerLocal(program: Command, context: CommandContext): void {
  program
    .command('local')
    .description('local circumstances for one place: contacts in local time, Moon altitude and azimuth, the sky, a summary')
    .argument('[when]', `${WHEN_EXPECTED} (default: next)`)
    .option('--place <name>', 'a place from the GeoNames gazetteer: "Lisbon", "Springfield, US-IL"')
    .option('--at <LAT,LON>', 'any point, degrees (east positive)')
    .option('--tz <zone>', 'IANA time zone (default: the zone at the place)')
    .option('--format <name>', LOCAL_FORMATS.join(', '), 'table')
    .option('--convention <name>', `shadow enlargement: ${SHADOW_CONVENTIONS.join(' or ')}`, 'danjon')
    .option('--delta-t <seconds>', 'use this ΔT (TT − UT, seconds) instead of the built-in model')
    .action((whenText: string | undefined, options: LocalOptions) => {
      const format = parseChoice('--format', options.format, LOCAL_FORMATS);
      const chosen = choosePlace(options)!;
      const eclipse = chooseEclipse(whenText, options, context.now());
      context.stdout(renderLocal(eclipse, chosen, format));
    });
}

export function localReport(eclipse: Parameters<typeof localCircumstances>[0], chosen: NonNullable<ReturnType<typeof choosePlace>>): LocalReport {
  const { place, clock } = chosen;
  const local = localCircumstances(eclipse, { latDeg: place.latDeg, lonDeg: place.lonDeg });
  return { local, place, clock, summary: localSummary(local, clock, place.name) };
}

function renderLocal(eclipse: Parameters<typeof localCircumstances>[0], chosen: NonNullable<ReturnType<typeof choosePlace>>, format: (typeof LOCAL_FORMATS)[number]): string {
  const report = localReport(eclipse, chosen);
  switch (format) {
    case 'table': return localTable(report);
    case 'markdown': return localMarkdown(report);
    case 'csv': return localCsv(report);
    case 'json': return localJson(report);
    case 'ics': return localIcs(report, `umbracast ${toolVersion()}`);
  }
}
