/** Local circumstances: civil time, altitudes, flags, moonrise and the calendar file. */
import assert from 'node:assert/strict';
import { test } from 'node:test';
import { Body, Equator, Horizon, Observer as AEObserver, SearchRiseSet } from 'astronomy-engine';
import coord from 'astronomia/coord';
import globe from 'astronomia/globe';
import moonposition from 'astronomia/moonposition';
import nutation from 'astronomia/nutation';
import parallax from 'astronomia/parallax';
import refraction from 'astronomia/refraction';
import sidereal from 'astronomia/sidereal';
import ICAL from 'ical.js';
import { findLunarEclipses } from '../../src/eclipses/lunar/catalogue.ts';
import { civilClock } from '../../src/ephemeris/civilTime.ts';
import { astroTimeOf, momentFromUT, utDaysFromDate, type Moment } from '../../src/ephemeris/time.ts';
import { localIcs, localIso, type LocalReport } from '../../src/outputs/localFormats.ts';
import { localCircumstances, moonRisesAndSets } from '../../src/local/lunar.ts';
import { localSummary } from '../../src/words/lunar/text.ts';
import { stage, visibilityEvaluator, visibilityOf, zoneFromMargins } from '../../src/visibility/lunar/visibility.ts';
import { distanceToEdgeDeg, randomPlaces, useOurDeltaTInAstronomyEngine } from './support.ts';

useOurDeltaTInAstronomyEngine();
const DEG = Math.PI / 180;
const eclipses2000to2040 = findLunarEclipses({ from: new Date('2007-01-01T00:00:00Z'), to: new Date('2041-01-01T00:00:00Z') });
const one = (date: string) => eclipses2000to2040.find((e) => e.id === date)!;

/** The last Sunday of a month, at 01:00 UTC (Directive 2000/84/EC, arts. 2–3). */
function lastSundayAt0100(year: number, month: number): number {
  const last = new Date(Date.UTC(year, month + 1, 0, 1));
  last.setUTCDate(last.getUTCDate() - last.getUTCDay());
  return last.getTime();
}

/** The nth Sunday of a month at 02:00 local standard/daylight time (Energy Policy Act of 2005, §110), for US Central (UTC−6). */
function nthSundayCentral(year: number, month: number, n: number, localHourUtcOffset: number): number {
  const first = new Date(Date.UTC(year, month, 1, 2 - localHourUtcOffset));
  const firstSunday = 1 + ((7 - first.getUTCDay()) % 7);
  return Date.UTC(year, month, firstSunday + 7 * (n - 1), 2 - localHourUtcOffset);
}

test('Europe/Berlin offsets at every contact 2007–2040 follow the EU rule: +02:00 from the last Sunday of March to the last Sunday of October, 01:00 UTC (Directive 2000/84/EC)', () => {
  const clock = civilClock('Europe/Berlin');
  let summer = 0;
  let winter = 0;
  for (const e of eclipses2000to2040) {
    for (const m of Object.values(e.contacts)) {
      const ms = Math.round(m!.utDays * 86_400_000 + Date.UTC(2000, 0, 1, 12));
      const year = new Date(ms).getUTCFullYear();
      const isSummer = ms >= lastSundayAt0100(year, 2) && ms < lastSundayAt0100(year, 9);
      assert.equal(localIso(clock, m!).slice(-6), isSummer ? '+02:00' : '+01:00', `${e.id}`);
      isSummer ? summer++ : winter++;
    }
  }
  assert.ok(summer > 50 && winter > 50);
});

