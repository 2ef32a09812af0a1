/** FileAccess through the preload API (`window.thermoshift`): Electron main does the file work. */
import type { ThermoshiftApi } from '../../../preload/api';
import type { IpcResult } from '../../../shared/ipc-result';
import type { FileAccess } from './file-access';

async function unwrap<T>(p: Promise<IpcResult<T>>): Promise<T> {
  const r = await p;
  if (!r.ok) throw new Error(r.message);
  return r.value;
}

export function desktopAccess(api: ThermoshiftApi): FileAccess {
  return {
    kind: 'desktop',
    openDataFiles: () => unwrap(api.openDataFiles()),
    openDataFolder: () => unwrap(api.openDataFolder()),
    openAnalysis: () => unwrap(api.openAnalysis()),
    saveFile: async (req) => (await unwrap(api.saveFile(req)))?.name ?? null,
    saveAnalysis: async (name, text) => (await unwrap(api.saveAnalysis(name, text)))?.name ?? null,
    listRecent: () => unwrap(api.listRecent()),
    openRecent: (id) => unwrap(api.openRecent(id)),
    // Main cannot remember dropped files: it never learns their paths, by design.
    rememberRecent: async (kind, _files, picked) => {
      if (picked) await unwrap(api.confirmRecent(kind));
    },
    writeAutosave: async (text) => void (await unwrap(api.writeAutosave(text))),
    readAutosave: () => unwrap(api.readAutosave()),
  };
}
