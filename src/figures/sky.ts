/**
 * "The view from here": one place, one night. Local time runs along the
 * bottom; the sky's brightness (day, the three twilights, night) fills the
 * background; the Moon's altitude is a path coloured by phase, with the
 * contacts marked on it; below the horizon lies the ground. A function of
 * its inputs alone, drawn with the same themes and outlined type as the maps.
 */
import type { ContactName } from '../eclipses/lunar/contacts.ts';
import type { LunarEclipse } from '../eclipses/lunar/types.ts';
import type { CivilClock } from '../ephemeris/civilTime.ts';
import type { AltitudeSample, LocalEvent, SkyClass } from '../local/lunar.ts';
import { compassPoint, phaseAt, skyClass } from '../local/lunar.ts';
import { LUNAR_FIGURES_ENGLISH, skyEventLabel, skySmallPrint, skyTitle, type LunarFigureWords } from '../words/lunar/figures.ts';
import { labelElement, layoutFor, n2, overlaps, plateBox, textElement, type Box, type PageSize } from './draw.ts';
import { pageFrame, type LegendEntry } from './frame.ts';
import { fillSwatch, trackPath, trackSwatch } from './layers.ts';
import type { Theme } from './theme.ts';
import { FONT_CREDIT, measureText } from './typography.ts';

export interface SkySceneInput {
  readonly eclipse: LunarEclipse;
  readonly placeName: string;
  readonly clock: CivilClock;
  readonly events: readonly LocalEvent[];
  readonly track: readonly AltitudeSample[];
  readonly summary: string;
  readonly theme: Theme;
  readonly size: PageSize;
  readonly generator: string;
  readonly credits: string;
  readonly title?: string;
  /** The figure's words, in the reader's language (default English). */
  readonly words?: LunarFigureWords;
}

export interface SkyScene {
  readonly svg: string;
  readonly title: string;
  readonly description: string;
  /** The events' dots, the labels' plates and the compass points along the path (page pixels): for tests. */
  readonly dots: readonly Box[];
  readonly labelPlates: readonly Box[];
  readonly compassMarks: readonly { readonly text: string; readonly utDays: number; readonly plate: Box }[];
}

const SKY_ORDER: readonly SkyClass[] = ['day', 'civil', 'nautical', 'astronomical', 'night'];

type Phase = 'outside' | 'penumbral' | 'partial' | 'total';

/** The path's colour: the eclipse phase, or 'outside' before and after it. */
function pathPhase(eclipse: LunarEclipse, utDays: number): Phase {
  const phase = phaseAt(eclipse, utDays);
  return phase === 'before' || phase === 'after' ? 'outside' : phase;
}

/**
 * The instants (UT days) between two others at which the local clock shows a whole hour, each read in
 * the offset in force at that instant: offsets of any size (+05:45, local mean time's seconds) and
 * clock changes inside the span are handled alike.
 */
export function localHourTicks(clock: CivilClock, fromUtDays: number, toUtDays: number): number[] {
  const offsets = new Set<number>([clock.offsetSeconds(fromUtDays), ...clock.offsetChanges(fromUtDays, toUtDays).map((c) => clock.offsetSeconds(c.utDays))]);
  const ticks = new Set<number>();
  for (const offsetSeconds of offsets) {
    const localFrom = fromUtDays * 86_400 + offsetSeconds;
    const localTo = toUtDays * 86_400 + offsetSeconds;
    for (let hour = Math.ceil(localFrom / 3600); hour * 3600 <= localTo; hour++) {
      const utDays = (hour * 3600 - offsetSeconds) / 86_400;
      // Keep the hour only where this offset is the one in force.
      if (clock.offsetSeconds(utDays) === offsetSeconds) ticks.add(utDays);
    }
  }
  return [...ticks].sort((a, b) => a - b);
}

