/**
 * What the map's lines and marks say to a reader, checked against an
 * independent computation: whether the Moon rises or sets at a labelled
 * place comes from astronomy-engine's topocentric Moon (Equator + Horizon),
 * not from our caps.
 */
import assert from 'node:assert/strict';
import { test } from 'node:test';
import { Body, Equator, Horizon, MakeTime, Observer } from 'astronomy-engine';
import { dateFromDays } from '../../src/ephemeris/time.ts';
import { render } from './support.ts';

const moonAltitude = (lonDeg: number, latDeg: number, utDays: number) => {
  const observer = new Observer(latDeg, lonDeg, 0);
  const time = MakeTime(dateFromDays(utDays));
  const eq = Equator(Body.Moon, time, observer, true, true);
  return Horizon(time, observer, eq.ra, eq.dec).altitude;
};

test('curve labels speak in words with the time, the code only a tag, and say rises where the Moon climbs and sets where it sinks (astronomy-engine, Equator/Horizon)', async () => {
  for (const date of ['2026-03-03', '2026-08-28', '2027-02-20']) {
    const { scene } = await render({ date, format: 'svg' });
    const labels = scene!.curveLabels;
    assert.ok(labels.length >= 6, `${date}: ${labels.length} labels`);
    for (const label of labels) {
      assert.match(label.words, /^Moon (rises|sets) (as|at) [a-z -]+ · \d\d:\d\d( [+−]\d days?)?$/, label.words);
      assert.ok(/^([PU][1-4])?$/.test(label.tag), label.tag);
      assert.ok(!/\b[PU][1-4]\b/.test(label.words), `no bare code in the words: ${label.words}`);
      const [lon, lat] = label.at;
      const climb = moonAltitude(lon, lat, label.utDays + 5 / 1440) - moonAltitude(lon, lat, label.utDays - 5 / 1440);
      assert.equal(label.words.startsWith('Moon rises'), climb > 0, `${date} ${label.words} at ${lon.toFixed(1)}, ${lat.toFixed(1)}: altitude changes by ${climb.toFixed(2)}° over 10 min`);
    }
  }
});

test('the codes are explained once, in the legend, not in the small print (common practice: one key per figure)', async () => {
  const { scene } = await render({ date: '2026-03-03', format: 'svg' });
  assert.ok(!/U1\/U4/.test(scene!.smallPrint));
  assert.ok(scene!.curveLabels.some((l) => l.tag === 'U2' && l.words.includes('as totality begins')));
});

