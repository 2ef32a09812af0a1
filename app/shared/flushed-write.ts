/**
 * Writing a file so that a crash never leaves half of it — shared by the desktop app's main
 * process and the command line (Node only: the renderer must not import this file). The bytes are
 * written to a file, flushed to disk (fsync) and closed; `writeFileAtomic` writes them to a
 * temporary file beside the target first and renames it into place, and the CLI's output sets
 * write every file flushed into a staging folder that is then renamed in whole.
 */
import { closeSync, fsyncSync, openSync, writeSync } from 'node:fs';
import { open, rename } from 'node:fs/promises';

/**
 * Writes `bytes` to a new file at `path`, flushed to disk before it is closed. `exclusive`: fail
 * when the file already exists (a staging folder holds only fresh files).
 */
export function writeFlushedSync(path: string, bytes: Uint8Array, exclusive = true): void {
  const fd = openSync(path, exclusive ? 'wx' : 'w');
  try {
    let done = 0;
    while (done < bytes.length) done += writeSync(fd, bytes, done, bytes.length - done);
    fsyncSync(fd);
  } finally {
    closeSync(fd);
  }
}

/** Replaces the file at `path` with `bytes` as a whole: temporary file, flushed, renamed into place. */
export async function writeFileAtomic(path: string, bytes: Uint8Array): Promise<void> {
  const tmp = `${path}.${process.pid}.tmp`;
  const handle = await open(tmp, 'w');
  try {
    await handle.writeFile(bytes);
    await handle.sync();
  } finally {
    await handle.close();
  }
  await rename(tmp, path);
}
