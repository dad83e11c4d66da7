/**
 * Solar maps: every theme and preset and several projections render, the
 * short eye-safety caution stands in the header band of every one (read back
 * from the SVG as the outlined lines the page frame draws), the lunar
 * naked-eye line is nowhere, labels stay on the page and apart, and the same
 * request gives the same bytes. Sources are named beside each check.
 */
import assert from 'node:assert/strict';
import { test } from 'node:test';
import sharp from 'sharp';
import { findSolarEclipses } from '../../src/eclipses/solar/catalogue.ts';
import type { SolarEclipse } from '../../src/eclipses/solar/types.ts';
import { textElement, overlaps, type Box } from '../../src/figures/draw.ts';
import { THEME_NAMES, THEMES, type ThemeName } from '../../src/figures/theme.ts';
import type { View } from '../../src/figures/projection.ts';
import { civilClock } from '../../src/ephemeris/civilTime.ts';
import { renderMapFile, solarMarkLabel, type SolarMapFile } from '../../src/outputs/mapFile.ts';
import { DEFAULT_MAP_CHOICES, mapSettings, type SizePreset } from '../../src/settings/mapSettings.ts';
import { solarSafetyText } from '../../src/words/solar/caution.ts';

const eclipseOn = (date: string): SolarEclipse => {
  const [e] = findSolarEclipses({ from: new Date(`${date}T00:00:00Z`), to: new Date(`${date}T23:59:59Z`) });
  if (!e) throw new Error(`no solar eclipse on ${date}`);
  return e;
};
const TOTAL = eclipseOn('2024-04-08');

/** The lunar outputs' last line (words/lunar/figures.ts): it must never reach a solar output. */
const NAKED_EYE = /naked eye/i;

async function renderSolar(eclipse: SolarEclipse, options: { theme?: ThemeName; preset?: SizePreset; view?: View; title?: string; format?: 'svg' | 'png' } = {}): Promise<SolarMapFile> {
  const settings = mapSettings({ ...DEFAULT_MAP_CHOICES, theme: options.theme ?? 'light', ...(options.preset ? { preset: options.preset } : { size: { widthPx: 1200, heightPx: 675 } }), ...(options.title ? { title: options.title } : {}) });
  const style = options.view ? { ...settings.style, view: options.view } : settings.style;
  return renderMapFile({ eclipse, ...settings, style, format: options.format ?? 'svg', generator: 'umbracast test' });
}

/** The caution's lines are in the SVG as the frame outlines them, above the map, and say the whole short caution. */
function assertCautionInHeader(file: SolarMapFile, expected: string) {
  const scene = file.scene!;
  const svg = Buffer.from(file.bytes).toString('utf8');
  const theme = svg.includes(THEMES.dark.paper) ? THEMES.dark : svg.includes(`fill="${THEMES.print.paper}"/>`) ? THEMES.print : THEMES.light;
  assert.ok(scene.cautionLines.length > 0, 'the caution has lines in the header');
  assert.equal(scene.cautionLines.map((l) => l.text).join(' '), expected, 'the whole short caution, as words/solar/caution.ts gives it');
  for (const line of scene.cautionLines) {
    assert.ok(svg.includes(textElement(line.text, line.x, line.y, line.style, theme.text)), `the SVG draws "${line.text}"`);
    assert.ok(line.y < scene.frame.y, `"${line.text}" stands above the map (baseline ${line.y.toFixed(1)} < ${scene.frame.y.toFixed(1)})`);
  }
  assert.ok(!NAKED_EYE.test(svg) && !NAKED_EYE.test(scene.smallPrint) && !NAKED_EYE.test(file.captionFile ?? ''), 'no naked-eye line');
}

/** Every label plate inside the map's frame, and no two overlapping. */
function assertLabelsApart(file: SolarMapFile) {
  const { frame, labelPlates } = file.scene!;
  const plates: Box[] = [...labelPlates.lines, ...labelPlates.marks];
  for (const p of plates) {
    assert.ok(p.left >= frame.x - 0.5 && p.right <= frame.x + frame.width + 0.5 && p.top >= frame.y - 0.5 && p.bottom <= frame.y + frame.height + 0.5, `plate ${JSON.stringify(p)} on the map`);
  }
  for (let i = 0; i < plates.length; i++) for (let j = i + 1; j < plates.length; j++) assert.ok(!overlaps(plates[i]!, plates[j]!), `plates ${i} and ${j} overlap`);
}

// The caution's content is the issue's own (issue 15, "Eye safety"): a total eclipse's map serves readers in and out of the path.
const WHOLE = solarSafetyText('short', 'whole-eclipse');
const NO_TOTALITY = solarSafetyText('short', 'no-totality');

for (const theme of THEME_NAMES) {
  for (const preset of ['card', 'square', 'print'] as const) {
    test(`solar map, ${theme} theme, ${preset} preset: caution in the header band, no naked-eye line, labels apart`, async () => {
      const file = await renderSolar(TOTAL, { theme, preset });
      assertCautionInHeader(file, WHOLE);
      assertLabelsApart(file);
      // A card shows the path (issue 15, "Outputs": a regional view fitted to the path by default for cards); the others the world.
      assert.equal(file.scene!.view.projection, preset === 'card' ? 'region' : 'equal-earth');
    });
  }
}

