/**
 * Reading and writing the user's files (paths always chosen by a dialog in main). Writes go to a
 * temporary file first and are renamed into place, so a crash never leaves half a file.
 */
import { readFile, rename, stat, writeFile } from 'node:fs/promises';
import { basename } from 'node:path';
import type { TextFile } from '../shared/ipc-channels';

/** Data files larger than this are refused with a message instead of freezing the window. */
export const MAX_DATA_FILE_BYTES = 200 * 1024 * 1024;

export async function readTextFile(path: string): Promise<TextFile> {
  const info = await stat(path);
  if (info.size > MAX_DATA_FILE_BYTES) {
    throw new Error(
      `${basename(path)} is ${(info.size / 1e6).toFixed(0)} MB; files up to ` +
        `${MAX_DATA_FILE_BYTES / 1e6} MB can be opened. Use the thermoshift command line for larger files.`,
    );
  }
  return { name: basename(path), text: await readFile(path, 'utf8') };
}

export async function writeFileAtomic(
  path: string,
  content: string,
  encoding: 'utf8' | 'base64' = 'utf8',
): Promise<void> {
  const tmp = `${path}.${process.pid}.tmp`;
  await writeFile(tmp, Buffer.from(content, encoding));
  await rename(tmp, path);
}
