import { describe, expect, it, vi } from 'vitest';
import { mkdirSync, mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import {
  APP_ENTRY_URL,
  APP_ORIGIN,
  APP_SCHEME_PRIVILEGES,
  createAppFileHandler,
  mimeTypeFor,
  registerAppScheme,
  resolveAppFile,
  serveAppFiles,
} from '../../app/main/app-protocol';

/** A built renderer folder, with a secret file next to it that must never be served. */
function rendererFolder() {
  const base = mkdtempSync(join(tmpdir(), 'ts-app-protocol-'));
  const root = join(base, 'renderer');
  mkdirSync(join(root, 'assets'), { recursive: true });
  writeFileSync(join(root, 'index.html'), '<!doctype html><title>t</title>');
  writeFileSync(join(root, 'assets', 'index-abc.js'), 'export const x = 1;');
  writeFileSync(join(root, 'assets', 'index-abc.css'), 'body{color:red}');
  writeFileSync(join(root, 'assets', 'notes.unknownext'), 'x');
  writeFileSync(join(base, 'secret.txt'), 'do not serve');
  writeFileSync(join(base, 'renderer-sibling.js'), 'do not serve');
  return { base, root };
}

const get = (url: string, method = 'GET') => new Request(url, { method });

describe('APP_SCHEME_PRIVILEGES', () => {
  it('APP_SCHEME_PRIVILEGES makes app:// a standard secure origin without bypassing CSP or CORS', () => {
    expect(APP_SCHEME_PRIVILEGES.scheme).toBe('app');
    const p = APP_SCHEME_PRIVILEGES.privileges!;
    expect(p.standard).toBe(true);
    expect(p.secure).toBe(true);
    expect(p.supportFetchAPI).toBe(true);
    for (const off of [
      'bypassCSP',
      'corsEnabled',
      'allowServiceWorkers',
      'allowExtensions',
    ] as const)
      expect(p[off], off).toBeFalsy();
    expect(APP_ENTRY_URL).toBe(`${APP_ORIGIN}/index.html`);
  });
});

describe('resolveAppFile()', () => {
  const root = '/opt/thermoshift/resources/app.asar/out/renderer';

  it('resolveAppFile() maps app://thermoshift/ paths to files in the renderer folder', () => {
    expect(resolveAppFile('app://thermoshift/index.html', root)).toBe(join(root, 'index.html'));
    expect(resolveAppFile('app://thermoshift/', root)).toBe(join(root, 'index.html'));
    expect(resolveAppFile('app://thermoshift/assets/index-abc.js?v=1#x', root)).toBe(
      join(root, 'assets', 'index-abc.js'),
    );
    expect(resolveAppFile('app://thermoshift/assets/a%20b.css', root)).toBe(
      join(root, 'assets', 'a b.css'),
    );
  });

  it('resolveAppFile() keeps dot segments at the root, as URL parsing does: ../ cannot climb out', () => {
    for (const url of [
      'app://thermoshift/../../../etc/passwd',
      'app://thermoshift/%2e%2e/%2e%2e/etc/passwd',
      'app://thermoshift/assets/../../etc/passwd',
    ])
      expect(resolveAppFile(url, root), url).toBe(join(root, 'etc', 'passwd'));
  });

  it.each([
    ['app://thermoshift/..%2f..%2fsecret.txt'],
    ['app://thermoshift/assets%2F..%2F..%2Fsecret.txt'],
    ['app://thermoshift/..%5csecret.txt'],
    ['app://thermoshift/assets\\..\\..\\secret.txt'],
    ['app://thermoshift/index.html%00.js'],
    ['app://thermoshift/%E0%A4%A'],
    ['app://other-host/index.html'],
    ['app://thermoshift.evil/index.html'],
    ['file:///opt/thermoshift/resources/app.asar/out/renderer/index.html'],
    ['https://thermoshift/index.html'],
    ['not a url'],
  ])('resolveAppFile(%s) is refused', (url) => {
    expect(resolveAppFile(url, root)).toBeNull();
  });
});

describe('mimeTypeFor()', () => {
  it.each([
    ['index.html', 'text/html; charset=utf-8'],
    ['assets/index-abc.js', 'text/javascript; charset=utf-8'],
    ['assets/analysis.worker-x.js', 'text/javascript; charset=utf-8'],
    ['assets/INDEX.CSS', 'text/css; charset=utf-8'],
    ['icon.svg', 'image/svg+xml'],
    ['font.woff2', 'font/woff2'],
    ['notes.unknownext', null],
    ['Makefile', null],
  ])('mimeTypeFor(%s) is %s', (name, type) => expect(mimeTypeFor(name)).toBe(type));
});

describe('createAppFileHandler()', () => {
  it('createAppFileHandler() serves the built files with their content type and nosniff', async () => {
    const { root } = rendererFolder();
    const handle = createAppFileHandler(root);
    const html = await handle(get('app://thermoshift/'));
    expect(html.status).toBe(200);
    expect(html.headers.get('content-type')).toBe('text/html; charset=utf-8');
    expect(html.headers.get('x-content-type-options')).toBe('nosniff');
    expect(await html.text()).toBe('<!doctype html><title>t</title>');
    const js = await handle(get('app://thermoshift/assets/index-abc.js'));
    expect(js.headers.get('content-type')).toBe('text/javascript; charset=utf-8');
    expect(await js.text()).toBe('export const x = 1;');
    const css = await handle(get('app://thermoshift/assets/index-abc.css'));
    expect(css.headers.get('content-type')).toBe('text/css; charset=utf-8');
  });

  it('createAppFileHandler() refuses paths outside the folder, folders, missing and unknown files', async () => {
    const { root } = rendererFolder();
    const handle = createAppFileHandler(root);
    for (const url of [
      'app://thermoshift/..%2fsecret.txt',
      'app://thermoshift/%2e%2e/secret.txt',
      'app://thermoshift/..%2frenderer-sibling.js',
      'app://thermoshift/assets',
      'app://thermoshift/assets/',
      'app://thermoshift/missing.js',
      'app://thermoshift/assets/notes.unknownext',
      'app://elsewhere/index.html',
    ]) {
      const r = await handle(get(url));
      expect(r.status, url).toBe(404);
      expect(await r.text(), url).toBe('');
    }
  });

  it('createAppFileHandler() answers HEAD without a body and refuses other methods', async () => {
    const { root } = rendererFolder();
    const handle = createAppFileHandler(root);
    const head = await handle(get('app://thermoshift/index.html', 'HEAD'));
    expect(head.status).toBe(200);
    expect(head.headers.get('content-type')).toBe('text/html; charset=utf-8');
    expect(await head.text()).toBe('');
    const post = await handle(
      new Request('app://thermoshift/index.html', { method: 'POST', body: 'x' }),
    );
    expect(post.status).toBe(405);
  });

  it('createAppFileHandler() turns a read failure into 404, not a crash', async () => {
    const handle = createAppFileHandler('/nowhere', {
      stat: async () => ({ isFile: () => true }),
      readFile: async () => {
        throw new Error('EIO');
      },
    });
    expect((await handle(get('app://thermoshift/index.html'))).status).toBe(404);
  });
});

describe('registerAppScheme() and serveAppFiles()', () => {
  it('registerAppScheme() declares exactly the app scheme with its privileges', () => {
    const protocol = { registerSchemesAsPrivileged: vi.fn() };
    registerAppScheme(protocol);
    expect(protocol.registerSchemesAsPrivileged).toHaveBeenCalledWith([APP_SCHEME_PRIVILEGES]);
  });

  it('serveAppFiles() hands protocol.handle("app") a handler bound to the renderer folder', async () => {
    const { root } = rendererFolder();
    const protocol = { handle: vi.fn() };
    serveAppFiles(protocol, root);
    expect(protocol.handle).toHaveBeenCalledTimes(1);
    const [scheme, handler] = protocol.handle.mock.calls[0] as [
      string,
      (r: Request) => Promise<Response>,
    ];
    expect(scheme).toBe('app');
    expect(await (await handler(get('app://thermoshift/index.html'))).text()).toContain('<title>');
    expect((await handler(get('app://thermoshift/..%2fsecret.txt'))).status).toBe(404);
  });
});
