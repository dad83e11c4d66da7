/**
 * A house style as the typed settings the library takes — the same values the
 * command line's flags are read into — and the style field behind each
 * parameter, for errors. Kept apart from the schema (style.ts), so that the
 * batch workers load no schema library.
 */
import type { SkyFormat } from '../outputs/formatNames.ts';
import { isRasterFormat } from '../raster/formats.ts';
import type { EclipseChoice } from '../settings/choose.ts';
import type { MapChoices } from '../settings/mapSettings.ts';
import { parseSize } from '../settings/read.ts';
import type { HouseStyle } from './style.ts';

/**
 * A style's map, as the typed choices the map settings take (the same the
 * command line's flags give): no text to re-read, save the size, which a
 * style writes as WxH.
 */
export function mapChoicesOf(style: HouseStyle): MapChoices {
  return {
    projection: style.projection,
    ...(style.bbox ? { bbox: style.bbox } : {}),
    // A style writes the centre as people do, [lat, lon].
    ...(style.centre ? { centre: [style.centre[1], style.centre[0]] as const } : {}),
    ...(style.span !== undefined ? { spanDeg: style.span } : {}),
    ...(style.size ? { size: parseSize(style.size) } : {}),
    ...(style.preset ? { preset: style.preset } : {}),
    ...(style.widthMm !== undefined ? { widthMm: style.widthMm } : {}),
    ...(style.dpi !== undefined ? { dpi: style.dpi } : {}),
    theme: style.theme,
    borders: style.borders,
    zone: style.tz,
    ...(style.title !== undefined ? { title: style.title } : {}),
    marks: style.marks,
    markClock: style.markClock,
    areaNames: style.areaNames,
    ...(style.lang !== undefined ? { lang: style.lang } : {}),
  };
}

/**
 * The formats of a style's diagram, none when it asks for none: `diagram: true`
 * takes the maps' picture formats (PNG when the maps are GeoJSON only), a list its own.
 */
export function diagramFormatsOf(style: HouseStyle): SkyFormat[] {
  if (style.diagram === undefined) return [];
  if (style.diagram !== true) return [...style.diagram];
  const pictures = style.formats.filter((f): f is SkyFormat => f === 'svg' || isRasterFormat(f));
  return pictures.length > 0 ? [...new Set(pictures)] : ['png'];
}

/** How a style's eclipses are computed (the convention is a lunar setting). */
export function eclipseChoiceOf(style: HouseStyle): EclipseChoice {
  return { convention: style.convention, ...(style.deltaT !== undefined ? { deltaTSeconds: style.deltaT } : {}) };
}

/** The style field behind each parameter of the map and eclipse settings, for errors that name the field. */
export const STYLE_FIELDS: Readonly<Record<string, keyof HouseStyle>> = {
  projection: 'projection', bbox: 'bbox', centre: 'centre', spanDeg: 'span', size: 'size', preset: 'preset', widthMm: 'widthMm', dpi: 'dpi',
  theme: 'theme', borders: 'borders', zone: 'tz', title: 'title', marks: 'marks', place: 'marks', markClock: 'markClock', areaNames: 'areaNames', lang: 'lang',
  convention: 'convention', deltaT: 'deltaT',
};
