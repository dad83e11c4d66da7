/** `umbracast batch`: a range of eclipses in a house style, in parallel, resumable; or --merge shard manifests. */
import { existsSync, readdirSync, statSync } from 'node:fs';
import { availableParallelism } from 'node:os';
import { dirname, join, resolve } from 'node:path';
import cliProgress from 'cli-progress';
import type { Command } from 'commander';
import { describeReceived, InputError } from '../../errors.ts';
import { BODY_CHOICES, ECLIPSE_BODIES, type EclipseBody } from '../../eclipses/kinds.ts';
import { MANIFEST_NAME, readManifestOrFail } from '../../batch/manifest.ts';
import { kindsOfBodies, KINDS_OF_BODY, MAX_MERGE_MANIFESTS, mergeManifests, runBatch, type ProgressEvent, type Shard } from '../../batch/run.ts';
import { DIAGRAM_SUFFIX_BYTES, longestStemBytes, placeSuffixBytes, SamePlace, stylePlaces } from '../../batch/naming.ts';
import { printable } from '../../batch/printable.ts';
import { MAX_FILE_NAME_BYTES } from '../../outputs/files.ts';
import { DEFAULT_STYLE, loadStyle, type HouseStyle } from '../../batch/style.ts';
import { choosePlace } from '../../settings/choose.ts';
import { mapSettings } from '../../settings/mapSettings.ts';
import { mapChoicesOf, STYLE_FIELDS } from '../../batch/styleSettings.ts';
import { asFlags } from '../flags.ts';
import type { CommandContext } from '../context.ts';
import { parseNumber, parseRange } from '../options.ts';
import { kindsFromFlags, type BodyFlags } from '../readFlags.ts';
import { toolVersion } from '../version.ts';
import { counted } from '../../outputs/counted.ts';

interface BatchCommandOptions extends BodyFlags {
  from?: string;
  to?: string;
  kind?: string;
  body?: string;
  style?: string;
  out: string;
  jobs?: string;
  force?: boolean;
  shard?: string;
  merge?: string[];
}

export function parseShard(text: string): Shard {
  const match = /^\s*(\d{1,4})\s*\/\s*(\d{1,4})\s*$/.exec(text);
  const index = Number(match?.[1]);
  const count = Number(match?.[2]);
  if (!match || count < 1 || index < 1 || index > count) throw new InputError('--shard', 'I/N with 1 ≤ I ≤ N ≤ 9999, e.g. 2/3', text);
  return { index, count };
}

export const MAX_JOBS = 64;

/** The bodies a batch takes: --body if given (all: both), else the style's `bodies`. */
export function bodiesFrom(text: string | undefined, style: HouseStyle): EclipseBody[] {
  if (text === undefined) return [...style.bodies];
  const body = text.trim().toLowerCase();
  if (!(BODY_CHOICES as readonly string[]).includes(body)) throw new InputError('--body', BODY_CHOICES.join(', '), text);
  return body === 'all' ? [...ECLIPSE_BODIES] : [body as EclipseBody];
}

export function registerBatch(program: Command, context: CommandContext): void {
  const command = program
    .command('batch')
    .description('render every eclipse of a range in a house style: maps, captions, local tables, a contact sheet; resumable')
    .option('--from <date>', 'start: YYYY, YYYY-MM or YYYY-MM-DD (default today, UTC)')
    .option('--to <date>', 'end: a bare year or month is included whole; a full date is exclusive (default: ten years on)')
    .option('--kind <kinds>', `only these kinds, comma-separated: lunar ${KINDS_OF_BODY.lunar.join(',')}; solar ${KINDS_OF_BODY.solar.join(',')}`)
    .option('--style <file>', 'house style, JSON or YAML (see README)')
    .option('--out <dir>', 'output folder (made if its parent exists)', 'out')
    .option('--jobs <n>', 'worker processes (default: the number of cores)')
    .option('--force', 'redo everything, even what is up to date')
    .option('--shard <I/N>', 'render only the I-th of N disjoint parts of the range')
    .option('--merge <dirs...>', 'combine the shard manifests found in these folders into --out/manifest.json');
  // --body is declared with the eclipse options once every command takes it; until then, here.
  if (!command.options.some((o) => o.long === '--body')) command.option('--body <body>', `which eclipses: ${BODY_CHOICES.join(', ')} (default: the style's bodies, both unless it says)`);
  command.action(async (options: BatchCommandOptions) => {
    try {
      await batchAction(options, context);
    } catch (error) {
      // What came from outside (paths, file names, style keys) is shown escaped, on one line.
      if (error instanceof InputError) {
        const flagged = asFlags(error);
        throw new InputError(printable(flagged.parameter), printable(flagged.expected), printable(flagged.received), true);
      }
      if (error instanceof Error && !(error instanceof BatchInterrupted)) throw new Error(printable(error.message));
      throw error;
    }
  });
}