test('marked towns: their own symbol (ink square, not the Moon-overhead ring\'s colour), labels clear of every drawn line and label, one clock per map unless asked (times via Intl, the IANA database)', async () => {
  const { findPlace } = await import('../../src/places/gazetteer.ts');
  const { renderMapFile, markLabel } = await import('../../src/outputs/mapFile.ts');
  const { civilClock } = await import('../../src/ephemeris/civilTime.ts');
  const { THEMES } = await import('../../src/figures/theme.ts');
  const { eclipseOn } = await import('./support.ts');
  const { visibilityOf } = await import('../../src/visibility/lunar/visibility.ts');
  const { fieldLines } = await import('../../src/visibility/lunar/fieldLines.ts');
  const { circleRing } = await import('../../src/sphere/circles.ts');
  const sharp = (await import('sharp')).default;
  const eclipse = eclipseOn('2026-03-03');
  const denver = civilClock('America/Denver');
  const places = ['Denver', 'Boulder', 'Cheyenne, US', 'Tokyo', 'Sydney', 'Honolulu'].map((name) => findPlace(name));
  const marks = places.map((p) => ({ ...p, tz: p.name === 'Tokyo' ? 'Asia/Tokyo' : p.name === 'Sydney' ? 'Australia/Sydney' : p.name === 'Honolulu' ? 'Pacific/Honolulu' : 'America/Denver' }));

  // One clock: Tokyo's greatest on the map's clock reads as Intl prints the instant in Denver; asked for, in Tokyo's own zone.
  // utDays count from J2000.0 = 2000-01-01 12:00 UT (Meeus ch. 7); rounded to the minute as printed.
  const greatest = new Date(Date.UTC(2000, 0, 1, 12) + Math.round(eclipse.greatest.utDays * 1440) * 60_000);
  const intlTime = (zone: string) => new Intl.DateTimeFormat('en-GB', { timeZone: zone, hour: '2-digit', minute: '2-digit', hourCycle: 'h23' }).format(greatest);
  const tokyo = marks.find((m) => m.name === 'Tokyo')!;
  assert.equal(markLabel(eclipse, tokyo, denver), `Tokyo · greatest ${intlTime('America/Denver')}`);
  assert.match(markLabel(eclipse, tokyo), new RegExp(`^Tokyo · greatest ${intlTime('Asia/Tokyo')} `));

  for (const [widthPx, heightPx] of [[1200, 675], [2400, 1350]] as const) {
    const style = { theme: THEMES.light, view: { projection: 'equal-earth' as const }, borders: 'countries' as const, clock: denver };
    const svgFile = await renderMapFile({ eclipse, style, size: { widthPx, heightPx }, dpi: 72, format: 'svg', generator: 'umbracast test', marks });
    const scene = svgFile.scene!;
    // Every drawn line (Moon-up edges, the field's lines) as page points.
    const visibility = visibilityOf(eclipse);
    const polylines = [
      ...visibility.stages.map((s) => circleRing(s.cap.centre, s.cap.radiusDeg, 0.5)),
      ...fieldLines(visibility).map((l) => l.line),
    ].map((line) => line.map((p) => scene.project([p[0]!, p[1]!])));
    const linePoints: [number, number][] = [];
    for (const line of polylines) {
      for (let k = 1; k < line.length; k++) {
        const a = line[k - 1];
        const b = line[k];
        if (!a || !b || Math.hypot(b[0] - a[0], b[1] - a[1]) > widthPx / 8) continue;
        for (let i = 0; i < 10; i++) linePoints.push([a[0] + ((b[0] - a[0]) * i) / 10, a[1] + ((b[1] - a[1]) * i) / 10]);
      }
    }
    const plates = scene.labelPlates.marks;
    assert.equal(plates.length, marks.length);
    for (const plate of plates) {
      const hits = linePoints.filter(([x, y]) => x > plate.left && x < plate.right && y > plate.top && y < plate.bottom).length;
      assert.equal(hits, 0, `${widthPx}px: a mark label lies on a line`);
    }
    // The symbol's pixels: the theme's ink, far from the Moon-overhead ring's colour.
    const png = await renderMapFile({ eclipse, style, size: { widthPx, heightPx }, dpi: 72, format: 'png', generator: 'umbracast test', marks });
    const { data, info } = await sharp(png.bytes).raw().toBuffer({ resolveWithObject: true });
    const [x, y] = scene.project([tokyo.lonDeg, tokyo.latDeg])!.map(Math.round) as [number, number];
    const at = (y * info.width + x) * info.channels;
    const pixel = [data[at]!, data[at + 1]!, data[at + 2]!];
    const hex = (h: string) => [1, 3, 5].map((i) => parseInt(h.slice(i, i + 2), 16));
    const distance = (a: number[], b: number[]) => Math.hypot(...a.map((v, i) => v - b[i]!));
    assert.ok(distance(pixel, hex(THEMES.light.text)) < 30, `symbol ${pixel}`);
    assert.ok(distance(pixel, hex(THEMES.light.centreMark)) > 150, 'unlike the Moon-overhead ring');
  }
});

test('times on another calendar day than the title\'s carry a day mark, in subtitle, caption and curve labels (calendar dates from Intl, the IANA database; Kiritimati at UTC+14, the world\'s earliest clock)', async () => {
  const { eclipseCaption } = await import('../../src/outputs/caption.ts');
  const { civilClock } = await import('../../src/ephemeris/civilTime.ts');
  const { visibilityOf } = await import('../../src/visibility/lunar/visibility.ts');
  const { eclipseOn } = await import('./support.ts');
  const intlDate = (utDays: number, zone: string) => new Intl.DateTimeFormat('en-CA', { timeZone: zone }).format(new Date(Date.UTC(2000, 0, 1, 12) + Math.round(utDays * 1440) * 60_000));
  const cases = [
    { date: '2027-02-20', zone: 'UTC', expect: '(21:12–01:13 +1 day)' },
    { date: '2027-02-20', zone: 'Asia/Tokyo', expect: '(06:12–10:13)' },
    { date: '2026-03-03', zone: 'Pacific/Kiritimati', expect: '(23:50 −1 day – 03:17)' },
  ];
  for (const c of cases) {
    const eclipse = eclipseOn(c.date);
    const [from, to] = eclipse.kind === 'penumbral' ? [eclipse.contacts.P1!, eclipse.contacts.P4!] : [eclipse.contacts.U1!, eclipse.contacts.U4!];
    // The premise, from Intl: do the ends fall on the date of greatest?
    const days = [from, to].map((m) => intlDate(m.utDays, c.zone) === intlDate(eclipse.greatest.utDays, c.zone));
    assert.equal(c.expect.includes('day'), days.includes(false), `${c.date} ${c.zone}: premise`);
    const { scene } = await render({ date: c.date, tz: c.zone, format: 'svg' });
    assert.ok(scene!.subtitle.includes(c.expect), `${scene!.subtitle} lacks ${c.expect}`);
    const caption = eclipseCaption(eclipse, visibilityOf(eclipse), civilClock(c.zone)).caption;
    assert.ok(caption.includes(c.expect.slice(1, -1)), `caption: ${caption.slice(0, 200)}`);
    for (const label of scene!.curveLabels) {
      const marked = / [+−]\d days?$/.test(label.words);
      assert.equal(marked, intlDate(label.utDays, c.zone) !== intlDate(eclipse.greatest.utDays, c.zone), label.words);
    }
  }
});

