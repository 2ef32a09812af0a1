/**
 * One running copy of the app for an end-to-end test file: the web build served on a free port,
 * Debian's Chromium, one page with its Content-Security-Policy watch, opened on the demo data.
 */
import { mkdirSync } from 'node:fs';
import type { BrowserContext, Page } from 'playwright-core';
import type { PreviewServer } from 'vite';
import { ARTIFACT_DIR, closePreview, launchBrowser, previewWebBuild, whenSettled } from './browser';
import { watchCsp, type CspWatch } from './csp-watch';

export interface AppSession {
  server: PreviewServer;
  ctx: BrowserContext;
  page: Page;
  csp: CspWatch;
  /** Closes the browser and the server. */
  close(): Promise<void>;
}

export interface OpenAppOptions {
  /** Grant the page clipboard read and write (copy buttons). */
  clipboard?: boolean;
  /** Wait until the demo master curve is drawn and no fit is running. */
  untilShown?: boolean;
}

export async function openApp(options: OpenAppOptions = {}): Promise<AppSession> {
  mkdirSync(ARTIFACT_DIR, { recursive: true });
  const server = await previewWebBuild();
  const ctx = await launchBrowser();
  const url = server.resolvedUrls!.local[0];
  if (options.clipboard) {
    await ctx.grantPermissions(['clipboard-read', 'clipboard-write'], {
      origin: new URL(url).origin,
    });
  }
  const page = await ctx.newPage();
  const csp = await watchCsp(page);
  page.on('pageerror', (e) => console.error('page error:', e.message));
  await page.goto(url);
  if (options.untilShown) {
    await page.waitForSelector('[data-view="master"] canvas');
    await whenSettled(page);
  }
  return {
    server,
    ctx,
    page,
    csp,
    close: async () => {
      await ctx.close();
      await closePreview(server);
    },
  };
}

/** Ctrl+Z on the app, then waits until the isotherm's lock shows released and no fit is running. */
export async function undoUntilUnlocked(page: Page, isothermId: string): Promise<void> {
  await page.keyboard.press('Control+z');
  await page.waitForFunction(
    (sel) => document.querySelector(sel)?.getAttribute('aria-pressed') === 'false',
    `tr[data-isotherm="${isothermId}"] [data-role="lock"]`,
  );
  await whenSettled(page);
}
