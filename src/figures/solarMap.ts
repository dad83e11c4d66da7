/**
 * A solar eclipse's map as one SVG document, on the shared page frame: a
 * function of (eclipse, style, size) alone — same inputs, same bytes.
 * Layers, bottom to top: the sea; the partial region in steps of the
 * greatest obscuration seen with the Sun up (visibility/solar/field.ts);
 * the total/annular path; graticule, land and borders; curves of equal
 * obscuration, the partial limits, the rise/set curves, the path limits and
 * the central line with its time ticks (eclipses/solar/curves.ts); the point
 * of greatest eclipse; labels and marks. The eye-safety caution (short)
 * stands in the header band under the subtitle, whatever the title.
 */
import { geoPath, type GeoProjection } from 'd3-geo';
import type { MultiLineString, MultiPolygon, Position } from 'geojson';
import type { LonLat } from '../ephemeris/earth.ts';
import { K_PENUMBRA, K_UMBRA } from '../eclipses/solar/constants.ts';
import { centralLine, partialLimits, pathLimits, riseSetCurves, type TimedLine } from '../eclipses/solar/curves.ts';
import type { SolarEclipse } from '../eclipses/solar/types.ts';
import { angularDistanceDeg } from '../sphere/circles.ts';
import { BASEMAP_CREDIT, detailForScale, loadBasemap, type BasemapDetail } from '../sphere/world.ts';
import { fieldRegion, FIELD_STEPS_DEG, obscurationField } from './solarField.ts';
import { pathPolygons } from '../visibility/solar/path.ts';
import { timeOnDay } from '../ephemeris/dayMark.ts';
import type { SolarWords } from '../words/solar/caution.ts';
import { contourLabel, mapCaution, riseSetLabel, solarLegendWords, solarMapTexts } from '../words/solar/figures.ts';
import { labelElement, layoutFor, n2, overlaps, plateBox, type Box } from './draw.ts';
import { pageFrame, type LegendEntry } from './frame.ts';
import { lineHitCounter, markElements, type MapMark } from './labels.ts';
import { basemapLayers, centreMark, lineSwatch, strokedPath, townSymbol, zoneSwatch, type StrokeSpec } from './layers.ts';
import type { MapSize, MapStyle } from './map.ts';
import { fitView, pixelsPerDegree, type BoundingBox, type Frame, type View } from './projection.ts';
import { SOLAR_RAMP_LEVELS, type Theme } from './theme.ts';
import { thinnedProjection } from './thin.ts';
import { FONT_CREDIT, type TextStyle } from './typography.ts';

/** The same thinning of land and borders as the lunar map (figures/map.ts). */
const BASEMAP_THINNING_PX = 0.5;
/** The least obscuration shaded: the field's own noise floor, well under what anyone would notice. */
const SHADED_FLOOR = 0.0005;
/** A field cell spans at least this many output pixels (finer adds time, not detail: the band edges are interpolated). */
const FIELD_CELL_PX = 12;
/** Room around a path for a view fitted to it, as a share of its extent, and at least this many degrees. */
const PATH_FIT_PAD = 0.12;
const PATH_FIT_MIN_PAD_DEG = 3;
/** How much of a flat world map's width a squarer page may crop (figures/map.ts does the same). */
const WORLD_CROP = 0.45;

export interface SolarSceneInput {
  readonly eclipse: SolarEclipse;
  readonly style: MapStyle;
  readonly size: MapSize;
  /** "umbracast 0.1.0", for the small print. */
  readonly generator: string;
  readonly marks?: readonly MapMark[];
  /** The reader's solar words (settings/language.ts); English when not given. */
  readonly words?: SolarWords;
}

export interface SolarScene {
  readonly svg: string;
  readonly title: string;
  readonly subtitle: string;
  /** The short caution printed in the header band. */
  readonly caution: string;
  readonly smallPrint: string;
  readonly project: (place: LonLat) => [number, number] | null;
  readonly frame: Frame;
  /** The caution's lines as drawn in the header band: text, start and baseline (page px), type. */
  readonly cautionLines: readonly { readonly text: string; readonly x: number; readonly y: number; readonly style: TextStyle }[];
  /** The header band's lower edge on the page (the caution lies above it). */
  readonly headerBottom: number;
  readonly basemapDetail: BasemapDetail;
  /** The view drawn (a card's default is fitted to the path). */
  readonly view: View;
  /** The plates of the labels on the map: on the lines, and of the marked places. */
  readonly labelPlates: { readonly lines: readonly Box[]; readonly marks: readonly Box[] };
}

