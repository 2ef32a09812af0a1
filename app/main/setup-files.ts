/**
 * File handlers: open data files, save exports, open/save an analysis, recent files. Every path is
 * chosen here through a native dialog; the renderer only proposes a bare file name.
 */
import { dialog, type BrowserWindow, type FileFilter } from 'electron';
import { extname } from 'node:path';
import { handleChannel, type HandleOptions } from './ipc';
import type { RecentStore } from './recent-files';
import type { RecentKind } from '../shared/ipc-channels';
import { dataFilesInFolder, readDataFiles, readTextFile, writeFileAtomic } from './text-files';

const DATA_FILTERS: FileFilter[] = [
  { name: 'Measurement tables', extensions: ['csv', 'txt', 'tsv', 'dat', 'asc', 'xlsx'] },
  { name: 'All files', extensions: ['*'] },
];
const ANALYSIS_FILTERS: FileFilter[] = [
  // Extensions are matched after the last dot, so "*.thermoshift.json" files fall under json.
  { name: 'Thermoshift analysis', extensions: ['json'] },
];

function filtersFor(name: string): FileFilter[] {
  const ext = extname(name).slice(1).toLowerCase();
  return ext ? [{ name: ext.toUpperCase(), extensions: [ext] }] : [];
}

export interface FileSetup extends HandleOptions {
  getWindow: () => BrowserWindow | null;
  recent: RecentStore;
}

export function setupFiles({ getWindow, recent, ...ipc }: FileSetup): void {
  // Files picked (or reopened) but not yet known to have opened: the renderer confirms with
  // recent:confirm once they did, and only then are they listed under Recent.
  const pending: Partial<Record<RecentKind, string[]>> = {};
  const parent = (): BrowserWindow => {
    const w = getWindow();
    if (!w) throw new Error('The Thermoshift window is not open.');
    return w;
  };

  handleChannel(
    'data-files:open',
    async () => {
      const r = await dialog.showOpenDialog(parent(), {
        title: 'Open measurement files',
        properties: ['openFile', 'multiSelections'],
        filters: DATA_FILTERS,
      });
      if (r.canceled || r.filePaths.length === 0) return [];
      const files = await readDataFiles(r.filePaths);
      pending.data = r.filePaths;
      return files;
    },
    ipc,
  );

  handleChannel(
    'data-folder:open',
    async () => {
      const r = await dialog.showOpenDialog(parent(), {
        title: 'Open a folder of measurement files',
        properties: ['openDirectory'],
      });
      if (r.canceled || r.filePaths.length === 0) return [];
      const paths = await dataFilesInFolder(r.filePaths[0]);
      const files = await readDataFiles(paths);
      pending.data = paths;
      return files;
    },
    ipc,
  );

  handleChannel(
    'file:save',
    async ({ suggestedName, content, encoding }) => {
      const r = await dialog.showSaveDialog(parent(), {
        title: 'Export',
        defaultPath: suggestedName,
        filters: filtersFor(suggestedName),
      });
      if (r.canceled || !r.filePath) return null;
      await writeFileAtomic(r.filePath, content, encoding);
      return { name: r.filePath.split(/[/\\]/).pop() ?? suggestedName };
    },
    ipc,
  );

  handleChannel(
    'analysis:open',
    async () => {
      const r = await dialog.showOpenDialog(parent(), {
        title: 'Open analysis',
        properties: ['openFile'],
        filters: ANALYSIS_FILTERS,
      });
      if (r.canceled || r.filePaths.length === 0) return null;
      const file = await readTextFile(r.filePaths[0]);
      pending.analysis = [r.filePaths[0]];
      return file;
    },
    ipc,
  );

  handleChannel(
    'analysis:save',
    async ({ suggestedName, text }) => {
      const r = await dialog.showSaveDialog(parent(), {
        title: 'Save analysis',
        defaultPath: suggestedName,
        filters: ANALYSIS_FILTERS,
      });
      if (r.canceled || !r.filePath) return null;
      await writeFileAtomic(r.filePath, text);
      await recent.remember('analysis', [r.filePath]);
      return { name: r.filePath.split(/[/\\]/).pop() ?? suggestedName };
    },
    ipc,
  );

  handleChannel('recent:list', () => recent.list(), ipc);

  handleChannel(
    'recent:open',
    async ({ id }) => {
      const { kind, paths } = await recent.paths(id);
      const files = kind === 'data' ? await readDataFiles(paths) : [await readTextFile(paths[0])];
      pending[kind] = paths;
      return { kind, files };
    },
    ipc,
  );

  handleChannel(
    'recent:confirm',
    async ({ kind }) => {
      const paths = pending[kind];
      delete pending[kind];
      if (paths) await recent.remember(kind, paths);
      return true as const;
    },
    ipc,
  );
}
