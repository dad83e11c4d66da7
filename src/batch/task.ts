/**
 * One eclipse of a batch, in a worker process: every file the house style
 * asks for, each written atomically (into folders runBatch has made); returns
 * what it wrote, with sizes and hashes.
 */
import sharp from 'sharp';
import { THEMES } from '../figures/theme.ts';
import { pathInside, writeFileAtomic } from '../outputs/files.ts';
import { localCsv, localIcs, localJson, localMarkdown, localReport, localTable, type LocalFormat } from '../outputs/localFormats.ts';
import { captionText } from '../outputs/caption.ts';
import { renderMapFiles } from '../outputs/mapFile.ts';
import { renderSkyFile } from '../outputs/skyFile.ts';
import { choosePlace } from '../settings/choose.ts';
import { mapSettings } from '../settings/mapSettings.ts';
import { mapChoicesOf } from './styleSettings.ts';
import { fileStem, stylePlaces } from './naming.ts';
import { SKY_FIGURE_PX } from './resources.ts';
import { sha256, type FileRole, type TaskInput, type WrittenFile, type TaskResult } from './written.ts';

export const THUMBNAIL_WIDTH_PX = 480;

// A worker renders one picture at a time: no operation cache to hold old images, one libvips thread.
sharp.cache(false);
sharp.concurrency(1);
const LOCAL_EXTENSIONS: Record<LocalFormat, string> = { table: 'txt', markdown: 'md', csv: 'csv', ics: 'ics', json: 'json' };

export async function renderEclipse(input: TaskInput): Promise<TaskResult> {
  const started = performance.now();
  const { eclipse, style, outDir, generator } = input;
  const stem = fileStem(style.naming, eclipse);
  const settings = mapSettings(mapChoicesOf(style));
  const written: WrittenFile[] = [];
  const write = async (relative: string, role: FileRole, data: Uint8Array | string) => {
    // Each file once: two outputs of one name would overwrite each other and never settle.
    if (written.some((w) => w.path === relative)) throw new Error(`two outputs named ${JSON.stringify(relative)}`);
    const bytes = typeof data === 'string' ? Buffer.from(data) : data;
    await writeFileAtomic(pathInside(outDir, relative), bytes);
    written.push({ path: relative, role, bytes: bytes.byteLength, sha256: sha256(bytes) });
  };

  const { files, caption, thumbnail } = await renderMapFiles({ eclipse, ...settings, generator }, style.formats, THUMBNAIL_WIDTH_PX);
  for (const format of style.formats) await write(`${stem}.${format}`, 'map', files.get(format)!);
  await write(`${stem}.txt`, 'caption', captionText(caption, settings.words));
  await write(`thumbs/${stem}.png`, 'thumbnail', thumbnail!);

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
  return { files: written, seconds: (performance.now() - started) / 1000 };
}

export default renderEclipse;
