/**
 * What the figure beside the map has in common, whatever the kind of eclipse: its page (the zone its
 * times are in, theme, size, density, format, maker, a title in place of the generated one) and the one
 * writer that turns a composed figure into its file — the shadow diagram (diagramFile.ts) and the Sun and
 * the Moon at maximum (solarDiagramFile.ts) alike.
 */
import type { CivilClock } from '../ephemeris/civilTime.ts';
import type { PageSize } from '../figures/draw.ts';
import type { Theme } from '../figures/theme.ts';
import { rasterise } from '../raster/raster.ts';
import type { SkyFormat } from './formatNames.ts';

/** The diagram is written in the sky figure's formats. */
export type DiagramFormat = SkyFormat;

export interface DiagramPage {
  readonly clock: CivilClock;
  readonly theme: Theme;
  readonly size: PageSize;
  readonly dpi: number;
  readonly format: DiagramFormat;
  readonly generator: string;
  readonly title?: string;
}

/** A diagram's file: its bytes in the format asked, the SVG it was drawn from, its alt text and its caption. */
export interface DiagramFile {
  readonly bytes: Uint8Array;
  readonly svg: string;
  readonly description: string;
  readonly caption: string;
}

/** A composed figure → its file: the SVG as it stands (with a final newline), or drawn and encoded with its title and description. */
export async function diagramFile(scene: { readonly svg: string; readonly title: string; readonly description: string }, caption: string, page: Pick<DiagramPage, 'format' | 'dpi'>): Promise<DiagramFile> {
  if (page.format === 'svg') return { bytes: Buffer.from(`${scene.svg}\n`), svg: scene.svg, description: scene.description, caption };
  const bytes = await rasterise(scene.svg, { format: page.format, dpi: page.dpi, title: scene.title, description: scene.description });
  return { bytes, svg: scene.svg, description: scene.description, caption };
}
