/**
 * Text as outlines. Every letter on a map is drawn as a path from a bundled
 * open-licence font (IBM Plex Sans, SIL OFL 1.1, from the registry package
 * @expo-google-fonts/ibm-plex-sans), so a render never depends on the fonts
 * a machine has: same inputs, same bytes, everywhere. The font covers Latin,
 * Greek and Cyrillic; other letters are drawn as its missing-glyph box.
 */
import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import opentype from 'opentype.js';

export type FontWeight = 'regular' | 'semibold';
export type TextAnchor = 'start' | 'middle' | 'end';

const FONT_FILES: Readonly<Record<FontWeight, string>> = {
  regular: '@expo-google-fonts/ibm-plex-sans/400Regular/IBMPlexSans_400Regular.ttf',
  semibold: '@expo-google-fonts/ibm-plex-sans/600SemiBold/IBMPlexSans_600SemiBold.ttf',
};

export const FONT_CREDIT = 'IBM Plex Sans (SIL OFL 1.1)';

const require = createRequire(import.meta.url);
const loaded = new Map<FontWeight, opentype.Font>();

/** Fonts are immutable assets: parse each once per process. */
function font(weight: FontWeight): opentype.Font {
  let f = loaded.get(weight);
  if (!f) {
    const bytes = readFileSync(require.resolve(FONT_FILES[weight]));
    f = opentype.parse(bytes.buffer.slice(bytes.byteOffset, bytes.byteOffset + bytes.byteLength) as ArrayBuffer);
    loaded.set(weight, f);
  }
  return f;
}

export interface TextStyle {
  readonly sizePx: number;
  readonly weight: FontWeight;
}

/**
 * Our own simple layout: one glyph per character, pair kerning, no
 * ligatures. opentype.js's full layout runs every OpenType feature on every
 * call, which made text the slowest part of a map; glyph outlines and kerning
 * pairs are immutable, so they are looked up once and reused.
 */
interface GlyphShape {
  readonly index: number;
  readonly advance: number;
  readonly commands: readonly opentype.PathCommand[];
}

const glyphCache = new Map<FontWeight, Map<string, GlyphShape>>();
const kerningCache = new Map<FontWeight, Map<number, number>>();

function glyphsOf(text: string, weight: FontWeight): GlyphShape[] {
  const f = font(weight);
  let cache = glyphCache.get(weight);
  if (!cache) glyphCache.set(weight, (cache = new Map()));
  return [...text].map((char) => {
    let shape = cache.get(char);
    if (!shape) {
      const glyph = f.charToGlyph(char);
      shape = { index: glyph.index, advance: glyph.advanceWidth ?? 0, commands: glyph.getPath(0, 0, f.unitsPerEm).commands };
      cache.set(char, shape);
    }
    return shape;
  });
}

function kerning(weight: FontWeight, left: GlyphShape, right: GlyphShape): number {
  let cache = kerningCache.get(weight);
  if (!cache) kerningCache.set(weight, (cache = new Map()));
  const key = left.index * 65536 + right.index;
  let value = cache.get(key);
  if (value === undefined) {
    const f = font(weight);
    value = f.getKerningValue(f.glyphs.get(left.index), f.glyphs.get(right.index)) || 0;
    cache.set(key, value);
  }
  return value;
}

/** Pen positions of each glyph, in font units from the start of the line. */
function layoutLine(text: string, weight: FontWeight): { glyphs: GlyphShape[]; positions: number[]; width: number } {
  const glyphs = glyphsOf(text, weight);
  const positions: number[] = [];
  let pen = 0;
  glyphs.forEach((g, i) => {
    positions.push(pen);
    pen += g.advance + (i + 1 < glyphs.length ? kerning(weight, g, glyphs[i + 1]!) : 0);
  });
  return { glyphs, positions, width: pen };
}

/** Advance width of a line of text, px. */
export function measureText(text: string, style: TextStyle): number {
  return (layoutLine(text, style.weight).width * style.sizePx) / font(style.weight).unitsPerEm;
}

/** SVG path data for one line of text with its baseline at y. */
export function textOutline(text: string, x: number, y: number, style: TextStyle, anchor: TextAnchor = 'start'): string {
  const { glyphs, positions, width } = layoutLine(text, style.weight);
  const scale = style.sizePx / font(style.weight).unitsPerEm;
  const widthPx = width * scale;
  const left = anchor === 'start' ? x : anchor === 'middle' ? x - widthPx / 2 : x - widthPx;
  let d = '';
  glyphs.forEach((g, i) => {
    const shape = glyphAtSize(style.weight, g, style.sizePx);
    if (shape.body) d += `M${num(left + positions[i]! * scale + shape.startX)} ${num(y + shape.startY)}${shape.body}`;
  });
  return d;
}

