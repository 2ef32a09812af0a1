/**
 * With no options, data that carry an entropic bT (invented melt, αV = 6·10⁻⁴ /K, a typical melt
 * value — common practice) get bT from the data; the summary says which mode and why, and every
 * curve that is left out carries its reason as a structured field.
 */
import { describe, expect, it } from 'vitest';
import { analysisSummary, buildMasterCurve } from '../../../core/pipeline';
import { syntheticIsotherms } from '../../../core/synthetic';
import { MELT_ARRHENIUS } from '../shift/fixtures';
import { reportHtml } from '../../../core/report';
import { shiftTableCsv } from '../../../core/report/csv';

describe('analysisSummary() vertical choice', () => {
  it('analysisSummary() reports vertical.chosen and vertical.reason, and the shifts are right', () => {
    const { dataset, truth } = syntheticIsotherms({
      ...MELT_ARRHENIUS.options,
      relativeNoise: 0.02,
      seed: 7,
      density: { referenceDensity: 900, volumetricExpansionPerK: 6e-4 },
    });
    const a = buildMasterCurve(dataset, { referenceTemperatureK: 463.15 });
    const s = analysisSummary(a);
    expect(s.vertical.requested).toBe('auto');
    expect(s.vertical.chosen).toBe('data');
    expect(s.vertical.reason).toMatch(/αV/);
    // αV fitted to the moduli: within 2·10⁻⁴ /K of the truth on this set.
    expect(Math.abs(s.vertical.expansionPerK! - 6e-4)).toBeLessThan(2e-4);
    const e = a.curves.map((c, k) => c.log10aT! - truth.log10aT[k]);
    const rms = Math.sqrt(e.reduce((x, y) => x + y * y, 0) / e.length);
    // 2 % noise: RMS error below 0.005 decades (the set-to-set distribution is in
    // tests/core/shift/vertical-auto.test.ts).
    expect(rms).toBeLessThan(0.005);
    expect(a.warnings.map((w) => w.code)).not.toContain('vertical-shift-ignored');
  });

  it('analysisSummary() gives an excluded isotherm its structured reason', () => {
    const { dataset } = syntheticIsotherms({
      ...MELT_ARRHENIUS.options,
      relativeNoise: 0.02,
      seed: 7,
    });
    const s = analysisSummary(
      buildMasterCurve(dataset, { referenceTemperatureK: 463.15, excludedIsothermIds: ['T01'] }),
    );
    expect(s.vertical.chosen).toBe('none');
    expect(s.curves[0].leftOut?.code).toBe('excluded');
  });

  it('shiftTableCsv() and reportHtml() carry the left-out reason and the vertical choice', () => {
    const { dataset } = syntheticIsotherms({
      ...MELT_ARRHENIUS.options,
      relativeNoise: 0.02,
      seed: 7,
    });
    // Moduli 10⁴ times higher on one isotherm: it overlaps nothing and is left out.
    for (const q of ['storageModulus', 'lossModulus'] as const)
      dataset.isotherms[9].quantities[q] = dataset.isotherms[9].quantities[q]!.map((v) => v * 1e4);
    const a = buildMasterCurve(dataset, { referenceTemperatureK: 463.15 });
    const csv = shiftTableCsv(a);
    expect(csv).toMatch(/left_out_code,left_out_reason/);
    expect(csv).toMatch(/T10,.*,no,no-overlap,/);
    const html = reportHtml(a, { date: '2026-12-01' });
    expect(html).toMatch(/overlaps no other isotherm/);
    expect(html).toMatch(/Vertical shift chosen automatically: bT = 1/);
  });
});
