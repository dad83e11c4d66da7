/** Drawing helpers shared by every figure: page units, outlined text, labels with halos, label boxes. */
import type { Theme } from './theme.ts';
import { measureText, textOutline, type TextStyle } from './typography.ts';

export interface PageSize {
  readonly widthPx: number;
  readonly heightPx: number;
}

export interface Layout {
  readonly unit: number;
  readonly margin: number;
  readonly titleStyle: TextStyle;
  readonly subtitleStyle: TextStyle;
  readonly legendStyle: TextStyle;
  readonly smallStyle: TextStyle;
  readonly labelStyle: TextStyle;
}

export function layoutFor({ widthPx, heightPx }: PageSize): Layout {
  const unit = Math.sqrt(widthPx * heightPx) / 900;
  return {
    unit,
    margin: 22 * unit,
    titleStyle: { sizePx: 27 * unit, weight: 'semibold' },
    subtitleStyle: { sizePx: 13.5 * unit, weight: 'regular' },
    legendStyle: { sizePx: 11.5 * unit, weight: 'regular' },
    smallStyle: { sizePx: 9 * unit, weight: 'regular' },
    labelStyle: { sizePx: 10.5 * unit, weight: 'semibold' },
  };
}

/** Two decimals for SVG numbers. */
export const n2 = (v: number) => (Math.round(v * 100) / 100).toString();

/** One line of outlined text as an SVG path element. */
export function textElement(text: string, x: number, y: number, style: TextStyle, fill: string, anchor: 'start' | 'middle' | 'end' = 'start'): string {
  const d = textOutline(text, x, y, style, anchor);
  return d ? `<path d="${d}" fill="${fill}"/>` : '';
}

/**
 * A sky figure's compass at the top left of its plot: arrows to north (up) and
 * east (left, as the sky looks when you face it), lettered in the reader's words.
 */
export function compassElements(plot: Box, legendSizePx: number, theme: Theme, unit: number, letters: { readonly north: string; readonly east: string }): string[] {
  const style = { sizePx: legendSizePx, weight: 'semibold' as const };
  const arm = 26 * unit;
  const ox = plot.left + style.sizePx * 1.4 + arm;
  const oy = plot.top + style.sizePx * 1.6 + arm;
  const stroke = `stroke="${theme.text}" stroke-width="${n2(1.3 * unit)}" fill="none"`;
  const barb = 5 * unit;
  return [
    `<path d="M${n2(ox)},${n2(oy)}V${n2(oy - arm)}M${n2(ox - barb)},${n2(oy - arm + barb)}L${n2(ox)},${n2(oy - arm)}L${n2(ox + barb)},${n2(oy - arm + barb)}" ${stroke}/>`,
    `<path d="M${n2(ox)},${n2(oy)}H${n2(ox - arm)}M${n2(ox - arm + barb)},${n2(oy - barb)}L${n2(ox - arm)},${n2(oy)}L${n2(ox - arm + barb)},${n2(oy + barb)}" ${stroke}/>`,
    textElement(letters.north, ox, oy - arm - style.sizePx * 0.45, style, theme.text, 'middle'),
    textElement(letters.east, ox - arm - style.sizePx * 0.35, oy + style.sizePx * 0.35, style, theme.text, 'end'),
  ];
}

/**
 * A scale bar at the bottom left of a plot: the longest of `lengthsArcmin` (longest first) that takes at most
 * 0.3 of the plot's width, else the last, labelled in arcminutes, with `caption` under it.
 */
export function scaleBarElements(plot: Box, legendSizePx: number, theme: Theme, unit: number, pxPerArcmin: number, lengthsArcmin: readonly number[], caption: string): string[] {
  const style = { sizePx: legendSizePx * 0.95, weight: 'regular' as const };
  const barArcmin = lengthsArcmin.find((m) => m * pxPerArcmin <= (plot.right - plot.left) * 0.3) ?? lengthsArcmin[lengthsArcmin.length - 1]!;
  const barPx = barArcmin * pxPerArcmin;
  const sx = plot.left + 4 * unit;
  const sy = plot.bottom - style.sizePx * 1.6;
  const stroke = `stroke="${theme.text}" stroke-width="${n2(1.3 * unit)}" fill="none"`;
  return [
    `<path d="M${n2(sx)},${n2(sy - 4 * unit)}V${n2(sy)}H${n2(sx + barPx)}V${n2(sy - 4 * unit)}" ${stroke}/>`,
    textElement(`${barArcmin}′`, sx + barPx / 2, sy - 6 * unit, style, theme.text, 'middle'),
    textElement(caption, sx, sy + style.sizePx * 1.3, style, theme.textMuted),
  ];
}

export interface Box {
  readonly left: number;
  readonly top: number;
  readonly right: number;
  readonly bottom: number;
}

export const overlaps = (a: Box, b: Box) => a.left < b.right && b.left < a.right && a.top < b.bottom && b.top < a.bottom;

/** The box a line of text takes, baseline at y. */
export function textBox(text: string, x: number, y: number, style: TextStyle, anchor: 'start' | 'middle' | 'end'): Box {
  const width = measureText(text, style);
  const left = anchor === 'start' ? x : anchor === 'middle' ? x - width / 2 : x - width;
  return { left, top: y - style.sizePx * 0.8, right: left + width, bottom: y + style.sizePx * 0.25 };
}

/** The plate a map label sits on: its text box and a margin (what must not overlap another label). */
export function plateBox(text: string, x: number, y: number, style: TextStyle, unit: number, anchor: 'start' | 'middle' | 'end' = 'middle'): Box {
  const box = textBox(text, x, y, style, anchor);
  const pad = 2.2 * unit;
  return { left: box.left - pad, top: box.top - pad * 0.6, right: box.right + pad, bottom: box.bottom + pad * 0.6 };
}

/**
 * A map label: outlined text on a small rounded plate of the page colour.
 * (A plate reads as well as a stroked halo and costs far less to rasterise:
 * one rectangle instead of stroking every letter's outline.)
 */
export function labelElement(text: string, x: number, y: number, style: TextStyle, theme: Theme, unit: number, anchor: 'start' | 'middle' | 'end' = 'middle'): string {
  const plate = plateBox(text, x, y, style, unit, anchor);
  const rect = `<rect x="${n2(plate.left)}" y="${n2(plate.top)}" width="${n2(plate.right - plate.left)}" height="${n2(plate.bottom - plate.top)}" rx="${n2(2.2 * unit)}" fill="${theme.halo}" fill-opacity="${theme.haloOpacity}"/>`;
  return `${rect}<path d="${textOutline(text, x, y, style, anchor)}" fill="${theme.text}"/>`;
}

/**
 * Lay items out left to right from `left`, starting a new row when the next
 * would pass `maxWidth`: the legend rows of every figure. Each item takes
 * `widthOf(item)` and is followed by `gap`.
 */
export function flowRows<T>(items: readonly T[], widthOf: (item: T) => number, maxWidth: number, left: number, gap = 0): (T & { x: number })[][] {
  const rows: (T & { x: number })[][] = [[]];
  let cursor = 0;
  for (const item of items) {
    const width = widthOf(item);
    if (cursor > 0 && cursor + width > maxWidth) {
      rows.push([]);
      cursor = 0;
    }
    rows[rows.length - 1]!.push({ ...item, x: left + cursor });
    cursor += width + gap;
  }
  return rows;
}
