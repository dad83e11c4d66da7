/**
 * The one error the library throws for bad input. Like sharp's
 * invalidParameterError, it names the parameter, what was expected and what
 * arrived; the CLI prints it as its single stderr line, naming its own flags
 * (see `renamed`).
 */

/** How a caller names a parameter: the library by its own name, the CLI by its flag, a style by its field. */
export type ParameterNamer = (parameter: string) => string;

/** What was expected; a function when the text mentions other parameters, so that each caller names them its own way. */
export type Expected = string | ((name: ParameterNamer) => string);

const asNamed: ParameterNamer = (parameter) => parameter;

export class InputError extends Error {
  readonly parameter: string;
  readonly expected: string;
  readonly received: string;
  readonly #expected: Expected;

  /** `received` is quoted and shortened; pass `asIs` when it is already a description. */
  constructor(parameter: string, expected: Expected, received: unknown, asIs = false) {
    const shown = asIs ? String(received) : describeReceived(received);
    const text = typeof expected === 'string' ? expected : expected(asNamed);
    super(`${parameter}: expected ${text}, received ${shown}`);
    this.name = 'InputError';
    this.parameter = parameter;
    this.expected = text;
    this.received = shown;
    this.#expected = expected;
  }

  /** The same error with every parameter it names (its own and those in `expected`) named by `name`. */
  renamed(name: ParameterNamer): InputError {
    const expected = this.#expected;
    return new InputError(name(this.parameter), typeof expected === 'string' ? expected : expected(name), this.received, true);
  }
}

/** Quote strings, keep it to one short line whatever arrives. */
export function describeReceived(value: unknown): string {
  if (value === undefined) return 'nothing';
  const text = typeof value === 'string' ? JSON.stringify(value) : String(value);
  const oneLine = text.replace(/[\r\n\u2028\u2029]+/g, ' ');
  return oneLine.length > 80 ? `${oneLine.slice(0, 77)}...` : oneLine;
}
