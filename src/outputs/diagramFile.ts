/** One eclipse → its shadow diagram as PNG, SVG, WebP or JPEG, with the caption published beside it. */
import { shadowDiagram } from '../eclipses/lunar/diagram.ts';
import type { LunarEclipse } from '../eclipses/lunar/types.ts';
import { composeDiagramScene } from '../figures/diagram.ts';
import { diagramCaption } from '../words/lunar/diagram.ts';
import { diagramFile, type DiagramFile, type DiagramPage } from './diagramPage.ts';
import type { LunarWords } from '../words/lunar/text.ts';

export type { DiagramFormat } from './diagramPage.ts';

export interface DiagramRequest extends DiagramPage {
  readonly eclipse: LunarEclipse;
  /** The reader's lunar words (settings/language.ts); English when not given. The clock should speak the same language. */
  readonly lunar?: LunarWords;
}

export async function renderDiagramFile(request: DiagramRequest): Promise<DiagramFile> {
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
  return diagramFile(scene, diagramCaption(scene.title, request.eclipse, request.clock, request.lunar), request);
}
