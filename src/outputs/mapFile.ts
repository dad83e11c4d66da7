/**
 * One eclipse → one map file: the scene, rasterised or not, or GeoJSON.
 * Everything here is a function of its inputs: same request, same bytes.
 */
import type { LunarEclipse } from '../eclipse/types.ts';
import { composeScene, type MapSize, type MapStyle, type Scene } from '../map/scene.ts';
import { rasterise, type RasterFormat } from '../raster/raster.ts';
import { visibilityOf } from '../visibility/visibility.ts';
import { visibilityGeoJson } from './geojson.ts';

export type MapFormat = RasterFormat | 'svg' | 'geojson';
export const MAP_FORMATS: readonly MapFormat[] = ['png', 'svg', 'webp', 'jpg', 'geojson'];

export interface MapRequest {
  readonly eclipse: LunarEclipse;
  readonly style: MapStyle;
  readonly size: MapSize;
  readonly dpi: number;
  readonly format: MapFormat;
  readonly generator: string;
}

export interface MapFile {
  readonly bytes: Uint8Array;
  readonly scene?: Scene;
}

export async function renderMapFile(request: MapRequest): Promise<MapFile> {
  const visibility = visibilityOf(request.eclipse);
  if (request.format === 'geojson') {
    return { bytes: Buffer.from(`${JSON.stringify(visibilityGeoJson(visibility))}\n`) };
  }
  const scene = composeScene({ eclipse: request.eclipse, visibility, style: request.style, size: request.size, generator: request.generator });
  if (request.format === 'svg') return { bytes: Buffer.from(`${scene.svg}\n`), scene };
  const bytes = await rasterise(scene.svg, {
    format: request.format,
    dpi: request.dpi,
    title: scene.title,
    description: `${scene.subtitle}. ${scene.smallPrint}`,
  });
  return { bytes, scene };
}
