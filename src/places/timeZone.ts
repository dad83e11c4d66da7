/**
 * The IANA time zone at a point, from geo-tz (MIT) and its full data set: the
 * timezone-boundary-builder polygons (ODbL, from OpenStreetMap boundaries),
 * one polygon per zone of the tz database, the zones that differ only before
 * 1970 kept apart (a Norwegian town is in Europe/Oslo, a Ghanaian one in
 * Africa/Accra). At sea the polygons give the nautical zones, Etc/GMT±N,
 * 15° wide and centred on multiples of 15° (common practice at sea).
 *
 * Why the full set: our eclipses run from 1000 to 3000, and a reader expects
 * their own country's zone by name; the set that merges zones agreeing since
 * 1970 names a Norwegian town's zone after Berlin, and the one that merges
 * zones agreeing today loses history too. The full set costs 30 MB on disk
 * (the package ships all three), about 0.1 s to read its index on first use,
 * and some 40 µs a lookup on a cold tile, 3 µs on a warm one.
 *
 * A named place is also checked against its country: if the point falls in
 * a zone its country does not use (a border town whose gazetteer point lies
 * across the line), the nearest zone of its own country is taken. Which
 * zones a country uses comes from ICU's region data (CLDR, through
 * Intl.Locale), so the test can check the result against the tz database's
 * own country table without reading the same data twice.
 */
import { createRequire } from 'node:module';
import { EARTH_MEAN_RADIUS_KM } from '../ephemeris/constants.ts';

const require = createRequire(import.meta.url);
let finder: ((latDeg: number, lonDeg: number) => string[]) | undefined;

/** geo-tz reads its index (~1 MB JSON) when first asked, and each polygon tile once. */
function find(latDeg: number, lonDeg: number): string[] {
  finder ??= (require('geo-tz/all') as { find: (lat: number, lon: number) => string[] }).find;
  return finder(latDeg, lonDeg);
}

/** Longitude in [−180, 180): +180 and −180 are one meridian and get one answer. */
function wrapLongitude(lonDeg: number): number {
  return ((((lonDeg + 180) % 360) + 360) % 360) - 180;
}

/**
 * The zone at a point. Where the polygons overlap (disputed ground) the first
 * answer, in the data's own order, is taken; on the meridian ±180° at sea that
 * is Etc/GMT+12. At the North Pole, where every nautical zone meets, UTC. The
 * South Pole lies in Antarctica/McMurdo, the zone the station there keeps.
 */
export function timeZoneAt(latDeg: number, lonDeg: number): string {
  if (latDeg >= 90) return 'UTC';
  return find(Math.max(-90, latDeg), wrapLongitude(lonDeg))[0]!;
}

const canonicalNames = new Map<string, string>();
/** Intl's own name for a zone, so that aliases compare equal (Asia/Kolkata and Asia/Calcutta). */
function canonicalZone(zone: string): string {
  let name = canonicalNames.get(zone);
  if (name === undefined) {
    try {
      name = new Intl.DateTimeFormat('en-US', { timeZone: zone }).resolvedOptions().timeZone;
    } catch {
      name = zone;
    }
    canonicalNames.set(zone, name);
  }
  return name;
}

/** The zones a country uses, by ICU's region data (CLDR); empty when ICU has none (XK). */
export function zonesOfCountry(countryCode: string): string[] {
  try {
    const locale = new Intl.Locale(`und-${countryCode.toUpperCase()}`) as Intl.Locale & { timeZones?: string[]; getTimeZones?: () => string[] };
    return locale.getTimeZones?.() ?? locale.timeZones ?? [];
  } catch {
    return [];
  }
}

/** Rings searched around a border place for a zone of its own country: out to 60 km, 16 bearings each. */
const SEARCH_RADII_KM = [2, 5, 10, 20, 40, 60];

/** The point at a distance and bearing on a sphere (great circle). */
function offsetPoint(latDeg: number, lonDeg: number, distanceKm: number, bearingDeg: number): [number, number] {
  const rad = Math.PI / 180;
  const d = distanceKm / EARTH_MEAN_RADIUS_KM;
  const phi = latDeg * rad;
  const theta = bearingDeg * rad;
  const phi2 = Math.asin(Math.sin(phi) * Math.cos(d) + Math.cos(phi) * Math.sin(d) * Math.cos(theta));
  const lambda2 = lonDeg * rad + Math.atan2(Math.sin(theta) * Math.sin(d) * Math.cos(phi), Math.cos(d) - Math.sin(phi) * Math.sin(phi2));
  return [phi2 / rad, wrapLongitude(lambda2 / rad)];
}

/**
 * The zone of a named place: the zone at its point if its country uses it;
 * else the first zone of its country found on rings around it (nearest
 * first); else, if the point fell in the sea (a nautical Etc/GMT zone) and
 * the country uses one zone only, that one; else the point's own zone — a
 * place far from its country's zones is an outlying territory or base that
 * keeps the clock of the land it stands on (Akrotiri, a British base on
 * Cyprus, keeps Cyprus's time).
 */
const countryZones = new Map<string, Set<string>>();

export function timeZoneOfPlace(place: { latDeg: number; lonDeg: number; country: string }): string {
  const atPoint = timeZoneAt(place.latDeg, place.lonDeg);
  let own = countryZones.get(place.country);
  if (!own) countryZones.set(place.country, (own = new Set(zonesOfCountry(place.country).map(canonicalZone))));
  if (own.size === 0 || own.has(canonicalZone(atPoint))) return atPoint;
  for (const radiusKm of SEARCH_RADII_KM) {
    for (let bearing = 0; bearing < 360; bearing += 22.5) {
      const [lat, lon] = offsetPoint(place.latDeg, place.lonDeg, radiusKm, bearing);
      const zone = timeZoneAt(lat, lon);
      if (own.has(canonicalZone(zone))) return zone;
    }
  }
  return own.size === 1 && atPoint.startsWith('Etc/') ? [...own][0]! : atPoint;
}
