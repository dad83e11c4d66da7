/**
 * Place names as readers write them. Two outside sources: GeoNames' own data
 * (the cities500 table, read here line by line with a plain fold of our own,
 * independent of the library's byte index) says which places bear a name and
 * how many people each has; "common practice" says which place a reader
 * means (a newspaper's "Cologne" is the German city).
 */
import assert from 'node:assert/strict';
import { readFileSync } from 'node:fs';
import { test } from 'node:test';
import { InputError } from '../../src/errors.ts';
import { citiesFile } from '../../src/places/geonames.ts';
import { CLEAR_LEAD, findPlace, isCodeNotName, resolvePlace, suggestPlaces } from '../../src/places/gazetteer.ts';
import { keyVariants, nameKey } from '../../src/places/nameFold.ts';

/** The plain fold: NFKD, marks dropped, lower case, punctuation to single spaces. */
const plainFold = (name: string) => name.normalize('NFKD').replace(/\p{M}/gu, '').toLowerCase().replace(/[^\p{L}\p{N}]+/gu, ' ').trim();

interface Row { id: number; name: string; country: string; admin: string; population: number; featureCode: string; names: string[] }

/**
 * Every place of the table that bears one of `keys` as its name, its ASCII
 * name or an alternate name (airport codes aside), read straight from the file.
 * A line is folded name by name only if, accents dropped and lower-cased, it
 * holds the longest word of some key.
 */
function placesNamed(keys: Set<string>): Map<string, Row[]> {
  const found = new Map<string, Row[]>([...keys].map((k) => [k, []]));
  const words = [...keys].map((key) => ({ key, word: key.split(' ').sort((a, b) => b.length - a.length)[0]! }));
  for (const line of readFileSync(citiesFile(), 'utf8').split('\n')) {
    if (!line) continue;
    const loose = line.normalize('NFKD').replace(/[\u0300-\u036f]/g, '').toLowerCase();
    const maybe = words.filter((w) => loose.includes(w.word));
    if (maybe.length === 0) continue;
    const f = line.split('\t');
    const names = [f[1]!, f[2]!, ...(f[3] ? f[3].split(',').filter((a) => !/^[A-Z]{3,4}$/.test(a)) : [])];
    const folded = new Set(names.map(plainFold));
    for (const { key } of maybe) {
      if (!folded.has(key)) continue;
      found.get(key)!.push({ id: Number(f[0]), name: f[1]!, country: f[8]!, admin: f[10]!, population: Number(f[14]), featureCode: f[7]!, names });
    }
  }
  return found;
}

