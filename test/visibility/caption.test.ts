/**
 * Captions are written from the geometry: check them against the geometry.
 * Named countries are checked by an independent fine sampling (seeded points
 * uniform on the sphere, d3-geo geoContains on the country's shape) against
 * the zones (which test/visibility/zones.test.ts checks against
 * astronomy-engine); sentences are checked against each other.
 */
import assert from 'node:assert/strict';
import { test } from 'node:test';
import { geoArea, geoBounds, geoContains } from 'd3-geo';
import type { Feature, Geometry } from 'geojson';
import { findLunarEclipses } from '../../src/eclipses/lunar/catalogue.ts';
import type { LonLat } from '../../src/ephemeris/earth.ts';
import { civilClock } from '../../src/ephemeris/civilTime.ts';
import { loadBasemap } from '../../src/sphere/world.ts';
import { eclipseCaption } from '../../src/outputs/caption.ts';
import { countryName } from '../../src/words/common.ts';
import { countrySampling, countryShares, MIN_SAMPLES_PER_COUNTRY, type CountryShare } from '../../src/visibility/lunar/countries.ts';
import { visibilityEvaluator, visibilityOf, type ZoneName } from '../../src/visibility/lunar/visibility.ts';
import { seededRandom } from './support.ts';

const one = (date: string) => {
  const [e] = findLunarEclipses({ from: new Date(`${date}T00:00:00Z`), to: new Date(`${date}T23:59:59Z`) });
  assert.ok(e, date);
  return e;
};
const DATES = ['2026-03-03', '2026-08-28', '2027-02-20', '2029-06-26', '2028-12-31', '2025-09-07'];
const features = loadBasemap('110m').countries().features as Feature<Geometry, { name: string }>[];
const featureOf = (c: CountryShare) => features.find((f) => f.properties.name === c.name)!;
const PHRASES: Record<string, ZoneName> = {
  'All of it can be seen from': 'sees-all',
  'The Moon sets while it is on in': 'sets-during',
  'The Moon rises while it is on in': 'rises-during',
  'It cannot be seen from': 'sees-none',
};
/** Short names that take "the" in English prose (common practice, news style), by ISO 3166-1 code. */
const TAKES_THE = new Set(['US', 'GB', 'NL', 'PH', 'BS', 'GM', 'CF', 'DO', 'AE', 'SB', 'FK']);
const escape = (text: string) => text.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');

/** Share of a country's area in a zone, by seeded points uniform on the sphere within its bounds, kept where geoContains says. */
function sampledShare(feature: Feature<Geometry, { name: string }>, zoneAt: (p: LonLat) => ZoneName, zone: ZoneName): { share: number; inside: number } {
  const [[west, south], [east, north]] = geoBounds(feature);
  const width = east! >= west! ? east! - west! : east! + 360 - west!;
  const random = seededRandom(4242);
  const [s0, s1] = [Math.sin((south! * Math.PI) / 180), Math.sin((north! * Math.PI) / 180)];
  let inside = 0;
  let inZone = 0;
  for (let k = 0; inside < 2000 && k < 300_000; k++) {
    const lon = ((west! + random() * width + 540) % 360) - 180;
    const lat = (Math.asin(s0 + random() * (s1 - s0)) * 180) / Math.PI;
    if (!geoContains(feature, [lon, lat])) continue;
    inside++;
    if (zoneAt([lon, lat]) === zone) inZone++;
  }
  return { share: inZone / inside, inside };
}

/** A sentence's continent list: items "X", "most of X", "parts of X", before ", including" or the full stop. */
function continentItems(sentence: string, lead: string): string[] {
  const list = sentence.slice(lead.length + 1).replace(/, including .*$/, '').replace(/\.$/, '');
  return list.split(/, | and /).map((s) => s.trim()).filter((s) => s && s !== 'parts of the world');
}

