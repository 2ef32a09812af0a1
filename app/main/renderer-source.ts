/**
 * Where the window's page comes from, decided once at start-up. A packaged app always loads its
 * own files from app://; electron-vite's dev server (ELECTRON_RENDERER_URL) is honoured only when
 * the app is not packaged, so an environment variable can never point an installed app at another
 * page and have it trusted for IPC.
 */
import { APP_ENTRY_URL, APP_ORIGIN } from './app-protocol';

export interface RendererSource {
  /** What the window loads. */
  url: string;
  /** The only origin whose main frame may call IPC, e.g. app://thermoshift. */
  origin: string;
  /** URL of the dev server when one is used (never in a packaged app). */
  devUrl?: string;
}

export interface RendererSourceInput {
  /** `app.isPackaged`. */
  packaged: boolean;
  /** `process.env.ELECTRON_RENDERER_URL`. */
  devUrl?: string;
}

/** An http(s) URL with a host, or null. */
function devServerUrl(devUrl: string | undefined): URL | null {
  if (!devUrl) return null;
  try {
    const u = new URL(devUrl);
    return (u.protocol === 'http:' || u.protocol === 'https:') && u.host ? u : null;
  } catch {
    return null;
  }
}

export function rendererSource({ packaged, devUrl }: RendererSourceInput): RendererSource {
  const dev = packaged ? null : devServerUrl(devUrl);
  if (!dev) return { url: APP_ENTRY_URL, origin: APP_ORIGIN };
  return { url: dev.href, origin: dev.origin, devUrl: dev.href };
}
