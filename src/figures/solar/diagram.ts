/**
 * The solar diagram: the Sun and the Moon as one place sees them at its
 * maximum, both discs to scale, the Moon's centre at its computed position
 * angle from the Sun's; north up (towards the celestial pole of date), east to
 * the left. Beside it the place's timetable. On the shared page frame, with
 * the eye-safety caution in the header band and the small print.
 */
import type { CivilClock } from '../../ephemeris/civilTime.ts';
import { timeOnDay } from '../../ephemeris/dayMark.ts';
import type { SolarDiscs, SolarLocalCircumstances } from '../../local/solar.ts';
import type { SolarWords } from '../../words/solar/caution.ts';
import { solarDiagramTexts, solarDiagramWords, solarMomentLabel, solarSunAltitudeWords, type SolarDiagramFacts } from '../../words/solar/diagram.ts';
import { fixedIn } from '../../words/common.ts';
import { compassElements, scaleBarElements, layoutFor, n2, textElement, type Box, type PageSize } from '../draw.ts';
import { pageFrame, type LegendEntry } from '../frame.ts';
import type { Theme } from '../theme.ts';
import { FONT_CREDIT, measureText } from '../typography.ts';
import { timetableLayout } from '../timetable.ts';

export interface SolarDiagramSceneInput {
  readonly local: SolarLocalCircumstances;
  readonly discs: SolarDiscs;
  readonly placeName: string;
  readonly clock: CivilClock;
  readonly theme: Theme;
  readonly size: PageSize;
  readonly generator: string;
  readonly title?: string;
  /** The reader's solar words (settings/language.ts); English when not given. */
  readonly words?: SolarWords;
}

export interface SolarDiagramScene {
  readonly svg: string;
  readonly title: string;
  readonly description: string;
  readonly facts: SolarDiagramFacts;
  /** For tests, page pixels: the discs as drawn, and the body's room. */
  readonly sun: { readonly x: number; readonly y: number; readonly r: number };
  readonly moon: { readonly x: number; readonly y: number; readonly r: number };
  readonly body: Box;
  /** For tests, page pixels: the timetable as drawn, its heading included; and the page's room for it (margins and footer aside). */
  readonly timetable: Box;
  readonly room: Box;
}

const ARCMIN_RAD = Math.PI / (180 * 60);
const DEG = Math.PI / 180;

/** The discs' ink, on the figure and in its legend alike. */
const sunInk = (theme: Theme, unit: number) => `fill="${theme.track.penumbral}" stroke="${theme.text}" stroke-width="${n2(1.2 * unit)}"`;
/** The Moon's dark side, as the night sky's colour; where that is the paper's own (the dark theme), the next sky shade, so that the disc stays visible at totality. */
const moonFill = (theme: Theme) => (theme.sky.night.toLowerCase() === theme.paper.toLowerCase() ? theme.sky.civil : theme.sky.night);
const moonInk = (theme: Theme, unit: number) => `fill="${moonFill(theme)}" stroke="${theme.textMuted}" stroke-width="${n2(0.8 * unit)}"`;
const moonOutlineInk = (theme: Theme, unit: number) => `fill="none" stroke="${theme.text}" stroke-width="${n2(1.1 * unit)}" stroke-dasharray="${n2(5 * unit)} ${n2(3 * unit)}"`;

