/**
 * The shadow diagram: the Earth's penumbra and umbra at the Moon's distance, held still, and the
 * Moon's computed path across them, with the Moon drawn at each contact and at greatest and the
 * time of each. North is up (towards the celestial pole of date) and east to the left, as the sky
 * is seen when facing it. A function of its inputs alone, drawn with the themes and outlined type
 * of the other figures.
 */
import type { ShadowDiagram, SkyOffset } from '../eclipses/lunar/diagram.ts';
import type { ContactName } from '../eclipses/lunar/contacts.ts';
import { printedFigures } from '../eclipses/lunar/figures.ts';
import type { LunarEclipse } from '../eclipses/lunar/types.ts';
import type { CivilClock } from '../ephemeris/civilTime.ts';
import { formatDuration } from '../words/common.ts';
import { timeOnDay } from '../ephemeris/dayMark.ts';
import { labelElement, layoutFor, n2, overlaps, plateBox, textElement, type Box, type PageSize } from './draw.ts';
import type { Theme } from './theme.ts';
import { escapeXml, FONT_CREDIT, fitText, measureText, wrapText } from './typography.ts';

export interface DiagramSceneInput {
  readonly diagram: ShadowDiagram;
  readonly clock: CivilClock;
  readonly theme: Theme;
  readonly size: PageSize;
  readonly generator: string;
  readonly title?: string;
}

export interface DiagramScene {
  readonly svg: string;
  readonly title: string;
  readonly description: string;
  /** For tests, page pixels: the shadow's centre, pixels per radian, the labels' plates. */
  readonly centre: { readonly x: number; readonly y: number };
  readonly pxPerRad: number;
  readonly labelPlates: readonly Box[];
}

const KIND_WORDS: Record<LunarEclipse['kind'], string> = { total: 'total', partial: 'partial', penumbral: 'penumbral' };
const ARCMIN_RAD = Math.PI / (180 * 60);

/** What each moment means for the Moon, in our words. */
export const MOMENT_WORDS: Readonly<Record<ContactName | 'greatest', string>> = {
  P1: 'touches the penumbra',
  U1: 'touches the umbra',
  U2: 'wholly inside the umbra',
  greatest: 'deepest in the shadow',
  U3: 'begins to leave the umbra',
  U4: 'clear of the umbra',
  P4: 'clear of the penumbra',
};

