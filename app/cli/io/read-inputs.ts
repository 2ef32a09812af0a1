/**
 * Turns the paths given on the command line into the files of one sample (which files: see
 * ./input-files.ts, shared with `inspect`). Reads them as UTF-8.
 */
import { readFileSync } from 'node:fs';
import { CliError } from '../cli-error.ts';
import { EXIT } from '../exit-codes.ts';
import { listInputFiles, type SkippedFile } from './input-files.ts';

export { DATA_FILE_PATTERN } from './input-files.ts';

export interface InputFile {
  /** The path as the user would recognise it; used in every message. */
  name: string;
  text: string;
}

/** Expands folders and checks every path; throws a one-line CliError naming the bad path. */
export function expandInputs(paths: string[], skipped: SkippedFile[] = []): string[] {
  const list = listInputFiles(paths);
  skipped.push(...list.skipped);
  return list.files;
}

/** Reads the sample's files; files skipped in folders are added to `skipped` with the reason. */
export function readInputs(paths: string[], skipped: SkippedFile[] = []): InputFile[] {
  return expandInputs(paths, skipped).map((name) => {
    try {
      return { name, text: readFileSync(name, 'utf8') };
    } catch (e) {
      throw new CliError(`${name}: cannot read: ${(e as Error).message}`, EXIT.dataError);
    }
  });
}
