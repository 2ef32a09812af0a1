/**
 * The narrow, task-shaped API the renderer gets as `window.thermoshift`. Built from an `invoke`
 * function so it can be tested without Electron; preload.ts passes ipcRenderer.invoke, never
 * ipcRenderer itself. The renderer's type for it is derived from this object (`ThermoshiftApi`).
 */
import type {
  IpcChannel,
  IpcRequest,
  IpcResponse,
  RecentKind,
  SaveFileRequest,
} from '../shared/ipc-channels';
import type { IpcResult } from '../shared/ipc-result';

export type Invoke = <C extends IpcChannel>(
  channel: C,
  request: IpcRequest<C>,
) => Promise<IpcResult<IpcResponse<C>>>;

export function createApi(invoke: Invoke) {
  return {
    /** Shows an open dialog for data files and returns their names and text. */
    openDataFiles: () => invoke('data-files:open', undefined),
    /** Shows a folder dialog and returns the data files inside it (names and text). */
    openDataFolder: () => invoke('data-folder:open', undefined),
    /** Shows a save dialog and writes an export. */
    saveFile: (request: SaveFileRequest) => invoke('file:save', request),
    /** Shows an open dialog for a saved analysis. */
    openAnalysis: () => invoke('analysis:open', undefined),
    /** Shows a save dialog and writes the analysis file. */
    saveAnalysis: (suggestedName: string, text: string) =>
      invoke('analysis:save', { suggestedName, text }),
    /** Files opened recently (most recent first). */
    listRecent: () => invoke('recent:list', undefined),
    /** Reads a recent entry again. */
    openRecent: (id: string) => invoke('recent:open', { id }),
    /** The files last picked or reopened for `kind` opened: list them under Recent. */
    confirmRecent: (kind: RecentKind) => invoke('recent:confirm', { kind }),
    /** Keeps the current analysis on disk so a crash loses nothing. */
    writeAutosave: (text: string) => invoke('autosave:write', { text }),
    /** The analysis kept by the last autosave, or null. */
    readAutosave: () => invoke('autosave:read', undefined),
  };
}

export type ThermoshiftApi = ReturnType<typeof createApi>;

/** Names of the functions exposed; the preload test checks the object has exactly these. */
export const API_FUNCTIONS = [
  'openDataFiles',
  'openDataFolder',
  'saveFile',
  'openAnalysis',
  'saveAnalysis',
  'listRecent',
  'openRecent',
  'confirmRecent',
  'writeAutosave',
  'readAutosave',
] as const satisfies readonly (keyof ThermoshiftApi)[];
