// Worker-thread entry for the batch pool: load the TypeScript task through tsx.
import { register } from 'tsx/esm/api';

register();
const { renderEclipse } = await import('./task.ts');
export default renderEclipse;
