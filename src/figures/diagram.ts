/**
 * The shadow diagram: the Earth's penumbra and umbra at the Moon's distance, held still, and the
 * Moon's computed path across them, with the Moon drawn at each contact and at greatest and the
 * time of each. North is up (towards the celestial pole of date) and east to the left, as the sky
 * is seen when facing it. A function of its inputs alone, drawn with the themes and outlined type
 * of the other figures.
 */
import type { ShadowDiagram, SkyOffset } from '../eclipses/lunar/diagram.ts';
import type { ContactName } from '../eclipses/lunar/contacts.ts';
import type { CivilClock } from '../ephemeris/civilTime.ts';
import { timeOnDay } from '../ephemeris/dayMark.ts';
import { diagramTexts, LUNAR_DIAGRAM_ENGLISH, lunarDiagramWords, momentLabel, moonAcrossWords, type LunarDiagramWords } from '../words/lunar/diagram.ts';
import type { LunarWords } from '../words/lunar/text.ts';
import { compassElements, scaleBarElements, labelElement, layoutFor, n2, overlaps, plateBox, textElement, type Box, type PageSize } from './draw.ts';
import { pageFrame, type LegendEntry } from './frame.ts';
import { fillSwatch } from './layers.ts';
import type { Theme } from './theme.ts';
import { FONT_CREDIT, measureText } from './typography.ts';
import { timetableLayout } from './timetable.ts';

export interface DiagramSceneInput {
  readonly diagram: ShadowDiagram;
  readonly clock: CivilClock;
  readonly theme: Theme;
  readonly size: PageSize;
  readonly generator: string;
  readonly title?: string;
  /** The reader's lunar words (settings/language.ts); English when not given. */
  readonly words?: LunarWords;
}

export interface DiagramScene {
  readonly svg: string;
  readonly title: string;
  readonly description: string;
  /** For tests, page pixels: the shadow's centre, pixels per radian, the labels' plates, the body's room. */
  readonly centre: { readonly x: number; readonly y: number };
  readonly pxPerRad: number;
  readonly labelPlates: readonly Box[];
  readonly body: Box;
  /** For tests, page pixels: the timetable as drawn, its heading included; and the page's room for it (margins and footer aside). */
  readonly timetable: Box;
  readonly room: Box;
}

const ARCMIN_RAD = Math.PI / (180 * 60);

/** The Moon's path: a line with a casing, drawn alike on the figure and in its legend. */
const pathInk = (theme: Theme, unit: number) => ({
  casing: `stroke="${theme.trackCasing}" stroke-opacity="0.55" stroke-width="${n2(3.6 * unit)}"`,
  line: `stroke="${theme.field}" stroke-width="${n2(1.8 * unit)}"`,
});

/** A drawn Moon: filled at greatest, a faint disc with an outline at a contact; figure and legend alike. */
const moonInk = (theme: Theme, unit: number, fill: string | undefined) => (fill
  ? `fill="${fill}" fill-opacity="0.9" stroke="${theme.text}" stroke-width="${n2(1.6 * unit)}"`
  : `fill="${theme.halo}" fill-opacity="0.25" stroke="${theme.text}" stroke-width="${n2(1.1 * unit)}"`);

