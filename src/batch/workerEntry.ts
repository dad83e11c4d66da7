/** What a batch worker process (tinypool, child_process runtime) exports: the one task. It readies its caches as it starts. */
import { collectGarbage } from '../raster/collect.ts';
import { renderEclipse, WARM_ENV, warmUp } from './task.ts';
import type { TaskInput, TaskResult } from './written.ts';

/** One eclipse, then a collection: what it drew and encoded goes back before the next (raster/collect.ts). */
export default async function renderThenCollect(input: TaskInput): Promise<TaskResult> {
  try {
    return await renderEclipse(input);
  } finally {
    collectGarbage();
  }
}

warmUp(process.env[WARM_ENV]);
