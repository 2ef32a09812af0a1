/**
 * The one application window, with Electron's secure defaults spelled out (Electron security
 * checklist: context isolation, sandbox, no Node integration, web security on, no webview).
 */
import { BrowserWindow, type BrowserWindowConstructorOptions } from 'electron';

export function mainWindowOptions(preloadPath: string): BrowserWindowConstructorOptions {
  return {
    width: 1440,
    height: 920,
    minWidth: 980,
    minHeight: 640,
    show: false,
    title: 'Thermoshift',
    backgroundColor: '#f3f4f1',
    webPreferences: {
      preload: preloadPath,
      contextIsolation: true,
      sandbox: true,
      nodeIntegration: false,
      nodeIntegrationInWorker: false,
      nodeIntegrationInSubFrames: false,
      webSecurity: true,
      allowRunningInsecureContent: false,
      webviewTag: false,
      experimentalFeatures: false,
      navigateOnDragDrop: false,
      spellcheck: false,
    },
  };
}

/** Where the renderer comes from: the built file, or electron-vite's dev server in development. */
export interface RendererLocation {
  file: string;
  devUrl?: string;
}

export function createMainWindow(preloadPath: string, where: RendererLocation): BrowserWindow {
  const win = new BrowserWindow(mainWindowOptions(preloadPath));
  win.once('ready-to-show', () => win.show());
  if (where.devUrl) void win.loadURL(where.devUrl);
  else void win.loadFile(where.file);
  return win;
}
