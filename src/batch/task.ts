/**
 * One eclipse of a batch, in a worker process: every file the house style
 * asks for, each written atomically (into folders runBatch has made); returns
 * what it wrote, with sizes and hashes. Dispatches on the eclipse's body:
 * a lunar eclipse gets maps, caption, thumbnail, local tables and sky
 * figures; a solar eclipse its maps (the caution in the header band) and
 * thumbnail, its caption (with the eye-safety caution), its GeoJSON geometry
 * and the local tables of the style's places (each with the caution). When
 * the style asks for the diagram: a lunar eclipse's shadow diagram; a solar
 * eclipse's Sun and Moon at maximum from each place of the style that sees it
 * (the greatest point when none does, or the style names none), caution and all.
 */
import sharp from 'sharp';
import { THEMES } from '../figures/theme.ts';
import { pathInside, writeFileAtomic } from '../outputs/files.ts';
import { localCsv, localIcs, localJson, localMarkdown, localReport, localTable, type LocalFormat } from '../outputs/localFormats.ts';
import { captionText } from '../outputs/caption.ts';
import { prepareSolarCaptions, solarCaption, solarCaptionText } from '../outputs/solarCaption.ts';
import { measureText } from '../figures/typography.ts';
import { loadBasemap } from '../sphere/world.ts';
import { solarGeoJson } from '../outputs/solarGeojson.ts';
import { solarLocalCsv, solarLocalIcs, solarLocalJson, solarLocalMarkdown, solarLocalReport, solarLocalTable } from '../outputs/solarLocal.ts';
import { civilClock } from '../ephemeris/civilTime.ts';
import type { LunarEclipse } from '../eclipses/lunar/types.ts';
import type { SolarEclipse } from '../eclipses/solar/types.ts';
import { renderMapFiles, renderSolarMapFiles } from '../outputs/mapFile.ts';
import { renderSkyFile } from '../outputs/skyFile.ts';
import { renderDiagramFile, type DiagramFormat } from '../outputs/diagramFile.ts';
import { renderSolarDiagramFile, type SolarDiagramRequest } from '../outputs/solarDiagramFile.ts';
import { choosePlace } from '../settings/choose.ts';
import { DIAGRAM_SIZE, mapSettings, pageSize } from '../settings/mapSettings.ts';
import type { HouseStyle } from './style.ts';
import { solarGreatestPointName } from '../words/solar/diagram.ts';
import { diagramFormatsOf, mapChoicesOf } from './styleSettings.ts';
import { fileStem, stylePlaces } from './naming.ts';
import { SKY_FIGURE_PX } from './resources.ts';
export { WARM_ENV } from './workerScript.ts';
import { sha256, type FileRole, type TaskInput, type WrittenFile, type TaskResult } from './written.ts';

export const THUMBNAIL_WIDTH_PX = 480;

/**
 * A worker's start: load now what every task of its batch reads, so that it
 * is ready while the batch's own process still searches the catalogue (the
 * pool starts before that search): the fonts, the coarse world (every
 * lunar caption and map reads it) and, when the batch holds solar
 * eclipses, the solar captions' land lattice and large cities (their 1:50m
 * country outlines are read per caption, not kept). Only caches are
 * filled: a failure here is left for the task that meets it to report.
 */
export function warmUp(bodies: string | undefined): void {
  try {
    measureText('0', { sizePx: 10, weight: 'regular' });
    measureText('0', { sizePx: 10, weight: 'semibold' });
    loadBasemap('110m');
    if (bodies?.split(',').includes('solar')) prepareSolarCaptions();
  } catch {
    // The task will meet it again, and say so.
  }
}

// A worker renders one picture at a time: no operation cache to hold old images, one libvips thread.
sharp.cache(false);
sharp.concurrency(1);
const LOCAL_EXTENSIONS: Record<LocalFormat, string> = { table: 'txt', markdown: 'md', csv: 'csv', ics: 'ics', json: 'json' };