/** The diagram's page: the circles and path on the left (or above, on tall pages), the timetable beside. */
export function composeDiagramScene(input: DiagramSceneInput): DiagramScene {
  const { diagram, clock, theme, size } = input;
  const { eclipse } = diagram;
  const layout = layoutFor(size);
  const { unit, margin } = layout;
  const W = size.widthPx;
  const H = size.heightPx;
  const contentWidth = W - 2 * margin;
  const figures = printedFigures(eclipse);
  const greatestUt = eclipse.greatest.utDays;
  const first = eclipse.contacts.P1!.utDays;
  const last = eclipse.contacts.P4!.utDays;
  const zoneName = clock.zoneDescriptionBetween(first, last);
  const clocksChange = clock.offsetChanges(first, last).length > 0;
  const timeText = (utDays: number) => (clocksChange ? clock.stamp(utDays, greatestUt) : timeOnDay(clock, utDays, greatestUt));

  const title = input.title ?? `Through the Earth's shadow: the ${KIND_WORDS[eclipse.kind]} lunar eclipse of ${clock.date(greatestUt)}`;
  // A long title takes a second line rather than losing its end.
  const wrapped = wrapText(title, layout.titleStyle, contentWidth);
  const titleLines = wrapped.length <= 2 ? wrapped : [wrapped[0]!, fitText(wrapped.slice(1).join(' '), layout.titleStyle, contentWidth)];
  const depth = eclipse.kind === 'penumbral'
    ? `penumbral magnitude ${figures.penumbralMagnitude}`
    : `umbral magnitude ${figures.umbralMagnitude}`;
  const longest = eclipse.durations.totalSeconds !== undefined ? `totality ${formatDuration(eclipse.durations.totalSeconds)}`
    : eclipse.durations.partialSeconds !== undefined ? `partial phase ${formatDuration(eclipse.durations.partialSeconds)}`
      : `penumbral phase ${formatDuration(eclipse.durations.penumbralSeconds)}`;
  const subtitle = `The Moon's path across the shadow, deepest at ${timeText(greatestUt)} (${depth}, ${longest}). Times: ${zoneName}.`;
  const subtitleLines = wrapText(subtitle, layout.subtitleStyle, contentWidth);
  const titleBaseline = margin + layout.titleStyle.sizePx * 0.95;
  const subtitleBaseline = titleBaseline + (titleLines.length - 1) * layout.titleStyle.sizePx * 1.2 + layout.subtitleStyle.sizePx * 1.65;
  const headerBottom = subtitleBaseline + (subtitleLines.length - 1) * layout.subtitleStyle.sizePx * 1.35 + 14 * unit;

  const smallPrint = [
    'Seen from the Earth\'s centre with the shadow held still: the line is the Moon\'s computed path relative to it.',
    'North up, towards the celestial pole of date; east to the left, as the sky looks when you face it.',
    `Shadow: ${eclipse.convention === 'danjon' ? 'Danjon' : 'Chauvenet'} convention, circles at greatest; ΔT ${eclipse.deltaT.seconds.toFixed(1)} s (${eclipse.deltaT.source}); gamma ${figures.gamma}.`,
    'Predictions: weather and the local horizon decide what is seen. A lunar eclipse is safe to watch with the naked eye.',
    `Type: ${FONT_CREDIT}. Made with ${input.generator}.`,
  ].join(' ');
  const smallLines = wrapText(smallPrint, layout.smallStyle, contentWidth);
  const smallHeight = smallLines.length * layout.smallStyle.sizePx * 1.4;

  // The timetable: one row per moment, in time order.
  const moments = [
    ...diagram.contacts.map((c) => ({ key: c.name as ContactName | 'greatest', utDays: c.moment.utDays })),
    { key: 'greatest' as const, utDays: greatestUt },
  ].sort((a, b) => a.utDays - b.utDays);
  const rowStyle = layout.legendStyle;
  const headStyle = { sizePx: layout.legendStyle.sizePx * 1.05, weight: 'semibold' as const };
  const rowText = moments.map((m) => ({ ...m, label: m.key === 'greatest' ? 'Greatest' : m.key, time: timeText(m.utDays), words: MOMENT_WORDS[m.key] }));
  const keyWidth = Math.max(...rowText.map((r) => measureText(r.label, { ...rowStyle, weight: 'semibold' })));
  const timeWidth = Math.max(...rowText.map((r) => measureText(r.time, rowStyle)));
  const wordsWidth = Math.max(...rowText.map((r) => measureText(r.words, rowStyle)));
  const gap = 10 * unit;
  const tableWidth = keyWidth + timeWidth + wordsWidth + 2 * gap;
  const rowHeight = rowStyle.sizePx * 1.75;
  const tableHeight = headStyle.sizePx * 2 + rowText.length * rowHeight;

  const bodyTop = headerBottom;
  const bodyBottom = H - margin - smallHeight - 10 * unit;
  // Wide pages put the timetable beside the circles; others put it below them.
  const side = W / H >= 1.2 && tableWidth < contentWidth * 0.45;
  const plot = side
    ? { left: margin, top: bodyTop, right: W - margin - tableWidth - 24 * unit, bottom: bodyBottom }
    : { left: margin, top: bodyTop, right: W - margin, bottom: bodyBottom - tableHeight - 12 * unit };
  const table = side
    ? { left: W - margin - tableWidth, top: bodyTop + 8 * unit }
    : { left: margin + Math.max(0, (contentWidth - tableWidth) / 2), top: plot.bottom + 12 * unit };

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
  out.push(`<svg xmlns="http://www.w3.org/2000/svg" width="${W}" height="${H}" viewBox="0 0 ${W} ${H}" role="img" aria-labelledby="diagram-title diagram-desc">`);
  out.push(`<title id="diagram-title">${escapeXml(title)}</title>`);
  out.push(`<desc id="diagram-desc">${escapeXml(`${subtitle} ${smallPrint}`)}</desc>`);
  out.push(`<rect width="${W}" height="${H}" fill="${theme.paper}"/>`);

  // The shadow: penumbra, umbra, and a small cross on its axis.
  const edge = `stroke="${theme.textMuted}" stroke-width="${n2(0.9 * unit)}"`;
  out.push(`<circle cx="${n2(cx)}" cy="${n2(cy)}" r="${n2(diagram.radii.penumbraRad * pxPerRad)}" fill="${theme.sky.civil}" ${edge}/>`);
  out.push(`<circle cx="${n2(cx)}" cy="${n2(cy)}" r="${n2(diagram.radii.umbraRad * pxPerRad)}" fill="${theme.sky.astronomical}" ${edge}/>`);
  const tick = 6 * unit;
  out.push(`<path d="M${n2(cx - tick)},${n2(cy)}h${n2(2 * tick)}M${n2(cx)},${n2(cy - tick)}v${n2(2 * tick)}" stroke="${theme.sky.day}" stroke-width="${n2(1 * unit)}"/>`);

  // The Moon's path, and an arrowhead on it after P4: the direction of motion.
  const points = diagram.path.map((p) => `${n2(px(p))},${n2(py(p))}`);
  out.push(`<path d="M${points.join('L')}" fill="none" stroke="${theme.trackCasing}" stroke-opacity="0.55" stroke-width="${n2(3.6 * unit)}" stroke-linejoin="round"/>`);
  out.push(`<path d="M${points.join('L')}" fill="none" stroke="${theme.field}" stroke-width="${n2(1.8 * unit)}" stroke-linejoin="round"/>`);
  const tip = diagram.path[diagram.path.length - 1]!;
  const before = diagram.path[diagram.path.length - 3]!;
  const angle = Math.atan2(py(tip) - py(before), px(tip) - px(before));
  const head = 11 * unit;
  const arrow = [0, 2.6, -2.6].map((a, i) => {
    const r = i === 0 ? 0 : head;
    return `${n2(px(tip) - r * Math.cos(angle + a * 0.16))},${n2(py(tip) - r * Math.sin(angle + a * 0.16))}`;
  });
  out.push(`<path d="M${arrow[1]}L${arrow[0]}L${arrow[2]}Z" fill="${theme.field}" stroke="${theme.trackCasing}" stroke-opacity="0.55" stroke-width="${n2(0.8 * unit)}"/>`);

  // The Moon at each contact (outlines) and at greatest (filled).
  const moonFill = theme.track[eclipse.kind === 'total' ? 'total' : eclipse.kind === 'partial' ? 'partial' : 'penumbral'];
  for (const c of diagram.contacts) {
    out.push(`<circle cx="${n2(px(c.offset))}" cy="${n2(py(c.offset))}" r="${n2(c.moonSemiDiameterRad * pxPerRad)}" fill="${theme.halo}" fill-opacity="0.25" stroke="${theme.text}" stroke-width="${n2(1.1 * unit)}"/>`);
  }
  const g = diagram.greatest;
  out.push(`<circle cx="${n2(px(g.offset))}" cy="${n2(py(g.offset))}" r="${n2(g.moonSemiDiameterRad * pxPerRad)}" fill="${moonFill}" fill-opacity="0.9" stroke="${theme.text}" stroke-width="${n2(1.6 * unit)}"/>`);
  for (const m of [...diagram.contacts, g]) {
    out.push(`<circle cx="${n2(px(m.offset))}" cy="${n2(py(m.offset))}" r="${n2(2.2 * unit)}" fill="${theme.text}"/>`);
  }

  // Labels: beside each Moon, across the path from it, on the side away from the shadow's centre
  // first; the first spot whose plate covers no earlier plate.
  const labelStyle = layout.labelStyle;
  const taken: Box[] = [];
  const labelPlates: Box[] = [];
  const labelled = [...diagram.contacts.map((c) => ({ ...c, text: `${c.name} ${timeText(c.moment.utDays)}` })), { ...g, name: 'greatest', text: `Greatest ${timeText(g.moment.utDays)}` }];
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
  const compassStyle = { sizePx: layout.legendStyle.sizePx, weight: 'semibold' as const };
  const arm = 26 * unit;
  const ox = plot.left + compassStyle.sizePx * 1.4 + arm;
  const oy = plot.top + compassStyle.sizePx * 1.6 + arm;
  const stroke = `stroke="${theme.text}" stroke-width="${n2(1.3 * unit)}" fill="none"`;
  const barb = 5 * unit;
  out.push(`<path d="M${n2(ox)},${n2(oy)}V${n2(oy - arm)}M${n2(ox - barb)},${n2(oy - arm + barb)}L${n2(ox)},${n2(oy - arm)}L${n2(ox + barb)},${n2(oy - arm + barb)}" ${stroke}/>`);
  out.push(`<path d="M${n2(ox)},${n2(oy)}H${n2(ox - arm)}M${n2(ox - arm + barb)},${n2(oy - barb)}L${n2(ox - arm)},${n2(oy)}L${n2(ox - arm + barb)},${n2(oy + barb)}" ${stroke}/>`);
  out.push(textElement('N', ox, oy - arm - compassStyle.sizePx * 0.45, compassStyle, theme.text, 'middle'));
  out.push(textElement('E', ox - arm - compassStyle.sizePx * 0.35, oy + compassStyle.sizePx * 0.35, compassStyle, theme.text, 'end'));

  const scaleStyle = { sizePx: layout.legendStyle.sizePx * 0.95, weight: 'regular' as const };
  const barArcmin = [60, 30, 20, 10].find((m) => m * ARCMIN_RAD * pxPerRad <= (plot.right - plot.left) * 0.3) ?? 10;
  const barPx = barArcmin * ARCMIN_RAD * pxPerRad;
  const sx = plot.left + 4 * unit;
  const sy = plot.bottom - scaleStyle.sizePx * 1.6;
  out.push(`<path d="M${n2(sx)},${n2(sy - 4 * unit)}V${n2(sy)}H${n2(sx + barPx)}V${n2(sy - 4 * unit)}" ${stroke}/>`);
  out.push(textElement(`${barArcmin}′`, sx + barPx / 2, sy - 6 * unit, scaleStyle, theme.text, 'middle'));
  const moonArcmin = (2 * moonRad) / ARCMIN_RAD;
  out.push(textElement(`the Moon is ${moonArcmin.toFixed(1)}′ across`, sx, sy + scaleStyle.sizePx * 1.3, scaleStyle, theme.textMuted));

  // Timetable, with a key to the fills.
  out.push(textElement(`Times (${clocksChange ? 'each with its zone' : clock.abbreviation(greatestUt)})`, table.left, table.top + headStyle.sizePx, headStyle, theme.text));
  rowText.forEach((r, i) => {
    const y = table.top + headStyle.sizePx * 2 + (i + 0.75) * rowHeight;
    const strong = r.key === 'greatest';
    out.push(textElement(r.label, table.left, y, { ...rowStyle, weight: 'semibold' }, theme.text));
    out.push(textElement(r.time, table.left + keyWidth + gap, y, { ...rowStyle, weight: strong ? 'semibold' : 'regular' }, theme.text));
    out.push(textElement(r.words, table.left + keyWidth + timeWidth + 2 * gap, y, rowStyle, theme.textMuted));
  });
  if (side) {
    const keyTop = table.top + tableHeight + 18 * unit;
    const swatch = 14 * unit;
    const keys: { fill: string; label: string; line?: boolean }[] = [
      { fill: theme.sky.civil, label: 'penumbra: part of the Sun hidden' },
      { fill: theme.sky.astronomical, label: 'umbra: all of the Sun hidden' },
      { fill: moonFill, label: 'the Moon at greatest' },
      { fill: theme.field, label: 'the Moon\'s path; the arrow: its motion', line: true },
    ];
    keys.forEach((k, i) => {
      const y = keyTop + i * rowHeight;
      if (k.line) {
        out.push(`<path d="M${n2(table.left)},${n2(y + swatch * 0.4)}h${n2(swatch)}" stroke="${theme.trackCasing}" stroke-opacity="0.55" stroke-width="${n2(3.6 * unit)}"/><path d="M${n2(table.left)},${n2(y + swatch * 0.4)}h${n2(swatch)}" stroke="${k.fill}" stroke-width="${n2(1.8 * unit)}"/>`);
        out.push(textElement(k.label, table.left + swatch + 6 * unit, y + swatch * 0.7, rowStyle, theme.text));
        return;
      }
      out.push(`<rect x="${n2(table.left)}" y="${n2(y)}" width="${n2(swatch)}" height="${n2(swatch * 0.8)}" fill="${k.fill}" stroke="${theme.textMuted}" stroke-width="${n2(0.6 * unit)}"/>`);
      out.push(textElement(k.label, table.left + swatch + 6 * unit, y + swatch * 0.7, rowStyle, theme.text));
    });
  }

  // Header and small print.
  titleLines.forEach((line, i) => out.push(textElement(line, margin, titleBaseline + i * layout.titleStyle.sizePx * 1.2, layout.titleStyle, theme.text)));
  subtitleLines.forEach((line, i) => out.push(textElement(line, margin, subtitleBaseline + i * layout.subtitleStyle.sizePx * 1.35, layout.subtitleStyle, theme.textMuted)));
  smallLines.forEach((line, i) => {
    out.push(textElement(line, margin, H - margin - smallHeight + layout.smallStyle.sizePx * (1 + i * 1.4) - layout.smallStyle.sizePx * 0.4, layout.smallStyle, theme.textMuted));
  });
  out.push('</svg>');
  return { svg: out.join('\n'), title, description: `${subtitle} ${smallPrint}`, centre: { x: cx, y: cy }, pxPerRad, labelPlates };
}
