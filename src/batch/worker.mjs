// A batch worker process: load the TypeScript task through tsx and serve it to the pool.
// Each worker is its own process, so each has its own libvips: SVGs rasterise in parallel.
import workerpool from 'workerpool';
import { register } from 'tsx/esm/api';

register();
const { renderEclipse } = await import('./task.ts');
workerpool.worker({ renderEclipse });
