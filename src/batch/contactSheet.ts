/**
 * index.html: a contact sheet of a batch that works offline from its folder —
 * a thumbnail per eclipse, its key facts, links to every file. No scripts, no
 * remote fonts or styles; relative links only, to files inside the folder.
 */
import { civilClock } from '../ephemeris/civilTime.ts';
import { escapeXml } from '../figures/xml.ts';
import type { EclipseRecord } from '../outputs/catalogueRecord.ts';
import type { SolarEclipseRecord } from '../eclipses/solar/record.ts';
import type { EclipseBody } from '../eclipses/kinds.ts';
import { safetyScopeForEclipse, solarSafetyText } from '../words/solar/caution.ts';
import { minutesAndSeconds, solarTextWords, type SolarTextWords } from '../words/solar/text.ts';
import { isPlainRelativePath } from '../outputs/files.ts';
import { decimalIn, fixedIn, formatDuration, roundToMinute, wholeIn } from '../words/common.ts';
import type { LunarWords } from '../words/lunar/text.ts';
import { chooseLanguage, type Language } from '../settings/language.ts';
import type { Manifest } from './manifest.ts';

/** Solar cards: a warm rule on top, the caution boxed so that it cannot be missed (only on sheets holding a solar eclipse). */
const SOLAR_CARD_STYLE = `
  article.solar { border-top: 4px solid #b5541c; } article.solar.annular { border-top-style: double; } article.solar.partial { border-top-color: #d99a5b; }
  p.caution { margin: .4rem 0; padding: .4rem .5rem; border-left: 3px solid #b5541c; background: #fbeee4; font-size: .9em; }`;

/** The words of a batch's style language (its `lang` field); a manifest from elsewhere with a tag not offered reads in English. */
export function styleWords(style: Readonly<Record<string, unknown>>): LunarWords {
  return styleLanguage(style).lunar;
}

/** The language of a batch's style (its `lang` field), both kinds' words; a tag not offered reads in English. */
function styleLanguage(style: Readonly<Record<string, unknown>>): Language {
  try {
    return chooseLanguage(typeof style.lang === 'string' ? style.lang : undefined);
  } catch {
    return chooseLanguage(undefined);
  }
}

/** A relative URL for a file path: each segment percent-encoded. */
const href = (path: string) => path.split('/').map(encodeURIComponent).join('/');

/** Manifests written before records carried `printed`: the figures from the record's own (already rounded) values. */
function figuresFromRecord(r: EclipseRecord): EclipseRecord['printed'] {
  const minutes = (seconds: number | undefined) => (seconds === undefined ? undefined : roundToMinute(seconds));
  return {
    greatestUtc: new Date(Math.round(Date.parse(r.greatest) / 60_000) * 60_000).toISOString().slice(0, 16).replace('T', ' '),
    umbralMagnitude: r.umbralMagnitude.toFixed(3),
    penumbralMagnitude: r.penumbralMagnitude.toFixed(3),
    gamma: r.gamma.toFixed(4),
    minutes: { penumbral: minutes(r.durations.penumbral)!, ...(r.durations.partial !== undefined ? { partial: minutes(r.durations.partial)! } : {}), ...(r.durations.total !== undefined ? { total: minutes(r.durations.total)! } : {}) },
  };
}

/**
 * The sheet's heading for a range whose end is exclusive: "Lunar eclipses
 * 2026-01-01 to 2035-12-31", both days included; the bodies of the batch
 * name it ("Lunar and solar eclipses …" when both).
 */
export function sheetTitle(fromIso: string, toIsoExclusive: string, bodies: readonly EclipseBody[] = ['lunar'], style: Readonly<Record<string, unknown>> = {}): string {
  const lastDay = new Date(Date.parse(toIsoExclusive) - 1).toISOString().slice(0, 10);
  if (!bodies.includes('solar')) return styleWords(style).sheet.title(fromIso.slice(0, 10), lastDay);
  return solarTextWords(styleLanguage(style).solar).sheet.title(bodies.includes('lunar'), fromIso.slice(0, 10), lastDay);
}