test('America/Chicago offsets at every contact 2007–2040 follow the US rule: −05:00 from the second Sunday of March to the first Sunday of November, 02:00 local (Energy Policy Act of 2005)', () => {
  const clock = civilClock('America/Chicago');
  for (const e of eclipses2000to2040) {
    for (const m of Object.values(e.contacts)) {
      const ms = Math.round(m!.utDays * 86_400_000 + Date.UTC(2000, 0, 1, 12));
      const year = new Date(ms).getUTCFullYear();
      const isDaylight = ms >= nthSundayCentral(year, 2, 2, -6) && ms < nthSundayCentral(year, 10, 1, -5);
      assert.equal(localIso(clock, m!).slice(-6), isDaylight ? '-05:00' : '-06:00', `${e.id}`);
    }
  }
});

test('a contact on each side of a changeover: the same instant read one hour apart, and the local clock labels each', () => {
  const clock = civilClock('Atlantic/Canary');
  const change = lastSundayAt0100(2025, 2); // 2025-03-30 01:00 UTC
  const before = momentFromUT(utDaysFromDate(new Date(change - 60_000)), 69);
  const after = momentFromUT(utDaysFromDate(new Date(change + 60_000)), 69);
  assert.equal(localIso(clock, before), '2025-03-30T00:59:00+00:00');
  assert.equal(localIso(clock, after), '2025-03-30T02:01:00+01:00');
  assert.equal(clock.zoneLabel(before.utDays), 'WET, UTC+00:00');
  assert.equal(clock.zoneLabel(after.utDays), 'WEST, UTC+01:00');
});

const PLACES: [string, number, number][] = [
  ['Dakar', 14.6937, -17.4441], ['Chicago', 41.85, -87.65], ['Sydney', -33.8679, 151.2073], ['Tokyo', 35.6895, 139.6917],
  ['Reykjavík', 64.1355, -21.8954], ['Nairobi', -1.2833, 36.8167], ['Ushuaia', -54.8, -68.3], ['Honolulu', 21.3069, -157.8583],
];

/** The Moon's apparent altitude by Meeus's own methods (astronomia): ch. 47 position, ch. 22 nutation, ch. 12 sidereal time, ch. 40 parallax, ch. 16 refraction. */
function meeusAltitudeDeg(moment: Moment, latDeg: number, lonDeg: number): number {
  const jde = moment.ttDays + 2451545;
  const jd = moment.utDays + 2451545;
  const moon = moonposition.position(jde);
  const [dPsi, dEps] = nutation.nutation(jde);
  const eq = new coord.Ecliptic(moon.lon + dPsi, moon.lat).toEquatorial(nutation.meanObliquity(jde) + dEps);
  const [rhoSin, rhoCos] = globe.Earth76.parallaxConstants(latDeg * DEG, 0);
  // parallax.topocentric reads its last argument only for sidereal time, which runs on UT.
  // parallax.horizontal wants the distance in au (Meeus eq. 40.1).
  const topo = parallax.topocentric({ ra: eq.ra, dec: eq.dec, range: moon.range / 149597870.7 }, rhoSin, rhoCos, -lonDeg * DEG, jd);
  const theta = (sidereal.apparent(jd) / 86400) * 2 * Math.PI;
  const hourAngle = theta + lonDeg * DEG - topo.ra;
  const h = Math.asin(Math.sin(latDeg * DEG) * Math.sin(topo.dec) + Math.cos(latDeg * DEG) * Math.cos(topo.dec) * Math.cos(hourAngle));
  return (h + (h >= -1 * DEG ? refraction.saemundsson(h) : 0)) / DEG;
}