/** The diagram's page: the circles and path on the left (or above, on tall pages), the timetable beside, on the shared page frame. */
export function composeDiagramScene(input: DiagramSceneInput): DiagramScene {
  const { diagram, clock, theme, size } = input;
  const { eclipse } = diagram;
  const W = size.widthPx;
  const H = size.heightPx;
  const greatestUt = eclipse.greatest.utDays;
  const first = eclipse.contacts.P1!.utDays;
  const last = eclipse.contacts.P4!.utDays;
  const zoneName = clock.zoneDescriptionBetween(first, last);
  const clocksChange = clock.offsetChanges(first, last).length > 0;
  const timeText = (utDays: number) => (clocksChange ? clock.stamp(utDays, greatestUt) : timeOnDay(clock, utDays, greatestUt));
  // A title too long for the page's width (a square page) gives way to the short one, never cut.
  const sizing = layoutFor(size);
  const fits = (text: string) => measureText(text, sizing.titleStyle) <= W - 2 * sizing.margin;
  const { title, subtitle, smallPrint } = diagramTexts(eclipse, clock, timeText, zoneName, input.generator, FONT_CREDIT, input.title, input.words, fits);
  const words = lunarDiagramWords(input.words);

  const unitOf = layoutFor(size).unit;
  const moonFill = theme.track[eclipse.kind === 'total' ? 'total' : eclipse.kind === 'partial' ? 'partial' : 'penumbral'];
  const path = pathInk(theme, unitOf);
  const moonSwatch = (fill: string | undefined) => (x: number, y: number, s: number) =>
    `<circle cx="${n2(x + s / 2)}" cy="${n2(y + s / 2)}" r="${n2(s * 0.42)}" ${moonInk(theme, unitOf, fill)}/>`;
  const legend: LegendEntry[] = [
    { label: words.legend.penumbra, swatch: fillSwatch(theme.sky.civil, theme, unitOf) },
    { label: words.legend.umbra, swatch: fillSwatch(theme.sky.astronomical, theme, unitOf) },
    { label: words.legend.moonAtGreatest, swatch: moonSwatch(moonFill) },
    { label: words.legend.moonAtContact, swatch: moonSwatch(undefined) },
    {
      label: words.legend.path,
      swatch: (x, y, s) => `<path d="M${n2(x)},${n2(y + s / 2)}h${n2(s)}" ${path.casing}/><path d="M${n2(x)},${n2(y + s / 2)}h${n2(s)}" ${path.line}/>`,
    },
  ];
  const page = pageFrame({
    size, theme, id: 'diagram', title, subtitle, description: `${subtitle} ${smallPrint}`, smallPrint, legend,
    legendSetting: { swatchUnits: 14, gapUnits: 14, gapInWidth: true }, headerGapUnits: 14,
  });
  const { layout, contentWidth } = page;
  const { unit, margin } = layout;

  // The timetable: one row per moment, in time order.
  const moments = [
    ...diagram.contacts.map((c) => ({ key: c.name as ContactName | 'greatest', utDays: c.moment.utDays })),
    { key: 'greatest' as const, utDays: greatestUt },
  ].sort((a, b) => a.utDays - b.utDays);
  const rowStyle = layout.legendStyle;
  const headStyle = { sizePx: layout.legendStyle.sizePx * 1.05, weight: 'semibold' as const };
  const rowText = moments.map((m) => ({ ...m, label: m.key === 'greatest' ? words.greatest : m.key, time: timeText(m.utDays), words: words.moments[m.key] }));
  const { keyWidth, timeWidth, gap, rowHeight, tableWidth, tableHeight, bodyBottom, side, plot, table } = timetableLayout(rowText, rowStyle, headStyle, { W, H, margin, unit, contentWidth, headerBottom: page.headerBottom, footerHeight: page.footerHeight }, 0.45);

  // Scale: the whole path with its Moon, and the penumbra, fit inside the plot with room for labels.
  const moonRad = diagram.greatest.moonSemiDiameterRad;
  const xs = [...diagram.path.map((p) => -p.eastRad), diagram.radii.penumbraRad, -diagram.radii.penumbraRad];
  const ys = [...diagram.path.map((p) => p.northRad), diagram.radii.penumbraRad, -diagram.radii.penumbraRad];
  const spanX = Math.max(...xs) - Math.min(...xs) + 2 * moonRad;
  const spanY = Math.max(...ys) - Math.min(...ys) + 2 * moonRad;
  const labelRoom = 2 * (rowStyle.sizePx * 2.6);
  const pxPerRad = Math.min((plot.right - plot.left - labelRoom) / spanX, (plot.bottom - plot.top - labelRoom) / spanY);
  const midX = (Math.max(...xs) + Math.min(...xs)) / 2;
  const midY = (Math.max(...ys) + Math.min(...ys)) / 2;
  const cx = (plot.left + plot.right) / 2 - midX * pxPerRad;
  const cy = (plot.top + plot.bottom) / 2 + midY * pxPerRad;
  // East to the left: x grows westward.
  const px = (o: SkyOffset) => cx - o.eastRad * pxPerRad;
  const py = (o: SkyOffset) => cy - o.northRad * pxPerRad;

  const out: string[] = [];

  // The shadow: penumbra, umbra, and a small cross on its axis.
  const edge = `stroke="${theme.textMuted}" stroke-width="${n2(0.9 * unit)}"`;
  out.push(`<circle cx="${n2(cx)}" cy="${n2(cy)}" r="${n2(diagram.radii.penumbraRad * pxPerRad)}" fill="${theme.sky.civil}" ${edge}/>`);
  out.push(`<circle cx="${n2(cx)}" cy="${n2(cy)}" r="${n2(diagram.radii.umbraRad * pxPerRad)}" fill="${theme.sky.astronomical}" ${edge}/>`);
  const tick = 6 * unit;
  out.push(`<path d="M${n2(cx - tick)},${n2(cy)}h${n2(2 * tick)}M${n2(cx)},${n2(cy - tick)}v${n2(2 * tick)}" stroke="${theme.sky.day}" stroke-width="${n2(1 * unit)}"/>`);

  // The Moon's path, and an arrowhead on it after P4: the direction of motion.
  const points = diagram.path.map((p) => `${n2(px(p))},${n2(py(p))}`);
  out.push(`<path d="M${points.join('L')}" fill="none" ${path.casing} stroke-linejoin="round"/>`);
  out.push(`<path d="M${points.join('L')}" fill="none" ${path.line} stroke-linejoin="round"/>`);
  out.push(`<path d="${arrowHead(diagram.path, px, py, 11 * unit)}" fill="${theme.field}" stroke="${theme.trackCasing}" stroke-opacity="0.55" stroke-width="${n2(0.8 * unit)}"/>`);

  // The Moon at each contact (outlines) and at greatest (filled).
  for (const c of diagram.contacts) {
    out.push(`<circle cx="${n2(px(c.offset))}" cy="${n2(py(c.offset))}" r="${n2(c.moonSemiDiameterRad * pxPerRad)}" ${moonInk(theme, unit, undefined)}/>`);
  }
  const g = diagram.greatest;
  out.push(`<circle cx="${n2(px(g.offset))}" cy="${n2(py(g.offset))}" r="${n2(g.moonSemiDiameterRad * pxPerRad)}" ${moonInk(theme, unit, moonFill)}/>`);
  for (const m of [...diagram.contacts, g]) {
    out.push(`<circle cx="${n2(px(m.offset))}" cy="${n2(py(m.offset))}" r="${n2(2.2 * unit)}" fill="${theme.text}"/>`);
  }

  // Labels: beside each Moon, across the path from it, on the side away from the shadow's centre
  // first; the first spot whose plate covers no earlier plate.
  const labelStyle = layout.labelStyle;
  const taken: Box[] = [];
  const labelPlates: Box[] = [];
  const labelled = [
    ...diagram.contacts.map((c) => ({ ...c, text: momentLabel(c.name, timeText(c.moment.utDays), input.words) })),
    { ...g, name: 'greatest', text: momentLabel('greatest', timeText(g.moment.utDays), input.words) },
  ];
  for (const m of labelled) {
    const i = diagram.path.findIndex((p) => p.ttDays >= m.moment.ttDays);
    const a = diagram.path[Math.max(0, i - 1)]!;
    const b = diagram.path[Math.min(diagram.path.length - 1, Math.max(1, i))]!;
    const dx = px(b) - px(a);
    const dy = py(b) - py(a);
    const length = Math.hypot(dx, dy) || 1;
    // The path's normal on the page, pointing away from the shadow's centre.
    let nx = -dy / length;
    let ny = dx / length;
    if (nx * (px(m.offset) - cx) + ny * (py(m.offset) - cy) < 0) [nx, ny] = [-nx, -ny];
    const radiusPx = m.moonSemiDiameterRad * pxPerRad;
    const spots = [1, -1, 1.9, -1.9, 2.8, -2.8].map((k) => {
      const reach = Math.sign(k) * (radiusPx + 8 * unit + (Math.abs(k) - 1) * labelStyle.sizePx * 1.4 + labelStyle.sizePx * 0.6);
      const lx = px(m.offset) + nx * reach;
      const ly = py(m.offset) + ny * reach + labelStyle.sizePx * 0.35;
      const anchor: 'start' | 'middle' | 'end' = Math.abs(nx * Math.sign(k)) < 0.35 ? 'middle' : nx * Math.sign(k) > 0 ? 'start' : 'end';
      return { lx, ly, anchor, plate: plateBox(m.text, lx, ly, labelStyle, unit, anchor) };
    });
    const inside = (p: Box) => p.left >= plot.left && p.right <= plot.right && p.top >= plot.top && p.bottom <= plot.bottom;
    const spot = spots.find((s) => inside(s.plate) && !taken.some((t) => overlaps(t, s.plate))) ?? spots.find((s) => !taken.some((t) => overlaps(t, s.plate))) ?? spots[0]!;
    taken.push(spot.plate);
    labelPlates.push(spot.plate);
    out.push(labelElement(m.text, spot.lx, spot.ly, labelStyle, theme, unit, spot.anchor));
  }

  // Compass (top left of the plot) and scale (bottom left).
  out.push(...compassElements(plot, layout.legendStyle.sizePx, theme, unit, words.compass));

  out.push(...scaleBarElements(plot, layout.legendStyle.sizePx, theme, unit, ARCMIN_RAD * pxPerRad, [60, 30, 20, 10], moonAcrossWords((2 * moonRad) / ARCMIN_RAD, input.words)));

  // The timetable.
  const heading = words.timesHeading(clocksChange ? undefined : clock.abbreviation(greatestUt));
  out.push(textElement(heading, table.left, table.top + headStyle.sizePx, headStyle, theme.text));
  const timetable = { left: table.left, top: table.top, right: table.left + Math.max(tableWidth, measureText(heading, headStyle)), bottom: table.top + tableHeight };
  rowText.forEach((r, i) => {
    const y = table.top + headStyle.sizePx * 2 + (i + 0.75) * rowHeight;
    const strong = r.key === 'greatest';
    out.push(textElement(r.label, table.left, y, { ...rowStyle, weight: 'semibold' }, theme.text));
    out.push(textElement(r.time, table.left + keyWidth + gap, y, { ...rowStyle, weight: strong ? 'semibold' : 'regular' }, theme.text));
    out.push(textElement(r.words, table.left + keyWidth + timeWidth + 2 * gap, y, rowStyle, theme.textMuted));
  });

  return {
    svg: page.render({ layers: out, footer: 'page-bottom' }),
    title,
    description: `${subtitle} ${smallPrint}`,
    centre: { x: cx, y: cy },
    pxPerRad,
    labelPlates,
    body: { left: plot.left, top: plot.top, right: W - margin, bottom: bodyBottom },
    timetable,
    room: { left: margin, top: page.headerBottom, right: W - margin, bottom: bodyBottom },
  };
}

