/**
 * Writing files so that nothing half-written is ever left: write beside the
 * target under a temporary name, then rename over it (atomic on one file
 * system). A failed write removes its temporary file.
 *
 * The temporary file is created exclusively (O_CREAT|O_EXCL) and without
 * following a link (O_NOFOLLOW), under a name with a random part: nothing
 * planted beside the target can redirect the write.
 *
 * Reading what a user or a manifest points at is bounded the same way: the
 * file is opened first (O_NONBLOCK, so a FIFO cannot hang the open), the
 * open descriptor must be a regular file, and at most the limit is read.
 */
import { randomBytes } from 'node:crypto';
import { closeSync, constants, type Stats, existsSync, fstatSync, lstatSync, openSync, readSync, realpathSync, statSync } from 'node:fs';
import { open, rename, unlink } from 'node:fs/promises';
import { basename, dirname, isAbsolute, join, relative, resolve, sep } from 'node:path';
import { InputError } from '../errors.ts';

/** The longest file name most file systems take (ext4, APFS, NTFS: 255 bytes or units). */
export const MAX_FILE_NAME_BYTES = 255;
/** What a temporary name adds to its file's name at most: "." + ".partial-" + pid + "-" + 12 hex digits. */
export const TEMPORARY_SUFFIX_BYTES = 1 + '.partial-'.length + 10 + 1 + 12;

/** Temporary names: ".NAME.partial-PID-RANDOM" (older runs left ".NAME.partial-PID"). */
export const TEMPORARY_NAME = /^\..+\.partial-\d+(-[0-9a-f]+)?$/;

/** The first `maxBytes` bytes of a name, never cutting a character in two. */
function headBytes(name: string, maxBytes: number): string {
  let out = '';
  let bytes = 0;
  for (const char of name) {
    bytes += Buffer.byteLength(char);
    if (bytes > maxBytes) break;
    out += char;
  }
  return out;
}

/**
 * A fresh temporary name beside `path`. Unpredictable (48 random bits), and
 * never over 255 bytes: a long name is shortened in its temporary form only.
 */
export function temporaryNameFor(path: string): string {
  const suffix = `.partial-${process.pid}-${randomBytes(6).toString('hex')}`;
  return join(dirname(path), `.${headBytes(basename(path), MAX_FILE_NAME_BYTES - 1 - Buffer.byteLength(suffix))}${suffix}`);
}

const CREATE_EXCLUSIVE = constants.O_WRONLY | constants.O_CREAT | constants.O_EXCL | constants.O_NOFOLLOW;

