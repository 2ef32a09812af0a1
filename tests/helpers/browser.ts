/**
 * Launches Debian's Chromium through playwright-core for end-to-end tests (never a downloaded
 * browser). Flags as in shared/TOOLCHAIN.md: the machine's network is closed, so background
 * networking is switched off.
 */
import { chromium, type BrowserContext } from 'playwright-core';
import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';

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