/** The inset's shape: its width over its height, for a given diagram (the path's extent with its Moon, and a heading row). */
export function diagramInsetAspect(diagram: ShadowDiagram, headingPx: number, widthPx: number): number {
  const { spanX, spanY } = diagramExtent(diagram);
  const inner = widthPx * 0.9;
  return widthPx / ((inner * spanY) / spanX + headingPx + widthPx * 0.1);
}

function diagramExtent(diagram: ShadowDiagram) {
  const moonRad = diagram.greatest.moonSemiDiameterRad;
  const xs = [...diagram.path.map((p) => -p.eastRad), diagram.radii.penumbraRad, -diagram.radii.penumbraRad];
  const ys = [...diagram.path.map((p) => p.northRad), diagram.radii.penumbraRad, -diagram.radii.penumbraRad];
  return {
    spanX: Math.max(...xs) - Math.min(...xs) + 2 * moonRad,
    spanY: Math.max(...ys) - Math.min(...ys) + 2 * moonRad,
    midX: (Math.max(...xs) + Math.min(...xs)) / 2,
    midY: (Math.max(...ys) + Math.min(...ys)) / 2,
  };
}

/**
 * The diagram small, as an inset on a map: a paper panel in `box` with a heading, the shadow's
 * circles, the Moon's path with its arrow, the Moon at each contact and at greatest; the times
 * are the map's. The same geometry and inks as the full figure.
 */
