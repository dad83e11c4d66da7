/**
 * Writing files so that nothing half-written is ever left: write beside the
 * target under a temporary name, then rename over it (atomic on one file
 * system). A failed write removes its temporary file.
 */
import { existsSync, statSync } from 'node:fs';
import { rename, unlink, writeFile } from 'node:fs/promises';
import { basename, dirname, join } from 'node:path';
import { InputError } from '../errors.ts';

export function temporaryNameFor(path: string): string {
  return join(dirname(path), `.${basename(path)}.partial-${process.pid}`);
}

export async function writeFileAtomic(path: string, data: string | Uint8Array): Promise<void> {
  const temporary = temporaryNameFor(path);
  try {
    await writeFile(temporary, data);
    await rename(temporary, path);
  } catch (error) {
    await unlink(temporary).catch(() => undefined);
    throw error;
  }
}

/** The folder of an output path must exist and be a folder: a usage error otherwise. */
export function checkOutputFolder(option: string, path: string): void {
  const folder = dirname(path);
  if (!existsSync(folder) || !statSync(folder).isDirectory()) {
    throw new InputError(option, 'a file path in an existing folder', path);
  }
  if (existsSync(path) && statSync(path).isDirectory()) throw new InputError(option, 'a file path, not a folder', path);
}
