/**
 * Electron main process: only wires the setupX() modules together (as Electron Fiddle does).
 */
import { app, BrowserWindow, ipcMain } from 'electron';
import { join } from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';
import { isTrustedSender, type AppWindowRef } from './ipc';
import { createRecentStore } from './recent-files';
import { setupAutosave } from './setup-autosave';
import { setupFiles } from './setup-files';
import { setupSecurity } from './setup-security';
import { createMainWindow } from './window';

const here = fileURLToPath(new URL('.', import.meta.url));
const rendererFile = join(here, '../renderer/index.html');
const devUrl = process.env.ELECTRON_RENDERER_URL;

let win: BrowserWindow | null = null;
let appRef: AppWindowRef | null = null;

app.enableSandbox();

void app.whenReady().then(() => {
  // The session exists only once the app is ready; windows are made after this.
  setupSecurity(devUrl);
  const ipc = {
    ipcMain,
    isTrusted: (e: Electron.IpcMainInvokeEvent) => isTrustedSender(e, appRef),
  };
  const userData = app.getPath('userData');
  setupFiles({
    ...ipc,
    getWindow: () => win,
    recent: createRecentStore(join(userData, 'recent-files.json')),
  });
  setupAutosave(join(userData, 'autosave.thermoshift.json'), ipc);

  const open = (): void => {
    win = createMainWindow(join(here, '../preload/preload.cjs'), { file: rendererFile, devUrl });
    appRef = {
      webContentsId: win.webContents.id,
      urlPrefix: devUrl ? new URL(devUrl).origin : pathToFileURL(join(here, '../renderer/')).href,
    };
    win.on('closed', () => {
      win = null;
      appRef = null;
    });
  };
  open();
  app.on('activate', () => {
    if (BrowserWindow.getAllWindows().length === 0) open();
  });
});

app.on('window-all-closed', () => {
  if (process.platform !== 'darwin') app.quit();
});
