/**
 * A visibility map as one SVG document: a function of (eclipse, style, size)
 * alone — same inputs, same bytes. Layers, bottom to top: zones (painted by
 * caps: the end cap, the start cap, their overlap), land, borders,
 * graticule, the field's lines, the Moon-up edges, the sub-lunar point,
 * labels; then title, legend and small print around the map.
 */
import { geoContains, geoPath, type GeoPermissibleObjects, type GeoProjection } from 'd3-geo';
import { shadowDiagram } from '../eclipses/lunar/diagram.ts';
import { diagramInset, diagramInsetAspect } from './diagram.ts';
import type { LunarDiagramWords } from '../words/lunar/diagram.ts';
import type { MapInset } from './insetNames.ts';
import type { MultiLineString, Position } from 'geojson';
import type { LunarEclipse } from '../eclipses/lunar/types.ts';
import type { CivilClock } from '../ephemeris/civilTime.ts';
import type { LonLat } from '../ephemeris/earth.ts';
import { fieldLines, type FieldLine } from '../visibility/lunar/fieldLines.ts';
import { storyCentre } from '../visibility/lunar/storyCentre.ts';
import { AREA_NAMES } from './areaNames.ts';
import { angularDistanceDeg } from '../sphere/circles.ts';
import { capOutline, PAINTED_ZONES, visibilityZonePolygons } from '../visibility/lunar/zones.ts';
import { stage, visibilityEvaluator, type Visibility } from '../visibility/lunar/visibility.ts';
import { timeOnDay } from '../ephemeris/dayMark.ts';
import { detailForScale, loadBasemap, type BasemapDetail, type BorderStyle } from '../sphere/world.ts';
import { thinnedProjection } from './thin.ts';
import { fitView, pixelsPerDegree, type Frame, type View } from './projection.ts';
import type { Theme } from './theme.ts';
import type { MarkClock } from './markClock.ts';
import { FONT_CREDIT, measureText, type TextStyle } from './typography.ts';
import { pageFrame, type LegendEntry } from './frame.ts';
import { crossingsAtY, curveLabel, hexLightness, lineHitCounter, markElements, mixHex, type MapMark } from './labels.ts';
import { basemapLayers, boundaryLight, boundaryStrong, centreMark, fieldStroke, lineSwatch, strokedPath, townSymbol, zoneSwatch } from './layers.ts';
import { boundaryLabel, fieldLineLabel, LUNAR_FIGURES_ENGLISH, mapLegendWords, mapTexts, type LunarFigureWords } from '../words/lunar/figures.ts';
import { labelElement, layoutFor, n2, overlaps, plateBox, textElement, type Box } from './draw.ts';

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
  /** A solar map: show the eclipse's path rather than `view` (the card preset's default; lunar maps ignore it). */
  readonly fitPath?: boolean;
  /** Every word on the map, in the reader's language (default English). */
  readonly words?: LunarFigureWords;
  /** A small figure inside the map, where it hides least land: the shadow diagram, or none (the default). */
  readonly inset?: MapInset;
  /** The inset's words, in the map's language (default English). */
  readonly diagramWords?: LunarDiagramWords;
}


export type { MapMark } from './labels.ts';

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
  /** The inset's panel on the page, when there is one. */
  readonly inset?: Box;
}


/**
 * Land and borders keep no point within this distance (output pixels) of the
 * last one kept. Measured on 2400-px world maps: 0.5 px takes a third of
 * the basemap's points and bytes and changes 0.001–0.007 % of pixels
 * (pixelmatch, threshold 0.1), at 1 px 0.015–0.04 %.
 */
export const BASEMAP_THINNING_PX = 0.5;


