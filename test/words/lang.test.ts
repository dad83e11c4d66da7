/**
 * Outputs in the reader's language (issue 16, point 2). Sources named beside
 * each check: the English catalogue's own key list (message catalogues carry
 * the same keys in every language: common practice); ECMA-402 Intl (dates,
 * numbers); the IBM Plex Sans font files read by opentype.js (an independent
 * parser from the registry) for glyph coverage; BCP 47 (RFC 5646) for tags.
 */
import assert from 'node:assert/strict';
import { test } from 'node:test';
import { LANGUAGES, LANGUAGE_TAGS, chooseLanguage, type Language } from '../../src/settings/language.ts';
import { solarLocalCsv, solarLocalIcs, solarLocalJson, solarLocalMarkdown, solarLocalReport, solarLocalTable } from '../../src/outputs/solarLocal.ts';
import { solarCaption, solarCaptionText } from '../../src/outputs/solarCaption.ts';
import { solarMarkLabel } from '../../src/outputs/mapFile.ts';
import { contourLabel, riseSetLabel, solarLegendWords } from '../../src/words/solar/figures.ts';
import { solarDiagramCaption } from '../../src/words/solar/diagram.ts';
import { diagramCaption } from '../../src/words/lunar/diagram.ts';
import { composeSolarDiagramScene } from '../../src/figures/solar/diagram.ts';
import { composeDiagramScene } from '../../src/figures/diagram.ts';
import { shadowDiagram } from '../../src/eclipses/lunar/diagram.ts';
import { solarDiscsAtMaximum, solarLocalCircumstances } from '../../src/local/solar.ts';
import { solarEclipseOn } from '../eclipses/solarSupport.ts';
import { catalogueDocument } from '../../src/outputs/catalogueRecord.ts';
import { catalogueTable } from '../../src/outputs/catalogueFormats.ts';
import { findEclipses } from '../../src/eclipses/kinds.ts';
import { civilClock } from '../../src/ephemeris/civilTime.ts';
import { InputError } from '../../src/errors.ts';
import { listWords, type CommonWords } from '../../src/words/common.ts';
import { solarSafetyText } from '../../src/words/solar/caution.ts';
import { localReport, localTable, localMarkdown, localIcs, localJson } from '../../src/outputs/localFormats.ts';
import { eclipseCaption, captionText } from '../../src/outputs/caption.ts';
import { visibilityOf } from '../../src/visibility/lunar/visibility.ts';
import { renderMapFile, markLabel } from '../../src/outputs/mapFile.ts';
import { renderSkyFile } from '../../src/outputs/skyFile.ts';
import { mapSettings, DEFAULT_MAP_CHOICES, type SizePreset } from '../../src/settings/mapSettings.ts';
import { mapLegendWords } from '../../src/words/lunar/figures.ts';
import { THEMES } from '../../src/figures/theme.ts';
import { layoutFor } from '../../src/figures/draw.ts';
import { measureText, missingGlyphs } from '../../src/figures/typography.ts';
import { overlaps, type Box } from '../../src/figures/draw.ts';
import { findPlace } from '../../src/places/gazetteer.ts';
import { eclipseOn } from '../figures/support.ts';

const OTHERS = LANGUAGE_TAGS.filter((tag) => tag !== 'en');

// ---- every language has every key ------------------------------------------------------------

/** Every key path of a catalogue and the kind of value there ("string", "function", "array:8"). */
function keyPaths(value: unknown, path = ''): string[] {
  if (typeof value === 'function') return [`${path}: function`];
  if (typeof value === 'string') return [`${path}: string`];
  if (Array.isArray(value)) return [`${path}: array:${value.length}`, ...value.flatMap((v, i) => keyPaths(v, `${path}[${i}]`))];
  if (value && typeof value === 'object') {
    return Object.keys(value).sort().flatMap((k) => keyPaths((value as Record<string, unknown>)[k], path ? `${path}.${k}` : k));
  }
  return [`${path}: ${typeof value}`];
}

/** The parts compared: `andBefore` is optional (only Spanish changes its "and"); `countryNames` lists exceptions, not keys. */
const keysOf = (value: unknown) => keyPaths(value).filter((line) => !/countryNames|andBefore|: undefined$/.test(line) && !/^tag:/.test(line));
const withoutCountryNames = (common: CommonWords) => ({ ...common, andBefore: undefined, countryNames: undefined });

/**
 * The catalogues still being written: optional until every language has them (a language lacking one is
 * refused for the outputs that need it). Each is compared on its own, for every language that has it.
 */
const PARTS_IN_PROGRESS = {
  'lunar.diagram': (l: Language) => l.lunar.diagram,
  'solar.text': (l: Language) => l.solar.text,
  'solar.figures': (l: Language) => l.solar.figures,
  'solar.diagram': (l: Language) => l.solar.diagram,
} as const;

