import pkg from '../../package.json' with { type: 'json' };

/** The version in package.json. */
export function toolVersion(): string {
  return pkg.version;
}
