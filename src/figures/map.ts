/**
 * A visibility map as one SVG document: a function of (eclipse, style, size)
 * alone — same inputs, same bytes. Layers, bottom to top: zones (painted by
 * caps: the end cap, the start cap, their overlap), land, borders,
 * graticule, the field's lines, the Moon-up edges, the sub-lunar point,
 * labels; then title, legend and small print around the map.
 */
import { geoGraticule, geoPath, type GeoPermissibleObjects, type GeoProjection } from 'd3-geo';
import type { LineString, MultiLineString, Position } from 'geojson';
import { printedFigures } from '../eclipses/lunar/figures.ts';
import type { LunarEclipse } from '../eclipses/lunar/types.ts';
import { durationWords, type CivilClock } from '../ephemeris/civilTime.ts';
import type { LonLat } from '../ephemeris/earth.ts';
import { fieldLines, type FieldLine } from '../visibility/lunar/fieldLines.ts';
import { storyCentre } from '../visibility/lunar/storyCentre.ts';
import { AREA_NAMES } from './areaNames.ts';
import { angularDistanceDeg } from '../sphere/circles.ts';
import { capOutline, PAINTED_ZONES, visibilityZonePolygons } from '../visibility/lunar/zones.ts';
import { stage, visibilityEvaluator, type Stage, type StageName, type Visibility, type ZoneName } from '../visibility/lunar/visibility.ts';
import { timeOnDay, timeRange } from '../ephemeris/dayMark.ts';
import { BASEMAP_CREDIT, detailForScale, loadBasemap, type BasemapDetail, type BorderStyle } from '../sphere/world.ts';
import { thinnedProjection } from './thin.ts';
import { fitView, pixelsPerDegree, type Frame, type View } from './projection.ts';
import type { Theme } from './theme.ts';
import type { MarkClock } from './markClock.ts';
import { escapeXml, FONT_CREDIT, fitText, measureText, wrapText, type TextStyle } from './typography.ts';
import { flowRows, labelElement, layoutFor, n2, overlaps, plateBox, textElement, type Box } from './draw.ts';

export interface MapStyle {
  readonly theme: Theme;
  readonly view: View;
  readonly borders: BorderStyle;
  readonly clock: CivilClock;
  /** Replaces the generated title. */
  readonly title?: string;
  /** Continent and ocean names (resolved: true or false). */
  readonly areaNames?: boolean;
  /** Marked towns' times on the map's clock (one clock per map, the default) or each on its own. */
  readonly markClock?: MarkClock;
}

/** A place marked on the map with a short label ("Dakar · sets 07:23 GMT"). */
export interface MapMark {
  readonly lonDeg: number;
  readonly latDeg: number;
  readonly label: string;
}

/** A label on a Moon-up edge: "Moon rises as totality begins · 11:05", tag "U2", at a place on that edge. */
export interface CurveLabel {
  readonly words: string;
  readonly tag: string;
  readonly at: LonLat;
  readonly utDays: number;
}

export interface MapSize {
  readonly widthPx: number;
  readonly heightPx: number;
}

export interface SceneInput {
  readonly eclipse: LunarEclipse;
  readonly visibility: Visibility;
  readonly style: MapStyle;
  readonly size: MapSize;
  /** "umbracast 0.1.0", for the small print. */
  readonly generator: string;
  readonly marks?: readonly MapMark[];
}

export interface Scene {
  readonly svg: string;
  readonly title: string;
  readonly subtitle: string;
  readonly smallPrint: string;
  /** Where the map sits on the page, and how lon/lat reach it: for tests and marks. */
  readonly project: (place: LonLat) => [number, number] | null;
  /** The page point back to lon/lat. */
  readonly unproject: (point: [number, number]) => LonLat | null;
  /** The map's frame on the page (pixels). */
  readonly frame: Frame;
  /** The continent and ocean names written, with their plates. */
  readonly areaNames: readonly { readonly name: string; readonly plate: Box }[];
  /** The labels on the Moon-up edges, with the place on the edge each names. */
  readonly curveLabels: readonly CurveLabel[];
  /** The world-atlas detail drawn. */
  readonly basemapDetail: BasemapDetail;
  /** The plates of the labels on the map (page pixels): on the zone edges and field lines, and of the marked places. */
  readonly labelPlates: { readonly zones: readonly Box[]; readonly marks: readonly Box[] };
}


const KIND_TITLE: Record<LunarEclipse['kind'], string> = {
  total: 'Total lunar eclipse',
  partial: 'Partial lunar eclipse',
  penumbral: 'Penumbral lunar eclipse',
};