type Write = (relative: string, role: FileRole, data: Uint8Array | string) => Promise<void>;

export async function renderEclipse(input: TaskInput): Promise<TaskResult> {
  const started = performance.now();
  const { eclipse, style, outDir } = input;
  const stem = fileStem(style.naming, eclipse);
  const written: WrittenFile[] = [];
  const write: Write = async (relative, role, data) => {
    // Each file once: two outputs of one name would overwrite each other and never settle.
    if (written.some((w) => w.path === relative)) throw new Error(`two outputs named ${JSON.stringify(relative)}`);
    const bytes = typeof data === 'string' ? Buffer.from(data) : data;
    await writeFileAtomic(pathInside(outDir, relative), bytes);
    written.push({ path: relative, role, bytes: bytes.byteLength, sha256: sha256(bytes) });
  };
  if (eclipse.body === 'solar') await renderSolar({ ...input, eclipse }, stem, write);
  else await renderLunar({ ...input, eclipse }, stem, write);
  return { files: written, seconds: (performance.now() - started) / 1000 };
}

/** A solar eclipse: its maps and thumbnail, caption and alt text, the geometry as GeoJSON, the places' local tables; every one with the caution. */
async function renderSolar(input: TaskInput & { eclipse: SolarEclipse }, stem: string, write: Write): Promise<void> {
  const { eclipse, style, generator } = input;
  // The style's language (its `lang`): the maps, caption and local tables all speak it.
  const settings = mapSettings(mapChoicesOf(style));
  const { solar } = settings;
  const clock = civilClock(style.tz, 'zone', solar.common.clock);
  // The style's pictures, each drawn with the caution in its header band; the geometry as GeoJSON always.
  // One scene for every picture format (and the thumbnail's PNG when the style writes none); files written as they are made.
  const pictures = style.formats.filter((f) => f !== 'geojson');
  if (pictures.length > 0) {
    const files = await renderSolarMapFiles({ eclipse, ...settings, generator }, pictures.includes('png') ? pictures : [...pictures, 'png']);
    for (const format of pictures) {
      await write(`${stem}.${format}`, 'map', files.get(format)!);
      if (format !== 'png') files.delete(format);
    }
    await write(`thumbs/${stem}.png`, 'thumbnail', await sharp(files.get('png')!).resize({ width: THUMBNAIL_WIDTH_PX }).png().toBuffer());
  }
  await write(`${stem}.txt`, 'caption', solarCaptionText(solarCaption(eclipse, { clock, solar }), solar.text));
  await write(`${stem}.geojson`, 'map', `${JSON.stringify(solarGeoJson(eclipse, { solar }))}\n`);
  const slugs = stylePlaces(style.places).map((p) => p.slug);
  const seeing: { stem: string; place: SolarDiagramRequest['place']; clock: SolarDiagramRequest['clock'] }[] = [];
  for (const [i, name] of style.places.entries()) {
    const report = solarLocalReport(eclipse, choosePlace({ place: name }, true, 'places'), solar);
    for (const format of style.localFormats) {
      const text = { table: solarLocalTable, markdown: solarLocalMarkdown, csv: solarLocalCsv, json: solarLocalJson, ics: (r: typeof report) => solarLocalIcs(r, generator) }[format](report);
      await write(`${stem}-${slugs[i]!}.${LOCAL_EXTENSIONS[format]}`, 'local', text);
    }
    const { place, clock } = report;
    if (report.local.kind !== 'none') seeing.push({ stem: `${stem}-${slugs[i]!}`, place: { name: place.name, latDeg: place.latDeg, lonDeg: place.lonDeg, parameter: 'places' }, clock });
  }
  const formats = diagramFormatsOf(style);
  if (formats.length === 0) return;
  // A place that sees nothing of it has no view to draw; with no such place, the view from the greatest point, in its own zone's time.
  if (seeing.length === 0) {
    const [lonDeg, latDeg] = eclipse.greatestPoint;
    const chosen = choosePlace({ at: [lonDeg, latDeg] }, true, 'place');
    seeing.push({ stem, place: { name: solarGreatestPointName(chosen.place.name, solar), latDeg, lonDeg, parameter: 'place' }, clock: civilClock(chosen.clock.zone, 'zone', solar.common.clock) });
  }
  const { size, dpi } = diagramPage(style);
  for (const view of seeing) {
    await writeDiagram(`${view.stem}-diagram`, formats, write, (format) =>
      renderSolarDiagramFile({ eclipse, place: view.place, clock: view.clock, theme: THEMES[style.theme], size, dpi, format, generator, solar }));
  }
}