for (const date of DATES) {
  const eclipse = one(date);
  const visibility = visibilityOf(eclipse);
  const evaluator = visibilityEvaluator(visibility);
  const { caption, altText, named, countries } = eclipseCaption(eclipse, visibility, civilClock('UTC'));
  const sentences = caption.split(/(?<=\.) /);
  const zoneSentences = sentences.flatMap((s) => {
    const lead = Object.keys(PHRASES).find((p) => s.startsWith(p));
    return lead ? [{ sentence: s, lead, zone: PHRASES[lead]! }] : [];
  });

  test(`${date}: every named country has more than half its area in the zone it is named under (d3-geo geoContains, fine sampling)`, () => {
    let checked = 0;
    for (const [zone, list] of named) {
      for (const c of list) {
        const { share, inside } = sampledShare(featureOf(c), evaluator.zoneAt, zone);
        assert.ok(inside >= 1000, `${c.code}: ${inside} points inside`);
        assert.ok(share > 0.5, `${c.code} named under ${zone} with ${(share * 100).toFixed(1)} % of its area there`);
        const own = zoneSentences.find((s) => s.zone === zone)!;
        assert.match(own.sentence, new RegExp(`including .*${escape(countryName(c))}`), `${c.code} in the ${zone} sentence`);
        checked++;
      }
    }
    assert.ok(checked >= 6, `${checked} countries checked`);
  });

  test(`${date}: no two sentences contradict each other`, () => {
    // Each country at most once.
    for (const c of countries) {
      const name = countryName(c);
      const longer = countries.map((c) => countryName(c)).filter((other) => other !== name && other.includes(name));
      const hits = zoneSentences.filter(({ sentence }) => {
        let text = sentence;
        for (const other of longer) text = text.split(other).join('');
        return new RegExp(`(^|[^\\p{L}])${escape(name)}([^\\p{L}]|$)`, 'u').test(text);
      });
      assert.ok(hits.length <= 1, `${c.code ?? c.name} named in ${hits.length} sentences`);
    }
    const items = zoneSentences.map((s) => ({ ...s, items: continentItems(s.sentence, s.lead) }));
    for (const s of items) {
      for (const item of s.items) {
        const continent = item.replace(/^(most of|parts of) /, '');
        const plain = item === continent;
        for (const other of items) {
          if (other === s) continue;
          const there = other.items.filter((i) => i.replace(/^(most of|parts of) /, '') === continent);
          // A continent said whole in one sentence appears in no other; "most of" it in one sentence only.
          if (plain) assert.equal(there.length, 0, `${continent}: whole in "${s.sentence}" but also in "${other.sentence}"`);
          if (item.startsWith('most of ')) assert.ok(!there.some((i) => i.startsWith('most of ')), `most of ${continent} twice`);
        }
        // A continent said whole in a zone holds no country named under another zone.
        if (plain) {
          for (const [zone, list] of named) {
            if (zone === s.zone) continue;
            for (const c of list) assert.notEqual(c.continent, continent, `${c.code} named under ${zone} while all of ${continent} is under ${s.zone}`);
          }
        }
      }
    }
  });

  test(`${date}: names are written as a reader would, the article rule holds`, () => {
    for (const list of named.values()) {
      for (const c of list) {
        const name = countryName(c);
        assert.equal(name.startsWith('the '), TAKES_THE.has(c.code!), `${c.code}: "${name}"`);
        if (!TAKES_THE.has(c.code!)) assert.doesNotMatch(caption, new RegExp(`\\bthe ${escape(name)}\\b`), `${c.code} without "the"`);
      }
    }
    assert.ok(altText.length < 400 && altText.startsWith('World map of where the'));
    assert.match(caption, /lunar eclipse of \d+ \w+ 20\d\d\. Greatest eclipse at \d\d:\d\d UTC/);
  });
}

test('country names tell every country apart; the two Congos and the article names come out as prose writes them (common practice)', () => {
  const shares = countryShares(visibilityOf(one('2026-03-03')), features);
  const names = shares.filter((c) => c.code).map((c) => countryName(c));
  assert.equal(new Set(names).size, names.length, 'no two countries share a name');
  const byCode = (code: string) => countryName(shares.find((c) => c.code === code)!);
  assert.equal(byCode('CD'), 'DR Congo');
  assert.equal(byCode('CG'), 'Congo');
  assert.equal(byCode('US'), 'the United States');
  assert.equal(byCode('GB'), 'the United Kingdom');
  for (const c of shares.filter((s) => s.code)) assert.equal(countryName(c).startsWith('the '), TAKES_THE.has(c.code!), `${c.code}`);
});

test('continents by area: Russia is split at the Urals, most of it in Asia (from memory: about three quarters); Timor-Leste is in Asia (UN M49)', () => {
  const shares = countryShares(visibilityOf(one('2026-03-03')), features);
  const russia = shares.find((c) => c.code === 'RU')!;
  const europe = russia.parts.find((p) => p.continent === 'Europe')!;
  const asia = russia.parts.find((p) => p.continent === 'Asia')!;
  const asiaShare = asia.area / (asia.area + europe.area);
  assert.ok(asiaShare > 0.7 && asiaShare < 0.8, `${asiaShare}`);
  assert.equal(russia.continent, 'Asia');
  assert.equal(shares.find((c) => c.code === 'TL')!.continent, 'Asia');
  // Every other country lies on one continent.
  for (const c of shares) if (c.code !== 'RU') assert.ok(c.parts.length <= 1, `${c.code ?? c.name}`);
});

test('2026-03-03: continents by share — Africa and Europe see nothing, Oceania sees (most of) it (geometry of the Moon-up caps)', () => {
  const eclipse = one('2026-03-03');
  const { caption } = eclipseCaption(eclipse, visibilityOf(eclipse), civilClock('UTC'));
  assert.match(caption, /It cannot be seen from Africa and Europe\./);
  assert.match(caption, /All of it can be seen from [^.]*Oceania/);
});

test('the equal-area samples measure each country\'s area: d3-geo geoArea within 7 % for every country (edges are great circles to d3, lines in lon/lat to the samples: the 49th parallel), median within 1 %', () => {
  const errors = features.map((f) => {
    const { samples, sampledArea } = countrySampling(f);
    assert.ok(samples >= MIN_SAMPLES_PER_COUNTRY, `${f.properties.name}: ${samples} samples`);
    return sampledArea / geoArea(f) - 1;
  });
  for (const [k, e] of errors.entries()) assert.ok(Math.abs(e) < 0.07, `${features[k]!.properties.name}: ${(e * 100).toFixed(1)} %`);
  const sorted = errors.map(Math.abs).sort((a, b) => a - b);
  assert.ok(sorted[Math.floor(sorted.length / 2)]! < 0.01, `median ${(sorted[Math.floor(sorted.length / 2)]! * 100).toFixed(2)} %`);
});