/** A solar card's facts: greatest, magnitude, the central phase and path width at greatest, saros. */
function solarFacts(r: SolarEclipseRecord, clock: ReturnType<typeof civilClock>, greatestUtDays: number, WORDS: LunarWords, text: SolarTextWords): string[] {
  const s = text.sheet;
  const minute = new Date(Math.round(Date.parse(r.greatest) / 60_000) * 60_000).toISOString().slice(11, 16);
  return [
    clock.zone === 'UTC' ? WORDS.sheet.greatestUtc(minute) : WORDS.sheet.greatestLocal(clock.stamp(greatestUtDays)),
    s.magnitude(fixedIn(r.magnitude, 3, text.common)),
    ...(r.durations.central !== undefined && r.kind !== 'partial' ? [s.central(r.kind, minutesAndSeconds(r.durations.central, text))] : []),
    ...(r.pathWidthKm !== undefined ? [s.width(wholeIn(Math.round(r.pathWidthKm), text.common))] : []),
    s.saros(r.saros),
  ];
}

/** Width and height of a PNG from its IHDR chunk (PNG specification, §11.2.2): bytes 16–23. */
export function pngSize(head: Uint8Array): [number, number] | undefined {
  if (head.length < 24 || head[12] !== 0x49 || head[13] !== 0x48 || head[14] !== 0x44 || head[15] !== 0x52) return undefined;
  const view = new DataView(head.buffer, head.byteOffset, head.byteLength);
  return [view.getUint32(16), view.getUint32(20)];
}

/**
 * `thumbSize` gives each thumbnail's pixel size (read from the file), for the
 * <img> width and height. Each card carries one date, the one the map's
 * title prints: greatest eclipse's date in the style's time zone.
 */
