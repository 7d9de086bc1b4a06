import { Command, CommanderError } from 'commander';
import { demoCommand } from './commands/demo.js';
import { historyCommand } from './commands/history.js';
import { populationCommand } from './commands/population.js';
import { lifeCommand } from './commands/life.js';
import { starCommand } from './commands/star.js';
import { batchCommand } from './commands/batch.js';
import { RowsRejected } from './rowsRejected.js';
import { trackCommand } from './commands/track.js';
import { isochroneCommand } from './commands/isochrone.js';
import { gridCommand } from './commands/grid.js';
import { plotCommand } from './commands/plot.js';
import { viewCommand } from './commands/view.js';
import type { Io } from './io.js';
import { diagnostic, processIo } from './io.js';
import { packageInfo } from './packageRoot.js';

/** Exit codes: the one place they are decided. */
export const EXIT = Object.freeze({ ok: 0, failure: 1, badInput: 2, rowsRejected: 3 });

/** The commander program with every subcommand, writing through `io`. */
export function createProgram(io: Io): Command {
  const program = new Command('starclock')
    .description(
      'what a star of a given birth mass, metallicity and age is today, and how it lives and dies (approximate model, for fiction, games and world-building)',
    )
    .version(packageInfo().version, '-V, --version', 'print the version')
    .helpOption('-h, --help', 'show help')
    .addCommand(starCommand(io))
    .addCommand(lifeCommand(io))
    .addCommand(trackCommand(io))
    .addCommand(isochroneCommand(io))
    .addCommand(gridCommand(io))
    .addCommand(batchCommand(io))
    .addCommand(plotCommand(io))
    .addCommand(viewCommand(io))
    .addCommand(populationCommand(io))
    .addCommand(historyCommand(io))
    .addCommand(demoCommand(io));
  // addCommand does not pass settings down, so every command gets the same output and exit handling.
  const configure = (command: Command): void => {
    command
      .exitOverride()
      .configureOutput({
        writeOut: (text) => io.out(text),
        writeErr: (text) => io.err(text),
        // Errors are reported once, by main, as one line.
        outputError: () => undefined,
      })
      .helpOption('-h, --help', 'show help');
    command.commands.forEach(configure);
  };
  configure(program);
  return program;
}

// Commander prefixes "error: " and, for a rejected option value, restates the option and value;
// our own parsers' messages (cli/options.ts) already start with the option's name, so that part goes.
function commanderMessage(error: CommanderError): string {
  return error.message
    .replace(/^error: /, '')
    .replace(/^option '[^']*' argument '[^']*' is invalid\. (?=--)/, '')
    .replace(/\s*\n\s*/g, ' ')
    .trim();
}

/**
 * Runs the command line and returns the exit code; never exits the process.
 * 0 ok (and --help, --version); 2 bad input — a usage error, a rejected option
 * value, or a RangeError/TypeError from the core — with one line
 * `starclock: <message>` on stderr; 3 the output is written but some input rows were
 * rejected (RowsRejected); 1 any other failure, also one line.
 *
 * @param argv the arguments after the program name (`process.argv.slice(2)`)
 * @param io where output and diagnostics go (default: the process's streams)
 */
export async function main(argv: readonly string[], io: Io = processIo): Promise<number> {
  const program = createProgram(io);
  try {
    await program.parseAsync([...argv], { from: 'user' });
    return EXIT.ok;
  } catch (error) {
    if (error instanceof CommanderError) {
      if (error.exitCode === 0) return EXIT.ok;
      // Help printed because no command was given: the help itself is the message.
      if (error.code !== 'commander.help') diagnostic(io, commanderMessage(error));
      return EXIT.badInput;
    }
    if (error instanceof RangeError || error instanceof TypeError) {
      diagnostic(io, error.message);
      return EXIT.badInput;
    }
    // Output written whole, but some input rows could not be used (batch).
    if (error instanceof RowsRejected) {
      diagnostic(io, error.message);
      return EXIT.rowsRejected;
    }
    diagnostic(io, error instanceof Error ? error.message : String(error));
    if (process.env.STARCLOCK_DEBUG && error instanceof Error && error.stack) io.err(error.stack + '\n');
    return EXIT.failure;
  }
}
