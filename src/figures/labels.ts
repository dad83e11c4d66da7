/**
 * Labels on a map, placed so that none covers another: labels on lines (at
 * their crossings of a row), marked places with their dots and leaders, and
 * the ink that stands out from what lies under a name. Every map body uses
 * these; the words come from words/<kind>/figures.ts.
 */
import type { GeoProjection } from 'd3-geo';
import { labelElement, n2, overlaps, plateBox, textElement, type Box } from './draw.ts';
import { townSymbol } from './layers.ts';
import type { Frame } from './projection.ts';
import type { Theme } from './theme.ts';
import { measureText, type TextStyle } from './typography.ts';

/** A place marked on the map with a short label ("Dakar · sets 07:23 GMT"). */
export interface MapMark {
  readonly lonDeg: number;
  readonly latDeg: number;
  readonly label: string;
}

/**
 * Places marked on the map, each a dot and a label. A label takes the first
 * spot that overlaps no plate, dot or other label already placed: the eight
 * spots around its dot first, then the same eight directions farther out,
 * joined to the dot by a thin leader line (so that towns a few pixels apart
 * still get a readable label each). Only when every spot clashes does it
 * take the one with the fewest clashes. A spot that also crosses none of the
 * map's `lines` (page coordinates, asked for only when there are marks) comes
 * first; else, of the spots clear of labels, the one crossing least line.
 */
export function markElements(
  marks: readonly MapMark[],
  projection: GeoProjection,
  frame: Frame,
  style: TextStyle,
  theme: Theme,
  unit: number,
  taken: Box[],
  lines: () => readonly (readonly ([number, number] | null)[])[],
): { elements: string[]; plates: Box[] } {
  const lineHits = marks.length === 0 ? () => 0 : lineHitCounter(lines(), frame, 6 * unit);
  const elements: string[] = [];
  const plates: Box[] = [];
  const gap = 7 * unit;
  const inFrame = (b: Box) => b.left >= frame.x && b.right <= frame.x + frame.width && b.top >= frame.y && b.bottom <= frame.y + frame.height;
  const dots = marks.map((m) => projection([m.lonDeg, m.latDeg]));
  const dotBox = ([x, y]: [number, number]): Box => ({ left: x - 4 * unit, top: y - 4 * unit, right: x + 4 * unit, bottom: y + 4 * unit });
  for (const p of dots) if (p) taken.push(dotBox(p));
  // Directions as (dx, dy, anchor): right, left, above, below, then the diagonals.
  const directions: [number, number, 'start' | 'middle' | 'end'][] = [[1, 0, 'start'], [-1, 0, 'end'], [0, -1, 'middle'], [0, 1, 'middle'], [1, -1, 'start'], [-1, -1, 'end'], [1, 1, 'start'], [-1, 1, 'end']];
  const reaches = [1, 2.6, 4.2, 6];
  marks.forEach((mark, i) => {
    const p = dots[i];
    if (!p) return;
    const [x, y] = p;
    const lift = style.sizePx * 0.3;
    const candidates = reaches.flatMap((reach) =>
      directions.map(([dx, dy, anchor]) => {
        const sx = x + dx * gap * reach;
        // Below the dot the baseline drops by the letters' height; beside it, the text centres on the dot.
        const sy = dy === 0 ? y + lift : dy < 0 ? y - gap * reach : y + gap * reach + style.sizePx * 0.7;
        const plate = plateBox(mark.label, sx, sy, style, unit, anchor);
        return { sx, sy, anchor, plate, reach, clashes: taken.filter((t) => overlaps(t, plate)).length + (inFrame(plate) ? 0 : 10), crossings: lineHits(plate) };
      }),
    );
    // Clear of labels and of lines if any spot is; else clear of labels, crossing as little line as may be.
    const best = candidates.find((c) => c.clashes === 0 && c.crossings === 0)
      ?? candidates.filter((c) => c.clashes === 0).sort((a, b) => a.crossings + (a.reach - 1) * 6 - (b.crossings + (b.reach - 1) * 6))[0]
      ?? candidates.filter((c) => c.reach === 1).reduce((a, b) => (b.clashes < a.clashes ? b : a));
    taken.push(best.plate);
    plates.push(best.plate);
    if (best.reach > 1) {
      // A leader from the dot's edge to the nearest point of the plate.
      const tx = Math.min(Math.max(x, best.plate.left), best.plate.right);
      const ty = Math.min(Math.max(y, best.plate.top), best.plate.bottom);
      const length = Math.hypot(tx - x, ty - y);
      const start = (4 * unit) / Math.max(length, 1e-9);
      const leader = `x1="${n2(x + (tx - x) * start)}" y1="${n2(y + (ty - y) * start)}" x2="${n2(tx)}" y2="${n2(ty)}"`;
      elements.push(`<line ${leader} stroke="${theme.halo}" stroke-width="${n2(2.6 * unit)}" stroke-opacity="0.8"/><line ${leader} stroke="${theme.text}" stroke-width="${n2(0.9 * unit)}"/>`);
    }
    elements.push(townSymbol(x, y, 5 * unit, theme, unit));
    elements.push(labelElement(mark.label, best.sx, best.sy, style, theme, unit, best.anchor));
  });
  return { elements, plates };
}


