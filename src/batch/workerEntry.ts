/** What a bundled batch worker exports: the one task. */
export { renderEclipse as default } from './task.ts';
