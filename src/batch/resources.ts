/**
 * How many worker processes a batch runs: no more than asked, no more than
 * the cores (each worker is a lane of about one core), and no more than
 * the memory available holds at the per-worker need of the style's largest
 * picture.
 *
 * The need was measured (peak RSS of a one-worker batch, rendering one
 * eclipse, resvg drawing; see README "Limits"): about 230 MiB for a
 * 12000×5333 map as SVG only, 729 MiB in one raster format and about
 * 1060 MiB in two to four (which share one drawing held as raw pixels; resvg
 * holds its canvas and the finished picture at once). A batch with solar
 * eclipses, measured the same way on the longest-path eclipse of 2026–2035
 * (2030-06-01): 787 MiB for 12000×5333 as SVG only (its thumbnail is drawn
 * from a full-size PNG all the same), 783 MiB as PNG, 1065 MiB as PNG, WebP
 * and JPEG from one drawing; 337 MiB for the decade's 22 solar eclipses
 * at 2400×1350, PNG + SVG. The estimate below lies at or above every
 * measurement.
 */
import { availableParallelism, freemem, totalmem } from 'node:os';

const MIB = 1024 * 1024;
/** The view-from-here figure a batch draws per place. */
export const SKY_FIGURE_PX = { widthPx: 1600, heightPx: 900 } as const;
/** A worker's own size: Node, the world basemap, the font, the gazetteer when places are named. */
export const WORKER_BASE_BYTES = 210 * MIB;

/**
 * What a worker holds on top of that when its batch has solar eclipses: the
 * solar captions' land lattice and large cities, a caption's 1:50m country
 * outlines while it is written (read for it, about 13 MB of heap), the
 * obscuration field and the GeoJSON's tracing grids. Kept at its first
 * measurement although a worker now holds less (the 12000×5333 PNG case
 * above: a worker's peak PSS 770 → 696 MB once the outlines were read per
 * caption, the path traced without a million-place grid and each drawing
 * freed as it is encoded): an estimate errs high.
 */
export const SOLAR_EXTRA_BYTES = 130 * MIB;

export interface PictureLoad {
  /** Pixels of the largest picture a worker draws (the map, a view-from-here figure, or a diagram). */
  readonly pixels: number;
  /** How many raster formats (png, webp, jpg) that picture is written in from one drawing (a diagram draws each format anew: at most 1; a solar map's thumbnail is drawn from a PNG even when no raster format is written). */
  readonly rasterFormats: number;
  /** Whether the batch holds solar eclipses. */
  readonly solar?: boolean;
}

/**
 * Bytes a worker needs at its peak: its base (more with solar eclipses), 4
 * bytes a pixel for the scene (its vector detail grows with the size), 5 more
 * for drawing a raster format (resvg's canvas and the picture it hands over),
 * and 6 more when several raster formats share one drawing held as raw pixels.
 */
export function workerNeedBytes(load: PictureLoad): number {
  const perPixel = 4 + (load.rasterFormats >= 1 ? 5 : 0) + (load.rasterFormats >= 2 ? 6 : 0);
  return WORKER_BASE_BYTES + (load.solar ? SOLAR_EXTRA_BYTES : 0) + load.pixels * perPixel;
}

/** Of two pictures a worker draws one after the other, the one that needs more memory. */
export function largerLoad(a: PictureLoad, b: PictureLoad): PictureLoad {
  return workerNeedBytes(b) > workerNeedBytes(a) ? b : a;
}

/** Memory this process may still use: what the system has free, within a container's limit if there is one. */
export function availableMemoryBytes(): number {
  const free = freemem();
  const limit = typeof process.constrainedMemory === 'function' ? process.constrainedMemory() : 0;
  if (limit && limit > 0 && limit < totalmem()) return Math.max(0, Math.min(free, limit - process.memoryUsage().rss));
  return free;
}

export interface WorkerBudget {
  readonly requested: number;
  readonly cores: number;
  readonly availableBytes: number;
  readonly needBytes: number;
}

/** min(requested, cores, ⌊available / need⌋), and at least one; with what limited it. */
export function workerCount(budget: WorkerBudget): { workers: number; limitedBy: 'cores' | 'memory' | undefined } {
  const byMemory = Math.max(1, Math.floor(budget.availableBytes / budget.needBytes));
  const workers = Math.max(1, Math.min(budget.requested, budget.cores, byMemory));
  if (workers === budget.requested) return { workers, limitedBy: undefined };
  return { workers, limitedBy: byMemory < budget.cores ? 'memory' : 'cores' };
}

/** The machine's side of the budget. */
export function machineBudget(requested: number, load: PictureLoad): WorkerBudget {
  return { requested, cores: availableParallelism(), availableBytes: availableMemoryBytes(), needBytes: workerNeedBytes(load) };
}

/** The one-line note printed when the count is capped. */
export function capNote(budget: WorkerBudget, workers: number, limitedBy: 'cores' | 'memory', load: PictureLoad): string {
  const gb = (bytes: number) => `${(bytes / 1024 ** 3).toFixed(1)} GB`;
  const mb = (bytes: number) => `${Math.round(bytes / MIB)} MB`;
  const why = limitedBy === 'cores'
    ? `${budget.cores} core${budget.cores === 1 ? '' : 's'}`
    : `${gb(budget.availableBytes)} of memory available, about ${mb(budget.needBytes)} per worker for ${(load.pixels / 1e6).toFixed(1)}-megapixel pictures`;
  return `running ${workers} worker process${workers === 1 ? '' : 'es'}, not ${budget.requested} (${why})`;
}