export function composeSolarDiagramScene(input: SolarDiagramSceneInput): SolarDiagramScene {
  const { local, discs, clock, theme, size } = input;
  const W = size.widthPx;
  const H = size.heightPx;
  const localKind = local.kind;
  if (localKind === 'none') throw new Error('composeSolarDiagramScene: the place sees nothing of the eclipse');
  const facts: SolarDiagramFacts = {
    eclipse: local.eclipse,
    placeName: input.placeName,
    clock,
    localKind,
    maximumUtDays: discs.maximum.utDays,
    magnitude: discs.magnitude,
    obscuration: discs.obscuration,
    sunAltitudeDeg: discs.sunAltitudeDeg,
    positionAngleDeg: discs.positionAngleDeg,
  };
  const events = local.events;
  const first = events[0]!.moment.utDays;
  const last = events[events.length - 1]!.moment.utDays;
  const zoneName = clock.zoneDescriptionBetween(first, last);
  const clocksChange = clock.offsetChanges(first, last).length > 0;
  const { title, subtitle, smallPrint } = solarDiagramTexts(facts, zoneName, input.generator, FONT_CREDIT, input.title, input.words);
  const words = solarDiagramWords(input.words);

  const unitOf = layoutFor(size).unit;
  const disc = (ink: string) => (x: number, y: number, s: number) => `<circle cx="${n2(x + s / 2)}" cy="${n2(y + s / 2)}" r="${n2(s * 0.42)}" ${ink}/>`;
  const legend: LegendEntry[] = [
    { label: words.legend.sun, swatch: disc(sunInk(theme, unitOf)) },
    { label: words.legend.moonOverSun, swatch: disc(moonInk(theme, unitOf)) },
    { label: words.legend.moonOutline, swatch: disc(moonOutlineInk(theme, unitOf)) },
  ];
  const page = pageFrame({
    size, theme, id: 'solar-diagram', title, subtitle, description: `${subtitle} ${smallPrint}`, smallPrint, legend,
    legendSetting: { swatchUnits: 14, gapUnits: 14, gapInWidth: true }, headerGapUnits: 14,
  });
  const { layout, contentWidth } = page;
  const { unit, margin } = layout;

  // The timetable: the place's contacts, maximum, and any sunrise or sunset inside the eclipse.
  const rowStyle = layout.legendStyle;
  const headStyle = { sizePx: layout.legendStyle.sizePx * 1.05, weight: 'semibold' as const };
  const rows = events.map((e) => ({
    key: e.event,
    label: solarMomentLabel(e.event, input.words),
    time: clocksChange ? clock.stamp(e.moment.utDays, discs.maximum.utDays) : timeOnDay(clock, e.moment.utDays, discs.maximum.utDays),
    words: `${words.moments[e.event]} · ${solarSunAltitudeWords(e.sunAltitudeDeg, input.words)}`,
  }));
  const { keyWidth, timeWidth, gap, rowHeight, tableWidth, tableHeight, bodyBottom, side, plot, table } = timetableLayout(rows, rowStyle, headStyle, { W, H, margin, unit, contentWidth, headerBottom: page.headerBottom, footerHeight: page.footerHeight }, 0.5);

  // Scale: the Sun and the whole Moon fit the plot, centred on the pair, with room for the compass and scale bar.
  const moonR = discs.moonRadiusSunRadii;
  const pa = discs.positionAngleDeg * DEG;
  // East to the left: the Moon's east offset moves it left on the page.
  const moonDx = -discs.separationSunRadii * Math.sin(pa);
  const moonDy = -discs.separationSunRadii * Math.cos(pa);
  const minX = Math.min(-1, moonDx - moonR);
  const maxX = Math.max(1, moonDx + moonR);
  const minY = Math.min(-1, moonDy - moonR);
  const maxY = Math.max(1, moonDy + moonR);
  const room = 2 * layout.legendStyle.sizePx * 2.6;
  const pxPerSunRadius = Math.min((plot.right - plot.left - room) / (maxX - minX), (plot.bottom - plot.top - room) / (maxY - minY));
  const sunX = (plot.left + plot.right) / 2 - ((minX + maxX) / 2) * pxPerSunRadius;
  const sunY = (plot.top + plot.bottom) / 2 - ((minY + maxY) / 2) * pxPerSunRadius;
  const sun = { x: sunX, y: sunY, r: pxPerSunRadius };
  const moon = { x: sunX + moonDx * pxPerSunRadius, y: sunY + moonDy * pxPerSunRadius, r: moonR * pxPerSunRadius };

  const defs = `<defs><clipPath id="solar-disc"><circle cx="${n2(sun.x)}" cy="${n2(sun.y)}" r="${n2(sun.r)}"/></clipPath></defs>`;
  const out: string[] = [];
  out.push(`<circle cx="${n2(sun.x)}" cy="${n2(sun.y)}" r="${n2(sun.r)}" ${sunInk(theme, unit)}/>`);
  // The Moon is seen only where it covers the Sun; its whole outline is drawn dashed.
  out.push(`<circle cx="${n2(moon.x)}" cy="${n2(moon.y)}" r="${n2(moon.r)}" ${moonInk(theme, unit)} clip-path="url(#solar-disc)"/>`);
  out.push(`<circle cx="${n2(moon.x)}" cy="${n2(moon.y)}" r="${n2(moon.r)}" ${moonOutlineInk(theme, unit)}/>`);
  const dot = 2.2 * unit;
  out.push(`<circle cx="${n2(sun.x)}" cy="${n2(sun.y)}" r="${n2(dot)}" fill="${theme.text}"/>`);
  out.push(`<circle cx="${n2(moon.x)}" cy="${n2(moon.y)}" r="${n2(dot)}" fill="${theme.centreMark}"/>`);

  // Compass (top left) and scale (bottom left), as on the lunar diagram.
  out.push(...compassElements(plot, layout.legendStyle.sizePx, theme, unit, words.compass));

  const pxPerArcmin = (pxPerSunRadius / discs.sunSemiDiameterRad) * ARCMIN_RAD;
  out.push(...scaleBarElements(plot, layout.legendStyle.sizePx, theme, unit, pxPerArcmin, [20, 10, 5, 2], words.sunAcross(fixedIn((2 * discs.sunSemiDiameterRad) / ARCMIN_RAD, 1, words.common))));

  // The timetable.
  const heading = words.timesHeading(clocksChange ? undefined : clock.abbreviation(discs.maximum.utDays));
  out.push(textElement(heading, table.left, table.top + headStyle.sizePx, headStyle, theme.text));
  const timetable = { left: table.left, top: table.top, right: table.left + Math.max(tableWidth, measureText(heading, headStyle)), bottom: table.top + tableHeight };
  rows.forEach((r, i) => {
    const y = table.top + headStyle.sizePx * 2 + (i + 0.75) * rowHeight;
    const strong = r.key === 'maximum';
    out.push(textElement(r.label, table.left, y, { ...rowStyle, weight: 'semibold' }, theme.text));
    out.push(textElement(r.time, table.left + keyWidth + gap, y, { ...rowStyle, weight: strong ? 'semibold' : 'regular' }, theme.text));
    out.push(textElement(r.words, table.left + keyWidth + timeWidth + 2 * gap, y, rowStyle, theme.textMuted));
  });

  return {
    svg: page.render({ defs, layers: out, footer: 'page-bottom' }),
    title,
    description: `${subtitle} ${smallPrint}`,
    facts,
    sun,
    moon,
    body: { left: plot.left, top: plot.top, right: W - margin, bottom: bodyBottom },
    timetable,
    room: { left: margin, top: page.headerBottom, right: W - margin, bottom: bodyBottom },
  };
}
