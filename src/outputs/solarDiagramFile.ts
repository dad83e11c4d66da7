/**
 * One solar eclipse and one place → the Sun and the Moon as the place sees
 * them at maximum, as PNG, SVG, WebP or JPEG, with its caption (the caution in
 * it, long form). A place that sees nothing of the eclipse with the Sun up is
 * bad input: one InputError naming the parameter the place came from.
 */
import { InputError } from '../errors.ts';
import type { SolarEclipse } from '../eclipses/solar/types.ts';
import { composeSolarDiagramScene } from '../figures/solar/diagram.ts';
import { solarDiscsAtMaximum, solarLocalCircumstances } from '../local/solar.ts';
import { solarDiagramCaption } from '../words/solar/diagram.ts';
import { diagramFile, type DiagramFile, type DiagramPage } from './diagramPage.ts';
import type { SolarWords } from '../words/solar/caution.ts';

export interface SolarDiagramRequest extends DiagramPage {
  readonly eclipse: SolarEclipse;
  /** Where the eclipse is seen from, and how it is named; `parameter` names where it came from, for errors. */
  readonly place: { readonly name: string; readonly latDeg: number; readonly lonDeg: number; readonly parameter: string };
  /** The reader's solar words (settings/language.ts); English when not given. The clock should speak the same language. */
  readonly solar?: SolarWords;
}

export async function renderSolarDiagramFile(request: SolarDiagramRequest): Promise<DiagramFile> {
  const { eclipse, place } = request;
  const observer = { latDeg: place.latDeg, lonDeg: place.lonDeg };
  const local = solarLocalCircumstances(eclipse, observer);
  if (local.kind === 'none') {
    throw new InputError(place.parameter, `a place that sees the solar eclipse of ${eclipse.id} with the Sun up`, `${place.name} (${local.events.length === 0 ? 'outside the Moon\'s shadow' : 'the Sun is down throughout'})`, true);
  }
  const scene = composeSolarDiagramScene({
    local,
    discs: solarDiscsAtMaximum(eclipse, observer),
    placeName: place.name,
    clock: request.clock,
    theme: request.theme,
    size: request.size,
    generator: request.generator,
    ...(request.title !== undefined ? { title: request.title } : {}),
    ...(request.solar !== undefined ? { words: request.solar } : {}),
  });
  return diagramFile(scene, solarDiagramCaption(scene.title, scene.facts, request.solar), request);
}
