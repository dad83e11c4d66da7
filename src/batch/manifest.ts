/**
 * The batch manifest, `umbracast.manifest/2`: what is in an output folder —
 * per eclipse its body (lunar or solar), its catalogue record, the key of the inputs it was made from,
 * and every file with its size and SHA-256 — plus the style's hash and the
 * tool's version. Written atomically after every finished eclipse. A
 * `umbracast.manifest/1` manifest (lunar eclipses only, no `body`) is still
 * read, its entries taken as lunar, and rewritten as /2.
 *
 * A manifest is read as untrusted data: from a regular file only (not
 * through a link), at most MAX_MANIFEST_BYTES, and checked field by field
 * before anything it names is opened. Its paths are plain relative names
 * inside the folder; the files they name are opened without following
 * links, only if regular, and hashed in bounded chunks.
 */
import { closeSync, readSync } from 'node:fs';
import { createHash } from 'node:crypto';
import { join } from 'node:path';
import { z } from 'zod';
import { InputError } from '../errors.ts';
import { CONTACT_ORDER } from '../eclipses/lunar/contacts.ts';
import { ECLIPSE_KINDS } from '../eclipses/lunar/types.ts';
import { SOLAR_CONTACT_ORDER, SOLAR_ECLIPSE_KINDS } from '../eclipses/solar/types.ts';
import type { SolarEclipseRecord } from '../eclipses/solar/record.ts';
import { isPlainRelativePath, openRegularInside, readRegularFile, ReadRefused, writeFileAtomic } from '../outputs/files.ts';
import type { EclipseRecord } from '../outputs/catalogueRecord.ts';
import { printable } from './printable.ts';
import { FILE_ROLES, type FileRole, type WrittenFile } from './written.ts';

export const MANIFEST_SCHEMA = 'umbracast.manifest/2';
/** The schema before solar eclipses: read, never written. */
export const MANIFEST_SCHEMA_V1 = 'umbracast.manifest/1';
export const MANIFEST_NAME = 'manifest.json';
/** Every eclipse of years 1000–3000 (4854) with room to spare. */
export const MAX_MANIFEST_ECLIPSES = 5000;
/** A manifest of MAX_MANIFEST_ECLIPSES eclipses with 20 places in 5 formats stays well under this. */
export const MAX_MANIFEST_BYTES = 64 * 1024 * 1024;
/** No file of ours is larger: a 64-megapixel image, uncompressed, is 256 MB. */
export const MAX_OUTPUT_FILE_BYTES = 1024 * 1024 * 1024;
/**
 * The most files one eclipse writes: 5 map formats, caption, thumbnail, a diagram in 4 formats with its
 * caption; 20 places × (5 local formats, a sky figure and its caption, a diagram in 4 formats and its caption).
 */
export const MAX_FILES_PER_ECLIPSE = 5 + 2 + (4 + 1) + 20 * (5 + 2 + 4 + 1);

/** A lunar record (umbracast.catalogue/1's) or a solar one (with `body: 'solar'`). */
export type BatchRecord = EclipseRecord | SolarEclipseRecord;

interface EntryCommon {
  id: string;
  kind: string;
  /** Hash of everything the files were made from: record, style, tool version. */
  key: string;
  files: WrittenFile[];
}

/** `body` is written for every entry; a lunar entry made by hand or by an older version may lack it. */
export type ManifestEntry = (EntryCommon & { body?: 'lunar'; record: EclipseRecord }) | (EntryCommon & { body: 'solar'; record: SolarEclipseRecord });

export interface Manifest {
  schema: typeof MANIFEST_SCHEMA;
  tool: string;
  styleHash: string;
  style: Record<string, unknown>;
  range: { from: string; to: string };
  shard: string | null;
  eclipses: ManifestEntry[];
}

const text = z.string().max(200);
const isoSeconds = z.string().regex(/^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}:\d{2}Z$/, 'an ISO 8601 UTC time with seconds');
const isoMillis = z.string().regex(/^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}:\d{2}(\.\d{3})?Z$/, 'an ISO 8601 UTC time');
const finite = z.number();
const lonLat = z.tuple([finite.min(-180).max(180), finite.min(-90).max(90)]);
const contactNames = CONTACT_ORDER as readonly string[];