/**
 * Land and borders keep no point within this distance (output pixels) of the
 * last one kept. Measured on 2400-px world maps: 0.5 px takes a third of
 * the basemap's points and bytes and changes 0.001–0.007 % of pixels
 * (pixelmatch, threshold 0.1), at 1 px 0.015–0.04 %.
 */
export const BASEMAP_THINNING_PX = 0.5;


export function sceneTexts(eclipse: LunarEclipse, clock: CivilClock, deltaTLabel: string, generator: string, customTitle?: string) {
  const at = eclipse.greatest.utDays;
  const title = customTitle ?? `${KIND_TITLE[eclipse.kind]} · ${clock.date(at)}`;
  const c = eclipse.contacts;
  // Greatest names the zone; ranges repeat it only when the clocks change during the eclipse, and then
  // each time carries the zone in force at its own instant.
  const clocksChange = clock.offsetChanges(c.P1!.utDays, c.P4!.utDays).length > 0;
  // A time on another day than the title's date says so ("01:13 +1 day").
  const range = (a: number, b: number) => (clocksChange ? clock.range(a, b, at) : timeRange(clock, a, b, at));
  const parts = [`Greatest ${clock.stamp(at)}`];
  // Figures rounded once, from the full value, as in the list and the caption.
  const figures = printedFigures(eclipse);
  const minus = (text: string) => text.replace('-', '−');
  if (eclipse.kind === 'penumbral') {
    parts.push(`penumbral magnitude ${minus(figures.penumbralMagnitude)}`);
    parts.push(`penumbral phase ${durationWords(figures.minutes.penumbral * 60)} (${range(c.P1!.utDays, c.P4!.utDays)})`);
  } else {
    parts.push(`umbral magnitude ${minus(figures.umbralMagnitude)}`);
    if (eclipse.kind === 'total') parts.push(`totality ${durationWords(figures.minutes.total! * 60)} (${range(c.U2!.utDays, c.U3!.utDays)})`);
    parts.push(`in the umbra ${durationWords(figures.minutes.partial! * 60)} (${range(c.U1!.utDays, c.U4!.utDays)})`);
  }
  const subtitle = parts.join(' · ');
  const timesIn = `Times in ${clock.zoneDescriptionBetween(c.P1!.utDays, c.P4!.utDays)}`;
  const convention = eclipse.convention === 'danjon' ? 'Danjon' : 'Chauvenet';
  const smallPrint = [
    `${timesIn}, 24-hour clock, rounded to the minute; "+1 day": the day after the date in the title.`,
    `Shadow: ${convention} convention; ΔT ${deltaTLabel}.`,
    'Moon up: upper limb on a sea-level horizon with standard refraction.',
    'Predictions: weather and the local horizon decide what is seen. A lunar eclipse is safe to watch with the naked eye.',
    `${BASEMAP_CREDIT}. Type: ${FONT_CREDIT}. Made with ${generator}.`,
  ].join(' ');
  return { title, subtitle, smallPrint };
}

/**
 * Places marked on the map, each a dot and a label. A label takes the first
 * spot that overlaps no plate, dot or other label already placed: the eight
 * spots around its dot first, then the same eight directions farther out,
 * joined to the dot by a thin leader line (so that towns a few pixels apart
 * still get a readable label each). Only when every spot clashes does it
 * take the one with the fewest clashes.
 */
