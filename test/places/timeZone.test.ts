/**
 * The zone of a point and of a named place. The outside source is the tz
 * database's own country table (zone1970.tab and zone.tab), read through the
 * registry package countries-and-timezones; our code takes a country's zones
 * from ICU's region data (CLDR) instead, so the two do not share data.
 */
import assert from 'node:assert/strict';
import { createRequire } from 'node:module';
import { test } from 'node:test';
import { findPlace, gazetteerPlaces } from '../../src/places/gazetteer.ts';
import { timeZoneAt, timeZoneOfPlace } from '../../src/places/timeZone.ts';

const require = createRequire(import.meta.url);
const tzdata = require('countries-and-timezones') as {
  getCountry(code: string): { timezones: string[] } | null;
  getTimezonesForCountry(code: string, options: { deprecated: boolean }): { name: string }[] | null;
  getTimezone(name: string): { aliasOf: string | null; countries: string[] } | null;
};
const cities = [...gazetteerPlaces()];

const zonesByCountry = new Map<string, Set<string>>();
/** A country's zones in the tz database: zone1970.tab's and zone.tab's (which also names the zones merged since 1970). */
function tzdataZones(country: string): Set<string> {
  let zones = zonesByCountry.get(country);
  if (!zones) {
    zones = new Set([...(tzdata.getCountry(country)?.timezones ?? []), ...(tzdata.getTimezonesForCountry(country, { deprecated: true }) ?? []).map((z) => z.name)]);
    zonesByCountry.set(country, zones);
  }
  return zones;
}

/**
 * Exceptions, each justified:
 * - XK (Kosovo) is a user-assigned code, not in ISO 3166-1, so the tz database has no row for it; Kosovo
 *   keeps Serbia's Central European Time, and the boundary data put it inside Europe/Belgrade. We accept
 *   Serbia's zones there.
 */
const COUNTRY_STANDING_IN: Record<string, string> = { XK: 'RS' };

/**
 * Places coded under one country that stand on ground another clock governs, each justified (the
 * boundary polygons give the clock kept there; no zone of the coded country lies within 60 km):
 * - Akrotiri (GB): a Sovereign Base Area on Cyprus, on Cyprus's time (Asia/Nicosia).
 * - Gantiadi (GE): in Abkhazia, which keeps Moscow time (Europe/Moscow).
 * - Smara, Aousserd, Gueltat Zemmour, Imlili (MA): in Western Sahara, the tz database's EH (Africa/El_Aaiun).
 * - Olonkinbyen (SJ): Jan Mayen, on Norway's clock (Europe/Oslo; the same offsets as SJ's Arctic/Longyearbyen).
 * - Hoàng Sa (VN): the Paracel Islands, administered from Hainan (Asia/Shanghai).
 * - Sarupathar (IN): GeoNames' point for it lies in Myanmar, some 300 km east of the Assam town
 *   (a coordinate slip in the data); the point's zone is what we can know.
 */
const STANDS_ELSEWHERE = new Map([
  ['Akrotiri|GB', 'Asia/Nicosia'], ['Gantiadi|GE', 'Europe/Moscow'], ['Smara|MA', 'Africa/El_Aaiun'], ['Aousserd|MA', 'Africa/El_Aaiun'],
  ['Gueltat Zemmour|MA', 'Africa/El_Aaiun'], ['Imlili|MA', 'Africa/El_Aaiun'], ['Olonkinbyen|SJ', 'Europe/Oslo'], ['Hoàng Sa|VN', 'Asia/Shanghai'],
  ['Sarupathar|IN', 'Asia/Yangon'],
]);
const allowedZones = (country: string) => tzdataZones(COUNTRY_STANDING_IN[country] ?? country);

const offsetAt = (zone: string, date: Date) =>
  new Intl.DateTimeFormat('en-US', { timeZone: zone, timeZoneName: 'longOffset' }).formatToParts(date).find((p) => p.type === 'timeZoneName')!.value;

test('every gazetteer place gets one of its own country\'s zones (tzdata zone1970.tab/zone.tab via countries-and-timezones)', () => {
  const wrong: string[] = [];
  for (const city of cities) {
    const zone = timeZoneOfPlace(city);
    if (allowedZones(city.country).has(zone) || STANDS_ELSEWHERE.get(`${city.name}|${city.country}`) === zone) continue;
    wrong.push(`${city.name} ${city.country} (${city.latDeg}, ${city.lonDeg}): ${zone}`);
  }
  assert.ok(cities.length > 190_000, 'the whole gazetteer was checked');
  assert.deepEqual(wrong, []);
});

test('every national capital is in one of its country\'s zones from its point alone, without the country check (tzdata via countries-and-timezones)', () => {
  const capitals = cities.filter((c) => c.featureCode === 'PPLC');
  assert.ok(capitals.length > 200);
  const wrong = capitals
    .map((c) => ({ c, zone: timeZoneAt(c.latDeg, c.lonDeg) }))
    .filter(({ c, zone }) => !allowedZones(c.country).has(zone))
    .map(({ c, zone }) => `${c.name} ${c.country}: ${zone}`);
  assert.deepEqual(wrong, []);
});

