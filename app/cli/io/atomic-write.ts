/**
 * Writes output files atomically: the content goes to a temporary file in the same folder, which
 * is then moved into place in one step, so a reader never sees half a file and an interrupted run
 * leaves no truncated output. Without `force` an existing file is never replaced: the temporary
 * file is hard-linked to the target, which fails if the target exists (no race between a check
 * and the write).
 */
import { existsSync, linkSync, mkdirSync, renameSync, unlinkSync, writeFileSync } from 'node:fs';
import { basename, dirname, join } from 'node:path';
import { randomBytes } from 'node:crypto';
import { CliError } from '../cli-error.ts';
import { EXIT } from '../exit-codes.ts';

export class OutputExistsError extends CliError {
  constructor(readonly path: string) {
    super(`${path} already exists; use --force to overwrite it`, EXIT.outputError);
    this.name = 'OutputExistsError';
  }
}

export function writeFileAtomic(path: string, content: string, options: { force: boolean }): void {
  const dir = dirname(path);
  try {
    mkdirSync(dir, { recursive: true });
  } catch (e) {
    throw new CliError(`cannot create folder ${dir}: ${(e as Error).message}`, EXIT.outputError);
  }
  const tmp = join(dir, `.${basename(path)}.${process.pid}.${randomBytes(4).toString('hex')}.tmp`);
  try {
    writeFileSync(tmp, content, { encoding: 'utf8', flag: 'wx' });
    if (options.force) renameSync(tmp, path);
    else {
      try {
        linkSync(tmp, path);
      } catch (e) {
        if ((e as NodeJS.ErrnoException).code === 'EEXIST') throw new OutputExistsError(path);
        throw e;
      } finally {
        unlinkSync(tmp);
      }
    }
  } catch (e) {
    if (existsSync(tmp)) unlinkSync(tmp);
    if (e instanceof CliError) throw e;
    throw new CliError(`cannot write ${path}: ${(e as Error).message}`, EXIT.outputError);
  }
}

/** Fails before anything is written when any of `paths` exists and `force` is off. */
export function assertWritable(paths: string[], force: boolean): void {
  if (force) return;
  const existing = paths.filter((p) => existsSync(p));
  if (existing.length === 1) throw new OutputExistsError(existing[0]);
  if (existing.length > 1)
    throw new CliError(
      `${existing.length} output files already exist (first: ${existing[0]}); use --force to overwrite them`,
      EXIT.outputError,
    );
}
