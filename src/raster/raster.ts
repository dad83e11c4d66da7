/**
 * SVG scene → image bytes: resvg draws, sharp encodes. Text is already
 * outlined, so resvg is given no fonts at all (none of the system's is
 * loaded); the density is recorded as asked (PNG pHYs), and a title and
 * description travel in XMP.
 */
import { createRequire } from 'node:module';
import sharp, { type Sharp } from 'sharp';
import { escapeXml } from '../figures/xml.ts';

import type { RasterFormat } from './formats.ts';
import { collectGarbage } from './collect.ts';

export { RASTER_FORMATS, isRasterFormat, type RasterFormat } from './formats.ts';

export interface RasterOptions {
  readonly format: RasterFormat;
  /** Pixels per inch to record in the file. */
  readonly dpi: number;
  /** Embedded as XMP dc:title and dc:description. */
  readonly title?: string;
  readonly description?: string;
}

export function xmpPacket(title: string, description: string): string {
  const alt = (text: string) => `<rdf:Alt><rdf:li xml:lang="x-default">${escapeXml(text)}</rdf:li></rdf:Alt>`;
  return [
    '<?xpacket begin="\uFEFF" id="W5M0MpCehiHzreSzNTczkc9d"?>',
    '<x:xmpmeta xmlns:x="adobe:ns:meta/"><rdf:RDF xmlns:rdf="http://www.w3.org/1999/02/22-rdf-syntax-ns#">',
    '<rdf:Description rdf:about="" xmlns:dc="http://purl.org/dc/elements/1.1/">',
    `<dc:title>${alt(title)}</dc:title><dc:description>${alt(description)}</dc:description>`,
    '</rdf:Description></rdf:RDF></x:xmpmeta>',
    '<?xpacket end="w"?>',
  ].join('');
}

const THUMBNAIL_PNG = { compressionLevel: 9 } as const;

// resvg-js loads a native module beside its own: required at run time, never bundled.
const { Resvg } = createRequire(import.meta.url)('@resvg/resvg-js') as typeof import('@resvg/resvg-js');

/**
 * Draw an SVG with resvg, at its own pixel size or scaled to a width.
 * resvg draws the whole picture in one pass (librsvg through sharp drew in
 * 2000-px tiles, so a 2400-px map was drawn twice) and took 0.4 times as long
 * on our maps (`npm run bench`). No font is loaded: letters are outlines, and
 * a stray <text> draws nothing rather than whatever the machine has. The
 * canvas is filled white first, so every pixel is opaque: the alpha channel
 * carries nothing, premultiplied and straight colour are the same, and the
 * picture goes on as RGB (identical pixels, smaller and faster to encode).
 * The price is memory: resvg holds the whole picture, and its copy for
 * sharp, at 4 bytes a pixel each (measured: 0.6 GB peak at the 64-megapixel
 * limit, where librsvg's tiles needed 0.24 GB; 26 MB more at 2400×1350).
 */
function draw(svg: string, widthPx?: number): Drawing {
  const image = new Resvg(svg, {
    font: { loadSystemFonts: false },
    fitTo: widthPx === undefined ? { mode: 'original' } : { mode: 'width', value: widthPx },
    background: '#ffffff',
    logLevel: 'off',
  }).render();
  return { pixels: image.pixels, width: image.width, height: image.height };
}

/** RGBA pixels, every one opaque. */
interface Drawing {
  readonly pixels: Buffer;
  readonly width: number;
  readonly height: number;
}

const rgb = (drawing: Drawing): Sharp =>
  sharp(drawing.pixels, { raw: { width: drawing.width, height: drawing.height, channels: 4 }, limitInputPixels: false }).removeAlpha();

/** A small PNG of an SVG picture, drawn at its small size (no full-size image in memory). */
export async function thumbnail(svg: string, widthPx: number): Promise<Buffer> {
  return rgb(draw(svg, widthPx)).png(THUMBNAIL_PNG).toBuffer();
}

function encode(image: Sharp, options: RasterOptions): Promise<Buffer> {
  image = image.withDensity(options.dpi);
  if (options.title !== undefined) image = image.withXmp(xmpPacket(options.title, options.description ?? ''));
  switch (options.format) {
    case 'png':
      image = image.png({ compressionLevel: 6, adaptiveFiltering: false });
      break;
    case 'webp':
      image = image.webp({ quality: 90, effort: 4 });
      break;
    case 'jpg':
      image = image.jpeg({ quality: 90, mozjpeg: true });
      break;
  }
  return image.toBuffer();
}

export async function rasterise(svg: string, options: RasterOptions): Promise<Buffer> {
  const drawing = draw(svg);
  // resvg's canvas and tree are garbage once its pixels are copied out: free them before encoding.
  collectGarbage();
  return encode(rgb(drawing), options);
}

export interface RasterSet {
  readonly files: Map<RasterFormat, Buffer>;
  readonly thumbnail?: Buffer;
}

const shrink = (image: Buffer | Sharp, widthPx: number) => (Buffer.isBuffer(image) ? sharp(image) : image).resize({ width: widthPx }).png(THUMBNAIL_PNG).toBuffer();

/**
 * The raster files of one SVG picture, and optionally a thumbnail of it.
 * Drawing costs more than encoding, so the SVG is drawn once:
 * one file is drawn straight into its encoder and the thumbnail shrunk from
 * that file (decoding it costs a fraction of drawing again); several files
 * share one drawing's pixels. With no raster file, the thumbnail is drawn
 * small.
 */
export async function rasteriseSet(
  svg: string,
  formats: readonly RasterFormat[],
  options: Omit<RasterOptions, 'format'>,
  thumbnailWidthPx?: number,
): Promise<RasterSet> {
  const files = new Map<RasterFormat, Buffer>();
  if (formats.length <= 1) {
    const format = formats[0];
    if (format !== undefined) files.set(format, await rasterise(svg, { ...options, format }));
    if (thumbnailWidthPx === undefined) return { files };
    return { files, thumbnail: format !== undefined ? await shrink(files.get(format)!, thumbnailWidthPx) : await thumbnail(svg, thumbnailWidthPx) };
  }
  const drawing = draw(svg);
  collectGarbage();
  for (const format of formats) files.set(format, await encode(rgb(drawing), { ...options, format }));
  return thumbnailWidthPx === undefined ? { files } : { files, thumbnail: await shrink(rgb(drawing), thumbnailWidthPx) };
}