const SOLAR_STROKES = (theme: Theme) => ({
  contour: { colour: theme.solar.contour, widthUnits: 0.7, dashUnits: [3, 2] } satisfies StrokeSpec,
  partialLimit: { colour: theme.solar.partialLimit, widthUnits: 1.4 } satisfies StrokeSpec,
  riseSet: { colour: theme.solar.riseSet, widthUnits: 1.1, dashUnits: [1.2, 2.4], roundCaps: true } satisfies StrokeSpec,
  pathLimit: { colour: theme.solar.pathLimit, widthUnits: 1.2 } satisfies StrokeSpec,
  central: { colour: theme.solar.centralLine, widthUnits: 1.3 } satisfies StrokeSpec,
  centralCasing: { colour: theme.solar.centralCasing, widthUnits: 3.1 } satisfies StrokeSpec,
});

/**
 * A regional view around the path (central eclipses): its limits' and
 * central line's extent, padded, as a box; longitudes unwrapped around the
 * greatest point so that a path across ±180° stays one box.
 */
export function pathView(eclipse: SolarEclipse): View | undefined {
  const limits = pathLimits(eclipse);
  const points = [...limits.north, ...limits.south, ...centralLine(eclipse).map((l) => l.points)].flat();
  if (points.length === 0) return undefined;
  const lon0 = eclipse.greatestPoint[0];
  const offsets = points.map(([lon]) => ((lon - lon0 + 540) % 360) - 180);
  const lats = points.map(([, lat]) => lat);
  const [west, east] = [Math.min(...offsets), Math.max(...offsets)];
  const [south, north] = [Math.min(...lats), Math.max(...lats)];
  const padLon = Math.max(PATH_FIT_MIN_PAD_DEG, (east - west) * PATH_FIT_PAD);
  const padLat = Math.max(PATH_FIT_MIN_PAD_DEG, (north - south) * PATH_FIT_PAD);
  if (east - west + 2 * padLon >= 300) return undefined;
  const wrap = (lon: number) => ((lon + 540) % 360) - 180;
  const box: BoundingBox = [wrap(lon0 + west - padLon), Math.max(-89, south - padLat), wrap(lon0 + east + padLon), Math.min(89, north + padLat)];
  return { projection: 'region', bbox: box };
}

/** The field's grid step for a view: the finest whose cells still span FIELD_CELL_PX on the page. */
function fieldStep(pixelsPerDeg: number): number {
  return FIELD_STEPS_DEG.find((step) => step * pixelsPerDeg >= FIELD_CELL_PX) ?? FIELD_STEPS_DEG[FIELD_STEPS_DEG.length - 1]!;
}

/** Planar lon/lat polygons (RFC 7946 winding) as d3-geo reads spheres: the interior on the right, so every ring reversed. */
const sphericalRegion = (region: Position[][][]): MultiPolygon => ({ type: 'MultiPolygon', coordinates: region.map((polygon) => polygon.map((ring) => [...ring].reverse())) });

/** Minutes between the central line's ticks: the first whose ticks stand this far apart on the page. */
const TICK_CHOICES_MIN = [1, 2, 5, 10, 15, 20, 30, 60];

