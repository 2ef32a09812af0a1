/**
 * Opens a report made by `thermoshift build` from synthetic files in Debian's Chromium and checks
 * that its charts drew: every chart SVG has a non-empty box, marks inside the plot, and nothing
 * is clipped by the page width; saves a screenshot and prints the report to A4 PDF.
 */
import { describe, it, expect, beforeAll, afterAll } from 'vitest';
import { mkdirSync, readFileSync, statSync } from 'node:fs';
import { join } from 'node:path';
import { pathToFileURL } from 'node:url';
import type { BrowserContext, Page } from 'playwright-core';
import { ARTIFACT_DIR, launchBrowser } from '../helpers/browser';
import { runCli, tempDir, writeSyntheticSample } from '../cli/cli-helpers';
import { EXIT } from '../../app/cli/exit-codes';

describe('report.html in Chromium', () => {
  let ctx: BrowserContext;
  let page: Page;
  let reportPath: string;
  const requests: string[] = [];
  beforeAll(async () => {
    const dir = tempDir('thermoshift-report-');
    writeSyntheticSample(join(dir, 'data'));
    const out = join(dir, 'out');
    const r = runCli([
      'build',
      join(dir, 'data'),
      '--tref',
      '100',
      '--out',
      out,
      '--modulus-unit',
      'MPa',
      '--date',
      '2026-12-01',
      '--quiet',
    ]);
    expect(r.status, r.stderr).toBe(EXIT.ok);
    reportPath = join(out, 'report.html');
    ctx = await launchBrowser();
    page = await ctx.newPage();
    page.on('request', (req) => requests.push(req.url()));
    await page.goto(pathToFileURL(reportPath).href);
  });
  afterAll(async () => {
    await ctx?.close();
  });

  it('report.html draws four charts with visible boxes, marks and lines', async () => {
    const charts = await page.$$eval('svg.chart', (els) =>
      els.map((svg) => {
        const box = svg.getBoundingClientRect();
        const data = svg.querySelector('g.data');
        const dataBox = data ? (data as SVGGraphicsElement).getBBox() : { width: 0, height: 0 };
        return {
          id: svg.id,
          width: box.width,
          height: box.height,
          points: svg.querySelectorAll('g.data .pt').length,
          lines: [...svg.querySelectorAll('g.data path.series-line')].filter(
            (p) => (p as SVGPathElement).getTotalLength() > 0,
          ).length,
          dataWidth: dataBox.width,
          dataHeight: dataBox.height,
          ticks: svg.querySelectorAll('g.axes text').length,
        };
      }),
    );
    expect(charts.map((c) => c.id)).toEqual([
      'chart-isotherms',
      'chart-master',
      'chart-shift',
      'chart-vgp',
    ]);
    for (const c of charts) {
      expect(c.width, c.id).toBeGreaterThan(300);
      expect(c.height, c.id).toBeGreaterThan(150);
      expect(c.points, c.id).toBeGreaterThan(5);
      expect(c.dataWidth, c.id).toBeGreaterThan(50);
      expect(c.dataHeight, c.id).toBeGreaterThan(20);
      expect(c.ticks, c.id).toBeGreaterThan(4);
    }
    expect(charts[1].lines).toBeGreaterThanOrEqual(2); // Prony G' and G'' through the master curve
    expect(charts[2].lines).toBeGreaterThanOrEqual(1); // model curves
  });

  it('report.html loads nothing but itself (works offline)', () => {
    expect(requests).toEqual([pathToFileURL(reportPath).href]);
  });

  it('report.html fits the page width (nothing clipped) and shows the cautions and tables', async () => {
    const overflow = await page.evaluate(
      () => document.documentElement.scrollWidth - document.documentElement.clientWidth,
    );
    expect(overflow).toBeLessThanOrEqual(0);
    expect(await page.textContent('#cautions')).toMatch(/licensed engineering practice/);
    expect(await page.$$eval('#table-shift tbody tr', (r) => r.length)).toBe(9);
    mkdirSync(ARTIFACT_DIR, { recursive: true });
    await page.screenshot({ path: join(ARTIFACT_DIR, 'report.png'), fullPage: true });
    expect(statSync(join(ARTIFACT_DIR, 'report.png')).size).toBeGreaterThan(10_000);
  });

  it('report.html prints to A4 PDF with the charts inside the printable width', async () => {
    await page.emulateMedia({ media: 'print' });
    const widths = await page.$$eval('svg.chart', (els) =>
      els.map((e) => e.getBoundingClientRect().right),
    );
    const pageWidth = await page.evaluate(() => document.documentElement.clientWidth);
    for (const w of widths) expect(w).toBeLessThanOrEqual(pageWidth);
    const pdfPath = join(ARTIFACT_DIR, 'report-a4.pdf');
    const pdf = await page.pdf({ path: pdfPath, format: 'A4', printBackground: true });
    expect(pdf.subarray(0, 5).toString()).toBe('%PDF-');
    const pages = (readFileSync(pdfPath, 'latin1').match(/\/Type\s*\/Page[^s]/g) ?? []).length;
    expect(pages).toBeGreaterThanOrEqual(3);
    expect(pages).toBeLessThanOrEqual(12);
    const letter = await page.pdf({ format: 'Letter', printBackground: true });
    expect(letter.subarray(0, 5).toString()).toBe('%PDF-');
  });
});
