/**
 * The command line: parse, dispatch, and turn every error into one stderr
 * line and an exit code (2 usage, 1 failure). Commands only parse options and
 * call the library.
 */
import { Command, CommanderError } from 'commander';
import { InputError } from '../errors.ts';
import type { CommandContext } from './context.ts';
import { asFlags } from './flags.ts';
import { printable } from '../batch/printable.ts';
import { toolVersion } from './version.ts';

export const EXIT_OK = 0;
export const EXIT_FAILURE = 1;
export const EXIT_USAGE = 2;
/** 128 + SIGINT, as shells report an interrupted command. */
export const EXIT_INTERRUPTED = 130;

export { toolVersion };

type Register = (program: Command, context: CommandContext) => void;

/**
 * Each command's module, loaded only when that command runs: `list` need not
 * load the batch's schema library, nor `local` the drawing code. Help and
 * unknown commands load them all (to list them, or to suggest one).
 */
const COMMANDS: Record<string, () => Promise<Register>> = {
  list: async () => (await import('./commands/list.ts')).registerList,
  map: async () => (await import('./commands/map.ts')).registerMap,
  local: async () => (await import('./commands/local.ts')).registerLocal,
  sky: async () => (await import('./commands/sky.ts')).registerSky,
  diagram: async () => (await import('./commands/diagram.ts')).registerDiagram,
  caption: async () => (await import('./commands/caption.ts')).registerCaption,
  batch: async () => (await import('./commands/batch.ts')).registerBatch,
};

/** The command the arguments name, if it is one of ours: the first argument that is not an option. */
function commandAsked(args: readonly string[]): string | undefined {
  const first = args.find((arg) => !arg.startsWith('-'));
  return first !== undefined && Object.hasOwn(COMMANDS, first) ? first : undefined;
}

async function buildProgram(context: CommandContext, args: readonly string[]): Promise<Command> {
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
  const asked = commandAsked(args);
  for (const name of asked !== undefined ? [asked] : Object.keys(COMMANDS)) (await COMMANDS[name]!())(program, context);
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

// Every error is one line, whatever arrived: what came from outside (an option's value, a path, a
// place name) is shown with its line breaks, terminal escapes and direction marks escaped.
/** Run the CLI with arguments (without node and script); resolves to the exit code. */
export async function main(args: readonly string[], context: CommandContext = defaultContext): Promise<number> {
  const program = await buildProgram(context, args);
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
      context.stderr(`umbracast: ${printable(error.message.replace(/^error: /, '').split('\n')[0]!)}\n`);
      return EXIT_USAGE;
    }
    if (error instanceof InputError) {
      // The library names its parameters; the user typed flags.
      context.stderr(`umbracast: ${printable(asFlags(error).message)}\n`);
      return EXIT_USAGE;
    }
    if (error instanceof Error && error.name === 'BatchInterrupted') {
      context.stderr(`umbracast: ${error.message}\n`);
      return EXIT_INTERRUPTED;
    }
    const message = error instanceof Error ? error.message : String(error);
    context.stderr(`umbracast: failed: ${printable(message.split('\n')[0]!)}\n`);
    return EXIT_FAILURE;
  }
}