export function diagramInset(diagram: ShadowDiagram, theme: Theme, box: Box, unit: number, headingStyle: { sizePx: number; weight: 'semibold' }, words: LunarDiagramWords = LUNAR_DIAGRAM_ENGLISH): string {
  const { eclipse } = diagram;
  const pad = (box.right - box.left) * 0.05;
  const plot = { left: box.left + pad, right: box.right - pad, top: box.top + pad + headingStyle.sizePx * 1.3, bottom: box.bottom - pad };
  const { spanX, spanY, midX, midY } = diagramExtent(diagram);
  const pxPerRad = Math.min((plot.right - plot.left) / spanX, (plot.bottom - plot.top) / spanY);
  const cx = (plot.left + plot.right) / 2 - midX * pxPerRad;
  const cy = (plot.top + plot.bottom) / 2 + midY * pxPerRad;
  const px = (o: SkyOffset) => cx - o.eastRad * pxPerRad;
  const py = (o: SkyOffset) => cy - o.northRad * pxPerRad;
  const path = pathInk(theme, unit * 0.6);
  const moonFill = theme.track[eclipse.kind === 'total' ? 'total' : eclipse.kind === 'partial' ? 'partial' : 'penumbral'];
  const out: string[] = [];
  out.push(`<rect x="${n2(box.left)}" y="${n2(box.top)}" width="${n2(box.right - box.left)}" height="${n2(box.bottom - box.top)}" rx="${n2(3 * unit)}" fill="${theme.paper}" fill-opacity="0.94" stroke="${theme.textMuted}" stroke-width="${n2(0.8 * unit)}"/>`);
  out.push(textElement(words.inset.heading, box.left + pad, box.top + pad + headingStyle.sizePx * 0.85, headingStyle, theme.text));
  const edge = `stroke="${theme.textMuted}" stroke-width="${n2(0.6 * unit)}"`;
  out.push(`<circle cx="${n2(cx)}" cy="${n2(cy)}" r="${n2(diagram.radii.penumbraRad * pxPerRad)}" fill="${theme.sky.civil}" ${edge}/>`);
  out.push(`<circle cx="${n2(cx)}" cy="${n2(cy)}" r="${n2(diagram.radii.umbraRad * pxPerRad)}" fill="${theme.sky.astronomical}" ${edge}/>`);
  const points = diagram.path.map((p) => `${n2(px(p))},${n2(py(p))}`);
  out.push(`<path d="M${points.join('L')}" fill="none" ${path.casing} stroke-linejoin="round"/>`);
  out.push(`<path d="M${points.join('L')}" fill="none" ${path.line} stroke-linejoin="round"/>`);
  out.push(`<path d="${arrowHead(diagram.path, px, py, 7 * unit)}" fill="${theme.field}"/>`);
  for (const c of diagram.contacts) {
    out.push(`<circle cx="${n2(px(c.offset))}" cy="${n2(py(c.offset))}" r="${n2(c.moonSemiDiameterRad * pxPerRad)}" ${moonInk(theme, unit * 0.7, undefined)}/>`);
  }
  const g = diagram.greatest;
  out.push(`<circle cx="${n2(px(g.offset))}" cy="${n2(py(g.offset))}" r="${n2(g.moonSemiDiameterRad * pxPerRad)}" ${moonInk(theme, unit * 0.7, moonFill)}/>`);
  return `<g>${out.join('')}</g>`;
}

/** The arrowhead at the end of the Moon's path (its direction of motion), `headPx` long, as path data. */
function arrowHead<P>(path: readonly P[], px: (p: P) => number, py: (p: P) => number, headPx: number): string {
  const tip = path[path.length - 1]!;
  const before = path[path.length - 3]!;
  const angle = Math.atan2(py(tip) - py(before), px(tip) - px(before));
  const corner = (a: number, r: number) => `${n2(px(tip) - r * Math.cos(angle + a * 0.16))},${n2(py(tip) - r * Math.sin(angle + a * 0.16))}`;
  return `M${corner(2.6, headPx)}L${corner(0, 0)}L${corner(-2.6, headPx)}Z`;
}
