/**
 * SVG scene → image bytes with sharp (librsvg inside). Text is already
 * outlined, so no font is looked up; PNG density (pHYs) is written as asked.
 */
import sharp from 'sharp';

export type RasterFormat = 'png' | 'webp' | 'jpg';
export const RASTER_FORMATS: readonly RasterFormat[] = ['png', 'webp', 'jpg'];

export interface RasterOptions {
  readonly format: RasterFormat;
  /** Pixels per inch to record in the file. */
  readonly dpi: number;
  /** PNG text chunks (e.g. a caption), written as tEXt/iTXt. */
  readonly comment?: string;
}

export async function rasterise(svg: string, options: RasterOptions): Promise<Buffer> {
  // librsvg reads the SVG's own pixel size; density 72 keeps one SVG px = one image px.
  let image = sharp(Buffer.from(svg), { density: 72, limitInputPixels: false }).withMetadata({ density: options.dpi });
  switch (options.format) {
    case 'png':
      image = image.png({ compressionLevel: 6, adaptiveFiltering: false, palette: false });
      break;
    case 'webp':
      image = image.webp({ quality: 90, effort: 4 });
      break;
    case 'jpg':
      image = image.flatten({ background: '#ffffff' }).jpeg({ quality: 90, mozjpeg: true });
      break;
  }
  return image.toBuffer();
}
