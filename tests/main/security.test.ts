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
    ['http://example.org', true],
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

  it('lockDownContents() denies every new window and hands only http(s) links to the browser', () => {
    const openExternal = vi.fn();
    const f = fakeContents();
    lockDownContents(f.contents, openExternal);
    expect(f.open('https://example.org/')).toEqual({ action: 'deny' });
    expect(f.open('file:///home/user/secret.txt')).toEqual({ action: 'deny' });
    expect(openExternal).toHaveBeenCalledTimes(1);
    expect(openExternal).toHaveBeenCalledWith('https://example.org/');
  });
});

describe('isAllowedRequest()', () => {
  it('isAllowedRequest() lets the app load its own files and refuses remote content', () => {
    expect(isAllowedRequest('file:///opt/thermoshift/out/renderer/index.html')).toBe(true);
    expect(isAllowedRequest('data:image/png;base64,AAAA')).toBe(true);
    expect(isAllowedRequest('https://cdn.example.org/lib.js')).toBe(false);
    expect(isAllowedRequest('http://localhost:5173/src/main.ts')).toBe(false);
  });

  it('isAllowedRequest() allows the dev server origin only when one is given', () => {
    expect(isAllowedRequest('http://localhost:5173/x.js', 'http://localhost:5173/')).toBe(true);
    expect(isAllowedRequest('http://localhost:5174/x.js', 'http://localhost:5173/')).toBe(false);
  });
});