/** The lunar catalogue record (umbracast.catalogue/2; /1 had no `body`) as the contact sheet and the csv read it. */
const recordSchema = z
  .object({
    body: z.literal('lunar').optional(),
    id: z.string().regex(/^\d{4}-\d{2}-\d{2}$/, 'an eclipse id YYYY-MM-DD'),
    kind: z.enum(ECLIPSE_KINDS as [string, ...string[]]),
    greatest: isoSeconds,
    greatestTT: isoSeconds,
    deltaT: finite,
    deltaTSource: z.enum(['observed', 'historical', 'forecast', 'long-term', 'user']),
    gamma: finite,
    umbralMagnitude: finite,
    penumbralMagnitude: finite,
    saros: z.number().int().min(-1000).max(1000),
    contacts: z.record(z.string(), isoSeconds).refine((c) => Object.keys(c).every((k) => contactNames.includes(k)), 'contacts named P1, U1, U2, U3, U4, P4'),
    durations: z.object({ penumbral: finite.nonnegative(), partial: finite.nonnegative().optional(), total: finite.nonnegative().optional() }).strict(),
    subLunar: z.record(z.string(), lonLat).refine((s) => 'greatest' in s && Object.keys(s).every((k) => k === 'greatest' || contactNames.includes(k)), 'sub-lunar points at greatest and the contacts'),
    // Figures as people read them, rounded once (absent from manifests written before they were recorded).
    printed: z
      .object({
        greatestUtc: z.string().regex(/^\d{4}-\d{2}-\d{2} \d{2}:\d{2}$/, 'a UTC minute "YYYY-MM-DD HH:MM"'),
        umbralMagnitude: z.string().regex(/^-?\d+\.\d{3}$/),
        penumbralMagnitude: z.string().regex(/^-?\d+\.\d{3}$/),
        gamma: z.string().regex(/^-?\d+\.\d{4}$/),
        minutes: z.object({ penumbral: z.number().int().nonnegative(), partial: z.number().int().nonnegative().optional(), total: z.number().int().nonnegative().optional() }).strict(),
      })
      .strict()
      .optional(),
  })
  .strict();

const solarContactNames = SOLAR_CONTACT_ORDER as readonly string[];

/** The solar record (src/eclipses/solar/record.ts) as the contact sheet reads it. */
const solarRecordSchema = z
  .object({
    body: z.literal('solar'),
    id: z.string().regex(/^\d{4}-\d{2}-\d{2}$/, 'an eclipse id YYYY-MM-DD'),
    kind: z.enum(SOLAR_ECLIPSE_KINDS as [string, ...string[]]),
    central: z.boolean(),
    greatest: isoSeconds,
    greatestTT: isoSeconds,
    deltaT: finite,
    deltaTSource: z.enum(['observed', 'historical', 'forecast', 'long-term', 'user']),
    gamma: finite,
    magnitude: finite,
    saros: z.number().int().min(-1000).max(1000),
    greatestPoint: lonLat,
    sunAltitude: finite.min(-90).max(90),
    pathWidthKm: finite.nonnegative().optional(),
    contacts: z.record(z.string(), isoSeconds).refine((c) => Object.keys(c).every((k) => solarContactNames.includes(k)), 'contacts named P1, U1, U2, U3, U4, P4'),
    durations: z.object({ partial: finite.nonnegative(), central: finite.nonnegative().optional() }).strict(),
    moonRadius: z.object({ penumbra: finite.positive(), umbra: finite.positive() }).strict(),
  })
  .strict();

const fileSchema = z
  .object({
    path: z.string().max(300).refine(isPlainRelativePath, 'a plain relative path inside the folder (letters, digits, . _ -; at most one folder; no "..", no leading dot)'),
    // `diagram` came after the first /2 manifests: an added value, so every manifest written before reads as it did.
    role: z.enum(FILE_ROLES as [FileRole, ...FileRole[]]),
    bytes: z.number().int().nonnegative().max(MAX_OUTPUT_FILE_BYTES),
    sha256: z.string().regex(/^[0-9a-f]{64}$/),
  })
  .strict();

const entryFields = { id: z.string(), kind: z.string(), key: z.string().regex(/^[0-9a-f]{32}$/), files: z.array(fileSchema).max(MAX_FILES_PER_ECLIPSE) };
// A /1 entry has no body: it is lunar. The body picks the record's schema, so that an error names the field at fault.
const entrySchema = z
  .preprocess(
    (entry) => (entry && typeof entry === 'object' && !Array.isArray(entry) && !('body' in entry) ? { ...entry, body: 'lunar' } : entry),
    z.discriminatedUnion('body', [
      z.object({ ...entryFields, body: z.literal('lunar'), record: recordSchema }).strict(),
      z.object({ ...entryFields, body: z.literal('solar'), record: solarRecordSchema }).strict(),
    ]),
  )
  .refine((e) => e.id === e.record.id && e.kind === e.record.kind, 'an entry whose id and kind are its record\'s')
  .refine((e) => new Set(e.files.map((f) => f.path)).size === e.files.length, 'an entry that lists each file once');

