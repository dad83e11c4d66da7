import { readFileSync } from 'node:fs';

/** The version in package.json (read from the package folder: src/ and dist/ sit at the same depth under it). */
export function toolVersion(): string {
  return (JSON.parse(readFileSync(new URL('../../package.json', import.meta.url), 'utf8')) as { version: string }).version;
}
