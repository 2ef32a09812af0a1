/**
 * The wiring of main.ts with Electron mocked: the scheme is declared before `ready`, the window
 * loads app:// (the dev server only when unpackaged), and the request filter and the IPC sender
 * check follow the same decision.
 */
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import type { IpcMainInvokeEvent } from 'electron';
import { APP_SCHEME_PRIVILEGES } from '../../app/main/app-protocol';

type Listener = (...args: unknown[]) => unknown;

const h = vi.hoisted(() => {
  const state = {
    order: [] as string[],
    packaged: true,
    ready: false,
    windows: [] as { options: { webPreferences: Record<string, unknown> }; url?: string }[],
    handlers: new Map<string, Listener>(),
    protocolHandlers: new Map<string, (r: Request) => Promise<Response>>(),
    appEvents: new Map<string, Listener>(),
    requestFilter: undefined as undefined | Listener,
    permissionRequest: undefined as undefined | Listener,
    permissionCheck: undefined as undefined | Listener,
    resolveReady: () => undefined as void,
  };
  return { state };
});

vi.mock('electron', () => {
  const s = h.state;
  class BrowserWindow {
    static getAllWindows = () => s.windows;
    webContents = { id: 41 };
    url?: string;
    constructor(public options: { webPreferences: Record<string, unknown> }) {
      s.order.push('window');
      s.windows.push(this);
    }
    once() {}
    on() {}
    loadURL(url: string) {
      this.url = url;
      return Promise.resolve();
    }
    loadFile() {
      throw new Error('loadFile must not be used');
    }
  }
  return {
    BrowserWindow,
    app: {
      get isPackaged() {
        return s.packaged;
      },
      enableSandbox: () => s.order.push('enableSandbox'),
      whenReady: () =>
        new Promise<void>((r) => {
          s.resolveReady = () => {
            s.ready = true;
            r();
          };
        }),
      on: (name: string, fn: Listener) => s.appEvents.set(name, fn),
      getPath: () => '/tmp/thermoshift-main-test',
      quit: () => undefined,
    },
    protocol: {
      registerSchemesAsPrivileged: (schemes: unknown) => {
        if (s.ready) throw new Error('registerSchemesAsPrivileged after ready');
        s.order.push(`registerSchemesAsPrivileged ${JSON.stringify(schemes)}`);
      },
      handle: (scheme: string, fn: (r: Request) => Promise<Response>) => {
        if (!s.ready) throw new Error('protocol.handle before ready');
        s.order.push(`handle ${scheme}`);
        s.protocolHandlers.set(scheme, fn);
      },
    },
    ipcMain: { handle: (c: string, fn: Listener) => s.handlers.set(c, fn) },
    session: {
      defaultSession: {
        setPermissionRequestHandler: (fn: Listener) => (s.permissionRequest = fn),
        setPermissionCheckHandler: (fn: Listener) => (s.permissionCheck = fn),
        webRequest: { onBeforeRequest: (fn: Listener) => (s.requestFilter = fn) },
      },
    },
    shell: { openExternal: vi.fn() },
    dialog: {},
  };
});

const s = h.state;

async function start(packaged: boolean, devUrl?: string): Promise<void> {
  s.packaged = packaged;
  if (devUrl) process.env.ELECTRON_RENDERER_URL = devUrl;
  else delete process.env.ELECTRON_RENDERER_URL;
  await import('../../app/main/main');
  s.order.push('ready');
  s.resolveReady();
  await new Promise((r) => setTimeout(r, 0));
}

const allowed = (url: string): boolean => {
  let cancel = true;
  s.requestFilter!({ url }, (r: { cancel: boolean }) => (cancel = r.cancel));
  return !cancel;
};

function sender(url: string): IpcMainInvokeEvent {
  const mainFrame = { url };
  return { sender: { id: 41, mainFrame }, senderFrame: mainFrame } as unknown as IpcMainInvokeEvent;
}

const autosaveFrom = async (url: string) =>
  (await s.handlers.get('autosave:read')!(sender(url), undefined)) as { ok: boolean };

