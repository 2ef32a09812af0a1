/**
 * Recent files, remembered in main (userData/recent-files.json). The renderer sees ids and labels
 * only; the paths stay here, so the renderer can never name a path itself.
 */
import { randomUUID } from 'node:crypto';
import { readFile } from 'node:fs/promises';
import { basename } from 'node:path';
import type { RecentEntry, RecentKind } from '../shared/ipc-channels';
import { writeFileAtomic } from './text-files';

export const MAX_RECENT = 10;

interface StoredEntry extends RecentEntry {
  paths: string[];
}

export interface RecentStore {
  list(): Promise<RecentEntry[]>;
  remember(kind: RecentKind, paths: string[]): Promise<void>;
  /** The paths of an entry, or throws when the id is unknown. */
  paths(id: string): Promise<{ kind: RecentKind; paths: string[] }>;
}

export function recentLabel(paths: string[]): string {
  const first = basename(paths[0] ?? '');
  return paths.length > 1 ? `${first} + ${paths.length - 1} more` : first;
}

export function createRecentStore(
  storePath: string,
  now: () => Date = () => new Date(),
): RecentStore {
  const load = async (): Promise<StoredEntry[]> => {
    try {
      const parsed: unknown = JSON.parse(await readFile(storePath, 'utf8'));
      return Array.isArray(parsed) ? (parsed as StoredEntry[]) : [];
    } catch {
      return [];
    }
  };
  return {
    async list() {
      return (await load()).map(({ id, kind, label, openedAt }) => ({ id, kind, label, openedAt }));
    },
    async remember(kind, paths) {
      const key = JSON.stringify(paths);
      const rest = (await load()).filter((e) => JSON.stringify(e.paths) !== key);
      const entry: StoredEntry = {
        id: randomUUID(),
        kind,
        label: recentLabel(paths),
        openedAt: now().toISOString(),
        paths,
      };
      await writeFileAtomic(storePath, JSON.stringify([entry, ...rest].slice(0, MAX_RECENT)));
    },
    async paths(id) {
      const e = (await load()).find((x) => x.id === id);
      if (!e) throw new Error('That recent file is no longer in the list.');
      return { kind: e.kind, paths: e.paths };
    },
  };
}
