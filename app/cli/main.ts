/**
 * `thermoshift` command line: thin wiring of commands around the same core the app uses.
 * Each command lives in ./commands/ and registers itself on the program.
 */
import { Command, CommanderError } from 'commander';
import { registerCommands } from './commands/index.ts';
import { EXIT } from './exit-codes.ts';
import { CliError } from './cli-error.ts';
import { THERMOSHIFT_VERSION } from '@core/pipeline';

export async function main(argv: string[]): Promise<number> {
  const program = new Command();
  program
    .name('thermoshift')
    .description('Time–temperature superposition master curves for polymers.')
    .version(THERMOSHIFT_VERSION, '-V, --version', 'print the Thermoshift version')
    .option('--debug', 'print stack traces of unexpected errors')
    .exitOverride()
    .configureOutput({ writeErr: (s) => process.stderr.write(s) });
  registerCommands(program);
  try {
    await program.parseAsync(argv, { from: 'user' });
    return typeof process.exitCode === 'number' ? process.exitCode : EXIT.ok;
  } catch (e) {
    if (e instanceof CommanderError) {
      if (e.code === 'commander.helpDisplayed' || e.code === 'commander.version') return EXIT.ok;
      if (e.code === 'commander.help') return EXIT.ok;
      return EXIT.usage;
    }
    if (e instanceof CliError) {
      process.stderr.write(`thermoshift: ${e.message}\n`);
      if (argv.includes('--debug')) {
        const origin = e.cause instanceof Error ? e.cause : e;
        if (origin.stack) process.stderr.write(`${origin.stack}\n`);
      }
      return e.exitCode;
    }
    const debug = argv.includes('--debug');
    process.stderr.write(
      `thermoshift: unexpected error: ${e instanceof Error ? e.message : String(e)}\n` +
        (debug && e instanceof Error && e.stack
          ? `${e.stack}\n`
          : '(run again with --debug for details)\n'),
    );
    return EXIT.internal;
  }
}
