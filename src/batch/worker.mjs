// A batch worker process (tinypool, child_process runtime): run the TypeScript task through tsx.
// Each worker is its own process, so each has its own libvips, V8 heap and malloc arena.
import { register } from 'tsx/esm/api';

register();
let task;
export default async function renderEclipse(input) {
  task ??= await import('./task.ts');
  return task.renderEclipse(input);
}
