/** Captions are written from the geometry: check them against the geometry. */
import assert from 'node:assert/strict';
import { test } from 'node:test';
import isoCountries from 'i18n-iso-countries';
import { findLunarEclipses } from '../../src/eclipse/catalogue.ts';
import { civilClock } from '../../src/ephemeris/civilTime.ts';
import { eclipseCaption } from '../../src/outputs/caption.ts';
import { visibilityOf } from '../../src/visibility/visibility.ts';

for (const date of ['2026-03-03', '2026-08-28', '2027-02-20']) {
  test(`${date}: the caption names a country wholly inside the whole-eclipse zone, and none wholly in the nothing-seen zone`, () => {
    const [eclipse] = findLunarEclipses({ from: new Date(`${date}T00:00:00Z`), to: new Date(`${date}T23:59:59Z`) });
    const { caption, altText, countries } = eclipseCaption(eclipse!, visibilityOf(eclipse!), civilClock('UTC'));
    const nameOf = (c: (typeof countries)[number]) => (c.code && isoCountries.getName(c.code, 'en', { select: 'alias' })) || c.name;
    // A name counts only where it is not part of a longer name ("Guinea" in "Papua New Guinea").
    const names = countries.map(nameOf);
    const mentions = (name: string) => {
      const longer = names.filter((other) => other !== name && other.includes(name));
      let text = caption;
      for (const other of longer) text = text.split(other).join('');
      return new RegExp(`(^|[^\\p{L}])${name.replace(/[.*+?^${}()|[\]\\]/g, '\\$&')}([^\\p{L}]|$)`, 'u').test(text);
    };
    const named = countries.filter((c) => mentions(nameOf(c)));
    assert.ok(named.some((c) => c.wholly === 'sees-all'), `named: ${named.map(nameOf).join(', ')}`);
    for (const c of named) assert.notEqual(c.wholly, 'sees-none', `${nameOf(c)} lies wholly where nothing is seen`);
    assert.ok(countries.some((c) => c.wholly === 'sees-none'), 'the check means something: some country sees nothing');
    assert.match(caption, /lunar eclipse of \d+ \w+ 20\d\d\. Greatest eclipse at \d\d:\d\d UTC/);
    assert.ok(altText.length < 400 && altText.startsWith('World map of where the'));
  });
}

test('2026-03-03: continents by share — Africa and Europe see nothing, Oceania sees all of it (geometry of the Moon-up caps)', () => {
  const [eclipse] = findLunarEclipses({ from: new Date('2026-03-03T00:00:00Z'), to: new Date('2026-03-04T00:00:00Z') });
  const { caption } = eclipseCaption(eclipse!, visibilityOf(eclipse!), civilClock('UTC'));
  assert.match(caption, /It cannot be seen from Africa and Europe\./);
  assert.match(caption, /All of it can be seen from [^.]*Oceania/);
});