/** A language's catalogues without the parts still being written. */
const compared = (language: Language) => keysOf({
  ...language,
  common: withoutCountryNames(language.common),
  lunar: { ...language.lunar, diagram: undefined },
  solar: { ...language.solar, text: undefined, figures: undefined, diagram: undefined },
});
/** One part still being written, its shared words set aside (compared above). */
const comparedPart = (part: { readonly common: CommonWords } | undefined) => (part === undefined ? undefined : keysOf({ ...part, common: undefined }));

test('every language has every key of the English catalogues, of the same shape (the English key list: common practice)', () => {
  const english = compared(LANGUAGES.en);
  assert.ok(english.length > 250, `${english.length} keys`);
  for (const tag of OTHERS) assert.deepEqual(compared(LANGUAGES[tag]), english, tag);
});

test('the solar words and the diagram words: English has them all, and every language that has a part has every key of it, of the same shape (common practice)', () => {
  for (const [name, part] of Object.entries(PARTS_IN_PROGRESS)) {
    const english = comparedPart(part(LANGUAGES.en));
    assert.ok(english !== undefined && english.length > 10, `English ${name}`);
    for (const tag of OTHERS) {
      const other = part(LANGUAGES[tag]);
      if (other === undefined) continue;
      assert.deepEqual(comparedPart(other), english, `${tag} ${name}`);
      assert.equal(other.common, LANGUAGES[tag].common, `${tag} ${name}: the language's own shared words`);
    }
  }
});

test('each catalogue names its own language for Intl, and the body it serves (BCP 47, RFC 5646)', () => {
  for (const tag of LANGUAGE_TAGS) {
    const language = LANGUAGES[tag];
    assert.equal(new Intl.Locale(language.common.locale).language, tag);
    assert.equal(language.common.clock.locale.split('-')[0], tag);
    assert.equal(language.lunar.common, language.common);
    assert.equal(language.lunar.figures.common, language.common);
    assert.equal(language.solar.common, language.common);
    assert.equal(language.lunar.body, 'lunar');
    assert.equal(language.solar.body, 'solar');
  }
});

// ---- the language chosen ----------------------------------------------------------------------

test('--lang takes a BCP 47 tag, a region reaching Intl; anything else is one InputError naming the parameter and the tags offered (RFC 5646)', () => {
  assert.equal(chooseLanguage(undefined), LANGUAGES.en);
  assert.equal(chooseLanguage('es'), LANGUAGES.es);
  assert.equal(chooseLanguage('DE').tag, 'de');
  assert.equal(chooseLanguage('en-GB'), LANGUAGES.en);
  const mexico = chooseLanguage('es-MX');
  assert.equal(mexico.tag, 'es');
  assert.equal(mexico.common.locale, 'es-MX');
  assert.equal(mexico.lunar.figures.common.clock.locale, 'es-MX');
  for (const bad of ['xx', 'nl', 'en_GB!', '']) {
    assert.throws(() => chooseLanguage(bad, 'lang'), (e: unknown) => e instanceof InputError && e.parameter === 'lang' && /en, es, fr, de, pt, it/.test(e.message), bad);
  }
});

test('a language in a script the bundled type lacks is refused with that reason, never drawn as boxes (Unicode CLDR likely scripts via Intl.Locale.maximize)', () => {
  for (const tag of ['ja', 'zh', 'ar', 'hi', 'he', 'th', 'ko']) {
    assert.throws(() => chooseLanguage(tag), (e: unknown) => e instanceof InputError && /has no letters of the \w{4} script/.test(e.message), tag);
  }
  // Latin, Greek and Cyrillic are drawn; a language so written but without a catalogue is refused as not offered.
  assert.throws(() => chooseLanguage('ru'), (e: unknown) => e instanceof InputError && !/script/.test(e.message));
});

// ---- the font has every glyph --------------------------------------------------------------

/** Every string a catalogue holds, and what its functions write around sample values. */
function catalogueTexts(value: unknown, seen = new Set<unknown>()): string[] {
  if (seen.has(value)) return [];
  if (typeof value === 'string') return [value];
  if (typeof value === 'function') {
    const out: string[] = [];
    for (const args of SAMPLE_ARGS) {
      try {
        const result = (value as (...a: unknown[]) => unknown)(...args);
        if (typeof result === 'string') out.push(result);
        else if (Array.isArray(result)) out.push(...result.filter((r) => typeof r === 'string'));
      } catch {
        // Not this shape of arguments: the next sample fits it.
      }
    }
    return out;
  }
  if (value && typeof value === 'object') {
    seen.add(value);
    return Object.values(value).flatMap((v) => catalogueTexts(v, seen));
  }
  return [];
}
const MARK = '\u0001';
const SAMPLE_ARGS: unknown[][] = [
  [MARK, MARK, MARK, MARK, MARK, MARK],
  [1], [2], [-1], [5],
  [[69.1, 69.1]], [[69.1, 70.2]],
  [true, MARK, MARK, MARK], [false, MARK, undefined, MARK],
  [MARK, 'whole'], [MARK, 'most'], [MARK, 'parts'],
  [10, MARK], [30, MARK], [60, MARK],
  [MARK, MARK, { duration: MARK, span: MARK }, MARK, MARK], [MARK, MARK, undefined, MARK, MARK],
  [MARK, MARK, MARK, 69.1, MARK], [MARK, 69.1, MARK, MARK],
];

