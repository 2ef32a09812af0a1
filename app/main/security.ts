/**
 * Navigation and permission lock-down for every web contents the app creates: no navigation away
 * from the app, no new windows, no webviews, no permissions, no remote requests. Links to http(s)
 * pages open in the user's browser (as Electron Fiddle's safelyOpenWebURL does); nothing else does.
 */
import type { WebContents } from 'electron';

/** True only for absolute http: or https: URLs. */
export function isSafeExternalUrl(url: string): boolean {
  try {
    const u = new URL(url);
    return u.protocol === 'https:' || u.protocol === 'http:';
  } catch {
    return false;
  }
}

/** The part of WebContents the lock-down needs (so tests can pass a fake). */
export type LockableContents = Pick<WebContents, 'on' | 'setWindowOpenHandler'>;

export function lockDownContents(
  contents: LockableContents,
  openExternal: (url: string) => unknown,
): void {
  contents.on('will-navigate', (event) => event.preventDefault());
  contents.on('will-redirect', (event) => event.preventDefault());
  contents.on('will-attach-webview', (event) => event.preventDefault());
  contents.setWindowOpenHandler(({ url }) => {
    if (isSafeExternalUrl(url)) void openExternal(url);
    return { action: 'deny' };
  });
}

/** Requests the renderer may make: its own files, data/blob URLs, the dev server in development. */
export function isAllowedRequest(url: string, devUrl?: string): boolean {
  if (/^(file|data|blob|devtools|chrome-extension):/.test(url)) return true;
  if (devUrl) {
    try {
      return new URL(url).origin === new URL(devUrl).origin;
    } catch {
      return false;
    }
  }
  return false;
}
