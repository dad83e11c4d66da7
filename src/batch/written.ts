/** What a batch task is given and what it reports back: plain data, safe to send between processes. */
import { createHash } from 'node:crypto';
import type { Eclipse } from '../eclipses/kinds.ts';
import type { HouseStyle } from './style.ts';

export interface TaskInput {
  /** A lunar or a solar eclipse: the task dispatches on `body`. */
  readonly eclipse: Eclipse;
  readonly style: HouseStyle;
  readonly outDir: string;
  readonly generator: string;
}

/** What a file is to its eclipse; `diagram`: the figure beside the map (the shadow diagram, or the Sun and the Moon at maximum). */
export type FileRole = 'map' | 'caption' | 'thumbnail' | 'local' | 'sky' | 'diagram';
export const FILE_ROLES: readonly FileRole[] = ['map', 'caption', 'thumbnail', 'local', 'sky', 'diagram'];

export interface WrittenFile {
  readonly path: string;
  readonly role: FileRole;
  readonly bytes: number;
  readonly sha256: string;
}

/** What a task reports: its files, and how long it took in its worker (seconds, from its own start). */
export interface TaskResult {
  readonly files: WrittenFile[];
  readonly seconds: number;
}

export function sha256(bytes: Uint8Array | string): string {
  return createHash('sha256').update(bytes).digest('hex');
}
