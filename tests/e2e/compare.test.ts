/**
 * The lot comparison as a user drives it, in Debian's Chromium: open the invented lot-release
 * files from samples/lot-release (a reference lot, three production lots, the specification)
 * through the comparison's file inputs, read the verdict table (lots 2 and 3 pass, lot 4 fails
 * and its failed criterion is named with the reason), see both figures drawn, then open the same
 * lots from the built-in invented demo. Waits on what the page shows; no CSP violation allowed.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { join } from 'node:path';
import { openApp, type AppSession } from '../helpers/app-session';
import { ARTIFACT_DIR } from '../helpers/browser';
import type { CspWatch } from '../helpers/csp-watch';

const LOTS = join(process.cwd(), 'samples', 'lot-release');

let app: AppSession;
let page: Page;
let csp: CspWatch;

beforeAll(async () => {
  app = await openApp();
  ({ page, csp } = app);
});

afterAll(async () => {
  await app?.close();
});

const verdictOf = (sample: RegExp, criterion: string): Promise<string> =>
  page
    .locator('[data-role="verdict-table"] tr[data-sample]')
    .filter({ hasText: sample })
    .filter({ has: page.locator('[data-role="criterion"]', { hasText: criterion }) })
    .locator('[data-role="verdict"]')
    .innerText();

describe('the lot comparison in Chromium', () => {
  it('opens the demo lots from files and names the failing lot’s criterion', async () => {
    await page.click('[data-role="compare"]');
    await page.waitForSelector('[data-role="compare-workspace"]');
    await page.setInputFiles('[data-role="compare-spec"]', join(LOTS, 'fr44-release.spec.json'));
    await page.setInputFiles(
      '[data-role="compare-reference"]',
      join(LOTS, 'fr44-lot-1-reference.csv'),
    );
    await page.setInputFiles(
      '[data-role="compare-samples"]',
      [2, 3, 4].map((k) => join(LOTS, `fr44-lot-${k}.csv`)),
    );
    await page.waitForSelector('[data-role="verdict-table"] tr[data-sample]');
    expect(await page.locator('[data-role="compare-roster"] li').count()).toBe(4);
    expect(await verdictOf(/lot 2/, 'relaxation times')).toBe('pass');
    expect(await verdictOf(/lot 3/, 'G′ band')).toBe('pass');
    expect(await verdictOf(/lot 4/, 'relaxation times')).toBe('fail');
    const reason = await page
      .locator('tr[data-sample*="lot 4"][data-verdict="fail"] .reason')
      .first()
      .innerText();
    expect(reason).toMatch(/^FAIL: .* beyond the upper limit .* probability .* outside the limits/);
    const overall = await page
      .locator('tr[data-sample*="lot 4"] [data-role="overall"]')
      .first()
      .innerText();
    expect(overall).toBe('fail');
    for (const key of ['overlay', 'difference']) {
      const img = page.locator(`[data-chart="${key}"] img`);
      await img.waitFor();
      expect(await img.evaluate((el) => (el as HTMLImageElement).naturalWidth)).toBeGreaterThan(0);
    }
    expect(await page.innerText('[data-role="compare-workspace"]')).toMatch(/confirm by testing/);
    await page.screenshot({ path: join(ARTIFACT_DIR, 'compare-lots.png'), fullPage: true });
  });

  it('opens the same lots from the built-in invented demo', async () => {
    await page.click('[data-role="compare-demo"]');
    await page.waitForSelector('text=invented demo lots');
    expect(await verdictOf(/lot 4/, 'G′ band')).toBe('fail');
    expect(await verdictOf(/lot 2/, 'Ea')).toBe('pass');
  });

  it('ran without a content-security-policy violation', () => {
    expect(csp.violations, 'securitypolicyviolation events').toEqual([]);
    expect(csp.cspConsoleErrors, 'CSP console errors').toEqual([]);
  });
});