test('the bundled type (IBM Plex Sans, regular and semibold) has a glyph for every character every catalogue uses, the caution included (the font\'s cmap via opentype.js)', () => {
  for (const tag of LANGUAGE_TAGS) {
    const language = LANGUAGES[tag];
    const texts = [...catalogueTexts(language), solarSafetyText('long', 'whole-eclipse', language.solar), solarSafetyText('short', 'whole-eclipse', language.solar)]
      .join(' ').replaceAll(MARK, ' ');
    // Dates and numbers through Intl in this language: every month name, both decimal signs.
    const months = Array.from({ length: 12 }, (_, m) => new Intl.DateTimeFormat(language.common.locale, { month: 'long', timeZone: 'UTC' }).format(Date.UTC(2026, m, 15)));
    const all = `${texts} ${months.join(' ')} ${new Intl.NumberFormat(language.common.locale).format(1234.5)}`;
    for (const weight of ['regular', 'semibold'] as const) assert.deepEqual(missingGlyphs(all, weight), [], `${tag} ${weight}`);
  }
  // The check can fail: a script the font lacks is reported.
  assert.deepEqual(missingGlyphs('日食 a'), ['日', '食']);
});

// ---- no English left -----------------------------------------------------------------------

/**
 * The English catalogues' phrases: the fixed parts of every value, cut at
 * punctuation and at the sample values, of two words or more — less any
 * phrase the language's own catalogue also writes (proper names, "Natural
 * Earth via world-atlas" in French…).
 */