test('the Moon\'s altitude at each contact: within 0.05° of astronomy-engine\'s Horizon and within 0.2° of Meeus (astronomia)', () => {
  for (const date of ['2025-03-14', '2026-03-03', '2026-08-28', '2028-12-31']) {
    const e = one(date) ?? findLunarEclipses({ from: new Date(`${date}T00:00:00Z`), to: new Date(`${date}T23:59:59Z`) })[0]!;
    for (const [name, lat, lon] of PLACES) {
      const local = localCircumstances(e, { latDeg: lat, lonDeg: lon });
      for (const ev of local.events) {
        const time = astroTimeOf(ev.moment);
        const observer = new AEObserver(lat, lon, 0);
        const equ = Equator(Body.Moon, time, observer, true, true);
        // Saemundsson ('normal') from a true −1° up, geometric below, as ours is.
        const geometric = Horizon(time, observer, equ.ra, equ.dec);
        const hor = geometric.altitude >= -1 ? Horizon(time, observer, equ.ra, equ.dec, 'normal') : geometric;
        assert.ok(Math.abs(hor.altitude - ev.moonAltitudeDeg) < 0.05, `${date} ${name} ${ev.event}: ${ev.moonAltitudeDeg} vs AE ${hor.altitude}`);
        const dAz = Math.abs(((hor.azimuth - ev.moonAzimuthDeg + 540) % 360) - 180);
        if (Math.abs(hor.altitude) < 85) assert.ok(dAz < 0.1, `${date} ${name} ${ev.event} azimuth ${ev.moonAzimuthDeg} vs ${hor.azimuth}`);
        const meeus = meeusAltitudeDeg(ev.moment, lat, lon);
        assert.ok(Math.abs(meeus - ev.moonAltitudeDeg) < 0.2, `${date} ${name} ${ev.event}: ${ev.moonAltitudeDeg} vs Meeus ${meeus}`);
      }
    }
  }
});

test('Moon-up flags at the start and end agree with the map\'s zones for the same places (away from the edges)', () => {
  for (const date of ['2026-03-03', '2026-08-28']) {
    const e = one(date);
    const visibility = visibilityOf(e);
    const evaluator = visibilityEvaluator(visibility);
    const start = stage(visibility, visibility.zoneSpan.start);
    const end = stage(visibility, visibility.zoneSpan.end);
    let compared = 0;
    for (const [lon, lat] of randomPlaces(150, 99)) {
      if (distanceToEdgeDeg(start.cap, [lon, lat]) < 0.3 || distanceToEdgeDeg(end.cap, [lon, lat]) < 0.3) continue;
      const local = localCircumstances(e, { latDeg: lat, lonDeg: lon });
      const flag = (name: string) => local.events.find((ev) => ev.event === name)!.moonUp;
      const zone = zoneFromMargins({ start: flag(visibility.zoneSpan.start) ? 1 : -1, end: flag(visibility.zoneSpan.end) ? 1 : -1 });
      assert.equal(zone, evaluator.zoneAt([lon, lat]), `${date} at ${lat},${lon}`);
      compared++;
    }
    assert.ok(compared > 120);
  }
});

test('moonrise and moonset agree with astronomy-engine\'s rise/set search within a minute', () => {
  let checked = 0;
  for (const e of eclipses2000to2040.slice(0, 12)) {
    for (const [name, lat, lon] of PLACES) {
      for (const found of moonRisesAndSets({ latDeg: lat, lonDeg: lon }, e.contacts.P1!, e.contacts.P4!)) {
        const startSearch = astroTimeOf(momentFromUT(found.moment.utDays - 0.05, found.moment.deltaTSeconds));
        const theirs = SearchRiseSet(Body.Moon, new AEObserver(lat, lon, 0), found.event === 'moonrise' ? +1 : -1, startSearch, 0.1);
        assert.ok(theirs, `${e.id} ${name}: astronomy-engine found no ${found.event}`);
        const minutes = Math.abs(theirs.ut - found.moment.utDays) * 1440;
        assert.ok(minutes < 1, `${e.id} ${name} ${found.event}: ${minutes.toFixed(2)} min apart`);
        checked++;
      }
    }
  }
  assert.ok(checked > 20, `checked ${checked}`);
});

