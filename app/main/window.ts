/**
 * The one application window, with Electron's secure defaults spelled out (Electron security
 * checklist: context isolation, sandbox, no Node integration, web security on, no webview).
 */
import { BrowserWindow, type BrowserWindowConstructorOptions } from 'electron';

export interface MainWindowSettings {
  /** Whether DevTools can be opened: only when the app is not packaged. @default false */
  devTools?: boolean;
}

export function mainWindowOptions(
  preloadPath: string,
  { devTools = false }: MainWindowSettings = {},
): BrowserWindowConstructorOptions {
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
      devTools,
    },
  };
}

/** Opens the window on `url`: app://thermoshift/index.html, or the dev server when unpackaged. */
export function createMainWindow(
  preloadPath: string,
  url: string,
  settings: MainWindowSettings = {},
): BrowserWindow {
  const win = new BrowserWindow(mainWindowOptions(preloadPath, settings));
  win.once('ready-to-show', () => win.show());
  void win.loadURL(url);
  return win;
}
