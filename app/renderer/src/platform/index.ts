/** Picks the FileAccess for where the renderer runs: Electron (window.thermoshift) or a browser. */
import type { ThermoshiftApi } from '../../../preload/api';
import { browserAccess } from './browser-access';
import { desktopAccess } from './desktop-access';
import type { FileAccess } from './file-access';
import { indexedDbStore, memoryStore } from './idb-store';

declare global {
  interface Window {
    /** Present only inside the desktop app (exposed by the preload script). */
    thermoshift?: ThermoshiftApi;
  }
}

export function detectFileAccess(): FileAccess {
  if (window.thermoshift) return desktopAccess(window.thermoshift);
  const store = typeof indexedDB === 'undefined' ? memoryStore() : indexedDbStore('thermoshift');
  let storage: Storage | null = null;
  try {
    storage = window.localStorage;
  } catch {
    storage = null;
  }
  return browserAccess(store, storage);
}

export type { FileAccess } from './file-access';