export function composeSolarScene(input: SolarSceneInput): SolarScene {
  const { eclipse, style, size } = input;
  const { theme, clock } = style;
  const layout = layoutFor(size);
  const { unit, margin } = layout;
  const H = size.heightPx;
  // The basemap's credit in the reader's language (the shared words carry it); English as world.ts gives it.
  const basemapCredit = input.words ? input.words.common.credits.basemap : BASEMAP_CREDIT;
  const texts = solarMapTexts(eclipse, clock, input.generator, { basemap: basemapCredit, font: FONT_CREDIT, moonRadii: [K_PENUMBRA, K_UMBRA] }, style.title, input.words);
  const caution = mapCaution(eclipse, 'short', input.words);
  const view: View = (style.fitPath && pathView(eclipse)) || style.view;

  const strokes = SOLAR_STROKES(theme);
  const clockLabel = clock.zoneDescriptionBetween(eclipse.contacts.P1!.utDays, eclipse.contacts.P4!.utDays).replace(/^the /, '');
  const words = solarLegendWords(eclipse, clockLabel, input.words);
  const marksGiven = (input.marks ?? []).length > 0;
  const legend: LegendEntry[] = [
    ...words.ramp.map((label, k) => ({ label, swatch: zoneSwatch(theme.solar.ramp[k]!, theme, unit) })),
    ...(words.path ? [{ label: words.path, swatch: zoneSwatch(theme.solar.path, theme, unit) }] : []),
    ...(words.centralLine ? [{
      label: words.centralLine,
      swatch: (x: number, y: number, s: number) => lineSwatch(strokes.centralCasing, unit)(x, y, s) + lineSwatch(strokes.central, unit)(x, y, s),
    }] : []),
    ...(words.pathLimits ? [{ label: words.pathLimits, swatch: lineSwatch(strokes.pathLimit, unit) }] : []),
    { label: words.partialLimits, swatch: lineSwatch(strokes.partialLimit, unit) },
    { label: words.contours, swatch: lineSwatch(strokes.contour, unit) },
    { label: words.riseSet, swatch: lineSwatch(strokes.riseSet, unit) },
    { label: words.greatest, swatch: (x, y, s) => centreMark(x + s / 2, y + s / 2, s * 0.32, theme, unit).join('') },
    ...(marksGiven ? [{ label: words.town, swatch: (x: number, y: number, s: number) => townSymbol(x + s / 2, y + s / 2, 5 * unit, theme, unit) }] : []),
  ];
  const page = pageFrame({
    size, theme, id: 'map', title: texts.title, subtitle: texts.subtitle, notice: caution,
    description: `${texts.subtitle}. ${caution} ${texts.smallPrint}`, smallPrint: texts.smallPrint, legend,
    legendSetting: { swatchUnits: 15, gapUnits: 16, gapInWidth: false }, headerGapUnits: 14,
  });
  const { contentWidth, headerBottom, footerHeight } = page;
  const gap = 10 * unit;
  const available: Frame = { x: margin, y: headerBottom, width: contentWidth, height: Math.max(10, H - margin - footerHeight - gap - headerBottom) };

  // The view, fitted as the lunar map fits it: a box takes its own shape, a world map is centred in its room.
  const focus: LonLat = view.projection === 'globe' ? (view.centre ?? eclipse.greatestPoint) : eclipse.greatestPoint;
  let fitted = fitView(view, available, focus);
  const boxView = view.projection === 'region' && 'bbox' in view;
  const clip = fitted.projection.clipExtent();
  const [[left, top], [right, bottom]] = geoPath(fitted.projection.clipExtent(null)).bounds(fitted.outline);
  fitted.projection.clipExtent(clip);
  // A flat world map on a page squarer than the world grows to the page's height and gives up its far
  // sides (the meridians farthest from the eclipse), up to WORLD_CROP of its width, as the lunar map does.
  const flatWorld = fitted.world && view.projection !== 'globe';
  const naturalAspect = (right - left) / (bottom - top);
  const grownWidth = flatWorld ? Math.min(available.height * naturalAspect, available.width * (1 + WORLD_CROP)) : right - left;
  const grown = flatWorld && grownWidth > available.width * 1.01;
  const mapHeight = grown ? grownWidth / naturalAspect : bottom - top;
  const slack = fitted.world || boxView ? Math.max(0, available.height - mapHeight) / 2 : 0;
  const slackX = boxView ? Math.max(0, available.width - (right - left)) / 2 : 0;
  const frame: Frame = { x: available.x + slackX, y: available.y + slack, width: available.width - 2 * slackX, height: available.height - 2 * slack };
  if (grown) {
    const wide: Frame = { x: frame.x - (grownWidth - frame.width) / 2, y: frame.y, width: grownWidth, height: frame.height };
    fitted = fitView(view, wide, focus);
    fitted.projection.clipExtent([[frame.x, frame.y], [frame.x + frame.width, frame.y + frame.height]]);
  } else if (slack > 0 || slackX > 0) fitted = fitView(view, frame, focus);
  const projection: GeoProjection = fitted.projection;
  const path = geoPath(projection).digits(1);
  const ppd = pixelsPerDegree(fitted);
  const basemap = loadBasemap(detailForScale(ppd));
  const globe = view.projection === 'globe';
  const onPage = (p: Position | LonLat): [number, number] | null => {
    if (globe && angularDistanceDeg(focus, p as LonLat) > 90) return null;
    const xy = projection([p[0]!, p[1]!]);
    if (!xy) return null;
    return xy[0] >= frame.x && xy[0] <= frame.x + frame.width && xy[1] >= frame.y && xy[1] <= frame.y + frame.height ? xy : null;
  };
  const outlineD = fitted.world ? path({ type: 'Sphere' }) ?? '' : `M${n2(frame.x)},${n2(frame.y)}h${n2(frame.width)}v${n2(frame.height)}h${n2(-frame.width)}Z`;

  const base: string[] = [];
  const overlay: string[] = [];
  base.push(`<path d="${outlineD}" fill="${theme.zones['sees-none']}"/>`);

  // The partial region in steps of obscuration seen, on a grid fine enough for the page; a regional view
  // evaluates only what it shows (a margin of a few cells around the frame).
  const step = fieldStep(ppd);
  const reach = step * ppd * 3;
  const wanted = fitted.world ? () => true : (p: LonLat) => {
    const xy = projection([p[0], p[1]]);
    return xy !== null && angularDistanceDeg(focus, p) < 150 && xy[0] > frame.x - reach && xy[0] < frame.x + frame.width + reach && xy[1] > frame.y - reach && xy[1] < frame.y + frame.height + reach;
  };
  const field = obscurationField(eclipse, step, wanted);
  const regions = SOLAR_RAMP_LEVELS.map((level) => fieldRegion(field, level === 0 ? SHADED_FLOOR : level));
  regions.forEach((region, k) => {
    if (region.length > 0) base.push(`<path d="${path(sphericalRegion(region)) ?? ''}" fill="${theme.solar.ramp[k]}"/>`);
  });
  for (const polygon of pathPolygons(eclipse)) base.push(`<path d="${path(polygon) ?? ''}" fill="${theme.solar.path}"/>`);
  base.push(...basemapLayers(path, geoPath(thinnedProjection(projection, BASEMAP_THINNING_PX)).digits(1), basemap, style.borders, theme, unit));

  // Lines.
  const multi = (lines: readonly (readonly LonLat[])[]): MultiLineString => ({ type: 'MultiLineString', coordinates: lines.map((l) => l.map(([lon, lat]) => [lon, lat])) });
  // The contours are the steps' own edges, so that line and shading agree (curves.ts's equal-obscuration curves
  // follow the obscuration at maximum, Sun up or not, and part from the shading where the Sun rises or sets).
  const contours = SOLAR_RAMP_LEVELS.flatMap((level, k) => (level > 0 ? [{ level, lines: regionEdges(regions[k]!) }] : []));
  for (const c of contours) overlay.push(strokedPath(path(multi(c.lines)) ?? '', strokes.contour, unit));
  const partial = partialLimits(eclipse);
  const partialLines = [...partial.north, ...partial.south];
  overlay.push(strokedPath(path(multi(partialLines)) ?? '', strokes.partialLimit, unit));
  const riseSet = riseSetCurves(eclipse);
  overlay.push(strokedPath(path(multi(riseSet.map((r) => r.points))) ?? '', strokes.riseSet, unit));
  const limits = pathLimits(eclipse);
  const limitLines = [...limits.north, ...limits.south];
  if (limitLines.length > 0) overlay.push(strokedPath(path(multi(limitLines)) ?? '', strokes.pathLimit, unit));
  const central = centralLine(eclipse);
  const centralD = path(multi(central.map((l) => l.points))) ?? '';
  if (central.length > 0) {
    overlay.push(strokedPath(centralD, strokes.centralCasing, unit), strokedPath(centralD, strokes.central, unit));
  }
  overlay.push(`<path d="${outlineD}" fill="none" stroke="${theme.textMuted}" stroke-width="${n2(0.8 * unit)}"/>`);

  // Labels, each clear of every one placed before it.
  const taken: Box[] = [];
  const labels: string[] = [];
  const labelPlates: Box[] = [];
  const place = (text: string, x: number, y: number, style: TextStyle, anchor: 'start' | 'middle' | 'end' = 'middle'): boolean => {
    const plate = plateBox(text, x, y, style, unit, anchor);
    const inside = plate.left >= frame.x && plate.right <= frame.x + frame.width && plate.top >= frame.y && plate.bottom <= frame.y + frame.height;
    if (!inside || taken.some((t) => overlaps(t, plate))) return false;
    taken.push(plate);
    labelPlates.push(plate);
    labels.push(labelElement(text, x, y, style, theme, unit, anchor));
    return true;
  };

  // The point of greatest eclipse.
  const greatestXY = onPage(eclipse.greatestPoint);
  if (greatestXY) {
    const [gx, gy] = greatestXY;
    taken.push({ left: gx - 9 * unit, top: gy - 9 * unit, right: gx + 9 * unit, bottom: gy + 9 * unit });
    overlay.push(...centreMark(gx, gy, 6.5 * unit, theme, unit, 0.9));
  }

  // Central line ticks: every few minutes on the map's clock, far enough apart on the page; a time beside every one that fits.
  const ticks = centralTicks(central, onPage, clock.offsetSeconds(eclipse.greatest.utDays) / 60, 34 * unit);
  const tickStyle: TextStyle = { sizePx: layout.labelStyle.sizePx * 0.85, weight: 'regular' };
  for (const t of ticks) {
    const [x, y] = t.xy;
    const [nx, ny] = t.normal;
    const half = 4.5 * unit;
    overlay.push(`<line x1="${n2(x - nx * half)}" y1="${n2(y - ny * half)}" x2="${n2(x + nx * half)}" y2="${n2(y + ny * half)}" stroke="${theme.solar.centralCasing}" stroke-width="${n2(2.6 * unit)}"/>`
      + `<line x1="${n2(x - nx * half)}" y1="${n2(y - ny * half)}" x2="${n2(x + nx * half)}" y2="${n2(y + ny * half)}" stroke="${theme.solar.centralLine}" stroke-width="${n2(1.1 * unit)}"/>`);
    taken.push({ left: x - half, top: y - half, right: x + half, bottom: y + half });
  }
  // Marked places before the line labels: a place's dot and words matter more than a tick's time or a contour's value.
  const marks = input.marks ?? [];
  const marked = markElements(marks, projection, frame, { sizePx: layout.labelStyle.sizePx, weight: 'regular' }, theme, unit, taken, () => [
    ...partialLines.map((l) => l.map(onPage)),
    ...limitLines.map((l) => l.map(onPage)),
    ...central.map((l) => l.points.map(onPage)),
    ...contours.flatMap((c) => c.lines.map((l) => l.map(onPage))),
  ]);
  for (const t of ticks) {
    const text = timeOnDay(clock, t.utDays, eclipse.greatest.utDays);
    const [x, y] = t.xy;
    const [nx, ny] = t.normal;
    const away = 12 * unit;
    // Beside the tick, on one side of the line or the other.
    for (const side of [1, -1]) {
      const lx = x + nx * away * side;
      const ly = y + ny * away * side + tickStyle.sizePx * 0.35;
      if (place(text, lx, ly, tickStyle, Math.abs(nx) < 0.3 ? 'middle' : nx * side > 0 ? 'start' : 'end')) break;
    }
  }

  // Contour labels: each level once or twice, where its line runs clear.
  const lineHits = lineHitCounter([
    ...partialLines.map((l) => l.map(onPage)),
    ...limitLines.map((l) => l.map(onPage)),
    ...central.map((l) => l.points.map(onPage)),
    ...riseSet.map((r) => r.points.map(onPage)),
  ], frame, 6 * unit);
  const contourStyle: TextStyle = { sizePx: layout.labelStyle.sizePx * 0.85, weight: 'regular' };
  for (const c of contours) {
    let placed = 0;
    for (const line of c.lines) {
      for (const p of spreadAlong(line.map(onPage), 5)) {
        if (placed >= 2) break;
        const plate = plateBox(contourLabel(c.level, input.words), p[0], p[1] + contourStyle.sizePx * 0.35, contourStyle, unit);
        if (lineHits(plate) > 0) continue;
        if (place(contourLabel(c.level, input.words), p[0], p[1] + contourStyle.sizePx * 0.35, contourStyle)) placed++;
      }
    }
  }
  // One label for the rise/set curves of each kind, where one fits.
  for (const kind of [...new Set(riseSet.map((r) => `${r.contact} ${r.sun}`))]) {
    const curves = riseSet.filter((r) => `${r.contact} ${r.sun}` === kind);
    const text = riseSetLabel(curves[0]!.contact, curves[0]!.sun, input.words);
    const spots = curves.flatMap((r) => spreadAlong(r.points.map(onPage), 4));
    spots.some((p) => place(text, p[0], p[1] + contourStyle.sizePx * 0.35, { ...contourStyle, weight: 'regular' }));
  }
  overlay.push(...labels, ...marked.elements);


  return {
    svg: page.render({ layers: [...base, ...overlay], headerShiftPx: slack, footer: { top: frame.y + frame.height + gap } }),
    title: texts.title,
    subtitle: texts.subtitle,
    caution,
    smallPrint: texts.smallPrint,
    project: (p) => projection([p[0], p[1]]),
    frame,
    cautionLines: page.noticeLines.map((l) => ({ text: l.text, x: margin, y: l.baselinePx + slack, style: page.noticeStyle })),
    headerBottom: headerBottom + slack,
    basemapDetail: basemap.detail,
    view,
    labelPlates: { lines: labelPlates, marks: marked.plates },
  };
}

