/**
 * Turns the paths given on the command line into the files of one sample: a file stands for
 * itself, a folder for the data files directly inside it (sorted by name). Decodes them by
 * core/io/decode.ts (UTF-8, UTF-16 with BOM, Windows-1252) and hands them over in chunks.
 */
import { readdirSync, readFileSync, statSync } from 'node:fs';
import { join } from 'node:path';
import { expandWorkbooks, isWorkbookName } from '@core/io';
import { CliError } from '../cli-error.ts';
import { EXIT } from '../exit-codes.ts';
import type { TextEncodingName } from '@core/io';
import { readDecodedChunks } from './read-text-chunks.ts';

/** File name endings taken from a folder (other files, e.g. notes or images, are skipped). */
export const DATA_FILE_PATTERN = /\.(csv|tsv|txt|dat|tab|xlsx)$/i;

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

/** Data files inside a folder, sorted by name. */
export function dataFilesIn(folder: string): string[] {
  return readdirSync(folder, { withFileTypes: true })
    .filter((d) => d.isFile() && DATA_FILE_PATTERN.test(d.name) && !d.name.startsWith('.'))
    .map((d) => join(folder, d.name))
    .sort((a, b) => a.localeCompare(b, 'en', { numeric: true }));
}

/** Expands folders and checks every path; throws a one-line CliError naming the bad path. */
export function expandInputs(paths: string[]): string[] {
  const out: string[] = [];
  for (const p of paths) {
    let st;
    try {
      st = statSync(p);
    } catch {
      throw new CliError(`${p}: no such file or folder`, EXIT.dataError);
    }
    if (st.isDirectory()) {
      const files = dataFilesIn(p);
      if (files.length === 0)
        throw new CliError(
          `${p}: folder holds no data files (.csv, .tsv, .txt, .dat, .xlsx)`,
          EXIT.dataError,
        );
      out.push(...files);
    } else out.push(p);
  }
  return [...new Set(out)];
}

export function readInputs(paths: string[]): InputFile[] {
  return expandInputs(paths).map((name) => {
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
export async function readWorkbookInputs(paths: string[]): Promise<InputFile[]> {
  return expandWorkbooks(readInputs(paths));
}
