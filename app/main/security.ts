/**
 * Navigation and permission lock-down for every web contents the app creates: no navigation away
 * from the app in any frame, no new windows, no webviews, no permissions, no remote requests.
 * Links to https pages open in the user's browser (as Electron Fiddle's safelyOpenWebURL does);
 * nothing else does.
 */
import type { WebContents } from 'electron';
import { APP_ORIGIN } from './app-protocol';
import { isSameOrigin } from './origin';

/**
 * True only for absolute https: URLs, the only links handed to shell.openExternal. Plain http:
 * is refused: it can be read and altered on the way, and the app links only to https pages.
 */
export function isSafeExternalUrl(url: string): boolean {
  try {
    return new URL(url).protocol === 'https:';
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
  // will-navigate covers the main frame only; iframes navigate through will-frame-navigate.
  contents.on('will-frame-navigate', (event) => event.preventDefault());
  contents.on('will-redirect', (event) => event.preventDefault());
  contents.on('will-attach-webview', (event) => event.preventDefault());
  contents.setWindowOpenHandler(({ url }) => {
    if (isSafeExternalUrl(url)) void openExternal(url);
    return { action: 'deny' };
  });
}

/** What the request filter lets through besides the app's own app:// files. */
export interface RequestPolicy {
  /** The dev server's URL; set only when the app is not packaged (renderer-source.ts). */
  devUrl?: string;
  /** Whether DevTools (devtools:, chrome-extension:) may load; only when not packaged. */
  devTools?: boolean;
}

/** The dev server's HMR socket: ws(s) to the dev server's host and port. */
function isDevSocket(url: string, devUrl: string): boolean {
  try {
    const dev = new URL(devUrl);
    const ws = dev.protocol === 'https:' ? 'wss:' : 'ws:';
    return isSameOrigin(url, `${ws}//${dev.host}`);
  } catch {
    return false;
  }
}

/**
 * Requests the renderer may make: its own app:// files and data/blob URLs; in an unpackaged run
 * also the dev server (and its HMR socket) and DevTools. Every file: URL and every other host is
 * refused.
 */
export function isAllowedRequest(url: string, policy: RequestPolicy = {}): boolean {
  if (/^(data|blob):/i.test(url)) return true;
  if (isSameOrigin(url, APP_ORIGIN)) return true;
  if (policy.devTools && /^(devtools|chrome-extension):/i.test(url)) return true;
  if (policy.devUrl) return isSameOrigin(url, policy.devUrl) || isDevSocket(url, policy.devUrl);
  return false;
}
