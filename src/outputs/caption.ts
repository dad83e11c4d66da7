/**
 * Captions and alt text, written from the geometry: which continents and
 * larger countries see all of the eclipse, only its start (the Moon sets
 * while it is on), only its end (the Moon rises while it is on).
 */
import { printedFigures } from '../eclipses/lunar/figures.ts';
import type { LunarEclipse } from '../eclipses/lunar/types.ts';
import type { CivilClock } from '../ephemeris/civilTime.ts';
import { loadBasemap } from '../sphere/world.ts';
import { continentShares, countryShares, type ContinentShare, type CountryShare } from '../visibility/lunar/countries.ts';
import type { Visibility, ZoneName } from '../visibility/lunar/visibility.ts';
import { countryName, decimalIn, formatDuration, listWords, type ContinentName } from '../words/common.ts';
import { LUNAR_ENGLISH, type ContinentShareWord, type LunarWords } from '../words/lunar/text.ts';

export interface Caption {
  readonly caption: string;
  readonly altText: string;
  readonly countries: readonly CountryShare[];
  /** The countries named, by the zone they are named under. */
  readonly named: ReadonlyMap<ZoneName, readonly CountryShare[]>;
}

/** Countries listed per zone at most. */
const COUNTRIES_PER_ZONE = 6;
/**
 * A country is named under a zone only when that zone holds more than this
 * share of its area: a clear majority, so that the area sampling (about 400
 * points per country at least) cannot tip a country split nearly in half.
 */
export const NAMED_SHARE = 0.55;
/** A continent is named without "most of" or "parts of" only when this share of it is in the zone (and none of its countries is named elsewhere). */
export const WHOLE_CONTINENT_SHARE = 0.99;

/** Few readers live there: Antarctica is left out of captions. */
const UNPEOPLED = 'Antarctica';

/** The countries a caption names, by zone: those with a clear majority of their area there, largest first. */
export function namedCountries(countries: readonly CountryShare[]): Map<ZoneName, CountryShare[]> {
  const named = new Map<ZoneName, CountryShare[]>();
  for (const zone of ['sees-all', 'sets-during', 'rises-during'] as const) {
    named.set(zone, countries
      .filter((c) => c.code && c.continent && c.continent !== UNPEOPLED && c.shares[zone] > NAMED_SHARE)
      .sort((a, b) => b.area - a.area || a.name.localeCompare(b.name))
      .slice(0, COUNTRIES_PER_ZONE));
  }
  return named;
}

/**
 * Continents in a zone, qualified by the share there: plain when all of it
 * is (and no country of it is named under another zone), "most of" above
 * half, "parts of" from 15 % — or below that, when one of its countries is
 * named in the zone, so that no country is listed under a continent not its own.
 */
function continentsIn(continents: readonly ContinentShare[], zone: ZoneName, namedElsewhere: ReadonlySet<string>, namedHere: ReadonlySet<string> = new Set()): { name: string; share: ContinentShareWord }[] {
  return continents
    .filter((c) => c.name !== UNPEOPLED && (c.shares[zone] >= 0.15 || (c.shares[zone] > 0 && namedHere.has(c.name))))
    .sort((a, b) => b.shares[zone] - a.shares[zone] || a.name.localeCompare(b.name))
    .map((c) => ({ name: c.name, share: c.shares[zone] >= WHOLE_CONTINENT_SHARE && !namedElsewhere.has(c.name) ? 'whole' : c.shares[zone] > 0.5 ? 'most' : 'parts' }));
}

/** `words`: the reader's language (default English); `clock` should print the same language (words.common.clock). */
export function eclipseCaption(eclipse: LunarEclipse, visibility: Visibility, clock: CivilClock, extra?: string, words: LunarWords = LUNAR_ENGLISH): Caption {
  const w = words.caption;
  const duration = (minutes: number) => formatDuration(minutes * 60, 'long', words.common);
  const list = (items: readonly string[]) => listWords(items, words.common);
  const countries = countryShares(visibility, loadBasemap('110m').countries().features);
  const continents = continentShares(countries);
  const at = eclipse.greatest.utDays;
  const c = eclipse.contacts;
  // Each time in the zone in force at its own instant (a clock change inside the eclipse reads true).
  const range = (a: number, b: number) => clock.range(a, b, at);
  // Figures rounded once, from the full value, as on the map and in the list.
  const figures = printedFigures(eclipse);
  const facts = [
    w.title(words.kindTitle[eclipse.kind], clock.date(at)),
    eclipse.kind === 'penumbral'
      ? w.penumbralFacts(clock.stamp(at), decimalIn(figures.penumbralMagnitude, words.common), duration(figures.minutes.penumbral), range(c.P1!.utDays, c.P4!.utDays))
      : w.umbralFacts(
        clock.stamp(at),
        decimalIn(figures.umbralMagnitude, words.common),
        eclipse.kind === 'total' ? { duration: duration(figures.minutes.total!), span: range(c.U2!.utDays, c.U3!.utDays) } : undefined,
        duration(figures.minutes.partial!),
        range(c.U1!.utDays, c.U4!.utDays),
      ),
  ];
  const say = (items: readonly { name: string; share: ContinentShareWord }[]) => items.map((c) => w.continent((words.common.continents as Readonly<Record<string, string>>)[c.name as ContinentName] ?? c.name, c.share));
  const named = namedCountries(countries);
  /** Continents with a country named under some other zone than `zone`. */
  const namedOutside = (zone: ZoneName) => new Set([...named].filter(([z]) => z !== zone).flatMap(([, list]) => list.map((c) => c.continent!)));
  const sentences: string[] = [];
  const altParts: string[] = [];
  for (const z of ['sees-all', 'sets-during', 'rises-during'] as const) {
    const where = say(continentsIn(continents, z, namedOutside(z), new Set(named.get(z)!.map((c) => c.continent!))));
    const names = named.get(z)!.map((country) => countryName(country, words.common));
    if (where.length === 0 && names.length === 0) continue;
    const places = where.length > 0 ? list(where) : w.somewhere;
    sentences.push(`${w.zone[z]} ${places}${names.length > 0 ? w.including(list(names)) : ''}.`);
    altParts.push(`${w.zoneInAltText[z]} ${where.length > 0 ? list(where) : list(names.slice(0, 3))}`);
  }
  const hidden = say(continentsIn(continents, 'sees-none', namedOutside('sees-none')).filter((h) => h.share !== 'parts'));
  if (hidden.length > 0) sentences.push(w.hidden(list(hidden)));
  const caption = [...facts, ...sentences, ...(extra ? [extra] : []), words.common.predictions].join(' ');
  const altText = w.altText(words.kind[eclipse.kind], clock.date(at), altParts.join('; '), hidden.length > 0 ? list(hidden) : undefined);
  return { caption, altText, countries, named };
}

/** The caption file published beside a picture. */
export function captionText(caption: Caption, words: LunarWords = LUNAR_ENGLISH): string {
  return words.caption.file(caption.caption, caption.altText);
}