test('the .ics parses with ical.js (RFC 5545) and its events carry the right UTC instants; uids are stable', () => {
  const e = one('2026-03-03');
  const place = { name: 'Toronto, "ON"; test', latDeg: 43.7001, lonDeg: -79.4163, tz: 'America/Toronto' };
  const clock = civilClock(place.tz);
  const local = localCircumstances(e, place);
  const report: LocalReport = { local, place, clock, summary: localSummary(local, clock, place.name) };
  const text = localIcs(report, 'test');
  assert.equal(localIcs(report, 'test'), text, 'same inputs, same bytes');
  assert.ok(text.split('\r\n').every((line) => Buffer.byteLength(line) <= 75), 'lines folded at 75 octets');
  const calendar = new ICAL.Component(ICAL.parse(text));
  const events = calendar.getAllSubcomponents('vevent').map((v) => new ICAL.Event(v));
  const find = (name: string) => local.events.find((ev) => ev.event === name)!.moment.utDays;
  const iso = (utDays: number) => new Date(Math.round((utDays * 86400 + Date.UTC(2000, 0, 1, 12) / 1000)) * 1000).toISOString();
  // Toronto: the Moon sets during totality, so every phase event ends at moonset.
  assert.deepEqual(events.map((ev) => ev.uid), ['2026-03-03-penumbral-43.7001_-79.4163@umbracast', '2026-03-03-partial-43.7001_-79.4163@umbracast', '2026-03-03-total-43.7001_-79.4163@umbracast']);
  assert.equal(events[0]!.startDate.toJSDate().toISOString(), iso(find('P1')));
  assert.equal(events[1]!.startDate.toJSDate().toISOString(), iso(find('U1')));
  assert.equal(events[2]!.startDate.toJSDate().toISOString(), iso(find('U2')));
  for (const ev of events) assert.equal(ev.endDate.toJSDate().toISOString(), iso(find('moonset')));
  assert.equal(events[0]!.location, place.name);
});

test('an eclipse not seen from the place still makes a valid calendar: one informative event over the eclipse that says so (RFC 5545 §3.6: at least one component); DTSTAMP is the fixed documented stamp, never the eclipse\'s time nor in the future (§3.8.7.2)', () => {
  const e = one('2026-03-03');
  // Dakar is some 150° from the Moon's sub-point at greatest: the Moon is down throughout (Meeus ch. 15).
  const place = { name: 'Dakar', latDeg: 14.6937, lonDeg: -17.4441, tz: 'Africa/Dakar' };
  const clock = civilClock(place.tz);
  const local = localCircumstances(e, place);
  assert.ok(local.events.every((ev) => !ev.moonUp), 'premise: nothing seen');
  const report: LocalReport = { local, place, clock, summary: localSummary(local, clock, place.name) };
  const text = localIcs(report, 'test');
  const calendar = new ICAL.Component(ICAL.parse(text));
  const events = calendar.getAllSubcomponents('vevent');
  assert.equal(events.length, 1);
  const event = new ICAL.Event(events[0]!);
  assert.match(event.summary, /not visible from Dakar/);
  assert.match(event.description, /cannot be seen/);
  for (const vevent of events) {
    const stamp = vevent.getFirstPropertyValue('dtstamp') as unknown as { toJSDate(): Date };
    assert.ok(stamp.toJSDate().getTime() < Date.now());
    assert.notEqual(stamp.toJSDate().toISOString().slice(0, 16), new Date(Date.UTC(2000, 0, 1, 12) + e.greatest.utDays * 86_400_000).toISOString().slice(0, 16));
  }
  // And a place that sees it: every event carries the same fixed stamp.
  const seen = { name: 'Honolulu', latDeg: 21.3069, lonDeg: -157.8583, tz: 'Pacific/Honolulu' };
  const seenLocal = localCircumstances(e, seen);
  const seenText = localIcs({ local: seenLocal, place: seen, clock: civilClock(seen.tz), summary: 'x' }, 'test');
  assert.deepEqual([...new Set([...seenText.matchAll(/^DTSTAMP:(.*)$/gm)].map((m) => m[1]!.trim()))], ['20000101T000000Z']);
});
