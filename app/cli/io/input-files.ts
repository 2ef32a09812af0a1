/**
 * Which files a command reads, the same for `inspect`, `build` and `batch`: a path naming a file
 * stands for itself, a folder for the data files directly inside it. Only regular files are read:
 * named pipes, devices and sockets are refused by name before anything opens them (reading one
 * would block for ever or never end). Symbolic links are followed once (stat, not lstat); a broken
 * link or a link loop is skipped with the reason, and a file reached twice (by its name and by a
 * link) is read once. Files Thermoshift wrote itself (first line "# Thermoshift <version> …") are
 * skipped in folders, so an output folder inside an input folder is never read as data.
 */
import { closeSync, openSync, readSync, readdirSync, realpathSync, statSync } from 'node:fs';
import type { Stats } from 'node:fs';
import { join } from 'node:path';
import { CliError } from '../cli-error.ts';
import { EXIT } from '../exit-codes.ts';

/** File name endings taken from a folder (other files, e.g. notes or images, are skipped). */
export const DATA_FILE_PATTERN = /\.(csv|tsv|txt|dat|tab|asc|prn|xlsx)$/i;
/** The endings in words, for messages. */
export const DATA_FILE_ENDINGS = '.csv, .tsv, .txt, .dat, .tab, .asc, .prn, .xlsx';

/** The first line of every table Thermoshift writes (core/report/csv). */
export const THERMOSHIFT_OUTPUT_LINE = /^\uFEFF?# Thermoshift \d+\.\d+/;

export interface SkippedFile {
  path: string;
  reason: string;
}

export interface InputFileList {
  /** Files to read, in order (folders' contents sorted by name). */
  files: string[];
  /** Files in the folders given that are not read, with the reason. */
  skipped: SkippedFile[];
}

/** What kind of thing `st` is, when it is not a regular file or a folder. */
function specialKind(st: Stats): string | undefined {
  if (st.isFIFO()) return 'a named pipe';
  if (st.isCharacterDevice()) return 'a character device';
  if (st.isBlockDevice()) return 'a block device';
  if (st.isSocket()) return 'a socket';
  if (!st.isFile() && !st.isDirectory()) return 'not a regular file';
  return undefined;
}

function statOrReason(path: string): Stats | string {
  try {
    return statSync(path);
  } catch (e) {
    const code = (e as NodeJS.ErrnoException).code;
    if (code === 'ELOOP') return 'a symbolic link loop';
    if (code === 'ENOENT') return 'no such file or folder (or a broken symbolic link)';
    if (code === 'EACCES') return 'permission denied';
    return (e as Error).message;
  }
}

/** True when the file's first line says Thermoshift wrote it. */
export function writtenByThermoshift(path: string): boolean {
  let fd: number | undefined;
  try {
    fd = openSync(path, 'r');
    const buf = Buffer.alloc(64);
    const n = readSync(fd, buf, 0, buf.length, 0);
    return THERMOSHIFT_OUTPUT_LINE.test(buf.subarray(0, n).toString('utf8'));
  } catch {
    return false; // unreadable files are reported when they are read
  } finally {
    if (fd !== undefined) closeSync(fd);
  }
}

const byName = (a: string, b: string): number => a.localeCompare(b, 'en', { numeric: true });

/** The data files directly inside `folder`, and the entries skipped with the reason. */
export function folderDataFiles(folder: string): InputFileList {
  const files: string[] = [];
  const skipped: SkippedFile[] = [];
  for (const name of readdirSync(folder).sort(byName)) {
    if (name.startsWith('.')) continue; // hidden files and our own temporary folders
    const path = join(folder, name);
    const st = statOrReason(path);
    if (typeof st === 'string') {
      skipped.push({ path, reason: st });
      continue;
    }
    if (st.isDirectory()) continue; // folders are samples in batch, never data of one sample
    if (!DATA_FILE_PATTERN.test(name)) {
      skipped.push({ path, reason: `not a data file ending (${DATA_FILE_ENDINGS})` });
      continue;
    }
    const special = specialKind(st);
    if (special) skipped.push({ path, reason: special });
    else if (writtenByThermoshift(path)) skipped.push({ path, reason: 'written by Thermoshift' });
    else files.push(path);
  }
  return { files, skipped };
}

/**
 * Expands the paths of one sample; throws a one-line CliError naming a bad path (missing, a pipe
 * or device, a folder without data files).
 */
export function listInputFiles(paths: string[]): InputFileList {
  const files: string[] = [];
  const skipped: SkippedFile[] = [];
  const seen = new Set<string>();
  const add = (p: string): void => {
    let real = p;
    try {
      real = realpathSync(p);
    } catch {
      // keep the name: the read reports the problem
    }
    if (seen.has(real)) return;
    seen.add(real);
    files.push(p);
  };
  for (const p of paths) {
    const st = statOrReason(p);
    if (typeof st === 'string') throw new CliError(`${p}: ${st}`, EXIT.dataError);
    if (st.isDirectory()) {
      const inside = folderDataFiles(p);
      skipped.push(...inside.skipped);
      if (inside.files.length === 0)
        throw new CliError(
          `${p}: folder holds no data files (${DATA_FILE_ENDINGS})${
            inside.skipped.length
              ? `; skipped: ${inside.skipped.map((s) => `${s.path} (${s.reason})`).join(', ')}`
              : ''
          }`,
          EXIT.dataError,
        );
      inside.files.forEach(add);
      continue;
    }
    const special = specialKind(st);
    if (special)
      throw new CliError(`${p}: ${special}; only regular files are read`, EXIT.dataError);
    add(p);
  }
  return { files, skipped };
}

/** One stderr line per skipped file, the same wording in every command. */
export function skippedLines(skipped: SkippedFile[]): string {
  return skipped.map((s) => `skipped ${s.path}: ${s.reason}\n`).join('');
}
