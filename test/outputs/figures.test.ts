/**
 * One eclipse reads the same everywhere: the list table, the map's title and
 * subtitle (the scene's text), the caption and the contact sheet print each
 * figure rounded once from the full value. Source: common practice (a figure
 * is rounded once, half away from zero, from the value computed), checked
 * with our own decimal arithmetic on the exact binary value.
 */
import assert from 'node:assert/strict';
import { test } from 'node:test';
import { contactSheet } from '../../src/batch/contactSheet.ts';
import { MANIFEST_SCHEMA } from '../../src/batch/manifest.ts';
import { findLunarEclipses } from '../../src/eclipses/lunar/catalogue.ts';
import type { LunarEclipse } from '../../src/eclipses/lunar/types.ts';
import { civilClock } from '../../src/ephemeris/civilTime.ts';
import { sceneTexts } from '../../src/figures/map.ts';
import { eclipseCaption } from '../../src/outputs/caption.ts';
import { catalogueTable } from '../../src/outputs/catalogueFormats.ts';
import { catalogueDocument, eclipseRecord } from '../../src/outputs/catalogueRecord.ts';
import { localReport, localTable } from '../../src/outputs/localFormats.ts';
import { visibilityOf } from '../../src/visibility/lunar/visibility.ts';

/** Round half away from zero at `places` decimals, on the exact decimal expansion of the double (BigInt arithmetic). */
function roundOnce(value: number, places: number): string {
  const exact = Math.abs(value).toFixed(40); // exact to 40 places: every double in [0, 10) has at most 1074 binary places, but 40 decimals decide a tie far below our figures
  const [whole, fraction] = exact.split('.') as [string, string];
  const scaled = BigInt(whole + fraction.slice(0, places));
  const rest = fraction.slice(places);
  const up = rest[0]! >= '5';
  const digits = (scaled + (up ? 1n : 0n)).toString().padStart(places + 1, '0');
  const text = places === 0 ? digits : `${digits.slice(0, -places)}.${digits.slice(-places)}`;
  return value < 0 && /[1-9]/.test(text) ? `-${text}` : text;
}

const eclipses = findLunarEclipses({ from: new Date('1900-01-01T00:00:00Z'), to: new Date('2101-01-01T00:00:00Z') });
/** Where the data's 4-decimal value ends in 5, a second rounding to 3 decimals may go the wrong way. */
const endsInFive = (v: number) => roundOnce(v, 4).endsWith('5');
const ties = eclipses.filter((e) => endsInFive(e.kind === 'penumbral' ? e.penumbralMagnitude : e.umbralMagnitude));

test('the eclipses of 1900–2100 include magnitudes whose 4th decimal is 5, and some that rounding twice would get wrong', () => {
  assert.ok(ties.length >= 10, `${ties.length}`);
  const twiceWrong = ties.filter((e) => {
    const v = e.kind === 'penumbral' ? e.penumbralMagnitude : e.umbralMagnitude;
    return roundOnce(Number(roundOnce(v, 4)), 3) !== roundOnce(v, 3);
  });
  assert.ok(twiceWrong.length > 0, 'a case like 1.15047 → 1.1505 → 1.151 is among them');
});

function listRow(eclipse: LunarEclipse): string[] {
  const doc = catalogueDocument([eclipse], { convention: 'danjon', deltaTModel: 'test', from: new Date('1900-01-01T00:00:00Z'), to: new Date('2101-01-01T00:00:00Z') });
  const line = catalogueTable(doc).split('\n').find((l) => l.startsWith(eclipse.id))!;
  return line.split(/\s{2,}/);
}