export function contactSheet(manifest: Manifest, title: string, thumbSize: (path: string) => [number, number] | undefined = () => undefined): string {
  const tz = typeof manifest.style.tz === 'string' ? manifest.style.tz : 'UTC';
  const language = styleLanguage(manifest.style);
  const WORDS = language.lunar;
  const SOLAR = language.solar;
  const solarText = solarTextWords(SOLAR);
  const clock = civilClock(tz, 'zone', WORDS.common.clock);
  const w = WORDS.sheet;
  const duration = (minutes: number) => formatDuration(minutes * 60, 'long', WORDS.common);
  // On a sheet holding both kinds, a lunar card says so too ("total lunar").
  const mixed = manifest.eclipses.some((e) => e.body === 'solar') && manifest.eclipses.some((e) => e.body !== 'solar');
  const cards = manifest.eclipses.map((listed) => {
    // Only plain relative paths inside the folder become links: never "../", "/", "//host" or a URL.
    const entry = { ...listed, files: listed.files.filter((f) => isPlainRelativePath(f.path)) };
    const thumb = entry.files.find((f) => f.role === 'thumbnail');
    // utDays count from J2000.0, 2000-01-01 12:00 UT.
    const greatestUtDays = (Date.parse(entry.record.greatest) - Date.UTC(2000, 0, 1, 12)) / 86_400_000;
    const solar = entry.body === 'solar' ? entry.record : undefined;
    // A kind this version does not know (a manifest from another) is printed as it stands.
    const lunarKind = (WORDS.kind as Readonly<Record<string, string>>)[entry.record.kind] ?? entry.record.kind;
    const kind = solar
      ? (solarText.sheet.kind as Readonly<Record<string, string>>)[solar.kind] ?? solar.kind
      : mixed ? solarText.sheet.lunarKind(lunarKind) : lunarKind;
    const r = entry.record;
    // The figures as the maps print them: rounded once, from the full value (record.printed).
    const p = entry.body !== 'solar' ? entry.record.printed ?? figuresFromRecord(entry.record) : undefined;
    const facts = solar ? solarFacts(solar, clock, greatestUtDays, WORDS, solarText) : !p ? [] : [
      clock.zone === 'UTC' ? w.greatestUtc(p.greatestUtc.slice(11)) : w.greatestLocal(clock.stamp(greatestUtDays)),
      r.kind === 'penumbral' ? w.penumbralMagnitude(decimalIn(p.penumbralMagnitude, WORDS.common)) : w.umbralMagnitude(decimalIn(p.umbralMagnitude, WORDS.common)),
      ...(p.minutes.total !== undefined ? [w.totality(duration(p.minutes.total))] : []),
      ...(p.minutes.partial !== undefined ? [w.inUmbra(duration(p.minutes.partial))] : [w.penumbralPhase(duration(p.minutes.penumbral))]),
      w.saros(r.saros),
    ];
    const links = entry.files
      .filter((f) => f.role !== 'thumbnail')
      .map((f) => `<li><a href="${escapeXml(href(f.path))}">${escapeXml(f.path.split('/').pop()!)}</a> <span>${w.fileNote(w.roles[f.role] ?? f.role, (f.bytes / 1024).toFixed(0))}</span></li>`)
      .join('\n        ');
    const size = thumb ? thumbSize(thumb.path) : undefined;
    const dimensions = size ? ` width="${size[0]}" height="${size[1]}"` : '';
    const date = clock.date(greatestUtDays);
    const image = thumb
      ? `<a href="${escapeXml(href(entry.files.find((f) => f.role === 'map')?.path ?? thumb.path))}"><img src="${escapeXml(href(thumb.path))}" alt="${escapeXml(solar ? solarText.sheet.thumbnailAlt(kind, date) : w.thumbnailAlt(lunarKind, date))}"${dimensions} loading="lazy"></a>`
      : '';
    // Beside every solar eclipse, the eye-safety caution (short form, scoped to the eclipse's kind); nothing else of it is lunar.
    const caution = solar
      ? `\n      <p class="caution"><strong>${escapeXml(solarSafetyText('short', safetyScopeForEclipse(solar.kind), SOLAR))}</strong></p>${thumb ? '' : `\n      <p>${escapeXml(solarText.sheet.noMap)}</p>`}`
      : '';
    return `    <article class="${solar ? `solar ${escapeXml(r.kind)}` : escapeXml(r.kind)}" id="${escapeXml(r.id)}">
      ${image ? `${image}\n      ` : ''}<h2>${escapeXml(date)} <small>${escapeXml(kind)}</small></h2>
      <p>${facts.map(escapeXml).join(' · ')}</p>${caution}
      <ul>
        ${links}
      </ul>
    </article>`;
  });
  return `<!doctype html>
<html lang="${escapeXml(WORDS.common.locale)}">
<head>
<meta charset="utf-8">
<meta name="viewport" content="width=device-width, initial-scale=1">
<title>${escapeXml(title)}</title>
<style>
  :root { color-scheme: light; --ink: #161a26; --muted: #4b5263; --paper: #faf8f3; --rule: #d8d4ca; }
  body { margin: 0; padding: 2rem; background: var(--paper); color: var(--ink); font: 15px/1.45 system-ui, sans-serif; }
  header { margin-bottom: 1.5rem; }
  h1 { margin: 0 0 .25rem; font-size: 1.6rem; }
  header p { margin: 0; color: var(--muted); }
  main { display: grid; grid-template-columns: repeat(auto-fill, minmax(300px, 1fr)); gap: 1.25rem; }
  article { background: #fff; border: 1px solid var(--rule); border-radius: 6px; padding: .75rem; }
  article.total { border-top: 4px solid #27366b; } article.partial { border-top: 4px solid #6d78b0; } article.penumbral { border-top: 4px solid #a9c4d6; }${manifest.eclipses.some((e) => e.body === 'solar') ? SOLAR_CARD_STYLE : ''}
  img { width: 100%; height: auto; display: block; border-radius: 3px; }
  h2 { font-size: 1.05rem; margin: .6rem 0 .2rem; } h2 small { font-weight: normal; color: var(--muted); }
  p { margin: 0 0 .4rem; } ul { margin: 0; padding-left: 1.1rem; } li span { color: var(--muted); font-size: .85em; }
  footer { margin-top: 2rem; color: var(--muted); font-size: .85em; }
</style>
</head>
<body>
<header>
  <h1>${escapeXml(title)}</h1>
  <p>${w.header(w.eclipses(manifest.eclipses.length), escapeXml(tz), escapeXml(manifest.styleHash), escapeXml(manifest.tool))}</p>
</header>
<main>
${cards.join('\n')}
</main>
<footer>${WORDS.common.predictions} ${w.credits}</footer>
</body>
</html>
`;
}
