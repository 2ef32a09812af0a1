import { describe, it, expect } from 'vitest';
import { reportHtml } from '../../../core/report/report-html';
import { CAUTIONS } from '../../../core/report/text-blocks';
import { escapeHtml } from '../../../core/report/escape';
import { fixtureAnalysis } from './analysis-fixture';

const a = fixtureAnalysis();
const html = reportHtml(a, { date: '2026-12-01', modulusUnit: 'MPa' });

describe('reportHtml()', () => {
  it('reportHtml() is one self-contained page: no script, no external resource', () => {
    expect(html.startsWith('<!DOCTYPE html>')).toBe(true);
    expect(html).not.toMatch(/<script/i);
    expect(html).not.toMatch(/(src|href)="(https?:)?\/\//i);
    expect(html).not.toMatch(/<link /i);
  });
  it('reportHtml() has a title block with sample, date and version, and labels invented data', () => {
    expect(html).toContain('Invented Polymer XR-7');
    expect(html).toContain('2026-12-01');
    expect(html).toContain(`Thermoshift ${a.version}`);
    expect(html).toContain('INVENTED DEMO DATA');
  });
  it('reportHtml() draws the four charts as inline SVG', () => {
    for (const id of ['chart-isotherms', 'chart-master', 'chart-shift', 'chart-vgp'])
      expect(html).toContain(`id="${id}"`);
    expect(html.match(/<svg /g)).toHaveLength(4);
  });
  it('reportHtml() contains the shift, model, Prony, indicator and settings tables', () => {
    for (const id of [
      'table-shift',
      'table-models',
      'table-prony',
      'table-indicators',
      'table-settings',
    ])
      expect(html).toContain(`id="${id}"`);
    expect(html).toContain('excludedIsothermIds');
  });
  it('reportHtml() states the sign and bT conventions under every table of shift factors', () => {
    const notes = html.match(/<p class="table-note">[^<]*<\/p>/g) ?? [];
    const withConvention = notes.filter(
      (n) => n.includes('log10 aT &lt; 0 above Tref') && n.includes('bT × measured'),
    );
    expect(withConvention.length).toBeGreaterThanOrEqual(3); // shift, models, Prony
  });
  it('reportHtml() shows every caution', () => {
    for (const c of CAUTIONS) expect(html).toContain(escapeHtml(c));
    expect(html).toMatch(/licensed engineering practice/);
  });
  it('reportHtml() lists warnings with file, row and column, escaped', () => {
    expect(html).toContain('a.csv, row 12, column 3');
    expect(html).toContain('&lt;check&gt;');
    expect(html).toContain('Invented Resins &lt;Ltd&gt; &amp; Co');
  });
  it('reportHtml() has print rules that keep figures and rows whole', () => {
    expect(html).toContain('@media print');
    expect(html).toContain('break-inside: avoid');
  });
  it('reportHtml() leaves out the van Gurp–Palmen plot for relaxation data and still renders', () => {
    const r = reportHtml(fixtureAnalysis('relaxation'), { date: '2026-12-01' });
    expect(r).not.toContain('id="chart-vgp"');
    expect(r).toContain('id="chart-master"');
  });
  it('reportHtml() renders without models or Prony series', () => {
    const r = reportHtml(
      { ...a, models: {}, prony: null, indicators: [], warnings: [] },
      { date: 'd' },
    );
    expect(r).not.toContain('id="table-models"');
    expect(r).not.toContain('id="table-prony"');
    expect(r).toContain('No warnings were raised');
  });
});

describe('reportHtml() with a vertical shift', () => {
  it('reportHtml() adds the log10 bT chart when bT was applied', () => {
    const b = { ...a, settings: { ...a.settings, verticalShift: 'data' as const } };
    const r = reportHtml(b, { date: 'd' });
    expect(r).toContain('id="chart-vertical"');
    expect(r).toContain('Large or erratic bT');
  });
});
