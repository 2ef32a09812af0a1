/**
 * Turns the paths given on the command line into the files of one sample (which files: see
 * ./input-files.ts, shared with `inspect`). Decodes them by core/io/decode.ts (UTF-8, UTF-16 with
 * BOM, Windows-1252) and hands them over in chunks; a workbook (.xlsx) is handed over as bytes and
 * becomes one file per sheet in `readWorkbookInputs`.
 */
import { readFileSync, statSync } from 'node:fs';
import { expandWorkbooks, isWorkbookName } from '@core/io';
import type { TextEncodingName } from '@core/io';
import { CliError } from '../cli-error.ts';
import { EXIT } from '../exit-codes.ts';
import { listInputFiles, type SkippedFile } from './input-files.ts';
import { readDecodedChunks } from './read-text-chunks.ts';

export { DATA_FILE_PATTERN } from './input-files.ts';

export interface InputFile {
  /** The path as the user would recognise it; used in every message. */
  name: string;
  /** '' : the content comes in `chunks` (read lazily, see read-text-chunks.ts). */
  text: string;
  /** A workbook's bytes (.xlsx; `text` is then empty): `readWorkbookInputs` reads its sheets. */
  bytes?: Uint8Array;
  chunks?: Iterable<string>;
  encoding?: TextEncodingName;
  byteLength?: number;
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
      if (isWorkbookName(name)) return { name, text: '', bytes: readFileSync(name) };
      const { chunks, encoding } = readDecodedChunks(name);
      return { name, text: '', chunks, encoding, byteLength: statSync(name).size };
    } catch (e) {
      throw new CliError(`${name}: cannot read: ${(e as Error).message}`, EXIT.dataError);
    }
  });
}

/**
 * `readInputs`, with every .xlsx workbook replaced by its sheets ("seal.xlsx › 40 °C"), each read
 * as one file by the importer.
 */
export async function readWorkbookInputs(
  paths: string[],
  skipped: SkippedFile[] = [],
): Promise<InputFile[]> {
  return expandWorkbooks(readInputs(paths, skipped));
}