/**
 * A traced region's edges as lines: its rings, less the stretches along ±180° and the poles where the
 * planar tracing closes them (no edge of the region lies there).
 */
function regionEdges(region: readonly Position[][][]): LonLat[][] {
  const seam = (a: Position, b: Position) => (Math.abs(a[0]!) === 180 && a[0] === b[0]) || (Math.abs(a[1]!) === 90 && a[1] === b[1]);
  const lines: LonLat[][] = [];
  for (const polygon of region) {
    for (const ring of polygon) {
      let run: LonLat[] = [];
      for (let k = 0; k < ring.length; k++) {
        const p = ring[k]!;
        const previous = ring[k - 1];
        if (previous && seam(previous, p)) {
          if (run.length >= 2) lines.push(run);
          run = [];
        }
        run.push([p[0]!, p[1]!]);
      }
      if (run.length >= 2) lines.push(run);
    }
  }
  return lines;
}

/** Points along a projected line (nulls off the page), spread evenly: the middle first, then outwards. */
function spreadAlong(points: readonly ([number, number] | null)[], count: number): [number, number][] {
  const on = points.filter((p): p is [number, number] => p !== null);
  if (on.length === 0) return [];
  const picks: [number, number][] = [];
  const order = [0.5, 0.3, 0.7, 0.15, 0.85, 0.4, 0.6].slice(0, Math.max(1, count));
  for (const f of order) picks.push(on[Math.min(on.length - 1, Math.floor(f * on.length))]!);
  return picks;
}

