/** Child process for the no-system-fonts test: render and print the PNG's SHA-256. */
import { createHash } from 'node:crypto';
import { render } from './support.ts';

const file = await render({ theme: 'light' });
process.stdout.write(createHash('sha256').update(file.bytes).digest('hex'));