/** A hundredth of a pixel, so that glyph shapes survive rounding; never "-0". */
function num(value: number): string {
  const rounded = Math.round(value * 100) / 100;
  return rounded === 0 ? '0' : String(rounded);
}

/**
 * A glyph at one size as relative path data after its first point: the same
 * string serves every place the glyph is drawn, so a map's thousand letters
 * cost a thousand concatenations, not a hundred thousand number strings.
 * (Our own serialiser: opentype.js's toPathData rounds through a string
 * exponent and turns some coordinates into NaN.) Relative steps are
 * differences of rounded points, so no error builds up along a contour.
 */
interface GlyphAtSize {
  readonly startX: number;
  readonly startY: number;
  readonly body: string;
}

const sizedCache = new Map<string, GlyphAtSize>();

function glyphAtSize(weight: FontWeight, g: GlyphShape, sizePx: number): GlyphAtSize {
  const key = `${weight}:${g.index}:${sizePx}`;
  const cached = sizedCache.get(key);
  if (cached) return cached;
  const k = sizePx / font(weight).unitsPerEm;
  const r = (v: number) => Math.round(v * k * 100) / 100;
  const first = g.commands[0];
  const startX = first && first.type === 'M' ? r(first.x) : 0;
  const startY = first && first.type === 'M' ? r(first.y) : 0;
  let cx = startX;
  let cy = startY;
  let subpathX = startX;
  let subpathY = startY;
  let body = '';
  for (const c of g.commands.slice(1)) {
    if (c.type === 'Z') {
      body += 'z';
      cx = subpathX;
      cy = subpathY;
      continue;
    }
    const nx = r(c.x);
    const ny = r(c.y);
    if (c.type === 'M' || c.type === 'L') body += `${c.type === 'M' ? 'm' : 'l'}${num(nx - cx)} ${num(ny - cy)}`;
    else if (c.type === 'Q') body += `q${num(r(c.x1) - cx)} ${num(r(c.y1) - cy)} ${num(nx - cx)} ${num(ny - cy)}`;
    else body += `c${num(r(c.x1) - cx)} ${num(r(c.y1) - cy)} ${num(r(c.x2) - cx)} ${num(r(c.y2) - cy)} ${num(nx - cx)} ${num(ny - cy)}`;
    if (c.type === 'M') {
      subpathX = nx;
      subpathY = ny;
    }
    cx = nx;
    cy = ny;
  }
  const sized = { startX, startY, body: first ? `${body}` : '' };
  sizedCache.set(key, sized);
  return sized;
}

/** White space a line may break at: any but the no-break spaces (U+00A0, U+2007, U+202F), which keep French "mot ;" and "23 %" whole. */
const BREAKABLE_SPACE = /[^\S\u00a0\u2007\u202f]+/;

/** Greedy word wrap to a width, px; never at a no-break space (Unicode UAX #14, class GL). */
export function wrapText(text: string, style: TextStyle, maxWidthPx: number): string[] {
  const lines: string[] = [];
  let current = '';
  for (const word of text.split(BREAKABLE_SPACE).filter(Boolean)) {
    const candidate = current ? `${current} ${word}` : word;
    if (current && measureText(candidate, style) > maxWidthPx) {
      lines.push(current);
      current = word;
    } else {
      current = candidate;
    }
  }
  if (current) lines.push(current);
  return lines;
}

/** The characters of a text the bundled type has no glyph for (drawn as its missing-glyph box), each once. */
export function missingGlyphs(text: string, weight: FontWeight = 'regular'): string[] {
  const f = font(weight);
  return [...new Set(text)].filter((char) => !/\s/.test(char) || char === '\u00a0' ? f.charToGlyph(char).index === 0 : false);
}

/** Shorten a line with an ellipsis until it fits. */
export function fitText(text: string, style: TextStyle, maxWidthPx: number): string {
  if (measureText(text, style) <= maxWidthPx) return text;
  const chars = [...text];
  while (chars.length > 1 && measureText(`${chars.join('')}…`, style) > maxWidthPx) chars.pop();
  return `${chars.join('').trimEnd()}…`;
}

export { escapeXml } from './xml.ts';
