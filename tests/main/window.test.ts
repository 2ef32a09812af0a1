import { describe, expect, it, vi } from 'vitest';

const made: {
  options: unknown;
  loadURL: ReturnType<typeof vi.fn>;
  loadFile: ReturnType<typeof vi.fn>;
}[] = [];
vi.mock('electron', () => ({
  BrowserWindow: class {
    loadURL = vi.fn(async () => undefined);
    loadFile = vi.fn(async () => undefined);
    once = vi.fn();
    constructor(public options: unknown) {
      made.push(this);
    }
  },
}));
const { createMainWindow, mainWindowOptions } = await import('../../app/main/window');

describe('mainWindowOptions()', () => {
  it('mainWindowOptions() keeps the renderer isolated, sandboxed and without Node', () => {
    const web = mainWindowOptions('/app/preload.cjs').webPreferences!;
    expect(web.preload).toBe('/app/preload.cjs');
    expect(web.contextIsolation).toBe(true);
    expect(web.sandbox).toBe(true);
    expect(web.nodeIntegration).toBe(false);
    expect(web.nodeIntegrationInWorker).toBe(false);
    expect(web.nodeIntegrationInSubFrames).toBe(false);
    expect(web.webSecurity).toBe(true);
    expect(web.allowRunningInsecureContent).toBe(false);
    expect(web.webviewTag).toBe(false);
    expect(web.navigateOnDragDrop).toBe(false);
  });

  it('mainWindowOptions() turns DevTools off unless an unpackaged run asks for them', () => {
    expect(mainWindowOptions('/p.cjs').webPreferences!.devTools).toBe(false);
    expect(mainWindowOptions('/p.cjs', { devTools: false }).webPreferences!.devTools).toBe(false);
    expect(mainWindowOptions('/p.cjs', { devTools: true }).webPreferences!.devTools).toBe(true);
  });
});

describe('createMainWindow()', () => {
  it('createMainWindow() loads the given app:// URL with loadURL, never a file', () => {
    made.length = 0;
    createMainWindow('/p.cjs', 'app://thermoshift/index.html');
    expect(made).toHaveLength(1);
    expect(made[0].loadURL).toHaveBeenCalledWith('app://thermoshift/index.html');
    expect(made[0].loadFile).not.toHaveBeenCalled();
    expect(made[0].options).toEqual(mainWindowOptions('/p.cjs'));
  });
});
