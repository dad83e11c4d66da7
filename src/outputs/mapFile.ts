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
import type { SolarEclipse } from '../eclipses/solar/types.ts';
import { composeSolarScene, type SolarScene } from '../figures/solarMap.ts';
import { solarLocalCircumstances } from '../local/solar.ts';
import { solarCaptionFile, solarMapCaptionWords, solarMarkWords } from '../words/solar/figures.ts';
import { solarGeoJson } from './solarGeojson.ts';
import { ENGLISH } from '../words/common.ts';
import type { SolarWords } from '../words/solar/caution.ts';

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

/** A solar eclipse's map: the same request, another eclipse. */
export interface SolarMapRequest extends Omit<MapRequest, 'eclipse'> {
  readonly eclipse: SolarEclipse;
  /** The reader's solar words: the map, its marks, caption and alt text (default English). */
  readonly solar?: SolarWords;
}

export interface SolarMapFile {
  readonly bytes: Uint8Array;
  readonly scene?: SolarScene;
  /** For pictures: the caption and alt text, each with the eye-safety caution, and the caption file's text. */
  readonly caption?: { readonly caption: string; readonly altText: string };
  readonly captionFile?: string;
}

export function renderMapFile(request: MapRequest): Promise<MapFile>;
export function renderMapFile(request: SolarMapRequest): Promise<SolarMapFile>;
export function renderMapFile(request: MapRequest | SolarMapRequest): Promise<MapFile | SolarMapFile>;
export async function renderMapFile(request: MapRequest | SolarMapRequest): Promise<MapFile | SolarMapFile> {
  if (request.eclipse.body === 'solar') return renderSolarMapFile(request as SolarMapRequest);
  return renderLunarMapFile(request as MapRequest);
}

/**
 * "Tromsø · total 11:05, 2 min 14 s", "Cairo · 63 % at 10:07", "Perth · not seen": what a place sees of a
 * solar eclipse with the Sun up, at its best moment, on the map's clock (or, given none, its own).
 */
export function solarMarkLabel(eclipse: SolarEclipse, place: PlaceLabel, mapClock?: CivilClock, solar?: SolarWords): string {
  const local = solarLocalCircumstances(eclipse, { lonDeg: place.lonDeg, latDeg: place.latDeg });
  const clock = mapClock ?? civilClock(place.tz, 'zone', (solar?.common ?? ENGLISH).clock);
  const when = (utDays: number) => (mapClock === undefined ? clock.stamp(utDays) : timeOnDay(clock, utDays, eclipse.greatest.utDays));
  const maximum = local.events.find((e) => e.event === 'maximum');
  if (local.kind === 'none' || !maximum) return solarMarkWords(place.name, { kind: 'none', share: 0 }, solar);
  if (maximum.sunUp) {
    return solarMarkWords(place.name, {
      kind: local.kind, share: local.obscurationSeen, time: when(maximum.moment.utDays),
      ...(local.kind !== 'partial' && local.centralSeconds !== undefined ? { centralSeconds: local.centralSeconds } : {}),
    }, solar);
  }
  // The Sun is down at maximum: the best seen is as it rises into, or sets during, the eclipse.
  const edge = local.events.find((e) => e.event === 'sunrise' && e.moment.ttDays > maximum.moment.ttDays)
    ?? [...local.events].reverse().find((e) => e.event === 'sunset' && e.moment.ttDays < maximum.moment.ttDays);
  if (!edge) return solarMarkWords(place.name, { kind: 'none', share: 0 }, solar);
  return solarMarkWords(place.name, { kind: 'partial', share: local.obscurationSeen, time: when(edge.moment.utDays), at: edge.event as 'sunrise' | 'sunset' }, solar);
}

async function renderSolarMapFile(request: SolarMapRequest): Promise<SolarMapFile> {
  // GeoJSON is the eclipse's geometry (outputs/solarGeojson.ts), with the caution on the collection and each feature.
  if (request.format === 'geojson') return { bytes: Buffer.from(`${JSON.stringify(solarGeoJson(request.eclipse, request.solar ? { solar: request.solar } : {}))}\n`) };
  const { scene, caption } = solarPicture(request);
  const captionFile = solarCaptionFile(caption.caption, caption.altText, request.solar);
  return { bytes: await solarPictureBytes(scene, caption, request.format, request.dpi), scene, caption, captionFile };
}

/** A solar map's scene and the caption its raster files carry, in the reader's words. */
function solarPicture(request: Omit<SolarMapRequest, 'format'>): { scene: SolarScene; caption: { caption: string; altText: string } } {
  const { eclipse, style } = request;
  const marks: MapMark[] = (request.marks ?? []).map((p) => ({ lonDeg: p.lonDeg, latDeg: p.latDeg, label: solarMarkLabel(eclipse, p, style.markClock === 'town' ? undefined : style.clock, request.solar) }));
  const scene = composeSolarScene({ eclipse, style, size: request.size, generator: request.generator, marks, ...(request.solar ? { words: request.solar } : {}) });
  return { scene, caption: solarMapCaptionWords(eclipse, style.clock, scene.subtitle, request.solar) };
}

/** One picture format of a solar scene: the SVG text, or a raster drawn from it on its own. */
async function solarPictureBytes(scene: SolarScene, caption: { caption: string; altText: string }, format: Exclude<MapFormat, 'geojson'>, dpi: number): Promise<Uint8Array> {
  if (format === 'svg') return Buffer.from(`${scene.svg}\n`);
  const rasters = await rasteriseSet(scene.svg, [format], { dpi, title: scene.title, description: `${caption.caption} Alt text: ${caption.altText}` });
  return rasters.files.get(format)!;
}

/**
 * A solar eclipse's map in several picture formats from one scene: what
 * renderMapFile makes format by format (the same bytes), without composing
 * the scene (its obscuration field, curves and labels) once per format, and
 * with one drawing for every raster format (rasteriseSet encodes the same
 * pixels rasterise draws). GeoJSON is not a picture and is not made here.
 */
export async function renderSolarMapFiles(request: Omit<SolarMapRequest, 'format'>, formats: readonly Exclude<MapFormat, 'geojson'>[]): Promise<Map<MapFormat, Uint8Array>> {
  const files = new Map<MapFormat, Uint8Array>();
  if (formats.length === 0) return files;
  const { scene, caption } = solarPicture(request);
  if (formats.includes('svg')) files.set('svg', Buffer.from(`${scene.svg}\n`));
  const rasters = await rasteriseSet(scene.svg, formats.filter(isRasterFormat), { dpi: request.dpi, title: scene.title, description: `${caption.caption} Alt text: ${caption.altText}` });
  for (const [format, bytes] of rasters.files) files.set(format, bytes);
  return files;
}

async function renderLunarMapFile(request: MapRequest): Promise<MapFile> {
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