function phrasesOf(language: Language): Set<string> {
  const parts = catalogueTexts(language).flatMap((text) => text.split(/[\u0001;:.,()·\n"“”«»–—]|\s[–-]\s/));
  return new Set(parts.map((p) => p.trim()).filter((p) => /\p{L}{3,}/u.test(p) && p.split(/\s+/).length >= 2));
}
const ENGLISH_PHRASES = phrasesOf(LANGUAGES.en);
/** Words only English writes, checked one by one. */
const ENGLISH_WORDS = /\b(the|and|from|with|Moon|eclipse|Greatest|rises|sets|Shadow|convention|Times|Alt text|Made with|Type|Basemap|Places|daylight|twilight|horizon below|minutes|totality)\b/;

/** Single words of the English catalogues (four letters or more; country names aside: those come from i18n-iso-countries), less those the language's own catalogue writes too. */
const wordsOf = (language: Language) =>
  new Set(catalogueTexts(language, new Set([language.common.countryNames])).flatMap((t) => t.match(/\p{L}{4,}/gu) ?? []));
const ENGLISH_SINGLE = wordsOf(LANGUAGES.en);

function leaks(fullText: string, language: Language): string[] {
  // IANA zone identifiers ("Pacific/Auckland") are codes, not words (RFC 6557).
  const text = fullText.replace(/\b[A-Z][A-Za-z]+(\/[A-Za-z_+-]+)+/g, '');
  const own = phrasesOf(language);
  const ownWords = wordsOf(language);
  const textWords = new Set(text.match(/\p{L}{4,}/gu) ?? []);
  const single = [...ENGLISH_SINGLE].filter((w) => !ownWords.has(w) && textWords.has(w));
  const found = [...[...ENGLISH_PHRASES].filter((phrase) => !own.has(phrase) && text.includes(phrase)), ...single];
  const word = ENGLISH_WORDS.exec(text);
  return word && !catalogueTexts(language).some((t) => new RegExp(`\\b${word[0]}\\b`).test(t)) ? [...found, word[0]] : found;
}

/** What a reader reads of a calendar: its SUMMARY, DESCRIPTION and LOCATION lines, unfolded (RFC 5545 §3.1). */
const icsReadable = (ics: string) => ics.replace(/\r\n /g, '').split('\r\n').filter((l) => /^(SUMMARY|DESCRIPTION|LOCATION):/.test(l)).join('\n');

const PLACES = [
  { date: '2026-03-03', place: 'Adelaide', zone: 'Australia/Adelaide' }, // sees totality, the Moon rising in the penumbral phase
  { date: '2025-09-07', place: 'Auckland', zone: 'Pacific/Auckland' }, // the Moon sets during it
  { date: '2026-08-28', place: 'Denver', zone: 'America/Denver' }, // partial, across midnight
  { date: '2027-02-20', place: 'Nairobi', zone: 'Africa/Nairobi' }, // penumbral
];

test('the sanity of the leak check: English output is full of English phrases, so the check can fail (the English catalogue itself)', () => {
  const { date, place, zone } = PLACES[0]!;
  const report = localReport(eclipseOn(date), { place: { ...findPlace(place), tz: zone }, clock: civilClock(zone) });
  assert.ok(leaks(localTable(report), LANGUAGES.es).length > 5);
});

test('local tables, markdown, calendars, JSON summaries and captions carry no English in any other language (the English catalogue\'s phrases)', () => {
  for (const tag of OTHERS) {
    const language = LANGUAGES[tag];
    for (const { date, place, zone } of PLACES) {
      const eclipse = eclipseOn(date);
      const report = localReport(eclipse, { place: { ...findPlace(place), tz: zone }, clock: civilClock(zone) }, language.lunar);
      const texts = {
        table: localTable(report),
        markdown: localMarkdown(report).replace(/<\/?small>/g, ''), // the HTML element is markup, not words
        ics: icsReadable(localIcs(report, 'umbracast test')),
        json: JSON.parse(localJson(report)).summary as string,
        caption: captionText(eclipseCaption(eclipse, visibilityOf(eclipse), civilClock(zone, 'zone', language.common.clock), report.summary, language.lunar), language.lunar),
        mark: markLabel(eclipse, { ...findPlace(place), tz: zone }, undefined, language.lunar),
      };
      for (const [name, text] of Object.entries(texts)) assert.deepEqual(leaks(text, language), [], `${tag} ${date} ${place} ${name}:\n${text}`);
    }
  }
});

test('dates, times and numbers go through Intl in the language: month names, the decimal sign, 24-hour times (ECMA-402)', () => {
  const eclipse = eclipseOn('2026-03-03');
  const expectedDate = (locale: string) => new Intl.DateTimeFormat(locale, { day: 'numeric', month: 'long', year: 'numeric', timeZone: 'UTC' }).format(Date.UTC(2026, 2, 3));
  for (const tag of LANGUAGE_TAGS) {
    const language = LANGUAGES[tag];
    const clock = civilClock('UTC', 'zone', language.common.clock);
    const caption = eclipseCaption(eclipse, visibilityOf(eclipse), clock, undefined, language.lunar).caption;
    assert.ok(caption.includes(expectedDate(language.common.clock.locale)), `${tag}: ${caption.slice(0, 80)}`);
    // Umbral magnitude 1.15 (from memory: the 2026 March 3 eclipse, about 1.15), written with the language's decimal sign.
    const sign = new Intl.NumberFormat(language.common.locale).formatToParts(0.5).find((p) => p.type === 'decimal')!.value;
    assert.match(caption, new RegExp(`1\\${sign}1\\d\\d`), tag);
    assert.match(caption, /\b11:34\b/, tag);
  }
  // A Julian date before the reform, in the language's month names (1100 March 1 = 23 February Julian: Meeus ch. 7).
  assert.equal(civilClock('UTC', 'zone', LANGUAGES.es.common.clock).date(Date.UTC(1100, 2, 1, 12) / 86_400_000 - 10957.5), '1 de marzo de 1100 (juliano: 23 de febrero de 1100)');
  assert.equal(civilClock('UTC', 'zone', LANGUAGES.de.common.clock).date(Date.UTC(1100, 2, 1, 12) / 86_400_000 - 10957.5), '1. März 1100 (julianisch: 23. Februar 1100)');
});

test('"and" in a list: Spanish writes "e" before an i sound, "y" before hie- (Real Academia Española, Ortografía 2010)', () => {
  assert.equal(listWords(['Francia', 'Italia'], LANGUAGES.es.common), 'Francia e Italia');
  assert.equal(listWords(['Chile', 'Hierro'], LANGUAGES.es.common), 'Chile y Hierro');
  assert.equal(listWords(['Chile', 'Perú'], LANGUAGES.es.common), 'Chile y Perú');
  assert.equal(listWords(['Chile', 'Perú'], LANGUAGES.it.common), 'Chile e Perú');
});

test('the solar caution in every language: every sentence of the long form kept, ISO 12312-2 named, the scope\'s own middle, never empty (ISO 12312-2; the English caution\'s content)', () => {
  for (const tag of LANGUAGE_TAGS) {
    const solar = LANGUAGES[tag].solar;
    for (const scope of ['totality', 'no-totality', 'whole-eclipse'] as const) {
      const long = solarSafetyText('long', scope, solar);
      const short = solarSafetyText('short', scope, solar);
      for (const text of [long, short]) assert.match(text, /ISO 12312-2/, `${tag} ${scope}`);
      const c = solar.caution.long;
      for (const sentence of [c.viewers, c.neverUnprotected, c.optics, c.children, c.authorities]) assert.ok(long.includes(sentence), `${tag} ${scope}`);
      assert.equal(long.includes(c.totality), scope !== 'no-totality', `${tag} ${scope}`);
      assert.equal(long.includes(c.noTotality), scope !== 'totality', `${tag} ${scope}`);
    }
    // The lunar naked-eye line is not the solar caution, in any language.
    assert.ok(!solarSafetyText('long', 'whole-eclipse', solar).includes(LANGUAGES[tag].lunar.figures.nakedEye));
  }
});

// ---- the figures -----------------------------------------------------------------------------

const PRESETS: readonly SizePreset[] = ['card', 'square', 'print'];

test('maps in every language at every preset: no English on them, the title whole, every legend entry within the page, labels on the page and apart (the English catalogue\'s phrases; the layout\'s own measures)', async () => {
  const eclipse = eclipseOn('2026-03-03');
  const visibility = visibilityOf(eclipse);
  for (const tag of OTHERS) {
    const language = LANGUAGES[tag];
    for (const preset of PRESETS) {
      const settings = mapSettings({ ...DEFAULT_MAP_CHOICES, preset, lang: tag, marks: ['Adelaide'], areaNames: 'on', dpi: preset === 'print' ? 150 : undefined } as never);
      const file = await renderMapFile({ eclipse, ...settings, format: 'svg', generator: 'umbracast test' });
      const scene = file.scene!;
      const { widthPx: W, heightPx: H } = settings.size;
      const layout = layoutFor(settings.size);
      const legend = mapLegendWords(eclipse, visibility.fieldSpan.phase, visibility.stages.map((s) => s.name).filter((n) => n !== 'greatest'), false, language.lunar.figures);
      const drawn = [scene.title, scene.subtitle, scene.smallPrint, ...scene.curveLabels.map((l) => l.words), ...scene.areaNames.map((a) => a.name), ...Object.values(legend)].join('\n');
      assert.deepEqual(leaks(drawn, language), [], `${tag} ${preset}:\n${drawn}`);
      assert.ok(measureText(scene.title, layout.titleStyle) <= W - 2 * layout.margin, `${tag} ${preset}: title ${scene.title}`);
      for (const entry of Object.values(legend)) assert.ok(measureText(entry, layout.legendStyle) + 40 * layout.unit <= W - 2 * layout.margin, `${tag} ${preset}: ${entry}`);
      const plates: Box[] = [...scene.labelPlates.zones, ...scene.labelPlates.marks, ...scene.areaNames.map((a) => a.plate)];
      assert.ok(plates.length >= 6, `${tag} ${preset}: ${plates.length} plates`);
      for (const p of plates) assert.ok(p.left >= 0 && p.top >= 0 && p.right <= W && p.bottom <= H, `${tag} ${preset}: a plate off the page`);
      for (const [i, a] of plates.entries()) for (const b of plates.slice(i + 1)) assert.ok(!overlaps(a, b), `${tag} ${preset}: two labels overlap`);
    }
  }
});

test('sky figures in every language: no English in the title, summary, small print or caption, the title whole (the English catalogue\'s phrases)', async () => {
  const eclipse = eclipseOn('2026-03-03');
  for (const tag of OTHERS) {
    const language = LANGUAGES[tag];
    const zone = 'Australia/Adelaide';
    const report = localReport(eclipse, { place: { ...findPlace('Adelaide'), tz: zone }, clock: civilClock(zone) }, language.lunar);
    const file = await renderSkyFile({ report, theme: THEMES.light, size: { widthPx: 1600, heightPx: 900 }, dpi: 72, format: 'svg', generator: 'umbracast test' });
    const title = /<title[^>]*>([^<]*)<\/title>/.exec(file.svg)![1]!;
    const texts = [title, file.description, file.caption].join('\n');
    assert.deepEqual(leaks(texts, language), [], `${tag}:\n${texts}`);
    assert.ok(measureText(title, layoutFor({ widthPx: 1600, heightPx: 900 }).titleStyle) <= 1600 - 2 * layoutFor({ widthPx: 1600, heightPx: 900 }).margin, `${tag}: ${title}`);
  }
});

// ---- the solar words and the shadow diagrams -------------------------------------------------
// These iterate over every language other than English (every catalogue has the solar and diagram words:
// the type requires them, and the shape test above compares them key by key with English).

const SOLAR_READY = OTHERS;
const LUNAR_DIAGRAM_READY = OTHERS;

/** Places of our own choosing (positions, zones): totality, an annular phase, partial phases, the Sun down throughout, outside the shadow. */
const SOLAR_CASES = [
  { id: '2026-08-12', name: 'Kestrel Ridge (test)', latDeg: 64.15, lonDeg: -21.94, tz: 'Atlantic/Reykjavik' },
  { id: '2027-08-02', name: 'Night Notes office (test)', latDeg: 25.69, lonDeg: 32.64, tz: 'Africa/Cairo' },
  { id: '2024-10-02', name: 'Rapa Nui (test)', latDeg: -27.1, lonDeg: -109.4, tz: 'Pacific/Easter' },
  { id: '2024-04-08', name: 'Front Range (test)', latDeg: 39.74, lonDeg: -104.99, tz: 'America/Denver' },
  { id: '2026-08-12', name: 'Aegean shore (test)', latDeg: 37.98, lonDeg: 23.73, tz: 'Europe/Athens' },
  { id: '2026-08-12', name: 'Harbour city (test)', latDeg: -33.87, lonDeg: 151.21, tz: 'Australia/Sydney' },
] as const;

/** Every text of one place's solar outputs in a language: the local formats, the caption with the place's summary, a map mark. */
function solarTexts(c: (typeof SOLAR_CASES)[number], language: Language): Record<string, string> {
  const eclipse = solarEclipseOn(c.id);
  const place = { name: c.name, latDeg: c.latDeg, lonDeg: c.lonDeg, tz: c.tz };
  const report = solarLocalReport(eclipse, { place, clock: civilClock(c.tz) }, language.solar);
  const json = JSON.parse(solarLocalJson(report)) as { summary: string; safety: string };
  const clock = civilClock('UTC', 'zone', language.common.clock);
  return {
    table: solarLocalTable(report),
    markdown: solarLocalMarkdown(report).replace(/<\/?small>/g, ''), // the HTML element is markup, not words
    ics: icsReadable(solarLocalIcs(report, 'umbracast test')),
    json: `${json.summary} ${json.safety}`,
    csvSafety: solarLocalCsv(report).split('\n')[1]!.replace(/^safety,+/, ''), // the row's code is data; its note the reader's
    caption: solarCaptionText(solarCaption(eclipse, { clock, solar: language.solar, extra: report.summary, cities: 2 }), language.solar.text),
    mark: solarMarkLabel(eclipse, place, undefined, language.solar),
  };
}

test('the sanity of the solar leak check: English solar outputs are full of English phrases, so the check can fail (the English catalogue itself)', () => {
  const texts = solarTexts(SOLAR_CASES[0], LANGUAGES.en);
  assert.ok(leaks(texts.table!, LANGUAGES.es).length > 5, texts.table);
  assert.ok(leaks(texts.caption!, LANGUAGES.fr).length > 5);
});

test('solar local tables, markdown, calendars, JSON, CSV caution, captions and map marks carry no English in any language that has the solar words (the English catalogue\'s phrases)', () => {
  for (const tag of SOLAR_READY) {
    const language = LANGUAGES[tag];
    for (const c of SOLAR_CASES) {
      for (const [name, text] of Object.entries(solarTexts(c, language))) assert.deepEqual(leaks(text, language), [], `${tag} ${c.id} ${c.name} ${name}:\n${text}`);
    }
  }
});

test('the solar words in every language that has them: ISO 12312-2 named in the local formats, the caption and the map caption; numbers in the language\'s decimal sign (ISO 12312-2; ECMA-402)', async () => {
  for (const tag of ['en', ...SOLAR_READY] as const) {
    const language = LANGUAGES[tag];
    const texts = solarTexts(SOLAR_CASES[1], language);
    for (const name of ['table', 'markdown', 'ics', 'json', 'caption'] as const) assert.match(texts[name]!, /ISO 12312-2/, `${tag} ${name}`);
    const sign = new Intl.NumberFormat(language.common.locale).formatToParts(0.5).find((p) => p.type === 'decimal')!.value;
    // The place's magnitude, three decimals: over 1 in the path of the 2027 August 2 total eclipse (from memory: Luxor is near its central line).
    assert.match(texts.table!, new RegExp(`1\\${sign}0\\d\\d`), tag);
  }
});

const SIZES = [{ widthPx: 1200, heightPx: 675 }, { widthPx: 1080, heightPx: 1080 }, { widthPx: 2126, heightPx: 1318 }, { widthPx: 1600, heightPx: 1000 }];

test('solar maps at card, square and print in every language that has the solar words: no English in the title, subtitle, caution, small print, legend, line labels, marks or caption; the title whole, every legend entry within the page (the English catalogue\'s phrases; the layout\'s own measures)', async () => {
  const eclipse = solarEclipseOn('2026-08-12');
  for (const tag of ['en', ...SOLAR_READY] as const) {
    const language = LANGUAGES[tag];
    for (const preset of PRESETS) {
      const settings = mapSettings({ ...DEFAULT_MAP_CHOICES, preset, lang: tag, marks: ['Bilbao'], dpi: preset === 'print' ? 150 : undefined } as never);
      const file = await renderMapFile({ eclipse, ...settings, format: 'svg', generator: 'umbracast test' });
      const scene = file.scene!;
      const { widthPx: W } = settings.size;
      const layout = layoutFor(settings.size);
      const legend = solarLegendWords(eclipse, 'UTC', language.solar);
      const legendEntries = [...legend.ramp, ...Object.values(legend).filter((v): v is string => typeof v === 'string')];
      const labels = [contourLabel(0.4, language.solar), riseSetLabel('C1', 'sunrise', language.solar), riseSetLabel('C4', 'sunset', language.solar)];
      if (tag !== 'en') {
        const drawn = [scene.title, scene.subtitle, scene.caution, scene.smallPrint, ...legendEntries, ...labels, file.captionFile!].join('\n');
        assert.deepEqual(leaks(drawn, language), [], `${tag} ${preset}:\n${drawn}`);
      }
      assert.ok(measureText(scene.title, layout.titleStyle) <= W - 2 * layout.margin, `${tag} ${preset}: title ${scene.title}`);
      for (const entry of legendEntries) assert.ok(measureText(entry, layout.legendStyle) + 40 * layout.unit <= W - 2 * layout.margin, `${tag} ${preset}: ${entry}`);
      for (const line of scene.cautionLines) assert.ok(line.x >= 0 && line.x + measureText(line.text, line.style) <= W, `${tag} ${preset}: caution line off the page`);
      assert.ok(scene.cautionLines.length > 0 && scene.cautionLines.every((l) => l.y <= scene.headerBottom), `${tag} ${preset}: the caution in the header band`);
    }
  }
});

/** The timetable inside the page's room, the title whole, every legend entry within the page. */
function assertDiagramFits(scene: { title: string; timetable: Box; room: Box }, legend: readonly string[], size: { widthPx: number; heightPx: number }, what: string) {
  const layout = layoutFor(size);
  assert.ok(measureText(scene.title, layout.titleStyle) <= size.widthPx - 2 * layout.margin, `${what}: title ${scene.title}`);
  for (const entry of legend) assert.ok(measureText(entry, layout.legendStyle) + 40 * layout.unit <= size.widthPx - 2 * layout.margin, `${what}: ${entry}`);
  const { timetable: t, room } = scene;
  assert.ok(t.left >= room.left && t.right <= room.right && t.top >= room.top && t.bottom <= room.bottom, `${what}: timetable ${JSON.stringify(t)} outside ${JSON.stringify(room)}`);
}

test('the solar diagram in every language that has its words, every preset: no English in the title, description or caption; title, legend and timetable within their room (the English catalogue\'s phrases; the layout\'s own measures)', () => {
  for (const tag of ['en', ...SOLAR_READY] as const) {
    const language = LANGUAGES[tag];
    for (const c of SOLAR_CASES.slice(0, 4)) {
      const eclipse = solarEclipseOn(c.id);
      const observer = { latDeg: c.latDeg, lonDeg: c.lonDeg };
      for (const size of SIZES) {
        const scene = composeSolarDiagramScene({
          local: solarLocalCircumstances(eclipse, observer), discs: solarDiscsAtMaximum(eclipse, observer), placeName: c.name,
          clock: civilClock(c.tz, 'zone', language.common.clock), theme: THEMES.light, size, generator: 'umbracast test', words: language.solar,
        });
        const w = language.solar.diagram!;
        const what = `${tag} ${c.id} ${size.widthPx}x${size.heightPx}`;
        if (tag !== 'en') {
          const texts = [scene.title, scene.description, solarDiagramCaption(scene.title, scene.facts, language.solar), ...Object.values(w.moments), ...Object.values(w.legend)].join('\n');
          assert.deepEqual(leaks(texts, language), [], `${what}:\n${texts}`);
        }
        assertDiagramFits(scene, Object.values(w.legend), size, what);
      }
    }
  }
});

test('the sanity of the diagram leak checks: the English diagrams\' words are caught (the English catalogue itself)', () => {
  const eclipse = eclipseOn('2025-03-14');
  const english = composeDiagramScene({ diagram: shadowDiagram(eclipse), clock: civilClock('UTC'), theme: THEMES.light, size: SIZES[0]!, generator: 'umbracast test' });
  assert.ok(leaks(`${english.title}\n${english.description}`, LANGUAGES.de).length > 3);
  const c = SOLAR_CASES[0];
  const solar = solarEclipseOn(c.id);
  const observer = { latDeg: c.latDeg, lonDeg: c.lonDeg };
  const englishSolar = composeSolarDiagramScene({
    local: solarLocalCircumstances(solar, observer), discs: solarDiscsAtMaximum(solar, observer), placeName: c.name, clock: civilClock(c.tz), theme: THEMES.light, size: SIZES[0]!, generator: 'umbracast test',
  });
  assert.ok(leaks(`${englishSolar.title}\n${englishSolar.description}`, LANGUAGES.it).length > 3);
});

test('the lunar shadow diagram in every language that has its words, every preset: no English in the title, description, caption or inset heading; title, legend and timetable within their room (the English catalogue\'s phrases; the layout\'s own measures)', () => {
  for (const tag of ['en', ...LUNAR_DIAGRAM_READY] as const) {
    const language = LANGUAGES[tag];
    for (const date of ['2025-03-14', '2026-08-28', '2027-02-20']) {
      const eclipse = eclipseOn(date);
      for (const size of SIZES) {
        const clock = civilClock('Australia/Adelaide', 'zone', language.common.clock);
        const scene = composeDiagramScene({ diagram: shadowDiagram(eclipse), clock, theme: THEMES.light, size, generator: 'umbracast test', words: language.lunar });
        const w = language.lunar.diagram!;
        const what = `${tag} ${date} ${size.widthPx}x${size.heightPx}`;
        if (tag !== 'en') {
          const texts = [scene.title, scene.description, diagramCaption(scene.title, eclipse, clock, language.lunar), w.inset.heading, ...Object.values(w.moments), ...Object.values(w.legend)].join('\n');
          assert.deepEqual(leaks(texts, language), [], `${what}:\n${texts}`);
        }
        assertDiagramFits(scene, Object.values(w.legend), size, what);
      }
    }
  }
});

// ---- pseudo-localisation: every word from a catalogue ---------------------------------------------

/**
 * A pseudo-language (pseudo-localisation, common practice in software localisation): the English catalogues
 * with every word they write upper-cased, the locales kept for Intl. An output made with it that still holds
 * a lower-case English catalogue phrase took that phrase from somewhere other than the catalogue.
 */
function shouted<T>(value: T, key = ''): T {
  if (key === 'locale') return value;
  if (typeof value === 'string') return value.toUpperCase() as T;
  if (typeof value === 'function') {
    return ((...args: unknown[]) => {
      const made = (value as (...a: unknown[]) => unknown)(...args);
      return typeof made === 'string' ? made.toUpperCase() : Array.isArray(made) ? made.map((m) => (typeof m === 'string' ? m.toUpperCase() : m)) : made;
    }) as T;
  }
  if (Array.isArray(value)) return value.map((v) => shouted(v)) as T;
  if (value && typeof value === 'object') return Object.fromEntries(Object.entries(value).map(([k, v]) => [k, shouted(v, k)])) as T;
  return value;
}
const PSEUDO: Language = { ...shouted(LANGUAGES.en), tag: 'en', lunar: { ...shouted(LANGUAGES.en.lunar), body: 'lunar' }, solar: { ...shouted(LANGUAGES.en.solar), body: 'solar' } };

test('pseudo-localisation (common practice): with every catalogue word upper-cased, no lower-case English catalogue phrase is left in the solar local formats, captions, marks, solar map, list table, or the solar and lunar diagrams', async () => {
  const check = (what: string, text: string) => assert.deepEqual(leaks(text, PSEUDO), [], `${what}:\n${text}`);
  // The check can fail: the same outputs in English are caught.
  assert.ok(leaks(Object.values(solarTexts(SOLAR_CASES[0], LANGUAGES.en)).join('\n'), PSEUDO).length > 5);
  for (const c of SOLAR_CASES) for (const [name, text] of Object.entries(solarTexts(c, PSEUDO))) check(`${c.id} ${c.name} ${name}`, text);
  const eclipse = solarEclipseOn('2026-08-12');
  for (const preset of PRESETS) {
    const settings = mapSettings({ ...DEFAULT_MAP_CHOICES, preset, marks: ['Bilbao'], dpi: preset === 'print' ? 150 : undefined } as never);
    const file = await renderMapFile({ eclipse, ...settings, solar: PSEUDO.solar, format: 'svg', generator: 'umbracast test' });
    const scene = file.scene!;
    const legend = solarLegendWords(eclipse, 'UTC', PSEUDO.solar);
    check(`map ${preset}`, [scene.title, scene.subtitle, scene.caution, scene.smallPrint, file.captionFile!, ...legend.ramp, ...Object.values(legend).filter((v) => typeof v === 'string'),
      contourLabel(0.4, PSEUDO.solar), riseSetLabel('C4', 'sunset', PSEUDO.solar)].join('\n'));
    const geojson = await renderMapFile({ eclipse, ...settings, solar: PSEUDO.solar, format: 'geojson', generator: 'umbracast test' });
    // GeoJSON is data in one schema (its keys and notes stay); the caution it carries is the reader's.
    check(`geojson ${preset}`, (JSON.parse(Buffer.from(geojson.bytes).toString()) as { umbracast: { safety: string } }).umbracast.safety);
  }
  for (const c of SOLAR_CASES.slice(0, 4)) {
    const solar = solarEclipseOn(c.id);
    const observer = { latDeg: c.latDeg, lonDeg: c.lonDeg };
    const scene = composeSolarDiagramScene({
      local: solarLocalCircumstances(solar, observer), discs: solarDiscsAtMaximum(solar, observer), placeName: c.name, clock: civilClock(c.tz), theme: THEMES.light,
      size: SIZES[0]!, generator: 'umbracast test', words: PSEUDO.solar,
    });
    check(`solar diagram ${c.id}`, [scene.title, scene.description, solarDiagramCaption(scene.title, scene.facts, PSEUDO.solar)].join('\n'));
  }
  for (const date of ['2025-03-14', '2027-02-20']) {
    const lunar = eclipseOn(date);
    for (const size of SIZES) {
      const scene = composeDiagramScene({ diagram: shadowDiagram(lunar), clock: civilClock('UTC'), theme: THEMES.light, size, generator: 'umbracast test', words: PSEUDO.lunar });
      check(`lunar diagram ${date} ${size.widthPx}`, [scene.title, scene.description, diagramCaption(scene.title, lunar, civilClock('UTC'), PSEUDO.lunar)].join('\n'));
    }
  }
  const [from, to] = [new Date('2026-01-01T00:00:00Z'), new Date('2028-01-01T00:00:00Z')];
  const doc = catalogueDocument(findEclipses({ from, to, body: 'all' }), { convention: 'danjon', deltaTModel: 'fixed 69 s (user)', from, to });
  check('list table', catalogueTable(doc, 'all', PSEUDO.lunar, PSEUDO.solar));
});