/** [what a reader types, the country they mean (ISO 3166-1), why] — "common practice" for which place is meant. */
const READERS: [string, string, string][] = [
  // The names the issue reported.
  ['Cologne', 'DE', 'English exonym of Köln'],
  ['Calcutta', 'IN', 'former name of Kolkata'],
  ['St. Petersburg', 'RU', '"St." for "Saint"; the Russian city over the Florida one'],
  ['Seville', 'ES', 'English exonym of Sevilla'],
  ['Nuremberg', 'DE', 'English exonym of Nürnberg'],
  ['Kiev', 'UA', 'former English spelling of Kyiv'],
  ['Bombay', 'IN', 'former name of Mumbai'],
  ['Peking', 'CN', 'former English name of Beijing'],
  ['Saigon', 'VN', 'former name of Ho Chi Minh City'],
  ['Den Haag', 'NL', 'Dutch name of The Hague'],
  ['Washington', 'US', 'the US capital, not a town of the same name'],
  ['Geneva', 'CH', 'English exonym of Genève, over small US namesakes'],
  // Others readers type.
  ['Leningrad', 'RU', 'former name of Saint Petersburg'],
  ['Madras', 'IN', 'former name of Chennai'],
  ['Rangoon', 'MM', 'former name of Yangon'],
  ['Canton', 'CN', 'former English name of Guangzhou, over US towns named Canton'],
  ['Tiflis', 'GE', 'former name of Tbilisi'],
  ['Leghorn', 'IT', 'old English exonym of Livorno'],
  ['Gothenburg', 'SE', 'English exonym of Göteborg'],
  ['Antwerp', 'BE', 'English exonym of Antwerpen'],
  ['Hanover', 'DE', 'English exonym of Hannover, over US towns'],
  ['Lyons', 'FR', 'old English spelling of Lyon'],
  ['Wien', 'AT', 'German name of Vienna (GeoNames\' main name is the English one)'],
  ['Mailand', 'IT', 'German exonym of Milan'],
  ['Kiew', 'UA', 'German exonym of Kyiv'],
  ['Nizza', 'FR', 'Italian and German exonym of Nice'],
  ['Bruxelles', 'BE', 'French name of Brussels'],
  ['Firenze', 'IT', 'Italian name of Florence'],
  ['Bâle', 'CH', 'French name of Basel, with its accent'],
  ['Bale', 'CH', 'French name of Basel, without its accent'],
  ['München', 'DE', 'German name of Munich, with its accent'],
  ['Muenchen', 'DE', 'German name of Munich, umlaut written out'],
  ['Zurich', 'CH', 'Zürich without its accent'],
  ['Krakow', 'PL', 'Kraków without its accent'],
  ['Lodz', 'PL', 'Łódź in plain letters (ł is a letter of its own, not an accented l)'],
  ['Saint-Etienne', 'FR', 'hyphenated, accent dropped'],
  ['St Etienne', 'FR', '"St" for "Saint", no hyphen'],
  ['Ft. Worth', 'US', '"Ft." for "Fort"'],
  ['Mt. Isa', 'AU', '"Mt." for "Mount"'],
];

const keyOf = (typed: string) => keyVariants(plainFold(typed));
/** The table read once for every name these tests look up. */
const lookups = placesNamed(new Set([...READERS.flatMap(([typed]) => keyOf(typed)), 'york']));

test('names as readers write them resolve to the place they mean, the most populous that bears the name (GeoNames cities500; common practice)', () => {
  for (const [typed, country, why] of READERS) {
    const match = resolvePlace(typed);
    assert.equal(match.place.country, country, `${typed}: ${why}`);
    const candidates = new Map(keyOf(typed).flatMap((k) => lookups.get(k)!).map((r) => [r.id, r]));
    assert.ok(candidates.size >= 1, `${typed}: GeoNames has the name`);
    const largest = Math.max(...[...candidates.values()].map((r) => r.population));
    assert.equal(match.place.population, largest, `${typed}: the largest of ${candidates.size} places bearing the name`);
    assert.ok(candidates.has(match.geonameId));
    // The name that matched is one GeoNames gives that place.
    assert.ok(candidates.get(match.geonameId)!.names.some((n) => n === match.matchedName), `${typed}: ${match.matchedName}`);
  }
});

test('how the name matched: as written, without accents or abbreviated, or by an alternate name (GeoNames cities500)', () => {
  const cases: [string, string, 'exact' | 'ascii' | 'alternate'][] = [
    ['Kraków', 'Kraków', 'exact'],
    ['KRAKÓW', 'Kraków', 'exact'],
    ['Krakow', 'Kraków', 'ascii'],
    ['Saint Petersburg', 'Saint Petersburg', 'exact'],
    ['St. Petersburg', 'Saint Petersburg', 'ascii'],
    ['Cologne', 'Köln', 'alternate'],
    ['Den Haag', 'The Hague', 'alternate'],
  ];
  for (const [typed, name, kind] of cases) {
    const match = resolvePlace(typed);
    assert.equal(match.place.name, name, typed);
    assert.equal(match.matchedBy, kind, typed);
    assert.equal(match.query, typed);
  }
  // The alternate name is reported as GeoNames writes it.
  assert.equal(resolvePlace('Cologne').matchedName, 'Cologne');
});

