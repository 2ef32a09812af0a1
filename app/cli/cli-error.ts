import { EXIT } from './exit-codes.ts';

/** An expected failure: printed as one line on stderr, no stack trace. */
export class CliError extends Error {
  constructor(
    message: string,
    readonly exitCode: number = EXIT.dataError,
  ) {
    super(message);
    this.name = 'CliError';
  }
}