test('a border place whose gazetteer point lies across the line keeps its own country\'s clock (tzdata country table)', () => {
  // Points from the gazetteer that the polygons put in the neighbour's zone; the neighbour's offset differs.
  const borderPlaces = cities.filter((c) => ['Nganglam|BT', 'Canoas|CR'].includes(`${c.name}|${c.country}`));
  assert.equal(borderPlaces.length, 2);
  for (const c of borderPlaces) {
    const { latDeg, lonDeg } = c;
    const zone = timeZoneOfPlace(c);
    assert.ok(tzdataZones(c.country).has(zone), `${c.name}: ${zone}`);
    assert.notEqual(offsetAt(zone, new Date('2026-01-15T00:00:00Z')), offsetAt(timeZoneAt(latDeg, lonDeg), new Date('2026-01-15T00:00:00Z')), `${c.name}: the point alone would be an offset off`);
  }
});

test('longitude +180 and −180 are one meridian: the same zone at every latitude (common practice: one point, one answer)', () => {
  for (let latDeg = -89; latDeg <= 89; latDeg += 1) assert.equal(timeZoneAt(latDeg, 180), timeZoneAt(latDeg, -180), `latitude ${latDeg}`);
  // And a longitude given past the meridian wraps onto it.
  assert.equal(timeZoneAt(-17.8, 181), timeZoneAt(-17.8, -179));
  // Fiji straddles the meridian (Taveuni, 16.8°S) and keeps one zone on both sides (tzdata: FJ Pacific/Fiji).
  assert.equal(timeZoneAt(-16.8, 179.99), 'Pacific/Fiji');
  assert.equal(timeZoneAt(-16.8, -179.99), 'Pacific/Fiji');
});

test('at sea: the nautical zone, UTC + round(longitude / 15°) hours (common practice; Etc/GMT+N is UTC−N in the tz database)', () => {
  for (const [latDeg, lonDeg] of [[0, -150], [-40, -20], [-30, 80], [30, -40], [-50, 100], [45, -160], [-60, -100]] as const) {
    const zone = timeZoneAt(latDeg, lonDeg);
    assert.match(zone, /^Etc\/GMT/, `${latDeg}, ${lonDeg}`);
    const hours = Math.round(lonDeg / 15);
    const expected = hours === 0 ? 'GMT' : `GMT${hours > 0 ? '+' : '-'}${String(Math.abs(hours)).padStart(2, '0')}:00`;
    assert.equal(offsetAt(zone, new Date('2026-06-01T00:00:00Z')), expected, `${latDeg}, ${lonDeg}`);
  }
});

test('the poles: the North Pole is one point with one zone (UTC); the South Pole keeps New Zealand time (tzdata backward: Antarctica/South_Pole is Pacific/Auckland)', () => {
  const north = new Set<string>();
  const south = new Set<string>();
  for (let lonDeg = -180; lonDeg <= 180; lonDeg += 7.5) {
    north.add(timeZoneAt(90, lonDeg));
    south.add(timeZoneAt(-90, lonDeg));
  }
  assert.deepEqual([...north], ['UTC']);
  assert.equal(south.size, 1);
  const southZone = [...south][0]!;
  assert.equal(offsetAt(southZone, new Date('2026-01-15T00:00:00Z')), offsetAt(tzdata.getTimezone('Antarctica/South_Pole')!.aliasOf!, new Date('2026-01-15T00:00:00Z')));
  assert.equal(offsetAt(southZone, new Date('2026-07-15T00:00:00Z')), offsetAt(tzdata.getTimezone('Antarctica/South_Pole')!.aliasOf!, new Date('2026-07-15T00:00:00Z')));
});

test('odd zones: Chatham Islands +12:45/+13:45, Kathmandu +05:45, Lord Howe +10:30/+11:00 (a 30-minute DST), Adelaide +09:30/+10:30 (tzdata via Intl)', () => {
  const cases: [string, string, string, string][] = [
    ['Waitangi, NZ-10', 'Pacific/Chatham', 'GMT+12:45', 'GMT+13:45'],
    ['Kathmandu', 'Asia/Kathmandu', 'GMT+05:45', 'GMT+05:45'],
    ['Adelaide', 'Australia/Adelaide', 'GMT+09:30', 'GMT+10:30'],
  ];
  // Lord Howe Island (under 500 people, so not in the gazetteer): by its point, 31.55°S 159.08°E.
  const lordHowe = timeZoneAt(-31.55, 159.08);
  assert.equal(lordHowe, 'Australia/Lord_Howe');
  assert.ok(tzdataZones('AU').has(lordHowe));
  assert.equal(offsetAt(lordHowe, new Date('2026-07-15T00:00:00Z')), 'GMT+10:30');
  assert.equal(offsetAt(lordHowe, new Date('2026-01-15T00:00:00Z')), 'GMT+11:00');
  for (const [name, zone, july, january] of cases) {
    const place = findPlace(name);
    const found = timeZoneOfPlace(place);
    assert.equal(found, zone, name);
    assert.ok(tzdataZones(place.country).has(found));
    assert.equal(offsetAt(found, new Date('2026-07-15T00:00:00Z')), july, name);
    assert.equal(offsetAt(found, new Date('2026-01-15T00:00:00Z')), january, name);
  }
});