async function batchAction(options: BatchCommandOptions, context: CommandContext): Promise<void> {
  const outDir = resolve(options.out);
  if (options.out.includes('\0') || !existsSync(dirname(outDir)) || (existsSync(outDir) && !statSync(outDir).isDirectory())) {
    throw new InputError('--out', 'a folder, or a new folder inside an existing one', options.out);
  }
  if (options.merge) {
    const manifests = options.merge.flatMap((dir) => {
      const folder = resolve(dir);
      if (!existsSync(folder)) throw new InputError('--merge', 'folders that exist', dir);
      if (!statSync(folder).isDirectory()) return [readManifestOrFail(folder)];
      const files = readdirSync(folder).filter((n) => /^manifest\.shard-\d{1,4}-of-\d{1,4}\.json$/.test(n)).sort();
      if (files.length > MAX_MERGE_MANIFESTS) throw new InputError('--merge', `at most ${MAX_MERGE_MANIFESTS} shard manifests`, `${files.length} in ${dir}`, true);
      return files.map((n) => readManifestOrFail(join(folder, n)));
    });
    const merged = await mergeManifests(outDir, manifests, `umbracast ${toolVersion()}`);
    context.stdout(`umbracast batch: merged ${counted(manifests.length, 'manifest')}, ${counted(merged.eclipses.length, 'eclipse')} → ${join(outDir, MANIFEST_NAME)}\n`);
    return;
  }
  const range = parseRange(options.from, options.to, context.now());
  const styled = options.style === undefined ? DEFAULT_STYLE : loadStyle(options.style);
  const style: HouseStyle = { ...styled, bodies: bodiesFrom(options.body, styled) };
  // Kinds are checked against the bodies taken: annular and hybrid are solar, penumbral lunar, total and partial both.
  const kinds = kindsFromFlags({ kind: options.kind }, style.bodies.length === 1 ? style.bodies[0]! : 'all');
  for (const notice of checkStyleSettings(style, options.style ?? 'the default style')) context.stderr(`${printable(notice)}\n`);
  const jobs = options.jobs === undefined ? availableParallelism() : parseNumber('--jobs', options.jobs, { min: 1, max: MAX_JOBS, unit: 'worker processes' });
  if (!Number.isInteger(jobs)) throw new InputError('--jobs', `a whole number of worker processes from 1 to ${MAX_JOBS}`, options.jobs);
  const shard = options.shard === undefined ? null : parseShard(options.shard);
  const progress = progressReporter(context);
  const controller = new AbortController();
  const onSignal = () => controller.abort();
  process.once('SIGINT', onSignal);
  process.once('SIGTERM', onSignal);
  try {
    const summary = await runBatch({ ...range, ...(kinds ? { kinds } : {}), style, outDir, jobs, force: options.force === true, shard, tool: `umbracast ${toolVersion()}`, signal: controller.signal, onProgress: progress.report });
    progress.stop();
    const size = `${(summary.bytes / 1e6).toFixed(1)} MB`;
    context.stdout(`umbracast batch: ${counted(summary.planned, 'eclipse')} — ${summary.rendered} rendered, ${summary.skipped} up to date, ${summary.failed.length} failed; ${counted(summary.files, 'file')}, ${size}, ${summary.seconds.toFixed(1)} s in all → ${outDir}\n`);
    if (summary.interrupted) throw new BatchInterrupted();
    if (summary.failed.length > 0) {
      throw new Error(`${summary.failed.length} eclipse(s) failed: ${summary.failed.map((f) => `${f.id} (${f.message})`).join('; ')}; rerun to finish them`);
    }
  } finally {
    progress.stop();
    process.off('SIGINT', onSignal);
    process.off('SIGTERM', onSignal);
  }
}

