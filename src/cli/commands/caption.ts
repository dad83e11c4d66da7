/** `umbracast caption [WHEN]`: a publication caption and alt text, written from the geometry, for a lunar or a solar eclipse. */
import type { Command } from 'commander';
import { civilClock } from '../../ephemeris/civilTime.ts';
import { chooseEclipse, choosePlace } from '../../settings/choose.ts';
import { flagOf } from '../flags.ts';
import type { CommandContext } from '../context.ts';
import { withBodyOptions, withEclipseOptions, withLanguageOption } from '../declare.ts';
import { chooseLanguage } from '../../settings/language.ts';
import { parseWhen, WHEN_EXPECTED } from '../options.ts';
import { bodyFromFlags, eclipseChoiceFromFlags, type BodyFlags, type EclipseFlags } from '../readFlags.ts';
import { placeChoiceFromFlags, type PlaceFlags } from '../readMapFlags.ts';

interface CaptionOptions extends PlaceFlags, EclipseFlags, BodyFlags {
  /** The caption's zone (default UTC), which also serves the place's own summary. */
  tz: string;
  lang?: string;
}

export function registerCaption(program: Command, context: CommandContext): void {
  const command = program
    .command('caption')
    .description('a caption and alt text for one eclipse, naming the continents and countries that see it')
    .argument('[when]', `${WHEN_EXPECTED} (default: next)`)
    .option('--tz <zone>', 'give times in this IANA time zone', 'UTC')
    .option('--place <name>', 'add what readers in this place will see')
    .option('--at <LAT,LON>', 'add what is seen from this point');
  withLanguageOption(withEclipseOptions(withBodyOptions(command, false)))
    .action(async (whenText: string | undefined, options: CaptionOptions) => {
      const language = chooseLanguage(options.lang, flagOf('lang'));
      const clock = civilClock(options.tz.trim(), 'zone', language.common.clock);
      // The place's own summary uses the caption's zone, so that one text reads in one time.
      const chosen = choosePlace(placeChoiceFromFlags(options), false, 'place', flagOf('place'));
      // An id resolves to its own eclipse; a date near both a lunar and a solar eclipse names both unless --body is given.
      const eclipse = chooseEclipse(parseWhen(whenText), eclipseChoiceFromFlags(options), context.now(), bodyFromFlags(options));
      if (chosen?.notice) context.stderr(`${chosen.notice}\n`);
      if (eclipse.body === 'solar') {
        const [{ solarCaption, solarCaptionText }, { solarLocalReport }] = await Promise.all([import('../../outputs/solarCaption.ts'), import('../../outputs/solarLocal.ts')]);
        const extra = chosen ? solarLocalReport(eclipse, chosen, language.solar).summary : undefined;
        context.stdout(solarCaptionText(solarCaption(eclipse, { clock, solar: language.solar, ...(extra ? { extra } : {}) }), language.solar.text));
        return;
      }
      // The geometry (world data, the visibility model) loads when a caption is written.
      const [{ eclipseCaption, captionText }, { visibilityOf }, { localReport }] = await Promise.all([
        import('../../outputs/caption.ts'),
        import('../../visibility/lunar/visibility.ts'),
        import('../../outputs/localFormats.ts'),
      ]);
      const extra = chosen ? localReport(eclipse, chosen, language.lunar).summary : undefined;
      context.stdout(captionText(eclipseCaption(eclipse, visibilityOf(eclipse), clock, extra, language.lunar), language.lunar));
    });
}
