/** The names of our output formats, apart from the code that writes them (light to import). */
export type RasterFormatName = 'png' | 'webp' | 'jpg';
export type MapFormat = RasterFormatName | 'svg' | 'geojson';
export const MAP_FORMATS: readonly MapFormat[] = ['png', 'svg', 'webp', 'jpg', 'geojson'];

export type SkyFormat = RasterFormatName | 'svg';
export const SKY_FORMATS: readonly SkyFormat[] = ['png', 'svg', 'webp', 'jpg'];

export type LocalFormat = 'table' | 'markdown' | 'csv' | 'ics' | 'json';
export const LOCAL_FORMATS: readonly LocalFormat[] = ['table', 'markdown', 'csv', 'ics', 'json'];
