/**
 * Options several commands declare alike. Declaring them loads nothing but
 * the lists of names, so that a command's module stays light until it runs.
 */
import type { Command } from 'commander';
import { SHADOW_CONVENTIONS } from '../eclipses/lunar/conventions.ts';
import { ECLIPSE_BODIES, type EclipseBody } from '../eclipses/common/record.ts';
import { LANGUAGE_TAGS } from '../settings/languageTags.ts';

export { DELTA_T_LIMITS } from '../settings/read.ts';

/** The kinds of eclipse each body has, as --kind names them. */
export { KINDS_OF_BODY } from '../eclipses/kindNames.ts';
import { KINDS_OF_BODY } from '../eclipses/kindNames.ts';

/** --convention and --delta-t, as every command that computes eclipses declares them. */
export function withEclipseOptions(command: Command): Command {
  return command
    .option('--convention <name>', `shadow enlargement: ${SHADOW_CONVENTIONS.join(' or ')}`, 'danjon')
    .option('--delta-t <seconds>', 'use this ΔT (TT − UT, seconds) instead of the built-in model');
}

/** --lang, as every command that writes words for readers declares it. */
export function withLanguageOption(command: Command): Command {
  return command.option('--lang <tag>', `the reader's language, a BCP 47 tag: ${LANGUAGE_TAGS.join(', ')} (default en)`);
}

/** --place, --at and --tz, as the one-place commands declare them. */
export function withPlaceOptions(command: Command): Command {
  return command
    .option('--place <name>', 'a place from the GeoNames gazetteer: "Adelaide", "Springfield, US-IL"')
    .option('--at <LAT,LON>', 'any point, degrees (east positive)')
    .option('--tz <zone>', 'IANA time zone (default: the zone at the place)');
}

/**
 * --body (lunar, solar or all; default all) and --kind (checked against the
 * body by `bodyFromFlags`/`kindsFromFlags` in readFlags.ts), as list, local,
 * map, caption and batch declare them. `withKind` false leaves --kind out
 * (the one-eclipse commands).
 */
export function withBodyOptions(command: Command, withKind = true): Command {
  command.option('--body <body>', `which eclipses: ${[...ECLIPSE_BODIES, 'all'].join(', ')}`, 'all');
  if (withKind) {
    command.option('--kind <kinds>', `only these kinds, comma-separated: lunar ${KINDS_OF_BODY.lunar.join(',')}; solar ${KINDS_OF_BODY.solar.join(',')}`);
  }
  return command;
}
