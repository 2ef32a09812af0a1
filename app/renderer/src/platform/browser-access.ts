/**
 * FileAccess for the plain browser: an <input type="file"> to open, a Blob link to download,
 * IndexedDB for recent files (their text is kept, since a web page cannot reopen a path) and
 * localStorage for the autosave (IndexedDB when it is too large for localStorage).
 */
import type { FileAccess, RecentEntry, TextFile } from './file-access';
import { byName, isDataFileName, readFiles } from './file-access';
import type { KeyValueStore } from './idb-store';

export const AUTOSAVE_KEY = 'thermoshift.autosave';
export const MAX_RECENT = 8;

interface StoredRecent extends RecentEntry {
  files: TextFile[];
}

/** Opens the browser's file picker; resolves [] when the user cancels. */
export function pickFiles(accept: string, multiple: boolean): Promise<TextFile[]> {
  return new Promise((resolve, reject) => {
    const input = document.createElement('input');
    input.type = 'file';
    input.accept = accept;
    input.multiple = multiple;
    input.style.display = 'none';
    input.dataset.role = multiple ? 'pick-data-files' : 'pick-analysis';
    const done = (files: TextFile[]): void => {
      input.remove();
      resolve(files);
    };
    input.addEventListener(
      'change',
      () =>
        void readFiles(input.files ?? []).then(done, (e: unknown) => {
          input.remove();
          reject(e instanceof Error ? e : new Error(String(e)));
        }),
    );
    input.addEventListener('cancel', () => done([]));
    document.body.append(input);
    input.click();
  });
}

/**
 * Opens the browser's folder picker (<input webkitdirectory>) and reads the data files directly
 * inside the chosen folder (sub-folders are left alone, as on the desktop and the command line);
 * resolves [] when the user cancels. A folder without data files is an error that says so.
 */
export function pickFolder(): Promise<TextFile[]> {
  return new Promise((resolve, reject) => {
    const input = document.createElement('input');
    input.type = 'file';
    input.webkitdirectory = true;
    input.style.display = 'none';
    input.dataset.role = 'pick-data-folder';
    const done = (): void => input.remove();
    input.addEventListener('change', () => {
      const all = [...(input.files ?? [])];
      const inside = all.filter((f) => {
        const parts = (f.webkitRelativePath || f.name).split('/');
        return parts.length <= 2 && isDataFileName(f.name);
      });
      done();
      if (all.length > 0 && inside.length === 0) {
        const folder = all[0].webkitRelativePath.split('/')[0] || 'chosen';
        reject(
          new Error(
            `the ${folder} folder holds no data files (.csv, .tsv, .txt, .dat, .asc, .xlsx).`,
          ),
        );
        return;
      }
      void readFiles(byName(inside)).then(resolve, reject);
    });
    input.addEventListener('cancel', () => {
      done();
      resolve([]);
    });
    document.body.append(input);
    input.click();
  });
}

const MIME: Record<string, string> = {
  png: 'image/png',
  zip: 'application/zip',
  svg: 'image/svg+xml',
  csv: 'text/csv;charset=utf-8',
  html: 'text/html;charset=utf-8',
  json: 'application/json',
};

/** Starts a download of `content` (text, or bytes as base64) under `name`. */
export function downloadBlob(name: string, content: string, encoding: 'utf8' | 'base64'): void {
  const bytes =
    encoding === 'base64' ? Uint8Array.from(atob(content), (c) => c.charCodeAt(0)) : content;
  const type = MIME[name.split('.').pop()?.toLowerCase() ?? ''] ?? 'text/plain;charset=utf-8';
  const url = URL.createObjectURL(new Blob([bytes], { type }));
  const a = document.createElement('a');
  a.href = url;
  a.download = name;
  a.style.display = 'none';
  document.body.append(a);
  a.click();
  a.remove();
  setTimeout(() => URL.revokeObjectURL(url), 10_000);
}

function label(files: TextFile[]): string {
  return files.length > 1 ? `${files[0].name} + ${files.length - 1} more` : (files[0]?.name ?? '');
}

export function browserAccess(store: KeyValueStore, storage: Storage | null): FileAccess {
  const loadRecent = async (): Promise<StoredRecent[]> =>
    (await store.get<StoredRecent[]>('recent').catch(() => undefined)) ?? [];
  const remember = async (kind: RecentEntry['kind'], files: TextFile[]): Promise<void> => {
    if (files.length === 0) return;
    const key = label(files);
    const rest = (await loadRecent()).filter((e) => !(e.label === key && e.kind === kind));
    const entry: StoredRecent = {
      id: `r${Date.now().toString(36)}${Math.floor(Math.random() * 1e6).toString(36)}`,
      kind,
      label: key,
      openedAt: new Date().toISOString(),
      files,
    };
    await store.set('recent', [entry, ...rest].slice(0, MAX_RECENT)).catch(() => undefined);
  };
  return {
    kind: 'browser',
    openDataFiles: () => pickFiles('.csv,.txt,.tsv,.dat,.asc,.xlsx,text/*', true),
    openDataFolder: () => pickFolder(),
    async openAnalysis() {
      const [file] = await pickFiles('.json,application/json', false);
      return file ?? null;
    },
    async saveFile({ suggestedName, content, encoding }) {
      downloadBlob(suggestedName, content, encoding);
      return suggestedName;
    },
    async saveAnalysis(name, text) {
      downloadBlob(name, text, 'utf8');
      return name;
    },
    async listRecent() {
      return (await loadRecent()).map(({ id, kind, label: l, openedAt }) => ({
        id,
        kind,
        label: l,
        openedAt,
      }));
    },
    async openRecent(id) {
      const e = (await loadRecent()).find((x) => x.id === id);
      if (!e) throw new Error('That recent file is no longer in the list.');
      return { kind: e.kind, files: e.files };
    },
    rememberRecent: (kind, files) => remember(kind, files),
    async writeAutosave(text) {
      try {
        storage?.setItem(AUTOSAVE_KEY, text);
        await store.set(AUTOSAVE_KEY, null).catch(() => undefined);
      } catch {
        // localStorage is full (a few MB): keep the autosave in IndexedDB instead.
        storage?.removeItem(AUTOSAVE_KEY);
        await store.set(AUTOSAVE_KEY, text);
      }
    },
    async readAutosave() {
      const big = await store.get<string | null>(AUTOSAVE_KEY).catch(() => undefined);
      return big ?? storage?.getItem(AUTOSAVE_KEY) ?? null;
    },
  };
}
