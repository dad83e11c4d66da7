/**
 * How each layer of a figure is inked, written once: the layer draws with
 * it and its legend entry draws its swatch with it, so that the two can never
 * drift apart. Strokes are specs (colour, width and dashes in page units);
 * symbols are small functions of a position.
 */
import { geoGraticule, type GeoPath, type GeoPermissibleObjects } from 'd3-geo';
import type { Basemap, BorderStyle } from '../sphere/world.ts';
import { n2 } from './draw.ts';
import type { Theme } from './theme.ts';

/** A line's ink: colour, width and dashes in page units, round caps if asked, an opacity if not 1. */
export interface StrokeSpec {
  readonly colour: string;
  readonly widthUnits: number;
  readonly dashUnits?: readonly [number, number];
  readonly roundCaps?: boolean;
}

/** The SVG attributes of a stroke at a page unit. */
export function strokeAttributes(spec: StrokeSpec, unit: number): string {
  const dash = spec.dashUnits ? ` stroke-dasharray="${n2(spec.dashUnits[0] * unit)} ${n2(spec.dashUnits[1] * unit)}"` : '';
  return `stroke="${spec.colour}" stroke-width="${n2(spec.widthUnits * unit)}"${dash}${spec.roundCaps ? ' stroke-linecap="round"' : ''}`;
}

/** A stroked path with no fill: a layer's line. */
export const strokedPath = (d: string, spec: StrokeSpec, unit: number) => `<path d="${d}" fill="none" ${strokeAttributes(spec, unit)}/>`;

/** A legend swatch for a line: a short stroke across the middle of the swatch square. */
export const lineSwatch = (spec: StrokeSpec, unit: number) => (x: number, y: number, size: number) =>
  `<path d="M${n2(x)},${n2(y + size / 2)}h${n2(size)}" ${strokeAttributes(spec, unit)}/>`;

/** The map's boundary lines: where the body rises or sets at the stages that bound the zones (strong), and at the others (light). */
export const boundaryStrong = (theme: Theme): StrokeSpec => ({ colour: theme.boundaryStrong, widthUnits: 1.7 });
export const boundaryLight = (theme: Theme): StrokeSpec => ({ colour: theme.boundaryLight, widthUnits: 0.8, dashUnits: [1.5, 2.5], roundCaps: true });
/** The continuous field's lines. */
export const fieldStroke = (theme: Theme): StrokeSpec => ({ colour: theme.field, widthUnits: 1.1, dashUnits: [4, 2.2] });

/** The point under the body at greatest: a ring, hollow so that the zone shows through, on a halo (at an opacity on the map); the halo, then the ring. */
export function centreMark(x: number, y: number, radius: number, theme: Theme, unit: number, haloOpacity?: number): [string, string] {
  const opacity = haloOpacity === undefined ? '' : ` stroke-opacity="${haloOpacity}"`;
  return [
    `<circle cx="${n2(x)}" cy="${n2(y)}" r="${n2(radius)}" fill="none" stroke="${theme.halo}" stroke-width="${n2(4.2 * unit)}"${opacity}/>`,
    `<circle cx="${n2(x)}" cy="${n2(y)}" r="${n2(radius)}" fill="none" stroke="${theme.centreMark}" stroke-width="${n2(2.2 * unit)}"/>`,
  ];
}

/** A marked town: a small square of ink with a paper rim, unlike the ring of the point under the body. */
export function townSymbol(x: number, y: number, side: number, theme: Theme, unit: number): string {
  return `<rect x="${n2(x - side / 2)}" y="${n2(y - side / 2)}" width="${n2(side)}" height="${n2(side)}" fill="${theme.text}" stroke="${theme.halo}" stroke-width="${n2(1.3 * unit)}"/>`;
}

