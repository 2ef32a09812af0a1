/**
 * The app as a user drives it, in Debian's Chromium: the demo opens with a master curve, a sample
 * is imported, the reference temperature changes, an isotherm is excluded, a curve is dragged,
 * the drag is undone, results are exported, the analysis is saved and reopened, and the autosave
 * restores it after a reload. Assertions are on visible text and numbers and on painted pixels;
 * screenshots of every view go to test-results/artifacts/. The last test checks that the whole
 * session ran under the page's CSP without a violation.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { openApp, undoUntilUnlocked, type AppSession } from '../helpers/app-session';
import {
  ARTIFACT_DIR,
  openInImportPreview,
  sealSampleFiles,
  canvasPaintedPixels,
  whenSettled,
} from '../helpers/browser';
import { expectAbsClose } from '../helpers/assert-close';
import type { CspWatch } from '../helpers/csp-watch';

const ROOT = process.cwd();
const SEAL = join(ROOT, 'samples', 'seal-dma');

let app: AppSession;
let page: Page;
let csp: CspWatch;

const shot = (name: string): Promise<Buffer> =>
  page.screenshot({ path: join(ARTIFACT_DIR, `app-${name}.png`) });

const paintedPixels = (): Promise<number> => canvasPaintedPixels(page);

const rowText = (id: string, role: string): Promise<string> =>
  page.locator(`tr[data-isotherm="${id}"] [data-role="${role}"]`).innerText();

/** The isotherm id of the roster row showing exactly this temperature (°C, one decimal). */
async function rowIdAt(celsius: string): Promise<string> {
  const exact = new RegExp(`^\\s*${celsius.replace('.', '\\.')}\\s*$`);
  const row = page
    .locator('tr[data-isotherm]')
    .filter({ has: page.locator('td:first-child', { hasText: exact }) });
  return (await row.first().getAttribute('data-isotherm')) ?? '';
}

const settled = (): Promise<void> => whenSettled(page);

beforeAll(async () => {
  app = await openApp();
  ({ page, csp } = app);
});

afterAll(async () => {
  await app?.close();
});

