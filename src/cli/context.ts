/** What a command may touch of the outside world; tests pass their own. */
export interface CommandContext {
  stdout(text: string): void;
  stderr(text: string): void;
  now(): Date;
  /** Is stderr a terminal (progress bar) or not (plain lines)? */
  isTerminal?(): boolean;
}
