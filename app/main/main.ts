/**
 * Electron main process: only wires the setupX() modules together (as Electron Fiddle does).
 */
import { app, BrowserWindow, ipcMain, protocol } from 'electron';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { registerAppScheme, serveAppFiles } from './app-protocol';
import { isTrustedSender, type AppWindowRef } from './ipc';
import { createRecentStore } from './recent-files';
import { rendererSource } from './renderer-source';
import { setupAutosave } from './setup-autosave';
import { setupFiles } from './setup-files';
import { setupSecurity } from './setup-security';
import { createMainWindow } from './window';

const here = fileURLToPath(new URL('.', import.meta.url));
/** The packaged app: ELECTRON_RENDERER_URL is ignored and DevTools are off. */
const packaged = app.isPackaged;
const source = rendererSource({ packaged, devUrl: process.env.ELECTRON_RENDERER_URL });

let win: BrowserWindow | null = null;
let appRef: AppWindowRef | null = null;

// Custom schemes must be declared before the app is ready.
registerAppScheme(protocol);
app.enableSandbox();

void app.whenReady().then(() => {
  // The session exists only once the app is ready; windows are made after this.
  serveAppFiles(protocol, join(here, '../renderer'));
  setupSecurity({ devUrl: source.devUrl, devTools: !packaged });
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
    win = createMainWindow(join(here, '../preload/preload.cjs'), source.url, {
      devTools: !packaged,
    });
    appRef = { webContentsId: win.webContents.id, origin: source.origin };
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
