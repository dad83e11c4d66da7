/**
 * The batch manifest, `umbracast.manifest/1`: what is in an output folder —
 * per eclipse its catalogue record, the key of the inputs it was made from,
 * and every file with its size and SHA-256 — plus the style's hash and the
 * tool's version. Written atomically after every finished eclipse.
 */
import { existsSync, readFileSync, statSync } from 'node:fs';
import { join } from 'node:path';
import { z } from 'zod';
import { InputError } from '../errors.ts';
import { writeFileAtomic } from '../outputs/files.ts';
import type { EclipseRecord } from '../outputs/catalogueRecord.ts';
import { sha256, type WrittenFile } from './written.ts';

export const MANIFEST_SCHEMA = 'umbracast.manifest/1';
export const MANIFEST_NAME = 'manifest.json';

export interface ManifestEntry {
  id: string;
  kind: string;
  /** Hash of everything the files were made from: record, style, tool version. */
  key: string;
  record: EclipseRecord;
  files: WrittenFile[];
}

export interface Manifest {
  schema: typeof MANIFEST_SCHEMA;
  tool: string;
  styleHash: string;
  style: Record<string, unknown>;
  range: { from: string; to: string };
  shard: string | null;
  eclipses: ManifestEntry[];
}

const fileSchema = z.object({ path: z.string(), role: z.enum(['map', 'caption', 'thumbnail', 'local', 'sky']), bytes: z.number().int().nonnegative(), sha256: z.string().regex(/^[0-9a-f]{64}$/) });
const manifestSchema = z.object({
  schema: z.literal(MANIFEST_SCHEMA),
  tool: z.string(),
  styleHash: z.string(),
  style: z.record(z.string(), z.unknown()),
  range: z.object({ from: z.string(), to: z.string() }),
  shard: z.string().nullable(),
  eclipses: z.array(z.object({ id: z.string(), kind: z.string(), key: z.string(), record: z.record(z.string(), z.unknown()), files: z.array(fileSchema) })),
});

export function manifestNameFor(shard: string | null): string {
  return shard ? `manifest.shard-${shard.replace('/', '-of-')}.json` : MANIFEST_NAME;
}

/** Read a manifest; a missing one is empty; a corrupt one is reported, and the batch can rebuild it. */
export function readManifest(path: string): { manifest: Manifest | undefined; problem?: string } {
  if (!existsSync(path)) return { manifest: undefined };
  let data: unknown;
  try {
    data = JSON.parse(readFileSync(path, 'utf8'));
  } catch {
    return { manifest: undefined, problem: `${path} is not valid JSON (truncated or corrupt)` };
  }
  const parsed = manifestSchema.safeParse(data);
  if (!parsed.success) {
    const issue = parsed.error.issues[0]!;
    return { manifest: undefined, problem: `${path}: ${issue.path.join('.') || '(top level)'}: ${issue.message}` };
  }
  return { manifest: parsed.data as unknown as Manifest };
}

/** Strict read for merging: a corrupt manifest is a usage error there. */
export function readManifestOrFail(path: string): Manifest {
  const { manifest, problem } = readManifest(path);
  if (problem) throw new InputError('--merge', 'readable umbracast manifests', problem);
  if (!manifest) throw new InputError('--merge', 'a folder or manifest file that exists', path);
  return manifest;
}

export async function writeManifest(dir: string, manifest: Manifest): Promise<void> {
  const sorted = { ...manifest, eclipses: [...manifest.eclipses].sort((a, b) => a.id.localeCompare(b.id)) };
  await writeFileAtomic(join(dir, manifestNameFor(manifest.shard)), `${JSON.stringify(sorted, null, 2)}\n`);
}

/** Are an entry's files all on disk as described (size, then hash)? */
export function filesIntact(dir: string, entry: ManifestEntry): boolean {
  return entry.files.every((f) => {
    const path = join(dir, f.path);
    if (!existsSync(path) || statSync(path).size !== f.bytes) return false;
    return sha256(readFileSync(path)) === f.sha256;
  });
}
