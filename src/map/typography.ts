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
    // Glyph paths were taken at size = unitsPerEm with the baseline at 0 and y pointing down.
    d += pathData(g.commands, left + positions[i]! * scale, y, scale);
  });
  return d;
}

/** A tenth of a pixel is finer than any output needs; never "-0". */
function num(value: number): string {
  const rounded = Math.round(value * 10) / 10;
  return rounded === 0 ? '0' : String(rounded);
}

/**
 * Our own serialiser: opentype.js's toPathData rounds through a string
 * exponent and turns some coordinates into NaN.
 */
function pathData(commands: readonly opentype.PathCommand[], dx: number, dy: number, k: number): string {
  const X = (v: number) => num(dx + v * k);
  const Y = (v: number) => num(dy + v * k);
  let d = '';
  for (const c of commands) {
    if (c.type === 'M' || c.type === 'L') d += `${c.type}${X(c.x)} ${Y(c.y)}`;
    else if (c.type === 'Q') d += `Q${X(c.x1)} ${Y(c.y1)} ${X(c.x)} ${Y(c.y)}`;
    else if (c.type === 'C') d += `C${X(c.x1)} ${Y(c.y1)} ${X(c.x2)} ${Y(c.y2)} ${X(c.x)} ${Y(c.y)}`;
    else d += 'Z';
  }
  return d;
}

/** Greedy word wrap to a width, px. */
export function wrapText(text: string, style: TextStyle, maxWidthPx: number): string[] {
  const lines: string[] = [];
  let current = '';
  for (const word of text.split(/\s+/).filter(Boolean)) {
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

/** Shorten a line with an ellipsis until it fits. */
export function fitText(text: string, style: TextStyle, maxWidthPx: number): string {
  if (measureText(text, style) <= maxWidthPx) return text;
  const chars = [...text];
  while (chars.length > 1 && measureText(`${chars.join('')}…`, style) > maxWidthPx) chars.pop();
  return `${chars.join('').trimEnd()}…`;
}

/** Escape text for SVG/XML content and attribute values. */
export function escapeXml(text: string): string {
  return text
    // Characters XML 1.0 forbids outright.
    .replace(/[\u0000-\u0008\u000B\u000C\u000E-\u001F\uFFFE\uFFFF]/g, '')
    .replace(/&/g, '&amp;')
    .replace(/</g, '&lt;')
    .replace(/>/g, '&gt;')
    .replace(/"/g, '&quot;')
    .replace(/'/g, '&apos;');
}
