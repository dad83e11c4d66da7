/**
 * The command line: parse, dispatch, and turn every error into one stderr
 * line and an exit code (2 usage, 1 failure). Commands only parse options and
 * call the library.
 */
import { Command, CommanderError } from 'commander';
import { InputError } from '../errors.ts';
import type { CommandContext } from './context.ts';
import { registerList } from './commands/list.ts';
import { registerMap } from './commands/map.ts';
import { registerLocal } from './commands/local.ts';
import { registerSky } from './commands/sky.ts';
import { registerCaption } from './commands/caption.ts';
import { BatchInterrupted, registerBatch } from './commands/batch.ts';
import { toolVersion } from './version.ts';

export const EXIT_OK = 0;
export const EXIT_FAILURE = 1;
export const EXIT_USAGE = 2;
/** 128 + SIGINT, as shells report an interrupted command. */
export const EXIT_INTERRUPTED = 130;

export { toolVersion };

function buildProgram(context: CommandContext): Command {
  const program = new Command('umbracast')
    .description('Lunar eclipses: when, where the Moon is up, and how it looks from your town.')
    .version(toolVersion(), '-V, --version', 'print the version')
    .helpOption('-h, --help', 'show help')
    .showSuggestionAfterError(true)
    .exitOverride()
    .configureOutput({
      writeOut: (text) => context.stdout(text),
      // Commander's own messages are reformatted in main(); swallow its raw output.
      writeErr: () => undefined,
      outputError: () => undefined,
    });
  registerList(program, context);
  registerMap(program, context);
  registerLocal(program, context);
  registerSky(program, context);
  registerCaption(program, context);
  registerBatch(program, context);
  for (const command of program.commands) {
    command.exitOverride().configureOutput({ writeOut: (t) => context.stdout(t), writeErr: () => undefined, outputError: () => undefined });
  }
  return program;
}

const defaultContext: CommandContext = {
  stdout: (text) => process.stdout.write(text),
  stderr: (text) => process.stderr.write(text),
  now: () => new Date(),
  isTerminal: () => Boolean(process.stderr.isTTY),
};

/** Run the CLI with arguments (without node and script); resolves to the exit code. */
export async function main(args: readonly string[], context: CommandContext = defaultContext): Promise<number> {
  const program = buildProgram(context);
  if (args.length === 0) {
    context.stdout(program.helpInformation());
    return EXIT_OK;
  }
  try {
    await program.parseAsync([...args], { from: 'user' });
    return EXIT_OK;
  } catch (error) {
    if (error instanceof CommanderError) {
      if (error.exitCode === 0) return EXIT_OK; // --help, --version
      context.stderr(`umbracast: ${error.message.replace(/^error: /, '').split('\n')[0]}\n`);
      return EXIT_USAGE;
    }
    if (error instanceof InputError) {
      context.stderr(`umbracast: ${error.message}\n`);
      return EXIT_USAGE;
    }
    if (error instanceof BatchInterrupted) {
      context.stderr(`umbracast: ${error.message}\n`);
      return EXIT_INTERRUPTED;
    }
    const message = error instanceof Error ? error.message : String(error);
    context.stderr(`umbracast: failed: ${message.split('\n')[0]}\n`);
    return EXIT_FAILURE;
  }
}
