/**
 * One batch per output folder: the lock file `.umbracast.lock`.
 *
 * The lock names its holder by more than a process id, which a container's
 * init may leave as a zombie and the system hands out again: the process's
 * start time (Linux: /proc/PID/stat field 22, clock ticks since boot;
 * elsewhere `ps -o lstart`), the host, the boot (Linux: boot_id) and a random
 * token. A lock is held only while a process with that id and that start
 * time runs, and is not a zombie, on this host and boot; any other lock of
 * ours is stale and taken over. A lock on another host cannot be checked and
 * is respected.
 *
 * The lock appears whole: it is written under a temporary name and linked
 * into place (link(2) fails if the name exists), so no batch reads a lock
 * half-written. A stale lock is moved aside before it is removed, and
 * removed only if what was moved is the lock judged stale (same inode).
 */
import { randomBytes } from 'node:crypto';
import { closeSync, constants, linkSync, lstatSync, openSync, readFileSync, renameSync, rmdirSync, unlinkSync, writeSync } from 'node:fs';
import { spawnSync } from 'node:child_process';
import { hostname } from 'node:os';
import { join } from 'node:path';
import { InputError } from '../errors.ts';
import { readRegularFile, ReadRefused } from '../outputs/files.ts';

export const LOCK_NAME = '.umbracast.lock';
const LOCK_TOOL = 'umbracast batch';
/** A lock is a line of JSON; anything longer is not ours. */
const MAX_LOCK_BYTES = 4096;

export interface LockRecord {
  readonly tool: typeof LOCK_TOOL;
  readonly pid: number;
  /** When the process started, as the system reports it; undefined where it cannot tell. */
  readonly start: string | undefined;
  readonly host: string;
  readonly boot: string | undefined;
  readonly token: string;
}

interface ProcessState {
  /** One letter, as ps and /proc report it: R, S, D, Z (zombie), X (dead), … */
  readonly state: string;
  readonly start: string;
}

function readText(path: string): string | undefined {
  try {
    return readFileSync(path, 'utf8');
  } catch {
    return undefined;
  }
}

/** This boot of this machine (Linux); undefined elsewhere. */
export function bootId(): string | undefined {
  return readText('/proc/sys/kernel/random/boot_id')?.trim() || undefined;
}

/**
 * A process's state and start time, or undefined if there is no such
 * process. Linux: /proc/PID/stat, fields 3 (state) and 22 (starttime) of
 * proc(5), counted after the command name, which may itself hold spaces and
 * parentheses. Elsewhere: ps -o stat= -o lstart= (POSIX ps; lstart on BSD,
 * macOS and procps).
 */
export function processState(pid: number): ProcessState | undefined {
  if (!Number.isSafeInteger(pid) || pid <= 0) return undefined;
  const stat = readText(`/proc/${pid}/stat`);
  if (stat !== undefined) {
    const fields = stat.slice(stat.lastIndexOf(')') + 2).split(' ');
    return { state: fields[0] ?? '?', start: fields[19] ?? '?' };
  }
  if (readText('/proc/self/stat') !== undefined) return undefined; // /proc works here: the process is gone.
  const ps = spawnSync('ps', ['-o', 'stat=', '-o', 'lstart=', '-p', String(pid)], { encoding: 'utf8', timeout: 5_000 });
  const line = ps.status === 0 ? ps.stdout.trim() : '';
  if (line === '') return undefined;
  const [state = '?', ...start] = line.split(/\s+/);
  return { state: state.slice(0, 1), start: start.join(' ') };
}

function ourRecord(): LockRecord {
  return { tool: LOCK_TOOL, pid: process.pid, start: processState(process.pid)?.start, host: hostname(), boot: bootId(), token: randomBytes(12).toString('hex') };
}

/** A lock's contents: ours (JSON), an older lock of ours (a bare process id), or not ours at all. */
function parseLock(text: string): (Partial<LockRecord> & { pid: number }) | undefined {
  if (/^\s*\d{1,10}\s*$/.test(text)) return { pid: Number(text) };
  try {
    const data = JSON.parse(text) as Partial<LockRecord>;
    if (data && data.tool === LOCK_TOOL && Number.isSafeInteger(data.pid)) return data as Partial<LockRecord> & { pid: number };
  } catch {
    // Not ours.
  }
  return undefined;
}

/** Is the batch a lock names still running? 'elsewhere' for a lock of another host, which cannot be checked. */
export function holderState(lock: Partial<LockRecord> & { pid: number }): 'alive' | 'gone' | 'elsewhere' {
  if (lock.host !== undefined && lock.host !== hostname()) return 'elsewhere';
  const boot = bootId();
  if (lock.boot !== undefined && boot !== undefined && lock.boot !== boot) return 'gone';
  const now = processState(lock.pid);
  if (!now || now.state === 'Z' || now.state === 'X') return 'gone';
  if (lock.start !== undefined) return now.start === lock.start ? 'alive' : 'gone';
  // An older lock holds a process id only: held while that process is a batch of ours (Linux can tell).
  const commandLine = readText(`/proc/${lock.pid}/cmdline`);
  return commandLine === undefined || /umbracast|bin\.m?js/.test(commandLine) ? 'alive' : 'gone';
}

