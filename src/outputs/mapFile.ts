/**
 * One eclipse → one map file: the scene, rasterised or not, or GeoJSON; with
 * its caption. Everything here is a function of its inputs: same request,
 * same bytes.
 */
import type { LunarEclipse } from '../eclipses/lunar/types.ts';
import { civilClock, type CivilClock } from '../ephemeris/civilTime.ts';
import { timeOnDay } from '../ephemeris/dayMark.ts';
import { composeScene, type MapMark, type MapSize, type MapStyle, type Scene } from '../figures/map.ts';
import { isRasterFormat, rasteriseSet } from '../raster/raster.ts';
import { localCircumstances } from '../local/lunar.ts';
import { visibilityOf, type Visibility } from '../visibility/lunar/visibility.ts';
import { captionText, eclipseCaption, type Caption } from './caption.ts';
import { LUNAR_ENGLISH, type LunarWords } from '../words/lunar/text.ts';
import { visibilityGeoJson } from './geojson.ts';
import type { PlaceLabel } from './localFormats.ts';

import type { MapFormat } from './formatNames.ts';
export { MAP_FORMATS, type MapFormat } from './formatNames.ts';

export interface MapRequest {
  readonly eclipse: LunarEclipse;
  readonly style: MapStyle;
  readonly size: MapSize;
  readonly dpi: number;
  readonly format: MapFormat;
  readonly generator: string;
  /** Places to mark, labelled on the map's clock or (style.markClock 'town') each in its own zone. */
  readonly marks?: readonly PlaceLabel[];
  /** The reader's language of the caption and mark labels (default English); the map's own words come with `style.words`. */
  readonly words?: LunarWords;
}

export interface MapFile {
  readonly bytes: Uint8Array;
  readonly scene?: Scene;
  /** For pictures: the caption and alt text to publish beside them. */
  readonly caption?: Caption;
}

/**
 * "Adelaide · greatest 17:29 ACDT", "Sydney · rises 19:14 AEDT", "Cairo · not seen"; given the
 * map's clock, on that clock with no zone name (the small print names it) and a day mark off the title's date.
 */
export function markLabel(eclipse: LunarEclipse, place: PlaceLabel, mapClock?: CivilClock, words: LunarWords = LUNAR_ENGLISH): string {
  const clock = civilClock(place.tz, 'zone', words.common.clock);
  const w = words.figures.mark;
  const local = localCircumstances(eclipse, place);
  // One clock per map: the map's zone is named in its header, so a mark gives the time and, off the title's day, a day mark;
  // if that clock changes during the eclipse, each time names its own zone. A town's own clock always names its zone.
  const span = [eclipse.contacts.P1!.utDays, eclipse.contacts.P4!.utDays] as const;
  const when = (utDays: number) =>
    mapClock === undefined ? clock.stamp(utDays)
      : mapClock.offsetChanges(...span).length > 0 ? mapClock.stamp(utDays, eclipse.greatest.utDays)
        : timeOnDay(mapClock, utDays, eclipse.greatest.utDays);
  const greatest = local.events.find((e) => e.event === 'greatest')!;
  const rise = local.events.find((e) => e.event === 'moonrise');
  const set = local.events.find((e) => e.event === 'moonset');
  const phrase = greatest.moonUp
    ? `${w.greatest} ${when(greatest.moment.utDays)}`
    : rise ? `${w.rises} ${when(rise.moment.utDays)}`
      : set ? `${w.sets} ${when(set.moment.utDays)}` : w.notSeen;
  return `${place.name} · ${phrase}`;
}

export async function renderMapFile(request: MapRequest): Promise<MapFile> {
  // GeoJSON is geometry alone: no fonts, scene or caption are made for it.
  if (request.format === 'geojson') return { bytes: geoJsonBytes(visibilityOf(request.eclipse)) };
  const { files, scene, caption } = await renderMapFiles(request, [request.format]);
  return { bytes: files.get(request.format)!, ...(scene ? { scene } : {}), caption };
}

const geoJsonBytes = (visibility: Visibility): Uint8Array => Buffer.from(`${JSON.stringify(visibilityGeoJson(visibility))}\n`);

/**
 * One eclipse in several formats at once: the scene and caption are made
 * once and serve every picture format (a batch asks for PNG and SVG
 * together), and the raster formats, with a thumbnail if asked, come from
 * one drawing of the scene. The scene is composed only when a picture or a
 * thumbnail is asked for.
 */
export async function renderMapFiles(
  request: Omit<MapRequest, 'format'>,
  formats: readonly MapFormat[],
  thumbnailWidthPx?: number,
): Promise<{ files: Map<MapFormat, Uint8Array>; scene?: Scene; caption: Caption; thumbnail?: Uint8Array }> {
  const visibility = visibilityOf(request.eclipse);
  const words = request.words ?? LUNAR_ENGLISH;
  const caption = eclipseCaption(request.eclipse, visibility, request.style.clock, undefined, words);
  const files = new Map<MapFormat, Uint8Array>();
  const pictures = formats.filter((f) => f !== 'geojson');
  if (pictures.length === 0 && thumbnailWidthPx === undefined) {
    for (const format of formats) files.set(format, geoJsonBytes(visibility));
    return { files, caption };
  }
  const marks: MapMark[] = (request.marks ?? []).map((p) => ({ lonDeg: p.lonDeg, latDeg: p.latDeg, label: markLabel(request.eclipse, p, request.style.markClock === 'town' ? undefined : request.style.clock, words) }));
  const scene = composeScene({ eclipse: request.eclipse, visibility, style: request.style, size: request.size, generator: request.generator, marks });
  const rasters = await rasteriseSet(
    scene.svg,
    formats.filter(isRasterFormat),
    { dpi: request.dpi, title: scene.title, description: captionText(caption, words).trim().replace(/\n+/g, ' ') },
    thumbnailWidthPx,
  );
  for (const format of formats) {
    if (format === 'geojson') files.set(format, geoJsonBytes(visibility));
    else if (format === 'svg') files.set(format, Buffer.from(`${scene.svg}\n`));
    else files.set(format, rasters.files.get(format)!);
  }
  return { files, scene, caption, ...(rasters.thumbnail ? { thumbnail: rasters.thumbnail } : {}) };
}
