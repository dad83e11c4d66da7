/** One eclipse → its shadow diagram as PNG, SVG, WebP or JPEG, with the caption published beside it. */
import { shadowDiagram, type ShadowDiagram } from '../eclipses/lunar/diagram.ts';
import type { LunarEclipse } from '../eclipses/lunar/types.ts';
import type { CivilClock } from '../ephemeris/civilTime.ts';
import { timeOnDay } from '../ephemeris/dayMark.ts';
import { composeDiagramScene } from '../figures/diagram.ts';
import type { PageSize } from '../figures/draw.ts';
import type { Theme } from '../figures/theme.ts';
import { rasterise } from '../raster/raster.ts';
import type { SkyFormat } from './formatNames.ts';

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
}

/** The caption file: title, what the figure shows in one sentence, then alt text. */
export function diagramCaptionText(title: string, diagram: ShadowDiagram, clock: CivilClock): string {
  const { eclipse } = diagram;
  const ref = eclipse.greatest.utDays;
  const at = (utDays: number) => `${timeOnDay(clock, utDays, ref)} ${clock.abbreviation(utDays)}`;
  const inner = eclipse.contacts.U2 && eclipse.contacts.U3 ? ` It is wholly inside the umbra from ${at(eclipse.contacts.U2.utDays)} to ${at(eclipse.contacts.U3.utDays)}.`
    : eclipse.contacts.U1 && eclipse.contacts.U4 ? ` It is partly inside the umbra from ${at(eclipse.contacts.U1.utDays)} to ${at(eclipse.contacts.U4.utDays)}.` : ' It never reaches the umbra.';
  const summary = `The Moon enters the Earth's penumbra at ${at(eclipse.contacts.P1!.utDays)}, is deepest in the shadow at ${at(ref)} and leaves it at ${at(eclipse.contacts.P4!.utDays)}.${inner}`;
  const side = eclipse.gamma >= 0 ? 'north' : 'south';
  const alt = `Diagram of two concentric circles, the Earth's lighter penumbra around its darker umbra, with the Moon's path crossing them from right to left, passing ${side} of the centre; the Moon is drawn where each phase begins and ends and at greatest, each labelled with its time. North is up, east to the left.`;
  return `${title}. ${summary}\n\nAlt text: ${alt}\n`;
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
  });
  const caption = diagramCaptionText(scene.title, diagram, request.clock);
  if (request.format === 'svg') return { bytes: Buffer.from(`${scene.svg}\n`), svg: scene.svg, description: scene.description, caption };
  const bytes = await rasterise(scene.svg, { format: request.format, dpi: request.dpi, title: scene.title, description: scene.description });
  return { bytes, svg: scene.svg, description: scene.description, caption };
}
