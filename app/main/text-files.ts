/**
 * Reading and writing the user's files (paths always chosen by a dialog in main). Writes go to a
 * temporary file first and are renamed into place, so a crash never leaves half a file.
 */
import { readdir, readFile, stat } from 'node:fs/promises';
import { basename, join } from 'node:path';
import { isWorkbookName, workbookToSourceFiles } from '@core/io';
import { writeFileAtomic as writeBytesAtomic } from '../shared/flushed-write';
import type { TextFile } from '../shared/ipc-channels';

/** File name endings taken from a chosen folder (other files, e.g. notes or images, are skipped). */
export const DATA_FILE_PATTERN = /\.(csv|tsv|txt|dat|tab|asc|prn|xlsx)$/i;

/** Data files larger than this are refused with a message instead of freezing the window. */
export const MAX_DATA_FILE_BYTES = 200 * 1024 * 1024;

async function checkSize(path: string): Promise<void> {
  const info = await stat(path);
  if (info.size > MAX_DATA_FILE_BYTES) {
    throw new Error(
      `${basename(path)} is ${(info.size / 1e6).toFixed(0)} MB; files up to ` +
        `${MAX_DATA_FILE_BYTES / 1e6} MB can be opened. Use the thermoshift command line for larger files.`,
    );
  }
}

export async function readTextFile(path: string): Promise<TextFile> {
  await checkSize(path);
  return { name: basename(path), text: await readFile(path, 'utf8') };
}

/**
 * A data file as the importer's files: a text file is one, an .xlsx workbook one per sheet
 * ("seal.xlsx › 40 °C", read by core/io/workbook.ts).
 */
export async function readDataFile(path: string): Promise<TextFile[]> {
  if (!isWorkbookName(path)) return [await readTextFile(path)];
  await checkSize(path);
  return workbookToSourceFiles(basename(path), new Uint8Array(await readFile(path)));
}

/** The data files directly inside a folder, sorted by name as people number files (2 before 10). */
export async function dataFilesInFolder(folder: string): Promise<string[]> {
  const entries = await readdir(folder, { withFileTypes: true });
  const files = entries
    .filter((d) => d.isFile() && !d.name.startsWith('.') && DATA_FILE_PATTERN.test(d.name))
    .map((d) => join(folder, d.name))
    .sort((a, b) => a.localeCompare(b, 'en', { numeric: true }));
  if (files.length === 0) {
    throw new Error(
      `The folder ${basename(folder)} holds no data files (.csv, .tsv, .txt, .dat, .asc, .xlsx).`,
    );
  }
  return files;
}

/** Reads every path as data files (workbooks become their sheets), in order. */
export async function readDataFiles(paths: string[]): Promise<TextFile[]> {
  return (await Promise.all(paths.map(readDataFile))).flat();
}

/** Writes text (or base64-encoded bytes) as a whole: app/shared/flushed-write.ts. */
export async function writeFileAtomic(
  path: string,
  content: string,
  encoding: 'utf8' | 'base64' = 'utf8',
): Promise<void> {
  await writeBytesAtomic(path, Buffer.from(content, encoding));
}
