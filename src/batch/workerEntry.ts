/** What a batch worker process (tinypool, child_process runtime) exports: the one task. */
export { renderEclipse as default } from './task.ts';