describe('the Thermoshift app in Chromium', () => {
  it('opens the invented demo with a master curve on the first start', async () => {
    await page.waitForSelector('[data-view="master"] canvas');
    await settled();
    expect(await page.innerText('[data-role="sample-name"]')).toMatch(/invented/);
    expect(await page.innerText('[data-role="cautions"]')).toMatch(/extrapolation/);
    expect(await page.locator('tr[data-isotherm]').count()).toBe(9);
    expect(await page.innerText('[data-role="tref-used"]')).toBe('190.0 °C');
    expect(await paintedPixels()).toBeGreaterThan(5000);
    await shot('master-curve');
    for (const [tab, name] of [
      ['measured', 'isotherms'],
      ['shift', 'shift-factors'],
      ['checks', 'van-gurp-palmen'],
    ] as const) {
      await page.click(`[data-view-tab="${tab}"]`);
      await page.waitForSelector(`canvas[data-plot]`);
      expect(await paintedPixels(), `${tab} drew`).toBeGreaterThan(3000);
      await shot(name);
    }
    await page.click('[data-view-tab="models"]');
    await page.click('[data-sub-view="tables"]');
    expect(await page.innerText('.models-view')).toMatch(/Prony series in shear \(.*\): \d+ modes/);
    await shot('models');
  });

  it('imports a sample through the import preview', async () => {
    await openInImportPreview(page, sealSampleFiles());
    expect(await page.locator('[data-role="import-groups"] tr').count()).toBe(11);
    await shot('import-preview');
    await page.click('[data-role="import-accept"]');
    await page.waitForFunction(() =>
      document.querySelector('[data-role="sample-name"]')?.textContent?.includes('QS-72'),
    );
    await settled();
    expect(await page.locator('tr[data-isotherm]').count()).toBe(11);
  });

  it('lists the imported files under Recent and takes dropped files into the import preview', async () => {
    await page.click('[data-role="recent"]');
    // The menu opens at once and fills when the stored list has been read (IndexedDB, async).
    await page.locator('.menu', { hasText: /\+ 10 more/ }).waitFor({ timeout: 10_000 });
    expect(await page.innerText('.menu')).toMatch(/\+ 10 more/);
    await page.click('[data-role="recent"]');
    const name = 'tf9-relaxation.tsv';
    const text = readFileSync(join(ROOT, 'samples', 'adhesive-relaxation', name), 'utf8');
    const data = await page.evaluateHandle(
      ([n, t]) => {
        const dt = new DataTransfer();
        dt.items.add(new File([t], n, { type: 'text/plain' }));
        return dt;
      },
      [name, text] as const,
    );
    await page.dispatchEvent('main', 'dragenter', { dataTransfer: data });
    await page.dispatchEvent('main', 'drop', { dataTransfer: data });
    await page.waitForSelector('[data-role="import-groups"] tr');
    expect(await page.innerText('[data-role="import-preview"]')).toMatch(/tf9-relaxation\.tsv/);
    await page.click('[data-role="import-cancel"]');
    expect(await page.innerText('[data-role="sample-name"]')).toMatch(/QS-72/);
  });

  it('changes the reference temperature and shows shifts that match the generator’s truth', async () => {
    await page.fill('[data-role="tref"]', '20');
    await page.press('[data-role="tref"]', 'Enter');
    await page.waitForFunction(
      () => document.querySelector('[data-role="tref-used"]')?.textContent?.trim() === '20.0 °C',
    );
    await settled();
    const at20 = await rowIdAt('20.0');
    const at60 = await rowIdAt('60.0');
    expectAbsClose(Number(await rowText(at20, 'log-aT')), 0, 0.0005, 'log10 aT at Tref');
    // Truth of the invented sample (samples/seal-dma/truth.json): WLF C1 = 10.5, C2 = 95 K at
    // −20 °C, so relative to 20 °C: log10 aT(60 °C) = −10.5·80/175 + 10.5·40/135 = −1.689.
    // 0.05 decades allows for the 2 % noise of the invented data (the shift engine's own
    // accuracy tests are stricter).
    const truth = JSON.parse(readFileSync(join(SEAL, 'truth.json'), 'utf8')) as {
      shiftLaw: { C1: number; C2K: number };
    };
    const wlf = (dT: number): number => (-truth.shiftLaw.C1 * dT) / (truth.shiftLaw.C2K + dT);
    expectAbsClose(
      Number(await rowText(at60, 'log-aT')),
      wlf(80) - wlf(40),
      0.05,
      'log10 aT(60 °C)',
    );
    await shot('reference-20C');
  });

  it('excludes an isotherm and re-fits without it', async () => {
    const id = await rowIdAt('-40.0');
    await page.click(`tr[data-isotherm="${id}"] [data-role="include"]`);
    await page.waitForFunction(() =>
      /10 of 11/.test(document.querySelector('.findings')?.textContent ?? ''),
    );
    expect(await page.isChecked(`tr[data-isotherm="${id}"] [data-role="include"]`)).toBe(false);
  });

  it('drags a curve on the master curve, re-fits the rest live, and undoes the drag', async () => {
    await page.click('[data-view-tab="master"]');
    await settled();
    const id = await rowIdAt('0.0');
    const before = Number(await rowText(id, 'log-aT'));
    const canvas = page.locator('canvas[data-plot="master"]');
    const anchors = JSON.parse((await canvas.getAttribute('data-anchors')) ?? '{}') as Record<
      string,
      [number, number]
    >;
    expect(anchors[id], `curve ${id} is on the plot`).toBeDefined();
    const axis = JSON.parse((await canvas.getAttribute('data-x-axis'))!) as Record<string, number>;
    const box = (await canvas.boundingBox())!;
    const [x, y] = anchors[id];
    await page.mouse.move(box.x + x, box.y + y);
    await page.mouse.down();
    await page.mouse.move(box.x + x + 15, box.y + y, { steps: 5 });
    await page.mouse.up();
    await page.waitForFunction(
      (sel) => document.querySelector(sel)?.getAttribute('aria-pressed') === 'true',
      `tr[data-isotherm="${id}"] [data-role="lock"]`,
    );
    await settled();
    const after = Number(await rowText(id, 'log-aT'));
    // 15 px on the axis as it was at pointer-down (views.test.ts checks the conversion to 2 %)
    const want = (15 * (Math.log10(axis.max) - Math.log10(axis.min))) / (axis.right - axis.left);
    expect(after - before, 'dragging right increases log10 aT').toBeGreaterThan(0);
    expectAbsClose(after - before, want, Math.max(0.02 * want, 0.0015), 'shift of a 15 px drag');
    await shot('after-drag');

    await undoUntilUnlocked(page, id);
    expectAbsClose(Number(await rowText(id, 'log-aT')), before, 0.0005, 'log10 aT after undo');
  });

  it('masks points by box-selecting them on the isotherms plot, as one undo step', async () => {
    await page.click('[data-view-tab="measured"]');
    await page.click('[data-role="mode-mask"]');
    const box = (await page.locator('canvas[data-plot="measured"]').boundingBox())!;
    // a box over the lower-left corner of the plot: the low-frequency, low-modulus points
    await page.mouse.move(box.x + 60, box.y + box.height * 0.55);
    await page.mouse.down();
    await page.mouse.move(box.x + box.width * 0.3, box.y + box.height - 40, { steps: 4 });
    await page.mouse.up();
    await page.waitForFunction(
      () => Number(document.querySelector('[data-role="masked-count"]')?.textContent) > 0,
    );
    await settled();
    expect(await paintedPixels()).toBeGreaterThan(3000);
    await shot('masked-points');
    await page.keyboard.press('Control+z');
    await page.waitForFunction(
      () => document.querySelector('[data-role="masked-count"]')?.textContent?.trim() === '0',
    );
    await page.click('[data-role="mode-explore"]');
  });

  it('nudges a curve with its button, as one undo step', async () => {
    // The undo of the mask above re-fits; read the shift once that is done.
    await settled();
    const id = await rowIdAt('10.0');
    const before = Number(await rowText(id, 'log-aT'));
    await page.click(`tr[data-isotherm="${id}"] [data-role="nudge-right"]`);
    await settled();
    expectAbsClose(Number(await rowText(id, 'log-aT')), before + 0.05, 0.0015, 'nudged log10 aT');
    await page.click('[data-role="undo"]');
    await settled();
    expectAbsClose(Number(await rowText(id, 'log-aT')), before, 0.0005, 'log10 aT after undo');
  });

  it('answers a prediction with its range, flags and cautions', async () => {
    await page.click('[data-view-tab="predict"]');
    await page.fill('[data-role="predict-temperature"]', '30');
    await page.fill('[data-role="predict-x"]', '1');
    await page.click('[data-role="predict"]');
    const text = await page.innerText('[data-role="prediction"]');
    expect(
      Number((await page.innerText('[data-role="predicted-value"]')).replace(/[^\d.e+-]/g, '')),
    ).toBeGreaterThan(0);
    expect(text).toMatch(/95 % range/);
    expect(text).toMatch(/licensed engineering practice/);
    await shot('prediction');
    await page.fill('[data-role="predict-temperature"]', '150');
    await page.click('[data-role="predict"]');
    expect(await page.innerText('[data-role="prediction"]')).toMatch(/outside the fitted range/);
    await page.click('[data-view-tab="master"]');
  });

  it('exports the shift table, a plot as PNG, and saves and reopens the analysis', async () => {
    await page.click('[data-role="export"]');
    const csvDownload = page.waitForEvent('download');
    await page.click('[data-export="shift-factors.csv"]');
    const csv = readFileSync((await (await csvDownload).path())!, 'utf8');
    expect(csv).toMatch(/log10/);
    expect(csv.split('\n').filter((l) => /^T\d\d/.test(l))).toHaveLength(11);

    await page.click('[data-role="export"]');
    const reportDownload = page.waitForEvent('download');
    await page.click('[data-export="report.html"]');
    const report = readFileSync((await (await reportDownload).path())!, 'utf8');
    expect(report).toMatch(/<html/i);
    expect(report).toMatch(/QS-72/);

    const pngDownload = page.waitForEvent('download');
    await page.click('[data-role="export-png"]');
    const png = readFileSync((await (await pngDownload).path())!);
    expect(png.subarray(1, 4).toString()).toBe('PNG');

    const svgDownload = page.waitForEvent('download');
    await page.click('[data-role="export-svg"]');
    expect(readFileSync((await (await svgDownload).path())!, 'utf8')).toMatch(/<svg[\s\S]*<\/svg>/);

    const saved = page.waitForEvent('download');
    await page.click('[data-role="save"]');
    const savedPath = (await (await saved).path())!;
    expect(JSON.parse(readFileSync(savedPath, 'utf8')).format).toBe('thermoshift-analysis');

    await page.click('[data-role="recent"]');
    await page.click('text=Invented demo analysis');
    await page.waitForFunction(() =>
      document.querySelector('[data-role="sample-name"]')?.textContent?.includes('HX-310'),
    );
    const chooser = page.waitForEvent('filechooser');
    await page.click('[data-role="open-analysis"]');
    await (await chooser).setFiles(savedPath);
    await page.waitForFunction(() =>
      document.querySelector('[data-role="sample-name"]')?.textContent?.includes('QS-72'),
    );
    await settled();
    expect(await page.innerText('[data-role="tref-used"]')).toBe('20.0 °C');
    expect(await page.locator('[data-role="include"]:not(:checked)').count()).toBe(1);
  });

  it('restores the autosaved analysis after a reload', async () => {
    await page.waitForTimeout(1000); // autosave waits 0.8 s after the last change
    await page.reload();
    await page.waitForFunction(() =>
      document.querySelector('[data-role="sample-name"]')?.textContent?.includes('QS-72'),
    );
    expect(await page.innerText('[data-role="notice"]')).toMatch(/Restored/);
    await settled();
    expect(await page.innerText('[data-role="tref-used"]')).toBe('20.0 °C');
  });

  it('shows the keyboard shortcuts', async () => {
    await page.keyboard.press('F1');
    expect(await page.innerText('[aria-label="Keyboard shortcuts"]')).toMatch(/Ctrl\+Z/);
    await shot('shortcuts');
    await page.keyboard.press('Escape');
  });

  it('did all of the above under the page’s CSP without a single violation', () => {
    expect(csp.violations, 'securitypolicyviolation events').toEqual([]);
    expect(csp.cspConsoleErrors, 'CSP console errors').toEqual([]);
  });
});