test('continent and ocean names: on world views by default, off on cards and regional views, switchable; never on a label, a mark or a line (names placed on Natural Earth\'s continents)', async () => {
  const { mapSettings, DEFAULT_MAP_CHOICES } = await import('../../src/settings/mapSettings.ts');
  const base = DEFAULT_MAP_CHOICES;
  assert.equal(mapSettings({ ...base }).style.areaNames, true);
  assert.equal(mapSettings({ ...base, projection: 'globe' }).style.areaNames, true);
  assert.equal(mapSettings({ ...base, preset: 'card' }).style.areaNames, false);
  assert.equal(mapSettings({ ...base, bbox: [-20, 30, 45, 72] }).style.areaNames, false);
  assert.equal(mapSettings({ ...base, preset: 'card', areaNames: 'on' }).style.areaNames, true);
  assert.equal(mapSettings({ ...base, areaNames: 'off' }).style.areaNames, false);
  // A plain-JavaScript caller may pass anything: the library's parameter is named.
  assert.throws(() => mapSettings({ ...base, areaNames: 'maybe' as 'auto' }), /areaNames: expected one of auto, on, off, received "maybe"/);

  const { visibilityOf } = await import('../../src/visibility/lunar/visibility.ts');
  const { fieldLines } = await import('../../src/visibility/lunar/fieldLines.ts');
  const { circleRing } = await import('../../src/sphere/circles.ts');
  const { eclipseOn } = await import('./support.ts');
  for (const [date, width, height] of [['2026-03-03', 2400, 1350], ['2026-08-28', 1200, 675], ['2027-02-20', 2126, 1318]] as const) {
    const { scene } = await render({ date, width, height, format: 'svg', areaNames: true });
    const names = scene!.areaNames;
    assert.ok(names.length >= 3, `${date}: ${names.map((n) => n.name)}`);
    const others = [...scene!.labelPlates.zones, ...scene!.labelPlates.marks];
    const visibility = visibilityOf(eclipseOn(date));
    const linePoints = [
      ...visibility.stages.map((s) => circleRing(s.cap.centre, s.cap.radiusDeg, 0.5)),
      ...fieldLines(visibility).map((l) => l.line),
    ].flatMap((line) => line.map((p) => scene!.project([p[0]!, p[1]!])).filter((p): p is [number, number] => p !== null));
    for (const { name, plate } of names) {
      for (const o of others) assert.ok(plate.right <= o.left || o.right <= plate.left || plate.bottom <= o.top || o.bottom <= plate.top, `${date}: ${name} on a label`);
      assert.ok(!linePoints.some(([x, y]) => x > plate.left && x < plate.right && y > plate.top && y < plate.bottom), `${date}: ${name} on a line`);
    }
    const { scene: off } = await render({ date, width, height, format: 'svg' });
    assert.equal(off!.areaNames.length, 0);
  }
  // On a globe and on a world's oval, a name stands on the map, not half on the paper around it: every corner
  // of its plate comes back to itself through the projection (d3-geo's inverse; off the sphere it does not).
  for (const view of [{ projection: 'globe' as const }, { projection: 'equal-earth' as const }]) {
    for (const date of ['2026-08-28', '2026-03-03']) {
      const { scene } = await render({ date, width: 2400, height: 1350, format: 'svg', areaNames: true, view });
      for (const { name, plate } of scene!.areaNames) {
        for (const corner of [[plate.left, plate.top], [plate.right, plate.top], [plate.left, plate.bottom], [plate.right, plate.bottom]] as [number, number][]) {
          const lonLat = scene!.unproject(corner);
          const back = lonLat && Number.isFinite(lonLat[0]) && Number.isFinite(lonLat[1]) ? scene!.project(lonLat) : null;
          assert.ok(back && Math.hypot(back[0] - corner[0], back[1] - corner[1]) < 1, `${view.projection} ${date}: ${name} reaches off the map at ${corner.map((v) => v.toFixed(0))}`);
        }
      }
    }
  }
});
