/**
 * Output naming: a template of {placeholders} filled per eclipse, and the
 * file-name part of each place. Kept apart from the style schema so that
 * batch workers load no schema library.
 */
import { findPlace, placeSlug, type Place } from '../places/gazetteer.ts';
import type { Eclipse } from '../eclipses/kinds.ts';

/** Placeholders a naming template may use. */
export const NAMING_FIELDS = ['id', 'kind', 'year', 'saros'] as const;
export const DEFAULT_NAMING = '{id}-{kind}';

/** The longest value of each placeholder: an id is YYYY-MM-DD, "penumbral" the longest kind, a saros number at most 4 digits. */
const LONGEST: Record<(typeof NAMING_FIELDS)[number], number> = { id: 10, kind: 9, year: 4, saros: 4 };

/** Fill a naming template for one eclipse. */
export function fileStem(template: string, eclipse: Pick<Eclipse, 'id' | 'kind' | 'saros'>): string {
  const values: Record<(typeof NAMING_FIELDS)[number], string> = {
    id: eclipse.id,
    kind: eclipse.kind,
    year: eclipse.id.slice(0, 4),
    saros: String(eclipse.saros),
  };
  return template.replace(/\{(id|kind|year|saros)\}/g, (_, key: (typeof NAMING_FIELDS)[number]) => values[key]);
}

/** The most bytes a template's stem can take, over every eclipse (templates are ASCII). */
export function longestStemBytes(template: string): number {
  return template.replace(/\{(id|kind|year|saros)\}/g, (_, key: (typeof NAMING_FIELDS)[number]) => 'x'.repeat(LONGEST[key])).length;
}

/** Longest ending a diagram adds to a stem (or to a place's part of it): "-diagram.webp". */
export const DIAGRAM_SUFFIX_BYTES = '-diagram.webp'.length;
/** Longest ending a place adds to a stem: "-SLUG-sky.png" or "-SLUG.markdown"-like extensions (at most 4 letters); "-SLUG-diagram.webp" when the style asks for diagrams. */
export const placeSuffixBytes = (slug: string, diagram = false) => Math.max(`-${slug}-sky.png`.length, `-${slug}.json`.length, diagram ? `-${slug}`.length + DIAGRAM_SUFFIX_BYTES : 0);
/** Longest ending a map file adds to a stem. */
export const MAP_SUFFIX_BYTES = '.geojson'.length;

/**
 * The file-name part of each place of a style, unique within the style:
 * its name's slug ("springfield"), with its country ("springfield-us") if
 * another place has the same slug, and its region too
 * ("springfield-us-il") if that is not enough. Throws `{ first, second }`
 * (indexes) when two entries name the same place.
 */
export function placeSlugs(places: readonly Place[]): string[] {
  const code = (text: string) => text.toLowerCase().replace(/[^a-z0-9]/g, '');
  const joined = (...parts: string[]) => parts.filter((t) => t !== '').join('-');
  const levels = places.map((p) => [placeSlug(p.name), joined(placeSlug(p.name), code(p.country)), joined(placeSlug(p.name), code(p.country), code(p.admin))]);
  const chosen = levels.map((l) => l[0]!);
  for (let level = 1; level < 3; level++) {
    const counts = new Map<string, number>();
    for (const slug of chosen) counts.set(slug, (counts.get(slug) ?? 0) + 1);
    chosen.forEach((slug, i) => {
      if (counts.get(slug)! > 1) chosen[i] = levels[i]![level]!;
    });
  }
  const seen = new Map<string, number>();
  chosen.forEach((slug, i) => {
    const first = seen.get(slug);
    if (first !== undefined) throw new SamePlace(first, i);
    seen.set(slug, i);
  });
  return chosen;
}

/** Two entries of a style's places that come to the same file names. */
export class SamePlace extends Error {
  constructor(readonly first: number, readonly second: number) {
    super(`places[${second}] has the same file names as places[${first}]`);
  }
}

/** The places of a style, found in the gazetteer, with their unique file-name parts. */
export function stylePlaces(names: readonly string[]): { place: Place; slug: string }[] {
  const places = names.map((name) => findPlace(name, 'places'));
  const slugs = placeSlugs(places);
  return places.map((place, i) => ({ place, slug: slugs[i]! }));
}
