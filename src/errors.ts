/**
 * The one error the library throws for bad input. Like sharp's
 * invalidParameterError, it names the parameter, what was expected and what
 * arrived; the CLI prints `message` as its single stderr line.
 */
export class InputError extends Error {
  readonly parameter: string;
  readonly expected: string;
  readonly received: string;

  /** `received` is quoted and shortened; pass `asIs` when it is already a description. */
  constructor(parameter: string, expected: string, received: unknown, asIs = false) {
    const shown = asIs ? String(received) : describeReceived(received);
    super(`${parameter}: expected ${expected}, received ${shown}`);
    this.name = 'InputError';
    this.parameter = parameter;
    this.expected = expected;
    this.received = shown;
  }
}

/** Quote strings, keep it to one short line whatever arrives. */
export function describeReceived(value: unknown): string {
  if (value === undefined) return 'nothing';
  const text = typeof value === 'string' ? JSON.stringify(value) : String(value);
  const oneLine = text.replace(/[\r\n\u2028\u2029]+/g, ' ');
  return oneLine.length > 80 ? `${oneLine.slice(0, 77)}...` : oneLine;
}
