/** `umbracast caption [WHEN]`: a publication caption and alt text, written from the geometry, for a lunar or a solar eclipse. */
import type { Command } from 'commander';
import { InputError } from '../../errors.ts';
import { BODY_CHOICES, eclipseNear, nextEclipse, type BodyChoice, type Eclipse } from '../../eclipses/kinds.ts';
import { civilClock } from '../../ephemeris/civilTime.ts';
import { chooseEclipse, choosePlace, deltaTModelOf, type EclipseChoice } from '../../settings/choose.ts';
import type { When } from '../../settings/read.ts';
import { flagOf } from '../flags.ts';
import type { CommandContext } from '../context.ts';
import { withEclipseOptions } from '../declare.ts';
import { parseWhen, WHEN_EXPECTED } from '../options.ts';
import { eclipseChoiceFromFlags, placeChoiceFromFlags, type EclipseFlags, type PlaceFlags } from '../readFlags.ts';

interface CaptionOptions extends PlaceFlags, EclipseFlags {
  /** The caption's zone (default UTC), which also serves the place's own summary. */
  tz: string;
  /** lunar, solar or all (the default). */
  body?: string;
}

/** The body asked for: lunar, solar or all (absent: all). */
function bodyOf(text: string | undefined): BodyChoice {
  if (text === undefined) return 'all';
  const body = text.trim().toLowerCase();
  if (!(BODY_CHOICES as readonly string[]).includes(body)) throw new InputError('body', BODY_CHOICES.join(', '), text);
  return body as BodyChoice;
}

/**
 * The eclipse meant: of one body as the other commands choose it, or of
 * either — an id resolves to its own eclipse, a date near both a lunar and a
 * solar eclipse is an error naming both.
 */
function eclipseMeant(when: When, body: BodyChoice, choice: EclipseChoice, now: Date): Eclipse {
  if (body !== 'all') return chooseEclipse(when, choice, now, body);
  const options = { deltaT: deltaTModelOf(choice), convention: choice.convention };
  const found = when.kind === 'next' ? nextEclipse(now, options) : eclipseNear(when.date, 7.5, options);
  if (!found) throw new InputError('when', WHEN_EXPECTED, when.kind === 'next' ? 'next (none within a year)' : when.text);
  return found;
}

export function registerCaption(program: Command, context: CommandContext): void {
  const command = program
    .command('caption')
    .description('a caption and alt text for one eclipse, naming the continents and countries that see it')
    .argument('[when]', `${WHEN_EXPECTED} (default: next)`)
    .option('--tz <zone>', 'give times in this IANA time zone', 'UTC')
    .option('--place <name>', 'add what readers in this place will see')
    .option('--at <LAT,LON>', 'add what is seen from this point');
  withEclipseOptions(command);
  // --body is declared with the eclipse options once every command takes it; until then, here.
  if (!command.options.some((o) => o.long === '--body')) command.option('--body <body>', `which eclipses: ${BODY_CHOICES.join(', ')} (default all)`);
  command.action(async (whenText: string | undefined, options: CaptionOptions) => {
    const clock = civilClock(options.tz.trim(), 'zone');
    const body = bodyOf(options.body);
    // The place's own summary uses the caption's zone, so that one text reads in one time.
    const chosen = choosePlace(placeChoiceFromFlags(options), false, 'place', flagOf('place'));
    const eclipse = eclipseMeant(parseWhen(whenText), body, eclipseChoiceFromFlags(options), context.now());
    if (chosen?.notice) context.stderr(`${chosen.notice}\n`);
    if (eclipse.body === 'solar') {
      const [{ solarCaption, solarCaptionText }, { solarLocalReport }] = await Promise.all([import('../../outputs/solarCaption.ts'), import('../../outputs/solarLocal.ts')]);
      const extra = chosen ? solarLocalReport(eclipse, chosen).summary : undefined;
      context.stdout(solarCaptionText(solarCaption(eclipse, { clock, ...(extra ? { extra } : {}) })));
      return;
    }
    // The geometry (world data, the visibility model) loads when a caption is written.
    const [{ eclipseCaption, captionText }, { visibilityOf }, { localReport }] = await Promise.all([
      import('../../outputs/caption.ts'),
      import('../../visibility/lunar/visibility.ts'),
      import('../../outputs/localFormats.ts'),
    ]);
    const extra = chosen ? localReport(eclipse, chosen).summary : undefined;
    context.stdout(captionText(eclipseCaption(eclipse, visibilityOf(eclipse), clock, extra)));
  });
}