test('a much larger place wins over a namesake; comparable namesakes stay ambiguous (GeoNames populations; rule: a lead of CLEAR_LEAD times)', () => {
  // Springfield: Missouri, Massachusetts and Illinois are within a factor of two of each other.
  assert.throws(() => findPlace('Springfield'), (e: unknown) => {
    assert.ok(e instanceof InputError);
    assert.equal(e.parameter, 'place');
    assert.match(e.message, /ambiguous: add a country or region code \(Springfield, US-MO \(pop\. [\d,]+\); Springfield, US-MA/);
    assert.match(e.message, /Springfield, US-IL/);
    return true;
  });
  assert.equal(findPlace('Springfield, US-IL').admin, 'IL');
  // The rule as stated: the winner has at least CLEAR_LEAD times the people of any other place bearing the name.
  const rows = lookups.get('cologne')!;
  const winner = findPlace('Cologne');
  for (const r of rows) if (r.population !== winner.population) assert.ok(winner.population >= CLEAR_LEAD * r.population, r.name);
  // A place's own name outranks a smaller place's alternate name: GeoNames gives "York" to a Georgia town too.
  const york = resolvePlace('York');
  assert.equal(york.place.country, 'GB');
  assert.equal(york.matchedBy, 'exact');
  const close = lookups.get('york')!.filter((r) => r.population < york.place.population && CLEAR_LEAD * r.population > york.place.population);
  assert.ok(close.length > 0 && close.every((r) => plainFold(r.name) !== 'york'), 'within the lead, only a place that bears "York" as an alternate name');
});

test('a misspelt name still gets suggestions, nearest first (GeoNames cities500)', () => {
  assert.deepEqual(suggestPlaces('Dakr').map((p) => p.country)[0], 'SN');
  assert.equal(suggestPlaces('Colonge')[0]!.name, 'Köln', 'a swap of two letters is one slip');
  assert.throws(() => findPlace('Nurembreg'), /did you mean: Nürnberg, DE/);
});

test('errors name the parameter the name came from; airport codes are not names (GeoNames cities500)', () => {
  assert.throws(() => findPlace('Atlantis City', 'marks'), (e: unknown) => e instanceof InputError && e.parameter === 'marks' && !/\bat\b/.test(e.message));
  assert.throws(() => findPlace('Atlantis City', 'style.yaml: marks[2]'), (e: unknown) => e instanceof InputError && e.parameter === 'style.yaml: marks[2]');
  // A name given as `place` may be a position instead: the library names its parameter, the CLI its flag.
  assert.throws(() => findPlace('Atlantis City'), /^InputError: place: expected .*, or use at LAT,LON/);
  assert.throws(() => findPlace('Atlantis City'), (e: unknown) => e instanceof InputError && /, or use --at LAT,LON/.test(e.renamed((p) => `--${p}`).message));
  // GeoNames lists Köln's airport code among its alternate names; nobody means the city by it.
  assert.ok(isCodeNotName('CGN'));
  assert.ok(!isCodeNotName('Ulm'));
  assert.throws(() => findPlace('CGN'));
});

test('the name fold: case, accents, punctuation, letters of their own, other scripts (Unicode NFKD; common practice)', () => {
  assert.equal(nameKey('Saint-Étienne'), 'saint etienne');
  assert.equal(nameKey("  L'Aquila "), 'l aquila');
  assert.equal(nameKey('Łódź'), 'lodz');
  assert.equal(nameKey('Großenhain'), 'grossenhain');
  assert.equal(nameKey('Tórshavn'), 'torshavn');
  assert.equal(nameKey('Ærøskøbing'), 'aeroskobing');
  assert.equal(nameKey('Кёльн'), 'кельн');
  assert.equal(nameKey('東京'), '東京');
  assert.deepEqual(keyVariants('st petersburg').sort(), ['saint petersburg', 'st petersburg']);
  assert.deepEqual(keyVariants('mount isa').sort(), ['mount isa', 'mt isa']);
  // A name in another script finds its place too.
  assert.equal(findPlace('Кёльн').country, 'DE');
});
