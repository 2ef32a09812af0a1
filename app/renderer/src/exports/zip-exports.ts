/**
 * Every export of an analysis as one zip file, so *Export → All* is one download (browsers ask
 * for each of several downloads) and one save dialog on the desktop. fflate builds the archive
 * in memory (a small, maintained, dependency-free library); files sit in a folder named after
 * the analysis, with the names `thermoshift build --out` writes.
 */
import { strToU8, zipSync } from 'fflate';

export interface ZipEntry {
  name: string;
  /** Text (UTF-8) or bytes. */
  content: string | Uint8Array;
}

/** The zip as bytes; `folder` is the folder inside the archive. */
export function zipFiles(folder: string, entries: readonly ZipEntry[], mtime: Date): Uint8Array {
  const tree: Record<string, [Uint8Array, { mtime: Date }]> = {};
  for (const e of entries)
    tree[`${folder}/${e.name}`] = [
      typeof e.content === 'string' ? strToU8(e.content) : e.content,
      { mtime },
    ];
  return zipSync(tree, { level: 6 });
}

/** Bytes as base64, for the save-file channel. */
export function bytesToBase64(bytes: Uint8Array): string {
  let s = '';
  for (let i = 0; i < bytes.length; i += 0x8000)
    s += String.fromCharCode(...bytes.subarray(i, i + 0x8000));
  return btoa(s);
}