/**
 * Check a style as its maps will read it — sizes, views, zones, every place
 * named — before any worker starts, so that a bad value is one usage error
 * naming the style's field, not a failure repeated for every eclipse. Returns
 * the lines saying which place each name not matched as written was taken for.
 */
export function checkStyleSettings(style: HouseStyle, file: string): string[] {
  const notices: string[] = [];
  const named = (names: readonly string[], key: string) =>
    names.forEach((name, i) => {
      const notice = choosePlace({ place: name }, true, `${file}: ${key}[${i}]`).notice;
      if (notice) notices.push(notice);
    });
  named(style.marks, 'marks');
  named(style.places, 'places');
  try {
    mapSettings(mapChoicesOf(style));
  } catch (error) {
    if (!(error instanceof InputError)) throw error;
    // The style's field is named; other settings the text mentions read as the command line's flags.
    throw new InputError(`${file}: ${STYLE_FIELDS[error.parameter] ?? error.parameter}`, asFlags(error).expected, error.received, true);
  }
  // Each place gets file names of its own (two Springfields are told apart by country and region), short enough to write.
  let places: ReturnType<typeof stylePlaces>;
  try {
    places = stylePlaces(style.places);
  } catch (error) {
    if (!(error instanceof SamePlace)) throw error;
    throw new InputError(`${file}: places[${error.second}]`, 'places that are each listed once', `${describeReceived(style.places[error.second])} (the same place as places[${error.first}])`, true);
  }
  const diagram = style.diagram !== undefined;
  if (diagram && longestStemBytes(style.naming) + DIAGRAM_SUFFIX_BYTES > MAX_FILE_NAME_BYTES) {
    throw new InputError(`${file}: naming`, `a template whose diagram file names fit in ${MAX_FILE_NAME_BYTES} bytes once filled in (the longest ending is -diagram.webp)`, style.naming);
  }
  places.forEach(({ slug }, i) => {
    const longest = longestStemBytes(style.naming) + placeSuffixBytes(slug, diagram);
    if (longest > MAX_FILE_NAME_BYTES) {
      throw new InputError(`${file}: places[${i}]`, `a place whose file names fit in ${MAX_FILE_NAME_BYTES} bytes with the naming template`, `${describeReceived(style.places[i])} (${longest} bytes)`, true);
    }
  });
  return notices;
}

/** Interrupted by Ctrl-C or SIGTERM: what finished is on disk and in the manifest. */
export class BatchInterrupted extends Error {
  override readonly name = 'BatchInterrupted';
  constructor() {
    super('interrupted: finished eclipses are kept and listed in the manifest; rerun to finish the rest');
  }
}

/** A progress bar on a terminal; one plain line per eclipse otherwise. */
function progressReporter(context: CommandContext): { report: (event: ProgressEvent) => void; stop: () => void } {
  const tty = context.isTerminal?.() ?? false;
  let bar: cliProgress.SingleBar | undefined;
  let done = 0;
  let total = 0;
  return {
    report(event) {
      switch (event.type) {
        case 'planned':
          total = event.total;
          done = event.upToDate;
          if (tty) {
            bar = new cliProgress.SingleBar({ format: 'umbracast batch {bar} {value}/{total} eclipses | {current} | {eta_formatted} left', stream: process.stderr, hideCursor: true }, cliProgress.Presets.shades_classic);
            bar.start(total, done, { current: 'starting' });
          } else {
            context.stderr(`umbracast batch: ${counted(total, 'eclipse')}, ${event.upToDate} already up to date\n`);
          }
          break;
        case 'done':
        case 'failed':
          done++;
          if (bar) bar.update(done, { current: `${event.id} ${event.kind}` });
          else context.stderr(`umbracast batch: [${done}/${total}] ${event.id} ${event.kind} ${event.type === 'done' ? `done (${counted(event.files, 'file')} in ${event.seconds.toFixed(1)} s)` : `FAILED: ${printable(event.message)}`}\n`);
          break;
        case 'notice':
          if (!bar) context.stderr(`umbracast batch: ${printable(event.message)}\n`);
          break;
        default:
          break;
      }
    },
    stop() {
      bar?.stop();
      bar = undefined;
    },
  };
}
