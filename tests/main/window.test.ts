import { describe, expect, it, vi } from 'vitest';

vi.mock('electron', () => ({ BrowserWindow: class {} }));
const { mainWindowOptions } = await import('../../app/main/window');

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
});
