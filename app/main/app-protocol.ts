/**
 * The `app://thermoshift/` scheme the window loads from instead of file:// (Electron security
 * checklist: "avoid the file protocol, prefer a custom protocol"). It serves the built renderer
 * folder and nothing else: URLs of another host, paths that climb out of the folder, folders and
 * unknown methods are refused. Files are read here with fs (Electron's fs reads inside app.asar),
 * so no file: request is ever made and the request filter can refuse every file: URL.
 */
import type { CustomScheme, Protocol } from 'electron';
import { readFile, stat } from 'node:fs/promises';
import { extname, isAbsolute, relative, resolve, sep } from 'node:path';

export const APP_SCHEME = 'app';
export const APP_HOST = 'thermoshift';
export const APP_ORIGIN = `${APP_SCHEME}://${APP_HOST}`;
export const APP_ENTRY_URL = `${APP_ORIGIN}/index.html`;

/**
 * Registered before the app is ready. `standard` gives the scheme an origin (relative URLs,
 * storage, CSP 'self'), `secure` makes it a secure context like https, `supportFetchAPI` lets the
 * page fetch its own files and `codeCache` keeps compiled scripts. Deliberately not set:
 * `bypassCSP` (the page's CSP applies), `corsEnabled` (other origins cannot read these files),
 * `allowServiceWorkers`, `stream` and `allowExtensions`.
 */
export const APP_SCHEME_PRIVILEGES: CustomScheme = {
  scheme: APP_SCHEME,
  privileges: { standard: true, secure: true, supportFetchAPI: true, codeCache: true },
};

/** Content types of the files a Vite build writes. Anything else is refused. */
export const MIME_TYPES: Readonly<Record<string, string>> = {
  '.html': 'text/html; charset=utf-8',
  '.js': 'text/javascript; charset=utf-8',
  '.mjs': 'text/javascript; charset=utf-8',
  '.css': 'text/css; charset=utf-8',
  '.json': 'application/json; charset=utf-8',
  '.map': 'application/json; charset=utf-8',
  '.svg': 'image/svg+xml',
  '.png': 'image/png',
  '.jpg': 'image/jpeg',
  '.jpeg': 'image/jpeg',
  '.gif': 'image/gif',
  '.webp': 'image/webp',
  '.ico': 'image/x-icon',
  '.woff': 'font/woff',
  '.woff2': 'font/woff2',
  '.ttf': 'font/ttf',
  '.wasm': 'application/wasm',
  '.txt': 'text/plain; charset=utf-8',
};

/** The content type for a file name, or null when the app never serves that kind of file. */
export function mimeTypeFor(fileName: string): string | null {
  return MIME_TYPES[extname(fileName).toLowerCase()] ?? null;
}

/**
 * The file under `rootDir` that an app:// URL names, or null when the URL is not one of the
 * app's: another scheme or host, an undecodable or NUL-carrying path, a backslash, or a path that
 * resolves outside `rootDir` (the URL parser already removes `..`; encoded `%2e%2e%2f` and
 * `%2f` are decoded here and checked again). `/` means index.html.
 */
export function resolveAppFile(url: string, rootDir: string): string | null {
  let u: URL;
  try {
    u = new URL(url);
  } catch {
    return null;
  }
  if (u.protocol !== `${APP_SCHEME}:` || u.host !== APP_HOST) return null;
  let path: string;
  try {
    path = decodeURIComponent(u.pathname);
  } catch {
    return null;
  }
  if (path.includes('\0') || path.includes('\\')) return null;
  if (path === '/' || path === '') path = '/index.html';
  const root = resolve(rootDir);
  const file = resolve(root, `.${path}`);
  const rel = relative(root, file);
  if (rel === '' || rel === '..' || rel.startsWith(`..${sep}`) || isAbsolute(rel)) return null;
  return file;
}

const refuse = (status: number): Response => new Response(null, { status });

/** The part of node:fs/promises the handler uses (tests pass the real one with a temp folder). */
export interface FileReader {
  stat(path: string): Promise<{ isFile(): boolean }>;
  readFile(path: string): Promise<Uint8Array>;
}

/**
 * The protocol.handle() handler: GET or HEAD of a file of the renderer folder, with its content
 * type and `nosniff`; 404 for anything outside it or missing, 405 for other methods.
 */
export function createAppFileHandler(
  rootDir: string,
  fs: FileReader = { stat, readFile },
): (request: Request) => Promise<Response> {
  return async (request) => {
    if (request.method !== 'GET' && request.method !== 'HEAD') return refuse(405);
    const file = resolveAppFile(request.url, rootDir);
    const type = file && mimeTypeFor(file);
    if (!file || !type) return refuse(404);
    try {
      if (!(await fs.stat(file)).isFile()) return refuse(404);
      // A copy on a plain ArrayBuffer: what the DOM's BodyInit type accepts (files are small).
      const body = request.method === 'HEAD' ? null : new Uint8Array(await fs.readFile(file));
      return new Response(body, {
        status: 200,
        headers: {
          'Content-Type': type,
          'X-Content-Type-Options': 'nosniff',
          'Cache-Control': 'no-cache',
        },
      });
    } catch {
      return refuse(404);
    }
  };
}

/** Before `ready`: declares the scheme and its privileges (Electron allows this once). */
export function registerAppScheme(protocol: Pick<Protocol, 'registerSchemesAsPrivileged'>): void {
  protocol.registerSchemesAsPrivileged([APP_SCHEME_PRIVILEGES]);
}

/** After `ready`: serves the renderer folder on the scheme for the default session. */
export function serveAppFiles(protocol: Pick<Protocol, 'handle'>, rendererDir: string): void {
  protocol.handle(APP_SCHEME, createAppFileHandler(rendererDir));
}
