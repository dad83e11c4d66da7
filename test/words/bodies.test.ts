/**
 * A caution meant for one kind of eclipse never reaches the other: the
 * lunar words (above all the naked-eye line) and the solar ones (the eye-safety
 * caution of ISO 12312-2) live in separate catalogues that cannot import each
 * other, print nothing of each other, and are told apart by the type system
 * (TextFor<'lunar'> is not a TextFor<'solar'>). Sources: ISO 12312-2 for what
 * the solar caution is about, and common practice (a lunar eclipse is safe to
 * watch unaided; a solar one never is, outside totality) for why they must
 * not mix; RFC 5545 for the calendar entry that carries the lunar line.
 */
import assert from 'node:assert/strict';
import { readFileSync } from 'node:fs';
import { dirname, relative, resolve } from 'node:path';
import { test } from 'node:test';
import { fileURLToPath } from 'node:url';
import { findLunarEclipses } from '../../src/eclipses/lunar/catalogue.ts';
import { civilClock } from '../../src/ephemeris/civilTime.ts';
import { localCircumstances } from '../../src/local/lunar.ts';
import { localIcs, localMarkdown, localTable, type LocalReport } from '../../src/outputs/localFormats.ts';
import { ENGLISH, meantOnlyFor, type TextFor } from '../../src/words/common.ts';
import { LUNAR_ENGLISH, localSummary } from '../../src/words/lunar/text.ts';
import { SOLAR_ENGLISH, solarSafetyText, type SolarSafetyForm, type SolarSafetyScope } from '../../src/words/solar/caution.ts';

const SRC = resolve(dirname(fileURLToPath(import.meta.url)), '../../src');

/**
 * Every source file a module reaches at run time through its relative imports (static `from '…'` and
 * `import '…'`), itself included. Type-only imports and re-exports (`import type`, `export type`) are
 * erased by TypeScript and carry no words, so they are not followed.
 */
