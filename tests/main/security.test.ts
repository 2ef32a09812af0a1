import { describe, expect, it, vi } from 'vitest';
import {
  isAllowedRequest,
  isSafeExternalUrl,
  lockDownContents,
  type LockableContents,
} from '../../app/main/security';

type Listener = (event: { preventDefault: () => void }) => void;

function fakeContents() {
  const listeners = new Map<string, Listener>();
  let openHandler: ((d: { url: string }) => { action: string }) | undefined;
  const contents = {
    on: (name: string, fn: Listener) => listeners.set(name, fn),
    setWindowOpenHandler: (fn: typeof openHandler) => (openHandler = fn),
  } as unknown as LockableContents;
  const fire = (name: string): boolean => {
    let prevented = false;
    listeners.get(name)?.({ preventDefault: () => (prevented = true) });
    return prevented;
  };
  return { contents, fire, open: (url: string) => openHandler!({ url }) };
}

describe('isSafeExternalUrl()', () => {
  it.each([
    ['https://example.org/docs', true],
    ['http://example.org', false],
    ['file:///etc/passwd', false],
    ['javascript:alert(1)', false],
    ['smb://server/share', false],
    ['not a url', false],
  ])('isSafeExternalUrl(%s) is %s', (url, ok) => expect(isSafeExternalUrl(url)).toBe(ok));
});

describe('lockDownContents()', () => {
  it('lockDownContents() prevents navigation, redirects and webviews', () => {
    const f = fakeContents();
    lockDownContents(f.contents, vi.fn());
    expect(f.fire('will-navigate')).toBe(true);
    expect(f.fire('will-redirect')).toBe(true);
    expect(f.fire('will-attach-webview')).toBe(true);
  });

  it('lockDownContents() prevents navigation in any frame (will-frame-navigate)', () => {
    const f = fakeContents();
    lockDownContents(f.contents, vi.fn());
    expect(f.fire('will-frame-navigate')).toBe(true);
  });

  it('lockDownContents() denies every new window and hands only http(s) links to the browser', () => {
    const openExternal = vi.fn();
    const f = fakeContents();
    lockDownContents(f.contents, openExternal);
    expect(f.open('https://example.org/')).toEqual({ action: 'deny' });
    expect(f.open('file:///home/user/secret.txt')).toEqual({ action: 'deny' });
    expect(openExternal).toHaveBeenCalledTimes(1);
    expect(openExternal).toHaveBeenCalledWith('https://example.org/');
  });

  it('lockDownContents() never hands plain http, mail or custom-scheme links to the browser', () => {
    const openExternal = vi.fn();
    const f = fakeContents();
    lockDownContents(f.contents, openExternal);
    for (const url of [
      'http://example.org/',
      'mailto:a@b.c',
      'smb://server/x',
      'app://thermoshift/',
    ])
      expect(f.open(url)).toEqual({ action: 'deny' });
    expect(openExternal).not.toHaveBeenCalled();
  });
});

describe('isAllowedRequest()', () => {
  it('isAllowedRequest() lets the app load its own files and refuses remote content', () => {
    expect(isAllowedRequest('app://thermoshift/index.html')).toBe(true);
    expect(isAllowedRequest('file:///opt/thermoshift/out/renderer/index.html')).toBe(false);
    expect(isAllowedRequest('data:image/png;base64,AAAA')).toBe(true);
    expect(isAllowedRequest('https://cdn.example.org/lib.js')).toBe(false);
    expect(isAllowedRequest('http://localhost:5173/src/main.ts')).toBe(false);
  });

  it('isAllowedRequest() allows the dev server origin only when one is given', () => {
    const dev = { devUrl: 'http://localhost:5173/' };
    expect(isAllowedRequest('http://localhost:5173/x.js', dev)).toBe(true);
    expect(isAllowedRequest('http://localhost:5174/x.js', dev)).toBe(false);
  });

  it('isAllowedRequest() refuses every file: URL, other app hosts and other schemes', () => {
    for (const url of [
      'file:///etc/passwd',
      'file:///opt/thermoshift/resources/app.asar/out/renderer/index.html',
      'FILE:///C:/Windows/win.ini',
      'app://other/index.html',
      'app://thermoshift.evil/x.js',
      'ws://localhost:5173/',
      'ftp://example.org/x',
      'javascript:alert(1)',
    ])
      expect(isAllowedRequest(url), url).toBe(false);
    expect(isAllowedRequest('blob:app://thermoshift/1234')).toBe(true);
  });

  it('isAllowedRequest() refuses devtools: and chrome-extension: unless DevTools are allowed', () => {
    for (const url of [
      'devtools://devtools/bundled/inspector.html',
      'chrome-extension://abc/x.js',
    ]) {
      expect(isAllowedRequest(url), url).toBe(false);
      expect(isAllowedRequest(url, { devUrl: 'http://localhost:5173/' }), url).toBe(false);
      expect(isAllowedRequest(url, { devTools: true }), url).toBe(true);
    }
  });

  it("isAllowedRequest() lets the dev server's HMR socket through only in a dev run", () => {
    const dev = { devUrl: 'http://localhost:5173/' };
    expect(isAllowedRequest('ws://localhost:5173/?token=x', dev)).toBe(true);
    expect(isAllowedRequest('ws://localhost:5174/', dev)).toBe(false);
    expect(isAllowedRequest('wss://localhost:5173/', dev)).toBe(false);
    expect(isAllowedRequest('ws://localhost:5173/')).toBe(false);
  });
});