const saved = process.env.ELECTRON_RENDERER_URL;
beforeEach(() => {
  vi.resetModules();
  vi.spyOn(console, 'error').mockImplementation(() => undefined); // refused senders are logged
  Object.assign(s, {
    order: [],
    ready: false,
    windows: [],
    handlers: new Map(),
    protocolHandlers: new Map(),
    appEvents: new Map(),
    requestFilter: undefined,
  });
});
afterEach(() => {
  vi.restoreAllMocks();
  if (saved === undefined) delete process.env.ELECTRON_RENDERER_URL;
  else process.env.ELECTRON_RENDERER_URL = saved;
});

describe('main.ts', () => {
  it('main.ts declares app:// as privileged before ready and serves it after ready', async () => {
    await start(true);
    expect(
      s.order.indexOf(`registerSchemesAsPrivileged ${JSON.stringify([APP_SCHEME_PRIVILEGES])}`),
    ).toBe(0);
    expect(s.order.indexOf('handle app')).toBeGreaterThan(s.order.indexOf('ready'));
    expect(s.order.indexOf('handle app')).toBeLessThan(s.order.indexOf('window'));
    // Bound to the renderer folder next to main (app/renderer from the sources here).
    const res = await s.protocolHandlers.get('app')!(new Request('app://thermoshift/index.html'));
    expect(res.status).toBe(200);
    expect(await res.text()).toContain('Content-Security-Policy');
  });

  it('main.ts in a packaged app loads app:// and ignores ELECTRON_RENDERER_URL everywhere', async () => {
    await start(true, 'http://localhost:5173/');
    expect(s.windows).toHaveLength(1);
    expect(s.windows[0].url).toBe('app://thermoshift/index.html');
    expect(s.windows[0].options.webPreferences.devTools).toBe(false);
    expect(allowed('app://thermoshift/assets/index.js')).toBe(true);
    expect(allowed('http://localhost:5173/src/main.ts')).toBe(false);
    expect(allowed('devtools://devtools/bundled/inspector.html')).toBe(false);
    expect(allowed('chrome-extension://abc/x.js')).toBe(false);
    expect(allowed('file:///etc/passwd')).toBe(false);
    expect((await autosaveFrom('app://thermoshift/index.html')).ok).toBe(true);
    expect((await autosaveFrom('http://localhost:5173/')).ok).toBe(false);
  });

  it('main.ts unpackaged with ELECTRON_RENDERER_URL loads the dev server and trusts only its origin', async () => {
    await start(false, 'http://localhost:5173/');
    expect(s.windows[0].url).toBe('http://localhost:5173/');
    expect(s.windows[0].options.webPreferences.devTools).toBe(true);
    expect(allowed('http://localhost:5173/src/main.ts')).toBe(true);
    expect(allowed('devtools://devtools/bundled/inspector.html')).toBe(true);
    expect(allowed('http://localhost:5174/x.js')).toBe(false);
    expect(allowed('file:///etc/passwd')).toBe(false);
    expect((await autosaveFrom('http://localhost:5173/index.html')).ok).toBe(true);
    expect((await autosaveFrom('http://localhost:5174/')).ok).toBe(false);
    expect((await autosaveFrom('app://thermoshift/index.html')).ok).toBe(false);
  });

  it('main.ts unpackaged without a dev server loads app:// with DevTools available', async () => {
    await start(false);
    expect(s.windows[0].url).toBe('app://thermoshift/index.html');
    expect(s.windows[0].options.webPreferences.devTools).toBe(true);
    expect(allowed('http://localhost:5173/x.js')).toBe(false);
  });

  it('main.ts refuses every permission and locks down every web contents', async () => {
    await start(true);
    let granted: boolean | undefined;
    s.permissionRequest!(null, 'media', (ok: boolean) => (granted = ok));
    expect(granted).toBe(false);
    expect(s.permissionCheck!(null, 'clipboard-read')).toBe(false);
    const events: string[] = [];
    s.appEvents.get('web-contents-created')!(
      {},
      { on: (name: string) => events.push(name), setWindowOpenHandler: () => undefined },
    );
    expect(events).toEqual(
      expect.arrayContaining(['will-navigate', 'will-frame-navigate', 'will-attach-webview']),
    );
  });
});