function markElements(marks: readonly MapMark[], projection: GeoProjection, frame: Frame, style: TextStyle, theme: Theme, unit: number, taken: Box[], lineHits: (box: Box) => number): { elements: string[]; plates: Box[] } {
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
function mixHex(bottom: string, top: string, opacity: number): string {
  const channel = (i: number) => Math.round(parseInt(bottom.slice(i, i + 2), 16) * (1 - opacity) + parseInt(top.slice(i, i + 2), 16) * opacity).toString(16).padStart(2, '0');
  return `#${channel(1)}${channel(3)}${channel(5)}`;
}

/** CIE L* of an sRGB colour (IEC 61966-2-1). */
function hexLightness(hex: string): number {
  const linear = [1, 3, 5].map((i) => {
    const c = parseInt(hex.slice(i, i + 2), 16) / 255;
    return c <= 0.04045 ? c / 12.92 : ((c + 0.055) / 1.055) ** 2.4;
  });
  const y = 0.2126 * linear[0]! + 0.7152 * linear[1]! + 0.0722 * linear[2]!;
  return y > 216 / 24389 ? 116 * Math.cbrt(y) - 16 : (24389 / 27) * y;
}

/** A marked town: a small square of ink with a paper rim, unlike the Moon-overhead ring. */
function townSymbol(x: number, y: number, side: number, theme: Theme, unit: number): string {
  return `<rect x="${n2(x - side / 2)}" y="${n2(y - side / 2)}" width="${n2(side)}" height="${n2(side)}" fill="${theme.text}" stroke="${theme.halo}" stroke-width="${n2(1.3 * unit)}"/>`;
}

/**
 * Where the lines run on the page, as points every few pixels in a grid of
 * cells: how many of them a label's plate would cover.
 */
function lineHitCounter(polylines: readonly (readonly ([number, number] | null)[])[], frame: Frame, cellPx: number): (box: Box) => number {
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

/**
 * Where the field's lines crowd together on the page (they converge towards
 * the poles, and a small page brings them all closer), dashed lines would
 * merge into one dark band. Keep them apart: lines in order of rank (every
 * second level first, like a contour map's index lines), each point kept
 * only when no kept point of another line lies within `minGapPx` on the
 * page. Returns the kept runs, still in lon/lat for the path to clip.
 */
export function thinnedFieldLines(lines: readonly FieldLine[], projection: GeoProjection, minGapPx: number): Position[][] {
  const levels = [...new Set(lines.map((l) => l.minutes))].sort((a, b) => a - b);
  const rank = (l: FieldLine) => (levels.indexOf(l.minutes) % 2 === 1 ? 0 : 1);
  const order = lines.map((l, id) => ({ l, id })).sort((a, b) => rank(a.l) - rank(b.l) || a.l.minutes - b.l.minutes);
  const [rotLon, rotLat] = projection.rotate();
  const front: LonLat = [-rotLon, -rotLat];
  // d3-geo reports no small-circle clip as 0 (or null): only a globe hides a far side.
  const clipDeg = projection.clipAngle() ?? 0;
  const globe = clipDeg > 0 && clipDeg <= 90;
  const cells = new Map<number, { x: number; y: number; id: number }[]>();
  const cellOf = (x: number, y: number) => Math.floor(x / minGapPx) * 100_003 + Math.floor(y / minGapPx);
  const runs: Position[][] = [];
  for (const { l, id } of order) {
    const kept: boolean[] = [];
    const points = l.line.map((p) => (globe && angularDistanceDeg(front, p) > 90 ? null : projection([p[0]!, p[1]!])));
    points.forEach((pt) => {
      if (!pt) return kept.push(true);
      const [x, y] = pt;
      let clear = true;
      for (let dx = -1; dx <= 1 && clear; dx++) {
        for (let dy = -1; dy <= 1 && clear; dy++) {
          for (const q of cells.get(cellOf(x + dx * minGapPx, y + dy * minGapPx)) ?? []) {
            if (q.id !== id && Math.hypot(q.x - x, q.y - y) < minGapPx) {
              clear = false;
              break;
            }
          }
        }
      }
      kept.push(clear);
    });
    let run: Position[] = [];
    l.line.forEach((p, i) => {
      const pt = points[i];
      if (kept[i]) {
        run.push(p);
        if (pt) {
          const key = cellOf(pt[0], pt[1]);
          const list = cells.get(key);
          if (list) list.push({ x: pt[0], y: pt[1], id });
          else cells.set(key, [{ x: pt[0], y: pt[1], id }]);
        }
      } else {
        if (run.length > 1) runs.push(run);
        run = [];
      }
    });
    if (run.length > 1) runs.push(run);
  }
  return runs;
}

/** Where a projected line crosses a horizontal line y = targetY, inside a frame; with the index of the point before. */
function crossingsAtY(points: ([number, number] | null)[], targetY: number, frame: Frame): { point: [number, number]; index: number }[] {
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


/** What happens at a stage, in a reader's words: "Moon rises as totality begins". */
function curveWords(stageName: StageName, kind: LunarEclipse['kind']): string {
  switch (stageName) {
    case 'P1': return kind === 'penumbral' ? 'as the eclipse begins' : 'as the faint outer shadow begins';
    case 'U1': return 'as the partial eclipse begins';
    case 'U2': return 'as totality begins';
    case 'greatest': return 'at mid-eclipse';
    case 'U3': return 'as totality ends';
    case 'U4': return 'as the partial eclipse ends';
    case 'P4': return kind === 'penumbral' ? 'as the eclipse ends' : 'as the faint outer shadow ends';
  }
}

/**
 * A curve's label: words and time in the label type, then the trade code as a
 * small muted tag, on one plate centred on the crossing, kept inside the frame.
 */
function curveLabel(words: string, tag: string, x: number, y: number, style: TextStyle, tagStyle: TextStyle, theme: Theme, unit: number, frame: Frame): { element: string; plate: Box } {
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

/** How much of a flat world map's width a squarer page may crop (its far sides, opposite the eclipse). */
const WORLD_CROP = 0.45;

const PHASE_WORDS: Record<Visibility['fieldSpan']['phase'], string> = {
  totality: 'totality',
  umbral: 'the umbral phase',
  penumbral: 'the penumbral phase',
};

export function composeScene(input: SceneInput): Scene {
  const { eclipse, visibility, style, size } = input;
  const { theme, clock } = style;
  const layout = layoutFor(size);
  const { unit, margin } = layout;
  const W = size.widthPx;
  const H = size.heightPx;

  const deltaTLabel = `${eclipse.deltaT.seconds.toFixed(1)} s (${eclipse.deltaT.source})`;
  const texts = sceneTexts(eclipse, clock, deltaTLabel, input.generator, style.title);

  // Header.
  const contentWidth = W - 2 * margin;
  const titleText = fitText(texts.title, layout.titleStyle, contentWidth);
  const subtitleLines = wrapText(texts.subtitle, layout.subtitleStyle, contentWidth);
  const titleBaseline = margin + layout.titleStyle.sizePx * 0.95;
  const subtitleBaseline = titleBaseline + layout.subtitleStyle.sizePx * 1.65;
  const headerBottom = subtitleBaseline + (subtitleLines.length - 1) * layout.subtitleStyle.sizePx * 1.35 + 14 * unit;

  // Footer: legend rows, then small print.
  const zoneSpan = visibility.zoneSpan;
  // The zones are those of the umbral phase (of the whole eclipse when it is penumbral): the legend says which.
  const phaseName = eclipse.kind === 'penumbral' ? 'the eclipse' : 'the umbral phase';
  const stageCodes = visibility.stages.map((s) => s.name).filter((n) => n !== 'greatest');
  const codeWords = [
    stageCodes.includes('P1') ? 'P1/P4 the Moon meets/leaves the outer shadow (penumbra)' : '',
    stageCodes.includes('U1') ? 'U1/U4 the umbra' : '',
    stageCodes.includes('U2') ? 'U2/U3 totality begins/ends' : '',
  ].filter(Boolean).join(', ');
  const legendItems: { key: string; label: string }[] = [
    { key: 'sees-all', label: `Moon up for all of ${phaseName}` },
    { key: 'sets-during', label: `Moon sets during ${phaseName}` },
    { key: 'rises-during', label: `Moon rises during ${phaseName}` },
    { key: 'sees-none', label: 'Moon below the horizon throughout' },
    { key: 'edge-strong', label: `Moonrise/moonset as ${phaseName} begins and ends` },
    { key: 'edge-light', label: 'at other stages' },
    { key: 'field', label: `minutes of ${PHASE_WORDS[visibility.fieldSpan.phase]} with the Moon up` },
    { key: 'marker', label: 'Moon overhead at greatest' },
    ...((input.marks ?? []).length > 0 ? [{ key: 'town', label: style.markClock === 'town' ? 'marked town: the key phase in its own time' : 'marked town: the key phase' }] : []),
    { key: 'codes', label: `small tags on the lines: ${codeWords}` },
  ];
  const swatch = 15 * unit;
  const itemGap = 16 * unit;
  const legendRowHeight = layout.legendStyle.sizePx * 1.7;
  const legendRows = flowRows(legendItems, (item) => swatch + 6 * unit + measureText(item.label, layout.legendStyle), contentWidth, margin, itemGap);
  const smallLines = wrapText(texts.smallPrint, layout.smallStyle, contentWidth);
  const smallHeight = smallLines.length * layout.smallStyle.sizePx * 1.4;
  const footerHeight = legendRows.length * legendRowHeight + 10 * unit + smallHeight;
  const gap = 10 * unit;
  const available: Frame = { x: margin, y: headerBottom, width: contentWidth, height: Math.max(10, H - margin - footerHeight - gap - headerBottom) };

  // Projection and data. A map shorter than its frame pulls header and footer in around it.
  const greatest = stage(visibility, 'greatest');
  // A box is shown whole and no more: the frame takes the box's shape, centred across the page (with paper beside it).
  const focus = style.view.projection === 'globe' ? (style.view.centre ?? storyCentre(visibility)) : greatest.cap.centre;
  let fitted = fitView(style.view, available, focus);
  const boxView = style.view.projection === 'region' && 'bbox' in style.view;
  const clip = fitted.projection.clipExtent();
  const [[left, top], [right, bottom]] = geoPath(fitted.projection.clipExtent(null)).bounds(fitted.outline);
  fitted.projection.clipExtent(clip);
  // A flat world map on a page squarer than the world (the square preset) grows to the page's height
  // and gives up its far sides — the meridians farthest from the eclipse — up to WORLD_CROP of its width.
  const flatWorld = fitted.world && style.view.projection !== 'globe';
  const naturalAspect = (right - left) / (bottom - top);
  const grownWidth = flatWorld ? Math.min(available.height * naturalAspect, available.width * (1 + WORLD_CROP)) : right - left;
  const grown = flatWorld && grownWidth > available.width * 1.01;
  const mapHeight = grown ? grownWidth / naturalAspect : bottom - top;
  const slack = fitted.world || boxView ? Math.max(0, available.height - mapHeight) / 2 : 0;
  const slackX = boxView ? Math.max(0, available.width - (right - left)) / 2 : 0;
  const frame: Frame = { x: available.x + slackX, y: available.y + slack, width: available.width - 2 * slackX, height: available.height - 2 * slack };
  if (grown) {
    const wide: Frame = { x: frame.x - (grownWidth - frame.width) / 2, y: frame.y, width: grownWidth, height: frame.height };
    fitted = fitView(style.view, wide, focus);
    fitted.projection.clipExtent([[frame.x, frame.y], [frame.x + frame.width, frame.y + frame.height]]);
  } else if (slack > 0 || slackX > 0) fitted = fitView(style.view, frame, focus);
  const shiftDown = slack;
  const footerTop = frame.y + frame.height + gap;
  const projection: GeoProjection = fitted.projection;
  const path = geoPath(projection).digits(1);
  const basemap = loadBasemap(detailForScale(pixelsPerDegree(fitted)));

  const outlineD = fitted.world ? path({ type: 'Sphere' }) ?? '' : `M${n2(frame.x)},${n2(frame.y)}h${n2(frame.width)}v${n2(frame.height)}h${n2(-frame.width)}Z`;

  // What lies under the lines and letters, and those.
  const base: string[] = [];
  const overlay: string[] = [];
  const open = `<svg xmlns="http://www.w3.org/2000/svg" width="${W}" height="${H}" viewBox="0 0 ${W} ${H}" role="img" aria-labelledby="map-title map-desc">`;
  const head = [`<title id="map-title">${escapeXml(texts.title)}</title>`, `<desc id="map-desc">${escapeXml(`${texts.subtitle}. ${texts.smallPrint}`)}</desc>`];
  base.push(`<rect width="${W}" height="${H}" fill="${theme.paper}"/>`);

  // d3-geo clips every layer to the view (the sphere's edge, or the region's frame): no SVG clip paths needed.
  base.push(`<path d="${outlineD}" fill="${theme.zones['sees-none']}"/>`);
  const zones = visibilityZonePolygons(visibility);
  for (const zone of PAINTED_ZONES) base.push(`<path d="${path(zones[zone]) ?? ''}" fill="${theme.zones[zone]}"/>`);
  // The graticule under the land, the coastline above both.
  base.push(`<path d="${path(geoGraticule().step([30, 30])()) ?? ''}" fill="none" stroke="${theme.graticule}" stroke-width="${n2(0.4 * unit)}" stroke-opacity="${theme.graticuleOpacity}"/>`);
  // World data is denser than the picture: points within half a pixel of the last one kept add bytes and drawing time, not detail.
  const basemapPath = geoPath(thinnedProjection(projection, BASEMAP_THINNING_PX)).digits(1);
  base.push(`<path d="${basemapPath(basemap.land as GeoPermissibleObjects) ?? ''}" fill="${theme.land}" fill-opacity="${theme.landOpacity}" stroke="${theme.coastline}" stroke-width="${n2(0.5 * unit)}" stroke-opacity="${theme.coastlineOpacity}"/>`);
  if (style.borders === 'countries') {
    base.push(`<path d="${basemapPath(basemap.borders) ?? ''}" fill="none" stroke="${theme.border}" stroke-width="${n2(0.5 * unit)}" stroke-opacity="0.75"/>`);
  }

  // The continuous field: lines of equal minutes with the Moon up.
  const lines = fieldLines(visibility);
  const fieldGeometry: MultiLineString = { type: 'MultiLineString', coordinates: thinnedFieldLines(lines, projection, 6.5 * unit) };
  overlay.push(`<path d="${path(fieldGeometry) ?? ''}" fill="none" stroke="${theme.field}" stroke-width="${n2(1.1 * unit)}" stroke-dasharray="${n2(4 * unit)} ${n2(2.2 * unit)}"/>`);

  // Moon-up edges at each stage (drawn, then labelled).
  const edges = new Map(visibility.stages.map((s) => [s.name, capOutline(s)]));
  for (const s of visibility.stages) {
    const strong = s.name === zoneSpan.start || s.name === zoneSpan.end;
    const d = path(edges.get(s.name)!) ?? '';
    overlay.push(strong
      ? `<path d="${d}" fill="none" stroke="${theme.edgeStrong}" stroke-width="${n2(1.7 * unit)}"/>`
      : `<path d="${d}" fill="none" stroke="${theme.edgeLight}" stroke-width="${n2(0.8 * unit)}" stroke-dasharray="${n2(1.5 * unit)} ${n2(2.5 * unit)}" stroke-linecap="round"/>`);
  }
  overlay.push(`<path d="${outlineD}" fill="none" stroke="${theme.textMuted}" stroke-width="${n2(0.8 * unit)}"/>`);

  // Sub-lunar point at greatest: a ring, hollow so that the zone shows through.
  const marker = projection([greatest.cap.centre[0], greatest.cap.centre[1]]);
  const labels: string[] = [];
  const taken: Box[] = [];
  const label = (text: string, x: number, y: number, style: TextStyle) => {
    taken.push(plateBox(text, x, y, style, unit));
    labels.push(labelElement(text, x, y, style, theme, unit));
  };
  if (marker) {
    const [mx, my] = marker;
    taken.push({ left: mx - 9 * unit, top: my - 9 * unit, right: mx + 9 * unit, bottom: my + 9 * unit });
    overlay.push(`<circle cx="${n2(mx)}" cy="${n2(my)}" r="${n2(6.5 * unit)}" fill="none" stroke="${theme.halo}" stroke-width="${n2(4.2 * unit)}" stroke-opacity="0.9"/>`);
    overlay.push(`<circle cx="${n2(mx)}" cy="${n2(my)}" r="${n2(6.5 * unit)}" fill="none" stroke="${theme.marker}" stroke-width="${n2(2.2 * unit)}"/>`);
  }

  // Labels on the Moon-up edges, each stage at its own height so that none collide: in words, with
  // the time, and the contact's code as a small tag after them (explained once, in the legend).
  const stages = visibility.stages;
  // Times carry the zone's name only when the clocks change during the eclipse; else the small print names it once.
  const clocksChange = clock.offsetChanges(eclipse.contacts.P1!.utDays, eclipse.contacts.P4!.utDays).length > 0;
  const stageTime = (utDays: number) => (clocksChange ? clock.stamp(utDays, eclipse.greatest.utDays) : timeOnDay(clock, utDays, eclipse.greatest.utDays));
  const curveLabels: CurveLabel[] = [];
  // A point's place on the page, or null on a globe's far side (the projection alone would fold it onto the near side).
  const onPage = (p: Position): [number, number] | null =>
    style.view.projection === 'globe' && angularDistanceDeg(focus, p) > 90 ? null : projection([p[0]!, p[1]!]);
  const curveStyle: TextStyle = { sizePx: layout.labelStyle.sizePx * 0.95, weight: 'semibold' };
  const tagStyle: TextStyle = { sizePx: layout.labelStyle.sizePx * 0.72, weight: 'regular' };
  stages.forEach((s, index) => {
    const targetY = frame.y + frame.height * (0.16 + (0.5 * index) / Math.max(1, stages.length - 1));
    const ring = edges.get(s.name)!.coordinates;
    const points = ring.map(onPage);
    const at = s.cap.moment.utDays;
    // On a crowded view (a globe, where rising and setting lines of different stages meet), try a little higher or lower.
    const rows = [0, 1, -1, 2, -2].map((k) => targetY + k * curveStyle.sizePx * 1.6);
    const found = new Map<number, { point: [number, number]; index: number }>();
    for (const crossing of crossingsAtY(points, targetY, frame)) found.set(crossing.index, crossing);
    for (const crossing of found.values()) {
      // West of the sub-lunar point the Earth turns places into the Moon-up cap: the Moon rises there.
      const [lon] = ring[crossing.index]!;
      const rising = ((lon! - s.cap.centre[0] + 540) % 360) - 180 < 0;
      const words = `Moon ${rising ? 'rises' : 'sets'} ${curveWords(s.name, eclipse.kind)} · ${stageTime(at)}`;
      const tag = s.name === 'greatest' ? '' : s.name;
      const a = ring[crossing.index]!;
      const b = ring[Math.min(crossing.index + 1, ring.length - 1)]!;
      curveLabels.push({ words, tag, at: [(a[0]! + b[0]!) / 2, (a[1]! + b[1]!) / 2], utDays: at });
      // The lines that bound the zones, and totality's, in the label type's weight; the others lighter.
      const strong = s.name === zoneSpan.start || s.name === zoneSpan.end || s.name === 'U2' || s.name === 'U3';
      const style = strong ? curveStyle : { ...curveStyle, weight: 'regular' as const };
      // The nearest crossing of this same stretch of line at each candidate row; the first whose plate is clear.
      const placed = rows
        .map((y) => crossingsAtY(points, y, frame).sort((p, q) => Math.abs(p.point[0] - crossing.point[0]) - Math.abs(q.point[0] - crossing.point[0]))[0])
        .filter((c): c is { point: [number, number]; index: number } => c !== undefined && Math.abs(c.point[0] - crossing.point[0]) < frame.width / 6)
        .map((c) => curveLabel(words, tag, c.point[0], c.point[1] + curveStyle.sizePx * 0.35, style, tagStyle, theme, unit, frame))
        .find((p) => !taken.some((t) => overlaps(t, p.plate)));
      if (!placed) {
        curveLabels.pop();
        continue;
      }
      taken.push(placed.plate);
      labels.push(placed.element);
    }
  });
  const fieldLabelStyle: TextStyle = { sizePx: layout.labelStyle.sizePx * 0.92, weight: 'regular' };
  // Field labels climb a ladder, one rung per level, so that close lines keep readable labels.
  const rung = fieldLabelStyle.sizePx * 1.5;
  const levels = [...new Set(lines.map((l) => l.minutes))];
  for (const l of lines) {
    const targetY = frame.y + frame.height * 0.84 - levels.indexOf(l.minutes) * rung;
    const points = l.line.map(onPage);
    for (const { point: [x, y] } of crossingsAtY(points, targetY, frame).slice(0, 1)) {
      // Kept inside the frame, as the line labels are.
      const half = measureText(`${l.minutes} min`, fieldLabelStyle) / 2 + 2.2 * unit;
      const cx = Math.min(Math.max(x, frame.x + half), frame.x + frame.width - half);
      label(`${l.minutes} min`, cx, y + fieldLabelStyle.sizePx * 0.35, fieldLabelStyle);
    }
  }
  overlay.push(...labels);
  const zoneLabelPlates = [...taken];
  const marks = input.marks ?? [];
  const lineHits = marks.length === 0 ? () => 0 : lineHitCounter([
    ...visibility.stages.map((s) => edges.get(s.name)!.coordinates.map((p) => projection([p[0]!, p[1]!]))),
    ...lines.map((l) => l.line.map((p) => projection([p[0]!, p[1]!]))),
  ], frame, 6 * unit);
  const marked = markElements(marks, projection, frame, { sizePx: layout.labelStyle.sizePx, weight: 'regular' }, theme, unit, taken, lineHits);
  overlay.push(...marked.elements);

  // Continent and ocean names, last: each at the first of its anchors (and a row above or below) that is on
  // the page and clear of every label and line; in ink that stands out from what lies under it.
  const named: { name: string; plate: Box }[] = [];
  if (style.areaNames ?? false) {
    const nameStyle: TextStyle = { sizePx: layout.labelStyle.sizePx * 1.05, weight: 'regular' };
    const zoneAt = visibilityEvaluator(visibility).zoneAt;
    const hits = lineHitCounter([
      ...visibility.stages.map((s) => edges.get(s.name)!.coordinates.map(onPage)),
      ...lines.map((l) => l.line.map(onPage)),
    ], frame, 6 * unit);
    // On the map itself, not on the paper around a globe or a world's oval: each corner of the plate must
    // come back to itself through the projection's inverse (off the sphere's outline it does not).
    const onSphere = ([x, y]: [number, number]) => {
      const lonLat = projection.invert?.([x, y]);
      if (!lonLat || !Number.isFinite(lonLat[0]) || !Number.isFinite(lonLat[1]) || Math.abs(lonLat[1]) > 90) return false;
      const back = projection(lonLat);
      return back !== null && Math.hypot(back[0] - x, back[1] - y) < 1;
    };
    const inFrame = (b: Box) =>
      b.left >= frame.x && b.right <= frame.x + frame.width && b.top >= frame.y && b.bottom <= frame.y + frame.height &&
      ([[b.left, b.top], [b.right, b.top], [b.left, b.bottom], [b.right, b.bottom]] as [number, number][]).every(onSphere);
    for (const area of AREA_NAMES) {
      const spots = area.anchors.flatMap((anchor) => {
        const p = onPage([anchor[0], anchor[1]]);
        if (!p) return [];
        return [0, -1.6, 1.6].map((k) => ({ anchor, x: p[0], y: p[1] + k * nameStyle.sizePx }));
      });
      const spot = spots.find(({ x, y }) => {
        const box = plateBox(area.name, x, y, nameStyle, unit);
        return inFrame(box) && !taken.some((t) => overlaps(t, box)) && hits(box) === 0;
      });
      if (!spot) continue;
      const plate = plateBox(area.name, spot.x, spot.y, nameStyle, unit);
      taken.push(plate);
      named.push({ name: area.name, plate });
      const zone = zoneAt(spot.anchor);
      const under = area.kind === 'ocean' ? theme.zones[zone] : mixHex(theme.zones[zone], theme.land, theme.landOpacity);
      const contrast = (ink: string) => Math.abs(hexLightness(ink) - hexLightness(under));
      const ink = contrast(theme.text) >= contrast(theme.paper) ? theme.text : theme.paper;
      overlay.push(textElement(area.name, spot.x, spot.y, nameStyle, ink, 'middle').replace('/>', ' fill-opacity="0.78"/>'));
    }
  }

  // Header.
  overlay.push(textElement(titleText, margin, titleBaseline + shiftDown, layout.titleStyle, theme.text));
  subtitleLines.forEach((line, i) => {
    overlay.push(textElement(line, margin, subtitleBaseline + shiftDown + i * layout.subtitleStyle.sizePx * 1.35, layout.subtitleStyle, theme.textMuted));
  });

  // Legend.
  legendRows.forEach((row, r) => {
    const y = footerTop + r * legendRowHeight;
    for (const item of row) {
      overlay.push(legendSwatch(item.key as LegendKey, item.x, y, swatch, theme, unit));
      overlay.push(textElement(item.label, item.x + swatch + 6 * unit, y + swatch * 0.8, layout.legendStyle, theme.text));
    }
  });
  smallLines.forEach((line, i) => {
    const y = footerTop + legendRows.length * legendRowHeight + 10 * unit + layout.smallStyle.sizePx * (1 + i * 1.4) - layout.smallStyle.sizePx * 0.4;
    overlay.push(textElement(line, margin, y, layout.smallStyle, theme.textMuted));
  });
  return {
    svg: [open, ...head, ...base, ...overlay, '</svg>'].join('\n'),
    title: texts.title,
    subtitle: texts.subtitle,
    smallPrint: texts.smallPrint,
    project: (place) => projection([place[0], place[1]]),
    curveLabels,
    areaNames: named,
    unproject: (point) => (projection.invert?.(point) as LonLat | undefined) ?? null,
    frame,
    basemapDetail: basemap.detail,
    labelPlates: { zones: zoneLabelPlates, marks: marked.plates },
  };
}

type LegendKey = ZoneName | 'edge-strong' | 'edge-light' | 'field' | 'marker' | 'codes' | 'town';

function legendSwatch(key: LegendKey, x: number, y: number, size: number, theme: Theme, unit: number): string {
  const midY = n2(y + size / 2);
  switch (key) {
    case 'edge-strong':
      return `<path d="M${n2(x)},${midY}h${n2(size)}" stroke="${theme.edgeStrong}" stroke-width="${n2(1.7 * unit)}"/>`;
    case 'edge-light':
      return `<path d="M${n2(x)},${midY}h${n2(size)}" stroke="${theme.edgeLight}" stroke-width="${n2(0.8 * unit)}" stroke-dasharray="${n2(1.5 * unit)} ${n2(2.5 * unit)}" stroke-linecap="round"/>`;
    case 'field':
      return `<path d="M${n2(x)},${midY}h${n2(size)}" stroke="${theme.field}" stroke-width="${n2(1.1 * unit)}" stroke-dasharray="${n2(4 * unit)} ${n2(2.2 * unit)}"/>`;
    case 'town':
      return townSymbol(x + size / 2, y + size / 2, 5 * unit, theme, unit);
    case 'codes':
      return textElement(size >= 0 ? 'U1' : '', x + size / 2, y + size * 0.72, { sizePx: size * 0.62, weight: 'regular' }, theme.textMuted, 'middle');
    case 'marker':
      return `<circle cx="${n2(x + size / 2)}" cy="${midY}" r="${n2(size * 0.32)}" fill="none" stroke="${theme.halo}" stroke-width="${n2(4.2 * unit)}"/>`
        + `<circle cx="${n2(x + size / 2)}" cy="${midY}" r="${n2(size * 0.32)}" fill="none" stroke="${theme.marker}" stroke-width="${n2(2.2 * unit)}"/>`;
    default: {
      // The zone at sea (upper left) and on land (lower right), as the map shows it.
      const [left, top, w, h] = [x, y + size * 0.1, size, size * 0.8];
      return `<rect x="${n2(left)}" y="${n2(top)}" width="${n2(w)}" height="${n2(h)}" fill="${theme.zones[key]}"/>`
        + `<path d="M${n2(left + w)},${n2(top)}V${n2(top + h)}H${n2(left)}Z" fill="${theme.land}" fill-opacity="${theme.landOpacity}"/>`
        + `<rect x="${n2(left)}" y="${n2(top)}" width="${n2(w)}" height="${n2(h)}" fill="none" stroke="${theme.textMuted}" stroke-width="${n2(0.5 * unit)}"/>`;
    }
  }
}
