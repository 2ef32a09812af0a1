/**
 * The renderer's Content-Security-Policy (no inline styles, no eval) holds in Chromium for every
 * way the page is served: the web build (vite preview), the desktop build (out/renderer) served
 * through the very handler main registers for app://, and the dev server (`npm run web`).
 * Violations are caught through `securitypolicyviolation` events and console errors; a positive
 * control shows that an inline style is indeed reported and blocked, so "no violation" means
 * something.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createServer as createHttpServer, type Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import { mkdtempSync, readFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { createServer, type PreviewServer, type ViteDevServer } from 'vite';
import type { BrowserContext, Page } from 'playwright-core';
import {
  closePreview,
  launchBrowser,
  openInImportPreview,
  previewWebBuild,
  sealSampleFiles,
  whenSettled,
} from '../helpers/browser';
import { cspOfHtml, parseCsp, watchCsp, type CspWatch } from '../helpers/csp-watch';
import { APP_ORIGIN, createAppFileHandler } from '../../app/main/app-protocol';

const ROOT = process.cwd();

const settled = whenSettled;

/** Every view, the shortcuts dialog and the import preview: what the page can show. */
async function walkThrough(page: Page): Promise<void> {
  await page.waitForSelector('[data-view="master"] canvas');
  await settled(page);
  for (const tab of ['measured', 'master', 'shift', 'checks', 'models', 'predict']) {
    await page.click(`[data-view-tab="${tab}"]`);
    await page.waitForSelector(`[data-view-tab="${tab}"][aria-selected="true"]`);
    await settled(page);
  }
  await page.keyboard.press('F1');
  await page.waitForSelector('[aria-label="Keyboard shortcuts"]');
  await page.keyboard.press('Escape');
  await openInImportPreview(page, sealSampleFiles());
  await page.click('[data-role="import-cancel"]');
  await settled(page);
}

/** A fresh Chromium profile with one page, watched for CSP violations, opened at `url`. */
async function openWatched(
  url: string,
): Promise<{ ctx: BrowserContext; page: Page; watch: CspWatch }> {
  const ctx = await launchBrowser();
  const page = await ctx.newPage();
  const watch = await watchCsp(page);
  await page.goto(url);
  return { ctx, page, watch };
}

/** The page background set by styles/base.css (--paper: #eef0ec): proof its styles applied. */
const PAPER = 'rgb(238, 240, 236)';
const paperColour = (page: Page): Promise<string> =>
  page.evaluate(() => getComputedStyle(document.body).backgroundColor);

function expectClean(watch: CspWatch): void {
  expect(watch.violations, 'securitypolicyviolation events').toEqual([]);
  expect(watch.cspConsoleErrors, 'CSP console errors').toEqual([]);
  expect(watch.consoleErrors, 'console errors').toEqual([]);
  expect(watch.pageErrors, 'uncaught exceptions').toEqual([]);
}

describe('the CSP of the renderer page', () => {
  it.each([['app/renderer/index.html'], ['dist/web/index.html'], ['out/renderer/index.html']])(
    '%s allows scripts and styles from the app itself only: no inline, no eval',
    (file) => {
      const policy = cspOfHtml(readFileSync(join(ROOT, file), 'utf8'));
      expect(policy, 'CSP meta tag').not.toBeNull();
      const csp = parseCsp(policy!);
      expect(csp.get('default-src')).toEqual(["'none'"]);
      expect(csp.get('script-src')).toEqual(["'self'"]);
      expect(csp.get('style-src')).toEqual(["'self'"]);
      expect(policy).not.toMatch(/unsafe-inline|unsafe-eval|unsafe-hashes/);
    },
  );
});

describe('the web build (dist/web) in Chromium', () => {
  let server: PreviewServer;
  let ctx: BrowserContext;
  let page: Page;
  let watch: CspWatch;

  beforeAll(async () => {
    server = await previewWebBuild();
    ({ ctx, page, watch } = await openWatched(server.resolvedUrls!.local[0]));
  });

  afterAll(async () => {
    await ctx?.close();
    await closePreview(server);
  });

  it('runs every view, the shortcuts and the import preview without a CSP violation or error', async () => {
    await walkThrough(page);
    expect(await paperColour(page), 'base.css applied').toBe(PAPER);
    expectClean(watch);
  });

  it('reports and blocks an injected <style> element and style attribute (the check works)', async () => {
    const applied = await page.evaluate(() => {
      const style = document.createElement('style');
      style.textContent = 'body { outline: 7px solid rgb(1, 2, 3); }';
      document.head.append(style);
      const box = document.createElement('div');
      box.innerHTML = '<p id="csp-probe" style="color: rgb(4, 5, 6)">x</p>';
      document.body.append(box);
      return {
        outline: getComputedStyle(document.body).outlineWidth,
        color: getComputedStyle(document.getElementById('csp-probe')!).color,
      };
    });
    expect(applied.outline).not.toBe('7px');
    expect(applied.color).not.toBe('rgb(4, 5, 6)');
    await expect.poll(() => watch.violations.length).toBeGreaterThanOrEqual(2);
    expect(watch.violations.join('\n')).toMatch(/style-src-elem/);
    expect(watch.violations.join('\n')).toMatch(/style-src-attr/);
  });
});