/** The map's title, subtitle and small print (words/lunar/figures.ts), with this stage's credits. */
export function sceneTexts(eclipse: LunarEclipse, clock: CivilClock, deltaTLabel: string, generator: string, customTitle?: string, words: LunarFigureWords = LUNAR_FIGURES_ENGLISH) {
  return mapTexts(eclipse, clock, deltaTLabel, generator, { basemap: words.common.credits.basemap, font: FONT_CREDIT }, customTitle, words);
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

/** How much of a flat world map's width a squarer page may crop (its far sides, opposite the eclipse). */
const WORLD_CROP = 0.45;

export function composeScene(input: SceneInput): Scene {
  const { eclipse, visibility, style, size } = input;
  const { theme, clock } = style;
  const layout = layoutFor(size);
  const { unit, margin } = layout;
  const H = size.heightPx;

  const language = style.words ?? LUNAR_FIGURES_ENGLISH;
  const deltaTLabel = `${eclipse.deltaT.seconds.toFixed(1)} s (${language.common.deltaTSources[eclipse.deltaT.source]})`;
  const texts = sceneTexts(eclipse, clock, deltaTLabel, input.generator, style.title, language);

  // Legend entries, each swatch drawn with its layer's own spec.
  const zoneSpan = visibility.zoneSpan;
  const marksGiven = (input.marks ?? []).length > 0;
  const words = mapLegendWords(eclipse, visibility.fieldSpan.phase, visibility.stages.map((s) => s.name).filter((n) => n !== 'greatest'), style.markClock === 'town', language);
  const strongLine = boundaryStrong(theme);
  const lightLine = boundaryLight(theme);
  const fieldLine = fieldStroke(theme);
  const legend: LegendEntry[] = [
    { label: words.zoneAll, swatch: zoneSwatch(theme.zones['sees-all'], theme, unit) },
    { label: words.zoneSets, swatch: zoneSwatch(theme.zones['sets-during'], theme, unit) },
    { label: words.zoneRises, swatch: zoneSwatch(theme.zones['rises-during'], theme, unit) },
    { label: words.zoneNone, swatch: zoneSwatch(theme.zones['sees-none'], theme, unit) },
    { label: words.boundaryStrong, swatch: lineSwatch(strongLine, unit) },
    { label: words.boundaryLight, swatch: lineSwatch(lightLine, unit) },
    { label: words.field, swatch: lineSwatch(fieldLine, unit) },
    { label: words.centre, swatch: (x, y, size) => centreMark(x + size / 2, y + size / 2, size * 0.32, theme, unit).join('') },
    ...(marksGiven ? [{ label: words.town, swatch: (x: number, y: number, size: number) => townSymbol(x + size / 2, y + size / 2, 5 * unit, theme, unit) }] : []),
    { label: words.codes, swatch: (x, y, size) => textElement(size >= 0 ? 'U1' : '', x + size / 2, y + size * 0.72, { sizePx: size * 0.62, weight: 'regular' }, theme.textMuted, 'middle') },
  ];
  const page = pageFrame({
    size, theme, id: 'map', title: texts.title, subtitle: texts.subtitle, description: `${texts.subtitle}. ${texts.smallPrint}`, smallPrint: texts.smallPrint, legend,
    legendSetting: { swatchUnits: 15, gapUnits: 16, gapInWidth: false }, headerGapUnits: 14,
  });
  const { contentWidth, headerBottom, footerHeight } = page;
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

  // d3-geo clips every layer to the view (the sphere's edge, or the region's frame): no SVG clip paths needed.
  base.push(`<path d="${outlineD}" fill="${theme.zones['sees-none']}"/>`);
  const zones = visibilityZonePolygons(visibility);
  for (const zone of PAINTED_ZONES) base.push(`<path d="${path(zones[zone]) ?? ''}" fill="${theme.zones[zone]}"/>`);
  // World data is denser than the picture: points within half a pixel of the last one kept add bytes and drawing time, not detail.
  base.push(...basemapLayers(path, geoPath(thinnedProjection(projection, BASEMAP_THINNING_PX)).digits(1), basemap, style.borders, theme, unit));

  // The continuous field: lines of equal minutes with the Moon up.
  const lines = fieldLines(visibility);
  const fieldGeometry: MultiLineString = { type: 'MultiLineString', coordinates: thinnedFieldLines(lines, projection, 6.5 * unit) };
  overlay.push(strokedPath(path(fieldGeometry) ?? '', fieldLine, unit));

  // Moon-up edges at each stage (drawn, then labelled).
  const edges = new Map(visibility.stages.map((s) => [s.name, capOutline(s)]));
  for (const s of visibility.stages) {
    const strong = s.name === zoneSpan.start || s.name === zoneSpan.end;
    const d = path(edges.get(s.name)!) ?? '';
    overlay.push(strong
      ? strokedPath(d, strongLine, unit)
      : strokedPath(d, lightLine, unit));
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
    overlay.push(...centreMark(mx, my, 6.5 * unit, theme, unit, 0.9));
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
      const words = boundaryLabel(rising, s.name, eclipse.kind, stageTime(at), language);
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
      const half = measureText(fieldLineLabel(l.minutes, language), fieldLabelStyle) / 2 + 2.2 * unit;
      const cx = Math.min(Math.max(x, frame.x + half), frame.x + frame.width - half);
      label(fieldLineLabel(l.minutes, language), cx, y + fieldLabelStyle.sizePx * 0.35, fieldLabelStyle);
    }
  }
  overlay.push(...labels);
  const zoneLabelPlates = [...taken];
  const marks = input.marks ?? [];
  // The inset goes where it hides least land and covers no label, centre mark or marked place; later
  // labels keep clear of it.
  let insetBox: Box | undefined;
  let insetSvg = '';
  if (style.inset === 'diagram') {
    const diagram = shadowDiagram(eclipse);
    const headingStyle = { sizePx: layout.legendStyle.sizePx * 0.8, weight: 'semibold' as const };
    // Scoring needs no fine coastline: the coarsest land keeps each test cheap on a detailed regional map.
    const coarseLand = loadBasemap('110m').land as GeoPermissibleObjects;
    const markPoints = marks.map((m) => projection([m.lonDeg, m.latDeg])).filter((p): p is [number, number] => p !== null);
    insetBox = insetPlace(frame, (width) => diagramInsetAspect(diagram, headingStyle.sizePx * 1.3, width), taken, markPoints, 6 * unit, (point) => {
      const lonLat = projection.invert?.(point);
      if (!lonLat || !Number.isFinite(lonLat[0]) || !Number.isFinite(lonLat[1])) return false;
      if (style.view.projection === 'globe' && angularDistanceDeg(focus, lonLat) > 90) return false;
      const back = projection(lonLat);
      return back !== null && Math.hypot(back[0] - point[0], back[1] - point[1]) < 1 && geoContains(coarseLand, lonLat);
    });
    taken.push(insetBox);
    insetSvg = diagramInset(diagram, theme, insetBox, unit, headingStyle, style.diagramWords);
  }
  const marked = markElements(marks, projection, frame, { sizePx: layout.labelStyle.sizePx, weight: 'regular' }, theme, unit, taken, () => [
    ...visibility.stages.map((s) => edges.get(s.name)!.coordinates.map((p) => projection([p[0]!, p[1]!]))),
    ...lines.map((l) => l.line.map((p) => projection([p[0]!, p[1]!]))),
  ]);
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
    for (const area of AREA_NAMES.map((a) => ({ ...a, name: (language.common.mapAreas as Readonly<Record<string, string>>)[a.name] ?? a.name }))) {
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

  if (insetSvg) overlay.push(insetSvg);

  return {
    svg: page.render({ layers: [...base, ...overlay], headerShiftPx: shiftDown, footer: { top: footerTop } }),
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
    ...(insetBox ? { inset: insetBox } : {}),
  };
}

/**
 * Where an inset of a given shape goes inside the map's frame: spots on a 9 × 9 grid over the frame
 * (corners first), at a quarter of the frame's width, else a fifth, else a sixth (never taller than
 * 45 % of the frame). Spots that would cover a label plate or a marked place are ruled out; of the
 * rest, the one that hides least land (a 10 × 10 grid of samples) wins, the first of equals. Should
 * every spot at every width cover something, the smallest spot covering fewest wins.
 */
export function insetPlace(frame: Frame, aspectAt: (widthPx: number) => number, taken: readonly Box[], points: readonly [number, number][], padPx: number, isLand: (point: [number, number]) => boolean): Box {
  const steps = [0, 1, 0.5, 0.25, 0.75, 0.125, 0.375, 0.625, 0.875];
  let fallback: { box: Box; covered: number } | undefined;
  for (const share of [0.24, 0.2, 0.16]) {
    // The shape depends a little on the width (the heading keeps its size): settle it in two steps.
    let width = frame.width * share;
    for (let i = 0; i < 2; i++) width = Math.min(frame.width * share, frame.height * 0.45 * aspectAt(width));
    const height = width / aspectAt(width);
    const candidates: Box[] = steps.flatMap((fy) => steps.map((fx) => {
      const left = frame.x + padPx + fx * (frame.width - 2 * padPx - width);
      const top = frame.y + padPx + fy * (frame.height - 2 * padPx - height);
      return { left, top, right: left + width, bottom: top + height };
    }));
    const coveredBy = (b: Box) => {
      const around: Box = { left: b.left - padPx, top: b.top - padPx, right: b.right + padPx, bottom: b.bottom + padPx };
      return taken.filter((t) => overlaps(t, around)).length + points.filter(([x, y]) => x >= around.left && x <= around.right && y >= around.top && y <= around.bottom).length;
    };
    const clear: Box[] = [];
    for (const b of candidates) {
      const covered = coveredBy(b);
      if (covered === 0) clear.push(b);
      else if (!fallback || covered <= fallback.covered) fallback = { box: b, covered };
    }
    if (clear.length === 0) continue;
    const land = (b: Box) => {
      let count = 0;
      for (let i = 0; i < 10; i++) {
        for (let j = 0; j < 10; j++) if (isLand([b.left + ((i + 0.5) * width) / 10, b.top + ((j + 0.5) * height) / 10])) count++;
      }
      return count;
    };
    return clear.map((b) => ({ b, s: land(b) })).reduce((best, c) => (c.s < best.s ? c : best)).b;
  }
  return fallback!.box;
}
