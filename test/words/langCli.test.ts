/**
 * --lang on the command line and `lang` in a house style: one clear line and
 * exit 2 for a tag not offered, the whole output in the language asked for.
 * Sources: BCP 47 (RFC 5646) for the tags; the catalogues' own words; the
 * contact sheet's <html lang> (HTML Living Standard, §3.2.6.2).
 */
import assert from 'node:assert/strict';
import { existsSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { test } from 'node:test';
import { main } from '../../src/cli/main.ts';
import { contactSheet, sheetTitle } from '../../src/batch/contactSheet.ts';
import type { Manifest } from '../../src/batch/manifest.ts';
import { LANGUAGE_TAGS, LANGUAGES } from '../../src/settings/language.ts';

async function run(args: string[], today = new Date('2026-01-10T10:00:00Z')) {
  let stdout = '';
  let stderr = '';
  const code = await main(args, { stdout: (t) => (stdout += t), stderr: (t) => (stderr += t), now: () => today });
  return { code, stdout, stderr };
}

for (const command of [['local', '2026-03-03', '--place', 'Adelaide'], ['caption', '2026-03-03'], ['map', '2026-03-03'], ['sky', '2026-03-03', '--place', 'Adelaide']]) {
  test(`${command[0]} --lang nl: exit 2, one line naming --lang and the tags offered, nothing written (RFC 5646)`, async () => {
    const dir = mkdtempSync(join(tmpdir(), 'umbracast-lang-'));
    try {
      const output = command[0] === 'map' || command[0] === 'sky' ? ['-o', join(dir, 'out.png')] : [];
      const { code, stdout, stderr } = await run([...command, '--lang', 'nl', ...output]);
      assert.equal(code, 2);
      assert.equal(stdout, '');
      assert.equal(stderr.split('\n').length, 2, stderr);
      assert.match(stderr.trimEnd(), /^umbracast: --lang: expected a BCP 47 language tag among en, es, fr, de, pt, it .*received "nl"$/);
      assert.ok(!existsSync(join(dir, 'out.png')));
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
  });
}

test('local --lang ja is refused for its script, not drawn as boxes (Unicode CLDR likely subtags: Japanese is Jpan)', async () => {
  const { code, stderr } = await run(['local', '2026-03-03', '--place', 'Adelaide', '--lang', 'ja']);
  assert.equal(code, 2);
  assert.match(stderr, /--lang: .*no letters of the Jpan script.*received "ja"/);
});

test('local --lang de --format ics: the calendar in German, its structure unchanged (RFC 5545)', async () => {
  const { code, stdout } = await run(['local', '2026-03-03', '--place', 'Adelaide', '--format', 'ics', '--lang', 'de']);
  assert.equal(code, 0);
  assert.match(stdout, /^BEGIN:VCALENDAR\r\n/);
  assert.match(stdout, /SUMMARY:Totalität\r\n/);
  assert.match(stdout.replace(/\r\n /g, ''), /DESCRIPTION:.*Gefahrlos mit bloßem Auge/);
});

test('caption --lang pt --tz UTC: title, facts and alt text in Portuguese, the date through Intl (ECMA-402)', async () => {
  const { code, stdout } = await run(['caption', '2026-03-03', '--lang', 'pt']);
  assert.equal(code, 0);
  assert.match(stdout, /^Eclipse total da Lua de 3 de março de 2026\. Máximo do eclipse às 11:34 UTC, magnitude umbral 1,1\d\d/);
  assert.match(stdout, /\n\nTexto alternativo: Mapa do mundo/);
});

test('a house style\'s lang: a tag not offered is one error naming the field (the style schema)', async () => {
  const dir = mkdtempSync(join(tmpdir(), 'umbracast-lang-'));
  try {
    const style = join(dir, 'style.yaml');
    writeFileSync(style, 'lang: klingon\n');
    const { code, stderr } = await run(['batch', '--from', '2026-03-01', '--to', '2026-03-10', '--style', style, '--out', join(dir, 'out')]);
    assert.equal(code, 2);
    assert.equal(stderr.split('\n').length, 2, stderr);
    assert.match(stderr, /lang.*BCP 47 language tag among en, es, fr, de, pt, it/);
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
});

test('the contact sheet in the style\'s language: <html lang>, title, facts and notice (HTML Living Standard §3.2.6.2; the catalogue)', () => {
  const manifest = {
    tool: 'umbracast test', styleHash: 'abc', style: { lang: 'fr', tz: 'UTC' }, shard: null, range: { from: '2026-01-01', to: '2027-01-01' },
    eclipses: [{
      id: '2026-03-03', files: [],
      record: { id: '2026-03-03', kind: 'total', greatest: '2026-03-03T11:33:40Z', umbralMagnitude: 1.1507, penumbralMagnitude: 2.18, gamma: -0.3765, saros: 133, durations: { penumbral: 20_000, partial: 12_400, total: 3_480 } },
    }],
  } as unknown as Manifest;
  const html = contactSheet(manifest, sheetTitle('2026-01-01T00:00:00Z', '2027-01-01T00:00:00Z', ['lunar'], manifest.style));
  assert.match(html, /<html lang="fr">/);
  assert.match(html, /<title>Éclipses de Lune du 2026-01-01 au 2026-12-31<\/title>/);
  assert.match(html, /<h2>3 mars 2026 <small>éclipse totale de Lune<\/small><\/h2>/);
  assert.match(html, /magnitude ombrale 1,151/);
  assert.match(html, /<footer>Prévisions/);
  assert.doesNotMatch(html, /Greatest|umbral magnitude|Lunar eclipses|Predictions/);
  // No lang: English, as before.
  assert.match(contactSheet({ ...manifest, style: { tz: 'UTC' } } as Manifest, 'x'), /<html lang="en">[\s\S]*umbral magnitude 1\.151/);
});

test('list --lang fr: the table in French, kinds short, Julian dates in French months, decimal commas; json stays data (ECMA-402; Meeus ch. 7 for 1501 May 13 Gregorian = May 3 Julian)', async () => {
  const { code, stdout } = await run(['list', '--from', '1501', '--to', '1501', '--lang', 'fr', '--body', 'lunar']);
  assert.equal(code, 0);
  assert.match(stdout, /^2 éclipses de Lune du 1501-01-01 au 1502-01-01 \(exclu\)/);
  assert.match(stdout, /1501-05-13 \(julien\u00a0: 3 mai 1501\)\s+totale\s+1501-05-13 \d\d:\d\d\s+1,\d{3}/);
  assert.doesNotMatch(stdout, /\b(partial|total|lunar|Times|observed|forecast|beyond|model)\b/);
  assert.match(stdout, /modèle\u00a0: observé 1955–\d{4}, prévision jusqu’en \d{4}, Espenak–Meeus au-delà\)/);
  const fixed = await run(['list', '--from', '2026', '--to', '2026', '--lang', 'de', '--delta-t', '69.25', '--body', 'lunar']);
  assert.match(fixed.stdout, /ΔT-Modell: fest, 69,25 s \(vom Nutzer angegeben\)\.|Modell: fest, 69,25 s \(vom Nutzer angegeben\)/);
  const json = await run(['list', '--from', '1501', '--to', '1501', '--lang', 'fr', '--format', 'json', '--body', 'lunar']);
  assert.equal(JSON.parse(json.stdout).eclipses[0].kind, 'total');
});

test('a solar eclipse is served in every language: list, local and caption exit 0, with the caution (ISO 12312-2) in the language and none of the English one', async () => {
  const englishCaution = (await run(['caption', '2026-08-12'])).stdout.split('\n').find((line) => /ISO 12312-2/.test(line))!;
  for (const tag of LANGUAGE_TAGS) {
    for (const args of [
      ['list', '--from', '2026', '--to', '2026', '--lang', tag],
      ['local', '2026-08-12', '--place', 'Bilbao', '--lang', tag],
      ['caption', '2026-08-12', '--lang', tag],
    ]) {
      const { code, stdout, stderr } = await run(args);
      assert.equal(code, 0, `${args.join(' ')}: ${stderr}`);
      assert.match(stdout, /ISO 12312-2/, args.join(' '));
      if (tag !== 'en') assert.ok(!stdout.includes(englishCaution), `${args.join(' ')}: the English caution`);
    }
  }
  // The lunar eclipses of the same year are fine in every language.
  for (const tag of LANGUAGE_TAGS) assert.equal((await run(['list', '--from', '2026', '--to', '2026', '--lang', tag, '--body', 'lunar'])).code, 0, tag);
});

test('diagram --lang: a language with the diagram words draws the figure and its caption in it, in every language, both kinds', async () => {
  const dir = mkdtempSync(join(tmpdir(), 'umbracast-lang-diagram-'));
  try {
    const english = { lunar: '', solar: '' };
    for (const tag of LANGUAGE_TAGS) {
      const language = LANGUAGES[tag];
      for (const [body, when] of [['lunar', '2026-03-03'], ['solar', '2026-08-12']] as const) {
        const out = join(dir, `${tag}-${body}.svg`);
        const { code, stderr } = await run(['diagram', when, '--body', body, '--place', 'Bilbao', '--lang', tag, '-o', out]);
        assert.equal(code, 0, `${tag} ${body}: ${stderr}`);
        const caption = readFileSync(out.replace(/\.svg$/, '.txt'), 'utf8');
        // The caption ends with the language's own alt-text wording, and differs from the English one.
        if (tag === 'en') english[body] = caption;
        else assert.notEqual(caption, english[body], `${tag} ${body}`);
        if (body === 'solar') assert.match(caption, /ISO 12312-2/, `${tag}: the caution (ISO 12312-2)`);
        else assert.ok(caption.includes(language.lunar.diagram!.caption.altText('north').slice(0, 12)), `${tag} lunar: the language's alt text\n${caption}`);
      }
    }
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
});

test('map --inset diagram --lang: refused in one line naming --lang where the language lacks the diagram words, drawn where it has them (the catalogues decide)', async () => {
  const dir = mkdtempSync(join(tmpdir(), 'umbracast-lang-inset-'));
  try {
    for (const tag of LANGUAGE_TAGS) {
      const out = join(dir, `${tag}.svg`);
      const { code, stderr } = await run(['map', '2026-03-03', '--inset', 'diagram', '--lang', tag, '-o', out]);
      if (LANGUAGES[tag].lunar.diagram === undefined) {
        assert.equal(code, 2, tag);
        assert.match(stderr, new RegExp(`^umbracast: --lang: expected en.* for the shadow diagram .*received "${tag}"\\n$`));
        assert.ok(!existsSync(out));
      } else {
        assert.equal(code, 0, `${tag}: ${stderr}`);
      }
    }
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
});