export async function writeFileAtomic(path: string, data: string | Uint8Array): Promise<void> {
  const temporary = temporaryNameFor(path);
  let created = false;
  try {
    const handle = await open(temporary, CREATE_EXCLUSIVE, 0o644);
    created = true;
    try {
      await handle.writeFile(data);
    } finally {
      await handle.close();
    }
    await rename(temporary, path);
  } catch (error) {
    if (created) await unlink(temporary).catch(() => undefined);
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

/**
 * A path as a manifest may list it: relative, "/"-separated, at most one
 * folder deep, each part a plain name of letters, digits, ".", "_" and "-"
 * that does not start with a dot (so no "..", no hidden or temporary
 * files), at most 255 bytes. Nothing absolute, no "//host", no "\\", no URL.
 */
export function isPlainRelativePath(path: string): boolean {
  const parts = path.split('/');
  return parts.length <= 2 && parts.every((part) => /^[A-Za-z0-9_-][A-Za-z0-9._-]*$/.test(part) && part.length <= MAX_FILE_NAME_BYTES);
}

/** Why a bounded read was refused. */
export type ReadRefusal = 'missing' | 'link' | 'not a regular file' | 'too large' | 'unreadable';

export class ReadRefused extends Error {
  readonly reason: ReadRefusal;
  readonly detail: string;
  constructor(reason: ReadRefusal, detail: string) {
    super(`${reason}: ${detail}`);
    this.reason = reason;
    this.detail = detail;
  }
}

const KIND_WORDS: [(s: Stats) => boolean, string][] = [
  [(s) => s.isDirectory(), 'a folder'],
  [(s) => s.isFIFO(), 'a FIFO'],
  [(s) => s.isCharacterDevice(), 'a character device'],
  [(s) => s.isBlockDevice(), 'a block device'],
  [(s) => s.isSocket(), 'a socket'],
];

/**
 * Read a regular file of at most `maxBytes` bytes. The file is opened
 * without blocking and checked on the open descriptor (fstat), so what is
 * read is what was checked; at most `maxBytes + 1` bytes are ever read,
 * whatever the file claims. `followLinks: false` refuses a link as the last
 * part of the path (O_NOFOLLOW). Throws ReadRefused.
 */
export function readRegularFile(path: string, maxBytes: number, { followLinks = true } = {}): Buffer {
  if (path.includes('\0')) throw new ReadRefused('missing', path); // No file system path holds a NUL.
  let fd: number;
  try {
    fd = openSync(path, constants.O_RDONLY | constants.O_NONBLOCK | (followLinks ? 0 : constants.O_NOFOLLOW));
  } catch (error) {
    const code = (error as NodeJS.ErrnoException).code;
    if (code === 'ENOENT' || code === 'ENOTDIR') throw new ReadRefused('missing', path);
    if (code === 'ELOOP' || code === 'EMLINK') throw new ReadRefused('link', path);
    // A socket cannot be opened at all (ENXIO): say what it is.
    const stat = followLinks ? statSync(path, { throwIfNoEntry: false }) : lstatSync(path, { throwIfNoEntry: false });
    if (stat && !stat.isFile()) throw new ReadRefused('not a regular file', `${path} is ${KIND_WORDS.find(([is]) => is(stat))?.[1] ?? 'not a regular file'}`);
    throw new ReadRefused('unreadable', `${path} (${code ?? 'error'})`);
  }
  try {
    const stat = fstatSync(fd);
    if (!stat.isFile()) throw new ReadRefused('not a regular file', `${path} is ${KIND_WORDS.find(([is]) => is(stat))?.[1] ?? 'not a regular file'}`);
    if (stat.size > maxBytes) throw new ReadRefused('too large', `${path} (${stat.size} bytes)`);
    // Read to the end, but never past the limit: a file may grow after fstat.
    const chunks: Buffer[] = [];
    let total = 0;
    for (;;) {
      const chunk = Buffer.alloc(Math.min(1 << 20, maxBytes + 1 - total));
      let n: number;
      try {
        n = readSync(fd, chunk, 0, chunk.length, null);
      } catch (error) {
        throw new ReadRefused('unreadable', `${path} (${(error as NodeJS.ErrnoException).code ?? 'error'})`);
      }
      if (n === 0) return Buffer.concat(chunks, total);
      chunks.push(chunk.subarray(0, n));
      total += n;
      if (total > maxBytes) throw new ReadRefused('too large', `${path} (over ${maxBytes} bytes)`);
    }
  } finally {
    closeSync(fd);
  }
}

/**
 * Open `relativePath` inside `root` for reading, refusing any link on the
 * way (each folder is checked with lstat; the file is opened O_NOFOLLOW) and
 * anything but a regular file. Returns the descriptor and its size, or
 * undefined when the file is missing, a link, or not a regular file.
 */
export function openRegularInside(root: string, relativePath: string): { fd: number; size: number } | undefined {
  if (!isPlainRelativePath(relativePath)) return undefined;
  const parts = relativePath.split('/');
  let folder = root;
  for (const part of parts.slice(0, -1)) {
    folder = join(folder, part);
    try {
      if (!lstatSync(folder).isDirectory()) return undefined;
    } catch {
      return undefined;
    }
  }
  let fd: number;
  try {
    fd = openSync(join(root, relativePath), constants.O_RDONLY | constants.O_NONBLOCK | constants.O_NOFOLLOW);
  } catch {
    return undefined;
  }
  const stat = fstatSync(fd);
  if (!stat.isFile()) {
    closeSync(fd);
    return undefined;
  }
  return { fd, size: stat.size };
}