/** The diagram's page: the style's size or preset, as for `umbracast diagram`, else that command's own size. */
const diagramPage = (style: HouseStyle) => pageSize(mapChoicesOf(style), DIAGRAM_SIZE);

/** A diagram in each format asked, and its caption beside it (the same for every format). */
async function writeDiagram(name: string, formats: readonly DiagramFormat[], write: Write, render: (format: DiagramFormat) => Promise<{ bytes: Uint8Array; caption: string }>): Promise<void> {
  let caption = '';
  for (const format of formats) {
    const file = await render(format);
    await write(`${name}.${format}`, 'diagram', file.bytes);
    caption = file.caption;
  }
  await write(`${name}.txt`, 'caption', caption);
}

async function renderLunar(input: TaskInput & { eclipse: LunarEclipse }, stem: string, write: Write): Promise<void> {
  const { eclipse, style, generator } = input;
  const settings = mapSettings(mapChoicesOf(style));

  const { files, caption, thumbnail } = await renderMapFiles({ eclipse, ...settings, generator }, style.formats, THUMBNAIL_WIDTH_PX);
  for (const format of style.formats) await write(`${stem}.${format}`, 'map', files.get(format)!);
  await write(`${stem}.txt`, 'caption', captionText(caption, settings.words));
  await write(`thumbs/${stem}.png`, 'thumbnail', thumbnail!);
  const diagramFormats = diagramFormatsOf(style);
  if (diagramFormats.length > 0) {
    // Times in the style's zone, as on its maps.
    const { size, dpi } = diagramPage(style);
    const clock = civilClock(style.tz, 'zone', settings.words.common.clock);
    await writeDiagram(`${stem}-diagram`, diagramFormats, write, (format) => renderDiagramFile({ eclipse, clock, theme: THEMES[style.theme], size, dpi, format, generator, lunar: settings.words }));
  }

  const slugs = stylePlaces(style.places).map((p) => p.slug);
  for (const [i, name] of style.places.entries()) {
    const chosen = choosePlace({ place: name }, true, 'places');
    const report = localReport(eclipse, chosen, settings.words);
    const slug = slugs[i]!;
    for (const format of style.localFormats) {
      const text = { table: localTable, markdown: localMarkdown, csv: localCsv, json: localJson, ics: (r: typeof report) => localIcs(r, generator) }[format](report);
      await write(`${stem}-${slug}.${LOCAL_EXTENSIONS[format]}`, 'local', text);
    }
    if (style.sky) {
      // A print style's figure is as wide as its map (same millimetres and density); otherwise SKY_FIGURE_PX (1600x900).
      const skySize = style.preset === 'print' ? { widthPx: settings.size.widthPx, heightPx: Math.round((settings.size.widthPx * 9) / 16) } : SKY_FIGURE_PX;
      const sky = await renderSkyFile({ report, theme: THEMES[style.theme], size: skySize, dpi: settings.dpi, format: 'png', generator });
      await write(`${stem}-${slug}-sky.png`, 'sky', sky.bytes);
      await write(`${stem}-${slug}-sky.txt`, 'caption', sky.caption);
    }
  }
}

export default renderEclipse;