function reachable(entry: string): Set<string> {
  const seen = new Set<string>();
  const visit = (file: string) => {
    if (seen.has(file)) return;
    seen.add(file);
    const text = readFileSync(file, 'utf8').replace(/(?:import|export)\s+type\s+[^;]*?from\s*'[^']+'/g, '');
    for (const match of text.matchAll(/(?:from|import)\s*\(?\s*'(\.{1,2}\/[^']+)'/g)) visit(resolve(dirname(file), match[1]!));
  };
  visit(resolve(SRC, entry));
  return new Set([...seen].map((f) => relative(SRC, f)));
}

/** Arguments tried in turn on a catalogue's function: words, numbers, a pair of numbers. */
const SAMPLE_ARGUMENTS: unknown[][] = [Array(6).fill('x'), Array(6).fill(1.5), [[1.5, 2.5]]];

/** The strings a catalogue holds, and what its small functions make of sample arguments. */
function catalogueTexts(value: unknown, out: string[] = []): string[] {
  if (typeof value === 'string') out.push(value);
  else if (typeof value === 'function') {
    const made = SAMPLE_ARGUMENTS.map((args) => {
      try {
        return (value as (...a: unknown[]) => unknown)(...args);
      } catch {
        return undefined; // arguments of another type: the next sample
      }
    }).find((m) => m !== undefined);
    if (typeof made === 'string') out.push(made);
    else if (Array.isArray(made)) out.push(...made.filter((m): m is string => typeof m === 'string'));
  } else if (Array.isArray(value)) value.forEach((v) => catalogueTexts(v, out));
  else if (value && typeof value === 'object') Object.values(value).forEach((v) => catalogueTexts(v, out));
  return out;
}

const FORMS: SolarSafetyForm[] = ['short', 'long'];
const SCOPES: SolarSafetyScope[] = ['totality', 'no-totality', 'whole-eclipse'];
const solarCautions = FORMS.flatMap((form) => SCOPES.map((scope) => solarSafetyText(form, scope)));

test('the solar words reach no lunar module, the lunar words no solar one, and the shared words neither', () => {
  const solar = reachable('words/solar/caution.ts');
  const lunar = reachable('words/lunar/text.ts');
  const common = reachable('words/common.ts');
  assert.ok(lunar.has('local/lunar.ts'), 'premise: the walk follows imports (the lunar words read local/lunar.ts)');
  assert.deepEqual([...solar].filter((f) => /(^|\/)lunar(\/|\.ts$)/.test(f)), [], 'lunar files reached from the solar words');
  assert.deepEqual([...lunar].filter((f) => /(^|\/)solar(\/|\.ts$)/.test(f)), [], 'solar files reached from the lunar words');
  assert.deepEqual([...common].filter((f) => /(^|\/)(lunar|solar)(\/|\.ts$)/.test(f)), [], 'kind-specific files reached from the shared words');
});

test('no solar caution says the eye may go unprotected the lunar way, and no lunar text speaks of filters or ISO 12312-2', () => {
  const lunarTexts = catalogueTexts(LUNAR_ENGLISH);
  const solarTexts = [...catalogueTexts(SOLAR_ENGLISH), ...solarCautions];
  assert.ok(lunarTexts.length > 100, `premise: the lunar catalogue was walked (${lunarTexts.length} texts)`);
  assert.ok(lunarTexts.includes(LUNAR_ENGLISH.nakedEyeInCalendar));
  for (const text of solarTexts) {
    assert.doesNotMatch(text, /naked eye|unaided|safe to watch/i, text);
    assert.ok(!text.includes(LUNAR_ENGLISH.nakedEyeInCalendar), text);
  }
  for (const text of lunarTexts) assert.doesNotMatch(text, /ISO 12312|filter|eclipse glasses|viewers? off/i, text);
  // Each catalogue's own caution is where it belongs (so the checks above could fail).
  assert.match(LUNAR_ENGLISH.nakedEyeInCalendar, /naked eye/);
  for (const text of solarCautions) assert.match(text, /ISO 12312-2/);
});

test('the shared catalogue carries no caution of either kind', () => {
  for (const text of catalogueTexts(ENGLISH)) {
    assert.doesNotMatch(text, /naked eye|ISO 12312|filter|viewers/i, text);
  }
});

test('a lunar timetable and calendar carry the naked-eye line and nothing of the solar caution', () => {
  const eclipse = findLunarEclipses({ from: new Date('2029-06-01T00:00:00Z'), to: new Date('2029-07-01T00:00:00Z') })[0]!;
  // Kestrel Ridge, an invented place of our own scenario, on the night side at greatest (the Moon is up there).
  const place = { name: 'Kestrel Ridge', latDeg: -33.5, lonDeg: -70.6, tz: 'America/Santiago' };
  const clock = civilClock(place.tz);
  const local = localCircumstances(eclipse, place);
  const report: LocalReport = { local, place, clock, summary: localSummary(local, clock, place.name) };
  const ics = localIcs(report, 'test');
  assert.ok(ics.replace(/\r\n /g, '').includes('Safe to watch with the naked eye'), 'the lunar calendar entry says it');
  for (const output of [ics.replace(/\r\n /g, ''), localTable(report), localMarkdown(report)]) {
    assert.doesNotMatch(output, /ISO 12312|eclipse glasses|solar filter/);
    for (const caution of solarCautions) assert.ok(!output.includes(caution));
  }
});

test('the type system keeps one kind\'s text from standing for the other\'s (tsc -p test fails if it would)', () => {
  const wantsSolar = (caution: TextFor<'solar'>) => caution.length;
  const wantsLunar = (caution: TextFor<'lunar'>) => caution.length;
  assert.ok(wantsSolar(solarSafetyText('short', 'no-totality')) > 0);
  assert.ok(wantsLunar(LUNAR_ENGLISH.nakedEyeInCalendar) > 0);
  // @ts-expect-error — the lunar naked-eye line is not a solar text.
  wantsSolar(LUNAR_ENGLISH.nakedEyeInCalendar);
  // @ts-expect-error — the solar caution is not a lunar text.
  wantsLunar(solarSafetyText('long', 'totality'));
  // @ts-expect-error — a bare string is neither: only the catalogues mark a text for a kind.
  wantsSolar('Safe to look.');
  assert.equal(wantsSolar(meantOnlyFor('solar', 'x')), 1);
});