/** A zone's swatch: its fill at sea (upper left) and under the land tint (lower right), as the map shows it. */
export const zoneSwatch = (fill: string, theme: Theme, unit: number) => (x: number, y: number, size: number) => {
  const [left, top, w, h] = [x, y + size * 0.1, size, size * 0.8];
  return `<rect x="${n2(left)}" y="${n2(top)}" width="${n2(w)}" height="${n2(h)}" fill="${fill}"/>`
    + `<path d="M${n2(left + w)},${n2(top)}V${n2(top + h)}H${n2(left)}Z" fill="${theme.land}" fill-opacity="${theme.landOpacity}"/>`
    + `<rect x="${n2(left)}" y="${n2(top)}" width="${n2(w)}" height="${n2(h)}" fill="none" stroke="${theme.textMuted}" stroke-width="${n2(0.5 * unit)}"/>`;
};

/** A plain filled swatch with a thin outline (the sky figure's sky classes). */
export const fillSwatch = (fill: string, theme: Theme, unit: number) => (x: number, y: number, size: number) =>
  `<rect x="${n2(x)}" y="${n2(y + size * 0.1)}" width="${n2(size)}" height="${n2(size * 0.8)}" fill="${fill}" stroke="${theme.textMuted}" stroke-width="${n2(0.5 * unit)}"/>`;

/** The sky figure's track of the body: its casing (under it, wider by this many page units, at this opacity) shows it on every sky. */
export const TRACK_CASING = { extraWidthUnits: 2.6, opacity: 0.8 } as const;

/** A stretch of the track: its casing, then its colour; `extra` attributes (a fade below the horizon) go on both. */
export function trackPath(d: string, colour: string, widthUnits: number, theme: Theme, unit: number, extra = ''): string {
  return `<path d="${d}" fill="none" stroke="${theme.trackCasing}" stroke-opacity="${TRACK_CASING.opacity}" stroke-width="${n2((widthUnits + TRACK_CASING.extraWidthUnits) * unit)}" stroke-linecap="round" stroke-linejoin="round"${extra}/>`
    + '\n'
    + `<path d="${d}" fill="none" stroke="${colour}" stroke-width="${n2(widthUnits * unit)}" stroke-linecap="round" stroke-linejoin="round"${extra}/>`;
}

/** The track's legend swatch: a short stretch of it, 4 page units wide, with its casing. */
export const trackSwatch = (colour: string, theme: Theme, unit: number) => (x: number, y: number, size: number) =>
  `<path d="M${n2(x)},${n2(y + size / 2)}h${n2(size)}" stroke="${theme.trackCasing}" stroke-opacity="${TRACK_CASING.opacity}" stroke-width="${n2((4 + TRACK_CASING.extraWidthUnits) * unit)}" stroke-linecap="round"/>`
  + `<path d="M${n2(x)},${n2(y + size / 2)}h${n2(size)}" stroke="${colour}" stroke-width="${n2(4 * unit)}" stroke-linecap="round"/>`;

/**
 * The world under a map's zones and lines: the graticule under the land, the
 * land as a tint with its coastline above both, then the borders if asked.
 * `path` draws the graticule; `basemapPath` the world data (thinned to the
 * output's resolution).
 */
export function basemapLayers(path: GeoPath, basemapPath: GeoPath, basemap: Basemap, borders: BorderStyle, theme: Theme, unit: number): string[] {
  const layers = [
    `<path d="${path(geoGraticule().step([30, 30])()) ?? ''}" fill="none" stroke="${theme.graticule}" stroke-width="${n2(0.4 * unit)}" stroke-opacity="${theme.graticuleOpacity}"/>`,
    `<path d="${basemapPath(basemap.land as GeoPermissibleObjects) ?? ''}" fill="${theme.land}" fill-opacity="${theme.landOpacity}" stroke="${theme.coastline}" stroke-width="${n2(0.5 * unit)}" stroke-opacity="${theme.coastlineOpacity}"/>`,
  ];
  if (borders === 'countries') {
    layers.push(`<path d="${basemapPath(basemap.borders) ?? ''}" fill="none" stroke="${theme.border}" stroke-width="${n2(0.5 * unit)}" stroke-opacity="0.75"/>`);
  }
  return layers;
}
