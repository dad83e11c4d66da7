/**
 * Writing files so that nothing half-written is ever left: write beside the
 * target under a temporary name, then rename over it (atomic on one file
 * system). A failed write removes its temporary file.
 */
import { existsSync, realpathSync, statSync } from 'node:fs';
import { rename, unlink, writeFile } from 'node:fs/promises';
import { basename, dirname, isAbsolute, join, relative, resolve, sep } from 'node:path';
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

/**
 * A path for `relativePath` inside `root` that stays inside it: no absolute
 * paths, no "..", and no symbolic link on the way that leads out of `root`.
 * Throws a plain Error (a failure of the eclipse being written, not a usage error).
 */
export function pathInside(root: string, relativePath: string): string {
  if (isAbsolute(relativePath) || relativePath.split(/[\\/]/).includes('..')) {
    throw new Error(`refusing to write ${JSON.stringify(relativePath)}: outside the output folder`);
  }
  const target = resolve(root, relativePath);
  const realRoot = realpathSync(root);
  const realParent = realpathSync(dirname(target));
  const inside = relative(realRoot, realParent);
  if (inside === '..' || inside.startsWith(`..${sep}`) || isAbsolute(inside)) {
    throw new Error(`refusing to write ${JSON.stringify(relativePath)}: a link leads out of the output folder`);
  }
  return join(realParent, basename(target));
}
