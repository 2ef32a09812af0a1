/** Autosave: the renderer hands over the current analysis; main keeps it in userData. */
import { readFile } from 'node:fs/promises';
import { handleChannel, type HandleOptions } from './ipc';
import { writeFileAtomic } from './text-files';

export function setupAutosave(autosavePath: string, ipc: HandleOptions): void {
  handleChannel(
    'autosave:write',
    async ({ text }) => {
      await writeFileAtomic(autosavePath, text);
      return true as const;
    },
    ipc,
  );
  handleChannel(
    'autosave:read',
    async () => {
      try {
        return await readFile(autosavePath, 'utf8');
      } catch {
        return null;
      }
    },
    ipc,
  );
}
