/**
 * Maps the core's typed errors to one-line CLI errors with the documented exit codes. Messages from
 * the core already name the file, row and column (import) or the key (settings, options).
 */
import { ImportError } from '@core/io';
import { SettingsError } from '@core/pipeline';
import { OptionsError } from '@core/pipeline';
import { PipelineError } from '@core/pipeline';
import { CliError } from './cli-error.ts';
import { EXIT } from './exit-codes.ts';

export function toCliError(e: unknown): unknown {
  if (e instanceof CliError) return e;
  const code =
    e instanceof ImportError || e instanceof PipelineError
      ? EXIT.dataError
      : e instanceof SettingsError || e instanceof OptionsError
        ? EXIT.usage
        : undefined;
  if (code === undefined) return e;
  const err = new CliError((e as Error).message, code);
  err.cause = e; // --debug prints where it came from
  return err;
}

/** The one-line message of any error (for batch progress and the index table). */
export function oneLine(e: unknown): string {
  const m = e instanceof Error ? e.message : String(e);
  return m.replace(/\s*[\r\n]+\s*/g, ' ');
}
