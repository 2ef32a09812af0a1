import { beforeAll, describe, expect, it } from 'vitest';
import { reportHtml } from '../../../core/report/report-html';
import { pronyCsv } from '../../../core/report/csv/prony-csv';
import type { Analysis } from '../../../core/pipeline/types';
import { millionPointAnalysis } from '../../helpers/million-points';

// Size (docs/conventions.md §7): no size limit but memory. 10⁶ measured points (and as many on the master curve)
// through the spectrum step, the report's charts and the exports, without a stack overflow.
describe('reportHtml() on 10⁶ points', () => {
  let a: Analysis;
  beforeAll(() => {
    a = millionPointAnalysis();
  }, 120_000);

  it('reportHtml() draws 10⁶ points as at most one marker per pixel and series, in a file of a few MB', () => {
    expect(a.masterCurve.reducedX.length).toBeGreaterThan(999_000);
    expect(a.prony).not.toBeNull();
    const html = reportHtml(a, { date: '2026-12-01' });
    // three charts of 640 × 380 px, 7 isotherms, 2 quantities: bounded by pixels, not by points
    expect(html.length).toBeLessThan(10e6);
    const markers = (html.match(/<circle class="pt"/g) ?? []).length;
    expect(markers).toBeGreaterThan(1000);
    expect(markers).toBeLessThan(200_000);
    expect(html).toMatch(/id="chart-master"/);
  }, 120_000);

  it('the spectrum step of 10⁶ points gives a series and melt indicators from binned data', () => {
    expect(a.prony!.binCount).toBeLessThan(200);
    expect(a.prony!.equilibrium.mode).toBe('zero');
    expect(a.indicators.map((i) => i.key)).toContain('zeroShearViscosity');
    expect(pronyCsv(a)).toMatch(/deformation: shear/);
  });
});