interface Tick {
  readonly utDays: number;
  readonly xy: [number, number];
  /** Unit normal to the line on the page. */
  readonly normal: [number, number];
}

/**
 * The central line's ticks: whole multiples of a step on the map's clock
 * (offset in minutes), the step the smallest of TICK_CHOICES_MIN whose ticks
 * stand at least `minGapPx` apart where the line runs slowest on the page.
 */
function centralTicks(lines: readonly TimedLine[], onPage: (p: LonLat) => [number, number] | null, offsetMinutes: number, minGapPx: number): Tick[] {
  let slowest = Infinity;
  for (const line of lines) {
    for (let k = 1; k < line.points.length; k++) {
      const a = onPage(line.points[k - 1]!);
      const b = onPage(line.points[k]!);
      const minutes = (line.times[k]!.utDays - line.times[k - 1]!.utDays) * 1440;
      if (!a || !b || minutes <= 0) continue;
      const speed = Math.hypot(b[0] - a[0], b[1] - a[1]) / minutes;
      if (speed > 0) slowest = Math.min(slowest, speed);
    }
  }
  if (!Number.isFinite(slowest)) return [];
  const stepMin = TICK_CHOICES_MIN.find((m) => m * slowest >= minGapPx) ?? TICK_CHOICES_MIN[TICK_CHOICES_MIN.length - 1]!;
  const ticks: Tick[] = [];
  for (const line of lines) {
    for (let k = 1; k < line.points.length; k++) {
      const t0 = line.times[k - 1]!.utDays * 1440 + offsetMinutes;
      const t1 = line.times[k]!.utDays * 1440 + offsetMinutes;
      const first = Math.ceil(t0 / stepMin - 1e-9) * stepMin;
      if (first > t1 || first === t1) continue;
      const a = onPage(line.points[k - 1]!);
      const b = onPage(line.points[k]!);
      if (!a || !b) continue;
      const length = Math.hypot(b[0] - a[0], b[1] - a[1]);
      if (length === 0 || length > 200) continue;
      const f = (first - t0) / (t1 - t0);
      ticks.push({
        utDays: (first - offsetMinutes) / 1440,
        xy: [a[0] + f * (b[0] - a[0]), a[1] + f * (b[1] - a[1])],
        normal: [-(b[1] - a[1]) / length, (b[0] - a[0]) / length],
      });
    }
  }
  return ticks;
}
