/**
 * The names of our output formats, apart from the code that writes them (light to import): one table,
 * from which the map formats, the sky figure's formats and the file-name extensions are all derived. A new
 * format is a row here (and, if it is an image, a case in the raster stage: src/raster/formats.ts).
 */
const OUTPUT_FORMATS = {
  png: { extensions: ['.png'], sky: true },
  svg: { extensions: ['.svg'], sky: true },
  webp: { extensions: ['.webp'], sky: true },
  jpg: { extensions: ['.jpg', '.jpeg'], sky: true },
  geojson: { extensions: ['.geojson', '.json'], sky: false },
} as const satisfies Record<string, { readonly extensions: readonly string[]; readonly sky: boolean }>;

type Table = typeof OUTPUT_FORMATS;

export type MapFormat = keyof Table;
export const MAP_FORMATS: readonly MapFormat[] = Object.keys(OUTPUT_FORMATS) as MapFormat[];

export type SkyFormat = { [F in MapFormat]: Table[F]['sky'] extends true ? F : never }[MapFormat];
export const SKY_FORMATS: readonly SkyFormat[] = MAP_FORMATS.filter((f): f is SkyFormat => OUTPUT_FORMATS[f].sky);

/** A file name's extension (lower case, with its dot) → the format it names. */
export const EXTENSION_FORMATS: Readonly<Record<string, MapFormat>> = Object.fromEntries(
  MAP_FORMATS.flatMap((format) => OUTPUT_FORMATS[format].extensions.map((extension) => [extension, format])),
);

export type LocalFormat = 'table' | 'markdown' | 'csv' | 'ics' | 'json';
export const LOCAL_FORMATS: readonly LocalFormat[] = ['table', 'markdown', 'csv', 'ics', 'json'];
