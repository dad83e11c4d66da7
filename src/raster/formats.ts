/** The image formats the raster stage encodes: the one list (light to import: no encoder loaded). */
export type RasterFormat = 'png' | 'webp' | 'jpg';
export const RASTER_FORMATS: readonly RasterFormat[] = ['png', 'webp', 'jpg'];

export const isRasterFormat = (format: string): format is RasterFormat => (RASTER_FORMATS as readonly string[]).includes(format);