/** `top` over `bottom` at an opacity, as the renderer composites sRGB values. */
export function mixHex(bottom: string, top: string, opacity: number): string {
  const channel = (i: number) => Math.round(parseInt(bottom.slice(i, i + 2), 16) * (1 - opacity) + parseInt(top.slice(i, i + 2), 16) * opacity).toString(16).padStart(2, '0');
  return `#${channel(1)}${channel(3)}${channel(5)}`;
}

/** CIE L* of an sRGB colour (IEC 61966-2-1). */
export function hexLightness(hex: string): number {
  const linear = [1, 3, 5].map((i) => {
    const c = parseInt(hex.slice(i, i + 2), 16) / 255;
    return c <= 0.04045 ? c / 12.92 : ((c + 0.055) / 1.055) ** 2.4;
  });
  const y = 0.2126 * linear[0]! + 0.7152 * linear[1]! + 0.0722 * linear[2]!;
  return y > 216 / 24389 ? 116 * Math.cbrt(y) - 16 : (24389 / 27) * y;
}

/**
 * Where the lines run on the page, as points every few pixels in a grid of
 * cells: how many of them a label's plate would cover.
 */
export function lineHitCounter(polylines: readonly (readonly ([number, number] | null)[])[], frame: Frame, cellPx: number): (box: Box) => number {
  const cells = new Map<number, [number, number][]>();
  const key = (cx: number, cy: number) => cx * 100_003 + cy;
  const add = (x: number, y: number) => {
    const k = key(Math.floor(x / cellPx), Math.floor(y / cellPx));
    const list = cells.get(k);
    if (list) list.push([x, y]);
    else cells.set(k, [[x, y]]);
  };
  const step = cellPx / 3;
  for (const line of polylines) {
    for (let k = 1; k < line.length; k++) {
      const a = line[k - 1];
      const b = line[k];
      if (!a || !b) continue;
      const length = Math.hypot(b[0] - a[0], b[1] - a[1]);
      if (length > frame.width / 8) continue; // a jump across the map's edge
      const n = Math.max(1, Math.ceil(length / step));
      for (let i = 0; i < n; i++) add(a[0] + ((b[0] - a[0]) * i) / n, a[1] + ((b[1] - a[1]) * i) / n);
    }
  }
  return (box) => {
    let hits = 0;
    for (let cx = Math.floor(box.left / cellPx); cx <= Math.floor(box.right / cellPx); cx++) {
      for (let cy = Math.floor(box.top / cellPx); cy <= Math.floor(box.bottom / cellPx); cy++) {
        for (const [x, y] of cells.get(key(cx, cy)) ?? []) if (x >= box.left && x <= box.right && y >= box.top && y <= box.bottom) hits++;
      }
    }
    return hits;
  };
}

/** Where a projected line crosses a horizontal line y = targetY, inside a frame; with the index of the point before. */
export function crossingsAtY(points: ([number, number] | null)[], targetY: number, frame: Frame): { point: [number, number]; index: number }[] {
  const found: { point: [number, number]; index: number }[] = [];
  for (let k = 1; k < points.length; k++) {
    const a = points[k - 1];
    const b = points[k];
    if (!a || !b) continue;
    if (Math.hypot(b[0] - a[0], b[1] - a[1]) > frame.width / 8) continue; // a jump across the map's edge
    if ((a[1] - targetY) * (b[1] - targetY) > 0 || a[1] === b[1]) continue;
    const f = (targetY - a[1]) / (b[1] - a[1]);
    const x = a[0] + f * (b[0] - a[0]);
    if (x > frame.x && x < frame.x + frame.width) found.push({ point: [x, targetY], index: k - 1 });
  }
  return found;
}


/**
 * A curve's label: words and time in the label type, then the trade code as a
 * small muted tag, on one plate centred on the crossing, kept inside the frame.
 */
export function curveLabel(words: string, tag: string, x: number, y: number, style: TextStyle, tagStyle: TextStyle, theme: Theme, unit: number, frame: Frame): { element: string; plate: Box } {
  const gap = tag ? 4 * unit : 0;
  const width = measureText(words, style) + gap + (tag ? measureText(tag, tagStyle) : 0);
  const pad = 2.2 * unit;
  const half = width / 2 + pad;
  const cx = Math.min(Math.max(x, frame.x + half), frame.x + frame.width - half);
  const left = cx - width / 2;
  const plate: Box = { left: left - pad, top: y - style.sizePx * 0.8 - pad * 0.6, right: left + width + pad, bottom: y + style.sizePx * 0.25 + pad * 0.6 };
  const rect = `<rect x="${n2(plate.left)}" y="${n2(plate.top)}" width="${n2(plate.right - plate.left)}" height="${n2(plate.bottom - plate.top)}" rx="${n2(2.2 * unit)}" fill="${theme.halo}" fill-opacity="${theme.haloOpacity}"/>`;
  const text = textElement(words, left, y, style, theme.text);
  const code = tag ? textElement(tag, left + measureText(words, style) + gap, y, tagStyle, theme.textMuted) : '';
  return { element: rect + text + code, plate };
}