const manifestSchema = z
  .object({
    // A /1 manifest is read as /2: its entries are lunar.
    schema: z.union([z.literal(MANIFEST_SCHEMA), z.literal(MANIFEST_SCHEMA_V1)]).transform(() => MANIFEST_SCHEMA),
    tool: text,
    styleHash: z.string().regex(/^[0-9a-f]{16}$/),
    style: z.record(z.string(), z.unknown()),
    range: z.object({ from: isoMillis, to: isoMillis }).strict(),
    shard: z.string().regex(/^\d{1,4}\/\d{1,4}$/).nullable(),
    eclipses: z.array(entrySchema).max(MAX_MANIFEST_ECLIPSES),
  })
  .strict()
  .refine((m) => new Set(m.eclipses.map((e) => e.id)).size === m.eclipses.length, { message: 'each eclipse listed once', path: ['eclipses'] })
  .refine((m) => {
    const paths = m.eclipses.flatMap((e) => e.files.map((f) => f.path));
    return new Set(paths).size === paths.length;
  }, { message: 'each file listed by one eclipse only', path: ['eclipses'] });

export function manifestNameFor(shard: string | null): string {
  return shard ? `manifest.shard-${shard.replace('/', '-of-')}.json` : MANIFEST_NAME;
}

const REFUSALS: Record<ReadRefused['reason'], string> = {
  missing: 'is missing',
  link: 'is a symbolic link (not followed)',
  'not a regular file': 'is not a regular file',
  'too large': `is larger than ${MAX_MANIFEST_BYTES / 1024 / 1024} MiB`,
  unreadable: 'cannot be read',
};

/** Check parsed manifest data. */
export function parseManifest(data: unknown, path: string): { manifest: Manifest | undefined; problem?: string } {
  const parsed = manifestSchema.safeParse(data);
  if (!parsed.success) {
    const issue = parsed.error.issues[0]!;
    return { manifest: undefined, problem: printable(`${path}: ${issue.path.join('.') || '(top level)'}: ${issue.message}`) };
  }
  return { manifest: parsed.data as unknown as Manifest };
}

/** Read a manifest; a missing one is empty; a corrupt, oversized or odd one is reported, and the batch can rebuild it. */
export function readManifest(path: string): { manifest: Manifest | undefined; problem?: string } {
  let bytes: Buffer;
  try {
    bytes = readRegularFile(path, MAX_MANIFEST_BYTES, { followLinks: false });
  } catch (error) {
    if (!(error instanceof ReadRefused)) throw error;
    if (error.reason === 'missing') return { manifest: undefined };
    return { manifest: undefined, problem: printable(error.reason === 'not a regular file' ? error.detail : `${path} ${REFUSALS[error.reason]}`) };
  }
  let data: unknown;
  try {
    data = JSON.parse(bytes.toString('utf8'));
  } catch {
    return { manifest: undefined, problem: printable(`${path} is not valid JSON (truncated or corrupt)`) };
  }
  return parseManifest(data, path);
}

/** Strict read for merging: a corrupt manifest is a usage error there. */
export function readManifestOrFail(path: string): Manifest {
  const { manifest, problem } = readManifest(path);
  if (problem) throw new InputError('manifests', 'readable umbracast manifests', problem, true);
  if (!manifest) throw new InputError('manifests', 'a folder or manifest file that exists', printable(path), true);
  return manifest;
}

export function manifestText(manifest: Manifest): string {
  const sorted = { ...manifest, eclipses: [...manifest.eclipses].sort((a, b) => a.id.localeCompare(b.id)) };
  return `${JSON.stringify(sorted, null, 2)}\n`;
}

export async function writeManifest(dir: string, manifest: Manifest): Promise<void> {
  await writeFileAtomic(join(dir, manifestNameFor(manifest.shard)), manifestText(manifest));
}

/** Is this file on disk as described: a regular file inside `dir`, reached without links, of that size and hash? */
export function fileIntact(dir: string, file: WrittenFile): boolean {
  const opened = openRegularInside(dir, file.path);
  if (!opened) return false;
  try {
    if (opened.size !== file.bytes) return false;
    const hash = createHash('sha256');
    const chunk = Buffer.alloc(1 << 20);
    let total = 0;
    for (;;) {
      const n = readSync(opened.fd, chunk, 0, chunk.length, null);
      if (n === 0) break;
      total += n;
      if (total > file.bytes) return false;
      hash.update(chunk.subarray(0, n));
    }
    return total === file.bytes && hash.digest('hex') === file.sha256;
  } catch {
    return false;
  } finally {
    closeSync(opened.fd);
  }
}

/** Are an entry's files all on disk as described (size, then hash)? */
export function filesIntact(dir: string, entry: ManifestEntry): boolean {
  return entry.files.every((f) => fileIntact(dir, f));
}
