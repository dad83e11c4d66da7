/** One eclipse → its shadow diagram as PNG, SVG, WebP or JPEG, with the caption published beside it. */
import { shadowDiagram } from '../eclipses/lunar/diagram.ts';
import type { LunarEclipse } from '../eclipses/lunar/types.ts';
import type { CivilClock } from '../ephemeris/civilTime.ts';
import { composeDiagramScene } from '../figures/diagram.ts';
import type { PageSize } from '../figures/draw.ts';
import type { Theme } from '../figures/theme.ts';
import { rasterise } from '../raster/raster.ts';
import { diagramCaption } from '../words/lunar/diagram.ts';
import type { SkyFormat } from './formatNames.ts';
import type { LunarWords } from '../words/lunar/text.ts';

/** The diagram is written in the sky figure's formats. */
export type DiagramFormat = SkyFormat;

export interface DiagramRequest {
  readonly eclipse: LunarEclipse;
  readonly clock: CivilClock;
  readonly theme: Theme;
  readonly size: PageSize;
  readonly dpi: number;
  readonly format: DiagramFormat;
  readonly generator: string;
  readonly title?: string;
  /** The reader's lunar words (settings/language.ts); English when not given. The clock should speak the same language. */
  readonly lunar?: LunarWords;
}

export async function renderDiagramFile(request: DiagramRequest): Promise<{ bytes: Uint8Array; svg: string; description: string; caption: string }> {
  const diagram = shadowDiagram(request.eclipse);
  const scene = composeDiagramScene({
    diagram,
    clock: request.clock,
    theme: request.theme,
    size: request.size,
    generator: request.generator,
    ...(request.title !== undefined ? { title: request.title } : {}),
    ...(request.lunar !== undefined ? { words: request.lunar } : {}),
  });
  const caption = diagramCaption(scene.title, request.eclipse, request.clock, request.lunar);
  if (request.format === 'svg') return { bytes: Buffer.from(`${scene.svg}\n`), svg: scene.svg, description: scene.description, caption };
  const bytes = await rasterise(scene.svg, { format: request.format, dpi: request.dpi, title: scene.title, description: scene.description });
  return { bytes, svg: scene.svg, description: scene.description, caption };
}
