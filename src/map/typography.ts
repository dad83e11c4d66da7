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

/** Advance width of a line of text, px. */
export function measureText(text: string, style: TextStyle): number {
  return font(style.weight).getAdvanceWidth(text, style.sizePx);
}

/** SVG path data for one line of text with its baseline at y. */
export function textOutline(text: string, x: number, y: number, style: TextStyle, anchor: TextAnchor = 'start'): string {
  const width = measureText(text, style);
  const left = anchor === 'start' ? x : anchor === 'middle' ? x - width / 2 : x - width;
  return pathData(font(style.weight).getPath(text, left, y, style.sizePx).commands);
}

/** Two decimals, no trailing zeros, never "-0". */
function num(value: number): string {
  const text = (Math.round(value * 100) / 100).toFixed(2).replace(/\.?0+$/, '');
  return text === '-0' ? '0' : text;
}

/**
 * Our own serialiser: opentype.js's toPathData rounds through a string
 * exponent and turns some coordinates into NaN.
 */
function pathData(commands: readonly opentype.PathCommand[]): string {
  let d = '';
  for (const c of commands) {
    if (c.type === 'M' || c.type === 'L') d += `${c.type}${num(c.x)} ${num(c.y)}`;
    else if (c.type === 'Q') d += `Q${num(c.x1)} ${num(c.y1)} ${num(c.x)} ${num(c.y)}`;
    else if (c.type === 'C') d += `C${num(c.x1)} ${num(c.y1)} ${num(c.x2)} ${num(c.y2)} ${num(c.x)} ${num(c.y)}`;
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
