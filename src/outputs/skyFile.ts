/** One eclipse, one place → the "view from here" figure as PNG, SVG, WebP or JPEG. */
import type { LunarEclipse } from '../eclipses/lunar/types.ts';
import { momentFromUT } from '../ephemeris/time.ts';
import type { PageSize } from '../figures/draw.ts';
import { composeSkyScene } from '../figures/sky.ts';
import type { Theme } from '../figures/theme.ts';
import { rasterise } from '../raster/raster.ts';
import { altitudeTrack } from '../local/lunar.ts';
import { skyCaption } from '../words/lunar/figures.ts';
import type { SkyFormat } from './formatNames.ts';
import { wordsOf, type LocalReport } from './localFormats.ts';

/** The figure shows an hour either side of the eclipse. */
const MARGIN_DAYS = 1 / 24;

export interface SkyRequest {
  readonly report: LocalReport;
  readonly theme: Theme;
  readonly size: PageSize;
  readonly dpi: number;
  readonly format: SkyFormat;
  readonly generator: string;
  readonly title?: string;
}

/** The caption file published beside a sky figure: its title and summary, then alt text (words/lunar/figures.ts). */
export function skyCaptionText(title: string, report: LocalReport): string {
  return skyCaption(title, report.summary, report.place.name, wordsOf(report).figures);
}

export async function renderSkyFile(request: SkyRequest): Promise<{ bytes: Uint8Array; svg: string; description: string; caption: string }> {
  const { report } = request;
  const eclipse: LunarEclipse = report.local.eclipse;
  const p1 = eclipse.contacts.P1!;
  const p4 = eclipse.contacts.P4!;
  const track = altitudeTrack(
    report.local.observer,
    momentFromUT(p1.utDays - MARGIN_DAYS, p1.deltaTSeconds),
    momentFromUT(p4.utDays + MARGIN_DAYS, p4.deltaTSeconds),
  );
  const scene = composeSkyScene({
    eclipse,
    placeName: report.place.name,
    clock: report.clock,
    events: report.local.events,
    track,
    summary: report.summary,
    theme: request.theme,
    size: request.size,
    generator: request.generator,
    credits: report.place.name.includes('°') ? '' : `${wordsOf(report).common.credits.places}.`,
    words: wordsOf(report).figures,
    ...(request.title !== undefined ? { title: request.title } : {}),
  });
  const caption = skyCaptionText(scene.title, report);
  if (request.format === 'svg') return { bytes: Buffer.from(`${scene.svg}\n`), svg: scene.svg, description: scene.description, caption };
  const bytes = await rasterise(scene.svg, { format: request.format, dpi: request.dpi, title: scene.title, description: scene.description });
  return { bytes, svg: scene.svg, description: scene.description, caption };
}