describe('the desktop build (out/renderer) served by the app:// handler', () => {
  let http: Server;
  let ctx: BrowserContext;
  let page: Page;
  let watch: CspWatch;
  let base: string;
  const types = new Map<string, string>();

  beforeAll(async () => {
    // Chromium cannot open app:// outside Electron, so the handler main registers with
    // protocol.handle() answers plain HTTP here: same files, same checks, same headers.
    const handle = createAppFileHandler(join(ROOT, 'out', 'renderer'));
    http = createHttpServer((req, res) => {
      void handle(new Request(`${APP_ORIGIN}${req.url ?? '/'}`, { method: req.method })).then(
        async (r) => {
          res.writeHead(r.status, Object.fromEntries(r.headers));
          res.end(Buffer.from(await r.arrayBuffer()));
        },
      );
    });
    await new Promise<void>((r) => http.listen(0, '127.0.0.1', r));
    base = `http://127.0.0.1:${(http.address() as AddressInfo).port}`;
    ({ ctx, page, watch } = await openWatched('about:blank'));
    page.on('response', (r) => types.set(new URL(r.url()).pathname, r.headers()['content-type']));
    await page.goto(`${base}/index.html`);
  });

  afterAll(async () => {
    await ctx?.close();
    await new Promise<void>((r) => http?.close(() => r()));
  });

  it('serves the page, its scripts, styles and worker with their content types', async () => {
    await walkThrough(page);
    const served = [...types.entries()];
    expect(served.find(([p]) => p === '/index.html')?.[1]).toBe('text/html; charset=utf-8');
    const scripts = served.filter(([p]) => p.endsWith('.js'));
    expect(scripts.map(([p]) => p).join(' ')).toMatch(/analysis\.worker-.*\.js/);
    for (const [p, type] of scripts) expect(type, p).toBe('text/javascript; charset=utf-8');
    const styles = served.filter(([p]) => p.endsWith('.css'));
    expect(styles.length).toBeGreaterThan(0);
    for (const [p, type] of styles) expect(type, p).toBe('text/css; charset=utf-8');
    expectClean(watch);
  });

  it('refuses paths that climb out of the renderer folder', async () => {
    for (const path of [
      '/..%2f..%2fpackage.json',
      '/..%2fmain%2fmain.js',
      '/%2e%2e/preload/preload.cjs',
    ]) {
      const r = await fetch(`${base}${path}`);
      expect(r.status, path).toBe(404);
    }
  });
});

describe('the dev server (npm run web) in Chromium', () => {
  let server: ViteDevServer;
  let ctx: BrowserContext;
  let page: Page;
  let watch: CspWatch;

  beforeAll(async () => {
    server = await createServer({
      configFile: join(ROOT, 'vite.config.ts'),
      cacheDir: mkdtempSync(join(tmpdir(), 'thermoshift-vite-cache-')),
      server: { host: '127.0.0.1', port: 0, strictPort: false },
      logLevel: 'warn',
    });
    await server.listen();
    ({ ctx, page, watch } = await openWatched(server.resolvedUrls!.local[0]));
  });

  afterAll(async () => {
    await ctx?.close();
    await server?.close();
  });

  it('styles the page through nonce-carrying <style> elements without a CSP violation', async () => {
    await walkThrough(page);
    const csp = parseCsp(
      (await page.getAttribute('meta[http-equiv="Content-Security-Policy"]', 'content'))!,
    );
    const styleSrc = csp.get('style-src')!;
    expect(styleSrc).toHaveLength(2);
    expect(styleSrc[0]).toBe("'self'");
    expect(styleSrc[1]).toMatch(/^'nonce-[A-Za-z0-9+/=]{16,}'$/);
    const styles = await page.evaluate(() =>
      [...document.querySelectorAll('style')].map((s) => s.nonce),
    );
    expect(styles.length).toBeGreaterThan(0);
    for (const nonce of styles) expect(`'nonce-${nonce}'`).toBe(styleSrc[1]);
    expect(await paperColour(page), 'base.css applied').toBe(PAPER);
    expectClean(watch);
  });
});
