/** What a batch worker process (tinypool, child_process runtime) exports: the one task. It readies its caches as it starts. */
import { WARM_ENV, warmUp } from './task.ts';

export { renderEclipse as default } from './task.ts';

warmUp(process.env[WARM_ENV]);