export function composeSkyScene(input: SkySceneInput): SkyScene {
  const { eclipse, clock, theme, size, track, events } = input;
  const words = input.words ?? LUNAR_FIGURES_ENGLISH;
  // Compass letters in the language's own (the hemisphere letters: N, S, E, O in Spanish).
  const h = words.common.hemispheres;
  const letters: Record<string, string> = { N: h.north, S: h.south, E: h.east, W: h.west };
  const compassText = (azimuthDeg: number) => [...compassPoint(azimuthDeg)].map((c) => letters[c] ?? c).join('');

  const title = input.title ?? skyTitle(eclipse, input.placeName, clock, words);
  const first = track[0]!.moment.utDays;
  const last = track[track.length - 1]!.moment.utDays;
  const zoneName = clock.zoneDescriptionBetween(first, last);
  // When the clocks change inside the figure, every time on it carries its own zone's name.
  const clocksChange = clock.offsetChanges(first, last).length > 0;
  const timeText = (utDays: number) => (clocksChange ? clock.stamp(utDays) : clock.time(utDays));
  const smallPrint = skySmallPrint(eclipse, zoneName, input.generator, { places: input.credits, font: FONT_CREDIT }, words);

  // Legend: the sky's classes and the track's phases, each swatch drawn as its layer is.
  const unitOf = layoutFor(size).unit;
  const legend: LegendEntry[] = [
    ...SKY_ORDER.map((k) => ({ label: words.sky.classes[k], swatch: fillSwatch(theme.sky[k], theme, unitOf) })),
    { label: words.sky.phases.penumbral, swatch: trackSwatch(theme.track.penumbral, theme, unitOf) },
    { label: words.sky.phases.partial, swatch: trackSwatch(theme.track.partial, theme, unitOf) },
    ...(eclipse.kind === 'total' ? [{ label: words.sky.phases.total, swatch: trackSwatch(theme.track.total, theme, unitOf) }] : []),
  ];
  const page = pageFrame({
    size, theme, id: 'sky', title, subtitle: input.summary, description: `${input.summary} ${smallPrint}`, smallPrint, legend,
    legendSetting: { swatchUnits: 14, gapUnits: 14, gapInWidth: true }, headerGapUnits: 16,
  });
  const { layout } = page;
  const { unit, margin } = layout;
  const W = size.widthPx;
  const H = size.heightPx;
  const headerBottom = page.headerBottom;
  const footerHeight = page.footerHeight;

  // The plot: room on the left for altitude ticks, below for hour ticks.
  const axisStyle = { sizePx: layout.legendStyle.sizePx * 0.95, weight: 'regular' as const };
  const plot = {
    left: margin + measureText('−15°', axisStyle) + 8 * unit,
    right: W - margin,
    top: headerBottom,
    bottom: H - margin - footerHeight - axisStyle.sizePx * (clocksChange ? 3.2 : 2.2),
  };
  const from = track[0]!.moment.utDays;
  const to = track[track.length - 1]!.moment.utDays;
  const maxAltitude = Math.max(...track.map((s) => s.moonAltitudeDeg));
  const altTop = Math.min(90, Math.max(45, Math.ceil((maxAltitude + 8) / 15) * 15));
  const altBottom = -15;
  const x = (utDays: number) => plot.left + ((utDays - from) / (to - from)) * (plot.right - plot.left);
  const y = (altDeg: number) => plot.bottom - ((altDeg - altBottom) / (altTop - altBottom)) * (plot.bottom - plot.top);

  const out: string[] = [];
  const defs = `<defs><clipPath id="plot"><rect x="${n2(plot.left)}" y="${n2(plot.top)}" width="${n2(plot.right - plot.left)}" height="${n2(plot.bottom - plot.top)}"/></clipPath></defs>`;

  // Sky bands: one rectangle per run of samples with the same class.
  let runStart = 0;
  for (let i = 1; i <= track.length; i++) {
    const cls = skyClass(track[runStart]!.sunAltitudeDeg);
    if (i < track.length && skyClass(track[i]!.sunAltitudeDeg) === cls) continue;
    const x0 = runStart === 0 ? plot.left : x((track[runStart - 1]!.moment.utDays + track[runStart]!.moment.utDays) / 2);
    const x1 = i === track.length ? plot.right : x((track[i - 1]!.moment.utDays + track[i]!.moment.utDays) / 2);
    out.push(`<rect x="${n2(x0)}" y="${n2(plot.top)}" width="${n2(x1 - x0)}" height="${n2(y(0) - plot.top)}" fill="${theme.sky[cls]}"/>`);
    runStart = i;
  }
  // Ground.
  out.push(`<rect x="${n2(plot.left)}" y="${n2(y(0))}" width="${n2(plot.right - plot.left)}" height="${n2(plot.bottom - y(0))}" fill="${theme.ground}"/>`);

  // Altitude grid and ticks.
  for (let alt = altBottom; alt <= altTop; alt += 15) {
    const gy = y(alt);
    out.push(`<path d="M${n2(plot.left)},${n2(gy)}H${n2(plot.right)}" stroke="${alt === 0 ? theme.text : theme.graticule}" stroke-width="${n2((alt === 0 ? 1.4 : 0.5) * unit)}" stroke-opacity="${alt === 0 ? 1 : 0.45}"/>`);
    out.push(textElement(`${alt < 0 ? '−' : ''}${Math.abs(alt)}°`, plot.left - 6 * unit, gy + axisStyle.sizePx * 0.35, axisStyle, theme.textMuted, 'end'));
  }
  out.push(labelElement(words.sky.horizon, plot.left + 34 * unit, y(0) - 5 * unit, { sizePx: axisStyle.sizePx, weight: 'regular' }, theme, unit));

  // Hour ticks in local time: each whole hour of the clock in force at that instant, so that a
  // clock change inside the figure shows as a repeated or skipped hour, each labelled with its zone.
  for (const ut of localHourTicks(clock, from, to)) {
    const gx = x(ut);
    out.push(`<path d="M${n2(gx)},${n2(plot.top)}V${n2(plot.bottom)}" stroke="${theme.graticule}" stroke-width="${n2(0.5 * unit)}" stroke-opacity="0.35"/>`);
    out.push(textElement(clock.time(ut), gx, plot.bottom + axisStyle.sizePx * 1.4, axisStyle, theme.textMuted, 'middle'));
    if (clocksChange) out.push(textElement(clock.abbreviation(ut), gx, plot.bottom + axisStyle.sizePx * 2.5, { ...axisStyle, sizePx: axisStyle.sizePx * 0.8 }, theme.textMuted, 'middle'));
  }
  out.push(`<rect x="${n2(plot.left)}" y="${n2(plot.top)}" width="${n2(plot.right - plot.left)}" height="${n2(plot.bottom - plot.top)}" fill="none" stroke="${theme.textMuted}" stroke-width="${n2(0.8 * unit)}"/>`);

  // The Moon's path, one polyline per phase run; dotted below the horizon.
  const widths: Record<Phase, number> = { outside: 1.2, penumbral: 2.2, partial: 3.4, total: 4.6 };
  out.push('<g clip-path="url(#plot)">');
  let segment: string[] = [];
  let segmentPhase: Phase | undefined;
  let segmentUp: boolean | undefined;
  const flush = () => {
    if (segment.length > 1 && segmentPhase) {
      // Below the horizon the path fades: the Moon is there, but no one sees it.
      const dash = segmentUp ? '' : ' opacity="0.4"';
      out.push(trackPath(`M${segment.join('L')}`, theme.track[segmentPhase], widths[segmentPhase], theme, unit, dash));
    }
  };
  for (const sample of track) {
    const phase = pathPhase(eclipse, sample.moment.utDays);
    const up = sample.moonAltitudeDeg > -0.3;
    const point = `${n2(x(sample.moment.utDays))},${n2(y(sample.moonAltitudeDeg))}`;
    if (phase !== segmentPhase || up !== segmentUp) {
      flush();
      segment = segment.length > 0 ? [segment[segment.length - 1]!] : [];
      segmentPhase = phase;
      segmentUp = up;
    }
    segment.push(point);
  }
  flush();
  out.push('</g>');

  // Contacts, greatest, moonrise and moonset on the path.
  // Each label takes the first spot, above or below its point, where its plate covers no earlier one.
  const labelStyle = { sizePx: layout.labelStyle.sizePx, weight: 'semibold' as const };
  const shown = events.filter((event) => !(event.moment.utDays < from || event.moment.utDays > to || event.moonAltitudeDeg < altBottom || event.moonAltitudeDeg > altTop));
  // Every dot is reserved before any label is placed, so that no label covers another event's dot.
  const dot = (px: number, py: number): Box => ({ left: px - 6 * unit, top: py - 6 * unit, right: px + 6 * unit, bottom: py + 6 * unit });
  const dots: Box[] = shown.map((event) => dot(x(event.moment.utDays), y(event.moonAltitudeDeg)));
  const taken: Box[] = [...dots];
  const labelPlates: Box[] = [];
  const compassMarks: { text: string; utDays: number; plate: Box }[] = [];
  // Where to look: the Moon's compass point along its path, every hour while it is up.
  const compassStyle = { sizePx: layout.legendStyle.sizePx * 0.85, weight: 'regular' as const };
  const hourly = Array.from({ length: Math.floor(to * 24) - Math.ceil(from * 24) + 1 }, (_, i) => (Math.ceil(from * 24) + i) / 24)
    .map((t) => track.reduce((a, b) => (Math.abs(b.moment.utDays - t) < Math.abs(a.moment.utDays - t) ? b : a)));
  for (const sample of hourly) {
    if (sample.moonAltitudeDeg < 2) continue;
    const cx = x(sample.moment.utDays);
    const cy = y(sample.moonAltitudeDeg) + 16 * unit + compassStyle.sizePx * 0.5;
    const box = plateBox(compassText(sample.moonAzimuthDeg), cx, cy, compassStyle, unit);
    if (cy > plot.bottom - 4 * unit || taken.some((b) => overlaps(b, box))) continue;
    taken.push(box);
    compassMarks.push({ text: compassText(sample.moonAzimuthDeg), utDays: sample.moment.utDays, plate: box });
    out.push(labelElement(compassText(sample.moonAzimuthDeg), cx, cy, compassStyle, theme, unit));
  }
  for (const event of shown) {
    const px = x(event.moment.utDays);
    const py = y(event.moonAltitudeDeg);
    const text = skyEventLabel(event.event as ContactName | 'greatest' | 'moonrise' | 'moonset', timeText(event.moment.utDays), words);
    out.push(`<circle cx="${n2(px)}" cy="${n2(py)}" r="${n2(4 * unit)}" fill="${theme.paper}" stroke="${theme.text}" stroke-width="${n2(1.4 * unit)}"/>`);
    const step = labelStyle.sizePx * 1.3;
    const spots = [-12 * unit, 12 * unit + labelStyle.sizePx * 0.8, -12 * unit - step, 12 * unit + labelStyle.sizePx * 0.8 + step, -12 * unit - 2 * step]
      .map((dy) => Math.max(plot.top + labelStyle.sizePx, Math.min(plot.bottom - 4 * unit, py + dy)));
    const ly = spots.find((sy) => !taken.some((b) => overlaps(b, plateBox(text, px, sy, labelStyle, unit)))) ?? spots[0]!;
    taken.push(plateBox(text, px, ly, labelStyle, unit));
    labelPlates.push(plateBox(text, px, ly, labelStyle, unit));
    out.push(labelElement(text, px, ly, labelStyle, theme, unit));
  }

  return { svg: page.render({ defs, layers: out, footer: 'page-bottom' }), title, description: `${input.summary} ${smallPrint}`, dots, labelPlates, compassMarks };
}
