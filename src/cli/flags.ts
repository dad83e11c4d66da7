/**
 * The one table from the library's parameter names to the command line's
 * flags: the library's InputError names `zone`, `outDir`, `marks`…; the CLI's
 * error line names `--tz`, `--out`, `--mark`. A name not in the table (a style
 * file's field, a flag already) is shown as it is.
 */
import type { InputError } from '../errors.ts';

export const FLAGS: Readonly<Record<string, string>> = {
  when: 'WHEN',
  from: '--from',
  to: '--to',
  kinds: '--kind',
  body: '--body',
  convention: '--convention',
  deltaT: '--delta-t',
  place: '--place',
  at: '--at',
  zone: '--tz',
  projection: '--projection',
  bbox: '--bbox',
  centre: '--centre',
  spanDeg: '--span',
  size: '--size',
  preset: '--preset',
  widthMm: '--width-mm',
  dpi: '--dpi',
  theme: '--theme',
  borders: '--borders',
  title: '--title',
  marks: '--mark',
  markClock: '--mark-clock',
  areaNames: '--area-names',
  lang: '--lang',
  inset: '--inset',
  style: '--style',
  outDir: '--out',
  jobs: '--jobs',
  shard: '--shard',
  manifests: '--merge',
};

export const flagOf = (parameter: string): string => (Object.hasOwn(FLAGS, parameter) ? FLAGS[parameter]! : parameter);

/** A library error as the command line says it: its flags in place of the library's parameter names. */
export const asFlags = (error: InputError): InputError => error.renamed(flagOf);