test('list, map title/subtitle, caption and contact sheet print the same magnitude, gamma, greatest and lengths, each rounded once from the full value', () => {
  const clock = civilClock('UTC');
  const manifest = {
    schema: MANIFEST_SCHEMA, tool: 'test', styleHash: 'x', style: {}, range: { from: '1900-01-01', to: '2101-01-01' }, shard: null,
    eclipses: ties.map((e) => ({ id: e.id, kind: e.kind, key: 'k', record: eclipseRecord(e), files: [] })),
  } as Parameters<typeof contactSheet>[0];
  const sheet = contactSheet(manifest, 'Night Notes');
  for (const e of ties) {
    const name = e.kind === 'penumbral' ? 'penumbral' : 'umbral';
    const magnitude = roundOnce(e.kind === 'penumbral' ? e.penumbralMagnitude : e.umbralMagnitude, 3);
    const [, , greatest, umbral, penumbral, gamma, inUmbra] = listRow(e);
    assert.equal(e.kind === 'penumbral' ? penumbral : umbral, magnitude, `${e.id} list`);
    assert.equal(umbral, roundOnce(e.umbralMagnitude, 3), `${e.id} list umbral`);
    assert.equal(penumbral, roundOnce(e.penumbralMagnitude, 3), `${e.id} list penumbral`);
    assert.equal(gamma, roundOnce(e.gamma, 4), `${e.id} list gamma`);
    const texts = sceneTexts(e, clock, '0 s', 'test');
    assert.ok(texts.subtitle.includes(`${name} magnitude ${magnitude.replace('-', '−')}`), `${e.id} map: ${texts.subtitle}`);
    const caption = eclipseCaption(e, visibilityOf(e), clock).caption;
    assert.ok(caption.includes(`${name} magnitude ${magnitude}`), `${e.id} caption`);
    const card = sheet.slice(sheet.indexOf(`id="${e.id}"`), sheet.indexOf('</article>', sheet.indexOf(`id="${e.id}"`)));
    assert.ok(card.includes(`${name} magnitude ${magnitude}`), `${e.id} contact sheet`);
    // Greatest: the list's minute (UTC) is the map's and the sheet's, rounded once from the full instant.
    const greatestMs = Math.round((Date.UTC(2000, 0, 1, 12) + e.greatest.utDays * 86_400_000) / 60_000) * 60_000;
    const minute = new Date(greatestMs).toISOString().slice(0, 16).replace('T', ' ');
    assert.equal(greatest, minute, `${e.id} list greatest`);
    assert.ok(texts.subtitle.startsWith(`Greatest ${minute.slice(11)} UTC`), `${e.id} map greatest`);
    // The card names its date once, in its heading (as the map title does), and the minute of greatest beside the figures.
    assert.ok(card.includes(`Greatest ${minute.slice(11)} UTC`), `${e.id} sheet greatest`);
    // Time in the umbra: whole minutes of the full U1→U4 span, in every output.
    if (e.contacts.U1) {
      const minutes = Math.round((e.contacts.U4!.utDays - e.contacts.U1.utDays) * 1440);
      const h = Math.floor(minutes / 60);
      const mm = String(minutes % 60).padStart(2, '0');
      const words = h > 0 ? `${h} h ${mm} min` : `${minutes} min`;
      assert.equal(inUmbra, h > 0 ? `${h}h ${mm}m` : `${minutes}m`, `${e.id} list in umbra`);
      assert.ok(texts.subtitle.includes(`in the umbra ${words}`), `${e.id} map in umbra`);
      assert.ok(caption.includes(`in the umbra for ${words}`), `${e.id} caption in umbra`);
      assert.ok(card.includes(`in the umbra ${words}`), `${e.id} sheet in umbra`);
    }
  }
});

test('the local table prints altitudes and azimuths rounded once from the full value (no 67.46° → 67.5° → 68°)', () => {
  let checked = 0;
  for (const e of ties.slice(0, 12)) {
    for (const [name, latDeg, lonDeg] of [['Kestrel Ridge', 47.3, -120.5], ['Southern Post', -33.9, 18.4], ['Northern Post', 64.1, 21.9]] as const) {
      const report = localReport(e, { place: { name, latDeg, lonDeg, tz: 'UTC' }, clock: civilClock('UTC') });
      const lines = localTable(report).split('\n');
      for (const event of report.local.events) {
        const label = event.event === 'greatest' ? 'Greatest' : event.event === 'moonrise' ? 'Moonrise' : event.event === 'moonset' ? 'Moonset' : event.event;
        const cells = lines.find((l) => l.startsWith(`${label} `))!.split(/\s{2,}/);
        assert.equal(cells[4], `${roundOnce(event.moonAltitudeDeg, 1).replace(/^-(0\.0)$/, '$1')}°`, `${e.id} ${name} ${label} altitude`);
        assert.equal(cells[5], `${Number(roundOnce(event.moonAzimuthDeg, 0)) % 360}°`, `${e.id} ${name} ${label} azimuth`);
        checked++;
      }
    }
  }
  assert.ok(checked > 100);
});