const CREATE_EXCLUSIVE = constants.O_WRONLY | constants.O_CREAT | constants.O_EXCL | constants.O_NOFOLLOW;

/** Write our record under a fresh name, then link it to the lock's name; false if a lock is already there. */
function tryCreate(path: string, record: LockRecord, outDir: string): boolean {
  const temporary = `${path}.new-${randomBytes(6).toString('hex')}`;
  let fd: number;
  try {
    fd = openSync(temporary, CREATE_EXCLUSIVE, 0o644);
  } catch (error) {
    const code = (error as NodeJS.ErrnoException).code;
    if (code === 'EACCES' || code === 'EPERM' || code === 'EROFS' || code === 'ENOENT') {
      throw new InputError('outDir', `a folder umbracast can write to (its lock ${LOCK_NAME} could not be made)`, `${outDir} (${code})`, true);
    }
    throw error;
  }
  try {
    writeSync(fd, `${JSON.stringify(record)}\n`);
    closeSync(fd);
    try {
      linkSync(temporary, path);
      return true;
    } catch (error) {
      if ((error as NodeJS.ErrnoException).code === 'EEXIST') return false;
      throw error;
    }
  } finally {
    try {
      unlinkSync(temporary);
    } catch {
      // Already gone.
    }
  }
}

/**
 * Take the lock of `outDir`, or throw an InputError naming the live holder.
 * Returns the release function, which removes the lock only if it is still ours.
 */
export function acquireLock(outDir: string): () => void {
  const path = join(outDir, LOCK_NAME);
  const record = ourRecord();
  for (let attempt = 0; attempt < 5; attempt++) {
    if (tryCreate(path, record, outDir)) {
      return () => {
        try {
          if (parseLock(readRegularFile(path, MAX_LOCK_BYTES, { followLinks: false }).toString('utf8'))?.token === record.token) unlinkSync(path);
        } catch {
          // Already gone.
        }
      };
    }
    // A lock is never changed in place, only made (link) and removed: its inode identifies it.
    const judged = lstatSync(path, { throwIfNoEntry: false });
    if (!judged) continue;
    if (!judged.isFile()) {
      const kind = judged.isDirectory() ? 'a folder' : judged.isSymbolicLink() ? 'a symbolic link' : 'not a plain file';
      throw new InputError('outDir', `a folder whose lock ${LOCK_NAME} is a plain file`, `${outDir} (${LOCK_NAME} is ${kind}; remove it)`, true);
    }
    let holder: ReturnType<typeof parseLock>;
    try {
      holder = parseLock(readRegularFile(path, MAX_LOCK_BYTES, { followLinks: false }).toString('utf8'));
    } catch (error) {
      // Gone, or replaced while we looked: try again. Too large to be ours: stale.
      if (!(error instanceof ReadRefused) || error.reason !== 'too large') continue;
    }
    if (holder) {
      const state = holderState(holder);
      if (state === 'alive') {
        throw new InputError('outDir', 'a folder no other batch is writing to', `${outDir} (batch with process ${holder.pid} holds ${LOCK_NAME}; wait for it, or remove the lock if that process is gone)`, true);
      }
      if (state === 'elsewhere') {
        throw new InputError('outDir', 'a folder no other batch is writing to', `${outDir} (a batch on host ${JSON.stringify(holder.host)} holds ${LOCK_NAME}; wait for it, or remove the lock if that batch is gone)`, true);
      }
    }
    // Stale (its batch is gone) or not a lock of ours: move it aside, and remove it only if it is the one judged.
    const aside = `${path}.stale-${randomBytes(6).toString('hex')}`;
    try {
      renameSync(path, aside);
    } catch {
      continue;
    }
    const moved = lstatSync(aside);
    if (moved.ino !== judged.ino || moved.dev !== judged.dev) {
      // A new lock arrived between our look and the move: put it back (link fails if yet another is in place; that one decides).
      try {
        linkSync(aside, path);
      } catch {
        // Another lock is in place again.
      }
    }
    unlinkSync(aside);
  }
  throw new InputError('outDir', 'a folder whose lock can be taken', `${outDir} (other batches keep taking ${LOCK_NAME})`, true);
}

/** Remove an empty folder we made, if a lock could not be taken in it. */
export function removeIfEmpty(folder: string): void {
  try {
    rmdirSync(folder);
  } catch {
    // Not empty, or not ours to remove.
  }
}
