/**
 * Launches Debian's Chromium through playwright-core for end-to-end tests (never a downloaded
 * browser). Flags as in shared/TOOLCHAIN.md: the machine's network is closed, so background
 * networking is switched off.
 */
import { chromium, type BrowserContext, type Page } from 'playwright-core';
import { mkdtempSync, readdirSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { preview, type PreviewServer } from 'vite';

export const CHROMIUM_PATH = process.env.THERMOSHIFT_CHROMIUM ?? '/usr/bin/chromium';

export async function launchBrowser(): Promise<BrowserContext> {
  return chromium.launchPersistentContext(mkdtempSync(join(tmpdir(), 'thermoshift-prof-')), {
    executablePath: CHROMIUM_PATH,
    headless: true,
    viewport: { width: 1400, height: 900 },
    acceptDownloads: true,
    args: [
      '--no-sandbox',
      '--disable-gpu',
      '--disable-quic',
      '--no-first-run',
      '--disable-background-networking',
      '--disable-component-update',
      '--disable-sync',
    ],
  });
}

/** Folder for screenshots and other artifacts that tests keep. */
export const ARTIFACT_DIR = join(process.cwd(), 'test-results', 'artifacts');

/** Serves the web build (dist/web, made by the e2e global setup) on 127.0.0.1, a free port. */
export function previewWebBuild(): Promise<PreviewServer> {
  const root = process.cwd();
  return preview({
    root,
    configFile: join(root, 'vite.config.ts'),
    preview: { host: '127.0.0.1', port: 0, strictPort: false },
    logLevel: 'warn',
  });
}

export function closePreview(server: PreviewServer | undefined): Promise<void> {
  return new Promise<void>((r) => (server ? server.httpServer.close(() => r()) : r()));
}

/** The invented seal sample's per-isotherm files (samples/seal-dma/*.txt). */
export function sealSampleFiles(): string[] {
  const dir = join(process.cwd(), 'samples', 'seal-dma');
  return readdirSync(dir)
    .filter((f) => f.endsWith('.txt'))
    .map((f) => join(dir, f));
}

/** Picks files through the app's *Import data…* file dialog and waits for the import preview. */
export async function openInImportPreview(page: Page, files: string[]): Promise<void> {
  const chooser = page.waitForEvent('filechooser');
  await page.click('[data-role="open-data"]');
  await (await chooser).setFiles(files);
  await page.waitForSelector('[data-role="import-groups"] tr');
}

/** Waits until the app has no fit running (the busy bar says so). */
export async function whenSettled(page: Page): Promise<void> {
  await page.waitForSelector('[data-role="busy"][aria-busy="false"]');
}

/** Non-white pixels on the canvas of the plot on screen (the plot really drew). */
export function canvasPaintedPixels(page: Page): Promise<number> {
  return page.evaluate(() => {
    const c = document.querySelector<HTMLCanvasElement>('canvas[data-plot]');
    const ctx2d = c?.getContext('2d');
    if (!c || !ctx2d) return 0;
    const d = ctx2d.getImageData(0, 0, c.width, c.height).data;
    let n = 0;
    for (let i = 0; i < d.length; i += 4) if (d[i] < 235 || d[i + 1] < 235 || d[i + 2] < 235) n++;
    return n;
  });
}