test('solar maps in other projections and of each kind: annular, hybrid and partial eclipses, globe, equirectangular, a box', async () => {
  const cases: { date: string; view?: View; caution: string }[] = [
    // Kinds of these eclipses from memory: 2023-10-14 annular, 2023-04-20 hybrid, 2025-03-29 partial.
    { date: '2023-10-14', view: { projection: 'globe' }, caution: NO_TOTALITY },
    { date: '2023-04-20', view: { projection: 'equirectangular' }, caution: WHOLE },
    { date: '2025-03-29', caution: NO_TOTALITY },
    { date: '2024-04-08', view: { projection: 'region', bbox: [-110, 15, -60, 50] }, caution: WHOLE },
  ];
  for (const c of cases) {
    const file = await renderSolar(eclipseOn(c.date), c.view ? { view: c.view } : {});
    assertCautionInHeader(file, c.caution);
    assertLabelsApart(file);
  }
  // A partial eclipse has no path: its card shows the world.
  const card = await renderSolar(eclipseOn('2025-03-29'), { preset: 'card' });
  assert.equal(card.scene!.view.projection, 'equal-earth');
});

test('a custom title cannot remove the caution', async () => {
  const file = await renderSolar(TOTAL, { title: 'Night Notes: the April eclipse' });
  assert.equal(file.scene!.title, 'Night Notes: the April eclipse');
  assertCautionInHeader(file, WHOLE);
});

test('same request, same bytes; the PNG carries the long caution in its XMP description and the caption file', async () => {
  const a = await renderSolar(TOTAL, { preset: 'card', format: 'png', theme: 'print' });
  const b = await renderSolar(TOTAL, { preset: 'card', format: 'png', theme: 'print' });
  assert.ok(Buffer.from(a.bytes).equals(Buffer.from(b.bytes)), 'identical PNG bytes (deterministic output: common practice)');
  // PNG signature (ISO/IEC 15948, 5.2).
  assert.deepEqual([...a.bytes.subarray(0, 8)], [0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]);
  const long = solarSafetyText('long', 'whole-eclipse');
  assert.ok(a.captionFile!.includes(long), 'the caption file carries the long caution');
  // The XMP packet (ISO 16684-1), read back by sharp (an independent reader of the file's metadata).
  const xmp = (await sharp(Buffer.from(a.bytes)).metadata()).xmp;
  assert.ok(xmp, 'an XMP packet');
  const text = xmp.toString('utf8');
  assert.ok(text.includes('ISO 12312-2') && text.includes('at no time is it safe to look without a filter'), 'the caution in the XMP description');
  assert.ok(!NAKED_EYE.test(text));
});

test('marks say what each place sees: kind, time of maximum, duration', () => {
  const clock = civilClock('UTC');
  // From memory: at Dallas on 2024-04-08 totality lasted about 3 min 50 s, around 18:42 UTC; Mexico City saw a deep partial
  // (about 75 % of the Sun's diameter) around 18:10 UTC; Perth saw nothing.
  const dallas = solarMarkLabel(TOTAL, { name: 'Dallas', latDeg: 32.78, lonDeg: -96.8, tz: 'America/Chicago' }, clock);
  assert.match(dallas, /^Dallas · total 18:4\d, 3 min [45]\d s$/);
  const mexico = solarMarkLabel(TOTAL, { name: 'Mexico City', latDeg: 19.43, lonDeg: -99.13, tz: 'America/Mexico_City' }, clock);
  assert.match(mexico, /^Mexico City · [6-8]\d % at 18:1\d$/);
  assert.equal(solarMarkLabel(TOTAL, { name: 'Perth', latDeg: -31.95, lonDeg: 115.86, tz: 'Australia/Perth' }, clock), 'Perth · not seen');
  // On its own clock a place names its zone (CDT: UTC−5 in April, IANA tzdata).
  assert.match(solarMarkLabel(TOTAL, { name: 'Dallas', latDeg: 32.78, lonDeg: -96.8, tz: 'America/Chicago' }), /total 13:4\d CDT/);
});

test('a solar map in GeoJSON is the solar geometry collection, with the long caution', async () => {
  const file = await renderSolar(TOTAL, { format: 'svg' });
  assert.ok(file.scene);
  const settings = mapSettings(DEFAULT_MAP_CHOICES);
  const geo = await renderMapFile({ eclipse: TOTAL, ...settings, format: 'geojson', generator: 'umbracast test' });
  const doc = JSON.parse(Buffer.from(geo.bytes).toString('utf8'));
  // RFC 7946 §3.3: a FeatureCollection; our schema names the solar geometry.
  assert.equal(doc.type, 'FeatureCollection');
  assert.equal(doc.umbracast.schema, 'umbracast.solar-geometry/1');
  assert.equal(doc.umbracast.safety, solarSafetyText('long', 'whole-eclipse'));
  assert.ok(doc.features.some((f: { properties: { layer: string } }) => f.properties.layer === 'path'));
});
